// Scenario folders: each test/scenarios/<name>/ is a small repository with an expect.json that
// lists cases { args, exitCode, models: { name: { verdict, checks: { id: status } } } }. Every case
// runs in-process (parseArgs -> runPipeline -> exitStatus) and through the built CLI
// (node dist/cli/index.js), and both must agree with the expectation.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseArgs } from '../../src/entries/args.js';
import { InputError } from '../../src/core/errors.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { exitStatus, type Result } from '../../src/result/result.js';

const here = path.dirname(fileURLToPath(import.meta.url));
const root = path.resolve(here, '..', '..');
const cli = path.join(root, 'dist', 'cli', 'index.js');

interface Expectation {
  args: string[];
  exitCode: number;
  models?: Record<string, { verdict?: string; rank?: number; parameters?: number; error?: string; checks?: Record<string, string> }>;
  stderr?: string[];
}

const scenarios = readdirSync(here, { withFileTypes: true })
  .filter((d) => d.isDirectory() && existsSync(path.join(here, d.name, 'expect.json')))
  .map((d) => ({
    name: d.name,
    cases: (JSON.parse(readFileSync(path.join(here, d.name, 'expect.json'), 'utf8')) as { cases: Expectation[] }).cases,
  }));

function checkModels(result: Result, want: Expectation['models']): void {
  for (const [name, w] of Object.entries(want ?? {})) {
    const m = result.models.find((x) => x.name === name);
    expect(m, `model ${name} in ${result.models.map((x) => x.name).join(', ')}`).toBeDefined();
    if (!m) continue;
    if (w.verdict) expect(m.verdict, `verdict of ${name}`).toBe(w.verdict);
    if (w.rank !== undefined) expect(m.metrics?.rank, `rank of ${name}`).toBe(w.rank);
    if (w.parameters !== undefined) expect(m.parameters, `parameters of ${name}`).toBe(w.parameters);
    if (w.error) expect(m.error?.code, `error code of ${name}`).toBe(w.error);
    for (const [id, status] of Object.entries(w.checks ?? {})) {
      expect(m.checks.find((c) => c.id === id)?.status, `${name} ${id}`).toBe(status);
    }
  }
}

beforeAll(() => {
  if (!existsSync(cli)) execFileSync(process.execPath, [path.join(root, 'test', 'tools', 'bundle.mjs')], { cwd: root });
});

describe.each(scenarios)('scenario $name', ({ name, cases }) => {
  const dir = path.join(here, name);

  it.each(cases)('in-process, args $args -> exit $exitCode', async (c) => {
    const parsed = parseArgs(['check', '--root', dir, ...c.args], root);
    if (parsed.kind !== 'check') throw new Error('expected a check command');
    let status: number;
    try {
      const result = await runPipeline(parsed.settings, createFsRepository(parsed.settings.root));
      status = exitStatus(result, parsed.settings.failOn);
      checkModels(result, c.models);
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      status = 2;
      for (const word of c.stderr ?? []) expect((error as InputError).describe()).toContain(word);
    }
    expect(status).toBe(c.exitCode);
  });

  it.each(cases)('through the built CLI, args $args -> exit $exitCode', (c) => {
    const run = spawnSync(process.execPath, [cli, 'check', '--root', dir, '--format', 'json', ...c.args], { encoding: 'utf8' });
    expect(run.status, run.stderr).toBe(c.exitCode);
    for (const word of c.stderr ?? []) expect(run.stderr).toContain(word);
    if (run.stdout.trim() !== '') checkModels(JSON.parse(run.stdout) as Result, c.models);
    else expect(c.models ?? {}).toEqual({});
    expect(run.stderr).not.toMatch(/\n\s+at /);
  });
});
