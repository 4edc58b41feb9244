/**
 * Public surface of the exposure library: interval arithmetic, period exposure, run quality,
 * chart series, units and the input error. Import from here rather than from the parts.
 */
export { ExposureInputError, EXPOSURE_INPUT_ERROR_CODE } from "./errors";
export type {
  DataQualityPeriod,
  ExposureFlag,
  ExposureRun,
  FlagVerdict,
  Interval,
  PeriodExposure,
  PeriodTotals,
  RunExposureRow,
  RunType,
} from "./types";
export { mergeIntervals, subtractIntervals, intersectIntervals, totalLength } from "./intervals";
export {
  DAYS_PER_JULIAN_YEAR,
  KG_DAY_PER_TONNE_YEAR,
  MS_PER_DAY,
  SECONDS_PER_DAY,
  kgDayToTonneYear,
  liveSecondsToKgDay,
  tonneYearToKgDay,
} from "./units";
export { validateExposureInputs, validateFlag, validatePeriod, validateRun } from "./validate";
export { buildFlagUnion, type FlagUnion } from "./flag-union";
export { computePeriodExposure, computePeriodsExposure, sortRunsByStart, summarizePeriodSorted } from "./period-exposure";
export { runQualities, runQuality, runQualityFromUnion, type RunQuality } from "./run-quality";
export {
  MAX_SERIES_DAYS,
  cumulativeExposureSeries,
  dailyLiveFraction,
  exposureOverTime,
  type CumulativeExposurePoint,
  type DailyLiveFraction,
} from "./exposure-series";
