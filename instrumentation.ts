import type { Instrumentation } from 'next';

// Runs once when a Next.js server starts: checks the settings (a bad one stops the start with a
// clear message), then starts the job queue's worker (graphile-worker: e-mail sending, the daily
// upload cleanup and chain anchors; lib/server/jobs, docs/jobs.md). Each app server runs one;
// the queue gives every job to one worker only. HM_JOB_WORKER=0 turns it off for this server.
export async function register() {
  if (process.env.NEXT_RUNTIME !== 'nodejs') return;
  const { env } = await import('./lib/server/env');
  const settings = env();
  if (settings.HM_JOB_WORKER === '0') return;
  const { startJobWorker } = await import('./lib/server/jobs/worker');
  try {
    const runner = await startJobWorker();
    const stop = () => void runner.stop().catch(() => undefined);
    process.once('SIGTERM', stop);
    process.once('SIGINT', stop);
  } catch (error) {
    // the app still serves; mail waits in the outbox until a worker runs
    console.error('[jobs] the job worker did not start', error);
  }
}

/** Every unexpected server error, logged with where it happened; pages show only its digest. */
export const onRequestError: Instrumentation.onRequestError = (error, request, context) => {
  const digest = (error as { digest?: string }).digest;
  console.error(
    `[request] ${request.method} ${request.path} failed in ${context.routeType} ${context.routePath}` +
      (digest ? ` (digest ${digest})` : ''),
    error,
  );
};
