/**
 * `base-change`: how much worse the hold-out RMSE got against the same model on the pull
 * request's base commit, as a fraction.
 */
import type { Check } from './types.js';
import { classifierBaseChange } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';
import { fromJsonNumber } from '../result/result.js';
import { predictionsBaseChange } from './predictions/measures.js';

/** Formats a fraction as a signed percentage, e.g. `+12.5%`. */
function percent(x: number): string {
  if (!Number.isFinite(x)) return formatNumber(x);
  return `${x >= 0 ? '+' : ''}${formatNumber(x * 100, 3)}%`;
}

const check: Check = {
  id: 'base-change',
  title: 'Change against the base commit',
  limitKey: 'base_change',
  defaultLimit: 'off',
  direction: 'above',
  limitSummary: 'Relative change of the hold-out RMSE against the same model on the base branch.',
  description: `- Default \`off\`. Points at the \`fit\` line.
- Figure: (hold-out RMSE now - hold-out RMSE on the base commit) / hold-out RMSE on the base
  commit, for pull requests (the action) or \`fitgate check --base REF\`. Skipped for models new in
  the pull request and when no base commit is available. \`base_change: 0.1\` allows 10 % worse.`,
  advice:
    'Find what made the hold-out error grow since the base commit (added terms, a smaller ridge penalty, changed rows) and undo it, or raise `base_change` when the change is intended.',
  line: (d) => d.termsLine,
  measureClassifier: classifierBaseChange,
  measurePredictions: predictionsBaseChange,
  measure({ metrics, baseline }) {
    if (!baseline) return { value: null, reason: 'no-base', message: 'no model of this name to compare with on the base commit' };
    const base = baseline.metrics ? fromJsonNumber(baseline.metrics.holdout_rmse) : Number.NaN;
    if (Number.isNaN(base))
      return { value: null, reason: 'base-not-checked', message: 'the model could not be checked on the base commit' };
    const head = metrics.holdoutRmse;
    const value = base === 0 ? (head === 0 ? 0 : Infinity) : (head - base) / base;
    return {
      value,
      message: `hold-out RMSE ${formatNumber(head)} against ${formatNumber(base)} on the base commit (${percent(value)})`,
      detail: { base_holdout_rmse: base },
    };
  },
};

export default check;
