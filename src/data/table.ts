/**
 * CSV data files to numeric columns.
 *
 * A data file is UTF-8 CSV: a header row of column names, then rows of numbers; columns are
 * chosen by name and only those are converted. What is accepted, in words:
 *
 * - Fields are separated by commas; lines end with `\n` or `\r\n`; a UTF-8 byte-order mark
 *   is dropped. Fields may be quoted with `"` (a quote inside is written `""`), so `"1.5"`
 *   is the number 1.5.
 * - White space around a field is ignored (the characters `String.prototype.trim` removes),
 *   inside quotes too: ` 1.5 ` and `" 1.5 "` are 1.5. Lines holding only white space are
 *   blank and skipped, before the header as well as between rows.
 * - The header is the first non-blank record; its names are trimmed and must be unique.
 * - A cell of a requested column must be a finite decimal number as JavaScript's `Number()`
 *   reads it: sign, digits, point, exponent (`-1`, `.5`, `1.`, `2.5E-3`). Empty cells, `NaN`,
 *   `Infinity`, `inf`, hexadecimal and values that overflow (`1e999`) are errors; values that
 *   underflow to a subnormal or zero are kept (they are what `Number()` gives).
 * - Every row has as many fields as the header.
 * - The whole file must be UTF-8, not only the columns used.
 *
 * Two readers give the same numbers, line numbers and errors: a fast loop over the bytes for
 * plain numeric CSV (fast-path.ts), and csv-parse for everything else (general-path.ts). The
 * fast one hands the file to the general one when it meets something it does not handle.
 */

import type { RepoReader } from '../repo/types.js';
import { InputError } from '../errors.js';
import { DEFAULT_CHUNK_ROWS, DEFAULT_MAX_BYTES, planRequest, type ColumnPlan } from './csv-rules.js';
import { FastPathDeclined, fastChunks } from './fast-path.js';
import { generalChunks, type ScanTarget } from './general-path.js';

/** A run of consecutive data rows, column-major. */
export interface TableChunk {
  /** Rows in this chunk. */
  rows: number;
  /** One Float64Array per requested column, in the requested order, each of length `rows`. */
  columns: Float64Array[];
  /** 1-based physical line of each row in the file. */
  lines: Int32Array;
}

/** What to read from a CSV file. */
export interface ReadTableOptions {
  /** Columns to convert, by header name, in the order wanted (a name may repeat: the chunks then share one array). */
  columns: string[];
  /** Rows per chunk. Default 65536. */
  chunkRows?: number;
  /** Size cap in bytes. Default 512 MiB. */
  maxBytes?: number;
  /** Force the general path (tests). Default false. */
  general?: boolean;
}

/** A whole table's requested columns. */
export interface Table {
  /** Repository-relative path it was read from. */
  file: string;
  /** All header names in file order. */
  header: string[];
  /** Number of data rows (blank lines not counted). */
  rows: number;
  /** Requested columns by name, each length `rows`. */
  columns: Map<string, Float64Array>;
  /** 1-based physical line of each row in the file, length `rows`. */
  lines: Int32Array;
}

/**
 * Streams a CSV file as numeric chunks (header checked first).
 *
 * Every chunk but the last holds exactly `chunkRows` rows; a file with a header and no data
 * rows yields no chunk. Errors are InputErrors: `file-too-large` (before reading),
 * `file-missing`, `csv-empty`, `csv-header`, `csv-missing-column`, `csv-ragged`, `csv-cell`,
 * `csv-syntax`, `csv-encoding`; each names the file and, where there is one, the line.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param options columns to read; chunk size (default 65536 rows); size cap (default 512 MiB);
 *   `general: true` to skip the fast path
 */
export async function* readTableChunks(repo: RepoReader, path: string, options: ReadTableOptions): AsyncGenerator<TableChunk> {
  const settings = checkOptions(options);
  await checkSize(repo, path, settings.maxBytes);
  yield* scan(repo, path, settings, () => undefined, false);
}

/**
 * Reads the requested columns whole (concatenating the chunks, no per-row objects).
 *
 * The chunks are kept as they come and copied once into arrays of the exact final length:
 * the same peak memory as growing buffers by doubling (at most twice the data), with one
 * copy instead of several.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param options as for {@link readTableChunks}
 * @returns the header, the row count, one Float64Array of length `rows` per requested name, and the rows' lines
 */
export async function readTable(repo: RepoReader, path: string, options: ReadTableOptions): Promise<Table> {
  const settings = checkOptions(options);
  await checkSize(repo, path, settings.maxBytes);
  let header: string[] = [];
  const chunks: TableChunk[] = [];
  let rows = 0;
  for await (const chunk of scan(repo, path, settings, (plan) => (header = plan.header), false)) {
    chunks.push(chunk);
    rows += chunk.rows;
  }
  const columns = new Map<string, Float64Array>();
  settings.columns.forEach((name, k) => {
    if (columns.has(name)) return;
    columns.set(name, concatenate(chunks.map((chunk) => chunk.columns[k]), new Float64Array(rows)));
  });
  const lines = concatenate(chunks.map((chunk) => chunk.lines), new Int32Array(rows));
  return { file: path, header, rows, columns, lines };
}

/**
 * Reads only the header names (for messages and checks): trimmed, in file order, checked
 * for repeats (`csv-header`); `csv-empty` when the file has none.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param maxBytes size cap in bytes; default 512 MiB
 */
export async function readHeader(repo: RepoReader, path: string, maxBytes = DEFAULT_MAX_BYTES): Promise<string[]> {
  const settings = checkOptions({ columns: [], maxBytes });
  await checkSize(repo, path, settings.maxBytes);
  let header: string[] = [];
  // A header-only scan ends right after the header and yields no rows.
  const scanning = scan(repo, path, settings, (plan) => (header = plan.header), true);
  while (!(await scanning.next()).done);
  return header;
}

interface Settings {
  columns: string[];
  chunkRows: number;
  maxBytes: number;
  general: boolean;
}

/** Checks the caller's options (a programming error, not the user's: TypeError / RangeError). */
function checkOptions(options: ReadTableOptions): Settings {
  const { columns, chunkRows = DEFAULT_CHUNK_ROWS, maxBytes = DEFAULT_MAX_BYTES, general = false } = options;
  if (!Array.isArray(columns) || columns.some((c) => typeof c !== 'string')) {
    throw new TypeError('readTable: `columns` must be an array of column names');
  }
  if (!Number.isInteger(chunkRows) || chunkRows < 1 || chunkRows > 2 ** 30) {
    throw new RangeError(`readTable: \`chunkRows\` must be an integer from 1 to 2^30, got ${chunkRows}`);
  }
  if (!(maxBytes >= 0)) throw new RangeError(`readTable: \`maxBytes\` must be a non-negative number, got ${maxBytes}`);
  return { columns, chunkRows, maxBytes, general };
}

/** InputError `file-too-large` when the file is over the cap. */
async function checkSize(repo: RepoReader, path: string, maxBytes: number): Promise<void> {
  const size = await repo.size(path);
  if (size > maxBytes) {
    throw new InputError(
      'file-too-large',
      `the file is ${megabytes(size)} (${size} bytes), over the cap of ${megabytes(maxBytes)} (${maxBytes} bytes); raise caps.max_file_mb in fitgate.yml`,
      { file: path },
    );
  }
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/**
 * Runs the fast path, and on the general path from the start when the fast one declines,
 * handing out only the rows the fast path has not handed out already.
 */
async function* scan(
  repo: RepoReader,
  path: string,
  settings: Settings,
  onHeader: (plan: ColumnPlan) => void,
  headerOnly: boolean,
): AsyncGenerator<TableChunk> {
  let headerSeen = false;
  const target: ScanTarget = {
    file: path,
    request: planRequest(settings.columns),
    chunkRows: settings.chunkRows,
    headerOnly,
    onHeader: (plan) => {
      if (headerSeen) return;
      headerSeen = true;
      onHeader(plan);
    },
  };
  let handedOut = 0;
  if (!settings.general) {
    try {
      for await (const chunk of fastChunks(repo.stream(path), target)) {
        handedOut += chunk.rows;
        yield chunk;
      }
      return;
    } catch (error) {
      if (!(error instanceof FastPathDeclined)) throw error;
    }
  }
  yield* generalChunks(repo.stream(path), target, handedOut);
}

/** Copies `parts` one after another into `out` (whose length is their total). */
function concatenate<T extends Float64Array | Int32Array>(parts: T[], out: T): T {
  if (parts.length === 1 && parts[0].length === out.length) return parts[0];
  let at = 0;
  for (const part of parts) {
    out.set(part, at);
    at += part.length;
  }
  return out;
}
