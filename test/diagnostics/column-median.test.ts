import { describe, expect, it } from 'vitest';
import { columnMedian } from '../../src/diagnostics/column-median.js';
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
