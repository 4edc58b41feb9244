/** Short human ages for queue items and overdue notices ("45 min", "3 h", "2 d"). No framework imports. */

const MINUTE_MS = 60_000;
const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

/** A duration in ms as a short age: "< 1 min", "N min" below an hour, "N h" below two days, else "N d" (rounded down). */
export function formatAge(ms: number): string {
  if (!Number.isFinite(ms)) throw new RangeError(`age must be a finite number of ms, got ${String(ms)}`);
  const t = Math.max(0, ms);
  if (t < MINUTE_MS) return "< 1 min";
  if (t < HOUR_MS) return `${Math.floor(t / MINUTE_MS)} min`;
  // Up to 48 h hours read better than "1 d" (a shift thinks in hours).
  if (t < 2 * DAY_MS) return `${Math.floor(t / HOUR_MS)} h`;
  return `${Math.floor(t / DAY_MS)} d`;
}

/** A duration in seconds as hours and minutes, e.g. 65 700 s → "18 h 15 min". */
export function formatHoursMinutes(seconds: number): string {
  if (!Number.isFinite(seconds)) throw new RangeError(`duration must be finite, got ${String(seconds)}`);
  const totalMin = Math.round(Math.max(0, seconds) / 60);
  const h = Math.floor(totalMin / 60);
  const m = totalMin % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}
