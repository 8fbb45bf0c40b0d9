// The rare handoffs that find something: new damage at a drop (a photo's metadata, a finding and
// a case in a state fitting its age, with its events) or a tandem pin not engaged (a finding and
// an out-of-service hold, released an hour later unless it was the trailer's last handoff).
import { randomUUID } from 'node:crypto';
import type { ItemRowInput } from '@/lib/handoffs/items';
import type { Buffers } from './buffers';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;

export const DAMAGE_KEYS = [
  ['left_side.skin', 'Skin dented behind the landing gear; no insulation showing.'],
  ['rear.door_right.hinge_2', 'Hinge bent; door closes but not flush.'],
  ['interior.floor', 'Floor board cracked near the nose.'],
  ['right_side.side_skirt', 'Side skirt torn loose at one bracket.'],
] as const;
export const PIN_KEY = 'undercarriage.tandem_pin.right_rear';

export type EventContext = {
  b: Buffers;
  rand: () => number;
  now: number;
  seq: number;
  handoffId: string;
  prevId: string | null;
  trailer: { id: string; unitNumber: string };
  terminalId: string;
  driver: { id: string; carrierId: string; name: string };
  clerkId: string;
  jockeyId: string;
  at: Date;
  isLast: boolean;
};

/** New damage on `key`: the changed item rows and the photo's SHA-256 (the chain covers both). */
export function damage(c: EventContext, key: string, note: string, okRows: ItemRowInput[]) {
  const { b, at, driver, trailer, handoffId: id } = c;
  const items = okRows.map((i) => (i.itemKey === key ? { ...i, condition: 'damaged' as const, note } : i));
  b.overrides.push([id, key, 'damaged', okRows.find((i) => i.itemKey === key)?.details ?? null, note]);
  const sha = randomUUID().replace(/-/g, '') + randomUUID().replace(/-/g, '');
  const photoId = randomUUID();
  b.photos.push([
    photoId,
    `handoffs/${trailer.id}/${photoId}.jpg`,
    driver.id,
    trailer.id,
    id,
    key,
    'stored',
    'image/jpeg',
    180_000 + (c.seq % 90_000),
    sha,
    at,
  ]);
  const caseId = randomUUID();
  const age = c.now - at.getTime();
  const state =
    age > 60 * DAY
      ? c.rand() < 0.7
        ? 'closed'
        : 'decided'
      : (['open', 'notified', 'disputed', 'decided'] as const)[c.seq % 4];
  const decided = state === 'closed' || state === 'decided';
  b.cases.push([
    caseId,
    id,
    trailer.id,
    c.terminalId,
    driver.carrierId,
    state,
    85_000,
    decided ? 'charge' : null,
    decided ? 85_000 : null,
    decided ? 'Damage found at the drop; the carrier held the trailer.' : null,
    state === 'open' ? null : new Date(at.getTime() + 14 * DAY),
    at,
    new Date(at.getTime() + (decided ? 10 : 1) * DAY),
    at,
  ]);
  b.caseEvents.push([
    caseId,
    'opened',
    null,
    'open',
    driver.id,
    `Opened by the drop of ${trailer.unitNumber}.`,
    at,
  ]);
  if (state !== 'open')
    b.caseEvents.push([
      caseId,
      'notified',
      'open',
      'notified',
      c.clerkId,
      null,
      new Date(at.getTime() + HOUR),
    ]);
  b.findings.push([
    id,
    trailer.id,
    key,
    'new',
    'damaged',
    'ok',
    c.prevId,
    driver.carrierId,
    driver.name,
    'high',
    [],
    `${key}: ok at the previous handoff, damaged at this drop.`,
    caseId,
    at,
  ]);
  return { items, shas: [sha] };
}

/** The right-rear tandem pin found not engaged (49 CFR 393.207(b)): finding and hold. */
export function pinNotEngaged(c: EventContext, okRows: ItemRowInput[]) {
  const { b, at, isLast } = c;
  const details = { ...(okRows.find((i) => i.itemKey === PIN_KEY)?.details ?? {}), isEngaged: false };
  const items = okRows.map((i) => (i.itemKey === PIN_KEY ? { ...i, details } : i));
  b.overrides.push([c.handoffId, PIN_KEY, 'ok', details, null]);
  const reason = 'Tandem locking pin, right rear is not engaged.';
  b.findings.push([
    c.handoffId,
    c.trailer.id,
    PIN_KEY,
    'pin_not_engaged',
    'ok',
    null,
    null,
    null,
    null,
    null,
    null,
    reason,
    null,
    at,
  ]);
  b.holds.push([
    c.trailer.id,
    c.handoffId,
    'out_of_service',
    'pin_not_engaged',
    PIN_KEY,
    reason,
    '49 CFR 393.207(b)',
    c.driver.id,
    at,
    isLast ? null : new Date(at.getTime() + HOUR),
    isLast ? null : c.jockeyId,
    isLast ? null : 'Pin engaged and checked.',
    isLast ? null : 'Yard mechanic',
    at,
  ]);
  return { items, shas: [] as string[] };
}
