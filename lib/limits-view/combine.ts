/**
 * Combining periods into one counting experiment: total observed count, total expected background and
 * total acceptance-weighted exposure Σ acceptance × exposure, over the periods that can take part.
 */
import type { LimitMethod } from "../limits";
import { limitFor, rateOf, type LimitView, type PeriodLimitInput } from "./period-limit";

/** A period offered for the combination. */
export interface CombinablePeriod extends PeriodLimitInput {
  id: number;
  name: string;
}

/** Why a period stays out of the combination. */
export type LeftOutReason = "blind" | "no count recorded" | "no background recorded" | "exposure cannot be computed";

/** The combined counting experiment and who is in it. */
export interface Combination {
  included: { id: number; name: string }[];
  leftOut: { id: number; name: string; why: LeftOutReason }[];
  /** Σ n over the included periods. */
  observed: number;
  /** Σ b over the included periods (events). */
  background: number;
  /** Σ acceptance × exposure over the included periods (kg·day). */
  acceptanceExposureKgDay: number;
}

function reasonLeftOut(p: CombinablePeriod): LeftOutReason | null {
  if (p.blind) return "blind";
  if (p.observed === null) return "no count recorded";
  if (p.background === null) return "no background recorded";
  if (p.exposureKgDay === null) return "exposure cannot be computed";
  return null;
}

/** Sums n, b and acceptance × exposure over the non-blind periods with n, b and exposure known. */
export function combinePeriods(periods: readonly CombinablePeriod[]): Combination {
  const combo: Combination = { included: [], leftOut: [], observed: 0, background: 0, acceptanceExposureKgDay: 0 };
  for (const p of periods) {
    const why = reasonLeftOut(p);
    if (why !== null) {
      combo.leftOut.push({ id: p.id, name: p.name, why });
      continue;
    }
    combo.included.push({ id: p.id, name: p.name });
    combo.observed += p.observed!;
    combo.background += p.background!;
    combo.acceptanceExposureKgDay += p.acceptance * p.exposureKgDay!;
  }
  // Summed decimals such as 1.3 + 1.1 pick up binary noise; twelve digits is far below any quoted precision.
  combo.background = Number(combo.background.toPrecision(12));
  return combo;
}

/** The combined limit with the given method and CL; "awaiting" when no period can take part yet. */
export function combinedLimitView(combo: Combination, method: LimitMethod, cl: number): LimitView {
  if (combo.included.length === 0) return { state: "awaiting", missing: ["observed"] };
  const limit = limitFor(combo.observed, combo.background, method, cl);
  if (!limit.ok) return { state: "refused", field: limit.field, reason: limit.reason };
  // Acceptance is already folded into the summed exposure.
  return { state: "computed", result: limit.result, ...rateOf(limit.result, 1, combo.acceptanceExposureKgDay) };
}
