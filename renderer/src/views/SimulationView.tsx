/**
 * Simulation: a lattice Monte Carlo run of one bimetallic particle (Gupta potential, canonical swap
 * moves) computed in a worker thread. Choose the pair, composition, shape and size, temperature (or an
 * annealing schedule), seed and length; Run queues it; a progress bar with live energy and surface
 * composition traces follows it; Cancel stops it. The result: surface composition, radial profile,
 * Warren–Cowley order, the architecture label beside the analytic prediction, a picture of the
 * particle and an extended XYZ export. Stored runs can be re-opened from the list. A pair's detail in
 * the prediction views can hand its pair and conditions over (app state `pendingSimulation`): the form
 * takes them once and says where they came from.
 */
import { useEffect, useMemo, useState, type FormEvent } from 'react';
import { Bar, BarChart, CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { ParticleShape } from '../../../shared-model/geometry/particle-sites';
import type { SimulationRun, SimulationRunSummary } from '../../../shared-model/api/simulation';
import { describeArchitecture } from '../../../shared-model/architecture/labels';
import { CLUSTER_SHAPES, type ClusterShape } from '../../../shared-model/clusters/shapes';
import { planSimulation, type SimulationProgress, type SimulationResult, type SimulationSpec } from '../../../shared-model/montecarlo/simulate';
import { predictPair } from '../../../shared-model/prediction/predict';
import { call } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { useAppState, type SimulationRequest } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { ParticlePicture } from './simulation/ParticlePicture';
import './simulation/simulation.css';

const pct = (x: number) => `${(100 * x).toFixed(1)} %`;
const num = (x: number, digits = 4) => (Number.isFinite(x) ? x.toPrecision(digits) : '–');

interface FormState {
  elementA: string;
  elementB: string;
  xB: string;
  shape: ClusterShape;
  sizeMode: 'shells' | 'diameter';
  shells: string;
  diameterNm: string;
  temperatureK: string;
  sweeps: string;
  anneal: boolean;
  annealStartK: string;
  annealSweeps: string;
  seed: string;
}

const INITIAL: FormState = {
  elementA: 'Ag',
  elementB: 'Pd',
  xB: '0.5',
  shape: 'cuboctahedron',
  sizeMode: 'shells',
  shells: '5',
  diameterNm: '3',
  temperatureK: '600',
  sweeps: '1000',
  anneal: false,
  annealStartK: '1500',
  annealSweeps: '500',
  seed: '1',
};

const numberOrUndefined = (text: string): number | undefined => (text.trim() === '' ? undefined : Number(text.replace(',', '.')));

function specFromForm(form: FormState) {
  return {
    elementA: form.elementA,
    elementB: form.elementB,
    xB: numberOrUndefined(form.xB) as number,
    shape: form.shape,
    ...(form.sizeMode === 'shells' ? { shells: numberOrUndefined(form.shells) } : { diameterNm: numberOrUndefined(form.diameterNm) }),
    temperatureK: numberOrUndefined(form.temperatureK) as number,
    sweeps: numberOrUndefined(form.sweeps) as number,
    anneal: form.anneal ? { startTemperatureK: numberOrUndefined(form.annealStartK) as number, sweeps: numberOrUndefined(form.annealSweeps) as number } : null,
    seed: numberOrUndefined(form.seed) ?? 1,
  };
}

const CLUSTER_SHAPE_OF: Record<ParticleShape, ClusterShape> = {
  cuboctahedron: 'cuboctahedron',
  icosahedron: 'icosahedron',
  'truncated octahedron': 'truncated-octahedron',
  sphere: 'sphere',
};

/** Short decimal text for a number from another view (0.30000000000000004 → "0.3"). */
const decimalText = (x: number) => String(Number(x.toPrecision(6)));

/** The form with a request from another view copied in; size by diameter, run length and seed kept. */
function formFromRequest(current: FormState, request: SimulationRequest): FormState {
  return {
    ...current,
    elementA: request.elementA,
    elementB: request.elementB,
    xB: decimalText(request.xB),
    shape: CLUSTER_SHAPE_OF[request.shape],
    sizeMode: 'diameter',
    diameterNm: decimalText(request.diameterNm),
    temperatureK: decimalText(request.temperatureK),
  };
}

function describeRequest(request: SimulationRequest): string {
  return `Filled in from ${request.source}: ${request.elementA}-${request.elementB}, x(${request.elementB}) = ${decimalText(request.xB)}, ${decimalText(request.diameterNm)} nm ${request.shape}, ${decimalText(request.temperatureK)} K. Check the sweeps and seed, then Run.`;
}

function RunForm(props: { elements: readonly string[]; mixingRule: string; onStarted: (run: SimulationRunSummary) => void }) {
  const [form, setForm] = useState<FormState>(INITIAL);
  const [prefilled, setPrefilled] = useState<string | null>(null);
  const { pendingSimulation, clearPendingSimulation } = useAppState();
  // A request from a pair's detail is taken once: copied into the form, then cleared from the app state.
  useEffect(() => {
    if (pendingSimulation === null) return;
    setForm((current) => formFromRequest(current, pendingSimulation));
    setPrefilled(describeRequest(pendingSimulation));
    clearPendingSimulation();
  }, [pendingSimulation, clearPendingSimulation]);
  const { errors, general, show, clear } = useFieldErrors();
  const set = <K extends keyof FormState>(key: K, value: FormState[K]) => setForm((f) => ({ ...f, [key]: value }));
  // Instant feedback: the planned size, or the first problem, computed in the page with the same model checks.
  const plan = useMemo(() => {
    try {
      const p = planSimulation(specFromForm(form) as SimulationSpec);
      return { text: `${p.atoms.toLocaleString('en-US')} atoms, ${p.totalSweeps.toLocaleString('en-US')} sweeps = ${p.attempts.toExponential(2)} swap attempts`, ok: true };
    } catch (error) {
      return { text: error instanceof Error ? error.message : String(error), ok: false };
    }
  }, [form]);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const result = await call('simulation.start', specFromForm(form));
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    props.onStarted(result.value);
  };

  const element = (name: 'elementA' | 'elementB', label: string) => (
    <Field label={label} name={name} error={errors[name]}>
      <select name={name} value={form[name]} onChange={(e) => set(name, e.target.value)}>
        {props.elements.map((symbol) => (
          <option key={symbol} value={symbol}>
            {symbol}
          </option>
        ))}
      </select>
    </Field>
  );

  return (
    <form className="card form-grid sim-form" onSubmit={submit} aria-label="New simulation" noValidate data-testid="sim-form">
      <h2 className="card__title">New run</h2>
      {prefilled ? (
        <p className="small" style={{ gridColumn: '1 / -1', margin: 0 }} data-testid="sim-prefilled">
          {prefilled}
        </p>
      ) : null}
      {element('elementA', 'Element A')}
      {element('elementB', 'Element B')}
      <Field label={`x(${form.elementB}), atomic fraction`} name="xB" error={errors.xB} hint="0 < xB < 1">
        <input name="xB" inputMode="decimal" value={form.xB} onChange={(e) => set('xB', e.target.value)} />
      </Field>
      <Field label="Shape" name="shape" error={errors.shape}>
        <select name="shape" value={form.shape} onChange={(e) => set('shape', e.target.value as ClusterShape)}>
          {CLUSTER_SHAPES.map((shape) => (
            <option key={shape} value={shape}>
              {shape}
            </option>
          ))}
        </select>
      </Field>
      <div className="sim-radio" role="radiogroup" aria-label="Size given by">
        <label>
          <input type="radio" name="sizeMode" checked={form.sizeMode === 'shells'} onChange={() => set('sizeMode', 'shells')} /> shells
        </label>
        <label>
          <input type="radio" name="sizeMode" checked={form.sizeMode === 'diameter'} onChange={() => set('sizeMode', 'diameter')} /> diameter
        </label>
      </div>
      {form.sizeMode === 'shells' ? (
        <Field label="Shells around the centre" name="shells" error={errors.shells} hint={form.shape === 'truncated-octahedron' ? 'edge atoms − 1' : form.shape === 'sphere' ? 'radius in nearest-neighbour distances' : '13, 55, 147, 309 … atoms'}>
          <input name="shells" inputMode="numeric" value={form.shells} onChange={(e) => set('shells', e.target.value)} />
        </Field>
      ) : (
        <Field label="Diameter, nm" name="diameterNm" error={errors.diameterNm} hint="nearest closed shell">
          <input name="diameterNm" inputMode="decimal" value={form.diameterNm} onChange={(e) => set('diameterNm', e.target.value)} />
        </Field>
      )}
      <Field label="Temperature, K" name="temperatureK" error={errors.temperatureK}>
        <input name="temperatureK" inputMode="decimal" value={form.temperatureK} onChange={(e) => set('temperatureK', e.target.value)} />
      </Field>
      <Field label="Sweeps" name="sweeps" error={errors.sweeps} hint="one swap attempt per atom each">
        <input name="sweeps" inputMode="numeric" value={form.sweeps} onChange={(e) => set('sweeps', e.target.value)} />
      </Field>
      <Field label="Seed" name="seed" error={errors.seed}>
        <input name="seed" inputMode="numeric" value={form.seed} onChange={(e) => set('seed', e.target.value)} />
      </Field>
      <fieldset>
        <legend>
          <label>
            <input type="checkbox" name="anneal" checked={form.anneal} onChange={(e) => set('anneal', e.target.checked)} /> Anneal from a high temperature first
          </label>
        </legend>
        {form.anneal ? (
          <div className="form-grid">
            <Field label="Start, K" name="anneal.startTemperatureK" error={errors['anneal.startTemperatureK']}>
              <input name="annealStartK" inputMode="decimal" value={form.annealStartK} onChange={(e) => set('annealStartK', e.target.value)} />
            </Field>
            <Field label="Cooling sweeps" name="anneal.sweeps" error={errors['anneal.sweeps']}>
              <input name="annealSweeps" inputMode="numeric" value={form.annealSweeps} onChange={(e) => set('annealSweeps', e.target.value)} />
            </Field>
          </div>
        ) : (
          <p className="small muted" style={{ margin: 0 }}>
            Geometric cooling to the run temperature before the production sweeps.
          </p>
        )}
      </fieldset>
      <p className={`small ${plan.ok ? 'muted' : ''}`} style={{ gridColumn: '1 / -1', margin: 0 }} data-testid="sim-plan">
        {plan.text}
      </p>
      <p className="small muted" style={{ gridColumn: '1 / -1', margin: 0 }} data-testid="sim-mixing-rule">
        Gupta potential, Cleri &amp; Rosato (1993) parameters, five neighbour shells; {props.mixingRule}.
      </p>
      <div className="form-actions">
        <button type="submit" className="button--primary">
          Run
        </button>
      </div>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </form>
  );
}

function Stat(props: { label: string; value: string; testId?: string }) {
  return (
    <div className="sim-stat">
      <span className="sim-stat__label">{props.label}</span>
      <span className="sim-stat__value" data-testid={props.testId}>
        {props.value}
      </span>
    </div>
  );
}

interface TracePoint {
  sweep: number;
  energyPerAtomEv: number;
  surfaceXB: number;
}

function Traces(props: { points: TracePoint[]; elementB: string; xB: number }) {
  return (
    <div className="sim-charts" data-testid="sim-traces">
      <figure style={{ margin: 0 }}>
        <figcaption className="small">energy per atom, eV, vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={200}>
          <LineChart data={props.points} margin={{ left: 8, right: 16, top: 8, bottom: 8 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="sweep" type="number" domain={['dataMin', 'dataMax']} />
            <YAxis domain={['auto', 'auto']} width={64} tickFormatter={(v: number) => v.toFixed(3)} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(4)} eV`} labelFormatter={(v) => `sweep ${v}`} />
            <Line type="monotone" dataKey="energyPerAtomEv" name="E/N" stroke="#1d4ed8" dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </figure>
      <figure style={{ margin: 0 }}>
        <figcaption className="small">{props.elementB} share of the surface sites vs sweep</figcaption>
        <ResponsiveContainer width="100%" height={200}>
          <LineChart data={props.points.map((p) => ({ ...p, surface: 100 * p.surfaceXB }))} margin={{ left: 8, right: 16, top: 8, bottom: 8 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="sweep" type="number" domain={['dataMin', 'dataMax']} />
            <YAxis domain={[0, 100]} unit="%" width={48} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(1)} %`} labelFormatter={(v) => `sweep ${v}`} />
            <ReferenceLine y={100 * props.xB} stroke="#888" strokeDasharray="4 4" />
            <Line type="monotone" dataKey="surface" name={`surface ${props.elementB}`} stroke="#c2410c" dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </figure>
    </div>
  );
}

function progressPoints(history: SimulationProgress[]): TracePoint[] {
  return history.map((p) => ({ sweep: p.sweep, energyPerAtomEv: p.energyPerAtomEv, surfaceXB: p.surfaceXB }));
}

function resultPoints(result: SimulationResult): TracePoint[] {
  return result.traces.sweep.map((sweep, k) => ({ sweep, energyPerAtomEv: result.traces.energyEv[k]! / result.atoms, surfaceXB: result.traces.surfaceXB[k]! }));
}

const PREDICTION_SHAPE: Record<ClusterShape, 'cuboctahedron' | 'icosahedron' | 'truncated octahedron' | 'sphere'> = {
  cuboctahedron: 'cuboctahedron',
  icosahedron: 'icosahedron',
  'truncated-octahedron': 'truncated octahedron',
  sphere: 'sphere',
};

function PredictionBeside(props: { result: SimulationResult; temperatureK: number }) {
  const { result } = props;
  const prediction = useMemo(() => {
    try {
      return {
        value: predictPair(result.elementA, result.elementB, {
          xB: result.xB,
          diameterNm: result.geometry.equivalentDiameterNm,
          shape: PREDICTION_SHAPE[result.geometry.shape],
          temperatureK: props.temperatureK,
        }),
        error: null,
      };
    } catch (error) {
      return { value: null, error: error instanceof Error ? error.message : String(error) };
    }
  }, [result, props.temperatureK]);
  return (
    <div className="sim-compare" aria-label="Simulation beside the analytic prediction">
      <div>
        <div className="sim-stat__label">Monte Carlo</div>
        <div className="sim-stat__value" data-testid="sim-architecture">
          {result.architecture}
        </div>
        <div className="small">
          surface {result.elementB} {pct(result.surfaceXB)}; {describeArchitecture(result.architecture)}
        </div>
      </div>
      <div>
        <div className="sim-stat__label">Analytic prediction</div>
        {prediction.value ? (
          <>
            <div className="sim-stat__value" data-testid="sim-prediction-architecture">
              {prediction.value.architecture}
            </div>
            <div className="small">
              surface {result.elementB} {pct(prediction.value.surfaceXB)} (Langmuir–McLean with Wynblatt–Ku terms, same size and temperature)
            </div>
          </>
        ) : (
          <div className="small">no analytic prediction: {prediction.error}</div>
        )}
      </div>
    </div>
  );
}

function RadialProfile(props: { result: SimulationResult }) {
  const { result } = props;
  const data = result.radialProfile.map((layer) => ({
    layer: layer.layerFromSurface === 0 ? 'surface' : layer.layerFromSurface === result.radialProfile[0]?.layerFromSurface ? 'centre' : `S−${layer.layerFromSurface}`,
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
          <Tooltip formatter={(v, _name, item) => [`${Number(v).toFixed(1)} % (${(item.payload as { atoms: number }).atoms} atoms)`, `at.% ${result.elementB}`]} />
          <ReferenceLine y={100 * result.xB} stroke="#888" strokeDasharray="4 4" />
          <Bar dataKey="xB" fill="#c2410c" isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}

async function downloadXyz(id: number, onError: (message: string) => void): Promise<void> {
  const result = await call('simulation.exportXyz', { id });
  if (!result.ok) {
    onError(result.error.message);
    return;
  }
  const url = URL.createObjectURL(new Blob([result.value.content], { type: 'chemical/x-xyz' }));
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = result.value.fileName;
  anchor.dataset.testid = 'xyz-download';
  document.body.appendChild(anchor);
  anchor.click();
  anchor.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function ResultPanel(props: { run: SimulationRun; result: SimulationResult }) {
  const { run, result } = props;
  const [error, setError] = useState<string | null>(null);
  const eq = result.equilibration;
  return (
    <div className="stack" data-testid="sim-result">
      <PredictionBeside result={result} temperatureK={run.spec.temperatureK} />
      <div className="sim-stats">
        <Stat label={`surface ${result.elementA}`} value={pct(result.surfaceFraction[result.elementA] ?? 0)} testId="sim-surface-a" />
        <Stat label={`surface ${result.elementB}`} value={`${pct(result.surfaceXB)} ± ${(100 * result.surfaceXBStandardError).toFixed(1)}`} testId="sim-surface-b" />
        <Stat label="Warren–Cowley order, 1st shell" value={num(result.warrenCowley, 3)} testId="sim-warren-cowley" />
        <Stat label="energy per atom" value={`${result.energyPerAtomEv.toFixed(4)} eV`} />
        <Stat label="mixing energy" value={`${(1000 * result.mixingEnergyPerAtomEv).toFixed(1)} meV/atom`} />
        <Stat label="atoms / surface sites" value={`${result.atoms} / ${result.surfaceSites}`} />
        <Stat label="acceptance" value={pct(result.acceptance)} />
        <Stat label="speed" value={`${Math.round(result.attemptsPerSecond).toLocaleString('en-US')} /s`} />
      </div>
      <p className="small muted">
        {eq.equilibrated ? 'Equilibrated' : 'Not equilibrated (energy still drifting in the last quarters: run longer)'}; averages from sweep{' '}
        {eq.equilibratedFromSample + (run.spec.anneal?.sweeps ?? 0) + 1}. Unlike pairs: {result.pairRule.description}. Rigid lattice (no relaxation) at the Vegard spacing{' '}
        {result.geometry.nearestNeighbourAngstrom.toFixed(3)} Å; engine {result.engineVersion}.
      </p>
      <div className="sim-charts">
        <RadialProfile result={result} />
        <ParticlePicture spec={run.spec} occupation={result.finalOccupation} elementA={result.elementA} elementB={result.elementB} />
      </div>
      <Traces points={resultPoints(result)} elementB={result.elementB} xB={result.xB} />
      <div className="form-actions">
        <button type="button" onClick={() => downloadXyz(run.id, setError)}>
          Export extended XYZ
        </button>
      </div>
      {error ? <Banner tone="error">{error}</Banner> : null}
    </div>
  );
}

function RunPanel(props: { id: number; onChanged: () => void }) {
  const { id, onChanged } = props;
  const [run, setRun] = useState<SimulationRun | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    let timer: ReturnType<typeof setTimeout> | null = null;
    const load = async () => {
      const result = await call('simulation.get', { id });
      if (!live) return;
      if (!result.ok) {
        setError(result.error.message);
        return;
      }
      setRun(result.value);
      setError(null);
      if (result.value.status === 'queued' || result.value.status === 'running') timer = setTimeout(load, 400);
      else onChanged();
    };
    setRun(null);
    void load();
    return () => {
      live = false;
      if (timer) clearTimeout(timer);
    };
  }, [id, onChanged]);

  const cancel = async () => {
    const result = await call('simulation.cancel', { id });
    if (!result.ok) setError(result.error.message);
  };

  if (error) return <Banner tone="error">{error}</Banner>;
  if (!run) return <p className="muted">Loading run {id}…</p>;
  const active = run.status === 'queued' || run.status === 'running';
  const fraction = run.progress ? run.progress.sweep / run.progress.totalSweeps : 0;
  const spec = run.spec;
  return (
    <section className="card" aria-label={`Run ${run.id}`} data-testid="sim-run">
      <div className="view__header" style={{ marginBottom: 8 }}>
        <h2 className="card__title">
          Run {run.id}: {spec.elementA}-{spec.elementB}, x({spec.elementB}) = {spec.xB}, {spec.shape}, {run.atoms} atoms, {spec.anneal ? `${spec.anneal.startTemperatureK} → ` : ''}
          {spec.temperatureK} K
        </h2>
        <span className="tag tag--muted" data-testid="sim-status">
          {run.status}
        </span>
      </div>
      {active ? (
        <div className="stack">
          <div className="sim-progress" role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={Math.round(100 * fraction)} data-testid="sim-progress">
            <div className="sim-progress__bar" style={{ width: `${(100 * fraction).toFixed(1)}%` }} />
          </div>
          <p className="small">
            {run.status === 'queued'
              ? 'Waiting for a free worker…'
              : run.progress
                ? `sweep ${run.progress.sweep} of ${run.progress.totalSweeps} (${run.progress.phase}, ${run.progress.temperatureK.toFixed(0)} K), E/N ${run.progress.energyPerAtomEv.toFixed(4)} eV, surface ${spec.elementB} ${pct(run.progress.surfaceXB)}, acceptance ${pct(run.progress.acceptance)}`
                : 'Starting…'}
          </p>
          <div className="form-actions">
            <button type="button" className="button--danger" onClick={cancel}>
              Cancel
            </button>
          </div>
          {run.progressHistory.length > 0 ? <Traces points={progressPoints(run.progressHistory)} elementB={spec.elementB} xB={spec.xB} /> : null}
        </div>
      ) : null}
      {run.status === 'done' && run.result ? <ResultPanel run={run} result={run.result} /> : null}
      {run.status === 'failed' || run.status === 'cancelled' ? <Banner tone={run.status === 'failed' ? 'error' : 'info'}>{run.error ?? run.status}</Banner> : null}
    </section>
  );
}

export function SimulationView() {
  const options = useQuery('simulation.options', {}, 'options');
  const [tick, setTick] = useState(0);
  const runs = useQuery('simulation.list', { limit: 50 }, `runs-${tick}`);
  const [selected, setSelected] = useState<number | null>(null);
  const reload = useMemo(() => () => setTick((t) => t + 1), []);
  const list = runs.data ?? [];
  const anyActive = list.some((r) => r.status === 'queued' || r.status === 'running');
  useEffect(() => {
    if (!anyActive) return;
    const timer = setInterval(reload, 1000);
    return () => clearInterval(timer);
  }, [anyActive, reload]);

  return (
    <div className="view">
      <div className="view__header">
        <h1>Simulation</h1>
        <span className="muted">lattice Monte Carlo of one particle, computed off the window in a worker</span>
      </div>
      {options.error ? <Banner tone="error">{options.error.message}</Banner> : null}
      <div className="sim-layout">
        <div className="stack">
          {options.data ? (
            <RunForm
              elements={options.data.elements}
              mixingRule={options.data.mixingRule}
              onStarted={(run) => {
                setSelected(run.id);
                reload();
              }}
            />
          ) : null}
          <section className="card" aria-label="Stored runs">
            <h2 className="card__title">Stored runs</h2>
            {list.length === 0 ? (
              <p className="muted small">No runs yet.</p>
            ) : (
              <table className="data-table sim-runs" aria-label="Simulation runs">
                <thead>
                  <tr>
                    <th scope="col">#</th>
                    <th scope="col">pair</th>
                    <th scope="col" className="num">
                      atoms
                    </th>
                    <th scope="col" className="num">
                      T, K
                    </th>
                    <th scope="col">status</th>
                    <th scope="col">architecture</th>
                  </tr>
                </thead>
                <tbody>
                  {list.map((r) => (
                    <tr key={r.id} aria-selected={r.id === selected} onClick={() => setSelected(r.id)} data-run={r.id}>
                      <td>{r.id}</td>
                      <td>
                        {r.spec.elementA}-{r.spec.elementB} {Math.round(100 * r.spec.xB)} %
                      </td>
                      <td className="num">{r.atoms}</td>
                      <td className="num">{r.spec.temperatureK}</td>
                      <td>{r.status === 'running' && r.progress ? `${Math.round((100 * r.progress.sweep) / r.progress.totalSweeps)} %` : r.status}</td>
                      <td>{r.architecture ?? '–'}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
          </section>
        </div>
        <div>{selected !== null ? <RunPanel id={selected} onChanged={reload} /> : <p className="muted">Start a run or open a stored one.</p>}</div>
      </div>
    </div>
  );
}
