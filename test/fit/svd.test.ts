import { describe, expect, it } from 'vitest';
import { svd } from '../../src/fit/svd.js';

describe('svd', () => {
  it('reproduces A = U diag(s) V^T with descending non-negative s', () => {
    const m = 4;
    const k = 3;
    const A = new Float64Array([2, -1, 0, 3, 1, 4, -2, 0, 0, 1, 5, -1]);
    const { s, U, V } = svd(A, m, k);
    for (let c = 1; c < k; c++) expect(s[c]).toBeLessThanOrEqual(s[c - 1]);
    for (const v of s) expect(v).toBeGreaterThanOrEqual(0);
    for (let i = 0; i < m; i++) {
      for (let j = 0; j < k; j++) {
        let t = 0;
        for (let c = 0; c < k; c++) t += U[c * m + i] * s[c] * V[c * k + j];
        expect(Math.abs(t - A[j * m + i]), `A[${i},${j}] = ${A[j * m + i]}, rebuilt ${t}`).toBeLessThan(1e-13);
      }
    }
  });

  it('diag(3, 1) has singular values 3 and 1 (descending)', () => {
    expect(Array.from(svd(new Float64Array([1, 0, 0, 3]), 2, 2).s)).toEqual([3, 1]);
  });

  it('rejects wide or empty shapes instead of letting ml-matrix warn', () => {
    expect(() => svd(new Float64Array(6), 2, 3)).toThrow(RangeError);
    expect(() => svd(new Float64Array(0), 0, 0)).toThrow(RangeError);
  });
});

describe('svd far from 1', () => {
  it('scales by a power of two: singular values of 1e-300 and 1e200 matrices are exact multiples', () => {
    // A = c * [[3, 0], [4, 5]]: scaling A by c scales its singular values by c
    const base = svd(Float64Array.from([3, 4, 0, 5]), 2, 2).s;
    for (const c of [1e-300, 1e200]) {
      const s = svd(Float64Array.from([3 * c, 4 * c, 0, 5 * c]), 2, 2).s;
      for (let i = 0; i < 2; i++) expect(Math.abs(s[i] / c - base[i]) / base[i], `c = ${c}, i = ${i}`).toBeLessThan(1e-14);
    }
  });

  it('ends on a factor with subnormal entries (regression: the iteration never converged)', () => {
    const A = Float64Array.from([2, 0, 0, 1e-300, 1, 0, 5e-324, 2.9e-313, -1e-297]);
    const { s } = svd(A, 3, 3);
    expect(s[0]).toBeCloseTo(2, 12);
    expect(s[1]).toBeCloseTo(1, 12);
    expect(s[2]).toBeLessThan(1e-290);
  });

  it('returns zeros for the zero matrix', () => {
    expect(Array.from(svd(new Float64Array(4), 2, 2).s)).toEqual([0, 0]);
  });
});
