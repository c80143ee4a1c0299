/** `pairwright batches list`: the named campaign's batches, the active campaigns' by default, --all for every one. */
import { describe, expect, it } from 'vitest';
import { AU_PD_RECIPE, cliOn } from '../support/cli-batches';
import { tempDataDir } from '../support/host-fixture';
import { TIMEOUTS } from '../support/timeouts';

describe('pairwright batches list', () => {
  it(
    "lists the named campaign's batches, hides archived campaigns' by default, and --all shows every one",
    () => {
      const { ok, run, json: jsonOf } = cliOn(tempDataDir());
      ok(['campaigns', 'create', 'Cathodes']);
      ok(['campaigns', 'create', 'Old screen']);
      ok([...AU_PD_RECIPE, '--save', 'AuPd current', '--campaign', 'Cathodes']);
      ok([...AU_PD_RECIPE, '--save', 'AuPd old', '--campaign', 'Old screen']);
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
      const json = jsonOf<{ name: string }[]>(['batches', 'list', '--all']);
      expect(json.map((b) => b.name).sort()).toEqual(['AuPd current', 'AuPd old']);

      // the archived campaign named explicitly still lists its batches
      expect(ok(['batches', 'list', '--campaign', 'Old screen'])).toContain('AuPd old');
      const both = run(['batches', 'list', '--all', '--campaign', 'Cathodes']);
      expect(both.status).toBe(2);
      expect(both.stderr).toMatch(/either --all or --campaign/);
    },
    TIMEOUTS.cliSequenceMs,
  );
});
