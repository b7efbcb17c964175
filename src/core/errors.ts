/**
 * Errors that stop a run (exit status 2) as opposed to check findings (exit status 1).
 *
 * Every problem with the user's files is an {@link InputError}: it carries the file
 * (repository-relative), the 1-based line and column where known, the key path inside a
 * YAML document, the offending value and what was expected, so that the CLI and the action
 * can print one line that says exactly what to fix.
 */

/** Where an input error points. All fields but `file` are optional. */
export interface ErrorLocation {
  /** File path relative to the repository root (or as given when outside it). */
  file?: string;
  /** 1-based line number. */
  line?: number;
  /** 1-based column number. */
  column?: number;
  /** Key path inside a YAML document, e.g. `terms[1].rbf.width`, or a CSV column name. */
  key?: string;
}

/** A problem with the user's settings, descriptor, data or arguments: exit status 2. */
export class InputError extends Error {
  override readonly name = 'InputError';
  /** Where the problem is. */
  readonly location: ErrorLocation;
  /** Stable machine-readable code, e.g. `yaml-syntax`, `schema`, `csv-cell`, `path-outside`. */
  readonly code: string;

  /**
   * @param code stable id of the kind of problem
   * @param message what is wrong and what was expected (without the location prefix)
   * @param location file, line, column and key where known
   */
  constructor(code: string, message: string, location: ErrorLocation = {}) {
    super(message);
    this.code = code;
    this.location = location;
  }

  /**
   * `file:line:column: key: message`, leaving out the parts that are unknown. The file and the
   * key are user text (a path, a CSV column name) and are cut with {@link clip}.
   */
  describe(): string {
    const { line, column } = this.location;
    const file = this.location.file === undefined ? undefined : clip(this.location.file);
    const key = this.location.key === undefined ? undefined : clip(this.location.key);
    let where = file ?? '';
    if (file !== undefined && line !== undefined) where += `:${line}`;
    if (file !== undefined && line !== undefined && column !== undefined) where += `:${column}`;
    const parts = [where, key !== undefined ? `\`${key}\`` : ''].filter((s) => s !== '');
    return parts.length > 0 ? `${parts.join(': ')}: ${this.message}` : this.message;
  }
}

/** Turns anything thrown into one line of text (no stack). */
export function errorMessage(error: unknown): string {
  if (error instanceof InputError) return error.describe();
  if (error instanceof Error) return error.message;
  return String(error);
}

/** Most characters of one piece of user text (a name, a cell, a path, a pattern) a message quotes. */
export const MAX_QUOTED = 80;

/**
 * The one way a message shortens user text: at most `max` characters (default
 * {@link MAX_QUOTED}, 80), the start kept and an ellipsis `…` as the last character when
 * something was cut. A cut never splits a UTF-16 surrogate pair. Every message that shows a
 * name, cell, header, path or pattern from the repository passes it through here (or through
 * {@link quoteValue}, which uses it).
 *
 * @param text the user text
 * @param max largest length of the result in UTF-16 code units (at least 2); default 80
 */
export function clip(text: string, max = MAX_QUOTED): string {
  if (text.length <= max) return text;
  let end = Math.max(1, max - 1);
  const last = text.charCodeAt(end - 1);
  if (last >= 0xd800 && last <= 0xdbff) end -= 1;
  return `${text.slice(0, end)}…`;
}

/**
 * Quotes a user value for an error message: strings as JSON strings, other values as JSON,
 * `undefined` as `nothing`; the whole cut with {@link clip} to `max` characters (default 80).
 */
export function quoteValue(value: unknown, max = MAX_QUOTED): string {
  let text: string;
  // A long string is cut before quoting (its quoted form is longer than `max` either way).
  if (typeof value === 'string') text = JSON.stringify(value.length > max ? value.slice(0, max) : value);
  else if (value === undefined) text = 'nothing';
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      text = String(value);
    }
  }
  return clip(text, max);
}
