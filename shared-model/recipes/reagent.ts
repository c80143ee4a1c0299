/**
 * A catalog reagent: what Pairwright needs to compute amounts (formula → molar mass, assay, density,
 * metal and oxidation state or electrons donated) and to warn (GHS codes, signal word, incompatibility
 * tags, waste stream). `reagentInputSchema` validates a user-added or edited reagent; every message
 * names the field.
 */
import { z } from 'zod';
import { isMetalSymbol } from '../elements/symbols';
import {
  CLASSIFICATION_SOURCE_NOTE,
  isKnownHCode,
  minimumSignalWord,
  stricterSignalWord,
  type SignalWord,
} from '../hazards/ghs';
import { HAZARD_TAGS, type HazardTag } from '../hazards/incompatibilities';
import { WASTE_STREAMS, type WasteStreamId } from '../hazards/waste';
import { fieldWords, userMessage } from '../api/issue-message';
import { DomainError, invalid } from '../api/result';
import { parseFormula } from './formula';
import { REDUCTION_COUPLES } from './potentials';
import { REDUCER_HALF_REACTIONS } from './reducers';

export const REAGENT_ROLES = ['metal-precursor', 'reducer', 'capping-agent', 'solvent', 'additive'] as const;
export type ReagentRole = (typeof REAGENT_ROLES)[number];

export const REAGENT_FORMS = ['solid', 'liquid', 'solution'] as const;
export type ReagentForm = (typeof REAGENT_FORMS)[number];

export interface ReagentMetal {
  symbol: string;
  /** Oxidation state of the metal in the precursor (0 for carbonyls: no electrons needed). */
  oxidationState: number;
  /** Reduction couple of the precursor (id in REDUCTION_COUPLES); null for zero-valent precursors. */
  coupleId: string | null;
}

/** A reagent as typed by a user or stored in the seed data (before the molar mass is computed). */
export interface ReagentInput {
  key: string;
  name: string;
  formula: string;
  roles: ReagentRole[];
  form: ReagentForm;
  /** Mass fraction (%) of `formula` in what is dispensed (37 for 37 wt% formaldehyde solution). */
  assayWtPct: number;
  /** g/mL, needed for liquids and solutions (volume from mass). */
  densityGPerMl?: number | null;
  metal?: ReagentMetal | null;
  /** Supplier's metal content (wt %) for hydrates of variable water (RhCl3·xH2O); overrides the formula for masses. */
  metalContentWtPct?: number | null;
  /** Id in REDUCER_HALF_REACTIONS for reagents that reduce. */
  reducerHalfReactionId?: string | null;
  hCodes: string[];
  signalWord: SignalWord | null;
  tags: HazardTag[];
  wasteStream: WasteStreamId;
  /** Default freshness limit of a stock solution (hours); null = no limit suggested. */
  stockFreshnessHours?: number | null;
  /** What one "mmol" means when not a formula unit (e.g. "monomer unit" for PVP). */
  amountUnitNote?: string | null;
  notes?: string;
  source?: string;
}

export interface Reagent extends ReagentInput {
  molarMassGPerMol: number;
  /** Formula as handed to mf-parser. */
  normalizedFormula: string;
  source: string;
  notes: string;
}

/** Above 0 and at least `least` (a floor that keeps amounts computed from it finite); z.number() refuses ±Infinity. */
const finitePositive = (what: string, least: number, unit: string) =>
  z
    .number({ error: `${what} must be a number` })
    .positive(`${what} must be greater than 0`)
    .min(least, `${what} must be at least ${least} ${unit}`);

const keySchema = z
  .string({ error: 'must be text' })
  .trim()
  .regex(/^[a-z0-9][a-z0-9-]{0,63}$/, 'must be 1–64 lower-case letters, digits or dashes (e.g. "haucl4-3h2o")');

export const reagentMetalSchema = z.object({
  symbol: z
    .string({ error: 'must be an element symbol' })
    .trim()
    .refine(isMetalSymbol, { error: (issue) => `"${String(issue.input)}" is not one of Pairwright's metals` }),
  oxidationState: z
    .number({ error: 'must be a number' })
    .int('must be a whole number')
    .min(0, 'must be ≥ 0')
    .max(8, 'must be ≤ 8'),
  coupleId: z.string().nullable().default(null),
});

export const reagentInputSchema = z
  .object({
    key: keySchema,
    name: z
      .string({ error: 'must be text' })
      .trim()
      .min(1, 'must not be empty')
      .max(160, 'must be at most 160 characters'),
    formula: z.string({ error: 'must be a chemical formula' }).trim().min(1, 'must not be empty'),
    roles: z
      .array(z.enum(REAGENT_ROLES, { error: `must be one of: ${REAGENT_ROLES.join(', ')}` }))
      .min(1, 'needs at least one role'),
    form: z.enum(REAGENT_FORMS, { error: `must be one of: ${REAGENT_FORMS.join(', ')}` }),
    assayWtPct: finitePositive('assay', 0.01, '%').max(100, 'assay must be at most 100 %').default(100),
    densityGPerMl: finitePositive('density', 0.01, 'g/mL')
      .max(25, 'density must be below 25 g/mL')
      .nullable()
      .optional(),
    metal: reagentMetalSchema.nullable().optional(),
    metalContentWtPct: finitePositive('metal content', 0.01, '%')
      .max(100, 'metal content must be at most 100 %')
      .nullable()
      .optional(),
    reducerHalfReactionId: z.string().nullable().optional(),
    hCodes: z.array(z.string().trim().toUpperCase()).default([]),
    signalWord: z.enum(['Danger', 'Warning']).nullable().default(null),
    tags: z
      .array(z.enum(HAZARD_TAGS as [HazardTag, ...HazardTag[]], { error: `must be one of: ${HAZARD_TAGS.join(', ')}` }))
      .default([]),
    wasteStream: z.enum(Object.keys(WASTE_STREAMS) as [WasteStreamId, ...WasteStreamId[]], {
      error: `must be one of: ${Object.keys(WASTE_STREAMS).join(', ')}`,
    }),
    stockFreshnessHours: finitePositive('freshness limit', 0.01, 'h')
      .max(100_000, 'freshness limit must be at most 100000 h')
      .nullable()
      .optional(),
    amountUnitNote: z.string().max(200).nullable().optional(),
    notes: z.string().max(2000, 'must be at most 2000 characters').default(''),
    source: z.string().max(500).default(CLASSIFICATION_SOURCE_NOTE),
  })
  .superRefine((value, ctx) => {
    if (typeof value.formula === 'string' && value.formula.trim().length > 0) {
      try {
        const parsed = parseFormula(value.formula, 'formula');
        if (value.metal && typeof value.metal.symbol === 'string' && !(value.metal.symbol in parsed.atoms)) {
          ctx.addIssue({
            code: 'custom',
            path: ['metal', 'symbol'],
            message: `formula ${value.formula} contains no ${value.metal.symbol}`,
          });
        }
      } catch (error) {
        if (!(error instanceof DomainError)) throw error;
        ctx.addIssue({ code: 'custom', path: ['formula'], message: error.message });
      }
    }
    const roles = value.roles ?? [];
    if (roles.includes('metal-precursor') && !value.metal) {
      ctx.addIssue({
        code: 'custom',
        path: ['metal'],
        message: 'a metal precursor needs its metal and oxidation state',
      });
    }
    if (value.metal) {
      const { coupleId, oxidationState, symbol } = value.metal;
      if (oxidationState > 0 && coupleId === null) {
        ctx.addIssue({
          code: 'custom',
          path: ['metal', 'coupleId'],
          message: `a ${symbol}(${oxidationState}) precursor needs its reduction couple; known: ${Object.keys(REDUCTION_COUPLES).join(', ')}`,
        });
      }
      if (coupleId !== null) {
        const couple = REDUCTION_COUPLES[coupleId];
        if (!couple) {
          ctx.addIssue({
            code: 'custom',
            path: ['metal', 'coupleId'],
            message: `unknown reduction couple "${coupleId}"; known: ${Object.keys(REDUCTION_COUPLES).join(', ')}`,
          });
        } else if (
          couple.metal !== symbol ||
          couple.oxidationState !== oxidationState ||
          couple.reducedOxidationState !== 0
        ) {
          ctx.addIssue({
            code: 'custom',
            path: ['metal', 'coupleId'],
            message: `couple ${coupleId} reduces ${couple.metal}(${couple.oxidationState}) to ${couple.reducedOxidationState === 0 ? 'the metal' : `${couple.metal}(${couple.reducedOxidationState})`}, not ${symbol}(${oxidationState}) to ${symbol}`,
          });
        }
      }
    }
    if (roles.includes('reducer')) {
      const id = value.reducerHalfReactionId;
      if (!id)
        ctx.addIssue({
          code: 'custom',
          path: ['reducerHalfReactionId'],
          message: `a reducer needs its half-reaction; known: ${Object.keys(REDUCER_HALF_REACTIONS).join(', ')}`,
        });
      else if (!REDUCER_HALF_REACTIONS[id])
        ctx.addIssue({
          code: 'custom',
          path: ['reducerHalfReactionId'],
          message: `unknown half-reaction "${id}"; known: ${Object.keys(REDUCER_HALF_REACTIONS).join(', ')}`,
        });
    }
    if ((value.form === 'liquid' || value.form === 'solution') && !value.densityGPerMl) {
      ctx.addIssue({
        code: 'custom',
        path: ['densityGPerMl'],
        message: `a ${value.form} needs its density (g/mL) to turn mass into volume`,
      });
    }
    const codes = value.hCodes ?? [];
    const unknown = codes.filter((code) => !isKnownHCode(code));
    if (unknown.length > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['hCodes'],
        message: `unknown or unsupported H-code(s) ${unknown.join(', ')} (UN GHS codes; EU sub-codes like H350i go in notes)`,
      });
    } else {
      const minimum = minimumSignalWord(codes);
      const stated = value.signalWord ?? null;
      if (minimum !== null && stricterSignalWord(stated, minimum) !== stated) {
        ctx.addIssue({
          code: 'custom',
          path: ['signalWord'],
          message: `${codes.join(', ')} call for the signal word "${minimum}", got ${stated === null ? 'none' : `"${stated}"`}`,
        });
      }
      if (codes.length === 0 && stated !== null) {
        ctx.addIssue({ code: 'custom', path: ['signalWord'], message: 'a signal word needs at least one H-code' });
      }
    }
  });

/** Validates and completes a reagent (molar mass computed from the formula). Throws `invalid(field, …)`. */
export function prepareReagent(input: unknown): Reagent {
  const parsed = reagentInputSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const field = issue ? issue.path.map(String).join('.') : 'reagent';
    const words = issue ? fieldWords(issue.path) : '';
    throw invalid(field || 'reagent', userMessage(words, issue?.message ?? 'the reagent was refused', 'reagent'));
  }
  const value = parsed.data;
  const formula = parseFormula(value.formula, 'formula');
  return {
    ...value,
    formula: formula.formula,
    hCodes: [...new Set(value.hCodes)],
    molarMassGPerMol: formula.molarMassGPerMol,
    normalizedFormula: formula.normalized,
    metal: value.metal ?? null,
    notes: value.notes,
    source: value.source,
  };
}

export function hasRole(reagent: Pick<ReagentInput, 'roles'>, role: ReagentRole): boolean {
  return reagent.roles.includes(role);
}

/** Electrons one formula unit gives as a reducer (0 if it is not one). */
export function electronsDonated(reagent: Pick<ReagentInput, 'reducerHalfReactionId'>): number {
  const id = reagent.reducerHalfReactionId;
  return id ? (REDUCER_HALF_REACTIONS[id]?.electrons ?? 0) : 0;
}
