// Small designs for diagnostics tests: `linear` terms over generated columns, with an intercept.
import { linearTerm } from '../../src/design/terms/linear.js';
import type { Rows } from '../../src/diagnostics/cross-validation.js';
import { createDesign, type Design } from '../../src/design/design-matrix.js';
import { fitFactor, QrAccumulator, type FitResult } from '../../src/fit/index.js';
import { forEachBlock } from '../../src/design/blocks.js';
import { seededRandom } from '../../src/diagnostics/random.js';

/** A design [1 | x1 .. xq] (or without the intercept). */
export function linearDesign(q: number, intercept = true): Design {
  const columns = Array.from({ length: q }, (_, j) => `x${j + 1}`);
  return createDesign([linearTerm({ kind: 'linear', columns, line: 10 })], intercept);
}

/** n rows of q uniform inputs in (-1, 1) and y = 1 + sum_j (j+1) x_j + noise sd 0.3, from a seed. */
export function randomRows(n: number, q: number, seed: number): Rows {
  const u = seededRandom(seed);
  const inputs = Array.from({ length: q }, () => Float64Array.from({ length: n }, () => 2 * u() - 1));
  const y = Float64Array.from({ length: n }, (_, i) => {
    let v = 1;
    for (let j = 0; j < q; j++) v += (j + 1) * inputs[j][i];
    return v + 0.3 * (u() + u() + u() - 1.5) * 2;
  });
  return { inputs, y, rows: n };
}

/** Fits a design on rows. */
export function fitRows(design: Design, rows: Rows, ridge = 0): FitResult {
  const acc = new QrAccumulator(design.p);
  forEachBlock(design, rows, (X, start, m) => acc.addRows(X, rows.y.subarray(start, start + m), m));
  return fitFactor(acc, { ridge, penalised: design.penalised });
}

/** The rows whose index passes `keep`. */
export function selectRows(rows: Rows, keep: (i: number) => boolean): Rows {
  const idx: number[] = [];
  for (let i = 0; i < rows.rows; i++) if (keep(i)) idx.push(i);
  return {
    inputs: rows.inputs.map((c) => Float64Array.from(idx, (i) => c[i])),
    y: Float64Array.from(idx, (i) => rows.y[i]),
    rows: idx.length,
  };
}

/** Prediction of one row under coefficients w. */
export function predictRow(design: Design, rows: Rows, i: number, w: Float64Array): number {
  const X = design.fill(rows.inputs, i, 1);
  let s = 0;
  for (let j = 0; j < design.p; j++) s += X[j] * w[j];
  return s;
}

/** Relative difference |a - b| / max(|b|, tiny). */
export function relDiff(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
}
