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
