/**
 * View helpers of the limits pages: text with units and tags, confidence-level choices, one period's limit
 * view, the combination of periods and the chart curve. Pure TypeScript over lib/limits.
 */
export {
  METHOD_LONG,
  METHOD_SHORT,
  RATE_UNIT,
  acceptanceText,
  clLabel,
  events,
  grouped,
  kgDayText,
  limitTag,
  muInterval,
  rateText,
  sci,
  superscript,
  tagged,
} from "./format";
export { CL_CHOICES, DEFAULT_CL, isClChoice, parseClPercent } from "./cl";
export {
  BLIND_TEXT,
  limitFor,
  periodLimitView,
  rateOf,
  visibleInput,
  type LimitView,
  type PeriodLimitInput,
  type RateInterval,
} from "./period-limit";
export { combinePeriods, combinedLimitView, type CombinablePeriod, type Combination, type LeftOutReason } from "./combine";
export { CURVE_STEPS, chartBackgrounds, upperCurveData, type CurveData } from "./curve";
