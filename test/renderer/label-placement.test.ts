import { describe, expect, it } from 'vitest';
import { boxesOverlap, placeLabels, type Box } from '../../renderer/src/charts/label-placement';

// Greedy point-label placement (Christensen, Marks & Shieber, ACM Trans. Graph. 14, 203 (1995)).
const bounds: Box = { left: 0, top: 0, width: 400, height: 300 };
const marker = (p: { x: number; y: number }, r = 4): Box => ({
  left: p.x - r,
  top: p.y - r,
  width: 2 * r,
  height: 2 * r,
});

describe('point labels that never overlap', () => {
  it('a lone point is labelled above itself, centred', () => {
    const [label] = placeLabels([{ x: 200, y: 150, text: 'Pt-Ni' }], { bounds });
    expect(label?.textX).toBeCloseTo(200, 9);
    expect(label!.box.top + label!.box.height).toBeLessThanOrEqual(150 - 4);
  });

  it('two points close together: the second label moves (below) instead of covering the first', () => {
    const points = [
      { x: 200, y: 150, text: 'Au-Pd' },
      { x: 204, y: 152, text: 'Ag-Pd' },
    ];
    const placed = placeLabels(points, { bounds });
    expect(placed).toHaveLength(2);
    expect(boxesOverlap(placed[0]!.box, placed[1]!.box)).toBe(false);
  });

  it('a dense cluster: no two labels overlap and no label covers any marker; the rest are left out', () => {
    const points = Array.from({ length: 60 }, (_, i) => ({
      x: 150 + (i % 10) * 9,
      y: 120 + Math.floor(i / 10) * 8,
      text: `P${i}-Q`,
    }));
    const placed = placeLabels(points, { bounds });
    expect(placed.length).toBeGreaterThan(0);
    expect(placed.length).toBeLessThan(points.length); // too dense to label everything
    for (let i = 0; i < placed.length; i++) {
      for (let j = i + 1; j < placed.length; j++) expect(boxesOverlap(placed[i]!.box, placed[j]!.box)).toBe(false);
      for (const p of points) expect(boxesOverlap(placed[i]!.box, marker(p))).toBe(false);
    }
  });

  it('labels stay inside the plot: a point at the top edge is labelled below, at the right edge to its left', () => {
    const [top] = placeLabels([{ x: 200, y: 2, text: 'Cu-Au' }], { bounds });
    expect(top!.box.top).toBeGreaterThan(2);
    const [right] = placeLabels([{ x: 398, y: 150, text: 'Ni-Ag' }], { bounds });
    expect(right!.box.left + right!.box.width).toBeLessThanOrEqual(400);
    expect(right!.textX).toBeLessThan(398);
  });

  it('keeps clear of unlabelled markers (obstacles), takes points in the order given and stops at maxLabels', () => {
    const obstacles = [{ x: 200, y: 135 }]; // right where the label above would go
    const [label] = placeLabels([{ x: 200, y: 150, text: 'Pt-Ru' }], { bounds, obstacles });
    expect(boxesOverlap(label!.box, marker(obstacles[0]!))).toBe(false);
    const many = [
      { x: 50, y: 50, text: 'A-B' },
      { x: 150, y: 150, text: 'C-D' },
      { x: 250, y: 250, text: 'E-F' },
    ];
    expect(placeLabels(many, { bounds, maxLabels: 2 }).map((p) => p.index)).toEqual([0, 1]);
  });

  it('a point with a larger marker (an outline round it) gets its label clear of the whole outline', () => {
    const [label] = placeLabels([{ x: 200, y: 150, text: 'Pd-Au', radius: 14 }], { bounds });
    expect(boxesOverlap(label!.box, marker({ x: 200, y: 150 }, 14))).toBe(false);
  });
});
