import { describe, expect, it } from "vitest";
import { COMMON_PICKUP_TUBE_OD_M, planPickupTube } from "@/lib/engineering/pickup-tube";
import { M_PER_IN } from "./nist-factors";

const mm = (v: number) => v / 1000;

describe("planPickupTube", () => {
  const segments = [
    { kind: "straight", lengthM: mm(20) },
    { kind: "bend", angleRad: Math.PI / 2, centerlineRadiusM: mm(15) },
    { kind: "straight", lengthM: mm(10) },
  ] as const;

  it("adds straight runs, bend arcs and the swage", () => {
    const plan = planPickupTube({ segments, swageEngagementM: mm(8) });
    // Hand: arc = 15 mm x pi/2 = 23.5619 mm; 20 + 23.5619 + 10 + 8 = 61.5619 mm.
    expect(plan.arcM * 1000).toBeCloseTo(23.5619, 4);
    expect(plan.cutLengthM * 1000).toBeCloseTo(61.5619, 4);
  });

  it("traces where the tube ends and how far it reaches", () => {
    const plan = planPickupTube({ segments, swageEngagementM: mm(8) });
    // Hand: 20 mm rearward; a 90° bend down of radius 15 mm moves 15 mm rearward and 15 mm down (35, 15);
    // then 10 mm straight down: (35, 25) mm.
    expect(plan.end.xM * 1000).toBeCloseTo(35, 6);
    expect(plan.end.yM * 1000).toBeCloseTo(25, 6);
    expect(plan.reach.rearwardM * 1000).toBeCloseTo(35, 6);
    expect(plan.reach.downwardM * 1000).toBeCloseTo(25, 6);
  });

  it("checks the reach against the room the bowl leaves, with the tube's half diameter", () => {
    // 5/16 in tube (common practice, no published source): half of 7.9375 mm = 3.96875 mm.
    // Hand: down 25 + 3.96875 = 28.96875 mm > 28 mm limit; rearward 35 + 3.96875 = 38.96875 mm < 40 mm.
    expect(COMMON_PICKUP_TUBE_OD_M).toBeCloseTo((5 / 16) * M_PER_IN, 12);
    const plan = planPickupTube({
      segments,
      swageEngagementM: mm(8),
      outsideDiameterM: COMMON_PICKUP_TUBE_OD_M,
      maxReach: { rearwardM: mm(40), downwardM: mm(28) },
    });
    expect(plan.reach.downwardM * 1000).toBeCloseTo(28.96875, 6);
    expect(plan.fitsBowl).toBe(false);
    expect(plan.exceeds).toEqual(["downward"]);
  });

  it("finds the farthest point inside a bend that turns past the vertical", () => {
    // Hand: a 135° bend of radius 10 mm starting rearward turns about a center at (0, 10) mm. The point at
    // heading θ is (10 sin θ, 10 - 10 cos θ): farthest rearward at θ = 90°, (10, 10) mm; the end at 135° is
    // (10 x 0.70711, 10 + 10 x 0.70711) = (7.0711, 17.0711) mm, also the lowest point.
    const plan = planPickupTube({ segments: [{ kind: "bend", angleRad: (3 * Math.PI) / 4, centerlineRadiusM: mm(10) }], swageEngagementM: 0 });
    expect(plan.reach.rearwardM * 1000).toBeCloseTo(10, 9);
    expect(plan.reach.downwardM * 1000).toBeCloseTo(17.0711, 4);
    expect(plan.end.xM * 1000).toBeCloseTo(7.0711, 4);
    expect(plan.end.yM * 1000).toBeCloseTo(17.0711, 4);
  });

  it("turns up for a negative angle", () => {
    // Hand: 90° up, radius 10 mm: ends at (10, -10) mm; never below the start, never behind 10 mm.
    const plan = planPickupTube({ segments: [{ kind: "bend", angleRad: -Math.PI / 2, centerlineRadiusM: mm(10) }], swageEngagementM: 0 });
    expect(plan.end.xM * 1000).toBeCloseTo(10, 9);
    expect(plan.end.yM * 1000).toBeCloseTo(-10, 9);
    expect(plan.reach.downwardM).toBe(0);
  });

  it("refuses a bend tighter than the tube", () => {
    expect(() =>
      planPickupTube({
        segments: [{ kind: "bend", angleRad: 1, centerlineRadiusM: mm(3) }],
        swageEngagementM: 0,
        outsideDiameterM: COMMON_PICKUP_TUBE_OD_M,
      }),
    ).toThrow(RangeError);
  });
});
