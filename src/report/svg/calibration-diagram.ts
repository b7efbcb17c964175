/**
 * The calibration diagram of a classifier (reliability diagram; DeGroot & Fienberg 1983, The
 * Statistician 32): per bin of predicted probability, the observed share of positives against the
 * bin's mean prediction, for the training rows (filled circles) and the hold-out rows (hollow
 * squares), the count of rows of each bin written beside its mark, and the diagonal where a
 * calibrated model's marks lie. An overfit model's hold-out marks fall below the diagonal at
 * high predictions and above it at low ones (its predictions are too extreme).
 */
import type { CalibrationBinData, ClassifierChartData } from '../../result/classifier-chart-types.js';
import { classLabel } from './class-label.js';
import { frame, plotArea, px, type ChartOptions } from './frame.js';
import {
  COLOURS,
  DASHES,
  HOLDOUT_STYLE,
  holdoutMark,
  LEGEND_HOLDOUT,
  LEGEND_TRAIN,
  legendLine,
  TRAIN_STYLE,
  trainMark,
} from './palette.js';
import { linearScale } from './scale.js';

/** Marks (and the line through them) of one file's non-empty bins, with each bin's count as a label. */
function binMarks(
  bins: readonly CalibrationBinData[],
  series: 'train' | 'holdout',
  sx: (v: number) => number,
  sy: (v: number) => number,
): { markup: string; labels: string; drawn: number } {
  const marks: string[] = [];
  const labels: string[] = [];
  let d = '';
  const mark = series === 'train' ? trainMark : holdoutMark;
  for (const b of bins) {
    if (b.count === 0 || b.predicted === null || b.observed === null) continue;
    const x = sx(b.predicted);
    const y = sy(b.observed);
    marks.push(mark(x, y));
    d += `${d ? 'L' : 'M'}${px(x)} ${px(y)}`;
    // Training counts above the mark, hold-out counts below, so the two rarely overlap.
    const dy = series === 'train' ? -7 : 15;
    labels.push(`<text x="${px(x)}" y="${px(y + dy)}" text-anchor="middle">${b.count}</text>`);
  }
  const colour = series === 'train' ? COLOURS.train : COLOURS.holdout;
  const style = series === 'train' ? TRAIN_STYLE : HOLDOUT_STYLE;
  return {
    markup: `<path d="${d}" fill="none" stroke="${colour}" stroke-width="1.2" stroke-opacity="0.6"${series === 'holdout' ? ` stroke-dasharray="${DASHES.limit}"` : ''}/><g data-series="${series}" data-count="${marks.length}" ${style}>${marks.join('')}</g>`,
    labels: `<g class="counts" data-series="${series}" font-size="9.5" fill="${colour}">${labels.join('')}</g>`,
    drawn: marks.length,
  };
}

/** One file's bins in words. */
function sentence(name: string, bins: readonly CalibrationBinData[]): string {
  const used = bins.filter((b) => b.count > 0 && b.predicted !== null && b.observed !== null);
  if (used.length === 0) return `${name}: no rows.`;
  const list = used.map(
    (b) => `${b.count} rows at ${(b.predicted as number).toFixed(2)} predicted, ${(b.observed as number).toFixed(2)} observed`,
  );
  return `${name}: ${list.join('; ')}.`;
}

/**
 * Renders the calibration diagram of a classifier.
 * @param chart the classifier's chart data (reads `calibration`)
 */
export function calibrationDiagramChart(chart: ClassifierChartData, options: ChartOptions): string {
  const { id } = options;
  const positive = classLabel(chart.positive);
  const { x0, y0, x1, y1 } = plotArea();
  const sx = linearScale([0, 1], [x0, x1]);
  const sy = linearScale([0, 1], [y1, y0]);
  const a = binMarks(chart.calibration.train, 'train', sx, sy);
  const b = binMarks(chart.calibration.holdout, 'holdout', sx, sy);
  const body = [
    `<line class="diagonal" x1="${px(sx(0))}" y1="${px(sy(0))}" x2="${px(sx(1))}" y2="${px(sy(1))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
    a.markup,
    b.markup,
    a.labels,
    b.labels,
  ].join('');
  const bins = chart.calibration.holdout.length;
  return frame({
    id,
    kind: 'calibration-diagram',
    title: `Calibration: observed share of ${chart.target} = ${positive}`,
    desc: `Observed share of positives (vertical) against the mean predicted probability (horizontal) in ${bins} equal-width bins of the predicted probability, the number of rows of each bin written beside its mark. ${sentence('Training rows (filled circles)', chart.calibration.train)} ${sentence('Hold-out rows (hollow squares)', chart.calibration.holdout)} Marks on the dotted diagonal are calibrated; hold-out marks flatter than the diagonal mean the predictions are too extreme.`,
    x: sx,
    y: sy,
    xLabel: 'mean predicted probability',
    yLabel: 'observed share positive',
    body,
    legend: [
      { mark: LEGEND_TRAIN, label: 'training' },
      { mark: LEGEND_HOLDOUT, label: 'hold-out' },
      { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'calibrated' },
    ],
    data: { 'train-bins': a.drawn, 'holdout-bins': b.drawn, bins },
  });
}
