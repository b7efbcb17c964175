/**
 * `parameter-ratio`: fitted parameters per training row.
 */
import { trainingRows } from '../data/model-data.js';
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import type { Limit } from '../config/types.js';
import { roundUp2 } from '../config/init-files.js';
import { predictionsParameterRatio } from './predictions/measures.js';

const LIMIT_KEY = 'params_per_sample';
const ADVICE = 'Remove terms, lower the degree or the number of radial centres, add a ridge penalty, or add training rows.';

/**
 * When the built-in limit (not one the user set) is exceeded, the advice says which rule it is
 * and how to relax it for a small data set; otherwise nothing (the check's own advice).
 */
function ruleAdvice(limit: Limit | undefined, ratio: number): { advice?: string } {
  if (limit?.source !== 'default' || limit.fail === null || !(ratio > limit.fail) || !Number.isFinite(ratio) || ratio >= 1) return {};
  return {
    advice:
      `The default limit ${formatNumber(limit.fail)} is a rule of thumb (common practice: at least ${formatNumber(1 / limit.fail)} training rows per parameter), not a law. ` +
      `${ADVICE} If the data set is small by nature and the fit is otherwise sound, relax the rule for this model in its descriptor: \`limits: { ${LIMIT_KEY}: ${roundUp2(ratio)} }\`.`,
  };
}

const check: Check = {
  id: 'parameter-ratio',
  title: 'Parameters per row',
  limitKey: LIMIT_KEY,
  defaultLimit: 0.1,
  direction: 'above',
  limitSummary: 'Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).',
  description: `- Default \`0.1\` (common practice: at least 10 training rows per
  fitted parameter). Points at the \`terms\` line.
- Figure: p / n, p the columns of the design (intercept included), n the training rows. With
  p = n a least-squares fit interpolates its training rows exactly. With \`fit.parameter_count:
  effective\`, the effective degrees of freedom of a ridge fit take the place of p:
  df = trace of the hat matrix = sum_j d_j^2 / (d_j^2 + lambda) (ESL eq. 3.50).`,
  advice: ADVICE,
  line: (d) => (d.fit.parameterCount === 'effective' ? d.fit.ridgeLine : d.termsLine),
  measurePredictions: predictionsParameterRatio,
  measure({ metrics, design, train, fit, descriptor }) {
    if (descriptor.fit.parameterCount === 'effective') {
      const df = fit.degreesOfFreedom;
      const ratio = df / trainingRows(train);
      return {
        value: ratio,
        reason: 'effective',
        message: `${formatNumber(df)} effective parameters (of ${design.p} columns) for ${trainingRows(train)} training rows (${formatNumber(ratio)} per row)`,
        detail: { counted: 'effective', effective_df: df, columns: design.p },
      };
    }
    return {
      value: metrics.paramsPerSample,
      message: `${design.p} parameters for ${trainingRows(train)} training rows (${formatNumber(metrics.paramsPerSample)} per row)`,
      detail: { counted: 'columns', columns: design.p },
      ...ruleAdvice(descriptor.limits[LIMIT_KEY], metrics.paramsPerSample),
    };
  },
};

export default check;
