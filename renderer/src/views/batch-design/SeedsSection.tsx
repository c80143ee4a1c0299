/** Seeds of a seed-mediated batch: a saved seed batch (its measured values are used) or typed values. */
import type { BatchSummary } from '../../../../shared-model/api/batches';
import { Field } from '../../components/Field';
import { DecimalInput, ElementSelect, Section, type SectionProps } from './form-parts';

export function SeedsSection({ form, set, errors, batches }: SectionProps & { batches: BatchSummary[] }) {
  const concLabel = form.seedConcKind === 'particles' ? 'Seeds per mL' : 'Seed metal (mM)';
  return (
    <Section title="Seeds">
      <Field
        label="Seed batch"
        name="seeds.seedBatchId"
        error={errors['seeds.seedBatchId']}
        hint="its measured size and concentration are used"
      >
        <select name="seeds.seedBatchId" value={form.seedBatchId} onChange={(e) => set('seedBatchId')(e.target.value)}>
          <option value="">none: type the seeds below</option>
          {batches
            .filter((b) => b.route !== 'seed-mediated')
            .map((b) => (
              <option key={b.id} value={b.id}>
                #{b.id} {b.name} ({b.status})
              </option>
            ))}
        </select>
      </Field>
      <Field label="Seed metal" name="seeds.metal" error={errors['seeds.metal']}>
        <ElementSelect
          name="seeds.metal"
          value={form.seedMetal || form.elementA}
          elements={[form.elementA, form.elementB]}
          onChange={set('seedMetal')}
        />
      </Field>
      {form.seedBatchId === '' ? (
        <>
          <Field label="Seed diameter (nm)" name="seeds.diameterNm" error={errors['seeds.diameterNm']}>
            <DecimalInput name="seeds.diameterNm" value={form.seedDiameterNm} onChange={set('seedDiameterNm')} />
          </Field>
          <Field label={concLabel} name="seeds.particlesPerMl" error={errors['seeds.particlesPerMl']}>
            <span className="input-with-unit">
              <DecimalInput name="seeds.particlesPerMl" value={form.seedConc} onChange={set('seedConc')} />
              <select
                aria-label="Seed concentration unit"
                value={form.seedConcKind}
                onChange={(e) => set('seedConcKind')(e.target.value as 'particles' | 'metal')}
              >
                <option value="particles">particles/mL</option>
                <option value="metal">metal mM</option>
              </select>
            </span>
          </Field>
        </>
      ) : null}
      <Field label="Seed volume used (mL)" name="seeds.volumeMl" error={errors['seeds.volumeMl']}>
        <DecimalInput name="seeds.volumeMl" value={form.seedVolumeMl} onChange={set('seedVolumeMl')} />
      </Field>
    </Section>
  );
}
