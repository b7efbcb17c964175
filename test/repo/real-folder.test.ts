// The real path of a named folder (src/repo/real-folder.ts): links followed, the boundary kept.
import { mkdirSync, mkdtempSync, realpathSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { FOLDER_REFUSED, isInsideFolder, realFolder } from '../../src/repo/real-folder.js';

const top = realpathSync(mkdtempSync(path.join(tmpdir(), 'fitgate-real-folder-')));
const ws = path.join(top, 'ws');
mkdirSync(path.join(ws, 'ml'), { recursive: true });
writeFileSync(path.join(ws, 'file.txt'), 'x');
symlinkSync('..', path.join(ws, 'up'));
symlinkSync('ml', path.join(ws, 'alias'));
symlinkSync('loop', path.join(ws, 'loop'));
afterAll(() => rmSync(top, { recursive: true, force: true }));

describe('isInsideFolder', () => {
  it('takes the folder itself and what lies below it, not a sibling whose name starts with ..', () => {
    expect(isInsideFolder('/a/b', '/a/b')).toBe(true);
    expect(isInsideFolder('/a/b', '/a/b/c/d')).toBe(true);
    expect(isInsideFolder('/a/b', '/a/bc')).toBe(false);
    expect(isInsideFolder('/a/b', '/a')).toBe(false);
    expect(isInsideFolder('/a/b', '/a/b/..c')).toBe(true);
  });
});

describe('realFolder', () => {
  const opts = { key: 'working-directory', within: ws, withinName: 'workspace' };

  it('follows a link that stays inside the boundary', () => {
    expect(realFolder(path.join(ws, 'alias'), opts)).toBe(path.join(ws, 'ml'));
    expect(realFolder(ws, opts)).toBe(ws);
  });

  it('refuses a link to the parent, a missing folder, a file and a loop, naming the key', () => {
    const cases: Array<[string, RegExp]> = [
      ['up', /leads out of the workspace .* through a symbolic link/],
      ['missing', /does not exist; expected an existing folder/],
      ['file.txt', /is not a folder; expected an existing folder/],
      ['loop', /goes round a loop of symbolic links/],
    ];
    for (const [name, message] of cases) {
      expect(() => realFolder(path.join(ws, name), opts), name).toThrow(
        expect.objectContaining({
          code: FOLDER_REFUSED,
          location: { key: 'working-directory' },
          message: expect.stringMatching(message) as string,
        }) as Error,
      );
    }
  });

  it('takes a folder named outside the boundary as named, unless only inside is allowed', () => {
    expect(realFolder(top, opts)).toBe(top);
    expect(() => realFolder(top, { ...opts, insideOnly: true })).toThrow(/is outside the workspace/);
  });
});
