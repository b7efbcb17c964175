import { describe, expect, it } from 'vitest';
import { diffLines } from '../../src/action/diff-lines.js';

describe('diffLines', () => {
  it('gives the added and context lines of each hunk with their new-side numbers', () => {
    const patch = [
      '@@ -5,4 +5,5 @@ terms:',
      '   target: y',
      ' terms:',
      '-  - polynomial: { of: x, degree: 2 }',
      '+  - polynomial: { of: x, degree: 9 }',
      '+  - linear: [z]',
      ' fit:',
      '@@ -20,2 +21,2 @@ limits:',
      '-  gap_ratio: 1.3',
      '+  gap_ratio: 1.5',
      ' ',
    ].join('\n');
    expect([...diffLines(patch)]).toEqual([
      [5, '  target: y'],
      [6, 'terms:'],
      [7, '  - polynomial: { of: x, degree: 9 }'],
      [8, '  - linear: [z]'],
      [9, 'fit:'],
      [21, '  gap_ratio: 1.5'],
      [22, ''],
    ]);
  });

  it('reads a one-line hunk header without counts, a new file, and the no-newline marker', () => {
    expect([...diffLines('@@ -3 +3 @@\n-a: 1\n+a: 2\n\\ No newline at end of file')]).toEqual([[3, 'a: 2']]);
    expect([...diffLines('@@ -0,0 +1,2 @@\n+version: 1\n+name: m\n')]).toEqual([
      [1, 'version: 1'],
      [2, 'name: m'],
    ]);
  });

  it('drops carriage returns, ignores a preamble, a deleted file, an empty patch and lines past a hunk', () => {
    expect([...diffLines('diff --git a/m.yml b/m.yml\n+++ b/m.yml\n@@ -1,1 +1,1 @@\n-x: 1\r\n+x: 2\r\n+stray: 3\n')]).toEqual([
      [1, 'x: 2'],
    ]);
    expect(diffLines('@@ -1,2 +0,0 @@\n-a: 1\n-b: 2').size).toBe(0);
    expect(diffLines('').size).toBe(0);
    expect(diffLines('+no: header').size).toBe(0);
  });
});
