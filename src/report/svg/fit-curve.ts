/**
 * Chart of a model of one input: the fitted curve over the whole scanned range, the observed
 * target band, hatched stretches where the curve leaves the band, training rows as filled
 * circles and hold-out rows as hollow squares.
 */
import { formatNumber } from '../../core/format.js';
import type { ChartData, FitCurveData } from '../../result/chart-types.js';
import { baseCurveLegend, baseCurveNote, baseCurvePath } from './base-curve.js';
import { frame, linePath, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, LEGEND_BAND, LEGEND_HOLDOUT, LEGEND_TRAIN, legendLine, legendRegion } from './palette.js';
import { marks, pointData, pointNote } from './points.js';
import { LEGEND_SPIKE, spikeBars, spikeLegendLabel, spikeNote } from './spike-marks.js';
import { extent, linearScale, pad } from './scale.js';
import { axisLabel } from './units.js';

/** How far past the data the y axis may reach to show a swinging curve, in data spans. */
const CURVE_HEADROOM = 0.6;

/**
 * Renders the fitted-curve chart.
 * @param chart the model's chart data (its `fit` must be set)
 * @param fit the curve (`chart.fit`)
 */
export function fitCurveChart(chart: ChartData, fit: FitCurveData, options: ChartOptions): string {
  const { id } = options;
  const { x0, y0, x1, y1 } = plotArea();
  const trainX = chart.train.x[0] ?? [];
  const holdoutX = chart.holdout.x[0] ?? [];
  const xDomain = extent(fit.x, trainX, holdoutX, fit.base?.x ?? []) ?? [0, 1];
  const data = extent(chart.train.actual, chart.holdout.actual, fit.band) ?? [0, 1];
  const span = Math.max(data[1] - data[0], 1e-12);
  const curve = extent(fit.y, fit.base?.y ?? []) ?? data;
  const yDomain = pad(
    [Math.max(curve[0], data[0] - CURVE_HEADROOM * span), Math.min(curve[1], data[1] + CURVE_HEADROOM * span)].map((v, i) =>
      i === 0 ? Math.min(v, data[0]) : Math.max(v, data[1]),
    ) as [number, number],
  );
  const sx = linearScale(xDomain, [x0, x1]);
  const sy = linearScale(yDomain, [y1, y0]);

  const body: string[] = [];
  const [blo, bhi] = fit.band;
  body.push(
    `<rect class="band" x="${x0}" y="${px(sy(bhi))}" width="${x1 - x0}" height="${px(Math.max(0, sy(blo) - sy(bhi)))}" fill="${COLOURS.band}"/>`,
    `<g stroke="${COLOURS.bandEdge}" stroke-width="1" stroke-dasharray="3 3"><line x1="${x0}" y1="${px(sy(bhi))}" x2="${x1}" y2="${px(sy(bhi))}"/><line x1="${x0}" y1="${px(sy(blo))}" x2="${x1}" y2="${px(sy(blo))}"/></g>`,
  );
  const regions = fit.regions
    .map((r) => {
      const a = sx(r.from);
      const b = sx(r.to);
      return `<rect class="region" data-side="${r.side}" x="${px(a)}" y="${y0}" width="${px(Math.max(1.5, b - a))}" height="${y1 - y0}" fill="url(#${id}-hatch)"/>`;
    })
    .join('');
  body.push(`<g class="regions" data-count="${fit.regions.length}">${regions}</g>`, spikeBars(fit.spikes, sx, y0));
  // Training range edges: the curve past them is extrapolation.
  body.push(
    `<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(fit.range[0]))}" y1="${y0}" x2="${px(sx(fit.range[0]))}" y2="${y1}"/><line x1="${px(sx(fit.range[1]))}" y1="${y0}" x2="${px(sx(fit.range[1]))}" y2="${y1}"/></g>`,
  );
  if (fit.base) body.push(baseCurvePath(fit.base, sx, sy));
  body.push(
    `<path class="curve" d="${linePath(fit.x, fit.y, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`,
  );
  const a = marks('train', trainX, chart.train.actual, sx, sy);
  const b = marks('holdout', holdoutX, chart.holdout.actual, sx, sy);
  body.push(a.markup, b.markup);

  const legend = [
    { mark: LEGEND_TRAIN, label: 'training' },
    { mark: LEGEND_HOLDOUT, label: 'hold-out' },
    { mark: legendLine(COLOURS.curve), label: 'fitted' },
    { mark: LEGEND_BAND, label: 'observed band' },
  ];
  if (fit.regions.length > 0) legend.push({ mark: legendRegion(id), label: 'leaves band' });
  if (fit.spikes && fit.spikes.intervals.length > 0) legend.push({ mark: LEGEND_SPIKE, label: spikeLegendLabel(fit.spikes) });
  if (fit.base) legend.push(baseCurveLegend());
  const where = fit.regions.length
    ? ` The curve leaves the band ${fit.regions.map((r) => `${r.side} it from ${formatNumber(r.from)} to ${formatNumber(r.to)}`).join('; ')}.`
    : ' The curve stays inside the band.';
  const desc =
    `Fitted ${chart.target} against ${fit.input} from ${formatNumber(fit.x[0])} to ${formatNumber(fit.x[fit.x.length - 1])} ` +
    `(training range ${formatNumber(fit.range[0])} to ${formatNumber(fit.range[1])}), with ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares. ` +
    `Observed target band ${formatNumber(blo)} to ${formatNumber(bhi)}.${where}${spikeNote(fit.spikes)}${fit.base ? baseCurveNote(fit.base) : ''}${pointNote(chart.train, chart.holdout, a, b)}`;
  return frame({
    id,
    kind: 'fit-curve',
    title: `Fitted curve: ${chart.target} against ${fit.input}`,
    desc,
    x: sx,
    y: sy,
    xLabel: axisLabel(fit.input),
    yLabel: axisLabel(chart.target),
    body: body.join(''),
    legend,
    data: {
      ...pointData(chart.train, chart.holdout, a, b),
      regions: fit.regions.length,
      source: fit.source,
      ...(fit.spikes ? { spikes: fit.spikes.intervals.length } : {}),
    },
  });
}
