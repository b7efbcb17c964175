/**
 * Scratch arrays of doubles lent for the length of one call and given back: a run of many small
 * models asks for the same few working buffers (a design block per pass) over and over, and
 * lending them from a small pool keeps that memory from being made and dropped per model (memory
 * outside the JavaScript heap that is freed only when the garbage collector gets to it, and that
 * the process's allocator does not always give back to the system).
 *
 * The pool belongs to the thread (each worker thread has its own copy of this module) and holds at
 * most {@link SCRATCH_KEPT} buffers of at most {@link SCRATCH_MAX_BYTES} each; a larger request is
 * made and dropped as before. A lent array is all zeros, as a new one is. Whoever borrows must give
 * it back only when nothing reads or writes it any more (in a `finally`, or after its last use: one
 * not given back, say when an error ends the call, is only dropped as a new one would be), and
 * must not keep it.
 */

/**
 * Buffers the pool keeps at most (8 MiB in all at worst). A model's diagnostics hold up to five
 * at once, of several sizes (the swing plan: two row-sized work arrays, the grid, its uniform
 * points and its gap indices; the swing scores: the grid, the predictions there and a design
 * block; the leakage scan: three), so that fewer would let the small ones crowd out a size asked
 * for again by the next model.
 */
export const SCRATCH_KEPT = 8;

/** Largest buffer the pool keeps (1 MiB: a design block is about 512 KiB, design/blocks.ts). */
export const SCRATCH_MAX_BYTES = 1 << 20;

/** Smallest buffer made for the pool (sizes are rounded up to a power of two from here). */
const SCRATCH_MIN_BYTES = 1 << 12;

const spare: ArrayBuffer[] = [];

/**
 * A zero-filled array of `length` doubles, from the pool when a kept buffer is large enough (the
 * smallest such), else new. Its `buffer` may be larger than `length` doubles.
 * @param length doubles wanted (a non-negative integer)
 */
export function borrowDoubles(length: number): Float64Array {
  return lend(length, true);
}

/**
 * {@link borrowDoubles} for a caller that writes every element before it reads any (a design
 * block: design/blocks.ts): a kept buffer is not cleared first, so the array may hold what its
 * last borrower left there (zeros when new).
 * @param length doubles wanted (a non-negative integer)
 */
export function borrowDoublesToOverwrite(length: number): Float64Array {
  return lend(length, false);
}

/** The array of {@link borrowDoubles}; a kept buffer is cleared only when `clear` is true. */
function lend(length: number, clear: boolean): Float64Array {
  const bytes = length * Float64Array.BYTES_PER_ELEMENT;
  let best = -1;
  for (let i = 0; i < spare.length; i++) {
    if (spare[i].byteLength >= bytes && (best < 0 || spare[i].byteLength < spare[best].byteLength)) best = i;
  }
  if (best >= 0) {
    const [buffer] = spare.splice(best, 1);
    const array = new Float64Array(buffer, 0, length);
    if (clear) array.fill(0);
    return array;
  }
  if (bytes > SCRATCH_MAX_BYTES) return new Float64Array(length);
  let size = SCRATCH_MIN_BYTES;
  while (size < bytes) size *= 2;
  return new Float64Array(new ArrayBuffer(size), 0, length);
}

/**
 * A zero-filled array of `length` 32-bit integers, lent from the same pool as
 * {@link borrowDoubles} (its buffer may be larger); give it back with {@link returnInts}.
 * @param length integers wanted (a non-negative integer)
 */
export function borrowInts(length: number): Int32Array {
  const doubles = borrowDoubles(Math.ceil(length / 2));
  return new Int32Array(doubles.buffer, doubles.byteOffset, length);
}

/**
 * Gives an array from {@link borrowInts} back to the pool, as {@link returnDoubles} does.
 * @param array the borrowed array
 */
export function returnInts(array: Int32Array): void {
  keep(array.buffer);
}

/**
 * Gives an array from {@link borrowDoubles} back to the pool (kept when there is room and it is not
 * too large; given twice, it is kept once). The caller must not use it afterwards.
 * @param array the borrowed array
 */
export function returnDoubles(array: Float64Array): void {
  keep(array.buffer);
}

/** Keeps a lent buffer for the next borrower, when it is of a kept size and there is room. */
function keep(buffer: ArrayBufferLike): void {
  if (!(buffer instanceof ArrayBuffer) || buffer.byteLength > SCRATCH_MAX_BYTES || buffer.byteLength < SCRATCH_MIN_BYTES) return;
  if (spare.length >= SCRATCH_KEPT || spare.includes(buffer)) return;
  spare.push(buffer);
}
