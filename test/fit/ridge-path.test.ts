import { describe, expect, it } from 'vitest';
import { QrAccumulator, solveCoefficients } from '../../src/fit/index.js';
import { ridgePath } from '../../src/fit/ridge-path.js';
import { seededRandom } from '../../src/diagnostics/random.js';

/** A factor of n random rows of p columns (column 0 all ones when `intercept`), optionally with a duplicated column. */
function factor(n: number, p: number, seed: number, intercept: boolean, duplicate = false): QrAccumulator {
  const u = seededRandom(seed);
  const X = new Float64Array(n * p);
  for (let j = 0; j < p; j++)
    for (let i = 0; i < n; i++) X[j * n + i] = intercept && j === 0 ? 1 : duplicate && j === p - 1 ? X[(j - 1) * n + i] : 4 * u() - 2;
  const y = Float64Array.from({ length: n }, () => 3 * u() - 1);
  const acc = new QrAccumulator(p);
  acc.addRows(X, y, n);
  return acc;
}

const relative = (a: Float64Array, b: Float64Array): number => {
  let num = 0;
  let den = 0;
  for (let j = 0; j < a.length; j++) {
    num = Math.max(num, Math.abs(a[j] - b[j]));
    den = Math.max(den, Math.abs(b[j]));
  }
  return num / den;
};

describe('ridge path from one SVD (ESL 2nd ed. eq. 3.47; intercept eliminated from the first row)', () => {
  const lambdas = [1e4, 30, 1, 0.02, 1e-6];
  for (const [label, intercept, duplicate, n] of [
    ['unpenalised intercept', true, false, 60],
    ['every column penalised', false, false, 60],
    ['a duplicated column (rank-deficient data)', true, true, 60],
    ['fewer rows than columns', true, false, 5],
  ] as const) {
    it(`equals one augmented QR solve per penalty to 1e-10 (${label})`, () => {
      const p = 8;
      const acc = factor(n, p, 17, intercept, duplicate);
      const penalised = Array.from({ length: p }, (_, j) => !(intercept && j === 0));
      const path = ridgePath(acc, lambdas, penalised);
      expect(path).not.toBeNull();
      lambdas.forEach((lambda, s) => {
        const direct = solveCoefficients(acc, { ridge: lambda, penalised });
        expect(relative(path![s], direct), `lambda ${lambda}`).toBeLessThan(1e-10);
      });
    });
  }

  it('declines what it does not cover: a zero penalty, an unpenalised column after a penalised one', () => {
    const acc = factor(30, 4, 3, true);
    expect(ridgePath(acc, [1, 0], [false, true, true, true])).toBeNull();
    expect(ridgePath(acc, [1], [true, false, true, true])).toBeNull();
    expect(ridgePath(acc, [1], [false, false, true, true])).toBeNull();
  });
});
