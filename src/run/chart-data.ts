/**
 * The figures the HTML report and the Markdown charts draw, computed once in the pipeline so
 * that reporters never compute: points of training and hold-out rows (thinned evenly when a file
 * is large, and saying so), the fitted curve over the scanned range with the observed target band
 * and the stretches where the curve leaves it, one partial curve per input, the complexity sweep
 * and the standardised coefficients. Every number is finite or null, so the data survives
 * `JSON.stringify` unchanged.
 */
import type { ModelData } from '../data/model-data.js';
import { placeOfLine } from '../data/data-parts.js';
import { predictRows } from '../design/blocks.js';
import { fromJsonNumber, type CheckResult, type JsonNumber } from '../result/result.js';
import { columnMedian } from '../diagnostics/column-median.js';
import { range } from '../design/stats.js';
import { inverseTarget } from '../data/target-transform.js';
import { spikeIntervals } from '../diagnostics/spikes.js';
import type { FittedModel } from './fit-model.js';
import {
  CHART_DIGITS,
  CURVE_MARGIN,
  CURVE_POINTS,
  FULL_CHART_SHARE,
  MAX_CHART_POINTS,
  MAX_PARTIAL_CURVES,
  MAX_SERIES_NUMBERS,
  MAX_SPIKE_MARKS,
  PARTIAL_CURVE_POINTS,
  type BandRegion,
  type ChartData,
  type ChartShare,
  type CurveData,
  type FitCurveData,
  type PointSeries,
  type SpikeMarks,
  type SweepData,
} from '../result/chart-types.js';

export { MAX_CHART_POINTS } from '../result/chart-types.js';

/** Exact powers of ten 10^0 .. 10^22 (every one a double without rounding). */
const EXACT_TENS = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** Smallest mantissa of {@link CHART_DIGITS} digits, 10^(digits - 1). */
const LEAST_MANTISSA = 10 ** (CHART_DIGITS - 1);

/**
 * Rounds to {@link CHART_DIGITS} significant digits; null for NaN and infinities. The value is
 * exactly `Number(x.toPrecision(CHART_DIGITS))` (and +0 for either zero), computed without strings
 * when that is safe: with e the decimal exponent of |x|, the mantissa n = round(|x| 10^(digits-1-e))
 * is taken from the double product when the product is not within 1e-6 of a tie (its rounding
 * error is below 1e-8 there), and n / 10^k (or n x 10^k) with both factors exact is the correctly
 * rounded double of the decimal n x 10^(e-digits+1), as the string's parse is. Anything else
 * (exponents beyond +-22, near-ties, a mantissa that carried into another digit) goes through the string.
 */
export function chartNumber(x: number): number | null {
  if (!Number.isFinite(x)) return null;
  if (x === 0) return 0;
  const a = Math.abs(x);
  const e = Math.floor(Math.log10(a));
  const k = CHART_DIGITS - 1 - e;
  if (k >= -22 && k <= 22) {
    const scaled = k >= 0 ? a * EXACT_TENS[k] : a / EXACT_TENS[-k];
    const n = Math.round(scaled);
    if (n >= LEAST_MANTISSA && n < 10 * LEAST_MANTISSA && Math.abs(Math.abs(scaled - Math.floor(scaled)) - 0.5) > 1e-6) {
      const r = k >= 0 ? n / EXACT_TENS[k] : n * EXACT_TENS[-k];
      return x < 0 ? -r : r;
    }
  }
  return Number(x.toPrecision(CHART_DIGITS));
}

/**
 * Rows to keep when a file has more than `max` rows: `max` evenly spaced indices
 * floor(t n / max), t = 0 .. max-1 (deterministic: the same file always gives the same points).
 */
export function thinRows(n: number, max = MAX_CHART_POINTS): Int32Array {
  // Plain loops: `Int32Array.from` with a mapping function takes the builtins' slow generic path.
  const m = Math.max(0, Math.trunc(Math.min(n, max)));
  const keep = new Int32Array(m);
  if (n <= max) for (let i = 0; i < m; i++) keep[i] = i;
  else for (let t = 0; t < m; t++) keep[t] = Math.floor((t * n) / max);
  return keep;
}

/**
 * Rows a series of a model with this many inputs keeps at most: `numbers` / (inputs + 4), at most `max`.
 * @param numbers most numbers of the series; default {@link MAX_SERIES_NUMBERS} (less under a shrunk {@link ChartShare})
 */
export function seriesPoints(inputs: number, max = MAX_CHART_POINTS, numbers = MAX_SERIES_NUMBERS): number {
  return Math.max(1, Math.min(max, Math.floor(numbers / (inputs + 4))));
}

/** Read from parts: the parts and each kept row's part (`files`, `file_index`); nothing for one file. */
function partIndex(data: ModelData, keep: Int32Array): { files?: string[]; file_index?: number[] } {
  const parts = data.parts;
  if (parts === undefined) return {};
  const index = new Map(parts.map((p, k) => [p.file, k]));
  const fileIndex: number[] = [];
  for (let t = 0; t < keep.length; t++) fileIndex.push(index.get(placeOfLine(data, data.lines[keep[t]]).file) ?? 0);
  return { files: parts.map((p) => p.file), file_index: fileIndex };
}

/** {@link chartNumber} of the kept rows of a column, in the order of `keep`. */
function pickRows(col: ArrayLike<number>, keep: Int32Array): (number | null)[] {
  // Made at its length (one backing store, not grown push by push) and filled in order.
  const out = new Array<number | null>(keep.length);
  for (let t = 0; t < keep.length; t++) out[t] = chartNumber(col[keep[t]]);
  return out;
}

function series(data: ModelData, predictions: Float64Array, max: number, numbers: number): PointSeries {
  const keep = thinRows(data.rows, seriesPoints(data.inputs.length, max, numbers));
  const thinned = keep.length < data.rows;
  // Plain loops over the kept rows (`Array.from` with a mapping function is several times slower).
  const lines = new Array<number>(keep.length);
  const residual = new Array<number | null>(keep.length);
  if (data.parts === undefined || data.parts.length === 0) for (let t = 0; t < keep.length; t++) lines[t] = data.lines[keep[t]];
  else for (let t = 0; t < keep.length; t++) lines[t] = placeOfLine(data, data.lines[keep[t]]).line;
  for (let t = 0; t < keep.length; t++) residual[t] = chartNumber(data.y[keep[t]] - predictions[keep[t]]);
  return {
    rows: data.rows,
    shown: keep.length,
    thinned,
    thinning: thinned ? `${keep.length} of ${data.rows} rows, evenly spaced through the file` : '',
    lines,
    ...partIndex(data, keep),
    x: data.inputs.map((col) => pickRows(col, keep)),
    actual: pickRows(data.y, keep),
    fitted: pickRows(predictions, keep),
    residual,
  };
}

/** A series that draws none of its rows (the run's chart data went to other models): counts and why. */
function emptySeries(data: ModelData, why: string): PointSeries {
  return {
    rows: data.rows,
    shown: 0,
    thinned: data.rows > 0,
    thinning: data.rows > 0 ? why : '',
    lines: [],
    ...(data.parts !== undefined ? { files: data.parts.map((p) => p.file), file_index: [] } : {}),
    x: data.inputs.map(() => []),
    actual: [],
    fitted: [],
    residual: [],
  };
}

/** Grid points of each partial curve of a model with this many curves (see {@link PARTIAL_CURVE_POINTS}). */
export function partialCurvePoints(curves: number): number {
  return Math.max(101, Math.min(CURVE_POINTS, Math.floor(PARTIAL_CURVE_POINTS / Math.max(1, curves))));
}

/**
 * Predictions along input c over [lo, hi] at `points` grid points (plus `extra` x values), the
 * others at `medians`; at the values in `discrete` only when given (a category's level codes).
 */
function curveAlong(
  model: FittedModel,
  c: number,
  lo: number,
  hi: number,
  medians: number[],
  extra: readonly number[],
  points: number,
  discrete?: readonly number[],
): { x: number[]; y: (number | null)[] } {
  const xs: number[] = [];
  if (discrete !== undefined) for (const v of discrete) xs.push(v);
  else for (let t = 0; t < points; t++) xs.push(t === points - 1 ? hi : lo + ((hi - lo) * t) / (points - 1));
  for (const v of extra) if (v >= lo && v <= hi) xs.push(v);
  const grid = Float64Array.from(xs).sort();
  const columns = model.design.inputs.map((_, k) => (k === c ? grid : new Float64Array(grid.length).fill(medians[k])));
  const pred = predictRows(model.design, { inputs: columns, rows: grid.length }, model.fit.coefficients);
  // A transformed target judged on the original scale is drawn on it (as the swing check scans it).
  const scale = originalScale(model);
  if (scale !== null) for (let i = 0; i < pred.length; i++) pred[i] = inverseTarget(scale.transform, pred[i]);
  const x: number[] = [];
  const y: (number | null)[] = [];
  for (let i = 0; i < grid.length; i++) {
    const xi = chartNumber(grid[i]);
    if (xi === null || (x.length > 0 && xi === x[x.length - 1])) continue;
    x.push(xi);
    y.push(chartNumber(pred[i]));
  }
  return { x, y };
}

/** The target scale of a model fitted on a transformed target whose limits judge the original scale, else null. */
function originalScale(model: FittedModel): NonNullable<FittedModel['targetScale']> | null {
  const scale = model.targetScale ?? null;
  return scale !== null && scale.limitsScale === 'original' ? scale : null;
}

/**
 * The intervals along input c where the curve spikes (diagnostics/spikes.ts, {@link spikeIntervals}),
 * judged with the `swing-spikes` outcome's warning limit, else its fail limit; only when that check
 * warns or fails (the marks show where its figure comes from), null otherwise, when none is marked
 * or the input is a category. The largest {@link MAX_SPIKE_MARKS} are kept.
 */
function spikeMarks(model: FittedModel, checks: readonly CheckResult[], c: number): SpikeMarks | null {
  const check = checks.find((k) => k.id === 'swing-spikes');
  const limit = check?.warn ?? check?.limit ?? null;
  // Marks explain a finding: only when the figure is over its warning or fail limit.
  if (check === undefined || (check.status !== 'warn' && check.status !== 'fail') || limit === null || !(limit > 0)) return null;
  const name = model.design.inputs[c];
  if (model.design.terms.some((t) => t.discreteValues !== undefined && t.inputs.includes(name))) return null;
  const scale = originalScale(model);
  const original =
    scale !== null ? { kind: scale.transform, y: scale.originalRows.train.y, weights: scale.originalRows.train.weights } : undefined;
  const found = spikeIntervals(model.design, model.tables.train, model.fit.coefficients, c, limit, original);
  if (found.length === 0) return null;
  const kept =
    found.length <= MAX_SPIKE_MARKS
      ? found
      : found
          .map((s, i) => ({ s, i }))
          .sort((a, b) => b.s.curveVariation / b.s.allowed - a.s.curveVariation / a.s.allowed || a.i - b.i)
          .slice(0, MAX_SPIKE_MARKS)
          .sort((a, b) => a.i - b.i)
          .map((e) => e.s);
  return {
    limit,
    intervals: kept.map((s) => ({
      from: chartNumber(s.from) ?? s.from,
      to: chartNumber(s.to) ?? s.to,
      variation: chartNumber(s.curveVariation),
      allowed: chartNumber(s.allowed),
    })),
    ...(found.length > kept.length ? { left_out: found.length - kept.length } : {}),
  };
}

/**
 * Stretches of the curve outside [lo, hi]; edges are placed where the straight line between two
 * neighbouring grid points crosses the band edge. A null prediction counts as outside (above).
 */
export function bandRegions(x: readonly number[], y: readonly (number | null)[], lo: number, hi: number): BandRegion[] {
  const regions: BandRegion[] = [];
  const sideOf = (v: number | null): 'above' | 'below' | null => (v === null || v > hi ? 'above' : v < lo ? 'below' : null);
  const cross = (i: number, edge: number): number => {
    const a = y[i - 1];
    const b = y[i];
    if (a === null || b === null || a === b) return x[i];
    const f = (edge - a) / (b - a);
    return x[i - 1] + Math.min(1, Math.max(0, f)) * (x[i] - x[i - 1]);
  };
  let open: BandRegion | null = null;
  for (let i = 0; i < x.length; i++) {
    const s = sideOf(y[i]);
    if (open && s !== open.side) {
      open.to = cross(i, open.side === 'above' ? hi : lo);
      regions.push(open);
      open = null;
    }
    if (s && !open) open = { from: i === 0 ? x[0] : cross(i, s === 'above' ? hi : lo), to: x[i], side: s };
  }
  if (open) {
    open.to = x[x.length - 1];
    regions.push(open);
  }
  return regions.map((r) => ({ from: chartNumber(r.from) ?? r.from, to: chartNumber(r.to) ?? r.to, side: r.side }));
}

/** The swing check's detail, as far as charts use it (every field optional: read defensively). */
interface SwingDetailView {
  band: [number, number] | null;
  curve: { x: number[]; prediction: number[]; range: [number, number] | null } | null;
  regions: BandRegion[] | null;
}

function numberPair(v: unknown): [number, number] | null {
  const xs = numbers(v);
  return xs && xs.length === 2 && Number.isFinite(xs[0]) && Number.isFinite(xs[1]) ? [xs[0], xs[1]] : null;
}

/** An array of JSON numbers (finite numbers or `"Infinity"` style strings) as numbers, or null. */
function numbers(v: unknown): number[] | null {
  if (!Array.isArray(v) || !v.every((e) => typeof e === 'number' || e === 'Infinity' || e === '-Infinity' || e === 'NaN')) return null;
  return v.map((e) => fromJsonNumber(e as JsonNumber));
}

function readSwing(checks: readonly CheckResult[], input: string): SwingDetailView | null {
  const check = checks.find((c) => c.id === 'swing');
  if (!check?.detail) return null;
  const d = check.detail;
  const band = numberPair(d.band);
  let curve: SwingDetailView['curve'] = null;
  const curves = Array.isArray(d.curves) ? (d.curves as Record<string, unknown>[]) : [];
  const mine = curves.find((c) => c && c.input === input);
  if (mine) {
    const x = numbers(mine.x);
    const prediction = numbers(mine.prediction);
    if (x && prediction && x.length === prediction.length && x.length > 0) curve = { x, prediction, range: numberPair(mine.range) };
  }
  let regions: BandRegion[] | null = null;
  if (Array.isArray(d.regions)) {
    regions = [];
    for (const r of d.regions as Record<string, unknown>[]) {
      if (r && (r.input === undefined || r.input === input) && typeof r.from === 'number' && typeof r.to === 'number') {
        regions.push({ from: r.from, to: r.to, side: r.side === 'below' ? 'below' : 'above' });
      }
    }
  }
  return { band, curve, regions };
}

function finiteOrNull(v: unknown): number | null {
  const x = typeof v === 'number' || typeof v === 'string' ? fromJsonNumber(v as JsonNumber) : Number.NaN;
  return Number.isFinite(x) ? x : null;
}

/**
 * Reads the complexity check's sweep from its detail: `{ setting: 'degree' | 'width' | 'ridge',
 * current, chosen (the suggested index), curve: [{ setting, cv_rmse }] }`.
 */
function readSweep(checks: readonly CheckResult[]): SweepData | null {
  const check = checks.find((c) => c.id === 'complexity');
  if (!check?.detail || !Array.isArray(check.detail.curve)) return null;
  const d = check.detail;
  const curve = d.curve as Record<string, unknown>[];
  const at = (index: unknown): number | null => {
    const i = typeof index === 'number' && Number.isInteger(index) ? index : -1;
    return i >= 0 && i < curve.length ? finiteOrNull(curve[i]?.setting) : null;
  };
  const rows: { s: number; cv: number | null }[] = [];
  for (const p of curve) {
    const s = p && typeof p === 'object' ? finiteOrNull(p.setting) : null;
    if (s !== null) rows.push({ s, cv: finiteOrNull(p.cv_rmse) });
  }
  if (rows.length === 0) return null;
  rows.sort((a, b) => a.s - b.s);
  const parameter = typeof d.setting === 'string' ? d.setting : 'setting';
  // rows are sorted by setting, so the positive settings run from the first to the last.
  const positive = rows.filter((r) => r.s > 0).map((r) => r.s);
  return {
    parameter,
    log: parameter !== 'degree' && positive.length >= 2 && rows.every((r) => r.s >= 0) && positive[positive.length - 1] / positive[0] >= 10,
    settings: rows.map((r) => chartNumber(r.s) ?? r.s),
    cv: rows.map((r) => (r.cv === null ? null : chartNumber(r.cv))),
    train: null,
    chosen: at(d.current),
    suggested: at(d.chosen),
  };
}

/**
 * Builds the chart data of one fitted model from its rows, predictions and check outcomes.
 * Cost: one pass over each file's kept rows, the medians (shared with swing: {@link columnMedian}), and
 * {@link CURVE_POINTS} predictions per curve.
 * @param model the fitted model (design, coefficients, data, predictions)
 * @param checks the model's check outcomes (swing and complexity details are read when present)
 * @param maxPoints most points per series; default {@link MAX_CHART_POINTS}
 * @param share the model's share of the run's chart data (series numbers, curve points); default the full share
 */
export function buildChartData(
  model: FittedModel,
  checks: readonly CheckResult[],
  maxPoints = MAX_CHART_POINTS,
  share: ChartShare = FULL_CHART_SHARE,
): ChartData {
  const { design, tables, metrics, descriptor } = model;
  const { train, holdout } = tables;
  const inputs = [...design.inputs];
  if (share.noPoints !== undefined) {
    // No points and no curves: only the sweep and the coefficients, a few numbers each.
    return {
      target: descriptor.data.target,
      inputs,
      train: emptySeries(train, share.noPoints),
      holdout: emptySeries(holdout, share.noPoints),
      fit: null,
      partials: [],
      sweep: readSweep(checks),
      coefficients: coefficientData(model, checks),
      no_points: share.noPoints,
    };
  }
  const medians = train.inputs.map((col) => columnMedian(col, train.rows));
  let spread = 0;
  for (let c = 0; c < inputs.length; c++) {
    const [lo, hi] = range(train.inputs[c], train.rows);
    if (hi > lo) spread++;
  }
  const points = Math.min(share.curvePoints, inputs.length === 1 ? CURVE_POINTS : partialCurvePoints(Math.min(spread, MAX_PARTIAL_CURVES)));

  // One input: the curve over the scanned range with the band; several: partial curves.
  let fitCurve: FitCurveData | null = null;
  const partials: CurveData[] = [];
  let partialsLeftOut = 0;
  for (let c = 0; c < inputs.length; c++) {
    const [tlo, thi] = range(train.inputs[c], train.rows);
    if (!(thi > tlo)) continue;
    if (inputs.length > 1 && partials.length >= MAX_PARTIAL_CURVES) {
      partialsLeftOut += 1;
      continue;
    }
    const swing = inputs.length === 1 ? readSwing(checks, inputs[c]) : null;
    const swingCurve = swing?.curve ?? null;
    // A category input is drawn at its levels only (no margins, no points between levels), as swing scans it.
    const discrete = model.design.terms.find((t) => t.discreteValues !== undefined && t.inputs.includes(inputs[c]))?.discreteValues;
    const margin = discrete !== undefined ? 0 : CURVE_MARGIN * (thi - tlo);
    const lo = swingCurve ? Math.min(swingCurve.x[0], tlo) : tlo - margin;
    const hi = swingCurve ? Math.max(swingCurve.x[swingCurve.x.length - 1], thi) : thi + margin;
    const { x, y } = curveAlong(model, c, lo, hi, medians, swingCurve ? swingCurve.x : [], points, discrete);
    // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
    const others: Record<string, number> = Object.create(null);
    inputs.forEach((name, k) => {
      if (k !== c) others[name] = chartNumber(medians[k]) ?? 0;
    });
    const spikes = spikeMarks(model, checks, c);
    const curve: CurveData = {
      input: inputs[c],
      others,
      range: [chartNumber(tlo) ?? tlo, chartNumber(thi) ?? thi],
      x,
      y,
      ...(spikes !== null ? { spikes } : {}),
    };
    if (inputs.length === 1) {
      const onOriginal = originalScale(model);
      const band = swing?.band ?? (onOriginal ? range(onOriginal.originalRows.train.y, train.rows) : metrics.targetRange);
      fitCurve = {
        ...curve,
        band: [chartNumber(band[0]) ?? band[0], chartNumber(band[1]) ?? band[1]],
        regions: swing?.regions ?? bandRegions(x, y, band[0], band[1]),
        source: swing && (swing.band || swing.curve) ? 'swing' : 'data',
      };
    } else {
      partials.push(curve);
    }
  }

  // A transformed target judged on the original scale: its rows as written, predictions back-transformed.
  const scale = originalScale(model);
  return {
    target: descriptor.data.target,
    inputs,
    train: scale
      ? series({ ...train, y: scale.originalRows.train.y }, scale.predictions.train, maxPoints, share.seriesNumbers)
      : series(train, model.trainPredictions, maxPoints, share.seriesNumbers),
    holdout: scale
      ? series({ ...holdout, y: scale.originalRows.holdout.y }, scale.predictions.holdout, maxPoints, share.seriesNumbers)
      : series(holdout, model.holdoutPredictions, maxPoints, share.seriesNumbers),
    fit: fitCurve,
    partials,
    ...(partialsLeftOut > 0 ? { partialsLeftOut } : {}),
    sweep: readSweep(checks),
    coefficients: coefficientData(model, checks),
  };
}

/** Standardised coefficients of the non-intercept columns, with the `coefficient-size` limits. */
function coefficientData(model: FittedModel, checks: readonly CheckResult[]): ChartData['coefficients'] {
  const { design, fit, metrics } = model;
  const coefCheck = checks.find((c) => c.id === 'coefficient-size');
  const columns: string[] = [];
  const values: (number | null)[] = [];
  for (let j = 0; j < design.p; j++) {
    if (!design.penalised[j]) continue;
    columns.push(design.columnNames[j]);
    values.push(chartNumber((fit.coefficients[j] * metrics.columnSd[j]) / metrics.targetSd));
  }
  return { columns, values, limit: coefCheck?.limit ?? null, warn: coefCheck?.warn ?? null };
}
