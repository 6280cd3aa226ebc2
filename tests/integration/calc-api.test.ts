// The public calculator API, called as a client would, with expected figures from outside the project.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { GET as drillsRoute } from "@/app/api/calc/drills/route";
import { GET as tapDrillRoute } from "@/app/api/calc/tap-drill/route";
import { POST as orificeRoute } from "@/app/api/calc/orifice/route";
import { POST as restrictionRoute } from "@/app/api/calc/restriction/route";
import { POST as passagePlugRoute } from "@/app/api/calc/passage-plug/route";
import { POST as grindRoute } from "@/app/api/calc/grind/route";
import { POST as pickupTubeRoute } from "@/app/api/calc/pickup-tube/route";
import { POST as stagingRoute } from "@/app/api/calc/staging/route";
import { jsonRequest } from "./support/database";

const get = (path: string) => new Request(`http://127.0.0.1${path}`);

describe("GET /api/calc/drills", () => {
  it("lists the standard series with labels, systems and both units", async () => {
    const response = await drillsRoute(get("/api/calc/drills"));
    expect(response.status).toBe(200);
    const { drills } = await response.json();
    const byLabel = new Map(drills.map((d: { label: string }) => [d.label, d]));
    expect(byLabel.get("#43")).toEqual({ label: "#43", system: "number", inch: 0.089, mm: 2.2606 }); // ASME B94.11M: #43 = 0.0890 in; x 25.4 = 2.2606 mm
    expect(byLabel.get("Q")).toMatchObject({ system: "letter", inch: 0.332 }); // ASME B94.11M: Q = 0.3320 in
    expect(byLabel.get("1/8")).toMatchObject({ system: "fraction", inch: 0.125 }); // 1/8 in = 0.125 in exactly
    expect(byLabel.get("2.50 mm")).toMatchObject({ system: "metric", mm: 2.5 });
  });

  it("filters by system and names a bad one", async () => {
    const letters = await (await drillsRoute(get("/api/calc/drills?system=letter"))).json();
    expect(letters.drills).toHaveLength(26); // A to Z
    const bad = await drillsRoute(get("/api/calc/drills?system=gauge"));
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.field).toBe("system");
  });
});

describe("GET /api/calc/tap-drill", () => {
  it("gives #43 for 4-40 at 75 %, with the engagement it really gives", async () => {
    const body = await (await tapDrillRoute(get("/api/calc/tap-drill?thread=4-40&engagement=75"))).json();
    expect(body.thread).toMatchObject({ majorIn: 0.112, pitchIn: 0.025 }); // ASME B1.1: #4 = 0.060 + 0.013 x 4 = 0.112 in, 40 tpi
    expect(body.drill).toMatchObject({ label: "#43", system: "number", inch: 0.089 }); // handbook tap-drill table: 4-40 -> #43
    // (0.112 - 0.089) / (1.299038 x 0.025) x 100 = 0.023 / 0.03247595 x 100 = 70.82 %
    expect(body.engagementPct).toBeCloseTo(70.82, 1);
  });

  it("takes metric threads and answers with a metric drill", async () => {
    const body = await (await tapDrillRoute(get("/api/calc/tap-drill?thread=M3x0.5"))).json();
    expect(body.thread.label).toBe("M3x0.5");
    expect(body.drill.label).toBe("2.50 mm"); // ISO 261 pitch 0.5; handbook tap drill for M3 = 2.5 mm
  });

  it("names the field for a missing or unknown thread and a bad engagement", async () => {
    for (const [query, field] of [
      ["", "thread"],
      ["?thread=banana", "thread"],
      ["?thread=4-40&engagement=0", "engagement"],
      ["?thread=4-40&engagement=lots", "engagement"],
      // ASME B1.1: 4-40 basic minor 0.112 - 1.082532 x 0.025 = 0.08494 in, i.e. 0.02706 / 0.03248 = 83.3 %;
      // 100 % would ask for 0.112 - 0.03248 = 0.0795 in, a #47 (0.0785) under the root
      ["?thread=4-40&engagement=100", "engagement"],
      ["?thread=4-40&engagement=83.4", "engagement"],
      ["?thread=4-40&engagement=5e-324", "engagement"],
      ["?thread=4-40&engagement=1e999", "engagement"],
    ] as const) {
      const response = await tapDrillRoute(get(`/api/calc/tap-drill${query}`));
      expect(response.status, query).toBe(400);
      expect((await response.json()).error.field, query).toBe(field);
    }
  });
});

describe("POST /api/calc/orifice", () => {
  it("solves A = m / (Cd sqrt(2 rho dP)) on a hand-worked case", async () => {
    const response = await orificeRoute(
      jsonRequest("/api/calc/orifice", "POST", { flow: { value: 10, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 0.61, densityKgM3: 750 }),
    );
    expect(response.status).toBe(200);
    const body = await response.json();
    // NIST SP 811: 1 psi = 6894.757 Pa. sqrt(2 x 750 x 6894.757) = 3215.919; A = 0.010 / (0.61 x 3215.919) = 5.0976e-6 m2
    expect(body.areaMm2).toBeCloseTo(5.0976, 3);
    expect(body.areaIn2).toBeCloseTo(5.0976 / 645.16, 6); // NIST SP 811: 1 in2 = 645.16 mm2
    // d = sqrt(4 A / pi) = sqrt(4 x 5.0976 / 3.14159) = 2.5476 mm = 0.10030 in
    expect(body.singleHoleDiameterIn).toBeCloseTo(0.1003, 4);
  });

  it("takes a named fuel and a volume flow", async () => {
    const response = await orificeRoute(
      jsonRequest("/api/calc/orifice", "POST", { flow: { value: 600, unit: "cc/min" }, dP: { value: 2, unit: "inHg" }, cd: 0.8, fuel: "E85" }),
    );
    expect(response.status).toBe(200);
    expect((await response.json()).areaIn2).toBeGreaterThan(0);
  });

  it("names the field that is wrong", async () => {
    const cases: [unknown, string][] = [
      [{ flow: { value: 10, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 1.4, densityKgM3: 750 }, "cd"],
      [{ flow: { value: 10, unit: "furlongs" }, dP: { value: 1, unit: "psi" }, cd: 0.6, densityKgM3: 750 }, "flow.unit"],
      [{ flow: { value: -1, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 0.6, densityKgM3: 750 }, "flow.value"],
      [{ flow: { value: 10, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 0.6 }, "fuel"],
      [{ flow: { value: 10, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 0.6, fuel: "diesel" }, "fuel"],
    ];
    for (const [body, field] of cases) {
      const response = await orificeRoute(jsonRequest("/api/calc/orifice", "POST", body));
      expect(response.status, field).toBe(400);
      expect((await response.json()).error.field, JSON.stringify(body)).toBe(field);
    }
  });
});

describe("POST /api/calc/restriction", () => {
  it("finds two #52 holes for the area of two #52 holes", async () => {
    // ASME B94.11M: #52 = 0.0635 in; 2 x pi/4 x 0.0635^2 = 0.0063338 in2
    const response = await restrictionRoute(jsonRequest("/api/calc/restriction", "POST", { targetAreaIn2: 0.0063338, maxHoles: 4 }));
    expect(response.status).toBe(200);
    const { candidates } = await response.json();
    expect(candidates[0]).toMatchObject({ count: 2, drill: { label: "#52" }, fits: true, valveLimited: false });
    expect(Math.abs(candidates[0].errorPct)).toBeLessThan(0.01);
  });

  it("keeps to the drills listed and flags layouts that don't fit the channel", async () => {
    const response = await restrictionRoute(
      jsonRequest("/api/calc/restriction", "POST", {
        targetAreaIn2: 0.02,
        maxHoles: 4,
        drills: ["#43", "1/16", "1/8"],
        channelLengthIn: 0.3,
        minWebIn: 0.03,
      }),
    );
    const { candidates } = await response.json();
    expect(new Set(candidates.map((c: { drill: { label: string } }) => c.drill.label))).toEqual(new Set(["#43", "1/16", "1/8"]));
    // 4 x 1/8 in + 3 x 0.03 in = 0.59 in > 0.3 in: does not fit, and ranks after every layout that does.
    const firstUnfit = candidates.findIndex((c: { fits: boolean }) => !c.fits);
    expect(candidates.slice(firstUnfit).every((c: { fits: boolean }) => !c.fits)).toBe(true);
    expect(candidates.find((c: { count: number; drill: { label: string } }) => c.count === 4 && c.drill.label === "1/8").fits).toBe(false);
  });

  it("says when the valve's own window limits the flow", async () => {
    const response = await restrictionRoute(
      jsonRequest("/api/calc/restriction", "POST", { targetAreaIn2: 0.01, maxHoles: 4, drills: ["1/8"], valveAreaIn2: 0.02 }),
    );
    const { candidates } = await response.json();
    // 2 x pi/4 x 0.125^2 = 0.02454 in2 >= the 0.02 in2 window: the valve, not the holes, sets the flow.
    expect(candidates.find((c: { count: number }) => c.count === 2).valveLimited).toBe(true);
    expect(candidates.find((c: { count: number }) => c.count === 1).valveLimited).toBe(false);
  });

  it("names the field that is wrong", async () => {
    const cases: [unknown, string][] = [
      [{ maxHoles: 2 }, "targetAreaIn2"],
      [{ targetAreaIn2: 0.01, maxHoles: 5 }, "maxHoles"],
      [{ targetAreaIn2: 0.01, maxHoles: 2, drills: ["#43", "#99"] }, "drills.1"],
      // a bare number says no series: #2, 2 mm or 2 in?
      [{ targetAreaIn2: 0.01, maxHoles: 2, drills: ["2"] }, "drills.0"],
      [{ targetAreaIn2: 0.01, maxHoles: 2, drills: ["#43", "2.5"] }, "drills.1"],
      [{ targetAreaMm2: "big", maxHoles: 2 }, "targetAreaMm2"],
    ];
    for (const [body, field] of cases) {
      const response = await restrictionRoute(jsonRequest("/api/calc/restriction", "POST", body));
      expect(response.status, JSON.stringify(body)).toBe(400);
      expect((await response.json()).error.field, JSON.stringify(body)).toBe(field);
    }
  });
});

describe("every calculator endpoint answers 400, never 500, to malformed input", () => {
  const anyJson = fc.oneof(
    fc.jsonValue(),
    fc.record({
      flow: fc.anything(),
      dP: fc.anything(),
      cd: fc.oneof(fc.double(), fc.string()),
      fuel: fc.oneof(fc.string(), fc.anything()),
      densityKgM3: fc.anything(),
      targetAreaIn2: fc.oneof(fc.double(), fc.string()),
      targetAreaMm2: fc.anything(),
      maxHoles: fc.oneof(fc.integer(), fc.double(), fc.string()),
      drills: fc.oneof(fc.array(fc.string()), fc.anything()),
      valveAreaIn2: fc.anything(),
      channelLengthIn: fc.anything(),
      minWebIn: fc.anything(),
      passageDiameter: fc.record({ value: fc.oneof(fc.double(), fc.string()), unit: fc.constantFrom("in", "mm", "ft") }),
      threads: fc.oneof(fc.array(fc.string()), fc.anything()),
      perPass: fc.record({ value: fc.double(), unit: fc.constantFrom("in", "mm") }),
      valves: fc.array(fc.anything()),
    }, { requiredKeys: [] }),
    fc.string(),
  );

  for (const [name, route] of [
    ["orifice", orificeRoute],
    ["restriction", restrictionRoute],
    ["passage-plug", passagePlugRoute],
    ["grind", grindRoute],
    ["pickup-tube", pickupTubeRoute],
    ["staging", stagingRoute],
  ] as const) {
    it(`POST /api/calc/${name}`, async () => {
      await fc.assert(
        fc.asyncProperty(anyJson, async (body) => {
          const raw = typeof body === "string" ? body : JSON.stringify(body);
          const response = await route(jsonRequest(`/api/calc/${name}`, "POST", raw));
          expect([200, 400]).toContain(response.status);
          if (response.status === 400) expect((await response.json()).error.field).toBeTruthy();
        }),
        { numRuns: 150 },
      );
    });
  }

  it("GET /api/calc/tap-drill and /api/calc/drills with any query", async () => {
    await fc.assert(
      fc.asyncProperty(fc.dictionary(fc.constantFrom("thread", "engagement", "allowOtherSystem", "system", "x"), fc.string()), async (params) => {
        const query = new URLSearchParams(params).toString();
        for (const route of [tapDrillRoute, drillsRoute]) {
          const response = await route(get(`/api/calc/any?${query}`));
          expect([200, 400]).toContain(response.status);
        }
      }),
      { numRuns: 200 },
    );
  });
});

describe("POST /api/calc/passage-plug", () => {
  const inch = (value: number) => ({ value, unit: "in" });
  const body = { passageDiameter: inch(0.085), wall: inch(0.25), depth: inch(0.5), threads: ["4-40", "M4x0.7"], drills: ["#43", "#50", "2.5 mm"] };
  const post = (b: unknown) => passagePlugRoute(jsonRequest("/api/calc/passage-plug", "POST", b));

  it("plugs a 0.085 in passage with 4-40 and a #43", async () => {
    const response = await post(body);
    expect(response.status).toBe(200);
    const { plug } = await response.json();
    expect(plug.thread).toEqual({ label: "#4-40 UNC" });
    // ASME B94.11M: #43 = 0.0890 in = 2.2606 mm
    expect(plug.drill).toEqual({ label: "#43", inch: 0.089, mm: 2.2606 });
    // (0.112 - 0.089) / (1.299038 x 0.025) x 100 = 70.82 %
    expect(plug.engagementPct).toBeCloseTo(70.82, 1);
    // 1.5 x 0.112 = 0.168 in of thread, + 3 x 0.025 of tap lead = 0.243 in (common practice)
    expect(plug.tapDepthIn).toBeCloseTo(0.168, 6);
    expect(plug.drillDepthIn).toBeCloseTo(0.243, 6);
    // longest stocked set screw not over 0.168 - 0.025 = 0.143 in: 1/8 in (ASME B18.3 practice, from memory)
    expect(plug.setScrew).toEqual({ label: "#4-40 UNC x 1/8 in" });
    // 0.25 - (0.112 - 0.085) / 2 = 0.2365 in
    expect(plug.wallLeftIn).toBeCloseTo(0.2365, 6);
  });

  it("answers 422 no_plug naming the drill the shop lacks", async () => {
    // #50 (0.0700) and #52 (0.0635), ASME B94.11M: neither cleans up 0.085 in; 4-40 would take a #43
    const response = await post({ ...body, threads: ["4-40"], drills: ["#50", "#52"] });
    expect(response.status).toBe(422);
    const { error } = await response.json();
    expect(error.code).toBe("no_plug");
    expect(error.message).toMatch(/largest is #50.*#4-40 UNC with a #43/);
  });

  it("answers 422 no_plug naming the thread the shop lacks", async () => {
    // 0.140 in passage, 6-32 (0.138 in major) offered: no thread forms. 10-24 with a #25 (0.1495 in):
    // (0.190 - 0.1495) / (1.299038 / 24) = 74.8 %
    const response = await post({ ...body, passageDiameter: inch(0.14), threads: ["6-32"], drills: undefined });
    expect(response.status).toBe(422);
    const { error } = await response.json();
    expect(error).toMatchObject({ code: "no_plug" });
    expect(error.message).toMatch(/#10-24 UNC with a #25/);
  });

  it("names the field that is wrong", async () => {
    const cases: [unknown, string][] = [
      [{ ...body, passageDiameter: undefined }, "passageDiameter"],
      [{ ...body, wall: inch(-1) }, "wall.value"],
      [{ ...body, depth: { value: 1, unit: "furlong" } }, "depth.unit"],
      [{ ...body, drills: ["2"] }, "drills.0"],
      [{ ...body, drills: ["#43", "2.5"] }, "drills.1"],
      [{ ...body, threads: ["4-41"] }, "threads.0"],
      [{ ...body, engagement: 100 }, "engagement"],
    ];
    for (const [b, field] of cases) {
      const response = await post(b);
      expect(response.status, JSON.stringify(b)).toBe(400);
      expect((await response.json()).error.field, JSON.stringify(b)).toBe(field);
    }
  });
});

describe("absurd figures answer 400 naming the field, never 500", () => {
  const orifice = { flow: { value: 10, unit: "g/s" }, dP: { value: 1, unit: "psi" }, cd: 0.61, densityKgM3: 750 };
  const restriction = { targetAreaIn2: 0.01, maxHoles: 2, valveAreaIn2: 0.02, channelLengthIn: 0.5, minWebIn: 0.03 };
  const plug = { passageDiameter: { value: 0.085, unit: "in" }, wall: { value: 0.25, unit: "in" }, depth: { value: 0.5, unit: "in" } };

  /** A copy of a body with the number at a dotted path replaced by raw JSON text (1e999 parses to Infinity). */
  function withRaw(body: object, path: string, raw: string): string {
    const marker = "__figure__";
    const copy = structuredClone(body) as Record<string, unknown>;
    const keys = path.split(".");
    let at = copy;
    for (const key of keys.slice(0, -1)) at = at[key] as Record<string, unknown>;
    at[keys.at(-1)!] = marker;
    return JSON.stringify(copy).replace(`"${marker}"`, raw);
  }

  for (const [name, route, body, paths] of [
    ["orifice", orificeRoute, orifice, ["flow.value", "dP.value", "cd", "densityKgM3"]],
    ["restriction", restrictionRoute, restriction, ["targetAreaIn2", "valveAreaIn2", "channelLengthIn", "minWebIn"]],
    ["passage-plug", passagePlugRoute, plug, ["passageDiameter.value", "wall.value", "depth.value"]],
  ] as const) {
    it(`POST /api/calc/${name}`, async () => {
      for (const path of paths) {
        for (const raw of ["1e308", "5e-324", "1e999", "-1e308"]) {
          const response = await route(jsonRequest(`/api/calc/${name}`, "POST", withRaw(body, path, raw)));
          expect(response.status, `${path} = ${raw}`).toBe(400);
          expect((await response.json()).error.field, `${path} = ${raw}`).toBe(path);
        }
      }
    });
  }

  it("refuses a fuel density outside 500-1500 kg/m³, with a hint for one typed in g/cm³", async () => {
    // Gasoline is about 0.745 g/cm³ = 745 kg/m³ (1 g/cm³ = 1000 kg/m³, NIST SP 811)
    const gcm3 = await orificeRoute(jsonRequest("/api/calc/orifice", "POST", { ...orifice, densityKgM3: 0.745 }));
    expect(gcm3.status).toBe(400);
    const { error } = await gcm3.json();
    expect(error.field).toBe("densityKgM3");
    expect(error.message).toMatch(/500 and 1500 kg\/m³.*g\/cm³.*745 kg\/m³/);
    for (const densityKgM3 of [499, 1501, 20000]) {
      const response = await orificeRoute(jsonRequest("/api/calc/orifice", "POST", { ...orifice, densityKgM3 }));
      expect(response.status, String(densityKgM3)).toBe(400);
    }
    const custom = await orificeRoute(
      jsonRequest("/api/calc/orifice", "POST", { ...orifice, densityKgM3: undefined, fuel: { kind: "custom", densityKgM3: 0.79, stoichAfr: 6.4 } }),
    );
    expect(custom.status).toBe(400);
    expect((await custom.json()).error.field).toMatch(/^fuel/);
    const ok = await orificeRoute(jsonRequest("/api/calc/orifice", "POST", { ...orifice, densityKgM3: 745 }));
    expect(ok.status).toBe(200);
  });
});

const inches = (value: number) => ({ value, unit: "in" });

/** POSTs a body and answers the status and the parsed JSON. */
async function call(route: (request: Request) => Promise<Response>, path: string, body: unknown) {
  const response = await route(jsonRequest(path, "POST", body));
  return { status: response.status, json: await response.json() };
}

/** 400 naming the field, as every calculator endpoint does. */
async function expectRefused(route: (request: Request) => Promise<Response>, path: string, body: unknown, field: string) {
  const { status, json } = await call(route, path, body);
  expect(status, field).toBe(400);
  expect(json.error.code, field).toBe("invalid_input");
  expect(json.error.field, field).toBe(field);
  expect(json.error.message, field).toMatch(new RegExp(`^${field.replace(/[.[\]]/g, "\\$&")}: `));
}

describe("POST /api/calc/grind", () => {
  const grind = {
    protrusion: inches(0.06),
    clearance: inches(0.02),
    clayGap: inches(0.01),
    wall: inches(0.25),
    minWall: inches(0.12),
    perPass: inches(0.015),
    clayEvery: 2,
  };

  it("plans the depth in equal passes with clay checks, as the form does", async () => {
    const { status, json } = await call(grindRoute, "/api/calc/grind", grind);
    expect(status).toBe(200);
    // 0.060 + 0.020 - 0.010 = 0.070 in; 0.070 / 0.015 = 4.67 -> 5 passes of 0.014 in; clay after 2, 4 and the last, 5
    expect(json.ok).toBe(true);
    expect(json.depth.in).toBeCloseTo(0.07, 9);
    expect(json.passes).toHaveLength(5);
    expect(json.passes[0].depth.in).toBeCloseTo(0.014, 9);
    expect(json.passes.filter((p: { clayCheck: boolean }) => p.clayCheck).map((p: { pass: number }) => p.pass)).toEqual([2, 4, 5]);
    // 0.250 - 0.070 = 0.180 in of wall left
    expect(json.remainingWall.in).toBeCloseTo(0.18, 9);
  });

  it("names the field that is wrong", async () => {
    await expectRefused(grindRoute, "/api/calc/grind", { ...grind, perPass: inches(0) }, "perPass.value");
    await expectRefused(grindRoute, "/api/calc/grind", { ...grind, clayGap: undefined }, "clayGap");
    await expectRefused(grindRoute, "/api/calc/grind", { ...grind, clayEvery: 1.5 }, "clayEvery");
    await expectRefused(grindRoute, "/api/calc/grind", { ...grind, wall: { value: 1, unit: "furlong" } }, "wall.unit");
    // 0.070 in at 0.0005 in a pass is 140 passes, over the 100 a plan takes (our own limit)
    await expectRefused(grindRoute, "/api/calc/grind", { ...grind, perPass: inches(0.0005) }, "perPass.value");
  });
});

describe("POST /api/calc/pickup-tube", () => {
  const tube = {
    firstRun: inches(1),
    bendAngle: 90,
    radius: inches(0.5),
    secondRun: inches(0.75),
    swage: inches(0.25),
    outsideDiameter: inches(0.3125),
  };

  it("adds the runs, the bend's arc and the swage, and fits without a limit", async () => {
    const { status, json } = await call(pickupTubeRoute, "/api/calc/pickup-tube", tube);
    expect(status).toBe(200);
    // 1.0 + 0.75 + 0.5 x pi/2 + 0.25 = 2.785398 in
    expect(json.cutLength.in).toBeCloseTo(2.785398, 5);
    // rearward 1.0 + 0.5 + 0.3125 / 2 = 1.65625 in; down 0.5 + 0.75 + 0.15625 = 1.40625 in
    expect(json.reachRearward.in).toBeCloseTo(1.65625, 5);
    expect(json.reachDownward.in).toBeCloseTo(1.40625, 5);
    expect(json.fitsBowl).toBe(true);
  });

  it("says the tube does not fit the room the bowl leaves", async () => {
    // 1.40625 in down against 1.25 in of room; 1.65625 in rearward within 2 in
    const { json } = await call(pickupTubeRoute, "/api/calc/pickup-tube", { ...tube, maxRearward: inches(2), maxDownward: inches(1.25) });
    expect(json.fitsBowl).toBe(false);
    expect(json.exceeds).toEqual(["downward"]);
  });

  it("names the field that is wrong", async () => {
    await expectRefused(pickupTubeRoute, "/api/calc/pickup-tube", { ...tube, bendAngle: 200 }, "bendAngle");
    await expectRefused(pickupTubeRoute, "/api/calc/pickup-tube", { ...tube, maxDownward: inches(-1) }, "maxDownward.value");
    await expectRefused(pickupTubeRoute, "/api/calc/pickup-tube", { ...tube, thirdRun: inches(0.5) }, "secondBendAngle");
    // a bend tighter than the tube's own radius: refused by the computation, on the radius
    await expectRefused(pickupTubeRoute, "/api/calc/pickup-tube", { ...tube, radius: inches(0.1) }, "radius.value");
  });
});

describe("POST /api/calc/staging", () => {
  const staging = {
    primaryJet: inches(0.076),
    primaryJets: 2,
    secondaryJet: inches(0.089),
    secondaryJets: 2,
    valves: [
      { kind: "vacuum", side: "primary", opening: { value: 6.5, unit: "inHg" }, area: { value: 0.002, unit: "in²" } },
      { kind: "boost", side: "primary", opening: { value: 3, unit: "psi" }, area: { value: 0.0015, unit: "in²" } },
      { kind: "boost", side: "secondary", opening: { value: 8, unit: "psi" }, area: { value: 0.003, unit: "in²" } },
    ],
    fuel: "gasoline",
    targetScale: "afr",
    targetAtmosphere: 12.5,
    targetPeak: 11.5,
    peakBoost: { value: 12, unit: "psi" },
    ambientTemperature: { value: 77, unit: "°F" },
    chargeTemperature: { value: 130, unit: "°F" },
    band: 5,
    proposeValves: 2,
  };

  it("charts the plan and balances the sides, as the form does", async () => {
    const { status, json } = await call(stagingRoute, "/api/calc/staging", staging);
    expect(status).toBe(200);
    // Primary mains 2 x pi/4 x 0.076^2 = 0.0090729 in2; after the last stage the primary holds
    // 0.0020 + 0.0015 = 0.0035 of 0.0065 in2 of restrictions = 53.846 %, and adds 0.0035 / 0.0090729 = 38.58 %
    const last = json.balance.stages.at(-1);
    expect(last.primarySharePct).toBeCloseTo(53.846, 2);
    expect(last.primaryEnrichmentPct).toBeCloseTo(38.58, 1);
    // the chart starts at 20 inHg of vacuum: 20 x 3386.389 / 6894.757 = 9.8231 psi under the atmosphere
    expect(json.chart.fromPsi).toBeCloseTo(-9.8231, 3);
  });

  it("proposes boost-valve setpoints within the boost range", async () => {
    const { status, json } = await call(stagingRoute, "/api/calc/staging", { ...staging, command: "propose" });
    expect(status).toBe(200);
    expect(json.proposal.valves).toHaveLength(2);
    for (const valve of json.proposal.valves) {
      expect(valve.setpointPsi).toBeGreaterThan(0);
      expect(valve.setpointPsi).toBeLessThanOrEqual(12);
    }
  });

  it("names the field that is wrong", async () => {
    await expectRefused(stagingRoute, "/api/calc/staging", { ...staging, fuel: "diesel" }, "fuel");
    await expectRefused(stagingRoute, "/api/calc/staging", { ...staging, targetScale: "lambda" }, "targetAtmosphere");
    await expectRefused(
      stagingRoute,
      "/api/calc/staging",
      { ...staging, valves: [{ ...staging.valves[1], opening: { value: 3, unit: "inHg" } }] },
      "valves.0.opening.unit",
    );
    await expectRefused(stagingRoute, "/api/calc/staging", { ...staging, peakBoost: { value: 1e308, unit: "psi" } }, "peakBoost.value");
    // the charge cannot be cooler than the ambient air: refused by the computation, on the charge temperature
    await expectRefused(stagingRoute, "/api/calc/staging", { ...staging, chargeTemperature: { value: 50, unit: "°F" } }, "chargeTemperature.value");
  });
});
