/**
 * `cross-validation`: k-fold cross-validation RMSE / training RMSE, with leave-one-out (PRESS),
 * GCV and the effective degrees of freedom in the model's metrics.
 */
import { trainingRows } from '../data/model-data.js';
import { skipWhenScoreOnly } from './score-only.js';
import type { Check } from './types.js';
import { classifierCrossValidation } from './classifier/measures.js';
import { formatNumber } from '../core/format.js';
import { gapRatio } from '../diagnostics/regression-metrics.js';
import { jsonMetrics, jsonRecord } from '../core/json.js';

const check: Check = {
  id: 'cross-validation',
  title: 'Cross-validation',
  limitKey: 'cv_ratio',
  defaultLimit: 'off',
  direction: 'above',
  limitSummary: 'Pooled k-fold cross-validation RMSE divided by training RMSE.',
  description: `- Default \`off\`. Points at the \`fit\` line.
- Figure: k-fold CV RMSE / training RMSE (infinite when the training RMSE is 0 and the CV RMSE is not).
- Folds: \`fit.folds\` (default 5; fewer rows than folds gives one row per fold), \`fit.fold_order\`:
  \`shuffled\` (default; a Fisher-Yates shuffle driven by a seeded 32-bit generator, seed \`fit.seed\`,
  default 1, recorded in the detail) or \`blocks\` (contiguous blocks in file order, right for rows
  ordered in time). In both orders the first n mod k folds hold floor(n/k) + 1 rows, the others
  floor(n/k).
- cv_rmse = sqrt(sum over all rows of (y_i - yhat_(-fold(i)))^2 / n), pooled over rows; the RMSE of
  each fold is in the detail. The fit without fold f uses the same terms (fixed from all training
  rows) and the same ridge penalty. No refit from scratch: each fold's rows are folded into their own
  QR factor in one pass; the factor without fold f is the merge of the others (Hastie, Tibshirani &
  Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10).
- Leave-one-out by the PRESS residuals e_i / (1 - h_ii) (Allen 1974, Technometrics 16(1)):
  loocv_rmse = sqrt(mean((e_i / (1 - h_ii))^2)), with e_i the full fit's residual and
  h_ii = x_i^T (X^T X + lambda E^T E)^+ x_i its leverage (exact for ridge with the same penalty). A row
  with leverage 1 (within 1e-10: the fit interpolates it) makes the figure infinite; the detail counts
  such rows.
- GCV = mean(e_i^2) / (1 - df/n)^2 (Golub, Heath & Wahba 1979, Technometrics 21(2)); infinite when df >= n.
- Effective degrees of freedom df = trace of the hat matrix = sum of the leverages; for ridge on
  every column sum_j d_j^2 / (d_j^2 + lambda) with d_j the singular values of the design (ESL eq. 3.50);
  p for least squares of full rank.
- Metrics: \`cv_rmse\`, \`loocv_rmse\`, \`gcv\`, \`effective_df\`, \`effective_df_per_sample\`, \`cv_folds\`.
  Detail: \`folds\`, \`fold_order\`, \`seed\`, \`fold_rows\`, \`fold_rmse\`, \`cv_rmse\`, \`loocv_rmse\`, \`press\`,
  \`gcv\`, \`effective_df\`, \`parameters\`, \`max_leverage\`, \`rows_with_leverage_one\`.
- With \`data.target_transform\` judged on the original scale (the default): the figure and metric
  \`cv_rmse\` back-transform each row's out-of-fold prediction; the detail, leave-one-out and GCV stay on
  the transformed scale (docs/fitting.md).`,
  advice:
    'Use fewer or wider basis functions, a lower degree or a larger ridge penalty until the cross-validation error comes close to the training error.',
  line: (d) => d.fit.line,
  measureClassifier: classifierCrossValidation,
  measure(context) {
    const scoreOnly = skipWhenScoreOnly(context.descriptor);
    if (scoreOnly) return scoreOnly;
    const folds = context.analyses.folds();
    const cv = context.analyses.crossValidation();
    const { metrics, train, design } = context;
    const effectiveDf = cv.effectiveDf;
    const figures = {
      loocv_rmse: cv.loocvRmse,
      gcv: cv.gcv,
      effective_df: effectiveDf,
      effective_df_per_sample: effectiveDf / trainingRows(train),
      cv_folds: cv.k,
    };
    const detail = {
      folds: cv.k,
      fold_order: folds.order,
      seed: folds.seed,
      fold_rows: cv.foldSizes,
      fold_rmse: cv.foldRmse,
      cv_rmse: cv.cvRmse,
      loocv_rmse: cv.loocvRmse,
      press: cv.press,
      gcv: cv.gcv,
      effective_df: effectiveDf,
      parameters: design.p,
      max_leverage: cv.maxLeverage,
      rows_with_leverage_one: cv.rowsWithLeverageOne,
    };
    if (cv.k < 2) {
      return {
        value: null,
        reason: 'too-few-rows',
        message: `cross-validation needs at least 2 training rows, got ${train.rows}`,
        metrics: jsonMetrics(figures),
        detail: jsonRecord(detail),
      };
    }
    // A transformed target judged on the original scale: the back-transformed out-of-fold predictions (metrics are on that scale too).
    const scale = context.targetScale ?? null;
    const cvRmse = scale !== null && scale.limitsScale === 'original' ? scale.original.cvRmse : cv.cvRmse;
    const ratio = gapRatio(metrics.trainRmse, cvRmse);
    const loo =
      cv.rowsWithLeverageOne > 0
        ? `infinite (${cv.rowsWithLeverageOne} rows with leverage 1: the fit interpolates them)`
        : formatNumber(cv.loocvRmse);
    return {
      value: ratio,
      message: `${cv.k}-fold CV RMSE ${formatNumber(cvRmse)}${scale !== null ? ` on the ${scale.limitsScale} scale of the target` : ''} (${folds.order}${folds.order === 'shuffled' ? `, seed ${folds.seed}` : ''}) is ${formatNumber(ratio)} times the training RMSE ${formatNumber(metrics.trainRmse)}; leave-one-out RMSE ${loo}, GCV ${formatNumber(cv.gcv)}, effective degrees of freedom ${formatNumber(effectiveDf)} of ${design.p} parameters`,
      metrics: jsonMetrics({ cv_rmse: cvRmse, ...figures }),
      detail: jsonRecord(detail),
    };
  },
};

export default check;
