// Runs once when the server starts (next start, next dev, and the end-to-end tests' server): the worker that
// sends queued mail lives as long as the server does.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startMailWorker } = await import("./lib/server/mail-queue");
    const { log } = await import("./lib/server/log");
    // Not awaited: the server starts even when the database is not reachable yet, and the worker keeps trying
    // to start; mail queued meanwhile waits in the queue.
    const start = (): void => {
      startMailWorker().catch((error: unknown) => {
        log.error({ err: error }, "mail worker not started; trying again in 10 s");
        setTimeout(start, 10_000).unref();
      });
    };
    start();
  }
}
