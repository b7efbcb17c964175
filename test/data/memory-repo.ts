/**
 * A tiny in-memory RepoReader for the data tests: files are byte arrays, and `stream`
 * splits them at chosen offsets (or in pieces of `chunkBytes`) so tests can check that the
 * piece boundaries never change a result.
 */

import { InputError } from '../../src/core/errors.js';
import type { RepoReader } from '../../src/repo/types.js';

/** Options for {@link memoryRepo}. */
export interface MemoryRepoOptions {
  /** Offsets at which `stream` cuts every file (sorted, inside the file); default: `chunkBytes` pieces. */
  cuts?: number[];
}

/** A RepoReader over `files` (text is encoded as UTF-8). Counts `stream` calls per path. */
export function memoryRepo(
  files: Record<string, string | Uint8Array>,
  options: MemoryRepoOptions = {},
): RepoReader & { streams: Map<string, number> } {
  const bytes = new Map<string, Uint8Array>();
  for (const [path, content] of Object.entries(files)) {
    bytes.set(path, typeof content === 'string' ? new TextEncoder().encode(content) : content);
  }
  const get = (path: string): Uint8Array => {
    const data = bytes.get(path);
    if (data === undefined) throw new InputError('file-missing', 'no such file', { file: path });
    return data;
  };
  const streams = new Map<string, number>();
  return {
    label: 'memory',
    streams,
    resolve: async (_from, target) => target,
    isFile: async (path) => bytes.has(path),
    entryKind: async (path) => (bytes.has(path) ? 'file' : 'missing'),
    size: async (path) => get(path).length,
    read: async (path) => get(path).slice(),
    async *stream(path: string, chunkBytes = 1024 * 1024) {
      const data = get(path);
      streams.set(path, (streams.get(path) ?? 0) + 1);
      const cuts = options.cuts ?? [];
      let at = 0;
      if (options.cuts !== undefined) {
        for (const cut of [...cuts, data.length]) {
          yield data.slice(at, cut);
          at = cut;
        }
        return;
      }
      for (; at < data.length; at += chunkBytes) yield data.slice(at, Math.min(data.length, at + chunkBytes));
    },
    glob: async () => ({ paths: [...bytes.keys()].sort(), notEntered: [] }),
  };
}
