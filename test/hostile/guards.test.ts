/**
 * Resource guards, in-process: caps are checked before memory is taken (a file over the size
 * cap is refused from its size, without a single byte read), their messages say how to raise
 * them, and a run over many models ends with every model's outcome when some of them fail to load.
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import type { RepoReader } from '../../src/repo/types.js';
import { exitStatus } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';
import { descriptor, HOLDOUT, rows, SETTINGS, TRAIN } from './corpus/repo.js';

/** A reader that records every path whose bytes were asked for (read or stream). */
function recording(files: Record<string, string | Uint8Array>): { repo: RepoReader; opened: string[] } {
  const inner = createMemoryRepository(files);
  const opened: string[] = [];
  const repo: RepoReader = {
    label: inner.label,
    resolve: (from, target, where) => inner.resolve(from, target, where),
    isFile: (p) => inner.isFile(p),
    entryKind: (p) => inner.entryKind(p),
    size: (p) => inner.size(p),
    read: (p) => {
      opened.push(p);
      return inner.read(p);
    },
    stream: (p, chunk) => {
      opened.push(p);
      return inner.stream(p, chunk);
    },
    glob: (patterns) => inner.glob(patterns),
  };
  return { repo, opened };
}

const settings = defaultSettings('/repo');

describe('size caps are checked from the size, before reading', () => {
  it('a data file over caps.max_file_mb is refused without being read, and the message says how to raise the cap', async () => {
    const big = rows(5000); // about 60 kB
    const { repo, opened } = recording({
      'fitgate.yml': `${SETTINGS}caps:\n  max_file_mb: 0.01\n`,
      'models/m.model.yml': descriptor(),
      'data/train.csv': big,
      'data/holdout.csv': HOLDOUT,
    });
    const result = await runPipeline(settings, repo);
    const m = result.models[0];
    expect(m.verdict).toBe('error');
    expect(m.error?.code).toBe('file-too-large');
    expect(m.error?.file).toBe('data/train.csv');
    expect(m.error?.message).toContain('raise caps.max_file_mb');
    expect(opened).not.toContain('data/train.csv');
  });

  it('a YAML file over 1 MiB is refused without being read', async () => {
    const { repo, opened } = recording({
      'fitgate.yml': SETTINGS,
      'models/m.model.yml': `${descriptor()}# ${'x'.repeat(1024 * 1024)}\n`,
      'data/train.csv': TRAIN,
      'data/holdout.csv': HOLDOUT,
    });
    const result = await runPipeline(settings, repo);
    expect(result.models[0].error?.code).toBe('file-too-large');
    expect(opened).not.toContain('models/m.model.yml');
  });

  it('rows x parameters over caps.max_cells is refused before the fit, naming the cap', async () => {
    const { repo } = recording({
      'fitgate.yml': `${SETTINGS}caps:\n  max_cells: 100\n`,
      'models/m.model.yml': descriptor({ terms: '  - polynomial: { of: x, degree: 5 }\n' }),
      'data/train.csv': TRAIN,
      'data/holdout.csv': HOLDOUT,
    });
    const result = await runPipeline(settings, repo);
    const m = result.models[0];
    expect(m.error?.code).toBe('too-large');
    expect(m.error?.message).toContain('30 training rows x 6 parameters = 180 cells');
    expect(m.error?.message).toContain('raise caps.max_cells');
  });

  it('raising the caps lets the same model run', async () => {
    const { repo } = recording({
      'fitgate.yml': `${SETTINGS}caps:\n  max_cells: 1000\n  max_file_mb: 1\n`,
      'models/m.model.yml': descriptor({ terms: '  - polynomial: { of: x, degree: 2 }\n' }),
      'data/train.csv': TRAIN,
      'data/holdout.csv': HOLDOUT,
    });
    const result = await runPipeline(settings, repo);
    expect(result.models[0].error).toBeNull();
  });
});

describe('a run over many models ends with every outcome', () => {
  it('40 models, 4 of them broken in different ways: 36 results and 4 errors, exit status 2', async () => {
    const files: Record<string, string> = {
      'fitgate.yml': SETTINGS,
      'data/train.csv': TRAIN,
      'data/holdout.csv': HOLDOUT,
      'data/bad.csv': TRAIN.replace('\n4,', '\nfour,'),
    };
    for (let i = 0; i < 40; i++) files[`models/m${String(i).padStart(2, '0')}.model.yml`] = descriptor({ name: `m${i}` });
    files['models/m05.model.yml'] = 'version: 1\nname: [\n'; // YAML syntax
    files['models/m12.model.yml'] = descriptor({ name: 'm12', terms: '  - polynomial: { of: x, degree: 0 }\n' }); // schema
    files['models/m20.model.yml'] = descriptor({ name: 'm20', train: '../data/bad.csv' }); // a bad cell
    files['models/m33.model.yml'] = descriptor({ name: 'm33', train: '../../elsewhere.csv' }); // outside
    const result = await runPipeline(settings, createMemoryRepository(files));
    expect(result.counts.models).toBe(40);
    expect(result.counts.error).toBe(4);
    expect(result.counts.pass).toBe(36);
    const errors = result.models.filter((m) => m.verdict === 'error').map((m) => [m.descriptor, m.error?.code]);
    expect(errors).toEqual([
      ['models/m05.model.yml', 'yaml-syntax'],
      ['models/m12.model.yml', 'schema'],
      ['models/m20.model.yml', 'csv-cell'],
      ['models/m33.model.yml', 'path-outside'],
    ]);
    expect(exitStatus(result)).toBe(2);
  });

  it('settings that cannot be read stop the run as a whole with an InputError (nothing can be checked)', async () => {
    const run = runPipeline({ ...settings, configExplicit: true }, createMemoryRepository({ 'fitgate.yml': 'version: 1\nmodels: [\n' }));
    await expect(run).rejects.toBeInstanceOf(InputError);
    await expect(run).rejects.toMatchObject({ code: 'yaml-syntax', location: { file: 'fitgate.yml' } });
  });
});
