import "server-only";
import { eq } from "drizzle-orm";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import type { Drill } from "@/lib/engineering/types";
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
