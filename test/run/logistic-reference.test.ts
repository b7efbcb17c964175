// The classifier's figures against the pandas + numpy + scikit-learn reference
// ../shared/bench/ref_logistic.py (its docstring defines the basis, the fit — scikit-learn
// LogisticRegression(C = 1/ridge, newton-cholesky, tol 1e-10), penalty=None for ridge 0, with an
// unpenalised intercept —, the metrics, the calibration slope and the contiguous folds), run with
// Debian's /usr/bin/python3 on CSV files its own `generate` command writes. Tolerance 1e-6
// relative, the benchmark's bar.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
import { PYTHON3, requireTool, sharedBenchDir, skipNote } from '../tools/require-tool.js';

const TOLERANCE = 1e-6;

const CASES = [
  { name: 'three-inputs-ridge', rows: 600, holdoutRows: 200, features: 3, degree: 3, ridge: 1, folds: 5, seed: 21 },
  { name: 'two-inputs-plain', rows: 400, holdoutRows: 150, features: 2, degree: 2, ridge: 0, folds: 4, seed: 22 },
];

/** [fitgate metrics key, path in the reference's output]. */
const FIGURES: [string, (r: Reference) => number][] = [
  ['train_log_loss', (r) => r.train.log_loss],
  ['holdout_log_loss', (r) => r.holdout.log_loss],
  ['train_brier', (r) => r.train.brier],
  ['holdout_brier', (r) => r.holdout.brier],
  ['train_accuracy', (r) => r.train.accuracy],
  ['holdout_accuracy', (r) => r.holdout.accuracy],
  ['train_auc', (r) => r.train.roc_auc],
  ['holdout_auc', (r) => r.holdout.roc_auc],
  ['calibration_slope', (r) => r.calibration_slope],
  ['calibration_intercept', (r) => r.calibration_intercept],
  ['events_per_parameter', (r) => r.events_per_parameter],
  ['cv_log_loss', (r) => r.cv_log_loss],
];

interface Figures {
  log_loss: number;
  brier: number;
  accuracy: number;
  roc_auc: number;
}
interface Reference {
  coefficients: number[];
  train: Figures;
  holdout: Figures;
  calibration_slope: number;
  calibration_intercept: number;
  events_per_parameter: number;
  cv_log_loss: number;
}

const relative = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

const missing = requireTool(['python3-numpy', 'python3-pandas', 'python3-sklearn', 'shared/bench']);

describe.skipIf(missing !== null)(`classifier figures against scikit-learn (ref_logistic.py)${skipNote(missing)}`, () => {
  let dir = '';
  let models = new Map<string, ModelResult>();

  beforeAll(async () => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'fitgate-logistic-reference-'));
    writeFileSync(path.join(dir, 'fitgate.yml'), 'version: 1\nmodels:\n  - "*.model.yml"\n');
    for (const c of CASES) {
      const gen = spawnSync(
        PYTHON3,
        [
          `${sharedBenchDir}ref_logistic.py`,
          'generate',
          '--out',
          path.join(dir, c.name),
          '--rows',
          String(c.rows),
          '--holdout-rows',
          String(c.holdoutRows),
          '--features',
          String(c.features),
          '--seed',
          String(c.seed),
        ],
        { encoding: 'utf8' },
      );
      if (gen.status !== 0) throw new Error(gen.stderr);
      const terms = Array.from({ length: c.features }, (_, j) => `  - polynomial: { of: x${j + 1}, degree: ${c.degree} }`).join('\n');
      writeFileSync(
        path.join(dir, `${c.name}.model.yml`),
        `version: 1\nname: ${c.name}\ntask: classification\ndata:\n  train: ${c.name}/train.csv\n  holdout: ${c.name}/holdout.csv\n  target: y\nterms:\n${terms}\nfit:\n  intercept: true\n  ridge: ${c.ridge}\n  folds: ${c.folds}\n  fold_order: blocks\n`,
      );
    }
    const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
    models = new Map(result.models.map((m) => [m.name, m]));
  });

  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it.each(CASES)('$name: coefficients and every figure within 1e-6 relative', (c) => {
    const model = models.get(c.name);
    expect(model?.error ?? null).toBeNull();
    const metrics = model?.metrics;
    if (!metrics || !model) throw new Error(`no metrics for ${c.name}`);
    const run = spawnSync(
      PYTHON3,
      [
        `${sharedBenchDir}ref_logistic.py`,
        'check',
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
      ],
      { encoding: 'utf8' },
    );
    expect(run.status, run.stderr).toBe(0);
    const ref = JSON.parse(run.stdout) as Reference;
    const deltas: Record<string, number> = {};
    for (const [key, read] of FIGURES) deltas[key] = relative(fromJsonNumber(metrics[key] as JsonNumber), read(ref));
    const scale = Math.max(...ref.coefficients.map(Math.abs));
    deltas.coefficients = Math.max(...ref.coefficients.map((w, j) => Math.abs(fromJsonNumber(model.coefficients[j]) - w) / scale));
    console.log(`${c.name}: ${JSON.stringify(deltas)}`);
    for (const [key, d] of Object.entries(deltas)) expect(d, key).toBeLessThan(TOLERANCE);
    expect(model.coefficients).toHaveLength(ref.coefficients.length);
  });
});
