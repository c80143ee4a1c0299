/**
 * Isotherm helpers for the pair detail view: surface composition against overall composition (fixed T and
 * size), against diameter (fixed composition and T) and against temperature. Each point is a full
 * prediction (same chain as `predictPair`), reduced to the numbers a chart needs.
 */
import { invalid } from '../api/result';
import {
  resolveConditions,
  pairContext,
  predictWithContext,
  type PredictionConditions,
  type ResolvedConditions,
} from './predict';

export const ISOTHERM_SWEEPS = ['xB', 'diameter', 'temperature'] as const;
export type IsothermSweep = (typeof ISOTHERM_SWEEPS)[number];

export interface IsothermPoint {
  /** The swept value: xB, diameter in nm, or temperature in K. */
  x: number;
  xB: number;
  diameterNm: number;
  temperatureK: number;
  /** B fraction of the surface layer and of the core. */
  surfaceXB: number;
  coreXB: number;
  enrichment: number;
  surfaceElement: string | null;
  architecture: string;
  atoms: number;
  surfaceSites: number;
}

export interface Isotherm {
  pair: string;
  sweep: IsothermSweep;
  points: IsothermPoint[];
}

function sweepValues(sweep: IsothermSweep, points: number, around: ResolvedConditions): number[] {
  const values: number[] = [];
  switch (sweep) {
    case 'xB':
      // open interval (0, 1): both ends approached but never reached
      for (let i = 0; i < points; i++) values.push(0.005 + (0.99 * i) / (points - 1));
      break;
    case 'diameter': {
      // logarithmic from 1 nm to 100 nm (and always including the chosen diameter's decade)
      const lo = Math.log(Math.min(1, around.diameterNm));
      const hi = Math.log(Math.max(100, around.diameterNm));
      for (let i = 0; i < points; i++) values.push(Math.exp(lo + ((hi - lo) * i) / (points - 1)));
      break;
    }
    case 'temperature': {
      const lo = 200;
      const hi = Math.max(1500, around.temperatureK);
      for (let i = 0; i < points; i++) values.push(lo + ((hi - lo) * i) / (points - 1));
      break;
    }
  }
  return values;
}

export function computeIsotherm(
  elementA: string,
  elementB: string,
  conditions: PredictionConditions,
  sweep: IsothermSweep,
  points = 41,
): Isotherm {
  if (!(ISOTHERM_SWEEPS as readonly string[]).includes(sweep))
    throw invalid('sweep', `sweep must be one of ${ISOTHERM_SWEEPS.join(', ')}, got "${String(sweep)}"`);
  if (!Number.isInteger(points) || points < 3 || points > 400)
    throw invalid('points', `points must be a whole number from 3 to 400, got ${String(points)}`);
  const base = resolveConditions(conditions);
  const ctx = pairContext(elementA, elementB);
  const out: IsothermPoint[] = [];
  for (const value of sweepValues(sweep, points, base)) {
    const c = {
      ...base,
      xB: sweep === 'xB' ? value : base.xB,
      diameterNm: sweep === 'diameter' ? value : base.diameterNm,
      temperatureK: sweep === 'temperature' ? value : base.temperatureK,
    };
    const p = predictWithContext(ctx, c);
    out.push({
      x: value,
      xB: c.xB,
      diameterNm: c.diameterNm,
      temperatureK: c.temperatureK,
      surfaceXB: p.surfaceXB,
      coreXB: p.coreXB,
      enrichment: p.enrichment,
      surfaceElement: p.surfaceElement,
      architecture: p.architecture,
      atoms: p.atoms,
      surfaceSites: p.surfaceSites,
    });
  }
  return { pair: `${ctx.a.symbol}-${ctx.b.symbol}`, sweep, points: out };
}
