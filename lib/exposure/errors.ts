/**
 * The one error type the exposure code throws for bad input, so callers (CLI, API routes, forms)
 * can tell "the ledger is wrong" apart from a bug and point at the offending record.
 */

/** Stable code carried by every ExposureInputError, for callers that switch on codes. */
export const EXPOSURE_INPUT_ERROR_CODE = "EXPOSURE_INPUT_INVALID";

/** Raised when a run, flag or period cannot be used for exposure; names the record and the field. */
export class ExposureInputError extends Error {
  readonly code = EXPOSURE_INPUT_ERROR_CODE;
  /** Which record is wrong, e.g. "run 1234", "flag 7", "period first". */
  readonly record: string;
  /** Which field of that record is wrong, e.g. "endMs". */
  readonly field: string;
  /** Plain-words reason, e.g. "ends at or before it starts". */
  readonly reason: string;

  constructor(record: string, field: string, reason: string) {
    super(`${record}: ${field} ${reason}`);
    this.name = "ExposureInputError";
    this.record = record;
    this.field = field;
    this.reason = reason;
  }
}
