/**
 * A small Mermaid `xychart-beta` chart per model for the Markdown summary and pull-request
 * comment, where GitHub renders Mermaid but strips inline SVG and data-URI images. The chart is
 * drawn from the pipeline's chart data; xychart-beta has lines and bars only (no scatter), so:
 * a model of one input shows its fitted curve with the observed target band as two flat lines;
 * otherwise the cross-validated error over the complexity sweep when there is one; otherwise
 * the standardised coefficient sizes as bars with the fail limit as a line.
 */
import { formatNumber } from '../core/format.js';
import type { ChartData } from '../result/chart-types.js';
import type { ModelResult } from '../result/result.js';
import { escapeMermaid } from './escape.js';
import { axisLabel } from './svg/units.js';

/** Options of {@link mermaidChart}. */
export interface MermaidOptions {
  /** Most values per line or bar series (curves are sampled evenly). Default 40. */
  maxValues?: number;
}

/** A number for a Mermaid series: 4 significant digits, plain decimal notation. */
function value(v: number): string {
  const r = Number(v.toPrecision(4));
  return Object.is(r, -0)
    ? '0'
    : String(r).includes('e')
      ? r.toFixed(Math.min(100, Math.max(0, 3 - Math.floor(Math.log10(Math.abs(r))))))
      : String(r);
}

/** Indices of at most `max` evenly spaced entries of a list of `n`, first and last kept. */
function evenly(n: number, max: number): number[] {
  if (n <= max) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: max }, (_, t) => Math.round((t * (n - 1)) / (max - 1)));
}

function fence(lines: string[]): string {
  return ['```mermaid', 'xychart-beta', ...lines.map((l) => `  ${l}`), '```', ''].join('\n');
}

function curveChart(name: string, chart: ChartData, max: number): string | null {
  const fit = chart.fit;
  if (!fit || fit.x.length < 2) return null;
  const [lo, hi] = fit.band;
  const span = hi - lo;
  // Values far outside the band would flatten the picture: clip them to one band width past it, and say so.
  const top = hi + span;
  const bottom = lo - span;
  const picks = evenly(fit.x.length, max);
  let clipped = false;
  const ys: string[] = [];
  for (const i of picks) {
    let y = fit.y[i];
    if (y === null) {
      y = top;
      clipped = true;
    } else if (y > top || y < bottom) {
      y = Math.min(top, Math.max(bottom, y));
      clipped = true;
    }
    ys.push(value(y));
  }
  const title = `${name}: fitted ${chart.target}, band ${formatNumber(lo)} to ${formatNumber(hi)}${clipped ? ' (clipped)' : ''}`;
  return fence([
    `title "${escapeMermaid(title)}"`,
    `x-axis "${escapeMermaid(axisLabel(fit.input))}" ${value(fit.x[0])} --> ${value(fit.x[fit.x.length - 1])}`,
    `y-axis "${escapeMermaid(axisLabel(chart.target))}" ${value(bottom)} --> ${value(top)}`,
    `line [${ys.join(', ')}]`,
    `line [${picks.map(() => value(hi)).join(', ')}]`,
    `line [${picks.map(() => value(lo)).join(', ')}]`,
  ]);
}

function sweepChart(name: string, chart: ChartData, max: number): string | null {
  const sweep = chart.sweep;
  if (!sweep) return null;
  const picks = evenly(sweep.settings.length, max).filter((i) => sweep.cv[i] !== null);
  if (picks.length < 2) return null;
  const cv = picks.map((i) => sweep.cv[i] as number);
  const title = `${name}: cross-validated RMSE over ${sweep.parameter}${sweep.chosen !== null ? `, chosen ${formatNumber(sweep.chosen)}` : ''}${sweep.suggested !== null ? `, suggested ${formatNumber(sweep.suggested)}` : ''}`;
  const categories = picks.map((i) => `"${escapeMermaid(formatNumber(sweep.settings[i]))}"`);
  return fence([
    `title "${escapeMermaid(title)}"`,
    `x-axis "${escapeMermaid(sweep.parameter)}" [${categories.join(', ')}]`,
    `y-axis "cross-validated RMSE"`,
    `line [${cv.map(value).join(', ')}]`,
  ]);
}

function coefficientChart(name: string, chart: ChartData, max: number): string | null {
  const coef = chart.coefficients;
  const entries = coef.columns.map((c, j) => ({ c, v: coef.values[j] })).filter((e): e is { c: string; v: number } => e.v !== null);
  if (entries.length === 0) return null;
  const shown = entries.length <= max ? entries : [...entries].sort((a, b) => Math.abs(b.v) - Math.abs(a.v)).slice(0, max);
  const bars = shown.map((e) => value(Math.abs(e.v)));
  const lines = [
    `title "${escapeMermaid(`${name}: standardised coefficient sizes${coef.limit !== null ? `, fail limit ${formatNumber(coef.limit)}` : ''}`)}"`,
    `x-axis [${shown.map((e) => `"${escapeMermaid(e.c)}"`).join(', ')}]`,
    `y-axis "|standardised coefficient|"`,
    `bar [${bars.join(', ')}]`,
  ];
  if (coef.limit !== null) lines.push(`line [${shown.map(() => value(coef.limit as number)).join(', ')}]`);
  return fence(lines);
}

/**
 * A fenced Mermaid chart for one model (for `report/markdown.ts`: put it after the model's check
 * table), or null when the model has no chart data.
 * @param model a model's outcome (reads `charts`)
 * @param options series length; defaults in {@link MermaidOptions}
 * @returns "```mermaid ... ```\n" text
 */
export function mermaidChart(model: ModelResult, options: MermaidOptions = {}): string | null {
  const chart = model.charts;
  if (!chart) return null;
  const max = options.maxValues ?? 40;
  return curveChart(model.name, chart, max) ?? sweepChart(model.name, chart, max) ?? coefficientChart(model.name, chart, max);
}
