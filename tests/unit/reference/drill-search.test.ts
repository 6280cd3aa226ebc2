// The drill chart's search box: labels and sizes a shop types, against ASME B94.11M sizes.
import { describe, expect, it } from "vitest";
import { drillDto } from "@/lib/format/quantity-pairs";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { searchDrills } from "@/app/(office)/reference/drills/drill-search";

const DRILLS = ALL_DRILLS.map(drillDto);
const labels = (text: string, system?: "number" | "letter" | "fraction" | "metric") => searchDrills(DRILLS, { text, system }).map((d) => d.label);

describe("drill chart search", () => {
  it("finds a number drill by its number, with or without the #", () => {
    expect(labels("43")).toEqual(["#43"]); // ASME B94.11M: #43 exists, and no other drill is labelled 43
    expect(labels("#43")).toEqual(["#43"]);
    expect(labels("no. 43")).toEqual(["#43"]);
  });

  it("finds letter and fractional drills by label", () => {
    expect(labels("q")).toEqual(["Q"]); // ASME B94.11M letter drill Q = 0.332 in
    expect(labels("1/8")).toEqual(["1/8"]);
  });

  it("finds drills by a decimal-inch size at the decimals typed", () => {
    // ASME B94.11M: #43 = 0.0890 in; no other inch drill is 0.089 in to three decimals (#42 = 0.0935,
    // #44 = 0.0860). The metric 2.25 mm is: 2.25 / 25.4 = 0.08858 in -> 0.089. Smallest first.
    expect(labels("0.089")).toEqual(["2.25 mm", "#43"]);
    // To four decimals only #43 is 0.0890 in (2.25 mm is 0.0886).
    expect(labels("0.0890")).toEqual(["#43"]);
    expect(labels("0.0890 in")).toEqual(["#43"]);
  });

  it("finds a metric size and the inch drills that round to it", () => {
    // 2.5 mm to one decimal: 2.50 mm itself; #40 = 0.0980 in = 2.4892 mm -> 2.5; #39 = 0.0995 in = 2.5273 mm -> 2.5;
    // #41 = 0.0960 in = 2.4384 mm -> 2.4 (out); 3/32 = 0.09375 in = 2.3813 mm (out). Hand arithmetic, x 25.4.
    const found = labels("2.5");
    expect(found).toContain("2.50 mm");
    expect(found).toContain("#40");
    expect(found).toContain("#39");
    expect(found).not.toContain("#41");
    expect(found).not.toContain("3/32");
  });

  it("keeps to the series chosen", () => {
    expect(labels("2.5", "metric").every((l) => l.endsWith("mm"))).toBe(true);
    expect(labels("", "letter")).toHaveLength(26); // A to Z
  });

  it("finds nothing for a size no standard drill has", () => {
    expect(labels("0.0001")).toEqual([]);
    expect(labels("banana")).toEqual([]);
  });
});
