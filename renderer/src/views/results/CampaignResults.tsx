/** A campaign's outcomes: prediction vs outcome per batch, and the confusion matrix of predicted vs observed labels. */
import { useState } from 'react';
import { useQuery } from '../../api/hooks';
import { Banner } from '../../components/Banner';
import { ConfusionHeatmap } from './ConfusionHeatmap';
import { fixed } from './format';

export function CampaignResults(props: {
  campaignId: number;
  revision: number;
  onOpenBatch: (batchId: number) => void;
}) {
  const [against, setAgainst] = useState<'prediction' | 'simulation'>('prediction');
  const rows = useQuery(
    'outcomes.listByCampaign',
    { campaignId: props.campaignId },
    `${props.campaignId}:${props.revision}`,
  );
  const confusion = useQuery(
    'outcomes.confusion',
    { campaignId: props.campaignId, against },
    `${props.campaignId}:${against}:${props.revision}`,
  );
  const list = rows.data ?? [];
  const m = confusion.data?.matrix;
  return (
    <>
      <section className="card" aria-label="Prediction vs outcome">
        <h2 className="card__title">Prediction vs outcome</h2>
        {rows.error ? <Banner tone="error">{rows.error.message}</Banner> : null}
        {list.length === 0 ? (
          <p className="muted">No batches in this campaign yet.</p>
        ) : (
          <table className="data-table" aria-label="Prediction vs outcome table">
            <thead>
              <tr>
                <th>batch</th>
                <th>pair</th>
                <th>predicted</th>
                <th>simulated</th>
                <th>observed</th>
                <th>agreement</th>
                <th>mean d (nm)</th>
                <th>CV (%)</th>
                <th>line-scan model</th>
              </tr>
            </thead>
            <tbody>
              {list.map((row) => (
                <tr key={row.batchId} data-batch={row.batchName}>
                  <td>
                    <button type="button" className="button--quiet" onClick={() => props.onOpenBatch(row.batchId)}>
                      {row.batchName}
                    </button>
                  </td>
                  <td>
                    {row.elementA}–{row.elementB}
                  </td>
                  <td>{row.predicted ?? '–'}</td>
                  <td>{row.simulated ?? '–'}</td>
                  <td>
                    {row.observed ?? '–'}
                    {row.decision === 'override' ? <span className="tag tag--muted">override</span> : null}
                  </td>
                  <td className={row.agreement ? `agreement--${row.agreement.replace(' ', '-')}` : undefined}>
                    {row.agreement ?? '–'}
                  </td>
                  <td>{fixed(row.meanDiameterNm)}</td>
                  <td>{fixed(row.cvPercent, 1)}</td>
                  <td>
                    {row.lineScanModel ?? '–'}
                    {row.lineScanEvidence ? <span className="muted small"> ({row.lineScanEvidence})</span> : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      <section className="card" aria-label="Confusion matrix">
        <h2 className="card__title">Confusion matrix</h2>
        <label className="toggle">
          compare observed with{' '}
          <select
            value={against}
            onChange={(event) => setAgainst(event.target.value as 'prediction' | 'simulation')}
            aria-label="Compare with"
          >
            <option value="prediction">the analytic prediction</option>
            <option value="simulation">the simulation</option>
          </select>
        </label>
        {confusion.error ? <Banner tone="error">{confusion.error.message}</Banner> : null}
        {m ? (
          <>
            <p data-testid="agreement-summary">
              {m.total} batch{m.total === 1 ? '' : 'es'} compared: {m.exactAgreement} agree exactly
              {m.exactAgreementRate !== null ? ` (${(m.exactAgreementRate * 100).toFixed(0)} %)` : ''},{' '}
              {m.kindAgreement} agree in kind.
              {confusion.data && confusion.data.unmatched > 0
                ? ` ${confusion.data.unmatched} observed batch(es) have no ${against} to compare with.`
                : ''}
            </p>
            <ConfusionHeatmap matrix={m} predictedLabel={against === 'prediction' ? 'predicted' : 'simulated'} />
          </>
        ) : null}
      </section>
    </>
  );
}
