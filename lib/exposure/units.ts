/**
 * Exposure units. kg·day is what the run bookkeeping yields; tonne·year is what results quote.
 * The year is the Julian year of 365.25 days (IAU convention), so 1 t·yr = 1000 kg × 365.25 d.
 */

/** Seconds in one day (86 400). */
export const SECONDS_PER_DAY = 86_400;

/** Milliseconds in one day. */
export const MS_PER_DAY = SECONDS_PER_DAY * 1000;

/** Days in a Julian year (365.25). */
export const DAYS_PER_JULIAN_YEAR = 365.25;

/** kg·day in one tonne·year: 1000 kg × 365.25 d = 365 250. */
export const KG_DAY_PER_TONNE_YEAR = 1000 * DAYS_PER_JULIAN_YEAR;

/** Converts an exposure in kg·day to tonne·year (Julian year). */
export function kgDayToTonneYear(kgDay: number): number {
  return kgDay / KG_DAY_PER_TONNE_YEAR;
}

/** Converts an exposure in tonne·year (Julian year) to kg·day. */
export function tonneYearToKgDay(tonneYear: number): number {
  return tonneYear * KG_DAY_PER_TONNE_YEAR;
}

/** Exposure in kg·day of `liveSeconds` of live time on `massKg`: live / 86 400 × mass, in that order. */
export function liveSecondsToKgDay(liveSeconds: number, massKg: number): number {
  return (liveSeconds / SECONDS_PER_DAY) * massKg;
}
