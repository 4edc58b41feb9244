/** Public surface of the run bookkeeping rules; the API, the server actions and the pages import from here. */
export * from "./types";
export { RunConflictError, RunInputError, RunNotFoundError } from "./errors";
export {
  ACCOUNTING_TOLERANCE_FRACTION,
  ACCOUNTING_TOLERANCE_MIN_SECONDS,
  ACCOUNTING_TOLERANCE_TEXT,
  accountingToleranceSeconds,
  checkClose,
  durationSeconds,
  liveFraction,
} from "./rules";
export { canonicalDecimal, parsePositiveDecimal } from "./decimal";
export { parseInstant, parseQueryInstant } from "./instant";
export { encodeCursor, decodeCursor } from "./cursor";
export {
  DEFAULT_LIST_LIMIT,
  MAX_LIST_LIMIT,
  MAX_RUN_NUMBER,
  parseCloseRequest,
  parseConfigRequest,
  parseListQuery,
  parseOpenRequest,
  toMillisecondSeconds,
} from "./parse";
export { closeDifferences, conditionsKey, openDifferences, type RecordedClose, type RecordedOpen } from "./compare";
export { configInForce, type DatedConfig } from "./config-in-force";
export { conditionsFromText, conditionsToText, numberFromFormInput, utcFromFormInput } from "./form";
