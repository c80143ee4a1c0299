/**
 * The catalog editor's form as a pure model: the typed text of a reagent, filled from a catalog entry when
 * editing, read into the input of `reagents.add` / `reagents.edit` (numbers through the one reader, the input
 * at fault named), and where the API's fields show their errors.
 */
import type { CatalogReagent } from '../../../../shared-model/api/batches';
import type { ReagentInput } from '../../../../shared-model/recipes/reagent';
import { fieldNumber, optionalFieldNumber, readForm, type FormReading } from '../../forms/typed-numbers';

export const EMPTY_REAGENT = {
  key: '',
  name: '',
  formula: '',
  role: 'metal-precursor',
  form: 'solid',
  assayWtPct: '100',
  densityGPerMl: '',
  metalSymbol: '',
  oxidationState: '',
  coupleId: '',
  reducerHalfReactionId: '',
  hCodes: '',
  signalWord: '',
  tags: '',
  wasteStream: 'precious-metal-recovery',
  notes: '',
};
export type ReagentFormState = typeof EMPTY_REAGENT;

/** API field → the input that shows its error. */
export const REAGENT_FIELD_ALIASES: Record<string, string> = {
  'metal.symbol': 'metalSymbol',
  'metal.oxidationState': 'oxidationState',
  'metal.coupleId': 'coupleId',
  metal: 'metalSymbol',
  roles: 'role',
};

export function fromCatalog(r: CatalogReagent): ReagentFormState {
  return {
    key: r.key,
    name: r.name,
    formula: r.formula,
    role: r.roles[0] ?? 'additive',
    form: r.form,
    assayWtPct: String(r.assayWtPct),
    densityGPerMl: r.densityGPerMl ? String(r.densityGPerMl) : '',
    metalSymbol: r.metal?.symbol ?? '',
    oxidationState: r.metal ? String(r.metal.oxidationState) : '',
    coupleId: r.metal?.coupleId ?? '',
    reducerHalfReactionId: r.reducerHalfReactionId ?? '',
    hCodes: r.hCodes.join(' '),
    signalWord: r.signalWord ?? '',
    tags: r.tags.join(' '),
    wasteStream: r.wasteStream,
    notes: r.notes,
  };
}

const words = (text: string) => text.split(/[\s,]+/).filter((word) => word.length > 0);

/**
 * The reagent to add, or (when `editing`) its next revision: the chosen role first, the entry's other roles
 * and its unedited settings kept. Codes and tags are checked by the contract.
 */
export function readReagentForm(f: ReagentFormState, editing: CatalogReagent | null): FormReading<ReagentInput> {
  return readForm(() => {
    const roles = editing ? [f.role, ...editing.roles.filter((r) => r !== f.role)] : [f.role];
    const metal =
      f.metalSymbol.trim() === ''
        ? null
        : {
            symbol: f.metalSymbol.trim(),
            oxidationState: fieldNumber(f.oxidationState, 'oxidationState', 'oxidation state'),
            coupleId: f.coupleId === '' ? null : f.coupleId,
          };
    const kept = editing
      ? {
          stockFreshnessHours: editing.stockFreshnessHours ?? null,
          metalContentWtPct: editing.metalContentWtPct ?? null,
          amountUnitNote: editing.amountUnitNote ?? null,
          source: editing.source,
        }
      : {};
    const input = {
      key: f.key,
      name: f.name,
      formula: f.formula,
      roles: roles as ReagentInput['roles'],
      form: f.form as ReagentInput['form'],
      assayWtPct: fieldNumber(f.assayWtPct, 'assayWtPct', 'assay, wt %'),
      densityGPerMl: optionalFieldNumber(f.densityGPerMl, 'densityGPerMl', 'density, g/mL'),
      metal,
      reducerHalfReactionId: f.reducerHalfReactionId === '' ? null : f.reducerHalfReactionId,
      hCodes: words(f.hCodes),
      signalWord: f.signalWord === '' ? null : (f.signalWord as 'Danger' | 'Warning'),
      tags: words(f.tags) as ReagentInput['tags'],
      wasteStream: f.wasteStream as ReagentInput['wasteStream'],
      notes: f.notes,
      ...kept,
    };
    return input as ReagentInput;
  });
}
