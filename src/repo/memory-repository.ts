/**
 * A {@link RepoReader} over an in-memory map of files: for tests, and for the base-branch
 * comparison, which reads blobs from git. There are no links, so only lexical checks apply.
 */

import { InputError } from '../core/errors.js';
import { compilePatterns } from './glob-pattern.js';
import { FILE_MISSING, joinRepoPath, normaliseRepoPath, notAFileError } from './repo-path.js';
import type { RepoReader } from './types.js';

/**
 * RepoReader over an in-memory map path -> contents (tests, and the base-branch comparison
 * which reads blobs from git).
 *
 * @param files repository-relative paths (`/` separators) to contents; strings are stored as UTF-8
 * @param label name used in messages (default `memory`)
 */
export function createMemoryRepository(files: Record<string, string | Uint8Array>, label = 'memory'): RepoReader {
  const encoder = new TextEncoder();
  const store = new Map<string, Uint8Array>();
  for (const [path, contents] of Object.entries(files)) {
    store.set(normaliseRepoPath(path), typeof contents === 'string' ? encoder.encode(contents) : contents);
  }

  /** A stored file's path, a folder's (some stored path lies below it), or nothing. */
  const kindOf = (key: string): 'file' | 'folder' | 'missing' => {
    if (store.has(key)) return 'file';
    const below = key === '' ? '' : `${key}/`;
    for (const stored of store.keys()) if (stored.startsWith(below)) return 'folder';
    return 'missing';
  };

  const get = (path: string): Uint8Array => {
    const key = normaliseRepoPath(path);
    const contents = store.get(key);
    if (contents !== undefined) return contents;
    if (kindOf(key) === 'folder') throw notAFileError('folder', { file: path });
    throw new InputError(FILE_MISSING, `no such file in ${label}; expected an existing file`, { file: path });
  };

  return {
    label,
    async resolve(fromFile, target, where) {
      return joinRepoPath(fromFile, target, { file: fromFile, ...where });
    },
    async isFile(path) {
      return store.has(normaliseRepoPath(path));
    },
    async entryKind(path) {
      return kindOf(normaliseRepoPath(path));
    },
    async size(path) {
      return get(path).byteLength;
    },
    async read(path) {
      return get(path).slice();
    },
    async *stream(path, chunkBytes = 1024 * 1024) {
      const contents = get(path);
      const step = Math.max(1, Math.floor(chunkBytes));
      for (let start = 0; start < contents.byteLength; start += step) yield contents.slice(start, start + step);
    },
    async glob(patterns) {
      const compiled = compilePatterns(patterns);
      return { paths: [...store.keys()].filter((path) => compiled.matches(path)).sort(), notEntered: [] };
    },
  };
}
