/**
 * `reproducibility`: how far the descriptor's shipped coefficients are from the refit.
 */
import { clip } from '../errors.js';
import type { Check } from './types.js';
import { formatNumber } from '../format.js';
import { jsonRecord } from '../diagnostics/json.js';
import { addErrors, emptySums, errorMeasures } from '../metrics/regression.js';
import { predictRows } from '../model/blocks.js';
import { jsonNumber } from '../result.js';

const check: Check = {
  id: 'reproducibility',
  title: 'Shipped coefficients against the refit',
  limitKey: 'reproducibility',
  description:
    "Largest absolute difference between the predictions of the descriptor's shipped `coefficients` and of the refit on the hold-out rows, divided by the range (max - min) of the training target: max_i |x_i^T w_shipped - x_i^T w_refit| / (max y - min y). Shows that the shipped model no longer follows from the committed data and terms. The detail also compares the shipped model's hold-out RMSE with the refit's. Skipped when the descriptor has no `coefficients`. Default limit 0.01 (1 % of the target's range).",
  advice: 'Refit the model from the committed data and ship the new coefficients, or restore the data and terms the shipped coefficients came from.',
  line: (d) => d.coefficientsLine ?? d.nameLine,
  measure({ descriptor, design, fit, holdout, metrics }) {
    const shipped = descriptor.coefficients;
    if (shipped === null) return { value: null, reason: 'no-coefficients', message: 'the descriptor ships no coefficients' };
    if (shipped.length !== design.p) {
      return { value: null, reason: 'coefficients-length', message: `\`coefficients\` has ${shipped.length} values for ${design.p} design columns` };
    }
    const ps = predictRows(design, holdout, shipped);
    const pr = predictRows(design, holdout, fit.coefficients);
    let diff = 0;
    let row = -1;
    for (let i = 0; i < holdout.rows; i++) {
      const d = Math.abs(ps[i] - pr[i]);
      if (d > diff || Number.isNaN(d)) {
        diff = d;
        row = i;
      }
    }
    const [lo, hi] = metrics.targetRange;
    const spread = hi - lo;
    const value = spread > 0 ? diff / spread : diff === 0 ? 0 : Infinity;
    const shippedSums = emptySums();
    addErrors(shippedSums, holdout.y, ps, holdout.rows);
    const shippedRmse = errorMeasures(shippedSums).rmse;
    let coefDiff = 0;
    for (let j = 0; j < design.p; j++) coefDiff = Math.max(coefDiff, Math.abs(shipped[j] - fit.coefficients[j]));
    return {
      value,
      message: `shipped and refit predictions differ by up to ${formatNumber(diff)} on the hold-out rows (${formatNumber(value * 100)} % of the training target's range ${formatNumber(spread)}${row >= 0 ? `, ${clip(holdout.file)} line ${holdout.lines[row]}` : ''}); hold-out RMSE shipped ${formatNumber(shippedRmse)}, refit ${formatNumber(metrics.holdoutRmse)}`,
      metrics: { shipped_prediction_difference: jsonNumber(value) },
      detail: jsonRecord({
        max_prediction_difference: diff,
        target_range: spread,
        at_line: row >= 0 ? holdout.lines[row] : null,
        shipped_holdout_rmse: shippedRmse,
        refit_holdout_rmse: metrics.holdoutRmse,
        holdout_rmse_ratio: shippedRmse / metrics.holdoutRmse,
        max_coefficient_difference: coefDiff,
      }),
    };
  },
};

export default check;
