// Attacks on the JSON API as a browser on another host of the same site, or a careless client, would make
// them: each must be refused and leave every table as it was.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { GET as listUsersRoute } from "@/app/api/users/route";
import { POST as createUserRoute } from "@/app/api/users/route";
import { POST as createJobRoute } from "@/app/api/jobs/route";
import { GET as drillsRoute } from "@/app/api/calc/drills/route";
import { POST as uploadRoute } from "@/app/api/blocks/[blockId]/photos/route";
import { actAs, jsonRequest, resetDatabase } from "./support/database";
import { startS3Fake, type S3Fake } from "./support/fakes";
import { blockIdOf, jobBody, makeJob } from "./support/jobs";
import { STATE_CHANGING_ROUTES, tableCounts } from "./support/state-changing-routes";

const APP = "http://127.0.0.1:3000"; // APP_BASE_URL's default: the app's own origin in these tests
const SAME_SITE_PAGE = "http://forum.127.0.0.1.nip.example"; // another host: a page the attacker controls

let s3: S3Fake;
beforeAll(async () => {
  s3 = await startS3Fake();
});
afterAll(async () => s3.stop());
beforeEach(resetDatabase);

function forged(path: string, method: string, init: { contentType: string; body: string; origin?: string; fetchSite?: string }) {
  const headers: Record<string, string> = { "content-type": init.contentType };
  if (init.origin !== undefined) headers.origin = init.origin;
  if (init.fetchSite !== undefined) headers["sec-fetch-site"] = init.fetchSite;
  return new Request(`${APP}${path}`, { method, headers, body: init.body });
}

describe("a page on another host posts to the API with the victim's cookie", () => {
  for (const route of STATE_CHANGING_ROUTES) {
    it(`${route.name}: text/plain and form posts are refused (403) and change nothing`, async () => {
      const { path, params } = await route.target();
      await actAs("admin");
      const before = await tableCounts();
      const json = JSON.stringify(route.body);
      const attempts = [
        { contentType: "text/plain", body: json, origin: SAME_SITE_PAGE, fetchSite: "same-site" },
        { contentType: "application/x-www-form-urlencoded", body: `${encodeURIComponent(json)}=`, origin: SAME_SITE_PAGE, fetchSite: "same-site" },
        { contentType: "multipart/form-data; boundary=x", body: `--x\r\nContent-Disposition: form-data; name="a"\r\n\r\n${json}\r\n--x--\r\n`, origin: SAME_SITE_PAGE, fetchSite: "cross-site" },
        // A sandboxed frame sends Origin: null.
        { contentType: "text/plain", body: json, origin: "null", fetchSite: "cross-site" },
        // Even as JSON: the origin alone decides.
        { contentType: "application/json", body: json, origin: SAME_SITE_PAGE, fetchSite: "same-site" },
        { contentType: "application/json", body: json, origin: SAME_SITE_PAGE },
      ];
      for (const attempt of attempts) {
        const response = await route.handler(forged(path, route.method, attempt), { params: Promise.resolve(params) });
        expect(response.status, `${attempt.contentType} from ${attempt.origin}`).toBe(403);
      }
      expect(await tableCounts()).toEqual(before);
    });
  }

  it("from its own origin, a body that is not JSON is refused with 415 on every JSON route", async () => {
    for (const route of STATE_CHANGING_ROUTES.filter((r) => r.reads === "json")) {
      const { path, params } = await route.target();
      await actAs("admin");
      const before = await tableCounts();
      for (const contentType of ["text/plain", "application/x-www-form-urlencoded", "text/plain; charset=application/json"]) {
        const response = await route.handler(forged(path, route.method, { contentType, body: JSON.stringify(route.body), origin: APP, fetchSite: "same-origin" }), {
          params: Promise.resolve(params),
        });
        expect(response.status, `${route.name} as ${contentType}`).toBe(415);
      }
      expect(await tableCounts()).toEqual(before);
    }
  });

  it("the app's own pages still post: Origin equal to the base URL, or Sec-Fetch-Site same-origin", async () => {
    await actAs("tuner");
    const ownOrigin = await createJobRoute(forged("/api/jobs", "POST", { contentType: "application/json", body: JSON.stringify(jobBody()), origin: APP }));
    expect(ownOrigin.status).toBe(201);
    const sameOrigin = await createJobRoute(
      forged("/api/jobs", "POST", { contentType: "application/json; charset=utf-8", body: JSON.stringify(jobBody()), fetchSite: "same-origin", origin: "http://localhost:3000" }),
    );
    expect(sameOrigin.status).toBe(201);
  });
});

describe("the caller is checked before the input", () => {
  it("anonymous callers get 401 and no field-level detail, whatever they send", async () => {
    await actAs("anonymous");
    const response = await createUserRoute(jsonRequest("/api/users", "POST", { email: "not-an-email" }));
    expect(response.status).toBe(401);
    const text = await response.text();
    expect(text).not.toContain("email");
    expect(text).not.toContain("issues");
  });

  it("the wrong role gets 403 before its body is read", async () => {
    await actAs("machinist");
    const response = await createJobRoute(jsonRequest("/api/jobs", "POST", "{ not json"));
    expect(response.status).toBe(403);
  });
});

describe("every API answer carries the security headers", () => {
  const EXPECTED = {
    "content-security-policy": /frame-ancestors 'none'/,
    "x-frame-options": /^DENY$/,
    "referrer-policy": /^strict-origin-when-cross-origin$/,
    "permissions-policy": /geolocation=\(\)/,
    "x-content-type-options": /^nosniff$/,
    "strict-transport-security": /max-age=\d{7,}/,
  };

  it("on success, refusal, validation error and cross-site refusal alike", async () => {
    await actAs("admin");
    const answers = [
      await listUsersRoute(new Request(`${APP}/api/users`)),
      await drillsRoute(new Request(`${APP}/api/calc/drills?system=bogus`)),
      await createUserRoute(jsonRequest("/api/users", "POST", "{")),
      await createUserRoute(forged("/api/users", "POST", { contentType: "text/plain", body: "{}", origin: SAME_SITE_PAGE })),
    ];
    await actAs("anonymous");
    answers.push(await listUsersRoute(new Request(`${APP}/api/users`)));
    expect(answers.map((a) => a.status)).toEqual([200, 400, 400, 403, 401]);
    for (const answer of answers) {
      for (const [name, pattern] of Object.entries(EXPECTED)) expect(answer.headers.get(name), name).toMatch(pattern);
    }
  });
});

describe("an upload larger than the limit, sent chunked without Content-Length", () => {
  it("is cut with 413 while it streams: 64 MB never sits in memory", async () => {
    const { id } = await makeJob("released");
    const blockId = await blockIdOf(id);
    await actAs("machinist");
    const chunk = new Uint8Array(64 * 1024).fill(0x41);
    const totalChunks = 1024; // 1024 x 64 KiB = 64 MiB
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      start(controller) {
        const head = "--edge\r\nContent-Disposition: form-data; name=\"photo\"; filename=\"big.jpg\"\r\nContent-Type: image/jpeg\r\n\r\n";
        controller.enqueue(new TextEncoder().encode(head));
      },
      pull(controller) {
        if (sent === totalChunks) {
          controller.enqueue(new TextEncoder().encode("\r\n--edge--\r\n"));
          controller.close();
          return;
        }
        sent++;
        controller.enqueue(chunk);
      },
    });
    global.gc?.();
    const startRss = process.memoryUsage().rss;
    let peakRss = startRss;
    const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 5);
    const request = new Request(`${APP}/api/blocks/${blockId}/photos`, {
      method: "POST",
      headers: { "content-type": "multipart/form-data; boundary=edge" },
      body,
      duplex: "half",
    } as RequestInit);
    const response = await uploadRoute(request, { params: Promise.resolve({ blockId }) });
    clearInterval(sampler);
    peakRss = Math.max(peakRss, process.memoryUsage().rss);
    expect(response.status).toBe(413);
    expect((await response.json()).error.code).toBe("payload_too_large");
    expect(sent).toBeLessThan(totalChunks / 4); // reading stopped near 12 MB, not at 64
    expect(peakRss - startRss).toBeLessThan(50 * 1024 * 1024);
    expect(s3.storedObjects()).toEqual([]);
  });

  it("a declared Content-Length over the limit is refused before reading", async () => {
    const { id } = await makeJob("released");
    const blockId = await blockIdOf(id);
    await actAs("machinist");
    const request = new Request(`${APP}/api/blocks/${blockId}/photos`, {
      method: "POST",
      headers: { "content-type": "multipart/form-data; boundary=edge", "content-length": String(64 * 1024 * 1024) },
      body: "--edge--\r\n",
    });
    expect((await uploadRoute(request, { params: Promise.resolve({ blockId }) })).status).toBe(413);
  });
});
