import { describe, expect, it, vi } from 'vitest';
import { skipNote, skipOrThrow, unmetNeeds } from './require-tool.js';

describe('requireTool: a missing tool skips locally and fails under CI=true', () => {
  it('returns null when nothing is missing, in CI or not', () => {
    expect(skipOrThrow([], { CI: 'true' })).toBeNull();
    expect(skipOrThrow([], {})).toBeNull();
    expect(skipNote(null)).toBe('');
  });

  it('returns the reason and warns once when a tool is missing locally', () => {
    const warn = vi.spyOn(console, 'warn').mockImplementation(() => {});
    try {
      expect(skipOrThrow(['/usr/bin/chromium is missing', 'no numpy'], { CI: 'false' })).toBe('/usr/bin/chromium is missing; no numpy');
      expect(warn).toHaveBeenCalledTimes(1);
      expect(String(warn.mock.calls[0][0])).toContain('/usr/bin/chromium is missing; no numpy');
    } finally {
      warn.mockRestore();
    }
    expect(skipNote('no numpy')).toBe(' (skipped: no numpy)');
  });

  it('throws, naming what is missing, when CI=true', () => {
    expect(() => skipOrThrow(['/usr/bin/chromium is missing'], { CI: 'true' })).toThrow(
      /^\/usr\/bin\/chromium is missing\. Under CI=true a test may not skip/,
    );
  });

  it('asks for nothing when no need is given', () => {
    expect(unmetNeeds([])).toEqual([]);
  });
});
