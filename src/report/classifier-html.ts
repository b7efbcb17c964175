/**
 * The HTML report's part for a binary classifier (report/html.ts calls it): its facts line and
 * its charts, the ROC curves, the calibration diagram and the predicted probability along each
 * input, drawn from the pipeline's `classifier_charts` (nothing here computes a figure).
 */
import { formatNumber } from '../core/format.js';
import type { ClassifierChartData } from '../result/classifier-chart-types.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../result/result.js';
import { escapeHtml } from './escape.js';
import { calibrationDiagramChart } from './svg/calibration-diagram.js';
import { probabilityCurveChart } from './svg/probability-curve.js';
import { rocCurveChart } from './svg/roc-curve.js';

function num(v: JsonNumber | number | string | null | undefined): string {
  if (v === null || v === undefined || (typeof v === 'string' && v !== 'Infinity' && v !== '-Infinity' && v !== 'NaN')) return '–';
  return escapeHtml(formatNumber(fromJsonNumber(v as JsonNumber)));
}

function figure(svg: string, caption: string): string {
  return `<figure>${svg}<figcaption>${escapeHtml(caption)}</figcaption></figure>`;
}

/** The facts line of a classifier: rows, parameters, log-loss, AUC and calibration slope (HTML). */
export function classifierFacts(m: ModelResult): string {
  const x = m.metrics;
  return (
    `<p class="facts"><span>training rows <b>${m.rows.train}</b></span><span>hold-out rows <b>${m.rows.holdout}</b></span><span>parameters <b>${m.parameters}</b></span>` +
    `<span>log-loss <b>${num(x?.train_log_loss)}</b> / <b>${num(x?.holdout_log_loss)}</b> (training / hold-out)</span>` +
    `<span>AUC <b>${num(x?.train_auc)}</b> / <b>${num(x?.holdout_auc)}</b></span><span>calibration slope <b>${num(x?.calibration_slope)}</b></span></p>`
  );
}

/** The chart figures of a classifier, in reading order. */
export function classifierCharts(chart: ClassifierChartData, prefix: string): string[] {
  const out: string[] = [
    figure(
      rocCurveChart(chart, { id: `${prefix}-roc` }),
      'ROC curves of the training and hold-out rows; a training curve well above the hold-out curve shows overfitting.',
    ),
    figure(
      calibrationDiagramChart(chart, { id: `${prefix}-calibration` }),
      `Calibration: observed share of positives against the mean prediction in ${chart.calibration.holdout.length} equal-width bins, with the rows per bin.`,
    ),
  ];
  chart.curves.forEach((curve, k) => {
    out.push(
      figure(
        probabilityCurveChart(chart, curve, { id: `${prefix}-probability-${k + 1}` }),
        `Predicted probability along ${curve.input}${chart.inputs.length > 1 ? ', the other inputs at their training medians' : ''}; rows at 1 (positive) and 0 (negative).`,
      ),
    );
  });
  return out;
}

/** Notes above a classifier's charts: thinned rows and ROC curves, and inputs left without a curve (HTML; empty when none). */
export function classifierChartNotes(chart: ClassifierChartData): string {
  const notes: string[] = [];
  if (chart.train.thinned) notes.push(`Training rows: ${chart.train.thinning}.`);
  if (chart.holdout.thinned) notes.push(`Hold-out rows: ${chart.holdout.thinning}.`);
  for (const [name, roc] of [
    ['training', chart.roc.train],
    ['hold-out', chart.roc.holdout],
  ] as const) {
    if (roc.thinned)
      notes.push(`The ${name} ROC curve: ${roc.fpr.length} of ${roc.points} points drawn, every vertex of its convex hull kept.`);
  }
  if ((chart.curvesLeftOut ?? 0) > 0)
    notes.push(`Probability curves of the first ${chart.curves.length} inputs; ${chart.curvesLeftOut} more left out.`);
  return notes.length ? `<p class="note">${notes.map(escapeHtml).join(' ')}</p>` : '';
}
