import { describe, expect, it } from 'vitest';
import { excursion, inputGrid, measureSwing, nearestPairs } from '../../src/diagnostics/swing.js';
import { seededRandom } from '../../src/diagnostics/random.js';
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

describe('nearest neighbours of the swing segments', () => {
  /** The plain search over all pairs: the k smallest (distance, index), duplicates skipped. */
  function bruteForce(flat: Float64Array, s: number, d: number, kk: number, rows: Int32Array): number[] {
    const out: number[] = [];
    for (let a = 0; a < s; a++) {
      const found: [number, number][] = [];
      for (let b = 0; b < s; b++) {
        if (b === a) continue;
        let dist = 0;
        for (let c = 0; c < d; c++) dist += (flat[a * d + c] - flat[b * d + c]) ** 2;
        if (dist > 0) found.push([dist, b]);
      }
      found.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
      for (const [, b] of found.slice(0, kk)) out.push(rows[a], rows[b]);
    }
    return out;
  }

  for (const [label, values] of [
    ['continuous values', (u: () => number) => 2 * u() - 1],
    ['few distinct values (ties and duplicates)', (u: () => number) => Math.floor(4 * u()) - 1.5],
  ] as const) {
    it(`equals the search over all pairs (${label})`, () => {
      const u = seededRandom(77);
      for (const [s, d, kk] of [[300, 3, 3], [120, 5, 4], [50, 2, 1], [8, 4, 7]]) {
        const flat = Float64Array.from({ length: s * d }, () => values(u));
        const rows = Int32Array.from({ length: s }, (_, a) => 3 * a + 1);
        expect(Array.from(nearestPairs(flat, s, d, kk, rows)), `s ${s}, d ${d}, k ${kk}`).toEqual(bruteForce(flat, s, d, kk, rows));
      }
    });
  }
});
