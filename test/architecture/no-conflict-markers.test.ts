/**
 * No file tracked by git holds a line that git writes for a merge conflict (`<<<<<<< `,
 * `=======`, `>>>>>>> ` at the start of a line): such a line once reached the README unnoticed.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const MARKER = /^(?:<{7} |={7}$|>{7} )/m;

/** The tracked text files outside dist/ (generated) and binary data. */
function trackedFiles(): string[] {
  const out = execFileSync('git', ['ls-files', '-z'], { cwd: root, encoding: 'utf8' });
  return out.split('\0').filter((f) => f !== '' && !f.startsWith('dist/') && /\.(?:ts|mts|mjs|js|json|md|ya?ml|wat|sh)$|^\.ci\//.test(f));
}

describe('merge conflict markers', () => {
  it('the pattern finds a marker (self-test)', () => {
    expect(MARKER.test('text\n=======\nmore')).toBe(true);
    expect(MARKER.test('text\n>>>>>>> h8\n')).toBe(true);
    expect(MARKER.test('a ======= b\n')).toBe(false);
  });

  it('no tracked source, test or document holds one', () => {
    const files = trackedFiles();
    expect(files.length).toBeGreaterThan(50);
    const bad = files.filter((f) => MARKER.test(readFileSync(path.join(root, f), 'utf8')));
    expect(bad).toEqual([]);
  });
});
