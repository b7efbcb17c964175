/**
 * Weighted least squares as ordinary least squares on scaled rows: minimising
 * sum_i w_i (y_i - phi_i^T b)^2 is minimising ||W^(1/2) y - W^(1/2) Phi b||^2, so every row of the
 * design and the target is multiplied by sqrt(w_i) and the QR engine runs unchanged (Björck,
 * Numerical Methods for Least Squares Problems, 1996, section 4.4.1). Leverages, out-of-fold and
 * leave-one-out errors of the scaled problem are those of the weighted fit (residuals scaled by
 * sqrt(w_i)).
 */
import type { ModelData } from '../data/model-data.js';
import type { Design } from './design-matrix.js';

/** The scaled problem's rows: sqrt(w_i) per row and the scaled target sqrt(w_i) y_i. */
export interface RowScaling {
  /** sqrt(w_i), length n. */
  sqrtW: Float64Array;
  /** sqrt(w_i) y_i, length n. */
  y: Float64Array;
}

/**
 * sqrt(w) and sqrt(w) y of a model's rows, or null when the rows carry no weights. The weights
 * are first divided by their mean (the fit does not change when every weight is multiplied by
 * one constant), so that the scaled problem's mean squared errors (cross-validation, leave-one-out)
 * are weighted mean squared errors sum w r^2 / sum w on the same footing as the weighted RMSE.
 */
export function rowScaling(data: Pick<ModelData, 'y' | 'rows' | 'weights'>): RowScaling | null {
  if (data.weights === undefined) return null;
  const sqrtW = new Float64Array(data.rows);
  const y = new Float64Array(data.rows);
  let total = 0;
  for (let i = 0; i < data.rows; i++) total += data.weights[i];
  const mean = total / data.rows;
  for (let i = 0; i < data.rows; i++) {
    sqrtW[i] = Math.sqrt(data.weights[i] / mean);
    y[i] = sqrtW[i] * data.y[i];
  }
  return { sqrtW, y };
}

/**
 * Multiplies each of the m rows of a column-major m x p block (rows start .. start+m-1 of the
 * data) by sqrt(w) in place.
 */
export function scaleBlockRows(X: Float64Array, m: number, p: number, sqrtW: Float64Array, start: number): void {
  for (let j = 0; j < p; j++) scaleColumn(X, j * m, m, sqrtW, start);
}

/** X[at + i] *= s[start + i] for i < m (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function scaleColumn(X: Float64Array, at: number, m: number, s: Float64Array, start: number): void {
  for (let i = 0; i < m; i++) X[at + i] *= s[start + i];
}

/**
 * The design of the scaled problem: the same columns, each row filled by `design` and multiplied
 * by sqrt(w) of its row (`fill`'s `start` indexes `scaling.sqrtW`). Only for the rows the
 * scaling was made from.
 */
export function weightedDesign(design: Design, scaling: RowScaling): Design {
  return {
    ...design,
    fill(inputs, start, m, out) {
      const filled = design.fill(inputs, start, m, out);
      scaleBlockRows(filled, m, design.p, scaling.sqrtW, start);
      return filled;
    },
  };
}
