/**
 * Splitting one table's rows into training and hold-out rows, reproducibly: `random` draws the
 * hold-out rows with a seeded shuffle (Fisher-Yates over {@link seededRandom}, as the folds do);
 * `last` holds out the last rows as one block (data in time order, where a random split would let
 * the model see the future). Both keep each side's rows in file order.
 */
import { permutation, seededRandom } from './random.js';

/** How to split: seeded random rows, or the last rows as a block. */
export type SplitHow = 'random' | 'last';

/** Row indexes of each side, ascending. */
export interface RowSplit {
  train: Int32Array;
  holdout: Int32Array;
}

/**
 * Hold-out rows: round(share * rows), at least 1, leaving at least 2 training rows.
 * Returns null when `rows` is below 3 (nothing sensible to split).
 *
 * @param rows number of data rows
 * @param share share of rows held out, in (0, 1)
 */
export function holdoutCount(rows: number, share: number): number | null {
  if (rows < 3) return null;
  return Math.min(rows - 2, Math.max(1, Math.round(share * rows)));
}

/**
 * Splits rows 0..rows-1.
 *
 * @param rows number of data rows (>= 3)
 * @param share share held out, in (0, 1) (see {@link holdoutCount})
 * @param how `random` (seeded) or `last` (a block at the end)
 * @param seed seed of the random split (ignored for `last`)
 * @throws RangeError when rows < 3
 */
export function splitRows(rows: number, share: number, how: SplitHow, seed: number): RowSplit {
  const count = holdoutCount(rows, share);
  if (count === null) throw new RangeError(`splitRows: need at least 3 rows, got ${rows}`);
  const held = new Uint8Array(rows);
  if (how === 'last') held.fill(1, rows - count);
  else {
    const order = permutation(rows, seededRandom(seed));
    markFirst(held, order, count);
  }
  return { train: indexesWhere(held, 0, rows - count), holdout: indexesWhere(held, 1, count) };
}

function markFirst(held: Uint8Array, order: Int32Array, count: number): void {
  for (let i = 0; i < count; i++) held[order[i]] = 1;
}

function indexesWhere(held: Uint8Array, value: number, count: number): Int32Array {
  const out = new Int32Array(count);
  let k = 0;
  for (let i = 0; i < held.length; i++) if (held[i] === value) out[k++] = i;
  return out;
}
