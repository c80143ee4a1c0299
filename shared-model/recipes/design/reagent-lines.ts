/**
 * Design stage 2 — reagent lines (DOMAIN.md Model 6): each amount becomes a line to weigh or pipette:
 * mass (formula units × M ÷ assay, or from the supplier's metal content), stock volume (÷ stock mM) or
 * neat volume (÷ density); then the solvent line and the volume balance (water to make up the batch).
 */
import { invalid } from '../../api/result';
import type { BatchDesignInput } from '../design-input';
import { atomicMassGPerMol } from '../formula';
import { roman } from '../potentials';
import type { Reagent } from '../reagent';
import type { DesignAmounts, PrecursorAmount } from './amounts';
import { fmt, type CatalogIndex } from './common';
import type { SeedSupply } from './particles';
import type { DesignCheck, DesignedReagent } from './types';

export interface ReagentLines {
  lines: DesignedReagent[];
  /** Water (or solvent) to add so the batch reaches its volume; null when the solvent volume is given. */
  makeUpVolumeMl: number | null;
  checks: DesignCheck[];
}

/** Mass to weigh (mg) of `amountMmol` formula units, the assay accounted for. */
export function massOf(reagent: Reagent, amountMmol: number): number {
  return (amountMmol * reagent.molarMassGPerMol) / (reagent.assayWtPct / 100);
}

/** Volume to dispense (mL): of the stock when one is given, else of the neat liquid; null for a solid. */
export function volumeOf(
  reagent: Reagent,
  amountMmol: number,
  massMg: number,
  stockMm: number | undefined,
): number | null {
  if (stockMm !== undefined) return (amountMmol / stockMm) * 1000;
  if ((reagent.form === 'liquid' || reagent.form === 'solution') && reagent.densityGPerMl) {
    return massMg / 1000 / reagent.densityGPerMl;
  }
  return null;
}

function dispensed(
  reagent: Reagent,
  role: DesignedReagent['role'],
  amountMmol: number,
  massMg: number,
  stockMm: number | undefined,
  note: string,
): DesignedReagent {
  return {
    key: reagent.key,
    name: reagent.name,
    formula: reagent.formula,
    role,
    amountMmol,
    massMg,
    volumeMl: volumeOf(reagent, amountMmol, massMg, stockMm),
    stockMm: stockMm ?? null,
    molarMassGPerMol: reagent.molarMassGPerMol,
    note,
  };
}

function precursorLine(precursor: PrecursorAmount): DesignedReagent {
  const { element, reagent, metal, metalMmol, amountMmol } = precursor;
  const content = reagent.metalContentWtPct;
  const massMg = content ? (metalMmol * atomicMassGPerMol(element)) / (content / 100) : massOf(reagent, amountMmol);
  const note =
    `${element}(${roman(metal.oxidationState)}) → ${element}: ${fmt(metalMmol)} mmol ${element}` +
    (content ? `, mass from ${content} wt% ${element} content` : '');
  return dispensed(reagent, 'metal-precursor', amountMmol, massMg, precursor.stockMm, note);
}

function seedLine(seeds: SeedSupply, particles: number): DesignedReagent {
  const batch = seeds.seedBatchId;
  return {
    key: batch ? `seed-batch-${batch}` : 'seeds',
    name: `${seeds.metal} seed dispersion${batch ? ` (batch #${batch})` : ''}`,
    formula: seeds.metal,
    role: 'seeds',
    amountMmol: null,
    massMg: null,
    volumeMl: seeds.volumeMl,
    stockMm: null,
    molarMassGPerMol: null,
    note:
      `${fmt(seeds.particlesPerMl)} seeds/mL × ${fmt(seeds.volumeMl)} mL = ${fmt(particles)} seeds of ` +
      `${fmt(seeds.atomsPerSeed)} atoms`,
  };
}

function cappingLine(
  input: BatchDesignInput,
  amounts: DesignAmounts,
  lines: DesignedReagent[],
): DesignedReagent | null {
  const capping = amounts.capping;
  if (!capping) return null;
  const { reagent, amountMmol, basis } = capping;
  const massMg = massOf(reagent, amountMmol);
  const already = lines.find((line) => line.key === reagent.key);
  if (already) {
    throw invalid(
      'capping.reagentKey',
      `${reagent.name} is already the ${already.role}; choose another capping agent or leave it out`,
    );
  }
  const unitNote = reagent.amountUnitNote ? `; ${reagent.amountUnitNote}` : '';
  const note =
    'molPerMolMetal' in basis
      ? `${fmt(basis.molPerMolMetal)} mol per mol of metal reduced (${fmt(basis.reducedMetalMmol)} mmol)${unitNote}`
      : `${fmt(basis.concentrationMm)} mM in ${fmt(input.batchVolumeMl)} mL${unitNote}`;
  return dispensed(reagent, 'capping-agent', amountMmol, massMg, capping.stockMm, note);
}

/** The solvent of a given volume (it may be the reducer too), or water to make the batch up to volume. */
function volumeBalance(
  input: BatchDesignInput,
  amounts: DesignAmounts,
  catalog: CatalogIndex,
  lines: DesignedReagent[],
  checks: DesignCheck[],
): number | null {
  const solvent = amounts.solvent;
  const dispensedMl = lines.reduce((sum, line) => sum + (line.volumeMl ?? 0), 0);
  const solventVolumeMl = input.solvent?.volumeMl;
  if (solvent && solventVolumeMl !== undefined) {
    const massMg = solventVolumeMl * (solvent.densityGPerMl ?? 1) * 1000;
    const solventMmol = (massMg * (solvent.assayWtPct / 100)) / solvent.molarMassGPerMol;
    const reducer = amounts.reducer;
    const reduces = reducer !== null && reducer.reagent.key === solvent.key;
    lines.push({
      key: solvent.key,
      name: solvent.name,
      formula: solvent.formula,
      role: 'solvent',
      amountMmol: solventMmol,
      massMg,
      volumeMl: solventVolumeMl,
      stockMm: null,
      molarMassGPerMol: solvent.molarMassGPerMol,
      note: reduces ? 'solvent and reducer' : 'solvent',
    });
    if (reduces && reducer.balance) {
      const electronsMmol = amounts.electronsMmol;
      const supplied = (solventMmol * reducer.balance.electronsPerUnit) / electronsMmol;
      checks.push({
        kind: 'reducer',
        severity: 'info',
        message:
          `${solvent.name} is solvent and reducer: ${fmt(solventVolumeMl)} mL could give ${fmt(supplied)} times the ` +
          `${fmt(electronsMmol)} mmol of electrons the precursors need (${reducer.balance.halfReaction}).`,
      });
    }
    const total = dispensedMl + solventVolumeMl;
    if (total > input.batchVolumeMl * 1.02) {
      checks.push({
        kind: 'volume',
        severity: 'warning',
        message:
          `Solvent and stocks add up to ${fmt(total)} mL, more than the ${fmt(input.batchVolumeMl)} mL ` +
          'batch volume.',
      });
    }
    return null;
  }
  const makeUpVolumeMl = input.batchVolumeMl - dispensedMl;
  const water = solvent ?? catalog.get('water') ?? null;
  if (makeUpVolumeMl < 0) {
    checks.push({
      kind: 'volume',
      severity: 'warning',
      message:
        `The stock volumes (${fmt(dispensedMl)} mL) exceed the ${fmt(input.batchVolumeMl)} mL batch volume by ` +
        `${fmt(-makeUpVolumeMl)} mL: use more concentrated stocks or a larger batch.`,
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
  return makeUpVolumeMl;
}

/** The lines to weigh and pipette, in working order: seeds, precursors, reducer, capping, additives, solvent. */
export function reagentLines(input: BatchDesignInput, amounts: DesignAmounts, catalog: CatalogIndex): ReagentLines {
  const checks: DesignCheck[] = [];
  const lines = amounts.precursorAmounts.map(precursorLine);
  if (amounts.seeds) lines.unshift(seedLine(amounts.seeds, amounts.particles));
  const reducer = amounts.reducer;
  if (reducer?.balance && reducer.amountMmol !== null) {
    const { electronsPerUnit, halfReaction, excess } = reducer.balance;
    const massMg = massOf(reducer.reagent, reducer.amountMmol);
    const note =
      `${fmt(amounts.electronsMmol)} mmol e⁻ ÷ ${electronsPerUnit} e⁻ per unit (${halfReaction}) × ` +
      `${fmt(excess)} excess`;
    lines.push(dispensed(reducer.reagent, 'reducer', reducer.amountMmol, massMg, reducer.stockMm, note));
  }
  const capping = cappingLine(input, amounts, lines);
  if (capping) lines.push(capping);
  input.additives.forEach((additive, index) => {
    const reagent = catalog.require(additive.reagentKey, `additives.${index}.reagentKey`);
    const massMg = massOf(reagent, additive.amountMmol);
    lines.push(dispensed(reagent, 'additive', additive.amountMmol, massMg, additive.stockMm, ''));
  });
  const makeUpVolumeMl = volumeBalance(input, amounts, catalog, lines, checks);
  return { lines, makeUpVolumeMl, checks };
}
