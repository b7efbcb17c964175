/**
 * The complexity sweep of a binary classifier: the same settings as the regression sweep
 * (complexity.ts: the ridge penalty, else the highest polynomial degree, else the first radial
 * width, else the first spline's knot count, else the first Fourier term's harmonics; the settings
 * of complexity.ts `sweepSettings`), each scored by its k-fold cross-validation log-loss on the model's own folds, and the
 * one-standard-error rule (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning,
 * 2nd ed., 2009, section 7.10) picking the simplest setting within one standard error of the best.
 */
import type { Descriptor } from '../config/types.js';
import { InputError } from '../core/errors.js';
import type { Design } from '../design/design-matrix.js';
import { firstStepsWithout, fitLogistic, outOfFoldDeviance, type LogisticRows } from '../fit/logistic.js';
import { designAtSetting, oneStandardErrorRule, subsample, sweepSettings, sweepTarget, type SweepKind } from './complexity.js';
import { assignFolds } from './folds.js';

/** One point of a classifier's complexity sweep. */
export interface ClassifierSweepPoint {
  value: number;
  cvLogLoss: number;
  standardError: number;
}

/** A classifier's complexity sweep (see checks/complexity.ts for the regression one). */
export interface ClassifierSweep {
  kind: SweepKind;
  line: number;
  points: ClassifierSweepPoint[];
  /** Index of the model's current setting among the points. */
  current: number;
  /** Index of the point the one-standard-error rule picks. */
  chosen: number;
  /** Index of the point with the lowest CV log-loss. */
  best: number;
}

/**
 * Rows the classifier sweep uses at most (an even-stride subsample above it): every setting is
 * k IRLS fits, so the sweep is kept to a bounded cost; 20,000 rows rank the settings well within
 * their standard errors (common practice: the curve only has to rank the settings).
 */
export const CLASSIFIER_SWEEP_MAX_ROWS = 20000;

/**
 * Sweeps the classifier's complexity setting. Ridge: lambda = s x 10^t, t = 3, 2, ..., -3, with
 * s = max(current lambda, rows / 1000), plus the current lambda, largest (simplest) first, each
 * setting's fit on all the sweep's rows started from the previous one's, and its fold fits from
 * it (their first Newton step from its per-fold Grams: fit/logistic.ts, firstStepsWithout). Other
 * kinds: the settings of complexity.ts `sweepSettings` (degree, width, knots, harmonics); a
 * setting the data cannot carry is left out. Each setting: the mean of the fold log-losses and its standard error (sample
 * sd / sqrt(k)).
 * @returns null when there is nothing to sweep or fewer than 2 folds
 */
export function sweepClassifier(descriptor: Descriptor, design: Design, train: LogisticRows): ClassifierSweep | null {
  const target = sweepTarget(descriptor, design);
  if (target === null || train.rows < 2) return null;
  const rows = train.rows > CLASSIFIER_SWEEP_MAX_ROWS ? subsample(train, CLASSIFIER_SWEEP_MAX_ROWS) : train;
  const folds = assignFolds(rows.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
  if (folds.k < 2) return null;
  const ridge = descriptor.fit.ridge;
  const points: { value: number; current: boolean; design: Design; ridge: number }[] = [];
  if (target.kind === 'ridge') {
    const s = Math.max(ridge, rows.rows / 1000);
    const grid: number[] = [];
    for (let t = 3; t >= -3; t--) grid.push(s * 10 ** t);
    const lambdas = [...grid.filter((l) => l > ridge), ridge, ...grid.filter((l) => l < ridge)];
    for (const l of lambdas) points.push({ value: l, current: l === ridge, design, ridge: l });
  } else {
    const trainColumns = new Map<string, Float64Array>(design.inputs.map((name, c) => [name, train.inputs[c]]));
    const swept = { kind: target.kind, term: target.term };
    for (const { value, current } of sweepSettings(design.terms[target.term].spec, swept.kind)) {
      let changed: Design;
      try {
        changed = designAtSetting(design, swept, { value, current }, trainColumns, descriptor.file);
      } catch (error) {
        // A setting the data cannot carry (e.g. more spline knots than distinct quantiles) is left out.
        if (!(error instanceof InputError)) throw error;
        continue;
      }
      points.push({ value, current, design: changed, ridge });
    }
  }
  const curve: ClassifierSweep['points'] = [];
  let start: Float64Array | null = null;
  for (const point of points) {
    const d = point.design;
    const options = { ridge: point.ridge, penalised: [...d.penalised] };
    // The fit on all the sweep's rows first (from the previous setting's, on the same design),
    // keeping one Gram per fold: each fold's first Newton step then needs no pass of its own.
    const [full] = fitLogistic(d, rows, options, [
      { parts: { of: folds.foldOf, count: folds.k }, ...(start && d === design ? { start } : {}) },
    ]);
    if (d === design) start = full.coefficients;
    const steps = full.parts !== null ? firstStepsWithout(full.parts, options) : null;
    const problems = Array.from({ length: folds.k }, (_, f) => ({
      foldOf: folds.foldOf,
      exclude: f,
      ...(steps ? { firstStep: steps[f] } : { start: full.coefficients }),
    }));
    const fits = fitLogistic(d, rows, options, problems);
    const deviance = outOfFoldDeviance(
      d,
      rows,
      folds.foldOf,
      fits.map((x) => x.coefficients),
    );
    const losses = Array.from(deviance, (dv, f) => dv / 2 / folds.sizes[f]);
    const mean = losses.reduce((a, b) => a + b, 0) / losses.length;
    const variance = losses.reduce((a, b) => a + (b - mean) ** 2, 0) / (losses.length - 1);
    curve.push({ value: point.value, cvLogLoss: mean, standardError: Math.sqrt(variance / losses.length) });
  }
  const { best, chosen } = oneStandardErrorRule(curve.map((c) => ({ mean: c.cvLogLoss, se: c.standardError })));
  return { kind: target.kind, line: target.line, current: points.findIndex((p) => p.current), points: curve, chosen, best };
}
