/**
 * CSV data files to numeric columns.
 *
 * A data file is UTF-8 CSV: a header row of column names, then rows of numbers; columns are
 * chosen by name and only those are converted. What is accepted, in words:
 *
 * - Fields are separated by commas, semicolons or tabs (detected from the header line, or set:
 *   csv-format.ts); lines end with `\n` or `\r\n`; a UTF-8 byte-order mark is dropped. Under
 *   the options of csv-format.ts a decimal comma is read, rows with missing cells are dropped
 *   (and counted), and a split column keeps one side's rows. A `.gz` path is decompressed as it
 *   streams (gzip-stream.ts). Fields may be quoted with `"` (a quote inside is written `""`), so `"1.5"`
 *   is the number 1.5.
 * - White space around a field is ignored (the characters `String.prototype.trim` removes),
 *   inside quotes too: ` 1.5 ` and `" 1.5 "` are 1.5. Lines holding only white space are
 *   blank and skipped, before the header as well as between rows.
 * - The header is the first non-blank record; its names are trimmed and must be unique.
 * - A cell of a requested column must be a finite decimal number as JavaScript's `Number()`
 *   reads it: sign, digits, point, exponent (`-1`, `.5`, `1.`, `2.5E-3`). Empty cells, `NaN`,
 *   `Infinity`, `inf`, hexadecimal, values that overflow (`1e999`) and nonzero values that
 *   underflow (`1e-400`, `1e-310`: `Number()` gives 0 or a subnormal) are errors.
 * - The header must end within the first 1 MiB of the file and name at most 100,000 columns
 *   (checked before a longer line is held in memory). A header that looks like a Git LFS
 *   pointer, a semicolon- or tab-separated file, or CR-only line ends gets a hint in the error.
 * - Every row has as many fields as the header.
 * - The whole file must be UTF-8, not only the columns used.
 *
 * Two readers give the same numbers, line numbers and errors: a fast loop over the bytes for
 * plain numeric CSV (fast-path.ts), and csv-parse for everything else (general-path.ts). The
 * fast one hands the file to the general one when it meets something it does not handle.
 */

import type { RepoReader } from '../repo/types.js';
import { clip, InputError } from '../core/errors.js';
import { MAX_TABLE_LINE, partsLabel, type DataPart } from './data-parts.js';
import { DEFAULT_CHUNK_ROWS, DEFAULT_MAX_BYTES, planRequest, type ColumnPlan } from './csv-rules.js';
import { FastPathDeclined, fastChunks } from './fast-path.js';
import { openDataFile } from './gzip-stream.js';
import type { ScanTarget } from './general-path.js';
import { DEFAULT_FORMAT, decimalSeparatorError, peekSeparator, type CsvFormat, type SplitFilter } from './csv-format.js';

/** A run of consecutive data rows, column-major. */
export interface TableChunk {
  /** Rows in this chunk. */
  rows: number;
  /** One Float64Array per requested column, in the requested order, each of length `rows`. */
  columns: Float64Array[];
  /** 1-based physical line of each row in the file (read from parts: table-wide, see data-parts.ts). */
  lines: Int32Array;
  /** Read from parts: the part this chunk comes from (a chunk never spans two parts). Absent for one file. */
  part?: DataPart;
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
  /** How the file is written (csv-format.ts): separator (default `auto`), decimal mark, missing cells. */
  format?: Partial<CsvFormat>;
  /** Read only the rows of one side of a split column. */
  split?: SplitFilter;
  /** readTableChunks: receives the count of rows dropped for a missing cell (`missing: drop`). */
  counts?: { dropped: number };
  /**
   * readTableChunks: reuse a chunk's arrays for a later chunk once the consumer asks for the next
   * (it must copy what it keeps). Default false.
   */
  recycle?: boolean;
  /** readTableChunks from parts: receives each part with its line offset as reading reaches it (empty parts too). */
  parts?: DataPart[];
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
  /** 1-based physical line of each row in the file, length `rows` (read from parts: table-wide, see data-parts.ts). */
  lines: Int32Array;
  /** Rows dropped for a missing cell (`missing: drop`); 0 otherwise. */
  dropped: number;
  /** Read from a list of files: each part with its line offset, in reading order. Absent for one file. */
  parts?: DataPart[];
}

/**
 * Streams a CSV file as numeric chunks (header checked first).
 *
 * Every chunk but the last holds exactly `chunkRows` rows; a file with a header and no data
 * rows yields no chunk. Given a list of parts, the parts are read in the order given (the
 * descriptor loader sorts them) as one table: a chunk never spans two parts (so each part's last
 * chunk may be short), carries its `part`, and its lines are table-wide (data-parts.ts); every
 * part's header must match the first's (`csv-header-parts`); the size cap holds for each part
 * and for all of them together (`file-too-large`). Errors are InputErrors: `file-too-large` (before reading),
 * `file-missing`, `csv-empty`, `csv-header`, `csv-missing-column`, `csv-ragged`, `csv-cell`,
 * `csv-syntax`, `csv-encoding`; each names the file and, where there is one, the line.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file, or the list of its parts (at least one)
 * @param options columns to read; chunk size (default 65536 rows); size cap (default 512 MiB);
 *   `general: true` to skip the fast path
 */
export async function* readTableChunks(
  repo: RepoReader,
  path: string | readonly string[],
  options: ReadTableOptions,
): AsyncGenerator<TableChunk> {
  const settings = checkOptions(options);
  if (typeof path !== 'string') {
    await checkSizes(repo, path, settings.maxBytes);
    yield* scanParts(
      repo,
      path,
      settings,
      () => undefined,
      options.recycle === true,
      options.counts,
      (pieces) => pieces,
      options.parts ?? [],
    );
    return;
  }
  await checkSize(repo, path, settings.maxBytes);
  yield* scan(
    () => openDataFile(repo, path, settings.maxBytes),
    path,
    settings,
    () => undefined,
    false,
    options.recycle === true,
    options.counts,
  );
}

/**
 * Reads the requested columns whole into preallocated arrays (no per-row objects, no list of
 * chunks kept): after the first chunk the row count is estimated from the file size and the
 * bytes read so far (plus 5 %), each chunk is copied in as it arrives and dropped, and the
 * arrays grow by 1.5x when the estimate was short. The result views the first `rows` entries
 * (capacity beyond that stays allocated: a few percent). Peak memory is about the data plus
 * one chunk, instead of twice the data.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file, or the list of its parts (as for {@link readTableChunks})
 * @param options as for {@link readTableChunks}
 * @returns the header, the row count, one Float64Array of length `rows` per requested name, and the
 *   rows' lines; read from parts, also `parts` (each with its line offset) and a `file` label
 */
export async function readTable(repo: RepoReader, path: string | readonly string[], options: ReadTableOptions): Promise<Table> {
  const settings = checkOptions(options);
  const size = typeof path === 'string' ? await checkSize(repo, path, settings.maxBytes) : await checkSizes(repo, path, settings.maxBytes);
  let header: string[] = [];
  let bytesRead = 0;
  const count = async function* (pieces: AsyncIterable<Uint8Array>): AsyncIterable<Uint8Array> {
    for await (const piece of pieces) {
      bytesRead += piece.length;
      yield piece;
    }
  };
  const counted = (): AsyncIterable<Uint8Array> => count(openDataFile(repo, path as string, settings.maxBytes));
  // First position of each distinct requested name (a repeated name shares one array).
  const firstOf = settings.columns.map((name) => settings.columns.indexOf(name));
  let columns: Float64Array[] = [];
  let lines: Int32Array = new Int32Array(0);
  let rows = 0;
  const grow = (capacity: number): void => {
    columns = settings.columns.map((_, k) => {
      if (firstOf[k] !== k) return columns[firstOf[k]];
      const next = new Float64Array(capacity);
      if (rows > 0) next.set(columns[k].subarray(0, rows));
      return next;
    });
    const nextLines = new Int32Array(capacity);
    if (rows > 0) nextLines.set(lines.subarray(0, rows));
    lines = nextLines;
  };
  const counts = { dropped: 0 };
  const parts: DataPart[] = [];
  const chunks =
    typeof path === 'string'
      ? scan(counted, path, settings, (plan) => (header = plan.header), false, true, counts)
      : scanParts(repo, path, settings, (plan) => (header = plan.header), true, counts, count, parts);
  // A chunk shorter than `chunkRows` is the last its reader hands out, and its buffers are never
  // written again: the first such chunk is held as it is, and when nothing follows (a file of
  // fewer rows than a chunk, as every file of a many-models run) its arrays become the table's
  // columns without a copy.
  let lone: TableChunk | null = null;
  const take = (chunk: TableChunk): void => {
    const needed = rows + chunk.rows;
    if (needed > lines.length) {
      let capacity = Math.max(needed, Math.ceil(lines.length * 1.5));
      if (rows === 0 && bytesRead > 0) {
        // First chunk: estimate the whole file's rows from its bytes per row.
        const estimate = Math.ceil((size / bytesRead) * chunk.rows * 1.05);
        capacity = Math.max(needed, Math.min(estimate, Math.ceil(size / 2) + 1));
      }
      grow(capacity);
    }
    settings.columns.forEach((_, k) => {
      if (firstOf[k] === k) columns[k].set(chunk.columns[k], rows);
    });
    lines.set(chunk.lines, rows);
    rows = needed;
  };
  for await (const chunk of chunks) {
    if (rows === 0 && lone === null && chunk.rows < settings.chunkRows) {
      lone = chunk;
      continue;
    }
    if (lone !== null) {
      take(lone);
      lone = null;
    }
    take(chunk);
  }
  if (lone !== null) {
    const chunk: TableChunk = lone;
    columns = settings.columns.map((_, k) => chunk.columns[firstOf[k]]);
    lines = chunk.lines;
    rows = chunk.rows;
  }
  const out = new Map<string, Float64Array>();
  settings.columns.forEach((name, k) => {
    if (!out.has(name)) out.set(name, rows === 0 ? new Float64Array(0) : columns[k].subarray(0, rows));
  });
  return {
    file: typeof path === 'string' ? path : partsLabel(path),
    header,
    rows,
    columns: out,
    lines: rows === 0 ? new Int32Array(0) : lines.subarray(0, rows),
    dropped: counts.dropped,
    ...(typeof path === 'string' ? {} : { parts }),
  };
}

/**
 * Reads only the header names (for messages and checks): trimmed, in file order, checked
 * for repeats (`csv-header`); `csv-empty` when the file has none.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param maxBytes size cap in bytes; default 512 MiB
 */
export async function readHeader(
  repo: RepoReader,
  path: string,
  maxBytes = DEFAULT_MAX_BYTES,
  format?: Partial<CsvFormat>,
): Promise<string[]> {
  const settings = checkOptions({ columns: [], maxBytes, format });
  await checkSize(repo, path, settings.maxBytes);
  let header: string[] = [];
  // A header-only scan ends right after the header and yields no rows.
  const scanning = scan(
    () => openDataFile(repo, path, settings.maxBytes),
    path,
    settings,
    (plan) => (header = plan.header),
    true,
    false,
  );
  while (!(await scanning.next()).done);
  return header;
}

interface Settings {
  columns: string[];
  chunkRows: number;
  maxBytes: number;
  general: boolean;
  format: CsvFormat;
  split: SplitFilter | undefined;
}

/** Checks the caller's options (a programming error, not the user's: TypeError / RangeError). */
function checkOptions(options: ReadTableOptions): Settings {
  const { columns, chunkRows = DEFAULT_CHUNK_ROWS, maxBytes = DEFAULT_MAX_BYTES, general = false, split } = options;
  const format: CsvFormat = { ...DEFAULT_FORMAT, ...options.format };
  if (!Array.isArray(columns) || columns.some((c) => typeof c !== 'string')) {
    throw new TypeError('readTable: `columns` must be an array of column names');
  }
  if (!Number.isInteger(chunkRows) || chunkRows < 1 || chunkRows > 2 ** 30) {
    throw new RangeError(`readTable: \`chunkRows\` must be an integer from 1 to 2^30, got ${chunkRows}`);
  }
  if (!(maxBytes >= 0)) throw new RangeError(`readTable: \`maxBytes\` must be a non-negative number, got ${maxBytes}`);
  return { columns, chunkRows, maxBytes, general, format, split };
}

/** InputError `file-too-large` when the file is over the cap; returns the size in bytes. */
async function checkSize(repo: RepoReader, path: string, maxBytes: number): Promise<number> {
  const size = await repo.size(path);
  if (size > maxBytes) {
    throw new InputError(
      'file-too-large',
      `the file is ${megabytes(size)} (${size} bytes), over the cap of ${megabytes(maxBytes)} (${maxBytes} bytes); raise caps.max_file_mb in fitgate.yml`,
      { file: path },
    );
  }
  return size;
}

/**
 * The size cap of a table read from parts: each part at most `maxBytes`, and all of them together
 * too (InputError `file-too-large` naming the part that passes it); returns the total size.
 */
async function checkSizes(repo: RepoReader, paths: readonly string[], maxBytes: number): Promise<number> {
  if (paths.length === 0) throw new TypeError('readTable: a list of parts must name at least one file');
  let total = 0;
  for (const path of paths) {
    total += await checkSize(repo, path, maxBytes);
    if (total > maxBytes) {
      throw new InputError(
        'file-too-large',
        `the parts up to this one come to ${megabytes(total)} (${total} bytes), over the cap of ${megabytes(maxBytes)} (${maxBytes} bytes) that holds for all parts together; raise caps.max_file_mb in fitgate.yml`,
        { file: path },
      );
    }
  }
  return total;
}

/**
 * The chunks of a table read from parts, one part after the other (a chunk never spans two), each
 * chunk's lines made table-wide (data-parts.ts) and tagged with its part. Every part's header must
 * name the same columns in the same order as the first part's (InputError `csv-header-parts` at
 * the first part whose header differs, naming its line and the first column that differs).
 * Decompressed bytes count against one cap for all parts together: each part may use what the
 * parts before it left of `maxBytes`.
 *
 * @param count wraps each opened byte stream (readTable counts the bytes read for its estimate)
 * @param parts receives each part with its offset as reading reaches it
 */
async function* scanParts(
  repo: RepoReader,
  paths: readonly string[],
  settings: Settings,
  onHeader: (plan: ColumnPlan) => void,
  recycle: boolean,
  counts: { dropped: number } | undefined,
  count: (pieces: AsyncIterable<Uint8Array>) => AsyncIterable<Uint8Array>,
  parts: DataPart[],
): AsyncGenerator<TableChunk> {
  let first: string[] | null = null;
  let offset = 0;
  let left = settings.maxBytes;
  for (const path of paths) {
    const part: DataPart = { file: path, lineOffset: offset };
    parts.push(part);
    // The decompressed size of the part: the most bytes any one opening of it gave.
    let used = 0;
    const cap = Math.min(settings.maxBytes, left);
    const open = (): AsyncIterable<Uint8Array> => {
      const source = openDataFile(repo, path, cap);
      return count(
        (async function* () {
          let seen = 0;
          try {
            for await (const piece of source) {
              seen += piece.length;
              if (seen > used) used = seen;
              yield piece;
            }
          } catch (error) {
            if (!(error instanceof InputError) || error.code !== 'file-too-large' || cap === settings.maxBytes) throw error;
            throw new InputError(
              'file-too-large',
              `the file decompresses to more than the ${cap} bytes the parts before it left of the cap of ${megabytes(settings.maxBytes)} (${settings.maxBytes} bytes) that holds for all parts together; raise caps.max_file_mb in fitgate.yml`,
              { file: path },
            );
          }
        })(),
      );
    };
    const checkHeader = (plan: ColumnPlan): void => {
      if (first === null) {
        first = plan.header;
        onHeader(plan);
        return;
      }
      const differs = headerDifference(first, plan.header);
      if (differs !== null) {
        throw new InputError(
          'csv-header-parts',
          `the header on line ${plan.headerLine} differs from the first part's (${clip(paths[0])}) at column ${differs.column}: ${differs.text}; expected every part to name the same columns in the same order`,
          { file: path, line: plan.headerLine, key: differs.name },
        );
      }
    };
    let lastLine = 0;
    for await (const chunk of scan(open, path, settings, checkHeader, false, recycle, counts)) {
      if (chunk.rows === 0) continue;
      lastLine = chunk.lines[chunk.rows - 1];
      if (offset > 0) {
        if (offset + lastLine > MAX_TABLE_LINE) {
          throw new InputError('too-large', `the parts hold more than ${MAX_TABLE_LINE} lines together; expected fewer`, { file: path });
        }
        for (let i = 0; i < chunk.rows; i++) chunk.lines[i] += offset;
      }
      chunk.part = part;
      yield chunk;
    }
    left -= used;
    offset += Math.max(1, lastLine);
  }
}

/** Where two headers first differ: the 1-based column, the name there (or the missing one) and words for it; null when equal. */
function headerDifference(first: readonly string[], other: readonly string[]): { column: number; name: string; text: string } | null {
  const n = Math.max(first.length, other.length);
  for (let k = 0; k < n; k++) {
    if (first[k] === other[k]) continue;
    const text =
      other[k] === undefined
        ? `it ends before \`${clip(first[k])}\``
        : first[k] === undefined
          ? `it has the extra column \`${clip(other[k])}\``
          : `\`${clip(other[k])}\` where the first part has \`${clip(first[k])}\``;
    return { column: k + 1, name: other[k] ?? first[k], text };
  }
  return null;
}

function megabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/**
 * Runs the fast path, and on the general path from the start when the fast one declines,
 * handing out only the rows the fast path has not handed out already.
 */
async function* scan(
  open: () => AsyncIterable<Uint8Array>,
  path: string,
  settings: Settings,
  onHeader: (plan: ColumnPlan) => void,
  headerOnly: boolean,
  recycle: boolean,
  counts?: { dropped: number },
): AsyncGenerator<TableChunk> {
  let headerSeen = false;
  let format = settings.format;
  let first: AsyncIterable<Uint8Array> | null = null;
  if (format.separator === 'auto') {
    const found = await peekSeparator(open());
    first = found.pieces;
    if (found.separator === ',' && format.decimal === ',') throw decimalSeparatorError(path, found.line);
    format = { ...format, separator: found.separator };
  } else if (format.separator === ',' && format.decimal === ',') throw decimalSeparatorError(path, 1);
  const target: ScanTarget = {
    file: path,
    request: planRequest(settings.columns),
    chunkRows: settings.chunkRows,
    headerOnly,
    recycle,
    format,
    split: settings.split,
    counts,
    onHeader: (plan) => {
      if (headerSeen) return;
      headerSeen = true;
      onHeader(plan);
    },
  };
  let handedOut = 0;
  if (!settings.general) {
    try {
      const pieces = first ?? open();
      first = null;
      for await (const chunk of fastChunks(pieces, target)) {
        handedOut += chunk.rows;
        yield chunk;
      }
      return;
    } catch (error) {
      if (!(error instanceof FastPathDeclined)) throw error;
    }
  }
  // csv-parse is loaded only when a file needs it (most data files take the fast path).
  const { generalChunks } = await import('./general-path.js');
  yield* generalChunks(first ?? open(), target, handedOut);
}
