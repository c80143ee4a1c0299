/**
 * Feature rows of a condition, in canonical A/B order (conditions.ts): the pair descriptors of
 * prediction/descriptors.ts (relative differences B vs A, Miedema mixing enthalpy and its chemical and
 * elastic parts at the condition's composition), xB, diameter (nm), temperature (K) and the route one-hot.
 * The rows are raw; standardisation (and dropping the exactly collinear Miedema total and last route
 * level) happens inside each training fold (standardise.ts).
 */
import { DomainError, invalid } from '../api/result';
import { DESCRIPTOR_KEYS, DESCRIPTOR_LABELS, pairDescriptors } from '../prediction/descriptors';
import { LEARN_ROUTES, type CanonicalCondition } from './conditions';

export const FEATURE_NAMES: readonly string[] = [
  ...DESCRIPTOR_KEYS,
  'xB',
  'diameterNm',
  'temperatureK',
  ...LEARN_ROUTES.map((route) => `route:${route}`),
];

export const FEATURE_LABELS: Readonly<Record<string, string>> = {
  ...DESCRIPTOR_LABELS,
  xB: 'atomic fraction of B (second symbol alphabetically)',
  diameterNm: 'particle diameter, nm',
  temperatureK: 'synthesis temperature, K',
  ...Object.fromEntries(LEARN_ROUTES.map((route) => [`route:${route}`, `route: ${route}`])),
};

const descriptorCache = new Map<string, number[]>();

/** Raw feature row; throws a DomainError naming `field` when an element has no descriptor data. */
export function featureRow(c: CanonicalCondition, field = 'pair'): number[] {
  const key = `${c.pair}|${c.xB.toFixed(6)}`;
  let descriptors = descriptorCache.get(key);
  if (!descriptors) {
    try {
      const d = pairDescriptors(c.elementA, c.elementB, c.xB);
      descriptors = DESCRIPTOR_KEYS.map((k) => d[k]);
    } catch (error) {
      if (error instanceof DomainError) throw invalid(field, `${c.pair}: no descriptor data (${error.message})`);
      throw error;
    }
    if (descriptors.some((v) => !Number.isFinite(v)))
      throw invalid(field, `${c.pair}: a descriptor is not a finite number; the element table lacks a value`);
    if (descriptorCache.size > 50_000) descriptorCache.clear();
    descriptorCache.set(key, descriptors);
  }
  return [...descriptors, c.xB, c.diameterNm, c.temperatureK, ...LEARN_ROUTES.map((r) => (r === c.route ? 1 : 0))];
}
