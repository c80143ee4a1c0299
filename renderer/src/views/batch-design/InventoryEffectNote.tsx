/** What a status move did to the inventory: what was taken or given back, stocks below zero, unmatched reagents. */
import type { StatusChange } from '../../../../shared-model/api/batches';
import { Banner } from '../../components/Banner';
import { formatNumber } from '../../../../shared-model/text/number-format';

export function InventoryEffectNote({ change }: { change: StatusChange }) {
  const effect = change.inventoryEffect;
  const head = `Batch #${change.id} “${change.name}” is now ${change.status}.`;
  if (!effect) return <Banner tone="info" testId="inventory-effect">{`${head} The inventory was not changed.`}</Banner>;
  const verb = effect.kind === 'used' ? 'Taken from the inventory' : 'Given back to the inventory';
  const tone = effect.warnings.length > 0 ? 'caution' : 'info';
  return (
    <Banner tone={tone} testId="inventory-effect">
      {head} {effect.movements.length > 0 ? `${verb}:` : `${verb}: nothing.`}
      {effect.movements.length > 0 ? (
        <ul>
          {effect.movements.map((m) => (
            <li key={`${m.inventoryId}`} data-reagent={m.reagentKey}>
              {m.reagentName}: {m.delta < 0 ? '−' : '+'}
              {formatNumber(Math.abs(m.delta), 4)} {m.unit}, now {formatNumber(m.after, 4)} {m.unit}
              {m.location ? ` (${m.location})` : ''}
            </li>
          ))}
        </ul>
      ) : null}
      {effect.warnings.map((warning) => (
        <p key={warning} className="warning-line">
          Warning: {warning}
        </p>
      ))}
      {effect.unmatched.map((u) => (
        <p key={u.reagentKey}>
          Not matched — {u.reagentName}: {u.reason}.
        </p>
      ))}
    </Banner>
  );
}
