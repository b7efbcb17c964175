/**
 * The real path of a folder the user named (the repository root: `working-directory`, `--root`),
 * checked against the folder it must stay inside. A folder named inside the workspace (action)
 * or the working directory (CLI) may be reached through symbolic links only while its real path,
 * with every link on the way resolved, stays inside that folder's real path: a folder replaced by
 * a link to a parent, or to anywhere else outside, is refused.
 */
import { realpathSync, statSync } from 'node:fs';
import path from 'node:path';
import { InputError } from '../core/errors.js';

/** Error code of a named folder that is missing, not a folder, or leads outside its boundary. */
export const FOLDER_REFUSED = 'folder-refused';

/**
 * True when `p` is `base` itself or lies below it (both absolute; compared as written, with the
 * platform's separators; no file system access).
 */
export function isInsideFolder(base: string, p: string): boolean {
  const rel = path.relative(base, p);
  return rel === '' || (rel !== '..' && !rel.startsWith(`..${path.sep}`) && !path.isAbsolute(rel));
}

/** Options of {@link realFolder}. */
export interface RealFolderOptions {
  /** The option or input that named the folder (`--root`, `working-directory`), named in messages. */
  key: string;
  /**
   * The folder (absolute, existing) that a folder named inside it must really stay inside, or
   * null for none. A folder named outside it is taken as named (its real path) unless
   * `insideOnly` is set.
   */
  within: string | null;
  /** Refuse a folder named outside `within`. Default false. */
  insideOnly?: boolean;
  /** What `within` is called in messages (`workspace`, `working directory`). Default `folder`. */
  withinName?: string;
}

/**
 * The real path of an existing folder (every symbolic link resolved, `realpath(3)`).
 * @param named the folder as named, absolute (already resolved against the working directory)
 * @param options the name for messages and the boundary; see {@link RealFolderOptions}
 * @throws InputError `folder-refused` (its key is `options.key`) when the folder is missing or is
 *   not a folder, or when it is named inside `within` and its real path is not inside the real
 *   path of `within`, or is named outside `within` with `insideOnly`
 */
export function realFolder(named: string, options: RealFolderOptions): string {
  const where = { key: options.key };
  const boundary = options.within;
  const boundaryName = options.withinName ?? 'folder';
  const namedInside = boundary !== null && isInsideFolder(boundary, named);
  if (boundary !== null && !namedInside && options.insideOnly) {
    throw new InputError(FOLDER_REFUSED, `${named} is outside the ${boundaryName} ${boundary}; expected a folder inside it`, where);
  }
  let real: string;
  try {
    real = realpathSync(named);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? String(error);
    const why =
      code === 'ELOOP'
        ? 'goes round a loop of symbolic links'
        : code === 'ENOENT' || code === 'ENOTDIR'
          ? 'does not exist'
          : `cannot be read (${code})`;
    throw new InputError(FOLDER_REFUSED, `${named} ${why}; expected an existing folder`, where);
  }
  if (!statSync(real).isDirectory()) throw new InputError(FOLDER_REFUSED, `${named} is not a folder; expected an existing folder`, where);
  if (boundary !== null && namedInside && !isInsideFolder(realpathSync(boundary), real)) {
    throw new InputError(
      FOLDER_REFUSED,
      `${named} leads out of the ${boundaryName} ${boundary} through a symbolic link; expected a folder whose real path is inside it`,
      where,
    );
  }
  return real;
}
