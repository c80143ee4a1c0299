-- Lattice Monte Carlo runs: the raw inputs (with the seed), the engine version, the state of the job,
-- the latest progress report, the analysed result and the final site occupations ('A'/'B' per site of the
-- geometry the inputs rebuild), so that any stored run can be re-opened, exported or recomputed.
CREATE TABLE simulation_runs (
  id INTEGER PRIMARY KEY,
  pair_id INTEGER REFERENCES pairs (id) ON DELETE SET NULL,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  label TEXT NOT NULL DEFAULT '',
  inputs_json TEXT NOT NULL CHECK (json_valid(inputs_json)),
  seed INTEGER NOT NULL,
  engine_version TEXT NOT NULL,
  status TEXT NOT NULL CHECK (status IN ('queued', 'running', 'done', 'failed', 'cancelled')),
  planned_atoms INTEGER NOT NULL CHECK (planned_atoms > 0),
  total_sweeps INTEGER NOT NULL CHECK (total_sweeps > 0),
  progress_json TEXT CHECK (progress_json IS NULL OR json_valid(progress_json)),
  result_json TEXT CHECK (result_json IS NULL OR json_valid(result_json)),
  final_occupation TEXT,
  error TEXT,
  -- The process that queued the run and the last time it said it was alive: a run whose owner fell silent
  -- (the app closed mid-run) is reported as interrupted by whichever process reads it next.
  owner TEXT NOT NULL,
  heartbeat_at TEXT NOT NULL,
  created_at TEXT NOT NULL,
  started_at TEXT,
  finished_at TEXT,
  CHECK (element_a <> element_b),
  CHECK (status <> 'done' OR (result_json IS NOT NULL AND final_occupation IS NOT NULL))
);
CREATE INDEX simulation_runs_by_created ON simulation_runs (created_at);
CREATE INDEX simulation_runs_by_pair ON simulation_runs (pair_id);
CREATE INDEX simulation_runs_active ON simulation_runs (status, heartbeat_at);
