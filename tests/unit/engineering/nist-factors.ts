// Conversion factors for writing test inputs in shop units. Taken from NIST Special Publication 811
// (2008), appendix B.8, not from the project's own units module, so the tests don't lean on code they
// may be checking.

/** inch = 0.0254 m exactly (NIST SP 811, B.8). */
export const M_PER_IN = 0.0254;
/** pound-force per square inch = 6.894 757 E+03 Pa (NIST SP 811, B.8). */
export const PA_PER_PSI = 6894.757;
/** inch of mercury, conventional = 3.386 389 E+03 Pa (NIST SP 811, B.8). */
export const PA_PER_INHG = 3386.389;
/** standard atmosphere = 101 325 Pa (NIST SP 811, B.8; ISO 2533). */
export const PA_STANDARD_ATMOSPHERE = 101325;
/** pound (avoirdupois) = 0.453 592 37 kg exactly (NIST SP 811, B.8). */
export const KG_PER_LB = 0.45359237;
/** horsepower (550 ft·lbf/s) = 7.456 999 E+02 W (NIST SP 811, B.8). */
export const W_PER_HP = 745.6999;

/** A drill as ASME B94.11M lists it, decimal inches converted exactly to metres. */
export function asmeDrill(label: string, inches: number, system: "number" | "letter" | "fraction" | "metric" = "number") {
  return { label, system, diameterM: inches * M_PER_IN } as const;
}
