/**
 * Flags are sorted and merged once per computation: exposure only needs the union of excluding time
 * (overlapping exclusions must not be subtracted twice) and, for display, the union of caution time.
 */
import { mergeIntervals } from "./intervals";
import type { ExposureFlag, Interval } from "./types";
import { validateFlag } from "./validate";

/** Merged flag time, ready for sweeping runs against. */
export interface FlagUnion {
  /** Union of "exclude" flags, sorted and coalesced. */
  exclude: Interval[];
  /** Union of "caution" flags, sorted and coalesced. */
  caution: Interval[];
}

/** Validates the flags and merges them by verdict, O(F log F). */
export function buildFlagUnion(flags: readonly ExposureFlag[]): FlagUnion {
  flags.forEach((flag, i) => validateFlag(flag, i));
  return mergeFlagsUnchecked(flags);
}

/** Same as buildFlagUnion for flags already validated by the caller. */
export function mergeFlagsUnchecked(flags: readonly ExposureFlag[]): FlagUnion {
  const exclude: Interval[] = [];
  const caution: Interval[] = [];
  for (const flag of flags) {
    (flag.verdict === "exclude" ? exclude : caution).push({ startMs: flag.startMs, endMs: flag.endMs });
  }
  return { exclude: mergeIntervals(exclude), caution: mergeIntervals(caution) };
}
