/**
 * Is a pair's predicted direction decided by more than the scatter of its surface-energy data?
 * Primary: Tyson & Miller (1977) mean surface energies; second: Vitos et al. (1998) DFT close-packed
 * facet values (element-table.ts). The second source runs systematically lower/higher by facet, so it is
 * first put on the primary's scale by one least-squares factor f over the elements both list.
 * Scatter of the pair's deciding difference Δγ = γ_A − γ_B: |Δγ₁ − f·Δγ₂| when both sources list both
 * elements, else √2 × (median relative scatter between the sources) × mean γ of the pair. Its energy
 * equivalent is the surface-energy term's share per J/m² (σ, calibrated) times that scatter. The
 * prediction is "uncertain" when a dilute-limit segregation enthalpy (B in A or A in B) is smaller in
 * size than that energy: changing the source could turn the direction.
 */
import { ELEMENT_RECORDS, type ElementRecord } from '../elements/element-table';

export const PRIMARY_SURFACE_ENERGY_SOURCE = 'Tyson & Miller 1977 (mean)';
export const SECOND_SURFACE_ENERGY_SOURCE = 'Vitos et al. 1998 (DFT, close-packed facet)';

function sourceComparison(): { factor: number; medianRelativeScatter: number } {
  const both = ELEMENT_RECORDS.filter((r) => r.surfaceEnergyJPerM2 !== null && r.surfaceEnergyDftJPerM2 !== null);
  let sxy = 0;
  let syy = 0;
  for (const r of both) {
    sxy += (r.surfaceEnergyJPerM2 as number) * (r.surfaceEnergyDftJPerM2 as number);
    syy += (r.surfaceEnergyDftJPerM2 as number) ** 2;
  }
  const factor = sxy / syy;
  const relative = both
    .map(
      (r) =>
        Math.abs(factor * (r.surfaceEnergyDftJPerM2 as number) - (r.surfaceEnergyJPerM2 as number)) /
        (r.surfaceEnergyJPerM2 as number),
    )
    .sort((p, q) => p - q);
  const mid = relative.length >> 1;
  const medianRelativeScatter =
    relative.length % 2 === 1
      ? (relative[mid] as number)
      : 0.5 * ((relative[mid - 1] as number) + (relative[mid] as number));
  return { factor, medianRelativeScatter };
}

/** Factor putting the second source on the first's scale, and the median relative scatter between them. */
export const SURFACE_ENERGY_SOURCE_COMPARISON = Object.freeze(sourceComparison());

export interface SurfaceEnergySources {
  primary: { source: string; gammaA: number; gammaB: number };
  second: { source: string; gammaA: number; gammaB: number } | null;
  /** Scatter of γ_A − γ_B between the sources, J/m². */
  scatterJPerM2: number;
  note: string;
}

export function surfaceEnergySources(
  a: ElementRecord,
  b: ElementRecord,
  gammaA: number,
  gammaB: number,
): SurfaceEnergySources {
  const primary = { source: PRIMARY_SURFACE_ENERGY_SOURCE, gammaA, gammaB };
  const { factor, medianRelativeScatter } = SURFACE_ENERGY_SOURCE_COMPARISON;
  const a2 = a.surfaceEnergyDftJPerM2;
  const b2 = b.surfaceEnergyDftJPerM2;
  const d1 = gammaA - gammaB;
  const fmt = (x: number) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(2)}`;
  if (a2 === null || b2 === null) {
    const lacking = [a2 === null ? a.symbol : null, b2 === null ? b.symbol : null]
      .filter((s) => s !== null)
      .join(' and ');
    const scatterJPerM2 = Math.SQRT2 * medianRelativeScatter * 0.5 * (gammaA + gammaB);
    return {
      primary,
      second: null,
      scatterJPerM2,
      note: `γ(${a.symbol}) − γ(${b.symbol}) = ${fmt(d1)} J/m² (${PRIMARY_SURFACE_ENERGY_SOURCE}); no second source for ${lacking}, typical scatter ±${scatterJPerM2.toFixed(2)} J/m²`,
    };
  }
  const d2 = a2 - b2;
  const scatterJPerM2 = Math.abs(d1 - factor * d2);
  return {
    primary,
    second: { source: SECOND_SURFACE_ENERGY_SOURCE, gammaA: a2, gammaB: b2 },
    scatterJPerM2,
    note: `γ(${a.symbol}) − γ(${b.symbol}) = ${fmt(d1)} J/m² (${PRIMARY_SURFACE_ENERGY_SOURCE}), ${fmt(d2)} J/m² (${SECOND_SURFACE_ENERGY_SOURCE}; ×${factor.toFixed(2)} on the first's scale: ${fmt(factor * d2)})`,
  };
}
