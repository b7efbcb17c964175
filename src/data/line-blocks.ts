/**
 * Turns a file's byte pieces (as a {@link RepoReader} streams them, split anywhere) into
 * blocks that end right after a line feed, so that no line and no UTF-8 character is ever
 * split between two blocks. Both CSV paths read through this one door, which also drops a
 * UTF-8 byte-order mark and stops at the first line that is not UTF-8 (the reader, which
 * counts lines, then throws {@link encodingError}).
 */

import { isUtf8 } from 'node:buffer';
import { InputError } from '../core/errors.js';

/** One block of whole lines, or the news that the next line is not UTF-8. */
export interface LineBlock {
  /** The bytes: whole lines, each ending with `\n`, except possibly the last line of the file. */
  bytes: Uint8Array;
  /** True for the file's last block (its last line may lack the `\n`). */
  final: boolean;
  /**
   * True when the line right after all bytes yielded so far holds bytes that are not UTF-8
   * (`bytes` is then empty and nothing follows). The reader, which counts lines, throws
   * {@link encodingError} with that line's number.
   */
  badUtf8: boolean;
  /** With `badUtf8`: the file starts with a UTF-16 byte-order mark. */
  utf16: boolean;
}

const LF = 10;
const BOM = [0xef, 0xbb, 0xbf] as const;

/**
 * Streams `pieces` as blocks of whole lines, checked to be UTF-8.
 *
 * A leading UTF-8 byte-order mark is dropped (line 1 stays line 1). When a line holds bytes
 * that are not UTF-8, the lines before it are still yielded, then a block with `badUtf8`
 * ends the stream: so errors always surface in file order, whatever the piece sizes.
 * An empty file yields nothing. No piece is copied except the line that straddles two pieces.
 *
 * @param pieces the file's bytes in pieces of any size (an empty piece is allowed)
 */
export async function* lineBlocks(pieces: AsyncIterable<Uint8Array>): AsyncGenerator<LineBlock> {
  let pending: Uint8Array[] = [];
  let pendingBytes = 0;
  let first = true;

  /** Checks and hands out `bytes`; false when they end the stream (bad UTF-8). */
  function* emit(bytes: Uint8Array, final: boolean): Generator<LineBlock, boolean> {
    if (first) {
      first = false;
      if (bytes.length >= 3 && bytes[0] === BOM[0] && bytes[1] === BOM[1] && bytes[2] === BOM[2]) bytes = bytes.subarray(3);
      else if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))) {
        yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, utf16: true };
        return false;
      }
    }
    if (bytes.length === 0) return true;
    const good = utf8Prefix(bytes);
    if (good === bytes.length) {
      yield { bytes, final, badUtf8: false, utf16: false };
      return true;
    }
    if (good > 0) yield { bytes: bytes.subarray(0, good), final: false, badUtf8: false, utf16: false };
    yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, utf16: false };
    return false;
  }

  for await (const piece of pieces) {
    if (piece.length === 0) continue;
    const firstCut = piece.indexOf(LF) + 1;
    if (firstCut === 0) {
      pending.push(piece);
      pendingBytes += piece.length;
      continue;
    }
    // The line that straddles the previous pieces and this one, then this piece's whole lines.
    const lastCut = piece.lastIndexOf(LF) + 1;
    if (pendingBytes > 0) {
      const joined = concat([...pending, piece.subarray(0, firstCut)], pendingBytes + firstCut);
      if (!(yield* emit(joined, false))) return;
      if (lastCut > firstCut && !(yield* emit(piece.subarray(firstCut, lastCut), false))) return;
    } else if (!(yield* emit(piece.subarray(0, lastCut), false))) return;
    pending = lastCut < piece.length ? [piece.subarray(lastCut)] : [];
    pendingBytes = piece.length - lastCut;
  }
  if (pendingBytes > 0) yield* emit(concat(pending, pendingBytes), true);
}

function concat(parts: Uint8Array[], total: number): Uint8Array {
  if (parts.length === 1) return parts[0];
  const out = new Uint8Array(total);
  let at = 0;
  for (const part of parts) {
    out.set(part, at);
    at += part.length;
  }
  return out;
}

/** Length of the longest run of whole UTF-8 lines at the start of `bytes`. */
function utf8Prefix(bytes: Uint8Array): number {
  if (isUtf8(bytes)) return bytes.length;
  let start = 0;
  while (start < bytes.length) {
    const lf = bytes.indexOf(LF, start);
    const end = lf === -1 ? bytes.length : lf + 1;
    if (!isUtf8(bytes.subarray(start, end))) break;
    start = end;
  }
  return start;
}

/**
 * The `csv-encoding` error for a line that is not UTF-8.
 * @param file repository-relative path
 * @param line 1-based line holding the bad bytes
 * @param utf16 the file starts with a UTF-16 byte-order mark
 */
export function encodingError(file: string, line: number, utf16: boolean): InputError {
  const hint = utf16 ? ' (the file looks like UTF-16)' : '';
  return new InputError('csv-encoding', `the line holds bytes that are not UTF-8 text${hint}; expected a UTF-8 CSV file (save it as UTF-8)`, {
    file,
    line,
  });
}
