/** How much: total metal or particle concentration (not for seeded growth), batch volume, temperature. */
import { Field } from '../../components/Field';
import type { BatchFormState } from './batch-form';
import { DecimalInput, Section, type SectionProps } from './form-parts';

export function AmountSection({ form, set, errors }: SectionProps) {
  return (
    <Section title="Amount">
      {form.route !== 'seed-mediated' ? (
        <Field
          label={form.amountKind === 'total-metal' ? 'Total metal (mmol)' : 'Particles per mL'}
          name="amount"
          error={errors.amount}
        >
          <span className="input-with-unit">
            <DecimalInput name="amount" value={form.amountValue} onChange={set('amountValue')} />
            <select
              aria-label="Amount given as"
              value={form.amountKind}
              onChange={(e) => set('amountKind')(e.target.value as BatchFormState['amountKind'])}
            >
              <option value="total-metal">mmol metal</option>
              <option value="particle-concentration">particles/mL</option>
            </select>
          </span>
        </Field>
      ) : null}
      <Field label="Batch volume (mL)" name="batchVolumeMl" error={errors.batchVolumeMl}>
        <DecimalInput name="batchVolumeMl" value={form.batchVolumeMl} onChange={set('batchVolumeMl')} />
      </Field>
      <Field label="Highest temperature (°C)" name="temperatureC" error={errors.temperatureC} hint="default by route">
        <DecimalInput name="temperatureC" value={form.temperatureC} onChange={set('temperatureC')} />
      </Field>
    </Section>
  );
}
