import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import complexity from '../../src/checks/complexity.js';
import { buildContext, defaultLimits, descriptor, exampleTable } from './context.js';

describe('complexity check', () => {
  it('suggests a low degree at the term line for the degree-9 tank fit and warns', () => {
    const d = descriptor({
      terms: [{ kind: 'polynomial', of: 'hours', degree: 9, shift: null, scale: null }],
      target: 'temp_c',
      foldOrder: 'blocks',
      limits: defaultLimits({ complexity: { warn: 1.5 } }),
    });
    const { outcome, figures } = runCheck(complexity, buildContext(d, exampleTable('tank-train.csv'), exampleTable('tank-holdout.csv')));
    expect(outcome.status, outcome.message).toBe('warn');
    expect(outcome.suggestion?.line).toBe(10);
    expect(outcome.suggestion?.text).toMatch(/^degree [1-4] /);
    expect(figures?.suggested_setting).toMatch(/^degree [1-4]$/);
    const curve = (outcome.detail as { curve: { setting: number }[] }).curve;
    expect(curve.map((c) => c.setting)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  });

  it('gives no suggestion when the current setting is the one the rule picks', () => {
    const d = descriptor({
      terms: [{ kind: 'polynomial', of: 'depth_m', degree: 3, shift: null, scale: null }],
      target: 'temp_c',
      limits: defaultLimits({ complexity: { warn: 1.5 } }),
    });
    const { outcome } = runCheck(complexity, buildContext(d, exampleTable('cellar-train.csv'), exampleTable('cellar-holdout.csv')));
    expect(outcome.suggestion).toBeUndefined();
    expect(outcome.value).toBe(1);
    expect(outcome.status).toBe('pass');
  });
});
