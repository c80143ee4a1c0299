/**
 * EDX line-scan geometry (DOMAIN.md Models 9). A spherical particle of radius R, centred at position x0 on
 * the scan line; the electron beam runs perpendicular to the scan and the scan passes through the centre
 * (a scan that misses the centre by b sees an apparent radius √(R² − b²)). Each element's X-ray signal at
 * position x is proportional to the length of the beam's path (the chord) through that element's region:
 *
 *   alloy     both elements fill the sphere: chord 2√(R² − u²), u = x − x0;
 *   A@B       A fills the concentric core of radius rc, B the shell: A ∝ core chord, B ∝ sphere − core chord;
 *   B@A       the same with the roles swapped;
 *   Janus     two hemispheres split by the plane through the centre that contains the beam direction and is
 *             perpendicular to the scan direction: every beam path lies wholly in one hemisphere, so A ∝ the
 *             sphere chord for u < 0 and B for u > 0 ("A on the low-position side"), or mirrored. A tilted
 *             interface gives profiles between this and the alloy's; this orientation is the clearest case.
 *
 * The probe is a Gaussian of standard deviation σ; the recorded profile is the chord profile convolved with
 * it, done numerically on a uniform grid of cells: the exact integral of the chord over each cell (from the
 * closed-form antiderivative, the area of a circular segment) times the Gaussian's mass over that cell.
 */
import { erfc } from './distributions';

/** The probe kernel is cut at ±4.5σ (mass outside: 7e-6) and renormalised. */
export const KERNEL_HALF_WIDTH_SIGMAS = 4.5;

/** Chord length 2√(r² − u²) through a sphere of radius r at distance u from its centre (0 outside). */
export function sphereChordNm(uNm: number, radiusNm: number): number {
  const s = radiusNm * radiusNm - uNm * uNm;
  return s > 0 ? 2 * Math.sqrt(s) : 0;
}

/**
 * ∫ from −r to u of the chord 2√(r² − t²) dt = u√(r² − u²) + r²·asin(u/r) + πr²/2, clamped to [0, πr²]:
 * the area of the part of the sphere's central cross-section left of u.
 */
export function chordAntiderivative(uNm: number, radiusNm: number): number {
  if (radiusNm <= 0 || uNm <= -radiusNm) return 0;
  const r2 = radiusNm * radiusNm;
  if (uNm >= radiusNm) return Math.PI * r2;
  return uNm * Math.sqrt(r2 - uNm * uNm) + r2 * Math.asin(uNm / radiusNm) + (Math.PI * r2) / 2;
}

export type LineScanModelKind = 'alloy' | 'A@B' | 'B@A' | 'Janus';
export const LINE_SCAN_MODELS: readonly LineScanModelKind[] = ['alloy', 'A@B', 'B@A', 'Janus'];

export interface ProfileGeometry {
  kind: LineScanModelKind;
  centerNm: number;
  radiusNm: number;
  /** Core radius for core@shell models (ignored otherwise). */
  coreRadiusNm: number;
  /** Janus only: true when A occupies the low-position hemisphere. */
  janusALow: boolean;
}

/** Unblurred chord through A's and B's regions at one position (used by tests and for drawing the geometry). */
export function regionChordsNm(geometry: ProfileGeometry, positionNm: number): { a: number; b: number } {
  const u = positionNm - geometry.centerNm;
  const whole = sphereChordNm(u, geometry.radiusNm);
  switch (geometry.kind) {
    case 'alloy':
      return { a: whole, b: whole };
    case 'A@B': {
      const core = sphereChordNm(u, geometry.coreRadiusNm);
      return { a: core, b: whole - core };
    }
    case 'B@A': {
      const core = sphereChordNm(u, geometry.coreRadiusNm);
      return { a: whole - core, b: core };
    }
    case 'Janus': {
      const low = u < 0 ? whole : 0;
      return geometry.janusALow ? { a: low, b: whole - low } : { a: whole - low, b: low };
    }
  }
}

/**
 * Evaluates blurred region-chord profiles at fixed scan positions. Built once per fit (the grid does not
 * move with the parameters, so the fitted objective is smooth); buffers are reused across evaluations.
 */
export class BlurredChordGrid {
  readonly cellNm: number;
  readonly startNm: number;
  readonly cellCount: number;
  private readonly cellIndex: Int32Array;
  private readonly cellFraction: Float64Array;
  private readonly antiderivative: Float64Array;
  private readonly meanA: Float64Array;
  private readonly meanB: Float64Array;
  private readonly kernel: Float64Array;
  private kernelHalfWidth = 0;
  private occupiedLo = 0;
  private occupiedHi = -1;

  /**
   * @param positionsNm scan positions (increasing)
   * @param cellNm grid cell width; data points fall on cell centres when the scan step is a multiple of it
   * @param padNm extra grid length beyond the first and last position (≥ the largest radius tried)
   * @param maxSigmaNm largest probe σ that will be asked for (sizes the kernel buffer)
   */
  constructor(
    readonly positionsNm: Float64Array,
    cellNm: number,
    padNm: number,
    maxSigmaNm: number,
  ) {
    const n = positionsNm.length;
    const first = positionsNm[0] as number;
    const last = positionsNm[n - 1] as number;
    const padCells = Math.ceil(padNm / cellNm) + 1;
    this.cellNm = cellNm;
    this.startNm = first - cellNm / 2 - padCells * cellNm;
    this.cellCount = Math.ceil((last - first) / cellNm) + 1 + 2 * padCells;
    this.cellIndex = new Int32Array(n);
    this.cellFraction = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const position = ((positionsNm[i] as number) - this.startNm) / cellNm - 0.5;
      let index = Math.floor(position + 1e-9);
      let fraction = position - index;
      if (fraction < 1e-9) fraction = 0;
      if (index >= this.cellCount - 1) {
        index = this.cellCount - 2;
        fraction = 1;
      }
      this.cellIndex[i] = index;
      this.cellFraction[i] = fraction;
    }
    this.antiderivative = new Float64Array(this.cellCount + 1);
    this.meanA = new Float64Array(this.cellCount);
    this.meanB = new Float64Array(this.cellCount);
    this.kernel = new Float64Array(2 * Math.ceil((KERNEL_HALF_WIDTH_SIGMAS * maxSigmaNm) / cellNm) + 3);
  }

  /** Fills cell means of the region chords of A and B for a geometry. */
  private fillMeans(g: ProfileGeometry): void {
    const h = this.cellNm;
    if (this.occupiedHi >= this.occupiedLo) {
      this.meanA.fill(0, this.occupiedLo, this.occupiedHi + 1);
      this.meanB.fill(0, this.occupiedLo, this.occupiedHi + 1);
    }
    const lo = Math.max(0, Math.floor((g.centerNm - g.radiusNm - this.startNm) / h));
    const hi = Math.min(this.cellCount - 1, Math.floor((g.centerNm + g.radiusNm - this.startNm) / h));
    this.occupiedLo = lo;
    this.occupiedHi = hi;
    if (hi < lo) return;
    const F = this.antiderivative;
    const cellAverage = (radius: number, halfSpaceLow: boolean, target: Float64Array, sign: number) => {
      for (let j = lo; j <= hi + 1; j++) {
        let u = this.startNm + j * h - g.centerNm;
        if (halfSpaceLow && u > 0) u = 0;
        F[j] = chordAntiderivative(u, radius);
      }
      for (let j = lo; j <= hi; j++)
        target[j] = (target[j] as number) + (sign * ((F[j + 1] as number) - (F[j] as number))) / h;
    };
    switch (g.kind) {
      case 'alloy':
        cellAverage(g.radiusNm, false, this.meanA, 1);
        this.meanB.set(this.meanA);
        return;
      case 'A@B':
        cellAverage(g.coreRadiusNm, false, this.meanA, 1);
        cellAverage(g.radiusNm, false, this.meanB, 1);
        cellAverage(g.coreRadiusNm, false, this.meanB, -1);
        return;
      case 'B@A':
        cellAverage(g.coreRadiusNm, false, this.meanB, 1);
        cellAverage(g.radiusNm, false, this.meanA, 1);
        cellAverage(g.coreRadiusNm, false, this.meanA, -1);
        return;
      case 'Janus': {
        const low = g.janusALow ? this.meanA : this.meanB;
        const high = g.janusALow ? this.meanB : this.meanA;
        cellAverage(g.radiusNm, true, low, 1);
        cellAverage(g.radiusNm, false, high, 1);
        cellAverage(g.radiusNm, true, high, -1);
        return;
      }
    }
  }

  private fillKernel(sigmaNm: number): void {
    const h = this.cellNm;
    if (sigmaNm < h / 20) {
      this.kernelHalfWidth = 0;
      this.kernel[0] = 1;
      return;
    }
    const m = Math.min(Math.ceil((KERNEL_HALF_WIDTH_SIGMAS * sigmaNm) / h), (this.kernel.length - 1) / 2);
    this.kernelHalfWidth = m;
    const scale = h / (sigmaNm * Math.SQRT2);
    let total = 0;
    for (let k = -m; k <= m; k++) {
      // Gaussian mass over the cell offset k: ½[erf((k+½)h/(σ√2)) − erf((k−½)h/(σ√2))]
      const mass = 0.5 * (erfc((k - 0.5) * scale) - erfc((k + 0.5) * scale));
      this.kernel[k + m] = mass;
      total += mass;
    }
    for (let k = 0; k <= 2 * m; k++) this.kernel[k] = (this.kernel[k] as number) / total;
  }

  private blurredCell(means: Float64Array, j: number): number {
    const m = this.kernelHalfWidth;
    let sum = 0;
    // Only cells inside the particle [occupiedLo, occupiedHi] are non-zero.
    const kLo = Math.max(-m, j - this.occupiedHi);
    const kHi = Math.min(m, j - this.occupiedLo);
    for (let k = kLo; k <= kHi; k++) sum += (this.kernel[k + m] as number) * (means[j - k] as number);
    return sum;
  }

  /** Blurred region-chord profiles of A and B at the scan positions, written into outA / outB (nm of path). */
  evaluate(g: ProfileGeometry, sigmaNm: number, outA: Float64Array, outB: Float64Array): void {
    this.fillMeans(g);
    this.fillKernel(sigmaNm);
    const n = this.positionsNm.length;
    for (let i = 0; i < n; i++) {
      const j = this.cellIndex[i] as number;
      const w = this.cellFraction[i] as number;
      let a = this.blurredCell(this.meanA, j);
      let b = this.blurredCell(this.meanB, j);
      if (w > 0) {
        a = (1 - w) * a + w * this.blurredCell(this.meanA, j + 1);
        b = (1 - w) * b + w * this.blurredCell(this.meanB, j + 1);
      }
      outA[i] = a;
      outB[i] = b;
    }
  }
}
