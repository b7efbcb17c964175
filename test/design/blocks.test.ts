// Design blocks (design/blocks.ts): the block buffer is lent by core/scratch.ts without being
// cleared, so every block must equal the design filled into a new array, whatever the lent buffer
// held before (here: NaN everywhere, left by an earlier borrower).
import { describe, expect, it } from 'vitest';
import type { TermSpec } from '../../src/config/types.js';
import { borrowDoubles, returnDoubles, SCRATCH_KEPT } from '../../src/core/scratch.js';
import { blockRows, forEachBlock, predictRows } from '../../src/design/blocks.js';
import { createDesign } from '../../src/design/design-matrix.js';
import { createTerm } from '../../src/design/terms/index.js';

describe('design blocks from a lent buffer', () => {
  it('equal the design filled into new arrays, block by block, after the pool held NaN', () => {
    const n = 20_000;
    const x = Float64Array.from({ length: n }, (_, i) => ((i * 7919) % 1000) / 100);
    const columns = new Map([['x', x]]);
    const specs: TermSpec[] = [
      { kind: 'polynomial', of: 'x', degree: 3, shift: null, scale: null, line: 1 },
      { kind: 'spline', of: 'x', knots: { kind: 'count', count: 4 }, degree: 3, natural: true, line: 2 },
      { kind: 'rbf', of: 'x', centers: { kind: 'list', values: [2, 5, 8] }, width: 1.5, line: 3 },
    ];
    const design = createDesign(
      specs.map((spec) => createTerm(spec, columns, 'm.yml')),
      true,
    );
    const data = { inputs: [x], rows: n };
    expect(n).toBeGreaterThan(2 * blockRows(design.p));
    // Every buffer the pool keeps, large enough for a block, left full of NaN.
    const poisoned = Array.from({ length: SCRATCH_KEPT }, () => borrowDoubles(blockRows(design.p) * design.p));
    for (const a of poisoned) new Float64Array(a.buffer).fill(Number.NaN);
    for (const a of poisoned) returnDoubles(a);
    let blocks = 0;
    forEachBlock(design, data, (X, start, m) => {
      blocks++;
      const fresh = design.fill([x], start, m);
      expect(Array.from(X.subarray(0, m * design.p))).toEqual(Array.from(fresh));
    });
    expect(blocks).toBeGreaterThan(2);
    const w = Array.from({ length: design.p }, (_, j) => (j % 3) - 0.5);
    const expected = new Float64Array(n);
    for (let start = 0; start < n; start += 1000) {
      const m = Math.min(1000, n - start);
      const X = design.fill([x], start, m);
      for (let i = 0; i < m; i++) for (let j = 0; j < design.p; j++) expected[start + i] += X[j * m + i] * w[j];
    }
    const got = predictRows(design, data, w);
    for (let i = 0; i < n; i++) expect(Math.abs(got[i] - expected[i])).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(expected[i])));
  });
});
