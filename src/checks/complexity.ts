/**
 * `complexity`: the simpler setting to use, by the one-standard-error rule on a sweep of the
 * model's main complexity setting.
 */
import type { Check, Measurement } from './types.js';
import { formatNumber } from '../core/format.js';
import { sweepComplexity } from '../diagnostics/complexity.js';
import { jsonRecord } from '../core/json.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'complexity',
  title: 'Simpler setting',
  limitKey: 'complexity',
  description:
    "Sweeps the model's main complexity setting and cross-validates every setting on the model's folds: the ridge penalty when `fit.ridge` is above 0 (or the model has only linear terms), lambda = s x 10^t for t = 3, 2.5, ..., -6 with s = trace(X^T X) / p, plus the current lambda; else the degree of the polynomial term of highest degree, 1 .. min(degree + 3, 15); else the width of the first radial term, the current width times 2^t for t = 4 .. -2. The suggestion is the simplest setting whose mean fold MSE is within one standard error (sample standard deviation of the fold MSEs / sqrt(k)) of the smallest (the one-standard-error rule: Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10); it is shown as a notice at the term's line (or `fit.ridge`'s) whenever it differs from the current setting. The figure is the current setting's k-fold CV RMSE divided by the suggested setting's: 1 or less when the current setting is already as good. A ridge sweep uses every training row; above 50,000 training rows a degree or width sweep uses an even-stride subsample of 50,000 rows. The whole curve is in the detail.",
  advice: 'Change the setting as suggested: the simpler model predicts new rows about as well or better.',
  line: (d) => d.fit.line,
  measure(context): Measurement {
    const { descriptor, design, train, fit } = context;
    const sweep = sweepComplexity(descriptor, design, train, fit, { factors: () => context.analyses.foldFactors() });
    if (sweep === null || sweep.chosen < 0 || sweep.current < 0) {
      return { value: null, reason: 'not-applicable', message: 'the model has no complexity setting to sweep, or too few rows' };
    }
    const chosen = sweep.curve[sweep.chosen];
    const current = sweep.curve[sweep.current];
    const best = sweep.curve[sweep.best];
    const value = chosen.cvRmse > 0 ? current.cvRmse / chosen.cvRmse : current.cvRmse === 0 ? 1 : Infinity;
    const detail = jsonRecord({
      setting: sweep.kind,
      folds: sweep.folds,
      rows: sweep.rows,
      subsampled: sweep.subsampled,
      rule: 'one-standard-error',
      chosen: sweep.chosen,
      best: sweep.best,
      current: sweep.current,
      curve: sweep.curve.map((c) => ({ setting: c.setting, label: c.label, parameters: c.parameters, cv_rmse: c.cvRmse, mean_mse: c.meanMse, se_mse: c.seMse, current: c.current, ...(c.failed ? { failed: c.failed } : {}) })),
    });
    const sub = sweep.subsampled ? ` (on an even-stride subsample of ${sweep.rows} rows)` : '';
    if (sweep.chosen === sweep.current) {
      return {
        value,
        message: `${current.label} is the simplest setting within one standard error of the best cross-validation error (${sweep.curve.length} settings swept${sub})`,
        line: sweep.line,
        metrics: { suggested_setting: current.label },
        detail,
      };
    }
    return {
      value,
      message: `${chosen.label} has k-fold CV RMSE ${formatNumber(chosen.cvRmse)} against ${formatNumber(current.cvRmse)} for the current ${current.label}; it is the simplest of ${sweep.curve.length} settings within one standard error of the best (${best.label}, ${formatNumber(best.cvRmse)})${sub}`,
      line: sweep.line,
      metrics: { suggested_setting: chosen.label, suggested_cv_rmse: jsonNumber(chosen.cvRmse) },
      detail,
      suggestion: { text: `${chosen.label} (k-fold CV RMSE ${formatNumber(chosen.cvRmse)} against ${formatNumber(current.cvRmse)} now)`, line: sweep.line },
    };
  },
};

export default check;
