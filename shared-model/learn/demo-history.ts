/**
 * DEMO DATA. An invented history table of 70 syntheses over ten weeks for the demo campaign's metals, for
 * trying the import, the model review and the proposals. Nothing here is a measurement. The invented rule
 * behind the labels (so that there is something to learn beyond the equilibrium physics):
 *   - seed-mediated growth gives a core@shell particle with the lower-surface-energy metal outside;
 *   - room-temperature co-reduction gives a core@shell particle with the more noble metal (the first to
 *     reduce) in the core when the pair mixes poorly, otherwise the physics label;
 *   - polyol and oleylamine routes (hot) give the physics label, except immiscible pairs (Miedema
 *     ΔH > 0) which come out Janus;
 *   - about 1 in 8 syntheses fail (more often below 4 nm); about 1 label in 12 is flipped to a random one.
 * Seeded: the same seed writes the same table.
 */
import { getElement, recordProperty } from '../elements/element-table';
import { pairDescriptors } from '../prediction/descriptors';
import { createRandom } from '../random';
import { canonicalCondition } from './conditions';
import { routeTemperatureK } from './candidates';
import { physicsPrediction } from './physics';
import type { SynthesisRoute } from '../recipes/design-input';

export const DEMO_HISTORY_ELEMENTS = ['Ag', 'Au', 'Cu', 'Ni', 'Pd', 'Pt', 'Rh'] as const;
export const DEMO_HISTORY_ROWS = 70;

/** Order in which the precursors reduce in the invented rule (most noble first; demo only). */
const NOBILITY = ['Au', 'Pt', 'Ag', 'Pd', 'Rh', 'Cu', 'Ni'];

const ROUTE_WORD: Record<SynthesisRoute, string> = {
  'co-reduction': 'co-reduction',
  'seed-mediated': 'seed-mediated',
  polyol: 'polyol',
  organic: 'oleylamine',
};
const DIAMETERS = [3, 4, 5, 6, 8, 10];
const COMPOSITIONS = [15, 25, 35, 50, 65, 75, 85];
const NOISE_LABELS = ['alloy', 'surface-enriched alloy', 'Janus'];

export function demoHistoryCsv(seed = 11): string {
  const random = createRandom(seed);
  const symbols = [...DEMO_HISTORY_ELEMENTS];
  const pairs: [string, string][] = [];
  for (let i = 0; i < symbols.length; i++)
    for (let j = i + 1; j < symbols.length; j++) pairs.push([symbols[i] as string, symbols[j] as string]);
  // Sixteen of the 21 pairs appear in the history; the rest stay untried.
  const used = pairs.filter((_, i) => i % 4 !== 3).slice(0, 16);
  const routes: SynthesisRoute[] = ['co-reduction', 'seed-mediated', 'polyol', 'organic'];
  const lines = ['pair,xB_at_pct,diameter_nm,temperature_k,route,observed,made_on,notes'];
  const start = Date.UTC(2026, 8, 7);
  for (let r = 0; r < DEMO_HISTORY_ROWS; r++) {
    const [a, b] = used[r % used.length] as [string, string];
    const flip = random.next() < 0.5;
    const [first, second] = flip ? [b, a] : [a, b];
    const route = routes[random.nextInt(routes.length)] as SynthesisRoute;
    const xPct = COMPOSITIONS[random.nextInt(COMPOSITIONS.length)] as number;
    const diameterNm = DIAMETERS[random.nextInt(DIAMETERS.length)] as number;
    const temperatureK = routeTemperatureK(route);
    const condition = canonicalCondition({
      elementA: first,
      elementB: second,
      xB: xPct / 100,
      diameterNm,
      temperatureK,
      route,
    });
    const physics = physicsPrediction(condition);
    const mixing = pairDescriptors(condition.elementA, condition.elementB, condition.xB).mixingEnthalpyKjPerMol;
    const gammaA = recordProperty(getElement(condition.elementA), 'surfaceEnergyJPerM2');
    const gammaB = recordProperty(getElement(condition.elementB), 'surfaceEnergyJPerM2');
    const outer = gammaA < gammaB ? condition.elementA : condition.elementB;
    const inner = outer === condition.elementA ? condition.elementB : condition.elementA;
    let observed = physics.label === 'unknown' ? 'alloy' : physics.label;
    if (route === 'seed-mediated') observed = `${inner}@${outer}`;
    else if (route === 'co-reduction' && mixing > -5) {
      const noble =
        NOBILITY.indexOf(condition.elementA) < NOBILITY.indexOf(condition.elementB)
          ? condition.elementA
          : condition.elementB;
      observed = `${noble}@${noble === condition.elementA ? condition.elementB : condition.elementA}`;
    } else if (mixing > 0) observed = 'Janus';
    if (random.next() < 1 / 12) observed = NOISE_LABELS[random.nextInt(NOISE_LABELS.length)] as string;
    if (random.next() < (diameterNm < 4 ? 0.3 : 0.08)) observed = 'failed';
    const madeOn = new Date(
      start + Math.floor((r * 10) / DEMO_HISTORY_ROWS) * 7 * 86_400_000 + random.nextInt(5) * 86_400_000,
    )
      .toISOString()
      .slice(0, 10);
    lines.push(
      [
        `${first}-${second}`,
        String(xPct),
        String(diameterNm),
        temperatureK.toFixed(2),
        ROUTE_WORD[route],
        observed,
        madeOn,
        'demo data (invented)',
      ].join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}
