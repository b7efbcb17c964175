/**
 * The plain, serialisable result of a run. The pipeline builds it; reporters only format it.
 * The JSON report is exactly `JSON.stringify(result)` (non-finite numbers become strings
 * `"Infinity"`, `"-Infinity"`, `"NaN"` through {@link jsonNumber}).
 */
import type { JsonNumber } from '../core/json.js';
import type { ChartData } from './chart-types.js';
import type { ClassifierChartData } from './classifier-chart-types.js';

export { fromJsonNumber, jsonNumber, type JsonNumber } from '../core/json.js';

/** Status of one check. */
export type CheckStatus = 'pass' | 'warn' | 'fail' | 'skipped';

/** Verdict of a model or of the whole run. `error`: the model could not be checked. */
export type Verdict = 'pass' | 'warn' | 'fail' | 'error';

/** The outcome of one check on one model. */
export interface CheckResult {
  /** Check id, e.g. `generalisation-gap`. */
  id: string;
  /** Stable code: the id plus the status or a sub-reason, e.g. `generalisation-gap/fail`, `holdout-rmse/off`. */
  code: string;
  status: CheckStatus;
  /** The figure the limit applies to; null when skipped or not computable. */
  value: JsonNumber | null;
  /** The limit key in YAML, e.g. `gap_ratio`. */
  limitKey: string;
  /** Fail threshold (null when only a warning threshold is set or the limit is off). */
  limit: number | null;
  /** Warning threshold, or null. */
  warn: number | null;
  /**
   * Floors, when the limit has any (checks whose figure fails below a value, or an explicit
   * `fail_below`/`warn_below`): the figure fails below `fail` and warns below `warn`. Absent
   * for a limit made of ceilings only (`limit`, `warn` above).
   */
  floor?: { warn: number | null; fail: number | null };
  /** Descriptor line to annotate. */
  line: number;
  /** One sentence on the finding. */
  message: string;
  /** One sentence on what to change (empty when passing). */
  advice: string;
  /** Extra figures for charts and the JSON report. */
  detail?: Record<string, unknown>;
  /**
   * A change to propose (e.g. `degree 3`) at a descriptor line; reporters show it as a notice.
   * `change`: the key whose value changes and the new value (e.g. `{ key: 'degree', value: 3 }`),
   * when the change is one value.
   */
  suggestion?: { text: string; line: number; change?: { key: string; value: number } };
}

/** Fit and hold-out figures of one model. Non-finite values as {@link JsonNumber}. */
export interface ModelMetrics {
  train_rmse: JsonNumber;
  holdout_rmse: JsonNumber;
  train_mae: JsonNumber;
  holdout_mae: JsonNumber;
  train_r2: JsonNumber;
  holdout_r2: JsonNumber;
  /** Hold-out RMSE / training RMSE; Infinity when training RMSE is 0 and hold-out is not. */
  gap_ratio: JsonNumber;
  /** Fitted parameters / training rows. */
  params_per_sample: JsonNumber;
  /** max over non-intercept columns of |w_j| sd(phi_j) / sd(y). */
  max_std_coefficient: JsonNumber;
  /** Name of the column with the largest standardised coefficient. */
  max_std_coefficient_column: string | null;
  /** max |w_j| over all coefficients. */
  max_abs_coefficient: JsonNumber;
  /** Numerical rank of the design. */
  rank: number;
  /** 2-norm condition number of the column-scaled design. */
  condition_number: JsonNumber;
  /** Further figures added by diagnostics (cross-validation, swing, ...). */
  [key: string]: JsonNumber | string | number | null;
}

/** Error figures of one scale of a model with a transformed target (see {@link TargetScaleResult}). */
export interface TargetScaleFigures {
  train_rmse: JsonNumber;
  holdout_rmse: JsonNumber;
  train_mae: JsonNumber;
  holdout_mae: JsonNumber;
  train_r2: JsonNumber;
  holdout_r2: JsonNumber;
  /** holdout_rmse / train_rmse. */
  gap_ratio: JsonNumber;
  /** Pooled k-fold RMSE; null without cross-validation. */
  cv_rmse: JsonNumber | null;
  /** Reduced chi-square of the training and hold-out rows; present with `data.sigma` only. */
  train_chi_square?: JsonNumber;
  holdout_chi_square?: JsonNumber;
}

/**
 * A model fitted on a transformed target (`data.target_transform`): its error figures on the
 * original scale (y against the back-transformed predictions, a median of y) and on the
 * transformed one (the fit's own). `metrics` holds the `limits_scale` ones.
 */
export interface TargetScaleResult {
  transform: 'log' | 'log1p' | 'sqrt';
  /** The scale the error limits judged. */
  limits_scale: 'original' | 'transformed';
  /** The back-transform of predictions: `exp`, `expm1` or `square` (of max(t, 0)). */
  back_transform: 'exp' | 'expm1' | 'square';
  original: TargetScaleFigures;
  transformed: TargetScaleFigures;
}

/** Figures of the shipped coefficients, when a descriptor carries them. */
export interface ShippedMetrics {
  train_rmse: JsonNumber;
  holdout_rmse: JsonNumber;
  /** max |shipped - refit| over coefficients. */
  max_coefficient_difference: JsonNumber;
}

/**
 * How a model compares with the same model on the base commit of a pull request, found by name,
 * else by descriptor path, else by its data files (train, hold-out, target) when exactly one base
 * model left over has them. `new`: no such model on the base commit (figures null). `compared`:
 * the base model of the same name. `renamed`: the base model of the same descriptor path or data
 * files under another name (`previous` says which). A base figure is null when the base model
 * could not be checked.
 */
export interface BaseComparison {
  status: 'new' | 'compared' | 'renamed';
  /** Full SHA of the base commit. */
  commit: string;
  /** Status `renamed`: the base model compared with, and what matched it. Absent otherwise. */
  previous?: { name: string; descriptor: string; matched_by: 'descriptor' | 'data' };
  /** Hold-out RMSE on the base commit, or null. */
  holdout_rmse: JsonNumber | null;
  /** Gap ratio on the base commit, or null. */
  gap_ratio: JsonNumber | null;
  /** (head hold-out RMSE - base) / base; positive = worse. Null when either side is missing. */
  holdout_rmse_change: JsonNumber | null;
  /** head gap ratio - base gap ratio. Null when either side is missing. */
  gap_ratio_change: JsonNumber | null;
  /** Classifiers only: hold-out log-loss on the base commit, or null (the RMSE fields are null for a classifier). */
  holdout_log_loss?: JsonNumber | null;
  /** Classifiers only: (head hold-out log-loss - base) / base; positive = worse. Null when either side is missing. */
  holdout_log_loss_change?: JsonNumber | null;
}

/** One model's outcome. */
export interface ModelResult {
  name: string;
  /** Descriptor path relative to the repository root. */
  descriptor: string;
  /**
   * `predictions`: a model trained elsewhere, gated from its predictions alone (nothing refitted;
   * `parameters` is the stated count, 0 when not stated; `columns` and `coefficients` empty).
   * Absent: a model of terms that fitgate fits.
   */
  kind?: 'predictions';
  verdict: Verdict;
  rows: { train: number; holdout: number };
  /**
   * The data files read, repository-relative, in reading order; present only when `data.train` or
   * `data.holdout` is a list of parts or a glob (so reports of one file per side keep their shape).
   */
  data?: { train: string[]; holdout: string[] };
  /** Rows dropped for a missing cell, per file; present only with `data.missing: drop`. */
  dropped?: { train: number; holdout: number };
  parameters: number;
  /** Column names of the design, in order (`(intercept)`, `x`, `x^2`, `rbf(x; c=1.5)`...). */
  columns: string[];
  metrics: ModelMetrics | null;
  /** Refit coefficients, intercept first. */
  coefficients: JsonNumber[];
  shipped: ShippedMetrics | null;
  /** A model with `data.target_transform`: figures on both scales; absent otherwise. */
  target_scale?: TargetScaleResult;
  checks: CheckResult[];
  /** Comparison with the base commit; absent when no comparison was asked for or possible. */
  base?: BaseComparison;
  /** Set when the model could not be checked (verdict `error`). */
  error: { message: string; file: string | null; line: number | null; code: string; column?: number | null } | null;
  /** Extra data for charts and further reporters. */
  extra?: Record<string, unknown>;
  /** What the HTML report and the Markdown charts draw (see model/chart-data.ts); absent for models that could not be checked. */
  charts?: ChartData;
  /** What the HTML report draws for a classifier (run/classifier-chart-data.ts); absent for regression models and models that could not be checked. */
  classifier_charts?: ClassifierChartData;
}

/** The whole run. */
export interface Result {
  tool: { name: 'fitgate'; version: string };
  /** Overall verdict: the worst model verdict (`pass` when there are no models). */
  verdict: Verdict;
  counts: { models: number; pass: number; warn: number; fail: number; error: number };
  models: ModelResult[];
  /** Messages about the run as a whole (e.g. base commit not available). */
  notes: string[];
  /**
   * The share of the models this run checked (`--shard K/N`: index K, count N), so that
   * `fitgate merge` can tell when a shard's report is missing. Absent for a whole run.
   */
  shard?: { index: number; count: number };
}

const ORDER: Record<Verdict, number> = { pass: 0, warn: 1, fail: 2, error: 3 };

/** The worse of two verdicts (error > fail > warn > pass). */
export function worse(a: Verdict, b: Verdict): Verdict {
  return ORDER[a] >= ORDER[b] ? a : b;
}

/** Builds the run-level fields from model results (sorted by descriptor path, then name). */
export function summarise(models: ModelResult[], version: string, notes: string[] = []): Result {
  const sorted = [...models].sort((a, b) =>
    a.descriptor < b.descriptor ? -1 : a.descriptor > b.descriptor ? 1 : a.name < b.name ? -1 : a.name > b.name ? 1 : 0,
  );
  const counts = { models: sorted.length, pass: 0, warn: 0, fail: 0, error: 0 };
  let verdict: Verdict = 'pass';
  for (const m of sorted) {
    counts[m.verdict] += 1;
    verdict = worse(verdict, m.verdict);
  }
  return { tool: { name: 'fitgate', version }, verdict, counts, models: sorted, notes };
}

/** Exit status of the CLI: 0 pass/warn, 1 a model over a fail limit, 2 an error. */
export function exitStatus(result: Result, failOn: 'fail' | 'warn' = 'fail'): 0 | 1 | 2 {
  if (result.verdict === 'error') return 2;
  if (result.verdict === 'fail') return 1;
  if (result.verdict === 'warn' && failOn === 'warn') return 1;
  return 0;
}
