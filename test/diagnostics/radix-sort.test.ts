import { describe, expect, it } from 'vitest';
import { sortFloat64 } from '../../src/diagnostics/radix-sort.js';

/** Deterministic pseudo-random numbers in [0, 1) (a linear congruential generator, Numerical Recipes constants). */
function uniform(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/** First index where a and b differ (Object.is: -0 and +0 differ), or -1. */
function firstDifference(a: Float64Array, b: Float64Array): number {
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return i;
  return -1;
}

describe('sortFloat64 gives exactly the order of Float64Array.prototype.sort', () => {
  const cases: [string, (r: () => number, i: number) => number][] = [
    ['evenly spread values with 10 significant digits (bucket path)', (r) => Number((r() * 200 - 100).toPrecision(10))],
    ['heavy-tailed values spanning 600 orders of magnitude (radix path)', (r) => (r() < 0.5 ? -1 : 1) * 10 ** (r() * 600 - 300)],
    ['many repeats, zeros of both signs and negatives', (r, i) => (i % 5 === 0 ? (i % 10 === 0 ? -0 : 0) : Math.floor(r() * 50) - 25)],
    ['one value repeated except the last (a single full bucket)', (_, i) => (i === 9999 ? 2 : 1)],
  ];
  for (const [name, make] of cases) {
    for (const n of [5000, 100_000]) {
      it(`${name}, n = ${n}`, () => {
        const r = uniform(n + name.length);
        const a = Float64Array.from({ length: n }, (_, i) => make(r, i));
        const expected = Float64Array.from(a).sort();
        const actual = sortFloat64(Float64Array.from(a), new Uint32Array(2 * n));
        const at = firstDifference(actual, expected);
        expect(at, `first difference at ${at}: got ${actual[at]}, expected ${expected[at]}`).toBe(-1);
      });
    }
  }

  it('sorts short arrays and the empty array (built-in path)', () => {
    expect(Array.from(sortFloat64(new Float64Array([3, -1, 2])))).toEqual([-1, 2, 3]);
    expect(sortFloat64(new Float64Array(0)).length).toBe(0);
  });
});
