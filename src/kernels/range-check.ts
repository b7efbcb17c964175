/**
 * The design's range check (run/plan.ts and run/passes.ts): the first value of a block whose
 * magnitude is beyond a bound. In WebAssembly where it is in use (kernels.wat, `firstBeyond`),
 * else in JavaScript ({@link firstBeyondJs}, the reference).
 */
import { facade } from './engine.js';
import { heap, type KernelExports } from './wasm.js';

/** The JavaScript reference of {@link firstBeyond}. */
export function firstBeyondJs(a: Float64Array, n: number, max: number): number {
  for (let i = 0; i < n; i++) if (!(Math.abs(a[i]) <= max)) return i;
  return -1;
}

/** {@link firstBeyond} in WebAssembly. */
function firstBeyondWasm(k: KernelExports, a: Float64Array, n: number, max: number): number {
  const f = heap(k, n);
  f.set(a.subarray(0, n));
  return k.firstBeyond(0, n, max);
}

/**
 * Index of the first of a[0..n) whose magnitude is not within ±max (NaN included), or -1.
 * @param a values (length >= n)
 */
export const firstBeyond: (a: Float64Array, n: number, max: number) => number = facade(firstBeyondWasm, firstBeyondJs);
