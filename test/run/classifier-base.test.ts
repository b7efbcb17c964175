// A classifier against the same model on a base commit: the `base` field of its result (hold-out
// log-loss there and its relative change) and the `base-change` check on it, through the pipeline
// with the base run's outcomes given as the baseline (as the action and `check --base` do).
import { describe, expect, it } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { fromJsonNumber, type JsonNumber, type ModelResult } from '../../src/result/result.js';
import { compareWithBase } from '../../src/run/base-comparison.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatText } from '../../src/report/text.js';

// Invented: hours a kiln ran before a glaze check and whether the glaze cracked (1) or not (0).
const HOURS = [0.5, 0.75, 1.0, 1.25, 1.5, 1.75, 1.75, 2.0, 2.25, 2.5, 2.75, 3.0, 3.25, 3.5, 4.0, 4.25, 4.5, 4.75, 5.0, 5.5];
const CRACKED = [0, 0, 0, 0, 0, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1, 1];
const HOLD_HOURS = [0.6, 1.1, 1.9, 2.4, 2.9, 3.4, 3.9, 4.4, 4.9, 5.4];
const HOLD_CRACKED = [0, 0, 0, 1, 0, 1, 1, 1, 1, 1];

const csv = (x: number[], y: number[]): string => `hours,cracked\n${x.map((v, i) => `${v},${y[i]}`).join('\n')}\n`;

function files(name: string, ridge: number, limit = 'base_change: 0.05\n'): Record<string, string> {
  return {
    'fitgate.yml': 'version: 1\nmodels:\n  - "*.model.yml"\n',
    'train.csv': csv(HOURS, CRACKED),
    'holdout.csv': csv(HOLD_HOURS, HOLD_CRACKED),
    'glaze.model.yml': `version: 1\nname: ${name}\ntask: classification\ndata:\n  train: train.csv\n  holdout: holdout.csv\n  target: cracked\nterms:\n  - linear: [hours]\nfit:\n  ridge: ${ridge}\n  folds: 4\n  fold_order: blocks\nlimits:\n  ${limit}`,
  };
}

async function run(repoFiles: Record<string, string>, baseline?: ModelResult[]): Promise<ModelResult> {
  const result = await runPipeline(defaultSettings('.'), createMemoryRepository(repoFiles), {
    jobs: 1,
    ...(baseline ? { baseline: new Map(baseline.map((m) => [m.name, m])), baseCommit: 'b'.repeat(40) } : {}),
  });
  return result.models[0];
}

const figure = (m: ModelResult, key: string): number => fromJsonNumber(m.metrics?.[key] as JsonNumber);

describe('classifier: comparison with the base commit', () => {
  it('carries the base hold-out log-loss and its change, and base-change judges that change', async () => {
    const base = await run(files('glaze', 0));
    // The pull request adds a heavy ridge penalty: the probabilities flatten, the hold-out log-loss grows.
    const head = await run(files('glaze', 20), [base]);
    const baseLoss = figure(base, 'holdout_log_loss');
    const headLoss = figure(head, 'holdout_log_loss');
    expect(headLoss).toBeGreaterThan(baseLoss);
    expect(head.base?.status).toBe('compared');
    expect(head.base?.commit).toBe('b'.repeat(40));
    expect(head.base?.holdout_rmse).toBeNull();
    expect(head.base?.holdout_rmse_change).toBeNull();
    expect(fromJsonNumber(head.base!.holdout_log_loss!)).toBe(baseLoss);
    const change = fromJsonNumber(head.base!.holdout_log_loss_change!);
    expect(Math.abs(change - (headLoss - baseLoss) / baseLoss)).toBeLessThan(1e-12);
    expect(fromJsonNumber(head.base!.gap_ratio!)).toBe(figure(base, 'gap_ratio'));
    const check = head.checks.find((c) => c.id === 'base-change')!;
    expect(change).toBeGreaterThan(0.05);
    expect(check.status).toBe('fail');
    expect(fromJsonNumber(check.value)).toBeCloseTo(change, 12);
    // The reports show the log-loss change where a regression model shows its RMSE change.
    const result = {
      tool: { name: 'fitgate' as const, version: '0' },
      verdict: head.verdict,
      counts: { models: 1, pass: 0, warn: 0, fail: 1, error: 0 },
      models: [head],
      notes: [],
    };
    expect(formatMarkdown(result)).toContain(`log-loss +${(change * 100).toPrecision(3)}`);
    expect(formatText(result)).toMatch(/\+\d+(\.\d+)?%/);
  });

  it('the same fit on both commits: change 0 and the check passes', async () => {
    const base = await run(files('glaze', 1));
    const head = await run(files('glaze', 1), [base]);
    expect(fromJsonNumber(head.base!.holdout_log_loss_change!)).toBe(0);
    expect(head.checks.find((c) => c.id === 'base-change')?.status).toBe('pass');
  });

  it('a classifier new in the pull request is `new`, with null figures, and the check is skipped', async () => {
    const head = await run(files('glaze', 1), []);
    expect(head.base).toEqual({
      status: 'new',
      commit: 'b'.repeat(40),
      holdout_rmse: null,
      gap_ratio: null,
      holdout_rmse_change: null,
      gap_ratio_change: null,
      holdout_log_loss: null,
      holdout_log_loss_change: null,
    });
    expect(head.checks.find((c) => c.id === 'base-change')?.code).toBe('base-change/no-base');
  });

  it('a base model that was a regression model has no log-loss to compare with', async () => {
    const base = await run(files('glaze', 1));
    const asRegression: ModelResult = { ...base, metrics: { ...base.metrics!, task: 'regression', holdout_log_loss: null } };
    const comparison = compareWithBase(base.metrics!, { model: asRegression, by: 'name' }, 'c');
    expect(comparison.holdout_log_loss).toBeNull();
    expect(comparison.holdout_log_loss_change).toBeNull();
    // A regression model's comparison has no log-loss fields at all.
    const regression = compareWithBase({ ...base.metrics!, task: 'regression' }, null, 'c');
    expect('holdout_log_loss' in regression).toBe(false);
  });
});
