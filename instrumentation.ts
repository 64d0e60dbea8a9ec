// Next calls register() once when a server instance starts. Parameter-study jobs are worked by
// their own process (`npm run worker`, scripts/worker.ts), not by the app: a long study never
// competes with requests. STUDY_WORKER=in-app makes an instance work jobs too (a lone dev server).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (!process.env.DATABASE_URL || process.env.NEXT_PHASE === "phase-production-build") return;
  try {
    // Mail queued in mail_outbox before a restart goes out without waiting for the next mail.
    const { startMailOutbox } = await import("./lib/server/email/outbox-sender");
    startMailOutbox();
  } catch (error) {
    console.error("[mail outbox] not started:", error instanceof Error ? error.message : error);
  }
  if (process.env.STUDY_WORKER !== "in-app") return;
  try {
    const { startAppStudyWorker } = await import("./lib/server/handoff/studies/app-queue");
    await startAppStudyWorker();
  } catch (error) {
    // The app still serves pages; studies wait in the queue until a worker runs.
    console.error("[study worker] not started:", error instanceof Error ? error.message : error);
  }
}
