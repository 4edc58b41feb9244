// Cryogens that can be spilled in an underground lab and how much gas one litre of liquid makes.
// The expansion ratio is liquid density (at the normal boiling point) over gas density at 20 °C
// and 1 atm. The gas density is taken as ideal (ρ = M·p/(R·T)); real gases at these conditions are
// a few tenths of a percent denser, so the ideal value slightly overstates the gas volume, which
// errs on the safe side for an oxygen-deficiency estimate.

import { SafetyInputError } from "./errors";

/** Cryogens the oxygen estimate knows about. */
export type CryogenId = "nitrogen" | "argon" | "xenon";

/** Physical data for one cryogen. */
export interface Cryogen {
  id: CryogenId;
  name: string;
  /** Molar mass, g/mol. */
  molarMassGPerMol: number;
  /** Liquid density at the normal boiling point, kg/m³. */
  liquidDensityKgM3: number;
  /** Normal boiling point, K. */
  boilingPointK: number;
  /** Volume of gas at 20 °C and 1 atm per volume of liquid, rounded to three figures. */
  expansionRatio: number;
  /** Where the numbers come from. */
  source: string;
}

/** Gas constant, J/(mol·K) (exact since the 2019 SI redefinition). */
export const GAS_CONSTANT = 8.314462618;
/** Reference temperature for the gas volume: 20 °C. */
export const REFERENCE_TEMPERATURE_K = 293.15;
/** Reference pressure for the gas volume: one standard atmosphere. */
export const REFERENCE_PRESSURE_PA = 101_325;

/** Ideal-gas density in kg/m³ at 20 °C and 1 atm for a gas of molar mass `molarMassGPerMol`. */
export function idealGasDensityKgM3(molarMassGPerMol: number): number {
  return (molarMassGPerMol * 1e-3 * REFERENCE_PRESSURE_PA) / (GAS_CONSTANT * REFERENCE_TEMPERATURE_K);
}

const MEMORY = "molar mass: IUPAC standard atomic weights; liquid density: cryogenic handbook values (both from memory)";

/** The cryogen table. Expansion ratios follow from the densities (N2 694 is also the figure common practice quotes). */
export const CRYOGENS: Readonly<Record<CryogenId, Cryogen>> = Object.freeze({
  nitrogen: Object.freeze({
    id: "nitrogen", name: "Nitrogen (LN2)", molarMassGPerMol: 28.0134, liquidDensityKgM3: 808, boilingPointK: 77.36,
    expansionRatio: 694, source: MEMORY,
  }),
  argon: Object.freeze({
    id: "argon", name: "Argon (LAr)", molarMassGPerMol: 39.948, liquidDensityKgM3: 1395, boilingPointK: 87.30,
    expansionRatio: 840, source: MEMORY,
  }),
  // 519 is sometimes quoted for xenon; it matches liquid at the triple point (3057 kg/m³) over gas
  // at 0 °C (5.89 kg/m³), not the 20 °C basis used here.
  xenon: Object.freeze({
    id: "xenon", name: "Xenon (LXe)", molarMassGPerMol: 131.293, liquidDensityKgM3: 2942, boilingPointK: 165.05,
    expansionRatio: 539, source: MEMORY,
  }),
});

/** Returns the cryogen with this id (case-insensitive) or throws UNKNOWN_CRYOGEN. */
export function getCryogen(id: string): Cryogen {
  const key = typeof id === "string" ? id.trim().toLowerCase() : "";
  const found = Object.prototype.hasOwnProperty.call(CRYOGENS, key) ? CRYOGENS[key as CryogenId] : undefined;
  if (!found) throw new SafetyInputError("UNKNOWN_CRYOGEN", "cryogen", `unknown cryogen "${String(id)}" (known: nitrogen, argon, xenon)`);
  return found;
}
