/**
 * Order of addition and conditions for each synthesis route, as printed on a bench sheet. These are the usual
 * ways each route is run (common practice, summarised from the colloid-synthesis literature and lab manuals), written
 * with the batch's own reagents; they are a starting point for the operator, never a validated procedure.
 */
import type { SynthesisRoute } from '../recipes/design-input';
import type { DesignedReagent } from '../recipes/design/types';

export const PROCEDURE_SOURCE = "common practice — adapt to your group's validated procedure";

export const PROCEDURE_REMINDER =
  "These steps assist your planning; they never replace the supplier's safety data sheet (SDS), your " +
  "institution's safety rules or local regulations. Read every reagent's SDS before you start, and have a " +
  'qualified person review any new procedure.';

export interface ProcedureStep {
  text: string;
}

const names = (reagents: readonly DesignedReagent[], role: DesignedReagent['role']): string =>
  reagents
    .filter((r) => r.role === role)
    .map((r) => r.name)
    .join(' and ');

const or = (text: string, fallback: string): string => (text === '' ? fallback : text);

/** Steps for the batch's route, naming its reagents; `temperatureC` is the design's highest temperature. */
export function procedureFor(
  route: SynthesisRoute,
  reagents: readonly DesignedReagent[],
  temperatureC: number,
): ProcedureStep[] {
  const precursors = or(names(reagents, 'metal-precursor'), 'the metal precursor(s)');
  const reducer = or(names(reagents, 'reducer'), 'the reducer');
  const capping = or(names(reagents, 'capping-agent'), 'the capping agent (if any)');
  const solvent = or(names(reagents, 'solvent'), 'the solvent');
  const steps: string[] = (() => {
    switch (route) {
      case 'co-reduction':
        return [
          'Clean all glassware (aqua regia or a validated alternative), rinse with ultrapure water and dry.',
          `Add water, then ${precursors}, then ${capping}; stir vigorously until fully mixed.`,
          `Prepare ${reducer} fresh in ice-cold water immediately before use (borohydride hydrolyses within minutes).`,
          `Add the ice-cold ${reducer} quickly in one portion under vigorous stirring; expect a fast colour change and ` +
            'gas evolution (hydrogen): work in a fume hood, away from ignition sources, with the vessel open to vent.',
          `Keep stirring at about ${temperatureC} °C for at least 30 min, then store capped and protected from light.`,
        ];
      case 'seed-mediated':
        return [
          'Clean all glassware (aqua regia or a validated alternative), rinse with ultrapure water and dry.',
          `Add water, the seed dispersion and ${capping}; stir gently.`,
          `Add ${precursors} (the shell precursor) and mix.`,
          `Add ${reducer} (mild reducer) slowly, dropwise or by syringe pump, under gentle stirring so the shell ` +
            'grows on the seeds instead of nucleating new particles.',
          `Keep at about ${temperatureC} °C until the colour is stable (typically 30–60 min); record the time.`,
        ];
      case 'polyol':
        return [
          `Dissolve ${capping} in ${solvent} and heat to about ${temperatureC} °C under stirring and reflux ` +
            '(inert gas if the procedure asks for it).',
          `Add ${precursors} (as a solution in the same polyol) slowly or in portions at temperature.`,
          `Hold at about ${temperatureC} °C for the planned time; hot glycol burns — use a heating block or ` +
            'oil bath with a temperature limiter.',
          'Cool to room temperature, then wash with acetone/ethanol and centrifuge to collect the particles.',
        ];
      case 'organic':
        return [
          `Combine ${precursors} with ${solvent} (and ${capping}) in a three-neck flask under inert gas (N₂ or Ar).`,
          'Degas at 100–120 °C under vacuum or gas flow for 20–30 min to remove water and oxygen.',
          `Heat under inert gas to about ${temperatureC} °C` +
            (reducer === 'the reducer' ? '' : `, adding ${reducer} as planned,`) +
            ' and hold for the planned time.',
          'Cool under inert gas; precipitate with ethanol, centrifuge and redisperse in hexane or toluene.',
        ];
    }
  })();
  return steps.map((text) => ({ text }));
}
