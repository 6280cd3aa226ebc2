// The one zod kit for quantities: a { value, unit } field checked in the unit it was typed in, and the same
// field parsed to SI for the job schemas.
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { formNumber, positiveNumber } from "@/lib/forms/quantity/figures";
import { optionalQuantity, quantity } from "@/lib/forms/quantity/quantity";
import { optionalQuantityInSI, quantityInSI } from "@/lib/forms/quantity/si";

const messages = (schema: z.ZodType, input: unknown) => {
  const result = schema.safeParse(input);
  return result.success ? [] : result.error.issues.map((issue) => `${issue.path.join(".")}: ${issue.message}`);
};

describe("quantity: a value with its unit, checked as typed", () => {
  const boost = quantity("peak boost", ["psi", "kPa", "bar"]);

  it("keeps the value and the unit as typed", () => {
    expect(boost.parse({ value: 9, unit: "psi" })).toEqual({ value: 9, unit: "psi" });
  });

  it("names the field in every refusal, on the part that is wrong", () => {
    expect(messages(boost, { unit: "psi" })).toEqual(["value: Enter the peak boost."]);
    expect(messages(boost, { value: 0, unit: "psi" })).toEqual(["value: The peak boost must be more than 0."]);
    expect(messages(boost, { value: 9, unit: "inHg" })).toEqual(["unit: Choose a unit for the peak boost: psi, kPa, bar."]);
    expect(messages(boost, { value: "nine", unit: "psi" })).toEqual(["value: The peak boost must be a number."]);
  });

  it("refuses a figure no job needs in its unit (a unit slip), but not the same number in a smaller unit", () => {
    // Our own plausible range, no published source: at most 150 psi; 200 kPa is about 29 psi.
    expect(messages(boost, { value: 200, unit: "psi" })).toEqual([
      "value: The peak boost is larger than any carburetor job needs (at most 150 psi): check the unit.",
    ]);
    expect(messages(boost, { value: 200, unit: "kPa" })).toEqual([]);
  });

  it("takes a negative figure only where the bounds allow it", () => {
    const temperature = quantity("ambient temperature", ["°F", "°C"], {});
    expect(temperature.parse({ value: -20, unit: "°F" })).toEqual({ value: -20, unit: "°F" });
  });

  it("reads a decimal comma where the box asks for it, and an empty box as missing", () => {
    const reading = quantity("measured value", ["in", "mm"], { decimalComma: true });
    expect(reading.parse({ value: "0,089", unit: "in" })).toEqual({ value: 0.089, unit: "in" });
    expect(messages(reading, { value: " ", unit: "in" })).toEqual(["value: Enter the measured value."]);
  });

  it("treats an optional quantity with an empty value as not given, whatever unit is selected", () => {
    const web = optionalQuantity("least web", ["in", "mm"], { min: 0, minInclusive: true });
    expect(web.parse(undefined)).toBeUndefined();
    expect(web.parse({ unit: "mm" })).toBeUndefined();
    expect(web.parse({ value: "", unit: "mm" })).toBeUndefined();
    expect(web.parse({ value: 0, unit: "mm" })).toEqual({ value: 0, unit: "mm" });
    expect(messages(web, { value: -1, unit: "mm" })).toEqual(["value: The least web must be 0 or more."]);
  });
});

describe("quantityInSI: the same field parsed to SI", () => {
  it("converts to the SI base unit", () => {
    // NIST SP 811 (2008), B.8: 1 psi = 6.894 757 E+03 Pa, so 9 psi = 62 052.8 Pa; 1 in = 0.0254 m exactly.
    expect(quantityInSI("pressure", "peak boost", ["psi", "kPa"]).parse({ value: 9, unit: "psi" })).toBeCloseTo(62052.8, 0);
    expect(quantityInSI("length", "main-jet diameter", ["in", "mm"]).parse({ value: 0.1, unit: "in" })).toBeCloseTo(0.00254, 9);
  });

  it("refuses a figure beyond the SI limit, naming the field", () => {
    // 60 psi = 413 685 Pa (NIST SP 811 factor above); 70 psi is past it.
    const boost = quantityInSI("pressure", "peak boost", ["psi", "kPa"], { min: 0, si: { max: 413_685.4 } });
    expect(messages(boost, { value: 70, unit: "psi" })).toEqual(["value: The peak boost is larger than any carburetor job needs: check the unit."]);
    expect(messages(boost, { value: 50, unit: "psi" })).toEqual([]);
  });

  it("refuses a temperature below absolute zero", () => {
    // Absolute zero is -459.67 °F (NIST SP 811, B.9: T/K = (t/°F + 459.67) / 1.8).
    const ambient = quantityInSI("temperature", "ambient temperature", ["°F", "°C"], {});
    expect(messages(ambient, { value: -500, unit: "°F" })).toEqual(["value: The ambient temperature is below absolute zero."]);
    expect(ambient.parse({ value: 32, unit: "°F" })).toBeCloseTo(273.15, 9); // 32 °F is the ice point, 273.15 K
  });

  it("gives undefined for an optional quantity left out", () => {
    const charge = optionalQuantityInSI("temperature", "charge temperature", ["°F", "°C"], {});
    expect(charge.parse({ value: "", unit: "°F" })).toBeUndefined();
    expect(charge.parse({ value: 100, unit: "°C" })).toBeCloseTo(373.15, 9); // 100 °C = 373.15 K by definition of the scale
  });
});

describe("figures", () => {
  it("words a form box by its label and a JSON field by its path", () => {
    expect(messages(formNumber("accepted band", { min: 0, max: 50 }), 60)).toEqual([": The accepted band must be at most 50."]);
    expect(messages(positiveNumber("cd"), 0)).toEqual([": cd must be greater than 0"]);
    expect(messages(positiveNumber("cd"), 1e9)).toEqual([": cd is far larger than any carburetor job needs: check the number"]);
  });
});
