/**
 * The planned passes over a model's training rows, each building the design block by block
 * (memory grows with p^2 and the block size, never with rows x p):
 *
 * 1. the fold pass: each fold's rows into its own QR factor (the full factor is their merge),
 *    the design's range check and column spreads alongside;
 * 2. the refinement pass, where one step of iterative refinement converges and gains digits;
 * 3. the scoring pass: predictions, out-of-fold errors and leverages together.
 *
 * The rows come from the plan's row source (data/row-source.ts): the columns in memory as one
 * chunk, or, for a training file too large to hold, the file read again on each pass; then the
 * scoring pass also gathers the training errors and the leakage scan, so that nothing of length
 * n is ever held ({@link streamedScoringPass}).
 */
import { checkDeadline, TimeLimitExceeded } from '../core/deadline.js';
import { clip, InputError } from '../core/errors.js';
import { blockRows, forEachBlock, predictRows } from '../design/blocks.js';
import type { RowChunk } from '../data/row-source.js';
import { foldIdsOf } from '../diagnostics/folds.js';
import { LeakageScan, type Leakage } from '../diagnostics/leakage.js';
import { addErrors, emptySums, type ErrorSums } from '../diagnostics/regression-metrics.js';
import { addProducts } from '../kernels/index.js';
import { ColumnSpread } from '../design/column-spread.js';
import { scaleBlockRows, weightedDesign } from '../design/weighted-design.js';
import {
  complementFactors,
  crossValidate,
  CrossValidationScorer,
  FoldFactorBuilder,
  mergeFactors,
  type CrossValidation,
  type FoldFactors,
} from '../diagnostics/cross-validation.js';
import { fitFactor, RefinementPass, refinementApplies, type FitResult } from '../fit/index.js';
import { firstBeyond } from '../kernels/index.js';
import { MAX_MAGNITUDE, type ModelPlan } from './plan.js';

/** What the fold pass yields. */
export interface FoldPass {
  /** The fit from the merged factor (before refinement). */
  fit: FitResult;
  /** Each fold's factor and each fold's complement (none below 2 folds). */
  foldFactors: FoldFactors;
  /** Population standard deviation of each design column over the training rows. */
  columnSd: Float64Array;
}

/**
 * Pass 1: folds every training row into its fold's factor, merges them and solves.
 * @throws InputError `design-overflow` when a design value is not within ±{@link MAX_MAGNITUDE}
 */
export async function foldPass(plan: ModelPlan): Promise<FoldPass> {
  const { design, folds, descriptor } = plan;
  const builder = new FoldFactorBuilder(design.p, folds);
  const spread = new ColumnSpread(design.p);
  const scaling = plan.scaling ?? null;
  let ids = new Int32Array(0);
  await plan.source.forEachChunk((chunk, first) => {
    if (folds.streamed === true && ids.length < chunk.rows) ids = new Int32Array(chunk.rows);
    const foldOf = foldIdsOf(folds, first, chunk.rows, ids);
    forEachBlock(design, chunk, (X, start, m) => {
      checkDeadline('fold pass');
      checkRange(plan, chunk, X, start, m);
      spread.add(X, m);
      // A weighted fit folds the rows scaled by sqrt(w) (design/weighted-design.ts).
      if (scaling !== null) scaleBlockRows(X, m, design.p, scaling.sqrtW, start);
      builder.add(X, scaling === null ? chunk.y : scaling.y, start, m, foldOf);
    });
  }, streamChunkRows(plan));
  checkDeadline('fold merges');
  const fit = fitFactor(mergeFactors(builder.factors, design.p), { ridge: descriptor.fit.ridge, penalised: design.penalised });
  checkDeadline('fit');
  const foldFactors = { perFold: builder.factors, complements: folds.k >= 2 ? complementFactors(builder.factors) : [] };
  return { fit, foldFactors, columnSd: spread.sd() };
}

/**
 * Pass 2: one step of iterative refinement where it applies (not for well-conditioned designs,
 * whose QR solution is already accurate to about 1e-14); the fit unchanged otherwise.
 */
export async function refinePass(plan: ModelPlan, fit: FitResult): Promise<FitResult> {
  if (!refinementApplies(fit)) return fit;
  const pass = new RefinementPass(fit);
  const scaling = plan.scaling ?? null;
  await plan.source.forEachChunk((chunk) => {
    const y = scaling === null ? chunk.y : scaling.y;
    forEachBlock(plan.design, chunk, (X, start, m) => {
      checkDeadline('refinement pass');
      if (scaling !== null) scaleBlockRows(X, m, plan.design.p, scaling.sqrtW, start);
      pass.addRows(X, y.subarray(start, start + m), m);
    });
  }, streamChunkRows(plan));
  return pass.finish();
}

/**
 * Rows per chunk of a streamed pass: a whole number of the design's blocks (design/blocks.ts)
 * near 65536 rows, so that the blocks, and with them every sum, are those of the in-memory path.
 */
function streamChunkRows(plan: ModelPlan): number {
  if (plan.chunkRows !== undefined) return plan.chunkRows;
  const block = blockRows(plan.design.p);
  return block * Math.max(1, Math.floor(65536 / block));
}

/** What the scoring pass yields. */
export interface ScoringPass {
  trainPredictions: Float64Array;
  holdoutPredictions: Float64Array;
  /** Cross-validation figures; null when they could not be computed (the check says why). */
  crossValidation: CrossValidation | null;
}

/** Pass 3: training predictions with the cross-validation in one pass, then the hold-out rows. */
export function scoringPass(plan: ModelPlan, fit: FitResult, foldFactors: FoldFactors): ScoringPass {
  const { design, tables, folds } = plan;
  const { train, holdout } = tables;
  let trainPredictions: Float64Array = new Float64Array(train.rows);
  let crossValidation: CrossValidation | null;
  const scaling = plan.scaling ?? null;
  try {
    if (scaling === null) {
      crossValidation = crossValidate(design, train, fit, folds, {
        factors: foldFactors.perFold,
        complements: foldFactors.complements,
        predictions: trainPredictions,
      });
    } else {
      // The scaled problem's errors are sqrt(w) times the residuals: weighted cross-validation.
      const rows = { inputs: train.inputs, y: scaling.y, rows: train.rows };
      crossValidation = crossValidate(weightedDesign(design, scaling), rows, fit, folds, {
        factors: foldFactors.perFold,
        complements: foldFactors.complements,
      });
      trainPredictions = predictRows(design, train, fit.coefficients);
    }
  } catch (error) {
    if (error instanceof TimeLimitExceeded) throw error;
    // The cross-validation check runs it again and reports why it could not be computed (as a
    // check that throws does); the fit itself stands.
    crossValidation = null;
    trainPredictions = predictRows(design, train, fit.coefficients);
  }
  return { trainPredictions, holdoutPredictions: predictRows(design, holdout, fit.coefficients), crossValidation };
}

/** What the scoring pass of a streamed model yields: sums instead of n-length predictions. */
export interface StreamedScoring {
  /** Error sums of the fit's training predictions over every row. */
  trainSums: ErrorSums;
  /** Error sums of the shipped coefficients' training predictions, when the descriptor ships some. */
  shippedTrainSums: ErrorSums | null;
  /** The fit's predictions of the sample rows (`tables.train`), for the checks and charts that read rows. */
  samplePredictions: Float64Array;
  holdoutPredictions: Float64Array;
  crossValidation: CrossValidation | null;
  /** Hold-out rows repeating a training row, from every training row streamed past the hold-out rows. */
  leakage: Leakage;
}

/**
 * Pass 3 of a streamed model, in one read of the file: per chunk the cross-validation scoring
 * (out-of-fold errors, residuals, leverages), the training error sums of the fit and of shipped
 * coefficients, and the leakage scan; predictions are made block by block and dropped.
 */
export async function streamedScoringPass(
  plan: ModelPlan,
  fit: FitResult,
  foldFactors: FoldFactors,
  shipped: readonly number[] | null,
): Promise<StreamedScoring> {
  const { design, tables, folds } = plan;
  const { holdout } = tables;
  const scorer = new CrossValidationScorer(design, fit, folds, { factors: foldFactors.perFold, complements: foldFactors.complements });
  const trainSums = emptySums();
  const shippedTrainSums = shipped === null ? null : emptySums();
  const leakage = new LeakageScan(holdout);
  let predictions = new Float64Array(0);
  let other = new Float64Array(0);
  await plan.source.forEachChunk((chunk) => {
    checkDeadline('scoring pass');
    if (predictions.length < chunk.rows) {
      predictions = new Float64Array(chunk.rows);
      other = new Float64Array(shipped === null ? 0 : chunk.rows);
    }
    scorer.addRows(chunk, predictions);
    addErrors(trainSums, chunk.y, predictions, chunk.rows);
    if (shipped !== null && shippedTrainSums !== null) {
      other.fill(0, 0, chunk.rows);
      forEachBlock(design, chunk, (X, start, m) => addProducts(other, start, X, m, shipped, design.p));
      addErrors(shippedTrainSums, chunk.y, other, chunk.rows);
    }
    leakage.add(chunk);
  }, streamChunkRows(plan));
  return {
    trainSums,
    shippedTrainSums,
    samplePredictions: predictRows(design, tables.train, fit.coefficients),
    holdoutPredictions: predictRows(design, holdout, fit.coefficients),
    crossValidation: scorer.finish(plan.rows),
    leakage: leakage.finish(),
  };
}

/**
 * InputError `design-overflow` when a block of the training design holds a value that is not a
 * finite number within ±{@link MAX_MAGNITUDE}: finite data can still overflow in a term (a huge
 * `shift` or `scale`, a high power of a large input), and sums of squares must stay finite.
 */
function checkRange(plan: ModelPlan, train: RowChunk, X: Float64Array, start: number, m: number): void {
  const { design, descriptor } = plan;
  const at = firstBeyond(X, design.p * m, MAX_MAGNITUDE);
  if (at < 0) return;
  const j = Math.floor(at / m);
  const i = at % m;
  let term = 0;
  while (term + 1 < design.termOffsets.length && design.termOffsets[term + 1] <= j) term += 1;
  const line = design.terms[term]?.spec.line ?? descriptor.termsLine;
  throw new InputError(
    'design-overflow',
    `design column \`${clip(design.columnNames[j])}\` is ${X[at]} at training row on line ${train.lines[start + i]} of ${clip(train.file)}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): use inputs of a smaller size, a lower degree, or a shift and scale near the data`,
    { file: descriptor.file, line, key: 'terms' },
  );
}
