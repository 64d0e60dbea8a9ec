// Next calls register() once when a server instance starts. Each instance runs a worker of the
// parameter-study queue in-process, so several instances share the studies' jobs.
// STUDY_WORKER=off leaves an instance out (it still submits jobs).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  if (process.env.STUDY_WORKER === "off" || !process.env.DATABASE_URL) return;
  if (process.env.NEXT_PHASE === "phase-production-build") return;
  try {
    const { startAppStudyWorker } = await import("./lib/studies/app-queue");
    await startAppStudyWorker();
  } catch (error) {
    // The app still serves pages; studies wait in the queue until a worker runs.
    console.error("[study worker] not started:", error instanceof Error ? error.message : error);
  }
}
