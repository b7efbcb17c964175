/**
 * The rules both CSV paths share, kept in one place so that the fast path and the general
 * path cannot drift apart: what a number cell may look like, how the header is checked,
 * the exact error each problem raises, and how rows are gathered into chunks.
 */

import { InputError, quoteValue } from '../core/errors.js';

/** Rows per chunk when the caller does not say. */
export const DEFAULT_CHUNK_ROWS = 65536;
/** Size cap in bytes when the caller does not say (512 MiB). */
export const DEFAULT_MAX_BYTES = 512 * 1024 * 1024;
/** How many header names an error message lists before cutting the list. */
const MAX_NAMES_LISTED = 20;
/** How many characters of a bad cell an error message quotes. */
const MAX_CELL_QUOTED = 40;
/** Most columns a header may name (a header that is the whole of a mis-separated file stops here). */
export const MAX_HEADER_COLUMNS = 100_000;

/**
 * Smallest positive normal double, 2^-1022 (IEEE 754 binary64). A nonzero decimal whose value
 * is below it reads as a subnormal (fewer significant bits) or as 0: an underflow, refused like
 * an overflow.
 */
export const MIN_NORMAL = 2.2250738585072014e-308;

/**
 * A decimal number as JavaScript's `Number()` reads it, without the forms we refuse
 * (empty text, `Infinity`, hexadecimal / binary / octal prefixes): optional sign, digits
 * with an optional point (`1`, `1.`, `.5`, `1.5`), optional exponent (`e-3`, `E+05`).
 * Source: ECMA-262 `StrDecimalLiteral` (section "ToNumber Applied to the String Type").
 */
export const DECIMAL_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Cell texts that mean "missing" under `missing: drop` (data/csv-format.ts), compared after trimming white space and
 * ignoring case: the empty cell, `NA`, `N/A`, `#N/A`, `NaN`, `null`, `None`. (The spellings
 * spreadsheet and statistics programs commonly write for a missing value: common practice.)
 */
export const MISSING_SPELLINGS: readonly string[] = Object.freeze(['', 'na', 'n/a', '#n/a', 'nan', 'null', 'none']);

const MISSING_SET = new Set(MISSING_SPELLINGS);

/** True when a cell's text (untrimmed) is one of {@link MISSING_SPELLINGS}. */
export function isMissingCell(cell: string): boolean {
  const text = cell.trim();
  return text.length <= 4 && MISSING_SET.has(text.toLowerCase());
}

/** What the header check hands to a parser. */
export interface ColumnPlan {
  /** All header names in file order. */
  header: string[];
  /** 1-based line of the header. */
  headerLine: number;
  /** For each field of a row: index into the distinct requested columns, or -1 when unused. */
  slotOfField: Int32Array;
  /** For each distinct requested column: its field index in a row. */
  fieldOfSlot: Int32Array;
}

/** The requested columns, with repeats collapsed. */
export interface Request {
  /** Columns as asked for, in order (may repeat). */
  columns: string[];
  /** Distinct names, in first-seen order. */
  distinct: string[];
  /** For each asked column: its index in `distinct`. */
  slotOfColumn: number[];
}

/**
 * Collapses repeated names in a column request.
 * @param columns names as the caller gave them
 */
export function planRequest(columns: string[]): Request {
  const distinct: string[] = [];
  const slotOfColumn: number[] = [];
  for (const name of columns) {
    let slot = distinct.indexOf(name);
    if (slot === -1) {
      slot = distinct.length;
      distinct.push(name);
    }
    slotOfColumn.push(slot);
  }
  return { columns, distinct, slotOfColumn };
}

/**
 * Checks the header and maps requested columns to fields.
 * Throws InputError `csv-header` for a repeated name (both 1-based positions),
 * `csv-missing-column` for requested names the header lacks (listing up to 20 names it has).
 *
 * @param file repository-relative path, for messages
 * @param header names as read (already trimmed)
 * @param headerLine 1-based line of the header
 * @param request the distinct requested columns
 */
export function planColumns(file: string, header: string[], headerLine: number, request: Request): ColumnPlan {
  if (header.some((name) => name.includes('\r'))) {
    throw new InputError(
      'csv-line-ends',
      'the header holds a carriage return that no line feed follows; expected lines ending with a line feed (LF or CRLF). Hint: the file has CR-only line ends (as classic Mac OS wrote them): save it with LF or CRLF line ends',
      { file, line: headerLine },
    );
  }
  if (header.length > MAX_HEADER_COLUMNS) {
    throw new InputError(
      'csv-header-too-wide',
      `the header names ${header.length} columns; expected at most ${MAX_HEADER_COLUMNS}${layoutHint(header)}`,
      { file, line: headerLine },
    );
  }
  const position = new Map<string, number>();
  header.forEach((name, i) => {
    const earlier = position.get(name);
    if (earlier !== undefined) {
      throw new InputError(
        'csv-header',
        `the header names column ${quoteValue(name, MAX_CELL_QUOTED)} twice, at positions ${earlier + 1} and ${i + 1}; expected unique column names`,
        { file, line: headerLine, key: name },
      );
    }
    position.set(name, i);
  });
  const missing = request.distinct.filter((name) => !position.has(name));
  if (missing.length > 0) {
    const listed = header.slice(0, MAX_NAMES_LISTED).map((name) => quoteValue(name, MAX_CELL_QUOTED));
    const more = header.length > MAX_NAMES_LISTED ? `, … (${header.length - MAX_NAMES_LISTED} more)` : '';
    const wanted = missing.map((name) => quoteValue(name, MAX_CELL_QUOTED)).join(', ');
    throw new InputError(
      'csv-missing-column',
      `no column named ${wanted}; the header has ${header.length} column${header.length === 1 ? '' : 's'}: ${listed.join(', ')}${more}${layoutHint(header)}`,
      { file, line: headerLine, key: missing[0] },
    );
  }
  const slotOfField = new Int32Array(header.length).fill(-1);
  const fieldOfSlot = new Int32Array(request.distinct.length);
  request.distinct.forEach((name, slot) => {
    const field = position.get(name) as number;
    slotOfField[field] = slot;
    fieldOfSlot[slot] = field;
  });
  return { header, headerLine, slotOfField, fieldOfSlot };
}

/** First line of a Git LFS pointer file (git-lfs specification, "version https://git-lfs.github.com/spec/v1"). */
const LFS_POINTER = 'version https://git-lfs.github.com/spec/';

/**
 * A one-sentence hint (starting `. Hint: `) when a header looks like a file that is not
 * comma-separated CSV at all: a Git LFS pointer (the data was never fetched), a file separated by
 * semicolons or tabs (one column whose name holds the separators); '' otherwise.
 *
 * @param header the header names as read
 */
export function layoutHint(header: readonly string[]): string {
  const only = header.length === 1 ? header[0] : '';
  if (header.length > 0 && header[0].startsWith(LFS_POINTER)) {
    return '. Hint: the file is a Git LFS pointer, not the data: fetch the LFS objects before the check (`git lfs pull`, or `lfs: true` on the checkout step)';
  }
  if (only.includes(';') && only.includes('\t'))
    return '. Hint: the header holds both semicolons and tabs and no commas, so the separator is ambiguous: set `data.separator` to ";" or "\\t" in the descriptor';
  if (only.includes(';'))
    return '. Hint: the header holds semicolons and no commas: the file looks semicolon-separated; set `data.separator: ";"` in the descriptor';
  if (only.includes('\t'))
    return '. Hint: the header holds tabs and no commas: the file looks tab-separated; set `data.separator: "\\t"` in the descriptor';
  return '';
}

/**
 * True when the decimal text has a nonzero digit before its exponent (its value is not 0).
 * @param text a {@link DECIMAL_NUMBER} text
 */
function nonzeroDecimal(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 101 || c === 69) return false; // e, E: the exponent starts
    if (c >= 49 && c <= 57) return true; // 1-9
  }
  return false;
}

/**
 * True when a decimal text's value underflows: the text names a nonzero number, but `Number()`
 * gives 0 or a subnormal (below {@link MIN_NORMAL} in size), e.g. `1e-400` or `2.5e-320`.
 *
 * @param text a {@link DECIMAL_NUMBER} text
 * @param value `Number(text)`
 */
export function underflows(text: string, value: number): boolean {
  return Math.abs(value) < MIN_NORMAL && (value !== 0 || nonzeroDecimal(text));
}

/**
 * Reads one cell of a requested column as the general path does: trims white space (as
 * `String.prototype.trim` defines it), then accepts only {@link DECIMAL_NUMBER} text whose
 * value is finite and does not underflow (see {@link underflows}). Anything else throws
 * InputError `csv-cell`.
 *
 * @param cell the field text (quotes already removed)
 * @param file repository-relative path, for messages
 * @param line 1-based physical line of the row
 * @param column the column's header name
 */
export function cellNumber(cell: string, file: string, line: number, column: string): number {
  const text = cell.trim();
  if (DECIMAL_NUMBER.test(text)) {
    const value = Number(text);
    if (Number.isFinite(value) && !underflows(text, value)) return value;
  }
  throw cellError(cell, file, line, column);
}

/** The `csv-cell` error for a cell that is not a finite decimal number (or underflows). */
export function cellError(cell: string, file: string, line: number, column: string): InputError {
  const text = cell.trim();
  let why: string;
  if (text === '') why = 'the cell is empty';
  else if (DECIMAL_NUMBER.test(text) && Number.isFinite(Number(text))) {
    why = `got ${quoteValue(cell, MAX_CELL_QUOTED)}, which is nonzero but too small for 64-bit floating point (below about 2.2e-308 in size it reads as 0 or loses precision); rescale the column`;
  } else if (DECIMAL_NUMBER.test(text))
    why = `got ${quoteValue(cell, MAX_CELL_QUOTED)}, which is beyond the range of 64-bit floating point (about ±1.8e308)`;
  else if (/^[+-]?(?:nan|inf|infinity)$/i.test(text))
    why = `got ${quoteValue(cell, MAX_CELL_QUOTED)}; missing and infinite values are not allowed`;
  else why = `got ${quoteValue(cell, MAX_CELL_QUOTED)}`;
  return new InputError(
    'csv-cell',
    `column ${quoteValue(column, MAX_CELL_QUOTED)}: expected a finite decimal number (like 12, -0.5 or 1.5e-3); ${why}${cellHint(text)}`,
    { file, line, key: column },
  );
}

/** The end of a `csv-cell` error for a missing cell: the setting that drops such rows. */
export const MISSING_HINT =
  '. Hint: to drop the rows with a missing cell in a used column (and count them in the report), set `data.missing: drop` in the descriptor';

/** The end of a `csv-cell` error for what may be a number with a decimal comma: the setting that reads it. */
export const DECIMAL_COMMA_HINT =
  '. Hint: if the file writes numbers with a decimal comma (1,5 for 1.5), set `data.decimal: ","` in the descriptor';

/** A number written with a decimal comma and no other mark, like `2,5` or `-0,125`. */
const DECIMAL_COMMA_NUMBER = /^[+-]?\d*,\d+$/;

/**
 * The setting that would have read a refused cell, said after its error: `data.missing: drop` for
 * a missing cell, `data.decimal: ","` for what may be a number with a decimal comma (`1,250` may
 * also be a thousands separator, so the hint says "if"). Neither can be set
 * already when such a cell is refused (under `drop` a missing cell drops its row; under `,` the
 * comma has become a point before the cell is judged), so the hint never names a setting in force.
 */
function cellHint(text: string): string {
  if (isMissingCell(text)) return MISSING_HINT;
  if (DECIMAL_COMMA_NUMBER.test(text)) return DECIMAL_COMMA_HINT;
  return '';
}

/** The `csv-ragged` error for a row whose field count differs from the header's. */
export function raggedError(file: string, line: number, expected: number, actual: number): InputError {
  return new InputError(
    'csv-ragged',
    `the row has ${actual} field${actual === 1 ? '' : 's'}; expected ${expected}, as many as the header`,
    { file, line },
  );
}

/** The `csv-empty` error for a file without a header row. */
export function emptyError(file: string): InputError {
  return new InputError('csv-empty', 'the file has no header row; expected a first line of comma-separated column names', {
    file,
  });
}

/** One chunk of rows: see `TableChunk` in table.ts (same shape). */
export interface Chunk {
  rows: number;
  columns: Float64Array[];
  lines: Int32Array;
}

/**
 * First buffer size of a chunk; buffers double from here up to the chunk size. Small, so that the
 * many files of a few hundred or thousand rows of a monorepo make small buffers (a larger file pays
 * a few more doublings, each a copy of what it read so far).
 */
const FIRST_CAPACITY = 1024;

/**
 * Gathers rows into column buffers and hands out chunks of `chunkRows` rows.
 * Parsers write `slots[s][row]` and `lines[row]` directly, then advance `row`; when `row`
 * reaches `capacity` they call {@link ChunkBuilder.full}, which grows the buffers (doubling)
 * or hands out a chunk, and reload `slots`, `lines`, `row` and `capacity`.
 */
export class ChunkBuilder {
  /** Filled chunks not yet handed out. */
  readonly ready: Chunk[] = [];
  /** One buffer per distinct requested column, length `capacity`. */
  slots: Float64Array[] = [];
  /** 1-based physical line of each row, length `capacity`. */
  lines: Int32Array = new Int32Array(0);
  /** Rows written in the current buffers. */
  row = 0;
  /** Rows the current buffers hold. */
  capacity = 0;

  /**
   * @param request the requested columns (a chunk lists them in the asked order)
   * @param chunkRows rows per chunk
   */
  constructor(
    private readonly request: Request,
    readonly chunkRows: number,
  ) {
    this.fresh();
  }

  /** Advances one row (for parsers that do not track `row` themselves). */
  endRow(): void {
    this.row++;
    if (this.row === this.capacity) this.full();
  }

  /** Called when `row === capacity`: hands out a chunk, or doubles the buffers. */
  full(): void {
    if (this.row >= this.chunkRows) {
      this.flush();
      return;
    }
    const capacity = Math.min(this.chunkRows, this.capacity * 2);
    this.slots = this.slots.map((old) => {
      const grown = new Float64Array(capacity);
      grown.set(old);
      return grown;
    });
    const lines = new Int32Array(capacity);
    lines.set(this.lines);
    this.lines = lines;
    this.capacity = capacity;
  }

  /** Hands out the rows gathered so far as a chunk (nothing when there are none). */
  flush(): void {
    if (this.handOut()) this.fresh();
  }

  /**
   * Hands out the last rows as a chunk (nothing when there are none) at the end of the file: as
   * {@link flush}, without making buffers for rows that will not come. No row may be added after.
   */
  finish(): void {
    this.handOut();
  }

  /**
   * Moves the rows gathered so far into a ready chunk; false when there were none. A chunk that
   * does not fill its buffers gets views of their first `rows` entries, not copies: the builder
   * never writes those buffers again (they are not recycled, and the next rows go into fresh
   * buffers), and they are at most twice the rows they hold.
   */
  private handOut(): boolean {
    const rows = this.row;
    if (rows === 0) return false;
    const exact = rows === this.capacity;
    const slots = exact ? this.slots : this.slots.map((s) => s.subarray(0, rows));
    const lines = exact ? this.lines : this.lines.subarray(0, rows);
    const chunk: Chunk = { rows, columns: this.request.slotOfColumn.map((slot) => slots[slot]), lines };
    if (exact) this.#buffersOf.set(chunk, { slots, lines });
    this.ready.push(chunk);
    return true;
  }

  /**
   * Takes back a chunk handed out by this builder whose reader is done with it: its buffers are
   * reused for a later chunk (no allocation per chunk when the reader copies each chunk away
   * before asking for the next). Chunks of another size are ignored.
   *
   * @param chunk a chunk from {@link take}; must not be read afterwards
   */
  recycle(chunk: Chunk): void {
    const buffers = this.#buffersOf.get(chunk);
    if (buffers === undefined) return;
    this.#buffersOf.delete(chunk);
    this.#spare.push(buffers);
  }

  readonly #buffersOf = new WeakMap<Chunk, { slots: Float64Array[]; lines: Int32Array }>();
  readonly #spare: { slots: Float64Array[]; lines: Int32Array }[] = [];

  /** Takes the chunks handed out so far. */
  take(): Chunk[] {
    return this.ready.splice(0, this.ready.length);
  }

  /** New buffers, as large as the last ones (a file that filled one chunk likely fills more). */
  private fresh(): void {
    if (this.capacity === 0) this.capacity = Math.min(this.chunkRows, FIRST_CAPACITY);
    this.row = 0;
    while (this.#spare.length > 0) {
      const spare = this.#spare.pop() as { slots: Float64Array[]; lines: Int32Array };
      if (spare.lines.length !== this.capacity) continue;
      this.slots = spare.slots;
      this.lines = spare.lines;
      return;
    }
    this.slots = this.request.distinct.map(() => new Float64Array(this.capacity));
    this.lines = new Int32Array(this.capacity);
  }
}
