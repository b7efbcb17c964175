/**
 * `chi-square`: the reduced chi-square of a fit whose target carries standard uncertainties
 * (`data.sigma`), with a two-sided default limit.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { reducedChiSquare } from '../diagnostics/weighted-metrics.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'chi-square',
  title: 'Reduced chi-square',
  limitKey: 'chi_square',
  defaultLimit: { warn_below: 0.5, warn_above: 2 },
  direction: 'above',
  limitSummary: 'Reduced chi-square sum(((y - f) / sigma)^2) / (n - p) of the training rows (models with `data.sigma` only).',
  description: `- Default \`{ warn_below: 0.5, warn_above: 2 }\` (common practice, not a law): two-sided.
  Applies only to models that give \`data.sigma\` (skipped otherwise). Points at the \`data.sigma\` line.
- Figure: chi2_nu = sum_i ((y_i - f_i) / sigma_i)^2 / (n - p) over the n training rows, p the design's
  columns (Bevington & Robinson, Data Reduction and Error Analysis for the Physical Sciences, 3rd ed.,
  2003, section 11.1). When the model is right and the uncertainties are honest it is near 1. Far above
  1: the model misses structure, or the stated sigmas are too small. Far below 1: the model follows the
  noise, not only the signal (it overfits), or the sigmas are too large.
- The same sum over the hold-out rows divided by their count (no parameter was fitted to them) is
  reported as metric \`holdout_chi_square\`; the training figure as \`train_chi_square\`. Detail:
  \`dof\`, \`holdout_rows\`.
- With \`data.target_transform\`: on the original scale (the default \`limits_scale\`) y against the
  back-transformed predictions with sigma as written; on the transformed scale g(y) against the fit
  with sigma_t = |g'(y)| sigma (the delta method; docs/fitting.md).`,
  advice:
    'Far below 1: simplify the model (it fits the noise) or check that the sigmas are not overstated; far above 1: the model misses structure or the sigmas are understated.',
  line: (d) => (d.data.weighting?.kind === 'sigma' ? d.data.weighting.line : d.data.lines.target),
  measure({ train, holdout, predictions, design, targetScale }) {
    if (train.sigma === undefined || holdout.sigma === undefined) {
      return { value: null, reason: 'not-applicable', message: 'the model gives no `data.sigma`, so there is no chi-square to compute' };
    }
    const dof = train.rows - design.p;
    // A transformed target: the figures of the scale the limits judge (data/target-transform.ts says how sigma transforms).
    const scaled = targetScale ? targetScale[targetScale.limitsScale] : null;
    const value = scaled ? scaled.trainChiSquare : reducedChiSquare(train.y, predictions.train, train.sigma, train.rows, dof);
    const held = scaled
      ? scaled.holdoutChiSquare
      : reducedChiSquare(holdout.y, predictions.holdout, holdout.sigma, holdout.rows, holdout.rows);
    if (Number.isNaN(value)) {
      return {
        value: null,
        reason: 'not-applicable',
        message: `${train.rows} training rows for ${design.p} parameters leave no degrees of freedom for a reduced chi-square`,
      };
    }
    return {
      value,
      message: `reduced chi-square ${formatNumber(value)} on the training rows (${dof} degrees of freedom), ${formatNumber(held)} on the hold-out rows`,
      metrics: { train_chi_square: jsonNumber(value), holdout_chi_square: jsonNumber(held) },
      detail: { dof, holdout_rows: holdout.rows },
    };
  },
};

export default check;
