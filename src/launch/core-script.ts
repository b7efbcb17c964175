/**
 * The CLI's core as a classic script. ncc writes the `fitgate` command as one ES module
 * (dist/cli/index.js before this step); V8 can start a classic script from a code cache (see
 * code-cache.ts) but, on Node.js 20, not a module. {@link toCoreScript} rewrites ncc's module into
 * one strict async function expression that takes the three things a module had from its loader:
 *
 * - `createRequire` (ncc's only static import, for Node's built-in modules),
 * - the entry's URL (the module's `import.meta.url`, the file worker threads start; the launcher
 *   passes its own),
 * - `import()` for the chunks ncc splits off, the parts only some runs load (a classic script
 *   compiled by `vm.Script` has no module loader of its own; the launcher resolves them in
 *   dist/cli/chunks/).
 *
 * Every rewrite is checked: the build fails when ncc's output has another shape than expected,
 * rather than shipping a core that breaks on first use. The first line names the build
 * ({@link coreId}), which the code cache must name too.
 */

/** The function's parameter names, in order (see the list above). */
export const CORE_PARAMETERS = ['__WEBPACK_EXTERNAL_createRequire', '__fitgate_entry_url', '__fitgate_import'] as const;

/** ncc's one static import at the top of an ES module bundle. */
const NCC_IMPORT = 'import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";\n';

/**
 * ncc's name for webpack's require function, spelt in two pieces: ncc renames the whole word even
 * inside strings of the code it bundles (and this module is bundled by ncc for the build).
 */
const NCC_REQUIRE = ['__nccwpck', 'require__'].join('_');

/** ncc's chunk loader call (webpack's "import chunk loading" runtime). */
const NCC_CHUNK_IMPORT = `import("./" + ${NCC_REQUIRE}.u(chunkId))`;

/** The signature of the function {@link toCoreScript} returns, as the launcher calls it. */
export type CoreFunction = (createRequire: (url: string) => NodeJS.Require, entryUrl: string, load: (specifier: string) => Promise<unknown>) => Promise<void>;

/** The comment that ends the script's first line, before the build's identity. */
const ID_MARK = '// fitgate core ';

/**
 * Rewrites an ncc ES module bundle into the source of one async function expression (see the
 * module comment).
 * @param bundle the text of ncc's `index.js`
 * @param identify gives the build's identity from the script's whole text with an empty identity
 *   (the build uses its SHA-256, in hex): any change to the script changes it
 * @returns the script's source: `(async function (...) {"use strict"; // fitgate core ID` and the
 *   bundle's statements, then `})`
 * @throws Error when the bundle does not have the expected shape (a changed ncc or webpack runtime)
 */
export function toCoreScript(bundle: string, identify: (script: string) => string): string {
  const shebang = /^#!.*\n/.exec(bundle);
  let text = shebang ? bundle.slice(shebang[0].length) : bundle;
  if (!text.startsWith(NCC_IMPORT)) throw new Error(`the CLI bundle does not start with ncc's import of createRequire (${JSON.stringify(text.slice(0, 80))})`);
  text = text.slice(NCC_IMPORT.length);
  const statement = /^(?:import|export)[\s{*]/m.exec(text);
  if (statement) throw new Error(`the CLI bundle has a module statement at offset ${statement.index}: ${JSON.stringify(text.slice(statement.index, statement.index + 80))}`);
  text = text.replaceAll('import.meta.url', CORE_PARAMETERS[1]);
  const meta = text.indexOf('import.meta');
  if (meta >= 0) throw new Error(`the CLI bundle uses import.meta other than import.meta.url: ${JSON.stringify(text.slice(meta, meta + 60))}`);
  const loaders = text.split(NCC_CHUNK_IMPORT).length - 1;
  if (loaders !== 1) throw new Error(`expected ncc's chunk loader once in the CLI bundle, found it ${loaders} times`);
  text = text.replace(NCC_CHUNK_IMPORT, `${CORE_PARAMETERS[2]}("./" + ${NCC_REQUIRE}.u(chunkId))`);
  // `import()` with nothing between the brackets is webpack's comment marking a chunk load.
  const dynamic = /\bimport\s*\((?!\))/.exec(text);
  if (dynamic) throw new Error(`the CLI bundle has an import() besides the chunk loader: ${JSON.stringify(text.slice(dynamic.index - 40, dynamic.index + 40))}`);
  const head = `(async function (${CORE_PARAMETERS.join(', ')}) {"use strict"; ${ID_MARK}`;
  const rest = `\n${text}\n})`;
  const id = identify(head + rest);
  if (!/^[0-9a-z]+$/.test(id)) throw new Error(`a core script's identity is lower-case letters and digits, not ${JSON.stringify(id)}`);
  return head + id + rest;
}

/**
 * The identity written on a core script's first line by {@link toCoreScript}, or null.
 * @param source the script's bytes (only the first line is read)
 */
export function coreId(source: Uint8Array): string | null {
  const head = Buffer.from(source.buffer, source.byteOffset, Math.min(source.byteLength, 512)).toString('latin1');
  const end = head.indexOf('\n');
  if (end < 0) return null;
  const line = head.slice(0, end);
  const at = line.lastIndexOf(ID_MARK);
  const id = at < 0 ? '' : line.slice(at + ID_MARK.length);
  return /^[0-9a-z]+$/.test(id) ? id : null;
}
