import { z } from "zod";
import { formNumber, formWholeNumber } from "@/lib/forms/quantity/figures";
import { optionalQuantity } from "@/lib/forms/quantity/quantity";
import { FORM_AREA_UNITS, FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

export const TARGET_KINDS = ["area", "afr", "percent"] as const;
export const DRILL_SETS = ["inch", "number", "fraction", "metric", "all"] as const;

/**
 * Restriction holes for one power-valve channel. The target is an effective area, or an enrichment: an AFR
 * change or a percent of the main-jet area, which needs the main jets (measured bore and count).
 */
export const restrictionSchema = z
  .object({
    targetKind: z.enum(TARGET_KINDS, { error: "Choose how the target is given." }),
    targetArea: optionalQuantity("target area", FORM_AREA_UNITS),
    afrBefore: formNumber("AFR before", { min: 0, max: 30 }).optional(),
    afrAfter: formNumber("AFR wanted", { min: 0, max: 30 }).optional(),
    percent: formNumber("enrichment", { min: 0, max: 200 }).optional(),
    mainJet: optionalQuantity("main-jet bore", FORM_LENGTH_UNITS),
    mainJetCount: formWholeNumber("number of main jets", 1, 8).optional(),
    maxHoles: formWholeNumber("most holes", 1, 4),
    drillSet: z.enum(DRILL_SETS, { error: "Choose the drills to pick from." }),
    valveWindow: optionalQuantity("valve window area", FORM_AREA_UNITS),
    channelLength: optionalQuantity("channel length", FORM_LENGTH_UNITS),
    minWeb: optionalQuantity("least web", FORM_LENGTH_UNITS, { min: 0, minInclusive: true }),
  })
  .superRefine((v, ctx) => {
    const need = (ok: boolean, path: (string | number)[], message: string) => {
      if (!ok) ctx.addIssue({ code: "custom", path, message });
    };
    if (v.targetKind === "area") need(v.targetArea !== undefined, ["targetArea", "value"], "Enter the target area.");
    if (v.targetKind === "afr") {
      need(v.afrBefore !== undefined, ["afrBefore"], "Enter the AFR before.");
      need(v.afrAfter !== undefined, ["afrAfter"], "Enter the AFR wanted.");
      if (v.afrBefore !== undefined && v.afrAfter !== undefined) {
        need(v.afrAfter < v.afrBefore, ["afrAfter"], "The AFR wanted must be richer (lower) than the AFR before.");
      }
    }
    if (v.targetKind === "percent") need(v.percent !== undefined, ["percent"], "Enter the enrichment.");
    if (v.targetKind !== "area") {
      need(v.mainJet !== undefined, ["mainJet", "value"], "Enter the main-jet bore.");
      need(v.mainJetCount !== undefined, ["mainJetCount"], "Enter the number of main jets.");
    }
  });

export type RestrictionInput = z.output<typeof restrictionSchema>;
