"use client";

import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import type { FormResult } from "@/lib/forms/form-action";

/** "Use this layout" for one candidate: records the tuner's pick on the server. */
export function UseLayoutButton({
  action,
  stageId,
  count,
  drillLabel,
  layout,
}: {
  action: (previous: FormResult | undefined, formData: FormData) => Promise<FormResult>;
  stageId: string;
  count: number;
  drillLabel: string;
  layout: string;
}) {
  const { formProps, lastResult: result, pending } = useServerForm(action, { id: `use-layout-${stageId}-${count}-${drillLabel}` });
  const refused = result && result.httpStatus !== 200 ? (result.error?.[""] ?? ["Not saved."]) : undefined;
  return (
    <form {...formProps} className="inline-flex flex-col items-end gap-1">
      <input type="hidden" name="stageId" value={stageId} />
      <input type="hidden" name="count" value={count} />
      <input type="hidden" name="drillLabel" value={drillLabel} />
      <Button type="submit" variant="secondary" disabled={pending} aria-label={`Use ${layout}`} className="min-h-8 px-3 text-xs">
        {pending ? "Saving…" : "Use this layout"}
      </Button>
      {refused ? (
        <span role="alert" className="text-xs text-fault">
          {refused.join(" ")}
        </span>
      ) : null}
    </form>
  );
}
