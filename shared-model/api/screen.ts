/**
 * Campaign screen through the API: queue Monte Carlo for every pair of a campaign's elements (that has
 * tight-binding parameters) × composition × size on the worker queue, follow it, cancel it, and read it
 * as a pair × pair matrix beside the analytic prediction. The runs are ordinary stored runs (labelled
 * with the screen), so every cell opens its run.
 */
import { z } from 'zod';
import { operation } from './operation';
import { idSchema, particleShapeSchema, seedSchema } from './schemas';
import { SIMULATION_LIMITS } from '../montecarlo/simulate';
import type { ScreenCell, SkippedPair } from '../montecarlo/screen';
import type { SimulationRunSummary } from './simulation';

const fraction = z
  .number({ error: 'must be a number (atomic fraction)' })
  .gt(0, 'must be above 0')
  .lt(1, 'must be below 1');

export const screenStartSchema = z.object({
  campaignId: idSchema,
  xB: z.array(fraction).min(1, 'give at least one composition').max(9, 'at most 9 compositions'),
  diameterNm: z
    .array(z.number({ error: 'must be a number (nm)' }).gt(0, 'must be above 0 nm').max(30, 'must be at most 30 nm'))
    .min(1, 'give at least one diameter')
    .max(4, 'at most 4 sizes'),
  temperatureK: z
    .number({ error: 'must be a number (K)' })
    .gt(0, 'must be above 0 K')
    .min(1, 'must be at least 1 K')
    .max(SIMULATION_LIMITS.maxTemperatureK, `must be at most ${SIMULATION_LIMITS.maxTemperatureK} K`),
  shape: particleShapeSchema.default('cuboctahedron'),
  sweeps: z
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(100, 'must be at least 100')
    .max(SIMULATION_LIMITS.maxSweeps, `must be at most ${SIMULATION_LIMITS.maxSweeps}`)
    .default(3000),
  seed: seedSchema.default(1),
});

export interface ScreenRun {
  runId: number;
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
}

export interface ScreenStarted {
  label: string;
  campaignId: number;
  elements: string[];
  runs: ScreenRun[];
  skipped: SkippedPair[];
  /** Runs computed at once (all cores but one, at least one). */
  concurrency: number;
}

export interface ScreenStatus {
  total: number;
  finished: number;
  /** 0..1 over all runs (finished runs count 1, running ones their sweep share). */
  progress: number;
  runs: (ScreenRun & {
    status: SimulationRunSummary['status'];
    architecture: string | null;
    surfaceXB: number | null;
    error: string | null;
  })[];
  cells: ScreenCell[];
  elements: string[];
  compositions: number[];
  diameters: number[];
  /** Wall time from the first start to the last finish so far (ms). */
  elapsedMs: number | null;
}

const runIdsSchema = z.object({
  runIds: z.array(idSchema).min(1, 'give at least one run id').max(2000, 'at most 2000 runs'),
});

export const screenOperations = {
  'screen.start': operation<ScreenStarted>()({
    kind: 'command',
    summary:
      "Queue Monte Carlo for every pair of a campaign's elements × composition × size; returns the run ids at once",
    input: screenStartSchema,
  }),
  'screen.status': operation<ScreenStatus>()({
    kind: 'query',
    summary: 'Progress, per-run status and the pair × pair matrix (with the analytic prediction) of a screen',
    input: runIdsSchema,
  }),
  'screen.cancel': operation<{ cancelled: number }>()({
    kind: 'command',
    summary: 'Cancel every queued or running run of a screen',
    input: runIdsSchema,
  }),
};
