/**
 * The figures the HTML report draws for a binary classifier, computed once in the pipeline so
 * that reporters never compute: the ROC curves of the training and hold-out rows (exact, thinned
 * keeping the convex hull), the calibration diagrams of both files, the rows as points at 0 and
 * 1 (thinned evenly as regression points are), and the predicted probability along each input
 * with the other inputs at their training medians (as the regression partial curves). Every list
 * is bounded (see result/classifier-chart-types.ts) and every number finite or null.
 */
import type { ModelData } from '../data/model-data.js';
import { predictRows } from '../design/blocks.js';
import { range } from '../design/stats.js';
import { columnMedian } from '../diagnostics/column-median.js';
import { thinnedRocCurve, upperHull } from '../diagnostics/roc-curve.js';
import { CURVE_MARGIN, CURVE_POINTS, MAX_CHART_POINTS, MAX_PARTIAL_CURVES } from '../result/chart-types.js';
import {
  CALIBRATION_BINS,
  ROC_MAX_POINTS,
  type CalibrationBinData,
  type ClassifierChartData,
  type ClassifierPoints,
  type ProbabilityCurveData,
  type RocCurveData,
} from '../result/classifier-chart-types.js';
import { chartNumber, partialCurvePoints, seriesPoints, thinRows } from './chart-data.js';
import type { FittedClassifier } from './fit-classifier.js';

/** The ROC curve of one file's rows for drawing (scores: the logits, whose order is the probabilities'). */
export function rocCurveData(y: Float64Array, eta: Float64Array, rows: number, max = ROC_MAX_POINTS): RocCurveData {
  const curve = thinnedRocCurve(y, eta, rows, Math.max(2, max));
  return {
    rows,
    positives: curve.positives,
    negatives: curve.negatives,
    points: curve.points,
    thinned: curve.kept.length < curve.points,
    fpr: curve.fpr.map((v) => chartNumber(v) ?? 0),
    tpr: curve.tpr.map((v) => chartNumber(v) ?? 0),
    threshold: curve.score.map((v) => (Number.isNaN(v) ? null : chartNumber(1 / (1 + Math.exp(-v))))),
    hull: hullOfKept(curve.fpr, curve.tpr),
  };
}

/** Indices of the kept points on the upper hull of the kept points (the whole curve's hull when it was kept whole). */
function hullOfKept(fpr: number[], tpr: number[]): number[] {
  return upperHull(Float64Array.from(fpr), Float64Array.from(tpr));
}

/**
 * The calibration diagram of one file ({@link CALIBRATION_BINS} equal-width bins of p = 1 / (1 +
 * exp(-eta)), as diagnostics/classification-metrics.ts calibrationBins bins them), from the
 * logits without a second array of probabilities.
 */
function calibrationData(y: Float64Array, eta: Float64Array, rows: number): CalibrationBinData[] {
  const bins = CALIBRATION_BINS;
  const count = new Float64Array(bins);
  const sumP = new Float64Array(bins);
  const sumY = new Float64Array(bins);
  for (let i = 0; i < rows; i++) {
    const p = 1 / (1 + Math.exp(-eta[i]));
    const b = Math.min(bins - 1, Math.floor(p * bins));
    count[b] += 1;
    sumP[b] += p;
    sumY[b] += y[i];
  }
  return Array.from(count, (c, b) => ({
    from: b / bins,
    to: (b + 1) / bins,
    count: c,
    predicted: c > 0 ? chartNumber(sumP[b] / c) : null,
    observed: c > 0 ? chartNumber(sumY[b] / c) : null,
  }));
}

/** The rows of one file as points, thinned evenly (seriesPoints of chart-data.ts). */
function points(data: ModelData, eta: Float64Array, max: number): ClassifierPoints {
  const keep = thinRows(data.rows, seriesPoints(data.inputs.length, max));
  const thinned = keep.length < data.rows;
  return {
    rows: data.rows,
    shown: keep.length,
    thinned,
    thinning: thinned ? `${keep.length} of ${data.rows} rows, evenly spaced through the file` : '',
    lines: Array.from(keep, (i) => data.lines[i]),
    x: data.inputs.map((col) => Array.from(keep, (i) => chartNumber(col[i]))),
    label: Array.from(keep, (i) => (data.y[i] === 1 ? 1 : 0)),
    probability: Array.from(keep, (i) => chartNumber(1 / (1 + Math.exp(-eta[i])))),
  };
}

/**
 * Builds the chart data of one fitted classifier.
 * Cost: two sorts of each file's logits (ROC), one pass over each file for the calibration bins,
 * the training medians of the inputs, and at most {@link CURVE_POINTS} predictions per curve.
 * @param model the fitted classifier (design, coefficients, rows, logits, labels)
 * @param maxPoints most points per file; default MAX_CHART_POINTS (fewer for many inputs)
 */
export function buildClassifierChartData(model: FittedClassifier, maxPoints = MAX_CHART_POINTS): ClassifierChartData {
  const { design, fit, descriptor } = model.context;
  const { train, holdout, trainEta, holdoutEta } = model;
  const inputs = [...design.inputs];
  const medians = train.inputs.map((col) => columnMedian(col, train.rows));
  const spread: number[] = [];
  for (let c = 0; c < inputs.length; c++) {
    const [lo, hi] = range(train.inputs[c], train.rows);
    if (hi > lo) spread.push(c);
  }
  const shown = spread.slice(0, MAX_PARTIAL_CURVES);
  const gridPoints = inputs.length === 1 ? CURVE_POINTS : partialCurvePoints(shown.length);
  const curves: ProbabilityCurveData[] = [];
  for (const c of shown) {
    const [tlo, thi] = range(train.inputs[c], train.rows);
    const lo = tlo - CURVE_MARGIN * (thi - tlo);
    const hi = thi + CURVE_MARGIN * (thi - tlo);
    // A category input is drawn at its level codes only (no margins, no points between levels).
    const discrete = design.terms.find((t) => t.discreteValues !== undefined && t.inputs.includes(inputs[c]))?.discreteValues;
    const points = discrete?.length ?? gridPoints;
    const grid = new Float64Array(points);
    if (discrete !== undefined) grid.set(discrete);
    else for (let t = 0; t < points; t++) grid[t] = t === points - 1 ? hi : lo + ((hi - lo) * t) / (points - 1);
    const columns = inputs.map((_, k) => (k === c ? grid : new Float64Array(points).fill(medians[k])));
    const eta = predictRows(design, { inputs: columns, rows: points }, fit.coefficients);
    const x: number[] = [];
    const p: (number | null)[] = [];
    for (let t = 0; t < points; t++) {
      const xt = chartNumber(grid[t]);
      if (xt === null || (x.length > 0 && xt === x[x.length - 1])) continue;
      x.push(xt);
      p.push(chartNumber(1 / (1 + Math.exp(-eta[t]))));
    }
    // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
    const others: Record<string, number> = Object.create(null);
    inputs.forEach((name, k) => {
      if (k !== c) others[name] = chartNumber(medians[k]) ?? 0;
    });
    curves.push({ input: inputs[c], others, range: [chartNumber(tlo) ?? tlo, chartNumber(thi) ?? thi], x, p });
  }
  return {
    target: descriptor.data.target,
    positive: model.labels.positive,
    negative: model.labels.negative,
    threshold: descriptor.fit.threshold ?? 0.5,
    inputs,
    roc: { train: rocCurveData(train.y, trainEta, train.rows), holdout: rocCurveData(holdout.y, holdoutEta, holdout.rows) },
    calibration: {
      train: calibrationData(train.y, trainEta, train.rows),
      holdout: calibrationData(holdout.y, holdoutEta, holdout.rows),
    },
    train: points(train, trainEta, maxPoints),
    holdout: points(holdout, holdoutEta, maxPoints),
    curves,
    ...(spread.length > shown.length ? { curvesLeftOut: spread.length - shown.length } : {}),
  };
}
