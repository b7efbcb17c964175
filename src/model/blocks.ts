/**
 * Walks a model's rows in blocks, building the design block by block so that no n x p matrix is
 * ever held: memory is one block of `rows x p` doubles.
 */
import type { ModelData } from '../checks/types.js';
import type { Design } from '../design-matrix.js';

/** Rows per block for a design of p columns: about 1 M doubles (8 MiB), at least 64 rows. */
export function blockRows(p: number): number {
  return Math.max(64, Math.floor((1 << 20) / Math.max(1, p)));
}

/**
 * Calls `visit(X, start, m)` for consecutive blocks of rows; `X` is column-major m x p and is
 * reused between calls (copy it to keep it).
 */
export function forEachBlock(
  design: Design,
  data: Pick<ModelData, 'inputs' | 'rows'>,
  visit: (X: Float64Array, start: number, m: number) => void,
): void {
  const size = blockRows(design.p);
  const buffer = new Float64Array(Math.min(size, Math.max(1, data.rows)) * design.p);
  for (let start = 0; start < data.rows; start += size) {
    const m = Math.min(size, data.rows - start);
    design.fill(data.inputs, start, m, buffer);
    visit(buffer, start, m);
  }
}

/** Predictions Phi w for every row of `data`, block by block (length `data.rows`). */
export function predictRows(design: Design, data: Pick<ModelData, 'inputs' | 'rows'>, w: ArrayLike<number>): Float64Array {
  const out = new Float64Array(data.rows);
  const p = design.p;
  forEachBlock(design, data, (X, start, m) => {
    for (let j = 0; j < p; j++) {
      const wj = w[j];
      if (wj === 0) continue;
      const base = j * m;
      for (let i = 0; i < m; i++) out[start + i] += X[base + i] * wj;
    }
  });
  return out;
}
