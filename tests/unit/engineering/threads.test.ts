import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  ALL_THREADS,
  UNIFIED_THREADS,
  METRIC_THREADS,
  parseThread,
  threadEngagementPct,
  tapDrill,
  clearanceDrill,
  type Thread,
} from "@/lib/engineering/threads";
import { passagePlug, setScrewFor, type PassagePlugResult } from "@/lib/engineering/passage-plug";
import { INCH_DRILLS, METRIC_DRILLS } from "@/lib/engineering/drills";
import { drillRack } from "./drill-rack";

const IN = 0.0254; // NIST SP 811: 1 in = 0.0254 m exactly
const MM = 0.001;

function thread(label: string): Thread {
  const t = parseThread(label);
  if (t === undefined) throw new Error(`no thread ${label}`);
  return t;
}

describe("thread tables", () => {
  it("gives Unified threads their basic major diameters and pitches", () => {
    // ASME B1.1: numbered sizes #n = 0.060 + 0.013 n in (from memory): #0 0.060, #4 0.112, #10 0.190, #12 0.216
    expect(thread("0-80").majorM / IN).toBeCloseTo(0.06, 9);
    expect(thread("4-40").majorM / IN).toBeCloseTo(0.112, 9);
    expect(thread("10-32").majorM / IN).toBeCloseTo(0.19, 9);
    expect(thread("12-24").majorM / IN).toBeCloseTo(0.216, 9);
    expect(thread("7/16-14").majorM / IN).toBeCloseTo(0.4375, 9);
    // 40 threads per inch -> pitch 0.025 in
    expect(thread("4-40").pitchM / IN).toBeCloseTo(0.025, 12);
  });

  it("has the UNC and UNF pitches of ASME B1.1", () => {
    // ASME B1.1 coarse and fine series, #0 to 1/2 in (from memory; #0 has no coarse size)
    const expected = [
      "#0-80 UNF", "#1-64 UNC", "#1-72 UNF", "#2-56 UNC", "#2-64 UNF", "#3-48 UNC", "#3-56 UNF", "#4-40 UNC",
      "#4-48 UNF", "#5-40 UNC", "#5-44 UNF", "#6-32 UNC", "#6-40 UNF", "#8-32 UNC", "#8-36 UNF", "#10-24 UNC",
      "#10-32 UNF", "#12-24 UNC", "#12-28 UNF", "1/4-20 UNC", "1/4-28 UNF", "5/16-18 UNC", "5/16-24 UNF",
      "3/8-16 UNC", "3/8-24 UNF", "7/16-14 UNC", "7/16-20 UNF", "1/2-13 UNC", "1/2-20 UNF",
    ];
    expect(UNIFIED_THREADS.map((t) => t.label)).toEqual(expected);
  });

  it("has the ISO 261 coarse and fine pitches", () => {
    // ISO 261 (from memory): coarse M1.6x0.35 ... M12x1.75; fines listed for each size
    const coarse = METRIC_THREADS.filter((t) => t.series === "coarse").map((t) => t.label);
    expect(coarse).toEqual([
      "M1.6x0.35", "M2x0.4", "M2.5x0.45", "M3x0.5", "M3.5x0.6", "M4x0.7", "M5x0.8", "M6x1", "M8x1.25", "M10x1.5",
      "M12x1.75",
    ]);
    const fine = METRIC_THREADS.filter((t) => t.series === "fine").map((t) => t.label);
    for (const label of ["M8x1", "M8x0.75", "M10x1.25", "M10x1", "M12x1.5", "M12x1.25", "M12x1", "M4x0.5", "M6x0.75"]) {
      expect(fine).toContain(label);
    }
    expect(thread("M12x1.75").majorM).toBeCloseTo(12 * MM, 12);
    expect(thread("M12x1.75").pitchM).toBeCloseTo(1.75 * MM, 12);
  });

  it("lists every thread smallest first, coarse before fine at one size", () => {
    for (let i = 1; i < ALL_THREADS.length; i++) {
      expect(ALL_THREADS[i]!.majorM).toBeGreaterThanOrEqual(ALL_THREADS[i - 1]!.majorM);
    }
    const m8 = ALL_THREADS.filter((t) => t.label.startsWith("M8x")).map((t) => t.label);
    expect(m8).toEqual(["M8x1.25", "M8x1", "M8x0.75"]);
  });
});

describe("parseThread", () => {
  it.each([
    ["4-40", "#4-40 UNC"],
    ["#4-40", "#4-40 UNC"],
    ["4-40 UNC", "#4-40 UNC"],
    ["no. 4-40", "#4-40 UNC"],
    ["4-48", "#4-48 UNF"],
    ["10-32 unf", "#10-32 UNF"],
    ["1/4-20", "1/4-20 UNC"],
    ['1/4"-20 UNC-2B', "1/4-20 UNC"],
    ["M3x0.5", "M3x0.5"],
    ["M3", "M3x0.5"],
    ["m3 x 0.5", "M3x0.5"],
    ["M3×0.35", "M3x0.35"],
    ["M8x1", "M8x1"],
    ["M8 fine", "M8x1"],
    ["M1.6", "M1.6x0.35"],
  ])("reads %j as %s", (input, label) => {
    expect(parseThread(input)?.label).toBe(label);
  });

  it.each(["4-41", "4-40 UNF", "0-64", "M3x0.6", "M7", "M8x1 coarse", "1/4", "", "3/4-10"])("finds no thread for %j", (input) => {
    expect(parseThread(input)).toBeUndefined();
  });
});

describe("threadEngagementPct", () => {
  it("matches the handbook's percentage-of-thread rule", () => {
    // Machinery's Handbook (from memory): percent of thread = TPI x (major - drill) / 0.01299, inch units.
    // 4-40 with #43 (0.0890): 40 x 0.023 / 0.01299 = 70.82 %
    expect(threadEngagementPct(0.112 * IN, 0.025 * IN, 0.089 * IN)).toBeCloseTo(70.82, 1);
    // M3x0.5 with 2.5 mm: (3 - 2.5) / (1.299038 x 0.5) = 76.98 %  (domain formula, by hand)
    expect(threadEngagementPct(3 * MM, 0.5 * MM, 2.5 * MM)).toBeCloseTo(76.98, 2);
  });
});

describe("tapDrill", () => {
  // Machinery's Handbook tap-drill table for about 75 % thread (from memory); the same pairs are printed in every
  // shop tap chart.
  it.each([
    ["0-80", "3/64"],
    ["1-64", "#53"],
    ["2-56", "#50"],
    ["3-48", "#47"],
    ["4-40", "#43"],
    ["4-48", "#42"],
    ["5-40", "#38"],
    ["6-32", "#36"],
    ["6-40", "#33"],
    ["8-32", "#29"],
    ["8-36", "#29"],
    ["10-24", "#25"],
    ["10-32", "#21"],
    ["12-24", "#16"],
    ["1/4-20", "#7"],
    ["1/4-28", "#3"],
    ["5/16-18", "F"],
    ["5/16-24", "I"],
    ["3/8-16", "5/16"],
    ["3/8-24", "Q"],
    ["7/16-14", "U"],
    ["7/16-20", "25/64"],
    ["1/2-13", "27/64"],
    ["1/2-20", "29/64"],
  ])("picks the handbook drill for %s: %s", (label, drill) => {
    expect(tapDrill(thread(label)).drill.label).toBe(drill);
  });

  // ISO 2306 / handbook metric tap drills, drill = D - P (from memory).
  it.each([
    ["M1.6x0.35", "1.25 mm"],
    ["M2x0.4", "1.60 mm"],
    ["M2.5x0.45", "2.05 mm"],
    ["M3x0.5", "2.50 mm"],
    ["M4x0.7", "3.30 mm"],
    ["M5", "4.20 mm"],
    ["M6", "5.00 mm"],
    ["M8", "6.80 mm"],
    ["M10", "8.50 mm"],
    ["M8x1", "7.00 mm"],
    ["M10x1.25", "8.80 mm"],
    ["M12x1.5", "10.50 mm"],
    ["M12x1.25", "10.80 mm"],
  ])("picks the handbook drill for %s: %s", (label, drill) => {
    expect(tapDrill(thread(label)).drill.label).toBe(drill);
  });

  it("differs from the handbook for M12x1.75, and says why", () => {
    // ISO 2306 / handbook (from memory): M12x1.75 -> 10.2 mm, i.e. D - P = 10.25 mm rounded down (77 % thread).
    // At 75 % the ideal drill is 12 - 0.75 x 1.299038 x 1.75 = 10.295 mm, so the nearest stocked size is 10.3 mm.
    const r = tapDrill(thread("M12x1.75"));
    expect(r.idealM / MM).toBeCloseTo(10.295, 3);
    expect(r.drill.label).toBe("10.30 mm");
    // Asking for the handbook's 77 % gives the handbook's drill.
    expect(tapDrill(thread("M12x1.75"), { engagementPct: 77 }).drill.label).toBe("10.20 mm");
  });

  it("reports the engagement the chosen drill really gives", () => {
    // 4-40 with #43: 70.82 % (worked above from the handbook rule)
    expect(tapDrill(thread("4-40")).engagementPct).toBeCloseTo(70.82, 1);
  });

  it("keeps to the thread's system unless told otherwise", () => {
    expect(tapDrill(thread("4-40")).drill.system).not.toBe("metric");
    expect(tapDrill(thread("M3")).drill.system).toBe("metric");
    // 4-40 at 75 %: ideal 0.112 - 0.75 x 1.299038 x 0.025 = 0.08764 in = 2.226 mm; nearest metric 2.25 mm
    expect(tapDrill(thread("4-40"), { allowOtherSystem: true }).drill.label).toBe("2.25 mm");
  });

  it("chooses only from the drills given", () => {
    const stock = drillRack(["#44", "3/32", "2.20 mm"]);
    // 4-40 ideal 0.08764 in: #44 (0.0860) is 0.0016 off, 2.20 mm (0.0866) 0.0010 off, 3/32 (0.0938) 0.0061 off
    expect(tapDrill(thread("4-40"), { drills: stock }).drill.label).toBe("2.20 mm");
    expect(() => tapDrill(thread("4-40"), { drills: drillRack(["1/4"]) })).toThrow(/drills/);
  });

  it("refuses an engagement above the basic minor diameter's 83.3 %, naming the field", () => {
    expect(() => tapDrill(thread("4-40"), { engagementPct: 0 })).toThrow(/engagementPct/);
    // ASME B1.1: basic minor diameter of 4-40 = 0.112 - 1.082532 x 0.025 = 0.112 - 0.0270633 = 0.0849367 in.
    // Its engagement: 0.0270633 / (1.299038 x 0.025 = 0.0324760) = 0.8333, i.e. 83.3 %. At 100 % the ideal drill
    // would be 0.112 - 0.0324760 = 0.0795 in, nearest #47 (0.0785, ASME B94.11M): a drill under the root.
    expect(() => tapDrill(thread("4-40"), { engagementPct: 100 })).toThrow(/engagementPct.*83\.3 %/);
    expect(() => tapDrill(thread("4-40"), { engagementPct: 84 })).toThrow(/engagementPct/);
    // ISO 724: D1 = D - 1.082532 P as well, so the same 83.3 % bounds M3x0.5
    expect(() => tapDrill(thread("M3"), { engagementPct: 90 })).toThrow(/engagementPct/);
    expect(tapDrill(thread("4-40"), { engagementPct: 83.3 }).drill.label).toBe("#44");
  });

  it("never takes a drill under the basic minor diameter", () => {
    // 4-40 at 83 %: ideal 0.112 - 0.83 x 0.0324760 = 0.08504 in. Of #45 (0.0820) and 3/32 (0.09375), #45 is nearer
    // (0.0030 off against 0.0087) but under the basic minor 0.08494 in worked above, so 3/32 is the answer:
    // (0.112 - 0.09375) / 0.0324760 = 56.2 %.
    const r = tapDrill(thread("4-40"), { engagementPct: 83, drills: drillRack(["#45", "3/32"]) });
    expect(r.drill.label).toBe("3/32");
    expect(r.engagementPct).toBeCloseTo(56.2, 1);
    expect(() => tapDrill(thread("4-40"), { drills: drillRack(["#45"]) })).toThrow(/drills: .*basic minor/);
  });

  it("gives the engagement of the formula and the nearest drill, for any thread and target", () => {
    fc.assert(
      fc.property(fc.constantFrom(...ALL_THREADS), fc.double({ min: 50, max: 83.3, noNaN: true }), (t, pct) => {
        const r = tapDrill(t, { engagementPct: pct });
        const d = r.drill.diameterM;
        // percent = (D - d) / (1.299038 P) x 100 (domain formula), written out here
        expect(r.engagementPct).toBeCloseTo(((t.majorM - d) / (1.299038 * t.pitchM)) * 100, 9);
        expect(r.idealM).toBeCloseTo(t.majorM - (pct / 100) * 1.299038 * t.pitchM, 12);
        // ASME B1.1 / ISO 724 basic minor diameter D - 1.082532 P: the drill is never under it
        const minor = t.majorM - 1.082532 * t.pitchM;
        expect(d).toBeGreaterThanOrEqual(minor - 1e-9);
        const pool = t.system === "unified" ? INCH_DRILLS : METRIC_DRILLS;
        for (const other of pool.filter((o) => o.diameterM < t.majorM && o.diameterM >= minor - 1e-9)) {
          expect(Math.abs(other.diameterM - r.idealM)).toBeGreaterThanOrEqual(Math.abs(d - r.idealM) - 1e-15);
        }
      }),
    );
  });
});

describe("clearanceDrill", () => {
  it.each([
    // Close and free fit columns of the usual shop tap-drill chart (common practice, from memory)
    ["4-40", "close", "#32"],
    ["4-40", "free", "#30"],
    ["6-32", "close", "#27"],
    ["6-32", "free", "#25"],
    ["10-32", "close", "#9"],
    ["10-24", "free", "#7"],
    ["1/4-20", "close", "F"],
    ["1/4-28", "free", "H"],
    ["1/2-13", "free", "17/32"],
    // ISO 273 fine (close) and medium (free) series (from memory)
    ["M3", "close", "3.20 mm"],
    ["M3", "free", "3.40 mm"],
    ["M3x0.35", "free", "3.40 mm"],
    ["M6", "close", "6.40 mm"],
    ["M8", "free", "9.00 mm"],
    ["M12", "free", "13.50 mm"],
  ] as const)("%s %s fit: %s", (label, fit, drill) => {
    expect(clearanceDrill(thread(label), fit).label).toBe(drill);
  });

  it("always clears the thread, the free fit at least as much as the close one", () => {
    for (const t of ALL_THREADS) {
      const close = clearanceDrill(t, "close");
      const free = clearanceDrill(t, "free");
      expect(close.diameterM).toBeGreaterThan(t.majorM);
      expect(free.diameterM).toBeGreaterThanOrEqual(close.diameterM);
    }
  });
});

describe("setScrewFor", () => {
  it("takes the longest stocked length that fits", () => {
    // Stocked socket set-screw lengths 1/8 and 3/16 in (ASME B18.3 practice, from memory)
    expect(setScrewFor(thread("4-40"), 0.143 * IN)?.label).toBe("#4-40 UNC x 1/8 in");
    expect(setScrewFor(thread("4-40"), 0.1875 * IN)?.label).toBe("#4-40 UNC x 3/16 in");
    // ISO 4026 preferred lengths include 4 and 5 mm (from memory)
    expect(setScrewFor(thread("M3"), 4.9 * MM)?.lengthM).toBeCloseTo(4 * MM, 12);
    expect(setScrewFor(thread("M3"), 1 * MM)).toBeUndefined();
  });
});

function plugOf(result: PassagePlugResult) {
  if (!result.ok) throw new Error(`expected a plug, got: ${result.message}`);
  return result.plug;
}

function refusalOf(result: PassagePlugResult) {
  if (result.ok) throw new Error(`expected a refusal, got ${result.plug.thread.label} with ${result.plug.drill.label}`);
  return result;
}

describe("passagePlug", () => {
  it("plugs a 0.085 in passage with #4-40 and a #43 drill", () => {
    // domain.md and handbook tap-drill tables: #4-40 with a #43 (0.0890 in) drill; the passage is cleaned up
    const plug = plugOf(passagePlug({ passageDiameterM: 0.085 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN }));
    expect(plug.thread.label).toBe("#4-40 UNC");
    expect(plug.drill.label).toBe("#43");
    expect(plug.tapLabel).toBe("#4-40 UNC plug tap");
    expect(plug.engagementPct).toBeCloseTo(70.82, 1); // worked above
    // Tap depth 1.5 x 0.112 = 0.168 in; drill depth 0.168 + 3 x 0.025 = 0.243 in (common practice rules)
    expect(plug.tapDepthM / IN).toBeCloseTo(0.168, 9);
    expect(plug.drillDepthM / IN).toBeCloseTo(0.243, 9);
    // Set screw: longest stocked length not over 0.168 - 0.025 = 0.143 in is 1/8 in
    expect(plug.setScrewLengthM! / IN).toBeCloseTo(0.125, 9);
    expect(plug.setScrew?.label).toBe("#4-40 UNC x 1/8 in");
    // Wall left: 0.25 - (0.112 - 0.085) / 2 = 0.2365 in
    expect(plug.remainingWallM / IN).toBeCloseTo(0.2365, 9);
    expect(plug.warnings).toEqual([]);
  });

  it("prefers the coarse thread when both series of a size qualify", () => {
    // Both 4-40 (#43, 70.8 %) and 4-48 (#42, 68.4 %) clean up 0.085 in; coarse holds better in castings
    // (common practice, no published source)
    const both = plugOf(
      passagePlug({ passageDiameterM: 0.085 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN, threads: [thread("4-48"), thread("4-40")] }),
    );
    expect(both.thread.label).toBe("#4-40 UNC");
    const fineOnly = plugOf(
      passagePlug({ passageDiameterM: 0.085 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN, threads: [thread("4-48")] }),
    );
    // Handbook tap drill for 4-48: #42
    expect(fineOnly.drill.label).toBe("#42");
  });

  it("moves up a size when the usual drill would not clean the passage up", () => {
    // 0.0895 in is over #43 (0.0890). 4-40 needs a drill from 0.0895 up to its 60 % drill,
    // 0.112 - 0.6 x 1.299038 x 0.025 = 0.0925 in: #42 (0.0935, ASME B94.11M) is past it.
    // 5-40 (0.125 in): 80 %..60 % drills 0.125 - 0.0260 = 0.0990 .. 0.125 - 0.0195 = 0.1055 in; 75 % ideal
    // 0.125 - 0.0244 = 0.1006; #38 (0.1015) is 0.0009 off, #39 (0.0995) 0.0011: #38, the handbook's 5-40 drill.
    const plug = plugOf(
      passagePlug({ passageDiameterM: 0.0895 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN, threads: UNIFIED_THREADS }),
    );
    expect(plug.thread.label).toBe("#5-40 UNC");
    expect(plug.drill.label).toBe("#38");
    // (0.125 - 0.1015) / (1.299038 x 0.025) = 0.0235 / 0.032476 = 72.4 %
    expect(plug.engagementPct).toBeCloseTo(72.4, 1);
  });

  it("warns when the wall is thin", () => {
    // 0.010 in of wall less (0.112 - 0.085) / 2 = 0.0135 in of growth breaks through
    const plug = plugOf(passagePlug({ passageDiameterM: 0.085 * IN, wallThicknessM: 0.01 * IN, depthAvailableM: 0.5 * IN }));
    expect(plug.remainingWallM / IN).toBeCloseTo(-0.0035, 9);
    expect(plug.warnings.join(" ")).toMatch(/breaks through/);
  });

  it("warns when the depth is short, and when no set screw fits", () => {
    // 0.150 in available less 3 x 0.025 of lead = 0.075 in of thread, short of 1.5 x 0.112 = 0.168 in;
    // a set screw must be at most 0.075 - 0.025 = 0.050 in, under the shortest stocked 1/16 in
    const plug = plugOf(passagePlug({ passageDiameterM: 0.085 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.15 * IN }));
    expect(plug.tapDepthM / IN).toBeCloseTo(0.075, 9);
    expect(plug.drillDepthM / IN).toBeCloseTo(0.15, 9);
    expect(plug.setScrewLengthM).toBeNull();
    expect(plug.warnings.some((w) => /full thread/.test(w))).toBe(true);
    expect(plug.warnings.some((w) => /set screw/.test(w))).toBe(true);
  });

  it("refuses a passage wider than the offered threads can plug, and names the thread that would", () => {
    // 6-32 (0.138 in, 32 tpi) in a 0.140 in passage: the drill would be over the major diameter, no thread forms.
    // 8-32 (0.164 in): its 60 % drill is 0.164 - 0.6 x 1.299038 / 32 = 0.1396 in, under 0.140: no.
    // 10-24 (0.190 in): 80 %..60 % drills 0.190 - 0.0433 = 0.1467 .. 0.190 - 0.0325 = 0.1575 in; 75 % ideal
    // 0.190 - 0.0406 = 0.1494; #25 (0.1495, ASME B94.11M) is nearest, the handbook's 10-24 drill:
    // (0.190 - 0.1495) / 0.054127 = 74.8 %.
    const refusal = refusalOf(
      passagePlug({ passageDiameterM: 0.14 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN, threads: [thread("4-40"), thread("6-32")] }),
    );
    expect(refusal.code).toBe("no_plug");
    expect(refusal.missing).toEqual({ thread: "#10-24 UNC" });
    expect(refusal.message).toMatch(/0\.1400 in passage/);
    expect(refusal.message).toMatch(/#10-24 UNC with a #25/);
  });

  it("refuses rather than plug outside 60-80 % engagement", () => {
    // 6-32 on a 0.120 in passage: drills from #31 (0.120) up give at most (0.138 - 0.120) / (1.299038 / 32) = 44 %.
    // 8-32: 80 %..60 % drills 0.164 - 0.0325 = 0.1315 .. 0.1396 in; only #29 (0.1360) lies there:
    // (0.164 - 0.136) / 0.040595 = 69 %.
    const refusal = refusalOf(
      passagePlug({ passageDiameterM: 0.12 * IN, wallThicknessM: 0.25 * IN, depthAvailableM: 0.5 * IN, threads: [thread("4-40"), thread("6-32")] }),
    );
    expect(refusal.missing).toEqual({ thread: "#8-32 UNC" });
    expect(refusal.message).toMatch(/60-80 %/);
    expect(refusal.message).toMatch(/#8-32 UNC with a #29/);
  });

  it("names both the thread and the drill when the shop lacks both", () => {
    // 0.140 in passage, 6-32 offered, only #36 (0.1065 in) stocked. 10-24 with a #25 would do (worked above).
    const refusal = refusalOf(
      passagePlug({
        passageDiameterM: 0.14 * IN,
        wallThicknessM: 0.25 * IN,
        depthAvailableM: 0.5 * IN,
        threads: [thread("6-32")],
        drills: drillRack(["#36"]),
      }),
    );
    expect(refusal.missing).toEqual({ thread: "#10-24 UNC", drill: "#25" });
    expect(refusal.message).toMatch(/#10-24 UNC with a #25.*not stocked either/);
  });

  it("names a thread the shop's own drills suit when only the thread is missing", () => {
    // 0.140 in passage, 6-32 offered, #25 (0.1495 in) stocked: 10-24 takes it (74.8 %, worked above)
    const refusal = refusalOf(
      passagePlug({
        passageDiameterM: 0.14 * IN,
        wallThicknessM: 0.25 * IN,
        depthAvailableM: 0.5 * IN,
        threads: [thread("6-32")],
        drills: drillRack(["#25", "#36"]),
      }),
    );
    expect(refusal.missing).toEqual({ thread: "#10-24 UNC" });
  });

  it("refuses when no stocked drill cleans the passage up, naming the drill", () => {
    // A rack of small drills: #50 (0.0700), #52 (0.0635), #55 (0.0520), ASME B94.11M; none reaches 0.085 in.
    const refusal = refusalOf(
      passagePlug({
        passageDiameterM: 0.085 * IN,
        wallThicknessM: 0.25 * IN,
        depthAvailableM: 0.5 * IN,
        threads: UNIFIED_THREADS,
        drills: drillRack(["#50", "#52", "#55"]),
      }),
    );
    expect(refusal.missing).toEqual({ drill: "#43" });
    expect(refusal.message).toMatch(/largest is #50, 0\.0700 in/);
    expect(refusal.message).toMatch(/#4-40 UNC with a #43/);
  });

  it("refuses when the stocked drills clean up but miss the band, with the band in the message", () => {
    // 4-40 on 0.085 in: drills from 0.112 - 0.8 x 0.032476 = 0.0860 in to 0.112 - 0.6 x 0.032476 = 0.0925 in.
    // #40 (0.0980) is past every small thread's band (5-40 starts at 0.0990); #50 does not clean up.
    const refusal = refusalOf(
      passagePlug({
        passageDiameterM: 0.085 * IN,
        wallThicknessM: 0.25 * IN,
        depthAvailableM: 0.5 * IN,
        threads: UNIFIED_THREADS,
        drills: drillRack(["#40", "#50"]),
      }),
    );
    expect(refusal.missing).toEqual({ drill: "#43" });
    expect(refusal.message).toMatch(/between 0\.0860 and 0\.0925 in/);
  });

  it("names a metric drill for metric threads", () => {
    // A 3.00 mm passage with only a 2.50 mm drill. M3.5x0.6: 80 %..60 % drills 3.5 - 0.6235 = 2.876 .. 3.5 - 0.4677
    // = 3.032 mm; the 3.00 mm drill (BS 328 series) cleans up and gives (3.5 - 3.0) / (1.299038 x 0.6) = 64.2 %.
    const refusal = refusalOf(
      passagePlug({
        passageDiameterM: 3 * MM,
        wallThicknessM: 5 * MM,
        depthAvailableM: 10 * MM,
        threads: METRIC_THREADS,
        drills: drillRack(["2.50 mm"]),
      }),
    );
    expect(refusal.missing).toEqual({ drill: "3.00 mm" });
    expect(refusal.message).toMatch(/M3\.5x0\.6 with a 3\.00 mm/);
  });

  it("when it plugs, cleans up and keeps the drill between the basic minor and major diameters", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.02 * IN, max: 0.4 * IN, noNaN: true }), (passage) => {
        const result = passagePlug({ passageDiameterM: passage, wallThicknessM: 0.5 * IN, depthAvailableM: 1 * IN });
        if (!result.ok) {
          expect(result.message.length).toBeGreaterThan(0);
          return;
        }
        const { plug } = result;
        expect(plug.drill.diameterM).toBeGreaterThanOrEqual(passage - 1e-9);
        expect(plug.drill.diameterM).toBeLessThan(plug.thread.majorM);
        // ASME B1.1 / ISO 724: basic minor diameter D - 1.082532 P
        expect(plug.drill.diameterM).toBeGreaterThanOrEqual(plug.thread.majorM - 1.082532 * plug.thread.pitchM);
        expect(plug.engagementPct).toBeGreaterThanOrEqual(60 - 1e-9);
        expect(plug.engagementPct).toBeLessThanOrEqual(80 + 1e-9);
        expect(plug.drillDepthM).toBeGreaterThan(plug.tapDepthM);
        expect(plug.setScrewLengthM ?? 0).toBeLessThanOrEqual(plug.tapDepthM - plug.thread.pitchM + 1e-9);
      }),
    );
  });

  it("refuses impossible inputs, naming the field", () => {
    expect(() => passagePlug({ passageDiameterM: 0, wallThicknessM: 0.01, depthAvailableM: 0.01 })).toThrow(/passageDiameterM/);
    expect(() => passagePlug({ passageDiameterM: 0.002, wallThicknessM: -1, depthAvailableM: 0.01 })).toThrow(/wallThicknessM/);
    expect(() => passagePlug({ passageDiameterM: 0.002, wallThicknessM: 0.01, depthAvailableM: Number.NaN })).toThrow(/depthAvailableM/);
    expect(() => passagePlug({ passageDiameterM: 0.002, wallThicknessM: 0.01, depthAvailableM: 0.01, threads: [] })).toThrow(/threads/);
    expect(() => passagePlug({ passageDiameterM: 0.002, wallThicknessM: 0.01, depthAvailableM: 0.01, drills: [] })).toThrow(/drills/);
  });
});
