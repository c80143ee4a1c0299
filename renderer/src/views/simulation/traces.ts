/** Points of the energy and surface-composition traces, from live progress or from a finished result. */
import type { SimulationProgress, SimulationResult } from '../../../../shared-model/montecarlo/simulate';

export interface TracePoint {
  sweep: number;
  energyPerAtomEv: number;
  surfaceXB: number;
}

export function progressPoints(history: SimulationProgress[]): TracePoint[] {
  return history.map((p) => ({ sweep: p.sweep, energyPerAtomEv: p.energyPerAtomEv, surfaceXB: p.surfaceXB }));
}

/** The stored traces hold total energies; the chart shows energy per atom. Stops at the shortest trace. */
export function resultPoints(result: SimulationResult): TracePoint[] {
  const { sweep, energyEv, surfaceXB } = result.traces;
  const points: TracePoint[] = [];
  for (let k = 0; k < sweep.length; k++) {
    const at = sweep[k];
    const energy = energyEv[k];
    const surface = surfaceXB[k];
    if (at === undefined || energy === undefined || surface === undefined) break;
    points.push({ sweep: at, energyPerAtomEv: energy / result.atoms, surfaceXB: surface });
  }
  return points;
}
