// Runs once when the server starts (next start, next dev, and the end-to-end tests' server): the worker that
// sends queued mail and the one that renders a release's travelers live as long as the server does.
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { startWorkers } = await import("./lib/jobs/workers");
    const { log } = await import("./lib/server/log");
    // Not awaited: the server starts even when the database is not reachable yet, and the worker keeps trying
    // to start; mail queued meanwhile waits in the queue.
    const start = (): void => {
      startWorkers().catch((error: unknown) => {
        log.error({ err: error }, "queue workers not started; trying again in 10 s");
        setTimeout(start, 10_000).unref();
      });
    };
    start();
  }
}
