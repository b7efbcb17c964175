/**
 * The exact ROC curve of a classifier's scores and its thinning for drawing. The curve (Fawcett,
 * "An introduction to ROC analysis", Pattern Recognition Letters 27, 2006, algorithm 1) steps
 * through the distinct scores from the highest down: at each, every row with that score turns
 * positive, so tied rows move the point diagonally, the same ties the AUC's Mann-Whitney count
 * halves. Thinning keeps the vertices of the curve's upper convex hull (the ROC convex hull,
 * Provost & Fawcett 2001, Machine Learning 42) so that the drawn curve's hull is the exact one.
 */
import { sortFloat64 } from './radix-sort.js';

/** The whole curve: rates and the score at each distinct threshold, (0, 0) first (threshold NaN). */
export interface RocCurve {
  fpr: Float64Array;
  tpr: Float64Array;
  /** The score used as threshold at each point (a row is positive when its score is at least it); NaN at (0, 0). */
  score: Float64Array;
  positives: number;
  negatives: number;
}

/**
 * The exact ROC curve of `n` rows: labels `y` in {0, 1}, `score` higher for the positive class
 * (rows whose score is NaN are left out). Both classes present: from (0, 0) to (1, 1), one point
 * per distinct score. One class missing: the diagonal (0, 0), (1, 1). Cost: two sorts of the
 * scores (radix, linear) and one merge.
 */
export function rocCurve(y: Float64Array, score: Float64Array, n: number): RocCurve {
  let np = 0;
  let nn = 0;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(score[i])) continue;
    if (y[i] === 1) np++;
    else nn++;
  }
  if (np === 0 || nn === 0) {
    return {
      fpr: Float64Array.of(0, 1),
      tpr: Float64Array.of(0, 1),
      score: Float64Array.of(Number.NaN, Number.NaN),
      positives: np,
      negatives: nn,
    };
  }
  const pos = new Float64Array(np);
  const neg = new Float64Array(nn);
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(score[i])) continue;
    if (y[i] === 1) pos[a++] = score[i];
    else neg[b++] = score[i];
  }
  sortFloat64(pos);
  sortFloat64(neg);
  return mergeDescending(pos, neg);
}

/** The curve from both classes' scores, each sorted ascending. */
function mergeDescending(pos: Float64Array, neg: Float64Array): RocCurve {
  const np = pos.length;
  const nn = neg.length;
  const size = np + nn + 1;
  const fpr = new Float64Array(size);
  const tpr = new Float64Array(size);
  const score = new Float64Array(size);
  score[0] = Number.NaN;
  let i = np - 1;
  let j = nn - 1;
  let tp = 0;
  let fp = 0;
  let k = 1;
  while (i >= 0 || j >= 0) {
    // The highest score left; every row of either class with it turns positive together.
    const v = j < 0 || (i >= 0 && pos[i] >= neg[j]) ? pos[i] : neg[j];
    while (i >= 0 && pos[i] === v) {
      tp++;
      i--;
    }
    while (j >= 0 && neg[j] === v) {
      fp++;
      j--;
    }
    fpr[k] = fp / nn;
    tpr[k] = tp / np;
    score[k] = v;
    k++;
  }
  return { fpr: fpr.slice(0, k), tpr: tpr.slice(0, k), score: score.slice(0, k), positives: np, negatives: nn };
}

/**
 * Indices of the vertices of the upper convex hull of the curve's points (x = fpr ascending,
 * y = tpr), first and last point included (Andrew's monotone chain, upper half; collinear points
 * left out).
 */
export function upperHull(fpr: Float64Array, tpr: Float64Array): number[] {
  const hull: number[] = [];
  for (let k = 0; k < fpr.length; k++) {
    while (hull.length >= 2) {
      const a = hull[hull.length - 2];
      const b = hull[hull.length - 1];
      // Cross product of (b - a) and (k - a): >= 0 means b is not above the chord a..k.
      const cross = (fpr[b] - fpr[a]) * (tpr[k] - tpr[a]) - (tpr[b] - tpr[a]) * (fpr[k] - fpr[a]);
      if (cross >= 0) hull.pop();
      else break;
    }
    hull.push(k);
  }
  return hull;
}

/** `count` evenly spaced entries of a sorted list of indices, its first and last kept. */
function evenlyOf(list: readonly number[], count: number): number[] {
  if (list.length <= count) return [...list];
  if (count <= 1) return [list[0]];
  const out: number[] = [];
  for (let t = 0; t < count; t++) out.push(list[Math.round((t * (list.length - 1)) / (count - 1))]);
  return out;
}

/** A curve of {@link thinnedRocCurve}: the kept points only. */
export interface ThinnedRocCurve {
  /** Points of the whole curve. */
  points: number;
  /** Index of each kept point in the whole curve, ascending. */
  kept: number[];
  fpr: number[];
  tpr: number[];
  /** Score used as threshold at each kept point (NaN at (0, 0)). */
  score: number[];
  positives: number;
  negatives: number;
}

/**
 * The ROC curve of {@link rocCurve} thinned as {@link thinCurve} thins it (the same points), without
 * holding the whole curve: one walk through the sorted scores counts the points and finds the
 * upper hull, a second emits the kept points. Memory: the sorted scores and the hull, not three
 * arrays of n + 1 points (a file of a million rows saves 24 MB).
 * @param max most points kept (at least 2)
 */
export function thinnedRocCurve(y: Float64Array, score: Float64Array, n: number, max: number): ThinnedRocCurve {
  let np = 0;
  let nn = 0;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(score[i])) continue;
    if (y[i] === 1) np++;
    else nn++;
  }
  if (np === 0 || nn === 0) {
    return { points: 2, kept: [0, 1], fpr: [0, 1], tpr: [0, 1], score: [Number.NaN, Number.NaN], positives: np, negatives: nn };
  }
  const pos = new Float64Array(np);
  const neg = new Float64Array(nn);
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(score[i])) continue;
    if (y[i] === 1) pos[a++] = score[i];
    else neg[b++] = score[i];
  }
  const scratch = new Uint32Array(2 * Math.max(np, nn));
  sortFloat64(pos, scratch);
  sortFloat64(neg, scratch);
  // First walk: the number of points and the upper hull (Andrew's monotone chain, as upperHull).
  const hull: number[] = [0];
  const hx: number[] = [0];
  const hy: number[] = [0];
  let points = 1;
  walk(pos, neg, (fpr, tpr) => {
    while (hull.length >= 2) {
      const k = hull.length - 1;
      const cross = (hx[k] - hx[k - 1]) * (tpr - hy[k - 1]) - (hy[k] - hy[k - 1]) * (fpr - hx[k - 1]);
      if (cross >= 0) {
        hull.pop();
        hx.pop();
        hy.pop();
      } else break;
    }
    hull.push(points);
    hx.push(fpr);
    hy.push(tpr);
    points++;
  });
  const kept = chooseKept(points, hull, max);
  // Second walk: the kept points.
  const out: ThinnedRocCurve = { points, kept, fpr: [0], tpr: [0], score: [Number.NaN], positives: np, negatives: nn };
  let index = 1;
  let next = 1;
  walk(pos, neg, (fpr, tpr, v) => {
    if (next < kept.length && kept[next] === index) {
      out.fpr.push(fpr);
      out.tpr.push(tpr);
      out.score.push(v);
      next++;
    }
    index++;
  });
  return out;
}

/** Calls `visit(fpr, tpr, score)` for each point after (0, 0), from the highest score down (both lists sorted ascending). */
function walk(pos: Float64Array, neg: Float64Array, visit: (fpr: number, tpr: number, score: number) => void): void {
  const np = pos.length;
  const nn = neg.length;
  let i = np - 1;
  let j = nn - 1;
  let tp = 0;
  let fp = 0;
  while (i >= 0 || j >= 0) {
    const v = j < 0 || (i >= 0 && pos[i] >= neg[j]) ? pos[i] : neg[j];
    while (i >= 0 && pos[i] === v) {
      tp++;
      i--;
    }
    while (j >= 0 && neg[j] === v) {
      fp++;
      j--;
    }
    visit(fp / nn, tp / np, v);
  }
}

/**
 * The points of a curve to draw: all of them when at most `max`; otherwise the hull vertices
 * (at most max / 2 of them, thinned evenly beyond) and points evenly spaced along the curve
 * (by index) to fill `max`, in curve order, first and last always kept.
 * @param max at least 2
 * @returns ascending indices into the curve, at most `max`
 */
export function thinCurve(fpr: Float64Array, tpr: Float64Array, max: number): number[] {
  return chooseKept(fpr.length, fpr.length <= max ? [] : upperHull(fpr, tpr), max);
}

/** {@link thinCurve} from the number of points and the hull's vertices. */
function chooseKept(n: number, hull: readonly number[], max: number): number[] {
  if (n <= max) return Array.from({ length: n }, (_, i) => i);
  const keep = new Set<number>(evenlyOf(hull, Math.max(2, Math.floor(max / 2))));
  keep.add(0);
  keep.add(n - 1);
  const room = max - keep.size;
  // Evenly spaced points along the curve; some may coincide with hull vertices, so take a few
  // more rounds with a finer step while room is left (bounded: at most 4 rounds).
  for (let round = 0, want = room; round < 4 && keep.size < max; round++, want *= 2) {
    for (let t = 1; t <= want && keep.size < max; t++) keep.add(Math.round((t * (n - 1)) / (want + 1)));
  }
  return [...keep].sort((u, v) => u - v);
}
