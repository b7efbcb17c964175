import { describe, expect, it } from 'vitest';
import { QrAccumulator } from '../../src/fit/qr-accumulator.js';
import { maxRelDiff, randomProblem, sliceRows } from './helpers.js';

const EPS = Number.EPSILON;

/** Folds rows of X (column-major n x p) in blocks of `block` rows. */
function foldInBlocks(X: Float64Array, y: Float64Array, n: number, p: number, block: number): QrAccumulator {
  const acc = new QrAccumulator(p);
  for (let from = 0; from < n; from += block) {
    const to = Math.min(n, from + block);
    acc.addRows(sliceRows(X, n, p, from, to), y.subarray(from, to), to - from);
  }
  return acc;
}

/** R with each row multiplied by the sign of its diagonal entry (Householder QR is unique up to row signs). */
function signNormalised(R: Float64Array, p: number): Float64Array {
  const out = Float64Array.from(R);
  for (let i = 0; i < p; i++) {
    const s = R[i * p + i] < 0 ? -1 : 1;
    for (let j = 0; j < p; j++) out[j * p + i] *= s;
  }
  return out;
}

describe('QrAccumulator: contract', () => {
  it('starts empty: zero factor, zero rows, rss 0', () => {
    const acc = new QrAccumulator(3);
    expect(acc.p).toBe(3);
    expect(acc.rows).toBe(0);
    expect(Array.from(acc.R)).toEqual(new Array(9).fill(0));
    expect(Array.from(acc.qty)).toEqual([0, 0, 0]);
    expect(acc.rss).toBe(0);
  });

  it('p = 0 accepts rows and sums y^2 into rss', () => {
    const acc = new QrAccumulator(0);
    acc.addRows(new Float64Array(0), new Float64Array([3, 4]), 2);
    expect(acc.rows).toBe(2);
    expect(acc.rss).toBe(25);
    expect(acc.R.length).toBe(0);
  });

  it('adding 0 rows changes nothing', () => {
    const acc = new QrAccumulator(2);
    acc.addRows(new Float64Array(0), new Float64Array(0), 0);
    expect(acc.rows).toBe(0);
    expect(acc.rss).toBe(0);
  });

  it('rejects NaN and infinite values with RangeError naming row and column', () => {
    const acc = new QrAccumulator(2);
    expect(() => acc.addRows(new Float64Array([1, 2, NaN, 4]), new Float64Array([1, 2]), 2)).toThrow(/row 0, column 1/);
    expect(() => acc.addRows(new Float64Array([1, 2, 3, 4]), new Float64Array([1, Infinity]), 2)).toThrow(RangeError);
  });

  it('rejects bad shapes and bad p', () => {
    const acc = new QrAccumulator(2);
    expect(() => acc.addRows(new Float64Array(3), new Float64Array(2), 2)).toThrow(RangeError);
    expect(() => acc.addRows(new Float64Array(4), new Float64Array(1), 2)).toThrow(RangeError);
    expect(() => acc.addRows(new Float64Array(4), new Float64Array(2), -1)).toThrow(RangeError);
    expect(() => new QrAccumulator(1.5)).toThrow(RangeError);
    expect(() => new QrAccumulator(2).merge(new QrAccumulator(3))).toThrow(RangeError);
  });

  it('does not modify its inputs', () => {
    const { X, y } = randomProblem(10, 3, 1);
    const X0 = Float64Array.from(X);
    const y0 = Float64Array.from(y);
    new QrAccumulator(3).addRows(X, y, 10);
    expect(Array.from(X)).toEqual(Array.from(X0));
    expect(Array.from(y)).toEqual(Array.from(y0));
  });

  it('a constant column folds to |R[0,0]| = sqrt(n) * c', () => {
    const acc = new QrAccumulator(1);
    acc.addRows(new Float64Array(16).fill(2), new Float64Array(16), 16);
    expect(Math.abs(acc.R[0])).toBeCloseTo(8, 14);
  });

  it('fewer rows than p leave the rows of R beyond them at zero (up to rounding)', () => {
    const { X, y } = randomProblem(2, 5, 2);
    const acc = new QrAccumulator(5);
    acc.addRows(X, y, 2);
    let below = 0;
    let scale = 0;
    for (let j = 0; j < 5; j++) {
      for (let i = 0; i < 5; i++) {
        const v = Math.abs(acc.R[j * 5 + i]);
        scale = Math.max(scale, v);
        if (i >= 2) below = Math.max(below, v);
      }
    }
    expect(below, `largest entry in rows 2..4: ${below}, scale ${scale}`).toBeLessThan(100 * EPS * scale);
  });
});

describe('QrAccumulator: invariants', () => {
  const n = 40;
  const p = 5;
  const { X, y } = randomProblem(n, p, 7);

  it('R is upper triangular and R^T R = X^T X', () => {
    const acc = foldInBlocks(X, y, n, p, n);
    for (let j = 0; j < p; j++) for (let i = j + 1; i < p; i++) expect(acc.R[j * p + i]).toBe(0);
    for (let a = 0; a < p; a++) {
      for (let b = 0; b < p; b++) {
        let rtr = 0;
        let xtx = 0;
        let scale = 0;
        for (let k = 0; k < p; k++) rtr += acc.R[a * p + k] * acc.R[b * p + k];
        for (let i = 0; i < n; i++) {
          xtx += X[a * n + i] * X[b * n + i];
          scale += Math.abs(X[a * n + i] * X[b * n + i]);
        }
        expect(Math.abs(rtr - xtx), `(R^T R)[${a},${b}] = ${rtr}, (X^T X) = ${xtx}, tol ${50 * n * EPS * scale}`).toBeLessThan(
          50 * n * EPS * scale,
        );
      }
    }
  });

  it('Q R reproduces X and Q has orthonormal columns (row i of Q = qty after folding y = e_i)', () => {
    // Folding the same X with y = e_i gives qty = Q^T e_i, the i-th row of the n x p factor Q1 in X = Q1 R.
    const Q = new Float64Array(n * p);
    let R: Float64Array | undefined;
    for (let i = 0; i < n; i++) {
      const e = new Float64Array(n);
      e[i] = 1;
      const acc = foldInBlocks(X, e, n, p, 7);
      R = acc.R;
      for (let j = 0; j < p; j++) Q[j * n + i] = acc.qty[j];
    }
    const Rf = R as Float64Array;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < p; j++) {
        let qr = 0;
        for (let k = 0; k <= j; k++) qr += Q[k * n + i] * Rf[j * p + k];
        expect(Math.abs(qr - X[j * n + i]), `(QR)[${i},${j}] = ${qr}, X = ${X[j * n + i]}`).toBeLessThan(1e-13);
      }
    }
    for (let a = 0; a < p; a++) {
      for (let b = 0; b < p; b++) {
        let dot = 0;
        for (let i = 0; i < n; i++) dot += Q[a * n + i] * Q[b * n + i];
        expect(Math.abs(dot - (a === b ? 1 : 0)), `(Q^T Q)[${a},${b}] = ${dot}`).toBeLessThan(1e-13);
      }
    }
  });

  it('||qty||^2 + rss = ||y||^2 (the transformation is orthogonal)', () => {
    const acc = foldInBlocks(X, y, n, p, 7);
    let qq = 0;
    for (const v of acc.qty) qq += v * v;
    let yy = 0;
    for (const v of y) yy += v * v;
    expect(Math.abs(qq + acc.rss - yy) / yy, `qty^2 ${qq} + rss ${acc.rss} vs y^2 ${yy}`).toBeLessThan(1e-13);
    expect(acc.rss).toBeGreaterThan(0);
  });

  it('folding in blocks of 1, 7 and all rows gives the same R (up to row signs), qty and rss', () => {
    const all = foldInBlocks(X, y, n, p, n);
    const ref = signNormalised(all.R, p);
    for (const block of [1, 7]) {
      const acc = foldInBlocks(X, y, n, p, block);
      expect(acc.rows).toBe(n);
      const d = maxRelDiff(signNormalised(acc.R, p), ref);
      expect(d, `block ${block}: max rel diff of R ${d}`).toBeLessThan(1e-13);
      const qa = acc.qty.map((v, i) => (acc.R[i * p + i] < 0 ? -v : v));
      const qb = all.qty.map((v, i) => (all.R[i * p + i] < 0 ? -v : v));
      expect(maxRelDiff(qa, qb), `block ${block}: qty`).toBeLessThan(1e-13);
      expect(Math.abs(acc.rss - all.rss) / all.rss, `block ${block}: rss ${acc.rss} vs ${all.rss}`).toBeLessThan(1e-12);
    }
  });

  it('merge of two halves equals folding all rows; merge leaves the other untouched', () => {
    const all = foldInBlocks(X, y, n, p, n);
    const a = new QrAccumulator(p);
    a.addRows(sliceRows(X, n, p, 0, 23), y.subarray(0, 23), 23);
    const b = new QrAccumulator(p);
    b.addRows(sliceRows(X, n, p, 23, n), y.subarray(23), n - 23);
    const bR = Float64Array.from(b.R);
    a.merge(b);
    expect(a.rows).toBe(n);
    expect(maxRelDiff(signNormalised(a.R, p), signNormalised(all.R, p))).toBeLessThan(1e-13);
    expect(Math.abs(a.rss - all.rss) / all.rss).toBeLessThan(1e-12);
    expect(Array.from(b.R)).toEqual(Array.from(bR));
  });

  it('clone is independent of the original', () => {
    const acc = foldInBlocks(X, y, n, p, n);
    const copy = acc.clone();
    copy.addRows(sliceRows(X, n, p, 0, 3), y.subarray(0, 3), 3);
    expect(acc.rows).toBe(n);
    expect(copy.rows).toBe(n + 3);
    expect(maxRelDiff(copy.R, acc.R)).toBeGreaterThan(0);
  });

  it('one call with more rows than the internal block size equals explicit blocks', () => {
    const big = 5000;
    const prob = randomProblem(big, 4, 11);
    const one = foldInBlocks(prob.X, prob.y, big, 4, big);
    const many = foldInBlocks(prob.X, prob.y, big, 4, 333);
    expect(maxRelDiff(signNormalised(one.R, 4), signNormalised(many.R, 4))).toBeLessThan(1e-12);
  });

  it('huge and tiny magnitudes do not overflow or underflow the reflector norm', () => {
    for (const scale of [1e200, 1e-200]) {
      const acc = new QrAccumulator(1);
      acc.addRows(new Float64Array([3 * scale, 4 * scale]), new Float64Array([0, 0]), 2);
      expect(Math.abs(acc.R[0]) / scale, `scale ${scale}`).toBeCloseTo(5, 12);
    }
  });
});

describe('QrAccumulator with tiny columns', () => {
  it('folds and merges columns near 1e-160 without overflow (regression: 1/(beta (beta - alpha)) overflowed)', () => {
    const a = new QrAccumulator(2);
    a.addRows(new Float64Array([1, 1e-160]), new Float64Array([1]), 1);
    a.addRows(new Float64Array([1, 3e-160]), new Float64Array([2]), 1);
    const b = new QrAccumulator(2);
    b.merge(a);
    for (const v of b.R) expect(Number.isFinite(v), `R entry ${v}`).toBe(true);
    for (const v of b.qty) expect(Number.isFinite(v), `qty entry ${v}`).toBe(true);
    // R^T R equals X^T X: the (2,2) entry is (1e-160)^2 + (3e-160)^2 underflows to 0, the (1,1) entry is 2.
    expect(Math.abs(b.R[0])).toBeCloseTo(Math.SQRT2, 14);
  });
});
