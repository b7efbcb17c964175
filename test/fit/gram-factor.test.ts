// The Cholesky factor of a weighted Gram (fit/gram-step.ts, gramFactor) against the QR factor of
// the same weighted rows (fit/qr-accumulator.ts): the rank and conditioning diagnostics
// (fit/index.ts, factorDiagnostics) agree, the bound refuses ill-conditioned Grams, and the
// factor pass of fitLogistic leaves the training logits and deviance predictRows and a plain sum give,
// and shows its design blocks to the caller.
import { describe, expect, it } from 'vitest';
import { predictRows } from '../../src/design/blocks.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';
import { seededRandom } from '../../src/diagnostics/random.js';
import { gramFactor, gramSize } from '../../src/fit/gram-step.js';
import { factorDiagnostics, fitFactor } from '../../src/fit/index.js';
import { fitLogistic, rowDeviance, type LogisticRows } from '../../src/fit/logistic.js';
import { QrAccumulator } from '../../src/fit/qr-accumulator.js';

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-300);

/**
 * Weighted rows sqrt(W_i) x_i of an n x p design (column-major; column 0 ones, the others
 * uniform on [-1, 1] times a column scale, column `near` nearly repeating column 1 when given),
 * with weights W_i = p_i (1 - p_i) of random logits: their extended Gram (upper triangle, the
 * extra column zero) summed plainly, and their QR factor.
 */
function weightedRows(n: number, p: number, seed: number, near?: { column: number; by: number }) {
  const random = seededRandom(seed);
  const q = gramSize(p);
  const G = new Float64Array(q * q);
  const rows = new Float64Array(n * p);
  const x = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    x[0] = 1;
    for (let j = 1; j < p; j++) x[j] = (2 * random() - 1) * 10 ** (j % 3);
    if (near) x[near.column] = x[1] + near.by * (2 * random() - 1);
    const pr = 1 / (1 + Math.exp(-(4 * random() - 2)));
    const s = Math.sqrt(pr * (1 - pr));
    for (let j = 0; j < p; j++) rows[j * n + i] = s * x[j];
    for (let k = 0; k < p; k++) for (let j = 0; j <= k; j++) G[k * q + j] += s * x[j] * s * x[k];
  }
  const acc = new QrAccumulator(p);
  acc.addRows(rows, new Float64Array(n), n);
  return { G, acc };
}

describe('Cholesky factor of the weighted Gram', () => {
  it('gives the rank, condition numbers, scaled singular values and collinear columns of the QR factor (within 1e-10 relative)', () => {
    for (const [n, p, seed, near] of [
      [500, 4, 1, undefined],
      [3000, 9, 2, undefined],
      [2000, 12, 3, { column: 5, by: 0.05 }],
      [4000, 25, 4, { column: 7, by: 0.2 }],
    ] as const) {
      const { G, acc } = weightedRows(n, p, seed, near);
      const R = gramFactor(G, p);
      expect(R).not.toBeNull();
      const fromGram = factorDiagnostics(R as Float64Array, p, n);
      const fromQr = fitFactor(acc);
      expect(fromGram.rank).toBe(fromQr.rank);
      expect(fromGram.rankDeficient).toBe(false);
      expect(relative(fromGram.conditionNumberScaled, fromQr.conditionNumberScaled)).toBeLessThan(1e-10);
      expect(relative(fromGram.conditionNumber, fromQr.conditionNumber)).toBeLessThan(1e-10);
      for (let j = 0; j < p; j++) expect(relative(fromGram.singularValuesScaled[j], fromQr.singularValuesScaled[j])).toBeLessThan(1e-10);
      expect(fromGram.collinearColumns).toEqual(fromQr.collinearColumns);
      if (near) expect(fromGram.collinearColumns).toEqual(expect.arrayContaining([1, near.column]));
      // R is upper triangular with a positive diagonal and R^T R = G (the leading p x p part).
      const q = gramSize(p);
      for (let j = 0; j < p; j++) {
        expect((R as Float64Array)[j * p + j]).toBeGreaterThan(0);
        for (let i = j + 1; i < p; i++) expect((R as Float64Array)[j * p + i]).toBe(0);
        for (let k = j; k < p; k++) {
          let rtr = 0;
          for (let t = 0; t <= j; t++) rtr += (R as Float64Array)[j * p + t] * (R as Float64Array)[k * p + t];
          expect(Math.abs(rtr - G[k * q + j])).toBeLessThan(1e-11 * Math.sqrt(G[j * q + j] * G[k * q + k]));
        }
      }
    }
  });

  it('is refused (null) when the scaled Gram is not certainly well conditioned, or a column is zero', () => {
    const { G } = weightedRows(2000, 5, 5, { column: 4, by: 1e-5 });
    expect(gramFactor(G, 5)).toBeNull();
    const q = gramSize(3);
    const zero = new Float64Array(q * q);
    zero[0] = 4;
    zero[q + 1] = 0;
    zero[2 * q + 2] = 1;
    expect(gramFactor(zero, 3)).toBeNull();
  });

  it("fitLogistic's factor pass leaves every row's logit as predictRows gives it and the deviance at the returned coefficients", () => {
    const n = 70_000; // several design blocks
    const random = seededRandom(12);
    const a = new Float64Array(n);
    const b = new Float64Array(n);
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      a[i] = 2 * random() - 1;
      b[i] = 3 * random();
      y[i] = random() < 1 / (1 + Math.exp(-(0.2 + a[i] - 0.6 * b[i] + 0.5 * a[i] * a[i]))) ? 1 : 0;
    }
    const data: LogisticRows = { inputs: [a, b], y, rows: n };
    const training = new Map([
      ['a', a],
      ['b', b],
    ]);
    const design = createDesign(
      [
        createTerm({ kind: 'polynomial', of: 'a', degree: 3, shift: null, scale: null, line: 1 }, training, 'm'),
        createTerm({ kind: 'linear', columns: ['b'], line: 2 }, training, 'm'),
      ],
      true,
    );
    const options = { ridge: 0.5, penalised: [...design.penalised] };
    const eta = new Float64Array(n).fill(7);
    const starts: number[] = [];
    let seen = 0;
    const onBlock = (X: Float64Array, start: number, m: number) => {
      starts.push(start);
      expect(start).toBe(seen);
      // The block is the design's rows start .. start + m - 1 (column 1: the input a, degree 1, standardised).
      const { shift, scale } = design.terms[0].fixed as { shift: number; scale: number };
      expect(X[0]).toBe(1);
      expect(X[m]).toBeCloseTo((a[start] - shift) / scale, 12);
      seen += m;
    };
    const [fit] = fitLogistic(design, data, options, [{ factor: true, eta, onBlock }]);
    expect(seen).toBe(n);
    expect(starts.length).toBeGreaterThan(1);
    expect(fit.converged).toBe(true);
    expect(fit.weightedR).not.toBeNull();
    expect(fit.weightedFactor).toBeNull();
    const plain = predictRows(design, data, fit.coefficients);
    expect(eta).toEqual(plain);
    let deviance = 0;
    for (let i = 0; i < n; i++) deviance += rowDeviance(plain[i], y[i]);
    expect(relative(fit.deviance, deviance)).toBeLessThan(1e-12);
  });
});
