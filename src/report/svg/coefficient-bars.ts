/**
 * Standardised coefficients |w_j| sd(phi_j) / sd(y) as horizontal bars, one per non-intercept
 * design column, with the fail limit (dashed) and the warning limit (dotted) drawn across. A
 * positive coefficient is a filled bar, a negative one an outlined bar; bars over the fail limit
 * are vermillion. When sizes span three decades or more the axis is logarithmic.
 */
import { formatNumber } from '../../core/format.js';
import { maxOf, minOf } from '../../core/extremes.js';
import type { CoefficientData } from '../../result/chart-types.js';
import { escapeHtml } from '../escape.js';
import { frame, MARGIN, plotArea, px, WIDTH, type ChartOptions } from './frame.js';
import { COLOURS, DASHES, legendLine } from './palette.js';
import { linearScale, logScale } from './scale.js';

/** Most bars drawn; with more columns the largest are kept, in column order. */
export const MAX_BARS = 60;

const BAR = 14;
const GAP = 4;
const LABEL_CHARS = 22;

function shorten(name: string): string {
  return name.length <= LABEL_CHARS ? name : `${name.slice(0, LABEL_CHARS - 1)}…`;
}

/** Renders the coefficient bars of a model; null when it has no non-intercept column. */
export function coefficientBarsChart(coef: CoefficientData, options: ChartOptions): string | null {
  const { id } = options;
  const all = coef.columns.map((name, j) => ({ name, j, v: coef.values[j] }));
  if (all.length === 0) return null;
  let shown = all;
  if (all.length > MAX_BARS) {
    shown = [...all]
      .sort((a, b) => Math.abs(b.v ?? Infinity) - Math.abs(a.v ?? Infinity))
      .slice(0, MAX_BARS)
      .sort((a, b) => a.j - b.j);
  }
  const left = Math.min(170, 16 + maxOf(shown.map((b) => shorten(b.name).length)) * 6.4);
  const height = Math.max(180, MARGIN.top + MARGIN.bottom + shown.length * (BAR + GAP) + GAP);
  const { x0, y0, x1, y1 } = plotArea(WIDTH, height, left);
  const sizes = shown.map((b) => (b.v === null ? null : Math.abs(b.v)));
  const finite = sizes.filter((v): v is number => v !== null);
  const refs = [coef.limit, coef.warn].filter((v): v is number => v !== null && v > 0);
  const top = maxOf([...finite, ...refs], 1e-12);
  const positives = [...finite, ...refs].filter((v) => v > 0);
  const bottom = positives.length ? minOf(positives) : top;
  const log = top / bottom >= 1000;
  const sx = log
    ? logScale([10 ** Math.floor(Math.log10(bottom)), 10 ** Math.ceil(Math.log10(top * 1.05))], [x0, x1])
    : linearScale([0, top * 1.08], [x0, x1]);
  const base = log ? x0 : sx(0);
  const bars: string[] = [];
  const categories: { y: number; label: string; full: string }[] = [];
  shown.forEach((b, k) => {
    const y = y0 + GAP + k * (BAR + GAP);
    categories.push({ y: y + BAR / 2, label: shorten(b.name), full: b.name });
    const size = sizes[k];
    const over = size === null || (coef.limit !== null && size > coef.limit);
    const colour = over ? COLOURS.limit : COLOURS.train;
    const end = size === null ? x1 : Math.max(base + 1, Math.min(x1, sx(size)));
    const negative = b.v !== null && b.v < 0;
    const fill = negative ? '#ffffff' : colour;
    bars.push(
      `<rect class="bar" data-column="${escapeHtml(b.name)}" x="${px(base)}" y="${px(y)}" width="${px(end - base)}" height="${BAR}" fill="${fill}" stroke="${colour}" stroke-width="1.4"><title>${escapeHtml(`${b.name}: ${b.v === null ? 'not finite' : formatNumber(b.v)}`)}</title></rect>`,
    );
  });
  const lines: string[] = [];
  if (coef.warn !== null && coef.warn > 0) {
    lines.push(
      `<line class="warn" x1="${px(sx(coef.warn))}" y1="${y0}" x2="${px(sx(coef.warn))}" y2="${y1}" stroke="${COLOURS.warn}" stroke-width="1.6" stroke-dasharray="${DASHES.warn}"/>`,
    );
  }
  if (coef.limit !== null && coef.limit > 0) {
    lines.push(
      `<line class="limit" x1="${px(sx(coef.limit))}" y1="${y0}" x2="${px(sx(coef.limit))}" y2="${y1}" stroke="${COLOURS.limit}" stroke-width="1.8" stroke-dasharray="${DASHES.limit}"/>`,
    );
  }
  const legend = [
    { mark: `<rect x="1" y="3" width="12" height="8" fill="${COLOURS.train}"/>`, label: 'positive' },
    { mark: `<rect x="1" y="3" width="12" height="8" fill="#fff" stroke="${COLOURS.train}" stroke-width="1.4"/>`, label: 'negative' },
  ];
  if (coef.limit !== null)
    legend.push({ mark: legendLine(COLOURS.limit, DASHES.limit, 1.8), label: `fail limit ${formatNumber(coef.limit)}` });
  if (coef.warn !== null) legend.push({ mark: legendLine(COLOURS.warn, DASHES.warn, 1.6), label: `warning ${formatNumber(coef.warn)}` });
  const overCount = sizes.filter((v) => v === null || (coef.limit !== null && v > coef.limit)).length;
  const largest = finite.length ? maxOf(finite) : Number.NaN;
  return frame({
    id,
    kind: 'coefficients',
    title: 'Standardised coefficients',
    desc:
      `Size of the standardised coefficient |w| sd(column) / sd(target) of ${shown.length}${shown.length < all.length ? ` (the largest) of ${all.length}` : ''} design columns${log ? ' on a log scale' : ''}; largest ${formatNumber(largest)}` +
      `${coef.limit !== null ? `; fail limit ${formatNumber(coef.limit)}, ${overCount} ${overCount === 1 ? 'column' : 'columns'} over it` : '; no fail limit'}.`,
    x: sx,
    y: linearScale([0, 1], [y1, y0]),
    xLabel: `|standardised coefficient|${log ? ' (log scale)' : ''}`,
    yLabel: '',
    body: `${bars.join('')}${lines.join('')}`,
    legend,
    height,
    left,
    yCategories: categories,
    data: { bars: shown.length, columns: all.length, over: overCount },
  });
}
