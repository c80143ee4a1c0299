/**
 * The core@shell models (A@B, B@A): a start from the core channel's half-maximum width and, when that is far from
 * one half, a second start at 0.5; core radius fR and shell R(1 − f) with their uncertainties by the delta method.
 */
import { monolayerThicknessNm } from '../../geometry/fcc';
import { modelSetup, startVector, type ModelSetup, type ModelStart, type StartValues } from './residual';
import type { Estimate, LineScanFitOptions } from './types';

export function coreShellStarts(kind: 'A@B' | 'B@A', start: StartValues): ModelStart[] {
  const setup = modelSetup(kind, true, start);
  const f0 = kind === 'A@B' ? start.fA : start.fB;
  const starts = [{ setup, p: startVector(setup, start, f0) }];
  if (Math.abs(f0 - 0.5) > 0.12) starts.push({ setup, p: startVector(setup, start, 0.5) });
  return starts;
}

export interface CoreShellEstimates {
  coreRadiusNm: Estimate | null;
  shellThicknessNm: Estimate | null;
  shellMonolayers: Estimate | null;
}

/** Nulls for the models without a core. */
export function coreShellEstimates(
  setup: ModelSetup,
  f: number,
  R: number,
  covOf: (p: string, q: string) => number | null,
  options: Pick<LineScanFitOptions, 'latticeANm' | 'latticeBNm'>,
): CoreShellEstimates {
  let coreRadiusNm: Estimate | null = null;
  let shellThicknessNm: Estimate | null = null;
  let shellMonolayers: Estimate | null = null;
  if (setup.hasCore) {
    const vR = covOf('radius', 'radius');
    const vf = covOf('core fraction', 'core fraction');
    const cRf = covOf('radius', 'core fraction');
    const ok = vR !== null && vf !== null && cRf !== null;
    const varCore = ok ? f * f * vR + R * R * vf + 2 * f * R * cRf : null;
    const varShell = ok ? (1 - f) ** 2 * vR + R * R * vf - 2 * R * (1 - f) * cRf : null;
    coreRadiusNm = { value: f * R, sd: varCore !== null && varCore >= 0 ? Math.sqrt(varCore) : null };
    shellThicknessNm = { value: (1 - f) * R, sd: varShell !== null && varShell >= 0 ? Math.sqrt(varShell) : null };
    const shellLattice = setup.kind === 'A@B' ? options.latticeBNm : options.latticeANm;
    if (shellLattice !== undefined && shellLattice !== null) {
      const ml = monolayerThicknessNm(shellLattice);
      shellMonolayers = {
        value: shellThicknessNm.value / ml,
        sd: shellThicknessNm.sd === null ? null : shellThicknessNm.sd / ml,
      };
    }
  }
  return { coreRadiusNm, shellThicknessNm, shellMonolayers };
}
