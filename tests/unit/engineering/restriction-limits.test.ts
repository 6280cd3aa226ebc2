import { describe, expect, it } from "vitest";
import { ALL_DRILLS, INCH_DRILLS, METRIC_DRILLS } from "@/lib/engineering/drills";
import {
  DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL,
  DEFAULT_LARGEST_RESTRICTION_DRILL_M,
  DEFAULT_MIN_WEB_M,
  DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL,
  DEFAULT_SMALLEST_RESTRICTION_DRILL_M,
  inDrillSystem,
  isRestrictionDrill,
  restrictionDrillLimits,
} from "@/lib/engineering/restriction-limits";
import { asmeDrill, M_PER_IN } from "./nist-factors";

const D43 = asmeDrill("#43", 0.089); // ASME B94.11M
const Q = asmeDrill("Q", 0.332, "letter"); // ASME B94.11M
const D1_8 = asmeDrill("1/8", 0.125, "fraction");
const MM2_5 = { label: "2.50 mm", system: "metric", diameterM: 0.0025 } as const;

describe("shop limit defaults", () => {
  it("are #70 to 1/8 with 0.020 in of web", () => {
    // Common practice, no published source; ASME B94.11M: #70 = 0.0280 in, 1/8 = 0.1250 in.
    expect(DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL).toBe("#70");
    expect(DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL).toBe("1/8");
    expect(DEFAULT_SMALLEST_RESTRICTION_DRILL_M / M_PER_IN).toBeCloseTo(0.028, 12);
    expect(DEFAULT_LARGEST_RESTRICTION_DRILL_M / M_PER_IN).toBeCloseTo(0.125, 12);
    expect(DEFAULT_MIN_WEB_M / M_PER_IN).toBeCloseTo(0.02, 12);
  });
});

describe("inDrillSystem", () => {
  const rack = [D43, Q, D1_8, MM2_5];

  it("keeps one plan to one system unless mixed is asked", () => {
    expect(rack.filter((d) => inDrillSystem(d.system, "inch")).map((d) => d.label)).toEqual(["#43", "Q", "1/8"]);
    expect(rack.filter((d) => inDrillSystem(d.system, "metric")).map((d) => d.label)).toEqual(["2.50 mm"]);
    expect(rack.filter((d) => inDrillSystem(d.system, "mixed")).map((d) => d.label)).toEqual(["#43", "Q", "1/8", "2.50 mm"]);
  });

  it("splits the standard series into the inch and the metric drills", () => {
    expect(ALL_DRILLS.filter((d) => inDrillSystem(d.system, "inch"))).toEqual(INCH_DRILLS);
    expect(ALL_DRILLS.filter((d) => inDrillSystem(d.system, "metric"))).toEqual([...METRIC_DRILLS].sort((a, b) => a.diameterM - b.diameterM));
  });

  it("refuses an unknown system for the limits", () => {
    expect(() => restrictionDrillLimits({ system: "imperial" as never })).toThrow(/system/);
  });
});

describe("restrictionDrillLimits", () => {
  it("uses the defaults where the shop set nothing", () => {
    expect(restrictionDrillLimits({ smallestDrillLabel: null, largestDrillLabel: null })).toEqual({
      system: "inch",
      smallestDrillM: 0.028 * M_PER_IN,
      largestDrillM: 0.125 * M_PER_IN,
    });
  });

  it("reads the shop's drill labels", () => {
    // ASME B94.11M: #60 = 0.0400 in; 3/32 = 0.09375 in.
    const limits = restrictionDrillLimits({ system: "metric", smallestDrillLabel: "#60", largestDrillLabel: "3/32" });
    expect(limits.system).toBe("metric");
    expect(limits.smallestDrillM / M_PER_IN).toBeCloseTo(0.04, 12);
    expect(limits.largestDrillM / M_PER_IN).toBeCloseTo(0.09375, 12);
  });

  it("refuses an unknown label and a smallest drill above the largest, naming the setting", () => {
    expect(() => restrictionDrillLimits({ smallestDrillLabel: "#99" })).toThrow(/smallestDrillLabel/);
    expect(() => restrictionDrillLimits({ largestDrillLabel: "0.3 banana" })).toThrow(/largestDrillLabel/);
    expect(() => restrictionDrillLimits({ smallestDrillLabel: "1/8", largestDrillLabel: "#70" })).toThrow(/smallestDrillM must not exceed/);
  });

  it("keeps the drills from #70 to 1/8 of the plan's system", () => {
    // ASME B94.11M: number drills #31 (0.1200 in) to #70 (0.0280 in) are 40 sizes; fractions 1/32 to 1/8 in
    // 64ths are 2/64..8/64, 7 sizes (1/64 = 0.0156 in is under #70); letters start at A = 0.2340 in. 47 in all.
    const inchLimits = restrictionDrillLimits();
    const inch = ALL_DRILLS.filter((d) => isRestrictionDrill(d, inchLimits));
    expect(inch).toHaveLength(47);
    expect(inch[0]?.label).toBe("#70");
    expect(inch.at(-1)?.label).toBe("1/8");
    // Metric, 0.7112 mm to 3.175 mm: 0.75 to 2.95 mm in 0.05 mm steps, (2.95 - 0.75) / 0.05 + 1 = 45 sizes,
    // then 3.0 and 3.1 mm in 0.1 mm steps (the project's BS 328 subset): 47.
    const metricLimits = restrictionDrillLimits({ system: "metric" });
    const metric = ALL_DRILLS.filter((d) => isRestrictionDrill(d, metricLimits));
    expect(metric).toHaveLength(47);
    expect(metric[0]?.label).toBe("0.75 mm");
    expect(metric.at(-1)?.label).toBe("3.10 mm");
  });
});
