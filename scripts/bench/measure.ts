// One benchmark row with autocannon: requests per second, p50/p95/p99 latency, errors (non-2xx or
// failed) and the mean response size; and the handoff submit's body for the drop/hook rows.
import { randomUUID } from 'node:crypto';
import autocannon from 'autocannon';
import { driver, type onRoad } from './fixtures';
import { unchangedHandoff } from './unchanged-handoff';

export type Row = {
  name: string;
  connections: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  requests: number;
  kb: number;
};

const pct = (xs: number[], p: number) => xs[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))] ?? 0;

export async function measure(
  base: string,
  seconds: number,
  name: string,
  o: {
    path: string;
    cookie?: string;
    connections: number;
    method?: 'GET' | 'POST';
    bodies?: () => string;
    amount?: number;
  },
): Promise<Row> {
  const url = `${base}${o.path}`;
  // one warm-up request (compiles the route's code paths, fills caches)
  // (bounded: an endpoint that does not answer at all is reported as such, not waited for)
  if (!o.bodies)
    await fetch(url, { headers: { cookie: o.cookie ?? '' }, signal: AbortSignal.timeout(seconds * 2000) })
      .then((r) => r.arrayBuffer())
      .catch(() => undefined);
  const times: number[] = [];
  let errors = 0;
  let bytes = 0;
  const instance = autocannon({
    url,
    connections: o.connections,
    ...(o.amount ? { amount: o.amount } : { duration: seconds }),
    headers: {
      cookie: o.cookie ?? '',
      ...(o.method === 'POST' ? { 'content-type': 'application/json', origin: base } : {}),
    },
    method: o.method ?? 'GET',
    requests: o.bodies ? [{ setupRequest: (req) => ({ ...req, body: o.bodies!() }) }] : undefined,
  });
  instance.on('response', (_c, status, resBytes, ms) => {
    times.push(ms);
    bytes += resBytes;
    if (status >= 400) errors++;
  });
  const result = await instance;
  // autocannon counts a timed-out request among its errors too
  errors += result.errors;
  times.sort((a, b) => a - b);
  const elapsed = result.duration || seconds;
  return {
    name,
    connections: o.connections,
    rps: times.length / elapsed,
    p50: Math.round(pct(times, 50)),
    p95: Math.round(pct(times, 95)),
    p99: Math.round(pct(times, 99)),
    errors,
    requests: times.length,
    kb: times.length ? bytes / times.length / 1024 : 0,
  };
}

export const submitBody = (kind: 'drop' | 'hook', t: (typeof onRoad)[number]) =>
  JSON.stringify(
    unchangedHandoff({
      idempotencyKey: `bench-${randomUUID()}`,
      trailerId: t.id,
      trailer: {
        kind: t.kind,
        hingesPerDoor: t.hinges_per_door,
        axleCount: t.axle_count,
        tireLayout: t.tire_layout,
        fuelTankGallons: t.fuel_tank_gallons,
      },
      kind,
      carrierId: driver.carrier_id,
      driverName: driver.name,
    }),
  );
