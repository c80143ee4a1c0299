/**
 * Characteristic X-ray lines of the 30 metals and the overlaps that matter for EDX of a pair.
 * All energies are FROM MEMORY (the usual tabulated values, e.g. as printed in X-ray data booklets);
 * they are good to a few eV, which is far below the detector resolution the overlap test uses.
 *
 * Overlap test: two lines are not cleanly resolved when they lie closer than 1.5 × the detector's FWHM at
 * their energy (common practice). FWHM(E)² = noise² + 2.355²·F·ε·E for a silicon drift detector, with
 * FWHM = 129 eV at Mn Kα (5.899 keV), Fano factor F = 0.115 and ε = 3.76 eV per electron–hole pair
 * (typical detector specification and Si constants, from memory).
 */

export type XrayLineName = 'Kα' | 'Kβ' | 'Lα' | 'Lβ1' | 'Mα';

export interface XrayLine {
  element: string;
  line: XrayLineName;
  energyKev: number;
}

/** [Kα, Kβ, Lα, Lβ1, Mα] in keV, null where the line is not used for that element. From memory. */
const LINES: Record<string, [number | null, number | null, number | null, number | null, number | null]> = {
  Al: [1.487, 1.557, null, null, null],
  Ti: [4.511, 4.932, 0.452, null, null],
  V: [4.952, 5.427, 0.511, null, null],
  Cr: [5.415, 5.947, 0.573, null, null],
  Mn: [5.899, 6.49, 0.637, null, null],
  Fe: [6.404, 7.058, 0.705, null, null],
  Co: [6.93, 7.649, 0.776, null, null],
  Ni: [7.478, 8.265, 0.851, null, null],
  Cu: [8.048, 8.905, 0.93, null, null],
  Zn: [8.639, 9.572, 1.012, null, null],
  Zr: [15.775, 17.668, 2.042, 2.124, null],
  Nb: [16.615, 18.623, 2.166, 2.257, null],
  Mo: [17.479, 19.608, 2.293, 2.395, null],
  Ru: [19.279, 21.657, 2.558, 2.683, null],
  Rh: [20.216, 22.724, 2.696, 2.834, null],
  Pd: [21.177, 23.818, 2.838, 2.99, null],
  Ag: [22.163, 24.942, 2.984, 3.151, null],
  Cd: [23.174, 26.095, 3.133, 3.316, null],
  In: [24.21, 27.276, 3.287, 3.487, null],
  Sn: [25.271, 28.486, 3.444, 3.663, null],
  Hf: [null, null, 7.899, 9.023, 1.645],
  Ta: [null, null, 8.146, 9.343, 1.71],
  W: [null, null, 8.398, 9.672, 1.775],
  Re: [null, null, 8.652, 10.01, 1.843],
  Os: [null, null, 8.911, 10.355, 1.91],
  Ir: [null, null, 9.175, 10.708, 1.98],
  Pt: [null, null, 9.442, 11.071, 2.048],
  Au: [null, null, 9.713, 11.442, 2.123],
  Pb: [null, null, 10.551, 12.614, 2.342],
  Bi: [null, null, 10.839, 13.023, 2.423],
};

const LINE_NAMES: readonly XrayLineName[] = ['Kα', 'Kβ', 'Lα', 'Lβ1', 'Mα'];

export function xrayLines(element: string): XrayLine[] {
  const row = LINES[element];
  if (!row) return [];
  const lines: XrayLine[] = [];
  row.forEach((energy, i) => {
    if (energy !== null) lines.push({ element, line: LINE_NAMES[i] as XrayLineName, energyKev: energy });
  });
  return lines;
}

const FWHM_MN_KA_EV = 129;
const MN_KA_EV = 5899;
const FANO_TIMES_EPSILON_EV = 0.115 * 3.76;
const NOISE_SQUARED = FWHM_MN_KA_EV ** 2 - 2.355 ** 2 * FANO_TIMES_EPSILON_EV * MN_KA_EV;

/** Detector FWHM (eV) at an energy (keV) for the silicon drift detector described above. */
export function detectorFwhmEv(energyKev: number): number {
  return Math.sqrt(NOISE_SQUARED + 2.355 ** 2 * FANO_TIMES_EPSILON_EV * energyKev * 1000);
}

export const OVERLAP_FWHM_FACTOR = 1.5;

export interface LineOverlap {
  lineA: XrayLine;
  lineB: XrayLine;
  separationEv: number;
  fwhmEv: number;
}

export function lineOverlaps(elementA: string, elementB: string): LineOverlap[] {
  const overlaps: LineOverlap[] = [];
  for (const a of xrayLines(elementA)) {
    for (const b of xrayLines(elementB)) {
      const separationEv = Math.abs(a.energyKev - b.energyKev) * 1000;
      const fwhmEv = detectorFwhmEv((a.energyKev + b.energyKev) / 2);
      if (separationEv < OVERLAP_FWHM_FACTOR * fwhmEv) overlaps.push({ lineA: a, lineB: b, separationEv, fwhmEv });
    }
  }
  return overlaps;
}

/** Highest energy reached by K lines we suggest (needs a TEM at ≥ 120 kV; an SEM at 20–30 kV cannot excite them). */
const MAX_SUGGESTED_KEV = 25;

/**
 * The line to quantify each element with: the first of Kα (≤ 25 keV), Lα, Mα, Kβ, Lβ1 that is clear of every
 * line of the other element; null when none is.
 */
export function suggestedLine(element: string, other: string): XrayLine | null {
  const otherLines = xrayLines(other);
  const clear = (line: XrayLine) =>
    otherLines.every(
      (o) =>
        Math.abs(o.energyKev - line.energyKev) * 1000 >=
        OVERLAP_FWHM_FACTOR * detectorFwhmEv((o.energyKev + line.energyKev) / 2),
    );
  const lines = xrayLines(element);
  const order: XrayLineName[] = ['Kα', 'Lα', 'Mα', 'Kβ', 'Lβ1'];
  for (const name of order) {
    const line = lines.find((l) => l.line === name);
    if (!line || line.energyKev > MAX_SUGGESTED_KEV) continue;
    if (clear(line)) return line;
  }
  return null;
}
