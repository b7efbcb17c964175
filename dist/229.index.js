export const id = 229;
export const ids = [229,167];
export const modules = {

/***/ 3167:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  readTextColumns: () => (/* binding */ readTextColumns)
});

// EXTERNAL MODULE: ./node_modules/csv-parse/lib/api/index.js + 3 modules
var api = __webpack_require__(7084);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/api/normalize_options.js + 1 modules
var normalize_options = __webpack_require__(6845);
;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/sync.js



const parse = function (data, opts = {}) {
  if (typeof data === "string") {
    data = Buffer.from(data);
  }
  const records = opts && opts.objname ? Object.create(null) : [];
  const parser = (0,api/* transform */.p)(opts);
  const push = (record) => {
    if (parser.options.objname === undefined) records.push(record);
    else {
      records[record[0]] = record[1];
    }
  };
  const close = () => {};
  const error = parser.parse(data, true, push, close);
  if (error !== undefined) throw error;
  return records;
};



// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/data/csv-format.ts
var csv_format = __webpack_require__(3838);
// EXTERNAL MODULE: ./src/data/gzip-stream.ts
var gzip_stream = __webpack_require__(7391);
;// CONCATENATED MODULE: ./src/data/text-columns.ts
/**
 * Text columns of a CSV file (category levels), read apart from the numeric columns: the numeric
 * readers (table.ts) refuse text, so a model's category inputs are left out of their request and
 * read here, with the same rules for records (the separator set or detected from the header line
 * as the numeric readers detect it, `"` quotes, a byte-order mark dropped, white space around a
 * field trimmed, lines holding only white space skipped). A level is the cell's text as written
 * (trimmed): `07` and `7` are two levels, never numbers.
 */




/**
 * Reads the named columns as text.
 * @param maxBytes size cap of the file and of its decompressed bytes (the caller's; the numeric read of the same file checks it first)
 * @param separator the descriptor's `data.separator`: `auto` (default) detects it from the first line that is not blank ({@link separatorOfHeader})
 * @throws InputError `csv-missing-column` (naming the columns that exist), `csv-syntax`, `file-too-large`
 */
async function readTextColumns(repo, path, names, maxBytes, separator = 'auto') {
    const size = await repo.size(path);
    if (size > maxBytes)
        throw new errors/* InputError */.dz('file-too-large', `${path} is ${size} bytes; the cap is ${maxBytes}`, { file: path });
    // Through the same door as the numeric read: decompressed when `.gz`, the decompressed bytes held to the cap.
    const pieces = [];
    for await (const piece of (0,gzip_stream/* openDataFile */.fu)(repo, path, maxBytes))
        pieces.push(piece);
    const text = new TextDecoder('utf-8').decode(Buffer.concat(pieces));
    const delimiter = separator === 'auto' ? (0,csv_format/* separatorOfHeader */.u_)(headerLineOf(text)) : separator;
    let records;
    try {
        records = parse(text, {
            bom: true,
            delimiter,
            trim: true,
            info: true,
            relax_column_count: true,
            skip_empty_lines: true,
        });
    }
    catch (error) {
        throw new errors/* InputError */.dz('csv-syntax', `${path} could not be read as CSV: ${error instanceof Error ? error.message.slice(0, 200) : String(error)}`, { file: path });
    }
    const kept = records.filter((r) => r.record.some((cell) => cell !== ''));
    if (kept.length === 0)
        throw new errors/* InputError */.dz('csv-empty', `${path} has no header row`, { file: path });
    const header = kept[0].record;
    const index = names.map((name) => {
        const k = header.indexOf(name);
        if (k < 0)
            throw new errors/* InputError */.dz('csv-missing-column', `${path} has no column \`${name}\`; its columns are ${header.slice(0, 20).join(', ')}`, {
                file: path,
                line: kept[0].info.lines,
                key: name,
            });
        return k;
    });
    const rows = kept.slice(1);
    const columns = new Map(names.map((name, j) => [name, rows.map((r) => r.record[index[j]] ?? '')]));
    return { columns, lines: Int32Array.from(rows, (r) => r.info.lines) };
}
/** The first line of `text` that holds more than white space (the header), without its line end. */
function headerLineOf(text) {
    for (const line of text.split('\n', 1000))
        if (line.trim() !== '')
            return line.replace(/\r$/, '');
    return '';
}


/***/ }),

/***/ 1229:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  evaluatePredictions: () => (/* binding */ evaluatePredictions)
});

// UNUSED EXPORTS: PROBABILITY_EPS, clampedLogits

// EXTERNAL MODULE: ./src/checks/index.ts + 24 modules
var src_checks = __webpack_require__(1550);
// EXTERNAL MODULE: ./src/core/deadline.ts
var deadline = __webpack_require__(6343);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/data/labels.ts
var data_labels = __webpack_require__(3909);
// EXTERNAL MODULE: ./src/data/load-model-data.ts + 1 modules
var load_model_data = __webpack_require__(5240);
// EXTERNAL MODULE: ./src/data/table.ts + 1 modules
var data_table = __webpack_require__(8785);
// EXTERNAL MODULE: ./src/data/text-columns.ts + 1 modules
var text_columns = __webpack_require__(3167);
;// CONCATENATED MODULE: ./src/data/load-predictions.ts





/** Stable codes of the errors this module throws. */
const PREDICTIONS_ERROR = Object.freeze({
    /** The prediction column is the target or an input. */
    column: 'predictions-column',
    /** Data and side file do not hold the same rows (count, or keys missing on either side). */
    rows: 'predictions-rows',
    /** A key cell is empty or a key repeats. */
    key: 'predictions-key',
    /** A prediction is not finite, or a classifier's probability is outside [0, 1]. */
    value: 'predictions-value',
});
/**
 * Loads a model trained elsewhere: inputs (`predictions.inputs`, for leakage), target and
 * predictions of both files. Classifiers' targets become 0/1 as for models of terms (labels.ts),
 * and their predictions must be probabilities in [0, 1].
 * @throws InputError every data-file error of {@link loadModelData}, plus `predictions-column`,
 *   `predictions-rows` (naming both files and the first bad line), `predictions-key`,
 *   `predictions-value`
 */
async function loadPredictionsData(repo, descriptor, settings) {
    const spec = descriptor.predictions;
    if (!spec)
        throw new TypeError('loadPredictionsData needs a descriptor with `predictions`');
    for (const which of ['train', 'holdout']) {
        const source = spec[which];
        if (source.file !== null)
            continue;
        const clash = source.column === descriptor.data.target ? 'the target column' : spec.inputs.includes(source.column) ? 'an input' : null;
        if (clash !== null) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.column, `\`predictions.${which}.column\` names ${clash} (\`${(0,errors/* clip */.$Q)(source.column)}\`); expected the column that holds the model's predictions`, { file: descriptor.file, line: source.line, key: `predictions.${which}.column` });
        }
    }
    const classifier = descriptor.task === 'classification';
    let tables;
    let labels = null;
    try {
        if (classifier) {
            const t = await (0,data_labels/* loadClassifierData */.W)(repo, descriptor, spec.inputs, settings);
            labels = t.labels;
            tables = t;
        }
        else {
            tables = await (0,load_model_data/* loadModelData */.u)(repo, descriptor, spec.inputs, settings);
        }
    }
    catch (error) {
        throw namedInput(error, descriptor);
    }
    const out = {};
    for (const which of ['train', 'holdout']) {
        const data = tables[which];
        const read = await readPredictions(repo, descriptor, settings, data, spec[which], which);
        checkValues(read, spec[which], which, classifier);
        out[which] = { ...data, predictions: read.values, predictionFile: read.file, predictionLines: read.lines };
    }
    return { train: out.train, holdout: out.holdout, labels };
}
async function readPredictions(repo, descriptor, settings, data, source, which) {
    const maxBytes = settings.caps.maxFileBytes;
    const format = descriptor.data.format;
    if (source.file === null)
        return columnOfDataFile(repo, descriptor, data, source, which, maxBytes);
    // A side file: its own rows, every cell of the column present.
    const side = await (0,data_table/* readTable */.xz)(repo, source.file, {
        columns: [source.column],
        maxBytes,
        ...(format ? { format: { ...format, missing: 'error' } } : {}),
    });
    const values = side.columns.get(source.column);
    if (source.key === null)
        return inFileOrder(descriptor, data, source.file, side.lines, values, side.rows, which);
    return byKey(repo, data, source, side.lines, values, side.rows, maxBytes);
}
/** The prediction column of the data file itself, row for row (the same split side; missing cells refused). */
async function columnOfDataFile(repo, descriptor, data, source, which, maxBytes) {
    const split = descriptor.data.split ?? null;
    const side = split === null
        ? undefined
        : which === 'train'
            ? { column: split.column, keep: split.train, other: split.holdout }
            : { column: split.column, keep: split.holdout, other: split.train };
    const format = descriptor.data.format;
    let table;
    try {
        table = await (0,data_table/* readTable */.xz)(repo, data.file, {
            columns: [source.column],
            maxBytes,
            ...(format ? { format } : {}),
            ...(side ? { split: side } : {}),
        });
    }
    catch (error) {
        if (error instanceof errors/* InputError */.dz && error.code === 'csv-missing-column' && error.location.key === source.column)
            throw new errors/* InputError */.dz(error.code, `${error.message} (asked for by \`predictions.${which}.column\` on line ${source.line} of ${(0,errors/* clip */.$Q)(descriptor.file)})`, error.location);
        throw error;
    }
    const all = table.columns.get(source.column);
    // With `data.missing: drop` either read may have dropped rows: pair them by line.
    const values = new Float64Array(data.rows);
    let j = 0;
    for (let i = 0; i < data.rows; i++) {
        const line = data.lines[i];
        while (j < table.rows && table.lines[j] < line)
            j++;
        if (j >= table.rows || table.lines[j] !== line) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `line ${line} of ${(0,errors/* clip */.$Q)(data.file)} has no prediction in column \`${(0,errors/* clip */.$Q)(source.column)}\` (\`predictions.${which}.column\`); expected a prediction for every data row`, { file: data.file, line, key: source.column });
        }
        values[i] = all[j];
    }
    return { values, file: data.file, lines: data.lines };
}
/** A side file without a key: its rows go with the data rows in file order, one for one. */
function inFileOrder(descriptor, data, sideFile, sideLines, values, sideRows, which) {
    if ((data.dropped ?? 0) > 0) {
        throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `${data.dropped} rows of ${(0,errors/* clip */.$Q)(data.file)} were dropped for missing cells, so the rows of ${(0,errors/* clip */.$Q)(sideFile)} cannot be paired with them in file order; expected \`predictions.${which}.key\` (a key column both files hold)`, { file: descriptor.file, line: descriptor.predictions?.[which].line, key: `predictions.${which}` });
    }
    if (sideRows !== data.rows) {
        const short = sideRows < data.rows;
        const message = short
            ? `${(0,errors/* clip */.$Q)(sideFile)} has ${sideRows} prediction rows but ${(0,errors/* clip */.$Q)(data.file)} has ${data.rows} data rows: line ${data.lines[sideRows]} of ${(0,errors/* clip */.$Q)(data.file)} (data row ${sideRows + 1}) has no prediction row`
            : `${(0,errors/* clip */.$Q)(sideFile)} has ${sideRows} prediction rows but ${(0,errors/* clip */.$Q)(data.file)} has ${data.rows} data rows: line ${sideLines[data.rows]} of ${(0,errors/* clip */.$Q)(sideFile)} (prediction row ${data.rows + 1}) has no data row`;
        throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `${message}; expected one prediction row per data row, in the same order (or \`predictions.${which}.key\` to match rows by a key column)`, short ? { file: data.file, line: data.lines[sideRows] } : { file: sideFile, line: sideLines[data.rows] });
    }
    return { values: values.slice(0, sideRows), file: sideFile, lines: sideLines.slice(0, sideRows) };
}
/**
 * A side file with a key column: each data row takes the side row of the same key. Keys are text
 * as written (trimmed; `07` and `7` differ) and unique in each file. A side key held by no row of
 * the data file is an error; one held by a row of the other split side or a dropped row is not.
 */
async function byKey(repo, data, source, sideLines, values, sideRows, maxBytes) {
    const keyColumn = source.key;
    const dataKeys = await (0,text_columns.readTextColumns)(repo, data.file, [keyColumn], maxBytes);
    const sideKeys = await (0,text_columns.readTextColumns)(repo, source.file, [keyColumn], maxBytes);
    // Every key of the data file (all its rows) by line, for the rows used and for the others.
    const allDataKeys = new Set();
    const dataKeyOf = keysByLine(dataKeys, keyColumn, data.file);
    for (const k of dataKeyOf.values())
        allDataKeys.add(k);
    // Side rows by key (unique), paired with their numeric row by line.
    const sideKeyOf = keysByLine(sideKeys, keyColumn, source.file);
    const sideIndex = new Map();
    for (let j = 0; j < sideRows; j++) {
        const k = sideKeyOf.get(sideLines[j]);
        if (k === undefined) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `line ${sideLines[j]} of ${(0,errors/* clip */.$Q)(source.file)} has a prediction but no key`, {
                file: source.file,
                line: sideLines[j],
                key: keyColumn,
            });
        }
        const first = sideIndex.get(k);
        if (first !== undefined)
            throw duplicateKey(source.file, keyColumn, k, sideLines[first], sideLines[j]);
        sideIndex.set(k, j);
    }
    const out = new Float64Array(data.rows);
    const lines = new Int32Array(data.rows);
    const used = new Map();
    for (let i = 0; i < data.rows; i++) {
        const k = dataKeyOf.get(data.lines[i]);
        if (k === undefined) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.key, `line ${data.lines[i]} of ${(0,errors/* clip */.$Q)(data.file)} has no key in column \`${(0,errors/* clip */.$Q)(keyColumn)}\` as its text is read; expected one record per line (no line breaks inside quoted cells)`, { file: data.file, line: data.lines[i], key: keyColumn });
        }
        const seen = used.get(k);
        if (seen !== undefined)
            throw duplicateKey(data.file, keyColumn, k, data.lines[seen], data.lines[i]);
        used.set(k, i);
        const j = sideIndex.get(k);
        if (j === undefined) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `line ${data.lines[i]} of ${(0,errors/* clip */.$Q)(data.file)} has key ${(0,errors/* quoteValue */.cl)(k, 40)} (column \`${(0,errors/* clip */.$Q)(keyColumn)}\`), which no row of ${(0,errors/* clip */.$Q)(source.file)} holds; expected a prediction row for every data row (${data.rows} data rows, ${sideRows} prediction rows)`, { file: data.file, line: data.lines[i], key: keyColumn });
        }
        out[i] = values[j];
        lines[i] = sideLines[j];
    }
    for (let j = 0; j < sideRows; j++) {
        const k = sideKeyOf.get(sideLines[j]);
        if (!allDataKeys.has(k)) {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.rows, `line ${sideLines[j]} of ${(0,errors/* clip */.$Q)(source.file)} has key ${(0,errors/* quoteValue */.cl)(k, 40)} (column \`${(0,errors/* clip */.$Q)(keyColumn)}\`), which no row of ${(0,errors/* clip */.$Q)(data.file)} holds; expected predictions of the data file's rows only (${data.rows} data rows, ${sideRows} prediction rows)`, { file: source.file, line: sideLines[j], key: keyColumn });
        }
    }
    return { values: out, file: source.file, lines };
}
/** Key of each row by its line; an empty key cell is an error naming the file and line. */
function keysByLine(text, column, file) {
    const keys = text.columns.get(column);
    const out = new Map();
    for (let r = 0; r < keys.length; r++) {
        if (keys[r] === '') {
            throw new errors/* InputError */.dz(PREDICTIONS_ERROR.key, `line ${text.lines[r]} of ${(0,errors/* clip */.$Q)(file)} has an empty key in column \`${(0,errors/* clip */.$Q)(column)}\`; expected a key in every row`, {
                file,
                line: text.lines[r],
                key: column,
            });
        }
        out.set(text.lines[r], keys[r]);
    }
    return out;
}
function duplicateKey(file, column, key, firstLine, line) {
    return new errors/* InputError */.dz(PREDICTIONS_ERROR.key, `line ${line} of ${(0,errors/* clip */.$Q)(file)} repeats key ${(0,errors/* quoteValue */.cl)(key, 40)} of line ${firstLine} (column \`${(0,errors/* clip */.$Q)(column)}\`); expected each key once`, { file, line, key: column });
}
/** Predictions are finite; a classifier's are probabilities in [0, 1]. */
function checkValues(read, source, which, classifier) {
    for (let i = 0; i < read.values.length; i++) {
        const v = read.values[i];
        const bad = classifier ? !(v >= 0 && v <= 1) : !Number.isFinite(v);
        if (!bad)
            continue;
        throw new errors/* InputError */.dz(PREDICTIONS_ERROR.value, classifier
            ? `the prediction ${v} on line ${read.lines[i]} of ${(0,errors/* clip */.$Q)(read.file)} (column \`${(0,errors/* clip */.$Q)(source.column)}\`, \`predictions.${which}\`) is not a probability; a classifier's predictions (\`task: classification\`) are probabilities of the positive class in [0, 1]`
            : `the prediction ${v} on line ${read.lines[i]} of ${(0,errors/* clip */.$Q)(read.file)} (column \`${(0,errors/* clip */.$Q)(source.column)}\`, \`predictions.${which}\`) is not a finite number`, { file: read.file, line: read.lines[i], key: source.column });
    }
}
/** A missing input column names `predictions.inputs` as the asker. */
function namedInput(error, descriptor) {
    if (!(error instanceof errors/* InputError */.dz) || error.code !== 'csv-missing-column' || error.location.key === undefined)
        return error;
    if (!descriptor.predictions?.inputs.includes(error.location.key))
        return error;
    return new errors/* InputError */.dz(error.code, `${error.message} (asked for by \`predictions.inputs\` on line ${descriptor.predictions.line} of ${(0,errors/* clip */.$Q)(descriptor.file)})`, error.location);
}

// EXTERNAL MODULE: ./src/diagnostics/classification-metrics.ts
var classification_metrics = __webpack_require__(2266);
// EXTERNAL MODULE: ./src/diagnostics/leakage.ts
var diagnostics_leakage = __webpack_require__(2918);
;// CONCATENATED MODULE: ./src/diagnostics/observed-spread.ts
/**
 * The swing figure of a model known only by its predictions: how far its predictions of the
 * observed rows (training and hold-out) leave the band of training targets. Without the model
 * itself nothing can be predicted between or beyond the rows, so this is the part of the swing
 * scan (diagnostics/swing.ts) that predictions allow.
 */
/**
 * The spread of the predictions of the observed rows against the training target band (the same
 * figure as the `swing` check's, on these rows only).
 * @param y training targets (the first `trainRows` entries are read)
 * @param files the training and hold-out rows with their predictions
 */
function observedSpread(y, trainRows, files) {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < trainRows; i++) {
        if (y[i] < lo)
            lo = y[i];
        if (y[i] > hi)
            hi = y[i];
    }
    let pLo = Infinity;
    let pHi = -Infinity;
    let worstOut = 0;
    let worst = null;
    let rows = 0;
    for (const f of files) {
        for (let i = 0; i < f.rows; i++) {
            const p = f.predictions[i];
            if (p < pLo)
                pLo = p;
            if (p > pHi)
                pHi = p;
            const out = Math.max(p - hi, lo - p);
            if (out > worstOut) {
                worstOut = out;
                worst = { file: f.file, line: f.lines[i], prediction: p };
            }
        }
        rows += f.rows;
    }
    const width = hi - lo;
    return { band: [lo, hi], predicted: [pLo, pHi], value: width > 0 ? worstOut / width : Number.NaN, rows, worst };
}

// EXTERNAL MODULE: ./src/diagnostics/regression-metrics.ts
var regression_metrics = __webpack_require__(155);
// EXTERNAL MODULE: ./src/result/result.ts
var result = __webpack_require__(1628);
// EXTERNAL MODULE: ./src/run/base-comparison.ts
var base_comparison = __webpack_require__(5148);
// EXTERNAL MODULE: ./src/run/run-checks.ts
var run_checks = __webpack_require__(6580);
// EXTERNAL MODULE: ./src/run/evaluate-classifier.ts + 6 modules
var evaluate_classifier = __webpack_require__(8134);
;// CONCATENATED MODULE: ./src/run/evaluate-predictions.ts
/**
 * One model trained elsewhere (`predictions`) from descriptor to outcome: its rows and
 * predictions (data/load-predictions.ts), the figures that need only predictions, every check of
 * the registry through its `measurePredictions` (the others skipped with `<id>/needs-refit`),
 * and its part of the Result (`kind: 'predictions'`). Nothing is fitted.
 */











/**
 * Probabilities are kept inside [EPS, 1 - EPS] where a logit is taken (log-loss, calibration), so
 * that a stated 0 or 1 gives a large finite loss instead of an infinite one (common practice;
 * 1e-15 as many metric libraries use, from memory). Brier score, accuracy and AUC use the
 * probabilities as given.
 */
const PROBABILITY_EPS = 1e-15;
/** logit(clamp(p, EPS, 1 - EPS)) of each entry. */
function clampedLogits(p, n) {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) {
        const q = Math.min(1 - PROBABILITY_EPS, Math.max(PROBABILITY_EPS, p[i]));
        out[i] = Math.log(q / (1 - q));
    }
    return out;
}
function errorsOf(rows) {
    const sums = (0,regression_metrics/* emptySums */.y3)();
    (0,regression_metrics/* addErrors */.xB)(sums, rows.y, rows.predictions, rows.rows);
    const m = (0,regression_metrics/* errorMeasures */._I)(sums);
    return { rmse: m.rmse, mae: m.mae, r2: m.r2 };
}
/**
 * Scores one model trained elsewhere and runs every check on it. Errors are handled by the caller
 * (evaluate.ts), as for models of terms.
 * @param base outcomes on the base commit to compare with; default none
 */
async function evaluatePredictions(repo, descriptor, settings, base) {
    const spec = descriptor.predictions;
    if (!spec)
        throw new TypeError('evaluatePredictions needs a descriptor with `predictions`');
    const tables = await loadPredictionsData(repo, descriptor, settings);
    (0,deadline/* checkDeadline */.Ft)('predictions');
    const { train, holdout } = tables;
    const parameters = descriptor.parameters ?? null;
    const isClassifier = descriptor.task === 'classification';
    // The figures of the predictions: errors (regression) or the probabilities' figures (classifiers).
    let classifier = null;
    let regression = null;
    let charts = {};
    if (isClassifier) {
        const threshold = descriptor.fit.threshold ?? 0.5;
        const trainEta = clampedLogits(train.predictions, train.rows);
        const holdoutEta = clampedLogits(holdout.predictions, holdout.rows);
        classifier = {
            train: (0,classification_metrics/* classificationFigures */["if"])(train.y, trainEta, train.predictions, train.rows, threshold),
            holdout: (0,classification_metrics/* classificationFigures */["if"])(holdout.y, holdoutEta, holdout.predictions, holdout.rows, threshold),
            calibration: (0,classification_metrics/* calibration */.xD)(holdout.y, holdoutEta, holdout.rows),
        };
        charts = {
            roc: { train: (0,classification_metrics/* rocPoints */.MP)(train.y, train.predictions, train.rows), holdout: (0,classification_metrics/* rocPoints */.MP)(holdout.y, holdout.predictions, holdout.rows) },
            calibration_bins: (0,classification_metrics/* calibrationBins */.N0)(holdout.y, holdout.predictions, holdout.rows).map((b) => ({
                from: b.from,
                to: b.to,
                count: b.count,
                predicted: (0,result/* jsonNumber */.qj)(b.predicted),
                observed: (0,result/* jsonNumber */.qj)(b.observed),
            })),
        };
    }
    else {
        regression = { train: errorsOf(train), holdout: errorsOf(holdout) };
    }
    (0,deadline/* checkDeadline */.Ft)('predictions');
    const leakage = spec.inputs.length > 0 ? (0,diagnostics_leakage/* findLeakage */.Gw)(train, holdout) : null;
    const spread = observedSpread(train.y, train.rows, [
        { file: train.predictionFile, lines: train.predictionLines, predictions: train.predictions, rows: train.rows },
        { file: holdout.predictionFile, lines: holdout.predictionLines, predictions: holdout.predictions, rows: holdout.rows },
    ]);
    const baseMatch = base?.matches.get(descriptor.file) ?? null;
    const context = {
        descriptor,
        parameters,
        inputs: spec.inputs,
        rows: { train: train.rows, holdout: holdout.rows },
        files: { train: train.file, holdout: holdout.file },
        regression,
        classifier,
        leakage,
        spread,
        baseline: baseMatch?.model ?? null,
    };
    const metrics = classifier !== null
        ? classifierMetrics(classifier, parameters, train.rows, descriptor, tables.labels)
        : regressionMetrics(regression, parameters, train.rows);
    const { checks, verdict } = (0,run_checks/* runChecks */.J)((0,src_checks/* checksFor */.NR)(descriptor.task), (check) => (0,src_checks/* runPredictionsCheck */.KK)(check, context), metrics);
    const source = (which) => {
        const s = spec[which];
        return { column: s.column, file: s.file, key: s.key };
    };
    return {
        name: descriptor.name,
        descriptor: descriptor.file,
        kind: 'predictions',
        verdict,
        rows: { train: train.rows, holdout: holdout.rows },
        ...(train.dropped !== undefined ? { dropped: { train: train.dropped, holdout: holdout.dropped ?? 0 } } : {}),
        parameters: parameters ?? 0,
        columns: [],
        metrics,
        coefficients: [],
        shipped: null,
        checks,
        ...(base && !isClassifier ? { base: (0,base_comparison/* compareWithBase */.te)(metrics, baseMatch, base.commit) } : {}),
        error: null,
        extra: {
            kind: 'predictions',
            ...(isClassifier ? { task: 'classification', labels: tables.labels } : {}),
            predictions: { train: source('train'), holdout: source('holdout'), inputs: [...spec.inputs] },
            parameters_stated: parameters !== null,
            observed_spread: {
                band: spread.band.map(result/* jsonNumber */.qj),
                predicted: spread.predicted.map(result/* jsonNumber */.qj),
                rows: spread.rows,
                worst: spread.worst === null ? null : { ...spread.worst, prediction: (0,result/* jsonNumber */.qj)(spread.worst.prediction) },
            },
            ...charts,
        },
    };
}
/**
 * The report's metrics of a regression model trained elsewhere: the error figures of its
 * predictions. The keys of coefficients and of the design (`max_std_coefficient`, `rank`...) are
 * left out: there are none; so is `params_per_sample` without a stated `parameters`.
 */
function regressionMetrics(r, parameters, rows) {
    const n = (x) => (0,result/* jsonNumber */.qj)(x);
    return {
        train_rmse: n(r.train.rmse),
        holdout_rmse: n(r.holdout.rmse),
        train_mae: n(r.train.mae),
        holdout_mae: n(r.holdout.mae),
        train_r2: n(r.train.r2),
        holdout_r2: n(r.holdout.r2),
        gap_ratio: n((0,regression_metrics/* gapRatio */.yr)(r.train.rmse, r.holdout.rmse)),
        ...(parameters === null ? {} : { params_per_sample: n(parameters / rows) }),
    };
}
/**
 * The report's metrics of a classifier trained elsewhere: the keys of evaluate-classifier.ts that
 * predictions give (log-loss, Brier, accuracy, AUC, class counts); the regression, coefficient and
 * design keys are left out.
 */
function classifierMetrics(c, parameters, rows, descriptor, labels) {
    const n = (x) => (0,result/* jsonNumber */.qj)(x);
    const train = c.train;
    const holdout = c.holdout;
    return {
        task: 'classification',
        gap_ratio: n((0,regression_metrics/* gapRatio */.yr)(train.logLoss, holdout.logLoss)),
        ...(parameters === null ? {} : { params_per_sample: n(parameters / rows) }),
        ...(0,evaluate_classifier/* classificationFigureMetrics */.k)(train, holdout, descriptor.fit.threshold ?? 0.5),
        positive_label: labels?.positive ?? null,
        negative_label: labels?.negative ?? null,
    };
}


/***/ })

};
