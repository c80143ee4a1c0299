/**
 * A second local account attacks a running browser host: it can reach 127.0.0.1 but must get no page, no key,
 * no session, no API call and no file of the data folder. Needs root (to run the attacker as another uid with
 * `runuser`) and the account named by PAIRWRIGHT_ATTACKER_USER, which .ci/run creates with useradd; elsewhere
 * it skips with a printed reason, and with CI=true a missing piece is a failure.
 */
import { execFile, spawnSync } from 'node:child_process';
import { chmodSync, copyFileSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestHost, type HostFixture } from '../support/host-fixture';
import { callApi, logIn } from '../support/http-client';
import { inCi } from '../support/reference-tools';

const run = promisify(execFile);
// The test run's own temp folder (TMPDIR) is private to this account, so the other account could not even walk
// to the data folder; these folders go to the system's /tmp (world-traversable) and are removed in afterAll.
const SYSTEM_TMP = '/tmp';
const attackerUser = process.env.PAIRWRIGHT_ATTACKER_USER ?? '';
const NODE = process.execPath;

function missingPiece(): string | null {
  if (process.platform === 'win32') return 'needs a POSIX system';
  if (process.getuid?.() !== 0) return 'needs root to run a program as another account (runuser)';
  if (spawnSync('sh', ['-c', 'command -v runuser']).status !== 0) return 'needs runuser (util-linux)';
  if (attackerUser === '') return 'needs PAIRWRIGHT_ATTACKER_USER (an account made with useradd; .ci/run creates one)';
  if (spawnSync('id', ['-u', attackerUser]).status !== 0) return `account ${attackerUser} does not exist (useradd it)`;
  return null;
}

const missing = missingPiece();
if (missing !== null) {
  if (inCi) throw new Error(`CI=true but the second-account test ${missing}`);
  console.warn(`[skipped] second-account attack on the browser host: ${missing}`);
}

interface AttackReport {
  attempts: number;
  refused: number;
  accepted: string[];
}

describe.skipIf(missing !== null)('another local account against the browser host', () => {
  let parent: string;
  let scriptDir: string;
  let fixture: HostFixture;
  let dataDir: string;

  beforeAll(async () => {
    parent = mkdtempSync(join(SYSTEM_TMP, 'pairwright-uid-'));
    chmodSync(parent, 0o755); // the attacker may walk up to the data folder itself
    dataDir = join(parent, 'data');
    fixture = await startTestHost(dataDir);
    const cookie = await logIn(fixture.host); // a live session exists while the attacker guesses
    expect((await callApi(fixture.host, cookie, 'campaigns.create', { name: 'Owner only' })).status).toBe(200);
    scriptDir = mkdtempSync(join(SYSTEM_TMP, 'pairwright-attacker-'));
    chmodSync(scriptDir, 0o755);
    copyFileSync(join(import.meta.dirname, 'attacker.mjs'), join(scriptDir, 'attacker.mjs'));
    chmodSync(join(scriptDir, 'attacker.mjs'), 0o644);
  });
  afterAll(async () => {
    await fixture?.stop();
    rmSync(parent, { recursive: true, force: true });
    rmSync(scriptDir, { recursive: true, force: true });
  });

  const attack = async (asOtherUser: boolean): Promise<AttackReport> => {
    const args = [join(scriptDir, 'attacker.mjs'), String(fixture.host.port), dataDir];
    const { stdout } = asOtherUser
      ? await run('runuser', ['-u', attackerUser, '--', NODE, ...args])
      : await run(NODE, args);
    return JSON.parse(stdout.trim().split('\n').pop() ?? '{}') as AttackReport;
  };

  it('refuses every call and every file to the other account', async () => {
    const report = await attack(true);
    console.log(`[second account] ${report.refused} of ${report.attempts} attacker calls refused`);
    expect(report.accepted).toEqual([]);
    expect(report.attempts).toBeGreaterThanOrEqual(15);
    expect(report.refused).toBe(report.attempts);
    const campaigns = fixture.store.db.prepare('SELECT name FROM campaigns').all();
    expect(campaigns).toEqual([{ name: 'Owner only' }]);
  });

  it('the same program run by the owner does reach the files (the probe can tell)', async () => {
    const report = await attack(false);
    expect(report.accepted).toContain('read the store: allowed');
    expect(report.accepted.filter((line) => line.startsWith('campaigns'))).toEqual([]);
  });
});
