/**
 * Makes diagnostic figures safe for the JSON report: non-finite numbers become the strings of
 * {@link jsonNumber}, typed arrays become plain arrays, nested objects and arrays are converted.
 */

/** A number in the JSON report: finite numbers as numbers, others as strings. */
export type JsonNumber = number | 'Infinity' | '-Infinity' | 'NaN';

/** Converts a number for the JSON report (JSON has no infinity or NaN). */
export function jsonNumber(x: number): JsonNumber {
  if (Number.isFinite(x)) return x;
  if (Number.isNaN(x)) return 'NaN';
  return x > 0 ? 'Infinity' : '-Infinity';
}

/** Reads a {@link JsonNumber} back into a number. */
export function fromJsonNumber(x: JsonNumber | null | undefined): number {
  if (x === null || x === undefined) return Number.NaN;
  if (typeof x === 'number') return x;
  return x === 'Infinity' ? Infinity : x === '-Infinity' ? -Infinity : Number.NaN;
}

/** A figure after {@link jsonSafe}. */
export type JsonValue = number | string | boolean | null | JsonValue[] | { [key: string]: JsonValue };

/**
 * Converts a value for the JSON report (numbers through `jsonNumber`, typed arrays to arrays,
 * `undefined` fields dropped). Objects come out as plain objects whose every key is an own
 * property, `__proto__` too (keys may be column names): as `JSON.parse` gives them back, and
 * nothing is ever set on a prototype.
 *
 * @param value numbers, strings, booleans, null, arrays, typed arrays and plain objects of them
 */
export function jsonSafe(value: unknown): JsonValue {
  if (typeof value === 'number') return jsonNumber(value);
  if (typeof value === 'string' || typeof value === 'boolean' || value === null) return value;
  // Plain loops (figures hold arrays of thousands of numbers: `Array.from` and `map` with a
  // function are several times slower), numbers converted without the recursive call.
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    const typed = value as unknown as ArrayLike<number>;
    const out: JsonValue[] = [];
    for (let i = 0; i < typed.length; i++) out.push(jsonNumber(typed[i]));
    return out;
  }
  if (Array.isArray(value)) {
    const out: JsonValue[] = [];
    for (let i = 0; i < value.length; i++) {
      const v: unknown = value[i];
      out.push(typeof v === 'number' ? jsonNumber(v) : jsonSafe(v));
    }
    return out;
  }
  if (typeof value === 'object' && value !== undefined) {
    // Keys may be column names (user text): `__proto__` is defined as an own property (an
    // assignment would set the prototype), every other key is assigned. A plain object, not one
    // without a prototype: V8 keeps those in dictionary mode, slower to build and to stringify.
    const out: { [key: string]: JsonValue } = {};
    const record = value as Record<string, unknown>;
    for (const k of Object.keys(record)) {
      const v = record[k];
      if (v === undefined) continue;
      const safe = typeof v === 'number' ? jsonNumber(v) : jsonSafe(v);
      if (k === '__proto__') Object.defineProperty(out, k, { value: safe, enumerable: true, writable: true, configurable: true });
      else out[k] = safe;
    }
    return out;
  }
  return null;
}

/** {@link jsonSafe} for a record of figures (model metrics or check detail). */
export function jsonRecord(record: Record<string, unknown>): Record<string, JsonValue> {
  return jsonSafe(record) as Record<string, JsonValue>;
}

/** Model metrics: numbers through `jsonNumber` (flat record). */
export function jsonMetrics(record: Record<string, number | string | null>): Record<string, number | string | null> {
  const out: Record<string, number | string | null> = {};
  for (const [k, v] of Object.entries(record)) out[k] = typeof v === 'number' ? jsonNumber(v) : v;
  return out;
}
