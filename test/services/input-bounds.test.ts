/**
 * Absurd inputs get a field message through dispatch, never an internal error: denormal temperatures, extreme
 * probe widths and cut-offs, NUL in names, an atom count that would size a huge array, two atoms at one place.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import { dispatch } from '../../electron/services/dispatch';
import { tempDataDir } from '../support/host-fixture';
import { dumpTables } from '../support/table-dump';

let store: Store;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
});
afterEach(() => store.close());

async function refusal(name: string, input: unknown): Promise<{ code: string; field?: string; message: string }> {
  const result = await dispatch({ store }, name, input);
  if (result.ok) throw new Error(`${name} accepted ${JSON.stringify(input).slice(0, 200)}`);
  return result.error;
}

describe('input bounds and odd values', () => {
  it('refuses denormal and absurd temperatures, naming the field', async () => {
    expect(
      await refusal('prediction.predict', {
        pair: 'Au-Pd',
        conditions: { xB: 0.5, diameterNm: 5, temperatureK: 5e-324 },
      }),
    ).toMatchObject({
      code: 'invalid_input',
      field: 'conditions.temperatureK',
    });
    const mc = { elementA: 'Ag', elementB: 'Pd', xB: 0.5, shape: 'cuboctahedron', shells: 2, sweeps: 10 };
    const start = await refusal('simulation.start', { ...mc, temperatureK: 5e-324 });
    expect(start).toMatchObject({ code: 'invalid_input', field: 'temperatureK' });
    expect(start.message).toMatch(/at least 1 K/);
  });

  it('refuses extreme probe widths and cut-offs', async () => {
    const xyz = '2\nProperties=species:S:1:pos:R:3\nAu 0 0 0\nAu 0 0 2.885\n';
    expect(await refusal('simulation.energy', { xyz, cutoffAngstrom: 100 })).toMatchObject({ field: 'cutoffAngstrom' });
    expect(await refusal('outcomes.refitLineScan', { id: 1, probeSigmaNm: 1e-6 })).toMatchObject({
      field: 'probeSigmaNm',
    });
    expect(await refusal('outcomes.refitLineScan', { id: 1, probeSigmaNm: 1e6 })).toMatchObject({
      field: 'probeSigmaNm',
    });
  });

  it('refuses NUL characters in names with a field message and stores nothing', async () => {
    const before = dumpTables(store.db);
    const error = await refusal('campaigns.create', { name: 'Pt\u0000Ni' });
    expect(error).toMatchObject({ code: 'invalid_input', field: 'name' });
    expect(error.message).toMatch(/control characters such as NUL/);
    expect(dumpTables(store.db)).toEqual(before);
  });

  it('refuses an atom count larger than the file before sizing any array', async () => {
    const error = await refusal('simulation.energy', { xyz: '100000000000\n\nAu 0 0 0\n' });
    expect(error).toMatchObject({ code: 'invalid_input', field: 'xyz' });
    expect(error.message).toMatch(/expected 100000000000 atom lines, the file has at most \d+/);
  });

  it('reports two atoms at the same position, naming both lines', async () => {
    const error = await refusal('simulation.energy', { xyz: '3\n\nAu 0 0 0\nAu 0 0 2.885\nPd 0 0 0.00001\n' });
    expect(error).toMatchObject({ code: 'invalid_input', field: 'xyz' });
    expect(error.message).toMatch(/lines 3 and 5: two atoms at the same position/);
  });
});
