import { z } from 'zod';
import { operation } from './operation';

export interface ElementSummary {
  symbol: string;
  name: string;
  z: number;
}

export const elementOperations = {
  'elements.list': operation<ElementSummary[]>()({
    kind: 'query',
    summary: 'List the metals for pickers',
    input: z.object({}),
  }),
};
