"use client";

import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";
import type { FormResult } from "@/lib/forms/form-action";
import type { JobState } from "@/db/job-states";
import type { StateMoveData } from "./state-moves";

export interface StateMove {
  to: JobState;
  label: string;
  title: string;
  primary: boolean;
}

/** The moves the job can make from where it is, as submit buttons of one form. */
export function StateControls({
  action,
  moves,
  idle,
  dangers = 0,
}: {
  action: (previous: FormResult<StateMoveData> | undefined, formData: FormData) => Promise<FormResult<StateMoveData>>;
  moves: StateMove[];
  /** Said instead of buttons when the office has no move to make from here. */
  idle: string;
  /** Danger warnings in the plan an approval would keep: approving needs an explicit acknowledgement. */
  dangers?: number;
}) {
  const { formProps, lastResult: result, pending, data } = useServerForm(action, { id: "job-state" });
  // A move that went ahead with warnings (a drill off the rack at release) is said in the warning's colours.
  const warned = (data?.warnings.length ?? 0) > 0;
  const refused =
    result && result.httpStatus !== 200 ? (result.error?.[""] ?? result.error?.to ?? result.error?.acknowledgeWarnings ?? result.error?.handedTo ?? ["Not done."]) : undefined;
  const approving = moves.some((m) => m.to === "planned");
  const delivering = moves.some((m) => m.to === "delivered");
  return (
    <form {...formProps} aria-label="Job state" className="flex flex-col items-end gap-2">
      {delivering ? (
        <div className="w-full max-w-sm">
          <Field label="Handed to" htmlFor="job-state-handed-to" hint="The name of the person who takes the blocks.">
            <Input id="job-state-handed-to" name="handedTo" autoComplete="off" maxLength={200} required />
          </Field>
        </div>
      ) : null}
      <div className="flex flex-wrap justify-end gap-2">
        {moves.length === 0 ? <p className="max-w-sm text-right text-sm text-graphite">{idle}</p> : null}
        {moves.map((move) => (
          <Button key={move.to} type="submit" name="to" value={move.to} title={move.title} variant={move.primary ? "primary" : "secondary"} disabled={pending}>
            {move.label}
          </Button>
        ))}
      </div>
      {approving && dangers > 0 ? (
        <label className="flex max-w-sm items-start gap-2 text-sm text-fault">
          <input type="checkbox" name="acknowledgeWarnings" className="mt-1 h-5 w-5" />
          <span>
            I have read the {dangers} danger warning{dangers > 1 ? "s" : ""} of this plan and approve it anyway; the acknowledgement is kept with the
            revision.
          </span>
        </label>
      ) : null}
      {warned ? (
        <div role="status" data-testid="move-warnings" className="max-w-sm rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
          {result?.message}
        </div>
      ) : (
        <FormMessage errors={refused} success={result?.httpStatus === 200 ? result.message : undefined} />
      )}
    </form>
  );
}
