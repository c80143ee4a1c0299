-- Outcomes of made batches (issue "Outcomes"): the raw characterization data — every particle diameter,
-- every line-scan point, every composition value — stored beside the derived results and the version of
-- the analysis that produced them, so any figure can be recomputed and compared later.

-- One import of TEM particle diameters.
CREATE TABLE outcome_size_imports (
  id INTEGER PRIMARY KEY,
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  source_file TEXT,
  column_number INTEGER NOT NULL CHECK (column_number >= 1),
  column_name TEXT,
  import_notes_json TEXT NOT NULL DEFAULT '[]' CHECK (json_valid(import_notes_json)),
  target_diameter_nm REAL CHECK (target_diameter_nm IS NULL OR target_diameter_nm > 0),
  precision_percent REAL NOT NULL CHECK (precision_percent > 0),
  analysis_version TEXT NOT NULL,
  -- Derived: statistics, log-normal fit with intervals, histogram (recomputable from the diameters below).
  analysis_json TEXT NOT NULL CHECK (json_valid(analysis_json)),
  created_at TEXT NOT NULL
);
CREATE INDEX outcome_size_imports_by_batch ON outcome_size_imports (batch_id);

CREATE TABLE outcome_diameters (
  import_id INTEGER NOT NULL REFERENCES outcome_size_imports (id) ON DELETE CASCADE,
  seq INTEGER NOT NULL,
  diameter_nm REAL NOT NULL CHECK (diameter_nm > 0),
  PRIMARY KEY (import_id, seq)
) WITHOUT ROWID;

-- One composition record: the nominal (feed) value, the grid metal, and measurements kept apart.
CREATE TABLE outcome_compositions (
  id INTEGER PRIMARY KEY,
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  nominal_xb REAL CHECK (nominal_xb IS NULL OR (nominal_xb >= 0 AND nominal_xb <= 1)),
  grid_metal TEXT,
  analysis_version TEXT NOT NULL,
  comparison_json TEXT NOT NULL CHECK (json_valid(comparison_json)),
  created_at TEXT NOT NULL
);
CREATE INDEX outcome_compositions_by_batch ON outcome_compositions (batch_id);

CREATE TABLE outcome_composition_measurements (
  composition_id INTEGER NOT NULL REFERENCES outcome_compositions (id) ON DELETE CASCADE,
  seq INTEGER NOT NULL,
  method TEXT NOT NULL,
  xb REAL NOT NULL CHECK (xb >= 0 AND xb <= 1),
  uncertainty_xb REAL CHECK (uncertainty_xb IS NULL OR (uncertainty_xb >= 0 AND uncertainty_xb <= 1)),
  lines TEXT,
  PRIMARY KEY (composition_id, seq)
) WITHOUT ROWID;

-- One EDX line scan across one particle, with its four-model fit.
CREATE TABLE outcome_line_scans (
  id INTEGER PRIMARY KEY,
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  name TEXT NOT NULL DEFAULT '',
  source_file TEXT,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  unit TEXT NOT NULL CHECK (unit IN ('counts', 'atPercent')),
  -- Probe σ given by the user (nm); NULL when the fit estimated it.
  probe_sigma_nm REAL CHECK (probe_sigma_nm IS NULL OR probe_sigma_nm > 0),
  import_notes_json TEXT NOT NULL DEFAULT '[]' CHECK (json_valid(import_notes_json)),
  chosen_model TEXT NOT NULL,
  analysis_version TEXT NOT NULL,
  analysis_json TEXT NOT NULL CHECK (json_valid(analysis_json)),
  created_at TEXT NOT NULL,
  fitted_at TEXT NOT NULL
);
CREATE INDEX outcome_line_scans_by_batch ON outcome_line_scans (batch_id);

CREATE TABLE outcome_line_scan_points (
  scan_id INTEGER NOT NULL REFERENCES outcome_line_scans (id) ON DELETE CASCADE,
  seq INTEGER NOT NULL,
  position_nm REAL NOT NULL,
  signal_a REAL NOT NULL,
  signal_b REAL NOT NULL,
  PRIMARY KEY (scan_id, seq)
) WITHOUT ROWID;

-- The observed architecture of a batch (confirmed or overridden) and free-text notes.
CREATE TABLE outcome_observations (
  batch_id INTEGER PRIMARY KEY REFERENCES batches (id) ON DELETE CASCADE,
  observed_label TEXT,
  decision TEXT CHECK (decision IS NULL OR decision IN ('confirmed', 'override')),
  suggested_label TEXT,
  reason TEXT NOT NULL DEFAULT '',
  notes TEXT NOT NULL DEFAULT '',
  updated_at TEXT NOT NULL,
  CHECK ((observed_label IS NULL) = (decision IS NULL))
);

-- Paths of original images and spectra; the files stay where they are.
CREATE TABLE outcome_files (
  id INTEGER PRIMARY KEY,
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  path TEXT NOT NULL CHECK (length(trim(path)) > 0),
  kind TEXT NOT NULL CHECK (kind IN ('image', 'spectrum', 'line scan', 'other')),
  note TEXT NOT NULL DEFAULT '',
  added_at TEXT NOT NULL
);
CREATE INDEX outcome_files_by_batch ON outcome_files (batch_id);
