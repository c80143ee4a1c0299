-- Each imported history row is a batch of its campaign (issue 11), characterized, marked "imported history"
-- by `history_outcome_id`, with its observed architecture as the outcome observation, so the batch lists,
-- the descriptor map and the confusion matrix see it. Removing an import removes its rows and so their
-- batches (and, through the batch, the observation).
ALTER TABLE batches ADD COLUMN history_outcome_id INTEGER REFERENCES history_outcomes (id) ON DELETE CASCADE;
CREATE UNIQUE INDEX batches_by_history_outcome ON batches (history_outcome_id) WHERE history_outcome_id IS NOT NULL;

-- Rows imported before this migration get their batches now (the repository writes them for new imports).
INSERT INTO batches (name, campaign_id, pair_id, element_a, element_b, target, route, status, inputs, computed,
  model_version, catalog_revisions, notes, created_at, updated_at, history_outcome_id)
SELECT
  'History ' || h.element_a || '-' || h.element_b || ' line ' || h.line,
  h.campaign_id,
  (SELECT p.id FROM pairs p WHERE p.campaign_id = h.campaign_id
     AND min(p.element_a, p.element_b) = min(h.element_a, h.element_b)
     AND max(p.element_a, p.element_b) = max(h.element_a, h.element_b) LIMIT 1),
  h.element_a, h.element_b, h.observed, h.route, 'characterized',
  json_object('importedHistory', json('true'), 'importId', h.import_id, 'line', h.line),
  json_object('importedHistory', json('true'), 'elementA', h.element_a, 'elementB', h.element_b,
    'target', h.observed, 'route', h.route, 'xB', h.xb, 'diameterNm', h.diameter_nm,
    'temperatureK', h.temperature_k, 'temperatureC', h.temperature_k - 273.15, 'madeOn', h.made_on,
    'importId', h.import_id, 'line', h.line, 'fileName', i.file_name, 'modelVersion', 'imported history'),
  'imported history', '{}', h.notes, i.created_at, i.created_at, h.id
FROM history_outcomes h JOIN history_imports i ON i.id = h.import_id
ORDER BY h.id;

-- The observed architecture as the outcome observation; a failed synthesis has no architecture: its
-- observation holds only the note.
INSERT INTO outcome_observations (batch_id, observed_label, decision, suggested_label, reason, notes, updated_at)
SELECT b.id,
  CASE WHEN h.observed = 'failed' THEN NULL ELSE h.observed END,
  CASE WHEN h.observed = 'failed' THEN NULL ELSE 'override' END,
  NULL,
  CASE WHEN h.observed = 'failed' THEN '' ELSE 'imported history (line ' || h.line || ')' END,
  CASE WHEN h.observed = 'failed' THEN 'imported history: the synthesis gave no usable particles (failed)'
    ELSE '' END,
  b.created_at
FROM batches b JOIN history_outcomes h ON h.id = b.history_outcome_id;
