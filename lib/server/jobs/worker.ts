// Starts the job queue's worker inside the app server (instrumentation.ts): it runs the e-mail
// sends and the scheduled jobs of tasks.ts. Several app servers may each run one: graphile-worker
// hands every job to one worker only.
import 'server-only';
import { run, type Runner } from 'graphile-worker';
import { databaseUrl } from '@/db/url';
import { cronItems, taskList } from './tasks';

export async function startJobWorker(): Promise<Runner> {
  return run({
    connectionString: databaseUrl(),
    concurrency: 2,
    maxPoolSize: 4,
    pollInterval: 5_000,
    noHandleSignals: true,
    taskList,
    parsedCronItems: cronItems(),
  });
}
