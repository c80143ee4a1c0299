/**
 * What a user asks for when designing a batch: the zod schema (shared by the API, the CLI and the view)
 * and its TypeScript type. Units are in the field names.
 */
import { z } from 'zod';
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

const positive = (what: string, unit: string) =>
  z
    .number({ error: `${what} must be a number (${unit})` })
    .refine(Number.isFinite, { error: `${what} must be a finite number` })
    .refine((v) => v > 0, { error: `${what} must be greater than 0 ${unit}` });

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
      diameterNm: positive('diameter', 'nm'),
      /** Composition: atomic fraction of element B (0–1), as in predictions and outcomes; views show at.%. */
      xB: z
        .number({ error: 'composition must be a number (atomic fraction of B, 0–1)' })
        .refine((v) => Number.isFinite(v) && v > 0 && v < 1, {
          error:
            'composition x_B must lie strictly between 0 and 1 (0 and 100 at.%): a bimetallic batch needs both metals',
        }),
    }),
    z
      .object({
        kind: z.literal('core-shell'),
        /** Core diameter; for seed-mediated growth it defaults to the seeds' diameter. */
        coreDiameterNm: positive('core diameter', 'nm').optional(),
        shellThicknessNm: positive('shell thickness', 'nm').optional(),
        shellMonolayers: positive('shell', 'monolayers').optional(),
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
      diameterNm: positive('diameter', 'nm'),
    }),
    z.object({
      kind: z.literal('core-shell-overall'),
      /** Overall particle diameter, core plus shell. */
      diameterNm: positive('diameter', 'nm'),
      shellThicknessNm: positive('shell thickness', 'nm'),
    }),
  ],
  { error: 'size.kind must be "alloy", "core-shell", "core-shell-overall" or "single-metal"' },
);
export type SizeTarget = z.infer<typeof sizeSchema>;

export const amountSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('total-metal'), totalMetalMmol: positive('total metal', 'mmol') }),
    z.object({
      kind: z.literal('particle-concentration'),
      particlesPerMl: positive('particle concentration', 'particles/mL'),
    }),
  ],
  { error: 'amount.kind must be "total-metal" or "particle-concentration"' },
);
export type AmountTarget = z.infer<typeof amountSchema>;

export const seedsSchema = z
  .object({
    metal: metalSymbol,
    /** Seed diameter; filled from the seed batch when `seedBatchId` is given. */
    diameterNm: positive('seed diameter', 'nm').optional(),
    /** Seed concentration as particles per mL … */
    particlesPerMl: positive('seed concentration', 'particles/mL').optional(),
    /** … or as the metal-atom concentration of the seed dispersion (mM). */
    metalMm: positive('seed metal concentration', 'mM').optional(),
    volumeMl: positive('seed volume', 'mL'),
    /** Batch the seeds come from (lineage); its measured size and concentration take precedence. */
    seedBatchId: z.number().int().positive().optional(),
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
  stockMm: positive('stock concentration', 'mM').optional(),
});

export const reducerChoiceSchema = z.object({
  reagentKey,
  /** Multiple of the stoichiometric amount from the electron balance (chemist's choice). */
  excess: positive('reducer excess', '×').default(1),
  stockMm: positive('stock concentration', 'mM').optional(),
});

export const cappingChoiceSchema = z
  .object({
    reagentKey,
    /** Capping agent per metal, mol/mol (PVP: monomer units per metal atom) … */
    molPerMolMetal: positive('capping ratio', 'mol/mol metal').optional(),
    /** … or its final concentration in the batch (mM). */
    concentrationMm: positive('capping concentration', 'mM').optional(),
    stockMm: positive('stock concentration', 'mM').optional(),
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
  volumeMl: positive('solvent volume', 'mL').optional(),
});

export const additiveChoiceSchema = z.object({
  reagentKey,
  amountMmol: positive('additive amount', 'mmol'),
  stockMm: positive('stock concentration', 'mM').optional(),
});

export const stockRecordSchema = z.object({
  reagentKey,
  /** When the stock solution was made (ISO 8601 date-time). */
  preparedAt: z.iso.datetime({ error: 'must be an ISO date-time such as 2025-03-01T09:30:00Z', offset: true }),
  /** Override of the catalog's freshness limit (hours). */
  freshnessHours: positive('freshness limit', 'h').optional(),
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
  batchVolumeMl: positive('batch volume', 'mL'),
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
  latticeNm: z.record(z.string(), positive('lattice constant', 'nm')).default({}),
  stocks: z.array(stockRecordSchema).default([]),
});
export type BatchDesignInput = z.output<typeof batchDesignInputSchema>;
export type BatchDesignRequest = z.input<typeof batchDesignInputSchema>;
