/**
 * Separation of a binary classifier's training rows (Albert & Anderson 1984, Biometrika 71(1),
 * "On the existence of maximum likelihood estimates in logistic regression models"): with
 * a_i = (2 y_i - 1) x_i, the rows are
 * - completely separated when some direction b gives a_i^T b > 0 for every row,
 * - quasi-completely separated when some b gives a_i^T b >= 0 for every row and > 0 for some,
 * - overlapping otherwise; only then do finite maximum-likelihood coefficients exist.
 *
 * Exact test by linear programming (the formulation of Konis 2007, "Linear programming algorithms
 * for detecting separated data in binary logistic regression models", DPhil thesis, University of
 * Oxford): maximise sum_{i in T} a_i^T b subject to a_i^T b >= 0 for every row and -1 <= b_j <= 1.
 * The optimum is positive exactly when some row of T can be separated; the rows with a_i^T b > 0
 * at the optimum are separated, and the test repeats with T = the rows not yet separated until the
 * optimum is 0. The union is the set of every separable row (the separating directions form a
 * convex cone, so the sum of those found separates all of them at once): complete separation when
 * it holds every row. Rows enter the program's constraints by cutting planes (a pass finds the rows
 * the current b violates and adds the worst), so the program stays small whatever the rows; the
 * simplex prices by Dantzig's rule and falls back to Bland's rule (no cycling on these degenerate
 * programs) when the objective stalls. On more than 4,000 rows an even-stride subset of 4,000 is
 * tested first: when its rows overlap and its design has full column rank, so do all rows (a
 * proof, not a sample estimate). Columns are scaled by their
 * largest magnitude; a_i^T b counts as positive above 1e-9 (|a_i| scaled, |b| <= 1).
 */
import { forEachBlock } from '../design/blocks.js';
import type { Design } from '../design/design-matrix.js';
import { fitFactor, QrAccumulator } from '../fit/index.js';
import { maxOf } from '../core/extremes.js';

/** Rows added to the program per cutting-plane round, at most. */
const CUTS_PER_ROUND = 64;
/** Largest number of row constraints in the program; beyond it the test gives up (`exact: false`). */
const MAX_CUTS = 4000;
/** A scaled a_i^T b above this counts as positive; below -this as violated. */
const TOLERANCE = 1e-9;
/** Rows listed in the result, at most. */
const MAX_LISTED = 20;

/** The outcome of the separation test. */
export interface Separation {
  kind: 'none' | 'quasi-complete' | 'complete';
  /** Number of training rows that can be separated. */
  separatedRows: number;
  /** File lines of the first separated rows (at most 20). */
  lines: number[];
  /** Design columns with a non-zero weight in a separating direction (by index), ascending. */
  columns: number[];
  /** A separating direction in the design's own units (length p; zeros for `none`). */
  direction: number[];
  /** False when the program grew past its size cap before settling (the kind is then a lower bound). */
  exact: boolean;
}

/** Rows of the training data as the design reads them. */
export interface SeparationRows {
  inputs: Float64Array[];
  y: Float64Array;
  rows: number;
  lines: Int32Array;
}

/**
 * Tests the training rows for separation (see the module comment).
 * @param design the fixed design (with its intercept column, if any)
 * @param data the training rows, y in {0, 1}
 */
export function findSeparation(design: Design, data: SeparationRows): Separation {
  if (data.rows > SUBSAMPLE_ROWS) {
    // Overlap of a subset of rows whose design has full column rank proves overlap of all rows:
    // every b with a_i^T b >= 0 on all rows has it on the subset, hence a_i^T b = 0 there, hence b = 0.
    const sub = subsample(data, SUBSAMPLE_ROWS);
    const found = separationOf(design, sub);
    if (found.kind === 'none' && found.exact && fullColumnRank(design, sub)) return found;
  }
  return separationOf(design, data);
}

/** Rows of the even-stride subset tried first on large data. */
const SUBSAMPLE_ROWS = 4000;

/** Every (n / m)-th row. */
function subsample(data: SeparationRows, m: number): SeparationRows {
  const n = data.rows;
  const pick = <T extends Float64Array | Int32Array>(col: T, out: T): T => {
    for (let t = 0; t < m; t++) out[t] = col[Math.floor((t * n) / m)];
    return out;
  };
  return {
    inputs: data.inputs.map((c) => pick(c, new Float64Array(m))),
    y: pick(data.y, new Float64Array(m)),
    rows: m,
    lines: pick(data.lines, new Int32Array(m)),
  };
}

/** Whether the design of these rows has rank p (the scaled-spectrum rule of the QR engine). */
function fullColumnRank(design: Design, data: SeparationRows): boolean {
  const acc = new QrAccumulator(design.p);
  const zeros = new Float64Array(Math.max(1, Math.min(data.rows, 1 << 16)));
  forEachBlock(design, data, (X, _start, m) => acc.addRows(X, zeros, m));
  return fitFactor(acc).rank === design.p;
}

/** The test on all of `data`'s rows (see the module comment). */
function separationOf(design: Design, data: SeparationRows): Separation {
  const p = design.p;
  const n = data.rows;
  const none: Separation = { kind: 'none', separatedRows: 0, lines: [], columns: [], direction: new Array(p).fill(0), exact: true };
  if (p === 0 || n === 0) return none;
  const scale = new Float64Array(p);
  forEachBlock(design, data, (X, _start, m) => {
    for (let j = 0; j < p; j++) for (let i = 0; i < m; i++) scale[j] = Math.max(scale[j], Math.abs(X[j * m + i]));
  });
  for (let j = 0; j < p; j++) if (!(scale[j] > 0) || !Number.isFinite(scale[j])) scale[j] = 1;
  const separated = new Uint8Array(n);
  const total = new Float64Array(p);
  let exact = true;
  let count = 0;
  const cuts: Float64Array[] = [];
  for (let round = 0; round < n + 1; round++) {
    // Objective: the sum of a_i over the rows not yet separated.
    const c = new Float64Array(p);
    forEachBlock(design, data, (X, start, m) => {
      for (let i = 0; i < m; i++) {
        if (separated[start + i]) continue;
        const sign = 2 * data.y[start + i] - 1;
        for (let j = 0; j < p; j++) c[j] += (sign * X[j * m + i]) / scale[j];
      }
    });
    const solved = solveWithCuts(design, data, scale, c, cuts);
    if (!solved.exact) exact = false;
    const b = solved.b;
    let found = 0;
    forEachBlock(design, data, (X, start, m) => {
      for (let i = 0; i < m; i++) {
        if (separated[start + i]) continue;
        if (rowValue(X, m, i, p, b, scale, 2 * data.y[start + i] - 1) > TOLERANCE) {
          separated[start + i] = 1;
          found += 1;
        }
      }
    });
    if (found === 0) break;
    count += found;
    for (let j = 0; j < p; j++) total[j] += b[j];
    if (count === n || !solved.exact) break;
  }
  if (count === 0) return { ...none, exact };
  const lines: number[] = [];
  for (let i = 0; i < n && lines.length < MAX_LISTED; i++) if (separated[i]) lines.push(data.lines[i]);
  const big = maxOf(Array.from(total, Math.abs));
  const columns: number[] = [];
  const direction: number[] = [];
  for (let j = 0; j < p; j++) {
    const v = total[j] / big;
    if (Math.abs(v) > 1e-6) columns.push(j);
    direction.push(Math.abs(v) > 1e-6 ? v / scale[j] : 0);
  }
  return { kind: count === n ? 'complete' : 'quasi-complete', separatedRows: count, lines, columns, direction, exact };
}

/** (2y - 1) x_i^T b with x scaled column by column. */
function rowValue(X: Float64Array, m: number, i: number, p: number, b: Float64Array, scale: Float64Array, sign: number): number {
  let s = 0;
  for (let j = 0; j < p; j++) s += (X[j * m + i] / scale[j]) * b[j];
  return sign * s;
}

/**
 * Maximises c^T b over -1 <= b <= 1 and a_i^T b >= 0 for every row, adding violated rows to
 * `cuts` (kept between calls: a cut stays valid) until the solution violates none.
 */
function solveWithCuts(
  design: Design,
  data: SeparationRows,
  scale: Float64Array,
  c: Float64Array,
  cuts: Float64Array[],
): { b: Float64Array; exact: boolean } {
  const p = design.p;
  // Each round adds at least one cut or returns, and the cuts are capped: at most MAX_CUTS rounds.
  for (let round = 0; round <= MAX_CUTS; round++) {
    const b = simplexMax(c, cuts, p);
    const worst: { value: number; row: Float64Array }[] = [];
    forEachBlock(design, data, (X, start, m) => {
      for (let i = 0; i < m; i++) {
        const sign = 2 * data.y[start + i] - 1;
        const v = rowValue(X, m, i, p, b, scale, sign);
        if (v >= -TOLERANCE) continue;
        if (worst.length === CUTS_PER_ROUND && v >= worst[worst.length - 1].value) continue;
        const row = new Float64Array(p);
        for (let j = 0; j < p; j++) row[j] = (sign * X[j * m + i]) / scale[j];
        worst.push({ value: v, row });
        worst.sort((a, z) => a.value - z.value);
        if (worst.length > CUTS_PER_ROUND) worst.pop();
      }
    });
    if (worst.length === 0) return { b, exact: true };
    if (cuts.length + worst.length > MAX_CUTS) return { b: new Float64Array(p), exact: false };
    for (const w of worst) cuts.push(w.row);
  }
  return { b: new Float64Array(p), exact: false };
}

/**
 * Dense tableau simplex for max c^T b, -1 <= b_j <= 1, a^T b >= 0 for each a in `rows`, with
 * b = u - v (u, v >= 0, u_j + v_j <= 1): every right-hand side is 0 or 1, so the origin is a
 * feasible start (no phase one). Dantzig's rule (the most negative reduced cost enters) while the
 * objective rises; after 50 pivots without a rise, Bland's rule (the lowest-index improving column
 * enters, the lowest-index basic variable among ratio ties leaves), which cannot cycle. At most
 * 100,000 pivots.
 */
export function simplexMax(c: Float64Array, rows: readonly Float64Array[], p: number): Float64Array {
  const r = rows.length;
  const mRows = r + p;
  const nVars = 2 * p;
  const cols = nVars + mRows + 1; // variables, slacks, right-hand side
  const T = new Float64Array((mRows + 1) * cols);
  const basis = new Int32Array(mRows);
  for (let k = 0; k < r; k++) {
    // -a^T (u - v) <= 0
    const a = rows[k];
    for (let j = 0; j < p; j++) {
      T[k * cols + j] = -a[j];
      T[k * cols + p + j] = a[j];
    }
  }
  for (let j = 0; j < p; j++) {
    const k = r + j;
    T[k * cols + j] = 1;
    T[k * cols + p + j] = 1;
    T[k * cols + cols - 1] = 1;
  }
  for (let k = 0; k < mRows; k++) {
    T[k * cols + nVars + k] = 1;
    basis[k] = nVars + k;
  }
  const z = mRows * cols;
  for (let j = 0; j < p; j++) {
    T[z + j] = -c[j];
    T[z + p + j] = c[j];
  }
  const nonZero = new Int32Array(cols);
  const eps = 1e-12;
  let stalled = 0;
  let objective = 0;
  for (let iter = 0; iter < 100000; iter++) {
    // Dantzig's rule (most negative reduced cost) while the objective rises; Bland's rule after
    // 50 pivots without a rise, which cannot cycle.
    const bland = stalled > 50;
    let enter = -1;
    let most = -eps;
    for (let j = 0; j < cols - 1; j++) {
      if (T[z + j] < most) {
        enter = j;
        if (bland) break;
        most = T[z + j];
      }
    }
    if (enter < 0) break;
    let leave = -1;
    let best = Number.POSITIVE_INFINITY;
    for (let k = 0; k < mRows; k++) {
      const a = T[k * cols + enter];
      if (a <= eps) continue;
      const ratio = T[k * cols + cols - 1] / a;
      if (ratio < best - 1e-15 || (Math.abs(ratio - best) <= 1e-15 && basis[k] < basis[leave])) {
        best = ratio;
        leave = k;
      }
    }
    if (leave < 0) break; // unbounded cannot happen (every variable is bounded)
    const pivot = T[leave * cols + enter];
    for (let j = 0; j < cols; j++) T[leave * cols + j] /= pivot;
    // Only the pivot row's non-zero entries change the other rows (most of its slack part is zero).
    let nnz = 0;
    for (let j = 0; j < cols; j++) if (T[leave * cols + j] !== 0) nonZero[nnz++] = j;
    for (let k = 0; k <= mRows; k++) {
      if (k === leave) continue;
      const f = T[k * cols + enter];
      if (f === 0) continue;
      eliminate(T, k * cols, leave * cols, f, nonZero, nnz);
    }
    basis[leave] = enter;
    const now = T[z + cols - 1];
    stalled = now > objective + 1e-12 ? 0 : stalled + 1;
    objective = Math.max(objective, now);
  }
  const x = new Float64Array(nVars);
  for (let k = 0; k < mRows; k++) if (basis[k] < nVars) x[basis[k]] = T[k * cols + cols - 1];
  const b = new Float64Array(p);
  for (let j = 0; j < p; j++) b[j] = x[j] - x[p + j];
  return b;
}

/** T[row + j] -= f T[pivot + j] for the pivot row's non-zero columns j = nonZero[t], t < nnz. */
function eliminate(T: Float64Array, row: number, pivot: number, f: number, nonZero: Int32Array, nnz: number): void {
  for (let t = 0; t < nnz; t++) {
    const j = nonZero[t];
    T[row + j] -= f * T[pivot + j];
  }
}
