import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  planSimulation,
  rebuildGeometry,
  runSimulation,
  scheduledTemperatureK,
  SIMULATION_LIMITS,
  type SimulationSpec,
} from '../../../shared-model/montecarlo/simulate';
import { totalEnergy } from '../../../shared-model/montecarlo/gupta-energy';
import { magicClusterAtoms, magicClusterSurfaceAtoms } from '../../../shared-model/geometry/magic-numbers';
import { createRandom } from '../../../shared-model/random';
import { predictPair } from '../../../shared-model/prediction/predict';

const base: SimulationSpec = {
  elementA: 'Ag',
  elementB: 'Pd',
  xB: 0.5,
  shape: 'cuboctahedron',
  shells: 3,
  temperatureK: 600,
  sweeps: 200,
  seed: 7,
};

function fieldOf(spec: Partial<SimulationSpec> & Record<string, unknown>): string | undefined {
  try {
    planSimulation({ ...base, ...spec } as SimulationSpec);
  } catch (error) {
    expect(error).toBeInstanceOf(DomainError);
    return (error as DomainError).field;
  }
  return undefined;
}

describe('bad input is refused before any work, naming the field', () => {
  it('unsupported element (no Gupta parameters), same element twice', () => {
    expect(fieldOf({ elementA: 'Fe' })).toBe('elementA');
    expect(fieldOf({ elementB: 'Co' })).toBe('elementB');
    expect(fieldOf({ elementB: 'Ag' })).toBe('elementB');
  });
  it('temperature ≤ 0 or above the cap', () => {
    expect(fieldOf({ temperatureK: 0 })).toBe('temperatureK');
    expect(fieldOf({ temperatureK: -300 })).toBe('temperatureK');
    expect(fieldOf({ temperatureK: SIMULATION_LIMITS.maxTemperatureK + 1 })).toBe('temperatureK');
    expect(fieldOf({ temperatureK: Number.NaN })).toBe('temperatureK');
  });
  it('sweeps ≤ 0, fractional or above the cap; too many attempts in total', () => {
    expect(fieldOf({ sweeps: 0 })).toBe('sweeps');
    expect(fieldOf({ sweeps: 2.5 })).toBe('sweeps');
    expect(fieldOf({ sweeps: SIMULATION_LIMITS.maxSweeps + 1 })).toBe('sweeps');
    // 20 shells: 28 741 atoms × 100 000 sweeps = 2.9e9 attempts > 2e9.
    expect(fieldOf({ shells: 20, sweeps: 100_000 })).toBe('sweeps');
  });
  it('size above the memory cap, or no / two sizes', () => {
    expect(fieldOf({ shells: 30 })).toBe('shells'); // 94 611 atoms > 50 000
    expect(fieldOf({ shells: undefined, diameterNm: 25 })).toBe('diameterNm');
    expect(fieldOf({ shells: 0 })).toBe('shells');
    expect(fieldOf({ shells: undefined })).toBe('shells');
    expect(fieldOf({ shells: 3, diameterNm: 2 })).toBe('shells');
  });
  it('composition outside (0, 1) or leaving no atom of one metal; bad anneal', () => {
    expect(fieldOf({ xB: 0 })).toBe('xB');
    expect(fieldOf({ xB: 1 })).toBe('xB');
    expect(fieldOf({ xB: 0.001 })).toBe('xB'); // 0.147 of an atom rounds to none
    expect(fieldOf({ anneal: { startTemperatureK: 500, sweeps: 10 } })).toBe('anneal.startTemperatureK');
    expect(fieldOf({ anneal: { startTemperatureK: 1500, sweeps: 0 } })).toBe('anneal.sweeps');
  });
  it('accepts a valid run and states its size', () => {
    const plan = planSimulation({ ...base, anneal: { startTemperatureK: 1500, sweeps: 50 } });
    expect(plan.atoms).toBe(magicClusterAtoms(3));
    expect(plan.totalSweeps).toBe(250);
    expect(plan.attempts).toBe(250 * 147);
  });
});

describe('a run', () => {
  it('reports progress, fills the result and repeats from its seed', () => {
    const reports: number[] = [];
    const result = runSimulation({ ...base, progressEverySweeps: 50 }, createRandom(7), {
      onProgress: (p) => reports.push(p.sweep),
    });
    expect(reports).toEqual([50, 100, 150, 200]);
    expect(result.atoms).toBe(147);
    expect(result.countB).toBe(74); // round(0.5 × 147)
    expect(result.surfaceSites).toBe(magicClusterSurfaceAtoms(3));
    expect(result.attempts).toBe(200 * 147);
    expect(result.radialProfile.map((l) => l.atoms)).toEqual([1, 12, 42, 92]);
    expect(result.finalOccupation).toHaveLength(147);
    expect(Math.abs(result.energyDriftEv)).toBeLessThan(1e-9);
    expect(result.pairRule.kind).toBe('mixing-rule');
    const again = runSimulation({ ...base, progressEverySweeps: 50 }, createRandom(7));
    expect(again.finalOccupation).toBe(result.finalOccupation);
    expect(again.energyEv).toBe(result.energyEv);
  });

  it('its final structure has the reported energy when recomputed from positions (structure-file path)', () => {
    const result = runSimulation(base, createRandom(1));
    const geometry = rebuildGeometry(result.spec);
    const symbols = Array.from(result.finalOccupation, (c) => (c === 'B' ? 'Pd' : 'Ag'));
    const e = totalEnergy({ symbols, positions: geometry.positions });
    expect(e.cutoffAngstrom).toBeCloseTo(result.geometry.cutoffAngstrom, 9);
    expect(Math.abs(e.energyEv - result.energyEv)).toBeLessThan(1e-9 * Math.abs(result.energyEv));
  });

  it('can be cancelled at any sweep', () => {
    let calls = 0;
    try {
      runSimulation(base, createRandom(1), { shouldCancel: () => ++calls > 10 });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(DomainError);
      expect((error as DomainError).code).toBe('cancelled');
      expect((error as DomainError).message).toMatch(/after 10 of 200 sweeps/);
    }
  });

  it('anneals geometrically from the start temperature down to the run temperature', () => {
    const spec = { ...base, anneal: { startTemperatureK: 2400, sweeps: 100 } };
    expect(scheduledTemperatureK(spec, 0)).toBe(2400);
    expect(scheduledTemperatureK(spec, 50)).toBeCloseTo(1200, 9); // geometric mean of 2400 and 600
    expect(scheduledTemperatureK(spec, 100)).toBe(600);
    const seen: string[] = [];
    runSimulation({ ...spec, progressEverySweeps: 100 }, createRandom(2), { onProgress: (p) => seen.push(p.phase) });
    expect(seen).toEqual(['anneal', 'production', 'production']);
  });
});

/**
 * Direction of equilibrium surface enrichment for well-known pairs. Expected directions: the element
 * with the lower surface energy and larger atom covers the particle — Ruban, Skriver & Nørskov,
 * Phys. Rev. B 59, 15990 (1999) (negative segregation energies of Ag in Pd, Au in Pt, Pd in Pt, Ag in
 * Cu, Ag in Ni, Au in Cu) and the nanoalloy review of Ferrando, Jellinek & Johnston, Chem. Rev. 108, 845
 * (2008) (Ag–Pd, Au–Pt, Pd–Pt, Ag–Cu and Ag–Ni particles with Ag / Au / Pd-rich surfaces). Pt–Ni: Pt
 * enriches the surface of annealed Pt–Ni (Stamenkovic et al., Science 315, 493 (2007)), more weakly.
 * From memory. Each case is also compared with the analytic prediction of shared-model/prediction at
 * the same composition, size and temperature: both must name the same surface element.
 */
describe('averages start at the detected equilibration point', () => {
  // Block-averaged equilibration detection (Flyvbjerg & Petersen, J. Chem. Phys. 91, 461 (1989)): the
  // transient of a random start is excluded from every average the result reports.
  it('a random start of Ag–Pd: the surface share and mean energy average only the sweeps after the transient', () => {
    const result = runSimulation({ ...base, sweeps: 400 }, createRandom(3));
    const from = result.equilibration.equilibratedFromSample; // no anneal: production sample k is sweep k + 1
    expect(result.traces.sweep).toHaveLength(400); // ≤ 500 sweeps: every sweep is kept
    // Ag (lower surface energy) moves to the surface from the random start: a transient is detected
    expect(from).toBeGreaterThan(0);
    const mean = (values: number[]) => values.reduce((s, v) => s + v, 0) / values.length;
    const surfaceAfter = mean(result.traces.surfaceXB.slice(from));
    const energyAfter = mean(result.traces.energyEv.slice(from));
    expect(result.surfaceXB).toBeCloseTo(surfaceAfter, 12);
    expect(result.meanEnergyEv).toBeCloseTo(energyAfter, 9);
    // from sweep 1 the averages would differ: the random start has more Pd at the surface and a higher energy
    expect(mean(result.traces.surfaceXB)).toBeGreaterThan(result.surfaceXB);
    expect(mean(result.traces.energyEv)).toBeGreaterThan(result.meanEnergyEv);
    expect(result.traces.surfaceXB[0]!).toBeGreaterThan(result.surfaceXB + 0.05);
  });
});

describe('surface enrichment direction vs published expectations and the analytic prediction', () => {
  const cases: { pair: [string, string]; surface: string; minimumShift: number }[] = [
    { pair: ['Pd', 'Ag'], surface: 'Ag', minimumShift: 0.2 },
    { pair: ['Pt', 'Au'], surface: 'Au', minimumShift: 0.2 },
    { pair: ['Pt', 'Pd'], surface: 'Pd', minimumShift: 0.2 },
    { pair: ['Cu', 'Ag'], surface: 'Ag', minimumShift: 0.2 },
    { pair: ['Ni', 'Ag'], surface: 'Ag', minimumShift: 0.2 },
    { pair: ['Cu', 'Au'], surface: 'Au', minimumShift: 0.2 },
    { pair: ['Pt', 'Ni'], surface: 'Pt', minimumShift: 0.03 },
  ];
  for (const { pair, surface, minimumShift } of cases) {
    it(`${pair[0]}–${pair[1]}: ${surface} enriches the surface (309-atom cuboctahedron, 600 K)`, () => {
      const result = runSimulation(
        {
          elementA: pair[0],
          elementB: pair[1],
          xB: 0.3,
          shape: 'cuboctahedron',
          shells: 4,
          temperatureK: 600,
          sweeps: 300,
          seed: 11,
        },
        createRandom(11),
      );
      expect(result.classification.enrichedElement).toBe(surface);
      const shift = surface === pair[1] ? result.surfaceXB - result.xB : result.xB - result.surfaceXB;
      expect(shift).toBeGreaterThan(minimumShift);
      // The label comes from the shared classifier with the particle's own numbers. A relaxed run of an
      // immiscible pair (Ag–Ni: miscibility gap across the phase diagram, from memory) whose minority
      // cannot cover the surface separates into domains: Janus is then the right label.
      const labels = ['surface-enriched alloy', `${pair[0]}@${pair[1]}`, `${pair[1]}@${pair[0]}`];
      if (result.relaxation.mode === 'relaxed') labels.push('Janus');
      expect(labels).toContain(result.architecture);
      const analytic = predictPair(pair[0], pair[1], {
        xB: result.xB,
        diameterNm: result.geometry.equivalentDiameterNm,
        shape: 'cuboctahedron',
        temperatureK: 600,
      });
      expect(analytic.surfaceElement).toBe(surface);
    });
  }
});
