/**
 * The campaign's learned model as Next batches needs it: trained on how many outcomes and when, how many
 * outcomes came since, and Retrain (a job off the main thread: progress and cancel). Model review shows the
 * model's figures; this only says whether proposals can be made from it.
 */
import { useEffect, useState } from 'react';
import type { LearnJob } from '../../../../shared-model/api/learn';
import { call } from '../../api/client';
import { useQuery } from '../../api/hooks';
import { Banner } from '../../components/Banner';

export function ModelStatus(props: { campaignId: number; revision: number; onTrained: () => void }) {
  const review = useQuery('learn.review', { campaignId: props.campaignId }, `${props.campaignId}:${props.revision}`);
  const [job, setJob] = useState<LearnJob | null>(null);
  const [error, setError] = useState<string | null>(null);
  const { onTrained } = props;

  useEffect(() => {
    if (job === null || job.status !== 'running') return;
    const timer = setTimeout(() => {
      void call('learn.job', { jobId: job.id }).then((result) => {
        if (!result.ok) {
          setError(result.error.message);
          setJob(null);
          return;
        }
        setJob(result.value);
        if (result.value.status === 'done') onTrained();
        if (result.value.status === 'failed')
          setError(`the retrain failed: ${result.value.error ?? 'no reason given'}`);
      });
    }, 400);
    return () => clearTimeout(timer);
  }, [job, onTrained]);

  const retrain = async () => {
    setError(null);
    const result = await call('learn.retrain', { campaignId: props.campaignId });
    if (!result.ok) {
      setError(result.error.message);
      return;
    }
    setJob(result.value);
  };
  const cancel = async () => {
    if (!job) return;
    const result = await call('learn.cancel', { jobId: job.id });
    if (!result.ok) setError(result.error.message);
    else setJob(result.value);
  };

  const stored = review.data?.stored ?? null;
  const running = job?.status === 'running';
  let status: string;
  if (review.data === null) status = 'Reading the model…';
  else if (stored === null) status = 'No learned model yet: retrain to learn from the campaign’s outcomes.';
  else if (stored.review.status !== 'ready') status = `The latest model could not be trained: ${stored.review.message}`;
  else
    status =
      `Model ${stored.modelVersion} trained on ${stored.trainedOn.length} outcomes ` +
      `(${stored.createdAt.slice(0, 16).replace('T', ' ')})` +
      (stored.newOutcomes > 0 ? `; ${stored.newOutcomes} outcomes since: retrain to include them.` : '.');
  return (
    <section className="card" aria-label="Learned model">
      <p data-testid="model-status">{status}</p>
      <div className="form-actions">
        <button type="button" onClick={() => void retrain()} disabled={running}>
          {stored === null ? 'Train the model' : 'Retrain'}
        </button>
        {running ? (
          <>
            <progress max={1} value={job.fraction} aria-label="Retrain progress" />
            <span className="small muted">
              {job.stage} ({Math.round(job.fraction * 100)} %)
            </span>
            <button type="button" className="button--quiet" onClick={() => void cancel()}>
              Cancel
            </button>
          </>
        ) : null}
        {job?.status === 'cancelled' ? <span className="small muted">retrain cancelled</span> : null}
      </div>
      {error ? <Banner tone="error">{error}</Banner> : null}
      {review.error ? <Banner tone="error">{review.error.message}</Banner> : null}
    </section>
  );
}
