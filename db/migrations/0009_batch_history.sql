-- What happened to a batch (issue "Statuses, inventory and lists that follow the work"): one line per
-- event — a status move, the reagents taken from the inventory when it was marked made, and their return
-- when that was undone. `movements` lists the inventory changes: [{inventoryId, reagentKey, delta, unit}].
CREATE TABLE batch_history (
  id INTEGER PRIMARY KEY,
  batch_id INTEGER NOT NULL REFERENCES batches (id) ON DELETE CASCADE,
  event TEXT NOT NULL CHECK (event IN ('status', 'stock-taken', 'stock-returned')),
  from_status TEXT,
  to_status TEXT,
  text TEXT NOT NULL,
  movements TEXT NOT NULL DEFAULT '[]' CHECK (json_valid(movements)),
  -- For an stock-taken line: the id of the stock-returned line that gave it back (NULL while in force).
  restored_by INTEGER REFERENCES batch_history (id) ON DELETE SET NULL,
  at TEXT NOT NULL
);
CREATE INDEX batch_history_by_batch ON batch_history (batch_id, id);

-- A batch marked made may take more than the inventory holds (the user is warned): the stock may go
-- below zero. SQLite cannot drop a CHECK, so the table is rebuilt with the same rows and ids.
ALTER TABLE inventory RENAME TO inventory_before_0009;
CREATE TABLE inventory (
  id INTEGER PRIMARY KEY,
  reagent_key TEXT NOT NULL REFERENCES reagents (key) ON DELETE CASCADE,
  amount REAL NOT NULL,
  unit TEXT NOT NULL CHECK (unit IN ('mg', 'g', 'kg', 'mL', 'L')),
  location TEXT NOT NULL DEFAULT '',
  lot TEXT NOT NULL DEFAULT '',
  updated_at TEXT NOT NULL
);
INSERT INTO inventory (id, reagent_key, amount, unit, location, lot, updated_at)
  SELECT id, reagent_key, amount, unit, location, lot, updated_at FROM inventory_before_0009;
DROP TABLE inventory_before_0009;
CREATE INDEX inventory_by_reagent ON inventory (reagent_key);
