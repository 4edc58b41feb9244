// Oxygen-deficiency estimate for a cryogen spill into a closed room. The liquid boils off into
// gas (volume × expansion ratio) and lowers the oxygen fraction. How much depends on what the
// room air does, so three limiting models are reported and the lowest is taken as the worst case:
//   displacement: gas pushes air out without mixing   O2 = 20.9 % · (V − Vg)/V   (floored at 0)
//   mixing:       gas mixes instantly, mixture leaves  O2 = 20.9 % · exp(−Vg/V)
//   sealed:       nothing leaves, gas adds volume      O2 = 20.9 % · V/(V + Vg)
// (mixing follows from dN_air/dVg = −N_air/V for a well-mixed room with outflow.)
// With ventilation Q for a time t after the release, the well-mixed room's inert-gas excess
// x0 = 1 − exp(−Vg/V) is diluted by fresh air as x(t) = x0 · exp(−Q·t/V), O2 = 20.9 % · (1 − x(t)).

import { SafetyInputError, requireNonNegative, requirePositive } from "./errors";
import { getCryogen, type Cryogen } from "./cryogens";

export { toCubicMetres, fromCubicMetres, roomVolumeM3, METRES_PER_FOOT, type VolumeUnit, type LengthUnit } from "./volume-units";

/** Oxygen fraction of normal air by volume (20.9 %). */
export const AIR_OXYGEN_FRACTION = 0.209;
/** Below this oxygen fraction air is oxygen-deficient (OSHA 29 CFR 1910.134: 19.5 % by volume). */
export const OXYGEN_DEFICIENT_BELOW = 0.195;

/** Which room model an oxygen value was computed with. */
export type OxygenModel = "displacement" | "mixing" | "sealed" | "ventilated";

/** Oxygen fraction under one model and whether it is below the deficiency line. */
export interface OxygenResult {
  model: OxygenModel;
  /** Oxygen fraction by volume, 0–1 (0.209 = 20.9 %). */
  oxygenFraction: number;
  deficient: boolean;
}

/** Inputs of a spill estimate. */
export interface OxygenInput {
  /** Volume of liquid released, litres. */
  liquidLitres: number;
  /** Cryogen id: "nitrogen", "argon" or "xenon". */
  cryogen: string;
  /** Free volume of the room, m³. */
  roomVolumeM3: number;
  /** Fresh-air ventilation rate, m³/h (optional; give with ventilationHours). */
  ventilationM3PerH?: number;
  /** Time the ventilation runs after the release, h (optional; give with ventilationM3PerH). */
  ventilationHours?: number;
}

/** Full result of a spill estimate. */
export interface OxygenEstimate {
  cryogen: Cryogen;
  /** Gas volume at 20 °C and 1 atm, m³. */
  gasVolumeM3: number;
  displacement: OxygenResult;
  mixing: OxygenResult;
  sealed: OxygenResult;
  /** Well-mixed room after ventilation, when a rate and time were given. */
  ventilated?: OxygenResult;
  /** Lowest oxygen among displacement, mixing and sealed (the state right after the release). */
  worst: OxygenResult;
}

function result(model: OxygenModel, oxygenFraction: number): OxygenResult {
  return { model, oxygenFraction, deficient: oxygenFraction < OXYGEN_DEFICIENT_BELOW };
}

function checkVolumes(gasM3: number, roomM3: number): void {
  requireNonNegative(gasM3, "gasVolumeM3");
  requirePositive(roomM3, "roomVolumeM3");
}

/** Gas volume in m³ (20 °C, 1 atm) from `liquidLitres` of the named cryogen. */
export function gasVolumeFromLiquidM3(liquidLitres: number, cryogen: string): number {
  requireNonNegative(liquidLitres, "liquidLitres");
  return liquidLitres * 1e-3 * getCryogen(cryogen).expansionRatio;
}

/** Oxygen fraction if the gas displaces room air without mixing (0 once the room is full of gas). */
export function displacementOxygen(gasM3: number, roomM3: number): number {
  checkVolumes(gasM3, roomM3);
  return AIR_OXYGEN_FRACTION * Math.max(0, (roomM3 - gasM3) / roomM3);
}

/** Oxygen fraction if the gas mixes instantly and the mixture flows out as gas enters. */
export function mixingOxygen(gasM3: number, roomM3: number): number {
  checkVolumes(gasM3, roomM3);
  return AIR_OXYGEN_FRACTION * Math.exp(-gasM3 / roomM3);
}

/** Oxygen fraction if no air leaves the room and the gas adds to its contents. */
export function sealedOxygen(gasM3: number, roomM3: number): number {
  checkVolumes(gasM3, roomM3);
  return (AIR_OXYGEN_FRACTION * roomM3) / (roomM3 + gasM3);
}

/** Oxygen fraction in a well-mixed room `hours` after the release with fresh air at `qM3PerH`. */
export function ventilatedOxygen(gasM3: number, roomM3: number, qM3PerH: number, hours: number): number {
  checkVolumes(gasM3, roomM3);
  requireNonNegative(qM3PerH, "ventilationM3PerH");
  requireNonNegative(hours, "ventilationHours");
  const inertAtRelease = 1 - Math.exp(-gasM3 / roomM3);
  return AIR_OXYGEN_FRACTION * (1 - inertAtRelease * Math.exp((-qM3PerH * hours) / roomM3));
}

// Inverts the ventilated model: t = (V/Q)·ln(x0 / (1 − threshold/20.9 %)); 0 if it never dropped below.
/** Hours of ventilation at `qM3PerH` until the well-mixed room is back at `threshold` oxygen. */
export function ventilationHoursToRecover(gasM3: number, roomM3: number, qM3PerH: number, threshold = OXYGEN_DEFICIENT_BELOW): number {
  checkVolumes(gasM3, roomM3);
  requirePositive(qM3PerH, "ventilationM3PerH");
  if (!(threshold > 0 && threshold < AIR_OXYGEN_FRACTION)) {
    throw new SafetyInputError("OUT_OF_RANGE", "threshold", `must be between 0 and ${AIR_OXYGEN_FRACTION}, got ${threshold}`);
  }
  const inertAtRelease = 1 - Math.exp(-gasM3 / roomM3);
  const inertAllowed = 1 - threshold / AIR_OXYGEN_FRACTION;
  if (inertAtRelease <= inertAllowed) return 0;
  return (roomM3 / qM3PerH) * Math.log(inertAtRelease / inertAllowed);
}

/** Oxygen estimate for a spill under all three room models, plus ventilation if given. */
export function estimateOxygen(input: OxygenInput): OxygenEstimate {
  const cryogen = getCryogen(input.cryogen);
  const gasVolumeM3 = gasVolumeFromLiquidM3(input.liquidLitres, cryogen.id);
  requirePositive(input.roomVolumeM3, "roomVolumeM3");
  const room = input.roomVolumeM3;
  const displacement = result("displacement", displacementOxygen(gasVolumeM3, room));
  const mixing = result("mixing", mixingOxygen(gasVolumeM3, room));
  const sealed = result("sealed", sealedOxygen(gasVolumeM3, room));
  const worst = [displacement, mixing, sealed].reduce((a, b) => (b.oxygenFraction < a.oxygenFraction ? b : a));

  const { ventilationM3PerH: q, ventilationHours: hours } = input;
  if ((q === undefined) !== (hours === undefined)) {
    const missing = q === undefined ? "ventilationM3PerH" : "ventilationHours";
    throw new SafetyInputError("MISSING", missing, "ventilation needs both a rate (m³/h) and a time (h)");
  }
  const ventilated = q !== undefined && hours !== undefined
    ? result("ventilated", ventilatedOxygen(gasVolumeM3, room, q, hours))
    : undefined;

  return { cryogen, gasVolumeM3, displacement, mixing, sealed, ...(ventilated ? { ventilated } : {}), worst };
}
