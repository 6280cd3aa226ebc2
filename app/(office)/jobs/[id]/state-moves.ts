import type { JobState } from "@/db/job-states";
import type { UserRole } from "@/db/schema";
import type { MoveWarning } from "@/lib/jobs/drill-rack-check";
import type { StateMove } from "./state-controls";

/** What a move answers beside its message: the warnings it went ahead with (a drill off the rack at release). */
export interface StateMoveData {
  warnings: MoveWarning[];
}

/** The moves the office makes from the job page; the bench moves a job into and out of machining itself. */
export function officeMoves(state: JobState, nextRevision: number, role: UserRole): StateMove[] {
  switch (state) {
    case "draft":
    case "held":
      return [{ to: "planned", label: `Approve as revision ${nextRevision}`, title: "Solve the plan and keep it as a revision", primary: true }];
    case "planned":
      return [
        { to: "draft", label: "Reopen for edits", title: "Back to draft; the approved revision stays as it is", primary: false },
        { to: "released", label: "Release to the bench", title: "Travelers go out; the bench may start", primary: true },
      ];
    case "verified":
      return [
        ...(role === "admin" ? [{ to: "machining" as const, label: "Reopen for corrections", title: "Back to machining so a signed reading can be corrected", primary: false }] : []),
        { to: "delivered", label: "Mark delivered", title: "Handed back to the customer", primary: true },
      ];
    default:
      return [];
  }
}

/** What the office is told when the job moves on without it. */
export function officeIdleNote(state: JobState): string {
  switch (state) {
    case "released":
    case "machining":
      return "The bench works from the current revision. Editing the inputs starts a new one (in machining, the job goes on hold).";
    case "delivered":
      return "Delivered. Editing the inputs starts a new revision for the car's next visit.";
    default:
      return "";
  }
}
