// The tap-drill chart against the handbook tap-drill tables (75 % thread, the figures the usual shop charts
// print). Values from memory of those tables.
import { describe, expect, it } from "vitest";
import { searchTapDrillRows, TAP_DRILL_ROWS } from "@/app/(office)/reference/tap-drills/chart-rows";
import { ALL_THREADS } from "@/lib/engineering/threads";

const row = (label: string) => {
  const found = TAP_DRILL_ROWS.find((r) => r.label === label);
  if (!found) throw new Error(`no row ${label}`);
  return found;
};

describe("tap-drill chart", () => {
  it("has one row for every thread in the tables", () => {
    expect(TAP_DRILL_ROWS).toHaveLength(ALL_THREADS.length);
  });

  it("gives the handbook tap drills", () => {
    expect(row("#4-40 UNC").tapDrill.label).toBe("#43"); // handbook tap-drill table: 4-40 -> #43
    expect(row("#6-32 UNC").tapDrill.label).toBe("#36"); // handbook: 6-32 -> #36
    expect(row("#8-32 UNC").tapDrill.label).toBe("#29"); // handbook: 8-32 -> #29
    expect(row("#10-32 UNF").tapDrill.label).toBe("#21"); // handbook: 10-32 -> #21
    expect(row("1/4-20 UNC").tapDrill.label).toBe("#7"); // handbook: 1/4-20 -> #7
    expect(row("5/16-18 UNC").tapDrill.label).toBe("F"); // handbook: 5/16-18 -> F
    expect(row("3/8-16 UNC").tapDrill.label).toBe("5/16"); // handbook: 3/8-16 -> 5/16
    expect(row("M3x0.5").tapDrill.label).toBe("2.50 mm"); // handbook: M3 -> 2.5 mm
    expect(row("M6x1").tapDrill.label).toBe("5.00 mm"); // handbook: M6 -> 5.0 mm
  });

  it("gives the engagement the drill really gives and the thread's sizes", () => {
    const r = row("#4-40 UNC");
    // (0.112 - 0.089) / (1.299038 x 0.025) x 100 = 0.023 / 0.03247595 x 100 = 70.82 %
    expect(r.engagementPct).toBeCloseTo(70.82, 1);
    expect(r.major.in).toBeCloseTo(0.112, 6); // ASME B1.1: #4 = 0.060 + 0.013 x 4 = 0.112 in
    expect(r.tpi).toBe(40);
    expect(row("M3x0.5").tpi).toBeNull();
    expect(row("M3x0.5").pitch.mm).toBeCloseTo(0.5, 6); // ISO 261: M3 coarse pitch 0.5 mm
  });

  it("finds threads as a shop writes them", () => {
    expect(searchTapDrillRows("4-40", undefined).map((r) => r.label)).toEqual(["#4-40 UNC"]);
    expect(searchTapDrillRows("#10-32", undefined).map((r) => r.label)).toEqual(["#10-32 UNF"]);
    expect(searchTapDrillRows("M8", undefined).map((r) => r.label)).toEqual(["M8x1.25", "M8x1", "M8x0.75"]); // ISO 261: M8 coarse 1.25, fine 1 and 0.75
    expect(searchTapDrillRows("", "metric").every((r) => r.system === "metric")).toBe(true);
    expect(searchTapDrillRows("4-40", "metric")).toEqual([]);
  });
});
