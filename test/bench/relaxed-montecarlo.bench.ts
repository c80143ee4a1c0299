/**
 * Relaxed Monte Carlo speed: attempts per second (displacement + swap, alternating) on 923- and
 * 6,525-atom Au–Ni cuboctahedra at 600 K after warm-up; the time to a default relaxed answer (stops at
 * the answer) for Au–Ni 3 nm; and the wall time of a campaign screen of 15 pairs × 3 compositions × 1 size
 * through the service and its worker queue (all cores but one), on a temporary store removed afterwards.
 */
import { rmSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { openStore } from '../../db/store';
import { dispatch } from '../../electron/services/dispatch';
import { queueFor } from '../../electron/workers/montecarlo-queue';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../shared-model/clusters/neighbours';
import { buildCluster } from '../../shared-model/clusters/shapes';
import type { ScreenStarted, ScreenStatus } from '../../shared-model/api/screen';
import { surfaceSites } from '../../shared-model/montecarlo/analysis';
import { guptaElement } from '../../shared-model/montecarlo/gupta-parameters';
import { OffLatticeGupta } from '../../shared-model/montecarlo/offlattice-gupta';
import { RelaxedEngine } from '../../shared-model/montecarlo/relaxed-engine';
import { DEFAULT_STOPPING, runSimulation } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import { tempDataDir } from '../support/host-fixture';

function engineSpeed(shells: number): { atoms: number; wall: number; cpu: number; step: number } {
  const nn = (guptaElement('Au').r0Angstrom + guptaElement('Ni').r0Angstrom) / 2;
  const geometry = buildCluster('cuboctahedron', { shells }, nn);
  const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
  const rng = createRandom(7);
  const species = Uint8Array.from({ length: geometry.atoms }, () => (rng.next() < 0.5 ? 1 : 0));
  const engine = new RelaxedEngine(
    new OffLatticeGupta(['Au', 'Ni']),
    geometry.positions,
    species,
    surfaceSites(list, nn),
    rng,
    0.1,
  );
  const warm = Math.max(3, Math.round(30_000 / geometry.atoms));
  for (let s = 0; s < warm; s++) engine.runSweep(600);
  const sweeps = Math.max(2, Math.round(600_000 / geometry.atoms));
  const before = engine.stats.swapAttempts + engine.stats.displacementAttempts;
  const cpuBefore = process.cpuUsage();
  const t0 = performance.now();
  for (let s = 0; s < sweeps; s++) engine.runSweep(600);
  const seconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpuBefore);
  const attempts = engine.stats.swapAttempts + engine.stats.displacementAttempts - before;
  return {
    atoms: geometry.atoms,
    wall: attempts / seconds,
    cpu: attempts / ((cpu.user + cpu.system) / 1e6),
    step: engine.stepAngstrom,
  };
}

async function screenWallTime(): Promise<void> {
  const dir = tempDataDir('pairwright-bench-screen-');
  const store = openStore({ dataDir: dir });
  try {
    const context = { store };
    const call = async <T>(name: string, input: unknown): Promise<T> => {
      const result = await dispatch(context, name, input);
      if (!result.ok) throw new Error(`${name}: ${result.error.message}`);
      return result.value as T;
    };
    const campaign = await call<{ id: number }>('campaigns.create', { name: 'Screen bench' });
    // Three pairs bring six metals (Ag Pd Au Pt Cu Ni); the screen takes every pair of them: 15.
    for (const pair of ['Ag-Pd', 'Au-Pt', 'Cu-Ni']) await call('pairs.add', { campaignId: campaign.id, pair });
    const t0 = performance.now();
    const started = await call<ScreenStarted>('screen.start', {
      campaignId: campaign.id,
      xB: [0.25, 0.5, 0.75],
      diameterNm: [2],
      temperatureK: 600,
    });
    let status: ScreenStatus;
    for (;;) {
      status = await call<ScreenStatus>('screen.status', { runIds: started.runs.map((r) => r.runId) });
      if (status.finished === status.total) break;
      await new Promise((resolve) => setTimeout(resolve, 500));
    }
    const wall = (performance.now() - t0) / 1000;
    const failed = status.runs.filter((r) => r.status !== 'done').length;
    console.log(
      `screen: ${started.elements.length} elements, ${status.total} runs (15 pairs × 3 compositions × 2 nm), ${started.concurrency} worker(s): ${wall.toFixed(1)} s wall` +
        `${failed > 0 ? `, ${failed} not done` : ''}`,
    );
  } finally {
    await queueFor(store).close();
    store.close();
    rmSync(dir, { recursive: true, force: true });
  }
}

export async function run(): Promise<void> {
  console.log(
    `machine: ${cpus().length} cores, load average ${loadavg()
      .map((l) => l.toFixed(2))
      .join(' ')}`,
  );
  for (const shells of [6, 12]) {
    const speed = engineSpeed(shells);
    console.log(
      `relaxed Au–Ni, ${speed.atoms} atoms, 600 K: ${speed.wall.toFixed(0)} attempts/s wall, ${speed.cpu.toFixed(0)} per CPU-second (step ${speed.step.toFixed(3)} Å)`,
    );
  }
  const t0 = performance.now();
  const answer = runSimulation(
    {
      elementA: 'Au',
      elementB: 'Ni',
      xB: 0.5,
      shape: 'cuboctahedron',
      diameterNm: 3,
      temperatureK: 600,
      sweeps: 3000,
      seed: 1,
      stopping: DEFAULT_STOPPING,
    },
    createRandom(1),
  );
  console.log(
    `time to a default relaxed answer, Au–Ni 3 nm (${answer.atoms} atoms) at 600 K: ${((performance.now() - t0) / 1000).toFixed(1)} s, ` +
      `${answer.stopping.sweepsTaken} sweeps (${answer.stopping.stoppedAtAnswer ? 'stopped at the answer' : 'ran to the cap'}), surface x(Ni) ${answer.surfaceXB.toFixed(3)} ± ${answer.surfaceXBStandardError.toFixed(4)}, ${answer.architecture}`,
  );
  await screenWallTime();
}
