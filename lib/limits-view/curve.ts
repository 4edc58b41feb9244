/**
 * The μ_up-versus-background chart: a background grid from 0 to max(2b, 5) that contains the recorded b
 * exactly (so the marker sits on the curve), and the curve from lib/limits in uPlot's aligned arrays.
 */
import { backgroundGrid, upperCurve, type LimitMethod } from "../limits";

/** Number of intervals on the chart's background axis (the recorded b is added on top). */
export const CURVE_STEPS = 60;

/** Backgrounds from 0 to max(2b, 5) events in CURVE_STEPS steps, plus b itself when given. */
export function chartBackgrounds(recorded: number | null): number[] {
  const to = Math.max(2 * (recorded ?? 0), 5);
  const grid = backgroundGrid(0, to, to / CURVE_STEPS);
  if (recorded === null || grid.includes(recorded)) return grid;
  return [...grid, recorded].sort((a, b) => a - b);
}

/** The chart's data: x = backgrounds, the upper end at each, and the marker (non-null only at the recorded b). */
export interface CurveData {
  backgrounds: number[];
  upper: (number | null)[];
  marker: (number | null)[];
}

/** μ_up against background for fixed n, method and CL, with the recorded b marked. */
export function upperCurveData(method: LimitMethod, observed: number, cl: number, recorded: number | null): CurveData {
  const backgrounds = chartBackgrounds(recorded);
  const upper = upperCurve(method, observed, cl, backgrounds).map((p) => p.upper);
  const marker = backgrounds.map((b, i) => (b === recorded ? (upper[i] ?? null) : null));
  return { backgrounds, upper, marker };
}
