/**
 * Reagents: pick planned batches → totals per reagent against the inventory (shortfalls highlighted),
 * hazard summary across the list, CSV export and a printable page; the inventory and the catalog are
 * edited here too.
 */
import { useMemo, useState, type FormEvent } from 'react';
import type { CatalogReagent } from '../../../shared-model/api/batches';
import { HAZARD_TAGS } from '../../../shared-model/hazards/incompatibilities';
import { WASTE_STREAMS } from '../../../shared-model/hazards/waste';
import { REDUCTION_COUPLES } from '../../../shared-model/recipes/potentials';
import { REAGENT_FORMS, REAGENT_ROLES, type ReagentInput } from '../../../shared-model/recipes/reagent';
import { INVENTORY_UNITS, type InventoryUnit } from '../../../shared-model/recipes/reagent-list';
import { REDUCER_HALF_REACTIONS } from '../../../shared-model/recipes/reducers';
import { call, printPage } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { formatNumber } from './BatchResult';
import { HazardBlock } from './HazardBlock';
import './batches.css';

function downloadText(filename: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv;charset=utf-8' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function InventoryForm(props: { catalog: CatalogReagent[]; onSaved: () => void }) {
  const [reagentKey, setReagentKey] = useState('');
  const [amount, setAmount] = useState('');
  const [unit, setUnit] = useState<InventoryUnit>('g');
  const [location, setLocation] = useState('');
  const [lot, setLot] = useState('');
  const { errors, general, show, clear } = useFieldErrors();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const number = amount.trim() === '' ? Number.NaN : Number(amount.replace(',', '.'));
    const result = await call('inventory.upsert', { reagentKey, amount: number, unit, location, lot });
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    setAmount('');
    setLot('');
    props.onSaved();
  };
  return (
    <form className="form-grid no-print" onSubmit={submit} aria-label="Add to inventory" noValidate>
      <Field label="Reagent" name="reagentKey" error={errors.reagentKey}>
        <select name="reagentKey" value={reagentKey} onChange={(e) => setReagentKey(e.target.value)}>
          <option value="">choose…</option>
          {props.catalog.map((r) => (
            <option key={r.key} value={r.key}>
              {r.name}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Amount on hand" name="amount" error={errors.amount}>
        <span className="input-with-unit">
          <input name="amount" inputMode="decimal" value={amount} onChange={(e) => setAmount(e.target.value)} />
          <select aria-label="Unit" name="unit" value={unit} onChange={(e) => setUnit(e.target.value as InventoryUnit)}>
            {INVENTORY_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </span>
      </Field>
      <Field label="Location" name="location" error={errors.location}>
        <input name="location" value={location} onChange={(e) => setLocation(e.target.value)} />
      </Field>
      <Field label="Lot" name="lot" error={errors.lot}>
        <input name="lot" value={lot} onChange={(e) => setLot(e.target.value)} />
      </Field>
      <div className="form-actions">
        <button type="submit">Add to inventory</button>
      </div>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </form>
  );
}

const EMPTY_REAGENT = {
  key: '',
  name: '',
  formula: '',
  role: 'metal-precursor',
  form: 'solid',
  assayWtPct: '100',
  densityGPerMl: '',
  metalSymbol: '',
  oxidationState: '',
  coupleId: '',
  reducerHalfReactionId: '',
  hCodes: '',
  signalWord: '',
  tags: '',
  wasteStream: 'precious-metal-recovery',
  notes: '',
};
type ReagentFormState = typeof EMPTY_REAGENT;

function fromCatalog(r: CatalogReagent): ReagentFormState {
  return {
    key: r.key,
    name: r.name,
    formula: r.formula,
    role: r.roles[0] ?? 'additive',
    form: r.form,
    assayWtPct: String(r.assayWtPct),
    densityGPerMl: r.densityGPerMl ? String(r.densityGPerMl) : '',
    metalSymbol: r.metal?.symbol ?? '',
    oxidationState: r.metal ? String(r.metal.oxidationState) : '',
    coupleId: r.metal?.coupleId ?? '',
    reducerHalfReactionId: r.reducerHalfReactionId ?? '',
    hCodes: r.hCodes.join(' '),
    signalWord: r.signalWord ?? '',
    tags: r.tags.join(' '),
    wasteStream: r.wasteStream,
    notes: r.notes,
  };
}

function CatalogEditor(props: { catalog: CatalogReagent[]; onSaved: () => void }) {
  const [f, setF] = useState<ReagentFormState>(EMPTY_REAGENT);
  const [editing, setEditing] = useState<CatalogReagent | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { errors, general, show, clear } = useFieldErrors();
  const set = (key: keyof ReagentFormState) => (value: string) => setF((s) => ({ ...s, [key]: value }));
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const roles = editing ? [f.role, ...editing.roles.filter((r) => r !== f.role)] : [f.role];
    const input: Partial<ReagentInput> & Record<string, unknown> = {
      key: f.key,
      name: f.name,
      formula: f.formula,
      roles: roles as ReagentInput['roles'],
      form: f.form as ReagentInput['form'],
      assayWtPct: Number(f.assayWtPct),
      densityGPerMl: f.densityGPerMl.trim() === '' ? null : Number(f.densityGPerMl),
      metal: f.metalSymbol.trim() === '' ? null : { symbol: f.metalSymbol.trim(), oxidationState: Number(f.oxidationState), coupleId: f.coupleId === '' ? null : f.coupleId },
      reducerHalfReactionId: f.reducerHalfReactionId === '' ? null : f.reducerHalfReactionId,
      hCodes: f.hCodes.split(/[\s,]+/).filter((c) => c.length > 0),
      signalWord: f.signalWord === '' ? null : (f.signalWord as 'Danger' | 'Warning'),
      tags: f.tags.split(/[\s,]+/).filter((t) => t.length > 0) as ReagentInput['tags'],
      wasteStream: f.wasteStream as ReagentInput['wasteStream'],
      notes: f.notes,
      ...(editing ? { stockFreshnessHours: editing.stockFreshnessHours ?? null, metalContentWtPct: editing.metalContentWtPct ?? null, amountUnitNote: editing.amountUnitNote ?? null, source: editing.source } : {}),
    };
    const result = editing ? await call('reagents.edit', input as ReagentInput) : await call('reagents.add', input as ReagentInput);
    if (!result.ok) {
      show(result.error, { 'metal.symbol': 'metalSymbol', 'metal.oxidationState': 'oxidationState', 'metal.coupleId': 'coupleId', metal: 'metalSymbol', roles: 'role' });
      return;
    }
    clear();
    setDone(`${editing ? 'Saved revision' : 'Added'} ${result.value.revision} of ${result.value.name} (${formatNumber(result.value.molarMassGPerMol, 6)} g/mol).`);
    setEditing(null);
    setF(EMPTY_REAGENT);
    props.onSaved();
  };
  return (
    <details className="card no-print catalog-editor">
      <summary>Catalog: add or edit a reagent</summary>
      <label className="field">
        <span className="field__label">Edit an existing reagent</span>
        <select
          aria-label="Edit an existing reagent"
          value={editing?.key ?? ''}
          onChange={(e) => {
            const found = props.catalog.find((r) => r.key === e.target.value) ?? null;
            setEditing(found);
            setF(found ? fromCatalog(found) : EMPTY_REAGENT);
            clear();
          }}
        >
          <option value="">new reagent</option>
          {props.catalog.map((r) => (
            <option key={r.key} value={r.key}>
              {r.name} (rev. {r.revision})
            </option>
          ))}
        </select>
      </label>
      <form className="form-grid" onSubmit={submit} aria-label="Catalog reagent" noValidate>
        <Field label="Key" name="key" error={errors.key} hint="lower-case, e.g. k2pdcl4">
          <input name="key" value={f.key} onChange={(e) => set('key')(e.target.value)} readOnly={editing !== null} />
        </Field>
        <Field label="Name" name="name" error={errors.name}>
          <input name="name" value={f.name} onChange={(e) => set('name')(e.target.value)} />
        </Field>
        <Field label="Formula" name="formula" error={errors.formula} hint="hydrates as HAuCl4·3H2O">
          <input name="formula" value={f.formula} onChange={(e) => set('formula')(e.target.value)} />
        </Field>
        <Field label="Role" name="role" error={errors.role}>
          <select name="role" value={f.role} onChange={(e) => set('role')(e.target.value)}>
            {REAGENT_ROLES.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Form" name="form" error={errors.form}>
          <select name="form" value={f.form} onChange={(e) => set('form')(e.target.value)}>
            {REAGENT_FORMS.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Assay (wt %)" name="assayWtPct" error={errors.assayWtPct}>
          <input name="assayWtPct" value={f.assayWtPct} onChange={(e) => set('assayWtPct')(e.target.value)} />
        </Field>
        <Field label="Density (g/mL)" name="densityGPerMl" error={errors.densityGPerMl}>
          <input name="densityGPerMl" value={f.densityGPerMl} onChange={(e) => set('densityGPerMl')(e.target.value)} />
        </Field>
        <Field label="Metal" name="metalSymbol" error={errors.metalSymbol}>
          <input name="metalSymbol" value={f.metalSymbol} onChange={(e) => set('metalSymbol')(e.target.value)} />
        </Field>
        <Field label="Oxidation state" name="oxidationState" error={errors.oxidationState}>
          <input name="oxidationState" value={f.oxidationState} onChange={(e) => set('oxidationState')(e.target.value)} />
        </Field>
        <Field label="Reduction couple" name="coupleId" error={errors.coupleId}>
          <select name="coupleId" value={f.coupleId} onChange={(e) => set('coupleId')(e.target.value)}>
            <option value="">none</option>
            {Object.values(REDUCTION_COUPLES).map((c) => (
              <option key={c.id} value={c.id}>
                {c.halfReaction} ({c.eStandardV.toFixed(3)} V)
              </option>
            ))}
          </select>
        </Field>
        <Field label="Reducer half-reaction" name="reducerHalfReactionId" error={errors.reducerHalfReactionId}>
          <select name="reducerHalfReactionId" value={f.reducerHalfReactionId} onChange={(e) => set('reducerHalfReactionId')(e.target.value)}>
            <option value="">none</option>
            {Object.values(REDUCER_HALF_REACTIONS).map((h) => (
              <option key={h.id} value={h.id}>
                {h.halfReaction}
              </option>
            ))}
          </select>
        </Field>
        <Field label="H-codes" name="hCodes" error={errors.hCodes} hint="e.g. H302 H317">
          <input name="hCodes" value={f.hCodes} onChange={(e) => set('hCodes')(e.target.value)} />
        </Field>
        <Field label="Signal word" name="signalWord" error={errors.signalWord}>
          <select name="signalWord" value={f.signalWord} onChange={(e) => set('signalWord')(e.target.value)}>
            <option value="">none</option>
            <option value="Warning">Warning</option>
            <option value="Danger">Danger</option>
          </select>
        </Field>
        <Field label="Incompatibility tags" name="tags" error={errors.tags} hint={HAZARD_TAGS.join(' ')}>
          <input name="tags" value={f.tags} onChange={(e) => set('tags')(e.target.value)} />
        </Field>
        <Field label="Waste stream" name="wasteStream" error={errors.wasteStream}>
          <select name="wasteStream" value={f.wasteStream} onChange={(e) => set('wasteStream')(e.target.value)}>
            {Object.values(WASTE_STREAMS).map((w) => (
              <option key={w.id} value={w.id}>
                {w.label}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Notes" name="notes" error={errors.notes} wide>
          <input name="notes" value={f.notes} onChange={(e) => set('notes')(e.target.value)} />
        </Field>
        <div className="form-actions">
          <button type="submit" className="button--primary">
            {editing ? 'Save new revision' : 'Add reagent'}
          </button>
        </div>
        {general ? <Banner tone="error">{general}</Banner> : null}
        {done ? <Banner tone="info">{done}</Banner> : null}
      </form>
      <p className="muted small">Hazard data you enter are your typical classification; verify them with your supplier's SDS. Saved batches keep the values they were computed with.</p>
    </details>
  );
}

export function ReagentsView() {
  const { revision, bumpRevision } = useAppState();
  const [showAll, setShowAll] = useState(false);
  const batchesQuery = useQuery('batches.list', showAll ? {} : { status: 'planned' }, `reagents-batches:${showAll}:${revision}`);
  const catalogQuery = useQuery('reagents.catalog', {}, `reagents-catalog:${revision}`);
  const inventoryQuery = useQuery('inventory.list', {}, `inventory:${revision}`);
  const [selected, setSelected] = useState<number[]>([]);
  const visibleIds = useMemo(() => new Set((batchesQuery.data ?? []).map((b) => b.id)), [batchesQuery.data]);
  const chosen = selected.filter((id) => visibleIds.has(id));
  const listQuery = useQuery('reagents.list', chosen.length > 0 ? { batchIds: chosen } : null, `reagent-list:${chosen.join(',')}:${revision}`);
  const [message, setMessage] = useState<string | null>(null);
  const list = listQuery.data;

  const toggle = (id: number) => setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : [...s, id]));
  const exportCsv = async () => {
    const result = await call('reagents.csv', { batchIds: chosen });
    if (!result.ok) {
      setMessage(result.error.message);
      return;
    }
    downloadText(result.value.filename, result.value.csv);
    setMessage(`Exported ${result.value.filename}.`);
  };
  const print = async () => {
    try {
      const savedTo = await printPage(`pairwright-reagents-${chosen.join('-')}.pdf`);
      setMessage(savedTo ? `Saved ${savedTo}.` : null);
    } catch (error) {
      setMessage(error instanceof Error ? error.message : String(error));
    }
  };
  const removeItem = async (id: number) => {
    const result = await call('inventory.remove', { id });
    if (!result.ok) setMessage(result.error.message);
    else bumpRevision();
  };

  return (
    <section className="view reagents-view" aria-labelledby="reagents-title">
      <header className="view__header">
        <h1 id="reagents-title">Reagents</h1>
        <span className="muted">Totals for the batches you choose, against your inventory</span>
      </header>
      <div className="split">
        <div className="split__side no-print">
          <section className="card" aria-label="Choose batches">
            <h2 className="card__title">Batches</h2>
            <label className="toggle">
              <input type="checkbox" checked={showAll} onChange={(e) => setShowAll(e.target.checked)} /> include made and characterized
            </label>
            {batchesQuery.error ? <Banner tone="error">{batchesQuery.error.message}</Banner> : null}
            {(batchesQuery.data ?? []).length === 0 ? <p className="muted">No {showAll ? '' : 'planned '}batches. Save one in Batch design.</p> : null}
            <ul className="batch-picker">
              {(batchesQuery.data ?? []).map((b) => (
                <li key={b.id}>
                  <label>
                    <input type="checkbox" checked={selected.includes(b.id)} onChange={() => toggle(b.id)} aria-label={`Batch ${b.id} ${b.name}`} /> #{b.id} {b.name}{' '}
                    <span className="muted small">
                      {b.elementA}–{b.elementB}, {b.status}
                    </span>
                  </label>
                </li>
              ))}
            </ul>
          </section>
          <section className="card" aria-label="Inventory">
            <h2 className="card__title">Inventory</h2>
            <InventoryForm catalog={catalogQuery.data ?? []} onSaved={bumpRevision} />
            <table className="data-table" aria-label="Inventory entries">
              <tbody>
                {(inventoryQuery.data ?? []).map((item) => (
                  <tr key={item.id}>
                    <td>{item.reagentName}</td>
                    <td className="num">
                      {item.amount} {item.unit}
                    </td>
                    <td className="muted small">
                      {item.location}
                      {item.lot ? ` · lot ${item.lot}` : ''}
                    </td>
                    <td>
                      <button type="button" className="button--quiet" onClick={() => void removeItem(item.id)} aria-label={`Remove ${item.reagentName} ${item.lot}`}>
                        Remove
                      </button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </section>
        </div>

        <div className="stack printable">
          <section className="card" aria-label="Reagent list">
            <div className="card__header">
              <h2 className="card__title">Reagent list{chosen.length > 0 ? ` for batches ${chosen.map((id) => `#${id}`).join(', ')}` : ''}</h2>
              <span className="no-print card__actions">
                <button type="button" onClick={() => void exportCsv()} disabled={chosen.length === 0}>
                  Export CSV
                </button>
                <button type="button" onClick={() => void print()} disabled={chosen.length === 0}>
                  Print / PDF
                </button>
              </span>
            </div>
            {message ? (
              <div className="no-print">
                <Banner tone="info">{message}</Banner>
              </div>
            ) : null}
            {listQuery.error ? <Banner tone="error">{listQuery.error.message}</Banner> : null}
            {!list ? (
              <p className="muted">Tick the batches you will make to total their reagents.</p>
            ) : (
              <table className="data-table" aria-label="Reagent totals">
                <thead>
                  <tr>
                    <th>Reagent</th>
                    <th>Formula</th>
                    <th className="num">Total mg</th>
                    <th className="num">Total mL</th>
                    <th>On hand</th>
                    <th>Location · lot</th>
                    <th className="num">Short by (mg)</th>
                    <th>Status</th>
                  </tr>
                </thead>
                <tbody>
                  {list.lines.map((line) => (
                    <tr key={line.key} className={line.status === 'short' ? 'row--short' : undefined} data-reagent={line.key} data-status={line.status}>
                      <td>
                        {line.name}
                        <div className="muted small">
                          {line.roles.join(', ')} · batches {line.batchIds.map((id) => `#${id}`).join(' ')}
                        </div>
                      </td>
                      <td>{line.formula}</td>
                      <td className="num">{formatNumber(line.totalMassMg)}</td>
                      <td className="num">{formatNumber(line.totalVolumeMl)}</td>
                      <td>{line.onHandText || '—'}</td>
                      <td className="small">
                        {line.locations.join('; ')}
                        {line.lots.length ? ` · ${line.lots.join('; ')}` : ''}
                      </td>
                      <td className="num">{line.shortfallMg ? formatNumber(line.shortfallMg) : ''}</td>
                      <td>{line.status}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </section>
          {list ? <HazardBlock summary={list.hazardSummary} title="Hazard summary across the list" perReagent /> : null}
          <CatalogEditor catalog={catalogQuery.data ?? []} onSaved={bumpRevision} />
        </div>
      </div>
    </section>
  );
}
