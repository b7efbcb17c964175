/**
 * Predictions of a design whose only term is one polynomial of one input, in one pass over the
 * points with no design block: for scans that predict thousands of points of a one-input model
 * (the swing grid, diagnostics/swing.ts), where building and reading the block costs more than
 * the arithmetic.
 */
import type { Design } from './design-matrix.js';

/**
 * A predictor for `design` under the coefficients `w` when its only term is a `polynomial` term
 * without an input transform (intercept or not), else null. predict(xs, out) adds to out[i] (all
 * zeros, length >= xs.length) the prediction at xs[i] and returns `out`: the same operations in
 * the same order as {@link predictRows} (design/blocks.ts) gives, so the bits are equal. The block
 * holds 1 (the intercept), then z = (x - shift) / scale (x itself when shift = 0 and scale = 1)
 * and its powers z^k = z^(k-1) z (design/terms/polynomial.ts, kernels/polynomial-columns.ts); the
 * products are added to the output column after column, those of weight 0 left out
 * (kernels/products.ts). test/design/polynomial-predictions.test.ts compares the bits.
 *
 * @param design the fitted design
 * @param w coefficients (length p)
 */
export function polynomialPredictor(design: Design, w: ArrayLike<number>): ((xs: Float64Array, out: Float64Array) => Float64Array) | null {
  if (design.terms.length !== 1) return null;
  const term = design.terms[0];
  const spec = term.spec;
  if (spec.kind !== 'polynomial' || spec.transform !== undefined || term.inputScale !== undefined || term.admits !== undefined) return null;
  const { shift, scale } = term.fixed;
  if (typeof shift !== 'number' || typeof scale !== 'number') return null;
  const degree = spec.degree;
  const first = design.intercept ? 1 : 0;
  if (!(degree >= 1) || term.columnNames.length !== degree || design.p !== first + degree) return null;
  const weights = new Float64Array(design.p);
  for (let j = 0; j < design.p; j++) weights[j] = w[j];
  const raw = shift === 0 && scale === 1;
  return (xs, out) => {
    if (degree <= 4) lowDegreeRows(xs, xs.length, shift, scale, raw, design.intercept, weights, degree, out);
    else polynomialRows(xs, xs.length, shift, scale, raw, design.intercept, weights, degree, out);
    return out;
  };
}

/**
 * out[i] += the prediction at xs[i] for i < m (see {@link polynomialPredictor}): the intercept's
 * product 1 w_0, then z^k w_k for k = 1 .. degree, each added in turn unless its weight is 0.
 * One loop nest (see DEVELOPERS.md, "Writing hot loops").
 */
function polynomialRows(
  xs: Float64Array,
  m: number,
  shift: number,
  scale: number,
  raw: boolean,
  intercept: boolean,
  w: Float64Array,
  degree: number,
  out: Float64Array,
): void {
  const first = intercept ? 1 : 0;
  const w0 = intercept ? w[0] : 0;
  const addIntercept = intercept && w0 !== 0;
  for (let i = 0; i < m; i++) {
    const z = raw ? xs[i] : (xs[i] - shift) / scale;
    let sum = out[i];
    if (addIntercept) sum += 1 * w0;
    let power = z;
    for (let k = 0; k < degree; k++) {
      if (k > 0) power = power * z;
      const wk = w[first + k];
      if (wk !== 0) sum += power * wk;
    }
    out[i] = sum;
  }
}

/**
 * {@link polynomialRows} for a degree of at most 4, the powers written out (no loop over the
 * columns inside the loop over the points: several times faster): the same operations in the
 * same order.
 */
function lowDegreeRows(
  xs: Float64Array,
  m: number,
  shift: number,
  scale: number,
  raw: boolean,
  intercept: boolean,
  w: Float64Array,
  degree: number,
  out: Float64Array,
): void {
  const first = intercept ? 1 : 0;
  const w0 = intercept ? w[0] : 0;
  const w1 = w[first];
  const w2 = degree >= 2 ? w[first + 1] : 0;
  const w3 = degree >= 3 ? w[first + 2] : 0;
  const w4 = degree >= 4 ? w[first + 3] : 0;
  // Which products are added: the intercept's and each power's of weight other than 0.
  const use0 = intercept && w0 !== 0;
  const use1 = w1 !== 0;
  const use2 = degree >= 2 && w2 !== 0;
  const use3 = degree >= 3 && w3 !== 0;
  const use4 = degree >= 4 && w4 !== 0;
  for (let i = 0; i < m; i++) {
    const z = raw ? xs[i] : (xs[i] - shift) / scale;
    let sum = out[i];
    if (use0) sum += 1 * w0;
    if (use1) sum += z * w1;
    const z2 = z * z;
    if (use2) sum += z2 * w2;
    const z3 = z2 * z;
    if (use3) sum += z3 * w3;
    if (use4) sum += z3 * z * w4;
    out[i] = sum;
  }
}
