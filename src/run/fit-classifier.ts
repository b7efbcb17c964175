/**
 * One binary classifier (task `classification`) fitted and scored: planned like a regression
 * model (plan.ts, with the target read as two classes), fitted by IRLS (fit/logistic.ts), each
 * cross-validation fold refitted from the full fit in shared passes, then the figures every
 * classifier check reads (checks/classifier/context.ts). No checks here.
 */
import type { ClassifierContext, ClassifierCrossValidation, ClassifierShipped } from '../checks/classifier/context.js';
import type { Descriptor, SettingsFile } from '../config/types.js';
import { clip, InputError } from '../core/errors.js';
import { streamsTrainingData, trainingFileSizes } from '../data/row-source.js';
import { loadClassifierData, type ClassLabels } from '../data/labels.js';
import type { ModelData } from '../data/model-data.js';
import { partsLabel, placeOfLine } from '../data/data-parts.js';
import { predictRows } from '../design/blocks.js';
import { ColumnSpread } from '../design/column-spread.js';
import type { Design } from '../design/design-matrix.js';
import { sweepClassifier } from '../diagnostics/classifier-complexity.js';
import {
  calibration,
  calibrationBins,
  classificationFigures,
  probabilities,
  rocPoints,
  type CalibrationBin,
} from '../diagnostics/classification-metrics.js';
import type { Folds } from '../diagnostics/folds.js';
import { findLeakage } from '../diagnostics/leakage.js';
import { findSeparation } from '../diagnostics/separation.js';
import { factorDiagnostics, fitFactor, type FactorDiagnostics } from '../fit/index.js';
import { firstStepsWithout, fitLogistic, outOfFoldDeviance, rowDeviance, type LogisticFit } from '../fit/logistic.js';
import type { RepoReader } from '../repo/types.js';
import { planModel } from './plan.js';

/**
 * Largest estimated CSV text of a classifier's training file (data/row-source.ts estimates it):
 * 512 MiB, the default file cap, so classifiers within the defaults are unaffected.
 */
export const CLASSIFIER_MAX_BYTES = 512 * 1024 * 1024;

/** A fitted classifier: the check context plus what the reports draw. */
export interface FittedClassifier {
  context: Omit<ClassifierContext, 'baseline'>;
  labels: ClassLabels;
  train: ModelData;
  holdout: ModelData;
  /** Linear predictors (logits) of the training and hold-out rows. */
  trainEta: Float64Array;
  holdoutEta: Float64Array;
  folds: Folds;
  /** What the reports draw: ROC points of the training and hold-out rows, and the hold-out calibration diagram (10 bins). */
  charts: { rocTrain: { fpr: number[]; tpr: number[] }; rocHoldout: { fpr: number[]; tpr: number[] }; calibration: CalibrationBin[] };
}

/**
 * Loads, fits and scores one classifier.
 * @throws InputError for bad data or labels, a design over the caps, or shipped coefficients of the wrong length
 */
export async function fitClassifier(repo: RepoReader, descriptor: Descriptor, settings: SettingsFile): Promise<FittedClassifier> {
  // Classifiers are held in memory (their fit makes several passes of its own): a file above the
  // default file cap is refused plainly rather than left to run out of memory.
  const { train: file, trainParts } = descriptor.data;
  if (streamsTrainingData(await trainingFileSizes(repo, file, trainParts), CLASSIFIER_MAX_BYTES)) {
    throw new InputError(
      'too-large-to-hold',
      `${trainParts === undefined ? 'the training file' : `the ${trainParts.length} training parts`} ${clip(trainParts === undefined ? file : partsLabel(trainParts))} ${trainParts === undefined ? 'is' : 'are'} estimated at over ${CLASSIFIER_MAX_BYTES / (1024 * 1024)} MiB of CSV text; a classifier's rows are held in memory and files this large are read as a stream for regression models only; expected a smaller training file`,
      { file: descriptor.file, line: descriptor.data.lines.train, key: 'data.train' },
    );
  }
  let labels: ClassLabels | null = null;
  const plan = await planModel(repo, descriptor, settings, async (r, d, inputs, s) => {
    const tables = await loadClassifierData(r, d, inputs, s);
    labels = tables.labels;
    return tables;
  });
  const { design, tables, folds } = plan;
  const { train, holdout } = tables;
  const options = { ridge: descriptor.fit.ridge, penalised: [...design.penalised] };

  const spread = new ColumnSpread(design.p);
  // With folds, each pass also keeps one Gram per fold, so that the folds' first Newton steps need no pass of their own.
  const parts = folds.k >= 2 ? { of: folds.foldOf, count: folds.k } : undefined;
  // The factor pass at the returned coefficients also leaves the training rows' logits and takes the columns' spread.
  const trainEta = new Float64Array(train.rows);
  const [fit] = fitLogistic(design, train, options, [
    { start: warmStart(design, train, options), parts, factor: true, eta: trainEta, onBlock: (X, _start, m) => spread.add(X, m) },
  ]);
  const columnSd = spread.sd();
  const weighted = weightedDiagnostics(fit, design.p, options);
  const holdoutEta = predictRows(design, holdout, fit.coefficients);
  const threshold = descriptor.fit.threshold ?? 0.5;
  const trainP = probabilities(trainEta);
  const holdoutP = probabilities(holdoutEta);
  const trainFigures = classificationFigures(train.y, trainEta, trainP, train.rows, threshold);
  const holdoutFigures = classificationFigures(holdout.y, holdoutEta, holdoutP, holdout.rows, threshold);
  const separation = findSeparation(design, train);
  // Without a penalty, separated rows have no finite maximum-likelihood coefficients (Albert &
  // Anderson 1984): the stopping rule is then met only because the objective approaches 0 as the
  // coefficients grow, so neither the fit nor its folds count as converged.
  const unbounded = options.ridge === 0 && separation.kind !== 'none';

  return {
    context: {
      descriptor,
      design,
      fit: unbounded ? { ...fit, converged: false } : fit,
      weighted,
      train: trainFigures,
      holdout: holdoutFigures,
      calibration: calibration(holdout.y, holdoutEta, holdout.rows),
      crossValidation: crossValidateClassifier(design, train, folds, fit, options, unbounded),
      separation,
      shipped: shippedClassifier(descriptor, design, train, holdout, fit, trainEta, holdoutEta),
      columnSd,
      leakage: leakageOf(train, holdout),
      ...(train.parts !== undefined ? { trainSource: { file: train.file, parts: train.parts } } : {}),
      complexity: sweepClassifier(descriptor, design, train),
    },
    labels: labels as unknown as ClassLabels,
    train,
    holdout,
    trainEta,
    holdoutEta,
    folds,
    charts: {
      rocTrain: rocPoints(train.y, trainP, train.rows),
      rocHoldout: rocPoints(holdout.y, holdoutP, holdout.rows),
      calibration: calibrationBins(holdout.y, holdoutP, holdout.rows),
    },
  };
}

/**
 * Rank and conditioning of the weighted design sqrt(W) X at the fit's coefficients: from the
 * Cholesky factor of its Gram when the fit has one (fit/gram-step.ts, gramFactor), else from its
 * QR factor (fit/index.ts, fitFactor).
 */
function weightedDiagnostics(fit: LogisticFit, p: number, options: { ridge: number; penalised: boolean[] }): FactorDiagnostics {
  if (fit.weightedR !== null) return factorDiagnostics(fit.weightedR, p, fit.rows);
  if (fit.weightedFactor === null) throw new Error('fitLogistic: the weighted factor asked for is missing');
  return fitFactor(fit.weightedFactor, options);
}

/** Above this many training rows the full fit starts from the fit of an even-stride subset of this many rows. */
export const WARM_START_ROWS = 50000;

/**
 * Starting coefficients for the full fit: on large data, the fit of an even-stride subset of
 * {@link WARM_START_ROWS} rows with the penalty scaled to its share of the rows (the optimum is
 * the full fit's, from wherever Newton's method starts; a near start saves whole passes over the
 * rows). Undefined (the default start) on smaller data.
 */
function warmStart(design: Design, train: ModelData, options: { ridge: number; penalised: boolean[] }): Float64Array | undefined {
  const n = train.rows;
  const m = WARM_START_ROWS;
  if (n <= 2 * m) return undefined;
  const pick = (col: Float64Array): Float64Array => {
    const out = new Float64Array(m);
    for (let t = 0; t < m; t++) out[t] = col[Math.floor((t * n) / m)];
    return out;
  };
  const sub = { inputs: train.inputs.map(pick), y: pick(train.y), rows: m };
  const [fit] = fitLogistic(design, sub, { ...options, ridge: (options.ridge * m) / n }, [{}]);
  return fit.coefficients.every(Number.isFinite) ? fit.coefficients : undefined;
}

/**
 * k-fold cross-validation: the fit without each fold (the same terms, fixed from all training
 * rows, and the same ridge), started from the full fit, all folds in shared passes; the pooled
 * log-loss of the out-of-fold probabilities. Null below 2 folds. When the full fit kept its
 * per-fold Grams (`full.parts`, one part per fold), each fold's first Newton step is solved
 * from them without a pass (fit/logistic.ts, firstStepsWithout); the optimum is the same.
 * With `unbounded` (ridge 0 and separated training rows: no finite optimum) the fold fits are
 * reported as not converged, whatever the stopping rule said: their log-loss is where the
 * iterations stopped on the way to infinite coefficients (on completely separated rows it tends
 * to 0, the out-of-fold rows being separated by the same direction).
 */
export function crossValidateClassifier(
  design: Design,
  train: ModelData,
  folds: Folds,
  full: LogisticFit,
  options: { ridge: number; penalised: boolean[] },
  unbounded = false,
): ClassifierCrossValidation | null {
  const k = folds.k;
  if (k < 2) return null;
  const steps = full.parts !== null && full.parts.grams.length === k ? firstStepsWithout(full.parts, options) : null;
  const problems = Array.from({ length: k }, (_, f) => ({
    foldOf: folds.foldOf,
    exclude: f,
    start: full.coefficients,
    ...(steps ? { firstStep: steps[f] } : {}),
  }));
  const fits = fitLogistic(design, train, options, problems);
  const foldDeviance = outOfFoldDeviance(
    design,
    train,
    folds.foldOf,
    fits.map((x) => x.coefficients),
  );
  let total = 0;
  for (let f = 0; f < k; f++) total += foldDeviance[f];
  return {
    k,
    logLoss: total / 2 / train.rows,
    foldLogLoss: Array.from(foldDeviance, (d, f) => d / 2 / folds.sizes[f]),
    foldRows: [...folds.sizes],
    converged: !unbounded && fits.every((x) => x.converged),
  };
}

/** The shipped coefficients' probabilities against the refit's; null when the descriptor ships none. */
function shippedClassifier(
  descriptor: Descriptor,
  design: Design,
  train: ModelData,
  holdout: ModelData,
  fit: LogisticFit,
  trainEta: Float64Array,
  holdoutEta: Float64Array,
): ClassifierShipped | null {
  const shipped = descriptor.coefficients;
  if (shipped === null) return null;
  if (shipped.length !== design.p) {
    throw new InputError(
      'coefficients-length',
      `\`coefficients\` has ${shipped.length} values but the terms build ${design.p} columns (${design.columnNames.slice(0, 12).join(', ')}${design.p > 12 ? ', …' : ''}); expected one value per column, intercept first`,
      { file: descriptor.file, line: descriptor.coefficientsLine ?? undefined, key: 'coefficients' },
    );
  }
  let maxP = 0;
  const losses: number[] = [];
  for (const [data, refit] of [
    [train, trainEta],
    [holdout, holdoutEta],
  ] as const) {
    const eta = predictRows(design, data, shipped);
    let dev = 0;
    for (let i = 0; i < data.rows; i++) {
      const d = Math.abs(1 / (1 + Math.exp(-eta[i])) - 1 / (1 + Math.exp(-refit[i])));
      if (d > maxP || Number.isNaN(d)) maxP = d;
      dev += rowDeviance(eta[i], data.y[i]);
    }
    losses.push(dev / 2 / data.rows);
  }
  let maxW = 0;
  for (let j = 0; j < design.p; j++) maxW = Math.max(maxW, Math.abs(shipped[j] - fit.coefficients[j]));
  return { maxProbabilityDifference: maxP, maxCoefficientDifference: maxW, trainLogLoss: losses[0], holdoutLogLoss: losses[1] };
}

function leakageOf(train: ModelData, holdout: ModelData): ClassifierContext['leakage'] {
  const found = findLeakage(train, holdout);
  return {
    duplicates: found.fullMatches,
    examples: found.holdoutLines.map((line, i) => {
      if (train.parts === undefined && holdout.parts === undefined) return { holdoutLine: line, trainLine: found.trainLines[i] };
      // Read from parts: each part's own line and its file.
      const h = placeOfLine(holdout, line);
      const t = placeOfLine(train, found.trainLines[i]);
      return { holdoutLine: h.line, trainLine: t.line, holdoutFile: h.file, trainFile: t.file };
    }),
  };
}
