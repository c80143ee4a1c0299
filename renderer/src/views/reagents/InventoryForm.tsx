/** Add an amount of a catalog reagent to the inventory (with location and lot). */
import { useState, type FormEvent } from 'react';
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import { INVENTORY_UNITS, type InventoryUnit } from '../../../../shared-model/recipes/reagent-list';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { EMPTY_INVENTORY_FORM, readInventoryForm, type InventoryFormState } from './inventory-form';

export function InventoryForm(props: { catalog: CatalogReagent[]; onSaved: () => void }) {
  const [form, setForm] = useState<InventoryFormState>(EMPTY_INVENTORY_FORM);
  const set = <K extends keyof InventoryFormState>(key: K, value: InventoryFormState[K]) =>
    setForm((f) => ({ ...f, [key]: value }));
  const { errors, general, show, clear } = useFieldErrors();
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const reading = readInventoryForm(form);
    if (!reading.ok) {
      show(reading.error);
      return;
    }
    const result = await call('inventory.upsert', reading.value);
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    setForm((f) => ({ ...f, amount: '', lot: '' }));
    props.onSaved();
  };
  return (
    <form className="form-grid no-print" onSubmit={submit} aria-label="Add to inventory" noValidate>
      <Field label="Reagent" name="reagentKey" error={errors.reagentKey}>
        <select name="reagentKey" value={form.reagentKey} onChange={(e) => set('reagentKey', e.target.value)}>
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
          <input
            name="amount"
            inputMode="decimal"
            value={form.amount}
            onChange={(e) => set('amount', e.target.value)}
          />
          <select
            aria-label="Unit"
            name="unit"
            value={form.unit}
            onChange={(e) => set('unit', e.target.value as InventoryUnit)}
          >
            {INVENTORY_UNITS.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </select>
        </span>
      </Field>
      <Field label="Location" name="location" error={errors.location}>
        <input name="location" value={form.location} onChange={(e) => set('location', e.target.value)} />
      </Field>
      <Field label="Lot" name="lot" error={errors.lot}>
        <input name="lot" value={form.lot} onChange={(e) => set('lot', e.target.value)} />
      </Field>
      <div className="form-actions">
        <button type="submit">Add to inventory</button>
      </div>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </form>
  );
}
