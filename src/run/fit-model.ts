/**
 * One model fitted and scored: its plan, the passes over its rows, the core figures every check
 * reads, and the shipped coefficients scored on the same rows. No checks here (see evaluate.ts).
 */
import type { CoreMetrics } from '../checks/index.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { clip, InputError } from '../core/errors.js';
import type { ModelTables } from '../data/load-model-data.js';
import { lineOfFile } from '../data/data-parts.js';
import type { Design } from '../design/design-matrix.js';
import { predictRows } from '../design/blocks.js';
import { range } from '../design/stats.js';
import type { FoldFactors } from '../diagnostics/cross-validation.js';
import type { Folds } from '../diagnostics/folds.js';
import { addErrors, emptySums, errorMeasures, pairedErrorFigures } from '../diagnostics/regression-metrics.js';
import { refitFigures, type RefitFigures } from '../diagnostics/refit-compare.js';
import { scoreShipped, type ShippedScore } from '../diagnostics/shipped.js';
import { weightedErrorMeasures } from '../diagnostics/weighted-metrics.js';
import type { FitResult } from '../fit/index.js';
import type { RepoReader } from '../repo/types.js';
import { loadModelData } from '../data/load-model-data.js';
import type { Leakage } from '../diagnostics/leakage.js';
import { foldPass, refinePass, scoringPass, streamedScoringPass, type FoldPass } from './passes.js';
import { planModel, type ModelPlan, type ScaleOptions } from './plan.js';
import { withTargetScale, type ScaledModel } from './target-scale.js';

/**
 * Runs `step` and, when the training rows were read from parts, rewrites the `line N of FILE` of
 * a `design-overflow` error (passes.ts names a training row by its table-wide line) into the
 * part's own line and path (data-parts.ts). Other errors, and data of one file, pass unchanged.
 */
async function partsNamed<T>(tables: ModelTables, step: () => Promise<T>): Promise<T> {
  try {
    return await step();
  } catch (error) {
    const train = tables.train;
    if (!(error instanceof InputError) || error.code !== 'design-overflow' || train.parts === undefined) throw error;
    const found = / on line (\d+) of /.exec(error.message);
    const label = clip(train.file);
    if (found === null) throw error;
    const after = found.index + found[0].length;
    if (error.message.slice(after, after + label.length) !== label) throw error;
    const message = `${error.message.slice(0, found.index)} on ${lineOfFile(train, Number(found[1]))}${error.message.slice(after + label.length)}`;
    throw new InputError(error.code, message, error.location);
  }
}

/** A fitted model with everything checks and reporters read (the figures of both scales: target-scale.ts's {@link ScaledModel}). */
export interface FittedModel extends ScaledModel {
  descriptor: Descriptor;
  /** The descriptor's shipped coefficients scored on the same rows; null when it ships none. */
  shipped: ShippedScore | null;
  /** Scored as shipped with `fit.refit_compare: true`: the refit's figures (information); absent otherwise. */
  refitCompare?: RefitFigures;
  /**
   * A streamed model's leakage, found in its scoring pass over every training row (the
   * diagnostics then do not look for it in the sample `tables.train`); absent otherwise.
   */
  leakage?: Leakage;
}

/**
 * Loads, fits and scores one model (no checks).
 * @throws InputError for bad data, a constant target, a design over the caps, or shipped
 *   coefficients of the wrong length
 */
export async function fitModel(
  repo: RepoReader,
  descriptor: Descriptor,
  settings: SettingsFile,
  scale: ScaleOptions = {},
): Promise<FittedModel> {
  const plan = await planModel(repo, descriptor, settings, loadModelData, scale);
  const { design, tables, folds } = plan;
  if (tables.streamed !== undefined && descriptor.fit.refit === false) {
    throw new InputError(
      'too-large-to-hold',
      `the training file ${clip(descriptor.data.train)} is read as a stream (too large to hold in memory), which \`fit.refit: false\` does not support yet; expected a smaller file, or a refit`,
      { file: descriptor.file, line: descriptor.data.lines.train, key: 'data.train' },
    );
  }
  const first = await partsNamed(plan.tables, () => foldPass(plan));
  const fit = await refinePass(plan, first.fit);
  if (tables.streamed !== undefined) return streamedModel(plan, fit, first);
  const scored = scoringPass(plan, fit, first.foldFactors);
  if (descriptor.fit.refit === false) {
    const shipped = withTargetScale(
      plan,
      scoredAsShipped(descriptor, design, tables, fit, plan.targetSd, first.columnSd, folds, first.foldFactors),
    );
    if (descriptor.fit.refitCompare !== true) return shipped;
    return {
      ...shipped,
      refitCompare: refitFigures(tables.train, tables.holdout, scored.trainPredictions, scored.holdoutPredictions, scored.crossValidation),
    };
  }
  const metrics = coreMetrics(plan.targetSd, first.columnSd, fit, design, tables, scored.trainPredictions, scored.holdoutPredictions);
  return withTargetScale(plan, {
    descriptor,
    design,
    fit,
    tables,
    metrics,
    trainPredictions: scored.trainPredictions,
    holdoutPredictions: scored.holdoutPredictions,
    folds,
    crossValidation: scored.crossValidation,
    foldFactors: first.foldFactors,
    shipped: shippedScore(descriptor, design, tables, fit),
  });
}

/**
 * A streamed model (data/row-source.ts) from its scoring pass: every figure of the training rows
 * (errors, cross-validation, leakage, the shipped coefficients' errors) over every row of the
 * file; `trainPredictions` and `tables.train` are those of the sample.
 */
async function streamedModel(plan: ModelPlan, fit: FitResult, first: FoldPass): Promise<FittedModel> {
  const { descriptor, design, tables, folds } = plan;
  const shipped = checkedShipped(descriptor, design);
  const scored = await streamedScoringPass(plan, fit, first.foldFactors, shipped);
  const metrics = coreMetricsFrom(
    plan.targetSd,
    first.columnSd,
    fit,
    design,
    plan.rows,
    errorMeasures(scored.trainSums),
    measuresOf(tables.holdout, scored.holdoutPredictions),
    plan.targetRange,
  );
  let shippedScore: ShippedScore | null = null;
  if (shipped !== null && scored.shippedTrainSums !== null) {
    const holdoutPredictions = predictRows(design, tables.holdout, shipped);
    let diff = 0;
    for (let j = 0; j < design.p; j++) diff = Math.max(diff, Math.abs(shipped[j] - fit.coefficients[j]));
    shippedScore = {
      coefficients: shipped,
      holdoutPredictions,
      train: errorMeasures(scored.shippedTrainSums),
      holdout: measuresOf(tables.holdout, holdoutPredictions),
      maxCoefficientDifference: diff,
    };
  }
  return {
    descriptor,
    design,
    fit,
    tables,
    metrics,
    trainPredictions: scored.samplePredictions,
    holdoutPredictions: scored.holdoutPredictions,
    folds,
    crossValidation: scored.crossValidation,
    foldFactors: first.foldFactors,
    shipped: shippedScore,
    leakage: scored.leakage,
  };
}

/** RMSE, MAE and R^2 of predictions of some rows (weighted when the rows carry weights). */
function measuresOf(data: ModelTables['train'], predictions: Float64Array): ReturnType<typeof errorMeasures> {
  // Weighted rows get the weighted measures (diagnostics/weighted-metrics.ts).
  if (data.weights !== undefined) return weightedErrorMeasures(data.y, predictions, data.weights, data.rows);
  const sums = emptySums();
  addErrors(sums, data.y, predictions, data.rows);
  return errorMeasures(sums);
}

/**
 * A model scored as shipped (`fit.refit: false`): the shipped coefficients take the refit's place
 * in every figure (predictions, errors, coefficient sizes, swing, the report's `coefficients`);
 * the internal refit keeps only what describes the design (rank, conditioning, effective degrees
 * of freedom). No cross-validation; no shipped-against-refit comparison.
 */
function scoredAsShipped(
  descriptor: Descriptor,
  design: Design,
  tables: ModelTables,
  refit: FitResult,
  targetSd: number,
  columnSd: Float64Array,
  folds: Folds,
  factors: FoldFactors,
): FittedModel {
  const shipped = checkedShipped(descriptor, design);
  const coefficients = Float64Array.from(shipped ?? []);
  const trainPredictions = predictRows(design, tables.train, coefficients);
  const holdoutPredictions = predictRows(design, tables.holdout, coefficients);
  let rss = 0;
  for (let i = 0; i < tables.train.rows; i++) rss += (tables.train.y[i] - trainPredictions[i]) ** 2;
  const fit: FitResult = { ...refit, coefficients, rss };
  return {
    descriptor,
    design,
    fit,
    tables,
    metrics: coreMetrics(targetSd, columnSd, fit, design, tables, trainPredictions, holdoutPredictions),
    trainPredictions,
    holdoutPredictions,
    folds,
    crossValidation: null,
    foldFactors: factors,
    shipped: null,
  };
}

/**
 * The figures every check may read: training and hold-out RMSE, MAE and R^2, the gap ratio,
 * parameters per row and coefficient sizes (|w_j| sd(phi_j) / sd(y) over penalised columns).
 */
function coreMetrics(
  targetSd: number,
  columnSd: Float64Array,
  fit: FitResult,
  design: Design,
  tables: ModelTables,
  trainPredictions: Float64Array,
  holdoutPredictions: Float64Array,
): CoreMetrics {
  const { train, holdout } = tables;
  const tr = measuresOf(train, trainPredictions);
  const ho = measuresOf(holdout, holdoutPredictions);
  return coreMetricsFrom(targetSd, columnSd, fit, design, train.rows, tr, ho, range(train.y, train.rows));
}

/** {@link coreMetrics} from the error measures of both files, the training rows and the target's range. */
function coreMetricsFrom(
  targetSd: number,
  columnSd: Float64Array,
  fit: FitResult,
  design: Design,
  trainRows: number,
  tr: ReturnType<typeof errorMeasures>,
  ho: ReturnType<typeof errorMeasures>,
  targetRange: [number, number],
): CoreMetrics {
  let maxStd = Number.NaN;
  let maxStdColumn = -1;
  let maxAbs = 0;
  for (let j = 0; j < design.p; j++) {
    const w = Math.abs(fit.coefficients[j]);
    if (w > maxAbs || Number.isNaN(w)) maxAbs = w;
    if (!design.penalised[j]) continue;
    const s = (w * columnSd[j]) / targetSd;
    if (maxStdColumn < 0 || s > maxStd) {
      maxStd = s;
      maxStdColumn = j;
    }
  }
  return {
    ...pairedErrorFigures(tr, ho),
    paramsPerSample: design.p / trainRows,
    maxStdCoefficient: maxStd,
    maxStdCoefficientColumn: maxStdColumn,
    maxAbsCoefficient: maxAbs,
    columnSd,
    targetSd,
    targetRange,
  };
}

/**
 * The shipped coefficients scored on the same rows, or null when the descriptor ships none.
 * @throws InputError `coefficients-length` when their count is not the design's
 */
function shippedScore(descriptor: Descriptor, design: Design, tables: ModelTables, fit: FitResult): ShippedScore | null {
  const shipped = checkedShipped(descriptor, design);
  if (shipped === null) return null;
  return scoreShipped(design, tables.train, tables.holdout, shipped, fit.coefficients);
}

/**
 * The shipped coefficients, or null when the descriptor ships none.
 * @throws InputError `coefficients-length` when their count is not the design's
 */
function checkedShipped(descriptor: Descriptor, design: Design): readonly number[] | null {
  const shipped = descriptor.coefficients;
  if (shipped === null) return null;
  if (shipped.length !== design.p) {
    throw new InputError(
      'coefficients-length',
      `\`coefficients\` has ${shipped.length} values but the terms build ${design.p} columns (${design.columnNames
        .slice(0, 12)
        .map((c) => clip(c))
        .join(', ')}${design.p > 12 ? ', …' : ''}); expected one value per column, intercept first`,
      { file: descriptor.file, line: descriptor.coefficientsLine ?? undefined, key: 'coefficients' },
    );
  }
  return shipped;
}
