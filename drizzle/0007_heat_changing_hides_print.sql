-- Studio templates copied from a built-in mug before blank variants said it themselves: the cold
-- heat-changing variant's coating hides the print, so previews leave the design off it and text
-- contrast is not checked against it. Variants that already say either way are left alone.
UPDATE "studio_templates" AS t
SET "spec" = jsonb_set(t."spec", '{variants}', (
  SELECT jsonb_agg(CASE WHEN v->>'id' = 'heat-changing-cold' AND NOT (v ? 'hidesPrint') THEN v || '{"hidesPrint": true}'::jsonb ELSE v END ORDER BY n)
  FROM jsonb_array_elements(t."spec"->'variants') WITH ORDINALITY AS e(v, n)
)), "updated_at" = now()
WHERE jsonb_typeof(t."spec"->'variants') = 'array'
  AND EXISTS (SELECT 1 FROM jsonb_array_elements(t."spec"->'variants') AS e(v) WHERE v->>'id' = 'heat-changing-cold' AND NOT (v ? 'hidesPrint'));
