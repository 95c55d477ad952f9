/** A seeded pseudo-random source: the same seed gives the same sequence on every platform. */
export interface Random {
  /** Uniform on [0, 1). */
  uniform(): number;
  /** Standard normal (mean 0, sd 1). */
  normal(): number;
}

// splitmix32 spreads one 32-bit seed over the four words of xoshiro128** (Blackman and Vigna,
// "Scrambled linear pseudorandom number generators", 2018); an all-zero state would be stuck.
function splitmix32(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x9e3779b9) >>> 0;
    let z = s;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
    return (z ^ (z >>> 16)) >>> 0;
  };
}

/** xoshiro128** seeded through splitmix32. `seed` is any finite number (its low 32 bits count). */
export function createRandom(seed: number): Random {
  if (!Number.isFinite(seed)) throw new RangeError('seed must be a finite number');
  const mix = splitmix32(seed);
  let a = mix(), b = mix(), c = mix(), d = mix();
  const next = (): number => {
    const result = Math.imul(rotl(Math.imul(b, 5), 7), 9) >>> 0;
    const t = b << 9;
    c ^= a; d ^= b; b ^= c; a ^= d; c ^= t;
    d = rotl(d, 11);
    return result;
  };
  let spare = NaN;
  return {
    uniform: () => next() / 4294967296,
    normal: () => {
      if (!Number.isNaN(spare)) {
        const value = spare;
        spare = NaN;
        return value;
      }
      // Box-Muller; 1 - u keeps the logarithm away from zero.
      const u = 1 - next() / 4294967296;
      const v = next() / 4294967296;
      const r = Math.sqrt(-2 * Math.log(u));
      spare = r * Math.sin(2 * Math.PI * v);
      return r * Math.cos(2 * Math.PI * v);
    },
  };
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}
