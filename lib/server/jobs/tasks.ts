// The job queue's tasks (graphile-worker) and its schedule. What runs when: docs/jobs.md.
import 'server-only';
import { parseCrontab, type Task, type TaskList } from 'graphile-worker';
import { z } from 'zod';
import { SEND_EMAIL_TASK } from '@/db/queries/outbox';
import { sendOutboxEmail } from '../mail';
import { removeStaleUploads } from '../photos/cleanup';
import { anchorDueTerminals } from './anchor';

const sendEmail: Task = async (payload, helpers) => {
  const { emailId } = z.object({ emailId: z.uuid() }).parse(payload);
  const outcome = await sendOutboxEmail(emailId, {
    attempt: helpers.job.attempts,
    maxAttempts: helpers.job.max_attempts,
  });
  helpers.logger.debug(`e-mail ${emailId}: ${outcome}`);
};

const removeStale: Task = async (_payload, helpers) => {
  const removed = await removeStaleUploads();
  helpers.logger.info(`stale uploads: ${removed.expired} refused, ${removed.objects} objects removed`);
};

const anchorChains: Task = async (_payload, helpers) => {
  for (const a of await anchorDueTerminals())
    helpers.logger.info(`anchored ${a.terminal} ${a.day}: ${a.digest}`);
};

export const taskList: TaskList = {
  [SEND_EMAIL_TASK]: sendEmail,
  remove_stale_uploads: removeStale,
  anchor_chains: anchorChains,
};

/**
 * Scheduled jobs (UTC, graphile-worker crontab syntax; `fill` runs a missed slot up to that long
 * after, e.g. when the app was down at the hour).
 *  - 03:17 every day: refuse uploads announced over a day ago and never completed; delete their files.
 *  - minute 7 of every hour: anchor each terminal whose previous local day is not anchored yet.
 */
export const crontab = `
17 3 * * * remove_stale_uploads ?fill=1d&max=1
7 * * * * anchor_chains ?fill=2h&max=3
`;

export const cronItems = () => parseCrontab(crontab);
