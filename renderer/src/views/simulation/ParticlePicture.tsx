/**
 * A picture of a simulated particle: a cross-section (the atoms of a slab through a chosen cut plane:
 * its normal x, y or z and its offset from the centre) with the two elements' centres of mass marked (an
 * off-centre core shows as a B mark away from the A mark), and the outer surface seen from +z (surface
 * atoms of the near half, drawn back to front), atoms as discs coloured by element, with a legend.
 * Geometry is rebuilt from the run's inputs (deterministic); a relaxed run draws its stored final positions.
 */
import { useMemo, useState } from 'react';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../../../shared-model/clusters/neighbours';
import { surfaceSites } from '../../../../shared-model/montecarlo/analysis';
import { rebuildGeometry, type SimulationSpec } from '../../../../shared-model/montecarlo/simulate';
import { ELEMENT } from '../../charts/palette';

/** The pair's two metals in the colours every chart gives them. */
export const ELEMENT_COLOURS = ELEMENT;

/** Surface picture only up to this size (the neighbour list is built in the page). */
const MAX_SURFACE_ATOMS = 20_000;

interface Disc {
  x: number;
  y: number;
  r: number;
  species: 'A' | 'B';
  shade: number;
}

interface Mark {
  x: number;
  y: number;
  species: 'A' | 'B';
}

function Discs(props: {
  discs: Disc[];
  extent: number;
  label: string;
  testId: string;
  elementA: string;
  elementB: string;
  marks?: Mark[];
}) {
  const { discs, extent } = props;
  const size = 2 * extent;
  return (
    <figure style={{ margin: 0 }} data-testid={props.testId}>
      <svg
        viewBox={`${-extent} ${-extent} ${size} ${size}`}
        width="100%"
        style={{
          maxWidth: 320,
          aspectRatio: '1 / 1',
          background: '#fbfaf6',
          border: '1px solid var(--line)',
          borderRadius: 6,
        }}
        role="img"
        aria-label={props.label}
      >
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
        {(props.marks ?? []).map((m) => (
          <g
            key={m.species}
            data-testid={`centre-of-mass-${m.species === 'A' ? props.elementA : props.elementB}`}
            stroke={m.species === 'A' ? '#1d2d3a' : '#7c2d12'}
            strokeWidth={extent / 80}
          >
            <line x1={m.x - extent / 14} y1={-m.y} x2={m.x + extent / 14} y2={-m.y} />
            <line x1={m.x} y1={-m.y - extent / 14} x2={m.x} y2={-m.y + extent / 14} />
          </g>
        ))}
      </svg>
      <figcaption className="small muted">{props.label}</figcaption>
    </figure>
  );
}

const AXES = ['x', 'y', 'z'] as const;
type Axis = (typeof AXES)[number];

export function ParticlePicture(props: {
  spec: SimulationSpec;
  occupation: string;
  elementA: string;
  elementB: string;
  positions?: readonly number[] | null;
}) {
  const { spec, occupation, elementA, elementB } = props;
  const [normal, setNormal] = useState<Axis>('z');
  const [offsetText, setOffsetText] = useState('0');
  const base = useMemo(() => {
    const geometry = rebuildGeometry(spec);
    const p =
      props.positions && props.positions.length === geometry.positions.length
        ? Float64Array.from(props.positions)
        : geometry.positions;
    const nn = geometry.nearestNeighbourAngstrom;
    const n = geometry.atoms;
    let extent = 0;
    for (let i = 0; i < n; i++) extent = Math.max(extent, Math.hypot(p[3 * i]!, p[3 * i + 1]!, p[3 * i + 2]!));
    extent += nn;
    const sum = { A: [0, 0, 0], B: [0, 0, 0] };
    const count = { A: 0, B: 0 };
    for (let i = 0; i < n; i++) {
      const s = occupation[i] === 'B' ? 'B' : 'A';
      count[s]++;
      for (let c = 0; c < 3; c++) sum[s][c]! += p[3 * i + c]!;
    }
    const centre = (s: 'A' | 'B') => sum[s].map((v) => (count[s] > 0 ? v / count[s] : 0));
    return { geometry, p, nn, n, extent, centres: { A: centre('A'), B: centre('B') } };
  }, [spec, occupation, props.positions]);
  const offset = Number(offsetText);
  const section = useMemo(() => {
    const { p, nn, n } = base;
    const k = AXES.indexOf(normal);
    const [u, v] = [0, 1, 2].filter((c) => c !== k) as [number, number];
    // Slab: atoms within ±0.4 nn of the plane (for fcc shapes cut along a cube axis, one (001) layer).
    const discs: Disc[] = [];
    for (let i = 0; i < n; i++) {
      if (Math.abs(p[3 * i + k]! - offset) <= 0.4 * nn)
        discs.push({
          x: p[3 * i + u]!,
          y: p[3 * i + v]!,
          r: 0.48 * nn,
          species: occupation[i] === 'B' ? 'B' : 'A',
          shade: 1,
        });
    }
    const marks: Mark[] = (['A', 'B'] as const).map((s) => ({
      x: base.centres[s][u]!,
      y: base.centres[s][v]!,
      species: s,
    }));
    return { discs, marks };
  }, [base, normal, offset, occupation]);
  const picture = useMemo(() => {
    const { p, nn, n, extent } = base;
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
    return { surface, extent };
  }, [base, occupation]);

  return (
    <div>
      <div style={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(220px, 1fr))', gap: 16 }}>
        <div>
          <div className="sim-radio" role="group" aria-label="Cut plane">
            <label>
              cut normal{' '}
              <select name="cutNormal" value={normal} onChange={(e) => setNormal(e.target.value as Axis)}>
                {AXES.map((a) => (
                  <option key={a} value={a}>
                    {a}
                  </option>
                ))}
              </select>
            </label>
            <label>
              offset, Å{' '}
              <input
                name="cutOffset"
                type="range"
                min={-Math.floor(picture.extent)}
                max={Math.floor(picture.extent)}
                step={0.5}
                value={Number.isFinite(offset) ? offset : 0}
                onChange={(e) => setOffsetText(e.target.value)}
              />{' '}
              {Number.isFinite(offset) ? offset.toFixed(1) : '0'}
            </label>
          </div>
          <Discs
            discs={section.discs}
            extent={picture.extent}
            marks={section.marks}
            label={`cross-section: slab ${normal} = ${Number.isFinite(offset) ? offset.toFixed(1) : '0'} Å; crosses mark each element's centre of mass, projected`}
            testId="particle-cross-section"
            elementA={elementA}
            elementB={elementB}
          />
        </div>
        {picture.surface ? (
          <Discs
            discs={picture.surface}
            extent={picture.extent}
            label="outer surface seen from above (nearer atoms darker)"
            testId="particle-surface"
            elementA={elementA}
            elementB={elementB}
          />
        ) : (
          <p className="small muted">
            The surface picture is drawn for particles up to {MAX_SURFACE_ATOMS.toLocaleString('en-US')} atoms.
          </p>
        )}
      </div>
      <p className="small" aria-label="Legend" data-testid="particle-legend">
        <span
          style={{
            display: 'inline-block',
            width: 12,
            height: 12,
            borderRadius: 6,
            background: ELEMENT_COLOURS.A,
            verticalAlign: 'middle',
            marginRight: 4,
          }}
        />{' '}
        {elementA}
        <span
          style={{
            display: 'inline-block',
            width: 12,
            height: 12,
            borderRadius: 6,
            background: ELEMENT_COLOURS.B,
            verticalAlign: 'middle',
            margin: '0 4px 0 16px',
          }}
        />{' '}
        {elementB}
      </p>
    </div>
  );
}
