CREATE TABLE "chain_anchors" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"terminal_id" uuid NOT NULL,
	"day" date NOT NULL,
	"digest" text NOT NULL,
	"heads" jsonb NOT NULL,
	"record_count" integer NOT NULL,
	"emailed_to" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "photos" ADD COLUMN "pending_key" text;--> statement-breakpoint
ALTER TABLE "chain_anchors" ADD CONSTRAINT "chain_anchors_terminal_id_terminals_id_fk" FOREIGN KEY ("terminal_id") REFERENCES "public"."terminals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "chain_anchors_terminal_day" ON "chain_anchors" USING btree ("terminal_id","day");