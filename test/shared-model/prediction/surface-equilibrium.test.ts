import { describe, expect, it } from 'vitest';
import { solveSurfaceEquilibrium, type EquilibriumInput } from '../../../shared-model/prediction/surface-equilibrium';

const logOdds = (x: number) => Math.log(x / (1 - x));

function residual(input: EquilibriumInput, xs: number, xc: number): number {
  const dh = input.c0 + input.cS * xs + input.cC * xc;
  return logOdds(xs) - logOdds(xc) + dh / input.kTEv;
}

describe('Langmuir–McLean surface/core equilibrium with mass balance', () => {
  it("semi-infinite limit with constant ΔH is McLean's closed form x_s/(1−x_s) = x/(1−x)·exp(−ΔH/kT)", () => {
    for (const [xB, dH, kT] of [
      [0.1, -0.2, 0.05],
      [0.5, 0.1, 0.0517],
      [0.9, -0.05, 0.1],
      [0.01, -0.4, 0.06],
    ] as const) {
      const out = solveSurfaceEquilibrium({ xB, surfaceShare: 0, kTEv: kT, c0: dH, cS: 0, cC: 0 });
      const odds = (xB / (1 - xB)) * Math.exp(-dH / kT);
      expect(out.surfaceXB).toBeCloseTo(odds / (1 + odds), 12);
      expect(out.coreXB).toBe(xB);
    }
  });

  it('satisfies the mass balance and the isotherm for a grid of finite particles', () => {
    for (const xB of [0.02, 0.2, 0.5, 0.8, 0.98]) {
      for (const f of [0.05, 0.3, 0.45, 0.7, 0.92]) {
        for (const c0 of [-0.5, -0.1, 0, 0.2]) {
          const input = { xB, surfaceShare: f, kTEv: 0.05, c0, cS: 0.06, cC: -0.1 };
          const out = solveSurfaceEquilibrium(input);
          expect(f * out.surfaceXB + (1 - f) * out.coreXB).toBeCloseTo(xB, 12);
          expect(out.surfaceXB).toBeGreaterThan(0);
          expect(out.surfaceXB).toBeLessThan(1);
          // residual in log-odds ~ 0 unless a fraction sits at the resolution of a double
          if (out.coreXB > 1e-12 && out.coreXB < 1 - 1e-12 && out.surfaceXB < 1 - 1e-12) {
            expect(Math.abs(residual(input, out.surfaceXB, out.coreXB))).toBeLessThan(1e-7);
          }
          expect(out.iterations).toBeLessThan(60);
        }
      }
    }
  });

  it('small particles deplete their core: the same ΔH leaves less B inside as Ns/N grows', () => {
    let previousCore = 1;
    for (const f of [0, 0.1, 0.2, 0.3, 0.4, 0.5]) {
      const out = solveSurfaceEquilibrium({ xB: 0.2, surfaceShare: f, kTEv: 0.05, c0: -0.3, cS: 0, cC: 0 });
      expect(out.coreXB).toBeLessThan(previousCore);
      previousCore = out.coreXB;
    }
    // at Ns/N = 0.5 and strong segregation, nearly all B is in the surface: x_c → 0, x_s → 2·xB = 0.4
    const strong = solveSurfaceEquilibrium({ xB: 0.2, surfaceShare: 0.5, kTEv: 0.05, c0: -2, cS: 0, cC: 0 });
    expect(strong.surfaceXB).toBeCloseTo(0.4, 6);
  });

  it('no divergence: xB → 0 or 1, |ΔH|/kT up to 10⁵, Ns/N → 1, Ns/N = 1', () => {
    const cases: EquilibriumInput[] = [];
    for (const xB of [1e-12, 1e-6, 0.5, 1 - 1e-6, 1 - 1e-12]) {
      for (const c0 of [-1e3, -50, 0, 50, 1e3]) {
        for (const f of [0, 1e-9, 0.4, 1 - 1e-9, 1])
          cases.push({ xB, surfaceShare: f, kTEv: 0.01, c0, cS: 0.3, cC: -0.2 });
      }
    }
    for (const input of cases) {
      const out = solveSurfaceEquilibrium(input);
      expect(Number.isFinite(out.surfaceXB), JSON.stringify(input)).toBe(true);
      expect(Number.isFinite(out.coreXB)).toBe(true);
      expect(out.surfaceXB).toBeGreaterThanOrEqual(0);
      expect(out.surfaceXB).toBeLessThanOrEqual(1);
      expect(out.coreXB).toBeGreaterThanOrEqual(0);
      expect(out.coreXB).toBeLessThanOrEqual(1);
      expect(input.surfaceShare * out.surfaceXB + (1 - input.surfaceShare) * out.coreXB).toBeCloseTo(input.xB, 9);
    }
    // strongly favoured B fills the surface as far as the B supply allows
    const fill = solveSurfaceEquilibrium({ xB: 0.3, surfaceShare: 0.4, kTEv: 0.01, c0: -1e3, cS: 0, cC: 0 });
    expect(fill.surfaceXB).toBeCloseTo(0.75, 9);
    // strongly disfavoured B leaves the surface entirely
    const empty = solveSurfaceEquilibrium({ xB: 0.3, surfaceShare: 0.4, kTEv: 0.01, c0: 1e3, cS: 0, cC: 0 });
    expect(empty.surfaceXB).toBeLessThan(1e-12);
  });

  it('keeps full precision when the core is depleted to ~1e-16 (a strongly segregating dilute solute)', () => {
    // coefficients of a Pb-in-Cr-like case at 1.5 nm, 600 K (ΔH ≈ −2.3 eV): the core keeps ~1e-16 of B
    const input = { xB: 0.05, surfaceShare: 0.63, kTEv: 0.0517, c0: -2.28, cS: -0.88, cC: 2.73 };
    const out = solveSurfaceEquilibrium(input);
    expect(out.coreXB).toBeGreaterThan(0);
    expect(out.coreXB).toBeLessThan(1e-12);
    expect(Math.abs(residual(input, out.surfaceXB, out.coreXB))).toBeLessThan(1e-6);
    expect(out.iterations).toBeLessThan(20);
  });

  it('T → ∞: no enrichment (x_s → x)', () => {
    const out = solveSurfaceEquilibrium({ xB: 0.3, surfaceShare: 0.4, kTEv: 1e9, c0: -0.5, cS: 0.2, cC: 0.1 });
    expect(out.surfaceXB).toBeCloseTo(0.3, 8);
    expect(out.coreXB).toBeCloseTo(0.3, 8);
  });

  it('every atom on the surface: nothing to exchange, x_s = x', () => {
    expect(solveSurfaceEquilibrium({ xB: 0.3, surfaceShare: 1, kTEv: 0.05, c0: -1, cS: 0, cC: 0 })).toEqual({
      surfaceXB: 0.3,
      coreXB: 0.3,
      iterations: 0,
    });
  });
});
