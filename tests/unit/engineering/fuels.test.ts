import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  FUEL_KINDS,
  FUEL_KIND_LABELS,
  GASOLINE,
  ETHANOL,
  METHANOL,
  ethanolBlend,
  fuelProperties,
} from "@/lib/engineering/fuels";

// IUPAC standard atomic weights (conventional values, 2013 onwards): C 12.011, H 1.008, O 15.999.
const C = 12.011;
const H = 1.008;
const O = 15.999;
// Dry air: O2 mole fraction 0.209476 and mean molar mass 28.9644 g/mol (U.S. Standard Atmosphere 1976, from
// memory), so the O2 mass fraction is 0.209476 x 31.998 / 28.9644 = 0.2314.
const O2_MASS_FRACTION_OF_AIR = (0.209476 * (2 * O)) / 28.9644;

/** Stoichiometric air-fuel ratio of a CxHyOz fuel by hand: x + y/4 - z/2 moles of O2 per mole of fuel. */
function stoichFromFormula(x: number, y: number, z: number): number {
  const fuelMass = x * C + y * H + z * O;
  const o2Mass = (x + y / 4 - z / 2) * 2 * O;
  return o2Mass / O2_MASS_FRACTION_OF_AIR / fuelMass;
}

describe("pure fuels", () => {
  it("uses the air's O2 share the chemistry needs", () => {
    // The usual engineering figure for dry air: 23.14 % oxygen by mass (from memory)
    expect(O2_MASS_FRACTION_OF_AIR).toBeCloseTo(0.2314, 4);
  });

  it("gives ethanol its stoichiometric ratio", () => {
    // C2H5OH + 3 O2 -> 2 CO2 + 3 H2O: 3 x 31.998 / 0.2314 / 46.069 = 9.00
    expect(stoichFromFormula(2, 6, 1)).toBeCloseTo(9.0, 1);
    expect(ETHANOL.stoichAfr).toBeCloseTo(stoichFromFormula(2, 6, 1), 1);
  });

  it("gives methanol its stoichiometric ratio", () => {
    // CH3OH + 1.5 O2 -> CO2 + 2 H2O: 1.5 x 31.998 / 0.2314 / 32.042 = 6.47
    expect(stoichFromFormula(1, 4, 1)).toBeCloseTo(6.47, 2);
    expect(METHANOL.stoichAfr).toBeCloseTo(stoichFromFormula(1, 4, 1), 2);
  });

  it("gives gasoline a ratio in the textbook band", () => {
    // Heywood, appendix D: 14.6 for a typical gasoline; 14.7 is what gasoline lambda readouts scale by
    // (common practice, no published source)
    expect(GASOLINE.stoichAfr).toBeGreaterThanOrEqual(14.6);
    expect(GASOLINE.stoichAfr).toBeLessThanOrEqual(14.7);
    // Cross-check by chemistry for a CH1.87 surrogate (Heywood's average gasoline formula, from memory): 14.6
    expect(Math.abs(GASOLINE.stoichAfr - stoichFromFormula(1, 1.87, 0))).toBeLessThan(0.15);
  });

  it("gives densities within the published figures", () => {
    // CRC Handbook of Chemistry and Physics, 20 °C (from memory): ethanol 0.7893 g/cm³, methanol 0.7914 g/cm³
    expect(ETHANOL.densityKgM3).toBeCloseTo(789.3, -1);
    expect(METHANOL.densityKgM3).toBeCloseTo(791.4, -1);
    // EN 228 gasoline, 15 °C (from memory): 720-775 kg/m³
    expect(GASOLINE.densityKgM3).toBeGreaterThanOrEqual(720);
    expect(GASOLINE.densityKgM3).toBeLessThanOrEqual(775);
  });
});

describe("ethanol blends", () => {
  it("gives E85 the commonly quoted ratio", () => {
    // Commonly quoted E85 stoichiometric ratio: about 9.8:1 (from memory; figures of 9.7-9.8 are published)
    expect(ethanolBlend(85).stoichAfr).toBeGreaterThan(9.7);
    expect(ethanolBlend(85).stoichAfr).toBeLessThan(9.9);
  });

  it("gives E10 the commonly quoted ratio", () => {
    // Commonly quoted E10 stoichiometric ratio: about 14.1:1 (from memory)
    expect(ethanolBlend(10).stoichAfr).toBeCloseTo(14.1, 1);
  });

  it("adds the air requirement by mass, not by volume", () => {
    // By hand, E50 with 789 and 745 kg/m³ (CRC, EN 228 figures above): ethanol mass fraction
    // 394.5 / (394.5 + 372.5) = 0.51434; 0.51434 x 9.0 + 0.48566 x 14.7 = 11.768
    expect(ethanolBlend(50).stoichAfr).toBeCloseTo(11.768, 3);
    // A volume-weighted mix would give 11.85; the two must differ.
    expect(Math.abs(ethanolBlend(50).stoichAfr - 11.85)).toBeGreaterThan(0.05);
    // Density mixes by volume: (789 + 745) / 2 = 767 kg/m³
    expect(ethanolBlend(50).densityKgM3).toBeCloseTo(767, 9);
  });

  it("meets the pure fuels at 0 and 100 %", () => {
    expect(ethanolBlend(0).stoichAfr).toBeCloseTo(GASOLINE.stoichAfr, 12);
    expect(ethanolBlend(100).stoichAfr).toBeCloseTo(ETHANOL.stoichAfr, 12);
    expect(ethanolBlend(100).densityKgM3).toBeCloseTo(ETHANOL.densityKgM3, 9);
  });

  it("names the blend", () => {
    expect(ethanolBlend(85).name).toBe("E85");
    expect(ethanolBlend(12.5).name).toBe("E12.5");
  });

  it("needs less air per kilogram of fuel as ethanol rises", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (a, b) => {
        fc.pre(b - a > 1e-6); // below that the two ratios round to the same double
        expect(ethanolBlend(b).stoichAfr).toBeLessThan(ethanolBlend(a).stoichAfr);
      }),
    );
  });
});

describe("fuelProperties", () => {
  it("lists every kind for forms", () => {
    expect([...FUEL_KINDS].sort()).toEqual(["blend", "custom", "ethanol", "gasoline", "methanol"]);
    for (const kind of FUEL_KINDS) expect(FUEL_KIND_LABELS[kind].length).toBeGreaterThan(0);
  });

  it("returns each kind", () => {
    expect(fuelProperties({ kind: "gasoline" })).toEqual(GASOLINE);
    expect(fuelProperties({ kind: "ethanol" })).toEqual(ETHANOL);
    expect(fuelProperties({ kind: "methanol" })).toEqual(METHANOL);
    expect(fuelProperties({ kind: "blend", ethanolPct: 85 }).name).toBe("E85");
    // Demo data: an invented fuel.
    expect(fuelProperties({ kind: "custom", densityKgM3: 760, stoichAfr: 13.5, name: "Race fuel" })).toEqual({
      name: "Race fuel",
      densityKgM3: 760,
      stoichAfr: 13.5,
    });
    expect(fuelProperties({ kind: "custom", densityKgM3: 760, stoichAfr: 13.5 }).name).toBe("Custom fuel");
  });

  it("does not hand out its constants for callers to change", () => {
    const g = fuelProperties({ kind: "gasoline" });
    g.stoichAfr = 1;
    expect(fuelProperties({ kind: "gasoline" }).stoichAfr).not.toBe(1);
  });

  it("refuses out-of-range inputs, naming the field", () => {
    expect(() => fuelProperties({ kind: "blend", ethanolPct: 101 })).toThrow(/ethanolPct/);
    expect(() => fuelProperties({ kind: "blend", ethanolPct: -1 })).toThrow(RangeError);
    expect(() => fuelProperties({ kind: "blend", ethanolPct: Number.NaN })).toThrow(/ethanolPct/);
    // A density typed in g/cc instead of kg/m³
    expect(() => fuelProperties({ kind: "custom", densityKgM3: 0.76, stoichAfr: 14 })).toThrow(/densityKgM3/);
    // A lambda typed where the ratio belongs
    expect(() => fuelProperties({ kind: "custom", densityKgM3: 760, stoichAfr: 0.8 })).toThrow(/stoichAfr/);
  });
});
