// Radioactive decay of a calibration source from its certificate value.
// A source is described by the activity on its certificate (A0 at reference date t0) and the
// half-life; everything else follows from A = A0 · 2^(−Δt/T½). Dates are UTC milliseconds.

import { SafetyInputError, requireFinite, requireNonNegative, requirePositive, requireInteger } from "./errors";

export { BQ_PER_CURIE, bqToCurie, curieToBq, bqToMicroCurie, microCurieToBq, formatSignificant, formatBq, formatCurie } from "./activity-units";

/** Certificate data of one source: reference activity, reference date and half-life. */
export interface SourceReference {
  /** Activity on the certificate, Bq. */
  a0Bq: number;
  /** Standard uncertainty of a0Bq, Bq (optional; 0 if absent). */
  a0SigmaBq?: number;
  /** Reference date of the certificate, UTC ms. */
  refMs: number;
  /** Half-life, s. */
  halfLifeS: number;
  /** Standard uncertainty of the half-life, s (optional; 0 if absent). */
  halfLifeSigmaS?: number;
}

/** An activity with its first-order standard uncertainty. */
export interface ActivityEstimate {
  activityBq: number;
  sigmaBq: number;
}

/** One point of an activity-versus-time series. */
export interface ActivityPoint {
  tMs: number;
  activityBq: number;
}

const MS_PER_S = 1_000;

function checkReference(ref: SourceReference): void {
  requireNonNegative(ref.a0Bq, "a0Bq");
  requireFinite(ref.refMs, "refMs");
  requirePositive(ref.halfLifeS, "halfLifeS");
  if (ref.a0SigmaBq !== undefined) requireNonNegative(ref.a0SigmaBq, "a0SigmaBq");
  if (ref.halfLifeSigmaS !== undefined) requireNonNegative(ref.halfLifeSigmaS, "halfLifeSigmaS");
}

/** Decay constant λ = ln 2 / T½, per second. */
export function decayConstant(halfLifeS: number): number {
  return Math.LN2 / requirePositive(halfLifeS, "halfLifeS");
}

/** Fraction 2^(−t/T½) of the activity left after `elapsedS` seconds (negative elapsed gives > 1). */
export function fractionRemaining(elapsedS: number, halfLifeS: number): number {
  requireFinite(elapsedS, "elapsedS");
  requirePositive(halfLifeS, "halfLifeS");
  return Math.pow(2, -elapsedS / halfLifeS);
}

/** Activity in Bq at `atMs`; dates before the reference date back-calculate (activity > A0). */
export function activityAt(ref: SourceReference, atMs: number): number {
  checkReference(ref);
  requireFinite(atMs, "atMs");
  return ref.a0Bq * fractionRemaining((atMs - ref.refMs) / MS_PER_S, ref.halfLifeS);
}

// First-order propagation: ∂A/∂T½ = A·ln2·Δt/T½² and ∂A/∂A0 = A/A0, added in quadrature.
/** Activity at `atMs` with its standard uncertainty from the half-life and certificate uncertainties. */
export function activityWithUncertainty(ref: SourceReference, atMs: number): ActivityEstimate {
  const activityBq = activityAt(ref, atMs);
  const dtS = (atMs - ref.refMs) / MS_PER_S;
  const fromHalfLife = (activityBq * Math.LN2 * Math.abs(dtS) * (ref.halfLifeSigmaS ?? 0)) / (ref.halfLifeS * ref.halfLifeS);
  // A/A0 is the decay fraction; written this way it stays defined when A0 = 0.
  const fromCertificate = fractionRemaining(dtS, ref.halfLifeS) * (ref.a0SigmaBq ?? 0);
  return { activityBq, sigmaBq: Math.hypot(fromHalfLife, fromCertificate) };
}

// Used for decay waits after a gaseous injection (e.g. Kr-83m down to 1 %: fraction 0.01).
/** Seconds until the activity falls to `fraction` of its starting value: T½ · log2(1/f). */
export function timeToFractionS(fraction: number, halfLifeS: number): number {
  requireFinite(fraction, "fraction");
  if (fraction <= 0 || fraction > 1) {
    throw new SafetyInputError("OUT_OF_RANGE", "fraction", `must be in (0, 1], got ${fraction}`);
  }
  requirePositive(halfLifeS, "halfLifeS");
  return halfLifeS * Math.log2(1 / fraction);
}

/** UTC ms at which the source's activity reaches `limitBq` (earlier than refMs if it was already below). */
export function dateActivityReachesMs(ref: SourceReference, limitBq: number): number {
  checkReference(ref);
  requirePositive(limitBq, "limitBq");
  if (ref.a0Bq === 0) throw new SafetyInputError("NOT_POSITIVE", "a0Bq", "a source with zero activity never reaches a positive limit");
  return ref.refMs + ref.halfLifeS * Math.log2(ref.a0Bq / limitBq) * MS_PER_S;
}

/** `points` evenly spaced activity values from startMs to endMs inclusive, for charts. */
export function activitySeries(ref: SourceReference, startMs: number, endMs: number, points: number): ActivityPoint[] {
  checkReference(ref);
  requireFinite(startMs, "startMs");
  requireFinite(endMs, "endMs");
  if (endMs <= startMs) throw new SafetyInputError("BAD_ORDER", "endMs", "must be later than startMs");
  requireInteger(points, "points");
  if (points < 2) throw new SafetyInputError("OUT_OF_RANGE", "points", `need at least 2 points, got ${points}`);
  const stepMs = (endMs - startMs) / (points - 1);
  return Array.from({ length: points }, (_, i) => {
    // The last point is pinned to endMs so rounding in the step never leaves the chart short.
    const tMs = i === points - 1 ? endMs : startMs + i * stepMs;
    return { tMs, activityBq: activityAt(ref, tMs) };
  });
}
