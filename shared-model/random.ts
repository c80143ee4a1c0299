/**
 * Seeded pseudo-random numbers. Every stochastic function in Pairwright takes one of these, so a run
 * repeats exactly from its seed. Generator: sfc32 (Chris Doty-Humphrey's small fast counting generator,
 * public domain), seeded through splitmix32 so that nearby seeds give unrelated streams.
 */
export interface SeededRandom {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform integer in [0, n). */
  nextInt(n: number): number;
  /** Standard normal deviate (Box–Muller). */
  nextNormal(): number;
  readonly seed: number;
}

function splitmix32(state: number): () => number {
  let s = state >>> 0;
  return () => {
    s = (s + 0x9e3779b9) >>> 0;
    let z = s;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
    return (z ^ (z >>> 16)) >>> 0;
  };
}

export function createRandom(seed: number): SeededRandom {
  if (!Number.isFinite(seed)) throw new RangeError(`seed must be a finite number, got ${seed}`);
  const init = splitmix32(Math.floor(seed) >>> 0);
  let a = init();
  let b = init();
  let c = init();
  let d = init();
  const nextUint32 = (): number => {
    const t = (((a + b) >>> 0) + d) >>> 0;
    d = (d + 1) >>> 0;
    a = b ^ (b >>> 9);
    b = (c + (c << 3)) >>> 0;
    c = (c << 21) | (c >>> 11);
    c = (c + t) >>> 0;
    return t;
  };
  for (let i = 0; i < 12; i++) nextUint32();
  let spareNormal: number | null = null;
  const next = (): number => nextUint32() / 4294967296;
  return {
    seed,
    next,
    nextInt: (n: number) => Math.floor(next() * n),
    nextNormal: () => {
      if (spareNormal !== null) {
        const value = spareNormal;
        spareNormal = null;
        return value;
      }
      let u = 0;
      while (u === 0) u = next();
      const v = next();
      const radius = Math.sqrt(-2 * Math.log(u));
      spareNormal = radius * Math.sin(2 * Math.PI * v);
      return radius * Math.cos(2 * Math.PI * v);
    },
  };
}
