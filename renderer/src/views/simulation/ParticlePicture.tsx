/**
 * A picture of a simulated particle: a central cross-section (the atoms of the slab through the centre)
 * and the outer surface seen from +z (surface atoms of the near half, drawn back to front), atoms as
 * discs coloured by element, with a legend. Geometry is rebuilt from the run's inputs (deterministic).
 */
import { useMemo } from 'react';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../../shared-model/clusters/neighbours';
import { surfaceSites } from '../../../../shared-model/montecarlo/analysis';
import { rebuildGeometry, type SimulationSpec } from '../../../../shared-model/montecarlo/simulate';

export const ELEMENT_COLOURS = { A: '#9aa5b1', B: '#c2410c' } as const;

/** Surface picture only up to this size (the neighbour list is built in the page). */
const MAX_SURFACE_ATOMS = 20_000;

interface Disc {
  x: number;
  y: number;
  r: number;
  species: 'A' | 'B';
  shade: number;
}

function Discs(props: { discs: Disc[]; extent: number; label: string; testId: string; elementA: string; elementB: string }) {
  const { discs, extent } = props;
  const size = 2 * extent;
  return (
    <figure style={{ margin: 0 }} data-testid={props.testId}>
      <svg viewBox={`${-extent} ${-extent} ${size} ${size}`} width="100%" style={{ maxWidth: 320, aspectRatio: '1 / 1', background: '#fbfaf6', border: '1px solid var(--line)', borderRadius: 6 }} role="img" aria-label={props.label}>
        {discs.map((d, k) => (
          <circle
            key={k}
            cx={d.x}
            cy={-d.y}
            r={d.r}
            fill={d.species === 'A' ? ELEMENT_COLOURS.A : ELEMENT_COLOURS.B}
            fillOpacity={d.shade}
            stroke="#1d2d3a"
            strokeOpacity={0.35}
            strokeWidth={extent / 300}
            data-species={d.species === 'A' ? props.elementA : props.elementB}
          />
        ))}
      </svg>
      <figcaption className="small muted">{props.label}</figcaption>
    </figure>
  );
}

export function ParticlePicture(props: { spec: SimulationSpec; occupation: string; elementA: string; elementB: string }) {
  const { spec, occupation, elementA, elementB } = props;
  const picture = useMemo(() => {
    const geometry = rebuildGeometry(spec);
    const p = geometry.positions;
    const nn = geometry.nearestNeighbourAngstrom;
    const n = geometry.atoms;
    let extent = 0;
    for (let i = 0; i < n; i++) extent = Math.max(extent, Math.hypot(p[3 * i]!, p[3 * i + 1]!, p[3 * i + 2]!));
    extent += nn;
    // Central slab: atoms within ±0.35 nn of the plane z = 0 (for fcc shapes, one (001) layer).
    const section: Disc[] = [];
    for (let i = 0; i < n; i++) {
      if (Math.abs(p[3 * i + 2]!) <= 0.35 * nn) section.push({ x: p[3 * i]!, y: p[3 * i + 1]!, r: 0.48 * nn, species: occupation[i] === 'B' ? 'B' : 'A', shade: 1 });
    }
    let surface: Disc[] | null = null;
    if (n <= MAX_SURFACE_ATOMS) {
      const list = buildNeighbourList(p, FIVE_SHELL_CUTOFF_FACTOR * nn);
      const isSurface = surfaceSites(list, nn);
      const front: number[] = [];
      for (let i = 0; i < n; i++) if (isSurface[i] && p[3 * i + 2]! >= -0.5 * nn) front.push(i);
      front.sort((a, b) => p[3 * a + 2]! - p[3 * b + 2]!);
      const zMax = Math.max(...front.map((i) => p[3 * i + 2]!), 1e-9);
      surface = front.map((i) => ({
        x: p[3 * i]!,
        y: p[3 * i + 1]!,
        r: 0.5 * nn,
        species: occupation[i] === 'B' ? 'B' : 'A',
        shade: 0.55 + 0.45 * Math.max(0, p[3 * i + 2]! / zMax),
      }));
    }
    return { section, surface, extent };
  }, [spec, occupation]);

  return (
    <div>
      <div style={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(220px, 1fr))', gap: 16 }}>
        <Discs discs={picture.section} extent={picture.extent} label="central cross-section (slab through the centre)" testId="particle-cross-section" elementA={elementA} elementB={elementB} />
        {picture.surface ? (
          <Discs discs={picture.surface} extent={picture.extent} label="outer surface seen from above (nearer atoms darker)" testId="particle-surface" elementA={elementA} elementB={elementB} />
        ) : (
          <p className="small muted">The surface picture is drawn for particles up to {MAX_SURFACE_ATOMS.toLocaleString('en-US')} atoms.</p>
        )}
      </div>
      <p className="small" aria-label="Legend" data-testid="particle-legend">
        <span style={{ display: 'inline-block', width: 12, height: 12, borderRadius: 6, background: ELEMENT_COLOURS.A, verticalAlign: 'middle', marginRight: 4 }} /> {elementA}
        <span style={{ display: 'inline-block', width: 12, height: 12, borderRadius: 6, background: ELEMENT_COLOURS.B, verticalAlign: 'middle', margin: '0 4px 0 16px' }} /> {elementB}
      </p>
    </div>
  );
}
