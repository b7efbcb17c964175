/**
 * `holdout-mae`: a ceiling on the hold-out mean absolute error, in the target's units.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { predictionsHoldout } from './predictions/measures.js';

const check: Check = {
  id: 'holdout-mae',
  title: 'Hold-out MAE',
  limitKey: 'holdout_mae',
  defaultLimit: 'off',
  direction: 'above',
  limitSummary: "Hold-out mean absolute error in the target's units.",
  description: `- Default \`off\`. A ceiling in the target's units: \`holdout_mae: 1.5\` fails when the
  hold-out MAE is above 1.5. Points at the \`fit\` line.
- Figure: MAE = mean(|y - yhat|) over the hold-out rows; less sensitive to a few large errors than
  the RMSE. Metric \`holdout_mae\`.`,
  advice: 'The typical hold-out error is above what the model may have: improve the model (inputs, terms) or agree on a looser limit.',
  line: (d) => d.fit.line,
  measurePredictions: predictionsHoldout('mae'),
  measure({ metrics }) {
    return { value: metrics.holdoutMae, message: `hold-out MAE is ${formatNumber(metrics.holdoutMae)}` };
  },
};

export default check;
