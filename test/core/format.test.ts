import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../src/core/format.js';
import fc from 'fast-check';

describe('formatNumber', () => {
  it.each([
    [0, '0'],
    [1.5, '1.5'],
    [0.1, '0.1'],
    [1.23456, '1.235'],
    [4931.2, '4931'],
    [247297.4, '247297'],
    [1e8, '1e8'],
    [8.27e13, '8.27e13'],
    [0.0001234, '1.234e-4'],
    [-2.5, '-2.5'],
    [Infinity, '∞'],
    [-Infinity, '-∞'],
    [Number.NaN, 'NaN'],
    [null, '–'],
  ])('formats %s as %s', (x, want) => {
    expect(formatNumber(x)).toBe(want);
  });
});

/** formatNumber as it was written with patterns (the reference the faster form must match character for character). */
function formatWithPatterns(x: number, digits: number): string {
  if (Number.isNaN(x)) return 'NaN';
  if (x === Infinity) return '∞';
  if (x === -Infinity) return '-∞';
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a < 1e-3 || a >= 1e6)
    return x
      .toExponential(digits - 1)
      .replace(/\.?0+e/, 'e')
      .replace('e+', 'e');
  if (a >= 10 ** digits) return String(Math.round(x));
  const text = x.toPrecision(digits);
  return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
}

describe('formatNumber against the pattern-based form', () => {
  it('writes the same text for round numbers, powers of ten and their neighbours, at 1 to 8 digits', () => {
    const values: number[] = [];
    for (let e = -12; e <= 15; e++) {
      for (const m of [1, 1.2, 1.25, 2, 9.5, 9.9995, 9.99995, 10, 100.5, Math.PI, 5e-5, 1 - 1e-12, 1 + 1e-12]) {
        values.push(m * 10 ** e, -m * 10 ** e);
      }
    }
    for (const digits of [1, 2, 3, 4, 5, 6, 8])
      for (const x of values) expect(formatNumber(x, digits), `${x} at ${digits} digits`).toBe(formatWithPatterns(x, digits));
  });

  it('writes the same text for any double (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: false }), fc.integer({ min: 1, max: 10 }), (x, digits) => {
        expect(formatNumber(x, digits)).toBe(formatWithPatterns(x, digits));
      }),
      { numRuns: 5000 },
    );
  });
});
