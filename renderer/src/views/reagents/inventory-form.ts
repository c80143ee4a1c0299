/** The Add to inventory form as a pure model: the typed amount read by the one number reader, the input named. */
import type { OperationInput } from '../../../../shared-model/api/contract';
import type { InventoryUnit } from '../../../../shared-model/recipes/reagent-list';
import { fieldNumber, readForm, type FormReading } from '../../forms/typed-numbers';

export interface InventoryFormState {
  reagentKey: string;
  amount: string;
  unit: InventoryUnit;
  location: string;
  lot: string;
}

export const EMPTY_INVENTORY_FORM: InventoryFormState = {
  reagentKey: '',
  amount: '',
  unit: 'g',
  location: '',
  lot: '',
};

/** The entry to store; the amount's range and the reagent are checked by the contract. */
export function readInventoryForm(f: InventoryFormState): FormReading<OperationInput<'inventory.upsert'>> {
  return readForm(() => ({
    reagentKey: f.reagentKey,
    amount: fieldNumber(f.amount, 'amount', 'amount on hand'),
    unit: f.unit,
    location: f.location,
    lot: f.lot,
  }));
}
