/**
 * A {@link RepoReader} over a folder on disk (the working tree). Every path is checked
 * lexically (no absolute paths, no `..` above the root) and then through the file system
 * (the real path, with every symbolic link at any level followed, must stay inside the
 * root's real path) before anything is opened; the real path is what gets opened.
 *
 * The file system calls are synchronous behind the asynchronous interface: a run reads its files
 * one after another (models run in parallel on worker threads, each with its own reader), and a
 * local call takes less time than its round trip through libuv's thread pool. A small model's
 * run makes a few dozen such calls; a 1 MiB piece of a big file is read in well under a
 * millisecond.
 */

import { closeSync, fstatSync, openSync, readFileSync, readSync, realpathSync, statSync, type Stats } from 'node:fs';
import * as nodePath from 'node:path';
import { InputError, type ErrorLocation } from '../core/errors.js';
import { FILE_MISSING, isAbsoluteLike, isIgnoredPath, joinRepoPath, normaliseRepoPath, PATH_OUTSIDE } from './repo-path.js';
import type { RepoReader } from './types.js';

/** Glob patterns never searched. */
const IGNORED_GLOBS = ['**/node_modules/**', '**/.git/**'];

/**
 * RepoReader over a folder on disk. Every path is checked: absolute paths, `..` escapes and
 * symbolic links (at any level) whose real path is outside the root's real path are
 * InputError `path-outside`; nothing outside the root is ever opened (the real path is
 * checked before opening).
 *
 * @param root the repository folder (absolute, or relative to the working directory)
 */
export function createFsRepository(root: string): RepoReader {
  const rootAbsolute = nodePath.resolve(root);
  let rootRealPromise: Promise<string> | null = null;
  const rootReal = (): Promise<string> => {
    rootRealPromise ??= realpath(rootAbsolute).catch((error: unknown) => {
      rootRealPromise = null;
      throw new InputError(FILE_MISSING, `repository folder cannot be read (${codeOf(error) ?? String(error)}); expected an existing folder`, { file: rootAbsolute });
    });
    return rootRealPromise;
  };

  /** The real path of a normalised repository-relative path, or null when nothing is there. */
  const realInside = async (rel: string, where: ErrorLocation, shown: string): Promise<string | null> => {
    const base = await rootReal();
    const full = rel === '' ? base : nodePath.join(base, rel);
    let real: string | null = null;
    try {
      real = await realpath(full);
    } catch (error) {
      const code = codeOf(error);
      if (code === 'ELOOP') throw new InputError(PATH_OUTSIDE, `path ${JSON.stringify(shown)} goes round a loop of symbolic links; expected a plain path`, where);
      if (code !== 'ENOENT' && code !== 'ENOTDIR') throw error;
    }
    if (real === null) {
      // Missing: still refuse when an existing folder on the way leads outside.
      for (let parent = nodePath.dirname(full); parent.length >= base.length; parent = nodePath.dirname(parent)) {
        try {
          const parentReal = await realpath(parent);
          if (!isInside(base, parentReal)) throw outside(shown, where);
          break;
        } catch (error) {
          if (error instanceof InputError) throw error;
          if (parent === base) break;
        }
      }
      return null;
    }
    if (!isInside(base, real)) throw outside(shown, where);
    return real;
  };

  const check = async (path: string): Promise<string | null> => realInside(normaliseRepoPath(path), { file: path }, path);

  const requireFile = async (path: string): Promise<string> => {
    const real = await check(path);
    if (real === null) throw new InputError(FILE_MISSING, `no such file in ${rootAbsolute}; expected an existing file`, { file: path });
    const info = await stat(real);
    if (!info.isFile()) throw new InputError(FILE_MISSING, `is not a regular file (a folder or device); expected a file`, { file: path });
    return real;
  };

  return {
    label: rootAbsolute,
    async resolve(fromFile, target, where) {
      const location: ErrorLocation = { file: fromFile, ...where };
      const rel = joinRepoPath(fromFile, target, location);
      await realInside(rel, location, target);
      return rel;
    },
    async isFile(path) {
      const real = await check(path);
      if (real === null) return false;
      return (await stat(real)).isFile();
    },
    async size(path) {
      return (await stat(await requireFile(path))).size;
    },
    async read(path) {
      return readFileSync(await requireFile(path));
    },
    async *stream(path, chunkBytes = 1024 * 1024) {
      const real = await requireFile(path);
      const fd = openSync(real, 'r');
      try {
        // Pieces of chunkBytes, no bigger than the file needs (a file that grows meanwhile is
        // still read to its end, in pieces of at least 64 KiB); each piece is a fresh buffer,
        // so a reader may keep a previous one.
        const size = Math.max(1, Math.min(Math.floor(chunkBytes), Math.max(65_536, fstatSync(fd).size + 1)));
        for (;;) {
          const piece = Buffer.allocUnsafe(size);
          const n = readSync(fd, piece, 0, size, null);
          if (n === 0) return;
          yield n === size ? piece : piece.subarray(0, n);
        }
      } finally {
        closeSync(fd);
      }
    },
    async glob(patterns) {
      for (const pattern of patterns) {
        const p = pattern.replace(/\\/g, '/');
        if (isAbsoluteLike(pattern) || p === '..' || p.startsWith('../')) {
          throw new InputError(PATH_OUTSIDE, `glob pattern ${JSON.stringify(pattern)} leaves the repository; expected a pattern relative to the root`, {});
        }
      }
      if (patterns.length === 0) return [];
      // tinyglobby is loaded when a run globs (a run given its descriptors never does).
      const { glob: tinyGlob } = await import('tinyglobby');
      const found = await tinyGlob(patterns, {
        cwd: await rootReal(),
        onlyFiles: true,
        followSymbolicLinks: false,
        dot: false,
        ignore: IGNORED_GLOBS,
      });
      const paths = new Set(found.map((p) => p.replace(/\\/g, '/')).filter((p) => !isIgnoredPath(p)));
      return [...paths].sort();
    },
  };
}

/** The real path (the system's realpath(3), as fs/promises uses), as a promise. */
async function realpath(path: string): Promise<string> {
  return realpathSync.native(path);
}

/** File information, as a promise. */
async function stat(path: string): Promise<Stats> {
  return statSync(path);
}

function isInside(base: string, real: string): boolean {
  const rel = nodePath.relative(base, real);
  return rel === '' || (rel !== '..' && !rel.startsWith(`..${nodePath.sep}`) && !nodePath.isAbsolute(rel));
}

function outside(shown: string, where: ErrorLocation): InputError {
  return new InputError(PATH_OUTSIDE, `path ${JSON.stringify(shown)} leads outside the repository through a symbolic link; expected a file inside it`, where);
}

function codeOf(error: unknown): string | undefined {
  return error !== null && typeof error === 'object' && 'code' in error ? String((error as { code: unknown }).code) : undefined;
}
