import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import {
  BOROHYDRIDE_HYDROLYSIS,
  hydrogenFromBorohydride,
  idealGasVolumeMl,
  MOLAR_GAS_CONSTANT_J_PER_MOL_K,
} from '../../../shared-model/hazards/hydrogen';

describe('hydrogen from borohydride hydrolysis', () => {
  it('uses the CODATA molar gas constant', () => {
    // CODATA 2018: R = 8.314 462 618 J mol⁻¹ K⁻¹ (exact in the 2019 SI)
    expect(MOLAR_GAS_CONSTANT_J_PER_MOL_K).toBe(8.314462618);
  });

  it('ideal-gas molar volume at 0 °C and 1 atm matches CODATA (22.413 969 54 L/mol)', () => {
    expect(idealGasVolumeMl(1000, 273.15, 101325) / 1000).toBeCloseTo(22.41396954, 6);
  });

  it('1 mmol NaBH4 → 4 mmol H2 → 97.86 mL at 25 °C, 1 atm', () => {
    // NaBH4 + 2 H2O → NaBO2 + 4 H2: n(H2) = 4 × 1 mmol = 4 mmol
    // V = nRT/p = 0.004 mol × 8.314462618 × 298.15 K / 101325 Pa = 9.78616e-5 m³ = 97.862 mL
    const estimate = hydrogenFromBorohydride(1);
    expect(estimate.hydrogenMmol).toBe(4);
    expect(estimate.hydrogenMl).toBeCloseTo(97.8616, 3);
    expect(estimate.stoichiometry).toBe(BOROHYDRIDE_HYDROLYSIS);
    expect(BOROHYDRIDE_HYDROLYSIS).toBe('NaBH4 + 2 H2O → NaBO2 + 4 H2');
  });

  it('100 mg NaBH4 (2.643 mmol at 37.83 g/mol) → 258.7 mL', () => {
    const mmol = 100 / 37.833;
    expect(hydrogenFromBorohydride(mmol).hydrogenMl).toBeCloseTo(4 * mmol * 24.4654037, 2);
  });

  it('refuses negative amounts and temperatures naming the field', () => {
    expect(() => hydrogenFromBorohydride(-1)).toThrow(DomainError);
    try {
      idealGasVolumeMl(1, -5);
    } catch (error) {
      expect((error as DomainError).field).toBe('temperatureK');
    }
    expect(() => idealGasVolumeMl(1, -5)).toThrow(DomainError);
  });
});
