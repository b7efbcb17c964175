// The exact ROC curve (diagnostics/roc-curve.ts) on small hand-worked cases, its area against the
// Mann-Whitney AUC, and its thinning for drawing (bounded, hull kept).
import { describe, expect, it } from 'vitest';
import { rocAuc } from '../../src/diagnostics/classification-metrics.js';
import { seededRandom } from '../../src/diagnostics/random.js';
import { rocCurve, thinCurve, thinnedRocCurve, upperHull } from '../../src/diagnostics/roc-curve.js';
import { rocCurveData } from '../../src/run/classifier-chart-data.js';

const f64 = (xs: number[]) => Float64Array.from(xs);

function area(fpr: ArrayLike<number>, tpr: ArrayLike<number>): number {
  let a = 0;
  for (let k = 1; k < fpr.length; k++) a += ((fpr[k] - fpr[k - 1]) * (tpr[k] + tpr[k - 1])) / 2;
  return a;
}

describe('rocCurve', () => {
  it('steps through the distinct scores from the highest, worked by hand', () => {
    // Scores 0.9 (pos), 0.8 (neg), 0.7 (pos), 0.6 (pos), 0.2 (neg): 3 positives, 2 negatives.
    const c = rocCurve(f64([1, 0, 1, 1, 0]), f64([0.9, 0.8, 0.7, 0.6, 0.2]), 5);
    expect(Array.from(c.fpr)).toEqual([0, 0, 0.5, 0.5, 0.5, 1]);
    expect(Array.from(c.tpr)).toEqual([0, 1 / 3, 1 / 3, 2 / 3, 1, 1]);
    expect(Array.from(c.score).slice(1)).toEqual([0.9, 0.8, 0.7, 0.6, 0.2]);
    expect(Number.isNaN(c.score[0])).toBe(true);
    // Area 4/6: of the 6 (positive, negative) pairs, 4 are ordered right (0.9 > 0.8, 0.9 / 0.7 / 0.6 > 0.2).
    expect(area(c.fpr, c.tpr)).toBeCloseTo(4 / 6, 15);
  });

  it('takes tied scores together (a diagonal step), whose area is the Mann-Whitney count with ties halved', () => {
    const y = f64([1, 0, 1, 0, 0]);
    const s = f64([0.5, 0.5, 0.5, 0.1, 0.9]);
    const c = rocCurve(y, s, 5);
    expect(Array.from(c.fpr)).toEqual([0, 1 / 3, 2 / 3, 1]);
    expect(Array.from(c.tpr)).toEqual([0, 0, 1, 1]);
    expect(area(c.fpr, c.tpr)).toBeCloseTo(rocAuc(y, s, 5), 15);
  });

  it('has the AUC as its area on random data with many ties, and one class gives the diagonal', () => {
    const random = seededRandom(5);
    const n = 5000;
    const y = new Float64Array(n);
    const s = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      s[i] = Math.round(random() * 40) / 40;
      y[i] = random() < s[i] ? 1 : 0;
    }
    const c = rocCurve(y, s, n);
    expect(c.fpr.length).toBeLessThanOrEqual(42);
    expect(Math.abs(area(c.fpr, c.tpr) - rocAuc(y, s, n))).toBeLessThan(1e-12);
    const one = rocCurve(f64([1, 1]), f64([0.2, 0.3]), 2);
    expect(Array.from(one.fpr)).toEqual([0, 1]);
    expect(Array.from(one.tpr)).toEqual([0, 1]);
  });

  it('thins a curve with ties in two walks to the same points as the whole curve thinned', () => {
    const random = seededRandom(21);
    const n = 30000;
    const y = new Float64Array(n);
    const s = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      s[i] = Math.round(random() * 2000) / 2000;
      y[i] = random() < s[i] ? 1 : 0;
    }
    const c = rocCurve(y, s, n);
    const walked = thinnedRocCurve(y, s, n, 120);
    expect(walked.points).toBe(c.fpr.length);
    expect(walked.kept).toEqual(thinCurve(c.fpr, c.tpr, 120));
    expect(walked.tpr).toEqual(walked.kept.map((k) => c.tpr[k]));
  });

  it('leaves out rows whose score is NaN', () => {
    const c = rocCurve(f64([1, 0, 1]), f64([0.9, Number.NaN, 0.1]), 3);
    expect(c.positives).toBe(2);
    expect(c.negatives).toBe(0);
  });
});

describe('upperHull and thinCurve', () => {
  it('finds the vertices of the upper convex hull', () => {
    // (0,0) (0,0.5) (0.25,0.6) (0.5,1) (1,1): (0.25, 0.6) lies under the chord (0,0.5)-(0.5,1).
    expect(upperHull(f64([0, 0, 0.25, 0.5, 1]), f64([0, 0.5, 0.6, 1, 1]))).toEqual([0, 1, 3, 4]);
  });

  it('keeps every point of a short curve, and thins a long one to the budget keeping every hull vertex', () => {
    expect(thinCurve(f64([0, 0.5, 1]), f64([0, 0.7, 1]), 300)).toEqual([0, 1, 2]);
    const random = seededRandom(9);
    const n = 200000;
    const y = new Float64Array(n);
    const s = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      s[i] = random() * 6 - 3;
      y[i] = random() < 1 / (1 + Math.exp(-s[i])) ? 1 : 0;
    }
    const c = rocCurve(y, s, n);
    expect(c.fpr.length).toBe(n + 1);
    const keep = thinCurve(c.fpr, c.tpr, 300);
    expect(keep.length).toBeLessThanOrEqual(300);
    expect(keep.length).toBeGreaterThan(250);
    expect(keep[0]).toBe(0);
    expect(keep[keep.length - 1]).toBe(n);
    for (let k = 1; k < keep.length; k++) expect(keep[k]).toBeGreaterThan(keep[k - 1]);
    const hull = upperHull(c.fpr, c.tpr);
    if (hull.length <= 150) for (const v of hull) expect(keep).toContain(v);
    // The drawn curve's area is within a hair of the exact one.
    const drawn = area(
      keep.map((k) => c.fpr[k]),
      keep.map((k) => c.tpr[k]),
    );
    expect(Math.abs(drawn - rocAuc(y, s, n))).toBeLessThan(2e-3);
    // Thinned in two walks without the whole curve: the same points.
    const walked = thinnedRocCurve(y, s, n, 300);
    expect(walked.points).toBe(n + 1);
    expect(walked.kept).toEqual(keep);
    expect(walked.fpr).toEqual(keep.map((k) => c.fpr[k]));
    expect(walked.tpr).toEqual(keep.map((k) => c.tpr[k]));
    expect(walked.score.slice(1)).toEqual(keep.slice(1).map((k) => c.score[k]));
    // The chart data: the same bound, probabilities as thresholds, the hull of the kept points.
    const data = rocCurveData(y, s, n);
    expect(data.fpr.length).toBe(keep.length);
    expect(data.thinned).toBe(true);
    expect(data.points).toBe(n + 1);
    expect(data.threshold[0]).toBeNull();
    expect(data.threshold[1]).toBeGreaterThan(0.9);
    expect(data.hull[0]).toBe(0);
    expect(data.hull[data.hull.length - 1]).toBe(keep.length - 1);
  });
});
