/**
 * A fast path for the common shape of fitgate's YAML files, beside the `yaml` library (which stays
 * the authority). Parsing a descriptor of some fifteen lines through the library costs a few hundred
 * microseconds; on a repository of a thousand models that was about a tenth of a whole run
 * (measured by CPU profile, see docs/security.md). This module reads a strict subset of YAML 1.2 in
 * one linear pass and gives the same {@link FastYamlResult} the library-based path would give (the
 * same plain value, the same key and value positions); for anything outside the subset it answers
 * `null` ("declined") and the caller parses the text with the library exactly as before.
 *
 * The subset (everything else is declined):
 * - lines end in `\n` only; no tab, carriage return or other control character anywhere; no line
 *   longer than {@link FAST_YAML_LIMITS}.maxLineLength; at most {@link FAST_YAML_LIMITS}.maxDepth
 *   nested collections;
 * - optionally one leading `---` line (comments may stand before it); no other document marker,
 *   no directive; the document is one block mapping or block list starting in column 1;
 * - block mappings (`key: value`, `key:` followed by a more indented block, a block list at the
 *   same indentation or nothing) and block lists (`- item`, `- key: value` starting a mapping,
 *   `-` followed by a more indented block or nothing), nested by spaces;
 * - keys: plain words of letters, digits and `_ . - + / : $ ( ) ^ ~` (not ending in `:`), unique
 *   in their mapping, not resolving to null;
 * - values on one line: plain scalars (no `: `, no brackets, not starting with an indicator),
 *   single-quoted strings (`''` for a quote), double-quoted strings without backslashes, and flow
 *   mappings `{ k: v, ... }` and flow lists `[a, b]` of such scalars and of flow collections (no
 *   empty entry, no trailing comma, no `:` or `#` in their plain scalars);
 * - full-line comments anywhere and trailing comments after a space.
 *
 * Plain scalars resolve as the library's YAML 1.2 core schema resolves them (same tests in the same
 * order: null, bool, 0o octal, decimal int, 0x hex, .inf/.nan, exponent float, float), so `yes`,
 * `off` and `017`-like text resolve the same way on both paths.
 */

import type { Position } from './types.js';

/** Limits of the fast path; text beyond them is declined (not refused: the library then decides). */
export const FAST_YAML_LIMITS = Object.freeze({
  /** Longest line read, in UTF-16 code units. */
  maxLineLength: 500,
  /** Deepest nesting of mappings and lists (the library path allows 64). */
  maxDepth: 32,
  /** Largest text in UTF-16 code units. */
  maxLength: 256 * 1024,
});

/** What the fast path gives for text it accepts: the value and position lookups of a YamlDocument. */
export interface FastYamlResult {
  /** The document as plain JavaScript (objects, arrays, strings, numbers, booleans, null). */
  value: unknown;
  /** Position of a key path as the library path gives it (key of a mapping entry, start of a list item); null when absent. */
  positionOf(path: (string | number)[]): Position | null;
  /** Position of the value at a key path as the library path gives it; null when absent. */
  valuePositionOf(path: (string | number)[]): Position | null;
}

type FastNode =
  | { kind: 'scalar'; start: number; value: unknown }
  | { kind: 'map'; start: number; keys: string[]; keyStarts: number[]; values: FastNode[] }
  | { kind: 'seq'; start: number; items: FastNode[] };

/** Thrown inside the parser to decline; caught in {@link parseFastYaml}. */
class Declined {}
const DECLINED = new Declined();

interface Line {
  /** Offset of the line's first character. */
  start: number;
  /** Offset of the line's end (its `\n`, or the text's length). */
  end: number;
  /** Leading spaces. */
  indent: number;
}

/**
 * Parses text in the fast-path subset (see the module comment).
 *
 * @param text YAML text without a byte-order mark
 * @returns the value and position lookups, or null when the text is outside the subset (declined)
 */
export function parseFastYaml(text: string): FastYamlResult | null {
  if (text.length > FAST_YAML_LIMITS.maxLength) return null;
  const lineStarts: number[] = [0];
  const content: Line[] = [];
  let sawMarker = false;
  let lineStart = 0;
  for (let i = 0; i <= text.length; i++) {
    const c = i < text.length ? text.charCodeAt(i) : 0x0a;
    if (c !== 0x0a) {
      if (c < 0x20 || (c >= 0x7f && c <= 0xa0) || c === 0x2028 || c === 0x2029 || c === 0xfeff) return null;
      continue;
    }
    const end = i;
    if (end - lineStart > FAST_YAML_LIMITS.maxLineLength) return null;
    let indent = 0;
    while (lineStart + indent < end && text.charCodeAt(lineStart + indent) === 0x20) indent++;
    const first = lineStart + indent < end ? text.charCodeAt(lineStart + indent) : -1;
    if (first !== -1 && first !== 0x23) {
      if (indent === 0 && (text.startsWith('---', lineStart) || text.startsWith('...', lineStart))) {
        if (content.length > 0 || sawMarker || end - lineStart !== 3 || text.charCodeAt(lineStart) !== 0x2d) return null;
        sawMarker = true;
      } else {
        content.push({ start: lineStart, end, indent });
      }
    }
    if (i < text.length) lineStarts.push(i + 1);
    lineStart = i + 1;
  }
  if (content.length === 0 || content[0].indent !== 0) return null;

  let root: FastNode;
  try {
    const parser = new Parser(text, content);
    root = parser.document();
  } catch (error) {
    if (error === DECLINED) return null;
    throw error;
  }

  const at = (offset: number): Position => {
    let low = 0;
    let high = lineStarts.length;
    while (low < high) {
      const mid = (low + high) >> 1;
      if (lineStarts[mid] <= offset) low = mid + 1;
      else high = mid;
    }
    return { line: low, column: offset - lineStarts[low - 1] + 1 };
  };

  // The same walk as the library path's `locate` (yaml-source.ts), on this module's nodes.
  const locate = (path: (string | number)[], wantValue: boolean): Position | null => {
    let node: FastNode = root;
    let keyOffset = root.start;
    for (const segment of path) {
      if (typeof segment === 'number' && node.kind === 'seq') {
        const item: FastNode | undefined = node.items[segment];
        if (item === undefined) return null;
        node = item;
        keyOffset = item.start;
      } else if (node.kind === 'map') {
        const index = node.keys.indexOf(String(segment));
        if (index < 0) return null;
        keyOffset = node.keyStarts[index];
        node = node.values[index];
      } else {
        return null;
      }
    }
    return at(wantValue ? node.start : keyOffset);
  };

  return {
    value: toPlain(root),
    positionOf: (path) => locate(path, false),
    valuePositionOf: (path) => locate(path, true),
  };
}

function toPlain(node: FastNode): unknown {
  if (node.kind === 'scalar') return node.value;
  if (node.kind === 'seq') return node.items.map(toPlain);
  const out: Record<string, unknown> = {};
  for (let i = 0; i < node.keys.length; i++) {
    const key = node.keys[i];
    const value = toPlain(node.values[i]);
    // As the library does: an own property even for `__proto__` (other names a plain object
    // inherits are data properties, which an assignment shadows the same way).
    if (key === '__proto__') Object.defineProperty(out, key, { value, writable: true, enumerable: true, configurable: true });
    else out[key] = value;
  }
  return out;
}

const KEY = /^(?:[A-Za-z0-9_]|[-+.][A-Za-z0-9_.])[A-Za-z0-9_.\-+/:$()^~]*$/;

class Parser {
  private li = 0;

  constructor(
    private readonly text: string,
    private readonly lines: Line[],
  ) {}

  document(): FastNode {
    const node = this.block(0, 1);
    if (this.li !== this.lines.length) throw DECLINED;
    return node;
  }

  /** The block node whose first line is the current one, at its indentation. */
  private block(indent: number, depth: number): FastNode {
    if (depth > FAST_YAML_LIMITS.maxDepth) throw DECLINED;
    const line = this.lines[this.li];
    if (line.indent !== indent) throw DECLINED;
    return this.isItem(line.start + indent, line.end) ? this.seq(indent, depth) : this.map(indent, line.start + indent, depth);
  }

  /** Whether a `-` at `pos` starts a list item (followed by a space or the line's end). */
  private isItem(pos: number, end: number): boolean {
    return this.text.charCodeAt(pos) === 0x2d && (pos + 1 === end || this.text.charCodeAt(pos + 1) === 0x20);
  }

  /** A block mapping at `indent`; its first key is at `firstKey` on the current line (compact in a list item or not). */
  private map(indent: number, firstKey: number, depth: number): FastNode {
    const node: FastNode = { kind: 'map', start: firstKey, keys: [], keyStarts: [], values: [] };
    let keyPos = firstKey;
    for (;;) {
      const line = this.lines[this.li];
      const { text } = this;
      // The key: up to the first `:` followed by a space or the line's end.
      let colon = -1;
      for (let i = keyPos; i < line.end; i++) {
        const c = text.charCodeAt(i);
        if (c === 0x3a && (i + 1 === line.end || text.charCodeAt(i + 1) === 0x20)) {
          colon = i;
          break;
        }
        if (c === 0x20) throw DECLINED;
      }
      if (colon < 0) throw DECLINED;
      const keySource = text.slice(keyPos, colon);
      if (!KEY.test(keySource) || keySource.endsWith(':')) throw DECLINED;
      const keyValue = resolvePlain(keySource);
      if (keyValue === null) throw DECLINED;
      const key = String(keyValue);
      if (node.keys.includes(key)) throw DECLINED;
      node.keys.push(key);
      node.keyStarts.push(keyPos);
      node.values.push(this.valueAfter(colon + 1, line, indent, depth));
      // The next line of this mapping, or its end.
      if (this.li >= this.lines.length) break;
      const next = this.lines[this.li];
      if (next.indent > indent) throw DECLINED;
      if (next.indent < indent) break;
      keyPos = next.start + indent;
      // A list item at a mapping's own indentation (not after an empty key) is an error for the library.
      if (this.isItem(keyPos, next.end)) throw DECLINED;
    }
    return node;
  }

  /** A block list at `indent` starting on the current line. */
  private seq(indent: number, depth: number): FastNode {
    const first = this.lines[this.li];
    const node: FastNode = { kind: 'seq', start: first.start + indent, items: [] };
    for (;;) {
      const line = this.lines[this.li];
      const dash = line.start + indent;
      node.items.push(this.itemAfter(dash + 1, line, indent, depth));
      if (this.li >= this.lines.length) break;
      const next = this.lines[this.li];
      if (next.indent > indent) throw DECLINED;
      if (next.indent < indent || !this.isItem(next.start + indent, next.end)) break;
    }
    return node;
  }

  /** A list item's content after its `-`; consumes the item's lines. */
  private itemAfter(pos: number, line: Line, indent: number, depth: number): FastNode {
    const { text } = this;
    let p = pos;
    while (p < line.end && text.charCodeAt(p) === 0x20) p++;
    const c = p < line.end ? text.charCodeAt(p) : -1;
    if (c === -1 || c === 0x23) return this.nestedOrNull(p, indent, depth, false);
    if (this.isItem(p, line.end)) throw DECLINED;
    if (c !== 0x27 && c !== 0x22 && c !== 0x5b && c !== 0x7b && hasKeyColon(text, p, line.end)) {
      if (depth + 1 > FAST_YAML_LIMITS.maxDepth) throw DECLINED;
      return this.map(p - line.start, p, depth + 1);
    }
    const value = this.inlineValue(p, line.end, depth + 1);
    this.li++;
    return value;
  }

  /** A mapping entry's value after its `:`; consumes the entry's lines. */
  private valueAfter(pos: number, line: Line, indent: number, depth: number): FastNode {
    const { text } = this;
    let p = pos;
    while (p < line.end && text.charCodeAt(p) === 0x20) p++;
    const c = p < line.end ? text.charCodeAt(p) : -1;
    if (c === -1 || c === 0x23) return this.nestedOrNull(p, indent, depth, true);
    const value = this.inlineValue(p, line.end, depth + 1);
    this.li++;
    return value;
  }

  /**
   * After an empty `key:` or `-`: a more indented block on the next line, a block list at the same
   * indentation (after a mapping key only), or null placed where the library places it.
   */
  private nestedOrNull(nullAt: number, indent: number, depth: number, afterKey: boolean): FastNode {
    this.li++;
    if (this.li < this.lines.length) {
      const next = this.lines[this.li];
      if (next.indent > indent) return this.block(next.indent, depth + 1);
      if (afterKey && next.indent === indent && this.isItem(next.start + indent, next.end)) return this.seq(indent, depth + 1);
    }
    return { kind: 'scalar', start: nullAt, value: null };
  }

  /** A scalar or flow collection filling the rest of a line from `p` (a trailing comment allowed). */
  private inlineValue(p: number, end: number, depth: number): FastNode {
    const { text } = this;
    const c = text.charCodeAt(p);
    let node: FastNode;
    let after: number;
    if (c === 0x27 || c === 0x22) {
      const q = quoted(text, p, end);
      node = { kind: 'scalar', start: p, value: q.value };
      after = q.end;
    } else if (c === 0x5b || c === 0x7b) {
      const f = flow(text, p, end, depth);
      node = f.node;
      after = f.end;
    } else {
      let stop = end;
      for (let i = p + 1; i < end; i++) {
        if (text.charCodeAt(i) === 0x23 && text.charCodeAt(i - 1) === 0x20) {
          stop = i;
          break;
        }
      }
      let last = stop;
      while (last > p && text.charCodeAt(last - 1) === 0x20) last--;
      const source = text.slice(p, last);
      if (!plainOk(source, false)) throw DECLINED;
      return { kind: 'scalar', start: p, value: resolvePlain(source) };
    }
    // After a quoted scalar or a flow collection: spaces, then the line's end or a comment.
    let i = after;
    while (i < end && text.charCodeAt(i) === 0x20) i++;
    if (i < end && (text.charCodeAt(i) !== 0x23 || i === after)) throw DECLINED;
    return node;
  }
}

/** Whether a `:` followed by a space or the line's end comes before any comment on the line. */
function hasKeyColon(text: string, p: number, end: number): boolean {
  for (let i = p; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x3a && (i + 1 === end || text.charCodeAt(i + 1) === 0x20)) return true;
    if (c === 0x23 && i > p && text.charCodeAt(i - 1) === 0x20) return false;
  }
  return false;
}

/** A quoted scalar on one line at `p`: its value and the offset after its closing quote. */
function quoted(text: string, p: number, end: number): { value: string; end: number } {
  const quote = text.charCodeAt(p);
  if (quote === 0x22) {
    const close = text.indexOf('"', p + 1);
    if (close < 0 || close >= end) throw DECLINED;
    const value = text.slice(p + 1, close);
    if (value.includes('\\')) throw DECLINED;
    return { value, end: close + 1 };
  }
  let value = '';
  let i = p + 1;
  for (;;) {
    const close = text.indexOf("'", i);
    if (close < 0 || close >= end) throw DECLINED;
    value += text.slice(i, close);
    if (close + 1 < end && text.charCodeAt(close + 1) === 0x27) {
      value += "'";
      i = close + 2;
    } else {
      return { value, end: close + 1 };
    }
  }
}

/** A flow mapping or list of scalars and flow collections on one line at `p`: its node and the offset after its closing bracket. */
function flow(text: string, p: number, end: number, depth: number): { node: FastNode; end: number } {
  if (depth > FAST_YAML_LIMITS.maxDepth) throw DECLINED;
  const isMap = text.charCodeAt(p) === 0x7b;
  const close = isMap ? 0x7d : 0x5d;
  const keys: string[] = [];
  const keyStarts: number[] = [];
  const values: FastNode[] = [];
  const skip = (from: number): number => {
    let i = from;
    while (i < end && text.charCodeAt(i) === 0x20) i++;
    return i;
  };
  let i = skip(p + 1);
  if (i < end && text.charCodeAt(i) === close) {
    const node: FastNode = isMap ? { kind: 'map', start: p, keys, keyStarts, values } : { kind: 'seq', start: p, items: values };
    return { node, end: i + 1 };
  }
  for (let count = 0; ; count++) {
    if (count > FAST_YAML_LIMITS.maxLineLength) throw DECLINED;
    if (isMap) {
      const colon = text.indexOf(': ', i);
      if (colon < 0 || colon >= end) throw DECLINED;
      const keySource = text.slice(i, colon);
      if (!KEY.test(keySource) || keySource.includes(':') || keySource.endsWith(':')) throw DECLINED;
      const keyValue = resolvePlain(keySource);
      if (keyValue === null) throw DECLINED;
      const key = String(keyValue);
      if (keys.includes(key)) throw DECLINED;
      keys.push(key);
      keyStarts.push(i);
      i = skip(colon + 1);
    }
    if (i >= end) throw DECLINED;
    const c = text.charCodeAt(i);
    let after: number;
    if (c === 0x27 || c === 0x22) {
      const q = quoted(text, i, end);
      values.push({ kind: 'scalar', start: i, value: q.value });
      after = q.end;
    } else if (c === 0x5b || c === 0x7b) {
      const inner = flow(text, i, end, depth + 1);
      values.push(inner.node);
      after = inner.end;
    } else {
      let stop = i;
      while (stop < end) {
        const d = text.charCodeAt(stop);
        if (d === 0x2c || d === 0x5d || d === 0x7d) break;
        stop++;
      }
      let last = stop;
      while (last > i && text.charCodeAt(last - 1) === 0x20) last--;
      const source = text.slice(i, last);
      if (!plainOk(source, true)) throw DECLINED;
      values.push({ kind: 'scalar', start: i, value: resolvePlain(source) });
      after = last;
    }
    i = skip(after);
    if (i >= end) throw DECLINED;
    const d = text.charCodeAt(i);
    if (d === close) {
      const node: FastNode = isMap ? { kind: 'map', start: p, keys, keyStarts, values } : { kind: 'seq', start: p, items: values };
      return { node, end: i + 1 };
    }
    if (d !== 0x2c) throw DECLINED;
    i = skip(i + 1);
    if (i >= end || text.charCodeAt(i) === close || text.charCodeAt(i) === 0x2c) throw DECLINED;
  }
}

/** Whether a plain scalar's text (trimmed, one line) is one the fast path reads as the library does. */
function plainOk(source: string, inFlow: boolean): boolean {
  if (source.length === 0) return false;
  const first = source.charCodeAt(0);
  // Indicators that cannot start a plain scalar here: - ? : , [ ] { } # & * ! | > ' " % @ `
  if ('?:,[]{}#&*!|>\'"%@`'.includes(source[0])) return false;
  if (first === 0x2d && !/^-[0-9A-Za-z._]/.test(source)) return false;
  if (source.endsWith(':') || source.includes(': ') || source.includes(' #')) return false;
  if (/[[\]{}]/.test(source)) return false;
  if (inFlow && (source.includes(':') || source.includes('#') || source.includes(','))) return false;
  return true;
}

/** First characters a null, boolean or number of the core schema can start with. */
const FIRST = /^[0-9+\-.~nNtTfF]/;
const NULL = /^(?:~|[Nn]ull|NULL)?$/;
const BOOL = /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/;
const INT_OCT = /^0o[0-7]+$/;
const INT = /^[-+]?[0-9]+$/;
const INT_HEX = /^0x[0-9a-fA-F]+$/;
const FLOAT_NAN = /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/;
const FLOAT_EXP = /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/;
const FLOAT = /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/;

/**
 * A plain scalar's value under the YAML 1.2 core schema, with the tests and conversions of the
 * `yaml` library's core schema (node_modules/yaml/dist/schema/core), tried in the library's order.
 */
export function resolvePlain(source: string): unknown {
  // Every test below needs one of these first characters (or empty text): others are text at once.
  if (source.length > 0 && !FIRST.test(source)) return source;
  if (NULL.test(source)) return null;
  if (BOOL.test(source)) return source[0] === 't' || source[0] === 'T';
  if (INT_OCT.test(source)) return parseInt(source.substring(2), 8);
  if (INT.test(source)) return parseInt(source, 10);
  if (INT_HEX.test(source)) return parseInt(source.substring(2), 16);
  if (FLOAT_NAN.test(source)) {
    if (source.slice(-3).toLowerCase() === 'nan') return Number.NaN;
    return source[0] === '-' ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY;
  }
  if (FLOAT_EXP.test(source)) return parseFloat(source);
  if (FLOAT.test(source)) return parseFloat(source);
  return source;
}
