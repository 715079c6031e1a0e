/**
 * Seeded pseudo-random numbers for the demo data: the same seed gives the same sequence on every run and
 * every machine (integer arithmetic only; no Math.random).
 */

/** A source of uniform deviates in [0, 1). */
export type Rand = () => number;

/**
 * mulberry32, a 32-bit-state generator by Tommy Ettinger (public domain; published 2017 at
 * https://gist.github.com/tommyettinger/46a874533244883189143505d203312c).
 * @param seed any integer; only its low 32 bits are used
 * @returns uniform deviates in [0, 1)
 */
export function mulberry32(seed: number): Rand {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Standard normal deviates by the Box–Muller transform (G. E. P. Box and M. E. Muller, "A Note on the
 * Generation of Random Normal Deviates", Ann. Math. Statist. 29 (1958) 610–611).
 * @param rand uniform source
 * @returns deviates with mean 0 and standard deviation 1
 */
export function normal(rand: Rand): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

/**
 * Uniform deviate in [lo, hi).
 * @param rand uniform source
 */
export function between(rand: Rand, lo: number, hi: number): number {
  return lo + (hi - lo) * rand();
}
