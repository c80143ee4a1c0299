/** Pair, target architecture and route. */
import { ROUTE_LABELS, ROUTES, type SynthesisRoute } from '../../../../shared-model/recipes/design-input';
import { Field } from '../../components/Field';
import { targetChoices } from '../PairsPanel';
import { Section, type SectionProps } from './form-parts';

export function PairTargetSection(
  props: SectionProps & {
    onRoute: (route: SynthesisRoute) => void;
    /** A new element A or B (the precursors follow the pair). */
    onPair: (change: { elementA?: string; elementB?: string }) => void;
  },
) {
  const { form, set, errors } = props;
  const targets = targetChoices(form.elementA, form.elementB);
  return (
    <Section title="Pair and target">
      <Field label="Element A" name="elementA" error={errors.elementA}>
        <input
          name="elementA"
          value={form.elementA}
          onChange={(e) => props.onPair({ elementA: e.target.value.trim() })}
        />
      </Field>
      <Field label="Element B" name="elementB" error={errors.elementB}>
        <input
          name="elementB"
          value={form.elementB}
          onChange={(e) => props.onPair({ elementB: e.target.value.trim() })}
        />
      </Field>
      <Field label="Target" name="target" error={errors.target}>
        <select name="target" value={form.target} onChange={(e) => set('target')(e.target.value)}>
          {(targets.includes(form.target) ? targets : [form.target, ...targets]).map((t) => (
            <option key={t} value={t}>
              {t}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Route" name="route" error={errors.route} wide>
        <select name="route" value={form.route} onChange={(e) => props.onRoute(e.target.value as SynthesisRoute)}>
          {ROUTES.map((r) => (
            <option key={r} value={r}>
              {ROUTE_LABELS[r]}
            </option>
          ))}
        </select>
      </Field>
    </Section>
  );
}
