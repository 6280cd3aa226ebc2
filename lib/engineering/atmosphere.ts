// The ambient air a carburetor is jetted in: the standard atmosphere's pressure at a site elevation, for a
// shop without a barometer. ISO 2533:1975 (the ICAO standard atmosphere), troposphere layer, 0 to 11 km
// geopotential altitude:
//   P = P0 (1 - L h / T0)^(g0 / (R L))
// with P0 = 101 325 Pa, T0 = 288.15 K, L = 0.0065 K/m, g0 = 9.80665 m/s², R = 287.05287 J/(kg K).
// The exponent g0 / (R L) is 5.25588. A barometer reading (station pressure, not the sea-level value a
// weather report gives) is better: weather moves it by a few percent.

import { requireInRange } from "./checks";
import { STANDARD_ATMOSPHERE_PA } from "./units";

const T0_K = 288.15;
const LAPSE_RATE_K_PER_M = 0.0065;
const G0 = 9.80665;
const R_AIR_ISO = 287.05287;
const EXPONENT = G0 / (R_AIR_ISO * LAPSE_RATE_K_PER_M);

/** Lowest and highest site a shop plans for: the Dead Sea shore and the highest roads, in metres. */
export const SITE_ELEVATION_RANGE_M = { min: -500, max: 6000 } as const;

/** Standard-atmosphere pressure at a geopotential elevation, absolute Pa (ISO 2533, troposphere). */
export function standardAtmospherePressurePa(elevationM: number): number {
  requireInRange("site elevation", elevationM, SITE_ELEVATION_RANGE_M.min, SITE_ELEVATION_RANGE_M.max);
  return STANDARD_ATMOSPHERE_PA * Math.pow(1 - (LAPSE_RATE_K_PER_M * elevationM) / T0_K, EXPONENT);
}
