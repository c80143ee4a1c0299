/** at.% of B layer by layer, centre → surface, with the overall composition dashed. */
import { Bar, BarChart, CartesianGrid, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
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
        <BarChart data={data} margin={{ left: 8, right: 16, top: 8, bottom: 8 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis dataKey="layer" />
          <YAxis domain={[0, 100]} unit="%" width={48} />
          <Tooltip
            formatter={(v, _name, item) => [
              `${Number(v).toFixed(1)} % (${(item.payload as { atoms: number }).atoms} atoms)`,
              `at.% ${result.elementB}`,
            ]}
          />
          <ReferenceLine y={100 * result.xB} stroke="#888" strokeDasharray="4 4" />
          <Bar dataKey="xB" fill="#c2410c" isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
