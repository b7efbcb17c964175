/**
 * `polynomial: { of, degree, shift?, scale? }`: z^1 .. z^degree with z = (x - shift) / scale.
 * Defaults: shift = training mean of x, scale = training population standard deviation.
 * Powers by repeated multiplication (z^k = z^(k-1) * z). `shift: 0, scale: 1` gives raw powers.
 */
import type { PolynomialTermSpec } from '../config/types.js';
import { clip, InputError } from '../errors.js';
import { polynomialColumnsInto, wasmKernels } from '../fit/wasm-kernels.js';
import { meanAndSd } from './stats.js';
import type { Term, TrainingColumns } from './types.js';

/**
 * Fixes shift and scale from the training column and returns the term.
 * @throws InputError `constant-input` when the default scale would be 0 (a constant column)
 */
export function polynomialTerm(spec: PolynomialTermSpec, training: TrainingColumns, file: string): Term {
  const x = training.get(spec.of) as Float64Array;
  let shift = spec.shift;
  let scale = spec.scale;
  if (shift === null || scale === null) {
    const { mean, sd } = meanAndSd(x);
    shift ??= mean;
    if (scale === null) {
      if (!(sd > 0)) {
        throw new InputError(
          'constant-input',
          `column \`${clip(spec.of)}\` is constant in the training data, so its default scale (standard deviation) is 0; give \`scale\` explicitly or drop the term`,
          { file, line: spec.line, key: 'polynomial.of' },
        );
      }
      scale = sd;
    }
  }
  const s = shift;
  const sc = scale;
  const raw = s === 0 && scale === 1;
  const names: string[] = [];
  for (let k = 1; k <= spec.degree; k++) {
    const base = raw ? spec.of : `z(${spec.of})`;
    names.push(k === 1 ? base : `${base}^${k}`);
  }
  return {
    spec,
    inputs: [spec.of],
    columnNames: names,
    fixed: { shift: s, scale },
    fill(inputs, m, out, offset) {
      const first = offset * m;
      // In WebAssembly where it is in use (fit/wasm-kernels.ts; the same operations).
      const kernels = wasmKernels();
      if (kernels !== null) {
        polynomialColumnsInto(kernels, inputs[0], m, s, sc, raw, spec.degree, out, first);
        return;
      }
      if (raw) out.set(inputs[0].subarray(0, m), first);
      else standardise(inputs[0], m, s, sc, out, first);
      for (let k = 1; k < spec.degree; k++) multiplyColumns(out, (offset + k - 1) * m, first, (offset + k) * m, m);
    },
  };
}

// The row loops are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").

/** out[at + i] = (x[i] - shift) / scale for i < m. */
function standardise(x: Float64Array, m: number, shift: number, scale: number, out: Float64Array, at: number): void {
  for (let i = 0; i < m; i++) out[at + i] = (x[i] - shift) / scale;
}

/** out[to + i] = out[a + i] * out[b + i] for i < m (the next power from the previous one and z). */
function multiplyColumns(out: Float64Array, a: number, b: number, to: number, m: number): void {
  for (let i = 0; i < m; i++) out[to + i] = out[a + i] * out[b + i];
}
