/**
 * The matching rule of Monte Carlo runs to prior candidates (shared-model/learn/screen-prior.ts): same pair in
 * either order, nearest composition within 0.05, same diameter within 0.05 nm, temperature within 100 K;
 * nearest composition, then temperature, then newest among several. The tolerances are our own stated rule.
 */
import { describe, expect, it } from 'vitest';
import { buildCandidates, candidateConditions } from '../../../shared-model/learn/candidates';
import { canonicalCondition, type CanonicalCondition } from '../../../shared-model/learn/conditions';
import { physicsPseudoOutcomes } from '../../../shared-model/learn/outcome-model';
import {
  matchMonteCarloRun,
  priorPseudoOutcomes,
  priorSourcesText,
  withMonteCarloPhysics,
  type MonteCarloLabel,
} from '../../../shared-model/learn/screen-prior';

// Ni–Pt at 80 at.% Pt, 3 nm, the polyol route's usual 160 °C.
const candidate: CanonicalCondition = canonicalCondition({
  elementA: 'Ni',
  elementB: 'Pt',
  xB: 0.8,
  diameterNm: 3,
  temperatureK: 433.15,
  route: 'polyol',
});

let nextId = 1;
function run(over: Partial<MonteCarloLabel>): MonteCarloLabel {
  return {
    runId: nextId++,
    elementA: 'Ni',
    elementB: 'Pt',
    xB: 0.8,
    diameterNm: 3,
    temperatureK: 450,
    architecture: 'Ni@Pt',
    createdAt: '2026-11-02T10:00:00.000Z',
    ...over,
  };
}

describe('matchMonteCarloRun', () => {
  it('matches the same pair given in either order, comparing compositions in canonical roles', () => {
    // Pt–Ni at 20 at.% Ni is Ni–Pt at 80 at.% Pt; the class is read in canonical roles (Ni@Pt = A@B).
    const swapped = run({ elementA: 'Pt', elementB: 'Ni', xB: 0.2 });
    expect(matchMonteCarloRun(candidate, [swapped])).toEqual({ run: swapped, classKey: 'A@B' });
    expect(matchMonteCarloRun(candidate, [run({ elementB: 'Pd' })])).toBeNull();
  });

  it('keeps each tolerance at its edge and refuses just beyond it', () => {
    expect(matchMonteCarloRun(candidate, [run({ xB: 0.75 })])).not.toBeNull();
    expect(matchMonteCarloRun(candidate, [run({ xB: 0.74 })])).toBeNull();
    expect(matchMonteCarloRun(candidate, [run({ diameterNm: 3.05 })])).not.toBeNull();
    expect(matchMonteCarloRun(candidate, [run({ diameterNm: 3.1 })])).toBeNull();
    expect(matchMonteCarloRun(candidate, [run({ temperatureK: 533.15 })])).not.toBeNull();
    expect(matchMonteCarloRun(candidate, [run({ temperatureK: 333.1 })])).toBeNull();
    // The screen's usual 600 K is too far from every route's usual temperature (≤ 473 K).
    expect(matchMonteCarloRun(candidate, [run({ temperatureK: 600 })])).toBeNull();
  });

  it('prefers the nearest composition, then the nearest temperature, then the newest run', () => {
    const nearX = run({ xB: 0.79, temperatureK: 520 });
    const nearT = run({ xB: 0.76, temperatureK: 433 });
    expect(matchMonteCarloRun(candidate, [nearT, nearX])?.run).toBe(nearX);
    const cooler = run({ temperatureK: 440 });
    const hotter = run({ temperatureK: 500 });
    expect(matchMonteCarloRun(candidate, [hotter, cooler])?.run).toBe(cooler);
    const old = run({ createdAt: '2026-10-01T00:00:00.000Z' });
    const fresh = run({ createdAt: '2026-11-20T00:00:00.000Z' });
    expect(matchMonteCarloRun(candidate, [fresh, old])?.run).toBe(fresh);
  });
});

describe('priorPseudoOutcomes', () => {
  const grid = { xB: [0.2, 0.8], diametersNm: [3], routes: ['polyol', 'organic', 'co-reduction'] as const };
  const candidates = buildCandidates(candidateConditions(['Ni', 'Pt', 'Pd'], grid));
  const classes = ['alloy', 'surface-enriched alloy', 'A@B', 'B@A', 'Janus'] as const;

  it('without runs is exactly the analytic prior', () => {
    const { pseudo, sources } = priorPseudoOutcomes(candidates, classes, []);
    expect(pseudo).toEqual(physicsPseudoOutcomes(candidates, classes));
    expect(sources).toMatchObject({ fromMonteCarlo: 0, fromAnalytic: pseudo.length, runIds: [], disagreements: 0 });
    expect(priorSourcesText(sources)).toMatch(/, all from the analytic prediction \(no finished Monte Carlo run/);
  });

  it('labels the matched candidates from the run and counts each source', () => {
    const r = run({ runId: 41 });
    const { pseudo, sources } = priorPseudoOutcomes(candidates, classes, [r]);
    // The run at 450 K matches polyol (433 K) and organic (473 K), not co-reduction (298 K).
    const matched = candidates
      .map((c, i) => ({ c, i }))
      .filter(
        ({ c }) => c.condition.pair === 'Ni-Pt' && c.condition.xB === 0.8 && c.condition.route !== 'co-reduction',
      );
    expect(matched).toHaveLength(2);
    expect(sources.fromMonteCarlo).toBe(2);
    expect(sources.runIds).toEqual([41]);
    expect(sources.pseudoOutcomes).toBe(pseudo.length);
    expect(sources.fromAnalytic).toBe(pseudo.length - 2);
    const labelled = pseudo.filter((p) => matched.some(({ c }) => c.features === p.features));
    expect(labelled.map((p) => p.classKey)).toEqual(['A@B', 'A@B']);
    const analytic = matched.map(({ c }) => c.physics.classKey);
    expect(sources.disagreements).toBe(analytic.filter((k) => k !== 'A@B').length);
    expect(priorSourcesText(sources)).toContain(', 2 from Monte Carlo screen runs (1 run), the rest from the analytic');
  });

  it('gives no pseudo-outcome where the run found a class the model does not have', () => {
    const { pseudo, sources } = priorPseudoOutcomes(candidates, ['alloy', 'surface-enriched alloy'], [run({})]);
    expect(sources.fromMonteCarlo).toBe(0);
    expect(sources.monteCarloOutsideClasses).toBe(2);
    expect(pseudo).toHaveLength(sources.fromAnalytic);
    expect(priorSourcesText(sources)).toContain('all from the analytic prediction');
  });
});

describe('withMonteCarloPhysics', () => {
  const grid = { xB: [0.8], diametersNm: [3], routes: ['polyol', 'co-reduction'] as const };
  const candidates = buildCandidates(candidateConditions(['Ni', 'Pt'], grid));

  it('gives matched candidates the run’s class and names the run and the analytic call', () => {
    const [polyol, coReduction] = withMonteCarloPhysics(candidates, [run({ runId: 12 })]);
    // candidateConditions orders routes as given: polyol (433 K, matched), co-reduction (298 K, not matched).
    expect(polyol!.condition.route).toBe('polyol');
    expect(polyol!.physics.classKey).toBe('A@B');
    const analytic = candidates[0]!.physics;
    expect(polyol!.physics.label).toBe(
      analytic.classKey === 'A@B'
        ? 'Ni@Pt (analytic and Monte Carlo run 12)'
        : `Ni@Pt by Monte Carlo run 12 (analytic: ${analytic.label})`,
    );
    expect(polyol!.physics.confidence).toBe(analytic.confidence);
    expect(coReduction).toBe(candidates[1]);
  });

  it('keeps the analytic call where the run found no class', () => {
    expect(withMonteCarloPhysics(candidates, [run({ architecture: 'unknown' })])).toEqual(candidates);
  });
});
