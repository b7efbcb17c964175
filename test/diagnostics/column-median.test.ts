import { describe, expect, it } from 'vitest';
import { columnMedian, medianOfSorted } from '../../src/diagnostics/column-median.js';
import { seededRandom } from '../../src/diagnostics/random.js';

/** The median by a full sort (the definition: middle value, or the mean of the two middle values). */
function sortedMedian(values: Float64Array): number {
  const s = Float64Array.from(values).sort();
  const n = s.length;
  return n % 2 === 1 ? s[n >> 1] : (s[(n >> 1) - 1] + s[n >> 1]) / 2;
}

describe('column median (exact; bracketed by a sample on big columns)', () => {
  const u = seededRandom(2024);
  const shapes: [string, (n: number) => Float64Array][] = [
    ['uniform', (n) => Float64Array.from({ length: n }, () => u())],
    ['sorted', (n) => Float64Array.from({ length: n }, (_, i) => i * 0.5)],
    ['reversed', (n) => Float64Array.from({ length: n }, (_, i) => n - i)],
    ['few distinct values', (n) => Float64Array.from({ length: n }, () => Math.floor(u() * 3))],
    ['constant', (n) => new Float64Array(n).fill(7.25)],
    ['extremes at the stride positions', (n) => Float64Array.from({ length: n }, (_, i) => (i % 64 === 0 ? 1e9 : u()))],
    ['half small, half huge', (n) => Float64Array.from({ length: n }, (_, i) => (i < n / 2 ? u() : 1e12 + u()))],
  ];
  for (const [label, make] of shapes) {
    it(`equals the median of the sorted column (${label}; small, odd and even big columns)`, () => {
      for (const n of [1, 2, 9, 1000, 16384, 50_001, 100_000]) {
        const values = make(n);
        const copy = Float64Array.from(values);
        expect(columnMedian(values, n), `n ${n}`).toBe(sortedMedian(values));
        expect(
          values.every((v, i) => v === copy[i]),
          'the column is not modified',
        ).toBe(true);
      }
    });
  }

  it('takes the first n values only, and remembers per column and n', () => {
    const values = Float64Array.from({ length: 40_000 }, (_, i) => (i < 30_000 ? i : -1e6));
    expect(columnMedian(values, 30_000)).toBe(sortedMedian(values.subarray(0, 30_000)));
    expect(columnMedian(values, 40_000)).toBe(sortedMedian(values));
  });
});

describe('median read off sorted values (medianOfSorted)', () => {
  const u = seededRandom(99);
  const cases: [string, Float64Array][] = [
    ['odd', Float64Array.from({ length: 1001 }, () => u() * 10 - 5)],
    ['even', Float64Array.from({ length: 1000 }, () => u() * 10 - 5)],
    ['repeats', Float64Array.from({ length: 600 }, () => Math.round(u() * 6))],
    ['zeros of both signs in the middle', Float64Array.from({ length: 8 }, (_, i) => [-0, 0, -1, 2, 0, -0, 3, -4][i])],
    ['a NaN', Float64Array.from([3, Number.NaN, 1, 2, 5])],
    ['infinities', Float64Array.from([Infinity, -Infinity, 1, 2])],
    ['one value', Float64Array.of(7)],
  ];
  for (const [name, values] of cases) {
    it(`gives the bits of the selection: ${name}`, () => {
      const expected = columnMedian(Float64Array.from(values), values.length);
      const sorted = Float64Array.from(values).sort();
      const got = medianOfSorted(values, values.length, sorted);
      expect(Object.is(got, expected)).toBe(true);
      // Remembered: a later reader gets the same value.
      expect(Object.is(columnMedian(values, values.length), expected)).toBe(true);
    });
  }
});
