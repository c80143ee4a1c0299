/**
 * Energy per atom and the B share of the surface sites against the sweep (live while running, stored when done).
 * For a finished run the equilibration point is marked and the averages reported with the result are drawn from
 * there on, in the colour of the trace they average.
 */
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartLegend, type LegendEntry } from '../../charts/ChartLegend';
import { niceTicks } from '../../charts/chart-numbers';
import { dashPattern, ELEMENT, FIT_STYLE, NEUTRAL, seriesColour } from '../../charts/palette';
import type { TracePoint } from './traces';

const MARGIN = { left: 8, right: 16, top: 8, bottom: 8 };

/** Decimals that write every tick exactly (round ticks: 0.005 steps need three). */
function decimalsOf(ticks: number[]): number {
  const step = Math.abs((ticks[1] as number) - (ticks[0] as number));
  return Math.max(
    0,
    Math.min(
      6,
      Math.ceil(-Math.log10(step) - 1e-9) +
        (Number((step / 10 ** Math.floor(Math.log10(step))).toFixed(6)) % 1 === 0 ? 0 : 1),
    ),
  );
}

/** What a finished run averaged: from which sweep (1-based), the mean energy per atom and surface share. */
export interface TraceAverages {
  fromSweep: number;
  energyPerAtomEv: number;
  surfaceXB: number;
}

/** The energy is no element's: a colour of its own; the surface share is B's. */
const ENERGY = seriesColour(4);
const SURFACE = ELEMENT.B;

export function Traces(props: { points: TracePoint[]; elementB: string; xB: number; averages?: TraceAverages }) {
  const { averages } = props;
  const last = props.points[props.points.length - 1]?.sweep ?? 1;
  const first = props.points[0]?.sweep ?? 0;
  const sweepTicks = niceTicks(0, last, 6).filter((t) => t >= first - 1e-9 && t <= last + 1e-9);
  const averageDash = dashPattern(1);
  const energies = props.points.map((p) => p.energyPerAtomEv).filter(Number.isFinite);
  const energyTicks = energies.length > 1 ? niceTicks(Math.min(...energies), Math.max(...energies), 6) : [];
  const energyDigits = energyTicks.length > 1 ? decimalsOf(energyTicks) : 3;
  const equilibration: LegendEntry[] = averages
    ? [
        {
          label: `equilibrated from sweep ${averages.fromSweep}`,
          colour: NEUTRAL.reference,
          marker: 'line',
          dash: '3 3',
          thin: true,
        },
      ]
    : [];
  const xAxis = (
    <XAxis
      dataKey="sweep"
      type="number"
      domain={[first, last]}
      ticks={sweepTicks.length > 1 ? sweepTicks : undefined}
      allowDecimals={false}
    />
  );
  const fromLine = averages ? (
    <ReferenceLine x={averages.fromSweep} stroke={NEUTRAL.reference} strokeDasharray="3 3" ifOverflow="extendDomain" />
  ) : null;
  return (
    <div className="sim-charts" data-testid="sim-traces">
      <figure style={{ margin: 0 }} data-testid="sim-trace-energy">
        <figcaption className="small">energy per atom, eV, vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={220}>
          <LineChart data={props.points} margin={MARGIN}>
            <CartesianGrid strokeDasharray="3 3" />
            {xAxis}
            <YAxis
              domain={
                energyTicks.length > 1
                  ? [energyTicks[0] as number, energyTicks[energyTicks.length - 1] as number]
                  : ['auto', 'auto']
              }
              ticks={energyTicks.length > 1 ? energyTicks : undefined}
              width={64}
              tickFormatter={(v: number) => v.toFixed(energyDigits)}
            />
            <Tooltip formatter={(v) => `${Number(v).toFixed(4)} eV`} labelFormatter={(v) => `sweep ${v}`} />
            {chartLegend([
              { label: 'E/N per sweep', colour: ENERGY, marker: 'line', thin: true },
              ...(averages
                ? [
                    {
                      label: `mean ${averages.energyPerAtomEv.toFixed(4)} eV`,
                      colour: ENERGY,
                      marker: 'line' as const,
                      dash: averageDash,
                    },
                  ]
                : []),
              ...equilibration,
            ])}
            {fromLine}
            <Line
              type="monotone"
              dataKey="energyPerAtomEv"
              name="E/N"
              stroke={ENERGY}
              strokeWidth={FIT_STYLE.otherWidth}
              dot={false}
              isAnimationActive={false}
            />
            {averages ? (
              <ReferenceLine
                segment={[
                  { x: averages.fromSweep, y: averages.energyPerAtomEv },
                  { x: last, y: averages.energyPerAtomEv },
                ]}
                stroke={ENERGY}
                strokeWidth={FIT_STYLE.width}
                strokeDasharray={averageDash}
              />
            ) : null}
          </LineChart>
        </ResponsiveContainer>
      </figure>
      <figure style={{ margin: 0 }} data-testid="sim-trace-surface">
        <figcaption className="small">{props.elementB} share of the surface sites vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={220}>
          <LineChart data={props.points.map((p) => ({ ...p, surface: 100 * p.surfaceXB }))} margin={MARGIN}>
            <CartesianGrid strokeDasharray="3 3" />
            {xAxis}
            <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" width={48} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(1)} %`} labelFormatter={(v) => `sweep ${v}`} />
            {chartLegend([
              { label: `surface ${props.elementB} per sweep`, colour: SURFACE, marker: 'line', thin: true },
              ...(averages
                ? [
                    {
                      label: `mean ${(100 * averages.surfaceXB).toFixed(1)} %`,
                      colour: SURFACE,
                      marker: 'line' as const,
                      dash: averageDash,
                    },
                  ]
                : []),
              {
                label: `overall ${(100 * props.xB).toFixed(1)} at.% ${props.elementB}`,
                colour: NEUTRAL.reference,
                marker: 'line',
                dash: '4 4',
                thin: true,
              },
              ...equilibration,
            ])}
            <ReferenceLine y={100 * props.xB} stroke={NEUTRAL.reference} strokeDasharray="4 4" />
            {fromLine}
            <Line
              type="monotone"
              dataKey="surface"
              name={`surface ${props.elementB}`}
              stroke={SURFACE}
              strokeWidth={FIT_STYLE.otherWidth}
              dot={false}
              isAnimationActive={false}
            />
            {averages ? (
              <ReferenceLine
                segment={[
                  { x: averages.fromSweep, y: 100 * averages.surfaceXB },
                  { x: last, y: 100 * averages.surfaceXB },
                ]}
                stroke={SURFACE}
                strokeWidth={FIT_STYLE.width}
                strokeDasharray={averageDash}
              />
            ) : null}
          </LineChart>
        </ResponsiveContainer>
      </figure>
    </div>
  );
}
