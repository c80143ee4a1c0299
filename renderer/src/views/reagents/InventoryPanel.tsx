/** The inventory: the add form and the entries on hand, each removable. */
import type { CatalogReagent, InventoryRecord } from '../../../../shared-model/api/batches';
import { InventoryForm } from './InventoryForm';

export function InventoryPanel(props: {
  catalog: CatalogReagent[];
  items: InventoryRecord[];
  onSaved: () => void;
  onRemove: (id: number) => void;
}) {
  return (
    <section className="card" aria-label="Inventory">
      <h2 className="card__title">Inventory</h2>
      <InventoryForm catalog={props.catalog} onSaved={props.onSaved} />
      <table className="data-table" aria-label="Inventory entries">
        <tbody>
          {props.items.map((item) => (
            <tr key={item.id}>
              <td>{item.reagentName}</td>
              <td className="num">
                {item.amount} {item.unit}
              </td>
              <td className="muted small">
                {item.location}
                {item.lot ? ` · lot ${item.lot}` : ''}
              </td>
              <td>
                <button
                  type="button"
                  className="button--quiet"
                  onClick={() => props.onRemove(item.id)}
                  aria-label={`Remove ${item.reagentName} ${item.lot}`}
                >
                  Remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
