/**
 * Simulation service: lattice Monte Carlo runs queued in worker threads (electron/workers), stored in
 * the workspace (migration 0003), re-opened, exported as extended XYZ; and the Gupta energy of a
 * given structure.
 */
import { getRun, listRuns } from '../../db/repositories/simulation';
import { DomainError } from '../../shared-model/api/result';
import { MIXING_RULE_DESCRIPTION, type simulationOperations } from '../../shared-model/api/simulation';
import { PARTICLE_SHAPES } from '../../shared-model/geometry/shapes';
import { writeExtendedXyz } from '../../shared-model/montecarlo/extended-xyz';
import { computePool } from '../workers/compute-pool';
import { GUPTA_ELEMENTS } from '../../shared-model/montecarlo/gupta-parameters';
import {
  DEFAULT_STOPPING,
  ENGINE_VERSION,
  rebuildGeometry,
  SIMULATION_LIMITS,
  type SimulationSpec,
} from '../../shared-model/montecarlo/simulate';
import { queueFor } from '../workers/montecarlo-queue';
import type { HandlerMap } from './context';

export const simulationHandlers: HandlerMap<keyof typeof simulationOperations> = {
  'simulation.options': () => ({
    elements: GUPTA_ELEMENTS,
    shapes: PARTICLE_SHAPES,
    limits: SIMULATION_LIMITS,
    mixingRule: MIXING_RULE_DESCRIPTION,
    engineVersion: ENGINE_VERSION,
  }),

  'simulation.start': (input, { store }) => {
    const { pairId, label, ...rest } = input;
    const spec: SimulationSpec = {
      elementA: rest.elementA,
      elementB: rest.elementB,
      xB: rest.xB,
      shape: rest.shape,
      shells: rest.shells,
      diameterNm: rest.diameterNm,
      temperatureK: rest.temperatureK,
      sweeps: rest.sweeps,
      anneal: rest.anneal ?? null,
      seed: rest.seed,
      progressEverySweeps: rest.progressEverySweeps,
      relaxation: rest.relaxation,
      stopping: rest.stopping === undefined ? DEFAULT_STOPPING : rest.stopping,
    };
    for (const key of Object.keys(spec) as (keyof SimulationSpec)[]) if (spec[key] === undefined) delete spec[key];
    return queueFor(store).enqueue(spec, label, pairId ?? null);
  },

  'simulation.status': ({ id }, { store }) => queueFor(store).summary(id),

  'simulation.cancel': ({ id }, { store }) => queueFor(store).cancel(id),

  'simulation.get': ({ id }, { store }) => {
    const queue = queueFor(store);
    queue.expireSilent();
    const run = getRun(store.db, id);
    run.progressHistory = queue.history(id);
    return run;
  },

  'simulation.list': ({ limit }, { store }) => {
    queueFor(store).expireSilent();
    return listRuns(store.db, limit);
  },

  'simulation.exportXyz': ({ id }, { store }) => {
    const run = getRun(store.db, id);
    if (run.status !== 'done' || !run.result)
      throw new DomainError('conflict', `run ${id} is ${run.status}; only a finished run has a final structure`, 'id');
    const result = run.result;
    const geometry = rebuildGeometry(run.spec);
    if (result.finalOccupation.length !== geometry.atoms) {
      throw new DomainError(
        'internal',
        `run ${id} stored ${result.finalOccupation.length} occupations for ${geometry.atoms} sites; the geometry builder changed since (engine ${run.engineVersion})`,
      );
    }
    const symbols = Array.from(result.finalOccupation, (c) => (c === 'B' ? result.elementB : result.elementA));
    // Relaxed runs store where the atoms ended; rigid runs sit on the rebuilt sites.
    const positions = result.finalPositionsAngstrom
      ? Float64Array.from(result.finalPositionsAngstrom)
      : geometry.positions;
    const content = writeExtendedXyz(
      { symbols, positions },
      {
        energy: result.energyEv,
        pair: `${result.elementA}-${result.elementB}`,
        xB: result.xB,
        shape: result.geometry.shape,
        shells: result.geometry.shells,
        temperatureK: run.spec.temperatureK,
        sweeps: run.spec.sweeps,
        seed: run.spec.seed,
        cutoffAngstrom: result.geometry.cutoffAngstrom,
        relaxation: result.relaxation?.mode ?? 'rigid',
        architecture: result.architecture,
        engine: result.engineVersion,
        run: id,
      },
    );
    return { fileName: `pairwright-run-${id}-${result.elementA}${result.elementB}.xyz`, content };
  },

  // Relaxations and energies run in the compute pool, so the host answers other calls meanwhile.
  'simulation.relax': ({ xyz, forceToleranceEvPerAngstrom, maxIterations }) =>
    computePool().run('relax', { xyz, forceToleranceEvPerAngstrom, maxIterations }),

  'simulation.energy': ({ xyz, cutoffAngstrom }) => computePool().run('energy', { xyz, cutoffAngstrom }),
};
