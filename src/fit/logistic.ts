/**
 * Binary logistic regression by iteratively reweighted least squares (IRLS), each Newton step
 * solved through the streaming QR engine on the weighted design, block by block (memory grows
 * with p^2 and the block size, never with rows x p).
 *
 * Objective: F(w) = D(w) + ridge * sum over penalised j of w_j^2, with the deviance
 * D(w) = -2 sum_i [y_i log p_i + (1 - y_i) log(1 - p_i)], p_i = 1 / (1 + exp(-x_i^T w)). This is
 * 2 / C times the objective of scikit-learn's LogisticRegression with C = 1 / ridge and an
 * unpenalised intercept, so both have the same minimiser.
 *
 * Newton step (McCullagh & Nelder, Generalized Linear Models, 2nd ed., 1989, sec. 2.5; Green
 * 1984, JRSS B 46(2), "Iteratively reweighted least squares"): with W_i = p_i (1 - p_i) and the
 * working response z_i = eta_i + (y_i - p_i) / W_i, the next w minimises
 * sum_i W_i (z_i - x_i^T w)^2 + ridge ||E w||^2, i.e. the least squares of the rows
 * sqrt(W_i) x_i against sqrt(W_i) z_i with the ridge penalty rows, which the QR accumulator folds
 * (W_i is floored at 1e-14 so that a saturated row keeps a finite working response; the floor
 * changes the path, not the minimiser, where the gradient X^T (y - p) - ridge E w is zero).
 *
 * Step halving: when F at the new w is above F at the previous one (beyond 1e-12 relative, the
 * rounding of the sums), w moves half way back, up to 40 times.
 *
 * Stopping rule: the fit has converged when a Newton step lowers F by at most 1e-10 (|F| + 0.1)
 * (the relative rule of R's glm.fit, tighter: Newton converges quadratically, so the coefficients
 * of that step are accurate to about the square of the previous step's change), or, from the
 * second step on, when the Newton decrement of the step just solved (the decrease the quadratic
 * model predicts, d^T (X^T W X + ridge E) d) is at most that, the new coefficients then taken
 * without another pass; at most 100 Newton steps.
 */
import { forEachBlock } from '../design/blocks.js';
import type { Design } from '../design/design-matrix.js';
import { addProducts } from '../kernels/index.js';
import { QrAccumulator } from './qr-accumulator.js';
import { solveCoefficients } from './index.js';

/** Largest number of Newton steps. */
export const LOGISTIC_MAX_ITERATIONS = 100;
/** Relative decrease of the objective at which IRLS stops. */
export const LOGISTIC_TOLERANCE = 1e-10;
/** Smallest IRLS weight p (1 - p). */
const MIN_WEIGHT = 1e-14;
/** Largest number of step halvings in a row. */
const MAX_HALVINGS = 40;

/** The rows a classifier is fitted to: inputs in `design.inputs` order and y in {0, 1}. */
export interface LogisticRows {
  inputs: Float64Array[];
  y: Float64Array;
  rows: number;
}

/** Options shared by every problem of one {@link fitLogistic} call. */
export interface LogisticOptions {
  /** Ridge penalty (>= 0) on the penalised columns. */
  ridge: number;
  /** Which columns the penalty applies to (length p). */
  penalised: readonly boolean[];
  /** Newton steps at most. Default {@link LOGISTIC_MAX_ITERATIONS}. */
  maxIterations?: number;
}

/** One fit among those of a call: all rows, or all rows but one fold's. */
export interface LogisticProblem {
  /** Leave out the rows with `foldOf[i] === exclude`; no `foldOf` = every row. */
  foldOf?: Int32Array;
  exclude?: number;
  /** Starting coefficients (length p); default 0 but the intercept at logit(mean y). */
  start?: Float64Array;
}

/** The outcome of one logistic fit. */
export interface LogisticFit {
  /** Coefficients at the last accepted step, length p. */
  coefficients: Float64Array;
  /** Deviance D of the rows fitted at the last coefficients evaluated (the returned ones, or the step before them when the Newton decrement stopped the fit). */
  deviance: number;
  /** D + ridge ||E w||^2 at the same coefficients. */
  objective: number;
  /** Newton steps taken. */
  iterations: number;
  /** Step halvings taken in all. */
  halvings: number;
  /** True when the stopping rule was met within the iteration cap. */
  converged: boolean;
  /** Rows fitted. */
  rows: number;
  /** QR factor of the weighted rows sqrt(W) X at the last coefficients evaluated (no penalty rows). */
  weightedFactor: QrAccumulator;
}

interface State {
  problem: LogisticProblem;
  w: Float64Array;
  previous: Float64Array | null;
  previousObjective: number;
  acc: QrAccumulator;
  deviance: number;
  rows: number;
  iterations: number;
  halvings: number;
  halvingRun: number;
  done: boolean;
  converged: boolean;
  lastFactor: QrAccumulator | null;
  lastDeviance: number;
}

/**
 * Fits one or more logistic regressions over the same design in shared passes (one pass over
 * the rows per Newton step of all problems still running: the design block is built once).
 *
 * @param design the fixed design
 * @param data the rows (y in {0, 1})
 * @param options ridge and penalised columns
 * @param problems the fits to make (e.g. the full fit, or one per cross-validation fold)
 * @returns one fit per problem, in order
 */
export function fitLogistic(
  design: Design,
  data: LogisticRows,
  options: LogisticOptions,
  problems: readonly LogisticProblem[],
): LogisticFit[] {
  const p = design.p;
  const maxIterations = options.maxIterations ?? LOGISTIC_MAX_ITERATIONS;
  const states: State[] = problems.map((problem) => ({
    problem,
    w: problem.start ? Float64Array.from(problem.start) : defaultStart(design, data, problem),
    previous: null,
    previousObjective: Number.POSITIVE_INFINITY,
    acc: new QrAccumulator(p),
    deviance: 0,
    rows: 0,
    iterations: 0,
    halvings: 0,
    halvingRun: 0,
    done: p === 0,
    converged: p === 0,
    lastFactor: null,
    lastDeviance: Number.NaN,
  }));
  const size = Math.max(1, Math.min(data.rows, 1 << 16));
  const eta = new Float64Array(size);
  const scale = new Float64Array(size);
  const target = new Float64Array(size);
  const index = new Int32Array(size);
  let work = new Float64Array(0);
  for (let guard = 0; guard < (maxIterations + 1) * (MAX_HALVINGS + 2); guard++) {
    const active = states.filter((s) => !s.done);
    if (active.length === 0) break;
    for (const s of active) {
      s.acc = new QrAccumulator(p);
      s.deviance = 0;
      s.rows = 0;
    }
    forEachBlock(design, data, (X, start, m) => {
      if (work.length < m * p) work = new Float64Array(m * p);
      for (const s of active) {
        eta.fill(0, 0, m);
        addProducts(eta, 0, X, m, s.w, p);
        const { foldOf, exclude } = s.problem;
        const r = foldOf
          ? weightRows(eta, data.y, start, m, foldOf, exclude ?? -1, scale, target, index)
          : weightAllRows(eta, data.y, start, m, scale, target, index);
        s.deviance += blockDeviance;
        s.rows += r;
        for (let j = 0; j < p; j++) scaleColumn(X, j * m, index, scale, r, work, j * r);
        s.acc.addRows(work, target, r);
      }
    });
    for (const s of active) step(s, options, maxIterations);
  }
  return states.map((s) => ({
    coefficients: s.w,
    deviance: s.lastDeviance,
    objective: s.previousObjective,
    iterations: s.iterations,
    halvings: s.halvings,
    converged: s.converged,
    rows: s.rows,
    weightedFactor: s.lastFactor ?? s.acc,
  }));
}

/** After a pass: accept the step (and solve the next), halve it, or stop. */
function step(s: State, options: LogisticOptions, maxIterations: number): void {
  const objective = s.deviance + options.ridge * penaltySum(s.w, options.penalised);
  const noise = 1e-12 * (Math.abs(s.previousObjective) + 0.1);
  if (s.previous !== null && !(objective <= s.previousObjective + noise)) {
    // Not lower: halve the step back towards the previous coefficients.
    s.halvings += 1;
    s.halvingRun += 1;
    if (s.halvingRun > MAX_HALVINGS || !Number.isFinite(s.previousObjective)) {
      s.w = s.previous;
      s.done = true;
      return;
    }
    for (let j = 0; j < s.w.length; j++) s.w[j] = (s.w[j] + s.previous[j]) / 2;
    return;
  }
  s.halvingRun = 0;
  s.lastFactor = s.acc;
  s.lastDeviance = s.deviance;
  const decrease = s.previousObjective - objective;
  s.previousObjective = objective;
  if (s.previous !== null && decrease <= LOGISTIC_TOLERANCE * (Math.abs(objective) + 0.1)) {
    s.done = true;
    s.converged = true;
    return;
  }
  if (s.iterations >= maxIterations) {
    s.done = true;
    return;
  }
  s.previous = Float64Array.from(s.w);
  s.w = solveCoefficients(s.acc, { ridge: options.ridge, penalised: options.penalised });
  s.iterations += 1;
  // Newton decrement: the quadratic model's decrease for the full step d = w_new - w, d^T (X^T W X + ridge E) d
  // = ||R d||^2 + ridge ||E d||^2. When it is below the tolerance the new coefficients are taken
  // without another pass (Boyd & Vandenberghe, Convex Optimization, 2004, sec. 9.5.1).
  if (s.iterations > 1 && newtonDecrease(s.acc.R, s.w, s.previous, options) <= LOGISTIC_TOLERANCE * (Math.abs(objective) + 0.1)) {
    s.done = true;
    s.converged = true;
  }
}

/** ||R d||^2 + ridge ||E d||^2 with d = w - previous (R upper triangular, column-major p x p). */
function newtonDecrease(R: Float64Array, w: Float64Array, previous: Float64Array, options: LogisticOptions): number {
  const p = w.length;
  let total = 0;
  for (let i = 0; i < p; i++) {
    let row = 0;
    for (let j = i; j < p; j++) row += R[j * p + i] * (w[j] - previous[j]);
    total += row * row;
    if (options.penalised[i]) total += options.ridge * (w[i] - previous[i]) ** 2;
  }
  return total;
}

/** sum over penalised j of w_j^2. */
function penaltySum(w: Float64Array, penalised: readonly boolean[]): number {
  let s = 0;
  for (let j = 0; j < w.length; j++) if (penalised[j]) s += w[j] * w[j];
  return s;
}

/** Zero coefficients, but the intercept (column 0 when the design has one) at logit of the mean target of the rows fitted. */
function defaultStart(design: Design, data: LogisticRows, problem: LogisticProblem): Float64Array {
  const w = new Float64Array(design.p);
  if (!design.intercept) return w;
  let n = 0;
  let positives = 0;
  for (let i = 0; i < data.rows; i++) {
    if (problem.foldOf && problem.foldOf[i] === problem.exclude) continue;
    n += 1;
    positives += data.y[i];
  }
  const mean = (positives + 0.5) / (n + 1);
  w[0] = Math.log(mean / (1 - mean));
  return w;
}

/** The deviance of the last block weighted (read right after {@link weightRows}). */
let blockDeviance = 0;

/**
 * The IRLS weights of one block: for each row kept, its index, sqrt(W) and sqrt(W) z, packed
 * from 0; the block's deviance in {@link blockDeviance}.
 * @returns the number of rows kept
 */
function weightRows(
  eta: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  foldOf: Int32Array,
  exclude: number,
  scale: Float64Array,
  target: Float64Array,
  index: Int32Array,
): number {
  let r = 0;
  let dev = 0;
  for (let i = 0; i < m; i++) {
    if (foldOf[start + i] === exclude) continue;
    const e = eta[i];
    const yi = y[start + i];
    const x = Math.exp(-Math.abs(e));
    dev += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
    const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
    const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
    const s = Math.sqrt(w);
    scale[r] = s;
    target[r] = s * e + (yi - pr) / s;
    index[r] = i;
    r++;
  }
  blockDeviance = dev;
  return r;
}

/** {@link weightRows} for every row of the block. */
function weightAllRows(
  eta: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  scale: Float64Array,
  target: Float64Array,
  index: Int32Array,
): number {
  let dev = 0;
  for (let i = 0; i < m; i++) {
    const e = eta[i];
    const yi = y[start + i];
    const x = Math.exp(-Math.abs(e));
    dev += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
    const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
    const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
    const s = Math.sqrt(w);
    scale[i] = s;
    target[i] = s * e + (yi - pr) / s;
    index[i] = i;
  }
  blockDeviance = dev;
  return m;
}

/**
 * One row's deviance -2 [y log p + (1 - y) log(1 - p)] from eta = logit p, without overflow:
 * 2 [log(1 + exp(-|eta|)) + max(eta, 0) - y eta].
 */
export function rowDeviance(eta: number, y: number): number {
  return 2 * (Math.log1p(Math.exp(-Math.abs(eta))) + Math.max(eta, 0) - y * eta);
}

/** out[to + k] = scale[k] X[from + index[k]] for k < r. */
function scaleColumn(
  X: Float64Array,
  from: number,
  index: Int32Array,
  scale: Float64Array,
  r: number,
  out: Float64Array,
  to: number,
): void {
  for (let k = 0; k < r; k++) out[to + k] = scale[k] * X[from + index[k]];
}
