/**
 * A {@link RepoReader} over one git commit: files are read from the commit's tree with
 * `git cat-file`, never from the working tree. The reader's root may be a sub-folder of the
 * git repository (the action's `working-directory`); nothing outside that folder is read.
 * Symbolic links are resolved inside the commit's tree only: a link whose target leaves the
 * root is refused like a `..` path.
 */
import { execFile, spawn } from 'node:child_process';
import { realpathSync } from 'node:fs';
import path from 'node:path';
import { InputError, quoteValue } from '../core/errors.js';
import { compilePatterns } from './glob-pattern.js';
import { FILE_MISSING, joinRepoPath, normaliseRepoPath, PATH_OUTSIDE, notAFileError, unreadableError } from './repo-path.js';
import type { RepoReader, EntryKind } from './types.js';

/** Options of {@link createGitRepository}. */
export interface GitRepositoryOptions {
  /** A folder inside the git work tree to run git in (absolute). */
  cwd: string;
  /** The commit to read (a SHA or any revision git understands). */
  commit: string;
  /** The reader's root as a path relative to the top of the git repository (`/` separators); default `''` (the top). */
  prefix?: string;
}

/** One entry of the commit's tree. */
interface TreeEntry {
  /** `file` (mode 100644/100755), `link` (120000) or `other` (submodules). */
  kind: 'file' | 'link' | 'other';
  /** Object id of the blob. */
  oid: string;
  /** Size in bytes of the blob. */
  size: number;
}

/** Largest number of links followed for one path (as Linux's MAXSYMLINKS). */
const MAX_LINKS = 40;

/** Most folders named by {@link safeDirectoryArgs} (a path deeper than this is cut at the top). */
const MAX_SAFE_DEPTH = 128;

/**
 * `-c safe.directory=<folder>` for `cwd` and each folder above it (as given and as real paths),
 * put before every git command fitgate runs. In a job that runs inside a container the workspace
 * belongs to another user id than the job's, and git refuses such a repository ("detected
 * dubious ownership", git 2.35.2 and later); the setting on the command line, which git reads as
 * protected configuration, lets only fitgate's own git calls read that one repository, and never
 * changes the user's git configuration. The repository's top folder is among the folders named,
 * whichever it is.
 */
export function safeDirectoryArgs(cwd: string): string[] {
  const folders = new Set<string>();
  const starts = [path.resolve(cwd)];
  try {
    starts.push(realpathSync(cwd));
  } catch {
    // A folder that cannot be resolved is named as given only.
  }
  for (const start of starts) {
    let folder = start;
    for (let depth = 0; depth < MAX_SAFE_DEPTH; depth++) {
      folders.add(folder);
      const parent = path.dirname(folder);
      if (parent === folder) break;
      folder = parent;
    }
  }
  return [...folders].flatMap((f) => ['-c', `safe.directory=${f}`]);
}

/**
 * Runs git with arguments (never through a shell) and returns standard output as bytes. Every
 * call names the work tree as a safe directory for that call only ({@link safeDirectoryArgs}).
 * @throws Error with git's standard error when git exits non-zero
 */
export function runGit(cwd: string, args: string[], maxBuffer = 64 * 1024 * 1024): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    execFile(
      'git',
      [...safeDirectoryArgs(cwd), ...args],
      { cwd, encoding: 'buffer', maxBuffer, env: { ...process.env, GIT_TERMINAL_PROMPT: '0' } },
      (error, stdout, stderr) => {
        if (error) {
          const detail = Buffer.isBuffer(stderr) ? stderr.toString('utf8').trim() : '';
          reject(new Error(`git ${args[0]} failed: ${detail || error.message}`));
        } else resolve(stdout);
      },
    );
  });
}

/**
 * The full SHA of a revision when it names a commit present in the local object store, else null
 * (unknown revision, or a shallow clone without it).
 * @param cwd a folder inside the git work tree
 * @param revision a SHA, branch, tag or expression such as `HEAD^1`
 */
export async function tryResolveCommit(cwd: string, revision: string): Promise<string | null> {
  if (revision.startsWith('-')) return null;
  try {
    const out = await runGit(cwd, ['rev-parse', '--verify', '--quiet', '--end-of-options', `${revision}^{commit}`]);
    const sha = out.toString('utf8').trim();
    return /^[0-9a-f]{40,64}$/.test(sha) ? sha : null;
  } catch {
    return null;
  }
}

/**
 * The top folder of the git work tree that contains `dir` (absolute), or null when `dir` is not
 * inside a git work tree.
 */
export async function tryGitTopLevel(dir: string): Promise<string | null> {
  try {
    const out = await runGit(dir, ['rev-parse', '--show-toplevel']);
    const top = out.toString('utf8').trim();
    return top === '' ? null : top;
  } catch {
    return null;
  }
}

/** Normalises a repository-relative path; null when it is absolute or leaves the root. */
function normalise(p: string): string | null {
  try {
    return normaliseRepoPath(p);
  } catch {
    return null;
  }
}

/** Parses `git ls-tree -r -l -z --full-tree` output into entries by path (relative to `prefix`). */
function parseTree(out: Buffer, prefix: string): Map<string, TreeEntry> {
  const entries = new Map<string, TreeEntry>();
  const lead = prefix === '' ? '' : `${prefix}/`;
  for (const record of out.toString('utf8').split('\0')) {
    if (record === '') continue;
    const tab = record.indexOf('\t');
    const [mode, , oid, size] = record.slice(0, tab).split(/ +/);
    const full = record.slice(tab + 1);
    if (!full.startsWith(lead)) continue;
    const rel = full.slice(lead.length);
    const kind = mode === '120000' ? 'link' : mode === '100644' || mode === '100755' ? 'file' : 'other';
    entries.set(rel, { kind, oid, size: Number(size) || 0 });
  }
  return entries;
}

/**
 * A reader of the files of one commit under `prefix`. The tree is listed once, on first use.
 * @param options git folder, commit and root prefix
 */
export function createGitRepository(options: GitRepositoryOptions): RepoReader {
  const { cwd, commit } = options;
  const prefix = normalise(options.prefix ?? '') ?? '';
  const label = `base commit ${commit.slice(0, 7)}`;
  let listing: Promise<Map<string, TreeEntry>> | null = null;
  const tree = (): Promise<Map<string, TreeEntry>> => {
    listing ??= runGit(cwd, ['ls-tree', '-r', '-l', '-z', '--full-tree', commit], 1024 * 1024 * 1024).then((out) => parseTree(out, prefix));
    return listing;
  };
  const outside = (file: string, where: { file?: string; line?: number; column?: number; key?: string }, target: string): InputError =>
    new InputError(PATH_OUTSIDE, `path ${quoteValue(target)} leaves the repository through a link in ${label}; expected a path inside it`, {
      file: where.file ?? file,
      line: where.line,
      column: where.column,
      key: where.key,
    });
  const missing = (file: string): InputError =>
    new InputError(FILE_MISSING, `no such file in ${label}; expected an existing file`, { file });

  /**
   * Follows links component by component inside the tree. Returns the final path and its entry
   * (undefined when nothing is there), or null when a link leaves the root.
   */
  async function realPath(p: string): Promise<{ path: string; entry: TreeEntry | undefined } | null> {
    const entries = await tree();
    let parts = p === '' ? [] : p.split('/');
    let done: string[] = [];
    let hops = 0;
    while (parts.length > 0) {
      const next = [...done, parts[0]].join('/');
      const entry = entries.get(next);
      if (entry?.kind === 'link') {
        hops += 1;
        if (hops > MAX_LINKS) return null;
        const target = (await runGit(cwd, ['cat-file', 'blob', entry.oid])).toString('utf8');
        const joined = target.startsWith('/') ? null : normalise(path.posix.join(done.join('/'), target));
        if (joined === null) return null;
        parts = [...(joined === '' ? [] : joined.split('/')), ...parts.slice(1)];
        done = [];
        continue;
      }
      done.push(parts[0]);
      parts = parts.slice(1);
    }
    const final = done.join('/');
    return { path: final, entry: entries.get(final) };
  }

  /** What `p` names (links followed inside the tree), with its entry when it is a file. */
  async function kindOf(p: string): Promise<{ kind: EntryKind; entry: TreeEntry | null }> {
    const n = normalise(p);
    if (n === null) throw outside(p, {}, p);
    const real = await realPath(n);
    if (real === null) throw outside(p, {}, p);
    const entry = real.entry;
    if (entry?.kind === 'file') return { kind: 'file', entry };
    if (entry?.kind === 'other') return { kind: 'special', entry: null };
    // Not an entry of the tree: a folder (entries below it), a link that leads nowhere, or nothing.
    const entries = await tree();
    const below = real.path === '' ? '' : `${real.path}/`;
    for (const key of entries.keys()) if (key.startsWith(below)) return { kind: 'folder', entry: null };
    return { kind: real.path !== n || entries.get(n)?.kind === 'link' ? 'broken-link' : 'missing', entry: null };
  }

  /** The blob entry of a regular file at `p` (links followed), or an InputError. */
  async function fileEntry(p: string): Promise<TreeEntry> {
    const { kind, entry } = await kindOf(p);
    if (kind === 'missing') throw missing(normalise(p) ?? p);
    if (kind !== 'file' || entry === null) throw notAFileError(kind === 'file' ? 'special' : kind, { file: p });
    return entry;
  }

  /** Runs git for the bytes of a file; git's failure (a damaged object store) is `file-unreadable`. */
  async function blob(p: string, args: string[], maxBuffer?: number): Promise<Buffer> {
    try {
      return await runGit(cwd, args, maxBuffer);
    } catch (error) {
      throw unreadableError(error, { file: p });
    }
  }

  return {
    label,
    async resolve(fromFile, target, where) {
      const joined = joinRepoPath(fromFile, target, { file: fromFile, ...where });
      if ((await realPath(joined)) === null) throw outside(fromFile, { file: fromFile, ...where }, target);
      return joined;
    },
    async isFile(p) {
      const n = normalise(p);
      if (n === null) return false;
      const real = await realPath(n);
      return real?.entry?.kind === 'file';
    },
    async entryKind(p) {
      return (await kindOf(p)).kind;
    },
    async size(p) {
      return (await fileEntry(p)).size;
    },
    async read(p) {
      const entry = await fileEntry(p);
      return new Uint8Array(await blob(p, ['cat-file', 'blob', entry.oid], Math.max(entry.size + 1024, 1024 * 1024)));
    },
    async *stream(p, chunkBytes = 1024 * 1024) {
      const entry = await fileEntry(p);
      const child = spawn('git', [...safeDirectoryArgs(cwd), 'cat-file', 'blob', entry.oid], { cwd, stdio: ['ignore', 'pipe', 'ignore'] });
      const closed = new Promise<number | null>((resolve, reject) => {
        child.on('error', reject);
        child.on('close', resolve);
      });
      let pending: Buffer[] = [];
      let pendingBytes = 0;
      for await (const piece of child.stdout as AsyncIterable<Buffer>) {
        pending.push(piece);
        pendingBytes += piece.length;
        if (pendingBytes >= chunkBytes) {
          yield new Uint8Array(Buffer.concat(pending));
          pending = [];
          pendingBytes = 0;
        }
      }
      const code = await closed;
      if (code !== 0) throw unreadableError({ code: `git cat-file exit status ${code}` }, { file: p });
      if (pendingBytes > 0) yield new Uint8Array(Buffer.concat(pending));
    },
    async glob(patterns) {
      const compiled = compilePatterns(patterns);
      const entries = await tree();
      const paths: string[] = [];
      const notEntered: string[] = [];
      for (const [p, entry] of entries) {
        if (entry.kind === 'other') continue; // a submodule is a folder of another repository
        if (compiled.matches(p)) paths.push(p);
        // A link a pattern would search below is never followed as a folder (as on disk).
        if (entry.kind === 'link' && compiled.searchesBelow(p)) notEntered.push(p);
      }
      return { paths: paths.sort(), notEntered: notEntered.sort() };
    },
  };
}
