/**
 * YAML text to a plain value plus the source position of any key path, with the guards a
 * file from a pull request needs: a size cap, a nesting cap, an alias cap, duplicate keys
 * refused, and non-UTF-8 or binary content refused. Every problem is an {@link InputError}
 * naming the file, line and column.
 */

import { isAlias, isMap, isPair, isScalar, isSeq, LineCounter } from 'yaml';
import { parseFastYaml } from './yaml-fast.js';
import { parseYamlDocument } from './yaml-parse.js';
import type { Document, Node as YamlNode, YAMLMap, YAMLSeq } from 'yaml';
import { InputError, clip } from '../core/errors.js';
import type { RepoReader } from '../repo/types.js';
import type { Position } from './types.js';

/** Guards applied to every YAML file fitgate reads. */
export const YAML_GUARDS = Object.freeze({
  /** Largest YAML file in bytes: 1 MiB. */
  maxBytes: 1024 * 1024,
  /** Deepest nesting of mappings and lists. */
  maxDepth: 64,
  /** Most alias expansions (`*name`) in one document. */
  maxAliasCount: 100,
});

/** Stable codes of the errors this module throws. */
export const YAML_ERROR = Object.freeze({
  syntax: 'yaml-syntax',
  duplicateKey: 'yaml-duplicate-key',
  collectionKey: 'yaml-collection-key',
  tooDeep: 'yaml-too-deep',
  aliases: 'yaml-aliases',
  tooLarge: 'file-too-large',
  encoding: 'file-encoding',
});

/** A parsed YAML document: its plain value and the positions of its keys. */
export interface YamlDocument {
  /** The document as plain JavaScript (objects, arrays, strings, numbers, booleans, null). */
  value: unknown;
  /**
   * Position of a key path: for a mapping entry the position of its key, for a list item
   * the position of the item. `[]` is the start of the document. Null when the path does not exist.
   */
  positionOf(path: (string | number)[]): Position | null;
  /** Position of the value at a key path (falls back to the key when the value is empty). */
  valuePositionOf(path: (string | number)[]): Position | null;
}

/**
 * Decodes file bytes as UTF-8 text (a leading byte-order mark is dropped).
 *
 * @param bytes the file's contents
 * @param file repository-relative path, for messages
 * @throws InputError `file-too-large` above {@link YAML_GUARDS}.maxBytes, `file-encoding` for
 *   bytes that are not UTF-8 or that contain NUL characters (binary content)
 */
export function decodeYamlBytes(bytes: Uint8Array, file: string): string {
  checkSize(bytes.byteLength, file);
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    const at = firstInvalidUtf8(bytes);
    throw new InputError(
      YAML_ERROR.encoding,
      `is not UTF-8 text (invalid byte 0x${bytes[at].toString(16).padStart(2, '0')} at offset ${at}); expected a UTF-8 YAML file`,
      { file, ...positionInBytes(bytes, at) },
    );
  }
  const nul = text.indexOf('\u0000');
  if (nul >= 0) {
    throw new InputError(YAML_ERROR.encoding, 'contains a NUL character, so it looks binary; expected a UTF-8 YAML file', {
      file,
      ...positionInText(text, nul),
    });
  }
  return text;
}

/**
 * Reads and parses a YAML file through the repository reader, checking its size before reading.
 *
 * @param repo the repository
 * @param path repository-relative path
 */
export async function readYamlFile(repo: RepoReader, path: string): Promise<YamlDocument> {
  checkSize(await repo.size(path), path);
  return parseYaml(decodeYamlBytes(await repo.read(path), path), path);
}

/**
 * Parses YAML 1.2 text (core schema: `off`, `yes`, `no` stay strings) into a plain value.
 *
 * @param text the YAML text
 * @param file repository-relative path, for messages
 * @throws InputError `yaml-syntax` (the yaml package's message and position), `yaml-duplicate-key`,
 *   `yaml-too-deep` (nesting above {@link YAML_GUARDS}.maxDepth), `yaml-aliases` (more alias
 *   expansions than {@link YAML_GUARDS}.maxAliasCount), `file-too-large`
 */
export function parseYaml(text: string, file: string): YamlDocument {
  checkSize(Buffer.byteLength(text, 'utf8'), file);
  // The common shape of descriptors and settings files is read without the library when the text
  // is inside the fast path's strict subset (same value, same positions: see yaml-fast.ts);
  // anything else, and every error, goes to the library.
  const fast = parseFastYaml(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  if (fast !== null) return fast;
  return parseYamlWithLibrary(text, file);
}

/**
 * Parses YAML text with the `yaml` library only (no fast path), with every guard of
 * {@link parseYaml}; the authority the fast path is tested against.
 *
 * @param text the YAML text
 * @param file repository-relative path, for messages
 * @throws InputError as {@link parseYaml}
 */
export function parseYamlWithLibrary(text: string, file: string): YamlDocument {
  checkSize(Buffer.byteLength(text, 'utf8'), file);
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);

  // A cheap bound first: the yaml package's parser gets slow (and its composer runs out of
  // stack) on documents nested thousands deep, so refuse those before parsing.
  const rough = roughNesting(text);
  if (rough.depth > ROUGH_DEPTH_CAP) {
    throw new InputError(
      YAML_ERROR.tooDeep,
      `is nested more than ${YAML_GUARDS.maxDepth} levels deep; expected a shallow settings or descriptor file`,
      { file, ...positionInText(text, rough.offset) },
    );
  }

  const lineCounter = new LineCounter();
  const doc = parseYamlDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: false, version: '1.2', schema: 'core' });
  const at = (offset: number): Position => {
    const { line, col } = lineCounter.linePos(offset);
    return { line, column: col };
  };

  if (doc.errors.length > 0) {
    const error = doc.errors[0];
    const stackOverflow = /call stack/i.test(error.message);
    const message = error.message.replace(/ at line \d+, column \d+:?[\s\S]*$/, '');
    throw new InputError(
      stackOverflow ? YAML_ERROR.tooDeep : YAML_ERROR.syntax,
      stackOverflow ? `is nested too deeply; expected at most ${YAML_GUARDS.maxDepth} levels` : `is not valid YAML: ${clip(message, 120)}`,
      { file, ...at(error.pos[0]) },
    );
  }

  checkStructure(doc, text, file, at);

  let value: unknown;
  try {
    value = doc.toJS({ maxAliasCount: YAML_GUARDS.maxAliasCount });
  } catch (error) {
    const first = firstAlias(doc.contents);
    throw new InputError(
      YAML_ERROR.aliases,
      `expands aliases (*name) more than ${YAML_GUARDS.maxAliasCount} times (${error instanceof Error ? error.message : String(error)}); expected few aliases`,
      { file, ...(first ? at(first) : {}) },
    );
  }

  const locate = (path: (string | number)[], wantValue: boolean): Position | null => {
    let node: unknown = doc.contents;
    let keyOffset: number | null = node && (node as YamlNode).range ? (node as YamlNode).range![0] : 0;
    for (const segment of path) {
      node = resolveAlias(doc, node);
      if (typeof segment === 'number' && isSeq(node)) {
        const item = (node as YAMLSeq).items[segment];
        if (item === undefined) return null;
        node = item;
        const range = (item as YamlNode | null)?.range;
        if (!range) return null;
        keyOffset = range[0];
      } else if (isMap(node)) {
        const pair = (node as YAMLMap).items.find((p) => keyText(p.key) === String(segment));
        if (!pair) return null;
        const keyRange = (pair.key as YamlNode | null)?.range;
        keyOffset = keyRange ? keyRange[0] : keyOffset;
        node = pair.value;
      } else {
        return null;
      }
    }
    if (keyOffset === null) return null;
    if (wantValue) {
      const range = (resolveAlias(doc, node) as YamlNode | null)?.range;
      const own = (node as YamlNode | null)?.range;
      if (own) return at(own[0]);
      if (range) return at(range[0]);
    }
    return at(keyOffset);
  };

  return {
    value,
    positionOf: (path) => locate(path, false),
    valuePositionOf: (path) => locate(path, true),
  };
}

/** Above this rough bound the text is refused before parsing (the exact check is {@link YAML_GUARDS}.maxDepth). */
const ROUGH_DEPTH_CAP = 512;

/**
 * An over-estimate of nesting depth from the raw text: open flow brackets (anywhere, even
 * inside strings) and leading indentation plus leading `- ` items on each line. Cheap and
 * linear; only pathological text gets near {@link ROUGH_DEPTH_CAP}.
 */
function roughNesting(text: string): { depth: number; offset: number } {
  let flow = 0;
  let best = 0;
  let bestOffset = 0;
  let lineStart = true;
  let lead = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 0x0a) {
      lineStart = true;
      lead = 0;
      continue;
    }
    if (lineStart) {
      if (c === 0x20 || c === 0x09) lead += 1;
      else if (c === 0x2d && text.charCodeAt(i + 1) === 0x20) lead += 1;
      else lineStart = false;
      if (lead > best) {
        best = lead;
        bestOffset = i;
      }
    }
    if (c === 0x5b || c === 0x7b) {
      flow += 1;
      if (flow > best) {
        best = flow;
        bestOffset = i;
      }
    } else if ((c === 0x5d || c === 0x7d) && flow > 0) {
      flow -= 1;
    }
  }
  return { depth: best, offset: bestOffset };
}

/** Checks nesting depth, duplicate keys and keys that are lists or mappings on the syntax tree (aliases are followed only to see what a key is). */
function checkStructure(doc: Document, text: string, file: string, at: (offset: number) => Position): void {
  const visit = (node: unknown, depth: number): void => {
    if (isMap(node) || isSeq(node)) {
      if (depth > YAML_GUARDS.maxDepth) {
        throw new InputError(
          YAML_ERROR.tooDeep,
          `is nested more than ${YAML_GUARDS.maxDepth} levels deep; expected a shallow settings or descriptor file`,
          {
            file,
            ...(node.range ? at(node.range[0]) : {}),
          },
        );
      }
    }
    if (isMap(node)) {
      const seen = new Map<string, number>();
      for (const pair of node.items) {
        const keyOffset = (pair.key as YamlNode | null)?.range?.[0] ?? node.range?.[0] ?? 0;
        // YAML allows a list or a mapping as a key; no key of fitgate's files is one, and plain
        // JavaScript objects cannot hold one (the yaml package would print a process warning).
        const keyNode = resolveAlias(doc, pair.key);
        if (isMap(keyNode) || isSeq(keyNode)) {
          const range = (pair.key as YamlNode | null)?.range;
          const written = range ? text.slice(range[0], range[1]).replace(/\s+/g, ' ').trim() : '';
          throw new InputError(
            YAML_ERROR.collectionKey,
            `a ${isMap(keyNode) ? 'mapping' : 'list'} used as a key (\`${clip(written, 40)}\`); expected a plain name before the colon`,
            {
              file,
              ...at(keyOffset),
            },
          );
        }
        const key = keyText(pair.key);
        const before = seen.get(key);
        if (before !== undefined) {
          const first = at(before);
          throw new InputError(
            YAML_ERROR.duplicateKey,
            `key \`${clip(key)}\` appears twice in the same mapping (first at line ${first.line}); expected each key once`,
            {
              file,
              key,
              ...at(keyOffset),
            },
          );
        }
        seen.set(key, keyOffset);
        visit(pair.key, depth + 1);
        visit(pair.value, depth + 1);
      }
    } else if (isSeq(node)) {
      for (const item of node.items) visit(item, depth + 1);
    } else if (isPair(node)) {
      visit(node.key, depth + 1);
      visit(node.value, depth + 1);
    }
  };
  visit(doc.contents, 1);
}

/** A mapping key as the text plain JavaScript would use for it. */
function keyText(key: unknown): string {
  if (isScalar(key)) return String(key.value);
  if (key === null || key === undefined) return '';
  if (isAlias(key)) return `*${key.source}`;
  return String(key);
}

function resolveAlias(doc: Document, node: unknown): unknown {
  let current = node;
  for (let hops = 0; isAlias(current) && hops < 8; hops++) current = current.resolve(doc);
  return current;
}

/** Offset of the first alias in document order, or null. */
function firstAlias(root: unknown): number | null {
  const stack: unknown[] = [root];
  let best: number | null = null;
  while (stack.length > 0) {
    const node = stack.pop();
    if (isAlias(node)) {
      const start = node.range?.[0];
      if (start !== undefined && (best === null || start < best)) best = start;
    } else if (isMap(node)) {
      for (const pair of node.items) stack.push(pair.key, pair.value);
    } else if (isSeq(node)) {
      for (const item of node.items) stack.push(item);
    }
  }
  return best;
}

function checkSize(bytes: number, file: string): void {
  if (bytes > YAML_GUARDS.maxBytes) {
    throw new InputError(YAML_ERROR.tooLarge, `is ${bytes} bytes; expected a YAML file of at most ${YAML_GUARDS.maxBytes} bytes (1 MiB)`, {
      file,
    });
  }
}

function firstInvalidUtf8(bytes: Uint8Array): number {
  // Largest prefix with no invalid byte (a cut-off sequence at its end is fine), by bisection:
  // prefix validity is monotone and files are at most 1 MiB.
  const validPrefix = (length: number): boolean => {
    try {
      new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, length), { stream: true });
      return true;
    } catch {
      return false;
    }
  };
  if (validPrefix(bytes.length)) return Math.max(0, bytes.length - 1); // cut off at the end
  let lo = 0; // valid
  let hi = bytes.length; // invalid
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (validPrefix(mid)) lo = mid;
    else hi = mid;
  }
  return hi - 1;
}

function positionInBytes(bytes: Uint8Array, offset: number): Position {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    if (bytes[i] === 0x0a) {
      line += 1;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}

function positionInText(text: string, offset: number): Position {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < offset; i++) {
    if (text.charCodeAt(i) === 0x0a) {
      line += 1;
      lineStart = i + 1;
    }
  }
  return { line, column: offset - lineStart + 1 };
}
