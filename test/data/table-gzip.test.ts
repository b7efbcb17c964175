import { describe, expect, it } from 'vitest';
import { gzipSync } from 'node:zlib';
import { memoryRepo } from './memory-repo.js';
import { outcome } from './outcome.js';

const text = 'x;y\n' + Array.from({ length: 5000 }, (_, i) => `${i / 8};${(i * 37) % 101}`).join('\n') + '\n';

describe('gzip data files (.csv.gz)', () => {
  it('read the same as the plain file on both paths, whatever the piece cuts', async () => {
    const plain = await outcome(memoryRepo({ 'd/t.csv': text }), 'd/t.csv', { columns: ['x', 'y'] });
    expect(plain).toMatchObject({ ok: true, rows: 5000 });
    const packed = gzipSync(Buffer.from(text));
    for (const cuts of [[], [1, 10, 11, 500], [Math.floor(packed.length / 2)]]) {
      const repo = memoryRepo({ 'd/t.csv.gz': packed }, { cuts });
      for (const general of [false, true]) {
        expect(await outcome(repo, 'd/t.csv.gz', { columns: ['x', 'y'], general })).toEqual(plain);
      }
    }
  });

  it('a file that is not gzip, or is cut short, is a csv-gzip error naming the file', async () => {
    const packed = gzipSync(Buffer.from(text));
    const repo = memoryRepo({ 'a.csv.gz': text, 'b.csv.gz': packed.subarray(0, packed.length - 20) });
    expect(await outcome(repo, 'a.csv.gz', { columns: ['x'] })).toMatchObject({ ok: false, code: 'csv-gzip', file: 'a.csv.gz' });
    expect(await outcome(repo, 'b.csv.gz', { columns: ['x'] })).toMatchObject({ ok: false, code: 'csv-gzip', file: 'b.csv.gz' });
  });

  it('stops at the size cap when the data decompresses past it (a small file that expands without end)', async () => {
    const bomb = gzipSync(Buffer.from('x\n' + '1\n'.repeat(4_000_000)));
    expect(bomb.length).toBeLessThan(100_000);
    const repo = memoryRepo({ 'b.csv.gz': bomb });
    expect(await outcome(repo, 'b.csv.gz', { columns: ['x'], maxBytes: 1_000_000 })).toMatchObject({
      ok: false,
      code: 'file-too-large',
      file: 'b.csv.gz',
    });
  });
});
