import { describe, expect, it } from 'vitest';
import { fromJsonNumber, jsonNumber, jsonRecord, jsonSafe } from '../../src/core/json.js';

describe('jsonSafe', () => {
  it('writes non-finite numbers as strings at any depth, in arrays, typed arrays and records', () => {
    const value = {
      a: 1.5,
      b: Number.NaN,
      c: [Infinity, -Infinity, 2, null, 'x', true],
      d: new Float64Array([0.25, Number.NaN, -Infinity]),
      e: new Int32Array([3, -4]),
      f: { g: [new Float64Array([Infinity])], h: undefined },
    };
    const safe = jsonSafe(value);
    expect(JSON.parse(JSON.stringify(safe))).toEqual({
      a: 1.5,
      b: 'NaN',
      c: ['Infinity', '-Infinity', 2, null, 'x', true],
      d: [0.25, 'NaN', '-Infinity'],
      e: [3, -4],
      f: { g: [['Infinity']] },
    });
    // Undefined fields are dropped (not written as null); an undefined array element is null.
    expect(Object.keys((safe as Record<string, Record<string, unknown>>).f)).toEqual(['g']);
    expect(jsonSafe([undefined, 1])).toEqual([null, 1]);
    expect(jsonSafe(undefined)).toBeNull();
    expect(jsonSafe(() => 1)).toBeNull();
  });

  it('keeps user-named keys such as __proto__ as plain keys, in their order', () => {
    const record = JSON.parse('{"z": 1, "__proto__": {"polluted": 1}, "a": [-0]}') as Record<string, unknown>;
    const safe = jsonRecord(record);
    expect(Object.getPrototypeOf(safe)).toBeNull();
    expect(JSON.stringify(safe)).toBe('{"z":1,"__proto__":{"polluted":1},"a":[0]}');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it('gives the same text as converting each element one at a time', () => {
    const xs = Array.from({ length: 257 }, (_, i) => (i % 7 === 0 ? Number.NaN : Math.sin(i) * 10 ** ((i % 9) - 4)));
    const expected = `[${xs.map((x) => JSON.stringify(jsonNumber(x))).join(',')}]`;
    expect(JSON.stringify(jsonSafe(xs))).toBe(expected);
    expect(JSON.stringify(jsonSafe(Float64Array.from(xs)))).toBe(expected);
    for (const x of xs) expect(Object.is(fromJsonNumber(jsonNumber(x)), x) || Number.isNaN(x)).toBe(true);
  });
});
