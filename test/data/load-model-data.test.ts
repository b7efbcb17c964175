import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { loadSettings } from '../../src/config/settings-file.js';
import { InputError } from '../../src/core/errors.js';
import { loadModelData } from '../../src/data/load-model-data.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';

const files = (target: string, terms: string) => ({
  'models/m.model.yml': `version: 1\nname: m\ndata:\n  train: ../data/t.csv\n  holdout: ../data/h.csv\n  target: ${target}\nterms:\n${terms}`,
  'data/t.csv': 'x,y\n1,2\n2,3\n3,5\n',
  'data/h.csv': 'x,y\n1.5,2.4\n',
});

async function missingColumn(target: string, terms: string, inputs: string[]): Promise<InputError> {
  const repo = createMemoryRepository(files(target, terms));
  const settings = await loadSettings(repo, 'fitgate.yml');
  const descriptor = await loadDescriptor(repo, 'models/m.model.yml', settings);
  try {
    await loadModelData(repo, descriptor, inputs, settings);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected a missing-column error');
}

describe('loadModelData', () => {
  it('names the descriptor line of `data.target` when the target column is missing', async () => {
    const error = await missingColumn('yy', '  - linear: [x]\n', ['x']);
    expect(error.code).toBe('csv-missing-column');
    expect(error.location).toMatchObject({ file: 'data/t.csv', line: 1, key: 'yy' });
    expect(error.message).toContain('`data.target` on line 6 of models/m.model.yml');
  });

  it('names the term that reads a missing input column', async () => {
    const error = await missingColumn('y', '  - linear: [x]\n  - polynomial: { of: speed, degree: 2 }\n', ['x', 'speed']);
    expect(error.message).toContain('the polynomial term on line 9 of models/m.model.yml');
  });
});
