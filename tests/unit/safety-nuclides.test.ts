import { describe, it, expect } from "vitest";
import { NUCLIDES, getNuclide, durationToSeconds, SECONDS_PER_JULIAN_YEAR } from "@/lib/safety/nuclides";
import { SafetyInputError } from "@/lib/safety/errors";

// Half-lives as published in ENSDF and shown by NuDat 3 (from memory). Value, standard
// uncertainty in the last digits written out, unit.
const ENSDF_HALF_LIVES = [
  { id: "Cs-137", value: 30.08, uncertainty: 0.09, unit: "y" }, // ENSDF via NuDat 3: 30.08(9) y (from memory)
  { id: "Co-60", value: 5.2714, uncertainty: 0.0005, unit: "y" }, // ENSDF via NuDat 3: 5.2714(5) y (from memory)
  { id: "Am-241", value: 432.6, uncertainty: 0.6, unit: "y" }, // ENSDF via NuDat 3: 432.6(6) y (from memory)
  { id: "Na-22", value: 2.6018, uncertainty: 0.0022, unit: "y" }, // ENSDF via NuDat 3: 2.6018(22) y (from memory)
  { id: "Ba-133", value: 10.551, uncertainty: 0.011, unit: "y" }, // ENSDF via NuDat 3: 10.551(11) y (from memory)
  { id: "Th-228", value: 1.9116, uncertainty: 0.0016, unit: "y" }, // ENSDF via NuDat 3: 1.9116(16) y (from memory)
  { id: "Ra-226", value: 1600, uncertainty: 7, unit: "y" }, // ENSDF via NuDat 3: 1600(7) y (from memory)
  { id: "Cf-252", value: 2.645, uncertainty: 0.008, unit: "y" }, // ENSDF via NuDat 3: 2.645(8) y (from memory)
  { id: "Y-88", value: 106.626, uncertainty: 0.021, unit: "d" }, // ENSDF via NuDat 3: 106.626(21) d (from memory)
  { id: "Rb-83", value: 86.2, uncertainty: 0.1, unit: "d" }, // ENSDF via NuDat 3: 86.2(1) d (from memory)
  { id: "Kr-83m", value: 1.83, uncertainty: 0.02, unit: "h" }, // ENSDF via NuDat 3: 1.83(2) h (from memory)
  { id: "Rn-220", value: 55.6, uncertainty: 0.1, unit: "s" }, // ENSDF via NuDat 3: 55.6(1) s (from memory)
] as const;

describe("nuclide table against ENSDF/NuDat 3", () => {
  it.each(ENSDF_HALF_LIVES)("$id half-life is $value $unit ± $uncertainty", ({ id, value, uncertainty, unit }) => {
    const n = getNuclide(id);
    expect(n.halfLife).toEqual({ value, uncertainty, unit });
  });

  it("every row names its source and says it was entered from memory", () => {
    for (const n of NUCLIDES) expect(n.source).toMatch(/NuDat 3.*\(from memory\)/);
  });

  it("holds the thirteen calibration nuclides, each id once", () => {
    const ids = NUCLIDES.map((n) => n.id).sort();
    // The calibration set a liquid-xenon/germanium lab keeps (common practice).
    expect(ids).toEqual(
      ["Am-241", "Am-Be", "Ba-133", "Cf-252", "Co-60", "Cs-137", "Kr-83m", "Na-22", "Ra-226", "Rb-83", "Rn-220", "Th-228", "Y-88"],
    );
  });

  it("gives Am-Be the Am-241 half-life (the neutron yield follows the alpha emitter; common practice)", () => {
    expect(getNuclide("Am-Be").halfLifeS).toBe(getNuclide("Am-241").halfLifeS);
  });

  it.each([
    { id: "Kr-83m", form: "gaseous" }, // injected into the detector gas (common practice)
    { id: "Rn-220", form: "gaseous" }, // emanated into the detector gas (common practice)
    { id: "Cs-137", form: "sealed" }, // sealed gamma capsule (common practice)
    { id: "Rb-83", form: "sealed" }, // held in the generator, not injected (common practice)
  ])("$id is typically $form", ({ id, form }) => {
    expect(getNuclide(id).form).toBe(form);
  });
});

describe("half-life in seconds (Julian year of 365.25 d)", () => {
  it.each([
    { id: "Cs-137", seconds: 949_252_608, sigma: 2_840_184 }, // 30.08 × 31 557 600 s; 0.09 × 31 557 600 s (IAU Julian year)
    { id: "Y-88", seconds: 9_212_486.4, sigma: 1_814.4 }, // 106.626 × 86 400 s; 0.021 × 86 400 s
    { id: "Kr-83m", seconds: 6_588, sigma: 72 }, // 1.83 × 3600 s; 0.02 × 3600 s
    { id: "Rn-220", seconds: 55.6, sigma: 0.1 }, // already in seconds
  ])("$id: $seconds s ± $sigma s", ({ id, seconds, sigma }) => {
    const n = getNuclide(id);
    expect(n.halfLifeS).toBeCloseTo(seconds, 3);
    expect(n.halfLifeSigmaS).toBeCloseTo(sigma, 6);
  });

  it("uses 31 557 600 s per year (365.25 × 86 400, the IAU Julian year)", () => {
    expect(SECONDS_PER_JULIAN_YEAR).toBe(31_557_600);
    expect(durationToSeconds(2, "min")).toBe(120); // 60 s per minute (SI)
  });
});

describe("nuclide lookup", () => {
  it.each([
    { label: "lower case, no hyphen", input: "cs137", id: "Cs-137" },
    { label: "upper case", input: "AM-BE", id: "Am-Be" },
    { label: "space instead of hyphen", input: "Kr 83m", id: "Kr-83m" },
  ])("resolves $label ($input)", ({ input, id }) => {
    expect(getNuclide(input).id).toBe(id);
  });

  it.each([
    { label: "unknown nuclide", input: "Xx-999" },
    { label: "empty string", input: "" },
  ])("rejects $label with UNKNOWN_NUCLIDE", ({ input }) => {
    expect(() => getNuclide(input)).toThrow(SafetyInputError);
    expect(() => getNuclide(input)).toThrow(expect.objectContaining({ code: "UNKNOWN_NUCLIDE", field: "nuclide" }));
  });
});
