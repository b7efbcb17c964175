import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonPieces } from '../../src/core/json-pieces.js';

const text = (value: unknown, depth?: number): string => [...jsonPieces(value, depth === undefined ? {} : { depth })].join('');

describe('jsonPieces', () => {
  it('joins to exactly JSON.stringify(value, null, 2), whatever the value and the depth walked', () => {
    const awkward = {
      a: [],
      b: {},
      c: [1, 'two\nlines', null, { d: [[], [{}]], e: undefined, f: () => 1 }],
      g: Number.NaN,
      h: -0,
      i: [undefined, () => 2, Infinity],
      j: { toJSON: () => ({ k: 'from toJSON' }) },
      'l"m': '\u2028 "quoted" \\ ',
      '1': 'integer key first',
    };
    for (const depth of [0, 1, 2, 3, 4, 10]) expect(text(awkward, depth), `depth ${depth}`).toBe(JSON.stringify(awkward, null, 2));
    expect(text('plain')).toBe('"plain"');
    expect(text(undefined)).toBe('');
  });

  it('agrees with JSON.stringify on random JSON values', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.integer({ min: 0, max: 6 }), (value, depth) => text(value, depth) === JSON.stringify(value, null, 2)),
      { numRuns: 300 },
    );
  });

  it('gives each element of a walked array its own pieces, so no piece holds two branches', () => {
    const value = { models: Array.from({ length: 1000 }, (_, i) => ({ name: `m${i}`, data: Array.from({ length: 50 }, (_, j) => j) })) };
    const pieces = [...jsonPieces(value, { depth: 2 })];
    expect(pieces.length).toBeGreaterThan(2000);
    expect(Math.max(...pieces.map((p) => p.length))).toBeLessThan(1000);
  });
});
