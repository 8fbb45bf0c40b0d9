// The no-loss run's settings and its own database: fresh, migrated and seeded as the owner (the
// app connects as its own role), plus an invented yard row of 40 empty slots so twenty phones
// never find the yard full, and one untouched trailer on the road per phone.
import { execFileSync } from 'node:child_process';
import net from 'node:net';

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : fallback;
  if (!Number.isInteger(v) || v < 0) throw new Error(`--${name} needs a whole number`);
  return v;
};

export const settings = {
  handoffs: arg('handoffs', 300),
  phones: arg('phones', 20),
  restarts: arg('restarts', 2),
  /** How long the SMTP fake stays down, from a sixth of the way into the run (0: never down). */
  mailDownSeconds: arg('mail-down', 20),
  /** How long to wait after the last handoff for every e-mail to arrive. */
  mailWaitSeconds: arg('mail-wait', 300),
  /** Against scripts/topology.sh: each kill takes down one of the two app servers behind nginx. */
  topology: process.argv.includes('--topology'),
};
export const DB = 'hitchmark_noloss';
const DRIVERS = ['D1001', 'D1002', 'D1003', 'D1004', 'D2001', 'D2002', 'D3001', 'D4001'];
export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** A port nobody listens on now (the run's app server and fakes take their own). */
export function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

export type Driver = { id: string; carrierId: string; terminalId: string; cookie: string };

/** Makes the database and returns the signed-in drivers and one trailer per phone. */
export async function prepare() {
  console.log(`no-loss: preparing ${DB} (migrate, seed; about 40 s)`);
  process.env.HM_DB_NAME = DB;
  execFileSync('bash', ['scripts/db.sh', 'createdb', DB], { stdio: 'ignore' });
  execFileSync('node_modules/.bin/tsx', ['db/migrate.ts'], { stdio: 'ignore' });
  execFileSync('node_modules/.bin/tsx', ['--conditions=react-server', 'db/seed/index.ts'], {
    stdio: 'ignore',
    env: { ...process.env, HM_DB_ROLE: 'owner' },
  });

  const { db } = await import('@/db');
  const { and, eq, sql } = await import('drizzle-orm');
  const { trailers, users, yardRows, yardSpots } = await import('@/db/schema');
  const { sessionCookieFor } = await import('@/tests/support/session-cookie');

  const drivers: Driver[] = await Promise.all(
    DRIVERS.map(async (n) => {
      const [u] = await db.select().from(users).where(eq(users.driverNumber, n));
      return {
        id: u.id,
        carrierId: u.carrierId!,
        terminalId: u.homeTerminalId!,
        cookie: await sessionCookieFor(n),
      };
    }),
  );
  // room for every phone's trailer at the drivers' home terminal
  const [row] = await db
    .insert(yardRows)
    .values({ terminalId: drivers[0].terminalId, name: 'No-loss row', sortOrder: -1 })
    .returning({ id: yardRows.id });
  await db.insert(yardSpots).values(
    Array.from({ length: 40 }, (_, i) => ({
      terminalId: drivers[0].terminalId,
      rowId: row.id,
      kind: 'slot' as const,
      label: `NL-${i + 1}`,
      sortOrder: i,
    })),
  );
  const onRoad = await db
    .select()
    .from(trailers)
    .where(
      and(
        eq(trailers.status, 'on_road'),
        sql`not exists (select 1 from handoffs h where h.trailer_id = ${trailers.id})`,
      ),
    )
    .limit(settings.phones);
  if (onRoad.length < settings.phones)
    throw new Error(`only ${onRoad.length} untouched trailers on the road for ${settings.phones} phones`);
  return { drivers, onRoad };
}

export type Trailer = Awaited<ReturnType<typeof prepare>>['onRoad'][number];
