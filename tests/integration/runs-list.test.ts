/**
 * Reading runs over HTTP: filters and keyset pagination of GET /api/runs, each run's quality against the
 * confirmed excluding flags, one run with its linked entries, and the configurations API. Test runs lie in
 * 2002-2003 on a Quillon-Ge test configuration, with numbers 9 000 000 + random, away from the demo runs.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { auditEvents, badTimeFlags, detectorConfigs, entries, entryRevisions, entryRuns, subsystems } from "@/db/schema";
import { createToken, revokeToken } from "@/db/tokens";
import { newToken } from "@/lib/auth/secrets";
import { makePerson, type TestPerson } from "../support/people";
import { signIn, withToken, type Session } from "../support/http";

const TEST_CONFIG = "Quillon-Ge test bench (runs integration tests)";
const TEST_EPOCH = Date.UTC(2001, 0, 1);
const MIN = 60_000;
const HOUR = 60 * MIN;
const DAY = 24 * HOUR;

let daq: ReturnType<typeof withToken>;
let tokenId: number;
let expert: TestPerson;
let expertSession: Session;
let nextNumber = 9_000_000 + Math.floor(Math.random() * 900_000) * 10 + 5;
const runNumber = () => nextNumber++;
/** Runs this file opened and has not closed: closed in afterAll so no test run stays open. */
const stillOpen = new Map<number, number>();
const json = (method: string, body: unknown): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

type Row = { number: number; type: string; status: string; quality: string; liveFraction: number | null; targetMassKg: string; targetMassSource: string };
type Page = { runs: Row[]; nextCursor: string | null; openRuns: number };

async function open(number: number, start: number, extra: Record<string, unknown> = {}) {
  const res = await daq("/api/runs", json("POST", { number, type: "science", start, detector: "Quillon-Ge", ...extra }));
  expect(res.status).toBe(201);
  stillOpen.set(number, start);
}

async function close(number: number, start: number, minutes: number, liveFraction = 0.96) {
  const duration = minutes * 60;
  const res = await daq(`/api/runs/${number}`, json("PATCH", { end: start + minutes * MIN, liveSeconds: duration * liveFraction, deadSeconds: duration * (1 - liveFraction) * 0.9, triggerCount: 1000 }));
  expect(res.status).toBe(200);
  stillOpen.delete(number);
}

async function list(query: string): Promise<Page> {
  const res = await expertSession.fetch(`/api/runs?${query}`);
  expect(res.status).toBe(200);
  return (await res.json()) as Page;
}

async function flag(startMs: number, endMs: number, state: "proposed" | "confirmed", verdict: "exclude" | "caution"): Promise<void> {
  const [sub] = await db.select({ code: subsystems.code }).from(subsystems).limit(1);
  let code = sub?.code;
  if (!code) {
    await db.insert(subsystems).ignore().values({ code: "daq", label: "DAQ" });
    code = "daq";
  }
  await db.insert(badTimeFlags).values({ startAt: new Date(startMs), endAt: new Date(endMs), subsystem: code, verdict, reason: "runs integration test", state, proposedBy: expert.id });
}

beforeAll(async () => {
  const [have] = await db.select({ id: detectorConfigs.id }).from(detectorConfigs).where(eq(detectorConfigs.name, TEST_CONFIG)).limit(1);
  if (!have) {
    await db.insert(detectorConfigs).values({ detector: "Quillon-Ge", name: TEST_CONFIG, targetMaterial: "germanium", fiducialMassKg: "12.2500", effectiveFrom: new Date(TEST_EPOCH) });
  }
  const { token, hash } = newToken("dsk_");
  tokenId = await createToken({}, `runs-list-test-${Date.now()}`, ["daq"], hash);
  daq = withToken(token);
  expert = await makePerson(["detector_expert"], "expert");
  expertSession = await signIn(expert.email, expert.password);
});

afterAll(async () => {
  for (const [number, start] of [...stillOpen]) await close(number, start, 30);
  await revokeToken({}, tokenId);
  await closeDb();
});

describe("GET /api/runs", () => {
  // Four runs on one random 2002 day: 1 h science, 1 h calibration, 1 h science, then an open science run.
  const day = Date.UTC(2002, 0, 1) + Math.floor(Math.random() * 330) * DAY + Math.floor(Math.random() * 600) * MIN;
  const numbers = [runNumber(), runNumber(), runNumber(), runNumber()];
  const starts = [0, 1, 2, 3].map((i) => day + i * (HOUR + MIN));
  const span = `from=${new Date(day).toISOString()}&to=${new Date(day + 4 * HOUR).toISOString()}`;

  beforeAll(async () => {
    for (const [i, n] of numbers.entries()) {
      await open(n, starts[i]!, { type: i === 1 ? "calibration" : "science", conditions: i === 1 ? { source: "Cs-137" } : {} });
      if (i < 3) await close(n, starts[i]!, 60);
    }
    await flag(starts[0]! + 10 * MIN, starts[0]! + 20 * MIN, "confirmed", "exclude"); // part of run 0
    await flag(starts[1]! - MIN, starts[1]! + 61 * MIN, "confirmed", "exclude"); // all of run 1
    await flag(starts[2]! + 5 * MIN, starts[2]! + 15 * MIN, "proposed", "exclude"); // run 2: not confirmed, no effect
    await flag(starts[2]! + 30 * MIN, starts[2]! + 40 * MIN, "confirmed", "caution"); // run 2: caution never removes time
  });

  it("lists the runs in a time span newest first, with live fraction, mass in force and quality", async () => {
    const page = await list(span);
    const ours = page.runs.filter((r) => numbers.includes(r.number));
    expect(ours.map((r) => r.number)).toEqual([...numbers].reverse());
    expect(ours.map((r) => r.quality)).toEqual(["open", "good", "excluded", "partly excluded"]);
    expect(ours.map((r) => r.status)).toEqual(["running", "ended", "ended", "ended"]);
    expect(ours[1]?.liveFraction).toBeCloseTo(0.96, 9); // the fraction sent above, 3456 s of 3600 s
    expect(ours.every((r) => r.targetMassKg === "12.25" && r.targetMassSource === "configuration")).toBe(true);
    expect(page.openRuns).toBeGreaterThanOrEqual(1);
  });

  it.each([
    { label: "type calibration", q: "type=calibration", expected: [1] },
    { label: "status running", q: "status=running", expected: [3] },
    { label: "status ended and type science", q: "status=ended&type=science", expected: [2, 0] },
  ])("filters by $label", async ({ q, expected }) => {
    const page = await list(`${span}&${q}`);
    expect(page.runs.filter((r) => numbers.includes(r.number)).map((r) => r.number)).toEqual(expected.map((i) => numbers[i]));
  });

  it("pages by keyset cursor without gaps or repeats", async () => {
    const exact = `from=${new Date(starts[0]!).toISOString()}&to=${new Date(starts[3]! + 1).toISOString()}`;
    const seen: number[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const page: Page = await list(`${exact}&limit=2${cursor ? `&cursor=${cursor}` : ""}`);
      seen.push(...page.runs.map((r) => r.number));
      cursor = page.nextCursor;
      pages++;
    } while (cursor && pages < 10);
    expect(seen.filter((n) => numbers.includes(n))).toEqual([...numbers].reverse());
    expect(new Set(seen).size).toBe(seen.length);
  });

  it.each([
    { label: "limit above 200", q: "limit=201", field: "limit" },
    { label: "a cursor it never handed out", q: "cursor=bm9wZQ", field: "cursor" },
    { label: "an unknown type", q: "type=physics", field: "type" },
  ])("refuses $label with 400", async ({ q, field }) => {
    const res = await expertSession.fetch(`/api/runs?${q}`);
    expect(res.status).toBe(400);
    expect(((await res.json()) as { field: string }).field).toBe(field);
  });
});

describe("GET /api/runs/{number}", () => {
  it("gives conditions, configuration, the override in force and the linked entries", async () => {
    const number = runNumber();
    const start = Date.UTC(2002, 11, 1) + Math.floor(Math.random() * 20 * 24) * HOUR;
    await open(number, start, { type: "calibration", conditions: { source: "AmBe", "bias voltage [V]": 3500 }, targetMassOverrideKg: "12.1" });
    const [res] = await db.insert(entries).values({ category: "run_note", authorId: expert.id });
    const entryId = res.insertId;
    await db.insert(entryRevisions).values({ entryId, revision: 1, title: `Source in for run ${number}`, body: "AmBe at the side tube.", tags: [], runNumbers: [number], authorId: expert.id });
    await db.insert(entryRuns).values({ entryId, runNumber: number });

    const got = await expertSession.fetch(`/api/runs/${number}`);
    expect(got.status).toBe(200);
    const { run } = (await got.json()) as { run: Record<string, unknown> & { entries: unknown[] } };
    expect(run).toMatchObject({
      number,
      conditions: { source: "AmBe", "bias voltage [V]": 3500 },
      targetMassKg: "12.1",
      targetMassSource: "override",
      config: { name: TEST_CONFIG, fiducialMassKg: "12.25", targetMaterial: "germanium" },
      quality: "open",
    });
    expect(run.entries).toEqual([{ id: entryId, category: "run_note", title: `Source in for run ${number}`, author: expert.name, createdAt: expect.any(String), retracted: false }]);
    expect((await expertSession.fetch("/api/runs/2147483001")).status).toBe(404);
  });
});

describe("configurations API", () => {
  it("lists for readers, refuses non-experts, refuses bad input and same-instant duplicates, and moves later runs onto a new one", async () => {
    const convener = await makePerson(["analysis_convener"], "convener");
    const cs = await signIn(convener.email, convener.password);
    const listed = (await (await cs.fetch("/api/configs")).json()) as { configs: { name: string }[] };
    expect(listed.configs.map((c) => c.name)).toContain(TEST_CONFIG);

    const from = Date.UTC(2003, 0, 1) + Math.floor(Math.random() * 300 * 24) * HOUR;
    const body = { detector: "Quillon-Ge", name: `Quillon-Ge test from ${new Date(from).toISOString().slice(0, 16)}`, targetMaterial: "germanium", fiducialMassKg: "11.75", effectiveFrom: new Date(from).toISOString() };
    expect((await cs.fetch("/api/configs", json("POST", body))).status).toBe(403);
    const bad = await expertSession.fetch("/api/configs", json("POST", { ...body, fiducialMassKg: "11.123456" }));
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { field: string }).field).toBe("fiducialMassKg");

    const number = runNumber();
    await open(number, from + 2 * HOUR);
    const made = await expertSession.fetch("/api/configs", json("POST", body));
    expect(made.status).toBe(201);
    const answer = (await made.json()) as { config: { id: number; fiducialMassKg: string }; reassignedRuns: number };
    expect(answer.config.fiducialMassKg).toBe("11.75");
    expect(answer.reassignedRuns).toBeGreaterThanOrEqual(1);
    const [trail] = await db.select().from(auditEvents).where(and(eq(auditEvents.recordType, "detector_config"), eq(auditEvents.recordId, String(answer.config.id))));
    expect(trail).toMatchObject({ action: "config.create", actorUserId: expert.id, details: { fiducialMassKg: "11.75", reassignedRuns: answer.reassignedRuns } });
    const run = (await (await expertSession.fetch(`/api/runs/${number}`)).json()) as { run: { config: { name: string }; targetMassKg: string } };
    expect(run.run).toMatchObject({ config: { name: body.name }, targetMassKg: "11.75" });

    const dup = await expertSession.fetch("/api/configs", json("POST", { ...body, name: "another name" }));
    expect(dup.status).toBe(409);
    expect(((await dup.json()) as { field: string }).field).toBe("effectiveFrom");
  });
});
