-- Learning from outcomes (issue 11): imported history tables with their rows, metal prices per gram with
-- their date, fitted models (version, settings, the ids of the outcomes each was trained on, its review)
-- and the proposals made from a model.

-- One imported table; `fingerprint` identifies its content, so importing the same table twice is noticed.
CREATE TABLE history_imports (
  id INTEGER PRIMARY KEY,
  campaign_id INTEGER NOT NULL REFERENCES campaigns (id) ON DELETE CASCADE,
  file_name TEXT,
  fingerprint TEXT NOT NULL,
  row_count INTEGER NOT NULL CHECK (row_count >= 1),
  created_at TEXT NOT NULL
);
CREATE INDEX history_imports_by_campaign ON history_imports (campaign_id);

-- One synthesis of the imported history, marked as imported history by living here; `observed` is an
-- architecture label as the app writes it, or 'failed'.
CREATE TABLE history_outcomes (
  id INTEGER PRIMARY KEY,
  import_id INTEGER NOT NULL REFERENCES history_imports (id) ON DELETE CASCADE,
  campaign_id INTEGER NOT NULL REFERENCES campaigns (id) ON DELETE CASCADE,
  line INTEGER NOT NULL,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  xb REAL NOT NULL CHECK (xb > 0 AND xb < 1),
  diameter_nm REAL NOT NULL CHECK (diameter_nm > 0),
  temperature_k REAL NOT NULL CHECK (temperature_k > 0),
  route TEXT NOT NULL,
  observed TEXT NOT NULL CHECK (length(observed) > 0),
  made_on TEXT,
  notes TEXT NOT NULL DEFAULT '',
  CHECK (element_a <> element_b)
);
CREATE INDEX history_outcomes_by_campaign ON history_outcomes (campaign_id);

-- Prices change too fast to ship: the user enters them; every entry is kept with its date.
CREATE TABLE metal_prices (
  id INTEGER PRIMARY KEY,
  symbol TEXT NOT NULL,
  price_per_gram REAL NOT NULL CHECK (price_per_gram > 0),
  currency TEXT NOT NULL CHECK (length(currency) > 0),
  priced_on TEXT NOT NULL,
  entered_at TEXT NOT NULL
);
CREATE INDEX metal_prices_by_symbol ON metal_prices (symbol, priced_on);

CREATE TABLE learn_models (
  id INTEGER PRIMARY KEY,
  campaign_id INTEGER NOT NULL REFERENCES campaigns (id) ON DELETE CASCADE,
  model_version TEXT NOT NULL,
  trained_on TEXT NOT NULL CHECK (json_valid(trained_on)),
  options TEXT NOT NULL CHECK (json_valid(options)),
  review TEXT NOT NULL CHECK (json_valid(review)),
  created_at TEXT NOT NULL
);
CREATE INDEX learn_models_by_campaign ON learn_models (campaign_id);

CREATE TABLE learn_proposals (
  id INTEGER PRIMARY KEY,
  campaign_id INTEGER NOT NULL REFERENCES campaigns (id) ON DELETE CASCADE,
  model_id INTEGER NOT NULL REFERENCES learn_models (id) ON DELETE CASCADE,
  model_version TEXT NOT NULL,
  trained_on TEXT NOT NULL CHECK (json_valid(trained_on)),
  target TEXT NOT NULL,
  options TEXT NOT NULL CHECK (json_valid(options)),
  proposals TEXT NOT NULL CHECK (json_valid(proposals)),
  created_at TEXT NOT NULL
);
CREATE INDEX learn_proposals_by_campaign ON learn_proposals (campaign_id);
