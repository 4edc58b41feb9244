/**
 * The demo scenario's run schedule, computed (no database): four weeks of Quillon data taking at the Kestrin
 * Deep Site. A seeded pseudo-random generator makes every seeding give the same runs relative to its start.
 */
import { REPAIR_DAY, RESTORE_DAY, DAY_MS } from "./seed/scenario";
import type { RunConditions, RunStatus, RunType } from "../lib/runs";

/** The first run number of the demo. */
export const FIRST_DEMO_RUN = 41_000;
const MINUTE = 60_000;
const SOURCES = ["Cs-137", "AmBe", "Kr-83m"] as const;
type Source = (typeof SOURCES)[number];
const CALIBRATION_MINUTES: Record<Source, number> = { "Cs-137": 120, AmBe: 180, "Kr-83m": 150 };
/** Invented trigger rates in Hz: the sources light the detector up, science data is mostly low-energy background. */
const CALIBRATION_RATE_HZ: Record<Source, number> = { "Cs-137": 180, AmBe: 45, "Kr-83m": 95 };
const SOURCE_POSITION: Record<Source, string> = { "Cs-137": "top guide tube", AmBe: "side guide tube", "Kr-83m": "injected into the gas system" };

/** One planned run. */
export interface PlannedRun {
  number: number;
  type: RunType;
  status: RunStatus;
  startMs: number;
  endMs: number | null;
  liveSeconds: number | null;
  deadSeconds: number | null;
  triggerCount: number | null;
  conditions: RunConditions;
  /** Which demo person opened it (e-mail), or null for the DAQ's own runs. */
  openedBy: string | null;
}

/** mulberry32: a small seeded generator, uniform on [0, 1); good enough to vary demo numbers reproducibly. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

type Special = { atMin: number; minutes: number; kind: RunType | "downtime"; status?: RunStatus; source?: Source; purpose?: string };

/** What a day holds besides back-to-back science runs, in time order. */
function specialsFor(day: number, rnd: () => number, calibrationIndex: number): { specials: Special[]; calibrated: boolean } {
  const s: Special[] = [];
  if (day === 0) s.push({ atMin: 0, minutes: 180, kind: "commissioning", purpose: "trigger thresholds after cool-down" });
  if (day === REPAIR_DAY - 1) s.push({ atMin: 600, minutes: 840, kind: "downtime" });
  if (day === REPAIR_DAY) {
    s.push({ atMin: 0, minutes: 150, kind: "commissioning", purpose: "HV ramp after grid repair" });
    s.push({ atMin: 152, minutes: 90, kind: "commissioning", purpose: "electron lifetime check" });
  }
  if (day === RESTORE_DAY - 1) s.push({ atMin: 780, minutes: 660, kind: "downtime" });
  if (day === RESTORE_DAY) s.push({ atMin: 0, minutes: 150, kind: "commissioning", purpose: "HV ramp to nominal field" });
  if (day % 7 === 2) s.push({ atMin: 440, minutes: 30, kind: "noise" });
  const quietDay = day === 0 || day === REPAIR_DAY - 1 || day === REPAIR_DAY || day === RESTORE_DAY;
  const calibrated = !quietDay && rnd() < 0.85;
  if (calibrated) {
    const source = SOURCES[calibrationIndex % SOURCES.length] ?? "Cs-137";
    s.push({ atMin: 480, minutes: CALIBRATION_MINUTES[source], kind: "calibration", source });
  }
  if (day === 9) s.push({ atMin: 840, minutes: 17, kind: "science", status: "aborted" });
  if (day % 7 === 4) s.push({ atMin: 1200, minutes: 238, kind: "background", purpose: "radon assay, recirculation paused" });
  return { specials: s.sort((a, b) => a.atMin - b.atMin), calibrated };
}

function conditionsAt(day: number, rnd: () => number): RunConditions {
  const reduced = day >= REPAIR_DAY && day < RESTORE_DAY;
  return {
    "drift field [kV/cm]": reduced ? 0.19 : 0.23,
    "cathode voltage [kV]": reduced ? -13.3 : -16.1,
    "liquid temperature [K]": Number((175.8 + (rnd() - 0.5) * 0.08).toFixed(2)),
    "gas pressure [bar]": Number((1.92 + (rnd() - 0.5) * 0.012).toFixed(3)),
  };
}

/** Live and dead time for a closed run: live fraction in [lo, hi], dead time the rest minus a little unaccounted time. */
function accounting(durationS: number, lo: number, hi: number, rnd: () => number): { live: number; dead: number } {
  const fraction = lo + (hi - lo) * rnd();
  const unaccounted = 0.0005 + 0.0025 * rnd();
  const live = Math.round(durationS * fraction * 1000) / 1000;
  const dead = Math.max(0, Math.round(durationS * (1 - fraction - unaccounted) * 1000) / 1000);
  return { live, dead };
}

/** The demo runs from the scenario start up to `nowMs`; the run under way at `nowMs` is left open. */
export function planDemoRuns(startMs: number, nowMs: number, seed = 41_017): PlannedRun[] {
  const rnd = seededRandom(seed);
  const out: PlannedRun[] = [];
  let t = startMs;
  let calibrations = 0;
  let open = false;
  const gap = () => (60 + Math.floor(rnd() * 120)) * 1000;

  const add = (type: RunType, s: number, e: number, day: number, extra: Partial<Special>, openedBy: string | null) => {
    if (open || s >= nowMs) return;
    const conditions: RunConditions = { ...conditionsAt(day, rnd) };
    if (extra.source) Object.assign(conditions, { source: extra.source, "source position": SOURCE_POSITION[extra.source] });
    if (extra.purpose) conditions.purpose = extra.purpose;
    if (type === "noise") conditions.trigger = "random, 10 Hz";
    const base = { number: FIRST_DEMO_RUN + out.length, type, startMs: s, conditions, openedBy };
    if (e > nowMs) {
      open = true;
      out.push({ ...base, status: "running", endMs: null, liveSeconds: null, deadSeconds: null, triggerCount: null });
      return;
    }
    const durationS = (e - s) / 1000;
    const [lo, hi] = type === "calibration" ? [0.93, 0.95] : type === "noise" ? [0.97, 0.98] : [0.955, 0.98];
    const { live, dead } = accounting(durationS, lo, hi, rnd);
    const rate = extra.source ? CALIBRATION_RATE_HZ[extra.source] : type === "noise" ? 10 : type === "commissioning" ? 15 + 10 * rnd() : 6.5 + 2 * rnd();
    out.push({ ...base, status: extra.status ?? "ended", endMs: e, liveSeconds: live, deadSeconds: dead, triggerCount: Math.round(live * rate) });
  };

  for (let day = 0; startMs + day * DAY_MS < nowMs && !open; day++) {
    const dayStart = startMs + day * DAY_MS;
    const { specials, calibrated } = specialsFor(day, seededRandom(seed + day), calibrations);
    if (calibrated) calibrations++;
    for (const sp of [...specials, { atMin: 1440, minutes: 0, kind: "downtime" as const }]) {
      const spStart = dayStart + sp.atMin * MINUTE;
      // Fill with hour-long science runs up to the next special; the last one is stopped early for it.
      while (t + 10 * MINUTE <= spStart - MINUTE) {
        const end = Math.min(t + 60 * MINUTE, spStart - MINUTE);
        add("science", t, end, day, {}, null);
        t = end + gap();
      }
      if (sp.minutes === 0) break;
      t = Math.max(t, spStart);
      if (sp.kind !== "downtime") {
        const crew = sp.kind === "calibration" || sp.kind === "commissioning" ? (day % 2 ? "jonah.fell@kestrin-deep.example" : "mara.velen@kestrin-deep.example") : null;
        add(sp.kind, t, t + sp.minutes * MINUTE, day, sp, crew);
      }
      t += sp.minutes * MINUTE + gap();
    }
  }
  // Now fell into a pause between runs: the DAQ has just started the next one.
  const last = out[out.length - 1];
  if (!open && last?.endMs != null && last.endMs < nowMs) {
    const s = Math.min(last.endMs + 90_000, nowMs - 1000);
    add("science", Math.max(s, last.endMs + 1000), nowMs + 60 * MINUTE, Math.floor((s - startMs) / DAY_MS), {}, null);
  }
  return out;
}
