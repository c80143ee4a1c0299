/**
 * What the batch-design stage tests share: the seeded catalog, indexed as the stages read it, fixed
 * lattice constants, and a request parsed through the contract's schema.
 */
import { indexCatalog } from '../../shared-model/recipes/design/common';
import {
  batchDesignInputSchema,
  type BatchDesignInput,
  type BatchDesignRequest,
} from '../../shared-model/recipes/design-input';
import { prepareReagent } from '../../shared-model/recipes/reagent';
import { REAGENT_SEED } from '../../shared-model/recipes/reagent-seed';

export const seededCatalog = REAGENT_SEED.map((r) => prepareReagent(r));
export const catalogIndex = indexCatalog(seededCatalog);

// Kittel, Introduction to Solid State Physics, 8th ed. (from memory)
const LATTICE: Record<string, number> = { Au: 0.40782, Pt: 0.39242, Ag: 0.40853, Ni: 0.3524, Pd: 0.38907 };
export const kittelLattice = (symbol: string): number | undefined => LATTICE[symbol];

export const parseRequest = (request: BatchDesignRequest): BatchDesignInput => batchDesignInputSchema.parse(request);
