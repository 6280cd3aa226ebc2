import { describe, expect, it } from "vitest";
import type { AirFuelRow } from "@/lib/engineering/air-fuel-log";
import { ethanolBlend } from "@/lib/engineering/fuels";
import { correctFromLog } from "@/lib/engineering/log-correction";
import type { PowerValve } from "@/lib/engineering/staging";
import { asmeDrill, M_PER_IN } from "./nist-factors";

describe("correctFromLog", () => {
  // An invented E85 job: a gasoline-scaled wideband, the secondary stage at 20 kPa, the power target 0.78.
  const secondary: PowerValve = { id: "sec", side: "secondary", kind: "boost", setpointPa: 20_000, restrictionAreaM2: 2e-6 };
  const rows: AirFuelRow[] = [
    // Hand: 12.054 / 14.7 (gasoline readout scale, common practice) = 0.82; absolute 128..132 kPa at 100 kPa ambient
    // -> 28..32 kPa gauge, all in the 4 to 5 psi bin (27 579 to 34 474 Pa, NIST SP 811 psi).
    ...[128, 129, 130, 131, 132, 130].map(
      (kPa, i): AirFuelRow => ({
        line: i + 2,
        manifold: { pa: kPa * 1000, reference: "absolute" },
        mixture: { kind: "afr", value: 12.054, scale: "gasoline" },
        throttlePct: 90,
        timeS: i,
        coolantK: 360,
      }),
    ),
    { line: 8, manifold: { pa: 130_000, reference: "absolute" }, mixture: { kind: "afr", value: 12.054, scale: "gasoline" }, throttlePct: 90, timeS: 6, coolantK: 300 },
    { line: 9, manifold: { pa: 130_000, reference: "absolute" }, mixture: { kind: "lambda", value: 3 }, throttlePct: 90, timeS: 7 },
  ];

  it("reads, cleans, bins and corrects a log in one call", () => {
    const result = correctFromLog({
      rows,
      ambientPa: 100_000,
      fuelStoichAfr: ethanolBlend(85).stoichAfr,
      correction: {
        model: { mainJets: { primary: 4e-6, secondary: 6e-6 }, valves: [secondary], target: { atmosphereAfr: 0.78, peakBoostAfr: 0.78, peakBoostGaugePa: 100_000 } },
        stages: [{ valveId: "sec", mode: "full", index: 1, layout: null, maxHoles: 4 }],
        // ASME B94.11M: #60 = 0.0400 in
        drills: [asmeDrill("#60", 0.04)],
        primaryMainJetDiameterM: 0.07 * M_PER_IN,
      },
    });
    expect(result.rejected.map((r) => r.line)).toEqual([9]);
    expect(result.setAside).toEqual({ fastThrottle: 0, cold: 1 });
    expect(result.usedReadings).toBe(6);
    expect(result.bins).toHaveLength(1);
    expect(result.bins[0]?.lambda).toBeCloseTo(0.82, 10);
    // Hand: open 4e-6 + 6e-6 + 2e-6 = 1.2e-5 m²; (0.82 / 0.78 - 1) = 0.0512821; +6.15385e-7 -> 2.615385e-6 m².
    // Read as 12.054 / 9.8 = lambda 1.23 it would have asked for about 9e-6 m² instead.
    expect(Math.abs((result.corrections[0]?.proposedAreaM2 ?? 0) - 2.615385e-6)).toBeLessThanOrEqual(1e-12);
  });
});
