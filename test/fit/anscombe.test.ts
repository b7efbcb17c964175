/**
 * Anscombe's quartet: F. J. Anscombe (1973), "Graphs in Statistical Analysis", The American
 * Statistician 27(1), 17-21. Published for every set: least-squares line y = 3.00 + 0.500 x and
 * R^2 about 0.67 (rounded summaries, tested at their printed rounding).
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { fitDesign } from '../../src/fit/index.js';
import { requireTool, skipNote } from '../tools/require-tool.js';
import { referenceDir } from './nist.js';

const missing = requireTool(['shared/reference']);

describe.skipIf(missing !== null)(`Anscombe's quartet${skipNote(missing)}`, () => {
  let rows: { set: number; x: number; y: number }[] = [];
  beforeAll(() => {
    const lines = readFileSync(`${referenceDir}anscombe.csv`, 'utf8').trim().split(/\r?\n/);
    rows = lines.slice(1).map((l) => {
      const [set, x, y] = l.split(',').map(Number);
      return { set, x, y };
    });
  });

  it.each([1, 2, 3, 4])('set %i: y = 3.00 + 0.500 x and R^2 = 0.67 at the published rounding', (set) => {
    const data = rows.filter((r) => r.set === set);
    const n = data.length;
    expect(n).toBe(11);
    const X = new Float64Array(2 * n);
    const y = Float64Array.from(data, (r) => r.y);
    data.forEach((r, i) => {
      X[i] = 1;
      X[n + i] = r.x;
    });
    const fit = fitDesign(X, y, n, 2);
    const mean = y.reduce((s, v) => s + v, 0) / n;
    const sst = y.reduce((s, v) => s + (v - mean) ** 2, 0);
    const r2 = 1 - fit.rss / sst;
    const [b0, b1] = fit.coefficients;
    expect(Math.abs(b0 - 3), `set ${set}: intercept ${b0}, published 3.00 +- 0.005`).toBeLessThanOrEqual(0.005);
    expect(Math.abs(b1 - 0.5), `set ${set}: slope ${b1}, published 0.500 +- 0.0005`).toBeLessThanOrEqual(0.0005);
    expect(Math.abs(r2 - 0.67), `set ${set}: R^2 ${r2}, published 0.67 +- 0.005`).toBeLessThanOrEqual(0.005);
  });
});
