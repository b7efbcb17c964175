export const id = 739;
export const ids = [739];
export const modules = {

/***/ 4982:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   l: () => (/* binding */ REPOSITORY_URL),
/* harmony export */   z: () => (/* binding */ checkDocsUrl)
/* harmony export */ });
/* harmony import */ var _version_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3323);
/**
 * Where fitgate's documentation lives on the web: the published repository, and the page of
 * each check (docs/checks.md, one `### <id>` heading per check, which GitHub anchors as `#<id>`).
 * The version's tag pins the page to the text of the release that wrote the link.
 */

/** The repository fitgate is published from (package.json `repository` says the same; a test keeps them in step). */
const REPOSITORY_URL = 'https://github.com/fitgate/fitgate';
/** The documentation page of a check: `<repository>/blob/v<version>/docs/checks.md#<id>`. */
function checkDocsUrl(id) {
    return `${REPOSITORY_URL}/blob/v${_version_js__WEBPACK_IMPORTED_MODULE_0__/* .VERSION */ .x}/docs/checks.md#${encodeURIComponent(id)}`;
}


/***/ }),

/***/ 9739:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  runInit: () => (/* binding */ runInit)
});

// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __webpack_require__(3024);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
// EXTERNAL MODULE: external "node:zlib"
var external_node_zlib_ = __webpack_require__(8522);
// EXTERNAL MODULE: ./src/config/init-files.ts
var init_files = __webpack_require__(1144);
// EXTERNAL MODULE: ./src/config/settings-file.ts
var settings_file = __webpack_require__(4140);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/core/links.ts
var links = __webpack_require__(4982);
// EXTERNAL MODULE: ./src/core/nearest.ts
var nearest = __webpack_require__(761);
// EXTERNAL MODULE: ./src/core/version.ts
var version = __webpack_require__(3323);
// EXTERNAL MODULE: ./src/data/table.ts + 1 modules
var data_table = __webpack_require__(8785);
// EXTERNAL MODULE: ./src/data/csv-rules.ts
var csv_rules = __webpack_require__(8706);
// EXTERNAL MODULE: ./src/data/gzip-stream.ts + 1 modules
var gzip_stream = __webpack_require__(4596);
// EXTERNAL MODULE: ./src/diagnostics/random.ts
var random = __webpack_require__(5089);
;// CONCATENATED MODULE: ./src/diagnostics/holdout-split.ts
/**
 * Splitting one table's rows into training and hold-out rows, reproducibly: `random` draws the
 * hold-out rows with a seeded shuffle (Fisher-Yates over {@link seededRandom}, as the folds do);
 * `last` holds out the last rows as one block (data in time order, where a random split would let
 * the model see the future). Both keep each side's rows in file order.
 */

/**
 * Hold-out rows: round(share * rows), at least 1, leaving at least 2 training rows.
 * Returns null when `rows` is below 3 (nothing sensible to split).
 *
 * @param rows number of data rows
 * @param share share of rows held out, in (0, 1)
 */
function holdoutCount(rows, share) {
    if (rows < 3)
        return null;
    return Math.min(rows - 2, Math.max(1, Math.round(share * rows)));
}
/**
 * Splits rows 0..rows-1.
 *
 * @param rows number of data rows (>= 3)
 * @param share share held out, in (0, 1) (see {@link holdoutCount})
 * @param how `random` (seeded) or `last` (a block at the end)
 * @param seed seed of the random split (ignored for `last`)
 * @throws RangeError when rows < 3
 */
function splitRows(rows, share, how, seed) {
    const count = holdoutCount(rows, share);
    if (count === null)
        throw new RangeError(`splitRows: need at least 3 rows, got ${rows}`);
    const held = new Uint8Array(rows);
    if (how === 'last')
        held.fill(1, rows - count);
    else {
        const order = (0,random/* permutation */.dL)(rows, (0,random/* seededRandom */.Is)(seed));
        markFirst(held, order, count);
    }
    return { train: indexesWhere(held, 0, rows - count), holdout: indexesWhere(held, 1, count) };
}
function markFirst(held, order, count) {
    for (let i = 0; i < count; i++)
        held[order[i]] = 1;
}
function indexesWhere(held, value, count) {
    const out = new Int32Array(count);
    let k = 0;
    for (let i = 0; i < held.length; i++)
        if (held[i] === value)
            out[k++] = i;
    return out;
}

// EXTERNAL MODULE: ./src/repo/fs-repository.ts
var fs_repository = __webpack_require__(4526);
// EXTERNAL MODULE: ./src/entries/repo-write.ts
var repo_write = __webpack_require__(9056);
;// CONCATENATED MODULE: ./src/entries/init-command.ts
/**
 * `fitgate init TRAIN.csv`: writes a first descriptor for a training CSV (and the settings file
 * when the repository has none), and, when no hold-out file is given, splits a reproducible
 * hold-out off the training file into two new CSV files beside it. Every file is checked before
 * any is written: nothing is overwritten without `--force` (the settings file never is).
 */















/** Folder the first descriptor goes into, repository-relative. */
const MODELS_FOLDER = 'models';
/** Most columns init tries to read as numbers (a wider file keeps the first ones that are). */
const MAX_COLUMNS = 200;
/**
 * Where the JSON Schema is for a file in `folder`: the installed package's copy when the
 * repository has one (`node_modules/fitgate/dist/schema/`), else the copy published with this
 * version in fitgate's repository.
 */
function schemaLocation(root, folder, file) {
    const installed = `node_modules/fitgate/dist/schema/${file}.schema.json`;
    if ((0,external_node_fs_.existsSync)(external_node_path_default().join(root, installed)))
        return external_node_path_default().posix.relative(folder === '' ? '.' : folder, installed);
    return `${links/* REPOSITORY_URL */.l.replace('https://github.com/', 'https://raw.githubusercontent.com/')}/v${version/* VERSION */.x}/dist/schema/${file}.schema.json`;
}
/** Reads the columns that hold numbers only (the target must be one of them), under `format`. */
async function numericTable(repo, file, header, target, format) {
    let columns = [target, ...header.filter((c) => c !== target)].slice(0, MAX_COLUMNS);
    const dropped = header.length > MAX_COLUMNS ? header.filter((c) => !columns.includes(c)) : [];
    for (let attempt = 0; attempt <= MAX_COLUMNS; attempt++) {
        try {
            return { table: await (0,data_table/* readTable */.xz)(repo, file, { columns, format }), dropped };
        }
        catch (error) {
            const bad = error instanceof errors/* InputError */.dz && error.code === 'csv-cell' ? error.location.key : undefined;
            if (bad === undefined || bad === target || !columns.includes(bad))
                throw error;
            columns = columns.filter((c) => c !== bad);
            dropped.push(bad);
        }
    }
    throw new errors/* InputError */.dz('csv-cell', 'too many columns that are not numbers', { file });
}
/**
 * The numeric columns under the decimal mark asked for; under `auto`, a decimal comma when more
 * columns read as numbers with it than with a point (a file separated by commas cannot have one).
 * An error of the init's own reading names the init option that settles it, not the descriptor key.
 */
async function readNumbers(repo, command, header, target) {
    const attempt = async (decimal) => ({
        ...(await numericTable(repo, command.train, header, target, { decimal, missing: command.missing })),
        decimal,
    });
    try {
        if (command.decimal !== 'auto')
            return await attempt(command.decimal);
        let point = null;
        let pointError = null;
        try {
            point = await attempt('.');
            if (point.dropped.length === 0)
                return point;
        }
        catch (error) {
            pointError = error;
        }
        let comma = null;
        try {
            comma = await attempt(',');
        }
        catch {
            // Not a decimal-comma file either: the point's outcome stands.
        }
        if (comma !== null && (point === null || comma.dropped.length < point.dropped.length))
            return comma;
        if (point !== null)
            return point;
        throw pointError;
    }
    catch (error) {
        if (!(error instanceof errors/* InputError */.dz) || error.code !== 'csv-cell')
            throw error;
        const message = error.message
            .replace(csv_rules/* MISSING_HINT */.PF, '. Hint: to drop the rows with a missing cell in a used column, give `--missing drop`')
            .replace(csv_rules/* DECIMAL_COMMA_HINT */.SK, '. Hint: if the file writes numbers with a decimal comma (1,5 for 1.5), give `--decimal ,`');
        throw new errors/* InputError */.dz(error.code, message, error.location);
    }
}
/**
 * The text of a data file as the CSV readers read it (data/gzip-stream.ts `openDataFile`:
 * decompressed when its name ends in `.gz`, within the plain-file size cap).
 */
async function fileText(repo, file) {
    const pieces = [];
    for await (const piece of (0,gzip_stream/* openDataFile */.fu)(repo, file, csv_rules/* DEFAULT_MAX_BYTES */.fS))
        pieces.push(piece);
    return new TextDecoder('utf-8').decode(Buffer.concat(pieces)).replace(/^\uFEFF/, '');
}
/**
 * The text of the data rows `indexes` of a CSV, from the rows' physical lines: the header (the
 * first line that is not blank), then each row's lines up to the next row's (lines between rows
 * that were not read as rows, such as rows dropped for a missing cell, go with the row before
 * them; those before the first row, with the first row). Blank lines are left out.
 */
function rowsText(lines, rowLines, indexes) {
    const header = lines.findIndex((line) => line.trim() !== '');
    const out = [lines[header]];
    for (const i of indexes) {
        const own = rowLines[i] - 1;
        const first = i === 0 ? header + 1 : own;
        const end = i + 1 < rowLines.length ? rowLines[i + 1] - 1 : lines.length;
        for (let j = first; j < end; j++)
            if (lines[j].trim() !== '' || j === own)
                out.push(lines[j]);
    }
    return `${out.join('\n')}\n`;
}
/** A model name from a file name: letters, digits, `-`, `_`, `.` only. */
function nameFrom(file) {
    const stem = external_node_path_default().posix
        .basename(file)
        .replace(/(\.csv)?(\.gz)?$/i, '')
        .replace(/[-_.]?train(ing)?$/i, '');
    const name = stem
        .replace(/[^A-Za-z0-9._-]+/g, '-')
        .replace(/^[-.]+|[-.]+$/g, '')
        .slice(0, 100);
    return name === '' ? 'model' : name;
}
/** Runs `fitgate init`; see the module comment. */
async function runInit(command) {
    const repo = (0,fs_repository/* createFsRepository */.E)(command.root);
    const header = await (0,data_table/* readHeader */.ay)(repo, command.train);
    const target = command.target ?? header[header.length - 1];
    if (!header.includes(target)) {
        const near = (0,nearest/* nearestWord */.z)(target, header);
        throw new errors/* InputError */.dz('csv-missing-column', `no column ${(0,errors/* quoteValue */.cl)(target, 60)}${near !== null ? ` (did you mean ${(0,errors/* quoteValue */.cl)(near, 60)}?)` : ''}; expected one of: ${header.slice(0, 20).join(', ')}`, { file: command.train, key: '--target' });
    }
    const { table, dropped, decimal } = await readNumbers(repo, command, header, target);
    const inputs = header.filter((c) => c !== target && table.columns.has(c));
    if (inputs.length === 0)
        throw new errors/* InputError */.dz('csv-missing-column', `no numeric column besides the target ${(0,errors/* quoteValue */.cl)(target, 60)}; expected at least one input column`, { file: command.train });
    if (command.name !== null && !/^[A-Za-z0-9._-]{1,100}$/.test(command.name)) {
        throw new errors/* InputError */.dz('option-value', `expected 1 to 100 letters, digits, \`-\`, \`_\` or \`.\`, got ${(0,errors/* quoteValue */.cl)(command.name, 60)}`, {
            key: '--name',
        });
    }
    const name = command.name ?? nameFrom(command.train);
    const descriptorPath = `${MODELS_FOLDER}/${name}.model.yml`;
    const writes = [];
    const notes = [];
    const said = [];
    let trainFile = command.train;
    let holdoutFile = command.holdout;
    let trainRows = table.rows;
    if (holdoutFile === null) {
        if (table.rows < 3)
            throw new errors/* InputError */.dz('csv-empty', `has ${table.rows} data rows; expected at least 3 to split a hold-out off (or give --holdout)`, {
                file: command.train,
            });
        const split = splitRows(table.rows, command.holdoutShare, command.split, command.seed);
        const lines = (await fileText(repo, command.train)).split(/\r?\n/);
        while (lines.length > 0 && lines[lines.length - 1].trim() === '')
            lines.pop();
        // A gzip file splits into gzip files: data/x.csv.gz -> data/x-train.csv.gz and data/x-holdout.csv.gz.
        const gzip = (0,gzip_stream/* isGzipPath */.ip)(command.train);
        const stem = command.train.replace(gzip ? /(\.csv)?\.gz$/i : /\.csv$/i, '');
        const ending = gzip ? '.csv.gz' : '.csv';
        const packed = (text) => (gzip ? (0,external_node_zlib_.gzipSync)(text) : text);
        trainFile = `${stem}-train${ending}`;
        holdoutFile = `${stem}-holdout${ending}`;
        trainRows = split.train.length;
        writes.push({ file: trainFile, text: packed(rowsText(lines, table.lines, split.train)), overwrite: command.force });
        writes.push({ file: holdoutFile, text: packed(rowsText(lines, table.lines, split.holdout)), overwrite: command.force });
        const how = command.split === 'last'
            ? `the last ${split.holdout.length} of ${table.rows} rows (a block at the end, for data in time order)`
            : `${split.holdout.length} of ${table.rows} rows drawn at random with seed ${command.seed} (reproducible: \`--seed ${command.seed}\` gives the same split)`;
        notes.push(`Hold-out: ${how}, split off ${command.train} by fitgate init.`);
        said.push(`split ${command.train}: ${trainRows} training rows -> ${trainFile}, ${split.holdout.length} hold-out rows -> ${holdoutFile}; hold-out = ${how}`);
    }
    else if (!(await repo.isFile(holdoutFile))) {
        throw new errors/* InputError */.dz('file-missing', `hold-out file not found in ${repo.label}`, { file: holdoutFile, key: '--holdout' });
    }
    if (decimal === ',')
        said.push('read the numbers with a decimal comma (data.decimal: "," in the descriptor)');
    if (table.dropped > 0) {
        notes.push(`Rows with a missing cell in a used column: ${table.dropped} in ${command.train}; data.missing: drop leaves them out of every check.`);
        said.push(`${table.dropped} rows of ${command.train} have a missing cell in a used column: data.missing: drop leaves them out of every check`);
    }
    if (dropped.length > 0) {
        notes.push(`Left out (not numeric): ${dropped.slice(0, 10).join(', ')}${dropped.length > 10 ? ', ...' : ''}.`);
        said.push(`left out columns that are not numbers: ${dropped.slice(0, 10).join(', ')}${dropped.length > 10 ? ', ...' : ''}`);
    }
    const ratio = (0,init_files/* ratioLimitFor */.y9)((0,init_files/* firstModelParameters */.oE)(inputs.length, command.degree), trainRows);
    const folder = external_node_path_default().posix.dirname(descriptorPath);
    writes.push({
        file: descriptorPath,
        overwrite: command.force,
        text: (0,init_files/* descriptorText */.tl)({
            name,
            task: command.task,
            train: external_node_path_default().posix.relative(folder, trainFile),
            holdout: external_node_path_default().posix.relative(folder, holdoutFile),
            target,
            inputs,
            degree: command.degree,
            rows: trainRows,
            schema: schemaLocation(command.root, folder, 'descriptor'),
            notes,
            decimal,
            missing: command.missing,
        }, ratio),
    });
    if (!(0,repo_write/* existsInRepo */.Qg)(command.root, settings_file/* DEFAULT_SETTINGS_PATH */.WA)) {
        writes.push({
            file: settings_file/* DEFAULT_SETTINGS_PATH */.WA,
            overwrite: false,
            text: (0,init_files/* settingsText */.JV)(schemaLocation(command.root, '', 'settings'), `${MODELS_FOLDER}/**/*.model.yml`),
        });
    }
    else
        said.push(`kept the settings file ${settings_file/* DEFAULT_SETTINGS_PATH */.WA} as it is (its \`models\` patterns must match ${descriptorPath}; the default is ${settings_file/* DEFAULT_MODEL_PATTERNS */.y3.join(', ')})`);
    // Every file is checked before any is written, so that a refusal leaves the tree as it was.
    const blocked = writes.filter((w) => !w.overwrite && (0,repo_write/* existsInRepo */.Qg)(command.root, w.file));
    if (blocked.length > 0) {
        throw new errors/* InputError */.dz(repo_write/* FILE_EXISTS */.Sy, `exists; nothing was written. Run again with --force to overwrite ${blocked.length === 1
            ? 'it'
            : `it and ${blocked
                .slice(1)
                .map((b) => b.file)
                .join(', ')}`}`, { file: blocked[0].file });
    }
    for (const w of writes)
        (0,repo_write/* writeInRepo */.DU)(command.root, w.file, w.text, w.overwrite);
    const lines = [
        ...writes.map((w) => `wrote ${w.file}`),
        ...said,
        `params_per_sample: ${ratio.value} (${ratio.comment})`,
        `next: fitgate check ${descriptorPath}`,
    ];
    return { stdout: `${lines.join('\n')}\n`, stderr: '', status: 0 };
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
