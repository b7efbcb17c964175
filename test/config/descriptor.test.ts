import { describe, expect, it } from 'vitest';
import { descriptorFromDocument, loadDescriptor } from '../../src/config/descriptor.js';
import { LIMIT_KEYS } from '../../src/config/limits.js';
import { defaultSettings, loadSettings } from '../../src/config/settings-file.js';
import type { SettingsFile } from '../../src/config/types.js';
import { parseYaml } from '../../src/config/yaml-source.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from './helpers.js';

const F = 'models/kiln/kiln.model.yml';

/** A valid descriptor using every term kind and every centres form (line numbers matter below). */
const FULL = `version: 1
name: kiln-exit.temperature_2
task: regression
data:
  train: data/train.csv
  holdout: ../shared/holdout.csv
  target: exit_temp_c
terms:
  - linear: [humidity_pct, load]
  - polynomial: { of: fuel_rate, degree: 3 }
  - polynomial: { of: fuel_rate, degree: 2, shift: 0, scale: 1 }
  - rbf: { of: ambient_c, centers: [-5, 0, 12.5], width: 8 }
  - rbf: { of: ambient_c, centers: { from: -10, to: 40, count: 6 }, width: 8 }
  - rbf: { of: ambient_c, centers: { from: 0, to: 1, step: 0.25 }, width: 0.5 }
  - rbf: { of: ambient_c, centers: at-samples, width: 2 }
fit:
  intercept: false
  ridge: 0.5
  fold_order: blocks
coefficients: [1, 2.5, -3]
limits:
  gap_ratio: 1.3
  swing: { fail: 0.4 }
  cv_ratio: off
`;

const DATA = { 'models/kiln/data/train.csv': 'a\n1\n', 'models/shared/holdout.csv': 'a\n2\n' };

function repoWith(descriptor: string, extra: Record<string, string> = {}) {
  return createMemoryRepository({ [F]: descriptor, ...DATA, ...extra });
}

/** Replaces one line (1-based) of FULL. */
function edit(line: number, replacement: string, base = FULL): string {
  const lines = base.split('\n');
  lines[line - 1] = replacement;
  return lines.join('\n');
}

describe('loadDescriptor: a valid descriptor with every term kind', () => {
  it('builds the normalised descriptor', async () => {
    const d = await loadDescriptor(repoWith(FULL), F, defaultSettings());
    expect(d.file).toBe(F);
    expect(d.name).toBe('kiln-exit.temperature_2');
    expect(d.nameLine).toBe(2);
    expect(d.task).toBe('regression');
    expect(d.data).toEqual({
      train: 'models/kiln/data/train.csv',
      holdout: 'models/shared/holdout.csv',
      target: 'exit_temp_c',
      lines: { train: 5, holdout: 6, target: 7 },
      positive: null,
    });
    expect(d.termsLine).toBe(8);
    expect(d.terms).toEqual([
      { kind: 'linear', columns: ['humidity_pct', 'load'], line: 9 },
      { kind: 'polynomial', of: 'fuel_rate', degree: 3, shift: null, scale: null, line: 10 },
      { kind: 'polynomial', of: 'fuel_rate', degree: 2, shift: 0, scale: 1, line: 11 },
      { kind: 'rbf', of: 'ambient_c', centers: { kind: 'list', values: [-5, 0, 12.5] }, width: 8, line: 12 },
      { kind: 'rbf', of: 'ambient_c', centers: { kind: 'count', from: -10, to: 40, count: 6 }, width: 8, line: 13 },
      { kind: 'rbf', of: 'ambient_c', centers: { kind: 'step', from: 0, to: 1, step: 0.25 }, width: 0.5, line: 14 },
      { kind: 'rbf', of: 'ambient_c', centers: { kind: 'at-samples' }, width: 2, line: 15 },
    ]);
    expect(d.fit).toEqual({
      intercept: false,
      refit: true,
      ridge: 0.5,
      folds: 5,
      foldOrder: 'blocks',
      seed: 1,
      parameterCount: 'columns',
      line: 16,
      ridgeLine: 18,
      threshold: 0.5,
    });
    expect(d.coefficients).toEqual([1, 2.5, -3]);
    expect(d.coefficientsLine).toBe(20);
    expect(d.limits.gap_ratio).toEqual({
      warn: null,
      fail: 1.3,
      warnBelow: null,
      failBelow: null,
      off: false,
      source: 'descriptor',
      line: 22,
    });
    expect(d.limits.swing).toEqual({ warn: null, fail: 0.4, warnBelow: null, failBelow: null, off: false, source: 'descriptor', line: 23 });
    expect(d.limits.cv_ratio).toEqual({
      warn: null,
      fail: null,
      warnBelow: null,
      failBelow: null,
      off: true,
      source: 'descriptor',
      line: 24,
    });
    expect(Object.keys(d.limits).sort()).toEqual(LIMIT_KEYS.map((k) => k.key).sort());
  });

  it('applies defaults when fit, task, coefficients and limits are left out; fit.line is the terms line', async () => {
    const minimal =
      'version: 1\nname: m\ndata: { train: data/train.csv, holdout: ../shared/holdout.csv, target: y }\nterms:\n  - linear: [x]\n';
    const d = await loadDescriptor(repoWith(minimal), F, defaultSettings());
    expect(d.task).toBe('regression');
    expect(d.fit).toEqual({
      intercept: true,
      refit: true,
      ridge: 0,
      folds: 5,
      foldOrder: 'shuffled',
      seed: 1,
      parameterCount: 'columns',
      line: 4,
      ridgeLine: 4,
      threshold: 0.5,
    });
    expect(d.coefficients).toBeNull();
    expect(d.coefficientsLine).toBeNull();
    expect(d.limits.gap_ratio).toEqual({
      warn: null,
      fail: 1.5,
      warnBelow: null,
      failBelow: null,
      off: false,
      source: 'default',
      line: null,
    });
  });

  it('takes fit defaults from the settings file, and descriptor fit keys win', async () => {
    const settings: SettingsFile = { ...defaultSettings(), fit: { folds: 10, foldOrder: 'blocks', seed: 7, parameterCount: 'columns' } };
    const withSeed =
      'version: 1\nname: m\ndata: { train: data/train.csv, holdout: ../shared/holdout.csv, target: y }\nterms: [ { linear: [x] } ]\nfit:\n  seed: 3\n';
    const d = await loadDescriptor(repoWith(withSeed), F, settings);
    expect(d.fit).toMatchObject({ folds: 10, foldOrder: 'blocks', seed: 3, line: 5, ridgeLine: 5 });
  });
});

describe('limits merge: defaults < settings < descriptor, key by key', () => {
  it('takes each key from the highest layer that sets it, whole', async () => {
    const settingsText = 'version: 1\nlimits:\n  gap_ratio: 2\n  coefficient: { warn: 10, fail: 20 }\n  condition: off\n';
    const descriptor =
      'version: 1\nname: m\ndata: { train: data/train.csv, holdout: ../shared/holdout.csv, target: y }\nterms: [ { linear: [x] } ]\nlimits:\n  coefficient: 30\n';
    const repo = repoWith(descriptor, { 'fitgate.yml': settingsText });
    const settings = await loadSettings(repo, 'fitgate.yml');
    const d = await loadDescriptor(repo, F, settings);
    expect(d.limits.gap_ratio).toEqual({
      warn: null,
      fail: 2,
      warnBelow: null,
      failBelow: null,
      off: false,
      source: 'settings',
      line: null,
    });
    expect(d.limits.condition).toEqual({
      warn: null,
      fail: null,
      warnBelow: null,
      failBelow: null,
      off: true,
      source: 'settings',
      line: null,
    });
    expect(d.limits.coefficient, 'descriptor replaces the settings { warn, fail } entirely').toEqual({
      warn: null,
      fail: 30,
      warnBelow: null,
      failBelow: null,
      off: false,
      source: 'descriptor',
      line: 6,
    });
    expect(d.limits.swing).toEqual({ warn: 0.25, fail: 0.5, warnBelow: null, failBelow: null, off: false, source: 'default', line: null });
    expect(d.limits.params_per_sample).toEqual({
      warn: null,
      fail: 0.1,
      warnBelow: null,
      failBelow: null,
      off: false,
      source: 'default',
      line: null,
    });
  });
});

describe('loadDescriptor: schema errors name file, line and key path', () => {
  const cases: Array<{ name: string; text: string; line: number; key: string; message?: RegExp }> = [
    {
      name: 'unknown top-level key',
      text: edit(3, 'tusk: regression'),
      line: 3,
      key: 'tusk',
      message: /unknown key `tusk` \(did you mean `task`\?\); expected one of: version, name, task/,
    },
    { name: 'bad version', text: edit(1, 'version: 2'), line: 1, key: 'version' },
    { name: 'name with a space', text: edit(2, 'name: kiln exit'), line: 2, key: 'name' },
    { name: 'name too long', text: edit(2, `name: ${'a'.repeat(101)}`), line: 2, key: 'name' },
    { name: 'unknown task', text: edit(3, 'task: ranking'), line: 3, key: 'task', message: /expected one of: regression, classification/ },
    { name: 'missing data.target', text: edit(7, ''), line: 4, key: 'data.target', message: /missing key `target`/ },
    { name: 'data path not text', text: edit(5, '  train: 3'), line: 5, key: 'data.train' },
    {
      name: 'target not text (a number to YAML)',
      text: edit(7, '  target: 2024'),
      line: 7,
      key: 'data.target',
      message: /expected text, got 2024 \(write it in quotes, "2024", for the text\)/,
    },
    {
      name: 'target not text (a boolean to YAML)',
      text: edit(7, '  target: true'),
      line: 7,
      key: 'data.target',
      message: /expected text, got true \(write it in quotes, "true", for the text\)/,
    },
    {
      name: 'unknown term kind',
      text: edit(9, '  - hinge: [humidity_pct]'),
      line: 9,
      key: 'terms[0].hinge',
      message: /unknown term kind `hinge`; expected one of: linear, polynomial, rbf, fourier, spline, category/,
    },
    {
      name: 'two kinds in one term',
      text: edit(9, '  - { linear: [a], polynomial: { of: b, degree: 2 } }'),
      line: 9,
      key: 'terms[0]',
      message: /exactly one key/,
    },
    {
      name: 'term as plain text',
      text: edit(9, '  - linear'),
      line: 9,
      key: 'terms[0]',
      message: /linear, polynomial, rbf, fourier, spline or category/,
    },
    { name: 'empty linear list', text: edit(9, '  - linear: []'), line: 9, key: 'terms[0].linear', message: /non-empty list/ },
    { name: 'linear column not text', text: edit(9, '  - linear: [a, [b]]'), line: 9, key: 'terms[0].linear[1]' },
    {
      name: 'degree above 30',
      text: edit(10, '  - polynomial: { of: fuel_rate, degree: 31 }'),
      line: 10,
      key: 'terms[1].polynomial.degree',
      message: /from 1 to 30, got 31/,
    },
    {
      name: 'degree not an integer',
      text: edit(10, '  - polynomial: { of: fuel_rate, degree: 2.5 }'),
      line: 10,
      key: 'terms[1].polynomial.degree',
      message: /an integer/,
    },
    {
      name: 'polynomial missing degree',
      text: edit(10, '  - polynomial: { of: fuel_rate }'),
      line: 10,
      key: 'terms[1].polynomial.degree',
      message: /missing key `degree`/,
    },
    {
      name: 'zero scale',
      text: edit(11, '  - polynomial: { of: fuel_rate, degree: 2, shift: 0, scale: 0 }'),
      line: 11,
      key: 'terms[2].polynomial.scale',
      message: /> 0/,
    },
    {
      name: 'unknown polynomial key',
      text: edit(11, '  - polynomial: { of: fuel_rate, degree: 2, offset: 0 }'),
      line: 11,
      key: 'terms[2].polynomial.offset',
      message: /unknown key `offset`; expected one of: of, degree, shift, scale/,
    },
    {
      name: 'negative rbf width',
      text: edit(12, '  - rbf: { of: ambient_c, centers: [1], width: -1 }'),
      line: 12,
      key: 'terms[3].rbf.width',
      message: /got -1/,
    },
    {
      name: 'infinite rbf width',
      text: edit(12, '  - rbf: { of: ambient_c, centers: [1], width: .inf }'),
      line: 12,
      key: 'terms[3].rbf.width',
      message: /finite number, got \.inf/,
    },
    {
      name: 'non-numeric centre',
      text: edit(12, '  - rbf: { of: ambient_c, centers: [1, two], width: 1 }'),
      line: 12,
      key: 'terms[3].rbf.centers[1]',
      message: /a number, got "two"/,
    },
    {
      name: 'NaN centre',
      text: edit(12, '  - rbf: { of: ambient_c, centers: [1, .nan], width: 1 }'),
      line: 12,
      key: 'terms[3].rbf.centers[1]',
      message: /finite/,
    },
    {
      name: 'empty centre list',
      text: edit(12, '  - rbf: { of: ambient_c, centers: [], width: 1 }'),
      line: 12,
      key: 'terms[3].rbf.centers',
      message: /non-empty list/,
    },
    {
      name: 'count of zero',
      text: edit(13, '  - rbf: { of: ambient_c, centers: { from: 0, to: 1, count: 0 }, width: 1 }'),
      line: 13,
      key: 'terms[4].rbf.centers.count',
      message: /from 1 to 10000/,
    },
    {
      name: 'step of zero',
      text: edit(14, '  - rbf: { of: ambient_c, centers: { from: 0, to: 1, step: 0 }, width: 1 }'),
      line: 14,
      key: 'terms[5].rbf.centers.step',
      message: /> 0/,
    },
    {
      name: 'centres text other than at-samples',
      text: edit(15, '  - rbf: { of: ambient_c, centers: everywhere, width: 1 }'),
      line: 15,
      key: 'terms[6].rbf.centers',
      message: /expected one of: a list of numbers, \{ from, to, count \}, \{ from, to, step \} or `at-samples`, got "everywhere"/,
    },
    {
      name: 'centres mapping with neither count nor step',
      text: edit(15, '  - rbf: { of: ambient_c, centers: { from: 0, to: 1 }, width: 1 }'),
      line: 15,
      key: 'terms[6].rbf.centers',
      message: /expected one of/,
    },
    {
      name: 'empty terms',
      text: FULL.split('\n').slice(0, 7).join('\n') + '\nterms: []\n',
      line: 8,
      key: 'terms',
      message: /non-empty list/,
    },
    { name: 'negative ridge', text: edit(18, '  ridge: -0.1'), line: 18, key: 'fit.ridge', message: />= 0/ },
    { name: 'one fold', text: edit(18, '  folds: 1'), line: 18, key: 'fit.folds', message: /from 2 to 50, got 1/ },
    { name: 'more folds than the bound', text: edit(18, '  folds: 51'), line: 18, key: 'fit.folds', message: /from 2 to 50, got 51/ },
    { name: 'bad fold order', text: edit(19, '  fold_order: random'), line: 19, key: 'fit.fold_order', message: /shuffled, blocks/ },
    {
      name: 'intercept not boolean',
      text: edit(17, '  intercept: yes'),
      line: 17,
      key: 'fit.intercept',
      message: /true or false, got "yes"/,
    },
    { name: 'unknown fit key', text: edit(18, '  lambda: 0.5'), line: 18, key: 'fit.lambda', message: /unknown key `lambda`/ },
    { name: 'coefficient not a number', text: edit(20, 'coefficients: [1, x, 3]'), line: 20, key: 'coefficients[1]' },
    {
      name: 'unknown limit key',
      text: edit(22, '  gap_ration: 1.3'),
      line: 22,
      key: 'limits.gap_ration',
      message: /unknown key `gap_ration` \(did you mean `gap_ratio`\?\); expected one of: gap_ratio, params_per_sample/,
    },
    { name: 'negative limit', text: edit(22, '  gap_ratio: -1'), line: 22, key: 'limits.gap_ratio', message: />= 0, got -1/ },
    {
      name: 'limit as other text',
      text: edit(22, '  gap_ratio: none'),
      line: 22,
      key: 'limits.gap_ratio',
      message: /expected one of: .*`off`/,
    },
    {
      name: 'empty warn/fail mapping',
      text: edit(23, '  swing: {}'),
      line: 23,
      key: 'limits.swing',
      message: /expected one of: .*\{ warn, fail \}, \{ warn_below, fail_below, warn_above, fail_above \}/,
    },
    {
      name: 'unknown key in warn/fail',
      text: edit(23, '  swing: { warn: 1, fial: 2 }'),
      line: 23,
      key: 'limits.swing.fial',
      message: /unknown key `fial`/,
    },
    { name: 'document not a mapping', text: '- a\n- b\n', line: 1, key: '', message: /a mapping/ },
  ];

  for (const c of cases) {
    it(c.name, async () => {
      const expected = {
        code: 'schema',
        file: F,
        line: c.line,
        ...(c.key !== '' ? { key: c.key } : {}),
        ...(c.message ? { message: c.message } : {}),
      };
      await expectInputError(() => loadDescriptor(repoWith(c.text), F, defaultSettings()), expected);
    });
  }

  it('reports the first problem in document order, deepest within it', async () => {
    let text = edit(3, 'task: nope');
    text = edit(12, '  - rbf: { of: ambient_c, centers: [1], width: -1 }', text);
    await expectInputError(() => loadDescriptor(repoWith(text), F, defaultSettings()), { code: 'schema', line: 3, key: 'task' });
  });
});

describe('loadDescriptor: checks beyond the schema', () => {
  it('refuses warn above fail at the warn key', async () => {
    await expectInputError(() => loadDescriptor(repoWith(edit(23, '  swing: { warn: 0.6, fail: 0.4 }')), F, defaultSettings()), {
      code: 'limit-order',
      file: F,
      line: 23,
      key: 'limits.swing.warn',
    });
  });

  it('refuses centres with to below from, and steps giving too many centres', async () => {
    await expectInputError(
      () => loadDescriptor(repoWith(edit(13, '  - rbf: { of: a, centers: { from: 5, to: 1, count: 3 }, width: 1 }')), F, defaultSettings()),
      {
        code: 'rbf-centers',
        file: F,
        line: 13,
        key: 'terms[4].rbf.centers.to',
      },
    );
    await expectInputError(
      () =>
        loadDescriptor(repoWith(edit(14, '  - rbf: { of: a, centers: { from: 0, to: 1, step: 1e-9 }, width: 1 }')), F, defaultSettings()),
      {
        code: 'rbf-centers',
        file: F,
        line: 14,
        key: 'terms[5].rbf.centers.step',
      },
    );
  });

  it('refuses a missing data file at its descriptor line', async () => {
    const repo = createMemoryRepository({ [F]: FULL, 'models/kiln/data/train.csv': 'a\n' });
    await expectInputError(() => loadDescriptor(repo, F, defaultSettings()), {
      code: 'file-missing',
      file: F,
      line: 6,
      key: 'data.holdout',
    });
  });

  it('refuses data paths that leave the repository or are absolute', async () => {
    await expectInputError(() => loadDescriptor(repoWith(edit(5, '  train: ../../../etc/passwd')), F, defaultSettings()), {
      code: 'path-outside',
      file: F,
      line: 5,
      key: 'data.train',
    });
    await expectInputError(() => loadDescriptor(repoWith(edit(6, '  holdout: /etc/passwd')), F, defaultSettings()), {
      code: 'path-outside',
      file: F,
      line: 6,
      key: 'data.holdout',
    });
  });

  it('passes YAML errors through with the descriptor file', async () => {
    await expectInputError(() => loadDescriptor(repoWith(FULL + 'name: again\n'), F, defaultSettings()), {
      code: 'yaml-duplicate-key',
      file: F,
      line: 25,
    });
  });

  it('descriptorFromDocument leaves data paths as written', () => {
    const d = descriptorFromDocument(parseYaml(FULL, F), F, defaultSettings());
    expect(d.data.holdout).toBe('../shared/holdout.csv');
  });
});

describe('loadDescriptor: limits of checks the model has no use for', () => {
  const model = (task: string, limit: string) =>
    `version: 1\nname: m\ntask: ${task}\ndata:\n  train: data/train.csv\n  holdout: ../shared/holdout.csv\n  target: a\nterms:\n  - linear: [b]\nlimits:\n  ${limit}\n`;

  it('a regression model setting a classifier-only limit is an error at that key', async () => {
    for (const key of ['calibration_slope', 'separation', 'events_per_parameter']) {
      const error = await expectInputError(() => loadDescriptor(repoWith(model('regression', `${key}: off`)), F, defaultSettings()), {
        code: 'limit-task',
        file: F,
        line: 11,
        key: `limits.${key}`,
      });
      expect(error.message).toContain('a check of classifiers only');
    }
  });

  it('a classifier may set them, and a regression model its own', async () => {
    await expect(
      loadDescriptor(repoWith(model('classification', 'calibration_slope: { fail: 0.5 }')), F, defaultSettings()),
    ).resolves.toBeDefined();
    await expect(loadDescriptor(repoWith(model('regression', 'gap_ratio: 1.2')), F, defaultSettings())).resolves.toBeDefined();
  });
});
