/**
 * Demo scenario part: safety. Calibration sources of the Kestrin Deep Site (Cs-137, Am-Be, a Kr-83m generator,
 * Th-228) with checkouts around the calibration runs they served, leak tests in every standing (one due soon,
 * one overdue), one source out now and one overdue; and a queue item for every safety entry the logbook seeded,
 * the older ones acknowledged by Oskar Lunde. Idempotent: sources by serial, checkouts only for a source that has
 * none, links and queue items only where missing. Sends no mail.
 */
import { and, asc, eq, inArray, isNull, lt, or, gt } from "drizzle-orm";
import type { Database } from "../client";
import { calibrationSources, checkoutRuns, entries, runs, safetyReviewEvents, safetyReviews, sourceCheckouts } from "../schema";
import { addUtcMonths } from "../../lib/safety/sources";
import { SAFETY_CATEGORIES } from "../../components/safety/review-flow";
import { DAY_MS, scenarioStartFor, storedScenarioStart } from "./scenario";

const HOUR_MS = 3_600_000;
const MIN_MS = 60_000;
const OSKAR = "oskar.lunde@kestrin-deep.example";

type DemoSource = {
  serial: string;
  nuclide: string;
  form: "sealed" | "gaseous";
  activityBq: number;
  refMs: number;
  location: string;
  custodian: string;
  allowedOutHours: number;
  lastLeakTestMs: number | null;
  decayWaitFraction: number | null;
  notes: string;
  /** The `source` condition the runs seed writes on calibration runs that used it. */
  runSource: string | null;
};

function demoSources(startMs: number, nowMs: number): DemoSource[] {
  const year = new Date(startMs).getUTCFullYear();
  const sealed = { form: "sealed" as const, decayWaitFraction: null };
  return [
    {
      ...sealed, serial: "KDS-CS-0142", nuclide: "Cs-137", activityBq: 370_000, refMs: Date.UTC(year - 2, 5, 1), location: "Source safe, Hall B (level −1400 m)",
      custodian: OSKAR, allowedOutHours: 8, runSource: "Cs-137",
      // Six months less twelve days ago: the next leak test is due in twelve days.
      lastLeakTestMs: addUtcMonths(nowMs, -6) + 12 * DAY_MS, notes: "Gamma check source for the top guide tube (662 keV line).",
    },
    {
      ...sealed, serial: "KDS-AMBE-0007", nuclide: "Am-Be", activityBq: 18_500_000, refMs: Date.UTC(year - 6, 2, 1), location: "Neutron source store, Hall B",
      custodian: OSKAR, allowedOutHours: 6, runSource: "AmBe",
      lastLeakTestMs: addUtcMonths(nowMs, -7), notes: "(alpha,n) neutron source for nuclear-recoil calibration; activity is the Am-241 activity.",
    },
    {
      ...sealed, serial: "KDS-TH-0311", nuclide: "Th-228", activityBq: 50_000, refMs: Date.UTC(year - 1, 0, 15), location: "Source safe, Hall B (level −1400 m)",
      custodian: "ilse.achter@kestrin-deep.example", allowedOutHours: 8, runSource: null,
      lastLeakTestMs: addUtcMonths(nowMs, -2), notes: "Emanates Rn-220 for the gas-system calibration port.",
    },
    {
      serial: "KDS-KR-GEN-03", nuclide: "Kr-83m", form: "gaseous", activityBq: 500_000, refMs: startMs - 10 * DAY_MS, location: "Gas system, calibration manifold",
      custodian: "ilse.achter@kestrin-deep.example", allowedOutHours: 4, runSource: "Kr-83m", lastLeakTestMs: null, decayWaitFraction: 0.001,
      notes: "Rb-83 generator (86.2 d parent) on zeolite. The activity is what one fill injects; each checkout is an injection.",
    },
  ];
}

type CalRun = { number: number; startAt: Date; endAt: Date | null; conditions: Record<string, string | number> };

// Checkouts around the calibration runs that used the source, or a weekly plan if no such run exists yet.
function plannedCheckouts(src: DemoSource, cal: CalRun[], startMs: number, nowMs: number) {
  const used = cal.filter((r) => r.endAt && r.endAt.getTime() < nowMs - HOUR_MS && src.runSource !== null && r.conditions.source === src.runSource);
  const gas = src.form === "gaseous";
  if (used.length > 0) {
    return used.map((r) => ({
      outMs: r.startAt.getTime() - (gas ? 10 : 20) * MIN_MS,
      // The generator valve closes soon after the fill; a sealed source comes back after the run.
      backMs: gas ? r.startAt.getTime() + 20 * MIN_MS : (r.endAt as Date).getTime() + 20 * MIN_MS,
      purpose: gas ? `Kr-83m injection for calibration run ${r.number}` : `${src.nuclide} calibration, run ${r.number}`,
    }));
  }
  return [3, 10, 17].map((day) => ({
    outMs: startMs + day * DAY_MS + 8 * HOUR_MS,
    backMs: startMs + day * DAY_MS + (gas ? 8.5 : 11.5) * HOUR_MS,
    purpose: gas ? "Kr-83m injection for a calibration" : `${src.nuclide} calibration at the cryostat`,
  }));
}

async function seedSources(db: Database, people: Map<string, number>, startMs: number, nowMs: number): Promise<{ sources: number; checkouts: number; links: number }> {
  const crew = [people.get("tobias.renn@kestrin-deep.example"), people.get("ilse.achter@kestrin-deep.example"), people.get("jonah.fell@kestrin-deep.example")].filter((x): x is number => x !== undefined);
  const officer = people.get(OSKAR) ?? crew[0];
  if (officer === undefined) return { sources: 0, checkouts: 0, links: 0 };
  const cal = (await db.select({ number: runs.number, startAt: runs.startAt, endAt: runs.endAt, conditions: runs.conditions }).from(runs).where(eq(runs.type, "calibration")).orderBy(asc(runs.startAt))) as CalRun[];
  let added = 0;
  let checkouts = 0;
  let links = 0;
  for (const src of demoSources(startMs, nowMs)) {
    let [row] = await db.select({ id: calibrationSources.id }).from(calibrationSources).where(eq(calibrationSources.serial, src.serial)).limit(1);
    if (!row) {
      const [res] = await db.insert(calibrationSources).values({
        nuclide: src.nuclide, serial: src.serial, form: src.form, referenceActivityBq: src.activityBq, referenceDate: new Date(src.refMs), location: src.location,
        custodianId: people.get(src.custodian) ?? null, allowedOutHours: src.allowedOutHours, leakTestIntervalMonths: src.form === "sealed" ? 6 : null,
        lastLeakTestAt: src.lastLeakTestMs === null ? null : new Date(src.lastLeakTestMs), decayWaitFraction: src.decayWaitFraction, notes: src.notes,
      });
      row = { id: res.insertId };
      added++;
    }
    const sourceId = row.id;
    const [any] = await db.select({ id: sourceCheckouts.id }).from(sourceCheckouts).where(eq(sourceCheckouts.sourceId, sourceId)).limit(1);
    if (!any) {
      const plan = plannedCheckouts(src, cal, startMs, nowMs);
      for (const [i, p] of plan.entries()) {
        const by = crew[i % Math.max(1, crew.length)] ?? officer;
        await db.insert(sourceCheckouts).values({ sourceId, checkedOutBy: by, checkedOutAt: new Date(p.outMs), purpose: p.purpose, returnedAt: new Date(p.backMs), returnedBy: by });
        checkouts++;
      }
      // One source out right now (within its allowance) and one left out past it.
      if (src.serial === "KDS-AMBE-0007") {
        await db.insert(sourceCheckouts).values({ sourceId, checkedOutBy: crew[0] ?? officer, checkedOutAt: new Date(nowMs - 30 * MIN_MS), purpose: "Neutron calibration at the side guide tube (in progress)" });
        checkouts++;
      }
      if (src.serial === "KDS-TH-0311") {
        await db.insert(sourceCheckouts).values({ sourceId, checkedOutBy: crew[1] ?? officer, checkedOutAt: new Date(nowMs - 30 * HOUR_MS), purpose: "Rn-220 emanation test at the gas-system port" });
        checkouts++;
      }
    }
    links += await linkCalibrationRuns(db, sourceId, src.runSource);
  }
  return { sources: added, checkouts, links };
}

// Links each checkout of the source to the calibration runs inside its window that used this source.
async function linkCalibrationRuns(db: Database, sourceId: number, runSource: string | null): Promise<number> {
  if (runSource === null) return 0;
  let linked = 0;
  const outs = await db.select().from(sourceCheckouts).where(eq(sourceCheckouts.sourceId, sourceId));
  for (const c of outs) {
    const end = c.returnedAt ?? new Date();
    const near = await db
      .select({ number: runs.number, conditions: runs.conditions })
      .from(runs)
      .where(and(eq(runs.type, "calibration"), lt(runs.startAt, new Date(end.getTime() + HOUR_MS)), or(isNull(runs.endAt), gt(runs.endAt, c.checkedOutAt))));
    const numbers = near.filter((r) => (r.conditions as Record<string, unknown>).source === runSource && r.number).map((r) => r.number);
    if (numbers.length === 0) continue;
    const [res] = await db.insert(checkoutRuns).ignore().values(numbers.map((runNumber) => ({ checkoutId: c.id, runNumber })));
    linked += res.affectedRows;
  }
  return linked;
}

const ACK_COMMENTS: Record<string, string> = {
  cryogenics: "Read with the shift. Oxygen monitors in the cryo hall stayed above 20 %; no further action.",
  radiation: "Checked the source log against this entry; checkout and return are recorded. Nothing further.",
  incident: "Talked to the shift lead; the area was made safe and the report is complete.",
};

async function seedQueue(db: Database, people: Map<string, number>, nowMs: number): Promise<{ items: number; moved: number }> {
  const officer = people.get(OSKAR) ?? null;
  const candidates = await db
    .select({ id: entries.id, category: entries.category, needs: entries.needsSafetyReview, createdAt: entries.createdAt, authorId: entries.authorId, rev: entries.currentRevision })
    .from(entries)
    .leftJoin(safetyReviews, eq(safetyReviews.entryId, entries.id))
    .where(and(isNull(safetyReviews.id), or(inArray(entries.category, [...SAFETY_CATEGORIES]), eq(entries.needsSafetyReview, true))))
    .orderBy(asc(entries.createdAt));
  let moved = 0;
  for (const [i, e] of candidates.entries()) {
    const old = nowMs - e.createdAt.getTime() > 2 * DAY_MS && officer !== null;
    // Older items were worked: two in three acknowledged, the third waits on its writer.
    const state = !old ? "awaiting_review" : i % 3 === 2 ? "follow_up" : "acknowledged";
    const movedAt = new Date(e.createdAt.getTime() + 3 * HOUR_MS);
    const [res] = await db.insert(safetyReviews).ignore().values({
      entryId: e.id, state, reviewedRevision: state === "awaiting_review" ? null : e.rev, enteredAt: e.createdAt, updatedAt: state === "awaiting_review" ? e.createdAt : movedAt,
    });
    if (res.affectedRows !== 1) continue;
    await db.insert(safetyReviewEvents).values({ reviewId: res.insertId, fromState: null, toState: "awaiting_review", comment: `entered the queue with revision ${e.rev}`, actorId: e.authorId, at: e.createdAt });
    if (state !== "awaiting_review") {
      const comment = state === "follow_up"
        ? "Please add the oxygen-monitor readings and who was in the hall at the time, so the record is complete."
        : (ACK_COMMENTS[e.category] ?? "Read and checked; nothing further needed.");
      await db.insert(safetyReviewEvents).values({ reviewId: res.insertId, fromState: "awaiting_review", toState: state, comment, actorId: officer, at: movedAt });
      moved++;
    }
  }
  return { items: candidates.length, moved };
}

/** Seed the safety part of the demo scenario; adds only what is missing. */
export async function seedSafety(db: Database, people: Map<string, number>): Promise<string> {
  const nowMs = Date.now();
  const startMs = (await storedScenarioStart(db)) ?? scenarioStartFor(nowMs);
  const s = await seedSources(db, people, startMs, nowMs);
  const q = await seedQueue(db, people, nowMs);
  return `safety: ${s.sources} sources, ${s.checkouts} checkouts, ${s.links} run links, ${q.items} queue items (${q.moved} reviewed) added`;
}
