// Models scored as shipped (`fit.refit: false`), through the command (the sources run as
// `node cli.js`): the checks judge the shipped coefficients; those that need a refit are skipped.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Result } from '../../src/result/result.js';
import { sourceCli } from './source-cli.js';
import { greenhouse } from './small-repo.js';

let cli: ReturnType<typeof sourceCli>;
const cleanup: Array<() => void> = [];
beforeAll(() => {
  cli = sourceCli();
});
afterAll(() => {
  cli?.remove();
  for (const f of cleanup) f();
});

/** RMSE of y = a + b x over the rows of a `vent_pct,humidity_pct` CSV, computed here from the file. */
function rmse(csv: string, a: number, b: number): number {
  const rows = csv
    .trim()
    .split('\n')
    .slice(1)
    .map((l) => l.split(',').map(Number));
  return Math.sqrt(rows.reduce((s, [x, y]) => s + (y - (a + b * x)) ** 2, 0) / rows.length);
}

function run(extra: string): { dir: string; result: Result; status: number | null } {
  const repo = greenhouse(extra);
  cleanup.push(repo.remove);
  const r = cli.run(['check', '--format', 'json', '--jobs', '1'], repo.dir);
  return { dir: repo.dir, result: JSON.parse(r.stdout || '{}') as Result, status: r.status };
}

describe('fit.refit: false', () => {
  it('judges the shipped coefficients and skips the checks that need a refit, with the reason', () => {
    // Shipped by another team: close to the line, slightly off (82, -0.34 rather than the refit's).
    const { dir, result, status } = run(
      'fit: { refit: false }\ncoefficients: [82, -0.34]\nlimits: { params_per_sample: 0.2, gap_ratio: 5 }',
    );
    expect(status).toBe(0);
    const m = result.models[0];
    expect(m.coefficients).toEqual([82, -0.34]);
    const train = readFileSync(path.join(dir, 'data/air-train.csv'), 'utf8');
    const holdout = readFileSync(path.join(dir, 'data/air-holdout.csv'), 'utf8');
    expect(m.metrics?.train_rmse).toBeCloseTo(rmse(train, 82, -0.34), 12);
    expect(m.metrics?.holdout_rmse).toBeCloseTo(rmse(holdout, 82, -0.34), 12);
    const status_ = Object.fromEntries(m.checks.map((c) => [c.id, c.code]));
    expect(status_['cross-validation']).toBe('cross-validation/score-only');
    expect(status_.complexity).toBe('complexity/score-only');
    expect(status_.reproducibility).toBe('reproducibility/score-only');
    for (const id of ['generalisation-gap', 'parameter-ratio', 'coefficient-size', 'swing', 'leakage', 'conditioning']) {
      expect(m.checks.find((c) => c.id === id)?.status, id).toBe('pass');
    }
    expect(m.checks.find((c) => c.id === 'cross-validation')?.message).toBe(
      'skipped: this check needs a refit, and the model is scored as shipped (`fit.refit: false`)',
    );
  });

  it('fails shipped coefficients that are over a limit, where the refit of the same descriptor passes', () => {
    const shipped = run('fit: { refit: false }\ncoefficients: [82, -30]\nlimits: { params_per_sample: 0.2 }');
    expect(shipped.status).toBe(1);
    expect(shipped.result.models[0].checks.find((c) => c.id === 'coefficient-size')?.status).toBe('fail');
    const refitted = run('coefficients: [82, -30]\nlimits: { params_per_sample: 0.2, reproducibility: off }');
    expect(refitted.status).toBe(0);
    expect(refitted.result.models[0].checks.find((c) => c.id === 'coefficient-size')?.status).toBe('pass');
  });

  it('needs shipped coefficients (exit 2 at the refit line)', () => {
    const repo = greenhouse('fit:\n  refit: false');
    cleanup.push(repo.remove);
    const r = cli.run(['check', '--jobs', '1'], repo.dir);
    expect(r.status).toBe(2);
    expect(r.stdout).toContain(
      'models/greenhouse.model.yml:11:10: `fit.refit`: `refit: false` scores the shipped coefficients, and the descriptor ships none',
    );
  });

  it('with `refit_compare: true` reports what a refit would give beside the shipped figures', () => {
    const { dir, result, status } = run(
      'fit: { refit: false, refit_compare: true }\ncoefficients: [82, -0.34]\nlimits: { params_per_sample: 0.2, gap_ratio: 5 }',
    );
    expect(status).toBe(0);
    const m = result.models[0];
    // The refit is least squares of a straight line: slope and intercept in closed form, here.
    const train = readFileSync(path.join(dir, 'data/air-train.csv'), 'utf8');
    const holdout = readFileSync(path.join(dir, 'data/air-holdout.csv'), 'utf8');
    const rows = train
      .trim()
      .split('\n')
      .slice(1)
      .map((l) => l.split(',').map(Number));
    const mx = rows.reduce((s, r) => s + r[0], 0) / rows.length;
    const my = rows.reduce((s, r) => s + r[1], 0) / rows.length;
    const b = rows.reduce((s, r) => s + (r[0] - mx) * (r[1] - my), 0) / rows.reduce((s, r) => s + (r[0] - mx) ** 2, 0);
    const a = my - b * mx;
    expect(m.metrics?.refit_train_rmse).toBeCloseTo(rmse(train, a, b), 10);
    expect(m.metrics?.refit_holdout_rmse).toBeCloseTo(rmse(holdout, a, b), 10);
    expect(m.metrics?.train_rmse).toBeCloseTo(rmse(train, 82, -0.34), 12);
    expect(m.metrics?.refit_cv_folds).toBe(5);
    // The CV figure is the one the same descriptor gets when it is refitted.
    const refitted = run('coefficients: [82, -0.34]\nlimits: { params_per_sample: 0.2, reproducibility: off }').result.models[0];
    expect(m.metrics?.refit_cv_rmse).toBe(refitted.metrics?.cv_rmse);
    expect(m.checks.find((c) => c.id === 'cross-validation')?.code).toBe('cross-validation/score-only');
    const text = cli.run(['check', '--verbose', '--jobs', '1'], dir).stdout;
    expect(text).toMatch(/a refit would give: training RMSE [0-9.]+, hold-out RMSE [0-9.]+, 5-fold CV RMSE [0-9.]+/);
  });

  it('is kept as it is by fitgate refit', () => {
    const repo = greenhouse('fit: { refit: false }\ncoefficients: [82, -0.34]');
    cleanup.push(repo.remove);
    const before = readFileSync(path.join(repo.dir, 'models/greenhouse.model.yml'), 'utf8');
    const r = cli.run(['refit'], repo.dir);
    expect(r.status, r.stdout).toBe(0);
    expect(r.stdout).toBe(
      'kept: models/greenhouse.model.yml: scored as shipped (`fit.refit: false`), not refitted\n1 model: 0 descriptors written\n',
    );
    expect(readFileSync(path.join(repo.dir, 'models/greenhouse.model.yml'), 'utf8')).toBe(before);
    expect(cli.run(['refit', '--check'], repo.dir).status).toBe(0);
  });
});
