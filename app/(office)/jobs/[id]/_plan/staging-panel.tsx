import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { StagingChart, StagingChartKey } from "@/components/staging-chart";
import { BalanceTable } from "./balance-table";
import { jobStagingChart, valveMarks } from "./staging-dto";

/** The fuel curve of the whole carburetor: part and full throttle, and the balance between the sides. */
export function StagingPanel({ plan, blocks, unit }: { plan: ConversionPlan; blocks: readonly BlockRow[]; unit: DisplayLengthUnit }) {
  const chart = jobStagingChart(blocks, plan);
  const { balance } = plan.staging;
  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-col gap-8">
        <StagingChart chart={chart} mode="part" unit={unit} />
        <StagingChart chart={chart} mode="full" unit={unit} />
      </div>
      <StagingChartKey />
      <section aria-label="Balance" className="flex flex-col gap-2">
        <h3 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Primary and secondary balance</h3>
        {balance.stages.length ? (
          <BalanceTable balance={balance} marks={valveMarks(blocks)} unit={unit} />
        ) : (
          <p className="text-sm text-pencil">No valve adds area yet.</p>
        )}
        <p className="text-xs text-pencil">
          Over mains: restriction area open on a side as a percent of that side&apos;s main-jet area, cumulative. Enrichment should reach the
          primary first, then the secondary (common practice), so cylinder distribution stays even.
        </p>
      </section>
    </div>
  );
}
