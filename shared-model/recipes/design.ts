/**
 * Batch design (DOMAIN.md Models 5–8): from a target particle, a route and catalog reagents to amounts,
 * masses and stock volumes, with the kinetic checks and the hazard block.
 *
 * Arithmetic, in order:
 *  1. particle geometry (atoms per particle, core and shell atoms) from the size target;
 *  2. particle count from the total metal (or the reverse from a particle concentration); for
 *     seed-mediated growth the seeds fix the count and the shell atoms per seed fix the shell precursor;
 *  3. metal per element → precursor formula units (÷ metal atoms per formula unit) → mass
 *     (× M, ÷ assay, or from the supplier's metal content) → stock volume (÷ stock mM) or neat volume
 *     (÷ density);
 *  4. electrons = Σ metal × oxidation state; reducer = electrons ÷ electrons per reducer × excess;
 *  5. capping agent = ratio × metal reduced, or final concentration × volume.
 */
import { invalid } from '../api/result';
import { parseArchitecture } from '../architecture/labels';
import { isFccElement, latticeConstantNm } from '../elements/element-table';
import { atomsInSphere } from '../geometry/fcc';
import { summarizeHazards, type HazardSummary, type ReagentHazardProfile } from '../hazards/summary';
import {
  AQUEOUS_ROUTES,
  DEFAULT_TEMPERATURE_C,
  ROUTE_LABELS,
  type BatchDesignInput,
  type SynthesisRoute,
} from './design-input';
import { atomicMassGPerMol, parseFormula } from './formula';
import {
  AVOGADRO_PER_MOL,
  alloyParticle,
  coreDiameterFromOverall,
  coreShellParticle,
  metalForParticles,
  particleNanomolar,
  particlesFromMetal,
  seedsPerMlFromMetal,
  singleMetalParticle,
  type ParticleGeometry,
  type ShellSpec,
} from './particle';
import {
  GALVANIC_MARGIN_V,
  galvanicReplacement,
  reductionCouple,
  reductionOrder,
  roman,
  seedDissolutionCouple,
  type ReductionCouple,
} from './potentials';
import { electronsDonated, hasRole, type Reagent, type ReagentRole } from './reagent';
import { REDUCER_HALF_REACTIONS } from './reducers';
import { formatHours, stockAges } from './stocks';

export const RECIPE_MODEL_VERSION = 'recipes-1';

export type CheckSeverity = 'info' | 'warning' | 'danger';
export type CheckKind =
  | 'reduction-order'
  | 'galvanic-replacement'
  | 'kinetics-vs-thermodynamics'
  | 'target'
  | 'shell'
  | 'geometry'
  | 'volume'
  | 'reducer'
  | 'stock-age'
  | 'hazard';

export interface DesignCheck {
  kind: CheckKind;
  severity: CheckSeverity;
  message: string;
}

export type DesignedRole = ReagentRole | 'seeds';

export interface DesignedReagent {
  key: string;
  name: string;
  formula: string;
  role: DesignedRole;
  /** Formula units (mmol); for PVP monomer units; null for the seed dispersion. */
  amountMmol: number | null;
  /** Mass to weigh (mg) of the reagent as dispensed (assay accounted for). */
  massMg: number | null;
  /** Volume to dispense (mL): of the stock solution when a stock is given, else of the neat liquid. */
  volumeMl: number | null;
  stockMm: number | null;
  molarMassGPerMol: number | null;
  note: string;
}

export interface MetalAmount {
  element: string;
  amountMmol: number;
  /** Final concentration in the batch volume (mM). */
  finalMm: number;
  /** Catalog key of the precursor; null when the metal comes with the seeds. */
  precursorKey: string | null;
  oxidationState: number | null;
}

export interface GalvanicSummary {
  seedMetal: string;
  shellMetal: string;
  drivingForceV: number;
  replaces: boolean;
  seedAtomsPerShellAtom: number;
  /** If the whole shell precursor reacted by replacement instead of reduction. */
  seedAtomsConsumedPerParticle: number;
  seedFractionConsumed: number;
  shellCouple: string;
  seedCouple: string;
  reaction: string;
}

export interface ReductionOrderSummary {
  first: string;
  second: string;
  gapV: number;
  firstCouple: string;
  secondCouple: string;
  firstEV: number;
  secondEV: number;
}

export interface BatchDesign {
  modelVersion: string;
  elementA: string;
  elementB: string;
  target: string;
  route: SynthesisRoute;
  routeLabel: string;
  architecture: 'alloy' | 'core@shell' | 'single-metal';
  coreElement: string | null;
  shellElement: string | null;
  latticeNm: Record<string, number>;
  diameterNm: number;
  coreDiameterNm: number | null;
  shellThicknessNm: number | null;
  shellMonolayers: number | null;
  atomsPerParticle: number;
  coreAtoms: number;
  shellAtoms: number;
  atomsA: number;
  atomsB: number;
  xBPct: number;
  particles: number;
  particlesPerMl: number;
  particleNanomolar: number;
  batchVolumeMl: number;
  temperatureC: number;
  aqueous: boolean;
  metals: MetalAmount[];
  electronsMmol: number;
  reducer: {
    key: string;
    electronsPerUnit: number;
    halfReaction: string;
    stoichiometricMmol: number;
    excess: number;
  } | null;
  reagents: DesignedReagent[];
  /** Water (or solvent) to add so the batch reaches its volume; null when not applicable. */
  makeUpVolumeMl: number | null;
  reductionOrder: ReductionOrderSummary | null;
  galvanic: GalvanicSummary | null;
  thermodynamicSurfaceElement: string | null | undefined;
  checks: DesignCheck[];
  hazards: { code: string; text: string }[];
  hazardSummary: HazardSummary;
}

export interface DesignContext {
  catalog: readonly Reagent[];
  /** Lattice constants (nm) for elements missing from `input.latticeNm`; else the element table's (fcc-equivalent) value. */
  latticeNm?: (symbol: string) => number | undefined;
  /**
   * Element the thermodynamic model puts at the surface for this pair and composition
   * (null: no strong enrichment; undefined: no prediction available).
   */
  thermodynamicSurfaceElement?: string | null;
  /** Current time (ISO) for stock-age checks; omit to skip them. */
  now?: string;
}

function fmt(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return String(value);
  const abs = Math.abs(value);
  if (abs !== 0 && (abs >= 1e5 || abs < 1e-3)) return value.toExponential(digits - 1);
  if (abs >= 10 ** digits) return value.toFixed(0);
  return value.toPrecision(digits);
}

function signedV(value: number): string {
  return `${value >= 0 ? '+' : '−'}${Math.abs(value).toFixed(3)} V`;
}

/** Designs a batch; throws `invalid(field, …)` naming the field for bad input. */
export function designBatch(input: BatchDesignInput, context: DesignContext): BatchDesign {
  const { elementA, elementB } = input;
  if (elementA === elementB) throw invalid('elementB', `a pair needs two different metals, got ${elementA}-${elementB}`);
  const pair = [elementA, elementB] as const;
  const parsedTarget = parseArchitecture(input.target, pair);
  if (!parsedTarget || parsedTarget.kind === 'hollow' || parsedTarget.kind === 'other' || parsedTarget.kind === 'unknown') {
    throw invalid('target', `"${input.target}" is not a target for ${elementA}-${elementB}; use alloy, surface-enriched alloy, ${elementA}@${elementB}, ${elementB}@${elementA}, Janus or intermetallic`);
  }

  const catalog = new Map(context.catalog.map((r) => [r.key, r]));
  const reagentFor = (key: string, field: string): Reagent => {
    const found = catalog.get(key);
    if (!found) throw invalid(field, `no reagent "${key}" in the catalog`);
    return found;
  };
  const lattice = (symbol: string): number => {
    const value = input.latticeNm[symbol] ?? context.latticeNm?.(symbol) ?? latticeConstantNm(symbol);
    if (value === undefined || !Number.isFinite(value) || value <= 0) throw invalid(`latticeNm.${symbol}`, `no lattice constant for ${symbol}; give latticeNm.${symbol} in nm`);
    return value;
  };

  const route = input.route;
  const checks: DesignCheck[] = [];
  const temperatureC = input.temperatureC ?? DEFAULT_TEMPERATURE_C[route];

  // ── Precursors ────────────────────────────────────────────────────────────────
  const precursorByElement = new Map<string, { reagent: Reagent; stockMm: number | undefined; index: number }>();
  input.precursors.forEach((choice, index) => {
    if (choice.element !== elementA && choice.element !== elementB) {
      throw invalid(`precursors.${index}.element`, `${choice.element} is not in the pair ${elementA}-${elementB}`);
    }
    if (precursorByElement.has(choice.element)) throw invalid(`precursors.${index}.element`, `two precursors for ${choice.element}; choose one`);
    const reagent = reagentFor(choice.reagentKey, `precursors.${index}.reagentKey`);
    if (!hasRole(reagent, 'metal-precursor') || !reagent.metal) {
      throw invalid(`precursors.${index}.reagentKey`, `${reagent.name} is not a metal precursor`);
    }
    if (reagent.metal.symbol !== choice.element) {
      throw invalid(`precursors.${index}.reagentKey`, `${reagent.name} is a ${reagent.metal.symbol} precursor, not a ${choice.element} precursor for ${elementA}-${elementB}`);
    }
    precursorByElement.set(choice.element, { reagent, stockMm: choice.stockMm, index });
  });
  const requirePrecursor = (element: string) => {
    const found = precursorByElement.get(element);
    if (!found) throw invalid('precursors', `choose a ${element} precursor (the batch reduces ${element})`);
    return found;
  };

  // ── Geometry and amounts ─────────────────────────────────────────────────────
  let geometry: ParticleGeometry;
  let particles: number;
  let coreElement: string | null = null;
  let shellElement: string | null = null;
  let seedInfo: { metal: string; atomsPerSeed: number; volumeMl: number; particlesPerMl: number; seedBatchId?: number } | null = null;
  const metalMmol = new Map<string, number>();

  const shellSpecFrom = (size: { shellThicknessNm?: number; shellMonolayers?: number }): ShellSpec =>
    size.shellMonolayers !== undefined ? { monolayers: size.shellMonolayers } : { thicknessNm: size.shellThicknessNm as number };

  if (route === 'seed-mediated') {
    const seeds = input.seeds;
    if (!seeds) throw invalid('seeds', 'seed-mediated growth needs the seeds: metal, diameter, concentration and volume');
    if (seeds.metal !== elementA && seeds.metal !== elementB) throw invalid('seeds.metal', `seeds of ${seeds.metal} are not part of ${elementA}-${elementB}`);
    if (input.size.kind !== 'core-shell') {
      throw invalid('size.kind', 'seed-mediated growth puts a shell on the seeds: give the size as "core-shell" with the shell thickness or monolayers');
    }
    if (input.size.coreDiameterNm !== undefined && seeds.diameterNm !== undefined && Math.abs(input.size.coreDiameterNm - seeds.diameterNm) > 0.01 * seeds.diameterNm) {
      throw invalid('size.coreDiameterNm', `the core is the seed (${seeds.diameterNm} nm); change seeds.diameterNm instead of the core diameter`);
    }
    if (seeds.diameterNm === undefined) throw invalid('seeds.diameterNm', 'give the seed diameter (nm), or the seed batch it comes from');
    if (seeds.particlesPerMl === undefined && seeds.metalMm === undefined) throw invalid('seeds.particlesPerMl', 'give the seed concentration, as particles/mL or as metal mM');
    const seedDiameterNm = seeds.diameterNm;
    if (seeds.volumeMl > input.batchVolumeMl) throw invalid('seeds.volumeMl', `seed volume ${seeds.volumeMl} mL exceeds the batch volume ${input.batchVolumeMl} mL`);
    coreElement = seeds.metal;
    shellElement = seeds.metal === elementA ? elementB : elementA;
    const seedPrecursor = precursorByElement.get(coreElement);
    if (seedPrecursor) {
      throw invalid(`precursors.${seedPrecursor.index}.element`, `the seeds provide the ${coreElement}; list only the ${shellElement} precursor`);
    }
    requirePrecursor(shellElement);
    geometry = coreShellParticle(seedDiameterNm, shellSpecFrom(input.size), lattice(coreElement), lattice(shellElement), coreElement === elementA ? 'A' : 'B');
    const atomsPerSeed = geometry.coreAtoms;
    const seedsPerMl = seeds.particlesPerMl ?? seedsPerMlFromMetal(seeds.metalMm as number, atomsPerSeed);
    particles = seedsPerMl * seeds.volumeMl;
    seedInfo = { metal: coreElement, atomsPerSeed, volumeMl: seeds.volumeMl, particlesPerMl: seedsPerMl, ...(seeds.seedBatchId ? { seedBatchId: seeds.seedBatchId } : {}) };
    metalMmol.set(coreElement, ((atomsPerSeed * particles) / AVOGADRO_PER_MOL) * 1000);
    metalMmol.set(shellElement, ((geometry.shellAtoms * particles) / AVOGADRO_PER_MOL) * 1000);
    if (parsedTarget.kind !== 'core@shell' || parsedTarget.core !== coreElement) {
      checks.push({
        kind: 'target',
        severity: 'warning',
        message: `Seeded growth of ${shellElement} on ${coreElement} seeds makes ${coreElement}@${shellElement}; the target "${input.target}" would need interdiffusion (annealing) or a different route.`,
      });
    }
  } else {
    const amount = input.amount;
    if (!amount) throw invalid('amount', 'give the total metal (mmol) or the particle concentration (particles/mL)');
    const size = input.size;
    if (size.kind === 'single-metal') {
      if (size.element !== elementA && size.element !== elementB) throw invalid('size.element', `${size.element} is not in the pair ${elementA}-${elementB}`);
      coreElement = size.element;
      geometry = singleMetalParticle(size.diameterNm, lattice(size.element), size.element === elementB);
    } else if (size.kind === 'alloy') {
      if (parsedTarget.kind === 'core@shell') {
        throw invalid('size.kind', `the target ${input.target} is a core@shell: give the size as core-shell (core diameter and shell)`);
      }
      geometry = alloyParticle(size.diameterNm, size.xBPct / 100, lattice(elementA), lattice(elementB));
    } else {
      if (parsedTarget.kind !== 'core@shell' || !parsedTarget.core || !parsedTarget.shell) {
        throw invalid('target', `a core-shell size needs a core@shell target such as ${elementA}@${elementB}, got "${input.target}"`);
      }
      coreElement = parsedTarget.core;
      shellElement = parsedTarget.shell;
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
      geometry = coreShellParticle(coreDiameterNm, shell, lattice(coreElement), lattice(shellElement), coreElement === elementA ? 'A' : 'B');
    }
    let totalMetalMmol: number;
    if (amount.kind === 'total-metal') {
      totalMetalMmol = amount.totalMetalMmol;
      particles = particlesFromMetal(totalMetalMmol, geometry.atomsPerParticle);
    } else {
      particles = amount.particlesPerMl * input.batchVolumeMl;
      totalMetalMmol = metalForParticles(particles, geometry.atomsPerParticle);
    }
    metalMmol.set(elementA, (totalMetalMmol * geometry.atomsA) / geometry.atomsPerParticle);
    metalMmol.set(elementB, (totalMetalMmol * geometry.atomsB) / geometry.atomsPerParticle);
    for (const element of pair) {
      if ((metalMmol.get(element) ?? 0) > 0) requirePrecursor(element);
      else {
        const unused = precursorByElement.get(element);
        if (unused) throw invalid(`precursors.${unused.index}.element`, `this single-metal batch makes ${coreElement} only; remove the ${element} precursor`);
      }
    }
  }

  for (const element of pair) {
    if (input.latticeNm[element] === undefined && context.latticeNm?.(element) === undefined && !isFccElement(element)) {
      checks.push({
        kind: 'geometry',
        severity: 'info',
        message: `${element} is not fcc: its atoms are counted with the fcc-equivalent lattice constant ${lattice(element).toFixed(4)} nm (same volume per atom as its own crystal).`,
      });
    }
  }

  // ── Shell sanity ─────────────────────────────────────────────────────────────
  if (geometry.shellMonolayers !== null && geometry.shellMonolayers < 1) {
    checks.push({
      kind: 'shell',
      severity: 'warning',
      message: `The shell is ${fmt(geometry.shellMonolayers, 2)} monolayer: less than one close-packed layer, so expect islands or a partial layer rather than a continuous shell.`,
    });
  }
  if (geometry.coreDiameterNm !== null && geometry.shellThicknessNm !== null && geometry.shellThicknessNm > geometry.coreDiameterNm) {
    checks.push({
      kind: 'shell',
      severity: 'info',
      message: `The shell (${fmt(geometry.shellThicknessNm)} nm) is thicker than the core diameter (${fmt(geometry.coreDiameterNm)} nm): ${fmt((100 * geometry.shellAtoms) / geometry.atomsPerParticle, 3)} % of the atoms are shell.`,
    });
  }

  const aqueous = AQUEOUS_ROUTES.includes(route) && (!input.solvent || reagentFor(input.solvent.reagentKey, 'solvent.reagentKey').tags.includes('water'));
  const lines: DesignedReagent[] = [];
  const volumeOf = (reagent: Reagent, amountMmol: number, massMg: number, stockMm: number | undefined): number | null => {
    if (stockMm !== undefined) return (amountMmol / stockMm) * 1000;
    if ((reagent.form === 'liquid' || reagent.form === 'solution') && reagent.densityGPerMl) return massMg / 1000 / reagent.densityGPerMl;
    return null;
  };
  const massOf = (reagent: Reagent, amountMmol: number): number => (amountMmol * reagent.molarMassGPerMol) / (reagent.assayWtPct / 100);

  // ── Precursor lines and electrons ────────────────────────────────────────────
  const metals: MetalAmount[] = [];
  let electronsMmol = 0;
  for (const element of pair) {
    const mmol = metalMmol.get(element) ?? 0;
    const precursor = precursorByElement.get(element);
    if (mmol === 0 && !precursor) continue;
    if (!precursor) {
      metals.push({ element, amountMmol: mmol, finalMm: (mmol / input.batchVolumeMl) * 1000, precursorKey: null, oxidationState: null });
      continue;
    }
    const reagent = precursor.reagent;
    const metal = reagent.metal as NonNullable<Reagent['metal']>;
    const metalPerUnit = parseFormula(reagent.formula).atoms[element] ?? 1;
    const amountMmol = mmol / metalPerUnit;
    const massMg = reagent.metalContentWtPct ? (mmol * atomicMassGPerMol(element)) / (reagent.metalContentWtPct / 100) : massOf(reagent, amountMmol);
    electronsMmol += mmol * metal.oxidationState;
    metals.push({ element, amountMmol: mmol, finalMm: (mmol / input.batchVolumeMl) * 1000, precursorKey: reagent.key, oxidationState: metal.oxidationState });
    lines.push({
      key: reagent.key,
      name: reagent.name,
      formula: reagent.formula,
      role: 'metal-precursor',
      amountMmol,
      massMg,
      volumeMl: volumeOf(reagent, amountMmol, massMg, precursor.stockMm),
      stockMm: precursor.stockMm ?? null,
      molarMassGPerMol: reagent.molarMassGPerMol,
      note: `${element}(${roman(metal.oxidationState)}) → ${element}: ${fmt(mmol)} mmol ${element}${reagent.metalContentWtPct ? `, mass from ${reagent.metalContentWtPct} wt% ${element} content` : ''}`,
    });
  }
  if (seedInfo) {
    lines.unshift({
      key: seedInfo.seedBatchId ? `seed-batch-${seedInfo.seedBatchId}` : 'seeds',
      name: `${seedInfo.metal} seed dispersion${seedInfo.seedBatchId ? ` (batch #${seedInfo.seedBatchId})` : ''}`,
      formula: seedInfo.metal,
      role: 'seeds',
      amountMmol: null,
      massMg: null,
      volumeMl: seedInfo.volumeMl,
      stockMm: null,
      molarMassGPerMol: null,
      note: `${fmt(seedInfo.particlesPerMl)} seeds/mL × ${fmt(seedInfo.volumeMl)} mL = ${fmt(particles)} seeds of ${fmt(seedInfo.atomsPerSeed)} atoms`,
    });
  }

  // ── Solvent ──────────────────────────────────────────────────────────────────
  let solventReagent: Reagent | null = null;
  let solventMmol = 0;
  if (input.solvent) {
    solventReagent = reagentFor(input.solvent.reagentKey, 'solvent.reagentKey');
    if (!hasRole(solventReagent, 'solvent')) throw invalid('solvent.reagentKey', `${solventReagent.name} is not a solvent`);
  }
  if (!aqueous && (!input.solvent || input.solvent.volumeMl === undefined)) {
    throw invalid(input.solvent ? 'solvent.volumeMl' : 'solvent', `the ${route} route needs its solvent and the solvent volume (mL)`);
  }

  // ── Reducer ──────────────────────────────────────────────────────────────────
  let reducerSummary: BatchDesign['reducer'] = null;
  let reducerReagent: Reagent | null = null;
  if (input.reducer) {
    reducerReagent = reagentFor(input.reducer.reagentKey, 'reducer.reagentKey');
    if (!hasRole(reducerReagent, 'reducer')) throw invalid('reducer.reagentKey', `${reducerReagent.name} is not a reducer`);
  } else if (solventReagent && hasRole(solventReagent, 'reducer')) {
    reducerReagent = solventReagent;
  } else if (electronsMmol > 0) {
    throw invalid('reducer', `choose a reducer: the precursors need ${fmt(electronsMmol)} mmol of electrons`);
  }
  const excess = input.reducer?.excess ?? 1;
  if (reducerReagent && electronsMmol > 0) {
    const electronsPerUnit = electronsDonated(reducerReagent);
    const halfReaction = REDUCER_HALF_REACTIONS[reducerReagent.reducerHalfReactionId ?? '']?.halfReaction ?? '';
    const stoichiometricMmol = electronsMmol / electronsPerUnit;
    reducerSummary = { key: reducerReagent.key, electronsPerUnit, halfReaction, stoichiometricMmol, excess };
    if (excess < 1) {
      checks.push({ kind: 'reducer', severity: 'warning', message: `Reducer excess ${fmt(excess)} is below the electron balance: at most ${fmt(100 * excess)} % of the metal can be reduced.` });
    }
    if (solventReagent && reducerReagent.key === solventReagent.key) {
      // the solvent line below carries the amount; report how many times the need it supplies
    } else {
      const amountMmol = stoichiometricMmol * excess;
      const massMg = massOf(reducerReagent, amountMmol);
      lines.push({
        key: reducerReagent.key,
        name: reducerReagent.name,
        formula: reducerReagent.formula,
        role: 'reducer',
        amountMmol,
        massMg,
        volumeMl: volumeOf(reducerReagent, amountMmol, massMg, input.reducer?.stockMm),
        stockMm: input.reducer?.stockMm ?? null,
        molarMassGPerMol: reducerReagent.molarMassGPerMol,
        note: `${fmt(electronsMmol)} mmol e⁻ ÷ ${electronsPerUnit} e⁻ per unit (${halfReaction}) × ${fmt(excess)} excess`,
      });
    }
  }

  // ── Capping agent ────────────────────────────────────────────────────────────
  const reducedMetalMmol = metals.filter((m) => m.precursorKey !== null).reduce((sum, m) => sum + m.amountMmol, 0);
  if (input.capping) {
    const capping = reagentFor(input.capping.reagentKey, 'capping.reagentKey');
    if (!hasRole(capping, 'capping-agent')) throw invalid('capping.reagentKey', `${capping.name} is not a capping agent`);
    const amountMmol =
      input.capping.molPerMolMetal !== undefined ? input.capping.molPerMolMetal * reducedMetalMmol : ((input.capping.concentrationMm as number) * input.batchVolumeMl) / 1000;
    const massMg = massOf(capping, amountMmol);
    const already = lines.find((line) => line.key === capping.key);
    if (already) throw invalid('capping.reagentKey', `${capping.name} is already the ${already.role}; choose another capping agent or leave it out`);
    lines.push({
      key: capping.key,
      name: capping.name,
      formula: capping.formula,
      role: 'capping-agent',
      amountMmol,
      massMg,
      volumeMl: volumeOf(capping, amountMmol, massMg, input.capping.stockMm),
      stockMm: input.capping.stockMm ?? null,
      molarMassGPerMol: capping.molarMassGPerMol,
      note:
        input.capping.molPerMolMetal !== undefined
          ? `${fmt(input.capping.molPerMolMetal)} mol per mol of metal reduced (${fmt(reducedMetalMmol)} mmol)${capping.amountUnitNote ? `; ${capping.amountUnitNote}` : ''}`
          : `${fmt(input.capping.concentrationMm as number)} mM in ${fmt(input.batchVolumeMl)} mL${capping.amountUnitNote ? `; ${capping.amountUnitNote}` : ''}`,
    });
  }

  // ── Additives ────────────────────────────────────────────────────────────────
  input.additives.forEach((additive, index) => {
    const reagent = reagentFor(additive.reagentKey, `additives.${index}.reagentKey`);
    const massMg = massOf(reagent, additive.amountMmol);
    lines.push({
      key: reagent.key,
      name: reagent.name,
      formula: reagent.formula,
      role: 'additive',
      amountMmol: additive.amountMmol,
      massMg,
      volumeMl: volumeOf(reagent, additive.amountMmol, massMg, additive.stockMm),
      stockMm: additive.stockMm ?? null,
      molarMassGPerMol: reagent.molarMassGPerMol,
      note: '',
    });
  });

  // ── Solvent line and volume balance ──────────────────────────────────────────
  const dispensedMl = lines.reduce((sum, line) => sum + (line.volumeMl ?? 0), 0);
  let makeUpVolumeMl: number | null = null;
  if (solventReagent && input.solvent?.volumeMl !== undefined) {
    const volumeMl = input.solvent.volumeMl;
    const massMg = volumeMl * (solventReagent.densityGPerMl ?? 1) * 1000;
    solventMmol = (massMg * (solventReagent.assayWtPct / 100)) / solventReagent.molarMassGPerMol;
    const reduces = reducerReagent !== null && reducerReagent.key === solventReagent.key;
    lines.push({
      key: solventReagent.key,
      name: solventReagent.name,
      formula: solventReagent.formula,
      role: 'solvent',
      amountMmol: solventMmol,
      massMg,
      volumeMl,
      stockMm: null,
      molarMassGPerMol: solventReagent.molarMassGPerMol,
      note: reduces ? 'solvent and reducer' : 'solvent',
    });
    if (reduces && reducerSummary) {
      const supplied = (solventMmol * reducerSummary.electronsPerUnit) / electronsMmol;
      checks.push({
        kind: 'reducer',
        severity: 'info',
        message: `${solventReagent.name} is solvent and reducer: ${fmt(volumeMl)} mL could give ${fmt(supplied)} times the ${fmt(electronsMmol)} mmol of electrons the precursors need (${reducerSummary.halfReaction}).`,
      });
    }
    const total = dispensedMl + volumeMl;
    if (total > input.batchVolumeMl * 1.02) {
      checks.push({ kind: 'volume', severity: 'warning', message: `Solvent and stocks add up to ${fmt(total)} mL, more than the ${fmt(input.batchVolumeMl)} mL batch volume.` });
    }
  } else {
    makeUpVolumeMl = input.batchVolumeMl - dispensedMl;
    const water = solventReagent ?? catalog.get('water') ?? null;
    if (makeUpVolumeMl < 0) {
      checks.push({
        kind: 'volume',
        severity: 'warning',
        message: `The stock volumes (${fmt(dispensedMl)} mL) exceed the ${fmt(input.batchVolumeMl)} mL batch volume by ${fmt(-makeUpVolumeMl)} mL: use more concentrated stocks or a larger batch.`,
      });
    } else if (water) {
      lines.push({
        key: water.key,
        name: water.name,
        formula: water.formula,
        role: 'solvent',
        amountMmol: null,
        massMg: null,
        volumeMl: makeUpVolumeMl,
        stockMm: null,
        molarMassGPerMol: water.molarMassGPerMol,
        note: `make up to ${fmt(input.batchVolumeMl)} mL`,
      });
    }
  }

  // ── Kinetic checks ───────────────────────────────────────────────────────────
  const coupleOf = (element: string): ReductionCouple | null => {
    const metal = precursorByElement.get(element)?.reagent.metal;
    return metal && metal.coupleId ? reductionCouple(metal.coupleId) : null;
  };
  let orderSummary: ReductionOrderSummary | null = null;
  let galvanicSummary: GalvanicSummary | null = null;
  let kineticCore: string | null = null;

  if (geometry.architecture === 'single-metal') {
    checks.push({ kind: 'target', severity: 'info', message: `Single-metal batch: ${coreElement} particles (seeds for a later growth batch of ${elementA}-${elementB}).` });
  } else if (route !== 'seed-mediated') {
    const coupleA = coupleOf(elementA);
    const coupleB = coupleOf(elementB);
    if (coupleA && coupleB) {
      const order = reductionOrder(coupleA, coupleB);
      kineticCore = order.first;
      orderSummary = {
        first: order.first,
        second: order.second,
        gapV: order.gapV,
        firstCouple: order.firstCouple.halfReaction,
        secondCouple: order.secondCouple.halfReaction,
        firstEV: order.firstCouple.eStandardV,
        secondEV: order.secondCouple.eStandardV,
      };
      checks.push({
        kind: 'reduction-order',
        severity: 'info',
        message: `${order.firstCouple.halfReaction} (E° = ${signedV(order.firstCouple.eStandardV)}) is more noble than ${order.secondCouple.halfReaction} (E° = ${signedV(order.secondCouple.eStandardV)}) by ${order.gapV.toFixed(3)} V: ${order.first} reduces first and tends to nucleate the core (kinetic ${order.first}@${order.second}).`,
      });
      if (geometry.architecture === 'alloy' && order.gapV > 0.3) {
        checks.push({
          kind: 'reduction-order',
          severity: 'warning',
          message: `A ${order.gapV.toFixed(2)} V gap between the couples works against a mixed alloy: co-reduction tends to give ${order.first}-rich cores and ${order.second}-rich surfaces. A fast, strong reducer added at once, or ligands that bring the potentials closer, help.`,
        });
      }
      if (parsedTarget.kind === 'core@shell' && parsedTarget.core === order.second) {
        checks.push({
          kind: 'reduction-order',
          severity: 'warning',
          message: `The target ${input.target} needs ${order.second} first, but ${order.first} reduces first in co-reduction: grow ${parsedTarget.shell} on preformed ${parsedTarget.core} seeds (seed-mediated route) instead.`,
        });
      }
    } else {
      const zeroValent = [...precursorByElement.values()].filter((p) => p.reagent.metal?.oxidationState === 0).map((p) => p.reagent.name);
      checks.push({
        kind: 'reduction-order',
        severity: 'info',
        message: zeroValent.length > 0
          ? `${zeroValent.join(', ')} is zero-valent and decomposes thermally: the order of nucleation follows decomposition vs reduction rates, not electrode potentials.`
          : 'No reduction couple for one of the precursors: the reduction order cannot be judged.',
      });
    }
  } else if (seedInfo && shellElement) {
    kineticCore = seedInfo.metal;
    const shellCouple = coupleOf(shellElement);
    const chloridePresent = lines.some((line) => line.role !== 'seeds' && line.role !== 'solvent' && /Cl(?![a-z])/.test(line.formula));
    const seedCouple = seedDissolutionCouple(seedInfo.metal, chloridePresent);
    if (shellCouple && seedCouple) {
      const verdict = galvanicReplacement(shellCouple, seedCouple);
      const consumed = geometry.shellAtoms * verdict.seedAtomsPerShellAtom;
      const fraction = Math.min(1, consumed / seedInfo.atomsPerSeed);
      galvanicSummary = {
        seedMetal: verdict.seedMetal,
        shellMetal: verdict.shellMetal,
        drivingForceV: verdict.drivingForceV,
        replaces: verdict.replaces,
        seedAtomsPerShellAtom: verdict.seedAtomsPerShellAtom,
        seedAtomsConsumedPerParticle: consumed,
        seedFractionConsumed: fraction,
        shellCouple: shellCouple.halfReaction,
        seedCouple: seedCouple.halfReaction,
        reaction: verdict.reaction,
      };
      const comparison = `${shellCouple.halfReaction} (${signedV(shellCouple.eStandardV)}) vs ${seedCouple.halfReaction} (${signedV(seedCouple.eStandardV)}${seedCouple.id === 'AgCl/Ag' ? ', chloride present' : ''})`;
      if (verdict.replaces) {
        checks.push({
          kind: 'galvanic-replacement',
          severity: verdict.drivingForceV > GALVANIC_MARGIN_V ? 'warning' : 'info',
          message:
            `${verdict.drivingForceV > GALVANIC_MARGIN_V ? 'Galvanic replacement' : 'Marginal galvanic replacement'}: the ${shellElement} precursor can oxidise the ${seedInfo.metal} seeds (ΔE° = ${signedV(verdict.drivingForceV)}; ${comparison}). ` +
            `${verdict.reaction}: ${fmt(verdict.seedAtomsPerShellAtom)} ${seedInfo.metal} atoms dissolve per ${shellElement} atom deposited by replacement. ` +
            `If the whole shell precursor reacted that way, ${fmt(consumed)} ${seedInfo.metal} atoms per seed would dissolve (${fmt(100 * fraction)} % of a ${fmt(seedInfo.atomsPerSeed)}-atom seed): expect hollow or alloyed particles. ` +
            'Add the reducer before or with the precursor, add the precursor slowly, or choose a less oxidising precursor.',
        });
      } else {
        checks.push({ kind: 'galvanic-replacement', severity: 'info', message: `No galvanic replacement expected: ΔE° = ${signedV(verdict.drivingForceV)} (${comparison}).` });
      }
    } else {
      checks.push({ kind: 'galvanic-replacement', severity: 'info', message: 'No couple for the shell precursor or the seed metal: galvanic replacement cannot be judged.' });
    }
  }

  const thermo = context.thermodynamicSurfaceElement;
  if (geometry.architecture === 'single-metal') {
    // one metal: nothing to compare
  } else if (thermo === undefined) {
    checks.push({ kind: 'kinetics-vs-thermodynamics', severity: 'info', message: 'No thermodynamic prediction was available to compare with the kinetic expectation.' });
  } else if (kineticCore !== null) {
    const other = kineticCore === elementA ? elementB : elementA;
    if (thermo === kineticCore) {
      checks.push({
        kind: 'kinetics-vs-thermodynamics',
        severity: 'warning',
        message: `Kinetics and thermodynamics disagree: ${kineticCore} is expected in the core (it ${route === 'seed-mediated' ? 'is the seed' : 'reduces first'}), but the thermodynamic model puts ${kineticCore} at the surface. A kinetic ${kineticCore}@${other} may invert or alloy on annealing or heating; keep post-synthesis temperatures low, or anneal on purpose and check by EDX line scan.`,
      });
    } else if (thermo === other) {
      checks.push({ kind: 'kinetics-vs-thermodynamics', severity: 'info', message: `Kinetics and thermodynamics agree: ${kineticCore} in the core, ${other} at the surface.` });
    } else if (thermo === null && (geometry.architecture === 'core@shell' || route === 'seed-mediated')) {
      checks.push({
        kind: 'kinetics-vs-thermodynamics',
        severity: 'info',
        message: `The thermodynamic model predicts no strong surface enrichment: a kinetic ${kineticCore}@${other} structure may interdiffuse toward an alloy on heating.`,
      });
    }
  }

  // ── Stock ages ───────────────────────────────────────────────────────────────
  if (context.now && input.stocks.length > 0) {
    const ages = stockAges(
      input.stocks.map((stock, index) => {
        const reagent = reagentFor(stock.reagentKey, `stocks.${index}.reagentKey`);
        return { reagentKey: reagent.key, name: reagent.name, preparedAt: stock.preparedAt, freshnessHours: stock.freshnessHours ?? reagent.stockFreshnessHours ?? null };
      }),
      context.now,
    );
    for (const age of ages) {
      if (age.stale) {
        checks.push({
          kind: 'stock-age',
          severity: 'warning',
          message: `The ${age.name} stock is ${formatHours(age.ageHours)} old, beyond its ${formatHours(age.freshnessHours as number)} limit: make it fresh.`,
        });
      }
    }
  }

  // ── Hazards ──────────────────────────────────────────────────────────────────
  const profiles: ReagentHazardProfile[] = [];
  for (const line of lines) {
    if (line.role === 'seeds') continue;
    const reagent = catalog.get(line.key);
    if (!reagent || profiles.some((p) => p.key === reagent.key)) continue;
    profiles.push({
      key: reagent.key,
      name: reagent.name,
      hCodes: reagent.hCodes,
      signalWord: reagent.signalWord,
      tags: reagent.tags,
      wasteStream: reagent.wasteStream,
      ...(line.amountMmol !== null ? { amountMmol: line.amountMmol } : {}),
      ...(reagent.notes ? { note: reagent.notes } : {}),
    });
  }
  const metalsPresent = seedInfo ? [seedInfo.metal, ...[...precursorByElement.keys()]] : [...precursorByElement.keys()];
  const hazardSummary = summarizeHazards(profiles, { temperatureC, metals: metalsPresent, aqueous, benchCautions: true });
  for (const warning of hazardSummary.warnings) {
    if (warning.reagentKeys.length === 0) continue;
    checks.push({ kind: 'hazard', severity: warning.severity === 'caution' ? 'warning' : warning.severity, message: warning.message });
  }

  const particlesPerMl = particles / input.batchVolumeMl;
  return {
    modelVersion: RECIPE_MODEL_VERSION,
    elementA,
    elementB,
    target: input.target,
    route,
    routeLabel: ROUTE_LABELS[route],
    architecture: geometry.architecture,
    coreElement,
    shellElement,
    latticeNm: { [elementA]: lattice(elementA), [elementB]: lattice(elementB) },
    diameterNm: geometry.diameterNm,
    coreDiameterNm: geometry.coreDiameterNm,
    shellThicknessNm: geometry.shellThicknessNm,
    shellMonolayers: geometry.shellMonolayers,
    atomsPerParticle: geometry.atomsPerParticle,
    coreAtoms: geometry.coreAtoms,
    shellAtoms: geometry.shellAtoms,
    atomsA: geometry.atomsA,
    atomsB: geometry.atomsB,
    xBPct: geometry.xB * 100,
    particles,
    particlesPerMl: particlesPerMl,
    particleNanomolar: particleNanomolar(particlesPerMl),
    batchVolumeMl: input.batchVolumeMl,
    temperatureC,
    aqueous,
    metals,
    electronsMmol,
    reducer: reducerSummary,
    reagents: lines,
    makeUpVolumeMl,
    reductionOrder: orderSummary,
    galvanic: galvanicSummary,
    thermodynamicSurfaceElement: thermo,
    checks,
    hazards: hazardSummary.hazards.map((h) => ({ code: h.code, text: h.text })),
    hazardSummary,
  };
}

/** Atoms in one seed of `diameterNm` (convenience for lineage and the view). */
export function atomsPerSeed(diameterNm: number, latticeNm: number): number {
  return atomsInSphere(diameterNm, latticeNm);
}
