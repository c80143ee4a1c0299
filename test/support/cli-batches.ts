/**
 * Set-up shared by the batch CLI tests (cli-batches*.test.ts, cli-bench-sheet.test.ts): `pairwright recipe`
 * argument lists and a runner bound to one store folder.
 */
import { expect } from 'vitest';
import { runPairwright, runPairwrightJson, type CliRun } from './cli';

export interface RecipeSpec {
  pair: string;
  diameterNm: string;
  compositionPct: string;
  totalMetalMmol: string;
  volumeMl: string;
  /** EL=reagent-key[@stock mM], once per metal. */
  precursors: readonly string[];
  reducer?: string;
  excess?: string;
  reducerStockMm?: string;
}

/** `pairwright recipe A-B …` with the flags of the spec, in this order. */
export function recipeArgs(spec: RecipeSpec): string[] {
  return [
    'recipe',
    spec.pair,
    '--diameter',
    spec.diameterNm,
    '--composition',
    spec.compositionPct,
    '--total-metal',
    spec.totalMetalMmol,
    '--volume',
    spec.volumeMl,
    ...spec.precursors.flatMap((p) => ['--precursor', p]),
    ...(spec.reducer !== undefined ? ['--reducer', spec.reducer] : []),
    ...(spec.excess !== undefined ? ['--excess', spec.excess] : []),
    ...(spec.reducerStockMm !== undefined ? ['--reducer-stock', spec.reducerStockMm] : []),
  ];
}

/** A 4 nm Pt75Ni25 alloy, 0.1 mmol metal in 50 mL, 20 mM stocks, NaBH4 ×5 from a 100 mM stock. */
export const PT_NI_RECIPE = recipeArgs({
  pair: 'Pt-Ni',
  diameterNm: '4',
  compositionPct: '25',
  totalMetalMmol: '0.1',
  volumeMl: '50',
  precursors: ['Pt=h2ptcl6-6h2o@20', 'Ni=nicl2-6h2o@20'],
  reducer: 'nabh4',
  excess: '5',
  reducerStockMm: '100',
});

/** A 5 nm Au50Pd50 alloy, 0.1 mmol metal in 20 mL, 10 mM stocks, NaBH4 ×5 from a 100 mM stock. */
export const AU_PD_RECIPE = recipeArgs({
  pair: 'Au-Pd',
  diameterNm: '5',
  compositionPct: '50',
  totalMetalMmol: '0.1',
  volumeMl: '20',
  precursors: ['Au=haucl4-3h2o@10', 'Pd=na2pdcl4@10'],
  reducer: 'nabh4',
  excess: '5',
  reducerStockMm: '100',
});

/** Runs `pairwright … --data <folder>`: `run` as it is, `ok` expecting exit 0 (stderr shown otherwise), `json`. */
export function cliOn(data: string): {
  run: (args: readonly string[]) => CliRun;
  ok: (args: readonly string[]) => string;
  json: <T>(args: readonly string[]) => T;
} {
  const run = (args: readonly string[]) => runPairwright([...args, '--data', data]);
  return {
    run,
    ok: (args) => {
      const result = run(args);
      expect(result.status, result.stderr).toBe(0);
      return result.stdout;
    },
    json: <T>(args: readonly string[]) => runPairwrightJson<T>([...args, '--data', data]),
  };
}
