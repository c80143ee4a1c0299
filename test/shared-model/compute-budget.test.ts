/**
 * Iteration and wall-time budgets of line-scan fits and energies (issue 14, item 3): a pathological input stops
 * with a message saying what ran out, instead of running for minutes. The contract now refuses the inputs the
 * issue names (probe σ 1e-6 / 1e6 nm, a 100 Å cut-off), so these tests call the models directly. Time is driven
 * by a clock the test owns (no timing in tests): each reading advances it by a fixed step.
 */
import { describe, expect, it } from 'vitest';
import { BudgetExceeded, BudgetMeter } from '../../shared-model/compute-budget';
import { fitLineScan, MAX_GRID_CELLS } from '../../shared-model/characterization/line-scan-fit';
import { buildCuboctahedron } from '../../shared-model/clusters/shapes';
import { ENERGY_BUDGET, totalEnergy } from '../../shared-model/montecarlo/gupta-energy';
import { relaxStructure } from '../../shared-model/montecarlo/minimise';
import { positions, syntheticScan } from './characterization/synthetic-line-scan';

const OPTIONS = { elementA: 'Au', elementB: 'Pd', latticeANm: 0.4078, latticeBNm: 0.3891 };

/** A 10 nm Au@Pd particle scanned over 20 nm at 0.4 nm (as in line-scan-fit.test.ts). */
function scan(stepNm = 0.4) {
  return syntheticScan(
    {
      kind: 'A@B',
      centerNm: 9.6,
      radiusNm: 5,
      coreRadiusNm: 3.5,
      janusALow: true,
      probeSigmaNm: 0.6,
      amplitudeA: 10,
      amplitudeB: 8,
      backgroundA: 5,
      backgroundB: 3,
      positionsNm: positions(0, 20, stepNm),
    },
    8,
    1,
  );
}

/** A clock that moves on by `stepMs` each time it is read. */
function steppingClock(stepMs: number): () => number {
  let now = 0;
  return () => (now += stepMs);
}

function budgetError(run: () => unknown): BudgetExceeded {
  try {
    run();
  } catch (error) {
    if (error instanceof BudgetExceeded) return error;
    throw error;
  }
  throw new Error('the computation finished within its budget');
}

// Au nearest-neighbour distance 2.884 Å = a/√2 with a = 4.078 Å (Kittel, ISSP 8th ed., from memory).
const AU_NN_ANGSTROM = 2.884;

describe('compute budgets', () => {
  it('the meter counts iterations and time, and says which ran out', () => {
    const labels = { what: 'the test sum', unit: 'terms', advice: 'sum less' };
    const byCount = new BudgetMeter({ maxIterations: 3, maxWallMs: 1e9 }, labels, steppingClock(1));
    byCount.spend(3);
    expect(() => byCount.spend()).toThrow(/^the test sum stopped: it needed more than its budget of 3 terms/);
    const byTime = new BudgetMeter({ maxIterations: 1e9, maxWallMs: 1500 }, labels, steppingClock(1000));
    byTime.stage = 'row 2';
    byTime.spend();
    expect(() => byTime.spend()).toThrow(/^the test sum stopped at row 2: it ran past its time budget of 1\.5 s/);
  });

  it('a line-scan fit with a probe σ of 1e-6 nm or 1e6 nm is refused before any grid is sized', () => {
    for (const probeSigmaNm of [1e-6, 1e6]) {
      const error = budgetError(() => fitLineScan(scan(), { ...OPTIONS, probeSigmaNm }));
      expect(error.field).toBe('probeSigmaNm');
      expect(error.message).toMatch(
        new RegExp(
          `model grid of .* cells \\(at most ${MAX_GRID_CELLS.toLocaleString('en-GB')}\\): a probe σ of ${probeSigmaNm} nm`,
        ),
      );
    }
  });

  it('a line-scan fit stops at its iteration budget, naming the model it was fitting', () => {
    const error = budgetError(() => fitLineScan(scan(), { ...OPTIONS, budget: { maxIterations: 50, maxWallMs: 1e9 } }));
    expect(error.code).toBe('unsupported');
    expect(error.message).toMatch(
      /^the line-scan fit of 51 points stopped at model alloy: it needed more than its budget of 50 model evaluations/,
    );
    expect(error.message).toMatch(/give the probe σ so it is not fitted/);
  });

  it('a line-scan fit of a long scan stops at its wall-time budget', () => {
    // 1,001 points at 0.02 nm; the clock moves 200 ms per reading (one per model evaluation).
    const error = budgetError(() =>
      fitLineScan(scan(0.02), {
        ...OPTIONS,
        budget: { maxIterations: 1e9, maxWallMs: 1000 },
        clock: steppingClock(200),
      }),
    );
    expect(error.message).toMatch(
      /^the line-scan fit of 1001 points stopped at model .*: it ran past its time budget of 1\.0 s/,
    );
    expect(error.spent.elapsedMs).toBeGreaterThan(1000);
  });

  it('the default budget leaves a normal fit alone', () => {
    const analysis = fitLineScan(scan(), OPTIONS);
    expect(analysis.chosenKind).toBe('A@B');
  });

  it('an energy of 17,885 atoms with a 100 Å cut-off stops at its pair budget, naming the cut-off', () => {
    const cluster = buildCuboctahedron(17, AU_NN_ANGSTROM);
    const structure = { symbols: Array.from({ length: cluster.atoms }, () => 'Au'), positions: cluster.positions };
    expect(cluster.atoms).toBe(17_885); // (10n³ + 15n² + 11n + 3)/3 at n = 17 (Mackay 1962)
    const error = budgetError(() => totalEnergy(structure, { cutoffAngstrom: 100 }));
    expect(error.field).toBe('cutoffAngstrom');
    expect(error.message).toMatch(
      /^the energy of 17885 atoms stopped at the pair search within 100\.00 Å: it needed more than its budget of 12,000,000 pair terms/,
    );
    // The search stopped before the pair list grew past twice the budget (16 bytes a pair).
    expect(error.spent.iterations).toBeLessThan(2 * ENERGY_BUDGET.maxIterations);
    // The same cluster at the default five-shell cut-off is well inside the budget.
    expect(totalEnergy(structure).atoms).toBe(17_885);
  });

  it('an energy stops at its wall-time budget', () => {
    const cluster = buildCuboctahedron(12, AU_NN_ANGSTROM);
    const structure = { symbols: Array.from({ length: cluster.atoms }, () => 'Au'), positions: cluster.positions };
    const error = budgetError(() =>
      totalEnergy(structure, { budget: { maxIterations: 1e9, maxWallMs: 300 }, clock: steppingClock(100) }),
    );
    expect(error.field).toBe('xyz');
    expect(error.message).toMatch(/ran past its time budget of 300 ms .*use a smaller cut-off/);
  });

  it('a relaxation stops at its wall-time budget; without one it runs to maxIterations', () => {
    const cluster = buildCuboctahedron(3, AU_NN_ANGSTROM * 1.03);
    const structure = { symbols: Array.from({ length: cluster.atoms }, () => 'Au'), positions: cluster.positions };
    const error = budgetError(() =>
      relaxStructure(structure, { forceToleranceEvPerAngstrom: 1e-9, maxWallMs: 1000, clock: steppingClock(100) }),
    );
    expect(error.message).toMatch(
      /^the relaxation of 147 atoms stopped: it ran past its time budget of 1\.0 s \(\d+ FIRE steps done\)/,
    );
    const capped = relaxStructure(structure, { forceToleranceEvPerAngstrom: 1e-9, maxIterations: 5 });
    expect(capped).toMatchObject({ iterations: 5, converged: false });
  });
});
