import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { linesText, placeOfLine } from '../../src/data/data-parts.js';
import { readTable, readTableChunks } from '../../src/data/table.js';
import { memoryRepo } from './memory-repo.js';

const header = 'x,y\n';
const rowsOf = (from: number, to: number): string =>
  Array.from({ length: to - from }, (_, k) => `${(from + k) / 4},${((from + k) * 37) % 101}`).join('\n') + '\n';

/** 30 rows in one file, and the same rows in three parts (the second with a blank line and CRLF). */
function files(): Record<string, string | Uint8Array> {
  return {
    'one.csv': header + rowsOf(0, 30),
    'p/part-1.csv': header + rowsOf(0, 10),
    'p/part-2.csv': (header + '\n' + rowsOf(10, 20)).replace(/\n/g, '\r\n'),
    'p/part-3.csv.gz': gzipSync(Buffer.from(header + rowsOf(20, 30))),
  };
}
const PARTS = ['p/part-1.csv', 'p/part-2.csv', 'p/part-3.csv.gz'];

async function errorOf(action: () => Promise<unknown>): Promise<InputError> {
  try {
    await action();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('a table read from parts', () => {
  it('gives the same columns as the rows in one file (a gzip part among plain ones), on both paths', async () => {
    const repo = memoryRepo(files());
    const one = await readTable(repo, 'one.csv', { columns: ['x', 'y'] });
    for (const general of [false, true]) {
      const parts = await readTable(repo, PARTS, { columns: ['x', 'y'], general, chunkRows: 7 });
      expect(parts.rows).toBe(30);
      expect(parts.header).toEqual(['x', 'y']);
      expect(Array.from(parts.columns.get('x') as Float64Array)).toEqual(Array.from(one.columns.get('x') as Float64Array));
      expect(Array.from(parts.columns.get('y') as Float64Array)).toEqual(Array.from(one.columns.get('y') as Float64Array));
      expect(parts.parts?.map((p) => p.file)).toEqual(PARTS);
    }
  });

  it('keeps each row at its part and its own line (table-wide lines decoded by placeOfLine)', async () => {
    const table = await readTable(memoryRepo(files()), PARTS, { columns: ['x'] });
    const places = Array.from(table.lines, (line) => placeOfLine(table, line));
    // part-1: lines 2..11; part-2: a blank line 2, rows on lines 3..12; part-3: lines 2..11.
    expect(places[0]).toEqual({ file: 'p/part-1.csv', line: 2 });
    expect(places[9]).toEqual({ file: 'p/part-1.csv', line: 11 });
    expect(places[10]).toEqual({ file: 'p/part-2.csv', line: 3 });
    expect(places[19]).toEqual({ file: 'p/part-2.csv', line: 12 });
    expect(places[20]).toEqual({ file: 'p/part-3.csv.gz', line: 2 });
    expect(places[29]).toEqual({ file: 'p/part-3.csv.gz', line: 11 });
    // Table-wide lines rise strictly, so no two rows share one.
    for (let i = 1; i < table.rows; i++) expect(table.lines[i]).toBeGreaterThan(table.lines[i - 1]);
    expect(linesText(table, [table.lines[1], table.lines[12], table.lines[13]])).toBe('p/part-1.csv line 3; p/part-2.csv lines 5, 6');
  });

  it('reads the parts in the order given, and chunks never span two parts (each tagged with its part)', async () => {
    const repo = memoryRepo(files());
    const order = [PARTS[2], PARTS[0]];
    const table = await readTable(repo, order, { columns: ['x'] });
    expect((table.columns.get('x') as Float64Array)[0]).toBe(20 / 4);
    const seen: { file: string | undefined; rows: number }[] = [];
    for await (const chunk of readTableChunks(repo, PARTS, { columns: ['x'], chunkRows: 4 }))
      seen.push({ file: chunk.part?.file, rows: chunk.rows });
    expect(seen.map((s) => s.rows)).toEqual([4, 4, 2, 4, 4, 2, 4, 4, 2]);
    expect(seen.map((s) => s.file)).toEqual([...Array(3).fill(PARTS[0]), ...Array(3).fill(PARTS[1]), ...Array(3).fill(PARTS[2])]);
  });

  it('refuses a part whose header differs, naming the part, its header line and the first column that differs', async () => {
    const repo = memoryRepo({ ...files(), 'p/part-2.csv': '\n\ny,x\n1,2\n', 'p/part-4.csv': 'x,y,z\n1,2,3\n', 'p/part-5.csv': 'x\n1\n' });
    const swapped = await errorOf(() => readTable(repo, ['p/part-1.csv', 'p/part-2.csv'], { columns: ['x'] }));
    expect({ code: swapped.code, ...swapped.location }).toEqual({ code: 'csv-header-parts', file: 'p/part-2.csv', line: 3, key: 'y' });
    expect(swapped.message).toMatch(/column 1: `y` where the first part has `x`/);
    const extra = await errorOf(() => readTable(repo, ['p/part-1.csv', 'p/part-4.csv'], { columns: ['x'] }));
    expect({ code: extra.code, ...extra.location }).toEqual({ code: 'csv-header-parts', file: 'p/part-4.csv', line: 1, key: 'z' });
    expect(extra.message).toMatch(/column 3: it has the extra column `z`/);
    const short = await errorOf(() => readTable(repo, ['p/part-1.csv', 'p/part-5.csv'], { columns: ['x'] }));
    expect({ code: short.code, ...short.location }).toEqual({ code: 'csv-header-parts', file: 'p/part-5.csv', line: 1, key: 'y' });
  });

  it('names the part and its own line in a cell error', async () => {
    const repo = memoryRepo({ ...files(), 'p/part-2.csv': 'x,y\n1,2\n3,oops\n' });
    const error = await errorOf(() => readTable(repo, PARTS, { columns: ['x', 'y'] }));
    expect({ code: error.code, file: error.location.file, line: error.location.line }).toEqual({
      code: 'csv-cell',
      file: 'p/part-2.csv',
      line: 3,
    });
  });

  it('holds each part and all parts together to the byte cap', async () => {
    const repo = memoryRepo(files());
    const sizes = await Promise.all(PARTS.map((p) => repo.size(p)));
    const total = sizes.reduce((a, b) => a + b, 0);
    // Each part fits, all together do not: refused at the part that passes the cap.
    const together = await errorOf(() => readTable(repo, PARTS, { columns: ['x'], maxBytes: total - 1 }));
    expect({ code: together.code, file: together.location.file }).toEqual({ code: 'file-too-large', file: PARTS[2] });
    expect(together.message).toMatch(/all parts together/);
    // One part alone over the cap.
    const alone = await errorOf(() => readTable(repo, PARTS, { columns: ['x'], maxBytes: sizes[0] - 1 }));
    expect({ code: alone.code, file: alone.location.file }).toEqual({ code: 'file-too-large', file: PARTS[0] });
    // The gzip part's decompressed bytes count too: the cap must hold the plain parts plus what it expands to.
    const plain = sizes[0] + sizes[1] + Buffer.byteLength(header + rowsOf(20, 30));
    const over = await errorOf(() => readTable(repo, PARTS, { columns: ['x'], maxBytes: plain - 1 }));
    expect({ code: over.code, file: over.location.file }).toEqual({ code: 'file-too-large', file: PARTS[2] });
    await expect(readTable(repo, PARTS, { columns: ['x'], maxBytes: plain })).resolves.toMatchObject({ rows: 30 });
  });

  it('holds decompressed bytes of all parts together to the cap (a gzip part that expands past what the others left)', async () => {
    const big = gzipSync(Buffer.from('x,y\n' + '1,2\n'.repeat(50_000)));
    const repo = memoryRepo({ 'a.csv': 'x,y\n' + '1,2\n'.repeat(1000), 'b.csv.gz': big });
    // 4,004 + 200,004 decompressed bytes; the files on disk are far smaller than the cap.
    const error = await errorOf(() => readTable(repo, ['a.csv', 'b.csv.gz'], { columns: ['x'], maxBytes: 202_000 }));
    expect({ code: error.code, file: error.location.file }).toEqual({ code: 'file-too-large', file: 'b.csv.gz' });
    expect(error.message).toMatch(/all parts together/);
    await expect(readTable(repo, ['a.csv', 'b.csv.gz'], { columns: ['x'], maxBytes: 205_000 })).resolves.toMatchObject({ rows: 51_000 });
  });

  it('a table of one file has no parts and its own lines (as before)', async () => {
    const table = await readTable(memoryRepo(files()), 'one.csv', { columns: ['x'] });
    expect(table.parts).toBeUndefined();
    expect(table.file).toBe('one.csv');
    expect(table.lines[29]).toBe(31);
    expect(placeOfLine(table, 31)).toEqual({ file: 'one.csv', line: 31 });
  });
});
