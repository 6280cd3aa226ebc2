import { z } from "zod";
import { formNumber, formQuantity, optionalFormQuantity } from "@/lib/forms/form-schema";
import { FORM_LENGTH_UNITS } from "@/lib/forms/units";

const zeroOrMore = { min: 0, minInclusive: true } as const;
const angle = (label: string) => formNumber(label, { min: -180, minInclusive: true, max: 180 });

/**
 * The secondary valve's pickup extension: a straight run from the valve inlet, a bend, a second run, and
 * optionally a second bend and a third run; plus the length swaged over the inlet.
 */
export const pickupTubeSchema = z
  .object({
    firstRun: formQuantity("first run", FORM_LENGTH_UNITS, zeroOrMore),
    bendAngle: angle("bend angle"),
    radius: formQuantity("centerline radius", FORM_LENGTH_UNITS),
    secondRun: formQuantity("second run", FORM_LENGTH_UNITS, zeroOrMore),
    secondBendAngle: angle("second bend angle").optional(),
    thirdRun: optionalFormQuantity("third run", FORM_LENGTH_UNITS, zeroOrMore),
    swage: formQuantity("swage engagement", FORM_LENGTH_UNITS, zeroOrMore),
    outsideDiameter: formQuantity("tube outside diameter", FORM_LENGTH_UNITS),
    maxRearward: optionalFormQuantity("room rearward", FORM_LENGTH_UNITS),
    maxDownward: optionalFormQuantity("room downward", FORM_LENGTH_UNITS),
  })
  .superRefine((v, ctx) => {
    if (v.secondBendAngle === undefined && v.thirdRun !== undefined) {
      ctx.addIssue({ code: "custom", path: ["secondBendAngle"], message: "Enter the second bend angle, or clear the third run." });
    }
    if (v.secondBendAngle !== undefined && v.thirdRun === undefined) {
      ctx.addIssue({ code: "custom", path: ["thirdRun", "value"], message: "Enter the third run after the second bend." });
    }
  });

export type PickupTubeInput = z.output<typeof pickupTubeSchema>;
