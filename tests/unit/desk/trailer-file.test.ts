import { describe, expect, it } from 'vitest';
import { buildTrailerFile, inWindow, type FileRows } from '@/lib/desk/trailer-file';

const t = (iso: string) => new Date(iso);
const rows: FileRows = {
  handoffs: [
    {
      id: 'h1',
      kind: 'drop',
      occurredAt: t('2026-11-01T10:00:00Z'),
      driverName: 'Lev Marchetti',
      carrierScac: 'OSFW',
      level: 'full',
      verificationCode: 'K7M2Q9TX',
    },
  ],
  moves: [
    {
      id: 'm1',
      movedAt: t('2026-11-01T11:00:00Z'),
      fromSpot: null,
      toSpot: 'B04',
      jockeyName: 'Tobias Quenneville',
    },
  ],
  walks: [],
  findings: [
    {
      id: 'f1',
      createdAt: t('2026-11-01T10:00:01Z'),
      itemKey: 'left_side.skin',
      kind: 'new',
      condition: 'damaged',
      reason: 'Inspected ok at the hook…',
    },
    {
      id: 'f2',
      createdAt: t('2026-11-01T10:00:01Z'),
      itemKey: 'rear.header',
      kind: 'unchanged',
      condition: 'ok',
      reason: 'Same as before.',
    },
  ],
  holds: [
    {
      id: 'x1',
      placedAt: t('2026-11-01T10:00:02Z'),
      severity: 'restricted',
      reason: 'Insulation showing',
      releasedAt: t('2026-11-03T09:00:00Z'),
      repairedBy: 'Riverbend body shop',
      repairNote: 'Skin patched',
      releasedByName: 'Priya',
    },
  ],
  cases: [
    {
      id: 'c1',
      openedAt: t('2026-11-01T10:00:03Z'),
      state: 'open',
      amountCents: 85_000,
      carrierScac: 'OSFW',
    },
  ],
  photos: [],
};

describe('trailer file', () => {
  it('merges every kind newest first, shows hold placement and release, and skips unchanged items', () => {
    const file = buildTrailerFile(rows);
    expect(file.map((e) => e.id)).toEqual(['x1:released', 'm1', 'c1', 'x1', 'f1', 'h1']);
    expect(file[0].title).toContain('Riverbend body shop');
    expect(file.find((e) => e.id === 'f1')?.title).toBe(
      'New damage: Left side skin — damaged (needs repair)',
    );
    expect(file.find((e) => e.id === 'c1')?.detail).toBe('Estimate $850.00');
  });

  it('filters by kind', () => {
    expect(buildTrailerFile(rows, 'hold').map((e) => e.id)).toEqual(['x1:released', 'x1']);
    expect(buildTrailerFile(rows, 'walk')).toEqual([]);
  });

  it("gives a photo both its times: taken (the phone's EXIF claim, when present) and uploaded", () => {
    const taken = new Date('2026-03-09T19:02:31Z');
    const uploaded = new Date('2026-03-09T19:09:05Z');
    const file = buildTrailerFile(
      {
        ...rows,
        photos: [
          {
            id: 'p1',
            createdAt: uploaded,
            itemKey: null,
            handoffId: null,
            capturedAt: taken,
            uploadedAt: uploaded,
          },
          {
            id: 'p2',
            createdAt: uploaded,
            itemKey: null,
            handoffId: null,
            capturedAt: null,
            uploadedAt: uploaded,
          },
        ],
      },
      'photo',
    );
    expect(file.map((e) => [e.id, e.photoTimes])).toEqual([
      ['p1', { takenAt: taken, uploadedAt: uploaded }],
      ['p2', { takenAt: null, uploadedAt: uploaded }],
    ]);
  });
});

describe('a page of the trailer file', () => {
  // `common practice` for keyset pages: an entry shows on exactly one page, the page whose span
  // [from, before) holds its time; the page's own handoffs are the page and are never filtered
  it('keeps only the records dated within the page span, and all of the page handoffs', () => {
    const later = { from: t('2026-11-01T10:30:00Z'), before: null };
    expect(
      buildTrailerFile(rows, undefined, later)
        .map((e) => e.id)
        .sort(),
    ).toEqual(['h1', 'm1', 'x1:released']); // the hold placed at 10:00:02 was released on Nov 3
    const earlier = { from: null, before: t('2026-11-01T10:30:00Z') };
    const ids = buildTrailerFile(rows, undefined, earlier).map((e) => e.id);
    expect(ids).toContain('h1');
    expect(ids).toContain('f1');
    expect(ids).toContain('x1');
    expect(ids).not.toContain('m1');
    expect(ids).not.toContain('x1:released');
  });

  it('puts a record at the span start on the page, and one at its end on the next', () => {
    expect(inWindow(t('2026-11-01T11:00:00Z'), { from: t('2026-11-01T11:00:00Z'), before: null })).toBe(true);
    expect(inWindow(t('2026-11-01T11:00:00Z'), { from: null, before: t('2026-11-01T11:00:00Z') })).toBe(
      false,
    );
  });
});
