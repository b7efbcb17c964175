/**
 * Cross-validation without refitting from scratch: k-fold from per-fold QR factors merged
 * (one pass over the rows to build them, one to score), leave-one-out from the full fit's
 * leverages (PRESS), and generalised cross-validation from the hat matrix trace.
 */
import type { ModelData } from '../data/model-data.js';
import type { Design } from '../design/design-matrix.js';
import { leveragesInto, QrAccumulator, solveCoefficients, type FitResult } from '../fit/index.js';
import { forEachBlock } from '../design/blocks.js';
import { addProducts, outOfFoldRows } from '../kernels/index.js';
import { foldIdsOf, type Folds } from './folds.js';
import { checkDeadline } from '../core/deadline.js';
import { borrowDoubles, borrowInts, returnDoubles, returnInts } from '../core/scratch.js';

/** The rows a diagnostic reads: input columns in `design.inputs` order and the target. */
export type Rows = Pick<ModelData, 'inputs' | 'y' | 'rows'>;

/** Leverages within this distance of 1 count as 1 (the row is interpolated; its LOO error is infinite). */
export const LEVERAGE_ONE_TOLERANCE = 1e-10;

/**
 * Folds design blocks into one QR factor per fold as they stream past: a block whose rows all
 * belong to one fold (the usual case for `blocks` folds) goes in as it is; otherwise its rows are
 * gathered per fold into a scratch block first. Rows enter each fold's factor in file order.
 */
export class FoldFactorBuilder {
  /** One accumulator per fold (data rows only, no penalty). */
  readonly factors: QrAccumulator[];
  readonly #folds: Folds;
  readonly #p: number;
  readonly #counts: Int32Array;

  /**
   * @param p design columns
   * @param folds fold of each row
   */
  constructor(p: number, folds: Folds) {
    this.#p = p;
    this.#folds = folds;
    this.factors = Array.from({ length: folds.k }, () => new QrAccumulator(p));
    this.#counts = new Int32Array(folds.k);
  }

  /**
   * Adds rows [start, start + m) given as a column-major m x p block and their targets.
   *
   * @param X column-major m x p block
   * @param y targets of the whole data set (indexed from `start`)
   * @param start first row
   * @param m rows in the block
   * @param foldOf fold of each row, indexed like `y`; default the folds' own table
   */
  add(X: Float64Array, y: Float64Array, start: number, m: number, foldOf: Int32Array = this.#folds.foldOf): void {
    const p = this.#p;
    const k = this.#folds.k;
    if (m === 0) return;
    const first = foldOf[start];
    if (oneFold(foldOf, start, m)) {
      this.factors[first].addRows(X, y.subarray(start, start + m), m);
      return;
    }
    // The gathered rows go to arrays lent for this block (core/scratch.ts): fold f's rows, in file
    // order, as a column-major block of its own at offsets[f] rows into them. Each row is read
    // once: runs of consecutive rows of one fold (every fold's rows for `blocks` folds) are copied
    // column by column, scattered rows one by one.
    const sub = borrowDoubles(m * p);
    const subY = borrowDoubles(m);
    const offsets = borrowInts(2 * k);
    try {
      const counts = this.#counts;
      counts.fill(0);
      const runs = countRows(foldOf, start, m, counts);
      let at = 0;
      for (let f = 0; f < k; f++) {
        offsets[f] = at;
        offsets[k + f] = 0;
        at += counts[f];
      }
      if (runs * 4 <= m) copyRuns(X, y, start, m, p, foldOf, counts, offsets, k, sub, subY);
      else scatterRows(X, y, start, m, p, foldOf, counts, offsets, k, sub, subY);
      for (let f = 0; f < k; f++) {
        const mf = counts[f];
        if (mf === 0) continue;
        const from = offsets[f];
        this.factors[f].addRows(sub.subarray(from * p, (from + mf) * p), subY.subarray(from, from + mf), mf);
      }
    } finally {
      returnInts(offsets);
      returnDoubles(subY);
      returnDoubles(sub);
    }
  }
}

// The row loops of FoldFactorBuilder.add, one loop each (see DEVELOPERS.md, "Writing hot loops").

/** counts[f] += rows of fold f among rows start .. start+m-1; returns the number of runs of consecutive rows of one fold. */
function countRows(foldOf: Int32Array, start: number, m: number, counts: Int32Array): number {
  let runs = 0;
  for (let i = 0; i < m; i++) {
    const f = foldOf[start + i];
    counts[f]++;
    if (i === 0 || f !== foldOf[start + i - 1]) runs++;
  }
  return runs;
}

/**
 * Copies each run of consecutive rows of one fold into its fold's block (see
 * FoldFactorBuilder.add): its column segments and targets as whole pieces. offsets[k + f] counts
 * fold f's rows written so far.
 */
function copyRuns(
  X: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  p: number,
  foldOf: Int32Array,
  counts: Int32Array,
  offsets: Int32Array,
  k: number,
  sub: Float64Array,
  subY: Float64Array,
): void {
  let i = 0;
  while (i < m) {
    const f = foldOf[start + i];
    let end = i + 1;
    while (end < m && foldOf[start + end] === f) end++;
    const mf = counts[f];
    const r = offsets[k + f];
    const base = offsets[f] * p;
    for (let j = 0; j < p; j++) sub.set(X.subarray(j * m + i, j * m + end), base + j * mf + r);
    subY.set(y.subarray(start + i, start + end), offsets[f] + r);
    offsets[k + f] = r + end - i;
    i = end;
  }
}

/** Writes each row into its fold's block (see FoldFactorBuilder.add), rows in file order. */
function scatterRows(
  X: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  p: number,
  foldOf: Int32Array,
  counts: Int32Array,
  offsets: Int32Array,
  k: number,
  sub: Float64Array,
  subY: Float64Array,
): void {
  for (let i = 0; i < m; i++) {
    const f = foldOf[start + i];
    const mf = counts[f];
    const r = offsets[k + f]++;
    const base = offsets[f] * p + r;
    for (let j = 0; j < p; j++) sub[base + j * mf] = X[j * m + i];
    subY[offsets[f] + r] = y[start + i];
  }
}

/** True when rows start .. start+m-1 (m >= 1) all belong to one fold (one loop per function; see DEVELOPERS.md, "Writing hot loops"). */
function oneFold(foldOf: Int32Array, start: number, m: number): boolean {
  const first = foldOf[start];
  for (let i = 1; i < m; i++) if (foldOf[start + i] !== first) return false;
  return true;
}

/**
 * Folds the rows of each fold into its own QR factor in one pass over the rows.
 *
 * @param design the model's design (p columns)
 * @param data rows (n = data.rows, equal to folds.foldOf.length)
 * @param folds fold of each row
 * @returns k accumulators, one per fold (data rows only, no penalty)
 */
export function foldFactors(design: Design, data: Rows, folds: Folds): QrAccumulator[] {
  const builder = new FoldFactorBuilder(design.p, folds);
  forEachBlock(design, data, (X, start, m) => {
    checkDeadline('fold factors');
    builder.add(X, data.y, start, m);
  });
  return builder.factors;
}

/**
 * The factor of every row: the merge of the per-fold factors (a QR factor of stacked rows is the
 * factor of the stacked factors; Golub & Van Loan, Matrix Computations, 4th ed., sec. 6.5.2).
 *
 * @param factors per-fold factors (not modified)
 * @param p columns (used when there are no factors)
 */
export function mergeFactors(factors: readonly QrAccumulator[], p: number): QrAccumulator {
  if (factors.length === 0) return new QrAccumulator(p);
  const all = factors[0].clone();
  for (let f = 1; f < factors.length; f++) all.merge(factors[f]);
  return all;
}

/**
 * For each fold f, the factor of every other fold's rows: prefix and suffix merges, so k folds
 * cost about 3k merges of p x p factors instead of k(k-1).
 *
 * @param factors per-fold factors from {@link foldFactors} (not modified)
 * @returns k accumulators; entry f holds every row not in fold f
 */
export function complementFactors(factors: readonly QrAccumulator[]): QrAccumulator[] {
  const k = factors.length;
  if (k === 0) return [];
  const p = factors[0].p;
  const prefix: QrAccumulator[] = [new QrAccumulator(p)];
  for (let f = 1; f < k; f++) {
    checkDeadline('fold merges');
    const next = prefix[f - 1].clone();
    next.merge(factors[f - 1]);
    prefix.push(next);
  }
  const out: QrAccumulator[] = new Array<QrAccumulator>(k);
  let suffix = new QrAccumulator(p);
  for (let f = k - 1; f >= 0; f--) {
    checkDeadline('fold merges');
    const without = prefix[f];
    if (suffix.rows > 0) without.merge(suffix);
    out[f] = without;
    if (f > 0) {
      const s = factors[f].clone();
      if (suffix.rows > 0) s.merge(suffix);
      suffix = s;
    }
  }
  return out;
}

/** Per-fold QR factors of the training rows and, for each fold, the factor of every other fold. */
export interface FoldFactors {
  /** perFold[f]: the rows of fold f (data rows only, no penalty). */
  perFold: readonly QrAccumulator[];
  /** complements[f]: every row not in fold f (see {@link complementFactors}). */
  complements: readonly QrAccumulator[];
}

/**
 * Squared out-of-fold errors from the fold factors alone, without a pass over the rows: with fold
 * f's rows X_f = Q_f [R_f; 0] and Q_f^T y_f = [qty_f; r_f],
 *
 *     ||y_f - X_f w||^2 = ||qty_f - R_f w||^2 + ||r_f||^2
 *
 * for any w, because Q_f is orthogonal (Golub & Van Loan, Matrix Computations, 4th ed., sec.
 * 5.3.3, the least-squares residual from a QR factorisation). Both terms are sums of squares, so
 * nothing cancels; it holds whatever the fold's rank. Costs p^2 per fold and coefficient set.
 *
 * @param perFold per-fold factors (fold f's rows only)
 * @param coefficients coefficients[s][f]: length-p coefficients of setting s fitted without fold f
 * @returns sse[s][f], as {@link outOfFoldErrors} gives them from a pass over the rows
 */
export function outOfFoldErrorsFromFactors(
  perFold: readonly QrAccumulator[],
  coefficients: readonly (readonly Float64Array[])[],
): OutOfFoldErrors {
  const sse = coefficients.map((bySet) =>
    perFold.map((acc, f) => {
      const p = acc.p;
      const R = acc.R;
      const qty = acc.qty;
      const w = bySet[f];
      let sum = acc.rss;
      for (let i = 0; i < p; i++) {
        // (R w)_i: R is upper triangular, column-major.
        let t = 0;
        for (let j = i; j < p; j++) t += R[j * p + i] * w[j];
        const d = qty[i] - t;
        sum += d * d;
      }
      return sum;
    }),
  );
  return { sse };
}

/** Sum of squared out-of-fold errors per fold, for several coefficient sets at once. */
export interface OutOfFoldErrors {
  /** sse[s][f]: squared errors of fold f's rows under coefficient set s (fitted without fold f). */
  sse: number[][];
}

/**
 * Scores each row with the coefficients fitted without its fold, for S settings at once, in one
 * pass over the rows. `visit` (optional) sees every design block too (for further figures in the
 * same pass).
 *
 * @param design the design (p columns)
 * @param data rows
 * @param folds fold of each row
 * @param coefficients coefficients[s][f]: length-p coefficients of setting s fitted without fold f
 * @param visit called with each block (column-major m x p), its first row and m
 * @param rowFolds for one chunk of a streamed model: its rows' folds (indexed like `data`) and
 *   the sse table to add into (returned); default the folds' own table and a new sse table
 */
export function outOfFoldErrors(
  design: Design,
  data: Rows,
  folds: Folds,
  coefficients: readonly (readonly Float64Array[])[],
  visit?: (X: Float64Array, start: number, m: number) => void,
  rowFolds?: { foldOf: Int32Array; sse: number[][] },
): OutOfFoldErrors {
  const p = design.p;
  const k = folds.k;
  const S = coefficients.length;
  // A streamed model's chunks add into one running table (rowFolds.sse), each with its rows' folds.
  const sse = rowFolds?.sse ?? Array.from({ length: S }, () => new Array<number>(k).fill(0));
  const foldOf = rowFolds?.foldOf ?? folds.foldOf;
  // W[s][j * k + f]: coefficient j of setting s fitted without fold f (one flat table per setting).
  const tables = coefficients.map((bySet) => {
    const t = new Float64Array(p * k);
    for (let f = 0; f < k; f++) for (let j = 0; j < p; j++) t[j * k + f] = bySet[f][j];
    return t;
  });
  forEachBlock(design, data, (X, start, m) => {
    checkDeadline('out-of-fold scoring');
    // The block's fold when all its rows share one (the usual case for `blocks` folds), else -1.
    const single = m > 0 && oneFold(foldOf, start, m) ? foldOf[start] : -1;
    const folds = foldOf.subarray(start, start + m);
    const y = data.y.subarray(start, start + m);
    for (let s = 0; s < S; s++) outOfFoldRows(X, m, p, tables[s], k, folds, single, y, sse[s]);
    visit?.(X, start, m);
  });
  return { sse };
}

/** Mean of the fold errors and its standard error (for the one-standard-error rule). */
export interface FoldErrorSummary {
  /** sqrt(sum of all squared out-of-fold errors / n) (pooled over rows). */
  cvRmse: number;
  /** Mean squared error of each fold's rows. */
  foldMse: number[];
  /** Mean of the fold MSEs, CV(f) of ESL eq. 7.48 with equal weights. */
  meanMse: number;
  /** Standard error of `meanMse`: sample sd of the fold MSEs / sqrt(k) (ESL section 7.10). */
  seMse: number;
}

/**
 * Summarises per-fold squared error sums.
 *
 * @param sse per-fold sums of squared out-of-fold errors (length k)
 * @param sizes rows per fold (length k)
 */
export function summariseFolds(sse: readonly number[], sizes: readonly number[]): FoldErrorSummary {
  const k = sse.length;
  let total = 0;
  let n = 0;
  const foldMse = sse.map((s, f) => {
    total += s;
    n += sizes[f];
    return sizes[f] > 0 ? s / sizes[f] : Number.NaN;
  });
  const meanMse = foldMse.reduce((a, b) => a + b, 0) / k;
  let ss = 0;
  for (const v of foldMse) ss += (v - meanMse) * (v - meanMse);
  const seMse = k > 1 ? Math.sqrt(ss / (k - 1)) / Math.sqrt(k) : Number.NaN;
  return { cvRmse: n > 0 ? Math.sqrt(total / n) : Number.NaN, foldMse, meanMse, seMse };
}

/** Coefficients of every complement fit, for each ridge penalty given. */
export function complementCoefficients(
  complements: readonly QrAccumulator[],
  ridges: readonly number[],
  penalised: ArrayLike<boolean>,
): Float64Array[][] {
  return ridges.map((ridge) =>
    complements.map((acc) => {
      checkDeadline('fold solves');
      return solveCoefficients(acc, { ridge, penalised });
    }),
  );
}

/** Every cross-validation figure of one fit. */
export interface CrossValidation {
  /** Folds used (k >= 2), their order and seed. */
  k: number;
  foldSizes: number[];
  /** k-fold RMSE pooled over rows: sqrt(sum of squared out-of-fold errors / n). NaN when k < 2. */
  cvRmse: number;
  /** RMSE of each fold's rows under the fit without that fold. */
  foldRmse: number[];
  /** Fold MSE mean and standard error (for the one-standard-error rule). */
  meanMse: number;
  seMse: number;
  /** sqrt(mean((e_i / (1 - h_ii))^2)); Infinity when a row has leverage 1. */
  loocvRmse: number;
  /** PRESS = sum (e_i / (1 - h_ii))^2 (Allen 1974). */
  press: number;
  /** Generalised cross-validation mean(e_i^2) / (1 - df/n)^2 (Golub, Heath & Wahba 1979); Infinity when df >= n. */
  gcv: number;
  /** Trace of the hat matrix (effective degrees of freedom). */
  effectiveDf: number;
  /** Sum of the leverages over the rows (equals `effectiveDf` up to rounding). */
  leverageSum: number;
  /** Largest leverage. */
  maxLeverage: number;
  /** Rows whose leverage is 1 within {@link LEVERAGE_ONE_TOLERANCE}. */
  rowsWithLeverageOne: number;
  /** Training residual sum of squares sum e_i^2 (from the same pass). */
  rss: number;
  /** Rows. */
  n: number;
}

/** Work {@link crossValidate} can take from a caller that already has it. */
export interface CrossValidateOptions {
  /** Per-fold factors of the same rows and folds (from {@link FoldFactorBuilder}); default: built in a first pass. */
  factors?: readonly QrAccumulator[];
  /** Their complements ({@link complementFactors} of `factors`); default: merged here. */
  complements?: readonly QrAccumulator[];
  /** When given (length >= n), receives the full fit's training predictions from the scoring pass. */
  predictions?: Float64Array;
}

/**
 * k-fold cross-validation, leave-one-out and generalised cross-validation of a fit, in two passes
 * over the training rows (one when the per-fold factors are given).
 *
 * Pass 1 folds each fold's rows into its own QR factor; the fit without fold f solves the merge of
 * the other factors with the same ridge penalty (exactly the fit a refit on those rows gives,
 * because a QR factor of stacked rows is the factor of the stacked factors). Pass 2 scores every
 * row under the fit without its fold and, in the same pass, takes the full fit's residual e_i and
 * leverage h_ii = x_i^T (X^T X + lambda E^T E)^+ x_i.
 *
 * - k-fold: cv_rmse = sqrt(sum over rows of squared out-of-fold errors / n).
 * - Leave-one-out by the PRESS shortcut: the residual of row i under the fit without row i is
 *   e_i / (1 - h_ii) (Allen, "The relationship between variable selection and data augmentation
 *   and a method for prediction", Technometrics 16(1), 1974; holds for ridge with the same
 *   penalty too); loocv_rmse = sqrt(mean((e_i / (1 - h_ii))^2)). A row with h_ii = 1 (the fit
 *   interpolates it) gives an infinite figure.
 * - GCV = mean(e_i^2) / (1 - df/n)^2 with df = trace of the hat matrix (Golub, Heath & Wahba,
 *   "Generalized cross-validation as a method for choosing a good ridge parameter",
 *   Technometrics 21(2), 1979, eq. 1.4 up to the factor n).
 *
 * @param design the model's design (p columns)
 * @param data training rows (n rows)
 * @param fit the full fit (its ridge and penalised mask are reused)
 * @param folds fold assignment of the n rows
 * @param options per-fold factors already built, and a buffer for the training predictions (default none)
 */
export function crossValidate(
  design: Design,
  data: Rows,
  fit: FitResult,
  folds: Folds,
  options: CrossValidateOptions = {},
): CrossValidation {
  const scorer = new CrossValidationScorer(design, fit, folds, {
    ...options,
    factors: options.factors ?? (options.complements || folds.k < 2 ? undefined : foldFactors(design, data, folds)),
  });
  scorer.addRows(data, options.predictions);
  return scorer.finish(data.rows);
}

/**
 * The scoring pass of {@link crossValidate} over rows that arrive in chunks (a streamed model,
 * data/row-source.ts): {@link addRows} per chunk in file order, then {@link finish}. Fed the whole
 * rows as one chunk it is {@link crossValidate}, addition for addition.
 */
export class CrossValidationScorer {
  readonly #design: Design;
  readonly #fit: FitResult;
  readonly #folds: Folds;
  readonly #coefficients: Float64Array[][];
  readonly #sse: number[][];
  #press = 0;
  #rss = 0;
  #leverageSum = 0;
  #maxLeverage = 0;
  #rowsWithLeverageOne = 0;
  #ids = new Int32Array(0);
  #rows = 0;

  /**
   * @param design the model's design
   * @param fit the full fit
   * @param folds fold assignment of every row (in-memory or streamed)
   * @param options the per-fold factors or their complements (one of them is needed for k >= 2)
   */
  constructor(design: Design, fit: FitResult, folds: Folds, options: Pick<CrossValidateOptions, 'factors' | 'complements'>) {
    this.#design = design;
    this.#fit = fit;
    this.#folds = folds;
    let coefficients: Float64Array[][] = [];
    if (folds.k >= 2) {
      const complements = options.complements ?? complementFactors(options.factors ?? []);
      coefficients = complementCoefficients(complements, [fit.ridge], fit.penalised);
    }
    this.#coefficients = coefficients;
    this.#sse = coefficients.map(() => new Array<number>(folds.k).fill(0));
  }

  /**
   * Scores the next chunk of rows (rows #rows .. #rows + data.rows - 1 of the model).
   * @param predictions when given (length >= data.rows), receives the full fit's predictions
   */
  addRows(data: Rows, predictions?: Float64Array): void {
    const { p } = this.#design;
    const fit = this.#fit;
    const w = fit.coefficients;
    const first = this.#rows;
    if (this.#ids.length < data.rows && this.#folds.streamed === true) this.#ids = new Int32Array(data.rows);
    const foldOf = foldIdsOf(this.#folds, first, data.rows, this.#ids);
    // One block's rows: the full fit's leverages h and predictions pred (arrays of m zeros), then its sums.
    const scoreBlock = (X: Float64Array, start: number, m: number, h: Float64Array, pred: Float64Array): void => {
      leveragesInto(fit, X, m, h);
      addProducts(pred, 0, X, m, w, p);
      if (predictions !== undefined) predictions.set(pred.subarray(0, m), start);
      // The sums run in locals and are stored once per block: the same additions in the same order,
      // without boxing a number into the closure's context on every row.
      let blockRss = this.#rss;
      let blockPress = this.#press;
      let blockLeverageSum = this.#leverageSum;
      let blockMaxLeverage = this.#maxLeverage;
      let blockOnes = this.#rowsWithLeverageOne;
      const y = data.y;
      for (let i = 0; i < m; i++) {
        const e = y[start + i] - pred[i];
        blockRss += e * e;
        const hi = h[i];
        blockLeverageSum += hi;
        if (hi > blockMaxLeverage) blockMaxLeverage = hi;
        if (1 - hi <= LEVERAGE_ONE_TOLERANCE) {
          blockOnes++;
          blockPress = Infinity;
        } else {
          const loo = e / (1 - hi);
          blockPress += loo * loo;
        }
      }
      this.#rss = blockRss;
      this.#press = blockPress;
      this.#leverageSum = blockLeverageSum;
      this.#maxLeverage = blockMaxLeverage;
      this.#rowsWithLeverageOne = blockOnes;
    };
    const visit = (X: Float64Array, start: number, m: number): void => {
      // The block's leverages and predictions go to arrays of zeros lent for the block (core/scratch.ts).
      const h = borrowDoubles(m);
      const pred = borrowDoubles(m);
      try {
        scoreBlock(X, start, m, h, pred);
      } finally {
        returnDoubles(pred);
        returnDoubles(h);
      }
    };
    outOfFoldErrors(this.#design, data, this.#folds, this.#coefficients, visit, { foldOf, sse: this.#sse });
    this.#rows += data.rows;
  }

  /** The figures over every row added; `n` is their count. */
  finish(n: number = this.#rows): CrossValidation {
    const folds = this.#folds;
    const k = folds.k;
    const summary = k >= 2 ? summariseFolds(this.#sse[0], folds.sizes) : null;
    const df = this.#fit.degreesOfFreedom;
    const rss = this.#rss;
    const press = this.#press;
    const gcvDenominator = 1 - df / n;
    const gcv = n === 0 ? Number.NaN : gcvDenominator > LEVERAGE_ONE_TOLERANCE ? rss / n / (gcvDenominator * gcvDenominator) : Infinity;
    return {
      k,
      foldSizes: [...folds.sizes],
      cvRmse: summary ? summary.cvRmse : Number.NaN,
      foldRmse: summary ? summary.foldMse.map(Math.sqrt) : [],
      meanMse: summary ? summary.meanMse : Number.NaN,
      seMse: summary ? summary.seMse : Number.NaN,
      loocvRmse: n > 0 ? Math.sqrt(press / n) : Number.NaN,
      press,
      gcv,
      effectiveDf: df,
      leverageSum: this.#leverageSum,
      maxLeverage: this.#maxLeverage,
      rowsWithLeverageOne: this.#rowsWithLeverageOne,
      rss,
      n,
    };
  }
}
