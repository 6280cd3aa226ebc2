import "server-only";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { dangerWarnings } from "@/lib/engineering/plan-warnings";
import { listStockedDrills } from "@/db/drill-stock";
import { RequestRefusal } from "@/db/refusal";
import { getJobInputs, storeRevision } from "@/db/revisions";
import { getShopSettings } from "@/db/shop-settings";
import type { Viewer } from "@/db/visibility";
import { planJob } from "./plan";

/** The plan of the job's working inputs, solved now with the shop's current rack and limits. */
export async function solveJob(jobId: string): Promise<ConversionPlan> {
  const [{ job, blocks }, stocked, shop] = await Promise.all([getJobInputs(jobId), listStockedDrills(), getShopSettings()]);
  return planJob(job, blocks, stocked, shop);
}

/**
 * Approves the working inputs as the next revision: solved under the job's lock with the shop's rack. A plan
 * that may damage the engine (a danger warning) is approved only with an explicit acknowledgement, kept with it.
 */
export async function approveRevision(actor: Viewer, jobId: string, options: { acknowledgeWarnings?: boolean | undefined } = {}): Promise<{ revision: number }> {
  const [stocked, shop] = await Promise.all([listStockedDrills(), getShopSettings()]);
  return storeRevision(actor, jobId, (job, blocks) => {
    const plan = planJob(job, blocks, stocked, shop);
    const dangers = dangerWarnings(plan.warnings).map(({ code, level, message }) => ({ code, level, message }));
    if (dangers.length && !options.acknowledgeWarnings) {
      throw new RequestRefusal(
        409,
        `The plan has ${dangers.length} danger warning${dangers.length > 1 ? "s" : ""}: ${dangers.map((d) => d.message).join(" ")} Approve with an explicit acknowledgement, or change the plan.`,
        "acknowledgeWarnings",
        { warnings: dangers },
      );
    }
    return { plan, acknowledgedWarnings: dangers };
  });
}
