/**
 * Converts an upper limit on signal events into an event-rate limit per unit exposure.
 */
import { LimitInputError } from "./errors";
import { assertAcceptance, assertExposure } from "./validate";

/** kg·day in one tonne·year (1000 kg × 365.25 days). */
export const KG_DAY_PER_TONNE_YEAR = 365_250;

/** Rate upper limit in both units the detector reports use. */
export interface RateUpperLimit {
  perKgDay: number;
  perTonneYear: number;
}

/** Rate limit μ_up / (acceptance × exposure), in events/(kg·day) and events/(t·yr). */
export function rateUpper(muUp: number, acceptance: number, exposureKgDay: number): RateUpperLimit {
  if (typeof muUp !== "number" || !Number.isFinite(muUp) || muUp < 0) {
    throw new LimitInputError("upper", `must be a finite number of events ≥ 0 (got ${String(muUp)})`);
  }
  assertAcceptance(acceptance);
  assertExposure(exposureKgDay);
  const perKgDay = muUp / (acceptance * exposureKgDay);
  return { perKgDay, perTonneYear: perKgDay * KG_DAY_PER_TONNE_YEAR };
}
