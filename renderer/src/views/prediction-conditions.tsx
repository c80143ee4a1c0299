/**
 * The conditions bar shared by the prediction views: composition (at.% of B), diameter, shape,
 * temperature, facet. Values are kept as typed text; `conditions` is null while a field does not parse,
 * and `errors` holds the message for the field at fault (shown under it). Range checks are the model's
 * own (DomainError naming the field), so the UI and the API say the same thing. The typed values are
 * kept for the browser tab (sessionStorage), so both prediction views and the pair detail share them.
 */
import { useEffect, useMemo, useState } from 'react';
import { DomainError } from '../../../shared-model/api/result';
import { PARTICLE_SHAPES, type ParticleShape } from '../../../shared-model/geometry/particle-sites';
import { checkConditions, type PredictionConditions } from '../../../shared-model/prediction/predict';
import type { SurfaceFacet } from '../../../shared-model/prediction/segregation';
import { Field } from '../components/Field';

export interface ConditionsState {
  text: { atPercentB: string; diameterNm: string; temperatureK: string };
  shape: ParticleShape;
  facet: SurfaceFacet;
  setText: (field: 'atPercentB' | 'diameterNm' | 'temperatureK', value: string) => void;
  setShape: (shape: ParticleShape) => void;
  setFacet: (facet: SurfaceFacet) => void;
  conditions: Required<PredictionConditions> | null;
  errors: Record<string, string>;
}

function parseNumber(text: string): number {
  const trimmed = text.trim().replace(',', '.');
  return trimmed === '' ? Number.NaN : Number(trimmed);
}

/** Field names of the model (xB, diameterNm, temperatureK) → the inputs of this bar. */
export const CONDITION_FIELD_ALIASES: Record<string, string> = { xB: 'atPercentB', diameterNm: 'diameterNm', temperatureK: 'temperatureK', shape: 'shape', facet: 'facet' };

const STORAGE_KEY = 'pairwright.predictionConditions';

interface StoredConditions {
  text: { atPercentB: string; diameterNm: string; temperatureK: string };
  shape: ParticleShape;
  facet: SurfaceFacet;
}

const DEFAULTS: StoredConditions = { text: { atPercentB: '50', diameterNm: '3', temperatureK: '600' }, shape: 'cuboctahedron', facet: '111' };

/** The conditions last typed in this tab (shared by the prediction views), or the defaults. */
function rememberedConditions(): StoredConditions {
  const raw = window.sessionStorage.getItem(STORAGE_KEY);
  if (raw === null) return DEFAULTS;
  let parsed: unknown;
  try {
    parsed = JSON.parse(raw);
  } catch (error) {
    if (error instanceof SyntaxError) return DEFAULTS; // a damaged entry: start from the defaults
    throw error;
  }
  const value = parsed as Partial<StoredConditions> | null;
  const text = value?.text;
  if (
    !text ||
    typeof text.atPercentB !== 'string' ||
    typeof text.diameterNm !== 'string' ||
    typeof text.temperatureK !== 'string' ||
    !(PARTICLE_SHAPES as readonly string[]).includes(String(value?.shape)) ||
    (value?.facet !== '111' && value?.facet !== '100')
  ) {
    return DEFAULTS;
  }
  return { text: { atPercentB: text.atPercentB, diameterNm: text.diameterNm, temperatureK: text.temperatureK }, shape: value.shape as ParticleShape, facet: value.facet };
}

export function useConditions(): ConditionsState {
  const [initial] = useState(rememberedConditions);
  const [text, setTextState] = useState(initial.text);
  const [shape, setShape] = useState<ParticleShape>(initial.shape);
  const [facet, setFacet] = useState<SurfaceFacet>(initial.facet);
  useEffect(() => {
    window.sessionStorage.setItem(STORAGE_KEY, JSON.stringify({ text, shape, facet } satisfies StoredConditions));
  }, [text, shape, facet]);
  const { conditions, errors } = useMemo(() => {
    const atPercent = parseNumber(text.atPercentB);
    const diameterNm = parseNumber(text.diameterNm);
    const temperatureK = parseNumber(text.temperatureK);
    const found: Record<string, string> = {};
    if (!Number.isFinite(atPercent)) found.atPercentB = 'composition must be a number of at.% between 0 and 100';
    if (!Number.isFinite(diameterNm)) found.diameterNm = 'diameter must be a number of nm';
    if (!Number.isFinite(temperatureK)) found.temperatureK = 'temperature must be a number of K';
    if (Object.keys(found).length > 0) return { conditions: null, errors: found };
    try {
      return { conditions: checkConditions({ xB: atPercent / 100, diameterNm, temperatureK, shape, facet }), errors: {} };
    } catch (error) {
      if (!(error instanceof DomainError)) throw error;
      const field = CONDITION_FIELD_ALIASES[error.field ?? ''] ?? 'atPercentB';
      const message = error.field === 'xB' ? 'composition must lie strictly between 0 and 100 at.%' : error.message;
      return { conditions: null, errors: { [field]: message } };
    }
  }, [text, shape, facet]);
  return {
    text,
    shape,
    facet,
    setText: (field, value) => setTextState((current) => ({ ...current, [field]: value })),
    setShape,
    setFacet,
    conditions,
    errors,
  };
}

export function ConditionsBar(props: { state: ConditionsState; elementB?: string; extraErrors?: Record<string, string> }) {
  const { state } = props;
  const errors = { ...state.errors, ...(props.extraErrors ?? {}) };
  return (
    <div className="form-grid conditions-bar" role="group" aria-label="Conditions">
      <Field label={`Composition, at.% ${props.elementB ?? 'B'}`} name="atPercentB" error={errors.atPercentB} hint="second element of each pair">
        <input name="atPercentB" inputMode="decimal" value={state.text.atPercentB} onChange={(e) => state.setText('atPercentB', e.target.value)} />
      </Field>
      <Field label="Diameter, nm" name="diameterNm" error={errors.diameterNm}>
        <input name="diameterNm" inputMode="decimal" value={state.text.diameterNm} onChange={(e) => state.setText('diameterNm', e.target.value)} />
      </Field>
      <Field label="Shape" name="shape" error={errors.shape}>
        <select name="shape" value={state.shape} onChange={(e) => state.setShape(e.target.value as ParticleShape)}>
          {PARTICLE_SHAPES.map((shape) => (
            <option key={shape} value={shape}>
              {shape}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Temperature, K" name="temperatureK" error={errors.temperatureK} hint="synthesis or annealing">
        <input name="temperatureK" inputMode="decimal" value={state.text.temperatureK} onChange={(e) => state.setText('temperatureK', e.target.value)} />
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
