/**
 * Error figures of a model fitted on a transformed target (`data.target_transform`) on both scales:
 * the transformed one (the fit's own residuals t - t_hat) and the original one (y against the
 * back-transformed predictions g^-1(t_hat), a median of y: see data/target-transform.ts).
 *
 * Each scale uses its own row weights: with `data.weight` the weights as written on both; with
 * `data.sigma` 1 / sigma_t^2 on the transformed scale and 1 / sigma^2 on the original one. The
 * formulas are those of regression-metrics.ts and weighted-metrics.ts; the k-fold figure on the
 * original scale back-transforms each row's out-of-fold prediction (the fit without its fold,
 * as cross-validation.ts makes it) and pools sqrt(sum w r^2 / sum w) over the rows.
 */
import type { ModelData } from '../data/model-data.js';
import { inverseTarget, type OriginalTarget, type TargetTransformKind } from '../data/target-transform.js';
import { forEachBlock } from '../design/blocks.js';
import type { Design } from '../design/design-matrix.js';
import type { FitResult } from '../fit/index.js';
import type { QrAccumulator } from '../fit/index.js';
import { checkDeadline } from '../core/deadline.js';
import { complementCoefficients } from './cross-validation.js';
import type { Folds } from './folds.js';
import { addErrors, emptySums, errorMeasures, pairedErrorFigures, type PairedErrorFigures } from './regression-metrics.js';
import { reducedChiSquare, weightedErrorMeasures } from './weighted-metrics.js';

/** The error figures of one scale. NaN where a figure is not defined. */
export interface ScaleFigures extends PairedErrorFigures {
  /** Pooled k-fold RMSE; NaN when there is no cross-validation (fewer than 2 folds, or not computed). */
  cvRmse: number;
  /** Reduced chi-square of the training rows (n - p degrees of freedom) with `data.sigma`; NaN otherwise. */
  trainChiSquare: number;
  /** The same sum over the hold-out rows divided by their count; NaN without `data.sigma`. */
  holdoutChiSquare: number;
}

/** Both scales of a model with a transformed target. */
export interface TargetScale {
  transform: TargetTransformKind;
  /** The scale the error limits apply to. */
  limitsScale: 'original' | 'transformed';
  /** Figures against y with back-transformed predictions. */
  original: ScaleFigures;
  /** Figures of the fit's own scale, t = g(y). */
  transformed: ScaleFigures;
  /** The original-scale rows and the back-transformed predictions (same order as the rows). */
  originalRows: { train: OriginalTarget; holdout: OriginalTarget };
  predictions: { train: Float64Array; holdout: Float64Array };
}

/** g^-1 of every prediction (a new array). */
export function backTransform(kind: TargetTransformKind, t: Float64Array): Float64Array {
  const out = new Float64Array(t.length);
  for (let i = 0; i < t.length; i++) out[i] = inverseTarget(kind, t[i]);
  return out;
}

/** RMSE, MAE and R^2 of predictions against y, weighted when weights are given. */
export function scaleMeasures(
  y: Float64Array,
  predictions: Float64Array,
  n: number,
  weights?: Float64Array,
): { rmse: number; mae: number; r2: number } {
  if (weights !== undefined) return weightedErrorMeasures(y, predictions, weights, n);
  const sums = emptySums();
  addErrors(sums, y, predictions, n);
  return errorMeasures(sums);
}

/** The figures of one scale from its rows and predictions. */
export function scaleFigures(
  train: OriginalTarget,
  holdout: OriginalTarget,
  predictions: { train: Float64Array; holdout: Float64Array },
  rows: { train: number; holdout: number; p: number },
  cvRmse: number,
): ScaleFigures {
  const tr = scaleMeasures(train.y, predictions.train, rows.train, train.weights);
  const ho = scaleMeasures(holdout.y, predictions.holdout, rows.holdout, holdout.weights);
  const chi = (part: OriginalTarget, pred: Float64Array, n: number, dof: number): number =>
    part.sigma === undefined ? Number.NaN : reducedChiSquare(part.y, pred, part.sigma, n, dof);
  return {
    ...pairedErrorFigures(tr, ho),
    cvRmse,
    trainChiSquare: chi(train, predictions.train, rows.train, rows.train - rows.p),
    holdoutChiSquare: chi(holdout, predictions.holdout, rows.holdout, rows.holdout),
  };
}

/**
 * Pooled k-fold RMSE on the original scale: each training row predicted by the fit without its
 * fold (the complements' solves, with the fit's ridge penalty; weighted fits' complements are
 * factors of the scaled rows, so these are the weighted fits), back-transformed, against y;
 * sqrt(sum w r^2 / sum w) (w = 1 without weights). NaN below 2 folds. One pass over the rows.
 *
 * @param design the model's design
 * @param train the transformed training rows (inputs are read)
 * @param folds the folds of the fit
 * @param complements each fold's complement factor (cross-validation.ts)
 * @param fit the full fit (ridge and penalised columns)
 * @param kind the transform
 * @param original the training target as written, with its original-scale weights
 */
export function originalScaleCvRmse(
  design: Design,
  train: Pick<ModelData, 'inputs' | 'rows'>,
  folds: Folds,
  complements: readonly QrAccumulator[],
  fit: FitResult,
  kind: TargetTransformKind,
  original: OriginalTarget,
): number {
  if (folds.k < 2 || complements.length !== folds.k) return Number.NaN;
  const coefficients = complementCoefficients(complements, [fit.ridge], fit.penalised)[0];
  const p = design.p;
  const foldOf = folds.foldOf;
  const y = original.y;
  const w = original.weights;
  let sse = 0;
  let total = 0;
  forEachBlock(design, train, (X, start, m) => {
    checkDeadline('original-scale cross-validation');
    for (let i = 0; i < m; i++) {
      const b = coefficients[foldOf[start + i]];
      let t = 0;
      for (let j = 0; j < p; j++) t += X[j * m + i] * b[j];
      const r = y[start + i] - inverseTarget(kind, t);
      const wi = w === undefined ? 1 : w[start + i];
      sse += wi * r * r;
      total += wi;
    }
  });
  return total > 0 ? Math.sqrt(sse / total) : Number.NaN;
}
