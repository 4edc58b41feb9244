import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomInt, randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, detectorConfigs, dqPeriods, runs } from "@/db/schema";
import { makePerson } from "../support/people";
import { signIn, type Session } from "../support/http";

// Runs of our own on a day of our own (2032–2039), far from the demo scenario. Expectations by hand with the
// brief's formulas: live in period = live × window / duration; exposure = good live / 86 400 × mass.
const H = 3_600_000;
const DAY0 = Date.UTC(2032, 0, 1) + randomInt(0, 2900) * 86_400_000;
const BASE = 70_000_000 + randomInt(0, 9_000_000);
const tag = randomUUID().slice(0, 8);
const iso = (h: number) => new Date(DAY0 + h * H).toISOString();

let convener: Session;
let expert: Session;
let configId = 0;
const periodIds: number[] = [];
const numbers = [BASE, BASE + 1, BASE + 2, BASE + 3, BASE + 4];

const send = (s: Session, method: string, path: string, body: unknown) =>
  s.fetch(path, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
async function json(res: Response) {
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}
const definition = (name: string) => ({ name, startAt: iso(0), endAt: iso(24), runTypes: ["science"], signalAcceptance: 0.82, notes: "integration test" });

beforeAll(async () => {
  const [c, e] = await Promise.all([makePerson(["analysis_convener"], "convener"), makePerson(["detector_expert"], "expert")]);
  [convener, expert] = await Promise.all([signIn(c.email, c.password), signIn(e.email, e.password)]);
  const [cfg] = await db.insert(detectorConfigs).values({
    detector: `Quillon-itest-${tag}`, name: `periods test ${tag}`, targetMaterial: "xenon", fiducialMassKg: "950", effectiveFrom: new Date(DAY0),
  });
  configId = cfg.insertId;
  const run = (number: number, type: "science" | "calibration", fromH: number, toH: number | null, live: string | null, override?: string) => ({
    number, type, status: toH === null ? ("running" as const) : ("ended" as const), startAt: new Date(DAY0 + fromH * H),
    endAt: toH === null ? null : new Date(DAY0 + toH * H), liveSeconds: live, configId, conditions: {}, targetMassOverrideKg: override ?? null,
  });
  await db.insert(runs).values([
    run(BASE, "science", 1, 3, "7000.000"), // 2 h, 7 000 s live, 950 kg
    run(BASE + 1, "science", 22, 26, "14000.000", "948.5"), // half in the period, mass overridden to 948.5 kg
    run(BASE + 2, "calibration", 4, 5, "3400.000"), // not a counted type
    run(BASE + 3, "science", 6, 7, null), // closed without a live time: listed apart
    run(BASE + 4, "science", 23, null, null), // still running: listed apart
  ]);
});

afterAll(async () => {
  await db.delete(runs).where(inArray(runs.number, numbers));
  await db.delete(detectorConfigs).where(eq(detectorConfigs.id, configId));
  if (periodIds.length) await db.delete(dqPeriods).where(inArray(dqPeriods.id, periodIds));
  await closeDb();
});

describe("data-quality periods through the API", () => {
  it("a convener creates a period; it is audited", async () => {
    const r = await json(await send(convener, "POST", "/api/periods", definition(`periods test ${tag}`)));
    expect(r.status).toBe(201);
    const p = r.body.period as { id: number; blind: boolean; runTypes: string[]; signalAcceptance: number };
    periodIds.push(p.id);
    expect(p).toMatchObject({ blind: false, runTypes: ["science"], signalAcceptance: 0.82 });
    const trail = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "period"), eq(auditEvents.recordId, String(p.id))));
    expect(trail.map((t) => t.action)).toEqual(["period.create"]);
  });

  it.each([
    { label: "a duplicate name (409)", body: () => definition(`periods test ${tag}`), status: 409, field: "name" },
    { label: "acceptance above 1 (400)", body: () => ({ ...definition(`x ${tag}`), signalAcceptance: 1.5 }), status: 400, field: "signalAcceptance" },
    { label: "no run types (400)", body: () => ({ ...definition(`y ${tag}`), runTypes: [] }), status: 400, field: "runTypes" },
    { label: "a time without zone (400)", body: () => ({ ...definition(`z ${tag}`), startAt: "2032-01-01T00:00:00" }), status: 400, field: "startAt" },
  ])("refuses $label, naming the field", async ({ body, status, field }) => {
    const r = await json(await send(convener, "POST", "/api/periods", body()));
    expect(r.status).toBe(status);
    expect(r.body.field).toBe(field);
  });

  it("a detector expert may read periods but not define them", async () => {
    expect((await send(expert, "POST", "/api/periods", definition(`expert ${tag}`))).status).toBe(403);
    expect((await expert.fetch("/api/periods")).status).toBe(200);
  });

  it("exposure counts the ended science runs, clips the one crossing the end, lists open ones apart", async () => {
    const r = await json(await convener.fetch(`/api/periods/${periodIds[0]}/exposure`));
    expect(r.status).toBe(200);
    const body = r.body as { totals: Record<string, number>; runs: { runNumber: number; liveSecondsInPeriod: number; exposureKgDay: number; targetMassKg: number }[]; openRuns: { runNumber: number; state: string }[]; formula: string };
    expect(body.formula).toBe("Σ good live s / 86 400 × target mass");
    expect(body.runs.map((x) => x.runNumber)).toEqual([BASE, BASE + 1]);
    // by hand: run BASE 7 000 / 86 400 × 950 = 76.967592… kg·day
    expect(body.runs[0]!.exposureKgDay).toBeCloseTo((7_000 / 86_400) * 950, 9);
    // by hand: run BASE+1 has 2 of its 4 h inside: 14 000 × 2/4 = 7 000 s on 948.5 kg (the run's override)
    expect(body.runs[1]!.liveSecondsInPeriod).toBeCloseTo(7_000, 9);
    expect(body.runs[1]!.targetMassKg).toBe(948.5);
    expect(body.totals.exposureKgDay).toBeCloseTo((7_000 / 86_400) * (950 + 948.5), 9);
    expect(body.totals.exposureTonneYear).toBeCloseTo(body.totals.exposureKgDay! / 365_250, 12); // Julian year
    expect(body.openRuns).toEqual([
      expect.objectContaining({ runNumber: BASE + 3, state: "no live time" }),
      expect.objectContaining({ runNumber: BASE + 4, state: "running" }),
    ]);
  });

  it("the period list carries the same totals", async () => {
    const r = await json(await convener.fetch("/api/periods"));
    const mine = (r.body.periods as { id: number; totals: { exposureKgDay: number; runs: number; openRuns: number } }[]).find((p) => p.id === periodIds[0]);
    expect(mine?.totals.runs).toBe(2);
    expect(mine?.totals.openRuns).toBe(2);
    expect(mine?.totals.exposureKgDay).toBeCloseTo((7_000 / 86_400) * (950 + 948.5), 9);
  });

  it("editing the run types and span changes the exposure; the change is audited", async () => {
    const id = periodIds[0]!;
    const r = await json(await send(convener, "PATCH", `/api/periods/${id}`, { runTypes: ["science", "calibration"], endAt: iso(20) }));
    expect(r.status).toBe(200);
    const e = await json(await convener.fetch(`/api/periods/${id}/exposure`));
    // by hand: run BASE (76.967… kg·day) + the calibration run 3 400 / 86 400 × 950 = 37.384… kg·day; run BASE+1 now outside
    expect((e.body.totals as { exposureKgDay: number }).exposureKgDay).toBeCloseTo((10_400 / 86_400) * 950, 9);
    const trail = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "period"), eq(auditEvents.recordId, String(id)), eq(auditEvents.action, "period.update")));
    expect(trail).toHaveLength(1);
    expect(Object.keys(trail[0]!.details ?? {}).sort()).toEqual(["endAt", "runTypes"]);
  });

  it.each([
    { label: "a span turned inside out (400)", patch: { startAt: iso(30) }, status: 400, field: "startAt" },
    { label: "a blank name (400)", patch: { name: "" }, status: 400, field: "name" },
  ])("PATCH refuses $label", async ({ patch, status, field }) => {
    const r = await json(await send(convener, "PATCH", `/api/periods/${periodIds[0]}`, patch));
    expect(r.status).toBe(status);
    expect(r.body.field).toBe(field);
  });

  it("a blind period is not unblinded by editing it", async () => {
    const r = await json(await send(convener, "POST", "/api/periods", { ...definition(`blind ${tag}`), blind: true }));
    expect(r.status).toBe(201);
    const id = (r.body.period as { id: number }).id;
    periodIds.push(id);
    const u = await json(await send(convener, "PATCH", `/api/periods/${id}`, { blind: false }));
    expect(u.status).toBe(409);
    expect(u.body.code).toBe("unblind_elsewhere");
  });

  it("good-run list CSV: header, one line per run with good time, attachment name", async () => {
    const res = await convener.fetch(`/api/periods/${periodIds[0]}/good-runs?format=csv`);
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="good-runs-periods-test-${tag}-${periodIds[0]}.csv"`);
    const lines = (await res.text()).trim().split("\r\n");
    expect(lines[0]).toBe("run_number,good_intervals_utc,good_live_s");
    expect(lines.slice(1)).toEqual([`${BASE},${iso(1)}/${iso(3)},7000`, `${BASE + 2},${iso(4)}/${iso(5)},3400`]);
  });

  it("an unknown format or period is refused", async () => {
    expect((await convener.fetch(`/api/periods/${periodIds[0]}/exposure?format=xml`)).status).toBe(400);
    expect((await convener.fetch(`/api/periods/999999999/exposure`)).status).toBe(404);
  });
});
