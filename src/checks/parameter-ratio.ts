/**
 * `parameter-ratio`: fitted parameters per training row.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';

const check: Check = {
  id: 'parameter-ratio',
  title: 'Parameters per row',
  limitKey: 'params_per_sample',
  description:
    'Number of fitted parameters p (columns of the design, intercept included) divided by the number of training rows n. With p = n a least-squares fit interpolates its training rows exactly. Default limit 0.1, that is at least 10 rows per parameter (common practice). With `fit.parameter_count: effective` a ridge model counts its effective degrees of freedom instead, df = trace of the hat matrix = sum_j d_j^2 / (d_j^2 + lambda) (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009, eq. 3.50).',
  advice: 'Remove terms, lower the degree or the number of radial centres, add a ridge penalty, or add training rows.',
  line: (d) => (d.fit.parameterCount === 'effective' ? d.fit.ridgeLine : d.termsLine),
  measure({ metrics, design, train, fit, descriptor }) {
    if (descriptor.fit.parameterCount === 'effective') {
      const df = fit.degreesOfFreedom;
      const ratio = df / train.rows;
      return {
        value: ratio,
        reason: 'effective',
        message: `${formatNumber(df)} effective parameters (of ${design.p} columns) for ${train.rows} training rows (${formatNumber(ratio)} per row)`,
        detail: { counted: 'effective', effective_df: df, columns: design.p },
      };
    }
    return {
      value: metrics.paramsPerSample,
      message: `${design.p} parameters for ${train.rows} training rows (${formatNumber(metrics.paramsPerSample)} per row)`,
      detail: { counted: 'columns', columns: design.p },
    };
  },
};

export default check;
