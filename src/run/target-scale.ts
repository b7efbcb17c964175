/**
 * A model fitted on a transformed target (`data.target_transform`): its error figures on both
 * scales (diagnostics/target-scale.ts), and the core metrics every check reads switched to the
 * scale the limits judge (`data.limits_scale`, default `original`). Coefficient sizes, the target's
 * spread and range stay those of the fit's own scale.
 */
import { backTransform, originalScaleCvRmse, scaleFigures, type TargetScale } from '../diagnostics/target-scale.js';
import type { TargetScaleFigures, TargetScaleResult } from '../result/result.js';
import { jsonNumber } from '../result/result.js';
import type { CoreMetrics } from '../checks/index.js';
import type { ModelTables } from '../data/load-model-data.js';
import type { Design } from '../design/design-matrix.js';
import type { CrossValidation, FoldFactors } from '../diagnostics/cross-validation.js';
import type { Folds } from '../diagnostics/folds.js';
import type { FitResult } from '../fit/index.js';
import type { ModelPlan } from './plan.js';

/** What {@link withTargetScale} reads and writes of a fitted model (fit-model.ts's `FittedModel` extends it). */
export interface ScaledModel {
  design: Design;
  fit: FitResult;
  tables: ModelTables;
  metrics: CoreMetrics;
  trainPredictions: Float64Array;
  holdoutPredictions: Float64Array;
  /** Cross-validation folds of the training rows (from the descriptor's `fit` settings). */
  folds: Folds;
  /** Cross-validation figures, computed in the fit's passes over the rows; null when they could not be computed. */
  crossValidation: CrossValidation | null;
  /** QR factors of each fold's rows and of each fold's complement (k small p x p factors). */
  foldFactors: FoldFactors;
  /** With `data.target_transform`: figures on both scales; absent otherwise. */
  targetScale?: TargetScale;
}

/**
 * The model with `targetScale` set and its metrics on the limits' scale; the model unchanged
 * without a target transform.
 * @param plan the model's plan (its original targets)
 * @param model the fitted model, with figures on the transformed scale
 */
export function withTargetScale<M extends ScaledModel>(plan: ModelPlan, model: M): M {
  const spec = plan.descriptor.data.targetTransform ?? null;
  const original = plan.originalTargets ?? null;
  if (spec === null || original === null) return model;
  const kind = spec.kind;
  const { train, holdout } = model.tables;
  const rows = { train: train.rows, holdout: holdout.rows, p: model.design.p };
  const own = (d: typeof train) => ({
    y: d.y,
    ...(d.weights !== undefined ? { weights: d.weights } : {}),
    ...(d.sigma !== undefined ? { sigma: d.sigma } : {}),
  });
  const fitted = { train: model.trainPredictions, holdout: model.holdoutPredictions };
  const transformed = scaleFigures(own(train), own(holdout), fitted, rows, model.crossValidation?.cvRmse ?? Number.NaN);
  const predictions = { train: backTransform(kind, fitted.train), holdout: backTransform(kind, fitted.holdout) };
  const cv =
    model.crossValidation === null
      ? Number.NaN
      : originalScaleCvRmse(model.design, train, model.folds, model.foldFactors.complements, model.fit, kind, original.train);
  const back = scaleFigures(original.train, original.holdout, predictions, rows, cv);
  const targetScale: TargetScale = {
    transform: kind,
    limitsScale: spec.limitsScale,
    original: back,
    transformed,
    originalRows: original,
    predictions,
  };
  const judged = spec.limitsScale === 'original' ? back : transformed;
  return {
    ...model,
    metrics: {
      ...model.metrics,
      trainRmse: judged.trainRmse,
      holdoutRmse: judged.holdoutRmse,
      trainMae: judged.trainMae,
      holdoutMae: judged.holdoutMae,
      trainR2: judged.trainR2,
      holdoutR2: judged.holdoutR2,
      gapRatio: judged.gapRatio,
    },
    targetScale,
  };
}

/** The report's block of a model with a transformed target (see {@link TargetScaleResult}). */
export function targetScaleResult(scale: TargetScale): TargetScaleResult {
  const figures = (f: TargetScale['original']): TargetScaleFigures => {
    return {
      train_rmse: jsonNumber(f.trainRmse),
      holdout_rmse: jsonNumber(f.holdoutRmse),
      train_mae: jsonNumber(f.trainMae),
      holdout_mae: jsonNumber(f.holdoutMae),
      train_r2: jsonNumber(f.trainR2),
      holdout_r2: jsonNumber(f.holdoutR2),
      gap_ratio: jsonNumber(f.gapRatio),
      cv_rmse: Number.isNaN(f.cvRmse) ? null : jsonNumber(f.cvRmse),
      ...(Number.isNaN(f.trainChiSquare) ? {} : { train_chi_square: jsonNumber(f.trainChiSquare) }),
      ...(Number.isNaN(f.holdoutChiSquare) ? {} : { holdout_chi_square: jsonNumber(f.holdoutChiSquare) }),
    };
  };
  return {
    transform: scale.transform,
    limits_scale: scale.limitsScale,
    back_transform: scale.transform === 'log' ? 'exp' : scale.transform === 'log1p' ? 'expm1' : 'square',
    original: figures(scale.original),
    transformed: figures(scale.transformed),
  };
}
