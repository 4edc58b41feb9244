/**
 * Errors of the run bookkeeping. Each carries a stable `code` so that route handlers and forms map it to
 * the right answer (400, 409, 404) and name the offending field.
 */

/** Bad input: names the field and the reason (answered with 400). */
export class RunInputError extends Error {
  readonly code = "RUN_INPUT_INVALID";
  readonly field: string;
  readonly reason: string;

  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.name = "RunInputError";
    this.field = field;
    this.reason = reason;
  }
}

/** A request that contradicts what is already recorded (answered with 409); lists the differing fields. */
export class RunConflictError extends Error {
  readonly code = "RUN_CONFLICT";
  readonly fields: string[];
  readonly reason: string;

  constructor(reason: string, fields: string[]) {
    super(fields.length ? `${reason} (differs in: ${fields.join(", ")})` : reason);
    this.name = "RunConflictError";
    this.reason = reason;
    this.fields = fields;
  }
}

/** No run with that number (answered with 404). */
export class RunNotFoundError extends Error {
  readonly code = "RUN_NOT_FOUND";
  readonly number: number;

  constructor(number: number) {
    super(`there is no run ${number}`);
    this.name = "RunNotFoundError";
    this.number = number;
  }
}
