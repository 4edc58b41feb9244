/**
 * Putting two periods' cumulative exposure on one chart: both curves are re-read on a shared grid of days since
 * each period's start, since uPlot draws series over one x array. Pure.
 */
import type { ExposureSeries } from "./compute";

/** Cumulative exposure at `t` (seconds) on a step curve: the last point at or before `t`, else 0. */
export function valueAt(curve: ExposureSeries["cumulative"], t: number): number {
  let lo = 0;
  let hi = curve.t.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (curve.t[mid]! <= t) lo = mid + 1;
    else hi = mid;
  }
  return lo === 0 ? 0 : curve.kgDay[lo - 1]!;
}

/**
 * Both curves on `steps + 1` grid points from day 0 to the longer period's length in days.
 * Returns [days, a, b] (each curve stops, as null, after its own period ends).
 */
export function alignByDay(
  a: { startSec: number; lengthDays: number; curve: ExposureSeries["cumulative"] },
  b: { startSec: number; lengthDays: number; curve: ExposureSeries["cumulative"] },
  steps = 400,
): [number[], (number | null)[], (number | null)[]] {
  const span = Math.max(a.lengthDays, b.lengthDays);
  const grid: number[] = [];
  for (let k = 0; k <= steps; k++) grid.push((span * k) / steps);
  const read = (p: typeof a) => grid.map((d) => (d <= p.lengthDays + 1e-9 ? valueAt(p.curve, p.startSec + d * 86_400) : null));
  return [grid, read(a), read(b)];
}
