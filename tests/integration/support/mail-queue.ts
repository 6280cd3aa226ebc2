// The mail queue in integration tests: the workers the server would start (mail, release travelers), and a
// wait for them to finish.
import { listMailQueue, pendingTravelerRenders } from "@/lib/server/mail-queue";
import { startWorkers } from "@/lib/jobs/workers";

export { startWorkers as startMailWorker };

/** Waits until no render is left and no message is queued, being sent or waiting for another try. */
export async function mailSettled(timeoutMs = 10_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    // Renders first: a render queues its mail before it completes, so none can slip between the two counts.
    const renders = await pendingTravelerRenders();
    const pending = (await listMailQueue()).filter((m) => m.state === "queued" || m.state === "sending" || m.state === "retrying");
    if (renders === 0 && pending.length === 0) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error("queued mail was still waiting to be sent");
}
