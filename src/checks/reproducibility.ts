/**
 * `reproducibility`: how far the descriptor's shipped coefficients are from the refit.
 */
import { linesText, placeOfLine } from '../data/data-parts.js';
import { skipWhenScoreOnly } from './score-only.js';
import type { Check } from './types.js';
import { classifierReproducibility } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';
import { jsonRecord } from '../core/json.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'reproducibility',
  title: 'Shipped coefficients against the refit',
  limitKey: 'reproducibility',
  defaultLimit: 0.01,
  direction: 'above',
  limitSummary:
    'Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.',
  description: `- Default \`0.01\`. Points at \`coefficients\`. Skipped (code
  \`reproducibility/no-coefficients\`) when the descriptor ships none.
- Figure: the largest absolute difference between the predictions of the shipped \`coefficients\` and
  of the refit on the hold-out rows, divided by the range of the training target:
  max_i |x_i^T w_shipped - x_i^T w_refit| / (max y - min y).
- Metric \`shipped_prediction_difference\`. Detail: \`max_prediction_difference\`, \`target_range\`,
  \`at_line\` (hold-out line of the largest difference), \`shipped_holdout_rmse\`, \`refit_holdout_rmse\`,
  \`holdout_rmse_ratio\` (shipped / refit), \`max_coefficient_difference\`.`,
  advice:
    'Refit the model from the committed data and ship the new coefficients, or restore the data and terms the shipped coefficients came from.',
  line: (d) => d.coefficientsLine ?? d.nameLine,
  measureClassifier: classifierReproducibility,
  measure({ shipped, predictions, holdout, metrics, descriptor, targetScale }) {
    const scoreOnly = skipWhenScoreOnly(descriptor);
    if (scoreOnly) return scoreOnly;
    if (shipped === null) return { value: null, reason: 'no-coefficients', message: 'the descriptor ships no coefficients' };
    const ps = shipped.holdoutPredictions;
    const pr = predictions.holdout;
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
    const shippedRmse = shipped.holdout.rmse;
    // Shipped and refit are compared on the fit's own scale (a transformed target's too).
    const refitRmse = targetScale ? targetScale.transformed.holdoutRmse : metrics.holdoutRmse;
    const coefDiff = shipped.maxCoefficientDifference;
    return {
      value,
      message: `shipped and refit predictions differ by up to ${formatNumber(diff)} on the hold-out rows (${formatNumber(value * 100)} % of the training target's range ${formatNumber(spread)}${row >= 0 ? `, ${linesText(holdout, [holdout.lines[row]])}` : ''}); hold-out RMSE shipped ${formatNumber(shippedRmse)}, refit ${formatNumber(refitRmse)}`,
      metrics: { shipped_prediction_difference: jsonNumber(value) },
      detail: jsonRecord({
        max_prediction_difference: diff,
        target_range: spread,
        at_line: row >= 0 ? placeOfLine(holdout, holdout.lines[row]).line : null,
        ...(holdout.parts !== undefined && row >= 0 ? { at_file: placeOfLine(holdout, holdout.lines[row]).file } : {}),
        shipped_holdout_rmse: shippedRmse,
        refit_holdout_rmse: refitRmse,
        holdout_rmse_ratio: shippedRmse / refitRmse,
        max_coefficient_difference: coefDiff,
      }),
    };
  },
};

export default check;
