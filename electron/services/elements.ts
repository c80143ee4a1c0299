import type { elementOperations } from '../../shared-model/api/elements';
import { METALS } from '../../shared-model/elements/symbols';
import type { HandlerMap } from './context';

export const elementHandlers: HandlerMap<keyof typeof elementOperations> = {
  'elements.list': () => METALS.map((metal) => ({ symbol: metal.symbol, name: metal.name, z: metal.z })),
};
