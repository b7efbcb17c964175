/**
 * The k nearest neighbours of every point of a small set (the swing scan's sampled rows), exactly
 * as a search over all pairs finds them, through a k-d tree (Bentley, "Multidimensional binary
 * search trees used for associative searching", Communications of the ACM 18(9), 1975).
 */

/** Points per leaf of the tree. */
const LEAF_SIZE = 8;

/** A k-d tree over point indices: node n splits `idx[lo..hi)` at `mid` on `dim` (a leaf when dim < 0). */
interface Tree {
  /** Point indices, grouped by node. */
  idx: Int32Array;
  /** Per node: first and end position in idx, split position, split dimension (-1: leaf), split value. */
  lo: Int32Array;
  hi: Int32Array;
  mid: Int32Array;
  dim: Int32Array;
  value: Float64Array;
  /** Per node: children (-1 for a leaf). */
  left: Int32Array;
  right: Int32Array;
}

/**
 * Pairs (row, neighbour) of each point and its `kk` nearest other points by squared Euclidean
 * distance, summed over the coordinates in order (exact duplicates, distance 0, are skipped;
 * equal distances: the lower index first).
 *
 * The search descends the tree to the point's own leaf first and visits a subtree on the other
 * side of a split only when the distance to the split plane, squared, is at most the k-th best
 * distance so far: every point there is at least that far in that coordinate alone, and a sum of
 * squares is at least any of its terms (in floating point too, as rounding is monotone). So the
 * result is the result of the search over all s x s pairs.
 *
 * @param flat coordinates, row-major: flat[a * d + c]
 * @param s points
 * @param d coordinates per point
 * @param kk neighbours per point (at most s - 1)
 * @param rows the training row of each point
 * @returns flat pairs [row, neighbour, row, neighbour, ...] of training rows, points in order and
 *   each point's neighbours nearest first
 */
export function nearestPairs(flat: Float64Array, s: number, d: number, kk: number, rows: Int32Array): Int32Array {
  const pairs = new Int32Array(2 * s * Math.max(kk, 0));
  if (s < 2 || kk < 1 || d < 1) return pairs.subarray(0, 0);
  const tree = buildTree(flat, s, d);
  let count = 0;
  const best = new Float64Array(kk);
  const bestIdx = new Int32Array(kk);
  for (let a = 0; a < s; a++) {
    best.fill(Infinity);
    bestIdx.fill(-1);
    searchTree(tree, 0, flat, d, a, kk, best, bestIdx);
    for (let t = 0; t < kk; t++) {
      if (bestIdx[t] < 0) continue;
      pairs[count++] = rows[a];
      pairs[count++] = rows[bestIdx[t]];
    }
  }
  return pairs.subarray(0, count);
}

/** Builds the tree: each node splits its points at the median of its widest coordinate. */
function buildTree(flat: Float64Array, s: number, d: number): Tree {
  const capacity = 2 * Math.ceil(s / (LEAF_SIZE / 2)) + 1;
  const tree: Tree = {
    idx: Int32Array.from({ length: s }, (_, a) => a),
    lo: new Int32Array(capacity),
    hi: new Int32Array(capacity),
    mid: new Int32Array(capacity),
    dim: new Int32Array(capacity),
    value: new Float64Array(capacity),
    left: new Int32Array(capacity),
    right: new Int32Array(capacity),
  };
  let nodes = 0;
  const make = (lo: number, hi: number): number => {
    const node = nodes++;
    tree.lo[node] = lo;
    tree.hi[node] = hi;
    tree.left[node] = -1;
    tree.right[node] = -1;
    tree.dim[node] = -1;
    if (hi - lo <= LEAF_SIZE) return node;
    const c = widestCoordinate(flat, d, tree.idx, lo, hi);
    if (c < 0) return node; // every point equal: a leaf
    const mid = (lo + hi) >> 1;
    selectByCoordinate(flat, d, c, tree.idx, lo, hi, mid);
    tree.dim[node] = c;
    tree.mid[node] = mid;
    tree.value[node] = flat[tree.idx[mid] * d + c];
    tree.left[node] = make(lo, mid);
    tree.right[node] = make(mid, hi);
    return node;
  };
  make(0, s);
  return tree;
}

/** The coordinate with the widest range over idx[lo..hi), or -1 when every range is 0. */
function widestCoordinate(flat: Float64Array, d: number, idx: Int32Array, lo: number, hi: number): number {
  let bestDim = -1;
  let bestWidth = 0;
  for (let c = 0; c < d; c++) {
    let min = Infinity;
    let max = -Infinity;
    for (let t = lo; t < hi; t++) {
      const v = flat[idx[t] * d + c];
      if (v < min) min = v;
      if (v > max) max = v;
    }
    if (max - min > bestWidth) {
      bestWidth = max - min;
      bestDim = c;
    }
  }
  return bestDim;
}

/**
 * Reorders idx[lo..hi) so that idx[k] holds the point whose coordinate c has rank k - lo, points
 * before it no greater and points after it no smaller in that coordinate (Hoare's selection).
 */
function selectByCoordinate(flat: Float64Array, d: number, c: number, idx: Int32Array, lo: number, hi: number, k: number): void {
  let l = lo;
  let r = hi - 1;
  while (r > l) {
    const pivot = flat[idx[(l + r) >> 1] * d + c];
    let i = l;
    let j = r;
    while (i <= j) {
      while (flat[idx[i] * d + c] < pivot) i++;
      while (flat[idx[j] * d + c] > pivot) j--;
      if (i <= j) {
        const t = idx[i];
        idx[i] = idx[j];
        idx[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) r = j;
    else if (k >= i) l = i;
    else return;
  }
}

/**
 * The k nearest points of point a within `node`'s subtree, merged into best (distances) and
 * bestIdx (points), nearest first: the side of each split that holds a first, the other side only
 * when the squared distance to the split can still be at most the k-th best. Points equal to the
 * split value may sit on either side, so a gap of 0 visits both.
 */
function searchTree(
  tree: Tree,
  node: number,
  flat: Float64Array,
  d: number,
  a: number,
  kk: number,
  best: Float64Array,
  bestIdx: Int32Array,
): void {
  const c = tree.dim[node];
  if (c < 0) {
    for (let t = tree.lo[node]; t < tree.hi[node]; t++) {
      const b = tree.idx[t];
      if (b !== a) considerNeighbour(flat, d, a, b, kk, best, bestIdx);
    }
    return;
  }
  const diff = flat[a * d + c] - tree.value[node];
  searchTree(tree, diff < 0 ? tree.left[node] : tree.right[node], flat, d, a, kk, best, bestIdx);
  if (diff * diff <= best[kk - 1]) searchTree(tree, diff < 0 ? tree.right[node] : tree.left[node], flat, d, a, kk, best, bestIdx);
}

/**
 * Puts point b into point a's list of the kk nearest (sorted by distance, then index) when it
 * belongs there; the distance is summed over the coordinates in order, as the list's entries were.
 */
function considerNeighbour(flat: Float64Array, d: number, a: number, b: number, kk: number, best: Float64Array, bestIdx: Int32Array): void {
  const limit = best[kk - 1];
  const ra = a * d;
  const rb = b * d;
  let dist = 0;
  // Partial sums only grow: once one passes the k-th best, the point cannot enter.
  for (let c = 0; c < d && dist <= limit; c++) {
    const t = flat[ra + c] - flat[rb + c];
    dist += t * t;
  }
  if (dist === 0 || dist > limit || (dist === limit && b > bestIdx[kk - 1])) return;
  let pos = kk - 1;
  while (pos > 0 && (best[pos - 1] > dist || (best[pos - 1] === dist && bestIdx[pos - 1] > b))) {
    best[pos] = best[pos - 1];
    bestIdx[pos] = bestIdx[pos - 1];
    pos--;
  }
  best[pos] = dist;
  bestIdx[pos] = b;
}
