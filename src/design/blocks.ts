/**
 * Walks a model's rows in blocks, building the design block by block so that no n x p matrix is
 * ever held: memory is one block of `rows x p` doubles.
 */
import type { ModelData } from '../data/model-data.js';
import type { Design } from './design-matrix.js';
import { addProducts } from '../kernels/index.js';
import { borrowDoublesToOverwrite, returnDoubles } from '../core/scratch.js';

/**
 * Rows per block for a design of p columns: about 64 K doubles (512 KiB), at least 64 rows. Small
 * enough to stay in cache between building a block and folding it (the QR works on pieces of a
 * few hundred rows of it), and to keep each pass's buffer from weighing on peak memory; large
 * enough that the per-block overhead does not show.
 */
export function blockRows(p: number): number {
  return Math.max(64, Math.floor((1 << 16) / Math.max(1, p)));
}

/**
 * Calls `visit(X, start, m)` for consecutive blocks of rows; `X` is column-major m x p and is
 * reused between calls and, once the walk is over, by later walks (core/scratch.ts lends it):
 * copy it to keep it.
 */
export function forEachBlock(
  design: Design,
  data: Pick<ModelData, 'inputs' | 'rows'>,
  visit: (X: Float64Array, start: number, m: number) => void,
): void {
  const size = blockRows(design.p);
  // Not cleared first: design.fill writes every entry of each block (terms/types.ts, Term.fill).
  const buffer = borrowDoublesToOverwrite(Math.min(size, Math.max(1, data.rows)) * design.p);
  try {
    for (let start = 0; start < data.rows; start += size) {
      const m = Math.min(size, data.rows - start);
      design.fill(data.inputs, start, m, buffer);
      visit(buffer, start, m);
    }
  } finally {
    returnDoubles(buffer);
  }
}

/**
 * Predictions Phi w for every row of `data`, block by block (length `data.rows`).
 * @param out where to write them: all zeros, of length `data.rows` (e.g. lent by core/scratch.ts);
 *   default a new array
 */
export function predictRows(
  design: Design,
  data: Pick<ModelData, 'inputs' | 'rows'>,
  w: ArrayLike<number>,
  out: Float64Array = new Float64Array(data.rows),
): Float64Array {
  forEachBlock(design, data, (X, start, m) => addProducts(out, start, X, m, w, design.p));
  return out;
}
