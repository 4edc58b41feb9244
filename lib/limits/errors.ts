/**
 * Typed input errors for the limit calculators. Forms and the CLI use `field` to point at the bad input;
 * nothing here ever returns NaN for bad input.
 */

/** Input fields a limit request can be wrong in. */
export type LimitField =
  | "method"
  | "observed"
  | "background"
  | "backgrounds"
  | "cl"
  | "upper"
  | "acceptance"
  | "exposure";

/** A limit request that cannot be computed; `field` names the input and `reason` says why. */
export class LimitInputError extends Error {
  readonly code = "LIMIT_INPUT" as const;
  readonly field: LimitField;
  readonly reason: string;

  /** Builds the error; the message reads "field: reason". */
  constructor(field: LimitField, reason: string) {
    super(`${field}: ${reason}`);
    this.name = "LimitInputError";
    this.field = field;
    this.reason = reason;
  }
}
