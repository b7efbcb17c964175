import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import holdoutMae from '../../src/checks/holdout-mae.js';
import holdoutR2 from '../../src/checks/holdout-r2.js';
import holdoutRmse from '../../src/checks/holdout-rmse.js';
import { toLimit } from '../../src/config/limits.js';
import type { LimitSpec } from '../../src/config/types.js';
import { buildContext, defaultLimits, descriptor, table } from './context.js';

// y = 2x + a known alternating residual of +-0.5 on the training rows; the hold-out rows carry
// residuals 0, 1, -1, 2 around the same line, so RMSE, MAE and R^2 are known by hand.
const x = Array.from({ length: 20 }, (_, i) => i);
const train = table(['x', 'y'], [x, x.map((v, i) => 2 * v + (i % 2 === 0 ? 0.5 : -0.5))]);
const hx = [1.5, 4.5, 9.5, 14.5];
const hr = [0, 1, -1, 2];
const holdout = table(['x', 'y'], [hx, hx.map((v, i) => 2 * v + hr[i])]);
const holdoutMean = hx.reduce((s, v, i) => s + 2 * v + hr[i], 0) / 4;
const sst = hx.reduce((s, v, i) => s + (2 * v + hr[i] - holdoutMean) ** 2, 0);

function context(key: string, spec: LimitSpec, direction: 'above' | 'below') {
  const d = descriptor({
    terms: [{ kind: 'linear', columns: ['x'] }],
    target: 'y',
    limits: { ...defaultLimits(), [key]: toLimit(spec, direction, 'descriptor', 40) },
  });
  return buildContext(d, train, holdout);
}

describe('accuracy floors and ceilings (default off)', () => {
  it('are off by default', () => {
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['x'] }], target: 'y', limits: defaultLimits() });
    for (const check of [holdoutR2, holdoutRmse, holdoutMae]) {
      const { outcome } = runCheck(check, buildContext(d, train, holdout));
      expect(outcome.status).toBe('skipped');
      expect(outcome.code).toBe(`${check.id}/off`);
    }
  });

  it('holdout-r2 is a floor: a number fails below it, { warn, fail } warns between', () => {
    // The least-squares line through the alternating residuals is y = 2x + c with c near 0; the
    // hold-out R^2 is 1 - SSE/SST with the residuals above (hand computation).
    const r2 = 1 - (0 + 1 + 1 + 4) / sst;
    const fail = runCheck(holdoutR2, context('holdout_r2', 0.9999, 'below')).outcome;
    expect(fail.value as number).toBeCloseTo(r2, 2);
    expect(fail.status).toBe('fail');
    expect(fail.message).toContain('under the fail floor');
    expect(fail.floor).toEqual({ warn: null, fail: 0.9999 });
    expect(runCheck(holdoutR2, context('holdout_r2', 0.5, 'below')).outcome.status).toBe('pass');
    expect(runCheck(holdoutR2, context('holdout_r2', { warn: 0.9999, fail: 0.5 }, 'below')).outcome.status).toBe('warn');
  });

  it('holdout-rmse and holdout-mae are ceilings in the target units', () => {
    const rmse = runCheck(holdoutRmse, context('holdout_rmse', 1, 'above')).outcome;
    expect(rmse.value as number).toBeCloseTo(Math.sqrt(6 / 4), 1);
    expect(rmse.status).toBe('fail');
    expect(runCheck(holdoutRmse, context('holdout_rmse', 2, 'above')).outcome.status).toBe('pass');
    const mae = runCheck(holdoutMae, context('holdout_mae', { warn: 0.5, fail: 2 }, 'above')).outcome;
    expect(mae.value as number).toBeCloseTo(1, 1);
    expect(mae.status).toBe('warn');
  });

  it('holdout-r2 is skipped for a constant hold-out target', () => {
    const flat = table(
      ['x', 'y'],
      [
        [1, 2, 3],
        [5, 5, 5],
      ],
    );
    const d = descriptor({
      terms: [{ kind: 'linear', columns: ['x'] }],
      target: 'y',
      limits: { ...defaultLimits(), holdout_r2: toLimit(0.9, 'below', 'descriptor', 40) },
    });
    const { outcome } = runCheck(holdoutR2, buildContext(d, train, flat));
    expect(outcome.status).toBe('skipped');
    expect(outcome.code).toBe('holdout-r2/not-applicable');
  });
});
