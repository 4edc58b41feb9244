import { describe, it, expect } from "vitest";
import {
  AIR_OXYGEN_FRACTION,
  OXYGEN_DEFICIENT_BELOW,
  displacementOxygen,
  estimateOxygen,
  fromCubicMetres,
  mixingOxygen,
  roomVolumeM3,
  sealedOxygen,
  toCubicMetres,
  ventilatedOxygen,
  ventilationHoursToRecover,
  type VolumeUnit,
} from "@/lib/safety/oxygen";
import { CRYOGENS, getCryogen, idealGasDensityKgM3 } from "@/lib/safety/cryogens";
import { SafetyInputError } from "@/lib/safety/errors";

describe("volume units (1 ft = 0.3048 m exactly, international yard and pound agreement)", () => {
  it.each([
    { label: "one cubic foot", value: 1, unit: "ft3", m3: 0.028316846592 }, // 0.3048³ exactly
    { label: "a thousand litres", value: 1000, unit: "L", m3: 1 }, // 1 L = 1 dm³ (SI)
    { label: "cubic metres unchanged", value: 2.5, unit: "m3", m3: 2.5 },
  ] satisfies { label: string; value: number; unit: VolumeUnit; m3: number }[])("$label", ({ value, unit, m3 }) => {
    expect(toCubicMetres(value, unit)).toBeCloseTo(m3, 12);
    expect(fromCubicMetres(m3, unit)).toBeCloseTo(value, 9);
  });

  it("a 70 × 70 × 10 ft room is 49 000 ft³ = 1387.525 m³ (49 000 × 0.028316846592)", () => {
    expect(roomVolumeM3(70, 70, 10, "ft")).toBeCloseTo(1387.5254830, 6);
  });
});

describe("cryogen expansion ratios", () => {
  it.each([
    // Ideal-gas density at 20 °C, 1 atm: M·p/(R·T), M from IUPAC atomic weights (from memory).
    { id: "nitrogen", gasKgM3: 1.165 }, // 1.165 kg/m³ (gas tables, from memory)
    { id: "argon", gasKgM3: 1.661 }, // 1.661 kg/m³ (gas tables, from memory)
    { id: "xenon", gasKgM3: 5.458 }, // 131.293e-3 × 101 325 / (8.314463 × 293.15) = 5.458 kg/m³ (ideal gas)
  ])("$id gas density at 20 °C is about $gasKgM3 kg/m³", ({ id, gasKgM3 }) => {
    expect(idealGasDensityKgM3(getCryogen(id).molarMassGPerMol)).toBeCloseTo(gasKgM3, 2);
  });

  it.each([
    { id: "nitrogen", ratio: 694 }, // liquid 808 / gas 1.165 = 693.6; 694 is the figure compressed-gas safety literature quotes (common practice, from memory)
    { id: "argon", ratio: 840 }, // liquid 1395 / gas 1.661 = 839.9 (densities from memory; ~842 also quoted)
    { id: "xenon", ratio: 539 }, // liquid 2942 / gas 5.458 = 539.0 (densities from memory)
  ])("$id: about $ratio volumes of gas per volume of liquid", ({ id, ratio }) => {
    const c = getCryogen(id);
    expect(c.expansionRatio).toBe(ratio);
    // The stored ratio must agree with the stored densities to within 0.2 %.
    const fromDensities = c.liquidDensityKgM3 / idealGasDensityKgM3(c.molarMassGPerMol);
    expect(Math.abs(fromDensities / c.expansionRatio - 1)).toBeLessThan(0.002);
  });

  it("knows exactly nitrogen, argon and xenon", () => {
    expect(Object.keys(CRYOGENS).sort()).toEqual(["argon", "nitrogen", "xenon"]);
  });
});

describe("worked example: 160 L of liquid nitrogen in a 70 × 70 × 10 ft room", () => {
  // Vg = 160 L × 694 = 111 040 L = 111.04 m³; V = 49 000 ft³ = 1387.525 m³; Vg/V = 0.0800274.
  // displacement: 20.9 % × (1 − 0.0800274)  = 20.9 % × 0.919973 = 19.227 %
  // mixing:       20.9 % × exp(−0.0800274)  = 20.9 % × 0.923091 = 19.293 %
  // sealed:       20.9 % / (1 + 0.0800274)  = 20.9 % × 0.925902 = 19.351 %
  // All three are below the OSHA 29 CFR 1910.134 line of 19.5 % and inside 19.2–19.4 %
  // (the range common practice quotes for this example, from memory).
  const estimate = estimateOxygen({ liquidLitres: 160, cryogen: "nitrogen", roomVolumeM3: roomVolumeM3(70, 70, 10, "ft") });

  it("boils off to 111.04 m³ of gas (160 L × 694)", () => {
    expect(estimate.gasVolumeM3).toBeCloseTo(111.04, 9);
  });

  it.each([
    { model: "displacement", percent: 19.227 },
    { model: "mixing", percent: 19.293 },
    { model: "sealed", percent: 19.351 },
  ] as const)("$model model leaves $percent % oxygen, deficient", ({ model, percent }) => {
    const r = estimate[model];
    expect(r.model).toBe(model);
    expect(r.oxygenFraction * 100).toBeCloseTo(percent, 3);
    expect(r.oxygenFraction * 100).toBeGreaterThanOrEqual(19.2);
    expect(r.oxygenFraction * 100).toBeLessThanOrEqual(19.4);
    expect(r.deficient).toBe(true);
  });

  it("reports displacement (19.227 %) as the worst case", () => {
    expect(estimate.worst.model).toBe("displacement");
    expect(estimate.worst.oxygenFraction * 100).toBeCloseTo(19.227, 3);
    expect(estimate.ventilated).toBeUndefined();
  });
});

describe("other spills and the ventilation model", () => {
  it.each([
    // 100 L LAr → 84 m³; sealed: 20.9 % × 500/584 = 17.894 %
    { label: "100 L argon, 500 m³, sealed", gas: 84, room: 500, f: sealedOxygen, percent: 17.894 },
    // 10 L LXe → 5.39 m³; mixing: 20.9 % × exp(−0.0539) = 19.803 %
    { label: "10 L xenon, 100 m³, mixing", gas: 5.39, room: 100, f: mixingOxygen, percent: 19.803 },
    // displacement: 20.9 % × (1 − 0.0539) = 19.773 %
    { label: "10 L xenon, 100 m³, displacement", gas: 5.39, room: 100, f: displacementOxygen, percent: 19.773 },
    // gas larger than the room: nothing but gas left in the displacement picture
    { label: "gas exceeds room, displacement", gas: 150, room: 100, f: displacementOxygen, percent: 0 },
    { label: "no spill, sealed", gas: 0, room: 100, f: sealedOxygen, percent: 20.9 }, // normal air, 20.9 % O2 (common practice)
  ])("$label → $percent %", ({ gas, room, f, percent }) => {
    expect(f(gas, room) * 100).toBeCloseTo(percent, 3);
  });

  it("applies the cryogen's ratio in the full estimate (10 L xenon → 10 × 0.539 = 5.39 m³)", () => {
    const e = estimateOxygen({ liquidLitres: 10, cryogen: "Xenon", roomVolumeM3: 100 });
    expect(e.gasVolumeM3).toBeCloseTo(5.39, 9);
    expect(e.worst.deficient).toBe(false); // 19.773 % ≥ 19.5 % (OSHA 29 CFR 1910.134)
  });

  const room = roomVolumeM3(70, 70, 10, "ft"); // 1387.525 m³
  it.each([
    // well-mixed room: x0 = 1 − 0.923091 = 0.076909; one air change (Q·t = V): x = x0/e = 0.028293 → 20.9 % × 0.971707 = 20.309 %
    { label: "one air change", q: room, hours: 1, percent: 20.309 },
    // no time: same as the mixing model, 19.293 %
    { label: "no time yet", q: room, hours: 0, percent: 19.293 },
    // Q·t = V·ln2 halves the excess: 20.9 % × (1 − 0.038454) = 20.096 %
    { label: "half the excess removed", q: room * Math.LN2, hours: 1, percent: 20.096 },
  ])("$label → $percent %", ({ q, hours, percent }) => {
    expect(ventilatedOxygen(111.04, room, q, hours) * 100).toBeCloseTo(percent, 3);
  });

  it("finds the ventilation time back to 19.5 % (t = V/Q·ln(0.076909/0.066986) = 0.13814 h at one change per hour)", () => {
    const hours = ventilationHoursToRecover(111.04, room, room);
    expect(hours).toBeCloseTo(0.13814, 5);
    expect(ventilatedOxygen(111.04, room, room, hours)).toBeCloseTo(OXYGEN_DEFICIENT_BELOW, 12);
    expect(ventilationHoursToRecover(1, room, room)).toBe(0); // a 1 m³ release never reaches 19.5 %
  });

  it("includes the ventilated state in the estimate when rate and time are given", () => {
    const e = estimateOxygen({ liquidLitres: 160, cryogen: "nitrogen", roomVolumeM3: room, ventilationM3PerH: room, ventilationHours: 1 });
    expect(e.ventilated?.oxygenFraction).toBeCloseTo(0.20309, 5); // as the one-air-change case above
    expect(e.ventilated?.deficient).toBe(false);
    expect(e.worst.model).toBe("displacement"); // ventilation is a later state, not the worst case
  });

  it("uses 20.9 % for air and 19.5 % as the deficiency line (OSHA 29 CFR 1910.134)", () => {
    expect(AIR_OXYGEN_FRACTION).toBe(0.209);
    expect(OXYGEN_DEFICIENT_BELOW).toBe(0.195);
  });
});

describe("bad input is a typed error", () => {
  const base = { liquidLitres: 10, cryogen: "nitrogen", roomVolumeM3: 100 };
  it.each([
    { label: "negative liquid volume", run: () => estimateOxygen({ ...base, liquidLitres: -1 }), code: "NEGATIVE", field: "liquidLitres" },
    { label: "zero room volume", run: () => estimateOxygen({ ...base, roomVolumeM3: 0 }), code: "NOT_POSITIVE", field: "roomVolumeM3" },
    { label: "negative room volume", run: () => sealedOxygen(1, -5), code: "NOT_POSITIVE", field: "roomVolumeM3" },
    { label: "unknown cryogen", run: () => estimateOxygen({ ...base, cryogen: "helium" }), code: "UNKNOWN_CRYOGEN", field: "cryogen" },
    { label: "NaN liquid volume", run: () => estimateOxygen({ ...base, liquidLitres: Number.NaN }), code: "NOT_FINITE", field: "liquidLitres" },
    { label: "rate without time", run: () => estimateOxygen({ ...base, ventilationM3PerH: 100 }), code: "MISSING", field: "ventilationHours" },
    { label: "negative ventilation time", run: () => ventilatedOxygen(1, 100, 100, -1), code: "NEGATIVE", field: "ventilationHours" },
    { label: "zero ventilation rate for recovery", run: () => ventilationHoursToRecover(1, 100, 0), code: "NOT_POSITIVE", field: "ventilationM3PerH" },
    { label: "threshold above air", run: () => ventilationHoursToRecover(1, 100, 1, 0.25), code: "OUT_OF_RANGE", field: "threshold" },
    { label: "unknown volume unit", run: () => toCubicMetres(1, "gal" as VolumeUnit), code: "UNKNOWN_UNIT", field: "unit" },
    { label: "negative room length", run: () => roomVolumeM3(-1, 2, 3, "m"), code: "NEGATIVE", field: "length" },
  ])("$label → $code", ({ run, code, field }) => {
    expect(run).toThrow(SafetyInputError);
    expect(run).toThrow(expect.objectContaining({ code, field }));
  });
});
