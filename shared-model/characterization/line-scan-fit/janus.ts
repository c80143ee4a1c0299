/** The Janus model: two hemispheres; both orientations (A on the low-position side, then on the high one). */
import { modelSetup, startVector, type ModelStart, type StartValues } from './residual';

export function janusStarts(start: StartValues): ModelStart[] {
  return [true, false].map((janusALow) => {
    const setup = modelSetup('Janus', janusALow, start);
    return { setup, p: startVector(setup, start) };
  });
}
