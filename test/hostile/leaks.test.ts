/**
 * Nothing outside the repository is opened, whatever a path or link says; messages quote at
 * most the offending cell or line; the token never reaches an output.
 *
 * Two kinds of bait sit in a folder beside the repository: files holding a unique marker (if
 * any output shows the marker, something was read), and named pipes (opening a pipe for reading
 * blocks until a writer comes, so a run that opens one hangs and is killed by the timeout).
 */
import { execFileSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import { descriptor, HOLDOUT, rows, SETTINGS, TRAIN } from './corpus/repo.js';
import {
  prepareBundles,
  runAction,
  runCli,
  SECRET,
  STACK_LINE,
  TOKEN,
  withoutMask,
  writeCase,
  type CaseDirs,
  type FileSpec,
  type Run,
} from './harness.js';

/** Every way a descriptor's data path can point outside, as models of one repository. */
function routes(file: string): Record<string, FileSpec> {
  const files: Record<string, FileSpec> = { 'fitgate.yml': SETTINGS, 'data/train.csv': TRAIN, 'data/holdout.csv': HOLDOUT };
  const add = (name: string, options: { train?: string; holdout?: string }): void => {
    files[`models/${name}.model.yml`] = descriptor({ name, ...options });
  };
  add('dotdot', { train: `../../outside/${file}` });
  add('dotdot-deep', { holdout: `../data/../../outside/${file}` });
  add('absolute', { train: `$OUTSIDE/${file}` });
  files['data/link-abs.csv'] = { link: `$OUTSIDE/${file}` };
  add('link-absolute', { train: '../data/link-abs.csv' });
  files['data/link-rel.csv'] = { link: `../../outside/${file}` };
  add('link-relative', { holdout: '../data/link-rel.csv' });
  files.lib = { link: '$OUTSIDE' };
  add('folder-link', { train: `../lib/${file}` });
  files['data/chain.csv'] = { link: 'chain2.csv' };
  files['data/chain2.csv'] = { link: `../lib/${file}` };
  add('link-chain', { train: '../data/chain.csv' });
  return files;
}

const written: CaseDirs[] = [];
function write(files: Record<string, FileSpec>, label: string, fifos = false): CaseDirs {
  const dirs = writeCase(files, label);
  written.push(dirs);
  if (fifos) for (const name of ['trap.csv', 'trap.yml', 'trap.model.yml']) execFileSync('mkfifo', [path.join(dirs.outside, name)]);
  return dirs;
}

afterAll(() => {
  for (const dirs of written) rmSync(dirs.base, { recursive: true, force: true });
});

const ROUTE_NAMES = ['absolute', 'dotdot', 'dotdot-deep', 'folder-link', 'link-absolute', 'link-chain', 'link-relative'];

function expectClean(run: Run): void {
  // The action prints the token once, in the line that registers it with the runner's masking.
  for (const text of [withoutMask(run.stdout), run.stderr, run.summary, run.report, JSON.stringify(run.outputs)]) {
    expect(text).not.toContain(SECRET);
    expect(text).not.toContain(TOKEN);
    expect(text).not.toMatch(STACK_LINE);
  }
}

describe('data paths that point outside: every route refused, nothing read', () => {
  let dirs: CaseDirs;
  let json: Run;
  let markdown: Run;
  let action: Run;
  beforeAll(async () => {
    prepareBundles();
    dirs = write(routes('secret.csv'), 'leak-routes');
    [json, markdown, action] = await Promise.all([
      runCli(dirs, ['--format', 'json']),
      runCli(dirs, ['--format', 'markdown']),
      runAction(dirs),
    ]);
  }, 120_000);

  it('each model is an error `path-outside` in the JSON report', () => {
    expect(json.status, json.stderr).toBe(2);
    const report = JSON.parse(json.stdout) as { models: { descriptor: string; error: { code: string } | null }[] };
    const got = report.models.map((m) => [m.descriptor, m.error?.code]).sort();
    expect(got).toEqual(ROUTE_NAMES.map((n) => [`models/${n}.model.yml`, 'path-outside']).sort());
  });

  it('the marker appears in no output: JSON, Markdown, the action log, summary, report and outputs', () => {
    for (const run of [json, markdown, action]) expectClean(run);
    expect(action.outputs.verdict).toBe('error');
  });
});

describe('named pipes outside: a run that opened one would hang', () => {
  it('every data route to a pipe ends promptly with path-outside', async () => {
    const dirs = write(routes('trap.csv'), 'leak-fifo', true);
    const run = await runCli(dirs, ['--format', 'json'], 15_000);
    expect(run.status, `killed after ${run.ms} ms? ${run.stderr}`).toBe(2);
    const report = JSON.parse(run.stdout) as { models: { name: string; error: { code: string } | null }[] };
    expect(report.models.map((m) => m.error?.code)).toEqual(ROUTE_NAMES.map(() => 'path-outside'));
  });

  it('the settings file as a link to a pipe, --config at a pipe, a descriptor argument linking to a pipe', async () => {
    const linked = write({ ...routes('trap.csv'), 'fitgate.yml': { link: '$OUTSIDE/trap.yml' } }, 'leak-fifo-settings', true);
    const plain = write(
      {
        'fitgate.yml': SETTINGS,
        'models/t.model.yml': { link: '$OUTSIDE/trap.model.yml' },
        'models/u.model.yml': { link: '../../outside/trap.model.yml' },
      },
      'leak-fifo-args',
      true,
    );
    const runs = await Promise.all([
      runCli(linked, [], 15_000),
      runCli(plain, ['--config', '../outside/trap.yml'], 15_000),
      runCli(plain, ['--config', '$OUTSIDE/trap.yml'], 15_000),
      runCli(plain, ['repo/models/t.model.yml'], 15_000),
      runCli(plain, ['repo/models/u.model.yml'], 15_000),
      runAction(linked, {}, 15_000),
      runAction(plain, { config: '../outside/trap.yml' }, 15_000),
    ]);
    for (const run of runs.slice(0, 5)) {
      expect(run.status, `after ${run.ms} ms: ${run.stdout}${run.stderr}`).toBe(2);
      expect(run.stderr).toMatch(/outside the repository/);
    }
    for (const run of runs.slice(5)) {
      expect(run.status, `after ${run.ms} ms: ${run.stdout}`).toBe(1);
      expect(run.outputs.verdict).toBe('error');
      expectClean(run);
    }
  });
});

describe('messages quote at most the offending cell or line', () => {
  const MARK = 'NEIGHBOUR-LINE-MARKER-93b1';
  const settings = defaultSettings('/repo');

  it('a bad CSV cell: the message shows the cell, not the other cells or lines', async () => {
    const train = rows(30, 0, 1, 'x,y,note')
      .replace(/\n(\d+),([^\n]+)/g, (_, x: string, y: string) => `\n${x},${y},${MARK}`)
      .replace('\n4,', '\nfour,');
    const result = await runPipeline(
      settings,
      createMemoryRepository({
        'fitgate.yml': SETTINGS,
        'models/m.model.yml': descriptor(),
        'data/train.csv': train,
        'data/holdout.csv': HOLDOUT,
      }),
    );
    const error = result.models[0].error;
    expect(error?.message).toContain('"four"');
    expect(JSON.stringify(result)).not.toContain(MARK);
  });

  it('a YAML error: the message names the line, not the file text around it', async () => {
    const text = `# ${MARK}\n${descriptor()}limits: { gap_ratio: [1, \n`;
    const result = await runPipeline(
      settings,
      createMemoryRepository({ 'fitgate.yml': SETTINGS, 'models/m.model.yml': text, 'data/train.csv': TRAIN, 'data/holdout.csv': HOLDOUT }),
    );
    expect(result.models[0].error?.code).toBe('yaml-syntax');
    expect(JSON.stringify(result)).not.toContain(MARK);
  });

  it('a schema error quotes the bad value cut short, not the whole document', async () => {
    const long = `${MARK}${'z'.repeat(5000)}`;
    const result = await runPipeline(
      settings,
      createMemoryRepository({
        'fitgate.yml': SETTINGS,
        'models/m.model.yml': descriptor({ extra: `fit:\n  ridge: "${long}"\n# ${MARK}-2\n` }),
        'data/train.csv': TRAIN,
        'data/holdout.csv': HOLDOUT,
      }),
    );
    const message = result.models[0].error?.message ?? '';
    expect(message).toContain('fit.ridge');
    expect(message.length).toBeLessThan(300);
    expect(message).not.toContain(`${MARK}-2`);
  });
});
