/**
 * `generalisation-gap`: hold-out RMSE / training RMSE.
 */
import type { Check } from './types.js';
import { classifierGap } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';
import { predictionsGap } from './predictions/measures.js';

const check: Check = {
  id: 'generalisation-gap',
  title: 'Generalisation gap',
  limitKey: 'gap_ratio',
  defaultLimit: 1.5,
  direction: 'above',
  limitSummary: 'Hold-out RMSE divided by training RMSE.',
  description: `- Default \`1.5\`. Points at the \`fit\` line.
- Figure: hold-out RMSE / training RMSE, RMSE = sqrt(mean((y - yhat)^2)). Infinite when the
  training RMSE is 0 and the hold-out RMSE is not (a model that interpolates its training rows); 1
  when both are 0. A model that has learnt noise scores far better on the rows it was fitted to than
  on new rows (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009,
  section 7.2). The default 1.5 is common practice, not a law: set it per model.`,
  advice:
    'Use fewer or wider basis functions, a lower degree, or a larger ridge penalty, so that the training error stops falling below the hold-out error.',
  line: (d) => d.fit.line,
  measureClassifier: classifierGap,
  measurePredictions: predictionsGap,
  measure({ metrics }) {
    return {
      value: metrics.gapRatio,
      message: `hold-out RMSE ${formatNumber(metrics.holdoutRmse)} is ${formatNumber(metrics.gapRatio)} times the training RMSE ${formatNumber(metrics.trainRmse)}`,
    };
  },
};

export default check;
