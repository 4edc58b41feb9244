import { describe, expect, it } from "vitest";
import {
  accountingToleranceSeconds,
  checkClose,
  closeDifferences,
  configInForce,
  liveFraction,
  openDifferences,
  RunInputError,
  type CloseRunInput,
  type OpenRunInput,
} from "@/lib/runs";

const START = Date.UTC(2026, 10, 3, 12, 0, 0); // 2026-11-03T12:00:00Z (ECMAScript Date.UTC)
const HOUR_MS = 3_600_000;

function close(durationS: number, live: number, dead: number, extra: Partial<CloseRunInput> = {}): CloseRunInput {
  return { endMs: START + durationS * 1000, liveSeconds: live, deadSeconds: dead, triggerCount: 1000, status: "ended", ...extra };
}

function fieldOf(fn: () => void): string | null {
  try {
    fn();
    return null;
  } catch (err) {
    if (err instanceof RunInputError) return err.field;
    throw err;
  }
}

describe("accounting tolerance: max(1 s, 0.1 % of the duration)", () => {
  it.each([
    { label: "10 s run: the 1 s floor applies", duration: 10, expected: 1 }, // rule of the DAQ API: floor of 1 s
    { label: "500 s run: still the floor", duration: 500, expected: 1 }, // 0.001 × 500 = 0.5 < 1 (hand arithmetic)
    { label: "1000 s run: both rules give 1 s", duration: 1000, expected: 1 }, // 0.001 × 1000 = 1 (hand arithmetic)
    { label: "1 h run: 3.6 s", duration: 3600, expected: 3.6 }, // 0.001 × 3600 = 3.6 (hand arithmetic)
    { label: "1 day run: 86.4 s", duration: 86_400, expected: 86.4 }, // 0.001 × 86 400 = 86.4 (hand arithmetic)
  ])("$label", ({ duration, expected }) => {
    expect(accountingToleranceSeconds(duration)).toBeCloseTo(expected, 9);
  });
});

describe("checkClose: which field a bad close is refused on", () => {
  it.each([
    { label: "typical 1 h science run (96.5 % live)", c: close(3600, 3474, 120), field: null }, // 3474 + 120 = 3594 ≤ 3600 (hand arithmetic)
    { label: "live + dead exactly the duration", c: close(3600, 3500, 100), field: null }, // 3600 = 3600
    { label: "live + dead at the 1 h tolerance edge (+3.6 s)", c: close(3600, 3500, 103.6), field: null }, // 3603.6 = 3600 + 3.6
    { label: "live + dead 1 ms past the 1 h tolerance", c: close(3600, 3500, 103.601), field: "deadSeconds" }, // 3603.601 > 3603.6
    { label: "short run: +1 s allowed by the floor", c: close(500, 450, 51), field: null }, // 501 = 500 + 1
    { label: "short run: 1 ms past the floor", c: close(500, 450, 51.001), field: "deadSeconds" }, // 501.001 > 501
    { label: "live time equal to the duration", c: close(3600, 3600, 0), field: null }, // live ≤ duration holds with equality
    { label: "live time 1 ms above the duration (no tolerance on live alone)", c: close(3600, 3600.001, 0), field: "liveSeconds" },
    { label: "negative live time", c: close(3600, -0.001, 10), field: "liveSeconds" },
    { label: "negative dead time", c: close(3600, 3000, -1), field: "deadSeconds" },
    { label: "end equal to start", c: close(0, 0, 0), field: "end" },
    { label: "end before start", c: close(-60, 0, 0), field: "end" },
  ])("$label", ({ c, field }) => {
    expect(fieldOf(() => checkClose(START, c))).toBe(field);
  });

  it("states the tolerance rule and its value in the refusal", () => {
    const err = (() => {
      try {
        checkClose(START, close(3600, 3500, 110));
      } catch (e) {
        return e as RunInputError;
      }
      return null;
    })();
    expect(err?.reason).toContain("3.6 s"); // 0.1 % of 3600 s (hand arithmetic)
    expect(err?.reason).toContain("1 s or 0.1 % of the run duration");
  });
});

describe("liveFraction", () => {
  it.each([
    { label: "3474 s live in 1 h", end: START + HOUR_MS, live: 3474, expected: 0.965 }, // 3474 / 3600 = 0.965 (hand arithmetic)
    { label: "open run", end: null, live: null, expected: null },
    { label: "all dead", end: START + HOUR_MS, live: 0, expected: 0 },
  ])("$label", ({ end, live, expected }) => {
    const got = liveFraction(START, end, live);
    if (expected === null) expect(got).toBeNull();
    else expect(got).toBeCloseTo(expected, 12);
  });
});

const OPEN: OpenRunInput = {
  number: 41_000,
  type: "science",
  startMs: START,
  detector: "Quillon",
  conditions: { "drift field [kV/cm]": 0.23, "gas pressure [bar]": 1.92 },
  targetMassOverrideKg: null,
};

describe("openDifferences: retry or conflict", () => {
  const recordedAs = (override: string | null = null) => ({
    type: OPEN.type,
    startMs: OPEN.startMs,
    detector: OPEN.detector,
    conditions: OPEN.conditions,
    targetMassOverrideKg: override,
  });
  it.each([
    { label: "identical request is a retry", recorded: recordedAs(), req: OPEN, diff: [] as string[] },
    {
      label: "conditions in another key order are the same",
      recorded: recordedAs(),
      req: { ...OPEN, conditions: { "gas pressure [bar]": 1.92, "drift field [kV/cm]": 0.23 } },
      diff: [],
    },
    // DECIMAL(12,4) hands back "950.0000" for 950 (MariaDB DECIMAL semantics)
    { label: "950.0000 kg stored and 950 kg sent are the same mass", recorded: recordedAs("950.0000"), req: { ...OPEN, targetMassOverrideKg: "950" }, diff: [] },
    { label: "another start", recorded: recordedAs(), req: { ...OPEN, startMs: START + 1 }, diff: ["start"] },
    {
      label: "another type and detector",
      recorded: recordedAs(),
      req: { ...OPEN, type: "calibration" as const, detector: "Quillon-Ge" as const },
      diff: ["type", "detector"],
    },
    {
      label: "a number sent as text is another value",
      recorded: recordedAs(),
      req: { ...OPEN, conditions: { ...OPEN.conditions, "gas pressure [bar]": "1.92" } },
      diff: ["conditions"],
    },
    { label: "override added", recorded: recordedAs(), req: { ...OPEN, targetMassOverrideKg: "948.5" }, diff: ["targetMassOverrideKg"] },
    { label: "override dropped", recorded: recordedAs("948.5"), req: OPEN, diff: ["targetMassOverrideKg"] },
  ])("$label", ({ recorded, req, diff }) => {
    expect(openDifferences(recorded, req)).toEqual(diff);
  });
});

describe("closeDifferences", () => {
  const recorded = { status: "ended" as const, endMs: START + HOUR_MS, liveSeconds: 3474.123, deadSeconds: 120.5, triggerCount: 26_000 };
  const same = { endMs: START + HOUR_MS, liveSeconds: 3474.123, deadSeconds: 120.5, triggerCount: 26_000, status: "ended" as const };
  it.each([
    { label: "identical close is a retry", req: same, diff: [] as string[] },
    { label: "other live time", req: { ...same, liveSeconds: 3474.124 }, diff: ["liveSeconds"] },
    { label: "aborted instead of ended", req: { ...same, status: "aborted" as const }, diff: ["status"] },
    { label: "other end and trigger count", req: { ...same, endMs: START + HOUR_MS + 1000, triggerCount: 1 }, diff: ["end", "triggerCount"] },
  ])("$label", ({ req, diff }) => {
    expect(closeDifferences(recorded, req)).toEqual(diff);
  });
});

describe("configInForce: the latest configuration effective at or before the start", () => {
  const DAY = 86_400_000;
  const configs = [
    { id: 1, detector: "Quillon", effectiveFromMs: START },
    { id: 2, detector: "Quillon", effectiveFromMs: START + 15 * DAY },
    { id: 3, detector: "Quillon", effectiveFromMs: START + 23 * DAY },
    { id: 4, detector: "Quillon-Ge", effectiveFromMs: START },
    { id: 5, detector: "Quillon-Ge", effectiveFromMs: START + 5 * DAY },
    { id: 6, detector: "Quillon-Ge", effectiveFromMs: START + 5 * DAY },
  ];
  it.each([
    { label: "before every configuration", detector: "Quillon", at: START - 1, id: null },
    { label: "exactly at the first effective time", detector: "Quillon", at: START, id: 1 },
    { label: "1 ms before the repair configuration", detector: "Quillon", at: START + 15 * DAY - 1, id: 1 },
    { label: "exactly at the repair configuration", detector: "Quillon", at: START + 15 * DAY, id: 2 },
    { label: "after the restore", detector: "Quillon", at: START + 30 * DAY, id: 3 },
    { label: "the other detector's list is separate", detector: "Quillon-Ge", at: START + 20 * DAY, id: 6 }, // same instant: higher id wins
    { label: "unknown detector", detector: "Quillon-X", at: START + DAY, id: null },
  ])("$label", ({ detector, at, id }) => {
    expect(configInForce(configs, detector, at)?.id ?? null).toBe(id);
  });
});
