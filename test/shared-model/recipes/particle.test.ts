import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { sphereDiameterForAtoms } from '../../../shared-model/geometry/fcc';
import { magicClusterAtoms, magicClusterSurfaceAtoms } from '../../../shared-model/geometry/magic-numbers';
import {
  AVOGADRO_PER_MOL,
  alloyParticle,
  coreDiameterFromOverall,
  coreShellParticle,
  particleNanomolar,
  particlesFromMetal,
  seedsPerMlFromMetal,
  singleMetalParticle,
} from '../../../shared-model/recipes/particle';

// Lattice constants at room temperature, Kittel, Introduction to Solid State Physics, 8th ed., Table 1.3 / ch. 1 (from memory).
const A_AU = 0.40782;
const A_PT = 0.39242;
const A_NI = 0.3524;

function fieldOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (error) {
    if (error instanceof DomainError) return error.field;
    throw error;
  }
  return undefined;
}

describe('atoms per particle, worked by hand', () => {
  it('5 nm Au sphere', () => {
    // a³ = 0.40782³ = 0.0678275 nm³ → 4/a³ = 58.973 atoms/nm³
    // V = π/6 · 5³ = 65.4498 nm³ → N = 65.4498 × 58.973 = 3859.8 atoms
    const au = singleMetalParticle(5, A_AU, false);
    expect(au.atomsPerParticle).toBeCloseTo(3859.8, 0);
    expect(au.atomsA).toBe(au.atomsPerParticle);
  });

  it('two Pt monolayers on a 10 nm Au core', () => {
    // one (111) monolayer of Pt = a/√3 = 0.39242/1.73205 = 0.226564 nm; 2 ML = 0.453128 nm
    // outer diameter = 10 + 2 × 0.453128 = 10.906256 nm; 10.906256³ = 1297.260 nm³
    // shell volume = π/6 (1297.260 − 1000) = 155.645 nm³; Pt density 4/0.39242³ = 66.192 atoms/nm³
    // shell atoms = 155.645 × 66.192 = 10302.5; core atoms = π/6 · 1000 × 58.973 = 30878.3
    const p = coreShellParticle(10, { monolayers: 2 }, A_AU, A_PT, 'A');
    expect(p.shellThicknessNm).toBeCloseTo(0.453128, 5);
    expect(p.diameterNm).toBeCloseTo(10.906256, 5);
    expect(p.shellAtoms).toBeCloseTo(10302.5, 0);
    expect(p.coreAtoms).toBeCloseTo(30878.3, 0);
    expect(p.atomsA).toBe(p.coreAtoms);
    expect(p.atomsB).toBe(p.shellAtoms);
    expect(p.xB).toBeCloseTo(10302.5 / (10302.5 + 30878.3), 4);
    // the same shell given in nm reads back as 2 monolayers
    const sameInNm = coreShellParticle(10, { thicknessNm: 0.453128 }, A_AU, A_PT, 'A');
    expect(sameInNm.shellMonolayers).toBeCloseTo(2, 4);
  });

  it('4 nm Pt75Ni25 alloy with a Vegard lattice constant', () => {
    // a = 0.75 × 0.39242 + 0.25 × 0.35240 = 0.382415 nm; a³ = 0.0559248 nm³ → 71.525 atoms/nm³
    // V = π/6 · 64 = 33.5103 nm³ → N = 2396.8 atoms: 1797.6 Pt + 599.2 Ni
    const p = alloyParticle(4, 0.25, A_PT, A_NI);
    expect(p.latticeNm.core).toBeCloseTo(0.382415, 6);
    expect(p.atomsPerParticle).toBeCloseTo(2396.8, 0);
    expect(p.atomsB).toBeCloseTo(599.2, 0);
  });

  it('particle count and molar concentration', () => {
    // 0.1 mmol of metal = 1e-4 mol × 6.02214076e23 = 6.02214e19 atoms; ÷ 2396.81 atoms = 2.51256e16 particles
    const p = alloyParticle(4, 0.25, A_PT, A_NI);
    const particles = particlesFromMetal(0.1, p.atomsPerParticle);
    expect(particles / 2.51256e16).toBeCloseTo(1, 4);
    // 1e12 particles/mL = 1e15 per L = 1e15 / 6.022e23 mol/L = 1.6605 nM
    expect(particleNanomolar(1e12)).toBeCloseTo(1.6605, 3);
    // seeds: 0.5 mM of Au atoms in 3859.8-atom seeds → 0.5e-6 mol/mL × N_A / 3859.8 = 7.801e13 seeds/mL
    expect(seedsPerMlFromMetal(0.5, 3859.8) / 7.801e13).toBeCloseTo(1, 3);
    expect(AVOGADRO_PER_MOL).toBe(6.02214076e23);
  });
});

describe('against the closed-shell magic numbers (Mackay, Acta Cryst. 15, 916 (1962))', () => {
  // A sphere holding N(n) atoms and the sphere holding N(n−1) differ by about one (111) monolayer, and one
  // monolayer on the N(n−1) sphere holds about the 10n² + 2 atoms of the cluster's outer shell.
  it.each([2, 3, 4, 5, 6, 7, 8, 9, 10])('n = %i shells', (n) => {
    const inner = sphereDiameterForAtoms(magicClusterAtoms(n - 1), A_AU);
    const outer = sphereDiameterForAtoms(magicClusterAtoms(n), A_AU);
    const layer = coreShellParticle(inner, { monolayers: 1 }, A_AU, A_AU, 'A');
    const tolerance = n === 2 ? 0.03 : 0.015;
    expect(Math.abs(layer.shellAtoms / magicClusterSurfaceAtoms(n) - 1)).toBeLessThan(tolerance);
    const step = coreShellParticle(inner, { thicknessNm: (outer - inner) / 2 }, A_AU, A_AU, 'A');
    expect(Math.abs((step.shellMonolayers as number) - 1)).toBeLessThan(0.02);
    expect(step.atomsPerParticle).toBeCloseTo(magicClusterAtoms(n), 6);
  });
});

describe('bad geometry names the field', () => {
  it('composition must lie strictly inside 0–100 at.%', () => {
    expect(fieldOf(() => alloyParticle(4, 0, A_PT, A_NI))).toBe('size.xB');
    expect(fieldOf(() => alloyParticle(4, 1, A_PT, A_NI))).toBe('size.xB');
    expect(fieldOf(() => alloyParticle(4, 1.2, A_PT, A_NI))).toBe('size.xB');
  });
  it('a shell as thick as the radius leaves no core', () => {
    expect(fieldOf(() => coreDiameterFromOverall(10, 5))).toBe('size.shellThicknessNm');
    expect(coreDiameterFromOverall(10, 1)).toBe(8);
  });
  it('less than a tenth of a monolayer is not a shell', () => {
    expect(fieldOf(() => coreShellParticle(10, { monolayers: 0.05 }, A_AU, A_PT, 'A'))).toBe('size.shellMonolayers');
    expect(fieldOf(() => coreShellParticle(10, { thicknessNm: 0.01 }, A_AU, A_PT, 'A'))).toBe('size.shellThicknessNm');
  });
  it('a particle beyond 1 µm is not a nanoparticle batch', () => {
    expect(fieldOf(() => coreShellParticle(900, { thicknessNm: 80 }, A_AU, A_PT, 'A'))).toBe('size.shellThicknessNm');
    expect(fieldOf(() => singleMetalParticle(-3, A_AU, false))).toBe('size.diameterNm');
  });
  it('non-positive amounts', () => {
    expect(fieldOf(() => particlesFromMetal(0, 1000))).toBe('amount.totalMetalMmol');
    expect(fieldOf(() => seedsPerMlFromMetal(-1, 1000))).toBe('seeds.metalMm');
  });
});
