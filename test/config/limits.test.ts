import { describe, expect, it } from 'vitest';
import { LIMIT_KEYS, limitKeyNames, limitOrderProblem, mergeLimits, toLimit } from '../../src/config/limits.js';
import { defaultSettings } from '../../src/config/settings-file.js';
import { judge } from '../../src/checks/types.js';

const NONE = { warn: null, fail: null, warnBelow: null, failBelow: null };

describe('toLimit', () => {
  it('normalises the forms of a ceiling', () => {
    expect(toLimit(2, 'above', 'settings', null)).toEqual({ ...NONE, fail: 2, off: false, source: 'settings', line: null });
    expect(toLimit({ warn: 1 }, 'above', 'descriptor', 4)).toEqual({ ...NONE, warn: 1, off: false, source: 'descriptor', line: 4 });
    expect(toLimit({ warn: 1, fail: 3 }, 'above', 'default', null)).toEqual({
      ...NONE,
      warn: 1,
      fail: 3,
      off: false,
      source: 'default',
      line: null,
    });
    expect(toLimit('off', 'above', 'descriptor', 9)).toEqual({ ...NONE, off: true, source: 'descriptor', line: 9 });
    expect(toLimit(0, 'above', 'default', null).fail, 'zero is a valid threshold (fail when any)').toBe(0);
  });

  it('reads a number and { warn, fail } of a floor as floors', () => {
    expect(toLimit(10, 'below', 'default', null)).toEqual({ ...NONE, failBelow: 10, off: false, source: 'default', line: null });
    expect(toLimit({ warn: 0.8, fail: 0.6 }, 'below', 'settings', null)).toEqual({
      ...NONE,
      warnBelow: 0.8,
      failBelow: 0.6,
      off: false,
      source: 'settings',
      line: null,
    });
  });

  it('reads explicit bounds whatever the direction, two-sided included', () => {
    const twoSided = toLimit({ warn_below: 0.5, warn_above: 2 }, 'above', 'descriptor', 7);
    expect(twoSided).toEqual({ warn: 2, fail: null, warnBelow: 0.5, failBelow: null, off: false, source: 'descriptor', line: 7 });
    expect(toLimit({ fail_below: 0.9 }, 'above', 'settings', null)).toEqual({
      ...NONE,
      failBelow: 0.9,
      off: false,
      source: 'settings',
      line: null,
    });
    expect(toLimit({ fail_above: -0.5 }, 'below', 'settings', null).fail, 'explicit bounds may be negative').toBe(-0.5);
  });

  it('throws on specs the loaders should have refused', () => {
    const bad: unknown[] = [
      Number.NaN,
      Infinity,
      {},
      { warn: 2, fail: 1 },
      'on',
      null,
      { fail_below: 3, fail_above: 2 },
      { warn_below: 1, fail_below: 2 },
    ];
    for (const spec of bad)
      expect(() => toLimit(spec as never, 'above', 'settings', null), `spec ${String(JSON.stringify(spec))}`).toThrow();
    expect(() => toLimit({ warn: 0.6, fail: 0.8 }, 'below', 'settings', null), 'a floor that fails above where it warns').toThrow(
      /warn 0.6 is below fail 0.8/,
    );
  });
});

describe('limitOrderProblem', () => {
  it('names the key to point at', () => {
    expect(limitOrderProblem({ warn: 2, fail: 1 }, 'above')?.[0]).toBe('warn');
    expect(limitOrderProblem({ warn: 2, fail: 1 }, 'below')).toBeNull();
    expect(limitOrderProblem({ warn_above: 3, fail_above: 2 }, 'below')?.[0]).toBe('warn_above');
    expect(limitOrderProblem({ warn_below: 0.5, warn_above: 2 }, 'above')).toBeNull();
    // A floor above a ceiling names the floor's key as written (the annotation points at its line).
    expect(limitOrderProblem({ warn_below: 3, fail_above: 1 }, 'above')?.[0]).toBe('warn_below');
    expect(limitOrderProblem({ fail_below: 0.2, warn_above: 0.1 }, 'below')?.[0]).toBe('fail_below');
    expect(limitOrderProblem({ warn_below: 0.3, fail_below: 0.2, warn_above: 0.25 }, 'below')?.[0]).toBe('warn_below');
  });
});

describe('judge', () => {
  it('fails beyond either fail bound, warns beyond either warn bound, skips NaN and off', () => {
    const twoSided = toLimit({ warn_below: 0.5, fail_below: 0.2, warn_above: 2, fail_above: 4 }, 'above', 'settings', null);
    expect([0.1, 0.3, 1, 3, 5].map((v) => judge(v, twoSided))).toEqual(['fail', 'warn', 'pass', 'warn', 'fail']);
    const floor = toLimit({ warn: 0.8, fail: 0.6 }, 'below', 'settings', null);
    expect(
      [0.5, 0.6, 0.7, 0.8, 0.9].map((v) => judge(v, floor)),
      'strictly below a bound',
    ).toEqual(['fail', 'warn', 'warn', 'pass', 'pass']);
    expect(judge(Number.NaN, floor)).toBe('skipped');
    expect(judge(1, toLimit('off', 'below', 'settings', null))).toBe('skipped');
  });
});

describe('LIMIT_KEYS', () => {
  it('has unique keys, a description each, and valid defaults', () => {
    const names = limitKeyNames();
    expect(new Set(names).size, `keys ${names.join(', ')}`).toBe(names.length);
    for (const { key, defaultSpec, description, direction } of LIMIT_KEYS) {
      expect(description.length, `${key} description`).toBeGreaterThan(10);
      expect(() => toLimit(defaultSpec, direction, 'default', null), `${key} default`).not.toThrow();
    }
  });
});

describe('mergeLimits', () => {
  it('defaults < settings < descriptor, key by key, unknown extra keys kept', () => {
    const settings = { ...defaultSettings(), limits: { gap_ratio: { spec: 2, line: 3 }, swing: { spec: 'off' as const, line: 4 } } };
    const merged = mergeLimits(settings, { gap_ratio: { spec: { warn: 1.1 }, line: 12 }, future_key: { spec: 3, line: 13 } });
    expect(merged.gap_ratio).toEqual({ ...NONE, warn: 1.1, off: false, source: 'descriptor', line: 12 });
    expect(merged.swing).toEqual({ ...NONE, off: true, source: 'settings', line: null });
    expect(merged.coefficient).toEqual({ ...NONE, fail: 25, off: false, source: 'default', line: null });
    expect(merged.future_key).toEqual({ ...NONE, fail: 3, off: false, source: 'descriptor', line: 13 });
    expect(Object.keys(merged).length).toBe(LIMIT_KEYS.length + 1);
  });
});
