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
 *   ascending order, ybar_j the mean target of the rows at the j-th value (above 20,000 rows, those
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
import { inputGrid } from './swing.js';

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
 * @param train training rows (inputs in `design.inputs` order)
 * @param coefficients fitted coefficients (length p)
 */
export function measureSpikes(design: Design, train: Rows, coefficients: ArrayLike<number>): Spikes {
  const n = train.rows;
  const medians = train.inputs.map((col) => columnMedian(col, n));
  const perInput: SpikeFigures[] = [];
  let ratio = Number.NaN;
  let worst: string | null = null;
  design.inputs.forEach((name, c) => {
    // Category inputs have no order between their levels: no variation along them to compare.
    if (design.terms.some((t) => t.discreteValues !== undefined && t.inputs.includes(name))) return;
    const grid = inputGrid(train.inputs[c].subarray(0, n)).inside;
    if (grid.length < 2) return;
    const columns = design.inputs.map((_, k) => (k === c ? grid : new Float64Array(grid.length).fill(medians[k])));
    const curve = predictRows(design, { inputs: columns, rows: grid.length }, coefficients);
    const curveVariation = totalVariation(curve, curve.length);
    const dataVariation = targetVariation(train.inputs[c], train.y, n);
    const r = dataVariation > 0 ? curveVariation / dataVariation : Number.NaN;
    perInput.push({ input: name, curveVariation, dataVariation, ratio: r });
    if (!Number.isNaN(r) && (Number.isNaN(ratio) || r > ratio)) {
      ratio = r;
      worst = name;
    }
  });
  return { ratio, worst, perInput };
}

/** sum |v[k+1] - v[k]| over the first m values (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function totalVariation(v: Float64Array, m: number): number {
  let s = 0;
  for (let k = 1; k < m; k++) s += Math.abs(v[k] - v[k - 1]);
  return s;
}

/**
 * Total variation of the mean target over the input's distinct values in ascending order. Each
 * value's targets are summed in row order (as a stable sort of the rows by value visits them):
 * the sampled values are sorted once (a native typed-array sort), and each row finds its value's
 * slot by binary search.
 */
function targetVariation(x: Float64Array, y: Float64Array, n: number): number {
  const m = Math.min(n, SPIKE_MAX_ROWS);
  const rows = new Int32Array(m);
  for (let t = 0; t < m; t++) rows[t] = m === n ? t : Math.floor((t * n) / m);
  const values = new Float64Array(m);
  for (let t = 0; t < m; t++) values[t] = x[rows[t]];
  values.sort();
  // Distinct values to the front (-0 and +0 are one value, as to `===`).
  let count = 0;
  for (let i = 0; i < m; i++) if (count === 0 || values[i] !== values[count - 1]) values[count++] = values[i];
  return variationOfMeans(x, y, rows, values, count);
}

/** Sums the targets of `rows` by value slot (in row order), then the total variation of the slot means. */
function variationOfMeans(x: Float64Array, y: Float64Array, rows: Int32Array, values: Float64Array, count: number): number {
  const sums = new Float64Array(count);
  const counts = new Float64Array(count);
  for (let t = 0; t < rows.length; t++) {
    const v = x[rows[t]];
    let lo = 0;
    let hi = count - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (values[mid] < v) lo = mid + 1;
      else hi = mid;
    }
    sums[lo] += y[rows[t]];
    counts[lo] += 1;
  }
  for (let j = 0; j < count; j++) sums[j] /= counts[j];
  return totalVariation(sums, count);
}
