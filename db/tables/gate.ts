import { boolean, index, integer, jsonb, pgTable, text, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import {
  at,
  conditionEnum,
  createdAt,
  handoffKindEnum,
  id,
  inspectionLevelEnum,
  photoStatusEnum,
  pretripEnum,
} from './common';
import { carriers, terminals, trailers, users } from './core';

/** A printed QR label. The token is an HMAC over the label id; re-issuing revokes the old label. */
export const labels = pgTable(
  'labels',
  {
    id: id(),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    issuedById: uuid('issued_by_id').references(() => users.id),
    issuedAt: at('issued_at').notNull().defaultNow(),
    revokedAt: at('revoked_at'),
    createdAt: createdAt(),
  },
  (t) => [index('labels_trailer').on(t.trailerId)],
);

/** A condition record at a change of custody. Immutable once stored; a correction is a new row. */
export const handoffs = pgTable(
  'handoffs',
  {
    id: id(),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    terminalId: uuid('terminal_id')
      .notNull()
      .references(() => terminals.id),
    kind: handoffKindEnum('kind').notNull(),
    level: inspectionLevelEnum('level').notNull().default('full'),
    carrierId: uuid('carrier_id')
      .notNull()
      .references(() => carriers.id),
    driverId: uuid('driver_id').references(() => users.id),
    driverName: text('driver_name').notNull(),
    tractorNumber: text('tractor_number').notNull(),
    recordedById: uuid('recorded_by_id')
      .notNull()
      .references(() => users.id),
    isLoaded: boolean('is_loaded').notNull(),
    sealNumber: text('seal_number'),
    fuelEighths: integer('fuel_eighths'),
    isReeferOn: boolean('is_reefer_on'),
    setpointTenthsF: integer('setpoint_tenths_f'),
    returnAirTenthsF: integer('return_air_tenths_f'),
    engineHoursTenths: integer('engine_hours_tenths'),
    pretripResult: pretripEnum('pretrip_result'),
    pretripAt: at('pretrip_at'),
    note: text('note'),
    /** A hook of a "no perishable loads" trailer: the driver's answer to "is the load perishable?" */
    isLoadPerishable: boolean('is_load_perishable'),
    occurredAt: at('occurred_at').notNull(),
    idempotencyKey: text('idempotency_key').notNull().unique(),
    correctsHandoffId: uuid('corrects_handoff_id'),
    /** Why a clerk corrected the record named by correctsHandoffId (the recorder may leave it empty). */
    correctionReason: text('correction_reason'),
    verificationCode: text('verification_code').notNull().unique(),
    prevHash: text('prev_hash'),
    contentHash: text('content_hash').notNull(),
    /**
     * How content_hash was made: 1 = plain SHA-256 (rows from before the chain was keyed; they
     * cannot be vouched for), 2 = HMAC-SHA-256 with CHAIN_KEY, 3 = the same, with is_load_perishable
     * in the hashed content. The submit writes 3; older rows keep verifying with their own version.
     */
    hashVersion: integer('hash_version').notNull().default(1),
    /** SHA-256 of the submitted body: a retry with the same draft key must send the same body. */
    requestHash: text('request_hash'),
    createdAt: createdAt(),
  },
  (t) => [
    index('handoffs_trailer_time').on(t.trailerId, t.occurredAt),
    index('handoffs_carrier').on(t.carrierId),
    index('handoffs_driver').on(t.driverId),
  ],
);

export const handoffItems = pgTable(
  'handoff_items',
  {
    id: id(),
    handoffId: uuid('handoff_id')
      .notNull()
      .references(() => handoffs.id),
    itemKey: text('item_key').notNull(),
    condition: conditionEnum('condition').notNull(),
    treadThirtySeconds: integer('tread_thirty_seconds'),
    isHoldingAir: boolean('is_holding_air'),
    /** The other observation fields of the item's kind (isEngaged, isMounted, isLocking, isInsulationShowing, isLeaking, cleanliness). */
    details: jsonb('details').$type<Record<string, boolean | string>>(),
    note: text('note'),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('handoff_items_handoff_item').on(t.handoffId, t.itemKey),
    index('handoff_items_item').on(t.itemKey),
  ],
);

export const photos = pgTable(
  'photos',
  {
    id: id(),
    /** Where the checked photo lives; written only by the server at completion, never presigned. */
    objectKey: text('object_key').notNull().unique(),
    /** Where the browser uploads it (a presigned PUT); read and deleted at completion. */
    pendingKey: text('pending_key'),
    uploadedById: uuid('uploaded_by_id')
      .notNull()
      .references(() => users.id),
    trailerId: uuid('trailer_id')
      .notNull()
      .references(() => trailers.id),
    handoffId: uuid('handoff_id').references(() => handoffs.id),
    caseEventId: uuid('case_event_id'),
    itemKey: text('item_key'),
    status: photoStatusEnum('status').notNull().default('pending'),
    contentType: text('content_type').notNull(),
    byteSize: integer('byte_size').notNull(),
    sha256: text('sha256').notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    index('photos_handoff').on(t.handoffId),
    index('photos_trailer').on(t.trailerId),
    // a case's history lists the photos attached to each of its events
    index('photos_case_event').on(t.caseEventId),
  ],
);
