ALTER TABLE "handoffs" ADD COLUMN "correction_reason" text;--> statement-breakpoint
ALTER TABLE "handoffs" ADD COLUMN "hash_version" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "handoffs" ADD COLUMN "request_hash" text;