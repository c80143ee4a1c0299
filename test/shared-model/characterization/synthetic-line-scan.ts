/**
 * Synthetic EDX line scans for tests, computed independently of the model's grid code: the Gaussian probe
 * blur of the analytic chord profile is integrated by composite Simpson quadrature on a fine local mesh.
 */
import { createRandom } from '../../../shared-model/random';
import {
  regionChordsNm,
  type LineScanModelKind,
  type ProfileGeometry,
} from '../../../shared-model/characterization/chord-profile';
import type { LineScanData } from '../../../shared-model/characterization/csv-import';

export interface SyntheticScanSpec {
  kind: LineScanModelKind;
  centerNm: number;
  radiusNm: number;
  coreRadiusNm: number;
  janusALow?: boolean;
  probeSigmaNm: number;
  amplitudeA: number;
  amplitudeB: number;
  backgroundA: number;
  backgroundB: number;
  positionsNm: number[];
}

/** Blurred region chords at each position by Simpson quadrature over ±6σ (2000 panels). */
export function exactBlurredProfiles(spec: SyntheticScanSpec): { a: number[]; b: number[] } {
  const geometry: ProfileGeometry = {
    kind: spec.kind,
    centerNm: spec.centerNm,
    radiusNm: spec.radiusNm,
    coreRadiusNm: spec.coreRadiusNm,
    janusALow: spec.janusALow ?? true,
  };
  const a: number[] = [];
  const b: number[] = [];
  const s = spec.probeSigmaNm;
  const panels = 2000;
  for (const x of spec.positionsNm) {
    const lo = x - 6 * s;
    const h = (12 * s) / panels;
    let sa = 0;
    let sb = 0;
    for (let i = 0; i <= panels; i++) {
      const t = lo + i * h;
      const weight = i === 0 || i === panels ? 1 : i % 2 === 1 ? 4 : 2;
      const g = Math.exp(-0.5 * ((x - t) / s) ** 2) / (s * Math.sqrt(2 * Math.PI));
      const c = regionChordsNm(geometry, t);
      sa += weight * g * c.a;
      sb += weight * g * c.b;
    }
    a.push((sa * h) / 3);
    b.push((sb * h) / 3);
  }
  return { a, b };
}

/** Scan with Gaussian noise of SD = (peak net signal of each channel) / snr. */
export function syntheticScan(spec: SyntheticScanSpec, snr: number, seed: number): LineScanData {
  const rng = createRandom(seed);
  const { a, b } = exactBlurredProfiles(spec);
  const peakA = spec.amplitudeA * Math.max(...a);
  const peakB = spec.amplitudeB * Math.max(...b);
  return {
    positionsNm: [...spec.positionsNm],
    signalA: a.map((v) => spec.amplitudeA * v + spec.backgroundA + (peakA / snr) * rng.nextNormal()),
    signalB: b.map((v) => spec.amplitudeB * v + spec.backgroundB + (peakB / snr) * rng.nextNormal()),
    unit: 'counts',
  };
}

export function positions(fromNm: number, toNm: number, stepNm: number): number[] {
  const out: number[] = [];
  for (let x = fromNm; x <= toNm + 1e-9; x += stepNm) out.push(Number(x.toFixed(6)));
  return out;
}
