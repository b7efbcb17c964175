/**
 * Data files compressed with gzip (`.gz` names, e.g. `train.csv.gz`): their bytes are
 * decompressed as they stream (node:zlib `createGunzip`), never held whole, and the
 * decompressed size is held to the same cap as a plain file's size, so a small file that
 * expands without end (a "gzip bomb") stops at the cap.
 */

import { Readable, pipeline } from 'node:stream';
import { createGunzip } from 'node:zlib';
import { InputError } from '../core/errors.js';
import type { RepoReader } from '../repo/types.js';
import { GZIP_SIGNATURE, SIGNATURE_BYTES, signatureOf } from './file-signatures.js';

/** True when a data path names a gzip file (ends with `.gz`, any case). */
export function isGzipPath(path: string): boolean {
  return path.toLowerCase().endsWith('.gz');
}

/**
 * The file's bytes as the CSV readers read them: decompressed when {@link isGzipPath}, else as
 * stored.
 *
 * @param repo where the file lives
 * @param path repository-relative path
 * @param maxBytes cap on the decompressed bytes (the plain-file size cap)
 * @throws InputError `file-too-large` past the cap, `csv-gzip` for data that is not valid gzip
 */
export function openDataFile(repo: RepoReader, path: string, maxBytes: number): AsyncIterable<Uint8Array> {
  if (!isGzipPath(path)) return repo.stream(path);
  return gunzipPieces(repo.stream(path), path, maxBytes);
}

/**
 * Decompresses a gzip stream piece by piece (member after member, as gzip allows).
 *
 * @param pieces the compressed bytes in pieces of any size
 * @param file repository-relative path, for messages
 * @param maxBytes cap on the decompressed bytes
 */
export async function* gunzipPieces(pieces: AsyncIterable<Uint8Array>, file: string, maxBytes: number): AsyncGenerator<Uint8Array> {
  const gunzip = createGunzip();
  // The file's first bytes, for the error when they are not gzip data.
  const head = new Uint8Array(SIGNATURE_BYTES);
  let headLength = 0;
  const watched = async function* (): AsyncGenerator<Uint8Array> {
    for await (const piece of pieces) {
      if (headLength < head.length) {
        const take = piece.subarray(0, head.length - headLength);
        head.set(take, headLength);
        headLength += take.length;
      }
      yield piece;
    }
  };
  // Errors of the source or of zlib end the iteration below; the callback only keeps them from being unhandled.
  pipeline(Readable.from(watched(), { objectMode: false }), gunzip, () => undefined);
  let total = 0;
  try {
    for await (const out of gunzip as AsyncIterable<Buffer>) {
      total += out.length;
      if (total > maxBytes) {
        const mb = (maxBytes / (1024 * 1024)).toFixed(1);
        throw new InputError(
          'file-too-large',
          `the file decompresses to more than ${mb} MB (${maxBytes} bytes), over the cap; raise caps.max_file_mb in fitgate.yml`,
          { file },
        );
      }
      yield out;
    }
  } catch (error) {
    if (error instanceof InputError) throw error;
    const code = (error as { code?: unknown }).code;
    throw new InputError(
      'csv-gzip',
      `the file is named .gz but is not valid gzip data (${typeof code === 'string' ? code : 'unreadable'}); expected a file written by gzip${notGzipHint(head.subarray(0, headLength))}`,
      { file },
    );
  } finally {
    gunzip.destroy();
  }
}

/**
 * What a file named .gz holds instead, by its first bytes: another format (data/file-signatures.ts),
 * or plain text (printable ASCII, tabs and line ends), or nothing known ('').
 */
function notGzipHint(head: Uint8Array): string {
  const signature = signatureOf(head);
  if (signature !== null && signature !== GZIP_SIGNATURE) return `. Hint: the file looks like ${signature.what}; ${signature.advice}`;
  if (head.length > 0 && head.every((b) => (b >= 0x20 && b < 0x7f) || b === 0x09 || b === 0x0a || b === 0x0d))
    return '. Hint: the file starts like plain text: if it is an uncompressed CSV file, drop the `.gz` from its name';
  return '';
}
