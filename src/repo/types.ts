/**
 * The one door to the user's files. Every read of settings, descriptors and data goes
 * through a {@link RepoReader}, which refuses any path that leaves the repository root
 * (`..`, absolute paths, and symbolic links whose target is outside). The disk version
 * reads the working tree; others read a git commit or memory (tests).
 */

/**
 * What a repository-relative path names, links followed inside the root: a regular `file`,
 * nothing (`missing`), a `folder`, a symbolic link that leads nowhere (`broken-link`), or
 * something that is not a regular file (`special`: a FIFO, socket, device, or a git submodule).
 */
export type EntryKind = 'file' | 'missing' | 'folder' | 'broken-link' | 'special';

/** What {@link RepoReader.glob} found. */
export interface GlobResult {
  /**
   * Repository-relative paths the patterns match that are not folders, sorted: regular files,
   * and also links and special files (reading one of those gives its error, so that nothing a
   * pattern names is skipped in silence).
   */
  paths: string[];
  /** Symbolic links a pattern would search below, which are never followed as folders. Sorted. */
  notEntered: string[];
}

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
  /**
   * What the path names (see {@link EntryKind}). Throws InputError `path-outside` like
   * {@link RepoReader.isFile}.
   */
  entryKind(path: string): Promise<EntryKind>;
  /**
   * Size in bytes. Throws InputError `file-missing` when absent, `not-a-file` when the path
   * names something else than a regular file, `file-unreadable` when the system cannot read it.
   */
  size(path: string): Promise<number>;
  /** The whole file. Throws InputError as {@link RepoReader.size}, and `path-outside` when it escapes. */
  read(path: string): Promise<Uint8Array>;
  /** The file in pieces of about `chunkBytes` (default 1 MiB), for large data files. Errors as {@link RepoReader.read}. */
  stream(path: string, chunkBytes?: number): AsyncIterable<Uint8Array>;
  /**
   * What the glob patterns match (see glob-pattern.ts for the rules, which every reader shares).
   * Throws InputError `path-outside` or `glob-too-complex` for a refused pattern.
   */
  glob(patterns: string[]): Promise<GlobResult>;
}
