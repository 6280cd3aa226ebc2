import { inArray, type SQL } from "drizzle-orm";
import type { JobState } from "./job-states";
import { jobs, type UserRole } from "./schema";

/** Who asks: every read and write of the stores takes it, so the row rules below apply everywhere. */
export interface Viewer {
  id: string;
  role: UserRole;
}

/** States whose work the bench (machinists) may see: the job reached the shop floor. */
/** A held job stays on it: the bench page says the revision is on hold instead of vanishing mid-work. */
export const SHOP_FLOOR_STATES: readonly JobState[] = ["released", "machining", "held", "verified", "delivered"];

/**
 * The one rule of which jobs a viewer sees: machinists see work that reached the shop floor, tuners and admins
 * see every job. A hidden job is answered exactly like a missing one (404), so the bench learns nothing about
 * work not yet released.
 */
export function maySeeJob(viewer: Viewer, state: JobState): boolean {
  return viewer.role !== "machinist" || SHOP_FLOOR_STATES.includes(state);
}

/** The same rule as a SQL condition on `jobs`, for lists (undefined: no restriction). */
export function visibleJobsWhere(viewer: Viewer): SQL | undefined {
  return viewer.role === "machinist" ? inArray(jobs.state, [...SHOP_FLOOR_STATES]) : undefined;
}
