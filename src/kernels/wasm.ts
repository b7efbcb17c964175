/**
 * The WebAssembly module of the row kernels (kernels.wat, assembled into generated/): compiled
 * and instantiated once per thread by engine.ts, and the one piece of its memory every kernel
 * copies its arrays into and back out of. The two places that reserve memory (instantiating the
 * module and growing its memory) turn a failure into a {@link ResourceFault}, which engine.ts
 * answers by running the JavaScript kernels instead.
 */
import { KERNELS_WASM } from './generated/kernels-wasm.js';

/**
 * The parts of the WebAssembly JavaScript API used here (the project's type libraries, ES2023
 * and Node's, do not declare it).
 */
interface WasmApi {
  Module: new (bytes: Uint8Array) => object;
  Instance: new (module: object) => { exports: object };
}

/** This runtime's WebAssembly, or undefined (`node --jitless` has none). */
const WASM = (globalThis as { WebAssembly?: WasmApi }).WebAssembly;

/** True where this runtime has WebAssembly. */
export const WASM_AVAILABLE = WASM !== undefined;

/** A WebAssembly.Global of the module. */
interface WasmGlobal {
  value: number;
}

/** What kernels.wat exports (addresses are byte offsets into `memory`; matrices column-major). */
export interface KernelExports {
  memory: { buffer: ArrayBuffer; grow(pages: number): number };
  badRow: WasmGlobal;
  badColumn: WasmGlobal;
  rss: WasmGlobal;
  fold(R: number, qty: number, X: number, y: number, m: number, p: number, C: number, yc: number, chunk: number): number;
  leverages(R: number, p: number, X: number, m: number, Z: number, out: number): void;
  firstNotFinite(a: number, n: number): number;
  refine(X: number, y: number, m: number, w: number, p: number, hi: number, lo: number, gHi: number, gLo: number): number;
  addProducts(out: number, X: number, m: number, w: number, p: number): void;
  gramRows(
    G: number,
    q: number,
    X: number,
    m: number,
    p: number,
    index: number,
    scale: number,
    u: number,
    offsets: number,
    count: number,
    work: number,
    chunk: number,
  ): void;
  outOfFold(
    X: number,
    m: number,
    p: number,
    W: number,
    k: number,
    folds: number,
    single: number,
    y: number,
    pred: number,
    column: number,
    errors: number,
  ): void;
  polynomialColumns(x: number, m: number, shift: number, scale: number, raw: number, degree: number, out: number): void;
  firstBeyond(a: number, n: number, max: number): number;
}

/**
 * WebAssembly memory could not be reserved (the module's instance or a larger memory): the
 * RangeError V8 throws under a low `ulimit -v`, for instance. Nothing outside the module's
 * memory was changed when it is thrown.
 */
export class ResourceFault extends Error {
  override readonly name = 'ResourceFault';

  /** @param cause the RangeError of the WebAssembly API */
  constructor(cause: RangeError) {
    super(cause.message, { cause });
  }
}

/** WebAssembly's page size in bytes. */
const PAGE = 65536;

/** Memory requests left before the injected fault ({@link injectMemoryFault}); -1: none. */
let faultIn = -1;

/**
 * The module could not be compiled by this runtime: its WebAssembly lacks a feature the module
 * uses (the Gram kernel's 128-bit SIMD, which V8 offers on x64 with SSE4.1 and on arm64), or the
 * bytes were refused. Thrown before any kernel ran.
 */
export class CompileFault extends Error {
  override readonly name = 'CompileFault';

  /** @param cause the WebAssembly.CompileError (or LinkError) */
  constructor(cause: Error) {
    super(cause.message, { cause });
  }
}

/** Module bytes a test puts in place of the assembled ones ({@link injectModuleBytes}); null: the real module. */
let testBytes: Uint8Array | null = null;

/**
 * Compiles and instantiates the module.
 * @returns its exports, or null where this runtime has no WebAssembly
 * @throws ResourceFault when the instance's memory cannot be reserved
 * @throws CompileFault when this runtime cannot compile the module
 */
export function instantiateKernels(): KernelExports | null {
  if (WASM === undefined) return null;
  let module: object;
  try {
    module = new WASM.Module(testBytes ?? Buffer.from(KERNELS_WASM, 'base64'));
  } catch (error) {
    if (error instanceof RangeError) throw new ResourceFault(error);
    if (error instanceof Error && (error.name === 'CompileError' || error.name === 'LinkError')) throw new CompileFault(error);
    throw error;
  }
  try {
    return new WASM.Instance(module).exports as KernelExports;
  } catch (error) {
    if (error instanceof RangeError) throw new ResourceFault(error);
    if (error instanceof Error && error.name === 'LinkError') throw new CompileFault(error);
    throw error;
  }
}

/**
 * Tests: compiles these bytes instead of the assembled module from the next instantiation on.
 * @param bytes module bytes (invalid ones stand for a runtime that cannot compile the module); null restores the real module
 */
export function injectModuleBytes(bytes: Uint8Array | null): void {
  testBytes = bytes;
}

/**
 * A view of the module's memory with room for at least `doubles` float64 values from address 0,
 * growing the memory when it is smaller. Every kernel asks for it before it changes anything.
 * @throws ResourceFault when the memory cannot grow
 */
export function heap(k: KernelExports, doubles: number): Float64Array {
  if (faultIn >= 0 && faultIn-- === 0) throw new ResourceFault(new RangeError('WebAssembly.Memory.grow(): injected by a test'));
  const bytes = doubles * 8;
  const have = k.memory.buffer.byteLength;
  if (bytes > have) {
    try {
      k.memory.grow(Math.ceil((bytes - have) / PAGE));
    } catch (error) {
      if (error instanceof RangeError) throw new ResourceFault(error);
      throw error;
    }
  }
  return new Float64Array(k.memory.buffer, 0, doubles);
}

/**
 * Tests: makes a later request for the module's memory fail as a memory that cannot grow does.
 * @param after requests that still succeed first (0: the next one fails); -1 cancels
 */
export function injectMemoryFault(after: number): void {
  faultIn = after;
}
