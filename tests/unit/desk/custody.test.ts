import { describe, expect, it } from 'vitest';
import { custodyTimeline } from '@/lib/desk/custody';

const t = (iso: string) => new Date(iso);

describe('custody between two inspections', () => {
  it('orders handoffs, yard moves and walk sightings oldest first and says who held the trailer', () => {
    const events = custodyTimeline({
      handoffs: [
        {
          id: 'd',
          kind: 'drop',
          occurredAt: t('2026-10-23T09:30:00Z'),
          driverName: 'Lev Marchetti',
          carrierScac: 'OSFW',
          carrierName: 'Osterlind Freightways',
        },
        {
          id: 'h',
          kind: 'hook',
          occurredAt: t('2026-10-20T14:00:00Z'),
          driverName: 'Lev Marchetti',
          carrierScac: 'OSFW',
          carrierName: 'Osterlind Freightways',
        },
      ],
      moves: [{ id: 'm', movedAt: t('2026-10-23T10:00:00Z'), toSpot: 'B04' }],
      walks: [{ id: 'w', scannedAt: t('2026-10-23T11:00:00Z') }],
    });
    expect(events.map((e) => e.id)).toEqual(['h', 'd', 'm', 'w']);
    expect(events[0].text).toBe('Hooked by Lev Marchetti (OSFW); custody passes to Osterlind Freightways');
    expect(events[1].text).toBe('Dropped by Lev Marchetti (OSFW); custody passes to the terminal');
    expect(events[2].text).toBe('Yard move to B04; custody stays with the terminal');
  });
});
