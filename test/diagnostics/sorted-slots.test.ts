// sortWithSlots (diagnostics/sorted-slots.ts): the built-in sort's values and each row's slot
// among the distinct values, or a refusal that leaves the outputs untouched.
import { describe, expect, it } from 'vitest';
import { sortWithSlots } from '../../src/diagnostics/sorted-slots.js';
import { seededRandom } from '../../src/diagnostics/random.js';

/** The distinct values of the built-in sort's result (of `===` equals the first), as the swing grid packs them. */
function packed(values: Float64Array): Float64Array {
  const s = Float64Array.from(values).sort();
  const out: number[] = [];
  for (const v of s) if (out.length === 0 || v !== out[out.length - 1]) out.push(v);
  return Float64Array.from(out);
}

describe('sortWithSlots', () => {
  const u = seededRandom(5);
  const cases: [string, Float64Array][] = [
    ['spread values', Float64Array.from({ length: 1000 }, () => u() * 50 - 20)],
    ['repeated values', Float64Array.from({ length: 800 }, () => Math.round(u() * 400) / 8)],
    ['zeros of both signs', Float64Array.from({ length: 300 }, (_, i) => (i % 37 === 0 ? -0 : i % 41 === 0 ? 0 : u() - 0.5))],
    ['two values', Float64Array.of(3, 1)],
  ];
  for (const [name, values] of cases) {
    it(`gives the built-in sort's bits and each row's slot: ${name}`, () => {
      const n = values.length;
      const out = new Float64Array(n);
      const slots = new Int32Array(n);
      expect(sortWithSlots(values, n, out, slots)).toBe(true);
      const want = Float64Array.from(values).sort();
      expect(Array.from(out).every((v, i) => Object.is(v, want[i]))).toBe(true);
      const distinct = packed(values);
      for (let r = 0; r < n; r++) expect(distinct[slots[r]] === values[r]).toBe(true);
      expect(Math.max(...slots)).toBe(distinct.length - 1);
    });
  }

  it('declines a NaN, infinite extremes, a constant column and bunched values, leaving the outputs as they were', () => {
    const bunched = Float64Array.from({ length: 1000 }, (_, i) => (i === 0 ? 1e9 : u()));
    for (const values of [Float64Array.of(1, Number.NaN, 2), Float64Array.of(1, Infinity, 2), Float64Array.of(4, 4, 4), bunched]) {
      const out = new Float64Array(values.length).fill(7);
      const slots = new Int32Array(values.length).fill(9);
      expect(sortWithSlots(values, values.length, out, slots)).toBe(false);
      expect(out.every((v) => v === 7)).toBe(true);
      expect(slots.every((v) => v === 9)).toBe(true);
    }
  });
});
