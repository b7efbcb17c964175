/**
 * A {@link RepoReader} over a folder on disk (the working tree). Every path is checked
 * lexically (no absolute paths, no `..` above the root) and then through the file system
 * (the real path, with every symbolic link at any level followed, must stay inside the
 * root's real path) before anything is opened; the real path is what gets opened. A path's real
 * path, once found inside the root, and a regular file's size are kept for the reader's life (one
 * run).
 *
 * The file system calls are synchronous behind the asynchronous interface: a run reads its files
 * one after another (models run in parallel on worker threads, each with its own reader), and a
 * local call takes less time than its round trip through libuv's thread pool. A small model's
 * run makes a few dozen such calls; a 1 MiB piece of a big file is read in well under a
 * millisecond.
 */

import { closeSync, lstatSync, openSync, readFileSync, readSync, realpathSync, statSync, type Stats } from 'node:fs';
import * as nodePath from 'node:path';
import { InputError, quoteValue, type ErrorLocation } from '../core/errors.js';
import { FILE_MISSING, joinRepoPath, normaliseRepoPath, notAFileError, PATH_OUTSIDE, unreadableError } from './repo-path.js';
import type { EntryKind, RepoReader } from './types.js';

/**
 * RepoReader over a folder on disk. Every path is checked: absolute paths, `..` escapes and
 * symbolic links (at any level) whose real path is outside the root's real path are
 * InputError `path-outside`; nothing outside the root is ever opened (the real path is
 * checked before opening). Whatever the system refuses while reading (permissions, I/O
 * errors) is InputError `file-unreadable` naming the file, never a bare system error.
 *
 * @param root the repository folder (absolute, or relative to the working directory)
 */
export function createFsRepository(root: string): RepoReader {
  const rootAbsolute = nodePath.resolve(root);
  let rootRealPromise: Promise<string> | null = null;
  const rootReal = (): Promise<string> => {
    rootRealPromise ??= realpath(rootAbsolute).catch((error: unknown) => {
      rootRealPromise = null;
      throw new InputError(
        FILE_MISSING,
        `repository folder cannot be read (${codeOf(error) ?? String(error)}); expected an existing folder`,
        { file: rootAbsolute },
      );
    });
    return rootRealPromise;
  };

  // Real paths already found inside the root, by normalised path: a run names each data file
  // several times (resolved from its descriptor, sized, read), and the answer is the same within
  // one run. Only paths found inside are kept; a missing path is looked up again each time.
  const knownInside = new Map<string, string>();

  // Sizes of regular files already found, by real path: a run asks for a data file's kind and
  // size several times (planned, sized, read). The size checked against the limits is the one
  // found first; a read still goes to the file's end as it is then.
  const fileSize = new Map<string, number>();

  /**
   * The real path of `rel` when its folder's real path is known (found inside the root before, or
   * found now the same way) and its last name is no link: that folder's real path joined with the
   * name, one `lstat` instead of a `realpath` of the whole path (which reads every folder on the
   * way again). Undefined when that does not apply (a link, nothing there, a folder not found): the
   * caller then resolves the whole path. A regular file's size is kept as {@link kindOf} keeps it.
   */
  const plainChild = (rel: string, base: string, depth: number): string | undefined => {
    if (rel === '' || depth > MAX_PLAIN_DEPTH) return undefined;
    const slash = rel.lastIndexOf('/');
    const folderRel = slash < 0 ? '' : rel.slice(0, slash);
    const folder = folderRel === '' ? base : (knownInside.get(folderRel) ?? plainChild(folderRel, base, depth + 1));
    if (folder === undefined) return undefined;
    const candidate = nodePath.join(folder, rel.slice(slash + 1));
    let info: Stats | undefined;
    try {
      info = lstatSync(candidate, { throwIfNoEntry: false });
    } catch {
      return undefined;
    }
    if (info === undefined || info.isSymbolicLink()) return undefined;
    knownInside.set(rel, candidate);
    if (info.isFile()) fileSize.set(candidate, info.size);
    return candidate;
  };

  /** The real path of a normalised repository-relative path, or null when nothing is there. */
  const realInside = async (rel: string, where: ErrorLocation, shown: string): Promise<string | null> => {
    const known = knownInside.get(rel);
    if (known !== undefined) return known;
    const base = await rootReal();
    const plain = plainChild(rel, base, 0);
    if (plain !== undefined) return plain;
    const full = rel === '' ? base : nodePath.join(base, rel);
    let real: string | null = null;
    try {
      real = await realpath(full);
    } catch (error) {
      const code = codeOf(error);
      if (code === 'ELOOP')
        throw new InputError(PATH_OUTSIDE, `path ${quoteValue(shown)} goes round a loop of symbolic links; expected a plain path`, where);
      if (code !== 'ENOENT' && code !== 'ENOTDIR') throw unreadableError(error, where);
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
    knownInside.set(rel, real);
    return real;
  };

  const check = async (path: string): Promise<string | null> => realInside(normaliseRepoPath(path), { file: path }, path);

  /** What `path` names, and its real path when something is there (and its size when it is a file). */
  const kindOf = async (path: string): Promise<{ kind: EntryKind; real: string | null; size?: number }> => {
    const real = await check(path);
    if (real === null) {
      // Nothing at the end of the links: a link that leads nowhere is not "missing".
      const base = await rootReal();
      const rel = normaliseRepoPath(path);
      const lexical = rel === '' ? base : nodePath.join(base, rel);
      try {
        return { kind: lstatSync(lexical).isSymbolicLink() ? 'broken-link' : 'missing', real: null };
      } catch {
        return { kind: 'missing', real: null };
      }
    }
    const known = fileSize.get(real);
    if (known !== undefined) return { kind: 'file', real, size: known };
    const info = await stat(real, { file: path });
    if (!info.isFile()) return { kind: info.isDirectory() ? 'folder' : 'special', real };
    fileSize.set(real, info.size);
    return { kind: 'file', real, size: info.size };
  };

  /** The real path of a regular file and its size; InputError otherwise. */
  const requireFile = async (path: string): Promise<{ real: string; size: number }> => {
    const { kind, real, size } = await kindOf(path);
    if (kind === 'missing')
      throw new InputError(FILE_MISSING, `no such file in ${rootAbsolute}; expected an existing file`, { file: path });
    if (kind !== 'file' || real === null || size === undefined) throw notAFileError(kind === 'file' ? 'special' : kind, { file: path });
    return { real, size };
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
      return (await kindOf(path)).kind === 'file';
    },
    async entryKind(path) {
      return (await kindOf(path)).kind;
    },
    async size(path) {
      return (await requireFile(path)).size;
    },
    async read(path) {
      const { real } = await requireFile(path);
      try {
        return readFileSync(real);
      } catch (error) {
        throw unreadableError(error, { file: path });
      }
    },
    async *stream(path, chunkBytes = 1024 * 1024) {
      const { real, size: fileBytes } = await requireFile(path);
      let fd: number;
      try {
        fd = openSync(real, 'r');
      } catch (error) {
        throw unreadableError(error, { file: path });
      }
      try {
        // Pieces of chunkBytes, the first no bigger than the file needs (its size as just found
        // for the checks above, plus one byte), the rest of at least 64 KiB (a file that grows
        // meanwhile is still read to its end). Each piece is a fresh buffer, so a reader may
        // keep a previous one; a piece is filled until it is full or a read finds the end, so a
        // small file is one buffer and the read that finds its end goes into that buffer's room.
        const most = Math.max(1, Math.floor(chunkBytes));
        let size = Math.min(most, fileBytes + 1);
        for (;;) {
          const piece = Buffer.allocUnsafe(size);
          let filled = 0;
          let ended = false;
          while (filled < size) {
            let n: number;
            try {
              n = readSync(fd, piece, filled, size - filled, null);
            } catch (error) {
              throw unreadableError(error, { file: path });
            }
            if (n === 0) {
              ended = true;
              break;
            }
            filled += n;
          }
          if (filled > 0) yield filled === size ? piece : piece.subarray(0, filled);
          if (ended) return;
          size = Math.min(most, Math.max(65_536, fileBytes + 1));
        }
      } finally {
        closeSync(fd);
      }
    },
    async glob(patterns) {
      // The matcher and the walk are loaded when a run globs (a run given its descriptors never
      // does); the patterns are checked (and refused) before the first folder is listed.
      const [{ compilePatterns }, { walkTree }] = await Promise.all([import('./glob-pattern.js'), import('./tree-walk.js')]);
      const compiled = compilePatterns(patterns);
      if (patterns.length === 0) return { paths: [], notEntered: [] };
      return walkTree(await rootReal(), compiled);
    },
  };
}

/** The real path (the system's realpath(3), as fs/promises uses), as a promise. */
async function realpath(path: string): Promise<string> {
  return realpathSync.native(path);
}

/** File information, as a promise; a system error is InputError `file-unreadable` at `where`. */
async function stat(path: string, where: ErrorLocation): Promise<Stats> {
  try {
    return statSync(path);
  } catch (error) {
    throw unreadableError(error, where);
  }
}

/** Folders above a path resolved one name at a time before the whole path is resolved at once. */
const MAX_PLAIN_DEPTH = 64;

function isInside(base: string, real: string): boolean {
  const rel = nodePath.relative(base, real);
  return rel === '' || (rel !== '..' && !rel.startsWith(`..${nodePath.sep}`) && !nodePath.isAbsolute(rel));
}

function outside(shown: string, where: ErrorLocation): InputError {
  return new InputError(
    PATH_OUTSIDE,
    `path ${quoteValue(shown)} leads outside the repository through a symbolic link; expected a file inside it`,
    where,
  );
}

function codeOf(error: unknown): string | undefined {
  return error !== null && typeof error === 'object' && 'code' in error ? String((error as { code: unknown }).code) : undefined;
}
