// The mail queue in integration tests: the worker the server would start, and a wait for it to finish.
import { listMailQueue, startMailWorker } from "@/lib/server/mail-queue";

export { startMailWorker };

/** Waits until no message is queued, being sent or waiting for another try. */
export async function mailSettled(timeoutMs = 10_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const pending = (await listMailQueue()).filter((m) => m.state === "queued" || m.state === "sending" || m.state === "retrying");
    if (pending.length === 0) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error("queued mail was still waiting to be sent");
}
