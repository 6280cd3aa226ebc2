import "server-only";
import { startQueueWorkers } from "@/lib/server/mail-queue";
import { renderReleaseTravelers } from "./release-travelers";

/** Starts the server's background work (queued mail, release travelers); a second call does nothing. */
export function startWorkers(): Promise<string[]> {
  return startQueueWorkers(renderReleaseTravelers);
}
