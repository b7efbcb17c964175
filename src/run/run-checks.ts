/**
 * The check loop both tasks share: each check in registry order is measured and judged, its
 * figures are added to the model's metrics, and the model's verdict is the worst status. The
 * model's time limit (core/deadline.ts) is checked before and after every check.
 */
import type { Check, Measurement } from '../checks/index.js';
import { checkDeadline } from '../core/deadline.js';
import { worse, type CheckResult, type ModelMetrics, type Verdict } from '../result/result.js';

/**
 * Runs `checks` in order with `run` (the task's runner: `runCheck` or `runClassifierCheck` bound
 * to the model's context), adding each check's figures to `metrics` in place.
 * @returns the outcomes in order and the model's verdict (`pass` when nothing warns or fails)
 */
export function runChecks(
  checks: readonly Check[],
  run: (check: Check) => { outcome: CheckResult; figures: Measurement['metrics'] },
  metrics: ModelMetrics,
): { checks: CheckResult[]; verdict: Verdict } {
  const outcomes: CheckResult[] = [];
  let verdict: Verdict = 'pass';
  for (const check of checks) {
    const stage = `${check.id} check`;
    checkDeadline(stage);
    const { outcome, figures } = run(check);
    // A check stopped by the deadline is caught as a check error: the model stops here instead.
    checkDeadline(stage);
    outcomes.push(outcome);
    if (figures) Object.assign(metrics, figures);
    if (outcome.status === 'fail' || outcome.status === 'warn') verdict = worse(verdict, outcome.status);
  }
  return { checks: outcomes, verdict };
}
