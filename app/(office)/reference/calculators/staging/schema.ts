import { z } from "zod";
import { formNumber, formWholeNumber } from "@/lib/forms/quantity/figures";
import { quantity, optionalQuantity } from "@/lib/forms/quantity/quantity";
import { FORM_AREA_UNITS, FORM_BOOST_UNITS, FORM_LENGTH_UNITS, FORM_OPENING_UNITS, FORM_TEMPERATURE_UNITS } from "@/lib/forms/quantity/units";

export const STAGING_COMMANDS = ["chart", "propose"] as const;
export const STAGING_FUELS = ["gasoline", "E10", "E30", "E85", "ethanol", "methanol"] as const;
export const TARGET_SCALES = ["afr", "lambda"] as const;
export const VALVE_KINDS = ["vacuum", "boost"] as const;
export const SIDES = ["primary", "secondary"] as const;
export const MAX_VALVES = 8;

const zeroOrMore = { min: 0, minInclusive: true } as const;

const valveSchema = z.object({
  kind: z.enum(VALVE_KINDS, { error: "Choose vacuum or boost." }),
  side: z.enum(SIDES, { error: "Choose primary or secondary." }),
  opening: quantity("opening point", FORM_OPENING_UNITS, zeroOrMore),
  area: quantity("restriction area", FORM_AREA_UNITS, zeroOrMore),
});

/**
 * The staging plan of one carburetor: main jets per side, the power valves (vacuum valves by their rating,
 * boost valves by their setpoint, each with the restriction area it adds), the fuel and target mixture, the
 * peak boost and the charge temperature. `command` says whether to chart the plan as entered or to propose
 * boost-valve setpoints and areas.
 */
export const stagingSchema = z
  .object({
    command: z.enum(STAGING_COMMANDS).default("chart"),
    primaryJet: quantity("primary main-jet bore", FORM_LENGTH_UNITS),
    primaryJets: formWholeNumber("number of primary main jets", 1, 8),
    secondaryJet: quantity("secondary main-jet bore", FORM_LENGTH_UNITS),
    secondaryJets: formWholeNumber("number of secondary main jets", 1, 8),
    valves: z.array(valveSchema).max(MAX_VALVES, { error: `At most ${MAX_VALVES} power valves.` }).default([]),
    fuel: z.enum(STAGING_FUELS, { error: "Choose the fuel." }),
    targetScale: z.enum(TARGET_SCALES, { error: "Choose AFR or lambda." }),
    targetAtmosphere: formNumber("target without boost", { min: 0, max: 30 }),
    targetPeak: formNumber("target at peak boost", { min: 0, max: 30 }),
    targetCruise: formNumber("target at cruise", { min: 0, max: 30 }).optional(),
    peakBoost: quantity("peak boost", FORM_BOOST_UNITS),
    ambientTemperature: quantity("ambient temperature", FORM_TEMPERATURE_UNITS, { min: -60, minInclusive: true, max: 160 }),
    chargeTemperature: quantity("charge temperature at peak boost", FORM_TEMPERATURE_UNITS, { min: -60, minInclusive: true, max: 400 }),
    band: formNumber("accepted band", { min: 0, max: 50 }),
    proposeValves: formWholeNumber("boost valves to propose", 1, 6),
    boostWindow: optionalQuantity("boost-valve window area", FORM_AREA_UNITS),
  })
  .superRefine((v, ctx) => {
    const targets = [
      ["targetAtmosphere", v.targetAtmosphere],
      ["targetPeak", v.targetPeak],
      ["targetCruise", v.targetCruise],
    ] as const;
    for (const [field, value] of targets) {
      if (value === undefined) continue;
      if (v.targetScale === "lambda" && value > 2) {
        ctx.addIssue({ code: "custom", path: [field], message: "A lambda target is near 1 (below 1 under boost): check AFR or lambda." });
      }
      if (v.targetScale === "afr" && value < 2) {
        ctx.addIssue({ code: "custom", path: [field], message: "An AFR target is several to one: check AFR or lambda." });
      }
    }
    if (v.targetCruise !== undefined && !v.valves.some((valve) => valve.kind === "vacuum")) {
      ctx.addIssue({ code: "custom", path: ["targetCruise"], message: "A cruise target needs a vacuum valve: it holds while that valve is shut." });
    }
    v.valves.forEach((valve, i) => {
      if (valve.kind === "boost" && valve.opening.unit === "inHg") {
        ctx.addIssue({ code: "custom", path: ["valves", i, "opening", "unit"], message: "A boost setpoint is in psi or kPa." });
      }
    });
  });

export type StagingInput = z.output<typeof stagingSchema>;
