// A PostgreSQL cluster of a test's own, in a temporary folder on a free loopback port: for tests that stop or
// restart the server, which must never happen to the shared cluster the other test files use.
import { execFile, execFileSync } from "node:child_process";
import { chownSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { createServer, type AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { Client } from "pg";

const run = promisify(execFile);
const PG_BIN = "/usr/lib/postgresql/15/bin";
const USER = "blockwright";

export interface ThrowawayCluster {
  /** postgres:// URL of the database made in it. */
  url: string;
  /** `pg_ctl restart -m fast`: connections are ended, the server stops and starts again on the same port. */
  restart: () => Promise<void>;
  /** Stops the server at once and removes its folder; safe to call twice. */
  remove: () => Promise<void>;
}

async function freePort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const { port } = probe.address() as AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

/** PostgreSQL refuses to run as root: as root the server runs as Debian's postgres user, owning only its folder. */
function asOwner(command: string, args: string[]): [string, string[]] {
  const root = process.getuid?.() === 0;
  return root ? ["runuser", ["-u", "postgres", "--", command, ...args]] : [command, args];
}

/** Creates, starts and fills a cluster with one empty database, `name`, reachable by the user blockwright. */
export async function startThrowawayCluster(name: string): Promise<ThrowawayCluster> {
  const folder = mkdtempSync(path.join(tmpdir(), "blockwright-pg-"));
  const data = path.join(folder, "data");
  const sockets = path.join(folder, "sockets");
  const log = path.join(folder, "server.log");
  mkdirSync(data, { mode: 0o700 });
  mkdirSync(sockets);
  if (process.getuid?.() === 0) {
    const uid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }).trim());
    const gid = Number(execFileSync("id", ["-g", "postgres"], { encoding: "utf8" }).trim());
    for (const owned of [folder, data, sockets]) chownSync(owned, uid, gid);
  }
  const port = await freePort();
  const pgCtl = (...args: string[]) => asOwner(`${PG_BIN}/pg_ctl`, ["-D", data, ...args]);
  const serverOptions = ["-o", `-c listen_addresses=127.0.0.1 -p ${port} -k ${sockets} -c fsync=off`];

  let removed = false;
  const stopNow = () => {
    if (removed) return;
    removed = true;
    try {
      execFileSync(...pgCtl("-w", "stop", "-m", "immediate"), { stdio: "ignore" });
    } catch {
      // not running (never started, or already stopped)
    }
    rmSync(folder, { recursive: true, force: true });
  };
  // A worker that ends without its afterAll (killed on a timeout) still takes the server down with it.
  process.once("exit", stopNow);

  try {
    // Loopback only, a throwaway: trust needs no password file.
    await run(...asOwner(`${PG_BIN}/initdb`, ["-D", data, "-U", USER, "-A", "trust", "-E", "UTF8", "--locale=C.UTF-8"]));
    await run(...pgCtl("-l", log, "-w", "start", ...serverOptions));
    const admin = new Client({ host: "127.0.0.1", port, user: USER, database: "postgres" });
    await admin.connect();
    try {
      await admin.query(`CREATE DATABASE "${name}"`);
    } finally {
      await admin.end();
    }
  } catch (error) {
    stopNow();
    throw error;
  }

  return {
    url: `postgres://${USER}@127.0.0.1:${port}/${name}`,
    restart: async () => {
      await run(...pgCtl("-l", log, "-w", "restart", "-m", "fast", ...serverOptions));
    },
    remove: async () => {
      process.removeListener("exit", stopNow);
      stopNow();
    },
  };
}
