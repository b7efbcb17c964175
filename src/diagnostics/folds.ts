/**
 * Assignment of training rows to cross-validation folds.
 */
import type { FoldOrder } from '../config/types.js';
import { mix32, permutation, seededRandom } from './random.js';

/** Rows of each fold and the fold of each row. */
export interface Folds {
  /** Number of folds k (at most the number of rows). */
  k: number;
  /**
   * Fold index of each row, length n; empty for folds made by {@link streamedFolds}, whose rows'
   * folds {@link foldIdsOf} computes from the row index.
   */
  foldOf: Int32Array;
  /** Rows in each fold, length k. */
  sizes: number[];
  /** How rows were assigned. */
  order: FoldOrder;
  /** Seed of the shuffle (recorded for `blocks` too, where it is unused). */
  seed: number;
  /** Rows n (equal to `foldOf.length` for in-memory folds). */
  rows?: number;
  /** True for {@link streamedFolds}: no per-row table, folds computed from the row index. */
  streamed?: boolean;
}

/**
 * Fold sizes of k-fold cross-validation on n rows: the first n mod k folds hold floor(n/k) + 1
 * rows, the others floor(n/k) (the split of scikit-learn's `KFold`, documented in its user
 * guide, section 3.1.2.1).
 *
 * @param n rows (>= 0)
 * @param k folds (1 <= k <= max(n, 1))
 */
export function foldSizes(n: number, k: number): number[] {
  const base = Math.floor(n / k);
  const extra = n % k;
  return Array.from({ length: k }, (_, f) => base + (f < extra ? 1 : 0));
}

/**
 * Assigns n rows to k folds. `blocks`: contiguous blocks in file order with {@link foldSizes}
 * (right for rows ordered in time). `shuffled`: the rows are permuted by a Fisher-Yates shuffle
 * driven by {@link seededRandom}(seed), and consecutive runs of the permutation form folds of the
 * same sizes.
 *
 * @param n rows (a non-negative integer)
 * @param k requested folds; reduced to n when n < k (leave-one-out), at least 1
 * @param order `shuffled` (default in descriptors) or `blocks`
 * @param seed seed of the shuffle (default in descriptors: 1)
 * @throws RangeError when n or k is not a non-negative / positive integer
 */
export function assignFolds(n: number, k: number, order: FoldOrder, seed: number): Folds {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`assignFolds: n must be a non-negative integer, got ${String(n)}`);
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`assignFolds: k must be a positive integer, got ${String(k)}`);
  const kk = Math.max(1, Math.min(k, n));
  const sizes = foldSizes(n, kk);
  const foldOf = new Int32Array(n);
  const perm = order === 'shuffled' ? permutation(n, seededRandom(seed)) : null;
  let pos = 0;
  for (let f = 0; f < kk; f++) pos = markFold(foldOf, perm, pos, sizes[f], f);
  return { k: kk, foldOf, sizes, order, seed };
}

/**
 * Assigns fold f to `size` rows from position `pos` (of the permutation, or the file order when
 * none); returns the next position. One loop per function (see DEVELOPERS.md, "Writing hot loops").
 */
function markFold(foldOf: Int32Array, perm: ArrayLike<number> | null, pos: number, size: number, f: number): number {
  let at = pos;
  for (let c = 0; c < size; c++, at++) foldOf[perm === null ? at : perm[at]] = f;
  return at;
}

/**
 * Folds of n rows without a per-row table, for a model whose rows stream from its file
 * (data/row-source.ts): memory independent of n. Fold sizes are {@link foldSizes}(n, k) as in
 * {@link assignFolds}. `blocks` gives the same folds as {@link assignFolds}. `shuffled` puts row i
 * at position pi(i) of a seeded pseudo-random permutation pi of 0..n-1 computed from i alone (a
 * four-round balanced Feistel network over the smallest even power of two >= n, with
 * {@link mix32} of the seed, round and half as round function, walked along its cycle until the
 * value falls below n: "cycle walking", Black & Rogaway, "Ciphers with arbitrary finite domains",
 * CT-RSA 2002); consecutive runs of positions form the folds, as in {@link assignFolds}. The
 * shuffled folds therefore differ from the in-memory shuffle's (a Fisher-Yates permutation needs
 * n integers of memory), while sizes, seed and order keep their meaning.
 *
 * @param n rows (a non-negative integer)
 * @param k requested folds; reduced to n when n < k, at least 1
 */
export function streamedFolds(n: number, k: number, order: FoldOrder, seed: number): Folds {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`streamedFolds: n must be a non-negative integer, got ${String(n)}`);
  if (!Number.isInteger(k) || k < 1) throw new RangeError(`streamedFolds: k must be a positive integer, got ${String(k)}`);
  const kk = Math.max(1, Math.min(k, n));
  return { k: kk, foldOf: new Int32Array(0), sizes: foldSizes(n, kk), order, seed, rows: n, streamed: true };
}

/**
 * The folds of rows start .. start+m-1: a view of `folds.foldOf` for in-memory folds, else
 * computed into `out` (length >= m) for {@link streamedFolds}.
 */
export function foldIdsOf(folds: Folds, start: number, m: number, out: Int32Array): Int32Array {
  if (folds.streamed !== true) return folds.foldOf.subarray(start, start + m);
  const n = folds.rows ?? 0;
  // First position of each fold after fold 0: a position's fold is the number of these <= it.
  const bounds = new Float64Array(folds.k);
  let at = 0;
  for (let f = 0; f < folds.k; f++) {
    at += folds.sizes[f];
    bounds[f] = at;
  }
  if (folds.order === 'blocks') blockFolds(bounds, start, m, out);
  else shuffledFolds(bounds, n, folds.seed, start, m, out);
  return out.subarray(0, m);
}

/** out[i] = fold of position start + i, for contiguous folds ending at `bounds`. */
function blockFolds(bounds: Float64Array, start: number, m: number, out: Int32Array): void {
  let f = 0;
  while (f < bounds.length - 1 && bounds[f] <= start) f++;
  for (let i = 0; i < m; i++) {
    while (f < bounds.length - 1 && bounds[f] <= start + i) f++;
    out[i] = f;
  }
}

/** out[i] = fold of position pi(start + i) (see {@link streamedFolds}). */
function shuffledFolds(bounds: Float64Array, n: number, seed: number, start: number, m: number, out: Int32Array): void {
  let bits = 2;
  while (2 ** bits < n) bits += 2;
  const half = bits / 2;
  const mask = 2 ** half - 1;
  const key = mix32(Math.trunc(seed) >>> 0);
  for (let i = 0; i < m; i++) {
    const position = feistelIndex(start + i, n, half, mask, key);
    // Binary search of the fold whose positions hold it.
    let lo = 0;
    let hi = bounds.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (bounds[mid] <= position) lo = mid + 1;
      else hi = mid;
    }
    out[i] = lo;
  }
}

/**
 * pi(x) for x < n: the Feistel permutation of 0 .. 4^half - 1 applied until the value is below n
 * (it returns to x along its cycle at the latest, so the loop ends; on average it takes fewer
 * than 4 steps, as 4^half < 4n).
 */
function feistelIndex(x: number, n: number, half: number, mask: number, key: number): number {
  let v = x;
  do {
    let left = Math.floor(v / 2 ** half);
    let right = v % 2 ** half;
    for (let round = 0; round < 4; round++) {
      const next = (left ^ (mix32((key ^ Math.imul(round + 1, 0x9e3779b1) ^ Math.imul(right, 0x85ebca6b)) >>> 0) & mask)) >>> 0;
      left = right;
      right = next;
    }
    v = left * 2 ** half + right;
  } while (v >= n);
  return v;
}
