/**
 * The descriptor line a suggestion replaces, rewritten: only the value of one key changes
 * (`degree: 9` becomes `degree: 3`), the rest of the line stays byte for byte: indentation,
 * flow-mapping style (`{ of: x, degree: 9 }`), spacing and trailing comments.
 */
import { isMap, isPair, isScalar, LineCounter, visit, type Pair, type Scalar } from 'yaml';
import { parseYamlDocument } from '../config/yaml-parse.js';

/** What to change: a key and its new number. */
export interface SettingChange {
  /** The key whose value changes: `degree`, `width` or `ridge`. */
  key: string;
  /** The new value (written as JavaScript writes the number: `3`, `1.6`, `0.0012`, `1.2e-7`). */
  value: number;
}

/** A rewritten line. */
export interface RewrittenLine {
  /** 1-based line of the file the value is on (the line to replace). */
  line: number;
  /** The line as it is (without its line break or a trailing carriage return). */
  before: string;
  /** The line with the new value. */
  after: string;
}

/** Options of the YAML parser, as the descriptor loader reads descriptors (YAML 1.2, core schema). */
const PARSE = { prettyErrors: false, uniqueKeys: false, version: '1.2', schema: 'core' } as const;

/** Line of an offset (1-based). */
function lineOf(counter: LineCounter, offset: number): number {
  return counter.linePos(offset).line;
}

/** The plain numeric scalar value of `key` in `pair`, or null. */
function numericValue(pair: Pair, key: string): Scalar | null {
  if (!isScalar(pair.key) || pair.key.value !== key) return null;
  const v = pair.value;
  if (!isScalar(v) || typeof v.value !== 'number' || v.type !== 'PLAIN' || v.tag !== undefined || !v.range) return null;
  return v;
}

/**
 * Rewrites the value of `change.key` that belongs to the descriptor line `line`: either the key
 * is on that line (`degree: 9`, `ridge: 0`, `{ of: x, degree: 9 }`), or the line holds the key of
 * a mapping that contains it (`- polynomial:` with `degree: 9` on a line below). The value must be
 * a plain number on one line, and exactly one such key may match. The new text is checked by
 * parsing the whole file again: it must be valid YAML whose value at the same place is the new
 * number.
 * @param text the descriptor file's text
 * @param line the line the suggestion points at (1-based)
 * @param change the key and its new value
 * @returns the line to replace and its new text, or null when the value cannot be found or
 *   rewritten this way (e.g. `ridge` not written in the file)
 */
export function rewriteSetting(text: string, line: number, change: SettingChange): RewrittenLine | null {
  if (!Number.isFinite(change.value)) return null;
  const counter = new LineCounter();
  const doc = parseYamlDocument(text, { ...PARSE, lineCounter: counter });
  if (doc.errors.length > 0) return null;

  // Every pair `key: <number>` that is on the line or inside a mapping whose key is on the line.
  const found: Scalar[] = [];
  visit(doc, {
    Pair(_, pair, path) {
      const value = numericValue(pair, change.key);
      if (value === null) return;
      const onLine = (p: unknown): boolean =>
        isPair(p) && isScalar(p.key) && p.key.range !== undefined && p.key.range !== null && lineOf(counter, p.key.range[0]) === line;
      if (onLine(pair) || path.some(onLine)) found.push(value);
    },
  });
  if (found.length !== 1) return null;
  const [start, end] = found[0].range!;
  const at = lineOf(counter, start);
  if (lineOf(counter, end) !== at) return null;

  const lines = text.split('\n');
  const lineStart = counter.lineStarts[at - 1];
  const before = lines[at - 1].replace(/\r$/, '');
  const newValue = String(change.value);
  const after = before.slice(0, start - lineStart) + newValue + before.slice(end - lineStart);

  // The new file must parse, and hold the new number where the old one was.
  const changed = [...lines.slice(0, at - 1), after, ...lines.slice(at)].join('\n');
  const again = parseYamlDocument(changed, PARSE);
  if (again.errors.length > 0) return null;
  let same = false;
  visit(again, {
    Scalar(_, node) {
      if (node.range && node.range[0] === start && node.value === change.value) same = true;
    },
  });
  if (!same || isMap(again.contents) === false) return null;
  return { line: at, before, after };
}
