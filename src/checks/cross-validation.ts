/**
 * `cross-validation`: k-fold cross-validation RMSE / training RMSE, with leave-one-out (PRESS),
 * GCV and the effective degrees of freedom in the model's metrics.
 */
import type { Check } from './types.js';
import { formatNumber } from '../core/format.js';
import { gapRatio } from '../diagnostics/regression-metrics.js';
import { jsonMetrics, jsonRecord } from '../core/json.js';

const check: Check = {
  id: 'cross-validation',
  title: 'Cross-validation',
  limitKey: 'cv_ratio',
  description:
    'k-fold cross-validation RMSE divided by training RMSE. The rows are split into k folds (`fit.folds`, default 5; `fit.fold_order: shuffled` from `fit.seed`, the default, or `blocks`: contiguous blocks in file order, the first n mod k folds one row longer); each fold is predicted by the fit on the other folds with the same ridge penalty, and cv_rmse = sqrt(sum of all squared out-of-fold errors / n) (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10). Also reported: leave-one-out RMSE sqrt(mean((e_i / (1 - h_ii))^2)) from the PRESS residuals (Allen 1974, Technometrics 16(1)), with h_ii the leverages (infinite when a row has leverage 1), generalised cross-validation GCV = mean(e_i^2) / (1 - df/n)^2 (Golub, Heath & Wahba 1979, Technometrics 21(2)), and the effective degrees of freedom df = trace of the hat matrix = sum of the leverages, sum_j d_j^2 / (d_j^2 + lambda) for ridge (ESL eq. 3.50). Infinite when the training RMSE is 0 and the CV RMSE is not.',
  advice: 'Use fewer or wider basis functions, a lower degree or a larger ridge penalty until the cross-validation error comes close to the training error.',
  line: (d) => d.fit.line,
  measure(context) {
    const folds = context.analyses.folds();
    const cv = context.analyses.crossValidation();
    const { metrics, train, design } = context;
    const effectiveDf = cv.effectiveDf;
    const figures = {
      loocv_rmse: cv.loocvRmse,
      gcv: cv.gcv,
      effective_df: effectiveDf,
      effective_df_per_sample: effectiveDf / train.rows,
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
    const ratio = gapRatio(metrics.trainRmse, cv.cvRmse);
    const loo = cv.rowsWithLeverageOne > 0 ? `infinite (${cv.rowsWithLeverageOne} rows with leverage 1: the fit interpolates them)` : formatNumber(cv.loocvRmse);
    return {
      value: ratio,
      message: `${cv.k}-fold CV RMSE ${formatNumber(cv.cvRmse)} (${folds.order}${folds.order === 'shuffled' ? `, seed ${folds.seed}` : ''}) is ${formatNumber(ratio)} times the training RMSE ${formatNumber(metrics.trainRmse)}; leave-one-out RMSE ${loo}, GCV ${formatNumber(cv.gcv)}, effective degrees of freedom ${formatNumber(effectiveDf)} of ${design.p} parameters`,
      metrics: jsonMetrics({ cv_rmse: cv.cvRmse, ...figures }),
      detail: jsonRecord(detail),
    };
  },
};

export default check;
