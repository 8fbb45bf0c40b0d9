CREATE TYPE "public"."case_state" AS ENUM('open', 'notified', 'disputed', 'decided', 'closed');--> statement-breakpoint
CREATE TYPE "public"."item_condition" AS ENUM('ok', 'minor', 'damaged', 'unsafe', 'missing', 'not_checked');--> statement-breakpoint
CREATE TYPE "public"."confidence" AS ENUM('high', 'medium', 'none');--> statement-breakpoint
CREATE TYPE "public"."case_decision" AS ENUM('charge', 'share', 'absorb', 'waive');--> statement-breakpoint
CREATE TYPE "public"."handoff_kind" AS ENUM('drop', 'hook');--> statement-breakpoint
CREATE TYPE "public"."hold_severity" AS ENUM('out_of_service', 'restricted');--> statement-breakpoint
CREATE TYPE "public"."inspection_level" AS ENUM('full', 'quick');--> statement-breakpoint
CREATE TYPE "public"."outbox_status" AS ENUM('pending', 'sent', 'failed');--> statement-breakpoint
CREATE TYPE "public"."photo_status" AS ENUM('pending', 'stored', 'rejected');--> statement-breakpoint
CREATE TYPE "public"."pretrip_result" AS ENUM('pass', 'fail', 'not_run');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('driver', 'jockey', 'clerk', 'admin');--> statement-breakpoint
CREATE TYPE "public"."spot_kind" AS ENUM('slot', 'door');--> statement-breakpoint
CREATE TYPE "public"."yard_task_kind" AS ENUM('low_fuel', 'unit_off', 'doors_open', 'seal_missing');--> statement-breakpoint
CREATE TYPE "public"."tire_layout" AS ENUM('dual', 'wide_single');--> statement-breakpoint
CREATE TYPE "public"."trailer_kind" AS ENUM('reefer', 'dry_van');--> statement-breakpoint
CREATE TYPE "public"."trailer_status" AS ENUM('in_yard', 'on_road', 'gone');--> statement-breakpoint
CREATE TYPE "public"."walk_outcome" AS ENUM('matched', 'wrong_slot', 'missing', 'unknown', 'duplicate');--> statement-breakpoint
CREATE TYPE "public"."walk_resolution" AS ENUM('accepted', 'marked_gone', 'investigating');--> statement-breakpoint
CREATE TYPE "public"."walk_status" AS ENUM('in_progress', 'finished');--> statement-breakpoint
CREATE TABLE "carriers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"scac" text NOT NULL,
	"name" text NOT NULL,
	"contact_email" text NOT NULL,
	"is_home_carrier" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "carriers_scac_unique" UNIQUE("scac")
);
--> statement-breakpoint
CREATE TABLE "terminals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"time_zone" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "terminals_code_unique" UNIQUE("code")
);
--> statement-breakpoint
CREATE TABLE "trailers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"unit_number" text NOT NULL,
	"vin" text NOT NULL,
	"plate" text NOT NULL,
	"plate_state" text NOT NULL,
	"kind" "trailer_kind" NOT NULL,
	"owner_carrier_id" uuid NOT NULL,
	"fuel_tank_gallons" integer DEFAULT 50 NOT NULL,
	"hinges_per_door" integer DEFAULT 4 NOT NULL,
	"axle_count" integer DEFAULT 2 NOT NULL,
	"tire_layout" "tire_layout" DEFAULT 'dual' NOT NULL,
	"status" "trailer_status" DEFAULT 'on_road' NOT NULL,
	"current_terminal_id" uuid,
	"current_spot_id" uuid,
	"is_loaded" boolean DEFAULT false NOT NULL,
	"fuel_eighths" integer,
	"is_reefer_on" boolean,
	"setpoint_tenths_f" integer,
	"gate_in_at" timestamp with time zone,
	"last_seen_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trailers_unit_number_unique" UNIQUE("unit_number"),
	CONSTRAINT "trailers_vin_unique" UNIQUE("vin")
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"role" "role" NOT NULL,
	"email" text,
	"driver_number" text,
	"secret_hash" text NOT NULL,
	"home_terminal_id" uuid,
	"carrier_id" uuid,
	"is_active" boolean DEFAULT true NOT NULL,
	"failed_sign_ins" integer DEFAULT 0 NOT NULL,
	"locked_until" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "users_email_unique" UNIQUE("email"),
	CONSTRAINT "users_driver_number_unique" UNIQUE("driver_number")
);
--> statement-breakpoint
CREATE TABLE "yard_rows" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"terminal_id" uuid NOT NULL,
	"name" text NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "yard_spots" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"terminal_id" uuid NOT NULL,
	"row_id" uuid,
	"kind" "spot_kind" NOT NULL,
	"label" text NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"retired_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "findings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"handoff_id" uuid,
	"walk_id" uuid,
	"trailer_id" uuid NOT NULL,
	"item_key" text NOT NULL,
	"kind" text NOT NULL,
	"condition" "item_condition",
	"previous_condition" "item_condition",
	"previous_handoff_id" uuid,
	"responsible_carrier_id" uuid,
	"responsible_party" text,
	"confidence" "confidence",
	"candidates" jsonb,
	"reason" text NOT NULL,
	"case_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "handoff_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"handoff_id" uuid NOT NULL,
	"item_key" text NOT NULL,
	"condition" "item_condition" NOT NULL,
	"tread_thirty_seconds" integer,
	"is_holding_air" boolean,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "handoffs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trailer_id" uuid NOT NULL,
	"terminal_id" uuid NOT NULL,
	"kind" "handoff_kind" NOT NULL,
	"level" "inspection_level" DEFAULT 'full' NOT NULL,
	"carrier_id" uuid NOT NULL,
	"driver_id" uuid,
	"driver_name" text NOT NULL,
	"tractor_number" text NOT NULL,
	"recorded_by_id" uuid NOT NULL,
	"is_loaded" boolean NOT NULL,
	"seal_number" text,
	"fuel_eighths" integer,
	"is_reefer_on" boolean,
	"setpoint_tenths_f" integer,
	"return_air_tenths_f" integer,
	"engine_hours_tenths" integer,
	"pretrip_result" "pretrip_result",
	"pretrip_at" timestamp with time zone,
	"note" text,
	"occurred_at" timestamp with time zone NOT NULL,
	"idempotency_key" text NOT NULL,
	"corrects_handoff_id" uuid,
	"verification_code" text NOT NULL,
	"prev_hash" text,
	"content_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "handoffs_idempotency_key_unique" UNIQUE("idempotency_key"),
	CONSTRAINT "handoffs_verification_code_unique" UNIQUE("verification_code")
);
--> statement-breakpoint
CREATE TABLE "holds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trailer_id" uuid NOT NULL,
	"handoff_id" uuid,
	"walk_id" uuid,
	"severity" "hold_severity" NOT NULL,
	"restriction" text,
	"rule_key" text NOT NULL,
	"item_key" text,
	"reason" text NOT NULL,
	"source" text NOT NULL,
	"placed_by_id" uuid,
	"placed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"released_at" timestamp with time zone,
	"released_by_id" uuid,
	"repair_note" text,
	"repaired_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "labels" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trailer_id" uuid NOT NULL,
	"issued_by_id" uuid,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"object_key" text NOT NULL,
	"uploaded_by_id" uuid NOT NULL,
	"trailer_id" uuid NOT NULL,
	"handoff_id" uuid,
	"case_event_id" uuid,
	"item_key" text,
	"status" "photo_status" DEFAULT 'pending' NOT NULL,
	"content_type" text NOT NULL,
	"byte_size" integer NOT NULL,
	"sha256" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_object_key_unique" UNIQUE("object_key")
);
--> statement-breakpoint
CREATE TABLE "walk_outcomes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"walk_id" uuid NOT NULL,
	"outcome" "walk_outcome" NOT NULL,
	"spot_id" uuid,
	"expected_spot_id" uuid,
	"trailer_id" uuid,
	"scanned_text" text,
	"resolution" "walk_resolution",
	"resolved_by_id" uuid,
	"resolved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "walk_scans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"walk_id" uuid NOT NULL,
	"seq" integer NOT NULL,
	"client_key" text NOT NULL,
	"scanned_text" text NOT NULL,
	"trailer_id" uuid,
	"spot_id" uuid,
	"is_unit_running" boolean,
	"setpoint_tenths_f" integer,
	"fuel_eighths" integer,
	"are_doors_closed" boolean,
	"is_seal_present" boolean,
	"scanned_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "walk_scans_client_key_unique" UNIQUE("client_key")
);
--> statement-breakpoint
CREATE TABLE "yard_moves" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"trailer_id" uuid NOT NULL,
	"terminal_id" uuid NOT NULL,
	"from_spot_id" uuid,
	"to_spot_id" uuid NOT NULL,
	"moved_by_id" uuid NOT NULL,
	"moved_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "yard_tasks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"terminal_id" uuid NOT NULL,
	"trailer_id" uuid NOT NULL,
	"walk_id" uuid,
	"kind" "yard_task_kind" NOT NULL,
	"note" text,
	"cleared_at" timestamp with time zone,
	"cleared_by_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "yard_walks" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"terminal_id" uuid NOT NULL,
	"started_by_id" uuid NOT NULL,
	"row_ids" jsonb NOT NULL,
	"status" "walk_status" DEFAULT 'in_progress' NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finished_at" timestamp with time zone,
	"summary" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_log" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"actor_id" uuid,
	"action" text NOT NULL,
	"entity_type" text NOT NULL,
	"entity_id" text,
	"detail" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "case_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"case_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"from_state" "case_state",
	"to_state" "case_state",
	"actor_id" uuid,
	"note" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "cases" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"handoff_id" uuid NOT NULL,
	"trailer_id" uuid NOT NULL,
	"terminal_id" uuid NOT NULL,
	"proposed_carrier_id" uuid,
	"state" "case_state" DEFAULT 'open' NOT NULL,
	"estimate_cents" integer DEFAULT 0 NOT NULL,
	"override_cents" integer,
	"override_reason" text,
	"decision" "case_decision",
	"charged_cents" integer,
	"decision_reason" text,
	"dispute_deadline" timestamp with time zone,
	"opened_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "cases_handoff_id_unique" UNIQUE("handoff_id")
);
--> statement-breakpoint
CREATE TABLE "email_outbox" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"text_body" text NOT NULL,
	"html_body" text,
	"status" "outbox_status" DEFAULT 'pending' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone,
	"related_type" text,
	"related_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "policies" (
	"terminal_id" uuid PRIMARY KEY NOT NULL,
	"data" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rate_card" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item_pattern" text NOT NULL,
	"condition" "item_condition" NOT NULL,
	"amount_cents" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "trailers" ADD CONSTRAINT "trailers_owner_carrier_id_carriers_id_fk" FOREIGN KEY ("owner_carrier_id") REFERENCES "public"."carriers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trailers" ADD CONSTRAINT "trailers_current_terminal_id_terminals_id_fk" FOREIGN KEY ("current_terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trailers" ADD CONSTRAINT "trailers_current_spot_id_yard_spots_id_fk" FOREIGN KEY ("current_spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_home_terminal_id_terminals_id_fk" FOREIGN KEY ("home_terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_carrier_id_carriers_id_fk" FOREIGN KEY ("carrier_id") REFERENCES "public"."carriers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_rows" ADD CONSTRAINT "yard_rows_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_spots" ADD CONSTRAINT "yard_spots_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_spots" ADD CONSTRAINT "yard_spots_row_id_yard_rows_id_fk" FOREIGN KEY ("row_id") REFERENCES "public"."yard_rows"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_previous_handoff_id_handoffs_id_fk" FOREIGN KEY ("previous_handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "findings" ADD CONSTRAINT "findings_responsible_carrier_id_carriers_id_fk" FOREIGN KEY ("responsible_carrier_id") REFERENCES "public"."carriers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoff_items" ADD CONSTRAINT "handoff_items_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_carrier_id_carriers_id_fk" FOREIGN KEY ("carrier_id") REFERENCES "public"."carriers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_driver_id_users_id_fk" FOREIGN KEY ("driver_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "handoffs" ADD CONSTRAINT "handoffs_recorded_by_id_users_id_fk" FOREIGN KEY ("recorded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_placed_by_id_users_id_fk" FOREIGN KEY ("placed_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "holds" ADD CONSTRAINT "holds_released_by_id_users_id_fk" FOREIGN KEY ("released_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labels" ADD CONSTRAINT "labels_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "labels" ADD CONSTRAINT "labels_issued_by_id_users_id_fk" FOREIGN KEY ("issued_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploaded_by_id_users_id_fk" FOREIGN KEY ("uploaded_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_outcomes" ADD CONSTRAINT "walk_outcomes_walk_id_yard_walks_id_fk" FOREIGN KEY ("walk_id") REFERENCES "public"."yard_walks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_outcomes" ADD CONSTRAINT "walk_outcomes_spot_id_yard_spots_id_fk" FOREIGN KEY ("spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_outcomes" ADD CONSTRAINT "walk_outcomes_expected_spot_id_yard_spots_id_fk" FOREIGN KEY ("expected_spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_outcomes" ADD CONSTRAINT "walk_outcomes_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_outcomes" ADD CONSTRAINT "walk_outcomes_resolved_by_id_users_id_fk" FOREIGN KEY ("resolved_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_scans" ADD CONSTRAINT "walk_scans_walk_id_yard_walks_id_fk" FOREIGN KEY ("walk_id") REFERENCES "public"."yard_walks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_scans" ADD CONSTRAINT "walk_scans_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "walk_scans" ADD CONSTRAINT "walk_scans_spot_id_yard_spots_id_fk" FOREIGN KEY ("spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_moves" ADD CONSTRAINT "yard_moves_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_moves" ADD CONSTRAINT "yard_moves_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_moves" ADD CONSTRAINT "yard_moves_from_spot_id_yard_spots_id_fk" FOREIGN KEY ("from_spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_moves" ADD CONSTRAINT "yard_moves_to_spot_id_yard_spots_id_fk" FOREIGN KEY ("to_spot_id") REFERENCES "public"."yard_spots"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_moves" ADD CONSTRAINT "yard_moves_moved_by_id_users_id_fk" FOREIGN KEY ("moved_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_tasks" ADD CONSTRAINT "yard_tasks_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_tasks" ADD CONSTRAINT "yard_tasks_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_tasks" ADD CONSTRAINT "yard_tasks_walk_id_yard_walks_id_fk" FOREIGN KEY ("walk_id") REFERENCES "public"."yard_walks"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_tasks" ADD CONSTRAINT "yard_tasks_cleared_by_id_users_id_fk" FOREIGN KEY ("cleared_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_walks" ADD CONSTRAINT "yard_walks_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "yard_walks" ADD CONSTRAINT "yard_walks_started_by_id_users_id_fk" FOREIGN KEY ("started_by_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_log" ADD CONSTRAINT "audit_log_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_case_id_cases_id_fk" FOREIGN KEY ("case_id") REFERENCES "public"."cases"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "case_events" ADD CONSTRAINT "case_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "cases" ADD CONSTRAINT "cases_proposed_carrier_id_carriers_id_fk" FOREIGN KEY ("proposed_carrier_id") REFERENCES "public"."carriers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "policies" ADD CONSTRAINT "policies_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "trailers_current_spot" ON "trailers" USING btree ("current_spot_id");--> statement-breakpoint
CREATE INDEX "trailers_terminal_status" ON "trailers" USING btree ("current_terminal_id","status");--> statement-breakpoint
CREATE INDEX "trailers_owner" ON "trailers" USING btree ("owner_carrier_id");--> statement-breakpoint
CREATE INDEX "users_carrier" ON "users" USING btree ("carrier_id");--> statement-breakpoint
CREATE INDEX "users_terminal" ON "users" USING btree ("home_terminal_id");--> statement-breakpoint
CREATE UNIQUE INDEX "yard_rows_terminal_name" ON "yard_rows" USING btree ("terminal_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "yard_spots_terminal_label" ON "yard_spots" USING btree ("terminal_id","label");--> statement-breakpoint
CREATE INDEX "yard_spots_row" ON "yard_spots" USING btree ("row_id");--> statement-breakpoint
CREATE INDEX "findings_handoff" ON "findings" USING btree ("handoff_id");--> statement-breakpoint
CREATE INDEX "findings_trailer" ON "findings" USING btree ("trailer_id");--> statement-breakpoint
CREATE INDEX "findings_case" ON "findings" USING btree ("case_id");--> statement-breakpoint
CREATE UNIQUE INDEX "handoff_items_handoff_item" ON "handoff_items" USING btree ("handoff_id","item_key");--> statement-breakpoint
CREATE INDEX "handoff_items_item" ON "handoff_items" USING btree ("item_key");--> statement-breakpoint
CREATE INDEX "handoffs_trailer_time" ON "handoffs" USING btree ("trailer_id","occurred_at");--> statement-breakpoint
CREATE INDEX "handoffs_carrier" ON "handoffs" USING btree ("carrier_id");--> statement-breakpoint
CREATE INDEX "handoffs_driver" ON "handoffs" USING btree ("driver_id");--> statement-breakpoint
CREATE INDEX "holds_trailer_open" ON "holds" USING btree ("trailer_id","released_at");--> statement-breakpoint
CREATE INDEX "labels_trailer" ON "labels" USING btree ("trailer_id");--> statement-breakpoint
CREATE INDEX "photos_handoff" ON "photos" USING btree ("handoff_id");--> statement-breakpoint
CREATE INDEX "photos_trailer" ON "photos" USING btree ("trailer_id");--> statement-breakpoint
CREATE INDEX "walk_outcomes_walk" ON "walk_outcomes" USING btree ("walk_id");--> statement-breakpoint
CREATE UNIQUE INDEX "walk_scans_walk_seq" ON "walk_scans" USING btree ("walk_id","seq");--> statement-breakpoint
CREATE INDEX "walk_scans_trailer" ON "walk_scans" USING btree ("trailer_id");--> statement-breakpoint
CREATE INDEX "yard_moves_trailer_time" ON "yard_moves" USING btree ("trailer_id","moved_at");--> statement-breakpoint
CREATE INDEX "yard_tasks_open" ON "yard_tasks" USING btree ("terminal_id","cleared_at");--> statement-breakpoint
CREATE INDEX "yard_walks_terminal" ON "yard_walks" USING btree ("terminal_id","started_at");--> statement-breakpoint
CREATE INDEX "audit_log_entity" ON "audit_log" USING btree ("entity_type","entity_id");--> statement-breakpoint
CREATE INDEX "case_events_case" ON "case_events" USING btree ("case_id","created_at");--> statement-breakpoint
CREATE INDEX "cases_state" ON "cases" USING btree ("terminal_id","state");--> statement-breakpoint
CREATE INDEX "cases_carrier" ON "cases" USING btree ("proposed_carrier_id");--> statement-breakpoint
CREATE INDEX "email_outbox_due" ON "email_outbox" USING btree ("status","next_attempt_at");--> statement-breakpoint
CREATE UNIQUE INDEX "rate_card_item_condition" ON "rate_card" USING btree ("item_pattern","condition");