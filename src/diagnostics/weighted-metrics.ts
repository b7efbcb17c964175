/**
 * Error measures of a weighted fit, and the reduced chi-square of a fit with known uncertainties.
 *
 * Weighted measures, with w_i the row weights and W = sum w_i (every weight 1 gives the plain
 * measures of regression-metrics.ts):
 * - RMSE_w = sqrt(sum w_i r_i^2 / W), MAE_w = sum w_i |r_i| / W, r_i = y_i - yhat_i;
 * - R^2_w = 1 - sum w_i r_i^2 / sum w_i (y_i - ybar_w)^2, ybar_w = sum w_i y_i / W
 *   (Draper & Smith, Applied Regression Analysis, 3rd ed., 1998, section 9.2: the R^2 of the
 *   least-squares problem on rows scaled by sqrt(w_i), with the weighted mean).
 * Reduced chi-square: chi2_nu = sum ((y_i - yhat_i) / sigma_i)^2 / nu, nu = n - p on the training
 * rows, nu = n on hold-out rows (no parameter was fitted to them) (Bevington & Robinson, Data
 * Reduction and Error Analysis for the Physical Sciences, 3rd ed., 2003, section 11.1).
 */

/** Weighted RMSE, MAE, R^2 and the weighted sum of squared errors (NaN for zero total weight). */
export function weightedErrorMeasures(
  y: Float64Array,
  yhat: Float64Array,
  w: Float64Array,
  n: number,
): { rmse: number; mae: number; r2: number; sse: number } {
  const total = weightSum(w, n);
  if (!(total > 0)) return { rmse: Number.NaN, mae: Number.NaN, r2: Number.NaN, sse: 0 };
  const mean = weightedSum(y, w, n) / total;
  const sse = weightedSquaredErrors(y, yhat, w, n);
  const sae = weightedAbsoluteErrors(y, yhat, w, n);
  const sst = weightedSquaredDeviations(y, w, n, mean);
  return { rmse: Math.sqrt(sse / total), mae: sae / total, r2: sst > 0 ? 1 - sse / sst : Number.NaN, sse };
}

/**
 * sum ((y_i - yhat_i) / sigma_i)^2 / dof, NaN when dof <= 0.
 * @param dof degrees of freedom: n - p for the training rows, n for hold-out rows
 */
export function reducedChiSquare(y: Float64Array, yhat: Float64Array, sigma: Float64Array, n: number, dof: number): number {
  if (!(dof > 0)) return Number.NaN;
  return chiSquareSum(y, yhat, sigma, n) / dof;
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

function weightSum(w: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += w[i];
  return s;
}

function weightedSum(y: Float64Array, w: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += w[i] * y[i];
  return s;
}

function weightedSquaredErrors(y: Float64Array, yhat: Float64Array, w: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - yhat[i];
    s += w[i] * r * r;
  }
  return s;
}

function weightedAbsoluteErrors(y: Float64Array, yhat: Float64Array, w: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) s += w[i] * Math.abs(y[i] - yhat[i]);
  return s;
}

function weightedSquaredDeviations(y: Float64Array, w: Float64Array, n: number, mean: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    const d = y[i] - mean;
    s += w[i] * d * d;
  }
  return s;
}

function chiSquareSum(y: Float64Array, yhat: Float64Array, sigma: Float64Array, n: number): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    const r = (y[i] - yhat[i]) / sigma[i];
    s += r * r;
  }
  return s;
}
