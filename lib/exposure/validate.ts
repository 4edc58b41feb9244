/**
 * Input checks for runs, flags and periods. Everything is validated before any arithmetic so a bad
 * record stops the computation with its name instead of leaking NaN or a negative exposure into totals.
 */
import { ExposureInputError } from "./errors";
import type { DataQualityPeriod, ExposureFlag, ExposureRun } from "./types";

/** Label used in errors for a run, e.g. "run 1234". */
export function runLabel(run: ExposureRun): string {
  return `run ${String(run.number)}`;
}

/** Label used in errors for a flag: "flag 7" by id, else by position "flag [3]". */
export function flagLabel(flag: ExposureFlag, index: number): string {
  return flag.id !== undefined ? `flag ${String(flag.id)}` : `flag [${index}]`;
}

/** Label used in errors for a period: "period first", or by position if unnamed. */
export function periodLabel(period: DataQualityPeriod, index = 0): string {
  return typeof period.name === "string" && period.name !== "" ? `period ${period.name}` : `period [${index}]`;
}

function requireFinite(record: string, field: string, value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new ExposureInputError(record, field, `must be a finite number (got ${String(value)})`);
  }
  return value;
}

/** Throws ExposureInputError unless the run has a sane time span, live time and mass. */
export function validateRun(run: ExposureRun): void {
  const record = runLabel(run);
  requireFinite(record, "number", run.number);
  if (typeof run.type !== "string") throw new ExposureInputError(record, "type", "must be a string");
  const start = requireFinite(record, "startMs", run.startMs);
  const live = requireFinite(record, "liveSeconds", run.liveSeconds);
  const mass = requireFinite(record, "targetMassKg", run.targetMassKg);
  if (mass < 0) throw new ExposureInputError(record, "targetMassKg", `must not be negative (got ${mass})`);
  if (live < 0) throw new ExposureInputError(record, "liveSeconds", `must not be negative (got ${live})`);
  if (run.endMs === null) return; // open run: no duration yet to check live time against
  const end = requireFinite(record, "endMs", run.endMs);
  if (end <= start) throw new ExposureInputError(record, "endMs", "must be after startMs (run ends at or before it starts)");
  const durationSeconds = (end - start) / 1000;
  if (live > durationSeconds) {
    throw new ExposureInputError(record, "liveSeconds", `exceeds the run duration (${live} s > ${durationSeconds} s)`);
  }
}

/** Throws ExposureInputError unless the flag has a known verdict and ends after it starts. */
export function validateFlag(flag: ExposureFlag, index: number): void {
  const record = flagLabel(flag, index);
  const start = requireFinite(record, "startMs", flag.startMs);
  const end = requireFinite(record, "endMs", flag.endMs);
  if (end <= start) throw new ExposureInputError(record, "endMs", "must be after startMs (flag ends at or before it starts)");
  if (flag.verdict !== "exclude" && flag.verdict !== "caution") {
    throw new ExposureInputError(record, "verdict", `must be "exclude" or "caution" (got ${String(flag.verdict)})`);
  }
}

/** Throws ExposureInputError unless the period has a name, a forward span and a list of run types. */
export function validatePeriod(period: DataQualityPeriod, index = 0): void {
  const record = periodLabel(period, index);
  if (typeof period.name !== "string" || period.name === "") {
    throw new ExposureInputError(record, "name", "must be a non-empty string");
  }
  const start = requireFinite(record, "startMs", period.startMs);
  const end = requireFinite(record, "endMs", period.endMs);
  if (end <= start) throw new ExposureInputError(record, "endMs", "must be after startMs (period ends at or before it starts)");
  if (!Array.isArray(period.runTypes) || period.runTypes.some((t) => typeof t !== "string")) {
    throw new ExposureInputError(record, "runTypes", "must be a list of run type names");
  }
}

/** Validates every run, flag and period, throwing on the first bad record. */
export function validateExposureInputs(
  runs: readonly ExposureRun[],
  flags: readonly ExposureFlag[],
  periods: readonly DataQualityPeriod[],
): void {
  runs.forEach((run) => validateRun(run));
  flags.forEach((flag, i) => validateFlag(flag, i));
  periods.forEach((period, i) => validatePeriod(period, i));
}
