/**
 * A model's figures against the same model (by name) on the base commit of a pull request.
 */
import { fromJsonNumber, jsonNumber, type BaseComparison, type ModelMetrics, type ModelResult } from '../result/result.js';

/** The base commit's outcomes to compare with, by model name. */
export interface BaseInput {
  models: ReadonlyMap<string, ModelResult>;
  /** Full SHA of the base commit. */
  commit: string;
}

/** Relative change (head - base) / base; +Infinity when base is 0 and head is not; null when either is missing. */
function relativeChange(head: number, base: number): number | null {
  if (Number.isNaN(head) || Number.isNaN(base)) return null;
  if (base === 0) return head === 0 ? 0 : Infinity;
  return (head - base) / Math.abs(base);
}

/** The `base` field of a model result: `new`, or the base figures and the changes. */
export function compareWithBase(metrics: ModelMetrics, baseline: ModelResult | null, commit: string): BaseComparison {
  if (baseline === null) {
    return { status: 'new', commit, holdout_rmse: null, gap_ratio: null, holdout_rmse_change: null, gap_ratio_change: null };
  }
  const b = baseline.metrics;
  const headRmse = fromJsonNumber(metrics.holdout_rmse);
  const headGap = fromJsonNumber(metrics.gap_ratio);
  const baseRmse = b ? fromJsonNumber(b.holdout_rmse) : Number.NaN;
  const baseGap = b ? fromJsonNumber(b.gap_ratio) : Number.NaN;
  const rmseChange = relativeChange(headRmse, baseRmse);
  const gapChange = Number.isNaN(headGap) || Number.isNaN(baseGap) ? null : headGap - baseGap;
  return {
    status: 'compared',
    commit,
    holdout_rmse: b ? b.holdout_rmse : null,
    gap_ratio: b ? b.gap_ratio : null,
    holdout_rmse_change: rmseChange === null ? null : jsonNumber(rmseChange),
    gap_ratio_change: gapChange === null ? null : jsonNumber(gapChange),
  };
}
