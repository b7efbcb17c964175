// Issue 13's gap: the hold-out rows are held to the same caps as the training rows. Every data
// file read (training, hold-out, parts, the text read of category columns and of text labels)
// goes through one byte cap (caps.max_file_mb, decompressed bytes included), and the work
// estimate that caps.max_operations bounds counts the hold-out rows.
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { loadDescriptor } from '../../src/config/descriptor.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import type { SettingsFile } from '../../src/config/types.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { OVER_BUDGET } from '../../src/run/cost.js';
import { evaluateModel } from '../../src/run/evaluate.js';
import { evaluateClassifier } from '../../src/run/evaluate-classifier.js';

/** n rows "x,y" of a smooth invented curve. */
const csv = (n: number, offset = 0): string =>
  `x,y\n${Array.from({ length: n }, (_, i) => `${(i + offset) / 10},${Math.sin((i + offset) / 10) + ((i * 13) % 7) / 100}`).join('\n')}\n`;

const MODEL = 'version: 1\nname: m\ndata: { train: t.csv, holdout: HOLDOUT, target: y }\nterms:\n  - polynomial: { of: x, degree: 3 }\n';

function settingsWith(caps: Partial<SettingsFile['caps']>): SettingsFile {
  return { ...defaultSettings(), caps: { ...defaultSettings().caps, ...caps } };
}

async function evaluate(files: Record<string, string | Uint8Array>, holdout: string, settings: SettingsFile) {
  const repo = createMemoryRepository({ 'm.model.yml': MODEL.replace('HOLDOUT', holdout), ...files });
  return evaluateModel(repo, await loadDescriptor(repo, 'm.model.yml', settings), settings);
}

describe('the hold-out rows under the caps', () => {
  it('a hold-out file over caps.max_file_mb is refused like a training file, before it is read', async () => {
    const train = csv(100);
    const holdout = csv(3000);
    const cap = Buffer.byteLength(train) + 10;
    expect(Buffer.byteLength(holdout)).toBeGreaterThan(cap);
    const result = await evaluate({ 't.csv': train, 'h.csv': holdout }, 'h.csv', settingsWith({ maxFileBytes: cap }));
    expect(result.error).toMatchObject({ code: 'file-too-large', file: 'h.csv' });
    expect((await evaluate({ 't.csv': train, 'h.csv': csv(50) }, 'h.csv', settingsWith({ maxFileBytes: cap }))).error).toBeNull();
  });

  it('a gzip hold-out file is held to the cap by its decompressed bytes, and hold-out parts by their total', async () => {
    const train = csv(100);
    const cap = Buffer.byteLength(train) + 10;
    // Repeated rows: small once compressed, 3,000 rows when read.
    const packed = gzipSync(Buffer.from(`x,y\n${'0.5,0.48\n'.repeat(3000)}`));
    expect(packed.length).toBeLessThan(cap);
    const gz = await evaluate({ 't.csv': train, 'h.csv.gz': packed }, 'h.csv.gz', settingsWith({ maxFileBytes: cap }));
    expect(gz.error).toMatchObject({ code: 'file-too-large', file: 'h.csv.gz' });
    // Two hold-out parts, each under the cap, together over it.
    const half = csv(60);
    expect(2 * Buffer.byteLength(half)).toBeGreaterThan(cap);
    const parts = await evaluate(
      { 't.csv': train, 'h1.csv': half, 'h2.csv': csv(60, 60) },
      '[h1.csv, h2.csv]',
      settingsWith({ maxFileBytes: cap }),
    );
    expect(parts.error).toMatchObject({ code: 'file-too-large', file: 'h2.csv' });
    expect(parts.error?.message).toContain('all parts together');
  });

  it('the text labels of a classifier are read through the same cap (a gzip hold-out that expands past it is refused)', async () => {
    const labelled = (n: number): string =>
      `x,y\n${Array.from({ length: n }, (_, i) => `${i / 10},${(i * 7) % 3 === 0 ? 'yes' : 'no'}`).join('\n')}\n`;
    const train = labelled(200);
    const cap = Buffer.byteLength(train) + 10;
    const files = {
      'c.model.yml':
        'version: 1\nname: c\ntask: classification\ndata: { train: t.csv, holdout: h.csv.gz, target: y, positive: "yes" }\nterms:\n  - linear: [x]\n',
      't.csv': train,
      'h.csv.gz': gzipSync(Buffer.from(labelled(100))),
    };
    const settings = settingsWith({ maxFileBytes: cap });
    const repo = createMemoryRepository(files);
    const fine = await evaluateClassifier(repo, await loadDescriptor(repo, 'c.model.yml', settings), settings);
    // The gzip hold-out's labels are read decompressed (before, the raw gzip bytes were parsed as text).
    expect(fine.error).toBeNull();
    expect(fine.rows).toEqual({ train: 200, holdout: 100 });
    const bomb = gzipSync(Buffer.from(`x,y\n${'1,yes\n0,no\n'.repeat(5000)}`));
    expect(bomb.length).toBeLessThan(cap);
    const big = createMemoryRepository({ ...files, 'h.csv.gz': bomb });
    const refused = await evaluateClassifier(big, await loadDescriptor(big, 'c.model.yml', settings), settings).catch(
      (error: unknown) => error,
    );
    expect(refused).toMatchObject({ code: 'file-too-large', location: { file: 'h.csv.gz' } });
  });

  it('caps.max_operations counts the hold-out rows: the same model with a hundred times the hold-out rows goes over a cap the smaller one passes', async () => {
    const train = csv(200);
    const estimate = async (holdoutRows: number): Promise<number> => {
      const result = await evaluate({ 't.csv': train, 'h.csv': csv(holdoutRows, 7) }, 'h.csv', settingsWith({ maxOperations: 1 }));
      expect(result.error?.code).toBe(OVER_BUDGET);
      const found = /estimated work of this model, ([0-9.e,]+) operations/.exec(result.error?.message ?? '');
      return Number((found?.[1] ?? 'NaN').replace(/,/g, ''));
    };
    const small = await estimate(200);
    const large = await estimate(20_000);
    expect(large).toBeGreaterThan(2 * small);
    const cap = Math.sqrt(small * large);
    expect((await evaluate({ 't.csv': train, 'h.csv': csv(200, 7) }, 'h.csv', settingsWith({ maxOperations: cap }))).error).toBeNull();
    const over = await evaluate({ 't.csv': train, 'h.csv': csv(20_000, 7) }, 'h.csv', settingsWith({ maxOperations: cap }));
    expect(over.error).toMatchObject({ code: OVER_BUDGET, file: 'm.model.yml' });
  });
});
