/**
 * `parameter-ratio`: fitted parameters per training row.
 */
import type { Check } from './types.js';
import { formatNumber } from '../format.js';

const check: Check = {
  id: 'parameter-ratio',
  title: 'Parameters per row',
  limitKey: 'params_per_sample',
  description:
    'Number of fitted parameters p (columns of the design, intercept included) divided by the number of training rows n. With p = n a least-squares fit interpolates its training rows exactly. Default limit 0.1, that is at least 10 rows per parameter (common practice).',
  advice: 'Remove terms, lower the degree or the number of radial centres, or add training rows.',
  line: (d) => d.termsLine,
  measure({ metrics, design, train }) {
    return {
      value: metrics.paramsPerSample,
      message: `${design.p} parameters for ${train.rows} training rows (${formatNumber(metrics.paramsPerSample)} per row)`,
    };
  },
};

export default check;
