/** The alloy model: both elements fill the sphere; one start from the half-maximum width. */
import { modelSetup, startVector, type ModelStart, type StartValues } from './residual';

export function alloyStarts(start: StartValues): ModelStart[] {
  const setup = modelSetup('alloy', true, start);
  return [{ setup, p: startVector(setup, start) }];
}
