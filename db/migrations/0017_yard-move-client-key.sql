ALTER TABLE "yard_moves" ADD COLUMN "client_key" text;--> statement-breakpoint
CREATE UNIQUE INDEX "yard_moves_mover_client_key" ON "yard_moves" USING btree ("moved_by_id","client_key");