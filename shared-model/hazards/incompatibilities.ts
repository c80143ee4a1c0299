/**
 * Incompatibility warnings and route-specific cautions (DOMAIN.md Models 8). Rules of the trade
 * ("common practice"), written for a synthesis bench; each names the reagents that trigger it.
 * The supplier's SDS, institutional rules and local regulations always take precedence.
 */
import { hydrogenFromBorohydride, idealGasVolumeMl } from './hydrogen';

/** What a reagent brings to the incompatibility rules. */
export type HazardTag =
  | 'borohydride'
  | 'borane-amine'
  | 'acid'
  | 'water'
  | 'ammonia'
  | 'silver-salt'
  | 'chloroplatinate'
  | 'amine'
  | 'hydrazine'
  | 'carbonyl'
  | 'nitric-acid'
  | 'hydrochloric-acid'
  | 'oxidizer'
  | 'organic'
  | 'flammable';

export const HAZARD_TAGS: readonly HazardTag[] = [
  'borohydride',
  'borane-amine',
  'acid',
  'water',
  'ammonia',
  'silver-salt',
  'chloroplatinate',
  'amine',
  'hydrazine',
  'carbonyl',
  'nitric-acid',
  'hydrochloric-acid',
  'oxidizer',
  'organic',
  'flammable',
];

export interface TaggedReagent {
  key: string;
  name: string;
  tags: readonly HazardTag[];
  /** Amount used in the batch (mmol), when known: feeds the hydrogen estimate. */
  amountMmol?: number;
}

export interface IncompatibilityContext {
  /** Highest temperature of the procedure (°C); heating rules fire above their thresholds. */
  temperatureC?: number;
  /** Metals present in the batch (precursor metals and seed metal). */
  metals?: readonly string[];
  /** True when the batch is run in water (aqueous stocks count as water). */
  aqueous?: boolean;
}

export type WarningSeverity = 'info' | 'caution' | 'danger';

export interface IncompatibilityWarning {
  id: string;
  severity: WarningSeverity;
  /** Keys of the reagents that trigger it (empty for route-level cautions). */
  reagentKeys: string[];
  message: string;
  /** Upper-bound hydrogen volume at 25 °C, 1 atm when the warning is about hydride hydrolysis. */
  hydrogenMl?: number;
}

/** H2 per formula unit from complete hydrolysis of a borane–amine adduct: R-NH2·BH3 + 3 H2O → R-NH2 + B(OH)3 + 3 H2. */
const BORANE_AMINE_H2_PER_UNIT = 3;

const HYDROGEN_CATALYST_METALS = new Set(['Pt', 'Pd', 'Ni', 'Ir', 'Rh', 'Ru', 'Co']);

function withTag(reagents: readonly TaggedReagent[], tag: HazardTag): TaggedReagent[] {
  return reagents.filter((r) => r.tags.includes(tag));
}

function names(reagents: readonly TaggedReagent[]): string {
  return reagents.map((r) => r.name).join(', ');
}

function keys(...groups: TaggedReagent[][]): string[] {
  return [...new Set(groups.flat().map((r) => r.key))];
}

function formatMl(ml: number): string {
  return ml >= 100 ? ml.toFixed(0) : ml >= 10 ? ml.toFixed(1) : ml.toPrecision(2);
}

/** All warnings that apply to the reagents present together, plus route-level cautions. */
export function incompatibilityWarnings(
  reagents: readonly TaggedReagent[],
  context: IncompatibilityContext = {},
): IncompatibilityWarning[] {
  const warnings: IncompatibilityWarning[] = [];
  const temperatureC = context.temperatureC ?? 25;
  const metals = new Set(context.metals ?? []);

  const borohydrides = withTag(reagents, 'borohydride');
  const boranes = withTag(reagents, 'borane-amine');
  const acids = withTag(reagents, 'acid');
  const waters = withTag(reagents, 'water');
  const hasWater = waters.length > 0 || context.aqueous === true;

  if (borohydrides.length > 0 && (acids.length > 0 || hasWater)) {
    const mmol = borohydrides.reduce((sum, r) => sum + (r.amountMmol ?? 0), 0);
    const estimate = hydrogenFromBorohydride(mmol);
    const withWhat = acids.length > 0 ? `acid (${names(acids)})${hasWater ? ' and water' : ''}` : 'water';
    const amountKnown = borohydrides.every((r) => r.amountMmol !== undefined);
    warnings.push({
      id: 'borohydride-hydrolysis',
      severity: acids.length > 0 ? 'danger' : 'caution',
      reagentKeys: keys(borohydrides, acids, waters),
      message:
        `${names(borohydrides)} with ${withWhat} releases hydrogen (${estimate.stoichiometry}). ` +
        (amountKnown
          ? `Upper bound for ${mmol.toPrecision(3)} mmol: ${formatMl(estimate.hydrogenMl)} mL H2 at 25 °C, 1 atm (ideal gas). `
          : '') +
        'Make the stock ice-cold and fresh, add it in an open, vented vessel in a fume hood, away from ignition sources; never seal a borohydride solution.',
      ...(amountKnown ? { hydrogenMl: estimate.hydrogenMl } : {}),
    });
  }

  if (boranes.length > 0 && (acids.length > 0 || hasWater)) {
    const mmol = boranes.reduce((sum, r) => sum + (r.amountMmol ?? 0), 0);
    const hydrogenMl = idealGasVolumeMl(mmol * BORANE_AMINE_H2_PER_UNIT);
    warnings.push({
      id: 'borane-amine-hydrolysis',
      severity: 'caution',
      reagentKeys: keys(boranes, acids, waters),
      message: `${names(boranes)} hydrolyses with acid or water to boric acid and hydrogen (R-NH2·BH3 + 3 H2O → R-NH2 + B(OH)3 + 3 H2)${mmol > 0 ? `: up to ${formatMl(hydrogenMl)} mL H2 at 25 °C, 1 atm` : ''}. Vent the vessel.`,
      ...(mmol > 0 ? { hydrogenMl } : {}),
    });
  }

  const silver = withTag(reagents, 'silver-salt');
  const ammonia = withTag(reagents, 'ammonia');
  if (silver.length > 0 && ammonia.length > 0) {
    warnings.push({
      id: 'ammoniacal-silver',
      severity: 'danger',
      reagentKeys: keys(silver, ammonia),
      message: `${names(silver)} with ${names(ammonia)} makes ammoniacal silver (Tollens'-type) solution. It must not stand: on standing or drying it deposits explosive silver nitride ("fulminating silver"). Prepare it immediately before use, never store it, and destroy leftovers at once with dilute acid.`,
    });
  }

  const chloroplatinates = withTag(reagents, 'chloroplatinate');
  if (chloroplatinates.length > 0) {
    warnings.push({
      id: 'chloroplatinate-sensitiser',
      severity: 'caution',
      reagentKeys: keys(chloroplatinates),
      message: `${names(chloroplatinates)}: halogenated platinum salts are potent respiratory and skin sensitisers (platinum salt sensitivity). Weigh in a ventilated enclosure, avoid dust, keep contaminated gloves off surfaces; sensitised people must not handle them.`,
    });
  }

  const amines = withTag(reagents, 'amine');
  if (amines.length > 0 && temperatureC > 100) {
    warnings.push({
      id: 'heated-amine',
      severity: 'caution',
      reagentKeys: keys(amines),
      message: `${names(amines)} heated to ${temperatureC.toFixed(0)} °C: hot amines are corrosive and give irritating fumes. Work in a fume hood under inert gas (N2 or Ar, Schlenk line) with a condenser and temperature control; never heat a closed vessel.`,
    });
  }

  const flammables = withTag(reagents, 'flammable');
  const organics = withTag(reagents, 'organic');
  if ((flammables.length > 0 || organics.length > 0) && temperatureC > 60) {
    const solvents = flammables.length > 0 ? flammables : organics;
    warnings.push({
      id: 'heated-solvent',
      severity: 'caution',
      reagentKeys: keys(solvents),
      message: `${names(solvents)} heated to ${temperatureC.toFixed(0)} °C: keep well below the autoignition temperature, heat under inert gas with a heating mantle or oil/sand bath (no open flame), and keep a lid or extinguisher at hand.`,
    });
  }

  const hydrazines = withTag(reagents, 'hydrazine');
  const catalysts = [...metals].filter((m) => HYDROGEN_CATALYST_METALS.has(m));
  if (hydrazines.length > 0 && catalysts.length > 0) {
    warnings.push({
      id: 'hydrazine-catalytic-decomposition',
      severity: 'danger',
      reagentKeys: keys(hydrazines),
      message: `${names(hydrazines)} decomposes catalytically on ${catalysts.join('/')} surfaces (N2H4 → N2 + 2 H2, 3 N2H4 → 4 NH3 + N2), exothermically and with gas evolution. Add it slowly and dilute, with venting and cooling at hand; never add it to a hot or concentrated dispersion of these metals.`,
    });
  }

  const carbonyls = withTag(reagents, 'carbonyl');
  if (carbonyls.length > 0) {
    warnings.push({
      id: 'metal-carbonyl',
      severity: 'danger',
      reagentKeys: keys(carbonyls),
      message: `${names(carbonyls)} releases carbon monoxide on heating and decomposition (the point of using it). Work only in a well-drawing fume hood with a CO monitor, vent the reaction through a bubbler into the hood exhaust, and keep it air-free (it is toxic and can be pyrophoric).`,
    });
  }

  const nitric = withTag(reagents, 'nitric-acid');
  const hydrochloric = withTag(reagents, 'hydrochloric-acid');
  if (nitric.length > 0 && hydrochloric.length > 0) {
    warnings.push({
      id: 'aqua-regia',
      severity: 'danger',
      reagentKeys: keys(nitric, hydrochloric),
      message: `${names(nitric)} with ${names(hydrochloric)} forms aqua regia, which evolves Cl2, NOCl and NOx. Make it fresh for each use, in a fume hood, never stopper or cap it (pressure builds and bottles burst), never mix it with organics or store it; neutralise and dispose of it as soon as it has done its work.`,
    });
  }
  const oxidisers = [...nitric, ...withTag(reagents, 'oxidizer').filter((r) => !r.tags.includes('silver-salt'))];
  if (nitric.length > 0 && organics.length > 0) {
    warnings.push({
      id: 'nitric-organic',
      severity: 'danger',
      reagentKeys: keys(oxidisers, organics),
      message: `${names(nitric)} with organic reagents (${names(organics)}) can react violently or explosively; keep nitric acid and acid cleaning baths away from the synthesis organics and their waste.`,
    });
  }

  if (acids.length > 0 && hydrazines.length > 0) {
    warnings.push({
      id: 'hydrazine-acid',
      severity: 'info',
      reagentKeys: keys(acids, hydrazines),
      message: `${names(hydrazines)} with ${names(acids)}: neutralisation is exothermic; add slowly with cooling.`,
    });
  }

  return warnings;
}

/** Cautions that apply to every synthesis Pairwright plans, whatever the reagents. */
export function standingBenchCautions(): IncompatibilityWarning[] {
  return [
    {
      id: 'dry-nanopowder',
      severity: 'caution',
      reagentKeys: [],
      message:
        'Dry metal nanopowders are an inhalation hazard (and some, e.g. Ni, Co, Pd, Pt, can be pyrophoric or catalyse ignition of solvent vapour): keep products wet or dispersed, dry and weigh them only in a ventilated enclosure, and wear respiratory protection your institution approves.',
    },
    {
      id: 'aqua-regia-glassware',
      severity: 'caution',
      reagentKeys: [],
      message:
        'Glassware for noble-metal syntheses is commonly cleaned with aqua regia (3 HCl : 1 HNO3 by volume): make it fresh, in a fume hood, never stopper or store it, rinse thoroughly, and collect the spent acid (it carries dissolved precious metal) for neutralisation and recovery.',
    },
  ];
}
