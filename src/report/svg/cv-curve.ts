/**
 * The cross-validation curve over the complexity sweep: cross-validated RMSE (solid line with
 * diamonds) and training RMSE (dashed line with small circles, when the sweep has it) at each
 * setting, with the descriptor's chosen setting (solid vertical line) and the suggested setting
 * (dashed vertical line) marked and labelled.
 */
import { formatNumber } from '../../core/format.js';
import { minOf } from '../../core/extremes.js';
import type { SweepData } from '../../result/chart-types.js';
import { escapeHtml } from '../escape.js';
import { frame, linePath, plotArea, px, type ChartOptions } from './frame.js';
import { COLOURS, DASHES, legendLine } from './palette.js';
import { extent, linearScale, logScale, pad } from './scale.js';

const DIAMOND = 4;

/** Renders the cross-validation curve of a complexity sweep. */
export function cvCurveChart(sweep: SweepData, options: ChartOptions): string {
  const { id } = options;
  const { x0, y0, x1, y1 } = plotArea();
  // On a log axis a setting of 0 (no penalty) sits one decade left of the smallest positive setting, labelled 0.
  const positives = sweep.settings.filter((v) => v > 0);
  const zeroAt = sweep.log && positives.length ? minOf(positives) / 10 : 0;
  const s = sweep.settings.map((v) => (sweep.log && v <= 0 ? zeroAt : v));
  const xDomain: [number, number] = [s[0], s[s.length - 1]];
  const sx = sweep.log ? logScale(xDomain, [x0 + 8, x1 - 8]) : linearScale(s.length > 1 ? xDomain : pad(xDomain), [x0 + 8, x1 - 8]);
  const hasZero = sweep.log && sweep.settings.some((v) => v <= 0);
  if (hasZero) {
    const kept = sx.ticks.filter((t) => t > zeroAt * 3);
    sx.ticks.length = 0;
    sx.ticks.push(zeroAt);
    for (const t of kept) sx.ticks.push(t);
  }
  const yRange = extent(sweep.cv, sweep.train ?? []) ?? [0, 1];
  const yLog = yRange[0] > 0 && yRange[1] / yRange[0] >= 100;
  const sy = yLog
    ? logScale([10 ** Math.floor(Math.log10(yRange[0])), 10 ** Math.ceil(Math.log10(yRange[1]))], [y1, y0])
    : linearScale(pad(yRange, 0.08), [y1, y0]);
  const plotX = (v: number | null): number | null => (v === null ? null : sweep.log && v <= 0 ? zeroAt : v);
  const body: string[] = [];
  const overlay: string[] = [];
  const marker = (value: number | null, label: string, dash: string | null, row: number): void => {
    const at = plotX(value);
    if (value === null || at === null) return;
    const x = sx(at);
    const p = px(x);
    body.push(
      `<line class="marker" data-marker="${label}" x1="${p}" y1="${y0}" x2="${p}" y2="${y1}" stroke="${COLOURS.curve}" stroke-width="1.4"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`,
    );
    const right = x > (x0 + x1) / 2;
    overlay.push(
      `<text x="${p}" y="${y0 + 13 + 14 * row}" dx="${right ? -4 : 4}" text-anchor="${right ? 'end' : 'start'}" font-size="11" fill="#222" paint-order="stroke" stroke="#fff" stroke-width="3">${escapeHtml(`${label} ${formatNumber(value)}`)}</text>`,
    );
  };
  marker(sweep.chosen, 'chosen', null, 0);
  if (sweep.suggested !== null && sweep.suggested !== sweep.chosen) marker(sweep.suggested, 'suggested', DASHES.suggested, 1);
  if (sweep.train) {
    body.push(
      `<path class="train" d="${linePath(s, sweep.train, sx, sy)}" fill="none" stroke="${COLOURS.train}" stroke-width="1.6" stroke-dasharray="${DASHES.reference}"/>`,
    );
    body.push(
      `<g fill="${COLOURS.train}">${s.map((v, i) => (sweep.train?.[i] == null ? '' : `<circle cx="${px(sx(v))}" cy="${px(sy(sweep.train[i] as number))}" r="2.4"/>`)).join('')}</g>`,
    );
  }
  body.push(`<path class="cv" d="${linePath(s, sweep.cv, sx, sy)}" fill="none" stroke="${COLOURS.holdout}" stroke-width="2"/>`);
  body.push(
    `<g fill="#ffffff" stroke="${COLOURS.holdout}" stroke-width="1.6">${s
      .map((v, i) => {
        const c = sweep.cv[i];
        if (c === null) return '';
        const x = sx(v);
        const y = sy(c);
        return `<path d="M${px(x)} ${px(y - DIAMOND)}L${px(x + DIAMOND)} ${px(y)}L${px(x)} ${px(y + DIAMOND)}L${px(x - DIAMOND)} ${px(y)}Z"/>`;
      })
      .join('')}</g>`,
  );
  let best = -1;
  sweep.cv.forEach((c, i) => {
    if (c !== null && (best < 0 || c < (sweep.cv[best] as number))) best = i;
  });
  const legend = [
    {
      mark: `${legendLine(COLOURS.holdout)}<path d="M7 3L11 7L7 11L3 7Z" fill="#fff" stroke="${COLOURS.holdout}" stroke-width="1.4"/>`,
      label: 'cross-validated RMSE',
    },
  ];
  if (sweep.train) legend.push({ mark: legendLine(COLOURS.train, DASHES.reference, 1.6), label: 'training RMSE' });
  if (sweep.chosen !== null) legend.push({ mark: legendLine(COLOURS.curve, undefined, 1.4), label: 'chosen' });
  if (sweep.suggested !== null && sweep.suggested !== sweep.chosen)
    legend.push({ mark: legendLine(COLOURS.curve, DASHES.suggested, 1.4), label: 'suggested' });
  return frame({
    id,
    kind: 'cv-curve',
    title: `Cross-validated error over ${sweep.parameter}`,
    desc:
      `Cross-validated RMSE at ${s.length} settings of ${sweep.parameter} from ${formatNumber(sweep.settings[0])} to ${formatNumber(sweep.settings[s.length - 1])}${sweep.log ? ' (log scale)' : ''}` +
      `${best >= 0 ? `; lowest ${formatNumber(sweep.cv[best])} at ${formatNumber(sweep.settings[best])}` : ''}` +
      `${sweep.chosen !== null ? `; the descriptor's setting is ${formatNumber(sweep.chosen)}` : ''}` +
      `${sweep.suggested !== null ? `; suggested ${formatNumber(sweep.suggested)}` : ''}.`,
    x: sx,
    y: sy,
    xLabel: `${sweep.parameter}${sweep.log ? ' (log scale)' : ''}`,
    yLabel: `cross-validated RMSE${yLog ? ' (log scale)' : ''}`,
    xTickLabel: hasZero ? (v) => (v === zeroAt ? '0' : null) : undefined,
    body: body.join(''),
    overlay: overlay.join(''),
    legend,
    data: { settings: s.length },
  });
}
