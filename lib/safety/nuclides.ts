// Built-in half-life table for the calibration sources a dark-matter detector lab keeps.
// The values were entered from memory of the ENSDF evaluations as shown by NuDat 3; each row
// says so in its `source`, so a reviewer knows to check them against the database before
// relying on them for a regulatory record.

import { SafetyInputError } from "./errors";

/** Seconds in one day. */
export const SECONDS_PER_DAY = 86_400;
/** Julian year (365.25 d) in seconds: the year used for every "y" half-life in this table. */
export const SECONDS_PER_JULIAN_YEAR = 365.25 * SECONDS_PER_DAY;

/** Unit a half-life is quoted in. */
export type HalfLifeUnit = "s" | "min" | "h" | "d" | "y";

const SECONDS_PER_UNIT: Readonly<Record<HalfLifeUnit, number>> = {
  s: 1,
  min: 60,
  h: 3_600,
  d: SECONDS_PER_DAY,
  y: SECONDS_PER_JULIAN_YEAR,
};

/** Converts a duration in `unit` to seconds (years are Julian, 365.25 d). */
export function durationToSeconds(value: number, unit: HalfLifeUnit): number {
  const factor = SECONDS_PER_UNIT[unit];
  if (factor === undefined) throw new SafetyInputError("UNKNOWN_UNIT", "unit", `unknown time unit "${String(unit)}"`);
  return value * factor;
}

/** How the nuclide is usually handled in the lab: a sealed capsule or a gas injected into the detector. */
export type SourceForm = "sealed" | "gaseous";

/** One row of the nuclide table. */
export interface Nuclide {
  /** Short identifier, e.g. "Cs-137", "Am-Be". */
  id: string;
  /** Name shown on pages. */
  name: string;
  /** Half-life as quoted: value, standard uncertainty (same unit) and unit. */
  halfLife: { value: number; uncertainty: number; unit: HalfLifeUnit };
  /** Half-life in seconds. */
  halfLifeS: number;
  /** Standard uncertainty of the half-life in seconds. */
  halfLifeSigmaS: number;
  /** Typical physical form of the calibration source. */
  form: SourceForm;
  /** Where the half-life comes from. */
  source: string;
  /** Anything a user of the value should know. */
  note?: string;
}

const NUDAT_FROM_MEMORY = "ENSDF via NuDat 3 (from memory)";

function row(
  id: string,
  name: string,
  value: number,
  uncertainty: number,
  unit: HalfLifeUnit,
  form: SourceForm,
  note?: string,
): Nuclide {
  return {
    id,
    name,
    halfLife: { value, uncertainty, unit },
    halfLifeS: durationToSeconds(value, unit),
    halfLifeSigmaS: durationToSeconds(uncertainty, unit),
    form,
    source: NUDAT_FROM_MEMORY,
    ...(note === undefined ? {} : { note }),
  };
}

/** The built-in nuclide table, in the order pages list it. */
export const NUCLIDES: readonly Nuclide[] = Object.freeze([
  row("Cs-137", "Caesium-137", 30.08, 0.09, "y", "sealed"),
  row("Co-60", "Cobalt-60", 5.2714, 0.0005, "y", "sealed",
    "Some evaluations quote 1925.28 d (about 5.2711 y); this table keeps 5.2714(5) y."),
  row("Am-241", "Americium-241", 432.6, 0.6, "y", "sealed"),
  row("Am-Be", "Americium-beryllium neutron source", 432.6, 0.6, "y", "sealed",
    "(alpha,n) neutron source; its activity follows the Am-241 half-life."),
  row("Kr-83m", "Krypton-83m", 1.83, 0.02, "h", "gaseous",
    "Injected into the detector gas from a Rb-83 generator."),
  row("Rn-220", "Radon-220", 55.6, 0.1, "s", "gaseous",
    "Emanated from a Th-228 source and carried into the detector gas."),
  row("Rb-83", "Rubidium-83", 86.2, 0.1, "d", "sealed",
    "Parent of Kr-83m; held in the generator (e.g. on zeolite), not injected itself."),
  row("Th-228", "Thorium-228", 1.9116, 0.0016, "y", "sealed"),
  row("Na-22", "Sodium-22", 2.6018, 0.0022, "y", "sealed"),
  row("Ba-133", "Barium-133", 10.551, 0.011, "y", "sealed"),
  row("Cf-252", "Californium-252", 2.645, 0.008, "y", "sealed",
    "Total half-life (alpha decay and spontaneous fission together)."),
  row("Ra-226", "Radium-226", 1600, 7, "y", "sealed"),
  row("Y-88", "Yttrium-88", 106.626, 0.021, "d", "sealed"),
].map((n) => Object.freeze(n)));

// Lookup ignores case, hyphens and spaces so "cs137", "CS-137" and "Am Be" all resolve.
function normaliseId(id: string): string {
  return id.toLowerCase().replace(/[\s-]/g, "");
}

const BY_ID: ReadonlyMap<string, Nuclide> = new Map(NUCLIDES.map((n) => [normaliseId(n.id), n]));

/** Returns the nuclide with this id (case, hyphens and spaces ignored) or throws UNKNOWN_NUCLIDE. */
export function getNuclide(id: string): Nuclide {
  const found = typeof id === "string" ? BY_ID.get(normaliseId(id)) : undefined;
  if (!found) throw new SafetyInputError("UNKNOWN_NUCLIDE", "nuclide", `no nuclide "${String(id)}" in the built-in table`);
  return found;
}
