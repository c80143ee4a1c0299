/**
 * Dilute surface-segregation energy of one solute atom at a close-packed (111) surface of a host metal, on
 * the relaxed off-lattice Gupta energy: a host cuboctahedron (its eight triangular faces are (111) facets)
 * with one solute atom at the central site of a (111) facet, minus the same particle with the solute at
 * the particle's centre, each relaxed to its local minimum (FIRE). Negative: the solute prefers the surface.
 * The facet-centre site is the 9-coordinated surface site nearest to the particle centre (common practice
 * for a dilute limit; the particle is large enough that the two sites do not feel each other's strain).
 */
import { invalid } from '../api/result';
import { buildNeighbourList, coordinationNumbers, FIVE_SHELL_CUTOFF_FACTOR } from '../clusters/neighbours';
import { buildCluster } from '../clusters/shapes';
import { guptaElement } from './gupta-parameters';
import { minimiseInPlace } from './minimise';
import { OffLatticeGupta } from './offlattice-gupta';

export interface DiluteSegregation {
  host: string;
  solute: string;
  /** E(solute at a (111) facet centre) − E(solute at the centre), both relaxed (eV). */
  segregationEnergyEv: number;
  atoms: number;
  method: string;
}

/** Dilute (111) segregation energy of `solute` in `host` (eV); `shells` sets the host cuboctahedron (default 6: 923 atoms). */
export function diluteSegregationEnergy111(host: string, solute: string, shells = 6): DiluteSegregation {
  const h = guptaElement(host, 'host');
  const s = guptaElement(solute, 'solute');
  if (h.symbol === s.symbol) throw invalid('solute', `the solute must differ from the host, got ${s.symbol} twice`);
  if (!Number.isInteger(shells) || shells < 3 || shells > 10)
    throw invalid('shells', `shells must be a whole number from 3 to 10, got ${shells}`);
  const nn = h.r0Angstrom;
  const geometry = buildCluster('cuboctahedron', { shells }, nn);
  const p = geometry.positions;
  const n = geometry.atoms;
  const cn = coordinationNumbers(buildNeighbourList(p, FIVE_SHELL_CUTOFF_FACTOR * nn), nn);
  let centre = 0;
  let facet = -1;
  let best = Infinity;
  let bestFacet = Infinity;
  for (let i = 0; i < n; i++) {
    const r = Math.hypot(p[3 * i]!, p[3 * i + 1]!, p[3 * i + 2]!);
    if (r < best) {
      best = r;
      centre = i;
    }
    if (cn[i] === 9 && r < bestFacet) {
      bestFacet = r;
      facet = i;
    }
  }
  if (facet < 0) throw invalid('shells', 'this cuboctahedron has no (111) facet centre site; use more shells');
  const model = new OffLatticeGupta([h.symbol, s.symbol]);
  const relaxedWithSoluteAt = (site: number): number => {
    const types = new Uint8Array(n);
    types[site] = 1;
    const positions = Float64Array.from(p);
    return minimiseInPlace(model, positions, types, { forceToleranceEvPerAngstrom: 1e-4, maxIterations: 50_000 })
      .energyEv;
  };
  return {
    host: h.symbol,
    solute: s.symbol,
    segregationEnergyEv: relaxedWithSoluteAt(facet) - relaxedWithSoluteAt(centre),
    atoms: n,
    method: `relaxed off-lattice Gupta energy, ${n}-atom ${h.symbol} cuboctahedron, solute at a (111) facet centre vs the centre (FIRE)`,
  };
}
