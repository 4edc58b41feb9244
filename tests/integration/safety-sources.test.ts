/**
 * Calibration sources against the running app: who may read, manage and check out; validation with the field named;
 * today's activity; a checkout left out past its allowance shows overdue and mails the safety officers once
 * (jobs run through POST /api/jobs); return; leak tests; a gaseous source's decay wait.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, like } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { outbox } from "@/db/schema";
import { flushOutbox } from "@/lib/server/mailer";
import { APP_URL, signIn, type Session } from "../support/http";
import { allMail, waitForMail } from "../support/mail";
import { makePerson, type TestPerson } from "../support/people";

const HOUR_MS = 3_600_000;
const tag = () => randomBytes(4).toString("hex").toUpperCase();
const json = (body: unknown, method = "POST"): RequestInit => ({ method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

let officer: TestPerson;
let officerS: Session;
let expertS: Session;
let crewS: Session;

type SourceJson = {
  id: number;
  checkout: { state: string; checkoutId?: number; overdueByMs?: number };
  leakTest: { state: string; dueAt?: string };
  activityNow: { bq: number; sigmaBq: number; text: string; microCurieText: string } | null;
  decayWait: { fraction: number; seconds: number } | null;
};

async function createSource(over: Record<string, unknown> = {}) {
  const serial = `TEST-${tag()}`;
  const res = await officerS.fetch("/api/sources", json({ nuclide: "Cs-137", serial, referenceActivityBq: 370000, referenceDate: "2024-06-01", location: "Test bench", allowedOutHours: 8, ...over }));
  expect(res.status).toBe(201);
  return { id: ((await res.json()) as { id: number }).id, serial };
}

async function getSource(id: number) {
  const res = await crewS.fetch(`/api/sources/${id}`);
  expect(res.status).toBe(200);
  return (await res.json()) as { source: SourceJson; checkouts: { id: number; returnedAt: string | null; runNumbers: number[] }[] };
}

beforeAll(async () => {
  officer = await makePerson(["safety_officer"], "officer");
  const expert = await makePerson(["detector_expert"], "expert");
  const crew = await makePerson(["shift_crew"], "crew");
  [officerS, expertS, crewS] = await Promise.all([signIn(officer.email, officer.password), signIn(expert.email, expert.password), signIn(crew.email, crew.password)]);
});

afterAll(async () => {
  await closeDb();
});

describe("inventory", () => {
  it("everyone signed in reads it; only safety officers add; nobody signed out", async () => {
    expect((await fetch(`${APP_URL}/api/sources`)).status).toBe(401);
    expect((await crewS.fetch("/api/sources")).status).toBe(200);
    const byCrew = await crewS.fetch("/api/sources", json({ nuclide: "Cs-137", serial: `X-${tag()}`, referenceActivityBq: 1, referenceDate: "2024-01-01", location: "x", allowedOutHours: 1 }));
    expect(byCrew.status).toBe(403);
    const byExpert = await expertS.fetch("/api/sources", json({ nuclide: "Cs-137", serial: `X-${tag()}`, referenceActivityBq: 1, referenceDate: "2024-01-01", location: "x", allowedOutHours: 1 }));
    expect(byExpert.status).toBe(403);
  });

  it.each([
    { label: "unknown nuclide", over: { nuclide: "Xx-999" }, field: "nuclide" },
    { label: "negative activity", over: { referenceActivityBq: -5 }, field: "referenceActivityBq" },
    { label: "date that is not a date", over: { referenceDate: "last June" }, field: "referenceDate" },
    { label: "no location", over: { location: "" }, field: "location" },
    { label: "zero allowed time", over: { allowedOutHours: 0 }, field: "allowedOutHours" },
  ])("refuses $label with 400 naming the field", async ({ over, field }) => {
    const res = await officerS.fetch("/api/sources", json({ nuclide: "Cs-137", serial: `BAD-${tag()}`, referenceActivityBq: 370000, referenceDate: "2024-06-01", location: "Test bench", allowedOutHours: 8, ...over }));
    expect(res.status).toBe(400);
    expect(((await res.json()) as { field: string }).field).toBe(field);
  });

  it("refuses a serial already in use (409)", async () => {
    const s = await createSource();
    const res = await officerS.fetch("/api/sources", json({ nuclide: "Cs-137", serial: s.serial, referenceActivityBq: 1, referenceDate: "2024-06-01", location: "x", allowedOutHours: 1 }));
    expect(res.status).toBe(409);
  });

  it("safety officers change the inventory details (audited); others may not", async () => {
    const s = await createSource();
    const patch = (sess: Session, body: unknown) => sess.fetch(`/api/sources/${s.id}`, json(body, "PATCH"));
    expect((await patch(expertS, { location: "Hall C" })).status).toBe(403);
    const bad = await patch(officerS, { allowedOutHours: -1 });
    expect(bad.status).toBe(400);
    expect(((await bad.json()) as { field: string }).field).toBe("allowedOutHours");
    expect((await patch(officerS, { location: "Source safe, Hall C", allowedOutHours: 12 })).status).toBe(200);
    const res = await crewS.fetch(`/api/sources/${s.id}`);
    const body = (await res.json()) as { source: { location: string; allowedOutHours: number } };
    expect(body.source).toMatchObject({ location: "Source safe, Hall C", allowedOutHours: 12 });
  });

  it("shows today's activity from the certificate by the decay law", async () => {
    // One Cs-137 half-life (30.08 y, ENSDF via NuDat 3, from memory) before today: the activity today is half.
    const refMs = Date.now() - 30.08 * 365.25 * 24 * HOUR_MS;
    const s = await createSource({ referenceActivityBq: 740000, referenceDate: new Date(refMs).toISOString() });
    const { source } = await getSource(s.id);
    expect(source.activityNow?.bq).toBeCloseTo(370000, -1);
    // 370 kBq = 10 µCi exactly (1 Ci = 3.7e10 Bq).
    expect(source.activityNow?.microCurieText).toBe("10.0 µCi");
    expect(source.leakTest.state).toBe("none_recorded");
  });
});

describe("checkout, overdue notice and return", () => {
  it("shift crew may not check out; a detector expert may", async () => {
    const s = await createSource();
    expect((await crewS.fetch(`/api/sources/${s.id}/checkouts`, json({ purpose: "look" }))).status).toBe(403);
    const ok = await expertS.fetch(`/api/sources/${s.id}/checkouts`, json({ purpose: "Cs-137 calibration at the top guide tube" }));
    expect(ok.status).toBe(201);
    // A second checkout while it is out is refused.
    expect((await expertS.fetch(`/api/sources/${s.id}/checkouts`, json({ purpose: "again" }))).status).toBe(409);
    const unknownRun = await expertS.fetch(`/api/sources/${(await createSource()).id}/checkouts`, json({ purpose: "x", runNumbers: [2_000_000_000] }));
    expect(unknownRun.status).toBe(400);
    expect(((await unknownRun.json()) as { field: string }).field).toBe("runNumbers");
  });

  it("a source out past its allowed time shows overdue and the officers are mailed once per checkout", async () => {
    const s = await createSource({ allowedOutHours: 0.5 });
    const out = await expertS.fetch(`/api/sources/${s.id}/checkouts`, json({ purpose: "Forgotten at the cryostat", checkedOutAt: new Date(Date.now() - 2 * HOUR_MS).toISOString() }));
    expect(out.status).toBe(201);
    const checkoutId = ((await out.json()) as { id: number }).id;
    const { source } = await getSource(s.id);
    expect(source.checkout.state).toBe("overdue");
    expect(source.checkout.overdueByMs).toBeGreaterThan(1.4 * HOUR_MS);

    expect((await crewS.fetch("/api/jobs", { method: "POST" })).status).toBe(403);
    const run = await officerS.fetch("/api/jobs", { method: "POST" });
    expect(run.status).toBe(200);
    const subject = new RegExp(`Overdue: Cs-137 ${s.serial}`);
    // The app sends 50 queued messages per run, oldest first; send the rest of any backlog from here.
    for (let i = 0; i < 40; i++) if ((await flushOutbox()).sent === 0) break;
    await waitForMail(officer.email, subject);
    expect((await officerS.fetch("/api/jobs", { method: "POST" })).status).toBe(200);
    const queued = await db.select().from(outbox).where(and(like(outbox.dedupeKey, `overdue:${checkoutId}:%`), eq(outbox.toAddress, officer.email)));
    expect(queued).toHaveLength(1);
    expect((await allMail()).filter((m) => m.to.includes(officer.email) && subject.test(m.subject))).toHaveLength(1);

    const back = await expertS.fetch(`/api/sources/${s.id}/checkouts/${checkoutId}/return`, json({}));
    expect(back.status).toBe(200);
    expect((await getSource(s.id)).source.checkout.state).toBe("in_store");
  });

  it("an officer may not move the clock of the jobs without the jobs secret", async () => {
    const res = await officerS.fetch("/api/jobs", json({ now: "2030-01-01T00:00:00Z" }));
    expect(res.status).toBe(403);
  });
});

describe("leak tests and decay waits", () => {
  it("a sealed source's leak test is overdue after its interval, and recording one clears it", async () => {
    const s = await createSource({ leakTestIntervalMonths: 6, lastLeakTestAt: new Date(Date.now() - 200 * 24 * HOUR_MS).toISOString() });
    expect((await getSource(s.id)).source.leakTest.state).toBe("overdue");
    expect((await expertS.fetch(`/api/sources/${s.id}/leak-tests`, json({ testedAt: new Date().toISOString() }))).status).toBe(403);
    const rec = await officerS.fetch(`/api/sources/${s.id}/leak-tests`, json({ testedAt: new Date().toISOString().slice(0, 10) }));
    expect(rec.status).toBe(200);
    expect((await getSource(s.id)).source.leakTest.state).toBe("ok");
  });

  it("a gaseous Kr-83m source has a decay wait of T½·log2(1/f) after each injection", async () => {
    const s = await createSource({ nuclide: "Kr-83m", referenceActivityBq: 500000, decayWaitFraction: 0.001, allowedOutHours: 4 });
    const inj = await expertS.fetch(`/api/sources/${s.id}/checkouts`, json({ purpose: "Kr-83m injection", checkedOutAt: new Date(Date.now() - HOUR_MS).toISOString() }));
    expect(inj.status).toBe(201);
    const res = await crewS.fetch(`/api/sources/${s.id}`);
    const body = (await res.json()) as { source: SourceJson; decayWaits: { waitS: number; injectedAt: string; waitEndsAt: string }[] };
    // Kr-83m T½ = 1.83 h (ENSDF via NuDat 3, from memory); to 0.1 %: 1.83 h × log2(1000) ≈ 18.24 h.
    expect(body.source.decayWait?.seconds).toBeCloseTo(1.83 * 3600 * Math.log2(1000), 3);
    expect(body.source.activityNow).toBeNull();
    expect(body.source.leakTest.state).toBe("not_required");
    expect(body.decayWaits).toHaveLength(1);
    expect(Date.parse(body.decayWaits[0]!.waitEndsAt) - Date.parse(body.decayWaits[0]!.injectedAt)).toBeCloseTo(1.83 * 3600_000 * Math.log2(1000), -1);
  });
});
