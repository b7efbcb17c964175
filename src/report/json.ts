/**
 * The JSON report: the Result exactly as the pipeline returned it.
 */
import { jsonPieces } from '../core/json-pieces.js';
import type { Result } from '../result/result.js';
import { neutraliseJson } from './runner-commands.js';

/**
 * The JSON report in pieces (one branch of the Result each, a model's charts at most), to write
 * one after another: joined, they are {@link formatJson}'s text. A run of any number of models
 * is written without ever being one string. Each piece is neutralised ({@link neutraliseJson});
 * a piece never splits a JSON string, so no `##[` can span two pieces.
 */
export function* jsonReport(result: Result): Generator<string> {
  for (const piece of jsonPieces(result)) yield neutraliseJson(piece);
  yield '\n';
}

/**
 * `JSON.stringify(result)` with two-space indentation and a final newline, where `##[` inside a
 * string is written `##\u005b` and U+2028, U+2029 and NEL as `\u` escapes
 * ({@link neutraliseJson}): `JSON.parse` gives back the same Result, and no line of the report
 * holds a runner command when it is printed in a CI step.
 */
export function formatJson(result: Result): string {
  return `${neutraliseJson(JSON.stringify(result, null, 2))}\n`;
}
