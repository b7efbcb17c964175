/**
 * Figures of a binary classifier's probabilities against 0/1 labels: log-loss, Brier score,
 * accuracy at a threshold, ROC AUC (Mann-Whitney, ties counted half), class counts, and the
 * logistic recalibration (calibration intercept and slope, Cox 1958).
 */
import { rowDeviance } from '../fit/logistic.js';
import { sortFloat64 } from './radix-sort.js';

/** The figures of one set of rows. */
export interface ClassificationFigures {
  rows: number;
  positives: number;
  negatives: number;
  /** Mean of -[y log p + (1 - y) log(1 - p)], from the linear predictor (no clipping needed). */
  logLoss: number;
  /** Mean of (p - y)^2 (Brier 1950, Monthly Weather Review 78(1)). */
  brier: number;
  /** Share of rows with (p >= threshold) equal to y. */
  accuracy: number;
  /** Area under the ROC curve; NaN when one class is absent. */
  auc: number;
}

/** p = 1 / (1 + exp(-eta)) for every entry. */
export function probabilities(eta: Float64Array): Float64Array {
  const out = new Float64Array(eta.length);
  for (let i = 0; i < eta.length; i++) out[i] = 1 / (1 + Math.exp(-eta[i]));
  return out;
}

/**
 * The figures of rows with labels y (0/1), linear predictors eta and probabilities p.
 * @param threshold a row is predicted positive when p >= threshold
 */
export function classificationFigures(
  y: Float64Array,
  eta: Float64Array,
  p: Float64Array,
  n: number,
  threshold: number,
): ClassificationFigures {
  let dev = 0;
  let brier = 0;
  let correct = 0;
  let positives = 0;
  for (let i = 0; i < n; i++) {
    const yi = y[i];
    dev += rowDeviance(eta[i], yi);
    const d = p[i] - yi;
    brier += d * d;
    if ((p[i] >= threshold ? 1 : 0) === yi) correct += 1;
    positives += yi;
  }
  return {
    rows: n,
    positives,
    negatives: n - positives,
    logLoss: dev / 2 / n,
    brier: brier / n,
    accuracy: correct / n,
    auc: rocAuc(y, p, n),
  };
}

/**
 * ROC AUC as the Mann-Whitney statistic: the share of (positive, negative) pairs in which the
 * positive scores higher, ties counted one half (Hanley & McNeil 1982, Radiology 143(1); equal to
 * the trapezoidal area under the ROC curve). NaN when either class is absent.
 */
export function rocAuc(y: Float64Array, score: Float64Array, n: number): number {
  let np = 0;
  for (let i = 0; i < n; i++) np += y[i];
  const nn = n - np;
  if (np === 0 || nn === 0) return Number.NaN;
  const pos = new Float64Array(np);
  const neg = new Float64Array(nn);
  let a = 0;
  let b = 0;
  for (let i = 0; i < n; i++) {
    if (y[i] === 1) pos[a++] = score[i];
    else neg[b++] = score[i];
  }
  sortFloat64(pos);
  sortFloat64(neg);
  return pairsAbove(pos, neg) / np / nn;
}

/** Sum over positives of (negatives below it + half the negatives equal to it), both sorted ascending. */
function pairsAbove(pos: Float64Array, neg: Float64Array): number {
  let below = 0;
  let equalEnd = 0;
  let total = 0;
  for (let i = 0; i < pos.length; i++) {
    const v = pos[i];
    while (below < neg.length && neg[below] < v) below++;
    if (equalEnd < below) equalEnd = below;
    while (equalEnd < neg.length && neg[equalEnd] === v) equalEnd++;
    total += below + (equalEnd - below) / 2;
  }
  return total;
}

/** Logistic recalibration of rows: logit P(y = 1) = a + b * eta. */
export interface Calibration {
  /** a: 0 for a model calibrated in the large. */
  intercept: number;
  /** b: 1 for a calibrated model; below 1, predictions too extreme (overfitting). */
  slope: number;
  /** True when Newton's method met its stopping rule. */
  converged: boolean;
}

/**
 * Calibration intercept and slope (Cox 1958, Biometrika 45(3-4), "Two further applications of a
 * model for binary regression"): the unpenalised logistic regression of y on the model's linear
 * predictor eta = logit p, by Newton's method on the two parameters with step halving, stopping
 * when a step lowers the deviance by at most 1e-12 relative (at most 100 steps). NaN when a class
 * is absent or eta is constant (the slope is then not identified); a separated recalibration
 * (perfect ranking) gives the large values its steps reach, flagged `converged: false`.
 */
export function calibration(y: Float64Array, eta: Float64Array, n: number): Calibration {
  let positives = 0;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < n; i++) {
    positives += y[i];
    if (eta[i] < lo) lo = eta[i];
    if (eta[i] > hi) hi = eta[i];
  }
  if (positives === 0 || positives === n || !(hi > lo)) return { intercept: Number.NaN, slope: Number.NaN, converged: false };
  let a = Math.log(positives / (n - positives));
  let b = 0;
  let dev = twoParameterDeviance(y, eta, n, a, b);
  for (let iter = 0; iter < 100; iter++) {
    // Gradient and Hessian of the log-likelihood in (a, b).
    let g0 = 0;
    let g1 = 0;
    let h00 = 0;
    let h01 = 0;
    let h11 = 0;
    for (let i = 0; i < n; i++) {
      const e = eta[i];
      const pr = 1 / (1 + Math.exp(-(a + b * e)));
      const r = y[i] - pr;
      const w = pr * (1 - pr);
      g0 += r;
      g1 += r * e;
      h00 += w;
      h01 += w * e;
      h11 += w * e * e;
    }
    const det = h00 * h11 - h01 * h01;
    if (!(det > 0)) return { intercept: a, slope: b, converged: false };
    let da = (h11 * g0 - h01 * g1) / det;
    let db = (h00 * g1 - h01 * g0) / det;
    let next = twoParameterDeviance(y, eta, n, a + da, b + db);
    let halvings = 0;
    while (!(next <= dev + 1e-13 * Math.abs(dev)) && halvings < 40) {
      da /= 2;
      db /= 2;
      next = twoParameterDeviance(y, eta, n, a + da, b + db);
      halvings++;
    }
    if (halvings >= 40) return { intercept: a, slope: b, converged: false };
    a += da;
    b += db;
    const decrease = dev - next;
    dev = next;
    if (decrease <= 1e-12 * (Math.abs(dev) + 0.1)) return { intercept: a, slope: b, converged: true };
  }
  return { intercept: a, slope: b, converged: false };
}

function twoParameterDeviance(y: Float64Array, eta: Float64Array, n: number, a: number, b: number): number {
  let dev = 0;
  for (let i = 0; i < n; i++) dev += rowDeviance(a + b * eta[i], y[i]);
  return dev;
}

/** One bin of a calibration diagram. */
export interface CalibrationBin {
  /** Bin range of predicted probabilities [from, to). */
  from: number;
  to: number;
  /** Rows in the bin. */
  count: number;
  /** Mean predicted probability of its rows (NaN when empty). */
  predicted: number;
  /** Share of positives among its rows (NaN when empty). */
  observed: number;
}

/**
 * Calibration diagram (reliability diagram; DeGroot & Fienberg 1983, The Statistician 32):
 * `bins` equal-width bins of the predicted probability, each with its count, mean prediction and
 * observed share of positives (the last bin includes 1).
 */
export function calibrationBins(y: Float64Array, p: Float64Array, n: number, bins = 10): CalibrationBin[] {
  const count = new Float64Array(bins);
  const sumP = new Float64Array(bins);
  const sumY = new Float64Array(bins);
  for (let i = 0; i < n; i++) {
    const b = Math.min(bins - 1, Math.floor(p[i] * bins));
    count[b] += 1;
    sumP[b] += p[i];
    sumY[b] += y[i];
  }
  return Array.from(count, (c, b) => ({
    from: b / bins,
    to: (b + 1) / bins,
    count: c,
    predicted: c > 0 ? sumP[b] / c : Number.NaN,
    observed: c > 0 ? sumY[b] / c : Number.NaN,
  }));
}

/**
 * Points of the ROC curve (false positive rate, true positive rate) for drawing: the rates at the
 * thresholds t = 1 - k / max (k = 0 .. max; a row counts positive when p >= t), from (0, 0) to
 * (1, 1), counted in one pass over the rows (exact at those thresholds).
 */
export function rocPoints(y: Float64Array, p: Float64Array, n: number, max = 50): { fpr: number[]; tpr: number[] } {
  const pos = new Float64Array(max + 1);
  const neg = new Float64Array(max + 1);
  let positives = 0;
  for (let i = 0; i < n; i++) {
    // Bin k holds p in [1 - k/max, 1 - (k-1)/max): the rows first counted at threshold index k.
    const k = Math.min(max, Math.max(0, Math.ceil((1 - p[i]) * max)));
    if (y[i] === 1) {
      pos[k] += 1;
      positives += 1;
    } else {
      neg[k] += 1;
    }
  }
  const negatives = n - positives;
  if (positives === 0 || negatives === 0) return { fpr: [0, 1], tpr: [0, 1] };
  const fpr = [0];
  const tpr = [0];
  let tp = 0;
  let fp = 0;
  for (let k = 0; k <= max; k++) {
    tp += pos[k];
    fp += neg[k];
    fpr.push(fp / negatives);
    tpr.push(tp / positives);
  }
  return { fpr, tpr };
}
