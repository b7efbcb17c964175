import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../src/core/format.js';

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
