import "server-only";
import { eq, inArray } from "drizzle-orm";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import type { Drill, DrillSystem } from "@/lib/engineering/types";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { stockedDrills } from "./schema";

export async function listStockedLabels(): Promise<Set<string>> {
  const rows = await getDb().select({ label: stockedDrills.label }).from(stockedDrills);
  return new Set(rows.map((r) => r.label));
}

/** The drills on the rack, smallest first, as the solver takes them. */
export async function listStockedDrills(): Promise<Drill[]> {
  const labels = await listStockedLabels();
  return ALL_DRILLS.filter((d) => labels.has(d.label));
}

export async function setDrillStocked(actorId: string, label: string, stocked: boolean): Promise<void> {
  await getDb().transaction(async (tx) => {
    if (stocked) await tx.insert(stockedDrills).values({ label }).onConflictDoNothing();
    else await tx.delete(stockedDrills).where(eq(stockedDrills.label, label));
    await recordAudit(tx, actorId, stocked ? "drill.stock" : "drill.unstock", label, {}, "drill");
  });
}

/** Puts every drill of one series on the rack, or takes them all off, in one transaction. */
export async function setSystemStocked(actorId: string, system: DrillSystem, stocked: boolean): Promise<number> {
  const labels = ALL_DRILLS.filter((d) => d.system === system).map((d) => d.label);
  await getDb().transaction(async (tx) => {
    if (stocked) await tx.insert(stockedDrills).values(labels.map((label) => ({ label }))).onConflictDoNothing();
    else await tx.delete(stockedDrills).where(inArray(stockedDrills.label, labels));
    await recordAudit(tx, actorId, stocked ? "drill.stock-system" : "drill.unstock-system", system, { count: labels.length }, "drill");
  });
  return labels.length;
}
