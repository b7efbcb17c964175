/**
 * The one door to the user's files. Every read of settings, descriptors and data goes
 * through a {@link RepoReader}, which refuses any path that leaves the repository root
 * (`..`, absolute paths, and symbolic links whose target is outside). The disk version
 * reads the working tree; others read a git commit or memory (tests).
 */

/** Reads files of one repository by repository-relative path (`/` separators). */
export interface RepoReader {
  /** A label for messages, e.g. the working tree's path or `base commit abc1234`. */
  readonly label: string;
  /**
   * Resolves `target` as written in the file `fromFile` (both repository-relative; `target`
   * relative to `fromFile`'s folder) to a normalised repository-relative path.
   * Throws an InputError (`path-outside`) naming `fromFile`, `line` and `key` when the path
   * is absolute, leaves the root, or resolves through a link to outside the root.
   */
  resolve(fromFile: string, target: string, where: { line?: number; column?: number; key?: string }): Promise<string>;
  /** True when the repository-relative path names a regular file (links followed inside the root only). */
  isFile(path: string): Promise<boolean>;
  /** Size in bytes; throws InputError `file-missing` when absent. */
  size(path: string): Promise<number>;
  /** The whole file. Throws InputError `file-missing` when absent, `path-outside` when it escapes. */
  read(path: string): Promise<Uint8Array>;
  /** The file in pieces of about `chunkBytes` (default 1 MiB), for large data files. */
  stream(path: string, chunkBytes?: number): AsyncIterable<Uint8Array>;
  /** Repository-relative paths of regular files matching any glob pattern, sorted. */
  glob(patterns: string[]): Promise<string[]>;
}
