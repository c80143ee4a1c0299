/**
 * The catalog editor: add a reagent, or pick one and save a new revision of it (saved batches keep the
 * values they were computed with). Its form model is reagent-form.ts.
 */
import { useState, type FormEvent } from 'react';
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import { HAZARD_TAGS } from '../../../../shared-model/hazards/incompatibilities';
import { WASTE_STREAMS } from '../../../../shared-model/hazards/waste';
import { REDUCTION_COUPLES } from '../../../../shared-model/recipes/potentials';
import { REAGENT_FORMS, REAGENT_ROLES } from '../../../../shared-model/recipes/reagent';
import { REDUCER_HALF_REACTIONS } from '../../../../shared-model/recipes/reducers';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { formatNumber } from '../../../../shared-model/text/number-format';
import {
  EMPTY_REAGENT,
  fromCatalog,
  readReagentForm,
  REAGENT_FIELD_ALIASES,
  type ReagentFormState,
} from './reagent-form';

export function CatalogEditor(props: { catalog: CatalogReagent[]; onSaved: () => void }) {
  const [f, setF] = useState<ReagentFormState>(EMPTY_REAGENT);
  const [editing, setEditing] = useState<CatalogReagent | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const { errors, general, show, clear } = useFieldErrors();
  const set = (key: keyof ReagentFormState) => (value: string) => setF((s) => ({ ...s, [key]: value }));
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const reading = readReagentForm(f, editing);
    if (!reading.ok) {
      show(reading.error);
      return;
    }
    const result = editing ? await call('reagents.edit', reading.value) : await call('reagents.add', reading.value);
    if (!result.ok) {
      show(result.error, REAGENT_FIELD_ALIASES);
      return;
    }
    clear();
    const molarMass = formatNumber(result.value.molarMassGPerMol, 6);
    setDone(
      `${editing ? 'Saved revision' : 'Added'} ${result.value.revision} of ${result.value.name} (${molarMass} g/mol).`,
    );
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
          <input
            name="oxidationState"
            value={f.oxidationState}
            onChange={(e) => set('oxidationState')(e.target.value)}
          />
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
          <select
            name="reducerHalfReactionId"
            value={f.reducerHalfReactionId}
            onChange={(e) => set('reducerHalfReactionId')(e.target.value)}
          >
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
      <p className="muted small">
        Hazard data you enter are your typical classification; verify them with your supplier's SDS. Saved batches keep
        the values they were computed with.
      </p>
    </details>
  );
}
