/**
 * Monte Carlo commands: `simulate` queues a run in the store (a worker thread computes it), waits for
 * it and prints the analysed result; `energy` prints the Gupta energy of a structure file;
 * `simulations` lists stored runs.
 */
import type { SimulationRun, SimulationRunSummary } from '../../../shared-model/api/simulation';
import { splitPair } from '../../../shared-model/api/schemas';
import type { StructureEnergy } from '../../../shared-model/montecarlo/gupta-energy';
import type { SimulationResult } from '../../../shared-model/montecarlo/simulate';
import {
  CliError,
  optionalNumber,
  optionalString,
  requirePositional,
  type CliCommand,
  type CliContext,
  type ParsedArgs,
} from '../command';
import { formatTable } from '../table';

const f = (value: number, digits = 4) => (Number.isFinite(value) ? value.toPrecision(digits) : String(value));

/** The flat JSON of `pairwright simulate`. */
export function simulationJson(run: SimulationRun, result: SimulationResult) {
  return {
    runId: run.id,
    pair: `${result.elementA}-${result.elementB}`,
    elementA: result.elementA,
    elementB: result.elementB,
    xB: result.xB,
    shape: result.geometry.shape,
    shells: result.geometry.shells,
    atoms: result.atoms,
    countA: result.countA,
    countB: result.countB,
    nearestNeighbourAngstrom: result.geometry.nearestNeighbourAngstrom,
    equivalentDiameterNm: result.geometry.equivalentDiameterNm,
    temperatureK: run.spec.temperatureK,
    sweeps: run.spec.sweeps,
    anneal: run.spec.anneal ?? null,
    seed: run.spec.seed,
    energyEv: result.energyEv,
    energyPerAtomEv: result.energyPerAtomEv,
    meanEnergyEv: result.meanEnergyEv,
    mixingEnergyPerAtomEv: result.mixingEnergyPerAtomEv,
    surfaceSites: result.surfaceSites,
    surfaceXB: result.surfaceXB,
    surfaceXBStandardError: result.surfaceXBStandardError,
    surfaceFraction: result.surfaceFraction,
    radialProfile: result.radialProfile,
    warrenCowley: result.warrenCowley,
    unlikeNeighbourRatio: result.unlikeNeighbourRatio,
    architecture: result.architecture,
    enrichedElement: result.classification.enrichedElement,
    enrichment: result.classification.enrichment,
    thresholds: result.classification.thresholds,
    pairRule: result.pairRule.description,
    acceptance: result.acceptance,
    attempts: result.attempts,
    attemptsPerSecond: result.attemptsPerSecond,
    elapsedMs: result.elapsedMs,
    equilibrated: result.equilibration.equilibrated,
    equilibratedFromSweep: result.equilibration.equilibratedFromSample + (run.spec.anneal?.sweeps ?? 0),
    engineVersion: result.engineVersion,
    relaxation: result.relaxation,
    sweepsTaken: result.stopping.sweepsTaken,
    stoppedAtAnswer: result.stopping.stoppedAtAnswer,
    stopping: result.stopping,
    separation: result.separation,
    kineticNote: result.kineticNote,
  };
}

function simulationText(run: SimulationRun, result: SimulationResult): string {
  const profile = formatTable(result.radialProfile, [
    { header: 'layer', value: (l) => (l.layerFromSurface === 0 ? 'surface' : `surface−${l.layerFromSurface}`) },
    { header: 'atoms', value: (l) => String(l.atoms), align: 'right' },
    { header: `x(${result.elementB})`, value: (l) => l.xB.toFixed(3), align: 'right' },
    { header: 'radius Å', value: (l) => l.meanRadiusAngstrom.toFixed(2), align: 'right' },
  ]);
  return [
    `run ${run.id}: ${result.elementA}-${result.elementB}, x(${result.elementB}) = ${f(result.xB, 3)}, ${result.geometry.shape} with ${result.geometry.shells} shells (${result.atoms} atoms, ≈${f(result.geometry.equivalentDiameterNm, 3)} nm)`,
    `${run.spec.anneal ? `annealed ${run.spec.anneal.startTemperatureK} K → ` : ''}${run.spec.temperatureK} K, ` +
      `${result.stopping.sweepsTaken} sweeps${result.stopping.stoppedAtAnswer ? ` (stopped at the answer; cap ${run.spec.sweeps})` : ''}, seed ${run.spec.seed}`,
    `${result.relaxation.mode}: ${result.relaxation.reason}`,
    `separation: centres of mass ${f(result.separation.centreOfMassDistanceAngstrom, 3)} Å apart (${f(result.separation.centreOfMassOffset, 2)} of the radius), ` +
      `${result.separation.interfaceAtoms} atoms at the A–B interface (≈${f(result.separation.interfaceAreaNm2, 3)} nm²), domains ` +
      Object.entries(result.separation.domains)
        .map(([symbol, d]) => `${symbol} ${d.domains}`)
        .join(', '),
    `architecture: ${result.architecture}  (surface x(${result.elementB}) = ${f(result.surfaceXB, 3)} ± ${f(result.surfaceXBStandardError, 2)}, Warren–Cowley α = ${f(result.warrenCowley, 3)})`,
    `energy ${f(result.energyEv, 8)} eV (${f(result.energyPerAtomEv, 6)} eV/atom), mixing ${f(result.mixingEnergyPerAtomEv, 3)} eV/atom`,
    `acceptance ${f(result.acceptance, 3)}, ${Math.round(result.attemptsPerSecond).toLocaleString('en-US')} attempts/s, ${result.equilibration.equilibrated ? 'equilibrated' : 'NOT equilibrated (drift in the last quarters; run longer)'}`,
    `unlike pairs: ${result.pairRule.description}`,
    result.kineticNote,
    '',
    profile,
  ].join('\n');
}

async function waitForRun(context: CliContext, id: number): Promise<SimulationRunSummary> {
  for (;;) {
    const status = await context.call('simulation.status', { id });
    if (status.status !== 'queued' && status.status !== 'running') return status;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

function pairOption(args: ParsedArgs): [string, string] {
  const text = requirePositional(args, 0, 'pair');
  const pair = splitPair(text);
  if (!pair) throw new CliError(`"${text}" is not a pair; write it as A-B, e.g. Ag-Pd`);
  return pair;
}

function integerOption(args: ParsedArgs, name: string): number | undefined {
  const value = optionalNumber(args, name);
  if (value !== undefined && !Number.isInteger(value))
    throw new CliError(`--${name} must be a whole number, got ${value}`);
  return value;
}

export const simulationCommands: CliCommand[] = [
  {
    words: ['simulate'],
    args: '<A-B>',
    summary: 'Lattice Monte Carlo (Gupta potential, swap moves) of one particle; stores the run and prints the result',
    options: {
      xB: { type: 'string', description: 'atomic fraction of B (0..1), required' },
      shape: { type: 'string', description: 'cuboctahedron (default), icosahedron, truncated-octahedron or sphere' },
      shells: { type: 'string', description: 'shells around the centre atom (or give --diameter-nm)' },
      'diameter-nm': { type: 'string', description: 'particle diameter in nm (nearest closed shell; sphere: cut)' },
      'temperature-k': { type: 'string', description: 'temperature in K, required' },
      sweeps: {
        type: 'string',
        description:
          'most sweeps to run (one swap attempt per atom each), required; the run stops earlier at the answer',
      },
      relaxation: {
        type: 'string',
        description: 'rigid or relaxed (default: relaxed when the metals differ in size by more than 6 %)',
      },
      'fixed-sweeps': {
        type: 'boolean',
        description: 'run every sweep instead of stopping once the surface composition is known to ±0.005',
      },
      'anneal-from-k': {
        type: 'string',
        description: 'anneal: start temperature in K, cooled to --temperature-k first',
      },
      'anneal-sweeps': {
        type: 'string',
        description: 'anneal: sweeps spent cooling (default 1000 when --anneal-from-k is given)',
      },
      seed: { type: 'string', description: 'random seed (default 1)' },
      label: { type: 'string', description: 'a label stored with the run' },
      xyz: { type: 'string', description: 'also write the final structure as extended XYZ to this file' },
    },
    run: async (args, context) => {
      const [elementA, elementB] = pairOption(args);
      const xB = optionalNumber(args, 'xB');
      if (xB === undefined) throw new CliError('--xB is required (atomic fraction of B, e.g. --xB 0.5)');
      const temperatureK = optionalNumber(args, 'temperature-k');
      if (temperatureK === undefined) throw new CliError('--temperature-k is required');
      const sweeps = integerOption(args, 'sweeps');
      if (sweeps === undefined) throw new CliError('--sweeps is required');
      const shells = integerOption(args, 'shells');
      const diameterNm = optionalNumber(args, 'diameter-nm');
      const annealFrom = optionalNumber(args, 'anneal-from-k');
      const annealSweeps = integerOption(args, 'anneal-sweeps');
      if (annealSweeps !== undefined && annealFrom === undefined)
        throw new CliError('--anneal-sweeps needs --anneal-from-k');
      const shape = optionalString(args, 'shape') ?? 'cuboctahedron';
      const relaxation = optionalString(args, 'relaxation');
      if (relaxation !== undefined && relaxation !== 'rigid' && relaxation !== 'relaxed')
        throw new CliError(`--relaxation must be rigid or relaxed, got "${relaxation}"`);
      const started = await context.call('simulation.start', {
        elementA,
        elementB,
        xB,
        shape: shape as 'cuboctahedron',
        ...(shells !== undefined ? { shells } : {}),
        ...(diameterNm !== undefined ? { diameterNm } : {}),
        ...(shells === undefined && diameterNm === undefined ? { shells: 6 } : {}),
        temperatureK,
        sweeps,
        anneal: annealFrom === undefined ? null : { startTemperatureK: annealFrom, sweeps: annealSweeps ?? 1000 },
        seed: integerOption(args, 'seed') ?? 1,
        label: optionalString(args, 'label') ?? '',
        ...(relaxation !== undefined ? { relaxation } : {}),
        ...(args.values['fixed-sweeps'] === true ? { stopping: null } : {}),
      });
      const ended = await waitForRun(context, started.id);
      if (ended.status !== 'done') throw new CliError(`run ${ended.id} ${ended.status}: ${ended.error ?? 'no result'}`);
      const run = await context.call('simulation.get', { id: started.id });
      const result = run.result;
      if (!result) throw new CliError(`run ${run.id} has no stored result`);
      const xyzPath = optionalString(args, 'xyz');
      let note = '';
      if (xyzPath) {
        const exported = await context.call('simulation.exportXyz', { id: run.id });
        context.writeTextFile(xyzPath, exported.content);
        note = `\nfinal structure written to ${xyzPath}`;
      }
      return {
        json: { ...simulationJson(run, result), xyzFile: xyzPath ?? null },
        text: simulationText(run, result) + note,
      };
    },
  },
  {
    words: ['energy'],
    args: '<structure.xyz>',
    summary: 'Gupta (Cleri & Rosato) energy of a cluster given as (extended) XYZ in Å; stores nothing',
    options: {
      'cutoff-angstrom': {
        type: 'string',
        description: "pair cutoff in Å (default 2.35 × the structure's nearest-neighbour distance)",
      },
    },
    run: async (args, context) => {
      const path = requirePositional(args, 0, 'structure.xyz');
      const cutoff = optionalNumber(args, 'cutoff-angstrom');
      const energy: StructureEnergy = await context.call('simulation.energy', {
        xyz: context.readTextFile(path),
        ...(cutoff !== undefined ? { cutoffAngstrom: cutoff } : {}),
      });
      const composition = Object.entries(energy.composition)
        .map(([symbol, count]) => `${symbol}${count}`)
        .join(' ');
      const text = [
        `${energy.atoms} atoms (${composition})`,
        `energy ${f(energy.energyEv, 10)} eV, ${f(energy.energyPerAtomEv, 8)} eV/atom`,
        `nearest-neighbour distance ${f(energy.nearestNeighbourAngstrom, 5)} Å, cutoff ${f(energy.cutoffAngstrom, 5)} Å`,
        ...energy.pairRules.map((rule) => `unlike pairs: ${rule.description}`),
      ].join('\n');
      return { json: energy, text };
    },
  },
  {
    words: ['relax'],
    args: '<structure.xyz>',
    summary: 'Minimise the off-lattice Gupta energy of a cluster given as (extended) XYZ in Å (FIRE); stores nothing',
    options: {
      xyz: { type: 'string', description: 'write the relaxed structure as extended XYZ to this file' },
      'force-tolerance': { type: 'string', description: 'stop when every force is below this, eV/Å (default 0.001)' },
      'max-iterations': { type: 'string', description: 'give up after this many steps (default 20000)' },
    },
    run: async (args, context) => {
      const path = requirePositional(args, 0, 'structure.xyz');
      const tolerance = optionalNumber(args, 'force-tolerance');
      const maxIterations = integerOption(args, 'max-iterations');
      const relaxed = await context.call('simulation.relax', {
        xyz: context.readTextFile(path),
        ...(tolerance !== undefined ? { forceToleranceEvPerAngstrom: tolerance } : {}),
        ...(maxIterations !== undefined ? { maxIterations } : {}),
      });
      const out = optionalString(args, 'xyz');
      if (out) context.writeTextFile(out, relaxed.xyz);
      const { xyz: _structure, ...numbers } = relaxed;
      const text = [
        `${relaxed.atoms} atoms: ${f(relaxed.initialEnergyEv, 10)} eV → ${f(relaxed.relaxedEnergyEv, 10)} eV (${f(relaxed.relaxedEnergyPerAtomEv, 8)} eV/atom)`,
        `${relaxed.iterations} steps, largest force ${f(relaxed.maxForceEvPerAngstrom, 3)} eV/Å` +
          (relaxed.converged
            ? ''
            : ` — NOT converged to ${relaxed.forceToleranceEvPerAngstrom} eV/Å; raise --max-iterations`),
        relaxed.method,
        ...(out ? [`relaxed structure written to ${out}`] : []),
      ].join('\n');
      return { json: { ...numbers, xyzFile: out ?? null }, text };
    },
  },
  {
    words: ['simulations'],
    args: '',
    summary: 'List stored Monte Carlo runs, newest first',
    options: { limit: { type: 'string', description: 'how many (default 20)' } },
    run: async (args, context) => {
      const runs = await context.call('simulation.list', { limit: integerOption(args, 'limit') ?? 20 });
      const text = formatTable(runs, [
        { header: 'id', value: (r) => String(r.id), align: 'right' },
        { header: 'pair', value: (r) => `${r.spec.elementA}-${r.spec.elementB}` },
        { header: 'xB', value: (r) => String(r.spec.xB), align: 'right' },
        { header: 'shape', value: (r) => r.spec.shape },
        { header: 'atoms', value: (r) => String(r.atoms), align: 'right' },
        { header: 'T K', value: (r) => String(r.spec.temperatureK), align: 'right' },
        { header: 'status', value: (r) => r.status },
        { header: 'architecture', value: (r) => r.architecture ?? '–' },
        { header: 'created', value: (r) => r.createdAt },
      ]);
      return { json: runs, text: runs.length === 0 ? 'no stored runs' : text };
    },
  },
];
