/**
 * The Gupta potential written as a LAMMPS `eam/fs` table (setfl, Finnis–Sinclair flavour) and a runner
 * for Debian's `lmp`. eam/fs carries a density function per element PAIR, which the Gupta model with
 * the mixing rule needs (ξ_AB, q_AB, r0_AB); eam/alloy could only express it for a pure metal.
 *
 * Mapping: E = Σ_i F(ρ_i) + ½ Σ_i Σ_j φ(r_ij) with F(ρ) = −√ρ, ρ_i = Σ_j ξ_ij² exp(−2 q_ij (r/r0_ij − 1)),
 * φ(r) = 2 A_ij exp(−p_ij (r/r0_ij − 1)); the table stops at the same sharp cutoff (2.35 nn) as ours.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import {
  guptaElement,
  guptaPair,
  pairDensityEv2,
  pairRepulsionEv,
} from '../../shared-model/montecarlo/gupta-parameters';
import { OffLatticeGupta } from '../../shared-model/montecarlo/offlattice-gupta';

/** Atomic numbers (IUPAC periodic table) of the ten Gupta metals. */
const ATOMIC_NUMBER: Record<string, number> = {
  Al: 13,
  Ni: 28,
  Cu: 29,
  Rh: 45,
  Pd: 46,
  Ag: 47,
  Ir: 77,
  Pt: 78,
  Au: 79,
  Pb: 82,
};

export interface EamTableOptions {
  /** Points of the r grid (0 .. cutoff). */
  nr?: number;
  /** Points of the ρ grid (0 .. rhoMax). */
  nrho?: number;
  /**
   * Tabulate the off-lattice energy: each pair's functions times its quintic switch (zero beyond its
   * rc2); the table's cutoff must then be the largest rc2 (`OffLatticeGupta.maxCutoffAngstrom`).
   */
  switched?: boolean;
}

function fmt(values: Float64Array): string {
  const lines: string[] = [];
  for (let k = 0; k < values.length; k += 5)
    lines.push(Array.from(values.subarray(k, k + 5), (v) => v.toExponential(16)).join(' '));
  return lines.join('\n');
}

/** setfl eam/fs text for `elements` with a sharp cutoff at `cutoffAngstrom`. */
export function writeEamFs(elements: readonly string[], cutoffAngstrom: number, options: EamTableOptions = {}): string {
  const nr = options.nr ?? 20_000;
  const nrho = options.nrho ?? 20_000;
  const dr = cutoffAngstrom / (nr - 1);
  // Largest density an atom can see: a bulk site of the densest pair at 5 % compression, with margin.
  let rhoMax = 0;
  for (const a of elements) {
    for (const b of elements) {
      const pair = guptaPair(a, b);
      let rho = 0;
      const shells = [12, 6, 24, 12, 24];
      shells.forEach((count, k) => (rho += count * pairDensityEv2(pair, 0.95 * pair.r0Angstrom * Math.sqrt(k + 1))));
      rhoMax = Math.max(rhoMax, rho);
    }
  }
  rhoMax *= 1.5;
  const drho = rhoMax / (nrho - 1);
  const smooth = options.switched ? new OffLatticeGupta(elements) : null;
  const density = (a: number, b: number, r: number) =>
    smooth ? smooth.pairTerms(a, b, r).rho : pairDensityEv2(guptaPair(elements[a]!, elements[b]!), r);
  const repulsion = (a: number, b: number, r: number) =>
    smooth ? smooth.pairTerms(a, b, r).phi : pairRepulsionEv(guptaPair(elements[a]!, elements[b]!), r);
  const out: string[] = [
    'Pairwright Gupta (second-moment tight-binding) potential, Cleri & Rosato PRB 48, 22 (1993) parameters',
    smooth
      ? 'unlike pairs by the mixing rule; per-pair quintic switch between 2.31 and 2.37 r0_ab (5th-6th shells)'
      : 'unlike pairs by the mixing rule (arithmetic p, q, r0; geometric A, xi); sharp cutoff at 2.35 nn',
    'F(rho) = -sqrt(rho); rho_ij(r) = xi^2 exp(-2q(r/r0-1)); phi(r) = 2A exp(-p(r/r0-1))',
    `${elements.length} ${elements.join(' ')}`,
    `${nrho} ${drho.toExponential(16)} ${nr} ${dr.toExponential(16)} ${cutoffAngstrom.toExponential(16)}`,
  ];
  for (const [a, symbol] of elements.entries()) {
    const e = guptaElement(symbol);
    out.push(`${ATOMIC_NUMBER[symbol]} ${e.massU} ${e.latticeAngstrom} fcc`);
    const f = new Float64Array(nrho);
    for (let k = 0; k < nrho; k++) f[k] = -Math.sqrt(k * drho);
    out.push(fmt(f));
    for (let b = 0; b < elements.length; b++) {
      const rho = new Float64Array(nr);
      for (let k = 0; k < nr; k++) rho[k] = density(a, b, k * dr);
      out.push(fmt(rho));
    }
  }
  for (let i = 0; i < elements.length; i++) {
    for (let j = 0; j <= i; j++) {
      const rphi = new Float64Array(nr);
      for (let k = 0; k < nr; k++) rphi[k] = k * dr * repulsion(i, j, k * dr);
      out.push(fmt(rphi));
    }
  }
  return out.join('\n') + '\n';
}

/** LAMMPS data file (atom_style atomic) in a box with free boundaries around the cluster. */
export function writeLammpsData(
  symbols: readonly string[],
  positions: Float64Array,
  elements: readonly string[],
): string {
  const n = symbols.length;
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of positions) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  lo -= 20;
  hi += 20;
  const lines = [
    'Pairwright cluster',
    '',
    `${n} atoms`,
    `${elements.length} atom types`,
    '',
    `${lo} ${hi} xlo xhi`,
    `${lo} ${hi} ylo yhi`,
    `${lo} ${hi} zlo zhi`,
    '',
    'Masses',
    '',
    ...elements.map((s, k) => `${k + 1} ${guptaElement(s).massU}`),
    '',
    'Atoms # atomic',
    '',
  ];
  for (let i = 0; i < n; i++) {
    lines.push(
      `${i + 1} ${elements.indexOf(symbols[i]!) + 1} ${positions[3 * i]!.toFixed(12)} ${positions[3 * i + 1]!.toFixed(12)} ${positions[3 * i + 2]!.toFixed(12)}`,
    );
  }
  return lines.join('\n') + '\n';
}

export interface LammpsRun {
  stdout: string;
  dir: string;
}

/** Runs `lmp` on `script` in a fresh temporary folder holding `files`; removes the folder afterwards. */
export function runLammps(script: string, files: Record<string, string>, timeoutMs = 600_000): string {
  const dir = mkdtempSync(join(tmpdir(), 'pairwright-lmp-'));
  try {
    for (const [name, content] of Object.entries(files)) writeFileSync(join(dir, name), content);
    writeFileSync(join(dir, 'in.pairwright'), script);
    return execFileSync('lmp', ['-in', 'in.pairwright', '-log', 'none', '-nocite'], {
      cwd: dir,
      encoding: 'utf8',
      timeout: timeoutMs,
      maxBuffer: 64 * 1024 * 1024,
    });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Runs `lmp` on a free cluster (`symbols` at `positions`, atom types in the order of `elements`) with the
 * tabulated Gupta potential, then `commands`; answers LAMMPS' standard output.
 */
export function runLammpsGuptaCluster(
  symbols: readonly string[],
  positions: Float64Array,
  elements: readonly string[],
  cutoffAngstrom: number,
  commands: readonly string[],
  table: EamTableOptions = {},
): string {
  const script = [
    'units metal',
    'atom_style atomic',
    'atom_modify map array',
    'boundary f f f',
    'read_data cluster.data',
    'pair_style eam/fs',
    `pair_coeff * * gupta.eam.fs ${elements.join(' ')}`,
    ...commands,
  ].join('\n');
  return runLammps(script, {
    'cluster.data': writeLammpsData(symbols, positions, elements),
    'gupta.eam.fs': writeEamFs(elements, cutoffAngstrom, table),
  });
}

/** Total energy (eV) LAMMPS computes for a cluster with the tabulated Gupta potential. */
export function lammpsGuptaEnergyEv(
  symbols: readonly string[],
  positions: Float64Array,
  cutoffAngstrom: number,
): number {
  const elements = [...new Set(symbols)];
  const stdout = runLammpsGuptaCluster(symbols, positions, elements, cutoffAngstrom, [
    'thermo_style custom step pe',
    'run 0',
    'print "PAIRWRIGHT_ENERGY $(pe:%.12f)"',
  ]);
  const match = /PAIRWRIGHT_ENERGY (-?[0-9.eE+-]+)/.exec(stdout);
  if (!match) throw new Error(`LAMMPS printed no energy:\n${stdout.slice(-2000)}`);
  return Number(match[1]);
}

/** Energy (eV) LAMMPS computes with the switched (off-lattice) table; `minimize` first when asked (cg). */
export function lammpsSwitchedEnergyEv(
  symbols: readonly string[],
  positions: Float64Array,
  options: { minimize?: boolean } = {},
): number {
  const elements = [...new Set(symbols)];
  const cutoff = new OffLatticeGupta(elements).maxCutoffAngstrom;
  const commands = ['thermo_style custom step pe fmax', 'thermo_modify format float %.12f'];
  if (options.minimize) commands.push('min_style cg', 'minimize 0 1e-8 50000 500000');
  else commands.push('run 0');
  commands.push('print "PAIRWRIGHT_ENERGY $(pe:%.12f)"');
  const stdout = runLammpsGuptaCluster(symbols, positions, elements, cutoff, commands, { switched: true });
  const match = /PAIRWRIGHT_ENERGY (-?[0-9.eE+-]+)/.exec(stdout);
  if (!match) throw new Error(`LAMMPS printed no energy:\n${stdout.slice(-2000)}`);
  return Number(match[1]);
}
