import { describe, expect, it } from 'vitest';
import { defaultSettings, loadSettings, modelPatternLine } from '../../src/config/settings-file.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from './helpers.js';

const S = 'fitgate.yml';

describe('loadSettings', () => {
  it('gives defaults when the default file is missing', async () => {
    const settings = await loadSettings(createMemoryRepository({}), S);
    expect(settings).toEqual({
      file: null,
      models: ['**/*.model.yml'],
      limits: {},
      fit: { folds: 5, foldOrder: 'shuffled', seed: 1, parameterCount: 'columns' },
      caps: { maxFileBytes: 512 * 1024 * 1024, maxCells: 200_000_000, maxOperations: 20_000_000_000, maxModelSeconds: 40 },
      notes: [],
    });
  });

  it('refuses a missing file given explicitly', async () => {
    await expectInputError(() => loadSettings(createMemoryRepository({}), 'ci/fitgate.yml', { explicit: true }), {
      code: 'file-missing',
      file: 'ci/fitgate.yml',
    });
  });

  it('refuses a settings path outside the repository', async () => {
    await expectInputError(() => loadSettings(createMemoryRepository({}), '../fitgate.yml', { explicit: true }), {
      code: 'path-outside',
      file: '../fitgate.yml',
    });
  });

  it('reads every key', async () => {
    const text = [
      'version: 1',
      'models:',
      '  - "models/**/*.model.yml"',
      '  - extra/*.model.yml',
      'limits:',
      '  gap_ratio: 1.2',
      '  swing: { warn: 0.1, fail: 0.2 }',
      '  base_change: off',
      'fit: { folds: 10, fold_order: blocks, seed: 42 }',
      'caps: { max_file_mb: 2, max_cells: 1000, max_operations: 5e9, max_model_seconds: 2.5 }',
      '',
    ].join('\n');
    const settings = await loadSettings(createMemoryRepository({ 'ci/fitgate.yml': text }), 'ci/fitgate.yml', { explicit: true });
    expect(settings).toEqual({
      file: 'ci/fitgate.yml',
      models: ['models/**/*.model.yml', 'extra/*.model.yml'],
      limits: {
        gap_ratio: { spec: 1.2, line: 6 },
        swing: { spec: { warn: 0.1, fail: 0.2 }, line: 7 },
        base_change: { spec: 'off', line: 8 },
      },
      fit: { folds: 10, foldOrder: 'blocks', seed: 42, parameterCount: 'columns' },
      caps: { maxFileBytes: 2 * 1024 * 1024, maxCells: 1000, maxOperations: 5e9, maxModelSeconds: 2.5 },
      notes: [],
    });
    expect([modelPatternLine(settings, 0), modelPatternLine(settings, 1)]).toEqual([3, 4]);
    expect(modelPatternLine(defaultSettings(), 0)).toBeNull();
  });

  it('fills defaults for keys left out', async () => {
    const settings = await loadSettings(createMemoryRepository({ [S]: 'version: 1\n' }), S);
    expect(settings).toEqual({ ...defaultSettings(), file: S, notes: [] });
  });

  it('refuses a settings path that is a folder, explicit or not (never taken for "no settings")', async () => {
    const repo = createMemoryRepository({ 'fitgate.yml/inner.txt': 'x' });
    await expectInputError(() => loadSettings(repo, S), { code: 'not-a-file', file: S, message: /is a folder/ });
    await expectInputError(() => loadSettings(repo, S, { explicit: true }), { code: 'not-a-file', file: S });
  });

  it('notes a fitgate.yaml beside the fitgate.yml it reads, whether or not that one exists', async () => {
    const alone = await loadSettings(createMemoryRepository({ 'fitgate.yaml': 'version: 1\nlimits: { gap_ratio: 9 }\n' }), S);
    expect(alone.file).toBeNull();
    expect(alone.notes).toEqual([
      'fitgate.yaml is not read: fitgate reads its settings from fitgate.yml (rename the file, or name it with --config / the `config` input)',
    ]);
    const both = await loadSettings(createMemoryRepository({ [S]: 'version: 1\n', 'fitgate.yaml': 'version: 1\n' }), S);
    expect(both.file).toBe(S);
    expect(both.notes).toHaveLength(1);
    const named = await loadSettings(createMemoryRepository({ 'fitgate.yaml': 'version: 1\n' }), 'fitgate.yaml', { explicit: true });
    expect([named.file, named.notes]).toEqual(['fitgate.yaml', []]);
  });

  const errors: Array<{ name: string; text: string; code?: string; line: number; key?: string; message?: RegExp }> = [
    { name: 'empty file', text: '', line: 1, message: /a mapping/ },
    { name: 'missing version', text: 'models: [a]\n', line: 1, key: 'version', message: /missing key `version`/ },
    {
      name: 'unknown key',
      text: 'version: 1\nmodel: [a]\n',
      line: 2,
      key: 'model',
      message: /unknown key `model` \(did you mean `models`\?\); expected one of: version, models, limits, fit, caps/,
    },
    { name: 'models not a list', text: 'version: 1\nmodels: "**/*.yml"\n', line: 2, key: 'models', message: /a list/ },
    { name: 'empty models', text: 'version: 1\nmodels: []\n', line: 2, key: 'models' },
    { name: 'unknown limit', text: 'version: 1\nlimits:\n  gap: 1\n', line: 3, key: 'limits.gap' },
    {
      name: 'limit warn above fail',
      text: 'version: 1\nlimits:\n  condition: { warn: 10, fail: 5 }\n',
      code: 'limit-order',
      line: 3,
      key: 'limits.condition.warn',
    },
    { name: 'folds below 2', text: 'version: 1\nfit:\n  folds: 1\n', line: 3, key: 'fit.folds' },
    {
      name: 'fit ridge belongs to descriptors',
      text: 'version: 1\nfit:\n  ridge: 1\n',
      line: 3,
      key: 'fit.ridge',
      message: /unknown key `ridge`/,
    },
    { name: 'negative seed', text: 'version: 1\nfit:\n  seed: -1\n', line: 3, key: 'fit.seed' },
    { name: 'zero max_file_mb', text: 'version: 1\ncaps:\n  max_file_mb: 0\n', line: 3, key: 'caps.max_file_mb' },
    { name: 'fractional max_cells', text: 'version: 1\ncaps:\n  max_cells: 1.5\n', line: 3, key: 'caps.max_cells' },
    { name: 'folds above 50', text: 'version: 1\nfit:\n  folds: 1000\n', line: 3, key: 'fit.folds', message: /from 2 to 50, got 1000/ },
    { name: 'zero max_operations', text: 'version: 1\ncaps:\n  max_operations: 0\n', line: 3, key: 'caps.max_operations' },
    { name: 'zero max_model_seconds', text: 'version: 1\ncaps:\n  max_model_seconds: 0\n', line: 3, key: 'caps.max_model_seconds' },
    {
      name: 'max_model_seconds above a day',
      text: 'version: 1\ncaps:\n  max_model_seconds: 100000\n',
      line: 3,
      key: 'caps.max_model_seconds',
    },
    { name: 'duplicate key', text: 'version: 1\nversion: 1\n', code: 'yaml-duplicate-key', line: 2, key: 'version' },
    { name: 'syntax error', text: 'version: 1\nmodels: [a\n', code: 'yaml-syntax', line: 3 },
  ];
  for (const c of errors) {
    it(`refuses: ${c.name}`, async () => {
      const expected = {
        code: c.code ?? 'schema',
        file: S,
        line: c.line,
        ...(c.key ? { key: c.key } : {}),
        ...(c.message ? { message: c.message } : {}),
      };
      await expectInputError(() => loadSettings(createMemoryRepository({ [S]: c.text }), S), expected);
    });
  }

  it('refuses binary content', async () => {
    await expectInputError(() => loadSettings(createMemoryRepository({ [S]: new Uint8Array([0x76, 0xc3, 0x28]) }), S), {
      code: 'file-encoding',
      file: S,
      line: 1,
    });
  });
});
