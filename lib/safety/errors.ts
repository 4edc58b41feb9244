// Typed input errors for the safety computations: callers (forms, API routes) show `reason`
// next to `field` instead of ever rendering a NaN.

/** Machine-readable reason a safety input was rejected. */
export type SafetyErrorCode =
  | "NOT_FINITE"
  | "NEGATIVE"
  | "NOT_POSITIVE"
  | "NOT_INTEGER"
  | "OUT_OF_RANGE"
  | "BAD_ORDER"
  | "MISSING"
  | "UNKNOWN_NUCLIDE"
  | "UNKNOWN_CRYOGEN"
  | "UNKNOWN_UNIT";

/** Error thrown for any invalid input to lib/safety; `field` names the offending input. */
export class SafetyInputError extends Error {
  readonly code: SafetyErrorCode;
  readonly field: string;
  readonly reason: string;

  constructor(code: SafetyErrorCode, field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.name = "SafetyInputError";
    this.code = code;
    this.field = field;
    this.reason = reason;
  }
}

/** Returns `value` if it is a finite number, otherwise throws NOT_FINITE. */
export function requireFinite(value: number, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new SafetyInputError("NOT_FINITE", field, `must be a finite number, got ${String(value)}`);
  }
  return value;
}

/** Returns `value` if it is finite and >= 0, otherwise throws. */
export function requireNonNegative(value: number, field: string): number {
  requireFinite(value, field);
  if (value < 0) throw new SafetyInputError("NEGATIVE", field, `must not be negative, got ${value}`);
  return value;
}

/** Returns `value` if it is finite and > 0, otherwise throws. */
export function requirePositive(value: number, field: string): number {
  requireFinite(value, field);
  if (value <= 0) throw new SafetyInputError("NOT_POSITIVE", field, `must be greater than zero, got ${value}`);
  return value;
}

/** Returns `value` if it is a (safe) integer, otherwise throws. */
export function requireInteger(value: number, field: string): number {
  requireFinite(value, field);
  if (!Number.isSafeInteger(value)) throw new SafetyInputError("NOT_INTEGER", field, `must be a whole number, got ${value}`);
  return value;
}
