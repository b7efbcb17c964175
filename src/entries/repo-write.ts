/**
 * Writing a file the user asked fitgate to make inside the repository (`init`, `refit`): a
 * repository-relative path, written with {@link writeFileSafely} with the root as the only
 * boundary (every folder on the way must really lie inside the root, a link is never followed,
 * the file is replaced atomically), and an existing file kept unless overwriting was asked for.
 */
import { lstatSync, realpathSync } from 'node:fs';
import * as nodePath from 'node:path';
import { InputError } from '../core/errors.js';
import { normaliseRepoPath } from '../repo/repo-path.js';
import { writeFileSafely } from './safe-write.js';

/** Code of the error for a file that exists when it may not be overwritten. */
export const FILE_EXISTS = 'file-exists';

/**
 * True when something (a file, a folder, a link) is at the repository-relative path.
 * @param root absolute repository root
 * @param rel repository-relative path with `/`
 */
export function existsInRepo(root: string, rel: string): boolean {
  try {
    lstatSync(nodePath.join(realpathSync(root), normaliseRepoPath(rel, { file: rel })));
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
 * @param text the contents: text (written as UTF-8) or bytes as they are
 * @param overwrite replace an existing regular file (default false: an existing file is an error)
 * @throws InputError `path-outside` (the path leaves the repository), `output-refused` (a folder on
 *   the way leads outside, or the target is a link or not a file), `file-exists` (the file exists
 *   and `overwrite` is false)
 */
export function writeInRepo(root: string, rel: string, text: string | Uint8Array, overwrite = false): void {
  const normal = normaliseRepoPath(rel, { file: rel });
  const base = realpathSync(root);
  if (!overwrite && existsInRepo(base, normal))
    throw new InputError(FILE_EXISTS, 'exists; run again with --force to overwrite it', { file: normal });
  writeFileSafely(nodePath.join(base, normal), text, { option: normal, within: [base], insideOnly: true });
}
