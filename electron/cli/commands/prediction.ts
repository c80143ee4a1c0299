/**
 * `pairwright elements`, `pairwright predict A-B`, `pairwright rank --elements … --target …`:
 * the segregation prediction from the command line (same services as the app).
 */
import type { ConditionsInput, MissRow, RankRow } from '../../../shared-model/api/prediction';
import { PREDICTION_DEFAULTS } from '../../../shared-model/prediction/conditions';
import type { Prediction } from '../../../shared-model/prediction/predict';
import {
  CliError,
  optionalNumber,
  optionalString,
  requirePositional,
  type CliCommand,
  type OptionSpec,
  type ParsedArgs,
} from '../command';
import { formatTable, type Column } from '../table';

const CONDITION_OPTIONS: Record<string, OptionSpec> = {
  xB: { type: 'string', description: 'atomic fraction of the second element B, 0 < xB < 1 (default 0.5)' },
  'diameter-nm': { type: 'string', description: 'particle diameter in nm (default 3)' },
  shape: { type: 'string', description: 'cuboctahedron (default), icosahedron, truncated-octahedron or sphere' },
  'temperature-k': { type: 'string', description: 'synthesis or annealing temperature in K (default 600)' },
  facet: { type: 'string', description: 'surface facet of the segregation terms: 111 (default) or 100' },
  'strain-rule': { type: 'string', description: '"oversized solute" (default) or "any solute"' },
  environment: {
    type: 'string',
    description: 'vacuum (default), H2, CO, O2 (air) or ligand (thiol, amine): adsorbate-induced segregation',
  },
  'pressure-bar': { type: 'string', description: 'gas pressure for the adsorbate coverage, bar (default 1)' },
  'time-h': {
    type: 'string',
    description: 'time at the temperature, hours (default 1): interdiffusion length and the as-made verdict',
  },
};

function conditionsFrom(args: ParsedArgs): ConditionsInput {
  const shape = optionalString(args, 'shape');
  const facet = optionalString(args, 'facet');
  const strainRule = optionalString(args, 'strain-rule');
  const environment = optionalString(args, 'environment');
  const pressureBar = optionalNumber(args, 'pressure-bar');
  const timeH = optionalNumber(args, 'time-h');
  return {
    xB: optionalNumber(args, 'xB') ?? PREDICTION_DEFAULTS.xB,
    diameterNm: optionalNumber(args, 'diameter-nm') ?? PREDICTION_DEFAULTS.diameterNm,
    temperatureK: optionalNumber(args, 'temperature-k') ?? PREDICTION_DEFAULTS.temperatureK,
    ...(shape !== undefined ? { shape: shape as ConditionsInput['shape'] } : {}),
    ...(facet !== undefined ? { facet: facet as ConditionsInput['facet'] } : {}),
    ...(strainRule !== undefined ? { strainRule: strainRule as ConditionsInput['strainRule'] } : {}),
    ...(environment !== undefined ? { environment: environment as ConditionsInput['environment'] } : {}),
    ...(pressureBar !== undefined ? { pressureBar } : {}),
    ...(timeH !== undefined ? { timeH } : {}),
  };
}

const percent = (x: number) => `${(100 * x).toFixed(1)} %`;
const ev = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(3)} eV`;

function describePrediction(p: Prediction): string {
  return [
    `${p.pair} at xB = ${p.xB} (${percent(p.xB)} ${p.elementB}), ${p.diameterNm} nm ${p.shape}, ${p.temperatureK} K for ${p.timeH} h, ${p.environment}, (${p.facet}) terms`,
    `  architecture      ${p.architecture} after annealing (confidence ${p.confidence.toFixed(2)}${p.certainty.uncertain ? ', uncertain' : ''}); as made: ${p.verdicts.asMade}`,
    `  kinetics          ${p.verdicts.text}`,
    `  surface element   ${p.surfaceElement ?? 'none'}: ${percent(p.surfaceFraction)} of ${p.surfaceSites} surface sites (${p.atoms} atoms); enrichment E = ${p.enrichment.toFixed(3)}`,
    `  core              ${percent(p.coreXB)} ${p.elementB}`,
    `  terms             surface energy ${ev(p.terms.surfaceEnergy)}, chemical ${ev(p.terms.chemical)}, elastic ${ev(p.terms.elastic)}, adsorbate ${ev(p.terms.adsorbate)} (×${p.calibrationScale} calibrated; negative favours ${p.surfaceElement ?? p.elementB} outside)`,
    `  dilute limits     ${p.elementB} in ${p.elementA}: ${ev(p.segregation.bInA.total)}; ${p.elementA} in ${p.elementB}: ${ev(p.segregation.aInB.total)}`,
    `  mixing            ΔHmix ${p.mixingEnthalpyKjPerMol.toFixed(1)} kJ/mol (chemical ${p.mixingChemicalKjPerMol.toFixed(1)}, elastic ${p.mixingElasticKjPerMol.toFixed(1)}); unlike neighbours ×${p.unlikeNeighbourRatio.toFixed(2)}`,
    ...(p.adsorbate.adsorbate !== null
      ? [
          `  adsorbate         ${p.adsorbate.adsorbate}: E_ads ${p.elementA} ${p.adsorbate.energyAEv ?? '–'} eV, ${p.elementB} ${p.adsorbate.energyBEv ?? '–'} eV, coverage ${p.adsorbate.coverage.toFixed(2)} (${p.adsorbate.source})`,
        ]
      : []),
    ...(p.wetting !== null
      ? [
          `  wetting           S = ${p.wetting.spreadingJPerM2.toFixed(2)} J/m² (γ ${p.wetting.core} ${p.wetting.gammaCoreJPerM2.toFixed(2)} − γ ${p.wetting.shell} ${p.wetting.gammaShellJPerM2.toFixed(2)} − γ_AB ${p.wetting.interfaceJPerM2.toFixed(2)}): ${p.wetting.verdict}${p.wetting.flipDiameterNm !== null ? `, flips at ${p.wetting.flipDiameterNm.toFixed(1)} nm` : ''}`,
        ]
      : []),
    ...(p.oxidation.summary !== '' ? [`  in air           ${p.oxidation.summary}`] : []),
    `  surface energies  ${p.certainty.sources.note}`,
    `  why               ${p.reason}`,
    ...p.flags.map((flag) => `  note              ${flag}`),
    `  model ${p.modelVersion}, classifier ${p.classifierVersion}`,
  ].join('\n');
}

const RANK_COLUMNS: Array<Column<RankRow>> = [
  { header: '#', value: (r) => r.rank, align: 'right' },
  { header: 'pair', value: (r) => r.prediction.pair },
  { header: 'score', value: (r) => r.score.toFixed(3), align: 'right' },
  { header: 'architecture', value: (r) => r.prediction.architecture },
  {
    header: 'conf.',
    value: (r) => `${r.prediction.confidence.toFixed(2)}${r.prediction.certainty.uncertain ? ' uncertain' : ''}`,
    align: 'right',
  },
  { header: 'as made', value: (r) => r.prediction.verdicts.asMade },
  { header: 'in air', value: (r) => r.prediction.oxidation.oxidisingInAir.map((e) => `${e} oxide`).join(', ') || '-' },
  { header: 'surface', value: (r) => r.prediction.surfaceElement ?? '-' },
  { header: 'E', value: (r) => r.prediction.enrichment.toFixed(2), align: 'right' },
  { header: 'ΔHmix kJ/mol', value: (r) => r.prediction.mixingEnthalpyKjPerMol.toFixed(1), align: 'right' },
  { header: 'why', value: (r) => r.prediction.reason },
];

export const predictionCommands: CliCommand[] = [
  {
    words: ['elements'],
    args: '',
    summary:
      'The element property table (structure, lattice, cohesive energy, radii, surface energy, moduli, Miedema parameters) with sources',
    options: {},
    run: async (_args, context) => {
      const table = await context.call('elements.table', {});
      const text =
        formatTable(table.elements, [
          { header: 'el', value: (e) => e.symbol },
          { header: 'structure', value: (e) => e.cell.structure },
          { header: 'a/Å', value: (e) => e.latticeConstantAngstrom, align: 'right' },
          { header: 'Ecoh/eV', value: (e) => e.cohesiveEnergyEv, align: 'right' },
          { header: 'r12/Å', value: (e) => e.metallicRadiusAngstrom, align: 'right' },
          { header: 'γ/J m⁻²', value: (e) => e.surfaceEnergyJPerM2, align: 'right' },
          { header: 'χ', value: (e) => e.electronegativityPauling, align: 'right' },
          { header: 'B/GPa', value: (e) => e.bulkModulusGpa, align: 'right' },
          { header: 'G/GPa', value: (e) => e.shearModulusGpa, align: 'right' },
          { header: 'M/g mol⁻¹', value: (e) => e.atomicMass, align: 'right' },
          { header: 'φ*/V', value: (e) => e.miedema?.phiStarV, align: 'right' },
          { header: 'nws^1/3', value: (e) => e.miedema?.nws13, align: 'right' },
          { header: 'V^2/3', value: (e) => e.miedema?.v23Cm2, align: 'right' },
          { header: 'ox.', value: (e) => e.oxidationStates.map((s) => `+${s}`).join(' ') },
        ]) +
        '\n\nsources:\n' +
        table.sources
          .map((s) => `  ${s.column} [${s.unit}]: ${s.source}${s.fromMemory ? ' (values from memory)' : ''}`)
          .join('\n');
      return { json: table, text };
    },
  },
  {
    words: ['predict'],
    args: '<A-B>',
    summary:
      'Predict the surface composition and architecture of one pair, e.g. predict Ag-Pd --xB 0.5 --diameter-nm 3 --temperature-k 600',
    options: CONDITION_OPTIONS,
    run: async (args, context) => {
      const prediction = await context.call('prediction.predict', {
        pair: requirePositional(args, 0, 'A-B'),
        conditions: conditionsFrom(args),
      });
      return { json: prediction, text: describePrediction(prediction) };
    },
  },
  {
    words: ['rank'],
    args: '',
    summary:
      'The pairs of an element set that meet a target, best first: rank --elements Pt,Pd,Au,Ag,Ni,Cu,Co --target core@shell:Pt [--all]',
    options: {
      ...CONDITION_OPTIONS,
      elements: { type: 'string', description: 'comma-separated symbols, or "all" (default all)' },
      target: {
        type: 'string',
        description: 'alloy, core@shell, core@shell:X (X in the shell), Janus or intermetallic (default alloy)',
      },
      limit: { type: 'string', description: 'print only the best N pairs' },
      all: { type: 'boolean', description: 'also list the pairs that do not meet the target, with why' },
    },
    run: async (args, context) => {
      const list = optionalString(args, 'elements') ?? 'all';
      const elements =
        list.trim().toLowerCase() === 'all'
          ? ('all' as const)
          : list
              .split(',')
              .map((s) => s.trim())
              .filter((s) => s !== '');
      const limit = optionalNumber(args, 'limit');
      if (limit !== undefined && (!Number.isInteger(limit) || limit < 1))
        throw new CliError(`--limit must be a whole number ≥ 1, got ${limit}`);
      const result = await context.call('prediction.rank', {
        elements,
        target: optionalString(args, 'target') ?? 'alloy',
        conditions: conditionsFrom(args),
        ...(limit !== undefined ? { limit } : {}),
        ...(args.values.all === true ? { all: true } : {}),
      });
      const header =
        `target: ${result.target}; xB ${result.conditions.xB}, ${result.conditions.diameterNm} nm ${result.conditions.shape}, ` +
        `${result.conditions.temperatureK} K for ${result.conditions.timeH} h, ${result.conditions.environment}\n` +
        `${result.meeting} of ${result.ranked} pairs meet the target`;
      const parts = [header];
      if (result.rows.length > 0) parts.push(formatTable(result.rows, RANK_COLUMNS));
      if (result.missing.length > 0) {
        parts.push(
          result.meeting === 0 ? `No pair meets ${result.target}; the closest:` : `Not meeting ${result.target}:`,
          formatTable(result.missing, [
            ...RANK_COLUMNS.slice(0, 3),
            { header: 'not met because', value: (r: MissRow) => r.miss },
            ...RANK_COLUMNS.slice(3),
          ]),
        );
      } else if (result.meeting < result.ranked)
        parts.push(`(${result.ranked - result.meeting} pairs that miss it: add --all)`);
      const text = parts.join('\n');
      return { json: result, text };
    },
  },
];
