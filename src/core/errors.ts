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

  /** `file:line:column: key: message`, leaving out the parts that are unknown. */
  describe(): string {
    const { file, line, column, key } = this.location;
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

/** Quotes a user value for an error message, cut to `max` characters (default 80). */
export function quoteValue(value: unknown, max = 80): string {
  let text: string;
  if (typeof value === 'string') text = JSON.stringify(value);
  else if (value === undefined) text = 'nothing';
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      text = String(value);
    }
  }
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}
