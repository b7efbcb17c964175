/**
 * The ROC curves of a classifier: true positive rate against false positive rate for the
 * training rows (solid blue) and the hold-out rows (dashed vermillion), with the diagonal of a
 * model that guesses. A training curve hugging the top left corner while the hold-out curve
 * sags towards the diagonal is the picture of an overfit classifier.
 */
import { formatNumber } from '../../core/format.js';
import type { ClassifierChartData, RocCurveData } from '../../result/classifier-chart-types.js';
import { classLabel } from './class-label.js';
import { frame, linePath, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, DASHES, legendLine } from './palette.js';
import { linearScale } from './scale.js';

/** The area under a drawn (kept) curve by the trapezoid rule: the exact AUC when the curve was not thinned. */
function drawnArea(curve: RocCurveData): number {
  let area = 0;
  for (let k = 1; k < curve.fpr.length; k++) area += ((curve.fpr[k] - curve.fpr[k - 1]) * (curve.tpr[k] + curve.tpr[k - 1])) / 2;
  return area;
}

/** One file's curve in words for the description. */
function sentence(name: string, curve: RocCurveData): string {
  if (curve.positives === 0 || curve.negatives === 0) return `${name}: one class only (${curve.rows} rows), no curve.`;
  const kept = curve.thinned
    ? `${curve.fpr.length} of its ${curve.points} points drawn, every convex hull vertex kept`
    : `${curve.points} points`;
  return `${name}: ${curve.positives} positive and ${curve.negatives} negative rows, ${kept}, area under the drawn curve ${formatNumber(drawnArea(curve), 4)}.`;
}

/**
 * Renders the ROC chart of a classifier.
 * @param chart the classifier's chart data (reads `roc`)
 */
export function rocCurveChart(chart: ClassifierChartData, options: ChartOptions): string {
  const { id } = options;
  const positive = classLabel(chart.positive);
  const { x0, y0, x1, y1 } = plotArea();
  const sx = linearScale([0, 1], [x0, x1]);
  const sy = linearScale([0, 1], [y1, y0]);
  const { train, holdout } = chart.roc;
  const path = (curve: RocCurveData, series: string, colour: string, dash: string | null): string =>
    `<path class="roc" data-series="${series}" data-count="${curve.fpr.length}" d="${linePath(curve.fpr, curve.tpr, sx, sy)}" fill="none" stroke="${colour}" stroke-width="2" stroke-linejoin="round"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
  const body = [
    `<line class="diagonal" x1="${px(sx(0))}" y1="${px(sy(0))}" x2="${px(sx(1))}" y2="${px(sy(1))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
    path(train, 'train', COLOURS.train, null),
    path(holdout, 'holdout', COLOURS.holdout, DASHES.limit),
  ].join('');
  return frame({
    id,
    kind: 'roc-curve',
    title: `ROC curves: ${chart.target} = ${positive}`,
    desc: `True positive rate (vertical) against false positive rate (horizontal) as the probability threshold for "${positive}" falls from 1 to 0. ${sentence('Training rows (solid line)', train)} ${sentence('Hold-out rows (dashed line)', holdout)} The dotted diagonal is a model that guesses; a training curve far above the hold-out curve shows overfitting.`,
    x: sx,
    y: sy,
    xLabel: 'false positive rate',
    yLabel: 'true positive rate',
    body,
    legend: [
      { mark: legendLine(COLOURS.train), label: 'training' },
      { mark: legendLine(COLOURS.holdout, DASHES.limit), label: 'hold-out' },
      { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'guessing' },
    ],
    data: {
      'train-points': train.fpr.length,
      'holdout-points': holdout.fpr.length,
      'train-area': formatNumber(drawnArea(train), 6),
      'holdout-area': formatNumber(drawnArea(holdout), 6),
    },
  });
}
