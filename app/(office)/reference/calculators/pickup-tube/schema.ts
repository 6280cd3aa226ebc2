import { z } from "zod";
import { formNumber } from "@/lib/forms/quantity/figures";
import { quantity, optionalQuantity } from "@/lib/forms/quantity/quantity";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

const zeroOrMore = { min: 0, minInclusive: true } as const;
const angle = (label: string) => formNumber(label, { min: -180, minInclusive: true, max: 180 });

/**
 * The secondary valve's pickup extension: a straight run from the valve inlet, a bend, a second run, and
 * optionally a second bend and a third run; plus the length swaged over the inlet.
 */
export const pickupTubeSchema = z
  .object({
    firstRun: quantity("first run", FORM_LENGTH_UNITS, zeroOrMore),
    bendAngle: angle("bend angle"),
    radius: quantity("centerline radius", FORM_LENGTH_UNITS),
    secondRun: quantity("second run", FORM_LENGTH_UNITS, zeroOrMore),
    secondBendAngle: angle("second bend angle").optional(),
    thirdRun: optionalQuantity("third run", FORM_LENGTH_UNITS, zeroOrMore),
    swage: quantity("swage engagement", FORM_LENGTH_UNITS, zeroOrMore),
    outsideDiameter: quantity("tube outside diameter", FORM_LENGTH_UNITS),
    maxRearward: optionalQuantity("room rearward", FORM_LENGTH_UNITS),
    maxDownward: optionalQuantity("room downward", FORM_LENGTH_UNITS),
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
