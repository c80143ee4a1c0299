/**
 * The colours of every chart, defined once. Rules the charts follow:
 * - a fitted line and the data it is fitted to share one colour (data as dots or pale bars, the fit as a
 *   solid line of the same hue), so the legend pairs them by colour as well as by words;
 * - the two metals of a pair keep their colours across views (A cool, B warm), as in the particle picture;
 * - architectures keep their colours across views (descriptor map, screens, outcome markers);
 * - reference lines (the overall composition, the run's condition, an equilibration point) are neutral grey, dashed.
 * Colours chosen for this project; the categorical set keeps neighbouring hues apart in lightness as well as hue.
 */

/** Categorical series colours, in the order charts use them. */
export const SERIES = ['#1d4ed8', '#c2410c', '#15803d', '#7c3aed', '#0e7490', '#a16207', '#be185d', '#4b5563'] as const;

/** Colour of the i-th series (wraps round). */
export function seriesColour(index: number): string {
  const n = SERIES.length;
  return SERIES[((index % n) + n) % n] as string;
}

/** Element A and element B of a pair. */
export const ELEMENT = { A: '#4f7cc0', B: '#c2410c' } as const;

/** Neutral colours: reference lines, grid, muted series. */
export const NEUTRAL = { reference: '#6b7280', grid: '#d1d5db', text: '#1f2937', empty: '#f3f4f6' } as const;

/** Architecture kinds (the labels of shared-model/architecture/labels.ts). */
export const ARCHITECTURE: Record<string, string> = {
  alloy: '#1d4ed8',
  'surface-enriched alloy': '#0e7490',
  'core@shell': '#c2410c',
  Janus: '#7c3aed',
  intermetallic: '#15803d',
  hollow: '#be185d',
  other: '#a16207',
  unknown: '#6b7280',
};

export function architectureColour(kind: string): string {
  return ARCHITECTURE[kind] ?? NEUTRAL.reference;
}

/** Agreement colours of a confusion matrix: agree (diagonal) and disagree, as r, g, b. */
export const AGREEMENT = { agree: [21, 128, 61], disagree: [185, 28, 28] } as const;

/** Data drawn under a fit: dot radius and fill opacity of points, fill opacity of histogram bars. */
export const DATA_STYLE = { dotRadius: 2.5, dotOpacity: 0.75, barOpacity: 0.35 } as const;

/** A fitted line over its data: solid, this wide; other (not chosen) fits thinner and dashed. */
export const FIT_STYLE = { width: 2.25, otherWidth: 1.25 } as const;

/** Dash patterns for telling several fits of one colour apart (the first, solid, is the chosen one). */
export const DASHES = ['', '7 3', '2 3', '10 3 2 3'] as const;

export function dashPattern(index: number): string {
  return DASHES[((index % DASHES.length) + DASHES.length) % DASHES.length] as string;
}

/** `colour` (#rrggbb) mixed with white: `share` of the colour (cell backgrounds that keep dark text readable). */
export function tint(colour: string, share = 0.25): string {
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(colour);
  if (!match) throw new RangeError(`not a #rrggbb colour: ${colour}`);
  const mix = (hex: string) =>
    Math.round(255 - share * (255 - parseInt(hex, 16)))
      .toString(16)
      .padStart(2, '0');
  return `#${mix(match[1]!)}${mix(match[2]!)}${mix(match[3]!)}`;
}

/** The light background of a cell that names an architecture (screens, tables). */
export function architectureTint(kind: string): string {
  return tint(architectureColour(kind));
}
