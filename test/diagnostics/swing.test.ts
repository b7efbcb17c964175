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
  it('equals the sorted distinct points of the uniform grid and the gap points, however the values fall (merge of two runs)', () => {
    // The grid's definition, built here with a plain sort: 201 even points from min to max, 8
    // evenly spaced points inside each gap between neighbouring distinct values.
    const reference = (values: number[]): Float64Array => {
      const distinct = [...new Set(Float64Array.from(values).sort())];
      const lo = distinct[0];
      const hi = distinct[distinct.length - 1];
      const points: number[] = [];
      for (let t = 0; t < 201; t++) points.push(t === 200 ? hi : lo + ((hi - lo) * t) / 200);
      for (let g = 0; g + 1 < distinct.length; g++)
        for (let t = 1; t <= 8; t++) points.push(distinct[g] + ((distinct[g + 1] - distinct[g]) * t) / 9);
      const sorted = Float64Array.from(points).sort();
      return Float64Array.from(sorted.filter((v, i) => i === 0 || v !== sorted[i - 1]));
    };
    let seed = 7;
    const random = (): number => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const cases: number[][] = [
      [-0, 0, 1, -1],
      [0.1, 0.2, 0.30000000000000004, 0.3],
      Array.from({ length: 500 }, () => Math.round(random() * 40) / 4 - 5),
      Array.from({ length: 900 }, () => 1e-300 * random()),
      Array.from({ length: 700 }, () => (random() < 0.5 ? -1 : 1) * 10 ** (20 * random() - 10)),
    ];
    for (const values of cases) {
      const got = inputGrid(values).inside;
      const want = reference(values);
      expect(got.length).toBe(want.length);
      expect(Array.from(got).every((v, i) => Object.is(v, want[i]))).toBe(true);
    }
  });

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
