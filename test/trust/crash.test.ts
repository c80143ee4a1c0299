/**
 * Crashes and a second writer, on real SQLite files with child processes:
 * - a writer killed with SIGKILL at random moments, 50 times: after each kill the store passes the full
 *   `PRAGMA integrity_check`; every write the writer acknowledged is there; no size import is half-stored;
 * - two writers at once (the browser host in this process, a writer program beside it): no lost write, no
 *   SQLITE_BUSY shown to either.
 */
import Database from 'better-sqlite3';
import { spawn } from 'node:child_process';
import { cpSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { build } from 'esbuild';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { defaultMigrationsDir } from '../../db/migrate';
import { STORE_FILE_NAME } from '../../db/store';
import type { SavedBatch } from '../../shared-model/api/batches';
import type { Campaign } from '../../shared-model/api/campaigns';
import type { CandidatePair } from '../../shared-model/api/pairs';
import { openWorkspace, closeWorkspace } from '../../electron/services/workspace';
import { createRandom } from '../../shared-model/random';
import { dispatchValue } from '../support/dispatch';
import { startTestHost } from '../support/host-fixture';
import { callApi, logIn } from '../support/http-client';
import { tempDir } from '../support/temp-dirs';
import { auPd } from '../support/sample-batches';

const KILLS = 50;
let bundleDir = '';
let writer = '';
let dataDir = '';
let batchId = 0;

beforeAll(async () => {
  // Bundled once so each child starts in a fraction of a second; beside node_modules for better-sqlite3.
  bundleDir = join(process.cwd(), 'test-output', `store-writer-${process.pid}`);
  mkdirSync(bundleDir, { recursive: true });
  writer = join(bundleDir, 'store-writer.mjs');
  await build({
    entryPoints: [join(import.meta.dirname, 'store-writer.ts')],
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    outfile: writer,
    external: ['better-sqlite3', 'tsx', 'tsx/*'],
    banner: {
      js: "import { createRequire as pwCreateRequire } from 'node:module'; const require = pwCreateRequire(import.meta.url);",
    },
    logLevel: 'error',
  });
  cpSync(defaultMigrationsDir(), join(bundleDir, 'migrations'), { recursive: true }); // as the desktop bundle does
}, 60_000);
afterAll(() => rmSync(bundleDir, { recursive: true, force: true }));

async function prepareStore(): Promise<void> {
  dataDir = tempDir('pairwright-crash-');
  const context = openWorkspace({ dataDir });
  const campaign = await dispatchValue<Campaign>(context, 'campaigns.create', { name: 'Crash test' });
  const pair = await dispatchValue<CandidatePair>(context, 'pairs.add', {
    campaignId: campaign.id,
    pair: 'Au-Pd',
    target: 'alloy',
  });
  const batch = await dispatchValue<SavedBatch>(context, 'batches.save', {
    name: 'AuPd',
    campaignId: campaign.id,
    pairId: pair.id,
    design: auPd,
  });
  batchId = batch.id;
  await closeWorkspace(context);
}

interface Acks {
  campaigns: string[];
  sizes: Map<string, number>;
  errors: string[];
}

function readAcks(text: string, into: Acks): void {
  for (const line of text.split('\n')) {
    const [kind, what, value, count] = line.split(' ');
    if (kind === 'ack' && what === 'campaign' && value) into.campaigns.push(value);
    else if (kind === 'ack' && what === 'sizes' && value) into.sizes.set(value, Number(count));
    else if (kind === 'error') into.errors.push(line);
  }
}

/** Runs the writer; kills it with SIGKILL `killAfterMs` after its first acknowledgement (or lets it finish). */
function runWriter(tag: string, count: number | 'forever', killAfterMs: number | null, acks: Acks): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [writer, dataDir, tag, String(batchId), String(count)], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    let err = '';
    let armed = false;
    child.stdout.on('data', (chunk: Buffer) => {
      out += chunk.toString('utf8');
      if (!armed && killAfterMs !== null && out.includes('ack ')) {
        armed = true;
        setTimeout(() => child.kill('SIGKILL'), killAfterMs);
      }
    });
    child.stderr.on('data', (chunk: Buffer) => (err += chunk.toString('utf8')));
    child.on('error', reject);
    child.on('exit', (code, signal) => {
      // Only whole lines count: a line cut by the kill was not acknowledged.
      readAcks(out.slice(0, out.lastIndexOf('\n') + 1), acks);
      if (killAfterMs === null && code !== 0)
        reject(new Error(`writer ${tag} exited ${code}: ${err}${out.slice(-500)}`));
      else if (killAfterMs !== null && signal !== 'SIGKILL' && code !== 0)
        reject(new Error(`writer ${tag} failed: ${err}`));
      else resolve();
    });
  });
}

function checkStore(acks: Acks): {
  integrity: string;
  lostCampaigns: string[];
  lostImports: string[];
  partialImports: string[];
} {
  const db = new Database(join(dataDir, STORE_FILE_NAME));
  try {
    const integrity = String(db.pragma('integrity_check', { simple: true }));
    const names = new Set(
      (db.prepare('SELECT name FROM campaigns').all() as { name: string }[]).map((row) => row.name),
    );
    const imports = db
      .prepare(
        'SELECT i.source_file AS file, count(d.seq) AS n FROM outcome_size_imports i LEFT JOIN outcome_diameters d ON d.import_id = i.id GROUP BY i.id',
      )
      .all() as { file: string; n: number }[];
    const byFile = new Map(imports.map((row) => [row.file, row.n]));
    const expected = (file: string) => 20 + (Number(/-(\d+)\.csv$/.exec(file)?.[1] ?? 0) % 40);
    return {
      integrity,
      lostCampaigns: acks.campaigns.filter((name) => !names.has(name)),
      lostImports: [...acks.sizes.entries()].filter(([file, n]) => byFile.get(file) !== n).map(([file]) => file),
      partialImports: imports
        .filter((row) => row.n !== expected(row.file))
        .map((row) => `${row.file}: ${row.n} diameters`),
    };
  } finally {
    db.close();
  }
}

describe('crashes and concurrent writers', () => {
  it(`survives ${KILLS} SIGKILLs of a writer with no acknowledged write lost and nothing half-written`, async () => {
    await prepareStore();
    const random = createRandom(20261202);
    const acks: Acks = { campaigns: [], sizes: new Map(), errors: [] };
    let survived = 0;
    for (let kill = 0; kill < KILLS; kill++) {
      await runWriter(`k${kill}`, 'forever', 5 + random.nextInt(120), acks);
      const state = checkStore(acks);
      expect(state.integrity).toBe('ok');
      expect(state.partialImports).toEqual([]);
      survived++;
    }
    const final = checkStore(acks);
    console.log(
      `[crash] ${survived} of ${KILLS} kills survived; ${acks.campaigns.length} campaign and ${acks.sizes.size} size-import writes ` +
        `acknowledged; lost: ${final.lostCampaigns.length + final.lostImports.length}`,
    );
    expect(acks.errors).toEqual([]);
    expect(final.lostCampaigns).toEqual([]);
    expect(final.lostImports).toEqual([]);
    expect(acks.campaigns.length).toBeGreaterThan(KILLS);
  }, 240_000);

  it('two writers at once (browser host + a writer program) lose nothing and show no BUSY', async () => {
    await prepareStore();
    const fixture = await startTestHost(dataDir);
    try {
      const cookie = await logIn(fixture.host);
      const acks: Acks = { campaigns: [], sizes: new Map(), errors: [] };
      const other = runWriter('cli', 150, null, acks);
      const hostNames: string[] = [];
      const hostErrors: string[] = [];
      for (let i = 0; i < 150; i++) {
        const answer = await callApi(fixture.host, cookie, 'campaigns.create', { name: `host-${i}` });
        if (answer.status === 200) hostNames.push(`host-${i}`);
        else hostErrors.push(answer.body);
      }
      await other;
      expect(hostErrors).toEqual([]);
      expect(acks.errors).toEqual([]);
      const state = checkStore({ ...acks, campaigns: [...acks.campaigns, ...hostNames] });
      console.log(
        `[two writers] ${hostNames.length} host + ${acks.campaigns.length} program writes; lost ${state.lostCampaigns.length}`,
      );
      expect(state.lostCampaigns).toEqual([]);
      expect(state.integrity).toBe('ok');
    } finally {
      await fixture.stop();
    }
  }, 120_000);
});
