import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** The one seed of the demo data: every file the demo ships is drawn from this stream. */
export const DEMO_SEED = 19970;

/** A seeded stream of uniform and Gaussian draws, consumed in a fixed order. */
export interface RandomStream {
  /** Uniform on [0, 1), 53 random bits. */
  uniform(): number;
  /** Standard normal N(0, 1). */
  gaussian(): number;
}

/**
 * One random stream: pure-rand's xoroshiro128+ (Blackman & Vigna, "Scrambled linear pseudorandom
 * number generators", ACM TOMS 47(4), 2021), seeded with the non-negative 32-bit integer `seed` through
 * pure-rand's `xoroshiro128plus(seed)`; uniforms by pure-rand's `uniformFloat64` (two 32-bit outputs
 * → 53 bits). Gaussians by the Box–Muller transform (Box & Muller 1958, Ann. Math. Statist. 29,
 * 610–611): z0 = √(−2 ln u1)·cos(2π u2), z1 = √(−2 ln u1)·sin(2π u2); both are used, in that order.
 * The generator is mutated in place, so the order of calls fixes the output.
 */
export function createRandomStream(seed: number): RandomStream {
  // pure-rand seeds from a 32-bit integer; larger seeds would silently collide, so they are refused.
  if (!Number.isInteger(seed) || seed < 0 || seed > 0x7fff_ffff) throw new Error(`seed must be an integer from 0 to 2147483647, got ${seed}`);
  const rng = xoroshiro128plus(seed);
  let spare: number | null = null;
  const uniform = () => uniformFloat64(rng);
  return {
    uniform,
    gaussian() {
      if (spare !== null) {
        const z = spare;
        spare = null;
        return z;
      }
      // 1 − u lies in (0, 1], so the logarithm is finite.
      const radius = Math.sqrt(-2 * Math.log(1 - uniform()));
      const angle = 2 * Math.PI * uniform();
      spare = radius * Math.sin(angle);
      return radius * Math.cos(angle);
    },
  };
}
