/**
 * A partial curve of a model of several inputs: the prediction along one input with every other
 * input held at its training median, over the input's training range and a margin, with the
 * training values of the input as a rug of ticks under the curve.
 */
import { formatNumber } from '../../core/format.js';
import type { ChartData, CurveData } from '../../result/chart-types.js';
import { baseCurveLegend, baseCurveNote, baseCurvePath } from './base-curve.js';
import { frame, linePath, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, legendLine } from './palette.js';
import { extent, linearScale, pad } from './scale.js';
import { axisLabel } from './units.js';
import { LEGEND_SPIKE, spikeBars, spikeLegendLabel, spikeNote } from './spike-marks.js';

/**
 * Renders one partial curve.
 * @param chart the model's chart data
 * @param curve one entry of `chart.partials`
 */
export function partialCurveChart(chart: ChartData, curve: CurveData, options: ChartOptions): string {
  const { id } = options;
  const { x0, y0, x1, y1 } = plotArea();
  const c = chart.inputs.indexOf(curve.input);
  const rug = c >= 0 ? chart.train.x[c] : [];
  const sx = linearScale(extent(curve.x, rug, curve.base?.x ?? []) ?? [0, 1], [x0, x1]);
  const sy = linearScale(pad(extent(curve.y, chart.train.actual, curve.base?.y ?? []) ?? [0, 1]), [y1, y0]);
  const ticks: string[] = [];
  for (const v of rug) if (v !== null) ticks.push(`M${px(sx(v))} ${y1}v-7`);
  const body = [
    `<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(curve.range[0]))}" y1="${y0}" x2="${px(sx(curve.range[0]))}" y2="${y1}"/><line x1="${px(sx(curve.range[1]))}" y1="${y0}" x2="${px(sx(curve.range[1]))}" y2="${y1}"/></g>`,
    `<path class="rug" d="${ticks.join('')}" stroke="${COLOURS.train}" stroke-opacity="0.55" stroke-width="1"/>`,
    curve.base ? baseCurvePath(curve.base, sx, sy) : '',
    `<path class="curve" d="${linePath(curve.x, curve.y, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`,
    spikeBars(curve.spikes, sx, y0),
  ].join('');
  const others = Object.entries(curve.others)
    .map(([k, v]) => `${k} = ${formatNumber(v)}`)
    .join(', ');
  return frame({
    id,
    kind: 'partial-curve',
    title: `Partial curve: ${chart.target} along ${curve.input}`,
    desc: `Predicted ${chart.target} as ${curve.input} runs from ${formatNumber(curve.x[0])} to ${formatNumber(curve.x[curve.x.length - 1])} (training range ${formatNumber(curve.range[0])} to ${formatNumber(curve.range[1])}, dotted lines), with the other inputs at their training medians${others ? ` (${others})` : ''}. Ticks along the bottom mark the training values of ${curve.input}.${spikeNote(curve.spikes)}${curve.base ? baseCurveNote(curve.base) : ''}`,
    x: sx,
    y: sy,
    xLabel: axisLabel(curve.input),
    yLabel: `predicted ${axisLabel(chart.target)}`,
    body,
    legend: [
      { mark: legendLine(COLOURS.curve), label: 'predicted, others at medians' },
      { mark: `<path d="M3 12V5M7 12V5M11 12V5" stroke="${COLOURS.train}" stroke-width="1"/>`, label: 'training values' },
      ...(curve.spikes && curve.spikes.intervals.length > 0 ? [{ mark: LEGEND_SPIKE, label: spikeLegendLabel(curve.spikes) }] : []),
      ...(curve.base ? [baseCurveLegend()] : []),
    ],
    data: { input: curve.input, 'rug-count': ticks.length, ...(curve.spikes ? { spikes: curve.spikes.intervals.length } : {}) },
  });
}
