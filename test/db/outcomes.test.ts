/** Outcome repository on a real SQLite file: an import is all or nothing. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { insertLineScan } from '../../db/repositories/outcome-line-scans';
import { insertSizeImport } from '../../db/repositories/outcome-sizes';
import { nowIso, openStore, type Store } from '../../db/store';
import { fitLineScan } from '../../shared-model/characterization/line-scan-fit';
import { analyseSizes } from '../../shared-model/characterization/size-analysis';
import { tempDataDir } from '../support/host-fixture';
import { positions, syntheticScan } from '../shared-model/characterization/synthetic-line-scan';

let store: Store;
let batchId: number;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
  const now = nowIso();
  // A bare batch row (the batch-design area fills these columns in the app).
  const info = store.db
    .prepare(
      `INSERT INTO batches (name, element_a, element_b, target, route, inputs, computed, model_version, catalog_revisions, created_at, updated_at)
       VALUES ('b', 'Au', 'Pd', 'alloy', 'co-reduction', '{}', '{"diameterNm": 10, "xB": 0.5}', 'test', '{}', ?, ?)`,
    )
    .run(now, now);
  batchId = Number(info.lastInsertRowid);
});
afterEach(() => store.close());

const count = (table: string) => (store.db.prepare(`SELECT count(*) AS n FROM ${table}`).get() as { n: number }).n;

describe('outcome imports are one transaction', () => {
  it('a size import whose raw rows break a constraint leaves nothing behind', () => {
    const analysis = analyseSizes([9, 10, 11]);
    expect(() =>
      insertSizeImport(store.db, {
        batchId,
        sourceFile: null,
        column: { number: 1, name: null },
        importNotes: [],
        targetDiameterNm: null,
        precisionPercent: 2,
        // The model never lets a non-positive diameter through; the table's CHECK is the second guard.
        diametersNm: [9, 10, -11],
        analysis,
      }),
    ).toThrow(/CHECK constraint/);
    expect(count('outcome_size_imports')).toBe(0);
    expect(count('outcome_diameters')).toBe(0);
  });

  it('a line scan is stored with every point, and a broken point rolls the scan back', () => {
    const scan = syntheticScan(
      {
        kind: 'alloy',
        centerNm: 10,
        radiusNm: 5,
        coreRadiusNm: 3,
        probeSigmaNm: 0.6,
        amplitudeA: 10,
        amplitudeB: 8,
        backgroundA: 5,
        backgroundB: 3,
        positionsNm: positions(0, 20, 0.5),
      },
      20,
      1,
    );
    const analysis = fitLineScan(scan, { elementA: 'Au', elementB: 'Pd' });
    const points = scan.positionsNm.map((positionNm, i) => ({
      positionNm,
      a: scan.signalA[i] as number,
      b: scan.signalB[i] as number,
    }));
    const base = {
      batchId,
      name: 'p1',
      sourceFile: null,
      elementA: 'Au',
      elementB: 'Pd',
      unit: 'counts' as const,
      probeSigmaNm: null,
      importNotes: [],
      analysis,
    };
    const stored = insertLineScan(store.db, { ...base, points });
    expect(stored.points).toEqual(points);
    expect(stored.analysis.chosenModel).toBe(analysis.chosenModel);
    const broken = [...points, { positionNm: 21, a: Number.NaN, b: 1 }];
    // SQLite stores NaN as NULL, so the NOT NULL column refuses the point and the transaction rolls back.
    expect(() => insertLineScan(store.db, { ...base, points: broken })).toThrow(/NOT NULL constraint failed/);
    expect(count('outcome_line_scans')).toBe(1);
    expect(count('outcome_line_scan_points')).toBe(points.length);
  });
});
