import { z } from "zod";
import { formQuantity, formWholeNumber } from "@/lib/forms/form-schema";
import { FORM_LENGTH_UNITS } from "@/lib/forms/units";

const zeroOrMore = { min: 0, minInclusive: true } as const;

/** Clearance grind of the boss next to a boost-referenced valve. */
export const grindSchema = z.object({
  protrusion: formQuantity("valve protrusion", FORM_LENGTH_UNITS, zeroOrMore),
  clearance: formQuantity("running clearance", FORM_LENGTH_UNITS, zeroOrMore),
  clayGap: formQuantity("clay gap", FORM_LENGTH_UNITS, zeroOrMore),
  wall: formQuantity("wall thickness", FORM_LENGTH_UNITS),
  minWall: formQuantity("least wall to leave", FORM_LENGTH_UNITS, zeroOrMore),
  perPass: formQuantity("depth per pass", FORM_LENGTH_UNITS),
  clayEvery: formWholeNumber("clay check interval", 1, 20),
});

export type GrindInput = z.output<typeof grindSchema>;
