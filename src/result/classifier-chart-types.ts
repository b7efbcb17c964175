/**
 * The chart data of a binary classifier in the Result (`ModelResult.classifier_charts`): plain
 * series the HTML report draws, built by run/classifier-chart-data.ts. Every number is finite or
 * null, and every list is bounded whatever the rows: a ROC curve keeps at most
 * {@link ROC_MAX_POINTS} points, a calibration diagram has {@link CALIBRATION_BINS} bins, the
 * points of a file at most MAX_CHART_POINTS (chart-types.ts) and the probability curves at most
 * MAX_PARTIAL_CURVES, as for regression models.
 */

/** Most points kept of a ROC curve (training or hold-out); a longer curve is thinned keeping its convex hull. */
export const ROC_MAX_POINTS = 300;

/** Bins of a calibration diagram: equal-width bins of the predicted probability, [0, 0.1), [0.1, 0.2), ... [0.9, 1]. */
export const CALIBRATION_BINS = 10;

/**
 * The ROC curve of one file: the false and true positive rates at every distinct predicted
 * probability used as a threshold (a row counts positive when its probability is at least the
 * threshold), from (0, 0) to (1, 1), tied probabilities taken together (a diagonal step, as the
 * Mann-Whitney count of the AUC takes ties). Thinned to {@link ROC_MAX_POINTS} points when longer:
 * every vertex of the curve's upper convex hull is kept (at most half the budget; more are thinned
 * evenly), the rest of the budget goes to points evenly spaced along the curve.
 */
export interface RocCurveData {
  /** Rows of the file, and how many are positive and negative. */
  rows: number;
  positives: number;
  negatives: number;
  /** Points of the whole curve (distinct thresholds + 1). */
  points: number;
  /** True when fewer than `points` are kept. */
  thinned: boolean;
  /** False positive rate of each kept point, ascending. */
  fpr: number[];
  /** True positive rate of each kept point. */
  tpr: number[];
  /** The threshold of each kept point (null for the first point, (0, 0): no row is positive). */
  threshold: (number | null)[];
  /** Indices (into the kept points) of the vertices of the upper convex hull. */
  hull: number[];
}

/** One bin of a calibration diagram. */
export interface CalibrationBinData {
  /** Bin range of predicted probabilities [from, to) (the last bin includes 1). */
  from: number;
  to: number;
  /** Rows in the bin. */
  count: number;
  /** Mean predicted probability of its rows (null when empty). */
  predicted: number | null;
  /** Share of positives among its rows (null when empty). */
  observed: number | null;
}

/** The rows of one file as points at 0 (negative) and 1 (positive), thinned evenly as regression points are. */
export interface ClassifierPoints {
  /** Data rows in the file. */
  rows: number;
  /** Points kept. */
  shown: number;
  /** True when the rows were thinned. */
  thinned: boolean;
  /** How rows were kept, in words (empty when not thinned). */
  thinning: string;
  /** 1-based file line of each kept row. */
  lines: number[];
  /** Input values of each kept row, one array per input (design order). */
  x: (number | null)[][];
  /** The label: 1 positive, 0 negative. */
  label: number[];
  /** The refit's predicted probability of the positive class. */
  probability: (number | null)[];
}

/** Predicted probability along one input, the other inputs held at their training medians. */
export interface ProbabilityCurveData {
  input: string;
  /** Training medians of the other inputs (empty for a model of one input). */
  others: Record<string, number>;
  /** Training range of the input. */
  range: [number, number];
  /** Input values, ascending (the training range and a margin of CURVE_MARGIN on each side). */
  x: number[];
  /** Predicted probabilities at `x` (null where not finite). */
  p: (number | null)[];
}

/** Everything the charts of one classifier draw. */
export interface ClassifierChartData {
  /** Target column name and its two labels. */
  target: string;
  positive: string;
  negative: string;
  /** The decision threshold of the accuracy figure (`fit.threshold`). */
  threshold: number;
  /** Input column names, in design order. */
  inputs: string[];
  roc: { train: RocCurveData; holdout: RocCurveData };
  /** Calibration diagrams of both files, {@link CALIBRATION_BINS} bins each. */
  calibration: { train: CalibrationBinData[]; holdout: CalibrationBinData[] };
  train: ClassifierPoints;
  holdout: ClassifierPoints;
  /** One curve per input with a spread, for the first MAX_PARTIAL_CURVES such inputs. */
  curves: ProbabilityCurveData[];
  /** Inputs with a spread left without a curve; absent when none. */
  curvesLeftOut?: number;
}
