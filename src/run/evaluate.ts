/**
 * One model from descriptor to outcome: fit and score it (fit-model.ts), run every check of the
 * registry against its limits, and build its part of the Result.
 */
import { checksFor, runCheck, type CheckContext } from '../checks/index.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { dataFilesField } from '../config/data-paths.js';
import { Deadline, TimeLimitExceeded, withDeadline } from '../core/deadline.js';
import { InputError } from '../core/errors.js';
import { ModelAnalyses } from '../diagnostics/analyses.js';
import type { ShippedScore } from '../diagnostics/shipped.js';
import type { RepoReader } from '../repo/types.js';
import { FULL_CHART_SHARE, MAX_CHART_POINTS, type ChartShare } from '../result/chart-types.js';
import { jsonNumber, type ModelMetrics, type ModelResult, type ShippedMetrics } from '../result/result.js';
import { compareWithBase, type BaseInput } from './base-comparison.js';
import { withBaseCurves } from './base-curves.js';
import { buildChartData } from './chart-data.js';
import { runChecks } from './run-checks.js';
import { errorResult, INTERNAL_ERROR, timeLimitError } from './error-result.js';
import { fitModel, type FittedModel } from './fit-model.js';
import { targetScaleResult } from './target-scale.js';
import type { ScaleOptions } from './plan.js';
import { trainingRows } from '../data/model-data.js';

/**
 * What a streamed model's report says of its sampling (docs/scale.md): which figures come from
 * every row and which from the sample.
 */
function streamedNote(sampleRows: number, rows: number): { rows: number; sample_rows: number; note: string } {
  return {
    rows,
    sample_rows: sampleRows,
    note: `the training file was streamed (${rows} rows); errors, cross-validation, leave-one-out, leakage, coefficients and conditioning use every row; swing, spikes, the complexity sweep, term parameters and charts use a seeded sample of ${sampleRows} rows`,
  };
}

export type { BaseInput } from './base-comparison.js';

/** The report's figures of the shipped coefficients, or null. */
function shippedMetrics(shipped: ShippedScore | null): ShippedMetrics | null {
  if (shipped === null) return null;
  return {
    train_rmse: jsonNumber(shipped.train.rmse),
    holdout_rmse: jsonNumber(shipped.holdout.rmse),
    max_coefficient_difference: jsonNumber(shipped.maxCoefficientDifference),
  };
}

/** Model metrics for the report. */
function reportMetrics(model: FittedModel): ModelMetrics {
  const { metrics: m, fit, design } = model;
  return {
    train_rmse: jsonNumber(m.trainRmse),
    holdout_rmse: jsonNumber(m.holdoutRmse),
    train_mae: jsonNumber(m.trainMae),
    holdout_mae: jsonNumber(m.holdoutMae),
    train_r2: jsonNumber(m.trainR2),
    holdout_r2: jsonNumber(m.holdoutR2),
    gap_ratio: jsonNumber(m.gapRatio),
    params_per_sample: jsonNumber(m.paramsPerSample),
    max_std_coefficient: jsonNumber(m.maxStdCoefficient),
    max_std_coefficient_column: m.maxStdCoefficientColumn >= 0 ? design.columnNames[m.maxStdCoefficientColumn] : null,
    max_abs_coefficient: jsonNumber(m.maxAbsCoefficient),
    rank: fit.rank,
    condition_number: jsonNumber(fit.conditionNumber),
    condition_number_scaled: jsonNumber(fit.conditionNumberScaled),
    // `fit.refit_compare`: what a refit would give, beside the shipped model's figures above.
    ...(model.refitCompare
      ? {
          refit_train_rmse: jsonNumber(model.refitCompare.trainRmse),
          refit_holdout_rmse: jsonNumber(model.refitCompare.holdoutRmse),
          refit_gap_ratio: jsonNumber(model.refitCompare.gapRatio),
          refit_cv_rmse: jsonNumber(model.refitCompare.cvRmse),
          refit_cv_folds: model.refitCompare.folds,
        }
      : {}),
  };
}

/**
 * Fits one model and runs every check on it, within its time limit (`caps.max_model_seconds`,
 * checked between the stages: see core/deadline.ts). Input problems and a model stopped at its
 * time limit become a model with verdict `error` (the run goes on).
 * @param base outcomes on the base commit to compare with; default none (no `base` field)
 * @param deadline the model's deadline; default one of `caps.max_model_seconds` from now
 * @param share the model's share of the run's chart data (result/chart-types.ts `chartShare`); default the full share
 * @param scale when to stream the training file and how (plan.ts {@link ScaleOptions}); default the built-in threshold
 */
export async function evaluateModel(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  base?: BaseInput,
  deadline?: Deadline,
  share: ChartShare = FULL_CHART_SHARE,
  scale: ScaleOptions = {},
): Promise<ModelResult> {
  const within = deadline ?? new Deadline(settings.caps.maxModelSeconds * 1000);
  try {
    return await withDeadline(within, () => evaluateWithin(repo, descriptor, settings, share, base, scale));
  } catch (error) {
    if (!(error instanceof TimeLimitExceeded)) throw error;
    return errorResult(
      descriptor.name,
      descriptor.file,
      timeLimitError(descriptor, settings.caps.maxModelSeconds, error.elapsedMs, error.stage, settings.file),
    );
  }
}

/** {@link evaluateModel} inside its deadline; TimeLimitExceeded passes through. */
async function evaluateWithin(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  share: ChartShare,
  base: BaseInput | undefined,
  scale: ScaleOptions,
): Promise<ModelResult> {
  let model: FittedModel;
  try {
    // Classifiers and models judged on their predictions load their modules when a run has one,
    // so that a run of regression models starts without them (a smaller bundle to compile).
    if (descriptor.predictions) {
      const { evaluatePredictions } = await import('./evaluate-predictions.js');
      return await evaluatePredictions(repo, descriptor, settings, base);
    }
    if (descriptor.task === 'classification') {
      const { evaluateClassifier } = await import('./evaluate-classifier.js');
      return await evaluateClassifier(repo, descriptor, settings, base);
    }
    model = await fitModel(repo, descriptor, settings, scale);
  } catch (error) {
    if (error instanceof TimeLimitExceeded) throw error;
    if (error instanceof InputError) return errorResult(descriptor.name, descriptor.file, error);
    // A fault of fitgate's own on this model's data: report it on this model (exit status 2) so
    // that every other model still gets its outcome; the code marks it as a bug to report.
    const detail = error instanceof Error ? error.message : String(error);
    return errorResult(
      descriptor.name,
      descriptor.file,
      new InputError(
        INTERNAL_ERROR,
        `fitgate could not compute this model (${detail}); this is a fault in fitgate, please report it with the descriptor and data`,
        { file: descriptor.file, line: descriptor.termsLine },
      ),
    );
  }
  const baseMatch = base?.matches.get(descriptor.file) ?? null;
  // The run's own passes already produced the folds, their factors and the cross-validation.
  const analyses = new ModelAnalyses(
    {
      design: model.design,
      fit: model.fit,
      train: model.tables.train,
      holdout: model.tables.holdout,
      folds: descriptor.fit,
      // A transformed target judged on the original scale: swing back-transforms the predictions.
      ...(model.targetScale?.limitsScale === 'original' ? { backTransform: model.targetScale.transform } : {}),
    },
    {
      folds: model.folds,
      foldFactors: model.foldFactors,
      crossValidation: model.crossValidation,
      ...(model.leakage ? { leakage: model.leakage } : {}),
    },
    share.fraction < 1 ? { curveShare: share.fraction } : {},
  );
  const context: CheckContext = {
    descriptor,
    design: model.design,
    fit: model.fit,
    metrics: model.metrics,
    train: model.tables.train,
    holdout: model.tables.holdout,
    baseline: baseMatch?.model ?? null,
    analyses,
    predictions: { train: model.trainPredictions, holdout: model.holdoutPredictions },
    shipped: model.shipped,
    targetScale: model.targetScale ?? null,
  };
  const metrics = reportMetrics(model);
  const { checks, verdict } = runChecks(checksFor('regression'), (check) => runCheck(check, context), metrics);
  return {
    name: descriptor.name,
    descriptor: descriptor.file,
    verdict,
    rows: { train: trainingRows(model.tables.train), holdout: model.tables.holdout.rows },
    ...dataFilesField(descriptor.data),
    ...(model.tables.train.dropped !== undefined
      ? { dropped: { train: model.tables.train.dropped, holdout: model.tables.holdout.dropped ?? 0 } }
      : {}),
    parameters: model.design.p,
    columns: [...model.design.columnNames],
    metrics,
    coefficients: Array.from(model.fit.coefficients, jsonNumber),
    shipped: shippedMetrics(model.shipped),
    ...(model.targetScale ? { target_scale: targetScaleResult(model.targetScale) } : {}),
    checks,
    ...(base ? { base: compareWithBase(metrics, baseMatch, base.commit) } : {}),
    error: null,
    extra: {
      rank_deficient: model.fit.rankDeficient,
      ...(model.tables.train.sampleOf !== undefined
        ? { streamed: streamedNote(model.tables.train.rows, model.tables.train.sampleOf) }
        : {}),
      terms: model.design.terms.map((t, i) => ({
        kind: t.spec.kind,
        line: t.spec.line,
        first_column: model.design.termOffsets[i],
        columns: t.columnNames.length,
        fixed: t.fixed,
      })),
    },
    charts: withBaseCurves(
      buildChartData(model, checks, MAX_CHART_POINTS, share),
      { columns: model.design.columnNames, coefficients: Array.from(model.fit.coefficients, jsonNumber) },
      context.baseline,
      base?.commit ?? '',
    ),
  };
}
