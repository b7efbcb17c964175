// Scratch arrays lent and given back (core/scratch.ts): zero-filled like new ones, the same buffer
// lent again after it came back, and the pool bounded in count and size.
import { describe, expect, it } from 'vitest';
import {
  borrowDoubles,
  borrowDoublesToOverwrite,
  borrowInts,
  returnDoubles,
  returnInts,
  SCRATCH_KEPT,
  SCRATCH_MAX_BYTES,
} from '../../src/core/scratch.js';

describe('scratch arrays of doubles', () => {
  it('lends a zero-filled array of the length asked, and the same buffer again once it is back', () => {
    const a = borrowDoubles(1000);
    expect(a.length).toBe(1000);
    expect(a.every((v) => v === 0)).toBe(true);
    a.fill(7);
    returnDoubles(a);
    const b = borrowDoubles(900);
    expect(b.buffer).toBe(a.buffer);
    expect(b.length).toBe(900);
    expect(b.every((v) => v === 0)).toBe(true);
    // While b is out, another request gets another buffer.
    const c = borrowDoubles(900);
    expect(c.buffer).not.toBe(b.buffer);
    returnDoubles(b);
    returnDoubles(c);
  });

  it('lends zero-filled 32-bit integers from the same pool (an odd length too)', () => {
    // A size no earlier test left in the pool (512 KiB).
    const a = borrowInts(100_001);
    expect(a).toBeInstanceOf(Int32Array);
    expect(a.length).toBe(100_001);
    expect(a.every((v) => v === 0)).toBe(true);
    a.fill(-1);
    returnInts(a);
    const b = borrowDoubles(50_001);
    expect(b.buffer).toBe(a.buffer);
    expect(b.every((v) => v === 0)).toBe(true);
    returnDoubles(b);
    const c = borrowInts(100_001);
    expect(c.buffer).toBe(a.buffer);
    expect(c.every((v) => v === 0)).toBe(true);
    returnInts(c);
  });

  it('lends a kept buffer as it was left to a caller that overwrites it, and a new one as zeros', () => {
    const fresh = borrowDoublesToOverwrite(100_001);
    expect(fresh.length).toBe(100_001);
    expect(fresh.every((v) => v === 0)).toBe(true);
    fresh.fill(3);
    returnDoubles(fresh);
    const again = borrowDoublesToOverwrite(80_000);
    expect(again.buffer).toBe(fresh.buffer);
    expect(again.length).toBe(80_000);
    expect(again[0]).toBe(3);
    returnDoubles(again);
    // borrowDoubles clears the same buffer.
    const cleared = borrowDoubles(80_000);
    expect(cleared.buffer).toBe(fresh.buffer);
    expect(cleared.every((v) => v === 0)).toBe(true);
    returnDoubles(cleared);
  });

  it('lends the smallest kept buffer that is large enough', () => {
    const small = borrowDoubles(600);
    const large = borrowDoubles(60_000);
    returnDoubles(large);
    returnDoubles(small);
    // Not the large one (earlier tests may have left other small buffers in the pool).
    const again = borrowDoubles(500);
    expect(again.buffer).not.toBe(large.buffer);
    expect(again.buffer.byteLength).toBe(small.buffer.byteLength);
    const big = borrowDoubles(50_000);
    expect(big.buffer).toBe(large.buffer);
    returnDoubles(again);
    returnDoubles(big);
  });

  it(`keeps at most ${SCRATCH_KEPT} buffers, none over ${SCRATCH_MAX_BYTES} bytes, and a buffer given twice once`, () => {
    const many = Array.from({ length: SCRATCH_KEPT + 3 }, () => borrowDoubles(100));
    for (const a of many) returnDoubles(a);
    returnDoubles(many[0]);
    const lent = Array.from({ length: SCRATCH_KEPT + 3 }, () => borrowDoubles(100));
    const reused = lent.filter((a) => many.some((m) => m.buffer === a.buffer));
    expect(reused).toHaveLength(SCRATCH_KEPT);
    expect(new Set(lent.map((a) => a.buffer)).size).toBe(lent.length);
    for (const a of lent) returnDoubles(a);
    const huge = borrowDoubles(SCRATCH_MAX_BYTES / 8 + 1);
    returnDoubles(huge);
    expect(borrowDoubles(SCRATCH_MAX_BYTES / 8 + 1).buffer).not.toBe(huge.buffer);
  });
});
