/**
 * Batch design: target particle + route + catalog reagents → amounts, kinetic checks and hazard cautions;
 * save as a planned batch; move saved batches planned → made → characterized; use a batch as seeds.
 */
import { useMemo, useState, type FormEvent, type ReactNode } from 'react';
import type { BatchSummary, CatalogReagent, SavedBatch } from '../../../shared-model/api/batches';
import type { ApiError } from '../../../shared-model/api/result';
import type { BatchDesign } from '../../../shared-model/recipes/design';
import { ROUTE_LABELS, ROUTES, type BatchDesignRequest, type SynthesisRoute } from '../../../shared-model/recipes/design-input';
import { call } from '../api/client';
import { useQuery } from '../api/hooks';
import { useAppState } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { BatchResult, formatNumber } from './BatchResult';
import { targetChoices } from './PairsPanel';
import './batches.css';

type SizeKind = 'alloy' | 'core-shell' | 'core-shell-overall' | 'single-metal';

interface FormState {
  elementA: string;
  elementB: string;
  target: string;
  route: SynthesisRoute;
  sizeKind: SizeKind;
  diameterNm: string;
  xBPct: string;
  coreDiameterNm: string;
  shellValue: string;
  shellUnit: 'nm' | 'ML';
  singleElement: string;
  amountKind: 'total-metal' | 'particle-concentration';
  amountValue: string;
  batchVolumeMl: string;
  seedMetal: string;
  seedDiameterNm: string;
  seedConcKind: 'particles' | 'metal';
  seedConc: string;
  seedVolumeMl: string;
  seedBatchId: string;
  precursorA: string;
  stockA: string;
  precursorB: string;
  stockB: string;
  reducerKey: string;
  reducerExcess: string;
  reducerStock: string;
  cappingKey: string;
  cappingRatio: string;
  cappingStock: string;
  solventKey: string;
  solventVolumeMl: string;
  temperatureC: string;
}

const EXAMPLE: FormState = {
  elementA: 'Pt',
  elementB: 'Ni',
  target: 'alloy',
  route: 'co-reduction',
  sizeKind: 'alloy',
  diameterNm: '4',
  xBPct: '25',
  coreDiameterNm: '',
  shellValue: '',
  shellUnit: 'ML',
  singleElement: 'Pt',
  amountKind: 'total-metal',
  amountValue: '0.1',
  batchVolumeMl: '50',
  seedMetal: '',
  seedDiameterNm: '',
  seedConcKind: 'particles',
  seedConc: '',
  seedVolumeMl: '',
  seedBatchId: '',
  precursorA: 'h2ptcl6-6h2o',
  stockA: '20',
  precursorB: 'nicl2-6h2o',
  stockB: '20',
  reducerKey: 'nabh4',
  reducerExcess: '5',
  reducerStock: '100',
  cappingKey: '',
  cappingRatio: '',
  cappingStock: '',
  solventKey: '',
  solventVolumeMl: '',
  temperatureC: '',
};

/** Text → number for the request; empty → undefined; anything else goes through so the server names the field. */
function numberOf(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  return Number(trimmed);
}

export function buildRequest(f: FormState): BatchDesignRequest {
  const shell = numberOf(f.shellValue);
  let size: BatchDesignRequest['size'];
  switch (f.sizeKind) {
    case 'alloy':
      size = { kind: 'alloy', diameterNm: numberOf(f.diameterNm) as number, xB: (numberOf(f.xBPct) as number) / 100 };
      break;
    case 'single-metal':
      size = { kind: 'single-metal', element: f.singleElement, diameterNm: numberOf(f.diameterNm) as number };
      break;
    case 'core-shell-overall':
      size = { kind: 'core-shell-overall', diameterNm: numberOf(f.diameterNm) as number, shellThicknessNm: shell as number };
      break;
    default: {
      const core = numberOf(f.coreDiameterNm);
      size = {
        kind: 'core-shell',
        ...(core !== undefined && f.route !== 'seed-mediated' ? { coreDiameterNm: core } : {}),
        ...(f.shellUnit === 'nm' ? { shellThicknessNm: shell as number } : { shellMonolayers: shell as number }),
      };
    }
  }
  const seedMode = f.route === 'seed-mediated';
  const seedMetal = f.seedMetal || f.elementA;
  const shellElement = seedMetal === f.elementA ? f.elementB : f.elementA;
  const precursors: BatchDesignRequest['precursors'] = [];
  const addPrecursor = (element: string, key: string, stock: string) => {
    if (!key) return;
    const stockMm = numberOf(stock);
    precursors.push({ element, reagentKey: key, ...(stockMm !== undefined ? { stockMm } : {}) });
  };
  if (seedMode) {
    addPrecursor(shellElement, shellElement === f.elementA ? f.precursorA : f.precursorB, shellElement === f.elementA ? f.stockA : f.stockB);
  } else {
    const single = f.sizeKind === 'single-metal' ? f.singleElement : null;
    if (!single || single === f.elementA) addPrecursor(f.elementA, f.precursorA, f.stockA);
    if (!single || single === f.elementB) addPrecursor(f.elementB, f.precursorB, f.stockB);
  }
  const request: BatchDesignRequest = {
    elementA: f.elementA,
    elementB: f.elementB,
    target: f.target,
    route: f.route,
    size,
    batchVolumeMl: numberOf(f.batchVolumeMl) as number,
    precursors,
  };
  if (!seedMode) {
    const value = numberOf(f.amountValue) as number;
    request.amount = f.amountKind === 'total-metal' ? { kind: 'total-metal', totalMetalMmol: value } : { kind: 'particle-concentration', particlesPerMl: value };
  } else {
    const seedBatchId = numberOf(f.seedBatchId);
    const conc = numberOf(f.seedConc);
    const diameter = numberOf(f.seedDiameterNm);
    request.seeds = {
      metal: seedMetal,
      volumeMl: numberOf(f.seedVolumeMl) as number,
      ...(seedBatchId !== undefined ? { seedBatchId } : {}),
      ...(diameter !== undefined && seedBatchId === undefined ? { diameterNm: diameter } : {}),
      ...(conc !== undefined && seedBatchId === undefined ? (f.seedConcKind === 'particles' ? { particlesPerMl: conc } : { metalMm: conc }) : {}),
    };
  }
  if (f.reducerKey) {
    const excess = numberOf(f.reducerExcess);
    const stockMm = numberOf(f.reducerStock);
    request.reducer = { reagentKey: f.reducerKey, ...(excess !== undefined ? { excess } : {}), ...(stockMm !== undefined ? { stockMm } : {}) };
  }
  if (f.cappingKey) {
    const ratio = numberOf(f.cappingRatio);
    const stockMm = numberOf(f.cappingStock);
    request.capping = { reagentKey: f.cappingKey, molPerMolMetal: ratio as number, ...(stockMm !== undefined ? { stockMm } : {}) };
  }
  if (f.solventKey) {
    const volume = numberOf(f.solventVolumeMl);
    request.solvent = { reagentKey: f.solventKey, ...(volume !== undefined ? { volumeMl: volume } : {}) };
  }
  const temperature = numberOf(f.temperatureC);
  if (temperature !== undefined) request.temperatureC = temperature;
  return request;
}

/** Error field (API path) → the input that shows it. */
function inputForField(field: string, f: FormState): string {
  const path = field.replace(/^design\./, '');
  if (path === 'amount.totalMetalMmol' || path === 'amount.particlesPerMl' || path === 'amount') return 'amount';
  if (path === 'size.shellThicknessNm' || path === 'size.shellMonolayers') return 'shell';
  if (path === 'size.element') return 'size.element';
  if (path.startsWith('seeds.')) return path === 'seeds.metalMm' ? 'seeds.particlesPerMl' : path;
  const precursor = /^precursors\.(\d+)\.(reagentKey|element|stockMm)$/.exec(path);
  if (precursor) {
    const request = buildRequest(f);
    const element = request.precursors[Number(precursor[1])]?.element;
    const slot = element === f.elementB ? 'B' : 'A';
    return precursor[2] === 'stockMm' ? `stock${slot}` : `precursor${slot}`;
  }
  if (path === 'reducer' || path === 'reducer.reagentKey') return 'reducer';
  if (path === 'capping.reagentKey') return 'capping';
  if (path === 'capping.molPerMolMetal' || path === 'capping.concentrationMm') return 'capping.molPerMolMetal';
  if (path === 'solvent' || path === 'solvent.reagentKey') return 'solvent';
  return path;
}

const FIELD_NAMES = new Set([
  'elementA', 'elementB', 'target', 'route', 'size.kind', 'size.diameterNm', 'size.xB', 'size.coreDiameterNm', 'shell', 'size.element', 'amount',
  'batchVolumeMl', 'seeds', 'seeds.metal', 'seeds.diameterNm', 'seeds.particlesPerMl', 'seeds.volumeMl', 'seeds.seedBatchId', 'precursors',
  'precursorA', 'stockA', 'precursorB', 'stockB', 'reducer', 'reducer.excess', 'reducer.stockMm', 'capping', 'capping.molPerMolMetal', 'capping.stockMm', 'solvent',
  'solvent.volumeMl', 'temperatureC', 'name', 'pairId', 'campaignId',
]);

function useFormErrors(form: FormState) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [general, setGeneral] = useState<string | null>(null);
  return {
    errors,
    general,
    show(error: ApiError) {
      const target = error.field ? inputForField(error.field, form) : null;
      if (target && FIELD_NAMES.has(target)) {
        setErrors({ [target]: error.message });
        setGeneral(null);
      } else {
        setErrors({});
        setGeneral(error.message);
      }
    },
    clear() {
      setErrors({});
      setGeneral(null);
    },
  };
}

function ReagentSelect(props: { name: string; value: string; onChange: (value: string) => void; options: CatalogReagent[]; allowNone?: string }) {
  return (
    <select name={props.name} value={props.value} onChange={(event) => props.onChange(event.target.value)}>
      {props.allowNone !== undefined ? <option value="">{props.allowNone}</option> : null}
      {props.options.map((r) => (
        <option key={r.key} value={r.key}>
          {r.name} ({r.formula})
        </option>
      ))}
    </select>
  );
}

function Section(props: { title: string; children: ReactNode }) {
  return (
    <fieldset className="form-section">
      <legend>{props.title}</legend>
      <div className="form-grid">{props.children}</div>
    </fieldset>
  );
}

/** Lots and stock-solution dates of a saved batch (what makes it reproducible); amounts stay as saved. */
function BatchRecords(props: { batch: SavedBatch; onSaved: (batch: SavedBatch) => void }) {
  const reagents = props.batch.design.reagents.filter((r) => r.role !== 'seeds' && r.massMg !== null);
  const localInput = (iso: string) => {
    const date = new Date(iso);
    const offset = date.getTimezoneOffset() * 60_000;
    return new Date(date.getTime() - offset).toISOString().slice(0, 16);
  };
  const [lots, setLots] = useState<Record<string, string>>(() => Object.fromEntries(props.batch.lots.map((l) => [l.reagentKey, l.lot])));
  const [dates, setDates] = useState<Record<string, string>>(() => Object.fromEntries(props.batch.stockAges.map((s) => [s.reagentKey, localInput(s.preparedAt)])));
  const [error, setError] = useState<ApiError | null>(null);
  const save = async () => {
    const stocks = Object.entries(dates)
      .filter(([, value]) => value.trim() !== '')
      .map(([reagentKey, value]) => {
        const time = new Date(value);
        return { reagentKey, preparedAt: Number.isNaN(time.getTime()) ? value : time.toISOString() };
      });
    const result = await call('batches.record', {
      id: props.batch.id,
      lots: Object.entries(lots).map(([reagentKey, lot]) => ({ reagentKey, lot })),
      stocks,
    });
    if (!result.ok) {
      setError(result.error);
      return;
    }
    setError(null);
    props.onSaved(result.value);
  };
  const ages = new Map(props.batch.stockAges.map((s) => [s.reagentKey, s]));
  return (
    <section className="card" aria-label="Lots and stock solutions">
      <h2 className="card__title">Lots and stock solutions of batch #{props.batch.id}</h2>
      <table className="data-table">
        <thead>
          <tr>
            <th>Reagent</th>
            <th>Lot</th>
            <th>Stock prepared</th>
            <th>Age</th>
          </tr>
        </thead>
        <tbody>
          {reagents.map((r) => {
            const age = ages.get(r.key);
            return (
              <tr key={r.key} data-record={r.key}>
                <td>{r.name}</td>
                <td>
                  <input aria-label={`Lot of ${r.name}`} value={lots[r.key] ?? ''} onChange={(e) => setLots((s) => ({ ...s, [r.key]: e.target.value }))} />
                </td>
                <td>
                  <input type="datetime-local" aria-label={`Stock of ${r.name} prepared`} value={dates[r.key] ?? ''} onChange={(e) => setDates((s) => ({ ...s, [r.key]: e.target.value }))} />
                </td>
                <td className={age?.stale ? 'stale' : undefined}>
                  {age ? `${formatNumber(age.ageHours, 3)} h${age.freshnessHours !== null ? ` (limit ${formatNumber(age.freshnessHours, 3)} h)` : ''}${age.stale ? ' — make it fresh' : ''}` : ''}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="form-actions">
        <button type="button" onClick={() => void save()}>
          Save lots and dates
        </button>
      </div>
      {error ? <Banner tone="error">{error.message}</Banner> : null}
    </section>
  );
}

function SavedBatches(props: { batches: BatchSummary[]; onOpen: (id: number) => void; onUseAsSeeds: (batch: BatchSummary) => void; onChanged: () => void }) {
  const [error, setError] = useState<string | null>(null);
  const [measuring, setMeasuring] = useState<number | null>(null);
  const [diameter, setDiameter] = useState('');
  const [conc, setConc] = useState('');
  const move = async (batch: BatchSummary, status: 'made' | 'characterized' | 'planned', measured?: { diameterNm?: number; particlesPerMl?: number }) => {
    const result = await call('batches.setStatus', { id: batch.id, status, ...(measured ? { measured } : {}) });
    if (!result.ok) setError(result.error.message);
    else {
      setError(null);
      setMeasuring(null);
      props.onChanged();
    }
  };
  if (props.batches.length === 0) return <p className="muted">No saved batches yet. Compute a batch and save it as planned.</p>;
  return (
    <>
      {error ? <Banner tone="error">{error}</Banner> : null}
      <table className="data-table" aria-label="Saved batches">
        <thead>
          <tr>
            <th className="num">#</th>
            <th>Name</th>
            <th>Pair</th>
            <th>Target</th>
            <th>Route</th>
            <th className="num">nm</th>
            <th>Status</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {props.batches.map((b) => (
            <tr key={b.id} data-batch={b.name}>
              <td className="num">{b.id}</td>
              <td>
                {b.name}
                {b.seedBatchId ? <span className="tag tag--muted">seeds #{b.seedBatchId}</span> : null}
                {b.catalogChanged ? <span className="tag tag--caution">catalog changed since</span> : null}
              </td>
              <td className="pair-symbol">
                {b.elementA}–{b.elementB}
              </td>
              <td>{b.target}</td>
              <td>{b.route}</td>
              <td className="num">{formatNumber(b.diameterNm, 3)}</td>
              <td data-status={b.status}>{b.status}</td>
              <td className="row-actions">
                <button type="button" className="button--quiet" onClick={() => props.onOpen(b.id)}>
                  Open
                </button>
                {b.status === 'planned' ? (
                  <button type="button" className="button--quiet" onClick={() => void move(b, 'made')}>
                    Mark made
                  </button>
                ) : null}
                {b.status === 'made' && measuring !== b.id ? (
                  <button type="button" className="button--quiet" onClick={() => setMeasuring(b.id)}>
                    Characterized…
                  </button>
                ) : null}
                {measuring === b.id ? (
                  <span className="inline-form">
                    <input aria-label="Measured diameter (nm)" placeholder="d, nm" value={diameter} onChange={(e) => setDiameter(e.target.value)} size={6} />
                    <input aria-label="Measured particles per mL" placeholder="particles/mL" value={conc} onChange={(e) => setConc(e.target.value)} size={10} />
                    <button
                      type="button"
                      onClick={() => {
                        const d = numberOf(diameter);
                        const c = numberOf(conc);
                        void move(b, 'characterized', { ...(d !== undefined ? { diameterNm: d } : {}), ...(c !== undefined ? { particlesPerMl: c } : {}) });
                      }}
                    >
                      Save
                    </button>
                  </span>
                ) : null}
                {b.route !== 'seed-mediated' && b.status !== 'planned' ? (
                  <button type="button" className="button--quiet" onClick={() => props.onUseAsSeeds(b)}>
                    Use as seeds
                  </button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}

export function BatchDesignView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const catalogQuery = useQuery('reagents.catalog', {}, `catalog:${revision}`);
  const batchesQuery = useQuery('batches.list', {}, `batches:${revision}`);
  const pairsQuery = useQuery('pairs.list', campaignId ? { campaignId } : null, `pairs:${campaignId}:${revision}`);
  const [form, setForm] = useState<FormState>(EXAMPLE);
  const [design, setDesign] = useState<BatchDesign | null>(null);
  const [opened, setOpened] = useState<SavedBatch | null>(null);
  const [name, setName] = useState('');
  const [saved, setSaved] = useState<string | null>(null);
  const { errors, general, show, clear } = useFormErrors(form);
  const catalog = useMemo(() => catalogQuery.data ?? [], [catalogQuery.data]);
  const set = <K extends keyof FormState>(key: K) => (value: FormState[K]) => setForm((f) => ({ ...f, [key]: value }));
  const precursorsOf = (element: string) => catalog.filter((r) => r.metal?.symbol === element);
  const reducers = catalog.filter((r) => r.roles.includes('reducer'));
  const cappings = catalog.filter((r) => r.roles.includes('capping-agent'));
  const solvents = catalog.filter((r) => r.roles.includes('solvent'));
  const seedMode = form.route === 'seed-mediated';
  const targets = targetChoices(form.elementA, form.elementB);

  const compute = async (event?: FormEvent) => {
    event?.preventDefault();
    setSaved(null);
    setOpened(null);
    const result = await call('batches.design', buildRequest(form));
    if (!result.ok) {
      show(result.error);
      setDesign(null);
      return;
    }
    clear();
    setDesign(result.value);
  };

  const save = async () => {
    const result = await call('batches.save', { name, campaignId: campaignId ?? null, design: buildRequest(form) });
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    setDesign(result.value.design);
    setSaved(`Saved as batch #${result.value.id} “${result.value.name}” (planned).`);
    setName('');
    bumpRevision();
  };

  const open = async (id: number) => {
    const result = await call('batches.get', { id });
    if (!result.ok) {
      show(result.error);
      return;
    }
    setOpened(result.value);
    setDesign(result.value.design);
  };

  const useAsSeeds = async (batch: BatchSummary) => {
    const result = await call('batches.get', { id: batch.id });
    if (!result.ok) {
      show(result.error);
      return;
    }
    const seedMetal = result.value.design.coreElement ?? batch.elementA;
    setForm((f) => ({ ...f, elementA: batch.elementA, elementB: batch.elementB, route: 'seed-mediated', sizeKind: 'core-shell', seedBatchId: String(batch.id), seedMetal, shellUnit: 'ML', shellValue: f.shellValue || '2', seedVolumeMl: f.seedVolumeMl || '5' }));
  };

  const fillFromPair = (id: string) => {
    const pair = pairsQuery.data?.find((p) => String(p.id) === id);
    if (pair) setForm((f) => ({ ...f, elementA: pair.elementA, elementB: pair.elementB, target: pair.target }));
  };

  return (
    <section className="view batch-design" aria-labelledby="batch-design-title">
      <header className="view__header">
        <h1 id="batch-design-title">Batch design</h1>
        <span className="muted">Target particle → reagent amounts, kinetic checks and hazard cautions</span>
      </header>
      <div className="split split--wide">
        <form className="card batch-form" onSubmit={compute} aria-label="Batch design" noValidate>
          {pairsQuery.data && pairsQuery.data.length > 0 ? (
            <label className="field">
              <span className="field__label">From a campaign pair</span>
              <select aria-label="From a campaign pair" value="" onChange={(event) => fillFromPair(event.target.value)}>
                <option value="">choose…</option>
                {pairsQuery.data.map((p) => (
                  <option key={p.id} value={p.id}>
                    {p.elementA}–{p.elementB} ({p.target})
                  </option>
                ))}
              </select>
            </label>
          ) : null}
          <Section title="Pair and target">
            <Field label="Element A" name="elementA" error={errors.elementA}>
              <input name="elementA" value={form.elementA} onChange={(e) => set('elementA')(e.target.value.trim())} />
            </Field>
            <Field label="Element B" name="elementB" error={errors.elementB}>
              <input name="elementB" value={form.elementB} onChange={(e) => set('elementB')(e.target.value.trim())} />
            </Field>
            <Field label="Target" name="target" error={errors.target}>
              <select name="target" value={form.target} onChange={(e) => set('target')(e.target.value)}>
                {(targets.includes(form.target) ? targets : [form.target, ...targets]).map((t) => (
                  <option key={t} value={t}>
                    {t}
                  </option>
                ))}
              </select>
            </Field>
            <Field label="Route" name="route" error={errors.route} wide>
              <select
                name="route"
                value={form.route}
                onChange={(e) => {
                  const route = e.target.value as SynthesisRoute;
                  setForm((f) => ({ ...f, route, sizeKind: route === 'seed-mediated' ? 'core-shell' : f.sizeKind }));
                }}
              >
                {ROUTES.map((r) => (
                  <option key={r} value={r}>
                    {ROUTE_LABELS[r]}
                  </option>
                ))}
              </select>
            </Field>
          </Section>

          <Section title="Particle">
            {!seedMode ? (
              <Field label="Size given as" name="size.kind" error={errors['size.kind']}>
                <select name="size.kind" value={form.sizeKind} onChange={(e) => set('sizeKind')(e.target.value as SizeKind)}>
                  <option value="alloy">alloy: diameter + composition</option>
                  <option value="core-shell">core diameter + shell</option>
                  <option value="core-shell-overall">overall diameter + shell</option>
                  <option value="single-metal">one metal (seeds)</option>
                </select>
              </Field>
            ) : null}
            {!seedMode && form.sizeKind !== 'core-shell' ? (
              <Field label={form.sizeKind === 'core-shell-overall' ? 'Overall diameter (nm)' : 'Diameter (nm)'} name="size.diameterNm" error={errors['size.diameterNm']}>
                <input name="size.diameterNm" inputMode="decimal" value={form.diameterNm} onChange={(e) => set('diameterNm')(e.target.value)} />
              </Field>
            ) : null}
            {!seedMode && form.sizeKind === 'alloy' ? (
              <Field label={`Composition (at.% ${form.elementB || 'B'})`} name="size.xB" error={errors['size.xB']}>
                <input name="size.xB" inputMode="decimal" value={form.xBPct} onChange={(e) => set('xBPct')(e.target.value)} />
              </Field>
            ) : null}
            {!seedMode && form.sizeKind === 'single-metal' ? (
              <Field label="Metal" name="size.element" error={errors['size.element']}>
                <select name="size.element" value={form.singleElement} onChange={(e) => set('singleElement')(e.target.value)}>
                  {[form.elementA, form.elementB].map((el) => (
                    <option key={el} value={el}>
                      {el}
                    </option>
                  ))}
                </select>
              </Field>
            ) : null}
            {!seedMode && form.sizeKind === 'core-shell' ? (
              <Field label="Core diameter (nm)" name="size.coreDiameterNm" error={errors['size.coreDiameterNm']}>
                <input name="size.coreDiameterNm" inputMode="decimal" value={form.coreDiameterNm} onChange={(e) => set('coreDiameterNm')(e.target.value)} />
              </Field>
            ) : null}
            {seedMode || form.sizeKind === 'core-shell' || form.sizeKind === 'core-shell-overall' ? (
              <Field label={`Shell (${form.sizeKind === 'core-shell-overall' && !seedMode ? 'nm' : form.shellUnit})`} name="shell" error={errors.shell}>
                <span className="input-with-unit">
                  <input name="shell" inputMode="decimal" value={form.shellValue} onChange={(e) => set('shellValue')(e.target.value)} />
                  {form.sizeKind !== 'core-shell-overall' || seedMode ? (
                    <select aria-label="Shell unit" value={form.shellUnit} onChange={(e) => set('shellUnit')(e.target.value as 'nm' | 'ML')}>
                      <option value="ML">monolayers</option>
                      <option value="nm">nm</option>
                    </select>
                  ) : null}
                </span>
              </Field>
            ) : null}
          </Section>

          {seedMode ? (
            <Section title="Seeds">
              <Field label="Seed batch" name="seeds.seedBatchId" error={errors['seeds.seedBatchId']} hint="its measured size and concentration are used">
                <select name="seeds.seedBatchId" value={form.seedBatchId} onChange={(e) => set('seedBatchId')(e.target.value)}>
                  <option value="">none: type the seeds below</option>
                  {(batchesQuery.data ?? [])
                    .filter((b) => b.route !== 'seed-mediated')
                    .map((b) => (
                      <option key={b.id} value={b.id}>
                        #{b.id} {b.name} ({b.status})
                      </option>
                    ))}
                </select>
              </Field>
              <Field label="Seed metal" name="seeds.metal" error={errors['seeds.metal']}>
                <select name="seeds.metal" value={form.seedMetal || form.elementA} onChange={(e) => set('seedMetal')(e.target.value)}>
                  {[form.elementA, form.elementB].map((el) => (
                    <option key={el} value={el}>
                      {el}
                    </option>
                  ))}
                </select>
              </Field>
              {form.seedBatchId === '' ? (
                <>
                  <Field label="Seed diameter (nm)" name="seeds.diameterNm" error={errors['seeds.diameterNm']}>
                    <input name="seeds.diameterNm" inputMode="decimal" value={form.seedDiameterNm} onChange={(e) => set('seedDiameterNm')(e.target.value)} />
                  </Field>
                  <Field label={form.seedConcKind === 'particles' ? 'Seeds per mL' : 'Seed metal (mM)'} name="seeds.particlesPerMl" error={errors['seeds.particlesPerMl']}>
                    <span className="input-with-unit">
                      <input name="seeds.particlesPerMl" inputMode="decimal" value={form.seedConc} onChange={(e) => set('seedConc')(e.target.value)} />
                      <select aria-label="Seed concentration unit" value={form.seedConcKind} onChange={(e) => set('seedConcKind')(e.target.value as 'particles' | 'metal')}>
                        <option value="particles">particles/mL</option>
                        <option value="metal">metal mM</option>
                      </select>
                    </span>
                  </Field>
                </>
              ) : null}
              <Field label="Seed volume used (mL)" name="seeds.volumeMl" error={errors['seeds.volumeMl']}>
                <input name="seeds.volumeMl" inputMode="decimal" value={form.seedVolumeMl} onChange={(e) => set('seedVolumeMl')(e.target.value)} />
              </Field>
            </Section>
          ) : null}

          <Section title="Amount">
            {!seedMode ? (
              <Field label={form.amountKind === 'total-metal' ? 'Total metal (mmol)' : 'Particles per mL'} name="amount" error={errors.amount}>
                <span className="input-with-unit">
                  <input name="amount" inputMode="decimal" value={form.amountValue} onChange={(e) => set('amountValue')(e.target.value)} />
                  <select aria-label="Amount given as" value={form.amountKind} onChange={(e) => set('amountKind')(e.target.value as FormState['amountKind'])}>
                    <option value="total-metal">mmol metal</option>
                    <option value="particle-concentration">particles/mL</option>
                  </select>
                </span>
              </Field>
            ) : null}
            <Field label="Batch volume (mL)" name="batchVolumeMl" error={errors.batchVolumeMl}>
              <input name="batchVolumeMl" inputMode="decimal" value={form.batchVolumeMl} onChange={(e) => set('batchVolumeMl')(e.target.value)} />
            </Field>
            <Field label="Highest temperature (°C)" name="temperatureC" error={errors.temperatureC} hint="default by route">
              <input name="temperatureC" inputMode="decimal" value={form.temperatureC} onChange={(e) => set('temperatureC')(e.target.value)} />
            </Field>
          </Section>

          <Section title="Reagents">
            {errors.precursors ? (
              <p className="field__error field--wide" role="alert" data-error-for="precursors">
                {errors.precursors}
              </p>
            ) : null}
            {[
              { slot: 'A' as const, element: form.elementA, key: form.precursorA, stock: form.stockA },
              { slot: 'B' as const, element: form.elementB, key: form.precursorB, stock: form.stockB },
            ].map(({ slot, element, key, stock }) => (
              <div className="precursor-pair" key={slot}>
                <Field label={`${element || slot} precursor`} name={`precursor${slot}`} error={errors[`precursor${slot}`]}>
                  <ReagentSelect
                    name={`precursor${slot}`}
                    value={key}
                    onChange={(value) => set(slot === 'A' ? 'precursorA' : 'precursorB')(value)}
                    options={[...precursorsOf(element), ...catalog.filter((r) => r.key === key && r.metal?.symbol !== element)]}
                    allowNone="none"
                  />
                </Field>
                <Field label="Stock (mM)" name={`stock${slot}`} error={errors[`stock${slot}`]}>
                  <input name={`stock${slot}`} inputMode="decimal" value={stock} onChange={(e) => set(slot === 'A' ? 'stockA' : 'stockB')(e.target.value)} />
                </Field>
              </div>
            ))}
            <Field label="Reducer" name="reducer" error={errors.reducer}>
              <ReagentSelect name="reducer" value={form.reducerKey} onChange={set('reducerKey')} options={reducers} allowNone="none" />
            </Field>
            <Field label="Excess (× electron balance)" name="reducer.excess" error={errors['reducer.excess']}>
              <input name="reducer.excess" inputMode="decimal" value={form.reducerExcess} onChange={(e) => set('reducerExcess')(e.target.value)} />
            </Field>
            <Field label="Reducer stock (mM)" name="reducer.stockMm" error={errors['reducer.stockMm']}>
              <input name="reducer.stockMm" inputMode="decimal" value={form.reducerStock} onChange={(e) => set('reducerStock')(e.target.value)} />
            </Field>
            <Field label="Capping agent" name="capping" error={errors.capping}>
              <ReagentSelect name="capping" value={form.cappingKey} onChange={set('cappingKey')} options={cappings} allowNone="none" />
            </Field>
            {form.cappingKey ? (
              <Field label="Capping (mol per mol metal)" name="capping.molPerMolMetal" error={errors['capping.molPerMolMetal']}>
                <input name="capping.molPerMolMetal" inputMode="decimal" value={form.cappingRatio} onChange={(e) => set('cappingRatio')(e.target.value)} />
              </Field>
            ) : null}
            <Field label="Solvent" name="solvent" error={errors.solvent} hint="water makes up the volume if none">
              <ReagentSelect name="solvent" value={form.solventKey} onChange={set('solventKey')} options={solvents} allowNone="water (make-up)" />
            </Field>
            {form.solventKey ? (
              <Field label="Solvent volume (mL)" name="solvent.volumeMl" error={errors['solvent.volumeMl']}>
                <input name="solvent.volumeMl" inputMode="decimal" value={form.solventVolumeMl} onChange={(e) => set('solventVolumeMl')(e.target.value)} />
              </Field>
            ) : null}
          </Section>

          <div className="form-actions">
            <button type="submit" className="button--primary">
              Compute
            </button>
            <button type="button" onClick={() => setForm(EXAMPLE)}>
              Reset to example
            </button>
          </div>
          {general ? <Banner tone="error">{general}</Banner> : null}
          <div className="save-row">
            <Field label="Batch name" name="name" error={errors.name}>
              <input name="name" value={name} onChange={(e) => setName(e.target.value)} placeholder="e.g. PtNi-04 4 nm alloy" />
            </Field>
            <button type="button" onClick={() => void save()}>
              Save as planned batch
            </button>
          </div>
          {saved ? <Banner tone="info">{saved}</Banner> : null}
        </form>

        <div className="stack">
          {opened ? (
            <Banner tone={opened.catalogChanges.length > 0 ? 'caution' : 'info'} testId="opened-batch">
              Batch #{opened.id} “{opened.name}”, {opened.status}, saved {opened.createdAt.slice(0, 16).replace('T', ' ')} with the values shown.
              {opened.catalogChanges.length > 0
                ? ` The catalog changed since: ${opened.catalogChanges.map((c) => `${c.name} (revision ${c.savedRevision} → ${c.currentRevision ?? 'removed'})`).join(', ')}. The amounts below are those saved; design again to use the new entries.`
                : ''}
              {opened.stockAges.filter((s) => s.stale).map((s) => ` The ${s.name} stock is ${formatNumber(s.ageHours, 3)} h old, beyond its limit.`)}
              {opened.lots.length > 0 ? ` Lots: ${opened.lots.map((l) => `${l.reagentKey} ${l.lot}`).join(', ')}.` : ''}
            </Banner>
          ) : null}
          {opened ? <BatchRecords key={`${opened.id}:${opened.updatedAt}`} batch={opened} onSaved={setOpened} /> : null}
          {design ? <BatchResult design={design} /> : <p className="card muted">Compute a batch to see atoms, particles, reagent amounts, checks and hazards.</p>}
          <section className="card" aria-label="Saved batches">
            <h2 className="card__title">Saved batches</h2>
            {batchesQuery.error ? <Banner tone="error">{batchesQuery.error.message}</Banner> : null}
            <SavedBatches batches={batchesQuery.data ?? []} onOpen={(id) => void open(id)} onUseAsSeeds={(batch) => void useAsSeeds(batch)} onChanged={bumpRevision} />
          </section>
        </div>
      </div>
    </section>
  );
}
