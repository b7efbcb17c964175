/**
 * The row kernels behind one facade: each function runs in WebAssembly where it is in use and in
 * JavaScript otherwise, with the same operations in the same order (the results are the same to
 * the bit). engine.ts makes that choice once per thread; callers never ask which. Each kernel's
 * module (qr-fold.ts, refine.ts, ...) holds its JavaScript reference (`...Js`), which
 * test/kernels/ compares the WebAssembly with. Code outside src/kernels/ imports from here only.
 */
export {
  kernelEngine,
  kernelNotes,
  KERNEL_COMPILE_NOTE,
  KERNEL_FALLBACK_NOTE,
  recordKernelNotes,
  useWasmKernels,
  type KernelEngine,
} from './engine.js';
export { leverageRows } from './leverages.js';
export { outOfFoldRows } from './out-of-fold.js';
export { polynomialColumns } from './polynomial-columns.js';
export { addGramRows } from './gram.js';
export { addProducts } from './products.js';
export { foldRows, sumOfSquares, type BadValue, type FoldOutcome } from './qr-fold.js';
export { firstBeyond } from './range-check.js';
export { firstNotFinite, refineRows, residualsInto, type RefineOutcome } from './refine.js';
