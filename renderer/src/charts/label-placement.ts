/**
 * Point labels that never overlap: a greedy placement (common practice for scatter-plot labelling; see
 * Christensen, Marks & Shieber, ACM Trans. Graph. 14, 203 (1995) for the point-feature label placement
 * problem and the greedy baseline). Points are taken in the order given (most important first); each label
 * tries eight positions around its point (above, below, right, left, then the four corners) and takes the
 * first whose box stays inside the plot and overlaps neither a label already placed nor any point's marker.
 * A label with no free position is left out (the chart shows it on hover). Pure: pixels in, boxes out.
 */

export interface LabelCandidate {
  /** Point centre in pixels. */
  x: number;
  y: number;
  text: string;
  /** Half-size of this point's marker when it differs from `markerRadiusPx` (a point with an outline round it). */
  radius?: number;
}

export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

export interface PlacedLabel {
  /** Index of the point in the input. */
  index: number;
  text: string;
  box: Box;
  /** Where to draw the text: the box centre (textAnchor middle, dominantBaseline central). */
  textX: number;
  textY: number;
}

export interface PlacementOptions {
  /** The plot area: labels stay inside it. */
  bounds: Box;
  /** Average glyph width and line height of the label font, px. */
  charWidthPx?: number;
  lineHeightPx?: number;
  /** Half the marker size: a label keeps clear of every marker's square of this half-width. */
  markerRadiusPx?: number;
  /** Space between a marker and its label, px. */
  gapPx?: number;
  /** Other markers the labels must not cover (points that carry no label). */
  obstacles?: Array<{ x: number; y: number; radius?: number }>;
  /** At most this many labels. */
  maxLabels?: number;
}

export function boxesOverlap(a: Box, b: Box): boolean {
  return a.left < b.left + b.width && b.left < a.left + a.width && a.top < b.top + b.height && b.top < a.top + a.height;
}

function inside(box: Box, bounds: Box): boolean {
  return (
    box.left >= bounds.left &&
    box.top >= bounds.top &&
    box.left + box.width <= bounds.left + bounds.width &&
    box.top + box.height <= bounds.top + bounds.height
  );
}

/** The eight candidate boxes of a label of size w × h around a point, in the order they are tried. */
export function candidateBoxes(x: number, y: number, w: number, h: number, clearance: number): Box[] {
  const c = clearance;
  return [
    { left: x - w / 2, top: y - c - h, width: w, height: h }, // above
    { left: x - w / 2, top: y + c, width: w, height: h }, // below
    { left: x + c, top: y - h / 2, width: w, height: h }, // right
    { left: x - c - w, top: y - h / 2, width: w, height: h }, // left
    { left: x + c * 0.7, top: y - c * 0.7 - h, width: w, height: h }, // above right
    { left: x - c * 0.7 - w, top: y - c * 0.7 - h, width: w, height: h }, // above left
    { left: x + c * 0.7, top: y + c * 0.7, width: w, height: h }, // below right
    { left: x - c * 0.7 - w, top: y + c * 0.7, width: w, height: h }, // below left
  ];
}

export function placeLabels(points: LabelCandidate[], options: PlacementOptions): PlacedLabel[] {
  const charWidth = options.charWidthPx ?? 6.2;
  const lineHeight = options.lineHeightPx ?? 13;
  const r = options.markerRadiusPx ?? 4;
  const gap = options.gapPx ?? 2;
  const max = options.maxLabels ?? Number.POSITIVE_INFINITY;
  const markers: Box[] = [...points, ...(options.obstacles ?? [])]
    .filter((p) => Number.isFinite(p.x) && Number.isFinite(p.y))
    .map((p) => {
      const half = p.radius ?? r;
      return { left: p.x - half, top: p.y - half, width: 2 * half, height: 2 * half };
    });
  const placed: PlacedLabel[] = [];
  points.forEach((point, index) => {
    if (placed.length >= max || !Number.isFinite(point.x) || !Number.isFinite(point.y) || point.text === '') return;
    const w = point.text.length * charWidth;
    for (const box of candidateBoxes(point.x, point.y, w, lineHeight, (point.radius ?? r) + gap)) {
      if (!inside(box, options.bounds)) continue;
      if (placed.some((p) => boxesOverlap(p.box, box))) continue;
      if (markers.some((m) => boxesOverlap(m, box))) continue;
      placed.push({ index, text: point.text, box, textX: box.left + w / 2, textY: box.top + lineHeight / 2 });
      return;
    }
  });
  return placed;
}
