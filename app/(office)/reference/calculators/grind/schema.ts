import { z } from "zod";
import { formWholeNumber } from "@/lib/forms/quantity/figures";
import { quantity } from "@/lib/forms/quantity/quantity";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

const zeroOrMore = { min: 0, minInclusive: true } as const;

/** Clearance grind of the boss next to a boost-referenced valve. */
export const grindSchema = z.object({
  protrusion: quantity("valve protrusion", FORM_LENGTH_UNITS, zeroOrMore),
  clearance: quantity("running clearance", FORM_LENGTH_UNITS, zeroOrMore),
  clayGap: quantity("clay gap", FORM_LENGTH_UNITS, zeroOrMore),
  wall: quantity("wall thickness", FORM_LENGTH_UNITS),
  minWall: quantity("least wall to leave", FORM_LENGTH_UNITS, zeroOrMore),
  perPass: quantity("depth per pass", FORM_LENGTH_UNITS),
  clayEvery: formWholeNumber("clay check interval", 1, 20),
});

export type GrindInput = z.output<typeof grindSchema>;
