import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomInt, randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, badTimeFlags, detectorConfigs, dqPeriods, runs, subsystems } from "@/db/schema";
import { makePerson, type TestPerson } from "../support/people";
import { APP_URL, signIn, type Session } from "../support/http";

// The worked example of the issue: a 10 h run with 9 h live on 950 kg and a 1 h excluding flag.
// By hand: before the flag 32 400 s / 86 400 × 950 = 356.25 kg·day; the flag removes 1/10 of the live time,
// 3 240 s, i.e. 950 × 0.9 h / 24 = 35.625 kg·day, leaving 320.625 kg·day.
const H = 3_600_000;
const BEFORE = 356.25;
const DROP = 35.625;

// A day of its own far from the demo data (some day in 2032–2039), so no other run falls in the period.
const DAY0 = Date.UTC(2032, 0, 1) + randomInt(0, 2900) * 86_400_000;
const RUN_START = DAY0 + 2 * H;
const RUN_NUMBER = 60_000_000 + randomInt(0, 9_000_000);
const tag = randomUUID().slice(0, 8);

let expertA: TestPerson, expertB: TestPerson, convener: TestPerson;
let a: Session, b: Session, c: Session;
let periodId = 0;
let flagId = 0;
let configId = 0;
const subsystem = `itest-${tag}`;

async function json(res: Response) {
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

async function exposure(s: Session) {
  const { status, body } = await json(await s.fetch(`/api/periods/${periodId}/exposure?format=json`));
  expect(status).toBe(200);
  return body as { totals: { runs: number; exposureKgDay: number; goodLiveSeconds: number; liveSeconds: number }; preview: { changeKgDay: number; proposedExcludingFlags: number } };
}

const post = (s: Session, path: string, body: unknown) =>
  s.fetch(path, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

beforeAll(async () => {
  [expertA, expertB, convener] = await Promise.all([
    makePerson(["detector_expert"], "expert"),
    makePerson(["detector_expert"], "expert"),
    makePerson(["analysis_convener"], "convener"),
  ]);
  [a, b, c] = await Promise.all([signIn(expertA.email, expertA.password), signIn(expertB.email, expertB.password), signIn(convener.email, convener.password)]);
  const [cfg] = await db.insert(detectorConfigs).values({
    detector: `Quillon-itest-${tag}`, name: `flags test ${tag}`, targetMaterial: "xenon", fiducialMassKg: "950", effectiveFrom: new Date(DAY0),
  });
  configId = cfg.insertId;
  await db.insert(runs).values({
    number: RUN_NUMBER, type: "science", status: "ended", startAt: new Date(RUN_START), endAt: new Date(RUN_START + 10 * H),
    liveSeconds: "32400.000", deadSeconds: "3600.000", configId, conditions: {},
  });
  const sub = await post(a, "/api/flags/subsystems", { code: subsystem, label: `Test subsystem ${tag}` });
  expect(sub.status).toBe(201);
  const p = await json(await post(c, "/api/periods", {
    name: `flags test ${tag}`, startAt: new Date(DAY0).toISOString(), endAt: new Date(DAY0 + 24 * H).toISOString(),
    runTypes: ["science"], signalAcceptance: 0.8,
  }));
  expect(p.status).toBe(201);
  periodId = (p.body.period as { id: number }).id;
});

afterAll(async () => {
  await db.delete(badTimeFlags).where(eq(badTimeFlags.subsystem, subsystem));
  await db.delete(subsystems).where(eq(subsystems.code, subsystem));
  await db.delete(runs).where(eq(runs.number, RUN_NUMBER));
  await db.delete(detectorConfigs).where(eq(detectorConfigs.id, configId));
  if (periodId) await db.delete(dqPeriods).where(eq(dqPeriods.id, periodId));
  await closeDb();
});

describe(`bad-time flags through the API (${APP_URL})`, () => {
  it("the period starts with the whole run: 356.25 kg·day", async () => {
    const e = await exposure(c);
    expect(e.totals.runs).toBe(1);
    expect(e.totals.exposureKgDay).toBeCloseTo(BEFORE, 9);
  });

  it("refuses a flag that ends before it starts, naming the field", async () => {
    const r = await json(await post(a, "/api/flags", {
      startAt: new Date(RUN_START + 5 * H).toISOString(), endAt: new Date(RUN_START + 4 * H).toISOString(), subsystem, verdict: "exclude", reason: "backwards",
    }));
    expect(r.status).toBe(400);
    expect(r.body.field).toBe("endAt");
  });

  it("only detector experts propose, and only when signed in", async () => {
    const body = { startAt: new Date(RUN_START).toISOString(), endAt: new Date(RUN_START + H).toISOString(), subsystem, verdict: "exclude", reason: "convener tries" };
    expect((await post(c, "/api/flags", body)).status).toBe(403);
    const anonymous = await fetch(`${APP_URL}/api/flags`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
    expect(anonymous.status).toBe(401);
  });

  it("an expert proposes a 1 h flag; the preview shows the drop before anyone confirms", async () => {
    const r = await json(await post(a, "/api/flags", {
      startAt: new Date(RUN_START + 4 * H).toISOString(), endAt: new Date(RUN_START + 5 * H).toISOString(), subsystem, verdict: "exclude", reason: "DAQ busy for an hour (test)",
    }));
    expect(r.status).toBe(201);
    const flag = r.body.flag as { id: number; state: string; proposedBy: { id: number } };
    expect(flag.state).toBe("proposed");
    expect(flag.proposedBy.id).toBe(expertA.id);
    flagId = flag.id;
    const e = await exposure(c);
    expect(e.totals.exposureKgDay).toBeCloseTo(BEFORE, 9); // proposed flags do not count yet
    expect(e.preview.proposedExcludingFlags).toBe(1);
    expect(e.preview.changeKgDay).toBeCloseTo(-DROP, 9);
  });

  it("the proposer cannot confirm their own flag (two-person rule)", async () => {
    const r = await json(await post(a, `/api/flags/${flagId}/confirm`, {}));
    expect(r.status).toBe(403);
    expect(r.body.code).toBe("own_flag");
    expect(String(r.body.error)).toMatch(/another detector expert must confirm/);
    expect((await db.select().from(badTimeFlags).where(eq(badTimeFlags.id, flagId)))[0]?.state).toBe("proposed");
  });

  it("a second expert confirms; the convener's exposure drops by exactly 35.625 kg·day", async () => {
    const r = await json(await post(b, `/api/flags/${flagId}/confirm`, { comment: "seen on the DAQ monitor too" }));
    expect(r.status).toBe(200);
    expect((r.body.flag as { state: string; confirmedBy: { id: number } }).confirmedBy.id).toBe(expertB.id);
    const e = await exposure(c);
    expect(e.totals.exposureKgDay).toBeCloseTo(BEFORE - DROP, 9);
    expect(BEFORE - e.totals.exposureKgDay).toBeCloseTo(DROP, 9);
    expect(e.totals.goodLiveSeconds).toBeCloseTo(29_160, 9); // 32 400 × 9/10
    expect(e.preview.proposedExcludingFlags).toBe(0);
    // confirming twice is a conflict, not a second confirmation
    expect((await post(b, `/api/flags/${flagId}/confirm`, {})).status).toBe(409);
  });

  it("the CSV export's totals line matches the JSON totals", async () => {
    const e = await exposure(c);
    const res = await c.fetch(`/api/periods/${periodId}/exposure?format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="exposure-flags-test-[a-z0-9-]+\.csv"$/);
    const lines = (await res.text()).trim().split("\r\n");
    const header = lines[0]!.split(",");
    const total = lines.find((l) => l.startsWith("total,"))!.split(",");
    const col = (name: string) => Number(total[header.indexOf(name)]);
    expect(col("exposure_kg_day")).toBe(e.totals.exposureKgDay);
    expect(col("good_live_s")).toBe(e.totals.goodLiveSeconds);
    expect(col("live_in_period_s")).toBe(e.totals.liveSeconds);
    expect(col("runs_counted")).toBe(e.totals.runs);
    expect(lines.filter((l) => l.startsWith("run,"))).toHaveLength(1);
  });

  it("the good-run list gives the two good pieces of the run as ISO UTC intervals", async () => {
    const r = await json(await c.fetch(`/api/periods/${periodId}/good-runs?format=json`));
    expect(r.status).toBe(200);
    const [run] = r.body.goodRuns as { runNumber: number; goodIntervals: { start: string; end: string }[]; goodLiveSeconds: number }[];
    expect(run?.runNumber).toBe(RUN_NUMBER);
    expect(run?.goodIntervals).toEqual([
      { start: new Date(RUN_START).toISOString(), end: new Date(RUN_START + 4 * H).toISOString() },
      { start: new Date(RUN_START + 5 * H).toISOString(), end: new Date(RUN_START + 10 * H).toISOString() },
    ]);
    expect(run?.goodLiveSeconds).toBeCloseTo(29_160, 9);
  });

  it("withdrawing needs a reason, restores the exposure and keeps the history", async () => {
    expect((await post(b, `/api/flags/${flagId}/withdraw`, {})).status).toBe(400);
    const r = await json(await post(b, `/api/flags/${flagId}/withdraw`, { reason: "the busy spell was in the other crate" }));
    expect(r.status).toBe(200);
    expect((r.body.flag as { state: string }).state).toBe("withdrawn");
    expect((await exposure(c)).totals.exposureKgDay).toBeCloseTo(BEFORE, 9);
    expect((await post(a, `/api/flags/${flagId}/withdraw`, { reason: "again" })).status).toBe(409);

    const detail = await json(await c.fetch(`/api/flags/${flagId}`));
    const history = detail.body.history as { action: string; actor: { id: number } }[];
    expect(history.map((h) => [h.action, h.actor.id])).toEqual([["proposed", expertA.id], ["confirmed", expertB.id], ["withdrawn", expertB.id]]);
    const trail = await db
      .select({ action: auditEvents.action, actor: auditEvents.actorUserId })
      .from(auditEvents)
      .where(and(eq(auditEvents.recordType, "flag"), eq(auditEvents.recordId, String(flagId)), inArray(auditEvents.action, ["flag.propose", "flag.confirm", "flag.withdraw"])));
    expect(trail.map((t) => t.action).sort()).toEqual(["flag.confirm", "flag.propose", "flag.withdraw"]);
  });

  it("lists the flags on a run's span for the timeline", async () => {
    const r = await json(await c.fetch(`/api/flags?run=${RUN_NUMBER}&state=proposed,confirmed,withdrawn`));
    expect(r.status).toBe(200);
    expect((r.body.flags as { id: number }[]).map((f) => f.id)).toContain(flagId);
    expect((r.body.run as { number: number }).number).toBe(RUN_NUMBER);
  });

  it("a deactivated subsystem is not offered and refuses new flags", async () => {
    const off = await a.fetch(`/api/flags/subsystems/${subsystem}`, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify({ active: false }) });
    expect(off.status).toBe(200);
    const list = await json(await a.fetch("/api/flags/subsystems"));
    expect((list.body.subsystems as { code: string }[]).map((s) => s.code)).not.toContain(subsystem);
    const r = await json(await post(a, "/api/flags", {
      startAt: new Date(RUN_START).toISOString(), endAt: new Date(RUN_START + H).toISOString(), subsystem, verdict: "caution", reason: "after deactivation",
    }));
    expect(r.status).toBe(400);
    expect(r.body.field).toBe("subsystem");
  });
});
