/**
 * Typed UTC times for forms. People type "2032-01-05 10:00" or "2032-01-05T10:00:30Z"; both mean UTC.
 * A time with another offset is refused rather than silently converted, because a flag or period boundary
 * shifted by the reader's zone would move exposure by hours.
 */

/** A typed time that cannot be read as a UTC instant. */
export class UtcInputError extends Error {
  readonly code = "UTC_TIME_INVALID";
  readonly field: string;
  readonly reason: string;
  constructor(field: string, reason: string) {
    super(`${field}: ${reason}`);
    this.name = "UtcInputError";
    this.field = field;
    this.reason = reason;
  }
}

const PATTERN = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,3}))?)?)?\s*(Z|UTC|\+00:?00)?$/i;

/** Reads "YYYY-MM-DD[ HH:MM[:SS[.sss]]][Z]" as a UTC instant in ms; throws UtcInputError naming the field. */
export function parseUtcInput(text: string, field = "time"): number {
  const trimmed = text.trim();
  if (trimmed === "") throw new UtcInputError(field, "is empty; type a UTC time like 2032-01-05 10:00");
  const m = PATTERN.exec(trimmed);
  if (!m) {
    throw new UtcInputError(field, `"${trimmed}" is not a UTC time; use YYYY-MM-DD HH:MM[:SS] (UTC, no other offset)`);
  }
  const [year, month, day, hour, minute, second] = [m[1], m[2], m[3], m[4], m[5], m[6]].map((p) => Number(p ?? 0)) as [
    number, number, number, number, number, number,
  ];
  const ms = m[7] ? Number(m[7].padEnd(3, "0")) : 0;
  const value = Date.UTC(year, month - 1, day, hour, minute, second, ms);
  const back = new Date(value);
  // Date.UTC rolls 2032-02-30 over to March; compare the parts to catch impossible dates and times.
  if (
    back.getUTCFullYear() !== year ||
    back.getUTCMonth() !== month - 1 ||
    back.getUTCDate() !== day ||
    back.getUTCHours() !== hour ||
    back.getUTCMinutes() !== minute ||
    back.getUTCSeconds() !== second
  ) {
    throw new UtcInputError(field, `"${trimmed}" is not a real date and time`);
  }
  return value;
}

/** Formats a UTC instant for a form field: "YYYY-MM-DD HH:MM:SS" (milliseconds only when not zero). */
export function formatUtcInput(ms: number): string {
  const iso = new Date(ms).toISOString();
  const base = iso.slice(0, 19).replace("T", " ");
  return ms % 1000 === 0 ? base : `${base}.${iso.slice(20, 23)}`;
}
