/**
 * `rbf: { of, centers, width }`: Gaussian radial basis functions
 * phi_c(x) = exp(-(x - c)^2 / (2 width^2)), one column per centre c
 * (Bishop, Pattern Recognition and Machine Learning, 2006, eq. 3.4).
 * Centres: a list; `{ from, to, count }` (count evenly spaced points, both ends included;
 * count 1 gives `from`); `{ from, to, step }` (from, from + step, ... up to `to`, with a
 * tolerance of 1e-9 step for rounding); or `at-samples` (one centre per training row).
 */
import type { RbfCenters, RbfTermSpec } from '../../config/types.js';
import type { Term, TrainingColumns } from './types.js';

/** Largest number of centres a `{ from, to, step }` range may produce. */
export const MAX_STEP_CENTERS = 10000;

/** The centres a specification stands for, in order. */
export function rbfCenters(centers: RbfCenters, training: Float64Array): number[] {
  switch (centers.kind) {
    case 'list':
      return [...centers.values];
    case 'count': {
      const { from, to, count } = centers;
      if (count === 1) return [from];
      const out: number[] = [];
      for (let k = 0; k < count; k++) out.push(k === count - 1 ? to : from + ((to - from) * k) / (count - 1));
      return out;
    }
    case 'step': {
      const { from, to, step } = centers;
      const out: number[] = [];
      const dir = to >= from ? 1 : -1;
      for (let k = 0; out.length < MAX_STEP_CENTERS; k++) {
        const c = from + dir * k * step;
        if (dir * (c - to) > 1e-9 * step) break;
        out.push(c);
      }
      return out;
    }
    case 'at-samples':
      return Array.from(training);
  }
}

/** Formats a centre for a column name (shortest round-trip text, at most 6 significant digits). */
function label(c: number): string {
  const short = Number(c.toPrecision(6));
  return String(short);
}

/** Builds the Gaussian term with its centres fixed. */
export function rbfTerm(spec: RbfTermSpec, training: TrainingColumns): Term {
  const x = training.get(spec.of) as Float64Array;
  const centres = rbfCenters(spec.centers, x);
  const a = 1 / (2 * spec.width * spec.width);
  return {
    spec,
    inputs: [spec.of],
    columnNames: centres.map((c) => `rbf(${spec.of}; c=${label(c)})`),
    fixed: { width: spec.width, centers: centres },
    fill(inputs, m, out, offset) {
      for (let k = 0; k < centres.length; k++) gaussianColumn(inputs[0], m, centres[k], a, out, (offset + k) * m);
    },
  };
}

/**
 * out[at + i] = exp(-(x[i] - c)^2 a) for i < m. A function of its own, one loop (see
 * DEVELOPERS.md, "Writing hot loops").
 */
function gaussianColumn(x: Float64Array, m: number, c: number, a: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) {
    const d = x[i] - c;
    out[at + i] = Math.exp(-d * d * a);
  }
}
