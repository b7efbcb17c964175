/**
 * `polynomial: { of: [x_1, .., x_k], degree: d, shift?, scale? }`: every monomial
 * z_1^e_1 * .. * z_k^e_k of total degree 1 .. d in the standardised inputs
 * z_i = (x_i - shift_i) / scale_i (defaults: each input's training mean and population standard
 * deviation, as for one input). C(k + d, d) - 1 columns, in graded order: by total degree, and
 * within a degree as the sorted index tuples (i_1 <= .. <= i_t) come in lexicographic order
 * (for [a, b], degree 2: a, b, a^2, a*b, b^2). Each monomial is its prefix's column times one z_i.
 */
import type { MultiPolynomialTermSpec } from '../../config/types.js';
import { InputError } from '../../core/errors.js';
import { meanAndSd } from '../stats.js';
import type { Term, TrainingColumns, TrainingStats } from './types.js';

/** The monomials of total degree 1 .. d over k inputs, as sorted index tuples in graded lexicographic order. */
export function monomials(k: number, d: number): number[][] {
  const out: number[][] = [];
  let level: number[][] = Array.from({ length: k }, (_, i) => [i]);
  for (let t = 1; t <= d; t++) {
    for (const m of level) out.push(m);
    if (t === d) break;
    const next: number[][] = [];
    for (const m of level) for (let i = m[m.length - 1]; i < k; i++) next.push([...m, i]);
    level = next;
  }
  return out;
}

/** Name of a monomial: `z(a)^2*z(b)`, or raw names (`a^2*b`) for inputs with shift 0 and scale 1. */
function monomialName(m: readonly number[], names: readonly string[]): string {
  const parts: string[] = [];
  for (let s = 0; s < m.length; ) {
    let e = s;
    while (e < m.length && m[e] === m[s]) e++;
    parts.push(e - s === 1 ? names[m[s]] : `${names[m[s]]}^${e - s}`);
    s = e;
  }
  return parts.join('*');
}

/**
 * Fixes each input's shift and scale from the training columns (or from `stats`, measured over
 * every training row when the columns are a sample) and returns the term.
 * @throws InputError `constant-input` when an input's default scale would be 0
 */
export function multiPolynomialTerm(spec: MultiPolynomialTermSpec, training: TrainingColumns, file: string, stats?: TrainingStats): Term {
  const shift: number[] = [];
  const scale: number[] = [];
  spec.of.forEach((name, i) => {
    const x = training.get(name) as Float64Array;
    const { mean, sd } = stats?.get(name) ?? meanAndSd(x);
    const sc = spec.scale[i] ?? sd;
    if (!(sc > 0)) {
      throw new InputError(
        'constant-input',
        `column \`${name}\` is constant in the training data, so its default scale (standard deviation) is 0; give \`scale\` explicitly or drop it from \`of\``,
        {
          file,
          line: spec.line,
          key: 'polynomial.of',
        },
      );
    }
    shift.push(spec.shift[i] ?? mean);
    scale.push(sc);
  });
  const labels = spec.of.map((name, i) => (shift[i] === 0 && scale[i] === 1 ? name : `z(${name})`));
  const terms = monomials(spec.of.length, spec.degree);
  // Column of each monomial's prefix (the monomial without its last factor), -1 for degree 1.
  const key = (m: readonly number[]): string => m.join(',');
  const index = new Map(terms.map((m, j) => [key(m), j]));
  const parent = terms.map((m) => (m.length === 1 ? -1 : (index.get(key(m.slice(0, -1))) as number)));
  const last = terms.map((m) => m[m.length - 1]);
  const k = spec.of.length;
  return {
    spec,
    inputs: spec.of,
    columnNames: terms.map((m) => monomialName(m, labels)),
    fixed: { shift, scale },
    fill(inputs, m, out, offset) {
      const first = offset * m;
      // Degree-1 columns are the standardised inputs (the first k monomials).
      for (let i = 0; i < k; i++) standardise(inputs[i], m, shift[i], scale[i], out, first + i * m);
      for (let j = k; j < terms.length; j++) multiplyColumns(out, first + parent[j] * m, first + last[j] * m, first + j * m, m);
    },
  };
}

// One loop per function (see DEVELOPERS.md, "Writing hot loops").

/** out[at + i] = (x[i] - shift) / scale for i < m. */
function standardise(x: Float64Array, m: number, shift: number, scale: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) out[at + i] = (x[i] - shift) / scale;
}

/** out[to + i] = out[a + i] * out[b + i] for i < m. */
function multiplyColumns(out: Float64Array, a: number, b: number, to: number, m: number): void {
  for (let i = 0; i < m; i++) out[to + i] = out[a + i] * out[b + i];
}
