-- Fills the code columns of rows written before the engine spoke in codes (lib/engine/types/codes.ts).
-- The English text columns stay exactly as receipted. Holds are mapped from their rule_key and
-- item_key with the English they were written in; findings from their kind, item_key and English;
-- a case's attribution note from its one known wording. A row whose English cannot be read back
-- (attributions, whose reasons name people and times, among them) gets `legacy_text` with the
-- stored English as its parameter, shown as is in every language. Runs as the owner (findings are
-- INSERT + SELECT only for the app's role).
CREATE FUNCTION hitchmark_reason_code(rule text, item text, txt text) RETURNS jsonb AS $$
DECLARE
  m text[];
  inner_reason jsonb;
  with_item jsonb := jsonb_build_object('item', item);
BEGIN
  IF txt IS NULL THEN
    RETURN NULL;
  END IF;
  IF txt ~ ' \(found at a refused hook\)$' THEN
    inner_reason := hitchmark_reason_code(rule, item, regexp_replace(txt, ' \(found at a refused hook\)$', ''));
    IF inner_reason IS NULL THEN
      RETURN NULL;
    END IF;
    RETURN jsonb_build_object('code', 'hold.at_refused_hook', 'params', jsonb_build_object('reason', inner_reason));
  END IF;
  -- rules without an item
  IF rule = 'pre_trip_missing' AND txt = 'No reefer pre-trip on record.' THEN
    RETURN jsonb_build_object('code', 'hold.pre_trip_missing', 'params', '{}'::jsonb);
  ELSIF rule = 'pre_trip_failed' AND txt = 'The last reefer pre-trip failed.' THEN
    RETURN jsonb_build_object('code', 'hold.pre_trip_failed', 'params', '{}'::jsonb);
  ELSIF rule = 'pre_trip_stale' THEN
    m := regexp_match(txt, '^The last passed pre-trip is ([0-9]+) h old; policy allows ([0-9.]+) h\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'hold.pre_trip_stale', 'params',
        jsonb_build_object('ageHours', m[1]::numeric, 'maxHours', m[2]::numeric));
    END IF;
  ELSIF rule = 'fuel_short' THEN
    m := regexp_match(txt, '^Fuel ([0-9]+)/8 \(([0-9.]+) gal of ([0-9.]+) gal\); policy asks ([0-9]+)/8 at a (drop|hook): ([0-9]+)/8 short \(([0-9.]+) gal\)\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'finding.fuel_short', 'params', jsonb_build_object(
        'eighths', m[1]::numeric, 'gallons', m[2]::numeric, 'tankGallons', m[3]::numeric,
        'requiredEighths', m[4]::numeric, 'eventType', m[5], 'shortfallEighths', m[6]::numeric,
        'shortfallGallons', m[7]::numeric));
    END IF;
  ELSIF rule = 'fuel_unexplained_drop' THEN
    m := regexp_match(txt, '^Fuel fell ([0-9.]+) gal since the last reading; ([0-9.]+) engine hours explain ([0-9.]+) gal\. Possible leak or theft: check the tank\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'finding.fuel_unexplained_drop', 'params', jsonb_build_object(
        'dropGallons', m[1]::numeric, 'engineHours', m[2]::numeric, 'expectedBurnGallons', m[3]::numeric));
    END IF;
  END IF;
  IF item IS NULL OR item = '' THEN
    RETURN NULL;
  END IF;
  -- rules about one checklist item: the label is the English before the rule's words
  IF rule = 'pin_not_engaged' THEN
    m := regexp_match(txt, '^(.+) is not engaged\.$');
  ELSIF rule = 'tire_not_holding_air' THEN
    m := regexp_match(txt, '^(.+) is not holding air\.$');
  ELSIF rule = 'insulation_showing' THEN
    m := regexp_match(txt, '^(.+): insulation is showing\.$');
  ELSIF rule = 'hinge_not_locking' THEN
    m := regexp_match(txt, '^(.+) does not lock\.$');
  ELSIF rule = 'fuel_leak' THEN
    m := regexp_match(txt, '^(.+): fuel is leaking\.$');
  ELSIF rule = 'item_unsafe' THEN
    m := regexp_match(txt, '^(.+) was recorded unsafe\.$');
  ELSIF rule = 'spare_unusable' THEN
    m := regexp_match(txt, '^(.+) (is missing|is not on its wheel|is not holding air)\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'hold.spare_unusable', 'params', with_item || jsonb_build_object(
        'label', m[1],
        'problem', CASE m[2] WHEN 'is missing' THEN 'missing' WHEN 'is not on its wheel' THEN 'off_wheel' ELSE 'flat' END));
    END IF;
    RETURN NULL;
  ELSIF rule = 'tire_tread_low' THEN
    m := regexp_match(txt, '^(.+) has ([0-9.]+)/32 in tread, under ([0-9.]+)/32 in\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'hold.tire_tread_low', 'params', with_item || jsonb_build_object(
        'label', m[1], 'tread', m[2]::numeric, 'min', m[3]::numeric));
    END IF;
    RETURN NULL;
  ELSIF rule = 'repaired' THEN
    m := regexp_match(txt, '^(.+): was (ok|minor|damaged|unsafe|missing), now (ok|minor|damaged|unsafe|missing): repaired since the last inspection\.$');
    IF m IS NOT NULL THEN
      RETURN jsonb_build_object('code', 'finding.repaired', 'params', with_item || jsonb_build_object(
        'label', m[1], 'previous', m[2], 'current', m[3]));
    END IF;
    RETURN NULL;
  ELSE
    RETURN NULL;
  END IF;
  IF m IS NULL THEN
    RETURN NULL;
  END IF;
  RETURN jsonb_build_object('code', 'hold.' || rule, 'params', with_item || jsonb_build_object('label', m[1]));
END;
$$ LANGUAGE plpgsql IMMUTABLE;
--> statement-breakpoint
CREATE FUNCTION hitchmark_caution_code(txt text) RETURNS jsonb AS $$
  SELECT CASE txt
    WHEN 'Do not move this trailer on a public road until a qualified technician has repaired it. Chock the wheels and set the brakes before going under it. Hitchmark''s checks support, and do not replace, the driver''s inspection under 49 CFR 396.11 and 396.13.'
      THEN '{"code": "caution.out_of_service", "params": {}}'::jsonb
    WHEN 'Yard moves only: this trailer does not leave the gate until the fault is fixed. In the yard, couple with the usual checks (tug test, kingpin locked, landing gear up, air and electrical lines) and move it slowly. Local codes, company policy and licensed mechanics decide.'
      THEN '{"code": "caution.yard_only", "params": {}}'::jsonb
    WHEN 'No perishable load until the repair is made: the box may not hold its temperature. A licensed mechanic or the refrigeration shop decides when it is fixed.'
      THEN '{"code": "caution.no_perishable", "params": {}}'::jsonb
    WHEN 'Chock the wheels and set the brakes before going under the trailer; never crawl under one that is not coupled or on its landing gear on firm ground.'
      THEN '{"code": "caution.under_trailer", "params": {}}'::jsonb
    ELSE jsonb_build_object('code', 'legacy_text', 'params', jsonb_build_object('text', txt))
  END
$$ LANGUAGE sql IMMUTABLE;
--> statement-breakpoint
UPDATE holds h
SET reason_code = c.coded ->> 'code', reason_params = c.coded -> 'params'
FROM (
  SELECT id, coalesce(
    hitchmark_reason_code(rule_key, item_key, reason),
    jsonb_build_object('code', 'legacy_text', 'params', jsonb_build_object('text', reason))
  ) AS coded
  FROM holds WHERE reason_code IS NULL
) c
WHERE h.id = c.id;
--> statement-breakpoint
UPDATE holds h
SET caution_code = c.coded ->> 'code', caution_params = c.coded -> 'params'
FROM (SELECT id, hitchmark_caution_code(caution) AS coded FROM holds WHERE caution IS NOT NULL AND caution_code IS NULL) c
WHERE h.id = c.id;
--> statement-breakpoint
UPDATE findings f
SET reason_code = c.coded ->> 'code', reason_params = c.coded -> 'params'
FROM (
  SELECT id, coalesce(
    hitchmark_reason_code(kind, item_key, reason),
    jsonb_build_object('code', 'legacy_text', 'params', jsonb_build_object('text', reason))
  ) AS coded
  FROM findings WHERE reason_code IS NULL
) c
WHERE f.id = c.id;
--> statement-breakpoint
UPDATE cases
SET
  attribution_note_code = CASE attribution_note
    WHEN 'no earlier inspection: not attributed' THEN 'case.not_attributed' ELSE 'legacy_text' END,
  attribution_note_params = CASE attribution_note
    WHEN 'no earlier inspection: not attributed' THEN '{}'::jsonb
    ELSE jsonb_build_object('text', attribution_note) END
WHERE attribution_note IS NOT NULL AND attribution_note_code IS NULL;
--> statement-breakpoint
DROP FUNCTION hitchmark_caution_code(text);
--> statement-breakpoint
DROP FUNCTION hitchmark_reason_code(text, text, text);
