import { pgEnum, timestamp, uuid } from 'drizzle-orm/pg-core';
import { ROLES } from '@/lib/auth/roles';
import { CASE_STATES, DECISIONS } from '@/lib/desk/case-state';
import { CONDITIONS } from '@/lib/engine/conditions';
import { TASK_KINDS, WALK_RESOLUTIONS } from '@/lib/yard/walk';

export const id = () => uuid('id').primaryKey().defaultRandom();
export const createdAt = () => timestamp('created_at', { withTimezone: true }).notNull().defaultNow();
export const at = (name: string) => timestamp(name, { withTimezone: true });

export const roleEnum = pgEnum('role', ROLES);
export const trailerKindEnum = pgEnum('trailer_kind', ['reefer', 'dry_van']);
export const tireLayoutEnum = pgEnum('tire_layout', ['dual', 'wide_single']);
export const trailerStatusEnum = pgEnum('trailer_status', ['in_yard', 'on_road', 'gone']);
export const spotKindEnum = pgEnum('spot_kind', ['slot', 'door']);
export const handoffKindEnum = pgEnum('handoff_kind', ['drop', 'hook']);
export const inspectionLevelEnum = pgEnum('inspection_level', ['full', 'quick']);
export const conditionEnum = pgEnum('item_condition', CONDITIONS);
export const pretripEnum = pgEnum('pretrip_result', ['pass', 'fail', 'not_run']);
export const photoStatusEnum = pgEnum('photo_status', ['pending', 'stored', 'rejected']);
export const confidenceEnum = pgEnum('confidence', ['high', 'medium', 'none']);
export const holdSeverityEnum = pgEnum('hold_severity', ['out_of_service', 'restricted']);
export const walkStatusEnum = pgEnum('walk_status', ['in_progress', 'finished']);
export const walkOutcomeEnum = pgEnum('walk_outcome', [
  'matched',
  'wrong_slot',
  'missing',
  'unknown',
  'duplicate',
]);
export const walkResolutionEnum = pgEnum('walk_resolution', WALK_RESOLUTIONS);
export const taskKindEnum = pgEnum('yard_task_kind', TASK_KINDS);
export const caseStateEnum = pgEnum('case_state', CASE_STATES);
export const decisionEnum = pgEnum('case_decision', DECISIONS);
export const outboxStatusEnum = pgEnum('outbox_status', ['pending', 'sent', 'failed']);
