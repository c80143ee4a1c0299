/** The batch-design form: a campaign pair to start from, the sections, Compute, Reset and Save as planned. */
import type { FormEvent } from 'react';
import type { BatchSummary, CatalogReagent } from '../../../../shared-model/api/batches';
import type { CandidatePair } from '../../../../shared-model/api/pairs';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { AmountSection } from './AmountSection';
import { EXAMPLE_BATCH_FORM, withPair, withReducer, withRoute, type BatchFormState } from './batch-form';
import type { SetField } from './form-parts';
import { PairTargetSection } from './PairTargetSection';
import { ParticleSection } from './ParticleSection';
import { ReagentsSection } from './ReagentsSection';
import { SeedsSection } from './SeedsSection';

export interface BatchFormProps {
  form: BatchFormState;
  onForm: (change: (form: BatchFormState) => BatchFormState) => void;
  errors: Record<string, string>;
  general: string | null;
  catalog: CatalogReagent[];
  pairs: CandidatePair[];
  batches: BatchSummary[];
  name: string;
  onName: (name: string) => void;
  saved: string | null;
  onCompute: () => void;
  onSave: () => void;
}

export function BatchForm(props: BatchFormProps) {
  const { form, errors, onForm } = props;
  const set: SetField = (key) => (value) => onForm((f) => ({ ...f, [key]: value }));
  const section = { form, set, errors };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    props.onCompute();
  };
  const fillFromPair = (id: string) => {
    const pair = props.pairs.find((p) => String(p.id) === id);
    if (!pair) return;
    const { elementA, elementB, target } = pair;
    onForm((f) => withPair(f, { elementA, elementB, target }, props.catalog));
  };
  return (
    <form className="card batch-form" onSubmit={submit} aria-label="Batch design" noValidate>
      {props.pairs.length > 0 ? (
        <label className="field">
          <span className="field__label">From a campaign pair</span>
          <select aria-label="From a campaign pair" value="" onChange={(event) => fillFromPair(event.target.value)}>
            <option value="">choose…</option>
            {props.pairs.map((p) => (
              <option key={p.id} value={p.id}>
                {p.elementA}–{p.elementB} ({p.target})
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <PairTargetSection
        {...section}
        onRoute={(route) => onForm((f) => withRoute(f, route))}
        onPair={(change) => onForm((f) => withPair(f, change, props.catalog))}
      />
      <ParticleSection {...section} />
      {form.route === 'seed-mediated' ? <SeedsSection {...section} batches={props.batches} /> : null}
      <AmountSection {...section} />
      <ReagentsSection {...section} catalog={props.catalog} onReducer={(key) => onForm((f) => withReducer(f, key))} />
      <div className="form-actions">
        <button type="submit" className="button--primary">
          Compute
        </button>
        <button type="button" onClick={() => onForm(() => EXAMPLE_BATCH_FORM)}>
          Reset to example
        </button>
      </div>
      {props.general ? <Banner tone="error">{props.general}</Banner> : null}
      <div className="save-row">
        <Field label="Batch name" name="name" error={errors.name}>
          <input
            name="name"
            value={props.name}
            onChange={(e) => props.onName(e.target.value)}
            placeholder="e.g. PtNi-04 4 nm alloy"
          />
        </Field>
        <button type="button" onClick={props.onSave}>
          Save as planned batch
        </button>
      </div>
      {props.saved ? <Banner tone="info">{props.saved}</Banner> : null}
    </form>
  );
}
