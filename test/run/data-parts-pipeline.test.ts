import { mkdtempSync, mkdirSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import { validateReport } from '../../src/config/generated/report-validator.js';
import { parseArgs } from '../../src/entries/args.js';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { jsonReport } from '../../src/report/json.js';
import { formatText } from '../../src/report/text.js';
import type { ModelResult, Result } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

/** y = 2x + 1 with a small wobble, 60 rows (invented). */
const rows = Array.from({ length: 60 }, (_, i) => [i / 4, 2 * (i / 4) + 1 + ((i * 7) % 5) / 50]);
const line = (r: number[]): string => `${r[0]},${r[1]}`;
const csv = (list: number[][]): string => `x,y\n${list.map(line).join('\n')}\n`;
const train = rows.filter((_, i) => i % 4 !== 0);
const holdout = rows.filter((_, i) => i % 4 === 0);

function descriptor(data: string, extra = ''): string {
  return `version: 1\nname: m\ndata:\n${data}  target: y\nterms:\n  - linear: [x]\n${extra}`;
}

async function run(files: Record<string, string | Uint8Array>): Promise<Result> {
  return runPipeline(defaultSettings('/repo'), createMemoryRepository(files), { jobs: 1 });
}

async function model(files: Record<string, string | Uint8Array>): Promise<ModelResult> {
  const result = await run(files);
  expect(result.models).toHaveLength(1);
  return result.models[0];
}

/** The training rows in three parts (one gzip, written out of order in the list) and the hold-out rows in two. */
const PARTS = {
  'm.model.yml': descriptor('  train: "train/part-*.csv*"\n  holdout: [holdout/h-2.csv, holdout/h-1.csv]\n'),
  'train/part-1.csv': csv(train.slice(0, 15)),
  'train/part-2.csv.gz': gzipSync(Buffer.from(csv(train.slice(15, 30)))),
  'train/part-3.csv': csv(train.slice(30)),
  'holdout/h-1.csv': csv(holdout.slice(0, 7)),
  'holdout/h-2.csv': csv(holdout.slice(7)),
};
const ONE = { 'm.model.yml': descriptor('  train: t.csv\n  holdout: h.csv\n'), 't.csv': csv(train), 'h.csv': csv(holdout) };

describe('data parts through the whole pipeline', () => {
  it('give the same figures as the same rows in one file each', async () => {
    const one = await model(ONE);
    const parts = await model(PARTS);
    expect(one.verdict).not.toBe('error');
    expect(parts.rows).toEqual(one.rows);
    expect(parts.coefficients).toEqual(one.coefficients);
    expect(parts.metrics).toEqual(one.metrics);
    expect(parts.checks.map((c) => [c.id, c.status, c.value])).toEqual(one.checks.map((c) => [c.id, c.status, c.value]));
  });

  it('name the parts in the report (`data`, chart rows) and validate against the strict report schema; one file keeps its shape', async () => {
    const one = await run(ONE);
    const parts = await run(PARTS);
    const m = parts.models[0];
    expect(m.data).toEqual({
      train: ['train/part-1.csv', 'train/part-2.csv.gz', 'train/part-3.csv'],
      holdout: ['holdout/h-1.csv', 'holdout/h-2.csv'],
    });
    const series = m.charts?.holdout;
    expect(series?.files).toEqual(['holdout/h-1.csv', 'holdout/h-2.csv']);
    // Hold-out rows 1..7 from h-1 (lines 2..8), then h-2 from its own line 2.
    expect(series?.lines.slice(5, 9)).toEqual([7, 8, 2, 3]);
    expect(series?.file_index?.slice(5, 9)).toEqual([0, 0, 1, 1]);
    for (const result of [one, parts]) expect(validateReport(JSON.parse([...jsonReport(result)].join('')))).toBe(true);
    const single = one.models[0];
    expect('data' in single).toBe(false);
    expect(single.charts?.holdout && 'files' in single.charts.holdout).toBe(false);
  });

  it('leakage names each repeated row by its part and its own line', async () => {
    // The hold-out part h-2 repeats the training row on line 3 of part-3 (train[31]).
    const leaky = { ...PARTS, 'holdout/h-2.csv': csv([...holdout.slice(7), train[31]]) };
    const m = await model(leaky);
    const leakage = m.checks.find((c) => c.id === 'leakage');
    expect(leakage?.value).toBe(1);
    expect(leakage?.message).toContain('holdout/h-2.csv line 10');
    expect(leakage?.message).toContain('train/part-3.csv line 3');
    expect(leakage?.detail).toMatchObject({
      holdout_lines: [10],
      train_lines: [3],
      holdout_line_files: ['holdout/h-2.csv'],
      train_line_files: ['train/part-3.csv'],
    });
  });

  it('a bad cell is named by its part and its own line', async () => {
    const bad = { ...PARTS, 'train/part-3.csv': csv(train.slice(30)).replace(/\n([^\n]*)\n$/, '\n$1\n1,oops\n') };
    const m = await model(bad);
    expect(m.error).toMatchObject({ code: 'csv-cell', file: 'train/part-3.csv', line: train.length - 30 + 2 });
  });

  it('a part whose header differs is an error naming the part', async () => {
    const m = await model({ ...PARTS, 'holdout/h-2.csv': `y,x\n1,2\n` });
    expect(m.error).toMatchObject({ code: 'csv-header-parts', file: 'holdout/h-2.csv', line: 1 });
  });

  it('data.split with parts: each side keeps its label from every part', async () => {
    const labelled = (list: number[][], from: number): string =>
      `set,x,y\n${list.map((r, k) => `${(from + k) % 4 === 0 ? 'test' : 'fit'},${line(r)}`).join('\n')}\n`;
    const m = await model({
      'm.model.yml': descriptor('  train: [b.csv, a.csv]\n  split: { column: set, train: fit, holdout: test }\n'),
      'a.csv': labelled(rows.slice(0, 28), 0),
      'b.csv': labelled(rows.slice(28), 28),
    });
    const one = await model(ONE);
    expect(m.rows).toEqual(one.rows);
    expect(m.coefficients).toEqual(one.coefficients);
    expect(m.data).toEqual({ train: ['a.csv', 'b.csv'], holdout: ['a.csv', 'b.csv'] });
  });

  it('a classifier with text labels reads its parts as one table', async () => {
    const labelled = (list: number[][]): string =>
      `x,y\n${list.map((r, k) => `${r[0]},${(r[0] * 7 + k) % 3 < 1.5 ? 'yes' : 'no'}`).join('\n')}\n`;
    const classifier = (data: string): string =>
      `version: 1\nname: c\ntask: classification\ndata:\n${data}  target: y\n  positive: "yes"\nterms:\n  - linear: [x]\n`;
    const one = await model({
      'c.model.yml': classifier('  train: t.csv\n  holdout: h.csv\n'),
      't.csv': labelled(train),
      'h.csv': labelled(holdout),
    });
    const parts = await model({
      'c.model.yml': classifier('  train: [t1.csv, t2.csv.gz]\n  holdout: h.csv\n'),
      't1.csv': labelled(train).split('\n').slice(0, 21).join('\n') + '\n',
      't2.csv.gz': gzipSync(Buffer.from(`x,y\n${labelled(train).split('\n').slice(21).join('\n')}`)),
      'h.csv': labelled(holdout),
    });
    expect(one.verdict).not.toBe('error');
    expect(parts.coefficients).toEqual(one.coefficients);
    expect(parts.metrics).toEqual(one.metrics);
  });
});

describe('data parts at the command level (in-process, on disk)', () => {
  const made: string[] = [];
  afterAll(() => {
    for (const dir of made) rmSync(dir, { recursive: true, force: true });
  });
  const folder = (): { base: string; repo: string } => {
    const base = mkdtempSync(path.join(tmpdir(), 'fitgate-parts-'));
    made.push(base);
    const repo = path.join(base, 'repo');
    for (const dir of ['repo/models/train', 'repo/models/holdout', 'outside']) mkdirSync(path.join(base, dir), { recursive: true });
    writeFileSync(path.join(repo, 'fitgate.yml'), 'version: 1\nmodels: ["models/*.model.yml"]\n');
    return { base, repo };
  };
  const check = async (repo: string): Promise<Result> => {
    const parsed = parseArgs(['check', '--root', repo, '--jobs', '1'], repo);
    if (parsed.kind !== 'check') throw new Error(`expected a check run, got ${parsed.kind}`);
    return runPipeline(parsed.settings, createFsRepository(parsed.settings.root), { jobs: 1, root: parsed.settings.root });
  };

  it('a glob of parts runs as one file does, and the text report names no part unless an error does', async () => {
    const { repo } = folder();
    for (const [name, text] of Object.entries(PARTS)) {
      if (name === 'm.model.yml') continue;
      writeFileSync(path.join(repo, 'models', name), text);
    }
    writeFileSync(path.join(repo, 'models', 'm.model.yml'), PARTS['m.model.yml']);
    const result = await check(repo);
    expect(result.models[0].verdict).not.toBe('error');
    expect(result.models[0].data?.train).toEqual(['models/train/part-1.csv', 'models/train/part-2.csv.gz', 'models/train/part-3.csv']);
    expect(validateReport(JSON.parse([...jsonReport(result)].join('')))).toBe(true);
    expect(formatText(result, { color: false })).toContain('m');
  });

  it('a part that is a link leading outside the repository is refused at its line, through a glob and through a list', async () => {
    const { base, repo } = folder();
    writeFileSync(path.join(base, 'outside', 'secret.csv'), csv(train));
    writeFileSync(path.join(repo, 'models', 'train', 'part-1.csv'), csv(train.slice(0, 20)));
    symlinkSync(path.join(base, 'outside', 'secret.csv'), path.join(repo, 'models', 'train', 'part-2.csv'));
    writeFileSync(path.join(repo, 'models', 'h.csv'), csv(holdout));
    writeFileSync(
      path.join(repo, 'models', 'g.model.yml'),
      descriptor('  train: "train/*.csv"\n  holdout: h.csv\n').replace('name: m', 'name: g'),
    );
    writeFileSync(
      path.join(repo, 'models', 'l.model.yml'),
      descriptor('  train:\n    - train/part-1.csv\n    - train/part-2.csv\n  holdout: h.csv\n').replace('name: m', 'name: l'),
    );
    writeFileSync(
      path.join(repo, 'models', 'd.model.yml'),
      descriptor('  train: "../../outside/*.csv"\n  holdout: h.csv\n').replace('name: m', 'name: d'),
    );
    const result = await check(repo);
    // A model that could not be loaded is named by its descriptor path.
    const by = new Map(result.models.map((m) => [m.descriptor.replace(/^models\/(.)\.model\.yml$/, '$1'), m]));
    expect(by.get('g')?.error).toMatchObject({ code: 'path-outside', file: 'models/g.model.yml', line: 4 });
    expect(by.get('l')?.error).toMatchObject({ code: 'path-outside', file: 'models/l.model.yml', line: 6 });
    expect(by.get('l')?.error?.message).toMatch(/train\/part-2\.csv.*symbolic link/);
    expect(by.get('d')?.error).toMatchObject({ code: 'path-outside', file: 'models/d.model.yml', line: 4 });
    expect(JSON.stringify(result)).not.toContain('outside/secret');
  });
});

describe('data parts in messages of later stages', () => {
  it('a design value out of range names the training part and its own line', async () => {
    // Row 3 of part-2 (its line 4) has x = 1e30: with scale 1e-60, z^2 = 1e180 is beyond the design's range (±1e140).
    const big = train.slice(15, 30).map((r, k) => (k === 2 ? [1e30, r[1]] : r));
    const m = await model({
      'm.model.yml': descriptor('  train: [p-1.csv, p-2.csv]\n  holdout: h.csv\n').replace(
        'linear: [x]',
        'polynomial: { of: x, degree: 3, shift: 0, scale: 1e-60 }',
      ),
      'p-1.csv': csv(train.slice(0, 15)),
      'p-2.csv': csv(big),
      'h.csv': csv(holdout),
    });
    expect(m.error?.code).toBe('design-overflow');
    expect(m.error?.message).toContain('on line 4 of p-2.csv;');
  });

  it('a bad weight names the part and its own line', async () => {
    const weighted = (list: number[][], bad: number): string =>
      `x,y,w\n${list.map((r, k) => `${line(r)},${k === bad ? -1 : 1}`).join('\n')}\n`;
    const m = await model({
      'm.model.yml': descriptor('  train: [p-1.csv, p-2.csv]\n  holdout: h.csv\n  weight: w\n'),
      'p-1.csv': weighted(train.slice(0, 15), -1),
      'p-2.csv': weighted(train.slice(15), 5),
      'h.csv': weighted(holdout, -1),
    });
    expect(m.error).toMatchObject({ code: 'bad-weight', file: 'p-2.csv', line: 7 });
  });
});

describe('data parts on a commit (the base of a pull request)', () => {
  it('the git reader resolves a glob of parts as the disk does, links inside the commit included', async () => {
    const { execFileSync } = await import('node:child_process');
    const { createGitRepository } = await import('../../src/repo/git-repository.js');
    const { loadDescriptor } = await import('../../src/config/descriptor.js');
    const { defaultSettings: settingsFile } = await import('../../src/config/settings-file.js');
    const dir = mkdtempSync(path.join(tmpdir(), 'fitgate-parts-git-'));
    try {
      mkdirSync(path.join(dir, 'models', 'train'), { recursive: true });
      writeFileSync(path.join(dir, 'models', 'm.model.yml'), descriptor('  train: "train/p-*.csv"\n  holdout: h.csv\n'));
      writeFileSync(path.join(dir, 'models', 'train', 'p-2.csv'), csv(train.slice(20)));
      writeFileSync(path.join(dir, 'models', 'real-1.csv'), csv(train.slice(0, 20)));
      symlinkSync('../real-1.csv', path.join(dir, 'models', 'train', 'p-1.csv'));
      writeFileSync(path.join(dir, 'models', 'h.csv'), csv(holdout));
      const env = {
        ...process.env,
        GIT_AUTHOR_NAME: 't',
        GIT_AUTHOR_EMAIL: 't@example.com',
        GIT_COMMITTER_NAME: 't',
        GIT_COMMITTER_EMAIL: 't@example.com',
      };
      for (const args of [
        ['init', '-q'],
        ['add', '-A'],
        ['commit', '-q', '-m', 'base'],
      ])
        execFileSync('git', args, { cwd: dir, env, stdio: 'pipe' });
      const repo = createGitRepository({ cwd: dir, commit: 'HEAD' });
      const d = await loadDescriptor(repo, 'models/m.model.yml', settingsFile());
      expect(d.data.trainParts).toEqual(['models/train/p-1.csv', 'models/train/p-2.csv']);
      const result = await runPipeline(defaultSettings(dir), repo, { jobs: 1 });
      const onDisk = await model(ONE);
      expect(result.models[0].coefficients).toEqual(onDisk.coefficients);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
