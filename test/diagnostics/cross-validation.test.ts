import { describe, expect, it } from 'vitest';
import { Matrix, inverse, SingularValueDecomposition } from 'ml-matrix';
import {
  complementCoefficients,
  complementFactors,
  crossValidate,
  FoldFactorBuilder,
  foldFactors,
  outOfFoldErrors,
  outOfFoldErrorsFromFactors,
  summariseFolds,
} from '../../src/diagnostics/cross-validation.js';
import { assignFolds } from '../../src/diagnostics/folds.js';
import { fitDesign, QrAccumulator } from '../../src/fit/index.js';
import { fitRows, linearDesign, predictRow, randomRows, relDiff, selectRows } from './helpers.js';

/** Explicit design matrix (row-major number[][]) of rows. */
function explicit(_q: number, rows: ReturnType<typeof randomRows>, intercept = true): number[][] {
  return Array.from({ length: rows.rows }, (_, i) => [...(intercept ? [1] : []), ...rows.inputs.map((c) => c[i])]);
}

describe('leave-one-out by the PRESS shortcut (Allen 1974)', () => {
  for (const ridge of [0, 0.7]) {
    it(`equals brute-force refits without each row (ridge ${ridge}, intercept) to 1e-9 relative`, () => {
      const design = linearDesign(3);
      const rows = randomRows(25, 3, 7);
      const fit = fitRows(design, rows, ridge);
      const cv = crossValidate(design, rows, fit, assignFolds(rows.rows, 5, 'blocks', 1));
      let press = 0;
      for (let i = 0; i < rows.rows; i++) {
        const rest = selectRows(rows, (r) => r !== i);
        const X = design.fill(rest.inputs, 0, rest.rows);
        const w = fitDesign(X, rest.y, rest.rows, design.p, { ridge, penalised: design.penalised }).coefficients;
        press += (rows.y[i] - predictRow(design, rows, i, w)) ** 2;
      }
      const expected = Math.sqrt(press / rows.rows);
      const d = relDiff(cv.loocvRmse, expected);
      expect(d, `ridge ${ridge}: shortcut ${cv.loocvRmse}, brute force ${expected}, rel diff ${d}, tol 1e-9`).toBeLessThan(1e-9);
      expect(relDiff(cv.press, press), `PRESS ${cv.press} vs ${press}`).toBeLessThan(1e-9);
    });
  }

  it('gives an infinite figure, not a crash, when a row has leverage 1 (p = n interpolation)', () => {
    const design = linearDesign(3);
    const rows = randomRows(4, 3, 3);
    const fit = fitRows(design, rows);
    const cv = crossValidate(design, rows, fit, assignFolds(4, 2, 'blocks', 1));
    expect(cv.loocvRmse).toBe(Infinity);
    expect(cv.rowsWithLeverageOne, `leverages: max ${cv.maxLeverage}`).toBe(4);
    expect(cv.gcv).toBe(Infinity);
  });
});

describe('effective degrees of freedom and GCV against explicit formulas (ml-matrix inverse and SVD)', () => {
  it('ridge with an unpenalised intercept: df = trace(X (X^T X + lambda E)^-1 X^T), GCV = mean(e^2) / (1 - df/n)^2', () => {
    const design = linearDesign(4);
    const rows = randomRows(30, 4, 11);
    const lambda = 2.5;
    const fit = fitRows(design, rows, lambda);
    const cv = crossValidate(design, rows, fit, assignFolds(30, 5, 'shuffled', 3));
    const X = new Matrix(explicit(4, rows));
    const E = Matrix.eye(5, 5).mul(lambda);
    E.set(0, 0, 0);
    const H = X.mmul(inverse(X.transpose().mmul(X).add(E))).mmul(X.transpose());
    let df = 0;
    for (let i = 0; i < 30; i++) df += H.get(i, i);
    const yhat = H.mmul(Matrix.columnVector(Array.from(rows.y)));
    let rss = 0;
    for (let i = 0; i < 30; i++) rss += (rows.y[i] - yhat.get(i, 0)) ** 2;
    const gcv = rss / 30 / (1 - df / 30) ** 2;
    expect(relDiff(cv.effectiveDf, df), `df ${cv.effectiveDf} vs explicit ${df}`).toBeLessThan(1e-10);
    expect(relDiff(cv.leverageSum, df), `sum of leverages ${cv.leverageSum} vs ${df}`).toBeLessThan(1e-10);
    expect(relDiff(cv.gcv, gcv), `GCV ${cv.gcv} vs explicit ${gcv}`).toBeLessThan(1e-10);
    expect(cv.effectiveDf).toBeLessThan(design.p);
  });

  it('ridge on every column: df = sum d_j^2 / (d_j^2 + lambda) (ESL eq. 3.50)', () => {
    const design = linearDesign(5, false);
    const rows = randomRows(40, 5, 5);
    const lambda = 4;
    const acc = fitRows(design, rows, lambda);
    const d = new SingularValueDecomposition(new Matrix(explicit(5, rows, false)), { autoTranspose: true }).diagonal;
    const expected = d.reduce((s, v) => s + (v * v) / (v * v + lambda), 0);
    const cv = crossValidate(design, rows, acc, assignFolds(40, 5, 'blocks', 1));
    expect(relDiff(cv.effectiveDf, expected), `df ${cv.effectiveDf} vs ${expected}`).toBeLessThan(1e-10);
  });

  it('least squares: df equals the number of parameters', () => {
    const design = linearDesign(2);
    const rows = randomRows(20, 2, 2);
    const cv = crossValidate(design, rows, fitRows(design, rows), assignFolds(20, 4, 'blocks', 1));
    expect(Math.abs(cv.effectiveDf - 3)).toBeLessThan(1e-12);
  });
});

describe('k-fold cross-validation from merged fold factors', () => {
  for (const [order, ridge] of [
    ['blocks', 0],
    ['blocks', 1.3],
    ['shuffled', 0.2],
  ] as const) {
    it(`equals brute-force refits per fold to 1e-10 (${order}, ridge ${ridge}, n = 23, k = 5)`, () => {
      const design = linearDesign(3);
      const rows = randomRows(23, 3, 19);
      const folds = assignFolds(23, 5, order, 42);
      const cv = crossValidate(design, rows, fitRows(design, rows, ridge), folds);
      const sse = new Array<number>(5).fill(0);
      for (let f = 0; f < 5; f++) {
        const rest = selectRows(rows, (i) => folds.foldOf[i] !== f);
        const w = fitRows(design, rest, ridge).coefficients;
        for (let i = 0; i < 23; i++) if (folds.foldOf[i] === f) sse[f] += (rows.y[i] - predictRow(design, rows, i, w)) ** 2;
      }
      const expected = summariseFolds(sse, folds.sizes);
      expect(relDiff(cv.cvRmse, expected.cvRmse), `cv ${cv.cvRmse} vs brute force ${expected.cvRmse}`).toBeLessThan(1e-10);
      cv.foldRmse.forEach((r, f) =>
        expect(relDiff(r, Math.sqrt(expected.foldMse[f])), `fold ${f}: ${r} vs ${Math.sqrt(expected.foldMse[f])}`).toBeLessThan(1e-10),
      );
      expect(cv.foldSizes).toEqual([5, 5, 5, 4, 4]);
    });
  }

  it('pools squared errors over rows: cv_rmse^2 = sum fold_rmse^2 * size / n', () => {
    const design = linearDesign(2);
    const rows = randomRows(17, 2, 4);
    const cv = crossValidate(design, rows, fitRows(design, rows), assignFolds(17, 3, 'shuffled', 9));
    const pooled = cv.foldRmse.reduce((s, r, f) => s + r * r * cv.foldSizes[f], 0) / 17;
    expect(relDiff(cv.cvRmse ** 2, pooled)).toBeLessThan(1e-12);
  });

  it('each complement factor holds every row but its fold', () => {
    const design = linearDesign(2);
    const rows = randomRows(13, 2, 8);
    const folds = assignFolds(13, 4, 'blocks', 1);
    const complements = complementFactors(foldFactors(design, rows, folds));
    expect(complements.map((c) => c.rows)).toEqual(folds.sizes.map((s) => 13 - s));
  });

  it('one row: no k-fold figure (NaN), leave-one-out infinite', () => {
    const design = linearDesign(1);
    const rows = randomRows(1, 1, 1);
    const cv = crossValidate(design, rows, fitRows(design, rows), assignFolds(1, 5, 'blocks', 1));
    expect(cv.k).toBe(1);
    expect(cv.cvRmse).toBeNaN();
    expect(cv.loocvRmse).toBe(Infinity);
  });

  // Identity ||y_f - X_f w||^2 = ||qty_f - R_f w||^2 + rss_f (Golub & Van Loan, Matrix Computations, 4th ed., sec. 5.3.3).
  for (const [n, k, q] of [
    [40, 5, 3],
    [9, 4, 3],
  ] as const) {
    it(`squared out-of-fold errors from the fold factors equal a pass over the rows (n = ${n}, k = ${k}, p = ${q + 1}${n / k < q + 1 ? ', folds with fewer rows than columns' : ''})`, () => {
      const design = linearDesign(q);
      const rows = randomRows(n, q, 31);
      const folds = assignFolds(n, k, 'shuffled', 5);
      const perFold = foldFactors(design, rows, folds);
      const coefficients = complementCoefficients(complementFactors(perFold), [0, 0.01, 3, 1e4], design.penalised);
      const fromFactors = outOfFoldErrorsFromFactors(perFold, coefficients).sse;
      const fromRows = outOfFoldErrors(design, rows, folds, coefficients).sse;
      fromRows.forEach((bySet, s) =>
        bySet.forEach((e, f) =>
          expect(relDiff(fromFactors[s][f], e), `setting ${s}, fold ${f}: ${fromFactors[s][f]} vs ${e}`).toBeLessThan(1e-11),
        ),
      );
    });
  }
});

describe('FoldFactorBuilder', () => {
  // Each block's rows of fold f must reach fold f's factor as one piece, in file order (the factor
  // depends on how rows are split into pieces): the same bits as gathering them fold by fold,
  // whether runs are copied whole (blocks folds) or rows scattered one by one (shuffled).
  for (const order of ['blocks', 'shuffled'] as const) {
    for (const blockSize of [7, 40, 1000]) {
      it(`gives each fold the factor of its rows of each block, bit for bit (${order}, blocks of ${blockSize} rows)`, () => {
        const design = linearDesign(3);
        const rows = randomRows(203, 3, 11);
        const folds = assignFolds(rows.rows, 5, order, 3);
        const builder = new FoldFactorBuilder(design.p, folds);
        const reference = Array.from({ length: folds.k }, () => new QrAccumulator(design.p));
        for (let start = 0; start < rows.rows; start += blockSize) {
          const m = Math.min(blockSize, rows.rows - start);
          builder.add(design.fill(rows.inputs, start, m), rows.y, start, m);
          for (let f = 0; f < folds.k; f++) {
            const own = selectRows(rows, (r) => r >= start && r < start + m && folds.foldOf[r] === f);
            if (own.rows > 0) reference[f].addRows(design.fill(own.inputs, 0, own.rows), own.y, own.rows);
          }
        }
        for (let f = 0; f < folds.k; f++) {
          const got = builder.factors[f];
          expect(got.rows).toBe(reference[f].rows);
          expect(Array.from(got.R)).toEqual(Array.from(reference[f].R));
          expect(Array.from(got.qty)).toEqual(Array.from(reference[f].qty));
          expect(got.rss).toBe(reference[f].rss);
        }
      });
    }
  }
});
