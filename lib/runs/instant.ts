/**
 * UTC instants as the DAQ sends them: milliseconds since 1970, or ISO 8601 text that states its zone.
 * Text without a zone is refused rather than guessed, because a guessed zone shifts a run by hours.
 */
import { RunInputError } from "./errors";

const ISO_WITH_ZONE = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-](\d{2}):(\d{2}))$/i;
const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;
/** Instants before 1970 or from 2100 on are refused as clock or unit mistakes (seconds sent as milliseconds...). */
const LATEST_MS = Date.UTC(2100, 0, 1);

function realCalendarTime([y = 0, mo = 0, d = 0, h = 0, mi = 0, s = 0, oh = 0, om = 0]: number[]): boolean {
  const daysInMonth = new Date(Date.UTC(y, mo, 0)).getUTCDate();
  return mo >= 1 && mo <= 12 && d >= 1 && d <= daysInMonth && h <= 23 && mi <= 59 && s <= 59 && oh <= 23 && om <= 59;
}

/** Parse an instant (integer ms or zoned ISO text) into UTC milliseconds; throws RunInputError naming the field. */
export function parseInstant(value: unknown, field: string): number {
  let ms: number;
  if (typeof value === "number") {
    if (!Number.isInteger(value)) throw new RunInputError(field, `must be whole milliseconds since 1970 (got ${value})`);
    ms = value;
  } else if (typeof value === "string") {
    const text = value.trim();
    const m = ISO_WITH_ZONE.exec(text);
    if (!m) throw new RunInputError(field, `must be an ISO 8601 UTC time such as 2026-03-01T12:00:00Z (with Z or an offset); got "${text}"`);
    // Date.parse rolls 30 February over into March; check the fields ourselves first.
    if (!realCalendarTime(m.slice(1).map((g) => (g === undefined ? 0 : Number(g))))) {
      throw new RunInputError(field, `is not a real calendar time ("${text}")`);
    }
    ms = Date.parse(text);
  } else {
    throw new RunInputError(field, value === undefined ? "is required" : "must be a UTC time (milliseconds since 1970 or ISO 8601 text)");
  }
  if (!Number.isFinite(ms)) throw new RunInputError(field, "is not a real calendar time");
  if (ms < 0 || ms >= LATEST_MS) throw new RunInputError(field, "must lie between 1970 and 2100");
  return ms;
}

/** Parse a query-string bound: digits as milliseconds, YYYY-MM-DD as that day's UTC midnight, else zoned ISO text. */
export function parseQueryInstant(text: string, field: string): number {
  const t = text.trim();
  if (/^\d+$/.test(t)) return parseInstant(Number(t), field);
  if (DATE_ONLY.test(t)) return parseInstant(`${t}T00:00:00Z`, field);
  return parseInstant(t, field);
}
