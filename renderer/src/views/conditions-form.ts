/**
 * The prediction conditions bar as a pure model (no React, no DOM): the typed text and its defaults (from
 * the model's PREDICTION_DEFAULTS), reading it into conditions — typed numbers by the one number reader,
 * ranges by the contract's zod schema, so the bar and the API say the same — and the copy kept for the
 * browser tab.
 */
import { keyWords, userMessage } from '../../../shared-model/api/issue-message';
import { conditionsSchema } from '../../../shared-model/api/prediction';
import { isParticleShape, normaliseShapeName, type ParticleShape } from '../../../shared-model/geometry/shapes';
import { PREDICTION_DEFAULTS, type ResolvedConditions } from '../../../shared-model/prediction/conditions';
import { ENVIRONMENTS, type Environment } from '../../../shared-model/prediction/environment';
import type { SurfaceFacet } from '../../../shared-model/prediction/segregation';
import { readUserNumber } from '../../../shared-model/text/user-number';

export type ConditionsTextField = 'atPercentB' | 'diameterNm' | 'temperatureK' | 'timeH';

export interface ConditionsForm {
  text: Record<ConditionsTextField, string>;
  shape: ParticleShape;
  facet: SurfaceFacet;
  environment: Environment;
}

/** Short decimal text of a default (0.5 → "50" at.%). */
const text = (x: number) => String(Number(x.toPrecision(6)));

export const DEFAULT_CONDITIONS_FORM: ConditionsForm = {
  text: {
    atPercentB: text(100 * PREDICTION_DEFAULTS.xB),
    diameterNm: text(PREDICTION_DEFAULTS.diameterNm),
    temperatureK: text(PREDICTION_DEFAULTS.temperatureK),
    timeH: text(PREDICTION_DEFAULTS.timeH),
  },
  shape: PREDICTION_DEFAULTS.shape,
  facet: PREDICTION_DEFAULTS.facet,
  environment: PREDICTION_DEFAULTS.environment,
};

/** Field names of the contract (xB, diameterNm, temperatureK) → the inputs of this bar. */
export const CONDITION_FIELD_ALIASES: Record<string, string> = {
  xB: 'atPercentB',
  diameterNm: 'diameterNm',
  temperatureK: 'temperatureK',
  shape: 'shape',
  facet: 'facet',
  timeH: 'timeH',
  environment: 'environment',
};

const LABELS: Record<ConditionsTextField, string> = {
  atPercentB: 'composition, at.%',
  diameterNm: 'diameter, nm',
  temperatureK: 'temperature, K',
  timeH: 'time, h',
};

export type ConditionsReading =
  | { conditions: ResolvedConditions; errors: Record<string, never> }
  | {
      conditions: null;
      errors: Record<string, string>;
    };

/** The typed conditions, or the message for each field at fault (keyed by the input's name). */
export function readConditions(form: ConditionsForm): ConditionsReading {
  const numbers: Partial<Record<ConditionsTextField, number>> = {};
  const errors: Record<string, string> = {};
  for (const field of ['atPercentB', 'diameterNm', 'temperatureK', 'timeH'] as const) {
    const result = readUserNumber(form.text[field], LABELS[field]);
    if (result.ok) numbers[field] = result.value;
    else errors[field] = result.message;
  }
  const { atPercentB, diameterNm, temperatureK, timeH } = numbers;
  if (atPercentB === undefined || diameterNm === undefined || temperatureK === undefined || timeH === undefined)
    return { conditions: null, errors };
  const parsed = conditionsSchema.safeParse({
    xB: atPercentB / 100,
    diameterNm,
    temperatureK,
    shape: form.shape,
    facet: form.facet,
    timeH,
    environment: form.environment,
  });
  if (parsed.success) return { conditions: parsed.data, errors: {} };
  const issue = parsed.error.issues[0];
  const path = String(issue?.path[0] ?? 'xB');
  const input = CONDITION_FIELD_ALIASES[path] ?? 'atPercentB';
  const message =
    path === 'xB'
      ? 'composition must lie strictly between 0 and 100 at.%'
      : userMessage(keyWords(path), issue?.message ?? 'was refused');
  return { conditions: null, errors: { [input]: message } };
}

/** The conditions kept for this browser tab (JSON text, or null when none), or the defaults when damaged. */
export function readKeptConditions(raw: string | null): ConditionsForm {
  if (raw === null) return DEFAULT_CONDITIONS_FORM;
  let parsed: unknown;
  try {
    parsed = JSON.parse(raw);
  } catch (error) {
    if (error instanceof SyntaxError) return DEFAULT_CONDITIONS_FORM; // a damaged entry: start from the defaults
    throw error;
  }
  const value = parsed as Partial<ConditionsForm> | null;
  const kept = value?.text;
  const shape = normaliseShapeName(String(value?.shape)); // copies from before the one spelling
  if (
    !kept ||
    typeof kept.atPercentB !== 'string' ||
    typeof kept.diameterNm !== 'string' ||
    typeof kept.temperatureK !== 'string' ||
    !isParticleShape(shape) ||
    (value?.facet !== '111' && value?.facet !== '100')
  ) {
    return DEFAULT_CONDITIONS_FORM;
  }
  const { atPercentB, diameterNm, temperatureK } = kept;
  // entries kept before the time and environment inputs existed take their defaults
  const timeH = typeof kept.timeH === 'string' ? kept.timeH : DEFAULT_CONDITIONS_FORM.text.timeH;
  const environment = (ENVIRONMENTS as readonly string[]).includes(String(value.environment))
    ? (value.environment as Environment)
    : DEFAULT_CONDITIONS_FORM.environment;
  return {
    text: { atPercentB, diameterNm, temperatureK, timeH },
    shape,
    facet: value.facet,
    environment,
  };
}
