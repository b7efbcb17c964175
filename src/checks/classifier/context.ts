/**
 * What a check reads about a fitted binary classifier (task `classification`). The run builds it
 * (run/fit-classifier.ts); checks that apply to classifiers measure from it with
 * `Check.measureClassifier`.
 */
import type { Descriptor } from '../../config/types.js';
import type { Design } from '../../design/design-matrix.js';
import type { ClassifierSweep } from '../../diagnostics/classifier-complexity.js';
import type { Calibration, ClassificationFigures } from '../../diagnostics/classification-metrics.js';
import type { Separation } from '../../diagnostics/separation.js';
import type { DataPart } from '../../data/data-parts.js';
import type { FactorDiagnostics } from '../../fit/index.js';
import type { LogisticFit } from '../../fit/logistic.js';
import type { ModelResult } from '../../result/result.js';

/** Cross-validation of a classifier: each fold refitted without its rows. */
export interface ClassifierCrossValidation {
  k: number;
  /** Pooled log-loss of the out-of-fold probabilities. */
  logLoss: number;
  /** Log-loss of each fold's rows under the fit without them. */
  foldLogLoss: number[];
  foldRows: number[];
  /** Whether every fold's fit met the stopping rule. */
  converged: boolean;
}

/** The shipped coefficients scored against the refit. */
export interface ClassifierShipped {
  /** Largest |p_shipped - p_refit| over the training and hold-out rows. */
  maxProbabilityDifference: number;
  maxCoefficientDifference: number;
  trainLogLoss: number;
  holdoutLogLoss: number;
}

/** A fitted classifier with everything its checks read. */
export interface ClassifierContext {
  descriptor: Descriptor;
  design: Design;
  fit: LogisticFit;
  /** Least-squares diagnostics of the weighted design sqrt(W) X at the optimum (rank, condition numbers). */
  weighted: FactorDiagnostics;
  train: ClassificationFigures;
  holdout: ClassificationFigures;
  /** Logistic recalibration on the hold-out rows. */
  calibration: Calibration;
  crossValidation: ClassifierCrossValidation | null;
  separation: Separation;
  shipped: ClassifierShipped | null;
  /** Population sd of each design column over the training rows. */
  columnSd: Float64Array;
  /** Exact duplicates between training and hold-out rows (inputs and label): count and examples. */
  /** With data read from parts, the lines are each part's own and `trainFile` / `holdoutFile` name the part. */
  leakage: { duplicates: number; examples: { trainLine: number; holdoutLine: number; trainFile?: string; holdoutFile?: string }[] };
  /** The training rows' file and parts (data-parts.ts), to name a training line's part; absent: lines are the file's own. */
  trainSource?: { file: string; parts?: DataPart[] };
  /** The same model on the base commit, when there is one. */
  baseline: ModelResult | null;
  /** The complexity sweep scored by CV log-loss, or null when the model has nothing to sweep. */
  complexity: ClassifierSweep | null;
}
