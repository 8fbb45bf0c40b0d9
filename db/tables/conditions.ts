// What the records found: findings (each inspected item compared with the trailer's history),
// holds (out of service or restricted), and each trailer's condition as last seen per item.
// Split from gate.ts (the records themselves) to keep each table file short.
import { sql } from 'drizzle-orm';
import { index, jsonb, pgTable, primaryKey, text, uuid } from 'drizzle-orm/pg-core';
import { at, conditionEnum, confidenceEnum, createdAt, holdSeverityEnum, id } from './common';
import { carriers, trailers, users } from './core';
import { handoffs } from './gate';

/** The engine's output for one handoff: one row per compared item or rule (fuel, pins, spare). */
export const findings = pgTable(
  'findings',
  {
    id: id(),
    handoffId: uuid('handoff_id').references(() => handoffs.id),
    walkId: uuid('walk_id'),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    itemKey: text('item_key').notNull(),
    kind: text('kind').notNull(),
    condition: conditionEnum('condition'),
    previousCondition: conditionEnum('previous_condition'),
    previousHandoffId: uuid('previous_handoff_id').references(() => handoffs.id),
    responsibleCarrierId: uuid('responsible_carrier_id').references(() => carriers.id),
    responsibleParty: text('responsible_party'),
    confidence: confidenceEnum('confidence'),
    candidates: jsonb('candidates').$type<unknown[]>(),
    /** The English words receipted at the time (evidence: kept as written). */
    reason: text('reason').notNull(),
    /** The reason as a code with parameters (lib/engine/types/codes.ts), rendered in the reader's language. */
    reasonCode: text('reason_code'),
    reasonParams: jsonb('reason_params').$type<Record<string, unknown>>(),
    caseId: uuid('case_id'),
    createdAt: createdAt(),
  },
  (t) => [
    index('findings_handoff').on(t.handoffId),
    index('findings_trailer').on(t.trailerId),
    index('findings_case').on(t.caseId),
  ],
);

/** A hold on a trailer: `out_of_service` blocks a hook; `restricted` names what is not allowed. */
export const holds = pgTable(
  'holds',
  {
    id: id(),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    handoffId: uuid('handoff_id').references(() => handoffs.id),
    walkId: uuid('walk_id'),
    severity: holdSeverityEnum('severity').notNull(),
    restriction: text('restriction'),
    ruleKey: text('rule_key').notNull(),
    itemKey: text('item_key'),
    /** The English words receipted at the time; `reason_code`/`reason_params` render it in any language. */
    reason: text('reason').notNull(),
    reasonCode: text('reason_code'),
    reasonParams: jsonb('reason_params').$type<Record<string, unknown>>(),
    source: text('source').notNull(),
    /** The safety caution shown with the hold (the engine's, at the time it was placed), and its code. */
    caution: text('caution'),
    cautionCode: text('caution_code'),
    cautionParams: jsonb('caution_params').$type<Record<string, unknown>>(),
    placedById: uuid('placed_by_id').references(() => users.id),
    placedAt: at('placed_at').notNull().defaultNow(),
    releasedAt: at('released_at'),
    releasedById: uuid('released_by_id').references(() => users.id),
    repairNote: text('repair_note'),
    repairedBy: text('repaired_by'),
    createdAt: createdAt(),
  },
  (t) => [
    index('holds_trailer_open').on(t.trailerId, t.releasedAt),
    // the board and the gate ask for open holds only: a small partial index however many were ever placed
    index('holds_open')
      .on(t.trailerId)
      .where(sql`${t.releasedAt} is null`),
  ],
);

/**
 * A trailer's current condition: per checklist item, the handoff that last observed it. Kept up
 * to date in the submit's transaction (one row per recorded item), so the gate and the submit
 * know how far back the engine must look (the oldest of these) without reading the whole history.
 */
export const trailerCondition = pgTable(
  'trailer_condition',
  {
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    itemKey: text('item_key').notNull(),
    handoffId: uuid('handoff_id')
      .notNull()
      .references(() => handoffs.id),
    observedAt: at('observed_at').notNull(),
    condition: conditionEnum('condition').notNull(),
  },
  (t) => [primaryKey({ columns: [t.trailerId, t.itemKey] })],
);
