/**
 * The fitting engine: least squares and ridge from a streaming Householder QR factor, with
 * rank and conditioning diagnostics. This module decides how to solve (triangular substitution
 * or truncated SVD, with or without penalty rows); the solvers know nothing of that choice.
 *
 * Accuracy: on the 11 NIST StRD linear least-squares datasets (raw designs, no centring),
 * `fitDesign(..., { refine: true })` agrees with the certified coefficients and residual SD to at
 * least 9 significant digits, 7.7 on Filip (plain QR: at least 6.5, Wampler5 being the weakest;
 * see test/fit/nist-strd.test.ts, which prints every dataset's figures).
 */
import { FactorSolver, rawSingularValues, scaledSpectrum } from './factor-solver.js';
import { QrAccumulator } from './qr-accumulator.js';
import { checkPenalty, penalisedFactor } from './ridge.js';
import { firstNotFinite, leverageRows, refineRows, residualsInto, sumOfSquares } from '../kernels/index.js';

export { QrAccumulator } from './qr-accumulator.js';

/** Options of {@link fitFactor}. */
export interface FitOptions {
  /** Ridge penalty lambda >= 0; 0 = least squares. Default 0. */
  ridge?: number;
  /** Which columns the penalty applies to (length p); the intercept column is not penalised. Default: all. */
  penalised?: ArrayLike<boolean>;
}

/** Options of {@link fitDesign}. */
export interface FitDesignOptions extends FitOptions {
  /**
   * One step of iterative refinement in a second pass over the data: r = y - X w,
   * g = X^T r - lambda E w, w += (R^T R)^+ g (the corrected semi-normal equations step, Björck,
   * Numerical Methods for Least Squares Problems, SIAM 1996, sec. 2.5.3 and 6.6.5), with the
   * residuals accumulated in compensated (double-double) arithmetic. `rss` is then recomputed
   * from the data at the refined coefficients. Default false.
   */
  refine?: boolean;
}

/** The solution and diagnostics of one fit. */
export interface FitResult {
  /** Coefficients, length p. */
  coefficients: Float64Array;
  /** Numerical rank of the (column-scaled) design, without penalty rows. */
  rank: number;
  /** rank < p (then `coefficients` is the minimum-norm solution). */
  rankDeficient: boolean;
  /** s_max/s_min of the design as built (raw columns, no penalty rows); Infinity when singular (rank < p). */
  conditionNumber: number;
  /** The same for the design with each column scaled to unit 2-norm. */
  conditionNumberScaled: number;
  /** Singular values of the unit-norm-column design, descending (length p). */
  singularValuesScaled: Float64Array;
  /**
   * Columns taking part in the most nearly collinear combination: indices j with |v_j| >= 0.1
   * (at least 1% of the squared weight) in the unit right singular vector v of the smallest
   * scaled singular value, plus every all-zero column, ascending. Always filled when p >= 1;
   * judge it by `conditionNumberScaled`.
   */
  collinearColumns: number[];
  /** The factor of the design plus penalty rows (what the coefficients solve), for leverages and re-solves. */
  factor: QrAccumulator;
  /** Residual sum of squares of the data rows at the solution (no penalty term). */
  rss: number;
  /** Numerical rank of `factor` (design plus penalty rows) used for the solve. */
  factorRank: number;
  /**
   * Effective number of parameters: trace of the hat matrix X (X^T X + lambda E)^+ X^T. Equals
   * `rank` for least squares and sum_j d_j^2 / (d_j^2 + lambda) for ridge on every column (d_j
   * the singular values of X; Hastie, Tibshirani & Friedman, The Elements of Statistical
   * Learning, 2nd ed., eq. 3.50).
   */
  degreesOfFreedom: number;
  /** The penalty used (0 for least squares). */
  ridge: number;
  /** Which columns the penalty applied to (length p; all true when nothing was specified). */
  penalised: boolean[];
  /** Whether a refinement step was applied ({@link FitDesignOptions.refine}). */
  refined: boolean;
}

/** The rank and conditioning diagnostics of a design, as {@link FitResult} states them. */
export type FactorDiagnostics = Pick<
  FitResult,
  'rank' | 'rankDeficient' | 'conditionNumber' | 'conditionNumberScaled' | 'singularValuesScaled' | 'collinearColumns'
>;

/**
 * Rank, condition numbers, scaled singular values and nearly collinear columns of a design from
 * an R factor of it (R^T R = X^T X; a QR factor, or a Cholesky factor of the Gram as
 * fit/gram-step.ts's gramFactor makes one), as {@link fitFactor} reports them: rank from the
 * column-scaled factor (factor-solver.ts, s_i > max(rows, p) eps s_max).
 * @param R p x p upper triangular, column-major
 * @param p columns (>= 1)
 * @param rows rows of the design (for the rank tolerance)
 */
export function factorDiagnostics(R: Float64Array, p: number, rows: number): FactorDiagnostics {
  const spectrum = scaledSpectrum(R, p, rows);
  const rank = spectrum.rank;
  const rankDeficient = rank < p;
  const sRaw = rawSingularValues(R, p);
  const conditionNumber = rankDeficient ? Infinity : sRaw[0] / sRaw[p - 1];
  const sScaled = spectrum.singularValues;
  const conditionNumberScaled = rankDeficient ? Infinity : sScaled[0] / sScaled[p - 1];
  const collinearColumns: number[] = [];
  for (let j = 0; j < p; j++) {
    if (spectrum.columnNorms[j] === 0 || Math.abs(spectrum.V[(p - 1) * p + j]) >= 0.1) collinearColumns.push(j);
  }
  return { rank, rankDeficient, conditionNumber, conditionNumberScaled, singularValuesScaled: sScaled, collinearColumns };
}

/**
 * Solves least squares or ridge from a data factor (data rows only). Never mutates `data`.
 *
 * Rank is decided on the column-scaled factor (see factor-solver.ts: s_i > max(n, p) eps s_max).
 * Full rank: back-substitution on R (most accurate). Rank deficient, or fewer rows than
 * parameters: the minimum-norm least-squares solution from the truncated SVD of R. Ridge solves
 * [X; sqrt(lambda) E] w ~ [y; 0] with E selecting the penalised columns.
 *
 * Edge cases: 0 rows gives rank 0, zero coefficients, condition numbers Infinity; p = 0 gives
 * empty arrays, rank 0, not deficient, condition numbers 1.
 *
 * @param data factor of the data rows
 * @param options ridge penalty (default 0) and penalised columns (default all)
 * @throws RangeError on a negative or non-finite penalty or a mask of the wrong length
 */
export function fitFactor(data: QrAccumulator, options: FitOptions = {}): FitResult {
  const p = data.p;
  const { lambda, mask } = checkPenalty(p, options.ridge, options.penalised);
  const factor = penalisedFactor(data, lambda, mask);
  if (p === 0) {
    return {
      coefficients: new Float64Array(0),
      rank: 0,
      rankDeficient: false,
      conditionNumber: 1,
      conditionNumberScaled: 1,
      singularValuesScaled: new Float64Array(0),
      collinearColumns: [],
      factor,
      rss: data.rss,
      factorRank: 0,
      degreesOfFreedom: 0,
      ridge: lambda,
      penalised: mask,
      refined: false,
    };
  }

  // Diagnostics of the design itself.
  const {
    rank,
    rankDeficient,
    conditionNumber,
    conditionNumberScaled,
    singularValuesScaled: sScaled,
    collinearColumns,
  } = factorDiagnostics(data.R, p, data.rows);

  // Solve with the factor of the design plus penalty rows.
  const factorRank = factor.rows === data.rows ? rank : scaledSpectrum(factor.R, p, factor.rows).rank;
  const solver = new FactorSolver(factor.R, p, factorRank);
  const coefficients = solver.solve(factor.qty);

  return {
    coefficients,
    rank,
    rankDeficient,
    conditionNumber,
    conditionNumberScaled,
    singularValuesScaled: sScaled,
    collinearColumns,
    factor,
    rss: dataRss(data, coefficients),
    factorRank,
    degreesOfFreedom: hatTrace(data, solver),
    ridge: lambda,
    penalised: mask,
    refined: false,
  };
}

/**
 * The coefficients {@link fitFactor} returns, without its diagnostics (condition numbers,
 * degrees of freedom): for the many solves of cross-validation and sweeps. The rank decision is
 * the same: full rank is taken without an SVD only when it is certain, i.e. when the lower bound
 * 1 / ||S^-1||_F of the smallest singular value of the column-scaled factor S exceeds the cutoff
 * max(rows, p) eps ||S||_F built on an upper bound of the largest (Golub & Van Loan, Matrix
 * Computations, 4th ed., sec. 2.3.2: ||A||_2 <= ||A||_F); otherwise the SVD decides.
 *
 * @param data factor of the data rows (not modified)
 * @param options ridge penalty (default 0) and penalised columns (default all)
 * @returns length p
 * @throws RangeError on a negative or non-finite penalty or a mask of the wrong length
 */
export function solveCoefficients(data: QrAccumulator, options: FitOptions = {}): Float64Array {
  const p = data.p;
  const { lambda, mask } = checkPenalty(p, options.ridge, options.penalised);
  const factor = penalisedFactor(data, lambda, mask);
  if (p === 0) return new Float64Array(0);
  const rank = certainlyFullRank(factor.R, p, factor.rows) ? p : scaledSpectrum(factor.R, p, factor.rows).rank;
  return new FactorSolver(factor.R, p, rank).solve(factor.qty);
}

/** True when the column-scaled triangular factor surely has rank p under the rule of {@link scaledSpectrum}. */
function certainlyFullRank(R: Float64Array, p: number, rows: number): boolean {
  const S = new Float64Array(p * p);
  let frob = 0;
  for (let j = 0; j < p; j++) {
    let ss = 0;
    for (let i = 0; i <= j; i++) ss += R[j * p + i] * R[j * p + i];
    if (!(ss > 1e-280 && ss < 1e280)) return false; // leave extreme scales to the SVD
    const d = Math.sqrt(ss);
    for (let i = 0; i <= j; i++) S[j * p + i] = R[j * p + i] / d;
    frob += 1;
  }
  // ||S^-1||_F^2 by solving S x = e_c for each column c (back-substitution).
  const x = new Float64Array(p);
  let inv = 0;
  for (let c = 0; c < p; c++) {
    for (let i = p - 1; i >= 0; i--) {
      let t = i === c ? 1 : 0;
      for (let k = i + 1; k <= c; k++) t -= S[k * p + i] * x[k];
      const diag = S[i * p + i];
      if (diag === 0) return false;
      x[i] = i > c ? 0 : t / diag;
      if (i <= c) inv += x[i] * x[i];
    }
  }
  if (!Number.isFinite(inv)) return false;
  const sMinLower = 1 / Math.sqrt(inv);
  const sMaxUpper = Math.sqrt(frob);
  // A safety factor of 2 covers the rounding of these bounds.
  return sMinLower > 2 * Math.max(rows, p) * Number.EPSILON * sMaxUpper;
}

/**
 * Convenience: folds a whole column-major n x p design and solves it.
 *
 * @param X column-major n x p (X[j*n + i] is row i, column j)
 * @param y length n
 * @param n rows
 * @param p columns
 * @param options {@link FitOptions} plus `refine` (one refinement pass over the data; default false)
 * @throws RangeError on bad shapes, NaN or infinite input, or bad options
 */
export function fitDesign(X: Float64Array, y: Float64Array, n: number, p: number, options: FitDesignOptions = {}): FitResult {
  const acc = new QrAccumulator(p);
  acc.addRows(X, y, n);
  const fit = fitFactor(acc, options);
  if (options.refine !== true || !refinementApplies(fit)) return fit;
  const pass = new RefinementPass(fit);
  pass.addRows(X, y, n);
  const refined = pass.finish();
  // The data are at hand: take rss directly from compensated residuals at the new coefficients.
  if (!refined.refined) return fit;
  const r = new Float64Array(n);
  residualsInto(X, y, n, refined.coefficients, r, new Float64Array(n));
  return { ...refined, rss: sumOfSquares(r, n) };
}

/**
 * Largest scaled condition number for which {@link RefinementPass} applies its correction:
 * the corrected semi-normal equations step contracts the error by about kappa^2 eps (Björck
 * 1987, "Stability analysis of the method of seminormal equations", Linear Algebra Appl. 88/89),
 * so it is used when kappa^2 eps <= 1e-3, i.e. kappa <= about 2.1e6.
 */
export const REFINE_MAX_CONDITION = Math.sqrt(1e-3 / Number.EPSILON);

/**
 * Scaled condition number at or below which the refinement pass is skipped: Householder QR is
 * backward stable, so its coefficients are then accurate to about kappa eps, 2e-14 norm-wise
 * (Golub & Van Loan, Matrix Computations, 4th ed., sec. 5.3.8), and the pass would cost about a
 * third of the fit for digits no figure shows. Measured on the benchmark's M workload (kappa
 * 19): without the pass the coefficients differ from the refined ones by 4e-15 norm-wise and
 * 2.5e-13 in the worst single coefficient, the reported figures by at most 7e-14 relative.
 */
export const REFINE_MIN_CONDITION = 100;

/** True when a refinement pass changes `fit` ({@link REFINE_MIN_CONDITION} < kappa <= {@link REFINE_MAX_CONDITION}, full rank). */
export function refinementApplies(fit: FitResult): boolean {
  return (
    fit.coefficients.length > 0 &&
    !fit.rankDeficient &&
    fit.conditionNumberScaled > REFINE_MIN_CONDITION &&
    fit.conditionNumberScaled <= REFINE_MAX_CONDITION
  );
}

/**
 * One step of iterative refinement computed in a streaming pass over the data rows (the same
 * rows, in any blocks, that built the fit's data factor): the corrected semi-normal equations
 * step w += (R^T R)^+ (X^T r - lambda E w) with r = y - X w and R the fit's factor (Björck,
 * Numerical Methods for Least Squares Problems, SIAM 1996, sec. 2.5.3 and 6.6.5). The
 * residuals and X^T r are accumulated in double-double arithmetic (compensated dot products,
 * Ogita, Rump & Oishi 2005, "Accurate sum and dot product", SIAM J. Sci. Comput. 26(6),
 * algorithm Dot2), which is what makes the step gain digits.
 *
 * The correction is applied only where {@link refinementApplies}: the design's scaled condition
 * number above {@link REFINE_MIN_CONDITION} and at most {@link REFINE_MAX_CONDITION}, full rank;
 * otherwise `finish` returns the
 * QR solution unchanged with `refined` false. `rss` of a refined fit is
 * ||r - X dw||^2 = ||r||^2 - 2 dw^T X^T r + dw^T X^T X dw with X^T X = R^T R - lambda E^T E, so
 * no third pass is needed.
 */
export class RefinementPass {
  readonly #fit: FitResult;
  readonly #gHi: Float64Array;
  readonly #gLo: Float64Array;
  #rss = 0;

  /** @param fit a fit from {@link fitFactor} (not modified) */
  constructor(fit: FitResult) {
    this.#fit = fit;
    this.#gHi = new Float64Array(fit.coefficients.length);
    this.#gLo = new Float64Array(fit.coefficients.length);
  }

  /**
   * Adds m data rows to the pass.
   *
   * @param X column-major m x p block
   * @param y length at least m
   * @param m rows
   * @throws RangeError on bad shapes or non-finite values
   */
  addRows(X: Float64Array, y: Float64Array, m: number): void {
    const w = this.#fit.coefficients;
    checkShape(X, y, m, w.length);
    const { sumOfSquares: ss, bad } = refineRows(X, y, m, w, this.#gHi, this.#gLo);
    if (bad !== null) notFinite(X, y, m, bad.column < 0 ? -1 : bad.column * m + bad.row, bad.column < 0 ? bad.row : -1);
    this.#rss += ss;
  }

  /** The refined fit (coefficients w + dw, `rss` at w + dw, `refined` true), or the fit unchanged (see the class note). */
  finish(): FitResult {
    const fit = this.#fit;
    const w = fit.coefficients;
    const p = w.length;
    if (!refinementApplies(fit)) return fit;
    const lambda = fit.ridge;
    const mask = fit.penalised;
    const gData = new Float64Array(p);
    for (let j = 0; j < p; j++) gData[j] = this.#gHi[j] + this.#gLo[j];
    // Gradient of the augmented problem: the penalty rows' residuals are -sqrt(lambda) E w.
    const g = new Float64Array(p);
    for (let j = 0; j < p; j++) g[j] = gData[j] - (mask[j] ? lambda * w[j] : 0);
    const solver = new FactorSolver(fit.factor.R, p, fit.factorRank);
    const dw = solver.solveNormal(g);
    const coefficients = new Float64Array(p);
    for (let j = 0; j < p; j++) coefficients[j] = w[j] + dw[j];
    // rss at the new coefficients.
    const R = fit.factor.R;
    let quad = 0;
    for (let i = 0; i < p; i++) {
      let t = 0;
      for (let k = i; k < p; k++) t += R[k * p + i] * dw[k];
      quad += t * t;
    }
    let cross = 0;
    for (let j = 0; j < p; j++) {
      cross += dw[j] * gData[j];
      if (mask[j]) quad -= lambda * dw[j] * dw[j];
    }
    const rss = Math.max(0, this.#rss - 2 * cross + quad);
    return { ...fit, coefficients, rss, refined: true };
  }
}

/**
 * Leverages h_i = x_i^T (X^T X + lambda E)^+ x_i for m rows (diagonal of the hat matrix for the
 * data rows; Hoaglin & Welsch 1978, The American Statistician 32(1)). Uses the fit's factor:
 * forward substitution with R^T when it has full rank, the truncated SVD (pseudo-inverse)
 * otherwise.
 *
 * @param fit a fit from {@link fitFactor} or {@link fitDesign}
 * @param X column-major m x p rows (training rows for the hat diagonal, any rows otherwise)
 * @param m rows
 * @returns length m
 * @throws RangeError on bad shapes or non-finite values
 */
export function leverages(fit: FitResult, X: Float64Array, m: number): Float64Array {
  const p = fit.factor.p;
  checkBlock(X, undefined, m, p);
  const out = new Float64Array(m);
  if (p === 0) return out;
  const solver = solverOf(fit);
  const x = new Float64Array(p);
  const z = new Float64Array(p);
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < p; j++) x[j] = X[j * m + i];
    solver.whiten(x, z);
    let h = 0;
    for (let j = 0; j < p; j++) h += z[j] * z[j];
    out[i] = h;
  }
  return out;
}

/**
 * The solver of a fit's factor, made once per fit: a rank-deficient factor's solver holds an SVD
 * of R (p^3 work), which must not be redone for every block of rows.
 */
const solvers = new WeakMap<FitResult, FactorSolver>();
function solverOf(fit: FitResult): FactorSolver {
  let solver = solvers.get(fit);
  if (solver === undefined) {
    solver = new FactorSolver(fit.factor.R, fit.factor.p, fit.factorRank);
    solvers.set(fit, solver);
  }
  return solver;
}

/**
 * Leverages of m rows written into `out` (see {@link leverages}), computed a few hundred rows at
 * a time with the forward substitution z = R^-T x run down whole columns; per row the operations
 * and their order are those of {@link leverages}, so the figures are identical. No finiteness
 * check (the rows come from a design the factor was built from).
 *
 * @param fit a fit from {@link fitFactor}
 * @param X column-major m x p block
 * @param m rows
 * @param out length >= m; out[i] receives h_i
 */
export function leveragesInto(fit: FitResult, X: Float64Array, m: number, out: Float64Array): void {
  const p = fit.factor.p;
  if (p === 0) {
    out.fill(0, 0, m);
    return;
  }
  if (fit.factorRank < p) {
    out.set(leverages(fit, X, m));
    return;
  }
  leverageRows(fit.factor.R, p, X, m, out);
}

/**
 * Predictions X w for m rows of a column-major design.
 *
 * @param X column-major m x p (p = coefficients.length)
 * @param m rows
 * @param coefficients length p
 * @returns length m
 * @throws RangeError when X is shorter than m*p
 */
export function predict(X: Float64Array, m: number, coefficients: Float64Array): Float64Array {
  const p = coefficients.length;
  if (!Number.isInteger(m) || m < 0) throw new RangeError(`predict: m must be a non-negative integer, got ${String(m)}`);
  if (X.length < m * p) throw new RangeError(`predict: X must hold m*p = ${m * p} numbers, got ${X.length}`);
  const out = new Float64Array(m);
  for (let j = 0; j < p; j++) {
    const w = coefficients[j];
    const col = j * m;
    for (let i = 0; i < m; i++) out[i] += X[col + i] * w;
  }
  return out;
}

/** ||X w - y||^2 of the data rows from their factor: rss + ||R w - qty||^2. */
function dataRss(data: QrAccumulator, w: Float64Array): number {
  const p = data.p;
  const R = data.R;
  const qty = data.qty;
  let extra = 0;
  for (let i = 0; i < p; i++) {
    let t = -qty[i];
    for (let k = i; k < p; k++) t += R[k * p + i] * w[k];
    extra += t * t;
  }
  return data.rss + extra;
}

/** trace(X (R_a^T R_a)^+ X^T) = sum over the rows r_i of the data factor of ||whiten(r_i)||^2. */
function hatTrace(data: QrAccumulator, solver: FactorSolver): number {
  const p = data.p;
  const R = data.R;
  const x = new Float64Array(p);
  const z = new Float64Array(p);
  let trace = 0;
  for (let i = 0; i < p; i++) {
    for (let k = 0; k < p; k++) x[k] = R[k * p + i];
    solver.whiten(x, z);
    for (let k = 0; k < p; k++) trace += z[k] * z[k];
  }
  return trace;
}

/** Checks a column-major block and its right-hand side for shape and finiteness. */
function checkBlock(X: Float64Array, y: Float64Array | undefined, m: number, p: number): void {
  checkShape(X, y, m, p);
  notFinite(X, y, m, firstNotFinite(X, m * p), y === undefined ? -1 : firstNotFinite(y, m));
}

/** Checks the shapes of a column-major block and its right-hand side. */
function checkShape(X: Float64Array, y: Float64Array | undefined, m: number, p: number): void {
  if (!Number.isInteger(m) || m < 0) throw new RangeError(`m must be a non-negative integer, got ${String(m)}`);
  if (X.length < m * p) throw new RangeError(`X must hold m*p = ${m * p} numbers (column-major ${m} x ${p}), got ${X.length}`);
  if (y !== undefined && y.length < m) throw new RangeError(`y must hold at least m = ${m} numbers, got ${y.length}`);
}

/**
 * Throws the RangeError for the first value of X (index k, column-major with m rows) or else of y
 * (index i) that is not finite; does nothing when both are -1.
 */
function notFinite(X: Float64Array, y: Float64Array | undefined, m: number, k: number, i: number): void {
  if (k >= 0) throw new RangeError(`X at row ${k % m}, column ${Math.floor(k / m)} must be a finite number, got ${String(X[k])}`);
  if (i >= 0 && y !== undefined) throw new RangeError(`y at row ${i} must be a finite number, got ${String(y[i])}`);
}
