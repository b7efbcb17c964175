// The pipeline's figures against the pandas + numpy + scikit-learn reference check
// ../shared/bench/ref_check.py (its docstring defines every figure: standardisation, basis order,
// unpenalised intercept, contiguous folds, PRESS, condition number, leaked rows), run with Debian's
// /usr/bin/python3 on the same CSV files. Tolerance 1e-6 relative, the benchmark's bar
// (test/bench/run.mjs); leaked rows exact. The reference also cross-checks its numpy fit with
// scikit-learn's Ridge / LinearRegression; that agreement is asserted too.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { fromJsonNumber, type ModelResult } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
// @ts-expect-error the generator is a plain ES module without types
import { generate } from '../bench/gen-data.mjs';
import { PYTHON3, requireTool, sharedBenchDir, skipNote } from '../tools/require-tool.js';

const TOLERANCE = 1e-6;

/** Workloads: shapes of ../shared/bench/README.md at test size; ridge 0 takes the reference's LinearRegression path. */
const CASES = [
  { name: 'three-inputs', rows: 400, holdoutRows: 120, features: 3, degree: 3, ridge: 1, folds: 5, seed: 11 },
  { name: 'one-input-plain', rows: 150, holdoutRows: 50, features: 1, degree: 6, ridge: 0, folds: 10, seed: 12 },
];

/** [fitgate metrics key, reference key]. */
const FIGURES: [string, string][] = [
  ['train_rmse', 'train_rmse'],
  ['holdout_rmse', 'holdout_rmse'],
  ['gap_ratio', 'gap_ratio'],
  ['params_per_sample', 'params_per_sample'],
  ['max_std_coefficient', 'max_std_coef'],
  ['loocv_rmse', 'loocv_rmse'],
  ['condition_number', 'cond'],
  ['cv_rmse', 'cv_rmse'],
];

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), Number.MIN_VALUE);

const missing = requireTool(['python3-numpy', 'python3-pandas', 'python3-sklearn', 'shared/bench']);

describe.skipIf(missing !== null)(`figures against the pandas + numpy + scikit-learn reference (ref_check.py)${skipNote(missing)}`, () => {
  let dir = '';
  let models = new Map<string, ModelResult>();

  beforeAll(async () => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-python-reference-'));
    writeFileSync(path.join(dir, 'fitgate.yml'), 'version: 1\nmodels:\n  - "*.model.yml"\n');
    for (const c of CASES) {
      generate({ out: path.join(dir, c.name), rows: c.rows, holdoutRows: c.holdoutRows, features: c.features, seed: c.seed });
      const terms = Array.from({ length: c.features }, (_, j) => `  - polynomial: { of: x${j + 1}, degree: ${c.degree} }`).join('\n');
      writeFileSync(
        path.join(dir, `${c.name}.model.yml`),
        `version: 1\nname: ${c.name}\ndata:\n  train: ${c.name}/train.csv\n  holdout: ${c.name}/holdout.csv\n  target: y\nterms:\n${terms}\nfit:\n  intercept: true\n  ridge: ${c.ridge}\n  folds: ${c.folds}\n  fold_order: blocks\n`,
      );
    }
    const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
    models = new Map(result.models.map((m) => [m.name, m]));
  });

  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it.each(CASES)('$name: every figure within 1e-6 relative, leaked rows exact, coefficients alike', (c) => {
    const model = models.get(c.name);
    expect(model?.error ?? null).toBeNull();
    const metrics = model?.metrics;
    if (!metrics || !model) throw new Error(`no metrics for ${c.name}`);
    const run = spawnSync(
      PYTHON3,
      [
        `${sharedBenchDir}ref_check.py`,
        '--train',
        path.join(dir, c.name, 'train.csv'),
        '--holdout',
        path.join(dir, c.name, 'holdout.csv'),
        '--degree',
        String(c.degree),
        '--ridge',
        String(c.ridge),
        '--folds',
        String(c.folds),
        '--loocv',
      ],
      { encoding: 'utf8', timeout: 120_000, env: { PATH: '/usr/bin:/bin', HOME: os.tmpdir(), LANG: 'C.UTF-8' } },
    );
    expect(run.status, run.stderr).toBe(0);
    const ref = JSON.parse(run.stdout) as Record<string, unknown>;

    for (const [ours, theirs] of FIGURES) {
      const a = fromJsonNumber(metrics[ours] as number);
      const b = ref[theirs] as number;
      expect(relative(a, b), `${ours}: fitgate ${a}, reference ${b}`).toBeLessThanOrEqual(TOLERANCE);
    }
    // The generator copies 5 training rows into the hold-out file (gen-data.mjs, N_LEAKED).
    expect(metrics.leaked_rows).toBe(ref.leaked_rows);
    expect(ref.leaked_rows).toBe(5);

    // Coefficients in the reference's order: intercept, then x1^1..x1^D, x2^1.. (the descriptor's term order).
    const coef = ref.coef as number[];
    expect(model.coefficients.length).toBe(coef.length);
    const scale = Math.max(...coef.map(Math.abs));
    model.coefficients.forEach((w, j) =>
      expect(Math.abs(fromJsonNumber(w) - coef[j]) / scale, `coefficient ${j}`).toBeLessThanOrEqual(TOLERANCE),
    );
    // The reference's own numpy-vs-scikit-learn cross-check.
    expect(ref.sklearn_max_abs_diff as number).toBeLessThanOrEqual(TOLERANCE * scale);
  });
});
