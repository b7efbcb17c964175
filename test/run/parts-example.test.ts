// The parts example (examples/parts, an invented press log kept as one file per week): the
// training rows come from a glob of four weekly parts, the hold-out rows from a list of two.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createFsRepository } from '../../src/repo/fs-repository.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { formatText } from '../../src/report/text.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

const dir = path.resolve(fileURLToPath(new URL('../../examples/parts', import.meta.url)));

describe('examples/parts', async () => {
  const result = await runPipeline(defaultSettings(dir), createFsRepository(dir), { jobs: 1 });
  const model = result.models[0];

  it('juice-density reads its weekly parts and passes', () => {
    expect(result.models).toHaveLength(1);
    expect(model.error).toBeNull();
    expect(model.verdict).toBe('pass');
    expect(model.rows).toEqual({ train: 160, holdout: 80 });
    expect(model.data).toEqual({
      train: ['press/log/week-01.csv', 'press/log/week-02.csv', 'press/log/week-03.csv', 'press/log/week-04.csv'],
      holdout: ['press/holdout/week-05.csv', 'press/holdout/week-06.csv'],
    });
    expect(formatText(result)).toContain('juice-density');
  });

  it('gives the figures of the same rows written as one file per side', async () => {
    const read = (rel: string): string => readFileSync(path.join(dir, rel), 'utf8');
    const join = (files: string[]): string => files.map((f, k) => (k === 0 ? read(f) : read(f).split('\n').slice(1).join('\n'))).join('');
    const one = await runPipeline(
      defaultSettings('/repo'),
      createMemoryRepository({
        'm.model.yml': read('press/juice-density.model.yml')
          .replace(/train: .*\n/, 'train: t.csv\n')
          .replace(/holdout:[\s\S]*?target/, 'holdout: h.csv\n  target'),
        't.csv': join(model.data?.train ?? []),
        'h.csv': join(model.data?.holdout ?? []),
      }),
      { jobs: 1 },
    );
    expect(one.models[0].error).toBeNull();
    expect(one.models[0].coefficients).toEqual(model.coefficients);
    expect(one.models[0].metrics).toEqual(model.metrics);
  });
});
