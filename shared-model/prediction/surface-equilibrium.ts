/**
 * Langmuir–McLean equilibrium between the surface layer and the core of a particle, closed by the
 * particle's own mass balance (DOMAIN.md Models 3):
 *
 *   x_s/(1 − x_s) = x_c/(1 − x_c) · exp(−ΔH_B(x_s, x_c)/kT),     N·x = Ns·x_s + (N − Ns)·x_c
 *
 * with ΔH_B = c0 + cS·x_s + cC·x_c (segregation.ts). Eliminating x_c with the mass balance leaves one
 * equation in x_s on the interval where both fractions lie in [0, 1]:
 *   h(x_s) = ln x_s − ln(1 − x_s) − ln x_c + ln(1 − x_c) + ΔH_B/kT,
 * which runs from −∞ at the lower end to +∞ at the upper end, so a root is always bracketed. It is found
 * by Newton steps kept inside the bracket (bisection when a step leaves it): no divergence for x → 0 or 1,
 * huge |ΔH|/kT or particles that are nearly all surface. When h is not monotonic (strong like-bond
 * preference within the surface layer: cS/kT < −4, a Fowler-type 2D phase separation) more than one root may exist and the solver returns one of them; the caller flags it.
 */
export interface EquilibriumInput {
  /** Overall B fraction of the particle, 0 < x < 1. */
  xB: number;
  /** Surface share of the sites, Ns/N, in [0, 1]. 0 is the semi-infinite crystal (core = bulk = xB). */
  surfaceShare: number;
  /** kT in eV, > 0. */
  kTEv: number;
  c0: number;
  cS: number;
  cC: number;
}

export interface EquilibriumResult {
  surfaceXB: number;
  coreXB: number;
  iterations: number;
}

const MAX_ITERATIONS = 200;

function logOdds(x: number): number {
  return Math.log(x) - Math.log1p(-x);
}

/**
 * Solves the surface/core equilibrium; pure, allocation only for the result. Unknown: the position y of
 * x_s inside its bracket [lo, hi], Newton steps in t = ln(y/(1 − y)). Both ends of the bracket are
 * logarithmic singularities of h (x_s → 0 or 1, or x_c → 0 or 1), so h is close to linear in t over the
 * whole line and Newton converges in a few steps from the middle; a step that leaves the current
 * bracket of y falls back to bisection.
 */
export function solveSurfaceEquilibrium(input: EquilibriumInput): EquilibriumResult {
  const { xB, surfaceShare: f, kTEv, c0, cS, cC } = input;
  if (f >= 1) return { surfaceXB: xB, coreXB: xB, iterations: 0 }; // every atom is a surface atom
  const inv = 1 / kTEv;
  const coreShare = 1 - f;
  const r = f / coreShare; // −dx_c/dx_s
  // interval of x_s where x_c = (xB − f·x_s)/(1 − f) stays in [0, 1]
  const lo = f > 0 ? Math.max(0, (xB - coreShare) / f) : 0;
  const hi = f > 0 ? Math.min(1, xB / f) : 1;
  const width = hi - lo;
  let yLo = 0;
  let yHi = 1;
  let y = 0.5;
  let t = 0;
  let x = lo + width * y;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    const xcRaw = (xB - f * x) / coreShare;
    const xc = xcRaw < 0 ? 0 : xcRaw > 1 ? 1 : xcRaw;
    const h = logOdds(x) - logOdds(xc) + (c0 + cS * x + cC * xc) * inv;
    if (Number.isNaN(h)) throw new Error(`surface equilibrium: log-odds undefined at x_s=${x}, x_c=${xc} (xB=${xB}, Ns/N=${f})`);
    if (h === 0) break;
    if (h < 0) yLo = y;
    else yHi = y;
    if (yHi - yLo <= 1e-15) break;
    const slopeX = 1 / (x * (1 - x)) + r / (xc * (1 - xc)) + (cS - cC * r) * inv;
    const slopeT = slopeX * width * y * (1 - y);
    const tNext = t - h / slopeT;
    let yNext = 1 / (1 + Math.exp(-tNext));
    if (yNext > yLo && yNext < yHi && Number.isFinite(tNext)) {
      t = tNext;
    } else {
      yNext = 0.5 * (yLo + yHi);
      t = Math.log(yNext) - Math.log1p(-yNext);
    }
    const xNext = lo + width * yNext;
    // converged: x_s and x_c moved by less than 1e-12 of themselves and of their complements (or not at all)
    const step = Math.abs(xNext - x);
    const done = step === 0 || (step <= 1e-12 * Math.min(xNext, 1 - xNext) && step * r <= 1e-12 * Math.min(xc, 1 - xc));
    y = yNext;
    x = xNext;
    if (done) break;
  }
  const xcRaw = (xB - f * x) / coreShare;
  return { surfaceXB: x, coreXB: xcRaw < 0 ? 0 : xcRaw > 1 ? 1 : xcRaw, iterations };
}
