// Unit factors: how many SI units one shop unit is. The single place they are written; units.ts converts
// typed quantities with mathjs and re-exports these, while code that only scales a number (formatting,
// defaults, the phone's preview) imports them from here without loading mathjs into a browser bundle.
// Values: NIST SP 811 (2008), appendix B.8.

/** inch = 0.0254 m exactly. */
export const M_PER_IN = 0.0254;
export const M_PER_MM = 0.001;
/** foot = 0.3048 m exactly. */
export const M_PER_FT = 0.3048;
export const M2_PER_IN2 = M_PER_IN * M_PER_IN;
export const M2_PER_MM2 = M_PER_MM * M_PER_MM;
export const M3_PER_IN3 = M_PER_IN * M_PER_IN * M_PER_IN;
export const M3_PER_L = 0.001;

/** pound (avoirdupois) = 0.453 592 37 kg exactly. */
export const KG_PER_LB = 0.45359237;
/** standard acceleration of gravity = 9.806 65 m/s² exactly. */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** horsepower (550 ft·lbf/s), from the exact foot and pound-force: 745.699 9 W. */
export const W_PER_HP = 550 * M_PER_FT * KG_PER_LB * STANDARD_GRAVITY_M_PER_S2;

/**
 * pound-force per square inch: the exact pound-force (0.453 592 37 kg x 9.806 65 m/s²) over the square inch,
 * 6894.757 293 Pa; SP 811 prints it rounded to 6.894 757 E+03.
 */
export const PA_PER_PSI = (KG_PER_LB * STANDARD_GRAVITY_M_PER_S2) / M2_PER_IN2;
export const PA_PER_KPA = 1000;
/** bar = 1 E+05 Pa exactly. */
export const PA_PER_BAR = 100_000;
// inch of mercury, conventional = 3.386 389 E+03 Pa (13 595.1 kg/m³ x 9.806 65 m/s² x 0.0254 m).
export const PA_PER_INHG = 3386.389;
// inch of water, conventional = 2.490 889 E+02 Pa (1000 kg/m³ x 9.806 65 m/s² x 0.0254 m). The same table
// gives 2.490 82 E+02 Pa for water at 39.2 °F; the two differ by 0.003 %, far below what a manometer reads.
export const PA_PER_INH2O = 249.0889;
/** standard atmosphere = 101 325 Pa (ISO 2533). */
export const STANDARD_ATMOSPHERE_PA = 101325;
