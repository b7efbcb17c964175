import { describe, expect, it } from 'vitest';
import { compareCodePoints, dataFiles, MAX_DATA_PARTS } from '../../src/config/data-paths.js';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { dataKey } from '../../src/run/base-comparison.js';
import { expectInputError } from './helpers.js';

const F = 'models/m.model.yml';
const CSV = 'x,y\n1,2\n';

/** A descriptor whose `data` block is `data` (line 3 is `data:`, line 4 the first key under it). */
function descriptor(data: string): string {
  return `version: 1\nname: m\ndata:\n${data}  target: y\nterms:\n  - linear: [x]\n`;
}

function repo(data: string, files: Record<string, string> = {}) {
  return createMemoryRepository({ [F]: descriptor(data), ...files });
}

describe('data.train / data.holdout as parts', () => {
  it('a list names its parts, read in code-point order of their repository paths whatever the list order', async () => {
    const files = { 'models/t/b.csv': CSV, 'models/t/a.csv': CSV, 'models/t/B.csv': CSV, 'models/h.csv': CSV };
    const d = await loadDescriptor(repo('  train: [t/b.csv, t/a.csv, t/B.csv]\n  holdout: h.csv\n', files), F, defaultSettings());
    expect(d.data.trainParts).toEqual(['models/t/B.csv', 'models/t/a.csv', 'models/t/b.csv']);
    expect(d.data.train).toBe('models/t/B.csv');
    expect(d.data.holdoutParts).toBeUndefined();
    expect(d.data.holdout).toBe('models/h.csv');
    expect(dataFiles(d.data, 'holdout')).toEqual(['models/h.csv']);
  });

  it('a glob relative to the descriptor matches with the repository matcher (gzip and plain parts mixed)', async () => {
    const files = {
      'models/train/part-2.csv.gz': CSV,
      'models/train/part-10.csv.gz': CSV,
      'models/train/part-1.csv': CSV,
      'models/train/other.csv': CSV,
      'models/train/deeper/part-3.csv': CSV,
      'models/h.csv': CSV,
    };
    const d = await loadDescriptor(repo('  train: "train/part-*.csv*"\n  holdout: h.csv\n', files), F, defaultSettings());
    // Code-point order: '1' < '2', and "part-1." < "part-10" ('.' is U+002E, '0' U+0030).
    expect(d.data.trainParts).toEqual(['models/train/part-1.csv', 'models/train/part-10.csv.gz', 'models/train/part-2.csv.gz']);
    const deep = await loadDescriptor(repo('  train: "train/**/part-*.csv"\n  holdout: h.csv\n', files), F, defaultSettings());
    expect(deep.data.trainParts).toEqual(['models/train/deeper/part-3.csv', 'models/train/part-1.csv']);
  });

  it('a list may hold globs; a path with glob characters that names a file is that one file', async () => {
    const files = { 'models/p/a1.csv': CSV, 'models/p/a2.csv': CSV, 'models/q.csv': CSV, 'models/odd[1].csv': CSV, 'models/h.csv': CSV };
    const d = await loadDescriptor(repo('  train: [q.csv, "p/a*.csv"]\n  holdout: "odd[1].csv"\n', files), F, defaultSettings());
    expect(d.data.trainParts).toEqual(['models/p/a1.csv', 'models/p/a2.csv', 'models/q.csv']);
    expect(d.data.holdout).toBe('models/odd[1].csv');
    expect(d.data.holdoutParts).toBeUndefined();
    // Also through a `..` segment, which a glob may not have: a path that names a file is no glob.
    const up = await loadDescriptor(repo('  train: q.csv\n  holdout: "../models/odd[1].csv"\n', files), F, defaultSettings());
    expect(up.data.holdout).toBe('models/odd[1].csv');
  });

  it('with data.split both sides read the same parts', async () => {
    const files = { 'models/a.csv': 'x,y,s\n1,2,fit\n', 'models/b.csv': 'x,y,s\n1,2,test\n' };
    const d = await loadDescriptor(
      repo('  train: [b.csv, a.csv]\n  split: { column: s, train: fit, holdout: test }\n', files),
      F,
      defaultSettings(),
    );
    expect(d.data.trainParts).toEqual(['models/a.csv', 'models/b.csv']);
    expect(d.data.holdoutParts).toEqual(['models/a.csv', 'models/b.csv']);
  });

  it('errors name the line of the key, or of the list item', async () => {
    const files = { 'models/a.csv': CSV, 'models/h.csv': CSV, 'models/sub/x.csv': CSV };
    // A missing item, at its own line (line 6: the second item of a block list).
    await expectInputError(
      () => loadDescriptor(repo('  train:\n    - a.csv\n    - nothing.csv\n  holdout: h.csv\n', files), F, defaultSettings()),
      {
        code: 'file-missing',
        file: F,
        line: 6,
        key: 'data.train[1]',
      },
    );
    // A glob matching nothing.
    await expectInputError(() => loadDescriptor(repo('  train: a.csv\n  holdout: "none/*.csv"\n', files), F, defaultSettings()), {
      code: 'data-glob-empty',
      file: F,
      line: 5,
      key: 'data.holdout',
      message: /matches no file/,
    });
    // A glob with a `..` segment is refused before anything is matched, as `models` patterns are.
    await expectInputError(() => loadDescriptor(repo('  train: "../models/*.csv"\n  holdout: h.csv\n', files), F, defaultSettings()), {
      code: 'path-outside',
      file: F,
      line: 4,
      key: 'data.train',
      message: /`\.\.` segment/,
    });
    await expectInputError(
      () => loadDescriptor(repo('  train: ["a.csv", "sub/{x,..}/*.csv"]\n  holdout: h.csv\n', files), F, defaultSettings()),
      {
        code: 'path-outside',
        file: F,
        line: 4,
        key: 'data.train[1]',
      },
    );
    // The same file twice (by a path and a glob).
    await expectInputError(() => loadDescriptor(repo('  train: [a.csv, "a*.csv"]\n  holdout: h.csv\n', files), F, defaultSettings()), {
      code: 'data-parts',
      file: F,
      line: 4,
      key: 'data.train[1]',
      message: /named again/,
    });
    // A number, or a list holding one, is a schema error at its line.
    const wrong = await expectInputError(
      () => loadDescriptor(repo('  train: a.csv\n  holdout: [h.csv, 5]\n', files), F, defaultSettings()),
      {
        code: 'schema',
        file: F,
        line: 5,
      },
    );
    expect(wrong.message).toBe('expected text, got 5 (write it in quotes, "5", for the text)');
    // An empty list is a schema error.
    await expectInputError(() => loadDescriptor(repo('  train: []\n  holdout: h.csv\n', files), F, defaultSettings()), {
      code: 'schema',
      file: F,
      line: 4,
    });
  });

  it('a glob under a descriptor folder whose name holds a glob character is refused (a list is the way there)', async () => {
    const files = {
      'models[1]/m.model.yml': descriptor('  train: "t/*.csv"\n  holdout: h.csv\n'),
      'models[1]/t/a.csv': CSV,
      'models[1]/h.csv': CSV,
    };
    await expectInputError(() => loadDescriptor(createMemoryRepository(files), 'models[1]/m.model.yml', defaultSettings()), {
      code: 'data-glob',
      line: 4,
      key: 'data.train',
    });
  });

  it(`caps the parts at ${MAX_DATA_PARTS}`, async () => {
    const files: Record<string, string> = { 'models/h.csv': CSV };
    for (let k = 0; k <= MAX_DATA_PARTS; k++) files[`models/p/${k}.csv`] = CSV;
    await expectInputError(() => loadDescriptor(repo('  train: "p/*.csv"\n  holdout: h.csv\n', files), F, defaultSettings()), {
      code: 'data-parts',
      line: 4,
      key: 'data.train',
      message: new RegExp(`matches ${MAX_DATA_PARTS + 1} files`),
    });
  });

  it('the base-comparison data key knows every part', async () => {
    const files = { 'models/a.csv': CSV, 'models/b.csv': CSV, 'models/h.csv': CSV };
    const one = await loadDescriptor(repo('  train: a.csv\n  holdout: h.csv\n', files), F, defaultSettings());
    const listed = await loadDescriptor(repo('  train: [a.csv]\n  holdout: h.csv\n', files), F, defaultSettings());
    const two = await loadDescriptor(repo('  train: [a.csv, b.csv]\n  holdout: h.csv\n', files), F, defaultSettings());
    expect(dataKey(one)).toBe(JSON.stringify(['models/a.csv', 'models/h.csv', 'y']));
    expect(dataKey(listed)).toBe(JSON.stringify([['models/a.csv'], 'models/h.csv', 'y']));
    expect(dataKey(two)).toBe(JSON.stringify([['models/a.csv', 'models/b.csv'], 'models/h.csv', 'y']));
  });

  it('compares by code point, not by UTF-16 code unit', () => {
    // U+FF61 is one code unit, U+1F600 two (0xD83D 0xDE00): by code unit the emoji sorts first.
    const a = 'p/\uFF61.csv';
    const b = 'p/\u{1F600}.csv';
    expect(a < b).toBe(false);
    expect(compareCodePoints(a, b)).toBeLessThan(0);
    expect(['b', 'a', 'a.csv', 'B'].sort(compareCodePoints)).toEqual(['B', 'a', 'a.csv', 'b']);
    expect(compareCodePoints('x', 'x')).toBe(0);
  });
});
