// Runs once when the Next server starts. First the environment: outside development and test a server
// without its secrets (or with a non-https public address) refuses to start, saying what is missing.
// Then the report worker, which lives in the server process (REPORT_WORKER=off leaves it out).
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  if (process.env.NEXT_PHASE === 'phase-production-build') return;
  const { env, EnvError } = await import('@/lib/env');
  let reportWorker: string;
  try {
    reportWorker = env().REPORT_WORKER;
  } catch (error) {
    if (!(error instanceof EnvError)) throw error;
    console.error(`\n${error.message}\n`);
    process.exit(1);
  }
  if (reportWorker === 'off') return;
  const { startReportWorkerWhenReady } = await import('@/lib/queue/worker');
  // Not awaited: the site serves pages while the database is still coming up, and the worker starts
  // (retrying with backoff) as soon as it answers; sends queued meanwhile wait in report_sends.
  startReportWorkerWhenReady();
}
