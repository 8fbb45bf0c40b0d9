// Starts the job queue's worker inside the app server (instrumentation.ts): it runs the e-mail
// sends and the scheduled jobs of tasks.ts. Several app servers may each run one: graphile-worker
// hands every job to one worker only.
//
// A server killed mid-job leaves that job locked by its worker, and graphile-worker only frees such
// a lock after four hours. So each server's worker has a fixed id (this host and the port it
// listens on, which no other live server can hold at the same time), and a server starting again
// first frees the jobs its killed predecessor held: an e-mail being sent when the app died goes
// out minutes later, not hours. A fixed id means one job at a time (the queue wants a distinct
// id per concurrent worker), which is plenty for a terminal's e-mail.
// The worker connects past PgBouncer (sessionDatabaseUrl, docs/topology.md): it LISTENs for new
// jobs and uses named prepared statements, which a transaction-pooled connection cannot keep.
import 'server-only';
import { hostname } from 'node:os';
import { makeWorkerUtils, run, type Runner, type RunnerOptions } from 'graphile-worker';
import { sessionDatabaseUrl } from '@/db/url';
import { env } from '../env';
import { cronItems, taskList } from './tasks';

/** This server's worker id: set by HM_JOB_WORKER_ID, or made from the host name and the port. */
export function jobWorkerId(): string {
  const settings = env();
  return settings.HM_JOB_WORKER_ID ?? `hitchmark-${hostname()}-${settings.PORT ?? 'default'}`;
}

export async function startJobWorker(): Promise<Runner> {
  const workerId = jobWorkerId();
  const utils = await makeWorkerUtils({ connectionString: sessionDatabaseUrl() });
  try {
    await utils.forceUnlockWorkers([workerId]);
  } finally {
    await utils.release();
  }
  const options: RunnerOptions & { workerId: string } = {
    connectionString: sessionDatabaseUrl(),
    concurrency: 1,
    // read by run() (it refuses one with concurrency above 1) though RunnerOptions does not list it
    workerId,
    maxPoolSize: 4,
    pollInterval: 5_000,
    noHandleSignals: true,
    taskList,
    parsedCronItems: cronItems(),
  };
  return run(options);
}
