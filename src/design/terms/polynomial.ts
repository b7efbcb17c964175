/**
 * `polynomial: { of, degree, shift?, scale? }`: z^1 .. z^degree with z = (x - shift) / scale.
 * Defaults: shift = training mean of x, scale = training population standard deviation.
 * Powers by repeated multiplication (z^k = z^(k-1) * z). `shift: 0, scale: 1` gives raw powers.
 */
import type { PolynomialTermSpec } from '../../config/types.js';
import { InputError, clip } from '../../core/errors.js';
import { polynomialColumns } from '../../kernels/index.js';
import { meanAndSd } from '../stats.js';
import type { Term, TrainingColumns, TrainingStats } from './types.js';

/**
 * Fixes shift and scale from the training column (or from `stats`, measured over every training
 * row when the column is a sample) and returns the term.
 * @throws InputError `constant-input` when the default scale would be 0 (a constant column)
 */
export function polynomialTerm(spec: PolynomialTermSpec, training: TrainingColumns, file: string, stats?: TrainingStats): Term {
  const x = training.get(spec.of) as Float64Array;
  let shift = spec.shift;
  let scale = spec.scale;
  if (shift === null || scale === null) {
    const { mean, sd } = stats?.get(spec.of) ?? meanAndSd(x);
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
      polynomialColumns(inputs[0], m, s, sc, raw, spec.degree, out, offset * m);
    },
  };
}
