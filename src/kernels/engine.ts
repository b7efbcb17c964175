/**
 * The one choice between the WebAssembly kernels and the JavaScript ones, made per thread: the
 * WebAssembly where this runtime has it (compiled on the first kernel call), the JavaScript where
 * it has not (`node --jitless`) or a test turned it off. When WebAssembly memory cannot be
 * reserved (a low `ulimit -v`), or this runtime cannot compile the module (a WebAssembly without the
 * SIMD it uses), the kernel that asked runs in JavaScript instead and so does every later one in
 * the thread; {@link kernelNotes} then holds one note for the run's Result. The
 * figures do not change: each WebAssembly kernel does its JavaScript reference's operations in the
 * same order (test/kernels/wasm-kernels.test.ts compares the bits).
 */
import { CompileFault, instantiateKernels, ResourceFault, WASM_AVAILABLE, type KernelExports } from './wasm.js';

/** Which kernels a call runs. */
export type KernelEngine = 'webassembly' | 'javascript';

/** The note a run's Result gets when the kernels fell back to JavaScript for want of memory. */
export const KERNEL_FALLBACK_NOTE =
  'WebAssembly memory could not be reserved (a low virtual-memory limit such as `ulimit -v` does this), so the row kernels ran in JavaScript: the same figures, more slowly.';

/** The note a run's Result gets when this runtime could not compile the kernels' module. */
export const KERNEL_COMPILE_NOTE =
  'This runtime could not compile the WebAssembly row kernels (they use 128-bit SIMD), so they ran in JavaScript: the same figures, more slowly.';

/** Whether to use WebAssembly (false after a fallback, or when a test turned it off). */
let wanted = WASM_AVAILABLE;
/** The module's exports once compiled. */
let kernels: KernelExports | null = null;
/** Notes of this thread's fallback and of those other threads reported ({@link recordKernelNotes}). */
const notes: string[] = [];

/** JavaScript from now on in this thread, with its note. */
function fallBack(note: string = KERNEL_FALLBACK_NOTE): void {
  wanted = false;
  kernels = null;
  if (!notes.includes(note)) notes.push(note);
}

/** The compiled module when WebAssembly is in use, else null (falling back when it cannot be instantiated). */
function current(): KernelExports | null {
  if (!wanted) return null;
  if (kernels === null) {
    try {
      kernels = instantiateKernels();
    } catch (error) {
      if (error instanceof CompileFault) fallBack(KERNEL_COMPILE_NOTE);
      else if (error instanceof ResourceFault) fallBack();
      else throw error;
    }
  }
  return kernels;
}

/**
 * A kernel's facade function: runs `wasm` where WebAssembly is in use, else `js`, and `js` when
 * `wasm` cannot reserve its memory (it throws a {@link ResourceFault} before it changes any of
 * its arguments, so `js` starts from the same inputs). Any other error is passed on.
 * @param wasm the WebAssembly wrapper (copies in, runs the module's function, copies out)
 * @param js the JavaScript reference, with the same parameters and result
 */
export function facade<A extends unknown[], R>(wasm: (k: KernelExports, ...args: A) => R, js: (...args: A) => R): (...args: A) => R {
  return (...args: A): R => {
    const k = current();
    if (k !== null) {
      try {
        return Reflect.apply(wasm, undefined, [k, ...args]) as R;
      } catch (error) {
        if (!(error instanceof ResourceFault)) throw error;
        fallBack();
      }
    }
    return Reflect.apply(js, undefined, args) as R;
  };
}

/** The kernels the next call runs in this thread (compiling the module when it is not yet). */
export function kernelEngine(): KernelEngine {
  return current() === null ? 'javascript' : 'webassembly';
}

/**
 * Tests: turns the WebAssembly kernels on (where the runtime has WebAssembly) or off for this
 * thread, forgetting an earlier fallback and its note (the module is compiled again on the next call).
 * @param on true for WebAssembly, false for JavaScript
 * @returns whether WebAssembly was wanted before
 */
export function useWasmKernels(on: boolean): boolean {
  const before = wanted;
  wanted = on && WASM_AVAILABLE;
  kernels = null;
  notes.length = 0;
  return before;
}

/** Notes about the kernels for the run's Result: empty, {@link KERNEL_FALLBACK_NOTE} or {@link KERNEL_COMPILE_NOTE}. */
export function kernelNotes(): string[] {
  return [...notes];
}

/**
 * Adds the kernel notes another thread reported (a model worker's), each once.
 * @param more that thread's {@link kernelNotes}
 */
export function recordKernelNotes(more: readonly string[]): void {
  for (const note of more) if (!notes.includes(note)) notes.push(note);
}
