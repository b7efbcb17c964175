/**
 * Writing one report file: never through a symbolic link, and atomically. Every file fitgate
 * writes (`--out`, `--html`, `--sarif`, `--junit`, the action's `html` / `sarif` / `junit`, the
 * JSON report under `RUNNER_TEMP`) goes through {@link writeFileSafely}:
 *
 * 1. The folder is checked before anything is created: its deepest existing part is resolved
 *    with `realpath(3)`, and when the path was named inside one of the boundary folders (the
 *    action's workspace; the CLI's repository root and working directory) that real path must
 *    lie inside the boundary's real path. Missing folders are then made one at a time inside the
 *    real folder, each checked to be a plain folder and not a link.
 * 2. A target that is a symbolic link, or not a regular file (a folder, a device, a pipe), is
 *    refused; nothing is written through it.
 * 3. The bytes go to a new temporary file in the same real folder, opened with
 *    `O_CREAT | O_EXCL | O_NOFOLLOW` (never an existing file, never a link), written in full,
 *    flushed with `fsync`, closed, and renamed over the target (`rename(2)` replaces the name in
 *    one step, and replaces a link rather than following it). A run that is killed or fails
 *    mid-way (a full disk) leaves the previous complete file, never an empty or cut one; a
 *    temporary file that fails is removed.
 *
 * Every refusal and failure is an InputError whose key is the option that named the path.
 */
import {
  closeSync,
  constants,
  fsyncSync,
  lstatSync,
  mkdirSync,
  openSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import path from 'node:path';
import { InputError, quoteValue } from '../core/errors.js';
import { isInsideFolder } from '../repo/real-folder.js';
import { WRITE_BUFFER_BYTES } from './report-file.js';

/**
 * The UTF-8 bytes of `pieces`, in batches of up to {@link WRITE_BUFFER_BYTES}, each encoded into
 * one buffer that is used again for the next batch (the caller writes each batch before asking
 * for the next): a report of any size is written through one buffer, with no string or buffer
 * per batch left for the garbage collector. A piece that could need more than the whole buffer
 * (3 bytes per UTF-16 unit at most) is its own batch. A piece of bytes (UTF-8 text already) is
 * copied in as it is, or is its own batch when larger than the buffer.
 */
function* encodedBatches(pieces: Iterable<string | Uint8Array>): Generator<Uint8Array> {
  const buffer = Buffer.allocUnsafe(WRITE_BUFFER_BYTES);
  let used = 0;
  for (const piece of pieces) {
    if (typeof piece !== 'string') {
      if (piece.length > buffer.length - used) {
        if (used > 0) yield buffer.subarray(0, used);
        used = 0;
        if (piece.length > buffer.length) {
          yield piece;
          continue;
        }
      }
      buffer.set(piece, used);
      used += piece.length;
      continue;
    }
    const most = piece.length * 3;
    if (most > buffer.length - used) {
      if (used > 0) yield buffer.subarray(0, used);
      used = 0;
      if (most > buffer.length) {
        yield Buffer.from(piece, 'utf8');
        continue;
      }
    }
    used += buffer.write(piece, used, 'utf8');
  }
  if (used > 0) yield buffer.subarray(0, used);
}

/** Error code of a target refused before writing (a link, not a file, a folder leading outside). */
export const OUTPUT_REFUSED = 'output-refused';
/** Error code of a write that failed (a full disk, no permission): the previous file is kept. */
export const OUTPUT_FAILED = 'output-failed';

/** Where a file may be written. */
export interface WritePlace {
  /** The option or input that named the path (`--out`, `html`), named in every message. */
  option: string;
  /**
   * Boundary folders (absolute, existing). A path named inside one of them (the most specific
   * one that holds it as written) must really stay inside it: its folder's real path must lie
   * inside that boundary's real path. Empty: no boundary.
   */
  within: readonly string[];
  /**
   * Refuse a path named outside every boundary (the action, whose files must be in the
   * workspace). Default false: a folder named outside them is used as named (the CLI's user named
   * it), still without writing through a link.
   */
  insideOnly?: boolean;
}

/** Replaceable file operations, for tests (a write that fails mid-way). */
export interface WriteHooks {
  /** As `fs.writeSync(fd, bytes, offset, length)`: returns the bytes written. Default `fs.writeSync`. */
  write?: (fd: number, bytes: Uint8Array, offset: number, length: number) => number;
}

/** Most folder levels walked up to the deepest existing one (a path deeper than this is refused). */
const MAX_DEPTH = 256;

/** Tries at a fresh temporary name before giving up (another writer in the same folder). */
const MAX_TEMP_TRIES = 8;

function codeOf(error: unknown): string | undefined {
  return (error as NodeJS.ErrnoException | null)?.code;
}

/**
 * Writes `data` to `file` without following a link, atomically (see the module comment).
 * @param file the target, absolute or relative to the process's folder
 * @param data the file's content (a string is written as UTF-8)
 * @param place the option that named it and the boundary folders; see {@link WritePlace}
 * @param hooks replaced file operations, for tests; default none
 * @returns the real path written
 * @throws InputError `output-refused` (nothing was written, the previous file is unchanged) or
 *   `output-failed` (the write failed; the previous file is unchanged, the temporary file removed)
 */
export function writeFileSafely(
  file: string,
  data: string | Uint8Array | Iterable<string | Uint8Array>,
  place: WritePlace,
  hooks: WriteHooks = {},
): string {
  const { named, realDir, target, refuse, failed } = prepareTarget(file, place);

  // 3. A temporary file in the same folder, then rename.
  // A report in pieces is written in batches of up to 1 MiB through one buffer: never held as one string.
  const chunks: Iterable<Uint8Array> =
    typeof data === 'string' ? [Buffer.from(data, 'utf8')] : data instanceof Uint8Array ? [data] : encodedBatches(data);
  const write = hooks.write ?? ((fd: number, b: Uint8Array, offset: number, length: number) => writeSync(fd, b, offset, length));
  const { fd: opened, temp } = openTemp(realDir, path.basename(target), 'tmp', constants.O_WRONLY, failed);
  let fd = opened;
  try {
    for (const bytes of chunks) {
      // Each round writes at least one byte, so this ends after at most bytes.length rounds.
      for (let offset = 0; offset < bytes.length; ) {
        const n = write(fd, bytes, offset, bytes.length - offset);
        if (!(n > 0)) throw new Error('the write made no progress');
        offset += n;
      }
    }
    fsyncSync(fd);
    closeSync(fd);
    fd = -1;
    // The folder must still be the one checked (no link swapped in while writing).
    if (realpathSync(realDir) !== realDir) throw refuse(`the folder of ${named} changed while it was written; nothing was replaced`);
    checkTarget(target, named, refuse);
    renameSync(temp, target);
  } catch (error) {
    if (fd >= 0) {
      try {
        closeSync(fd);
      } catch {
        // already failing; the first error is the one reported
      }
    }
    try {
      unlinkSync(temp);
    } catch {
      // gone already
    }
    throw failed(error);
  }
  syncFolder(realDir);
  return target;
}

/** A new temporary file that {@link openTempBeside} opened. */
export interface TempFile {
  /** Its descriptor, open for reading and writing. */
  fd: number;
  /** Its path (in the real folder of the target). */
  path: string;
}

/**
 * Opens a new temporary file in the folder `file` would be written to, checked as
 * {@link writeFileSafely} checks it (steps 1 and 2 of the module comment: the folder made when
 * missing, its real path inside the boundary; the target not a link and not a special file),
 * created with `O_CREAT | O_EXCL | O_NOFOLLOW` (never an existing file, never a link) and open
 * for reading and writing. For data a writer gathers on disk before it writes `file` itself (the
 * model spool, entries/model-spool.ts); the caller closes and removes it.
 * @param file the target the data is for, absolute or relative to the process's folder
 * @param place the option that named it and the boundary folders; see {@link WritePlace}
 * @param suffix the end of the temporary file's name (after a dot), e.g. `spool`
 * @throws InputError `output-refused` or `output-failed`, as {@link writeFileSafely} would for `file`
 */
export function openTempBeside(file: string, place: WritePlace, suffix: string): TempFile {
  const { realDir, target, failed } = prepareTarget(file, place);
  const { fd, temp } = openTemp(realDir, path.basename(target), suffix, constants.O_RDWR, failed);
  return { fd, path: temp };
}

/** A target checked by steps 1 and 2 of the module comment, with its error makers. */
interface PreparedTarget {
  /** The path as named, resolved. */
  named: string;
  /** The real folder it is written in. */
  realDir: string;
  /** The file in the real folder. */
  target: string;
  refuse: (message: string) => InputError;
  failed: (error: unknown) => InputError;
}

/** Steps 1 and 2 of the module comment for `file`; throws the InputError writeFileSafely would. */
function prepareTarget(file: string, place: WritePlace): PreparedTarget {
  const where = { key: place.option };
  const refuse = (message: string): InputError => new InputError(OUTPUT_REFUSED, message, where);
  if (file === '' || file.includes('\0')) throw refuse(`expected a file path, got ${quoteValue(file)}`);
  const named = path.resolve(file);
  const name = path.basename(named);
  const folder = path.dirname(named);
  if (name === '' || folder === named) throw refuse(`${named} names no file; expected a file path`);
  const failed = (error: unknown): InputError =>
    error instanceof InputError
      ? error
      : new InputError(
          OUTPUT_FAILED,
          `could not write ${named} (${codeOf(error) ?? (error instanceof Error ? error.message : String(error))}); the previous file, if any, is unchanged`,
          where,
        );

  // 1. The boundary that holds the path as written, and the real folder.
  const bases = place.within.filter((b) => isInsideFolder(b, folder)).sort((a, b) => b.length - a.length);
  const base = bases[0] ?? null;
  if (base === null && place.insideOnly) throw refuse(`${named} is outside ${place.within.join(' and ')}; expected a path inside`);
  try {
    const realDir = makeFolder(folder, base, refuse);
    // 2. The target itself.
    const target = path.join(realDir, name);
    checkTarget(target, named, refuse);
    return { named, realDir, target, refuse, failed };
  } catch (error) {
    throw failed(error);
  }
}

/**
 * A new file `.NAME.PID.RANDOM.SUFFIX` in `realDir`, opened with `access | O_CREAT | O_EXCL |
 * O_NOFOLLOW` (a fresh name is tried when one exists, at most {@link MAX_TEMP_TRIES} times).
 */
function openTemp(
  realDir: string,
  name: string,
  suffix: string,
  access: number,
  failed: (error: unknown) => InputError,
): { fd: number; temp: string } {
  const flags = access | constants.O_CREAT | constants.O_EXCL | (constants.O_NOFOLLOW ?? 0);
  for (let attempt = 0; ; attempt++) {
    const temp = path.join(
      realDir,
      `.${name.slice(0, 100)}.${process.pid}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}.${suffix}`,
    );
    try {
      return { fd: openSync(temp, flags, 0o666), temp };
    } catch (error) {
      if (codeOf(error) !== 'EEXIST' || attempt + 1 >= MAX_TEMP_TRIES) throw failed(error);
    }
  }
}

/**
 * The real path of `folder`, made when missing. The deepest existing part is resolved and, when
 * `base` is given, must lie inside the real path of `base`; each missing folder is then made
 * inside that real path and checked to be a folder and not a link.
 */
function makeFolder(folder: string, base: string | null, refuse: (message: string) => InputError): string {
  const missing: string[] = [];
  let existing = folder;
  for (let depth = 0; ; depth++) {
    if (depth > MAX_DEPTH) throw refuse(`${folder} is more than ${MAX_DEPTH} folders deep`);
    try {
      lstatSync(existing);
      break;
    } catch (error) {
      const code = codeOf(error);
      if (code !== 'ENOENT' && code !== 'ENOTDIR') throw error;
    }
    const parent = path.dirname(existing);
    if (parent === existing) break;
    missing.unshift(path.basename(existing));
    existing = parent;
  }
  let real: string;
  try {
    real = realpathSync(existing);
  } catch (error) {
    const code = codeOf(error);
    if (code === 'ENOENT' || code === 'ELOOP')
      throw refuse(`${existing} is a symbolic link that leads nowhere or round a loop; expected a folder`);
    throw error;
  }
  if (!statSync(real).isDirectory()) throw refuse(`${existing} is not a folder; expected a folder to write in`);
  if (base !== null && !isInsideFolder(realpathSync(base), real)) {
    throw refuse(`${folder} leads out of ${base} through a symbolic link; expected a folder whose real path is inside it`);
  }
  for (const part of missing) {
    real = path.join(real, part);
    try {
      mkdirSync(real);
    } catch (error) {
      if (codeOf(error) !== 'EEXIST') throw error;
    }
    const info = lstatSync(real);
    if (!info.isDirectory())
      throw refuse(`${real} is ${info.isSymbolicLink() ? 'a symbolic link' : 'not a folder'}; expected a folder to write in`);
  }
  return real;
}

/** Refuses a target that is a symbolic link or not a regular file; a missing target is fine. */
function checkTarget(target: string, named: string, refuse: (message: string) => InputError): void {
  let info: ReturnType<typeof lstatSync>;
  try {
    info = lstatSync(target);
  } catch (error) {
    if (codeOf(error) === 'ENOENT') return;
    throw error;
  }
  if (info.isSymbolicLink())
    throw refuse(`${named} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`);
  if (!info.isFile()) throw refuse(`${named} is not a regular file (a folder, device or pipe); expected a file to replace, or no file`);
}

/** Flushes the folder's entry list (the rename) to disk where the platform allows; best effort. */
function syncFolder(dir: string): void {
  let fd = -1;
  try {
    fd = openSync(dir, constants.O_RDONLY);
    fsyncSync(fd);
  } catch {
    // Not every platform opens or syncs a folder; the file itself is already synced.
  }
  if (fd >= 0) {
    try {
      closeSync(fd);
    } catch {
      // nothing left to do
    }
  }
}
