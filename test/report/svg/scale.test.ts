import { describe, expect, it } from 'vitest';
import { extent, linearScale, logScale, niceTicks, pad } from '../../../src/report/svg/scale.js';

describe('niceTicks', () => {
  it('steps by 1, 2 or 5 times a power of ten and stays inside the interval', () => {
    expect(niceTicks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(niceTicks(0.3, 5.7, 5)).toEqual([1, 2, 3, 4, 5]);
    expect(niceTicks(-0.013, 0.021, 4)).toEqual([-0.01, 0, 0.01, 0.02]);
    expect(niceTicks(1e9, 7e9, 5)).toEqual([1e9, 2e9, 3e9, 4e9, 5e9, 6e9, 7e9]);
  });
  it('gives the single value for an empty or non-finite interval', () => {
    expect(niceTicks(3, 3)).toEqual([3]);
    expect(niceTicks(Number.NaN, 1)).toEqual([Number.NaN]);
  });
  it('falls back to the two ends far from zero, where the tick index cannot advance in double precision', () => {
    // step 2e-16 * 1e20 / 5 rounds to a power of ten near 1e4, and 1e20 / 1e4 = 1e16 > 2^52
    expect(niceTicks(1e20, 1e20 + 32768)).toEqual([1e20, 1e20 + 32768]);
  });
});

describe('extent and pad', () => {
  it('ignores null, NaN and infinities; null when nothing is finite', () => {
    expect(extent([3, null, -1, Number.NaN, Infinity], [7])).toEqual([-1, 7]);
    expect(extent([null, Number.NaN])).toBeNull();
  });
  it('widens an interval, and a single value by max(1, |v| / 10)', () => {
    expect(pad([0, 10], 0.1)).toEqual([-1, 11]);
    expect(pad([50, 50])).toEqual([45, 55]);
    expect(pad([0, 0])).toEqual([-1, 1]);
  });
});

describe('scales', () => {
  it('maps the domain ends to the range ends, also backwards (y axes)', () => {
    const s = linearScale([2, 4], [100, 0]);
    expect([s(2), s(3), s(4)]).toEqual([100, 50, 0]);
  });
  it('maps decades to equal steps on a log scale, with ticks at powers of ten', () => {
    const s = logScale([0.01, 100], [0, 400]);
    expect([s(0.01), s(1), s(100)].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0, 200, 400]);
    expect(s.ticks).toEqual([0.01, 0.1, 1, 10, 100]);
  });
  it('thins log ticks to about seven over many decades', () => {
    const s = logScale([1e-3, 1e22], [0, 100]);
    expect(s.ticks.length).toBeLessThanOrEqual(9);
    expect(s.ticks[0]).toBe(1e-3);
  });
});

describe('logScale near the largest double', () => {
  it('keeps its ticks finite and few when the domain reaches Infinity (regression: an endless loop found by fuzzing)', () => {
    const s = logScale([1e-20, Infinity], [0, 100]);
    expect(s.ticks.length).toBeGreaterThan(0);
    expect(s.ticks.length).toBeLessThanOrEqual(9);
    expect(s.ticks.every((t) => Number.isFinite(t))).toBe(true);
  });
});
