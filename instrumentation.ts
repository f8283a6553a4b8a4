// Runs once when the Next server starts: the report worker lives in the server process.
// REPORT_WORKER=off leaves it out (e.g. when a separate worker process is run).
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build' || process.env.REPORT_WORKER === 'off') return;
  const { startReportWorker } = await import('@/lib/jobs/worker');
  try {
    await startReportWorker();
  } catch (error) {
    // The site still serves pages; queued reports wait for the next start.
    console.error('[jobs] the report worker did not start', error);
  }
}
