import { describe, expect, it } from 'vitest';
import { QrAccumulator } from '../../src/fit/qr-accumulator.js';
import { checkPenalty, penalisedFactor } from '../../src/fit/ridge.js';

describe('checkPenalty', () => {
  it('defaults to lambda 0 and every column penalised', () => {
    expect(checkPenalty(3)).toEqual({ lambda: 0, mask: [true, true, true] });
    expect(checkPenalty(2, 1.5, [false, true])).toEqual({ lambda: 1.5, mask: [false, true] });
  });
  it('rejects negative, NaN and infinite lambda, and a mask of the wrong length', () => {
    for (const bad of [-1, NaN, Infinity]) expect(() => checkPenalty(2, bad), String(bad)).toThrow(RangeError);
    expect(() => checkPenalty(2, 1, [true])).toThrow(/one entry per column \(2\), got 1/);
  });
});

describe('penalisedFactor', () => {
  it('adds lambda to the penalised diagonal entries of R^T R and one row per penalised column', () => {
    const data = new QrAccumulator(2);
    data.addRows(new Float64Array([1, 1, 1, 0, 1, 2]), new Float64Array([1, 2, 4]), 3);
    const f = penalisedFactor(data, 4, [false, true]);
    expect(f.rows).toBe(4);
    expect(data.rows).toBe(3);
    const gram = (R: Float64Array, a: number, b: number) => R[a * 2] * R[b * 2] + R[a * 2 + 1] * R[b * 2 + 1];
    // X^T X = [[3, 3], [3, 5]]; with the penalty [[3, 3], [3, 9]].
    expect(gram(f.R, 0, 0)).toBeCloseTo(3, 13);
    expect(gram(f.R, 0, 1)).toBeCloseTo(3, 13);
    expect(gram(f.R, 1, 1)).toBeCloseTo(9, 13);
  });
  it('lambda 0 returns an unchanged copy', () => {
    const data = new QrAccumulator(1);
    data.addRows(new Float64Array([2]), new Float64Array([1]), 1);
    const f = penalisedFactor(data, 0, [true]);
    expect(f).not.toBe(data);
    expect(f.rows).toBe(1);
    expect(Array.from(f.R)).toEqual(Array.from(data.R));
  });
});
