/**
 * seededRandom: a deterministic pseudo-random source for simulations.
 *
 * Uniform numbers come from Mulberry32 (Tommy Ettinger, 2017, public domain; a 32-bit state
 * generator with a period of 2^32). Normal numbers use the Box–Muller transform
 * (Box & Muller 1958, Ann. Math. Statist. 29(2):610–611): z0 = sqrt(−2 ln u1)·cos(2π u2),
 * z1 = sqrt(−2 ln u1)·sin(2π u2); both are used, z1 is kept for the next call.
 *
 * @param seed any finite number; it is reduced to an unsigned 32-bit integer.
 * @throws if the seed is not finite.
 * @returns a generator; the same seed always yields the same sequence.
 * @example const random = seededRandom(42); random.normal(); // standard normal draw
 */
export interface SeededRandom {
  /** Uniform on [0, 1). */
  uniform(): number;
  /** Uniform on [low, high). */
  between(low: number, high: number): number;
  /** Integer uniform on low..high inclusive. */
  integer(low: number, high: number): number;
  /** Standard normal (mean 0, standard deviation 1). */
  normal(): number;
  /** True with the given probability. */
  chance(probability: number): boolean;
}

const TWO_POW_32 = 4294967296;

export function seededRandom(seed: number): SeededRandom {
  if (!Number.isFinite(seed)) throw new Error(`seededRandom: seed must be a finite number, got ${seed}`);
  let state = Math.trunc(seed) >>> 0;
  let spareNormal: number | null = null;

  const uniform = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / TWO_POW_32;
  };

  const normal = (): number => {
    if (spareNormal !== null) {
      const value = spareNormal;
      spareNormal = null;
      return value;
    }
    const u1 = 1 - uniform(); // (0, 1], so the logarithm is finite
    const u2 = uniform();
    const radius = Math.sqrt(-2 * Math.log(u1));
    spareNormal = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  };

  return {
    uniform,
    between: (low, high) => low + (high - low) * uniform(),
    integer: (low, high) => low + Math.floor(uniform() * (high - low + 1)),
    normal,
    chance: (probability) => uniform() < probability,
  };
}
