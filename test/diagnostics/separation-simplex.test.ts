// The separation test's simplex (diagnostics/separation.ts, simplexMax, which eliminates with the
// pivot row's non-zero entries only): feasible and optimal on separable rows, the origin on
// overlapping rows.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../src/diagnostics/random.js';
import { simplexMax } from '../../src/diagnostics/separation.js';

const dot = (a: Float64Array, b: Float64Array): number => a.reduce((s, v, j) => s + v * b[j], 0);

describe('simplexMax', () => {
  it('separable rows: a feasible b (|b_j| <= 1, a_i^T b >= 0) at least as good as a known separating direction', () => {
    const random = seededRandom(21);
    const p = 6;
    const star = Float64Array.from({ length: p }, () => 2 * random() - 1);
    const top = Math.max(...star.map(Math.abs));
    for (let j = 0; j < p; j++) star[j] /= top;
    const rows: Float64Array[] = [];
    while (rows.length < 150) {
      const a = Float64Array.from({ length: p }, () => 2 * random() - 1);
      const v = dot(a, star);
      if (v > 0.05) rows.push(a);
      else if (v < -0.05) rows.push(a.map((x) => -x));
    }
    const c = new Float64Array(p);
    for (const a of rows) for (let j = 0; j < p; j++) c[j] += a[j];
    const b = simplexMax(c, rows, p);
    for (let j = 0; j < p; j++) expect(Math.abs(b[j])).toBeLessThanOrEqual(1 + 1e-12);
    for (const a of rows) expect(dot(a, b)).toBeGreaterThanOrEqual(-1e-9);
    expect(dot(c, b)).toBeGreaterThanOrEqual(dot(c, star) - 1e-9);
  });

  it('overlapping rows (every direction has a row on each side): the origin', () => {
    const random = seededRandom(22);
    const p = 5;
    const rows: Float64Array[] = [];
    for (let i = 0; i < 60; i++) {
      const a = Float64Array.from({ length: p }, () => 2 * random() - 1);
      rows.push(
        a,
        a.map((x) => -x * (0.5 + random())),
      );
    }
    const c = new Float64Array(p);
    for (const a of rows) for (let j = 0; j < p; j++) c[j] += a[j];
    const b = simplexMax(c, rows, p);
    for (let j = 0; j < p; j++) expect(Math.abs(b[j])).toBeLessThan(1e-9);
  });
});
