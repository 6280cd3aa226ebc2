import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  UNITS_BY_KIND,
  type QuantityKind,
  type UnitsByKind,
  toSI,
  fromSI,
  pressure,
  gaugePressure,
  absolutePressure,
  gaugeFromAbsolute,
  toGauge,
} from "@/lib/engineering/units";

// Standard gravity: 9.806 65 m/s² (CGPM 1901; NIST SP 811, appendix B.8 note).
const G_N = 9.80665;

describe("toSI", () => {
  it("converts lengths", () => {
    // NIST SP 811, B.8: inch = 2.54 E-02 m exactly
    expect(toSI("length", 1, "in")).toBeCloseTo(0.0254, 15);
    expect(toSI("length", 25.4, "mm")).toBeCloseTo(0.0254, 15);
    expect(toSI("length", 3, "m")).toBe(3);
  });

  it("converts areas", () => {
    // NIST SP 811, B.8: square inch = 6.4516 E-04 m² exactly
    expect(toSI("area", 1, "in²")).toBeCloseTo(6.4516e-4, 15);
    expect(toSI("area", 645.16, "mm²")).toBeCloseTo(6.4516e-4, 15);
  });

  it("converts pressures", () => {
    // NIST SP 811, B.8: pound-force per square inch = 6.894 757 E+03 Pa
    expect(toSI("pressure", 1, "psi")).toBeCloseTo(6894.757, 3);
    // NIST SP 811, B.8: bar = 1.0 E+05 Pa
    expect(toSI("pressure", 1, "bar")).toBe(100000);
    expect(toSI("pressure", 1, "kPa")).toBe(1000);
    // NIST SP 811, B.8: inch of mercury, conventional = 3.386 389 E+03 Pa
    expect(toSI("pressure", 1, "inHg")).toBeCloseTo(3386.389, 3);
    // Conventional inch of mercury by definition: 13 595.1 kg/m³ x g_n x 0.0254 m
    expect(toSI("pressure", 1, "inHg")).toBeCloseTo(13595.1 * G_N * 0.0254, 2);
    // NIST SP 811, B.8: inch of water, conventional = 2.490 889 E+02 Pa (= 1000 kg/m³ x g_n x 0.0254 m)
    expect(toSI("pressure", 1, "inH2O")).toBeCloseTo(249.0889, 4);
    expect(toSI("pressure", 1, "inH2O")).toBeCloseTo(1000 * G_N * 0.0254, 3);
    // NIST SP 811, B.8: inch of water (39.2 °F) = 2.490 82 E+02 Pa; the conventional value is within 0.01 Pa of it
    expect(Math.abs(toSI("pressure", 1, "inH2O") - 249.082)).toBeLessThan(0.01);
  });

  it("converts fuel mass flows", () => {
    // NIST SP 811, B.8: pound (avoirdupois) = 4.535 923 7 E-01 kg exactly
    expect(toSI("massFlow", 3600, "lb/h")).toBeCloseTo(0.45359237, 12);
    expect(toSI("massFlow", 3600, "kg/h")).toBeCloseTo(1, 12);
    expect(toSI("massFlow", 1000, "g/s")).toBeCloseTo(1, 12);
  });

  it("converts fuel volume flows", () => {
    // NIST SP 811, B.8: gallon (U.S.) = 3.785 412 E-03 m³ (231 in³ exactly)
    expect(toSI("volumeFlow", 3600, "gal/h")).toBeCloseTo(231 * 0.0254 ** 3, 12);
    expect(toSI("volumeFlow", 3600, "gal/h")).toBeCloseTo(3.785412e-3, 9);
    // cubic centimetre = 1 E-06 m³; minute = 60 s (SI Brochure, non-SI units accepted for use)
    expect(toSI("volumeFlow", 60, "cc/min")).toBeCloseTo(1e-6, 15);
    expect(toSI("volumeFlow", 3600, "L/h")).toBeCloseTo(1e-3, 15);
  });

  it("converts temperatures as points on the scale", () => {
    // NIST SP 811, 4.2.1.1: T/K = t/°C + 273.15; t/°F = 1.8 t/°C + 32
    expect(toSI("temperature", 32, "°F")).toBeCloseTo(273.15, 9);
    expect(toSI("temperature", 212, "°F")).toBeCloseTo(373.15, 9);
    expect(toSI("temperature", 20, "°C")).toBeCloseTo(293.15, 9);
    expect(fromSI("temperature", toSI("temperature", -40, "°C"), "°F")).toBeCloseTo(-40, 9);
  });

  it("converts densities", () => {
    // NIST SP 811, B.8: gram per cubic centimetre = 1.0 E+03 kg/m³
    expect(toSI("density", 0.789, "g/cc")).toBeCloseTo(789, 9);
    // NIST SP 811, B.8: pound per gallon (U.S.) = 1.198 264 E+02 kg/m³
    expect(toSI("density", 1, "lb/gal")).toBeCloseTo(119.8264, 4);
  });

  it("refuses a value that is not a finite number, naming the field", () => {
    expect(() => toSI("length", Number.NaN, "in")).toThrow(/value/);
    expect(() => fromSI("length", Number.POSITIVE_INFINITY, "in")).toThrow(/valueSI/);
  });

  it("refuses a unit of another kind, naming it", () => {
    // Forced past the type checker, as a value read from an untyped form could be.
    expect(() => toSI("length", 1, "psi" as unknown as "in")).toThrow(/"psi" is not a length unit/);
  });
});

describe("toSI and fromSI", () => {
  const kinds = Object.keys(UNITS_BY_KIND) as QuantityKind[];

  it("round-trips every unit of every kind", () => {
    for (const kind of kinds) {
      for (const unit of UNITS_BY_KIND[kind] as readonly UnitsByKind[typeof kind][]) {
        fc.assert(
          fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (value) => {
            const back = fromSI(kind, toSI(kind, value, unit), unit);
            expect(back).toBeCloseTo(value, Math.max(0, 9 - Math.ceil(Math.log10(Math.abs(value) + 1))));
          }),
          { numRuns: 50 },
        );
      }
    }
  });

  it("converts between units through SI", () => {
    // NIST SP 811, B.8: psi = 6.894 757 E+03 Pa, bar = 1 E+05 Pa -> 14.503 77 psi per bar
    expect(fromSI("pressure", toSI("pressure", 1, "bar"), "psi")).toBeCloseTo(14.50377, 4);
    // 1 in = 25.4 mm exactly (NIST SP 811)
    expect(fromSI("length", toSI("length", 0.089, "in"), "mm")).toBeCloseTo(2.2606, 9);
  });
});

describe("pressures with a reference", () => {
  it("reads a pressure in a shop unit with its reference", () => {
    // NIST SP 811: psi = 6894.757 Pa, kPa = 1000 Pa
    const boost = pressure(8, "psi", "gauge");
    expect(boost.reference).toBe("gauge");
    expect(boost.pa).toBeCloseTo(8 * 6894.757, 1);
    expect(pressure(101.325, "kPa", "absolute")).toEqual({ reference: "absolute", pa: expect.closeTo(101325, 6) as number });
  });

  it("takes the ambient off an absolute reading", () => {
    const p = gaugeFromAbsolute(absolutePressure(150000), 100000);
    expect(p).toEqual({ reference: "gauge", pa: 50000 });
  });

  it("refuses a negative absolute pressure and an ambient of zero", () => {
    expect(() => absolutePressure(-1)).toThrow(/pa/);
    expect(() => gaugeFromAbsolute(absolutePressure(90000), 0)).toThrow(/ambientPa/);
  });

  it("keeps a gauge reading as it is through toGauge", () => {
    const a = absolutePressure(120000);
    expect(toGauge(a, 100000).pa).toBe(20000);
    const g = gaugePressure(-20000);
    expect(toGauge(g)).toBe(g);
  });

  it("will not take a gauge pressure where an absolute one is needed (checked by tsc)", () => {
    const gauge = gaugePressure(50000);
    // @ts-expect-error: a gauge reading is not an absolute pressure
    const wrongWay = () => gaugeFromAbsolute(gauge);
    // At run time it only takes the ambient off; the type checker is what stops it.
    expect(typeof wrongWay).toBe("function");
    // @ts-expect-error: a bare number has no reference
    const bare = () => gaugeFromAbsolute(200000);
    expect(typeof bare).toBe("function");
  });
});

describe("displacement and power", () => {
  it("converts cubic inches and horsepower by their definitions", () => {
    // NIST SP 811 B.8: 1 in³ = 1.638 706 4 E-05 m³ (exact, from 1 in = 0.0254 m)
    expect(toSI("displacement", 1, "in³")).toBeCloseTo(1.6387064e-5, 12);
    // 350 in³ = 5.735 L (350 x 16.387064 cm³ = 5735.47 cm³)
    expect(fromSI("displacement", toSI("displacement", 350, "in³"), "L")).toBeCloseTo(5.73547, 4);
    // NIST SP 811 B.8: 1 hp (550 ft·lbf/s) = 745.699 87 W
    expect(toSI("power", 1, "hp")).toBeCloseTo(745.69987, 4);
    expect(toSI("power", 2.5, "kW")).toBe(2500);
  });
});
