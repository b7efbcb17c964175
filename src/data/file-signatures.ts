/**
 * What a data file that is not UTF-8 text most likely is, told by its first bytes (the "magic
 * numbers" each format starts with), so that the encoding error says what to do with it: a
 * compressed file of another kind, an archive or a spreadsheet workbook instead of CSV text.
 *
 * Sources of the signatures: The Unicode Standard (the UTF-16 byte-order marks); RFC 1952 (gzip);
 * the .xz file format specification; bzip2's stream header `BZh` (as bzip2 1.0 writes it; from
 * memory); RFC 8878 (the Zstandard frame's magic number); PKWARE's APPNOTE.TXT (the ZIP local file
 * header; .xlsx, .docx and .ods files are ZIP archives); 7-Zip's 7zFormat.txt; [MS-CFB] (the
 * Compound File Binary header of legacy Office files); the Apache Parquet format (`PAR1`).
 * test/data/file-signatures.test.ts checks the gzip, bzip2, xz and ZIP signatures against files
 * that Python's standard library writes.
 */
import { maxOf } from '../core/extremes.js';

/** A kind of file recognised by its first bytes. */
export interface FileSignature {
  /** The first bytes of every such file. */
  readonly magic: readonly number[];
  /** What the file is, for the message: "the file looks like ...". */
  readonly what: string;
  /** What to do instead, for the message. */
  readonly advice: string;
  /** True for text in another encoding: none of it is UTF-8, so the file is refused at its first bytes. Default false. */
  readonly otherEncoding?: boolean;
}

/** gzip data (RFC 1952): read as such only under a name ending in `.gz`. */
export const GZIP_SIGNATURE: FileSignature = Object.freeze({
  magic: [0x1f, 0x8b],
  what: 'gzip-compressed data',
  advice: 'give it a name ending in `.gz` (e.g. `train.csv.gz`), so that fitgate decompresses it as it reads',
});

const RECOMPRESS = 'fitgate reads plain CSV text and gzip-compressed CSV (`.csv.gz`): decompress it, or compress it with gzip';
const EXPORT = 'export the sheet or table as a CSV file (UTF-8)';

/** The signatures fitgate recognises, longest first where one could begin another. */
export const FILE_SIGNATURES: readonly FileSignature[] = Object.freeze([
  { magic: [0xff, 0xfe], what: 'UTF-16 text', advice: 'save it as UTF-8', otherEncoding: true },
  { magic: [0xfe, 0xff], what: 'UTF-16 text', advice: 'save it as UTF-8', otherEncoding: true },
  GZIP_SIGNATURE,
  { magic: [0xfd, 0x37, 0x7a, 0x58, 0x5a, 0x00], what: 'xz-compressed data', advice: RECOMPRESS },
  { magic: [0x42, 0x5a, 0x68], what: 'bzip2-compressed data', advice: RECOMPRESS },
  { magic: [0x28, 0xb5, 0x2f, 0xfd], what: 'Zstandard-compressed data', advice: RECOMPRESS },
  {
    magic: [0x50, 0x4b, 0x03, 0x04],
    what: 'a ZIP archive (an .xlsx or .ods workbook is one)',
    advice: `extract the CSV file from it, or ${EXPORT}`,
  },
  { magic: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c], what: 'a 7z archive', advice: 'extract the CSV file from it' },
  { magic: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1], what: 'a legacy Office file (such as an .xls workbook)', advice: EXPORT },
  { magic: [0x50, 0x41, 0x52, 0x31], what: 'a Parquet file', advice: EXPORT },
]);

/** Most bytes a signature needs. */
export const SIGNATURE_BYTES = maxOf(FILE_SIGNATURES.map((s) => s.magic.length));

/**
 * The signature the bytes start with, or null.
 * @param head the file's first bytes (at least {@link SIGNATURE_BYTES} of them where the file has that many)
 */
export function signatureOf(head: Uint8Array): FileSignature | null {
  for (const signature of FILE_SIGNATURES) {
    const { magic } = signature;
    if (head.length < magic.length) continue;
    let match = true;
    for (let i = 0; i < magic.length && match; i++) match = head[i] === magic[i];
    if (match) return signature;
  }
  return null;
}
