/**
 * "What a refit would give" for a model scored as shipped (`fit.refit: false` with
 * `fit.refit_compare: true`): the figures of the refit from the same rows, reported beside the
 * shipped model's as information (no check judges them).
 */
import type { ModelData } from '../data/model-data.js';
import type { CrossValidation } from './cross-validation.js';
import { addErrors, emptySums, errorMeasures, gapRatio } from './regression-metrics.js';
import { weightedErrorMeasures } from './weighted-metrics.js';

/** The refit's figures. */
export interface RefitFigures {
  /** RMSE of the refit on the training rows (weighted when the rows are). */
  trainRmse: number;
  /** RMSE of the refit on the hold-out rows (weighted when the rows are). */
  holdoutRmse: number;
  /** holdoutRmse / trainRmse (see {@link gapRatio}). */
  gapRatio: number;
  /** Pooled k-fold cross-validation RMSE of the refit; NaN when it could not be computed. */
  cvRmse: number;
  /** k of that cross-validation (0 when none). */
  folds: number;
}

function rmse(data: ModelData, predictions: Float64Array): number {
  if (data.weights !== undefined) return weightedErrorMeasures(data.y, predictions, data.weights, data.rows).rmse;
  const sums = emptySums();
  addErrors(sums, data.y, predictions, data.rows);
  return errorMeasures(sums).rmse;
}

/**
 * The refit's figures from its predictions of both files and its cross-validation.
 * @param trainPredictions the refit's predictions of the training rows (length train.rows)
 * @param holdoutPredictions the refit's predictions of the hold-out rows (length holdout.rows)
 * @param cv the refit's cross-validation, or null
 */
export function refitFigures(
  train: ModelData,
  holdout: ModelData,
  trainPredictions: Float64Array,
  holdoutPredictions: Float64Array,
  cv: CrossValidation | null,
): RefitFigures {
  const trainRmse = rmse(train, trainPredictions);
  const holdoutRmse = rmse(holdout, holdoutPredictions);
  return {
    trainRmse,
    holdoutRmse,
    gapRatio: gapRatio(trainRmse, holdoutRmse),
    cvRmse: cv === null ? Number.NaN : cv.cvRmse,
    folds: cv === null ? 0 : cv.k,
  };
}
