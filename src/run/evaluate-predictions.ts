/**
 * One model trained elsewhere (`predictions`) from descriptor to outcome: its rows and
 * predictions (data/load-predictions.ts), the figures that need only predictions, every check of
 * the registry through its `measurePredictions` (the others skipped with `<id>/needs-refit`),
 * and its part of the Result (`kind: 'predictions'`). Nothing is fitted.
 */
import { checksFor, runPredictionsCheck, type PredictionsContext } from '../checks/index.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { checkDeadline } from '../core/deadline.js';
import { loadPredictionsData, type PredictedRows } from '../data/load-predictions.js';
import {
  calibration,
  calibrationBins,
  classificationFigures,
  rocPoints,
  type ClassificationFigures,
} from '../diagnostics/classification-metrics.js';
import { findLeakage } from '../diagnostics/leakage.js';
import { observedSpread } from '../diagnostics/observed-spread.js';
import { addErrors, emptySums, errorMeasures, gapRatio } from '../diagnostics/regression-metrics.js';
import type { RepoReader } from '../repo/types.js';
import { jsonNumber, type ModelMetrics, type ModelResult } from '../result/result.js';
import { compareWithBase, type BaseInput } from './base-comparison.js';
import { runChecks } from './run-checks.js';
import { classificationFigureMetrics } from './evaluate-classifier.js';

/**
 * Probabilities are kept inside [EPS, 1 - EPS] where a logit is taken (log-loss, calibration), so
 * that a stated 0 or 1 gives a large finite loss instead of an infinite one (common practice;
 * 1e-15 as many metric libraries use, from memory). Brier score, accuracy and AUC use the
 * probabilities as given.
 */
export const PROBABILITY_EPS = 1e-15;

/** logit(clamp(p, EPS, 1 - EPS)) of each entry. */
export function clampedLogits(p: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const q = Math.min(1 - PROBABILITY_EPS, Math.max(PROBABILITY_EPS, p[i]));
    out[i] = Math.log(q / (1 - q));
  }
  return out;
}

function errorsOf(rows: PredictedRows): { rmse: number; mae: number; r2: number } {
  const sums = emptySums();
  addErrors(sums, rows.y, rows.predictions, rows.rows);
  const m = errorMeasures(sums);
  return { rmse: m.rmse, mae: m.mae, r2: m.r2 };
}

/**
 * Scores one model trained elsewhere and runs every check on it. Errors are handled by the caller
 * (evaluate.ts), as for models of terms.
 * @param base outcomes on the base commit to compare with; default none
 */
export async function evaluatePredictions(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  base?: BaseInput,
): Promise<ModelResult> {
  const spec = descriptor.predictions;
  if (!spec) throw new TypeError('evaluatePredictions needs a descriptor with `predictions`');
  const tables = await loadPredictionsData(repo, descriptor, settings);
  checkDeadline('predictions');
  const { train, holdout } = tables;
  const parameters = descriptor.parameters ?? null;
  const isClassifier = descriptor.task === 'classification';

  // The figures of the predictions: errors (regression) or the probabilities' figures (classifiers).
  let classifier: PredictionsContext['classifier'] = null;
  let regression: PredictionsContext['regression'] = null;
  let charts: Record<string, unknown> = {};
  if (isClassifier) {
    const threshold = descriptor.fit.threshold ?? 0.5;
    const trainEta = clampedLogits(train.predictions, train.rows);
    const holdoutEta = clampedLogits(holdout.predictions, holdout.rows);
    classifier = {
      train: classificationFigures(train.y, trainEta, train.predictions, train.rows, threshold),
      holdout: classificationFigures(holdout.y, holdoutEta, holdout.predictions, holdout.rows, threshold),
      calibration: calibration(holdout.y, holdoutEta, holdout.rows),
    };
    charts = {
      roc: { train: rocPoints(train.y, train.predictions, train.rows), holdout: rocPoints(holdout.y, holdout.predictions, holdout.rows) },
      calibration_bins: calibrationBins(holdout.y, holdout.predictions, holdout.rows).map((b) => ({
        from: b.from,
        to: b.to,
        count: b.count,
        predicted: jsonNumber(b.predicted),
        observed: jsonNumber(b.observed),
      })),
    };
  } else {
    regression = { train: errorsOf(train), holdout: errorsOf(holdout) };
  }
  checkDeadline('predictions');
  const leakage = spec.inputs.length > 0 ? findLeakage(train, holdout) : null;
  const spread = observedSpread(train.y, train.rows, [
    { file: train.predictionFile, lines: train.predictionLines, predictions: train.predictions, rows: train.rows },
    { file: holdout.predictionFile, lines: holdout.predictionLines, predictions: holdout.predictions, rows: holdout.rows },
  ]);
  const baseMatch = base?.matches.get(descriptor.file) ?? null;
  const context: PredictionsContext = {
    descriptor,
    parameters,
    inputs: spec.inputs,
    rows: { train: train.rows, holdout: holdout.rows },
    files: { train: train.file, holdout: holdout.file },
    regression,
    classifier,
    leakage,
    spread,
    baseline: baseMatch?.model ?? null,
  };
  const metrics =
    classifier !== null
      ? classifierMetrics(classifier, parameters, train.rows, descriptor, tables.labels)
      : regressionMetrics(regression as NonNullable<PredictionsContext['regression']>, parameters, train.rows);
  const { checks, verdict } = runChecks(checksFor(descriptor.task), (check) => runPredictionsCheck(check, context), metrics);
  const source = (which: 'train' | 'holdout') => {
    const s = spec[which];
    return { column: s.column, file: s.file, key: s.key };
  };
  return {
    name: descriptor.name,
    descriptor: descriptor.file,
    kind: 'predictions',
    verdict,
    rows: { train: train.rows, holdout: holdout.rows },
    ...(train.dropped !== undefined ? { dropped: { train: train.dropped, holdout: holdout.dropped ?? 0 } } : {}),
    parameters: parameters ?? 0,
    columns: [],
    metrics,
    coefficients: [],
    shipped: null,
    checks,
    ...(base && !isClassifier ? { base: compareWithBase(metrics, baseMatch, base.commit) } : {}),
    error: null,
    extra: {
      kind: 'predictions',
      ...(isClassifier ? { task: 'classification', labels: tables.labels } : {}),
      predictions: { train: source('train'), holdout: source('holdout'), inputs: [...spec.inputs] },
      parameters_stated: parameters !== null,
      observed_spread: {
        band: spread.band.map(jsonNumber),
        predicted: spread.predicted.map(jsonNumber),
        rows: spread.rows,
        worst: spread.worst === null ? null : { ...spread.worst, prediction: jsonNumber(spread.worst.prediction) },
      },
      ...charts,
    },
  };
}

/**
 * The report's metrics of a regression model trained elsewhere: the error figures of its
 * predictions. The keys of coefficients and of the design (`max_std_coefficient`, `rank`...) are
 * left out: there are none; so is `params_per_sample` without a stated `parameters`.
 */
function regressionMetrics(r: NonNullable<PredictionsContext['regression']>, parameters: number | null, rows: number): ModelMetrics {
  const n = (x: number) => jsonNumber(x);
  return {
    train_rmse: n(r.train.rmse),
    holdout_rmse: n(r.holdout.rmse),
    train_mae: n(r.train.mae),
    holdout_mae: n(r.holdout.mae),
    train_r2: n(r.train.r2),
    holdout_r2: n(r.holdout.r2),
    gap_ratio: n(gapRatio(r.train.rmse, r.holdout.rmse)),
    ...(parameters === null ? {} : { params_per_sample: n(parameters / rows) }),
  } as unknown as ModelMetrics;
}

/**
 * The report's metrics of a classifier trained elsewhere: the keys of evaluate-classifier.ts that
 * predictions give (log-loss, Brier, accuracy, AUC, class counts); the regression, coefficient and
 * design keys are left out.
 */
function classifierMetrics(
  c: NonNullable<PredictionsContext['classifier']>,
  parameters: number | null,
  rows: number,
  descriptor: Descriptor,
  labels: { positive: string; negative: string } | null,
): ModelMetrics {
  const n = (x: number) => jsonNumber(x);
  const train: ClassificationFigures = c.train;
  const holdout: ClassificationFigures = c.holdout;
  return {
    task: 'classification',
    gap_ratio: n(gapRatio(train.logLoss, holdout.logLoss)),
    ...(parameters === null ? {} : { params_per_sample: n(parameters / rows) }),
    ...classificationFigureMetrics(train, holdout, descriptor.fit.threshold ?? 0.5),
    positive_label: labels?.positive ?? null,
    negative_label: labels?.negative ?? null,
  } as unknown as ModelMetrics;
}
