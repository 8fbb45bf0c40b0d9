// One trailer's history as a single timeline, newest first, a page at a time. Pure: the query
// passes the rows of one page (its handoffs, and the other records it fetched).
import { formatMoney } from '@/lib/format/money';
import { findingTitle } from './finding-title';
import { itemLabel } from './item-labels';

export type FileKind = 'handoff' | 'move' | 'walk' | 'finding' | 'hold' | 'case' | 'photo';
/** A line of the file as a message key and its values, for the screen to say in the reader's language. */
export type FileWords = { key: string; values: Record<string, string> };
/** Stored text (an engine reason, a clerk's note) shown as it is. */
export const STORED = 'stored';

export type FileEntry = {
  id: string;
  kind: FileKind;
  at: Date;
  /** English title and detail (kept for tests and exports); the screen uses `words`. */
  title: string;
  detail: string | null;
  words: { title: FileWords; detail: FileWords[] };
  href?: string;
  tone?: 'danger' | 'ok' | 'hold';
  /** A photo's two times: when the phone says it was taken (EXIF; may be absent) and when it arrived. */
  photoTimes?: { takenAt: Date | null; uploadedAt: Date };
};

export type FileRows = {
  handoffs: {
    id: string;
    kind: 'drop' | 'hook';
    occurredAt: Date;
    driverName: string;
    carrierScac: string;
    level: string;
    verificationCode: string;
    /** Set on a correction: the record it stands in for, and the clerk's reason. */
    correctsHandoffId?: string | null;
    correctionReason?: string | null;
  }[];
  moves: { id: string; movedAt: Date; fromSpot: string | null; toSpot: string; jockeyName: string | null }[];
  walks: { id: string; scannedAt: Date; spot: string | null; jockeyName: string | null }[];
  findings: {
    id: string;
    createdAt: Date;
    itemKey: string;
    kind: string;
    condition: string | null;
    reason: string;
  }[];
  holds: {
    id: string;
    placedAt: Date;
    severity: string;
    reason: string;
    releasedAt: Date | null;
    repairedBy: string | null;
    repairNote: string | null;
    releasedByName: string | null;
  }[];
  cases: { id: string; openedAt: Date; state: string; amountCents: number; carrierScac: string | null }[];
  photos: {
    id: string;
    createdAt: Date;
    itemKey: string | null;
    handoffId: string | null;
    capturedAt?: Date | null;
    uploadedAt?: Date;
  }[];
  /** Handoffs on other pages that correct, or are corrected by, one on this page (only looked up). */
  related?: FileRows['handoffs'];
};

/** Where a page of the file starts: the handoff after which older entries follow. */
export type FileCursor = { at: Date; id: string };
/** The page's time span: entries at or after `from` (null: the first record) and before `before` (null: now). */
export type FileWindow = { from: Date | null; before: Date | null };
export type FilePage = { rows: FileRows; window: FileWindow; next: FileCursor | null };

/** Whether a non-handoff entry falls on this page (its handoffs are the page itself). */
export function inWindow(at: Date, w: FileWindow): boolean {
  return (!w.from || at >= w.from) && (!w.before || at < w.before);
}

const SHOWN_FINDINGS = new Set(['new', 'worse', 'repaired']);

/** A stored handoff's file entry: a corrected one stays, marked with the record that corrects it. */
function handoffEntry(h: FileRows['handoffs'][number], all: FileRows['handoffs']): FileEntry {
  const correctedBy = all.find((o) => o.correctsHandoffId === h.id);
  const corrects = h.correctsHandoffId ? all.find((o) => o.id === h.correctsHandoffId) : undefined;
  const what = `${h.kind === 'drop' ? 'Drop' : 'Hook'} by ${h.driverName} (${h.carrierScac})`;
  const parts = [`${h.level === 'full' ? 'Full inspection' : 'Quick check'} · receipt ${h.verificationCode}`];
  const who = { kind: h.kind, driver: h.driverName, scac: h.carrierScac };
  const detail: FileWords[] = [
    { key: h.level === 'full' ? 'fullInspection' : 'quickCheck', values: { code: h.verificationCode } },
  ];
  if (h.correctsHandoffId) {
    parts.push(`corrects receipt ${corrects?.verificationCode ?? 'of another trailer'}`);
    detail.push(
      corrects
        ? { key: 'corrects', values: { code: corrects.verificationCode } }
        : { key: 'correctsOther', values: {} },
    );
    if (h.correctionReason) {
      parts.push(`reason: ${h.correctionReason}`);
      detail.push({ key: 'reason', values: { reason: h.correctionReason } });
    }
  }
  if (correctedBy) {
    parts.push(`corrected by receipt ${correctedBy.verificationCode}; the correction stands in for it`);
    detail.push({ key: 'correctedBy', values: { code: correctedBy.verificationCode } });
  }
  return {
    id: h.id,
    kind: 'handoff',
    at: h.occurredAt,
    title: h.correctsHandoffId ? `Correction: ${what}` : correctedBy ? `${what} (corrected)` : what,
    detail: parts.join(' · '),
    words: {
      title: { key: h.correctsHandoffId ? 'correction' : correctedBy ? 'corrected' : 'handoff', values: who },
      detail,
    },
    ...(correctedBy ? { tone: 'hold' as const } : {}),
  };
}

export function buildTrailerFile(rows: FileRows, kind?: FileKind, window?: FileWindow): FileEntry[] {
  const known = [...rows.handoffs, ...(rows.related ?? [])];
  const entries: FileEntry[] = [
    ...rows.handoffs.map((h) => handoffEntry(h, known)),
    ...rows.moves.map((m): FileEntry => ({
      id: m.id,
      kind: 'move',
      at: m.movedAt,
      title: `Moved ${m.fromSpot ? `from ${m.fromSpot} ` : ''}to ${m.toSpot}`,
      detail: m.jockeyName ? `by ${m.jockeyName}` : null,
      words: {
        title: m.fromSpot
          ? { key: 'movedFrom', values: { from: m.fromSpot, to: m.toSpot } }
          : { key: 'moved', values: { to: m.toSpot } },
        detail: m.jockeyName ? [{ key: 'by', values: { name: m.jockeyName } }] : [],
      },
    })),
    ...rows.walks.map((w): FileEntry => ({
      id: w.id,
      kind: 'walk',
      at: w.scannedAt,
      title: `Seen on a yard walk${w.spot ? ` in ${w.spot}` : ''}`,
      detail: w.jockeyName ? `by ${w.jockeyName}` : null,
      words: {
        title: w.spot ? { key: 'seenIn', values: { spot: w.spot } } : { key: 'seen', values: {} },
        detail: w.jockeyName ? [{ key: 'by', values: { name: w.jockeyName } }] : [],
      },
    })),
    ...rows.findings
      .filter(
        (f) => SHOWN_FINDINGS.has(f.kind) || !['unchanged', 'first_record', 'not_checked'].includes(f.kind),
      )
      .map((f): FileEntry => ({
        id: f.id,
        kind: 'finding',
        at: f.createdAt,
        title: findingTitle(f),
        detail: f.reason,
        // the title in words in the reader's language (findingTitle); the reason as the engine stored it
        words: {
          title: { key: 'finding', values: { kind: f.kind, item: f.itemKey, condition: f.condition ?? '' } },
          detail: [{ key: STORED, values: { text: f.reason } }],
        },
        tone: f.kind === 'repaired' ? 'ok' : 'danger',
      })),
    ...rows.holds.flatMap((h): FileEntry[] => {
      const placed: FileEntry = {
        id: h.id,
        kind: 'hold',
        at: h.placedAt,
        title: `Hold placed: ${h.severity === 'out_of_service' ? 'out of service' : 'restricted'}`,
        detail: h.reason,
        words: {
          title: { key: h.severity === 'out_of_service' ? 'holdOutOfService' : 'holdRestricted', values: {} },
          detail: [{ key: STORED, values: { text: h.reason } }],
        },
        tone: 'hold',
      };
      if (!h.releasedAt) return [placed];
      const released: FileEntry = {
        id: `${h.id}:released`,
        kind: 'hold',
        at: h.releasedAt,
        title: `Hold released after repair by ${h.repairedBy ?? 'unknown'}`,
        detail: `${h.repairNote ?? ''}${h.releasedByName ? ` · recorded by ${h.releasedByName}` : ''}`,
        words: {
          title: h.repairedBy
            ? { key: 'released', values: { who: h.repairedBy } }
            : { key: 'releasedUnknown', values: {} },
          detail: [
            ...(h.repairNote ? [{ key: STORED, values: { text: h.repairNote } }] : []),
            ...(h.releasedByName ? [{ key: 'recordedBy', values: { name: h.releasedByName } }] : []),
          ],
        },
        tone: 'ok',
      };
      return [placed, released];
    }),
    ...rows.cases.map((c): FileEntry => ({
      id: c.id,
      kind: 'case',
      at: c.openedAt,
      title: `Damage case ${c.state}${c.carrierScac ? ` · ${c.carrierScac}` : ''}`,
      detail: `Estimate ${formatMoney(c.amountCents)}`,
      words: {
        title: { key: 'case', values: { state: c.state, scac: c.carrierScac ?? '' } },
        detail: [{ key: 'estimate', values: { amount: formatMoney(c.amountCents) } }],
      },
      href: `/desk/cases/${c.id}`,
    })),
    ...rows.photos.map((p): FileEntry => ({
      id: p.id,
      kind: 'photo',
      at: p.createdAt,
      title: `Photo${p.itemKey ? ` of ${itemLabel(p.itemKey)}` : ''}`,
      detail: null,
      words: {
        title: p.itemKey
          ? { key: 'photoOf', values: { item: itemLabel(p.itemKey), itemKey: p.itemKey } }
          : { key: 'photo', values: {} },
        detail: [],
      },
      href: `/api/photos/${p.id}`,
      photoTimes: { takenAt: p.capturedAt ?? null, uploadedAt: p.uploadedAt ?? p.createdAt },
    })),
  ];
  return entries
    .filter((e) => !kind || e.kind === kind)
    .filter((e) => e.kind === 'handoff' || !window || inWindow(e.at, window))
    .sort((a, b) => b.at.getTime() - a.at.getTime() || a.id.localeCompare(b.id));
}
