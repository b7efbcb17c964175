import { describe, expect, it } from 'vitest';
import type { PolynomialTermSpec, RbfTermSpec } from '../../src/config/types.js';
import { createTerm } from '../../src/design/terms/index.js';
import { rbfCenters } from '../../src/design/terms/rbf.js';
import { meanAndSd } from '../../src/design/stats.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { InputError } from '../../src/core/errors.js';

const x = new Float64Array([1, 2, 3, 4, 5]);
const training = new Map([
  ['x', x],
  ['u', new Float64Array([0, 0, 1, 1, 2])],
]);
const poly = (over: Partial<PolynomialTermSpec> = {}): PolynomialTermSpec => ({
  kind: 'polynomial',
  of: 'x',
  degree: 3,
  shift: null,
  scale: null,
  line: 4,
  ...over,
});

function column(term: ReturnType<typeof createTerm>, k: number, m = 5): number[] {
  const out = new Float64Array(m * term.columnNames.length);
  term.fill([x], m, out, 0);
  return Array.from(out.subarray(k * m, (k + 1) * m));
}

describe('polynomial term', () => {
  it('defaults to the training mean and population standard deviation', () => {
    const t = createTerm(poly(), training, 'm.yml');
    // mean 3, population sd sqrt(2)
    expect(t.fixed.shift).toBe(3);
    expect(t.fixed.scale).toBeCloseTo(Math.SQRT2, 15);
    const z = Array.from(x, (v) => (v - 3) / Math.SQRT2);
    expect(column(t, 0)).toEqual(z);
    expect(
      column(t, 2)
        .map((v, i) => v - z[i] ** 3)
        .every((d) => Math.abs(d) < 1e-14),
    ).toBe(true);
    expect(t.columnNames).toEqual(['z(x)', 'z(x)^2', 'z(x)^3']);
  });

  it('gives raw powers with shift 0 and scale 1', () => {
    const t = createTerm(poly({ shift: 0, scale: 1 }), training, 'm.yml');
    expect(column(t, 1)).toEqual([1, 4, 9, 16, 25]);
    expect(column(t, 2)).toEqual([1, 8, 27, 64, 125]);
    expect(t.columnNames).toEqual(['x', 'x^2', 'x^3']);
  });

  it('refuses a constant column when the scale is left to default', () => {
    const flat = new Map([['x', new Float64Array([2, 2, 2])]]);
    let caught: unknown;
    try {
      createTerm(poly(), flat, 'models/m.yml');
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(InputError);
    expect((caught as InputError).code).toBe('constant-input');
    expect((caught as InputError).location).toMatchObject({ file: 'models/m.yml', line: 4 });
  });
});

describe('rbf term', () => {
  it('places centres by count, step and list', () => {
    expect(rbfCenters({ kind: 'count', from: 0, to: 1, count: 5 }, x)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    expect(rbfCenters({ kind: 'count', from: 2, to: 9, count: 1 }, x)).toEqual([2]);
    expect(rbfCenters({ kind: 'step', from: 0, to: 1, step: 0.1 }, x)).toHaveLength(11);
    expect(rbfCenters({ kind: 'step', from: 0, to: 0.95, step: 0.1 }, x)).toHaveLength(10);
    expect(rbfCenters({ kind: 'list', values: [3, -1] }, x)).toEqual([3, -1]);
    expect(rbfCenters({ kind: 'at-samples' }, x)).toEqual([1, 2, 3, 4, 5]);
  });

  it('computes exp(-(x - c)^2 / (2 width^2))', () => {
    const spec: RbfTermSpec = { kind: 'rbf', of: 'x', centers: { kind: 'list', values: [2] }, width: 0.5, line: 3 };
    const t = createTerm(spec, training, 'm.yml');
    const got = column(t, 0);
    const want = Array.from(x, (v) => Math.exp(-((v - 2) ** 2) / (2 * 0.25)));
    got.forEach((g, i) => expect(Math.abs(g - want[i])).toBeLessThan(1e-16));
    expect(got[1]).toBe(1);
  });
});

describe('design matrix', () => {
  it('puts the intercept first, then each term in order, and fills blocks from an offset', () => {
    const terms = [
      createTerm({ kind: 'linear', columns: ['u'], line: 2 }, training, 'm'),
      createTerm(poly({ degree: 2, shift: 0, scale: 1 }), training, 'm'),
    ];
    const d = createDesign(terms, true);
    expect(d.p).toBe(4);
    expect(d.columnNames).toEqual(['(intercept)', 'u', 'x', 'x^2']);
    expect(d.penalised).toEqual([false, true, true, true]);
    expect(d.inputs).toEqual(['u', 'x']);
    const block = d.fill([training.get('u') as Float64Array, x], 2, 3);
    // rows 2..4: u = 1, 1, 2; x = 3, 4, 5
    expect(Array.from(block)).toEqual([1, 1, 1, 1, 1, 2, 3, 4, 5, 9, 16, 25]);
  });

  it('has no intercept column when asked', () => {
    const d = createDesign([createTerm({ kind: 'linear', columns: ['x'], line: 2 }, training, 'm')], false);
    expect(d.columnNames).toEqual(['x']);
    expect(d.penalised).toEqual([true]);
  });
});

describe('meanAndSd', () => {
  it('is exact on a large offset (two-pass)', () => {
    const big = new Float64Array([1e9 + 1, 1e9 + 2, 1e9 + 3]);
    const { mean, sd } = meanAndSd(big);
    expect(mean).toBe(1e9 + 2);
    expect(Math.abs(sd - Math.sqrt(2 / 3))).toBeLessThan(1e-9);
  });
  it('gives NaN for no rows', () => {
    expect(Number.isNaN(meanAndSd(new Float64Array(0)).mean)).toBe(true);
  });
});
