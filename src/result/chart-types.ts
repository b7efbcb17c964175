/**
 * The chart data of a model in the Result: plain series the reporters draw, built by run/chart-data.ts.
 */

/**
 * Most points drawn per series (training or hold-out); larger files are thinned evenly. A model
 * of several inputs keeps fewer ({@link MAX_SERIES_NUMBERS}).
 */
export const MAX_CHART_POINTS = 1000;

/**
 * Most numbers one series holds: each kept row carries its line, every input, the target, the
 * prediction and the residual (inputs + 4 numbers), so a series keeps at most
 * floor(5,000 / (inputs + 4)) rows, and never more than {@link MAX_CHART_POINTS} (a model of one
 * input keeps 1,000, of five 555). With at most {@link MAX_PARTIAL_CURVES} curves this bounds a
 * model's chart data whatever its rows and inputs; {@link RUN_CHART_NUMBERS} bounds a run's.
 */
export const MAX_SERIES_NUMBERS = 5000;

/** Most partial curves of a model of several inputs: those of its first inputs (with a spread). */
export const MAX_PARTIAL_CURVES = 12;

/**
 * Grid points of all partial curves of a model together: up to 3 curves get {@link CURVE_POINTS}
 * each, more share this many (at least 101 each).
 */
export const PARTIAL_CURVE_POINTS = 1203;

/** Points of the evenly spaced grid along a curve. */
export const CURVE_POINTS = 401;

/** Margin on each side of an input's training range for curves, as a fraction of the range (as the swing check's default). */
export const CURVE_MARGIN = 0.1;

/** Significant digits kept in chart numbers (plenty for a picture, a third of the JSON size). */
export const CHART_DIGITS = 7;

/**
 * Chart numbers a whole run keeps at most, about, over all its models: a fixed total, so that the
 * charts of a run (its JSON and HTML reports, and its memory) stop growing with its number of
 * models ({@link chartShare}). Up to {@link RUN_CHART_NUMBERS} / {@link MODEL_CHART_NUMBERS} = 50
 * models each keeps its full charts; beyond, each model's share shrinks, down to the floors
 * ({@link MIN_MODEL_CHART_NUMBERS} a model); past {@link CHARTED_MODELS} models, the models after
 * the first {@link CHARTED_MODELS} (in report order) draw no points (their chart data says why).
 */
export const RUN_CHART_NUMBERS = 750_000;

/**
 * Chart numbers of one model at its full share, about: two series of {@link MAX_SERIES_NUMBERS},
 * the fitted curve with the swing check's points on it and the swing curve itself.
 */
export const MODEL_CHART_NUMBERS = 15_000;

/** Fewest numbers a point series keeps under a shrunk share (50 rows of a model of one input). */
export const MIN_SERIES_NUMBERS = 250;

/** Fewest grid points a curve keeps under a shrunk share. */
export const MIN_CURVE_POINTS = 51;

/**
 * Chart numbers of one model at the floors, about: two series of {@link MIN_SERIES_NUMBERS} with
 * their file lines (600 for one input), a curve of {@link MIN_CURVE_POINTS} points and the swing
 * check's points on it.
 */
export const MIN_MODEL_CHART_NUMBERS = 750;

/** Most models of a run that draw chart points: {@link RUN_CHART_NUMBERS} / {@link MIN_MODEL_CHART_NUMBERS} = 1,000. */
export const CHARTED_MODELS = RUN_CHART_NUMBERS / MIN_MODEL_CHART_NUMBERS;

/**
 * One model's share of a run's chart data (plain data: it crosses to worker threads).
 * `fraction` is 1 for the full amounts; below 1 every bounded amount is scaled by it, down to its floor.
 */
export interface ChartShare {
  /** min(1, RUN_CHART_NUMBERS / (models x MODEL_CHART_NUMBERS)), in (0, 1]. */
  fraction: number;
  /** Most numbers per point series: {@link MAX_SERIES_NUMBERS} x fraction, at least {@link MIN_SERIES_NUMBERS}. */
  seriesNumbers: number;
  /** Most grid points per curve: {@link CURVE_POINTS} x fraction, at least {@link MIN_CURVE_POINTS}. */
  curvePoints: number;
  /**
   * Present when the model draws no points or curves (the run's chart data went to the first
   * {@link CHARTED_MODELS} models): why, in words. Its sweep and coefficients are still kept.
   */
  noPoints?: string;
}

/** The share of a model in a run of up to 50 models: every amount at its maximum. */
export const FULL_CHART_SHARE: ChartShare = Object.freeze({ fraction: 1, seriesNumbers: MAX_SERIES_NUMBERS, curvePoints: CURVE_POINTS });

/**
 * The share of the chart data of the model at `index` (0-based, report order) in a run of `models`
 * models (see {@link RUN_CHART_NUMBERS}): the full amounts up to 50 models; beyond, scaled by
 * 50 / models down to the floors (reached at 1,000 models of one input), and past
 * {@link CHARTED_MODELS} models only the first {@link CHARTED_MODELS} draw points, so that the
 * charts of any run take at most about {@link RUN_CHART_NUMBERS} numbers. Depends only on
 * `models` and `index`, so the same run always draws the same points.
 * @param models models in the run (>= 0)
 * @param index the model's place in the run; default 0
 */
export function chartShare(models: number, index = 0): ChartShare {
  const fraction = Math.min(1, RUN_CHART_NUMBERS / (Math.max(1, models) * MODEL_CHART_NUMBERS));
  if (fraction >= 1) return FULL_CHART_SHARE;
  const share: ChartShare = {
    fraction,
    seriesNumbers: Math.max(MIN_SERIES_NUMBERS, Math.floor(MAX_SERIES_NUMBERS * fraction)),
    curvePoints: Math.max(MIN_CURVE_POINTS, Math.floor(CURVE_POINTS * fraction)),
  };
  if (index >= CHARTED_MODELS)
    share.noPoints = `no points drawn: the run's chart data (about ${RUN_CHART_NUMBERS.toLocaleString('en-US')} numbers) went to its first ${CHARTED_MODELS.toLocaleString('en-US')} of ${models.toLocaleString('en-US')} models`;
  return share;
}

/** The rows of one file as points. Arrays are in file order of the kept rows; non-finite values are null. */
export interface PointSeries {
  /** Data rows in the file. */
  rows: number;
  /** Points kept (`rows` unless thinned). */
  shown: number;
  /** True when the rows were thinned (to {@link MAX_CHART_POINTS}, or fewer for many inputs: {@link MAX_SERIES_NUMBERS}). */
  thinned: boolean;
  /** How rows were kept, in words (empty when not thinned). */
  thinning: string;
  /** 1-based file line of each kept row (read from parts: the line in its own part). */
  lines: number[];
  /** Read from parts only: the parts, in reading order (absent for one file). */
  files?: string[];
  /** Read from parts only: each kept row's part, an index into `files`. */
  file_index?: number[];
  /** Input values of each kept row, one array per input (charts of one input read `x[0]`). */
  x: (number | null)[][];
  /** Observed target. */
  actual: (number | null)[];
  /** The refit's prediction. */
  fitted: (number | null)[];
  /** actual - fitted. */
  residual: (number | null)[];
}

/** A stretch of the input where the curve is outside the observed target band. */
export interface BandRegion {
  from: number;
  to: number;
  /** `above` the band's top, `below` its bottom. */
  side: 'above' | 'below';
}

/**
 * The same curve of the same model (by name) as fitted on the base commit of a pull request,
 * drawn under the head's curve; only on models whose fit the pull request changed. At most
 * {@link CURVE_POINTS} points, as the base run drew them (its own range and medians).
 */
export interface BaseCurve {
  /** Full SHA of the base commit. */
  commit: string;
  /** Input values, ascending. */
  x: number[];
  /** The base fit's predictions at `x` (null where not finite). */
  y: (number | null)[];
}

/** Predictions along one input with the other inputs held at their training medians. */
export interface CurveData {
  input: string;
  /** Training medians of the other inputs (empty for a model of one input). */
  others: Record<string, number>;
  /** Training range of the input. */
  range: [number, number];
  /** Input values, ascending. */
  x: number[];
  /** Predictions at `x` (null where not finite). */
  y: (number | null)[];
  /** The base commit's curve along the same input, when the pull request changed the model's fit (run/base-curves.ts). */
  base?: BaseCurve;
  /** Where the curve spikes between neighbouring training values (diagnostics/spikes.ts); only when `swing-spikes` warns or fails and some interval is marked. */
  spikes?: SpikeMarks;
}

/** Most spike intervals a curve's chart data keeps (the largest variations over what is allowed). */
export const MAX_SPIKE_MARKS = 200;

/** The intervals of a curve where it varies more than the `swing-spikes` limit allows. */
export interface SpikeMarks {
  /** The factor they were judged with: the `swing-spikes` warning limit, else its fail limit. */
  limit: number;
  /** At most {@link MAX_SPIKE_MARKS}, ascending by `from`. */
  intervals: { from: number; to: number; variation: number | null; allowed: number | null }[];
  /** Marked intervals left out beyond {@link MAX_SPIKE_MARKS}; absent when none. */
  left_out?: number;
}

/** The fitted curve of a model of one input. */
export interface FitCurveData extends CurveData {
  /** Observed target band [min, max] of the training targets. */
  band: [number, number];
  /** Where the curve leaves the band. */
  regions: BandRegion[];
  /** `swing`: range, band and regions as the swing check scanned them; `data`: from the training rows. */
  source: 'swing' | 'data';
}

/** Cross-validated error over a complexity sweep. */
export interface SweepData {
  /** What was swept, e.g. `ridge` or `degree`. */
  parameter: string;
  /** True when settings span a decade or more and read best on a log axis (a setting of 0 is drawn one decade left of the smallest positive one). */
  log: boolean;
  /** Settings in ascending order. */
  settings: number[];
  /** Cross-validated RMSE at each setting. */
  cv: (number | null)[];
  /** Training RMSE at each setting, when the sweep has it. */
  train: (number | null)[] | null;
  /** The descriptor's setting, or null when it is not on the sweep. */
  chosen: number | null;
  /** The suggested setting, or null. */
  suggested: number | null;
}

/** Standardised coefficients w_j sd(phi_j) / sd(y) of the non-intercept columns. */
export interface CoefficientData {
  columns: string[];
  /** Signed standardised coefficients (null where not finite). */
  values: (number | null)[];
  /** Fail and warning limits of the `coefficient-size` check (null when off or unset). */
  limit: number | null;
  warn: number | null;
}

/** Everything the charts of one model draw. */
export interface ChartData {
  /** Target column name. */
  target: string;
  /** Input column names, in design order. */
  inputs: string[];
  train: PointSeries;
  holdout: PointSeries;
  /** One input: the fitted curve; null otherwise. */
  fit: FitCurveData | null;
  /**
   * Several inputs: one curve per input with the others at their medians, for the first
   * {@link MAX_PARTIAL_CURVES} inputs with a spread; empty otherwise.
   */
  partials: CurveData[];
  /** Inputs with a spread left without a partial curve (beyond {@link MAX_PARTIAL_CURVES}); absent when none. */
  partialsLeftOut?: number;
  /** The complexity sweep, when the complexity check ran. */
  sweep: SweepData | null;
  coefficients: CoefficientData;
  /**
   * Present when the run's chart data left this model without points and curves (its series keep
   * no rows, `fit` is null and `partials` empty): why, in words ({@link ChartShare} `noPoints`).
   */
  no_points?: string;
}
