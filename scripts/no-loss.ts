// No-loss run (trust suite): many phones record handoffs at once over HTTP against `next start`,
// with duplicate taps, client timeouts and retries under the same draft key, while the app server
// (not the database) is killed and restarted, and the SMTP fake is taken down for a while and
// brought back. Then it checks what the database and the inbox hold: stored = sent, each draft
// key once, no answer 500, every touched trailer's chain verifies, and every e-mail queued
// arrived exactly once (by its Message-ID), none lost, none twice.
//
//   source scripts/env.sh && npx next build && npm run -s no-loss
//   npm run -s no-loss -- --handoffs 60 --phones 10 --restarts 1 --mail-down 10   (a short form)
//   npm run -s no-loss -- --topology …   the same through scripts/topology.sh: each kill takes down
//     one of the two app servers behind the balancer (docs/topology.md)
//
// It makes its own database (hitchmark_noloss; scripts/no-loss/setup.ts), its own fakes and its own
// server on free ports (HM_NOLOSS_PORT picks the server's). Needs PostgreSQL running (scripts/db.sh start).
import { checkMail } from './no-loss/mail';
import { figures, outcomes, runPhones } from './no-loss/phones';
import { base, killServer, smtp, startFakes, startServer, stopServers } from './no-loss/server';
import { prepare, settings, sleep } from './no-loss/setup';

if (!process.env.SESSION_SECRET || !process.env.CHAIN_KEY) {
  console.error('Run `source scripts/env.sh` first (SESSION_SECRET and CHAIN_KEY are needed).');
  process.exit(2);
}
const { handoffs: HANDOFFS, phones: PHONES, restarts: RESTARTS, mailDownSeconds } = settings;

const { drivers, onRoad } = await prepare();
const { db, pool } = await import('@/db');
const { like } = await import('drizzle-orm');
const { handoffs } = await import('@/db/schema');
const { verifyTrailerChain } = await import('@/lib/server/handoffs/chain');

await startFakes();
await startServer();
console.log(
  `no-loss: ${HANDOFFS} handoffs from ${PHONES} phones, ${RESTARTS} server kills, SMTP down ${mailDownSeconds} s` +
    (settings.topology ? ` (topology at ${base()}: nginx, two app servers, PgBouncer)` : ''),
);
const t0 = Date.now();
let phonesDone = false;
const run = runPhones(drivers, onRoad, HANDOFFS).finally(() => {
  phonesDone = true;
});
const waitFor = async (share: number) => {
  while (!phonesDone && figures.recorded < HANDOFFS * share) await sleep(50);
};

let restarts = 0;
const killer = (async () => {
  for (let k = 1; k <= RESTARTS; k++) {
    await waitFor(k / (RESTARTS + 1));
    if (phonesDone) break;
    const killed = await killServer();
    console.log(`no-loss: killed ${killed} after ${figures.recorded} recorded handoffs`);
    await sleep(1000);
    await startServer();
    restarts++;
    console.log('no-loss: app server back');
  }
})();

let mailOutages = 0;
const mailDown = (async () => {
  if (!mailDownSeconds) return;
  await waitFor(1 / 6);
  await smtp('stop');
  console.log(`no-loss: SMTP fake down after ${figures.recorded} recorded handoffs`);
  await sleep(mailDownSeconds * 1000);
  await smtp('start');
  mailOutages++;
  console.log(`no-loss: SMTP fake back after ${mailDownSeconds} s (${figures.recorded} recorded)`);
})();
await run;
await killer;
await mailDown;
const phonesSeconds = (Date.now() - t0) / 1000;

// every e-mail due goes out while the server (and its job worker) still runs
const mail = await checkMail(settings.mailWaitSeconds);
stopServers();

// ---- what the database holds
const stored = await db
  .select({ id: handoffs.id, key: handoffs.idempotencyKey, trailerId: handoffs.trailerId })
  .from(handoffs)
  .where(like(handoffs.idempotencyKey, 'noloss-%'));
const byKey = new Map<string, number>();
for (const s of stored) byKey.set(s.key, (byKey.get(s.key) ?? 0) + 1);
const sentKeys = new Set(outcomes.map((o) => o.key));
const answered = outcomes.filter((o) => o.handoffId);
const storedIds = new Set(stored.map((s) => `${s.key} ${s.id}`));
const missing = answered.filter((o) => !storedIds.has(`${o.key} ${o.handoffId}`));
const twice = [...byKey.values()].filter((n) => n > 1).length;
const strays = stored.filter((s) => !sentKeys.has(s.key)).length;
const chains = await Promise.all(onRoad.map((t) => verifyTrailerChain(t.id)));
const chainsOk = chains.filter((c) => c.check.ok).length;
await pool.end();

const lines = [
  `handoffs sent             ${outcomes.length} (${PHONES} phones, ${figures.requests} HTTP requests in ${phonesSeconds.toFixed(0)} s)`,
  `handoffs stored           ${stored.length}`,
  `answered 201/200          ${answered.length} (replays answered 200: ${figures.replays})`,
  `stored as answered        ${answered.length - missing.length} of ${answered.length}`,
  `draft keys stored twice   ${twice}`,
  `stored but never sent     ${strays}`,
  `duplicate taps            ${figures.duplicateTaps}`,
  `client timeouts (retried) ${figures.timeouts}`,
  `network errors (retried)  ${figures.networkErrors}`,
  `409 while a twin held it  ${figures.conflicts}`,
  `answers 500               ${figures.fiveHundreds}`,
  `balancer 502/503/504      ${figures.gatewayErrors} (retried under the same draft key)`,
  `server kills survived     ${restarts}`,
  `chains verified           ${chainsOk} of ${chains.length} trailers`,
  `SMTP outages              ${mailOutages} (${mailDownSeconds} s)`,
  `e-mails queued            ${mail.queued} (send attempts: ${mail.attempts})`,
  `e-mails delivered         ${mail.delivered} (by Message-ID; ${mail.waitedSeconds} s after the last handoff)`,
  `e-mails delivered twice   ${mail.deliveredTwice}`,
  `e-mails lost              ${mail.missing} (outbox rows sent ${mail.sentRows}, failed ${mail.failedRows})`,
  `inbox messages not queued ${mail.strays}`,
];
console.log(`\nno-loss figures\n  ${lines.join('\n  ')}`);
const ok =
  outcomes.length === HANDOFFS &&
  stored.length === HANDOFFS &&
  answered.length === HANDOFFS &&
  missing.length === 0 &&
  twice === 0 &&
  strays === 0 &&
  figures.fiveHundreds === 0 &&
  restarts === RESTARTS &&
  chainsOk === chains.length &&
  mailOutages === (mailDownSeconds ? 1 : 0) &&
  mail.queued > 0 &&
  mail.delivered === mail.queued &&
  mail.sentRows === mail.queued &&
  mail.deliveredTwice === 0 &&
  mail.missing === 0 &&
  mail.strays === 0;
console.log(ok ? '\nno-loss: PASS' : '\nno-loss: FAIL');
process.exit(ok ? 0 : 1);
