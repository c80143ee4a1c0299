/**
 * Totals per reagent over the chosen batches against the inventory; shortfalls highlighted. "Total stock
 * mL" is the stock-solution volume to pipette (uses given as a stock); a neat liquid's volume is shown under it.
 */
import type { ReagentList } from '../../../../shared-model/recipes/reagent-list';
import { formatNumber } from '../../../../shared-model/text/number-format';

export function ReagentTotals(props: { list: ReagentList }) {
  return (
    <table className="data-table" aria-label="Reagent totals">
      <thead>
        <tr>
          <th>Reagent</th>
          <th>Formula</th>
          <th className="num">Total mg</th>
          <th className="num">Total stock mL</th>
          <th>On hand</th>
          <th>Location · lot</th>
          <th className="num">Short by (mg)</th>
          <th>Status</th>
        </tr>
      </thead>
      <tbody>
        {props.list.lines.map((line) => (
          <tr
            key={line.key}
            className={line.status === 'short' ? 'row--short' : undefined}
            data-reagent={line.key}
            data-status={line.status}
          >
            <td>
              {line.name}
              <div className="muted small">
                {line.roles.join(', ')} · batches {line.batchIds.map((id) => `#${id}`).join(' ')}
              </div>
            </td>
            <td>{line.formula}</td>
            <td className="num">{formatNumber(line.totalMassMg)}</td>
            <td className="num" data-column="stock-ml">
              {line.totalStockVolumeMl !== null ? formatNumber(line.totalStockVolumeMl) : '—'}
              {line.totalVolumeMl !== null && line.totalVolumeMl > 0 ? (
                <div className="muted small">{formatNumber(line.totalVolumeMl)} mL neat</div>
              ) : null}
            </td>
            <td>{line.onHandText || '—'}</td>
            <td className="small">
              {line.locations.join('; ')}
              {line.lots.length ? ` · ${line.lots.join('; ')}` : ''}
            </td>
            <td className="num">{line.shortfallMg ? formatNumber(line.shortfallMg) : ''}</td>
            <td>{line.status}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
