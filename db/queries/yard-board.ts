import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { holds, policies, terminals, trailers, yardRows, yardSpots } from '@/db/schema';
import { listRows } from './yard-layout';
import { DEFAULT_LOCALE } from '@/lib/i18n/locales';
import { storedText } from '@/lib/i18n/reasons';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import type { Board, BoardHold, BoardSpot } from '@/lib/yard/types';

/**
 * The yard board of one terminal: live slots and doors in map order, who sits where, open holds
 * (their reasons in `locale`, the reader's language).
 */
export async function getBoard(
  terminalId: string,
  now = new Date(),
  locale: string = DEFAULT_LOCALE,
): Promise<Board | null> {
  const [terminal] = await db
    .select({ name: terminals.name, timeZone: terminals.timeZone, policy: policies.data })
    .from(terminals)
    .leftJoin(policies, eq(policies.terminalId, terminals.id))
    .where(eq(terminals.id, terminalId))
    .limit(1);
  if (!terminal) return null;
  const [rows, spots, openHolds] = await Promise.all([
    listRows(terminalId),
    db
      .select({
        id: yardSpots.id,
        label: yardSpots.label,
        kind: yardSpots.kind,
        rowId: yardSpots.rowId,
        trailerId: trailers.id,
        unitNumber: trailers.unitNumber,
        trailerKind: trailers.kind,
        isLoaded: trailers.isLoaded,
        isReeferOn: trailers.isReeferOn,
        setpointTenthsF: trailers.setpointTenthsF,
        fuelEighths: trailers.fuelEighths,
        gateInAt: trailers.gateInAt,
        lastSeenAt: trailers.lastSeenAt,
        rowOrder: yardRows.sortOrder,
      })
      .from(yardSpots)
      .leftJoin(yardRows, eq(yardRows.id, yardSpots.rowId))
      .leftJoin(trailers, and(eq(trailers.currentSpotId, yardSpots.id), eq(trailers.status, 'in_yard')))
      .where(and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)))
      .orderBy(asc(yardSpots.kind), asc(yardRows.sortOrder), asc(yardSpots.sortOrder), asc(yardSpots.label)),
    db
      .select({
        trailerId: holds.trailerId,
        severity: holds.severity,
        reason: holds.reason,
        reasonCode: holds.reasonCode,
        reasonParams: holds.reasonParams,
      })
      .from(holds)
      .innerJoin(trailers, eq(trailers.id, holds.trailerId))
      .where(
        and(
          eq(trailers.currentTerminalId, terminalId),
          eq(trailers.status, 'in_yard'),
          isNull(holds.releasedAt),
        ),
      ),
  ]);
  const holdsOf = new Map<string, BoardHold[]>();
  for (const h of openHolds) {
    const list = holdsOf.get(h.trailerId) ?? [];
    const reason = storedText(h.reason, h.reasonCode, h.reasonParams, locale, terminal.timeZone);
    list.push({ severity: h.severity, reason });
    holdsOf.set(h.trailerId, list);
  }
  const boardSpots: BoardSpot[] = spots.map((s, order) => ({
    id: s.id,
    label: s.label,
    kind: s.kind,
    rowId: s.rowId,
    order,
    trailer: s.trailerId
      ? {
          id: s.trailerId,
          unitNumber: s.unitNumber!,
          kind: s.trailerKind!,
          isLoaded: s.isLoaded!,
          isReeferOn: s.isReeferOn,
          setpointTenthsF: s.setpointTenthsF,
          fuelEighths: s.fuelEighths,
          gateInAt: s.gateInAt?.toISOString() ?? null,
          lastSeenAt: s.lastSeenAt?.toISOString() ?? null,
          holds: holdsOf.get(s.trailerId) ?? [],
        }
      : null,
  }));
  return {
    terminal: { name: terminal.name, timeZone: terminal.timeZone },
    policy: terminalPolicyOf(terminal.policy).yard,
    rows,
    spots: boardSpots,
    generatedAt: now.toISOString(),
  };
}
