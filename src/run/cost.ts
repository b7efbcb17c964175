/**
 * The work one model will take, estimated from its shape before the first pass over its rows
 * (rows, design columns, folds, inputs, the swing grid and the complexity sweep's settings), and
 * the cap it is held to (`caps.max_operations`). One estimate for every stage, so that no stage
 * can grow without the estimate seeing it.
 *
 * The unit is one operation, about one floating-point multiply-add: folding a row into a p x p QR
 * factor costs p^2 of them, and the constants below were measured against that (ratios of times
 * of the same kernels on one machine, so they hold on others too). Decompositions are counted at
 * their worst (a rank-deficient factor is decomposed where a full-rank one is only substituted),
 * because a pull request chooses the data; what the shapes cannot foresee is left to the time
 * limit (`caps.max_model_seconds`).
 */
import type { Descriptor, SettingsFile } from '../config/types.js';
import { InputError } from '../core/errors.js';
import { formatNumber } from '../core/format.js';
import type { Design } from '../design/design-matrix.js';
import { SWEEP_MAX_ROWS, sweepShape, type SweepShape } from '../diagnostics/complexity.js';
import { SWING_DEFAULTS } from '../diagnostics/swing.js';
import { CURVE_POINTS, MAX_PARTIAL_CURVES } from '../result/chart-types.js';

/** Operations to build one design value of a Gaussian radial column (an exponential). */
export const BUILD_RBF = 20;

/** Operations to build one design value of any other column (a copy, a power). */
export const BUILD_OTHER = 4;

/**
 * Operations of one SVD of a p x p matrix, per p^3: one-sided Jacobi takes about 5.5 p^3
 * multiply-adds a sweep and converges in about 12 sweeps (measured: 70).
 */
export const SVD_OPERATIONS = 70;

/**
 * SVDs' worth of work in one fit of the full factor: the scaled spectrum, the raw singular
 * values, the penalised factor's rank, the truncated solver of a rank-deficient factor and the
 * hat trace (measured on rank-deficient designs: about 10).
 */
export const FIT_SVDS = 10;

/**
 * SVDs' worth of work in one solve of a fold's complement when its rank is in doubt (the rank
 * test, then the scaled spectrum and the truncated solver; measured: about 5).
 */
export const SOLVE_SVDS = 5;

/**
 * Operations per row and p^2 of the leverages: forward substitution is p^2 / 2; a rank-deficient
 * factor's pseudo-inverse takes up to 4 times as long (measured: 3.5).
 */
export const LEVERAGE_OPERATIONS = 2;

/**
 * Operations per row of the leakage scan: two probes of hash tables of the hold-out rows, each
 * a likely cache miss once the tables outgrow the cache (measured: about 200).
 */
export const LEAKAGE_ROW_OPERATIONS = 200;

/** The sizes the estimate is made from. */
export interface ModelShape {
  /** Training and hold-out rows. */
  trainRows: number;
  holdoutRows: number;
  /** Input columns the terms read. */
  inputs: number;
  /** Design columns p. */
  columns: number;
  /** Operations to build one row of the design ({@link BUILD_RBF} per radial column, {@link BUILD_OTHER} per other). */
  buildPerRow: number;
  /** Folds actually used: min(fit.folds, training rows); below 2 there is no k-fold cross-validation. */
  folds: number;
  /** The descriptor ships coefficients (scored on both files). */
  shipped: boolean;
  /** The complexity sweep's settings, or null when it has none. */
  sweep: SweepShape | null;
  /** `data.target_transform` is given (figures on the original scale: one more pass); absent otherwise. */
  targetTransform?: boolean;
  /**
   * Rows of the sample a streamed model's sampled diagnostics use (swing, charts, the sweep:
   * data/row-source.ts); absent for an in-memory model, whose diagnostics use every row.
   */
  sampleRows?: number;
}

/** One stage's share of the estimate. */
export interface CostPart {
  /** What the stage is, for people (`fold pass`, `complexity sweep`). */
  stage: string;
  /** Its estimated operations. */
  operations: number;
  /** The sizes behind it, for people (`120000 rows x 200 columns`). */
  sizes: string;
}

/** The estimate of one model. */
export interface CostEstimate {
  /** Sum of the parts, in operations. */
  total: number;
  /** Each stage's share, in the order the run does them. */
  parts: CostPart[];
}

/** Operations of building `rows` rows of a design whose row costs `buildPerRow`. */
function build(rows: number, buildPerRow: number): number {
  return rows * buildPerRow;
}

/** Operations to build one row of a design. */
export function buildCost(design: Design): number {
  let ops = design.intercept ? BUILD_OTHER : 0;
  for (const t of design.terms) ops += t.columnNames.length * (t.spec.kind === 'rbf' ? BUILD_RBF : BUILD_OTHER);
  return ops;
}

/** The sizes of a planned model. */
export function modelShape(
  descriptor: Descriptor,
  design: Design,
  trainRows: number,
  holdoutRows: number,
  sampleRows?: number,
): ModelShape {
  const sampled = sampleRows ?? trainRows;
  return {
    trainRows,
    holdoutRows,
    inputs: design.inputs.length,
    columns: design.p,
    buildPerRow: buildCost(design),
    folds: Math.min(descriptor.fit.folds, trainRows),
    shipped: descriptor.coefficients !== null,
    sweep: sweepShape(descriptor, design, sampled, { maxRows: SWEEP_MAX_ROWS }),
    ...(sampleRows === undefined ? {} : { sampleRows }),
    ...(descriptor.data.targetTransform ? { targetTransform: true } : {}),
  };
}

/** Points of the swing scan at most (every input's grid, the margins, the neighbour segments). */
export function swingPoints(inputs: number, rows: number): number {
  const s = SWING_DEFAULTS;
  const gaps = Math.min(Math.max(0, rows - 1), s.maxGridRows) * inputs;
  const gapPoints = Math.min(gaps, s.maxGaps + inputs) * s.perGap;
  const segments = inputs >= 2 ? Math.min(rows, s.maxRows) * s.neighbours * s.segmentPoints : 0;
  return inputs * (s.uniform + 2 * s.marginPoints) + gapPoints + segments;
}

/**
 * Estimates the operations of every stage of one model (see the module comment for the unit).
 * With n training rows, m hold-out rows, p columns, b operations to build a row, k folds and d
 * inputs:
 *
 * - fold pass: n (b + p^2); merges of the fold factors: 4 k p^3 (the full factor and every
 *   fold's complement);
 * - fit: {@link FIT_SVDS} SVDs of p x p ({@link SVD_OPERATIONS} p^3 each);
 * - refinement pass: n (b + 2p); scoring pass: n (b + {@link LEVERAGE_OPERATIONS} p^2 + 2p),
 *   hold-out rows m (b + p), shipped coefficients (n + m)(b + p);
 * - cross-validation solves: k ({@link SOLVE_SVDS} SVDs + p^3 / 3);
 * - swing scan: its points (b + p), the neighbour search 1000^2 d, the grid sorts;
 * - leakage: (n + m)({@link LEAKAGE_ROW_OPERATIONS} + 4d); charts: curves of 401 points per input (at most 12);
 * - complexity sweep: a ridge sweep k SVDs and 2 L k p^2 for L penalties; a degree or width
 *   sweep, per setting of p_s columns on its n_s rows, n_s (2 b_s + p_s^2 + p_s) + 4 k p_s^3 +
 *   k ({@link SOLVE_SVDS} SVDs + p_s^3 / 3);
 * - a transformed target's original scale: the out-of-fold pass n (b + p) and k fold solves.
 */
export function estimateCost(shape: ModelShape): CostEstimate {
  const { trainRows: n, holdoutRows: m, columns: p, buildPerRow: b, inputs: d } = shape;
  const k = shape.folds >= 2 ? shape.folds : 0;
  const p2 = p * p;
  const p3 = p2 * p;
  const svd = (q: number): number => SVD_OPERATIONS * q * q * q;
  const solves = (folds: number, q: number): number => folds * (SOLVE_SVDS * svd(q) + (q * q * q) / 3);
  const rowsBy = (rows: number): string => `${rows} rows x ${p} columns`;
  const parts: CostPart[] = [
    { stage: 'fold pass', operations: build(n, b) + n * p2, sizes: rowsBy(n) },
    { stage: 'fold merges and fit', operations: 4 * k * p3 + FIT_SVDS * svd(p), sizes: `${k} folds, ${p} columns` },
    { stage: 'refinement pass', operations: build(n, b) + 2 * n * p, sizes: rowsBy(n) },
    {
      stage: 'scoring pass',
      operations:
        build(n, b) + n * (LEVERAGE_OPERATIONS * p2 + 2 * p) + build(m, b) + m * p + (shape.shipped ? build(n + m, b) + (n + m) * p : 0),
      sizes: `${n} + ${m} rows x ${p} columns`,
    },
    { stage: 'cross-validation', operations: solves(k, p), sizes: `${k} fold solves of ${p} columns` },
  ];
  // A streamed model's swing scan and charts read its sample (ns rows); leakage streams every row.
  const ns = shape.sampleRows ?? n;
  const grid = swingPoints(d, ns);
  const sampled = Math.min(ns, SWING_DEFAULTS.maxRows);
  const sorted = Math.min(ns, SWING_DEFAULTS.maxGridRows);
  parts.push({
    stage: 'swing scan',
    operations: grid * (b + p) + (d >= 2 ? sampled * sampled * d : 0) + d * (32 * sorted + 4 * ns),
    sizes: `${grid} points`,
  });
  const curves = Math.min(d, MAX_PARTIAL_CURVES);
  parts.push({
    stage: 'leakage and charts',
    operations: (n + m) * (LEAKAGE_ROW_OPERATIONS + 4 * d) + curves * CURVE_POINTS * (b + p) + 4 * ns * d,
    sizes: `${n} + ${m} rows x ${d} inputs`,
  });
  parts.push(sweepPart(shape, k));
  if (shape.targetTransform === true)
    parts.push({ stage: 'original scale of the target', operations: build(n, b) + n * p + solves(k, p), sizes: rowsBy(n) });
  return { total: parts.reduce((sum, part) => sum + part.operations, 0), parts };
}

/** The complexity sweep's share (see {@link estimateCost}). */
function sweepPart(shape: ModelShape, k: number): CostPart {
  const sweep = shape.sweep;
  if (sweep === null || k < 2) return { stage: 'complexity sweep', operations: 0, sizes: 'no setting to sweep' };
  const p = shape.columns;
  if (sweep.kind === 'ridge') {
    const L = sweep.parameters.length;
    return {
      stage: 'complexity sweep',
      operations: k * SVD_OPERATIONS * p * p * p + 2 * L * k * p * p,
      sizes: `${L} ridge penalties x ${k} folds`,
    };
  }
  const perColumn = shape.buildPerRow / Math.max(1, p);
  let ops = 0;
  for (const q of sweep.parameters) {
    const bq = perColumn * q;
    ops += sweep.rows * (2 * bq + q * q + q) + 4 * k * q * q * q + k * (SOLVE_SVDS * SVD_OPERATIONS * q * q * q + (q * q * q) / 3);
  }
  return { stage: 'complexity sweep', operations: ops, sizes: `${sweep.parameters.length} ${sweep.kind} settings on ${sweep.rows} rows` };
}

/** Error code of a model whose estimate is over `caps.max_operations`. */
export const OVER_BUDGET = 'over-budget';

/** A count of operations for people: `4.2e10`. */
export function formatOperations(x: number): string {
  return x < 1e6 ? formatNumber(Math.round(x)) : x.toExponential(1).replace('e+', 'e');
}

/**
 * Refuses a model whose estimate is over the cap.
 * @param descriptor the model (its `terms` line is named)
 * @param estimate from {@link estimateCost}
 * @param settings the settings file (`caps.maxOperations`, and its path for the message)
 * @throws InputError {@link OVER_BUDGET} naming the largest stages and the cap to raise
 */
export function checkBudget(descriptor: Descriptor, estimate: CostEstimate, settings: SettingsFile): void {
  const cap = settings.caps.maxOperations;
  if (!(estimate.total > cap)) return;
  const largest = estimate.parts
    .filter((part) => part.operations > 0)
    .sort((a, b) => b.operations - a.operations)
    .slice(0, 3)
    .map((part) => `${part.stage} ${formatOperations(part.operations)} (${part.sizes})`)
    .join(', ');
  throw new InputError(
    OVER_BUDGET,
    `the estimated work of this model, ${formatOperations(estimate.total)} operations, is over the cap of ${formatOperations(cap)} (largest: ${largest}); raise caps.max_operations in ${settings.file ?? 'the settings file (fitgate.yml)'} to allow it, or use fewer rows, columns, folds or sweep settings`,
    { file: descriptor.file, line: descriptor.termsLine, key: 'terms' },
  );
}
