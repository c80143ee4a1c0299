import { z } from 'zod';
import { operation } from './operation';
import { idSchema, nameSchema } from './schemas';

export interface Campaign {
  id: number;
  name: string;
  description: string;
  archived: boolean;
  /** True for the invented demo campaign; the UI labels it as demo data everywhere. */
  isDemo: boolean;
  pairCount: number;
  createdAt: string;
  updatedAt: string;
}

export const campaignOperations = {
  'campaigns.create': operation<Campaign>()({
    kind: 'command',
    summary: 'Create a campaign',
    input: z.object({
      name: nameSchema,
      description: z.string({ error: 'must be text' }).max(2000, 'must be at most 2000 characters').default(''),
    }),
  }),
  'campaigns.list': operation<Campaign[]>()({
    kind: 'query',
    summary: 'List campaigns',
    input: z.object({ includeArchived: z.boolean({ error: 'must be true or false' }).default(false) }),
  }),
  'campaigns.rename': operation<Campaign>()({
    kind: 'command',
    summary: 'Rename a campaign',
    input: z.object({ id: idSchema, name: nameSchema }),
  }),
  'campaigns.archive': operation<Campaign>()({
    kind: 'command',
    summary: 'Archive or restore a campaign',
    input: z.object({ id: idSchema, archived: z.boolean({ error: 'must be true or false' }).default(true) }),
  }),
  'campaigns.loadDemo': operation<Campaign>()({
    kind: 'command',
    summary: 'Load the demo campaign (invented data, labelled as demo)',
    input: z.object({}),
  }),
};
