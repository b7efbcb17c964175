import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/checks/index.js';
import leakage from '../../src/checks/leakage.js';
import { buildContext, defaultLimits, descriptor, exampleTable, table } from './context.js';

describe('leakage check (default limit 0: fail when any)', () => {
  it('fails with exact counts and lines on constructed files', () => {
    const train = table(
      ['a', 'b', 'y'],
      [
        [1, 2, 3, 4, 5, 6],
        [1, 1, 2, 2, 3, 3],
        [10, 11, 12, 13, 14, 15],
      ],
      'train.csv',
    );
    // Hold-out rows (lines 2..5): copy of train line 3; same inputs as train line 6 with another target; new; copy of train line 2.
    const holdout = table(
      ['a', 'b', 'y'],
      [
        [2, 5, 9, 1],
        [1, 3, 9, 1],
        [11, 99, 0, 10],
      ],
      'holdout.csv',
    );
    const d = descriptor({ terms: [{ kind: 'linear', columns: ['a', 'b'] }], target: 'y', limits: defaultLimits() });
    const { outcome, figures } = runCheck(leakage, buildContext(d, train, holdout));
    expect(outcome.status).toBe('fail');
    expect(outcome.value).toBe(3);
    expect(figures).toEqual({ leaked_rows: 2, holdout_rows_in_training: 3 });
    expect(outcome.detail).toMatchObject({ holdout_lines: [2, 3, 5], train_lines: [3, 6, 2], target_matches: 2 });
    expect(outcome.line).toBe(5);
  });

  it('fails the bottle-fill example (five planted copies) and passes press-yield', () => {
    const fill = descriptor({
      terms: [{ kind: 'linear', columns: ['line_speed', 'nozzle_bar'] }],
      target: 'fill_ml',
      limits: defaultLimits(),
    });
    const bad = runCheck(leakage, buildContext(fill, exampleTable('fill-train.csv'), exampleTable('fill-holdout.csv'))).outcome;
    expect([bad.status, bad.value]).toEqual(['fail', 5]);
    const press = descriptor({
      terms: [{ kind: 'linear', columns: ['apples_kg', 'press_min'] }],
      target: 'juice_l',
      limits: defaultLimits(),
    });
    const good = runCheck(leakage, buildContext(press, exampleTable('press-train.csv'), exampleTable('press-holdout.csv'))).outcome;
    expect([good.status, good.value]).toEqual(['pass', 0]);
  });
});
