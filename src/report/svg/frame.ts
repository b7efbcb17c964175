/**
 * The frame every chart shares: the `<svg>` element with its text alternative (`<title>`,
 * `<desc>`, `role="img"`, `aria-labelledby`), grid lines, axes with ticks and labels, the plot
 * area's clip path and a legend drawn inside the picture (so that it prints and screenshots
 * with the chart). Chart modules pass already escaped body markup; every text given here is
 * escaped on the way in.
 */
import { formatNumber } from '../../core/format.js';
import { escapeHtml } from '../escape.js';
import { COLOURS } from './palette.js';
import type { Scale } from './scale.js';

/** Chart size in px (the page scales it to its column width). */
export const WIDTH = 560;
export const HEIGHT = 340;

/** Space around the plot area in px. */
export const MARGIN = { top: 34, right: 18, bottom: 48, left: 68 } as const;

/** Options every chart function takes. */
export interface ChartOptions {
  /** Unique id prefix on the page (letters, digits, `-`; not from user text). */
  id: string;
}

/** One legend entry: a small picture (SVG markup at 0,0 in a 14 x 14 box) and a label. */
export interface LegendItem {
  mark: string;
  label: string;
}

/** Everything the frame draws around a chart's body. */
export interface FrameSpec {
  id: string;
  /** `data-chart` value: the chart kind. */
  kind: string;
  /** Short title (plain text). */
  title: string;
  /** Text alternative: what the chart shows and its main finding (plain text). */
  desc: string;
  x: Scale;
  y: Scale;
  xLabel: string;
  yLabel: string;
  /** Plot-area markup (already escaped), clipped to the plot area. */
  body: string;
  /** Markup drawn above the plot area without clipping (labels of markers), already escaped. */
  overlay?: string;
  legend: LegendItem[];
  /** Extra `data-*` attributes (names without the prefix). */
  data?: Record<string, string | number>;
  width?: number;
  height?: number;
  /** Left margin override (long category labels). */
  left?: number;
  /** Text of an x tick instead of the number (null: the number). Default none. */
  xTickLabel?: (value: number) => string | null;
  /** Draw vertical grid lines and x ticks. Default true. */
  xTicks?: boolean;
  /** Category labels at y positions instead of numeric y ticks. */
  yCategories?: { y: number; label: string; full: string }[];
}

/** Text of a tick value. */
export function tickText(v: number, log: boolean): string {
  if (log) {
    const e = Math.round(Math.log10(v));
    return Math.abs(e) <= 3 ? formatNumber(v) : `1e${e}`;
  }
  return formatNumber(v);
}

/** A number as SVG coordinate text (one decimal). */
export function px(v: number): string {
  return v.toFixed(1);
}

/** Plot area of a chart: left, top, right, bottom in px. */
export function plotArea(width = WIDTH, height = HEIGHT, left: number = MARGIN.left): { x0: number; y0: number; x1: number; y1: number } {
  return { x0: left, y0: MARGIN.top, x1: width - MARGIN.right, y1: height - MARGIN.bottom };
}

/** SVG path through points, breaking at null y values (gaps). */
export function linePath(xs: readonly number[], ys: readonly (number | null)[], sx: Scale, sy: Scale): string {
  let d = '';
  let pen = false;
  for (let i = 0; i < xs.length; i++) {
    const y = ys[i];
    if (y === null) {
      pen = false;
      continue;
    }
    // Keep far-off values finite for the renderer; the clip path hides them.
    const py = Math.max(-1e5, Math.min(1e5, sy(y)));
    d += `${pen ? 'L' : 'M'}${px(sx(xs[i]))} ${px(py)}`;
    pen = true;
  }
  return d;
}

/** Renders a chart: `<svg>` with title, description, grid, axes, clipped body, overlay and legend. */
export function frame(spec: FrameSpec): string {
  const width = spec.width ?? WIDTH;
  const height = spec.height ?? HEIGHT;
  const { x0, y0, x1, y1 } = plotArea(width, height, spec.left);
  const { x, y, id } = spec;
  const parts: string[] = [];
  const data = Object.entries(spec.data ?? {})
    .map(([k, v]) => ` data-${k}="${escapeHtml(String(v))}"`)
    .join('');
  parts.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-labelledby="${id}-title ${id}-desc" data-chart="${escapeHtml(spec.kind)}"${data}>`,
    `<title id="${id}-title">${escapeHtml(spec.title)}</title>`,
    `<desc id="${id}-desc">${escapeHtml(spec.desc)}</desc>`,
    `<defs><clipPath id="${id}-clip"><rect x="${x0}" y="${y0}" width="${x1 - x0}" height="${y1 - y0}"/></clipPath>`,
    `<pattern id="${id}-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="${COLOURS.region}" fill-opacity="0.12"/><line x1="0" y1="0" x2="0" y2="6" stroke="${COLOURS.region}" stroke-width="2.2"/></pattern></defs>`,
  );
  // Grid and ticks.
  const grid: string[] = [];
  const labels: string[] = [];
  if (spec.xTicks !== false) {
    for (const t of x.ticks) {
      const p = x(t);
      if (p < x0 - 0.5 || p > x1 + 0.5) continue;
      grid.push(`<line x1="${px(p)}" y1="${y0}" x2="${px(p)}" y2="${y1}"/>`);
      labels.push(
        `<text x="${px(p)}" y="${y1 + 16}" text-anchor="middle">${escapeHtml(spec.xTickLabel?.(t) ?? tickText(t, x.log))}</text>`,
      );
    }
  }
  if (spec.yCategories) {
    for (const c of spec.yCategories) {
      labels.push(
        `<text x="${x0 - 6}" y="${px(c.y + 4)}" text-anchor="end"><title>${escapeHtml(c.full)}</title>${escapeHtml(c.label)}</text>`,
      );
    }
  } else {
    for (const t of y.ticks) {
      const p = y(t);
      if (p < y0 - 0.5 || p > y1 + 0.5) continue;
      grid.push(`<line x1="${x0}" y1="${px(p)}" x2="${x1}" y2="${px(p)}"/>`);
      labels.push(`<text x="${x0 - 6}" y="${px(p + 4)}" text-anchor="end">${escapeHtml(tickText(t, y.log))}</text>`);
    }
  }
  parts.push(`<g class="grid" stroke="${COLOURS.grid}" stroke-width="1">${grid.join('')}</g>`);
  parts.push(`<g class="body" clip-path="url(#${id}-clip)">${spec.body}</g>`);
  parts.push(
    `<g class="axes" stroke="${COLOURS.axis}" stroke-width="1" fill="none"><path d="M${x0} ${y0}V${y1}H${x1}"/></g>`,
    `<g class="ticks" fill="${COLOURS.axis}" font-size="11">${labels.join('')}</g>`,
    `<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${height - 10}" text-anchor="middle" font-size="12" fill="#222">${escapeHtml(spec.xLabel)}</text>`,
  );
  if (spec.yLabel) {
    parts.push(
      `<text class="axis-label" transform="translate(14 ${px((y0 + y1) / 2)}) rotate(-90)" text-anchor="middle" font-size="12" fill="#222">${escapeHtml(spec.yLabel)}</text>`,
    );
  }
  if (spec.overlay) parts.push(spec.overlay);
  // Legend in one row above the plot area; a row too long for it starts further left (into the
  // margin of the y axis, whose label sits lower down).
  const natural = spec.legend.reduce((w, item) => w + 28 + item.label.length * 6.1, 0);
  let lx = x0 + natural > width - MARGIN.right ? Math.max(MARGIN.right, width - MARGIN.right - natural) : x0;
  const legend: string[] = [];
  for (const item of spec.legend) {
    legend.push(
      `<g transform="translate(${px(lx)} 9)">${item.mark}<text x="19" y="11" font-size="11" fill="#333">${escapeHtml(item.label)}</text></g>`,
    );
    lx += 28 + item.label.length * 6.1;
  }
  parts.push(`<g class="legend">${legend.join('')}</g>`);
  parts.push('</svg>');
  return parts.join('');
}
