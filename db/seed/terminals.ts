// The two demo terminals (invented), their policies, yard rows, slots and dock doors.
import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { policies, terminals, yardRows, yardSpots } from '@/db/schema';
import { defaultPolicy } from '@/lib/engine/policy';
import { upsertBy } from './upsert';

const TERMINALS = [
  {
    code: 'RVB',
    name: 'Riverbend terminal',
    timeZone: 'America/Chicago',
    rows: ['A', 'B', 'C', 'D', 'E', 'F'],
    slotsPerRow: 24,
    doors: 12,
  },
  {
    code: 'HMS',
    name: 'High Mesa terminal',
    timeZone: 'America/Denver',
    rows: ['A', 'B', 'C', 'D'],
    slotsPerRow: 16,
    doors: 8,
  },
];

/** Terminal ids by code. */
export async function seedTerminals(): Promise<Record<string, string>> {
  const terminalIds: Record<string, string> = {};
  for (const t of TERMINALS) {
    const row = await upsertBy(
      () =>
        db
          .insert(terminals)
          .values({ code: t.code, name: t.name, timeZone: t.timeZone })
          .onConflictDoNothing()
          .returning({ id: terminals.id }),
      () => db.select({ id: terminals.id }).from(terminals).where(eq(terminals.code, t.code)),
    );
    terminalIds[t.code] = row.id;
    await db
      .insert(policies)
      .values({
        terminalId: row.id,
        data: { ...defaultPolicy, freeTimeHours: 48, disputeWindowDays: 14, lowFuelEighths: 4 },
      })
      .onConflictDoNothing();
    for (const [i, name] of t.rows.entries()) {
      const r = await upsertBy(
        () =>
          db
            .insert(yardRows)
            .values({ terminalId: row.id, name: `Row ${name}`, sortOrder: i })
            .onConflictDoNothing()
            .returning({ id: yardRows.id }),
        () =>
          db
            .select({ id: yardRows.id })
            .from(yardRows)
            .where(and(eq(yardRows.terminalId, row.id), eq(yardRows.name, `Row ${name}`))),
      );
      const slots = Array.from({ length: t.slotsPerRow }, (_, s) => ({
        terminalId: row.id,
        rowId: r.id,
        kind: 'slot' as const,
        label: `${name}${String(s + 1).padStart(2, '0')}`,
        sortOrder: s,
      }));
      await db.insert(yardSpots).values(slots).onConflictDoNothing();
    }
    const doors = Array.from({ length: t.doors }, (_, d) => ({
      terminalId: row.id,
      kind: 'door' as const,
      label: `Door ${d + 1}`,
      sortOrder: d,
    }));
    await db.insert(yardSpots).values(doors).onConflictDoNothing();
  }
  return terminalIds;
}
