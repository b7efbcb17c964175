import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { checkUniqueNames, discoverDescriptors } from '../../src/config/discover.js';
import { defaultSettings, loadSettings } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from './helpers.js';

const model = (name: string) =>
  `version: 1\nname: ${name}\ndata: { train: t.csv, holdout: h.csv, target: y }\nterms: [ { linear: [x] } ]\n`;

const FILES = {
  'models/a/a.model.yml': model('a'),
  'models/a/t.csv': 'x,y\n',
  'models/a/h.csv': 'x,y\n',
  'models/b.model.yml': model('b'),
  'models/t.csv': 'x,y\n',
  'models/h.csv': 'x,y\n',
  'other/c.model.yml': model('a'),
  'other/t.csv': 'x,y\n',
  'other/h.csv': 'x,y\n',
  'node_modules/pkg/x.model.yml': model('x'),
  '.hidden/y.model.yml': model('y'),
};

describe('discoverDescriptors', () => {
  it('uses the default glob without a settings file, skipping node_modules and dot folders', async () => {
    const repo = createMemoryRepository(FILES);
    expect(await discoverDescriptors(repo, defaultSettings(), [])).toEqual({
      paths: ['models/a/a.model.yml', 'models/b.model.yml', 'other/c.model.yml'],
      notes: [],
    });
  });

  it('enters node_modules only for a pattern that names it', async () => {
    const repo = createMemoryRepository({ ...FILES, 'fitgate.yml': 'version: 1\nmodels:\n  - "node_modules/pkg/*.model.yml"\n' });
    const settings = await loadSettings(repo, 'fitgate.yml');
    expect((await discoverDescriptors(repo, settings, [])).paths).toEqual(['node_modules/pkg/x.model.yml']);
  });

  it('notes *.model.yaml files beside the *.model.yml names a pattern asks for, and names them when nothing else matches', async () => {
    const repo = createMemoryRepository({ ...FILES, 'models/d.model.yaml': model('d'), 'other/e.model.yaml': model('e') });
    const found = await discoverDescriptors(repo, defaultSettings(), []);
    expect(found.paths).toEqual(['models/a/a.model.yml', 'models/b.model.yml', 'other/c.model.yml']);
    expect(found.notes).toEqual([
      'pattern "**/*.model.yml": models/d.model.yaml, other/e.model.yaml are not read: the pattern asks for .yml, and fitgate reads only the names a pattern matches (rename them to .yml, or change the pattern).',
    ]);
    const only = createMemoryRepository({ 'models/d.model.yaml': model('d') });
    await expectInputError(() => discoverDescriptors(only, defaultSettings(), []), {
      code: 'glob-empty',
      message: /models\/d\.model\.yaml is not read/,
    });
  });

  it('unites the settings globs, sorted and de-duplicated', async () => {
    const repo = createMemoryRepository({
      ...FILES,
      'fitgate.yml': 'version: 1\nmodels:\n  - "other/*.model.yml"\n  - "models/**/*.model.yml"\n  - "**/b.model.yml"\n',
    });
    const settings = await loadSettings(repo, 'fitgate.yml');
    expect((await discoverDescriptors(repo, settings, [])).paths).toEqual([
      'models/a/a.model.yml',
      'models/b.model.yml',
      'other/c.model.yml',
    ]);
  });

  it('refuses a glob that matches nothing, naming the settings line', async () => {
    const repo = createMemoryRepository({
      ...FILES,
      'fitgate.yml': 'version: 1\nmodels:\n  - "models/**/*.model.yml"\n  - "nowhere/*.model.yml"\n',
    });
    const settings = await loadSettings(repo, 'fitgate.yml');
    await expectInputError(() => discoverDescriptors(repo, settings, []), {
      code: 'glob-empty',
      file: 'fitgate.yml',
      line: 4,
      key: 'models[1]',
    });
  });

  it('refuses the default glob matching nothing', async () => {
    await expectInputError(() => discoverDescriptors(createMemoryRepository({}), defaultSettings(), []), {
      code: 'glob-empty',
      key: 'models[0]',
    });
  });

  it('refuses absolute globs and globs with a .. segment anywhere, braces and parentheses included, at their line', async () => {
    for (const [pattern, line] of [
      ['/etc/*.yml', 3],
      ['../elsewhere/*.model.yml', 3],
      ['models/../../x/*.yml', 3],
      ['{..,models}/*.yml', 3],
      ['models/{a,..}/*.yml', 3],
      ['@(..)/x.yml', 3],
      ['+(a|..)/x.yml', 3],
      ['models\\\\..\\\\x.yml', 3],
      ['{/etc,models}/*.yml', 3],
      ['C:/x/*.yml', 3],
    ] as const) {
      const repo = createMemoryRepository({ ...FILES, 'fitgate.yml': `version: 1\nmodels:\n  - "${pattern}"\n` });
      const settings = await loadSettings(repo, 'fitgate.yml');
      await expectInputError(() => discoverDescriptors(repo, settings, []), {
        code: 'glob-outside',
        file: 'fitgate.yml',
        line,
        key: 'models[0]',
      });
    }
  });

  it('refuses a pattern over the length or brace-alternative cap, at its line', async () => {
    for (const pattern of [`${'a'.repeat(1001)}.yml`, `${'{a,b}'.repeat(9)}.yml`]) {
      const repo = createMemoryRepository({ ...FILES, 'fitgate.yml': `version: 1\nmodels:\n  - "models/*.model.yml"\n  - "${pattern}"\n` });
      const settings = await loadSettings(repo, 'fitgate.yml');
      await expectInputError(() => discoverDescriptors(repo, settings, []), {
        code: 'glob-too-complex',
        file: 'fitgate.yml',
        line: 4,
        key: 'models[1]',
      });
    }
  });

  it('takes explicit paths instead of globs, normalised, sorted, de-duplicated', async () => {
    const repo = createMemoryRepository(FILES);
    expect(
      (await discoverDescriptors(repo, defaultSettings(), ['other/c.model.yml', './models/b.model.yml', 'models/../other/c.model.yml']))
        .paths,
    ).toEqual(['models/b.model.yml', 'other/c.model.yml']);
  });

  it('refuses explicit paths that are missing, absolute or leave the repository', async () => {
    const repo = createMemoryRepository(FILES);
    await expectInputError(() => discoverDescriptors(repo, defaultSettings(), ['models/none.model.yml']), {
      code: 'file-missing',
      file: 'models/none.model.yml',
    });
    await expectInputError(() => discoverDescriptors(repo, defaultSettings(), ['/etc/passwd']), {
      code: 'path-outside',
      file: '/etc/passwd',
    });
    await expectInputError(() => discoverDescriptors(repo, defaultSettings(), ['models/../../x.model.yml']), {
      code: 'path-outside',
      file: 'models/../../x.model.yml',
    });
  });
});

describe('checkUniqueNames', () => {
  it('refuses a name used twice, naming both files and the second name line', async () => {
    const repo = createMemoryRepository(FILES);
    const settings = defaultSettings();
    const loaded = [
      await loadDescriptor(repo, 'models/a/a.model.yml', settings),
      await loadDescriptor(repo, 'models/b.model.yml', settings),
      await loadDescriptor(repo, 'other/c.model.yml', settings),
    ];
    await expectInputError(() => checkUniqueNames(loaded), {
      code: 'duplicate-name',
      file: 'other/c.model.yml',
      line: 2,
      key: 'name',
      message: /models\/a\/a\.model\.yml:2/,
    });
    expect(() => checkUniqueNames(loaded.slice(0, 2))).not.toThrow();
  });
});
