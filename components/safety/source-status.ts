/**
 * What the source pages show about one calibration source, computed from its stored record with lib/safety:
 * today's activity (sealed: decay from the certificate), checkout and leak-test deadlines, and for gaseous
 * sources the decay wait after each injection. No framework imports: unit-tested.
 */
import { activityWithUncertainty, bqToMicroCurie, formatBq, formatSignificant, timeToFractionS } from "@/lib/safety/decay";
import { getNuclide, type Nuclide } from "@/lib/safety/nuclides";
import { checkoutStatus, leakTestStatus, type DeadlineStatus } from "@/lib/safety/sources";

const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;
/** A leak test due within this many days is flagged "due soon" (gives a month to book the wipe test). */
export const LEAK_TEST_SOON_DAYS = 30;

/** The stored facts of a source that the computations need (dates as UTC ms). */
export type SourceFacts = {
  nuclide: string;
  form: "sealed" | "gaseous";
  referenceActivityBq: number;
  referenceDateMs: number;
  allowedOutHours: number;
  leakTestIntervalMonths: number | null;
  lastLeakTestMs: number | null;
  decayWaitFraction: number | null;
};

/** A checkout as the computations need it. */
export type CheckoutFacts = { id: number; checkedOutMs: number; returnedMs: number | null };

/** Where the source is: in store, out within its allowance, or out past it. */
export type CheckoutState =
  | { state: "in_store" }
  | { state: "out" | "overdue"; checkoutId: number; deadline: DeadlineStatus };

/** Leak-test standing of a source. */
export type LeakState =
  | { state: "not_required" }
  | { state: "none_recorded" }
  | { state: "ok" | "due_soon" | "overdue"; deadline: DeadlineStatus };

/** Decay wait after one injection of a gaseous source. */
export type DecayWait = { checkoutId: number; injectedMs: number; waitEndMs: number; waitS: number; fraction: number };

/** The source's nuclide from the built-in table, or null if the stored id is not in it. */
export function nuclideOf(facts: Pick<SourceFacts, "nuclide">): Nuclide | null {
  try {
    return getNuclide(facts.nuclide);
  } catch {
    return null;
  }
}

/** An activity as text with a unit prefix; values too small to matter read "< 0.001 Bq" (never a NaN or a throw). */
export function activityText(bq: number): string {
  if (!Number.isFinite(bq) || bq < 0) return "—";
  if (bq < 1e-3) return "< 0.001 Bq";
  return formatBq(bq);
}

/** The same activity in µCi (1 µCi = 37 kBq), the unit older certificates use. */
export function microCurieText(bq: number): string {
  if (!Number.isFinite(bq) || bq < 0) return "—";
  const uci = bqToMicroCurie(bq);
  if (uci < 1e-6) return "< 0.000001 µCi";
  return `${formatSignificant(uci, 3)} µCi`;
}

/** Activity of a sealed source at `nowMs` from its certificate, with the half-life's uncertainty propagated. */
export function activityNow(facts: SourceFacts, nowMs: number): { activityBq: number; sigmaBq: number } | null {
  const n = nuclideOf(facts);
  if (!n) return null;
  return activityWithUncertainty(
    { a0Bq: facts.referenceActivityBq, refMs: facts.referenceDateMs, halfLifeS: n.halfLifeS, halfLifeSigmaS: n.halfLifeSigmaS },
    nowMs,
  );
}

/** The open checkout (if any) and whether it is past the source's allowed time out. */
export function checkoutState(facts: Pick<SourceFacts, "allowedOutHours">, checkouts: readonly CheckoutFacts[], nowMs: number): CheckoutState {
  const open = checkouts.filter((c) => c.returnedMs === null).sort((a, b) => b.checkedOutMs - a.checkedOutMs)[0];
  if (!open) return { state: "in_store" };
  const deadline = checkoutStatus(open.checkedOutMs, facts.allowedOutHours * HOUR_MS, nowMs);
  return { state: deadline.overdue ? "overdue" : "out", checkoutId: open.id, deadline };
}

/** Leak-test standing: only sealed sources with an interval need one. */
export function leakState(facts: SourceFacts, nowMs: number): LeakState {
  if (facts.form !== "sealed" || facts.leakTestIntervalMonths === null) return { state: "not_required" };
  if (facts.lastLeakTestMs === null) return { state: "none_recorded" };
  const deadline = leakTestStatus(facts.lastLeakTestMs, nowMs, { months: facts.leakTestIntervalMonths });
  if (deadline.overdue) return { state: "overdue", deadline };
  return { state: deadline.remainingMs <= LEAK_TEST_SOON_DAYS * DAY_MS ? "due_soon" : "ok", deadline };
}

/** Decay waits of a gaseous source: one per checkout (injection), ending when activity falls below the fraction. */
export function decayWaits(facts: SourceFacts, checkouts: readonly CheckoutFacts[]): DecayWait[] {
  const n = nuclideOf(facts);
  if (facts.form !== "gaseous" || facts.decayWaitFraction === null || !n) return [];
  const waitS = timeToFractionS(facts.decayWaitFraction, n.halfLifeS);
  return checkouts
    .map((c) => ({ checkoutId: c.id, injectedMs: c.checkedOutMs, waitEndMs: c.checkedOutMs + waitS * 1000, waitS, fraction: facts.decayWaitFraction as number }))
    .sort((a, b) => a.injectedMs - b.injectedMs);
}

/** A run as the decay-wait check needs it. */
export type RunSpan = { number: number; type: string; startMs: number; endMs: number | null };

/** Science runs that overlap any decay wait (a run still going counts up to `nowMs`). */
export function scienceRunsInsideWaits(runs: readonly RunSpan[], waits: readonly DecayWait[], nowMs: number): { run: RunSpan; wait: DecayWait }[] {
  const out: { run: RunSpan; wait: DecayWait }[] = [];
  for (const run of runs) {
    if (run.type !== "science") continue;
    const end = run.endMs ?? nowMs;
    const wait = waits.find((w) => run.startMs < w.waitEndMs && end > w.injectedMs);
    if (wait) out.push({ run, wait });
  }
  return out.sort((a, b) => a.run.startMs - b.run.startMs);
}

/** The stored columns of a source row that describeSource reads (structural, so no database import here). */
export type SourceRowLike = {
  nuclide: string;
  form: "sealed" | "gaseous";
  referenceActivityBq: number;
  referenceDate: Date;
  allowedOutHours: number;
  leakTestIntervalMonths: number | null;
  lastLeakTestAt: Date | null;
  decayWaitFraction: number | null;
};

/** The computation inputs of a stored source row. */
export function factsFromRow(row: SourceRowLike): SourceFacts {
  return {
    nuclide: row.nuclide, form: row.form, referenceActivityBq: row.referenceActivityBq, referenceDateMs: row.referenceDate.getTime(),
    allowedOutHours: row.allowedOutHours, leakTestIntervalMonths: row.leakTestIntervalMonths, lastLeakTestMs: row.lastLeakTestAt?.getTime() ?? null,
    decayWaitFraction: row.decayWaitFraction,
  };
}

/** Everything the pages and the API say about a source's state at `nowMs`, as plain JSON-ready values. */
export function describeSource(row: SourceRowLike, checkouts: readonly CheckoutFacts[], nowMs: number) {
  const facts = factsFromRow(row);
  const n = nuclideOf(facts);
  const now = facts.form === "sealed" ? activityNow(facts, nowMs) : null;
  const out = checkoutState(facts, checkouts, nowMs);
  const leak = leakState(facts, nowMs);
  const waitS = n && facts.form === "gaseous" && facts.decayWaitFraction !== null ? timeToFractionS(facts.decayWaitFraction, n.halfLifeS) : null;
  return {
    halfLife: n
      ? { value: n.halfLife.value, uncertainty: n.halfLife.uncertainty, unit: n.halfLife.unit, seconds: n.halfLifeS, sigmaSeconds: n.halfLifeSigmaS, source: n.source, note: n.note ?? null, name: n.name }
      : null,
    activityNow: now
      ? { bq: now.activityBq, sigmaBq: now.sigmaBq, text: activityText(now.activityBq), sigmaText: activityText(now.sigmaBq), microCurieText: microCurieText(now.activityBq) }
      : null,
    checkout: out.state === "in_store"
      ? { state: out.state }
      : { state: out.state, checkoutId: out.checkoutId, dueAt: new Date(out.deadline.dueMs).toISOString(), overdueByMs: out.deadline.overdueByMs },
    leakTest: leak.state === "ok" || leak.state === "due_soon" || leak.state === "overdue"
      ? { state: leak.state, dueAt: new Date(leak.deadline.dueMs).toISOString() }
      : { state: leak.state },
    decayWait: waitS === null ? null : { fraction: facts.decayWaitFraction as number, seconds: waitS },
  };
}

/** The JSON shape of describeSource. */
export type SourceDescription = ReturnType<typeof describeSource>;
