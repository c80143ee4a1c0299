-- Segregation predictions as they were made: the raw inputs, the settings (classification thresholds,
-- facet, strain rule), the model version and the full result, optionally linked to a campaign pair so that
-- a later outcome can be compared with what was predicted at the time.
CREATE TABLE predictions (
  id INTEGER PRIMARY KEY,
  pair_id INTEGER REFERENCES pairs (id) ON DELETE SET NULL,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  inputs_json TEXT NOT NULL CHECK (json_valid(inputs_json)),
  settings_json TEXT NOT NULL CHECK (json_valid(settings_json)),
  model_version TEXT NOT NULL,
  result_json TEXT NOT NULL CHECK (json_valid(result_json)),
  created_at TEXT NOT NULL,
  CHECK (element_a <> element_b)
);
CREATE INDEX predictions_by_pair ON predictions (pair_id, created_at);
