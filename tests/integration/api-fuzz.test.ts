// 2,000 generated bodies per JSON route, from any JSON at all to the route's own keys holding odd values:
// every answer is a client error (or a success), never a server error, and never shows a stack or SQL.
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { actAs, resetDatabase } from "./support/database";
import { STATE_CHANGING_ROUTES } from "./support/state-changing-routes";

const RUNS = 2000;
const LEAK = /\bat [\w.<>]+ \(|node_modules|\.ts:\d+|\b(select|insert into|update \w+ set|delete from)\b|postgres|drizzle|violates|syntax error/i;

const oddValue = fc.oneof(
  fc.jsonValue(),
  fc.string({ unit: "binary" }),
  fc.constantFrom(null, "", "\u0000", -0, 1e308, -1e308, "NaN", "Infinity", [], {}, "00000000-0000-0000-0000-000000000000"),
);

function bodies(example: unknown) {
  const keys = example && typeof example === "object" ? Object.keys(example) : [];
  return fc.oneof(
    fc.jsonValue().map((value) => JSON.stringify(value)),
    fc.string({ unit: "binary" }),
    fc.dictionary(fc.constantFrom(...keys, "__proto__", "constructor"), oddValue).map((value) => JSON.stringify({ ...(example as object), ...value })),
    fc.dictionary(fc.constantFrom(...keys), oddValue).map((value) => JSON.stringify(value)),
  );
}

beforeAll(resetDatabase);

describe("generated bodies never break a JSON route", () => {
  for (const route of STATE_CHANGING_ROUTES.filter((r) => r.reads === "json")) {
    it(`${route.name}: ${RUNS} bodies, all answered below 500 with no stack or SQL`, { timeout: 240_000 }, async () => {
      const { path, params } = await route.target();
      await actAs(route.name.includes("users") ? "admin" : "tuner");
      await fc.assert(
        fc.asyncProperty(bodies(route.body), async (body) => {
          const request = new Request(`http://127.0.0.1:3000${path}`, { method: route.method, headers: { "content-type": "application/json" }, body });
          const response = await route.handler(request, { params: Promise.resolve(params) });
          const text = await response.text();
          expect(response.status, text).toBeLessThan(500);
          expect(text).not.toMatch(LEAK);
        }),
        { numRuns: RUNS },
      );
    });
  }
});
