/**
 * Binary logistic regression by iteratively reweighted least squares (IRLS), each Newton step
 * solved from the weighted Gram matrix or, when that is not certainly well conditioned, through
 * the streaming QR engine on the weighted design, block by block (memory grows with p^2 and the
 * block size, never with rows x p).
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
 * (or, equivalently, (X^T W X + ridge E) d = X^T (y - p) - ridge E w for the step d = w_new - w)
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
 *
 * Gram steps (gram-step.ts): a pass accumulates the weighted Gram matrix X^T W X and the gradient
 * X^T (y - p) instead of the QR factor (about a quarter of the multiply-adds per row), and the
 * Newton step is solved by Cholesky when the scaled Hessian is certainly well conditioned
 * (condition number bound at most 1e7); otherwise the problem repeats that pass at the same
 * coefficients with the QR engine and keeps it. Both solve the same Newton step up to rounding,
 * and the gradient that decides the optimum is summed row by row either way, so the optimum and
 * the stopping rule are the same. A problem that asks for its weighted factor
 * ({@link LogisticProblem.factor}) gets it from one Gram pass at the returned coefficients, as the
 * Cholesky factor of that Gram (the R of a QR factor of sqrt(W) X up to row signs) when the Gram
 * is certainly well conditioned (the same bound as for a step), else from one more pass with the
 * QR engine.
 *
 * Shared Grams for cross-validation: a fit over all rows can keep one Gram per part of the rows
 * (the folds) at each pass; at the same coefficients every fold fit has the same weights, so the
 * Newton step of the fit without fold f is solved from the sum of the other folds' Grams
 * ({@link firstStepsWithout}) and the fold fits, started there, need one pass over the rows fewer.
 */
import { forEachBlock } from '../design/blocks.js';
import type { Design } from '../design/design-matrix.js';
import { addGramRows, addProducts } from '../kernels/index.js';
import { addInto, gramFactor, gramSize, gramStep } from './gram-step.js';
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
  /**
   * Also keep, at the coefficients of each pass, one Gram and one deviance per part of the rows
   * (`of[i]` in 0..count-1, e.g. the cross-validation folds), the problem's own Gram being their
   * sum: {@link LogisticFit.parts} (while the problem takes Gram steps). Default none.
   */
  parts?: { of: Int32Array; count: number };
  /**
   * Return a factor of the weighted design at the returned coefficients, for its diagnostics:
   * from one Gram pass there, the Cholesky factor of the Gram ({@link LogisticFit.weightedR}) when
   * it is certainly well conditioned (gram-step.ts, gramFactor), else the QR factor from one more
   * pass with the QR engine ({@link LogisticFit.weightedFactor}). Default false.
   */
  factor?: boolean;
  /**
   * With `factor`: filled with the linear predictor x_i^T w of every row (all of them, also those
   * of an excluded fold) at the returned coefficients, summed as design/blocks.ts's predictRows
   * sums it (length rows).
   */
  eta?: Float64Array;
  /**
   * With `factor`: called with each design block of the factor pass (every row once, in order;
   * X column-major m x p, to be read only), so that the caller can take column statistics in
   * the same pass. Not called when p = 0.
   */
  onBlock?: (X: Float64Array, start: number, m: number) => void;
  /** A Newton step already prepared (see {@link firstStepsWithout}): the fit starts at its solution; `start` is then not read. */
  firstStep?: LogisticFirstStep;
}

/**
 * The first Newton step of a fit, prepared without a pass over the rows: the coefficients it
 * starts from, the problem's objective and deviance there, and the extended Gram of its rows
 * there (gram-step.ts: X^T W X and the gradient X^T (y - p)).
 */
export interface LogisticFirstStep {
  from: Float64Array;
  objective: number;
  deviance: number;
  gram: Float64Array;
}

/** The per-part Grams of a fit with {@link LogisticProblem.parts}, at the last coefficients accepted. */
export interface LogisticParts {
  /** The coefficients the Grams and deviances were taken at. */
  at: Float64Array;
  /** Extended Gram of each part's rows (size gramSize(p) squared, upper triangle). */
  grams: Float64Array[];
  /** Rows of each part. */
  rows: Float64Array;
  /** Deviance of each part's rows. */
  deviance: Float64Array;
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
  /**
   * QR factor of the weighted rows sqrt(W) X (no penalty rows): with {@link LogisticProblem.factor}
   * at the returned coefficients when {@link weightedR} is null; otherwise at the last coefficients
   * evaluated when the problem solved its steps with the QR engine, else null.
   */
  weightedFactor: QrAccumulator | null;
  /**
   * With {@link LogisticProblem.factor}: the upper-triangular R (p x p, column-major) with
   * R^T R = X^T W X at the returned coefficients, from the Gram (gram-step.ts, gramFactor), when
   * that is certainly well conditioned; else null (and {@link weightedFactor} is the QR factor).
   */
  weightedR: Float64Array | null;
  /** With {@link LogisticProblem.parts}: the Grams and deviances per part at the last coefficients accepted; null otherwise (or when no pass was accepted, or the problem left Gram steps). */
  parts: LogisticParts | null;
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
  lastR: Float64Array | null;
  lastDeviance: number;
  /** Per-part Grams (one after another), rows and deviances of the pass under way (problems with `parts`, Gram steps). */
  partGram: Float64Array | null;
  partRows: Float64Array | null;
  partDev: Float64Array | null;
  lastParts: LogisticParts | null;
  /** Gram steps (else the QR engine, for good). */
  gram: boolean;
  /** The extended Gram of the pass under way. */
  G: Float64Array;
  /** The last pass's Gram gave no step: the next pass, at the same coefficients with the QR engine, only solves. */
  redo: boolean;
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
  const states: State[] = problems.map((problem) => {
    const s: State = {
      problem,
      w: problem.start ? Float64Array.from(problem.start) : new Float64Array(0),
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
      lastR: null,
      lastDeviance: Number.NaN,
      partGram: null,
      partRows: null,
      partDev: null,
      lastParts: null,
      gram: true,
      G: new Float64Array(0),
      redo: false,
    };
    const first = problem.firstStep;
    const prepared = first && p > 0 ? gramStep(first.gram, first.from, options.ridge, options.penalised) : null;
    if (first && prepared) {
      // Start after the prepared step: as if its pass had just been accepted and solved.
      s.previous = Float64Array.from(first.from);
      s.previousObjective = first.objective;
      s.lastDeviance = first.deviance;
      s.w = prepared.w;
      s.iterations = 1;
    } else if (first) {
      // The prepared Gram is not well conditioned: start where it was taken, with the QR engine.
      s.w = Float64Array.from(first.from);
      s.gram = false;
    } else if (!problem.start) s.w = defaultStart(design, data, problem);
    return s;
  });
  const q = gramSize(p);
  const size = Math.max(1, Math.min(data.rows, 1 << 16));
  const eta = new Float64Array(size);
  const weighted = blockWeights(size);
  const { scale, target, resid, index } = weighted;
  const partScale = new Float64Array(size);
  const partResid = new Float64Array(size);
  const single = new Int32Array(2);
  let work = new Float64Array(0);
  for (let guard = 0; guard < (maxIterations + 1) * (MAX_HALVINGS + 2); guard++) {
    const active = states.filter((s) => !s.done);
    if (active.length === 0) break;
    for (const s of active) {
      s.acc = new QrAccumulator(p);
      s.G = new Float64Array(s.gram ? q * q : 0);
      s.deviance = 0;
      s.rows = 0;
      const parts = s.problem.parts;
      if (parts && s.gram) {
        s.partGram = new Float64Array(parts.count * q * q);
        s.partRows = new Float64Array(parts.count);
        s.partDev = new Float64Array(parts.count);
      } else {
        s.partGram = null;
        s.partRows = null;
        s.partDev = null;
      }
    }
    forEachBlock(design, data, (X, start, m) => {
      if (work.length < m * p) work = new Float64Array(m * p);
      for (const s of active) {
        eta.fill(0, 0, m);
        addProducts(eta, 0, X, m, s.w, p);
        const { parts } = s.problem;
        if (parts && s.partGram && s.partRows && s.partDev) {
          // Every row, each into its part's Gram (rows of a part gathered in row order).
          weightRowsByPart(eta, data.y, start, m, parts.of, s.partDev, scale, resid);
          const offsets = sortByPart(parts.of, start, m, parts.count, index);
          gather(scale, index, m, partScale);
          gather(resid, index, m, partResid);
          addGramRows(s.partGram, q, X, m, p, index, partScale, partResid, offsets, parts.count);
          for (let f = 0; f < parts.count; f++) s.partRows[f] += offsets[f + 1] - offsets[f];
          s.rows += m;
          continue;
        }
        const r = weighBlock(eta, data.y, start, m, s.problem, weighted);
        s.deviance += blockDeviance;
        s.rows += r;
        if (s.gram) {
          single[1] = r;
          addGramRows(s.G, q, X, m, p, index, scale, resid, single, 1);
        } else {
          for (let j = 0; j < p; j++) scaleColumn(X, j * m, index, scale, r, work, j * r);
          s.acc.addRows(work, target, r);
        }
      }
    });
    for (const s of active) {
      if (s.partGram && s.partDev) {
        // The problem's Gram and deviance: the sums of its parts', in part order.
        for (let f = 0; f < s.partDev.length; f++) addInto(s.G, s.partGram.subarray(f * q * q, (f + 1) * q * q));
        s.deviance = 0;
        for (let f = 0; f < s.partDev.length; f++) s.deviance += s.partDev[f];
      }
      step(s, options, maxIterations);
    }
  }
  for (const s of states) {
    // Problems that asked for their factor: one Gram pass at the returned coefficients, which
    // also gives the deviance and objective there (and the predictors, when asked), then the
    // Cholesky factor of that Gram, or, when it is not certainly well conditioned, one QR pass.
    if (!s.problem.factor || p === 0) continue;
    const at = gramAt(design, data, s.problem, s.w);
    s.lastR = gramFactor(at.gram, p);
    s.lastFactor = s.lastR === null ? factorAt(design, data, s.problem, s.w).factor : null;
    s.lastDeviance = at.deviance;
    s.previousObjective = at.deviance + options.ridge * penaltySum(s.w, options.penalised);
  }
  return states.map((s) => ({
    coefficients: s.w,
    deviance: s.lastDeviance,
    objective: s.previousObjective,
    iterations: s.iterations,
    halvings: s.halvings,
    converged: s.converged,
    rows: s.rows,
    weightedFactor: s.lastR !== null ? null : (s.lastFactor ?? (s.gram ? null : s.acc)),
    weightedR: s.lastR,
    parts: s.lastParts,
  }));
}

/**
 * The extended Gram of a problem's weighted rows [sqrt(W) X | u] at coefficients w (gram-step.ts)
 * and its deviance there, in one pass; with `problem.eta`, every row's linear predictor is left
 * there (each block's sum as predictRows makes it: zero, then addProducts).
 */
function gramAt(design: Design, data: LogisticRows, problem: LogisticProblem, w: Float64Array): { gram: Float64Array; deviance: number } {
  const p = design.p;
  const q = gramSize(p);
  const size = Math.max(1, Math.min(data.rows, 1 << 16));
  const out = problem.eta;
  if (out) out.fill(0, 0, data.rows);
  const block = new Float64Array(size);
  const weighted = blockWeights(size);
  const { scale, resid, index } = weighted;
  const single = new Int32Array(2);
  const gram = new Float64Array(q * q);
  let deviance = 0;
  const onBlock = problem.onBlock;
  forEachBlock(design, data, (X, start, m) => {
    if (onBlock) onBlock(X, start, m);
    let eta: Float64Array = block;
    if (out) {
      addProducts(out, start, X, m, w, p);
      eta = out.subarray(start, start + m);
    } else {
      eta.fill(0, 0, m);
      addProducts(eta, 0, X, m, w, p);
    }
    const r = weighBlock(eta, data.y, start, m, problem, weighted);
    deviance += blockDeviance;
    single[1] = r;
    addGramRows(gram, q, X, m, p, index, scale, resid, single, 1);
  });
  return { gram, deviance };
}

/** The QR factor of the weighted rows sqrt(W) [X | z] of a problem at coefficients w, and its deviance there, in one pass. */
function factorAt(
  design: Design,
  data: LogisticRows,
  problem: LogisticProblem,
  w: Float64Array,
): { factor: QrAccumulator; deviance: number } {
  const p = design.p;
  const size = Math.max(1, Math.min(data.rows, 1 << 16));
  const eta = new Float64Array(size);
  const weighted = blockWeights(size);
  const { scale, target, index } = weighted;
  const factor = new QrAccumulator(p);
  let deviance = 0;
  let work = new Float64Array(0);
  forEachBlock(design, data, (X, start, m) => {
    if (work.length < m * p) work = new Float64Array(m * p);
    eta.fill(0, 0, m);
    addProducts(eta, 0, X, m, w, p);
    const r = weighBlock(eta, data.y, start, m, problem, weighted);
    deviance += blockDeviance;
    for (let j = 0; j < p; j++) scaleColumn(X, j * m, index, scale, r, work, j * r);
    factor.addRows(work, target, r);
  });
  return { factor, deviance };
}

/**
 * The first Newton step of each fit without one part of the rows, from the per-part Grams of a
 * fit over all rows ({@link LogisticProblem.parts}): at the common coefficients `at` every row
 * has the same weight and residual in every such fit, so the Gram of the fit without part f is
 * the sum of the other parts' Grams (in part order; an exact addition, no subtraction), and its
 * deviance the sum of theirs. Each step is the Newton step a pass over those rows at `at` would
 * give (up to the rounding of the sums), so cross-validation folds started from the full fit need
 * one pass fewer. A fold whose summed Gram is not well conditioned starts at `at` instead.
 * @param parts the full fit's parts (at least 2)
 * @returns one prepared step per part, for {@link LogisticProblem.firstStep}
 */
export function firstStepsWithout(parts: LogisticParts, options: LogisticOptions): LogisticFirstStep[] {
  const k = parts.grams.length;
  const penalty = options.ridge * penaltySum(parts.at, options.penalised);
  const steps: LogisticFirstStep[] = [];
  for (let f = 0; f < k; f++) {
    const gram = new Float64Array(gramSize(parts.at.length) ** 2);
    let deviance = 0;
    for (let q = 0; q < k; q++) {
      if (q === f) continue;
      addInto(gram, parts.grams[q]);
      deviance += parts.deviance[q];
    }
    steps.push({ from: parts.at, objective: deviance + penalty, deviance, gram });
  }
  return steps;
}

/** After a pass: accept the step (and solve the next), halve it, or stop. */
function step(s: State, options: LogisticOptions, maxIterations: number): void {
  const objective = s.deviance + options.ridge * penaltySum(s.w, options.penalised);
  if (s.redo) {
    // The pass that was accepted, repeated at the same coefficients with the QR engine: solve only.
    s.redo = false;
    s.lastFactor = s.acc;
    solveNext(s, options, objective);
    return;
  }
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
  s.lastFactor = s.gram ? null : s.acc;
  s.lastDeviance = s.deviance;
  s.lastParts =
    s.partGram && s.partRows && s.partDev
      ? {
          at: Float64Array.from(s.w),
          grams: Array.from(s.partDev, (_, f) => (s.partGram as Float64Array).subarray(f * s.G.length, (f + 1) * s.G.length)),
          rows: s.partRows,
          deviance: s.partDev,
        }
      : null;
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
  solveNext(s, options, objective);
}

/** Solves the Newton step from the pass just accepted (Gram, else QR factor), and stops when its decrement is below the tolerance. */
function solveNext(s: State, options: LogisticOptions, objective: number): void {
  const previous = Float64Array.from(s.w);
  let decrement: number;
  if (s.gram) {
    const next = gramStep(s.G, s.w, options.ridge, options.penalised);
    if (next === null) {
      // Not certainly well conditioned: the same pass again with the QR engine, from now on.
      s.gram = false;
      s.redo = true;
      return;
    }
    s.w = next.w;
    decrement = next.decrement;
  } else {
    s.w = solveCoefficients(s.acc, { ridge: options.ridge, penalised: options.penalised });
    decrement = newtonDecrease(s.acc.R, s.w, previous, options);
  }
  s.previous = previous;
  s.iterations += 1;
  // Newton decrement: the quadratic model's decrease for the full step d = w_new - w, d^T (X^T W X + ridge E) d
  // (= ||R d||^2 + ridge ||E d||^2 from a QR factor). When it is below the tolerance the new
  // coefficients are taken without another pass (Boyd & Vandenberghe, Convex Optimization, 2004, sec. 9.5.1).
  if (s.iterations > 1 && decrement <= LOGISTIC_TOLERANCE * (Math.abs(objective) + 0.1)) {
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

/** One block's IRLS rows as {@link weightRows} packs them (each array of the block's size). */
interface BlockWeights {
  /** sqrt(W) of each row kept. */
  scale: Float64Array;
  /** sqrt(W) z = sqrt(W) eta + u of each row kept. */
  target: Float64Array;
  /** u = (y - p) / sqrt(W) of each row kept. */
  resid: Float64Array;
  /** Each kept row's index in the block. */
  index: Int32Array;
}

/** {@link BlockWeights} for blocks of up to `size` rows. */
function blockWeights(size: number): BlockWeights {
  return { scale: new Float64Array(size), target: new Float64Array(size), resid: new Float64Array(size), index: new Int32Array(size) };
}

/**
 * The IRLS weights of one block of a problem's rows: {@link weightRows} without the rows of the
 * problem's excluded fold, {@link weightAllRows} when it has no folds.
 * @returns the number of rows kept (packed from 0 in `into`)
 */
function weighBlock(
  eta: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  problem: Pick<LogisticProblem, 'foldOf' | 'exclude'>,
  into: BlockWeights,
): number {
  const { scale, target, resid, index } = into;
  return problem.foldOf
    ? weightRows(eta, y, start, m, problem.foldOf, problem.exclude ?? -1, scale, target, resid, index)
    : weightAllRows(eta, y, start, m, scale, target, resid, index);
}

/** The deviance of the last block weighted (read right after {@link weightRows}). */
let blockDeviance = 0;

/**
 * The IRLS weights of one block: for each row kept, its index, sqrt(W), u = (y - p) / sqrt(W) and
 * sqrt(W) z = sqrt(W) eta + u, packed from 0; the block's deviance in {@link blockDeviance}.
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
  resid: Float64Array,
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
    resid[r] = (yi - pr) / s;
    target[r] = s * e + resid[r];
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
  resid: Float64Array,
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
    resid[i] = (yi - pr) / s;
    target[i] = s * e + resid[i];
    index[i] = i;
  }
  blockDeviance = dev;
  return m;
}

/**
 * The out-of-fold deviance of k fits each made without one fold: per fold f, the deviance of the
 * rows of fold f under the coefficients of fit f, in one pass over the rows. Each row's logit is
 * summed column after column with its own fold's coefficients, as addProducts sums it, so the
 * figures are those of predicting each fold with its own fit.
 * @param foldOf fold of each row (0 .. k-1)
 * @param coefficients the k fits' coefficients, fit f made without fold f
 * @returns the deviance of each fold's rows (length k)
 */
export function outOfFoldDeviance(
  design: Design,
  data: LogisticRows,
  foldOf: Int32Array,
  coefficients: readonly Float64Array[],
): Float64Array {
  const k = coefficients.length;
  const p = design.p;
  const deviance = new Float64Array(k);
  const eta = new Float64Array(Math.max(1, Math.min(data.rows, 1 << 16)));
  const W = new Float64Array(p * k);
  for (let f = 0; f < k; f++) for (let j = 0; j < p; j++) W[j * k + f] = coefficients[f][j];
  forEachBlock(design, data, (X, start, m) => {
    eta.fill(0, 0, m);
    for (let j = 0; j < p; j++) addFoldColumn(eta, X, j * m, W, j * k, foldOf, start, m);
    addFoldDeviance(deviance, eta, data.y, foldOf, start, m);
  });
  return deviance;
}

/** eta[i] += X[col + i] W[base + foldOf[start + i]] for i < m. */
function addFoldColumn(
  eta: Float64Array,
  X: Float64Array,
  col: number,
  W: Float64Array,
  base: number,
  foldOf: Int32Array,
  start: number,
  m: number,
): void {
  for (let i = 0; i < m; i++) eta[i] += X[col + i] * W[base + foldOf[start + i]];
}

/** deviance[foldOf[start + i]] += rowDeviance(eta[i], y[start + i]) for i < m, in row order. */
function addFoldDeviance(deviance: Float64Array, eta: Float64Array, y: Float64Array, foldOf: Int32Array, start: number, m: number): void {
  for (let i = 0; i < m; i++) deviance[foldOf[start + i]] += rowDeviance(eta[i], y[start + i]);
}

/**
 * sqrt(W) and u = (y - p) / sqrt(W) of every row of the block (as {@link weightRows}), each
 * row's deviance added to its part's sum (`partDev[of[start + i]]`).
 */
function weightRowsByPart(
  eta: Float64Array,
  y: Float64Array,
  start: number,
  m: number,
  of: Int32Array,
  partDev: Float64Array,
  scale: Float64Array,
  resid: Float64Array,
): void {
  for (let i = 0; i < m; i++) {
    const e = eta[i];
    const yi = y[start + i];
    const x = Math.exp(-Math.abs(e));
    partDev[of[start + i]] += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
    const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
    const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
    const s = Math.sqrt(w);
    scale[i] = s;
    resid[i] = (yi - pr) / s;
  }
}

/** Block-row indices grouped by part (a stable counting sort into `index`); returns the offsets of the parts (length count + 1). */
function sortByPart(of: Int32Array, start: number, m: number, count: number, index: Int32Array): Int32Array {
  const offsets = new Int32Array(count + 1);
  for (let i = 0; i < m; i++) offsets[of[start + i] + 1] += 1;
  for (let q = 0; q < count; q++) offsets[q + 1] += offsets[q];
  const next = offsets.slice(0, count);
  for (let i = 0; i < m; i++) index[next[of[start + i]]++] = i;
  return offsets;
}

/** out[k] = from[rows[k]] for k < r. */
function gather(from: Float64Array, rows: Int32Array, r: number, out: Float64Array): void {
  for (let k = 0; k < r; k++) out[k] = from[rows[k]];
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
