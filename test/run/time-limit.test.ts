// The per-model time limit (`caps.max_model_seconds`): a model still running at its limit becomes
// that model's `time-limit` error and every other model is still checked, on the main thread
// (the run's own checks between stages) and on worker threads (the same checks, and the thread
// ended from outside when a step does not come back).
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings as defaultSettingsFile } from '../../src/config/settings-file.js';
import { Deadline } from '../../src/core/deadline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { TIME_LIMIT } from '../../src/run/error-result.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';
import type { Result } from '../../src/result/result.js';
import { transpileSources } from './transpile.js';

function csv(rows: number, seed: number): string {
  let s = seed;
  const u = (): number => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
  const lines = ['x,y'];
  for (let i = 0; i < rows; i++) {
    const x = (10 * i) / rows + 0.001 * u();
    lines.push(`${x.toFixed(6)},${(Math.sin(x) + 0.1 * u()).toFixed(6)}`);
  }
  return `${lines.join('\n')}\n`;
}

const descriptorText = (name: string, train: string, terms: string): string =>
  `version: 1\nname: ${name}\ndata: { train: ${train}, holdout: data/small-holdout.csv, target: y }\nterms:\n${terms}`;

/**
 * Three light models and one heavy one: 150 radial columns on 60,000 rows, with a width sweep,
 * minutes of work (its estimate is let through: caps.max_operations is raised).
 */
function files(limitSeconds: number): Record<string, string> {
  return {
    'fitgate.yml': `version: 1\nmodels: ["models/*.model.yml"]\ncaps:\n  max_model_seconds: ${limitSeconds}\n  max_operations: 1e15\nlimits:\n  params_per_sample: off\n  gap_ratio: off\n`,
    'data/small-train.csv': csv(60, 3),
    'data/small-holdout.csv': csv(20, 4),
    'data/big-train.csv': csv(60_000, 5),
    'models/a.model.yml': descriptorText('a', '../data/small-train.csv', '  - linear: [x]\n'),
    'models/b.model.yml': descriptorText('b', '../data/small-train.csv', '  - polynomial: { of: x, degree: 3 }\n'),
    'models/heavy.model.yml': descriptorText(
      'heavy',
      '../data/big-train.csv',
      '  - rbf: { of: x, centers: { from: 0, to: 10, count: 150 }, width: 0.05 }\n',
    ),
    'models/z.model.yml': descriptorText('z', '../data/small-train.csv', '  - linear: [x]\n'),
  };
}

// Paths in the descriptors are relative to models/; fix the hold-out path the same way.
const fixed = (f: Record<string, string>): Record<string, string> =>
  Object.fromEntries(
    Object.entries(f).map(([k, v]) => [k, v.replace('holdout: data/small-holdout.csv', 'holdout: ../data/small-holdout.csv')]),
  );

/** Each model's error code, or `checked` when it got its checks' outcome (pass, warn or fail). */
function outcomes(result: Result): Record<string, string> {
  return Object.fromEntries(result.models.map((m) => [m.name, m.error ? m.error.code : m.checks.length > 0 ? 'checked' : 'nothing']));
}

describe('the per-model time limit on the main thread', () => {
  it('turns a model whose deadline has passed into its time-limit error, at the terms line, naming the cap', async () => {
    const repo = createMemoryRepository(fixed(files(40)));
    const settings = defaultSettingsFile();
    const d = await loadDescriptor(repo, 'models/a.model.yml', settings);
    let t = 0;
    const result = await evaluateModel(repo, d, settings, undefined, new Deadline(1000, () => (t += 600)));
    expect(result.verdict).toBe('error');
    expect(result.error).toMatchObject({ code: TIME_LIMIT, file: 'models/a.model.yml', line: 4 });
    expect(result.error?.message).toMatch(
      /^did not finish within the time limit of 40 s per model \(stopped in the [a-z -]+ after \d+\.\d s\); raise caps\.max_model_seconds in the settings file \(fitgate\.yml\)/,
    );
  });

  it('stops the heavy model at a 3 s limit and checks the others (serial, --jobs 1)', async () => {
    const repo = createMemoryRepository(fixed(files(3)));
    const started = performance.now();
    const result = await runPipeline(defaultSettings('/nowhere'), repo, { jobs: 1 });
    const seconds = (performance.now() - started) / 1000;
    expect(outcomes(result)).toEqual({ a: 'checked', b: 'checked', heavy: TIME_LIMIT, z: 'checked' });
    const heavy = result.models.find((m) => m.name === 'heavy');
    expect(heavy?.error?.message).toMatch(/time limit of 3 s per model \(stopped in the /);
    // Reading 60,000 rows, then at most one step past the limit: not the minutes the model needs.
    expect(seconds, `run took ${seconds.toFixed(1)} s`).toBeLessThan(25);
  });
});

describe('the per-model time limit on worker threads', () => {
  let lib: { dir: string; remove: () => void };
  let root: string;
  beforeAll(() => {
    lib = transpileSources();
    root = mkdtempSync(path.join(os.tmpdir(), 'fitgate-time-limit-'));
    for (const [rel, text] of Object.entries(fixed(files(3)))) {
      mkdirSync(path.dirname(path.join(root, rel)), { recursive: true });
      writeFileSync(path.join(root, rel), text);
    }
  });
  afterAll(() => {
    lib?.remove();
    if (root) rmSync(root, { recursive: true, force: true });
  });

  it('gives the heavy model its time-limit error and the others their outcome, and the command ends', () => {
    const started = performance.now();
    const run = spawnSync(process.execPath, [path.join(lib.dir, 'cli.js'), 'check', '--root', root, '--jobs', '2', '--format', 'json'], {
      encoding: 'utf8',
      timeout: 120_000,
      maxBuffer: 64 * 1024 * 1024,
    });
    const seconds = (performance.now() - started) / 1000;
    expect(run.status, run.stderr).toBe(2);
    const report = JSON.parse(run.stdout) as Result;
    expect(outcomes(report)).toEqual({ a: 'checked', b: 'checked', heavy: TIME_LIMIT, z: 'checked' });
    expect(report.models.find((m) => m.name === 'heavy')?.error?.message).toContain('caps.max_model_seconds');
    expect(seconds, `command took ${seconds.toFixed(1)} s`).toBeLessThan(30);
  });
});
