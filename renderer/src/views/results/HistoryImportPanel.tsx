/**
 * Results → Import history: paste or pick a history table (pair, xB_at_pct, diameter_nm, temperature_k, route,
 * observed[, made_on, notes]) and import it into the current campaign (all rows or none). A refused table
 * lists each bad cell with its line, column and value; the same table a second time asks before adding every
 * row again; the imported tables are listed, each removable after a question. The form's model is
 * history-import-form.ts.
 */
import { useState, type FormEvent } from 'react';
import { call } from '../../api/client';
import { useQuery } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { ConfirmDialog } from '../../components/ConfirmDialog';
import { Field } from '../../components/Field';
import { CsvFileField } from './CsvFileField';
import {
  EMPTY_HISTORY_IMPORT,
  importDoneText,
  importedTables,
  importErrorLines,
  isDuplicateRefusal,
  readHistoryImport,
  removeQuestion,
  type HistoryImportFormState,
  type ImportedTableRow,
} from './history-import-form';

export function HistoryImportPanel(props: { campaignId: number; revision: number; onChanged: () => void }) {
  const [form, setForm] = useState<HistoryImportFormState>(EMPTY_HISTORY_IMPORT);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [duplicate, setDuplicate] = useState<string | null>(null);
  const [removing, setRemoving] = useState<ImportedTableRow | null>(null);
  // Bumped after an import so the file input is new and picking the same file again reads it again.
  const [imports, setImports] = useState(0);
  const history = useQuery('learn.history', { campaignId: props.campaignId }, `${props.campaignId}:${props.revision}`);
  const tables = history.data ? importedTables(history.data.imports, history.data.outcomes) : [];

  const runImport = async (allowDuplicates: boolean) => {
    setDone(null);
    const reading = readHistoryImport(form, props.campaignId, allowDuplicates);
    if (!reading.ok) {
      setError(reading.error.message);
      return;
    }
    const result = await call('learn.importHistory', reading.input);
    if (!result.ok) {
      if (!allowDuplicates && isDuplicateRefusal(result.error)) {
        setError(null);
        setDuplicate(result.error.message);
        return;
      }
      setError(result.error.message);
      return;
    }
    setError(null);
    setDone(importDoneText(result.value));
    setForm(EMPTY_HISTORY_IMPORT);
    setImports((n) => n + 1);
    props.onChanged();
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    void runImport(false);
  };

  const remove = async (row: ImportedTableRow) => {
    setRemoving(null);
    const result = await call('learn.removeImport', { importId: row.summary.id });
    if (!result.ok) {
      setError(result.error.message);
      return;
    }
    setDone(`Removed ${row.summary.fileName ?? 'the pasted table'} (${result.value} table, its rows with it).`);
    props.onChanged();
  };

  const errorParts = error ? importErrorLines(error) : null;
  return (
    <section className="card" aria-label="Import history">
      <h2 className="card__title">Import history</h2>
      <p className="muted small">
        A table of past syntheses with a header row: <code>pair</code> (Pt-Ni), <code>xB_at_pct</code> (at.% of the
        second element), <code>diameter_nm</code>, <code>temperature_k</code>, <code>route</code> (co-reduction,
        seed-mediated, polyol, oleylamine), <code>observed</code> (alloy, surface-enriched alloy, Ni@Pt, Janus,
        intermetallic, hollow, other, or failed) and optionally <code>made_on</code> (YYYY-MM-DD) and <code>notes</code>
        . Commas, semicolons or tabs; decimal commas with semicolons or tabs. Every row becomes an outcome of this
        campaign, or none does.
      </p>
      <form className="form-grid" onSubmit={submit} aria-label="Import history table" noValidate>
        <Field label="History table (CSV)" name="csvText" wide>
          <textarea
            className="csv-input"
            name="csvText"
            value={form.csvText}
            onChange={(event) => setForm({ csvText: event.target.value, fileName: null })}
            spellCheck={false}
          />
        </Field>
        <CsvFileField
          key={imports}
          name="historyFile"
          onPicked={(file) => setForm({ csvText: file.text, fileName: file.name })}
        />
        <div className="form-actions field--wide">
          <button type="submit" className="button--primary">
            Import history
          </button>
          {form.fileName ? <span className="small muted">from {form.fileName}</span> : null}
        </div>
      </form>
      {errorParts ? (
        <div className="banner banner--error" role="alert" data-testid="history-errors">
          {errorParts.lead ? <p>{errorParts.lead}:</p> : null}
          <ul>
            {errorParts.lines.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </div>
      ) : null}
      {done ? (
        <Banner tone="info" testId="history-done">
          {done}
        </Banner>
      ) : null}
      {history.error ? <Banner tone="error">{history.error.message}</Banner> : null}
      <h3 className="card__title">Imported tables</h3>
      {history.data && tables.length === 0 ? (
        <p className="muted">No history imported into this campaign yet.</p>
      ) : null}
      {tables.length > 0 ? (
        <table className="data-table" aria-label="Imported history tables">
          <thead>
            <tr>
              <th>Table</th>
              <th>Made on</th>
              <th>Observed</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {tables.map((row) => (
              <tr key={row.summary.id} data-import-id={row.summary.id}>
                <td>{row.title}</td>
                <td>{row.dates ?? '–'}</td>
                <td className="small">{row.labels}</td>
                <td>
                  <button type="button" className="button--quiet" onClick={() => setRemoving(row)}>
                    Remove
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {duplicate ? (
        <ConfirmDialog
          title="Import the same table again?"
          message={`${duplicate}. Import anyway?`}
          confirmLabel="Import again (duplicates)"
          onConfirm={() => {
            setDuplicate(null);
            void runImport(true);
          }}
          onCancel={() => setDuplicate(null)}
        />
      ) : null}
      {removing ? (
        <ConfirmDialog
          title="Remove this history table?"
          message={removeQuestion(removing)}
          confirmLabel="Remove table"
          onConfirm={() => void remove(removing)}
          onCancel={() => setRemoving(null)}
        />
      ) : null}
    </section>
  );
}
