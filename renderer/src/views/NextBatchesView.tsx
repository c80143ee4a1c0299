/**
 * Next batches: what to make next week for a target (the syntax of rank: alloy, core@shell, core@shell:X,
 * Janus, intermetallic). Proposals come from the campaign's learned model (learn.propose: P(target) × P(success)
 * ÷ metal cost, Thompson sampling, at most one per pair, exploration slots marked), each with its one-line
 * reason and Plan this, which opens Batch design filled in. A proposal meets the target when its posterior mean
 * P(target) is at least 0.5; when fewer than asked do, the view says so and shows the closest, marked. Metal prices per gram (with their date) are entered
 * here; metals without a price are named. The form's model is next-batches/next-batches-form.ts.
 */
import { useEffect, useState, type FormEvent } from 'react';
import type { ProposalSet } from '../../../shared-model/api/learn';
import { call } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { useAppState, useHandOffTo } from '../app-state';
import { Banner } from '../components/Banner';
import { Field } from '../components/Field';
import { ModelStatus } from './next-batches/ModelStatus';
import { PricesPanel } from './next-batches/PricesPanel';
import {
  compositionText,
  costText,
  INITIAL_NEXT_BATCHES_FORM,
  meetsText,
  metalsWithoutPrice,
  missingPriceText,
  planFromProposal,
  probabilityText,
  proposalsTitle,
  readNextBatchesForm,
  routeText,
  TARGET_EXAMPLES,
  type NextBatchesFormState,
} from './next-batches/next-batches-form';

function ProposalTable(props: { set: ProposalSet }) {
  const requestBatchPlan = useHandOffTo('batch-design');
  const { set } = props;
  return (
    <table className="data-table" aria-label="Proposals">
      <thead>
        <tr>
          <th>#</th>
          <th>Pair</th>
          <th>Composition</th>
          <th>Size</th>
          <th>Route</th>
          <th title="posterior mean ± standard deviation">P(target)</th>
          <th>P(success)</th>
          <th title={`metal of one batch (${set.metalMmolPerBatch} mmol)`}>Cost per batch</th>
          <th title={`posterior mean P(target) at least ${set.threshold}`}>Meets the target?</th>
          <th>Reason</th>
          <th />
        </tr>
      </thead>
      <tbody>
        {set.proposals.map((p, i) => (
          <tr
            key={`${p.pair}:${i}`}
            data-proposal={p.pair}
            data-exploration={p.exploration ? 'yes' : 'no'}
            data-meets={p.meetsTarget ? 'yes' : 'no'}
            className={p.meetsTarget ? undefined : 'muted'}
          >
            <td>{i + 1}</td>
            <td>
              {p.pair}
              {p.exploration ? (
                <>
                  {' '}
                  <span
                    className="tag tag--caution"
                    title="an exploration slot: an untried pair or one where physics and model disagree"
                  >
                    exploration
                  </span>
                </>
              ) : null}
            </td>
            <td>{compositionText(p)}</td>
            <td>{p.diameterNm} nm</td>
            <td>
              {routeText(p.route)}, {Number(p.temperatureK.toFixed(1))} K
            </td>
            <td data-cell="probability">
              {probabilityText(p)} <span className="muted small">({p.targetLabel})</span>
            </td>
            <td>{p.successProbability.toFixed(2)}</td>
            <td data-cell="cost" style={{ whiteSpace: 'nowrap' }}>
              {costText(p)}
            </td>
            <td className="small" data-cell="meets" style={{ whiteSpace: 'nowrap' }}>
              {meetsText(p, set.threshold)}
            </td>
            <td className="small" data-cell="reason">
              {p.reason}
            </td>
            <td>
              <button
                type="button"
                onClick={() => requestBatchPlan(planFromProposal(p, set.metalMmolPerBatch, set.target))}
              >
                Plan this
              </button>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function ProposalForm(props: { campaignId: number; missingPrices: string[]; onSet: (set: ProposalSet) => void }) {
  const [form, setForm] = useState<NextBatchesFormState>(INITIAL_NEXT_BATCHES_FORM);
  const { errors, general, show, clear } = useFieldErrors();
  const set = <K extends keyof NextBatchesFormState>(key: K, value: NextBatchesFormState[K]) =>
    setForm((f) => ({ ...f, [key]: value }));

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const reading = readNextBatchesForm(form, props.campaignId);
    if (!reading.ok) {
      show(reading.error);
      return;
    }
    const result = await call('learn.propose', reading.value);
    if (!result.ok) {
      show(result.error, { campaignId: '' });
      return;
    }
    clear();
    props.onSet(result.value);
  };

  return (
    <form className="card form-grid" onSubmit={submit} aria-label="Propose next batches" noValidate>
      <Field
        label="Target"
        name="target"
        error={errors.target}
        hint="alloy, core@shell, core@shell:X (X in the shell), Janus or intermetallic"
      >
        <input
          name="target"
          list="next-batch-targets"
          value={form.target}
          onChange={(e) => set('target', e.target.value)}
        />
      </Field>
      <datalist id="next-batch-targets">
        {TARGET_EXAMPLES.map((t) => (
          <option key={t} value={t} />
        ))}
      </datalist>
      <Field label="Proposals" name="count" error={errors.count}>
        <input name="count" inputMode="numeric" value={form.count} onChange={(e) => set('count', e.target.value)} />
      </Field>
      <Field
        label="Exploration slots"
        name="explorationSlots"
        error={errors.explorationSlots}
        hint="of these, kept for untried pairs or where physics and model disagree"
      >
        <input
          name="explorationSlots"
          inputMode="numeric"
          value={form.explorationSlots}
          onChange={(e) => set('explorationSlots', e.target.value)}
        />
      </Field>
      <label className="field">
        <span className="field__label">Failed conditions</span>
        <span>
          <input
            type="checkbox"
            name="includeFailed"
            checked={form.includeFailed}
            onChange={(e) => set('includeFailed', e.target.checked)}
          />{' '}
          propose again where a synthesis failed
        </span>
      </label>
      <div className="form-actions field--wide">
        <button type="submit" className="button--primary">
          Propose
        </button>
        {props.missingPrices.length > 0 ? (
          <span className="small muted">without cost for {props.missingPrices.join(', ')}</span>
        ) : null}
      </div>
      {general ? (
        <div className="field--wide">
          <Banner tone="error">{general}</Banner>
        </div>
      ) : null}
    </form>
  );
}

export function NextBatchesView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const [proposalSet, setProposalSet] = useState<ProposalSet | null>(null);
  useEffect(() => setProposalSet(null), [campaignId]);
  const pairs = useQuery('pairs.list', campaignId ? { campaignId } : null, `pairs:${campaignId}:${revision}`);
  const history = useQuery('learn.history', campaignId ? { campaignId } : null, `history:${campaignId}:${revision}`);
  const prices = useQuery('learn.prices', {}, `prices:${revision}`);
  const campaignPairs = [
    ...(pairs.data ?? []).map((p) => `${p.elementA}-${p.elementB}`),
    ...(history.data?.outcomes ?? []).map((o) => o.pair),
  ];
  const missing = metalsWithoutPrice(campaignPairs, prices.data?.latest ?? []);
  const missingText = prices.data ? missingPriceText(missing) : null;

  return (
    <section className="view" aria-labelledby="next-batches-title">
      <header className="view__header">
        <h1 id="next-batches-title">Next batches</h1>
        <span className="muted">What to make next week: proposals from what the group has seen</span>
      </header>
      {campaignId === null ? (
        <p className="muted">Choose a campaign first; proposals come from its outcomes.</p>
      ) : (
        <div className="stack">
          <ModelStatus campaignId={campaignId} revision={revision} onTrained={bumpRevision} />
          <ProposalForm campaignId={campaignId} missingPrices={missing} onSet={setProposalSet} />
          {missingText ? (
            <Banner tone="caution" testId="missing-prices">
              {missingText}
            </Banner>
          ) : null}
          {proposalSet ? (
            <section className="card" aria-label="Proposed batches">
              <h2 className="card__title">{proposalsTitle(proposalSet)}</h2>
              <p className="muted small">
                Ranked by P(target) × P(success) ÷ metal cost over {proposalSet.candidatesConsidered} untested
                conditions ({proposalSet.excludedTested} already made, {proposalSet.excludedFailed} failed left out);
                one posterior draw per slot, at most one proposal per pair; a proposal meets the target when its
                posterior mean P(target) is at least {proposalSet.threshold}. Model {proposalSet.modelVersion} (
                {proposalSet.trainedOn.length} outcomes); cost for {proposalSet.metalMmolPerBatch} mmol of metal.
              </p>
              {proposalSet.meetingNote ? (
                <Banner tone="info" testId="meeting-note">
                  {proposalSet.meetingNote}
                </Banner>
              ) : null}
              {proposalSet.targetNote ? <Banner tone="caution">{proposalSet.targetNote}</Banner> : null}
              {proposalSet.costNote ? <Banner tone="caution">{proposalSet.costNote}</Banner> : null}
              {proposalSet.proposals.length === 0 ? (
                <p className="muted">No untested condition can reach this target; try another target.</p>
              ) : (
                <ProposalTable set={proposalSet} />
              )}
            </section>
          ) : null}
          <PricesPanel
            prices={prices.data}
            error={prices.error?.message ?? null}
            missing={missing}
            onSaved={bumpRevision}
          />
        </div>
      )}
    </section>
  );
}
