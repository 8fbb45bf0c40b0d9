CREATE TABLE "trailer_condition" (
	"trailer_id" uuid NOT NULL,
	"item_key" text NOT NULL,
	"handoff_id" uuid NOT NULL,
	"observed_at" timestamp with time zone NOT NULL,
	"condition" "item_condition" NOT NULL,
	CONSTRAINT "trailer_condition_trailer_id_item_key_pk" PRIMARY KEY("trailer_id","item_key")
);
--> statement-breakpoint
ALTER TABLE "trailer_condition" ADD CONSTRAINT "trailer_condition_trailer_id_trailers_id_fk" FOREIGN KEY ("trailer_id") REFERENCES "public"."trailers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trailer_condition" ADD CONSTRAINT "trailer_condition_handoff_id_handoffs_id_fk" FOREIGN KEY ("handoff_id") REFERENCES "public"."handoffs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "trailers_unit_upper" ON "trailers" USING btree (upper("unit_number"));--> statement-breakpoint
CREATE INDEX "holds_open" ON "holds" USING btree ("trailer_id") WHERE "holds"."released_at" is null;--> statement-breakpoint
CREATE INDEX "cases_opened" ON "cases" USING btree ("opened_at","id");--> statement-breakpoint
CREATE INDEX "cases_trailer" ON "cases" USING btree ("trailer_id");