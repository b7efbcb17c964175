/**
 * The general CSV path: csv-parse (streaming API) with quoted fields, CRLF, blank lines and
 * white space around fields. Every record goes through csv-parse's `on_record` hook as soon
 * as it is parsed, so rows are checked and converted in file order and errors come out in
 * file order whatever the piece sizes.
 */

import { parse } from 'csv-parse';
import { InputError } from '../core/errors.js';
import { encodingError, lineBlocks, type LineBlock, blockError } from './line-blocks.js';
import { ChunkBuilder, cellNumber, emptyError, planColumns, raggedError, type Chunk, type ColumnPlan, type Request } from './csv-rules.js';
import { formatCellNumber, splitFieldOf, splitLabelError, type CsvFormat, type SplitFilter } from './csv-format.js';

/** What a parser is asked to read, shared by both paths. */
export interface ScanTarget {
  /** Repository-relative path, for messages. */
  file: string;
  /** Requested columns. */
  request: Request;
  /** Rows per chunk. */
  chunkRows: number;
  /** Stop after the header (and its checks). */
  headerOnly: boolean;
  /** Called once the header has passed its checks. */
  onHeader: (plan: ColumnPlan) => void;
  /**
   * The reader is done with each chunk when it asks for the next one (it copies the rows away),
   * so the chunk's buffers may be reused. Default false: chunks stay valid.
   */
  recycle?: boolean;
  /** How the file is written, the separator already resolved (not `auto`). Default: comma, point, missing cells are errors. */
  format?: CsvFormat;
  /** Keep only the rows whose split cell is `keep`; skip those with `other`; any other label is an error. */
  split?: SplitFilter;
  /** Receives the count of rows dropped for a missing cell (`missing: drop`). */
  counts?: { dropped: number };
}

/** Stops csv-parse from inside `on_record` once the header is known (header-only reads). */
class StopReading extends Error {}

/**
 * Reads a CSV file with csv-parse and yields numeric chunks.
 *
 * Settings: comma delimiter, `"` quote (and `""` inside quotes), `\n` or `\r\n` line ends,
 * white space around fields trimmed (`trim: true`, the set of `String.prototype.trim`),
 * lines holding only white space skipped, field counts checked here (`csv-ragged`).
 * The physical line of a record is worked out from csv-parse's counts: 1 + skipped blank
 * lines + earlier records + line breaks inside earlier quoted fields.
 *
 * @param pieces the file's bytes in pieces of any size
 * @param target what to read
 * @param skipRows data rows already handed out by the fast path: parsed and checked but not converted
 */
export async function* generalChunks(pieces: AsyncIterable<Uint8Array>, target: ScanTarget, skipRows = 0): AsyncGenerator<Chunk> {
  const { file, request } = target;
  const builder = new ChunkBuilder(request, target.chunkRows);
  let plan: ColumnPlan | null = null;
  let breaksInFields = 0;
  let dataRows = 0;
  const format = target.format;
  const plain = format === undefined || (format.decimal === '.' && format.missing === 'error');
  const split = target.split;
  let splitField = -1;

  const onRecord = (record: string[], info: { empty_lines: number; records: number }): null => {
    const line = 1 + info.empty_lines + (info.records - 1) + breaksInFields;
    for (const field of record) {
      for (let i = field.indexOf('\n'); i !== -1; i = field.indexOf('\n', i + 1)) breaksInFields++;
    }
    if (plan === null) {
      plan = planColumns(file, record, line, request);
      if (split !== undefined) splitField = splitFieldOf(file, record, line, split);
      target.onHeader(plan);
      if (target.headerOnly) throw new StopReading();
      return null;
    }
    if (record.length !== plan.header.length) throw raggedError(file, line, plan.header.length, record.length);
    if (splitField !== -1 && split !== undefined) {
      const label = record[splitField];
      if (label !== split.keep) {
        if (label === split.other) return null;
        throw splitLabelError(label, file, line, split);
      }
    }
    if (dataRows++ < skipRows) return null;
    const { fieldOfSlot } = plan;
    const row = builder.row;
    if (plain) {
      for (let slot = 0; slot < fieldOfSlot.length; slot++) {
        builder.slots[slot][row] = cellNumber(record[fieldOfSlot[slot]], file, line, request.distinct[slot]);
      }
    } else {
      let missing = false;
      for (let slot = 0; slot < fieldOfSlot.length; slot++) {
        const value = formatCellNumber(record[fieldOfSlot[slot]], file, line, request.distinct[slot], format);
        if (Number.isNaN(value)) missing = true;
        builder.slots[slot][row] = value;
      }
      if (missing) {
        if (target.counts !== undefined) target.counts.dropped++;
        return null;
      }
    }
    builder.lines[row] = line;
    builder.endRow();
    return null;
  };

  const parser = parse({
    bom: false, // line-blocks drops it
    delimiter: format?.separator === undefined || format.separator === 'auto' ? ',' : format.separator,
    quote: '"',
    escape: '"',
    record_delimiter: ['\r\n', '\n'],
    trim: true,
    skip_empty_lines: true,
    relax_column_count: true,
    on_record: onRecord,
  });
  // Errors are read from `parser.errored` after each write; this keeps Node from also
  // reporting them as unhandled.
  parser.on('error', () => undefined);

  /** 1-based line where the next record starts (or the open one started). */
  const nextLine = (): number => 1 + parser.info.empty_lines + parser.info.records + breaksInFields;

  /**
   * True when reading should stop quietly; throws the row or syntax error otherwise. After
   * bad bytes (`bad`), a syntax error only means the text was cut short: the bad bytes win.
   */
  const settle = (bad: LineBlock | null): boolean => {
    const failure = parser.errored;
    if (failure === null) return false;
    if (failure instanceof StopReading) return true;
    if (failure instanceof InputError) throw failure;
    if (bad !== null) throw encodingError(file, 1 + lineFeeds, bad.signature);
    throw syntaxError(failure, file, nextLine());
  };

  // Line feeds written so far: the line of bad bytes is the one after them.
  let lineFeeds = 0;
  const blocks = lineBlocks(pieces)[Symbol.asyncIterator]();
  try {
    let bad: LineBlock | null = null;
    for (;;) {
      const next = await blocks.next();
      if (next.done === true) break;
      if (next.value.headerTooLong === true) throw blockError(file, 1 + lineFeeds, next.value);
      if (next.value.badUtf8) {
        // The lines before the bad bytes are written; finish them first so that an
        // earlier row error wins, as it does on the fast path.
        bad = next.value;
        break;
      }
      const { bytes } = next.value;
      lineFeeds += countLineFeeds(bytes);
      parser.write(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
      if (settle(null)) return;
      for (const chunk of builder.take()) {
        yield chunk;
        if (target.recycle === true) builder.recycle(chunk);
      }
    }
    await endParser(parser);
    if (settle(bad)) return;
    if (bad !== null) throw encodingError(file, 1 + lineFeeds, bad.signature);
    if (plan === null) throw emptyError(file);
    builder.finish();
    for (const chunk of builder.take()) {
      yield chunk;
      if (target.recycle === true) builder.recycle(chunk);
    }
  } finally {
    parser.destroy();
    await blocks.return?.(undefined);
  }
}

/** Counts `\n` bytes. */
function countLineFeeds(bytes: Uint8Array): number {
  let n = 0;
  for (let i = bytes.indexOf(10); i !== -1; i = bytes.indexOf(10, i + 1)) n++;
  return n;
}

/** Ends the parser's input and waits until it has handled the last record (or failed). */
function endParser(parser: ReturnType<typeof parse>): Promise<void> {
  return new Promise((resolve) => {
    if (parser.errored !== null) {
      resolve();
      return;
    }
    const done = (): void => resolve();
    parser.once('finish', done);
    parser.once('error', done);
    parser.once('close', done);
    parser.end();
  });
}

/** Turns a csv-parse error into InputError `csv-syntax` at the line where the record began. */
function syntaxError(failure: Error, file: string, line: number): InputError {
  const code = (failure as { code?: unknown }).code;
  let what: string;
  switch (code) {
    case 'CSV_QUOTE_NOT_CLOSED':
      what = `a quoted field in the record starting on line ${line} is never closed; expected a closing quote (")`;
      break;
    case 'CSV_INVALID_CLOSING_QUOTE':
    case 'CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE':
      what = `in the record starting on line ${line}, a closing quote is followed by text; expected a comma or the end of the line after it (write "" for a quote inside a quoted field)`;
      break;
    case 'INVALID_OPENING_QUOTE':
      what = `in the record starting on line ${line}, a quote appears inside an unquoted field; expected quotes only around a whole field (write "" for a quote inside a quoted field)`;
      break;
    default:
      what = `the record starting on line ${line} is not valid CSV: ${failure.message}`;
  }
  return new InputError('csv-syntax', what, { file, line });
}
