/**
 * Predicted against actual target for training rows (filled circles) and hold-out rows (hollow
 * squares), with the line y = x where a perfect model's points would lie.
 */
import type { ChartData } from '../../result/chart-types.js';
import { frame, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, DASHES, LEGEND_HOLDOUT, LEGEND_TRAIN, legendLine } from './palette.js';
import { marks, pointData, pointNote } from './points.js';
import { extent, linearScale, pad } from './scale.js';
import { axisLabel } from './units.js';

/** Renders the predicted-against-actual chart of a model. */
export function predictedActualChart(chart: ChartData, options: ChartOptions): string {
  const { id } = options;
  const { x0, y0, x1, y1 } = plotArea();
  const domain = pad(extent(chart.train.actual, chart.holdout.actual, chart.train.fitted, chart.holdout.fitted) ?? [0, 1]);
  const sx = linearScale(domain, [x0, x1]);
  const sy = linearScale(domain, [y1, y0]);
  const a = marks('train', chart.train.actual, chart.train.fitted, sx, sy);
  const b = marks('holdout', chart.holdout.actual, chart.holdout.fitted, sx, sy);
  const body = [
    `<line class="identity" x1="${px(sx(domain[0]))}" y1="${px(sy(domain[0]))}" x2="${px(sx(domain[1]))}" y2="${px(sy(domain[1]))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
    a.markup,
    b.markup,
  ].join('');
  const label = axisLabel(chart.target);
  return frame({
    id,
    kind: 'predicted-actual',
    title: `Predicted against actual ${chart.target}`,
    desc: `Predicted ${chart.target} (vertical) against the observed value (horizontal) for ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares; points on the dashed line y = x are predicted exactly. Hold-out points far from the line while training points sit on it show overfitting.${pointNote(chart.train, chart.holdout, a, b)}`,
    x: sx,
    y: sy,
    xLabel: `actual ${label}`,
    yLabel: `predicted ${label}`,
    body,
    legend: [
      { mark: LEGEND_TRAIN, label: 'training' },
      { mark: LEGEND_HOLDOUT, label: 'hold-out' },
      { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'y = x' },
    ],
    data: pointData(chart.train, chart.holdout, a, b),
  });
}
