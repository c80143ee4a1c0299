/**
 * Particle arithmetic for a batch (DOMAIN.md Models 5): atoms per particle, atoms in core and shell,
 * shell thickness ↔ monolayers, particle count and concentration from a metal amount (or the reverse).
 * Spheres at bulk density; lattice constants come in as arguments (fcc, or for a non-fcc metal the
 * fcc-equivalent constant (4·V_atom)^(1/3) that gives the same atoms per volume).
 */
import { invalid } from '../api/result';
import { atomsInSphere, atomsInSphericalShell, monolayerThicknessNm, vegardLatticeNm } from '../geometry/fcc';

/** Avogadro constant, exact in the 2019 SI (CODATA 2018). */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/** Largest particle Pairwright plans (nm): beyond it the batch is no longer a nanoparticle synthesis. */
export const MAX_DIAMETER_NM = 1000;
/** Thinnest shell accepted (monolayers): below a tenth of a layer a "shell" has no physical meaning. */
export const MIN_SHELL_MONOLAYERS = 0.1;

export interface ParticleGeometry {
  architecture: 'alloy' | 'core@shell' | 'single-metal';
  diameterNm: number;
  atomsPerParticle: number;
  /** For an alloy the whole particle counts as core (shellAtoms = 0). */
  coreAtoms: number;
  shellAtoms: number;
  atomsA: number;
  atomsB: number;
  /** Atomic fraction of B in the particle. */
  xB: number;
  coreDiameterNm: number | null;
  shellThicknessNm: number | null;
  shellMonolayers: number | null;
  /** Lattice constant used for the alloy (Vegard) or for core and shell. */
  latticeNm: { core: number; shell: number | null };
}

function requirePositive(field: string, value: number, unit: string): void {
  if (!Number.isFinite(value) || value <= 0)
    throw invalid(field, `${field} must be greater than 0 ${unit}, got ${value}`);
}

function requireDiameter(field: string, value: number): void {
  requirePositive(field, value, 'nm');
  if (value > MAX_DIAMETER_NM)
    throw invalid(field, `${field} ${value} nm is beyond ${MAX_DIAMETER_NM} nm, not a nanoparticle batch`);
}

/** Solid-solution sphere of diameter `diameterNm` with atomic fraction `xB` of B (Vegard lattice constant). */
export function alloyParticle(
  diameterNm: number,
  xB: number,
  latticeANm: number,
  latticeBNm: number,
): ParticleGeometry {
  requireDiameter('size.diameterNm', diameterNm);
  if (!Number.isFinite(xB) || xB <= 0 || xB >= 1) {
    const got = `x_B = ${xB.toPrecision(4)} (${(xB * 100).toPrecision(4)} at.%)`;
    throw invalid('size.xB', `composition x_B must lie strictly between 0 and 1 (0 and 100 at.%), got ${got}`);
  }
  const latticeNm = vegardLatticeNm(latticeANm, latticeBNm, xB);
  const atoms = atomsInSphere(diameterNm, latticeNm);
  return {
    architecture: 'alloy',
    diameterNm,
    atomsPerParticle: atoms,
    coreAtoms: atoms,
    shellAtoms: 0,
    atomsA: atoms * (1 - xB),
    atomsB: atoms * xB,
    xB,
    coreDiameterNm: null,
    shellThicknessNm: null,
    shellMonolayers: null,
    latticeNm: { core: latticeNm, shell: null },
  };
}

/** Sphere of one metal (seeds): `isB` says which element of the pair it is. */
export function singleMetalParticle(diameterNm: number, latticeNm: number, isB: boolean): ParticleGeometry {
  requireDiameter('size.diameterNm', diameterNm);
  const atoms = atomsInSphere(diameterNm, latticeNm);
  return {
    architecture: 'single-metal',
    diameterNm,
    atomsPerParticle: atoms,
    coreAtoms: atoms,
    shellAtoms: 0,
    atomsA: isB ? 0 : atoms,
    atomsB: isB ? atoms : 0,
    xB: isB ? 1 : 0,
    coreDiameterNm: null,
    shellThicknessNm: null,
    shellMonolayers: null,
    latticeNm: { core: latticeNm, shell: null },
  };
}

export type ShellSpec = { thicknessNm: number } | { monolayers: number };

/** Shell thickness in nm from either form; throws naming the field for a meaningless shell. */
export function shellThicknessNm(shell: ShellSpec, shellLatticeNm: number): number {
  const layerNm = monolayerThicknessNm(shellLatticeNm);
  if ('monolayers' in shell) {
    if (!Number.isFinite(shell.monolayers) || shell.monolayers < MIN_SHELL_MONOLAYERS) {
      throw invalid(
        'size.shellMonolayers',
        `shell must be at least ${MIN_SHELL_MONOLAYERS} monolayer, got ${shell.monolayers}`,
      );
    }
    return shell.monolayers * layerNm;
  }
  requirePositive('size.shellThicknessNm', shell.thicknessNm, 'nm');
  if (shell.thicknessNm < MIN_SHELL_MONOLAYERS * layerNm) {
    throw invalid(
      'size.shellThicknessNm',
      `shell ${shell.thicknessNm} nm is less than ${MIN_SHELL_MONOLAYERS} monolayer (one (111) layer is ${layerNm.toFixed(3)} nm)`,
    );
  }
  return shell.thicknessNm;
}

/**
 * Core@shell sphere: core of `coreDiameterNm` (element at index `coreIs`), shell of the other element.
 * `coreIs` says whether the core is A or B so atomsA/atomsB come out right.
 */
export function coreShellParticle(
  coreDiameterNm: number,
  shell: ShellSpec,
  coreLatticeNm: number,
  shellLatticeNm: number,
  coreIs: 'A' | 'B',
): ParticleGeometry {
  requireDiameter('size.coreDiameterNm', coreDiameterNm);
  const thicknessNm = shellThicknessNm(shell, shellLatticeNm);
  const diameterNm = coreDiameterNm + 2 * thicknessNm;
  if (diameterNm > MAX_DIAMETER_NM) {
    throw invalid(
      'thicknessNm' in shell ? 'size.shellThicknessNm' : 'size.shellMonolayers',
      `core ${coreDiameterNm} nm plus this shell makes a ${diameterNm.toFixed(0)} nm particle, beyond ${MAX_DIAMETER_NM} nm`,
    );
  }
  const coreAtoms = atomsInSphere(coreDiameterNm, coreLatticeNm);
  const shellAtoms = atomsInSphericalShell(coreDiameterNm, thicknessNm, shellLatticeNm);
  const total = coreAtoms + shellAtoms;
  const atomsA = coreIs === 'A' ? coreAtoms : shellAtoms;
  const atomsB = coreIs === 'A' ? shellAtoms : coreAtoms;
  return {
    architecture: 'core@shell',
    diameterNm,
    atomsPerParticle: total,
    coreAtoms,
    shellAtoms,
    atomsA,
    atomsB,
    xB: atomsB / total,
    coreDiameterNm,
    shellThicknessNm: thicknessNm,
    shellMonolayers: thicknessNm / monolayerThicknessNm(shellLatticeNm),
    latticeNm: { core: coreLatticeNm, shell: shellLatticeNm },
  };
}

/** Core diameter from an overall diameter and a shell thickness; the shell must be thinner than the radius. */
export function coreDiameterFromOverall(diameterNm: number, shellNm: number): number {
  requireDiameter('size.diameterNm', diameterNm);
  requirePositive('size.shellThicknessNm', shellNm, 'nm');
  const core = diameterNm - 2 * shellNm;
  if (core <= 0) {
    throw invalid(
      'size.shellThicknessNm',
      `a ${shellNm} nm shell on a ${diameterNm} nm particle leaves no core (the shell must be thinner than the radius, ${(diameterNm / 2).toFixed(2)} nm)`,
    );
  }
  return core;
}

/** Number of particles that `metalMmol` of metal atoms makes at `atomsPerParticle` each. */
export function particlesFromMetal(metalMmol: number, atomsPerParticle: number): number {
  requirePositive('amount.totalMetalMmol', metalMmol, 'mmol');
  requirePositive('atomsPerParticle', atomsPerParticle, 'atoms');
  return ((metalMmol / 1000) * AVOGADRO_PER_MOL) / atomsPerParticle;
}

/** Metal (mmol) needed for `particles` particles of `atomsPerParticle` atoms. */
export function metalForParticles(particles: number, atomsPerParticle: number): number {
  requirePositive('particles', particles, '');
  requirePositive('atomsPerParticle', atomsPerParticle, 'atoms');
  return ((particles * atomsPerParticle) / AVOGADRO_PER_MOL) * 1000;
}

/** Molar particle concentration (nmol/L, "nM") of `particlesPerMl`. */
export function particleNanomolar(particlesPerMl: number): number {
  return ((particlesPerMl * 1000) / AVOGADRO_PER_MOL) * 1e9;
}

/** Seeds per mL from the metal concentration of a seed dispersion (mM of metal atoms) and atoms per seed. */
export function seedsPerMlFromMetal(metalMm: number, atomsPerSeed: number): number {
  requirePositive('seeds.metalMm', metalMm, 'mM');
  requirePositive('atomsPerSeed', atomsPerSeed, 'atoms');
  return ((metalMm / 1e6) * AVOGADRO_PER_MOL) / atomsPerSeed;
}
