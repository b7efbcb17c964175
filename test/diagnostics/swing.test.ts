import { describe, expect, it } from 'vitest';
import {
  excursion,
  inputGrid,
  measureSwing,
  scoreSwing,
  totalVariation,
  type InsideCurve,
  type SwingPlan,
} from '../../src/diagnostics/swing.js';
import { borrowDoubles, returnDoubles, SCRATCH_KEPT } from '../../src/core/scratch.js';
import { predictRows } from '../../src/design/blocks.js';
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
      // Uniform points 9 t equal to gap points 81 k + 9 t (all exact): repeats across the two runs.
      Array.from({ length: 23 }, (_, k) => 81 * k).concat([1800]),
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

  it('keeps none of the arrays it borrows: the result and the inside curves stay the same when the pool lends them again', () => {
    for (const q of [1, 2]) {
      const design = linearDesign(q);
      const n = 1500;
      const inputs = Array.from({ length: q }, (_, c) => Float64Array.from({ length: n }, (_, i) => ((i * (7919 + c * 104)) % 1009) / 7));
      const rows = { inputs, y: Float64Array.from(inputs[0], (v, i) => Math.sin(v) + i / n), rows: n };
      const known: InsideCurve[] = [];
      const swing = measureSwing(design, rows, fitRows(design, rows).coefficients, {}, known);
      expect(known.length).toBe(q);
      const before = structuredClone({ swing, known });
      // Every buffer the pool keeps, lent out again and overwritten.
      const lent = Array.from({ length: SCRATCH_KEPT }, () => borrowDoubles(1));
      for (const a of lent) new Float64Array(a.buffer).fill(Number.NaN);
      expect({ swing, known }).toEqual(before);
      for (const a of lent) returnDoubles(a);
      // The same scan again gives the same figures.
      const again: InsideCurve[] = [];
      expect(measureSwing(design, rows, fitRows(design, rows).coefficients, {}, again)).toEqual(swing);
      expect(again).toEqual(known);
    }
  });

  it("records each whole grid's curve as its length and total variation (the predictions at inputGrid's points)", () => {
    const design = linearDesign(1);
    const x = Float64Array.from({ length: 400 }, (_, i) => ((i * 37) % 101) / 3);
    const rows = { inputs: [x], y: Float64Array.from(x, (v) => v * v), rows: x.length };
    const { coefficients } = fitRows(design, rows);
    const known: InsideCurve[] = [];
    measureSwing(design, rows, coefficients, {}, known);
    const grid = inputGrid(x).inside;
    const curve = predictRows(design, { inputs: [grid], rows: grid.length }, coefficients);
    let variation = 0;
    for (let k = 1; k < curve.length; k++) variation += Math.abs(curve[k] - curve[k - 1]);
    expect(known).toHaveLength(1);
    expect(known[0].points).toBe(grid.length);
    expect(known[0].variation).toBe(variation);
    expect(totalVariation(curve, curve.length)).toBe(variation);
  });
});

describe('swing curve: inside and margin points merged, thinned with the extremes kept', () => {
  // The curve's definition, built here plainly: every point and its prediction merged ascending
  // (a stable sort by x: an inside point before an equal margin point), the first smallest and
  // first largest prediction found by a scan in that order, and the indices round(t (L - 1) /
  // (slots - 1)) plus those two, slots = count - (distinct indices kept), at least 2.
  const reference = (inside: Float64Array, beyond: Float64Array, pin: Float64Array, pout: Float64Array, count: number) => {
    const points = [...Array.from(inside, (x, i) => ({ x, p: pin[i] })), ...Array.from(beyond, (x, i) => ({ x, p: pout[i] }))];
    const merged = points.map((q, order) => ({ ...q, order })).sort((a, b) => (a.x < b.x ? -1 : a.x > b.x ? 1 : a.order - b.order));
    let imin = 0;
    let imax = 0;
    merged.forEach((q, i) => {
      if (q.p < merged[imin].p) imin = i;
      if (q.p > merged[imax].p) imax = i;
    });
    let keep = merged.map((_, i) => i);
    if (merged.length > count) {
      const chosen = new Set([imax, imin]);
      const slots = Math.max(2, count - chosen.size);
      for (let t = 0; t < slots; t++) chosen.add(Math.round((t * (merged.length - 1)) / (slots - 1)));
      keep = [...chosen].sort((a, b) => a - b);
    }
    return { x: keep.map((i) => merged[i].x), prediction: keep.map((i) => merged[i].p) };
  };
  const design = linearDesign(1);
  const plan = (inside: number[], beyond: number[], maxCurvePoints: number): SwingPlan => ({
    band: [0, 1],
    medians: [0],
    grids: [{ input: 0, inside: Float64Array.from(inside), beyond: Float64Array.from(beyond) }],
    segmentColumns: null,
    segments: null,
    margin: 0.1,
    maxCurvePoints,
    maxCurves: 12,
  });
  const even = (from: number, to: number, m: number): number[] => Array.from({ length: m }, (_, t) => from + ((to - from) * t) / (m - 1));
  const cases: Array<{ name: string; inside: number[]; beyond: number[]; coefficients: number[]; count: number }> = [
    { name: 'a rising line', inside: even(0, 1, 900), beyond: [-0.1, -0.05, 1.05, 1.1], coefficients: [0, 1], count: 100 },
    { name: 'a falling line, few points', inside: even(0, 1, 30), beyond: [-0.1, 1.1], coefficients: [1, -2], count: 400 },
    // Margin points equal to the range's ends (a range of a few ulps): inside first.
    {
      name: 'margins equal to the ends',
      inside: [1e8, 1e8 + 1.5e-8, 1e8 + 3e-8],
      beyond: [1e8, 1e8 + 3e-8],
      coefficients: [0, 1],
      count: 3,
    },
    {
      name: 'a flat curve (first of equal extremes)',
      inside: even(-1, 1, 500),
      beyond: [-1.2, -1.1, 1.1, 1.2],
      coefficients: [5, 0],
      count: 50,
    },
    { name: 'no predictions (NaN)', inside: even(0, 1, 300), beyond: [-0.1, 1.1], coefficients: [Number.NaN, 1], count: 40 },
    // 0 x Infinity: one NaN amid the inside points, infinite extremes equal across the two runs.
    { name: 'a NaN amid infinities', inside: even(-1, 1, 501), beyond: [-1.2, 1.2], coefficients: [0, Infinity], count: 60 },
    {
      name: 'wide margins, extremes in them',
      inside: even(-1, 1, 700),
      beyond: even(-1.5, -1.05, 20).concat(even(1.05, 1.5, 20)),
      coefficients: [0, 1],
      count: 25,
    },
  ];
  for (const c of cases) {
    it(`${c.name}: the points and predictions of the definition`, () => {
      const swingPlan = plan(c.inside, c.beyond, c.count);
      const grid = swingPlan.grids[0];
      const predict = (xs: Float64Array): Float64Array => predictRows(design, { inputs: [xs], rows: xs.length }, c.coefficients);
      const curve = scoreSwing(swingPlan, design, c.coefficients).curves[0];
      const expected = reference(grid.inside, grid.beyond, predict(grid.inside), predict(grid.beyond), c.count);
      expect(curve.x).toEqual(expected.x);
      expect(curve.prediction).toEqual(expected.prediction);
      expect(curve.x.length).toBeLessThanOrEqual(Math.max(c.count, 4));
      // The worst point inside: the first with the largest excursion max(0, p - 1, 0 - p) / 1 (NaN: Infinity).
      const pin = predict(grid.inside);
      const excursions = Array.from(pin, (p) => (Number.isNaN(p) ? Infinity : Math.max(0, p - 1, -p)));
      const worst = excursions.indexOf(Math.max(...excursions));
      const swing = scoreSwing(swingPlan, design, c.coefficients);
      expect(swing.inside).toBe(excursions[worst]);
      expect(swing.worstInside).toEqual({ inputs: { x1: grid.inside[worst] }, prediction: pin[worst] });
    });
  }
});
