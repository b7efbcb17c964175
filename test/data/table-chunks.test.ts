import { describe, it, expect } from 'vitest';
import { memoryRepo } from './memory-repo.js';
import { bits, chunkedOutcome, outcome } from './outcome.js';

const FILE = 'data/holdout.csv';
const COLUMNS = ['y', 'x'];

/** Small files covering the awkward spots: BOM, CRLF, blank lines, quotes, multi-line fields, errors. */
const SAMPLES: Record<string, string | Uint8Array> = {
  plain: 'x,y,note\n1,2,a\n-3.5,4e-2,b\n\n5,6,c\n7,8,d\n9,10,e\n11,12,f\n13,14,g',
  crlfBom: '\uFEFFx,y,note\r\n\r\n1,2,a\r\n 3 , 4 ,b\r\n5,6,c\r\n',
  quoted: 'x,y,note\n"1","2","a\nb"\n3,4,"c ""d"""\n\n  \n5,"6",e\n',
  lateQuote: 'x,y,note\n1,2,a\n3,4,b\n5,6,"c"\n7,8,d\n9,10,e\n',
  ragged: 'x,y,note\n1,2,a\n3,4\n5,6,c\n',
  badCell: 'x,y,note\n1,2,a\n3,abc,b\n',
  badQuote: 'x,y,note\n1,2,a\n3,4,"b\n5,6,c\n',
  badBytes: Uint8Array.from('x,y,note\n1,2,a\n3,4,caf\xE9\n', (c) => c.charCodeAt(0)),
};

describe('readTableChunks: chunk sizes do not change the result', () => {
  for (const [name, text] of Object.entries(SAMPLES)) {
    for (const general of [false, true]) {
      it(`${name}, ${general ? 'general' : 'fast'} path, chunkRows 1, 3 and 65536`, async () => {
        const whole = await outcome(memoryRepo({ [FILE]: text }), FILE, { columns: COLUMNS, general });
        for (const chunkRows of [1, 3, 65536]) {
          const chunked = await chunkedOutcome(memoryRepo({ [FILE]: text }), FILE, { columns: COLUMNS, general, chunkRows });
          if (!whole.ok || !chunked.ok) {
            expect(chunked, `chunkRows ${chunkRows}`).toEqual(whole);
            continue;
          }
          expect(chunked.columns, `chunkRows ${chunkRows}`).toEqual(whole.columns);
          expect(chunked.lines, `chunkRows ${chunkRows}`).toEqual(whole.lines);
          const sizes = chunked.chunkSizes ?? [];
          sizes.slice(0, -1).forEach((size) => expect(size, `chunk sizes ${sizes}`).toBe(chunkRows));
          expect(sizes.at(-1) ?? 0, `chunk sizes ${sizes}`).toBeLessThanOrEqual(chunkRows);
          expect(sizes.every((size) => size > 0)).toBe(true);
        }
      });
    }
  }
});

describe('readTable: where the repository splits the stream does not change the result', () => {
  for (const [name, text] of Object.entries(SAMPLES)) {
    it(`${name}: a cut at every byte offset, and one-byte pieces, on both paths`, async () => {
      const length = typeof text === 'string' ? new TextEncoder().encode(text).length : text.length;
      const reference = await outcome(memoryRepo({ [FILE]: text }), FILE, { columns: COLUMNS, general: true });
      const splits: number[][] = [Array.from({ length: length - 1 }, (_, i) => i + 1)];
      for (let cut = 0; cut <= length; cut++) splits.push([cut]);
      for (const cuts of splits) {
        for (const general of [false, true]) {
          const result = await outcome(memoryRepo({ [FILE]: text }, { cuts }), FILE, { columns: COLUMNS, general });
          expect(result, `${general ? 'general' : 'fast'} path, cuts ${cuts.length === 1 ? cuts[0] : 'every byte'}`).toEqual(reference);
        }
      }
    }, 60_000);
  }
});

describe('readTable: a larger file in many pieces', () => {
  it('gives the same doubles on both paths as Number() of each cell (5000 rows, 4 KiB pieces)', async () => {
    // A fixed pseudo-random sequence (linear congruential, common practice) so the file is the same every run.
    let state = 12345;
    const next = (): number => {
      state = (Math.imul(state, 1103515245) + 12345) >>> 0;
      return state / 2 ** 32;
    };
    const texts: string[][] = [];
    for (let i = 0; i < 5000; i++) {
      texts.push(
        Array.from({ length: 3 }, () => ((next() - 0.5) * 10 ** Math.floor(next() * 12 - 4)).toPrecision(1 + Math.floor(next() * 17))),
      );
    }
    const csv = `a,b,c\n${texts.map((row) => row.join(',')).join('\n')}\n`;
    const length = new TextEncoder().encode(csv).length;
    const cuts = Array.from({ length: Math.floor((length - 1) / 4096) }, (_, i) => (i + 1) * 4096);
    const options = { columns: ['c', 'a'], chunkRows: 1000 };
    const fast = await outcome(memoryRepo({ [FILE]: csv }, { cuts }), FILE, options);
    const general = await outcome(memoryRepo({ [FILE]: csv }, { cuts }), FILE, { ...options, general: true });
    expect(fast).toEqual(general);
    if (!fast.ok) throw new Error(`unexpected ${fast.code}: ${fast.message}`);
    expect(fast.columns.c).toEqual(texts.map((row) => bits(Number(row[2]))));
    expect(fast.columns.a).toEqual(texts.map((row) => bits(Number(row[0]))));
    expect(fast.lines).toEqual(texts.map((_, i) => i + 2));
  }, 60_000);
});
