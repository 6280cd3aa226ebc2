// The units a machinist reads gauges in at the bench. Plain lists (no schema library): the phone's form and
// the server's schema (sign-off-schema.ts) both take them from here.

export const BENCH_LENGTH_UNITS = ["in", "mm"] as const;
export const BENCH_PRESSURE_UNITS = ["psi", "kPa", "bar"] as const;
