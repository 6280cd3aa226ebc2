"use server";

import { revalidatePath } from "next/cache";
import { chooseStageLayout } from "@/db/jobs";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { moveJob } from "@/lib/jobs/moves";
import { JOB_STATE_LABELS } from "@/db/job-states";
import { jobStateChangeSchema, stageChoiceSchema } from "@/lib/jobs/schema";
import { requireVisibleJob } from "./job-guard";
import type { StateMoveData } from "./state-moves";

// The job page's own actions: the tuner's pick among the hole layouts, and the moves between states.
// Bound to the job's id by the page; the id is checked again here like any other input.

export async function chooseLayoutAction(jobId: string, _previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: stageChoiceSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work(value, user) {
      const id = await requireVisibleJob(user, jobId);
      await chooseStageLayout(user, { jobId: id, stageId: value.stageId, count: value.count, drillLabel: value.drillLabel });
      revalidatePath(`/jobs/${id}`);
      return `Stage uses ${value.count} × ${value.drillLabel}.`;
    },
  });
}

export async function changeStateAction(jobId: string, _previous: FormResult<StateMoveData> | undefined, formData: FormData): Promise<FormResult<StateMoveData>> {
  return runFormAction(formData, {
    schema: jobStateChangeSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work(value, user) {
      const id = await requireVisibleJob(user, jobId);
      const moved = await moveJob(user, id, value.to, { acknowledgeWarnings: value.acknowledgeWarnings, handedTo: value.handedTo });
      revalidatePath(`/jobs/${id}`);
      revalidatePath("/jobs");
      const done =
        value.to === "planned"
          ? `Revision ${moved.revision} approved.`
          : moved.state === "delivered"
            ? moved.recordMailedTo
              ? `Delivered to ${value.handedTo}; the conversion record goes to ${moved.recordMailedTo}.`
              : `Delivered to ${value.handedTo}. The customer has no e-mail address on file: print the record from the customer's page.`
            : `The job is ${JOB_STATE_LABELS[moved.state].label}.`;
      return { message: [done, ...moved.warnings.map((w) => w.message)].join(" "), data: { warnings: moved.warnings } };
    },
  });
}
