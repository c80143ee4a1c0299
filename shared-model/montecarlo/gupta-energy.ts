/**
 * Gupta (second-moment tight-binding) energies outside the Monte Carlo loop: bulk fcc cohesive
 * energy, the total energy of any configuration (a structure file), and a plain O(N²) reference sum
 * used by the tests to check the fast engine.
 *
 * E = Σ_{pairs i<j, r<rc} 2A_ij exp(−p_ij (r/r0_ij − 1)) − Σ_i √( Σ_{j, r<rc} ξ_ij² exp(−2q_ij (r/r0_ij − 1)) ),
 * rc = 2.35 × the structure's nearest-neighbour distance (five fcc shells, sharp cutoff); see
 * `structureNearestNeighbourAngstrom` for how that distance is read from a structure.
 */
import { invalid } from '../api/result';
import { BudgetMeter, type Clock, type ComputeBudget } from '../compute-budget';
import { FIRST_SHELL_FACTOR, FIVE_SHELL_CUTOFF_FACTOR, pairsWithin } from '../clusters/neighbours';
import {
  guptaElement,
  guptaPair,
  pairDensityEv2,
  pairRepulsionEv,
  type GuptaPairParameters,
  type PairRule,
} from './gupta-parameters';

/** Pair parameters for every ordered pair of `elements` (a symmetric matrix, row-major). */
export function pairMatrix(elements: readonly string[]): GuptaPairParameters[] {
  const out: GuptaPairParameters[] = [];
  for (const a of elements) for (const b of elements) out.push(guptaPair(a, b));
  return out;
}

/**
 * Bulk fcc energy per atom (eV) of a pure metal at lattice constant `latticeAngstrom` (default: the
 * one its parameters were fitted at), summing the neighbour shells closer than 2.35 nearest-neighbour
 * distances (the five shells 12, 6, 24, 12, 24). The negative of the cohesive energy at equilibrium.
 */
export function bulkEnergyPerAtomEv(symbol: string, latticeAngstrom?: number): number {
  const element = guptaElement(symbol);
  const a = latticeAngstrom ?? element.latticeAngstrom;
  if (!Number.isFinite(a) || a <= 0)
    throw invalid('latticeAngstrom', `lattice constant must be a positive number of Å, got ${a}`);
  const pair = guptaPair(symbol, symbol);
  const nn = a / Math.SQRT2;
  const cutoff = FIVE_SHELL_CUTOFF_FACTOR * nn;
  const half = a / 2;
  const extent = Math.ceil(cutoff / half) + 1;
  let repulsion = 0;
  let density = 0;
  for (let x = -extent; x <= extent; x++) {
    for (let y = -extent; y <= extent; y++) {
      for (let z = -extent; z <= extent; z++) {
        if ((x + y + z) % 2 !== 0 || (x === 0 && y === 0 && z === 0)) continue;
        const r = half * Math.sqrt(x * x + y * y + z * z);
        if (r >= cutoff) continue;
        repulsion += pairRepulsionEv(pair, r) / 2;
        density += pairDensityEv2(pair, r);
      }
    }
  }
  return repulsion - Math.sqrt(density);
}

/**
 * The nearest-neighbour distance of a structure (Å): the mean length of its first-shell bonds, i.e. of
 * the pairs closer than (1 + √2)/2 × d0, where d0 is the median over atoms of each atom's nearest
 * distance. For an fcc lattice this is the lattice's nearest-neighbour distance; for a Mackay
 * icosahedron it is the mean bond the builder scales to. Atoms with no neighbour within 4.5 Å are ignored.
 */
export function structureNearestNeighbourAngstrom(positions: Float64Array, meter?: BudgetMeter): number {
  const atoms = positions.length / 3;
  if (atoms < 2)
    throw invalid('structure', 'a structure needs at least two atoms to define a nearest-neighbour distance');
  const search = 4.5;
  const pairs = pairsWithin(positions, search, meter && ((found) => meter.reach(found)));
  const nearest = new Float64Array(atoms).fill(Infinity);
  for (let k = 0; k < pairs.count; k++) {
    const d = pairs.distanceAngstrom[k]!;
    const i = pairs.first[k]!;
    const j = pairs.second[k]!;
    if (d < nearest[i]!) nearest[i] = d;
    if (d < nearest[j]!) nearest[j] = d;
  }
  const found = Array.from(nearest).filter((d) => Number.isFinite(d));
  if (found.length === 0) {
    throw invalid(
      'structure',
      `no two atoms are closer than ${search} Å; coordinates must be in Å and describe a condensed cluster`,
    );
  }
  found.sort((x, y) => x - y);
  const mid = found.length >> 1;
  const median = found.length % 2 === 1 ? found[mid]! : (found[mid - 1]! + found[mid]!) / 2;
  const limit = FIRST_SHELL_FACTOR * median;
  let sum = 0;
  let count = 0;
  for (let k = 0; k < pairs.count; k++) {
    const d = pairs.distanceAngstrom[k]!;
    if (d < limit) {
      sum += d;
      count++;
    }
  }
  return sum / count;
}

export interface AtomicStructure {
  /** Element symbol per atom. */
  symbols: readonly string[];
  /** Å, interleaved x, y, z. */
  positions: Float64Array;
}

export interface StructureEnergy {
  atoms: number;
  energyEv: number;
  energyPerAtomEv: number;
  /** Element → atom count. */
  composition: Record<string, number>;
  nearestNeighbourAngstrom: number;
  cutoffAngstrom: number;
  /** How each unlike pair's parameters were obtained (the mixing rule unless a published fit applies). */
  pairRules: PairRule[];
  /** Zero-distance or overlapping atoms would make the energy meaningless; pairs closer than 0.5 nn are refused. */
  closestPairAngstrom: number;
}

function speciesIndices(symbols: readonly string[]): { elements: string[]; index: Uint8Array } {
  const elements: string[] = [];
  const index = new Uint8Array(symbols.length);
  symbols.forEach((symbol, i) => {
    guptaElement(symbol, `atoms[${i + 1}].species`);
    let k = elements.indexOf(symbol);
    if (k < 0) {
      elements.push(symbol);
      k = elements.length - 1;
    }
    index[i] = k;
  });
  return { elements, index };
}

/**
 * Pair terms and wall time of one energy: 12 million pairs (~200 MB of pair list) is a 500,000-atom cluster at the
 * five-shell cutoff, or 16,000 atoms at 15 Å (6.7 million); 30 s is far above the ~1 s such a sum takes.
 */
export const ENERGY_BUDGET: ComputeBudget = Object.freeze({ maxIterations: 12_000_000, maxWallMs: 30_000 });

export interface TotalEnergyOptions {
  cutoffAngstrom?: number;
  /** Pair terms (pairs within the cutoff) and wall time; default ENERGY_BUDGET. */
  budget?: ComputeBudget;
  clock?: Clock;
}

/**
 * Total Gupta energy of any configuration of supported metals (a cluster; no periodic images).
 * Cutoff: `cutoffAngstrom` if given, else 2.35 × `structureNearestNeighbourAngstrom`.
 */
export function totalEnergy(structure: AtomicStructure, options: TotalEnergyOptions = {}): StructureEnergy {
  const atoms = structure.symbols.length;
  if (atoms === 0) throw invalid('structure', 'the structure holds no atoms');
  if (structure.positions.length !== 3 * atoms)
    throw invalid(
      'structure',
      `expected ${3 * atoms} coordinates for ${atoms} atoms, got ${structure.positions.length}`,
    );
  const { elements, index } = speciesIndices(structure.symbols);
  const meter = new BudgetMeter(
    options.budget ?? ENERGY_BUDGET,
    {
      what: `the energy of ${atoms} atoms`,
      unit: 'pair terms',
      advice: 'use a smaller cut-off (the default five-shell one), or a smaller structure',
      field: options.cutoffAngstrom === undefined ? 'xyz' : 'cutoffAngstrom',
    },
    options.clock,
  );
  meter.stage = 'the nearest-neighbour search';
  const nn = atoms >= 2 ? structureNearestNeighbourAngstrom(structure.positions, meter) : 1;
  const cutoff = options.cutoffAngstrom ?? FIVE_SHELL_CUTOFF_FACTOR * nn;
  if (!Number.isFinite(cutoff) || cutoff <= 0)
    throw invalid('cutoffAngstrom', `cutoff must be a positive number of Å, got ${cutoff}`);
  const matrix = pairMatrix(elements);
  const m = elements.length;
  const density = new Float64Array(atoms);
  let repulsion = 0;
  let closest = Infinity;
  meter.stage = `the pair search within ${cutoff.toFixed(2)} Å`;
  const pairs =
    atoms >= 2
      ? pairsWithin(structure.positions, cutoff, (found) => meter.reach(found))
      : { first: new Int32Array(0), second: new Int32Array(0), distanceAngstrom: new Float64Array(0), count: 0 };
  meter.stage = 'the pair sum';
  for (let k = 0; k < pairs.count; k++) {
    if ((k & 0xffff) === 0) meter.check();
    const i = pairs.first[k]!;
    const j = pairs.second[k]!;
    const r = pairs.distanceAngstrom[k]!;
    if (r < closest) closest = r;
    const pair = matrix[index[i]! * m + index[j]!]!;
    repulsion += pairRepulsionEv(pair, r);
    const rho = pairDensityEv2(pair, r);
    density[i]! += rho;
    density[j]! += rho;
  }
  if (closest < 0.5 * nn) {
    throw invalid(
      'structure',
      `two atoms are only ${closest.toFixed(3)} Å apart (nearest-neighbour distance ${nn.toFixed(3)} Å); overlapping atoms have no meaningful energy`,
    );
  }
  let band = 0;
  for (let i = 0; i < atoms; i++) band += Math.sqrt(density[i]!);
  const energyEv = repulsion - band;
  const composition: Record<string, number> = {};
  for (const symbol of structure.symbols) composition[symbol] = (composition[symbol] ?? 0) + 1;
  const pairRules: PairRule[] = [];
  for (let a = 0; a < m; a++) for (let b = a + 1; b < m; b++) pairRules.push(matrix[a * m + b]!.rule);
  return {
    atoms,
    energyEv,
    energyPerAtomEv: energyEv / atoms,
    composition,
    nearestNeighbourAngstrom: nn,
    cutoffAngstrom: cutoff,
    pairRules,
    closestPairAngstrom: closest,
  };
}

/**
 * Reference sum over all N(N−1)/2 pairs with no neighbour list (O(N²)); the tests compare the fast
 * engine and `totalEnergy` with it.
 */
export function bruteForceEnergyEv(structure: AtomicStructure, cutoffAngstrom: number): number {
  const atoms = structure.symbols.length;
  const { elements, index } = speciesIndices(structure.symbols);
  const matrix = pairMatrix(elements);
  const m = elements.length;
  const p = structure.positions;
  let repulsion = 0;
  let band = 0;
  for (let i = 0; i < atoms; i++) {
    let density = 0;
    for (let j = 0; j < atoms; j++) {
      if (j === i) continue;
      const r = Math.hypot(p[3 * i]! - p[3 * j]!, p[3 * i + 1]! - p[3 * j + 1]!, p[3 * i + 2]! - p[3 * j + 2]!);
      if (r >= cutoffAngstrom) continue;
      const pair = matrix[index[i]! * m + index[j]!]!;
      repulsion += pairRepulsionEv(pair, r) / 2;
      density += pairDensityEv2(pair, r);
    }
    band += Math.sqrt(density);
  }
  return repulsion - band;
}
