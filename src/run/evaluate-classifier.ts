/**
 * One binary classifier from descriptor to outcome: fit and score it (fit-classifier.ts), run
 * every check of the registry with its classifier measure (checks that apply to regression only
 * are skipped with `<id>/not-for-classification`), and build its part of the Result.
 */
import { CHECKS, runClassifierCheck, type ClassifierContext } from '../checks/index.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { dataFilesField } from '../config/data-paths.js';
import type { ClassificationFigures } from '../diagnostics/classification-metrics.js';
import { jsonNumber, type JsonNumber, type ModelMetrics, type ModelResult } from '../result/result.js';
import type { RepoReader } from '../repo/types.js';
import { compareWithBase, type BaseInput } from './base-comparison.js';
import { runChecks } from './run-checks.js';
import { buildClassifierChartData } from './classifier-chart-data.js';
import { fitClassifier, type FittedClassifier } from './fit-classifier.js';
import { maxOf } from '../core/extremes.js';
import { gapRatio } from '../diagnostics/regression-metrics.js';

/**
 * The report keys of a classifier's figures on both files, shared by models of terms and models
 * trained elsewhere: log-loss, Brier score, accuracy at the threshold, ROC AUC and class counts.
 * @param threshold `fit.threshold` (default 0.5)
 */
export function classificationFigureMetrics(
  train: ClassificationFigures,
  holdout: ClassificationFigures,
  threshold: number,
): Record<string, JsonNumber | number> {
  const n = (x: number) => jsonNumber(x);
  return {
    train_log_loss: n(train.logLoss),
    holdout_log_loss: n(holdout.logLoss),
    train_brier: n(train.brier),
    holdout_brier: n(holdout.brier),
    train_accuracy: n(train.accuracy),
    holdout_accuracy: n(holdout.accuracy),
    train_auc: n(train.auc),
    holdout_auc: n(holdout.auc),
    threshold,
    train_positives: train.positives,
    train_negatives: train.negatives,
    holdout_positives: holdout.positives,
    holdout_negatives: holdout.negatives,
  };
}

/**
 * The report's metrics of a classifier: the training and hold-out figures, calibration, class
 * counts and the fit's convergence; the checks add theirs (gap ratio, CV log-loss...). The
 * regression keys (RMSE, MAE, R^2) are null: they do not apply.
 */
function classifierMetrics(model: FittedClassifier): ModelMetrics {
  const { train, holdout, fit, design, weighted } = model.context;
  const n = (x: number) => jsonNumber(x);
  return {
    task: 'classification',
    train_rmse: null,
    holdout_rmse: null,
    train_mae: null,
    holdout_mae: null,
    train_r2: null,
    holdout_r2: null,
    gap_ratio: n(gapRatio(train.logLoss, holdout.logLoss)),
    params_per_sample: n(design.p / train.rows),
    max_std_coefficient: null,
    max_std_coefficient_column: null,
    max_abs_coefficient: n(maxOf(Array.from(fit.coefficients, Math.abs), 0)),
    rank: weighted.rank,
    condition_number: n(weighted.conditionNumberScaled),
    ...classificationFigureMetrics(train, holdout, model.context.descriptor.fit.threshold ?? 0.5),
    positive_label: model.labels.positive,
    negative_label: model.labels.negative,
    fit_iterations: fit.iterations,
    fit_converged: fit.converged ? 1 : 0,
    deviance: n(fit.deviance),
  } as unknown as ModelMetrics;
}

/**
 * Fits one classifier and runs every check on it. Errors are handled by the caller
 * (evaluate.ts), as for regression models.
 */
export async function evaluateClassifier(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  base?: BaseInput,
): Promise<ModelResult> {
  const model = await fitClassifier(repo, descriptor, settings);
  const baseMatch = base?.matches.get(descriptor.file) ?? null;
  const context: ClassifierContext = { ...model.context, baseline: baseMatch?.model ?? null };
  const metrics = classifierMetrics(model);
  const { checks, verdict } = runChecks(CHECKS, (check) => runClassifierCheck(check, context), metrics);
  return {
    name: descriptor.name,
    descriptor: descriptor.file,
    verdict,
    rows: { train: model.train.rows, holdout: model.holdout.rows },
    ...dataFilesField(descriptor.data),
    ...(model.train.dropped !== undefined ? { dropped: { train: model.train.dropped, holdout: model.holdout.dropped ?? 0 } } : {}),
    parameters: model.context.design.p,
    columns: [...model.context.design.columnNames],
    metrics,
    coefficients: Array.from(model.context.fit.coefficients, jsonNumber),
    shipped: null,
    checks,
    ...(base ? { base: compareWithBase(metrics, baseMatch, base.commit) } : {}),
    error: null,
    extra: {
      task: 'classification',
      labels: model.labels,
      roc: { train: model.charts.rocTrain, holdout: model.charts.rocHoldout },
      calibration_bins: model.charts.calibration.map((b) => ({
        from: b.from,
        to: b.to,
        count: b.count,
        predicted: jsonNumber(b.predicted),
        observed: jsonNumber(b.observed),
      })),
      terms: model.context.design.terms.map((t, i) => ({
        kind: t.spec.kind,
        line: t.spec.line,
        first_column: model.context.design.termOffsets[i],
        columns: t.columnNames.length,
        fixed: t.fixed,
      })),
    },
    classifier_charts: buildClassifierChartData(model),
  };
}
