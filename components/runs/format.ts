/** Number formatting for run screens: every figure with its unit, thin spaces between thousands. */

const group = (n: number, digits = 0) =>
  n.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits }).replace(/,/g, "\u2009");

/** A duration in seconds as "1 h 02 min", "17 min 05 s" or "42 s". */
export function formatDuration(seconds: number | null): string {
  if (seconds === null) return "—";
  const s = Math.round(seconds);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const r = s % 60;
  if (h > 0) return `${h} h ${String(m).padStart(2, "0")} min`;
  if (m > 0) return `${m} min ${String(r).padStart(2, "0")} s`;
  return `${r} s`;
}

/** Seconds with one decimal and the unit, e.g. "3 476.5 s". */
export function formatSeconds(seconds: number | null, digits = 1): string {
  return seconds === null ? "—" : `${group(seconds, digits)} s`;
}

/** A fraction as a percentage with one decimal, e.g. "96.6 %". */
export function formatPercent(fraction: number | null): string {
  return fraction === null ? "—" : `${(fraction * 100).toFixed(1)} %`;
}

/** A count with thin-space grouping. */
export function formatCount(n: number | null): string {
  return n === null ? "—" : group(n);
}

/** A mass (canonical decimal string) with its unit. */
export function formatMass(kg: string): string {
  return `${kg} kg`;
}
