/**
 * Error measures of predictions against observed targets, over Float64Arrays.
 * Formulas: RMSE = sqrt(mean((y - yhat)^2)), MAE = mean(|y - yhat|),
 * R^2 = 1 - SSE / sum((y - mean(y))^2) (coefficient of determination; Draper & Smith,
 * Applied Regression Analysis, 3rd ed., 1998, section 1.6). R^2 of hold-out rows uses the
 * hold-out mean. All are NaN for zero rows; R^2 is NaN when the target is constant.
 */
import { sumOfDeviations, sumOfSquaredDeviations } from '../design/stats.js';

/** Sums needed for RMSE, MAE and R^2, gathered in one pass. */
export interface ErrorSums {
  n: number;
  sse: number;
  sae: number;
  /** Sum of y and of y^2 about a shift (the first y), for the total sum of squares. */
  shift: number;
  sy: number;
  syy: number;
}

/** Empty sums. */
export function emptySums(): ErrorSums {
  return { n: 0, sse: 0, sae: 0, shift: Number.NaN, sy: 0, syy: 0 };
}

/**
 * Adds `m` observations (targets `y`, predictions `yhat`) to `sums`. Each sum is its own pass
 * (one loop per function; see DEVELOPERS.md, "Writing hot loops"), added in row order.
 */
export function addErrors(sums: ErrorSums, y: Float64Array, yhat: Float64Array, m: number): void {
  if (m > 0 && Number.isNaN(sums.shift)) sums.shift = y[0];
  sums.n += m;
  sums.sse += squaredErrorSum(y, yhat, m);
  sums.sae += absoluteErrorSum(y, yhat, m);
  sums.sy += sumOfDeviations(y, m, sums.shift);
  sums.syy += sumOfSquaredDeviations(y, m, sums.shift);
}

/** Sum of (y - yhat)^2 over the first m rows. */
function squaredErrorSum(y: Float64Array, yhat: Float64Array, m: number): number {
  let sse = 0;
  for (let i = 0; i < m; i++) {
    const r = y[i] - yhat[i];
    sse += r * r;
  }
  return sse;
}

/** Sum of |y - yhat| over the first m rows. */
function absoluteErrorSum(y: Float64Array, yhat: Float64Array, m: number): number {
  let sae = 0;
  for (let i = 0; i < m; i++) sae += Math.abs(y[i] - yhat[i]);
  return sae;
}

/** RMSE, MAE and R^2 from gathered sums. */
export function errorMeasures(sums: ErrorSums): { rmse: number; mae: number; r2: number; sse: number } {
  const { n, sse, sae, sy, syy } = sums;
  if (n === 0) return { rmse: Number.NaN, mae: Number.NaN, r2: Number.NaN, sse: 0 };
  const sst = Math.max(0, syy - (sy * sy) / n);
  return {
    rmse: Math.sqrt(sse / n),
    mae: sae / n,
    r2: sst > 0 ? 1 - sse / sst : Number.NaN,
    sse,
  };
}

/**
 * Generalisation-gap ratio: hold-out RMSE / training RMSE. Infinity when the training RMSE is 0
 * and the hold-out RMSE is not; 1 when both are 0 (no gap).
 */
export function gapRatio(trainRmse: number, holdoutRmse: number): number {
  if (trainRmse === 0) return holdoutRmse === 0 ? 1 : Infinity;
  return holdoutRmse / trainRmse;
}

/** The error figures of both files side by side, with their {@link gapRatio}. */
export interface PairedErrorFigures {
  trainRmse: number;
  holdoutRmse: number;
  trainMae: number;
  holdoutMae: number;
  trainR2: number;
  holdoutR2: number;
  gapRatio: number;
}

/**
 * The training and hold-out figures of one scale from each file's {@link errorMeasures}.
 * @param train the training rows' RMSE, MAE and R^2
 * @param holdout the hold-out rows' RMSE, MAE and R^2
 */
export function pairedErrorFigures(
  train: { rmse: number; mae: number; r2: number },
  holdout: { rmse: number; mae: number; r2: number },
): PairedErrorFigures {
  return {
    trainRmse: train.rmse,
    holdoutRmse: holdout.rmse,
    trainMae: train.mae,
    holdoutMae: holdout.mae,
    trainR2: train.r2,
    holdoutR2: holdout.r2,
    gapRatio: gapRatio(train.rmse, holdout.rmse),
  };
}
