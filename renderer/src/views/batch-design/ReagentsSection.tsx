/** Catalog reagents of the batch: a precursor (and stock) per metal, reducer, capping agent, solvent. */
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import type { BatchFormState } from './batch-form';
import { Field } from '../../components/Field';
import { reducerExcessHint } from './batch-form';
import { DecimalInput, ReagentSelect, Section, type SectionProps } from './form-parts';

export function ReagentsSection(
  props: SectionProps & { catalog: CatalogReagent[]; onReducer: (reagentKey: string) => void },
) {
  const { form, set, errors, catalog } = props;
  const precursorsOf = (element: string) => catalog.filter((r) => r.metal?.symbol === element);
  const reducers = catalog.filter((r) => r.roles.includes('reducer'));
  const cappings = catalog.filter((r) => r.roles.includes('capping-agent'));
  const solvents = catalog.filter((r) => r.roles.includes('solvent'));
  const slots = [
    { slot: 'A' as const, element: form.elementA, key: form.precursorA, stock: form.stockA },
    { slot: 'B' as const, element: form.elementB, key: form.precursorB, stock: form.stockB },
  ];
  return (
    <Section title="Reagents">
      {errors.precursors ? (
        <p className="field__error field--wide" role="alert" data-error-for="precursors">
          {errors.precursors}
        </p>
      ) : null}
      {slots.map(({ slot, element, key, stock }) => (
        <div className="precursor-pair" key={slot}>
          <Field label={`${element || slot} precursor`} name={`precursor${slot}`} error={errors[`precursor${slot}`]}>
            <ReagentSelect
              name={`precursor${slot}`}
              value={key}
              onChange={set(slot === 'A' ? 'precursorA' : 'precursorB')}
              options={[
                ...precursorsOf(element),
                ...catalog.filter((r) => r.key === key && r.metal?.symbol !== element),
              ]}
              allowNone="none"
            />
          </Field>
          <Field label="Stock (mM)" name={`stock${slot}`} error={errors[`stock${slot}`]}>
            <DecimalInput name={`stock${slot}`} value={stock} onChange={set(slot === 'A' ? 'stockA' : 'stockB')} />
          </Field>
        </div>
      ))}
      <Field label="Reducer" name="reducer" error={errors.reducer}>
        <ReagentSelect
          name="reducer"
          value={form.reducerKey}
          onChange={props.onReducer}
          options={reducers}
          allowNone="none"
        />
      </Field>
      <Field
        label="Excess (× electron balance)"
        name="reducer.excess"
        error={errors['reducer.excess']}
        hint={reducerExcessHint(catalog.find((r) => r.key === form.reducerKey)) ?? undefined}
        wide
      >
        <DecimalInput name={'reducer.excess'} value={form.reducerExcess} onChange={set('reducerExcess')} />
      </Field>
      <Field label="Reducer stock (mM)" name="reducer.stockMm" error={errors['reducer.stockMm']}>
        <DecimalInput name={'reducer.stockMm'} value={form.reducerStock} onChange={set('reducerStock')} />
      </Field>
      <Field label="Capping agent" name="capping" error={errors.capping}>
        <ReagentSelect
          name="capping"
          value={form.cappingKey}
          onChange={set('cappingKey')}
          options={cappings}
          allowNone="none"
        />
      </Field>
      {form.cappingKey ? (
        <>
          <Field label="Capping amount given as" name="capping.amountKind">
            <select
              name="capping.amountKind"
              value={form.cappingAmountKind}
              onChange={(e) => set('cappingAmountKind')(e.target.value as BatchFormState['cappingAmountKind'])}
            >
              <option value="mol-per-mol-metal">mol per mol metal</option>
              <option value="final-mM">final mM in the batch</option>
            </select>
          </Field>
          <Field
            label={form.cappingAmountKind === 'final-mM' ? 'Capping final (mM)' : 'Capping (mol per mol metal)'}
            name="capping.molPerMolMetal"
            error={errors['capping.molPerMolMetal']}
          >
            <DecimalInput name={'capping.molPerMolMetal'} value={form.cappingRatio} onChange={set('cappingRatio')} />
          </Field>
          <Field label="Capping stock (mM)" name="capping.stockMm" error={errors['capping.stockMm']}>
            <DecimalInput name={'capping.stockMm'} value={form.cappingStock} onChange={set('cappingStock')} />
          </Field>
        </>
      ) : null}
      <Field label="Solvent" name="solvent" error={errors.solvent} hint="water makes up the volume if none">
        <ReagentSelect
          name="solvent"
          value={form.solventKey}
          onChange={set('solventKey')}
          options={solvents}
          allowNone="water (make-up)"
        />
      </Field>
      {form.solventKey ? (
        <Field label="Solvent volume (mL)" name="solvent.volumeMl" error={errors['solvent.volumeMl']}>
          <DecimalInput name={'solvent.volumeMl'} value={form.solventVolumeMl} onChange={set('solventVolumeMl')} />
        </Field>
      ) : null}
    </Section>
  );
}
