/** The one path from an operation name to its service (dispatch.ts), on a real SQLite file. */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openStore, type Store } from '../../db/store';
import { dispatch, runOperation, runOperationInTransaction } from '../../electron/services/dispatch';
import { DomainError } from '../../shared-model/api/result';
import { tempDataDir } from '../support/host-fixture';

let store: Store;
beforeEach(() => {
  store = openStore({ dataDir: tempDataDir() });
});
afterEach(() => store.close());

describe('runOperation and dispatch', () => {
  it('refuse bad input the same way: a DomainError thrown, an error value answered, both naming the field', async () => {
    const context = { store };
    const thrown = (() => {
      try {
        return runOperation(context, 'campaigns.create', { name: '' });
      } catch (error) {
        return error;
      }
    })();
    expect(thrown).toBeInstanceOf(DomainError);
    const error = thrown as DomainError;
    expect(error.field).toBe('name');
    const answered = await dispatch(context, 'campaigns.create', { name: '' });
    expect(answered).toEqual({ ok: false, error: { code: error.code, message: error.message, field: 'name' } });
  });

  it('runs several operations in one transaction, and a failing one rolls back the ones before it', () => {
    const context = { store };
    const campaigns = () => (store.db.prepare('SELECT count(*) AS n FROM campaigns').get() as { n: number }).n;
    expect(() =>
      store.db.transaction(() => {
        runOperationInTransaction(context, 'campaigns.create', { name: 'first' });
        runOperationInTransaction(context, 'campaigns.create', { name: 'first' });
      })(),
    ).toThrow(/a campaign named "first" already exists/);
    expect(campaigns()).toBe(0);
    const created = store.db.transaction(() => runOperationInTransaction(context, 'campaigns.create', { name: 'a' }))();
    expect(created.name).toBe('a');
    expect(campaigns()).toBe(1);
  });

  it('refuses to run "in a transaction" when none is open', () => {
    expect(() => runOperationInTransaction({ store }, 'campaigns.list', {})).toThrow(/needs an open transaction/);
  });
});
