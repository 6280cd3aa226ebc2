import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

// The layering rule is only worth having if a wrong-way import fails lint: each case lints one line as if it
// were written in the named file, with the project's own configuration.
const eslint = new ESLint({ cwd: process.cwd() });

async function boundaryErrors(filePath: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${source}\nexport {};\n`, { filePath });
  return (result?.messages ?? []).filter((m) => m.ruleId === "boundaries/dependencies" || m.ruleId === "no-restricted-imports").map((m) => m.message);
}

describe("import layers: app -> components -> lib/<feature> -> db -> lib/engineering", () => {
  it("refuses db/ importing a workflow folder", async () => {
    expect(await boundaryErrors("db/probe.ts", 'import { planJob } from "@/lib/jobs/plan"; void planJob;')).toHaveLength(1);
  });
  it("refuses components/ importing db/", async () => {
    expect(await boundaryErrors("components/probe.tsx", 'import { getJob } from "@/db/jobs"; void getJob;')).toHaveLength(1);
  });
  it("refuses lib/ importing app/ or components/", async () => {
    expect(await boundaryErrors("lib/jobs/probe.ts", 'import { Button } from "@/components/ui/button"; void Button;')).toHaveLength(1);
    expect(await boundaryErrors("lib/jobs/probe.ts", 'import { GET } from "@/app/api/health/route"; void GET;')).toHaveLength(1);
  });
  it("keeps lib/engineering to itself and its math library", async () => {
    expect(await boundaryErrors("lib/engineering/probe.ts", 'import { getDb } from "@/db/client"; void getDb;')).not.toHaveLength(0);
    expect(await boundaryErrors("lib/engineering/probe.ts", 'import { z } from "zod"; void z;')).toHaveLength(1);
    expect(await boundaryErrors("lib/engineering/probe.ts", 'import { evaluate } from "mathjs"; import { ALL_DRILLS } from "./drills"; void evaluate; void ALL_DRILLS;')).toEqual([]);
  });
  it("lets each layer import the layers below it", async () => {
    expect(await boundaryErrors("app/probe/page.tsx", 'import { Button } from "@/components/ui/button"; import { getJob } from "@/db/jobs"; import { planJob } from "@/lib/jobs/plan"; void Button; void getJob; void planJob;')).toEqual([]);
    expect(await boundaryErrors("lib/jobs/probe.ts", 'import { getJob } from "@/db/jobs"; import { ALL_DRILLS } from "@/lib/engineering/drills"; void getJob; void ALL_DRILLS;')).toEqual([]);
    expect(await boundaryErrors("db/probe.ts", 'import { ALL_DRILLS } from "@/lib/engineering/drills"; void ALL_DRILLS;')).toEqual([]);
  });
}, 120_000);
