import type { Campaign } from '../../shared-model/api/campaigns';
import { DomainError } from '../../shared-model/api/result';
import { nowIso, type SqliteDatabase } from '../store';
import { countPairsByCampaign } from './pairs';

interface CampaignRow {
  id: number;
  name: string;
  description: string;
  archived: number;
  is_demo: number;
  created_at: string;
  updated_at: string;
}

const SELECT = 'SELECT c.* FROM campaigns c';

function toCampaign(row: CampaignRow, pairCount: number): Campaign {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    archived: row.archived === 1,
    isDemo: row.is_demo === 1,
    pairCount,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

function nameTaken(db: SqliteDatabase, name: string, exceptId?: number): boolean {
  const row = db.prepare('SELECT id FROM campaigns WHERE name = ? COLLATE NOCASE').get(name) as
    { id: number } | undefined;
  return row !== undefined && row.id !== exceptId;
}

export function getCampaign(db: SqliteDatabase, id: number): Campaign {
  const row = db.prepare(`${SELECT} WHERE c.id = ?`).get(id) as CampaignRow | undefined;
  if (!row) throw new DomainError('not_found', `no campaign with id ${id}`, 'id');
  return toCampaign(row, countPairsByCampaign(db, [id]).get(id) ?? 0);
}

export function findCampaignByName(db: SqliteDatabase, name: string): Campaign | null {
  const row = db.prepare(`${SELECT} WHERE c.name = ? COLLATE NOCASE`).get(name) as CampaignRow | undefined;
  return row ? toCampaign(row, countPairsByCampaign(db, [row.id]).get(row.id) ?? 0) : null;
}

export function listCampaigns(db: SqliteDatabase, includeArchived: boolean): Campaign[] {
  const rows = db
    .prepare(
      `${SELECT} ${includeArchived ? '' : 'WHERE c.archived = 0'} ORDER BY c.archived, c.updated_at DESC, c.id DESC`,
    )
    .all() as CampaignRow[];
  const counts = countPairsByCampaign(
    db,
    rows.map((row) => row.id),
  );
  return rows.map((row) => toCampaign(row, counts.get(row.id) ?? 0));
}

export function createCampaign(
  db: SqliteDatabase,
  input: { name: string; description: string; isDemo?: boolean },
): Campaign {
  if (nameTaken(db, input.name))
    throw new DomainError('conflict', `a campaign named "${input.name}" already exists`, 'name');
  const now = nowIso();
  const info = db
    .prepare('INSERT INTO campaigns (name, description, is_demo, created_at, updated_at) VALUES (?, ?, ?, ?, ?)')
    .run(input.name, input.description, input.isDemo ? 1 : 0, now, now);
  return getCampaign(db, Number(info.lastInsertRowid));
}

export function renameCampaign(db: SqliteDatabase, id: number, name: string): Campaign {
  getCampaign(db, id);
  if (nameTaken(db, name, id)) throw new DomainError('conflict', `a campaign named "${name}" already exists`, 'name');
  db.prepare('UPDATE campaigns SET name = ?, updated_at = ? WHERE id = ?').run(name, nowIso(), id);
  return getCampaign(db, id);
}

export function setCampaignArchived(db: SqliteDatabase, id: number, archived: boolean): Campaign {
  getCampaign(db, id);
  db.prepare('UPDATE campaigns SET archived = ?, updated_at = ? WHERE id = ?').run(archived ? 1 : 0, nowIso(), id);
  return getCampaign(db, id);
}

export function touchCampaign(db: SqliteDatabase, id: number): void {
  db.prepare('UPDATE campaigns SET updated_at = ? WHERE id = ?').run(nowIso(), id);
}
