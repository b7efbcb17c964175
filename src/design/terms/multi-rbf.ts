/**
 * `rbf: { of: [x_1, .., x_k], centers, width }`: isotropic Gaussian radial basis functions on the
 * standardised inputs z_i = (x_i - mean_i) / sd_i (training mean and population standard deviation):
 * phi_c(x) = exp(-||z - z_c||^2 / (2 width^2)), one column per centre c (Bishop, Pattern Recognition
 * and Machine Learning, 2006, eq. 3.4, with the Euclidean norm). Centres are written in the inputs'
 * own units and standardised alike; `width` is in standard deviations. Centres: a list of rows (one
 * value per input), a grid (one `{ from, to, count }` per input; every combination, the first input
 * varying slowest), or `at-samples` (one per training row).
 */
import type { MultiRbfCenters, MultiRbfTermSpec } from '../../config/types.js';
import { InputError } from '../../core/errors.js';
import { meanAndSd } from '../stats.js';
import type { Term, TrainingColumns } from './types.js';

/** The centres a specification stands for, as rows in the inputs' own units. */
export function multiRbfCenters(centers: MultiRbfCenters, training: readonly Float64Array[]): number[][] {
  if (centers.kind === 'rows') return centers.rows.map((r) => [...r]);
  if (centers.kind === 'at-samples') return Array.from({ length: training[0].length }, (_, i) => training.map((col) => col[i]));
  const axes = centers.axes.map(({ from, to, count }) =>
    count === 1 ? [from] : Array.from({ length: count }, (_, k) => (k === count - 1 ? to : from + ((to - from) * k) / (count - 1))),
  );
  let rows: number[][] = [[]];
  for (const axis of axes) rows = rows.flatMap((r) => axis.map((v) => [...r, v]));
  return rows;
}

/** Formats a number for a column name (at most 6 significant digits). */
function label(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/**
 * Fixes the standardisation and the centres from the training columns and returns the term.
 * @throws InputError `constant-input` when an input is constant in the training rows
 */
export function multiRbfTerm(spec: MultiRbfTermSpec, training: TrainingColumns, file: string): Term {
  const columns = spec.of.map((name) => training.get(name) as Float64Array);
  const shift: number[] = [];
  const scale: number[] = [];
  spec.of.forEach((name, i) => {
    const { mean, sd } = meanAndSd(columns[i]);
    if (!(sd > 0)) {
      throw new InputError(
        'constant-input',
        `column \`${name}\` is constant in the training data, so it cannot be standardised for a radial term over several inputs; drop it from \`of\``,
        {
          file,
          line: spec.line,
          key: 'rbf.of',
        },
      );
    }
    shift.push(mean);
    scale.push(sd);
  });
  const centres = multiRbfCenters(spec.centers, columns);
  const k = spec.of.length;
  const z = Float64Array.from(centres.flatMap((c) => c.map((v, i) => (v - shift[i]) / scale[i])));
  const a = 1 / (2 * spec.width * spec.width);
  let scratch = new Float64Array(0);
  return {
    spec,
    inputs: spec.of,
    columnNames: centres.map((c) => `rbf(${spec.of.join(', ')}; c=(${c.map(label).join(', ')}))`),
    fixed: { width: spec.width, shift, scale, centers: centres.flat() },
    fill(inputs, m, out, offset) {
      if (scratch.length < k * m) scratch = new Float64Array(k * m);
      for (let i = 0; i < k; i++) standardise(inputs[i], m, shift[i], scale[i], scratch, i * m);
      for (let c = 0; c < centres.length; c++) {
        const at = (offset + c) * m;
        out.fill(0, at, at + m);
        for (let i = 0; i < k; i++) addSquaredDistance(scratch, i * m, m, z[c * k + i], out, at);
        gaussianInPlace(out, at, m, a);
      }
    },
  };
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

/** out[at + i] = (x[i] - shift) / scale for i < m. */
function standardise(x: Float64Array, m: number, shift: number, scale: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) out[at + i] = (x[i] - shift) / scale;
}

/** out[at + i] += (z[from + i] - c)^2 for i < m. */
function addSquaredDistance(z: Float64Array, from: number, m: number, c: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) {
    const d = z[from + i] - c;
    out[at + i] += d * d;
  }
}

/** out[at + i] = exp(-out[at + i] a) for i < m. */
function gaussianInPlace(out: Float64Array, at: number, m: number, a: number): void {
  for (let i = 0; i < m; i++) out[at + i] = Math.exp(-out[at + i] * a);
}
