/**
 * The New run form: pair, composition, shape and size, temperature (or an annealing schedule), seed and
 * length. The planned size (or the first problem) shows while typing; Run queues the run. A request from a
 * pair's detail (app state `pendingHandOffs.simulation`) is taken once and the form says where it came from.
 */
import { useEffect, useMemo, useState, type FormEvent } from 'react';
import type { SimulationRunSummary } from '../../../../shared-model/api/simulation';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { usePendingHandOff } from '../../app-state';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { ShapeSelect } from '../../components/ShapeSelect';
import {
  describeRequest,
  formFromRequest,
  INITIAL_RUN_FORM,
  modeText,
  planText,
  readRunForm,
  shellsHint,
  type RunFormState,
} from './run-form';

export function RunForm(props: {
  elements: readonly string[];
  mixingRule: string;
  onStarted: (run: SimulationRunSummary) => void;
}) {
  const [form, setForm] = useState<RunFormState>(INITIAL_RUN_FORM);
  const [prefilled, setPrefilled] = useState<string | null>(null);
  const { pending: pendingSimulation, clear: clearPendingSimulation } = usePendingHandOff('simulation');
  // A request from a pair's detail is taken once: copied into the form, then cleared from the app state.
  useEffect(() => {
    if (pendingSimulation === null) return;
    setForm((current) => formFromRequest(current, pendingSimulation));
    setPrefilled(describeRequest(pendingSimulation));
    clearPendingSimulation();
  }, [pendingSimulation, clearPendingSimulation]);
  const { errors, general, show, clear } = useFieldErrors();
  const set = <K extends keyof RunFormState>(key: K, value: RunFormState[K]) =>
    setForm((f) => ({ ...f, [key]: value }));
  const plan = useMemo(() => planText(form), [form]);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const reading = readRunForm(form);
    if (!reading.ok) {
      show({ code: 'invalid_input', message: reading.message, field: reading.field });
      return;
    }
    const result = await call('simulation.start', reading.input);
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
  const text = (name: keyof RunFormState & string, inputMode: 'decimal' | 'numeric') => (
    <input name={name} inputMode={inputMode} value={String(form[name])} onChange={(e) => set(name, e.target.value)} />
  );

  return (
    <form
      className="card form-grid sim-form"
      onSubmit={submit}
      aria-label="New simulation"
      noValidate
      data-testid="sim-form"
    >
      <h2 className="card__title">New run</h2>
      {prefilled ? (
        <p className="small" style={{ gridColumn: '1 / -1', margin: 0 }} data-testid="sim-prefilled">
          {prefilled}
        </p>
      ) : null}
      {element('elementA', 'Element A')}
      {element('elementB', 'Element B')}
      <Field label={`x(${form.elementB}), atomic fraction`} name="xB" error={errors.xB} hint="0 < xB < 1">
        {text('xB', 'decimal')}
      </Field>
      <Field label="Shape" name="shape" error={errors.shape}>
        <ShapeSelect name="shape" value={form.shape} onChange={(shape) => set('shape', shape)} />
      </Field>
      <div className="sim-radio" role="radiogroup" aria-label="Size given by">
        <label>
          <input
            type="radio"
            name="sizeMode"
            checked={form.sizeMode === 'shells'}
            onChange={() => set('sizeMode', 'shells')}
          />{' '}
          shells
        </label>
        <label>
          <input
            type="radio"
            name="sizeMode"
            checked={form.sizeMode === 'diameter'}
            onChange={() => set('sizeMode', 'diameter')}
          />{' '}
          diameter
        </label>
      </div>
      {form.sizeMode === 'shells' ? (
        <Field label="Shells around the centre" name="shells" error={errors.shells} hint={shellsHint(form.shape)}>
          {text('shells', 'numeric')}
        </Field>
      ) : (
        <Field label="Diameter, nm" name="diameterNm" error={errors.diameterNm} hint="nearest closed shell">
          {text('diameterNm', 'decimal')}
        </Field>
      )}
      <Field label="Temperature, K" name="temperatureK" error={errors.temperatureK}>
        {text('temperatureK', 'decimal')}
      </Field>
      <Field label="Sweeps (most)" name="sweeps" error={errors.sweeps} hint="one swap attempt per atom each">
        {text('sweeps', 'numeric')}
      </Field>
      <Field label="Atoms" name="relaxation" error={errors.relaxation}>
        <select
          name="relaxation"
          value={form.relaxation}
          onChange={(e) => set('relaxation', e.target.value as RunFormState['relaxation'])}
        >
          <option value="auto">by size mismatch (relaxed above 6 %)</option>
          <option value="rigid">rigid lattice (swap moves only)</option>
          <option value="relaxed">relaxed (swap + displacement moves)</option>
        </select>
      </Field>
      <label style={{ gridColumn: '1 / -1' }}>
        <input
          type="checkbox"
          name="stopAtAnswer"
          checked={form.stopAtAnswer}
          onChange={(e) => set('stopAtAnswer', e.target.checked)}
        />{' '}
        Stop at the answer: once equilibrated and the surface composition is known to ±0.005 (at least 100 sweeps; the
        sweeps above are the cap)
      </label>
      <Field label="Seed" name="seed" error={errors.seed}>
        {text('seed', 'numeric')}
      </Field>
      <fieldset>
        <legend>
          <label>
            <input
              type="checkbox"
              name="anneal"
              checked={form.anneal}
              onChange={(e) => set('anneal', e.target.checked)}
            />{' '}
            Anneal from a high temperature first
          </label>
        </legend>
        {form.anneal ? (
          <div className="form-grid">
            <Field label="Start, K" name="anneal.startTemperatureK" error={errors['anneal.startTemperatureK']}>
              {text('annealStartK', 'decimal')}
            </Field>
            <Field label="Cooling sweeps" name="anneal.sweeps" error={errors['anneal.sweeps']}>
              {text('annealSweeps', 'numeric')}
            </Field>
          </div>
        ) : (
          <p className="small muted" style={{ margin: 0 }}>
            Geometric cooling to the run temperature before the production sweeps.
          </p>
        )}
      </fieldset>
      <p
        className={`small ${plan.ok ? 'muted' : ''}`}
        style={{ gridColumn: '1 / -1', margin: 0 }}
        data-testid="sim-plan"
      >
        {plan.text}
      </p>
      <p className="small" style={{ gridColumn: '1 / -1', margin: 0 }} data-testid="sim-mode">
        {modeText(form)} Swap moves exchange atoms anywhere in the particle: they find the equilibrium arrangement,
        which a real synthesis at low temperature may not reach.
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
