// Runs once when the Next server starts: the report worker lives in the server process.
// REPORT_WORKER=off leaves it out (e.g. when a separate worker process is run).
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build' || process.env.REPORT_WORKER === 'off') return;
  const { startReportWorkerWhenReady } = await import('@/lib/jobs/worker');
  // Not awaited: the site serves pages while the database is still coming up, and the worker starts
  // (retrying with backoff) as soon as it answers; sends queued meanwhile wait in report_sends.
  startReportWorkerWhenReady();
}
