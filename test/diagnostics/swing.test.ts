import { describe, expect, it } from 'vitest';
import { excursion, inputGrid, measureSwing } from '../../src/diagnostics/swing.js';
import { fitRows, linearDesign } from './helpers.js';

describe('excursion outside the band of training targets', () => {
  it('is max(0, max(pred) - hi, lo - min(pred)) / (hi - lo)', () => {
    expect(excursion([1, 2, 3], 0, 4)).toBe(0);
    expect(excursion([1, 6, 3], 0, 4)).toBe(0.5);
    expect(excursion([-8, 2], 0, 4)).toBe(2);
    expect(excursion([], 0, 4)).toBeNaN();
    expect(excursion([1], 2, 2)).toBeNaN();
  });
});

describe('grid across an input', () => {
  it('puts 8 points inside every gap between neighbouring distinct values, a uniform grid, and margins of 10 % outside', () => {
    const values = [0, 0, 1, 1.001, 5, 10];
    const { inside, beyond } = inputGrid(values);
    const distinct = [0, 1, 1.001, 5, 10];
    for (let g = 0; g + 1 < distinct.length; g++) {
      const inGap = inside.filter((x) => x > distinct[g] && x < distinct[g + 1]).length;
      expect(inGap, `gap ${distinct[g]}..${distinct[g + 1]}`).toBeGreaterThanOrEqual(8);
    }
    expect(inside[0]).toBe(0);
    expect(inside[inside.length - 1]).toBe(10);
    expect(Math.min(...beyond)).toBeCloseTo(-1, 12);
    expect(Math.max(...beyond)).toBeCloseTo(11, 12);
    expect(beyond.every((x) => x < 0 || x > 10)).toBe(true);
  });

  it('is empty for a constant input', () => {
    expect(inputGrid([3, 3, 3]).inside.length).toBe(0);
  });

  it('caps the number of gaps (the widest kept) so that big files stay cheap', () => {
    const values = Array.from({ length: 100000 }, (_, i) => i + (i === 500 ? 0.5 : 0));
    const { inside } = inputGrid(values, { maxGaps: 1000 });
    expect(inside.length).toBeLessThan(100000 * 0.2);
  });
});

describe('swing of a fitted model', () => {
  it('a straight line through points on a line stays in the band inside the range and leaves it beyond', () => {
    const design = linearDesign(1);
    const x = Float64Array.from({ length: 11 }, (_, i) => i);
    const rows = { inputs: [x], y: Float64Array.from(x, (v) => 2 * v + 1), rows: 11 };
    const swing = measureSwing(design, rows, fitRows(design, rows).coefficients);
    expect(swing.inside).toBeLessThan(1e-12);
    // 10 % of the range beyond each end moves the line by 10 % of the band.
    expect(Math.abs(swing.beyond - 0.1)).toBeLessThan(1e-9);
    expect(swing.curves[0].x.length).toBeLessThanOrEqual(400);
    expect(swing.segments).toBeNull();
  });

  it('several inputs: scans segments between neighbours and curves along each input (thinned to 400 points)', () => {
    const design = linearDesign(2);
    const n = 3000;
    const a = Float64Array.from({ length: n }, (_, i) => (i * 7919) % 1000);
    const b = Float64Array.from({ length: n }, (_, i) => (i * 104729) % 997);
    const rows = { inputs: [a, b], y: Float64Array.from(a, (v, i) => v + b[i]), rows: n };
    const swing = measureSwing(design, rows, fitRows(design, rows).coefficients);
    expect(swing.segments).toEqual({ rows: 1000, neighbours: 3, pointsPerSegment: 8 });
    expect(swing.curves.map((c) => c.input)).toEqual(['x1', 'x2']);
    for (const c of swing.curves) expect(c.x.length).toBeLessThanOrEqual(400);
    expect(swing.inside).toBeLessThan(1e-9);
  });
});
