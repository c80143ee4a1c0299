/** Energy per atom and the B share of the surface sites against the sweep (live while running, stored when done). */
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { TracePoint } from './traces';

const MARGIN = { left: 8, right: 16, top: 8, bottom: 8 };

export function Traces(props: { points: TracePoint[]; elementB: string; xB: number }) {
  return (
    <div className="sim-charts" data-testid="sim-traces">
      <figure style={{ margin: 0 }}>
        <figcaption className="small">energy per atom, eV, vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={200}>
          <LineChart data={props.points} margin={MARGIN}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="sweep" type="number" domain={['dataMin', 'dataMax']} />
            <YAxis domain={['auto', 'auto']} width={64} tickFormatter={(v: number) => v.toFixed(3)} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(4)} eV`} labelFormatter={(v) => `sweep ${v}`} />
            <Line
              type="monotone"
              dataKey="energyPerAtomEv"
              name="E/N"
              stroke="#1d4ed8"
              dot={false}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </figure>
      <figure style={{ margin: 0 }}>
        <figcaption className="small">{props.elementB} share of the surface sites vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={200}>
          <LineChart data={props.points.map((p) => ({ ...p, surface: 100 * p.surfaceXB }))} margin={MARGIN}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="sweep" type="number" domain={['dataMin', 'dataMax']} />
            <YAxis domain={[0, 100]} unit="%" width={48} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(1)} %`} labelFormatter={(v) => `sweep ${v}`} />
            <ReferenceLine y={100 * props.xB} stroke="#888" strokeDasharray="4 4" />
            <Line
              type="monotone"
              dataKey="surface"
              name={`surface ${props.elementB}`}
              stroke="#c2410c"
              dot={false}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </figure>
    </div>
  );
}
