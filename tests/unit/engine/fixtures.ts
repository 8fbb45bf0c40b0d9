// Invented people and carriers for engine tests; none is real.
import type { HandoffEvent, ItemObservations, Party, YardMoveEvent, YardWalkEvent } from '@/lib/engine';

export const TZ = 'America/Chicago';

export const northwind: Party = {
  carrierId: 'c-nw',
  carrierName: 'Carrier Northwind',
  driverName: 'D. Example',
};
export const bluefield: Party = {
  carrierId: 'c-bf',
  carrierName: 'Carrier Bluefield',
  driverName: 'E. Sample',
};
export const corvid: Party = { carrierId: 'c-cv', carrierName: 'Carrier Corvid', driverName: 'F. Person' };

let seq = 0;
const nextId = (p: string) => `${p}-${++seq}`;

export function drop(
  at: string,
  party: Party,
  items: ItemObservations = {},
  extra: Partial<HandoffEvent> = {},
): HandoffEvent {
  return { type: 'drop', id: nextId('drop'), at: new Date(at), party, items, ...extra };
}

export function hook(
  at: string,
  party: Party,
  items: ItemObservations = {},
  extra: Partial<HandoffEvent> = {},
): HandoffEvent {
  return { type: 'hook', id: nextId('hook'), at: new Date(at), party, items, ...extra };
}

export function walk(
  at: string,
  items: ItemObservations = {},
  extra: Partial<YardWalkEvent> = {},
): YardWalkEvent {
  return { type: 'walk', id: nextId('walk'), at: new Date(at), jockeyName: 'G. Jockey', items, ...extra };
}

export function move(at: string): YardMoveEvent {
  return { type: 'move', id: nextId('move'), at: new Date(at), jockeyName: 'G. Jockey' };
}
