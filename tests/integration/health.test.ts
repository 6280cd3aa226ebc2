// The health route: up after a real SELECT 1; down (503, Retry-After) when the database refuses the
// connection or accepts it and never answers.
import { createServer, type Server, type Socket } from "node:net";
import type { AddressInfo } from "node:net";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { afterEach, describe, expect, it } from "vitest";
import { GET as healthRoute } from "@/app/api/health/route";
import { databaseAnswers } from "@/db/health";
import * as schema from "@/db/schema";
import { healthResponse } from "@/lib/server/health";

const pools: Pool[] = [];
const servers: Server[] = [];
const sockets: Socket[] = [];
afterEach(async () => {
  sockets.splice(0).forEach((socket) => socket.destroy());
  await Promise.all(servers.splice(0).map((server) => new Promise((resolve) => server.close(resolve))));
  await Promise.all(pools.splice(0).map((pool) => pool.end()));
});

function databaseAt(port: number) {
  const pool = new Pool({ host: "127.0.0.1", port, user: "nobody", password: "none", database: "none", max: 1 });
  pool.on("error", () => {}); // the point of these tests: the connection fails
  pools.push(pool);
  return drizzle(pool, { schema });
}

/** A loopback port with nothing listening on it: taken from the system, then let go. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  await new Promise((resolve) => server.close(resolve));
  return port;
}

/** A server that accepts connections and never says a word, like a database stuck under load. */
async function silentServer(): Promise<number> {
  const server = createServer((socket) => sockets.push(socket));
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  servers.push(server);
  return (server.address() as AddressInfo).port;
}

describe("GET /api/health", () => {
  it("answers 200 with the database up, to anyone, without caching", async () => {
    const response = await healthRoute();
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ ok: true, database: "up" });
    expect(response.headers.get("cache-control")).toBe("no-store");
    expect(response.headers.get("retry-after")).toBeNull();
  });

  it("answers 503 with Retry-After: 5 when the database refuses the connection", async () => {
    const port = await closedPort();
    const response = await healthResponse(() => databaseAnswers(databaseAt(port)));
    expect(response.status).toBe(503);
    expect(await response.json()).toEqual({ ok: false, database: "down" });
    expect(response.headers.get("retry-after")).toBe("5");
  });

  it("gives up on a database that does not answer after 2 s, not sooner and not much later", async () => {
    const port = await silentServer();
    const started = performance.now();
    const response = await healthResponse(() => databaseAnswers(databaseAt(port)));
    const waitedMs = performance.now() - started;
    expect(response.status).toBe(503);
    expect(await response.json()).toEqual({ ok: false, database: "down" });
    expect(response.headers.get("retry-after")).toBe("5");
    expect(waitedMs).toBeGreaterThanOrEqual(1990);
    expect(waitedMs).toBeLessThan(4000);
  });
});
