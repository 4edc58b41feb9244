/**
 * The limits API against the running app: the stateless calculator (same numbers as lib/limits, 400 naming the
 * field, 401 signed out) and a period's limit (recording by conveners only, n refused and hidden while blind,
 * the rate over the period's exposure). Test periods, a configuration and a run of their own lie in 2035,
 * away from the demo data, and are removed afterwards.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, detectorConfigs, dqPeriods, runs } from "@/db/schema";
import { computeLimit, rateUpper } from "@/lib/limits";
import { makePerson } from "../support/people";
import { APP_URL, signIn, type Session } from "../support/http";

const DAY = 86_400_000;
// A random day in 2035 so reruns and parallel checkouts do not share spans.
const T0 = Date.UTC(2035, 0, 1) + Math.floor(Math.random() * 300) * DAY;
const tag = randomUUID().slice(0, 8);

let convener: Session;
let crew: Session;
let configId: number;
let runId: number;
let openPeriod: number;
let blindPeriod: number;
/** Already holds n = 3, b = 1.2 quoted as Bayesian 95 %, so the GET checks do not depend on the recording checks. */
let countedPeriod: number;
const SECRET_COUNT = 48_611;

const json = (method: string, body: unknown): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

async function insertPeriod(name: string, blind: boolean, extra: Partial<typeof dqPeriods.$inferInsert> = {}): Promise<number> {
  const [res] = await db.insert(dqPeriods).values({
    name, startAt: new Date(T0), endAt: new Date(T0 + 2 * DAY), runTypes: ["science"], signalAcceptance: 0.5, blind, ...extra,
  });
  return res.insertId;
}

beforeAll(async () => {
  const [cfg] = await db.insert(detectorConfigs).values({
    detector: "Quillon-Ge", name: `limits test bench ${tag}`, targetMaterial: "germanium", fiducialMassKg: "12.2500", effectiveFrom: new Date(T0 - DAY),
  });
  configId = cfg.insertId;
  // One day long, 43 200 s live: 0.5 d × 12.25 kg = 6.125 kg·day (hand arithmetic).
  const [run] = await db.insert(runs).values({
    number: 7_000_000 + Math.floor(Math.random() * 999_000), type: "science", status: "ended", startAt: new Date(T0 + 3_600_000),
    endAt: new Date(T0 + 3_600_000 + DAY), liveSeconds: "43200.000", deadSeconds: "0.000", triggerCount: 1, configId, conditions: {},
  });
  runId = run.insertId;
  openPeriod = await insertPeriod(`limits test open ${tag}`, false);
  countedPeriod = await insertPeriod(`limits test counted ${tag}`, false, {
    observedCount: 3, expectedBackground: 1.2, backgroundNote: "bench model", confidenceLevel: 0.95, limitMethod: "bayes",
  });
  blindPeriod = await insertPeriod(`limits test blind ${tag}`, true, { observedCount: SECRET_COUNT, expectedBackground: 1.1, backgroundNote: "test model" });
  const c = await makePerson(["analysis_convener"], "limits-convener");
  const s = await makePerson(["shift_crew"], "limits-crew");
  convener = await signIn(c.email, c.password);
  crew = await signIn(s.email, s.password);
});

afterAll(async () => {
  await db.delete(dqPeriods).where(inArray(dqPeriods.id, [openPeriod, countedPeriod, blindPeriod]));
  await db.delete(runs).where(eq(runs.id, runId));
  await db.delete(detectorConfigs).where(eq(detectorConfigs.id, configId));
  await closeDb();
});

describe("POST /api/limits", () => {
  it("fc n=3 b=1.2 cl=0.9 answers exactly what lib/limits computes", async () => {
    const res = await crew.fetch("/api/limits", json("POST", { n: 3, b: 1.2, cl: 0.9, method: "fc" }));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toEqual(computeLimit("fc", 3, 1.2, 0.9));
    // FC 1998 Table IV (90 %) lists 6.42 at b = 1.0 and 5.92 at b = 1.5 (from memory); 1.2 lies between.
    expect(body.upper).toBeGreaterThan(5.92);
    expect(body.upper).toBeLessThan(6.42);
  });

  it("a classical no-limit comes back as such, with its note", async () => {
    const res = await crew.fetch("/api/limits", json("POST", { n: 0, b: 3, cl: 0.9, method: "classical" }));
    const body = await res.json();
    // 2.3026 − 3 < 0 (analytic): no classical limit.
    expect(body).toMatchObject({ kind: "no-limit", upper: null });
    expect(body.note).toMatch(/not a limit/);
  });

  it.each([
    { label: "cl = 1", body: { n: 3, b: 1.2, cl: 1, method: "fc" }, field: "cl" },
    { label: "n = -1", body: { n: -1, b: 1.2, cl: 0.9, method: "fc" }, field: "n" },
    { label: "method unknown", body: { n: 3, b: 1.2, cl: 0.9, method: "frequentist" }, field: "method" },
    { label: "b as text", body: { n: 3, b: "1.2", cl: 0.9, method: "fc" }, field: "b" },
    // lib/limits caps Feldman–Cousins at n + b ≤ 200 000 (MAX_FC_TOTAL); its "background" field is the request's b.
    { label: "FC beyond its range", body: { n: 10, b: 250_000, cl: 0.9, method: "fc" }, field: "b" },
  ])("$label → 400 naming $field", async ({ body, field }) => {
    const res = await crew.fetch("/api/limits", json("POST", body));
    expect(res.status).toBe(400);
    const answer = await res.json();
    expect(answer.field).toBe(field);
    expect(answer.reason).toEqual(expect.any(String));
    expect(answer.error).toContain(field);
  });

  it("a body that is not JSON → 400 on body", async () => {
    const res = await crew.fetch("/api/limits", { method: "POST", headers: { "content-type": "application/json" }, body: "{n:" });
    expect(res.status).toBe(400);
    expect((await res.json()).field).toBe("body");
  });

  it("signed out → 401", async () => {
    const res = await fetch(`${APP_URL}/api/limits`, json("POST", { n: 3, b: 1.2, cl: 0.9, method: "fc" }));
    expect(res.status).toBe(401);
  });
});

describe("PATCH /api/periods/{id}/limit (recording)", () => {
  it("shift crew may not record → 403, nothing written", async () => {
    const res = await crew.fetch(`/api/periods/${openPeriod}/limit`, json("PATCH", { observed: 1 }));
    expect(res.status).toBe(403);
    const [row] = await db.select({ n: dqPeriods.observedCount }).from(dqPeriods).where(eq(dqPeriods.id, openPeriod));
    expect(row?.n).toBeNull();
  });

  it("signed out → 401", async () => {
    const res = await fetch(`${APP_URL}/api/periods/${openPeriod}/limit`, json("PATCH", { observed: 1 }));
    expect(res.status).toBe(401);
  });

  it("n on a blind period is refused with 409 on observed; the stored value stays", async () => {
    const res = await convener.fetch(`/api/periods/${blindPeriod}/limit`, json("PATCH", { observed: 3, background: 0.9, backgroundNote: "x" }));
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body).toMatchObject({ field: "observed", code: "blind" });
    expect(body.error).toMatch(/blind/);
    const [row] = await db.select({ n: dqPeriods.observedCount, b: dqPeriods.expectedBackground }).from(dqPeriods).where(eq(dqPeriods.id, blindPeriod));
    expect(row).toEqual({ n: SECRET_COUNT, b: 1.1 });
  });

  it("the background of a blind period may be recorded, and the answer has no count", async () => {
    const res = await convener.fetch(`/api/periods/${blindPeriod}/limit`, json("PATCH", { background: 0.95, backgroundNote: "test model v2" }));
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.counting).toMatchObject({ expectedBackground: 0.95, blind: true });
    expect(body.counting).not.toHaveProperty("observedCount");
  });

  it("a background without a note is refused on backgroundNote", async () => {
    const res = await convener.fetch(`/api/periods/${openPeriod}/limit`, json("PATCH", { background: 1.0 }));
    expect(res.status).toBe(400);
    expect((await res.json()).field).toBe("backgroundNote");
  });

  it.each([
    { label: "observed 2.5", body: { observed: 2.5 }, field: "observed" },
    { label: "cl 0", body: { cl: 0 }, field: "cl" },
    { label: "method unknown", body: { method: "cls" }, field: "method" },
    { label: "nothing to record", body: {}, field: "body" },
  ])("$label → 400 on $field", async ({ body, field }) => {
    const res = await convener.fetch(`/api/periods/${openPeriod}/limit`, json("PATCH", body));
    expect(res.status).toBe(400);
    expect((await res.json()).field).toBe(field);
  });

  it("the convener records n, b, note, CL and method; audited with before and after", async () => {
    const res = await convener.fetch(`/api/periods/${openPeriod}/limit`, json("PATCH", { observed: 3, background: 1.2, backgroundNote: "bench model", cl: 0.95, method: "bayes" }));
    expect(res.status).toBe(200);
    expect((await res.json()).counting).toMatchObject({ observedCount: 3, expectedBackground: 1.2, backgroundNote: "bench model", confidenceLevel: 0.95, limitMethod: "bayes" });
    const rows = await db.select().from(auditEvents).where(and(eq(auditEvents.action, "limits.record"), eq(auditEvents.recordId, String(openPeriod))));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.details).toMatchObject({ observed: { from: null, to: 3 }, background: { from: null, to: 1.2 }, method: { from: "fc", to: "bayes" } });
  });
});

describe("GET /api/periods/{id}/limit", () => {
  it("answers the period's n, b, acceptance, exposure, μ interval and rates with the asked method and CL", async () => {
    const res = await crew.fetch(`/api/periods/${countedPeriod}/limit?method=fc&cl=0.9`);
    expect(res.status).toBe(200);
    const body = await res.json();
    const expected = computeLimit("fc", 3, 1.2, 0.9);
    // 0.5 d live × 12.25 kg = 6.125 kg·day (hand arithmetic, see beforeAll).
    expect(body).toMatchObject({ method: "fc", cl: 0.9, blind: false, state: "computed", observed: 3, background: 1.2, acceptance: 0.5 });
    expect(body.exposureKgDay).toBeCloseTo(6.125, 9);
    expect(body.limit).toEqual({ kind: expected.kind, lower: expected.lower, upper: expected.upper });
    const rate = rateUpper(expected.upper!, 0.5, 6.125);
    expect(body.rate.upperPerKgDay).toBeCloseTo(rate.perKgDay, 12);
    expect(body.rate.upperPerTonneYear).toBeCloseTo(rate.perTonneYear, 8);
  });

  it("without a query it uses the period's quoted method and CL", async () => {
    const body = await (await crew.fetch(`/api/periods/${countedPeriod}/limit`)).json();
    expect(body).toMatchObject({ method: "bayes", cl: 0.95 });
    expect(body.limit.upper).toBe(computeLimit("bayes", 3, 1.2, 0.95).upper);
  });

  it("a blind period answers 200 with blind: true and no count, limit or rate", async () => {
    const res = await convener.fetch(`/api/periods/${blindPeriod}/limit?method=fc&cl=0.9`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({ blind: true, state: "blind", message: "Blind — count hidden until unblinding" });
    // The background is not hidden (1.1 as inserted, or 0.95 once the recording check above ran).
    expect(body.background).toEqual(expect.any(Number));
    for (const key of ["observed", "limit", "rate"]) expect(body).not.toHaveProperty(key);
    expect(JSON.stringify(body)).not.toContain(String(SECRET_COUNT));
  });

  it.each([
    { label: "method unknown", query: "method=neyman", field: "method" },
    { label: "cl 1.5", query: "cl=1.5", field: "cl" },
    { label: "cl text", query: "cl=ninety", field: "cl" },
  ])("$label → 400 on $field", async ({ query, field }) => {
    const res = await crew.fetch(`/api/periods/${countedPeriod}/limit?${query}`);
    expect(res.status).toBe(400);
    expect((await res.json()).field).toBe(field);
  });

  it("unknown period → 404; signed out → 401", async () => {
    expect((await crew.fetch(`/api/periods/999999999/limit`)).status).toBe(404);
    expect((await fetch(`${APP_URL}/api/periods/${countedPeriod}/limit`)).status).toBe(401);
  });
});
