/** A seeded source of uniform numbers in [0, 1); inject one wherever the engine needs randomness. */
export type Rng = () => number;

/**
 * mulberry32, a 32-bit-state generator by Tommy Ettinger (2017, public domain), as collected in
 * bryc's "PRNGs" notes: period 2^32, passes gjrand's tests for its size. Small and fast; fine for
 * surrogates and synthetic data, not for cryptography. The same seed gives the same sequence.
 */
export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A standard normal variate from two uniforms (Box & Muller 1958, Ann. Math. Stat. 29:610). */
export function normalVariate(rng: Rng): number {
  // 1 − u keeps the logarithm's argument in (0, 1].
  const u = 1 - rng();
  const v = rng();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}
