/**
 * Batch design: target particle + route + catalog reagents → amounts, kinetic checks and hazard cautions;
 * save as a planned batch; move saved batches planned → made → characterized; use a batch as seeds.
 * The form's model is renderer/src/views/batch-design/batch-form.ts; its parts live beside it.
 */
import { useEffect, useMemo, useState } from 'react';
import type { BatchSummary, SavedBatch } from '../../../shared-model/api/batches';
import type { BatchDesign } from '../../../shared-model/recipes/design';
import { call } from '../api/client';
import { useFieldErrors, useQuery } from '../api/hooks';
import { useAppState, usePendingHandOff } from '../app-state';
import { Banner } from '../components/Banner';
import { BatchForm } from './batch-design/BatchForm';
import { BatchRecords } from './batch-design/BatchRecords';
import type { ApiError } from '../../../shared-model/api/result';
import {
  EXAMPLE_BATCH_FORM,
  computeFailureText,
  growOnSeeds,
  placeError,
  readBatchForm,
  readingError,
  withPair,
  type BatchFormState,
} from './batch-design/batch-form';
import { OpenedBatchBanner } from './batch-design/OpenedBatchBanner';
import { describePlan, formFromPlan } from './batch-design/plan-request';
import { SavedBatches } from './batch-design/SavedBatches';
import { BatchResult } from './BatchResult';
import './batches.css';

export function BatchDesignView() {
  const { campaignId, revision, bumpRevision } = useAppState();
  const catalogQuery = useQuery('reagents.catalog', {}, `catalog:${revision}`);
  // The current campaign's batches (archived campaigns' batches hidden); the switch shows every batch.
  const [everyBatch, setEveryBatch] = useState(false);
  const listScope = everyBatch || campaignId === null ? { includeArchived: everyBatch } : { campaignId };
  const batchesQuery = useQuery('batches.list', listScope, `batches:${JSON.stringify(listScope)}:${revision}`);
  // Seeds come only from batches that were made (or characterized), of the same scope.
  const seedScope = { ...listScope, statuses: ['made' as const, 'characterized' as const] };
  const seedsQuery = useQuery('batches.list', seedScope, `seed-batches:${JSON.stringify(seedScope)}:${revision}`);
  const pairsQuery = useQuery('pairs.list', campaignId ? { campaignId } : null, `pairs:${campaignId}:${revision}`);
  const [form, setForm] = useState<BatchFormState>(EXAMPLE_BATCH_FORM);
  const [design, setDesign] = useState<BatchDesign | null>(null);
  // The form a shown design was computed from (null for an opened saved batch), and the last Compute's failure.
  const [computedFrom, setComputedFrom] = useState<BatchFormState | null>(null);
  const [failure, setFailure] = useState<ApiError | null>(null);
  const [opened, setOpened] = useState<SavedBatch | null>(null);
  const [name, setName] = useState('');
  const [saved, setSaved] = useState<string | null>(null);
  const { errors, general, show, clear } = useFieldErrors();
  const catalog = useMemo(() => catalogQuery.data ?? [], [catalogQuery.data]);
  // A batch planned from Next batches is taken once the catalog is read (for each metal's precursor).
  const { pending: pendingBatchPlan, clear: clearPendingBatchPlan } = usePendingHandOff('batch-design');
  const [prefilled, setPrefilled] = useState<string | null>(null);
  useEffect(() => {
    if (pendingBatchPlan === null || !catalogQuery.data) return;
    const plan = pendingBatchPlan;
    setForm((current) => formFromPlan(current, plan, catalogQuery.data ?? []));
    setPrefilled(describePlan(plan));
    setDesign(null);
    setOpened(null);
    clearPendingBatchPlan();
  }, [pendingBatchPlan, catalogQuery.data, clearPendingBatchPlan]);

  /** The request, or the error shown beside the input whose text is not a number. */
  const request = () => {
    const reading = readBatchForm(form);
    if (reading.ok) return { ok: true as const, request: reading.request };
    const error = readingError(reading);
    show(error);
    return { ok: false as const, error };
  };

  /** A failed Compute: no design is left on show, and the result pane says why. */
  const failed = (error: ApiError) => {
    setDesign(null);
    setComputedFrom(null);
    setFailure(error);
  };

  const compute = async () => {
    setSaved(null);
    setOpened(null);
    const asked = form;
    const reading = request();
    if (!reading.ok) {
      failed(reading.error);
      return;
    }
    const result = await call('batches.design', reading.request);
    if (!result.ok) {
      const placed = placeError(result.error, form);
      show(placed);
      failed(placed);
      return;
    }
    clear();
    setFailure(null);
    setDesign(result.value);
    setComputedFrom(asked);
  };

  const save = async () => {
    const reading = request();
    if (!reading.ok) return;
    const design = reading.request;
    const result = await call('batches.save', { name, campaignId: campaignId ?? null, design });
    if (!result.ok) {
      show(placeError(result.error, form));
      return;
    }
    clear();
    setFailure(null);
    setDesign(result.value.design);
    setComputedFrom(form);
    setSaved(`Saved as batch #${result.value.id} “${result.value.name}” (planned).`);
    setName('');
    bumpRevision();
  };

  const open = async (id: number) => {
    const result = await call('batches.get', { id });
    if (!result.ok) {
      show(placeError(result.error, form));
      return;
    }
    setOpened(result.value);
    setFailure(null);
    setComputedFrom(null);
    setDesign(result.value.design);
  };

  const useAsSeeds = async (batch: BatchSummary) => {
    const result = await call('batches.get', { id: batch.id });
    if (!result.ok) {
      show(placeError(result.error, form));
      return;
    }
    const seedMetal = result.value.design.coreElement ?? batch.elementA;
    setForm((f) => withPair(growOnSeeds(f, batch, seedMetal), {}, catalog));
  };

  return (
    <section className="view batch-design" aria-labelledby="batch-design-title">
      <header className="view__header">
        <h1 id="batch-design-title">Batch design</h1>
        <span className="muted">Target particle → reagent amounts, kinetic checks and hazard cautions</span>
      </header>
      {prefilled ? (
        <Banner tone="info" testId="batch-prefilled">
          {prefilled}
        </Banner>
      ) : null}
      <div className="split split--wide">
        <BatchForm
          form={form}
          onForm={setForm}
          errors={errors}
          general={general}
          catalog={catalog}
          pairs={pairsQuery.data ?? []}
          batches={seedsQuery.data ?? []}
          name={name}
          onName={setName}
          saved={saved}
          onCompute={() => void compute()}
          onSave={() => void save()}
        />
        <div className="stack">
          {opened ? <OpenedBatchBanner batch={opened} /> : null}
          {opened ? <BatchRecords key={`${opened.id}:${opened.updatedAt}`} batch={opened} onSaved={setOpened} /> : null}
          {failure ? (
            <div className="card" data-testid="compute-failure">
              <Banner tone="error">{computeFailureText(failure)}</Banner>
            </div>
          ) : null}
          {design && computedFrom !== null && computedFrom !== form ? (
            <Banner tone="caution" testId="result-stale">
              The inputs changed since this result was computed: Compute again to see the amounts for them.
            </Banner>
          ) : null}
          {design ? (
            <BatchResult design={design} />
          ) : failure ? null : (
            <p className="card muted">Compute a batch to see atoms, particles, reagent amounts, checks and hazards.</p>
          )}
          <section className="card" aria-label="Saved batches">
            <h2 className="card__title">Saved batches</h2>
            <label className="small">
              <input type="checkbox" checked={everyBatch} onChange={(e) => setEveryBatch(e.target.checked)} /> Show
              every campaign’s batches, archived ones too
            </label>
            {batchesQuery.error ? <Banner tone="error">{batchesQuery.error.message}</Banner> : null}
            <SavedBatches
              batches={batchesQuery.data ?? []}
              onOpen={(id) => void open(id)}
              onUseAsSeeds={(batch) => void useAsSeeds(batch)}
              onChanged={bumpRevision}
            />
          </section>
        </div>
      </div>
    </section>
  );
}
