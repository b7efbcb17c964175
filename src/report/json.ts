/**
 * The JSON report: the Result exactly as the pipeline returned it.
 */
import { jsonPieces } from '../core/json-pieces.js';
import type { Result } from '../result/result.js';

/**
 * The JSON report in pieces (one branch of the Result each, a model's charts at most), to write
 * one after another: joined, they are {@link formatJson}'s text. A run of any number of models
 * is written without ever being one string.
 */
export function* jsonReport(result: Result): Generator<string> {
  yield* jsonPieces(result);
  yield '\n';
}

/** `JSON.stringify(result)` with two-space indentation and a final newline. */
export function formatJson(result: Result): string {
  return `${JSON.stringify(result, null, 2)}\n`;
}
