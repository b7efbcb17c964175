/**
 * Swing between and beyond samples: how far a model's predictions leave the band of observed
 * training targets on inputs between the training rows and just past their range.
 */
import { createDesign, type Design } from '../design/design-matrix.js';
import type { Term } from '../design/terms/index.js';
import { predictRows } from '../design/blocks.js';
import { polynomialPredictor } from '../design/polynomial-predictions.js';
import type { Rows } from './cross-validation.js';
import { columnMedian, medianOfSorted, selectKth } from './column-median.js';
import { range } from '../design/stats.js';
import { sortFloat64 } from './radix-sort.js';
import { sortWithSlots } from './sorted-slots.js';
import { nearestPairs } from './nearest-neighbours.js';
import { checkDeadline } from '../core/deadline.js';
import { inverseTarget, type TargetTransformKind } from '../data/target-transform.js';
import { borrowDoubles, borrowInts, returnDoubles, returnInts } from '../core/scratch.js';

/** Options of {@link measureSwing}; every field has a default. */
export interface SwingOptions {
  /** Points inside each gap between neighbouring distinct values of an input. Default 8. */
  perGap?: number;
  /** Points of the uniform grid across an input's range (both ends included). Default 201. */
  uniform?: number;
  /** Margin outside the range on each side, as a fraction of the range. Default 0.1 (10 %). */
  margin?: number;
  /** Points in each margin. Default 40. */
  marginPoints?: number;
  /**
   * At most this many gaps get points (the widest); the uniform grid covers the rest. Several
   * inputs share it evenly: each input's grid takes its ceil(maxGaps / d) widest gaps. Default 4000.
   */
  maxGaps?: number;
  /**
   * Rows an input's grid is built from: above it, an even stride through the file plus the
   * input's smallest and largest value (so the grid spans the whole range). Default 20,000.
   */
  maxGridRows?: number;
  /** Several inputs: rows sampled for the neighbour segments. Default 1000. */
  maxRows?: number;
  /** Several inputs: nearest neighbours per sampled row. Default 3. */
  neighbours?: number;
  /** Several inputs: points inside each segment. Default 8. */
  segmentPoints?: number;
  /**
   * Points kept per curve in the result (thinning keeps each curve's extremes). Default 400, fewer
   * when more than 2 curves are kept, so that all curves together hold at most
   * {@link SWING_CURVE_NUMBERS} points (at least {@link SWING_MIN_CURVE_POINTS} each).
   */
  maxCurvePoints?: number;
  /**
   * Fraction (0, 1] of the default `maxCurvePoints` kept when it is not given: a run of many
   * models shrinks each model's curves (run/chart-data.ts, `chartShare`), to at least
   * {@link SWING_SHARED_MIN_CURVE_POINTS} points. Default 1.
   */
  curveShare?: number;
  /** Curves kept in the result: those of the first inputs (every input is scanned). Default 12. */
  maxCurves?: number;
  /**
   * The target transform of a model fitted on t = g(y) (`data.target_transform`) whose limits
   * judge the original scale: every prediction and the band's ends are back-transformed
   * (data/target-transform.ts, an increasing map) before they are compared. Default none.
   */
  backTransform?: TargetTransformKind;
}

/** The defaults of {@link SwingOptions}, one place for the scan and for the cost estimate (run/cost.ts). */
export const SWING_DEFAULTS = Object.freeze({
  perGap: 8,
  uniform: 201,
  margin: 0.1,
  marginPoints: 40,
  maxGaps: 4000,
  maxGridRows: 20_000,
  maxRows: 1000,
  neighbours: 3,
  segmentPoints: 8,
  maxCurvePoints: 400,
  maxCurves: 12,
});

/** Points of all kept curves together, at most (each curve is thinned to its share; 400 each up to 2 inputs). */
export const SWING_CURVE_NUMBERS = 800;

/** Fewest points a kept curve is thinned to. */
export const SWING_MIN_CURVE_POINTS = 100;

/** Fewest points a kept curve is thinned to under a `curveShare` below 1. */
export const SWING_SHARED_MIN_CURVE_POINTS = 25;

/** One curve for charts: predictions along one input, the other inputs held at their medians. */
export interface SwingCurve {
  /** The input varied along the curve. */
  input: string;
  /** The values of the other inputs (their training medians); empty for a model of one input. */
  others: Record<string, number>;
  /** Training range of the input. */
  range: [number, number];
  /** Input values, ascending, margins included (at most `maxCurvePoints`). */
  x: number[];
  /** Predictions at `x`. */
  prediction: number[];
}

/** Where the largest excursion happened. */
export interface SwingPoint {
  /** Input values by name. */
  inputs: Record<string, number>;
  prediction: number;
}

/** The swing figures of one fit. */
export interface Swing {
  /**
   * Excursion between samples: max(0, max(pred) - ymax, ymin - min(pred)) / (ymax - ymin) over
   * every point inside the training range.
   */
  inside: number;
  /** The same over the margins outside the range. */
  beyond: number;
  /** [ymin, ymax] of the training targets. */
  band: [number, number];
  /** Points evaluated inside the range and in the margins. */
  points: { inside: number; beyond: number };
  /** Where the largest excursion inside and beyond happened (null when no points). */
  worstInside: SwingPoint | null;
  worstBeyond: SwingPoint | null;
  /** One curve per input with a spread, for the first {@link SwingOptions.maxCurves} such inputs. */
  curves: SwingCurve[];
  /** Several inputs: sampled rows and neighbours used for the segments; null for one input. */
  segments: { rows: number; neighbours: number; pointsPerSegment: number } | null;
  /** The margin fraction used. */
  margin: number;
}

/**
 * Excursion of predictions outside the band [lo, hi] in units of its width:
 * max(0, max(pred) - hi, lo - min(pred)) / (hi - lo). NaN when hi <= lo or no predictions.
 */
export function excursion(prediction: ArrayLike<number>, lo: number, hi: number): number {
  if (!(hi > lo) || prediction.length === 0) return Number.NaN;
  let worst = 0;
  for (let i = 0; i < prediction.length; i++) {
    const v = prediction[i];
    const e = Number.isNaN(v) ? Infinity : Math.max(v - hi, lo - v);
    if (e > worst) worst = e;
  }
  return worst / (hi - lo);
}

/**
 * Grid across one input's range: `uniform` evenly spaced points from min to max, plus `perGap`
 * evenly spaced interior points in each gap between neighbouring distinct values (in the
 * `maxGaps` widest gaps when there are more; at least one per gap), plus `marginPoints` on each
 * side up to `margin` x range outside. Sorted, without duplicates.
 *
 * @param values the input's training values (any order; not modified)
 * @returns inside and beyond points, ascending; empty when the input has no spread
 */
export function inputGrid(values: ArrayLike<number>, options: SwingOptions = {}): { inside: Float64Array; beyond: Float64Array } {
  const sorted = sortFloat64(Float64Array.from(values));
  const { inside, beyond } = gridFromSorted(sorted, sorted.length, options);
  const own = inside.slice();
  returnDoubles(inside);
  return { inside: own, beyond };
}

/**
 * {@link inputGrid} from the input's values already sorted ascending in `sorted[0..n)`; the
 * array is overwritten (its distinct values are packed to the front). `inside` is lent
 * (core/scratch.ts): the caller gives it back with `returnDoubles` once nothing reads it.
 */
function gridFromSorted(
  sorted: Float64Array,
  n: number,
  options: SwingOptions,
  work?: Float64Array,
): { inside: Float64Array; beyond: Float64Array; gaps: number } {
  const perGap = options.perGap ?? SWING_DEFAULTS.perGap;
  const uniform = options.uniform ?? SWING_DEFAULTS.uniform;
  const margin = options.margin ?? SWING_DEFAULTS.margin;
  const marginPoints = options.marginPoints ?? SWING_DEFAULTS.marginPoints;
  const maxGaps = options.maxGaps ?? SWING_DEFAULTS.maxGaps;
  const count = packDistinct(sorted, n);
  const distinct = sorted.subarray(0, count);
  if (count < 2) return { inside: new Float64Array(0), beyond: new Float64Array(0), gaps: 0 };
  const lo = distinct[0];
  const hi = distinct[count - 1];
  const width = hi - lo;
  const gaps = widestGaps(distinct, maxGaps, work);
  const per = Math.max(1, Math.min(perGap, Math.floor((maxGaps * perGap) / gaps.length)));
  // The gap points go behind room for the uniform points, which wait in a second lent buffer: the
  // two runs are merged into the one array.
  const inside = borrowDoubles(uniform + gaps.length * per);
  const even = borrowDoubles(uniform);
  try {
    fillUniform(even, uniform, lo, hi);
    const beyond = marginGrid(lo, hi, margin * width, marginPoints);
    // The usual grid: the gap points merged with the uniform ones as they are made (one pass).
    const taken = new Int32Array(1);
    const merged = ascending(even, 0, uniform) ? mergeGapPoints(even, uniform, distinct, gaps, per, inside, taken) : -1;
    if (merged >= 0) {
      const all = appendUniform(even, taken[0], uniform, inside, merged);
      return { inside: inside.subarray(0, all), beyond: unique(beyond, beyond.length), gaps: count - 1 };
    }
    const w = fillGaps(inside, uniform, distinct, gaps, per);
    return { inside: uniqueOfRuns(even, inside, uniform, w), beyond: unique(beyond, beyond.length), gaps: count - 1 };
  } finally {
    returnDoubles(even);
    returnInts(gaps);
  }
}

// The loops of the grid are functions of their own, each a loop and its return (see
// DEVELOPERS.md, "Writing hot loops").

/** Packs the distinct values of the ascending a[0..n) to its front; returns how many. */
function packDistinct(a: Float64Array, n: number): number {
  let count = 0;
  for (let i = 0; i < n; i++) if (count === 0 || a[i] !== a[count - 1]) a[count++] = a[i];
  return count;
}

/**
 * {@link unique} of the points first[0..split) and xs[split..length) when each run is ascending
 * (the uniform points and the gap points), written to the front of `xs` (returned as its
 * subarray): one linear merge instead of a sort, with the sort's result (-0 before +0). Falls back
 * to {@link unique} when a run is out of order or holds a NaN.
 */
function uniqueOfRuns(first: Float64Array, xs: Float64Array, split: number, length: number): Float64Array {
  if (ascending(first, 0, split) && increasing(xs, split, length)) return xs.subarray(0, mergeBlocks(first, xs, split, length));
  if (!ascending(first, 0, split) || !ascending(xs, split, length)) {
    xs.set(first.subarray(0, split));
    return unique(xs, length);
  }
  return xs.subarray(0, mergeRuns(first, xs, split, length));
}

/** True when xs[from..to) holds no NaN and each value is below the next (no two equal, not even -0 and +0). */
function increasing(xs: Float64Array, from: number, to: number): boolean {
  if (to > from && Number.isNaN(xs[from])) return false;
  for (let i = from + 1; i < to; i++) if (!(xs[i - 1] < xs[i])) return false;
  return true;
}

/**
 * {@link mergeRuns} when the run xs[split..length) is {@link increasing} (the usual grid): the
 * values of `xs` between two values of `first` are moved as one block (`copyWithin`), found by
 * binary search; of a block only its first value can equal the value written before it.
 */
function mergeBlocks(first: Float64Array, xs: Float64Array, split: number, length: number): number {
  let j = split;
  let w = 0;
  for (let i = 0; i <= split; i++) {
    // The block xs[j..end): the values that sort before first[i] (every one left after the last).
    const end = i < split ? blockEnd(xs, j, length, first[i]) : length;
    if (end > j && w > 0 && xs[j] === xs[w - 1]) j++;
    if (end > j) {
      xs.copyWithin(w, j, end);
      w += end - j;
      j = end;
    }
    if (i < split && (w === 0 || first[i] !== xs[w - 1])) xs[w++] = first[i];
  }
  return w;
}

/** The first index t in [from, to) with !sortsBefore(xs[t], v), or `to` (xs[from..to) ascending; binary search). */
function blockEnd(xs: Float64Array, from: number, to: number, v: number): number {
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sortsBefore(xs[mid], v)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** True when xs[from..to) holds no NaN and is ascending in the order of the built-in sort. */
function ascending(xs: Float64Array, from: number, to: number): boolean {
  for (let i = from; i < to; i++) {
    const v = xs[i];
    if (Number.isNaN(v) || (i > from && sortsBefore(v, xs[i - 1]))) return false;
  }
  return true;
}

/**
 * Writes to xs[0..) the distinct values of the merge of the ascending runs first[0..split) and
 * xs[split..length) (equal values: the first run's first; of values equal to `===`, -0 and +0,
 * the first is kept, as {@link packDistinct} keeps it) and returns how many. In place: a value
 * taken from `first` is written below the next unread one of `xs` (fewer than `split` taken from
 * `first` so far), and one taken from `xs` at or below where it was read.
 */
function mergeRuns(first: Float64Array, xs: Float64Array, split: number, length: number): number {
  let i = 0;
  let j = split;
  let w = 0;
  for (let k = 0; k < length; k++) {
    const v = j >= length || (i < split && !sortsBefore(xs[j], first[i])) ? first[i++] : xs[j++];
    if (w === 0 || v !== xs[w - 1]) xs[w++] = v;
  }
  return w;
}

/** a < b in the order of the built-in typed-array sort (-0 before +0). */
function sortsBefore(a: number, b: number): boolean {
  return a < b || (a === 0 && b === 0 && Object.is(a, -0) && !Object.is(b, -0));
}

/** The distinct values of xs[0..length), ascending, as a subarray of xs (xs is reordered). */
function unique(xs: Float64Array, length: number): Float64Array {
  const u = sortFloat64(xs.subarray(0, length));
  return u.subarray(0, packDistinct(u, u.length));
}

/** out[0..count): count evenly spaced points from lo to hi, both included (hi exactly). */
function fillUniform(out: Float64Array, count: number, lo: number, hi: number): void {
  const width = hi - lo;
  for (let t = 0; t < count; t++) out[t] = t === count - 1 ? hi : lo + (width * t) / Math.max(1, count - 1);
}

/**
 * {@link uniqueOfRuns} of the ascending uniform points first[0..split) and the points
 * {@link fillGaps} makes, written to out[0..) as the gap points are made, without writing them
 * first: before each gap point v the uniform points u with !sortsBefore(v, u) (as
 * {@link mergeBlocks} orders them), and every value unless it equals (`===`) the one written
 * before it. Returns how many were written, or -1 when the gap points are not
 * {@link increasing} (the caller then takes the general path, which overwrites `out`); taken[0]
 * is how many uniform points it wrote, the rest follow with {@link appendUniform} (nothing but the
 * return after the loop: see DEVELOPERS.md, "Writing hot loops").
 */
function mergeGapPoints(
  first: Float64Array,
  split: number,
  distinct: Float64Array,
  gaps: Int32Array,
  per: number,
  out: Float64Array,
  taken: Int32Array,
): number {
  let i = 0;
  let w = 0;
  let made = 0;
  taken[0] = 0;
  let previous = 0;
  for (let g = 0; g < gaps.length; g++) {
    const a = distinct[gaps[g]];
    const b = distinct[gaps[g] + 1];
    for (let t = 1; t <= per; t++) {
      const v = a + ((b - a) * t) / (per + 1);
      if (made === 0 ? Number.isNaN(v) : !(previous < v)) return -1;
      made++;
      previous = v;
      while (i < split && !sortsBefore(v, first[i])) {
        const u = first[i++];
        taken[0] = i;
        if (w === 0 || u !== out[w - 1]) out[w++] = u;
      }
      if (w === 0 || v !== out[w - 1]) out[w++] = v;
    }
  }
  return w;
}

/** Writes the uniform points first[from..split) after out[0..w) as {@link mergeGapPoints} does (each unless equal to the one before); returns the count. */
function appendUniform(first: Float64Array, from: number, split: number, out: Float64Array, w: number): number {
  let at = w;
  for (let i = from; i < split; i++) {
    const u = first[i];
    if (at === 0 || u !== out[at - 1]) out[at++] = u;
  }
  return at;
}

/** Writes `per` points inside each listed gap of `distinct` from out[at]; returns the next free index. */
function fillGaps(out: Float64Array, at: number, distinct: Float64Array, gaps: Int32Array, per: number): number {
  let w = at;
  for (let g = 0; g < gaps.length; g++) {
    const a = distinct[gaps[g]];
    const b = distinct[gaps[g] + 1];
    for (let t = 1; t <= per; t++) out[w++] = a + ((b - a) * t) / (per + 1);
  }
  return w;
}

/** `count` points on each side of [lo, hi], at (t / count) of `reach` for t = 1..count, alternating below and above. */
function marginGrid(lo: number, hi: number, reach: number, count: number): Float64Array {
  const beyond = new Float64Array(2 * count);
  for (let t = 1; t <= count; t++) {
    const d = (reach * t) / count;
    beyond[2 * t - 2] = lo - d;
    beyond[2 * t - 1] = hi + d;
  }
  return beyond;
}

/**
 * Indices g of the `maxGaps` widest gaps distinct[g + 1] - distinct[g] (ties: lower g first), in
 * ascending g; all gaps when there are no more than `maxGaps`. Linear time: the threshold width
 * is found by selection ({@link select}) on one typed array of the widths. The array is lent
 * (core/scratch.ts): the caller gives it back with `returnInts`.
 */
function widestGaps(distinct: Float64Array, maxGaps: number, work?: Float64Array): Int32Array {
  const count = distinct.length - 1;
  if (count <= maxGaps) return allGaps(count);
  const widths = work !== undefined && work.length >= count ? work.subarray(0, count) : new Float64Array(count);
  gapWidths(distinct, count, widths);
  const threshold = selectKth(widths, count - maxGaps);
  const out = borrowInts(maxGaps);
  pickGaps(distinct, count, threshold, maxGaps - gapsWiderThan(distinct, count, threshold), out);
  return out;
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

/** 0, 1, ..., count - 1, in a lent array (core/scratch.ts). */
function allGaps(count: number): Int32Array {
  const out = borrowInts(count);
  for (let g = 0; g < count; g++) out[g] = g;
  return out;
}

/** widths[g] = distinct[g + 1] - distinct[g] for g < count. */
function gapWidths(distinct: Float64Array, count: number, widths: Float64Array): void {
  for (let g = 0; g < count; g++) widths[g] = distinct[g + 1] - distinct[g];
}

/** How many of the first `count` gaps are wider than `threshold`. */
function gapsWiderThan(distinct: Float64Array, count: number, threshold: number): number {
  let above = 0;
  for (let g = 0; g < count; g++) if (distinct[g + 1] - distinct[g] > threshold) above++;
  return above;
}

/** Writes to `out`, ascending, every gap wider than `threshold` and the first `ties` gaps equal to it. */
function pickGaps(distinct: Float64Array, count: number, threshold: number, ties: number, out: Int32Array): void {
  let left = ties;
  let w = 0;
  for (let g = 0; g < count; g++) {
    const width = distinct[g + 1] - distinct[g];
    if (width > threshold || (width === threshold && left-- > 0)) out[w++] = g;
  }
}

/**
 * Copies the values an input's grid is built from into `out` and returns how many: every row
 * when there are at most `max`, else `max - 2` rows at an even stride plus the smallest and the
 * largest value. Large files have gaps far narrower than any swing, so the sample loses nothing
 * the figure could show and saves sorting millions of values.
 */
function gridSample(column: Float64Array, n: number, max: number, out: Float64Array): number {
  if (n <= max) {
    out.set(column.subarray(0, n));
    return n;
  }
  const [lo, hi] = range(column, n);
  const strided = max - 2;
  out[strided] = lo;
  out[strided + 1] = hi;
  stridedSample(column, n, strided, out);
  return max;
}

/** out[t] = column[floor(t n / count)] for t = 0 .. count-1. */
function stridedSample(column: Float64Array, n: number, count: number, out: Float64Array): void {
  for (let t = 0; t < count; t++) out[t] = column[Math.floor((t * n) / count)];
}

/**
 * Indices of at most `count` points (ascending, distinct) spread evenly, always keeping `keep`:
 * every index when `length <= count`, else the indices in `keep` plus round(t (length - 1) /
 * (slots - 1)) for t = 0 .. slots - 1, slots = max(2, count - (distinct indices kept)).
 */
function thinIndices(length: number, count: number, keep: readonly number[]): number[] {
  if (length <= count) return Array.from({ length }, (_, i) => i);
  const kept = [...new Set(keep.filter((i) => i >= 0 && i < length))].sort((a, b) => a - b);
  const slots = Math.max(2, count - kept.length);
  // The even indices rise by more than 1 each (length - 1 >= slots), so they are distinct and ascending.
  const even = evenIndices(length, slots);
  return withKept(even, kept);
}

/** round(t (length - 1) / (slots - 1)) for t = 0 .. slots - 1 (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function evenIndices(length: number, slots: number): number[] {
  const out = new Array<number>(slots);
  for (let t = 0; t < slots; t++) out[t] = Math.round((t * (length - 1)) / (slots - 1));
  return out;
}

/** The ascending distinct union of the ascending distinct `even` and the few ascending distinct `kept`. */
function withKept(even: number[], kept: readonly number[]): number[] {
  const out: number[] = [];
  let k = 0;
  for (const i of even) {
    while (k < kept.length && kept[k] < i) out.push(kept[k++]);
    if (k < kept.length && kept[k] === i) k++;
    out.push(i);
  }
  while (k < kept.length) out.push(kept[k++]);
  return out;
}

/**
 * Predictions along input c with every other input fixed, as a function of that input's values:
 * terms that do not read input c add the same amount at every point, so they are evaluated once
 * (at the fixed values) and only the terms that read c are filled per point. A model whose every
 * term reads c is predicted with its whole design, as {@link predictRows} does.
 *
 * @param design the fitted design
 * @param coefficients fitted coefficients (length p)
 * @param c index of the varying input in `design.inputs`
 * @param fixed value of every input (entry c is ignored)
 * @returns predict(xs, out): predictions at the points xs of input c, written to `out` when given
 *   (all zeros, of length xs.length)
 */
function predictorAlong(
  design: Design,
  coefficients: ArrayLike<number>,
  c: number,
  fixed: readonly number[],
): (xs: Float64Array, out?: Float64Array) => Float64Array {
  const name = design.inputs[c];
  const varying = design.terms.map((t) => t.inputs.includes(name));
  // Column c is `xs` itself; only the other inputs get a column of their fixed value.
  const columnsAt = (xs: Float64Array): Float64Array[] =>
    design.inputs.map((_, k) => (k === c ? xs : new Float64Array(xs.length).fill(fixed[k])));
  if (readByEveryTerm(design, c)) {
    // One polynomial term: the predictions in one pass, without a design block (the same bits).
    const polynomial = polynomialPredictor(design, coefficients);
    if (polynomial !== null) return (xs, out) => polynomial(xs, out ?? new Float64Array(xs.length));
    return (xs, out) => predictRows(design, { inputs: columnsAt(xs), rows: xs.length }, coefficients, out);
  }
  // The fixed part: intercept plus every term that does not read input c, at the fixed values.
  const row = design.fill(columnsAt(Float64Array.of(fixed[c])), 0, 1);
  let base = design.intercept ? coefficients[0] : 0;
  const sub: number[] = [];
  design.terms.forEach((t, i) => {
    const first = design.termOffsets[i];
    const width = t.columnNames.length;
    for (let j = first; j < first + width; j++) {
      if (varying[i]) sub.push(coefficients[j]);
      else base += row[j] * coefficients[j];
    }
  });
  const partial = createDesign(
    design.terms.filter((_, i) => varying[i]),
    false,
  );
  const fixedByName = new Map(design.inputs.map((input, k) => [input, fixed[k]]));
  return (xs, out) => {
    const columns = partial.inputs.map((input) =>
      input === name ? xs : new Float64Array(xs.length).fill(fixedByName.get(input) ?? Number.NaN),
    );
    const pred = predictRows(partial, { inputs: columns, rows: xs.length }, sub, out);
    for (let i = 0; i < pred.length; i++) pred[i] += base;
    return pred;
  };
}

/** True when every term of the design reads input c (its predictions along c take the whole design). */
function readByEveryTerm(design: Design, c: number): boolean {
  const name = design.inputs[c];
  return design.terms.every((t) => t.inputs.includes(name));
}

/**
 * Where the points of `bx` fall when the ascending point sets `ax` and `bx` are merged as a stable
 * sort by x gives (a point of `ax` before an equal one of `bx`): place[b] is bx[b]'s index in the
 * merged order, ascending. The merged order is never built: the curve reads its few kept points
 * through {@link mergedValues}.
 */
function mergedPlaces(ax: Float64Array, bx: Float64Array): Int32Array {
  const place = new Int32Array(bx.length);
  let a = 0;
  for (let b = 0; b < bx.length; b++) {
    a = firstAfter(ax, a, bx[b]);
    place[b] = a + b;
  }
  return place;
}

/**
 * The first index i >= from of the ascending xs (any NaN at its end) with !(xs[i] <= v), or
 * xs.length: how far a merge takes xs before v. Binary search (xs[i] <= v holds for a prefix).
 */
function firstAfter(xs: Float64Array, from: number, v: number): number {
  let lo = from;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (xs[mid] <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The values at the merged indices `indices` (ascending) of `a` and `b` merged with `b` at `place` (see {@link mergedPlaces}). */
function mergedValues(a: Float64Array, b: Float64Array, place: Int32Array, indices: readonly number[]): number[] {
  const out = new Array<number>(indices.length);
  let k = 0;
  for (let q = 0; q < indices.length; q++) {
    const i = indices[q];
    while (k < place.length && place[k] < i) k++;
    out[q] = k < place.length && place[k] === i ? b[k] : a[i - k];
  }
  return out;
}

/**
 * [merged index of the smallest, of the largest] value of `a` and `b` merged with `b` at `place`
 * (first of equals, as a scan of the merged values in order keeps the first; a NaN first value is
 * kept, since nothing compares below or above it); [0, 0] when both are empty.
 */
function mergedExtremes(a: Float64Array, b: Float64Array, place: Int32Array): [number, number] {
  const total = a.length + b.length;
  if (total === 0) return [0, 0];
  const first = place.length > 0 && place[0] === 0 ? b[0] : a[0];
  const best = { min: first, max: first, imin: 0, imax: 0 };
  // The merged order: runs of `a` between the points of `b`.
  let from = 0;
  for (let k = 0; k <= place.length; k++) {
    const to = k < place.length ? place[k] - k : a.length;
    extremesOfRun(a, from, to, k, best);
    if (k < place.length) extremesOfRun(b, k, k + 1, place[k] - k, best);
    from = to;
  }
  return [best.imin, best.imax];
}

/** Updates `best` over values[from..to), whose merged index is the index plus `shift` (one loop). */
function extremesOfRun(
  values: Float64Array,
  from: number,
  to: number,
  shift: number,
  best: { min: number; max: number; imin: number; imax: number },
): void {
  let { min, max, imin, imax } = best;
  for (let i = from; i < to; i++) {
    const v = values[i];
    if (v < min) {
      min = v;
      imin = i + shift;
    }
    if (v > max) {
      max = v;
      imax = i + shift;
    }
  }
  best.min = min;
  best.max = max;
  best.imin = imin;
  best.imax = imax;
}

/** v[i] = g^-1(v[i]) for i < m (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function backTransformInPlace(v: Float64Array, m: number, kind: TargetTransformKind): void {
  for (let i = 0; i < m; i++) v[i] = inverseTarget(kind, v[i]);
}

/** Excursion of one prediction: max(0, v - hi, lo - v) / (hi - lo); Infinity for NaN. */
function pointExcursion(v: number, lo: number, hi: number): number {
  return Number.isNaN(v) ? Infinity : Math.max(0, v - hi, lo - v) / (hi - lo);
}

/**
 * The first index of pred[0..m) with the largest {@link pointExcursion}; 0 when none is larger than
 * -Infinity. The excursion is divided by the band's width only for a point whose distance outside
 * the band (Infinity for NaN) is above every earlier one's: division by the width never lowers
 * an order, so no other point can have a larger excursion.
 */
function worstExcursionIndex(pred: Float64Array, m: number, lo: number, hi: number): number {
  let value = -Infinity;
  let index = 0;
  let farthest = -Infinity;
  for (let i = 0; i < m; i++) {
    const v = pred[i];
    const above = v - hi;
    const below = lo - v;
    const distance = Number.isNaN(v) ? Infinity : Math.max(0, above, below);
    if (distance > farthest) {
      farthest = distance;
      const e = pointExcursion(v, lo, hi);
      if (e > value) {
        value = e;
        index = i;
      }
    }
  }
  return index;
}

/**
 * What {@link scanCurve} finds in one pass over a curve's predictions, by index:
 * [worst, variation, min, imin, max, imax] (see {@link scanCurve}; the variation is stored by its caller).
 */
const SCAN_WORST = 0;
const SCAN_VARIATION = 1;
const SCAN_MIN = 2;
const SCAN_IMIN = 3;
const SCAN_MAX = 4;
const SCAN_IMAX = 5;

/**
 * One pass over pred[0..m) (m >= 1) for three figures the inside grid needs, each as its own loop
 * gives it: into[0] the index of {@link worstExcursionIndex}, the {@link totalVariation} (the same
 * additions in the same order; returned), and into[2..6) the smallest and largest value with the
 * index of the first of each, as {@link extremesOfRun} finds them from pred[0] (a NaN pred[0]
 * stays both, at index 0). `into` is written where a figure changes, so that nothing but the
 * return follows the loop (see DEVELOPERS.md, "Writing hot loops").
 */
function scanCurve(pred: Float64Array, m: number, lo: number, hi: number, into: Float64Array): number {
  let value = -Infinity;
  let farthest = -Infinity;
  let variation = 0;
  let previous = pred[0];
  let min = previous;
  let max = previous;
  into[SCAN_WORST] = 0;
  into[SCAN_MIN] = min;
  into[SCAN_IMIN] = 0;
  into[SCAN_MAX] = max;
  into[SCAN_IMAX] = 0;
  for (let i = 0; i < m; i++) {
    const v = pred[i];
    const above = v - hi;
    const below = lo - v;
    const distance = Number.isNaN(v) ? Infinity : Math.max(0, above, below);
    if (distance > farthest) {
      farthest = distance;
      const e = pointExcursion(v, lo, hi);
      if (e > value) {
        value = e;
        into[SCAN_WORST] = i;
      }
    }
    if (i > 0) variation += Math.abs(v - previous);
    previous = v;
    if (v < min) {
      min = v;
      into[SCAN_MIN] = v;
      into[SCAN_IMIN] = i;
    }
    if (v > max) {
      max = v;
      into[SCAN_MAX] = v;
      into[SCAN_IMAX] = i;
    }
  }
  return variation;
}

/**
 * {@link mergedExtremes} of the inside predictions `a` and the margin predictions `b` from the
 * extremes {@link scanCurve} found over `a` (`scan`) and a short scan of `b`: the first extreme of
 * each run, then of the two the more extreme value, the earlier in the merged order on a tie.
 * Null when the plain scan must decide (a run that is empty or starts with a NaN).
 */
function extremesFromScan(a: Float64Array, b: Float64Array, place: Int32Array, scan: Float64Array): [number, number] | null {
  if (a.length === 0 || Number.isNaN(a[0])) return null;
  if (b.length === 0) return [scan[SCAN_IMIN], scan[SCAN_IMAX]];
  if (Number.isNaN(b[0])) return null;
  const best = { min: b[0], max: b[0], imin: 0, imax: 0 };
  extremesOfRun(b, 0, b.length, 0, best);
  // The merged index of a[i]: i plus the margin points before it (place[k] - k of them are inside points).
  const iminA = scan[SCAN_IMIN] + marginPointsBefore(place, scan[SCAN_IMIN]);
  const imaxA = scan[SCAN_IMAX] + marginPointsBefore(place, scan[SCAN_IMAX]);
  const minA = scan[SCAN_MIN];
  const maxA = scan[SCAN_MAX];
  const iminB = place[best.imin];
  const imaxB = place[best.imax];
  const imin = best.min < minA || (!(minA < best.min) && iminB < iminA) ? iminB : iminA;
  const imax = best.max > maxA || (!(maxA > best.max) && imaxB < imaxA) ? imaxB : imaxA;
  return [imin, imax];
}

/** How many points of `b` come before a[i] in the merge of {@link mergedPlaces} (place[k] - k <= i). */
function marginPointsBefore(place: Int32Array, i: number): number {
  let count = 0;
  for (let k = 0; k < place.length; k++) if (place[k] - k <= i) count++;
  return count;
}

/** One input's scan: its grid inside the training range and in the margins. */
export interface SwingGrid {
  /** Index of the input in `design.inputs`. */
  input: number;
  /** Points inside the range and in the margins, each ascending. */
  inside: Float64Array;
  beyond: Float64Array;
  /**
   * True when `inside` is {@link inputGrid} of every training value of the input with the default
   * sizes (no row sample, no transformed scale): the points the spike figure scans
   * (diagnostics/spikes.ts), which then takes the predictions there from {@link scoreSwing}.
   */
  whole?: boolean;
  /**
   * With `whole`: the input's distinct training values, ascending (of `===` equals the first in
   * the order of the built-in sort, -0 before +0), from which the grid was built.
   */
  distinct?: Float64Array;
  /**
   * With `distinct`, when the sort gave them (diagnostics/sorted-slots.ts): slots[r] is the index
   * in `distinct` of training row r's value (equal to `===`); absent otherwise.
   */
  slots?: Int32Array;
}

/**
 * Everything the swing scan needs that does not depend on the coefficients: the target band, the
 * input medians, each input's grid and the neighbour segments. Plain data (typed arrays, numbers),
 * so it can be built on another thread while the model is fitted.
 */
export interface SwingPlan {
  band: [number, number];
  medians: number[];
  grids: SwingGrid[];
  /** Points on the neighbour segments, one column per input (several inputs only). */
  segmentColumns: Float64Array[] | null;
  segments: Swing['segments'];
  margin: number;
  maxCurvePoints: number;
  /** Curves kept (those of the first grids). */
  maxCurves: number;
  /** {@link SwingOptions.backTransform}, or absent. */
  backTransform?: TargetTransformKind;
  /**
   * The grids' arrays lent by core/scratch.ts ({@link measureSwing} gives them back once the plan
   * is scored: nothing in the {@link Swing} or the {@link InsideCurve}s reads them); default none.
   */
  lent?: Float64Array[];
}

/**
 * The inputs of the sampled rows, each divided by its standard deviation over them after taking
 * off their mean (0 for an input without spread), row-major: flat[a * d + c] for the neighbour
 * search.
 */
function scaledRows(inputs: readonly Float64Array[], rows: Int32Array): Float64Array {
  const s = rows.length;
  const d = inputs.length;
  const flat = new Float64Array(s * d);
  const v = new Float64Array(s);
  for (let c = 0; c < d; c++) {
    const col = inputs[c];
    for (let a = 0; a < s; a++) v[a] = col[rows[a]];
    let mean = 0;
    for (let a = 0; a < s; a++) mean += v[a] / s;
    let ss = 0;
    for (let a = 0; a < s; a++) ss += (v[a] - mean) * (v[a] - mean);
    const sd = Math.sqrt(ss / s);
    for (let a = 0; a < s; a++) flat[a * d + c] = sd > 0 ? (v[a] - mean) / sd : 0;
  }
  return flat;
}

/** `perSegment` evenly spaced points strictly inside each segment between a row and its neighbour, one column per input. */
function segmentPoints(inputs: readonly Float64Array[], pairs: Int32Array, perSegment: number): Float64Array[] {
  const d = inputs.length;
  const segmentsCount = pairs.length / 2;
  const m = segmentsCount * perSegment;
  const columns = inputs.map(() => new Float64Array(m));
  for (let c = 0; c < d; c++) segmentsAlong(inputs[c], pairs, segmentsCount, perSegment, columns[c]);
  return columns;
}

/** One input's points inside every segment (pairs[2q] to pairs[2q + 1]), `perSegment` each, into `out`. */
function segmentsAlong(col: Float64Array, pairs: Int32Array, segmentsCount: number, perSegment: number, out: Float64Array): void {
  for (let q = 0; q < segmentsCount; q++) {
    const from = col[pairs[2 * q]];
    const to = col[pairs[2 * q + 1]];
    for (let t = 1; t <= perSegment; t++) out[q * perSegment + t - 1] = from + (t / (perSegment + 1)) * (to - from);
  }
}

/**
 * The coefficient-independent part of {@link measureSwing}: band, medians, grids and segments.
 *
 * @param design the model's design (only its inputs are read)
 * @param train training rows (inputs in `design.inputs` order)
 * @param options grid sizes (see {@link SwingOptions})
 */
export function planSwing(design: Design, train: Rows, options: SwingOptions = {}): SwingPlan {
  const n = train.rows;
  const d = design.inputs.length;
  const [ylo, yhi] = range(train.y, n);
  // One scratch buffer for every input: selection for the medians, then a typed sort for the
  // grid; a second one for the sort's and the widest gaps' work. Both are lent (core/scratch.ts)
  // and given back after the loop (nothing kept in the plan reads them; should the loop throw,
  // they are dropped as new arrays would be).
  const scratch = borrowDoubles(n);
  const work = borrowDoubles(n);
  // An input whose every row is sorted below takes its median from the sorted values; the
  // others (categories, samples, transformed scales) by selection after the loop.
  const medians: number[] = train.inputs.map(() => Number.NaN);
  const fromSorted: boolean[] = train.inputs.map(() => false);
  const radixScratch = new Uint32Array(work.buffer, work.byteOffset, 2 * n);
  const grids: SwingGrid[] = [];
  const lent: Float64Array[] = [];
  const gridOptions: SwingOptions = { ...options, maxGaps: Math.ceil((options.maxGaps ?? SWING_DEFAULTS.maxGaps) / Math.max(1, d)) };
  for (let c = 0; c < d; c++) {
    // A category input takes only its level codes: scanned level by level, no margins.
    const discrete = design.terms.find((t) => t.discreteValues !== undefined && t.inputs.includes(design.inputs[c]))?.discreteValues;
    if (discrete !== undefined) {
      if (discrete.length >= 2) grids.push({ input: c, inside: Float64Array.from(discrete), beyond: new Float64Array(0) });
      continue;
    }
    const maxGridRows = options.maxGridRows ?? SWING_DEFAULTS.maxGridRows;
    // An input every term reads on one transformed scale (log x ...) is scanned on that scale.
    const onScale = inputScaleOf(design, c);
    // Every row on the input's own scale: one sort gives the sorted values and each row's slot
    // among the distinct values (for the spike figure); else (or when that sort declines) a copy
    // of the rows (or of a sample of them) sorted.
    let slots: Int32Array | null = n >= 2 && n <= maxGridRows && onScale === null ? new Int32Array(n) : null;
    let len = n;
    if (slots === null || !sortWithSlots(train.inputs[c], n, scratch, slots)) {
      slots = null;
      len = gridSample(train.inputs[c], n, maxGridRows, scratch);
      if (onScale !== null) for (let i = 0; i < len; i++) scratch[i] = onScale.forward(scratch[i]);
      sortFloat64(scratch.subarray(0, len), radixScratch);
    }
    const sample = scratch.subarray(0, len);
    if (len === n && n > 0 && onScale === null) {
      medians[c] = medianOfSorted(train.inputs[c], n, sample, work);
      fromSorted[c] = true;
    }
    const grid = gridFromSorted(sample, len, gridOptions, work.subarray(0, len));
    if (onScale !== null) {
      const onInput = grid.inside.map(onScale.inverse);
      returnDoubles(grid.inside);
      grid.inside = onInput;
      grid.beyond = grid.beyond.map(onScale.inverse);
    } else lent.push(grid.inside);
    const whole = len === n && onScale === null && defaultInsideGrid(options, gridOptions, grid.gaps);
    if (grid.inside.length > 0) {
      const beyond = admitted(design, c, grid.beyond);
      // The grid packed the distinct values to the front of the sorted sample (every row here).
      grids.push(
        whole
          ? { input: c, inside: grid.inside, beyond, whole, distinct: sample.slice(0, grid.gaps + 1), ...(slots !== null ? { slots } : {}) }
          : { input: c, inside: grid.inside, beyond, whole },
      );
    }
  }
  for (let c = 0; c < medians.length; c++) if (!fromSorted[c]) medians[c] = columnMedian(train.inputs[c], n, scratch);
  returnDoubles(work);
  returnDoubles(scratch);

  // Several inputs: segments between sampled rows and their nearest neighbours.
  let segments: Swing['segments'] = null;
  let segmentColumns: Float64Array[] | null = null;
  if (d >= 2 && n >= 2) {
    const maxRows = options.maxRows ?? SWING_DEFAULTS.maxRows;
    const kNear = options.neighbours ?? SWING_DEFAULTS.neighbours;
    const perSegment = options.segmentPoints ?? SWING_DEFAULTS.segmentPoints;
    const s = Math.min(n, maxRows);
    const rows = Int32Array.from({ length: s }, (_, t) => Math.floor((t * n) / s));
    const flat = scaledRows(train.inputs, rows);
    const kk = Math.min(kNear, s - 1);
    const pairs = nearestPairs(flat, s, d, kk, rows);
    if (pairs.length > 0 && perSegment > 0) segmentColumns = admittedRows(design, segmentPoints(train.inputs, pairs, perSegment));
    segments = { rows: s, neighbours: kk, pointsPerSegment: perSegment };
  }
  const maxCurves = options.maxCurves ?? SWING_DEFAULTS.maxCurves;
  const fullCurvePoints = Math.max(
    SWING_MIN_CURVE_POINTS,
    Math.min(SWING_DEFAULTS.maxCurvePoints, Math.floor(SWING_CURVE_NUMBERS / Math.max(1, Math.min(d, maxCurves)))),
  );
  const share = options.curveShare ?? 1;
  const maxCurvePoints =
    options.maxCurvePoints ?? (share >= 1 ? fullCurvePoints : Math.max(SWING_SHARED_MIN_CURVE_POINTS, Math.floor(fullCurvePoints * share)));
  const back = options.backTransform;
  return {
    band: back === undefined ? [ylo, yhi] : [inverseTarget(back, ylo), inverseTarget(back, yhi)],
    medians,
    grids,
    segmentColumns,
    segments,
    margin: options.margin ?? SWING_DEFAULTS.margin,
    maxCurvePoints,
    maxCurves,
    ...(back !== undefined ? { backTransform: back } : {}),
    lent,
  };
}

/**
 * True when a grid of `gaps` gaps built with `gridOptions` (the share of the gaps of one input)
 * holds the same inside points as {@link inputGrid} with the default sizes: the same points per
 * gap and uniform points, and either the same number of gaps kept or every gap kept by both.
 */
function defaultInsideGrid(options: SwingOptions, gridOptions: SwingOptions, gaps: number): boolean {
  const maxGaps = gridOptions.maxGaps ?? SWING_DEFAULTS.maxGaps;
  return (
    (options.perGap ?? SWING_DEFAULTS.perGap) === SWING_DEFAULTS.perGap &&
    (options.uniform ?? SWING_DEFAULTS.uniform) === SWING_DEFAULTS.uniform &&
    (maxGaps === SWING_DEFAULTS.maxGaps || gaps <= Math.min(maxGaps, SWING_DEFAULTS.maxGaps))
  );
}

/** The points (rows of `columns`) at which every term is defined: a segment between two levels of a category has no levels between them. */
function admittedRows(design: Design, columns: Float64Array[]): Float64Array[] {
  const checks = design.terms.filter((t) => t.admits !== undefined);
  if (checks.length === 0 || columns.length === 0) return columns;
  const keep: number[] = [];
  for (let i = 0; i < columns[0].length; i++) {
    if (checks.every((t) => t.inputs.every((name) => t.admits?.(name, columns[design.inputs.indexOf(name)][i]) ?? true))) keep.push(i);
  }
  return columns.map((col) => Float64Array.from(keep, (i) => col[i]));
}

/** The transformed scale every term reading input c shares, or null (no transform, or different ones). */
function inputScaleOf(design: Design, c: number): NonNullable<Term['inputScale']> | null {
  const name = design.inputs[c];
  const readers = design.terms.filter((t) => t.inputs.includes(name));
  const first = readers[0]?.inputScale;
  if (first === undefined || !readers.every((t) => t.inputScale?.name === first.name)) return null;
  return first;
}

/** The margin points every term reading input c is defined at (e.g. no x <= 0 under `transform: log`). */
function admitted(design: Design, c: number, points: Float64Array): Float64Array {
  const name = design.inputs[c];
  const checks = design.terms.filter((t) => t.admits !== undefined && t.inputs.includes(name));
  if (checks.length === 0) return points;
  return points.filter((v) => checks.every((t) => t.admits?.(name, v) ?? true));
}

/**
 * Total variation of a sampled curve: sum |v[k+1] - v[k]| over its first m values (Jordan 1881;
 * of a sampled curve, the sum of absolute increments). One loop (see DEVELOPERS.md, "Writing hot
 * loops").
 * @param v the curve's values in order
 * @param m values read (m <= v.length)
 */
export function totalVariation(v: Float64Array, m: number): number {
  let s = 0;
  for (let k = 1; k < m; k++) s += Math.abs(v[k] - v[k - 1]);
  return s;
}

/**
 * The curve of predictions along one input at the points of its whole grid
 * ({@link SwingGrid.whole}), the other inputs at their training medians, predicted with the whole
 * design: what the spike figure measures along that input (diagnostics/spikes.ts), kept as its
 * length and total variation so that it is computed once (the predictions themselves are not kept).
 */
export interface InsideCurve {
  /** Index of the input in `design.inputs`. */
  input: number;
  /** Points of the grid (inside the range, ascending). */
  points: number;
  /**
   * {@link totalVariation} of the predictions at the grid's points in ascending order,
   * back-transformed under `backTransform`.
   */
  variation: number;
  /** The plan's {@link SwingPlan.backTransform}, or absent. */
  backTransform?: TargetTransformKind;
  /** The input's distinct training values, ascending ({@link SwingGrid.distinct}), or absent. */
  distinct?: Float64Array;
  /** With `distinct`: each training row's slot in it ({@link SwingGrid.slots}), or absent. */
  slots?: Int32Array;
}

/**
 * Scores a {@link SwingPlan} under the fitted coefficients: the swing figures and curves.
 *
 * @param plan from {@link planSwing} on the same design and rows
 * @param design the fitted design
 * @param coefficients fitted coefficients (length p)
 * @param insideCurves when given, receives an {@link InsideCurve} for every whole grid predicted
 *   with the whole design (an input every term reads); default none
 */
export function scoreSwing(plan: SwingPlan, design: Design, coefficients: ArrayLike<number>, insideCurves?: InsideCurve[]): Swing {
  const [ylo, yhi] = plan.band;
  const { medians, maxCurvePoints } = plan;
  let inside = 0;
  let beyond = 0;
  let insideCount = 0;
  let beyondCount = 0;
  let worstInside: SwingPoint | null = null;
  let worstBeyond: SwingPoint | null = null;
  const pointAt = (columns: Float64Array[], i: number, prediction: number): SwingPoint => {
    // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
    const inputs: Record<string, number> = Object.create(null);
    design.inputs.forEach((name, c) => (inputs[name] = columns[c][i]));
    return { inputs, prediction };
  };
  /**
   * Scores points (predicted here unless their predictions are given); returns the predictions.
   * With `scan`, the worst point comes from {@link scanCurve}, which fills `scan` too.
   */
  const score = (
    columns: Float64Array[],
    m: number,
    where: 'inside' | 'beyond',
    given?: Float64Array,
    scan?: Float64Array,
  ): Float64Array => {
    const pred = given ?? predictRows(design, { inputs: columns, rows: m }, coefficients);
    if (plan.backTransform !== undefined) backTransformInPlace(pred, m, plan.backTransform);
    if (m > 0) {
      let index: number;
      if (scan !== undefined) {
        scan[SCAN_VARIATION] = scanCurve(pred, m, ylo, yhi, scan);
        index = scan[SCAN_WORST];
      } else index = worstExcursionIndex(pred, m, ylo, yhi);
      const value = pointExcursion(pred[index], ylo, yhi);
      if (where === 'inside') {
        if (worstInside === null || value > inside) {
          inside = Math.max(inside, value);
          worstInside = pointAt(columns, index, pred[index]);
        }
      } else if (worstBeyond === null || value > beyond) {
        beyond = Math.max(beyond, value);
        worstBeyond = pointAt(columns, index, pred[index]);
      }
    }
    if (where === 'inside') insideCount += m;
    else beyondCount += m;
    return pred;
  };

  // Along each input, the others at their medians (one reused column of each median).
  const constants: Float64Array[] = medians.map(() => new Float64Array(0));
  const constant = (k: number, length: number): Float64Array => {
    if (constants[k].length < length) constants[k] = new Float64Array(length).fill(medians[k]);
    return constants[k].subarray(0, length);
  };
  const curves: SwingCurve[] = [];
  const scan = new Float64Array(6);
  for (const grid of plan.grids) {
    checkDeadline('swing scan');
    const c = grid.input;
    const along = (xs: Float64Array): Float64Array[] => design.inputs.map((_, k) => (k === c ? xs : constant(k, xs.length)));
    const predict = predictorAlong(design, coefficients, c, medians);
    // The inside predictions are lent (core/scratch.ts) and given back before the next input:
    // only figures and copies of them are kept.
    // One pass over the inside predictions finds the worst point, the variation and the extremes.
    const pin = score(along(grid.inside), grid.inside.length, 'inside', predict(grid.inside, borrowDoubles(grid.inside.length)), scan);
    const pout = score(along(grid.beyond), grid.beyond.length, 'beyond', predict(grid.beyond));
    if (insideCurves !== undefined && grid.whole === true && readByEveryTerm(design, c)) {
      insideCurves.push({
        input: c,
        points: pin.length,
        variation: pin.length > 0 ? scan[SCAN_VARIATION] : 0,
        ...(plan.backTransform !== undefined ? { backTransform: plan.backTransform } : {}),
        ...(grid.distinct !== undefined ? { distinct: grid.distinct } : {}),
        ...(grid.distinct !== undefined && grid.slots !== undefined ? { slots: grid.slots } : {}),
      });
    }
    if (curves.length >= plan.maxCurves) {
      returnDoubles(pin);
      continue;
    }
    // Curve for charts: all points ascending (inside and margins merged), thinned with the
    // extremes kept; only the kept points are read out of the merged order.
    const place = mergedPlaces(grid.inside, grid.beyond);
    const [imin, imax] = extremesFromScan(pin, pout, place, scan) ?? mergedExtremes(pin, pout, place);
    const keep = thinIndices(grid.inside.length + grid.beyond.length, maxCurvePoints, [imax, imin]);
    const others: Record<string, number> = Object.create(null);
    design.inputs.forEach((name, k) => {
      if (k !== c) others[name] = medians[k];
    });
    curves.push({
      input: design.inputs[c],
      others,
      range: [grid.inside[0], grid.inside[grid.inside.length - 1]],
      x: mergedValues(grid.inside, grid.beyond, place, keep),
      prediction: mergedValues(pin, pout, place, keep),
    });
    returnDoubles(pin);
  }
  if (plan.segmentColumns !== null) score(plan.segmentColumns, plan.segmentColumns[0].length, 'inside');

  const valid = ylo < yhi;
  return {
    inside: valid && insideCount > 0 ? inside : Number.NaN,
    beyond: valid && beyondCount > 0 ? beyond : Number.NaN,
    band: [ylo, yhi],
    points: { inside: insideCount, beyond: beyondCount },
    worstInside,
    worstBeyond,
    curves,
    segments: plan.segments,
    margin: plan.margin,
  };
}

/**
 * Measures swing between and beyond samples for a fitted model: {@link planSwing}, then
 * {@link scoreSwing}.
 *
 * One input: a dense grid across the training range ({@link inputGrid}). Several inputs: (a) the
 * same grid along each input with the other inputs at their training medians, and (b) points on
 * the segments between each of up to `maxRows` sampled training rows (an even stride through the
 * file) and its `neighbours` nearest sampled rows (Euclidean distance on inputs divided by their
 * standard deviations). Margins are along each input. The figure is {@link excursion} against the
 * band of training targets.
 *
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order)
 * @param coefficients fitted coefficients (length p)
 * @param options grid sizes (see {@link SwingOptions})
 * @param insideCurves as in {@link scoreSwing}; default none
 */
export function measureSwing(
  design: Design,
  train: Rows,
  coefficients: ArrayLike<number>,
  options: SwingOptions = {},
  insideCurves?: InsideCurve[],
): Swing {
  const plan = planSwing(design, train, options);
  try {
    return scoreSwing(plan, design, coefficients, insideCurves);
  } finally {
    for (const array of plan.lent ?? []) returnDoubles(array);
  }
}
