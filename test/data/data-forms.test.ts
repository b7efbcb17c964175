import { describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { defaultSettings } from '../../src/run/settings.js';
import type { ModelResult } from '../../src/result/result.js';

/** y = 2x + 1 with a small wobble, 40 rows, as CSV lines "x,y". */
const rows = Array.from({ length: 40 }, (_, i) => [i / 4, 2 * (i / 4) + 1 + ((i * 7) % 5) / 50]);

function descriptor(data: string): string {
  return `version: 1\nname: m\ndata:\n${data}  target: y\nterms:\n  - linear: [x]\n`;
}

async function run(files: Record<string, string>): Promise<ModelResult> {
  const repo = createMemoryRepository(files);
  const result = await runPipeline(defaultSettings('/repo'), repo, { jobs: 1 });
  expect(result.models).toHaveLength(1);
  return result.models[0];
}

const csv = (sep: string, decimal: string, list: number[][]): string =>
  ['x', 'y'].join(sep) + '\n' + list.map((r) => r.map((v) => String(v).replace('.', decimal)).join(sep)).join('\n') + '\n';

describe('data forms through the whole pipeline', () => {
  it('semicolon + decimal comma, tab, and a split column give the same fit as plain comma files', async () => {
    const train = rows.filter((_, i) => i % 4 !== 0);
    const holdout = rows.filter((_, i) => i % 4 === 0);
    const plain = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: h.csv\n'),
      't.csv': csv(',', '.', train),
      'h.csv': csv(',', '.', holdout),
    });
    expect(plain.verdict).not.toBe('error');
    const semicolon = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: h.csv\n  decimal: ","\n'),
      't.csv': csv(';', ',', train),
      'h.csv': csv(';', ',', holdout),
    });
    const tab = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: h.csv\n  separator: "\\t"\n'),
      't.csv': csv('\t', '.', train),
      'h.csv': csv('\t', '.', holdout),
    });
    const splitFile = 'set,x,y\n' + rows.map((r, i) => `${i % 4 === 0 ? 'test' : 'fit'},${r[0]},${r[1]}`).join('\n') + '\n';
    const split = await run({
      'm.model.yml': descriptor('  train: all.csv\n  split: { column: set, train: fit, holdout: test }\n'),
      'all.csv': splitFile,
    });
    for (const other of [semicolon, tab, split]) {
      expect(other.rows).toEqual(plain.rows);
      expect(other.coefficients).toEqual(plain.coefficients);
      expect(other.metrics).toEqual(plain.metrics);
      expect(other.dropped).toBeUndefined();
    }
  });

  it('missing: drop drops rows with NA-like cells and counts them per file in the report', async () => {
    const train = csv(',', '.', rows.slice(0, 30)).replace('\n0.5,', '\nNA,').replace('\n1,', '\n,');
    const result = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: h.csv\n  missing: drop\n'),
      't.csv': train,
      'h.csv':
        csv(',', '.', rows.slice(30))
          .replace(/\n([^\n]*)\n$/, '\n$1,\n')
          .replace(/,\n$/, '\n') + '8,n/a\n',
    });
    expect(result.verdict).not.toBe('error');
    expect(result.dropped).toEqual({ train: 2, holdout: 1 });
    expect(result.rows).toEqual({ train: 28, holdout: 10 });
  });

  it('bad forms are clear errors naming file, line and key', async () => {
    const both = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: t.csv\n  split: { column: set, train: a, holdout: b }\n'),
      't.csv': 'x,y\n1,2\n',
    });
    expect(both.verdict).toBe('error');
    expect(both.error).toMatchObject({ code: 'data-form', file: 'm.model.yml', line: 6 });
    const neither = await run({ 'm.model.yml': descriptor('  train: t.csv\n'), 't.csv': 'x,y\n1,2\n' });
    expect(neither.error).toMatchObject({ code: 'data-form', file: 'm.model.yml' });
    const commas = await run({
      'm.model.yml': descriptor('  train: t.csv\n  holdout: t.csv\n  separator: ","\n  decimal: ","\n'),
      't.csv': 'x,y\n1,2\n',
    });
    expect(commas.error).toMatchObject({ code: 'data-form', file: 'm.model.yml', line: 7 });
    expect(commas.error?.message).toContain('data.separator');
    const label = await run({
      'm.model.yml': descriptor('  train: all.csv\n  split: { column: set, train: fit, holdout: test }\n'),
      'all.csv': 'set,x,y\nfit,1,2\nfit,2,3\ntset,3,4\n',
    });
    expect(label.error).toMatchObject({ code: 'csv-split', file: 'all.csv', line: 4 });
    expect(label.error?.message).toContain('"set"');
  });
});
