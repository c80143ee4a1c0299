/** `pairwright batches list`: the named campaign's batches, the active campaigns' by default, --all for every one. */
import { describe, expect, it } from 'vitest';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

// Each child process starts Node; under a parallel run that takes seconds (as in cli-batches.test.ts).
const SLOW = 180_000;

const AU_PD = [
  'recipe',
  'Au-Pd',
  '--diameter',
  '5',
  '--composition',
  '50',
  '--total-metal',
  '0.1',
  '--volume',
  '20',
  '--precursor',
  'Au=haucl4-3h2o@10',
  '--precursor',
  'Pd=na2pdcl4@10',
  '--reducer',
  'nabh4',
  '--excess',
  '5',
  '--reducer-stock',
  '100',
];

describe('pairwright batches list', () => {
  it(
    "lists the named campaign's batches, hides archived campaigns' by default, and --all shows every one",
    () => {
      const data = tempDataDir();
      const ok = (args: string[]) => {
        const run = runPairwright([...args, '--data', data]);
        expect(run.status, run.stderr).toBe(0);
        return run.stdout;
      };
      ok(['campaigns', 'create', 'Cathodes']);
      ok(['campaigns', 'create', 'Old screen']);
      ok([...AU_PD, '--save', 'AuPd current', '--campaign', 'Cathodes']);
      ok([...AU_PD, '--save', 'AuPd old', '--campaign', 'Old screen']);
      ok(['campaigns', 'archive', 'Old screen']);

      const named = ok(['batches', 'list', '--campaign', 'Cathodes']);
      expect(named).toContain('the batches of "Cathodes"');
      expect(named).toContain('AuPd current');
      expect(named).not.toContain('AuPd old');

      const active = ok(['batches', 'list']);
      expect(active).toContain('AuPd current');
      expect(active).not.toContain('AuPd old');

      const all = ok(['batches', 'list', '--all']);
      expect(all).toMatch(/AuPd current.*Cathodes/);
      expect(all).toMatch(/AuPd old.*Old screen \(archived\)/);
      const json = runPairwrightJson<{ name: string }[]>(['batches', 'list', '--all', '--data', data]);
      expect(json.map((b) => b.name).sort()).toEqual(['AuPd current', 'AuPd old']);

      // the archived campaign named explicitly still lists its batches
      expect(ok(['batches', 'list', '--campaign', 'Old screen'])).toContain('AuPd old');
      const both = runPairwright(['batches', 'list', '--all', '--campaign', 'Cathodes', '--data', data]);
      expect(both.status).toBe(2);
      expect(both.stderr).toMatch(/either --all or --campaign/);
    },
    SLOW,
  );
});
