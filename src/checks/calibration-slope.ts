/**
 * `calibration-slope`: the hold-out calibration slope of a classifier (logistic recalibration).
 */
import type { Check } from './types.js';
import { calibrationMeasurement, predictionsCalibration } from './predictions/measures.js';

const check: Check = {
  id: 'calibration-slope',
  title: 'Calibration slope',
  limitKey: 'calibration_slope',
  defaultLimit: { warn: 0.8, fail: 0.6 },
  direction: 'below',
  limitSummary: 'Hold-out calibration slope of a classifier (1 = calibrated, below 1 = over-confident); fails below the limit.',
  description: `- Default \`{ warn: 0.8, fail: 0.6 }\` (floors: the check warns below 0.8 and fails below 0.6). Classifiers only. Points at the \`fit\` line.
- Figure: b of the logistic recalibration logit P(y = 1) = a + b * logit(p) fitted (no penalty) on the
  hold-out rows, p the model's probabilities (Cox 1958, "Two further applications of a model for binary
  regression", Biometrika 45(3-4)). b = 1 and a = 0 for a calibrated model; b well below 1 means the
  probabilities are too extreme on new rows, the classic sign of an overfit classifier. The intercept a
  is in the metrics (\`calibration_intercept\`). The defaults 0.8 and 0.6 are common practice.`,
  advice: 'Add a ridge penalty (`fit.ridge`) or use fewer terms so that the probabilities stop being over-confident on new rows.',
  line: (d) => d.fit.line,
  tasks: ['classification'],
  measurePredictions: predictionsCalibration,
  measure: () => ({ value: null, reason: 'not-for-regression', message: 'applies to classifiers only' }),
  measureClassifier: ({ calibration, holdout }) => calibrationMeasurement(calibration, holdout, 'model'),
};

export default check;
