/**
 * The one legend of every chart: each entry is a marker drawn as the series is drawn (a dot for data points,
 * a pale bar for histogram bins, a line, dashed where the series is dashed, a square outline for overlay
 * markers) beside its words. Use `chartLegend(entries)` as a child of a recharts chart (it renders in the
 * chart's legend slot), or `<ChartLegend entries={…} />` anywhere else.
 */
import { Legend } from 'recharts';
import { DATA_STYLE, FIT_STYLE } from './palette';
import './charts.css';

export type LegendMarker = 'dot' | 'bar' | 'line' | 'square';

export interface LegendEntry {
  label: string;
  colour: string;
  marker: LegendMarker;
  /** SVG dash pattern of a line marker ('' or absent: solid). */
  dash?: string;
  /** Thinner line (a fit that is not the chosen one). */
  thin?: boolean;
}

function Marker(props: { entry: LegendEntry }) {
  const { colour, marker, dash, thin } = props.entry;
  return (
    <svg width={22} height={12} viewBox="0 0 22 12" aria-hidden="true" data-marker={marker}>
      {marker === 'dot' ? (
        <circle cx={11} cy={6} r={DATA_STYLE.dotRadius + 1} fill={colour} fillOpacity={DATA_STYLE.dotOpacity} />
      ) : marker === 'bar' ? (
        <rect x={4} y={1} width={14} height={10} fill={colour} fillOpacity={DATA_STYLE.barOpacity} stroke={colour} />
      ) : marker === 'square' ? (
        <rect x={5} y={1} width={10} height={10} fill="none" stroke={colour} strokeWidth={2} />
      ) : (
        <line
          x1={1}
          y1={6}
          x2={21}
          y2={6}
          stroke={colour}
          strokeWidth={thin ? FIT_STYLE.otherWidth : FIT_STYLE.width}
          strokeDasharray={dash || undefined}
        />
      )}
    </svg>
  );
}

export function ChartLegend(props: { entries: LegendEntry[]; testId?: string }) {
  return (
    <ul className="chart-legend" data-testid={props.testId ?? 'chart-legend'}>
      {props.entries.map((entry) => (
        <li key={`${entry.marker}:${entry.label}`} data-legend-marker={entry.marker} data-legend-colour={entry.colour}>
          <Marker entry={entry} />
          <span>{entry.label}</span>
        </li>
      ))}
    </ul>
  );
}

/** The legend as a recharts child (placed above the plot, space reserved by recharts). */
export function chartLegend(entries: LegendEntry[], testId?: string) {
  return <Legend verticalAlign="top" content={() => <ChartLegend entries={entries} testId={testId} />} />;
}
