/**
 * The DAQ's runs API against the running app: open and close with a machine token, retries, conflicts,
 * each kind of bad input, a revoked token, who else may write, and the audit rows. Test runs use their own
 * numbers (9 000 000 + random) and lie in 2001 on a Quillon-Ge test configuration, away from the demo runs.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, detectorConfigs } from "@/db/schema";
import { createToken, revokeToken } from "@/db/tokens";
import { newToken } from "@/lib/auth/secrets";
import { makePerson } from "../support/people";
import { signIn, withToken } from "../support/http";

const TEST_CONFIG = "Quillon-Ge test bench (runs integration tests)";
const TEST_EPOCH = Date.UTC(2001, 0, 1);
const HOUR = 3_600_000;

let daq: ReturnType<typeof withToken>;
let tokenId: number;
let nextNumber = 9_000_000 + Math.floor(Math.random() * 900_000) * 10;
const runNumber = () => nextNumber++;
/** Runs this file opened (number → start); afterAll closes any still open so no test run stays open. */
const openedHere = new Map<number, number>();
/** A start well after the test configuration, on a whole second, different for each call. */
const startAt = () => TEST_EPOCH + 30 * 86_400_000 + Math.floor(Math.random() * 300 * 24) * HOUR;

async function ensureTestConfig(): Promise<void> {
  const [have] = await db.select({ id: detectorConfigs.id }).from(detectorConfigs).where(eq(detectorConfigs.name, TEST_CONFIG)).limit(1);
  if (have) return;
  await db.insert(detectorConfigs).values({
    detector: "Quillon-Ge",
    name: TEST_CONFIG,
    targetMaterial: "germanium",
    fiducialMassKg: "12.2500",
    effectiveFrom: new Date(TEST_EPOCH),
  });
}

const json = (method: string, body: unknown): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

function openBody(number: number, start: number, extra: Record<string, unknown> = {}) {
  return { number, type: "science", start: new Date(start).toISOString(), detector: "Quillon-Ge", conditions: { "bias voltage [V]": 3500 }, ...extra };
}

async function openRun(number: number, start: number) {
  const res = await daq("/api/runs", json("POST", openBody(number, start)));
  expect(res.status).toBe(201);
  openedHere.set(number, start);
  return (await res.json()) as { run: Record<string, unknown> };
}

beforeAll(async () => {
  await ensureTestConfig();
  const { token, hash } = newToken("dsk_");
  tokenId = await createToken({}, `runs-test-${Date.now()}`, ["daq"], hash);
  daq = withToken(token);
});

afterAll(async () => {
  // A retry-safe close of everything opened here: 409 for runs already closed with other values is fine.
  for (const [number, start] of openedHere) {
    await daq(`/api/runs/${number}`, json("PATCH", { end: start + HOUR, liveSeconds: 3000, deadSeconds: 100, triggerCount: 1, status: "aborted" }));
  }
  await revokeToken({}, tokenId);
  await closeDb();
});

describe("DAQ opens and closes a run", () => {
  it("opens (201), a retry gets 200 with the same body, closes, and a retried close is harmless", async () => {
    const number = runNumber();
    const start = startAt();
    const first = await daq("/api/runs", json("POST", openBody(number, start)));
    expect(first.status).toBe(201);
    const opened = (await first.json()) as { run: Record<string, unknown> };
    expect(opened.run).toMatchObject({
      number,
      type: "science",
      status: "running",
      detector: "Quillon-Ge",
      startMs: start,
      end: null,
      liveFraction: null,
      targetMassKg: "12.25", // the test configuration's 12.2500 kg, canonical
      targetMassSource: "configuration",
      conditions: { "bias voltage [V]": 3500 },
      openedBy: { kind: "token", id: tokenId },
    });

    const again = await daq("/api/runs", json("POST", openBody(number, start)));
    expect(again.status).toBe(200);
    expect(again.headers.get("x-deepshift-replay")).toBe("yes");
    expect(await again.json()).toEqual(opened);

    const closeBody = { end: new Date(start + HOUR).toISOString(), liveSeconds: 3474.5, deadSeconds: 120.25, triggerCount: 26_011 };
    const closed = await daq(`/api/runs/${number}`, json("PATCH", closeBody));
    expect(closed.status).toBe(200);
    expect(closed.headers.get("x-deepshift-replay")).toBe("no");
    const closedBody = (await closed.json()) as { run: Record<string, unknown> };
    expect(closedBody.run).toMatchObject({ status: "ended", durationSeconds: 3600, liveSeconds: 3474.5, deadSeconds: 120.25, triggerCount: 26_011 });
    expect(closedBody.run.liveFraction).toBeCloseTo(3474.5 / 3600, 12); // live ÷ duration (hand arithmetic)

    const closedAgain = await daq(`/api/runs/${number}`, json("PATCH", closeBody));
    expect(closedAgain.status).toBe(200);
    expect(closedAgain.headers.get("x-deepshift-replay")).toBe("yes");
    expect(await closedAgain.json()).toEqual(closedBody);

    // Opening again after the close is still recognised as the same run.
    expect((await daq("/api/runs", json("POST", openBody(number, start)))).status).toBe(200);
  });

  it("writes one audit row per change, naming the token, and none for retries", async () => {
    const number = runNumber();
    const start = startAt();
    await openRun(number, start);
    await daq("/api/runs", json("POST", openBody(number, start)));
    const closeBody = { end: start + HOUR, liveSeconds: 3500, deadSeconds: 90, triggerCount: 7, status: "aborted" };
    expect((await daq(`/api/runs/${number}`, json("PATCH", closeBody))).status).toBe(200);
    expect((await daq(`/api/runs/${number}`, json("PATCH", closeBody))).status).toBe(200);
    const rows = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "run"), eq(auditEvents.recordId, String(number))));
    expect(rows.map((r) => r.action).sort()).toEqual(["run.close", "run.open"]);
    expect(rows.every((r) => r.actorTokenId === tokenId && r.actorUserId === null)).toBe(true);
    expect(rows.find((r) => r.action === "run.close")?.details).toMatchObject({ status: "aborted", liveSeconds: 3500, end: new Date(start + HOUR).toISOString() });
  });
});

describe("conflicts get 409 naming what differs", () => {
  it.each([
    { label: "same number, another start", change: (s: number) => ({ start: new Date(s + 1000).toISOString() }), fields: ["start"] },
    { label: "same number, another type", change: () => ({ type: "calibration" }), fields: ["type"] },
    { label: "same number, other conditions", change: () => ({ conditions: { "bias voltage [V]": 3400 } }), fields: ["conditions"] },
    { label: "same number, a mass override", change: () => ({ targetMassOverrideKg: "12.1" }), fields: ["targetMassOverrideKg"] },
  ])("open: $label", async ({ change, fields }) => {
    const number = runNumber();
    const start = startAt();
    await openRun(number, start);
    const res = await daq("/api/runs", json("POST", openBody(number, start, change(start))));
    expect(res.status).toBe(409);
    expect(((await res.json()) as { fields: string[] }).fields).toEqual(fields);
  });

  it("closing an already closed run with other values", async () => {
    const number = runNumber();
    const start = startAt();
    await openRun(number, start);
    const closeBody = { end: start + HOUR, liveSeconds: 3500, deadSeconds: 90, triggerCount: 7 };
    expect((await daq(`/api/runs/${number}`, json("PATCH", closeBody))).status).toBe(200);
    const res = await daq(`/api/runs/${number}`, json("PATCH", { ...closeBody, liveSeconds: 3499 }));
    expect(res.status).toBe(409);
    expect(await res.json()).toMatchObject({ field: "liveSeconds", fields: ["liveSeconds"] });
  });
});

describe("bad input gets 400 with the field", () => {
  it.each([
    { label: "unknown type", body: (n: number, s: number) => openBody(n, s, { type: "physics" }), field: "type" },
    { label: "start without a time zone", body: (n: number, s: number) => openBody(n, s, { start: new Date(s).toISOString().slice(0, 19) }), field: "start" },
    { label: "no configuration in force at the start", body: (n: number) => openBody(n, Date.UTC(1971, 0, 1)), field: "start" }, // before any Quillon-Ge configuration
    { label: "unknown detector", body: (n: number, s: number) => openBody(n, s, { detector: "Quillon-3" }), field: "detector" },
    { label: "misspelt field", body: (n: number, s: number) => ({ ...openBody(n, s), trigger: 1 }), field: "trigger" },
  ])("open: $label", async ({ body, field }) => {
    const res = await daq("/api/runs", json("POST", body(runNumber(), startAt())));
    expect(res.status).toBe(400);
    const answer = (await res.json()) as { field: string; error: string };
    expect(answer.field).toBe(field);
    expect(answer.error.length).toBeGreaterThan(field.length + 5);
  });

  // One-hour run: tolerance on live + dead = max(1 s, 0.1 % × 3600 s) = 3.6 s (the API's stated rule).
  it.each([
    { label: "end equal to the start", close: { endOffset: 0, live: 0, dead: 0 }, status: 400, field: "end" },
    { label: "end before the start", close: { endOffset: -HOUR, live: 0, dead: 0 }, status: 400, field: "end" },
    { label: "negative live time", close: { endOffset: HOUR, live: -1, dead: 0 }, status: 400, field: "liveSeconds" },
    { label: "live time above the duration", close: { endOffset: HOUR, live: 3600.5, dead: 0 }, status: 400, field: "liveSeconds" },
    { label: "negative dead time", close: { endOffset: HOUR, live: 3500, dead: -0.5 }, status: 400, field: "deadSeconds" },
    { label: "live + dead 3.7 s over the duration", close: { endOffset: HOUR, live: 3500, dead: 103.7 }, status: 400, field: "deadSeconds" },
    { label: "live + dead 3.6 s over (at the tolerance)", close: { endOffset: HOUR, live: 3500, dead: 103.6 }, status: 200, field: null },
  ])("close: $label", async ({ close, status, field }) => {
    const number = runNumber();
    const start = startAt();
    await openRun(number, start);
    const res = await daq(
      `/api/runs/${number}`,
      json("PATCH", { end: new Date(start + close.endOffset).toISOString(), liveSeconds: close.live, deadSeconds: close.dead, triggerCount: 10 }),
    );
    expect(res.status).toBe(status);
    const answer = (await res.json()) as { field?: string; error?: string };
    if (field) {
      expect(answer.field).toBe(field);
      if (field === "deadSeconds" && close.dead > 0) expect(answer.error).toContain("1 s or 0.1 % of the run duration");
    }
  });

  it.each([
    { label: "a body that is not JSON", path: "/api/runs", init: { method: "POST", headers: { "content-type": "application/json" }, body: "{number:" }, status: 400, field: "body" },
    { label: "a run number that is not a number", path: "/api/runs/abc", init: json("PATCH", {}), status: 400, field: "number" },
    { label: "closing a run that does not exist", path: "/api/runs/2147483000", init: json("PATCH", { end: 1, liveSeconds: 0, deadSeconds: 0, triggerCount: 0 }), status: 404, field: "number" },
  ])("$label", async ({ path, init, status, field }) => {
    const res = await daq(path, init);
    expect(res.status).toBe(status);
    expect(((await res.json()) as { field: string }).field).toBe(field);
  });
});

describe("who may write", () => {
  it("a revoked token gets 401", async () => {
    const { token, hash } = newToken("dsk_");
    const id = await createToken({}, `runs-test-revoked-${Date.now()}`, ["daq"], hash);
    await revokeToken({}, id);
    const res = await withToken(token)("/api/runs", json("POST", openBody(runNumber(), startAt())));
    expect(res.status).toBe(401);
  });

  it("a shift crew member may open and close through the API (audited with their user id); a convener may read but not write", async () => {
    const crew = await makePerson(["shift_crew"], "crew");
    const session = await signIn(crew.email, crew.password);
    const number = runNumber();
    const start = startAt();
    const opened = await session.fetch("/api/runs", json("POST", openBody(number, start)));
    expect(opened.status).toBe(201);
    expect(((await opened.json()) as { run: { openedBy: unknown } }).run.openedBy).toEqual({ kind: "user", id: crew.id, name: crew.name });
    const closed = await session.fetch(`/api/runs/${number}`, json("PATCH", { end: start + HOUR, liveSeconds: 3400, deadSeconds: 100, triggerCount: 5 }));
    expect(closed.status).toBe(200);
    const rows = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "run"), eq(auditEvents.recordId, String(number))));
    expect(rows.map((r) => [r.action, r.actorUserId])).toEqual(
      expect.arrayContaining([
        ["run.open", crew.id],
        ["run.close", crew.id],
      ]),
    );

    const convener = await makePerson(["analysis_convener"], "convener");
    const cs = await signIn(convener.email, convener.password);
    expect((await cs.fetch("/api/runs", json("POST", openBody(runNumber(), startAt())))).status).toBe(403);
    expect((await cs.fetch(`/api/runs/${number}`, json("PATCH", { end: start + HOUR, liveSeconds: 1, deadSeconds: 1, triggerCount: 1 }))).status).toBe(403);
    expect((await cs.fetch(`/api/runs/${number}`)).status).toBe(200);
  });

  it("nobody signed in gets 401", async () => {
    const { APP_URL } = await import("../support/http");
    expect((await fetch(`${APP_URL}/api/runs`)).status).toBe(401);
  });
});
