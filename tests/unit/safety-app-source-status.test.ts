import { describe, it, expect } from "vitest";
import {
  activityNow, activityText, checkoutState, decayWaits, describeSource, leakState, microCurieText, scienceRunsInsideWaits, type SourceFacts,
} from "@/components/safety/source-status";

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const utc = (iso: string) => Date.parse(iso);
const JULIAN_YEAR_MS = 365.25 * DAY;

// Invented Kestrin Deep Site sources.
const cs137: SourceFacts = {
  nuclide: "Cs-137", form: "sealed", referenceActivityBq: 370_000, referenceDateMs: utc("2024-06-01T00:00:00Z"), allowedOutHours: 4,
  leakTestIntervalMonths: 6, lastLeakTestMs: utc("2025-01-20T00:00:00Z"), decayWaitFraction: null,
};
const kr83m: SourceFacts = {
  nuclide: "Kr-83m", form: "gaseous", referenceActivityBq: 500_000, referenceDateMs: utc("2025-01-01T00:00:00Z"), allowedOutHours: 4,
  leakTestIntervalMonths: null, lastLeakTestMs: null, decayWaitFraction: 0.001,
};

describe("activity display", () => {
  it.each([
    // 1 µCi = 37 kBq exactly (the curie is defined as 3.7e10 Bq).
    { label: "370 kBq is 10 µCi", bq: 370_000, text: "370 kBq", uci: "10.0 µCi" },
    { label: "37 MBq is 1000 µCi", bq: 37e6, text: "37.0 MBq", uci: "1000 µCi" },
    // Kr-83m weeks after its reference date: 2^-300 of anything is far below a millibecquerel; must not throw.
    { label: "vanishing activity", bq: 500_000 * 2 ** -300, text: "< 0.001 Bq", uci: "< 0.000001 µCi" },
    { label: "nothing left", bq: 0, text: "< 0.001 Bq", uci: "< 0.000001 µCi" },
  ])("$label", ({ bq, text, uci }) => {
    expect(activityText(bq)).toBe(text);
    expect(microCurieText(bq)).toBe(uci);
  });

  it("a sealed source one half-life after its certificate has half the activity", () => {
    // Cs-137 T½ = 30.08 y (ENSDF via NuDat 3, from memory), Julian years as in the nuclide table.
    const a = activityNow(cs137, cs137.referenceDateMs + 30.08 * JULIAN_YEAR_MS);
    expect(a?.activityBq).toBeCloseTo(185_000, 6);
    // σ(A) = A·ln2·Δt·σ(T½)/T½² = 185 kBq · ln2 · 0.09/30.08 (first-order propagation).
    expect(a?.sigmaBq).toBeCloseTo((185_000 * Math.LN2 * 0.09) / 30.08, 3);
  });

  it("a gaseous source gets no certificate-decay activity; it shows its decay wait instead", () => {
    const d = describeSource({ ...kr83m, referenceDate: new Date(kr83m.referenceDateMs), lastLeakTestAt: null }, [], utc("2025-02-01T00:00:00Z"));
    expect(d.activityNow).toBeNull();
    // 1.83 h × log2(1/0.001) (Kr-83m T½ ENSDF via NuDat 3, from memory).
    expect(d.decayWait?.seconds).toBeCloseTo(1.83 * 3600 * Math.log2(1000), 6);
    expect(d.leakTest).toEqual({ state: "not_required" });
  });
});

describe("where the source is", () => {
  const out = { id: 7, checkedOutMs: utc("2025-03-10T08:00:00Z"), returnedMs: null };
  it.each([
    { label: "never out", checkouts: [], now: "2025-03-10T09:00:00Z", state: "in_store" },
    { label: "returned", checkouts: [{ ...out, returnedMs: utc("2025-03-10T10:00:00Z") }], now: "2025-03-10T20:00:00Z", state: "in_store" },
    { label: "out within its 4 h", checkouts: [out], now: "2025-03-10T11:00:00Z", state: "out" },
    { label: "out exactly 4 h", checkouts: [out], now: "2025-03-10T12:00:00Z", state: "out" },
    { label: "out 5 h", checkouts: [out], now: "2025-03-10T13:00:00Z", state: "overdue" },
  ])("$label → $state", ({ checkouts, now, state }) => {
    const s = checkoutState(cs137, checkouts, utc(now));
    expect(s.state).toBe(state);
    if (s.state !== "in_store") {
      expect(s.checkoutId).toBe(7);
      expect(s.deadline.dueMs).toBe(utc("2025-03-10T12:00:00Z"));
    }
  });
});

describe("leak-test standing", () => {
  it.each([
    // Six calendar months after 2025-01-20 is 2025-07-20; "due soon" within 30 days (common practice for booking a wipe test).
    { label: "well before the due date", facts: cs137, now: "2025-05-01T00:00:00Z", state: "ok" },
    { label: "19 days before", facts: cs137, now: "2025-07-01T00:00:00Z", state: "due_soon" },
    { label: "a day after", facts: cs137, now: "2025-07-21T00:00:00Z", state: "overdue" },
    { label: "no test on record", facts: { ...cs137, lastLeakTestMs: null }, now: "2025-05-01T00:00:00Z", state: "none_recorded" },
    { label: "no interval set", facts: { ...cs137, leakTestIntervalMonths: null }, now: "2025-05-01T00:00:00Z", state: "not_required" },
    { label: "gaseous source", facts: kr83m, now: "2025-05-01T00:00:00Z", state: "not_required" },
  ])("$label → $state", ({ facts, now, state }) => {
    const s = leakState(facts, utc(now));
    expect(s.state).toBe(state);
    if ("deadline" in s) expect(s.deadline.dueMs).toBe(utc("2025-07-20T00:00:00Z"));
  });
});

describe("decay waits and the science runs inside them", () => {
  const injected = utc("2025-04-02T10:00:00Z");
  const waitMs = 1.83 * HOUR * Math.log2(1000); // Kr-83m T½ 1.83 h (ENSDF via NuDat 3, from memory), fraction 0.001
  const waits = decayWaits(kr83m, [{ id: 3, checkedOutMs: injected, returnedMs: injected + HOUR }]);

  it("one wait per injection, ending when the activity is down to the fraction", () => {
    expect(waits).toHaveLength(1);
    expect(waits[0]?.waitEndMs).toBeCloseTo(injected + waitMs, 0);
  });

  it("sealed sources have no decay wait", () => {
    expect(decayWaits(cs137, [{ id: 1, checkedOutMs: injected, returnedMs: null }])).toEqual([]);
  });

  const runs = [
    { label: "calibration run during the injection", number: 101, type: "calibration", startMs: injected, endMs: injected + 2 * HOUR, inside: false },
    { label: "science run two hours later", number: 102, type: "science", startMs: injected + 2 * HOUR, endMs: injected + 3 * HOUR, inside: true },
    { label: "science run still going near the end of the wait", number: 103, type: "science", startMs: injected + 18 * HOUR, endMs: null, inside: true },
    { label: "science run after the wait", number: 104, type: "science", startMs: injected + 19 * HOUR, endMs: injected + 20 * HOUR, inside: false },
    { label: "science run before the injection", number: 100, type: "science", startMs: injected - 2 * HOUR, endMs: injected - HOUR, inside: false },
  ];
  it.each(runs)("$label: inside = $inside", ({ number, inside }) => {
    const found = scienceRunsInsideWaits(runs, waits, injected + 30 * HOUR).map((x) => x.run.number);
    expect(found.includes(number)).toBe(inside);
  });
});
