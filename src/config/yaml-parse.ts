/**
 * The one way fitgate parses YAML text into a document: `parseDocument` of the `yaml` library with
 * the library's debugging switches out of reach. That library prints every token (environment
 * variable `LOG_TOKENS`) or every composed node (`LOG_STREAM`) to standard output through
 * `console.log` when they are set, which would break a report written to standard output, and it
 * reads `process.env.LOG_TOKENS` once per token: a lookup in the process's environment (a call
 * into the runtime each time) that is most of the parser's own time per token. During the parse,
 * which is synchronous (no other code of this thread runs meanwhile), `process.env` is an empty
 * object; the real one is back before this returns or throws.
 */
import { parseDocument, type DocumentOptions, type ParseOptions, type SchemaOptions } from 'yaml';

/** Options of {@link parseYamlDocument}: those of the library's `parseDocument`. */
export type YamlParseOptions = ParseOptions & DocumentOptions & SchemaOptions;

/**
 * Parses YAML text into a document, as the `yaml` library's `parseDocument(text, options)` does,
 * with the environment hidden from the library while it parses (see the module comment).
 * @param text the YAML text
 * @param options the library's parse, document and schema options
 */
export function parseYamlDocument(text: string, options: YamlParseOptions): ReturnType<typeof parseDocument> {
  const environment = process.env;
  process.env = {};
  try {
    return parseDocument(text, options);
  } finally {
    process.env = environment;
  }
}
