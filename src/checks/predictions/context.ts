/**
 * What a check reads about a model trained elsewhere (`predictions`): figures computed from its
 * predictions of the training and hold-out rows only (run/evaluate-predictions.ts builds it).
 * Checks that can judge such a model measure it with `Check.measurePredictions`; the others are
 * skipped with `<id>/needs-refit`.
 */
import type { Descriptor } from '../../config/types.js';
import type { Calibration, ClassificationFigures } from '../../diagnostics/classification-metrics.js';
import type { Leakage } from '../../diagnostics/leakage.js';
import type { ObservedSpread } from '../../diagnostics/observed-spread.js';
import type { ModelResult } from '../../result/result.js';

/** Error figures of one file's rows (RMSE, MAE, R^2 as diagnostics/regression-metrics.ts computes them). */
export interface PredictionErrors {
  rmse: number;
  mae: number;
  r2: number;
}

/** A model trained elsewhere, as its checks see it. */
export interface PredictionsContext {
  descriptor: Descriptor;
  /** The stated parameter count (`parameters`), or null when the descriptor states none. */
  parameters: number | null;
  /** The named input columns (`predictions.inputs`); empty when not given. */
  inputs: readonly string[];
  rows: { train: number; holdout: number };
  files: { train: string; holdout: string };
  /** Regression: the errors of the predictions; null for a classifier. */
  regression: { train: PredictionErrors; holdout: PredictionErrors } | null;
  /** Classification: the figures of the probabilities and the hold-out calibration; null for regression. */
  classifier: { train: ClassificationFigures; holdout: ClassificationFigures; calibration: Calibration } | null;
  /** Hold-out rows that repeat a training row in the named inputs; null when no inputs are named. */
  leakage: Leakage | null;
  /** The predictions of the observed rows against the training target band (regression). */
  spread: ObservedSpread;
  /** The same model on the base commit, when there is one. */
  baseline: ModelResult | null;
}
