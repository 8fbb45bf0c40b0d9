-- The current condition of every trailer from the handoffs stored so far: per item, the handoff
-- that last observed it (latest occurred_at, then created_at, as the timeline orders them).
INSERT INTO "trailer_condition" ("trailer_id", "item_key", "handoff_id", "observed_at", "condition")
SELECT DISTINCT ON (h."trailer_id", i."item_key") h."trailer_id", i."item_key", h."id", h."occurred_at", i."condition"
  FROM "handoff_items" i
  JOIN "handoffs" h ON h."id" = i."handoff_id"
 ORDER BY h."trailer_id", i."item_key", h."occurred_at" DESC, h."created_at" DESC
ON CONFLICT DO NOTHING;
