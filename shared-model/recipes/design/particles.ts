/**
 * Design stage 1a — the particles (DOMAIN.md Model 5): the target read against the pair, the precursor
 * chosen for each metal, the particle geometry (atoms per particle, core and shell atoms) from the size
 * target, the particle count from the total metal (or the reverse from a particle concentration) and the
 * metal per element. For seed-mediated growth the seeds fix the count and the shell atoms per seed fix the
 * shell metal.
 */
import { invalid } from '../../api/result';
import { parseArchitecture, type ParsedArchitecture } from '../../architecture/labels';
import { isFccElement, latticeConstantNm } from '../../elements/element-table';
import type { BatchDesignInput } from '../design-input';
import {
  AVOGADRO_PER_MOL,
  alloyParticle,
  coreDiameterFromOverall,
  coreShellParticle,
  metalForParticles,
  particlesFromMetal,
  seedsPerMlFromMetal,
  singleMetalParticle,
  type ParticleGeometry,
  type ShellSpec,
} from '../particle';
import { hasRole, type Reagent, type ReagentMetal } from '../reagent';
import { fmt, type CatalogIndex } from './common';
import type { DesignCheck } from './types';

export interface PrecursorChoice {
  reagent: Reagent;
  metal: ReagentMetal;
  stockMm: number | undefined;
  /** Position in `input.precursors` (for field names in messages). */
  index: number;
}

/** The seed dispersion of a seed-mediated batch. */
export interface SeedSupply {
  metal: string;
  atomsPerSeed: number;
  volumeMl: number;
  particlesPerMl: number;
  seedBatchId?: number;
}

export interface ParticlePlan {
  pair: readonly [string, string];
  target: ParsedArchitecture;
  /** Precursor by element, in the order the user listed them. */
  precursors: Map<string, PrecursorChoice>;
  geometry: ParticleGeometry;
  particles: number;
  coreElement: string | null;
  shellElement: string | null;
  seeds: SeedSupply | null;
  /** Metal atoms (mmol) of each element of the pair in the batch, seeds included. */
  metalMmol: Map<string, number>;
  latticeNm: Record<string, number>;
  checks: DesignCheck[];
}

type LatticeSource = ((symbol: string) => number | undefined) | undefined;

function readTarget(input: BatchDesignInput): ParsedArchitecture {
  const { elementA, elementB } = input;
  if (elementA === elementB) {
    throw invalid('elementB', `a pair needs two different metals, got ${elementA}-${elementB}`);
  }
  const parsed = parseArchitecture(input.target, [elementA, elementB]);
  if (!parsed || parsed.kind === 'hollow' || parsed.kind === 'other' || parsed.kind === 'unknown') {
    throw invalid(
      'target',
      `"${input.target}" is not a target for ${elementA}-${elementB}; use alloy, surface-enriched alloy, ` +
        `${elementA}@${elementB}, ${elementB}@${elementA}, Janus or intermetallic`,
    );
  }
  return parsed;
}

function readPrecursors(input: BatchDesignInput, catalog: CatalogIndex): Map<string, PrecursorChoice> {
  const { elementA, elementB } = input;
  const chosen = new Map<string, PrecursorChoice>();
  input.precursors.forEach((choice, index) => {
    const field = `precursors.${index}`;
    if (choice.element !== elementA && choice.element !== elementB) {
      throw invalid(`${field}.element`, `${choice.element} is not in the pair ${elementA}-${elementB}`);
    }
    if (chosen.has(choice.element)) {
      throw invalid(`${field}.element`, `two precursors for ${choice.element}; choose one`);
    }
    const reagent = catalog.require(choice.reagentKey, `${field}.reagentKey`);
    const metal = reagent.metal;
    if (!hasRole(reagent, 'metal-precursor') || !metal) {
      throw invalid(`${field}.reagentKey`, `${reagent.name} is not a metal precursor`);
    }
    if (metal.symbol !== choice.element) {
      throw invalid(
        `${field}.reagentKey`,
        `${reagent.name} is a ${metal.symbol} precursor, not a ${choice.element} precursor for ${elementA}-${elementB}`,
      );
    }
    chosen.set(choice.element, { reagent, metal, stockMm: choice.stockMm, index });
  });
  return chosen;
}

function latticeReader(input: BatchDesignInput, source: LatticeSource): (symbol: string) => number {
  return (symbol) => {
    const value = input.latticeNm[symbol] ?? source?.(symbol) ?? latticeConstantNm(symbol);
    if (value === undefined || !Number.isFinite(value) || value <= 0) {
      throw invalid(
        `latticeNm.${symbol}`,
        `no lattice constant is known for ${symbol}, so the atoms of the particle cannot be counted`,
      );
    }
    return value;
  };
}

interface ShellSize {
  shellThicknessNm?: number | undefined;
  shellMonolayers?: number | undefined;
}

function shellSpecFrom(size: ShellSize): ShellSpec {
  if (size.shellMonolayers !== undefined) return { monolayers: size.shellMonolayers };
  if (size.shellThicknessNm === undefined) {
    throw invalid('size.shellThicknessNm', 'give the shell thickness (nm) or monolayers');
  }
  return { thicknessNm: size.shellThicknessNm };
}

function requirePrecursor(precursors: Map<string, PrecursorChoice>, element: string): void {
  if (!precursors.has(element)) {
    throw invalid('precursors', `choose a ${element} precursor (the batch reduces ${element})`);
  }
}

type Sized = Pick<ParticlePlan, 'geometry' | 'particles' | 'coreElement' | 'shellElement' | 'seeds' | 'metalMmol'>;

/** Seed-mediated growth: the seeds are the cores, the shell grows on each of them. */
function seededParticles(
  input: BatchDesignInput,
  target: ParsedArchitecture,
  precursors: Map<string, PrecursorChoice>,
  lattice: (symbol: string) => number,
  checks: DesignCheck[],
): Sized {
  const { elementA, elementB } = input;
  const seeds = input.seeds;
  if (!seeds) throw invalid('seeds', 'seed-mediated growth needs the seeds: metal, diameter, concentration and volume');
  if (seeds.metal !== elementA && seeds.metal !== elementB) {
    throw invalid('seeds.metal', `seeds of ${seeds.metal} are not part of ${elementA}-${elementB}`);
  }
  const size = input.size;
  if (size.kind !== 'core-shell') {
    throw invalid(
      'size.kind',
      'seed-mediated growth puts a shell on the seeds: give the size as core + shell, with the shell thickness ' +
        'or monolayers',
    );
  }
  if (
    size.coreDiameterNm !== undefined &&
    seeds.diameterNm !== undefined &&
    Math.abs(size.coreDiameterNm - seeds.diameterNm) > 0.01 * seeds.diameterNm
  ) {
    throw invalid(
      'size.coreDiameterNm',
      `the core is the seed (${seeds.diameterNm} nm); change the seed diameter instead of the core diameter`,
    );
  }
  if (seeds.diameterNm === undefined) {
    throw invalid('seeds.diameterNm', 'give the seed diameter (nm), or the seed batch it comes from');
  }
  const seedMetalMm = seeds.metalMm;
  if (seeds.particlesPerMl === undefined && seedMetalMm === undefined) {
    throw invalid('seeds.particlesPerMl', 'give the seed concentration, as particles/mL or as metal mM');
  }
  if (seeds.volumeMl > input.batchVolumeMl) {
    const message = `seed volume ${seeds.volumeMl} mL exceeds the batch volume ${input.batchVolumeMl} mL`;
    throw invalid('seeds.volumeMl', message);
  }
  const coreElement = seeds.metal;
  const shellElement = seeds.metal === elementA ? elementB : elementA;
  const seedPrecursor = precursors.get(coreElement);
  if (seedPrecursor) {
    throw invalid(
      `precursors.${seedPrecursor.index}.element`,
      `the seeds provide the ${coreElement}; list only the ${shellElement} precursor`,
    );
  }
  requirePrecursor(precursors, shellElement);
  const geometry = coreShellParticle(
    seeds.diameterNm,
    shellSpecFrom(size),
    lattice(coreElement),
    lattice(shellElement),
    coreElement === elementA ? 'A' : 'B',
  );
  const atomsPerSeed = geometry.coreAtoms;
  const seedsPerMl = seeds.particlesPerMl ?? seedsPerMlFromMetal(seedMetalMm ?? Number.NaN, atomsPerSeed);
  const particles = seedsPerMl * seeds.volumeMl;
  const metalMmol = new Map<string, number>([
    [coreElement, ((atomsPerSeed * particles) / AVOGADRO_PER_MOL) * 1000],
    [shellElement, ((geometry.shellAtoms * particles) / AVOGADRO_PER_MOL) * 1000],
  ]);
  if (target.kind !== 'core@shell' || target.core !== coreElement) {
    checks.push({
      kind: 'target',
      severity: 'warning',
      message:
        `Seeded growth of ${shellElement} on ${coreElement} seeds makes ${coreElement}@${shellElement}; the target ` +
        `"${input.target}" would need interdiffusion (annealing) or a different route.`,
    });
  }
  const seedSupply: SeedSupply = {
    metal: coreElement,
    atomsPerSeed,
    volumeMl: seeds.volumeMl,
    particlesPerMl: seedsPerMl,
    ...(seeds.seedBatchId ? { seedBatchId: seeds.seedBatchId } : {}),
  };
  return { geometry, particles, coreElement, shellElement, seeds: seedSupply, metalMmol };
}

/** Every other route: the particle from the size target, the count from the metal (or the reverse). */
function nucleatedParticles(
  input: BatchDesignInput,
  target: ParsedArchitecture,
  precursors: Map<string, PrecursorChoice>,
  lattice: (symbol: string) => number,
): Sized {
  const { elementA, elementB } = input;
  const amount = input.amount;
  if (!amount) throw invalid('amount', 'give the total metal (mmol) or the particle concentration (particles/mL)');
  const size = input.size;
  let geometry: ParticleGeometry;
  let coreElement: string | null = null;
  let shellElement: string | null = null;
  if (size.kind === 'single-metal') {
    if (size.element !== elementA && size.element !== elementB) {
      throw invalid('size.element', `${size.element} is not in the pair ${elementA}-${elementB}`);
    }
    coreElement = size.element;
    geometry = singleMetalParticle(size.diameterNm, lattice(size.element), size.element === elementB);
  } else if (size.kind === 'alloy') {
    if (target.kind === 'core@shell') {
      throw invalid(
        'size.kind',
        `the target ${input.target} is a core@shell: give the size as core-shell (core diameter and shell)`,
      );
    }
    geometry = alloyParticle(size.diameterNm, size.xB, lattice(elementA), lattice(elementB));
  } else {
    if (target.kind !== 'core@shell' || !target.core || !target.shell) {
      throw invalid(
        'target',
        `a core-shell size needs a core@shell target such as ${elementA}@${elementB}, got "${input.target}"`,
      );
    }
    coreElement = target.core;
    shellElement = target.shell;
    let coreDiameterNm: number;
    let shell: ShellSpec;
    if (size.kind === 'core-shell-overall') {
      coreDiameterNm = coreDiameterFromOverall(size.diameterNm, size.shellThicknessNm);
      shell = { thicknessNm: size.shellThicknessNm };
    } else {
      if (size.coreDiameterNm === undefined) throw invalid('size.coreDiameterNm', 'give the core diameter (nm)');
      coreDiameterNm = size.coreDiameterNm;
      shell = shellSpecFrom(size);
    }
    geometry = coreShellParticle(
      coreDiameterNm,
      shell,
      lattice(coreElement),
      lattice(shellElement),
      coreElement === elementA ? 'A' : 'B',
    );
  }
  let totalMetalMmol: number;
  let particles: number;
  if (amount.kind === 'total-metal') {
    totalMetalMmol = amount.totalMetalMmol;
    particles = particlesFromMetal(totalMetalMmol, geometry.atomsPerParticle);
  } else {
    particles = amount.particlesPerMl * input.batchVolumeMl;
    totalMetalMmol = metalForParticles(particles, geometry.atomsPerParticle);
  }
  const metalMmol = new Map<string, number>([
    [elementA, (totalMetalMmol * geometry.atomsA) / geometry.atomsPerParticle],
    [elementB, (totalMetalMmol * geometry.atomsB) / geometry.atomsPerParticle],
  ]);
  for (const element of [elementA, elementB]) {
    if ((metalMmol.get(element) ?? 0) > 0) requirePrecursor(precursors, element);
    else {
      const unused = precursors.get(element);
      if (unused) {
        throw invalid(
          `precursors.${unused.index}.element`,
          `this single-metal batch makes ${coreElement} only; remove the ${element} precursor`,
        );
      }
    }
  }
  return { geometry, particles, coreElement, shellElement, seeds: null, metalMmol };
}

function shellChecks(geometry: ParticleGeometry): DesignCheck[] {
  const checks: DesignCheck[] = [];
  if (geometry.shellMonolayers !== null && geometry.shellMonolayers < 1) {
    checks.push({
      kind: 'shell',
      severity: 'warning',
      message:
        `The shell is ${fmt(geometry.shellMonolayers, 2)} monolayer: less than one close-packed layer, so expect ` +
        'islands or a partial layer rather than a continuous shell.',
    });
  }
  const { coreDiameterNm, shellThicknessNm } = geometry;
  if (coreDiameterNm !== null && shellThicknessNm !== null && shellThicknessNm > coreDiameterNm) {
    const shellPct = (100 * geometry.shellAtoms) / geometry.atomsPerParticle;
    checks.push({
      kind: 'shell',
      severity: 'info',
      message:
        `The shell (${fmt(shellThicknessNm)} nm) is thicker than the core diameter (${fmt(coreDiameterNm)} nm): ` +
        `${fmt(shellPct, 3)} % of the atoms are shell.`,
    });
  }
  return checks;
}

/** Plans the particles of a batch; throws `invalid(field, …)` naming the field for bad input. */
export function planParticles(
  input: BatchDesignInput,
  catalog: CatalogIndex,
  latticeSource: LatticeSource,
): ParticlePlan {
  const target = readTarget(input);
  const precursors = readPrecursors(input, catalog);
  const lattice = latticeReader(input, latticeSource);
  const checks: DesignCheck[] = [];
  const sized =
    input.route === 'seed-mediated'
      ? seededParticles(input, target, precursors, lattice, checks)
      : nucleatedParticles(input, target, precursors, lattice);
  const pair = [input.elementA, input.elementB] as const;
  for (const element of pair) {
    if (input.latticeNm[element] === undefined && latticeSource?.(element) === undefined && !isFccElement(element)) {
      checks.push({
        kind: 'geometry',
        severity: 'info',
        message:
          `${element} is not fcc: its atoms are counted with the fcc-equivalent lattice constant ` +
          `${lattice(element).toFixed(4)} nm (same volume per atom as its own crystal).`,
      });
    }
  }
  const latticeNm = { [input.elementA]: lattice(input.elementA), [input.elementB]: lattice(input.elementB) };
  checks.push(...shellChecks(sized.geometry));
  return { pair, target, precursors, ...sized, latticeNm, checks };
}
