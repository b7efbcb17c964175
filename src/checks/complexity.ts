/**
 * `complexity`: the simpler setting to use, by the one-standard-error rule on a sweep of the
 * model's main complexity setting.
 */
import { classifierComplexity } from './classifier/measures.js';
import { skipWhenScoreOnly } from './score-only.js';
import type { Check, Measurement } from './types.js';
import { formatNumber } from '../core/format.js';
import { sweepComplexity } from '../diagnostics/complexity.js';
import { jsonRecord } from '../core/json.js';
import { jsonNumber } from '../result/result.js';

const check: Check = {
  id: 'complexity',
  title: 'Simpler setting',
  limitKey: 'complexity',
  defaultLimit: { warn: 1.5 },
  direction: 'above',
  limitSummary: 'Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.',
  description: `- Default \`{ warn: 1.5 }\` (see below). Points at the line to change:
  the swept term's line, or \`fit.ridge\`'s line (the \`fit\` line when \`ridge\` is not written).
- What is swept (one setting per model, the same folds as \`cross-validation\`):
  - \`fit.ridge\` above 0, or a model of linear terms only: the ridge penalty lambda = s x 10^t for
    t = 3, 2.5, ..., -6 with s = trace(X^T X) / p of the model's design, plus the current lambda
    (20 settings at most); simplest = largest lambda. The design does not change, so the model's
    own per-fold factors serve every lambda: one SVD per fold complement gives every lambda's
    coefficients (ESL eq. 3.47, the unpenalised intercept eliminated from the factor's first
    row), and each fold's squared errors come from its factor
    (||y_f - X_f w||^2 = ||Q_f^T y_f - R_f w||^2 + the fold's residual sum of squares): no pass over
    the rows, every row used.
  - else the polynomial term of highest degree (one input or several): degrees 1 .. min(degree + 3, 15)
    (over several inputs only the degrees that build at most 200 columns, and the current one);
  - else the first radial term (one input or several): its width times 2^t for t = 4, 3, ..., -2;
    simplest = widest;
  - else the first spline term: 1 .. current + 4 interior knots (at most 100) at the training
    quantiles (the current setting as written); simplest = fewest;
  - else the first Fourier term: 1 .. harmonics + 3 harmonics (at most 50); simplest = fewest.
- Each setting's k-fold error: the mean of the fold MSEs and its standard error (sample standard
  deviation of the fold MSEs / sqrt(k)). The suggestion is the simplest setting whose mean is within
  one standard error of the smallest mean (the one-standard-error rule: Hastie, Tibshirani &
  Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10). When it differs from
  the current setting it is shown as a notice at the line to change, e.g. \`degree 3 (k-fold CV RMSE
  0.47 against 24.9 now)\`.
- Figure: the current setting's k-fold CV RMSE / the suggested setting's (1 or less when the current
  setting is as good). The default warns above 1.5: the suggestion is then clearly better,
  not only simpler; a notice alone is given otherwise, and the check never fails by default.
- Weighted models (\`data.weight\`, \`data.sigma\`): every setting is the weighted fit (rows scaled by
  sqrt(w), weights divided by their mean over the rows used), and the errors are weighted: the fold
  MSEs are sum w r^2 over the fold divided by its rows, cv_rmse = sqrt(sum w r^2 / sum w) (Björck,
  Numerical Methods for Least Squares Problems, 1996, section 4.4.1).
- Above 50,000 training rows a degree or width sweep uses a subsample of 50,000 rows at an even
  stride through the file (detail \`subsampled: true\`); a ridge sweep always uses every row. A
  training file read as a stream (docs/scale.md) is swept on its seeded sample of at most 100,000
  rows, a ridge sweep too, with folds of the sample's own (\`subsampled: true\`).
- Metrics: \`suggested_setting\`, \`suggested_cv_rmse\`. Detail: \`setting\` (\`degree\`, \`width\`,
  \`knots\`, \`harmonics\` or \`ridge\`), \`folds\`, \`rows\`, \`subsampled\`, \`rule\`, indices \`chosen\`, \`best\`, \`current\`, and \`curve\`:
  \`[{ setting, label, parameters, cv_rmse, mean_mse, se_mse, current, failed? }]\`, simplest first.`,
  advice: 'Change the setting as suggested: the simpler model predicts new rows about as well or better.',
  line: (d) => d.fit.line,
  measureClassifier: classifierComplexity,
  measure(context): Measurement {
    const scoreOnly = skipWhenScoreOnly(context.descriptor);
    if (scoreOnly) return scoreOnly;
    const { descriptor, design, train, fit } = context;
    // A streamed model's rows at hand are its sample (data/row-source.ts): the sweep runs on the
    // sample with folds of its own, not on the fold factors of every row.
    const sampled = train.sampleOf !== undefined && train.sampleOf > train.rows;
    const sweep = sweepComplexity(
      descriptor,
      design,
      train,
      fit,
      sampled ? { sampled: true } : { factors: () => context.analyses.foldFactors(), folds: () => context.analyses.folds() },
    );
    if (sweep === null || sweep.chosen < 0 || sweep.current < 0) {
      return { value: null, reason: 'not-applicable', message: 'the model has no complexity setting to sweep, or too few rows' };
    }
    const chosen = sweep.curve[sweep.chosen];
    const current = sweep.curve[sweep.current];
    const best = sweep.curve[sweep.best];
    const value = chosen.cvRmse > 0 ? current.cvRmse / chosen.cvRmse : current.cvRmse === 0 ? 1 : Infinity;
    const detail = jsonRecord({
      setting: sweep.kind,
      folds: sweep.folds,
      rows: sweep.rows,
      subsampled: sweep.subsampled,
      rule: 'one-standard-error',
      chosen: sweep.chosen,
      best: sweep.best,
      current: sweep.current,
      curve: sweep.curve.map((c) => ({
        setting: c.setting,
        label: c.label,
        parameters: c.parameters,
        cv_rmse: c.cvRmse,
        mean_mse: c.meanMse,
        se_mse: c.seMse,
        current: c.current,
        ...(c.failed ? { failed: c.failed } : {}),
      })),
    });
    const sub = sampled
      ? ` (on a seeded sample of ${sweep.rows} of ${train.sampleOf} rows)`
      : sweep.subsampled
        ? ` (on an even-stride subsample of ${sweep.rows} rows)`
        : '';
    if (sweep.chosen === sweep.current) {
      return {
        value,
        message: `${current.label} is the simplest setting within one standard error of the best cross-validation error (${sweep.curve.length} settings swept${sub})`,
        line: sweep.line,
        metrics: { suggested_setting: current.label },
        detail,
      };
    }
    return {
      value,
      message: `${chosen.label} has k-fold CV RMSE ${formatNumber(chosen.cvRmse)} against ${formatNumber(current.cvRmse)} for the current ${current.label}; it is the simplest of ${sweep.curve.length} settings within one standard error of the best (${best.label}, ${formatNumber(best.cvRmse)})${sub}`,
      line: sweep.line,
      metrics: { suggested_setting: chosen.label, suggested_cv_rmse: jsonNumber(chosen.cvRmse) },
      detail,
      suggestion: {
        text: `${chosen.label} (k-fold CV RMSE ${formatNumber(chosen.cvRmse)} against ${formatNumber(current.cvRmse)} now)`,
        line: sweep.line,
        // The value as the label rounds it (what a person would write): `degree 3`, `width 1.6`, `ridge 0.8`.
        change: { key: sweep.kind, value: Number(chosen.label.slice(sweep.kind.length + 1)) },
      },
    };
  },
};

export default check;
