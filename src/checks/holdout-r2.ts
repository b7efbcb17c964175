/**
 * `holdout-r2`: a floor on the hold-out coefficient of determination.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { predictionsHoldout } from './predictions/measures.js';

const check: Check = {
  id: 'holdout-r2',
  title: 'Hold-out R^2',
  limitKey: 'holdout_r2',
  defaultLimit: 'off',
  direction: 'below',
  limitSummary: 'Hold-out R^2 (coefficient of determination).',
  description: `- Default \`off\`. A floor: \`holdout_r2: 0.9\` fails when the hold-out R^2 is below 0.9,
  \`{ warn: 0.95, fail: 0.9 }\` warns below 0.95 and fails below 0.9. Points at the \`fit\` line.
- Figure: R^2 = 1 - SSE / SST on the hold-out rows, SSE = sum((y - yhat)^2), SST = sum((y - mean(y))^2)
  with the hold-out mean (Draper & Smith, Applied Regression Analysis, 3rd ed., 1998, section 1.6).
  It can be negative: a model worse than the hold-out mean. Skipped when the hold-out target is
  constant (SST = 0). Unlike the ratio checks this is an absolute figure: it says how good the model
  is, not whether it overfits. Metric \`holdout_r2\`.`,
  advice:
    'The model explains too little of the hold-out variation: add the inputs or terms it is missing, or lower the floor if the data cannot support it.',
  line: (d) => d.fit.line,
  measurePredictions: predictionsHoldout('r2'),
  measure({ metrics }) {
    if (Number.isNaN(metrics.holdoutR2)) {
      return { value: null, reason: 'not-applicable', message: 'the hold-out target is constant, so R^2 is not defined' };
    }
    return { value: metrics.holdoutR2, message: `hold-out R^2 is ${formatNumber(metrics.holdoutR2)}` };
  },
};

export default check;
