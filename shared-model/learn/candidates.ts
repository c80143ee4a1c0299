/**
 * The candidate set: every pair of the campaign's elements × composition × size × route, in canonical
 * order, at the route's usual temperature (recipes/design-input.ts DEFAULT_TEMPERATURE_C, common practice).
 * Candidates carry their feature row and physics call, computed once.
 */
import { DEFAULT_TEMPERATURE_C, type SynthesisRoute } from '../recipes/design-input';
import { canonicalCondition, LEARN_ROUTES, type CanonicalCondition } from './conditions';
import { featureRow } from './features';
import { physicsPrediction, type PhysicsCall } from './physics';

export interface CandidateGrid {
  xB: readonly number[];
  diametersNm: readonly number[];
  routes: readonly SynthesisRoute[];
}

export const DEFAULT_GRID: CandidateGrid = {
  xB: [0.2, 0.35, 0.5, 0.65, 0.8],
  diametersNm: [3, 5, 8],
  routes: LEARN_ROUTES,
};

export interface Candidate {
  condition: CanonicalCondition;
  features: number[];
  physics: PhysicsCall;
}

export function routeTemperatureK(route: SynthesisRoute): number {
  return DEFAULT_TEMPERATURE_C[route] + 273.15;
}

export function candidateConditions(
  elements: readonly string[],
  grid: CandidateGrid = DEFAULT_GRID,
): CanonicalCondition[] {
  const symbols = [...new Set(elements)].sort();
  const out: CanonicalCondition[] = [];
  for (let i = 0; i < symbols.length; i++) {
    for (let j = i + 1; j < symbols.length; j++) {
      for (const route of grid.routes) {
        for (const diameterNm of grid.diametersNm) {
          for (const xB of grid.xB) {
            out.push(
              canonicalCondition({
                elementA: symbols[i] as string,
                elementB: symbols[j] as string,
                xB,
                diameterNm,
                temperatureK: routeTemperatureK(route),
                route,
              }),
            );
          }
        }
      }
    }
  }
  return out;
}

export function buildCandidates(conditions: readonly CanonicalCondition[]): Candidate[] {
  return conditions.map((condition) => ({
    condition,
    features: featureRow(condition, 'candidates'),
    physics: physicsPrediction(condition),
  }));
}

/** Whether two conditions are the same experiment (same pair and route, xB within 0.05, size within 25 %). */
export function sameCondition(a: CanonicalCondition, b: CanonicalCondition): boolean {
  return (
    a.pair === b.pair &&
    a.route === b.route &&
    Math.abs(a.xB - b.xB) <= 0.05 + 1e-9 &&
    Math.abs(Math.log(a.diameterNm / b.diameterNm)) <= Math.log(1.25)
  );
}
