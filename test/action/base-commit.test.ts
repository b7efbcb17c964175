import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ACTION_FETCH_HINT, evaluateBase } from '../../src/action/base-commit.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { fromJsonNumber, type Result } from '../../src/result/result.js';
import { formatMarkdown } from '../../src/report/markdown.js';
import { formatText } from '../../src/report/text.js';
import type { Settings } from '../../src/run/settings.js';
import { makeFixture, type Fixture } from './fixture.js';

/** Writes files under `root` (null removes one). */
function writeFiles(root: string, files: Record<string, string | null>): void {
  for (const [rel, text] of Object.entries(files)) {
    const full = path.join(root, rel);
    if (text === null) rmSync(full, { force: true });
    else {
      mkdirSync(path.dirname(full), { recursive: true });
      writeFileSync(full, text);
    }
  }
}

let fixture: Fixture;
let settings: Settings;

beforeAll(() => {
  fixture = makeFixture();
  settings = { root: path.join(fixture.workspace, 'ml'), config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' };
});

describe('evaluateBase', () => {
  it('checks the models as they were on the base commit, in a sub-folder of the git repository', async () => {
    const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect(options.notes).toEqual([]);
    expect(options.baseCommit).toBe(fixture.baseSha);
    expect([...(options.baseline?.keys() ?? [])].sort()).toEqual(['lean', 'steady', 'wide']);
    // On the base, `wide` has degree 2: 3 parameters.
    expect(options.baseline?.get('wide')?.parameters).toBe(3);
  });

  it('feeds the head run: new models, changes, and the base_change limit', async () => {
    const options = await evaluateBase(settings, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    const result = await runPipeline(settings, createFsRepository(settings.root), options);
    const byName = new Map(result.models.map((m) => [m.name, m]));
    expect(byName.get('fresh')?.base?.status).toBe('new');
    const steady = byName.get('steady')!;
    expect(steady.base?.status).toBe('compared');
    const head = fromJsonNumber(steady.metrics!.holdout_rmse);
    const base = fromJsonNumber(steady.base!.holdout_rmse!);
    const change = fromJsonNumber(steady.base!.holdout_rmse_change!);
    expect(Math.abs(change - (head - base) / base), `head ${head}, base ${base}, change ${change}`).toBeLessThan(1e-12);
    const check = steady.checks.find((c) => c.id === 'base-change')!;
    expect(check.status).toBe('fail');
    expect(fromJsonNumber(check.value)).toBeCloseTo(change, 12);
    expect(check.line).toBe(11);
    // Without a limit the check is off for the other models.
    expect(byName.get('wide')?.checks.find((c) => c.id === 'base-change')?.status).toBe('skipped');
    expect(byName.get('fresh')?.checks.find((c) => c.id === 'base-change')?.code).toBe('base-change/no-base');
  });

  it('says once that a commit git does not have is not available', async () => {
    const options = await evaluateBase(settings, 'a'.repeat(40), { fetchHint: ACTION_FETCH_HINT });
    expect(options).toEqual({ notes: [`base commit aaaaaaa is not available; ${ACTION_FETCH_HINT}`] });
  });

  it('says so when the root is not in a git work tree', async () => {
    const lonely = mkdtempSync(path.join(tmpdir(), 'fitgate-nogit-'));
    const options = await evaluateBase({ ...settings, root: lonely }, fixture.baseSha, { fetchHint: ACTION_FETCH_HINT });
    expect(options.baseline).toBeUndefined();
    expect(options.notes?.[0]).toMatch(/^base commit [0-9a-f]{7} is not available: .* is not inside a git work tree\./);
  });

  it('treats every model as new when the named settings file did not exist on the base', async () => {
    const options = await evaluateBase({ ...settings, config: 'lean-only.yml', configExplicit: true }, fixture.baseSha, {
      fetchHint: ACTION_FETCH_HINT,
    });
    expect(options.baseline?.size).toBe(0);
    expect(options.notes).toEqual([]);
  });

  it('leaves out named descriptors that are new in the head', async () => {
    const options = await evaluateBase({ ...settings, descriptors: ['models/fresh.model.yml', 'models/wide.model.yml'] }, fixture.baseSha, {
      fetchHint: ACTION_FETCH_HINT,
    });
    expect([...(options.baseline?.keys() ?? [])]).toEqual(['wide']);
  });
});

describe('a pull request that renames a model cannot escape base-change', () => {
  const wobble = (i: number): number => (((i * 7) % 5) - 2) * 0.1;
  const rows = (n: number, x0: number, step: number, scale: number): string =>
    `x,y\n${Array.from({ length: n }, (_, i) => `${x0 + i * step},${2 * (x0 + i * step) + 1 + scale * wobble(i + 3)}`).join('\n')}\n`;
  const kiln = (name: string, train = '../data/train.csv', holdout = '../data/holdout.csv'): string =>
    `version: 1\nname: ${name}\ndata:\n  train: ${train}\n  holdout: ${holdout}\n  target: y\nterms:\n  - linear: [x]\nlimits:\n  params_per_sample: off\n  base_change: 0.1\n`;
  let root = '';
  let baseSha = '';

  /** A repository whose base commit has `kiln` (hold-out wobble x1); the working tree is the pull request. */
  beforeAll(() => {
    const workspace = mkdtempSync(path.join(tmpdir(), 'fitgate-rename-'));
    root = workspace;
    const git = (...args: string[]): string =>
      execFileSync('git', args, {
        cwd: workspace,
        encoding: 'utf8',
        env: {
          ...process.env,
          GIT_AUTHOR_NAME: 't',
          GIT_AUTHOR_EMAIL: 't@example.com',
          GIT_COMMITTER_NAME: 't',
          GIT_COMMITTER_EMAIL: 't@example.com',
        },
      }).trim();
    git('init', '-q', '-b', 'main');
    writeFiles(workspace, {
      'fitgate.yml':
        'version: 1\nmodels: ["models/*.model.yml"]\nlimits:\n  gap_ratio: off\n  swing: off\n  swing_beyond: off\n  leakage: off\n',
      'models/kiln.model.yml': kiln('kiln'),
      'data/train.csv': rows(20, 0, 1, 1),
      'data/holdout.csv': rows(10, 0.5, 2, 1),
    });
    git('add', '-A');
    git('commit', '-q', '-m', 'base');
    baseSha = git('rev-parse', 'HEAD');
  });

  /** The working tree as the pull request leaves it (the hold-out error tripled), checked against the base. */
  async function pullRequest(files: Record<string, string | null>): Promise<Result> {
    writeFiles(root, { 'data/holdout.csv': rows(10, 0.5, 2, 3), ...files });
    const prSettings: Settings = { root, config: 'fitgate.yml', configExplicit: false, descriptors: [], failOn: 'fail' };
    const options = await evaluateBase(prSettings, baseSha, { fetchHint: ACTION_FETCH_HINT });
    return runPipeline(prSettings, createFsRepository(root), options);
  }

  it('renamed in its file: found by the descriptor path, reported as renamed, and base-change fails', async () => {
    const result = await pullRequest({ 'models/kiln.model.yml': kiln('kiln-v2') });
    const m = result.models[0];
    expect(m.name).toBe('kiln-v2');
    expect(m.base).toMatchObject({
      status: 'renamed',
      previous: { name: 'kiln', descriptor: 'models/kiln.model.yml', matched_by: 'descriptor' },
    });
    expect(m.checks.find((c) => c.id === 'base-change')?.status).toBe('fail');
    expect(result.notes).toEqual(['settings: fitgate.yml']);
    expect(formatMarkdown(result)).toMatch(/\| FAIL \| kiln-v2 \| .* \| renamed from kiln: RMSE \+\d/);
    expect(formatText(result)).toContain(
      'note: kiln-v2 is compared with kiln (models/kiln.model.yml) of the base commit, found by its descriptor path',
    );
  });

  it('renamed and moved to another file: found by its data files, and base-change fails', async () => {
    const result = await pullRequest({ 'models/kiln.model.yml': null, 'models/furnace.model.yml': kiln('furnace') });
    const m = result.models[0];
    expect(m.base).toMatchObject({ status: 'renamed', previous: { name: 'kiln', matched_by: 'data' } });
    expect(m.checks.find((c) => c.id === 'base-change')?.status).toBe('fail');
  });

  it('renamed, moved and pointed at copies of the data: new, and a note says the base model matched nothing', async () => {
    const result = await pullRequest({
      'models/kiln.model.yml': null,
      'models/furnace.model.yml': null,
      'data/copy-train.csv': rows(20, 0, 1, 1),
      'data/copy-holdout.csv': rows(10, 0.5, 2, 3),
      'models/oven.model.yml': kiln('oven', '../data/copy-train.csv', '../data/copy-holdout.csv'),
    });
    expect(result.models[0].base?.status).toBe('new');
    expect(result.notes).toEqual([
      'settings: fitgate.yml',
      'base model kiln (models/kiln.model.yml) matches no model of this run by name, descriptor path or data files: it was removed, or renamed and moved with other data, and is not compared',
    ]);
  });
});
