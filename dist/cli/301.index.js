export const id = 301;
export const ids = [301];
export const modules = {

/***/ 7301:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runRefit: () => (/* binding */ runRefit)
});

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __webpack_require__(8815);
// EXTERNAL MODULE: ./src/config/yaml-parse.ts
var yaml_parse = __webpack_require__(3317);
// EXTERNAL MODULE: ./src/core/errors.ts
var core_errors = __webpack_require__(4296);
;// CONCATENATED MODULE: ./src/config/coefficients-text.ts
/**
 * Writing a model's coefficients into its descriptor's text, changing nothing else: the YAML
 * library's document API finds the source range of the `coefficients` value (and of each of its
 * items), and only those bytes are replaced; every comment, key order, quote and blank line
 * elsewhere stays byte for byte. With the same number of items each number is replaced where it
 * stands (comments between items survive); otherwise the list is rewritten in the style it had
 * (flow `[a, b]` or block `- a` lines at its indentation). A descriptor without the key gets
 * `coefficients: [...]` appended as a last top-level key.
 */



/** Code of the error for a descriptor whose `coefficients` cannot be rewritten in place. */
const COEFFICIENTS_TEXT_ERROR = 'coefficients-text';
/**
 * A number as YAML reads it back to the same double: the shortest round-trip form of
 * `Number.prototype.toString` (ECMA-262 Number::toString), which the YAML 1.2 core schema's float
 * and int forms accept. Non-finite numbers are refused.
 */
function yamlNumber(x) {
    if (!Number.isFinite(x))
        throw new RangeError(`yamlNumber: ${x} is not finite`);
    return Object.is(x, -0) ? '0' : String(x);
}
/**
 * The descriptor text with `values` as its coefficients.
 *
 * @param text the descriptor's current text (one YAML document whose top level is a mapping)
 * @param values the coefficients, intercept first (finite numbers)
 * @param file repository-relative path, for errors
 * @returns the new text (equal to `text` when the coefficients are already these numbers as written)
 * @throws InputError `coefficients-text` when the text is not one mapping or `coefficients` is not a list of scalars
 */
function withCoefficients(text, values, file) {
    const written = values.map(yamlNumber);
    const doc = (0,yaml_parse/* parseYamlDocument */.I)(text, { version: '1.2', schema: 'core', uniqueKeys: false });
    if (doc.errors.length > 0 || !(0,dist/* isMap */.jh)(doc.contents)) {
        throw new core_errors/* InputError */.dz(COEFFICIENTS_TEXT_ERROR, 'cannot be rewritten: expected one YAML document whose top level is a mapping', { file });
    }
    const pair = doc.contents.items.find((p) => (0,dist/* isScalar */.jn)(p.key) && p.key.value === 'coefficients');
    if (pair === undefined) {
        const body = text === '' || text.endsWith('\n') ? text : `${text}\n`;
        return `${body}coefficients: [${written.join(', ')}]\n`;
    }
    const seq = pair.value;
    if (!(0,dist/* isSeq */.oP)(seq) || !seq.range || !seq.items.every((item) => (0,dist/* isScalar */.jn)(item) && item.range)) {
        throw new core_errors/* InputError */.dz(COEFFICIENTS_TEXT_ERROR, 'cannot be rewritten: expected `coefficients` to be a list of numbers', {
            file,
            key: 'coefficients',
        });
    }
    const items = seq.items;
    if (items.length === written.length && items.length > 0) {
        // Each number where it stands, from the last so that earlier offsets stay valid.
        let out = text;
        for (let i = items.length - 1; i >= 0; i--) {
            const [start, end] = items[i].range;
            out = out.slice(0, start) + written[i] + out.slice(end);
        }
        return out;
    }
    return replaceList(text, seq, written);
}
function replaceList(text, seq, written) {
    const [start, valueEnd] = seq.range;
    if (seq.flow || seq.items.length === 0)
        return `${text.slice(0, start)}[${written.join(', ')}]${text.slice(valueEnd)}`;
    // A block list: keep the indentation of its first `-` and whatever follows its last item on that line.
    const lineStart = text.lastIndexOf('\n', start - 1) + 1;
    const indent = text.slice(lineStart, start);
    const last = seq.items[seq.items.length - 1];
    const end = last.range[1];
    if (written.length === 0)
        return `${text.slice(0, start)}[]${text.slice(end)}`;
    return `${text.slice(0, start)}${written.map((w) => `- ${w}`).join(`\n${indent}`)}${text.slice(end)}`;
}
/**
 * The coefficients a descriptor text ships (its top-level `coefficients` list of numbers), or
 * null when it has none or they are not a list of finite numbers (the schema refuses those).
 */
function shippedCoefficients(text) {
    const doc = (0,yaml_parse/* parseYamlDocument */.I)(text, { version: '1.2', schema: 'core', uniqueKeys: false });
    if (doc.errors.length > 0 || !(0,dist/* isMap */.jh)(doc.contents))
        return null;
    const value = doc.contents.get('coefficients');
    if (!(0,dist/* isSeq */.oP)(value))
        return null;
    const numbers = value.items.map((item) => ((0,dist/* isScalar */.jn)(item) ? item.value : null));
    return numbers.every((n) => typeof n === 'number' && Number.isFinite(n)) ? numbers : null;
}
/**
 * How far shipped coefficients are from a refit's: the largest absolute difference and its
 * index, and whether they are stale, i.e. missing, of another length, or apart by more than
 * 1e-9 times the largest refit coefficient in absolute value (a relative tolerance far below any
 * figure fitgate reports, above the last-bit noise of a refit).
 */
function compareCoefficients(shipped, refit) {
    if (shipped === null || shipped.length !== refit.length)
        return { stale: true, largest: Number.NaN, at: -1 };
    let largest = 0;
    let at = -1;
    let scale = 0;
    for (let j = 0; j < refit.length; j++) {
        const d = Math.abs(shipped[j] - refit[j]);
        if (d > largest) {
            largest = d;
            at = j;
        }
        scale = Math.max(scale, Math.abs(refit[j]));
    }
    return { stale: largest > 1e-9 * scale || (scale === 0 && largest > 0), largest, at };
}
/**
 * The text with its top-level `coefficients` key and value blanked out (every character of them
 * but line breaks becomes a space), so that a refit can run on a descriptor whose shipped list no
 * longer fits its terms while every other line keeps its number for messages. Returns the text
 * unchanged when it has no such key or is not one mapping.
 */
function blankCoefficients(text) {
    const doc = (0,yaml_parse/* parseYamlDocument */.I)(text, { version: '1.2', schema: 'core', uniqueKeys: false });
    if (doc.errors.length > 0 || !(0,dist/* isMap */.jh)(doc.contents))
        return text;
    const pair = doc.contents.items.find((p) => (0,dist/* isScalar */.jn)(p.key) && p.key.value === 'coefficients');
    const key = pair?.key;
    const value = pair?.value;
    if (!key?.range)
        return text;
    const start = key.range[0];
    const end = value?.range ? value.range[1] : key.range[1];
    return text.slice(0, start) + text.slice(start, end).replace(/[^\n]/g, ' ') + text.slice(end);
}
/** True when a descriptor text says `fit: { refit: false }` (its shipped coefficients are the model). */
function scoresAsShipped(text) {
    const doc = (0,yaml_parse/* parseYamlDocument */.I)(text, { version: '1.2', schema: 'core', uniqueKeys: false });
    return doc.errors.length === 0 && (0,dist/* isMap */.jh)(doc.contents) && doc.getIn(['fit', 'refit']) === false;
}

// EXTERNAL MODULE: ./src/core/format.ts
var format = __webpack_require__(6228);
// EXTERNAL MODULE: ./src/repo/fs-repository.ts
var fs_repository = __webpack_require__(4526);
// EXTERNAL MODULE: ./src/entries/repo-write.ts
var repo_write = __webpack_require__(9056);
// EXTERNAL MODULE: ./src/result/result.ts
var result_result = __webpack_require__(1628);
// EXTERNAL MODULE: ./src/run/pipeline.ts + 15 modules
var pipeline = __webpack_require__(324);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(4031);
;// CONCATENATED MODULE: ./src/entries/refit-command.ts
/**
 * `fitgate refit [descriptor...]`: refits every model and writes its coefficients into the
 * descriptor's `coefficients` (only those bytes change; see config/coefficients-text.ts), with
 * one summary line per descriptor. `--check` writes nothing and exits 1 when a descriptor's
 * shipped coefficients are stale (missing or apart from the refit), for a CI step. A model that
 * cannot be refitted is listed and makes the exit status 2; the others are still written. A
 * model scored as shipped (`fit.refit: false`) is kept as it is.
 */








/** Runs `fitgate refit`; see the module comment. */
async function runRefit(command) {
    const { settings } = command;
    const repo = (0,fs_repository/* createFsRepository */.E)(settings.root);
    // The refit ignores the shipped coefficients (a list that no longer fits the terms is what a
    // refit is for): YAML files are read with that key blanked out. Serial, so that every read
    // goes through this reader.
    const refitting = {
        ...repo,
        label: repo.label,
        resolve: (from, target, where) => repo.resolve(from, target, where),
        isFile: (p) => repo.isFile(p),
        size: (p) => repo.size(p),
        stream: (p, chunk) => repo.stream(p, chunk),
        glob: (patterns) => repo.glob(patterns),
        read: async (p) => {
            const bytes = await repo.read(p);
            if (!/\.ya?ml$/i.test(p))
                return bytes;
            const text = new TextDecoder().decode(bytes);
            return scoresAsShipped(text) ? bytes : new TextEncoder().encode(blankCoefficients(text));
        },
    };
    const result = await (0,pipeline/* runPipeline */.a)(settings, refitting, { jobs: 1 });
    const lines = [];
    let stale = 0;
    let errors = 0;
    let written = 0;
    for (const m of result.models) {
        const where = (0,report_escape/* escapeTerminal */.en)(m.descriptor);
        if (m.error) {
            errors += 1;
            const at = m.error.file && m.error.file !== m.descriptor
                ? `${m.error.file}${m.error.line ? `:${m.error.line}` : ''}: `
                : m.error.line
                    ? `line ${m.error.line}: `
                    : '';
            lines.push(`error: ${where}: ${(0,report_escape/* escapeTerminal */.en)(at + m.error.message)}`);
            continue;
        }
        if (m.kind === 'predictions') {
            lines.push(`kept: ${where}: trained elsewhere (\`predictions\`), nothing to refit`);
            continue;
        }
        const refit = m.coefficients.map((c) => (0,result_result/* fromJsonNumber */.M)(c));
        if (!refit.every(Number.isFinite)) {
            errors += 1;
            lines.push(`error: ${where}: the refit has coefficients that are not finite numbers; nothing written`);
            continue;
        }
        try {
            const text = new TextDecoder('utf-8', { fatal: true }).decode(await repo.read(m.descriptor));
            if (scoresAsShipped(text)) {
                lines.push(`kept: ${where}: scored as shipped (\`fit.refit: false\`), not refitted`);
                continue;
            }
            const shipped = shippedCoefficients(text);
            const { stale: isStale, largest, at } = compareCoefficients(shipped, refit);
            const count = `${refit.length} coefficient${refit.length === 1 ? '' : 's'}`;
            const change = shipped === null
                ? 'none shipped'
                : shipped.length !== refit.length
                    ? `${shipped.length} shipped`
                    : `largest difference ${(0,format/* formatNumber */.Z)(largest)} at [${at}]`;
            if (command.check) {
                if (isStale)
                    stale += 1;
                lines.push(isStale ? `stale: ${where}: ${count} from the refit, ${change}; run \`fitgate refit ${where}\`` : `current: ${where}: ${count}`);
                continue;
            }
            if (!isStale && shipped !== null) {
                lines.push(`unchanged: ${where}: ${count}`);
                continue;
            }
            (0,repo_write/* writeInRepo */.DU)(settings.root, m.descriptor, withCoefficients(text, refit, m.descriptor), true);
            written += 1;
            lines.push(`wrote: ${where}: ${count} (${change})`);
        }
        catch (error) {
            if (!(error instanceof core_errors/* InputError */.dz))
                throw error;
            errors += 1;
            lines.push(`error: ${where}: ${(0,report_escape/* escapeTerminal */.en)(error.location.file === m.descriptor ? error.message : (0,core_errors/* errorMessage */.gJ)(error))}`);
        }
    }
    const models = `${result.models.length} model${result.models.length === 1 ? '' : 's'}`;
    lines.push(command.check
        ? `${models}: ${stale} with stale coefficients${errors > 0 ? `, ${errors} could not be refitted` : ''}`
        : `${models}: ${written} descriptor${written === 1 ? '' : 's'} written${errors > 0 ? `, ${errors} could not be refitted` : ''}`);
    const status = errors > 0 ? 2 : command.check && stale > 0 ? 1 : 0;
    return { stdout: `${lines.join('\n')}\n`, stderr: '', status };
}


/***/ }),

/***/ 9056:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   DU: () => (/* binding */ writeInRepo),
/* harmony export */   Qg: () => (/* binding */ existsInRepo),
/* harmony export */   Sy: () => (/* binding */ FILE_EXISTS)
/* harmony export */ });
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(4296);
/* harmony import */ var _repo_repo_path_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(3856);
/* harmony import */ var _safe_write_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(9725);
/**
 * Writing a file the user asked fitgate to make inside the repository (`init`, `refit`): a
 * repository-relative path, written with {@link writeFileSafely} with the root as the only
 * boundary (every folder on the way must really lie inside the root, a link is never followed,
 * the file is replaced atomically), and an existing file kept unless overwriting was asked for.
 */





/** Code of the error for a file that exists when it may not be overwritten. */
const FILE_EXISTS = 'file-exists';
/**
 * True when something (a file, a folder, a link) is at the repository-relative path.
 * @param root absolute repository root
 * @param rel repository-relative path with `/`
 */
function existsInRepo(root, rel) {
    try {
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.lstatSync)(node_path__WEBPACK_IMPORTED_MODULE_1__.join((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(root), (0,_repo_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .normaliseRepoPath */ .Gn)(rel, { file: rel })));
        return true;
    }
    catch {
        return false;
    }
}
/**
 * Writes `text` to the repository-relative path `rel` (creating folders), atomically.
 *
 * @param root absolute repository root
 * @param rel repository-relative path with `/`
 * @param text the contents: text (written as UTF-8) or bytes as they are
 * @param overwrite replace an existing regular file (default false: an existing file is an error)
 * @throws InputError `path-outside` (the path leaves the repository), `output-refused` (a folder on
 *   the way leads outside, or the target is a link or not a file), `file-exists` (the file exists
 *   and `overwrite` is false)
 */
function writeInRepo(root, rel, text, overwrite = false) {
    const normal = (0,_repo_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .normaliseRepoPath */ .Gn)(rel, { file: rel });
    const base = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(root);
    if (!overwrite && existsInRepo(base, normal))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(FILE_EXISTS, 'exists; run again with --force to overwrite it', { file: normal });
    (0,_safe_write_js__WEBPACK_IMPORTED_MODULE_4__/* .writeFileSafely */ .kv)(node_path__WEBPACK_IMPORTED_MODULE_1__.join(base, normal), text, { option: normal, within: [base], insideOnly: true });
}


/***/ })

};
