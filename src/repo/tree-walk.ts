/**
 * The walk of a folder on disk that finds the descriptors a settings file's `models` patterns
 * match. It never leaves the repository: a folder is entered only while a pattern could still
 * match below it (so `node_modules`, `.git` and dot folders only when a pattern names them), a
 * symbolic link to a folder is never followed (it is reported instead when a pattern would
 * search below it, so that nothing is skipped in silence), and every entry counts against a cap.
 */
import { readdirSync, statSync, type Dirent } from 'node:fs';
import * as nodePath from 'node:path';
import { InputError } from '../core/errors.js';
import type { PatternSet, WalkState } from './glob-pattern.js';
import { FILE_UNREADABLE } from './repo-path.js';

/** Most folder entries one walk may look at (a pattern that reaches further is refused). */
export const MAX_WALK_ENTRIES = 1_000_000;

/** Code of a walk over {@link MAX_WALK_ENTRIES}. */
export const WALK_TOO_LARGE = 'glob-too-large';

/** What a walk found. */
export interface WalkResult {
  /**
   * Repository-relative paths (`/` separators) of the entries the patterns match that are not
   * folders: regular files, and also links, FIFOs, sockets and devices (a reader refuses those
   * with an error of their own, so nothing a pattern names is skipped in silence). Sorted.
   */
  paths: string[];
  /** Symbolic links to folders that a pattern would search below, which the walk does not follow. Sorted. */
  notEntered: string[];
}

/**
 * Walks `rootReal` for entries the patterns match.
 *
 * @param rootReal the repository root's real path (absolute, links resolved)
 * @param patterns the compiled `models` patterns
 * @param maxEntries most entries looked at; default {@link MAX_WALK_ENTRIES}
 * @throws InputError `glob-too-large` past `maxEntries`, `file-unreadable` for a folder that cannot be listed
 */
export function walkTree(rootReal: string, patterns: PatternSet, maxEntries = MAX_WALK_ENTRIES): WalkResult {
  const paths: string[] = [];
  const notEntered: string[] = [];
  /** Folders still to list: repository path, absolute path, pattern state. */
  const todo: { rel: string; abs: string; state: WalkState }[] = [{ rel: '', abs: rootReal, state: patterns.start }];
  let seen = 0;
  while (todo.length > 0) {
    const folder = todo.pop() as (typeof todo)[number];
    let entries: Dirent[];
    try {
      entries = readdirSync(folder.abs, { withFileTypes: true });
    } catch (error) {
      const code = codeOf(error);
      if (code === 'ENOENT' || code === 'ENOTDIR') continue; // gone while the walk ran
      throw new InputError(
        FILE_UNREADABLE,
        `the folder cannot be listed (${code ?? 'error'}) while searching for descriptors; expected a readable folder`,
        { file: folder.rel === '' ? '.' : folder.rel },
      );
    }
    for (const entry of entries) {
      seen += 1;
      if (seen > maxEntries) {
        throw new InputError(
          WALK_TOO_LARGE,
          `the \`models\` patterns reach more than ${maxEntries} files and folders; expected patterns that name the folders holding descriptors (e.g. models/**/*.model.yml)`,
          {},
        );
      }
      const name = entry.name;
      const rel = folder.rel === '' ? name : `${folder.rel}/${name}`;
      const state = patterns.step(folder.state, name);
      if (entry.isDirectory()) {
        if (patterns.alive(state)) todo.push({ rel, abs: nodePath.join(folder.abs, name), state });
        continue;
      }
      const accepted = patterns.accepts(state);
      const alive = patterns.alive(state);
      if (!accepted && !alive) continue;
      if (entry.isSymbolicLink() && leadsToFolder(nodePath.join(folder.abs, name))) {
        // A link to a folder is never followed (its target may be anywhere): reported when a
        // pattern would search below it, never a match (a folder is not a descriptor).
        if (alive) notEntered.push(rel);
        continue;
      }
      // Files, and links to anything else (the reader checks where they lead when it reads them).
      if (accepted) paths.push(rel);
    }
  }
  return { paths: paths.sort(), notEntered: notEntered.sort() };
}

/** True when the link at `abs` leads to a folder (its status only is looked at, never its contents). */
function leadsToFolder(abs: string): boolean {
  try {
    return statSync(abs).isDirectory();
  } catch {
    return false;
  }
}

function codeOf(error: unknown): string | undefined {
  return error !== null && typeof error === 'object' && 'code' in error ? String((error as { code: unknown }).code) : undefined;
}
