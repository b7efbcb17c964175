/**
 * The descriptor's shipped coefficients scored on the same rows as the refit: their predictions,
 * error measures, and how far they are from the refit's coefficients.
 */
import type { ModelData } from '../data/model-data.js';
import { predictRows } from '../design/blocks.js';
import type { Design } from '../design/design-matrix.js';
import { addErrors, emptySums, errorMeasures } from './regression-metrics.js';
import { weightedErrorMeasures } from './weighted-metrics.js';

/** Error measures of one set of rows (see {@link errorMeasures}). */
export type ErrorMeasures = ReturnType<typeof errorMeasures>;

/** The shipped coefficients' figures. */
export interface ShippedScore {
  /** The shipped coefficients (length p, intercept first). */
  coefficients: readonly number[];
  /** Predictions of the shipped coefficients on the hold-out rows (length = hold-out rows). */
  holdoutPredictions: Float64Array;
  train: ErrorMeasures;
  holdout: ErrorMeasures;
  /** max_j |shipped_j - refit_j|. */
  maxCoefficientDifference: number;
}

/** RMSE, MAE and R^2 of the rows; weighted rows get the weighted measures (weighted-metrics.ts), as the refit's. */
function measures(data: ModelData, predictions: Float64Array): ErrorMeasures {
  if (data.weights !== undefined) return weightedErrorMeasures(data.y, predictions, data.weights, data.rows);
  const sums = emptySums();
  addErrors(sums, data.y, predictions, data.rows);
  return errorMeasures(sums);
}

/**
 * Scores shipped coefficients on the training and hold-out rows (one prediction pass each).
 * @param shipped length design.p (the caller checks it)
 * @param refit the refit's coefficients (length design.p)
 */
export function scoreShipped(
  design: Design,
  train: ModelData,
  holdout: ModelData,
  shipped: readonly number[],
  refit: ArrayLike<number>,
): ShippedScore {
  const holdoutPredictions = predictRows(design, holdout, shipped);
  let diff = 0;
  for (let j = 0; j < design.p; j++) diff = Math.max(diff, Math.abs(shipped[j] - refit[j]));
  return {
    coefficients: shipped,
    holdoutPredictions,
    train: measures(train, predictRows(design, train, shipped)),
    holdout: measures(holdout, holdoutPredictions),
    maxCoefficientDifference: diff,
  };
}
