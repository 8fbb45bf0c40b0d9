import {
  bigserial,
  date,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { at, caseStateEnum, conditionEnum, createdAt, decisionEnum, id, outboxStatusEnum } from './common';
import { carriers, terminals, trailers, users } from './core';
import { handoffs } from './gate';

/** A damage case: one per handoff that found new or worse damage. */
export const cases = pgTable(
  'cases',
  {
    id: id(),
    handoffId: uuid('handoff_id')
      .notNull()
      .unique()
      .references(() => handoffs.id),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    proposedCarrierId: uuid('proposed_carrier_id').references(() => carriers.id),
    /** Set when the case holds damage with no earlier inspection: "no earlier inspection: not attributed". */
    attributionNote: text('attribution_note'),
    /** The attribution note as a code with parameters (`case.not_attributed`), rendered in the reader's language. */
    attributionNoteCode: text('attribution_note_code'),
    attributionNoteParams: jsonb('attribution_note_params').$type<Record<string, unknown>>(),
    state: caseStateEnum('state').notNull().default('open'),
    estimateCents: integer('estimate_cents').notNull().default(0),
    overrideCents: integer('override_cents'),
    overrideReason: text('override_reason'),
    decision: decisionEnum('decision'),
    chargedCents: integer('charged_cents'),
    decisionReason: text('decision_reason'),
    disputeDeadline: at('dispute_deadline'),
    openedAt: at('opened_at').notNull().defaultNow(),
    updatedAt: at('updated_at').notNull().defaultNow(),
    createdAt: createdAt(),
  },
  (t) => [
    index('cases_state').on(t.terminalId, t.state),
    index('cases_carrier').on(t.proposedCarrierId),
    // the desk queue pages through cases by opening time (keyset: opened_at, id)
    index('cases_opened').on(t.openedAt, t.id),
    index('cases_trailer').on(t.trailerId),
  ],
);

export const caseEvents = pgTable(
  'case_events',
  {
    id: id(),
    caseId: uuid('case_id')
      .notNull()
      .references(() => cases.id),
    kind: text('kind').notNull(),
    fromState: caseStateEnum('from_state'),
    toState: caseStateEnum('to_state'),
    actorId: uuid('actor_id').references(() => users.id),
    note: text('note'),
    createdAt: createdAt(),
  },
  (t) => [index('case_events_case').on(t.caseId, t.createdAt)],
);

/** Repair prices per checklist item (or item-key prefix) and condition, in integer cents. */
export const rateCard = pgTable(
  'rate_card',
  {
    id: id(),
    itemPattern: text('item_pattern').notNull(),
    condition: conditionEnum('condition').notNull(),
    amountCents: integer('amount_cents').notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('rate_card_item_condition').on(t.itemPattern, t.condition)],
);

/** Terminal policy (fuel rules, pre-trip age, free time, dispute window) as the engine's policy data. */
export const policies = pgTable('policies', {
  terminalId: uuid('terminal_id')
    .primaryKey()
    .references(() => terminals.id),
  data: jsonb('data').$type<Record<string, unknown>>().notNull(),
  updatedAt: at('updated_at').notNull().defaultNow(),
  createdAt: createdAt(),
});

/** Every e-mail is written here first and sent by the outbox worker, retried until it goes. */
export const emailOutbox = pgTable(
  'email_outbox',
  {
    id: id(),
    toAddress: text('to_address').notNull(),
    /** One address in copy (a handoff receipt: the carrier's contact when it goes to the driver). */
    ccAddress: text('cc_address'),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body'),
    status: outboxStatusEnum('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: at('next_attempt_at').notNull().defaultNow(),
    sentAt: at('sent_at'),
    relatedType: text('related_type'),
    relatedId: uuid('related_id'),
    createdAt: createdAt(),
  },
  (t) => [index('email_outbox_due').on(t.status, t.nextAttemptAt)],
);

/** Append-only: a trigger in the migrations refuses UPDATE and DELETE. */
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    actorId: uuid('actor_id').references(() => users.id),
    action: text('action').notNull(),
    entityType: text('entity_type').notNull(),
    entityId: text('entity_id'),
    detail: jsonb('detail').$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index('audit_log_entity').on(t.entityType, t.entityId)],
);

/** One head of a trailer's handoff chain as anchored: its last record, that record's stored hash, how many records led to it. */
export type AnchoredHead = { trailerId: string; handoffId: string; hash: string; count: number };

/**
 * A terminal's chain heads, fixed once a day and e-mailed to its managers (lib/server/jobs/anchor.ts).
 * The e-mailed digest is the copy outside the database: a rewritten history no longer leads to it.
 */
export const chainAnchors = pgTable(
  'chain_anchors',
  {
    id: id(),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    /** The terminal's local day the anchor closes (anchored shortly after that day's midnight). */
    day: date('day', { mode: 'string' }).notNull(),
    digest: text('digest').notNull(),
    heads: jsonb('heads').$type<AnchoredHead[]>().notNull(),
    recordCount: integer('record_count').notNull(),
    emailedTo: jsonb('emailed_to').$type<string[]>().notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('chain_anchors_terminal_day').on(t.terminalId, t.day)],
);
