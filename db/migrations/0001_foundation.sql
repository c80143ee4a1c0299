-- Campaigns and their candidate metal pairs.
CREATE TABLE campaigns (
  id INTEGER PRIMARY KEY,
  name TEXT NOT NULL CHECK (length(trim(name)) > 0),
  description TEXT NOT NULL DEFAULT '',
  archived INTEGER NOT NULL DEFAULT 0 CHECK (archived IN (0, 1)),
  is_demo INTEGER NOT NULL DEFAULT 0 CHECK (is_demo IN (0, 1)),
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL
);
CREATE UNIQUE INDEX campaigns_name_unique ON campaigns (name COLLATE NOCASE);

CREATE TABLE pairs (
  id INTEGER PRIMARY KEY,
  campaign_id INTEGER NOT NULL REFERENCES campaigns (id) ON DELETE CASCADE,
  element_a TEXT NOT NULL,
  element_b TEXT NOT NULL,
  target TEXT NOT NULL,
  status TEXT NOT NULL DEFAULT 'candidate',
  notes TEXT NOT NULL DEFAULT '',
  created_at TEXT NOT NULL,
  updated_at TEXT NOT NULL,
  CHECK (element_a <> element_b)
);
-- One row per unordered pair in a campaign: Pt-Ni and Ni-Pt are the same pair.
CREATE UNIQUE INDEX pairs_unique_in_campaign ON pairs (campaign_id, min(element_a, element_b), max(element_a, element_b));
CREATE INDEX pairs_by_campaign ON pairs (campaign_id);
