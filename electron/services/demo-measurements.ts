/**
 * INVENTED measurements for the demo campaign, generated (never measured) from Pairwright's own models with
 * a seeded generator, so the demo is the same on every machine and every load:
 *
 *   - TEM diameters drawn from a log-normal distribution (median, σ of ln d), written as the CSV an
 *     image-analysis tool would export, so they go through the same import as a user's file;
 *   - an EDX line scan from the line-scan forward model (chord-profile.ts: chords through a sphere's regions,
 *     blurred by a Gaussian probe), in integer counts with Poisson counting noise, written as CSV.
 *
 * Nothing here is a measurement; every caller labels the result as demo data.
 */
import { BlurredChordGrid, type LineScanModelKind } from '../../shared-model/characterization/chord-profile';
import { createRandom, type SeededRandom } from '../../shared-model/random';

export interface DemoSizeSpec {
  seed: number;
  /** Median diameter (nm): exp(μ) of the log-normal. */
  medianNm: number;
  /** Standard deviation of ln d (the log-normal σ). */
  sigmaLog: number;
  count: number;
}

/** "diameter (nm)" CSV of `count` diameters from a seeded log-normal, two decimals (0.01 nm). */
export function demoDiameterCsv(spec: DemoSizeSpec): string {
  const random = createRandom(spec.seed);
  const mu = Math.log(spec.medianNm);
  const lines = ['diameter (nm)'];
  for (let i = 0; i < spec.count; i++) lines.push(Math.exp(mu + spec.sigmaLog * random.nextNormal()).toFixed(2));
  return `${lines.join('\n')}\n`;
}

/**
 * A Poisson deviate of the given mean: Knuth's product of uniforms below 30, else the normal approximation
 * (mean + √mean · z, rounded, never negative) — the counting noise of an X-ray channel (common practice).
 */
export function poissonCount(random: SeededRandom, mean: number): number {
  if (!(mean > 0)) return 0;
  if (mean < 30) {
    const limit = Math.exp(-mean);
    let product = random.next();
    let count = 0;
    while (product > limit) {
      count++;
      product *= random.next();
    }
    return count;
  }
  return Math.max(0, Math.round(mean + Math.sqrt(mean) * random.nextNormal()));
}

export interface DemoLineScanSpec {
  seed: number;
  elementA: string;
  elementB: string;
  kind: LineScanModelKind;
  centerNm: number;
  radiusNm: number;
  /** Core radius for the core@shell kinds (ignored otherwise). */
  coreRadiusNm: number;
  probeSigmaNm: number;
  /** Scan from `startNm` to `endNm` in steps of `stepNm`. */
  startNm: number;
  endNm: number;
  stepNm: number;
  /** Expected counts per nm of beam path through each element's region, and the background counts. */
  countsPerNmA: number;
  countsPerNmB: number;
  backgroundA: number;
  backgroundB: number;
}

/** "position (nm),A,B" CSV of a line scan from the forward model with seeded Poisson noise. */
export function demoLineScanCsv(spec: DemoLineScanSpec): string {
  const steps = Math.round((spec.endNm - spec.startNm) / spec.stepNm);
  const positions = new Float64Array(steps + 1);
  for (let i = 0; i <= steps; i++) positions[i] = Number((spec.startNm + i * spec.stepNm).toFixed(6));
  // Grid cells a fifth of the step: the points sit on cell centres (chord-profile.ts).
  const grid = new BlurredChordGrid(positions, spec.stepNm / 5, spec.radiusNm + 1, spec.probeSigmaNm);
  const chordA = new Float64Array(positions.length);
  const chordB = new Float64Array(positions.length);
  grid.evaluate(
    {
      kind: spec.kind,
      centerNm: spec.centerNm,
      radiusNm: spec.radiusNm,
      coreRadiusNm: spec.coreRadiusNm,
      janusALow: true,
    },
    spec.probeSigmaNm,
    chordA,
    chordB,
  );
  const random = createRandom(spec.seed);
  const lines = [`position (nm),${spec.elementA},${spec.elementB}`];
  for (let i = 0; i < positions.length; i++) {
    const a = poissonCount(random, spec.countsPerNmA * (chordA[i] as number) + spec.backgroundA);
    const b = poissonCount(random, spec.countsPerNmB * (chordB[i] as number) + spec.backgroundB);
    lines.push(`${positions[i]},${a},${b}`);
  }
  return `${lines.join('\n')}\n`;
}
