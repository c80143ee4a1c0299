/**
 * The New run form as a pure model (no React, no DOM): the typed text of each field, the defaults, reading
 * the text into a `simulation.start` input (typed numbers through the one reader, the field at fault
 * named), the planned size shown while typing, and taking over a request handed on by another view.
 */
import type { OperationInput } from '../../../../shared-model/api/contract';
import { shapeLabel, type ParticleShape } from '../../../../shared-model/geometry/shapes';
import { defaultRelaxation, planSimulation, type SimulationSpec } from '../../../../shared-model/montecarlo/simulate';
import { isGuptaElement } from '../../../../shared-model/montecarlo/gupta-parameters';
import { fieldNumber, optionalFieldNumber, readForm } from '../../forms/typed-numbers';
import type { SimulationRequest } from '../../app-state';

export interface RunFormState {
  elementA: string;
  elementB: string;
  xB: string;
  shape: ParticleShape;
  sizeMode: 'shells' | 'diameter';
  shells: string;
  diameterNm: string;
  temperatureK: string;
  sweeps: string;
  anneal: boolean;
  annealStartK: string;
  annealSweeps: string;
  seed: string;
  /** 'auto': by the size-mismatch rule. */
  relaxation: 'auto' | 'rigid' | 'relaxed';
  /** Stop at the answer (the default rule); off: run every sweep. */
  stopAtAnswer: boolean;
}

export const INITIAL_RUN_FORM: RunFormState = {
  elementA: 'Ag',
  elementB: 'Pd',
  xB: '0.5',
  shape: 'cuboctahedron',
  sizeMode: 'shells',
  shells: '5',
  diameterNm: '3',
  temperatureK: '600',
  sweeps: '1000',
  anneal: false,
  annealStartK: '1500',
  annealSweeps: '500',
  seed: '1',
  relaxation: 'auto',
  stopAtAnswer: true,
};

type SimulationStartInput = OperationInput<'simulation.start'>;

/** The input read from the form, or the first field that does not hold a number (field = the API's path). */
export type RunFormReading = { ok: true; input: SimulationStartInput } | { ok: false; field: string; message: string };

const optional = (text: string, field: string, label: string) => optionalFieldNumber(text, field, label) ?? undefined;

/** Reads the typed text; range checks are left to the contract (zod) so the form and the API say the same. */
export function readRunForm(form: RunFormState): RunFormReading {
  const reading = readForm((): SimulationStartInput => ({
    elementA: form.elementA,
    elementB: form.elementB,
    xB: fieldNumber(form.xB, 'xB', `x(${form.elementB})`),
    shape: form.shape,
    ...(form.sizeMode === 'shells'
      ? { shells: optional(form.shells, 'shells', 'shells') }
      : { diameterNm: optional(form.diameterNm, 'diameterNm', 'diameter, nm') }),
    temperatureK: fieldNumber(form.temperatureK, 'temperatureK', 'temperature, K'),
    sweeps: fieldNumber(form.sweeps, 'sweeps', 'sweeps'),
    anneal: form.anneal
      ? {
          startTemperatureK: fieldNumber(form.annealStartK, 'anneal.startTemperatureK', 'anneal start, K'),
          sweeps: fieldNumber(form.annealSweeps, 'anneal.sweeps', 'cooling sweeps'),
        }
      : null,
    seed: optional(form.seed, 'seed', 'seed') ?? 1,
    ...(form.relaxation !== 'auto' ? { relaxation: form.relaxation } : {}),
    ...(form.stopAtAnswer ? {} : { stopping: null }),
  }));
  return reading.ok
    ? { ok: true, input: reading.value }
    : { ok: false, field: reading.error.field, message: reading.error.message };
}

/** The planned size, or the first problem, computed in the page with the model's own checks. */
export function planText(form: RunFormState): { text: string; ok: boolean } {
  const reading = readRunForm(form);
  if (!reading.ok) return { text: reading.message, ok: false };
  try {
    const plan = planSimulation(reading.input as SimulationSpec);
    const atoms = plan.atoms.toLocaleString('en-US');
    const sweeps = plan.totalSweeps.toLocaleString('en-US');
    return { text: `${atoms} atoms, ${sweeps} sweeps = ${plan.attempts.toExponential(2)} swap attempts`, ok: true };
  } catch (error) {
    return { text: error instanceof Error ? error.message : String(error), ok: false };
  }
}

/** The hint under the shells field, which depends on the shape. */
export function shellsHint(shape: ParticleShape): string {
  if (shape === 'truncated-octahedron') return 'edge atoms − 1';
  if (shape === 'sphere') return 'radius in nearest-neighbour distances';
  return '13, 55, 147, 309 … atoms';
}

/** Short decimal text for a number from another view (0.30000000000000004 → "0.3"). */
export const decimalText = (x: number): string => String(Number(x.toPrecision(6)));

/** The form with a request from another view copied in; size by diameter, run length and seed kept. */
export function formFromRequest(current: RunFormState, request: SimulationRequest): RunFormState {
  return {
    ...current,
    elementA: request.elementA,
    elementB: request.elementB,
    xB: decimalText(request.xB),
    shape: request.shape,
    sizeMode: 'diameter',
    diameterNm: decimalText(request.diameterNm),
    temperatureK: decimalText(request.temperatureK),
  };
}

/** The sentence above the form saying where its values came from. */
export function describeRequest(request: SimulationRequest): string {
  const pair = `${request.elementA}-${request.elementB}, x(${request.elementB}) = ${decimalText(request.xB)}`;
  const particle = `${decimalText(request.diameterNm)} nm ${shapeLabel(request.shape)}, ${decimalText(request.temperatureK)} K`;
  return `Filled in from ${request.source}: ${pair}, ${particle}. Check the sweeps and seed, then Run.`;
}

/** Which mode the run will use and why (the size-mismatch rule unless the user chose). */
export function modeText(form: RunFormState): string {
  if (form.relaxation !== 'auto') return `${form.relaxation === 'relaxed' ? 'Relaxed' : 'Rigid lattice'}: chosen.`;
  if (!isGuptaElement(form.elementA) || !isGuptaElement(form.elementB) || form.elementA === form.elementB) return '';
  const rule = defaultRelaxation(form.elementA, form.elementB);
  return `${rule.mode === 'relaxed' ? 'Relaxed' : 'Rigid lattice'}: ${rule.reason}.`;
}
