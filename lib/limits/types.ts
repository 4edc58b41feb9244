/**
 * Result shapes shared by the limit calculators, the CLI and the limits page.
 */

/** Which construction produced a limit. */
export type LimitMethod = "classical" | "fc" | "bayes";

/**
 * What a result may be read as:
 * - "upper-limit": lower is 0 and `upper` bounds the signal mean;
 * - "interval": a two-sided interval [lower, upper] (Feldman–Cousins with a clear excess);
 * - "no-limit": the construction gave no usable bound (classical limit ≤ 0); `upper` is null, see `note`.
 */
export type LimitKind = "upper-limit" | "interval" | "no-limit";

/** One computed limit on the signal mean μ (events), with the inputs that produced it. */
export interface LimitResult {
  method: LimitMethod;
  observed: number;
  background: number;
  cl: number;
  kind: LimitKind;
  lower: number;
  /** Upper end on μ in events; null when kind is "no-limit". */
  upper: number | null;
  /** The raw classical value s − b when it came out ≤ 0 (kept for display, never to be quoted as a limit). */
  rawUpper?: number;
  note?: string;
}
