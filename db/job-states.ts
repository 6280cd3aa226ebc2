// The life of a job, and which moves between states are allowed. Checked on the server for every change.

export const JOB_STATES = ["draft", "planned", "released", "machining", "held", "verified", "delivered"] as const;
export type JobState = (typeof JOB_STATES)[number];

export const JOB_STATE_LABELS: Record<JobState, { label: string; meaning: string }> = {
  draft: { label: "draft", meaning: "inputs being entered or revised; nothing approved for the shop" },
  planned: { label: "planned", meaning: "a revision is approved and waits to be released" },
  released: { label: "released", meaning: "travelers are out; the bench may start" },
  machining: { label: "machining", meaning: "the bench has signed at least one operation" },
  held: { label: "on hold", meaning: "the inputs are being revised mid-machining; the bench waits for the next revision" },
  verified: { label: "verified", meaning: "every operation signed and every measurement within plan" },
  delivered: { label: "delivered", meaning: "handed back to the customer" },
};

/** Moves a person may ask for. Approving (draft -> planned) also snapshots a revision. */
const ALLOWED: Record<JobState, readonly JobState[]> = {
  draft: ["planned"],
  planned: ["draft", "released"],
  released: ["machining"],
  machining: ["verified"],
  // A held job leaves hold by approving the revised inputs; the new revision supersedes the one on the bench.
  held: ["planned"],
  verified: ["delivered", "machining"],
  delivered: [],
};

/** States whose inputs are being edited: the plan is solved live, layouts may be picked, approval comes next. */
export const EDITING_STATES: readonly JobState[] = ["draft", "held"];

export function canMove(from: JobState, to: JobState): boolean {
  return ALLOWED[from].includes(to);
}

export function nextStates(from: JobState): readonly JobState[] {
  return ALLOWED[from];
}

