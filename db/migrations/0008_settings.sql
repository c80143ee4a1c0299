-- Settings kept in the store itself (so a backup carries them): one JSON value per key.
-- First key: backups_kept, how many files the backups folder keeps (issue "Trust", backups).
CREATE TABLE settings (
  key TEXT PRIMARY KEY CHECK (length(key) > 0),
  value_json TEXT NOT NULL CHECK (json_valid(value_json)),
  updated_at TEXT NOT NULL
) WITHOUT ROWID;
