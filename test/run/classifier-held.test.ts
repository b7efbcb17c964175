// A classifier's rows are always held in memory: the loader's streamed path (a seeded sample of a
// training file above 128 MiB, for regression) must never serve a classifier, whose fit makes
// passes of its own over every row. Here the streaming threshold's default is lowered to 0 bytes
// (the real one needs a file of 128 MiB), so any read that leaves it to the default streams.
import { describe, expect, it, vi } from 'vitest';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { fromJsonNumber, type ModelResult } from '../../src/result/result.js';
import { runPipeline } from '../../src/run/pipeline.js';
import { defaultSettings } from '../../src/run/settings.js';

vi.mock('../../src/data/row-source.js', async (importOriginal) => {
  const actual = await importOriginal<typeof import('../../src/data/row-source.js')>();
  return {
    ...actual,
    streamsTrainingData: (files: Parameters<typeof actual.streamsTrainingData>[0], aboveBytes = 0) =>
      actual.streamsTrainingData(files, aboveBytes),
  };
});

// The exam example of test/run/classifier.test.ts (published fit -4.0777, 1.5046).
const HOURS = [0.5, 0.75, 1.0, 1.25, 1.5, 1.75, 1.75, 2.0, 2.25, 2.5, 2.75, 3.0, 3.25, 3.5, 4.0, 4.25, 4.5, 4.75, 5.0, 5.5];
const PASS = [0, 0, 0, 0, 0, 0, 1, 0, 1, 0, 1, 0, 1, 0, 1, 1, 1, 1, 1, 1];

async function run(label: (v: number) => string, positive: string): Promise<ModelResult> {
  const csv = `x,y\n${HOURS.map((v, i) => `${v},${label(PASS[i])}`).join('\n')}\n`;
  const repo = createMemoryRepository({
    'm.model.yml': `version: 1\nname: m\ntask: classification\ndata:\n  train: train.csv\n  holdout: holdout.csv\n  target: y\n${positive}terms:\n  - linear: [x]\n`,
    'train.csv': csv,
    'holdout.csv': csv,
  });
  const result = await runPipeline(defaultSettings('.'), repo, { jobs: 1 });
  return result.models[0];
}

describe('classifier: rows held, never streamed', () => {
  it('0/1 labels: every row fitted, the published coefficients', async () => {
    const m = await run((v) => String(v), '');
    expect(m.error).toBeNull();
    expect(m.rows).toEqual({ train: 20, holdout: 20 });
    expect(fromJsonNumber(m.coefficients[0])).toBeCloseTo(-4.0777, 4);
    expect(fromJsonNumber(m.coefficients[1])).toBeCloseTo(1.5046, 4);
  });

  it('text labels: the same fit, no streaming error', async () => {
    const m = await run((v) => (v ? 'passed' : 'failed'), '  positive: passed\n');
    expect(m.error).toBeNull();
    expect(fromJsonNumber(m.coefficients[1])).toBeCloseTo(1.5046, 4);
  });
});
