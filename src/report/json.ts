/**
 * The JSON report: the Result exactly as the pipeline returned it.
 */
import { jsonBytesAt, jsonPieces } from '../core/json-pieces.js';
import type { ModelResult, Result } from '../result/result.js';
import { neutraliseJson } from './runner-commands.js';

/**
 * The JSON report in pieces (the run's fields, then one model at a time: each model is one
 * native `JSON.stringify`, its size bounded by the run's chart data), to write one after another:
 * joined, they are {@link formatJson}'s text. A run of any number of models is written without
 * ever being one string. Each piece is neutralised ({@link neutraliseJson});
 * a piece never splits a JSON string, so no `##[` can span two pieces. The pieces of a model's text
 * rendered earlier ({@link JsonReportOptions.modelText}: neutralised when rendered) pass as they
 * are, strings or bytes.
 */
export function* jsonReport<P extends string | Uint8Array = string>(
  result: Result,
  options: JsonReportOptions<P> = {},
): Generator<string | P> {
  const modelText = options.modelText;
  const models = new Set(result.models);
  // True while the pieces come from text rendered earlier, neutralised already.
  let written = false;
  const substitute =
    modelText === undefined
      ? undefined
      : (value: unknown): Iterable<P> | undefined => {
          // Only the models of the Result are looked up (by identity); everything else is walked.
          if (value === null || typeof value !== 'object' || !models.has(value as ModelResult)) return undefined;
          const text = modelText(value as ModelResult);
          if (text === undefined) return undefined;
          return (function* () {
            written = true;
            yield* text;
            written = false;
          })();
        };
  // Pieces of text written earlier pass as they are; the walk's own pieces are strings.
  for (const piece of jsonPieces<P>(result, { depth: MODEL_DEPTH, substitute })) yield written ? piece : neutraliseJson(piece as string);
  yield '\n';
}

/** Depth the report's pieces are walked to: the Result, `models`, then each model whole (half the time of walking into each model). */
const MODEL_DEPTH = 2;

/**
 * Options of {@link jsonReport}. `P`: the type of the pieces of text rendered earlier, strings or
 * their UTF-8 bytes (which then pass into the report's pieces as they are).
 */
export interface JsonReportOptions<P extends string | Uint8Array = string> {
  /**
   * A model's text rendered earlier ({@link jsonModelBytes} of the full model, while the Result
   * keeps a smaller copy), or undefined to format the model as it is in the Result. Default none.
   */
  modelText?: (model: ModelResult) => Iterable<P> | undefined;
}

/**
 * One model's part of the JSON report as UTF-8 bytes, exactly as {@link jsonReport} writes it
 * inside `models` (indented two levels, neutralised, no separators around it): for rendering each
 * model's text as soon as its outcome is final, and handing it back through
 * {@link JsonReportOptions.modelText}. {@link neutraliseJson} changes only characters inside the
 * text's strings, never the brackets of the wrapping that are cut off.
 */
export function jsonModelBytes(model: ModelResult): Uint8Array {
  return jsonBytesAt(model, 2, neutraliseJson);
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
