import { Matrix, SingularValueDecomposition, inverse, pseudoInverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { QrAccumulator, RefinementPass, fitDesign, fitFactor, leverages, predict } from '../../src/fit/index.js';
import { maxRelDiff, randomProblem, show, sliceRows, stackRows, toMatrix } from './helpers.js';

const EPS = Number.EPSILON;

function sum(a: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i];
  return s;
}

describe('fitFactor / fitDesign: contract', () => {
  it('0 rows: rank 0, zero coefficients, singular, rss 0', () => {
    const fit = fitFactor(new QrAccumulator(3));
    expect(Array.from(fit.coefficients)).toEqual([0, 0, 0]);
    expect(fit.rank).toBe(0);
    expect(fit.rankDeficient).toBe(true);
    expect(fit.conditionNumber).toBe(Infinity);
    expect(fit.conditionNumberScaled).toBe(Infinity);
    expect(fit.rss).toBe(0);
    expect(fit.collinearColumns).toEqual([0, 1, 2]);
  });

  it('p = 0: empty coefficients, rss = sum of y^2', () => {
    const fit = fitDesign(new Float64Array(0), new Float64Array([1, 2]), 2, 0);
    expect(fit.coefficients.length).toBe(0);
    expect(fit.rank).toBe(0);
    expect(fit.rankDeficient).toBe(false);
    expect(fit.rss).toBe(5);
  });

  it('NaN in X or y throws RangeError', () => {
    expect(() => fitDesign(new Float64Array([1, NaN]), new Float64Array([1, 2]), 2, 1)).toThrow(RangeError);
    expect(() => fitDesign(new Float64Array([1, 2]), new Float64Array([1, NaN]), 2, 1)).toThrow(RangeError);
  });

  it('rejects a negative or non-finite ridge and a mask of the wrong length', () => {
    const acc = new QrAccumulator(2);
    expect(() => fitFactor(acc, { ridge: -1 })).toThrow(RangeError);
    expect(() => fitFactor(acc, { ridge: NaN })).toThrow(RangeError);
    expect(() => fitFactor(acc, { ridge: 1, penalised: [true] })).toThrow(RangeError);
  });

  it('never mutates the data factor', () => {
    const { X, y } = randomProblem(20, 3, 3);
    const acc = new QrAccumulator(3);
    acc.addRows(X, y, 20);
    const R0 = Float64Array.from(acc.R);
    const fit = fitFactor(acc, { ridge: 2 });
    expect(Array.from(acc.R)).toEqual(Array.from(R0));
    expect(acc.rows).toBe(20);
    expect(fit.factor.rows).toBe(23);
  });

  it('a constant column alone fits the mean', () => {
    const y = new Float64Array([1, 2, 3, 6]);
    const fit = fitDesign(new Float64Array(4).fill(1), y, 4, 1);
    expect(fit.coefficients[0]).toBeCloseTo(3, 14);
    expect(fit.rss).toBeCloseTo(14, 12);
    expect(fit.rank).toBe(1);
  });

  it('an all-zero column: rank p-1, its coefficient 0, named as collinear', () => {
    const n = 12;
    const { X, y } = randomProblem(n, 3, 5);
    X.fill(0, 2 * n, 3 * n);
    const fit = fitDesign(X, y, n, 3);
    expect(fit.rank).toBe(2);
    expect(fit.rankDeficient).toBe(true);
    expect(fit.coefficients[2]).toBe(0);
    expect(fit.collinearColumns).toContain(2);
    const ref = fitDesign(X.subarray(0, 2 * n), y, n, 2);
    expect(maxRelDiff(fit.coefficients.subarray(0, 2), ref.coefficients)).toBeLessThan(1e-12);
  });
});

describe('least squares: invariants', () => {
  const n = 60;
  const p = 6;
  const { X, y } = randomProblem(n, p, 21);

  it('residuals are orthogonal to every column of X', () => {
    const fit = fitDesign(X, y, n, p);
    const yhat = predict(X, n, fit.coefficients);
    for (let j = 0; j < p; j++) {
      let dot = 0;
      let scale = 0;
      for (let i = 0; i < n; i++) {
        const r = y[i] - yhat[i];
        dot += X[j * n + i] * r;
        scale += Math.abs(X[j * n + i] * r);
      }
      expect(Math.abs(dot), `column ${j}: x_j . r = ${dot}, tolerance ${10 * n * EPS * scale}`).toBeLessThan(10 * n * EPS * scale);
    }
    let rss = 0;
    for (let i = 0; i < n; i++) rss += (y[i] - yhat[i]) ** 2;
    expect(Math.abs(fit.rss - rss) / rss, `rss ${fit.rss} vs recomputed ${rss}`).toBeLessThan(1e-10);
  });

  it('folding in blocks of 1, 7 and all rows gives the same coefficients to 1e-12 relative', () => {
    const ref = fitDesign(X, y, n, p).coefficients;
    for (const block of [1, 7]) {
      const acc = new QrAccumulator(p);
      for (let from = 0; from < n; from += block) {
        const to = Math.min(n, from + block);
        acc.addRows(sliceRows(X, n, p, from, to), y.subarray(from, to), to - from);
      }
      const w = fitFactor(acc).coefficients;
      expect(maxRelDiff(w, ref), `block ${block}: ${show(w, ref, 1e-12)}`).toBeLessThan(1e-12);
    }
  });

  it('merge of two halves gives the coefficients of all rows (k-fold use)', () => {
    const ref = fitDesign(X, y, n, p).coefficients;
    const a = new QrAccumulator(p);
    a.addRows(sliceRows(X, n, p, 0, 30), y.subarray(0, 30), 30);
    const b = new QrAccumulator(p);
    b.addRows(sliceRows(X, n, p, 30, n), y.subarray(30), n - 30);
    a.merge(b);
    const w = fitFactor(a).coefficients;
    expect(maxRelDiff(w, ref), show(w, ref, 1e-12)).toBeLessThan(1e-12);
  });

  it('agrees with the pseudo-inverse solution of ml-matrix', () => {
    const w = fitDesign(X, y, n, p).coefficients;
    const ref = pseudoInverse(toMatrix(X, n, p))
      .mmul(Matrix.columnVector(Array.from(y)))
      .getColumn(0);
    expect(maxRelDiff(w, ref), show(w, ref, 1e-10)).toBeLessThan(1e-10);
  });

  it('full rank: rank p, finite condition numbers, scaled <= raw within rounding for unequal column norms', () => {
    const Xs = Float64Array.from(X);
    for (let i = 0; i < n; i++) Xs[3 * n + i] *= 1e6;
    const fit = fitDesign(Xs, y, n, p);
    expect(fit.rank).toBe(p);
    expect(fit.rankDeficient).toBe(false);
    expect(fit.conditionNumber).toBeGreaterThan(1e5);
    expect(fit.conditionNumberScaled).toBeLessThan(10);
    expect(fit.singularValuesScaled.length).toBe(p);
    for (let k = 1; k < p; k++) expect(fit.singularValuesScaled[k]).toBeLessThanOrEqual(fit.singularValuesScaled[k - 1]);
    // The same data without the scaling give the same predictions.
    const ref = fitDesign(X, y, n, p);
    expect(fit.coefficients[3] * 1e6).toBeCloseTo(ref.coefficients[3], 10);
  });

  it('n linearly independent basis functions through n samples interpolate exactly (common practice)', () => {
    const m = 9;
    const xs = Array.from({ length: m }, (_, i) => Math.cos(((2 * i + 1) * Math.PI) / (2 * m))); // Chebyshev points
    const ys = Float64Array.from(xs, (x) => Math.sin(3 * x) + x * x);
    // Polynomial basis 1, x, ..., x^8 and a Gaussian RBF basis centred at the samples (width 0.5).
    const poly = new Float64Array(m * m);
    const rbf = new Float64Array(m * m);
    for (let j = 0; j < m; j++) {
      for (let i = 0; i < m; i++) {
        poly[j * m + i] = xs[i] ** j;
        rbf[j * m + i] = Math.exp(-((xs[i] - xs[j]) ** 2) / (2 * 0.5 ** 2));
      }
    }
    for (const [name, B] of [
      ['polynomial', poly],
      ['rbf', rbf],
    ] as const) {
      const fit = fitDesign(B, ys, m, m);
      const yhat = predict(B, m, fit.coefficients);
      let ss = 0;
      for (let i = 0; i < m; i++) ss += (ys[i] - yhat[i]) ** 2;
      const rmse = Math.sqrt(ss / m);
      expect(fit.rank, name).toBe(m);
      expect(rmse, `${name}: training RMSE ${rmse}`).toBeLessThan(1e-10);
    }
  });
});

describe('rank deficiency', () => {
  it('more parameters than rows: minimum-norm solution equal to pinv(X) y (ml-matrix pseudoInverse)', () => {
    const n = 3;
    const p = 5;
    const { X, y } = randomProblem(n, p, 9);
    const fit = fitDesign(X, y, n, p);
    const ref = pseudoInverse(toMatrix(X, n, p))
      .mmul(Matrix.columnVector(Array.from(y)))
      .getColumn(0);
    expect(fit.rank).toBe(3);
    expect(fit.rankDeficient).toBe(true);
    expect(fit.conditionNumber).toBe(Infinity);
    expect(maxRelDiff(fit.coefficients, ref), show(fit.coefficients, ref, 1e-10)).toBeLessThan(1e-10);
    expect(fit.rss).toBeLessThan(1e-20);
  });

  it('duplicate column: rank p-1, the coefficient split evenly, both columns named', () => {
    const n = 30;
    const base = randomProblem(n, 3, 13);
    const X = new Float64Array(n * 4);
    X.set(base.X);
    X.set(base.X.subarray(2 * n, 3 * n), 3 * n);
    const fit = fitDesign(X, base.y, n, 4);
    const ref = fitDesign(base.X, base.y, n, 3).coefficients;
    expect(fit.rank).toBe(3);
    expect(fit.rankDeficient).toBe(true);
    expect(fit.collinearColumns).toEqual([2, 3]);
    const expected = [ref[0], ref[1], ref[2] / 2, ref[2] / 2];
    expect(maxRelDiff(fit.coefficients, expected), show(fit.coefficients, expected, 1e-10)).toBeLessThan(1e-10);
    const rssRef = fitDesign(base.X, base.y, n, 3).rss;
    expect(Math.abs(fit.rss - rssRef) / rssRef).toBeLessThan(1e-10);
  });
});

describe('ridge', () => {
  const n = 50;
  const p = 5;
  const { X, y } = randomProblem(n, p, 31, 0.5);
  const penalised = [false, true, true, true, true];

  it('equals the normal-equation formula (X^T X + lambda E)^-1 X^T y on a well-conditioned case', () => {
    const lambda = 3;
    const fit = fitDesign(X, y, n, p, { ridge: lambda, penalised });
    const M = toMatrix(X, n, p);
    const A = M.transpose().mmul(M);
    for (let j = 1; j < p; j++) A.set(j, j, A.get(j, j) + lambda);
    const ref = inverse(A)
      .mmul(M.transpose().mmul(Matrix.columnVector(Array.from(y))))
      .getColumn(0);
    expect(maxRelDiff(fit.coefficients, ref), show(fit.coefficients, ref, 1e-11)).toBeLessThan(1e-11);
    expect(fit.ridge).toBe(lambda);
  });

  it('equals least squares on the explicitly augmented system [X; sqrt(lambda) E]', () => {
    const lambda = 0.7;
    const E = new Float64Array(4 * p);
    for (let r = 0; r < 4; r++) E[(r + 1) * 4 + r] = Math.sqrt(lambda);
    const Xa = stackRows(X, n, E, 4, p);
    const ya = new Float64Array(n + 4);
    ya.set(y);
    const ls = fitDesign(Xa, ya, n + 4, p);
    const fit = fitDesign(X, y, n, p, { ridge: lambda, penalised });
    expect(maxRelDiff(fit.coefficients, ls.coefficients), show(fit.coefficients, ls.coefficients, 1e-12)).toBeLessThan(1e-12);
    // rss of the data rows only: the augmented fit's rss minus the penalty rows' residuals.
    let pen = 0;
    for (let j = 1; j < p; j++) pen += lambda * fit.coefficients[j] ** 2;
    expect(Math.abs(fit.rss + pen - ls.rss) / ls.rss, `rss ${fit.rss} + penalty ${pen} vs ${ls.rss}`).toBeLessThan(1e-10);
  });

  it('tends to least squares as lambda -> 0', () => {
    const ls = fitDesign(X, y, n, p).coefficients;
    let previous = Infinity;
    for (const lambda of [1, 1e-2, 1e-4, 1e-6, 1e-8]) {
      const d = maxRelDiff(fitDesign(X, y, n, p, { ridge: lambda }).coefficients, ls);
      expect(d, `lambda ${lambda}: distance ${d} should shrink from ${previous}`).toBeLessThan(previous);
      previous = d;
    }
    expect(previous).toBeLessThan(1e-8);
    expect(maxRelDiff(fitDesign(X, y, n, p, { ridge: 0 }).coefficients, ls)).toBe(0);
  });

  it('makes a rank-deficient design solvable in the penalised columns', () => {
    const X2 = new Float64Array(n * 3);
    X2.set(X.subarray(0, 2 * n));
    X2.set(X.subarray(n, 2 * n), 2 * n); // column 2 duplicates column 1
    const fit = fitDesign(X2, y, n, 3, { ridge: 1, penalised: [false, true, true] });
    expect(fit.rank).toBe(2);
    expect(fit.rankDeficient).toBe(true);
    expect(fit.factorRank).toBe(3);
    expect(fit.coefficients[1]).toBeCloseTo(fit.coefficients[2], 12);
  });
});

describe('leverages', () => {
  const n = 40;
  const p = 4;
  const { X, y } = randomProblem(n, p, 41);

  it('sum to the rank for least squares (trace of the hat matrix), full rank and rank deficient', () => {
    const fit = fitDesign(X, y, n, p);
    const h = leverages(fit, X, n);
    expect(Math.abs(sum(h) - p), `sum ${sum(h)} vs ${p}`).toBeLessThan(1e-12);
    expect(Math.abs(fit.degreesOfFreedom - p)).toBeLessThan(1e-12);
    for (const v of h) expect(v).toBeLessThanOrEqual(1 + 1e-12);
    // Duplicate the last column: rank stays p.
    const Xd = new Float64Array(n * (p + 1));
    Xd.set(X);
    Xd.set(X.subarray((p - 1) * n, p * n), p * n);
    const fd = fitDesign(Xd, y, n, p + 1);
    const hd = leverages(fd, Xd, n);
    expect(Math.abs(sum(hd) - p), `deficient: sum ${sum(hd)} vs rank ${p}`).toBeLessThan(1e-10);
    expect(maxRelDiff(hd, h)).toBeLessThan(1e-10);
  });

  it('sum to the effective degrees of freedom sum d_j^2 / (d_j^2 + lambda) for ridge without intercept (ESL eq. 3.50)', () => {
    // Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., eq. 3.50;
    // d_j from ml-matrix's SVD of X, independent of the QR route.
    const lambda = 5;
    const fit = fitDesign(X, y, n, p, { ridge: lambda });
    const d = new SingularValueDecomposition(toMatrix(X, n, p), { autoTranspose: true }).diagonal;
    const df = d.reduce((s, dj) => s + (dj * dj) / (dj * dj + lambda), 0);
    const h = leverages(fit, X, n);
    expect(Math.abs(sum(h) - df), `sum of leverages ${sum(h)}, df ${df}`).toBeLessThan(1e-12);
    expect(Math.abs(fit.degreesOfFreedom - df)).toBeLessThan(1e-12);
  });

  it('match the diagonal of X (X^T X)^-1 X^T computed with ml-matrix', () => {
    const fit = fitDesign(X, y, n, p);
    const M = toMatrix(X, n, p);
    const H = M.mmul(inverse(M.transpose().mmul(M))).mmul(M.transpose());
    const h = leverages(fit, X, n);
    const ref = Array.from({ length: n }, (_, i) => H.get(i, i));
    expect(maxRelDiff(h, ref), show(h.subarray(0, 4), ref.slice(0, 4), 1e-11)).toBeLessThan(1e-11);
  });
});

describe('predict', () => {
  it('computes X w', () => {
    const X = new Float64Array([1, 1, 1, 0, 1, 2]);
    expect(Array.from(predict(X, 3, new Float64Array([1, 2])))).toEqual([1, 3, 5]);
    expect(() => predict(new Float64Array(5), 3, new Float64Array([1, 2]))).toThrow(RangeError);
  });
});

describe('refinement', () => {
  it('a streaming RefinementPass in blocks equals fitDesign with refine', () => {
    const n = 300;
    const p = 6;
    const x = Array.from({ length: n }, (_, i) => i / 10);
    const X = new Float64Array(n * p);
    for (let j = 0; j < p; j++) for (let i = 0; i < n; i++) X[j * n + i] = x[i] ** j;
    const { y } = randomProblem(n, 1, 5, 1);
    for (let i = 0; i < n; i++) y[i] += 1 + x[i] ** 3;
    const whole = fitDesign(X, y, n, p, { refine: true, ridge: 0.1, penalised: [false, true, true, true, true, true] });
    expect(whole.refined).toBe(true);
    const acc = new QrAccumulator(p);
    acc.addRows(X, y, n);
    const pass = new RefinementPass(fitFactor(acc, { ridge: 0.1, penalised: [false, true, true, true, true, true] }));
    for (let from = 0; from < n; from += 64) {
      const to = Math.min(n, from + 64);
      pass.addRows(sliceRows(X, n, p, from, to), y.subarray(from, to), to - from);
    }
    const streamed = pass.finish();
    expect(maxRelDiff(streamed.coefficients, whole.coefficients), show(streamed.coefficients, whole.coefficients, 1e-13)).toBeLessThan(
      1e-13,
    );
    expect(Math.abs(streamed.rss - whole.rss) / whole.rss).toBeLessThan(1e-10);
  });

  it('is not applied to rank-deficient designs', () => {
    const { X, y } = randomProblem(3, 5, 9);
    const fit = fitDesign(X, y, 3, 5, { refine: true });
    expect(fit.refined).toBe(false);
  });
});
