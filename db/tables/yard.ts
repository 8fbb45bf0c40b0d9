import { boolean, index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import {
  at,
  createdAt,
  id,
  taskKindEnum,
  walkOutcomeEnum,
  walkResolutionEnum,
  walkStatusEnum,
} from './common';
import { terminals, trailers, users, yardSpots } from './core';

/** A jockey's move of a trailer inside the yard; custody stays with the terminal. */
export const yardMoves = pgTable(
  'yard_moves',
  {
    id: id(),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    fromSpotId: uuid('from_spot_id').references(() => yardSpots.id),
    toSpotId: uuid('to_spot_id')
      .notNull()
      .references(() => yardSpots.id),
    movedById: uuid('moved_by_id')
      .notNull()
      .references(() => users.id),
    /** When the move was made: the phone's time for a move queued without signal. */
    movedAt: at('moved_at').notNull().defaultNow(),
    /** The phone's key for the move: a move queued without signal and sent twice is one move. */
    clientKey: text('client_key'),
    /** When the move reached the server (later than moved_at for a queued move). */
    createdAt: createdAt(),
  },
  (t) => [
    index('yard_moves_trailer_time').on(t.trailerId, t.movedAt),
    uniqueIndex('yard_moves_mover_client_key').on(t.movedById, t.clientKey),
  ],
);

export const yardWalks = pgTable(
  'yard_walks',
  {
    id: id(),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    startedById: uuid('started_by_id')
      .notNull()
      .references(() => users.id),
    rowIds: jsonb('row_ids').$type<string[]>().notNull(),
    status: walkStatusEnum('status').notNull().default('in_progress'),
    startedAt: at('started_at').notNull().defaultNow(),
    finishedAt: at('finished_at'),
    summary: jsonb('summary').$type<Record<string, number>>(),
    createdAt: createdAt(),
  },
  (t) => [index('yard_walks_terminal').on(t.terminalId, t.startedAt)],
);

/** One scan in a walk, with the jockey's quick checks. `clientKey` makes offline re-sends idempotent. */
export const walkScans = pgTable(
  'walk_scans',
  {
    id: id(),
    walkId: uuid('walk_id')
      .notNull()
      .references(() => yardWalks.id),
    seq: integer('seq').notNull(),
    clientKey: text('client_key').notNull().unique(),
    scannedText: text('scanned_text').notNull(),
    trailerId: uuid('trailer_id').references(() => trailers.id),
    spotId: uuid('spot_id').references(() => yardSpots.id),
    isUnitRunning: boolean('is_unit_running'),
    setpointTenthsF: integer('setpoint_tenths_f'),
    fuelEighths: integer('fuel_eighths'),
    areDoorsClosed: boolean('are_doors_closed'),
    isSealPresent: boolean('is_seal_present'),
    scannedAt: at('scanned_at').notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('walk_scans_walk_seq').on(t.walkId, t.seq),
    index('walk_scans_trailer').on(t.trailerId),
  ],
);

/** The reconciliation of a finished walk, one row per slot or trailer, and what the clerk did about it. */
export const walkOutcomes = pgTable(
  'walk_outcomes',
  {
    id: id(),
    walkId: uuid('walk_id')
      .notNull()
      .references(() => yardWalks.id),
    outcome: walkOutcomeEnum('outcome').notNull(),
    spotId: uuid('spot_id').references(() => yardSpots.id),
    expectedSpotId: uuid('expected_spot_id').references(() => yardSpots.id),
    trailerId: uuid('trailer_id').references(() => trailers.id),
    scannedText: text('scanned_text'),
    resolution: walkResolutionEnum('resolution'),
    resolvedById: uuid('resolved_by_id').references(() => users.id),
    resolvedAt: at('resolved_at'),
    createdAt: createdAt(),
  },
  (t) => [index('walk_outcomes_walk').on(t.walkId)],
);

export const yardTasks = pgTable(
  'yard_tasks',
  {
    id: id(),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    walkId: uuid('walk_id').references(() => yardWalks.id),
    kind: taskKindEnum('kind').notNull(),
    note: text('note'),
    clearedAt: at('cleared_at'),
    clearedById: uuid('cleared_by_id').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [index('yard_tasks_open').on(t.terminalId, t.clearedAt)],
);
