/**
 * A campaign screen: Monte Carlo for every pair of the campaign's elements that has tight-binding
 * parameters, at each composition and size, and the results as a pair × pair matrix beside the analytic
 * prediction. This module plans the runs (and lists the pairs it must skip, with why) and folds finished
 * runs into matrix cells; queueing and storage belong to the services.
 *
 * Matrix convention: in the matrix of composition x, the cell in row R and column C is the particle with
 * x(C) = x, i.e. the run R–C at xB = x, or equivalently the run C–R at xB = 1 − x. A screen runs each
 * unordered pair once per composition given; a mirrored cell is filled when 1 − x is also among them.
 */
import { invalid } from '../api/result';
import type { ParticleShape } from '../geometry/shapes';
import { GUPTA_ELEMENTS, isGuptaElement } from './gupta-parameters';
import { DEFAULT_STOPPING, defaultRelaxation, planSimulation, type SimulationSpec } from './simulate';

export interface ScreenRequest {
  elements: readonly string[];
  /** Atomic fractions of B (0 < x < 1). */
  xB: readonly number[];
  diameterNm: readonly number[];
  temperatureK: number;
  shape: ParticleShape;
  /** Cap per run (each run stops at the answer by default). */
  sweeps: number;
  seed: number;
}

export interface SkippedPair {
  pair: string;
  reason: string;
}

export interface PlannedScreenRun {
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
  spec: SimulationSpec;
}

export interface ScreenPlan {
  elements: string[];
  /** Elements with parameters, in the order of the request. */
  simulatedElements: string[];
  runs: PlannedScreenRun[];
  skipped: SkippedPair[];
}

/** Plans the runs of a screen; refuses empty or out-of-range lists naming the field. */
export function planScreen(request: ScreenRequest): ScreenPlan {
  const elements = [...new Set(request.elements)];
  if (request.xB.length === 0) throw invalid('xB', 'give at least one composition');
  if (request.diameterNm.length === 0) throw invalid('diameterNm', 'give at least one diameter');
  for (const x of request.xB)
    if (!(x > 0 && x < 1)) throw invalid('xB', `each composition must lie strictly between 0 and 1, got ${x}`);
  const simulated = elements.filter(isGuptaElement);
  const skipped: SkippedPair[] = [];
  const runs: PlannedScreenRun[] = [];
  for (let i = 0; i < elements.length; i++) {
    for (let j = i + 1; j < elements.length; j++) {
      const a = elements[i]!;
      const b = elements[j]!;
      const missing = [a, b].filter((s) => !isGuptaElement(s));
      if (missing.length > 0) {
        skipped.push({
          pair: `${a}-${b}`,
          reason: `${missing.join(' and ')} ${missing.length > 1 ? 'have' : 'has'} no tight-binding (Gupta) parameters; the Monte Carlo supports ${GUPTA_ELEMENTS.join(', ')}`,
        });
        continue;
      }
      for (const diameterNm of request.diameterNm) {
        for (const xB of request.xB) {
          const spec: SimulationSpec = {
            elementA: a,
            elementB: b,
            xB,
            shape: request.shape,
            diameterNm,
            temperatureK: request.temperatureK,
            sweeps: request.sweeps,
            seed: request.seed,
            relaxation: defaultRelaxation(a, b).mode,
            // Each run stops at the answer (SE of the surface fraction below the target); sweeps is the cap.
            stopping: DEFAULT_STOPPING,
          };
          planSimulation(spec);
          runs.push({ elementA: a, elementB: b, xB, diameterNm, spec });
        }
      }
    }
  }
  if (simulated.length < 2) {
    throw invalid(
      'campaignId',
      `the campaign's elements (${elements.join(', ') || 'none'}) hold fewer than two metals with tight-binding parameters; nothing to screen`,
    );
  }
  return { elements, simulatedElements: simulated, runs, skipped };
}

export interface ScreenCellSource {
  runId: number;
  elementA: string;
  elementB: string;
  xB: number;
  diameterNm: number;
  status: string;
  architecture: string | null;
  prediction: string | null;
}

export interface ScreenCell {
  row: string;
  column: string;
  /** x of the column element. */
  x: number;
  diameterNm: number;
  runId: number;
  status: string;
  architecture: string | null;
  prediction: string | null;
}

/** The matrix cells of finished and pending runs (both mirror cells of a run when they belong to a listed composition). */
export function screenCells(runs: readonly ScreenCellSource[], compositions: readonly number[]): ScreenCell[] {
  const cells: ScreenCell[] = [];
  const listed = (x: number) => compositions.some((c) => Math.abs(c - x) < 1e-9);
  for (const run of runs) {
    const base = {
      diameterNm: run.diameterNm,
      runId: run.runId,
      status: run.status,
      architecture: run.architecture,
      prediction: run.prediction,
    };
    cells.push({ ...base, row: run.elementA, column: run.elementB, x: run.xB });
    const mirrored = Math.round((1 - run.xB) * 1e9) / 1e9;
    if (listed(mirrored) && Math.abs(mirrored - run.xB) > 1e-9) {
      const alreadyRun = runs.some(
        (r) =>
          r.elementA === run.elementB &&
          r.elementB === run.elementA &&
          Math.abs(r.xB - mirrored) < 1e-9 &&
          r.diameterNm === run.diameterNm,
      );
      if (!alreadyRun) cells.push({ ...base, row: run.elementB, column: run.elementA, x: mirrored });
    }
  }
  return cells;
}
