import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { memoryRepo } from './memory-repo.js';
import { bits, outcome } from './outcome.js';
import { readTable } from '../../src/data/table.js';
import { separatorOfHeader } from '../../src/data/csv-format.js';
import { isMissingCell, MISSING_SPELLINGS } from '../../src/data/csv-rules.js';

const FILE = 'data/t.csv';
const RUNS = 150;

describe('separator detection from the header line', () => {
  it('comma wins whenever the header holds one; else semicolon or tab alone; else comma (ambiguous)', () => {
    expect(separatorOfHeader('a,b;c')).toBe(',');
    expect(separatorOfHeader('a;b;c')).toBe(';');
    expect(separatorOfHeader('a\tb')).toBe('\t');
    expect(separatorOfHeader('a;b\tc')).toBe(',');
    expect(separatorOfHeader('"a,b";c')).toBe(';');
    expect(separatorOfHeader('single')).toBe(',');
  });

  it('reads semicolon and tab files as it reads comma files', async () => {
    const comma = 'x,y\n1.5,2\n-3,4e2\n';
    for (const sep of [';', '\t']) {
      const repo = memoryRepo({ [FILE]: comma.replaceAll(',', sep) });
      for (const general of [false, true]) {
        const got = await outcome(repo, FILE, { columns: ['x', 'y'], general });
        expect(got).toEqual(await outcome(memoryRepo({ [FILE]: comma }), FILE, { columns: ['x', 'y'] }));
      }
    }
  });

  it('an ambiguous header keeps its hint and says how to set the separator', async () => {
    const repo = memoryRepo({ [FILE]: 'x;y\tz\n1;2\t3\n' });
    const got = await outcome(repo, FILE, { columns: ['x'] });
    expect(got).toMatchObject({ ok: false, code: 'csv-missing-column', file: FILE, line: 1 });
    expect(got.ok === false && got.message).toMatch(/data\.separator/);
  });

  it('a set separator wins over detection', async () => {
    const repo = memoryRepo({ [FILE]: 'x;y,z\n1;2,3\n' });
    const got = await outcome(repo, FILE, { columns: ['x', 'y,z'], format: { separator: ';' } });
    expect(got).toMatchObject({ ok: false, code: 'csv-cell', line: 2, key: 'y,z' });
    expect(await outcome(repo, FILE, { columns: ['x'], format: { separator: ';' } })).toMatchObject({
      ok: true,
      rows: 1,
      header: ['x', 'y,z'],
    });
  });
});

describe('decimal comma', () => {
  it('reads 1,5 as 1.5 on both paths, and a decimal point is an error naming file, line and column', async () => {
    const repo = memoryRepo({ [FILE]: 'x;y\n1,5;-2,25e1\n3;4\n', bad: 'x;y\n1,5;2\n1.5;2\n' });
    for (const general of [false, true]) {
      const got = await outcome(repo, FILE, { columns: ['x', 'y'], general, format: { decimal: ',' } });
      expect(got).toMatchObject({ ok: true, rows: 2, columns: { x: [bits(1.5), bits(3)], y: [bits(-22.5), bits(4)] } });
      const bad = await outcome(repo, 'bad', { columns: ['x', 'y'], general, format: { decimal: ',' } });
      expect(bad).toMatchObject({ ok: false, code: 'csv-cell', file: 'bad', line: 3, key: 'x' });
      expect(bad.ok === false && bad.message).toMatch(/decimal comma/);
    }
  });

  it('a comma-separated header with a decimal comma is refused with a clear error', async () => {
    const repo = memoryRepo({ [FILE]: 'x,y\n1,2\n' });
    const got = await outcome(repo, FILE, { columns: ['x'], format: { decimal: ',' } });
    expect(got).toMatchObject({ ok: false, code: 'csv-format', file: FILE, line: 1 });
  });
});

describe('missing cells', () => {
  it('NA spellings (any case, padded) are missing; numbers and other words are not', () => {
    for (const s of MISSING_SPELLINGS) {
      expect(isMissingCell(s)).toBe(true);
      expect(isMissingCell(` ${s.toUpperCase()} `)).toBe(true);
    }
    expect(isMissingCell('0')).toBe(false);
    expect(isMissingCell('nope')).toBe(false);
  });

  it('drop: rows with a missing used cell are dropped and counted; unused columns may be empty; lines stay physical', async () => {
    const text = 'x,y,note\n1,2,\n,3,a\n4,NA,b\n5, n/a ,c\n6,7,\n';
    const repo = memoryRepo({ [FILE]: text });
    for (const general of [false, true]) {
      const table = await readTable(repo, FILE, { columns: ['x', 'y'], general, format: { missing: 'drop' } });
      expect(table.rows).toBe(2);
      expect(table.dropped).toBe(3);
      expect(Array.from(table.lines)).toEqual([2, 6]);
      expect(Array.from(table.columns.get('x') as Float64Array)).toEqual([1, 6]);
    }
  });

  it('error (default): a missing cell is a csv-cell error naming file, line and column, and the setting that drops it', async () => {
    for (const cell of ['NA', '', ' #N/A ']) {
      const repo = memoryRepo({ [FILE]: `x,y\n1,2\n3,${cell}\n` });
      for (const general of [false, true]) {
        const got = await outcome(repo, FILE, { columns: ['x', 'y'], general });
        expect(got).toMatchObject({ ok: false, code: 'csv-cell', file: FILE, line: 3, key: 'y' });
        expect(got.ok === false && got.message, JSON.stringify(cell)).toMatch(/Hint: .*set `data\.missing: drop`/);
      }
    }
    // A cell that no setting reads gets no hint.
    const other = await outcome(memoryRepo({ [FILE]: 'x,y\n1,2\n3,abc\n' }), FILE, { columns: ['x', 'y'] });
    expect(other.ok === false && other.message).not.toMatch(/Hint/);
  });

  it('a number with a decimal comma in a semicolon file is refused with the setting that reads it', async () => {
    const repo = memoryRepo({ [FILE]: 'x;y\n1;2\n3;-0,25\n' });
    for (const general of [false, true]) {
      const got = await outcome(repo, FILE, { columns: ['x', 'y'], general });
      expect(got).toMatchObject({ ok: false, code: 'csv-cell', file: FILE, line: 3, key: 'y' });
      expect(got.ok === false && got.message).toMatch(/Hint: if the file writes numbers with a decimal comma .*set `data\.decimal: ","`/);
    }
  });

  it('drop still refuses a cell that is neither a number nor missing', async () => {
    const repo = memoryRepo({ [FILE]: 'x,y\n1,2\n3,abc\n' });
    for (const general of [false, true]) {
      const got = await outcome(repo, FILE, { columns: ['x', 'y'], general, format: { missing: 'drop' } });
      expect(got).toMatchObject({ ok: false, code: 'csv-cell', line: 3, key: 'y' });
    }
  });
});

describe('split column', () => {
  const text = 'set,x,y\nfit,1,2\ntest,3,4\n fit ,5,6\ntest,7,8\n';
  it('keeps one side and skips the other, on both paths, with physical lines', async () => {
    const repo = memoryRepo({ [FILE]: text });
    for (const general of [false, true]) {
      const train = await readTable(repo, FILE, { columns: ['x', 'y'], general, split: { column: 'set', keep: 'fit', other: 'test' } });
      expect(Array.from(train.lines)).toEqual([2, 4]);
      expect(Array.from(train.columns.get('x') as Float64Array)).toEqual([1, 5]);
      const test = await readTable(repo, FILE, { columns: ['x', 'y'], general, split: { column: 'set', keep: 'test', other: 'fit' } });
      expect(Array.from(test.lines)).toEqual([3, 5]);
    }
  });

  it('a third label is a csv-split error naming file, line and column; a missing split column is named', async () => {
    const repo = memoryRepo({ [FILE]: 'set,x\nfit,1\nvalidate,2\n', other: 'x\n1\n' });
    for (const general of [false, true]) {
      const got = await outcome(repo, FILE, { columns: ['x'], general, split: { column: 'set', keep: 'fit', other: 'test' } });
      expect(got).toMatchObject({ ok: false, code: 'csv-split', file: FILE, line: 3, key: 'set' });
      const none = await outcome(repo, 'other', { columns: ['x'], general, split: { column: 'set', keep: 'fit', other: 'test' } });
      expect(none).toMatchObject({ ok: false, code: 'csv-missing-column', file: 'other', line: 1, key: 'set' });
    }
  });
});

/** A random table written in one of the forms, with its expected kept rows. */
const formTable = fc
  .record({
    separator: fc.constantFrom(',', ';', '\t'),
    decimal: fc.constantFrom('.', ','),
    missing: fc.constantFrom('error', 'drop'),
    split: fc.boolean(),
    rows: fc.array(
      fc.record({
        x: fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }).map((v) => (Math.abs(v) < 1e-300 ? 0 : v)),
        y: fc.integer({ min: -1e6, max: 1e6 }),
        gap: fc.constantFrom(null, null, null, null, '', 'NA', 'n/a', 'NaN'),
        side: fc.boolean(),
        pad: fc.constantFrom('', ' ', '  '),
      }),
      { maxLength: 40 },
    ),
  })
  .map((t) => ({ ...t, separator: t.decimal === ',' && t.separator === ',' ? ';' : t.separator }));

describe('every form on both paths (property)', () => {
  it('the fast and the general path give the same values, lines, drop counts and errors', async () => {
    await fc.assert(
      fc.asyncProperty(formTable, fc.nat(64), async (t, cut) => {
        const sep = t.separator;
        const num = (v: number): string => (t.decimal === ',' ? String(v).replace('.', ',') : String(v));
        const header = ['x', 'y', 'set'].join(sep);
        const lines = t.rows.map((r) => [r.pad + num(r.x) + r.pad, r.gap ?? num(r.y), r.side ? 'fit' : 'test'].join(sep));
        const text = [header, ...lines].join('\n') + '\n';
        const repo = memoryRepo({ [FILE]: text }, { cuts: cut > 0 && cut < text.length ? [cut] : [] });
        const options = {
          columns: ['x', 'y'],
          format: { separator: t.separator as ',' | ';' | '\t', decimal: t.decimal as '.' | ',', missing: t.missing as 'error' | 'drop' },
          ...(t.split ? { split: { column: 'set', keep: 'fit', other: 'test' } } : {}),
        };
        const fast = await outcome(repo, FILE, options);
        const general = await outcome(repo, FILE, { ...options, general: true });
        expect(fast).toEqual(general);
        const kept = t.rows.filter((r) => (!t.split || r.side) && (r.gap === null || t.missing === 'error'));
        if (t.missing === 'drop' || t.rows.every((r) => r.gap === null || (t.split && !r.side))) {
          expect(fast).toMatchObject({ ok: true, rows: kept.length });
          if (fast.ok) expect(fast.columns.x).toEqual(kept.map((r) => bits(Number(String(r.x)))));
          const table = await readTable(repo, FILE, options);
          const dropped = t.rows.filter((r) => (!t.split || r.side) && r.gap !== null).length;
          expect(table.dropped).toBe(t.missing === 'drop' ? dropped : 0);
        } else {
          expect(fast).toMatchObject({ ok: false, code: 'csv-cell', key: 'y' });
        }
      }),
      { numRuns: RUNS },
    );
  }, 60_000);
});
