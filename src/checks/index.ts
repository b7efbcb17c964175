/**
 * The check registry: every check module, in a stable order, and the code that runs them.
 * To add a check: write `checks/<id>.ts` default-exporting a {@link Check} and list it below;
 * `npm run bundle` (test/tools/gen-validators.mjs) then regenerates the limit-key table, the
 * JSON Schemas' `limits` and docs/checks.md from this list, and tests fail while they are stale.
 */
import type { Descriptor, Limit, Task } from '../config/types.js';
import type { ClassifierContext } from './classifier/context.js';
import type { PredictionsContext } from './predictions/context.js';
import { jsonNumber, type CheckResult } from '../result/result.js';
import { formatNumber } from '../core/format.js';
import baseChange from './base-change.js';
import chiSquare from './chi-square.js';
import coefficientSize from './coefficient-size.js';
import generalisationGap from './generalisation-gap.js';
import holdoutMae from './holdout-mae.js';
import holdoutR2 from './holdout-r2.js';
import holdoutRmse from './holdout-rmse.js';
import parameterRatio from './parameter-ratio.js';
import complexity from './complexity.js';
import conditioning from './conditioning.js';
import crossValidation from './cross-validation.js';
import leakage from './leakage.js';
import reproducibility from './reproducibility.js';
import swing from './swing.js';
import swingBeyond from './swing-beyond.js';
import calibrationSlope from './calibration-slope.js';
import eventsPerParameter from './events-per-parameter.js';
import separation from './separation.js';
import swingSpikes from './swing-spikes.js';
import { appliesTo, judge, type Check, type CheckContext, type Measurement } from './types.js';

export type { Check, CheckContext, CoreMetrics, Measurement } from './types.js';
export type { ClassifierContext } from './classifier/context.js';
export type { PredictionsContext } from './predictions/context.js';

/** Every check, in report order. Ids are unique (checked on load). */
export const CHECKS: readonly Check[] = validate([
  generalisationGap,
  parameterRatio,
  coefficientSize,
  baseChange,
  crossValidation,
  swing,
  swingBeyond,
  swingSpikes,
  leakage,
  reproducibility,
  conditioning,
  complexity,
  holdoutR2,
  holdoutRmse,
  holdoutMae,
  chiSquare,
  separation,
  eventsPerParameter,
  calibrationSlope,
]);

function validate(checks: Check[]): Check[] {
  const seen = new Set<string>();
  for (const c of checks) {
    if (seen.has(c.id)) throw new Error(`duplicate check id ${c.id}`);
    if (!/^[a-z][a-z0-9-]*$/.test(c.id)) throw new Error(`check id ${c.id} is not kebab-case`);
    seen.add(c.id);
  }
  return checks;
}

/**
 * The limit keys of the registry with their defaults, directions, summaries and the tasks their
 * checks apply to ({@link appliesTo}), in registry order: the source of src/config/generated/limit-keys.ts, of the JSON Schemas' `limits` and of
 * docs/checks.md (test/tools/gen-validators.mjs writes them; tests keep them current).
 */
export function registryLimitKeys(): {
  key: string;
  defaultSpec: Check['defaultLimit'];
  direction: Check['direction'];
  description: string;
  tasks: Task[];
}[] {
  const all: Task[] = ['regression', 'classification'];
  return CHECKS.map((c) => ({
    key: c.limitKey,
    defaultSpec: c.defaultLimit,
    direction: c.direction,
    description: c.limitSummary,
    tasks: all.filter((task) => appliesTo(c, task)),
  }));
}

/** The check with this id, or undefined. */
export function findCheck(id: string): Check | undefined {
  return CHECKS.find((c) => c.id === id);
}

function describeLimit(status: CheckResult['status'], value: number, limit: Limit): string {
  if (status === 'fail')
    return limit.failBelow !== null && value < limit.failBelow
      ? `under the fail floor ${formatNumber(limit.failBelow)}`
      : `over the fail limit ${formatNumber(limit.fail)}`;
  if (status === 'warn')
    return limit.warnBelow !== null && value < limit.warnBelow
      ? `under the warning floor ${formatNumber(limit.warnBelow)}`
      : `over the warning limit ${formatNumber(limit.warn)}`;
  if (limit.off) return 'limit is off';
  const parts: string[] = [];
  if (limit.warnBelow !== null) parts.push(`warn below ${formatNumber(limit.warnBelow)}`);
  if (limit.failBelow !== null) parts.push(`fail below ${formatNumber(limit.failBelow)}`);
  if (limit.warn !== null) parts.push(`warn above ${formatNumber(limit.warn)}`);
  if (limit.fail !== null) parts.push(`fail above ${formatNumber(limit.fail)}`);
  return `within limits (${parts.join(', ')})`;
}

/**
 * Runs one check and compares its figure with the model's limit. A check that throws becomes
 * a skipped outcome with code `<id>/internal-error` (the run goes on).
 */
export function runCheck(check: Check, context: CheckContext): { outcome: CheckResult; figures: Measurement['metrics'] } {
  return judgeCheck(check, context.descriptor, () => check.measure(context));
}

/**
 * Runs one check on a binary classifier: its `measureClassifier`, or a skipped outcome
 * `<id>/not-for-classification` when the check does not apply to classifiers.
 */
export function runClassifierCheck(check: Check, context: ClassifierContext): { outcome: CheckResult; figures: Measurement['metrics'] } {
  const measure = check.measureClassifier;
  if (!appliesTo(check, 'classification') || measure === undefined) {
    return judgeCheck(check, context.descriptor, () => ({
      value: null,
      reason: 'not-for-classification',
      message: 'applies to regression models only',
    }));
  }
  return judgeCheck(check, context.descriptor, () => measure.call(check, context));
}

/**
 * Runs one check on a model trained elsewhere (`predictions`): its `measurePredictions`; a check
 * without one needs a refit or coefficients and is skipped with `<id>/needs-refit`; a check not
 * for the model's task is skipped as for models of terms.
 */
export function runPredictionsCheck(check: Check, context: PredictionsContext): { outcome: CheckResult; figures: Measurement['metrics'] } {
  const { descriptor } = context;
  const measure = check.measurePredictions;
  if (!appliesTo(check, descriptor.task)) {
    return judgeCheck(check, descriptor, () => ({
      value: null,
      reason: descriptor.task === 'classification' ? 'not-for-classification' : 'not-for-regression',
      message: descriptor.task === 'classification' ? 'applies to regression models only' : 'applies to classifiers only',
    }));
  }
  if (measure === undefined) {
    return judgeCheck(check, descriptor, () => ({
      value: null,
      reason: 'needs-refit',
      message:
        "skipped: this check needs a refit or the model's coefficients, and the model was trained elsewhere (`predictions`: fitgate has its predictions only)",
      line: descriptor.predictions?.line,
    }));
  }
  return judgeCheck(check, descriptor, () => measure.call(check, context));
}

/** The checks that apply to a task, in report order (a regression model's report lists only these). */
export function checksFor(task: Task): Check[] {
  return CHECKS.filter((c) => task === 'classification' || appliesTo(c, task));
}

function judgeCheck(
  check: Check,
  descriptor: Descriptor,
  measure: () => Measurement,
): { outcome: CheckResult; figures: Measurement['metrics'] } {
  const context = { descriptor };
  const limit = context.descriptor.limits[check.limitKey];
  const line = limit?.line ?? null;
  let measured: Measurement;
  try {
    measured = measure();
  } catch (error) {
    measured = {
      value: null,
      reason: 'internal-error',
      message: `could not be computed: ${error instanceof Error ? error.message : String(error)}`,
    };
  }
  const effective: Limit = limit ?? { warn: null, fail: null, warnBelow: null, failBelow: null, off: true, source: 'default', line: null };
  const status = judge(measured.value, effective);
  const reason = measured.reason ?? (status === 'skipped' && effective.off ? 'off' : status);
  const comparison = measured.value === null ? '' : `; ${describeLimit(status, measured.value, effective)}`;
  // Two literals of the one key order (with and without `floor`), the optional tail assigned in
  // order: no spread of a temporary object per key (every model makes one outcome per check).
  const id = check.id;
  const code = `${id}/${reason}`;
  const value = measured.value === null ? null : jsonNumber(measured.value);
  const limitKey = check.limitKey;
  const failAt = effective.off ? null : effective.fail;
  const warnAt = effective.off ? null : effective.warn;
  const floor =
    !effective.off && (effective.warnBelow !== null || effective.failBelow !== null)
      ? { warn: effective.warnBelow, fail: effective.failBelow }
      : null;
  const at = line ?? measured.line ?? check.line(context.descriptor);
  const message = `${measured.message}${comparison}`;
  const advice = status === 'fail' || status === 'warn' ? (measured.advice ?? check.advice) : '';
  const outcome: CheckResult =
    floor === null
      ? { id, code, status, value, limitKey, limit: failAt, warn: warnAt, line: at, message, advice }
      : { id, code, status, value, limitKey, limit: failAt, warn: warnAt, floor, line: at, message, advice };
  if (measured.detail) outcome.detail = measured.detail;
  if (measured.suggestion) outcome.suggestion = measured.suggestion;
  return { outcome, figures: measured.metrics };
}
