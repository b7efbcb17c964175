/**
 * `holdout-rmse`: a ceiling on the hold-out root-mean-square error, in the target's units.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { predictionsHoldout } from './predictions/measures.js';

const check: Check = {
  id: 'holdout-rmse',
  title: 'Hold-out RMSE',
  limitKey: 'holdout_rmse',
  defaultLimit: 'off',
  direction: 'above',
  limitSummary: "Hold-out RMSE in the target's units.",
  description: `- Default \`off\`. A ceiling in the target's units: \`holdout_rmse: 2.5\` fails when the
  hold-out RMSE is above 2.5. Points at the \`fit\` line.
- Figure: RMSE = sqrt(mean((y - yhat)^2)) over the hold-out rows. An absolute figure: it says
  whether the model is accurate enough for its use, not whether it overfits. Metric \`holdout_rmse\`.`,
  advice: 'The hold-out error is above what the model may have: improve the model (inputs, terms) or agree on a looser limit.',
  line: (d) => d.fit.line,
  measurePredictions: predictionsHoldout('rmse'),
  measure({ metrics }) {
    return { value: metrics.holdoutRmse, message: `hold-out RMSE is ${formatNumber(metrics.holdoutRmse)}` };
  },
};

export default check;
