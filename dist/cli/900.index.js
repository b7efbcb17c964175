export const id = 900;
export const ids = [900];
export const modules = {

/***/ 5900:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

// ESM COMPAT FLAG
__webpack_require__.r(__webpack_exports__);

// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  DEFAULT_MAX_BYTES: () => (/* binding */ DEFAULT_MAX_BYTES),
  formatMarkdown: () => (/* binding */ formatMarkdown),
  modelDetail: () => (/* binding */ modelDetail),
  overviewRow: () => (/* binding */ overviewRow),
  verdictLine: () => (/* binding */ verdictLine)
});

// EXTERNAL MODULE: ./src/report/classifier-figures.ts
var classifier_figures = __webpack_require__(2953);
// EXTERNAL MODULE: ./src/report/model-kind.ts
var model_kind = __webpack_require__(698);
// EXTERNAL MODULE: ./src/report/refit-compare.ts
var refit_compare = __webpack_require__(3524);
// EXTERNAL MODULE: ./src/core/format.ts
var format = __webpack_require__(6228);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(4031);
// EXTERNAL MODULE: ./src/report/svg/units.ts
var units = __webpack_require__(3332);
;// CONCATENATED MODULE: ./src/report/mermaid.ts
/**
 * A small Mermaid `xychart-beta` chart per model for the Markdown summary and pull-request
 * comment, where GitHub renders Mermaid but strips inline SVG and data-URI images. The chart is
 * drawn from the pipeline's chart data; xychart-beta has lines and bars only (no scatter), so:
 * a model of one input shows its fitted curve with the observed target band as two flat lines;
 * otherwise the cross-validated error over the complexity sweep when there is one; otherwise
 * the standardised coefficient sizes as bars with the fail limit as a line.
 */



/** A number for a Mermaid series: 4 significant digits, plain decimal notation. */
function value(v) {
    const r = Number(v.toPrecision(4));
    return Object.is(r, -0)
        ? '0'
        : String(r).includes('e')
            ? r.toFixed(Math.min(100, Math.max(0, 3 - Math.floor(Math.log10(Math.abs(r))))))
            : String(r);
}
/** Indices of at most `max` evenly spaced entries of a list of `n`, first and last kept. */
function evenly(n, max) {
    if (n <= max)
        return Array.from({ length: n }, (_, i) => i);
    return Array.from({ length: max }, (_, t) => Math.round((t * (n - 1)) / (max - 1)));
}
function fence(lines) {
    return ['```mermaid', 'xychart-beta', ...lines.map((l) => `  ${l}`), '```', ''].join('\n');
}
function curveChart(name, chart, max) {
    const fit = chart.fit;
    if (!fit || fit.x.length < 2)
        return null;
    const [lo, hi] = fit.band;
    const span = hi - lo;
    // Values far outside the band would flatten the picture: clip them to one band width past it, and say so.
    const top = hi + span;
    const bottom = lo - span;
    const picks = evenly(fit.x.length, max);
    let clipped = false;
    const ys = [];
    for (const i of picks) {
        let y = fit.y[i];
        if (y === null) {
            y = top;
            clipped = true;
        }
        else if (y > top || y < bottom) {
            y = Math.min(top, Math.max(bottom, y));
            clipped = true;
        }
        ys.push(value(y));
    }
    const title = `${name}: fitted ${chart.target}, band ${(0,format/* formatNumber */.Z)(lo)} to ${(0,format/* formatNumber */.Z)(hi)}${clipped ? ' (clipped)' : ''}`;
    return fence([
        `title "${(0,report_escape/* escapeMermaid */.Fw)(title)}"`,
        `x-axis "${(0,report_escape/* escapeMermaid */.Fw)((0,units/* axisLabel */.M)(fit.input))}" ${value(fit.x[0])} --> ${value(fit.x[fit.x.length - 1])}`,
        `y-axis "${(0,report_escape/* escapeMermaid */.Fw)((0,units/* axisLabel */.M)(chart.target))}" ${value(bottom)} --> ${value(top)}`,
        `line [${ys.join(', ')}]`,
        `line [${picks.map(() => value(hi)).join(', ')}]`,
        `line [${picks.map(() => value(lo)).join(', ')}]`,
    ]);
}
function sweepChart(name, chart, max) {
    const sweep = chart.sweep;
    if (!sweep)
        return null;
    const picks = evenly(sweep.settings.length, max).filter((i) => sweep.cv[i] !== null);
    if (picks.length < 2)
        return null;
    const cv = picks.map((i) => sweep.cv[i]);
    const title = `${name}: cross-validated RMSE over ${sweep.parameter}${sweep.chosen !== null ? `, chosen ${(0,format/* formatNumber */.Z)(sweep.chosen)}` : ''}${sweep.suggested !== null ? `, suggested ${(0,format/* formatNumber */.Z)(sweep.suggested)}` : ''}`;
    const categories = picks.map((i) => `"${(0,report_escape/* escapeMermaid */.Fw)((0,format/* formatNumber */.Z)(sweep.settings[i]))}"`);
    return fence([
        `title "${(0,report_escape/* escapeMermaid */.Fw)(title)}"`,
        `x-axis "${(0,report_escape/* escapeMermaid */.Fw)(sweep.parameter)}" [${categories.join(', ')}]`,
        `y-axis "cross-validated RMSE"`,
        `line [${cv.map(value).join(', ')}]`,
    ]);
}
function coefficientChart(name, chart, max) {
    const coef = chart.coefficients;
    const entries = coef.columns.map((c, j) => ({ c, v: coef.values[j] })).filter((e) => e.v !== null);
    if (entries.length === 0)
        return null;
    const shown = entries.length <= max ? entries : [...entries].sort((a, b) => Math.abs(b.v) - Math.abs(a.v)).slice(0, max);
    const bars = shown.map((e) => value(Math.abs(e.v)));
    const lines = [
        `title "${(0,report_escape/* escapeMermaid */.Fw)(`${name}: standardised coefficient sizes${coef.limit !== null ? `, fail limit ${(0,format/* formatNumber */.Z)(coef.limit)}` : ''}`)}"`,
        `x-axis [${shown.map((e) => `"${(0,report_escape/* escapeMermaid */.Fw)(e.c)}"`).join(', ')}]`,
        `y-axis "|standardised coefficient|"`,
        `bar [${bars.join(', ')}]`,
    ];
    if (coef.limit !== null)
        lines.push(`line [${shown.map(() => value(coef.limit)).join(', ')}]`);
    return fence(lines);
}
/**
 * A fenced Mermaid chart for one model (for `report/markdown.ts`: put it after the model's check
 * table), or null when the model has no chart data.
 * @param model a model's outcome (reads `charts`)
 * @param options series length; defaults in {@link MermaidOptions}
 * @returns "```mermaid ... ```\n" text
 */
function mermaidChart(model, options = {}) {
    const chart = model.charts;
    if (!chart)
        return null;
    const max = options.maxValues ?? 40;
    return curveChart(model.name, chart, max) ?? sweepChart(model.name, chart, max) ?? coefficientChart(model.name, chart, max);
}

// EXTERNAL MODULE: ./src/result/result.ts
var result = __webpack_require__(1628);
// EXTERNAL MODULE: ./src/report/wording.ts
var wording = __webpack_require__(5594);
// EXTERNAL MODULE: ./src/report/target-scale-text.ts
var target_scale_text = __webpack_require__(764);
;// CONCATENATED MODULE: ./src/report/markdown.ts
/**
 * The Markdown report: the job summary, the pull-request comment and `--format markdown`.
 * One verdict line, a table of every model, then for each model that did not pass each check's
 * figure against its limit with one sentence on what to change. Built as a string; the caller
 * writes it. Text from the repository is escaped with {@link escapeMarkdown} and cut to a
 * readable length; the whole report stays under `maxBytes`.
 */









/** Default size cap: under GitHub's job-summary limit of 1 MiB (1,048,576 bytes). */
const DEFAULT_MAX_BYTES = 1_000_000;
/** Longest piece of repository text (a name, a message) shown, in characters. */
const MAX_TEXT = 300;
/** Bytes kept free for the closing note when cutting. */
const NOTE_RESERVE = 400;
const MARK = { pass: 'pass', warn: 'WARN', fail: 'FAIL', error: 'ERROR', skipped: 'skipped' };
/** Repository text for Markdown: cut to {@link MAX_TEXT} characters, then escaped. */
function markdown_text(s) {
    const chars = [...s];
    return (0,report_escape/* escapeMarkdown */.FV)(chars.length > MAX_TEXT ? `${chars.slice(0, MAX_TEXT - 1).join('')}…` : s);
}
function cell(v) {
    if (typeof v === 'number' || typeof v === 'string')
        return (0,format/* formatNumber */.Z)((0,result/* fromJsonNumber */.M)(v));
    return '–';
}
function signed(x, suffix = '') {
    if (Number.isNaN(x))
        return 'NaN';
    if (x === 0)
        return `0${suffix}`;
    return `${x > 0 ? '+' : ''}${(0,format/* formatNumber */.Z)(x)}${suffix}`;
}
/** The verdict in one line. */
function verdictLine(result) {
    const head = result.verdict === 'pass' && result.counts.models === 0 ? 'no models to check' : (0,wording/* verdictHeadline */.ge)(result);
    return `**${MARK[result.verdict]}**: ${head} (${(0,wording/* countsText */.WN)(result.counts)})`;
}
/** The "against base" cell of a model: `new`, the changes (after `renamed from <name>:` for a renamed model), or `–`. */
function baseCell(m) {
    const b = m.base;
    if (!b)
        return '–';
    if (b.status === 'new')
        return 'new';
    const from = b.status === 'renamed' && b.previous ? `renamed from ${markdown_text(b.previous.name)}: ` : '';
    const rmse = b.holdout_rmse_change === null ? null : (0,result/* fromJsonNumber */.M)(b.holdout_rmse_change);
    const loss = b.holdout_log_loss_change === undefined || b.holdout_log_loss_change === null ? null : (0,result/* fromJsonNumber */.M)(b.holdout_log_loss_change);
    const gap = b.gap_ratio_change === null ? null : (0,result/* fromJsonNumber */.M)(b.gap_ratio_change);
    if (rmse === null && loss === null && gap === null)
        return `${from}base not checked`;
    const parts = [];
    if (rmse !== null)
        parts.push(`RMSE ${Number.isFinite(rmse) ? signed(rmse * 100, '%') : signed(rmse)}`);
    if (loss !== null)
        parts.push(`log-loss ${Number.isFinite(loss) ? signed(loss * 100, '%') : signed(loss)}`);
    if (gap !== null)
        parts.push(`gap ${signed(gap)}`);
    return `${from}${parts.join(', ')}`;
}
/** Table header (and separator) of the model overview. */
function overviewHead(withBase) {
    return [
        `| Status | Model | Hold-out RMSE | Gap ratio | Params / row | Largest std. coef. |${withBase ? ' Against base |' : ''}`,
        `| --- | --- | ---: | ---: | ---: | ---: |${withBase ? ' --- |' : ''}`,
    ];
}
/** One row of the model overview. */
function overviewRow(m, withBase) {
    const x = m.metrics;
    return `| ${MARK[m.verdict]} | ${markdown_text(m.name + (0,model_kind/* kindMark */.w6)(m))} | ${cell(x?.holdout_rmse)} | ${cell(x?.gap_ratio)} | ${cell(x?.params_per_sample)} | ${cell(x?.max_std_coefficient)} |${withBase ? ` ${baseCell(m)} |` : ''}`;
}
/** The block of one model that did not pass. */
function modelDetail(m) {
    const lines = [`### ${MARK[m.verdict]}: ${markdown_text(m.name)}`, '', `Descriptor: ${markdown_text(m.descriptor)}`, ''];
    if (m.error) {
        const where = m.error.file ? `${markdown_text(m.error.file)}${m.error.line ? ` line ${m.error.line}` : ''}: ` : '';
        lines.push(`Could not be checked. ${where}${markdown_text(m.error.message)}`, '');
        return lines;
    }
    const shown = m.checks.filter((c) => c.status === 'fail' || c.status === 'warn');
    const kind = (0,model_kind/* kindLine */.J0)(m);
    if (kind !== null)
        lines.push(markdown_text(kind), '');
    const refit = (0,refit_compare/* refitCompareLine */.C)(m);
    if (refit !== null)
        lines.push(markdown_text(refit), '');
    if ((0,classifier_figures/* isClassifier */.aA)(m))
        lines.push(markdown_text((0,classifier_figures/* classifierLine */.KT)(m)), '');
    const scale = (0,target_scale_text/* targetScaleSentence */.tt)(m);
    if (scale !== null) {
        lines.push(`${scale}:`, '', `| ${target_scale_text/* TARGET_SCALE_HEADINGS */.x8.join(' | ')} |`, '| --- | ---: | ---: | ---: | ---: | ---: | ---: |');
        for (const row of (0,target_scale_text/* targetScaleRows */.rY)(m))
            lines.push(`| ${row.join(' | ')} |`);
        lines.push('');
    }
    lines.push('| Check | Status | Value | Limit | Line |', '| --- | --- | ---: | --- | ---: |');
    for (const c of shown)
        lines.push(`| ${c.id} | ${MARK[c.status]} | ${cell(c.value)} | ${(0,wording/* limitText */.PW)(c)} | ${c.line} |`);
    lines.push('');
    for (const c of shown)
        lines.push(`- **${c.id}**: ${markdown_text(c.message)}. ${markdown_text(c.advice)}`);
    lines.push('');
    const chart = (0,classifier_figures/* isClassifier */.aA)(m) ? (0,classifier_figures/* calibrationChart */.dO)(m) : mermaidChart(m);
    if (chart !== null)
        lines.push(chart);
    return lines;
}
function bytes(s) {
    return Buffer.byteLength(s, 'utf8');
}
/**
 * Formats the Result as Markdown, at most `maxBytes` UTF-8 bytes. When the report would be
 * larger, table rows and then model blocks are left out (the table first keeps every model
 * that did not pass) and a closing note says how many.
 * @param result the run's Result
 * @param options title, size cap and preamble; defaults in {@link MarkdownOptions}
 */
function formatMarkdown(result, options = {}) {
    const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
    const budget = maxBytes - NOTE_RESERVE;
    const withBase = result.models.some((m) => m.base !== undefined);
    const head = [...(options.preamble ?? []), `## ${markdown_text(options.title ?? 'fitgate')}`, '', verdictLine(result), ''];
    for (const n of result.notes)
        head.push(`> ${markdown_text(n)}`, '');
    let out = `${head.join('\n')}\n`;
    const notPassing = result.models.filter((m) => m.verdict !== 'pass');
    const blocks = notPassing.map((m) => `\n${modelDetail(m).join('\n')}`);
    const detailBytes = blocks.reduce((sum, b) => sum + bytes(b), 0);
    // The table: when it must be cut it keeps the models that did not pass first, and takes at
    // least half of what is left, the rest going to the details of those models.
    const cuts = [];
    if (result.models.length > 0) {
        const tableHead = `${overviewHead(withBase).join('\n')}\n`;
        const rows = result.models.map((m) => `${overviewRow(m, withBase)}\n`);
        const left = budget - bytes(out);
        const tableBudget = bytes(out) + Math.max(left / 2, left - detailBytes);
        let size = bytes(out) + bytes(tableHead);
        const keep = new Set();
        const order = result.models
            .map((_, i) => i)
            .sort((a, b) => Number(result.models[a].verdict === 'pass') - Number(result.models[b].verdict === 'pass') || a - b);
        for (const i of order) {
            if (size + bytes(rows[i]) > tableBudget)
                break;
            keep.add(i);
            size += bytes(rows[i]);
        }
        out += tableHead + result.models.map((_, i) => (keep.has(i) ? rows[i] : '')).join('');
        if (keep.size < result.models.length)
            cuts.push(`${result.models.length - keep.size} of ${result.models.length} table rows`);
    }
    // One block per model that did not pass.
    let shown = 0;
    let size = bytes(out);
    for (const block of blocks) {
        const b = bytes(block);
        if (size + b > budget)
            break;
        out += block;
        size += b;
        shown += 1;
    }
    if (shown < notPassing.length)
        cuts.push(`${notPassing.length - shown} of ${notPassing.length} model details`);
    if (cuts.length > 0) {
        out += `\n_Cut to stay under the size limit: ${cuts.join(' and ')} left out. Run \`fitgate check\` or read the JSON report for all of them._\n`;
    }
    return out;
}


/***/ }),

/***/ 3332:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   M: () => (/* binding */ axisLabel)
/* harmony export */ });
/* unused harmony export unitOf */
/**
 * Axis labels from column names: a trailing unit suffix (`_m`, `_kg`, `_c`, `_pct`, ...) is shown
 * as a unit in brackets after the name, e.g. `depth_m` -> `depth_m (m)`, `exit_temp_c` ->
 * `exit_temp_c (°C)`. Names without a known suffix stay as they are. The name is kept whole so
 * that readers find the column they know.
 */
/** Unit suffixes (lower case, after the last `_`) and how they are shown. Common practice in data files. */
const UNITS = {
    mm: 'mm',
    cm: 'cm',
    m: 'm',
    km: 'km',
    in: 'in',
    ft: 'ft',
    mg: 'mg',
    g: 'g',
    kg: 'kg',
    t: 't',
    lb: 'lb',
    ml: 'mL',
    l: 'L',
    m3: 'm³',
    ms: 'ms',
    s: 's',
    sec: 's',
    min: 'min',
    h: 'h',
    hr: 'h',
    hours: 'h',
    days: 'days',
    d: 'd',
    c: '°C',
    degc: '°C',
    f: '°F',
    degf: '°F',
    k: 'K',
    pct: '%',
    percent: '%',
    ppm: 'ppm',
    ppb: 'ppb',
    pa: 'Pa',
    kpa: 'kPa',
    mpa: 'MPa',
    bar: 'bar',
    psi: 'psi',
    w: 'W',
    kw: 'kW',
    mw: 'MW',
    kwh: 'kWh',
    wh: 'Wh',
    j: 'J',
    kj: 'kJ',
    v: 'V',
    a: 'A',
    hz: 'Hz',
    rpm: 'rpm',
    usd: 'USD',
    eur: 'EUR',
    gbp: 'GBP',
    mps: 'm/s',
    kmh: 'km/h',
    lpm: 'L/min',
};
/** The unit a column name ends in (`depth_m` -> `m`), or null. */
function unitOf(column) {
    const i = column.lastIndexOf('_');
    if (i <= 0 || i === column.length - 1)
        return null;
    return UNITS[column.slice(i + 1).toLowerCase()] ?? null;
}
/** Axis label of a column: the name, then its unit in brackets when the name ends in one (plain text, not escaped). */
function axisLabel(column) {
    const unit = unitOf(column);
    return unit ? `${column} (${unit})` : column;
}


/***/ }),

/***/ 5594:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   PW: () => (/* binding */ limitText),
/* harmony export */   WN: () => (/* binding */ countsText),
/* harmony export */   ge: () => (/* binding */ verdictHeadline)
/* harmony export */ });
/* harmony import */ var _core_format_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(6228);
/**
 * Sentences several reporters print, as plain text: each reporter escapes them for its medium
 * (HTML, Markdown, XML).
 */

/** A check's limits: `warn > 0.25, fail > 0.5`, floors as `warn < 0.8, fail < 0.6`, or `off`. */
function limitText(c) {
    const parts = [];
    if (c.floor?.warn != null)
        parts.push(`warn < ${(0,_core_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(c.floor.warn)}`);
    if (c.floor?.fail != null)
        parts.push(`fail < ${(0,_core_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(c.floor.fail)}`);
    if (c.warn !== null)
        parts.push(`warn > ${(0,_core_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(c.warn)}`);
    if (c.limit !== null)
        parts.push(`fail > ${(0,_core_format_js__WEBPACK_IMPORTED_MODULE_0__/* .formatNumber */ .Z)(c.limit)}`);
    return parts.length ? parts.join(', ') : 'off';
}
/** The run's verdict in words, e.g. `2 of 6 models over a limit`. */
function verdictHeadline(result) {
    const { counts } = result;
    if (result.verdict === 'pass')
        return 'every model within its limits';
    if (result.verdict === 'warn')
        return `every model within its fail limits, ${counts.warn} with warnings`;
    if (result.verdict === 'fail')
        return `${counts.fail} of ${counts.models} models over a limit`;
    return `${counts.error} of ${counts.models} models could not be checked`;
}
/** The counts behind the verdict: `6 checked: 1 pass, 0 warn, 5 fail, 0 error`. */
function countsText(counts) {
    return `${counts.models} checked: ${counts.pass} pass, ${counts.warn} warn, ${counts.fail} fail, ${counts.error} error`;
}


/***/ })

};
