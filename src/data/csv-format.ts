/**
 * The forms a data file may take beyond plain comma-separated numbers: the field separator
 * (comma, semicolon or tab, detected from the header line or set), the decimal mark (point or
 * comma), what to do with missing cells (refuse, or drop the row and count it), and a split
 * column that divides one file into training and hold-out rows. Both CSV paths read these
 * settings from here so that they cannot drift apart.
 */

import { InputError, quoteValue } from '../core/errors.js';
import { MAX_HEADER_BYTES } from './line-blocks.js';
import { cellError, DECIMAL_NUMBER, isMissingCell, underflows } from './csv-rules.js';

/** Field separators fitgate reads. */
export type Separator = ',' | ';' | '\t';

/** How a data file is written, as the descriptor's `data` section says. */
export interface CsvFormat {
  /** Field separator, or `auto` (default): detected from the header line, see {@link separatorOfHeader}. */
  separator: Separator | 'auto';
  /** Decimal mark of number cells: `.` (default) or `,` (then the separator may not be a comma). */
  decimal: '.' | ',';
  /** `error` (default): an empty or NA-like cell in a used column is an error; `drop`: the row is dropped and counted. */
  missing: 'error' | 'drop';
}

/** The format when the descriptor says nothing: detected separator, decimal point, missing cells are errors. */
export const DEFAULT_FORMAT: Readonly<CsvFormat> = Object.freeze({ separator: 'auto', decimal: '.', missing: 'error' });

/** Which rows of a file with a split column to read. */
export interface SplitFilter {
  /** Header name of the split column (text labels). */
  column: string;
  /** Label of the rows to keep. */
  keep: string;
  /** Label of the rows to skip quietly (the other side); any third label is an error. */
  other: string;
}

/**
 * The separator of a header line when it is not set: comma when the line holds a comma outside
 * quotes (as before separators were detected, so comma files read as they always did); else
 * semicolon when it holds semicolons and no tabs; else tab when it holds tabs and no semicolons;
 * else comma (one column, or both semicolons and tabs: ambiguous, the missing-column error then
 * carries a hint to set `data.separator`).
 *
 * @param line the header line's text
 */
export function separatorOfHeader(line: string): Separator {
  let semicolons = 0;
  let tabs = 0;
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (c === '"') quoted = !quoted;
    else if (quoted) continue;
    else if (c === ',') return ',';
    else if (c === ';') semicolons++;
    else if (c === '\t') tabs++;
  }
  if (semicolons > 0 && tabs === 0) return ';';
  if (tabs > 0 && semicolons === 0) return '\t';
  return ',';
}

/** Decodes one whole line at a time (no `stream` option, so no state is kept between calls): shared by every read. */
const LINE_DECODER = new TextDecoder('utf-8');

/**
 * Reads pieces of a file until its first line that is not blank has ended (within the header's
 * 1 MiB bound: past it the readers report the long header), finds that line's separator by
 * {@link separatorOfHeader}, and hands back the same bytes again, held pieces first, then the rest
 * of the one stream: the file is opened and read once. Comma (line 1) for an empty file.
 *
 * @param pieces the file's bytes in pieces of any size
 * @returns the separator, the header's 1-based line, and the file's pieces from the start
 */
export async function peekSeparator(
  pieces: AsyncIterable<Uint8Array>,
): Promise<{ separator: Separator; line: number; pieces: AsyncIterable<Uint8Array> }> {
  const iterator = pieces[Symbol.asyncIterator]();
  const held: Uint8Array[] = [];
  let heldBytes = 0;
  let segments: Uint8Array[] = [];
  let line = 1;
  let found: Separator | null = null;
  let done = false;
  const decoder = LINE_DECODER;
  const lineText = (): string => {
    const total = segments.reduce((n, s) => n + s.length, 0);
    const bytes = new Uint8Array(total);
    let at = 0;
    for (const s of segments) {
      bytes.set(s, at);
      at += s.length;
    }
    segments = [];
    return decoder.decode(bytes);
  };
  reading: while (heldBytes <= MAX_HEADER_BYTES) {
    const next = await iterator.next();
    if (next.done === true) {
      done = true;
      const last = lineText();
      if (last.trim() !== '') found = separatorOfHeader(last);
      break;
    }
    const piece = next.value;
    held.push(piece);
    heldBytes += piece.length;
    let start = 0;
    for (let lf = piece.indexOf(10); lf !== -1; lf = piece.indexOf(10, start)) {
      segments.push(piece.subarray(start, lf));
      start = lf + 1;
      const text = lineText();
      if (text.trim() !== '') {
        found = separatorOfHeader(text);
        break reading;
      }
      line++;
    }
    segments.push(piece.subarray(start));
  }
  const replay = async function* (): AsyncGenerator<Uint8Array> {
    try {
      yield* held.splice(0, held.length);
      while (!done) {
        const next = await iterator.next();
        if (next.done === true) break;
        yield next.value;
      }
    } finally {
      await iterator.return?.(undefined);
    }
  };
  return { separator: found ?? ',', line: found === null ? 1 : line, pieces: replay() };
}

/** The `csv-format` error: the header is comma-separated while the decimal mark is the comma. */
export function decimalSeparatorError(file: string, line: number): InputError {
  return new InputError(
    'csv-format',
    'the header is comma-separated, but `data.decimal: ","` makes the comma the decimal mark; expected a header separated by semicolons or tabs (or set `data.separator`)',
    { file, line },
  );
}

/**
 * Checks a format against itself: a decimal comma needs a separator other than the comma.
 * @returns a sentence saying what is wrong, or null
 */
export function formatProblem(format: CsvFormat): string | null {
  if (format.decimal === ',' && format.separator === ',') {
    return 'a decimal comma needs a separator other than the comma; set `data.separator` to ";" or "\\t"';
  }
  return null;
}

/**
 * Reads one cell of a used column under a format: trims white space, returns NaN for a missing
 * cell under `missing: drop` (the row is then dropped), accepts a decimal comma in place of the
 * point when `decimal` is `,` (a point is then an error), and otherwise reads it as the default
 * format does (finite, not underflowing; see csv-rules `cellNumber`). Throws InputError `csv-cell`.
 *
 * @param cell the field text (quotes already removed)
 * @param file repository-relative path, for messages
 * @param line 1-based physical line of the row
 * @param column the column's header name
 * @param format the file's format
 */
export function formatCellNumber(cell: string, file: string, line: number, column: string, format: CsvFormat): number {
  if (format.missing === 'drop' && isMissingCell(cell)) return Number.NaN;
  let text = cell.trim();
  if (format.decimal === ',') {
    if (text.includes('.')) throw decimalPointError(cell, file, line, column);
    text = text.replace(',', '.');
  }
  if (DECIMAL_NUMBER.test(text)) {
    const value = Number(text);
    if (Number.isFinite(value) && !underflows(text, value)) return value;
  }
  throw cellError(format.decimal === ',' ? text : cell, file, line, column);
}

function decimalPointError(cell: string, file: string, line: number, column: string): InputError {
  return new InputError(
    'csv-cell',
    `column ${quoteValue(column, 40)}: expected a number with a decimal comma (like 12, -0,5 or 1,5e-3), as \`data.decimal: ","\` says; got ${quoteValue(cell, 40)}`,
    { file, line, key: column },
  );
}

/**
 * The field index of the split column in a header, or throws InputError `csv-missing-column`.
 * @param file repository-relative path, for messages
 * @param header the header names
 * @param headerLine 1-based line of the header
 * @param split the split filter
 */
export function splitFieldOf(file: string, header: readonly string[], headerLine: number, split: SplitFilter): number {
  const field = header.indexOf(split.column);
  if (field === -1) {
    throw new InputError(
      'csv-missing-column',
      `no split column named ${quoteValue(split.column, 40)} (from \`data.split.column\`); the header has ${header.length} column${header.length === 1 ? '' : 's'}`,
      {
        file,
        line: headerLine,
        key: split.column,
      },
    );
  }
  return field;
}

/** The `csv-split` error for a split cell that is neither label. */
export function splitLabelError(cell: string, file: string, line: number, split: SplitFilter): InputError {
  return new InputError(
    'csv-split',
    `column ${quoteValue(split.column, 40)}: expected ${quoteValue(split.keep, 40)} or ${quoteValue(split.other, 40)} (the labels of \`data.split\`); got ${quoteValue(cell, 40)}`,
    { file, line, key: split.column },
  );
}
