/**
 * Demo scenario part: data quality. Subsystems always; when runs exist, a handful of bad-time flags over them
 * (confirmed exclusions, a caution, one awaiting confirmation, one withdrawn) and the three data-quality periods.
 * Each record is looked up before it is added, so a second run adds nothing.
 */
import { and, count, eq } from "drizzle-orm";
import type { Database } from "../client";
import { audit } from "../audit";
import { badTimeFlags, dqPeriods, flagEvents, runs, subsystems, type FlagState, type FlagVerdict, type RunType } from "../schema";
import { DAY_MS, REPAIR_DAY, RESTORE_DAY, SCENARIO_DAYS, storedScenarioStart } from "./scenario";

const H = 3_600_000;
const MIN = 60_000;

/** The subsystems every installation starts with; experts add more on the Subsystems page. */
export const DEMO_SUBSYSTEMS = [
  { code: "tpc", label: "TPC" },
  { code: "cryogenics", label: "Cryogenics" },
  { code: "daq", label: "DAQ" },
  { code: "veto", label: "Veto" },
  { code: "calibration", label: "Calibration system" },
  { code: "slow-control", label: "Slow control" },
  { code: "environment", label: "Environment" },
];

const TOBIAS = "tobias.renn@kestrin-deep.example";
const ILSE = "ilse.achter@kestrin-deep.example";
const PRIYA = "priya.castel@kestrin-deep.example";

type DemoFlag = {
  /** Offset from the scenario start. */
  fromMs: number;
  toMs: number;
  subsystem: string;
  verdict: FlagVerdict;
  reason: string;
  state: FlagState;
  proposer: string;
  /** Confirmer (confirmed flags) or withdrawer (withdrawn flags). */
  second?: string;
  withdrawReason?: string;
};

const day = (d: number, h = 0, m = 0) => d * DAY_MS + h * H + m * MIN;

const DEMO_FLAGS: DemoFlag[] = [
  { fromMs: day(4, 13, 20), toMs: day(4, 14, 5), subsystem: "daq", verdict: "exclude", state: "confirmed", proposer: TOBIAS, second: ILSE,
    reason: "Event builder busy: dead time above 40 % for 45 minutes after a disk array rebuild started." },
  { fromMs: day(9, 7, 10), toMs: day(9, 7, 55), subsystem: "veto", verdict: "exclude", state: "confirmed", proposer: ILSE, second: TOBIAS,
    reason: "Muon veto high voltage tripped on two PMT rows; veto coverage incomplete until the ramp finished." },
  { fromMs: day(REPAIR_DAY - 1, 7, 25), toMs: day(REPAIR_DAY - 1, 9, 50), subsystem: "cryogenics", verdict: "exclude", state: "confirmed", proposer: ILSE, second: TOBIAS,
    reason: "Pressure excursion in the inner vessel (up to 2.31 bar) as the gate grid began to fail, just before the repair stop; field and purity unstable." },
  { fromMs: day(REPAIR_DAY + 4, 3, 5), toMs: day(REPAIR_DAY + 4, 3, 50), subsystem: "slow-control", verdict: "exclude", state: "confirmed", proposer: TOBIAS, second: ILSE,
    reason: "Slow-control archiver stalled: no record of cathode voltage or liquid level for 45 minutes, detector state unknown." },
  { fromMs: day(11, 0, 0), toMs: day(11, 8, 0), subsystem: "environment", verdict: "caution", state: "confirmed", proposer: TOBIAS, second: ILSE,
    reason: "Radon in the cavern air raised after a ventilation fan stop; keep an eye on the low-energy background." },
  { fromMs: day(6, 15, 0), toMs: day(6, 16, 0), subsystem: "calibration", verdict: "exclude", state: "withdrawn", proposer: ILSE, second: ILSE,
    reason: "Source deployment arm reported not parked during a science run.",
    withdrawReason: "Position sensor glitch: the arm was parked the whole time (checked on the camera)." },
  { fromMs: day(SCENARIO_DAYS - 3, 14, 15), toMs: day(SCENARIO_DAYS - 3, 15, 0), subsystem: "tpc", verdict: "exclude", state: "proposed", proposer: TOBIAS,
    reason: "Cathode current spikes (micro-discharges) seen on the slow-control trend; drift field possibly unstable." },
];

type DemoPeriod = { name: string; fromMs: number; toMs: number; runTypes: RunType[]; signalAcceptance: number; blind: boolean; notes: string };

const DEMO_PERIODS: DemoPeriod[] = [
  { name: "Science run A", fromMs: day(0), toMs: day(REPAIR_DAY), runTypes: ["science"], signalAcceptance: 0.82, blind: false,
    notes: "First science data of Quillon at the full 950 kg fiducial target, up to the grid repair." },
  { name: "Science run B (post-repair)", fromMs: day(REPAIR_DAY), toMs: day(SCENARIO_DAYS + 1), runTypes: ["science"], signalAcceptance: 0.8, blind: true,
    notes: "After the grid repair: 948.5 kg until the full fiducial volume was restored. Kept blind." },
  { name: "Calibration campaign", fromMs: day(RESTORE_DAY), toMs: day(SCENARIO_DAYS + 1), runTypes: ["calibration"], signalAcceptance: 1,
    blind: false, notes: "Cs-137, AmBe and Kr-83m calibration runs after the fiducial volume was restored." },
];

async function seedSubsystems(db: Database): Promise<number> {
  let added = 0;
  for (const s of DEMO_SUBSYSTEMS) {
    const [existing] = await db.select().from(subsystems).where(eq(subsystems.code, s.code)).limit(1);
    if (existing) continue;
    await db.insert(subsystems).values({ ...s, active: true });
    added++;
  }
  return added;
}

function person(people: Map<string, number>, email: string): number {
  const id = people.get(email);
  if (id === undefined) throw new Error(`demo person ${email} is missing; seed the people first`);
  return id;
}

async function seedFlag(db: Database, people: Map<string, number>, start: number, f: DemoFlag): Promise<boolean> {
  const startAt = new Date(start + f.fromMs);
  const proposedBy = person(people, f.proposer);
  const [existing] = await db
    .select({ id: badTimeFlags.id })
    .from(badTimeFlags)
    .where(and(eq(badTimeFlags.startAt, startAt), eq(badTimeFlags.subsystem, f.subsystem), eq(badTimeFlags.proposedBy, proposedBy)))
    .limit(1);
  if (existing) return false;
  const endAt = new Date(start + f.toMs);
  const proposedAt = new Date(endAt.getTime() + 40 * MIN);
  const secondAt = new Date(proposedAt.getTime() + 3 * H);
  const second = f.second ? person(people, f.second) : null;
  await db.transaction(async (tx) => {
    const [res] = await tx.insert(badTimeFlags).values({
      startAt, endAt, subsystem: f.subsystem, verdict: f.verdict, reason: f.reason, state: f.state, proposedBy, proposedAt,
      confirmedBy: f.state === "confirmed" ? second : null,
      confirmedAt: f.state === "confirmed" ? secondAt : null,
      withdrawnBy: f.state === "withdrawn" ? second : null,
      withdrawnAt: f.state === "withdrawn" ? secondAt : null,
      withdrawReason: f.state === "withdrawn" ? (f.withdrawReason ?? null) : null,
    });
    const flagId = res.insertId;
    await tx.insert(flagEvents).values({ flagId, action: "proposed", actorId: proposedBy, comment: f.reason, at: proposedAt });
    await audit({ userId: proposedBy }, "flag.propose", { type: "flag", id: flagId }, { seeded: true }, tx);
    if (f.state !== "proposed" && second !== null) {
      const action = f.state === "confirmed" ? "confirmed" : "withdrawn";
      await tx.insert(flagEvents).values({ flagId, action, actorId: second, comment: f.withdrawReason ?? null, at: secondAt });
      await audit({ userId: second }, f.state === "confirmed" ? "flag.confirm" : "flag.withdraw", { type: "flag", id: flagId }, { seeded: true }, tx);
    }
  });
  return true;
}

async function seedPeriod(db: Database, people: Map<string, number>, start: number, p: DemoPeriod): Promise<boolean> {
  const [existing] = await db.select({ id: dqPeriods.id }).from(dqPeriods).where(eq(dqPeriods.name, p.name)).limit(1);
  if (existing) return false;
  const createdBy = person(people, PRIYA);
  await db.transaction(async (tx) => {
    const [res] = await tx.insert(dqPeriods).values({
      name: p.name, startAt: new Date(start + p.fromMs), endAt: new Date(start + p.toMs), runTypes: p.runTypes, detector: "Quillon",
      signalAcceptance: p.signalAcceptance, blind: p.blind, notes: p.notes, createdBy,
    });
    await audit({ userId: createdBy }, "period.create", { type: "period", id: res.insertId }, { seeded: true, name: p.name }, tx);
  });
  return true;
}

/** Seed the quality part of the demo scenario; adds only what is missing. */
export async function seedQuality(db: Database, people: Map<string, number>): Promise<string> {
  const addedSubsystems = await seedSubsystems(db);
  const start = await storedScenarioStart(db);
  const [{ n: runCount } = { n: 0 }] = await db.select({ n: count() }).from(runs);
  if (start === null || runCount === 0) return `quality: ${addedSubsystems} subsystems added (no runs yet, so no flags or periods)`;
  let flags = 0;
  for (const f of DEMO_FLAGS) if (await seedFlag(db, people, start, f)) flags++;
  let periods = 0;
  for (const p of DEMO_PERIODS) if (await seedPeriod(db, people, start, p)) periods++;
  return `quality: ${addedSubsystems} subsystems, ${flags} flags, ${periods} periods added`;
}
