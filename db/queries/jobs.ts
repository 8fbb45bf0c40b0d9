import 'server-only';
import { sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';

/**
 * Queues a graphile-worker job with its own SQL function, inside the caller's transaction when
 * `tx` is given: the job exists exactly when the caller's rows do. A `jobKey` replaces a waiting
 * job with the same key (and starts its attempts again) instead of adding a second.
 */
export async function addJob(
  task: string,
  payload: Record<string, unknown>,
  options: { maxAttempts?: number; jobKey?: string; runAt?: Date } = {},
  tx?: Tx,
): Promise<void> {
  await (tx ?? db).execute(
    sql`select graphile_worker.add_job(
      ${task},
      ${JSON.stringify(payload)}::json,
      max_attempts => ${options.maxAttempts ?? null}::int,
      job_key => ${options.jobKey ?? null}::text,
      run_at => ${options.runAt?.toISOString() ?? null}::timestamptz
    )`,
  );
}
