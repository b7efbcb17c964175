export const id = 898;
export const ids = [898];
export const modules = {

/***/ 4898:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  generalChunks: () => (/* binding */ generalChunks)
});

// EXTERNAL MODULE: external "stream"
var external_stream_ = __webpack_require__(2203);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/utils/is_object.js
var is_object = __webpack_require__(8467);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/api/index.js + 3 modules
var api = __webpack_require__(7084);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/api/CsvError.js
var CsvError = __webpack_require__(6892);
// EXTERNAL MODULE: ./node_modules/csv-parse/lib/api/normalize_options.js + 1 modules
var normalize_options = __webpack_require__(6845);
;// CONCATENATED MODULE: ./node_modules/csv-parse/lib/index.js
/*
CSV Parse

Please look at the [project documentation](https://csv.js.org/parse/) for
additional information.
*/







class Parser extends external_stream_.Transform {
  constructor(opts = {}) {
    super({ ...{ readableObjectMode: true }, ...opts, encoding: null });
    this.api = (0,api/* transform */.p)({
      on_skip: (err, chunk) => {
        this.emit("skip", err, chunk);
      },
      ...opts,
    });
    // Backward compatibility
    this.state = this.api.state;
    this.options = this.api.options;
    this.info = this.api.info;
  }
  // Implementation of `Transform._transform`
  _transform(buf, _, callback) {
    if (this.state.stop === true) {
      return;
    }
    const err = this.api.parse(
      buf,
      false,
      (record) => {
        this.push(record);
      },
      () => {
        this.push(null);
        this.end();
        // Fix #333 and break #410
        //   ko: api.stream.iterator.coffee
        //   ko with v21.4.0, ok with node v20.5.1: api.stream.finished # aborted (with generate())
        //   ko: api.stream.finished # aborted (with Readable)
        // this.destroy()
        // Fix #410 and partially break #333
        //   ok: api.stream.iterator.coffee
        //   ok: api.stream.finished # aborted (with generate())
        //   broken: api.stream.finished # aborted (with Readable)
        this.on("end", this.destroy);
      },
    );
    if (err !== undefined) {
      this.state.stop = true;
    }
    callback(err);
  }
  // Implementation of `Transform._flush`
  _flush(callback) {
    if (this.state.stop === true) {
      return;
    }
    const err = this.api.parse(
      undefined,
      true,
      (record) => {
        this.push(record);
      },
      () => {
        this.push(null);
        this.on("end", this.destroy);
      },
    );
    callback(err);
  }
}

const parse = function () {
  let data, options, callback;
  for (const i in arguments) {
    const argument = arguments[i];
    const type = typeof argument;
    if (
      data === undefined &&
      (typeof argument === "string" || Buffer.isBuffer(argument))
    ) {
      data = argument;
    } else if (options === undefined && (0,is_object/* is_object */.v)(argument)) {
      options = argument;
    } else if (callback === undefined && type === "function") {
      callback = argument;
    } else {
      throw new CsvError/* CsvError */.J(
        "CSV_INVALID_ARGUMENT",
        ["Invalid argument:", `got ${JSON.stringify(argument)} at index ${i}`],
        options || {},
      );
    }
  }
  const parser = new Parser(options);
  if (callback) {
    const records =
      options === undefined || options.objname === undefined
        ? []
        : Object.create(null);
    parser.on("readable", function () {
      let record;
      while ((record = this.read()) !== null) {
        if (options === undefined || options.objname === undefined) {
          records.push(record);
        } else {
          Object.assign(records, {
            [record[0]]: record[1],
            // writable: true,
            // enumerable: true,
            // configurable: true
          });
        }
      }
    });
    parser.on("error", function (err) {
      callback(err, undefined, parser.api.__infoDataSet());
    });
    parser.on("end", function () {
      callback(undefined, records, parser.api.__infoDataSet());
    });
  }
  if (data !== undefined) {
    const writer = function () {
      parser.write(data);
      parser.end();
    };
    // Support Deno, Rollup doesn't provide a shim for setImmediate
    if (typeof setImmediate === "function") {
      setImmediate(writer);
    } else {
      setTimeout(writer, 0);
    }
  }
  return parser;
};



// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/data/line-blocks.ts + 1 modules
var line_blocks = __webpack_require__(4113);
// EXTERNAL MODULE: ./src/data/csv-rules.ts
var csv_rules = __webpack_require__(8706);
// EXTERNAL MODULE: ./src/data/csv-format.ts
var csv_format = __webpack_require__(3838);
;// CONCATENATED MODULE: ./src/data/general-path.ts
/**
 * The general CSV path: csv-parse (streaming API) with quoted fields, CRLF, blank lines and
 * white space around fields. Every record goes through csv-parse's `on_record` hook as soon
 * as it is parsed, so rows are checked and converted in file order and errors come out in
 * file order whatever the piece sizes.
 */





/** Stops csv-parse from inside `on_record` once the header is known (header-only reads). */
class StopReading extends Error {
}
/**
 * Reads a CSV file with csv-parse and yields numeric chunks.
 *
 * Settings: comma delimiter, `"` quote (and `""` inside quotes), `\n` or `\r\n` line ends,
 * white space around fields trimmed (`trim: true`, the set of `String.prototype.trim`),
 * lines holding only white space skipped, field counts checked here (`csv-ragged`).
 * The physical line of a record is worked out from csv-parse's counts: 1 + skipped blank
 * lines + earlier records + line breaks inside earlier quoted fields.
 *
 * @param pieces the file's bytes in pieces of any size
 * @param target what to read
 * @param skipRows data rows already handed out by the fast path: parsed and checked but not converted
 */
async function* generalChunks(pieces, target, skipRows = 0) {
    const { file, request } = target;
    const builder = new csv_rules/* ChunkBuilder */.vB(request, target.chunkRows);
    let plan = null;
    let breaksInFields = 0;
    let dataRows = 0;
    const format = target.format;
    const plain = format === undefined || (format.decimal === '.' && format.missing === 'error');
    const split = target.split;
    let splitField = -1;
    const onRecord = (record, info) => {
        const line = 1 + info.empty_lines + (info.records - 1) + breaksInFields;
        for (const field of record) {
            for (let i = field.indexOf('\n'); i !== -1; i = field.indexOf('\n', i + 1))
                breaksInFields++;
        }
        if (plan === null) {
            plan = (0,csv_rules/* planColumns */.j7)(file, record, line, request);
            if (split !== undefined)
                splitField = (0,csv_format/* splitFieldOf */.ID)(file, record, line, split);
            target.onHeader(plan);
            if (target.headerOnly)
                throw new StopReading();
            return null;
        }
        if (record.length !== plan.header.length)
            throw (0,csv_rules/* raggedError */.L6)(file, line, plan.header.length, record.length);
        if (splitField !== -1 && split !== undefined) {
            const label = record[splitField];
            if (label !== split.keep) {
                if (label === split.other)
                    return null;
                throw (0,csv_format/* splitLabelError */.rS)(label, file, line, split);
            }
        }
        if (dataRows++ < skipRows)
            return null;
        const { fieldOfSlot } = plan;
        const row = builder.row;
        if (plain) {
            for (let slot = 0; slot < fieldOfSlot.length; slot++) {
                builder.slots[slot][row] = (0,csv_rules/* cellNumber */.W4)(record[fieldOfSlot[slot]], file, line, request.distinct[slot]);
            }
        }
        else {
            let missing = false;
            for (let slot = 0; slot < fieldOfSlot.length; slot++) {
                const value = (0,csv_format/* formatCellNumber */.v0)(record[fieldOfSlot[slot]], file, line, request.distinct[slot], format);
                if (Number.isNaN(value))
                    missing = true;
                builder.slots[slot][row] = value;
            }
            if (missing) {
                if (target.counts !== undefined)
                    target.counts.dropped++;
                return null;
            }
        }
        builder.lines[row] = line;
        builder.endRow();
        return null;
    };
    const parser = parse({
        bom: false, // line-blocks drops it
        delimiter: format?.separator === undefined || format.separator === 'auto' ? ',' : format.separator,
        quote: '"',
        escape: '"',
        record_delimiter: ['\r\n', '\n'],
        trim: true,
        skip_empty_lines: true,
        relax_column_count: true,
        on_record: onRecord,
    });
    // Errors are read from `parser.errored` after each write; this keeps Node from also
    // reporting them as unhandled.
    parser.on('error', () => undefined);
    /** 1-based line where the next record starts (or the open one started). */
    const nextLine = () => 1 + parser.info.empty_lines + parser.info.records + breaksInFields;
    /**
     * True when reading should stop quietly; throws the row or syntax error otherwise. After
     * bad bytes (`bad`), a syntax error only means the text was cut short: the bad bytes win.
     */
    const settle = (bad) => {
        const failure = parser.errored;
        if (failure === null)
            return false;
        if (failure instanceof StopReading)
            return true;
        if (failure instanceof errors/* InputError */.dz)
            throw failure;
        if (bad !== null)
            throw (0,line_blocks/* encodingError */.Sj)(file, 1 + lineFeeds, bad.signature);
        throw syntaxError(failure, file, nextLine());
    };
    // Line feeds written so far: the line of bad bytes is the one after them.
    let lineFeeds = 0;
    const blocks = (0,line_blocks/* lineBlocks */.Dr)(pieces)[Symbol.asyncIterator]();
    try {
        let bad = null;
        for (;;) {
            const next = await blocks.next();
            if (next.done === true)
                break;
            if (next.value.headerTooLong === true)
                throw (0,line_blocks/* blockError */.Si)(file, 1 + lineFeeds, next.value);
            if (next.value.badUtf8) {
                // The lines before the bad bytes are written; finish them first so that an
                // earlier row error wins, as it does on the fast path.
                bad = next.value;
                break;
            }
            const { bytes } = next.value;
            lineFeeds += countLineFeeds(bytes);
            parser.write(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
            if (settle(null))
                return;
            for (const chunk of builder.take()) {
                yield chunk;
                if (target.recycle === true)
                    builder.recycle(chunk);
            }
        }
        await endParser(parser);
        if (settle(bad))
            return;
        if (bad !== null)
            throw (0,line_blocks/* encodingError */.Sj)(file, 1 + lineFeeds, bad.signature);
        if (plan === null)
            throw (0,csv_rules/* emptyError */.CA)(file);
        builder.finish();
        for (const chunk of builder.take()) {
            yield chunk;
            if (target.recycle === true)
                builder.recycle(chunk);
        }
    }
    finally {
        parser.destroy();
        await blocks.return?.(undefined);
    }
}
/** Counts `\n` bytes. */
function countLineFeeds(bytes) {
    let n = 0;
    for (let i = bytes.indexOf(10); i !== -1; i = bytes.indexOf(10, i + 1))
        n++;
    return n;
}
/** Ends the parser's input and waits until it has handled the last record (or failed). */
function endParser(parser) {
    return new Promise((resolve) => {
        if (parser.errored !== null) {
            resolve();
            return;
        }
        const done = () => resolve();
        parser.once('finish', done);
        parser.once('error', done);
        parser.once('close', done);
        parser.end();
    });
}
/** Turns a csv-parse error into InputError `csv-syntax` at the line where the record began. */
function syntaxError(failure, file, line) {
    const code = failure.code;
    let what;
    switch (code) {
        case 'CSV_QUOTE_NOT_CLOSED':
            what = `a quoted field in the record starting on line ${line} is never closed; expected a closing quote (")`;
            break;
        case 'CSV_INVALID_CLOSING_QUOTE':
        case 'CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE':
            what = `in the record starting on line ${line}, a closing quote is followed by text; expected a comma or the end of the line after it (write "" for a quote inside a quoted field)`;
            break;
        case 'INVALID_OPENING_QUOTE':
            what = `in the record starting on line ${line}, a quote appears inside an unquoted field; expected quotes only around a whole field (write "" for a quote inside a quoted field)`;
            break;
        default:
            what = `the record starting on line ${line} is not valid CSV: ${failure.message}`;
    }
    return new errors/* InputError */.dz('csv-syntax', what, { file, line });
}


/***/ })

};
