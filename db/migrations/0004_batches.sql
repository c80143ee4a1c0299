-- Batch design: the reagent catalog (with revisions), saved batches with their inputs and computed
-- amounts, lots, stock-solution dates, lineage (growth batch → seed batch), and the user's inventory.

-- Catalog: one row per reagent key; `data` is the validated reagent (JSON). Built-in rows are written
-- from the seed data by the repository the first time the catalog is read; every edit bumps `revision`.
CREATE TABLE reagents (
  key TEXT PRIMARY KEY CHECK (length(key) > 0),
  data TEXT NOT NULL CHECK (json_valid(data)),
  revision INTEGER NOT NULL DEFAULT 1 CHECK (revision >= 1),
  built_in INTEGER NOT NULL DEFAULT 0 CHECK (built_in IN (0, 1)),
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL
);

-- Every revision ever saved, so a batch can show what changed since it was computed.
CREATE TABLE reagent_revisions (
  reagent_key TEXT NOT NULL REFERENCES reagents (key) ON DELETE CASCADE,
  revision INTEGER NOT NULL,
  data TEXT NOT NULL CHECK (json_valid(data)),
  saved_at TEXT NOT NULL,
  PRIMARY KEY (reagent_key, revision)
);

CREATE TABLE batches (
  id INTEGER PRIMARY KEY,
  name TEXT NOT NULL CHECK (length(trim(name)) > 0),
  campaign_id INTEGER REFERENCES campaigns (id) ON DELETE SET NULL,
  pair_id INTEGER REFERENCES pairs (id) ON DELETE SET NULL,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  target TEXT NOT NULL,
  route TEXT NOT NULL,
  status TEXT NOT NULL DEFAULT 'planned' CHECK (status IN ('planned', 'made', 'characterized')),
  -- What the user asked for and what Pairwright computed from it, kept as saved (never recomputed silently).
  inputs TEXT NOT NULL CHECK (json_valid(inputs)),
  computed TEXT NOT NULL CHECK (json_valid(computed)),
  model_version TEXT NOT NULL,
  -- {reagent key: catalog revision} of every reagent the computation used.
  catalog_revisions TEXT NOT NULL CHECK (json_valid(catalog_revisions)),
  -- Lineage: the batch whose particles were used as seeds.
  seed_batch_id INTEGER REFERENCES batches (id) ON DELETE RESTRICT,
  measured_diameter_nm REAL CHECK (measured_diameter_nm IS NULL OR measured_diameter_nm > 0),
  measured_particles_per_ml REAL CHECK (measured_particles_per_ml IS NULL OR measured_particles_per_ml > 0),
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  CHECK (element_a <> element_b),
  CHECK (seed_batch_id IS NULL OR seed_batch_id <> id)
);
CREATE INDEX batches_by_campaign ON batches (campaign_id);
CREATE INDEX batches_by_seed ON batches (seed_batch_id);

-- Reagent lot numbers used in a batch.
CREATE TABLE batch_lots (
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  reagent_key TEXT NOT NULL,
  lot TEXT NOT NULL,
  PRIMARY KEY (batch_id, reagent_key)
);

-- When each stock solution of a batch was prepared (for the freshness warning).
CREATE TABLE batch_stocks (
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  reagent_key TEXT NOT NULL,
  prepared_at TEXT NOT NULL,
  freshness_hours REAL CHECK (freshness_hours IS NULL OR freshness_hours > 0),
  PRIMARY KEY (batch_id, reagent_key)
);

-- What the group holds: amount on hand, where, which lot.
CREATE TABLE inventory (
  id INTEGER PRIMARY KEY,
  reagent_key TEXT NOT NULL REFERENCES reagents (key) ON DELETE CASCADE,
  amount REAL NOT NULL CHECK (amount >= 0),
  unit TEXT NOT NULL CHECK (unit IN ('mg', 'g', 'kg', 'mL', 'L')),
  location TEXT NOT NULL DEFAULT '',
  lot TEXT NOT NULL DEFAULT '',
  updated_at TEXT NOT NULL
);
CREATE INDEX inventory_by_reagent ON inventory (reagent_key);
