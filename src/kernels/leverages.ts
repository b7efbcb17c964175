/**
 * Leverages of a block of rows under a full-rank triangular factor: h_i = || R^-T x_i ||^2, by
 * forward substitution run down whole columns a few hundred rows at a time (fit/index.ts,
 * leveragesInto, says what they are). In WebAssembly where it is in use (kernels.wat,
 * `leverages`), else in JavaScript ({@link leverageRowsJs}, the reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/** Rows per chunk of the JavaScript (the chunk's z columns stay in cache). */
const LEVERAGE_CHUNK = 256;

/** The JavaScript reference of {@link leverageRows}. */
export function leverageRowsJs(R: Float64Array, p: number, X: Float64Array, m: number, out: Float64Array): void {
  const Z = new Float64Array(LEVERAGE_CHUNK * p);
  for (let i0 = 0; i0 < m; i0 += LEVERAGE_CHUNK) leverageChunk(R, p, X, m, i0, Math.min(LEVERAGE_CHUNK, m - i0), Z, out);
}

/** {@link leverageRows} in WebAssembly: the same operations in the same order per row. */
function leverageRowsWasm(k: KernelExports, R: Float64Array, p: number, X: Float64Array, m: number, out: Float64Array): void {
  const oX = p * p;
  const oZ = oX + m * p;
  const oOut = oZ + m * p;
  const f = heap(k, oOut + m);
  f.set(R.subarray(0, p * p));
  f.set(X.subarray(0, m * p), oX);
  k.leverages(0, p, oX * 8, m, oZ * 8, oOut * 8);
  out.set(f.subarray(oOut, oOut + m));
}

/**
 * Leverages of the m rows of a column-major m x p block X under a full-rank upper-triangular R
 * (p x p, column-major): out[i] = || R^-T x_i ||^2 for i < m (out has length >= m). No
 * finiteness check.
 */
export const leverageRows: (R: Float64Array, p: number, X: Float64Array, m: number, out: Float64Array) => void = facade(
  leverageRowsWasm,
  leverageRowsJs,
);

/**
 * Leverages of rows i0 .. i0+mb-1 of the column-major m x p block X into out[i0..): forward
 * substitution z = R^-T x down whole columns of Z (leading dimension LEVERAGE_CHUNK). A function of
 * its own so that its loops never run inside code V8 optimised in the middle of another chunk
 * (see DEVELOPERS.md, "Writing hot loops").
 */
function leverageChunk(
  R: Float64Array,
  p: number,
  X: Float64Array,
  m: number,
  i0: number,
  mb: number,
  Z: Float64Array,
  out: Float64Array,
): void {
  const CH = LEVERAGE_CHUNK;
  for (let i = 0; i < mb; i++) out[i0 + i] = 0;
  for (let j = 0; j < p; j++) {
    const zj = j * CH;
    const xj = j * m + i0;
    for (let i = 0; i < mb; i++) Z[zj + i] = X[xj + i];
    let k = 0;
    // Four earlier columns per sweep (the same subtractions in the same order per row).
    for (; k + 3 < j; k += 4) {
      const r0 = R[j * p + k];
      const r1 = R[j * p + k + 1];
      const r2 = R[j * p + k + 2];
      const r3 = R[j * p + k + 3];
      const z0 = k * CH;
      for (let i = 0; i < mb; i++) {
        Z[zj + i] = Z[zj + i] - r0 * Z[z0 + i] - r1 * Z[z0 + CH + i] - r2 * Z[z0 + 2 * CH + i] - r3 * Z[z0 + 3 * CH + i];
      }
    }
    for (; k < j; k++) {
      const r = R[j * p + k];
      const zk = k * CH;
      for (let i = 0; i < mb; i++) Z[zj + i] -= r * Z[zk + i];
    }
    const diag = R[j * p + j];
    for (let i = 0; i < mb; i++) {
      const z = Z[zj + i] / diag;
      Z[zj + i] = z;
      out[i0 + i] += z * z;
    }
  }
}
