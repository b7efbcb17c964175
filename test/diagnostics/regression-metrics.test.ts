import { describe, expect, it } from 'vitest';
import { ColumnSpread } from '../../src/design/column-spread.js';
import { addErrors, emptySums, errorMeasures, gapRatio } from '../../src/diagnostics/regression-metrics.js';

describe('error measures', () => {
  it('match their definitions on a small case computed by hand', () => {
    const y = Float64Array.of(1, 2, 3, 4);
    const yhat = Float64Array.of(1.5, 2, 2, 4);
    const s = emptySums();
    addErrors(s, y.slice(0, 2), yhat.slice(0, 2), 2);
    addErrors(s, y.slice(2), yhat.slice(2), 2);
    const m = errorMeasures(s);
    // residuals -0.5, 0, 1, 0: SSE 1.25, SAE 1.5; SST about mean 2.5 = 5
    expect(m.rmse).toBeCloseTo(Math.sqrt(1.25 / 4), 15);
    expect(m.mae).toBeCloseTo(0.375, 15);
    expect(m.r2).toBeCloseTo(1 - 1.25 / 5, 15);
  });

  it('are NaN for zero rows, and R^2 is NaN for a constant target', () => {
    expect(Number.isNaN(errorMeasures(emptySums()).rmse)).toBe(true);
    const s = emptySums();
    addErrors(s, Float64Array.of(2, 2), Float64Array.of(1, 3), 2);
    expect(Number.isNaN(errorMeasures(s).r2)).toBe(true);
    expect(errorMeasures(s).rmse).toBe(1);
  });

  it('gap ratio is infinite when only the training error is zero, and 1 when both are', () => {
    expect(gapRatio(0, 0.2)).toBe(Infinity);
    expect(gapRatio(0, 0)).toBe(1);
    expect(gapRatio(2, 3)).toBe(1.5);
  });
});

describe('column spread', () => {
  it('equals the two-pass population standard deviation across blocks', () => {
    const cols = [
      [1e8 + 0.5, 1e8 + 1.5, 1e8 + 2.5, 1e8 + 3.5, 1e8 + 10],
      [3, 3, 3, 3, 3],
    ];
    const spread = new ColumnSpread(2);
    for (const [start, m] of [
      [0, 2],
      [2, 3],
    ]) {
      const block = new Float64Array(m * 2);
      for (let j = 0; j < 2; j++) for (let i = 0; i < m; i++) block[j * m + i] = cols[j][start + i];
      spread.add(block, m);
    }
    const sd = spread.sd();
    const mean = cols[0].reduce((a, b) => a + b) / 5;
    const want = Math.sqrt(cols[0].reduce((a, b) => a + (b - mean) ** 2, 0) / 5);
    expect(Math.abs(sd[0] - want) / want).toBeLessThan(1e-12);
    expect(sd[1]).toBe(0);
  });
});
