/**
 * The conditions bar shared by the prediction views: composition (at.% of B), diameter, shape,
 * temperature, facet. Values are kept as typed text; `conditions` is null while a field does not parse,
 * and `errors` holds the message for the field at fault (shown under it). Reading and range checks are
 * in the pure model conditions-form.ts (the contract's zod schema, so the UI and the API say the same
 * thing). The typed values are kept for the browser tab (sessionStorage), so both prediction views and
 * the pair detail share them.
 */
import { useEffect, useMemo, useState } from 'react';
import type { ParticleShape } from '../../../shared-model/geometry/shapes';
import type { ResolvedConditions } from '../../../shared-model/prediction/conditions';
import { ENVIRONMENTS, ENVIRONMENT_LABELS, type Environment } from '../../../shared-model/prediction/environment';
import type { SurfaceFacet } from '../../../shared-model/prediction/segregation';
import { Field } from '../components/Field';
import { ShapeSelect } from '../components/ShapeSelect';
import { readConditions, readKeptConditions, type ConditionsForm, type ConditionsTextField } from './conditions-form';

export interface ConditionsState {
  text: ConditionsForm['text'];
  shape: ParticleShape;
  facet: SurfaceFacet;
  setText: (field: ConditionsTextField, value: string) => void;
  setShape: (shape: ParticleShape) => void;
  setFacet: (facet: SurfaceFacet) => void;
  environment: Environment;
  setEnvironment: (environment: Environment) => void;
  conditions: ResolvedConditions | null;
  errors: Record<string, string>;
}

const STORAGE_KEY = 'pairwright.predictionConditions';

export function useConditions(): ConditionsState {
  const [initial] = useState(() => readKeptConditions(window.sessionStorage.getItem(STORAGE_KEY)));
  const [text, setTextState] = useState(initial.text);
  const [shape, setShape] = useState<ParticleShape>(initial.shape);
  const [facet, setFacet] = useState<SurfaceFacet>(initial.facet);
  const [environment, setEnvironment] = useState<Environment>(initial.environment);
  useEffect(() => {
    window.sessionStorage.setItem(
      STORAGE_KEY,
      JSON.stringify({ text, shape, facet, environment } satisfies ConditionsForm),
    );
  }, [text, shape, facet, environment]);
  const { conditions, errors } = useMemo(
    () => readConditions({ text, shape, facet, environment }),
    [text, shape, facet, environment],
  );
  return {
    text,
    shape,
    facet,
    setText: (field, value) => setTextState((current) => ({ ...current, [field]: value })),
    setShape,
    setFacet,
    environment,
    setEnvironment,
    conditions,
    errors,
  };
}

export function ConditionsBar(props: {
  state: ConditionsState;
  elementB?: string;
  extraErrors?: Record<string, string>;
}) {
  const { state } = props;
  const errors = { ...state.errors, ...(props.extraErrors ?? {}) };
  return (
    <div className="form-grid conditions-bar" role="group" aria-label="Conditions">
      <Field
        label={`Composition, at.% ${props.elementB ?? 'B'}`}
        name="atPercentB"
        error={errors.atPercentB}
        hint="second element of each pair"
      >
        <input
          name="atPercentB"
          inputMode="decimal"
          value={state.text.atPercentB}
          onChange={(e) => state.setText('atPercentB', e.target.value)}
        />
      </Field>
      <Field label="Diameter, nm" name="diameterNm" error={errors.diameterNm}>
        <input
          name="diameterNm"
          inputMode="decimal"
          value={state.text.diameterNm}
          onChange={(e) => state.setText('diameterNm', e.target.value)}
        />
      </Field>
      <Field label="Shape" name="shape" error={errors.shape}>
        <ShapeSelect name="shape" value={state.shape} onChange={state.setShape} />
      </Field>
      <Field label="Temperature, K" name="temperatureK" error={errors.temperatureK} hint="synthesis or annealing">
        <input
          name="temperatureK"
          inputMode="decimal"
          value={state.text.temperatureK}
          onChange={(e) => state.setText('temperatureK', e.target.value)}
        />
      </Field>
      <Field label="Time, h" name="timeH" error={errors.timeH} hint="at that temperature">
        <input
          name="timeH"
          inputMode="decimal"
          value={state.text.timeH}
          onChange={(e) => state.setText('timeH', e.target.value)}
        />
      </Field>
      <Field label="Environment" name="environment" error={errors.environment} hint="gas or ligand">
        <select
          name="environment"
          value={state.environment}
          onChange={(e) => state.setEnvironment(e.target.value as Environment)}
        >
          {ENVIRONMENTS.map((environment) => (
            <option key={environment} value={environment}>
              {ENVIRONMENT_LABELS[environment]}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Facet" name="facet" error={errors.facet} hint="of the segregation terms">
        <select name="facet" value={state.facet} onChange={(e) => state.setFacet(e.target.value as SurfaceFacet)}>
          <option value="111">(111)</option>
          <option value="100">(100)</option>
        </select>
      </Field>
    </div>
  );
}

/** Parses "Pt, Pd Au" or "all" into a list of symbols (validation is the model's). */
export function parseElementList(text: string): string[] | 'all' {
  const trimmed = text.trim();
  if (trimmed.toLowerCase() === 'all') return 'all';
  return trimmed
    .split(/[\s,;]+/)
    .filter((s) => s !== '')
    .map((s) => s.charAt(0).toUpperCase() + s.slice(1).toLowerCase());
}
