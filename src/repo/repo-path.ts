/**
 * Lexical handling of repository-relative paths shared by every {@link RepoReader}:
 * normalising, and refusing absolute paths and `..` escapes. Links are the disk reader's business.
 */

import { posix } from 'node:path';
import { InputError, type ErrorLocation, clip, quoteValue } from '../core/errors.js';

/** Code of every refused path. */
export const PATH_OUTSIDE = 'path-outside';
/** Code of a path that names no file. */
export const FILE_MISSING = 'file-missing';
/** Code of a path that names something other than a regular file (a folder, a broken link, a FIFO...). */
export const NOT_A_FILE = 'not-a-file';
/** Code of a file (or folder) that exists but that the system does not let fitgate read. */
export const FILE_UNREADABLE = 'file-unreadable';

/** The words for what a path names, when it is not a regular file. */
const KIND_WORDS: Readonly<Record<'folder' | 'broken-link' | 'special', string>> = Object.freeze({
  folder: 'is a folder, not a file',
  'broken-link': 'is a symbolic link that leads to nothing, not a file',
  special: 'is not a regular file (a FIFO, socket, device or submodule)',
});

/**
 * Words for a path that names something other than a regular file, e.g. `is a folder, not a file`.
 * @param kind what the path names
 */
export function kindWords(kind: 'folder' | 'broken-link' | 'special'): string {
  return KIND_WORDS[kind];
}

/**
 * The `not-a-file` error: the path exists but is not a regular file.
 * @param kind what the path names
 * @param location where to point (the path itself as the file by default)
 */
export function notAFileError(kind: 'folder' | 'broken-link' | 'special', location: ErrorLocation): InputError {
  return new InputError(NOT_A_FILE, `${kindWords(kind)}; expected a regular file`, location);
}

/**
 * The `file-unreadable` error for a system error while reading (permissions, I/O): that file's
 * problem, reported like any bad input.
 * @param error what the system threw (its code, such as `EACCES`, is named)
 * @param location the file
 */
export function unreadableError(error: unknown, location: ErrorLocation): InputError {
  const code = error !== null && typeof error === 'object' && 'code' in error ? String((error as { code: unknown }).code) : 'error';
  return new InputError(FILE_UNREADABLE, `cannot be read (${code}); expected a file that the user running fitgate may read`, location);
}

/** True for `/x`, `\\x`, `C:x` and `C:\x`: paths that do not start at the repository root. */
export function isAbsoluteLike(path: string): boolean {
  return path.startsWith('/') || path.startsWith('\\') || /^[A-Za-z]:/.test(path);
}

/**
 * Normalises a repository-relative path: `\` becomes `/`, `.` and `..` segments are
 * resolved, a leading `./` and trailing `/` are dropped; the root is `''`.
 *
 * @param path the path as given
 * @param location where to point an error (default: the path itself as the file)
 * @throws InputError `path-outside` for absolute paths and paths that climb above the root
 */
export function normaliseRepoPath(path: string, location?: ErrorLocation): string {
  const where = location ?? { file: path };
  if (path.includes('\u0000'))
    throw new InputError(PATH_OUTSIDE, `path ${quoteValue(path)} contains a NUL character; expected a plain relative path`, where);
  const slashed = path.replace(/\\/g, '/');
  if (isAbsoluteLike(path)) {
    throw new InputError(PATH_OUTSIDE, `path ${quoteValue(path)} is absolute; expected a path relative to the repository`, where);
  }
  let normal = posix.normalize(slashed === '' ? '.' : slashed);
  if (normal === '..' || normal.startsWith('../')) {
    throw new InputError(PATH_OUTSIDE, `path ${quoteValue(path)} leaves the repository; expected a path inside it`, where);
  }
  if (normal === '.' || normal === './') return '';
  normal = normal.replace(/^\.\//, '').replace(/\/+$/, '');
  return normal;
}

/**
 * Resolves `target` as written in `fromFile` (relative to its folder) lexically.
 *
 * @param fromFile repository-relative path of the file that names `target`
 * @param target the path as written
 * @param location where to point an error (the naming file, line and key)
 */
export function joinRepoPath(fromFile: string, target: string, location: ErrorLocation): string {
  if (isAbsoluteLike(target)) {
    throw new InputError(
      PATH_OUTSIDE,
      `path ${quoteValue(target)} is absolute; expected a path relative to ${clip(fromFile)}'s folder`,
      location,
    );
  }
  const folder = posix.dirname(normaliseRepoPath(fromFile));
  const joined = posix.join(folder, target.replace(/\\/g, '/'));
  return normaliseRepoPath(joined, { ...location, file: location.file ?? fromFile });
}
