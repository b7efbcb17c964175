#!/usr/bin/env node
/******/ (() => { // webpackBootstrap
/******/ 	"use strict";
/******/ 	var __webpack_modules__ = ({

/***/ 849:
/***/ (function(__unused_webpack_module, exports, __nccwpck_require__) {


var __importDefault = (this && this.__importDefault) || function (mod) {
    return (mod && mod.__esModule) ? mod : { "default": mod };
};
Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.CHECKSUM_FLAG = void 0;
exports.currentRuntime = currentRuntime;
exports.encodeCodeCache = encodeCodeCache;
exports.readCodeCache = readCodeCache;
exports.withCacheChecksums = withCacheChecksums;
exports.compileCore = compileCore;
exports.runCore = runCore;
/**
 * The CLI's V8 code cache: the bytecode of the functions a typical run compiles, made at build time
 * (make-code-cache.ts) and shipped beside the core script (dist/cli/core.js and core.cache). A run
 * that starts from it skips parsing and compiling those functions, about 40 ms of a 0.2 s check of
 * a small model on the development machine. V8 takes a cache only from its own version, run with
 * the same flags; any other Node.js compiles the script as usual and computes the same results.
 *
 * The file is one header line, then V8's data:
 *
 *     fitgate-code-cache 1 <V8 version> <arch> <core.js's identity> <bytes of data>\n
 *
 * V8 itself checks its version, its flags and only the length of the source, so the header binds
 * the data to one build of core.js (core-script.ts writes the identity on its first line), and V8
 * checks the data's checksum (`--verify-snapshot-checksum`, set while the script compiles and while
 * the cache is made): a cache left over from another build, cut short or damaged on the way, is
 * never run. Nothing here loads node:crypto (about 9 ms at start on the development machine).
 */
const node_module_1 = __nccwpck_require__(995);
const node_fs_1 = __nccwpck_require__(24);
const node_path_1 = __importDefault(__nccwpck_require__(760));
const node_url_1 = __nccwpck_require__(136);
const node_util_1 = __nccwpck_require__(975);
const node_v8_1 = __importDefault(__nccwpck_require__(877));
const node_vm_1 = __importDefault(__nccwpck_require__(714));
const core_script_js_1 = __nccwpck_require__(150);
/** First word of the header line. */
const MAGIC = 'fitgate-code-cache';
/** Version of the file layout above. */
const LAYOUT = '1';
/** Longest header line read (the six fields take about 120 bytes). */
const MAX_HEADER = 512;
/**
 * The V8 flag under which caches are made and read: V8 then writes a checksum of its data and
 * verifies it (by default only debug builds do).
 */
exports.CHECKSUM_FLAG = '--verify-snapshot-checksum';
/** The runtime of this process. */
function currentRuntime() {
    return { v8: process.versions.v8, arch: process.arch };
}
/**
 * A cache file's bytes: the header line for the core script `id` and `runtime`, then `data`.
 * @param id the core script's identity ({@link coreId})
 * @param data V8's cached data (`vm.Script#createCachedData()`, made under {@link CHECKSUM_FLAG})
 * @param runtime default this process's
 */
function encodeCodeCache(id, data, runtime = currentRuntime()) {
    const header = `${MAGIC} ${LAYOUT} ${runtime.v8} ${runtime.arch} ${id} ${data.byteLength}\n`;
    return Buffer.concat([Buffer.from(header, 'latin1'), data]);
}
/**
 * Reads a cache file's header and checks it against the script and the runtime.
 * @param file the cache file's bytes
 * @param source the core script's bytes (its first line names its build)
 * @param runtime default this process's; `null` skips the runtime check (the build keeps a cache
 *   made by another Node.js as long as the script is the same)
 * @returns V8's data and the runtime it was made for, or the reason it does not fit
 */
function readCodeCache(file, source, runtime = currentRuntime()) {
    const bytes = Buffer.from(file.buffer, file.byteOffset, file.byteLength);
    const end = bytes.subarray(0, MAX_HEADER).indexOf(0x0a);
    const fields = end < 0 ? [] : bytes.toString('latin1', 0, end).split(' ');
    if (fields.length !== 6 || fields[0] !== MAGIC)
        return { data: null, reason: 'not a fitgate code cache file' };
    const [, layout, v8Version, arch, id, length] = fields;
    if (layout !== LAYOUT)
        return { data: null, reason: `layout ${layout}, expected ${LAYOUT}` };
    if (runtime !== null && (v8Version !== runtime.v8 || arch !== runtime.arch)) {
        return { data: null, reason: `made for V8 ${v8Version} on ${arch}, this is V8 ${runtime.v8} on ${runtime.arch}` };
    }
    if (id !== (0, core_script_js_1.coreId)(source))
        return { data: null, reason: 'made for another core.js' };
    const data = bytes.subarray(end + 1);
    if (String(data.byteLength) !== length)
        return { data: null, reason: `${data.byteLength} bytes of data, expected ${length}` };
    return { data, runtime: { v8: v8Version, arch } };
}
/** Runs `compile` with V8's code cache checksums on (see {@link CHECKSUM_FLAG}), then turns them off. */
function withCacheChecksums(compile) {
    node_v8_1.default.setFlagsFromString(exports.CHECKSUM_FLAG);
    try {
        return compile();
    }
    finally {
        node_v8_1.default.setFlagsFromString(exports.CHECKSUM_FLAG.replace('--', '--no-'));
    }
}
/**
 * Compiles the core script, from its code cache when one fits (see {@link readCodeCache}). With
 * `NODE_DEBUG=fitgate` in the environment it prints `code cache: <outcome>` on stderr.
 * @param coreFile the script written by toCoreScript (dist/cli/core.js)
 * @param cacheFile its cache (dist/cli/core.cache); a missing file means no cache
 */
function compileCore(coreFile, cacheFile) {
    const source = (0, node_fs_1.readFileSync)(coreFile);
    let lookup;
    try {
        lookup = readCodeCache((0, node_fs_1.readFileSync)(cacheFile), source);
    }
    catch {
        lookup = { data: null, reason: 'no code cache file' };
    }
    const text = source.toString('utf8');
    let cache;
    let script;
    if (lookup.data === null) {
        script = new node_vm_1.default.Script(text, { filename: coreFile });
        cache = lookup.reason;
    }
    else {
        const data = lookup.data;
        script = withCacheChecksums(() => new node_vm_1.default.Script(text, { filename: coreFile, cachedData: data }));
        cache = script.cachedDataRejected === true ? 'rejected by V8' : 'accepted';
    }
    (0, node_util_1.debuglog)('fitgate')(`code cache: ${cache}`);
    return { script, cache };
}
/**
 * Runs the compiled core as its entry module would run: `entry` is the file worker threads start
 * (the launcher), `chunks` the folder of the ES modules the core loads on demand.
 * @param script from {@link compileCore}
 * @param entry absolute path of the launcher
 * @param chunks absolute path of the chunks' folder
 * @returns the core's completion (the command sets `process.exitCode` itself)
 */
function runCore(script, entry, chunks) {
    const core = script.runInThisContext();
    const base = (0, node_url_1.pathToFileURL)(`${chunks}${node_path_1.default.sep}`);
    // Node's own import(), not the bundler's (webpackIgnore keeps ncc from rewriting it).
    return core(node_module_1.createRequire, (0, node_url_1.pathToFileURL)(entry).href, (specifier) => import(/* webpackIgnore: true */ new URL(specifier, base).href));
}


/***/ }),

/***/ 150:
/***/ ((__unused_webpack_module, exports) => {


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
Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.CORE_PARAMETERS = void 0;
exports.toCoreScript = toCoreScript;
exports.coreId = coreId;
/** The function's parameter names, in order (see the list above). */
exports.CORE_PARAMETERS = ['__WEBPACK_EXTERNAL_createRequire', '__fitgate_entry_url', '__fitgate_import'];
/** ncc's one static import at the top of an ES module bundle. */
const NCC_IMPORT = 'import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";\n';
/**
 * ncc's name for webpack's require function, spelt in two pieces: ncc renames the whole word even
 * inside strings of the code it bundles (and this module is bundled by ncc for the build).
 */
const NCC_REQUIRE = ['__nccwpck', 'require__'].join('_');
/** ncc's chunk loader call (webpack's "import chunk loading" runtime). */
const NCC_CHUNK_IMPORT = `import("./" + ${NCC_REQUIRE}.u(chunkId))`;
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
function toCoreScript(bundle, identify) {
    const shebang = /^#!.*\n/.exec(bundle);
    let text = shebang ? bundle.slice(shebang[0].length) : bundle;
    if (!text.startsWith(NCC_IMPORT))
        throw new Error(`the CLI bundle does not start with ncc's import of createRequire (${JSON.stringify(text.slice(0, 80))})`);
    text = text.slice(NCC_IMPORT.length);
    const statement = /^(?:import|export)[\s{*]/m.exec(text);
    if (statement)
        throw new Error(`the CLI bundle has a module statement at offset ${statement.index}: ${JSON.stringify(text.slice(statement.index, statement.index + 80))}`);
    text = text.replaceAll('import.meta.url', exports.CORE_PARAMETERS[1]);
    const meta = text.indexOf('import.meta');
    if (meta >= 0)
        throw new Error(`the CLI bundle uses import.meta other than import.meta.url: ${JSON.stringify(text.slice(meta, meta + 60))}`);
    const loaders = text.split(NCC_CHUNK_IMPORT).length - 1;
    if (loaders !== 1)
        throw new Error(`expected ncc's chunk loader once in the CLI bundle, found it ${loaders} times`);
    text = text.replace(NCC_CHUNK_IMPORT, `${exports.CORE_PARAMETERS[2]}("./" + ${NCC_REQUIRE}.u(chunkId))`);
    // `import()` with nothing between the brackets is webpack's comment marking a chunk load.
    const dynamic = /\bimport\s*\((?!\))/.exec(text);
    if (dynamic)
        throw new Error(`the CLI bundle has an import() besides the chunk loader: ${JSON.stringify(text.slice(dynamic.index - 40, dynamic.index + 40))}`);
    const head = `(async function (${exports.CORE_PARAMETERS.join(', ')}) {"use strict"; ${ID_MARK}`;
    const rest = `\n${text}\n})`;
    const id = identify(head + rest);
    if (!/^[0-9a-z]+$/.test(id))
        throw new Error(`a core script's identity is lower-case letters and digits, not ${JSON.stringify(id)}`);
    return head + id + rest;
}
/**
 * The identity written on a core script's first line by {@link toCoreScript}, or null.
 * @param source the script's bytes (only the first line is read)
 */
function coreId(source) {
    const head = Buffer.from(source.buffer, source.byteOffset, Math.min(source.byteLength, 512)).toString('latin1');
    const end = head.indexOf('\n');
    if (end < 0)
        return null;
    const line = head.slice(0, end);
    const at = line.lastIndexOf(ID_MARK);
    const id = at < 0 ? '' : line.slice(at + ID_MARK.length);
    return /^[0-9a-z]+$/.test(id) ? id : null;
}


/***/ }),

/***/ 723:
/***/ (function(__unused_webpack_module, exports, __nccwpck_require__) {


var __importDefault = (this && this.__importDefault) || function (mod) {
    return (mod && mod.__esModule) ? mod : { "default": mod };
};
Object.defineProperty(exports, "__esModule", ({ value: true }));
/**
 * The `fitgate` command as shipped (dist/cli/index.js): compiles the command's core
 * (dist/cli/core.js, src/cli.ts made a classic script by core-script.ts) from its V8 code cache
 * when this Node.js can use it, and runs it. Everything the command does is in cli.ts; a core
 * that cannot be read or started (a damaged installation) ends the run with status 2.
 *
 * This file and the rest of src/launch are CommonJS (src/launch/package.json): Node.js starts a
 * CommonJS entry without its ES module loader, about 7 ms sooner on the development machine. The
 * chunks the core loads on demand are ES modules in dist/cli/chunks/.
 */
const node_path_1 = __importDefault(__nccwpck_require__(760));
const code_cache_js_1 = __nccwpck_require__(849);
function cannotStart(error) {
    process.stderr.write(`fitgate: cannot start: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 2;
}
try {
    const core = (0, code_cache_js_1.compileCore)(node_path_1.default.join(__dirname, 'core.js'), node_path_1.default.join(__dirname, 'core.cache'));
    (0, code_cache_js_1.runCore)(core.script, __filename, node_path_1.default.join(__dirname, 'chunks')).catch(cannotStart);
}
catch (error) {
    cannotStart(error);
}


/***/ }),

/***/ 24:
/***/ ((module) => {

module.exports = require("node:fs");

/***/ }),

/***/ 995:
/***/ ((module) => {

module.exports = require("node:module");

/***/ }),

/***/ 760:
/***/ ((module) => {

module.exports = require("node:path");

/***/ }),

/***/ 136:
/***/ ((module) => {

module.exports = require("node:url");

/***/ }),

/***/ 975:
/***/ ((module) => {

module.exports = require("node:util");

/***/ }),

/***/ 877:
/***/ ((module) => {

module.exports = require("node:v8");

/***/ }),

/***/ 714:
/***/ ((module) => {

module.exports = require("node:vm");

/***/ })

/******/ 	});
/************************************************************************/
/******/ 	// The module cache
/******/ 	var __webpack_module_cache__ = {};
/******/ 	
/******/ 	// The require function
/******/ 	function __nccwpck_require__(moduleId) {
/******/ 		// Check if module is in cache
/******/ 		var cachedModule = __webpack_module_cache__[moduleId];
/******/ 		if (cachedModule !== undefined) {
/******/ 			return cachedModule.exports;
/******/ 		}
/******/ 		// Create a new module (and put it into the cache)
/******/ 		var module = __webpack_module_cache__[moduleId] = {
/******/ 			// no module.id needed
/******/ 			// no module.loaded needed
/******/ 			exports: {}
/******/ 		};
/******/ 	
/******/ 		// Execute the module function
/******/ 		var threw = true;
/******/ 		try {
/******/ 			__webpack_modules__[moduleId].call(module.exports, module, module.exports, __nccwpck_require__);
/******/ 			threw = false;
/******/ 		} finally {
/******/ 			if(threw) delete __webpack_module_cache__[moduleId];
/******/ 		}
/******/ 	
/******/ 		// Return the exports of the module
/******/ 		return module.exports;
/******/ 	}
/******/ 	
/************************************************************************/
/******/ 	/* webpack/runtime/asset-relocator-loader */
/******/ 	if (typeof __nccwpck_require__ !== 'undefined') __nccwpck_require__.ab = __dirname + "/";
/******/ 	
/************************************************************************/
/******/ 	
/******/ 	// startup
/******/ 	// Load entry module and return exports
/******/ 	// This entry module is referenced by other modules so it can't be inlined
/******/ 	var __webpack_exports__ = __nccwpck_require__(723);
/******/ 	module.exports = __webpack_exports__;
/******/ 	
/******/ })()
;