/**
 * Metal prices per gram with their date (learn.setPrice / learn.prices): the latest price of each metal and a
 * form to enter one; the campaign's metals without a price are named and offered first. Prices are kept in the
 * store with the date they were quoted on; they change too fast to ship with the app.
 */
import { useState, type FormEvent } from 'react';
import type { MetalPriceView } from '../../../../shared-model/api/learn';
import { call } from '../../api/client';
import { useFieldErrors } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { Field } from '../../components/Field';
import { initialPriceForm, readPriceForm, type PriceFormState } from './next-batches-form';

const today = (): string => new Date().toISOString().slice(0, 10);

export function PricesPanel(props: {
  prices: { latest: MetalPriceView[] } | null;
  error: string | null;
  missing: string[];
  onSaved: () => void;
}) {
  const [form, setForm] = useState<PriceFormState>(() => initialPriceForm(today(), props.missing[0] ?? ''));
  const [saved, setSaved] = useState<string | null>(null);
  const { errors, general, show, clear } = useFieldErrors();
  const set = (key: keyof PriceFormState, value: string) => setForm((f) => ({ ...f, [key]: value }));

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setSaved(null);
    const reading = readPriceForm(form);
    if (!reading.ok) {
      show(reading.error);
      return;
    }
    const result = await call('learn.setPrice', reading.value);
    if (!result.ok) {
      show(result.error);
      return;
    }
    clear();
    const p = result.value;
    setSaved(`${p.symbol}: ${p.pricePerGram} ${p.currency} per gram on ${p.pricedOn}.`);
    const next = props.missing.find((s) => s !== p.symbol) ?? '';
    setForm(initialPriceForm(form.pricedOn, next));
    props.onSaved();
  };

  const latest = props.prices?.latest ?? [];
  return (
    <section className="card" aria-label="Metal prices">
      <h2 className="card__title">Metal prices</h2>
      <p className="muted small">
        Price per gram of each metal with the date it was quoted on (the cost of a batch is its metal: the total metal
        per batch split by the composition, times each metal’s molar mass and price).
      </p>
      {props.error ? <Banner tone="error">{props.error}</Banner> : null}
      {latest.length > 0 ? (
        <table className="data-table" aria-label="Latest metal prices">
          <thead>
            <tr>
              <th>Metal</th>
              <th>Price per gram</th>
              <th>Quoted on</th>
            </tr>
          </thead>
          <tbody>
            {latest.map((p) => (
              <tr key={p.symbol} data-price={p.symbol}>
                <td>{p.symbol}</td>
                <td>
                  {p.pricePerGram} {p.currency}
                </td>
                <td>{p.pricedOn}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : props.prices ? (
        <p className="muted">No prices entered yet.</p>
      ) : null}
      <form className="form-grid" onSubmit={submit} aria-label="Enter a metal price" noValidate>
        <Field
          label="Metal"
          name="symbol"
          error={errors.symbol}
          hint={props.missing.length > 0 ? `no price yet: ${props.missing.join(', ')}` : undefined}
        >
          <input name="symbol" value={form.symbol} onChange={(e) => set('symbol', e.target.value)} />
        </Field>
        <Field label="Price per gram" name="pricePerGram" error={errors.pricePerGram}>
          <input
            name="pricePerGram"
            inputMode="decimal"
            value={form.pricePerGram}
            onChange={(e) => set('pricePerGram', e.target.value)}
          />
        </Field>
        <Field label="Currency" name="currency" error={errors.currency}>
          <input name="currency" value={form.currency} onChange={(e) => set('currency', e.target.value)} />
        </Field>
        <Field label="Quoted on" name="pricedOn" error={errors.pricedOn}>
          <input name="pricedOn" type="date" value={form.pricedOn} onChange={(e) => set('pricedOn', e.target.value)} />
        </Field>
        <div className="form-actions field--wide">
          <button type="submit">Save price</button>
          {saved ? <span className="small muted">{saved}</span> : null}
        </div>
        {general ? (
          <div className="field--wide">
            <Banner tone="error">{general}</Banner>
          </div>
        ) : null}
      </form>
    </section>
  );
}
