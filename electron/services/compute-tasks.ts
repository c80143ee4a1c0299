/**
 * The heavy computations behind the outcome and simulation operations — a line-scan fit (from CSV text or from
 * stored points), the Gupta energy and the FIRE relaxation of an XYZ structure — as functions of plain data. The
 * services run them in the compute pool (electron/workers/compute-pool.ts) so the host's main thread keeps
 * answering; inside a store transaction, which cannot await (the demo campaign), they run in place.
 */
import type { RelaxedCluster } from '../../shared-model/api/simulation';
import type { LineScanPreview } from '../../shared-model/api/outcomes';
import type { LineScanData } from '../../shared-model/characterization/csv-import';
import {
  fitLineScan,
  LINE_SCAN_FIT_BUDGET,
  type LineScanAnalysis,
  type LineScanFitOptions,
} from '../../shared-model/characterization/line-scan-fit';
import { readExtendedXyz, writeExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { ENERGY_BUDGET, totalEnergy, type StructureEnergy } from '../../shared-model/montecarlo/gupta-energy';
import { FIRE_DESCRIPTION, RELAX_WALL_BUDGET_MS, relaxStructure } from '../../shared-model/montecarlo/minimise';
import { analyseLineScanCsv, type LineScanImportInput } from './outcome-analysis';

export interface ComputeTasks {
  previewLineScan: {
    args: { input: LineScanImportInput; elementA: string; elementB: string };
    result: LineScanPreview;
  };
  fitLineScan: { args: { scan: LineScanData; options: LineScanFitOptions }; result: LineScanAnalysis };
  energy: { args: { xyz: string; cutoffAngstrom?: number | undefined }; result: StructureEnergy };
  relax: {
    args: { xyz: string; forceToleranceEvPerAngstrom: number; maxIterations: number };
    result: RelaxedCluster;
  };
}
export type ComputeKind = keyof ComputeTasks;
export type ComputeArgs<Kind extends ComputeKind> = ComputeTasks[Kind]['args'];
export type ComputeResult<Kind extends ComputeKind> = ComputeTasks[Kind]['result'];

/** Each task's own wall-time budget (ms): the pool stops a worker that runs well past it. */
export const COMPUTE_WALL_BUDGET_MS: Record<ComputeKind, number> = {
  previewLineScan: LINE_SCAN_FIT_BUDGET.maxWallMs,
  fitLineScan: LINE_SCAN_FIT_BUDGET.maxWallMs,
  energy: ENERGY_BUDGET.maxWallMs,
  relax: RELAX_WALL_BUDGET_MS,
};

function relaxXyz({ xyz, forceToleranceEvPerAngstrom, maxIterations }: ComputeArgs<'relax'>): RelaxedCluster {
  const relaxed = relaxStructure(readExtendedXyz(xyz), {
    forceToleranceEvPerAngstrom,
    maxIterations,
    maxWallMs: RELAX_WALL_BUDGET_MS,
  });
  const content = writeExtendedXyz(
    { symbols: relaxed.symbols, positions: relaxed.positions },
    {
      energy: relaxed.energyEv,
      initialEnergy: relaxed.initialEnergyEv,
      maxForce: relaxed.maxForceEvPerAngstrom,
      iterations: relaxed.iterations,
      method: 'FIRE',
    },
  );
  return {
    atoms: relaxed.atoms,
    composition: relaxed.composition,
    initialEnergyEv: relaxed.initialEnergyEv,
    relaxedEnergyEv: relaxed.energyEv,
    relaxedEnergyPerAtomEv: relaxed.energyEv / relaxed.atoms,
    maxForceEvPerAngstrom: relaxed.maxForceEvPerAngstrom,
    iterations: relaxed.iterations,
    converged: relaxed.converged,
    forceToleranceEvPerAngstrom,
    method: FIRE_DESCRIPTION,
    xyz: content,
  };
}

/** Runs one task here, on the calling thread. */
export function runComputeTask<Kind extends ComputeKind>(kind: Kind, args: ComputeArgs<Kind>): ComputeResult<Kind> {
  const task = { kind, args } as { [K in ComputeKind]: { kind: K; args: ComputeArgs<K> } }[ComputeKind];
  switch (task.kind) {
    case 'previewLineScan':
      return analyseLineScanCsv(task.args.input, task.args.elementA, task.args.elementB) as ComputeResult<Kind>;
    case 'fitLineScan':
      return fitLineScan(task.args.scan, task.args.options) as ComputeResult<Kind>;
    case 'energy': {
      const { xyz, cutoffAngstrom } = task.args;
      return totalEnergy(
        readExtendedXyz(xyz),
        cutoffAngstrom === undefined ? {} : { cutoffAngstrom },
      ) as ComputeResult<Kind>;
    }
    case 'relax':
      return relaxXyz(task.args) as ComputeResult<Kind>;
  }
}
