/**
 * The one shape every check has. A check measures one figure of a fitted model; the registry
 * compares the figure with the model's limit for that check and writes the outcome. Checks never
 * log, format or read settings on their own.
 */
import type { Descriptor, Limit, LimitDirection, LimitSpec, Task } from '../config/types.js';
import type { ClassifierContext } from './classifier/context.js';
import type { PredictionsContext } from './predictions/context.js';
import type { Design } from '../design/design-matrix.js';
import type { FitResult } from '../fit/index.js';
import type { ModelData } from '../data/model-data.js';
import type { ModelAnalyses } from '../diagnostics/analyses.js';
import type { PairedErrorFigures } from '../diagnostics/regression-metrics.js';
import type { ShippedScore } from '../diagnostics/shipped.js';
import type { TargetScale } from '../diagnostics/target-scale.js';
import type { CheckStatus, ModelResult } from '../result/result.js';

/** Figures of the refit that every check may read (plain numbers; non-finite allowed). */
export interface CoreMetrics extends PairedErrorFigures {
  paramsPerSample: number;
  /** max_j |w_j| sd(phi_j) / sd(y) over non-intercept columns; NaN when there are none. */
  maxStdCoefficient: number;
  /** Index of the column with the largest standardised coefficient, or -1. */
  maxStdCoefficientColumn: number;
  maxAbsCoefficient: number;
  /** Population standard deviation of each design column (training rows). */
  columnSd: Float64Array;
  /** Population standard deviation of the training target. */
  targetSd: number;
  /** Smallest and largest training target. */
  targetRange: [number, number];
}

/** Everything a check may read about one model. */
export interface CheckContext {
  descriptor: Descriptor;
  design: Design;
  fit: FitResult;
  metrics: CoreMetrics;
  train: ModelData;
  holdout: ModelData;
  /** The same model (by name) on the base commit of a pull request; null when there is none to compare with. */
  baseline: ModelResult | null;
  /** Diagnostics shared by several checks, each computed once (cross-validation, swing, leakage...). */
  analyses: ModelAnalyses;
  /** The refit's predictions of the training and hold-out rows (lengths train.rows, holdout.rows). */
  predictions: { train: Float64Array; holdout: Float64Array };
  /** The descriptor's shipped coefficients scored on the same rows; null when it ships none. */
  shipped: ShippedScore | null;
  /**
   * A model fitted on a transformed target (`data.target_transform`): its figures on both scales.
   * `metrics`' error figures are then those of `targetScale.limitsScale`. Absent or null otherwise.
   */
  targetScale?: TargetScale | null;
}

/** What a check measured. `value: null` means the check does not apply (status skipped). */
export interface Measurement {
  value: number | null;
  /** Sub-reason appended to the check id in the outcome's code (e.g. `not-applicable`). */
  reason?: string;
  /** One sentence on what was measured (without the limit); the registry adds the comparison. */
  message: string;
  /** Descriptor line to annotate when the model does not set this check's limit. */
  line?: number;
  /** Figures for the JSON report (added to the check outcome). */
  detail?: Record<string, unknown>;
  /** Figures to add to the model's metrics (snake_case keys). */
  metrics?: Record<string, number | string | null>;
  /**
   * A change to propose at a descriptor line (shown as a notice whatever the status); `change`,
   * when given, is the one value to write instead (the action's review suggestion rewrites it).
   */
  suggestion?: { text: string; line: number; change?: { key: string; value: number } };
  /** Advice for this outcome when it warns or fails, instead of the check's own `advice`. */
  advice?: string;
}

/** A check module's default export. */
export interface Check {
  /** Stable id, kebab-case, e.g. `generalisation-gap`. */
  id: string;
  /** Short title for annotations and tables. */
  title: string;
  /** Limit key in YAML (`limits:` map), e.g. `gap_ratio`. */
  limitKey: string;
  /** The built-in limit, used when neither the settings file nor the descriptor sets the key. */
  defaultLimit: LimitSpec;
  /** `above`: the figure fails above its limit (a ceiling); `below`: below it (a floor). */
  direction: LimitDirection;
  /** One sentence: what figure the limit applies to (schema descriptions, the docs' tables). */
  limitSummary: string;
  /** One paragraph for docs/checks.md: what the figure is, its exact formula and its source. */
  description: string;
  /** One sentence on what to change when the check warns or fails. */
  advice: string;
  /** Default line to point at: the term or `fit` line that drives the figure. */
  line(descriptor: Descriptor): number;
  /** Measures the figure of a regression model. Must not throw for any fitted model. */
  measure(context: CheckContext): Measurement;
  /**
   * The tasks the check applies to. Default: `regression`, plus `classification` when the check
   * has {@link measureClassifier}. A classifier's report lists a check that does not apply as
   * skipped (`<id>/not-for-classification`); a regression model's report leaves out checks made
   * for classifiers only.
   */
  tasks?: readonly Task[];
  /** Measures the figure of a binary classifier (task `classification`). Must not throw. */
  measureClassifier?(context: ClassifierContext): Measurement;
  /**
   * Measures the figure of a model trained elsewhere (`predictions`) from its predictions alone,
   * either task. Absent: the check needs a refit or coefficients and such a model's report lists
   * it as skipped (`<id>/needs-refit`). Must not throw.
   */
  measurePredictions?(context: PredictionsContext): Measurement;
}

/** Whether a check applies to a task (see {@link Check.tasks}). */
export function appliesTo(check: Check, task: Task): boolean {
  if (check.tasks) return check.tasks.includes(task);
  return task === 'regression' || check.measureClassifier !== undefined;
}

/**
 * Compares a figure with a limit: beyond a fail bound (above `fail`, below `failBelow`) fails,
 * beyond a warn bound warns; a figure that is null or NaN, or an `off` limit, is skipped.
 */
export function judge(value: number | null, limit: Limit): CheckStatus {
  if (limit.off || value === null || Number.isNaN(value)) return 'skipped';
  if ((limit.fail !== null && value > limit.fail) || (limit.failBelow !== null && value < limit.failBelow)) return 'fail';
  if ((limit.warn !== null && value > limit.warn) || (limit.warnBelow !== null && value < limit.warnBelow)) return 'warn';
  return 'pass';
}
