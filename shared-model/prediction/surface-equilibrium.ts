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

const MAX_ITERATIONS = 100;

/**
 * Solves the surface/core equilibrium; pure, allocation only for the result.
 *
 * Unknown: the position of x_s inside its bracket [lo, hi], x_s = lo + w·y = hi − w·ȳ (w = hi − lo,
 * ȳ = 1 − y), with Newton steps in t = ln(y/ȳ). Both ends of the bracket are logarithmic singularities of
 * h (x_s → 0 or 1, or the core x_c → 0 or 1), so h is close to linear in t over the whole line and Newton
 * converges in a few steps. y and ȳ are both computed from t, and x_s, 1 − x_s, x_c, 1 − x_c each from the
 * end of the bracket it is small at, so a root a hair's breadth from an end (a core depleted to 1e-16)
 * keeps full relative precision. A step that leaves the bracket of t falls back to bisection.
 */
export function solveSurfaceEquilibrium(input: EquilibriumInput): EquilibriumResult {
  const { xB, surfaceShare: f, kTEv, c0, cS, cC } = input;
  if (f >= 1) return { surfaceXB: xB, coreXB: xB, iterations: 0 }; // every atom is a surface atom
  const inv = 1 / kTEv;
  const coreShare = 1 - f;
  const r = f / coreShare; // −dx_c/dx_s
  // ends of the bracket, with the fractions there written exactly
  const saturates = f > 0 && xB - coreShare > 0; // at lo the core is pure B
  const depletes = f > 0 && xB < f; // at hi the core holds no B
  const lo = saturates ? (xB - coreShare) / f : 0;
  const hi = depletes ? xB / f : 1;
  const oneMinusLo = 1 - lo;
  const oneMinusHi = depletes ? 1 - hi : 0;
  const coreAtLo = saturates ? 1 : xB / coreShare; // x_c when x_s = lo
  const oneMinusCoreAtLo = saturates ? 0 : 1 - coreAtLo;
  const coreAtHi = depletes ? 0 : (xB - f) / coreShare; // x_c when x_s = hi
  const oneMinusCoreAtHi = depletes ? 1 : 1 - coreAtHi;
  const w = hi - lo;
  const rw = r * w;

  let tLo = Number.NEGATIVE_INFINITY;
  let tHi = Number.POSITIVE_INFINITY;
  let t = 0;
  let xs = 0.5;
  let xc = xB;
  let iterations = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    let y: number;
    let yBar: number;
    if (t >= 0) {
      const e = Math.exp(-t);
      y = 1 / (1 + e);
      yBar = e / (1 + e);
    } else {
      const e = Math.exp(t);
      y = e / (1 + e);
      yBar = 1 / (1 + e);
    }
    const upper = y > 0.5;
    xs = upper ? hi - w * yBar : lo + w * y;
    const xsBar = upper ? oneMinusHi + w * yBar : oneMinusLo - w * y;
    xc = upper ? coreAtHi + rw * yBar : coreAtLo - rw * y;
    const xcBar = upper ? oneMinusCoreAtHi - rw * yBar : oneMinusCoreAtLo + rw * y;
    const h = Math.log(xs) - Math.log(xsBar) - Math.log(xc) + Math.log(xcBar) + (c0 + cS * xs + cC * xc) * inv;
    if (Number.isNaN(h))
      throw new Error(`surface equilibrium: log-odds undefined at x_s=${xs}, x_c=${xc} (xB=${xB}, Ns/N=${f})`);
    if (h === 0) break;
    if (h < 0) tLo = t;
    else tHi = t;
    const slope = (1 / (xs * xsBar) + r / (xc * xcBar) + (cS - cC * r) * inv) * w * y * yBar;
    let next = t - h / slope;
    // converged: a Newton step this small resolves y and ȳ to full relative precision
    if (Math.abs(next - t) <= 1e-12) break;
    if (!(next > tLo && next < tHi)) {
      if (Number.isFinite(tLo) && Number.isFinite(tHi)) next = 0.5 * (tLo + tHi);
      else if (Number.isFinite(tLo)) next = tLo + Math.max(1, Math.abs(tLo));
      else next = tHi - Math.max(1, Math.abs(tHi));
    }
    const step = Math.abs(next - t);
    t = next;
    // t resolves ȳ and y to relative precision |Δt|
    if (step <= 1e-12 || tHi - tLo <= 1e-12 * Math.max(1, Math.abs(t))) break;
    if (!Number.isFinite(t)) break;
  }
  return { surfaceXB: xs, coreXB: xc < 0 ? 0 : xc > 1 ? 1 : xc, iterations };
}
