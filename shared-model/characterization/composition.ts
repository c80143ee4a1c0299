/**
 * Composition of a made batch: the feed (nominal) composition, bulk analysis (ICP-OES / ICP-MS) and EDX
 * (whole particle or area) kept as separate values, because they differ in practice. A measurement is
 * flagged when it differs from the nominal composition by more than its stated uncertainty, and EDX is
 * compared with a bulk analysis by the combined uncertainty √(u₁² + u₂²).
 * Practical warnings: a TEM grid made of one of the pair's metals, and X-ray line overlaps (xray-lines.ts).
 */
import { invalid } from '../api/result';
import { detectorFwhmEv, lineOverlaps, suggestedLine, type XrayLine } from './xray-lines';

export const COMPOSITION_METHODS = ['ICP-OES', 'ICP-MS', 'EDX particle', 'EDX area', 'XPS', 'other'] as const;
export type CompositionMethod = (typeof COMPOSITION_METHODS)[number];

export interface CompositionMeasurement {
  method: CompositionMethod;
  /** Atomic fraction of B, 0–1. */
  xB: number;
  /** Stated standard uncertainty of xB (absolute, fraction), or null when none was stated. */
  uncertaintyXB: number | null;
  /** X-ray lines used, e.g. "Pt L, Au L" (EDX only). */
  lines?: string;
}

export interface CompositionInput {
  elementA: string;
  elementB: string;
  /** Feed composition (atomic fraction of B in the precursors), or null when not known. */
  nominalXB: number | null;
  measurements: CompositionMeasurement[];
  /** Metal of the TEM grid, e.g. "Cu"; null when not recorded. */
  gridMetal?: string | null;
}

export interface CompositionRow extends CompositionMeasurement {
  /** xB − nominal xB, or null without a nominal value. */
  deviationFromNominal: number | null;
  /** true: beyond the stated uncertainty; false: within; null: cannot tell (no nominal or no uncertainty). */
  flagged: boolean | null;
  comment: string;
}

export interface CompositionWarning {
  code: 'grid-metal' | 'grid-unknown' | 'line-overlap' | 'edx-vs-bulk';
  message: string;
  /** True when the warning rests on values recalled rather than read from a source. */
  fromMemory: boolean;
}

export interface CompositionComparison {
  elementA: string;
  elementB: string;
  nominalXB: number | null;
  rows: CompositionRow[];
  warnings: CompositionWarning[];
  suggestedLines: { elementA: XrayLine | null; elementB: XrayLine | null };
}

/** Grid metals sold for TEM (from memory), for suggesting an alternative. */
export const GRID_METALS = ['Cu', 'Ni', 'Au', 'Mo', 'Ti', 'Al'] as const;

function checkFraction(field: string, value: number): void {
  if (!(Number.isFinite(value) && value >= 0 && value <= 1))
    throw invalid(field, `${field} must be an atomic fraction between 0 and 1, got ${value}`);
}

/** Fractions typed as at.% (48 → 0.48) carry binary rounding; a deviation equal to the uncertainty is not beyond it. */
const ROUNDING_SLACK = 1e-9;

const pct = (x: number) => `${(x * 100).toFixed(1)} at.%`;

export function compareComposition(input: CompositionInput): CompositionComparison {
  const { elementA, elementB } = input;
  if (input.nominalXB !== null) checkFraction('nominalXB', input.nominalXB);
  const rows: CompositionRow[] = input.measurements.map((m, i) => {
    checkFraction(`measurements.${i}.xB`, m.xB);
    if (
      m.uncertaintyXB !== null &&
      !(Number.isFinite(m.uncertaintyXB) && m.uncertaintyXB >= 0 && m.uncertaintyXB <= 1)
    ) {
      throw invalid(
        `measurements.${i}.uncertaintyXB`,
        `uncertainty must be a fraction between 0 and 1 (0.02 = 2 at.%), got ${m.uncertaintyXB}`,
      );
    }
    const deviation = input.nominalXB === null ? null : m.xB - input.nominalXB;
    let flagged: boolean | null = null;
    let comment: string;
    if (deviation === null) comment = 'no nominal composition to compare with';
    else if (m.uncertaintyXB === null)
      comment = `differs from nominal by ${pct(deviation)}; no uncertainty stated, so it cannot be judged`;
    else {
      flagged = Math.abs(deviation) > m.uncertaintyXB + ROUNDING_SLACK;
      comment = flagged
        ? `${elementB} ${deviation > 0 ? 'above' : 'below'} nominal by ${pct(Math.abs(deviation))}, beyond the stated ±${pct(m.uncertaintyXB)}`
        : `within ±${pct(m.uncertaintyXB)} of nominal`;
    }
    return { ...m, deviationFromNominal: deviation, flagged, comment };
  });

  const warnings: CompositionWarning[] = [];
  const grid = input.gridMetal ?? null;
  if (grid !== null && (grid === elementA || grid === elementB)) {
    const alternatives = GRID_METALS.filter((g) => g !== elementA && g !== elementB)
      .slice(0, 3)
      .join(', ');
    warnings.push({
      code: 'grid-metal',
      message: `the TEM grid is ${grid}, one of the pair's metals: the grid adds ${grid} X-rays (stray scattering and fluorescence) to every spectrum, so EDX overstates ${grid}; use a ${alternatives} grid`,
      fromMemory: false,
    });
  } else if (grid === null && (elementA === 'Cu' || elementB === 'Cu' || elementA === 'Ni' || elementB === 'Ni')) {
    const metal = elementA === 'Cu' || elementB === 'Cu' ? 'Cu' : 'Ni';
    warnings.push({
      code: 'grid-unknown',
      message: `grid metal not recorded: most TEM grids are copper${metal === 'Ni' ? ' and nickel grids are common' : ''}; if the grid is ${metal}, its X-rays add to the ${metal} signal`,
      fromMemory: false,
    });
  }
  for (const o of lineOverlaps(elementA, elementB)) {
    warnings.push({
      code: 'line-overlap',
      message: `${o.lineA.element} ${o.lineA.line} (${o.lineA.energyKev.toFixed(3)} keV) and ${o.lineB.element} ${o.lineB.line} (${o.lineB.energyKev.toFixed(3)} keV) are ${o.separationEv.toFixed(0)} eV apart, within 1.5 × the detector resolution there (~${detectorFwhmEv(o.lineA.energyKev).toFixed(0)} eV FWHM): choose other lines or deconvolve the overlap`,
      fromMemory: true,
    });
  }
  const bulk = rows.filter((r) => r.method === 'ICP-OES' || r.method === 'ICP-MS');
  const edx = rows.filter((r) => r.method === 'EDX particle' || r.method === 'EDX area');
  for (const e of edx) {
    for (const b of bulk) {
      if (e.uncertaintyXB === null || b.uncertaintyXB === null) continue;
      const combined = Math.hypot(e.uncertaintyXB, b.uncertaintyXB);
      const difference = e.xB - b.xB;
      if (Math.abs(difference) > combined + ROUNDING_SLACK) {
        warnings.push({
          code: 'edx-vs-bulk',
          message: `${e.method} (${pct(e.xB)} ${elementB}) and ${b.method} (${pct(b.xB)}) differ by ${pct(Math.abs(difference))}, beyond their combined uncertainty ±${pct(combined)}: check line choice, grid signal, or whether the analysed particles represent the batch`,
          fromMemory: false,
        });
      }
    }
  }
  return {
    elementA,
    elementB,
    nominalXB: input.nominalXB,
    rows,
    warnings,
    suggestedLines: { elementA: suggestedLine(elementA, elementB), elementB: suggestedLine(elementB, elementA) },
  };
}
