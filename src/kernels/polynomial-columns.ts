/**
 * The columns of a polynomial term (design/terms/polynomial.ts): z = (x - shift) / scale (x itself
 * when raw), then its powers by repeated multiplication (z^k = z^(k-1) * z). In WebAssembly where
 * it is in use (kernels.wat, `polynomialColumns`), else in JavaScript ({@link polynomialColumnsJs},
 * the reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/** The JavaScript reference of {@link polynomialColumns}. */
export function polynomialColumnsJs(
  x: Float64Array,
  m: number,
  shift: number,
  scale: number,
  raw: boolean,
  degree: number,
  out: Float64Array,
  at: number,
): void {
  if (raw) out.set(x.subarray(0, m), at);
  else standardise(x, m, shift, scale, out, at);
  for (let k = 1; k < degree; k++) multiplyColumns(out, at + (k - 1) * m, at, at + k * m, m);
}

/** {@link polynomialColumns} in WebAssembly: the same operations. */
function polynomialColumnsWasm(
  k: KernelExports,
  x: Float64Array,
  m: number,
  shift: number,
  scale: number,
  raw: boolean,
  degree: number,
  out: Float64Array,
  at: number,
): void {
  const oOut = m;
  const f = heap(k, oOut + degree * m);
  f.set(x.subarray(0, m));
  k.polynomialColumns(0, m, shift, scale, raw ? 1 : 0, degree, oOut * 8);
  out.set(f.subarray(oOut, oOut + degree * m), at);
}

/**
 * The `degree` columns of a polynomial term for x[0..m), written to out from `at` (column k at
 * at + k m, k = 0 .. degree-1): z = (x - shift) / scale, or x itself when `raw`, then z^2, z^3, ...
 * @param out length >= at + degree m
 */
export const polynomialColumns: (
  x: Float64Array,
  m: number,
  shift: number,
  scale: number,
  raw: boolean,
  degree: number,
  out: Float64Array,
  at: number,
) => void = facade(polynomialColumnsWasm, polynomialColumnsJs);

// The row loops are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").

/** out[at + i] = (x[i] - shift) / scale for i < m. */
function standardise(x: Float64Array, m: number, shift: number, scale: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) out[at + i] = (x[i] - shift) / scale;
}

/** out[to + i] = out[a + i] * out[b + i] for i < m (the next power from the previous one and z). */
function multiplyColumns(out: Float64Array, a: number, b: number, to: number, m: number): void {
  for (let i = 0; i < m; i++) out[to + i] = out[a + i] * out[b + i];
}
