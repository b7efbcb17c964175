/**
 * The simpler model to use: sweep a model's main complexity setting, cross-validate each setting
 * on the same folds, and pick the simplest setting whose error is within one standard error of
 * the best (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009,
 * section 7.10, the "one-standard-error" rule).
 */
import { createTerm, type Term } from '../design/terms/index.js';
import type {
  Descriptor,
  FourierTermSpec,
  MultiPolynomialTermSpec,
  PolynomialTermSpec,
  RbfTermSpec,
  SplineTermSpec,
  TermSpec,
} from '../config/types.js';
import { InputError } from '../core/errors.js';
import { createDesign, type Design } from '../design/design-matrix.js';
import { solveCoefficients, type FitResult, type QrAccumulator } from '../fit/index.js';
import { ridgePath } from '../fit/ridge-path.js';
import {
  complementCoefficients,
  complementFactors,
  foldFactors,
  outOfFoldErrors,
  outOfFoldErrorsFromFactors,
  summariseFolds,
  type FoldFactors,
  type Rows,
} from './cross-validation.js';
import { assignFolds, type Folds } from './folds.js';
import { checkDeadline } from '../core/deadline.js';
import { rowScaling, weightedDesign } from '../design/weighted-design.js';

/** A point of a cross-validation curve, in order of increasing complexity. */
export interface CurvePoint {
  /** Mean cross-validation error (any loss; the rule only compares). */
  mean: number;
  /** Its standard error (NaN counts as 0). */
  se: number;
}

/**
 * The one-standard-error rule: with the settings ordered from simplest to most complex, the
 * minimum mean error m* at index `best` and its standard error s*, the choice is the simplest
 * setting whose mean is at most m* + s* (ESL 2nd ed. section 7.10, p. 244). Non-finite means are
 * never the best nor chosen. Returns -1 for both when no mean is finite.
 *
 * @param curve points ordered simplest first
 */
export function oneStandardErrorRule(curve: readonly CurvePoint[]): { best: number; chosen: number } {
  let best = -1;
  for (let i = 0; i < curve.length; i++) {
    if (Number.isFinite(curve[i].mean) && (best < 0 || curve[i].mean < curve[best].mean)) best = i;
  }
  if (best < 0) return { best: -1, chosen: -1 };
  const se = Number.isFinite(curve[best].se) ? curve[best].se : 0;
  const threshold = curve[best].mean + se;
  for (let i = 0; i <= best; i++) if (Number.isFinite(curve[i].mean) && curve[i].mean <= threshold) return { best, chosen: i };
  return { best, chosen: best };
}

/** Which setting a sweep varies. */
export type SweepKind = 'degree' | 'width' | 'ridge' | 'knots' | 'harmonics';

/** One setting of the sweep with its cross-validation figures. */
export interface SweepPoint {
  /** The setting's value (degree, width or ridge lambda). */
  setting: number;
  /** Text for people, e.g. `degree 3`, `ridge 0.8`. */
  label: string;
  /** Design columns. */
  parameters: number;
  /** Pooled k-fold RMSE sqrt(sum of squared out-of-fold errors / n). */
  cvRmse: number;
  /** Mean of the fold MSEs and its standard error. */
  meanMse: number;
  seMse: number;
  /** This is the model's current setting. */
  current: boolean;
  /** Why the setting could not be cross-validated (its figures are NaN), when it could not. */
  failed?: string;
}

/** Outcome of a sweep. */
export interface Sweep {
  kind: SweepKind;
  /** Descriptor line to change (the term's line, or `fit.ridge`'s line). */
  line: number;
  /** Settings ordered simplest first. */
  curve: SweepPoint[];
  /** Index of the minimum mean fold MSE, of the setting the rule chose, and of the current setting. */
  best: number;
  chosen: number;
  current: number;
  /** Rows used (degree and width sweeps: a deterministic even-stride subsample when the training data are larger than `maxRows`). */
  rows: number;
  subsampled: boolean;
  folds: number;
}

/** Options of {@link sweepComplexity}. */
export interface SweepOptions {
  /** Degree and width sweeps: subsample rows above this count (even stride through the file). Default {@link SWEEP_MAX_ROWS}. */
  maxRows?: number;
  /** Highest polynomial degree tried. Default {@link SWEEP_MAX_DEGREE}. */
  maxDegree?: number;
  /**
   * The fold factors of `train` under the model's own folds (`fit.folds`, `fit.fold_order`,
   * `fit.seed`), when the caller has them; a ridge sweep then makes no pass over the rows.
   * Default: a ridge sweep builds them in one pass.
   */
  factors?: () => FoldFactors;
  /**
   * With `factors`: the folds they were built on, when the caller has them (a ridge sweep reads
   * only their count and sizes); taken when they are the folds {@link assignFolds} gives for the
   * rows and the model's fold settings, else assigned here. Default: assigned here.
   */
  folds?: () => Folds;
  /** The rows given are a sample of a streamed training file (data/row-source.ts): the detail says `subsampled: true`. Default false. */
  sampled?: boolean;
}

/** Formats a setting for people (up to 3 significant digits). */
function formatSetting(x: number): string {
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a < 1e-3 || a >= 1e5) return x.toExponential(1).replace('e+', 'e');
  return String(Number(x.toPrecision(a >= 1 ? 3 : 2)));
}

/** The setting a sweep varies for this model, or null when there is none. */
export function sweepTarget(descriptor: Descriptor, design: Design): { kind: SweepKind; term: number; line: number } | null {
  if (descriptor.fit.ridge > 0) return { kind: 'ridge', term: -1, line: descriptor.fit.ridgeLine };
  let poly = -1;
  let rbf = -1;
  let spline = -1;
  let fourier = -1;
  design.terms.forEach((t, i) => {
    const spec = t.spec;
    if (
      (spec.kind === 'polynomial' || spec.kind === 'multi-polynomial') &&
      (poly < 0 || spec.degree > (design.terms[poly].spec as PolynomialTermSpec).degree)
    )
      poly = i;
    if ((spec.kind === 'rbf' || spec.kind === 'multi-rbf') && rbf < 0) rbf = i;
    if (spec.kind === 'spline' && spline < 0) spline = i;
    if (spec.kind === 'fourier' && fourier < 0) fourier = i;
  });
  if (poly >= 0) return { kind: 'degree', term: poly, line: design.terms[poly].spec.line };
  if (rbf >= 0) return { kind: 'width', term: rbf, line: design.terms[rbf].spec.line };
  if (spline >= 0) return { kind: 'knots', term: spline, line: design.terms[spline].spec.line };
  if (fourier >= 0) return { kind: 'harmonics', term: fourier, line: design.terms[fourier].spec.line };
  if (design.p > (design.intercept ? 1 : 0)) return { kind: 'ridge', term: -1, line: descriptor.fit.ridgeLine };
  return null;
}

/** Most design columns a degree setting of a polynomial over several inputs may build in a sweep. */
export const MAX_SWEEP_COLUMNS = 200;

/** Columns of a polynomial over k inputs of degree g: C(k + g, g) - 1. */
function monomialCount(k: number, g: number): number {
  let c = 1;
  for (let i = 1; i <= g; i++) c = (c * (k + i)) / i;
  return Math.round(c) - 1;
}

/** Knot counts 1 .. current + 4 (at most 100) of a spline, harmonics 1 .. current + 3 (at most 50) of a Fourier term; simplest first. */
function countSettings(spec: TermSpec): { value: number; current: boolean }[] {
  const current =
    spec.kind === 'spline'
      ? spec.knots.kind === 'list'
        ? spec.knots.values.length
        : spec.knots.count
      : spec.kind === 'fourier'
        ? spec.harmonics
        : 1;
  const top = spec.kind === 'spline' ? Math.min(100, current + 4) : Math.min(50, current + 3);
  return Array.from({ length: top }, (_, i) => ({ value: i + 1, current: i + 1 === current }));
}

/**
 * The settings a sweep of the term `spec` tries for a kind other than ridge, simplest first, the
 * term's own setting marked `current`: degrees 1 .. min(current + {@link SWEEP_DEGREES_ABOVE},
 * maxDegree) (at least the current one; over several inputs only those of at most
 * {@link MAX_SWEEP_COLUMNS} columns, and the current one), widths current x 2^t for t in
 * {@link SWEEP_WIDTH_EXPONENTS}, knot counts 1 .. current + 4 (at most 100), harmonics 1 ..
 * current + 3 (at most 50). The regression and the classifier sweeps both try these.
 * @param spec the swept term's spec
 * @param kind the sweep's kind (not `ridge`)
 * @param maxDegree highest degree tried; default {@link SWEEP_MAX_DEGREE}
 */
export function sweepSettings(
  spec: TermSpec,
  kind: Exclude<SweepKind, 'ridge'>,
  maxDegree = SWEEP_MAX_DEGREE,
): { value: number; current: boolean }[] {
  if (kind === 'degree') {
    const degree = (spec as PolynomialTermSpec | MultiPolynomialTermSpec).degree;
    // Over several inputs the columns grow as C(k + g, g) - 1: stop before MAX_SWEEP_COLUMNS.
    const inputs = spec.kind === 'multi-polynomial' ? spec.of.length : 1;
    return sweepDegrees(degree, maxDegree)
      .filter((g) => g === degree || monomialCount(inputs, g) <= MAX_SWEEP_COLUMNS)
      .map((g) => ({ value: g, current: g === degree }));
  }
  if (kind === 'width') {
    const width = (spec as RbfTermSpec).width;
    return SWEEP_WIDTH_EXPONENTS.map((t) => ({ value: width * 2 ** t, current: t === 0 }));
  }
  return countSettings(spec);
}

/**
 * The term's spec with the swept setting changed (knots become a count at the training quantiles).
 * @param spec the swept term's spec
 * @param kind the sweep's kind (not `ridge`)
 * @param value the setting
 */
function changedSpec(spec: TermSpec, kind: Exclude<SweepKind, 'ridge'>, value: number): TermSpec {
  if (kind === 'degree') return { ...(spec as PolynomialTermSpec | MultiPolynomialTermSpec), degree: value };
  if (kind === 'width') return { ...(spec as RbfTermSpec), width: value };
  if (kind === 'knots') return { ...(spec as SplineTermSpec), knots: { kind: 'count', count: value } };
  return { ...(spec as FourierTermSpec), harmonics: value };
}

/**
 * The design with the swept term at one setting: the term's own spec when `current`, else
 * {@link changedSpec}; its columns built from the training inputs (`trainColumns`, by name).
 * @throws InputError when the data cannot carry the setting (e.g. more spline knots than distinct quantiles)
 */
export function designAtSetting(
  design: Design,
  target: { kind: Exclude<SweepKind, 'ridge'>; term: number },
  setting: { value: number; current: boolean },
  trainColumns: Map<string, Float64Array>,
  file: string,
): Design {
  const spec = design.terms[target.term].spec;
  const changed = setting.current ? spec : changedSpec(spec, target.kind, setting.value);
  const terms: Term[] = design.terms.map((t, i) => (i === target.term ? createTerm(changed, trainColumns, file) : t));
  return createDesign(terms, design.intercept);
}

/**
 * Rows the sweep uses at most: above this a deterministic even-stride subsample (the detail says
 * `subsampled: true` and gives `rows`). 50,000 rows estimate each setting's k-fold error to well
 * under its own standard error, at a quarter of the cost of 200,000 (common practice: the curve
 * only has to rank the settings).
 */
export const SWEEP_MAX_ROWS = 50000;

/** Highest polynomial degree a degree sweep tries (a current degree above it is tried too). */
export const SWEEP_MAX_DEGREE = 15;

/** A degree sweep tries degrees 1 .. min(current + this, {@link SWEEP_MAX_DEGREE}). */
export const SWEEP_DEGREES_ABOVE = 3;

/** A width sweep tries the current width times 2^t for these t, widest (simplest) first. */
export const SWEEP_WIDTH_EXPONENTS: readonly number[] = Object.freeze([4, 3, 2, 1, 0, -1, -2]);

/** A ridge sweep tries s x 10^t for these t, largest (simplest) first, plus the current lambda. */
export const SWEEP_RIDGE_EXPONENTS: readonly number[] = Object.freeze(Array.from({ length: 19 }, (_, i) => 3 - i / 2));

/** The degrees a degree sweep tries for a term of this degree (ascending: simplest first). */
export function sweepDegrees(degree: number, maxDegree = SWEEP_MAX_DEGREE): number[] {
  const top = Math.max(degree, Math.min(degree + SWEEP_DEGREES_ABOVE, maxDegree));
  return Array.from({ length: top }, (_, g) => g + 1);
}

/** What a sweep will fit, known before any pass over the rows (for the cost estimate, run/cost.ts). */
export interface SweepShape {
  kind: SweepKind;
  /** Rows each setting is cross-validated on (a degree or width sweep subsamples above `maxRows`). */
  rows: number;
  /** Design columns of each setting, simplest first (ridge: at most this many penalties, all of p columns). */
  parameters: number[];
}

/**
 * The settings a sweep of this model tries and their sizes, as {@link sweepComplexity} runs them.
 * @param descriptor the model
 * @param design its design
 * @param rows training rows
 * @param options the row cap and highest degree, as for the sweep
 * @returns null when the model has no setting to sweep or fewer than 2 rows
 */
export function sweepShape(
  descriptor: Descriptor,
  design: Design,
  rows: number,
  options: Pick<SweepOptions, 'maxRows' | 'maxDegree'> = {},
): SweepShape | null {
  const target = sweepTarget(descriptor, design);
  if (target === null || rows < 2) return null;
  if (target.kind === 'ridge')
    return { kind: 'ridge', rows, parameters: Array.from({ length: SWEEP_RIDGE_EXPONENTS.length + 1 }, () => design.p) };
  const used = Math.min(rows, options.maxRows ?? SWEEP_MAX_ROWS);
  const term = design.terms[target.term];
  const settings = sweepSettings(term.spec, target.kind, options.maxDegree);
  if (target.kind === 'width') return { kind: 'width', rows: used, parameters: settings.map(() => design.p) };
  // Columns of the term at each setting: a polynomial of one input has `degree` columns, one of
  // several inputs C(k + g, g) - 1; a spline gains a column per knot, a Fourier term two per harmonic.
  const own = term.columnNames.length;
  const currentValue = settings.find((x) => x.current)?.value ?? 0;
  const columnsAt = (value: number): number => {
    const spec = term.spec;
    if (spec.kind === 'multi-polynomial') return monomialCount(spec.of.length, value);
    if (target.kind === 'degree') return value;
    return own + (value - currentValue) * (target.kind === 'harmonics' ? 2 : 1);
  };
  return { kind: target.kind, rows: used, parameters: settings.map(({ value }) => design.p - own + columnsAt(value)) };
}

/**
 * m rows at an even stride through the data (row floor(t n / m) for t < m), as new columns.
 * @param m rows to keep (<= data.rows)
 */
export function subsample(data: Rows & { weights?: Float64Array }, m: number): Rows & { weights?: Float64Array } {
  const n = data.rows;
  const pick = (col: Float64Array): Float64Array => {
    const out = new Float64Array(m);
    for (let t = 0; t < m; t++) out[t] = col[Math.floor((t * n) / m)];
    return out;
  };
  return {
    inputs: data.inputs.map(pick),
    y: pick(data.y),
    rows: m,
    ...(data.weights !== undefined ? { weights: pick(data.weights) } : {}),
  };
}

/**
 * coefficients[s][f]: the fit without fold f under penalty s. One SVD per fold serves every
 * positive penalty ({@link ridgePath}); a penalty of 0, or a factor the path does not take, is
 * solved on its own.
 */
function sweepCoefficients(
  complements: readonly QrAccumulator[],
  lambdas: readonly number[],
  penalised: readonly boolean[],
): Float64Array[][] {
  const coefficients = lambdas.map(() => new Array<Float64Array>(complements.length));
  const positive = lambdas.filter((l) => l > 0);
  complements.forEach((acc, f) => {
    checkDeadline('complexity sweep');
    const path = ridgePath(acc, positive, penalised);
    let next = 0;
    lambdas.forEach((lambda, s) => {
      coefficients[s][f] = path !== null && lambda > 0 ? path[next++] : solveCoefficients(acc, { ridge: lambda, penalised });
    });
  });
  return coefficients;
}

/** True when `folds` are those {@link assignFolds}(n, fit.folds, fit.foldOrder, fit.seed) gives (in-memory folds of n rows under the same settings). */
function sameFolds(folds: Folds, n: number, fit: Pick<Descriptor['fit'], 'folds' | 'foldOrder' | 'seed'>): boolean {
  return (
    folds.streamed !== true &&
    folds.foldOf.length === n &&
    Number.isInteger(fit.folds) &&
    fit.folds >= 1 &&
    folds.k === Math.max(1, Math.min(fit.folds, n)) &&
    folds.order === fit.foldOrder &&
    folds.seed === fit.seed
  );
}

/**
 * Sweeps the model's main complexity setting and applies {@link oneStandardErrorRule} to the
 * k-fold errors (the same folds for every setting).
 *
 * - A ridge penalty above 0 (or a model of linear terms only): lambda on a log grid
 *   s x 10^t, t = -6, -5.5, ..., 3, with s = trace(X^T X) / p of the current design, plus the
 *   current lambda; simplest = largest. The design does not change, so the model's per-fold
 *   factors serve every lambda: one SVD per fold complement gives every lambda's coefficients
 *   ({@link ridgePath}), and each fold's squared errors come
 *   from its own factor ({@link outOfFoldErrorsFromFactors}), with no pass over the rows. Every
 *   row is used (no subsample).
 * - Else the polynomial term of highest degree: degrees 1 .. min(current + 3, maxDegree).
 * - Else the first radial term: widths current x 2^t, t = -2 .. 4; simplest = widest.
 *   Degree and width settings each build their own design: two passes over the rows each, on
 *   an even-stride subsample above `maxRows` rows.
 * - Weighted rows (`train.weights`): every setting is the weighted fit, through the rows scaled by
 *   sqrt(w) with the weights divided by their mean over the rows used (design/weighted-design.ts),
 *   so each fold's errors are weighted and cv_rmse = sqrt(sum w r^2 / sum w) over the out-of-fold
 *   residuals r (the ridge sweep gets the same from the model's own weighted fold factors).
 *
 * @param descriptor the model (fit options, term lines)
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order)
 * @param fit the current fit (its factor gives trace(X^T X))
 * @param options row cap and highest degree
 * @returns null when the model has no setting to sweep or fewer than 2 rows
 */
export function sweepComplexity(
  descriptor: Descriptor,
  design: Design,
  train: Rows & { weights?: Float64Array },
  fit: FitResult,
  options: SweepOptions = {},
): Sweep | null {
  const target = sweepTarget(descriptor, design);
  if (target === null || train.rows < 2) return null;
  const maxRows = options.maxRows ?? SWEEP_MAX_ROWS;
  // A ridge sweep needs no pass over the rows once the fold factors exist, so it uses every row.
  const thinned = target.kind !== 'ridge' && train.rows > maxRows;
  const rows = thinned ? subsample(train, maxRows) : train;
  const subsampled = thinned || options.sampled === true;
  const given = target.kind === 'ridge' && options.factors !== undefined ? options.folds?.() : undefined;
  const folds: Folds =
    given !== undefined && sameFolds(given, rows.rows, descriptor.fit)
      ? given
      : assignFolds(rows.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
  if (folds.k < 2) return null;
  const ridge = descriptor.fit.ridge;
  const curve: SweepPoint[] = [];

  const pointFrom = (setting: number, label: string, parameters: number, sse: number[], current: boolean): SweepPoint => {
    const s = summariseFolds(sse, folds.sizes);
    return { setting, label, parameters, cvRmse: s.cvRmse, meanMse: s.meanMse, seMse: s.seMse, current };
  };

  if (target.kind === 'ridge') {
    // trace(X^T X) = trace(R^T R) of the data rows = trace of the penalised factor minus lambda per penalised column.
    const R = fit.factor.R;
    const p = design.p;
    let trace = 0;
    for (let k = 0; k < p * p; k++) trace += R[k] * R[k];
    trace -= ridge * fit.penalised.filter(Boolean).length;
    const scale = trace / Math.max(1, p);
    const grid = SWEEP_RIDGE_EXPONENTS.map((t) => scale * 10 ** t);
    const lambdas = [...grid.filter((l) => l > ridge), ridge, ...grid.filter((l) => l < ridge)];
    let factors: FoldFactors;
    if (options.factors) {
      factors = options.factors();
    } else {
      const perFold = foldFactors(design, rows, folds);
      factors = { perFold, complements: complementFactors(perFold) };
    }
    const coefficients = sweepCoefficients(factors.complements, lambdas, design.penalised);
    const { sse } = outOfFoldErrorsFromFactors(factors.perFold, coefficients);
    lambdas.forEach((l, s) => curve.push(pointFrom(l, `ridge ${formatSetting(l)}`, p, sse[s], s === lambdas.indexOf(ridge))));
  } else {
    const scaling = rowScaling(rows);
    const scaledRows: Rows = scaling === null ? rows : { inputs: rows.inputs, y: scaling.y, rows: rows.rows };
    const trainColumns = new Map<string, Float64Array>(design.inputs.map((name, c) => [name, train.inputs[c]]));
    const swept = { kind: target.kind, term: target.term };
    for (const { value, current } of sweepSettings(design.terms[target.term].spec, swept.kind, options.maxDegree)) {
      checkDeadline('complexity sweep');
      const label = `${target.kind} ${formatSetting(value)}`;
      let d: Design;
      try {
        d = designAtSetting(design, swept, { value, current }, trainColumns, descriptor.file);
      } catch (error) {
        // A setting the data cannot carry (e.g. more spline knots than distinct quantiles) leaves a gap.
        if (!(error instanceof InputError)) throw error;
        curve.push({
          setting: value,
          label,
          parameters: Number.NaN,
          cvRmse: Number.NaN,
          meanMse: Number.NaN,
          seMse: Number.NaN,
          current,
          failed: error.message,
        });
        continue;
      }
      try {
        // Weighted rows: the fit of the rows scaled by sqrt(w) (errors sqrt(w) r).
        const dw = scaling === null ? d : weightedDesign(d, scaling);
        const factors = complementFactors(foldFactors(dw, scaledRows, folds));
        const coefficients = complementCoefficients(factors, [ridge], d.penalised);
        const { sse } = outOfFoldErrors(dw, scaledRows, folds, coefficients);
        curve.push(pointFrom(value, label, d.p, sse[0], current));
      } catch (error) {
        // A setting whose fit cannot be computed (e.g. columns that underflow) leaves a gap in the curve.
        if (!(error instanceof RangeError)) throw error;
        curve.push({
          setting: value,
          label,
          parameters: d.p,
          cvRmse: Number.NaN,
          meanMse: Number.NaN,
          seMse: Number.NaN,
          current,
          failed: error.message,
        });
      }
    }
  }
  const { best, chosen } = oneStandardErrorRule(curve.map((c) => ({ mean: c.meanMse, se: c.seMse })));
  return {
    kind: target.kind,
    line: target.line,
    curve,
    best,
    chosen,
    current: curve.findIndex((c) => c.current),
    rows: rows.rows,
    subsampled,
    folds: folds.k,
  };
}
