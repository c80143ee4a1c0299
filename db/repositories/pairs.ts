import type { CandidatePair, PairStatus } from '../../shared-model/api/pairs';
import { DomainError } from '../../shared-model/api/result';
import { nowIso, type SqliteDatabase } from '../store';
import { getCampaign, touchCampaign } from './campaigns';

interface PairRow {
  id: number;
  campaign_id: number;
  element_a: string;
  element_b: string;
  target: string;
  status: PairStatus;
  notes: string;
  created_at: string;
  updated_at: string;
}

function toPair(row: PairRow): CandidatePair {
  return {
    id: row.id,
    campaignId: row.campaign_id,
    elementA: row.element_a,
    elementB: row.element_b,
    target: row.target,
    status: row.status,
    notes: row.notes,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

export function getPair(db: SqliteDatabase, id: number): CandidatePair {
  const row = db.prepare('SELECT * FROM pairs WHERE id = ?').get(id) as PairRow | undefined;
  if (!row) throw new DomainError('not_found', `no candidate pair with id ${id}`, 'id');
  return toPair(row);
}

/** How many candidate pairs each of the given campaigns holds (campaigns without pairs are left out). */
export function countPairsByCampaign(db: SqliteDatabase, campaignIds: readonly number[]): Map<number, number> {
  if (campaignIds.length === 0) return new Map();
  const rows = db
    .prepare(
      `SELECT campaign_id, count(*) AS n FROM pairs WHERE campaign_id IN (SELECT value FROM json_each(?))
       GROUP BY campaign_id`,
    )
    .all(JSON.stringify(campaignIds)) as { campaign_id: number; n: number }[];
  return new Map(rows.map((row) => [row.campaign_id, row.n]));
}

export function listPairs(db: SqliteDatabase, campaignId: number): CandidatePair[] {
  getCampaign(db, campaignId);
  const rows = db.prepare('SELECT * FROM pairs WHERE campaign_id = ? ORDER BY id').all(campaignId) as PairRow[];
  return rows.map(toPair);
}

export function findPair(
  db: SqliteDatabase,
  campaignId: number,
  elementA: string,
  elementB: string,
): CandidatePair | null {
  const row = db
    .prepare(
      'SELECT * FROM pairs WHERE campaign_id = ? AND ((element_a = ? AND element_b = ?) OR (element_a = ? AND element_b = ?))',
    )
    .get(campaignId, elementA, elementB, elementB, elementA) as PairRow | undefined;
  return row ? toPair(row) : null;
}

export function addPair(
  db: SqliteDatabase,
  input: { campaignId: number; elementA: string; elementB: string; target: string; notes: string; status?: PairStatus },
): CandidatePair {
  return db.transaction(() => {
    const campaign = getCampaign(db, input.campaignId);
    if (campaign.archived)
      throw new DomainError('conflict', `"${campaign.name}" is archived; restore it before adding pairs`, 'campaignId');
    const existing = findPair(db, input.campaignId, input.elementA, input.elementB);
    if (existing) {
      throw new DomainError(
        'conflict',
        `${existing.elementA}-${existing.elementB} is already in "${campaign.name}"`,
        'pair',
      );
    }
    const now = nowIso();
    const info = db
      .prepare(
        'INSERT INTO pairs (campaign_id, element_a, element_b, target, status, notes, created_at, updated_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
      )
      .run(
        input.campaignId,
        input.elementA,
        input.elementB,
        input.target,
        input.status ?? 'candidate',
        input.notes,
        now,
        now,
      );
    touchCampaign(db, input.campaignId);
    return getPair(db, Number(info.lastInsertRowid));
  })();
}

export function updatePair(
  db: SqliteDatabase,
  id: number,
  changes: { status?: PairStatus; target?: string; notes?: string },
): CandidatePair {
  return db.transaction(() => {
    const pair = getPair(db, id);
    const next = { ...pair, ...Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined)) };
    db.prepare('UPDATE pairs SET status = ?, target = ?, notes = ?, updated_at = ? WHERE id = ?').run(
      next.status,
      next.target,
      next.notes,
      nowIso(),
      id,
    );
    touchCampaign(db, pair.campaignId);
    return getPair(db, id);
  })();
}

export function removePair(db: SqliteDatabase, id: number): number {
  return db.transaction(() => {
    const pair = getPair(db, id);
    db.prepare('DELETE FROM pairs WHERE id = ?').run(id);
    touchCampaign(db, pair.campaignId);
    return id;
  })();
}
