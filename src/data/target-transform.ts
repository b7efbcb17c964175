/**
 * `data.target_transform: log | log1p | sqrt`: the model is fitted on t = g(y) instead of y.
 *
 * - g(y) = log(y) (natural logarithm, y > 0), back-transform exp(t);
 * - g(y) = log(1 + y) (y > -1, accurate near 0), back-transform expm1(t) = exp(t) - 1;
 * - g(y) = sqrt(y) (y >= 0), back-transform max(t, 0)^2 (a prediction below 0 is the domain's edge).
 *
 * The back-transform of a prediction of t is a median of y, not its mean: g is increasing, so the
 * median of g(Y) maps to the median of Y, while E[g^-1(T)] != g^-1(E[T]) (Jensen's inequality;
 * for log-normal errors the mean is exp(mu + s^2 / 2), Aitchison & Brown, The Lognormal
 * Distribution, 1957, section 2.3). No smearing correction is applied.
 *
 * Standard uncertainties carry over to the transformed scale to first order (the delta method:
 * sigma_t = |g'(y)| sigma, Bevington & Robinson, Data Reduction and Error Analysis for the Physical
 * Sciences, 3rd ed., 2003, section 3.2, eq. 3.13): sigma / y for log, sigma / (1 + y) for log1p,
 * sigma / (2 sqrt(y)) for sqrt (which needs y > 0 then). The fit's weights are 1 / sigma_t^2.
 */
import type { TargetTransformSpec } from '../config/types.js';
import { clip, InputError } from '../core/errors.js';
import type { ModelData } from './model-data.js';

/** The transforms of `data.target_transform`. */
export type TargetTransformKind = TargetTransformSpec['kind'];

/** g(y). */
export function forwardTarget(kind: TargetTransformKind, y: number): number {
  return kind === 'log' ? Math.log(y) : kind === 'log1p' ? Math.log1p(y) : Math.sqrt(y);
}

/** The back-transform of a prediction t: exp(t), expm1(t) or max(t, 0)^2 (a median of y; see the module comment). */
export function inverseTarget(kind: TargetTransformKind, t: number): number {
  if (kind === 'log') return Math.exp(t);
  if (kind === 'log1p') return Math.expm1(t);
  return t > 0 ? t * t : 0;
}

/** g'(y): 1 / y, 1 / (1 + y) or 1 / (2 sqrt(y)). */
export function targetSlope(kind: TargetTransformKind, y: number): number {
  return kind === 'log' ? 1 / y : kind === 'log1p' ? 1 / (1 + y) : 1 / (2 * Math.sqrt(y));
}

/** Whether y is inside g's domain (for sqrt with uncertainties, above 0: g' is infinite at 0). */
export function inTargetDomain(kind: TargetTransformKind, y: number, withSigma: boolean): boolean {
  if (kind === 'log') return y > 0;
  if (kind === 'log1p') return y > -1;
  return withSigma ? y > 0 : y >= 0;
}

const DOMAIN: Record<TargetTransformKind, string> = {
  log: 'a value above 0',
  log1p: 'a value above -1',
  sqrt: 'a value of 0 or more',
};

/** A model's target as written, kept beside the transformed rows. */
export interface OriginalTarget {
  /** y as written. */
  y: Float64Array;
  /** Row weights of the original scale (w as written, or 1 / sigma^2); absent when unweighted. */
  weights?: Float64Array;
  /** sigma as written (`data.sigma`); absent otherwise. */
  sigma?: Float64Array;
}

/**
 * The rows with their target transformed (and, with `data.sigma`, sigma_t = g'(y) sigma and the
 * weights 1 / sigma_t^2), and the target as written.
 * @param data the rows as read
 * @param kind the transform
 * @param target the target column's name (for messages)
 * @throws InputError `target-domain` naming the file, line, column and value of the first target
 *   outside the transform's domain
 */
export function transformTarget(data: ModelData, kind: TargetTransformKind, target: string): { data: ModelData; original: OriginalTarget } {
  const withSigma = data.sigma !== undefined;
  const n = data.rows;
  const i = firstOutside(data.y, n, kind, withSigma);
  if (i >= 0) {
    const expected = withSigma && kind === 'sqrt' ? 'a value above 0 (with `data.sigma` the slope of sqrt must be finite)' : DOMAIN[kind];
    throw new InputError(
      'target-domain',
      `the target \`${clip(target)}\` is ${data.y[i]} on line ${data.lines[i]} of ${clip(data.file)}, outside the domain of \`data.target_transform: ${kind}\`; expected ${expected}`,
      { file: data.file, line: data.lines[i], key: target },
    );
  }
  const y = new Float64Array(n);
  forwardInto(kind, data.y, n, y);
  const original: OriginalTarget = {
    y: data.y.subarray(0, n),
    ...(data.weights !== undefined ? { weights: data.weights } : {}),
    ...(data.sigma !== undefined ? { sigma: data.sigma } : {}),
  };
  if (data.sigma === undefined) return { data: { ...data, y }, original };
  const sigma = new Float64Array(n);
  const weights = new Float64Array(n);
  sigmaInto(kind, data.y, data.sigma, n, sigma, weights);
  return { data: { ...data, y, sigma, weights }, original };
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

function firstOutside(y: Float64Array, n: number, kind: TargetTransformKind, withSigma: boolean): number {
  for (let i = 0; i < n; i++) if (!inTargetDomain(kind, y[i], withSigma)) return i;
  return -1;
}

function forwardInto(kind: TargetTransformKind, y: Float64Array, n: number, out: Float64Array): void {
  for (let i = 0; i < n; i++) out[i] = forwardTarget(kind, y[i]);
}

function sigmaInto(
  kind: TargetTransformKind,
  y: Float64Array,
  s: Float64Array,
  n: number,
  sigma: Float64Array,
  weights: Float64Array,
): void {
  for (let i = 0; i < n; i++) {
    const st = Math.abs(targetSlope(kind, y[i])) * s[i];
    sigma[i] = st;
    weights[i] = 1 / (st * st);
  }
}

/**
 * Both files' rows with their targets transformed (see {@link transformTarget}), the training
 * input columns unchanged, and the targets as written.
 * @throws InputError `target-domain` (see {@link transformTarget})
 */
export function transformTables<T extends { train: ModelData; holdout: ModelData }>(
  tables: T,
  kind: TargetTransformKind,
  target: string,
): { tables: T; original: { train: OriginalTarget; holdout: OriginalTarget } } {
  const train = transformTarget(tables.train, kind, target);
  const holdout = transformTarget(tables.holdout, kind, target);
  return {
    tables: { ...tables, train: train.data, holdout: holdout.data },
    original: { train: train.original, holdout: holdout.original },
  };
}
