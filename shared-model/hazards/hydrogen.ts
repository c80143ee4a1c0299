/**
 * Hydrogen released by borohydride hydrolysis (DOMAIN.md Models 8).
 *
 * Stoichiometry assumed: NaBH4 + 2 H2O → NaBO2 + 4 H2 — four moles of H2 per mole of borohydride, the
 * complete hydrolysis (acid makes it fast; water alone makes it slower but, given time, complete). This is
 * the upper bound: borohydride that reduces metal ions instead gives its hydride electrons to the metal.
 * Volume by the ideal gas law V = nRT/p with the CODATA 2018 molar gas constant
 * R = 8.314462618 J/(mol·K) (exact in the 2019 SI), at 25 °C (298.15 K) and 1 atm (101 325 Pa).
 */
import { invalid } from '../api/result';

export const MOLAR_GAS_CONSTANT_J_PER_MOL_K = 8.314462618;
export const STANDARD_ATMOSPHERE_PA = 101_325;
export const ROOM_TEMPERATURE_K = 298.15;
export const H2_PER_BOROHYDRIDE = 4;
export const BOROHYDRIDE_HYDROLYSIS = 'NaBH4 + 2 H2O → NaBO2 + 4 H2';

/** Volume (mL) of an ideal gas of `gasMmol` millimoles at `temperatureK` and `pressurePa`. */
export function idealGasVolumeMl(
  gasMmol: number,
  temperatureK = ROOM_TEMPERATURE_K,
  pressurePa = STANDARD_ATMOSPHERE_PA,
): number {
  if (!Number.isFinite(gasMmol) || gasMmol < 0) throw invalid('gasMmol', `gas amount must be ≥ 0 mmol, got ${gasMmol}`);
  if (!Number.isFinite(temperatureK) || temperatureK <= 0)
    throw invalid('temperatureK', `temperature must be > 0 K, got ${temperatureK}`);
  if (!Number.isFinite(pressurePa) || pressurePa <= 0)
    throw invalid('pressurePa', `pressure must be > 0 Pa, got ${pressurePa}`);
  const volumeM3 = ((gasMmol / 1000) * MOLAR_GAS_CONSTANT_J_PER_MOL_K * temperatureK) / pressurePa;
  return volumeM3 * 1e6;
}

export interface HydrogenEstimate {
  borohydrideMmol: number;
  hydrogenMmol: number;
  /** Upper-bound H2 volume at 25 °C and 1 atm. */
  hydrogenMl: number;
  stoichiometry: string;
}

/** Upper-bound hydrogen from complete hydrolysis of `borohydrideMmol` of NaBH4 (or any BH4⁻ salt). */
export function hydrogenFromBorohydride(
  borohydrideMmol: number,
  temperatureK = ROOM_TEMPERATURE_K,
  pressurePa = STANDARD_ATMOSPHERE_PA,
): HydrogenEstimate {
  if (!Number.isFinite(borohydrideMmol) || borohydrideMmol < 0)
    throw invalid('borohydrideMmol', `borohydride amount must be ≥ 0 mmol, got ${borohydrideMmol}`);
  const hydrogenMmol = H2_PER_BOROHYDRIDE * borohydrideMmol;
  return {
    borohydrideMmol,
    hydrogenMmol,
    hydrogenMl: idealGasVolumeMl(hydrogenMmol, temperatureK, pressurePa),
    stoichiometry: BOROHYDRIDE_HYDROLYSIS,
  };
}
