/**
 * A classifier's predicted probability along one input: the curve over the input's training
 * range and a margin with the other inputs at their training medians (dotted lines: the training
 * range), and the rows as points at 0 (negative) and 1 (positive), training rows as filled
 * circles and hold-out rows as hollow squares, jittered a little up or down so that stacked rows
 * show as a band. A curve that jumps between 0 and 1 between neighbouring rows is the picture of
 * separation or overfitting.
 */
import { formatNumber } from '../../core/format.js';
import type { ClassifierChartData, ClassifierPoints, ProbabilityCurveData } from '../../result/classifier-chart-types.js';
import { classLabel } from './class-label.js';
import { frame, linePath, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, LEGEND_HOLDOUT, LEGEND_TRAIN, legendLine } from './palette.js';
import { marks, pointData, pointNote } from './points.js';
import { extent, linearScale } from './scale.js';
import { axisLabel } from './units.js';

/** Height of the jitter band of the points at 0 and 1, in probability units. */
const JITTER = 0.035;

/**
 * The y value of each kept row: its label, moved towards the middle by up to {@link JITTER}
 * (a fixed pattern by position, so the chart is the same on every run).
 */
function jittered(points: ClassifierPoints): number[] {
  return points.label.map((l, i) => {
    const offset = (((i * 7919) % 97) / 96) * JITTER;
    return l === 1 ? 1 - offset : offset;
  });
}

/**
 * Renders the probability curve along one input.
 * @param chart the classifier's chart data
 * @param curve one entry of `chart.curves`
 */
export function probabilityCurveChart(chart: ClassifierChartData, curve: ProbabilityCurveData, options: ChartOptions): string {
  const { id } = options;
  const positive = classLabel(chart.positive);
  const negative = classLabel(chart.negative);
  const { x0, y0, x1, y1 } = plotArea();
  const c = chart.inputs.indexOf(curve.input);
  const trainX = c >= 0 ? chart.train.x[c] : [];
  const holdoutX = c >= 0 ? chart.holdout.x[c] : [];
  const sx = linearScale(extent(curve.x, trainX, holdoutX) ?? [0, 1], [x0, x1]);
  const sy = linearScale([-0.05, 1.05], [y1, y0]);
  const a = marks('train', trainX, jittered(chart.train), sx, sy);
  const b = marks('holdout', holdoutX, jittered(chart.holdout), sx, sy);
  const t = chart.threshold;
  const body = [
    `<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(curve.range[0]))}" y1="${y0}" x2="${px(sx(curve.range[0]))}" y2="${y1}"/><line x1="${px(sx(curve.range[1]))}" y1="${y0}" x2="${px(sx(curve.range[1]))}" y2="${y1}"/></g>`,
    `<line class="threshold" x1="${x0}" y1="${px(sy(t))}" x2="${x1}" y2="${px(sy(t))}" stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="4 4"/>`,
    a.markup,
    b.markup,
    `<path class="curve" d="${linePath(curve.x, curve.p, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`,
  ].join('');
  const others = Object.entries(curve.others)
    .map(([k, v]) => `${k} = ${formatNumber(v)}`)
    .join(', ');
  return frame({
    id,
    kind: 'probability-curve',
    title: `Probability of ${chart.target} = ${positive} along ${curve.input}`,
    desc: `Predicted probability of ${chart.target} = ${positive} (vertical) as ${curve.input} runs from ${formatNumber(curve.x[0])} to ${formatNumber(curve.x[curve.x.length - 1])} (training range ${formatNumber(curve.range[0])} to ${formatNumber(curve.range[1])}, dotted lines)${others ? `, the other inputs at their training medians (${others})` : ''}; the dashed line is the threshold ${formatNumber(t)}. ${a.drawn} training rows (filled circles) and ${b.drawn} hold-out rows (hollow squares) sit at 1 when ${positive} and at 0 when ${negative}, spread a little to show how many.${pointNote(chart.train, chart.holdout, a, b)}`,
    x: sx,
    y: sy,
    xLabel: axisLabel(curve.input),
    yLabel: `probability of ${positive}`,
    body,
    legend: [
      { mark: legendLine(COLOURS.curve), label: others ? 'predicted, others at medians' : 'predicted' },
      { mark: LEGEND_TRAIN, label: 'training' },
      { mark: LEGEND_HOLDOUT, label: 'hold-out' },
    ],
    data: { input: curve.input, ...pointData(chart.train, chart.holdout, a, b) },
  });
}
