import { describe, expect, it } from 'vitest';
import { classifyArchitecture, DEFAULT_THRESHOLDS } from '../../../shared-model/architecture/classify';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../shared-model/clusters/neighbours';
import { buildCluster } from '../../../shared-model/clusters/shapes';
import { surfaceSites } from '../../../shared-model/montecarlo/analysis';
import { analyseSeparation } from '../../../shared-model/montecarlo/separation';
import { createRandom } from '../../../shared-model/random';

const nn = 2.8;
const geometry = buildCluster('cuboctahedron', { shells: 4 }, nn);
const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
const surface = surfaceSites(list, nn);
const p = geometry.positions;

function classify(species: Uint8Array) {
  const separation = analyseSeparation(list, nn, p, species, 'Ag', 'Ni');
  let b = 0;
  let sb = 0;
  let s = 0;
  for (let i = 0; i < species.length; i++) {
    b += species[i]!;
    s += surface[i]!;
    if (surface[i] && species[i]) sb++;
  }
  const label = classifyArchitecture(
    {
      elementA: 'Ag',
      elementB: 'Ni',
      xB: b / species.length,
      surfaceXB: sb / s,
      separation: {
        centreOfMassOffset: separation.centreOfMassOffset,
        largestDomainShareA: separation.domains.Ag!.largestDomainShare,
        largestDomainShareB: separation.domains.Ni!.largestDomainShare,
      },
    },
    DEFAULT_THRESHOLDS,
  ).label;
  return { separation, label };
}

describe('separation analysis and the Janus rule', () => {
  it('two halves (Janus): centres of mass far apart, one domain each, a planar interface; labelled Janus', () => {
    const species = Uint8Array.from({ length: geometry.atoms }, (_, i) => (p[3 * i]! > 1e-9 ? 1 : 0));
    const { separation, label } = classify(species);
    // Two half-balls of radius R: centroids 3R/8 from the centre each, 0.75 R apart (uniform hemisphere).
    expect(separation.centreOfMassOffset).toBeGreaterThan(0.6);
    expect(separation.domains.Ag).toEqual({ domains: 1, largestDomainShare: 1 });
    expect(separation.domains.Ni).toEqual({ domains: 1, largestDomainShare: 1 });
    expect(separation.interfaceShare).toBeLessThan(0.4);
    expect(label).toBe('Janus');
  });

  it('a centred core under a complete shell: centres coincide; labelled core@shell', () => {
    const species = Uint8Array.from({ length: geometry.atoms }, (_, i) => (surface[i] ? 0 : 1));
    const { separation, label } = classify(species);
    expect(separation.centreOfMassDistanceAngstrom).toBeLessThan(1e-9);
    expect(label).toBe('Ni@Ag');
  });

  it('an off-centre core: the centre-of-mass offset sees it while the shell stays complete', () => {
    const species = Uint8Array.from({ length: geometry.atoms }, (_, i) => {
      const d = Math.hypot(p[3 * i]! - 3, p[3 * i + 1]!, p[3 * i + 2]!);
      return !surface[i] && d < 6 ? 1 : 0;
    });
    const { separation, label } = classify(species);
    expect(separation.centreOfMassOffset).toBeGreaterThan(0.15);
    expect(separation.domains.Ni!.domains).toBe(1);
    expect(label).toBe('Ni@Ag');
  });

  it('a random alloy: centres together, most atoms at an interface, not Janus', () => {
    const rng = createRandom(4);
    const species = Uint8Array.from({ length: geometry.atoms }, () => (rng.next() < 0.5 ? 1 : 0));
    const { separation, label } = classify(species);
    expect(separation.centreOfMassOffset).toBeLessThan(0.1);
    expect(separation.interfaceShare).toBeGreaterThan(0.9);
    expect(separation.interfaceAreaNm2).toBeGreaterThan(0);
    expect(label).not.toBe('Janus');
  });
});
