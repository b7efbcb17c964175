/**
 * The planned passes over a model's training rows, each building the design block by block
 * (memory grows with p^2 and the block size, never with rows x p):
 *
 * 1. the fold pass: each fold's rows into its own QR factor (the full factor is their merge),
 *    the design's range check and column spreads alongside;
 * 2. the refinement pass, where one step of iterative refinement converges and gains digits;
 * 3. the scoring pass: predictions, out-of-fold errors and leverages together.
 */
import { checkDeadline, TimeLimitExceeded } from '../core/deadline.js';
import { clip, InputError } from '../core/errors.js';
import { forEachBlock, predictRows } from '../design/blocks.js';
import { ColumnSpread } from '../design/column-spread.js';
import { scaleBlockRows, weightedDesign } from '../design/weighted-design.js';
import {
  complementFactors,
  crossValidate,
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
export function foldPass(plan: ModelPlan): FoldPass {
  const { design, tables, folds, descriptor } = plan;
  const train = tables.train;
  const builder = new FoldFactorBuilder(design.p, folds);
  const spread = new ColumnSpread(design.p);
  const scaling = plan.scaling ?? null;
  forEachBlock(design, train, (X, start, m) => {
    checkDeadline('fold pass');
    checkRange(plan, X, start, m);
    spread.add(X, m);
    // A weighted fit folds the rows scaled by sqrt(w) (design/weighted-design.ts).
    if (scaling !== null) scaleBlockRows(X, m, design.p, scaling.sqrtW, start);
    builder.add(X, scaling === null ? train.y : scaling.y, start, m);
  });
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
export function refinePass(plan: ModelPlan, fit: FitResult): FitResult {
  if (!refinementApplies(fit)) return fit;
  const train = plan.tables.train;
  const pass = new RefinementPass(fit);
  const scaling = plan.scaling ?? null;
  const y = scaling === null ? train.y : scaling.y;
  forEachBlock(plan.design, train, (X, start, m) => {
    checkDeadline('refinement pass');
    if (scaling !== null) scaleBlockRows(X, m, plan.design.p, scaling.sqrtW, start);
    pass.addRows(X, y.subarray(start, start + m), m);
  });
  return pass.finish();
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

/**
 * InputError `design-overflow` when a block of the training design holds a value that is not a
 * finite number within ±{@link MAX_MAGNITUDE}: finite data can still overflow in a term (a huge
 * `shift` or `scale`, a high power of a large input), and sums of squares must stay finite.
 */
function checkRange(plan: ModelPlan, X: Float64Array, start: number, m: number): void {
  const { design, descriptor } = plan;
  const train = plan.tables.train;
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
