/**
 * Lattice Monte Carlo speed: swap attempts per second for a 1415-atom Ag–Pd cuboctahedron (7 shells,
 * xB = 0.5, 600 K, Gupta five-shell sums), single thread, and the memory it takes. Two figures:
 * the production path (a full run in a worker thread, as the app and CLI run it) and the bare kernel
 * after warm-up; each as wall-clock and as CPU-time rate (the latter is what a busy machine cannot
 * inflate). When LAMMPS is installed the same system runs with `fix atom/swap` (which re-evaluates the
 * whole energy for every attempt) and the speed ratio is printed. Target: ≥ 1,000,000 attempts/s.
 */
import { spawnSync } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { Worker } from 'node:worker_threads';
import { pathToFileURL } from 'node:url';
import { join } from 'node:path';
import { buildCluster } from '../../shared-model/clusters/shapes';
import { buildNeighbourList, FIVE_SHELL_CUTOFF_FACTOR } from '../../shared-model/clusters/neighbours';
import { surfaceSites } from '../../shared-model/montecarlo/analysis';
import { guptaElement } from '../../shared-model/montecarlo/gupta-parameters';
import { binaryTables, SwapEngine } from '../../shared-model/montecarlo/swap-engine';
import type { SimulationResult, SimulationSpec } from '../../shared-model/montecarlo/simulate';
import { createRandom } from '../../shared-model/random';
import { runLammpsGuptaCluster } from '../support/gupta-lammps';

function hasLammps(): boolean {
  return spawnSync('sh', ['-c', 'command -v lmp'], { encoding: 'utf8' }).stdout.trim().length > 0;
}

/** A full run in a worker thread, exactly as the queue starts it (tsx bootstrap of the worker source). */
function runInWorker(spec: SimulationSpec): Promise<{ result: SimulationResult; cpuSeconds: number }> {
  const root = process.cwd();
  const api = pathToFileURL(join(root, 'node_modules', 'tsx', 'dist', 'esm', 'api', 'index.mjs')).href;
  const source = pathToFileURL(join(root, 'electron', 'workers', 'montecarlo-worker.ts')).href;
  const code = `import(${JSON.stringify(api)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(source)}); });`;
  return new Promise((resolve, reject) => {
    const worker = new Worker(code, { eval: true, workerData: { spec, cancelBuffer: new SharedArrayBuffer(4) } });
    const cpuBefore = process.cpuUsage();
    worker.on('message', (message: { type: string; result?: SimulationResult; message?: string }) => {
      if (message.type === 'result' && message.result) {
        const cpu = process.cpuUsage(cpuBefore);
        resolve({ result: message.result, cpuSeconds: (cpu.user + cpu.system) / 1e6 });
      } else if (message.type === 'error') reject(new Error(message.message));
    });
    worker.on('error', reject);
  });
}

export async function run(): Promise<void> {
  console.log(
    `machine: ${cpus().length} cores, load average ${loadavg()
      .map((l) => l.toFixed(2))
      .join(' ')} (wall-clock rates drop when other work shares the cores)`,
  );
  const production = await runInWorker({
    elementA: 'Ag',
    elementB: 'Pd',
    xB: 0.5,
    shape: 'cuboctahedron',
    shells: 7,
    temperatureK: 600,
    sweeps: 2000,
    seed: 7,
  });
  console.log(
    `production path (worker thread, 2000 sweeps from a random start): ${production.result.attemptsPerSecond.toFixed(0)} attempts/s wall in the loop; ${(production.result.attempts / production.cpuSeconds).toFixed(0)} attempts per CPU-second incl. setup and analysis; surface x(Pd) ${production.result.surfaceXB.toFixed(3)}, ${production.result.architecture}`,
  );

  const elementA = 'Ag';
  const elementB = 'Pd';
  const xB = 0.5;
  const temperatureK = 600;
  const nn = (1 - xB) * guptaElement(elementA).r0Angstrom + xB * guptaElement(elementB).r0Angstrom;
  const heapBefore = process.memoryUsage().heapUsed;
  const geometry = buildCluster('cuboctahedron', { shells: 7 }, nn);
  const list = buildNeighbourList(geometry.positions, FIVE_SHELL_CUTOFF_FACTOR * nn);
  const rng = createRandom(7);
  const species = new Uint8Array(geometry.atoms);
  for (let k = 0; k < Math.round(xB * geometry.atoms); k++) species[k] = 1;
  for (let i = geometry.atoms - 1; i > 0; i--) {
    const j = rng.nextInt(i + 1);
    const t = species[i]!;
    species[i] = species[j]!;
    species[j] = t;
  }
  const engine = new SwapEngine(
    list,
    geometry.positions,
    binaryTables(elementA, elementB, list),
    species,
    surfaceSites(list, nn),
    rng,
  );
  const heapAfter = process.memoryUsage().heapUsed;
  const listBytes =
    list.offsets.byteLength +
    list.neighbours.byteLength +
    list.distanceClass.byteLength +
    list.classDistancesAngstrom.byteLength;
  // Engine arrays: densities, roots, pending, species, surface, slots, lists, positions (all per site).
  const engineBytes = geometry.atoms * (8 + 8 + 8 + 1 + 1 + 4 + 4 + 24);

  engine.runAttempts(2_000_000, temperatureK); // warm-up: JIT and equilibration
  const rounds = 5;
  const perRound = 3_000_000;
  const speeds: number[] = [];
  let accepted = 0;
  const cpuBefore = process.cpuUsage();
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    accepted += engine.runAttempts(perRound, temperatureK);
    speeds.push(perRound / ((performance.now() - t0) / 1000));
  }
  const cpu = process.cpuUsage(cpuBefore);
  const cpuRate = (rounds * perRound) / ((cpu.user + cpu.system) / 1e6);
  speeds.sort((a, b) => a - b);
  const median = speeds[Math.floor(rounds / 2)]!;
  console.log(
    `system: ${elementA}-${elementB} cuboctahedron, ${geometry.atoms} atoms, xB ${xB}, ${temperatureK} K, ${(list.neighbours.length / geometry.atoms).toFixed(1)} neighbours/atom`,
  );
  console.log(
    `kernel, swap attempts/s (median of ${rounds} × ${perRound / 1e6} M after warm-up): ${median.toFixed(0)} wall [min ${speeds[0]!.toFixed(0)}, max ${speeds[rounds - 1]!.toFixed(0)}], ${cpuRate.toFixed(0)} per CPU-second; target ≥ 1,000,000`,
  );
  console.log(`acceptance: ${(accepted / (rounds * perRound)).toFixed(3)}`);
  console.log(
    `memory: neighbour list ${(listBytes / 1024).toFixed(0)} kB, engine arrays ${(engineBytes / 1024).toFixed(0)} kB, heap growth at setup ${((heapAfter - heapBefore) / 1024).toFixed(0)} kB`,
  );

  if (!hasLammps()) {
    console.log('LAMMPS (lmp) not found: no atom/swap comparison');
    return;
  }
  const symbols = Array.from(species, (s) => (s ? elementB : elementA));
  const swapsPerStep = 50;
  const steps = 40;
  const stdout = runLammpsGuptaCluster(
    symbols,
    geometry.positions,
    [elementA, elementB],
    FIVE_SHELL_CUTOFF_FACTOR * nn,
    [
      'timestep 0.001',
      `fix mc all atom/swap 1 ${swapsPerStep} 4711 ${temperatureK} ke no types 1 2`,
      'thermo 10',
      `run ${steps}`,
    ],
  );
  const loop = /Loop time of ([0-9.eE+-]+) on/.exec(stdout);
  if (!loop) {
    console.log(`LAMMPS printed no loop time:\n${stdout.slice(-1500)}`);
    return;
  }
  const lammpsSpeed = (swapsPerStep * steps) / Number(loop[1]);
  console.log(
    `LAMMPS fix atom/swap (same system and potential, ${swapsPerStep * steps} attempts): ${lammpsSpeed.toFixed(0)} attempts/s`,
  );
  console.log(`speed ratio Pairwright / LAMMPS atom/swap: ${(median / lammpsSpeed).toFixed(0)}×  (goal ≥ 1000×)`);
}
