/**
 * Writing a file inside the repository root, safely against a hostile tree: the path is
 * repository-relative (no absolute path, no `..`), every existing folder on the way must have its
 * real path inside the root's real path, the file itself must not be a symbolic link (a link is
 * never followed on write), and the text goes to a temporary file in the same folder that is
 * then renamed over the target (readers see the old file or the new one, never a half).
 */
import { closeSync, lstatSync, mkdirSync, openSync, realpathSync, renameSync, rmSync, writeSync } from 'node:fs';
import * as nodePath from 'node:path';
import { InputError } from '../core/errors.js';
import { normaliseRepoPath, PATH_OUTSIDE } from './repo-path.js';

/** Code of the error for a file that exists when it may not be overwritten. */
export const FILE_EXISTS = 'file-exists';

function isInside(base: string, real: string): boolean {
  return real === base || real.startsWith(base.endsWith(nodePath.sep) ? base : base + nodePath.sep);
}

/**
 * True when something (a file, a folder, a link) is at the repository-relative path.
 * @param root absolute repository root
 * @param rel repository-relative path with `/`
 */
export function existsInRepo(root: string, rel: string): boolean {
  try {
    lstatSync(nodePath.join(realpathSync(root), ...normaliseRepoPath(rel, { file: rel }).split('/')));
    return true;
  } catch {
    return false;
  }
}

/**
 * Writes `text` to the repository-relative path `rel` (creating folders), atomically.
 *
 * @param root absolute repository root
 * @param rel repository-relative path with `/`
 * @param text UTF-8 contents
 * @param overwrite replace an existing regular file (default false: an existing file is an error)
 * @throws InputError `path-outside` (a folder on the way leads outside, or the target is a link),
 *   `file-exists` (the file exists and `overwrite` is false)
 */
export function writeInRepo(root: string, rel: string, text: string, overwrite = false): void {
  const normal = normaliseRepoPath(rel, { file: rel });
  const base = realpathSync(root);
  const segments = normal.split('/');
  let folder = base;
  for (const segment of segments.slice(0, -1)) {
    folder = nodePath.join(folder, segment);
    try {
      mkdirSync(folder);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
    const real = realpathSync(folder);
    if (!isInside(base, real))
      throw new InputError(
        PATH_OUTSIDE,
        'a folder on the way is a link that leads outside the repository; expected a plain folder inside it',
        { file: normal },
      );
    folder = real;
  }
  const target = nodePath.join(folder, segments[segments.length - 1]);
  let existing: ReturnType<typeof lstatSync> | null = null;
  try {
    existing = lstatSync(target);
  } catch {
    existing = null;
  }
  if (existing?.isSymbolicLink())
    throw new InputError(PATH_OUTSIDE, 'is a symbolic link; fitgate never writes through a link (remove it first)', { file: normal });
  if (existing && !existing.isFile())
    throw new InputError(FILE_EXISTS, 'exists and is not a regular file; expected a file path', { file: normal });
  if (existing && !overwrite) throw new InputError(FILE_EXISTS, 'exists; run again with --force to overwrite it', { file: normal });
  const temporary = nodePath.join(folder, `.${segments[segments.length - 1].slice(0, 40)}.${process.pid}.${Date.now().toString(36)}.tmp`);
  const fd = openSync(temporary, 'wx', 0o644);
  try {
    const bytes = Buffer.from(text, 'utf8');
    let written = 0;
    while (written < bytes.length) written += writeSync(fd, bytes, written, bytes.length - written);
  } catch (error) {
    closeSync(fd);
    rmSync(temporary, { force: true });
    throw error;
  }
  closeSync(fd);
  renameSync(temporary, target);
}
