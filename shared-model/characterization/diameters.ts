import { invalid } from '../api/result';

/** Checks a list of particle diameters: finite, positive, at least three. Throws naming the first bad value. */
export function checkDiameters(diametersNm: readonly number[], field = 'diametersNm'): void {
  if (!Array.isArray(diametersNm)) throw invalid(field, 'diameters must be a list of numbers (nm)');
  for (let i = 0; i < diametersNm.length; i++) {
    const d = diametersNm[i] as number;
    if (typeof d !== 'number' || !Number.isFinite(d))
      throw invalid(field, `diameter #${i + 1} is not a number (${String(d)})`);
    if (d <= 0) throw invalid(field, `diameter #${i + 1} is ${d} nm; diameters must be positive`);
  }
  if (diametersNm.length < 3) {
    throw invalid(field, `need at least 3 particle diameters for statistics, got ${diametersNm.length}`);
  }
}
