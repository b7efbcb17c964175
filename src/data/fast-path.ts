/**
 * The fast CSV path: one loop over the bytes of plain numeric CSV (no quotes), parsing
 * numbers straight into Float64Array columns without building a string per field.
 *
 * It accepts a strict subset of what the general path accepts and gives the same numbers
 * and line numbers for it. Anything else (a quote, a lone carriage return, a field count
 * that differs from the header's, a cell that is not a plain finite number, white space
 * other than spaces and tabs where it matters) makes it give up with
 * {@link FastPathDeclined}; the caller then reads the file again on the general path,
 * which either accepts it or throws the error the user should see.
 */

import { blockError, lineBlocks } from './line-blocks.js';
import { ChunkBuilder, emptyError, MIN_NORMAL, planColumns, type Chunk, type ColumnPlan } from './csv-rules.js';
import type { ScanTarget } from './general-path.js';
import { splitFieldOf } from './csv-format.js';

/** Thrown when the fast path meets input it does not handle. Never leaves this folder. */
export class FastPathDeclined extends Error {
  constructor(readonly line: number) {
    super(`fast CSV path declined at line ${line}`);
  }
}

// Bytes the loop looks at.
const TAB = 9;
const LF = 10;
const VT = 11;
const FF = 12;
const CR = 13;
const SPACE = 32;
const QUOTE = 34;
const PLUS = 43;
const COMMA = 44;
const MINUS = 45;
const POINT = 46;
const DIGIT_0 = 48;
const DIGIT_9 = 57;
const UPPER_E = 69;
const LOWER_E = 101;

/**
 * Largest mantissa that can take one more decimal digit and stay below 2^53 (every integer
 * up to 2^53 is exact in a double): 900719925474098 * 10 + 9 < 9007199254740992.
 */
const MANTISSA_ROOM = 900719925474099;
/** Exponents beyond this are clamped while reading digits (the value then goes through Number()). */
const EXPONENT_CLAMP = 100000;
/** Powers of ten that are exact in a double: 10^0 .. 10^22. */
const EXACT_POWERS_OF_TEN = Float64Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

const utf8 = new TextDecoder('utf-8', { ignoreBOM: true });

/**
 * Reads plain numeric CSV and yields numeric chunks; throws {@link FastPathDeclined} at the
 * first thing it does not handle (chunks already yielded stay valid: they are exactly what
 * the general path gives for those rows).
 *
 * A number is built exactly: the digits go into an integer mantissa m (kept below 2^53) and
 * a decimal exponent e; when |e| <= 22 the value is m * 10^e or m / 10^-e, one correctly
 * rounded operation on two exact doubles, hence equal to `Number(text)` (W. D. Clinger,
 * "How to read floating point numbers accurately", PLDI 1990, the fast path). Otherwise the
 * cell's text goes through `Number()`.
 *
 * @param pieces the file's bytes in pieces of any size
 * @param target what to read
 */
export async function* fastChunks(pieces: AsyncIterable<Uint8Array>, target: ScanTarget): AsyncGenerator<Chunk> {
  const reader = new FastReader(target);
  for await (const block of lineBlocks(pieces)) {
    const stop = blockError(target.file, reader.line, block);
    if (stop !== null) throw stop;
    let bytes = block.bytes;
    if (block.final && bytes[bytes.length - 1] !== LF) {
      // Give the last line its line feed so that every inner loop stops on one.
      const closed = new Uint8Array(bytes.length + 1);
      closed.set(bytes);
      closed[bytes.length] = LF;
      bytes = closed;
    }
    reader.read(bytes);
    if (reader.stopped) return;
    for (const chunk of reader.builder.take()) {
      yield chunk;
      if (target.recycle === true) reader.builder.recycle(chunk);
    }
  }
  if (reader.plan === null) throw emptyError(target.file);
  reader.builder.finish();
  for (const chunk of reader.builder.take()) {
    yield chunk;
    if (target.recycle === true) reader.builder.recycle(chunk);
  }
}

/** State of the fast path between blocks. */
class FastReader {
  readonly builder: ChunkBuilder;
  plan: ColumnPlan | null = null;
  /** 1-based line number of the next line to read. */
  line = 1;
  /** True once a header-only read has its header. */
  stopped = false;
  /** Field separator byte (comma, semicolon or tab). */
  readonly separator: number;
  /** Decimal mark byte (point or comma). */
  readonly decimal: number;
  /** White space skipped around cells besides the space: the tab, unless the tab separates fields. */
  readonly blank: number;
  /** Field index of the split column, or -1. */
  splitField = -1;
  /** UTF-8 bytes of the split labels to keep and to skip. */
  readonly keepLabel: Uint8Array;
  readonly otherLabel: Uint8Array;

  constructor(private readonly target: ScanTarget) {
    this.builder = new ChunkBuilder(target.request, target.chunkRows);
    const format = target.format;
    this.separator = format === undefined || format.separator === 'auto' ? COMMA : format.separator.charCodeAt(0);
    this.decimal = format === undefined ? POINT : format.decimal.charCodeAt(0);
    this.blank = this.separator === TAB ? SPACE : TAB;
    const encoder = new TextEncoder();
    this.keepLabel = encoder.encode(target.split?.keep ?? '');
    this.otherLabel = encoder.encode(target.split?.other ?? '');
  }

  /** Reads whole lines; `buf` ends with a line feed. */
  read(buf: Uint8Array): void {
    let p = this.plan === null ? this.readHeader(buf) : 0;
    if (this.plan === null || this.stopped) return;
    const builder = this.builder;
    while (p < buf.length) {
      p = this.readRows(buf, p);
      // The buffer switch lives out here so the hot loop never runs code it has no type
      // feedback for (which would throw away its optimised code).
      if (builder.row === builder.capacity) builder.full();
    }
  }

  /** Reads rows from `p` until the block ends or the chunk buffers are full; returns the new offset. */
  private readRows(buf: Uint8Array, p: number): number {
    const plan = this.plan as ColumnPlan;
    const end = buf.length;
    const slotOfField = plan.slotOfField;
    const lastField = slotOfField.length - 1;
    const builder = this.builder;
    const SEP = this.separator;
    const DEC = this.decimal;
    const BLANK = this.blank;
    const splitField = this.splitField;
    const slots = builder.slots;
    const lines = builder.lines;
    const capacity = builder.capacity;
    let row = builder.row;
    let line = this.line;
    let text: Buffer | null = null;

    // The counters are stored on every line, inside the loop: code after a loop that V8 optimised
    // while it ran has no type feedback, and reaching it would throw the optimised code away.
    while (p < end && row < capacity) {
      // Line start: skip spaces and tabs; a line of nothing else is blank.
      let b = buf[p];
      while (b === SPACE || b === BLANK) b = buf[++p];
      if (b === LF) {
        p++;
        line++;
        this.line = line;
        continue;
      }
      if (b === CR && buf[p + 1] === LF) {
        p += 2;
        line++;
        this.line = line;
        continue;
      }
      // Other white space could make the line blank for the general path: let it decide.
      if (b > 127 || b === VT || b === FF || b === CR || b === TAB) throw new FastPathDeclined(line);
      let keep = true;

      let field = 0;
      for (;;) {
        const slot = slotOfField[field];
        if (slot >= 0) {
          // A requested cell: [spaces] [sign] digits [. digits] [e [sign] digits] [spaces]
          while (b === SPACE || b === BLANK) b = buf[++p];
          const start = p;
          let negative = false;
          if (b === MINUS) {
            negative = true;
            b = buf[++p];
          } else if (b === PLUS) {
            b = buf[++p];
          }
          let mantissa = 0;
          let digits = 0;
          let exponent = 0;
          let exact = true;
          while (b >= DIGIT_0 && b <= DIGIT_9) {
            if (mantissa < MANTISSA_ROOM) mantissa = mantissa * 10 + (b - DIGIT_0);
            else exact = false;
            digits++;
            b = buf[++p];
          }
          if (b === DEC) {
            b = buf[++p];
            while (b >= DIGIT_0 && b <= DIGIT_9) {
              if (mantissa < MANTISSA_ROOM) {
                mantissa = mantissa * 10 + (b - DIGIT_0);
                exponent--;
              } else exact = false;
              digits++;
              b = buf[++p];
            }
          }
          if (digits === 0) throw new FastPathDeclined(line);
          if (b === LOWER_E || b === UPPER_E) {
            b = buf[++p];
            // The sign multiplies: a unary minus would run only for negative exponents, and code
            // that runs rarely has no type feedback when V8 optimises the loop.
            let exponentSign = 1;
            if (b === MINUS) {
              exponentSign = -1;
              b = buf[++p];
            } else if (b === PLUS) {
              b = buf[++p];
            }
            if (!(b >= DIGIT_0 && b <= DIGIT_9)) throw new FastPathDeclined(line);
            let e = 0;
            while (b >= DIGIT_0 && b <= DIGIT_9) {
              if (e < EXPONENT_CLAMP) e = e * 10 + (b - DIGIT_0);
              b = buf[++p];
            }
            exponent += exponentSign * e;
          }
          let value: number;
          if (exact && exponent >= -22 && exponent <= 22) {
            value = exponent < 0 ? mantissa / EXACT_POWERS_OF_TEN[-exponent] : mantissa * EXACT_POWERS_OF_TEN[exponent];
            if (negative) value = -value;
          } else {
            if (DEC !== POINT) throw new FastPathDeclined(line);
            text ??= Buffer.from(buf.buffer, buf.byteOffset, buf.byteLength);
            value = Number(text.toString('latin1', start, p));
            // Overflow, and underflow of a nonzero text (mantissa > 0) to 0 or a subnormal: the
            // general path says which (the exact branch above can do neither).
            if (!Number.isFinite(value) || (mantissa !== 0 && Math.abs(value) < MIN_NORMAL)) throw new FastPathDeclined(line);
          }
          while (b === SPACE || b === BLANK) b = buf[++p];
          slots[slot][row] = value;
        } else {
          // An unused cell: skip to the separator or the line end.
          const start = p;
          while (b !== SEP && b !== LF) {
            if (b === QUOTE || (b === CR && buf[p + 1] !== LF)) throw new FastPathDeclined(line);
            if (b === CR) break;
            b = buf[++p];
          }
          if (field === splitField) keep = this.splitKeeps(buf, start, p, line);
        }
        if (b === SEP) {
          if (field === lastField) throw new FastPathDeclined(line);
          field++;
          b = buf[++p];
          continue;
        }
        if (b === CR && buf[p + 1] === LF) b = buf[++p];
        if (b !== LF || field !== lastField) throw new FastPathDeclined(line);
        p++;
        break;
      }
      if (keep) {
        lines[row] = line;
        row++;
        builder.row = row;
      }
      line++;
      this.line = line;
    }
    return p;
  }

  /**
   * True when the split cell in `buf[start, end)` (spaces and tabs around it ignored) is the label to
   * keep, false when it is the other label; declines otherwise (the general path names the error).
   */
  private splitKeeps(buf: Uint8Array, start: number, end: number, line: number): boolean {
    while (start < end && (buf[start] === SPACE || buf[start] === TAB)) start++;
    while (end > start && (buf[end - 1] === SPACE || buf[end - 1] === TAB)) end--;
    const same = (label: Uint8Array): boolean => {
      if (label.length !== end - start) return false;
      for (let i = 0; i < label.length; i++) if (buf[start + i] !== label[i]) return false;
      return true;
    };
    if (same(this.keepLabel)) return true;
    if (same(this.otherLabel)) return false;
    throw new FastPathDeclined(line);
  }

  /**
   * Reads lines up to and including the first non-blank one, the header; returns the offset
   * after it (or `buf.length` when the block has no header yet).
   */
  private readHeader(buf: Uint8Array): number {
    let p = 0;
    while (p < buf.length) {
      const lf = buf.indexOf(LF, p);
      let end = lf;
      if (end > p && buf[end - 1] === CR) end--;
      for (let i = p; i < end; i++) {
        if (buf[i] === QUOTE || buf[i] === CR) throw new FastPathDeclined(this.line);
      }
      const text = utf8.decode(buf.subarray(p, end));
      const line = this.line++;
      p = lf + 1;
      // A line of tabs is blank here but a record of empty fields to csv-parse in a tab-separated file.
      if (this.separator === TAB && text.includes('\t') && text.trim() === '') throw new FastPathDeclined(line);
      if (text.trim() === '') continue;
      const header = text.split(String.fromCharCode(this.separator)).map((name) => name.trim());
      this.plan = planColumns(this.target.file, header, line, this.target.request);
      if (this.target.split !== undefined) this.splitField = splitFieldOf(this.target.file, header, line, this.target.split);
      // A split column that is also read as numbers: the general path handles it.
      if (this.splitField !== -1 && this.plan.slotOfField[this.splitField] >= 0) throw new FastPathDeclined(line);
      this.target.onHeader(this.plan);
      if (this.target.headerOnly) this.stopped = true;
      return p;
    }
    return p;
  }
}
