/**
 * How the checks that need only predictions measure a model trained elsewhere
 * (Check.measurePredictions): the same figures as for a model of terms, from the predictions of
 * the training and hold-out rows; log-loss where a classifier's checks use it.
 */
import { clip } from '../../core/errors.js';
import { formatNumber } from '../../core/format.js';
import { jsonMetrics } from '../../core/json.js';
import { gapRatio } from '../../diagnostics/regression-metrics.js';
import { fromJsonNumber, type JsonNumber } from '../../result/result.js';
import type { Measurement } from '../types.js';
import type { PredictionsContext } from './context.js';
import type { Calibration, ClassificationFigures } from '../../diagnostics/classification-metrics.js';

/** Advice for a model trained elsewhere: the change is made in the tool that trained it. */
const ELSEWHERE_ADVICE =
  'Regularise the model in the tool that trained it (shallower or fewer trees, early stopping, dropout, weight decay, fewer inputs) and write its predictions again, so that the training rows are no longer predicted far better than new rows.';

const FOR_REGRESSION: Measurement = { value: null, reason: 'not-for-classification', message: 'applies to regression models only' };

/** `generalisation-gap`: hold-out RMSE / training RMSE (classifiers: hold-out / training log-loss). */
export function predictionsGap({ regression, classifier }: PredictionsContext): Measurement {
  if (classifier !== null) {
    const value = gapRatio(classifier.train.logLoss, classifier.holdout.logLoss);
    return {
      value,
      message: `hold-out log-loss ${formatNumber(classifier.holdout.logLoss)} is ${formatNumber(value)} times the training log-loss ${formatNumber(classifier.train.logLoss)}`,
      metrics: { gap_ratio: value },
      advice: ELSEWHERE_ADVICE,
    };
  }
  const r = regression as NonNullable<PredictionsContext['regression']>;
  const value = gapRatio(r.train.rmse, r.holdout.rmse);
  return {
    value,
    message: `hold-out RMSE ${formatNumber(r.holdout.rmse)} is ${formatNumber(value)} times the training RMSE ${formatNumber(r.train.rmse)}`,
    advice: ELSEWHERE_ADVICE,
  };
}

/** `parameter-ratio`: stated parameters / training rows; skipped when `parameters` is not given. */
export function predictionsParameterRatio({ parameters, rows, descriptor }: PredictionsContext): Measurement {
  if (parameters === null) return notStated(descriptor);
  const value = parameters / rows.train;
  return {
    value,
    message: `${parameters} stated parameters for ${rows.train} training rows (${formatNumber(value)} per row)`,
    line: descriptor.parametersLine ?? undefined,
    detail: { counted: 'stated', parameters },
    advice:
      'Use a smaller model in the tool that trained it (fewer trees, leaves or units), or add training rows; if the stated count is too high, correct `parameters`.',
  };
}

/** `events-per-parameter` (classifiers): min(positives, negatives) / stated parameters. */
export function predictionsEventsPerParameter({ parameters, classifier, descriptor }: PredictionsContext): Measurement {
  if (classifier === null) return { value: null, reason: 'not-for-regression', message: 'applies to classifiers only' };
  if (parameters === null) return notStated(descriptor);
  const { positives, negatives } = classifier.train;
  const events = Math.min(positives, negatives);
  const value = events / parameters;
  return {
    value,
    message: `${events} training rows of the smaller class (${positives} positive, ${negatives} negative) for ${parameters} stated parameters: ${formatNumber(value)} per parameter`,
    line: descriptor.parametersLine ?? undefined,
    metrics: { events_per_parameter: value },
  };
}

function notStated(descriptor: PredictionsContext['descriptor']): Measurement {
  return {
    value: null,
    reason: 'not-stated',
    message: 'the descriptor states no `parameters` for this model trained elsewhere, so there is no count to judge',
    line: descriptor.predictions?.line,
  };
}

/**
 * The `calibration-slope` measurement of a classifier's hold-out recalibration, for a model of
 * terms and a model trained elsewhere alike.
 * @param calibration the logistic recalibration on the hold-out rows (slope NaN when not identified)
 * @param holdout the hold-out rows' class counts (named when the slope is not identified)
 * @param separatedBy what separates the hold-out rows when the recalibration does not converge
 */
export function calibrationMeasurement(
  calibration: Calibration,
  holdout: Pick<ClassificationFigures, 'positives' | 'negatives'>,
  separatedBy: 'model' | 'predictions',
): Measurement {
  const figures = jsonMetrics({ calibration_slope: calibration.slope, calibration_intercept: calibration.intercept });
  if (Number.isNaN(calibration.slope)) {
    return {
      value: null,
      reason: 'not-identified',
      message: `the hold-out rows (${holdout.positives} positive, ${holdout.negatives} negative) hold one class only or constant probabilities`,
      metrics: figures,
    };
  }
  return {
    value: calibration.slope,
    message: `hold-out calibration slope ${formatNumber(calibration.slope)}, intercept ${formatNumber(calibration.intercept)}${calibration.converged ? '' : ` (the recalibration did not converge: the hold-out rows are separated by the ${separatedBy})`}`,
    metrics: figures,
  };
}

/** `calibration-slope` (classifiers): the logistic recalibration of the hold-out probabilities. */
export function predictionsCalibration({ classifier }: PredictionsContext): Measurement {
  if (classifier === null) return { value: null, reason: 'not-for-regression', message: 'applies to classifiers only' };
  return calibrationMeasurement(classifier.calibration, classifier.holdout, 'predictions');
}

/** `base-change`: relative change of the hold-out RMSE (classifiers: log-loss) against the base commit. */
export function predictionsBaseChange({ regression, classifier, baseline }: PredictionsContext): Measurement {
  if (!baseline) return { value: null, reason: 'no-base', message: 'no model of this name to compare with on the base commit' };
  const key = classifier !== null ? 'holdout_log_loss' : 'holdout_rmse';
  const raw = baseline.metrics?.[key];
  const base = typeof raw === 'number' || typeof raw === 'string' ? fromJsonNumber(raw as JsonNumber) : Number.NaN;
  if (Number.isNaN(base)) return { value: null, reason: 'base-not-checked', message: 'the model could not be checked on the base commit' };
  const head =
    classifier !== null ? classifier.holdout.logLoss : (regression as NonNullable<PredictionsContext['regression']>).holdout.rmse;
  const value = base === 0 ? (head === 0 ? 0 : Infinity) : (head - base) / base;
  const what = classifier !== null ? 'hold-out log-loss' : 'hold-out RMSE';
  return {
    value,
    message: `${what} ${formatNumber(head)} against ${formatNumber(base)} on the base commit`,
    detail: { [`base_${key}`]: base },
  };
}

/** `leakage`: hold-out rows that repeat a training row in the named inputs. */
export function predictionsLeakage({ leakage, inputs, files, descriptor }: PredictionsContext): Measurement {
  if (leakage === null) {
    return {
      value: null,
      reason: 'no-inputs',
      message: 'the descriptor names no input columns (`predictions.inputs`), so rows cannot be compared',
      line: descriptor.predictions?.line,
    };
  }
  const columns = inputs.map((c) => clip(c)).join(', ');
  const metrics = { leaked_rows: leakage.fullMatches, holdout_rows_in_training: leakage.inputMatches };
  const detail = {
    columns: [...inputs],
    holdout_rows: leakage.holdoutRows,
    input_matches: leakage.inputMatches,
    target_matches: leakage.fullMatches,
    holdout_lines: leakage.holdoutLines,
    train_lines: leakage.trainLines,
    holdout_file: files.holdout,
    train_file: files.train,
  };
  if (leakage.inputMatches === 0)
    return { value: 0, message: `no hold-out row of ${leakage.holdoutRows} repeats a training row in ${columns}`, metrics, detail };
  const more = leakage.inputMatches > leakage.holdoutLines.length ? ', …' : '';
  return {
    value: leakage.inputMatches,
    message: `${leakage.inputMatches} of ${leakage.holdoutRows} hold-out rows repeat a training row in ${columns} (${leakage.fullMatches} with the same target): ${clip(files.holdout)} lines ${leakage.holdoutLines.join(', ')}${more}; first matching training rows: ${clip(files.train)} lines ${leakage.trainLines.join(', ')}${more}`,
    metrics,
    detail,
  };
}

/** `swing` (regression): how far the predictions of the observed rows leave the training target band. */
export function predictionsSwing({ spread, classifier }: PredictionsContext): Measurement {
  if (classifier !== null) return FOR_REGRESSION;
  const detail = jsonMetrics({
    band_low: spread.band[0],
    band_high: spread.band[1],
    predicted_low: spread.predicted[0],
    predicted_high: spread.predicted[1],
    rows: spread.rows,
  });
  if (Number.isNaN(spread.value))
    return { value: null, reason: 'not-applicable', message: 'the training target is constant, so its band has no width', detail };
  const band = `[${formatNumber(spread.band[0])}, ${formatNumber(spread.band[1])}]`;
  return {
    value: spread.value,
    reason: 'observed-rows',
    message:
      spread.worst === null
        ? `the predictions of the ${spread.rows} training and hold-out rows stay inside the training target band ${band} (observed rows only: a model trained elsewhere cannot be scanned between them)`
        : `the predictions of the ${spread.rows} training and hold-out rows leave the training target band ${band} by ${formatNumber(spread.value)} band widths (prediction ${formatNumber(spread.worst.prediction)} on line ${spread.worst.line} of ${clip(spread.worst.file)}; observed rows only)`,
    metrics: { swing: spread.value },
    detail,
  };
}

/** `holdout-r2`, `holdout-rmse`, `holdout-mae` (regression): the hold-out figure. */
export function predictionsHoldout(figure: 'r2' | 'rmse' | 'mae'): (context: PredictionsContext) => Measurement {
  return ({ regression }) => {
    if (regression === null) return FOR_REGRESSION;
    const value = regression.holdout[figure];
    if (figure === 'r2' && Number.isNaN(value))
      return { value: null, reason: 'not-applicable', message: 'the hold-out target is constant, so R^2 is not defined' };
    const name = figure === 'r2' ? 'R^2' : figure.toUpperCase();
    return { value, message: `hold-out ${name} is ${formatNumber(value)}` };
  };
}
