import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = { "@": path.resolve(import.meta.dirname) };

// Integration workers: their files wait on PostgreSQL much of the time, so one more worker than cores
// keeps the CPU busy. Each worker has a database of its own (tests/integration/global-setup.ts).
const integrationWorkers = Number(process.env.BLOCKWRIGHT_IT_WORKERS) || 3;

export default defineConfig({
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          environment: "node",
          include: ["tests/unit/**/*.test.ts", "lib/**/*.test.ts"],
          // Pure computations with no module state to leak: every file in one worker, modules loaded once.
          isolate: false,
          maxWorkers: 1,
          sequence: { groupOrder: 0 },
        },
      },
      {
        resolve: { alias: { ...alias, "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") } },
        test: {
          name: "integration",
          environment: "node",
          include: ["tests/integration/**/*.test.ts"],
          // Each file keeps its own module graph: files set the configuration (base URL, fake ports) before
          // it is first read and cached.
          globalSetup: ["tests/integration/global-setup.ts"],
          setupFiles: ["tests/integration/setup.ts"],
          maxWorkers: integrationWorkers,
          sequence: { groupOrder: 1 },
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
