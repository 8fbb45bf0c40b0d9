import { sql } from 'drizzle-orm';
import { boolean, index, integer, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import {
  at,
  createdAt,
  id,
  roleEnum,
  spotKindEnum,
  tireLayoutEnum,
  trailerKindEnum,
  trailerStatusEnum,
} from './common';

export const terminals = pgTable('terminals', {
  id: id(),
  code: text('code').notNull().unique(),
  name: text('name').notNull(),
  timeZone: text('time_zone').notNull(),
  createdAt: createdAt(),
});

export const yardRows = pgTable(
  'yard_rows',
  {
    id: id(),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    name: text('name').notNull(),
    sortOrder: integer('sort_order').notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('yard_rows_terminal_name').on(t.terminalId, t.name)],
);

/** Slots (parking places in a row) and dock doors share one table: a trailer sits in exactly one. */
export const yardSpots = pgTable(
  'yard_spots',
  {
    id: id(),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    rowId: uuid('row_id').references(() => yardRows.id),
    kind: spotKindEnum('kind').notNull(),
    label: text('label').notNull(),
    sortOrder: integer('sort_order').notNull().default(0),
    retiredAt: at('retired_at'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('yard_spots_terminal_label').on(t.terminalId, t.label),
    index('yard_spots_row').on(t.rowId),
  ],
);

export const carriers = pgTable('carriers', {
  id: id(),
  scac: text('scac').notNull().unique(),
  name: text('name').notNull(),
  contactEmail: text('contact_email').notNull(),
  isHomeCarrier: boolean('is_home_carrier').notNull().default(false),
  /** The language of the carrier contact's e-mail (en | es). */
  locale: text('locale').notNull().default('en'),
  createdAt: createdAt(),
});

export const users = pgTable(
  'users',
  {
    id: id(),
    name: text('name').notNull(),
    role: roleEnum('role').notNull(),
    email: text('email').unique(),
    driverNumber: text('driver_number').unique(),
    secretHash: text('secret_hash').notNull(),
    homeTerminalId: uuid('home_terminal_id').references(() => terminals.id),
    carrierId: uuid('carrier_id').references(() => carriers.id),
    isActive: boolean('is_active').notNull().default(true),
    /** Carried in the session cookie; a cookie with an older number is signed out (trigger bumps it on secret, role or active changes). */
    sessionVersion: integer('session_version').notNull().default(1),
    /** The language chosen at sign-in or in the header (en | es): screens and e-mail follow it. */
    locale: text('locale').notNull().default('en'),
    createdAt: createdAt(),
  },
  (t) => [index('users_carrier').on(t.carrierId), index('users_terminal').on(t.homeTerminalId)],
);

/**
 * Sign-in attempts per key (an account, an address, or an account from one address): counted
 * atomically in one INSERT … ON CONFLICT, so parallel tries cannot slip past the count.
 */
export const signInThrottle = pgTable('sign_in_throttle', {
  key: text('key').primaryKey(),
  tries: integer('tries').notNull(),
  blockedUntil: at('blocked_until'),
  updatedAt: at('updated_at').notNull(),
});

export const trailers = pgTable(
  'trailers',
  {
    id: id(),
    unitNumber: text('unit_number').notNull().unique(),
    vin: text('vin').notNull().unique(),
    plate: text('plate').notNull(),
    plateState: text('plate_state').notNull(),
    kind: trailerKindEnum('kind').notNull(),
    ownerCarrierId: uuid('owner_carrier_id')
      .notNull()
      .references(() => carriers.id),
    fuelTankGallons: integer('fuel_tank_gallons').notNull().default(50),
    hingesPerDoor: integer('hinges_per_door').notNull().default(4),
    axleCount: integer('axle_count').notNull().default(2),
    tireLayout: tireLayoutEnum('tire_layout').notNull().default('dual'),
    status: trailerStatusEnum('status').notNull().default('on_road'),
    currentTerminalId: uuid('current_terminal_id').references(() => terminals.id),
    currentSpotId: uuid('current_spot_id').references(() => yardSpots.id),
    isLoaded: boolean('is_loaded').notNull().default(false),
    fuelEighths: integer('fuel_eighths'),
    isReeferOn: boolean('is_reefer_on'),
    setpointTenthsF: integer('setpoint_tenths_f'),
    gateInAt: at('gate_in_at'),
    lastSeenAt: at('last_seen_at'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('trailers_current_spot').on(t.currentSpotId),
    index('trailers_terminal_status').on(t.currentTerminalId, t.status),
    index('trailers_owner').on(t.ownerCarrierId),
    // typed lookups match unit numbers without regard to case (db/queries/trailer-lookup.ts)
    index('trailers_unit_upper').on(sql`upper(${t.unitNumber})`),
  ],
);
