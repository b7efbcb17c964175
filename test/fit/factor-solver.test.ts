import { describe, expect, it } from 'vitest';
import { FactorSolver, rawSingularValues, scaledSpectrum } from '../../src/fit/factor-solver.js';

// R = [[2, 1, 0], [0, 3, 1], [0, 0, 4]], column-major.
const R = new Float64Array([2, 0, 0, 1, 3, 0, 0, 1, 4]);

describe('scaledSpectrum', () => {
  it('column norms are the design column norms and the rank is full for a regular R', () => {
    const s = scaledSpectrum(R, 3, 10);
    expect(Array.from(s.columnNorms)).toEqual([2, Math.sqrt(10), Math.sqrt(17)]);
    expect(s.rank).toBe(3);
    expect(s.tolerance).toBeCloseTo(10 * Number.EPSILON * s.singularValues[0], 30);
  });
  it('is invariant to column scaling, unlike the raw singular values', () => {
    const Rs = Float64Array.from(R);
    for (let i = 0; i < 3; i++) Rs[6 + i] *= 1e8;
    const a = scaledSpectrum(R, 3, 3).singularValues;
    const b = scaledSpectrum(Rs, 3, 3).singularValues;
    for (let c = 0; c < 3; c++) expect(b[c]).toBeCloseTo(a[c], 12);
    expect(rawSingularValues(Rs, 3)[0] / rawSingularValues(R, 3)[0]).toBeGreaterThan(1e7);
  });
  it('a rank-one R has rank 1', () => {
    const R1 = new Float64Array([1, 0, 0, 2, 0, 0, 3, 0, 0]);
    expect(scaledSpectrum(R1, 3, 5).rank).toBe(1);
  });
});

describe('FactorSolver', () => {
  it('solve, whiten and solveNormal agree with hand-computed triangular solves', () => {
    const solver = new FactorSolver(R, 3, 3);
    // R w = [3, 4, 4] -> w = [1, 1, 1].
    expect(Array.from(solver.solve([3, 4, 4]))).toEqual([1, 1, 1]);
    // R^T z = [2, 4, 5] -> z = [1, 1, 1].
    expect(Array.from(solver.whiten([2, 4, 5], new Float64Array(3)))).toEqual([1, 1, 1]);
    // (R^T R)^-1 (R^T R [1, 1, 1]) = [1, 1, 1]; R^T R [1,1,1] = R^T [3, 4, 4] = [6, 15, 20].
    const back = solver.solveNormal([6, 15, 20]);
    for (const v of back) expect(v).toBeCloseTo(1, 13);
  });
  it('rank 0 gives zeros (minimum-norm solution of a zero factor)', () => {
    const solver = new FactorSolver(new Float64Array(4), 2, 0);
    expect(Array.from(solver.solve([1, 2]))).toEqual([0, 0]);
    expect(Array.from(solver.whiten([1, 2], new Float64Array(2)))).toEqual([0, 0]);
  });
  it('truncated: a rank-one factor gives the pseudo-inverse solution', () => {
    // R = [[1, 1], [0, 0]]: R^+ [2, 0] = [1, 1].
    const solver = new FactorSolver(new Float64Array([1, 0, 1, 0]), 2, 1);
    const w = solver.solve([2, 0]);
    expect(w[0]).toBeCloseTo(1, 14);
    expect(w[1]).toBeCloseTo(1, 14);
  });
});
