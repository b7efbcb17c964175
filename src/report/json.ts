/**
 * The JSON report: the Result exactly as the pipeline returned it.
 */
import type { Result } from '../result/result.js';
import { neutraliseJson } from './runner-commands.js';

/**
 * `JSON.stringify(result)` with two-space indentation and a final newline, where `##[` inside a
 * string is written `##\u005b` and U+2028, U+2029 and NEL as `\u` escapes
 * ({@link neutraliseJson}): `JSON.parse` gives back the same Result, and no line of the report
 * holds a runner command when it is printed in a CI step.
 */
export function formatJson(result: Result): string {
  return `${neutraliseJson(JSON.stringify(result, null, 2))}\n`;
}
