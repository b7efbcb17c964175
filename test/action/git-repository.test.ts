import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/errors.js';
import { createGitRepository, tryGitTopLevel, tryResolveCommit } from '../../src/repo/git-repository.js';
import type { RepoReader } from '../../src/repo/types.js';

let top: string;
let first: string;
let second: string;

function git(...args: string[]): string {
  return execFileSync('git', args, {
    cwd: top,
    encoding: 'utf8',
    env: {
      ...process.env,
      GIT_AUTHOR_NAME: 't',
      GIT_AUTHOR_EMAIL: 't@example.com',
      GIT_COMMITTER_NAME: 't',
      GIT_COMMITTER_EMAIL: 't@example.com',
    },
  }).trim();
}

function put(file: string, text: string): void {
  mkdirSync(path.dirname(path.join(top, file)), { recursive: true });
  writeFileSync(path.join(top, file), text);
}

/** The InputError code a promise rejects with. */
async function code(p: Promise<unknown>): Promise<string> {
  try {
    await p;
  } catch (error) {
    if (error instanceof InputError) return error.code;
    throw error;
  }
  return 'resolved';
}

beforeAll(() => {
  top = mkdtempSync(path.join(tmpdir(), 'fitgate-git-'));
  git('init', '-q', '-b', 'main');
  put('outside.txt', 'secret\n');
  put('ml/fitgate.yml', 'version: 1\n');
  put('ml/models/a.model.yml', 'name: a\n');
  put('ml/models/deep/b.model.yml', 'name: b\n');
  put('ml/models/.hidden.model.yml', 'name: h\n');
  put('ml/data/a.csv', 'x,y\n1,2\n');
  symlinkSync('../data/a.csv', path.join(top, 'ml/models/link.csv'));
  symlinkSync('../../outside.txt', path.join(top, 'ml/models/escape.csv'));
  symlinkSync('data', path.join(top, 'ml/data-link'));
  symlinkSync('/etc/passwd', path.join(top, 'ml/absolute.csv'));
  git('add', '-A');
  git('commit', '-q', '-m', 'one');
  first = git('rev-parse', 'HEAD');
  put('ml/models/a.model.yml', 'name: a2\n');
  put('ml/models/c.model.yml', 'name: c\n');
  git('add', '-A');
  git('commit', '-q', '-m', 'two');
  second = git('rev-parse', 'HEAD');
});

function reader(commit: string, prefix = 'ml'): RepoReader {
  return createGitRepository({ cwd: path.join(top, 'ml'), commit, prefix });
}

describe('createGitRepository', () => {
  it('reads files as they were at the commit, not the working tree', async () => {
    const text = async (r: RepoReader, p: string) => new TextDecoder().decode(await r.read(p));
    expect(await text(reader(first), 'models/a.model.yml')).toBe('name: a\n');
    expect(await text(reader(second), 'models/a.model.yml')).toBe('name: a2\n');
    expect(await reader(first).isFile('models/c.model.yml')).toBe(false);
    expect(await reader(second).isFile('models/c.model.yml')).toBe(true);
    expect(await reader(first).size('data/a.csv')).toBe(8);
    expect(reader(first).label).toBe(`base commit ${first.slice(0, 7)}`);
  });

  it('streams a file in pieces that join to the whole', async () => {
    const pieces: Uint8Array[] = [];
    for await (const piece of reader(first).stream('data/a.csv', 3)) pieces.push(piece);
    expect(Buffer.concat(pieces).toString('utf8')).toBe('x,y\n1,2\n');
  });

  it('globs the commit tree with the same rules as the other readers (no dot files, ** spans folders)', async () => {
    expect((await reader(first).glob(['models/**/*.model.yml'])).paths).toEqual(['models/a.model.yml', 'models/deep/b.model.yml']);
    expect((await reader(second).glob(['models/*.model.yml'])).paths).toEqual(['models/a.model.yml', 'models/c.model.yml']);
    // A link that matches is listed like a file (reading it then says where it leads), as on disk.
    expect((await reader(first).glob(['models/*.csv'])).paths).toEqual(['models/escape.csv', 'models/link.csv']);
    expect(await code(reader(first).read('models/escape.csv'))).toBe('path-outside');
    // A link a pattern would search below is reported, not followed.
    expect(await reader(first).glob(['data-link/*.csv'])).toEqual({ paths: [], notEntered: ['data-link'] });
    expect(await code(reader(first).glob(['../*.txt']))).toBe('path-outside');
  });

  it('follows links inside the root only', async () => {
    const r = reader(first);
    expect(new TextDecoder().decode(await r.read('models/link.csv'))).toBe('x,y\n1,2\n');
    expect(new TextDecoder().decode(await r.read('data-link/a.csv'))).toBe('x,y\n1,2\n');
    expect(await code(r.read('models/escape.csv'))).toBe('path-outside');
    expect(await code(r.read('absolute.csv'))).toBe('path-outside');
    expect(await r.isFile('models/escape.csv')).toBe(false);
    // The link's target exists in the commit, but outside the root (`ml/`).
    expect(await reader(first, '').isFile('ml/models/escape.csv')).toBe(true);
  });

  it('refuses paths that leave the root, naming the file, line and key', async () => {
    const r = reader(first);
    expect(await code(r.read('../outside.txt'))).toBe('path-outside');
    expect(await code(r.read('/etc/passwd'))).toBe('path-outside');
    expect(await code(r.resolve('models/a.model.yml', '../../outside.txt', { line: 3, key: 'data.train' }))).toBe('path-outside');
    expect(await code(r.resolve('models/a.model.yml', 'escape.csv', { line: 3 }))).toBe('path-outside');
    expect(await r.resolve('models/a.model.yml', '../data/a.csv', { line: 3 })).toBe('data/a.csv');
    try {
      await r.resolve('models/a.model.yml', '../../outside.txt', { line: 3, key: 'data.train' });
    } catch (error) {
      expect((error as InputError).location).toMatchObject({ file: 'models/a.model.yml', line: 3, key: 'data.train' });
    }
  });

  it('reports missing files as file-missing', async () => {
    expect(await code(reader(first).read('models/none.yml'))).toBe('file-missing');
    expect(await code(reader(first).size('models'))).toBe('not-a-file');
    expect(await reader(first).entryKind('models')).toBe('folder');
  });
});

describe('commit lookup', () => {
  it('resolves revisions present locally and refuses others', async () => {
    expect(await tryResolveCommit(top, 'HEAD~1')).toBe(first);
    expect(await tryResolveCommit(top, second)).toBe(second);
    expect(await tryResolveCommit(top, 'f'.repeat(40))).toBeNull();
    expect(await tryResolveCommit(top, '--output=/tmp/x')).toBeNull();
    expect(await tryGitTopLevel(path.join(top, 'ml', 'models'))).toBe(
      execFileSync('git', ['rev-parse', '--show-toplevel'], { cwd: top, encoding: 'utf8' }).trim(),
    );
    expect(await tryGitTopLevel(tmpdir())).toBeNull();
  });
});
