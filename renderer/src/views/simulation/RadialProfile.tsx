/** at.% of B layer by layer, centre → surface, with the overall composition dashed. */
import {
  Bar,
  BarChart,
  CartesianGrid,
  LabelList,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { chartLegend } from '../../charts/ChartLegend';
import { DATA_STYLE, ELEMENT, NEUTRAL } from '../../charts/palette';
import type { SimulationResult } from '../../../../shared-model/montecarlo/simulate';
import { pct } from './format';

function layerName(layerFromSurface: number, centre: number | undefined): string {
  if (layerFromSurface === 0) return 'surface';
  return layerFromSurface === centre ? 'centre' : `S−${layerFromSurface}`;
}

export function RadialProfile(props: { result: SimulationResult }) {
  const { result } = props;
  const centre = result.radialProfile[0]?.layerFromSurface;
  const data = result.radialProfile.map((layer) => ({
    layer: layerName(layer.layerFromSurface, centre),
    xB: 100 * layer.xB,
    atoms: layer.atoms,
  }));
  return (
    <figure style={{ margin: 0 }} data-testid="radial-profile">
      <figcaption className="small">
        at.% {result.elementB} layer by layer, centre → surface (dashed: overall {pct(result.xB)})
      </figcaption>
      <ResponsiveContainer width="100%" height={220}>
        <BarChart data={data} margin={{ left: 8, right: 16, top: 16, bottom: 8 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis dataKey="layer" interval={0} />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" width={48} />
          <Tooltip
            formatter={(v, _name, item) => [
              `${Number(v).toFixed(1)} % (${(item.payload as { atoms: number }).atoms} atoms)`,
              `at.% ${result.elementB}`,
            ]}
          />
          {chartLegend([
            { label: `at.% ${result.elementB} in the layer`, colour: ELEMENT.B, marker: 'bar' },
            {
              label: `overall ${pct(result.xB)}`,
              colour: NEUTRAL.reference,
              marker: 'line',
              dash: '4 4',
              thin: true,
            },
          ])}
          <ReferenceLine y={100 * result.xB} stroke={NEUTRAL.reference} strokeDasharray="4 4" />
          <Bar
            dataKey="xB"
            fill={ELEMENT.B}
            fillOpacity={DATA_STYLE.barOpacity}
            stroke={ELEMENT.B}
            // a layer with no B is still drawn (1 px) so that it carries its "0" label too
            minPointSize={1}
            isAnimationActive={false}
          >
            {/* every bar carries its value */}
            <LabelList dataKey="xB" position="top" fontSize={11} formatter={(v: unknown) => Number(v).toFixed(0)} />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
