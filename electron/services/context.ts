import type { Store } from '../../db/store';
import type { OperationName, OperationOutput, ValidatedInput } from '../../shared-model/api/contract';

/** What every service function receives besides its validated input. */
export interface ServiceContext {
  store: Store;
}

export type Handler<Name extends OperationName> = (
  input: ValidatedInput<Name>,
  context: ServiceContext,
) => OperationOutput<Name> | Promise<OperationOutput<Name>>;

/** A service file exports one of these for the operations it answers. */
export type HandlerMap<Names extends OperationName> = { [Name in Names]: Handler<Name> };
