/** The particle: how its size is given (alloy, core + shell, overall + shell, one metal) and its numbers. */
import { Field } from '../../components/Field';
import type { SizeKind } from './batch-form';
import { DecimalInput, ElementSelect, Section, type SectionProps } from './form-parts';

export function ParticleSection({ form, set, errors }: SectionProps) {
  const seedMode = form.route === 'seed-mediated';
  const kind = form.sizeKind;
  const overall = kind === 'core-shell-overall' && !seedMode;
  const hasShell = seedMode || kind === 'core-shell' || kind === 'core-shell-overall';
  return (
    <Section title="Particle">
      {!seedMode ? (
        <Field label="Size given as" name="size.kind" error={errors['size.kind']}>
          <select name="size.kind" value={kind} onChange={(e) => set('sizeKind')(e.target.value as SizeKind)}>
            <option value="alloy">alloy: diameter + composition</option>
            <option value="core-shell">core diameter + shell</option>
            <option value="core-shell-overall">overall diameter + shell</option>
            <option value="single-metal">one metal (seeds)</option>
          </select>
        </Field>
      ) : null}
      {!seedMode && kind !== 'core-shell' ? (
        <Field
          label={kind === 'core-shell-overall' ? 'Overall diameter (nm)' : 'Diameter (nm)'}
          name="size.diameterNm"
          error={errors['size.diameterNm']}
        >
          <DecimalInput name="size.diameterNm" value={form.diameterNm} onChange={set('diameterNm')} />
        </Field>
      ) : null}
      {!seedMode && kind === 'alloy' ? (
        <Field label={`Composition (at.% ${form.elementB || 'B'})`} name="size.xB" error={errors['size.xB']}>
          <DecimalInput name="size.xB" value={form.compositionPct} onChange={set('compositionPct')} />
        </Field>
      ) : null}
      {!seedMode && kind === 'single-metal' ? (
        <Field label="Metal" name="size.element" error={errors['size.element']}>
          <ElementSelect
            name="size.element"
            value={form.singleElement}
            elements={[form.elementA, form.elementB]}
            onChange={set('singleElement')}
          />
        </Field>
      ) : null}
      {!seedMode && kind === 'core-shell' ? (
        <Field label="Core diameter (nm)" name="size.coreDiameterNm" error={errors['size.coreDiameterNm']}>
          <DecimalInput name="size.coreDiameterNm" value={form.coreDiameterNm} onChange={set('coreDiameterNm')} />
        </Field>
      ) : null}
      {hasShell ? (
        <Field label={`Shell (${overall ? 'nm' : form.shellUnit})`} name="shell" error={errors.shell}>
          <span className="input-with-unit">
            <DecimalInput name="shell" value={form.shellValue} onChange={set('shellValue')} />
            {!overall ? (
              <select
                aria-label="Shell unit"
                value={form.shellUnit}
                onChange={(e) => set('shellUnit')(e.target.value as 'nm' | 'ML')}
              >
                <option value="ML">monolayers</option>
                <option value="nm">nm</option>
              </select>
            ) : null}
          </span>
        </Field>
      ) : null}
    </Section>
  );
}
