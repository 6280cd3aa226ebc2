// The load section of `npm run bench`: the production build under `next start` on a free loopback port,
// against the seeded database scripts/bench.sh prepared (BENCH_DATABASE_URL), hit with autocannon.
// Every route is measured in the same run as the health route, which does the least a request can do
// (a session-free SELECT 1), so the ratio to it says what a route costs beyond the server itself.
// Also reads each page's first-load JavaScript from the build's manifests. Prints figures and PASS/FAIL
// against the targets; it never changes the exit code: the figures are for reading, not a test.

import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { createServer, type AddressInfo } from "node:net";
import path from "node:path";
import { runInNewContext } from "node:vm";
import { gzipSync } from "node:zlib";
import autocannon from "autocannon";
import { Client } from "pg";

const ROOT = path.resolve(import.meta.dirname, "..");
const CONNECTIONS = 50;
const TRAVELER_CONNECTIONS = 8;
const DURATION_S = 10;
const DEMO_PASSWORD = "blockwright-demo";

const TARGETS = {
  travelerP99Ms: 500,
  benchPageFirstLoadKb: 150,
  jobPageFirstLoadKb: 200,
  signOffToHealth: 0.35,
};

interface Measured {
  name: string;
  connections: number;
  requestsPerSecond: number;
  p50: number;
  p95: number;
  p99: number;
  statuses: Map<number, number>;
  errors: number;
  timeouts: number;
}

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

function quantile(sorted: readonly number[], q: number): number {
  const index = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[index] ?? Number.NaN;
}

async function startApp(port: number, env: NodeJS.ProcessEnv): Promise<ChildProcess> {
  const app = spawn("npx", ["next", "start", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: ROOT,
    env,
    stdio: ["ignore", "ignore", "pipe"],
    detached: true,
  });
  let stderr = "";
  app.stderr?.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (app.exitCode !== null) throw new Error(`next start ended (${app.exitCode}): ${stderr.trim()}`);
    try {
      const response = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (response.status === 200) return app;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  stopApp(app);
  throw new Error(`next start did not answer /api/health within 60 s: ${stderr.trim()}`);
}

function stopApp(app: ChildProcess): void {
  // npx runs next in a child of its own: end the whole group started above.
  if (app.pid && app.exitCode === null) {
    try {
      process.kill(-app.pid, "SIGTERM");
    } catch {
      // already gone
    }
  }
}

/** Signs in through next-auth's credentials endpoint, as the sign-in form does; returns the Cookie header. */
async function signIn(base: string, email: string): Promise<string> {
  const jar = new Map<string, string>();
  const keep = (response: Response) => {
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const at = pair!.indexOf("=");
      jar.set(pair!.slice(0, at), pair!.slice(at + 1));
    }
  };
  const cookie = () => [...jar].map(([name, value]) => `${name}=${value}`).join("; ");
  const csrf = await fetch(`${base}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookie() },
    body: new URLSearchParams({ csrfToken, email, password: DEMO_PASSWORD, json: "true" }),
  });
  keep(response);
  if (![...jar.keys()].some((name) => name.endsWith("next-auth.session-token"))) {
    throw new Error(`signing in as ${email} gave no session (HTTP ${response.status})`);
  }
  return cookie();
}

interface Fixture {
  blockId: string;
  revision: number;
  /** Operations of the released job with nothing to measure: signed with no readings. */
  signOffOperations: string[];
  signOffNote: string;
}

/** The released demo job: a block to open on the bench and print, and operations to sign off. */
async function readFixture(databaseUrl: string): Promise<Fixture> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const blocks = await client.query<{ block_id: string; revision: number; job_id: string }>(
      `SELECT b.id AS block_id, r.number AS revision, j.id AS job_id
         FROM jobs j JOIN metering_blocks b ON b.job_id = j.id
         JOIN plan_revisions r ON r.job_id = j.id AND r.status = 'current'
        WHERE j.state = 'released' ORDER BY j.number, b.side LIMIT 1`,
    );
    const block = blocks.rows[0];
    if (!block) throw new Error("the bench database holds no released job: was it seeded?");
    const operations = await client.query<{ id: string; measured: boolean }>(
      `SELECT o.id, jsonb_array_length(o.measurements) > 0 AS measured
         FROM operations o JOIN plan_revisions r ON r.id = o.revision_id
        WHERE r.job_id = $1 AND r.status = 'current' ORDER BY o.block_id, o.number`,
      [block.job_id],
    );
    // Leave at least one operation open, so the job never becomes verified and later sign-offs still land.
    const free = operations.rows.filter((op) => !op.measured).map((op) => op.id);
    const signOffOperations = free.length === operations.rows.length ? free.slice(0, -1) : free;
    if (signOffOperations.length === 0) throw new Error("the released demo job has no operation to sign off without readings");
    return { blockId: block.block_id, revision: block.revision, signOffOperations, signOffNote: "" };
  } finally {
    await client.end();
  }
}

async function measure(
  name: string,
  options: { url: string; connections?: number; method?: "GET" | "POST"; cookie?: string; body?: string; paths?: string[] },
): Promise<Measured> {
  const statuses = new Map<number, number>();
  const times: number[] = [];
  const headers: Record<string, string> = {};
  if (options.cookie) headers.cookie = options.cookie;
  if (options.body) headers["content-type"] = "application/json";
  let next = 0;
  const paths = options.paths;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: options.url,
        connections: options.connections ?? CONNECTIONS,
        duration: DURATION_S,
        method: options.method ?? "GET",
        headers,
        body: options.body,
        timeout: 30,
        ...(paths
          ? { requests: [{ setupRequest: (request: autocannon.Request) => ({ ...request, path: paths[next++ % paths.length]! }) }] }
          : {}),
      },
      (error, finished) => (error ? reject(error) : resolve(finished)),
    );
    instance.on("response", (_client, statusCode, _bytes, responseTime) => {
      statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
      times.push(responseTime);
    });
  });
  times.sort((a, b) => a - b);
  const elapsedS = result.duration || DURATION_S;
  return {
    name,
    connections: options.connections ?? CONNECTIONS,
    requestsPerSecond: times.length / elapsedS,
    p50: quantile(times, 0.5),
    p95: quantile(times, 0.95),
    p99: quantile(times, 0.99),
    statuses,
    errors: result.errors,
    timeouts: result.timeouts,
  };
}

/**
 * First-load JavaScript of an app route, gzipped: the runtime chunks every page loads (the page's
 * build-manifest rootMainFiles) plus the chunks of the page and every layout above it (its client
 * reference manifest's entryJSFiles). Polyfills are left out: modern browsers skip them (nomodule).
 */
export function firstLoadJsKb(distDir: string, route: string): number {
  const server = path.join(distDir, "server", "app", route);
  const buildManifest = JSON.parse(readFileSync(path.join(server, "page", "build-manifest.json"), "utf8")) as { rootMainFiles: string[] };
  // The manifest is a script that fills globalThis.__RSC_MANIFEST[route]: run it in a context of its own.
  const context: { __RSC_MANIFEST?: Record<string, { entryJSFiles: Record<string, string[]> }> } = {};
  runInNewContext(readFileSync(path.join(server, "page_client-reference-manifest.js"), "utf8"), context);
  const manifest = Object.values(context.__RSC_MANIFEST ?? {})[0];
  if (!manifest) throw new Error(`no client reference manifest for ${route}`);
  const page = `[project]/app/${route}/page`;
  const onRoute = Object.entries(manifest.entryJSFiles).filter(([entry]) => {
    if (entry === page) return true;
    if (!entry.endsWith("/layout")) return false;
    const folder = entry.slice(0, -"layout".length);
    return page.startsWith(folder);
  });
  const files = new Set([...buildManifest.rootMainFiles, ...onRoute.flatMap(([, chunks]) => chunks)]);
  let bytes = 0;
  for (const file of files) bytes += gzipSync(readFileSync(path.join(distDir, file)), { level: 9 }).length;
  return bytes / 1000;
}

const ms = (value: number) => `${value.toFixed(0).padStart(5)} ms`;

function printRow(row: Measured, health: Measured): void {
  const statuses = [...row.statuses].sort(([a], [b]) => a - b).map(([status, count]) => `${status}x${count}`).join(" ");
  const problems = row.errors || row.timeouts ? `  errors ${row.errors} timeouts ${row.timeouts}` : "";
  console.log(
    `  ${row.name.padEnd(48)} ${String(row.connections).padStart(3)} conn ${row.requestsPerSecond.toFixed(1).padStart(8)} req/s ` +
      `${ms(row.p50)} ${ms(row.p95)} ${ms(row.p99)}  ${(row.requestsPerSecond / health.requestsPerSecond).toFixed(2).padStart(5)}x  ${statuses}${problems}`,
  );
}

function verdict(pass: boolean, text: string): void {
  console.log(`${pass ? "PASS" : "FAIL"}  ${text}`);
}

export async function runLoadSection(): Promise<void> {
  const databaseUrl = process.env.BENCH_DATABASE_URL;
  const distDir = path.resolve(ROOT, process.env.NEXT_DIST_DIR || ".next");
  console.log("\nLoad: the production app under next start");
  if (!databaseUrl) {
    console.log("  skipped: no seeded bench database (BENCH_DATABASE_URL); `npm run bench` prepares one, or says above why it could not");
    return;
  }
  if (!existsSync(path.join(distDir, "BUILD_ID"))) {
    console.log(`  skipped: no build in ${distDir}`);
    return;
  }

  const bench = firstLoadJsKb(distDir, "bench/[blockId]");
  const job = firstLoadJsKb(distDir, "(office)/jobs/[id]");

  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const fixture = await readFixture(databaseUrl);
  const app = await startApp(port, {
    ...process.env,
    NODE_ENV: "production",
    DATABASE_URL: databaseUrl,
    NEXTAUTH_URL: base,
    APP_BASE_URL: base,
    // Nothing listens there: a notice the work sends fails at once instead of waiting on a real server.
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(await freePort()),
  });
  try {
    const machinist = await signIn(base, "machinist@blockwright.test");
    const tuner = await signIn(base, "tuner@blockwright.test");
    const benchPath = `/bench/${fixture.blockId}?revision=${fixture.revision}`;
    const travelerPath = `/api/blocks/${fixture.blockId}/traveler?revision=${fixture.revision}`;
    const signOffBody = JSON.stringify({ readings: [], note: fixture.signOffNote });
    // One call of each first, so loading a route's code on first use is not counted against it.
    for (const [url, init] of [
      [`${base}/api/health`, {}],
      [`${base}/api/jobs`, { headers: { cookie: tuner } }],
      [`${base}${benchPath}`, { headers: { cookie: machinist } }],
      [`${base}${travelerPath}`, { headers: { cookie: machinist } }],
    ] as const) {
      const response = await fetch(url, init);
      if (response.status !== 200) throw new Error(`${url} answered ${response.status} before the load started`);
      await response.arrayBuffer();
    }

    console.log(
      `  ${CONNECTIONS} connections (traveler ${TRAVELER_CONNECTIONS}) for ${DURATION_S} s each, one after the other, on ${base}\n` +
        `  ${"route".padEnd(48)}     conn        req/s       p50       p95       p99  / health  statuses`,
    );
    const health = await measure("GET /api/health", { url: `${base}/api/health` });
    printRow(health, health);
    const signOff = await measure(`POST /api/operations/{id}/sign-off (${fixture.signOffOperations.length} ops)`, {
      url: base,
      method: "POST",
      cookie: machinist,
      body: signOffBody,
      paths: fixture.signOffOperations.map((id) => `/api/operations/${id}/sign-off`),
    });
    printRow(signOff, health);
    const jobs = await measure("GET /api/jobs (tuner)", { url: `${base}/api/jobs`, cookie: tuner });
    printRow(jobs, health);
    const benchPage = await measure("GET /bench/{blockId}?revision=N (machinist)", { url: `${base}${benchPath}`, cookie: machinist });
    printRow(benchPage, health);
    const traveler = await measure("GET /api/blocks/{blockId}/traveler (machinist)", {
      url: `${base}${travelerPath}`,
      cookie: machinist,
      connections: TRAVELER_CONNECTIONS,
    });
    printRow(traveler, health);
    console.log(
      `  sign-off: the machinist signs the released demo job's ${fixture.signOffOperations.length} operations that need no readings, ` +
        "in turn: the first of each is recorded (201), every later one is a repeat the route answers 200 without recording " +
        "(it still locks the job and reads the sign-off in a transaction).",
    );

    console.log(`  first-load JS (gzip, from ${path.relative(ROOT, distDir)}/ manifests): bench page ${bench.toFixed(1)} kB, job page ${job.toFixed(1)} kB`);
    verdict(traveler.p99 <= TARGETS.travelerP99Ms, `traveler p99 ${traveler.p99.toFixed(0)} ms <= ${TARGETS.travelerP99Ms} ms (${TRAVELER_CONNECTIONS} connections)`);
    verdict(bench <= TARGETS.benchPageFirstLoadKb, `bench page first-load JS ${bench.toFixed(1)} kB <= ${TARGETS.benchPageFirstLoadKb} kB`);
    verdict(job <= TARGETS.jobPageFirstLoadKb, `job page first-load JS ${job.toFixed(1)} kB <= ${TARGETS.jobPageFirstLoadKb} kB`);
    const ratio = signOff.requestsPerSecond / health.requestsPerSecond;
    verdict(ratio >= TARGETS.signOffToHealth, `sign-off throughput ${ratio.toFixed(2)}x health >= ${TARGETS.signOffToHealth}x`);
  } finally {
    stopApp(app);
  }
}
