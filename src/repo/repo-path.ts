/**
 * Lexical handling of repository-relative paths shared by every {@link RepoReader}:
 * normalising, and refusing absolute paths and `..` escapes. Links are the disk reader's business.
 */

import { posix } from 'node:path';
import { InputError, type ErrorLocation } from '../core/errors.js';

/** Code of every refused path. */
export const PATH_OUTSIDE = 'path-outside';
/** Code of a path that names no file. */
export const FILE_MISSING = 'file-missing';

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
  if (path.includes('\u0000')) throw new InputError(PATH_OUTSIDE, `path ${JSON.stringify(path)} contains a NUL character; expected a plain relative path`, where);
  const slashed = path.replace(/\\/g, '/');
  if (isAbsoluteLike(path)) {
    throw new InputError(PATH_OUTSIDE, `path ${JSON.stringify(path)} is absolute; expected a path relative to the repository`, where);
  }
  let normal = posix.normalize(slashed === '' ? '.' : slashed);
  if (normal === '..' || normal.startsWith('../')) {
    throw new InputError(PATH_OUTSIDE, `path ${JSON.stringify(path)} leaves the repository; expected a path inside it`, where);
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
    throw new InputError(PATH_OUTSIDE, `path ${JSON.stringify(target)} is absolute; expected a path relative to ${fromFile}'s folder`, location);
  }
  const folder = posix.dirname(normaliseRepoPath(fromFile));
  const joined = posix.join(folder, target.replace(/\\/g, '/'));
  return normaliseRepoPath(joined, { ...location, file: location.file ?? fromFile });
}

/** True when a repository-relative path passes through `node_modules` or `.git`. */
export function isIgnoredPath(path: string): boolean {
  return path.split('/').some((segment) => segment === 'node_modules' || segment === '.git');
}
