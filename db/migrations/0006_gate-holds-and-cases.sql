ALTER TABLE "handoffs" ADD COLUMN "is_load_perishable" boolean;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "caution" text;--> statement-breakpoint
ALTER TABLE "cases" ADD COLUMN "attribution_note" text;