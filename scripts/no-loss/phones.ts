// The simulated phones: each records its trailer's drops and hooks over HTTP, retrying every
// handoff under the same draft key until the server answers it, with double taps (two identical
// requests at once) and impatient clients (a 40 ms timeout) thrown in.
import { randomUUID } from 'node:crypto';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { checklistOf } from '@/lib/trailers/checklist';
import { base } from './server';
import { sleep, type Driver, type Trailer } from './setup';

export type Outcome = {
  key: string;
  trailerId: string;
  handoffId: string | null;
  status: number | null;
  tries: number;
};
export const outcomes: Outcome[] = [];
export const figures = {
  requests: 0,
  fiveHundreds: 0,
  /** 502/503/504 from the balancer: the app server behind it was killed mid-request */
  gatewayErrors: 0,
  networkErrors: 0,
  timeouts: 0,
  duplicateTaps: 0,
  replays: 0,
  conflicts: 0,
  recorded: 0,
};

type Answer = { handoff?: { id: string }; message?: string };

async function send(cookie: string, body: unknown, timeoutMs: number) {
  figures.requests++;
  try {
    const res = await fetch(`${base()}/api/handoffs`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie, origin: base() },
      body: JSON.stringify(body),
      signal: AbortSignal.timeout(timeoutMs),
    });
    // a success whose body never fully arrives (the client's timeout, or the server killed while
    // answering) is no answer: it throws into the catch below and the phone tries again
    const json = (await (res.ok ? res.json() : res.json().catch(() => null))) as Answer | null;
    if (res.status === 502 || res.status === 503 || res.status === 504) figures.gatewayErrors++;
    else if (res.status >= 500) figures.fiveHundreds++;
    if (res.status === 200) figures.replays++;
    if (res.status === 409) figures.conflicts++;
    return { status: res.status, json };
  } catch (e) {
    if ((e as Error).name === 'TimeoutError') figures.timeouts++;
    else figures.networkErrors++;
    return null;
  }
}

function handoffBody(phone: number, d: Driver, kind: 'drop' | 'hook', trailer: Trailer, key: string) {
  return {
    idempotencyKey: key,
    trailerId: trailer.id,
    kind,
    carrierId: d.carrierId,
    driverName: `Phone ${phone + 1}`,
    tractorNumber: `NL-${phone + 1}`,
    isLoaded: false,
    sealNumber: null,
    fuelEighths: 8,
    reefer:
      trailer.kind === 'reefer'
        ? {
            isUnitOn: true,
            setpointF: 34,
            returnAirF: 36,
            engineHours: 1200,
            preTripResult: 'pass',
            preTripAt: new Date(Date.now() - 3_600_000).toISOString(),
          }
        : null,
    items: allOkObservations(checklistOf(trailer)),
    spotId: null,
    note: null,
  };
}

/** One handoff from one phone: retried under the same draft key until the server answers it. */
async function handoff(phone: number, d: Driver, kind: 'drop' | 'hook', trailer: Trailer) {
  const key = `noloss-${randomUUID()}`;
  const body = handoffBody(phone, d, kind, trailer, key);
  const out: Outcome = { key, trailerId: trailer.id, handoffId: null, status: null, tries: 0 };
  outcomes.push(out);
  const started = Date.now();
  while (Date.now() - started < 180_000) {
    out.tries++;
    // one try in ten is a double tap; one in eight gives up after 40 ms
    const tap = Math.random() < 0.1;
    const timeout = Math.random() < 0.125 ? 40 : 20_000;
    if (tap) figures.duplicateTaps++;
    const answers = await Promise.all([
      send(d.cookie, body, timeout),
      tap ? send(d.cookie, body, 20_000) : null,
    ]);
    const ok = answers.find((a) => a && (a.status === 201 || a.status === 200));
    if (ok) {
      out.handoffId = ok.json?.handoff?.id ?? null;
      out.status = ok.status;
      figures.recorded++;
      return;
    }
    const refusal = answers.find((a) => a && a.status >= 400 && a.status < 500 && a.status !== 409);
    if (refusal) {
      out.status = refusal.status;
      console.error(`phone ${phone + 1}: ${kind} refused ${refusal.status}: ${refusal.json?.message}`);
      return;
    }
    await sleep(200 + Math.random() * 300); // server down, timed out, or the double tap's twin holds the trailer
  }
  console.error(`phone ${phone + 1}: gave up on ${key} after 180 s`);
}

/** Every phone's handoffs, the phones side by side: drop, hook, drop… on its own trailer. */
export function runPhones(drivers: Driver[], trailers: Trailer[], total: number) {
  const phones = trailers.length;
  return Promise.all(
    trailers.map(async (trailer, i) => {
      const count = Math.floor(total / phones) + (i < total % phones ? 1 : 0);
      const d = drivers[i % drivers.length];
      for (let n = 0; n < count; n++) await handoff(i, d, n % 2 === 0 ? 'drop' : 'hook', trailer);
    }),
  );
}
