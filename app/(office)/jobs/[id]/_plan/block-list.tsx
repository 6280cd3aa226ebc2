import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { Sheet } from "@/components/ui/sheet";
import { BlockInputs } from "./block-inputs";
import { targetText, valveText } from "./stage-terms";

/** The blocks and stages as entered, for when there is no plan to show beside them. */
export function BlockList({ blocks, unit }: { blocks: BlockRow[]; unit: DisplayLengthUnit }) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      {blocks.map((block) => (
        <Sheet key={block.id} title={block.side === "primary" ? "Primary metering block" : "Secondary metering block"}>
          <div className="flex flex-col gap-4">
            <BlockInputs block={block} unit={unit} />
            <ol className="flex list-decimal flex-col gap-1 pl-5 text-sm">
              {block.stages.map((stage) => (
                <li key={stage.id}>
                  {valveText(stage)} · {targetText(stage, unit)}
                </li>
              ))}
            </ol>
          </div>
        </Sheet>
      ))}
    </div>
  );
}
