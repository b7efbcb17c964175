import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import reproducibility from '../../src/checks/reproducibility.js';
import { buildContext, defaultLimits, descriptor, exampleTable, table } from './context.js';

describe('reproducibility check', () => {
  it('divides the largest hold-out prediction difference by the training target range', () => {
    // Exact line y = 1 + 2x on x = 0..4 (range of y: 8); shipped 1.5 + 2x differs by 0.5 everywhere: 0.5 / 8.
    const train = table(
      ['x', 'y'],
      [
        [0, 1, 2, 3, 4],
        [1, 3, 5, 7, 9],
      ],
    );
    const holdout = table(
      ['x', 'y'],
      [
        [0.5, 10],
        [2, 21],
      ],
    );
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', coefficients: [1.5, 2], limits: defaultLimits() });
    const { outcome } = runCheck(reproducibility, buildContext(d, train, holdout));
    expect(Math.abs((outcome.value as number) - 0.5 / 8)).toBeLessThan(1e-12);
    expect(outcome.status).toBe('fail');
    expect(outcome.line).toBe(30);
    const detail = outcome.detail as { shipped_holdout_rmse: number; refit_holdout_rmse: number };
    expect(Math.abs(detail.shipped_holdout_rmse - 0.5), `shipped RMSE ${detail.shipped_holdout_rmse}`).toBeLessThan(1e-12);
    expect(detail.refit_holdout_rmse).toBeLessThan(1e-12);
  });

  it('fails the keg-weight example and is skipped without shipped coefficients', () => {
    const d = descriptor({
      terms: [{ kind: 'linear', columns: ['litres'] }],
      target: 'weight_kg',
      coefficients: [9.4, 1.03],
      limits: defaultLimits(),
    });
    const keg = runCheck(reproducibility, buildContext(d, exampleTable('keg-train.csv'), exampleTable('keg-holdout.csv'))).outcome;
    expect(keg.status, keg.message).toBe('fail');
    const none = runCheck(
      reproducibility,
      buildContext({ ...d, coefficients: null }, exampleTable('keg-train.csv'), exampleTable('keg-holdout.csv')),
    ).outcome;
    expect([none.status, none.code]).toEqual(['skipped', 'reproducibility/no-coefficients']);
  });

  it('passes shipped coefficients equal to the refit', () => {
    const train = table(
      ['x', 'y'],
      [
        [0, 1, 2, 3],
        [1, 3, 5, 7],
      ],
    );
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', coefficients: [1, 2], limits: defaultLimits() });
    const { outcome } = runCheck(reproducibility, buildContext(d, train, train));
    expect(outcome.status).toBe('pass');
    expect(outcome.value as number).toBeLessThan(1e-12);
  });
});
