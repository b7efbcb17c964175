import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import crossValidation from '../../src/checks/cross-validation.js';
import type { TermWithoutLine } from './context.js';
import { buildContext, defaultLimits, descriptor, exampleTable, table } from './context.js';

const poly = (degree: number): TermWithoutLine => ({ kind: 'polynomial', of: 'depth_m', degree, shift: null, scale: null });

describe('cross-validation check', () => {
  it('fails the interpolating degree-9 cellar fit, reports infinite leave-one-out and records the folds', () => {
    const d = descriptor({ terms: [poly(9)], target: 'temp_c', limits: defaultLimits({ cv_ratio: { fail: 2 } }), seed: 7 });
    const { outcome, figures } = runCheck(
      crossValidation,
      buildContext(d, exampleTable('cellar-train.csv'), exampleTable('cellar-holdout.csv')),
    );
    expect(outcome.status).toBe('fail');
    expect(figures?.loocv_rmse).toBe('Infinity');
    expect(outcome.detail).toMatchObject({
      folds: 5,
      fold_order: 'shuffled',
      seed: 7,
      fold_rows: [2, 2, 2, 2, 2],
      rows_with_leverage_one: 10,
    });
  });

  it('passes a quadratic on the same data and reports effective degrees of freedom per row', () => {
    const d = descriptor({ terms: [poly(2)], target: 'temp_c', limits: defaultLimits({ cv_ratio: { fail: 2 } }) });
    const { outcome, figures } = runCheck(
      crossValidation,
      buildContext(d, exampleTable('cellar-train.csv'), exampleTable('cellar-holdout.csv')),
    );
    expect(outcome.status, outcome.message).toBe('pass');
    expect(Math.abs((figures?.effective_df as number) - 3)).toBeLessThan(1e-9);
    expect(Math.abs((figures?.effective_df_per_sample as number) - 0.3)).toBeLessThan(1e-9);
  });

  it('is skipped with one training row', () => {
    const one = table(['x', 'y'], [[1], [2]]);
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', limits: defaultLimits({ cv_ratio: { fail: 2 } }) });
    const { outcome } = runCheck(crossValidation, buildContext(d, one, one));
    expect(outcome.code).toBe('cross-validation/too-few-rows');
  });
});
