/**
 * Writing a report given as pieces (the reporters' generators) to a file or to standard output,
 * without ever joining it into one string: a run of any number of models is written in buffers of
 * {@link WRITE_BUFFER_BYTES}.
 *
 * A file is written atomically and never through a link: the pieces go to a new temporary file in
 * the same folder, opened with `O_CREAT | O_EXCL | O_NOFOLLOW` (never an existing file, never a
 * link), flushed with `fsync`, and renamed over the target (`rename(2)` replaces the name in one
 * step and replaces a link rather than following it). A target that is a link or not a regular
 * file is refused. A write that fails midway leaves the previous file, and the temporary file is
 * removed.
 */
import { closeSync, constants, fsyncSync, lstatSync, mkdirSync, openSync, renameSync, unlinkSync, writeSync } from 'node:fs';
import path from 'node:path';
import type { Writable } from 'node:stream';
import { InputError } from '../core/errors.js';

/** Bytes gathered before each write. */
export const WRITE_BUFFER_BYTES = 1 << 20;

/** Error code of a target refused before writing (a link, a folder). */
export const OUTPUT_REFUSED = 'output-refused';

/** Groups pieces into strings of about {@link WRITE_BUFFER_BYTES} UTF-16 units (one buffer each). */
function* batches(pieces: Iterable<string>): Generator<string> {
  let parts: string[] = [];
  let size = 0;
  for (const piece of pieces) {
    parts.push(piece);
    size += piece.length;
    if (size >= WRITE_BUFFER_BYTES) {
      yield parts.join('');
      parts = [];
      size = 0;
    }
  }
  if (size > 0) yield parts.join('');
}

function codeOf(error: unknown): string | undefined {
  return (error as NodeJS.ErrnoException | null)?.code;
}

/** Refuses a target that is a link or not a regular file; a missing target is fine. */
function checkTarget(file: string, option: string): void {
  let info;
  try {
    info = lstatSync(file);
  } catch (error) {
    if (codeOf(error) === 'ENOENT') return;
    throw error;
  }
  if (info.isSymbolicLink()) throw new InputError(OUTPUT_REFUSED, `${file} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`, { key: option });
  if (!info.isFile()) throw new InputError(OUTPUT_REFUSED, `${file} is not a regular file; expected a file to replace, or no file`, { key: option });
}

/**
 * Writes the pieces to `file` atomically (see the module comment); its folder is made when missing.
 * @param file the target, absolute or relative to the process's folder
 * @param pieces the report's text in pieces
 * @param option the option or input that named the file, for messages (`--out`, `html`)
 * @throws InputError `output-refused` for a link or a folder as target; the file system's error when a write fails
 */
export function writeReportFile(file: string, pieces: Iterable<string>, option: string): void {
  const target = path.resolve(file);
  const folder = path.dirname(target);
  mkdirSync(folder, { recursive: true });
  checkTarget(target, option);
  const temp = path.join(folder, `.${path.basename(target).slice(0, 100)}.${process.pid}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}.tmp`);
  const fd = openSync(temp, constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | (constants.O_NOFOLLOW ?? 0), 0o666);
  let open = true;
  try {
    for (const text of batches(pieces)) {
      const bytes = Buffer.from(text, 'utf8');
      // Each round writes at least one byte, so this ends after at most bytes.length rounds.
      for (let offset = 0; offset < bytes.length; ) {
        const n = writeSync(fd, bytes, offset, bytes.length - offset);
        if (!(n > 0)) throw new Error(`the write to ${temp} made no progress`);
        offset += n;
      }
    }
    fsyncSync(fd);
    closeSync(fd);
    open = false;
    checkTarget(target, option);
    renameSync(temp, target);
  } catch (error) {
    if (open) closeSync(fd);
    try {
      unlinkSync(temp);
    } catch {
      // already gone
    }
    throw error;
  }
}

/**
 * Writes the pieces to a stream (standard output), waiting for it to drain whenever its buffer is
 * full, so that memory stays at one buffer whatever the report's size.
 * @param stream where to write (`process.stdout`)
 * @param pieces the report's text in pieces
 */
export async function writeReportStream(stream: Writable, pieces: Iterable<string>): Promise<void> {
  for (const text of batches(pieces)) {
    // A closed pipe (`fitgate check | head`) takes nothing more; the run's outcome stands.
    if (stream.destroyed) return;
    if (!stream.write(text)) await drained(stream);
  }
}

/** Resolves when the stream drains, closes or fails, whichever comes first. */
function drained(stream: Writable): Promise<void> {
  return new Promise<void>((resolve) => {
    const done = (): void => {
      stream.off('drain', done);
      stream.off('close', done);
      stream.off('error', done);
      resolve();
    };
    stream.on('drain', done);
    stream.on('close', done);
    stream.on('error', done);
  });
}
