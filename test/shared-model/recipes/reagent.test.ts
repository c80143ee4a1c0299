import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { hazardStatement, minimumSignalWord, stricterSignalWord } from '../../../shared-model/hazards/ghs';
import { electronsDonated, prepareReagent, type ReagentInput } from '../../../shared-model/recipes/reagent';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';
import { REDUCER_HALF_REACTIONS } from '../../../shared-model/recipes/reducers';

function fieldOf(input: unknown): string | undefined {
  try {
    prepareReagent(input);
  } catch (error) {
    if (error instanceof DomainError) return error.field;
    throw error;
  }
  return undefined;
}

const base = REAGENT_SEED.find((r) => r.key === 'haucl4-3h2o') as ReagentInput;

describe('the seed catalog', () => {
  it('has about thirty reagents with unique keys', () => {
    expect(REAGENT_SEED.length).toBeGreaterThanOrEqual(30);
    expect(new Set(REAGENT_SEED.map((r) => r.key)).size).toBe(REAGENT_SEED.length);
  });

  it.each(REAGENT_SEED.map((r) => [r.key, r] as const))('%s validates', (_key, reagent) => {
    const prepared = prepareReagent(reagent);
    expect(prepared.molarMassGPerMol).toBeGreaterThan(0);
    expect(prepared.source).toBe("typical classification, verify with your supplier's SDS");
    // the stated signal word is at least what the codes require
    const minimum = minimumSignalWord(prepared.hCodes);
    expect(stricterSignalWord(prepared.signalWord, minimum)).toBe(prepared.signalWord);
    for (const code of prepared.hCodes) expect(hazardStatement(code).code).toBe(code);
  });

  it('covers the reagents the issue names', () => {
    const formulas = new Set(REAGENT_SEED.map((r) => r.formula));
    for (const formula of [
      'HAuCl4·3H2O',
      'H2PtCl6·6H2O',
      'K2PtCl4',
      'Pt(C5H7O2)2',
      'Pd(C5H7O2)2',
      'Na2PdCl4',
      'AgNO3',
      'NaBH4',
      'C6H8O6',
      'N2H4·H2O',
      'C2H6O2',
      'C18H37N',
      'C18H34O2',
      'C19H42BrN',
      'CH2O',
      'C4H11N·BH3',
    ]) {
      expect(formulas.has(formula), formula).toBe(true);
    }
  });
});

describe('electrons per reducer formula unit (change of oxidation states, worked by hand)', () => {
  it.each([
    // BH4⁻: four H go from −1 to +1 → 4 × 2 = 8 e⁻ (B stays +3)
    ['nabh4', 8],
    // C6H8O6 → C6H6O6 + 2 H⁺: two H removed as protons with their electrons → 2 e⁻
    ['ascorbic-acid', 2],
    // N2H4 → N2: two N from −2 to 0 → 2 × 2 = 4 e⁻
    ['hydrazine-hydrate', 4],
    // HOCH2CH2OH → HOCH2CHO: one C from −1 to +1 → 2 e⁻
    ['ethylene-glycol', 2],
    // HCHO → HCOOH: C from 0 to +2 → 2 e⁻
    ['formaldehyde-37', 2],
    // R-NH2·BH3 → B(OH)3: three hydrides, H −1 → +1 → 3 × 2 = 6 e⁻
    ['borane-tbutylamine', 6],
    // RCH2NH2 → RCH=NH: C from −1 to +1 → 2 e⁻
    ['oleylamine', 2],
  ])('%s gives %i e⁻', (key, electrons) => {
    const reagent = REAGENT_SEED.find((r) => r.key === key) as ReagentInput;
    expect(electronsDonated(reagent)).toBe(electrons);
  });

  it('each half-reaction states its electrons', () => {
    for (const reaction of Object.values(REDUCER_HALF_REACTIONS)) {
      const written = reaction.halfReaction.match(/(\d+)?\s*e⁻/);
      expect(written, reaction.id).not.toBeNull();
      expect(Number(written?.[1] ?? 1), reaction.id).toBe(reaction.electrons);
    }
  });
});

describe('user-added or edited reagents: bad input names the field', () => {
  it('unparseable formula', () => {
    expect(fieldOf({ ...base, key: 'x', formula: 'HAuCl4(3H2O' })).toBe('formula');
    expect(fieldOf({ ...base, key: 'x', formula: 'Qq3' })).toBe('formula');
  });
  it('metal missing from the formula', () => {
    expect(fieldOf({ ...base, key: 'x', formula: 'AgNO3' })).toBe('metal.symbol');
  });
  it('a precursor without its metal', () => {
    expect(fieldOf({ ...base, key: 'x', metal: null })).toBe('metal');
  });
  it('a couple of another metal or oxidation state', () => {
    expect(fieldOf({ ...base, key: 'x', metal: { symbol: 'Au', oxidationState: 3, coupleId: 'PdCl4/Pd' } })).toBe(
      'metal.coupleId',
    );
    expect(fieldOf({ ...base, key: 'x', metal: { symbol: 'Au', oxidationState: 1, coupleId: 'AuCl4/Au' } })).toBe(
      'metal.coupleId',
    );
    expect(fieldOf({ ...base, key: 'x', metal: { symbol: 'Au', oxidationState: 3, coupleId: 'nonsense' } })).toBe(
      'metal.coupleId',
    );
  });
  it('a reducer without a half-reaction', () => {
    const nabh4 = REAGENT_SEED.find((r) => r.key === 'nabh4') as ReagentInput;
    expect(fieldOf({ ...nabh4, key: 'x', reducerHalfReactionId: null })).toBe('reducerHalfReactionId');
    expect(fieldOf({ ...nabh4, key: 'x', reducerHalfReactionId: 'magic' })).toBe('reducerHalfReactionId');
  });
  it('unknown H-code, weak signal word, liquid without density, bad key, assay out of range', () => {
    expect(fieldOf({ ...base, key: 'x', hCodes: ['H999'] })).toBe('hCodes');
    expect(fieldOf({ ...base, key: 'x', signalWord: 'Warning' })).toBe('signalWord');
    expect(fieldOf({ ...base, key: 'x', form: 'liquid' })).toBe('densityGPerMl');
    expect(fieldOf({ ...base, key: 'Bad Key' })).toBe('key');
    expect(fieldOf({ ...base, key: 'x', assayWtPct: 120 })).toBe('assayWtPct');
    expect(fieldOf({ ...base, key: 'x', assayWtPct: 0 })).toBe('assayWtPct');
  });
  it('a valid edit goes through with its molar mass', () => {
    const edited = prepareReagent({
      ...base,
      key: 'haucl4-anhydrous',
      name: 'Tetrachloroauric acid, anhydrous',
      formula: 'HAuCl4',
    });
    expect(edited.molarMassGPerMol).toBeCloseTo(339.79, 1);
  });
});
