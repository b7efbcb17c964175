export const id = 167;
export const ids = [167];
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


/***/ })

};
