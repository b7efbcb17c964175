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

  it('keeps user-named keys such as __proto__ as own keys, in their order, and sets no prototype', () => {
    const record = JSON.parse('{"z": 1, "__proto__": {"polluted": 1}, "constructor": 2, "1": 3, "a": [-0]}') as Record<string, unknown>;
    const safe = jsonRecord(record);
    expect(Object.getPrototypeOf(safe)).toBe(Object.prototype);
    expect(Object.keys(safe)).toEqual(['1', 'z', '__proto__', 'constructor', 'a']);
    expect(Object.getOwnPropertyDescriptor(safe, '__proto__')?.value).toEqual({ polluted: 1 });
    expect((safe as Record<string, unknown>).polluted).toBeUndefined();
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    // The same text as JSON.stringify of the record as JSON.parse gave it.
    expect(JSON.stringify(safe)).toBe('{"1":3,"z":1,"__proto__":{"polluted":1},"constructor":2,"a":[0]}');
    expect(JSON.stringify(safe, null, 2)).toBe(JSON.stringify(record, null, 2).replace('-0', '0'));
  });

  it('gives the same text as converting each element one at a time', () => {
    const xs = Array.from({ length: 257 }, (_, i) => (i % 7 === 0 ? Number.NaN : Math.sin(i) * 10 ** ((i % 9) - 4)));
    const expected = `[${xs.map((x) => JSON.stringify(jsonNumber(x))).join(',')}]`;
    expect(JSON.stringify(jsonSafe(xs))).toBe(expected);
    expect(JSON.stringify(jsonSafe(Float64Array.from(xs)))).toBe(expected);
    for (const x of xs) expect(Object.is(fromJsonNumber(jsonNumber(x)), x) || Number.isNaN(x)).toBe(true);
  });
});
