// Volume units for the oxygen-deficiency estimate. Rooms are often measured in feet on US-built
// plans; 1 ft = 0.3048 m exactly (international foot), so 1 ft³ = 0.028316846592 m³ exactly.

import { SafetyInputError, requireFinite, requireNonNegative } from "./errors";

/** Volume units accepted by the safety pages. */
export type VolumeUnit = "L" | "m3" | "ft3";

/** Length units for room dimensions. */
export type LengthUnit = "m" | "ft";

/** Metres in one international foot (exact). */
export const METRES_PER_FOOT = 0.3048;

const M3_PER_UNIT: Readonly<Record<VolumeUnit, number>> = {
  L: 1e-3,
  m3: 1,
  ft3: METRES_PER_FOOT ** 3,
};

const M_PER_LENGTH_UNIT: Readonly<Record<LengthUnit, number>> = { m: 1, ft: METRES_PER_FOOT };

function factorFor<U extends string>(table: Readonly<Record<U, number>>, unit: U, field: string): number {
  const factor = Object.prototype.hasOwnProperty.call(table, unit) ? table[unit] : undefined;
  if (factor === undefined) throw new SafetyInputError("UNKNOWN_UNIT", field, `unknown unit "${String(unit)}"`);
  return factor;
}

/** Converts a volume in `unit` to m³. */
export function toCubicMetres(value: number, unit: VolumeUnit): number {
  return requireFinite(value, "value") * factorFor(M3_PER_UNIT, unit, "unit");
}

/** Converts a volume in m³ to `unit`. */
export function fromCubicMetres(m3: number, unit: VolumeUnit): number {
  return requireFinite(m3, "m3") / factorFor(M3_PER_UNIT, unit, "unit");
}

/** Volume in m³ of a box-shaped room measured in `unit`. */
export function roomVolumeM3(length: number, width: number, height: number, unit: LengthUnit): number {
  const f = factorFor(M_PER_LENGTH_UNIT, unit, "unit");
  return requireNonNegative(length, "length") * f * (requireNonNegative(width, "width") * f) * (requireNonNegative(height, "height") * f);
}
