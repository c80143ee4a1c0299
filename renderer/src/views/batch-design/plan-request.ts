/**
 * A batch asked for from another view (Next batches → Plan this) taken into the batch-design form: pair,
 * target, route, diameter, composition (at.%), temperature and total metal; a precursor of each metal from the
 * catalog when the form's own is for another metal. Seed-mediated growth becomes seeds of the core metal with a
 * shell whose thickness gives the composition (equal atomic volumes assumed: d_core = d (1 − x_shell)^(1/3)).
 * Pure: no React, no DOM.
 */
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import type { BatchPlanRequest } from '../../app-state';
import type { BatchFormState } from './batch-form';

const text = (x: number): string => String(Number(x.toPrecision(4)));

function precursorFor(current: string, element: string, catalog: readonly CatalogReagent[]): string {
  const own = catalog.find((r) => r.key === current);
  if (own && own.metal?.symbol === element) return current;
  return catalog.find((r) => r.metal?.symbol === element)?.key ?? '';
}

/** The core and shell metals a seed-mediated plan means (target "Ni@Pt" → Ni seeds, Pt shell). */
export function seedAndShellOf(plan: BatchPlanRequest): { core: string; shell: string } {
  const m = /^([A-Z][a-z]?)@([A-Z][a-z]?)$/.exec(plan.targetLabel);
  if (m && m[1] && m[2]) return { core: m[1], shell: m[2] };
  return { core: plan.elementA, shell: plan.elementB };
}

export function formFromPlan(
  current: BatchFormState,
  plan: BatchPlanRequest,
  catalog: readonly CatalogReagent[],
): BatchFormState {
  const base: BatchFormState = {
    ...current,
    elementA: plan.elementA,
    elementB: plan.elementB,
    target: plan.targetLabel,
    route: plan.route,
    diameterNm: text(plan.diameterNm),
    compositionPct: text(plan.xB * 100),
    amountKind: 'total-metal',
    amountValue: text(plan.totalMetalMmol),
    temperatureC: text(plan.temperatureK - 273.15),
    precursorA: precursorFor(current.precursorA, plan.elementA, catalog),
    precursorB: precursorFor(current.precursorB, plan.elementB, catalog),
  };
  if (plan.route !== 'seed-mediated') return { ...base, sizeKind: 'alloy' };
  const { core, shell } = seedAndShellOf(plan);
  const xShell = shell === plan.elementB ? plan.xB : 1 - plan.xB;
  const coreNm = plan.diameterNm * Math.cbrt(1 - xShell);
  return {
    ...base,
    sizeKind: 'core-shell',
    seedMetal: core,
    seedBatchId: '',
    seedDiameterNm: text(coreNm),
    shellUnit: 'nm',
    shellValue: text((plan.diameterNm - coreNm) / 2),
    seedVolumeMl: current.seedVolumeMl || '5',
  };
}

/** The sentence above the form saying where its values came from and what to check. */
export function describePlan(plan: BatchPlanRequest): string {
  const pair = `${plan.elementA}-${plan.elementB}, ${text(plan.xB * 100)} at.% ${plan.elementB}`;
  const particle = `${text(plan.diameterNm)} nm, target ${plan.targetLabel}, ${Number(plan.temperatureK.toFixed(2))} K`;
  const seeds =
    plan.route === 'seed-mediated'
      ? ` Seeds of ${seedAndShellOf(plan).core} with a shell giving that composition (equal atomic volumes assumed).`
      : '';
  return `Filled in from ${plan.source}: ${pair}, ${particle}.${seeds} Check the reagents, then Compute.`;
}
