/**
 * A small seeded pseudo-random generator, so that shuffled cross-validation folds are the same on
 * every machine and every run with the same seed.
 */
import { mix32 } from '../core/mix32.js';

/**
 * Returns a generator of uniform numbers in [0, 1) from a 32-bit seed. The state advances by the
 * odd constant 0x9e3779b9 (the golden-ratio increment of a Weyl sequence) and each output is the
 * state passed through a 32-bit integer finaliser (two xor-shift-multiply rounds, the constants of
 * the "lowbias32" mixer published by C. Wellons, "Prospecting for hash functions", 2018). Period
 * 2^32; good enough to shuffle rows, not for cryptography.
 *
 * @param seed any finite number; it is reduced to an unsigned 32-bit integer (the fraction is dropped)
 * @returns a function giving the next number in [0, 1)
 * @throws RangeError when the seed is not finite
 */
export function seededRandom(seed: number): () => number {
  if (!Number.isFinite(seed)) throw new RangeError(`seededRandom: seed must be a finite number, got ${String(seed)}`);
  let state = Math.trunc(seed) >>> 0;
  return () => {
    state = (state + 0x9e3779b9) >>> 0;
    return mix32(state) / 4294967296;
  };
}

/** The 32-bit integer finaliser (core/mix32.ts), here for the modules that hash or shuffle. */
export { mix32 };

/**
 * A uniformly random permutation of 0..n-1 (Fisher-Yates shuffle, Durstenfeld's in-place form;
 * Knuth, The Art of Computer Programming vol. 2, 3rd ed., algorithm 3.4.2 P).
 *
 * @param n length (a non-negative integer)
 * @param random uniform numbers in [0, 1)
 * @returns Int32Array of length n
 */
export function permutation(n: number, random: () => number): Int32Array {
  const out = identity(n);
  shuffle(out, random);
  return out;
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

function identity(n: number): Int32Array {
  const out = new Int32Array(n);
  for (let i = 0; i < n; i++) out[i] = i;
  return out;
}

function shuffle(out: Int32Array, random: () => number): void {
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const t = out[i];
    out[i] = out[j];
    out[j] = t;
  }
}
