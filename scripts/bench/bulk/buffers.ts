// The COPY buffers of the handoff pass: the tables it writes and, for the items, the few rows
// that differ from a trailer's all-ok template (the items themselves are made in SQL, items.ts).
import { CopyBuffer } from './copy';

const cols = (s: string) => s.split(/\s+/).filter(Boolean);

export function makeBuffers() {
  return {
    handoffs: new CopyBuffer(
      'handoffs',
      cols(`id trailer_id terminal_id kind level carrier_id driver_id driver_name tractor_number
        recorded_by_id is_loaded seal_number fuel_eighths is_reefer_on setpoint_tenths_f
        return_air_tenths_f engine_hours_tenths pretrip_result pretrip_at note occurred_at
        idempotency_key corrects_handoff_id verification_code prev_hash content_hash hash_version created_at`),
    ),
    overrides: new CopyBuffer('bulk_item_override', cols('handoff_id item_key condition details note')),
    photos: new CopyBuffer(
      'photos',
      cols(`id object_key uploaded_by_id trailer_id handoff_id item_key status content_type byte_size
        sha256 created_at`),
    ),
    cases: new CopyBuffer(
      'cases',
      cols(`id handoff_id trailer_id terminal_id proposed_carrier_id state estimate_cents decision
        charged_cents decision_reason dispute_deadline opened_at updated_at created_at`),
    ),
    caseEvents: new CopyBuffer(
      'case_events',
      cols('case_id kind from_state to_state actor_id note created_at'),
    ),
    findings: new CopyBuffer(
      'findings',
      cols(`handoff_id trailer_id item_key kind condition previous_condition previous_handoff_id
        responsible_carrier_id responsible_party confidence candidates reason case_id created_at`),
    ),
    holds: new CopyBuffer(
      'holds',
      cols(`trailer_id handoff_id severity rule_key item_key reason source placed_by_id placed_at
        released_at released_by_id repair_note repaired_by created_at`),
    ),
    finals: new CopyBuffer(
      'bulk_trailer_final',
      cols(`trailer_id status terminal_id spot_id is_loaded fuel_eighths is_reefer_on setpoint_tenths_f
        gate_in_at last_seen_at last_handoff_id`),
    ),
    shapes: new CopyBuffer('bulk_trailer_shape', cols('trailer_id shape')),
    templates: new CopyBuffer(
      'bulk_item_template',
      cols('shape item_key condition tread_thirty_seconds is_holding_air details note'),
    ),
  };
}
export type Buffers = ReturnType<typeof makeBuffers>;

/** The work tables the pass fills (dropped with the session). */
export const WORK_TABLES_SQL = `
  CREATE TEMP TABLE bulk_trailer_final (trailer_id uuid, status trailer_status, terminal_id uuid,
    spot_id uuid, is_loaded boolean, fuel_eighths int, is_reefer_on boolean, setpoint_tenths_f int,
    gate_in_at timestamptz, last_seen_at timestamptz, last_handoff_id uuid);
  CREATE TEMP TABLE bulk_trailer_shape (trailer_id uuid PRIMARY KEY, shape text NOT NULL);
  CREATE TEMP TABLE bulk_item_template (shape text, item_key text, condition text,
    tread_thirty_seconds int, is_holding_air boolean, details jsonb, note text);
  CREATE TEMP TABLE bulk_item_override (handoff_id uuid, item_key text, condition text, details jsonb,
    note text, PRIMARY KEY (handoff_id, item_key));`;
