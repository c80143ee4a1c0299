/**
 * Numbers that see phase separation in a binary particle, beyond surface composition and Warren–Cowley:
 * - the distance between the centres of mass of the two elements (an off-centre core or a Janus
 *   particle moves them apart; a centred core@shell or an alloy keeps them together), also relative to
 *   the particle's radius (√(5/3) × radius of gyration, the radius of a uniform sphere of that gyration);
 * - the A–B interface: atoms with at least one unlike nearest neighbour, and an area estimate,
 *   (interface atoms / 2) × the area of one atom in a close-packed (111) plane, (√3/2)·nn²;
 * - connected domains per element: like atoms joined by nearest-neighbour bonds (union–find), with the
 *   share of each element's atoms in its largest domain (1 = one connected piece).
 * Neighbours are the first-shell bonds of the particle's sites (atoms of a relaxed run stay near them).
 */
import { FIRST_SHELL_FACTOR, type NeighbourList } from '../clusters/neighbours';

export interface ElementDomains {
  /** Connected pieces of this element (0 when it has no atoms). */
  domains: number;
  /** Share of the element's atoms in its largest piece. */
  largestDomainShare: number;
}

export interface SeparationAnalysis {
  /** Distance between the centres of mass of the A atoms and of the B atoms (Å). */
  centreOfMassDistanceAngstrom: number;
  /** That distance over the particle radius (0 centred; ~0.5 or more for a Janus particle). */
  centreOfMassOffset: number;
  particleRadiusAngstrom: number;
  /** Atoms with at least one unlike nearest neighbour. */
  interfaceAtoms: number;
  /** interfaceAtoms / N. */
  interfaceShare: number;
  /** (interface atoms / 2) × (√3/2)·nn², in nm². */
  interfaceAreaNm2: number;
  /** Element symbol → domains. */
  domains: Record<string, ElementDomains>;
}

function find(parent: Int32Array, i: number): number {
  let root = i;
  while (parent[root] !== root) root = parent[root]!;
  while (parent[i] !== root) {
    const next = parent[i]!;
    parent[i] = root;
    i = next;
  }
  return root;
}

export function analyseSeparation(
  list: NeighbourList,
  nnAngstrom: number,
  positions: Float64Array,
  species: Uint8Array,
  elementA: string,
  elementB: string,
): SeparationAnalysis {
  const n = list.atoms;
  const limit = FIRST_SHELL_FACTOR * nnAngstrom;
  const centre = [0, 0, 0];
  const sum = [
    [0, 0, 0],
    [0, 0, 0],
  ];
  const count = [0, 0];
  for (let i = 0; i < n; i++) {
    const s = species[i]!;
    count[s]!++;
    for (let c = 0; c < 3; c++) {
      centre[c]! += positions[3 * i + c]!;
      sum[s]![c]! += positions[3 * i + c]!;
    }
  }
  for (let c = 0; c < 3; c++) centre[c]! /= n;
  let gyration = 0;
  for (let i = 0; i < n; i++) {
    for (let c = 0; c < 3; c++) gyration += (positions[3 * i + c]! - centre[c]!) ** 2;
  }
  const radius = Math.sqrt((5 / 3) * (gyration / n));
  let distance = 0;
  if (count[0]! > 0 && count[1]! > 0) {
    let d2 = 0;
    for (let c = 0; c < 3; c++) d2 += (sum[0]![c]! / count[0]! - sum[1]![c]! / count[1]!) ** 2;
    distance = Math.sqrt(d2);
  }
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  const atInterface = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    for (let e = list.offsets[i]!; e < list.offsets[i + 1]!; e++) {
      const j = list.neighbours[e]!;
      if (j <= i || list.classDistancesAngstrom[list.distanceClass[e]!]! >= limit) continue;
      if (species[i] !== species[j]) {
        atInterface[i] = 1;
        atInterface[j] = 1;
      } else {
        const ri = find(parent, i);
        const rj = find(parent, j);
        if (ri !== rj) parent[ri] = rj;
      }
    }
  }
  let interfaceAtoms = 0;
  for (let i = 0; i < n; i++) interfaceAtoms += atInterface[i]!;
  const size = new Int32Array(n);
  for (let i = 0; i < n; i++) size[find(parent, i)]!++;
  const domains: Record<string, ElementDomains> = {};
  [elementA, elementB].forEach((symbol, s) => {
    let pieces = 0;
    let largest = 0;
    for (let i = 0; i < n; i++) {
      if (species[i] !== s || parent[i] !== i) continue;
      pieces++;
      largest = Math.max(largest, size[i]!);
    }
    domains[symbol] = { domains: pieces, largestDomainShare: count[s]! > 0 ? largest / count[s]! : 0 };
  });
  const atomArea = (Math.sqrt(3) / 2) * nnAngstrom * nnAngstrom;
  return {
    centreOfMassDistanceAngstrom: distance,
    centreOfMassOffset: radius > 0 ? distance / radius : 0,
    particleRadiusAngstrom: radius,
    interfaceAtoms,
    interfaceShare: n > 0 ? interfaceAtoms / n : 0,
    interfaceAreaNm2: ((interfaceAtoms / 2) * atomArea) / 100,
    domains,
  };
}
