/**
 * How the checks shared with regression measure a binary classifier (Check.measureClassifier):
 * each figure is the classification counterpart of the regression one, from the log-loss
 * (mean -[y log p + (1 - y) log(1 - p)]) where the regression check uses the RMSE.
 */
import { formatNumber } from '../../core/format.js';
import { clip } from '../../core/errors.js';
import { jsonMetrics } from '../../core/json.js';
import { fromJsonNumber } from '../../result/result.js';
import type { Measurement } from '../types.js';
import type { ClassifierContext } from './context.js';

/** b / a, with 0 / 0 = 1 and x / 0 = Infinity. */
function ratio(a: number, b: number): number {
  if (a === 0) return b === 0 ? 1 : Infinity;
  return b / a;
}

/** `generalisation-gap`: hold-out log-loss / training log-loss. */
export function classifierGap({ train, holdout }: ClassifierContext): Measurement {
  const value = ratio(train.logLoss, holdout.logLoss);
  return {
    value,
    message: `hold-out log-loss ${formatNumber(holdout.logLoss)} is ${formatNumber(value)} times the training log-loss ${formatNumber(train.logLoss)}`,
    metrics: { gap_ratio: value },
  };
}

/** `coefficient-size`: max over non-intercept columns of |w_j| sd(phi_j), the change of the log-odds for one standard deviation of the column. */
export function classifierCoefficientSize({ fit, design, columnSd }: ClassifierContext): Measurement {
  let best = -1;
  let value = Number.NaN;
  for (let j = 0; j < design.p; j++) {
    if (!design.penalised[j]) continue;
    const s = Math.abs(fit.coefficients[j]) * columnSd[j];
    if (best < 0 || s > value || Number.isNaN(s)) {
      value = s;
      best = j;
    }
  }
  if (best < 0) return { value: null, reason: 'no-columns', message: 'the model has no non-intercept columns' };
  const term = design.termOffsets.findLastIndex((o) => o <= best);
  return {
    value,
    message: `largest standardised coefficient is ${formatNumber(value)} (log-odds per standard deviation), on column \`${design.columnNames[best]}\``,
    line: term >= 0 ? design.terms[term].spec.line : undefined,
    detail: { column: design.columnNames[best] },
    metrics: { max_std_coefficient: value, max_std_coefficient_column: design.columnNames[best] },
  };
}

/** `cross-validation`: pooled k-fold CV log-loss / training log-loss. */
export function classifierCrossValidation({ crossValidation: cv, train }: ClassifierContext): Measurement {
  if (cv === null)
    return { value: null, reason: 'too-few-rows', message: `cross-validation needs at least 2 training rows, got ${train.rows}` };
  const value = ratio(train.logLoss, cv.logLoss);
  return {
    value,
    message: `${cv.k}-fold CV log-loss ${formatNumber(cv.logLoss)} is ${formatNumber(value)} times the training log-loss ${formatNumber(train.logLoss)}${cv.converged ? '' : ' (a fold fit did not converge)'}`,
    metrics: jsonMetrics({ cv_log_loss: cv.logLoss, cv_folds: cv.k }),
    detail: { folds: cv.k, fold_rows: cv.foldRows, fold_log_loss: cv.foldLogLoss, converged: cv.converged },
  };
}

/** `leakage`: hold-out rows that repeat a training row (inputs and label). */
export function classifierLeakage({ leakage, design }: ClassifierContext): Measurement {
  if (design.inputs.length === 0)
    return { value: null, reason: 'not-applicable', message: 'the model reads no input column, so no row can repeat' };
  const of = (file: string | undefined): string => (file === undefined ? '' : ` of ${clip(file)}`);
  const shown = leakage.examples
    .map((e) => `hold-out line ${e.holdoutLine}${of(e.holdoutFile)} = training line ${e.trainLine}${of(e.trainFile)}`)
    .join(', ');
  return {
    value: leakage.duplicates,
    message:
      leakage.duplicates === 0
        ? 'no hold-out row repeats a training row'
        : `${leakage.duplicates} hold-out rows repeat a training row, inputs and label (${shown})`,
    metrics: { leaked_rows: leakage.duplicates },
  };
}

/** `reproducibility`: largest |p_shipped - p_refit| over the training and hold-out rows. */
export function classifierReproducibility({ shipped }: ClassifierContext): Measurement {
  if (shipped === null) return { value: null, reason: 'no-coefficients', message: 'the descriptor ships no coefficients' };
  return {
    value: shipped.maxProbabilityDifference,
    message: `the shipped coefficients' probabilities differ from the refit's by up to ${formatNumber(shipped.maxProbabilityDifference)} (largest coefficient difference ${formatNumber(shipped.maxCoefficientDifference)})`,
    metrics: jsonMetrics({
      shipped_max_probability_difference: shipped.maxProbabilityDifference,
      shipped_holdout_log_loss: shipped.holdoutLogLoss,
    }),
  };
}

/** `conditioning`: condition number of the column-scaled weighted design sqrt(W) X at the optimum. */
export function classifierConditioning({ weighted, design }: ClassifierContext): Measurement {
  const value = weighted.conditionNumberScaled;
  const cols = weighted.collinearColumns.map((j) => `\`${design.columnNames[j]}\``).join(', ');
  return {
    value,
    message: `the weighted design sqrt(W) X at the optimum has scaled condition number ${formatNumber(value)}${value > 1e3 && cols ? ` (nearly collinear: ${cols})` : ''}`,
    metrics: jsonMetrics({ condition_number: value, rank: weighted.rank }),
  };
}

/** `base-change`: relative change of the hold-out log-loss against the base commit. */
export function classifierBaseChange({ holdout, baseline }: ClassifierContext): Measurement {
  if (!baseline) return { value: null, reason: 'no-base', message: 'no model of this name to compare with on the base commit' };
  const raw = baseline.metrics?.holdout_log_loss;
  const base = typeof raw === 'number' || typeof raw === 'string' ? fromJsonNumber(raw as never) : Number.NaN;
  if (Number.isNaN(base))
    return { value: null, reason: 'base-not-checked', message: 'the model could not be checked as a classifier on the base commit' };
  const head = holdout.logLoss;
  const value = base === 0 ? (head === 0 ? 0 : Infinity) : (head - base) / base;
  return {
    value,
    message: `hold-out log-loss ${formatNumber(head)} against ${formatNumber(base)} on the base commit`,
    detail: { base_holdout_log_loss: base },
  };
}

/** `complexity`: the current setting's CV log-loss / that of the setting the one-standard-error rule picks. */
export function classifierComplexity({ complexity: sweep }: ClassifierContext): Measurement {
  if (sweep === null || sweep.chosen < 0 || sweep.current < 0)
    return { value: null, reason: 'not-applicable', message: 'the model has no complexity setting to sweep, or too few rows' };
  const label = (i: number): string => `${sweep.kind} ${formatNumber(sweep.points[i].value)}`;
  const chosen = sweep.points[sweep.chosen];
  const current = sweep.points[sweep.current];
  const value = chosen.cvLogLoss > 0 ? current.cvLogLoss / chosen.cvLogLoss : current.cvLogLoss === 0 ? 1 : Infinity;
  const detail = {
    setting: sweep.kind,
    rule: 'one-standard-error',
    chosen: sweep.chosen,
    best: sweep.best,
    current: sweep.current,
    curve: sweep.points.map((p) => ({ setting: p.value, cv_log_loss: p.cvLogLoss, se: p.standardError })),
  };
  if (sweep.chosen === sweep.current) {
    return {
      value,
      message: `${label(sweep.current)} is the simplest setting within one standard error of the best CV log-loss (${sweep.points.length} settings swept)`,
      line: sweep.line,
      detail,
      metrics: { suggested_setting: label(sweep.current) },
    };
  }
  return {
    value,
    message: `${label(sweep.chosen)} has k-fold CV log-loss ${formatNumber(chosen.cvLogLoss)} against ${formatNumber(current.cvLogLoss)} for the current ${label(sweep.current)}; the simplest of ${sweep.points.length} settings within one standard error of the best`,
    line: sweep.line,
    detail,
    metrics: { suggested_setting: label(sweep.chosen) },
    suggestion: {
      text: `${label(sweep.chosen)} (k-fold CV log-loss ${formatNumber(chosen.cvLogLoss)} against ${formatNumber(current.cvLogLoss)} now)`,
      line: sweep.line,
    },
  };
}
