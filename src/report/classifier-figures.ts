/**
 * The figures of a binary classifier for the text and Markdown reports (format only): one line of
 * its hold-out figures, and a small Mermaid chart of its hold-out calibration diagram.
 */
import { formatNumber } from '../core/format.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../result/result.js';
import { escapeMermaid } from './escape.js';

/** True when the model was checked as a classifier. */
export function isClassifier(m: ModelResult): boolean {
  return m.metrics?.task === 'classification';
}

function figure(m: ModelResult, key: string): string {
  const v = m.metrics?.[key];
  return typeof v === 'number' || typeof v === 'string' ? formatNumber(fromJsonNumber(v as JsonNumber)) : '–';
}

/**
 * One line: log-loss (training and hold-out), AUC, Brier score, accuracy, calibration slope and
 * the class counts, e.g. `classifier: log-loss 0.41 / 0.52 (train / hold-out), AUC 0.83, ...`.
 */
export function classifierLine(m: ModelResult): string {
  return (
    `classifier: log-loss ${figure(m, 'train_log_loss')} / ${figure(m, 'holdout_log_loss')} (train / hold-out), ` +
    `AUC ${figure(m, 'train_auc')} / ${figure(m, 'holdout_auc')}, Brier ${figure(m, 'holdout_brier')}, ` +
    `accuracy ${figure(m, 'holdout_accuracy')} at ${figure(m, 'threshold')}, calibration slope ${figure(m, 'calibration_slope')}, ` +
    `training rows ${figure(m, 'train_positives')} positive / ${figure(m, 'train_negatives')} negative`
  );
}

interface Bin {
  from: number;
  to: number;
  count: number;
  predicted: JsonNumber;
  observed: JsonNumber;
}

/**
 * A Mermaid `xychart-beta` of the hold-out calibration diagram: observed share of positives per
 * bin of predicted probability (bars), and the bins' mean prediction (a line: a calibrated model's
 * bars reach it). Null when the model has no bins.
 */
export function calibrationChart(m: ModelResult): string | null {
  const bins = (m.extra?.calibration_bins ?? null) as Bin[] | null;
  if (!Array.isArray(bins) || bins.length === 0) return null;
  const used = bins.filter((b) => b.count > 0);
  if (used.length < 2) return null;
  const v = (x: JsonNumber) => String(Number(fromJsonNumber(x).toFixed(3)));
  const title = `${m.name}: hold-out calibration (bars observed, line predicted; rows per bin ${used.map((b) => b.count).join(', ')})`;
  return [
    '```mermaid',
    'xychart-beta',
    `  title "${escapeMermaid(title)}"`,
    `  x-axis "predicted probability" [${used.map((b) => `"${b.from.toFixed(1)}-${b.to.toFixed(1)}"`).join(', ')}]`,
    '  y-axis "share positive" 0 --> 1',
    `  bar [${used.map((b) => v(b.observed)).join(', ')}]`,
    `  line [${used.map((b) => v(b.predicted)).join(', ')}]`,
    '```',
    '',
  ].join('\n');
}
