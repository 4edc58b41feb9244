/**
 * Number formatting for the exposure pages: fixed decimals, thousands grouped with a narrow space (the
 * SI way, so no reader mistakes a separator for a decimal mark), always the same on server and client.
 */

const GROUP = "\u202f";

/** `value` with `digits` decimals and grouped thousands, e.g. 12345.6 → "12 345.60"; "—" when not finite. */
export function fixed(value: number, digits: number): string {
  if (!Number.isFinite(value)) return "—";
  const negative = value < 0 && Number(value.toFixed(digits)) !== 0;
  const [whole = "0", frac] = Math.abs(value).toFixed(digits).split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, GROUP);
  return `${negative ? "−" : ""}${grouped}${frac !== undefined ? `.${frac}` : ""}`;
}

/** Exposure in kg·day to three decimals (a gram-day resolution on a tonne-scale target). */
export function kgDay(value: number): string {
  return `${fixed(value, 3)} kg·day`;
}

/** Exposure in tonne·year to five decimals. */
export function tonneYear(value: number): string {
  return `${fixed(value, 5)} t·yr`;
}

/** Seconds as hours, e.g. 32 400 → "9.000 h". */
export function hours(seconds: number, digits = 3): string {
  return `${fixed(seconds / 3600, digits)} h`;
}

/** Seconds as days, e.g. 86 400 → "1.0000 d". */
export function days(seconds: number, digits = 4): string {
  return `${fixed(seconds / 86_400, digits)} d`;
}

/** Seconds with one decimal, e.g. "32 400.0 s". */
export function seconds(value: number, digits = 1): string {
  return `${fixed(value, digits)} s`;
}

/** A signed change, e.g. −35.625 → "−35.625", +0 → "±0.000". */
export function signed(value: number, digits: number): string {
  const text = fixed(value, digits);
  if (Number(value.toFixed(digits)) === 0) return `±${fixed(0, digits)}`;
  return value > 0 ? `+${text}` : text;
}

/** An ISO time as "YYYY-MM-DD HH:MM:SS" UTC, for dense tables. */
export function utcText(isoTime: string): string {
  return isoTime.slice(0, 19).replace("T", " ");
}
