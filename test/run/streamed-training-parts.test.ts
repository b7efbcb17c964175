// Training data in parts (`data.train` a glob of plain and gzip parts) read as a stream on every
// pass (data/row-source.ts) against the same parts held in memory: with fewer rows than the sample
// size the sample is every row, so every figure of the report must agree to rounding (1e-9
// relative, as for one streamed file: test/run/streamed-training.test.ts), and every line a
// message or a check detail names must be the same part and line. The streamed path is forced
// with a threshold of 0 bytes and small chunks (1500 rows: parts of 1700, 1300, 0 and 2000 rows
// end inside chunks).
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { fileRowSource, streamsTrainingData } from '../../src/data/row-source.js';
import { placeOfLine } from '../../src/data/data-parts.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import type { ModelResult } from '../../src/result/result.js';
import type { RepoReader } from '../../src/repo/types.js';
import { evaluateModel } from '../../src/run/evaluate.js';

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
    const x2 = rand() * 10 + 0.5;
    const y = Math.sin(x1) + 0.3 * x2 - 0.02 * x2 * x2 + (rand() - 0.5) * 0.4;
    out.push(`${x1.toPrecision(10)},${x2.toPrecision(10)},${y.toPrecision(10)}`);
  }
  return out;
}

const train = rows(5000, 11);
// Hold-out rows repeating training rows of the first, second and fourth part (two with the target too).
const holdout = [...rows(700, 12), train[10], train[1800], train[3100].replace(/,[^,]*$/, ',99'), train[4999].replace(/,[^,]*$/, ',-99')];
const HEADER = 'x1,x2,y\n';

/**
 * The 5000 training rows in four parts, in reading order: part-1.csv (rows 0-1699), part-2.csv.gz
 * (1700-2999), part-3.csv (a header only), part-4.csv (3000-4999, after a blank line). `edit`
 * changes a row of the fourth part before it is written.
 */
function partFiles(edit?: (rows: string[]) => void): Record<string, string | Uint8Array> {
  const fourth = train.slice(3000);
  edit?.(fourth);
  return {
    'data/train/part-1.csv': `${HEADER}${train.slice(0, 1700).join('\n')}\n`,
    'data/train/part-2.csv.gz': gzipSync(Buffer.from(`${HEADER}${train.slice(1700, 3000).join('\n')}\n`)),
    'data/train/part-3.csv': HEADER,
    'data/train/part-4.csv': `${HEADER}\n${fourth.join('\n')}\n`,
  };
}

const TERMS = 'terms:\n  - polynomial: { of: x1, degree: 5 }\n  - polynomial: { of: x2, degree: 3 }\n';

function repository(extra: string, files = partFiles(), terms = TERMS) {
  return createMemoryRepository({
    'm.model.yml': `version: 1\nname: m\ndata:\n  train: "data/train/part-*"\n  holdout: data/holdout.csv\n  target: y\n${terms}${extra}`,
    'data/holdout.csv': `${HEADER}${holdout.join('\n')}\n`,
    ...files,
  });
}

async function evaluate(repo: ReturnType<typeof repository>, streamed: boolean, chunkRows = 1500): Promise<ModelResult> {
  const settings = defaultSettings();
  const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
  return evaluateModel(repo, descriptor, settings, undefined, undefined, undefined, streamed ? { streamAboveBytes: 0, chunkRows } : {});
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
  // Messages quote figures rounded for people, which may differ in the last digit shown; their
  // file names and lines are compared apart below.
  if (typeof a === 'string' && typeof b === 'string' && /\d/.test(a) && /\d/.test(b)) {
    const words = (s: string): string => s.replace(/-?\d+(\.\d+)?(e[-+]?\d+)?/g, '#');
    expect(words(a), where).toBe(words(b));
    return;
  }
  expect(a, where).toEqual(b);
}

describe('training data in parts read as a stream against the same parts held in memory', () => {
  for (const [label, extra] of [
    ['blocks folds, ridge 0', 'fit:\n  folds: 5\n  fold_order: blocks\n'],
    [
      'blocks folds, ridge 0.5 and shipped coefficients',
      'fit:\n  folds: 4\n  fold_order: blocks\n  ridge: 0.5\ncoefficients: [1, 0.1, 0.2, 0.3, 0.1, 0.1, 0.2, 0.1, 0.05]\n',
    ],
  ] as const) {
    it(`gives every figure of the report within ${TOLERANCE}, and the same parts and lines (${label})`, async () => {
      const repo = repository(extra);
      const memory = await evaluate(repo, false);
      const streamed = await evaluate(repo, true);
      expect(memory.error).toBeNull();
      expect(streamed.error).toBeNull();
      expect(streamed.rows).toEqual({ train: 5000, holdout: 704 });
      expect((streamed.extra as { streamed?: unknown }).streamed).toMatchObject({ rows: 5000, sample_rows: 5000 });
      const { extra: e1, ...s } = streamed;
      const { extra: e2, ...m } = memory;
      const { streamed: _s, ...restStreamed } = e1 as Record<string, unknown>;
      sameFigures(restStreamed, e2, 'extra');
      sameFigures(s, m, 'model');
      // The leakage rows name each training row's part and its own line, as in memory.
      const leak = (r: ModelResult) => r.checks.find((c) => c.id === 'leakage');
      expect(leak(streamed)?.message).toBe(leak(memory)?.message);
      expect(leak(streamed)?.detail).toEqual(leak(memory)?.detail);
      expect(leak(streamed)?.detail).toMatchObject({
        train_lines: [12, 102, 103, 2002],
        train_line_files: ['data/train/part-1.csv', 'data/train/part-2.csv.gz', 'data/train/part-4.csv', 'data/train/part-4.csv'],
      });
      expect(leak(streamed)?.message).toContain('data/train/part-4.csv lines 103, 2002');
      // Every check and the swing rows (lines of the sample) name the same parts and lines.
      for (const c of memory.checks) {
        const other = streamed.checks.find((x) => x.id === c.id);
        expect(other?.status, c.id).toBe(c.status);
      }
    });
  }

  it('with `data.split` over the parts, streams the training rows of each part and agrees with memory', async () => {
    const labelled = (from: number, to: number): string =>
      `x1,x2,y,s\n${train
        .slice(from, to)
        .map((r, i) => `${r},${(from + i) % 5 === 0 ? 'test' : 'fit'}`)
        .join('\n')}\n`;
    const repo = createMemoryRepository({
      'm.model.yml': `version: 1\nname: m\ndata:\n  train: [p/b.csv.gz, p/a.csv]\n  split: { column: s, train: fit, holdout: test }\n  target: y\n${TERMS}fit:\n  folds: 5\n  fold_order: blocks\n`,
      'p/a.csv': labelled(0, 2600),
      'p/b.csv.gz': gzipSync(Buffer.from(labelled(2600, 5000))),
    });
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error).toBeNull();
    expect(streamed.rows).toEqual({ train: 4000, holdout: 1000 });
    expect((streamed.extra as { streamed?: unknown }).streamed).toMatchObject({ rows: 4000 });
    for (const key of ['train_rmse', 'holdout_rmse', 'cv_rmse', 'train_r2', 'gap_ratio', 'condition_number'] as const) {
      expect(typeof streamed.metrics?.[key], key).toBe('number');
      sameFigures(streamed.metrics?.[key], memory.metrics?.[key], key);
    }
  });

  it('a chunk size that is not a whole number of blocks still gives the in-memory figures', async () => {
    const repo = repository('fit:\n  folds: 3\n  fold_order: blocks\n');
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true, 777);
    expect(streamed.error).toBeNull();
    for (const key of ['train_rmse', 'holdout_rmse', 'cv_rmse', 'train_r2', 'condition_number'] as const) {
      expect(typeof streamed.metrics?.[key], key).toBe('number');
      sameFigures(streamed.metrics?.[key], memory.metrics?.[key], key);
    }
  });

  it('names the part and its own line of a target out of range, as in memory', async () => {
    const repo = repository(
      '',
      partFiles((r) => (r[5] = r[5].replace(/,[^,]*$/, ',1e200'))),
    );
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error?.code).toBe('target-range');
    expect(streamed.error).toEqual(memory.error);
    // Row 6 of the fourth part: its header on line 1, a blank line 2, rows from line 3.
    expect(streamed.error?.message).toContain('on line 8 of data/train/part-4.csv');
  });

  it('names the part and its own line of an input outside a transform domain, as in memory', async () => {
    const terms = 'terms:\n  - polynomial: { of: x2, degree: 2, transform: log }\n';
    const repo = repository(
      '',
      partFiles((r) => (r[100] = r[100].replace(/^([^,]*),[^,]*/, '$1,-3'))),
      terms,
    );
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error?.code).toBe('transform-domain');
    expect(streamed.error).toEqual(memory.error);
    expect(streamed.error).toMatchObject({ file: 'data/train/part-4.csv', line: 103 });
  });

  it('names the part and its own line of a design value that overflows, as in memory', async () => {
    const terms = 'terms:\n  - polynomial: { of: x1, degree: 3, shift: 0, scale: 1 }\n';
    const repo = repository(
      '',
      partFiles((r) => (r[1990] = r[1990].replace(/^[^,]*/, '1e50'))),
      terms,
    );
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error?.code).toBe('design-overflow');
    expect(streamed.error).toEqual(memory.error);
    expect(streamed.error?.message).toContain('on line 1993 of data/train/part-4.csv');
  });

  it('checks one header across the parts when streaming: the part that differs, its line and column', async () => {
    const files = partFiles();
    files['data/train/part-4.csv'] = `x2,x1,y\n${train.slice(3000).join('\n')}\n`;
    const repo = repository('', files);
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error?.code).toBe('csv-header-parts');
    expect(streamed.error).toEqual(memory.error);
    expect(streamed.error).toMatchObject({ file: 'data/train/part-4.csv', line: 1 });
  });

  it('says that the parts have no data rows, as in memory', async () => {
    const repo = repository('', {
      'data/train/part-1.csv': HEADER,
      'data/train/part-2.csv.gz': gzipSync(Buffer.from(HEADER)),
    });
    const memory = await evaluate(repo, false);
    const streamed = await evaluate(repo, true);
    expect(memory.error?.code).toBe('no-rows');
    expect(streamed.error).toEqual(memory.error);
    expect(streamed.error?.message).toContain('the 2 parts of `data.train`');
  });

  it('refuses streamed parts with weights, naming the parts and the descriptor line', async () => {
    const w = (text: string): string => text.replace(/^x1,x2,y$/m, 'x1,x2,y,w').replace(/^(-?\d[^,\n]*,[^,\n]*,[^,\n]*)$/gm, '$1,1');
    const repo = createMemoryRepository({
      'm.model.yml':
        'version: 1\nname: m\ndata:\n  train: [a.csv, b.csv]\n  holdout: a.csv\n  target: y\n  weight: w\nterms:\n  - linear: [x1]\n',
      'a.csv': w(`${HEADER}${train.slice(0, 10).join('\n')}\n`),
      'b.csv': w(`${HEADER}${train.slice(10, 20).join('\n')}\n`),
    });
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
    const held = await evaluateModel(repo, descriptor, settings);
    expect(held.error).toBeNull();
    const result = await evaluateModel(repo, descriptor, settings, undefined, undefined, undefined, { streamAboveBytes: 0 });
    expect(result.error).toMatchObject({ code: 'too-large-to-hold', file: 'm.model.yml', line: 4 });
    expect(result.error?.message).toContain('the 2 training parts a.csv (+1 more part) are too large to hold');
    expect(result.error?.message).toContain('`data.weight`');
  });

  it('refuses a classifier whose training parts together are too large to hold, naming the parts', async () => {
    const memory = createMemoryRepository({
      'm.model.yml':
        'version: 1\nname: m\ntask: classification\ndata:\n  train: [t1.csv, t2.csv]\n  holdout: t1.csv\n  target: y\nterms:\n  - linear: [x]\n',
      't1.csv': 'x,y\n1,0\n2,1\n3,0\n4,1\n',
      't2.csv': 'x,y\n5,0\n6,1\n7,0\n8,1\n',
    });
    // The same files, each part said to be 300 MiB: none over the 512 MiB a classifier may hold, both together over it.
    const repo: RepoReader = {
      label: memory.label,
      resolve: (f, t, w) => memory.resolve(f, t, w),
      isFile: (p) => memory.isFile(p),
      entryKind: (p) => memory.entryKind(p),
      size: async (p) => (p.startsWith('t') ? 300 * 1024 * 1024 : memory.size(p)),
      read: (p) => memory.read(p),
      stream: (p, c) => memory.stream(p, c),
      glob: (g) => memory.glob(g),
    };
    const settings = defaultSettings();
    const descriptor = await loadDescriptor(repo, 'm.model.yml', settings);
    const result = await evaluateModel(repo, descriptor, settings);
    expect(result.error).toMatchObject({ code: 'too-large-to-hold', file: 'm.model.yml', line: 5 });
    expect(result.error?.message).toContain('the 2 training parts t1.csv (+1 more part) are estimated at over 512 MiB');
  });

  it('streams when the parts together are above the threshold (gzip parts judged at 4x their size)', () => {
    const f = (path: string, size: number) => ({ path, size });
    expect(streamsTrainingData([f('a.csv', 50), f('b.csv', 50)], 99)).toBe(true);
    expect(streamsTrainingData([f('a.csv', 50), f('b.csv', 49)], 99)).toBe(false);
    expect(streamsTrainingData([f('a.csv', 80), f('b.csv.gz', 5)], 99)).toBe(true);
    expect(streamsTrainingData([f('a.csv', 79), f('b.csv.gz', 5)], 99)).toBe(false);
    expect(streamsTrainingData([f('a.csv.gz', 25)], 99)).toBe(true);
  });

  it('a part source hands out every row in order in chunks of the size asked for, across the parts, each line placed in its part', async () => {
    const repo = repository('');
    const source = fileRowSource(
      repo,
      ['data/train/part-1.csv', 'data/train/part-2.csv.gz', 'data/train/part-3.csv', 'data/train/part-4.csv'],
      {
        inputs: ['x1', 'x2'],
        target: 'y',
        maxBytes: 1e9,
      },
    );
    expect(source.file).toBe('data/train/part-1.csv (+3 more parts)');
    for (const size of [1500, 1, 4999, 5000, 65536]) {
      const sizes: number[] = [];
      const ys: number[] = [];
      const places: string[] = [];
      await source.forEachChunk((chunk, start) => {
        expect(start, `size ${size}`).toBe(sizes.reduce((a, b) => a + b, 0));
        sizes.push(chunk.rows);
        for (let i = 0; i < chunk.rows; i++) {
          ys.push(chunk.y[i]);
          if (start + i === 0 || start + i === 1700 || start + i === 4999) {
            const p = placeOfLine(chunk, chunk.lines[i]);
            places.push(`${p.file}:${p.line}`);
          }
        }
      }, size);
      expect(
        sizes.slice(0, -1).every((n) => n === size),
        `size ${size}: ${sizes.slice(0, 5)}`,
      ).toBe(true);
      expect(ys.length).toBe(5000);
      expect(ys.map((y) => y.toPrecision(10))).toEqual(train.map((r) => r.split(',')[2]));
      expect(places).toEqual(['data/train/part-1.csv:2', 'data/train/part-2.csv.gz:2', 'data/train/part-4.csv:2002']);
    }
  });
});
