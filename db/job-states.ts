// The life of a job, and which moves between states are allowed. Checked on the server for every change.

export const JOB_STATES = ["draft", "planned", "released", "machining", "verified", "delivered"] as const;
export type JobState = (typeof JOB_STATES)[number];

export const JOB_STATE_LABELS: Record<JobState, { label: string; meaning: string }> = {
  draft: { label: "draft", meaning: "inputs being entered or revised; nothing approved for the shop" },
  planned: { label: "planned", meaning: "a revision is approved and waits to be released" },
  released: { label: "released", meaning: "travelers are out; the bench may start" },
  machining: { label: "machining", meaning: "the bench has signed at least one operation" },
  verified: { label: "verified", meaning: "every operation signed and every measurement within plan" },
  delivered: { label: "delivered", meaning: "handed back to the customer" },
};

/** Moves a person may ask for. Approving (draft -> planned) also snapshots a revision. */
const ALLOWED: Record<JobState, readonly JobState[]> = {
  draft: ["planned"],
  planned: ["draft", "released"],
  released: ["machining"],
  machining: ["verified"],
  verified: ["delivered", "machining"],
  delivered: [],
};

export function canMove(from: JobState, to: JobState): boolean {
  return ALLOWED[from].includes(to);
}

export function nextStates(from: JobState): readonly JobState[] {
  return ALLOWED[from];
}

