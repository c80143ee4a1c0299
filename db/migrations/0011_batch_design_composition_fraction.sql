-- The computed batch design states the composition as the atomic fraction of B (xB, 0–1), as its inputs
-- (migration 0006), predictions and outcomes do; designs saved before stated it in at.% (xBPct).
-- Rewrite each saved design once; nothing else in it changes.
UPDATE batches
SET computed = json_remove(
  json_set(computed, '$.xB', json_extract(computed, '$.xBPct') / 100.0),
  '$.xBPct'
)
WHERE json_type(computed, '$.xBPct') IN ('integer', 'real');
