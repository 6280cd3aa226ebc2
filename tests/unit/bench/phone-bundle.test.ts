import { existsSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

// What the bench page sends a phone: every module its client components import (types excepted, server
// actions being references). None of them may pull a schema or unit library: the server checks and converts.

const ROOT = process.cwd();
const HEAVY = [/^zod(\/|$)/, /^@conform-to\/zod/, /^mathjs(\/|$)/, /^recharts(\/|$)/];

function resolveLocal(from: string, specifier: string): string | undefined {
  const base = specifier.startsWith("@/") ? path.join(ROOT, specifier.slice(2)) : path.resolve(path.dirname(from), specifier);
  return [`${base}.ts`, `${base}.tsx`, path.join(base, "index.ts"), path.join(base, "index.tsx"), base].find((f) => existsSync(f) && statSync(f).isFile());
}

/** Runtime imports of a module (not `import type`, not `export type`). */
function runtimeImports(file: string): string[] {
  const source = readFileSync(file, "utf8");
  const found: string[] = [];
  for (const match of source.matchAll(/^\s*(import|export)\s+(type\s+)?[^'";]*?from\s+["']([^"']+)["']/gm)) {
    if (!match[2]) found.push(match[3]!);
  }
  for (const match of source.matchAll(/^\s*import\s+["']([^"']+)["']/gm)) found.push(match[1]!);
  return found;
}

function clientGraph(entries: string[]): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const queue = [...entries];
  while (queue.length) {
    const file = queue.pop()!;
    if (files.has(file)) continue;
    files.add(file);
    if (/^["']use server["']/m.test(readFileSync(file, "utf8"))) continue;
    for (const specifier of runtimeImports(file)) {
      if (specifier.startsWith(".") || specifier.startsWith("@/")) {
        const resolved = resolveLocal(file, specifier);
        if (resolved) queue.push(resolved);
      } else packages.add(specifier);
    }
  }
  return { files, packages };
}

describe("the bench page on a phone", () => {
  it("loads no schema, unit or chart library in its client components", () => {
    const dir = path.join(ROOT, "app/bench");
    const entries = ["[blockId]/operation-card.tsx", "[blockId]/_components/sign-off-form.tsx", "[blockId]/photo-control.tsx", "[blockId]/shop-time.tsx", "bench-sign-out.tsx"]
      .map((f) => path.join(dir, f))
      .filter((f) => readFileSync(f, "utf8").startsWith('"use client"'));
    expect(entries.length).toBeGreaterThan(0);
    const { files, packages } = clientGraph(entries);
    expect(files.size).toBeGreaterThan(entries.length);
    expect([...packages].filter((p) => HEAVY.some((h) => h.test(p)))).toEqual([]);
  });
});
