import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  combineCouples,
  galvanicReplacement,
  REDUCTION_COUPLES,
  reductionCouple,
  reductionOrder,
  seedDissolutionCouple,
} from '../../../shared-model/recipes/potentials';
import { REAGENT_SEED } from '../../../shared-model/recipes/reagent-seed';

/**
 * Reference E° (V vs SHE, 25 °C). "read": CRC Handbook "Electrochemical Series" values as reproduced in
 * OpenStax Chemistry 2e, Appendix L. "memory": CRC Handbook (Vanýsek), recalled.
 */
const REFERENCE: Record<string, { e: number; source: 'read' | 'memory'; tolerance?: number; note?: string }> = {
  'AuCl4/Au': { e: 1.002, source: 'memory' },
  'PtCl6/PtCl4': { e: 0.68, source: 'read' },
  'PtCl4/Pt': { e: 0.755, source: 'read' },
  'Pt2+/Pt': { e: 1.18, source: 'memory', tolerance: 0.02, note: 'OpenStax prints 1.20' },
  'PdCl4/Pd': { e: 0.591, source: 'read' },
  'Pd2+/Pd': { e: 0.951, source: 'memory', tolerance: 0.04, note: 'OpenStax prints 0.987; editions differ' },
  'Ag+/Ag': { e: 0.7996, source: 'read' },
  'AgCl/Ag': { e: 0.22233, source: 'read' },
  'Cu2+/Cu': { e: 0.3419, source: 'memory', tolerance: 0.002, note: 'OpenStax prints 0.34' },
  'Ni2+/Ni': { e: -0.257, source: 'read' },
  'Co2+/Co': { e: -0.28, source: 'read' },
  'Fe2+/Fe': { e: -0.447, source: 'read' },
  'Fe3+/Fe': { e: -0.037, source: 'memory' },
  'RhCl6/Rh': { e: 0.431, source: 'memory', tolerance: 0.01, note: 'OpenStax prints 0.44' },
  'IrCl6/Ir': { e: 0.77, source: 'memory' },
  // Latimer from Ru3+/Ru2+ 0.2487 and Ru2+/Ru 0.455 (CRC, from memory): (1 × 0.2487 + 2 × 0.455)/3 = 0.38623
  'Ru3+/Ru': { e: 0.38623, source: 'memory' },
  // Latimer from the two Pt chloro couples: (2 × 0.68 + 2 × 0.755)/4 = 0.7175
  'PtCl6/Pt': { e: 0.7175, source: 'read' },
};

describe('standard reduction potentials vs the CRC Electrochemical Series', () => {
  it.each(Object.keys(REDUCTION_COUPLES))('%s', (id) => {
    const reference = REFERENCE[id];
    expect(reference, `no reference value written for ${id}`).toBeDefined();
    const couple = reductionCouple(id);
    expect(Math.abs(couple.eStandardV - (reference as { e: number }).e)).toBeLessThanOrEqual(
      reference?.tolerance ?? 0.0005,
    );
    expect(couple.fromMemory).toBe(reference?.source === 'memory');
  });

  it('electron counts follow the oxidation states', () => {
    expect(reductionCouple('AuCl4/Au').electrons).toBe(3);
    expect(reductionCouple('PtCl6/Pt').electrons).toBe(4);
    expect(reductionCouple('PtCl6/PtCl4').electrons).toBe(2);
    expect(reductionCouple('Ag+/Ag').electrons).toBe(1);
  });

  it('Latimer combination weights by electrons', () => {
    const combined = combineCouples('x', [reductionCouple('PtCl6/PtCl4'), reductionCouple('PtCl4/Pt')], '');
    expect(combined.eStandardV).toBeCloseTo(0.7175, 6);
    expect(combined.electrons).toBe(4);
  });

  it('every catalog precursor names a known couple of its own metal and oxidation state', () => {
    for (const reagent of REAGENT_SEED) {
      if (!reagent.metal || reagent.metal.coupleId === null) continue;
      const couple = reductionCouple(reagent.metal.coupleId);
      expect(couple.metal, reagent.key).toBe(reagent.metal.symbol);
      expect(couple.oxidationState, reagent.key).toBe(reagent.metal.oxidationState);
      expect(couple.reducedOxidationState, reagent.key).toBe(0);
    }
  });
});

describe('reduction order in co-reduction', () => {
  it('Pt(IV) reduces before Ni(II)', () => {
    const order = reductionOrder(reductionCouple('Ni2+/Ni'), reductionCouple('PtCl6/Pt'));
    expect(order.first).toBe('Pt');
    expect(order.gapV).toBeCloseTo(0.7175 + 0.257, 4);
  });
  it('Au(III) before Pd(II); Ag(I) before Pd(II) chloro-complex', () => {
    expect(reductionOrder(reductionCouple('PdCl4/Pd'), reductionCouple('AuCl4/Au')).first).toBe('Au');
    expect(reductionOrder(reductionCouple('PdCl4/Pd'), reductionCouple('Ag+/Ag')).first).toBe('Ag');
  });
  it('two couples of one metal are refused', () => {
    expect(() => reductionOrder(reductionCouple('PtCl4/Pt'), reductionCouple('PtCl6/Pt'))).toThrow(DomainError);
  });
});

describe('galvanic replacement, textbook cases', () => {
  const verdict = (shell: string, seedMetal: string, chloride: boolean) => {
    const seed = seedDissolutionCouple(seedMetal, chloride);
    if (!seed) throw new Error(`no seed couple for ${seedMetal}`);
    return galvanicReplacement(reductionCouple(shell), seed);
  };

  it('Au(III) on Ag seeds: yes, three Ag per Au (hollow Au–Ag nanoboxes)', () => {
    const v = verdict('AuCl4/Au', 'Ag', true);
    expect(v.replaces).toBe(true);
    expect(v.seedAtomsPerShellAtom).toBe(3);
    // even without chloride: 1.002 − 0.7996 = +0.2024 V
    expect(verdict('AuCl4/Au', 'Ag', false).drivingForceV).toBeCloseTo(0.2024, 4);
  });
  it('Pt(IV) on Au seeds: no', () => {
    const v = verdict('PtCl6/Pt', 'Au', true);
    expect(v.replaces).toBe(false);
    expect(v.drivingForceV).toBeCloseTo(0.7175 - 1.002, 4);
  });
  it('Pd(II) on Au seeds: no; Ag(I) on Au seeds: no', () => {
    expect(verdict('PdCl4/Pd', 'Au', true).replaces).toBe(false);
    expect(verdict('Ag+/Ag', 'Au', false).replaces).toBe(false);
  });
  it('Pd(II) and Pt(II) chloro-complexes on Ag seeds: yes with chloride (AgCl forms), two Ag per Pd', () => {
    const pd = verdict('PdCl4/Pd', 'Ag', true);
    expect(pd.replaces).toBe(true);
    expect(pd.seedAtomsPerShellAtom).toBe(2);
    expect(verdict('PtCl4/Pt', 'Ag', true).replaces).toBe(true);
    // without chloride Ag⁺/Ag (0.7996 V) lies above PtCl4²⁻/Pt (0.755 V): no replacement
    expect(verdict('PtCl4/Pt', 'Ag', false).replaces).toBe(false);
  });
  it('Pt(II) on Pd seeds: yes, one Pd per Pt', () => {
    const v = verdict('PtCl4/Pt', 'Pd', true);
    expect(v.replaces).toBe(true);
    expect(v.seedAtomsPerShellAtom).toBe(1);
  });
  it('Pt(IV) on Ni seeds: yes, two Ni per Pt; Ni(II) on Pt seeds: no', () => {
    const v = verdict('PtCl6/Pt', 'Ni', true);
    expect(v.replaces).toBe(true);
    expect(v.seedAtomsPerShellAtom).toBe(2);
    expect(verdict('Ni2+/Ni', 'Pt', true).replaces).toBe(false);
  });
  it('Au(III) on Cu seeds: yes, 1.5 Cu per Au', () => {
    const v = verdict('AuCl4/Au', 'Cu', true);
    expect(v.replaces).toBe(true);
    expect(v.seedAtomsPerShellAtom).toBe(1.5);
  });
});
