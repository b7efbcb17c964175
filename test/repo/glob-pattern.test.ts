import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { glob } from 'tinyglobby';
import { afterAll, describe, expect, it } from 'vitest';
import { expandBraces, globMatcher } from '../../src/repo/glob-pattern.js';

const PATHS = [
  'a.model.yml',
  'models/a.model.yml',
  'models/kiln/kiln.model.yml',
  'models/kiln/data/train.csv',
  'models/.hidden/x.model.yml',
  'models/.dot.model.yml',
  'other/b.model.yaml',
  'other/c1.yml',
  'other/c2.yml',
  'other/cx.yml',
  'deep/a/b/c/d.model.yml',
];

const PATTERNS = [
  '**/*.model.yml',
  'models/**/*.model.yml',
  'models/*.model.yml',
  '*.model.yml',
  'other/*.{yml,yaml}',
  'other/c?.yml',
  'other/c[0-9].yml',
  'other/c[!0-9].yml',
  'deep/**',
  'deep/**/d.model.yml',
  'models/.hidden/*.model.yml',
  '**/*.model.{yml,yaml}',
  'models/kiln/kiln.model.yml',
];

const dir = mkdtempSync(join(tmpdir(), 'fitgate-glob-'));
for (const p of PATHS) {
  mkdirSync(dirname(join(dir, p)), { recursive: true });
  writeFileSync(join(dir, p), '');
}
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('globMatcher agrees with tinyglobby (dot: false)', () => {
  for (const pattern of PATTERNS) {
    it(pattern, async () => {
      const expected = (await glob([pattern], { cwd: dir, onlyFiles: true, dot: false, followSymbolicLinks: false })).sort();
      const match = globMatcher(pattern);
      const actual = PATHS.filter((p) => match(p)).sort();
      expect(actual, `pattern ${pattern}`).toEqual(expected);
    });
  }
});

describe('expandBraces', () => {
  it('expands nested alternatives and leaves unclosed braces alone', () => {
    expect(expandBraces('a/{b,c{d,e}}/f')).toEqual(['a/b/f', 'a/cd/f', 'a/ce/f']);
    expect(expandBraces('a{b')).toEqual(['a{b']);
    expect(expandBraces('{x}')).toEqual(['{x}']);
  });
});
