import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  ALL_DRILLS,
  NUMBER_DRILLS,
  LETTER_DRILLS,
  FRACTION_DRILLS,
  METRIC_DRILLS,
  INCH_DRILLS,
  findDrill,
  nearestDrill,
  fractionDrill,
  metricDrill,
} from "@/lib/engineering/drills";
import type { Drill, DrillSystem } from "@/lib/engineering/types";

const IN = 0.0254; // NIST SP 811: 1 in = 0.0254 m exactly

function inches(label: string): number {
  const d = findDrill(label);
  if (d === undefined) throw new Error(`no drill ${label}`);
  return d.diameterM / IN;
}

describe("drill series", () => {
  it("has every size of each series", () => {
    // ASME B94.11M: number sizes #1-#80, letter sizes A-Z; fractions 1/64-1/2 in by 64ths = 32 sizes
    expect(NUMBER_DRILLS).toHaveLength(80);
    expect(LETTER_DRILLS).toHaveLength(26);
    expect(FRACTION_DRILLS).toHaveLength(32);
    // BS 328 steps: 0.30-2.95 mm by 0.05 (54 sizes) and 3.0-13.0 mm by 0.1 (101 sizes)
    expect(METRIC_DRILLS).toHaveLength(54 + 101);
    expect(ALL_DRILLS).toHaveLength(80 + 26 + 32 + 155);
  });

  it("gives number drills their handbook decimals", () => {
    // Machinery's Handbook, twist drill sizes (ASME B94.11M), from memory; #1, #7, #21, #25, #43 and #80 also
    // match public web drill charts consulted while writing this table.
    expect(inches("#1")).toBeCloseTo(0.228, 6);
    expect(inches("#7")).toBeCloseTo(0.201, 6);
    expect(inches("#21")).toBeCloseTo(0.159, 6);
    expect(inches("#25")).toBeCloseTo(0.1495, 6);
    expect(inches("#29")).toBeCloseTo(0.136, 6);
    expect(inches("#30")).toBeCloseTo(0.1285, 6);
    expect(inches("#36")).toBeCloseTo(0.1065, 6);
    expect(inches("#43")).toBeCloseTo(0.089, 6);
    expect(inches("#44")).toBeCloseTo(0.086, 6);
    expect(inches("#50")).toBeCloseTo(0.07, 6);
    expect(inches("#60")).toBeCloseTo(0.04, 6);
    expect(inches("#69")).toBeCloseTo(0.0292, 6);
    expect(inches("#80")).toBeCloseTo(0.0135, 6);
  });

  it("gives letter drills their handbook decimals", () => {
    // Machinery's Handbook, letter drill sizes (ASME B94.11M), from memory; A = 0.234 and Z = 0.413 also match
    // public drill charts consulted.
    expect(inches("A")).toBeCloseTo(0.234, 6);
    expect(inches("E")).toBeCloseTo(0.25, 6);
    expect(inches("F")).toBeCloseTo(0.257, 6);
    expect(inches("I")).toBeCloseTo(0.272, 6);
    expect(inches("Q")).toBeCloseTo(0.332, 6);
    expect(inches("U")).toBeCloseTo(0.368, 6);
    expect(inches("Z")).toBeCloseTo(0.413, 6);
  });

  it("runs number drills from #80 smallest to #1 largest, then A to Z", () => {
    // ASME B94.11M: a higher gauge number is a smaller drill; letters grow from A to Z; #1 (0.228) < A (0.234)
    for (let i = 1; i < NUMBER_DRILLS.length; i++) {
      expect(NUMBER_DRILLS[i]!.diameterM).toBeLessThan(NUMBER_DRILLS[i - 1]!.diameterM);
    }
    for (let i = 1; i < LETTER_DRILLS.length; i++) {
      expect(LETTER_DRILLS[i]!.diameterM).toBeGreaterThan(LETTER_DRILLS[i - 1]!.diameterM);
    }
    expect(NUMBER_DRILLS[0]!.diameterM).toBeLessThan(LETTER_DRILLS[0]!.diameterM);
  });

  it("labels fractions reduced and metric sizes with two decimals", () => {
    expect(FRACTION_DRILLS[0]!.label).toBe("1/64");
    expect(FRACTION_DRILLS[2]!.label).toBe("3/64");
    expect(FRACTION_DRILLS[7]!.label).toBe("1/8");
    expect(FRACTION_DRILLS[31]!.label).toBe("1/2");
    // 1/8 in = 3.175 mm (NIST SP 811: 1 in = 25.4 mm)
    expect(FRACTION_DRILLS[7]!.diameterM).toBeCloseTo(0.003175, 12);
    expect(METRIC_DRILLS.map((d) => d.label)).toContain("2.50 mm");
    expect(METRIC_DRILLS[0]!.label).toBe("0.30 mm");
    expect(METRIC_DRILLS.at(-1)!.label).toBe("13.00 mm");
    expect(fractionDrill(34, 64).label).toBe("17/32");
    expect(metricDrill(13.5)).toEqual({ label: "13.50 mm", system: "metric", diameterM: 0.0135 });
  });

  it("keeps ALL_DRILLS sorted by diameter, inch drills first at equal size", () => {
    for (let i = 1; i < ALL_DRILLS.length; i++) {
      expect(ALL_DRILLS[i]!.diameterM).toBeGreaterThanOrEqual(ALL_DRILLS[i - 1]!.diameterM);
    }
    expect(INCH_DRILLS.every((d) => d.system !== "metric")).toBe(true);
    expect(INCH_DRILLS).toHaveLength(80 + 26 + 32);
  });

  it("has unique labels", () => {
    expect(new Set(ALL_DRILLS.map((d) => d.label)).size).toBe(ALL_DRILLS.length);
  });
});

describe("findDrill", () => {
  it.each([
    ["#43", "#43"],
    ["no. 43", "#43"],
    ["No 43", "#43"],
    ["  # 43 ", "#43"],
    ["q", "Q"],
    ["Q", "Q"],
    ["1/8", "1/8"],
    ["8/64", "1/8"],
    ['1/8"', "1/8"],
    ["1/8 in", "1/8"],
    ["2.5mm", "2.50 mm"],
    ["2.50 MM", "2.50 mm"],
    ["0.089 in", "#43"], // ASME B94.11M: #43 = 0.0890 in
    ['0.250"', "1/4"], // 1/4 in and letter E are both 0.250 in; the fraction is preferred
  ])("reads %j as %s", (input, label) => {
    expect(findDrill(input)?.label).toBe(label);
  });

  // A bare number names no series: "2" could be #2 (0.221 in), 2 mm or 2 in; "43" likewise.
  it.each(["#81", "#0", "AA", "1/128", "2.53 mm", "0.5", "14 mm", "", "3/4", "43", "2", "2.5"])("finds no drill for %j", (input) => {
    expect(findDrill(input)).toBeUndefined();
  });
});

describe("nearestDrill", () => {
  it("picks the closest standard drill", () => {
    // ASME B94.11M: #43 = 0.0890, #44 = 0.0860; 0.0876 in is 0.0014 from #43 and 0.0016 from #44
    expect(nearestDrill(0.0876 * IN, { systems: ["number"] })?.label).toBe("#43");
    expect(nearestDrill(0.0876 * IN, { systems: ["number"], direction: "atMost" })?.label).toBe("#44");
    expect(nearestDrill(0.0876 * IN, { systems: ["number"], direction: "atLeast" })?.label).toBe("#43");
    // A size exactly on a drill is that drill, in every direction.
    for (const direction of ["nearest", "atLeast", "atMost"] as const) {
      expect(nearestDrill(0.089 * IN, { systems: ["number"], direction })?.label).toBe("#43");
    }
  });

  it("returns undefined when no drill qualifies", () => {
    expect(nearestDrill(20e-3, { direction: "atLeast" })).toBeUndefined();
    expect(nearestDrill(0.1e-3, { direction: "atMost" })).toBeUndefined();
    expect(nearestDrill(1e-3, { drills: [] })).toBeUndefined();
  });

  it("refuses a diameter that is not positive", () => {
    expect(() => nearestDrill(0)).toThrow(/diameterM/);
    expect(() => nearestDrill(Number.NaN)).toThrow(/diameterM/);
  });

  const systemsArb = fc.subarray<DrillSystem>(["number", "letter", "fraction", "metric"], { minLength: 1 });
  const stockArb = fc.uniqueArray(fc.constantFrom(...ALL_DRILLS), { minLength: 1, maxLength: 30 });
  const diameterArb = fc.double({ min: 0.1e-3, max: 15e-3, noNaN: true });

  it("returns a member of the list, with none closer", () => {
    fc.assert(
      fc.property(diameterArb, stockArb, (d, stock) => {
        const found = nearestDrill(d, { drills: stock });
        expect(found).toBeDefined();
        expect(stock).toContain(found);
        for (const other of stock) {
          expect(Math.abs(other.diameterM - d)).toBeGreaterThanOrEqual(Math.abs(found!.diameterM - d) - 1e-15);
        }
      }),
    );
  });

  it("keeps to the chosen series", () => {
    fc.assert(
      fc.property(diameterArb, systemsArb, (d, systems) => {
        const found = nearestDrill(d, { systems });
        expect(found).toBeDefined();
        expect(systems).toContain(found!.system);
      }),
    );
  });

  it("honours atLeast and atMost", () => {
    fc.assert(
      fc.property(diameterArb, stockArb, (d, stock: Drill[]) => {
        const up = nearestDrill(d, { drills: stock, direction: "atLeast" });
        const down = nearestDrill(d, { drills: stock, direction: "atMost" });
        const bigger = stock.filter((s) => s.diameterM >= d);
        const smaller = stock.filter((s) => s.diameterM <= d);
        if (bigger.length === 0) expect(up).toBeUndefined();
        else expect(up!.diameterM).toBe(Math.min(...bigger.map((s) => s.diameterM)));
        if (smaller.length === 0) expect(down).toBeUndefined();
        else expect(down!.diameterM).toBe(Math.max(...smaller.map((s) => s.diameterM)));
      }),
    );
  });
});
