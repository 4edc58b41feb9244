/** Typed errors for logbook input: each names the field it is about and says why in plain words. */

export type LogbookErrorCode =
  | "invalid_tag"
  | "invalid_run_number"
  | "too_many"
  | "file_too_large"
  | "file_empty"
  | "file_type_not_allowed"
  | "file_type_mismatch"
  | "invalid_limit";

/** Bad logbook input (a tag, a run number, an attachment); `field` names the form field or header. */
export class LogbookInputError extends Error {
  readonly code: LogbookErrorCode;
  readonly field: string;

  /** Make an error for one field with a reason a writer can act on. */
  constructor(code: LogbookErrorCode, field: string, message: string) {
    super(message);
    this.name = "LogbookInputError";
    this.code = code;
    this.field = field;
  }
}
