/**
 * Keeping runner commands out of plain text. A CI runner reads every line a step prints (standard
 * output and standard error) and obeys two forms of command (actions/runner,
 * src/Runner.Common/ActionCommand.cs, `TryParseV2` and `TryParse`):
 *
 * - `::name props::data` when the line begins with `::` after leading white space;
 * - the older `##[name props]data` found anywhere in the line.
 *
 * The runner matches with .NET's culture-aware `StartsWith` and `IndexOf`, which may skip
 * characters such as zero-width spaces and other format characters (from memory), so those are
 * treated here as if absent. Every plain line fitgate prints (the action's log, the CLI's reports
 * on standard output, its error line) passes through {@link neutraliseLogLine}; the workflow
 * commands fitgate writes itself (`report/annotations.ts`) pass their text through
 * {@link defuseLegacyCommands}; JSON keeps its data exact with {@link neutraliseJson}.
 */
import { escapeTerminal } from './escape.js';

/** Characters a comparison may pass over unseen: controls, format characters (zero-width), marks. */
const UNSEEN = '[\\p{C}\\p{M}]*';
/** `##[`, with anything unseen between its three characters. */
const LEGACY = new RegExp(`#(${UNSEEN})#(${UNSEEN})\\[`, 'gu');
/** A line that begins with `::` after white space (which the runner trims) and unseen characters. */
const LEADING = /^[\s\p{C}\p{M}]*::/u;
/** Every line break a reader may split on. */
const LINE_BREAK = /\r\n|[\r\n\u0085\u2028\u2029]/g;

/** A character as a `\u2028` (or `\u{e0001}`) escape. */
function codeEscape(c: string): string {
  const code = c.codePointAt(0) ?? 0;
  return code > 0xffff ? `\\u{${code.toString(16)}}` : `\\u${code.toString(16).padStart(4, '0')}`;
}

/** Longest piece of text from an API server that is printed, in characters (house rule: quote a short piece). */
export const MAX_SERVER_TEXT = 80;

/**
 * Breaks every `##[` in `text` by putting a space before the `[` (`##[error]` becomes
 * `## [error]`), so that the runner's older command form cannot start anywhere in it. Nothing
 * else changes; line breaks are left as they are.
 */
export function defuseLegacyCommands(text: string): string {
  return text.replace(LEGACY, '#$1#$2 [');
}

/**
 * One plain log line, safe wherever a runner reads it: line breaks (CR, LF, NEL, LS, PS) become
 * spaces, every `##[` is broken ({@link defuseLegacyCommands}), and a line that would begin with
 * `::` (after white space or unseen characters) starts with `» ` instead. Text without any of
 * these is returned unchanged; applying it twice changes nothing more.
 */
export function neutraliseLogLine(text: string): string {
  const one = defuseLegacyCommands(text.replace(LINE_BREAK, ' '));
  return LEADING.test(one) ? `» ${one}` : one;
}

/** {@link neutraliseLogLine} on each `\n`-separated line of a text; the `\n`s are kept. */
export function neutraliseLog(text: string): string {
  return text.split('\n').map(neutraliseLogLine).join('\n');
}

/**
 * JSON text with the same data but no runner command in any line: `[` after `##` (only ever
 * inside a string) is written `\u005b`, and the line separators JSON leaves raw (U+2028, U+2029,
 * NEL) as `\u` escapes. `JSON.parse` gives back exactly the same value. Lines of
 * `JSON.stringify(value, null, 2)` begin with white space and a bracket, a brace, a quote or a
 * digit, never with `::`.
 */
export function neutraliseJson(json: string): string {
  // Most pieces (numbers, plain names) hold none of the characters either pattern needs. Four
  // `indexOf` scans of single characters are an order of magnitude faster than one scan by a
  // character-class pattern (and a text of one-byte characters cannot hold U+2028 or U+2029).
  if (!needsNeutralising(json)) return json;
  return json.replace(LEGACY, '#$1#$2\\u005b').replace(/[\u0085\u2028\u2029]/g, codeEscape);
}

/** True when `text` holds a character without which {@link neutraliseJson} changes nothing: `#` (of `##[`) or a raw line separator. */
function needsNeutralising(text: string): boolean {
  return text.includes('#') || text.includes('\u0085') || text.includes('\u2028') || text.includes('\u2029');
}

/**
 * Text an API server sent back (an error message, a library's warning about a response), made
 * fit to print: on one line, control and format characters shown as `\u001b` style escapes,
 * lone surrogates replaced, neutralised as a log line ({@link neutraliseLogLine}), then cut to at
 * most `max` characters (the last one `…` when cut; cutting off a tail cannot make a command).
 * @param text the server's text
 * @param max longest result, in characters; default {@link MAX_SERVER_TEXT}
 */
export function quoteServerText(text: string, max = MAX_SERVER_TEXT): string {
  const visible = escapeTerminal(text.replace(LINE_BREAK, ' '))
    .replace(/\p{Cf}/gu, codeEscape)
    .replace(/\p{Cs}/gu, '\ufffd');
  const chars = [...neutraliseLogLine(visible)];
  return chars.length > max ? `${chars.slice(0, max - 1).join('')}…` : chars.join('');
}
