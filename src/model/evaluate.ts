/**
 * One model from descriptor to outcome: load its data, fix the terms, fold the training rows
 * into the factor, solve, score training and hold-out rows, run every check.
 */
import { createTerm, termInputs } from '../basis/index.js';
import { meanAndSd, range } from '../basis/stats.js';
import { CHECKS, runCheck, type CheckContext, type CoreMetrics } from '../checks/index.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { createDesign, type Design } from '../design-matrix.js';
import { clip, InputError } from '../errors.js';
import { fitFactor, RefinementPass, refinementApplies, type FitResult } from '../fit/index.js';
import { firstBeyondIn, wasmKernels } from '../fit/wasm-kernels.js';
import { ColumnSpread } from '../metrics/column-spread.js';
import { allowOptimisingCompiler, estimateWork, SMALL_WORK } from '../optimising-compiler.js';
import { sweepTarget } from '../diagnostics/complexity.js';
import { addErrors, emptySums, errorMeasures, gapRatio } from '../metrics/regression.js';
import type { RepoReader } from '../repo/types.js';
import { fromJsonNumber, jsonNumber, worse, type BaseComparison, type CheckResult, type ModelMetrics, type ModelResult, type ShippedMetrics, type Verdict } from '../result.js';
import { complementFactors, crossValidate, FoldFactorBuilder, mergeFactors, type CrossValidation, type FoldFactors } from '../diagnostics/cross-validation.js';
import { assignFolds, type Folds } from '../diagnostics/folds.js';
import { SHARED_CROSS_VALIDATION_KEY, SHARED_FOLD_FACTORS_KEY, SHARED_FOLDS_KEY } from '../diagnostics/shared.js';
import { forEachBlock, predictRows } from './blocks.js';
import { buildChartData } from './chart-data.js';
import { loadModelData, type ModelTables } from './load-data.js';

/** Error code of a model that failed through a fault in fitgate rather than in its files. */
export const INTERNAL_ERROR = 'internal-error';

/**
 * Largest number of design columns. The diagnostics take singular value decompositions of p x p
 * factors (several per model and fold when the design is rank deficient), whose cost grows with
 * p^3: at 200 columns each takes about 0.4 s here, so a pull request cannot make a run take hours.
 */
export const MAX_PARAMETERS = 200;

/**
 * Largest magnitude of a design value or target: sums of squares of up to 1e9 rows must stay
 * finite in double precision (1e140^2 * 1e9 = 1e289 < 1.8e308).
 */
export const MAX_MAGNITUDE = 1e140;

/** A fitted model with everything checks and reporters read. */
export interface FittedModel {
  descriptor: Descriptor;
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
}

/**
 * Loads, fits and scores one model (no checks).
 * @throws InputError for bad data, a constant target, or a design over the caps
 */
export async function fitModel(repo: RepoReader, descriptor: Descriptor, settings: SettingsFile): Promise<FittedModel> {
  const inputs: string[] = [];
  for (const t of descriptor.terms) for (const c of termInputs(t)) if (!inputs.includes(c)) inputs.push(c);
  const tables = await loadModelData(repo, descriptor, inputs, settings);
  const { train, holdout } = tables;
  const file = descriptor.file;

  // Fix term parameters from the training rows, then check the size before taking memory.
  const terms = descriptor.terms.map((spec) => createTerm(spec, tables.trainColumns, file));
  const design = createDesign(terms, descriptor.fit.intercept);
  const p = design.p;
  if (p > MAX_PARAMETERS) {
    throw new InputError(
      'too-many-parameters',
      `the terms build ${p} design columns; at most ${MAX_PARAMETERS} are supported (the diagnostics decompose p x p factors, at a cost that grows with p^3); use fewer radial centres or a lower degree`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  if (train.rows * p > settings.caps.maxCells) {
    throw new InputError(
      'too-large',
      `${train.rows} training rows x ${p} parameters = ${train.rows * p} cells is over the cap of ${settings.caps.maxCells}; raise caps.max_cells in the settings file to allow it`,
      { file, line: descriptor.termsLine, key: 'terms' },
    );
  }
  for (const data of [train, tables.holdout]) {
    const i = firstBeyond(data.y, data.rows, MAX_MAGNITUDE);
    if (i >= 0) {
      throw new InputError(
        'target-range',
        `the target \`${clip(descriptor.data.target)}\` is ${data.y[i]} on line ${data.lines[i]} of ${clip(data.file)}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): rescale the target`,
        { file, line: descriptor.data.lines.target, key: 'data.target' },
      );
    }
  }
  // Big work runs on optimised code (see optimising-compiler.ts); small work finishes sooner without.
  const sweep = sweepTarget(descriptor, design);
  const swept = sweep === null ? null : design.terms[sweep.term]?.spec;
  const refits = swept?.kind === 'polynomial' ? Math.min(swept.degree, 12) + 3 : swept?.kind === 'rbf' ? 7 : 0;
  if (estimateWork({ rows: train.rows, columns: p, inputs: design.inputs.length, refits }) > SMALL_WORK) allowOptimisingCompiler();
  const targetStats = meanAndSd(train.y, train.rows);
  if (!(targetStats.sd > 0)) {
    throw new InputError(
      'constant-target',
      `the target \`${clip(descriptor.data.target)}\` is constant (${train.y[0]}) in every training row; there is nothing to model`,
      { file, line: descriptor.data.lines.target, key: 'data.target' },
    );
  }

  // One pass over the training rows: each fold's rows into its own factor (the folds are known
  // before the pass), column spreads alongside. The full factor is the merge of the fold factors.
  const folds = assignFolds(train.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
  const builder = new FoldFactorBuilder(p, folds);
  const spread = new ColumnSpread(p);
  forEachBlock(design, train, (X, start, m) => {
    checkFiniteBlock(design, train, descriptor, X, start, m);
    builder.add(X, train.y, start, m);
    spread.add(X, m);
  });
  const full = mergeFactors(builder.factors, p);
  let fit = fitFactor(full, { ridge: descriptor.fit.ridge, penalised: design.penalised });
  // One step of iterative refinement from a further pass where it converges and gains digits
  // (not for well-conditioned designs, whose QR solution is already accurate to about 1e-14).
  if (refinementApplies(fit)) {
    const pass = new RefinementPass(fit);
    forEachBlock(design, train, (X, start, m) => pass.addRows(X, train.y.subarray(start, start + m), m));
    fit = pass.finish();
  }

  // One scoring pass over the training rows: predictions, out-of-fold errors and leverages
  // together (the checks read the cross-validation from the shared memo); then the hold-out rows.
  const foldFactors: FoldFactors = { perFold: builder.factors, complements: folds.k >= 2 ? complementFactors(builder.factors) : [] };
  let trainPredictions: Float64Array = new Float64Array(train.rows);
  let crossValidation: CrossValidation | null;
  try {
    crossValidation = crossValidate(design, train, fit, folds, { factors: foldFactors.perFold, complements: foldFactors.complements, predictions: trainPredictions });
  } catch {
    // The cross-validation check will run it again and report why it could not be computed
    // (as a check that throws does); the fit itself stands.
    crossValidation = null;
    trainPredictions = predictRows(design, train, fit.coefficients);
  }
  const holdoutPredictions = predictRows(design, holdout, fit.coefficients);
  const trainSums = emptySums();
  addErrors(trainSums, train.y, trainPredictions, train.rows);
  const holdoutSums = emptySums();
  addErrors(holdoutSums, holdout.y, holdoutPredictions, holdout.rows);
  const tr = errorMeasures(trainSums);
  const ho = errorMeasures(holdoutSums);

  // Coefficient sizes.
  const columnSd = spread.sd();
  let maxStd = Number.NaN;
  let maxStdColumn = -1;
  let maxAbs = 0;
  for (let j = 0; j < p; j++) {
    const w = Math.abs(fit.coefficients[j]);
    if (w > maxAbs || Number.isNaN(w)) maxAbs = w;
    if (!design.penalised[j]) continue;
    const s = (w * columnSd[j]) / targetStats.sd;
    if (maxStdColumn < 0 || s > maxStd) {
      maxStd = s;
      maxStdColumn = j;
    }
  }
  const metrics: CoreMetrics = {
    trainRmse: tr.rmse,
    holdoutRmse: ho.rmse,
    trainMae: tr.mae,
    holdoutMae: ho.mae,
    trainR2: tr.r2,
    holdoutR2: ho.r2,
    gapRatio: gapRatio(tr.rmse, ho.rmse),
    paramsPerSample: p / train.rows,
    maxStdCoefficient: maxStd,
    maxStdCoefficientColumn: maxStdColumn,
    maxAbsCoefficient: maxAbs,
    columnSd,
    targetSd: targetStats.sd,
    targetRange: range(train.y, train.rows),
  };
  return { descriptor, design, fit, tables, metrics, trainPredictions, holdoutPredictions, folds, crossValidation, foldFactors };
}

/**
 * Index of the first of values[0..n) that is not within ±max (NaN included), or -1. A function of
 * its own so that fitModel is not optimised in the middle of this loop (see DEVELOPERS.md,
 * "Writing hot loops").
 */
function firstBeyond(values: Float64Array, n: number, max: number): number {
  for (let i = 0; i < n; i++) if (!(Math.abs(values[i]) <= max)) return i;
  return -1;
}

/**
 * InputError `design-overflow` when a block of the training design holds a value that is not a
 * finite number within ±{@link MAX_MAGNITUDE}: finite data can still overflow in a term (a huge
 * `shift` or `scale`, a high power of a large input), and sums of squares must stay finite.
 */
function checkFiniteBlock(design: Design, train: FittedModel['tables']['train'], descriptor: Descriptor, X: Float64Array, start: number, m: number): void {
  // In WebAssembly where it is in use (fit/wasm-kernels.ts); the loop below then only runs to
  // report a value that is out of range.
  const kernels = wasmKernels();
  if (kernels !== null && firstBeyondIn(kernels, X, design.p * m, MAX_MAGNITUDE) < 0) return;
  for (let j = 0; j < design.p; j++) {
    const base = j * m;
    for (let i = 0; i < m; i++) {
      const v = X[base + i];
      if (Math.abs(v) <= MAX_MAGNITUDE) continue;
      let term = 0;
      while (term + 1 < design.termOffsets.length && design.termOffsets[term + 1] <= j) term += 1;
      const line = design.terms[term]?.spec.line ?? descriptor.termsLine;
      throw new InputError(
        'design-overflow',
        `design column \`${clip(design.columnNames[j])}\` is ${v} at training row on line ${train.lines[start + i]} of ${clip(train.file)}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): use inputs of a smaller size, a lower degree, or a shift and scale near the data`,
        { file: descriptor.file, line, key: 'terms' },
      );
    }
  }
}

/** Training and hold-out RMSE of the descriptor's shipped coefficients. */
function scoreShipped(model: FittedModel): ShippedMetrics | null {
  const { descriptor, design, tables, fit } = model;
  const shipped = descriptor.coefficients;
  if (shipped === null) return null;
  if (shipped.length !== design.p) {
    throw new InputError(
      'coefficients-length',
      `\`coefficients\` has ${shipped.length} values but the terms build ${design.p} columns (${design.columnNames.slice(0, 12).map((c) => clip(c)).join(', ')}${design.p > 12 ? ', …' : ''}); expected one value per column, intercept first`,
      { file: descriptor.file, line: descriptor.coefficientsLine ?? undefined, key: 'coefficients' },
    );
  }
  const rmse = (data: ModelTables['train']): number => {
    const sums = emptySums();
    addErrors(sums, data.y, predictRows(design, data, shipped), data.rows);
    return errorMeasures(sums).rmse;
  };
  let diff = 0;
  for (let j = 0; j < design.p; j++) diff = Math.max(diff, Math.abs(shipped[j] - fit.coefficients[j]));
  return {
    train_rmse: jsonNumber(rmse(tables.train)),
    holdout_rmse: jsonNumber(rmse(tables.holdout)),
    max_coefficient_difference: jsonNumber(diff),
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
  };
}

/**
 * The outcome of a model that could not be checked. The message starts with the key path
 * (`` `terms[0].polynomial.degree`: ``) when the error has one, as {@link InputError.describe}
 * does, since the result keeps only the file and line of the location.
 */
export function errorResult(name: string, descriptor: string, error: InputError): ModelResult {
  const key = error.location.key;
  return {
    name,
    descriptor,
    verdict: 'error',
    rows: { train: 0, holdout: 0 },
    parameters: 0,
    columns: [],
    metrics: null,
    coefficients: [],
    shipped: null,
    checks: [],
    error: {
      message: key !== undefined && key !== '' ? `\`${clip(key)}\`: ${error.message}` : error.message,
      file: error.location.file ?? null,
      line: error.location.line ?? null,
      code: error.code,
    },
  };
}

/** The base commit's outcomes to compare with, by model name. */
export interface BaseInput {
  models: ReadonlyMap<string, ModelResult>;
  /** Full SHA of the base commit. */
  commit: string;
}

/** Relative change (head - base) / base; +Infinity when base is 0 and head is not; null when either is missing. */
function relativeChange(head: number, base: number): number | null {
  if (Number.isNaN(head) || Number.isNaN(base)) return null;
  if (base === 0) return head === 0 ? 0 : Infinity;
  return (head - base) / Math.abs(base);
}

/** The `base` field of a model result: `new`, or the base figures and the changes. */
function compareWithBase(metrics: ModelMetrics, baseline: ModelResult | null, commit: string): BaseComparison {
  if (baseline === null) {
    return { status: 'new', commit, holdout_rmse: null, gap_ratio: null, holdout_rmse_change: null, gap_ratio_change: null };
  }
  const b = baseline.metrics;
  const headRmse = fromJsonNumber(metrics.holdout_rmse);
  const headGap = fromJsonNumber(metrics.gap_ratio);
  const baseRmse = b ? fromJsonNumber(b.holdout_rmse) : Number.NaN;
  const baseGap = b ? fromJsonNumber(b.gap_ratio) : Number.NaN;
  const rmseChange = relativeChange(headRmse, baseRmse);
  const gapChange = Number.isNaN(headGap) || Number.isNaN(baseGap) ? null : headGap - baseGap;
  return {
    status: 'compared',
    commit,
    holdout_rmse: b ? b.holdout_rmse : null,
    gap_ratio: b ? b.gap_ratio : null,
    holdout_rmse_change: rmseChange === null ? null : jsonNumber(rmseChange),
    gap_ratio_change: gapChange === null ? null : jsonNumber(gapChange),
  };
}

/**
 * Fits one model and runs every check on it. Input problems become a model with verdict
 * `error` (the run goes on); anything else is re-thrown.
 * @param base outcomes on the base commit to compare with; default none (no `base` field)
 */
export async function evaluateModel(repo: RepoReader, descriptor: Descriptor, settings: SettingsFile, base?: BaseInput): Promise<ModelResult> {
  let model: FittedModel;
  let shipped: ShippedMetrics | null;
  try {
    model = await fitModel(repo, descriptor, settings);
    shipped = scoreShipped(model);
  } catch (error) {
    if (error instanceof InputError) return errorResult(descriptor.name, descriptor.file, error);
    // A fault of fitgate's own on this model's data: report it on this model (exit status 2) so
    // that every other model still gets its outcome; the code marks it as a bug to report.
    const detail = error instanceof Error ? error.message : String(error);
    return errorResult(descriptor.name, descriptor.file, new InputError(INTERNAL_ERROR, `fitgate could not compute this model (${detail}); this is a fault in fitgate, please report it with the descriptor and data`, { file: descriptor.file, line: descriptor.termsLine }));
  }
  // The pipeline's own passes already produced what the shared diagnostics would compute.
  const memo = new Map<string, unknown>([
    [SHARED_FOLDS_KEY, model.folds],
    [SHARED_FOLD_FACTORS_KEY, model.foldFactors],
  ]);
  if (model.crossValidation !== null) memo.set(SHARED_CROSS_VALIDATION_KEY, model.crossValidation);
  const context: CheckContext = {
    descriptor,
    design: model.design,
    fit: model.fit,
    metrics: model.metrics,
    train: model.tables.train,
    holdout: model.tables.holdout,
    baseline: base?.models.get(descriptor.name) ?? null,
    shared<T>(key: string, compute: () => T): T {
      if (!memo.has(key)) memo.set(key, compute());
      return memo.get(key) as T;
    },
  };
  const metrics = reportMetrics(model);
  const checks: CheckResult[] = [];
  let verdict: Verdict = 'pass';
  for (const check of CHECKS) {
    const { outcome, figures } = runCheck(check, context);
    checks.push(outcome);
    if (figures) Object.assign(metrics, figures);
    if (outcome.status === 'fail' || outcome.status === 'warn') verdict = worse(verdict, outcome.status);
  }
  return {
    name: descriptor.name,
    descriptor: descriptor.file,
    verdict,
    rows: { train: model.tables.train.rows, holdout: model.tables.holdout.rows },
    parameters: model.design.p,
    columns: [...model.design.columnNames],
    metrics,
    coefficients: Array.from(model.fit.coefficients, jsonNumber),
    shipped,
    checks,
    ...(base ? { base: compareWithBase(metrics, context.baseline, base.commit) } : {}),
    error: null,
    extra: {
      rank_deficient: model.fit.rankDeficient,
      terms: model.design.terms.map((t, i) => ({ kind: t.spec.kind, line: t.spec.line, first_column: model.design.termOffsets[i], columns: t.columnNames.length, fixed: t.fixed })),
    },
    charts: buildChartData(model, checks),
  };
}
