/**
 * Lattice Monte Carlo runs through the API: start a run (returns its id at once; the run is queued and
 * computed off the UI thread), follow its progress, cancel it, read the stored result, export the
 * final structure as extended XYZ, and compute the Gupta energy of any given structure.
 *
 * Bad input is refused here, before any work starts, with the field named: an element without Gupta
 * parameters, T ≤ 0 or above the cap, sweeps ≤ 0 or above the cap, a size above the atom cap.
 */
import { z } from 'zod';
import { DomainError } from './result';
import { operation } from './operation';
import { idSchema, particleShapeSchema, seedSchema } from './schemas';
import { GUPTA_ELEMENTS, isGuptaElement, MIXING_RULE_DESCRIPTION } from '../montecarlo/gupta-parameters';
import {
  planSimulation,
  RELAXATION_MODES,
  SIMULATION_LIMITS,
  type SimulationProgress,
  type SimulationResult,
  type SimulationSpec,
} from '../montecarlo/simulate';
import type { StructureEnergy } from '../montecarlo/gupta-energy';

/** `simulation.relax`: the minimised structure of a given cluster (FIRE on the off-lattice Gupta energy). */
export interface RelaxedCluster {
  atoms: number;
  composition: Record<string, number>;
  initialEnergyEv: number;
  relaxedEnergyEv: number;
  relaxedEnergyPerAtomEv: number;
  maxForceEvPerAngstrom: number;
  iterations: number;
  converged: boolean;
  forceToleranceEvPerAngstrom: number;
  method: string;
  /** The relaxed structure as extended XYZ. */
  xyz: string;
}

const guptaElementSchema = z
  .string({ error: 'must be an element symbol' })
  .trim()
  .transform((s) => s.charAt(0).toUpperCase() + s.slice(1).toLowerCase())
  .refine(isGuptaElement, {
    error: (issue) =>
      `${String(issue.input)} has no tight-binding parameters; the simulation supports ${GUPTA_ELEMENTS.join(', ')}`,
  });

const positiveNumber = (what: string) => z.number({ error: `must be a number (${what})` });

const specShape = {
  elementA: guptaElementSchema,
  elementB: guptaElementSchema,
  xB: positiveNumber('atomic fraction of B').gt(0, 'must be above 0').lt(1, 'must be below 1'),
  shape: particleShapeSchema,
  shells: z
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    // 60 shells of a cuboctahedron are ~720,000 atoms, far above the atom cap that planSimulation applies.
    .max(60, 'must be at most 60 shells')
    .optional(),
  // 30 nm of Au is ~830,000 atoms, above the atom cap (checked with the count by planSimulation).
  diameterNm: positiveNumber('nm').gt(0, 'must be above 0 nm').max(30, 'must be at most 30 nm').optional(),
  temperatureK: positiveNumber('K')
    .gt(0, 'must be above 0 K')
    .min(1, 'must be at least 1 K')
    .max(SIMULATION_LIMITS.maxTemperatureK, `must be at most ${SIMULATION_LIMITS.maxTemperatureK} K`),
  sweeps: z
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    .max(SIMULATION_LIMITS.maxSweeps, `must be at most ${SIMULATION_LIMITS.maxSweeps}`),
  anneal: z
    .object({
      startTemperatureK: positiveNumber('K')
        .gt(0, 'must be above 0 K')
        .min(1, 'must be at least 1 K')
        .max(SIMULATION_LIMITS.maxTemperatureK, `must be at most ${SIMULATION_LIMITS.maxTemperatureK} K`),
      sweeps: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(1, 'must be at least 1')
        .max(SIMULATION_LIMITS.maxSweeps, `must be at most ${SIMULATION_LIMITS.maxSweeps}`),
    })
    .nullish(),
  seed: seedSchema.default(1),
  progressEverySweeps: z
    .number({ error: 'must be a whole number' })
    .int('must be a whole number')
    .min(1, 'must be at least 1')
    .max(SIMULATION_LIMITS.maxSweeps, `must be at most ${SIMULATION_LIMITS.maxSweeps}`)
    .optional(),
  /** Rigid lattice or relaxed (swap + displacement); omitted: by the size-mismatch rule. */
  relaxation: z.enum(RELAXATION_MODES, { error: `must be one of: ${RELAXATION_MODES.join(', ')}` }).optional(),
  /** Stop at the answer (sweeps is then the cap); omitted: the default rule; null: run every sweep. */
  stopping: z
    .object({
      surfaceStandardError: positiveNumber('fraction').gt(0, 'must be above 0').lt(0.5, 'must be below 0.5'),
      minSweeps: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(10, 'must be at least 10')
        .max(SIMULATION_LIMITS.maxSweeps, `must be at most ${SIMULATION_LIMITS.maxSweeps}`),
    })
    .nullish(),
};

/** The model's own checks (a pair of different metals, one size given, atom and attempt caps), field named. */
function checkPlan(value: SimulationSpec, ctx: z.RefinementCtx): void {
  try {
    planSimulation(value);
  } catch (error) {
    if (error instanceof DomainError) {
      ctx.addIssue({ code: 'custom', path: (error.field ?? 'spec').split('.'), message: error.message });
      return;
    }
    throw error;
  }
}

export const simulationSpecSchema = z
  .object(specShape)
  .superRefine((value, ctx) => checkPlan(value as SimulationSpec, ctx));

/** Start input: the run's inputs plus an optional campaign pair it belongs to and a label. */
export const simulationStartSchema = z
  .object({
    ...specShape,
    pairId: idSchema.nullish(),
    label: z.string({ error: 'must be text' }).trim().max(200, 'must be at most 200 characters').default(''),
  })
  .superRefine((value, ctx) => checkPlan(value as SimulationSpec, ctx));

export type SimulationSpecInput = z.input<typeof simulationSpecSchema>;

export const SIMULATION_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type SimulationStatus = (typeof SIMULATION_STATUSES)[number];

/** A run as listed: inputs, state and headline numbers (no traces or occupations). */
export interface SimulationRunSummary {
  id: number;
  status: SimulationStatus;
  spec: SimulationSpec;
  label: string;
  /** Campaign pair the run belongs to, if any. */
  pairId: number | null;
  engineVersion: string;
  /** Planned size, known before the run starts. */
  atoms: number;
  totalSweeps: number;
  /** Latest progress report while queued/running (null before the first). */
  progress: SimulationProgress | null;
  /** Architecture label once done. */
  architecture: string | null;
  surfaceXB: number | null;
  error: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

/** A run with its full result (when done). */
export interface SimulationRun extends SimulationRunSummary {
  result: SimulationResult | null;
  /** Progress history kept while running (for the live traces). */
  progressHistory: SimulationProgress[];
}

export interface SimulationOptions {
  elements: readonly string[];
  shapes: readonly string[];
  limits: typeof SIMULATION_LIMITS;
  mixingRule: string;
  engineVersion: string;
}

export interface XyzExport {
  fileName: string;
  content: string;
}

export const simulationOperations = {
  'simulation.options': operation<SimulationOptions>()({
    kind: 'query',
    summary: 'Supported metals, shapes, limits and the unlike-pair rule of the lattice Monte Carlo',
    input: z.object({}),
  }),
  'simulation.start': operation<SimulationRunSummary>()({
    kind: 'command',
    summary: 'Queue a lattice Monte Carlo run; returns its id at once (progress by polling simulation.status)',
    input: simulationStartSchema,
  }),
  'simulation.status': operation<SimulationRunSummary>()({
    kind: 'query',
    summary: 'State and latest progress of a run',
    input: z.object({ id: idSchema }),
  }),
  'simulation.cancel': operation<SimulationRunSummary>()({
    kind: 'command',
    summary: 'Cancel a queued or running run',
    input: z.object({ id: idSchema }),
  }),
  'simulation.get': operation<SimulationRun>()({
    kind: 'query',
    summary: 'A stored run with its inputs and result',
    input: z.object({ id: idSchema }),
  }),
  'simulation.list': operation<SimulationRunSummary[]>()({
    kind: 'query',
    summary: 'Stored runs, newest first',
    input: z.object({
      limit: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(1, 'must be at least 1')
        .max(500, 'must be at most 500')
        .default(100),
    }),
  }),
  'simulation.exportXyz': operation<XyzExport>()({
    kind: 'query',
    summary: 'Final structure of a finished run as extended XYZ',
    input: z.object({ id: idSchema }),
  }),
  'simulation.energy': operation<StructureEnergy>()({
    kind: 'query',
    summary: 'Gupta energy of a given structure (extended XYZ text, Å)',
    input: z.object({
      xyz: z
        .string({ error: 'must be the text of an XYZ file' })
        .min(1, 'must not be empty')
        .max(20_000_000, 'must be at most 20 MB'),
      // 1–15 Å: Gupta's exponential terms are negligible beyond the fifth fcc shell (~7 Å for Au; common
      // practice); a 100 Å cut-off on 16,000 atoms took 14 s and 3 GB.
      cutoffAngstrom: positiveNumber('Å').min(1, 'must be at least 1 Å').max(15, 'must be at most 15 Å').optional(),
    }),
  }),
  'simulation.relax': operation<RelaxedCluster>()({
    kind: 'query',
    summary: 'Minimise the Gupta energy of a given cluster (extended XYZ, Å) off the lattice; stores nothing',
    input: z.object({
      xyz: z
        .string({ error: 'must be the text of an XYZ file' })
        .min(1, 'must not be empty')
        .max(20_000_000, 'must be at most 20 MB'),
      forceToleranceEvPerAngstrom: positiveNumber('eV/Å')
        .gt(0, 'must be above 0 eV/Å')
        .max(1, 'must be at most 1 eV/Å')
        .default(1e-3),
      maxIterations: z
        .number({ error: 'must be a whole number' })
        .int('must be a whole number')
        .min(1, 'must be at least 1')
        .max(200_000, 'must be at most 200000')
        .default(20_000),
    }),
  }),
};

export { MIXING_RULE_DESCRIPTION };
