/**
 * Writing a model's coefficients into its descriptor's text, changing nothing else: the YAML
 * library's document API finds the source range of the `coefficients` value (and of each of its
 * items), and only those bytes are replaced; every comment, key order, quote and blank line
 * elsewhere stays byte for byte. With the same number of items each number is replaced where it
 * stands (comments between items survive); otherwise the list is rewritten in the style it had
 * (flow `[a, b]` or block `- a` lines at its indentation). A descriptor without the key gets
 * `coefficients: [...]` appended as a last top-level key.
 */
import { isMap, isScalar, isSeq, type Scalar, type YAMLSeq } from 'yaml';
import { parseYamlDocument } from './yaml-parse.js';
import { InputError } from '../core/errors.js';

/** Code of the error for a descriptor whose `coefficients` cannot be rewritten in place. */
export const COEFFICIENTS_TEXT_ERROR = 'coefficients-text';

/**
 * A number as YAML reads it back to the same double: the shortest round-trip form of
 * `Number.prototype.toString` (ECMA-262 Number::toString), which the YAML 1.2 core schema's float
 * and int forms accept. Non-finite numbers are refused.
 */
export function yamlNumber(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`yamlNumber: ${x} is not finite`);
  return Object.is(x, -0) ? '0' : String(x);
}

/**
 * The descriptor text with `values` as its coefficients.
 *
 * @param text the descriptor's current text (one YAML document whose top level is a mapping)
 * @param values the coefficients, intercept first (finite numbers)
 * @param file repository-relative path, for errors
 * @returns the new text (equal to `text` when the coefficients are already these numbers as written)
 * @throws InputError `coefficients-text` when the text is not one mapping or `coefficients` is not a list of scalars
 */
export function withCoefficients(text: string, values: readonly number[], file: string): string {
  const written = values.map(yamlNumber);
  const doc = parseYamlDocument(text, { version: '1.2', schema: 'core', uniqueKeys: false });
  if (doc.errors.length > 0 || !isMap(doc.contents)) {
    throw new InputError(COEFFICIENTS_TEXT_ERROR, 'cannot be rewritten: expected one YAML document whose top level is a mapping', { file });
  }
  const pair = doc.contents.items.find((p) => isScalar(p.key) && (p.key as Scalar).value === 'coefficients');
  if (pair === undefined) {
    const body = text === '' || text.endsWith('\n') ? text : `${text}\n`;
    return `${body}coefficients: [${written.join(', ')}]\n`;
  }
  const seq = pair.value;
  if (!isSeq(seq) || !seq.range || !seq.items.every((item) => isScalar(item) && item.range)) {
    throw new InputError(COEFFICIENTS_TEXT_ERROR, 'cannot be rewritten: expected `coefficients` to be a list of numbers', {
      file,
      key: 'coefficients',
    });
  }
  const items = seq.items as Scalar[];
  if (items.length === written.length && items.length > 0) {
    // Each number where it stands, from the last so that earlier offsets stay valid.
    let out = text;
    for (let i = items.length - 1; i >= 0; i--) {
      const [start, end] = items[i].range as [number, number, number];
      out = out.slice(0, start) + written[i] + out.slice(end);
    }
    return out;
  }
  return replaceList(text, seq, written);
}

function replaceList(text: string, seq: YAMLSeq, written: string[]): string {
  const [start, valueEnd] = seq.range as [number, number, number];
  if (seq.flow || seq.items.length === 0) return `${text.slice(0, start)}[${written.join(', ')}]${text.slice(valueEnd)}`;
  // A block list: keep the indentation of its first `-` and whatever follows its last item on that line.
  const lineStart = text.lastIndexOf('\n', start - 1) + 1;
  const indent = text.slice(lineStart, start);
  const last = seq.items[seq.items.length - 1] as Scalar;
  const end = (last.range as [number, number, number])[1];
  if (written.length === 0) return `${text.slice(0, start)}[]${text.slice(end)}`;
  return `${text.slice(0, start)}${written.map((w) => `- ${w}`).join(`\n${indent}`)}${text.slice(end)}`;
}

/**
 * The coefficients a descriptor text ships (its top-level `coefficients` list of numbers), or
 * null when it has none or they are not a list of finite numbers (the schema refuses those).
 */
export function shippedCoefficients(text: string): number[] | null {
  const doc = parseYamlDocument(text, { version: '1.2', schema: 'core', uniqueKeys: false });
  if (doc.errors.length > 0 || !isMap(doc.contents)) return null;
  const value = doc.contents.get('coefficients');
  if (!isSeq(value)) return null;
  const numbers = value.items.map((item) => (isScalar(item) ? item.value : null));
  return numbers.every((n): n is number => typeof n === 'number' && Number.isFinite(n)) ? numbers : null;
}

/**
 * How far shipped coefficients are from a refit's: the largest absolute difference and its
 * index, and whether they are stale, i.e. missing, of another length, or apart by more than
 * 1e-9 times the largest refit coefficient in absolute value (a relative tolerance far below any
 * figure fitgate reports, above the last-bit noise of a refit).
 */
export function compareCoefficients(
  shipped: readonly number[] | null,
  refit: readonly number[],
): { stale: boolean; largest: number; at: number } {
  if (shipped === null || shipped.length !== refit.length) return { stale: true, largest: Number.NaN, at: -1 };
  let largest = 0;
  let at = -1;
  let scale = 0;
  for (let j = 0; j < refit.length; j++) {
    const d = Math.abs(shipped[j] - refit[j]);
    if (d > largest) {
      largest = d;
      at = j;
    }
    scale = Math.max(scale, Math.abs(refit[j]));
  }
  return { stale: largest > 1e-9 * scale || (scale === 0 && largest > 0), largest, at };
}

/**
 * The text with its top-level `coefficients` key and value blanked out (every character of them
 * but line breaks becomes a space), so that a refit can run on a descriptor whose shipped list no
 * longer fits its terms while every other line keeps its number for messages. Returns the text
 * unchanged when it has no such key or is not one mapping.
 */
export function blankCoefficients(text: string): string {
  const doc = parseYamlDocument(text, { version: '1.2', schema: 'core', uniqueKeys: false });
  if (doc.errors.length > 0 || !isMap(doc.contents)) return text;
  const pair = doc.contents.items.find((p) => isScalar(p.key) && (p.key as Scalar).value === 'coefficients');
  const key = pair?.key as Scalar | undefined;
  const value = pair?.value as { range?: [number, number, number] } | null | undefined;
  if (!key?.range) return text;
  const start = key.range[0];
  const end = value?.range ? value.range[1] : key.range[1];
  return text.slice(0, start) + text.slice(start, end).replace(/[^\n]/g, ' ') + text.slice(end);
}

/** True when a descriptor text says `fit: { refit: false }` (its shipped coefficients are the model). */
export function scoresAsShipped(text: string): boolean {
  const doc = parseYamlDocument(text, { version: '1.2', schema: 'core', uniqueKeys: false });
  return doc.errors.length === 0 && isMap(doc.contents) && doc.getIn(['fit', 'refit']) === false;
}
