/**
 * Special functions and quantiles needed by the characterization statistics: log-gamma, regularized
 * incomplete gamma and beta functions, Student t and χ² quantiles, the normal quantile and erf.
 * Algorithms: Lanczos log-gamma (g = 7, n = 9 coefficients); series and continued-fraction forms of the
 * incomplete gamma and beta functions (Numerical Recipes, 3rd ed., §6.2 and §6.4); quantiles by safeguarded
 * bisection on the CDF (monotone, so it always converges); erfc by the Chebyshev-fitted exponential of
 * Numerical Recipes §6.2 (fractional error < 1.2e-7), used only for probe-blur kernels.
 */
import { at } from '../indexed';

const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
];

export function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * x))) - logGamma(1 - x);
  const z = x - 1;
  let sum = at(LANCZOS, 0);
  for (let i = 1; i < 9; i++) sum += at(LANCZOS, i) / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(sum);
}

const EPS = 1e-15;
const TINY = 1e-300;

/** Regularized lower incomplete gamma P(a, x). */
export function regularizedGammaP(a: number, x: number): number {
  if (x <= 0) return 0;
  const lnPrefix = a * Math.log(x) - x - logGamma(a);
  if (x < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n < 1000; n++) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * EPS) break;
    }
    return Math.min(1, sum * Math.exp(lnPrefix));
  }
  // Continued fraction for Q(a, x) (modified Lentz).
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 1000; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return Math.max(0, 1 - Math.exp(lnPrefix) * h);
}

function betaContinuedFraction(a: number, b: number, x: number): number {
  const qab = a + b;
  const qap = a + 1;
  const qam = a - 1;
  let c = 1;
  let d = 1 - (qab * x) / qap;
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m < 1000; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((qam + m2) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (qap + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return h;
}

/** Regularized incomplete beta I_x(a, b). */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const lnFront = logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(lnFront) * betaContinuedFraction(a, b, x)) / a;
  return 1 - (Math.exp(lnFront) * betaContinuedFraction(b, a, 1 - x)) / b;
}

/** CDF of Student's t with `df` degrees of freedom. */
export function studentTCdf(t: number, df: number): number {
  const x = df / (df + t * t);
  const tail = 0.5 * regularizedBeta(x, df / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/** CDF of χ² with `df` degrees of freedom. */
export function chiSquareCdf(x: number, df: number): number {
  return x <= 0 ? 0 : regularizedGammaP(df / 2, x / 2);
}

/** Inverts a monotone increasing CDF by bisection on [lo, hi] (hi is widened until it brackets p). */
function invertCdf(cdf: (x: number) => number, p: number, lo: number, hi: number): number {
  let upper = hi;
  while (cdf(upper) < p) upper *= 2;
  let lower = lo;
  for (let i = 0; i < 200; i++) {
    const mid = 0.5 * (lower + upper);
    if (cdf(mid) < p) lower = mid;
    else upper = mid;
    if (upper - lower <= 1e-13 * Math.max(1, Math.abs(mid))) break;
  }
  return 0.5 * (lower + upper);
}

function checkProbability(p: number): void {
  if (!(p > 0 && p < 1)) throw new RangeError(`probability must lie strictly between 0 and 1, got ${p}`);
}

function checkDf(df: number): void {
  if (!(Number.isFinite(df) && df > 0)) throw new RangeError(`degrees of freedom must be positive, got ${df}`);
}

/** Quantile of Student's t: the t with P(T ≤ t) = p. */
export function studentTQuantile(p: number, df: number): number {
  checkProbability(p);
  checkDf(df);
  if (p === 0.5) return 0;
  if (p < 0.5) return -studentTQuantile(1 - p, df);
  return invertCdf((t) => studentTCdf(t, df), p, 0, 16);
}

/** Quantile of χ²: the x with P(X ≤ x) = p. */
export function chiSquareQuantile(p: number, df: number): number {
  checkProbability(p);
  checkDf(df);
  return invertCdf((x) => chiSquareCdf(x, df), p, 0, Math.max(4 * df, 16));
}

/** erfc(x), fractional error below 1.2e-7 (Numerical Recipes' Chebyshev-fitted form). */
export function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 2 / (2 + z);
  const ans =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t *
          (1.00002368 +
            t *
              (0.37409196 +
                t *
                  (0.09678418 +
                    t *
                      (-0.18628806 +
                        t *
                          (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? ans : 2 - ans;
}

/** Standard normal CDF Φ(x). */
export function normalCdf(x: number): number {
  return 0.5 * erfc(-x / Math.SQRT2);
}

/** Standard normal quantile, from the exact relation Φ(x) = P(1/2, x²/2)/2 + 1/2 for x ≥ 0. */
export function normalQuantile(p: number): number {
  checkProbability(p);
  if (p === 0.5) return 0;
  if (p < 0.5) return -normalQuantile(1 - p);
  return invertCdf((x) => 0.5 + 0.5 * regularizedGammaP(0.5, (x * x) / 2), p, 0, 8);
}
