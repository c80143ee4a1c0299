/** The `pairwright` command run as a child process against a real store folder. */
import { describe, expect, it } from 'vitest';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { CandidatePair } from '../../shared-model/api/pairs';
import { runPairwright, runPairwrightJson } from '../support/cli';
import { tempDataDir } from '../support/host-fixture';

describe('pairwright CLI', () => {
  it('lists campaigns of a fresh store as an empty JSON array', () => {
    expect(runPairwrightJson<Campaign[]>(['campaigns', 'list', '--data', tempDataDir()])).toEqual([]);
  });

  it('creates a campaign, adds pairs by campaign name, lists them as JSON and as a table', () => {
    const data = tempDataDir();
    const campaign = runPairwrightJson<Campaign>(['campaigns', 'create', 'Fuel-cell cathode screen', '--data', data]);
    expect(campaign.name).toBe('Fuel-cell cathode screen');
    const pair = runPairwrightJson<CandidatePair>([
      'pairs',
      'add',
      'Fuel-cell cathode screen',
      'Pt-Ni',
      '--target',
      'Ni@Pt',
      '--data',
      data,
    ]);
    expect(pair).toMatchObject({ elementA: 'Pt', elementB: 'Ni', target: 'Ni@Pt' });
    const table = runPairwright(['pairs', 'list', String(campaign.id), '--data', data]);
    expect(table.status).toBe(0);
    expect(table.stdout).toMatch(/Pt-Ni\s+Ni@Pt\s+candidate/);
  });

  it('exits non-zero with one line for bad input', () => {
    const data = tempDataDir();
    runPairwrightJson<Campaign>(['campaigns', 'create', 'C', '--data', data]);
    const cases: [string[], RegExp][] = [
      [['pairs', 'add', 'C', 'Pt-Xx', '--data', data], /unknown element "Xx"/],
      [['pairs', 'add', 'C', 'Pt-Pt', '--data', data], /two different elements/],
      [['pairs', 'add', 'Nope', 'Pt-Ni', '--data', data], /no campaign "Nope"/],
      [['campaigns', 'create', '', '--data', data], /name/],
      [['campaigns', 'list', '--bogus', '--data', data], /bogus/],
      [['pairs', 'remove', '1', '--data', data], /needs confirmation|no candidate pair/],
      [['frobnicate'], /unknown command/],
    ];
    for (const [args, message] of cases) {
      const run = runPairwright(args);
      expect(run.status, args.join(' ')).toBe(2);
      expect(run.stderr.trim().split('\n')).toHaveLength(1);
      expect(run.stderr).toMatch(message);
    }
  });

  it('prints help listing the commands', () => {
    const run = runPairwright(['--help']);
    expect(run.status).toBe(0);
    expect(run.stdout).toContain('pairwright campaigns list');
  });
});
