/**
 * A Result with awkward content for the renderers' golden tests: pipes, `<` and `&`, emoji,
 * percent signs, commas, colons, line breaks, a name that looks like a workflow command,
 * NaN and infinite figures, a model that could not be checked, a new model and a compared one.
 */
import type { CheckResult, ModelResult, Result } from '../../src/result/result.js';
import { summarise } from '../../src/result/result.js';

/** A check outcome with defaults for the fields a test does not care about. */
export function check(over: Partial<CheckResult> & Pick<CheckResult, 'id' | 'status'>): CheckResult {
  return {
    code: `${over.id}/${over.status}`,
    value: 1,
    limitKey: 'gap_ratio',
    limit: 1.5,
    warn: null,
    line: 5,
    message: 'measured',
    advice: over.status === 'fail' || over.status === 'warn' ? 'Change it.' : '',
    ...over,
  };
}

/** A checked model with defaults. */
export function model(over: Partial<ModelResult> & Pick<ModelResult, 'name' | 'verdict'>): ModelResult {
  return {
    descriptor: `models/${over.name}.model.yml`,
    rows: { train: 10, holdout: 5 },
    parameters: 2,
    columns: ['(intercept)', 'x'],
    metrics: {
      train_rmse: 1,
      holdout_rmse: 1.5,
      train_mae: 1,
      holdout_mae: 1,
      train_r2: 0.9,
      holdout_r2: 0.8,
      gap_ratio: 1.5,
      params_per_sample: 0.2,
      max_std_coefficient: 0.5,
      max_std_coefficient_column: 'x',
      max_abs_coefficient: 2,
      rank: 2,
      condition_number: 3,
    },
    coefficients: [1, 2],
    shipped: null,
    checks: [],
    error: null,
    ...over,
  };
}

/** The awkward Result. */
export function awkwardResult(): Result {
  return summarise(
    [
      model({
        name: 'a|b <c> & d 🌡️',
        verdict: 'fail',
        metrics: { ...model({ name: 'x', verdict: 'pass' }).metrics!, holdout_rmse: 'NaN', gap_ratio: 'Infinity' },
        checks: [
          check({
            id: 'generalisation-gap',
            status: 'fail',
            value: 'Infinity',
            line: 12,
            message: 'ratio 100% of a, b: c\nnext line',
            advice: 'Use fewer terms.',
          }),
          check({
            id: 'parameter-ratio',
            status: 'warn',
            value: 0.25,
            limitKey: 'params_per_sample',
            limit: 0.5,
            warn: 0.1,
            line: 8,
            message: 'column `x|y` <big>',
          }),
          check({ id: 'coefficient-size', status: 'pass', value: 0.5 }),
        ],
        base: {
          status: 'compared',
          commit: 'a'.repeat(40),
          holdout_rmse: 1,
          gap_ratio: 1.25,
          holdout_rmse_change: 0.5,
          gap_ratio_change: 0.25,
        },
      }),
      model({
        name: '::error::x',
        descriptor: 'models/weird.model.yml',
        verdict: 'error',
        metrics: null,
        error: { message: 'bad\r\n::warning::injected', file: 'data/a,b:c.csv', line: 3, code: 'csv-cell' },
      }),
      model({
        name: 'plain',
        verdict: 'pass',
        base: {
          status: 'new',
          commit: 'a'.repeat(40),
          holdout_rmse: null,
          gap_ratio: null,
          holdout_rmse_change: null,
          gap_ratio_change: null,
        },
      }),
    ],
    '0.1.0',
    ['base commit abc1234 is not available; fetch it'],
  );
}
