// The no-loss run's processes: its own fakes (S3 and the SMTP inbox, on free ports, so the
// run never touches another checkout's inbox) and the app server, which the run kills and restarts.
// With --topology: scripts/topology.sh (nginx, two app servers, PgBouncer); a kill takes down one
// app server (A, then B, …) while the balancer sends the phones to the other.
import { execFile, execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { DB, freePort, settings, sleep } from './setup';

let server: ChildProcess | null = null;
let fakes: ChildProcess | null = null;
export const ports = { app: 0, s3: 0, smtp: 0, inbox: 0 };
export const base = () =>
  settings.topology ? `http://127.0.0.1:${process.env.HM_TOPO_PORT}` : `http://localhost:${ports.app}`;
export const inboxUrl = () => `http://127.0.0.1:${ports.inbox}`;

async function waitFor(url: string, what: string) {
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      /* not up yet */
    }
    await sleep(250);
  }
  throw new Error(`${what} did not come up in 60 s`);
}

export async function startFakes() {
  ports.app = Number(process.env.HM_NOLOSS_PORT ?? (await freePort()));
  ports.s3 = await freePort();
  ports.smtp = await freePort();
  ports.inbox = await freePort();
  fakes = spawn('node_modules/.bin/tsx', ['scripts/fakes.ts'], {
    env: {
      ...process.env,
      HM_S3_PORT: String(ports.s3),
      HM_SMTP_PORT: String(ports.smtp),
      HM_MAIL_HTTP_PORT: String(ports.inbox),
      HM_S3_DIR: mkdtempSync(path.join(tmpdir(), 'hm-noloss-s3-')),
    },
    stdio: 'ignore',
    detached: true,
  });
  await waitFor(`${inboxUrl()}/health`, 'the fakes');
}

const appEnv = () => ({
  ...process.env,
  HM_DB_NAME: DB,
  HM_TOPO_DB: DB,
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: String(ports.smtp),
  S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
  S3_PUBLIC_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
});
const topology = (...a: string[]) =>
  promisify(execFile)('bash', ['scripts/topology.sh', ...a], { env: appEnv() });

export async function startServer() {
  // the topology starts what is not running: after a kill, the app server that was killed
  if (settings.topology) return void (await topology('start'));
  server = spawn('node_modules/.bin/next', ['start', '-p', String(ports.app)], {
    env: {
      ...process.env,
      HM_DB_NAME: DB,
      HM_APP_PORT: String(ports.app),
      APP_URL: base(),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(ports.smtp),
      S3_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
      S3_PUBLIC_ENDPOINT: `http://127.0.0.1:${ports.s3}`,
    },
    stdio: 'ignore',
    detached: true,
  });
  await waitFor(`${base()}/api/health`, 'the app server');
}

const killGroup = (p: ChildProcess | null) => {
  try {
    if (p?.pid) process.kill(-p.pid, 'SIGKILL');
  } catch {
    /* gone already */
  }
};
let kills = 0;
/** Kills the app server outright (in the topology: one of the two, in turn); returns its name. */
export async function killServer(): Promise<string> {
  if (settings.topology) {
    const name = kills++ % 2 === 0 ? 'a' : 'b';
    await topology('kill', name);
    return `app server ${name.toUpperCase()} of two`;
  }
  killGroup(server);
  server = null;
  return 'the app server';
}

/** Stops every app server (and in the topology, the balancer and PgBouncer). */
export function stopServers() {
  if (settings.topology) execFileSync('bash', ['scripts/topology.sh', 'stop'], { stdio: 'ignore' });
  killGroup(server);
  server = null;
}

/** Takes the SMTP fake's port down or up (the inbox keeps what it holds). */
export async function smtp(to: 'stop' | 'start') {
  const res = await fetch(`${inboxUrl()}/smtp/${to}`, { method: 'POST' });
  if (!res.ok) throw new Error(`the SMTP fake did not ${to}`);
}

process.on('exit', () => {
  stopServers();
  killGroup(fakes);
});
process.on('SIGINT', () => process.exit(130));
process.on('SIGTERM', () => process.exit(143));
