/**
 * Residuals (actual - fitted) against fitted values, training rows as filled circles and hold-out
 * rows as hollow squares, with the zero line.
 */
import type { ChartData } from '../../result/chart-types.js';
import { frame, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, LEGEND_HOLDOUT, LEGEND_TRAIN, legendLine } from './palette.js';
import { marks, pointData, pointNote } from './points.js';
import { extent, linearScale, pad } from './scale.js';
import { axisLabel } from './units.js';

/** Renders the residuals-against-fitted chart of a model. */
export function residualsChart(chart: ChartData, options: ChartOptions): string {
  const { id } = options;
  const { x0, y0, x1, y1 } = plotArea();
  const sx = linearScale(pad(extent(chart.train.fitted, chart.holdout.fitted) ?? [0, 1]), [x0, x1]);
  const r = extent(chart.train.residual, chart.holdout.residual, [0]) ?? [-1, 1];
  const m = Math.max(Math.abs(r[0]), Math.abs(r[1])) || 1;
  const sy = linearScale(pad([-m, m]), [y1, y0]);
  const a = marks('train', chart.train.fitted, chart.train.residual, sx, sy);
  const b = marks('holdout', chart.holdout.fitted, chart.holdout.residual, sx, sy);
  const body = [
    `<line class="zero" x1="${x0}" y1="${px(sy(0))}" x2="${x1}" y2="${px(sy(0))}" stroke="${COLOURS.reference}" stroke-width="1.2"/>`,
    a.markup,
    b.markup,
  ].join('');
  const label = axisLabel(chart.target);
  return frame({
    id,
    kind: 'residuals',
    title: `Residuals against fitted ${chart.target}`,
    desc: `Residual (actual minus fitted ${chart.target}) against the fitted value for ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares. Hold-out residuals much wider than training residuals show overfitting; a pattern in either shows a missing term.${pointNote(chart.train, chart.holdout, a, b)}`,
    x: sx,
    y: sy,
    xLabel: `fitted ${label}`,
    yLabel: `residual ${label}`,
    body,
    legend: [
      { mark: LEGEND_TRAIN, label: 'training' },
      { mark: LEGEND_HOLDOUT, label: 'hold-out' },
      { mark: legendLine(COLOURS.reference, undefined, 1.2), label: 'zero' },
    ],
    data: pointData(chart.train, chart.holdout, a, b),
  });
}
