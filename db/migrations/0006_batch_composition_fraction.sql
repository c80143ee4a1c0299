-- Batch-design inputs state the composition as the atomic fraction of B (size.xB, 0–1), as predictions
-- and outcomes do; inputs saved before stated it in at.% (size.xBPct). Rewrite each saved input once.
-- The computed design (`computed`) is kept as saved.
UPDATE batches
SET inputs = json_remove(
  json_set(inputs, '$.size.xB', json_extract(inputs, '$.size.xBPct') / 100.0),
  '$.size.xBPct'
)
WHERE json_type(inputs, '$.size.xBPct') IN ('integer', 'real');
