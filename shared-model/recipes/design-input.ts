/**
 * What a user asks for when designing a batch: the zod schema (shared by the API, the CLI and the view)
 * and its TypeScript type. Units are in the field names.
 */
import { z } from 'zod';
import { idSchema } from '../api/schemas';
import { isMetalSymbol } from '../elements/symbols';

export const ROUTES = ['co-reduction', 'seed-mediated', 'polyol', 'organic'] as const;
export type SynthesisRoute = (typeof ROUTES)[number];

export const ROUTE_LABELS: Record<SynthesisRoute, string> = {
  'co-reduction': 'Co-reduction (aqueous, one pot)',
  'seed-mediated': 'Seed-mediated growth of a shell on existing seeds',
  polyol: 'Polyol reduction (glycol as solvent and reducer)',
  organic: 'Reduction in oleylamine / organic solvent',
};

/** Routes run in water unless the user names another solvent. */
export const AQUEOUS_ROUTES: readonly SynthesisRoute[] = ['co-reduction', 'seed-mediated'];

/** Typical highest temperature of each route (°C), used when the user gives none (common practice). */
export const DEFAULT_TEMPERATURE_C: Record<SynthesisRoute, number> = {
  'co-reduction': 25,
  'seed-mediated': 25,
  polyol: 160,
  organic: 200,
};

/**
 * A positive quantity within its physical range (max inclusive): `what` and the range are in the message.
 * z.number() refuses NaN and ±Infinity (zod 4); `least`, when given, is a floor above 0 (e.g. a 0.5 nm particle).
 */
const positive = (what: string, unit: string, range: { max: number; least?: number }) => {
  const base = z
    .number({ error: `${what} must be a number (${unit})` })
    .gt(0, `${what} must be greater than 0 ${unit}`)
    .max(range.max, `${what} must be at most ${range.max} ${unit}`);
  return range.least === undefined ? base : base.min(range.least, `${what} must be at least ${range.least} ${unit}`);
};

// Physical ranges of a wet-chemistry batch (common practice): particles 0.5 nm–1 µm, amounts up to 10 mol,
// stocks up to 20 M, volumes from 1 µL to 100 L, particle counts up to 1e21 per mL.
const XB_RANGE =
  'composition x_B must lie strictly between 0 and 1 (0 and 100 at.%): a bimetallic batch needs both metals';
const DIAMETER_NM = { least: 0.5, max: 1000 };
const SHELL_NM = { least: 0.01, max: 500 };
const STOCK_MM = { least: 1e-6, max: 20_000 };
const VOLUME_ML = { least: 1e-3, max: 100_000 };
const AMOUNT_MMOL = { least: 1e-9, max: 10_000 };
const PARTICLES_PER_ML = { least: 1, max: 1e21 };

const metalSymbol = z
  .string({ error: 'must be an element symbol' })
  .trim()
  .refine(isMetalSymbol, { error: (issue) => `"${String(issue.input)}" is not one of Pairwright's metals` });

const reagentKey = z.string({ error: 'must name a catalog reagent' }).trim().min(1, 'must name a catalog reagent');

export const sizeSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('alloy'),
      diameterNm: positive('diameter', 'nm', DIAMETER_NM),
      /** Composition: atomic fraction of element B (0–1), as in predictions and outcomes; views show at.%. */
      xB: z
        .number({ error: 'composition must be a number (atomic fraction of B, 0–1)' })
        .gt(0, XB_RANGE)
        .lt(1, XB_RANGE),
    }),
    z
      .object({
        kind: z.literal('core-shell'),
        /** Core diameter; for seed-mediated growth it defaults to the seeds' diameter. */
        coreDiameterNm: positive('core diameter', 'nm', DIAMETER_NM).optional(),
        shellThicknessNm: positive('shell thickness', 'nm', SHELL_NM).optional(),
        shellMonolayers: positive('shell', 'monolayers', { least: 0.01, max: 1000 }).optional(),
      })
      .superRefine((value, ctx) => {
        const given = (value.shellThicknessNm !== undefined ? 1 : 0) + (value.shellMonolayers !== undefined ? 1 : 0);
        if (given !== 1)
          ctx.addIssue({
            code: 'custom',
            path: ['shellThicknessNm'],
            message: 'give the shell as either thickness (nm) or monolayers, exactly one of them',
          });
      }),
    z.object({
      /** One metal only: seeds for a later growth batch of the same pair. */
      kind: z.literal('single-metal'),
      element: metalSymbol,
      diameterNm: positive('diameter', 'nm', DIAMETER_NM),
    }),
    z.object({
      kind: z.literal('core-shell-overall'),
      /** Overall particle diameter, core plus shell. */
      diameterNm: positive('diameter', 'nm', DIAMETER_NM),
      shellThicknessNm: positive('shell thickness', 'nm', SHELL_NM),
    }),
  ],
  { error: 'size.kind must be "alloy", "core-shell", "core-shell-overall" or "single-metal"' },
);
export type SizeTarget = z.infer<typeof sizeSchema>;

export const amountSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('total-metal'), totalMetalMmol: positive('total metal', 'mmol', AMOUNT_MMOL) }),
    z.object({
      kind: z.literal('particle-concentration'),
      particlesPerMl: positive('particle concentration', 'particles/mL', PARTICLES_PER_ML),
    }),
  ],
  { error: 'amount.kind must be "total-metal" or "particle-concentration"' },
);
export type AmountTarget = z.infer<typeof amountSchema>;

export const seedsSchema = z
  .object({
    metal: metalSymbol,
    /** Seed diameter; filled from the seed batch when `seedBatchId` is given. */
    diameterNm: positive('seed diameter', 'nm', DIAMETER_NM).optional(),
    /** Seed concentration as particles per mL … */
    particlesPerMl: positive('seed concentration', 'particles/mL', PARTICLES_PER_ML).optional(),
    /** … or as the metal-atom concentration of the seed dispersion (mM). */
    metalMm: positive('seed metal concentration', 'mM', STOCK_MM).optional(),
    volumeMl: positive('seed volume', 'mL', VOLUME_ML),
    /** Batch the seeds come from (lineage); its measured size and concentration take precedence. */
    seedBatchId: idSchema.optional(),
  })
  .superRefine((value, ctx) => {
    if (value.seedBatchId !== undefined) return;
    if (value.diameterNm === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['diameterNm'],
        message: 'give the seed diameter (nm), or the seed batch it comes from',
      });
    if (value.particlesPerMl === undefined && value.metalMm === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['particlesPerMl'],
        message: 'give the seed concentration, as particles/mL or as metal mM, or the seed batch',
      });
    }
  });
export type SeedsInput = z.infer<typeof seedsSchema>;

export const precursorChoiceSchema = z.object({
  element: metalSymbol,
  reagentKey,
  /** Stock solution concentration (mM of the reagent); gives the volume to pipette. */
  stockMm: positive('stock concentration', 'mM', STOCK_MM).optional(),
});

export const reducerChoiceSchema = z.object({
  reagentKey,
  /**
   * Multiple of the stoichiometric amount from the electron balance (chemist's choice); when omitted, the
   * reducer's common-practice default (recipes/reducers.ts `defaultReducerExcess`), stated in the design.
   */
  excess: positive('reducer excess', '×', { least: 0.01, max: 1000 }).optional(),
  stockMm: positive('stock concentration', 'mM', STOCK_MM).optional(),
});

export const cappingChoiceSchema = z
  .object({
    reagentKey,
    /** Capping agent per metal, mol/mol (PVP: monomer units per metal atom) … */
    molPerMolMetal: positive('capping ratio', 'mol/mol metal', { least: 1e-6, max: 10_000 }).optional(),
    /** … or its final concentration in the batch (mM). */
    concentrationMm: positive('capping concentration', 'mM', STOCK_MM).optional(),
    stockMm: positive('stock concentration', 'mM', STOCK_MM).optional(),
  })
  .superRefine((value, ctx) => {
    const given = (value.molPerMolMetal !== undefined ? 1 : 0) + (value.concentrationMm !== undefined ? 1 : 0);
    if (given !== 1)
      ctx.addIssue({
        code: 'custom',
        path: ['molPerMolMetal'],
        message: 'give the capping amount as mol per mol metal or as final mM, exactly one of them',
      });
  });

export const solventChoiceSchema = z.object({
  reagentKey,
  /** Volume of solvent (mL); omitted for water, which makes the batch up to its volume. */
  volumeMl: positive('solvent volume', 'mL', VOLUME_ML).optional(),
});

export const additiveChoiceSchema = z.object({
  reagentKey,
  amountMmol: positive('additive amount', 'mmol', AMOUNT_MMOL),
  stockMm: positive('stock concentration', 'mM', STOCK_MM).optional(),
});

export const stockRecordSchema = z.object({
  reagentKey,
  /** When the stock solution was made (ISO 8601 date-time). */
  preparedAt: z.iso.datetime({ error: 'must be an ISO date-time such as 2025-03-01T09:30:00Z', offset: true }),
  /** Override of the catalog's freshness limit (hours). */
  freshnessHours: positive('freshness limit', 'h', { least: 0.01, max: 100_000 }).optional(),
});
export type StockRecord = z.infer<typeof stockRecordSchema>;

export const batchDesignInputSchema = z.object({
  elementA: metalSymbol,
  elementB: metalSymbol,
  /** Target architecture label: alloy, A@B, B@A, surface-enriched alloy, Janus, intermetallic. */
  target: z.string({ error: 'must be an architecture such as alloy or Au@Pt' }).trim().min(1, 'must not be empty'),
  route: z.enum(ROUTES, { error: `must be one of: ${ROUTES.join(', ')}` }),
  size: sizeSchema,
  /** Not used by seed-mediated growth (the seeds fix the particle count). */
  amount: amountSchema.optional(),
  batchVolumeMl: positive('batch volume', 'mL', VOLUME_ML),
  seeds: seedsSchema.optional(),
  precursors: z
    .array(precursorChoiceSchema)
    .min(1, 'choose a precursor for each metal to be reduced')
    .max(2, 'at most two precursors'),
  reducer: reducerChoiceSchema.optional(),
  capping: cappingChoiceSchema.optional(),
  solvent: solventChoiceSchema.optional(),
  additives: z.array(additiveChoiceSchema).default([]),
  /** Highest temperature of the procedure (°C); defaults by route. */
  temperatureC: z
    .number({ error: 'must be a number (°C)' })
    .min(-80, 'must be ≥ −80 °C')
    .max(400, 'must be ≤ 400 °C')
    .optional(),
  /** Lattice constants (nm) by element symbol; the service fills them from the element table. */
  latticeNm: z.record(z.string(), positive('lattice constant', 'nm', { least: 0.1, max: 1 })).default({}),
  stocks: z.array(stockRecordSchema).default([]),
});
export type BatchDesignInput = z.output<typeof batchDesignInputSchema>;
export type BatchDesignRequest = z.input<typeof batchDesignInputSchema>;
