/**
 * The JSON report: the Result exactly as the pipeline returned it.
 */
import type { Result } from '../result/result.js';

/** `JSON.stringify(result)` with two-space indentation and a final newline. */
export function formatJson(result: Result): string {
  return `${JSON.stringify(result, null, 2)}\n`;
}
