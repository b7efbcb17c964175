/**
 * "What a refit would give" (`fit.refit_compare: true` on a model scored as shipped) for the
 * text, Markdown and HTML reports: one line of the refit's figures beside the shipped model's
 * (format only; the figures are the metrics `refit_*`).
 */
import { formatNumber } from '../core/format.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../result/result.js';

function figure(m: ModelResult, key: string): string {
  const v = m.metrics?.[key];
  return typeof v === 'number' || typeof v === 'string' ? formatNumber(fromJsonNumber(v as JsonNumber)) : '–';
}

/**
 * One line, e.g. `shipped: training RMSE 0.52, hold-out RMSE 0.61; a refit would give: training
 * RMSE 0.48, hold-out RMSE 0.6, 5-fold CV RMSE 0.55`; null when the model has no refit figures.
 */
export function refitCompareLine(m: ModelResult): string | null {
  if (m.metrics?.refit_holdout_rmse === undefined) return null;
  const folds = m.metrics.refit_cv_folds;
  return (
    `shipped: training RMSE ${figure(m, 'train_rmse')}, hold-out RMSE ${figure(m, 'holdout_rmse')}; ` +
    `a refit would give: training RMSE ${figure(m, 'refit_train_rmse')}, hold-out RMSE ${figure(m, 'refit_holdout_rmse')}, ` +
    `${typeof folds === 'number' && folds > 0 ? `${folds}-fold ` : ''}CV RMSE ${figure(m, 'refit_cv_rmse')}`
  );
}
