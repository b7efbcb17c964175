// The `predictions` and `parameters` keys (models trained elsewhere) and `fit.refit_compare`:
// what they read, and each error at its line (invented descriptors of a bakery's proofing model).
import { describe, expect, it } from 'vitest';
import { descriptorFromDocument, loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { parseYaml } from '../../src/config/yaml-source.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { expectInputError } from './helpers.js';

const F = 'models/proofing.model.yml';

const HEAD = `version: 1
name: proofing-minutes
data:
  train: data/train.csv
  holdout: data/holdout.csv
  target: minutes
`;

function read(text: string) {
  return descriptorFromDocument(parseYaml(text, F), F, defaultSettings());
}

describe('predictions', () => {
  it('reads a column, a side file in order and a side file by key, the inputs and the stated parameters', () => {
    const d = read(`${HEAD}predictions:
  train: { column: pred }
  holdout: { file: preds/holdout.csv, key: id, column: p }
  inputs: [temp_c, humidity_pct]
parameters: 120
`);
    expect(d.predictions).toEqual({
      train: { column: 'pred', file: null, key: null, line: 8 },
      holdout: { column: 'p', file: 'preds/holdout.csv', key: 'id', line: 9 },
      inputs: ['temp_c', 'humidity_pct'],
      line: 7,
    });
    expect(d.parameters).toBe(120);
    expect(d.parametersLine).toBe(11);
    expect(d.terms).toEqual([]);
    expect(d.termsLine).toBe(7);
  });

  it('leaves a descriptor of terms as it was (no predictions keys)', () => {
    const d = read(`${HEAD}terms:\n  - linear: [temp_c]\n`);
    expect('predictions' in d).toBe(false);
    expect('parameters' in d).toBe(false);
  });

  it('errors at their lines', async () => {
    await expectInputError(() => read(`${HEAD}terms:\n  - linear: [t]\npredictions:\n  train: { column: p }\n  holdout: { column: p }\n`), {
      code: 'predictions-form',
      file: F,
      line: 7,
      key: 'terms',
    });
    await expectInputError(() => read(HEAD), { code: 'schema', file: F, message: /missing key `terms`.*`predictions`/ });
    await expectInputError(() => read(`${HEAD}predictions:\n  train: { column: p, key: id }\n  holdout: { column: p }\n`), {
      code: 'predictions-form',
      line: 8,
      key: 'predictions.train.key',
    });
    await expectInputError(() => read(`${HEAD}terms:\n  - linear: [t]\nparameters: 4\n`), {
      code: 'predictions-form',
      line: 9,
      key: 'parameters',
    });
    await expectInputError(() => read(`${HEAD}predictions:\n  train: { column: p }\n  holdout: { column: p }\ncoefficients: [1, 2]\n`), {
      code: 'predictions-form',
      line: 10,
      key: 'coefficients',
    });
    await expectInputError(() => read(`${HEAD}predictions:\n  train: { colum: p }\n  holdout: { column: p }\n`), {
      code: 'schema',
      line: 8,
      message: /column/,
    });
    await expectInputError(() => read(`${HEAD}predictions:\n  train: { column: p }\n  holdout: { column: p }\nparameters: 0\n`), {
      code: 'schema',
      line: 10,
    });
  });

  it('resolves side files inside the repository, as data files', async () => {
    const repo = createMemoryRepository({
      'models/data/train.csv': 'minutes,p\n1,1\n',
      'models/data/holdout.csv': 'minutes,p\n1,1\n',
      'models/preds/h.csv': 'p\n1\n',
      [F]: `${HEAD}predictions:\n  train: { column: p }\n  holdout: { file: preds/h.csv, column: p }\n`,
    });
    const d = await loadDescriptor(repo, F, defaultSettings());
    expect(d.predictions?.holdout.file).toBe('models/preds/h.csv');
    const missing = createMemoryRepository({
      'models/data/train.csv': 'minutes,p\n1,1\n',
      'models/data/holdout.csv': 'minutes,p\n1,1\n',
      [F]: `${HEAD}predictions:\n  train: { column: p }\n  holdout: { file: preds/none.csv, column: p }\n`,
    });
    await expectInputError(() => loadDescriptor(missing, F, defaultSettings()), {
      code: 'file-missing',
      line: 9,
      key: 'predictions.holdout.file',
    });
  });
});

describe('fit.refit_compare', () => {
  it('is read with refit: false, and refused without it or on a classifier', async () => {
    const terms = 'terms:\n  - linear: [t]\ncoefficients: [1, 2]\n';
    expect(read(`${HEAD}${terms}fit: { refit: false, refit_compare: true }\n`).fit.refitCompare).toBe(true);
    expect('refitCompare' in read(`${HEAD}${terms}fit: { refit: false }\n`).fit).toBe(false);
    await expectInputError(() => read(`${HEAD}${terms}fit:\n  refit_compare: true\n`), {
      code: 'predictions-form',
      line: 11,
      key: 'fit.refit_compare',
    });
    await expectInputError(
      () =>
        read(
          `version: 1\nname: x\ntask: classification\ndata:\n  train: a.csv\n  holdout: b.csv\n  target: y\n${terms}fit: { refit: false, refit_compare: true }\n`,
        ),
      // A classifier is always refitted: its `refit: false` is the error, before `refit_compare`.
      {
        code: 'predictions-form',
        key: 'fit.refit',
      },
    );
  });
});
