// Bounded memory of a streamed training file (data/row-source.ts): the pipeline runs in a child
// process (the sources transpiled, test/run/transpile.ts) with V8's heap capped at 192 MiB
// (`--max-old-space-size=192`, the flag of issue 18), on generated gzip files of 500,000 and
// 2,000,000 rows of 8 inputs. Ten million rows (1.4 GB of CSV) would take minutes here; four times
// the rows is enough to prove the bound: held in memory, the 1.5 million extra rows would add
// 1.5e6 x 10 columns x 8 bytes = 114 MiB of columns (plus the fold table and the predictions);
// streamed, the peak resident memory must not grow by more than 24 MiB between the two (chunks,
// sample and hold-out rows are the same size for both) and stays under 256 MiB.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { writeGzipRows } from './gzip-rows.js';
import { transpileSources } from './transpile.js';

const INPUTS = 8;

/** Writes `rows` rows of x1..x8, y as gzip CSV (test/run/gzip-rows.ts). */
const writeGzip = (file: string, rows: number, seed: number): Promise<void> => writeGzipRows(file, rows, seed, INPUTS);

const SCRIPT = `
const [dir, root] = process.argv.slice(1);
const { createFsRepository } = await import(dir + '/repo/fs-repository.js');
const { loadDescriptor } = await import(dir + '/config/descriptor.js');
const { defaultSettings } = await import(dir + '/config/settings-file.js');
const { evaluateModel } = await import(dir + '/run/evaluate.js');
const repo = createFsRepository(root);
const base = defaultSettings();
const settings = { ...base, caps: { ...base.caps, maxModelSeconds: 600 } };
const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
const result = await evaluateModel(repo, descriptor, settings, undefined, undefined, undefined, { streamAboveBytes: 0 });
process.stdout.write(JSON.stringify({ maxRssKiB: process.resourceUsage().maxRSS, rows: result.rows, error: result.error, streamed: result.extra?.streamed ?? null }));
`;

let work = '';
let sources: { dir: string; remove: () => void } | null = null;

beforeAll(() => {
  work = mkdtempSync(path.join(os.tmpdir(), 'fitgate-stream-'));
  sources = transpileSources();
});

afterAll(() => {
  sources?.remove();
  if (work) rmSync(work, { recursive: true, force: true });
});

async function peak(rows: number): Promise<{ maxRssKiB: number; rows: { train: number }; error: unknown; streamed: unknown }> {
  const root = path.join(work, String(rows));
  mkdirSync(root, { recursive: true });
  await writeGzip(path.join(root, 'train.csv.gz'), rows, 5);
  await writeGzip(path.join(root, 'holdout.csv.gz'), 20000, 6);
  const terms = Array.from({ length: INPUTS }, (_, j) => `x${j + 1}`).join(', ');
  writeFileSync(
    path.join(root, 'm.model.yml'),
    `version: 1\nname: big\ndata:\n  train: train.csv.gz\n  holdout: holdout.csv.gz\n  target: y\nterms:\n  - linear: [${terms}]\nfit:\n  folds: 5\n`,
  );
  const run = spawnSync(process.execPath, ['--max-old-space-size=192', '--input-type=module', '-e', SCRIPT, sources?.dir ?? '', root], {
    encoding: 'utf8',
    maxBuffer: 16 * 1024 * 1024,
  });
  expect(run.status, run.stderr).toBe(0);
  return JSON.parse(run.stdout);
}

describe('a streamed gzip training file in bounded memory (heap capped at 192 MiB)', () => {
  it('peaks under 256 MiB and does not grow from 500,000 to 2,000,000 rows', async () => {
    const small = await peak(500_000);
    const large = await peak(2_000_000);
    for (const [r, n] of [
      [small, 500_000],
      [large, 2_000_000],
    ] as const) {
      expect(r.error).toBeNull();
      expect(r.rows.train).toBe(n);
      expect(r.streamed).toMatchObject({ rows: n, sample_rows: 100_000 });
    }
    const mib = (kib: number): number => kib / 1024;
    const growth = mib(large.maxRssKiB) - mib(small.maxRssKiB);
    expect(mib(large.maxRssKiB), 'peak resident MiB at 2,000,000 rows').toBeLessThan(256);
    expect(growth, `peak grew from ${mib(small.maxRssKiB).toFixed(0)} to ${mib(large.maxRssKiB).toFixed(0)} MiB`).toBeLessThan(24);
  }, 240_000);
});
