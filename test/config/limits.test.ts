import { describe, expect, it } from 'vitest';
import { LIMIT_KEYS, limitKeyNames, mergeLimits, toLimit } from '../../src/config/limits.js';
import { defaultSettings } from '../../src/config/settings-file.js';

describe('toLimit', () => {
  it('normalises the three forms', () => {
    expect(toLimit(2, 'settings', null)).toEqual({ warn: null, fail: 2, off: false, source: 'settings', line: null });
    expect(toLimit({ warn: 1 }, 'descriptor', 4)).toEqual({ warn: 1, fail: null, off: false, source: 'descriptor', line: 4 });
    expect(toLimit({ warn: 1, fail: 3 }, 'default', null)).toEqual({ warn: 1, fail: 3, off: false, source: 'default', line: null });
    expect(toLimit('off', 'descriptor', 9)).toEqual({ warn: null, fail: null, off: true, source: 'descriptor', line: 9 });
    expect(toLimit(0, 'default', null).fail, 'zero is a valid threshold (fail when any)').toBe(0);
  });

  it('throws on specs the loaders should have refused', () => {
    const bad: unknown[] = [-1, Number.NaN, Infinity, {}, { warn: 2, fail: 1 }, { fail: -0.5 }, 'on', null];
    for (const spec of bad) expect(() => toLimit(spec as never, 'settings', null), `spec ${String(JSON.stringify(spec))}`).toThrow();
  });
});

describe('LIMIT_KEYS', () => {
  it('has unique keys, a description each, and valid defaults', () => {
    const names = limitKeyNames();
    expect(new Set(names).size, `keys ${names.join(', ')}`).toBe(names.length);
    for (const { key, defaultSpec, description } of LIMIT_KEYS) {
      expect(description.length, `${key} description`).toBeGreaterThan(10);
      expect(() => toLimit(defaultSpec, 'default', null), `${key} default`).not.toThrow();
    }
  });
});

describe('mergeLimits', () => {
  it('defaults < settings < descriptor, key by key, unknown extra keys kept', () => {
    const settings = { ...defaultSettings(), limits: { gap_ratio: { spec: 2, line: 3 }, swing: { spec: 'off' as const, line: 4 } } };
    const merged = mergeLimits(settings, { gap_ratio: { spec: { warn: 1.1 }, line: 12 }, future_key: { spec: 3, line: 13 } });
    expect(merged.gap_ratio).toEqual({ warn: 1.1, fail: null, off: false, source: 'descriptor', line: 12 });
    expect(merged.swing).toEqual({ warn: null, fail: null, off: true, source: 'settings', line: null });
    expect(merged.coefficient).toEqual({ warn: null, fail: 25, off: false, source: 'default', line: null });
    expect(merged.future_key).toEqual({ warn: null, fail: 3, off: false, source: 'descriptor', line: 13 });
    expect(Object.keys(merged).length).toBe(LIMIT_KEYS.length + 1);
  });
});
