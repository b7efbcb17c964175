/**
 * The row kernels behind one facade: each function runs in WebAssembly where it is available and
 * in JavaScript otherwise, with the same operations in the same order (the results are the same
 * to the bit). Callers never ask which. The JavaScript is the reference the WebAssembly is tested
 * against (test/kernels/).
 */
import { firstBeyondIn, wasmKernels } from './wasm.js';

export { useWasmKernels } from './wasm.js';

/**
 * Index of the first of a[0..n) whose magnitude is not within ±max (NaN included), or -1.
 * @param a values (length >= n)
 */
export function firstBeyond(a: Float64Array, n: number, max: number): number {
  const kernels = wasmKernels();
  if (kernels !== null) return firstBeyondIn(kernels, a, n, max);
  for (let i = 0; i < n; i++) if (!(Math.abs(a[i]) <= max)) return i;
  return -1;
}
