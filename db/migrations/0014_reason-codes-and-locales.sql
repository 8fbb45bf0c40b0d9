ALTER TABLE "carriers" ADD COLUMN "locale" text DEFAULT 'en' NOT NULL;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "locale" text DEFAULT 'en' NOT NULL;--> statement-breakpoint
ALTER TABLE "findings" ADD COLUMN "reason_code" text;--> statement-breakpoint
ALTER TABLE "findings" ADD COLUMN "reason_params" jsonb;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "reason_code" text;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "reason_params" jsonb;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "caution_code" text;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "caution_params" jsonb;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "attribution_note_code" text;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "attribution_note_params" jsonb;