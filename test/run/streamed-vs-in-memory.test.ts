// The streamed pipeline (design blocks folded into per-fold QR factors, the full factor merged
// from them, one scoring pass for predictions, out-of-fold errors and leverages) against the
// same model solved in memory: the whole design matrix built at once and solved by fitDesign
// (with refinement), every fold refitted from scratch, leverages from one call on the whole
// matrix. Both are exact least-squares / ridge solutions of the same data, so they must agree
// to rounding: 1e-12 relative (coefficients norm-wise).
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { assignFolds } from '../../src/diagnostics/folds.js';
import { fitDesign, leverages, predict } from '../../src/fit/index.js';
import { fitModel } from '../../src/run/fit-model.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';

const TOLERANCE = 1e-12;

/** Deterministic rows x1, x2, y with y a smooth function plus a fixed pseudo-random wobble. */
function csv(n: number, seed: number): string {
  let s = seed >>> 0;
  const rand = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
  const lines = ['x1,x2,y'];
  for (let i = 0; i < n; i++) {
    const x1 = rand() * 4 - 2;
    const x2 = rand() * 10;
    const y = Math.sin(x1) + 0.3 * x2 - 0.02 * x2 * x2 + (rand() - 0.5) * 0.4;
    lines.push(`${x1.toPrecision(10)},${x2.toPrecision(10)},${y.toPrecision(10)}`);
  }
  return `${lines.join('\n')}\n`;
}

function rel(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), Number.MIN_VALUE);
}

async function model(foldOrder: 'blocks' | 'shuffled', ridge: number) {
  const repo = createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - polynomial: { of: x1, degree: 5 }\n  - polynomial: { of: x2, degree: 3 }\nfit:\n  ridge: ${ridge}\n  folds: 5\n  fold_order: ${foldOrder}\n`,
    'data/train.csv': csv(3000, 11),
    'data/holdout.csv': csv(700, 12),
  });
  const settings = defaultSettings();
  const descriptor = await loadDescriptor(repo, 'models/m.model.yml', settings);
  return fitModel(repo, descriptor, settings);
}

describe('streamed pipeline versus the whole design in memory (3000 rows, p = 9)', () => {
  for (const [order, ridge] of [
    ['blocks', 0],
    ['shuffled', 0.5],
  ] as const) {
    it(`agree to ${TOLERANCE} relative: coefficients, RMSEs, k-fold, leave-one-out (folds ${order}, ridge ${ridge})`, async () => {
      const m = await model(order, ridge);
      const { design, tables, fit } = m;
      const { train, holdout } = tables;
      const n = train.rows;
      const p = design.p;
      const options = { ridge, penalised: design.penalised, refine: true };
      const X = design.fill(train.inputs, 0, n);
      const whole = fitDesign(X, train.y, n, p, options);

      let maxW = 0;
      let maxDiff = 0;
      for (let j = 0; j < p; j++) {
        maxW = Math.max(maxW, Math.abs(whole.coefficients[j]));
        maxDiff = Math.max(maxDiff, Math.abs(whole.coefficients[j] - fit.coefficients[j]));
      }
      expect(
        maxDiff / maxW,
        `coefficients: streamed ${Array.from(fit.coefficients)}, in memory ${Array.from(whole.coefficients)}`,
      ).toBeLessThan(TOLERANCE);

      const rmse = (Xm: Float64Array, y: Float64Array, rows: number, w: Float64Array): number => {
        const pred = predict(Xm, rows, w);
        let ss = 0;
        for (let i = 0; i < rows; i++) ss += (y[i] - pred[i]) ** 2;
        return Math.sqrt(ss / rows);
      };
      const Xh = design.fill(holdout.inputs, 0, holdout.rows);
      const trainRmse = rmse(X, train.y, n, whole.coefficients);
      const holdoutRmse = rmse(Xh, holdout.y, holdout.rows, whole.coefficients);
      expect(rel(m.metrics.trainRmse, trainRmse), `training RMSE ${m.metrics.trainRmse} vs ${trainRmse}`).toBeLessThan(TOLERANCE);
      expect(rel(m.metrics.holdoutRmse, holdoutRmse), `hold-out RMSE ${m.metrics.holdoutRmse} vs ${holdoutRmse}`).toBeLessThan(TOLERANCE);

      // k-fold: refit without each fold from the rows themselves.
      const folds = assignFolds(n, 5, order, 1);
      let sse = 0;
      for (let f = 0; f < folds.k; f++) {
        const keep: number[] = [];
        const out: number[] = [];
        for (let i = 0; i < n; i++) (folds.foldOf[i] === f ? out : keep).push(i);
        const pick = (rows: number[]): Float64Array => {
          const M = new Float64Array(rows.length * p);
          for (let j = 0; j < p; j++) rows.forEach((i, r) => (M[j * rows.length + r] = X[j * n + i]));
          return M;
        };
        const w = fitDesign(
          pick(keep),
          Float64Array.from(keep, (i) => train.y[i]),
          keep.length,
          p,
          options,
        ).coefficients;
        const pred = predict(pick(out), out.length, w);
        out.forEach((i, r) => (sse += (train.y[i] - pred[r]) ** 2));
      }
      const cvRmse = Math.sqrt(sse / n);
      const cv = m.crossValidation;
      expect(cv, 'the pipeline computed the cross-validation').not.toBeNull();
      expect(rel(cv?.cvRmse ?? NaN, cvRmse), `k-fold RMSE ${cv?.cvRmse} vs ${cvRmse}`).toBeLessThan(TOLERANCE);

      // Leave-one-out (PRESS) from the whole matrix's leverages.
      const h = leverages(whole, X, n);
      const pred = predict(X, n, whole.coefficients);
      let press = 0;
      for (let i = 0; i < n; i++) press += ((train.y[i] - pred[i]) / (1 - h[i])) ** 2;
      const loocv = Math.sqrt(press / n);
      expect(rel(cv?.loocvRmse ?? NaN, loocv), `leave-one-out RMSE ${cv?.loocvRmse} vs ${loocv}`).toBeLessThan(TOLERANCE);
    });
  }
});
