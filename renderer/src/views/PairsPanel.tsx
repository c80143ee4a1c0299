/** The candidate pairs of one campaign: add, change status or target, remove (with confirmation). */
import { useState, type FormEvent } from 'react';
import type { Campaign } from '../../../shared-model/api/campaigns';
import { PAIR_STATUSES, type CandidatePair, type PairStatus } from '../../../shared-model/api/pairs';
import { describeArchitecture } from '../../../shared-model/architecture/labels';
import { call } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { Banner } from '../components/Banner';
import { ConfirmDialog } from '../components/ConfirmDialog';
import { Field } from '../components/Field';

export function targetChoices(a: string, b: string): string[] {
  const base = ['alloy', 'surface-enriched alloy'];
  const shells = a && b && a !== b ? [`${a}@${b}`, `${b}@${a}`] : [];
  return [...base, ...shells, 'Janus', 'intermetallic'];
}

/** Where a `pairs.add` error is shown: the element at fault, or the first element for the pair as a whole. */
const PAIR_FIELD_INPUTS = { 'pair.elementA': 'elementA', 'pair.elementB': 'elementB', pair: 'elementA' };

function AddPairForm(props: { campaign: Campaign; onAdded: () => void }) {
  const elements = useQuery('elements.list', {}, 'elements');
  const [elementA, setElementA] = useState('');
  const [elementB, setElementB] = useState('');
  const [target, setTarget] = useState('alloy');
  const [notes, setNotes] = useState('');
  const { errors, general, show, clear } = useFieldErrors();
  const choices = targetChoices(elementA, elementB);
  const chosenTarget = choices.includes(target) ? target : 'alloy';
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    if (!elementA || !elementB) {
      const missing = !elementA ? 'elementA' : 'elementB';
      const which = !elementA ? 'first' : 'second';
      show({ code: 'invalid_input', message: `Choose the ${which} element of the pair`, field: missing });
      return;
    }
    const result = await call('pairs.add', {
      campaignId: props.campaign.id,
      pair: `${elementA}-${elementB}`,
      target: chosenTarget,
      notes,
    });
    if (!result.ok) {
      // an unknown element is shown under that element; a fault of the pair as a whole under the first
      show(result.error, PAIR_FIELD_INPUTS);
      return;
    }
    clear();
    setElementA('');
    setElementB('');
    setTarget('alloy');
    setNotes('');
    props.onAdded();
  };
  const options = elements.data ?? [];
  return (
    <form className="card form-grid" onSubmit={submit} aria-label="Add pair" noValidate>
      <h2 className="card__title">Add a candidate pair</h2>
      <datalist id="element-symbols">
        {options.map((element) => (
          <option key={element.symbol} value={element.symbol}>
            {element.name}
          </option>
        ))}
      </datalist>
      <Field label="Element A" name="elementA" error={errors.elementA} hint="symbol, e.g. Pt">
        <input
          name="elementA"
          list="element-symbols"
          value={elementA}
          onChange={(event) => setElementA(event.target.value.trim())}
          autoComplete="off"
        />
      </Field>
      <Field label="Element B" name="elementB" error={errors.elementB} hint="symbol, e.g. Ni">
        <input
          name="elementB"
          list="element-symbols"
          value={elementB}
          onChange={(event) => setElementB(event.target.value.trim())}
          autoComplete="off"
        />
      </Field>
      <Field label="Target architecture" name="target" error={errors.target} hint={describeArchitecture(chosenTarget)}>
        <select name="target" value={chosenTarget} onChange={(event) => setTarget(event.target.value)}>
          {choices.map((choice) => (
            <option key={choice} value={choice}>
              {choice}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Notes" name="notes" error={errors.notes} wide>
        <input name="notes" value={notes} onChange={(event) => setNotes(event.target.value)} />
      </Field>
      <div className="form-actions">
        <button type="submit" className="button--primary">
          Add pair
        </button>
      </div>
      {general ? <Banner tone="error">{general}</Banner> : null}
    </form>
  );
}

function PairRow(props: { pair: CandidatePair; onChanged: () => void; onRemove: () => void }) {
  const { pair } = props;
  const [error, setError] = useState<string | null>(null);
  const update = async (changes: { status?: PairStatus; target?: string }) => {
    const result = await call('pairs.update', { id: pair.id, ...changes });
    if (!result.ok) setError(result.error.message);
    else {
      setError(null);
      props.onChanged();
    }
  };
  return (
    <tr data-pair={`${pair.elementA}-${pair.elementB}`}>
      <th scope="row" className="pair-symbol">
        {pair.elementA}–{pair.elementB}
      </th>
      <td>
        <select
          aria-label={`Target of ${pair.elementA}-${pair.elementB}`}
          value={pair.target}
          onChange={(event) => update({ target: event.target.value })}
        >
          {targetChoices(pair.elementA, pair.elementB).map((choice) => (
            <option key={choice} value={choice}>
              {choice}
            </option>
          ))}
        </select>
      </td>
      <td>
        <select
          aria-label={`Status of ${pair.elementA}-${pair.elementB}`}
          value={pair.status}
          onChange={(event) => update({ status: event.target.value as PairStatus })}
        >
          {PAIR_STATUSES.map((status) => (
            <option key={status} value={status}>
              {status}
            </option>
          ))}
        </select>
      </td>
      <td className="notes-cell">
        {pair.notes}
        {error ? <span className="field__error">{error}</span> : null}
      </td>
      <td>
        <button
          type="button"
          className="button--quiet"
          onClick={props.onRemove}
          aria-label={`Remove ${pair.elementA}-${pair.elementB}`}
        >
          Remove
        </button>
      </td>
    </tr>
  );
}

export function PairsPanel(props: { campaign: Campaign; onChanged: () => void }) {
  const { campaign } = props;
  const pairs = useQuery('pairs.list', { campaignId: campaign.id }, `${campaign.id}:${campaign.updatedAt}`);
  const [removing, setRemoving] = useState<CandidatePair | null>(null);
  const [error, setError] = useState<string | null>(null);
  const confirmRemove = async () => {
    if (!removing) return;
    const result = await call('pairs.remove', { id: removing.id, confirm: true });
    setRemoving(null);
    if (!result.ok) setError(result.error.message);
    else {
      setError(null);
      props.onChanged();
    }
  };
  return (
    <div className="stack">
      <div className="card">
        <h2 className="card__title">
          {campaign.name} {campaign.isDemo ? <span className="tag tag--demo">demo data</span> : null}
        </h2>
        {campaign.description ? <p className="muted">{campaign.description}</p> : null}
        {campaign.isDemo ? (
          <Banner tone="demo">Invented demo data: the pairs, notes and results here are not measurements.</Banner>
        ) : null}
        {pairs.error ? <Banner tone="error">{pairs.error.message}</Banner> : null}
        {error ? <Banner tone="error">{error}</Banner> : null}
        {pairs.data && pairs.data.length === 0 ? (
          <p className="muted">No pairs yet. Add the first candidate below.</p>
        ) : null}
        {pairs.data && pairs.data.length > 0 ? (
          <table className="data-table" aria-label="Candidate pairs">
            <thead>
              <tr>
                <th scope="col">Pair</th>
                <th scope="col">Target</th>
                <th scope="col">Status</th>
                <th scope="col">Notes</th>
                <th scope="col">
                  <span className="visually-hidden">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {pairs.data.map((pair) => (
                <PairRow
                  key={`${pair.id}:${pair.updatedAt}`}
                  pair={pair}
                  onChanged={props.onChanged}
                  onRemove={() => setRemoving(pair)}
                />
              ))}
            </tbody>
          </table>
        ) : null}
      </div>
      {!campaign.archived ? (
        <AddPairForm campaign={campaign} onAdded={props.onChanged} />
      ) : (
        <Banner tone="info">This campaign is archived; restore it to add pairs.</Banner>
      )}
      {removing ? (
        <ConfirmDialog
          title={`Remove ${removing.elementA}–${removing.elementB}?`}
          message={`The pair leaves "${campaign.name}". This cannot be undone.`}
          confirmLabel="Remove pair"
          onConfirm={confirmRemove}
          onCancel={() => setRemoving(null)}
        />
      ) : null}
    </div>
  );
}
