import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { glob } from 'tinyglobby';
import { afterAll, describe, expect, it } from 'vitest';
import { compilePatterns, expandBraces, globMatcher, MAX_PATTERN_LENGTH, patternProblem } from '../../src/repo/glob-pattern.js';

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

describe('the matcher cannot backtrack catastrophically', () => {
  // A regular expression with 25 `[^/]*` runs against a name that almost matches takes time
  // growing like n^25; the matcher here returns only to the latest star (tokens x characters).
  it('answers a pattern of 25 stars against a 200-character name in milliseconds', () => {
    const pattern = `${'*a'.repeat(25)}b`;
    const name = 'a'.repeat(200);
    const start = performance.now();
    const match = globMatcher(pattern);
    const answers = [match(name), match(`${name}b`), match(`x/${name}`)];
    const ms = performance.now() - start;
    expect(answers).toEqual([false, true, false]);
    // Generous bound for a busy machine: measured well under 5 ms here.
    expect(ms, `took ${ms.toFixed(1)} ms`).toBeLessThan(250);
  });

  it('answers 25 `**` segments against a path of 200 segments in milliseconds', () => {
    const pattern = `${'**/a/'.repeat(25)}x.yml`;
    const path = `${'a/'.repeat(200)}y.yml`;
    const start = performance.now();
    const answers = [globMatcher(pattern)(path), globMatcher(pattern)(`${'a/'.repeat(200)}x.yml`)];
    const ms = performance.now() - start;
    expect(answers).toEqual([false, true]);
    expect(ms, `took ${ms.toFixed(1)} ms`).toBeLessThan(250);
  });
});

describe('patternProblem', () => {
  it.each([
    ['..'],
    ['../x/*.yml'],
    ['models/../../x.yml'],
    ['models/..'],
    ['{..,models}/*.yml'],
    ['models/{a,{b,..}}/*.yml'],
    ['@(..)/x.yml'],
    ['!(..)/x.yml'],
    ['+(a|..)/x.yml'],
    ['models\\..\\x.yml'],
    ['/etc/*.yml'],
    ['C:/x/*.yml'],
    ['{/etc,models}/*.yml'],
    ['models/\u0000.yml'],
  ])('refuses %j as leaving the repository', (pattern) => {
    expect(patternProblem(pattern)?.kind).toBe('outside');
  });

  it('accepts dots that are not a `..` segment', () => {
    for (const pattern of ['models/..x/*.yml', 'models/.../*.yml', '**/*..yml', './models/*.yml', 'a.b/{c,d}.yml'])
      expect(patternProblem(pattern), pattern).toBeNull();
  });

  it('refuses patterns over the length and alternatives caps before expanding them', () => {
    expect(patternProblem('a'.repeat(MAX_PATTERN_LENGTH + 1))?.kind).toBe('complex');
    expect(patternProblem('a'.repeat(MAX_PATTERN_LENGTH))).toBeNull();
    // 2^40 alternatives: refused without making them.
    const start = performance.now();
    expect(patternProblem('{a,b}'.repeat(40))?.kind).toBe('complex');
    expect(performance.now() - start).toBeLessThan(250);
    expect(patternProblem('{a,b}'.repeat(8))).toBeNull(); // 256
    expect(patternProblem('{a,b}'.repeat(9))?.kind).toBe('complex'); // 512
    expect(expandBraces('{a,b}'.repeat(9))).toBeNull();
  });
});

describe('node_modules and .git', () => {
  it('are matched only by a pattern segment that names them literally', () => {
    expect(globMatcher('**/*.yml')('node_modules/p/a.yml')).toBe(false);
    expect(globMatcher('*/p/a.yml')('node_modules/p/a.yml')).toBe(false);
    expect(globMatcher('node_*/p/a.yml')('node_modules/p/a.yml')).toBe(false);
    expect(globMatcher('node_modules/**/*.yml')('node_modules/p/a.yml')).toBe(true);
    expect(globMatcher('**/node_modules/p/*.yml')('x/node_modules/p/a.yml')).toBe(true);
    expect(globMatcher('**/*.yml')('.git/a.yml')).toBe(false);
    expect(globMatcher('.git/*.yml')('.git/a.yml')).toBe(true);
  });

  it('tell a walk which folders to enter', () => {
    const set = compilePatterns(['models/**/*.model.yml']);
    expect(
      ['models', 'models/a', 'other', 'node_modules', 'models/node_modules', 'models/.hidden'].map((p) => set.searchesBelow(p)),
    ).toEqual([true, true, false, false, false, false]);
  });
});
