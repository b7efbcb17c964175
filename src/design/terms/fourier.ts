/**
 * `fourier: { of, period, harmonics }`: seasonal columns
 * sin(2 pi j x / P), cos(2 pi j x / P) for j = 1 .. harmonics (in that order: sin 1, cos 1, sin 2, ...),
 * a truncated Fourier series of period P (Hyndman & Athanasopoulos, Forecasting: Principles and
 * Practice, 2nd ed., 2018, section 5.4, "Fourier series"). Nothing is taken from the data.
 */
import type { FourierTermSpec } from '../../config/types.js';
import type { Term } from './types.js';

/** Formats a number for a column name (at most 6 significant digits). */
function label(v: number): string {
  return String(Number(v.toPrecision(6)));
}

/** The column names of a Fourier term: `sin(2pi*1*day/7)`, `cos(2pi*1*day/7)`, ... */
export function fourierColumnNames(of: string, period: number, harmonics: number): string[] {
  const names: string[] = [];
  for (let j = 1; j <= harmonics; j++) names.push(`sin(2pi*${j}*${of}/${label(period)})`, `cos(2pi*${j}*${of}/${label(period)})`);
  return names;
}

/** Builds the Fourier term. */
export function fourierTerm(spec: FourierTermSpec): Term {
  return {
    spec,
    inputs: [spec.of],
    columnNames: fourierColumnNames(spec.of, spec.period, spec.harmonics),
    fixed: { period: spec.period, harmonics: spec.harmonics },
    fill(inputs, m, out, offset) {
      for (let j = 1; j <= spec.harmonics; j++) {
        const base = (offset + 2 * (j - 1)) * m;
        sinCosColumns(inputs[0], m, 2 * Math.PI * j, spec.period, out, base, base + m);
      }
    },
  };
}

/** out[s + i] = sin(w x[i] / P), out[c + i] = cos(w x[i] / P) for i < m (one loop; see DEVELOPERS.md, "Writing hot loops"). */
function sinCosColumns(x: Float64Array, m: number, w: number, period: number, out: Float64Array, s: number, c: number): void {
  for (let i = 0; i < m; i++) {
    const a = (w * x[i]) / period;
    out[s + i] = Math.sin(a);
    out[c + i] = Math.cos(a);
  }
}
