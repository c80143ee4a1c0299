/** Confusion matrix as a heat-map (recharts scatter with square cells), the count written in each cell. */
import { CartesianGrid, Scatter, ScatterChart, XAxis, YAxis } from 'recharts';
import type { ConfusionMatrix } from '../../../../shared-model/characterization/confusion';
import { AGREEMENT, NEUTRAL } from '../../charts/palette';

const rgba = (rgb: readonly number[], alpha: number) => `rgba(${rgb.join(', ')}, ${alpha.toFixed(3)})`;

const CELL_PX = 78;
const Y_AXIS_PX = 150;
const X_AXIS_PX = 110;
const MARGIN = { top: 10, right: 10, bottom: 10, left: 10 };

interface CellDatum {
  x: number;
  y: number;
  count: number;
  predicted: string;
  observed: string;
}

export function ConfusionHeatmap(props: { matrix: ConfusionMatrix; predictedLabel: string }) {
  const { labels, counts } = props.matrix;
  const n = labels.length;
  if (n === 0) return <p className="muted">No batch has both a prediction and an observed architecture yet.</p>;
  const max = Math.max(1, ...counts.flat());
  const cells: CellDatum[] = [];
  counts.forEach((row, observedIndex) =>
    row.forEach((count, predictedIndex) => {
      cells.push({
        x: predictedIndex,
        y: n - 1 - observedIndex,
        count,
        predicted: labels[predictedIndex] as string,
        observed: labels[observedIndex] as string,
      });
    }),
  );
  const width = MARGIN.left + MARGIN.right + Y_AXIS_PX + n * CELL_PX;
  const height = MARGIN.top + MARGIN.bottom + X_AXIS_PX + n * CELL_PX;
  const shape = (raw: unknown) => {
    const p = raw as { cx?: number; cy?: number; payload?: CellDatum };
    if (p.cx === undefined || p.cy === undefined || !p.payload) return <g />;
    const { count, predicted, observed } = p.payload;
    const strength = count / max;
    const diagonal = predicted === observed;
    const fill =
      count === 0 ? NEUTRAL.empty : rgba(diagonal ? AGREEMENT.agree : AGREEMENT.disagree, 0.2 + 0.8 * strength);
    return (
      <g data-cell={`${observed}|${predicted}`}>
        <rect
          x={p.cx - CELL_PX / 2 + 1}
          y={p.cy - CELL_PX / 2 + 1}
          width={CELL_PX - 2}
          height={CELL_PX - 2}
          fill={fill}
          stroke={NEUTRAL.grid}
        />
        <text
          x={p.cx}
          y={p.cy}
          textAnchor="middle"
          dominantBaseline="central"
          fontSize={18}
          fill={count > 0 && strength > 0.6 ? '#ffffff' : NEUTRAL.text}
        >
          {count}
        </text>
      </g>
    );
  };
  const ticks = labels.map((_, i) => i);
  return (
    <div className="heatmap-wrap" data-testid="confusion-heatmap">
      <p className="muted small">
        Rows: observed architecture. Columns: {props.predictedLabel}. Green cells agree, red cells disagree; the number
        is the count of batches.
      </p>
      <ScatterChart width={width} height={height} margin={MARGIN}>
        <CartesianGrid strokeDasharray="0" stroke="none" />
        <XAxis
          type="number"
          dataKey="x"
          domain={[-0.5, n - 0.5]}
          ticks={ticks}
          interval={0}
          tickFormatter={(i: number) => labels[i] ?? ''}
          height={X_AXIS_PX}
          // Slanted so long labels ("surface-enriched alloy") never run into their neighbours.
          angle={-35}
          textAnchor="end"
          label={{ value: 'predicted', position: 'insideBottom', offset: 0, fontSize: 12 }}
        />
        <YAxis
          type="number"
          dataKey="y"
          domain={[-0.5, n - 0.5]}
          ticks={ticks}
          interval={0}
          tickFormatter={(i: number) => labels[n - 1 - i] ?? ''}
          width={Y_AXIS_PX}
          label={{
            value: 'observed',
            angle: -90,
            position: 'insideLeft',
            fontSize: 12,
            style: { textAnchor: 'middle' },
          }}
        />
        <Scatter data={cells} shape={shape} isAnimationActive={false} />
      </ScatterChart>
    </div>
  );
}
