export const id = 130;
export const ids = [130];
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

/***/ 1130:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  writeFileReports: () => (/* binding */ writeFileReports)
});

// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/checks/index.ts + 23 modules
var checks = __webpack_require__(6903);
// EXTERNAL MODULE: ./src/report/model-kind.ts
var model_kind = __webpack_require__(698);
// EXTERNAL MODULE: ./src/report/refit-compare.ts
var refit_compare = __webpack_require__(3524);
// EXTERNAL MODULE: ./src/core/format.ts
var format = __webpack_require__(6228);
// EXTERNAL MODULE: ./src/result/result.ts
var result_result = __webpack_require__(1628);
// EXTERNAL MODULE: ./src/report/escape.ts
var report_escape = __webpack_require__(4031);
;// CONCATENATED MODULE: ./src/report/svg/class-label.ts
/**
 * A class label of a classifier as chart text: labels come from the user's CSV file, so at most
 * {@link CLASS_LABEL_CHARS} characters of one are shown (cut with `…`); plain text, escaped by the
 * frame like every other chart text.
 */
/** Most characters of a label shown in a chart. */
const CLASS_LABEL_CHARS = 40;
/** The label, cut to {@link CLASS_LABEL_CHARS} characters (by code point) with `…` when longer. */
function classLabel(label) {
    const chars = Array.from(label);
    return chars.length <= CLASS_LABEL_CHARS ? label : `${chars.slice(0, CLASS_LABEL_CHARS - 1).join('')}…`;
}

;// CONCATENATED MODULE: ./src/report/svg/palette.ts
/**
 * Colours and marks of every chart. Colours come from the colour-blind-safe set of Okabe & Ito
 * (Color Universal Design, 2008): blue, vermillion, orange and reddish purple stay apart for
 * readers with any of the common colour-vision deficiencies. No meaning rests on colour alone:
 * training rows are filled circles and hold-out rows hollow squares, the fail limit is dashed and
 * the warning limit dotted, so every chart still reads when printed in greyscale.
 */
/** Chart colours (CSS colour strings). */
const COLOURS = {
    /** Training rows: blue #0072B2 (dark in greyscale). */
    train: '#0072B2',
    /** Hold-out rows: vermillion #D55E00. */
    holdout: '#D55E00',
    /** Fitted and partial curves: near black. */
    curve: '#1a1a1a',
    /** Observed target band: pale grey-blue fill. */
    band: '#dde6ee',
    /** Band edges. */
    bandEdge: '#7b8a97',
    /** Regions where the curve leaves the band: reddish purple #CC79A7 hatching. */
    region: '#CC79A7',
    /** Fail limit: vermillion, dashed. */
    limit: '#D55E00',
    /** Warning limit: orange #E69F00, dotted. */
    warn: '#B07800',
    /** Grid lines. */
    grid: '#e6e6e6',
    /** Axes and tick labels. */
    axis: '#4d4d4d',
    /** Reference lines (y = x, zero). */
    reference: '#8c8c8c',
};
/** Dash patterns (SVG `stroke-dasharray`). */
const DASHES = {
    limit: '6 4',
    warn: '2 3',
    reference: '4 4',
    suggested: '6 4',
};
/** Radius of a training point and half side of a hold-out square, in px. */
const MARK_SIZE = 3.2;
/** A filled circle for a training row at (x, y). */
function trainMark(x, y) {
    return `<circle class="pt" cx="${x.toFixed(1)}" cy="${y.toFixed(1)}" r="${MARK_SIZE}"/>`;
}
/** A hollow square for a hold-out row at (x, y). */
function holdoutMark(x, y) {
    const s = MARK_SIZE;
    return `<rect class="pt" x="${(x - s).toFixed(1)}" y="${(y - s).toFixed(1)}" width="${2 * s}" height="${2 * s}"/>`;
}
/** Group attributes of the training series (filled blue circles). */
const TRAIN_STYLE = `fill="${COLOURS.train}" fill-opacity="0.85" stroke="#ffffff" stroke-width="0.6"`;
/** Group attributes of the hold-out series (hollow vermillion squares). */
const HOLDOUT_STYLE = `fill="none" stroke="${COLOURS.holdout}" stroke-width="1.6"`;
/** Legend picture of a training point. */
const LEGEND_TRAIN = `<circle cx="7" cy="7" r="${MARK_SIZE + 0.4}" fill="${COLOURS.train}"/>`;
/** Legend picture of a hold-out point. */
const LEGEND_HOLDOUT = `<rect x="3" y="3" width="8" height="8" fill="none" stroke="${COLOURS.holdout}" stroke-width="1.6"/>`;
/** Legend picture of a line in a colour, optionally dashed. */
function legendLine(colour, dash, width = 2) {
    return `<line x1="0" y1="7" x2="14" y2="7" stroke="${colour}" stroke-width="${width}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
}
/** Legend picture of the observed target band. */
const LEGEND_BAND = `<rect x="0" y="2" width="14" height="10" fill="${COLOURS.band}" stroke="${COLOURS.bandEdge}" stroke-dasharray="2 2"/>`;
/** Legend picture of a hatched region (uses the chart's pattern `<id>-hatch`). */
function legendRegion(id) {
    return `<rect x="0" y="1" width="14" height="12" fill="url(#${id}-hatch)" stroke="${COLOURS.region}"/>`;
}

;// CONCATENATED MODULE: ./src/report/svg/frame.ts
/**
 * The frame every chart shares: the `<svg>` element with its text alternative (`<title>`,
 * `<desc>`, `role="img"`, `aria-labelledby`), grid lines, axes with ticks and labels, the plot
 * area's clip path and a legend drawn inside the picture (so that it prints and screenshots
 * with the chart). Chart modules pass already escaped body markup; every text given here is
 * escaped on the way in.
 */



/** Chart size in px (the page scales it to its column width). */
const WIDTH = 560;
const HEIGHT = 340;
/** Space around the plot area in px. */
const MARGIN = { top: 34, right: 18, bottom: 48, left: 68 };
/** Text of a tick value. */
function tickText(v, log) {
    if (log) {
        const e = Math.round(Math.log10(v));
        return Math.abs(e) <= 3 ? (0,format/* formatNumber */.Z)(v) : `1e${e}`;
    }
    return (0,format/* formatNumber */.Z)(v);
}
/** A number as SVG coordinate text (one decimal). */
function px(v) {
    return v.toFixed(1);
}
/** Plot area of a chart: left, top, right, bottom in px. */
function plotArea(width = WIDTH, height = HEIGHT, left = MARGIN.left) {
    return { x0: left, y0: MARGIN.top, x1: width - MARGIN.right, y1: height - MARGIN.bottom };
}
/** SVG path through points, breaking at null y values (gaps). */
function linePath(xs, ys, sx, sy) {
    let d = '';
    let pen = false;
    for (let i = 0; i < xs.length; i++) {
        const y = ys[i];
        if (y === null) {
            pen = false;
            continue;
        }
        // Keep far-off values finite for the renderer; the clip path hides them.
        const py = Math.max(-1e5, Math.min(1e5, sy(y)));
        d += `${pen ? 'L' : 'M'}${px(sx(xs[i]))} ${px(py)}`;
        pen = true;
    }
    return d;
}
/** Renders a chart: `<svg>` with title, description, grid, axes, clipped body, overlay and legend. */
function frame_frame(spec) {
    const width = spec.width ?? WIDTH;
    const height = spec.height ?? HEIGHT;
    const { x0, y0, x1, y1 } = plotArea(width, height, spec.left);
    const { x, y, id } = spec;
    const parts = [];
    const data = Object.entries(spec.data ?? {})
        .map(([k, v]) => ` data-${k}="${(0,report_escape/* escapeHtml */.ZD)(String(v))}"`)
        .join('');
    parts.push(`<svg xmlns="http://www.w3.org/2000/svg" class="chart" viewBox="0 0 ${width} ${height}" width="${width}" height="${height}" role="img" aria-labelledby="${id}-title ${id}-desc" data-chart="${(0,report_escape/* escapeHtml */.ZD)(spec.kind)}"${data}>`, `<title id="${id}-title">${(0,report_escape/* escapeHtml */.ZD)(spec.title)}</title>`, `<desc id="${id}-desc">${(0,report_escape/* escapeHtml */.ZD)(spec.desc)}</desc>`, `<defs><clipPath id="${id}-clip"><rect x="${x0}" y="${y0}" width="${x1 - x0}" height="${y1 - y0}"/></clipPath>`, `<pattern id="${id}-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="${COLOURS.region}" fill-opacity="0.12"/><line x1="0" y1="0" x2="0" y2="6" stroke="${COLOURS.region}" stroke-width="2.2"/></pattern></defs>`);
    // Grid and ticks.
    const grid = [];
    const labels = [];
    if (spec.xTicks !== false) {
        for (const t of x.ticks) {
            const p = x(t);
            if (p < x0 - 0.5 || p > x1 + 0.5)
                continue;
            grid.push(`<line x1="${px(p)}" y1="${y0}" x2="${px(p)}" y2="${y1}"/>`);
            labels.push(`<text x="${px(p)}" y="${y1 + 16}" text-anchor="middle">${(0,report_escape/* escapeHtml */.ZD)(spec.xTickLabel?.(t) ?? tickText(t, x.log))}</text>`);
        }
    }
    if (spec.yCategories) {
        for (const c of spec.yCategories) {
            labels.push(`<text x="${x0 - 6}" y="${px(c.y + 4)}" text-anchor="end"><title>${(0,report_escape/* escapeHtml */.ZD)(c.full)}</title>${(0,report_escape/* escapeHtml */.ZD)(c.label)}</text>`);
        }
    }
    else {
        for (const t of y.ticks) {
            const p = y(t);
            if (p < y0 - 0.5 || p > y1 + 0.5)
                continue;
            grid.push(`<line x1="${x0}" y1="${px(p)}" x2="${x1}" y2="${px(p)}"/>`);
            labels.push(`<text x="${x0 - 6}" y="${px(p + 4)}" text-anchor="end">${(0,report_escape/* escapeHtml */.ZD)(tickText(t, y.log))}</text>`);
        }
    }
    parts.push(`<g class="grid" stroke="${COLOURS.grid}" stroke-width="1">${grid.join('')}</g>`);
    parts.push(`<g class="body" clip-path="url(#${id}-clip)">${spec.body}</g>`);
    parts.push(`<g class="axes" stroke="${COLOURS.axis}" stroke-width="1" fill="none"><path d="M${x0} ${y0}V${y1}H${x1}"/></g>`, `<g class="ticks" fill="${COLOURS.axis}" font-size="11">${labels.join('')}</g>`, `<text class="axis-label" x="${px((x0 + x1) / 2)}" y="${height - 10}" text-anchor="middle" font-size="12" fill="#222">${(0,report_escape/* escapeHtml */.ZD)(spec.xLabel)}</text>`);
    if (spec.yLabel) {
        parts.push(`<text class="axis-label" transform="translate(14 ${px((y0 + y1) / 2)}) rotate(-90)" text-anchor="middle" font-size="12" fill="#222">${(0,report_escape/* escapeHtml */.ZD)(spec.yLabel)}</text>`);
    }
    if (spec.overlay)
        parts.push(spec.overlay);
    // Legend in one row above the plot area; a row too long for it starts further left (into the
    // margin of the y axis, whose label sits lower down).
    const natural = spec.legend.reduce((w, item) => w + 28 + item.label.length * 6.1, 0);
    let lx = x0 + natural > width - MARGIN.right ? Math.max(MARGIN.right, width - MARGIN.right - natural) : x0;
    const legend = [];
    for (const item of spec.legend) {
        legend.push(`<g transform="translate(${px(lx)} 9)">${item.mark}<text x="19" y="11" font-size="11" fill="#333">${(0,report_escape/* escapeHtml */.ZD)(item.label)}</text></g>`);
        lx += 28 + item.label.length * 6.1;
    }
    parts.push(`<g class="legend">${legend.join('')}</g>`);
    parts.push('</svg>');
    return parts.join('');
}

;// CONCATENATED MODULE: ./src/report/svg/scale.ts
/**
 * Scales and ticks: map data values to pixels. Linear and base-10 logarithmic. Tick steps are
 * 1, 2 or 5 times a power of ten (common practice in chart axes).
 */
/**
 * The smallest and largest finite values, or null when there are none.
 * @param values numbers; null and non-finite entries are ignored
 */
function extent(...values) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const list of values) {
        for (const v of list) {
            if (v === null || !Number.isFinite(v))
                continue;
            if (v < lo)
                lo = v;
            if (v > hi)
                hi = v;
        }
    }
    return lo <= hi ? [lo, hi] : null;
}
/** Widens [lo, hi] by `fraction` of its width on each side; a single value becomes value ± max(1, |value| / 10). */
function pad([lo, hi], fraction = 0.05) {
    if (!(hi > lo)) {
        const d = Math.max(1, Math.abs(lo) / 10);
        return [lo - d, hi + d];
    }
    const d = (hi - lo) * fraction;
    return [lo - d, hi + d];
}
/** About `count` round tick values covering [lo, hi] (steps 1, 2 or 5 x 10^k). */
function niceTicks(lo, hi, count = 5) {
    if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi))
        return [lo];
    const raw = (hi - lo) / Math.max(1, count);
    const power = 10 ** Math.floor(Math.log10(raw));
    const f = raw / power;
    const step = (f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10) * power;
    const first = Math.ceil(lo / step - 1e-9);
    const last = Math.floor(hi / step + 1e-9);
    // Far from zero relative to the step (|first| beyond 2^52), the tick index no longer moves by
    // one per step in double precision: fall back to the two ends rather than loop.
    if (!Number.isFinite(step) || step <= 0 || !(Math.abs(first) < 2 ** 52 && Math.abs(last) < 2 ** 52) || last - first > 100)
        return [lo, hi];
    const ticks = [];
    for (let t = first; t <= last; t++) {
        const v = t * step;
        ticks.push(Math.abs(v) < step * 1e-9 ? 0 : Number(v.toPrecision(12)));
    }
    return ticks;
}
/**
 * A linear scale.
 * @param domain data interval (widened when empty)
 * @param range pixel interval; may run backwards (y axes)
 */
function linearScale(domain, range, tickCount = 5) {
    const [lo, hi] = domain[1] > domain[0] ? domain : pad(domain);
    const k = (range[1] - range[0]) / (hi - lo);
    const f = ((v) => range[0] + (v - lo) * k);
    return Object.assign(f, { domain: [lo, hi], range, ticks: niceTicks(lo, hi, tickCount), log: false });
}
/**
 * A base-10 logarithmic scale over [lo, hi] (both > 0), ticks at powers of ten (every
 * second or further power when the domain spans more than seven decades).
 * @param domain positive data interval
 * @param range pixel interval
 */
function logScale(domain, range) {
    // Clamp to finite positive numbers: a padded domain can reach Infinity near 1e308, and the
    // tick loop below must stay bounded.
    const lo = Math.min(Math.max(domain[0], Number.MIN_VALUE), Number.MAX_VALUE / 10);
    const hi = Math.min(domain[1] > lo ? domain[1] : lo * 10, Number.MAX_VALUE);
    const a = Math.log10(lo);
    const b = Math.log10(hi);
    const k = (range[1] - range[0]) / (b - a);
    const f = ((v) => range[0] + (Math.log10(Math.max(v, Number.MIN_VALUE)) - a) * k);
    const ticks = [];
    const first = Math.ceil(a - 1e-9);
    const last = Math.floor(b + 1e-9);
    const step = Math.max(1, Math.ceil((last - first) / 7));
    for (let e = first; e <= last; e += step)
        ticks.push(10 ** e);
    return Object.assign(f, { domain: [lo, hi], range, ticks, log: true });
}

;// CONCATENATED MODULE: ./src/report/svg/calibration-diagram.ts




/** Marks (and the line through them) of one file's non-empty bins, with each bin's count as a label. */
function binMarks(bins, series, sx, sy) {
    const marks = [];
    const labels = [];
    let d = '';
    const mark = series === 'train' ? trainMark : holdoutMark;
    for (const b of bins) {
        if (b.count === 0 || b.predicted === null || b.observed === null)
            continue;
        const x = sx(b.predicted);
        const y = sy(b.observed);
        marks.push(mark(x, y));
        d += `${d ? 'L' : 'M'}${px(x)} ${px(y)}`;
        // Training counts above the mark, hold-out counts below, so the two rarely overlap.
        const dy = series === 'train' ? -7 : 15;
        labels.push(`<text x="${px(x)}" y="${px(y + dy)}" text-anchor="middle">${b.count}</text>`);
    }
    const colour = series === 'train' ? COLOURS.train : COLOURS.holdout;
    const style = series === 'train' ? TRAIN_STYLE : HOLDOUT_STYLE;
    return {
        markup: `<path d="${d}" fill="none" stroke="${colour}" stroke-width="1.2" stroke-opacity="0.6"${series === 'holdout' ? ` stroke-dasharray="${DASHES.limit}"` : ''}/><g data-series="${series}" data-count="${marks.length}" ${style}>${marks.join('')}</g>`,
        labels: `<g class="counts" data-series="${series}" font-size="9.5" fill="${colour}">${labels.join('')}</g>`,
        drawn: marks.length,
    };
}
/** One file's bins in words. */
function sentence(name, bins) {
    const used = bins.filter((b) => b.count > 0 && b.predicted !== null && b.observed !== null);
    if (used.length === 0)
        return `${name}: no rows.`;
    const list = used.map((b) => `${b.count} rows at ${b.predicted.toFixed(2)} predicted, ${b.observed.toFixed(2)} observed`);
    return `${name}: ${list.join('; ')}.`;
}
/**
 * Renders the calibration diagram of a classifier.
 * @param chart the classifier's chart data (reads `calibration`)
 */
function calibrationDiagramChart(chart, options) {
    const { id } = options;
    const positive = classLabel(chart.positive);
    const { x0, y0, x1, y1 } = plotArea();
    const sx = linearScale([0, 1], [x0, x1]);
    const sy = linearScale([0, 1], [y1, y0]);
    const a = binMarks(chart.calibration.train, 'train', sx, sy);
    const b = binMarks(chart.calibration.holdout, 'holdout', sx, sy);
    const body = [
        `<line class="diagonal" x1="${px(sx(0))}" y1="${px(sy(0))}" x2="${px(sx(1))}" y2="${px(sy(1))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
        a.markup,
        b.markup,
        a.labels,
        b.labels,
    ].join('');
    const bins = chart.calibration.holdout.length;
    return frame_frame({
        id,
        kind: 'calibration-diagram',
        title: `Calibration: observed share of ${chart.target} = ${positive}`,
        desc: `Observed share of positives (vertical) against the mean predicted probability (horizontal) in ${bins} equal-width bins of the predicted probability, the number of rows of each bin written beside its mark. ${sentence('Training rows (filled circles)', chart.calibration.train)} ${sentence('Hold-out rows (hollow squares)', chart.calibration.holdout)} Marks on the dotted diagonal are calibrated; hold-out marks flatter than the diagonal mean the predictions are too extreme.`,
        x: sx,
        y: sy,
        xLabel: 'mean predicted probability',
        yLabel: 'observed share positive',
        body,
        legend: [
            { mark: LEGEND_TRAIN, label: 'training' },
            { mark: LEGEND_HOLDOUT, label: 'hold-out' },
            { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'calibrated' },
        ],
        data: { 'train-bins': a.drawn, 'holdout-bins': b.drawn, bins },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/points.ts

/**
 * Draws one series.
 * @param series `train` (filled circles) or `holdout` (hollow squares)
 * @param xs x values of the rows (null = not finite)
 * @param ys y values of the rows
 */
function marks(series, xs, ys, sx, sy) {
    const out = [];
    let omitted = 0;
    const mark = series === 'train' ? trainMark : holdoutMark;
    for (let i = 0; i < ys.length; i++) {
        const x = xs[i];
        const y = ys[i];
        if (x === null || y === null || x === undefined) {
            omitted++;
            continue;
        }
        out.push(mark(sx(x), sy(y)));
    }
    const style = series === 'train' ? TRAIN_STYLE : HOLDOUT_STYLE;
    return {
        markup: `<g data-series="${series}" data-count="${out.length}" ${style}>${out.join('')}</g>`,
        drawn: out.length,
        omitted,
    };
}
/** `data-*` attributes stating rows, kept points and drawn marks of both series. */
function pointData(train, holdout, a, b) {
    return {
        'train-rows': train.rows,
        'train-shown': train.shown,
        'train-points': a.drawn,
        'train-omitted': a.omitted,
        'holdout-rows': holdout.rows,
        'holdout-shown': holdout.shown,
        'holdout-points': b.drawn,
        'holdout-omitted': b.omitted,
    };
}
/** Sentence on thinning and omitted rows for a chart's description (empty when nothing to say). */
function pointNote(train, holdout, a, b) {
    const parts = [];
    if (train.shown < train.rows)
        parts.push(`${train.shown} of ${train.rows} training rows shown, evenly spaced through the file`);
    if (holdout.shown < holdout.rows)
        parts.push(`${holdout.shown} of ${holdout.rows} hold-out rows shown, evenly spaced through the file`);
    if (a.omitted + b.omitted > 0)
        parts.push(`${a.omitted + b.omitted} rows with values that are not finite are not drawn`);
    return parts.length ? ` ${parts.join('; ')}.` : '';
}

// EXTERNAL MODULE: ./src/report/svg/units.ts
var units = __webpack_require__(3332);
;// CONCATENATED MODULE: ./src/report/svg/probability-curve.ts
/**
 * A classifier's predicted probability along one input: the curve over the input's training
 * range and a margin with the other inputs at their training medians (dotted lines: the training
 * range), and the rows as points at 0 (negative) and 1 (positive), training rows as filled
 * circles and hold-out rows as hollow squares, jittered a little up or down so that stacked rows
 * show as a band. A curve that jumps between 0 and 1 between neighbouring rows is the picture of
 * separation or overfitting.
 */







/** Height of the jitter band of the points at 0 and 1, in probability units. */
const JITTER = 0.035;
/**
 * The y value of each kept row: its label, moved towards the middle by up to {@link JITTER}
 * (a fixed pattern by position, so the chart is the same on every run).
 */
function jittered(points) {
    return points.label.map((l, i) => {
        const offset = (((i * 7919) % 97) / 96) * JITTER;
        return l === 1 ? 1 - offset : offset;
    });
}
/**
 * Renders the probability curve along one input.
 * @param chart the classifier's chart data
 * @param curve one entry of `chart.curves`
 */
function probabilityCurveChart(chart, curve, options) {
    const { id } = options;
    const positive = classLabel(chart.positive);
    const negative = classLabel(chart.negative);
    const { x0, y0, x1, y1 } = plotArea();
    const c = chart.inputs.indexOf(curve.input);
    const trainX = c >= 0 ? chart.train.x[c] : [];
    const holdoutX = c >= 0 ? chart.holdout.x[c] : [];
    const sx = linearScale(extent(curve.x, trainX, holdoutX) ?? [0, 1], [x0, x1]);
    const sy = linearScale([-0.05, 1.05], [y1, y0]);
    const a = marks('train', trainX, jittered(chart.train), sx, sy);
    const b = marks('holdout', holdoutX, jittered(chart.holdout), sx, sy);
    const t = chart.threshold;
    const body = [
        `<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(curve.range[0]))}" y1="${y0}" x2="${px(sx(curve.range[0]))}" y2="${y1}"/><line x1="${px(sx(curve.range[1]))}" y1="${y0}" x2="${px(sx(curve.range[1]))}" y2="${y1}"/></g>`,
        `<line class="threshold" x1="${x0}" y1="${px(sy(t))}" x2="${x1}" y2="${px(sy(t))}" stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="4 4"/>`,
        a.markup,
        b.markup,
        `<path class="curve" d="${linePath(curve.x, curve.p, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`,
    ].join('');
    const others = Object.entries(curve.others)
        .map(([k, v]) => `${k} = ${(0,format/* formatNumber */.Z)(v)}`)
        .join(', ');
    return frame_frame({
        id,
        kind: 'probability-curve',
        title: `Probability of ${chart.target} = ${positive} along ${curve.input}`,
        desc: `Predicted probability of ${chart.target} = ${positive} (vertical) as ${curve.input} runs from ${(0,format/* formatNumber */.Z)(curve.x[0])} to ${(0,format/* formatNumber */.Z)(curve.x[curve.x.length - 1])} (training range ${(0,format/* formatNumber */.Z)(curve.range[0])} to ${(0,format/* formatNumber */.Z)(curve.range[1])}, dotted lines)${others ? `, the other inputs at their training medians (${others})` : ''}; the dashed line is the threshold ${(0,format/* formatNumber */.Z)(t)}. ${a.drawn} training rows (filled circles) and ${b.drawn} hold-out rows (hollow squares) sit at 1 when ${positive} and at 0 when ${negative}, spread a little to show how many.${pointNote(chart.train, chart.holdout, a, b)}`,
        x: sx,
        y: sy,
        xLabel: (0,units/* axisLabel */.M)(curve.input),
        yLabel: `probability of ${positive}`,
        body,
        legend: [
            { mark: legendLine(COLOURS.curve), label: others ? 'predicted, others at medians' : 'predicted' },
            { mark: LEGEND_TRAIN, label: 'training' },
            { mark: LEGEND_HOLDOUT, label: 'hold-out' },
        ],
        data: { input: curve.input, ...pointData(chart.train, chart.holdout, a, b) },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/roc-curve.ts
/**
 * The ROC curves of a classifier: true positive rate against false positive rate for the
 * training rows (solid blue) and the hold-out rows (dashed vermillion), with the diagonal of a
 * model that guesses. A training curve hugging the top left corner while the hold-out curve
 * sags towards the diagonal is the picture of an overfit classifier.
 */





/** The area under a drawn (kept) curve by the trapezoid rule: the exact AUC when the curve was not thinned. */
function drawnArea(curve) {
    let area = 0;
    for (let k = 1; k < curve.fpr.length; k++)
        area += ((curve.fpr[k] - curve.fpr[k - 1]) * (curve.tpr[k] + curve.tpr[k - 1])) / 2;
    return area;
}
/** One file's curve in words for the description. */
function roc_curve_sentence(name, curve) {
    if (curve.positives === 0 || curve.negatives === 0)
        return `${name}: one class only (${curve.rows} rows), no curve.`;
    const kept = curve.thinned
        ? `${curve.fpr.length} of its ${curve.points} points drawn, every convex hull vertex kept`
        : `${curve.points} points`;
    return `${name}: ${curve.positives} positive and ${curve.negatives} negative rows, ${kept}, area under the drawn curve ${(0,format/* formatNumber */.Z)(drawnArea(curve), 4)}.`;
}
/**
 * Renders the ROC chart of a classifier.
 * @param chart the classifier's chart data (reads `roc`)
 */
function rocCurveChart(chart, options) {
    const { id } = options;
    const positive = classLabel(chart.positive);
    const { x0, y0, x1, y1 } = plotArea();
    const sx = linearScale([0, 1], [x0, x1]);
    const sy = linearScale([0, 1], [y1, y0]);
    const { train, holdout } = chart.roc;
    const path = (curve, series, colour, dash) => `<path class="roc" data-series="${series}" data-count="${curve.fpr.length}" d="${linePath(curve.fpr, curve.tpr, sx, sy)}" fill="none" stroke="${colour}" stroke-width="2" stroke-linejoin="round"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;
    const body = [
        `<line class="diagonal" x1="${px(sx(0))}" y1="${px(sy(0))}" x2="${px(sx(1))}" y2="${px(sy(1))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
        path(train, 'train', COLOURS.train, null),
        path(holdout, 'holdout', COLOURS.holdout, DASHES.limit),
    ].join('');
    return frame_frame({
        id,
        kind: 'roc-curve',
        title: `ROC curves: ${chart.target} = ${positive}`,
        desc: `True positive rate (vertical) against false positive rate (horizontal) as the probability threshold for "${positive}" falls from 1 to 0. ${roc_curve_sentence('Training rows (solid line)', train)} ${roc_curve_sentence('Hold-out rows (dashed line)', holdout)} The dotted diagonal is a model that guesses; a training curve far above the hold-out curve shows overfitting.`,
        x: sx,
        y: sy,
        xLabel: 'false positive rate',
        yLabel: 'true positive rate',
        body,
        legend: [
            { mark: legendLine(COLOURS.train), label: 'training' },
            { mark: legendLine(COLOURS.holdout, DASHES.limit), label: 'hold-out' },
            { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'guessing' },
        ],
        data: {
            'train-points': train.fpr.length,
            'holdout-points': holdout.fpr.length,
            'train-area': (0,format/* formatNumber */.Z)(drawnArea(train), 6),
            'holdout-area': (0,format/* formatNumber */.Z)(drawnArea(holdout), 6),
        },
    });
}

;// CONCATENATED MODULE: ./src/report/classifier-html.ts
/**
 * The HTML report's part for a binary classifier (report/html.ts calls it): its facts line and
 * its charts, the ROC curves, the calibration diagram and the predicted probability along each
 * input, drawn from the pipeline's `classifier_charts` (nothing here computes a figure).
 */






function num(v) {
    if (v === null || v === undefined || (typeof v === 'string' && v !== 'Infinity' && v !== '-Infinity' && v !== 'NaN'))
        return '–';
    return (0,report_escape/* escapeHtml */.ZD)((0,format/* formatNumber */.Z)((0,result_result/* fromJsonNumber */.M)(v)));
}
function figure(svg, caption) {
    return `<figure>${svg}<figcaption>${(0,report_escape/* escapeHtml */.ZD)(caption)}</figcaption></figure>`;
}
/** The facts line of a classifier: rows, parameters, log-loss, AUC and calibration slope (HTML). */
function classifierFacts(m) {
    const x = m.metrics;
    return (`<p class="facts"><span>training rows <b>${m.rows.train}</b></span><span>hold-out rows <b>${m.rows.holdout}</b></span><span>parameters <b>${m.parameters}</b></span>` +
        `<span>log-loss <b>${num(x?.train_log_loss)}</b> / <b>${num(x?.holdout_log_loss)}</b> (training / hold-out)</span>` +
        `<span>AUC <b>${num(x?.train_auc)}</b> / <b>${num(x?.holdout_auc)}</b></span><span>calibration slope <b>${num(x?.calibration_slope)}</b></span></p>`);
}
/** The chart figures of a classifier, in reading order. */
function classifierCharts(chart, prefix) {
    const out = [
        figure(rocCurveChart(chart, { id: `${prefix}-roc` }), 'ROC curves of the training and hold-out rows; a training curve well above the hold-out curve shows overfitting.'),
        figure(calibrationDiagramChart(chart, { id: `${prefix}-calibration` }), `Calibration: observed share of positives against the mean prediction in ${chart.calibration.holdout.length} equal-width bins, with the rows per bin.`),
    ];
    chart.curves.forEach((curve, k) => {
        out.push(figure(probabilityCurveChart(chart, curve, { id: `${prefix}-probability-${k + 1}` }), `Predicted probability along ${curve.input}${chart.inputs.length > 1 ? ', the other inputs at their training medians' : ''}; rows at 1 (positive) and 0 (negative).`));
    });
    return out;
}
/** Notes above a classifier's charts: thinned rows and ROC curves, and inputs left without a curve (HTML; empty when none). */
function classifierChartNotes(chart) {
    const notes = [];
    if (chart.train.thinned)
        notes.push(`Training rows: ${chart.train.thinning}.`);
    if (chart.holdout.thinned)
        notes.push(`Hold-out rows: ${chart.holdout.thinning}.`);
    for (const [name, roc] of [
        ['training', chart.roc.train],
        ['hold-out', chart.roc.holdout],
    ]) {
        if (roc.thinned)
            notes.push(`The ${name} ROC curve: ${roc.fpr.length} of ${roc.points} points drawn, every vertex of its convex hull kept.`);
    }
    if ((chart.curvesLeftOut ?? 0) > 0)
        notes.push(`Probability curves of the first ${chart.curves.length} inputs; ${chart.curvesLeftOut} more left out.`);
    return notes.length ? `<p class="note">${notes.map(report_escape/* escapeHtml */.ZD).join(' ')}</p>` : '';
}

// EXTERNAL MODULE: ./src/report/wording.ts
var wording = __webpack_require__(5594);
// EXTERNAL MODULE: ./src/core/extremes.ts
var extremes = __webpack_require__(398);
;// CONCATENATED MODULE: ./src/report/svg/coefficient-bars.ts
/**
 * Standardised coefficients |w_j| sd(phi_j) / sd(y) as horizontal bars, one per non-intercept
 * design column, with the fail limit (dashed) and the warning limit (dotted) drawn across. A
 * positive coefficient is a filled bar, a negative one an outlined bar; bars over the fail limit
 * are vermillion. When sizes span three decades or more the axis is logarithmic.
 */






/** Most bars drawn; with more columns the largest are kept, in column order. */
const MAX_BARS = 60;
const BAR = 14;
const GAP = 4;
const LABEL_CHARS = 22;
function shorten(name) {
    return name.length <= LABEL_CHARS ? name : `${name.slice(0, LABEL_CHARS - 1)}…`;
}
/** Renders the coefficient bars of a model; null when it has no non-intercept column. */
function coefficientBarsChart(coef, options) {
    const { id } = options;
    const all = coef.columns.map((name, j) => ({ name, j, v: coef.values[j] }));
    if (all.length === 0)
        return null;
    let shown = all;
    if (all.length > MAX_BARS) {
        shown = [...all]
            .sort((a, b) => Math.abs(b.v ?? Infinity) - Math.abs(a.v ?? Infinity))
            .slice(0, MAX_BARS)
            .sort((a, b) => a.j - b.j);
    }
    const left = Math.min(170, 16 + (0,extremes/* maxOf */._)(shown.map((b) => shorten(b.name).length)) * 6.4);
    const height = Math.max(180, MARGIN.top + MARGIN.bottom + shown.length * (BAR + GAP) + GAP);
    const { x0, y0, x1, y1 } = plotArea(WIDTH, height, left);
    const sizes = shown.map((b) => (b.v === null ? null : Math.abs(b.v)));
    const finite = sizes.filter((v) => v !== null);
    const refs = [coef.limit, coef.warn].filter((v) => v !== null && v > 0);
    const top = (0,extremes/* maxOf */._)([...finite, ...refs], 1e-12);
    const positives = [...finite, ...refs].filter((v) => v > 0);
    const bottom = positives.length ? (0,extremes/* minOf */.H)(positives) : top;
    const log = top / bottom >= 1000;
    const sx = log
        ? logScale([10 ** Math.floor(Math.log10(bottom)), 10 ** Math.ceil(Math.log10(top * 1.05))], [x0, x1])
        : linearScale([0, top * 1.08], [x0, x1]);
    const base = log ? x0 : sx(0);
    const bars = [];
    const categories = [];
    shown.forEach((b, k) => {
        const y = y0 + GAP + k * (BAR + GAP);
        categories.push({ y: y + BAR / 2, label: shorten(b.name), full: b.name });
        const size = sizes[k];
        const over = size === null || (coef.limit !== null && size > coef.limit);
        const colour = over ? COLOURS.limit : COLOURS.train;
        const end = size === null ? x1 : Math.max(base + 1, Math.min(x1, sx(size)));
        const negative = b.v !== null && b.v < 0;
        const fill = negative ? '#ffffff' : colour;
        bars.push(`<rect class="bar" data-column="${(0,report_escape/* escapeHtml */.ZD)(b.name)}" x="${px(base)}" y="${px(y)}" width="${px(end - base)}" height="${BAR}" fill="${fill}" stroke="${colour}" stroke-width="1.4"><title>${(0,report_escape/* escapeHtml */.ZD)(`${b.name}: ${b.v === null ? 'not finite' : (0,format/* formatNumber */.Z)(b.v)}`)}</title></rect>`);
    });
    const lines = [];
    if (coef.warn !== null && coef.warn > 0) {
        lines.push(`<line class="warn" x1="${px(sx(coef.warn))}" y1="${y0}" x2="${px(sx(coef.warn))}" y2="${y1}" stroke="${COLOURS.warn}" stroke-width="1.6" stroke-dasharray="${DASHES.warn}"/>`);
    }
    if (coef.limit !== null && coef.limit > 0) {
        lines.push(`<line class="limit" x1="${px(sx(coef.limit))}" y1="${y0}" x2="${px(sx(coef.limit))}" y2="${y1}" stroke="${COLOURS.limit}" stroke-width="1.8" stroke-dasharray="${DASHES.limit}"/>`);
    }
    const legend = [
        { mark: `<rect x="1" y="3" width="12" height="8" fill="${COLOURS.train}"/>`, label: 'positive' },
        { mark: `<rect x="1" y="3" width="12" height="8" fill="#fff" stroke="${COLOURS.train}" stroke-width="1.4"/>`, label: 'negative' },
    ];
    if (coef.limit !== null)
        legend.push({ mark: legendLine(COLOURS.limit, DASHES.limit, 1.8), label: `fail limit ${(0,format/* formatNumber */.Z)(coef.limit)}` });
    if (coef.warn !== null)
        legend.push({ mark: legendLine(COLOURS.warn, DASHES.warn, 1.6), label: `warning ${(0,format/* formatNumber */.Z)(coef.warn)}` });
    const overCount = sizes.filter((v) => v === null || (coef.limit !== null && v > coef.limit)).length;
    const largest = finite.length ? (0,extremes/* maxOf */._)(finite) : Number.NaN;
    return frame_frame({
        id,
        kind: 'coefficients',
        title: 'Standardised coefficients',
        desc: `Size of the standardised coefficient |w| sd(column) / sd(target) of ${shown.length}${shown.length < all.length ? ` (the largest) of ${all.length}` : ''} design columns${log ? ' on a log scale' : ''}; largest ${(0,format/* formatNumber */.Z)(largest)}` +
            `${coef.limit !== null ? `; fail limit ${(0,format/* formatNumber */.Z)(coef.limit)}, ${overCount} ${overCount === 1 ? 'column' : 'columns'} over it` : '; no fail limit'}.`,
        x: sx,
        y: linearScale([0, 1], [y1, y0]),
        xLabel: `|standardised coefficient|${log ? ' (log scale)' : ''}`,
        yLabel: '',
        body: `${bars.join('')}${lines.join('')}`,
        legend,
        height,
        left,
        yCategories: categories,
        data: { bars: shown.length, columns: all.length, over: overCount },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/cv-curve.ts
/**
 * The cross-validation curve over the complexity sweep: cross-validated RMSE (solid line with
 * diamonds) and training RMSE (dashed line with small circles, when the sweep has it) at each
 * setting, with the descriptor's chosen setting (solid vertical line) and the suggested setting
 * (dashed vertical line) marked and labelled.
 */






const DIAMOND = 4;
/** Renders the cross-validation curve of a complexity sweep. */
function cvCurveChart(sweep, options) {
    const { id } = options;
    const { x0, y0, x1, y1 } = plotArea();
    // On a log axis a setting of 0 (no penalty) sits one decade left of the smallest positive setting, labelled 0.
    const positives = sweep.settings.filter((v) => v > 0);
    const zeroAt = sweep.log && positives.length ? (0,extremes/* minOf */.H)(positives) / 10 : 0;
    const s = sweep.settings.map((v) => (sweep.log && v <= 0 ? zeroAt : v));
    const xDomain = [s[0], s[s.length - 1]];
    const sx = sweep.log ? logScale(xDomain, [x0 + 8, x1 - 8]) : linearScale(s.length > 1 ? xDomain : pad(xDomain), [x0 + 8, x1 - 8]);
    const hasZero = sweep.log && sweep.settings.some((v) => v <= 0);
    if (hasZero) {
        const kept = sx.ticks.filter((t) => t > zeroAt * 3);
        sx.ticks.length = 0;
        sx.ticks.push(zeroAt);
        for (const t of kept)
            sx.ticks.push(t);
    }
    const yRange = extent(sweep.cv, sweep.train ?? []) ?? [0, 1];
    const yLog = yRange[0] > 0 && yRange[1] / yRange[0] >= 100;
    const sy = yLog
        ? logScale([10 ** Math.floor(Math.log10(yRange[0])), 10 ** Math.ceil(Math.log10(yRange[1]))], [y1, y0])
        : linearScale(pad(yRange, 0.08), [y1, y0]);
    const plotX = (v) => (v === null ? null : sweep.log && v <= 0 ? zeroAt : v);
    const body = [];
    const overlay = [];
    const marker = (value, label, dash, row) => {
        const at = plotX(value);
        if (value === null || at === null)
            return;
        const x = sx(at);
        const p = px(x);
        body.push(`<line class="marker" data-marker="${label}" x1="${p}" y1="${y0}" x2="${p}" y2="${y1}" stroke="${COLOURS.curve}" stroke-width="1.4"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`);
        const right = x > (x0 + x1) / 2;
        overlay.push(`<text x="${p}" y="${y0 + 13 + 14 * row}" dx="${right ? -4 : 4}" text-anchor="${right ? 'end' : 'start'}" font-size="11" fill="#222" paint-order="stroke" stroke="#fff" stroke-width="3">${(0,report_escape/* escapeHtml */.ZD)(`${label} ${(0,format/* formatNumber */.Z)(value)}`)}</text>`);
    };
    marker(sweep.chosen, 'chosen', null, 0);
    if (sweep.suggested !== null && sweep.suggested !== sweep.chosen)
        marker(sweep.suggested, 'suggested', DASHES.suggested, 1);
    if (sweep.train) {
        body.push(`<path class="train" d="${linePath(s, sweep.train, sx, sy)}" fill="none" stroke="${COLOURS.train}" stroke-width="1.6" stroke-dasharray="${DASHES.reference}"/>`);
        body.push(`<g fill="${COLOURS.train}">${s.map((v, i) => (sweep.train?.[i] == null ? '' : `<circle cx="${px(sx(v))}" cy="${px(sy(sweep.train[i]))}" r="2.4"/>`)).join('')}</g>`);
    }
    body.push(`<path class="cv" d="${linePath(s, sweep.cv, sx, sy)}" fill="none" stroke="${COLOURS.holdout}" stroke-width="2"/>`);
    body.push(`<g fill="#ffffff" stroke="${COLOURS.holdout}" stroke-width="1.6">${s
        .map((v, i) => {
        const c = sweep.cv[i];
        if (c === null)
            return '';
        const x = sx(v);
        const y = sy(c);
        return `<path d="M${px(x)} ${px(y - DIAMOND)}L${px(x + DIAMOND)} ${px(y)}L${px(x)} ${px(y + DIAMOND)}L${px(x - DIAMOND)} ${px(y)}Z"/>`;
    })
        .join('')}</g>`);
    let best = -1;
    sweep.cv.forEach((c, i) => {
        if (c !== null && (best < 0 || c < sweep.cv[best]))
            best = i;
    });
    const legend = [
        {
            mark: `${legendLine(COLOURS.holdout)}<path d="M7 3L11 7L7 11L3 7Z" fill="#fff" stroke="${COLOURS.holdout}" stroke-width="1.4"/>`,
            label: 'cross-validated RMSE',
        },
    ];
    if (sweep.train)
        legend.push({ mark: legendLine(COLOURS.train, DASHES.reference, 1.6), label: 'training RMSE' });
    if (sweep.chosen !== null)
        legend.push({ mark: legendLine(COLOURS.curve, undefined, 1.4), label: 'chosen' });
    if (sweep.suggested !== null && sweep.suggested !== sweep.chosen)
        legend.push({ mark: legendLine(COLOURS.curve, DASHES.suggested, 1.4), label: 'suggested' });
    return frame_frame({
        id,
        kind: 'cv-curve',
        title: `Cross-validated error over ${sweep.parameter}`,
        desc: `Cross-validated RMSE at ${s.length} settings of ${sweep.parameter} from ${(0,format/* formatNumber */.Z)(sweep.settings[0])} to ${(0,format/* formatNumber */.Z)(sweep.settings[s.length - 1])}${sweep.log ? ' (log scale)' : ''}` +
            `${best >= 0 ? `; lowest ${(0,format/* formatNumber */.Z)(sweep.cv[best])} at ${(0,format/* formatNumber */.Z)(sweep.settings[best])}` : ''}` +
            `${sweep.chosen !== null ? `; the descriptor's setting is ${(0,format/* formatNumber */.Z)(sweep.chosen)}` : ''}` +
            `${sweep.suggested !== null ? `; suggested ${(0,format/* formatNumber */.Z)(sweep.suggested)}` : ''}.`,
        x: sx,
        y: sy,
        xLabel: `${sweep.parameter}${sweep.log ? ' (log scale)' : ''}`,
        yLabel: `cross-validated RMSE${yLog ? ' (log scale)' : ''}`,
        xTickLabel: hasZero ? (v) => (v === zeroAt ? '0' : null) : undefined,
        body: body.join(''),
        overlay: overlay.join(''),
        legend,
        data: { settings: s.length },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/base-curve.ts

/** Colour of the base commit's curve: mid grey #6e6e6e (reads in greyscale; the dash tells it apart). */
const BASE_CURVE_COLOUR = '#6e6e6e';
/** Dash pattern of the base commit's curve. */
const BASE_CURVE_DASH = '5 4';
/** Legend label of the base commit's curve. */
const BASE_CURVE_LABEL = 'base commit';
/** The dashed path of the base curve (class `base-curve`, `data-commit` the short SHA). */
function baseCurvePath(base, sx, sy) {
    return `<path class="base-curve" data-commit="${shortSha(base.commit)}" d="${linePath(base.x, base.y, sx, sy)}" fill="none" stroke="${BASE_CURVE_COLOUR}" stroke-width="1.8" stroke-dasharray="${BASE_CURVE_DASH}" stroke-linejoin="round"/>`;
}
/** The legend entry of the base curve. */
function baseCurveLegend() {
    return {
        mark: `<line x1="0" y1="7" x2="14" y2="7" stroke="${BASE_CURVE_COLOUR}" stroke-width="1.8" stroke-dasharray="${BASE_CURVE_DASH}"/>`,
        label: BASE_CURVE_LABEL,
    };
}
/** One sentence for the chart's description. */
function baseCurveNote(base) {
    return ` The dashed grey line is the same model fitted on the base commit ${shortSha(base.commit)}.`;
}
/** The first 7 hexadecimal digits of a SHA (other characters dropped, so it is safe in markup). */
function shortSha(commit) {
    return commit.replace(/[^0-9a-f]/gi, '').slice(0, 7);
}

;// CONCATENATED MODULE: ./src/report/svg/spike-marks.ts
/**
 * Spike marks on a curve chart: the intervals between neighbouring training values where the curve
 * varies more than the `swing-spikes` limit allows (chart data `spikes`, run/chart-data.ts), drawn
 * as solid bars along the top edge of the plot area over each interval, so that they read apart
 * from the hatched band regions (which span the whole height) without resting on colour alone.
 */


/** Bar colour: Okabe–Ito bluish green #009E73 (apart from the band's and the regions' colours). */
const SPIKE_COLOUR = '#009E73';
/** Height of a spike bar in px. */
const spike_marks_BAR = 7;
/** Intervals named in the text alternative, at most. */
const NAMED = 5;
/**
 * The bars (a `<g class="spikes">` with one `<rect class="spike">` per interval, each at least
 * 2 px wide), or an empty string when there are none.
 * @param spikes the curve's spike marks (absent: none)
 * @param sx the x scale
 * @param top the plot area's top edge in px
 */
function spikeBars(spikes, sx, top) {
    if (spikes === undefined || spikes.intervals.length === 0)
        return '';
    const bars = spikes.intervals.map((s) => {
        const a = sx(s.from);
        const b = sx(s.to);
        return `<rect class="spike" data-from="${s.from}" data-to="${s.to}" x="${px(a)}" y="${top}" width="${px(Math.max(2, b - a))}" height="${spike_marks_BAR}"/>`;
    });
    return `<g class="spikes" data-count="${spikes.intervals.length}" fill="${SPIKE_COLOUR}">${bars.join('')}</g>`;
}
/** Legend picture of a spike bar. */
const LEGEND_SPIKE = `<rect x="0" y="0" width="14" height="${spike_marks_BAR}" fill="${SPIKE_COLOUR}"/>`;
/** Legend label of the spike bars. */
function spikeLegendLabel(spikes) {
    return `spikes (> ${(0,format/* formatNumber */.Z)(spikes.limit)}x)`;
}
/**
 * One sentence for the chart's text alternative (with a leading space): how many intervals spike
 * and the first few; an empty string when none do or the marks are absent.
 */
function spikeNote(spikes) {
    if (spikes === undefined || spikes.intervals.length === 0)
        return '';
    const count = spikes.intervals.length + (spikes.left_out ?? 0);
    const named = spikes.intervals
        .slice(0, NAMED)
        .map((s) => `${(0,format/* formatNumber */.Z)(s.from)} to ${(0,format/* formatNumber */.Z)(s.to)}`)
        .join('; ');
    const more = count > NAMED ? '; …' : '';
    return ` Bars along the top mark ${count} interval${count === 1 ? '' : 's'} between neighbouring training values where the curve varies more than ${(0,format/* formatNumber */.Z)(spikes.limit)} times what the data allow (${named}${more}).`;
}

;// CONCATENATED MODULE: ./src/report/svg/fit-curve.ts
/**
 * Chart of a model of one input: the fitted curve over the whole scanned range, the observed
 * target band, hatched stretches where the curve leaves the band, training rows as filled
 * circles and hold-out rows as hollow squares.
 */








/** How far past the data the y axis may reach to show a swinging curve, in data spans. */
const CURVE_HEADROOM = 0.6;
/**
 * Renders the fitted-curve chart.
 * @param chart the model's chart data (its `fit` must be set)
 * @param fit the curve (`chart.fit`)
 */
function fitCurveChart(chart, fit, options) {
    const { id } = options;
    const { x0, y0, x1, y1 } = plotArea();
    const trainX = chart.train.x[0] ?? [];
    const holdoutX = chart.holdout.x[0] ?? [];
    const xDomain = extent(fit.x, trainX, holdoutX, fit.base?.x ?? []) ?? [0, 1];
    const data = extent(chart.train.actual, chart.holdout.actual, fit.band) ?? [0, 1];
    const span = Math.max(data[1] - data[0], 1e-12);
    const curve = extent(fit.y, fit.base?.y ?? []) ?? data;
    const yDomain = pad([Math.max(curve[0], data[0] - CURVE_HEADROOM * span), Math.min(curve[1], data[1] + CURVE_HEADROOM * span)].map((v, i) => i === 0 ? Math.min(v, data[0]) : Math.max(v, data[1])));
    const sx = linearScale(xDomain, [x0, x1]);
    const sy = linearScale(yDomain, [y1, y0]);
    const body = [];
    const [blo, bhi] = fit.band;
    body.push(`<rect class="band" x="${x0}" y="${px(sy(bhi))}" width="${x1 - x0}" height="${px(Math.max(0, sy(blo) - sy(bhi)))}" fill="${COLOURS.band}"/>`, `<g stroke="${COLOURS.bandEdge}" stroke-width="1" stroke-dasharray="3 3"><line x1="${x0}" y1="${px(sy(bhi))}" x2="${x1}" y2="${px(sy(bhi))}"/><line x1="${x0}" y1="${px(sy(blo))}" x2="${x1}" y2="${px(sy(blo))}"/></g>`);
    const regions = fit.regions
        .map((r) => {
        const a = sx(r.from);
        const b = sx(r.to);
        return `<rect class="region" data-side="${r.side}" x="${px(a)}" y="${y0}" width="${px(Math.max(1.5, b - a))}" height="${y1 - y0}" fill="url(#${id}-hatch)"/>`;
    })
        .join('');
    body.push(`<g class="regions" data-count="${fit.regions.length}">${regions}</g>`, spikeBars(fit.spikes, sx, y0));
    // Training range edges: the curve past them is extrapolation.
    body.push(`<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(fit.range[0]))}" y1="${y0}" x2="${px(sx(fit.range[0]))}" y2="${y1}"/><line x1="${px(sx(fit.range[1]))}" y1="${y0}" x2="${px(sx(fit.range[1]))}" y2="${y1}"/></g>`);
    if (fit.base)
        body.push(baseCurvePath(fit.base, sx, sy));
    body.push(`<path class="curve" d="${linePath(fit.x, fit.y, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`);
    const a = marks('train', trainX, chart.train.actual, sx, sy);
    const b = marks('holdout', holdoutX, chart.holdout.actual, sx, sy);
    body.push(a.markup, b.markup);
    const legend = [
        { mark: LEGEND_TRAIN, label: 'training' },
        { mark: LEGEND_HOLDOUT, label: 'hold-out' },
        { mark: legendLine(COLOURS.curve), label: 'fitted' },
        { mark: LEGEND_BAND, label: 'observed band' },
    ];
    if (fit.regions.length > 0)
        legend.push({ mark: legendRegion(id), label: 'leaves band' });
    if (fit.spikes && fit.spikes.intervals.length > 0)
        legend.push({ mark: LEGEND_SPIKE, label: spikeLegendLabel(fit.spikes) });
    if (fit.base)
        legend.push(baseCurveLegend());
    const where = fit.regions.length
        ? ` The curve leaves the band ${fit.regions.map((r) => `${r.side} it from ${(0,format/* formatNumber */.Z)(r.from)} to ${(0,format/* formatNumber */.Z)(r.to)}`).join('; ')}.`
        : ' The curve stays inside the band.';
    const desc = `Fitted ${chart.target} against ${fit.input} from ${(0,format/* formatNumber */.Z)(fit.x[0])} to ${(0,format/* formatNumber */.Z)(fit.x[fit.x.length - 1])} ` +
        `(training range ${(0,format/* formatNumber */.Z)(fit.range[0])} to ${(0,format/* formatNumber */.Z)(fit.range[1])}), with ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares. ` +
        `Observed target band ${(0,format/* formatNumber */.Z)(blo)} to ${(0,format/* formatNumber */.Z)(bhi)}.${where}${spikeNote(fit.spikes)}${fit.base ? baseCurveNote(fit.base) : ''}${pointNote(chart.train, chart.holdout, a, b)}`;
    return frame_frame({
        id,
        kind: 'fit-curve',
        title: `Fitted curve: ${chart.target} against ${fit.input}`,
        desc,
        x: sx,
        y: sy,
        xLabel: (0,units/* axisLabel */.M)(fit.input),
        yLabel: (0,units/* axisLabel */.M)(chart.target),
        body: body.join(''),
        legend,
        data: {
            ...pointData(chart.train, chart.holdout, a, b),
            regions: fit.regions.length,
            source: fit.source,
            ...(fit.spikes ? { spikes: fit.spikes.intervals.length } : {}),
        },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/partial-curve.ts
/**
 * A partial curve of a model of several inputs: the prediction along one input with every other
 * input held at its training median, over the input's training range and a margin, with the
 * training values of the input as a rug of ticks under the curve.
 */







/**
 * Renders one partial curve.
 * @param chart the model's chart data
 * @param curve one entry of `chart.partials`
 */
function partialCurveChart(chart, curve, options) {
    const { id } = options;
    const { x0, y0, x1, y1 } = plotArea();
    const c = chart.inputs.indexOf(curve.input);
    const rug = c >= 0 ? chart.train.x[c] : [];
    const sx = linearScale(extent(curve.x, rug, curve.base?.x ?? []) ?? [0, 1], [x0, x1]);
    const sy = linearScale(pad(extent(curve.y, chart.train.actual, curve.base?.y ?? []) ?? [0, 1]), [y1, y0]);
    const ticks = [];
    for (const v of rug)
        if (v !== null)
            ticks.push(`M${px(sx(v))} ${y1}v-7`);
    const body = [
        `<g stroke="${COLOURS.reference}" stroke-width="1" stroke-dasharray="1 3"><line x1="${px(sx(curve.range[0]))}" y1="${y0}" x2="${px(sx(curve.range[0]))}" y2="${y1}"/><line x1="${px(sx(curve.range[1]))}" y1="${y0}" x2="${px(sx(curve.range[1]))}" y2="${y1}"/></g>`,
        `<path class="rug" d="${ticks.join('')}" stroke="${COLOURS.train}" stroke-opacity="0.55" stroke-width="1"/>`,
        curve.base ? baseCurvePath(curve.base, sx, sy) : '',
        `<path class="curve" d="${linePath(curve.x, curve.y, sx, sy)}" fill="none" stroke="${COLOURS.curve}" stroke-width="2" stroke-linejoin="round"/>`,
        spikeBars(curve.spikes, sx, y0),
    ].join('');
    const others = Object.entries(curve.others)
        .map(([k, v]) => `${k} = ${(0,format/* formatNumber */.Z)(v)}`)
        .join(', ');
    return frame_frame({
        id,
        kind: 'partial-curve',
        title: `Partial curve: ${chart.target} along ${curve.input}`,
        desc: `Predicted ${chart.target} as ${curve.input} runs from ${(0,format/* formatNumber */.Z)(curve.x[0])} to ${(0,format/* formatNumber */.Z)(curve.x[curve.x.length - 1])} (training range ${(0,format/* formatNumber */.Z)(curve.range[0])} to ${(0,format/* formatNumber */.Z)(curve.range[1])}, dotted lines), with the other inputs at their training medians${others ? ` (${others})` : ''}. Ticks along the bottom mark the training values of ${curve.input}.${spikeNote(curve.spikes)}${curve.base ? baseCurveNote(curve.base) : ''}`,
        x: sx,
        y: sy,
        xLabel: (0,units/* axisLabel */.M)(curve.input),
        yLabel: `predicted ${(0,units/* axisLabel */.M)(chart.target)}`,
        body,
        legend: [
            { mark: legendLine(COLOURS.curve), label: 'predicted, others at medians' },
            { mark: `<path d="M3 12V5M7 12V5M11 12V5" stroke="${COLOURS.train}" stroke-width="1"/>`, label: 'training values' },
            ...(curve.spikes && curve.spikes.intervals.length > 0 ? [{ mark: LEGEND_SPIKE, label: spikeLegendLabel(curve.spikes) }] : []),
            ...(curve.base ? [baseCurveLegend()] : []),
        ],
        data: { input: curve.input, 'rug-count': ticks.length, ...(curve.spikes ? { spikes: curve.spikes.intervals.length } : {}) },
    });
}

;// CONCATENATED MODULE: ./src/report/svg/predicted-actual.ts





/** Renders the predicted-against-actual chart of a model. */
function predictedActualChart(chart, options) {
    const { id } = options;
    const { x0, y0, x1, y1 } = plotArea();
    const domain = pad(extent(chart.train.actual, chart.holdout.actual, chart.train.fitted, chart.holdout.fitted) ?? [0, 1]);
    const sx = linearScale(domain, [x0, x1]);
    const sy = linearScale(domain, [y1, y0]);
    const a = marks('train', chart.train.actual, chart.train.fitted, sx, sy);
    const b = marks('holdout', chart.holdout.actual, chart.holdout.fitted, sx, sy);
    const body = [
        `<line class="identity" x1="${px(sx(domain[0]))}" y1="${px(sy(domain[0]))}" x2="${px(sx(domain[1]))}" y2="${px(sy(domain[1]))}" stroke="${COLOURS.reference}" stroke-width="1.2" stroke-dasharray="${DASHES.reference}"/>`,
        a.markup,
        b.markup,
    ].join('');
    const label = (0,units/* axisLabel */.M)(chart.target);
    return frame_frame({
        id,
        kind: 'predicted-actual',
        title: `Predicted against actual ${chart.target}`,
        desc: `Predicted ${chart.target} (vertical) against the observed value (horizontal) for ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares; points on the dashed line y = x are predicted exactly. Hold-out points far from the line while training points sit on it show overfitting.${pointNote(chart.train, chart.holdout, a, b)}`,
        x: sx,
        y: sy,
        xLabel: `actual ${label}`,
        yLabel: `predicted ${label}`,
        body,
        legend: [
            { mark: LEGEND_TRAIN, label: 'training' },
            { mark: LEGEND_HOLDOUT, label: 'hold-out' },
            { mark: legendLine(COLOURS.reference, DASHES.reference, 1.2), label: 'y = x' },
        ],
        data: pointData(chart.train, chart.holdout, a, b),
    });
}

;// CONCATENATED MODULE: ./src/report/svg/residuals.ts





/** Renders the residuals-against-fitted chart of a model. */
function residualsChart(chart, options) {
    const { id } = options;
    const { x0, y0, x1, y1 } = plotArea();
    const sx = linearScale(pad(extent(chart.train.fitted, chart.holdout.fitted) ?? [0, 1]), [x0, x1]);
    const r = extent(chart.train.residual, chart.holdout.residual, [0]) ?? [-1, 1];
    const m = Math.max(Math.abs(r[0]), Math.abs(r[1])) || 1;
    const sy = linearScale(pad([-m, m]), [y1, y0]);
    const a = marks('train', chart.train.fitted, chart.train.residual, sx, sy);
    const b = marks('holdout', chart.holdout.fitted, chart.holdout.residual, sx, sy);
    const body = [
        `<line class="zero" x1="${x0}" y1="${px(sy(0))}" x2="${x1}" y2="${px(sy(0))}" stroke="${COLOURS.reference}" stroke-width="1.2"/>`,
        a.markup,
        b.markup,
    ].join('');
    const label = (0,units/* axisLabel */.M)(chart.target);
    return frame_frame({
        id,
        kind: 'residuals',
        title: `Residuals against fitted ${chart.target}`,
        desc: `Residual (actual minus fitted ${chart.target}) against the fitted value for ${a.drawn} training rows as filled circles and ${b.drawn} hold-out rows as hollow squares. Hold-out residuals much wider than training residuals show overfitting; a pattern in either shows a missing term.${pointNote(chart.train, chart.holdout, a, b)}`,
        x: sx,
        y: sy,
        xLabel: `fitted ${label}`,
        yLabel: `residual ${label}`,
        body,
        legend: [
            { mark: LEGEND_TRAIN, label: 'training' },
            { mark: LEGEND_HOLDOUT, label: 'hold-out' },
            { mark: legendLine(COLOURS.reference, undefined, 1.2), label: 'zero' },
        ],
        data: pointData(chart.train, chart.holdout, a, b),
    });
}

// EXTERNAL MODULE: ./src/report/target-scale-text.ts
var target_scale_text = __webpack_require__(764);
;// CONCATENATED MODULE: ./src/report/html.ts
/**
 * The HTML report: one self-contained page (inline CSS and SVG, no script, no network; a
 * content security policy forbids any fetch) with the verdict, an overview table of every model
 * and, per model, its checks and charts. Prints one model per page. Every text from the
 * repository is escaped with {@link escapeHtml}; charts come from the pipeline's chart data
 * (`ModelResult.charts`), so nothing here computes a figure.
 */















const MARK = { pass: 'pass', warn: 'WARN', fail: 'FAIL', error: 'ERROR', skipped: 'skipped' };
/** Name of the file `--html DIR` writes into DIR. */
const HTML_FILE = 'index.html';
const CSS = `
:root{--ink:#1f2328;--muted:#5b636b;--rule:#d8dadc;--paper:#fcfcfa;--card:#ffffff;--pass:#007a5a;--warn:#8a5f00;--fail:#b34700;--error:#7a1f5c}
*{box-sizing:border-box}
html{background:var(--paper);color:var(--ink);font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,"Noto Sans","Liberation Sans",sans-serif}
body{margin:0 auto;max-width:1200px;padding:28px 24px 48px}
h1{font-size:1.55rem;font-weight:600;margin:0 0 4px}
h2{font-size:1.2rem;font-weight:600;margin:0}
h3{font-size:1rem;font-weight:600;margin:18px 0 8px}
p{margin:6px 0}
.muted{color:var(--muted)}
code{font:0.92em ui-monospace,"SFMono-Regular",Menlo,Consolas,"Liberation Mono",monospace;overflow-wrap:anywhere}
.verdict{font-size:1.05rem;margin:10px 0 22px}
.badge{display:inline-block;min-width:4.2em;text-align:center;font-size:.78rem;font-weight:700;letter-spacing:.04em;padding:1px 7px;border:1.5px solid currentColor;border-radius:3px;vertical-align:.1em}
.badge.pass{color:var(--pass)}.badge.warn{color:var(--warn);border-style:dashed}.badge.fail{color:var(--fail);border-width:2.5px}.badge.error{color:var(--error);border-style:double;border-width:3px}.badge.skipped{color:var(--muted);border-style:dotted}
table{border-collapse:collapse;width:100%;background:var(--card)}
th,td{padding:6px 10px;border-bottom:1px solid var(--rule);text-align:left;vertical-align:top}
th{font-size:.82rem;font-weight:600;color:var(--muted);border-bottom:1.5px solid #b9bdc1}
td.num,th.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
.overview a{color:inherit}
section.model{margin-top:34px;padding:20px 22px 22px;background:var(--card);border:1px solid var(--rule);border-radius:6px}
section.model header{display:flex;gap:12px;align-items:baseline;flex-wrap:wrap}
.facts{display:flex;gap:22px;flex-wrap:wrap;margin:8px 0 4px;color:var(--muted);font-size:.92rem}
.facts b{color:var(--ink);font-weight:600}
.checks td.finding{min-width:18em}
.advice{color:var(--muted)}
.charts{display:grid;grid-template-columns:repeat(auto-fill,minmax(460px,1fr));gap:18px 22px;margin-top:10px}
figure{margin:0;padding:10px 10px 6px;border:1px solid var(--rule);border-radius:4px;background:#fff}
figure.wide{grid-column:1/-1}
figure svg{display:block;width:100%;height:auto;font-family:inherit}
figcaption{font-size:.84rem;color:var(--muted);margin-top:4px}
.note{border-left:3px solid var(--rule);padding:2px 10px;color:var(--muted)}
.error-text{border-left:3px solid var(--error);padding:4px 10px}
footer{margin-top:40px;font-size:.82rem;color:var(--muted)}
@media (max-width:560px){.charts{grid-template-columns:1fr}body{padding:14px}}
@media print{
 html{background:#fff;font-size:10pt}
 body{max-width:none;padding:0}
 *{-webkit-print-color-adjust:exact;print-color-adjust:exact}
 section.model{break-before:page;border:none;padding:0;margin-top:0}
 figure{break-inside:avoid}
 tr{break-inside:avoid}
 .charts{grid-template-columns:1fr 1fr}
 .overview a{text-decoration:none}
 footer{display:none}
}
`;
function html_num(v) {
    if (v === null || v === undefined)
        return '–';
    return (0,report_escape/* escapeHtml */.ZD)((0,format/* formatNumber */.Z)((0,result_result/* fromJsonNumber */.M)(v)));
}
function badge(status) {
    return `<span class="badge ${(0,report_escape/* escapeHtml */.ZD)(status)}">${(0,report_escape/* escapeHtml */.ZD)(MARK[status] ?? status)}</span>`;
}
function verdictText(result) {
    return `${badge(result.verdict)} ${(0,report_escape/* escapeHtml */.ZD)((0,wording/* verdictHeadline */.ge)(result))} <span class="muted">(${(0,report_escape/* escapeHtml */.ZD)((0,wording/* countsText */.WN)(result.counts))})</span>`;
}
function overviewRow(m, i) {
    const x = m.metrics;
    const over = m.checks.filter((c) => c.status === 'fail' || c.status === 'warn').map((c) => `<code>${(0,report_escape/* escapeHtml */.ZD)(c.id)}</code>`);
    return (`<tr><td>${badge(m.verdict)}</td><td><a href="#model-${i + 1}">${(0,report_escape/* escapeHtml */.ZD)(m.name)}</a>${(0,report_escape/* escapeHtml */.ZD)((0,model_kind/* kindMark */.w6)(m))}</td>` +
        `<td class="num">${m.rows.train}</td><td class="num">${m.rows.holdout}</td><td class="num">${(0,report_escape/* escapeHtml */.ZD)((0,model_kind/* parametersText */.Or)(m))}</td>` +
        `<td class="num">${html_num(x?.holdout_rmse)}</td><td class="num">${html_num(x?.gap_ratio)}</td><td class="num">${html_num(x?.max_std_coefficient)}</td>` +
        `<td>${m.error ? 'could not be checked' : over.length ? over.join(', ') : '–'}</td></tr>`);
}
/** The overview table, one piece per row. */
function* overview(result) {
    yield '<section class="overview" aria-labelledby="overview-title"><h2 id="overview-title">Models</h2>' +
        '<table><thead><tr><th>Status</th><th>Model</th><th class="num">Training rows</th><th class="num">Hold-out rows</th><th class="num">Parameters</th>' +
        '<th class="num">Hold-out RMSE</th><th class="num">Gap ratio</th><th class="num">Max std. coef.</th><th>Over a limit</th></tr></thead>' +
        '<tbody>';
    for (let i = 0; i < result.models.length; i++)
        yield overviewRow(result.models[i], i);
    yield '</tbody></table></section>';
}
function checksTable(m) {
    const rows = m.checks.map((c) => {
        const title = (0,checks/* findCheck */.Sd)(c.id)?.title ?? c.id;
        const advice = c.advice ? ` <span class="advice">${(0,report_escape/* escapeHtml */.ZD)(c.advice)}</span>` : '';
        const suggestion = c.suggestion
            ? ` <span class="advice">Suggestion (line ${c.suggestion.line}): ${(0,report_escape/* escapeHtml */.ZD)(c.suggestion.text)}</span>`
            : '';
        return (`<tr data-check="${(0,report_escape/* escapeHtml */.ZD)(c.id)}" data-status="${(0,report_escape/* escapeHtml */.ZD)(c.status)}"><td>${(0,report_escape/* escapeHtml */.ZD)(title)}<br><code class="muted">${(0,report_escape/* escapeHtml */.ZD)(c.id)}</code></td><td>${badge(c.status)}</td>` +
            `<td class="num">${html_num(c.value)}</td><td class="num">${(0,report_escape/* escapeHtml */.ZD)((0,wording/* limitText */.PW)(c))}</td><td class="num">${c.line}</td>` +
            `<td class="finding">${(0,report_escape/* escapeHtml */.ZD)(c.message)}.${advice}${suggestion}</td></tr>`);
    });
    return ('<table class="checks"><thead><tr><th>Check</th><th>Status</th><th class="num">Value</th><th class="num">Limit</th><th class="num">Line</th><th>Finding</th></tr></thead>' +
        `<tbody>${rows.join('')}</tbody></table>`);
}
function html_figure(svg, caption, wide = false) {
    return `<figure${wide ? ' class="wide"' : ''}>${svg}<figcaption>${(0,report_escape/* escapeHtml */.ZD)(caption)}</figcaption></figure>`;
}
/** The charts of one model, in reading order. */
function charts(chart, prefix) {
    const out = [];
    // Left without points by the run's chart data: only the sweep and the coefficients.
    const points = chart.no_points === undefined;
    if (points && chart.fit) {
        out.push(html_figure(fitCurveChart(chart, chart.fit, { id: `${prefix}-fit` }), 'The fitted curve over the scanned range (dotted lines: the training range). A curve that leaves the observed band between the samples is chasing noise.'));
    }
    else if (points) {
        out.push(html_figure(predictedActualChart(chart, { id: `${prefix}-pa` }), 'Predicted against actual values; hold-out points far from the dashed line while training points sit on it show overfitting.'));
    }
    if (points)
        out.push(html_figure(residualsChart(chart, { id: `${prefix}-res` }), 'Residuals against fitted values.'));
    chart.partials.forEach((curve, k) => {
        out.push(html_figure(partialCurveChart(chart, curve, { id: `${prefix}-partial-${k + 1}` }), `Partial curve along ${curve.input}, the other inputs at their training medians.`));
    });
    if (chart.sweep) {
        out.push(html_figure(cvCurveChart(chart.sweep, { id: `${prefix}-cv` }), 'Cross-validated error over the complexity sweep.'));
    }
    const bars = coefficientBarsChart(chart.coefficients, { id: `${prefix}-coef` });
    if (bars)
        out.push(html_figure(bars, 'Standardised coefficients: the change in the prediction, in target standard deviations, for one standard deviation of each column.'));
    return out;
}
function modelSection(m, index) {
    const id = `model-${index + 1}`;
    const parts = [];
    parts.push(`<section class="model" id="${id}" data-model="${(0,report_escape/* escapeHtml */.ZD)(m.name)}" data-verdict="${(0,report_escape/* escapeHtml */.ZD)(m.verdict)}" aria-labelledby="${id}-name">`, `<header>${badge(m.verdict)}<h2 id="${id}-name">${(0,report_escape/* escapeHtml */.ZD)(m.name)}</h2><code class="muted">${(0,report_escape/* escapeHtml */.ZD)(m.descriptor)}</code></header>`);
    if (m.error) {
        const where = m.error.file ? `${(0,report_escape/* escapeHtml */.ZD)(m.error.file)}${m.error.line ? ` line ${m.error.line}` : ''}: ` : '';
        parts.push(`<p class="error-text">Could not be checked. ${where}${(0,report_escape/* escapeHtml */.ZD)(m.error.message)}</p></section>`);
        return parts.join('');
    }
    const x = m.metrics;
    parts.push(`<p class="facts"><span>training rows <b>${m.rows.train}</b></span><span>hold-out rows <b>${m.rows.holdout}</b></span><span>parameters <b>${(0,report_escape/* escapeHtml */.ZD)((0,model_kind/* parametersText */.Or)(m))}</b></span>` +
        `<span>training RMSE <b>${html_num(x?.train_rmse)}</b></span><span>hold-out RMSE <b>${html_num(x?.holdout_rmse)}</b></span><span>gap ratio <b>${html_num(x?.gap_ratio)}</b></span></p>`);
    // A classifier's facts are its log-loss, AUC and calibration slope instead.
    if (x?.task === 'classification')
        parts[parts.length - 1] = classifierFacts(m);
    const kind = (0,model_kind/* kindLine */.J0)(m);
    if (kind !== null)
        parts.push(`<p class="note" data-kind="predictions">${(0,report_escape/* escapeHtml */.ZD)(kind)}</p>`);
    const refit = (0,refit_compare/* refitCompareLine */.C)(m);
    if (refit !== null)
        parts.push(`<p class="note" data-refit-compare>${(0,report_escape/* escapeHtml */.ZD)(refit)}</p>`);
    const scale = (0,target_scale_text/* targetScaleSentence */.tt)(m);
    if (scale !== null) {
        const head = target_scale_text/* TARGET_SCALE_HEADINGS */.x8.map((h, j) => `<th${j > 0 ? ' class="num"' : ''}>${(0,report_escape/* escapeHtml */.ZD)(h)}</th>`).join('');
        const body = (0,target_scale_text/* targetScaleRows */.rY)(m)
            .map((row) => `<tr>${row.map((c, j) => `<td${j > 0 ? ' class="num"' : ''}>${(0,report_escape/* escapeHtml */.ZD)(c)}</td>`).join('')}</tr>`)
            .join('');
        parts.push(`<p class="note">${(0,report_escape/* escapeHtml */.ZD)(scale)}.</p><table class="target-scale"><thead><tr>${head}</tr></thead><tbody>${body}</tbody></table>`);
    }
    parts.push('<h3>Checks</h3>', checksTable(m));
    if (m.classifier_charts) {
        const list = classifierCharts(m.classifier_charts, id);
        parts.push('<h3>Charts</h3>', classifierChartNotes(m.classifier_charts));
        parts.push(`<div class="charts" data-charts="${list.length}">${list.join('')}</div>`);
    }
    else if (m.charts) {
        const list = charts(m.charts, id);
        const thinned = [m.charts.train, m.charts.holdout].filter((s) => s.thinned);
        parts.push(`<h3>Charts</h3>`);
        if (m.charts.no_points !== undefined)
            parts.push(`<p class="note" data-no-points>${(0,report_escape/* escapeHtml */.ZD)(`Rows and curves: ${m.charts.no_points}.`)}</p>`);
        else if (thinned.length)
            parts.push(`<p class="note">${thinned.map((s) => (0,report_escape/* escapeHtml */.ZD)(`${s === m.charts?.train ? 'Training' : 'Hold-out'} rows: ${s.thinning}.`)).join(' ')}</p>`);
        const leftOut = m.charts.partialsLeftOut ?? 0;
        if (leftOut > 0)
            parts.push(`<p class="note">${(0,report_escape/* escapeHtml */.ZD)(`Partial curves of the first ${m.charts.partials.length} inputs; ${leftOut} more left out.`)}</p>`);
        parts.push(`<div class="charts" data-charts="${list.length}">${list.join('')}</div>`);
    }
    else {
        parts.push('<p class="note">No chart data in this result.</p>');
    }
    parts.push('</section>');
    return parts.join('');
}
/**
 * The HTML page in pieces (the head, each overview row, each model's section, the end), to write
 * one after another: joined, they are {@link formatHtml}'s text. A page of any number of models is
 * written without ever being one string.
 * @param result the run's Result
 * @param options heading text; defaults in {@link HtmlOptions}
 */
function* htmlReport(result, options = {}) {
    const title = options.title ?? 'fitgate report';
    const notes = result.notes.map((n) => `<p class="note">${(0,report_escape/* escapeHtml */.ZD)(n)}</p>`).join('');
    yield [
        '<!DOCTYPE html>',
        '<html lang="en">',
        '<head>',
        '<meta charset="utf-8">',
        '<meta name="viewport" content="width=device-width, initial-scale=1">',
        `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`,
        '<meta name="color-scheme" content="light">',
        '<link rel="icon" href="data:,">',
        `<title>${(0,report_escape/* escapeHtml */.ZD)(`${title}: ${MARK[result.verdict] ?? result.verdict}`)}</title>`,
        `<style>${CSS}</style>`,
        '</head>',
        `<body data-verdict="${(0,report_escape/* escapeHtml */.ZD)(result.verdict)}">`,
        `<header><h1>${(0,report_escape/* escapeHtml */.ZD)(title)}</h1>${options.subtitle ? `<p class="muted">${(0,report_escape/* escapeHtml */.ZD)(options.subtitle)}</p>` : ''}<p class="verdict">${verdictText(result)}</p>${notes}</header>`,
        '<main>',
        '',
    ].join('\n');
    yield* overview(result);
    yield '\n';
    for (let i = 0; i < result.models.length; i++)
        yield `${modelSection(result.models[i], i)}\n`;
    yield [
        '</main>',
        `<footer>${(0,report_escape/* escapeHtml */.ZD)(`${result.tool.name} ${result.tool.version}`)}. Training rows are filled circles, hold-out rows hollow squares; dashed lines are fail limits, dotted lines warning limits. Colours from the Okabe–Ito colour-blind-safe set.</footer>`,
        '</body>',
        '</html>',
        '',
    ].join('\n');
}
/**
 * Formats the Result as one self-contained HTML page ({@link htmlReport} joined).
 * @param result the run's Result
 * @param options heading text; defaults in {@link HtmlOptions}
 */
function formatHtml(result, options = {}) {
    return [...htmlReport(result, options)].join('');
}

;// CONCATENATED MODULE: ./src/report/junit.ts
/**
 * The JUnit XML report, read by most CI systems' test views: one `<testsuite>` per model, one
 * `<testcase>` per check (`classname` the model, `name` the check id). A failing check is a
 * `<failure>` with its message; a warning passes and carries the message in `<system-out>`
 * (unless `failOn` is `warn`, then it fails too); a skipped check is `<skipped>`; a model that
 * could not be checked is one test case `load` with an `<error>`. All text is XML-escaped with
 * {@link escapeXml}.
 */




function attrs(pairs) {
    return Object.entries(pairs)
        .map(([k, v]) => ` ${k}="${(0,report_escape/* escapeXml */.X)(String(v))}"`)
        .join('');
}
function junit_figure(c) {
    const value = c.value === null ? '–' : (0,format/* formatNumber */.Z)((0,result_result/* fromJsonNumber */.M)(c.value));
    return `value ${value}; limit ${(0,wording/* limitText */.PW)(c)}`;
}
function suite(m, failOn) {
    const cases = [];
    const counts = { tests: 0, failures: 0, errors: 0, skipped: 0 };
    const common = { classname: m.name, file: m.descriptor };
    if (m.error) {
        counts.tests = 1;
        counts.errors = 1;
        const where = `${m.error.file ?? m.descriptor}${m.error.line ? `:${m.error.line}` : ''}`;
        cases.push(`    <testcase${attrs({ ...common, name: 'load', ...(m.error.line ? { line: m.error.line } : {}) })}>\n` +
            `      <error${attrs({ message: m.error.message, type: m.error.code })}>${(0,report_escape/* escapeXml */.X)(`${where}: ${m.error.message}`)}</error>\n` +
            '    </testcase>');
    }
    for (const c of m.checks) {
        counts.tests++;
        const open = `    <testcase${attrs({ ...common, name: c.id, line: c.line })}`;
        const text = `${m.descriptor}:${c.line}: ${c.message}. ${junit_figure(c)}.${c.advice ? ` ${c.advice}` : ''}`;
        if (c.status === 'fail' || (c.status === 'warn' && failOn === 'warn')) {
            counts.failures++;
            cases.push(`${open}>\n      <failure${attrs({ message: c.message, type: c.code })}>${(0,report_escape/* escapeXml */.X)(text)}</failure>\n    </testcase>`);
        }
        else if (c.status === 'warn') {
            cases.push(`${open}>\n      <system-out>${(0,report_escape/* escapeXml */.X)(`WARNING: ${text}`)}</system-out>\n    </testcase>`);
        }
        else if (c.status === 'skipped') {
            counts.skipped++;
            cases.push(`${open}>\n      <skipped${attrs({ message: c.message })}/>\n    </testcase>`);
        }
        else {
            cases.push(`${open}/>`);
        }
    }
    const head = `  <testsuite${attrs({ name: m.name, tests: counts.tests, failures: counts.failures, errors: counts.errors, skipped: counts.skipped, file: m.descriptor })}`;
    // A model trained elsewhere says so in the suite's properties (JUnit's place for facts of a suite).
    if (m.kind)
        cases.unshift(`    <properties>\n      <property${attrs({ name: 'kind', value: m.kind })}/>\n    </properties>`);
    return { xml: cases.length ? `${head}>\n${cases.join('\n')}\n  </testsuite>` : `${head}/>`, counts };
}
/**
 * The JUnit XML report in pieces (the head, then one test suite per model), to write one after
 * another: joined, they are {@link formatJunit}'s text.
 * @param result the run's Result
 * @param options what counts as a failure; defaults in {@link JunitOptions}
 */
function* junitReport(result, options = {}) {
    const failOn = options.failOn ?? 'fail';
    const suites = result.models.map((m) => suite(m, failOn));
    const total = { tests: 0, failures: 0, errors: 0, skipped: 0 };
    for (const s of suites) {
        total.tests += s.counts.tests;
        total.failures += s.counts.failures;
        total.errors += s.counts.errors;
        total.skipped += s.counts.skipped;
    }
    const head = `<testsuites${attrs({ name: result.tool.name, tests: total.tests, failures: total.failures, errors: total.errors, skipped: total.skipped })}`;
    if (suites.length === 0) {
        yield `<?xml version="1.0" encoding="UTF-8"?>\n${head}/>\n`;
        return;
    }
    yield `<?xml version="1.0" encoding="UTF-8"?>\n${head}>`;
    for (const s of suites)
        yield `\n${s.xml}`;
    yield '\n</testsuites>\n';
}
/**
 * Formats the Result as JUnit XML ({@link junitReport} joined).
 * @param result the run's Result
 * @param options what counts as a failure; defaults in {@link JunitOptions}
 */
function formatJunit(result, options = {}) {
    return [...junitReport(result, options)].join('');
}

// EXTERNAL MODULE: external "node:crypto"
var external_node_crypto_ = __webpack_require__(7598);
// EXTERNAL MODULE: ./src/core/links.ts
var links = __webpack_require__(4982);
// EXTERNAL MODULE: ./src/core/json-pieces.ts
var json_pieces = __webpack_require__(1629);
;// CONCATENATED MODULE: ./src/report/sarif.ts
/**
 * The SARIF 2.1.0 report (OASIS Static Analysis Results Interchange Format, Version 2.1.0,
 * OASIS Standard, 2020), the format code scanning reads. One rule per check of the registry
 * (id, title, description, advice, `helpUri` to the check's docs page); one result per check that fails (`error`) or warns
 * (`warning`), and a `note` for a check that could not be computed, each at the descriptor line
 * the check points at. Models that could not be checked are tool execution notifications at
 * the file and line of the problem. Passing and switched-off checks are not results.
 */






/** The `$schema` written into the log (the OASIS standard's schema). */
const SARIF_SCHEMA_URI = 'https://docs.oasis-open.org/sarif/sarif/v2.1.0/os/schemas/sarif-schema-2.1.0.json';
function levelOf(c) {
    if (c.status === 'fail')
        return 'error';
    if (c.status === 'warn')
        return 'warning';
    if (c.status === 'skipped' && c.code.endsWith('/internal-error'))
        return 'note';
    return null;
}
/** A repository path as a relative URI reference: each segment percent-encoded. */
function pathUri(prefix, path) {
    const full = [prefix.replace(/^\/+|\/+$/g, ''), path].filter((s) => s !== '').join('/');
    return full
        .split('/')
        .map((s) => encodeURIComponent(s))
        .join('/');
}
function ruleName(id) {
    return id.replace(/(^|-)([a-z0-9])/g, (_, _dash, c) => c.toUpperCase());
}
/** A stable fingerprint of a finding: model name and check id (not the line, which moves). */
function fingerprint(model, check) {
    return (0,external_node_crypto_.createHash)('sha256').update(`${model}\u0000${check}`).digest('hex').slice(0, 32);
}
function region(line) {
    return typeof line === 'number' && Number.isInteger(line) && line >= 1 ? { startLine: line } : undefined;
}
/**
 * Builds the SARIF log object of a run.
 * @param result the run's Result
 * @param options path prefix and tool URI; defaults in {@link SarifOptions}
 */
function sarifLog(result, options = {}) {
    const prefix = options.pathPrefix ?? '';
    const ruleIndex = new Map(checks/* CHECKS */.ui.map((c, i) => [c.id, i]));
    const rules = checks/* CHECKS */.ui.map((c) => ({
        id: c.id,
        name: ruleName(c.id),
        shortDescription: { text: c.title },
        fullDescription: { text: c.description },
        help: { text: c.advice },
        helpUri: (0,links/* checkDocsUrl */.z)(c.id),
        defaultConfiguration: { level: 'error' },
        properties: { limitKey: c.limitKey },
    }));
    const results = [];
    const notifications = [];
    for (const m of result.models) {
        if (m.error) {
            const file = m.error.file ?? m.descriptor;
            const r = region(m.error.line);
            notifications.push({
                level: 'error',
                message: { text: `${m.name}: could not be checked: ${m.error.message}` },
                descriptor: { id: m.error.code },
                locations: [
                    { physicalLocation: { artifactLocation: { uri: pathUri(prefix, file), uriBaseId: '%SRCROOT%' }, ...(r ? { region: r } : {}) } },
                ],
            });
            continue;
        }
        for (const c of m.checks) {
            const level = levelOf(c);
            if (level === null)
                continue;
            const advice = c.advice ? ` ${c.advice}` : '';
            const r = region(c.line);
            const index = ruleIndex.get(c.id);
            results.push({
                ruleId: c.id,
                ...(index === undefined ? {} : { ruleIndex: index }),
                level,
                message: { text: `${m.name}: ${c.message}.${advice}` },
                locations: [
                    {
                        physicalLocation: {
                            artifactLocation: { uri: pathUri(prefix, m.descriptor), uriBaseId: '%SRCROOT%' },
                            ...(r ? { region: r } : {}),
                        },
                    },
                ],
                partialFingerprints: { 'fitgateFinding/v1': fingerprint(m.name, c.id) },
                properties: {
                    model: m.name,
                    ...(m.kind ? { kind: m.kind } : {}),
                    code: c.code,
                    value: c.value === null ? null : (0,format/* formatNumber */.Z)((0,result_result/* fromJsonNumber */.M)(c.value)),
                    limit: c.limit,
                    ...(c.floor ? { floor: c.floor } : {}),
                    warn: c.warn,
                },
            });
        }
    }
    return {
        $schema: SARIF_SCHEMA_URI,
        version: '2.1.0',
        runs: [
            {
                tool: {
                    driver: {
                        name: result.tool.name,
                        version: result.tool.version,
                        semanticVersion: result.tool.version,
                        ...(options.informationUri ? { informationUri: options.informationUri } : {}),
                        rules,
                    },
                },
                invocations: [
                    {
                        executionSuccessful: notifications.length === 0,
                        ...(notifications.length ? { toolExecutionNotifications: notifications } : {}),
                    },
                ],
                columnKind: 'unicodeCodePoints',
                results,
            },
        ],
    };
}
/**
 * The SARIF report in pieces (one result each at most), to write one after another: joined, they
 * are {@link formatSarif}'s text.
 */
function* sarifReport(result, options = {}) {
    yield* (0,json_pieces/* jsonPieces */.M)(sarifLog(result, options));
    yield '\n';
}
/** The SARIF report as JSON text (two-space indentation, final newline). */
function formatSarif(result, options = {}) {
    return `${JSON.stringify(sarifLog(result, options), null, 2)}\n`;
}

// EXTERNAL MODULE: ./src/entries/safe-write.ts
var safe_write = __webpack_require__(9725);
;// CONCATENATED MODULE: ./src/entries/output-files.ts
/**
 * Writes the file reports a run asked for (HTML page, SARIF log, JUnit XML). Shared by the CLI
 * and the action; the reporters only format, this module only writes, each file through
 * {@link writeFileSafely} (never through a link, atomically), piece by piece (never one string).
 */






/**
 * Writes every requested file report (missing folders are made, each checked). A report that
 * cannot be written does not stop the others.
 * @returns the reports that were not written, in the order html, sarif, junit; empty when all were
 */
async function writeFileReports(result, files) {
    const failures = [];
    const place = (name) => ({
        option: `${files.optionPrefix ?? ''}${name}`,
        within: files.within,
        insideOnly: files.insideOnly ?? false,
    });
    const attempt = (name, file, pieces) => {
        try {
            (0,safe_write/* writeFileSafely */.kv)(file, pieces(), place(name));
        }
        catch (error) {
            failures.push({
                option: place(name).option,
                refused: error instanceof errors/* InputError */.dz && error.code === safe_write/* OUTPUT_REFUSED */.LC,
                message: (0,errors/* errorMessage */.gJ)(error),
            });
        }
    };
    if (files.html !== null)
        attempt('html', external_node_path_default().join(files.html, HTML_FILE), () => htmlReport(result));
    if (files.sarif !== null)
        attempt('sarif', files.sarif, () => sarifReport(result, { pathPrefix: files.sarifPrefix }));
    if (files.junit !== null)
        attempt('junit', files.junit, () => junitReport(result, { failOn: files.failOn }));
    return failures;
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
