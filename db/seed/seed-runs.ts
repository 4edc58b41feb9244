/**
 * Demo scenario part: detector configurations and four weeks of runs. Adds configurations that are missing
 * (by detector and name); adds the runs only when no demo run exists yet, in batches.
 */
import { and, count, eq, gte, lt } from "drizzle-orm";
import type { Database } from "../client";
import { detectorConfigs, runs } from "../schema";
import { DAY_MS, REPAIR_DAY, RESTORE_DAY, scenarioStartFor, storedScenarioStart } from "./scenario";
import { FIRST_DEMO_RUN, planDemoRuns } from "../run-demo-plan";
import { configInForce } from "../../lib/runs";

const BATCH = 100;
const DEMO_RANGE = 100_000;

function demoConfigs(startMs: number) {
  return [
    { detector: "Quillon", name: "Quillon baseline", targetMaterial: "xenon", fiducialMassKg: "950", effectiveFromMs: startMs, notes: "Nominal fiducial volume, drift field 0.23 kV/cm." },
    {
      detector: "Quillon",
      name: "Quillon after grid repair",
      targetMaterial: "xenon",
      fiducialMassKg: "948.5",
      effectiveFromMs: startMs + REPAIR_DAY * DAY_MS,
      notes: "Outer radius cut tightened near the repaired gate-grid section; reduced field 0.19 kV/cm.",
    },
    { detector: "Quillon", name: "Quillon restored", targetMaterial: "xenon", fiducialMassKg: "950", effectiveFromMs: startMs + RESTORE_DAY * DAY_MS, notes: "Full fiducial volume and nominal field again." },
    { detector: "Quillon-Ge", name: "Quillon-Ge array", targetMaterial: "germanium", fiducialMassKg: "12.25", effectiveFromMs: startMs, notes: "Eight high-purity germanium crystals." },
  ];
}

/** Seed the runs part of the demo scenario; adds only what is missing. */
export async function seedRuns(db: Database, people: Map<string, number>): Promise<string> {
  const startMs = (await storedScenarioStart(db)) ?? scenarioStartFor(Date.now());
  const expert = people.get("tobias.renn@kestrin-deep.example") ?? null;
  let addedConfigs = 0;
  for (const c of demoConfigs(startMs)) {
    const [have] = await db
      .select({ id: detectorConfigs.id })
      .from(detectorConfigs)
      .where(and(eq(detectorConfigs.detector, c.detector), eq(detectorConfigs.name, c.name)))
      .limit(1);
    if (have) continue;
    const { effectiveFromMs, ...rest } = c;
    await db.insert(detectorConfigs).values({ ...rest, effectiveFrom: new Date(effectiveFromMs), createdBy: expert });
    addedConfigs++;
  }

  const [demo] = await db
    .select({ n: count() })
    .from(runs)
    .where(and(gte(runs.number, FIRST_DEMO_RUN), lt(runs.number, FIRST_DEMO_RUN + DEMO_RANGE)));
  if ((demo?.n ?? 0) > 0) return `runs: ${addedConfigs} configurations added; demo runs already there (${demo?.n}), none added`;

  const configs = (await db.select().from(detectorConfigs).where(eq(detectorConfigs.detector, "Quillon"))).map((c) => ({
    id: c.id,
    detector: c.detector,
    effectiveFromMs: c.effectiveFrom.getTime(),
  }));
  const planned = planDemoRuns(startMs, Date.now());
  const rows = planned.map((p) => {
    const config = configInForce(configs, "Quillon", p.startMs);
    if (!config) throw new Error(`no Quillon configuration in force at ${new Date(p.startMs).toISOString()} for demo run ${p.number}`);
    return {
      number: p.number,
      type: p.type,
      status: p.status,
      startAt: new Date(p.startMs),
      endAt: p.endMs === null ? null : new Date(p.endMs),
      liveSeconds: p.liveSeconds === null ? null : p.liveSeconds.toFixed(3),
      deadSeconds: p.deadSeconds === null ? null : p.deadSeconds.toFixed(3),
      triggerCount: p.triggerCount,
      configId: config.id,
      conditions: p.conditions,
      openedByUserId: p.openedBy ? (people.get(p.openedBy) ?? null) : null,
    };
  });
  await db.transaction(async (tx) => {
    for (let i = 0; i < rows.length; i += BATCH) await tx.insert(runs).values(rows.slice(i, i + BATCH));
  });
  const open = planned.filter((p) => p.status === "running").length;
  return `runs: ${addedConfigs} configurations and ${rows.length} runs added (${open} open)`;
}
