import { describe, it, expect } from 'vitest';
import { readHeader, readTable, readTableChunks } from '../../src/data/table.js';
import { InputError } from '../../src/core/errors.js';
import type { RepoReader } from '../../src/repo/types.js';
import { memoryRepo } from './memory-repo.js';
import { bits, outcome, type Outcome } from './outcome.js';

const FILE = 'data/train.csv';

/** Reads `text` on both paths, checks they agree exactly, returns the outcome. */
async function both(text: string | Uint8Array, columns: string[], extra: { maxBytes?: number } = {}): Promise<Outcome> {
  const fast = await outcome(memoryRepo({ [FILE]: text }), FILE, { columns, ...extra });
  const general = await outcome(memoryRepo({ [FILE]: text }), FILE, { columns, general: true, ...extra });
  expect(fast, `fast and general paths differ on ${JSON.stringify(text)}`).toEqual(general);
  return fast;
}

/** The numbers of one column of a successful outcome. */
function values(result: Outcome, column: string): number[] {
  if (!result.ok) throw new Error(`expected a table, got ${result.code}: ${result.message}`);
  return result.columns[column].map((hex) => new DataView(new BigUint64Array([BigInt(`0x${hex}`)]).buffer).getFloat64(0, true));
}

function failure(result: Outcome): Extract<Outcome, { ok: false }> {
  if (result.ok) throw new Error(`expected an error, got a table of ${result.rows} rows`);
  return result;
}

describe('readTable: accepted forms (fast and general paths agree)', () => {
  it('reads plain numbers, only the requested columns, in the requested order', async () => {
    const result = await both('x,y,z\n1,2,3\n4,5,6\n', ['z', 'x']);
    expect(values(result, 'z')).toEqual([3, 6]);
    expect(values(result, 'x')).toEqual([1, 4]);
    expect(result.ok && result.lines).toEqual([2, 3]);
    expect(result.ok && result.header).toEqual(['x', 'y', 'z']);
  });

  it('reads quoted numbers, including spaces inside the quotes', async () => {
    const result = await both('x,y\n"1.5","-2"\n" 3 ",4\n', ['x', 'y']);
    expect(values(result, 'x')).toEqual([1.5, 3]);
    expect(values(result, 'y')).toEqual([-2, 4]);
  });

  it('reads CRLF line ends, with and without a final line end', async () => {
    for (const text of ['x,y\r\n1,2\r\n3,4\r\n', 'x,y\r\n1,2\r\n3,4']) {
      const result = await both(text, ['x', 'y']);
      expect(values(result, 'y'), JSON.stringify(text)).toEqual([2, 4]);
      expect(result.ok && result.lines).toEqual([2, 3]);
    }
  });

  it('drops a UTF-8 byte-order mark (the first header name stays clean)', async () => {
    const result = await both('\uFEFFx,y\n1,2\n', ['x']);
    expect(result.ok && result.header).toEqual(['x', 'y']);
    expect(values(result, 'x')).toEqual([1]);
  });

  it('skips blank and white-space-only lines and keeps physical line numbers', async () => {
    const text = '\n  \nx,y\n\n1,2\n \t \n\r\n3,4\n\n';
    const result = await both(text, ['x']);
    expect(values(result, 'x')).toEqual([1, 3]);
    expect(result.ok && result.lines).toEqual([5, 8]);
  });

  it('trims spaces and tabs around numbers and header names', async () => {
    const result = await both(' x , y\t\n  1.5 ,\t-2\t\n', ['x', 'y']);
    expect(result.ok && result.header).toEqual(['x', 'y']);
    expect(values(result, 'x')).toEqual([1.5]);
    expect(values(result, 'y')).toEqual([-2]);
  });

  it('reads numbers near the ends of the double range (the smallest normal included), zeros with any exponent and exponent forms', async () => {
    const cells = [
      '1.7976931348623157e308',
      '-1.7976931348623157e308',
      '1e308',
      '-0e-400',
      '0.000e-500',
      '2.2250738585072014e-308',
      '1E5',
      '1e+5',
      '-2.5e-3',
      '.5',
      '5.',
      '+3',
      '007',
      '0e999',
      '123456789012345678901234567890',
      '0.1',
      '9007199254740993',
    ];
    const result = await both(`v\n${cells.join('\n')}\n`, ['v']);
    // Expected values: JavaScript's own Number() of the same text (the contract).
    expect(values(result, 'v').map(bits)).toEqual(cells.map((c) => bits(Number(c))));
    expect(values(result, 'v')[5]).toBe(2 ** -1022); // the smallest normal double (IEEE 754 binary64)
  });

  it('keeps negative zero', async () => {
    const result = await both('v\n-0\n-0.0\n-0e5\n0\n', ['v']);
    const v = values(result, 'v');
    expect(v.map((x) => Object.is(x, -0))).toEqual([true, true, true, false]);
  });

  it('accepts bad cells in columns that are not requested', async () => {
    const text = 'x,note\n1,hello\n2,NaN\n3,Infinity\n4,\n5,0x1F\n6,1e999\n';
    const result = await both(text, ['x']);
    expect(values(result, 'x')).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('reads a header with no data rows as 0 rows', async () => {
    const result = await both('x,y\n\n', ['x', 'y']);
    expect(result.ok && result.rows).toBe(0);
    expect(values(result, 'x')).toEqual([]);
    const chunks = [];
    for await (const chunk of readTableChunks(memoryRepo({ [FILE]: 'x,y\n' }), FILE, { columns: ['x'] })) chunks.push(chunk);
    expect(chunks).toEqual([]);
  });

  it('reads a quoted field spanning lines (unused column) and counts physical lines', async () => {
    const text = 'x,note\n1,"two\nlines"\n2,"a ""quoted"" word"\n3,x\n';
    const result = await both(text, ['x']);
    expect(values(result, 'x')).toEqual([1, 2, 3]);
    expect(result.ok && result.lines).toEqual([2, 4, 5]);
  });

  it('gives one shared array when a column is requested twice', async () => {
    const table = await readTable(memoryRepo({ [FILE]: 'x,y\n1,2\n' }), FILE, { columns: ['x', 'x'] });
    expect([...table.columns.keys()]).toEqual(['x']);
    const chunks = [];
    for await (const chunk of readTableChunks(memoryRepo({ [FILE]: 'x,y\n1,2\n' }), FILE, { columns: ['x', 'y', 'x'] })) chunks.push(chunk);
    expect(chunks[0].columns[0]).toBe(chunks[0].columns[2]);
  });

  it('reads plain files in one pass and hands quoted files to the general path', async () => {
    const plain = memoryRepo({ [FILE]: 'x\n1\n' });
    await readTable(plain, FILE, { columns: ['x'] });
    expect(plain.streams.get(FILE)).toBe(1);
    const quoted = memoryRepo({ [FILE]: 'x\n1\n"2"\n' });
    await readTable(quoted, FILE, { columns: ['x'] });
    expect(quoted.streams.get(FILE)).toBe(2);
  });
});

describe('readTable: errors (same on both paths)', () => {
  it('csv-empty for an empty file or one of blank lines only', async () => {
    for (const text of ['', '\n\n', '  \r\n\t\n', '\uFEFF']) {
      const error = failure(await both(text, ['x']));
      expect(error.code, JSON.stringify(text)).toBe('csv-empty');
      expect(error.file).toBe(FILE);
    }
  });

  it('csv-header names both positions of a repeated name', async () => {
    const error = failure(await both('\na,b,a\n1,2,3\n', ['b']));
    expect(error).toMatchObject({ code: 'csv-header', line: 2, key: 'a' });
    expect(error.message).toContain('positions 1 and 3');
  });

  it('csv-missing-column lists the columns that exist, cut after 20', async () => {
    const small = failure(await both('a,b\n1,2\n', ['b', 'c', 'd']));
    expect(small).toMatchObject({ code: 'csv-missing-column', line: 1, key: 'c' });
    expect(small.message).toContain('"c", "d"');
    expect(small.message).toContain('"a", "b"');
    const names = Array.from({ length: 30 }, (_, i) => `col${i}`);
    const wide = failure(await both(`${names.join(',')}\n`, ['nope']));
    expect(wide.message).toContain('"col19"');
    expect(wide.message).not.toContain('"col20"');
    expect(wide.message).toContain('10 more');
  });

  it('csv-ragged gives the line and both field counts', async () => {
    const fewer = failure(await both('x,y,z\n1,2,3\n\n4,5\n', ['x']));
    expect(fewer).toMatchObject({ code: 'csv-ragged', line: 4 });
    expect(fewer.message).toContain('2 fields; expected 3');
    const more = failure(await both('x,y\n1,2,3\n', ['y']));
    expect(more).toMatchObject({ code: 'csv-ragged', line: 2 });
    expect(more.message).toContain('3 fields; expected 2');
  });

  it('csv-cell for text, NaN, Infinity, inf, hex, empty and overflowing cells in a used column', async () => {
    const bad = [
      'abc',
      'NaN',
      'Infinity',
      '-Infinity',
      'inf',
      '0x1F',
      '',
      '  ',
      '1e999',
      '-1e999',
      '1,5',
      '1.2.3',
      '1e',
      '-',
      '.',
      '1_000',
      '"  "',
    ];
    for (const cell of bad) {
      const error = failure(await both(`x,y\n1,2\n3,${cell}\n`, ['x', 'y']));
      expect(error, `cell ${JSON.stringify(cell)}`).toMatchObject({
        code: cell === '1,5' ? 'csv-ragged' : 'csv-cell',
        file: FILE,
        line: 3,
      });
      if (cell !== '1,5') {
        expect(error.key).toBe('y');
        expect(error.message).toContain('"y"');
      }
    }
  });

  it('csv-cell for nonzero cells that underflow to 0 or a subnormal, like an overflow, naming file, line and column', async () => {
    const tiny = [
      '1e-400',
      '-1e-400',
      '1e-320',
      '4.9e-324',
      '-2.5e-315',
      '123e-330',
      `0.${'0'.repeat(400)}1`,
      ' 1e-400 ',
      '"1e-400"',
      `${'9'.repeat(30)}e-340`,
    ];
    for (const cell of tiny) {
      const error = failure(await both(`x,y\n1,2\n3,${cell}\n`, ['x', 'y']));
      expect(error, `cell ${JSON.stringify(cell)}`).toMatchObject({ code: 'csv-cell', file: FILE, line: 3, key: 'y' });
      expect(error.message).toContain('"y"');
      expect(error.message).toContain('too small for 64-bit floating point');
    }
  });

  it('csv-cell quotes the cell, cut to 40 characters', async () => {
    const long = 'z'.repeat(100);
    const error = failure(await both(`x\n${long}\n`, ['x']));
    expect(error.code).toBe('csv-cell');
    expect(error.message).toContain('zzzz');
    expect(error.message).not.toContain('z'.repeat(41));
  });

  it('reports the first problem in file order', async () => {
    const error = failure(await both('x,y\n1,2\nbad,2\n3\n', ['x']));
    expect(error).toMatchObject({ code: 'csv-cell', line: 3 });
  });

  it('file-too-large before reading, naming the setting to raise', async () => {
    const error = failure(await both('x\n1\n', ['x'], { maxBytes: 3 }));
    expect(error.code).toBe('file-too-large');
    expect(error.message).toContain('raise caps.max_file_mb in fitgate.yml');
    expect(error.message).toContain('4 bytes');
  });

  it('csv-encoding for bytes that are not UTF-8, in the header or later, after earlier row errors', async () => {
    const latin1 = (text: string): Uint8Array => Uint8Array.from(text, (c) => c.charCodeAt(0));
    expect(failure(await both(latin1('temp\xE9rature,y\n1,2\n'), ['y']))).toMatchObject({ code: 'csv-encoding', line: 1 });
    expect(failure(await both(latin1('\nx,note\n1,ok\n2,caf\xE9\n'), ['x']))).toMatchObject({ code: 'csv-encoding', line: 4 });
    expect(failure(await both(latin1('x,note\n1\n2,caf\xE9\n'), ['x']))).toMatchObject({ code: 'csv-ragged', line: 2 });
    const utf16 = new Uint8Array([0xff, 0xfe, 0x78, 0x00, 0x0a, 0x00]);
    const error = failure(await both(utf16, ['x']));
    expect(error).toMatchObject({ code: 'csv-encoding', line: 1 });
    expect(error.message).toContain('UTF-16');
  });

  it('csv-syntax for broken quoting (never a hang or a raw parser error)', async () => {
    expect(failure(await both('x,y\n1,"2\n3,4\n', ['x']))).toMatchObject({ code: 'csv-syntax', line: 2 });
    expect(failure(await both('x,y\n1,2\n3,a"b"\n', ['x']))).toMatchObject({ code: 'csv-syntax', line: 3 });
    expect(failure(await both('x,y\n1,"2"z\n', ['x']))).toMatchObject({ code: 'csv-syntax', line: 2 });
  });

  it('checks the header before the first chunk', async () => {
    const chunks = readTableChunks(memoryRepo({ [FILE]: 'a\n1\n' }), FILE, { columns: ['b'] });
    await expect(chunks[Symbol.asyncIterator]().next()).rejects.toBeInstanceOf(InputError);
  });

  it('passes on the repository error for a missing file', async () => {
    await expect(readTable(memoryRepo({}), FILE, { columns: ['x'] })).rejects.toMatchObject({ code: 'file-missing' });
  });
});

describe('readHeader', () => {
  it('returns the trimmed names in file order, on plain and quoted headers', async () => {
    expect(await readHeader(memoryRepo({ [FILE]: '\n a ,b,c\n1,2,3\n' }), FILE)).toEqual(['a', 'b', 'c']);
    expect(await readHeader(memoryRepo({ [FILE]: '"a,1",b\n"x\n' }), FILE)).toEqual(['a,1', 'b']);
  });

  it('throws csv-empty and csv-header like readTable', async () => {
    await expect(readHeader(memoryRepo({ [FILE]: '\n' }), FILE)).rejects.toMatchObject({ code: 'csv-empty' });
    await expect(readHeader(memoryRepo({ [FILE]: 'a,a\n' }), FILE)).rejects.toMatchObject({ code: 'csv-header' });
  });
});

describe('readTable: files that are not comma-separated CSV get a hint naming the likely cause (same on both paths)', () => {
  it('a Git LFS pointer file', async () => {
    // The three lines of a pointer as the git-lfs specification (spec/v1) lays them out; the oid is made up.
    const pointer = `version https://git-lfs.github.com/spec/v1\noid sha256:${'ab12'.repeat(16)}\nsize 123456\n`;
    const error = failure(await both(pointer, ['x', 'y']));
    expect(error).toMatchObject({ code: 'csv-missing-column', file: FILE, line: 1 });
    expect(error.message).toContain('Hint: the file is a Git LFS pointer, not the data');
  });

  it.each([
    ['semicolon', 'x;y\n1.5;2\n3;4\n'],
    ['tab', 'x\ty\n1.5\t2\n3\t4\n'],
  ])('a %s-separated file is read (the separator is detected from the header)', async (_, text) => {
    const table = await both(text, ['x', 'y']);
    expect(table).toMatchObject({ ok: true, rows: 2, header: ['x', 'y'] });
  });

  it('a header with both semicolons and tabs (ambiguous) gets the hint to set data.separator', async () => {
    const error = failure(await both('x;y\tz\n1;2\t3\n', ['x', 'y']));
    expect(error).toMatchObject({ code: 'csv-missing-column', file: FILE, line: 1 });
    expect(error.message).toContain('Hint: the header holds both semicolons and tabs');
    expect(error.message).toContain('data.separator');
  });

  it('CR-only line ends', async () => {
    const error = failure(await both('x,y\r1,2\r3,4\r', ['x']));
    expect(error).toMatchObject({ code: 'csv-line-ends', file: FILE, line: 1 });
    expect(error.message).toContain('CR-only line ends');
  });

  it('gives no hint to a plain CSV file that lacks a column', async () => {
    const error = failure(await both('x,z\n1,2\n', ['x', 'y']));
    expect(error.code).toBe('csv-missing-column');
    expect(error.message).not.toContain('Hint');
  });
});

describe('readTable: header caps', () => {
  /** A reader whose one file is `head` then `fill` repeated without end, in 64 KiB pieces; counts bytes handed out. */
  function endless(head: string, fill: string): { repo: RepoReader; pulled: () => number } {
    let pulled = 0;
    const piece = new TextEncoder().encode(fill.repeat(Math.ceil(65_536 / fill.length)).slice(0, 65_536));
    const repo: RepoReader = {
      label: 'endless',
      resolve: async (_from, target) => target,
      isFile: async () => true,
      entryKind: async () => 'file',
      size: async () => 100 * 1024 * 1024,
      read: async () => {
        throw new Error('read is not used for data');
      },
      async *stream() {
        const first = new TextEncoder().encode(head);
        pulled += first.length;
        yield first;
        for (let i = 0; i < 100_000; i++) {
          pulled += piece.length;
          yield piece;
        }
      },
      glob: async () => ({ paths: [], notEntered: [] }),
    };
    return { repo, pulled: () => pulled };
  }

  it.each([false, true])(
    'refuses a header that does not end within 1 MiB before holding more of it (general path: %s)',
    async (general) => {
      const { repo, pulled } = endless('x,y,', 'c,');
      const error = failure(await outcome(repo, FILE, { columns: ['x'], general }));
      expect(error).toMatchObject({ code: 'csv-header-too-long', file: FILE, line: 1 });
      expect(pulled()).toBeLessThanOrEqual(1024 * 1024 + 2 * 65_536);
    },
  );

  it('names CR-only line ends when a long header holds lone carriage returns', async () => {
    const { repo } = endless('x,y\r', '1,2\r');
    const error = failure(await outcome(repo, FILE, { columns: ['x'] }));
    expect(error.code).toBe('csv-header-too-long');
    expect(error.message).toContain('CR-only line ends');
  });

  it('counts blank lines before the header within the cap, and takes a header that ends inside it', async () => {
    const blank = ' \n'.repeat(1000);
    const result = await both(`${blank}x,y\n1,2\n`, ['y']);
    expect(values(result, 'y')).toEqual([2]);
    // The cap counts from the file's start: 1 MiB of blank line leaves no room for the header.
    const error = failure(await both(`${' '.repeat(1024 * 1024)}\nx\n1\n`, ['x']));
    expect(error).toMatchObject({ code: 'csv-header-too-long', line: 1 });
  });

  it('refuses a header of more than 100,000 columns', async () => {
    const names = Array.from({ length: 100_001 }, (_, i) => `c${i}`).join(',');
    const error = failure(await both(`${names}\n`, ['c0']));
    expect(error).toMatchObject({ code: 'csv-header-too-wide', file: FILE, line: 1 });
  });
});
