/**
 * Spikes inside the band: how much more a model's curve goes up and down between the training
 * samples than the training targets themselves do. The `swing` figure only sees predictions that
 * leave the band [min y, max y]; narrow radial bumps over an intercept jump to each sample and
 * fall back between them without ever leaving it. Their curve's total variation, though, is many
 * times the targets' own.
 *
 * For each input with at least two distinct training values, the other inputs at their training
 * medians (as the swing curves):
 * - curve variation TV_f = sum_k |f(g_(k+1)) - f(g_k)| over the swing grid g inside the training
 *   range (201 even points plus 8 in each gap between neighbouring distinct values: the points
 *   `swing` scans; see {@link inputGrid});
 * - data variation TV_y = sum_j |ybar_(j+1) - ybar_j| over the input's distinct training values in
 *   ascending order, ybar_j the mean target (weighted: sum w y / sum w) of the rows at the j-th value (above 20,000 rows, those
 *   of an even-stride sample of 20,000 rows);
 * - ratio TV_f / TV_y.
 * The figure is the largest ratio over the inputs. A curve that passes through every sample has
 * TV_f >= TV_y (a ratio of at least 1); a smooth fit of noisy data is far below 1 (the noise adds to
 * TV_y, not to TV_f); bumps that fall back between the samples add about twice their height each.
 * Total variation of a function: Jordan 1881; of a sampled curve, the sum of absolute increments.
 */
import type { Design } from '../design/design-matrix.js';
import { predictRows } from '../design/blocks.js';
import { columnMedian } from './column-median.js';
import type { Rows } from './cross-validation.js';
import { inputGrid, totalVariation, type InsideCurve } from './swing.js';
import { inverseTarget, type TargetTransformKind } from '../data/target-transform.js';
import { borrowDoubles, borrowInts, returnDoubles, returnInts } from '../core/scratch.js';

/** One input's figures. */
export interface SpikeFigures {
  input: string;
  curveVariation: number;
  dataVariation: number;
  /** curveVariation / dataVariation; NaN when the data variation is 0. */
  ratio: number;
}

/** The spike figure of a model: the worst input's ratio, and every input's figures. */
export interface Spikes {
  /** Largest ratio over the inputs; NaN when no input has two distinct values with different mean targets. */
  ratio: number;
  /** The input of the largest ratio, or null. */
  worst: string | null;
  perInput: SpikeFigures[];
}

/** Largest number of rows whose targets make up the data variation (an even-stride sample above it). */
export const SPIKE_MAX_ROWS = 20_000;

/**
 * Measures the spike figure of a fitted model.
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order; with `weights`, the data variation
 *   uses weighted means, see {@link meanTargets})
 * @param coefficients fitted coefficients (length p)
 * @param original a model fitted on t = g(y) judged on the original scale: the transform (the
 *   curve is back-transformed) and the training targets as written (the data variation is theirs);
 *   default none (the fit's own scale)
 * @param known curves along inputs that the swing scan already predicted on the same design, rows
 *   and coefficients (swing.ts {@link InsideCurve}): the length and variation of one whose back
 *   transform is that of `original` are taken instead of predicting the same points again; default none
 */
export function measureSpikes(
  design: Design,
  train: Rows & { weights?: Float64Array },
  coefficients: ArrayLike<number>,
  original?: { kind: TargetTransformKind; y: Float64Array; weights?: Float64Array },
  known: readonly InsideCurve[] = [],
): Spikes {
  const n = train.rows;
  // The medians are needed only for a curve the swing scan did not predict already.
  let medians: number[] | null = null;
  const mediansOnce = (): number[] => {
    if (medians === null) medians = train.inputs.map((col) => columnMedian(col, n));
    return medians;
  };
  const perInput: SpikeFigures[] = [];
  let ratio = Number.NaN;
  let worst: string | null = null;
  design.inputs.forEach((name, c) => {
    // Category inputs have no order between their levels: no variation along them to compare.
    if (design.terms.some((t) => t.discreteValues !== undefined && t.inputs.includes(name))) return;
    const scanned = known.find((k) => k.input === c && k.backTransform === original?.kind);
    let points: number;
    let curveVariation: number;
    if (scanned !== undefined) ({ points, variation: curveVariation } = scanned);
    else {
      const curve = curveAlong(design, train, coefficients, c, mediansOnce(), original);
      points = curve.length;
      curveVariation = totalVariation(curve, curve.length);
    }
    if (points < 2) return;
    // The swing scan sorted every row's value of this input already: its distinct values serve
    // when the data variation reads every row too (at most SPIKE_MAX_ROWS).
    const sorted = n <= SPIKE_MAX_ROWS ? known.find((k) => k.input === c && k.distinct !== undefined) : undefined;
    const dataVariation = targetVariation(
      train.inputs[c],
      original?.y ?? train.y,
      n,
      original ? original.weights : train.weights,
      sorted?.distinct,
      sorted?.slots,
    );
    const r = dataVariation > 0 ? curveVariation / dataVariation : Number.NaN;
    perInput.push({ input: name, curveVariation, dataVariation, ratio: r });
    if (!Number.isNaN(r) && (Number.isNaN(ratio) || r > ratio)) {
      ratio = r;
      worst = name;
    }
  });
  return { ratio, worst, perInput };
}

/** The predictions at the points of {@link inputGrid} inside input c's range, the other inputs at `medians` (back-transformed under `original`). */
function curveAlong(
  design: Design,
  train: Rows,
  coefficients: ArrayLike<number>,
  c: number,
  medians: readonly number[],
  original?: { kind: TargetTransformKind },
): Float64Array {
  const grid = inputGrid(train.inputs[c].subarray(0, train.rows)).inside;
  if (grid.length < 2) return new Float64Array(0);
  const columns = design.inputs.map((_, k) => (k === c ? grid : new Float64Array(grid.length).fill(medians[k])));
  const curve = predictRows(design, { inputs: columns, rows: grid.length }, coefficients);
  if (original !== undefined) for (let i = 0; i < curve.length; i++) curve[i] = inverseTarget(original.kind, curve[i]);
  return curve;
}

/** Total variation of the (weighted) mean target over the input's distinct values in ascending order. */
function targetVariation(
  x: Float64Array,
  y: Float64Array,
  n: number,
  weights?: Float64Array,
  distinct?: Float64Array,
  slots?: Int32Array,
): number {
  return slotSums(x, y, n, weights, distinct, slots, variationOfSlots);
}

/**
 * sum |means[j+1] - means[j]| over the means {@link meansOfSlots} gives, without making them: the
 * same means (sums / totals of the kept slots) and the same additions in the same order (one loop).
 */
function variationOfSlots(sorted: Float64Array, sums: Float64Array, totals: Float64Array): number {
  let s = 0;
  let previous = 0;
  let kept = 0;
  for (let j = 0; j < sorted.length; j++) {
    if (Number.isFinite(sorted[j]) && totals[j] > 0) {
      const mean = sums[j] / totals[j];
      if (kept > 0) s += Math.abs(mean - previous);
      previous = mean;
      kept++;
    }
  }
  return s;
}

/** One interval between neighbouring distinct training values where the curve spikes (see {@link spikeIntervals}). */
export interface SpikeInterval {
  /** The neighbouring distinct training values the interval runs between. */
  from: number;
  to: number;
  /** Total variation of the curve over the interval. */
  curveVariation: number;
  /** What it was compared with: max(|f(x_(j+1)) - f(x_j)|, |ybar_(j+1) - ybar_j|, TV_y / gaps). */
  allowed: number;
}

/** Most intervals {@link spikeIntervals} examines (the widest, when an input has more gaps). */
export const SPIKE_MAX_GAPS = 4000;

/** Points inside each interval at which the curve is evaluated (besides its two ends). */
export const SPIKE_POINTS_PER_GAP = 8;

/**
 * The intervals between neighbouring distinct training values of input c where the curve (the
 * other inputs at their training medians, as {@link measureSpikes}) goes up and down more than
 * `limit` times what the interval allows: TV_f over [x_j, x_(j+1)] (the curve at both ends and
 * {@link SPIKE_POINTS_PER_GAP} even points between) above
 * limit * max(|f(x_(j+1)) - f(x_j)|, |ybar_(j+1) - ybar_j|, TV_y / gaps), with ybar_j the mean
 * target at the j-th distinct value (an even-stride sample of {@link SPIKE_MAX_ROWS} rows above it)
 * and TV_y / gaps the data's mean step. A curve that only rises or only falls over the interval has
 * TV_f equal to its net change, so a steep but monotone stretch is never marked; the data's steps
 * keep a flat stretch of data from marking every small wiggle. Our own rule for the charts, in the spirit of the
 * `swing-spikes` figure (which sums the same variations over the whole range); not a published one.
 * At most {@link SPIKE_MAX_GAPS} intervals are examined (the widest). Ascending by `from`.
 *
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order)
 * @param coefficients fitted coefficients (length p)
 * @param c index of the input in `design.inputs`
 * @param limit the factor (the `swing-spikes` warning limit, else its fail limit)
 * @param original as in {@link measureSpikes}: back-transform the curve and compare with y as written
 */
export function spikeIntervals(
  design: Design,
  train: Rows & { weights?: Float64Array },
  coefficients: ArrayLike<number>,
  c: number,
  limit: number,
  original?: { kind: TargetTransformKind; y: Float64Array; weights?: Float64Array },
): SpikeInterval[] {
  const n = train.rows;
  if (!(limit > 0) || c < 0 || c >= design.inputs.length) return [];
  const { values, means } = meanTargets(train.inputs[c], original?.y ?? train.y, n, original ? original.weights : train.weights);
  const gaps = values.length - 1;
  if (gaps < 1) return [];
  let dataVariation = 0;
  for (let j = 0; j < gaps; j++) dataVariation += Math.abs(means[j + 1] - means[j]);
  const meanStep = dataVariation / gaps;
  const chosen = widestGapIndices(values, SPIKE_MAX_GAPS);
  const per = SPIKE_POINTS_PER_GAP + 2;
  const grid = new Float64Array(chosen.length * per);
  chosen.forEach((j, q) => {
    for (let t = 0; t < per; t++) grid[q * per + t] = values[j] + ((values[j + 1] - values[j]) * t) / (per - 1);
  });
  const medians = train.inputs.map((col) => columnMedian(col, n));
  const columns = design.inputs.map((_, k) => (k === c ? grid : new Float64Array(grid.length).fill(medians[k])));
  const curve = predictRows(design, { inputs: columns, rows: grid.length }, coefficients);
  if (original !== undefined) for (let i = 0; i < curve.length; i++) curve[i] = inverseTarget(original.kind, curve[i]);
  const out: SpikeInterval[] = [];
  chosen.forEach((j, q) => {
    const variation = totalVariation(curve.subarray(q * per, (q + 1) * per), per);
    const net = Math.abs(curve[(q + 1) * per - 1] - curve[q * per]);
    const allowed = Math.max(net, Math.abs(means[j + 1] - means[j]), meanStep);
    if (variation > limit * allowed) out.push({ from: values[j], to: values[j + 1], curveVariation: variation, allowed });
  });
  return out;
}

/**
 * The distinct values of x ascending (of an even-stride sample above {@link SPIKE_MAX_ROWS} rows)
 * and the mean y at each: the plain mean, or with row weights the weighted mean sum w y / sum w (a
 * value whose rows all weigh 0 is left out: it takes no part in the fit). Each value's targets are
 * summed in row order (as a stable sort of the rows by value visits them): the sampled values are
 * sorted once (a native typed-array sort), and each row finds its value's slot through equal-width
 * buckets of the range ({@link SlotBuckets}) or by binary search.
 * `distinct`, when given, must be those distinct values of every row (n <= SPIKE_MAX_ROWS), as
 * the sort and packing here make them: they are taken instead of sorting again; `slots` with
 * them, each row's index in them (swing.ts {@link InsideCurve}): the rows are summed into their
 * slots without looking their values up (the same additions). The working
 * arrays are lent (core/scratch.ts); each loop is a function of its own (see DEVELOPERS.md,
 * "Writing hot loops").
 */
function meanTargets(
  x: Float64Array,
  y: Float64Array,
  n: number,
  weights?: Float64Array,
  distinct?: Float64Array,
  slots?: Int32Array,
): { values: number[]; means: number[] } {
  return slotSums(x, y, n, weights, distinct, slots, meansOfSlots);
}

/**
 * The work of {@link meanTargets}: each slot's sum of (weighted) targets and total weight, handed
 * to `read` (sorted distinct values, sums, totals; lent arrays it must not keep), whose result is
 * returned.
 */
function slotSums<T>(
  x: Float64Array,
  y: Float64Array,
  n: number,
  weights: Float64Array | undefined,
  distinct: Float64Array | undefined,
  slots: Int32Array | undefined,
  read: (sorted: Float64Array, sums: Float64Array, totals: Float64Array) => T,
): T {
  const m = Math.min(n, SPIKE_MAX_ROWS);
  const own = distinct !== undefined && m === n ? null : borrowDoubles(m);
  try {
    let sorted: Float64Array;
    if (own === null) sorted = distinct as Float64Array;
    else {
      sampleRows(x, n, m, own);
      own.sort();
      sorted = own.subarray(0, packDistinct(own, m));
    }
    const sums = borrowDoubles(sorted.length);
    const totals = borrowDoubles(sorted.length);
    const buckets = borrowInts(sorted.length);
    try {
      if (own === null && slots !== undefined) sumInSlots(y, n, weights, slots, sums, totals);
      else sumBySlot(x, y, n, m, weights, sorted, slotBuckets(sorted, buckets), sums, totals);
      return read(sorted, sums, totals);
    } finally {
      returnInts(buckets);
      returnDoubles(totals);
      returnDoubles(sums);
    }
  } finally {
    if (own !== null) returnDoubles(own);
  }
}

/** out[t] = x[row t] for the m rows {@link meanTargets} reads: every row when m = n, else row floor(t n / m). */
function sampleRows(x: Float64Array, n: number, m: number, out: Float64Array): void {
  for (let t = 0; t < m; t++) out[t] = x[m === n ? t : Math.floor((t * n) / m)];
}

/** Packs the distinct values of the ascending a[0..n) to its front (-0 and +0 are one value, as to `===`); returns how many. */
function packDistinct(a: Float64Array, n: number): number {
  let count = 0;
  for (let i = 0; i < n; i++) if (count === 0 || a[i] !== a[count - 1]) a[count++] = a[i];
  return count;
}

/**
 * Equal-width buckets over the range of the ascending `sorted` (all finite, at least two values),
 * to find a value's slot without a binary search: bucket b of value v is
 * min(B - 1, floor((v - lo) * B / (hi - lo))), B = table.length, and table[b] the first slot whose
 * value's bucket is b or later. The bucket never falls as the value rises (each operation rounds
 * monotonically), so every slot before table[b] holds a value below every value of bucket b: the
 * slot of v is found by stepping up from table[bucket of v] (a step or two for spread values).
 */
interface SlotBuckets {
  table: Int32Array;
  lo: number;
  hi: number;
  scale: number;
}

/** {@link SlotBuckets} of `sorted` in `table` (of sorted.length entries), or null when its ends are not finite or the range has no usable width. */
function slotBuckets(sorted: Float64Array, table: Int32Array): SlotBuckets | null {
  const count = sorted.length;
  if (count < 2) return null;
  const lo = sorted[0];
  const hi = sorted[count - 1];
  const scale = count / (hi - lo);
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || !Number.isFinite(scale) || !(scale > 0)) return null;
  fillBuckets(sorted, lo, scale, table);
  return { table, lo, hi, scale };
}

/** table[b] = the first slot of `sorted` whose bucket is b or later (the last slot when none is). */
function fillBuckets(sorted: Float64Array, lo: number, scale: number, table: Int32Array): void {
  const last = table.length - 1;
  let b = 0;
  for (let j = 0; j < sorted.length; j++) {
    const bucket = Math.min(last, Math.floor((sorted[j] - lo) * scale));
    while (b <= bucket) table[b++] = j;
  }
  while (b <= last) table[b++] = sorted.length - 1;
}

/** Steps up from a value's bucket before {@link sumBySlot} goes on by binary search (values bunched into few buckets). */
const BUCKET_STEPS = 8;

/**
 * Adds each read row's target (times its weight) to sums[j] and its weight (1 without weights) to
 * totals[j], j the first slot of the ascending `sorted` not below the row's value (the last slot
 * when none is), rows in file order. The slot is found from `found` for a value in its range (at
 * most {@link BUCKET_STEPS} steps up from its bucket's first slot), then, when not yet reached,
 * by binary search above: the same slot a binary search over every slot gives.
 */
function sumBySlot(
  x: Float64Array,
  y: Float64Array,
  n: number,
  m: number,
  weights: Float64Array | undefined,
  sorted: Float64Array,
  found: SlotBuckets | null,
  sums: Float64Array,
  totals: Float64Array,
): void {
  const count = sorted.length;
  const table = found?.table;
  const last = count - 1;
  const from = found?.lo ?? Number.NaN;
  const to = found?.hi ?? Number.NaN;
  const scale = found?.scale ?? Number.NaN;
  for (let t = 0; t < m; t++) {
    const r = m === n ? t : Math.floor((t * n) / m);
    const v = x[r];
    let lo = 0;
    if (table !== undefined && v >= from && v <= to) {
      lo = table[Math.min(last, Math.floor((v - from) * scale))];
      for (let step = 0; step < BUCKET_STEPS && sorted[lo] < v; step++) lo++;
    }
    // Binary search above `lo` when its value is still below v (every slot before it is too).
    if (lo < last && sorted[lo] < v) {
      let hi = last;
      lo++;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (sorted[mid] < v) lo = mid + 1;
        else hi = mid;
      }
    }
    const w = weights === undefined ? 1 : weights[r];
    sums[lo] += weights === undefined ? y[r] : w * y[r];
    totals[lo] += w;
  }
}

/**
 * {@link sumBySlot} of every row (m = n) when each row's slot is known: slots[r] is the slot
 * sumBySlot finds for row r (the index of its value among the distinct values). The same
 * additions in the same order (rows in file order).
 */
function sumInSlots(
  y: Float64Array,
  n: number,
  weights: Float64Array | undefined,
  slots: Int32Array,
  sums: Float64Array,
  totals: Float64Array,
): void {
  for (let r = 0; r < n; r++) {
    const slot = slots[r];
    const w = weights === undefined ? 1 : weights[r];
    sums[slot] += weights === undefined ? y[r] : w * y[r];
    totals[slot] += w;
  }
}

/** The finite values of `sorted` whose total weight is above 0, and their means sums / totals. */
function meansOfSlots(sorted: Float64Array, sums: Float64Array, totals: Float64Array): { values: number[]; means: number[] } {
  const values: number[] = [];
  const means: number[] = [];
  for (let j = 0; j < sorted.length; j++) {
    if (Number.isFinite(sorted[j]) && totals[j] > 0) {
      values.push(sorted[j]);
      means.push(sums[j] / totals[j]);
    }
  }
  return { values, means };
}

/** Indices j of the at most `max` widest gaps values[j]..values[j+1], ascending. */
function widestGapIndices(values: readonly number[], max: number): number[] {
  const all = Array.from({ length: values.length - 1 }, (_, j) => j);
  if (all.length <= max) return all;
  return all
    .sort((a, b) => values[b + 1] - values[b] - (values[a + 1] - values[a]) || a - b)
    .slice(0, max)
    .sort((a, b) => a - b);
}
