/**
 * `spline: { of, knots, degree?, natural? }`: piecewise polynomials joined smoothly at knots.
 *
 * Knots: boundary knots a = min x, b = max x of the training rows; interior knots as listed
 * (strictly between a and b) or `{ count: k }` at the training quantiles j / (k + 1), j = 1 .. k
 * (linear interpolation between order statistics: Hyndman & Fan 1996, The American Statistician
 * 50(4), definition 7).
 *
 * - B-splines (`natural: false`, the default): the B-spline basis B_1 .. B_(K+d+1) of degree d on the
 *   knot sequence with a and b repeated d + 1 times and the K interior knots once, evaluated by the
 *   Cox-de Boor recursion (de Boor, A Practical Guide to Splines, 1978, chapter X; as in Piegl &
 *   Tiller, The NURBS Book, 2nd ed., 1997, algorithm A2.2). The B-splines sum to 1, so B_1 is left out
 *   (the intercept carries it): K + d columns. Beyond [a, b] each end piece's polynomial continues.
 * - Natural cubic splines (`natural: true`, degree 3): cubic between the knots, linear beyond the
 *   boundary knots. On u = (x - a) / (b - a) with knots xi_1 = 0 < xi_2 < ... < xi_(K+2) = 1 (the
 *   interior knots mapped alike): N_1 = u and N_(k+1) = d_k(u) - d_(K+1)(u) for k = 1 .. K, with
 *   d_k(u) = ((u - xi_k)_+^3 - (u - xi_(K+2))_+^3) / (xi_(K+2) - xi_k) (Hastie, Tibshirani & Friedman,
 *   The Elements of Statistical Learning, 2nd ed., 2009, eqs. 5.4 and 5.5): K + 1 columns (the
 *   constant N_0 = 1 is the intercept's).
 */
import type { SplineTermSpec } from '../../config/types.js';
import { InputError } from '../../core/errors.js';
import type { Term, TrainingColumns } from './types.js';

/** Quantile q of sorted values (linear interpolation between order statistics, Hyndman & Fan definition 7). */
export function quantileSorted(sorted: Float64Array, q: number): number {
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/** The boundary and interior knots of a spline term from its training column. */
export function splineKnots(spec: SplineTermSpec, x: Float64Array, file: string): { lower: number; upper: number; interior: number[] } {
  const sorted = Float64Array.from(x).sort();
  const lower = sorted[0];
  const upper = sorted[sorted.length - 1];
  const fail = (message: string): never => {
    throw new InputError('spline-knots', message, { file, line: spec.line, key: 'spline.knots' });
  };
  if (!(upper > lower)) fail(`column \`${spec.of}\` is constant in the training data, so a spline has no range to span; drop the term`);
  const interior =
    spec.knots.kind === 'list'
      ? [...spec.knots.values]
      : Array.from({ length: spec.knots.count }, (_, j) =>
          quantileSorted(sorted, (j + 1) / (spec.knots.kind === 'count' ? spec.knots.count + 1 : 1)),
        );
  for (let k = 0; k < interior.length; k++) {
    if (!(interior[k] > lower && interior[k] < upper) || (k > 0 && !(interior[k] > interior[k - 1]))) {
      fail(
        spec.knots.kind === 'list'
          ? `knot ${interior[k]} is not strictly inside the training range (${lower}, ${upper}) of \`${spec.of}\`; expected increasing knots between the smallest and the largest training value`
          : `${spec.knots.count} knots at the training quantiles of \`${spec.of}\` do not all differ (ties in the data); expected fewer knots`,
      );
    }
  }
  return { lower, upper, interior };
}

/** Formats a number for a column name (at most 6 significant digits). */
function label(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/** Builds the spline term with its knots fixed from the training column. */
export function splineTerm(spec: SplineTermSpec, training: TrainingColumns, file: string): Term {
  const x = training.get(spec.of) as Float64Array;
  const { lower, upper, interior } = splineKnots(spec, x, file);
  const fixed = { lower, upper, knots: interior, degree: spec.degree };
  if (spec.natural) {
    const width = upper - lower;
    const xi = [0, ...interior.map((k) => (k - lower) / width), 1];
    const names = [`ns(${spec.of}; u)`, ...interior.map((k) => `ns(${spec.of}; knot ${label(k)})`)];
    return {
      spec,
      inputs: [spec.of],
      columnNames: names,
      fixed,
      fill(inputs, m, out, offset) {
        naturalColumns(inputs[0], m, lower, width, xi, out, offset * m);
      },
    };
  }
  const d = spec.degree;
  const t = [...Array(d + 1).fill(lower), ...interior, ...Array(d + 1).fill(upper)] as number[];
  const count = interior.length + d + 1;
  const names = Array.from({ length: count - 1 }, (_, j) => `bs(${spec.of}; degree ${d}, ${j + 2} of ${count})`);
  return {
    spec,
    inputs: [spec.of],
    columnNames: names,
    fixed,
    fill(inputs, m, out, offset) {
      bsplineColumns(inputs[0], m, Float64Array.from(t), d, count, out, offset * m);
    },
  };
}

/**
 * Values of the d + 1 B-splines B_(span-d) .. B_span that are non-zero at x (Cox-de Boor recursion,
 * The NURBS Book algorithm A2.2), into `basis` (length d + 1). `left`, `right`: scratch, length d + 1.
 */
export function bsplineValues(
  t: Float64Array,
  d: number,
  span: number,
  x: number,
  basis: Float64Array,
  left: Float64Array,
  right: Float64Array,
): void {
  basis[0] = 1;
  for (let j = 1; j <= d; j++) {
    left[j] = x - t[span + 1 - j];
    right[j] = t[span + j] - x;
    let saved = 0;
    for (let r = 0; r < j; r++) {
      const temp = basis[r] / (right[r + 1] + left[j - r]);
      basis[r] = saved + right[r + 1] * temp;
      saved = left[j - r] * temp;
    }
    basis[j] = saved;
  }
}

/** The knot span of x: the largest mu in [d, count - 1] with t[mu] <= x (the end spans for x outside). */
function knotSpan(t: Float64Array, d: number, count: number, x: number): number {
  let lo = d;
  let hi = count - 1;
  if (!(x >= t[lo + 1])) return lo;
  if (x >= t[hi]) return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x >= t[mid]) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Fills the count - 1 B-spline columns B_2 .. B_count of m rows from `at` (column-major). */
function bsplineColumns(x: Float64Array, m: number, t: Float64Array, d: number, count: number, out: Float64Array, at: number): void {
  out.fill(0, at, at + (count - 1) * m);
  const basis = new Float64Array(d + 1);
  const left = new Float64Array(d + 1);
  const right = new Float64Array(d + 1);
  for (let i = 0; i < m; i++) {
    const span = knotSpan(t, d, count, x[i]);
    bsplineValues(t, d, span, x[i], basis, left, right);
    for (let r = 0; r <= d; r++) {
      const j = span - d + r; // B_(j+1) in 1-based terms; column j - 1 (B_1 left out)
      if (j >= 1) out[at + (j - 1) * m + i] = basis[r];
    }
  }
}

/** Fills the natural cubic spline columns (ESL eqs. 5.4-5.5 on u) of m rows from `at`. */
function naturalColumns(
  x: Float64Array,
  m: number,
  lower: number,
  width: number,
  xi: readonly number[],
  out: Float64Array,
  at: number,
): void {
  const last = xi.length - 1;
  const dLast = (u: number): number =>
    cubePlus(u - xi[last - 1]) / (xi[last] - xi[last - 1]) - cubePlus(u - xi[last]) / (xi[last] - xi[last - 1]);
  for (let i = 0; i < m; i++) {
    const u = (x[i] - lower) / width;
    out[at + i] = u;
    const tail = dLast(u);
    for (let k = 0; k < last - 1; k++) {
      const dk = (cubePlus(u - xi[k]) - cubePlus(u - xi[last])) / (xi[last] - xi[k]);
      out[at + (k + 1) * m + i] = dk - tail;
    }
  }
}

/** max(0, v)^3. */
function cubePlus(v: number): number {
  return v > 0 ? v * v * v : 0;
}
