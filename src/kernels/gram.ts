/**
 * The Gram kernel of an IRLS pass (fit/gram-step.ts): for each part f of a block's kept rows,
 * G_f += A^T A on the upper triangle, A the extended rows [scale_t X[index_t, :] | u_t | 0]
 * (q columns, q even: p design columns, the residual column and a zero column when p + 1 is odd).
 * Rows are taken in chunks: each chunk is gathered and scaled into a small work block that stays in
 * cache, then summed in 2 x 2 tiles of columns. In WebAssembly where it is in use (kernels.wat,
 * `gramRows`), else in JavaScript ({@link addGramRowsJs}, the reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/** Rows per chunk (the chunk's work block, CHUNK x q, stays in cache). */
const CHUNK = 256;

/** The JavaScript work block (grown as needed; the kernel is never re-entered). */
let work = new Float64Array(0);

/**
 * The JavaScript reference of {@link addGramRows}: for each part, for each chunk of its rows,
 * the work block W (leading dimension CHUNK) with W[j][t] = scale[t] X[j * m + index[t]] (j < p),
 * W[p][t] = u[t], zeros beyond; then for each tile of columns (j, j + 1) x (k, k + 1), k >= j, four
 * sums over the chunk's rows in row order, each added to its entry of G_f.
 */
export function addGramRowsJs(
  G: Float64Array,
  q: number,
  X: Float64Array,
  m: number,
  p: number,
  index: Int32Array,
  scale: Float64Array,
  u: Float64Array,
  offsets: Int32Array,
  count: number,
): void {
  if (work.length < CHUNK * q) work = new Float64Array(CHUNK * q);
  for (let f = 0; f < count; f++) {
    const g = f * q * q;
    for (let s = offsets[f]; s < offsets[f + 1]; s += CHUNK) {
      const n = Math.min(offsets[f + 1], s + CHUNK) - s;
      for (let j = 0; j < p; j++) gatherScaled(X, j * m, index, scale, s, n, work, j * CHUNK);
      for (let t = 0; t < n; t++) work[p * CHUNK + t] = u[s + t];
      for (let j = p + 1; j < q; j++) work.fill(0, j * CHUNK, j * CHUNK + n);
      for (let j = 0; j < q; j += 2) {
        for (let k = j; k < q; k += 2) addTile(G, g, q, work, j, k, n);
      }
    }
  }
}

/** {@link addGramRows} in WebAssembly: the same operations in the same order. */
function addGramRowsWasm(
  k: KernelExports,
  G: Float64Array,
  q: number,
  X: Float64Array,
  m: number,
  p: number,
  index: Int32Array,
  scale: Float64Array,
  u: Float64Array,
  offsets: Int32Array,
  count: number,
): void {
  const r = offsets[count];
  const oX = count * q * q;
  const oScale = oX + m * p;
  const oU = oScale + r;
  const oWork = oU + r;
  const oIndex = oWork + CHUNK * q; // r i32 values, then count + 1 offsets
  const oOffsets = oIndex + Math.ceil(r / 2);
  const f = heap(k, oOffsets + Math.ceil((count + 1) / 2) + 1);
  f.set(G.subarray(0, oX));
  f.set(X.subarray(0, m * p), oX);
  f.set(scale.subarray(0, r), oScale);
  f.set(u.subarray(0, r), oU);
  const ints = new Int32Array(k.memory.buffer, 0, 2 * oOffsets + count + 1);
  ints.set(index.subarray(0, r), 2 * oIndex);
  ints.set(offsets.subarray(0, count + 1), 2 * oOffsets);
  k.gramRows(0, q, oX * 8, m, p, oIndex * 8, oScale * 8, oU * 8, oOffsets * 8, count, oWork * 8, CHUNK);
  G.set(f.subarray(0, oX));
}

/**
 * For each part f < count (rows offsets[f] .. offsets[f + 1] - 1 of `index`, `scale` and `u`):
 * G[f * q * q ..] += A_f^T A_f on the entries G_f[k * q + j], j <= k (and, of the diagonal
 * tiles, the entry just below the diagonal; the rest of the lower triangle is left as it is).
 *
 * @param G count Grams of q x q, column-major, one after another
 * @param q columns of the extended rows (even, p + 1 or p + 2)
 * @param X column-major m x p block (X[j * m + i] row i, column j)
 * @param index block row of each kept row t
 * @param scale sqrt(W) of each kept row t
 * @param u the residual column's value of each kept row t
 * @param offsets count + 1 ascending offsets into the kept rows
 */
export const addGramRows: (
  G: Float64Array,
  q: number,
  X: Float64Array,
  m: number,
  p: number,
  index: Int32Array,
  scale: Float64Array,
  u: Float64Array,
  offsets: Int32Array,
  count: number,
) => void = facade(addGramRowsWasm, addGramRowsJs);

// The row loops are functions of their own (see DEVELOPERS.md, "Writing hot loops").

/** out[to + t] = scale[s + t] X[from + index[s + t]] for t < n. */
function gatherScaled(
  X: Float64Array,
  from: number,
  index: Int32Array,
  scale: Float64Array,
  s: number,
  n: number,
  out: Float64Array,
  to: number,
): void {
  for (let t = 0; t < n; t++) out[to + t] = scale[s + t] * X[from + index[s + t]];
}

/** The four sums of tile (j, j + 1) x (k, k + 1) over the chunk's n rows, added to G at g. */
function addTile(G: Float64Array, g: number, q: number, A: Float64Array, j: number, k: number, n: number): void {
  const a0 = j * CHUNK;
  const a1 = a0 + CHUNK;
  const b0 = k * CHUNK;
  const b1 = b0 + CHUNK;
  let s00 = 0;
  let s01 = 0;
  let s10 = 0;
  let s11 = 0;
  for (let i = 0; i < n; i++) {
    const x0 = A[a0 + i];
    const x1 = A[a1 + i];
    const y0 = A[b0 + i];
    const y1 = A[b1 + i];
    s00 += x0 * y0;
    s01 += x0 * y1;
    s10 += x1 * y0;
    s11 += x1 * y1;
  }
  G[g + k * q + j] += s00;
  G[g + (k + 1) * q + j] += s01;
  G[g + k * q + j + 1] += s10;
  G[g + (k + 1) * q + j + 1] += s11;
}
