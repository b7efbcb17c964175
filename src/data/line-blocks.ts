/**
 * Turns a file's byte pieces (as a {@link RepoReader} streams them, split anywhere) into
 * blocks that end right after a line feed, so that no line and no UTF-8 character is ever
 * split between two blocks. Both CSV paths read through this one door, which also drops a
 * UTF-8 byte-order mark and stops at the first line that is not UTF-8 (the reader, which
 * counts lines, then throws {@link encodingError}).
 */

import { isUtf8 } from 'node:buffer';
import { InputError } from '../core/errors.js';
import { SIGNATURE_BYTES, signatureOf, type FileSignature } from './file-signatures.js';

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
  /**
   * With `badUtf8`: what the file's first bytes say it is (UTF-16 text, another compression,
   * an archive or a workbook; data/file-signatures.ts), or null. Otherwise null.
   */
  signature: FileSignature | null;
  /**
   * True when the header (the first line that is not blank) does not end within the first
   * {@link MAX_HEADER_BYTES} bytes (`bytes` is then empty and nothing follows). The reader throws
   * {@link headerTooLongError}.
   */
  headerTooLong?: boolean;
  /** With `headerTooLong`: the bytes read hold a carriage return that no line feed follows. */
  loneCarriageReturn?: boolean;
}

/** The header, with any blank lines before it, must end within this many bytes of the file's start (1 MiB). */
export const MAX_HEADER_BYTES = 1024 * 1024;

const LF = 10;
const CR = 13;
const BOM = [0xef, 0xbb, 0xbf] as const;
const decoder = new TextDecoder('utf-8');

/**
 * Streams `pieces` as blocks of whole lines, checked to be UTF-8.
 *
 * A leading UTF-8 byte-order mark is dropped (line 1 stays line 1). When a line holds bytes
 * that are not UTF-8, the lines before it are still yielded, then a block with `badUtf8`
 * ends the stream: so errors always surface in file order, whatever the piece sizes.
 * An empty file yields nothing. No piece is copied except the line that straddles two pieces.
 * Until the header (the first line that is not blank) has ended, at most
 * {@link MAX_HEADER_BYTES} bytes are held: past that, a block with `headerTooLong` ends the
 * stream, so a file that is one endless line is refused before it is in memory.
 *
 * @param pieces the file's bytes in pieces of any size (an empty piece is allowed)
 */
export async function* lineBlocks(pieces: AsyncIterable<Uint8Array>): AsyncGenerator<LineBlock> {
  let pending: Uint8Array[] = [];
  let pendingBytes = 0;
  let first = true;
  /** What the file's first bytes say it is (data/file-signatures.ts), told with a bad-UTF-8 block. */
  let signature: FileSignature | null = null;
  /** Bytes handed out (or passed over as a byte-order mark) so far. */
  let consumed = 0;
  /** True once a line that is not blank has ended within the cap. */
  let headerEnded = false;

  /** The block that ends the stream for a header over the cap. */
  const tooLong = (held: Uint8Array[]): LineBlock => ({
    bytes: new Uint8Array(0),
    final: false,
    badUtf8: false,
    signature: null,
    headerTooLong: true,
    loneCarriageReturn: held.some(hasLoneCarriageReturn),
  });

  /** Checks and hands out `bytes`; false when they end the stream (bad UTF-8, header too long). */
  function* emit(bytes: Uint8Array, final: boolean): Generator<LineBlock, boolean> {
    if (first) {
      first = false;
      signature = signatureOf(bytes.subarray(0, SIGNATURE_BYTES));
      if (bytes.length >= 3 && bytes[0] === BOM[0] && bytes[1] === BOM[1] && bytes[2] === BOM[2]) {
        bytes = bytes.subarray(3);
        consumed += 3;
      } else if (signature?.otherEncoding === true) {
        // Text in another encoding (UTF-16): refused at its mark.
        yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, signature };
        return false;
      }
    }
    if (bytes.length === 0) return true;
    if (!headerEnded) {
      const end = headerEnd(bytes);
      if (end >= 0) headerEnded = true;
      if (consumed + (end >= 0 ? end : bytes.length) > MAX_HEADER_BYTES) {
        yield tooLong([bytes]);
        return false;
      }
    }
    consumed += bytes.length;
    const good = utf8Prefix(bytes);
    if (good === bytes.length) {
      yield { bytes, final, badUtf8: false, signature: null };
      return true;
    }
    if (good > 0) yield { bytes: bytes.subarray(0, good), final: false, badUtf8: false, signature: null };
    yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, signature };
    return false;
  }

  for await (const piece of pieces) {
    if (piece.length === 0) continue;
    const firstCut = piece.indexOf(LF) + 1;
    if (firstCut === 0) {
      pending.push(piece);
      pendingBytes += piece.length;
      if (!headerEnded && consumed + pendingBytes > MAX_HEADER_BYTES) {
        // Still no line end, and the header would be over the cap: stop holding bytes.
        yield tooLong(pending);
        return;
      }
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

/**
 * Offset just past the end of the first line in `bytes` that is not blank (white space only, as
 * `String.prototype.trim` defines it), or -1 when every line is blank. The end of `bytes` ends
 * its last line.
 */
function headerEnd(bytes: Uint8Array): number {
  let start = 0;
  while (start < bytes.length) {
    const lf = bytes.indexOf(LF, start);
    const end = lf === -1 ? bytes.length : lf + 1;
    if (decoder.decode(bytes.subarray(start, end)).trim() !== '') return end;
    start = end;
  }
  return -1;
}

/** True when `bytes` hold a carriage return that no line feed follows (at the end too). */
function hasLoneCarriageReturn(bytes: Uint8Array): boolean {
  for (let i = bytes.indexOf(CR); i !== -1; i = bytes.indexOf(CR, i + 1)) if (bytes[i + 1] !== LF) return true;
  return false;
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
 * The `csv-header-too-long` error: the header does not end within {@link MAX_HEADER_BYTES}.
 * @param file repository-relative path
 * @param line 1-based line where the header starts
 * @param loneCarriageReturn the bytes read hold carriage returns without line feeds
 */
export function headerTooLongError(file: string, line: number, loneCarriageReturn: boolean): InputError {
  const hint = loneCarriageReturn
    ? '. Hint: the file has CR-only line ends (as classic Mac OS wrote them), so it reads as one line: save it with LF or CRLF line ends'
    : '. Hint: a file without line feeds (not CSV text, or one record per file) reads as one line';
  return new InputError(
    'csv-header-too-long',
    `the header line does not end within the first ${MAX_HEADER_BYTES} bytes (1 MiB) of the file; expected a header of comma-separated column names on one line${hint}`,
    {
      file,
      line,
    },
  );
}

/**
 * The error a reader throws for a block that ends the stream (`badUtf8` or `headerTooLong`),
 * or null for a block of lines. Both CSV paths go through here, so they give the same error.
 * @param file repository-relative path
 * @param line 1-based line right after the lines read so far
 * @param block the block
 */
export function blockError(file: string, line: number, block: LineBlock): InputError | null {
  if (block.headerTooLong === true) return headerTooLongError(file, line, block.loneCarriageReturn === true);
  if (block.badUtf8) return encodingError(file, line, block.signature);
  return null;
}

/**
 * The `csv-encoding` error for a line that is not UTF-8.
 * @param file repository-relative path
 * @param line 1-based line holding the bad bytes
 * @param signature what the file's first bytes say it is (data/file-signatures.ts), or null
 */
export function encodingError(file: string, line: number, signature: FileSignature | null): InputError {
  const message =
    signature === null
      ? 'the line holds bytes that are not UTF-8 text; expected a UTF-8 CSV file (save it as UTF-8)'
      : `the line holds bytes that are not UTF-8 text: the file looks like ${signature.what}; expected a UTF-8 CSV file (${signature.advice})`;
  return new InputError('csv-encoding', message, { file, line });
}
