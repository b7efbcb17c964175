import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { evaluateModels, workerScript } from '../../src/run/model-worker.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { fleetFiles } from './fleet.js';
import { transpileSources } from './transpile.js';

let lib: { dir: string; remove: () => void };
let repo: string;
const files = fleetFiles(5);

beforeAll(() => {
  lib = transpileSources();
  repo = mkdtempSync(path.join(os.tmpdir(), 'fitgate-fleet-'));
  for (const [rel, text] of Object.entries(files)) {
    mkdirSync(path.dirname(path.join(repo, rel)), { recursive: true });
    writeFileSync(path.join(repo, rel), text);
  }
});
afterAll(() => {
  lib?.remove();
  if (repo) rmSync(repo, { recursive: true, force: true });
});

/** Runs the transpiled CLI; NODE_DEBUG=worker makes Node log every worker it starts. */
function cli(args: string[]): { status: number | null; stdout: string; workers: number } {
  const run = spawnSync(process.execPath, [path.join(lib.dir, 'cli.js'), ...args], {
    encoding: 'utf8',
    env: { ...process.env, NODE_DEBUG: 'worker', NO_COLOR: '1' },
    maxBuffer: 256 * 1024 * 1024,
  });
  const workers = (run.stderr.match(/create new worker/g) ?? []).length;
  return { status: run.status, stdout: run.stdout, workers };
}

describe('models on worker threads', () => {
  it('gives byte-identical reports and exit status with 1 thread and with 3 (the main thread and 2 workers)', () => {
    for (const format of ['json', 'text']) {
      const serial = cli(['check', '--root', repo, '--jobs', '1', '--format', format]);
      const parallel = cli(['check', '--root', repo, '--jobs', '3', '--format', format]);
      expect(serial.workers, 'no worker with --jobs 1').toBe(0);
      expect(parallel.workers, `workers started with --jobs 3 (${format})`).toBe(2);
      expect(parallel.status).toBe(serial.status);
      expect(parallel.stdout, `${format} report`).toBe(serial.stdout);
    }
  });

  it('through the bundle (where each worker loads the whole CLI): the report alone on stdout, the same as serial', () => {
    // Regression: the bundle's entry ran the command in every worker too, printing the usage text.
    const bundle = path.join(process.cwd(), 'dist', 'cli', 'index.js');
    const run = (jobs: string) =>
      spawnSync(process.execPath, [bundle, 'check', '--root', repo, '--jobs', jobs, '--format', 'json'], {
        encoding: 'utf8',
        env: { ...process.env, NODE_DEBUG: 'worker' },
        maxBuffer: 256 * 1024 * 1024,
      });
    const serial = run('1');
    const parallel = run('2');
    expect((parallel.stderr.match(/create new worker/g) ?? []).length, 'workers started beside the main thread').toBe(1);
    expect(parallel.stdout).not.toContain('Usage:');
    expect(() => JSON.parse(parallel.stdout)).not.toThrow();
    expect(parallel.stdout).toBe(serial.stdout);
    expect(parallel.status).toBe(serial.status);
  });

  it('through the bundle, the JSON report to a file (each model rendered on the thread that evaluated it): byte for byte the serial one', () => {
    const bundle = path.join(process.cwd(), 'dist', 'cli', 'index.js');
    const out = mkdtempSync(path.join(os.tmpdir(), 'fitgate-fleet-out-'));
    try {
      const run = (jobs: string) => {
        const file = path.join(out, `report-${jobs}.json`);
        const done = spawnSync(process.execPath, [bundle, 'check', '--root', repo, '--jobs', jobs, '--format', 'json', '--out', file], {
          encoding: 'utf8',
          env: { ...process.env, NODE_DEBUG: 'worker' },
        });
        return { status: done.status, workers: (done.stderr.match(/create new worker/g) ?? []).length, text: readFileSync(file, 'utf8') };
      };
      const serial = run('1');
      const parallel = run('3');
      expect(parallel.workers, 'the main thread and 2 workers').toBe(2);
      expect(parallel.text).toBe(serial.text);
      expect(parallel.status).toBe(serial.status);
      expect(readdirSync(out).sort(), 'no spool file left behind').toEqual(['report-1.json', 'report-3.json']);
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  });

  it('matches the in-process serial pipeline, error models included, in descriptor order', async () => {
    const parallel = cli(['check', '--root', repo, '--jobs', '4', '--format', 'json']);
    expect(parallel.workers, 'the main thread and 3 workers').toBe(3);
    const inProcess = await runPipeline(defaultSettings(repo), createMemoryRepository(files), { jobs: 4, root: repo });
    const report = JSON.parse(parallel.stdout) as typeof inProcess;
    expect(report).toEqual(JSON.parse(JSON.stringify(inProcess)));
    expect(report.models.length).toBe(Object.keys(files).filter((f) => f.endsWith('.model.yml')).length);
    const verdicts = Object.fromEntries(report.models.map((m) => [m.name, m.verdict]));
    expect(verdicts['bad-data'], 'the bad data file makes its model an error').toBe('error');
    const descriptors = report.models.map((m) => m.descriptor);
    expect(descriptors).toEqual([...descriptors].sort());
  });

  it('starts no worker by default when the guessed work is too small to pay for one (the same report)', () => {
    const byDefault = cli(['check', '--root', repo, '--format', 'json']);
    const serial = cli(['check', '--root', repo, '--jobs', '1', '--format', 'json']);
    expect(byDefault.workers, 'a fleet of 5 small models runs on the main thread').toBe(0);
    expect(byDefault.stdout).toBe(serial.stdout);
    expect(byDefault.status).toBe(serial.status);
  });

  it('runs serially from TypeScript sources (workers cannot load .ts)', async () => {
    expect(workerScript(), 'this test runs the .ts module through vite').toBeNull();
    const memory = createMemoryRepository(files);
    const results = await evaluateModels(memory, [], (await import('../../src/config/settings-file.js')).defaultSettings(), {
      jobs: 4,
      root: repo,
    });
    expect(results).toEqual([]);
  });

  it('rejects a bad --jobs value with exit status 2', () => {
    for (const bad of ['0', '-1', 'two', '1.5']) {
      const run = cli(['check', '--root', repo, '--jobs', bad]);
      expect(run.status, `--jobs ${bad}`).toBe(2);
    }
  });
});
