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

  it('says what a file named .gz holds instead: plain text, or another format known by its first bytes', async () => {
    // The xz stream header's magic bytes (data/file-signatures.ts), then bytes no gzip member starts with.
    const xz = Uint8Array.from([0xfd, 0x37, 0x7a, 0x58, 0x5a, 0x00, 0x00, 0x04, 0xe6, 0xd6]);
    const repo = memoryRepo({ 'a.csv.gz': text, 'x.csv.gz': xz, 'z.csv.gz': Uint8Array.from([0x00, 0xff, 0x00, 0xff]) }, { cuts: [1, 3] });
    const message = async (file: string): Promise<string> => {
      const got = await outcome(repo, file, { columns: ['x'] });
      expect(got).toMatchObject({ ok: false, code: 'csv-gzip', file });
      return got.ok ? '' : got.message;
    };
    expect(await message('a.csv.gz')).toMatch(/Hint: the file starts like plain text: .*drop the `\.gz` from its name/);
    expect(await message('x.csv.gz')).toMatch(/Hint: the file looks like xz-compressed data; .*compress it with gzip/);
    expect(await message('z.csv.gz')).not.toMatch(/Hint/);
    // Cut short, a real gzip file gets no hint: it is gzip data.
    const packed = gzipSync(Buffer.from(text));
    const cut = await outcome(memoryRepo({ 'b.csv.gz': packed.subarray(0, packed.length - 20) }), 'b.csv.gz', { columns: ['x'] });
    expect(cut.ok === false && cut.message).not.toMatch(/Hint/);
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
