/**
 * One pair in detail: the prediction at the chosen conditions with its terms, and how the surface
 * composition changes with composition, diameter and temperature (isotherm charts). Saves the prediction
 * to the store, linked to the current campaign's pair when there is one, and hands the pair with its
 * conditions to the Simulation view (lattice Monte Carlo) when both metals have Gupta parameters.
 */
import { useMemo, useState } from 'react';
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { describeArchitecture } from '../../../shared-model/architecture/labels';
import {
  CLOSED_SHELL_RULE,
  describeClosedShell,
  nearestClosedShell,
} from '../../../shared-model/geometry/closed-shells';
import { GUPTA_ELEMENTS, isGuptaElement } from '../../../shared-model/montecarlo/gupta-parameters';
import { computeIsotherm, type IsothermSweep } from '../../../shared-model/prediction/isotherm';
import { predictPair, type PredictionConditions } from '../../../shared-model/prediction/predict';
import { call } from '../api/client';
import { logTicks, niceTicks } from '../charts/chart-numbers';
import { chartLegend } from '../charts/ChartLegend';
import { dashPattern, ELEMENT, FIT_STYLE, NEUTRAL } from '../charts/palette';
import { useQuery } from '../api/hooks';
import { useAppState, useHandOffTo } from '../app-state';
import { Banner } from '../components/Banner';
import { FlaskTerms, FlaskVerdicts } from './FlaskTerms';

const pct = (x: number) => `${(100 * x).toFixed(1)} %`;
const TERM_NAMES = {
  surfaceEnergy: 'surface energy',
  chemical: 'chemical (regular solution)',
  elastic: 'elastic strain',
  adsorbate: 'adsorbate (environment)',
  total: 'total',
} as const;
const ev = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(3)} eV`;

function IsothermChart(props: {
  elementA: string;
  elementB: string;
  conditions: Required<PredictionConditions>;
  sweep: IsothermSweep;
}) {
  const { elementA, elementB, conditions, sweep } = props;
  const data = useMemo(
    () =>
      computeIsotherm(elementA, elementB, conditions, sweep, 41).points.map((p) => ({
        x: sweep === 'xB' ? 100 * p.x : p.x,
        surface: 100 * p.surfaceXB,
        core: 100 * p.coreXB,
        overall: 100 * p.xB,
      })),
    [elementA, elementB, conditions, sweep],
  );
  // round ticks: composition 0/25/50/75/100 at.%, temperature in round steps, diameter 1-2-5 on the log axis
  const xs = data.map((d) => d.x);
  const lo = Math.min(...xs);
  const hi = Math.max(...xs);
  const ticks = sweep === 'xB' ? [0, 25, 50, 75, 100] : sweep === 'diameter' ? logTicks(lo, hi) : niceTicks(lo, hi, 6);
  const xLabel = sweep === 'xB' ? `overall at.% ${elementB}` : sweep === 'diameter' ? 'diameter, nm' : 'temperature, K';
  const marker =
    sweep === 'xB' ? 100 * conditions.xB : sweep === 'diameter' ? conditions.diameterNm : conditions.temperatureK;
  return (
    <figure
      style={{ margin: 0 }}
      aria-label={`${elementB} at the surface vs ${xLabel}`}
      data-testid={`isotherm-${sweep}`}
    >
      <figcaption className="small">
        at.% {elementB} in the surface layer and in the core vs {xLabel}
      </figcaption>
      <ResponsiveContainer width="100%" height={220}>
        <LineChart data={data} margin={{ left: 8, right: 16, top: 8, bottom: 16 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis
            dataKey="x"
            type="number"
            scale={sweep === 'diameter' ? 'log' : 'linear'}
            domain={
              sweep !== 'diameter' && ticks.length > 1
                ? [ticks[0] as number, ticks[ticks.length - 1] as number]
                : ['dataMin', 'dataMax']
            }
            ticks={ticks}
            tickFormatter={(v: number) => (sweep === 'diameter' ? String(Number(v.toPrecision(2))) : v.toFixed(0))}
            label={{ value: xLabel, position: 'insideBottom', offset: -8 }}
          />
          <YAxis domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} unit="%" width={48} />
          <Tooltip
            formatter={(value) => `${Number(value).toFixed(1)} %`}
            labelFormatter={(v) => `${xLabel} ${Number(v).toPrecision(3)}`}
          />
          {chartLegend([
            { label: `surface ${elementB}`, colour: ELEMENT.B, marker: 'line' },
            { label: `core ${elementB}`, colour: ELEMENT.B, marker: 'line', dash: dashPattern(1), thin: true },
            ...(sweep !== 'xB'
              ? [
                  {
                    label: `overall ${elementB}`,
                    colour: NEUTRAL.reference,
                    marker: 'line' as const,
                    dash: dashPattern(2),
                    thin: true,
                  },
                ]
              : []),
            { label: 'these conditions', colour: NEUTRAL.reference, marker: 'line', dash: '4 4', thin: true },
          ])}
          <ReferenceLine x={marker} stroke={NEUTRAL.reference} strokeDasharray="4 4" />
          <Line
            type="monotone"
            dataKey="surface"
            name={`surface ${elementB}`}
            stroke={ELEMENT.B}
            dot={false}
            strokeWidth={FIT_STYLE.width}
            isAnimationActive={false}
          />
          <Line
            type="monotone"
            dataKey="core"
            name={`core ${elementB}`}
            stroke={ELEMENT.B}
            strokeDasharray={dashPattern(1)}
            dot={false}
            strokeWidth={FIT_STYLE.otherWidth}
            isAnimationActive={false}
          />
          {sweep !== 'xB' ? (
            <Line
              type="monotone"
              dataKey="overall"
              name="overall"
              stroke={NEUTRAL.reference}
              dot={false}
              strokeDasharray={dashPattern(2)}
              strokeWidth={FIT_STYLE.otherWidth}
              isAnimationActive={false}
            />
          ) : null}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}

export function PairDetail(props: {
  elementA: string;
  elementB: string;
  conditions: Required<PredictionConditions>;
  onClose?: () => void;
}) {
  const { elementA, elementB, conditions } = props;
  const p = useMemo(() => predictPair(elementA, elementB, conditions), [elementA, elementB, conditions]);
  const { campaignId, revision, bumpRevision } = useAppState();
  const requestSimulation = useHandOffTo('simulation');
  const pairs = useQuery('pairs.list', campaignId === null ? null : { campaignId }, `pairs-${campaignId}-${revision}`);
  const linked =
    (pairs.data ?? []).find(
      (x) =>
        (x.elementA === elementA && x.elementB === elementB) || (x.elementA === elementB && x.elementB === elementA),
    ) ?? null;
  const saved = useQuery(
    'prediction.listForPair',
    linked ? { pairId: linked.id } : null,
    `saved-${linked?.id}-${revision}`,
  );
  const [message, setMessage] = useState<{ tone: 'info' | 'error'; text: string } | null>(null);

  const save = async () => {
    const result = await call('prediction.save', {
      pair: `${elementA}-${elementB}`,
      conditions: { ...conditions },
      ...(linked ? { pairId: linked.id } : {}),
    });
    if (!result.ok) {
      setMessage({ tone: 'error', text: result.error.message });
      return;
    }
    setMessage({
      tone: 'info',
      text: linked
        ? `saved as prediction ${result.value.id} for pair ${linked.elementA}-${linked.elementB} of this campaign`
        : `saved as prediction ${result.value.id} (no campaign pair to link)`,
    });
    bumpRevision();
  };

  const withoutParameters = [elementA, elementB].filter((symbol) => !isGuptaElement(symbol));
  const simulateTitle =
    withoutParameters.length === 0
      ? `Open the Simulation view with ${elementA}-${elementB}, ${pct(conditions.xB)} ${elementB}, ${conditions.diameterNm} nm ${conditions.shape}, ${conditions.temperatureK} K`
      : `${withoutParameters.join(' and ')} ${withoutParameters.length === 1 ? 'has' : 'have'} no Gupta (second-moment tight-binding) parameters; the simulation supports ${GUPTA_ELEMENTS.join(', ')}`;
  const simulate = () =>
    requestSimulation({
      elementA,
      elementB,
      xB: conditions.xB,
      diameterNm: conditions.diameterNm,
      shape: conditions.shape,
      temperatureK: conditions.temperatureK,
      source: `the pair detail of ${elementA}-${elementB}`,
    });

  return (
    <section className="card pair-detail" aria-label={`Pair detail ${p.pair}`}>
      <div className="view__header">
        <h2 className="card__title">
          {p.pair}: <span data-testid="detail-architecture">{p.architecture}</span>{' '}
          <span className="muted small">({describeArchitecture(p.architecture)})</span>
        </h2>
        {props.onClose ? (
          <button type="button" className="button--quiet" onClick={props.onClose}>
            Close
          </button>
        ) : null}
      </div>
      <p>
        {p.surfaceElement ? (
          <>
            <strong>{p.surfaceElement}</strong> goes to the surface: {pct(p.surfaceFraction)} of {p.surfaceSites}{' '}
            surface sites ({p.atoms} atoms), enrichment E = {p.enrichment.toFixed(2)}; the core holds {pct(p.coreXB)}{' '}
            {elementB}.
          </>
        ) : (
          <>No surface enrichment.</>
        )}{' '}
        Confidence {p.confidence.toFixed(2)}.
      </p>
      <p className="small muted" data-testid="detail-size-rule">
        {p.shape === 'sphere'
          ? `${p.atoms} atoms: a ${p.diameterNm} nm sphere at bulk fcc density (lattice ${p.latticeNm.toFixed(4)} nm).`
          : `${describeClosedShell(nearestClosedShell(p.shape, p.diameterNm, p.latticeNm))}: for ${p.diameterNm} nm, ${CLOSED_SHELL_RULE}, with the lattice constant ${p.latticeNm.toFixed(4)} nm (the same rule as the Simulation view's cluster).`}
      </p>
      <FlaskVerdicts prediction={p} />
      <p className="muted">{p.reason}</p>
      <table className="data-table" aria-label="Segregation terms">
        <thead>
          <tr>
            <th scope="col">term (eV; negative favours the element at the surface)</th>
            <th scope="col">at these conditions ({p.surfaceElement ?? elementB})</th>
            <th scope="col">
              dilute {elementB} in {elementA}
            </th>
            <th scope="col">
              dilute {elementA} in {elementB}
            </th>
          </tr>
        </thead>
        <tbody>
          {(['surfaceEnergy', 'chemical', 'elastic', 'adsorbate', 'total'] as const).map((key) => (
            <tr key={key}>
              <th scope="row">{TERM_NAMES[key]}</th>
              <td>{ev(p.terms[key])}</td>
              <td>{ev(p.segregation.bInA[key])}</td>
              <td>{ev(p.segregation.aInB[key])}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="small muted">
        Miedema ΔHmix {p.mixingEnthalpyKjPerMol.toFixed(1)} kJ/mol (chemical {p.mixingChemicalKjPerMol.toFixed(1)},
        elastic {p.mixingElasticKjPerMol.toFixed(1)}); unlike neighbours ×{p.unlikeNeighbourRatio.toFixed(2)} of random
        {p.miscibilityGap ? ', inside the miscibility gap' : ''}. ({p.facet}) facet, strain rule “{p.strainRule}”, model{' '}
        {p.modelVersion}.
      </p>
      <FlaskTerms prediction={p} />
      {p.flags.length > 0 ? (
        <ul className="small">
          {p.flags.map((flag) => (
            <li key={flag}>{flag}</li>
          ))}
        </ul>
      ) : null}
      <div style={{ display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(320px, 1fr))', gap: 16 }}>
        <IsothermChart elementA={elementA} elementB={elementB} conditions={conditions} sweep="xB" />
        <IsothermChart elementA={elementA} elementB={elementB} conditions={conditions} sweep="diameter" />
        <IsothermChart elementA={elementA} elementB={elementB} conditions={conditions} sweep="temperature" />
      </div>
      <div className="form-actions">
        <button type="button" className="button--primary" onClick={save}>
          Save prediction{linked ? ` to ${linked.elementA}-${linked.elementB}` : ''}
        </button>
        <button
          type="button"
          onClick={simulate}
          disabled={withoutParameters.length > 0}
          title={simulateTitle}
          data-testid="simulate-pair"
        >
          Simulate this pair
        </button>
        {withoutParameters.length > 0 ? (
          <span className="small muted">no simulation: {simulateTitle.split(';')[0]}</span>
        ) : null}
        {linked && saved.data ? (
          <span className="small muted">{saved.data.length} saved for this campaign pair</span>
        ) : null}
        {!linked ? (
          <span className="small muted">
            {campaignId === null ? 'no campaign selected' : 'this pair is not in the current campaign'}: saved unlinked
          </span>
        ) : null}
      </div>
      {message ? <Banner tone={message.tone}>{message.text}</Banner> : null}
    </section>
  );
}
