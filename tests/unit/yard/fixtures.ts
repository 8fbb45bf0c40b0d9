import type { Board, BoardSpot, BoardTrailer } from '@/lib/yard/types';

export function trailer(over: Partial<BoardTrailer> & { id: string }): BoardTrailer {
  return {
    unitNumber: over.id.toUpperCase(),
    kind: 'reefer',
    isLoaded: false,
    isReeferOn: true,
    setpointTenthsF: 340,
    fuelEighths: 6,
    gateInAt: '2026-03-01T12:00:00Z',
    lastSeenAt: '2026-03-01T13:00:00Z',
    holds: [],
    ...over,
  };
}

export function spot(
  label: string,
  order: number,
  t: BoardTrailer | null,
  rowId: string | null = 'row-a',
): BoardSpot {
  return { id: `spot-${label}`, label, kind: rowId ? 'slot' : 'door', rowId, order, trailer: t };
}

export function board(spots: BoardSpot[]): Board {
  return {
    terminal: { name: 'Riverbend terminal', timeZone: 'America/Chicago' },
    policy: { freeTimeHours: 48, lowFuelEighths: 4 },
    rows: [{ id: 'row-a', name: 'Row A' }],
    spots,
    generatedAt: '2026-03-09T18:00:00Z',
  };
}
