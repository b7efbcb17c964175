/**
 * JSON text in pieces: exactly the text `JSON.stringify(value, null, 2)` gives, cut so that no
 * piece holds more than one branch of the value. A report of any number of models is then written
 * piece by piece and never held as one string (V8 refuses strings longer than about 2^29
 * characters: "Invalid string length").
 *
 * Containers down to a depth are walked here, key by key and element by element; anything deeper
 * is one `JSON.stringify` call, re-indented. Strings in JSON text never hold a raw line break, so
 * the re-indenting cannot touch their content.
 */

/**
 * Options of {@link jsonPieces}. `P` is the type of the pieces a substitute gives: strings, or
 * also bytes (UTF-8 text written earlier, passed through as it is).
 */
export interface JsonPiecesOptions<P extends string | Uint8Array = string> {
  /** Containers nested less deeply than this are walked; deeper values are stringified whole. Default 4. */
  depth?: number;
  /**
   * Text written in place of a value met on the walk: pieces that, joined, are exactly what the
   * walk would write for that value at its nesting level (e.g. written earlier by
   * {@link jsonBytesAt} from a fuller copy of it), or undefined to walk the value itself.
   * Default none.
   */
  substitute?: (value: unknown) => Iterable<P> | undefined;
}

const INDENT = '  ';

/** The value JSON.stringify would write for `value` (its `toJSON` applied), or undefined when it writes nothing. */
function prepared(value: unknown, key: string): unknown {
  if (value !== null && typeof value === 'object' && typeof (value as { toJSON?: unknown }).toJSON === 'function') {
    return (value as { toJSON: (key: string) => unknown }).toJSON(key);
  }
  return value;
}

function isWritten(value: unknown): boolean {
  return value !== undefined && typeof value !== 'function' && typeof value !== 'symbol';
}

/**
 * The pieces of `JSON.stringify(value, null, 2)`; joined, they are that text exactly (no final
 * line break). A value JSON.stringify writes nothing for gives no pieces.
 * @param value a JSON-compatible value (plain objects, arrays, strings, numbers, booleans, null)
 * @param options how deep to walk; default 4 levels
 */
export function* jsonPieces<P extends string | Uint8Array = string>(
  value: unknown,
  options: JsonPiecesOptions<P> = {},
): Generator<string | P> {
  const v = prepared(value, '');
  if (!isWritten(v)) return;
  yield* piecesOf(v, 0, options.depth ?? 4, options.substitute);
}

/**
 * The value stringified inside `level` one-element arrays (whose lines JSON.stringify indents
 * itself), and how many characters of the arrays' own brackets stand before and after it (ASCII,
 * so as many bytes). One native call, no second pass over the text.
 */
function wrappedText(value: unknown, level: number): { text: string; head: number; tail: number } {
  let wrapped = value;
  for (let l = 0; l < level; l++) wrapped = [wrapped];
  const text = JSON.stringify(wrapped, null, 2) ?? 'null';
  // Openers: `[` then a line break and one more step of indent per level; closers the mirror image.
  let head = 0;
  let tail = 0;
  for (let l = 0; l < level; l++) {
    head += 1 + 1 + INDENT.length * (l + 1);
    tail += 1 + INDENT.length * l + 1;
  }
  return { text, head, tail };
}

/**
 * `JSON.stringify(value, null, 2)` with every line after the first indented `level` more steps
 * ({@link wrappedText} with the brackets cut off).
 */
function indented(value: unknown, level: number): string {
  const { text, head, tail } = wrappedText(value, level);
  return level === 0 ? text : text.slice(head, text.length - tail);
}

/**
 * The UTF-8 bytes of `value` stringified whole as {@link jsonPieces} writes it nested `level`
 * containers deep in a larger value when `level` is at least its walking depth (one piece: lines
 * after the first indented `level` more steps): `transform(text)` encoded, where
 * `transform` must leave the text's ASCII brackets, line breaks and indentation around the value
 * as they are (an escape of characters inside its strings does). The brackets of the wrapping are
 * cut off the bytes, so the text is never copied to drop them.
 * @param value a JSON-compatible value (no `toJSON` at its top)
 * @param level its nesting level
 * @param transform applied to the whole text before encoding; default none
 */
export function jsonBytesAt(value: unknown, level: number, transform: (text: string) => string = (text) => text): Uint8Array {
  const { text, head, tail } = wrappedText(value, level);
  const bytes = Buffer.from(transform(text), 'utf8');
  return level === 0 ? bytes : bytes.subarray(head, bytes.length - tail);
}

function* piecesOf<P extends string | Uint8Array>(
  value: unknown,
  level: number,
  depth: number,
  substitute: JsonPiecesOptions<P>['substitute'],
): Generator<string | P> {
  const given = substitute?.(value);
  if (given !== undefined) {
    yield* given;
    return;
  }
  if (value === null || typeof value !== 'object' || level >= depth) {
    yield indented(value, level);
    return;
  }
  const inner = INDENT.repeat(level + 1);
  const outer = INDENT.repeat(level);
  if (Array.isArray(value)) {
    if (value.length === 0) {
      yield '[]';
      return;
    }
    yield '[';
    for (let i = 0; i < value.length; i++) {
      yield `${i === 0 ? '' : ','}\n${inner}`;
      const element = prepared(value[i], String(i));
      // In an array, what JSON.stringify writes nothing for is written as null.
      yield* piecesOf(isWritten(element) ? element : null, level + 1, depth, substitute);
    }
    yield `\n${outer}]`;
    return;
  }
  let first = true;
  for (const key of Object.keys(value)) {
    const element = prepared((value as Record<string, unknown>)[key], key);
    if (!isWritten(element)) continue;
    yield `${first ? '{' : ','}\n${inner}${JSON.stringify(key)}: `;
    first = false;
    yield* piecesOf(element, level + 1, depth, substitute);
  }
  yield first ? '{}' : `\n${outer}}`;
}
