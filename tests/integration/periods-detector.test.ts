import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { randomInt, randomUUID } from "node:crypto";
import { inArray } from "drizzle-orm";
import { closeDb, db } from "@/db/client";
import { detectorConfigs, dqPeriods, runs } from "@/db/schema";
import { makePerson } from "../support/people";
import { signIn, type Session } from "../support/http";

// Two detectors of our own on one day of our own (2040–2047), one 10 h run each, no flags. Expected exposure
// by hand with the brief's formula: good live s / 86 400 × target mass.
//   xenon:     32 400 s / 86 400 × 950 kg   = 356.25 kg·day
//   germanium: 34 200 s / 86 400 × 12.25 kg = 4.84895833… kg·day
const H = 3_600_000;
const DAY0 = Date.UTC(2040, 0, 1) + randomInt(0, 2900) * 86_400_000;
const BASE = 60_000_000 + randomInt(0, 9_000_000);
const tag = randomUUID().slice(0, 8);
const XE = `Xe-itest-${tag}`;
const GE = `Ge-itest-${tag}`;
const XENON_KG_DAY = (32_400 / 86_400) * 950;
const GERMANIUM_KG_DAY = (34_200 / 86_400) * 12.25;

let convener: Session;
const configIds: number[] = [];
const periodIds: number[] = [];

const send = (path: string, body: unknown) =>
  convener.fetch(path, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });

async function exposureOf(detector: string | null): Promise<{ runs: number; exposureKgDay: number; period: { detector?: string | null } }> {
  const body = { name: `detector test ${tag} ${detector ?? "all"}`, startAt: new Date(DAY0).toISOString(), endAt: new Date(DAY0 + 24 * H).toISOString(), runTypes: ["science"], signalAcceptance: 0.5, detector };
  const created = await send("/api/periods", body);
  expect(created.status).toBe(201);
  const { period } = (await created.json()) as { period: { id: number; detector: string | null } };
  periodIds.push(period.id);
  expect(period.detector).toBe(detector);
  const res = await convener.fetch(`/api/periods/${period.id}/exposure?format=json`);
  const report = (await res.json()) as { totals: { runs: number; exposureKgDay: number }; period: { detector?: string | null } };
  return { ...report.totals, period: report.period };
}

beforeAll(async () => {
  const c = await makePerson(["analysis_convener"], "convener");
  convener = await signIn(c.email, c.password);
  const [xe] = await db.insert(detectorConfigs).values({ detector: XE, name: `xenon ${tag}`, targetMaterial: "xenon", fiducialMassKg: "950", effectiveFrom: new Date(DAY0) });
  const [ge] = await db.insert(detectorConfigs).values({ detector: GE, name: `germanium ${tag}`, targetMaterial: "germanium", fiducialMassKg: "12.25", effectiveFrom: new Date(DAY0) });
  configIds.push(xe.insertId, ge.insertId);
  const run = (number: number, configId: number, live: string) => ({
    number, type: "science" as const, status: "ended" as const, startAt: new Date(DAY0 + H), endAt: new Date(DAY0 + 11 * H), liveSeconds: live, configId, conditions: {},
  });
  await db.insert(runs).values([run(BASE, xe.insertId, "32400.000"), run(BASE + 1, ge.insertId, "34200.000")]);
});

afterAll(async () => {
  await db.delete(runs).where(inArray(runs.number, [BASE, BASE + 1]));
  if (periodIds.length) await db.delete(dqPeriods).where(inArray(dqPeriods.id, periodIds));
  await db.delete(detectorConfigs).where(inArray(detectorConfigs.id, configIds));
  await closeDb();
});

describe("a period counts one detector's runs", () => {
  it.each([
    { label: "the xenon detector only", detector: XE, runs: 1, kgDay: XENON_KG_DAY },
    { label: "the germanium array only", detector: GE, runs: 1, kgDay: GERMANIUM_KG_DAY },
    { label: "every detector (masses add up)", detector: null, runs: 2, kgDay: XENON_KG_DAY + GERMANIUM_KG_DAY },
  ])("$label", async ({ detector, runs: count, kgDay }) => {
    const totals = await exposureOf(detector);
    expect(totals.runs).toBe(count);
    expect(totals.exposureKgDay).toBeCloseTo(kgDay, 9);
    expect(totals.period.detector ?? null).toBe(detector);
  });
});
