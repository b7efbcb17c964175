// The fused predictor of one polynomial term (design/polynomial-predictions.ts) must give the bits
// predictRows gives (design/blocks.ts): the swing figures and curves are built from it.
import { describe, expect, it } from 'vitest';
import type { PolynomialTermSpec, TermSpec } from '../../src/config/types.js';
import { predictRows } from '../../src/design/blocks.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { polynomialPredictor } from '../../src/design/polynomial-predictions.js';
import { createTerm } from '../../src/design/terms/index.js';

/** Same bits, NaN and the sign of zero included. */
function sameBits(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  const ua = new Uint32Array(a.buffer, a.byteOffset, 2 * a.length);
  const ub = new Uint32Array(b.buffer, b.byteOffset, 2 * b.length);
  for (let i = 0; i < ua.length; i++) if (ua[i] !== ub[i]) return false;
  return true;
}

describe('polynomialPredictor', () => {
  const n = 500;
  const x = Float64Array.from({ length: n }, (_, i) => ((i * 7919) % 1000) / 37 - 9);
  const columns = new Map([['x', x]]);
  // Points inside and far outside the range, exact zeros, both zeros and a huge value (powers overflow).
  const xs = Float64Array.from([...Array.from({ length: 3000 }, (_, i) => -40 + i * 0.0271), 0, -0, 1e160, -1e160]);

  for (const degree of [1, 2, 3, 4, 5, 7]) {
    for (const intercept of [true, false]) {
      for (const scaled of [
        { shift: null, scale: null },
        { shift: 0, scale: 1 },
        { shift: 2.5, scale: 0.75 },
      ]) {
        it(`gives predictRows' bits: degree ${degree}, intercept ${intercept}, shift ${scaled.shift} scale ${scaled.scale}`, () => {
          const spec: PolynomialTermSpec = { kind: 'polynomial', of: 'x', degree, ...scaled, line: 1 };
          const design = createDesign([createTerm(spec, columns, 'm.yml')], intercept);
          // Weights with zeros (left out), a negative zero and ordinary values.
          const weightSets = [
            Array.from({ length: design.p }, (_, j) => 0.37 * (j + 1) * (j % 2 === 0 ? 1 : -1)),
            Array.from({ length: design.p }, (_, j) => (j % 2 === 0 ? 0 : 1.5 / (j + 1))),
            Array.from({ length: design.p }, (_, j) => (j === 0 ? -0 : j === design.p - 1 ? 0 : -2.25 * j)),
          ];
          for (const w of weightSets) {
            const predict = polynomialPredictor(design, w);
            expect(predict).not.toBeNull();
            const expected = predictRows(design, { inputs: [xs], rows: xs.length }, w);
            const got = predict?.(xs, new Float64Array(xs.length)) ?? new Float64Array(0);
            expect(sameBits(got, expected)).toBe(true);
          }
        });
      }
    }
  }

  it('declines designs it does not cover (other terms, two terms, a transformed input)', () => {
    const spline: TermSpec = { kind: 'spline', of: 'x', knots: { kind: 'count', count: 4 }, degree: 3, natural: true, line: 1 };
    const poly: TermSpec = { kind: 'polynomial', of: 'x', degree: 2, shift: null, scale: null, line: 2 };
    const positive = new Map([['x', Float64Array.from(x, (v) => Math.abs(v) + 1)]]);
    const logged: TermSpec = { ...poly, transform: 'log' } as TermSpec;
    expect(polynomialPredictor(createDesign([createTerm(spline, columns, 'm.yml')], true), [1, 1, 1, 1, 1])).toBeNull();
    const two = createDesign([createTerm(poly, columns, 'm.yml'), createTerm(poly, columns, 'm.yml')], true);
    expect(polynomialPredictor(two, new Array(two.p).fill(1))).toBeNull();
    const transformed = createDesign([createTerm(logged, positive, 'm.yml')], true);
    expect(polynomialPredictor(transformed, new Array(transformed.p).fill(1))).toBeNull();
  });
});
