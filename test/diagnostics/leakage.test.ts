import { describe, expect, it } from 'vitest';
import { findLeakage, LeakageScan } from '../../src/diagnostics/leakage.js';

function data(rows: number[][], firstLine = 2): { inputs: Float64Array[]; y: Float64Array; rows: number; lines: Int32Array } {
  const q = rows.length > 0 ? rows[0].length - 1 : 1;
  return {
    inputs: Array.from({ length: q }, (_, c) => Float64Array.from(rows, (r) => r[c])),
    y: Float64Array.from(rows, (r) => r[q]),
    rows: rows.length,
    lines: Int32Array.from(rows, (_, i) => firstLine + i),
  };
}

describe('leakage: hold-out rows equal to a training row', () => {
  it('counts input matches and full matches exactly on a constructed pair of files', () => {
    const train = data([
      [1, 2, 10],
      [3, 4, 20],
      [5, 6, 30],
      [3, 4, 21], // same inputs as line 3, another target
    ]);
    const holdout = data([
      [1, 2, 10], // full match of train line 2
      [3, 4, 21], // full match of train line 5 (input match of line 3 first)
      [5, 6, 99], // inputs only
      [5, 7, 30], // no match
      [0.1 + 0.2, 4, 20], // no match: 0.30000000000000004 is not 3
    ]);
    const leak = findLeakage(train, holdout);
    expect(leak.inputMatches).toBe(3);
    expect(leak.fullMatches).toBe(2);
    expect(leak.holdoutLines).toEqual([2, 3, 4]);
    expect(leak.trainLines).toEqual([2, 3, 4]);
  });

  it('treats -0 and 0 as equal and compares values, not text', () => {
    const leak = findLeakage(data([[0, 1, 5]]), data([[-0, 1, 5]]));
    expect(leak.inputMatches).toBe(1);
    expect(leak.fullMatches).toBe(1);
  });

  it('reports at most 5 lines of each file, counts every match', () => {
    const rows = Array.from({ length: 12 }, (_, i) => [i, i * 2]);
    const leak = findLeakage(data(rows), data(rows, 100));
    expect(leak.inputMatches).toBe(12);
    expect(leak.fullMatches).toBe(12);
    expect(leak.holdoutLines).toEqual([100, 101, 102, 103, 104]);
    expect(leak.trainLines).toEqual([2, 3, 4, 5, 6]);
  });

  it('finds nothing in disjoint files and handles empty files', () => {
    expect(findLeakage(data([[1, 1]]), data([[2, 1]])).inputMatches).toBe(0);
    expect(findLeakage(data([]), data([[2, 1]])).inputMatches).toBe(0);
    expect(findLeakage(data([[1, 1]]), data([])).holdoutRows).toBe(0);
  });

  it('stays linear when both files repeat one row: 200,000 x 200,000 equal rows are counted in linear time', () => {
    // Before: each training row walked a chain of every equal hold-out row, 4e10 comparisons.
    const n = 200_000;
    const same = (rows: number, y: (i: number) => number): ReturnType<typeof data> => ({
      inputs: [new Float64Array(rows).fill(1), new Float64Array(rows).fill(2)],
      y: Float64Array.from({ length: rows }, (_, i) => y(i)),
      rows,
      lines: Int32Array.from({ length: rows }, (_, i) => i + 2),
    });
    const started = performance.now();
    // Hold-out targets 0..n-1; training targets only even numbers: every row matches on its
    // inputs, the even-target half on its target too.
    const leak = findLeakage(
      same(n, (i) => 2 * i),
      same(n, (i) => i),
    );
    const ms = performance.now() - started;
    expect(leak.inputMatches).toBe(n);
    expect(leak.fullMatches).toBe(n / 2);
    expect(leak.holdoutLines).toEqual([2, 3, 4, 5, 6]);
    expect(leak.trainLines).toEqual([2, 2, 2, 2, 2]);
    expect(ms, `${ms.toFixed(0)} ms`).toBeLessThan(3000);
  });

  it('matches the count of a naive all-pairs comparison on 2,000 random rows with planted copies', () => {
    let s = 7;
    const next = (): number => {
      s = (s * 16807) % 2147483647;
      return Math.floor((s / 2147483647) * 20); // few distinct values: many hash chains and near misses
    };
    const train = Array.from({ length: 2000 }, () => [next(), next(), next()]);
    const holdout = Array.from({ length: 500 }, () => [next(), next(), next()]);
    let inputs = 0;
    let full = 0;
    for (const h of holdout) {
      const same = train.filter((t) => t[0] === h[0] && t[1] === h[1]);
      if (same.length > 0) inputs++;
      if (same.some((t) => t[2] === h[2])) full++;
    }
    const leak = findLeakage(data(train), data(holdout));
    expect([leak.inputMatches, leak.fullMatches]).toEqual([inputs, full]);
  });

  it('finds every planted copy among 60,000 hold-out and 300,000 training rows streamed in chunks (the hash filter drops no match)', () => {
    let s = 11;
    const next = (): number => {
      s = (s * 16807) % 2147483647;
      return s / 2147483647;
    };
    const holdout = Array.from({ length: 60000 }, () => [next(), next(), next() < 0.5 ? 1 : 0]);
    const train = Array.from({ length: 300000 }, () => [next(), next(), next() < 0.5 ? 1 : 0]);
    // Every 37th hold-out row planted in the training rows (every 3rd of them with the other label).
    const planted = new Set<number>();
    for (let h = 0; h < holdout.length; h += 37) {
      const at = Math.floor(next() * train.length);
      train[at] = [holdout[h][0], holdout[h][1], h % 3 === 0 ? 1 - holdout[h][2] : holdout[h][2]];
      planted.add(h);
    }
    const trainInputs = new Set(train.map((t) => `${t[0]},${t[1]}`));
    const trainRows = new Set(train.map((t) => `${t[0]},${t[1]},${t[2]}`));
    let inputs = 0;
    let full = 0;
    for (const h of holdout) {
      if (trainInputs.has(`${h[0]},${h[1]}`)) inputs++;
      if (trainRows.has(`${h[0]},${h[1]},${h[2]}`)) full++;
    }
    // A later copy may overwrite an earlier one: nearly every planted row is there.
    expect(inputs).toBeGreaterThan(0.99 * planted.size);
    const scan = new LeakageScan(data(holdout));
    for (let start = 0; start < train.length; start += 70000) scan.add(data(train.slice(start, start + 70000), 2 + start));
    const leak = scan.finish();
    expect([leak.inputMatches, leak.fullMatches]).toEqual([inputs, full]);
    expect(leak.fullMatches).toBeLessThan(leak.inputMatches);
  });

  it('gives its lent tables back once: finish() again gives the same figures, rows after it are refused, and scans in turn agree', () => {
    const train = data([
      [1, 2, 10],
      [3, 4, 20],
    ]);
    const holdout = data([
      [3, 4, 20],
      [1, 2, 11],
      [7, 8, 9],
    ]);
    const scan = new LeakageScan(holdout);
    scan.add(train);
    const first = scan.finish();
    // Another scan borrows the same buffers from the pool and overwrites them.
    const other = findLeakage(data([[7, 8, 9]]), data([[7, 8, 9]]));
    expect(other.fullMatches).toBe(1);
    expect(scan.finish()).toBe(first);
    expect(first).toEqual({ inputMatches: 2, fullMatches: 1, holdoutLines: [2, 3], trainLines: [3, 2], holdoutRows: 3, columns: 2 });
    expect(() => scan.add(train)).toThrow(/after finish/);
    expect(findLeakage(train, holdout)).toEqual(first);
  });
});
