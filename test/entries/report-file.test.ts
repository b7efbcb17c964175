// Reports written to a stream in batches (entries/report-file.ts): pieces of bytes among strings
// reach the stream as they are, even when their source fills one buffer again for the next piece.
import { PassThrough } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { batches, writeReportStream } from '../../src/entries/report-file.js';

describe('writeReportStream', () => {
  it('writes strings and bytes in order, copying a piece of bytes before the next is asked for', async () => {
    const shared = Buffer.alloc(4);
    function* pieces(): Generator<string | Uint8Array> {
      yield 'a€';
      for (const part of ['😀', 'bcd']) {
        shared.fill(0);
        const n = shared.write(part, 'utf8');
        yield shared.subarray(0, n);
      }
      yield 'e';
    }
    const stream = new PassThrough();
    const out: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => out.push(chunk));
    await writeReportStream(stream, pieces());
    stream.end();
    expect(Buffer.concat(out).toString('utf8')).toBe('a€😀bcde');
  });

  it('groups strings into batches and hands bytes on one piece at a time', () => {
    const got = [...batches(['a', 'b', Uint8Array.of(0x63), 'd'])].map((p) =>
      typeof p === 'string' ? p : `<${Buffer.from(p).toString()}>`,
    );
    expect(got).toEqual(['ab', '<c>', 'd']);
  });
});
