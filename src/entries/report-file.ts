/**
 * Reports given as pieces (the reporters' generators), written without ever being joined into one
 * string: {@link batches} groups them into buffers of {@link WRITE_BUFFER_BYTES} for a file (written
 * by safe-write.ts: atomically, never through a link) or for standard output
 * ({@link writeReportStream}).
 */
import type { Writable } from 'node:stream';

/** Bytes gathered before each write. */
export const WRITE_BUFFER_BYTES = 1 << 20;

/**
 * Groups pieces into strings of about {@link WRITE_BUFFER_BYTES} UTF-16 units (one buffer each).
 * A piece of bytes (UTF-8 text already) ends the batch before it and is handed on as a copy of
 * its own (the source may use its buffer again for the next piece).
 */
export function* batches(pieces: Iterable<string | Uint8Array>): Generator<string | Uint8Array> {
  let parts: string[] = [];
  let size = 0;
  for (const piece of pieces) {
    if (typeof piece !== 'string') {
      if (size > 0) yield parts.join('');
      parts = [];
      size = 0;
      if (piece.length > 0) yield Buffer.from(piece);
      continue;
    }
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

/**
 * Writes the pieces to a stream (standard output), waiting for it to drain whenever its buffer is
 * full, so that memory stays at one buffer whatever the report's size.
 * @param stream where to write (`process.stdout`)
 * @param pieces the report's text in pieces
 */
export async function writeReportStream(stream: Writable, pieces: Iterable<string | Uint8Array>): Promise<void> {
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
