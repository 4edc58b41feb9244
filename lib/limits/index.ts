/**
 * Poisson limits for Deepshift: classical (Neyman), Feldman–Cousins and flat-prior Bayesian limits on a
 * signal mean with known background, the dispatcher, the rate conversion and the chart curve.
 */
export { LimitInputError, type LimitField } from "./errors";
export type { LimitKind, LimitMethod, LimitResult } from "./types";
export { LIMIT_METHODS, MAX_FC_TOTAL, MAX_OBSERVED } from "./validate";
export { classical, classicalTotalMean } from "./classical";
export { fc, fcEdges, type FcEdges } from "./fc";
export { bayes, bayesUpper } from "./bayes";
export { backgroundGrid, computeLimit, MAX_CURVE_POINTS, upperCurve, type UpperCurvePoint } from "./compute";
export { KG_DAY_PER_TONNE_YEAR, rateUpper, type RateUpperLimit } from "./rate";
