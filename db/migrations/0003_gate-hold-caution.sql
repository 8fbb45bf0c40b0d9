ALTER TABLE "handoffs" ADD COLUMN "is_load_perishable" boolean;--> statement-breakpoint
ALTER TABLE "holds" ADD COLUMN "caution" text;