// A training file read as a stream on every pass (data/row-source.ts) against the same model held
// in memory: with fewer rows than the sample size the sample is every row, so every figure of the
// report must agree to rounding (the sums are gathered per chunk instead of in one run: 1e-9
// relative). The streamed path is forced with a threshold of 0 bytes and small chunks.
import { describe, expect, it } from 'vitest';
import { gzipSync } from 'node:zlib';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { assignFolds, foldIdsOf, streamedFolds } from '../../src/diagnostics/folds.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import type { ModelResult } from '../../src/result/result.js';
import { RowReservoir, streamsTrainingFile } from '../../src/data/row-source.js';
import type { RepoReader } from '../../src/repo/types.js';

const TOLERANCE = 1e-9;

/** Deterministic rows x1, x2, y: a smooth function plus a fixed pseudo-random wobble. */
function rows(n: number, seed: number): string[] {
  let s = seed >>> 0;
  const rand = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
  const out: string[] = [];
  for (let i = 0; i < n; i++) {
    const x1 = rand() * 4 - 2;
    const x2 = rand() * 10;
    const y = Math.sin(x1) + 0.3 * x2 - 0.02 * x2 * x2 + (rand() - 0.5) * 0.4;
    out.push(`${x1.toPrecision(10)},${x2.toPrecision(10)},${y.toPrecision(10)}`);
  }
  return out;
}

const train = rows(5000, 11);
// Four hold-out rows repeat training rows (two with the target too): the leakage scan must find them.
const holdout = [...rows(700, 12), train[10], train[4000], train[20].replace(/,[^,]*$/, ',99'), train[4999].replace(/,[^,]*$/, ',-99')];

function repository(trainFile: string, descriptorExtra: string, gz: boolean) {
  const text = `x1,x2,y\n${train.join('\n')}\n`;
  return createMemoryRepository({
    'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/${trainFile}\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - polynomial: { of: x1, degree: 5 }\n  - polynomial: { of: x2, degree: 3 }\n${descriptorExtra}`,
    [`data/${trainFile}`]: gz ? gzipSync(Buffer.from(text)) : text,
    'data/holdout.csv': `x1,x2,y\n${holdout.join('\n')}\n`,
  });
}

async function evaluate(trainFile: string, extra: string, gz: boolean, streamed: boolean): Promise<ModelResult> {
  const repo = repository(trainFile, extra, gz);
  const settings = defaultSettings();
  const descriptor = await loadDescriptor(repo, 'models/m.model.yml', settings);
  return evaluateModel(
    repo,
    descriptor,
    settings,
    undefined,
    undefined,
    undefined,
    streamed ? { streamAboveBytes: 0, chunkRows: 1500 } : {},
  );
}

/** Every number of `a` equals the one at the same place of `b` within TOLERANCE relative; the rest equal. */
function sameFigures(a: unknown, b: unknown, where: string): void {
  if (typeof a === 'number' && typeof b === 'number') {
    const rel = Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), Number.MIN_VALUE);
    if (!(a === b || rel <= TOLERANCE)) expect.fail(`${where}: streamed ${a}, in memory ${b}`);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    expect(a.length, where).toBe(b.length);
    a.forEach((x, i) => sameFigures(x, b[i], `${where}[${i}]`));
    return;
  }
  if (a !== null && b !== null && typeof a === 'object' && typeof b === 'object') {
    expect(Object.keys(a).sort(), where).toEqual(Object.keys(b).sort());
    for (const key of Object.keys(a))
      sameFigures((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key], `${where}.${key}`);
    return;
  }
  // Messages quote figures rounded for people, which may differ in the last digit shown.
  if (typeof a === 'string' && typeof b === 'string' && /\d/.test(a)) return;
  expect(a, where).toEqual(b);
}

describe('a streamed training file against the same file held in memory', () => {
  for (const [label, file, gz, extra] of [
    ['plain CSV, blocks folds, ridge 0', 'train.csv', false, 'fit:\n  folds: 5\n  fold_order: blocks\n'],
    [
      'gzip CSV, blocks folds, ridge 0.5 and shipped coefficients',
      'train.csv.gz',
      true,
      'fit:\n  folds: 4\n  fold_order: blocks\n  ridge: 0.5\ncoefficients: [1, 0.1, 0.2, 0.3, 0.1, 0.1, 0.2, 0.1, 0.05]\n',
    ],
  ] as const) {
    it(`gives every figure of the report within ${TOLERANCE} (${label}; 5000 rows in chunks of 1500)`, async () => {
      const memory = await evaluate(file, extra, gz, false);
      const streamed = await evaluate(file, extra, gz, true);
      expect(memory.error).toBeNull();
      expect(streamed.error).toBeNull();
      expect(streamed.rows).toEqual({ train: 5000, holdout: 704 });
      expect((streamed.extra as { streamed?: { rows: number; sample_rows: number } }).streamed).toMatchObject({
        rows: 5000,
        sample_rows: 5000,
      });
      const { extra: e1, ...s } = streamed;
      const { extra: e2, ...m } = memory;
      const { streamed: _s, ...restStreamed } = e1 as Record<string, unknown>;
      sameFigures(restStreamed, e2, 'extra');
      sameFigures(s, m, 'model');
      const leak = streamed.checks.find((c) => c.id === 'leakage');
      expect(leak?.message).toContain('4 of 704 hold-out rows repeat a training row');
    });
  }

  it('with a sample smaller than the file: figures of every row stay exact, the sampled diagnostics say so', async () => {
    const extra = 'fit:\n  folds: 5\n  fold_order: shuffled\n';
    const repo = repository('train.csv', extra, false);
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(repo, 'models/m.model.yml', settings);
    const memory = await evaluateModel(repo, descriptor, settings);
    const streamed = await evaluateModel(repo, descriptor, settings, undefined, undefined, undefined, {
      streamAboveBytes: 0,
      sampleRows: 1000,
    });
    expect(streamed.error).toBeNull();
    expect(streamed.rows.train).toBe(5000);
    expect((streamed.extra as { streamed?: unknown }).streamed).toMatchObject({ rows: 5000, sample_rows: 1000 });
    // Every row: training errors, coefficients (terms fixed from the sample give another but
    // equivalent basis, so compare predictions' errors), parameters per row.
    for (const key of ['train_rmse', 'train_r2', 'holdout_rmse', 'params_per_sample'] as const)
      sameFigures(streamed.metrics?.[key], memory.metrics?.[key], key);
    // The polynomials' default shift and scale come from every row (merged in the sampling read),
    // not from the sample: the same standardised columns, so the same coefficients and condition.
    for (const key of ['max_std_coefficient', 'max_abs_coefficient', 'condition_number', 'condition_number_scaled'] as const)
      sameFigures(streamed.metrics?.[key], memory.metrics?.[key], key);
    // Shuffled folds of the streamed path are another shuffle: the k-fold error is close, not equal.
    const cv = (r: ModelResult) => r.metrics?.cv_rmse as number;
    expect(Math.abs(cv(streamed) - cv(memory)) / cv(memory)).toBeLessThan(0.02);
    const sweep = streamed.checks.find((c) => c.id === 'complexity');
    if (sweep === undefined) expect.fail('no complexity outcome');
    expect(sweep.detail).toMatchObject({ subsampled: true });
    expect((sweep.detail as { rows: number }).rows).toBeLessThanOrEqual(1000);
    expect(sweep.message).toContain('seeded sample of');
  });

  it('shuffled folds: the streamed ones are a partition with the sizes of the in-memory ones, and blocks folds are equal', () => {
    for (const n of [1, 7, 100, 4097, 65536, 100003]) {
      for (const k of [1, 2, 5, 10]) {
        const memory = assignFolds(n, k, 'shuffled', 3);
        const folds = streamedFolds(n, k, 'shuffled', 3);
        const ids = foldIdsOf(folds, 0, n, new Int32Array(n));
        const counts = new Array<number>(folds.k).fill(0);
        for (const f of ids) counts[f]++;
        expect(counts, `n=${n} k=${k}`).toEqual(memory.sizes);
        const blocks = streamedFolds(n, k, 'blocks', 3);
        // In pieces, as the passes ask for them.
        const pieces = new Int32Array(n);
        for (let start = 0; start < n; start += 999)
          pieces.set(foldIdsOf(blocks, start, Math.min(999, n - start), new Int32Array(999)), start);
        expect(Array.from(pieces), `blocks n=${n} k=${k}`).toEqual(Array.from(assignFolds(n, k, 'blocks', 3).foldOf));
      }
    }
    // Shuffled folds mix the file order: the first 1000 rows do not all land in one fold.
    const ids = foldIdsOf(streamedFolds(100000, 5, 'shuffled', 1), 0, 1000, new Int32Array(1000));
    expect(new Set(ids).size).toBe(5);
  });

  it('the reservoir keeps every row while they fit, and a bounded sample in file order after', () => {
    const reservoir = new RowReservoir(1, 100, 1);
    const lines = Int32Array.from({ length: 1000 }, (_, i) => i + 2);
    const x = Float64Array.from({ length: 1000 }, (_, i) => i);
    reservoir.add({ inputs: [x.subarray(0, 60)], y: x.subarray(0, 60), lines: lines.subarray(0, 60), rows: 60, file: 'f' });
    expect(Array.from(reservoir.rows('f').y)).toEqual(Array.from(x.subarray(0, 60)));
    reservoir.add({ inputs: [x.subarray(60)], y: x.subarray(60), lines: lines.subarray(60), rows: 940, file: 'f' });
    const sample = reservoir.rows('f');
    expect(sample.rows).toBe(100);
    for (let i = 1; i < 100; i++) expect(sample.lines[i]).toBeGreaterThan(sample.lines[i - 1]);
    for (let i = 0; i < 100; i++) expect(sample.lines[i]).toBe(sample.y[i] + 2);
    // Rows from the whole file, not only its start.
    expect(sample.y[99]).toBeGreaterThan(500);
  });

  it('streams a file above the threshold (gzip judged at 4x its size) and keeps smaller ones in memory', () => {
    expect(streamsTrainingFile('t.csv', 100, 99)).toBe(true);
    expect(streamsTrainingFile('t.csv', 99, 99)).toBe(false);
    expect(streamsTrainingFile('t.csv.gz', 25, 99)).toBe(true);
    expect(streamsTrainingFile('t.csv.gz', 24, 99)).toBe(false);
  });

  it('refuses a classifier whose training file is too large to hold, naming the descriptor line', async () => {
    const memory = createMemoryRepository({
      'm.model.yml':
        'version: 1\nname: m\ntask: classification\ndata:\n  train: t.csv\n  holdout: t.csv\n  target: y\nterms:\n  - linear: [x]\n',
      't.csv': 'x,y\n1,0\n2,1\n3,0\n4,1\n',
    });
    // The same files, with the training file said to be 600 MiB (over the 512 MiB a classifier may hold).
    const repo: RepoReader = {
      label: memory.label,
      resolve: (f, t, w) => memory.resolve(f, t, w),
      isFile: (p) => memory.isFile(p),
      entryKind: (p) => memory.entryKind(p),
      size: async (p) => (p === 't.csv' ? 600 * 1024 * 1024 : memory.size(p)),
      read: (p) => memory.read(p),
      stream: (p, c) => memory.stream(p, c),
      glob: (g) => memory.glob(g),
    };
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
    const result = await evaluateModel(repo, descriptor, settings);
    expect(result.error).toMatchObject({ code: 'too-large-to-hold', file: 'm.model.yml', line: 5 });
    expect(result.error?.message).toContain('512 MiB');
  });

  it('refuses a streamed model with weights plainly, naming the descriptor line', async () => {
    const repo = createMemoryRepository({
      'm.model.yml': 'version: 1\nname: m\ndata:\n  train: t.csv\n  holdout: t.csv\n  target: y\n  weight: w\nterms:\n  - linear: [x]\n',
      't.csv': 'x,y,w\n1,2,1\n2,3,1\n3,5,2\n4,4,1\n',
    });
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
    const result = await evaluateModel(repo, descriptor, settings, undefined, undefined, undefined, { streamAboveBytes: 0 });
    expect(result.error).toMatchObject({ code: 'too-large-to-hold', file: 'm.model.yml', line: 4 });
    expect(result.error?.message).toContain('`data.weight`');
  });
});
