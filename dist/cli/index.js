#!/usr/bin/env node
import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";
/******/ var __webpack_modules__ = ({

/***/ 6214:
/***/ ((__unused_webpack_module, exports) => {

var __webpack_unused_export__;

__webpack_unused_export__ = ({ value: true });
// https://mathiasbynens.be/notes/javascript-encoding
// https://github.com/bestiejs/punycode.js - punycode.ucs2.decode
function ucs2length(str) {
    const len = str.length;
    let length = 0;
    let pos = 0;
    let value;
    while (pos < len) {
        length++;
        value = str.charCodeAt(pos++);
        if (value >= 0xd800 && value <= 0xdbff && pos < len) {
            // high surrogate, and there is a next character
            value = str.charCodeAt(pos);
            if ((value & 0xfc00) === 0xdc00)
                pos++; // low surrogate
        }
    }
    return length;
}
exports.A = ucs2length;
ucs2length.code = 'require("ajv/dist/runtime/ucs2length").default';
//# sourceMappingURL=ucs2length.js.map

/***/ }),

/***/ 1093:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  ui: () => (/* binding */ CHECKS),
  Sd: () => (/* binding */ findCheck),
  k_: () => (/* binding */ runCheck)
});

// UNUSED EXPORTS: registryLimitKeys

// EXTERNAL MODULE: ./src/result/result.ts
var result = __nccwpck_require__(1628);
// EXTERNAL MODULE: ./src/core/format.ts
var format = __nccwpck_require__(6228);
;// CONCATENATED MODULE: ./src/checks/base-change.ts


/** Formats a fraction as a signed percentage, e.g. `+12.5%`. */
function percent(x) {
    if (!Number.isFinite(x))
        return (0,format/* formatNumber */.Z)(x);
    return `${x >= 0 ? '+' : ''}${(0,format/* formatNumber */.Z)(x * 100, 3)}%`;
}
const check = {
    id: 'base-change',
    title: 'Change against the base commit',
    limitKey: 'base_change',
    defaultLimit: 'off',
    direction: 'above',
    limitSummary: 'Relative change of the hold-out RMSE against the same model on the base branch.',
    description: `- Default \`off\`. Points at the \`fit\` line.
- Figure: (hold-out RMSE now - hold-out RMSE on the base commit) / hold-out RMSE on the base
  commit, for pull requests (the action) or \`fitgate check --base REF\`. Skipped for models new in
  the pull request and when no base commit is available. \`base_change: 0.1\` allows 10 % worse.`,
    advice: 'Find what made the hold-out error grow since the base commit (added terms, a smaller ridge penalty, changed rows) and undo it, or raise `base_change` when the change is intended.',
    line: (d) => d.termsLine,
    measure({ metrics, baseline }) {
        if (!baseline)
            return { value: null, reason: 'no-base', message: 'no model of this name to compare with on the base commit' };
        const base = baseline.metrics ? (0,result/* fromJsonNumber */.M)(baseline.metrics.holdout_rmse) : Number.NaN;
        if (Number.isNaN(base))
            return { value: null, reason: 'base-not-checked', message: 'the model could not be checked on the base commit' };
        const head = metrics.holdoutRmse;
        const value = base === 0 ? (head === 0 ? 0 : Infinity) : (head - base) / base;
        return {
            value,
            message: `hold-out RMSE ${(0,format/* formatNumber */.Z)(head)} against ${(0,format/* formatNumber */.Z)(base)} on the base commit (${percent(value)})`,
            detail: { base_holdout_rmse: base },
        };
    },
};
/* harmony default export */ const base_change = (check);

// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __nccwpck_require__(4296);
;// CONCATENATED MODULE: ./src/checks/coefficient-size.ts
/**
 * `coefficient-size`: the largest standardised coefficient.
 */


const coefficient_size_check = {
    id: 'coefficient-size',
    title: 'Coefficient size',
    limitKey: 'coefficient',
    defaultLimit: 25,
    direction: 'above',
    limitSummary: 'Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.',
    description: `- Default \`25\`. Points at the term whose column has the largest figure.
- Figure: max over non-intercept columns of |w_j| * sd(phi_j) / sd(y), population standard
  deviations over the training rows: the change of the prediction, in target standard deviations,
  for one standard deviation of that column (standardised regression coefficient; Draper & Smith,
  Applied Regression Analysis, 3rd ed., 1998, section 16.3). Huge values mean that columns cancel
  each other, the signature of an overfit or ill-conditioned fit.`,
    advice: 'Add a ridge penalty (`fit.ridge`) or remove nearly collinear terms so that columns stop cancelling each other.',
    line: (d) => d.fit.ridgeLine,
    measure({ metrics, design }) {
        if (metrics.maxStdCoefficientColumn < 0) {
            return { value: null, reason: 'no-columns', message: 'the model has no non-intercept columns' };
        }
        const column = design.columnNames[metrics.maxStdCoefficientColumn];
        const term = design.termOffsets.findLastIndex((o) => o <= metrics.maxStdCoefficientColumn);
        return {
            value: metrics.maxStdCoefficient,
            message: `largest standardised coefficient is ${(0,format/* formatNumber */.Z)(metrics.maxStdCoefficient)}, on column \`${(0,errors/* clip */.$Q)(column)}\``,
            line: term >= 0 ? design.terms[term].spec.line : undefined,
            detail: { column },
        };
    },
};
/* harmony default export */ const coefficient_size = (coefficient_size_check);

;// CONCATENATED MODULE: ./src/checks/generalisation-gap.ts

const generalisation_gap_check = {
    id: 'generalisation-gap',
    title: 'Generalisation gap',
    limitKey: 'gap_ratio',
    defaultLimit: 1.5,
    direction: 'above',
    limitSummary: 'Hold-out RMSE divided by training RMSE.',
    description: `- Default \`1.5\`. Points at the \`fit\` line.
- Figure: hold-out RMSE / training RMSE, RMSE = sqrt(mean((y - yhat)^2)). Infinite when the
  training RMSE is 0 and the hold-out RMSE is not (a model that interpolates its training rows); 1
  when both are 0. A model that has learnt noise scores far better on the rows it was fitted to than
  on new rows (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009,
  section 7.2). The default 1.5 is common practice, not a law: set it per model.`,
    advice: 'Use fewer or wider basis functions, a lower degree, or a larger ridge penalty, so that the training error stops falling below the hold-out error.',
    line: (d) => d.fit.line,
    measure({ metrics }) {
        return {
            value: metrics.gapRatio,
            message: `hold-out RMSE ${(0,format/* formatNumber */.Z)(metrics.holdoutRmse)} is ${(0,format/* formatNumber */.Z)(metrics.gapRatio)} times the training RMSE ${(0,format/* formatNumber */.Z)(metrics.trainRmse)}`,
        };
    },
};
/* harmony default export */ const generalisation_gap = (generalisation_gap_check);

;// CONCATENATED MODULE: ./src/checks/parameter-ratio.ts

const parameter_ratio_check = {
    id: 'parameter-ratio',
    title: 'Parameters per row',
    limitKey: 'params_per_sample',
    defaultLimit: 0.1,
    direction: 'above',
    limitSummary: 'Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).',
    description: `- Default \`0.1\` (common practice: at least 10 training rows per
  fitted parameter). Points at the \`terms\` line.
- Figure: p / n, p the columns of the design (intercept included), n the training rows. With
  p = n a least-squares fit interpolates its training rows exactly. With \`fit.parameter_count:
  effective\`, the effective degrees of freedom of a ridge fit take the place of p:
  df = trace of the hat matrix = sum_j d_j^2 / (d_j^2 + lambda) (ESL eq. 3.50).`,
    advice: 'Remove terms, lower the degree or the number of radial centres, add a ridge penalty, or add training rows.',
    line: (d) => (d.fit.parameterCount === 'effective' ? d.fit.ridgeLine : d.termsLine),
    measure({ metrics, design, train, fit, descriptor }) {
        if (descriptor.fit.parameterCount === 'effective') {
            const df = fit.degreesOfFreedom;
            const ratio = df / train.rows;
            return {
                value: ratio,
                reason: 'effective',
                message: `${(0,format/* formatNumber */.Z)(df)} effective parameters (of ${design.p} columns) for ${train.rows} training rows (${(0,format/* formatNumber */.Z)(ratio)} per row)`,
                detail: { counted: 'effective', effective_df: df, columns: design.p },
            };
        }
        return {
            value: metrics.paramsPerSample,
            message: `${design.p} parameters for ${train.rows} training rows (${(0,format/* formatNumber */.Z)(metrics.paramsPerSample)} per row)`,
            detail: { counted: 'columns', columns: design.p },
        };
    },
};
/* harmony default export */ const parameter_ratio = (parameter_ratio_check);

// EXTERNAL MODULE: ./src/design/terms/index.ts + 3 modules
var design_terms = __nccwpck_require__(7482);
// EXTERNAL MODULE: ./src/design/design-matrix.ts
var design_matrix = __nccwpck_require__(6566);
// EXTERNAL MODULE: ./src/fit/index.ts + 3 modules
var fit = __nccwpck_require__(2485);
// EXTERNAL MODULE: ./src/fit/svd.ts
var svd = __nccwpck_require__(5936);
;// CONCATENATED MODULE: ./src/fit/ridge-path.ts

/**
 * Coefficients of every penalty, or null when the penalised columns are not all columns or all
 * but the first, when r00 is 0, or when a penalty is not positive (the caller then solves each
 * penalty on its own).
 *
 * @param data factor of the data rows (not modified)
 * @param lambdas penalties, each > 0
 * @param penalised which columns are penalised (length p)
 * @returns one length-p coefficient array per penalty, in order
 */
function ridgePath(data, lambdas, penalised) {
    const p = data.p;
    if (p === 0 || penalised.length !== p || !lambdas.every((l) => l > 0 && Number.isFinite(l)))
        return null;
    let free = 0;
    while (free < p && !penalised[free])
        free++;
    for (let j = free; j < p; j++)
        if (!penalised[j])
            return null;
    if (free > 1)
        return null;
    const R = data.R;
    const q = data.qty;
    if (free === 1 && !(R[0] !== 0))
        return null;
    // The penalised block R2 (k x k) and its right-hand side q2.
    const k = p - free;
    if (k === 0)
        return null;
    const out = lambdas.map(() => new Float64Array(p));
    const R2 = new Float64Array(k * k);
    for (let c = 0; c < k; c++)
        for (let r = 0; r <= c; r++)
            R2[c * k + r] = R[(c + free) * p + (r + free)];
    let decomposition;
    try {
        decomposition = (0,svd/* svd */.C)(R2, k, k, 'both');
    }
    catch {
        return null;
    }
    const { s, U, V } = decomposition;
    // U^T q2 once.
    const uq = new Float64Array(k);
    for (let c = 0; c < k; c++) {
        let t = 0;
        for (let r = 0; r < k; r++)
            t += U[c * k + r] * q[r + free];
        uq[c] = t;
    }
    const coef = new Float64Array(k);
    lambdas.forEach((lambda, index) => {
        for (let c = 0; c < k; c++)
            coef[c] = (s[c] / (s[c] * s[c] + lambda)) * uq[c];
        const w = out[index];
        for (let r = 0; r < k; r++) {
            let t = 0;
            for (let c = 0; c < k; c++)
                t += V[c * k + r] * coef[c];
            w[r + free] = t;
        }
        if (free === 1) {
            let t = q[0];
            for (let j = 1; j < p; j++)
                t -= R[j * p] * w[j];
            w[0] = t / R[0];
        }
    });
    if (out.some((w) => w.some((v) => !Number.isFinite(v))))
        return null;
    return out;
}

// EXTERNAL MODULE: ./src/diagnostics/cross-validation.ts
var cross_validation = __nccwpck_require__(7114);
// EXTERNAL MODULE: ./src/diagnostics/folds.ts
var diagnostics_folds = __nccwpck_require__(9236);
;// CONCATENATED MODULE: ./src/diagnostics/complexity.ts
/**
 * The simpler model to use: sweep a model's main complexity setting, cross-validate each setting
 * on the same folds, and pick the simplest setting whose error is within one standard error of
 * the best (Hastie, Tibshirani & Friedman, The Elements of Statistical Learning, 2nd ed., 2009,
 * section 7.10, the "one-standard-error" rule).
 */






/**
 * The one-standard-error rule: with the settings ordered from simplest to most complex, the
 * minimum mean error m* at index `best` and its standard error s*, the choice is the simplest
 * setting whose mean is at most m* + s* (ESL 2nd ed. section 7.10, p. 244). Non-finite means are
 * never the best nor chosen. Returns -1 for both when no mean is finite.
 *
 * @param curve points ordered simplest first
 */
function oneStandardErrorRule(curve) {
    let best = -1;
    for (let i = 0; i < curve.length; i++) {
        if (Number.isFinite(curve[i].mean) && (best < 0 || curve[i].mean < curve[best].mean))
            best = i;
    }
    if (best < 0)
        return { best: -1, chosen: -1 };
    const se = Number.isFinite(curve[best].se) ? curve[best].se : 0;
    const threshold = curve[best].mean + se;
    for (let i = 0; i <= best; i++)
        if (Number.isFinite(curve[i].mean) && curve[i].mean <= threshold)
            return { best, chosen: i };
    return { best, chosen: best };
}
/** Formats a setting for people (up to 3 significant digits). */
function formatSetting(x) {
    if (x === 0)
        return '0';
    const a = Math.abs(x);
    if (a < 1e-3 || a >= 1e5)
        return x.toExponential(1).replace('e+', 'e');
    return String(Number(x.toPrecision(a >= 1 ? 3 : 2)));
}
/** The setting a sweep varies for this model, or null when there is none. */
function sweepTarget(descriptor, design) {
    if (descriptor.fit.ridge > 0)
        return { kind: 'ridge', term: -1, line: descriptor.fit.ridgeLine };
    let poly = -1;
    let rbf = -1;
    design.terms.forEach((t, i) => {
        const spec = t.spec;
        if (spec.kind === 'polynomial' && (poly < 0 || spec.degree > design.terms[poly].spec.degree))
            poly = i;
        if (spec.kind === 'rbf' && rbf < 0)
            rbf = i;
    });
    if (poly >= 0)
        return { kind: 'degree', term: poly, line: design.terms[poly].spec.line };
    if (rbf >= 0)
        return { kind: 'width', term: rbf, line: design.terms[rbf].spec.line };
    if (design.p > (design.intercept ? 1 : 0))
        return { kind: 'ridge', term: -1, line: descriptor.fit.ridgeLine };
    return null;
}
/**
 * Rows the sweep uses at most: above this a deterministic even-stride subsample (the detail says
 * `subsampled: true` and gives `rows`). 50,000 rows estimate each setting's k-fold error to well
 * under its own standard error, at a quarter of the cost of 200,000 (common practice: the curve
 * only has to rank the settings).
 */
const SWEEP_MAX_ROWS = 50000;
/** Every other row at an even stride, as new columns. */
function subsample(data, m) {
    const n = data.rows;
    const pick = (col) => {
        const out = new Float64Array(m);
        for (let t = 0; t < m; t++)
            out[t] = col[Math.floor((t * n) / m)];
        return out;
    };
    return { inputs: data.inputs.map(pick), y: pick(data.y), rows: m };
}
/**
 * coefficients[s][f]: the fit without fold f under penalty s. One SVD per fold serves every
 * positive penalty ({@link ridgePath}); a penalty of 0, or a factor the path does not take, is
 * solved on its own.
 */
function sweepCoefficients(complements, lambdas, penalised) {
    const coefficients = lambdas.map(() => new Array(complements.length));
    const positive = lambdas.filter((l) => l > 0);
    complements.forEach((acc, f) => {
        const path = ridgePath(acc, positive, penalised);
        let next = 0;
        lambdas.forEach((lambda, s) => {
            coefficients[s][f] = path !== null && lambda > 0 ? path[next++] : (0,fit/* solveCoefficients */.gQ)(acc, { ridge: lambda, penalised });
        });
    });
    return coefficients;
}
/**
 * Sweeps the model's main complexity setting and applies {@link oneStandardErrorRule} to the
 * k-fold errors (the same folds for every setting).
 *
 * - A ridge penalty above 0 (or a model of linear terms only): lambda on a log grid
 *   s x 10^t, t = -6, -5.5, ..., 3, with s = trace(X^T X) / p of the current design, plus the
 *   current lambda; simplest = largest. The design does not change, so the model's per-fold
 *   factors serve every lambda: one SVD per fold complement gives every lambda's coefficients
 *   ({@link ridgePath}), and each fold's squared errors come
 *   from its own factor ({@link outOfFoldErrorsFromFactors}), with no pass over the rows. Every
 *   row is used (no subsample).
 * - Else the polynomial term of highest degree: degrees 1 .. min(current + 3, maxDegree).
 * - Else the first radial term: widths current x 2^t, t = -2 .. 4; simplest = widest.
 *   Degree and width settings each build their own design: two passes over the rows each, on
 *   an even-stride subsample above `maxRows` rows.
 *
 * @param descriptor the model (fit options, term lines)
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order)
 * @param fit the current fit (its factor gives trace(X^T X))
 * @param options row cap and highest degree
 * @returns null when the model has no setting to sweep or fewer than 2 rows
 */
function sweepComplexity(descriptor, design, train, fit, options = {}) {
    const target = sweepTarget(descriptor, design);
    if (target === null || train.rows < 2)
        return null;
    const maxRows = options.maxRows ?? SWEEP_MAX_ROWS;
    // A ridge sweep needs no pass over the rows once the fold factors exist, so it uses every row.
    const subsampled = target.kind !== 'ridge' && train.rows > maxRows;
    const rows = subsampled ? subsample(train, maxRows) : train;
    const folds = (0,diagnostics_folds/* assignFolds */.o)(rows.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
    if (folds.k < 2)
        return null;
    const ridge = descriptor.fit.ridge;
    const curve = [];
    const pointFrom = (setting, label, parameters, sse, current) => {
        const s = (0,cross_validation/* summariseFolds */.$l)(sse, folds.sizes);
        return { setting, label, parameters, cvRmse: s.cvRmse, meanMse: s.meanMse, seMse: s.seMse, current };
    };
    if (target.kind === 'ridge') {
        // trace(X^T X) = trace(R^T R) of the data rows = trace of the penalised factor minus lambda per penalised column.
        const R = fit.factor.R;
        const p = design.p;
        let trace = 0;
        for (let k = 0; k < p * p; k++)
            trace += R[k] * R[k];
        trace -= ridge * fit.penalised.filter(Boolean).length;
        const scale = trace / Math.max(1, p);
        const grid = [];
        for (let t = 3; t >= -6; t -= 0.5)
            grid.push(scale * 10 ** t);
        const lambdas = [...grid.filter((l) => l > ridge), ridge, ...grid.filter((l) => l < ridge)];
        let factors;
        if (options.factors) {
            factors = options.factors();
        }
        else {
            const perFold = (0,cross_validation/* foldFactors */.Y6)(design, rows, folds);
            factors = { perFold, complements: (0,cross_validation/* complementFactors */.Zd)(perFold) };
        }
        const coefficients = sweepCoefficients(factors.complements, lambdas, design.penalised);
        const { sse } = (0,cross_validation/* outOfFoldErrorsFromFactors */.un)(factors.perFold, coefficients);
        lambdas.forEach((l, s) => curve.push(pointFrom(l, `ridge ${formatSetting(l)}`, p, sse[s], s === lambdas.indexOf(ridge))));
    }
    else {
        const trainColumns = new Map(design.inputs.map((name, c) => [name, train.inputs[c]]));
        const spec = design.terms[target.term].spec;
        const settings = [];
        if (target.kind === 'degree') {
            const degree = spec.degree;
            const top = Math.max(degree, Math.min(degree + 3, options.maxDegree ?? 15));
            for (let g = 1; g <= top; g++)
                settings.push({ value: g, current: g === degree });
        }
        else {
            const width = spec.width;
            for (let t = 4; t >= -2; t--)
                settings.push({ value: width * 2 ** t, current: t === 0 });
        }
        for (const { value, current } of settings) {
            const changed = target.kind === 'degree' ? { ...spec, degree: value } : { ...spec, width: value };
            const terms = design.terms.map((t, i) => (i === target.term ? (0,design_terms/* createTerm */.P)(changed, trainColumns, descriptor.file) : t));
            const d = (0,design_matrix/* createDesign */.x)(terms, design.intercept);
            const label = `${target.kind} ${formatSetting(value)}`;
            try {
                const factors = (0,cross_validation/* complementFactors */.Zd)((0,cross_validation/* foldFactors */.Y6)(d, rows, folds));
                const coefficients = (0,cross_validation/* complementCoefficients */.dn)(factors, [ridge], d.penalised);
                const { sse } = (0,cross_validation/* outOfFoldErrors */.Yo)(d, rows, folds, coefficients);
                curve.push(pointFrom(value, label, d.p, sse[0], current));
            }
            catch (error) {
                // A setting whose fit cannot be computed (e.g. columns that underflow) leaves a gap in the curve.
                if (!(error instanceof RangeError))
                    throw error;
                curve.push({ setting: value, label, parameters: d.p, cvRmse: Number.NaN, meanMse: Number.NaN, seMse: Number.NaN, current, failed: error.message });
            }
        }
    }
    const { best, chosen } = oneStandardErrorRule(curve.map((c) => ({ mean: c.meanMse, se: c.seMse })));
    return {
        kind: target.kind,
        line: target.line,
        curve,
        best,
        chosen,
        current: curve.findIndex((c) => c.current),
        rows: rows.rows,
        subsampled,
        folds: folds.k,
    };
}

// EXTERNAL MODULE: ./src/core/json.ts
var json = __nccwpck_require__(6153);
;// CONCATENATED MODULE: ./src/checks/complexity.ts




const complexity_check = {
    id: 'complexity',
    title: 'Simpler setting',
    limitKey: 'complexity',
    defaultLimit: { warn: 1.5 },
    direction: 'above',
    limitSummary: 'Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.',
    description: `- Default \`{ warn: 1.5 }\` (see below). Points at the line to change:
  the swept term's line, or \`fit.ridge\`'s line (the \`fit\` line when \`ridge\` is not written).
- What is swept (one setting per model, the same folds as \`cross-validation\`):
  - \`fit.ridge\` above 0, or a model of linear terms only: the ridge penalty lambda = s x 10^t for
    t = 3, 2.5, ..., -6 with s = trace(X^T X) / p of the model's design, plus the current lambda
    (20 settings at most); simplest = largest lambda. The design does not change, so the model's
    own per-fold factors serve every lambda: one SVD per fold complement gives every lambda's
    coefficients (ESL eq. 3.47, the unpenalised intercept eliminated from the factor's first
    row), and each fold's squared errors come from its factor
    (||y_f - X_f w||^2 = ||Q_f^T y_f - R_f w||^2 + the fold's residual sum of squares): no pass over
    the rows, every row used.
  - else the polynomial term of highest degree: degrees 1 .. min(degree + 3, 15);
  - else the first radial term: its width times 2^t for t = 4, 3, ..., -2; simplest = widest.
- Each setting's k-fold error: the mean of the fold MSEs and its standard error (sample standard
  deviation of the fold MSEs / sqrt(k)). The suggestion is the simplest setting whose mean is within
  one standard error of the smallest mean (the one-standard-error rule: Hastie, Tibshirani &
  Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10). When it differs from
  the current setting it is shown as a notice at the line to change, e.g. \`degree 3 (k-fold CV RMSE
  0.47 against 24.9 now)\`.
- Figure: the current setting's k-fold CV RMSE / the suggested setting's (1 or less when the current
  setting is as good). The default warns above 1.5: the suggestion is then clearly better,
  not only simpler; a notice alone is given otherwise, and the check never fails by default.
- Above 50,000 training rows a degree or width sweep uses a subsample of 50,000 rows at an even
  stride through the file (detail \`subsampled: true\`); a ridge sweep always uses every row.
- Metrics: \`suggested_setting\`, \`suggested_cv_rmse\`. Detail: \`setting\` (\`degree\`, \`width\` or
  \`ridge\`), \`folds\`, \`rows\`, \`subsampled\`, \`rule\`, indices \`chosen\`, \`best\`, \`current\`, and \`curve\`:
  \`[{ setting, label, parameters, cv_rmse, mean_mse, se_mse, current, failed? }]\`, simplest first.`,
    advice: 'Change the setting as suggested: the simpler model predicts new rows about as well or better.',
    line: (d) => d.fit.line,
    measure(context) {
        const { descriptor, design, train, fit } = context;
        const sweep = sweepComplexity(descriptor, design, train, fit, { factors: () => context.analyses.foldFactors() });
        if (sweep === null || sweep.chosen < 0 || sweep.current < 0) {
            return { value: null, reason: 'not-applicable', message: 'the model has no complexity setting to sweep, or too few rows' };
        }
        const chosen = sweep.curve[sweep.chosen];
        const current = sweep.curve[sweep.current];
        const best = sweep.curve[sweep.best];
        const value = chosen.cvRmse > 0 ? current.cvRmse / chosen.cvRmse : current.cvRmse === 0 ? 1 : Infinity;
        const detail = (0,json/* jsonRecord */.eJ)({
            setting: sweep.kind,
            folds: sweep.folds,
            rows: sweep.rows,
            subsampled: sweep.subsampled,
            rule: 'one-standard-error',
            chosen: sweep.chosen,
            best: sweep.best,
            current: sweep.current,
            curve: sweep.curve.map((c) => ({ setting: c.setting, label: c.label, parameters: c.parameters, cv_rmse: c.cvRmse, mean_mse: c.meanMse, se_mse: c.seMse, current: c.current, ...(c.failed ? { failed: c.failed } : {}) })),
        });
        const sub = sweep.subsampled ? ` (on an even-stride subsample of ${sweep.rows} rows)` : '';
        if (sweep.chosen === sweep.current) {
            return {
                value,
                message: `${current.label} is the simplest setting within one standard error of the best cross-validation error (${sweep.curve.length} settings swept${sub})`,
                line: sweep.line,
                metrics: { suggested_setting: current.label },
                detail,
            };
        }
        return {
            value,
            message: `${chosen.label} has k-fold CV RMSE ${(0,format/* formatNumber */.Z)(chosen.cvRmse)} against ${(0,format/* formatNumber */.Z)(current.cvRmse)} for the current ${current.label}; it is the simplest of ${sweep.curve.length} settings within one standard error of the best (${best.label}, ${(0,format/* formatNumber */.Z)(best.cvRmse)})${sub}`,
            line: sweep.line,
            metrics: { suggested_setting: chosen.label, suggested_cv_rmse: (0,result/* jsonNumber */.qj)(chosen.cvRmse) },
            detail,
            suggestion: {
                text: `${chosen.label} (k-fold CV RMSE ${(0,format/* formatNumber */.Z)(chosen.cvRmse)} against ${(0,format/* formatNumber */.Z)(current.cvRmse)} now)`,
                line: sweep.line,
                // The value as the label rounds it (what a person would write): `degree 3`, `width 1.6`, `ridge 0.8`.
                change: { key: sweep.kind, value: Number(chosen.label.slice(sweep.kind.length + 1)) },
            },
        };
    },
};
/* harmony default export */ const complexity = (complexity_check);

;// CONCATENATED MODULE: ./src/checks/conditioning.ts
/**
 * `conditioning`: condition number of the column-scaled design, naming nearly collinear terms.
 */



const conditioning_check = {
    id: 'conditioning',
    title: 'Conditioning of the design',
    limitKey: 'condition',
    defaultLimit: { warn: 1e8 },
    direction: 'above',
    limitSummary: '2-norm condition number of the column-scaled design matrix.',
    description: `- Default \`{ warn: 1e8 }\` (common practice). Points at the first term that has
  a nearly collinear column (the \`fit\` line when it is only the intercept).
- Figure: the 2-norm condition number s_max / s_min of the design with every column scaled to unit
  length, from the singular values of the triangular factor R of its QR factorisation (Golub & Van
  Loan, Matrix Computations, 4th ed., 2013, sections 2.6 and 5.3; column scaling: van der Sluis 1969,
  Numerische Mathematik 14). Infinite for a rank-deficient design.
- The message names the columns with weight |v_j| >= 0.1 in the right singular vector of the
  smallest singular value (the most nearly collinear combination) when the figure is above 1e3.
- Metric \`condition_number_scaled\`. Detail: \`collinear_columns\`, \`collinear_term_lines\`, \`rank\`,
  \`singular_values_scaled\`.`,
    advice: 'Drop or merge the named terms, lower the degree, centre and scale polynomial inputs (the default shift and scale), or add a ridge penalty.',
    line: (d) => d.termsLine,
    measure({ fit, design, descriptor }) {
        const value = fit.conditionNumberScaled;
        const columns = fit.collinearColumns.map((j) => design.columnNames[j]);
        // Term of each collinear column (the intercept belongs to the `fit` block).
        const termOf = (j) => {
            let t = -1;
            design.termOffsets.forEach((offset, i) => {
                if (j >= offset && design.terms[i].columnNames.length > 0)
                    t = i;
            });
            return t;
        };
        const terms = [...new Set(fit.collinearColumns.map(termOf).filter((t) => t >= 0))];
        const line = terms.length > 0 ? design.terms[terms[0]].spec.line : descriptor.fit.line;
        const named = columns.length > 0 ? `; nearly collinear: ${columns.slice(0, 8).map((c) => (0,errors/* clip */.$Q)(c)).join(', ')}${columns.length > 8 ? ', …' : ''}${terms.length > 0 ? ` (${terms.length === 1 ? 'term on line' : 'terms on lines'} ${terms.map((t) => design.terms[t].spec.line).join(', ')})` : ''}` : '';
        return {
            value,
            message: `the column-scaled design has condition number ${(0,format/* formatNumber */.Z)(value)} (rank ${fit.rank} of ${design.p})${value > 1e3 ? named : ''}`,
            line,
            metrics: { condition_number_scaled: (0,result/* jsonNumber */.qj)(value) },
            detail: { collinear_columns: columns, collinear_term_lines: terms.map((t) => design.terms[t].spec.line), rank: fit.rank, singular_values_scaled: Array.from(fit.singularValuesScaled, result/* jsonNumber */.qj) },
        };
    },
};
/* harmony default export */ const conditioning = (conditioning_check);

// EXTERNAL MODULE: ./src/diagnostics/regression-metrics.ts
var regression_metrics = __nccwpck_require__(155);
;// CONCATENATED MODULE: ./src/checks/cross-validation.ts



const cross_validation_check = {
    id: 'cross-validation',
    title: 'Cross-validation',
    limitKey: 'cv_ratio',
    defaultLimit: 'off',
    direction: 'above',
    limitSummary: 'Pooled k-fold cross-validation RMSE divided by training RMSE.',
    description: `- Default \`off\`. Points at the \`fit\` line.
- Figure: k-fold CV RMSE / training RMSE (infinite when the training RMSE is 0 and the CV RMSE is not).
- Folds: \`fit.folds\` (default 5; fewer rows than folds gives one row per fold), \`fit.fold_order\`:
  \`shuffled\` (default; a Fisher-Yates shuffle driven by a seeded 32-bit generator, seed \`fit.seed\`,
  default 1, recorded in the detail) or \`blocks\` (contiguous blocks in file order, right for rows
  ordered in time). In both orders the first n mod k folds hold floor(n/k) + 1 rows, the others
  floor(n/k).
- cv_rmse = sqrt(sum over all rows of (y_i - yhat_(-fold(i)))^2 / n), pooled over rows; the RMSE of
  each fold is in the detail. The fit without fold f uses the same terms (fixed from all training
  rows) and the same ridge penalty. No refit from scratch: each fold's rows are folded into their own
  QR factor in one pass; the factor without fold f is the merge of the others (Hastie, Tibshirani &
  Friedman, The Elements of Statistical Learning, 2nd ed., 2009, section 7.10).
- Leave-one-out by the PRESS residuals e_i / (1 - h_ii) (Allen 1974, Technometrics 16(1)):
  loocv_rmse = sqrt(mean((e_i / (1 - h_ii))^2)), with e_i the full fit's residual and
  h_ii = x_i^T (X^T X + lambda E^T E)^+ x_i its leverage (exact for ridge with the same penalty). A row
  with leverage 1 (within 1e-10: the fit interpolates it) makes the figure infinite; the detail counts
  such rows.
- GCV = mean(e_i^2) / (1 - df/n)^2 (Golub, Heath & Wahba 1979, Technometrics 21(2)); infinite when df >= n.
- Effective degrees of freedom df = trace of the hat matrix = sum of the leverages; for ridge on
  every column sum_j d_j^2 / (d_j^2 + lambda) with d_j the singular values of the design (ESL eq. 3.50);
  p for least squares of full rank.
- Metrics: \`cv_rmse\`, \`loocv_rmse\`, \`gcv\`, \`effective_df\`, \`effective_df_per_sample\`, \`cv_folds\`.
  Detail: \`folds\`, \`fold_order\`, \`seed\`, \`fold_rows\`, \`fold_rmse\`, \`cv_rmse\`, \`loocv_rmse\`, \`press\`,
  \`gcv\`, \`effective_df\`, \`parameters\`, \`max_leverage\`, \`rows_with_leverage_one\`.`,
    advice: 'Use fewer or wider basis functions, a lower degree or a larger ridge penalty until the cross-validation error comes close to the training error.',
    line: (d) => d.fit.line,
    measure(context) {
        const folds = context.analyses.folds();
        const cv = context.analyses.crossValidation();
        const { metrics, train, design } = context;
        const effectiveDf = cv.effectiveDf;
        const figures = {
            loocv_rmse: cv.loocvRmse,
            gcv: cv.gcv,
            effective_df: effectiveDf,
            effective_df_per_sample: effectiveDf / train.rows,
            cv_folds: cv.k,
        };
        const detail = {
            folds: cv.k,
            fold_order: folds.order,
            seed: folds.seed,
            fold_rows: cv.foldSizes,
            fold_rmse: cv.foldRmse,
            cv_rmse: cv.cvRmse,
            loocv_rmse: cv.loocvRmse,
            press: cv.press,
            gcv: cv.gcv,
            effective_df: effectiveDf,
            parameters: design.p,
            max_leverage: cv.maxLeverage,
            rows_with_leverage_one: cv.rowsWithLeverageOne,
        };
        if (cv.k < 2) {
            return {
                value: null,
                reason: 'too-few-rows',
                message: `cross-validation needs at least 2 training rows, got ${train.rows}`,
                metrics: (0,json/* jsonMetrics */.Gc)(figures),
                detail: (0,json/* jsonRecord */.eJ)(detail),
            };
        }
        const ratio = (0,regression_metrics/* gapRatio */.yr)(metrics.trainRmse, cv.cvRmse);
        const loo = cv.rowsWithLeverageOne > 0 ? `infinite (${cv.rowsWithLeverageOne} rows with leverage 1: the fit interpolates them)` : (0,format/* formatNumber */.Z)(cv.loocvRmse);
        return {
            value: ratio,
            message: `${cv.k}-fold CV RMSE ${(0,format/* formatNumber */.Z)(cv.cvRmse)} (${folds.order}${folds.order === 'shuffled' ? `, seed ${folds.seed}` : ''}) is ${(0,format/* formatNumber */.Z)(ratio)} times the training RMSE ${(0,format/* formatNumber */.Z)(metrics.trainRmse)}; leave-one-out RMSE ${loo}, GCV ${(0,format/* formatNumber */.Z)(cv.gcv)}, effective degrees of freedom ${(0,format/* formatNumber */.Z)(effectiveDf)} of ${design.p} parameters`,
            metrics: (0,json/* jsonMetrics */.Gc)({ cv_rmse: cv.cvRmse, ...figures }),
            detail: (0,json/* jsonRecord */.eJ)(detail),
        };
    },
};
/* harmony default export */ const checks_cross_validation = (cross_validation_check);

;// CONCATENATED MODULE: ./src/checks/leakage.ts
/**
 * `leakage`: hold-out rows that repeat a training row.
 */

const leakage_check = {
    id: 'leakage',
    title: 'Hold-out rows in the training data',
    limitKey: 'leakage',
    defaultLimit: 0,
    direction: 'above',
    limitSummary: 'Hold-out rows that also appear in the training data (the default 0 fails when there is any).',
    description: `- Default \`0\` (fail when any row repeats; common practice: hold-out rows must
  be unseen). Points at \`data.holdout\`.
- Figure: the number of hold-out rows whose values in every input column of the model equal those of
  some training row (exact comparison of the parsed numbers, -0 equal to 0; found through a hash of
  the values' bit patterns, confirmed value by value). The message says how many of them repeat the
  target too, and names the first 5 lines of the hold-out file and the first matching training line
  of each.
- Metrics: \`holdout_rows_in_training\` (the figure) and \`leaked_rows\`: hold-out rows equal to a
  training row in the inputs and the target. Only the model's columns are compared: a column of the
  file that no term reads does not count (a comparison on every column of the files can give a
  smaller count).
- Models whose inputs take few distinct values (counts, categories coded as numbers) repeat inputs
  by nature: set \`leakage\` to a tolerated count or \`off\` for them.
- Detail: \`columns\`, \`holdout_rows\`, \`input_matches\`, \`target_matches\`, \`holdout_lines\`,
  \`train_lines\`, \`holdout_file\`, \`train_file\`.`,
    advice: 'Remove the repeated rows from the hold-out file (or from the training file) so that the hold-out rows are new to the fit.',
    line: (d) => d.data.lines.holdout,
    measure(context) {
        const { holdout, train, design } = context;
        if (design.inputs.length === 0) {
            return { value: null, reason: 'not-applicable', message: 'the model reads no input column, so no row can repeat' };
        }
        const leak = context.analyses.leakage();
        const metrics = { leaked_rows: leak.fullMatches, holdout_rows_in_training: leak.inputMatches };
        const detail = {
            columns: [...design.inputs],
            holdout_rows: leak.holdoutRows,
            input_matches: leak.inputMatches,
            target_matches: leak.fullMatches,
            holdout_lines: leak.holdoutLines,
            train_lines: leak.trainLines,
            holdout_file: holdout.file,
            train_file: train.file,
        };
        if (leak.inputMatches === 0) {
            return { value: 0, message: `no hold-out row of ${leak.holdoutRows} repeats a training row in ${design.inputs.map((c) => (0,errors/* clip */.$Q)(c)).join(', ')}`, metrics, detail };
        }
        const lines = (file, ls) => `${(0,errors/* clip */.$Q)(file)} line${ls.length > 1 ? 's' : ''} ${ls.join(', ')}${leak.inputMatches > ls.length ? ', …' : ''}`;
        const target = leak.fullMatches === leak.inputMatches ? 'all with the same target' : leak.fullMatches === 0 ? 'none with the same target' : `${leak.fullMatches} with the same target`;
        return {
            value: leak.inputMatches,
            message: `${leak.inputMatches} of ${leak.holdoutRows} hold-out rows repeat a training row in ${design.inputs.map((c) => (0,errors/* clip */.$Q)(c)).join(', ')} (${target}): ${lines(holdout.file, leak.holdoutLines)}; first matching training rows: ${lines(train.file, leak.trainLines)}`,
            metrics,
            detail,
        };
    },
};
/* harmony default export */ const leakage = (leakage_check);

;// CONCATENATED MODULE: ./src/checks/reproducibility.ts
/**
 * `reproducibility`: how far the descriptor's shipped coefficients are from the refit.
 */




const reproducibility_check = {
    id: 'reproducibility',
    title: 'Shipped coefficients against the refit',
    limitKey: 'reproducibility',
    defaultLimit: 0.01,
    direction: 'above',
    limitSummary: 'Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.',
    description: `- Default \`0.01\`. Points at \`coefficients\`. Skipped (code
  \`reproducibility/no-coefficients\`) when the descriptor ships none.
- Figure: the largest absolute difference between the predictions of the shipped \`coefficients\` and
  of the refit on the hold-out rows, divided by the range of the training target:
  max_i |x_i^T w_shipped - x_i^T w_refit| / (max y - min y).
- Metric \`shipped_prediction_difference\`. Detail: \`max_prediction_difference\`, \`target_range\`,
  \`at_line\` (hold-out line of the largest difference), \`shipped_holdout_rmse\`, \`refit_holdout_rmse\`,
  \`holdout_rmse_ratio\` (shipped / refit), \`max_coefficient_difference\`.`,
    advice: 'Refit the model from the committed data and ship the new coefficients, or restore the data and terms the shipped coefficients came from.',
    line: (d) => d.coefficientsLine ?? d.nameLine,
    measure({ shipped, predictions, holdout, metrics }) {
        if (shipped === null)
            return { value: null, reason: 'no-coefficients', message: 'the descriptor ships no coefficients' };
        const ps = shipped.holdoutPredictions;
        const pr = predictions.holdout;
        let diff = 0;
        let row = -1;
        for (let i = 0; i < holdout.rows; i++) {
            const d = Math.abs(ps[i] - pr[i]);
            if (d > diff || Number.isNaN(d)) {
                diff = d;
                row = i;
            }
        }
        const [lo, hi] = metrics.targetRange;
        const spread = hi - lo;
        const value = spread > 0 ? diff / spread : diff === 0 ? 0 : Infinity;
        const shippedRmse = shipped.holdout.rmse;
        const coefDiff = shipped.maxCoefficientDifference;
        return {
            value,
            message: `shipped and refit predictions differ by up to ${(0,format/* formatNumber */.Z)(diff)} on the hold-out rows (${(0,format/* formatNumber */.Z)(value * 100)} % of the training target's range ${(0,format/* formatNumber */.Z)(spread)}${row >= 0 ? `, ${(0,errors/* clip */.$Q)(holdout.file)} line ${holdout.lines[row]}` : ''}); hold-out RMSE shipped ${(0,format/* formatNumber */.Z)(shippedRmse)}, refit ${(0,format/* formatNumber */.Z)(metrics.holdoutRmse)}`,
            metrics: { shipped_prediction_difference: (0,result/* jsonNumber */.qj)(value) },
            detail: (0,json/* jsonRecord */.eJ)({
                max_prediction_difference: diff,
                target_range: spread,
                at_line: row >= 0 ? holdout.lines[row] : null,
                shipped_holdout_rmse: shippedRmse,
                refit_holdout_rmse: metrics.holdoutRmse,
                holdout_rmse_ratio: shippedRmse / metrics.holdoutRmse,
                max_coefficient_difference: coefDiff,
            }),
        };
    },
};
/* harmony default export */ const reproducibility = (reproducibility_check);

;// CONCATENATED MODULE: ./src/checks/swing.ts
/**
 * `swing`: how far predictions between the training samples leave the band of training targets.
 */




/** Describes a point's inputs for a message, e.g. `depth_m = 5.1`. */
function describePoint(point) {
    if (point === null)
        return '';
    return Object.entries(point.inputs)
        .map(([name, v]) => `${(0,errors/* clip */.$Q)(name)} = ${(0,format/* formatNumber */.Z)(v)}`)
        .join(', ');
}
/** The chart data every swing outcome carries (see the README for its shape). */
function swingDetail(swing) {
    return (0,json/* jsonRecord */.eJ)({
        band: swing.band,
        inside: swing.inside,
        beyond: swing.beyond,
        margin: swing.margin,
        points: swing.points,
        worst_inside: swing.worstInside,
        worst_beyond: swing.worstBeyond,
        segments: swing.segments,
        curves: swing.curves,
    });
}
/** Line of the first term that reads this input, else the terms line. */
function inputLine(context, point) {
    if (point === null)
        return undefined;
    const names = Object.keys(point.inputs);
    const term = context.design.terms.find((t) => t.inputs.some((c) => names.length === 1 && c === names[0]));
    return term?.spec.line;
}
const swing_check = {
    id: 'swing',
    title: 'Swing between samples',
    limitKey: 'swing',
    defaultLimit: { warn: 0.25, fail: 0.5 },
    direction: 'above',
    limitSummary: 'How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.',
    description: `- Default \`{ warn: 0.25, fail: 0.5 }\`. Points at the line of the term that reads
  the input where the largest excursion happened (models of one input), else at \`terms\`.
- Figure: how far the predictions between the training samples leave the band [min y, max y] of the
  training targets, in band widths: max(0, max(pred) - max y, min y - min(pred)) / (max y - min y).
  0 when every prediction stays in the band.
- Points scanned, one input: 201 evenly spaced points from the smallest to the largest training value
  plus 8 evenly spaced points inside every gap between neighbouring distinct values (the 4,000
  widest gaps when there are more; above 20,000 training rows the gaps are those of 20,000 rows
  at an even stride through the file plus the input's smallest and largest value, since the gaps
  of big files are far narrower than any swing). Several inputs: the same grid along each input with the other
  inputs at their training medians (the 4,000 gaps shared evenly: the widest ceil(4,000 /
  inputs) gaps of each input), plus 8 points on each segment between a training row and each of
  its 3 nearest neighbours (Euclidean distance on the inputs divided by their standard deviations;
  at most 1,000 rows, taken at an even stride through the file).
- Why: a model that interpolates its samples with a high-degree polynomial or narrow radial bumps
  can pass through every sample and still predict absurd values between them (Runge's phenomenon,
  Runge 1901, Zeitschrift für Mathematik und Physik 46).
- Metric \`swing\`. Detail (for charts): \`band: [min y, max y]\`, \`inside\`, \`beyond\`, \`margin\` (0.1),
  \`points: { inside, beyond }\` (counts), \`worst_inside\` and \`worst_beyond\`
  (\`{ inputs: { <input>: value }, prediction }\` or null), \`segments\` (\`{ rows, neighbours,
  pointsPerSegment }\` or null for one input) and \`curves\`: one per input with a spread,
  \`{ input, others: { <input>: median }, range: [min x, max x], x: number[], prediction: number[] }\`,
  x ascending over the range and both margins, at most 400 points (thinned evenly, always keeping the
  largest and smallest prediction).`,
    advice: 'Lower the degree, widen or thin the radial centres, or add a ridge penalty so that the curve stops swinging between the samples.',
    line: (d) => d.termsLine,
    measure(context) {
        const swing = context.analyses.swing();
        if (Number.isNaN(swing.inside)) {
            return { value: null, reason: 'not-applicable', message: 'no input has two distinct training values, so there is nothing between samples to scan', detail: swingDetail(swing) };
        }
        const where = describePoint(swing.worstInside);
        return {
            value: swing.inside,
            message: swing.inside > 0
                ? `between the samples the predictions leave the training target band [${(0,format/* formatNumber */.Z)(swing.band[0])}, ${(0,format/* formatNumber */.Z)(swing.band[1])}] by ${(0,format/* formatNumber */.Z)(swing.inside)} band widths (prediction ${(0,format/* formatNumber */.Z)(swing.worstInside?.prediction)} at ${where}; ${swing.points.inside} points scanned)`
                : `the predictions stay inside the training target band [${(0,format/* formatNumber */.Z)(swing.band[0])}, ${(0,format/* formatNumber */.Z)(swing.band[1])}] at ${swing.points.inside} points between the samples`,
            line: inputLine(context, swing.worstInside),
            metrics: { swing: (0,result/* jsonNumber */.qj)(swing.inside) },
            detail: swingDetail(swing),
        };
    },
};
/* harmony default export */ const swing = (swing_check);

;// CONCATENATED MODULE: ./src/checks/swing-beyond.ts



const swing_beyond_check = {
    id: 'swing-beyond',
    title: 'Swing beyond the samples',
    limitKey: 'swing_beyond',
    defaultLimit: { warn: 1 },
    direction: 'above',
    limitSummary: 'Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).',
    description: `- Default \`{ warn: 1 }\`. Points like \`swing\`.
- Figure: the \`swing\` figure over the margins outside the training range: 40 evenly spaced points on
  each side of each input, up to 10 % of its range beyond the smallest and the largest training value
  (other inputs at their medians). Reported apart from \`swing\` because some extrapolation error is
  expected of any model. Metric \`swing_beyond\`; detail \`margin\`, \`points\`, \`worst\`. The chart curves
  are in the \`swing\` outcome (they include the margins).`,
    advice: 'Do not use the model outside its training range, or choose terms that level off (fewer polynomial powers, radial terms) so that it extrapolates calmly.',
    line: (d) => d.termsLine,
    measure(context) {
        const swing = context.analyses.swing();
        if (Number.isNaN(swing.beyond)) {
            return { value: null, reason: 'not-applicable', message: 'no input has two distinct training values, so there is no range to step beyond' };
        }
        const where = describePoint(swing.worstBeyond);
        return {
            value: swing.beyond,
            message: swing.beyond > 0
                ? `within ${(0,format/* formatNumber */.Z)(swing.margin * 100)} % of the range beyond the samples the predictions leave the training target band [${(0,format/* formatNumber */.Z)(swing.band[0])}, ${(0,format/* formatNumber */.Z)(swing.band[1])}] by ${(0,format/* formatNumber */.Z)(swing.beyond)} band widths (prediction ${(0,format/* formatNumber */.Z)(swing.worstBeyond?.prediction)} at ${where})`
                : `within ${(0,format/* formatNumber */.Z)(swing.margin * 100)} % of the range beyond the samples the predictions stay inside the training target band`,
            line: inputLine(context, swing.worstBeyond),
            metrics: { swing_beyond: (0,result/* jsonNumber */.qj)(swing.beyond) },
            detail: { margin: swing.margin, points: swing.points.beyond, worst: swing.worstBeyond === null ? null : { inputs: swing.worstBeyond.inputs, prediction: (0,result/* jsonNumber */.qj)(swing.worstBeyond.prediction) } },
        };
    },
};
/* harmony default export */ const swing_beyond = (swing_beyond_check);

;// CONCATENATED MODULE: ./src/checks/types.ts
/**
 * Compares a figure with a limit: beyond a fail bound (above `fail`, below `failBelow`) fails,
 * beyond a warn bound warns; a figure that is null or NaN, or an `off` limit, is skipped.
 */
function judge(value, limit) {
    if (limit.off || value === null || Number.isNaN(value))
        return 'skipped';
    if ((limit.fail !== null && value > limit.fail) || (limit.failBelow !== null && value < limit.failBelow))
        return 'fail';
    if ((limit.warn !== null && value > limit.warn) || (limit.warnBelow !== null && value < limit.warnBelow))
        return 'warn';
    return 'pass';
}

;// CONCATENATED MODULE: ./src/checks/index.ts














/** Every check, in report order. Ids are unique (checked on load). */
const CHECKS = validate([
    generalisation_gap,
    parameter_ratio,
    coefficient_size,
    base_change,
    checks_cross_validation,
    swing,
    swing_beyond,
    leakage,
    reproducibility,
    conditioning,
    complexity,
]);
function validate(checks) {
    const seen = new Set();
    for (const c of checks) {
        if (seen.has(c.id))
            throw new Error(`duplicate check id ${c.id}`);
        if (!/^[a-z][a-z0-9-]*$/.test(c.id))
            throw new Error(`check id ${c.id} is not kebab-case`);
        seen.add(c.id);
    }
    return checks;
}
/**
 * The limit keys of the registry with their defaults, directions and summaries, in registry
 * order: the source of src/config/generated/limit-keys.ts, of the JSON Schemas' `limits` and of
 * docs/checks.md (test/tools/gen-validators.mjs writes them; tests keep them current).
 */
function registryLimitKeys() {
    return CHECKS.map((c) => ({ key: c.limitKey, defaultSpec: c.defaultLimit, direction: c.direction, description: c.limitSummary }));
}
/** The check with this id, or undefined. */
function findCheck(id) {
    return CHECKS.find((c) => c.id === id);
}
function describeLimit(status, value, limit) {
    if (status === 'fail')
        return limit.failBelow !== null && value < limit.failBelow ? `under the fail floor ${(0,format/* formatNumber */.Z)(limit.failBelow)}` : `over the fail limit ${(0,format/* formatNumber */.Z)(limit.fail)}`;
    if (status === 'warn')
        return limit.warnBelow !== null && value < limit.warnBelow ? `under the warning floor ${(0,format/* formatNumber */.Z)(limit.warnBelow)}` : `over the warning limit ${(0,format/* formatNumber */.Z)(limit.warn)}`;
    if (limit.off)
        return 'limit is off';
    const parts = [];
    if (limit.warnBelow !== null)
        parts.push(`warn below ${(0,format/* formatNumber */.Z)(limit.warnBelow)}`);
    if (limit.failBelow !== null)
        parts.push(`fail below ${(0,format/* formatNumber */.Z)(limit.failBelow)}`);
    if (limit.warn !== null)
        parts.push(`warn above ${(0,format/* formatNumber */.Z)(limit.warn)}`);
    if (limit.fail !== null)
        parts.push(`fail above ${(0,format/* formatNumber */.Z)(limit.fail)}`);
    return `within limits (${parts.join(', ')})`;
}
/**
 * Runs one check and compares its figure with the model's limit. A check that throws becomes
 * a skipped outcome with code `<id>/internal-error` (the run goes on).
 */
function runCheck(check, context) {
    const limit = context.descriptor.limits[check.limitKey];
    const line = limit?.line ?? null;
    let measured;
    try {
        measured = check.measure(context);
    }
    catch (error) {
        measured = {
            value: null,
            reason: 'internal-error',
            message: `could not be computed: ${error instanceof Error ? error.message : String(error)}`,
        };
    }
    const effective = limit ?? { warn: null, fail: null, warnBelow: null, failBelow: null, off: true, source: 'default', line: null };
    const status = judge(measured.value, effective);
    const reason = measured.reason ?? (status === 'skipped' && effective.off ? 'off' : status);
    const comparison = measured.value === null ? '' : `; ${describeLimit(status, measured.value, effective)}`;
    const outcome = {
        id: check.id,
        code: `${check.id}/${reason}`,
        status,
        value: measured.value === null ? null : (0,result/* jsonNumber */.qj)(measured.value),
        limitKey: check.limitKey,
        limit: effective.off ? null : effective.fail,
        warn: effective.off ? null : effective.warn,
        ...(!effective.off && (effective.warnBelow !== null || effective.failBelow !== null) ? { floor: { warn: effective.warnBelow, fail: effective.failBelow } } : {}),
        line: line ?? measured.line ?? check.line(context.descriptor),
        message: `${measured.message}${comparison}`,
        advice: status === 'fail' || status === 'warn' ? check.advice : '',
        ...(measured.detail ? { detail: measured.detail } : {}),
        ...(measured.suggestion ? { suggestion: measured.suggestion } : {}),
    };
    return { outcome, figures: measured.metrics };
}


/***/ }),

/***/ 5581:
/***/ ((module, __unused_webpack___webpack_exports__, __nccwpck_require__) => {

__nccwpck_require__.a(module, async (__webpack_handle_async_dependencies__, __webpack_async_result__) => { try {
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__nccwpck_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _entries_args_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(7280);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(4296);
/* harmony import */ var _run_pool_js__WEBPACK_IMPORTED_MODULE_4__ = __nccwpck_require__(4236);
/* harmony import */ var _run_worker_role_js__WEBPACK_IMPORTED_MODULE_5__ = __nccwpck_require__(5280);
/* harmony import */ var _run_pipeline_js__WEBPACK_IMPORTED_MODULE_6__ = __nccwpck_require__(5786);
/* harmony import */ var _repo_fs_repository_js__WEBPACK_IMPORTED_MODULE_7__ = __nccwpck_require__(4526);
/* harmony import */ var _report_json_js__WEBPACK_IMPORTED_MODULE_8__ = __nccwpck_require__(2794);
/* harmony import */ var _report_escape_js__WEBPACK_IMPORTED_MODULE_13__ = __nccwpck_require__(4031);
/* harmony import */ var _report_runner_commands_js__WEBPACK_IMPORTED_MODULE_9__ = __nccwpck_require__(673);
/* harmony import */ var _report_text_js__WEBPACK_IMPORTED_MODULE_10__ = __nccwpck_require__(5655);
/* harmony import */ var _result_result_js__WEBPACK_IMPORTED_MODULE_11__ = __nccwpck_require__(1628);
/* harmony import */ var _entries_safe_write_js__WEBPACK_IMPORTED_MODULE_12__ = __nccwpck_require__(9725);
/* harmony import */ var _core_version_js__WEBPACK_IMPORTED_MODULE_14__ = __nccwpck_require__(3323);
/**
 * The `fitgate` command: parse argv, run the pipeline, print a report, set the exit status
 * (0 within limits, 1 a model over a limit, 2 the run could not be done).
 */
// node:fs rather than node:fs/promises: a command reads and writes its few files in turn, and the
// promises module takes about 2 ms to load (readline and streams come with it).















/** Reads the report files of `fitgate merge`; a file that cannot be read is an InputError. */
function readReports(files) {
    return files.map((file) => {
        try {
            return { file, text: (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)(file, 'utf8') };
        }
        catch (error) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .dz('file-missing', `expected a readable JSON report file: ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .errorMessage */ .gJ)(error)}`, { file });
        }
    });
}
/** One line of standard error: control characters shown, no runner command (a file name may hold a line break and `::`). */
function errorLine(message) {
    return `fitgate: ${(0,_report_runner_commands_js__WEBPACK_IMPORTED_MODULE_9__/* .neutraliseLogLine */ .h4)((0,_report_escape_js__WEBPACK_IMPORTED_MODULE_13__/* .escapeTerminal */ .en)(message))}\n`;
}
/** Runs one command; the report goes to standard output or `--out`, the file reports where asked. */
async function main(argv) {
    let debug = argv.includes('--debug');
    try {
        const parsed = (0,_entries_args_js__WEBPACK_IMPORTED_MODULE_2__/* .parseArgs */ .Z)(argv, process.cwd());
        if (parsed.kind === 'print') {
            (parsed.status === 0 ? process.stdout : process.stderr).write((0,_report_runner_commands_js__WEBPACK_IMPORTED_MODULE_9__/* .neutraliseLog */ .Z$)(parsed.text));
            return parsed.status;
        }
        debug = parsed.debug;
        let result;
        let failOn;
        // Modules only some runs need are loaded when asked for, so that a plain check starts fast.
        if (parsed.kind === 'merge') {
            const { mergeReports } = await __nccwpck_require__.e(/* import() */ 640).then(__nccwpck_require__.bind(__nccwpck_require__, 5640));
            result = mergeReports(readReports(parsed.reports), _core_version_js__WEBPACK_IMPORTED_MODULE_14__/* .VERSION */ .x, { expect: parsed.expect });
            failOn = parsed.failOn;
        }
        else {
            let baseOptions = {};
            if (parsed.base !== null) {
                const { CLI_FETCH_HINT, evaluateBase } = await __nccwpck_require__.e(/* import() */ 57).then(__nccwpck_require__.bind(__nccwpck_require__, 2057));
                baseOptions = await evaluateBase(parsed.settings, parsed.base, { fetchHint: CLI_FETCH_HINT });
            }
            const scale = { shard: parsed.shard, jobs: parsed.jobs ?? (0,_run_pool_js__WEBPACK_IMPORTED_MODULE_4__/* .defaultJobs */ .yV)(), root: parsed.settings.root };
            result = await (0,_run_pipeline_js__WEBPACK_IMPORTED_MODULE_6__/* .runPipeline */ .a)(parsed.settings, (0,_repo_fs_repository_js__WEBPACK_IMPORTED_MODULE_7__/* .createFsRepository */ .E)(parsed.settings.root), { ...baseOptions, ...scale });
            failOn = parsed.settings.failOn;
        }
        const toFile = parsed.out !== null;
        const color = parsed.color ?? (!toFile && process.stdout.isTTY === true && !process.env.NO_COLOR);
        // Each format keeps runner commands out of its lines (the text and JSON reporters do it
        // themselves), so the report is safe to print in a CI step.
        const text = parsed.format === 'json'
            ? (0,_report_json_js__WEBPACK_IMPORTED_MODULE_8__/* .formatJson */ .I)(result)
            : parsed.format === 'markdown'
                ? (0,_report_runner_commands_js__WEBPACK_IMPORTED_MODULE_9__/* .neutraliseLog */ .Z$)((await __nccwpck_require__.e(/* import() */ 900).then(__nccwpck_require__.bind(__nccwpck_require__, 5900))).formatMarkdown(result))
                : (0,_report_text_js__WEBPACK_IMPORTED_MODULE_10__/* .formatText */ .v)(result, { color });
        // Where files may go: a path named inside the repository root or the working directory must
        // really stay inside it; a report that cannot be written does not stop the others.
        const cwd = process.cwd();
        const within = parsed.kind === 'check' ? [parsed.settings.root, cwd] : [cwd];
        const failures = [];
        if (parsed.out !== null) {
            try {
                (0,_entries_safe_write_js__WEBPACK_IMPORTED_MODULE_12__/* .writeFileSafely */ .kv)(parsed.out, text, { option: '--out', within });
            }
            catch (error) {
                failures.push((0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .errorMessage */ .gJ)(error));
            }
        }
        else
            process.stdout.write(text);
        // SARIF paths are relative to the working directory when the root lies inside it (code
        // scanning reads them from the checkout); merged shard reports run from the root.
        const prefix = parsed.kind === 'check' ? node_path__WEBPACK_IMPORTED_MODULE_1___default().relative(cwd, parsed.settings.root).split((node_path__WEBPACK_IMPORTED_MODULE_1___default().sep)).join('/') : '';
        if (parsed.html !== null || parsed.sarif !== null || parsed.junit !== null) {
            const { writeFileReports } = await __nccwpck_require__.e(/* import() */ 574).then(__nccwpck_require__.bind(__nccwpck_require__, 574));
            const missed = await writeFileReports(result, {
                html: parsed.html,
                sarif: parsed.sarif,
                junit: parsed.junit,
                sarifPrefix: prefix.startsWith('..') || node_path__WEBPACK_IMPORTED_MODULE_1___default().isAbsolute(prefix) ? '' : prefix,
                failOn,
                within,
                optionPrefix: '--',
            });
            for (const failure of missed)
                failures.push(failure.message);
        }
        for (const message of failures)
            process.stderr.write(errorLine(message));
        return failures.length > 0 ? 2 : (0,_result_result_js__WEBPACK_IMPORTED_MODULE_11__/* .exitStatus */ .$u)(result, failOn);
    }
    catch (error) {
        process.stderr.write(errorLine((0,_core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .errorMessage */ .gJ)(error)));
        if (debug && error instanceof Error && error.stack)
            process.stderr.write(`${(0,_report_runner_commands_js__WEBPACK_IMPORTED_MODULE_9__/* .neutraliseLog */ .Z$)(error.stack)}\n`);
        else if (!(error instanceof _core_errors_js__WEBPACK_IMPORTED_MODULE_3__/* .InputError */ .dz))
            process.stderr.write('(run with --debug for the stack trace)\n');
        return 2;
    }
}
// In a model worker thread (the bundle is one file, so workers load it too) the worker loop runs
// instead: the command itself runs on the main thread only.
if (!(0,_run_worker_role_js__WEBPACK_IMPORTED_MODULE_5__/* .isFitgateWorker */ .$)()) {
    // A closed pipe (`fitgate check | head`) is not an error of the run.
    process.stdout.on('error', (error) => {
        if (error.code !== 'EPIPE')
            throw error;
    });
    process.exitCode = await main(process.argv.slice(2));
}

__webpack_async_result__();
} catch(e) { __webpack_async_result__(e); } }, 1);

/***/ }),

/***/ 4296:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   $Q: () => (/* binding */ clip),
/* harmony export */   cl: () => (/* binding */ quoteValue),
/* harmony export */   dz: () => (/* binding */ InputError),
/* harmony export */   gJ: () => (/* binding */ errorMessage)
/* harmony export */ });
/* unused harmony export MAX_QUOTED */
/**
 * Errors that stop a run (exit status 2) as opposed to check findings (exit status 1).
 *
 * Every problem with the user's files is an {@link InputError}: it carries the file
 * (repository-relative), the 1-based line and column where known, the key path inside a
 * YAML document, the offending value and what was expected, so that the CLI and the action
 * can print one line that says exactly what to fix.
 */
/** A problem with the user's settings, descriptor, data or arguments: exit status 2. */
class InputError extends Error {
    name = 'InputError';
    /** Where the problem is. */
    location;
    /** Stable machine-readable code, e.g. `yaml-syntax`, `schema`, `csv-cell`, `path-outside`. */
    code;
    /**
     * @param code stable id of the kind of problem
     * @param message what is wrong and what was expected (without the location prefix)
     * @param location file, line, column and key where known
     */
    constructor(code, message, location = {}) {
        super(message);
        this.code = code;
        this.location = location;
    }
    /**
     * `file:line:column: key: message`, leaving out the parts that are unknown. The file and the
     * key are user text (a path, a CSV column name) and are cut with {@link clip}.
     */
    describe() {
        const { line, column } = this.location;
        const file = this.location.file === undefined ? undefined : clip(this.location.file);
        const key = this.location.key === undefined ? undefined : clip(this.location.key);
        let where = file ?? '';
        if (file !== undefined && line !== undefined)
            where += `:${line}`;
        if (file !== undefined && line !== undefined && column !== undefined)
            where += `:${column}`;
        const parts = [where, key !== undefined ? `\`${key}\`` : ''].filter((s) => s !== '');
        return parts.length > 0 ? `${parts.join(': ')}: ${this.message}` : this.message;
    }
}
/** Turns anything thrown into one line of text (no stack). */
function errorMessage(error) {
    if (error instanceof InputError)
        return error.describe();
    if (error instanceof Error)
        return error.message;
    return String(error);
}
/** Most characters of one piece of user text (a name, a cell, a path, a pattern) a message quotes. */
const MAX_QUOTED = 80;
/**
 * The one way a message shortens user text: at most `max` characters (default
 * {@link MAX_QUOTED}, 80), the start kept and an ellipsis `…` as the last character when
 * something was cut. A cut never splits a UTF-16 surrogate pair. Every message that shows a
 * name, cell, header, path or pattern from the repository passes it through here (or through
 * {@link quoteValue}, which uses it).
 *
 * @param text the user text
 * @param max largest length of the result in UTF-16 code units (at least 2); default 80
 */
function clip(text, max = MAX_QUOTED) {
    if (text.length <= max)
        return text;
    let end = Math.max(1, max - 1);
    const last = text.charCodeAt(end - 1);
    if (last >= 0xd800 && last <= 0xdbff)
        end -= 1;
    return `${text.slice(0, end)}…`;
}
/**
 * Quotes a user value for an error message: strings as JSON strings, other values as JSON,
 * `undefined` as `nothing`; the whole cut with {@link clip} to `max` characters (default 80).
 */
function quoteValue(value, max = MAX_QUOTED) {
    let text;
    // A long string is cut before quoting (its quoted form is longer than `max` either way).
    if (typeof value === 'string')
        text = JSON.stringify(value.length > max ? value.slice(0, max) : value);
    else if (value === undefined)
        text = 'nothing';
    else {
        try {
            text = JSON.stringify(value) ?? String(value);
        }
        catch {
            text = String(value);
        }
    }
    return clip(text, max);
}


/***/ }),

/***/ 6228:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Z: () => (/* binding */ formatNumber)
/* harmony export */ });
/**
 * Number formatting shared by check messages and reporters.
 */
/**
 * Formats a figure for people: 4 significant digits (whole numbers from 1e4 to 1e6 are rounded to
 * an integer), exponent form below 1e-3 and from 1e6,
 * `∞`/`-∞` for infinities and `NaN` for NaN. `null` gives `–`.
 */
function formatNumber(x, digits = 4) {
    if (x === null || x === undefined)
        return '–';
    if (Number.isNaN(x))
        return 'NaN';
    if (x === Infinity)
        return '∞';
    if (x === -Infinity)
        return '-∞';
    if (x === 0)
        return '0';
    const a = Math.abs(x);
    if (a < 1e-3 || a >= 1e6)
        return x.toExponential(digits - 1).replace(/\.?0+e/, 'e').replace('e+', 'e');
    if (a >= 10 ** digits)
        return String(Math.round(x));
    const text = x.toPrecision(digits);
    return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
}


/***/ }),

/***/ 6153:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Gc: () => (/* binding */ jsonMetrics),
/* harmony export */   M: () => (/* binding */ fromJsonNumber),
/* harmony export */   eJ: () => (/* binding */ jsonRecord),
/* harmony export */   qj: () => (/* binding */ jsonNumber)
/* harmony export */ });
/* unused harmony export jsonSafe */
/**
 * Makes diagnostic figures safe for the JSON report: non-finite numbers become the strings of
 * {@link jsonNumber}, typed arrays become plain arrays, nested objects and arrays are converted.
 */
/** Converts a number for the JSON report (JSON has no infinity or NaN). */
function jsonNumber(x) {
    if (Number.isFinite(x))
        return x;
    if (Number.isNaN(x))
        return 'NaN';
    return x > 0 ? 'Infinity' : '-Infinity';
}
/** Reads a {@link JsonNumber} back into a number. */
function fromJsonNumber(x) {
    if (x === null || x === undefined)
        return Number.NaN;
    if (typeof x === 'number')
        return x;
    return x === 'Infinity' ? Infinity : x === '-Infinity' ? -Infinity : Number.NaN;
}
/**
 * Converts a value for the JSON report (numbers through `jsonNumber`, typed arrays to arrays,
 * `undefined` fields dropped). Objects come out without a prototype (their keys may be column
 * names such as `__proto__`); `JSON.stringify` writes them as any object.
 *
 * @param value numbers, strings, booleans, null, arrays, typed arrays and plain objects of them
 */
function jsonSafe(value) {
    if (typeof value === 'number')
        return jsonNumber(value);
    if (typeof value === 'string' || typeof value === 'boolean' || value === null)
        return value;
    if (ArrayBuffer.isView(value) && !(value instanceof DataView))
        return Array.from(value, jsonNumber);
    if (Array.isArray(value))
        return value.map(jsonSafe);
    if (typeof value === 'object' && value !== undefined) {
        // Keys may be column names (user text): no prototype, so `__proto__` is a name like any other.
        const out = Object.create(null);
        for (const [k, v] of Object.entries(value))
            if (v !== undefined)
                out[k] = jsonSafe(v);
        return out;
    }
    return null;
}
/** {@link jsonSafe} for a record of figures (model metrics or check detail). */
function jsonRecord(record) {
    return jsonSafe(record);
}
/** Model metrics: numbers through `jsonNumber` (flat record). */
function jsonMetrics(record) {
    const out = {};
    for (const [k, v] of Object.entries(record))
        out[k] = typeof v === 'number' ? jsonNumber(v) : v;
    return out;
}


/***/ }),

/***/ 3323:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   x: () => (/* binding */ VERSION)
/* harmony export */ });
/** fitgate's version, reported in every result. Kept in step with package.json by a test. */
const VERSION = '0.1.0';


/***/ }),

/***/ 8706:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   CA: () => (/* binding */ emptyError),
/* harmony export */   L6: () => (/* binding */ raggedError),
/* harmony export */   NX: () => (/* binding */ planRequest),
/* harmony export */   Vt: () => (/* binding */ MIN_NORMAL),
/* harmony export */   W4: () => (/* binding */ cellNumber),
/* harmony export */   _I: () => (/* binding */ DEFAULT_CHUNK_ROWS),
/* harmony export */   fS: () => (/* binding */ DEFAULT_MAX_BYTES),
/* harmony export */   j7: () => (/* binding */ planColumns),
/* harmony export */   vB: () => (/* binding */ ChunkBuilder)
/* harmony export */ });
/* unused harmony exports MAX_HEADER_COLUMNS, DECIMAL_NUMBER, layoutHint, underflows, cellError */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(4296);
/**
 * The rules both CSV paths share, kept in one place so that the fast path and the general
 * path cannot drift apart: what a number cell may look like, how the header is checked,
 * the exact error each problem raises, and how rows are gathered into chunks.
 */

/** Rows per chunk when the caller does not say. */
const DEFAULT_CHUNK_ROWS = 65536;
/** Size cap in bytes when the caller does not say (512 MiB). */
const DEFAULT_MAX_BYTES = 512 * 1024 * 1024;
/** How many header names an error message lists before cutting the list. */
const MAX_NAMES_LISTED = 20;
/** How many characters of a bad cell an error message quotes. */
const MAX_CELL_QUOTED = 40;
/** Most columns a header may name (a header that is the whole of a mis-separated file stops here). */
const MAX_HEADER_COLUMNS = 100_000;
/**
 * Smallest positive normal double, 2^-1022 (IEEE 754 binary64). A nonzero decimal whose value
 * is below it reads as a subnormal (fewer significant bits) or as 0: an underflow, refused like
 * an overflow.
 */
const MIN_NORMAL = 2.2250738585072014e-308;
/**
 * A decimal number as JavaScript's `Number()` reads it, without the forms we refuse
 * (empty text, `Infinity`, hexadecimal / binary / octal prefixes): optional sign, digits
 * with an optional point (`1`, `1.`, `.5`, `1.5`), optional exponent (`e-3`, `E+05`).
 * Source: ECMA-262 `StrDecimalLiteral` (section "ToNumber Applied to the String Type").
 */
const DECIMAL_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
/**
 * Collapses repeated names in a column request.
 * @param columns names as the caller gave them
 */
function planRequest(columns) {
    const distinct = [];
    const slotOfColumn = [];
    for (const name of columns) {
        let slot = distinct.indexOf(name);
        if (slot === -1) {
            slot = distinct.length;
            distinct.push(name);
        }
        slotOfColumn.push(slot);
    }
    return { columns, distinct, slotOfColumn };
}
/**
 * Checks the header and maps requested columns to fields.
 * Throws InputError `csv-header` for a repeated name (both 1-based positions),
 * `csv-missing-column` for requested names the header lacks (listing up to 20 names it has).
 *
 * @param file repository-relative path, for messages
 * @param header names as read (already trimmed)
 * @param headerLine 1-based line of the header
 * @param request the distinct requested columns
 */
function planColumns(file, header, headerLine, request) {
    if (header.some((name) => name.includes('\r'))) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-line-ends', 'the header holds a carriage return that no line feed follows; expected lines ending with a line feed (LF or CRLF). Hint: the file has CR-only line ends (as classic Mac OS wrote them): save it with LF or CRLF line ends', { file, line: headerLine });
    }
    if (header.length > MAX_HEADER_COLUMNS) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-header-too-wide', `the header names ${header.length} columns; expected at most ${MAX_HEADER_COLUMNS}${layoutHint(header)}`, { file, line: headerLine });
    }
    const position = new Map();
    header.forEach((name, i) => {
        const earlier = position.get(name);
        if (earlier !== undefined) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-header', `the header names column ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(name, MAX_CELL_QUOTED)} twice, at positions ${earlier + 1} and ${i + 1}; expected unique column names`, { file, line: headerLine, key: name });
        }
        position.set(name, i);
    });
    const missing = request.distinct.filter((name) => !position.has(name));
    if (missing.length > 0) {
        const listed = header.slice(0, MAX_NAMES_LISTED).map((name) => (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(name, MAX_CELL_QUOTED));
        const more = header.length > MAX_NAMES_LISTED ? `, … (${header.length - MAX_NAMES_LISTED} more)` : '';
        const wanted = missing.map((name) => (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(name, MAX_CELL_QUOTED)).join(', ');
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-missing-column', `no column named ${wanted}; the header has ${header.length} column${header.length === 1 ? '' : 's'}: ${listed.join(', ')}${more}${layoutHint(header)}`, { file, line: headerLine, key: missing[0] });
    }
    const slotOfField = new Int32Array(header.length).fill(-1);
    const fieldOfSlot = new Int32Array(request.distinct.length);
    request.distinct.forEach((name, slot) => {
        const field = position.get(name);
        slotOfField[field] = slot;
        fieldOfSlot[slot] = field;
    });
    return { header, headerLine, slotOfField, fieldOfSlot };
}
/** First line of a Git LFS pointer file (git-lfs specification, "version https://git-lfs.github.com/spec/v1"). */
const LFS_POINTER = 'version https://git-lfs.github.com/spec/';
/**
 * A one-sentence hint (starting `. Hint: `) when a header looks like a file that is not
 * comma-separated CSV at all: a Git LFS pointer (the data was never fetched), a file separated by
 * semicolons or tabs (one column whose name holds the separators); '' otherwise.
 *
 * @param header the header names as read
 */
function layoutHint(header) {
    const only = header.length === 1 ? header[0] : '';
    if (header.length > 0 && header[0].startsWith(LFS_POINTER)) {
        return '. Hint: the file is a Git LFS pointer, not the data: fetch the LFS objects before the check (`git lfs pull`, or `lfs: true` on the checkout step)';
    }
    if (only.includes(';'))
        return '. Hint: the header holds semicolons and no commas: the file looks semicolon-separated; fitgate reads comma-separated files';
    if (only.includes('\t'))
        return '. Hint: the header holds tabs and no commas: the file looks tab-separated; fitgate reads comma-separated files';
    return '';
}
/**
 * True when the decimal text has a nonzero digit before its exponent (its value is not 0).
 * @param text a {@link DECIMAL_NUMBER} text
 */
function nonzeroDecimal(text) {
    for (let i = 0; i < text.length; i++) {
        const c = text.charCodeAt(i);
        if (c === 101 || c === 69)
            return false; // e, E: the exponent starts
        if (c >= 49 && c <= 57)
            return true; // 1-9
    }
    return false;
}
/**
 * True when a decimal text's value underflows: the text names a nonzero number, but `Number()`
 * gives 0 or a subnormal (below {@link MIN_NORMAL} in size), e.g. `1e-400` or `2.5e-320`.
 *
 * @param text a {@link DECIMAL_NUMBER} text
 * @param value `Number(text)`
 */
function underflows(text, value) {
    return Math.abs(value) < MIN_NORMAL && (value !== 0 || nonzeroDecimal(text));
}
/**
 * Reads one cell of a requested column as the general path does: trims white space (as
 * `String.prototype.trim` defines it), then accepts only {@link DECIMAL_NUMBER} text whose
 * value is finite and does not underflow (see {@link underflows}). Anything else throws
 * InputError `csv-cell`.
 *
 * @param cell the field text (quotes already removed)
 * @param file repository-relative path, for messages
 * @param line 1-based physical line of the row
 * @param column the column's header name
 */
function cellNumber(cell, file, line, column) {
    const text = cell.trim();
    if (DECIMAL_NUMBER.test(text)) {
        const value = Number(text);
        if (Number.isFinite(value) && !underflows(text, value))
            return value;
    }
    throw cellError(cell, file, line, column);
}
/** The `csv-cell` error for a cell that is not a finite decimal number (or underflows). */
function cellError(cell, file, line, column) {
    const text = cell.trim();
    let why;
    if (text === '')
        why = 'the cell is empty';
    else if (DECIMAL_NUMBER.test(text) && Number.isFinite(Number(text))) {
        why = `got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(cell, MAX_CELL_QUOTED)}, which is nonzero but too small for 64-bit floating point (below about 2.2e-308 in size it reads as 0 or loses precision); rescale the column`;
    }
    else if (DECIMAL_NUMBER.test(text))
        why = `got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(cell, MAX_CELL_QUOTED)}, which is beyond the range of 64-bit floating point (about ±1.8e308)`;
    else if (/^[+-]?(?:nan|inf|infinity)$/i.test(text))
        why = `got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(cell, MAX_CELL_QUOTED)}; missing and infinite values are not allowed`;
    else
        why = `got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(cell, MAX_CELL_QUOTED)}`;
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-cell', `column ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(column, MAX_CELL_QUOTED)}: expected a finite decimal number (like 12, -0.5 or 1.5e-3); ${why}`, { file, line, key: column });
}
/** The `csv-ragged` error for a row whose field count differs from the header's. */
function raggedError(file, line, expected, actual) {
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-ragged', `the row has ${actual} field${actual === 1 ? '' : 's'}; expected ${expected}, as many as the header`, { file, line });
}
/** The `csv-empty` error for a file without a header row. */
function emptyError(file) {
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('csv-empty', 'the file has no header row; expected a first line of comma-separated column names', {
        file,
    });
}
/** First buffer size of a chunk; buffers double from here up to the chunk size. */
const FIRST_CAPACITY = 4096;
/**
 * Gathers rows into column buffers and hands out chunks of `chunkRows` rows.
 * Parsers write `slots[s][row]` and `lines[row]` directly, then advance `row`; when `row`
 * reaches `capacity` they call {@link ChunkBuilder.full}, which grows the buffers (doubling)
 * or hands out a chunk, and reload `slots`, `lines`, `row` and `capacity`.
 */
class ChunkBuilder {
    request;
    chunkRows;
    /** Filled chunks not yet handed out. */
    ready = [];
    /** One buffer per distinct requested column, length `capacity`. */
    slots = [];
    /** 1-based physical line of each row, length `capacity`. */
    lines = new Int32Array(0);
    /** Rows written in the current buffers. */
    row = 0;
    /** Rows the current buffers hold. */
    capacity = 0;
    /**
     * @param request the requested columns (a chunk lists them in the asked order)
     * @param chunkRows rows per chunk
     */
    constructor(request, chunkRows) {
        this.request = request;
        this.chunkRows = chunkRows;
        this.fresh();
    }
    /** Advances one row (for parsers that do not track `row` themselves). */
    endRow() {
        this.row++;
        if (this.row === this.capacity)
            this.full();
    }
    /** Called when `row === capacity`: hands out a chunk, or doubles the buffers. */
    full() {
        if (this.row >= this.chunkRows) {
            this.flush();
            return;
        }
        const capacity = Math.min(this.chunkRows, this.capacity * 2);
        this.slots = this.slots.map((old) => {
            const grown = new Float64Array(capacity);
            grown.set(old);
            return grown;
        });
        const lines = new Int32Array(capacity);
        lines.set(this.lines);
        this.lines = lines;
        this.capacity = capacity;
    }
    /** Hands out the rows gathered so far as a chunk (nothing when there are none). */
    flush() {
        const rows = this.row;
        if (rows === 0)
            return;
        const exact = rows === this.capacity;
        const slots = exact ? this.slots : this.slots.map((s) => s.slice(0, rows));
        const lines = exact ? this.lines : this.lines.slice(0, rows);
        const chunk = { rows, columns: this.request.slotOfColumn.map((slot) => slots[slot]), lines };
        if (exact)
            this.#buffersOf.set(chunk, { slots, lines });
        this.ready.push(chunk);
        this.fresh();
    }
    /**
     * Takes back a chunk handed out by this builder whose reader is done with it: its buffers are
     * reused for a later chunk (no allocation per chunk when the reader copies each chunk away
     * before asking for the next). Chunks of another size are ignored.
     *
     * @param chunk a chunk from {@link take}; must not be read afterwards
     */
    recycle(chunk) {
        const buffers = this.#buffersOf.get(chunk);
        if (buffers === undefined)
            return;
        this.#buffersOf.delete(chunk);
        this.#spare.push(buffers);
    }
    #buffersOf = new WeakMap();
    #spare = [];
    /** Takes the chunks handed out so far. */
    take() {
        return this.ready.splice(0, this.ready.length);
    }
    /** New buffers, as large as the last ones (a file that filled one chunk likely fills more). */
    fresh() {
        if (this.capacity === 0)
            this.capacity = Math.min(this.chunkRows, FIRST_CAPACITY);
        this.row = 0;
        while (this.#spare.length > 0) {
            const spare = this.#spare.pop();
            if (spare.lines.length !== this.capacity)
                continue;
            this.slots = spare.slots;
            this.lines = spare.lines;
            return;
        }
        this.slots = this.request.distinct.map(() => new Float64Array(this.capacity));
        this.lines = new Int32Array(this.capacity);
    }
}


/***/ }),

/***/ 4113:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  Si: () => (/* binding */ blockError),
  Sj: () => (/* binding */ encodingError),
  Dr: () => (/* binding */ lineBlocks)
});

// UNUSED EXPORTS: MAX_HEADER_BYTES, headerTooLongError

;// CONCATENATED MODULE: external "node:buffer"
const external_node_buffer_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:buffer");
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __nccwpck_require__(4296);
;// CONCATENATED MODULE: ./src/data/line-blocks.ts
/**
 * Turns a file's byte pieces (as a {@link RepoReader} streams them, split anywhere) into
 * blocks that end right after a line feed, so that no line and no UTF-8 character is ever
 * split between two blocks. Both CSV paths read through this one door, which also drops a
 * UTF-8 byte-order mark and stops at the first line that is not UTF-8 (the reader, which
 * counts lines, then throws {@link encodingError}).
 */


/** The header, with any blank lines before it, must end within this many bytes of the file's start (1 MiB). */
const MAX_HEADER_BYTES = 1024 * 1024;
const LF = 10;
const CR = 13;
const BOM = [0xef, 0xbb, 0xbf];
const decoder = new TextDecoder('utf-8');
/**
 * Streams `pieces` as blocks of whole lines, checked to be UTF-8.
 *
 * A leading UTF-8 byte-order mark is dropped (line 1 stays line 1). When a line holds bytes
 * that are not UTF-8, the lines before it are still yielded, then a block with `badUtf8`
 * ends the stream: so errors always surface in file order, whatever the piece sizes.
 * An empty file yields nothing. No piece is copied except the line that straddles two pieces.
 * Until the header (the first line that is not blank) has ended, at most
 * {@link MAX_HEADER_BYTES} bytes are held: past that, a block with `headerTooLong` ends the
 * stream, so a file that is one endless line is refused before it is in memory.
 *
 * @param pieces the file's bytes in pieces of any size (an empty piece is allowed)
 */
async function* lineBlocks(pieces) {
    let pending = [];
    let pendingBytes = 0;
    let first = true;
    /** Bytes handed out (or passed over as a byte-order mark) so far. */
    let consumed = 0;
    /** True once a line that is not blank has ended within the cap. */
    let headerEnded = false;
    /** The block that ends the stream for a header over the cap. */
    const tooLong = (held) => ({
        bytes: new Uint8Array(0),
        final: false,
        badUtf8: false,
        utf16: false,
        headerTooLong: true,
        loneCarriageReturn: held.some(hasLoneCarriageReturn),
    });
    /** Checks and hands out `bytes`; false when they end the stream (bad UTF-8, header too long). */
    function* emit(bytes, final) {
        if (first) {
            first = false;
            if (bytes.length >= 3 && bytes[0] === BOM[0] && bytes[1] === BOM[1] && bytes[2] === BOM[2]) {
                bytes = bytes.subarray(3);
                consumed += 3;
            }
            else if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))) {
                yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, utf16: true };
                return false;
            }
        }
        if (bytes.length === 0)
            return true;
        if (!headerEnded) {
            const end = headerEnd(bytes);
            if (end >= 0)
                headerEnded = true;
            if (consumed + (end >= 0 ? end : bytes.length) > MAX_HEADER_BYTES) {
                yield tooLong([bytes]);
                return false;
            }
        }
        consumed += bytes.length;
        const good = utf8Prefix(bytes);
        if (good === bytes.length) {
            yield { bytes, final, badUtf8: false, utf16: false };
            return true;
        }
        if (good > 0)
            yield { bytes: bytes.subarray(0, good), final: false, badUtf8: false, utf16: false };
        yield { bytes: bytes.subarray(0, 0), final: false, badUtf8: true, utf16: false };
        return false;
    }
    for await (const piece of pieces) {
        if (piece.length === 0)
            continue;
        const firstCut = piece.indexOf(LF) + 1;
        if (firstCut === 0) {
            pending.push(piece);
            pendingBytes += piece.length;
            if (!headerEnded && consumed + pendingBytes > MAX_HEADER_BYTES) {
                // Still no line end, and the header would be over the cap: stop holding bytes.
                yield tooLong(pending);
                return;
            }
            continue;
        }
        // The line that straddles the previous pieces and this one, then this piece's whole lines.
        const lastCut = piece.lastIndexOf(LF) + 1;
        if (pendingBytes > 0) {
            const joined = concat([...pending, piece.subarray(0, firstCut)], pendingBytes + firstCut);
            if (!(yield* emit(joined, false)))
                return;
            if (lastCut > firstCut && !(yield* emit(piece.subarray(firstCut, lastCut), false)))
                return;
        }
        else if (!(yield* emit(piece.subarray(0, lastCut), false)))
            return;
        pending = lastCut < piece.length ? [piece.subarray(lastCut)] : [];
        pendingBytes = piece.length - lastCut;
    }
    if (pendingBytes > 0)
        yield* emit(concat(pending, pendingBytes), true);
}
/**
 * Offset just past the end of the first line in `bytes` that is not blank (white space only, as
 * `String.prototype.trim` defines it), or -1 when every line is blank. The end of `bytes` ends
 * its last line.
 */
function headerEnd(bytes) {
    let start = 0;
    while (start < bytes.length) {
        const lf = bytes.indexOf(LF, start);
        const end = lf === -1 ? bytes.length : lf + 1;
        if (decoder.decode(bytes.subarray(start, end)).trim() !== '')
            return end;
        start = end;
    }
    return -1;
}
/** True when `bytes` hold a carriage return that no line feed follows (at the end too). */
function hasLoneCarriageReturn(bytes) {
    for (let i = bytes.indexOf(CR); i !== -1; i = bytes.indexOf(CR, i + 1))
        if (bytes[i + 1] !== LF)
            return true;
    return false;
}
function concat(parts, total) {
    if (parts.length === 1)
        return parts[0];
    const out = new Uint8Array(total);
    let at = 0;
    for (const part of parts) {
        out.set(part, at);
        at += part.length;
    }
    return out;
}
/** Length of the longest run of whole UTF-8 lines at the start of `bytes`. */
function utf8Prefix(bytes) {
    if ((0,external_node_buffer_namespaceObject.isUtf8)(bytes))
        return bytes.length;
    let start = 0;
    while (start < bytes.length) {
        const lf = bytes.indexOf(LF, start);
        const end = lf === -1 ? bytes.length : lf + 1;
        if (!(0,external_node_buffer_namespaceObject.isUtf8)(bytes.subarray(start, end)))
            break;
        start = end;
    }
    return start;
}
/**
 * The `csv-header-too-long` error: the header does not end within {@link MAX_HEADER_BYTES}.
 * @param file repository-relative path
 * @param line 1-based line where the header starts
 * @param loneCarriageReturn the bytes read hold carriage returns without line feeds
 */
function headerTooLongError(file, line, loneCarriageReturn) {
    const hint = loneCarriageReturn
        ? '. Hint: the file has CR-only line ends (as classic Mac OS wrote them), so it reads as one line: save it with LF or CRLF line ends'
        : '. Hint: a file without line feeds (not CSV text, or one record per file) reads as one line';
    return new errors/* InputError */.dz('csv-header-too-long', `the header line does not end within the first ${MAX_HEADER_BYTES} bytes (1 MiB) of the file; expected a header of comma-separated column names on one line${hint}`, {
        file,
        line,
    });
}
/**
 * The error a reader throws for a block that ends the stream (`badUtf8` or `headerTooLong`),
 * or null for a block of lines. Both CSV paths go through here, so they give the same error.
 * @param file repository-relative path
 * @param line 1-based line right after the lines read so far
 * @param block the block
 */
function blockError(file, line, block) {
    if (block.headerTooLong === true)
        return headerTooLongError(file, line, block.loneCarriageReturn === true);
    if (block.badUtf8)
        return encodingError(file, line, block.utf16);
    return null;
}
/**
 * The `csv-encoding` error for a line that is not UTF-8.
 * @param file repository-relative path
 * @param line 1-based line holding the bad bytes
 * @param utf16 the file starts with a UTF-16 byte-order mark
 */
function encodingError(file, line, utf16) {
    const hint = utf16 ? ' (the file looks like UTF-16)' : '';
    return new errors/* InputError */.dz('csv-encoding', `the line holds bytes that are not UTF-8 text${hint}; expected a UTF-8 CSV file (save it as UTF-8)`, {
        file,
        line,
    });
}


/***/ }),

/***/ 7254:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   aN: () => (/* binding */ forEachBlock),
/* harmony export */   tp: () => (/* binding */ predictRows)
/* harmony export */ });
/* unused harmony export blockRows */
/* harmony import */ var _kernels_index_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(8667);

/**
 * Rows per block for a design of p columns: about 64 K doubles (512 KiB), at least 64 rows. Small
 * enough to stay in cache between building a block and folding it (the QR works on pieces of a
 * few hundred rows of it), and to keep each pass's buffer from weighing on peak memory; large
 * enough that the per-block overhead does not show.
 */
function blockRows(p) {
    return Math.max(64, Math.floor((1 << 16) / Math.max(1, p)));
}
/**
 * Calls `visit(X, start, m)` for consecutive blocks of rows; `X` is column-major m x p and is
 * reused between calls (copy it to keep it).
 */
function forEachBlock(design, data, visit) {
    const size = blockRows(design.p);
    const buffer = new Float64Array(Math.min(size, Math.max(1, data.rows)) * design.p);
    for (let start = 0; start < data.rows; start += size) {
        const m = Math.min(size, data.rows - start);
        design.fill(data.inputs, start, m, buffer);
        visit(buffer, start, m);
    }
}
/** Predictions Phi w for every row of `data`, block by block (length `data.rows`). */
function predictRows(design, data, w) {
    const out = new Float64Array(data.rows);
    forEachBlock(design, data, (X, start, m) => (0,_kernels_index_js__WEBPACK_IMPORTED_MODULE_0__/* .addProducts */ .kD)(out, start, X, m, w, design.p));
    return out;
}


/***/ }),

/***/ 6566:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   x: () => (/* binding */ createDesign)
/* harmony export */ });
/* unused harmony export INTERCEPT */
/** Name of the intercept column. */
const INTERCEPT = '(intercept)';
/**
 * Builds a design from fixed terms.
 * @param terms the terms in descriptor order
 * @param intercept whether to put a column of ones first
 */
function createDesign(terms, intercept) {
    const inputs = [];
    for (const t of terms)
        for (const c of t.inputs)
            if (!inputs.includes(c))
                inputs.push(c);
    const names = intercept ? ['(intercept)'] : [];
    const offsets = [];
    for (const t of terms) {
        offsets.push(names.length);
        names.push(...t.columnNames);
    }
    const p = names.length;
    const penalised = names.map((_, j) => !(intercept && j === 0));
    const termInputIndex = terms.map((t) => t.inputs.map((c) => inputs.indexOf(c)));
    return {
        p,
        columnNames: names,
        penalised,
        termOffsets: offsets,
        intercept,
        terms,
        inputs,
        fill(cols, start, m, out = new Float64Array(m * p)) {
            if (intercept)
                out.fill(1, 0, m);
            const views = cols.map((c) => c.subarray(start, start + m));
            for (let t = 0; t < terms.length; t++) {
                terms[t].fill(termInputIndex[t].map((k) => views[k]), m, out, offsets[t]);
            }
            return out;
        },
    };
}


/***/ }),

/***/ 6801:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Mq: () => (/* binding */ sumOfSquaredDeviations),
/* harmony export */   jZ: () => (/* binding */ sumOfDeviations),
/* harmony export */   nQ: () => (/* binding */ largest),
/* harmony export */   ud: () => (/* binding */ meanAndSd),
/* harmony export */   y1: () => (/* binding */ range)
/* harmony export */ });
/* unused harmony export smallest */
/**
 * Column statistics used to fix basis parameters.
 */
/**
 * Mean and population standard deviation sqrt(mean((x - mean)^2)) of the first `n` entries,
 * by two passes (the second on deviations, so no cancellation). Empty input gives NaN.
 */
function meanAndSd(x, n = x.length) {
    if (n === 0)
        return { mean: Number.NaN, sd: Number.NaN };
    let mean = sumOf(x, n) / n;
    // One correction step (mean of deviations) keeps the mean exact to rounding for large offsets.
    mean += sumOfDeviations(x, n, mean) / n;
    return { mean, sd: Math.sqrt(sumOfSquaredDeviations(x, n, mean) / n) };
}
// The passes below are separate functions, each one loop followed by nothing but its return, so
// that V8's code optimised in the middle of a long loop never runs into code it has no type
// feedback for (which throws the optimised code away; see DEVELOPERS.md, "Writing hot loops").
function sumOf(x, n) {
    let sum = 0;
    for (let i = 0; i < n; i++)
        sum += x[i];
    return sum;
}
/** Sum of x[i] - shift over x[0..n), added in order. */
function sumOfDeviations(x, n, shift) {
    let dev = 0;
    for (let i = 0; i < n; i++)
        dev += x[i] - shift;
    return dev;
}
/** Sum of (x[i] - shift)^2 over x[0..n), added in order. */
function sumOfSquaredDeviations(x, n, shift) {
    let ss = 0;
    for (let i = 0; i < n; i++) {
        const d = x[i] - shift;
        ss += d * d;
    }
    return ss;
}
/** Smallest and largest of the first `n` entries (NaN entries ignored); [Infinity, -Infinity] when empty. */
function range(x, n = x.length) {
    return [smallest(x, n), largest(x, n)];
}
/** Smallest of x[0..n), NaN ignored; Infinity when empty. */
function smallest(x, n) {
    let lo = Infinity;
    for (let i = 0; i < n; i++)
        if (x[i] < lo)
            lo = x[i];
    return lo;
}
/** Largest of x[0..n), NaN ignored; -Infinity when empty. */
function largest(x, n) {
    let hi = -Infinity;
    for (let i = 0; i < n; i++)
        if (x[i] > hi)
            hi = x[i];
    return hi;
}


/***/ }),

/***/ 7482:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  P: () => (/* binding */ createTerm),
  Q: () => (/* binding */ termInputs)
});

;// CONCATENATED MODULE: ./src/design/terms/linear.ts
/** Builds the linear term: one design column per listed input column, copied unchanged. */
function linearTerm(spec) {
    return {
        spec,
        inputs: spec.columns,
        columnNames: spec.columns,
        fixed: {},
        fill(inputs, m, out, offset) {
            for (let j = 0; j < inputs.length; j++) {
                out.set(inputs[j].subarray(0, m), (offset + j) * m);
            }
        },
    };
}

// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __nccwpck_require__(4296);
// EXTERNAL MODULE: ./src/kernels/index.ts + 10 modules
var kernels = __nccwpck_require__(8667);
// EXTERNAL MODULE: ./src/design/stats.ts
var stats = __nccwpck_require__(6801);
;// CONCATENATED MODULE: ./src/design/terms/polynomial.ts



/**
 * Fixes shift and scale from the training column and returns the term.
 * @throws InputError `constant-input` when the default scale would be 0 (a constant column)
 */
function polynomialTerm(spec, training, file) {
    const x = training.get(spec.of);
    let shift = spec.shift;
    let scale = spec.scale;
    if (shift === null || scale === null) {
        const { mean, sd } = (0,stats/* meanAndSd */.ud)(x);
        shift ??= mean;
        if (scale === null) {
            if (!(sd > 0)) {
                throw new errors/* InputError */.dz('constant-input', `column \`${(0,errors/* clip */.$Q)(spec.of)}\` is constant in the training data, so its default scale (standard deviation) is 0; give \`scale\` explicitly or drop the term`, { file, line: spec.line, key: 'polynomial.of' });
            }
            scale = sd;
        }
    }
    const s = shift;
    const sc = scale;
    const raw = s === 0 && scale === 1;
    const names = [];
    for (let k = 1; k <= spec.degree; k++) {
        const base = raw ? spec.of : `z(${spec.of})`;
        names.push(k === 1 ? base : `${base}^${k}`);
    }
    return {
        spec,
        inputs: [spec.of],
        columnNames: names,
        fixed: { shift: s, scale },
        fill(inputs, m, out, offset) {
            (0,kernels/* polynomialColumns */.gU)(inputs[0], m, s, sc, raw, spec.degree, out, offset * m);
        },
    };
}

;// CONCATENATED MODULE: ./src/design/terms/rbf.ts
/** Largest number of centres a `{ from, to, step }` range may produce. */
const MAX_STEP_CENTERS = 10000;
/** The centres a specification stands for, in order. */
function rbfCenters(centers, training) {
    switch (centers.kind) {
        case 'list':
            return [...centers.values];
        case 'count': {
            const { from, to, count } = centers;
            if (count === 1)
                return [from];
            const out = [];
            for (let k = 0; k < count; k++)
                out.push(k === count - 1 ? to : from + ((to - from) * k) / (count - 1));
            return out;
        }
        case 'step': {
            const { from, to, step } = centers;
            const out = [];
            const dir = to >= from ? 1 : -1;
            for (let k = 0; out.length < MAX_STEP_CENTERS; k++) {
                const c = from + dir * k * step;
                if (dir * (c - to) > 1e-9 * step)
                    break;
                out.push(c);
            }
            return out;
        }
        case 'at-samples':
            return Array.from(training);
    }
}
/** Formats a centre for a column name (shortest round-trip text, at most 6 significant digits). */
function label(c) {
    const short = Number(c.toPrecision(6));
    return String(short);
}
/** Builds the Gaussian term with its centres fixed. */
function rbfTerm(spec, training) {
    const x = training.get(spec.of);
    const centres = rbfCenters(spec.centers, x);
    const a = 1 / (2 * spec.width * spec.width);
    return {
        spec,
        inputs: [spec.of],
        columnNames: centres.map((c) => `rbf(${spec.of}; c=${label(c)})`),
        fixed: { width: spec.width, centers: centres },
        fill(inputs, m, out, offset) {
            for (let k = 0; k < centres.length; k++)
                gaussianColumn(inputs[0], m, centres[k], a, out, (offset + k) * m);
        },
    };
}
/**
 * out[at + i] = exp(-(x[i] - c)^2 a) for i < m. A function of its own, one loop (see
 * DEVELOPERS.md, "Writing hot loops").
 */
function gaussianColumn(x, m, c, a, out, at) {
    for (let i = 0; i < m; i++) {
        const d = x[i] - c;
        out[at + i] = Math.exp(-d * d * a);
    }
}

;// CONCATENATED MODULE: ./src/design/terms/index.ts



/** Every input column a term reads (without duplicates, in first-use order). */
function termInputs(spec) {
    return spec.kind === 'linear' ? [...new Set(spec.columns)] : [spec.of];
}
/**
 * Fixes a term's data-dependent parameters from the training columns.
 * @param spec the descriptor entry
 * @param training training columns by name (must hold every input of the term)
 * @param file descriptor path, for errors
 */
function createTerm(spec, training, file) {
    switch (spec.kind) {
        case 'linear':
            return linearTerm(spec);
        case 'polynomial':
            return polynomialTerm(spec, training, file);
        case 'rbf':
            return rbfTerm(spec, training);
    }
}


/***/ }),

/***/ 7114:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   $l: () => (/* binding */ summariseFolds),
/* harmony export */   DJ: () => (/* binding */ crossValidate),
/* harmony export */   UN: () => (/* binding */ FoldFactorBuilder),
/* harmony export */   Y6: () => (/* binding */ foldFactors),
/* harmony export */   Yo: () => (/* binding */ outOfFoldErrors),
/* harmony export */   Z4: () => (/* binding */ mergeFactors),
/* harmony export */   Zd: () => (/* binding */ complementFactors),
/* harmony export */   dn: () => (/* binding */ complementCoefficients),
/* harmony export */   un: () => (/* binding */ outOfFoldErrorsFromFactors)
/* harmony export */ });
/* unused harmony export LEVERAGE_ONE_TOLERANCE */
/* harmony import */ var _fit_index_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(2485);
/* harmony import */ var _design_blocks_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(7254);
/* harmony import */ var _kernels_index_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(8667);



/** Leverages within this distance of 1 count as 1 (the row is interpolated; its LOO error is infinite). */
const LEVERAGE_ONE_TOLERANCE = 1e-10;
/**
 * Folds design blocks into one QR factor per fold as they stream past: a block whose rows all
 * belong to one fold (the usual case for `blocks` folds) goes in as it is; otherwise its rows are
 * gathered per fold into a scratch block first. Rows enter each fold's factor in file order.
 */
class FoldFactorBuilder {
    /** One accumulator per fold (data rows only, no penalty). */
    factors;
    #folds;
    #p;
    #sub = new Float64Array(0);
    #subY = new Float64Array(0);
    #counts;
    /**
     * @param p design columns
     * @param folds fold of each row
     */
    constructor(p, folds) {
        this.#p = p;
        this.#folds = folds;
        this.factors = Array.from({ length: folds.k }, () => new _fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .QrAccumulator */ .SC(p));
        this.#counts = new Int32Array(folds.k);
    }
    /**
     * Adds rows [start, start + m) given as a column-major m x p block and their targets.
     *
     * @param X column-major m x p block
     * @param y targets of the whole data set (indexed from `start`)
     * @param start first row
     * @param m rows in the block
     */
    add(X, y, start, m) {
        const p = this.#p;
        const k = this.#folds.k;
        const foldOf = this.#folds.foldOf;
        if (m === 0)
            return;
        const first = foldOf[start];
        if (oneFold(foldOf, start, m)) {
            this.factors[first].addRows(X, y.subarray(start, start + m), m);
            return;
        }
        if (this.#sub.length < m * p) {
            this.#sub = new Float64Array(m * p);
            this.#subY = new Float64Array(m);
        }
        const sub = this.#sub;
        const subY = this.#subY;
        const counts = this.#counts;
        counts.fill(0);
        for (let i = 0; i < m; i++)
            counts[foldOf[start + i]]++;
        for (let f = 0; f < k; f++) {
            const mf = counts[f];
            if (mf === 0)
                continue;
            // Gather the block's rows of fold f into a column-major mf x p block.
            let r = 0;
            for (let i = 0; i < m; i++) {
                if (foldOf[start + i] !== f)
                    continue;
                for (let j = 0; j < p; j++)
                    sub[j * mf + r] = X[j * m + i];
                subY[r] = y[start + i];
                r++;
            }
            this.factors[f].addRows(sub, subY, mf);
        }
    }
}
/** True when rows start .. start+m-1 (m >= 1) all belong to one fold (one loop per function; see DEVELOPERS.md, "Writing hot loops"). */
function oneFold(foldOf, start, m) {
    const first = foldOf[start];
    for (let i = 1; i < m; i++)
        if (foldOf[start + i] !== first)
            return false;
    return true;
}
/**
 * Folds the rows of each fold into its own QR factor in one pass over the rows.
 *
 * @param design the model's design (p columns)
 * @param data rows (n = data.rows, equal to folds.foldOf.length)
 * @param folds fold of each row
 * @returns k accumulators, one per fold (data rows only, no penalty)
 */
function foldFactors(design, data, folds) {
    const builder = new FoldFactorBuilder(design.p, folds);
    (0,_design_blocks_js__WEBPACK_IMPORTED_MODULE_1__/* .forEachBlock */ .aN)(design, data, (X, start, m) => builder.add(X, data.y, start, m));
    return builder.factors;
}
/**
 * The factor of every row: the merge of the per-fold factors (a QR factor of stacked rows is the
 * factor of the stacked factors; Golub & Van Loan, Matrix Computations, 4th ed., sec. 6.5.2).
 *
 * @param factors per-fold factors (not modified)
 * @param p columns (used when there are no factors)
 */
function mergeFactors(factors, p) {
    if (factors.length === 0)
        return new _fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .QrAccumulator */ .SC(p);
    const all = factors[0].clone();
    for (let f = 1; f < factors.length; f++)
        all.merge(factors[f]);
    return all;
}
/**
 * For each fold f, the factor of every other fold's rows: prefix and suffix merges, so k folds
 * cost about 3k merges of p x p factors instead of k(k-1).
 *
 * @param factors per-fold factors from {@link foldFactors} (not modified)
 * @returns k accumulators; entry f holds every row not in fold f
 */
function complementFactors(factors) {
    const k = factors.length;
    if (k === 0)
        return [];
    const p = factors[0].p;
    const prefix = [new _fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .QrAccumulator */ .SC(p)];
    for (let f = 1; f < k; f++) {
        const next = prefix[f - 1].clone();
        next.merge(factors[f - 1]);
        prefix.push(next);
    }
    const out = new Array(k);
    let suffix = new _fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .QrAccumulator */ .SC(p);
    for (let f = k - 1; f >= 0; f--) {
        const without = prefix[f];
        if (suffix.rows > 0)
            without.merge(suffix);
        out[f] = without;
        if (f > 0) {
            const s = factors[f].clone();
            if (suffix.rows > 0)
                s.merge(suffix);
            suffix = s;
        }
    }
    return out;
}
/**
 * Squared out-of-fold errors from the fold factors alone, without a pass over the rows: with fold
 * f's rows X_f = Q_f [R_f; 0] and Q_f^T y_f = [qty_f; r_f],
 *
 *     ||y_f - X_f w||^2 = ||qty_f - R_f w||^2 + ||r_f||^2
 *
 * for any w, because Q_f is orthogonal (Golub & Van Loan, Matrix Computations, 4th ed., sec.
 * 5.3.3, the least-squares residual from a QR factorisation). Both terms are sums of squares, so
 * nothing cancels; it holds whatever the fold's rank. Costs p^2 per fold and coefficient set.
 *
 * @param perFold per-fold factors (fold f's rows only)
 * @param coefficients coefficients[s][f]: length-p coefficients of setting s fitted without fold f
 * @returns sse[s][f], as {@link outOfFoldErrors} gives them from a pass over the rows
 */
function outOfFoldErrorsFromFactors(perFold, coefficients) {
    const sse = coefficients.map((bySet) => perFold.map((acc, f) => {
        const p = acc.p;
        const R = acc.R;
        const qty = acc.qty;
        const w = bySet[f];
        let sum = acc.rss;
        for (let i = 0; i < p; i++) {
            // (R w)_i: R is upper triangular, column-major.
            let t = 0;
            for (let j = i; j < p; j++)
                t += R[j * p + i] * w[j];
            const d = qty[i] - t;
            sum += d * d;
        }
        return sum;
    }));
    return { sse };
}
/**
 * Scores each row with the coefficients fitted without its fold, for S settings at once, in one
 * pass over the rows. `visit` (optional) sees every design block too (for further figures in the
 * same pass).
 *
 * @param design the design (p columns)
 * @param data rows
 * @param folds fold of each row
 * @param coefficients coefficients[s][f]: length-p coefficients of setting s fitted without fold f
 * @param visit called with each block (column-major m x p), its first row and m
 */
function outOfFoldErrors(design, data, folds, coefficients, visit) {
    const p = design.p;
    const k = folds.k;
    const S = coefficients.length;
    const sse = Array.from({ length: S }, () => new Array(k).fill(0));
    const foldOf = folds.foldOf;
    // W[s][j * k + f]: coefficient j of setting s fitted without fold f (one flat table per setting).
    const tables = coefficients.map((bySet) => {
        const t = new Float64Array(p * k);
        for (let f = 0; f < k; f++)
            for (let j = 0; j < p; j++)
                t[j * k + f] = bySet[f][j];
        return t;
    });
    (0,_design_blocks_js__WEBPACK_IMPORTED_MODULE_1__/* .forEachBlock */ .aN)(design, data, (X, start, m) => {
        // The block's fold when all its rows share one (the usual case for `blocks` folds), else -1.
        const single = m > 0 && oneFold(foldOf, start, m) ? foldOf[start] : -1;
        const folds = foldOf.subarray(start, start + m);
        const y = data.y.subarray(start, start + m);
        for (let s = 0; s < S; s++)
            (0,_kernels_index_js__WEBPACK_IMPORTED_MODULE_2__/* .outOfFoldRows */ .e8)(X, m, p, tables[s], k, folds, single, y, sse[s]);
        visit?.(X, start, m);
    });
    return { sse };
}
/**
 * Summarises per-fold squared error sums.
 *
 * @param sse per-fold sums of squared out-of-fold errors (length k)
 * @param sizes rows per fold (length k)
 */
function summariseFolds(sse, sizes) {
    const k = sse.length;
    let total = 0;
    let n = 0;
    const foldMse = sse.map((s, f) => {
        total += s;
        n += sizes[f];
        return sizes[f] > 0 ? s / sizes[f] : Number.NaN;
    });
    const meanMse = foldMse.reduce((a, b) => a + b, 0) / k;
    let ss = 0;
    for (const v of foldMse)
        ss += (v - meanMse) * (v - meanMse);
    const seMse = k > 1 ? Math.sqrt(ss / (k - 1)) / Math.sqrt(k) : Number.NaN;
    return { cvRmse: n > 0 ? Math.sqrt(total / n) : Number.NaN, foldMse, meanMse, seMse };
}
/** Coefficients of every complement fit, for each ridge penalty given. */
function complementCoefficients(complements, ridges, penalised) {
    return ridges.map((ridge) => complements.map((acc) => (0,_fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .solveCoefficients */ .gQ)(acc, { ridge, penalised })));
}
/**
 * k-fold cross-validation, leave-one-out and generalised cross-validation of a fit, in two passes
 * over the training rows (one when the per-fold factors are given).
 *
 * Pass 1 folds each fold's rows into its own QR factor; the fit without fold f solves the merge of
 * the other factors with the same ridge penalty (exactly the fit a refit on those rows gives,
 * because a QR factor of stacked rows is the factor of the stacked factors). Pass 2 scores every
 * row under the fit without its fold and, in the same pass, takes the full fit's residual e_i and
 * leverage h_ii = x_i^T (X^T X + lambda E^T E)^+ x_i.
 *
 * - k-fold: cv_rmse = sqrt(sum over rows of squared out-of-fold errors / n).
 * - Leave-one-out by the PRESS shortcut: the residual of row i under the fit without row i is
 *   e_i / (1 - h_ii) (Allen, "The relationship between variable selection and data augmentation
 *   and a method for prediction", Technometrics 16(1), 1974; holds for ridge with the same
 *   penalty too); loocv_rmse = sqrt(mean((e_i / (1 - h_ii))^2)). A row with h_ii = 1 (the fit
 *   interpolates it) gives an infinite figure.
 * - GCV = mean(e_i^2) / (1 - df/n)^2 with df = trace of the hat matrix (Golub, Heath & Wahba,
 *   "Generalized cross-validation as a method for choosing a good ridge parameter",
 *   Technometrics 21(2), 1979, eq. 1.4 up to the factor n).
 *
 * @param design the model's design (p columns)
 * @param data training rows (n rows)
 * @param fit the full fit (its ridge and penalised mask are reused)
 * @param folds fold assignment of the n rows
 * @param options per-fold factors already built, and a buffer for the training predictions (default none)
 */
function crossValidate(design, data, fit, folds, options = {}) {
    const n = data.rows;
    const p = design.p;
    const k = folds.k;
    const kfold = k >= 2;
    let coefficients = [];
    if (kfold) {
        const complements = options.complements ?? complementFactors(options.factors ?? foldFactors(design, data, folds));
        coefficients = complementCoefficients(complements, [fit.ridge], fit.penalised);
    }
    const w = fit.coefficients;
    const out = options.predictions;
    let press = 0;
    let rss = 0;
    let leverageSum = 0;
    let maxLeverage = 0;
    let rowsWithLeverageOne = 0;
    let h = new Float64Array(0);
    let pred = new Float64Array(0);
    const visit = (X, start, m) => {
        if (h.length < m) {
            h = new Float64Array(m);
            pred = new Float64Array(m);
        }
        (0,_fit_index_js__WEBPACK_IMPORTED_MODULE_0__/* .leveragesInto */ .lG)(fit, X, m, h);
        pred.fill(0, 0, m);
        (0,_kernels_index_js__WEBPACK_IMPORTED_MODULE_2__/* .addProducts */ .kD)(pred, 0, X, m, w, p);
        if (out !== undefined)
            out.set(pred.subarray(0, m), start);
        // The sums run in locals and are stored once per block: the same additions in the same order,
        // without boxing a number into the closure's context on every row.
        let blockRss = rss;
        let blockPress = press;
        let blockLeverageSum = leverageSum;
        let blockMaxLeverage = maxLeverage;
        let blockOnes = rowsWithLeverageOne;
        const y = data.y;
        for (let i = 0; i < m; i++) {
            const e = y[start + i] - pred[i];
            blockRss += e * e;
            const hi = h[i];
            blockLeverageSum += hi;
            if (hi > blockMaxLeverage)
                blockMaxLeverage = hi;
            if (1 - hi <= LEVERAGE_ONE_TOLERANCE) {
                blockOnes++;
                blockPress = Infinity;
            }
            else {
                const loo = e / (1 - hi);
                blockPress += loo * loo;
            }
        }
        rss = blockRss;
        press = blockPress;
        leverageSum = blockLeverageSum;
        maxLeverage = blockMaxLeverage;
        rowsWithLeverageOne = blockOnes;
    };
    const { sse } = outOfFoldErrors(design, data, folds, coefficients, visit);
    const summary = kfold ? summariseFolds(sse[0], folds.sizes) : null;
    const df = fit.degreesOfFreedom;
    const gcvDenominator = 1 - df / n;
    const gcv = n === 0 ? Number.NaN : gcvDenominator > LEVERAGE_ONE_TOLERANCE ? rss / n / (gcvDenominator * gcvDenominator) : Infinity;
    return {
        k,
        foldSizes: [...folds.sizes],
        cvRmse: summary ? summary.cvRmse : Number.NaN,
        foldRmse: summary ? summary.foldMse.map(Math.sqrt) : [],
        meanMse: summary ? summary.meanMse : Number.NaN,
        seMse: summary ? summary.seMse : Number.NaN,
        loocvRmse: n > 0 ? Math.sqrt(press / n) : Number.NaN,
        press,
        gcv,
        effectiveDf: df,
        leverageSum,
        maxLeverage,
        rowsWithLeverageOne,
        rss,
        n,
    };
}


/***/ }),

/***/ 9236:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   o: () => (/* binding */ assignFolds)
/* harmony export */ });
/* unused harmony export foldSizes */
/* harmony import */ var _random_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(5089);

/**
 * Fold sizes of k-fold cross-validation on n rows: the first n mod k folds hold floor(n/k) + 1
 * rows, the others floor(n/k) (the split of scikit-learn's `KFold`, documented in its user
 * guide, section 3.1.2.1).
 *
 * @param n rows (>= 0)
 * @param k folds (1 <= k <= max(n, 1))
 */
function foldSizes(n, k) {
    const base = Math.floor(n / k);
    const extra = n % k;
    return Array.from({ length: k }, (_, f) => base + (f < extra ? 1 : 0));
}
/**
 * Assigns n rows to k folds. `blocks`: contiguous blocks in file order with {@link foldSizes}
 * (right for rows ordered in time). `shuffled`: the rows are permuted by a Fisher-Yates shuffle
 * driven by {@link seededRandom}(seed), and consecutive runs of the permutation form folds of the
 * same sizes.
 *
 * @param n rows (a non-negative integer)
 * @param k requested folds; reduced to n when n < k (leave-one-out), at least 1
 * @param order `shuffled` (default in descriptors) or `blocks`
 * @param seed seed of the shuffle (default in descriptors: 1)
 * @throws RangeError when n or k is not a non-negative / positive integer
 */
function assignFolds(n, k, order, seed) {
    if (!Number.isInteger(n) || n < 0)
        throw new RangeError(`assignFolds: n must be a non-negative integer, got ${String(n)}`);
    if (!Number.isInteger(k) || k < 1)
        throw new RangeError(`assignFolds: k must be a positive integer, got ${String(k)}`);
    const kk = Math.max(1, Math.min(k, n));
    const sizes = foldSizes(n, kk);
    const foldOf = new Int32Array(n);
    const perm = order === 'shuffled' ? (0,_random_js__WEBPACK_IMPORTED_MODULE_0__/* .permutation */ .dL)(n, (0,_random_js__WEBPACK_IMPORTED_MODULE_0__/* .seededRandom */ .Is)(seed)) : null;
    let pos = 0;
    for (let f = 0; f < kk; f++)
        pos = markFold(foldOf, perm, pos, sizes[f], f);
    return { k: kk, foldOf, sizes, order, seed };
}
/**
 * Assigns fold f to `size` rows from position `pos` (of the permutation, or the file order when
 * none); returns the next position. One loop per function (see DEVELOPERS.md, "Writing hot loops").
 */
function markFold(foldOf, perm, pos, size, f) {
    let at = pos;
    for (let c = 0; c < size; c++, at++)
        foldOf[perm === null ? at : perm[at]] = f;
    return at;
}


/***/ }),

/***/ 5089:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Is: () => (/* binding */ seededRandom),
/* harmony export */   QV: () => (/* binding */ mix32),
/* harmony export */   dL: () => (/* binding */ permutation)
/* harmony export */ });
/**
 * A small seeded pseudo-random generator, so that shuffled cross-validation folds are the same on
 * every machine and every run with the same seed.
 */
/**
 * Returns a generator of uniform numbers in [0, 1) from a 32-bit seed. The state advances by the
 * odd constant 0x9e3779b9 (the golden-ratio increment of a Weyl sequence) and each output is the
 * state passed through a 32-bit integer finaliser (two xor-shift-multiply rounds, the constants of
 * the "lowbias32" mixer published by C. Wellons, "Prospecting for hash functions", 2018). Period
 * 2^32; good enough to shuffle rows, not for cryptography.
 *
 * @param seed any finite number; it is reduced to an unsigned 32-bit integer (the fraction is dropped)
 * @returns a function giving the next number in [0, 1)
 * @throws RangeError when the seed is not finite
 */
function seededRandom(seed) {
    if (!Number.isFinite(seed))
        throw new RangeError(`seededRandom: seed must be a finite number, got ${String(seed)}`);
    let state = Math.trunc(seed) >>> 0;
    return () => {
        state = (state + 0x9e3779b9) >>> 0;
        return mix32(state) / 4294967296;
    };
}
/**
 * The 32-bit integer finaliser of {@link seededRandom} ("lowbias32", C. Wellons, "Prospecting for
 * hash functions", 2018): xor-shift, multiply, xor-shift, multiply, xor-shift; every input bit
 * reaches every output bit. Returns an unsigned 32-bit integer. Leakage hashes rows with it too.
 */
function mix32(z) {
    z ^= z >>> 16;
    z = Math.imul(z, 0x7feb352d);
    z ^= z >>> 15;
    z = Math.imul(z, 0x846ca68b);
    z ^= z >>> 16;
    return z >>> 0;
}
/**
 * A uniformly random permutation of 0..n-1 (Fisher-Yates shuffle, Durstenfeld's in-place form;
 * Knuth, The Art of Computer Programming vol. 2, 3rd ed., algorithm 3.4.2 P).
 *
 * @param n length (a non-negative integer)
 * @param random uniform numbers in [0, 1)
 * @returns Int32Array of length n
 */
function permutation(n, random) {
    const out = identity(n);
    shuffle(out, random);
    return out;
}
// One loop per function (see DEVELOPERS.md, "Writing hot loops").
function identity(n) {
    const out = new Int32Array(n);
    for (let i = 0; i < n; i++)
        out[i] = i;
    return out;
}
function shuffle(out, random) {
    for (let i = out.length - 1; i > 0; i--) {
        const j = Math.floor(random() * (i + 1));
        const t = out[i];
        out[i] = out[j];
        out[j] = t;
    }
}


/***/ }),

/***/ 155:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   _I: () => (/* binding */ errorMeasures),
/* harmony export */   xB: () => (/* binding */ addErrors),
/* harmony export */   y3: () => (/* binding */ emptySums),
/* harmony export */   yr: () => (/* binding */ gapRatio)
/* harmony export */ });
/* harmony import */ var _design_stats_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(6801);
/**
 * Error measures of predictions against observed targets, over Float64Arrays.
 * Formulas: RMSE = sqrt(mean((y - yhat)^2)), MAE = mean(|y - yhat|),
 * R^2 = 1 - SSE / sum((y - mean(y))^2) (coefficient of determination; Draper & Smith,
 * Applied Regression Analysis, 3rd ed., 1998, section 1.6). R^2 of hold-out rows uses the
 * hold-out mean. All are NaN for zero rows; R^2 is NaN when the target is constant.
 */

/** Empty sums. */
function emptySums() {
    return { n: 0, sse: 0, sae: 0, shift: Number.NaN, sy: 0, syy: 0 };
}
/**
 * Adds `m` observations (targets `y`, predictions `yhat`) to `sums`. Each sum is its own pass
 * (one loop per function; see DEVELOPERS.md, "Writing hot loops"), added in row order.
 */
function addErrors(sums, y, yhat, m) {
    if (m > 0 && Number.isNaN(sums.shift))
        sums.shift = y[0];
    sums.n += m;
    sums.sse += squaredErrorSum(y, yhat, m);
    sums.sae += absoluteErrorSum(y, yhat, m);
    sums.sy += (0,_design_stats_js__WEBPACK_IMPORTED_MODULE_0__/* .sumOfDeviations */ .jZ)(y, m, sums.shift);
    sums.syy += (0,_design_stats_js__WEBPACK_IMPORTED_MODULE_0__/* .sumOfSquaredDeviations */ .Mq)(y, m, sums.shift);
}
/** Sum of (y - yhat)^2 over the first m rows. */
function squaredErrorSum(y, yhat, m) {
    let sse = 0;
    for (let i = 0; i < m; i++) {
        const r = y[i] - yhat[i];
        sse += r * r;
    }
    return sse;
}
/** Sum of |y - yhat| over the first m rows. */
function absoluteErrorSum(y, yhat, m) {
    let sae = 0;
    for (let i = 0; i < m; i++)
        sae += Math.abs(y[i] - yhat[i]);
    return sae;
}
/** RMSE, MAE and R^2 from gathered sums. */
function errorMeasures(sums) {
    const { n, sse, sae, sy, syy } = sums;
    if (n === 0)
        return { rmse: Number.NaN, mae: Number.NaN, r2: Number.NaN, sse: 0 };
    const sst = Math.max(0, syy - (sy * sy) / n);
    return {
        rmse: Math.sqrt(sse / n),
        mae: sae / n,
        r2: sst > 0 ? 1 - sse / sst : Number.NaN,
        sse,
    };
}
/**
 * Generalisation-gap ratio: hold-out RMSE / training RMSE. Infinity when the training RMSE is 0
 * and the hold-out RMSE is not; 1 when both are 0 (no gap).
 */
function gapRatio(trainRmse, holdoutRmse) {
    if (trainRmse === 0)
        return holdoutRmse === 0 ? 1 : Infinity;
    return holdoutRmse / trainRmse;
}


/***/ }),

/***/ 7280:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  Z: () => (/* binding */ parseArgs)
});

// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __nccwpck_require__(6760);
var external_node_path_default = /*#__PURE__*/__nccwpck_require__.n(external_node_path_);
;// CONCATENATED MODULE: external "node:util"
const external_node_util_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:util");
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __nccwpck_require__(4296);
// EXTERNAL MODULE: ./src/repo/real-folder.ts
var real_folder = __nccwpck_require__(6711);
// EXTERNAL MODULE: ./src/run/shard.ts
var run_shard = __nccwpck_require__(6941);
// EXTERNAL MODULE: ./src/core/version.ts
var version = __nccwpck_require__(3323);
;// CONCATENATED MODULE: ./src/entries/args.ts
/**
 * The command line: the only reader of argv. Produces the same {@link Settings} the action's
 * `inputs.ts` does, plus the CLI's own output options.
 *
 * Tokens come from Node's own `util.parseArgs` (long options, `--name=value`, `--` ending the
 * options, options and arguments in any order); the commands, their options, the checks of
 * values and the help text are declared once in {@link COMMANDS}. A repeated option keeps its
 * last value, as is usual for command lines.
 */






/** Reads `--expect`: a whole number of reports from 1 to {@link MAX_SHARDS}. */
function parseExpect(value) {
    if (value === null)
        return null;
    const n = Number(value);
    if (!/^\s*\d+\s*$/.test(value) || !Number.isSafeInteger(n) || n < 1 || n > run_shard/* MAX_SHARDS */.hH) {
        throw new errors/* InputError */.dz('expect-value', `expected the number of shard reports, a whole number from 1 to ${run_shard/* MAX_SHARDS */.hH}, got ${(0,errors/* quoteValue */.cl)(value)}`, { key: '--expect' });
    }
    return n;
}
/** Reads `--jobs`: a whole number >= 1. */
function parseJobs(value) {
    if (value === undefined)
        return null;
    const n = Number(value);
    if (!/^\s*\d+\s*$/.test(value) || !Number.isSafeInteger(n) || n < 1) {
        throw new errors/* InputError */.dz('jobs-value', `expected a whole number of worker threads >= 1, got ${(0,errors/* quoteValue */.cl)(value)}`, { key: '--jobs' });
    }
    return n;
}
const FORMAT = { name: 'format', value: 'format', description: 'report format', choices: ['text', 'json', 'markdown'], default: 'text' };
const OUT = { name: 'out', value: 'file', description: 'write the report to a file instead of standard output' };
const FAIL_ON = { name: 'fail-on', value: 'level', description: 'what fails the run', choices: ['fail', 'warn'], default: 'fail' };
const COLOR = { name: 'color', description: 'force colours in the text report' };
const NO_COLOR = { name: 'no-color', description: 'never use colours' };
const DEBUG = { name: 'debug', description: 'print stack traces of unexpected errors' };
const HELP = { name: 'help', description: 'print this help' };
/** Every command, in the order the main help lists them. */
const COMMANDS = [
    {
        name: 'check',
        summary: 'Check models against their limits. Exit status: 0 within limits, 1 a model over a limit, 2 the run could not be done.',
        argument: { name: 'descriptor', description: 'model descriptors to check (default: every model the settings file matches)', required: false },
        options: [
            { name: 'root', value: 'dir', description: 'repository root; nothing outside it is read', default: '.' },
            { name: 'config', value: 'file', description: 'settings file, relative to the root', default: 'fitgate.yml' },
            FORMAT,
            OUT,
            FAIL_ON,
            COLOR,
            NO_COLOR,
            { name: 'base', value: 'ref', description: 'also check the models as they are on this git commit and compare (hold-out RMSE, gap ratio, the base_change limit)' },
            { name: 'shard', value: 'K/N', description: 'check only share K of N of the models (descriptors sorted by path, dealt round-robin); join the JSON reports with `fitgate merge`' },
            { name: 'jobs', value: 'n', description: 'worker threads to run models on (default: one per core; 1 = serial)' },
            { name: 'html', value: 'dir', description: 'also write the HTML report (index.html, self-contained) into this folder' },
            { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log for code scanning to this file' },
            { name: 'junit', value: 'file', description: 'also write a JUnit XML report to this file' },
            DEBUG,
            HELP,
        ],
    },
    {
        name: 'merge',
        summary: 'Join the JSON reports of `fitgate check --shard K/N --format json` jobs into one report. Exit status as for check.',
        argument: { name: 'report', description: 'JSON report files', required: true },
        options: [
            { name: 'expect', value: 'n', description: 'the number of shard reports there must be: a missing one is an error (reports also name their shard K/N, and a gap among them is an error)' },
            FORMAT,
            OUT,
            FAIL_ON,
            { name: 'html', value: 'dir', description: 'also write the HTML report of the joined result into this folder' },
            { name: 'sarif', value: 'file', description: 'also write a SARIF 2.1.0 log of the joined result to this file' },
            { name: 'junit', value: 'file', description: 'also write a JUnit XML report of the joined result to this file' },
            COLOR,
            NO_COLOR,
            DEBUG,
            HELP,
        ],
    },
];
const DESCRIPTION = 'Refit committed regression models, re-score them on their hold-out rows, and fail when they overfit.';
/** Help lines are wrapped to this many columns. */
const HELP_WIDTH = 80;
/** A mistake on the command line: printed with a pointer to the help, exit status 2. */
function usageError(message, command) {
    const hint = command === null ? '(run `fitgate --help` for the commands)' : `(run \`fitgate ${command.name} --help\` for the options)`;
    return { kind: 'print', text: `error: ${message}\n${hint}\n`, status: 2 };
}
/**
 * Parses argv (without `node` and the script). `--root` is resolved to its real path
 * (`realpath(3)`); named inside `cwd`, its real path must lie inside the real path of `cwd`.
 * @param argv arguments
 * @param cwd the working directory paths are relative to (an existing folder)
 * @throws InputError for a bad value, or a `--root` that is not an existing folder or leads out
 *   of `cwd` through a symbolic link
 */
function parseArgs(argv, cwd) {
    const [first, ...rest] = argv;
    if (first === undefined || first === '-h' || first === '--help')
        return { kind: 'print', text: mainHelp(), status: 0 };
    if (first === '-V' || first === '--version')
        return { kind: 'print', text: `${version/* VERSION */.x}\n`, status: 0 };
    if (first === 'help') {
        const topic = rest[0];
        if (topic === undefined)
            return { kind: 'print', text: mainHelp(), status: 0 };
        const command = COMMANDS.find((c) => c.name === topic);
        return command ? { kind: 'print', text: commandHelp(command), status: 0 } : usageError(`unknown command '${topic}'`, null);
    }
    const command = COMMANDS.find((c) => c.name === first);
    if (!command)
        return usageError(first.startsWith('-') ? `unknown option '${first}'` : `unknown command '${first}'`, null);
    const read = readOptions(command, rest);
    if ('kind' in read)
        return read;
    if (read.switches.has('help'))
        return { kind: 'print', text: commandHelp(command), status: 0 };
    if (command.argument.required && read.positionals.length === 0)
        return usageError(`missing required argument '${command.argument.name}'`, command);
    const value = (name) => read.values.get(name) ?? null;
    const common = {
        format: (value('format') ?? 'text'),
        out: value('out'),
        color: read.color,
        debug: read.switches.has('debug'),
        html: value('html'),
        sarif: value('sarif'),
        junit: value('junit'),
    };
    const failOn = value('fail-on') === 'warn' ? 'warn' : 'fail';
    if (command.name === 'merge') {
        return { kind: 'merge', reports: read.positionals.map((r) => external_node_path_default().resolve(cwd, r)), failOn, ...common, expect: parseExpect(value('expect')) };
    }
    // The root as named, and its real path: named inside the working directory, it must really
    // stay inside it (a folder replaced by a link to a parent is refused).
    const named = external_node_path_default().resolve(cwd, value('root') ?? '.');
    const root = (0,real_folder/* realFolder */.PX)(named, { key: '--root', within: cwd, withinName: 'working directory' });
    const config = value('config');
    const base = value('base');
    const shard = value('shard');
    return {
        kind: 'check',
        settings: {
            root,
            config: toRepoPath([named], external_node_path_default().resolve(named, config ?? 'fitgate.yml'), config ?? 'fitgate.yml', '--config'),
            configExplicit: config !== null,
            // Descriptor arguments may be written through the root as named or as it really is.
            descriptors: read.positionals.map((d) => toRepoPath([named, root], external_node_path_default().resolve(cwd, d), d, d)),
            failOn,
        },
        ...common,
        base: base !== null && base !== '' ? base : null,
        shard: shard !== null ? (0,run_shard/* parseShard */.uK)(shard, '--shard') : null,
        jobs: parseJobs(value('jobs') ?? undefined),
    };
}
/**
 * Reads a command's options and arguments, in any order; `--` ends the options. A value that is
 * not among an option's choices, an unknown option, a value missing or given to a switch is a
 * usage error.
 */
function readOptions(command, args) {
    const declared = Object.fromEntries(command.options.map((o) => [o.name, { type: o.value === undefined ? 'boolean' : 'string', ...(o.name === 'help' ? { short: 'h' } : {}) }]));
    const { tokens } = (0,external_node_util_namespaceObject.parseArgs)({ args, options: declared, strict: false, allowPositionals: true, tokens: true });
    const out = { values: new Map(), switches: new Set(), color: null, positionals: [] };
    // Asking for help wins over any mistake beside it.
    if (tokens.some((t) => t.kind === 'option' && t.name === 'help')) {
        out.switches.add('help');
        return out;
    }
    for (const token of tokens) {
        if (token.kind === 'positional')
            out.positionals.push(token.value);
        if (token.kind !== 'option')
            continue;
        const spec = command.options.find((o) => o.name === token.name);
        if (!spec || (token.rawName.length === 2 && token.name !== 'help'))
            return usageError(`unknown option '${token.rawName}'`, command);
        if (spec.value === undefined) {
            if (token.inlineValue)
                return usageError(`option '--${spec.name}' takes no value`, command);
            if (spec.name === 'color' || spec.name === 'no-color')
                out.color = spec.name === 'color';
            else
                out.switches.add(spec.name);
            continue;
        }
        if (token.value === undefined)
            return usageError(`option '--${spec.name} <${spec.value}>' argument missing`, command);
        if (spec.choices && !spec.choices.includes(token.value)) {
            return usageError(`option '--${spec.name} <${spec.value}>' argument '${token.value}' is invalid; expected one of ${spec.choices.join(', ')}`, command);
        }
        out.values.set(spec.name, token.value);
    }
    return out;
}
/** The help of `fitgate` alone: the commands. */
function mainHelp() {
    const rows = COMMANDS.map((c) => [`${c.name} [options] ${argumentUsage(c)}`, c.summary]);
    rows.push(['help [command]', 'print the help of a command']);
    return helpPage('fitgate [options] [command]', DESCRIPTION, [
        [
            'Options',
            [
                ['-V, --version', 'print the version'],
                ['-h, --help', 'print this help'],
            ],
        ],
        ['Commands', rows],
    ]);
}
/** The help of one command: its argument and every option with its choices and default. */
function commandHelp(command) {
    const options = command.options.map((o) => {
        const name = o.name === 'help' ? '-h, --help' : `--${o.name}${o.value === undefined ? '' : ` <${o.value}>`}`;
        const notes = [o.choices ? `one of ${o.choices.join(', ')}` : '', o.default !== undefined ? `default: ${o.default}` : ''].filter((s) => s !== '');
        return [name, notes.length > 0 ? `${o.description} (${notes.join('; ')})` : o.description];
    });
    return helpPage(`fitgate ${command.name} [options] ${argumentUsage(command)}`, command.summary, [
        ['Arguments', [[command.argument.name, command.argument.description]]],
        ['Options', options],
    ]);
}
/** A help page: the usage line, the wrapped description, then each titled section as a table. */
function helpPage(usage, description, sections) {
    const lines = [`Usage: ${usage}`, '', ...wrap(description, HELP_WIDTH)];
    for (const [title, rows] of sections)
        lines.push('', `${title}:`, ...table(rows));
    return [...lines, ''].join('\n');
}
function argumentUsage(command) {
    return command.argument.required ? `<${command.argument.name}...>` : `[${command.argument.name}...]`;
}
/** Two columns: names padded to the widest, descriptions wrapped beside them. */
function table(rows) {
    const indent = 2 + Math.max(...rows.map(([name]) => name.length)) + 2;
    return rows.flatMap(([name, text]) => wrap(text, HELP_WIDTH - indent).map((line, i) => (i === 0 ? `  ${name.padEnd(indent - 4)}  ${line}` : `${' '.repeat(indent)}${line}`)));
}
/** Words of `text` in lines of at most `width` characters (a longer word gets a line of its own). */
function wrap(text, width) {
    const lines = [];
    let line = '';
    for (const word of text.split(' ')) {
        if (line !== '' && line.length + 1 + word.length > width) {
            lines.push(line);
            line = word;
        }
        else
            line = line === '' ? word : `${line} ${word}`;
    }
    lines.push(line);
    return lines;
}
/**
 * A path as repository-relative with `/`; outside the root is an InputError.
 * @param roots the root's spellings (as named, then its real path): the first that holds the path is used
 * @param given the path as the user wrote it (quoted in the message)
 * @param key what names it: the option (`--config`) or, for an argument, the path itself
 */
function toRepoPath(roots, absolute, given, key) {
    for (const root of roots) {
        const rel = external_node_path_default().relative(root, absolute);
        if (!(rel === '' || rel.startsWith('..') || external_node_path_default().isAbsolute(rel)))
            return rel.split((external_node_path_default()).sep).join('/');
    }
    const what = key === given ? 'is' : `${(0,errors/* quoteValue */.cl)(given)} is`;
    throw new errors/* InputError */.dz('path-outside', `${what} outside the repository root ${(0,errors/* clip */.$Q)(roots[0])}; expected a path inside it`, { key });
}


/***/ }),

/***/ 9725:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   LC: () => (/* binding */ OUTPUT_REFUSED),
/* harmony export */   kv: () => (/* binding */ writeFileSafely)
/* harmony export */ });
/* unused harmony export OUTPUT_FAILED */
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__nccwpck_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(4296);
/* harmony import */ var _repo_real_folder_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(6711);
/**
 * Writing one report file: never through a symbolic link, and atomically. Every file fitgate
 * writes (`--out`, `--html`, `--sarif`, `--junit`, the action's `html` / `sarif` / `junit`, the
 * JSON report under `RUNNER_TEMP`) goes through {@link writeFileSafely}:
 *
 * 1. The folder is checked before anything is created: its deepest existing part is resolved
 *    with `realpath(3)`, and when the path was named inside one of the boundary folders (the
 *    action's workspace; the CLI's repository root and working directory) that real path must
 *    lie inside the boundary's real path. Missing folders are then made one at a time inside the
 *    real folder, each checked to be a plain folder and not a link.
 * 2. A target that is a symbolic link, or not a regular file (a folder, a device, a pipe), is
 *    refused; nothing is written through it.
 * 3. The bytes go to a new temporary file in the same real folder, opened with
 *    `O_CREAT | O_EXCL | O_NOFOLLOW` (never an existing file, never a link), written in full,
 *    flushed with `fsync`, closed, and renamed over the target (`rename(2)` replaces the name in
 *    one step, and replaces a link rather than following it). A run that is killed or fails
 *    mid-way (a full disk) leaves the previous complete file, never an empty or cut one; a
 *    temporary file that fails is removed.
 *
 * Every refusal and failure is an InputError whose key is the option that named the path.
 */




/** Error code of a target refused before writing (a link, not a file, a folder leading outside). */
const OUTPUT_REFUSED = 'output-refused';
/** Error code of a write that failed (a full disk, no permission): the previous file is kept. */
const OUTPUT_FAILED = 'output-failed';
/** Most folder levels walked up to the deepest existing one (a path deeper than this is refused). */
const MAX_DEPTH = 256;
/** Tries at a fresh temporary name before giving up (another writer in the same folder). */
const MAX_TEMP_TRIES = 8;
function codeOf(error) {
    return error?.code;
}
/**
 * Writes `data` to `file` without following a link, atomically (see the module comment).
 * @param file the target, absolute or relative to the process's folder
 * @param data the file's content (a string is written as UTF-8)
 * @param place the option that named it and the boundary folders; see {@link WritePlace}
 * @param hooks replaced file operations, for tests; default none
 * @returns the real path written
 * @throws InputError `output-refused` (nothing was written, the previous file is unchanged) or
 *   `output-failed` (the write failed; the previous file is unchanged, the temporary file removed)
 */
function writeFileSafely(file, data, place, hooks = {}) {
    const where = { key: place.option };
    const refuse = (message) => new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(OUTPUT_REFUSED, message, where);
    if (file === '' || file.includes('\0'))
        throw refuse(`expected a file path, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .quoteValue */ .cl)(file)}`);
    const named = node_path__WEBPACK_IMPORTED_MODULE_1___default().resolve(file);
    const name = node_path__WEBPACK_IMPORTED_MODULE_1___default().basename(named);
    const folder = node_path__WEBPACK_IMPORTED_MODULE_1___default().dirname(named);
    if (name === '' || folder === named)
        throw refuse(`${named} names no file; expected a file path`);
    const failed = (error) => error instanceof _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz ? error : new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(OUTPUT_FAILED, `could not write ${named} (${codeOf(error) ?? (error instanceof Error ? error.message : String(error))}); the previous file, if any, is unchanged`, where);
    // 1. The boundary that holds the path as written, and the real folder.
    const bases = place.within.filter((b) => (0,_repo_real_folder_js__WEBPACK_IMPORTED_MODULE_3__/* .isInsideFolder */ .zz)(b, folder)).sort((a, b) => b.length - a.length);
    const base = bases[0] ?? null;
    if (base === null && place.insideOnly)
        throw refuse(`${named} is outside ${place.within.join(' and ')}; expected a path inside`);
    let realDir;
    let target;
    try {
        realDir = makeFolder(folder, base, refuse);
        // 2. The target itself.
        target = node_path__WEBPACK_IMPORTED_MODULE_1___default().join(realDir, name);
        checkTarget(target, named, refuse);
    }
    catch (error) {
        throw failed(error);
    }
    // 3. A temporary file in the same folder, then rename.
    const bytes = typeof data === 'string' ? Buffer.from(data, 'utf8') : data;
    const write = hooks.write ?? ((fd, b, offset, length) => (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.writeSync)(fd, b, offset, length));
    const flags = node_fs__WEBPACK_IMPORTED_MODULE_0__.constants.O_WRONLY | node_fs__WEBPACK_IMPORTED_MODULE_0__.constants.O_CREAT | node_fs__WEBPACK_IMPORTED_MODULE_0__.constants.O_EXCL | (node_fs__WEBPACK_IMPORTED_MODULE_0__.constants.O_NOFOLLOW ?? 0);
    let temp = '';
    let fd = -1;
    for (let attempt = 0; fd < 0; attempt++) {
        temp = node_path__WEBPACK_IMPORTED_MODULE_1___default().join(realDir, `.${name.slice(0, 100)}.${process.pid}.${Date.now().toString(36)}${Math.random().toString(36).slice(2, 8)}.tmp`);
        try {
            fd = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.openSync)(temp, flags, 0o666);
        }
        catch (error) {
            if (codeOf(error) !== 'EEXIST' || attempt + 1 >= MAX_TEMP_TRIES)
                throw failed(error);
        }
    }
    try {
        // Each round writes at least one byte, so this ends after at most bytes.length rounds.
        for (let offset = 0; offset < bytes.length;) {
            const n = write(fd, bytes, offset, bytes.length - offset);
            if (!(n > 0))
                throw new Error('the write made no progress');
            offset += n;
        }
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.fsyncSync)(fd);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
        fd = -1;
        // The folder must still be the one checked (no link swapped in while writing).
        if ((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(realDir) !== realDir)
            throw refuse(`the folder of ${named} changed while it was written; nothing was replaced`);
        checkTarget(target, named, refuse);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.renameSync)(temp, target);
    }
    catch (error) {
        if (fd >= 0) {
            try {
                (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
            }
            catch {
                // already failing; the first error is the one reported
            }
        }
        try {
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.unlinkSync)(temp);
        }
        catch {
            // gone already
        }
        throw failed(error);
    }
    syncFolder(realDir);
    return target;
}
/**
 * The real path of `folder`, made when missing. The deepest existing part is resolved and, when
 * `base` is given, must lie inside the real path of `base`; each missing folder is then made
 * inside that real path and checked to be a folder and not a link.
 */
function makeFolder(folder, base, refuse) {
    const missing = [];
    let existing = folder;
    for (let depth = 0;; depth++) {
        if (depth > MAX_DEPTH)
            throw refuse(`${folder} is more than ${MAX_DEPTH} folders deep`);
        try {
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.lstatSync)(existing);
            break;
        }
        catch (error) {
            const code = codeOf(error);
            if (code !== 'ENOENT' && code !== 'ENOTDIR')
                throw error;
        }
        const parent = node_path__WEBPACK_IMPORTED_MODULE_1___default().dirname(existing);
        if (parent === existing)
            break;
        missing.unshift(node_path__WEBPACK_IMPORTED_MODULE_1___default().basename(existing));
        existing = parent;
    }
    let real;
    try {
        real = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(existing);
    }
    catch (error) {
        const code = codeOf(error);
        if (code === 'ENOENT' || code === 'ELOOP')
            throw refuse(`${existing} is a symbolic link that leads nowhere or round a loop; expected a folder`);
        throw error;
    }
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.statSync)(real).isDirectory())
        throw refuse(`${existing} is not a folder; expected a folder to write in`);
    if (base !== null && !(0,_repo_real_folder_js__WEBPACK_IMPORTED_MODULE_3__/* .isInsideFolder */ .zz)((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(base), real)) {
        throw refuse(`${folder} leads out of ${base} through a symbolic link; expected a folder whose real path is inside it`);
    }
    for (const part of missing) {
        real = node_path__WEBPACK_IMPORTED_MODULE_1___default().join(real, part);
        try {
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.mkdirSync)(real);
        }
        catch (error) {
            if (codeOf(error) !== 'EEXIST')
                throw error;
        }
        const info = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.lstatSync)(real);
        if (!info.isDirectory())
            throw refuse(`${real} is ${info.isSymbolicLink() ? 'a symbolic link' : 'not a folder'}; expected a folder to write in`);
    }
    return real;
}
/** Refuses a target that is a symbolic link or not a regular file; a missing target is fine. */
function checkTarget(target, named, refuse) {
    let info;
    try {
        info = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.lstatSync)(target);
    }
    catch (error) {
        if (codeOf(error) === 'ENOENT')
            return;
        throw error;
    }
    if (info.isSymbolicLink())
        throw refuse(`${named} is a symbolic link; fitgate never writes through a link (remove it, or name another file)`);
    if (!info.isFile())
        throw refuse(`${named} is not a regular file (a folder, device or pipe); expected a file to replace, or no file`);
}
/** Flushes the folder's entry list (the rename) to disk where the platform allows; best effort. */
function syncFolder(dir) {
    let fd = -1;
    try {
        fd = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.openSync)(dir, node_fs__WEBPACK_IMPORTED_MODULE_0__.constants.O_RDONLY);
        (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.fsyncSync)(fd);
    }
    catch {
        // Not every platform opens or syncs a folder; the file itself is already synced.
    }
    if (fd >= 0) {
        try {
            (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
        }
        catch {
            // nothing left to do
        }
    }
}


/***/ }),

/***/ 2485:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  SC: () => (/* reexport */ qr_accumulator_QrAccumulator),
  rT: () => (/* binding */ RefinementPass),
  Ps: () => (/* binding */ fitFactor),
  lG: () => (/* binding */ leveragesInto),
  C4: () => (/* binding */ refinementApplies),
  gQ: () => (/* binding */ solveCoefficients)
});

// UNUSED EXPORTS: REFINE_MAX_CONDITION, REFINE_MIN_CONDITION, fitDesign, leverages, predict

// EXTERNAL MODULE: ./src/fit/svd.ts
var svd = __nccwpck_require__(5936);
;// CONCATENATED MODULE: ./src/fit/factor-solver.ts
/**
 * Rank decisions and solves with a p x p upper-triangular factor R of a design X = Q R.
 *
 * Rank is decided on the column-scaled factor R D^-1 (D = diag of column norms, which equal the
 * design's column norms because ||X e_j|| = ||R e_j||): Householder QR is column-scaling
 * invariant, so the scaled singular values measure collinearity without being fooled by units.
 * Tolerance: a singular value counts when s_i > max(n, p) * eps * s_max (the rule of LAPACK's
 * xGELSS / numpy `matrix_rank`, applied here to the scaled factor; eps = 2^-52).
 */

/**
 * Column norms and the SVD of the column-scaled factor, with the numerical rank.
 *
 * @param R p x p upper-triangular, column-major
 * @param p columns (>= 1)
 * @param rows rows the factor stands for (enters the tolerance max(rows, p) * eps * s_max)
 */
function scaledSpectrum(R, p, rows) {
    const columnNorms = new Float64Array(p);
    const scaled = new Float64Array(p * p);
    for (let j = 0; j < p; j++) {
        let amax = 0;
        for (let i = 0; i <= j; i++)
            amax = Math.max(amax, Math.abs(R[j * p + i]));
        let ss = 0;
        if (amax > 0)
            for (let i = 0; i <= j; i++)
                ss += (R[j * p + i] / amax) ** 2;
        const d = amax * Math.sqrt(ss);
        columnNorms[j] = d;
        const div = d > 0 ? d : 1;
        for (let i = 0; i <= j; i++)
            scaled[j * p + i] = R[j * p + i] / div;
    }
    const { s, V } = (0,svd/* svd */.C)(scaled, p, p, 'right');
    const tolerance = Math.max(rows, p) * Number.EPSILON * s[0];
    let rank = 0;
    while (rank < p && s[rank] > tolerance)
        rank++;
    return { columnNorms, singularValues: s, V, tolerance, rank };
}
/**
 * Singular values of the factor as it is (no scaling), descending.
 *
 * @param R p x p column-major
 * @param p columns (>= 1)
 */
function rawSingularValues(R, p) {
    return (0,svd/* svd */.C)(R, p, p, 'none').s;
}
/**
 * Solves with R (p x p upper triangular, column-major) given its numerical rank: triangular
 * substitution when rank = p (most accurate), else the truncated SVD of R keeping the `rank`
 * largest singular values (minimum-norm least-squares solutions, pseudo-inverse products).
 */
class FactorSolver {
    p;
    rank;
    #R;
    #svd;
    /**
     * @param R p x p upper-triangular factor, column-major (not copied: do not change it while in use)
     * @param p columns
     * @param rank numerical rank from {@link scaledSpectrum} (0..p)
     */
    constructor(R, p, rank) {
        this.p = p;
        this.rank = rank;
        this.#R = R;
        this.#svd = rank < p && rank > 0 ? (0,svd/* svd */.C)(R, p, p) : undefined;
    }
    /** w = R^+ b (back-substitution R w = b when full rank). Length p in, length p out. */
    solve(b) {
        const p = this.p;
        const R = this.#R;
        const w = new Float64Array(p);
        if (this.rank === p) {
            for (let j = p - 1; j >= 0; j--) {
                let t = b[j];
                for (let k = j + 1; k < p; k++)
                    t -= R[k * p + j] * w[k];
                w[j] = t / R[j * p + j];
            }
            return w;
        }
        const dec = this.#svd;
        if (dec === undefined)
            return w; // rank 0: the minimum-norm solution is zero
        for (let c = 0; c < this.rank; c++) {
            let t = 0;
            for (let i = 0; i < p; i++)
                t += dec.U[c * p + i] * b[i];
            t /= dec.s[c];
            for (let i = 0; i < p; i++)
                w[i] += dec.V[c * p + i] * t;
        }
        return w;
    }
    /**
     * z with ||z||^2 = x^T (R^T R)^+ x: z = R^-T x by forward substitution when full rank, else
     * S_r^-1 V_r^T x from the truncated SVD. Its squared norm is the leverage of row x.
     *
     * @param x a row of the design, length p
     * @param z output, length p (entries beyond the rank are set to 0)
     */
    whiten(x, z) {
        const p = this.p;
        const R = this.#R;
        if (this.rank === p) {
            for (let j = 0; j < p; j++) {
                let t = x[j];
                for (let k = 0; k < j; k++)
                    t -= R[j * p + k] * z[k];
                z[j] = t / R[j * p + j];
            }
            return z;
        }
        z.fill(0);
        const dec = this.#svd;
        if (dec === undefined)
            return z;
        for (let c = 0; c < this.rank; c++) {
            let t = 0;
            for (let i = 0; i < p; i++)
                t += dec.V[c * p + i] * x[i];
            z[c] = t / dec.s[c];
        }
        return z;
    }
    /** (R^T R)^+ g: R^-1 R^-T g when full rank, else V_r S_r^-2 V_r^T g. Length p. */
    solveNormal(g) {
        const p = this.p;
        if (this.rank === p)
            return this.solve(this.whiten(g, new Float64Array(p)));
        const out = new Float64Array(p);
        const dec = this.#svd;
        if (dec === undefined)
            return out;
        for (let c = 0; c < this.rank; c++) {
            let t = 0;
            for (let i = 0; i < p; i++)
                t += dec.V[c * p + i] * g[i];
            t /= dec.s[c] * dec.s[c];
            for (let i = 0; i < p; i++)
                out[i] += dec.V[c * p + i] * t;
        }
        return out;
    }
}

// EXTERNAL MODULE: ./src/kernels/index.ts + 10 modules
var kernels = __nccwpck_require__(8667);
;// CONCATENATED MODULE: ./src/fit/qr-accumulator.ts
/**
 * Streaming Householder QR of a tall design: rows are folded into a p x p upper-triangular
 * factor block by block, so memory grows with p^2 and not with the number of rows.
 *
 * Folding a block of m rows computes the QR factorisation of the stacked matrix
 *
 *     [ R    qty ]
 *     [ X_b  y_b ]
 *
 * where R is already triangular. Householder reflector j only has to touch row j of R and the
 * m block rows, so a block costs O(m p^2) flops (Golub & Van Loan, Matrix Computations, 4th ed.,
 * sec. 5.1-5.2 Householder QR, and sec. 6.5.2 on updating a QR factorisation by appending rows).
 * The parts of the transformed right-hand side that leave the top p rows are summed into `rss`.
 */

/** Target size of the internal work block in numbers (m x p chunk plus its right-hand side). */
const WORK_NUMBERS = 16384;
/**
 * Streaming Householder QR: folds row blocks into an upper-triangular p x p factor R, Q^T y and
 * the residual sum of squares.
 *
 * With X the n x p matrix of every row folded so far and y its right-hand side, the state is
 * X = Q [R; 0], Q^T y = [qty; r] and `rss` = ||r||^2, which is the least-squares residual sum of
 * squares min ||X w - y||^2 when R has full rank. Reflectors use the sign choice
 * beta = -sign(alpha) ||a|| (no cancellation), so diagonal entries of R may be negative.
 *
 * @example
 * const acc = new QrAccumulator(2);
 * acc.addRows(new Float64Array([1, 1, 1, 0, 1, 2]), new Float64Array([1, 2, 3]), 3);
 */
class qr_accumulator_QrAccumulator {
    /** Number of columns. */
    p;
    #rows = 0;
    #R;
    #qty;
    #rss = 0;
    /** Rows per piece of a fold (the leading dimension of the kernel's work block). */
    #chunk;
    /**
     * @param p number of columns of the design (a non-negative integer)
     * @throws RangeError when p is not a non-negative integer
     */
    constructor(p) {
        if (!Number.isInteger(p) || p < 0) {
            throw new RangeError(`QrAccumulator: p must be a non-negative integer, got ${String(p)}`);
        }
        this.p = p;
        this.#R = new Float64Array(p * p);
        this.#qty = new Float64Array(p);
        this.#chunk = Math.max(16, Math.floor(WORK_NUMBERS / (p + 1)));
    }
    /** Number of rows folded in so far (all rows, including penalty rows). */
    get rows() {
        return this.#rows;
    }
    /**
     * Upper-triangular factor, p x p, column-major (R[j*p + i]); rows beyond the rank are zero
     * (up to rounding) when fewer rows than p were folded. This is the live array: read it, do
     * not write it (use {@link clone} for a copy to change).
     */
    get R() {
        return this.#R;
    }
    /** First p entries of Q^T y (live array: read only). */
    get qty() {
        return this.#qty;
    }
    /** Sum of squares of the remaining entries of Q^T y (the least-squares residual sum of squares when R has full rank). */
    get rss() {
        return this.#rss;
    }
    /**
     * Fold m rows into the factor. Large m is processed in internal blocks; the inputs are not
     * modified.
     *
     * @param X column-major m x p block (X[j*m + i] is row i, column j); length at least m*p
     * @param y right-hand side, length m or more (the first m entries are used)
     * @param m number of rows (a non-negative integer; 0 does nothing)
     * @throws RangeError on bad shapes or a NaN / infinite value (the message names row and column)
     */
    addRows(X, y, m) {
        const p = this.p;
        if (!Number.isInteger(m) || m < 0) {
            throw new RangeError(`addRows: m must be a non-negative integer, got ${String(m)}`);
        }
        if (X.length < m * p) {
            throw new RangeError(`addRows: X must hold m*p = ${m * p} numbers (column-major ${m} x ${p}), got ${X.length}`);
        }
        if (y.length < m) {
            throw new RangeError(`addRows: y must hold at least m = ${m} numbers, got ${y.length}`);
        }
        this.#foldAll(X, y, m);
        this.#rows += m;
    }
    /**
     * Fold another accumulator's factor into this one: stack [R1; R2] (with their Q^T y) and
     * re-triangularise; residual sums of squares and row counts add. Used for k-fold
     * cross-validation: the fit without fold k is the merge of the other folds.
     *
     * @param other an accumulator with the same p (not modified)
     * @throws RangeError when the column counts differ
     */
    merge(other) {
        if (other.p !== this.p) {
            throw new RangeError(`merge: column counts differ (${this.p} and ${other.p})`);
        }
        // R2 is column-major p x p with leading dimension p: exactly the block layout of addRows.
        // Copy first so that merging an accumulator into itself reads the old factor.
        const R2 = Float64Array.from(other.#R);
        const qty2 = Float64Array.from(other.#qty);
        const rss2 = other.#rss;
        const rows2 = other.#rows;
        this.#foldAll(R2, qty2, this.p);
        this.#rss += rss2;
        this.#rows += rows2;
    }
    /** An independent copy (same factor, right-hand side, rss and row count). */
    clone() {
        const copy = new qr_accumulator_QrAccumulator(this.p);
        copy.#R.set(this.#R);
        copy.#qty.set(this.#qty);
        copy.#rss = this.#rss;
        copy.#rows = this.#rows;
        return copy;
    }
    /** Folds a column-major m x p block in pieces of at most `#chunk` rows (kernels/qr-fold.ts). */
    #foldAll(X, y, m) {
        const { rss, bad } = (0,kernels/* foldRows */.$8)(this.#R, this.#qty, this.#rss, X, y, m, this.p, this.#chunk);
        this.#rss = rss;
        if (bad !== null)
            throw notFinite(bad.row, bad.column, bad.column < 0 ? y[bad.row] : X[bad.column * m + bad.row]);
    }
}
/** The error for a value of X (row, column) or of y (column -1) that is NaN or infinite. */
function notFinite(row, column, value) {
    const what = column < 0 ? `y at row ${row}` : `X at row ${row}, column ${column}`;
    return new RangeError(`addRows: ${what} must be a finite number, got ${String(value)}`);
}

;// CONCATENATED MODULE: ./src/fit/ridge.ts
/**
 * Checks a penalty and its column mask.
 *
 * @param p number of columns
 * @param ridge lambda (default 0)
 * @param penalised mask of length p (default: every column)
 * @returns lambda and a concrete boolean mask of length p
 * @throws RangeError when lambda is negative or not finite, or the mask has the wrong length
 */
function checkPenalty(p, ridge = 0, penalised) {
    if (typeof ridge !== 'number' || !Number.isFinite(ridge) || ridge < 0) {
        throw new RangeError(`ridge must be a finite number >= 0, got ${String(ridge)}`);
    }
    if (penalised !== undefined && penalised.length !== p) {
        throw new RangeError(`penalised must have one entry per column (${p}), got ${penalised.length}`);
    }
    const mask = Array.from({ length: p }, (_, j) => (penalised === undefined ? true : Boolean(penalised[j])));
    return { lambda: ridge, mask };
}
/**
 * The factor of [X; sqrt(lambda) E]: a clone of the data factor with one penalty row per
 * penalised column folded in. The penalty applies to the columns exactly as built (lambda is
 * not rescaled by column norms or row counts).
 *
 * @param data factor of the data rows (not modified)
 * @param lambda penalty >= 0; 0 (or no penalised column) returns a plain clone
 * @param mask length p, true where column j is penalised
 * @returns a new accumulator; its `rows` counts the penalty rows too
 */
function penalisedFactor(data, lambda, mask) {
    const factor = data.clone();
    const p = data.p;
    const cols = [];
    for (let j = 0; j < p; j++)
        if (mask[j])
            cols.push(j);
    if (lambda === 0 || cols.length === 0)
        return factor;
    const k = cols.length;
    const E = new Float64Array(k * p);
    const root = Math.sqrt(lambda);
    cols.forEach((j, r) => {
        E[j * k + r] = root;
    });
    factor.addRows(E, new Float64Array(k), k);
    return factor;
}

;// CONCATENATED MODULE: ./src/fit/index.ts
/**
 * The fitting engine: least squares and ridge from a streaming Householder QR factor, with
 * rank and conditioning diagnostics. This module decides how to solve (triangular substitution
 * or truncated SVD, with or without penalty rows); the solvers know nothing of that choice.
 *
 * Accuracy: on the 11 NIST StRD linear least-squares datasets (raw designs, no centring),
 * `fitDesign(..., { refine: true })` agrees with the certified coefficients and residual SD to at
 * least 9 significant digits, 7.7 on Filip (plain QR: at least 6.5, Wampler5 being the weakest;
 * see test/fit/nist-strd.test.ts, which prints every dataset's figures).
 */





/**
 * Solves least squares or ridge from a data factor (data rows only). Never mutates `data`.
 *
 * Rank is decided on the column-scaled factor (see factor-solver.ts: s_i > max(n, p) eps s_max).
 * Full rank: back-substitution on R (most accurate). Rank deficient, or fewer rows than
 * parameters: the minimum-norm least-squares solution from the truncated SVD of R. Ridge solves
 * [X; sqrt(lambda) E] w ~ [y; 0] with E selecting the penalised columns.
 *
 * Edge cases: 0 rows gives rank 0, zero coefficients, condition numbers Infinity; p = 0 gives
 * empty arrays, rank 0, not deficient, condition numbers 1.
 *
 * @param data factor of the data rows
 * @param options ridge penalty (default 0) and penalised columns (default all)
 * @throws RangeError on a negative or non-finite penalty or a mask of the wrong length
 */
function fitFactor(data, options = {}) {
    const p = data.p;
    const { lambda, mask } = checkPenalty(p, options.ridge, options.penalised);
    const factor = penalisedFactor(data, lambda, mask);
    if (p === 0) {
        return {
            coefficients: new Float64Array(0),
            rank: 0,
            rankDeficient: false,
            conditionNumber: 1,
            conditionNumberScaled: 1,
            singularValuesScaled: new Float64Array(0),
            collinearColumns: [],
            factor,
            rss: data.rss,
            factorRank: 0,
            degreesOfFreedom: 0,
            ridge: lambda,
            penalised: mask,
            refined: false,
        };
    }
    // Diagnostics of the design itself.
    const spectrum = scaledSpectrum(data.R, p, data.rows);
    const rank = spectrum.rank;
    const rankDeficient = rank < p;
    const sRaw = rawSingularValues(data.R, p);
    const conditionNumber = rankDeficient ? Infinity : sRaw[0] / sRaw[p - 1];
    const sScaled = spectrum.singularValues;
    const conditionNumberScaled = rankDeficient ? Infinity : sScaled[0] / sScaled[p - 1];
    const collinearColumns = [];
    for (let j = 0; j < p; j++) {
        if (spectrum.columnNorms[j] === 0 || Math.abs(spectrum.V[(p - 1) * p + j]) >= 0.1)
            collinearColumns.push(j);
    }
    // Solve with the factor of the design plus penalty rows.
    const factorRank = factor.rows === data.rows ? rank : scaledSpectrum(factor.R, p, factor.rows).rank;
    const solver = new FactorSolver(factor.R, p, factorRank);
    const coefficients = solver.solve(factor.qty);
    return {
        coefficients,
        rank,
        rankDeficient,
        conditionNumber,
        conditionNumberScaled,
        singularValuesScaled: sScaled,
        collinearColumns,
        factor,
        rss: dataRss(data, coefficients),
        factorRank,
        degreesOfFreedom: hatTrace(data, solver),
        ridge: lambda,
        penalised: mask,
        refined: false,
    };
}
/**
 * The coefficients {@link fitFactor} returns, without its diagnostics (condition numbers,
 * degrees of freedom): for the many solves of cross-validation and sweeps. The rank decision is
 * the same: full rank is taken without an SVD only when it is certain, i.e. when the lower bound
 * 1 / ||S^-1||_F of the smallest singular value of the column-scaled factor S exceeds the cutoff
 * max(rows, p) eps ||S||_F built on an upper bound of the largest (Golub & Van Loan, Matrix
 * Computations, 4th ed., sec. 2.3.2: ||A||_2 <= ||A||_F); otherwise the SVD decides.
 *
 * @param data factor of the data rows (not modified)
 * @param options ridge penalty (default 0) and penalised columns (default all)
 * @returns length p
 * @throws RangeError on a negative or non-finite penalty or a mask of the wrong length
 */
function solveCoefficients(data, options = {}) {
    const p = data.p;
    const { lambda, mask } = checkPenalty(p, options.ridge, options.penalised);
    const factor = penalisedFactor(data, lambda, mask);
    if (p === 0)
        return new Float64Array(0);
    const rank = certainlyFullRank(factor.R, p, factor.rows) ? p : scaledSpectrum(factor.R, p, factor.rows).rank;
    return new FactorSolver(factor.R, p, rank).solve(factor.qty);
}
/** True when the column-scaled triangular factor surely has rank p under the rule of {@link scaledSpectrum}. */
function certainlyFullRank(R, p, rows) {
    const S = new Float64Array(p * p);
    let frob = 0;
    for (let j = 0; j < p; j++) {
        let ss = 0;
        for (let i = 0; i <= j; i++)
            ss += R[j * p + i] * R[j * p + i];
        if (!(ss > 1e-280 && ss < 1e280))
            return false; // leave extreme scales to the SVD
        const d = Math.sqrt(ss);
        for (let i = 0; i <= j; i++)
            S[j * p + i] = R[j * p + i] / d;
        frob += 1;
    }
    // ||S^-1||_F^2 by solving S x = e_c for each column c (back-substitution).
    const x = new Float64Array(p);
    let inv = 0;
    for (let c = 0; c < p; c++) {
        for (let i = p - 1; i >= 0; i--) {
            let t = i === c ? 1 : 0;
            for (let k = i + 1; k <= c; k++)
                t -= S[k * p + i] * x[k];
            const diag = S[i * p + i];
            if (diag === 0)
                return false;
            x[i] = i > c ? 0 : t / diag;
            if (i <= c)
                inv += x[i] * x[i];
        }
    }
    if (!Number.isFinite(inv))
        return false;
    const sMinLower = 1 / Math.sqrt(inv);
    const sMaxUpper = Math.sqrt(frob);
    // A safety factor of 2 covers the rounding of these bounds.
    return sMinLower > 2 * Math.max(rows, p) * Number.EPSILON * sMaxUpper;
}
/**
 * Convenience: folds a whole column-major n x p design and solves it.
 *
 * @param X column-major n x p (X[j*n + i] is row i, column j)
 * @param y length n
 * @param n rows
 * @param p columns
 * @param options {@link FitOptions} plus `refine` (one refinement pass over the data; default false)
 * @throws RangeError on bad shapes, NaN or infinite input, or bad options
 */
function fitDesign(X, y, n, p, options = {}) {
    const acc = new QrAccumulator(p);
    acc.addRows(X, y, n);
    const fit = fitFactor(acc, options);
    if (options.refine !== true || !refinementApplies(fit))
        return fit;
    const pass = new RefinementPass(fit);
    pass.addRows(X, y, n);
    const refined = pass.finish();
    // The data are at hand: take rss directly from compensated residuals at the new coefficients.
    if (!refined.refined)
        return fit;
    const r = new Float64Array(n);
    residualsInto(X, y, n, refined.coefficients, r, new Float64Array(n));
    return { ...refined, rss: sumOfSquares(r, n) };
}
/**
 * Largest scaled condition number for which {@link RefinementPass} applies its correction:
 * the corrected semi-normal equations step contracts the error by about kappa^2 eps (Björck
 * 1987, "Stability analysis of the method of seminormal equations", Linear Algebra Appl. 88/89),
 * so it is used when kappa^2 eps <= 1e-3, i.e. kappa <= about 2.1e6.
 */
const REFINE_MAX_CONDITION = Math.sqrt(1e-3 / Number.EPSILON);
/**
 * Scaled condition number at or below which the refinement pass is skipped: Householder QR is
 * backward stable, so its coefficients are then accurate to about kappa eps, 2e-14 norm-wise
 * (Golub & Van Loan, Matrix Computations, 4th ed., sec. 5.3.8), and the pass would cost about a
 * third of the fit for digits no figure shows. Measured on the benchmark's M workload (kappa
 * 19): without the pass the coefficients differ from the refined ones by 4e-15 norm-wise and
 * 2.5e-13 in the worst single coefficient, the reported figures by at most 7e-14 relative.
 */
const REFINE_MIN_CONDITION = 100;
/** True when a refinement pass changes `fit` ({@link REFINE_MIN_CONDITION} < kappa <= {@link REFINE_MAX_CONDITION}, full rank). */
function refinementApplies(fit) {
    return fit.coefficients.length > 0 && !fit.rankDeficient && fit.conditionNumberScaled > REFINE_MIN_CONDITION && fit.conditionNumberScaled <= REFINE_MAX_CONDITION;
}
/**
 * One step of iterative refinement computed in a streaming pass over the data rows (the same
 * rows, in any blocks, that built the fit's data factor): the corrected semi-normal equations
 * step w += (R^T R)^+ (X^T r - lambda E w) with r = y - X w and R the fit's factor (Björck,
 * Numerical Methods for Least Squares Problems, SIAM 1996, sec. 2.5.3 and 6.6.5). The
 * residuals and X^T r are accumulated in double-double arithmetic (compensated dot products,
 * Ogita, Rump & Oishi 2005, "Accurate sum and dot product", SIAM J. Sci. Comput. 26(6),
 * algorithm Dot2), which is what makes the step gain digits.
 *
 * The correction is applied only where {@link refinementApplies}: the design's scaled condition
 * number above {@link REFINE_MIN_CONDITION} and at most {@link REFINE_MAX_CONDITION}, full rank;
 * otherwise `finish` returns the
 * QR solution unchanged with `refined` false. `rss` of a refined fit is
 * ||r - X dw||^2 = ||r||^2 - 2 dw^T X^T r + dw^T X^T X dw with X^T X = R^T R - lambda E^T E, so
 * no third pass is needed.
 */
class RefinementPass {
    #fit;
    #gHi;
    #gLo;
    #rss = 0;
    /** @param fit a fit from {@link fitFactor} (not modified) */
    constructor(fit) {
        this.#fit = fit;
        this.#gHi = new Float64Array(fit.coefficients.length);
        this.#gLo = new Float64Array(fit.coefficients.length);
    }
    /**
     * Adds m data rows to the pass.
     *
     * @param X column-major m x p block
     * @param y length at least m
     * @param m rows
     * @throws RangeError on bad shapes or non-finite values
     */
    addRows(X, y, m) {
        const w = this.#fit.coefficients;
        checkShape(X, y, m, w.length);
        const { sumOfSquares: ss, bad } = (0,kernels/* refineRows */.Hb)(X, y, m, w, this.#gHi, this.#gLo);
        if (bad !== null)
            fit_notFinite(X, y, m, bad.column < 0 ? -1 : bad.column * m + bad.row, bad.column < 0 ? bad.row : -1);
        this.#rss += ss;
    }
    /** The refined fit (coefficients w + dw, `rss` at w + dw, `refined` true), or the fit unchanged (see the class note). */
    finish() {
        const fit = this.#fit;
        const w = fit.coefficients;
        const p = w.length;
        if (!refinementApplies(fit))
            return fit;
        const lambda = fit.ridge;
        const mask = fit.penalised;
        const gData = new Float64Array(p);
        for (let j = 0; j < p; j++)
            gData[j] = this.#gHi[j] + this.#gLo[j];
        // Gradient of the augmented problem: the penalty rows' residuals are -sqrt(lambda) E w.
        const g = new Float64Array(p);
        for (let j = 0; j < p; j++)
            g[j] = gData[j] - (mask[j] ? lambda * w[j] : 0);
        const solver = new FactorSolver(fit.factor.R, p, fit.factorRank);
        const dw = solver.solveNormal(g);
        const coefficients = new Float64Array(p);
        for (let j = 0; j < p; j++)
            coefficients[j] = w[j] + dw[j];
        // rss at the new coefficients.
        const R = fit.factor.R;
        let quad = 0;
        for (let i = 0; i < p; i++) {
            let t = 0;
            for (let k = i; k < p; k++)
                t += R[k * p + i] * dw[k];
            quad += t * t;
        }
        let cross = 0;
        for (let j = 0; j < p; j++) {
            cross += dw[j] * gData[j];
            if (mask[j])
                quad -= lambda * dw[j] * dw[j];
        }
        const rss = Math.max(0, this.#rss - 2 * cross + quad);
        return { ...fit, coefficients, rss, refined: true };
    }
}
/**
 * Leverages h_i = x_i^T (X^T X + lambda E)^+ x_i for m rows (diagonal of the hat matrix for the
 * data rows; Hoaglin & Welsch 1978, The American Statistician 32(1)). Uses the fit's factor:
 * forward substitution with R^T when it has full rank, the truncated SVD (pseudo-inverse)
 * otherwise.
 *
 * @param fit a fit from {@link fitFactor} or {@link fitDesign}
 * @param X column-major m x p rows (training rows for the hat diagonal, any rows otherwise)
 * @param m rows
 * @returns length m
 * @throws RangeError on bad shapes or non-finite values
 */
function leverages(fit, X, m) {
    const p = fit.factor.p;
    checkBlock(X, undefined, m, p);
    const out = new Float64Array(m);
    if (p === 0)
        return out;
    const solver = new FactorSolver(fit.factor.R, p, fit.factorRank);
    const x = new Float64Array(p);
    const z = new Float64Array(p);
    for (let i = 0; i < m; i++) {
        for (let j = 0; j < p; j++)
            x[j] = X[j * m + i];
        solver.whiten(x, z);
        let h = 0;
        for (let j = 0; j < p; j++)
            h += z[j] * z[j];
        out[i] = h;
    }
    return out;
}
/**
 * Leverages of m rows written into `out` (see {@link leverages}), computed a few hundred rows at
 * a time with the forward substitution z = R^-T x run down whole columns; per row the operations
 * and their order are those of {@link leverages}, so the figures are identical. No finiteness
 * check (the rows come from a design the factor was built from).
 *
 * @param fit a fit from {@link fitFactor}
 * @param X column-major m x p block
 * @param m rows
 * @param out length >= m; out[i] receives h_i
 */
function leveragesInto(fit, X, m, out) {
    const p = fit.factor.p;
    if (p === 0) {
        out.fill(0, 0, m);
        return;
    }
    if (fit.factorRank < p) {
        out.set(leverages(fit, X, m));
        return;
    }
    (0,kernels/* leverageRows */.fO)(fit.factor.R, p, X, m, out);
}
/**
 * Predictions X w for m rows of a column-major design.
 *
 * @param X column-major m x p (p = coefficients.length)
 * @param m rows
 * @param coefficients length p
 * @returns length m
 * @throws RangeError when X is shorter than m*p
 */
function predict(X, m, coefficients) {
    const p = coefficients.length;
    if (!Number.isInteger(m) || m < 0)
        throw new RangeError(`predict: m must be a non-negative integer, got ${String(m)}`);
    if (X.length < m * p)
        throw new RangeError(`predict: X must hold m*p = ${m * p} numbers, got ${X.length}`);
    const out = new Float64Array(m);
    for (let j = 0; j < p; j++) {
        const w = coefficients[j];
        const col = j * m;
        for (let i = 0; i < m; i++)
            out[i] += X[col + i] * w;
    }
    return out;
}
/** ||X w - y||^2 of the data rows from their factor: rss + ||R w - qty||^2. */
function dataRss(data, w) {
    const p = data.p;
    const R = data.R;
    const qty = data.qty;
    let extra = 0;
    for (let i = 0; i < p; i++) {
        let t = -qty[i];
        for (let k = i; k < p; k++)
            t += R[k * p + i] * w[k];
        extra += t * t;
    }
    return data.rss + extra;
}
/** trace(X (R_a^T R_a)^+ X^T) = sum over the rows r_i of the data factor of ||whiten(r_i)||^2. */
function hatTrace(data, solver) {
    const p = data.p;
    const R = data.R;
    const x = new Float64Array(p);
    const z = new Float64Array(p);
    let trace = 0;
    for (let i = 0; i < p; i++) {
        for (let k = 0; k < p; k++)
            x[k] = R[k * p + i];
        solver.whiten(x, z);
        for (let k = 0; k < p; k++)
            trace += z[k] * z[k];
    }
    return trace;
}
/** Checks a column-major block and its right-hand side for shape and finiteness. */
function checkBlock(X, y, m, p) {
    checkShape(X, y, m, p);
    fit_notFinite(X, y, m, (0,kernels/* firstNotFinite */.vN)(X, m * p), y === undefined ? -1 : (0,kernels/* firstNotFinite */.vN)(y, m));
}
/** Checks the shapes of a column-major block and its right-hand side. */
function checkShape(X, y, m, p) {
    if (!Number.isInteger(m) || m < 0)
        throw new RangeError(`m must be a non-negative integer, got ${String(m)}`);
    if (X.length < m * p)
        throw new RangeError(`X must hold m*p = ${m * p} numbers (column-major ${m} x ${p}), got ${X.length}`);
    if (y !== undefined && y.length < m)
        throw new RangeError(`y must hold at least m = ${m} numbers, got ${y.length}`);
}
/**
 * Throws the RangeError for the first value of X (index k, column-major with m rows) or else of y
 * (index i) that is not finite; does nothing when both are -1.
 */
function fit_notFinite(X, y, m, k, i) {
    if (k >= 0)
        throw new RangeError(`X at row ${k % m}, column ${Math.floor(k / m)} must be a finite number, got ${String(X[k])}`);
    if (i >= 0 && y !== undefined)
        throw new RangeError(`y at row ${i} must be a finite number, got ${String(y[i])}`);
}


/***/ }),

/***/ 5936:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   C: () => (/* binding */ svd)
/* harmony export */ });
/* unused harmony export MAX_SWEEPS */
/**
 * Singular value decomposition of the small p x p matrices of the fitting engine, by one-sided
 * Jacobi rotations (Hestenes 1958; Demmel & Veselić, "Jacobi's method is more accurate than QR",
 * SIAM J. Matrix Anal. Appl. 13(4), 1992): the columns of A are rotated pairwise until they are
 * mutually orthogonal; their norms are then the singular values, the normalised columns the left
 * singular vectors, and the accumulated rotations the right singular vectors.
 *
 * Why not ml-matrix's SVD (Golub-Kahan-Reinsch as in JAMA): its iteration has no cap, and on
 * factors of rank-deficient designs (all-zero and duplicate columns next to values near the
 * underflow threshold) it was seen to run for minutes without ending. Jacobi sweeps converge
 * quadratically and are capped here (60 sweeps); the matrix is scaled by a power of two (exact)
 * so that its largest entry is about 1, and entries below 2^-600 of it are set to zero.
 */
/** Machine epsilon, read once (a property read at the top of a hot function has no type feedback on its first call). */
const EPSILON = Number.EPSILON;
/** Most Jacobi sweeps; convergence is quadratic, so well-scaled matrices need fewer than 15. */
const MAX_SWEEPS = 60;
/**
 * SVD of a column-major m x k matrix with m >= k >= 1.
 *
 * @param A column-major m x k (A[j*m + i])
 * @param m rows
 * @param k columns (at most m)
 * @param vectors which singular vectors to return; default both
 * @returns singular values in descending order with the matching vectors
 * @throws RangeError when m < k or k < 1, or when A has a non-finite entry
 */
function svd(A, m, k, vectors = 'both') {
    if (k < 1 || m < k)
        throw new RangeError(`svd: need m >= k >= 1, got ${m} x ${k}`);
    const amax = largestMagnitude(A, m * k);
    if (!Number.isFinite(amax))
        throw new RangeError('svd: the matrix has a non-finite entry');
    if (amax === 0)
        return zeroSvd(m, k, vectors);
    const shift = Math.round(Math.log2(amax));
    const W = scaledCopy(A, m * k, 2 ** -shift);
    const V = new Float64Array(k * k);
    for (let c = 0; c < k; c++)
        V[c * k + c] = 1;
    jacobiSweeps(W, V, m, k);
    // Singular values are the column norms; sort descending.
    const norms = columnNorms(W, m, k);
    const order = Array.from({ length: k }, (_, c) => c).sort((a, b) => norms[b] - norms[a]);
    const s = new Float64Array(k);
    const U = new Float64Array(vectors === 'both' ? m * k : 0);
    const Vout = new Float64Array(vectors === 'none' ? 0 : k * k);
    order.forEach((c, to) => {
        s[to] = norms[c] * 2 ** shift;
        if (U.length > 0 && norms[c] > 0)
            for (let i = 0; i < m; i++)
                U[to * m + i] = W[c * m + i] / norms[c];
        if (Vout.length > 0)
            for (let i = 0; i < k; i++)
                Vout[to * k + i] = V[c * k + i];
    });
    return { s, U, V: Vout };
}
// The loops below are functions of their own, each a loop nest and its return (see DEVELOPERS.md,
// "Writing hot loops").
/** Largest |a_i| over A[0..n); NaN or Infinity when an entry is not finite. */
function largestMagnitude(A, n) {
    let amax = 0;
    for (let i = 0; i < n; i++) {
        const a = Math.abs(A[i]);
        if (!(a <= amax))
            amax = a;
    }
    return amax;
}
/** A[0..n) times `scale` (a power of two, so exact), entries below 2^-600 set to zero. */
function scaledCopy(A, n, scale) {
    const floor = 2 ** -600;
    const W = new Float64Array(n);
    for (let i = 0; i < n; i++) {
        const v = A[i] * scale;
        W[i] = Math.abs(v) < floor ? 0 : v;
    }
    return W;
}
/**
 * One-sided Jacobi: rotates column pairs (p, q) of W (m x k), and the same pairs of V (k x k),
 * until every pair of W's columns is orthogonal to machine precision, or {@link MAX_SWEEPS}.
 */
function jacobiSweeps(W, V, m, k) {
    const eps = EPSILON;
    for (let sweep = 0; sweep < MAX_SWEEPS; sweep++) {
        let rotated = false;
        for (let p = 0; p < k - 1; p++) {
            const cp = p * m;
            for (let q = p + 1; q < k; q++) {
                const cq = q * m;
                let alpha = 0;
                let beta = 0;
                let gamma = 0;
                for (let i = 0; i < m; i++) {
                    const x = W[cp + i];
                    const y = W[cq + i];
                    alpha += x * x;
                    beta += y * y;
                    gamma += x * y;
                }
                if (gamma === 0 || Math.abs(gamma) <= eps * Math.sqrt(alpha * beta))
                    continue;
                rotated = true;
                // Rotation angle that zeroes the (p, q) entry of W^T W (Rutishauser's formulas).
                const zeta = (beta - alpha) / (2 * gamma);
                const t = Math.sign(zeta || 1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
                const c = 1 / Math.sqrt(1 + t * t);
                const s = c * t;
                rotate(W, cp, cq, m, c, s);
                rotate(V, p * k, q * k, k, c, s);
            }
        }
        if (!rotated)
            return;
    }
}
/** Euclidean norms of the k columns of the column-major m x k W. */
function columnNorms(W, m, k) {
    const norms = new Float64Array(k);
    for (let c = 0; c < k; c++) {
        let ss = 0;
        for (let i = 0; i < m; i++)
            ss += W[c * m + i] ** 2;
        norms[c] = Math.sqrt(ss);
    }
    return norms;
}
/** Rotates the columns of length n starting at `a` and `b` of `M` by the angle with cosine c, sine s. */
function rotate(M, a, b, n, c, s) {
    for (let i = 0; i < n; i++) {
        const x = M[a + i];
        const y = M[b + i];
        M[a + i] = c * x - s * y;
        M[b + i] = s * x + c * y;
    }
}
/** The SVD of an m x k zero matrix: zero singular values, unit vectors. */
function zeroSvd(m, k, vectors) {
    const U = new Float64Array(vectors === 'both' ? m * k : 0);
    const V = new Float64Array(vectors === 'none' ? 0 : k * k);
    for (let c = 0; c < k; c++) {
        if (U.length > 0)
            U[c * m + c] = 1;
        if (V.length > 0)
            V[c * k + c] = 1;
    }
    return { s: new Float64Array(k), U, V };
}


/***/ }),

/***/ 8667:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  kD: () => (/* reexport */ addProducts),
  gy: () => (/* reexport */ firstBeyond),
  vN: () => (/* reexport */ firstNotFinite),
  $8: () => (/* reexport */ foldRows),
  TJ: () => (/* reexport */ kernelNotes),
  fO: () => (/* reexport */ leverageRows),
  e8: () => (/* reexport */ outOfFoldRows),
  gU: () => (/* reexport */ polynomialColumns),
  YK: () => (/* reexport */ recordKernelNotes),
  Hb: () => (/* reexport */ refineRows)
});

// UNUSED EXPORTS: KERNEL_FALLBACK_NOTE, kernelEngine, residualsInto, sumOfSquares, useWasmKernels

;// CONCATENATED MODULE: ./src/kernels/generated/kernels-wasm.ts
// Generated by test/tools/gen-wasm.mjs from src/kernels/kernels.wat; do not edit.
/** The row kernels' WebAssembly module (4050 bytes), in base64. */
const KERNELS_WASM = 'AGFzbQEAAAABkAEQYAJ/fwF/YAN/f38Bf2ACf38BfGADf398AXxgA39/fABgCH9/f39/f398AGAGf39/f3x/AGAHf39/f39/fwBg' +
    'CX9/f39/f39/fwF/YAZ/f39/f38AYAN8fHwBfGAJf39/f39/f39/AXxgBX9/f39/AGALf39/f39/f39/f38AYAd/f3x8f39/AGAD' +
    'f398AX8DFxYAAQICAwQDBQUFBgcICQoHCQsMDQ4PBQMBAAEGLwV/AUEAC38BQQALfAFEAAAAAAAAAAALfABEdZQ/aucvyiALfABE' +
    'r5ZQLjWNE18LB44BDAZtZW1vcnkCAAZiYWRSb3cDAAliYWRDb2x1bW4DAQNyc3MDAg5maXJzdE5vdEZpbml0ZQAABGZvbGQADAls' +
    'ZXZlcmFnZXMADQZyZWZpbmUAEQthZGRQcm9kdWN0cwASCW91dE9mRm9sZAATEXBvbHlub21pYWxDb2x1bW5zABQLZmlyc3RCZXlv' +
    'bmQAFQrUHBZAAgF/AXwCQANAIAIgAU4NASAAIAJBA3RqKwMAIQMgAyADoUQAAAAAAAAAAGIEQCACDwsgAkEBaiECDAALC0F/CyMB' +
    'AX8gACACEAAhAyADQQBIBEAgASAAIAJBA3T8CgAACyADCzgCAX8CfAJAA0AgAiABTg0BIAAgAkEDdGorAwCZIQQgBCADZARAIAQh' +
    'AwsgAkEBaiECDAALCyADCzUCAX8CfAJAA0AgAiABTg0BIAAgAkEDdGorAwAhBCADIAQgBKKgIQMgAkEBaiECDAALCyADCzgCAX8C' +
    'fAJAA0AgAyABTg0BIAAgA0EDdGorAwAgAqMhBSAEIAUgBaKgIQQgA0EBaiEDDAALCyAECzEBAn8CQANAIAMgAU4NASAAIANBA3Rq' +
    'IQQgBCAEKwMAIAKjOQMAIANBAWohAwwACwsLvQEBBnwgApkgACABEAKlIQMgA0QAAAAAAAAAAGEEQEQAAAAAAAD4fw8LIAMjA2Qg' +
    'AyMEY3EEQCAAIAEQAyEEIAREAAAAAAAAAABhBEBEAAAAAAAA+H8PCyACIAKiIASgnyEHBSAAIAEgAxAEIQUgBUQAAAAAAAAAAGEE' +
    'QEQAAAAAAAD4fw8LIAIgA6MhBiADIAYgBqIgBaCfoiEHCyAHmiAHIAJEAAAAAAAAAABmGyEIIAAgASACIAihEAUgCAuMBAMHfwl8' +
    'A38gASAEIAJsQQN0aiEIIAEgBSACbEEDdGohCSAJIAJBA3RqIQogCiACQQN0aiELIAsgAkEDdGohDCAAIAUgA2wgBGpBA3RqIQ0g' +
    'A0EDdCEOIA0rAwAhDyANIA5qKwMAIRAgDSAOQQJsaisDACERIA0gDkEDbGorAwAhEgJAA0AgGCAGTg0BIBhBA3QhGSAIIBlqKwMA' +
    'IRcgDyAXIAkgGWorAwCioCEPIBAgFyAKIBlqKwMAoqAhECARIBcgCyAZaisDAKKgIREgEiAXIAwgGWorAwCioCESIBhBAWohGAwA' +
    'CwsgByAPoiETIAcgEKIhFCAHIBGiIRUgByASoiEWIBNEAAAAAAAAAABhIBREAAAAAAAAAABhcSAVRAAAAAAAAAAAYSAWRAAAAAAA' +
    'AAAAYXFxBEAPCyANIA0rAwAgE6E5AwAgDSAOaiEaIBogGisDACAUoTkDACAaIA5qIRogGiAaKwMAIBWhOQMAIBogDmohGiAaIBor' +
    'AwAgFqE5AwBBACEYAkADQCAYIAZODQEgGEEDdCEZIAggGWorAwAhFyAJIBlqIRogGiAaKwMAIBMgF6KhOQMAIAogGWohGiAaIBor' +
    'AwAgFCAXoqE5AwAgCyAZaiEaIBogGisDACAVIBeioTkDACAMIBlqIRogGiAaKwMAIBYgF6KhOQMAIBhBAWohGAwACwsLuQIDBX8F' +
    'fAN/IAEgBCACbEEDdGohCCABIAUgAmxBA3RqIQkgCSACQQN0aiEKIAAgBSADbCAEakEDdGohCyALIANBA3RqIQwgCysDACENIAwr' +
    'AwAhDgJAA0AgEiAGTg0BIBJBA3QhEyAIIBNqKwMAIREgDSARIAkgE2orAwCioCENIA4gESAKIBNqKwMAoqAhDiASQQFqIRIMAAsL' +
    'IAcgDaIhDyAHIA6iIRAgD0QAAAAAAAAAAGEgEEQAAAAAAAAAAGFxBEAPCyALIAsrAwAgD6E5AwAgDCAMKwMAIBChOQMAQQAhEgJA' +
    'A0AgEiAGTg0BIBJBA3QhEyAIIBNqKwMAIREgCSATaiEUIBQgFCsDACAPIBGioTkDACAKIBNqIRQgFCAUKwMAIBAgEaKhOQMAIBJB' +
    'AWohEgwACwsLzgEDA38CfAN/IAEgBCACbEEDdGohCCABIAUgAmxBA3RqIQkgACAFIANsIARqQQN0aiEKIAorAwAhCwJAA0AgDSAG' +
    'Tg0BIA1BA3QhDiALIAggDmorAwAgCSAOaisDAKKgIQsgDUEBaiENDAALCyAHIAuiIQwgDEQAAAAAAAAAAGEEQA8LIAogCisDACAM' +
    'oTkDAEEAIQ0CQANAIA0gBk4NASANQQN0IQ4gCSAOaiEPIA8gDysDACAMIAggDmorAwCioTkDACANQQFqIQ0MAAsLC64BAwF/AnwD' +
    'fyAAIAVBA3RqIQYgBisDACEHAkADQCAJIANODQEgCUEDdCEKIAcgAiAKaisDACABIApqKwMAoqAhByAJQQFqIQkMAAsLIAQgB6Ih' +
    'CCAIRAAAAAAAAAAAYQRADwsgBiAGKwMAIAihOQMAQQAhCQJAA0AgCSADTg0BIAlBA3QhCiABIApqIQsgCyALKwMAIAggAiAKaisD' +
    'AKKhOQMAIAlBAWohCQwACwsL9gECBH8DfAJAA0AgByAFTg0BIAIgByAEbEEDdGohCSAAIAcgBWwgB2pBA3RqIQogCisDACELIAkg' +
    'BiALEAYhDCAMIAxhBEAgDCALoSAMoyENIAdBAWohCAJAA0AgCEEDaiAFTg0BIAAgAiAEIAUgByAIIAYgDRAHIAhBBGohCAwACwsC' +
    'QANAIAhBAWogBU4NASAAIAIgBCAFIAcgCCAGIA0QCCAIQQJqIQgMAAsLAkADQCAIIAVODQEgACACIAQgBSAHIAggBiANEAkgCEEB' +
    'aiEIDAALCyABIAMgCSAGIA0gBxAKIAogDDkDAAsgB0EBaiEHDAALCwu+AQEEfwJAA0AgCSAETg0BIAggBCAJayAIIAQgCWtIGyEK' +
    'QQAhCwJAA0AgCyAFTg0BIAIgCyAEbCAJakEDdGogBiALIAhsQQN0aiAKEAEhDCAMQQBOBEAgCSAMaiQAIAskAUEBDwsgC0EBaiEL' +
    'DAALCyADIAlBA3RqIAcgChABIQwgDEEATgRAIAkgDGokAEF/JAFBAQ8LIAAgASAGIAcgCCAFIAoQCyMCIAcgChADoCQCIAkgCGoh' +
    'CQwACwtBAAuYAgMGfwN8An8gA0EDdCEJIAVBACAJ/AsAAkADQCAHIAFODQEgBCAHIAlsaiEKIAogAiAHIAlsaiAJ/AoAAEEAIQgC' +
    'QANAIAggB04NASAAIAcgAWwgCGpBA3RqKwMAIQwgBCAIIAlsaiELQQAhDwJAA0AgDyAJTg0BIAogD2ohECAQIBArAwAgDCALIA9q' +
    'KwMAoqE5AwAgD0EIaiEPDAALCyAIQQFqIQgMAAsLIAAgByABbCAHakEDdGorAwAhDUEAIQYCQANAIAYgA04NASAGQQN0IQ8gCiAP' +
    'aisDACANoyEOIAogD2ogDjkDACAFIA9qIRAgECAQKwMAIA4gDqKgOQMAIAZBAWohBgwACwsgB0EBaiEHDAALCwtcAQV8RAAAAAIA' +
    'AKBBIACiIQMgAyADIAChoSEEIAAgBKEhBUQAAAACAACgQSABoiEDIAMgAyABoaEhBiABIAahIQcgBSAHoiACIAQgBqKhIAQgB6Kh' +
    'IAUgBqKhoQvWAQIDfwh8AkADQCAHIAJODQEgB0EDdCEJIAEgCWorAwAhCkQAAAAAAAAAACELQQAhCAJAA0AgCCAETg0BIAAgCCAC' +
    'bCAHakEDdGorAwCaIQwgAyAIQQN0aisDACENIAwgDaIhDiAKIA6gIQ8gDyAKoSEQIAsgCiAPIBChoSAOIBChoCAMIA0gDhAOoKAh' +
    'CyAPIQogCEEBaiEIDAALCyAKIAugIREgESAKoSEQIAUgCWogETkDACAGIAlqIAogESAQoaEgCyAQoaA5AwAgB0EBaiEHDAALCwuU' +
    'AQICfwd8IAQrAwAhCCAFKwMAIQkCQANAIAYgAU4NASAGQQN0IQcgACAHaisDACEKIAIgB2orAwAhCyAKIAuiIQwgCCAMoCENIA0g' +
    'CKEhDiAJIAggDSAOoaEgDCAOoaAgCiALIAwQDqAgCiADIAdqKwMAoqCgIQkgDSEIIAZBAWohBgwACwsgBCAIOQMAIAUgCTkDAAtZ' +
    'AgF/AXwgACABIAIgAyAEIAUgBhAPIAUgAhADIQoCQANAIAkgBE4NASAAIAkgAmxBA3RqIAIgBSAGIAcgCUEDdGogCCAJQQN0ahAQ' +
    'IAlBAWohCQwACwsgCguCAQMBfwF8BH8gAkEDdCEJAkADQCAFIARODQEgAyAFQQN0aisDACEGIAZEAAAAAAAAAABiBEAgASAFIAls' +
    'aiEHQQAhCAJAA0AgCCAJTg0BIAAgCGohCiAKIAorAwAgByAIaisDACAGoqA5AwAgCEEIaiEIDAALCwsgBUEBaiEFDAALCwuvAgIG' +
    'fwF8IAhBACABQQN0/AsAIAZBAE4EQAJAA0AgDCACTg0BIAkgDEEDdGogAyAMIARsIAZqQQN0aisDADkDACAMQQFqIQwMAAsLIAgg' +
    'ACABIAkgAhASBQJAA0AgDCACTg0BIAAgDCABbEEDdGohDSAMIARsIQ5BACELAkADQCALIAFODQEgCCALQQN0aiEPIA8gDysDACAN' +
    'IAtBA3RqKwMAIAMgDiAFIAtBAnRqKAIAakEDdGorAwCioDkDACALQQFqIQsMAAsLIAxBAWohDAwACwsLQQAhCwJAA0AgCyABTg0B' +
    'IAcgC0EDdGorAwAgCCALQQN0aisDAKEhESAFIAtBAnRqKAIAIRAgCiAQQQN0aiEPIA8gDysDACARIBGioDkDACALQQFqIQsMAAsL' +
    'C6sBAQV/IAFBA3QhCSAEBEAgBiAAIAn8CgAABQJAA0AgCCAJTg0BIAYgCGogACAIaisDACACoSADozkDACAIQQhqIQgMAAsLC0EB' +
    'IQcCQANAIAcgBU4NASAGIAdBAWsgCWxqIQogBiAHIAlsaiELQQAhCAJAA0AgCCAJTg0BIAsgCGogCiAIaisDACAGIAhqKwMAojkD' +
    'ACAIQQhqIQgMAAsLIAdBAWohBwwACwsLMgEBfwJAA0AgAyABTg0BIAAgA0EDdGorAwCZIAJlRQRAIAMPCyADQQFqIQMMAAsLQX8L';

;// CONCATENATED MODULE: ./src/kernels/wasm.ts
/**
 * The WebAssembly module of the row kernels (kernels.wat, assembled into generated/): compiled
 * and instantiated once per thread by engine.ts, and the one piece of its memory every kernel
 * copies its arrays into and back out of. The two places that reserve memory (instantiating the
 * module and growing its memory) turn a failure into a {@link ResourceFault}, which engine.ts
 * answers by running the JavaScript kernels instead.
 */

/** This runtime's WebAssembly, or undefined (`node --jitless` has none). */
const WASM = globalThis.WebAssembly;
/** True where this runtime has WebAssembly. */
const wasm_WASM_AVAILABLE = WASM !== undefined;
/**
 * WebAssembly memory could not be reserved (the module's instance or a larger memory): the
 * RangeError V8 throws under a low `ulimit -v`, for instance. Nothing outside the module's
 * memory was changed when it is thrown.
 */
class ResourceFault extends Error {
    name = 'ResourceFault';
    /** @param cause the RangeError of the WebAssembly API */
    constructor(cause) {
        super(cause.message, { cause });
    }
}
/** WebAssembly's page size in bytes. */
const PAGE = 65536;
/** Memory requests left before the injected fault ({@link injectMemoryFault}); -1: none. */
let faultIn = -1;
/**
 * Compiles and instantiates the module.
 * @returns its exports, or null where this runtime has no WebAssembly
 * @throws ResourceFault when the instance's memory cannot be reserved
 */
function instantiateKernels() {
    if (WASM === undefined)
        return null;
    try {
        return new WASM.Instance(new WASM.Module(Buffer.from(KERNELS_WASM, 'base64'))).exports;
    }
    catch (error) {
        if (error instanceof RangeError)
            throw new ResourceFault(error);
        throw error;
    }
}
/**
 * A view of the module's memory with room for at least `doubles` float64 values from address 0,
 * growing the memory when it is smaller. Every kernel asks for it before it changes anything.
 * @throws ResourceFault when the memory cannot grow
 */
function heap(k, doubles) {
    if (faultIn >= 0 && faultIn-- === 0)
        throw new ResourceFault(new RangeError('WebAssembly.Memory.grow(): injected by a test'));
    const bytes = doubles * 8;
    const have = k.memory.buffer.byteLength;
    if (bytes > have) {
        try {
            k.memory.grow(Math.ceil((bytes - have) / PAGE));
        }
        catch (error) {
            if (error instanceof RangeError)
                throw new ResourceFault(error);
            throw error;
        }
    }
    return new Float64Array(k.memory.buffer, 0, doubles);
}
/**
 * Tests: makes a later request for the module's memory fail as a memory that cannot grow does.
 * @param after requests that still succeed first (0: the next one fails); -1 cancels
 */
function injectMemoryFault(after) {
    faultIn = after;
}

;// CONCATENATED MODULE: ./src/kernels/engine.ts
/**
 * The one choice between the WebAssembly kernels and the JavaScript ones, made per thread: the
 * WebAssembly where this runtime has it (compiled on the first kernel call), the JavaScript where
 * it has not (`node --jitless`) or a test turned it off. When WebAssembly memory cannot be
 * reserved (a low `ulimit -v`), the kernel that asked runs in JavaScript instead and so does every
 * later one in the thread; {@link kernelNotes} then holds one note for the run's Result. The
 * figures do not change: each WebAssembly kernel does its JavaScript reference's operations in the
 * same order (test/kernels/wasm-kernels.test.ts compares the bits).
 */

/** The note a run's Result gets when the kernels fell back to JavaScript. */
const KERNEL_FALLBACK_NOTE = 'WebAssembly memory could not be reserved (a low virtual-memory limit such as `ulimit -v` does this), so the row kernels ran in JavaScript: the same figures, more slowly.';
/** Whether to use WebAssembly (false after a fallback, or when a test turned it off). */
let wanted = wasm_WASM_AVAILABLE;
/** The module's exports once compiled. */
let kernels = null;
/** Notes of this thread's fallback and of those other threads reported ({@link recordKernelNotes}). */
const notes = [];
/** JavaScript from now on in this thread, with its note. */
function fallBack() {
    wanted = false;
    kernels = null;
    if (!notes.includes(KERNEL_FALLBACK_NOTE))
        notes.push(KERNEL_FALLBACK_NOTE);
}
/** The compiled module when WebAssembly is in use, else null (falling back when it cannot be instantiated). */
function current() {
    if (!wanted)
        return null;
    if (kernels === null) {
        try {
            kernels = instantiateKernels();
        }
        catch (error) {
            if (!(error instanceof ResourceFault))
                throw error;
            fallBack();
        }
    }
    return kernels;
}
/**
 * A kernel's facade function: runs `wasm` where WebAssembly is in use, else `js`, and `js` when
 * `wasm` cannot reserve its memory (it throws a {@link ResourceFault} before it changes any of
 * its arguments, so `js` starts from the same inputs). Any other error is passed on.
 * @param wasm the WebAssembly wrapper (copies in, runs the module's function, copies out)
 * @param js the JavaScript reference, with the same parameters and result
 */
function facade(wasm, js) {
    return (...args) => {
        const k = current();
        if (k !== null) {
            try {
                return wasm(k, ...args);
            }
            catch (error) {
                if (!(error instanceof ResourceFault))
                    throw error;
                fallBack();
            }
        }
        return js(...args);
    };
}
/** The kernels the next call runs in this thread (compiling the module when it is not yet). */
function kernelEngine() {
    return current() === null ? 'javascript' : 'webassembly';
}
/**
 * Tests: turns the WebAssembly kernels on (where the runtime has WebAssembly) or off for this
 * thread, forgetting an earlier fallback and its note.
 * @param on true for WebAssembly, false for JavaScript
 * @returns whether WebAssembly was wanted before
 */
function useWasmKernels(on) {
    const before = wanted;
    wanted = on && WASM_AVAILABLE;
    notes.length = 0;
    return before;
}
/** Notes about the kernels for the run's Result: empty, or the one {@link KERNEL_FALLBACK_NOTE}. */
function kernelNotes() {
    return [...notes];
}
/**
 * Adds the kernel notes another thread reported (a model worker's), each once.
 * @param more that thread's {@link kernelNotes}
 */
function recordKernelNotes(more) {
    for (const note of more)
        if (!notes.includes(note))
            notes.push(note);
}

;// CONCATENATED MODULE: ./src/kernels/leverages.ts
/**
 * Leverages of a block of rows under a full-rank triangular factor: h_i = || R^-T x_i ||^2, by
 * forward substitution run down whole columns a few hundred rows at a time (fit/index.ts,
 * leveragesInto, says what they are). In WebAssembly where it is in use (kernels.wat,
 * `leverages`), else in JavaScript ({@link leverageRowsJs}, the reference).
 */


/** Rows per chunk of the JavaScript (the chunk's z columns stay in cache). */
const LEVERAGE_CHUNK = 256;
/** The JavaScript reference of {@link leverageRows}. */
function leverageRowsJs(R, p, X, m, out) {
    const Z = new Float64Array(LEVERAGE_CHUNK * p);
    for (let i0 = 0; i0 < m; i0 += LEVERAGE_CHUNK)
        leverageChunk(R, p, X, m, i0, Math.min(LEVERAGE_CHUNK, m - i0), Z, out);
}
/** {@link leverageRows} in WebAssembly: the same operations in the same order per row. */
function leverageRowsWasm(k, R, p, X, m, out) {
    const oX = p * p;
    const oZ = oX + m * p;
    const oOut = oZ + m * p;
    const f = heap(k, oOut + m);
    f.set(R.subarray(0, p * p));
    f.set(X.subarray(0, m * p), oX);
    k.leverages(0, p, oX * 8, m, oZ * 8, oOut * 8);
    out.set(f.subarray(oOut, oOut + m));
}
/**
 * Leverages of the m rows of a column-major m x p block X under a full-rank upper-triangular R
 * (p x p, column-major): out[i] = || R^-T x_i ||^2 for i < m (out has length >= m). No
 * finiteness check.
 */
const leverageRows = facade(leverageRowsWasm, leverageRowsJs);
/**
 * Leverages of rows i0 .. i0+mb-1 of the column-major m x p block X into out[i0..): forward
 * substitution z = R^-T x down whole columns of Z (leading dimension LEVERAGE_CHUNK). A function of
 * its own so that its loops never run inside code V8 optimised in the middle of another chunk
 * (see DEVELOPERS.md, "Writing hot loops").
 */
function leverageChunk(R, p, X, m, i0, mb, Z, out) {
    const CH = LEVERAGE_CHUNK;
    for (let i = 0; i < mb; i++)
        out[i0 + i] = 0;
    for (let j = 0; j < p; j++) {
        const zj = j * CH;
        const xj = j * m + i0;
        for (let i = 0; i < mb; i++)
            Z[zj + i] = X[xj + i];
        let k = 0;
        // Four earlier columns per sweep (the same subtractions in the same order per row).
        for (; k + 3 < j; k += 4) {
            const r0 = R[j * p + k];
            const r1 = R[j * p + k + 1];
            const r2 = R[j * p + k + 2];
            const r3 = R[j * p + k + 3];
            const z0 = k * CH;
            for (let i = 0; i < mb; i++) {
                Z[zj + i] = Z[zj + i] - r0 * Z[z0 + i] - r1 * Z[z0 + CH + i] - r2 * Z[z0 + 2 * CH + i] - r3 * Z[z0 + 3 * CH + i];
            }
        }
        for (; k < j; k++) {
            const r = R[j * p + k];
            const zk = k * CH;
            for (let i = 0; i < mb; i++)
                Z[zj + i] -= r * Z[zk + i];
        }
        const diag = R[j * p + j];
        for (let i = 0; i < mb; i++) {
            const z = Z[zj + i] / diag;
            Z[zj + i] = z;
            out[i0 + i] += z * z;
        }
    }
}

;// CONCATENATED MODULE: ./src/kernels/products.ts
/**
 * Predictions of a block of rows: out[at + i] += sum_j X[j*m + i] w[j] for a column-major m x p
 * block, the columns added one after another, those whose weight is 0 left out. In WebAssembly
 * where it is in use (kernels.wat, `addProducts`), else in JavaScript ({@link addProductsJs}, the
 * reference).
 */


/**
 * The JavaScript reference of {@link addProducts}: four columns per sweep over the rows, so each
 * output is loaded and stored once per four columns (the sums are those of the plain loop).
 */
function addProductsJs(out, at, X, m, w, p) {
    let j = 0;
    for (; j + 3 < p; j += 4) {
        if (w[j] === 0 || w[j + 1] === 0 || w[j + 2] === 0 || w[j + 3] === 0) {
            for (let q = j; q < j + 4; q++)
                addColumn(out, at, X, m, w[q], q);
        }
        else {
            addFourColumns(out, at, X, m, w[j], w[j + 1], w[j + 2], w[j + 3], j);
        }
    }
    for (; j < p; j++)
        addColumn(out, at, X, m, w[j], j);
}
/** {@link addProducts} in WebAssembly: the same additions in the same order. */
function addProductsWasm(k, out, at, X, m, w, p) {
    const oX = m;
    const oW = oX + m * p;
    const f = heap(k, oW + p);
    f.set(out.subarray(at, at + m));
    f.set(X.subarray(0, m * p), oX);
    for (let j = 0; j < p; j++)
        f[oW + j] = w[j];
    k.addProducts(0, oX * 8, m, oW * 8, p);
    out.set(f.subarray(0, m), at);
}
/**
 * out[at + i] += sum_j X[j*m + i] w[j] for the m rows of a column-major m x p block, the terms
 * added one after another in column order. Columns whose weight is 0 are left out (so an
 * infinite design value in such a column adds nothing, not NaN).
 *
 * @param out output (length >= at + m)
 * @param at first output index
 * @param X column-major m x p block
 * @param m rows
 * @param w coefficients (length >= p)
 * @param p columns
 */
const addProducts = facade(addProductsWasm, addProductsJs);
// The row loops are functions of their own, each one loop and its return (see DEVELOPERS.md,
// "Writing hot loops"): the loop over columns above then never runs inside code optimised in
// the middle of a row loop.
/** out[at + i] += X[j*m + i] w0 + X[(j+1)*m + i] w1 + X[(j+2)*m + i] w2 + X[(j+3)*m + i] w3, added left to right. */
function addFourColumns(out, at, X, m, w0, w1, w2, w3, j) {
    const c0 = j * m;
    const c1 = c0 + m;
    const c2 = c1 + m;
    const c3 = c2 + m;
    for (let i = 0; i < m; i++)
        out[at + i] = out[at + i] + X[c0 + i] * w0 + X[c1 + i] * w1 + X[c2 + i] * w2 + X[c3 + i] * w3;
}
/** out[at + i] += X[j*m + i] wj; nothing for wj = 0 (so an infinite design value in a column with weight 0 adds nothing, not NaN). */
function addColumn(out, at, X, m, wj, j) {
    if (wj === 0)
        return;
    const c = j * m;
    for (let i = 0; i < m; i++)
        out[at + i] += X[c + i] * wj;
}

;// CONCATENATED MODULE: ./src/kernels/out-of-fold.ts
/**
 * Squared out-of-fold errors of a block of rows for one coefficient setting
 * (diagnostics/cross-validation.ts, outOfFoldErrors): each row is predicted with the coefficients
 * fitted without its fold, and (y - prediction)^2 is added to its fold's sum, in row order. In
 * WebAssembly where it is in use (kernels.wat, `outOfFold`), else in JavaScript
 * ({@link outOfFoldRowsJs}, the reference).
 */



/** The JavaScript's predictions and one fold's coefficients (grown as needed; never re-entered). */
let pred = new Float64Array(0);
let column = new Float64Array(0);
/** The JavaScript reference of {@link outOfFoldRows}. */
function outOfFoldRowsJs(X, m, p, W, kFolds, folds, single, y, errors) {
    if (pred.length < m)
        pred = new Float64Array(m);
    if (column.length < p)
        column = new Float64Array(p);
    pred.fill(0, 0, m);
    if (single >= 0) {
        // Every row of one fold: its coefficients, zero weights left out as in addProducts.
        for (let j = 0; j < p; j++)
            column[j] = W[j * kFolds + single];
        addProductsJs(pred, 0, X, m, column, p);
    }
    else {
        // Column-major sweep: for each column, add its contribution with the row's fold coefficient.
        for (let j = 0; j < p; j++)
            addFoldColumn(pred, X, j * m, W, j * kFolds, folds, m);
    }
    addSquaredErrors(errors, y, pred, folds, m);
}
/** {@link outOfFoldRows} in WebAssembly: the same operations in the same order. */
function outOfFoldRowsWasm(k, X, m, p, W, kFolds, folds, single, y, errors) {
    const oW = m * p;
    const oY = oW + p * kFolds;
    const oPred = oY + m;
    const oColumn = oPred + m;
    const oErrors = oColumn + p;
    const oFolds = oErrors + kFolds;
    const f = heap(k, oFolds + Math.ceil(m / 2));
    f.set(X.subarray(0, m * p));
    f.set(W.subarray(0, p * kFolds), oW);
    f.set(y.subarray(0, m), oY);
    for (let q = 0; q < kFolds; q++)
        f[oErrors + q] = errors[q];
    new Int32Array(f.buffer, oFolds * 8, m).set(folds.subarray(0, m));
    k.outOfFold(0, m, p, oW * 8, kFolds, oFolds * 8, single, oY * 8, oPred * 8, oColumn * 8, oErrors * 8);
    for (let q = 0; q < kFolds; q++)
        errors[q] = f[oErrors + q];
}
/**
 * Adds one block's squared out-of-fold errors to errors[f] for one setting.
 * @param X column-major m x p block
 * @param W coefficient j fitted without fold f at W[j * kFolds + f] (length >= p kFolds)
 * @param folds the fold of each of the m rows
 * @param single the fold of every row, or -1 when they differ
 * @param y the m rows' targets
 * @param errors per fold (length kFolds), added to in place
 */
const outOfFoldRows = facade(outOfFoldRowsWasm, outOfFoldRowsJs);
// The row loops are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").
/** pred[i] += X[col + i] * W[base + folds[i]] for i < m. */
function addFoldColumn(pred, X, col, W, base, folds, m) {
    for (let i = 0; i < m; i++)
        pred[i] += X[col + i] * W[base + folds[i]];
}
/** errors[folds[i]] += (y[i] - pred[i])^2 for i < m, in row order. */
function addSquaredErrors(errors, y, pred, folds, m) {
    for (let i = 0; i < m; i++) {
        const r = y[i] - pred[i];
        errors[folds[i]] += r * r;
    }
}

;// CONCATENATED MODULE: ./src/kernels/polynomial-columns.ts
/**
 * The columns of a polynomial term (design/terms/polynomial.ts): z = (x - shift) / scale (x itself
 * when raw), then its powers by repeated multiplication (z^k = z^(k-1) * z). In WebAssembly where
 * it is in use (kernels.wat, `polynomialColumns`), else in JavaScript ({@link polynomialColumnsJs},
 * the reference).
 */


/** The JavaScript reference of {@link polynomialColumns}. */
function polynomialColumnsJs(x, m, shift, scale, raw, degree, out, at) {
    if (raw)
        out.set(x.subarray(0, m), at);
    else
        standardise(x, m, shift, scale, out, at);
    for (let k = 1; k < degree; k++)
        multiplyColumns(out, at + (k - 1) * m, at, at + k * m, m);
}
/** {@link polynomialColumns} in WebAssembly: the same operations. */
function polynomialColumnsWasm(k, x, m, shift, scale, raw, degree, out, at) {
    const oOut = m;
    const f = heap(k, oOut + degree * m);
    f.set(x.subarray(0, m));
    k.polynomialColumns(0, m, shift, scale, raw ? 1 : 0, degree, oOut * 8);
    out.set(f.subarray(oOut, oOut + degree * m), at);
}
/**
 * The `degree` columns of a polynomial term for x[0..m), written to out from `at` (column k at
 * at + k m, k = 0 .. degree-1): z = (x - shift) / scale, or x itself when `raw`, then z^2, z^3, ...
 * @param out length >= at + degree m
 */
const polynomialColumns = facade(polynomialColumnsWasm, polynomialColumnsJs);
// The row loops are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").
/** out[at + i] = (x[i] - shift) / scale for i < m. */
function standardise(x, m, shift, scale, out, at) {
    for (let i = 0; i < m; i++)
        out[at + i] = (x[i] - shift) / scale;
}
/** out[to + i] = out[a + i] * out[b + i] for i < m (the next power from the previous one and z). */
function multiplyColumns(out, a, b, to, m) {
    for (let i = 0; i < m; i++)
        out[to + i] = out[a + i] * out[b + i];
}

;// CONCATENATED MODULE: ./src/kernels/qr-fold.ts
/**
 * The QR fold: Householder reflections that fold a column-major block of rows (and its
 * right-hand side) into a triangular factor [R; qty], in pieces of a fixed number of rows, with
 * the sum of squares of what leaves the top p rows added to the residual sum of squares
 * (fit/qr-accumulator.ts holds the state and says where the method comes from). In WebAssembly
 * where it is in use (kernels.wat, `fold`), else in JavaScript ({@link foldRowsJs}, the reference).
 */


/** Sums of squares in this range are computed without rescaling (no overflow or underflow). */
const SAFE_SMALL = 1e-150;
const SAFE_LARGE = 1e150;
/** The work block of the JavaScript fold (grown as needed; the fold is never re-entered). */
let work = new Float64Array(0);
let workY = new Float64Array(0);
/**
 * The JavaScript reference of {@link foldRows}: for each piece of at most `chunk` rows, copies it
 * into the work block (leading dimension `chunk`) checking every value, annihilates it against R,
 * and adds the sum of squares of what is left of its right-hand side.
 */
function foldRowsJs(R, qty, rss, X, y, m, p, chunk) {
    const ld = chunk;
    if (work.length < ld * p)
        work = new Float64Array(ld * p);
    if (workY.length < ld)
        workY = new Float64Array(ld);
    let sum = rss;
    for (let start = 0; start < m; start += chunk) {
        const mb = Math.min(chunk, m - start);
        const bad = copyChecked(X, m, y, start, mb, p, work, workY, ld);
        if (bad !== null)
            return { rss: sum, bad };
        annihilate(R, qty, work, workY, ld, p, mb);
        // What is left of the piece's right-hand side is orthogonal to the column space.
        sum += sumOfSquares(workY, mb);
    }
    return { rss: sum, bad: null };
}
/** {@link foldRows} in WebAssembly: the same operations in the same order. */
function foldRowsWasm(k, R, qty, rss, X, y, m, p, chunk) {
    const oQty = p * p;
    const oX = oQty + p;
    const oY = oX + m * p;
    const oC = oY + m;
    const oYc = oC + chunk * p;
    const f = heap(k, oYc + chunk);
    f.set(R.subarray(0, oQty));
    f.set(qty.subarray(0, p), oQty);
    f.set(X.subarray(0, m * p), oX);
    f.set(y.subarray(0, m), oY);
    k.rss.value = rss;
    const status = k.fold(0, oQty * 8, oX * 8, oY * 8, m, p, oC * 8, oYc * 8, chunk);
    R.set(f.subarray(0, oQty));
    qty.set(f.subarray(oQty, oQty + p));
    const bad = status === 0 ? null : { row: k.badRow.value, column: k.badColumn.value };
    return { rss: k.rss.value, bad };
}
/**
 * Folds the m rows of a column-major m x p block X and their right-hand side y into the
 * triangular R (p x p, column-major) and qty (p), in place, in pieces of `chunk` rows.
 * @param rss the residual sum of squares so far
 * @param chunk rows per piece (at least 1): also the work block's leading dimension
 * @returns the new residual sum of squares, and where a value was not finite (null when none
 *   was; the pieces before it are folded, that piece and the rest are not)
 */
const foldRows = facade(foldRowsWasm, foldRowsJs);
// The loops below are separate functions, each one loop nest, so that V8 optimises each whole
// (a loop that first runs after another loop was optimised mid-function has no type feedback and
// throws the optimised code away, block after block; see DEVELOPERS.md, "Writing hot loops").
/**
 * Copies rows [start, start + mb) of the column-major X (leading dimension ldx) and of y into C
 * (leading dimension ld) and yc.
 * @returns where the first value that is not finite is (columns in order, then y), or null
 */
function copyChecked(X, ldx, y, start, mb, p, C, yc, ld) {
    for (let j = 0; j < p; j++) {
        const at = copyColumnChecked(X, j * ldx + start, C, j * ld, mb);
        if (at >= 0)
            return { row: start + at, column: j };
    }
    const at = copyColumnChecked(y, start, yc, 0, mb);
    return at >= 0 ? { row: start + at, column: -1 } : null;
}
/**
 * Copies mb values from src[from..] to dst[to..], stopping at the first that is not finite.
 * @returns its index among the mb, or -1
 */
function copyColumnChecked(src, from, dst, to, mb) {
    for (let i = 0; i < mb; i++) {
        const v = src[from + i];
        if (!Number.isFinite(v))
            return i;
        dst[to + i] = v;
    }
    return -1;
}
/** Sum of squares of v[0..m), in order (one loop; shared by the fit's passes). */
function sumOfSquares(v, m) {
    let s = 0;
    for (let i = 0; i < m; i++)
        s += v[i] * v[i];
    return s;
}
/**
 * Householder reflections that zero the mb x p block C (leading dimension ld) against the
 * triangular R (p x p, column-major), applied to qty and yc alike. Each step is a function of its
 * own (one loop nest each), so that V8 compiles the small hot pieces separately and soon.
 */
function annihilate(R, qty, C, yc, ld, p, mb) {
    for (let j = 0; j < p; j++) {
        const cj = j * ld;
        const alpha = R[j * p + j];
        const beta = reflector(C, cj, mb, alpha);
        if (Number.isNaN(beta))
            continue; // nothing to annihilate in this column
        const tau = (beta - alpha) / beta;
        let k = j + 1;
        // Four, then two columns at a time: each u_i is loaded once for all of them (per column the
        // operations and their order are those of the single-column loop).
        for (; k + 3 < p; k += 4)
            reflectFour(R, C, ld, p, j, k, mb, tau);
        for (; k + 1 < p; k += 2)
            reflectTwo(R, C, ld, p, j, k, mb, tau);
        for (; k < p; k++)
            reflectOne(R, C, ld, p, j, k, mb, tau);
        reflectTarget(qty, yc, C, cj, mb, tau, j);
        R[j * p + j] = beta;
    }
}
/**
 * The reflector for column j of [R; C] with a = [alpha; C[cj..cj+mb)]: H = I - tau u u^T with
 * u = v / v0 = [1; C[:, j] / v0], v = [alpha - beta; C[:, j]], tau = (beta - alpha) / beta in
 * [1, 2] (the normalisation of LAPACK's dlarfg). Every |u_i| <= 1, so no intermediate overflows or
 * underflows however tiny the column is. Overwrites the column with u's lower part and returns
 * beta; NaN (the column unchanged) when the block part is zero.
 */
function reflector(C, cj, mb, alpha) {
    const amax = Math.max(Math.abs(alpha), largestMagnitudeIn(C, cj, mb));
    if (amax === 0)
        return Number.NaN;
    let norm;
    if (amax > SAFE_SMALL && amax < SAFE_LARGE) {
        const sigma = sumOfSquaresIn(C, cj, mb); // sum of squares of the block part
        if (sigma === 0)
            return Number.NaN;
        norm = Math.sqrt(alpha * alpha + sigma);
    }
    else {
        const scaled = scaledSumOfSquaresIn(C, cj, mb, amax);
        if (scaled === 0)
            return Number.NaN;
        const a0 = alpha / amax;
        norm = amax * Math.sqrt(a0 * a0 + scaled);
    }
    const beta = alpha >= 0 ? -norm : norm;
    divideIn(C, cj, mb, alpha - beta);
    return beta;
}
function largestMagnitudeIn(C, from, n) {
    let amax = 0;
    for (let i = 0; i < n; i++) {
        const a = Math.abs(C[from + i]);
        if (a > amax)
            amax = a;
    }
    return amax;
}
function sumOfSquaresIn(C, from, n) {
    let sigma = 0;
    for (let i = 0; i < n; i++) {
        const c = C[from + i];
        sigma += c * c;
    }
    return sigma;
}
function scaledSumOfSquaresIn(C, from, n, scale) {
    let scaled = 0;
    for (let i = 0; i < n; i++) {
        const c = C[from + i] / scale;
        scaled += c * c;
    }
    return scaled;
}
function divideIn(C, from, n, d) {
    for (let i = 0; i < n; i++)
        C[from + i] /= d;
}
/** Applies the reflector of column j (u in C's column j) to columns k .. k+3 of [R; C]. */
function reflectFour(R, C, ld, p, j, k, mb, tau) {
    const cj = j * ld;
    const c1 = k * ld;
    const c2 = c1 + ld;
    const c3 = c2 + ld;
    const c4 = c3 + ld;
    const r1 = k * p + j;
    let w1 = R[r1];
    let w2 = R[r1 + p];
    let w3 = R[r1 + 2 * p];
    let w4 = R[r1 + 3 * p];
    for (let i = 0; i < mb; i++) {
        const u = C[cj + i];
        w1 += u * C[c1 + i];
        w2 += u * C[c2 + i];
        w3 += u * C[c3 + i];
        w4 += u * C[c4 + i];
    }
    const f1 = tau * w1;
    const f2 = tau * w2;
    const f3 = tau * w3;
    const f4 = tau * w4;
    if (f1 === 0 && f2 === 0 && f3 === 0 && f4 === 0)
        return;
    R[r1] -= f1;
    R[r1 + p] -= f2;
    R[r1 + 2 * p] -= f3;
    R[r1 + 3 * p] -= f4;
    for (let i = 0; i < mb; i++) {
        const u = C[cj + i];
        C[c1 + i] -= f1 * u;
        C[c2 + i] -= f2 * u;
        C[c3 + i] -= f3 * u;
        C[c4 + i] -= f4 * u;
    }
}
/** Applies the reflector of column j to columns k and k+1 of [R; C]. */
function reflectTwo(R, C, ld, p, j, k, mb, tau) {
    const cj = j * ld;
    const ck = k * ld;
    const ck2 = ck + ld;
    const rIdx = k * p + j;
    const rIdx2 = rIdx + p;
    let w1 = R[rIdx];
    let w2 = R[rIdx2];
    for (let i = 0; i < mb; i++) {
        const u = C[cj + i];
        w1 += u * C[ck + i];
        w2 += u * C[ck2 + i];
    }
    const f1 = tau * w1;
    const f2 = tau * w2;
    if (f1 === 0 && f2 === 0)
        return;
    R[rIdx] -= f1;
    R[rIdx2] -= f2;
    for (let i = 0; i < mb; i++) {
        const u = C[cj + i];
        C[ck + i] -= f1 * u;
        C[ck2 + i] -= f2 * u;
    }
}
/** Applies the reflector of column j to column k of [R; C]. */
function reflectOne(R, C, ld, p, j, k, mb, tau) {
    const cj = j * ld;
    const ck = k * ld;
    const rIdx = k * p + j;
    let w = R[rIdx];
    for (let i = 0; i < mb; i++)
        w += C[cj + i] * C[ck + i];
    const f = tau * w;
    if (f === 0)
        return;
    R[rIdx] -= f;
    for (let i = 0; i < mb; i++)
        C[ck + i] -= f * C[cj + i];
}
/** Applies the reflector of column j (u in C from cj) to the right-hand side [qty; yc]. */
function reflectTarget(qty, yc, C, cj, mb, tau, j) {
    let w = qty[j];
    for (let i = 0; i < mb; i++)
        w += C[cj + i] * yc[i];
    const f = tau * w;
    if (f === 0)
        return;
    qty[j] -= f;
    for (let i = 0; i < mb; i++)
        yc[i] -= f * C[cj + i];
}

;// CONCATENATED MODULE: ./src/kernels/range-check.ts
/**
 * The design's range check (run/plan.ts and run/passes.ts): the first value of a block whose
 * magnitude is beyond a bound. In WebAssembly where it is in use (kernels.wat, `firstBeyond`),
 * else in JavaScript ({@link firstBeyondJs}, the reference).
 */


/** The JavaScript reference of {@link firstBeyond}. */
function firstBeyondJs(a, n, max) {
    for (let i = 0; i < n; i++)
        if (!(Math.abs(a[i]) <= max))
            return i;
    return -1;
}
/** {@link firstBeyond} in WebAssembly. */
function firstBeyondWasm(k, a, n, max) {
    const f = heap(k, n);
    f.set(a.subarray(0, n));
    return k.firstBeyond(0, n, max);
}
/**
 * Index of the first of a[0..n) whose magnitude is not within ±max (NaN included), or -1.
 * @param a values (length >= n)
 */
const firstBeyond = facade(firstBeyondWasm, firstBeyondJs);

;// CONCATENATED MODULE: ./src/kernels/refine.ts
/**
 * One block of the refinement pass (fit/index.ts, RefinementPass): the residuals r = y - X w of
 * the block's rows in double-double arithmetic and the compensated dot product of each column
 * with them (Ogita, Rump & Oishi 2005, "Accurate sum and dot product", SIAM J. Sci. Comput.
 * 26(6), algorithm Dot2). In WebAssembly where it is in use (kernels.wat, `refine`), else in
 * JavaScript ({@link refineRowsJs}, the reference).
 */



/** The JavaScript reference of {@link refineRows}. */
function refineRowsJs(X, y, m, w, gHi, gLo) {
    const p = w.length;
    const atX = firstNotFinite(X, m * p);
    if (atX >= 0)
        return { sumOfSquares: 0, bad: { row: atX % m, column: Math.floor(atX / m) } };
    const atY = firstNotFinite(y, m);
    if (atY >= 0)
        return { sumOfSquares: 0, bad: { row: atY, column: -1 } };
    const hi = new Float64Array(m);
    const lo = new Float64Array(m);
    residualsInto(X, y, m, w, hi, lo);
    const ss = sumOfSquares(hi, m);
    for (let j = 0; j < p; j++)
        addColumnDot2(X, j * m, m, hi, lo, gHi, gLo, j);
    return { sumOfSquares: ss, bad: null };
}
/** {@link refineRows} in WebAssembly: the same operations in the same order. */
function refineRowsWasm(k, X, y, m, w, gHi, gLo) {
    const p = w.length;
    const oY = m * p;
    const oW = oY + m;
    const oHi = oW + p;
    const oLo = oHi + m;
    const oGHi = oLo + m;
    const oGLo = oGHi + p;
    const f = heap(k, oGLo + p);
    f.set(X.subarray(0, m * p));
    f.set(y.subarray(0, m), oY);
    const atX = k.firstNotFinite(0, m * p);
    if (atX >= 0)
        return { sumOfSquares: 0, bad: { row: atX % m, column: Math.floor(atX / m) } };
    const atY = k.firstNotFinite(oY * 8, m);
    if (atY >= 0)
        return { sumOfSquares: 0, bad: { row: atY, column: -1 } };
    f.set(w, oW);
    f.set(gHi, oGHi);
    f.set(gLo, oGLo);
    const sumOfSquares = k.refine(0, oY * 8, m, oW * 8, p, oHi * 8, oLo * 8, oGHi * 8, oGLo * 8);
    gHi.set(f.subarray(oGHi, oGHi + p));
    gLo.set(f.subarray(oGLo, oGLo + p));
    return { sumOfSquares, bad: null };
}
/**
 * One block of the refinement pass: checks X (m x p, column-major, p = w.length) and y (m) for
 * finiteness, then adds to (gHi[j], gLo[j]) the compensated dot product of column j with the
 * residuals y - X w (as double-double numbers hi + lo), in place.
 * @returns the sum of squares of the residuals' high parts, or where a value is not finite
 *   (nothing added then)
 */
const refineRows = facade(refineRowsWasm, refineRowsJs);
// The row loops below are functions of their own, each a loop and its return (see DEVELOPERS.md,
// "Writing hot loops").
/** Index of the first NaN or infinite value among v[0..n), or -1 (JavaScript only). */
function firstNotFinite(v, n) {
    for (let i = 0; i < n; i++)
        if (!Number.isFinite(v[i]))
            return i;
    return -1;
}
/**
 * Adds to the running (gHi[j], gLo[j]) the dot product of column j of X (from `col`, m rows) with
 * r = hi + lo: Dot2 with hi, plus the plain dot with lo.
 */
function addColumnDot2(X, col, m, hi, lo, gHi, gLo, j) {
    let sum = gHi[j];
    let comp = gLo[j];
    for (let i = 0; i < m; i++) {
        const a = X[col + i];
        const prod = a * hi[i];
        const t = sum + prod;
        const z = t - sum;
        comp += sum - (t - z) + (prod - z) + twoProductError(a, hi[i], prod) + a * lo[i];
        sum = t;
    }
    gHi[j] = sum;
    gLo[j] = comp;
}
/**
 * r = y - X w for a column-major m x p block (p = w.length) as double-double numbers hi + lo
 * (written to the length-m arrays `hi` and `lo`), each entry by a compensated dot product (Dot2).
 * JavaScript only: the refinement pass's WebAssembly does the same inside `refine`.
 */
function residualsInto(X, y, m, w, hi, lo) {
    const p = w.length;
    for (let i = 0; i < m; i++) {
        let s = y[i];
        let c = 0;
        for (let j = 0; j < p; j++) {
            const a = -X[j * m + i];
            const prod = a * w[j];
            const t = s + prod;
            const z = t - s;
            c += s - (t - z) + (prod - z) + twoProductError(a, w[j], prod);
            s = t;
        }
        // Renormalise (s, c) into hi + lo with |lo| <= ulp(hi) / 2 (TwoSum).
        const h = s + c;
        const z = h - s;
        hi[i] = h;
        lo[i] = s - (h - z) + (c - z);
    }
}
/** Exact error of a floating-point product (Dekker / Veltkamp splitting): a*b - fl(a*b). */
function twoProductError(a, b, prod) {
    const SPLIT = 134217729; // 2^27 + 1
    let t = SPLIT * a;
    const ah = t - (t - a);
    const al = a - ah;
    t = SPLIT * b;
    const bh = t - (t - b);
    const bl = b - bh;
    return al * bl - (prod - ah * bh - ah * bl - al * bh);
}

;// CONCATENATED MODULE: ./src/kernels/index.ts
/**
 * The row kernels behind one facade: each function runs in WebAssembly where it is in use and in
 * JavaScript otherwise, with the same operations in the same order (the results are the same to
 * the bit). engine.ts makes that choice once per thread; callers never ask which. Each kernel's
 * module (qr-fold.ts, refine.ts, ...) holds its JavaScript reference (`...Js`), which
 * test/kernels/ compares the WebAssembly with. Code outside src/kernels/ imports from here only.
 */










/***/ }),

/***/ 4526:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   E: () => (/* binding */ createFsRepository)
/* harmony export */ });
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__nccwpck_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(4296);
/* harmony import */ var _repo_path_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(3856);
/**
 * A {@link RepoReader} over a folder on disk (the working tree). Every path is checked
 * lexically (no absolute paths, no `..` above the root) and then through the file system
 * (the real path, with every symbolic link at any level followed, must stay inside the
 * root's real path) before anything is opened; the real path is what gets opened.
 *
 * The file system calls are synchronous behind the asynchronous interface: a run reads its files
 * one after another (models run in parallel on worker threads, each with its own reader), and a
 * local call takes less time than its round trip through libuv's thread pool. A small model's
 * run makes a few dozen such calls; a 1 MiB piece of a big file is read in well under a
 * millisecond.
 */




/**
 * RepoReader over a folder on disk. Every path is checked: absolute paths, `..` escapes and
 * symbolic links (at any level) whose real path is outside the root's real path are
 * InputError `path-outside`; nothing outside the root is ever opened (the real path is
 * checked before opening). Whatever the system refuses while reading (permissions, I/O
 * errors) is InputError `file-unreadable` naming the file, never a bare system error.
 *
 * @param root the repository folder (absolute, or relative to the working directory)
 */
function createFsRepository(root) {
    const rootAbsolute = node_path__WEBPACK_IMPORTED_MODULE_1__.resolve(root);
    let rootRealPromise = null;
    const rootReal = () => {
        rootRealPromise ??= realpath(rootAbsolute).catch((error) => {
            rootRealPromise = null;
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .FILE_MISSING */ .GY, `repository folder cannot be read (${codeOf(error) ?? String(error)}); expected an existing folder`, { file: rootAbsolute });
        });
        return rootRealPromise;
    };
    /** The real path of a normalised repository-relative path, or null when nothing is there. */
    const realInside = async (rel, where, shown) => {
        const base = await rootReal();
        const full = rel === '' ? base : node_path__WEBPACK_IMPORTED_MODULE_1__.join(base, ...rel.split('/'));
        let real = null;
        try {
            real = await realpath(full);
        }
        catch (error) {
            const code = codeOf(error);
            if (code === 'ELOOP')
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .PATH_OUTSIDE */ .oE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .quoteValue */ .cl)(shown)} goes round a loop of symbolic links; expected a plain path`, where);
            if (code !== 'ENOENT' && code !== 'ENOTDIR')
                throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .unreadableError */ .Sw)(error, where);
        }
        if (real === null) {
            // Missing: still refuse when an existing folder on the way leads outside.
            for (let parent = node_path__WEBPACK_IMPORTED_MODULE_1__.dirname(full); parent.length >= base.length; parent = node_path__WEBPACK_IMPORTED_MODULE_1__.dirname(parent)) {
                try {
                    const parentReal = await realpath(parent);
                    if (!isInside(base, parentReal))
                        throw outside(shown, where);
                    break;
                }
                catch (error) {
                    if (error instanceof _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz)
                        throw error;
                    if (parent === base)
                        break;
                }
            }
            return null;
        }
        if (!isInside(base, real))
            throw outside(shown, where);
        return real;
    };
    const check = async (path) => realInside((0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .normaliseRepoPath */ .Gn)(path), { file: path }, path);
    /** What `path` names, and its real path when something is there. */
    const kindOf = async (path) => {
        const real = await check(path);
        if (real === null) {
            // Nothing at the end of the links: a link that leads nowhere is not "missing".
            const base = await rootReal();
            const rel = (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .normaliseRepoPath */ .Gn)(path);
            const lexical = rel === '' ? base : node_path__WEBPACK_IMPORTED_MODULE_1__.join(base, ...rel.split('/'));
            try {
                return { kind: (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.lstatSync)(lexical).isSymbolicLink() ? 'broken-link' : 'missing', real: null };
            }
            catch {
                return { kind: 'missing', real: null };
            }
        }
        const info = await stat(real, { file: path });
        return { kind: info.isFile() ? 'file' : info.isDirectory() ? 'folder' : 'special', real };
    };
    const requireFile = async (path) => {
        const { kind, real } = await kindOf(path);
        if (kind === 'missing')
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .FILE_MISSING */ .GY, `no such file in ${rootAbsolute}; expected an existing file`, { file: path });
        if (kind !== 'file' || real === null)
            throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .notAFileError */ .V5)(kind === 'file' ? 'special' : kind, { file: path });
        return real;
    };
    return {
        label: rootAbsolute,
        async resolve(fromFile, target, where) {
            const location = { file: fromFile, ...where };
            const rel = (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .joinRepoPath */ .Kp)(fromFile, target, location);
            await realInside(rel, location, target);
            return rel;
        },
        async isFile(path) {
            return (await kindOf(path)).kind === 'file';
        },
        async entryKind(path) {
            return (await kindOf(path)).kind;
        },
        async size(path) {
            return (await stat(await requireFile(path), { file: path })).size;
        },
        async read(path) {
            const real = await requireFile(path);
            try {
                return (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readFileSync)(real);
            }
            catch (error) {
                throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .unreadableError */ .Sw)(error, { file: path });
            }
        },
        async *stream(path, chunkBytes = 1024 * 1024) {
            const real = await requireFile(path);
            let fd;
            try {
                fd = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.openSync)(real, 'r');
            }
            catch (error) {
                throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .unreadableError */ .Sw)(error, { file: path });
            }
            try {
                // Pieces of chunkBytes, no bigger than the file needs (a file that grows meanwhile is
                // still read to its end, in pieces of at least 64 KiB); each piece is a fresh buffer,
                // so a reader may keep a previous one.
                const size = Math.max(1, Math.min(Math.floor(chunkBytes), Math.max(65_536, (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.fstatSync)(fd).size + 1)));
                for (;;) {
                    const piece = Buffer.allocUnsafe(size);
                    let n;
                    try {
                        n = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readSync)(fd, piece, 0, size, null);
                    }
                    catch (error) {
                        throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .unreadableError */ .Sw)(error, { file: path });
                    }
                    if (n === 0)
                        return;
                    yield n === size ? piece : piece.subarray(0, n);
                }
            }
            finally {
                (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.closeSync)(fd);
            }
        },
        async glob(patterns) {
            // The matcher and the walk are loaded when a run globs (a run given its descriptors never
            // does); the patterns are checked (and refused) before the first folder is listed.
            const [{ compilePatterns }, { walkTree }] = await Promise.all([__nccwpck_require__.e(/* import() */ 955).then(__nccwpck_require__.bind(__nccwpck_require__, 955)), __nccwpck_require__.e(/* import() */ 502).then(__nccwpck_require__.bind(__nccwpck_require__, 9502))]);
            const compiled = compilePatterns(patterns);
            if (patterns.length === 0)
                return { paths: [], notEntered: [] };
            return walkTree(await rootReal(), compiled);
        },
    };
}
/** The real path (the system's realpath(3), as fs/promises uses), as a promise. */
async function realpath(path) {
    return node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync.native(path);
}
/** File information, as a promise; a system error is InputError `file-unreadable` at `where`. */
async function stat(path, where) {
    try {
        return (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.statSync)(path);
    }
    catch (error) {
        throw (0,_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .unreadableError */ .Sw)(error, where);
    }
}
function isInside(base, real) {
    const rel = node_path__WEBPACK_IMPORTED_MODULE_1__.relative(base, real);
    return rel === '' || (rel !== '..' && !rel.startsWith(`..${node_path__WEBPACK_IMPORTED_MODULE_1__.sep}`) && !node_path__WEBPACK_IMPORTED_MODULE_1__.isAbsolute(rel));
}
function outside(shown, where) {
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .PATH_OUTSIDE */ .oE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .quoteValue */ .cl)(shown)} leads outside the repository through a symbolic link; expected a file inside it`, where);
}
function codeOf(error) {
    return error !== null && typeof error === 'object' && 'code' in error ? String(error.code) : undefined;
}


/***/ }),

/***/ 6711:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   PX: () => (/* binding */ realFolder),
/* harmony export */   zz: () => (/* binding */ isInsideFolder)
/* harmony export */ });
/* unused harmony export FOLDER_REFUSED */
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__nccwpck_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(4296);
/**
 * The real path of a folder the user named (the repository root: `working-directory`, `--root`),
 * checked against the folder it must stay inside. A folder named inside the workspace (action)
 * or the working directory (CLI) may be reached through symbolic links only while its real path,
 * with every link on the way resolved, stays inside that folder's real path: a folder replaced by
 * a link to a parent, or to anywhere else outside, is refused.
 */



/** Error code of a named folder that is missing, not a folder, or leads outside its boundary. */
const FOLDER_REFUSED = 'folder-refused';
/**
 * True when `p` is `base` itself or lies below it (both absolute; compared as written, with the
 * platform's separators; no file system access).
 */
function isInsideFolder(base, p) {
    const rel = node_path__WEBPACK_IMPORTED_MODULE_1___default().relative(base, p);
    return rel === '' || (rel !== '..' && !rel.startsWith(`..${(node_path__WEBPACK_IMPORTED_MODULE_1___default().sep)}`) && !node_path__WEBPACK_IMPORTED_MODULE_1___default().isAbsolute(rel));
}
/**
 * The real path of an existing folder (every symbolic link resolved, `realpath(3)`).
 * @param named the folder as named, absolute (already resolved against the working directory)
 * @param options the name for messages and the boundary; see {@link RealFolderOptions}
 * @throws InputError `folder-refused` (its key is `options.key`) when the folder is missing or is
 *   not a folder, or when it is named inside `within` and its real path is not inside the real
 *   path of `within`, or is named outside `within` with `insideOnly`
 */
function realFolder(named, options) {
    const where = { key: options.key };
    const boundary = options.within;
    const boundaryName = options.withinName ?? 'folder';
    const namedInside = boundary !== null && isInsideFolder(boundary, named);
    if (boundary !== null && !namedInside && options.insideOnly) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(FOLDER_REFUSED, `${named} is outside the ${boundaryName} ${boundary}; expected a folder inside it`, where);
    }
    let real;
    try {
        real = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(named);
    }
    catch (error) {
        const code = error.code ?? String(error);
        const why = code === 'ELOOP' ? 'goes round a loop of symbolic links' : code === 'ENOENT' || code === 'ENOTDIR' ? 'does not exist' : `cannot be read (${code})`;
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(FOLDER_REFUSED, `${named} ${why}; expected an existing folder`, where);
    }
    if (!(0,node_fs__WEBPACK_IMPORTED_MODULE_0__.statSync)(real).isDirectory())
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(FOLDER_REFUSED, `${named} is not a folder; expected an existing folder`, where);
    if (boundary !== null && namedInside && !isInsideFolder((0,node_fs__WEBPACK_IMPORTED_MODULE_0__.realpathSync)(boundary), real)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(FOLDER_REFUSED, `${named} leads out of the ${boundaryName} ${boundary} through a symbolic link; expected a folder whose real path is inside it`, where);
    }
    return real;
}


/***/ }),

/***/ 3856:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   FP: () => (/* binding */ FILE_UNREADABLE),
/* harmony export */   GY: () => (/* binding */ FILE_MISSING),
/* harmony export */   Gk: () => (/* binding */ kindWords),
/* harmony export */   Gn: () => (/* binding */ normaliseRepoPath),
/* harmony export */   Kp: () => (/* binding */ joinRepoPath),
/* harmony export */   Sw: () => (/* binding */ unreadableError),
/* harmony export */   V5: () => (/* binding */ notAFileError),
/* harmony export */   bd: () => (/* binding */ NOT_A_FILE),
/* harmony export */   oE: () => (/* binding */ PATH_OUTSIDE)
/* harmony export */ });
/* unused harmony export isAbsoluteLike */
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_path__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(4296);
/**
 * Lexical handling of repository-relative paths shared by every {@link RepoReader}:
 * normalising, and refusing absolute paths and `..` escapes. Links are the disk reader's business.
 */


/** Code of every refused path. */
const PATH_OUTSIDE = 'path-outside';
/** Code of a path that names no file. */
const FILE_MISSING = 'file-missing';
/** Code of a path that names something other than a regular file (a folder, a broken link, a FIFO...). */
const NOT_A_FILE = 'not-a-file';
/** Code of a file (or folder) that exists but that the system does not let fitgate read. */
const FILE_UNREADABLE = 'file-unreadable';
/** The words for what a path names, when it is not a regular file. */
const KIND_WORDS = Object.freeze({
    folder: 'is a folder, not a file',
    'broken-link': 'is a symbolic link that leads to nothing, not a file',
    special: 'is not a regular file (a FIFO, socket, device or submodule)',
});
/**
 * Words for a path that names something other than a regular file, e.g. `is a folder, not a file`.
 * @param kind what the path names
 */
function kindWords(kind) {
    return KIND_WORDS[kind];
}
/**
 * The `not-a-file` error: the path exists but is not a regular file.
 * @param kind what the path names
 * @param location where to point (the path itself as the file by default)
 */
function notAFileError(kind, location) {
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(NOT_A_FILE, `${kindWords(kind)}; expected a regular file`, location);
}
/**
 * The `file-unreadable` error for a system error while reading (permissions, I/O): that file's
 * problem, reported like any bad input.
 * @param error what the system threw (its code, such as `EACCES`, is named)
 * @param location the file
 */
function unreadableError(error, location) {
    const code = error !== null && typeof error === 'object' && 'code' in error ? String(error.code) : 'error';
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(FILE_UNREADABLE, `cannot be read (${code}); expected a file that the user running fitgate may read`, location);
}
/** True for `/x`, `\\x`, `C:x` and `C:\x`: paths that do not start at the repository root. */
function isAbsoluteLike(path) {
    return path.startsWith('/') || path.startsWith('\\') || /^[A-Za-z]:/.test(path);
}
/**
 * Normalises a repository-relative path: `\` becomes `/`, `.` and `..` segments are
 * resolved, a leading `./` and trailing `/` are dropped; the root is `''`.
 *
 * @param path the path as given
 * @param location where to point an error (default: the path itself as the file)
 * @throws InputError `path-outside` for absolute paths and paths that climb above the root
 */
function normaliseRepoPath(path, location) {
    const where = location ?? { file: path };
    if (path.includes('\u0000'))
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(PATH_OUTSIDE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quoteValue */ .cl)(path)} contains a NUL character; expected a plain relative path`, where);
    const slashed = path.replace(/\\/g, '/');
    if (isAbsoluteLike(path)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(PATH_OUTSIDE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quoteValue */ .cl)(path)} is absolute; expected a path relative to the repository`, where);
    }
    let normal = node_path__WEBPACK_IMPORTED_MODULE_0__.posix.normalize(slashed === '' ? '.' : slashed);
    if (normal === '..' || normal.startsWith('../')) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(PATH_OUTSIDE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quoteValue */ .cl)(path)} leaves the repository; expected a path inside it`, where);
    }
    if (normal === '.' || normal === './')
        return '';
    normal = normal.replace(/^\.\//, '').replace(/\/+$/, '');
    return normal;
}
/**
 * Resolves `target` as written in `fromFile` (relative to its folder) lexically.
 *
 * @param fromFile repository-relative path of the file that names `target`
 * @param target the path as written
 * @param location where to point an error (the naming file, line and key)
 */
function joinRepoPath(fromFile, target, location) {
    if (isAbsoluteLike(target)) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .InputError */ .dz(PATH_OUTSIDE, `path ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .quoteValue */ .cl)(target)} is absolute; expected a path relative to ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_1__/* .clip */ .$Q)(fromFile)}'s folder`, location);
    }
    const folder = node_path__WEBPACK_IMPORTED_MODULE_0__.posix.dirname(normaliseRepoPath(fromFile));
    const joined = node_path__WEBPACK_IMPORTED_MODULE_0__.posix.join(folder, target.replace(/\\/g, '/'));
    return normaliseRepoPath(joined, { ...location, file: location.file ?? fromFile });
}


/***/ }),

/***/ 4031:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   FV: () => (/* binding */ escapeMarkdown),
/* harmony export */   Fw: () => (/* binding */ escapeMermaid),
/* harmony export */   X: () => (/* binding */ escapeXml),
/* harmony export */   ZD: () => (/* binding */ escapeHtml),
/* harmony export */   en: () => (/* binding */ escapeTerminal)
/* harmony export */ });
/**
 * Escaping of text that comes from the repository (model names, column names, messages) for
 * each medium it reaches. One helper per medium, tested byte for byte.
 */
/** HTML text and attribute values: & < > " ' become entities. */
function escapeHtml(text) {
    return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]);
}
/**
 * Markdown inline text (GitHub-flavoured, inside table cells too): line breaks become spaces;
 * `&`, `<` and `>` become entities (no HTML, no hidden comments); the characters that start
 * inline Markdown syntax or end a table cell (`\`, backtick, `*`, `_`, `[`, `]`, `|`, `~`) are
 * backslash-escaped; `@` is followed by a zero-width space so that names never mention anyone.
 * Text is always placed mid-line, so block syntax (`#`, `-`, `>` at a line start) cannot start.
 */
function escapeMarkdown(text) {
    return text
        .replace(/\r?\n|\r/g, ' ')
        .replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c])
        .replace(/([\\`*_[\]|~])/g, '\\$1')
        .replace(/@/g, '@\u200b');
}
/**
 * Text for a terminal: control characters (including ESC, which starts colour codes and
 * cursor moves) are shown as `\u001b` style escapes; line breaks become spaces.
 */
function escapeTerminal(text) {
    return text.replace(/\r?\n|\r/g, ' ').replace(/[\u0000-\u001f\u007f-\u009f]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
/**
 * XML 1.0 text and attribute values (JUnit): & < > " ' become entities; tab, line feed and
 * carriage return become character references (`&#9;`, `&#10;`, `&#13;`: kept exactly in
 * attribute values, which XML would otherwise turn into spaces, and never a raw line break from a
 * name); characters XML 1.0 does not allow (other C0 controls, U+FFFE, U+FFFF, lone surrogates)
 * become U+FFFD. No CDATA is used, so `]]>` is plain text.
 */
function escapeXml(text) {
    return text
        .replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, '\ufffd')
        .replace(/[&<>"'\t\n\r]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;', '\t': '&#9;', '\n': '&#10;', '\r': '&#13;' })[c]);
}
/**
 * Text inside a double-quoted Mermaid string (chart titles, axis labels): line breaks and other
 * control characters become spaces; `"` becomes `'`; `<` and `>` become `‹` and `›` (Mermaid
 * passes labels through an HTML sanitiser); `#` becomes the full-width `＃` (Mermaid reads
 * `#name;` as an entity code); a backtick becomes `'` so that the text cannot close a
 * Markdown code fence.
 */
function escapeMermaid(text) {
    return text
        .replace(/[\u0000-\u001f\u007f-\u009f]+/g, ' ')
        .replace(/["`]/g, "'")
        .replace(/</g, '‹')
        .replace(/>/g, '›')
        .replace(/#/g, '＃');
}


/***/ }),

/***/ 2794:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   I: () => (/* binding */ formatJson)
/* harmony export */ });
/* harmony import */ var _runner_commands_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(673);

/**
 * `JSON.stringify(result)` with two-space indentation and a final newline, where `##[` inside a
 * string is written `##\u005b` and U+2028, U+2029 and NEL as `\u` escapes
 * ({@link neutraliseJson}): `JSON.parse` gives back the same Result, and no line of the report
 * holds a runner command when it is printed in a CI step.
 */
function formatJson(result) {
    return `${(0,_runner_commands_js__WEBPACK_IMPORTED_MODULE_0__/* .neutraliseJson */ .rb)(JSON.stringify(result, null, 2))}\n`;
}


/***/ }),

/***/ 673:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Z$: () => (/* binding */ neutraliseLog),
/* harmony export */   h4: () => (/* binding */ neutraliseLogLine),
/* harmony export */   rb: () => (/* binding */ neutraliseJson)
/* harmony export */ });
/* unused harmony exports MAX_SERVER_TEXT, defuseLegacyCommands, quoteServerText */
/**
 * Keeping runner commands out of plain text. A CI runner reads every line a step prints (standard
 * output and standard error) and obeys two forms of command (actions/runner,
 * src/Runner.Common/ActionCommand.cs, `TryParseV2` and `TryParse`):
 *
 * - `::name props::data` when the line begins with `::` after leading white space;
 * - the older `##[name props]data` found anywhere in the line.
 *
 * The runner matches with .NET's culture-aware `StartsWith` and `IndexOf`, which may skip
 * characters such as zero-width spaces and other format characters (from memory), so those are
 * treated here as if absent. Every plain line fitgate prints (the action's log, the CLI's reports
 * on standard output, its error line) passes through {@link neutraliseLogLine}; the workflow
 * commands fitgate writes itself (`report/annotations.ts`) pass their text through
 * {@link defuseLegacyCommands}; JSON keeps its data exact with {@link neutraliseJson}.
 */

/** Characters a comparison may pass over unseen: controls, format characters (zero-width), marks. */
const UNSEEN = '[\\p{C}\\p{M}]*';
/** `##[`, with anything unseen between its three characters. */
const LEGACY = new RegExp(`#(${UNSEEN})#(${UNSEEN})\\[`, 'gu');
/** A line that begins with `::` after white space (which the runner trims) and unseen characters. */
const LEADING = /^[\s\p{C}\p{M}]*::/u;
/** Every line break a reader may split on. */
const LINE_BREAK = /\r\n|[\r\n\u0085\u2028\u2029]/g;
/** A character as a `\u2028` (or `\u{e0001}`) escape. */
function codeEscape(c) {
    const code = c.codePointAt(0) ?? 0;
    return code > 0xffff ? `\\u{${code.toString(16)}}` : `\\u${code.toString(16).padStart(4, '0')}`;
}
/** Longest piece of text from an API server that is printed, in characters (house rule: quote a short piece). */
const MAX_SERVER_TEXT = 80;
/**
 * Breaks every `##[` in `text` by putting a space before the `[` (`##[error]` becomes
 * `## [error]`), so that the runner's older command form cannot start anywhere in it. Nothing
 * else changes; line breaks are left as they are.
 */
function defuseLegacyCommands(text) {
    return text.replace(LEGACY, '#$1#$2 [');
}
/**
 * One plain log line, safe wherever a runner reads it: line breaks (CR, LF, NEL, LS, PS) become
 * spaces, every `##[` is broken ({@link defuseLegacyCommands}), and a line that would begin with
 * `::` (after white space or unseen characters) starts with `» ` instead. Text without any of
 * these is returned unchanged; applying it twice changes nothing more.
 */
function neutraliseLogLine(text) {
    const one = defuseLegacyCommands(text.replace(LINE_BREAK, ' '));
    return LEADING.test(one) ? `» ${one}` : one;
}
/** {@link neutraliseLogLine} on each `\n`-separated line of a text; the `\n`s are kept. */
function neutraliseLog(text) {
    return text.split('\n').map(neutraliseLogLine).join('\n');
}
/**
 * JSON text with the same data but no runner command in any line: `[` after `##` (only ever
 * inside a string) is written `\u005b`, and the line separators JSON leaves raw (U+2028, U+2029,
 * NEL) as `\u` escapes. `JSON.parse` gives back exactly the same value. Lines of
 * `JSON.stringify(value, null, 2)` begin with white space and a bracket, a brace, a quote or a
 * digit, never with `::`.
 */
function neutraliseJson(json) {
    return json.replace(LEGACY, '#$1#$2\\u005b').replace(/[\u0085\u2028\u2029]/g, codeEscape);
}
/**
 * Text an API server sent back (an error message, a library's warning about a response), made
 * fit to print: on one line, control and format characters shown as `\u001b` style escapes,
 * lone surrogates replaced, neutralised as a log line ({@link neutraliseLogLine}), then cut to at
 * most `max` characters (the last one `…` when cut; cutting off a tail cannot make a command).
 * @param text the server's text
 * @param max longest result, in characters; default {@link MAX_SERVER_TEXT}
 */
function quoteServerText(text, max = MAX_SERVER_TEXT) {
    const visible = escapeTerminal(text.replace(LINE_BREAK, ' ')).replace(/\p{Cf}/gu, codeEscape).replace(/\p{Cs}/gu, '\ufffd');
    const chars = [...neutraliseLogLine(visible)];
    return chars.length > max ? `${chars.slice(0, max - 1).join('')}…` : chars.join('');
}


/***/ }),

/***/ 5655:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   v: () => (/* binding */ formatText)
/* harmony export */ });
/* harmony import */ var _result_result_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(1628);
/* harmony import */ var _core_format_js__WEBPACK_IMPORTED_MODULE_2__ = __nccwpck_require__(6228);
/* harmony import */ var _escape_js__WEBPACK_IMPORTED_MODULE_3__ = __nccwpck_require__(4031);
/* harmony import */ var _runner_commands_js__WEBPACK_IMPORTED_MODULE_1__ = __nccwpck_require__(673);
/**
 * The terminal report: one aligned table of every model, then one block per model that did not
 * pass, with each check's figure against its limit and the descriptor line to change.
 */




const COLOURS = { pass: '32', warn: '33', fail: '31', error: '35', skipped: '2' };
function paint(text, status, color) {
    return color ? `\u001b[${COLOURS[status]}m${text}\u001b[0m` : text;
}
function table(rows, rightAligned) {
    const widths = rows[0].map((_, j) => Math.max(...rows.map((r) => [...r[j]].length)));
    return rows.map((r) => r
        .map((cell, j) => {
        const pad = ' '.repeat(widths[j] - [...cell].length);
        return rightAligned[j] ? pad + cell : cell + pad;
    })
        .join('  ')
        .trimEnd());
}
function metric(m, key) {
    const v = m.metrics?.[key];
    return typeof v === 'number' || typeof v === 'string' ? (0,_core_format_js__WEBPACK_IMPORTED_MODULE_2__/* .formatNumber */ .Z)((0,_result_result_js__WEBPACK_IMPORTED_MODULE_0__/* .fromJsonNumber */ .M)(v)) : '–';
}
function checkLine(model, c, color) {
    const status = paint(c.status.toUpperCase().padEnd(4), c.status, color);
    const text = `  ${status} ${c.id} (${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(model.descriptor)}:${c.line}): ${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(c.message)}`;
    return c.advice ? `${text}\n       ${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(c.advice)}` : text;
}
/** Formats the Result for a terminal. */
function formatText(result, options = {}) {
    const color = options.color ?? false;
    const out = [];
    const header = ['status', 'model', 'hold-out RMSE', 'gap ratio', 'params/row', 'max std coef'];
    const rows = result.models.map((m) => [
        m.verdict,
        (0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(m.name),
        metric(m, 'holdout_rmse'),
        metric(m, 'gap_ratio'),
        metric(m, 'params_per_sample'),
        metric(m, 'max_std_coefficient'),
    ]);
    if (rows.length > 0) {
        const lines = table([header, ...rows], [false, false, true, true, true, true]);
        out.push(lines[0]);
        lines.slice(1).forEach((line, i) => {
            const v = result.models[i].verdict;
            out.push(paint(v, v, color) + line.slice(v.length));
        });
    }
    else {
        out.push('no models to check');
    }
    for (const m of result.models) {
        if (m.verdict === 'pass')
            continue;
        out.push('');
        out.push(`${paint(m.verdict.toUpperCase(), m.verdict, color)} ${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(m.name)} (${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(m.descriptor)})`);
        if (m.error) {
            const where = m.error.file ? `${m.error.file}${m.error.line ? `:${m.error.line}` : ''}: ` : '';
            out.push(`  ${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(where + m.error.message)}`);
            continue;
        }
        for (const c of m.checks)
            if (c.status === 'fail' || c.status === 'warn')
                out.push(checkLine(m, c, color));
    }
    for (const note of result.notes)
        out.push('', `note: ${(0,_escape_js__WEBPACK_IMPORTED_MODULE_3__/* .escapeTerminal */ .en)(note)}`);
    const { counts } = result;
    out.push('');
    out.push(`${paint(result.verdict.toUpperCase(), result.verdict, color)}: ${counts.models} model${counts.models === 1 ? '' : 's'}, ${counts.pass} passed, ${counts.warn} warned, ${counts.fail} failed, ${counts.error} could not be checked`);
    // Read by a CI runner when the CLI runs in a CI step: no line may hold a runner command.
    return `${(0,_runner_commands_js__WEBPACK_IMPORTED_MODULE_1__/* .neutraliseLog */ .Z$)(out.join('\n'))}\n`;
}


/***/ }),

/***/ 1628:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   $u: () => (/* binding */ exitStatus),
/* harmony export */   JJ: () => (/* binding */ worse),
/* harmony export */   M: () => (/* reexport safe */ _core_json_js__WEBPACK_IMPORTED_MODULE_0__.M),
/* harmony export */   fS: () => (/* binding */ summarise),
/* harmony export */   qj: () => (/* reexport safe */ _core_json_js__WEBPACK_IMPORTED_MODULE_0__.qj)
/* harmony export */ });
/* harmony import */ var _core_json_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(6153);

const ORDER = { pass: 0, warn: 1, fail: 2, error: 3 };
/** The worse of two verdicts (error > fail > warn > pass). */
function worse(a, b) {
    return ORDER[a] >= ORDER[b] ? a : b;
}
/** Builds the run-level fields from model results (sorted by descriptor path, then name). */
function summarise(models, version, notes = []) {
    const sorted = [...models].sort((a, b) => a.descriptor < b.descriptor ? -1 : a.descriptor > b.descriptor ? 1 : a.name < b.name ? -1 : a.name > b.name ? 1 : 0);
    const counts = { models: sorted.length, pass: 0, warn: 0, fail: 0, error: 0 };
    let verdict = 'pass';
    for (const m of sorted) {
        counts[m.verdict] += 1;
        verdict = worse(verdict, m.verdict);
    }
    return { tool: { name: 'fitgate', version }, verdict, counts, models: sorted, notes };
}
/** Exit status of the CLI: 0 pass/warn, 1 a model over a fail limit, 2 an error. */
function exitStatus(result, failOn = 'fail') {
    if (result.verdict === 'error')
        return 2;
    if (result.verdict === 'fail')
        return 1;
    if (result.verdict === 'warn' && failOn === 'warn')
        return 1;
    return 0;
}


/***/ }),

/***/ 5786:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  a: () => (/* binding */ runPipeline)
});

// EXTERNAL MODULE: ./src/core/errors.ts
var core_errors = __nccwpck_require__(4296);
// EXTERNAL MODULE: ./src/repo/repo-path.ts
var repo_path = __nccwpck_require__(3856);
;// CONCATENATED MODULE: ./src/config/generated/limit-keys.ts
/** Every limit key, in registry (report) order. */
const limit_keys_LIMIT_KEYS = Object.freeze([
    { key: "gap_ratio", defaultSpec: 1.5, direction: "above", description: "Hold-out RMSE divided by training RMSE." },
    { key: "params_per_sample", defaultSpec: 0.1, direction: "above", description: "Fitted parameters divided by training rows (common practice: at least 10 rows per parameter)." },
    { key: "coefficient", defaultSpec: 25, direction: "above", description: "Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns." },
    { key: "base_change", defaultSpec: "off", direction: "above", description: "Relative change of the hold-out RMSE against the same model on the base branch." },
    { key: "cv_ratio", defaultSpec: "off", direction: "above", description: "Pooled k-fold cross-validation RMSE divided by training RMSE." },
    { key: "swing", defaultSpec: { "warn": 0.25, "fail": 0.5 }, direction: "above", description: "How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths." },
    { key: "swing_beyond", defaultSpec: { "warn": 1 }, direction: "above", description: "Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation)." },
    { key: "leakage", defaultSpec: 0, direction: "above", description: "Hold-out rows that also appear in the training data (the default 0 fails when there is any)." },
    { key: "reproducibility", defaultSpec: 0.01, direction: "above", description: "Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target." },
    { key: "condition", defaultSpec: { "warn": 100000000 }, direction: "above", description: "2-norm condition number of the column-scaled design matrix." },
    { key: "complexity", defaultSpec: { "warn": 1.5 }, direction: "above", description: "Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks." },
]);

;// CONCATENATED MODULE: ./src/config/limits.ts
/**
 * Limits: the known keys (generated from the check registry), the limit forms, and how the three
 * layers (built-in defaults < settings file < descriptor) combine. Checks read their limit from
 * `Descriptor.limits[key]`.
 *
 * Forms (docs/configuration.md, "Limits"):
 * - a number: fail beyond it in the check's direction (above a ceiling, below a floor);
 * - `{ warn, fail }`: warn and fail beyond them in the check's direction (at least one);
 * - `{ warn_below, fail_below, warn_above, fail_above }`: explicit bounds (at least one), for a
 *   floor, a ceiling or both on any check;
 * - `off`: skip the check.
 */


/** The known limit keys, in registry order. */
function limitKeyNames() {
    return LIMIT_KEYS.map((k) => k.key);
}
/** The known key's entry, or undefined. */
function limitKeyInfo(key) {
    return limit_keys_LIMIT_KEYS.find((k) => k.key === key);
}
/** The direction of a key's check (`above` for a key no check knows). */
function limitDirection(key) {
    return limitKeyInfo(key)?.direction ?? 'above';
}
/** The bounds of an explicit spec, or null for the other forms. */
function explicitBounds(spec) {
    if (typeof spec !== 'object' || spec === null)
        return null;
    if (!('warn_below' in spec || 'fail_below' in spec || 'warn_above' in spec || 'fail_above' in spec))
        return null;
    const s = spec;
    return { warnBelow: s.warn_below ?? null, failBelow: s.fail_below ?? null, warnAbove: s.warn_above ?? null, failAbove: s.fail_above ?? null };
}
/**
 * Why a spec's bounds are out of order, or null when they are in order: a ceiling's warn at most
 * its fail, a floor's warn at least its fail, every floor below every ceiling.
 * @returns the offending pair as `[key, message]`
 */
function limitOrderProblem(spec, direction) {
    if (spec === 'off' || typeof spec === 'number')
        return null;
    const b = explicitBounds(spec);
    const plain = spec;
    const warnBelow = b ? b.warnBelow : direction === 'below' ? (plain.warn ?? null) : null;
    const failBelow = b ? b.failBelow : direction === 'below' ? (plain.fail ?? null) : null;
    const warnAbove = b ? b.warnAbove : direction === 'above' ? (plain.warn ?? null) : null;
    const failAbove = b ? b.failAbove : direction === 'above' ? (plain.fail ?? null) : null;
    const [wa, fa, wb, fb] = b ? ['warn_above', 'fail_above', 'warn_below', 'fail_below'] : ['warn', 'fail', 'warn', 'fail'];
    if (warnAbove !== null && failAbove !== null && warnAbove > failAbove)
        return [wa, `${wa} ${warnAbove} is above ${fa} ${failAbove}; expected ${wa} <= ${fa} (a ceiling warns before it fails)`];
    if (warnBelow !== null && failBelow !== null && warnBelow < failBelow)
        return [wb, `${wb} ${warnBelow} is below ${fb} ${failBelow}; expected ${wb} >= ${fb} (a floor warns before it fails)`];
    const floor = Math.max(warnBelow ?? -Infinity, failBelow ?? -Infinity);
    const ceiling = Math.min(warnAbove ?? Infinity, failAbove ?? Infinity);
    if (floor > ceiling)
        return [b ? 'warn_below' : 'warn', `the floor ${floor} is above the ceiling ${ceiling}; every value would be out of bounds`];
    return null;
}
/**
 * Normalises a limit as written to a {@link Limit}.
 *
 * @param spec one of the forms above; numbers finite (the loaders check the forms and the order
 *   with file positions first; here a bad spec is a programming error: TypeError / RangeError)
 * @param direction the check's direction, for a number and `{ warn, fail }`
 * @param source which layer the spec came from
 * @param line descriptor line of the key (descriptor limits only), else null
 */
function toLimit(spec, direction, source, line) {
    const none = { warn: null, fail: null, warnBelow: null, failBelow: null };
    if (spec === 'off')
        return { ...none, off: true, source, line };
    if (typeof spec === 'number') {
        assertThreshold(spec);
        return direction === 'above' ? { ...none, fail: spec, off: false, source, line } : { ...none, failBelow: spec, off: false, source, line };
    }
    if (spec === null || typeof spec !== 'object')
        throw new TypeError(`limit spec must be a number, an object of bounds or 'off', got ${String(spec)}`);
    const problem = limitOrderProblem(spec, direction);
    if (problem !== null)
        throw new RangeError(problem[1]);
    const b = explicitBounds(spec);
    let limit;
    if (b !== null) {
        limit = { warn: b.warnAbove, fail: b.failAbove, warnBelow: b.warnBelow, failBelow: b.failBelow, off: false, source, line };
    }
    else {
        const { warn = null, fail = null } = spec;
        limit = direction === 'above' ? { ...none, warn, fail, off: false, source, line } : { ...none, warnBelow: warn, failBelow: fail, off: false, source, line };
    }
    const bounds = [limit.warn, limit.fail, limit.warnBelow, limit.failBelow].filter((x) => x !== null);
    if (bounds.length === 0)
        throw new RangeError('a limit needs at least one bound');
    for (const x of bounds)
        assertThreshold(x);
    return limit;
}
function assertThreshold(x) {
    if (typeof x !== 'number' || !Number.isFinite(x))
        throw new RangeError(`limit threshold must be a finite number, got ${String(x)}`);
}
/**
 * Merges limits key by key: built-in default < settings file < descriptor. A layer that
 * sets a key replaces the whole limit of the layer below (no mixing of `warn` from one
 * layer with `fail` from another).
 *
 * @param settings the settings file (its `limits`)
 * @param descriptorLimits the descriptor's own limits with the line of each key
 * @returns one {@link Limit} per known key plus any further key a layer sets
 */
function mergeLimits(settings, descriptorLimits) {
    const merged = {};
    for (const { key, defaultSpec, direction } of limit_keys_LIMIT_KEYS)
        merged[key] = toLimit(defaultSpec, direction, 'default', null);
    for (const [key, { spec }] of Object.entries(settings.limits))
        merged[key] = toLimit(spec, limitDirection(key), 'settings', null);
    for (const [key, { spec, line }] of Object.entries(descriptorLimits))
        merged[key] = toLimit(spec, limitDirection(key), 'descriptor', line);
    return merged;
}

;// CONCATENATED MODULE: ./src/config/schema-errors.ts
/**
 * Turns ajv's validation errors into the one most useful {@link InputError}: the first problem
 * in document order (and within it the deepest), with the file, line, column, key path, the
 * bad value (quoted, cut) and what the schema expected.
 */

/** Code of every schema violation. */
const SCHEMA_ERROR_CODE = 'schema';
/**
 * Formats a key path as written in messages: `terms[1].rbf.width`.
 *
 * @param path map keys and list indexes; the empty path gives the empty string
 */
function formatKeyPath(path) {
    let out = '';
    for (const segment of path) {
        if (typeof segment === 'number')
            out += `[${segment}]`;
        else
            out += out === '' ? segment : `.${segment}`;
    }
    return out;
}
/**
 * An InputError at a key path of a parsed document.
 *
 * @param doc the parsed document (for positions)
 * @param file repository-relative path
 * @param code stable error code
 * @param path key path the problem is about
 * @param message what is wrong and what was expected
 * @param pointAt `value` (default) points at the value, `key` at the key, `parent` at the parent's key
 */
function errorAt(doc, file, code, path, message, pointAt = 'value') {
    const position = locate(doc, path, pointAt);
    const key = formatKeyPath(path);
    return new core_errors/* InputError */.dz(code, message, { file, ...(position ?? {}), ...(key !== '' ? { key } : {}) });
}
/** Quotes a user value for a message; non-finite numbers as YAML writes them. */
function showValue(value) {
    if (typeof value === 'number' && !Number.isFinite(value))
        return Number.isNaN(value) ? '.nan' : value > 0 ? '.inf' : '-.inf';
    if (value instanceof Uint8Array)
        return 'binary data';
    if (value === null)
        return 'nothing (null)';
    return (0,core_errors/* quoteValue */.cl)(value);
}
/**
 * The single most specific InputError for a failed validation.
 *
 * @param errors ajv errors (compiled with `allErrors` and `verbose`)
 * @param doc the parsed document the errors are about
 * @param file repository-relative path
 */
function schemaError(errors, doc, file) {
    const issues = resolveAlternatives(errors).flatMap((e) => toIssue(e, doc.value));
    if (issues.length === 0)
        return new core_errors/* InputError */.dz(SCHEMA_ERROR_CODE, 'does not match its schema', { file });
    // First in document order; within its subtree, the deepest.
    const placed = issues.map((issue, index) => ({ issue, index, at: locate(doc, issue.path, issue.pointAt) ?? { line: 0, column: 0 } }));
    placed.sort((a, b) => a.at.line - b.at.line || a.at.column - b.at.column || a.index - b.index);
    const first = placed[0];
    let chosen = first;
    for (const candidate of placed) {
        if (isPrefix(first.issue.path, candidate.issue.path) && candidate.issue.path.length > chosen.issue.path.length)
            chosen = candidate;
    }
    const { issue } = chosen;
    return errorAt(doc, file, SCHEMA_ERROR_CODE, issue.path, issue.message, issue.pointAt);
}
function isPrefix(prefix, path) {
    return prefix.length <= path.length && prefix.every((s, i) => s === path[i]);
}
function locate(doc, path, pointAt) {
    let target = pointAt === 'parent' ? path.slice(0, -1) : path;
    let position = pointAt === 'value' ? doc.valuePositionOf(target) : doc.positionOf(target);
    while (position === null && target.length > 0) {
        target = target.slice(0, -1);
        position = doc.positionOf(target);
    }
    return position;
}
/** Replaces each failed oneOf/anyOf and its branch errors by the errors of the branch the user meant, or one "expected one of" error. */
function resolveAlternatives(errors) {
    const alternatives = errors.filter((e) => e.keyword === 'oneOf' || e.keyword === 'anyOf').sort((a, b) => a.schemaPath.length - b.schemaPath.length);
    if (alternatives.length === 0)
        return errors;
    const outer = alternatives[0];
    const prefix = `${outer.schemaPath}/`;
    const inside = errors.filter((e) => e.schemaPath.startsWith(prefix));
    const rest = errors.filter((e) => e !== outer && !e.schemaPath.startsWith(prefix));
    const branches = new Map();
    for (const e of inside) {
        const index = Number.parseInt(e.schemaPath.slice(prefix.length), 10);
        branches.set(index, [...(branches.get(index) ?? []), e]);
    }
    const matchingType = [...branches.entries()].filter(([, list]) => !list.some((e) => e.instancePath === outer.instancePath && (e.keyword === 'type' || e.keyword === 'const' || e.keyword === 'enum')));
    const score = (list) => [Math.max(...list.map((e) => effectiveDepth(e))), -list.length];
    let best = null;
    let tie = false;
    for (const [, list] of matchingType) {
        if (best === null) {
            best = list;
            continue;
        }
        const [d1, n1] = score(list);
        const [d0, n0] = score(best);
        if (d1 > d0 || (d1 === d0 && n1 > n0)) {
            best = list;
            tie = false;
        }
        else if (d1 === d0 && n1 === n0) {
            tie = true;
        }
    }
    const chosen = best !== null && !tie ? best : [alternativesError(outer)];
    return resolveAlternatives([...rest, ...chosen]);
}
/** A stand-in error listing the forms of a failed oneOf/anyOf. */
function alternativesError(outer) {
    const forms = Array.isArray(outer.schema) ? outer.schema.map((s) => s.title ?? 'another form') : [];
    return { ...outer, keyword: 'x-alternatives', params: { forms } };
}
function effectiveDepth(e) {
    const depth = e.instancePath === '' ? 0 : e.instancePath.split('/').length - 1;
    return e.keyword === 'required' || e.keyword === 'additionalProperties' || e.keyword === 'propertyNames' ? depth + 1 : depth;
}
/** JSON pointer to a key path; numbers where the data there is a list. */
function pointerToPath(pointer, root) {
    if (pointer === '')
        return [];
    const path = [];
    let node = root;
    for (const raw of pointer.slice(1).split('/')) {
        const segment = raw.replace(/~1/g, '/').replace(/~0/g, '~');
        if (Array.isArray(node)) {
            const index = Number(segment);
            path.push(index);
            node = node[index];
        }
        else {
            path.push(segment);
            node = node !== null && typeof node === 'object' ? node[segment] : undefined;
        }
    }
    return path;
}
const TYPE_WORDS = {
    number: 'a number',
    integer: 'an integer',
    string: 'text',
    object: 'a mapping (key: value)',
    array: 'a list',
    boolean: 'true or false',
    null: 'nothing',
};
const PATTERN_WORDS = {
    '^[A-Za-z0-9._-]+$': 'only letters, digits, `-`, `_` or `.`',
};
function orList(items) {
    if (items.length <= 1)
        return items.join('');
    return `${items.slice(0, -1).join(', ')} or ${items[items.length - 1]}`;
}
function toIssue(e, root) {
    const path = pointerToPath(e.instancePath, root);
    const parent = (e.parentSchema ?? {});
    const got = `got ${showValue(e.data)}`;
    const params = e.params;
    const keys = Object.keys(parent.properties ?? {});
    const isTerm = Array.isArray(parent.propertyNames?.enum) && parent.maxProperties === 1;
    const kinds = (parent.propertyNames?.enum ?? []).map(String);
    switch (e.keyword) {
        case 'type': {
            const types = (Array.isArray(params.type) ? params.type : String(params.type).split(','));
            let expected = orList(types.map((t) => TYPE_WORDS[t] ?? t));
            if (typeof e.data === 'number' && !Number.isFinite(e.data))
                expected = `a finite ${types.includes('integer') ? 'integer' : 'number'}`;
            if (types.includes('object') && isTerm)
                expected = `a mapping with one key, the term kind (${orList(kinds)})`;
            else if (types.includes('object') && keys.length > 0)
                expected += ` with keys among: ${keys.join(', ')}`;
            return [{ path, pointAt: 'value', message: `expected ${expected}, ${got}` }];
        }
        case 'enum':
            if (e.propertyName !== undefined)
                return []; // reported by propertyNames
            return [{ path, pointAt: 'value', message: `expected one of: ${params.allowedValues.map(String).join(', ')}, ${got}` }];
        case 'const':
            return [{ path, pointAt: 'value', message: `expected \`${(0,core_errors/* clip */.$Q)(String(params.allowedValue))}\`, ${got}` }];
        case 'minimum':
        case 'maximum':
        case 'exclusiveMinimum':
        case 'exclusiveMaximum':
            return [{ path, pointAt: 'value', message: `expected ${boundsText(parent)}, ${got}` }];
        case 'multipleOf':
            return [{ path, pointAt: 'value', message: `expected a multiple of ${String(params.multipleOf)}, ${got}` }];
        case 'minLength':
            return [{ path, pointAt: 'value', message: `expected ${params.limit === 1 ? 'non-empty text' : `text of at least ${String(params.limit)} characters`}, ${got}` }];
        case 'maxLength':
            return [{ path, pointAt: 'value', message: `expected text of at most ${String(params.limit)} characters, got ${String(e.data).length} characters` }];
        case 'pattern': {
            const pattern = String(params.pattern);
            return [{ path, pointAt: 'value', message: `expected ${PATTERN_WORDS[pattern] ?? `text matching ${pattern}`}, ${got}` }];
        }
        case 'minItems':
            return [{ path, pointAt: 'value', message: `expected ${params.limit === 1 ? 'a non-empty list' : `a list of at least ${String(params.limit)} items`}, ${got}` }];
        case 'maxItems':
            return [{ path, pointAt: 'value', message: `expected a list of at most ${String(params.limit)} items, got ${Array.isArray(e.data) ? e.data.length : '?'} items` }];
        case 'required': {
            const missing = String(params.missingProperty);
            return [{ path: [...path, missing], pointAt: 'parent', message: `missing key \`${(0,core_errors/* clip */.$Q)(missing)}\`; required keys: ${(parent.required ?? [missing]).join(', ')}` }];
        }
        case 'additionalProperties': {
            const extra = String(params.additionalProperty);
            return [{ path: [...path, extra], pointAt: 'key', message: `unknown key \`${(0,core_errors/* clip */.$Q)(extra)}\`; expected one of: ${keys.join(', ')}` }];
        }
        case 'propertyNames': {
            const name = String(params.propertyName);
            const what = isTerm ? 'term kind' : 'key';
            return [{ path: [...path, name], pointAt: 'key', message: `unknown ${what} \`${(0,core_errors/* clip */.$Q)(name)}\`; expected one of: ${kinds.join(', ')}` }];
        }
        case 'minProperties':
        case 'maxProperties': {
            const present = e.data !== null && typeof e.data === 'object' ? Object.keys(e.data) : [];
            if (isTerm) {
                const has = present.length === 0 ? 'no key' : `${present.length} keys (${present.join(', ')})`;
                return [{ path, pointAt: 'value', message: `a term has exactly one key, the term kind (${orList(kinds)}); got ${has}` }];
            }
            return [{ path, pointAt: 'value', message: `expected at least one of: ${keys.join(', ')}, ${got}` }];
        }
        case 'x-alternatives':
            return [{ path, pointAt: 'value', message: `expected one of: ${orList(params.forms)}, ${got}` }];
        case 'oneOf':
            return [{ path, pointAt: 'value', message: `matches more than one form; ${got}` }];
        default:
            return [{ path, pointAt: 'value', message: `${e.message ?? 'is not valid'}, ${got}` }];
    }
}
function boundsText(schema) {
    const what = schema.type === 'integer' ? 'an integer' : 'a number';
    const parts = [];
    if (schema.minimum !== undefined && schema.maximum !== undefined)
        return `${what} from ${schema.minimum} to ${schema.maximum}`;
    if (schema.minimum !== undefined)
        parts.push(`>= ${schema.minimum}`);
    if (schema.exclusiveMinimum !== undefined)
        parts.push(`> ${schema.exclusiveMinimum}`);
    if (schema.maximum !== undefined)
        parts.push(`<= ${schema.maximum}`);
    if (schema.exclusiveMaximum !== undefined)
        parts.push(`< ${schema.exclusiveMaximum}`);
    return `${what} ${parts.join(' and ')}`;
}

;// CONCATENATED MODULE: ./src/config/schema/descriptor.schema.json
const descriptor_schema_namespaceObject = {};
;// CONCATENATED MODULE: ./src/config/schema/settings.schema.json
const settings_schema_namespaceObject = {};
// EXTERNAL MODULE: ./node_modules/ajv/dist/runtime/ucs2length.js
var ucs2length = __nccwpck_require__(6214);
;// CONCATENATED MODULE: ./src/config/generated/validators.ts
// @ts-nocheck
// Generated by test/tools/gen-validators.mjs from src/config/schema/*.json: do not edit.


const validateSettings = validate52;
const schema19 = { "$schema": "https://json-schema.org/draft/2020-12/schema", "$id": "urn:fitgate:schema:settings:1", "title": "fitgate repository settings (fitgate.yml)", "description": "Where the model descriptors are and the limits every model gets unless its descriptor says otherwise.", "type": "object", "required": ["version"], "additionalProperties": false, "properties": { "version": { "description": "Version of this file format. Always 1.", "const": 1 }, "models": { "description": "Glob patterns of model descriptors, relative to the repository root (node_modules and .git are searched only when a pattern names them; links to folders are never followed). Each pattern must match at least one file.", "type": "array", "minItems": 1, "default": ["**/*.model.yml"], "items": { "description": "A glob pattern such as `models/**/*.model.yml` (`*`, `?`, `**`, `[...]`, `{a,b}`); not absolute, no `..` segment anywhere, at most 1000 characters and 256 brace alternatives.", "type": "string", "minLength": 1 } }, "limits": { "$ref": "#/$defs/limits", "description": "Limits for every model; a descriptor's own `limits` win key by key." }, "fit": { "description": "Defaults for the `fit` keys that a descriptor leaves out.", "type": "object", "additionalProperties": false, "properties": { "folds": { "description": "k of k-fold cross-validation: the training rows are split into this many folds.", "type": "integer", "minimum": 2, "default": 5 }, "fold_order": { "description": "How rows are assigned to folds: `shuffled` (a seeded random order) or `blocks` (consecutive rows, for ordered data such as time series).", "enum": ["shuffled", "blocks"], "default": "shuffled" }, "seed": { "description": "Seed of the fold shuffle and of any other random step, so runs repeat exactly.", "type": "integer", "minimum": 0, "maximum": 4294967295, "default": 1 }, "parameter_count": { "description": "What the `parameter-ratio` check counts as parameters: `columns` (the design's columns p) or `effective` (the effective degrees of freedom of a ridge fit, the trace of its hat matrix; equals p for least squares of full rank).", "enum": ["columns", "effective"], "default": "columns" } } }, "caps": { "description": "Resource caps that guard memory and time; raise them for large models.", "type": "object", "additionalProperties": false, "properties": { "max_file_mb": { "description": "Largest data file, in MiB.", "type": "number", "exclusiveMinimum": 0, "default": 512 }, "max_cells": { "description": "Largest training rows x fitted parameters.", "type": "integer", "minimum": 1, "default": 200000000 } } } }, "$defs": { "limits": { "title": "limits", "description": "Limits by key. Each is a number (fail above it), { warn, fail } or `off`.", "type": "object", "additionalProperties": false, "properties": { "gap_ratio": { "$ref": "#/$defs/limit", "description": "Hold-out RMSE divided by training RMSE.", "default": 1.5 }, "params_per_sample": { "$ref": "#/$defs/limit", "description": "Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).", "default": 0.1 }, "coefficient": { "$ref": "#/$defs/limit", "description": "Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.", "default": 25 }, "base_change": { "$ref": "#/$defs/limit", "description": "Relative change of the hold-out RMSE against the same model on the base branch.", "default": "off" }, "cv_ratio": { "$ref": "#/$defs/limit", "description": "Pooled k-fold cross-validation RMSE divided by training RMSE.", "default": "off" }, "swing": { "$ref": "#/$defs/limit", "description": "How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.", "default": { "warn": 0.25, "fail": 0.5 } }, "swing_beyond": { "$ref": "#/$defs/limit", "description": "Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).", "default": { "warn": 1 } }, "leakage": { "$ref": "#/$defs/limit", "description": "Hold-out rows that also appear in the training data (the default 0 fails when there is any).", "default": 0 }, "reproducibility": { "$ref": "#/$defs/limit", "description": "Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.", "default": 0.01 }, "condition": { "$ref": "#/$defs/limit", "description": "2-norm condition number of the column-scaled design matrix.", "default": { "warn": 100000000 } }, "complexity": { "$ref": "#/$defs/limit", "description": "Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.", "default": { "warn": 1.5 } } } }, "limit": { "title": "limit", "description": "A number (fail beyond it in the check's direction: above a ceiling, below a floor), { warn, fail } (at least one) in the same direction, explicit bounds { warn_below, fail_below, warn_above, fail_above } (at least one; a floor's warn >= its fail, a ceiling's warn <= its fail), or `off` (skip the check).", "oneOf": [{ "title": "a number >= 0 (fail beyond it)", "description": "Fail when the figure is beyond this number in the check's direction (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, { "title": "{ warn, fail }", "description": "Warn beyond `warn`, fail beyond `fail`, in the check's direction; give at least one (a ceiling's warn <= fail, a floor's warn >= fail).", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn": { "description": "Warn when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, "fail": { "description": "Fail when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 } } }, { "title": "{ warn_below, fail_below, warn_above, fail_above }", "description": "Explicit bounds on either side, whatever the check's direction: fail below `fail_below` or above `fail_above`, warn below `warn_below` or above `warn_above`; give at least one.", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn_below": { "description": "Warn when the figure is below this number.", "type": "number" }, "fail_below": { "description": "Fail when the figure is below this number.", "type": "number" }, "warn_above": { "description": "Warn when the figure is above this number.", "type": "number" }, "fail_above": { "description": "Fail when the figure is above this number.", "type": "number" } } }, { "title": "`off`", "description": "Skip the check.", "const": "off" }] } } };
const func1 = typeof ucs2length/* default */.A === "function" ? ucs2length/* default */.A : ucs2length/* default.default */.A["default"];
const schema20 = { "title": "limits", "description": "Limits by key. Each is a number (fail above it), { warn, fail } or `off`.", "type": "object", "additionalProperties": false, "properties": { "gap_ratio": { "$ref": "#/$defs/limit", "description": "Hold-out RMSE divided by training RMSE.", "default": 1.5 }, "params_per_sample": { "$ref": "#/$defs/limit", "description": "Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).", "default": 0.1 }, "coefficient": { "$ref": "#/$defs/limit", "description": "Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.", "default": 25 }, "base_change": { "$ref": "#/$defs/limit", "description": "Relative change of the hold-out RMSE against the same model on the base branch.", "default": "off" }, "cv_ratio": { "$ref": "#/$defs/limit", "description": "Pooled k-fold cross-validation RMSE divided by training RMSE.", "default": "off" }, "swing": { "$ref": "#/$defs/limit", "description": "How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.", "default": { "warn": 0.25, "fail": 0.5 } }, "swing_beyond": { "$ref": "#/$defs/limit", "description": "Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).", "default": { "warn": 1 } }, "leakage": { "$ref": "#/$defs/limit", "description": "Hold-out rows that also appear in the training data (the default 0 fails when there is any).", "default": 0 }, "reproducibility": { "$ref": "#/$defs/limit", "description": "Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.", "default": 0.01 }, "condition": { "$ref": "#/$defs/limit", "description": "2-norm condition number of the column-scaled design matrix.", "default": { "warn": 100000000 } }, "complexity": { "$ref": "#/$defs/limit", "description": "Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.", "default": { "warn": 1.5 } } } };
const func2 = Object.prototype.hasOwnProperty;
const schema21 = { "title": "limit", "description": "A number (fail beyond it in the check's direction: above a ceiling, below a floor), { warn, fail } (at least one) in the same direction, explicit bounds { warn_below, fail_below, warn_above, fail_above } (at least one; a floor's warn >= its fail, a ceiling's warn <= its fail), or `off` (skip the check).", "oneOf": [{ "title": "a number >= 0 (fail beyond it)", "description": "Fail when the figure is beyond this number in the check's direction (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, { "title": "{ warn, fail }", "description": "Warn beyond `warn`, fail beyond `fail`, in the check's direction; give at least one (a ceiling's warn <= fail, a floor's warn >= fail).", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn": { "description": "Warn when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, "fail": { "description": "Fail when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 } } }, { "title": "{ warn_below, fail_below, warn_above, fail_above }", "description": "Explicit bounds on either side, whatever the check's direction: fail below `fail_below` or above `fail_above`, warn below `warn_below` or above `warn_above`; give at least one.", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn_below": { "description": "Warn when the figure is below this number.", "type": "number" }, "fail_below": { "description": "Fail when the figure is below this number.", "type": "number" }, "warn_above": { "description": "Warn when the figure is above this number.", "type": "number" }, "fail_above": { "description": "Fail when the figure is above this number.", "type": "number" } } }, { "title": "`off`", "description": "Skip the check.", "const": "off" }] };
function validate54(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate54.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    const _errs0 = errors;
    let valid0 = false;
    let passing0 = null;
    const _errs1 = errors;
    if ((typeof data == "number") && (isFinite(data))) {
        if (data < 0 || isNaN(data)) {
            const err0 = { instancePath, schemaPath: "#/oneOf/0/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema21.oneOf[0], data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
    }
    else {
        const err1 = { instancePath, schemaPath: "#/oneOf/0/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[0].type, parentSchema: schema21.oneOf[0], data };
        if (vErrors === null) {
            vErrors = [err1];
        }
        else {
            vErrors.push(err1);
        }
        errors++;
    }
    var _valid0 = _errs1 === errors;
    if (_valid0) {
        valid0 = true;
        passing0 = 0;
    }
    const _errs3 = errors;
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (Object.keys(data).length < 1) {
            const err2 = { instancePath, schemaPath: "#/oneOf/1/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema21.oneOf[1], data };
            if (vErrors === null) {
                vErrors = [err2];
            }
            else {
                vErrors.push(err2);
            }
            errors++;
        }
        for (const key0 in data) {
            if (!((key0 === "warn") || (key0 === "fail"))) {
                const err3 = { instancePath, schemaPath: "#/oneOf/1/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema21.oneOf[1], data };
                if (vErrors === null) {
                    vErrors = [err3];
                }
                else {
                    vErrors.push(err3);
                }
                errors++;
            }
        }
        if (data.warn !== undefined) {
            let data0 = data.warn;
            if ((typeof data0 == "number") && (isFinite(data0))) {
                if (data0 < 0 || isNaN(data0)) {
                    const err4 = { instancePath: instancePath + "/warn", schemaPath: "#/oneOf/1/properties/warn/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema21.oneOf[1].properties.warn, data: data0 };
                    if (vErrors === null) {
                        vErrors = [err4];
                    }
                    else {
                        vErrors.push(err4);
                    }
                    errors++;
                }
            }
            else {
                const err5 = { instancePath: instancePath + "/warn", schemaPath: "#/oneOf/1/properties/warn/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[1].properties.warn.type, parentSchema: schema21.oneOf[1].properties.warn, data: data0 };
                if (vErrors === null) {
                    vErrors = [err5];
                }
                else {
                    vErrors.push(err5);
                }
                errors++;
            }
        }
        if (data.fail !== undefined) {
            let data1 = data.fail;
            if ((typeof data1 == "number") && (isFinite(data1))) {
                if (data1 < 0 || isNaN(data1)) {
                    const err6 = { instancePath: instancePath + "/fail", schemaPath: "#/oneOf/1/properties/fail/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema21.oneOf[1].properties.fail, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err6];
                    }
                    else {
                        vErrors.push(err6);
                    }
                    errors++;
                }
            }
            else {
                const err7 = { instancePath: instancePath + "/fail", schemaPath: "#/oneOf/1/properties/fail/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[1].properties.fail.type, parentSchema: schema21.oneOf[1].properties.fail, data: data1 };
                if (vErrors === null) {
                    vErrors = [err7];
                }
                else {
                    vErrors.push(err7);
                }
                errors++;
            }
        }
    }
    else {
        const err8 = { instancePath, schemaPath: "#/oneOf/1/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema21.oneOf[1].type, parentSchema: schema21.oneOf[1], data };
        if (vErrors === null) {
            vErrors = [err8];
        }
        else {
            vErrors.push(err8);
        }
        errors++;
    }
    var _valid0 = _errs3 === errors;
    if (_valid0 && valid0) {
        valid0 = false;
        passing0 = [passing0, 1];
    }
    else {
        if (_valid0) {
            valid0 = true;
            passing0 = 1;
            var props0 = true;
        }
        const _errs10 = errors;
        if (data && typeof data == "object" && !Array.isArray(data)) {
            if (Object.keys(data).length < 1) {
                const err9 = { instancePath, schemaPath: "#/oneOf/2/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema21.oneOf[2], data };
                if (vErrors === null) {
                    vErrors = [err9];
                }
                else {
                    vErrors.push(err9);
                }
                errors++;
            }
            for (const key1 in data) {
                if (!((((key1 === "warn_below") || (key1 === "fail_below")) || (key1 === "warn_above")) || (key1 === "fail_above"))) {
                    const err10 = { instancePath, schemaPath: "#/oneOf/2/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema21.oneOf[2], data };
                    if (vErrors === null) {
                        vErrors = [err10];
                    }
                    else {
                        vErrors.push(err10);
                    }
                    errors++;
                }
            }
            if (data.warn_below !== undefined) {
                let data2 = data.warn_below;
                if (!((typeof data2 == "number") && (isFinite(data2)))) {
                    const err11 = { instancePath: instancePath + "/warn_below", schemaPath: "#/oneOf/2/properties/warn_below/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[2].properties.warn_below.type, parentSchema: schema21.oneOf[2].properties.warn_below, data: data2 };
                    if (vErrors === null) {
                        vErrors = [err11];
                    }
                    else {
                        vErrors.push(err11);
                    }
                    errors++;
                }
            }
            if (data.fail_below !== undefined) {
                let data3 = data.fail_below;
                if (!((typeof data3 == "number") && (isFinite(data3)))) {
                    const err12 = { instancePath: instancePath + "/fail_below", schemaPath: "#/oneOf/2/properties/fail_below/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[2].properties.fail_below.type, parentSchema: schema21.oneOf[2].properties.fail_below, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err12];
                    }
                    else {
                        vErrors.push(err12);
                    }
                    errors++;
                }
            }
            if (data.warn_above !== undefined) {
                let data4 = data.warn_above;
                if (!((typeof data4 == "number") && (isFinite(data4)))) {
                    const err13 = { instancePath: instancePath + "/warn_above", schemaPath: "#/oneOf/2/properties/warn_above/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[2].properties.warn_above.type, parentSchema: schema21.oneOf[2].properties.warn_above, data: data4 };
                    if (vErrors === null) {
                        vErrors = [err13];
                    }
                    else {
                        vErrors.push(err13);
                    }
                    errors++;
                }
            }
            if (data.fail_above !== undefined) {
                let data5 = data.fail_above;
                if (!((typeof data5 == "number") && (isFinite(data5)))) {
                    const err14 = { instancePath: instancePath + "/fail_above", schemaPath: "#/oneOf/2/properties/fail_above/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema21.oneOf[2].properties.fail_above.type, parentSchema: schema21.oneOf[2].properties.fail_above, data: data5 };
                    if (vErrors === null) {
                        vErrors = [err14];
                    }
                    else {
                        vErrors.push(err14);
                    }
                    errors++;
                }
            }
        }
        else {
            const err15 = { instancePath, schemaPath: "#/oneOf/2/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema21.oneOf[2].type, parentSchema: schema21.oneOf[2], data };
            if (vErrors === null) {
                vErrors = [err15];
            }
            else {
                vErrors.push(err15);
            }
            errors++;
        }
        var _valid0 = _errs10 === errors;
        if (_valid0 && valid0) {
            valid0 = false;
            passing0 = [passing0, 2];
        }
        else {
            if (_valid0) {
                valid0 = true;
                passing0 = 2;
                if (props0 !== true) {
                    props0 = true;
                }
            }
            const _errs21 = errors;
            if ("off" !== data) {
                const err16 = { instancePath, schemaPath: "#/oneOf/3/const", keyword: "const", params: { allowedValue: "off" }, message: "must be equal to constant", schema: "off", parentSchema: schema21.oneOf[3], data };
                if (vErrors === null) {
                    vErrors = [err16];
                }
                else {
                    vErrors.push(err16);
                }
                errors++;
            }
            var _valid0 = _errs21 === errors;
            if (_valid0 && valid0) {
                valid0 = false;
                passing0 = [passing0, 3];
            }
            else {
                if (_valid0) {
                    valid0 = true;
                    passing0 = 3;
                }
            }
        }
    }
    if (!valid0) {
        const err17 = { instancePath, schemaPath: "#/oneOf", keyword: "oneOf", params: { passingSchemas: passing0 }, message: "must match exactly one schema in oneOf", schema: schema21.oneOf, parentSchema: schema21, data };
        if (vErrors === null) {
            vErrors = [err17];
        }
        else {
            vErrors.push(err17);
        }
        errors++;
    }
    else {
        errors = _errs0;
        if (vErrors !== null) {
            if (_errs0) {
                vErrors.length = _errs0;
            }
            else {
                vErrors = null;
            }
        }
    }
    validate54.errors = vErrors;
    evaluated0.props = props0;
    return errors === 0;
}
validate54.evaluated = { "dynamicProps": true, "dynamicItems": false };
function validate53(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate53.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    if (data && typeof data == "object" && !Array.isArray(data)) {
        for (const key0 in data) {
            if (!(func2.call(schema20.properties, key0))) {
                const err0 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema20, data };
                if (vErrors === null) {
                    vErrors = [err0];
                }
                else {
                    vErrors.push(err0);
                }
                errors++;
            }
        }
        if (data.gap_ratio !== undefined) {
            if (!(validate54(data.gap_ratio, { instancePath: instancePath + "/gap_ratio", parentData: data, parentDataProperty: "gap_ratio", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.params_per_sample !== undefined) {
            if (!(validate54(data.params_per_sample, { instancePath: instancePath + "/params_per_sample", parentData: data, parentDataProperty: "params_per_sample", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.coefficient !== undefined) {
            if (!(validate54(data.coefficient, { instancePath: instancePath + "/coefficient", parentData: data, parentDataProperty: "coefficient", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.base_change !== undefined) {
            if (!(validate54(data.base_change, { instancePath: instancePath + "/base_change", parentData: data, parentDataProperty: "base_change", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.cv_ratio !== undefined) {
            if (!(validate54(data.cv_ratio, { instancePath: instancePath + "/cv_ratio", parentData: data, parentDataProperty: "cv_ratio", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.swing !== undefined) {
            if (!(validate54(data.swing, { instancePath: instancePath + "/swing", parentData: data, parentDataProperty: "swing", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.swing_beyond !== undefined) {
            if (!(validate54(data.swing_beyond, { instancePath: instancePath + "/swing_beyond", parentData: data, parentDataProperty: "swing_beyond", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.leakage !== undefined) {
            if (!(validate54(data.leakage, { instancePath: instancePath + "/leakage", parentData: data, parentDataProperty: "leakage", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.reproducibility !== undefined) {
            if (!(validate54(data.reproducibility, { instancePath: instancePath + "/reproducibility", parentData: data, parentDataProperty: "reproducibility", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.condition !== undefined) {
            if (!(validate54(data.condition, { instancePath: instancePath + "/condition", parentData: data, parentDataProperty: "condition", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
        if (data.complexity !== undefined) {
            if (!(validate54(data.complexity, { instancePath: instancePath + "/complexity", parentData: data, parentDataProperty: "complexity", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate54.errors : vErrors.concat(validate54.errors);
                errors = vErrors.length;
            }
        }
    }
    else {
        const err1 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema20.type, parentSchema: schema20, data };
        if (vErrors === null) {
            vErrors = [err1];
        }
        else {
            vErrors.push(err1);
        }
        errors++;
    }
    validate53.errors = vErrors;
    return errors === 0;
}
validate53.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };
function validate52(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    /*# sourceURL="urn:fitgate:schema:settings:1" */ ;
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate52.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (data.version === undefined) {
            const err0 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "version" }, message: "must have required property '" + "version" + "'", schema: schema19.required, parentSchema: schema19, data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
        for (const key0 in data) {
            if (!(((((key0 === "version") || (key0 === "models")) || (key0 === "limits")) || (key0 === "fit")) || (key0 === "caps"))) {
                const err1 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema19, data };
                if (vErrors === null) {
                    vErrors = [err1];
                }
                else {
                    vErrors.push(err1);
                }
                errors++;
            }
        }
        if (data.version !== undefined) {
            let data0 = data.version;
            if (1 !== data0) {
                const err2 = { instancePath: instancePath + "/version", schemaPath: "#/properties/version/const", keyword: "const", params: { allowedValue: 1 }, message: "must be equal to constant", schema: 1, parentSchema: schema19.properties.version, data: data0 };
                if (vErrors === null) {
                    vErrors = [err2];
                }
                else {
                    vErrors.push(err2);
                }
                errors++;
            }
        }
        if (data.models !== undefined) {
            let data1 = data.models;
            if (Array.isArray(data1)) {
                if (data1.length < 1) {
                    const err3 = { instancePath: instancePath + "/models", schemaPath: "#/properties/models/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema19.properties.models, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err3];
                    }
                    else {
                        vErrors.push(err3);
                    }
                    errors++;
                }
                const len0 = data1.length;
                for (let i0 = 0; i0 < len0; i0++) {
                    let data2 = data1[i0];
                    if (typeof data2 === "string") {
                        if (func1(data2) < 1) {
                            const err4 = { instancePath: instancePath + "/models/" + i0, schemaPath: "#/properties/models/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema19.properties.models.items, data: data2 };
                            if (vErrors === null) {
                                vErrors = [err4];
                            }
                            else {
                                vErrors.push(err4);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err5 = { instancePath: instancePath + "/models/" + i0, schemaPath: "#/properties/models/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema19.properties.models.items.type, parentSchema: schema19.properties.models.items, data: data2 };
                        if (vErrors === null) {
                            vErrors = [err5];
                        }
                        else {
                            vErrors.push(err5);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err6 = { instancePath: instancePath + "/models", schemaPath: "#/properties/models/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema19.properties.models.type, parentSchema: schema19.properties.models, data: data1 };
                if (vErrors === null) {
                    vErrors = [err6];
                }
                else {
                    vErrors.push(err6);
                }
                errors++;
            }
        }
        if (data.limits !== undefined) {
            if (!(validate53(data.limits, { instancePath: instancePath + "/limits", parentData: data, parentDataProperty: "limits", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate53.errors : vErrors.concat(validate53.errors);
                errors = vErrors.length;
            }
        }
        if (data.fit !== undefined) {
            let data4 = data.fit;
            if (data4 && typeof data4 == "object" && !Array.isArray(data4)) {
                for (const key1 in data4) {
                    if (!((((key1 === "folds") || (key1 === "fold_order")) || (key1 === "seed")) || (key1 === "parameter_count"))) {
                        const err7 = { instancePath: instancePath + "/fit", schemaPath: "#/properties/fit/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema19.properties.fit, data: data4 };
                        if (vErrors === null) {
                            vErrors = [err7];
                        }
                        else {
                            vErrors.push(err7);
                        }
                        errors++;
                    }
                }
                if (data4.folds !== undefined) {
                    let data5 = data4.folds;
                    if (!(((typeof data5 == "number") && (!(data5 % 1) && !isNaN(data5))) && (isFinite(data5)))) {
                        const err8 = { instancePath: instancePath + "/fit/folds", schemaPath: "#/properties/fit/properties/folds/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema19.properties.fit.properties.folds.type, parentSchema: schema19.properties.fit.properties.folds, data: data5 };
                        if (vErrors === null) {
                            vErrors = [err8];
                        }
                        else {
                            vErrors.push(err8);
                        }
                        errors++;
                    }
                    if ((typeof data5 == "number") && (isFinite(data5))) {
                        if (data5 < 2 || isNaN(data5)) {
                            const err9 = { instancePath: instancePath + "/fit/folds", schemaPath: "#/properties/fit/properties/folds/minimum", keyword: "minimum", params: { comparison: ">=", limit: 2 }, message: "must be >= 2", schema: 2, parentSchema: schema19.properties.fit.properties.folds, data: data5 };
                            if (vErrors === null) {
                                vErrors = [err9];
                            }
                            else {
                                vErrors.push(err9);
                            }
                            errors++;
                        }
                    }
                }
                if (data4.fold_order !== undefined) {
                    let data6 = data4.fold_order;
                    if (!((data6 === "shuffled") || (data6 === "blocks"))) {
                        const err10 = { instancePath: instancePath + "/fit/fold_order", schemaPath: "#/properties/fit/properties/fold_order/enum", keyword: "enum", params: { allowedValues: schema19.properties.fit.properties.fold_order.enum }, message: "must be equal to one of the allowed values", schema: schema19.properties.fit.properties.fold_order.enum, parentSchema: schema19.properties.fit.properties.fold_order, data: data6 };
                        if (vErrors === null) {
                            vErrors = [err10];
                        }
                        else {
                            vErrors.push(err10);
                        }
                        errors++;
                    }
                }
                if (data4.seed !== undefined) {
                    let data7 = data4.seed;
                    if (!(((typeof data7 == "number") && (!(data7 % 1) && !isNaN(data7))) && (isFinite(data7)))) {
                        const err11 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema19.properties.fit.properties.seed.type, parentSchema: schema19.properties.fit.properties.seed, data: data7 };
                        if (vErrors === null) {
                            vErrors = [err11];
                        }
                        else {
                            vErrors.push(err11);
                        }
                        errors++;
                    }
                    if ((typeof data7 == "number") && (isFinite(data7))) {
                        if (data7 > 4294967295 || isNaN(data7)) {
                            const err12 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/maximum", keyword: "maximum", params: { comparison: "<=", limit: 4294967295 }, message: "must be <= 4294967295", schema: 4294967295, parentSchema: schema19.properties.fit.properties.seed, data: data7 };
                            if (vErrors === null) {
                                vErrors = [err12];
                            }
                            else {
                                vErrors.push(err12);
                            }
                            errors++;
                        }
                        if (data7 < 0 || isNaN(data7)) {
                            const err13 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema19.properties.fit.properties.seed, data: data7 };
                            if (vErrors === null) {
                                vErrors = [err13];
                            }
                            else {
                                vErrors.push(err13);
                            }
                            errors++;
                        }
                    }
                }
                if (data4.parameter_count !== undefined) {
                    let data8 = data4.parameter_count;
                    if (!((data8 === "columns") || (data8 === "effective"))) {
                        const err14 = { instancePath: instancePath + "/fit/parameter_count", schemaPath: "#/properties/fit/properties/parameter_count/enum", keyword: "enum", params: { allowedValues: schema19.properties.fit.properties.parameter_count.enum }, message: "must be equal to one of the allowed values", schema: schema19.properties.fit.properties.parameter_count.enum, parentSchema: schema19.properties.fit.properties.parameter_count, data: data8 };
                        if (vErrors === null) {
                            vErrors = [err14];
                        }
                        else {
                            vErrors.push(err14);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err15 = { instancePath: instancePath + "/fit", schemaPath: "#/properties/fit/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema19.properties.fit.type, parentSchema: schema19.properties.fit, data: data4 };
                if (vErrors === null) {
                    vErrors = [err15];
                }
                else {
                    vErrors.push(err15);
                }
                errors++;
            }
        }
        if (data.caps !== undefined) {
            let data9 = data.caps;
            if (data9 && typeof data9 == "object" && !Array.isArray(data9)) {
                for (const key2 in data9) {
                    if (!((key2 === "max_file_mb") || (key2 === "max_cells"))) {
                        const err16 = { instancePath: instancePath + "/caps", schemaPath: "#/properties/caps/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key2 }, message: "must NOT have additional properties", schema: false, parentSchema: schema19.properties.caps, data: data9 };
                        if (vErrors === null) {
                            vErrors = [err16];
                        }
                        else {
                            vErrors.push(err16);
                        }
                        errors++;
                    }
                }
                if (data9.max_file_mb !== undefined) {
                    let data10 = data9.max_file_mb;
                    if ((typeof data10 == "number") && (isFinite(data10))) {
                        if (data10 <= 0 || isNaN(data10)) {
                            const err17 = { instancePath: instancePath + "/caps/max_file_mb", schemaPath: "#/properties/caps/properties/max_file_mb/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema19.properties.caps.properties.max_file_mb, data: data10 };
                            if (vErrors === null) {
                                vErrors = [err17];
                            }
                            else {
                                vErrors.push(err17);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err18 = { instancePath: instancePath + "/caps/max_file_mb", schemaPath: "#/properties/caps/properties/max_file_mb/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema19.properties.caps.properties.max_file_mb.type, parentSchema: schema19.properties.caps.properties.max_file_mb, data: data10 };
                        if (vErrors === null) {
                            vErrors = [err18];
                        }
                        else {
                            vErrors.push(err18);
                        }
                        errors++;
                    }
                }
                if (data9.max_cells !== undefined) {
                    let data11 = data9.max_cells;
                    if (!(((typeof data11 == "number") && (!(data11 % 1) && !isNaN(data11))) && (isFinite(data11)))) {
                        const err19 = { instancePath: instancePath + "/caps/max_cells", schemaPath: "#/properties/caps/properties/max_cells/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema19.properties.caps.properties.max_cells.type, parentSchema: schema19.properties.caps.properties.max_cells, data: data11 };
                        if (vErrors === null) {
                            vErrors = [err19];
                        }
                        else {
                            vErrors.push(err19);
                        }
                        errors++;
                    }
                    if ((typeof data11 == "number") && (isFinite(data11))) {
                        if (data11 < 1 || isNaN(data11)) {
                            const err20 = { instancePath: instancePath + "/caps/max_cells", schemaPath: "#/properties/caps/properties/max_cells/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema19.properties.caps.properties.max_cells, data: data11 };
                            if (vErrors === null) {
                                vErrors = [err20];
                            }
                            else {
                                vErrors.push(err20);
                            }
                            errors++;
                        }
                    }
                }
            }
            else {
                const err21 = { instancePath: instancePath + "/caps", schemaPath: "#/properties/caps/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema19.properties.caps.type, parentSchema: schema19.properties.caps, data: data9 };
                if (vErrors === null) {
                    vErrors = [err21];
                }
                else {
                    vErrors.push(err21);
                }
                errors++;
            }
        }
    }
    else {
        const err22 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema19.type, parentSchema: schema19, data };
        if (vErrors === null) {
            vErrors = [err22];
        }
        else {
            vErrors.push(err22);
        }
        errors++;
    }
    validate52.errors = vErrors;
    return errors === 0;
}
validate52.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };
const validateDescriptor = validate67;
const schema22 = { "$schema": "https://json-schema.org/draft/2020-12/schema", "$id": "urn:fitgate:schema:descriptor:1", "title": "fitgate model descriptor (*.model.yml)", "description": "One regression model: its data, its terms (the design matrix), how it is fitted, and its limits.", "type": "object", "required": ["version", "name", "data", "terms"], "additionalProperties": false, "properties": { "version": { "description": "Version of this file format. Always 1.", "const": 1 }, "name": { "description": "Model name, unique in the repository: 1 to 100 letters, digits, `-`, `_` or `.`.", "type": "string", "minLength": 1, "maxLength": 100, "pattern": "^[A-Za-z0-9._-]+$" }, "task": { "description": "Kind of model. Only `regression` today.", "enum": ["regression"], "default": "regression" }, "data": { "description": "The committed data: CSV paths relative to this file (never outside the repository) and the target column.", "type": "object", "required": ["train", "holdout", "target"], "additionalProperties": false, "properties": { "train": { "description": "Training CSV, relative to this descriptor's folder.", "type": "string", "minLength": 1 }, "holdout": { "description": "Hold-out CSV, relative to this descriptor's folder.", "type": "string", "minLength": 1 }, "target": { "description": "Name of the column to predict.", "type": "string", "minLength": 1 } } }, "terms": { "description": "The design matrix: [intercept | columns of each term, in order]. Each item has exactly one key, the term kind.", "type": "array", "minItems": 1, "items": { "$ref": "#/$defs/term", "description": "One term: `linear`, `polynomial` or `rbf`." } }, "fit": { "description": "How the model is fitted; keys left out come from the settings file's `fit`, then the built-in defaults.", "type": "object", "additionalProperties": false, "properties": { "intercept": { "description": "Add a column of ones first (not penalised by `ridge`).", "type": "boolean", "default": true }, "ridge": { "description": "L2 penalty lambda on every coefficient but the intercept, on the columns exactly as the terms build them; 0 is least squares.", "type": "number", "minimum": 0, "default": 0 }, "folds": { "description": "k of k-fold cross-validation: the training rows are split into this many folds.", "type": "integer", "minimum": 2, "default": 5 }, "fold_order": { "description": "How rows are assigned to folds: `shuffled` (a seeded random order) or `blocks` (consecutive rows, for ordered data such as time series).", "enum": ["shuffled", "blocks"], "default": "shuffled" }, "seed": { "description": "Seed of the fold shuffle and of any other random step, so runs repeat exactly.", "type": "integer", "minimum": 0, "maximum": 4294967295, "default": 1 }, "parameter_count": { "description": "What the `parameter-ratio` check counts as parameters: `columns` (the design's columns p) or `effective` (the effective degrees of freedom of a ridge fit, the trace of its hat matrix; equals p for least squares of full rank).", "enum": ["columns", "effective"], "default": "columns" } } }, "coefficients": { "description": "The shipped coefficients: intercept first (when there is one), then each term's columns in order.", "type": "array", "minItems": 1, "items": { "description": "One coefficient (a finite number).", "type": "number" } }, "limits": { "$ref": "#/$defs/limits", "description": "This model's own limits; they win over the settings file key by key." } }, "$defs": { "term": { "title": "term", "description": "One term of the design: a mapping with exactly one key, the term kind.", "type": "object", "minProperties": 1, "maxProperties": 1, "propertyNames": { "enum": ["linear", "polynomial", "rbf"] }, "properties": { "linear": { "description": "The columns as they are: one design column per listed data column.", "type": "array", "minItems": 1, "items": { "description": "A data column name.", "type": "string", "minLength": 1 } }, "polynomial": { "description": "Powers z^1 .. z^degree of z = (x - shift) / scale.", "type": "object", "required": ["of", "degree"], "additionalProperties": false, "properties": { "of": { "description": "The data column x.", "type": "string", "minLength": 1 }, "degree": { "description": "Highest power, 1 to 30.", "type": "integer", "minimum": 1, "maximum": 30 }, "shift": { "description": "Subtracted from x before scaling. Default: the training mean of x; 0 with scale 1 gives raw powers.", "type": "number" }, "scale": { "description": "Divides x - shift. Default: the training population standard deviation of x. Must be > 0.", "type": "number", "exclusiveMinimum": 0 } } }, "rbf": { "description": "Gaussian radial basis columns exp(-(x - c)^2 / (2 width^2)), one per centre c.", "type": "object", "required": ["of", "centers", "width"], "additionalProperties": false, "properties": { "of": { "description": "The data column x.", "type": "string", "minLength": 1 }, "centers": { "$ref": "#/$defs/centers", "description": "The centres c: a list, { from, to, count }, { from, to, step } or `at-samples` (one per training row)." }, "width": { "description": "Width (standard deviation) of each Gaussian, > 0.", "type": "number", "exclusiveMinimum": 0 } } } } }, "centers": { "title": "centers", "description": "Centres of Gaussian radial basis columns.", "oneOf": [{ "title": "a list of numbers", "description": "The centres as listed.", "type": "array", "minItems": 1, "items": { "description": "One centre.", "type": "number" } }, { "title": "{ from, to, count }", "description": "`count` evenly spaced centres from `from` to `to`, both included.", "type": "object", "required": ["from", "to", "count"], "additionalProperties": false, "properties": { "from": { "description": "First centre.", "type": "number" }, "to": { "description": "Last centre (>= from).", "type": "number" }, "count": { "description": "Number of centres, 1 to 10000.", "type": "integer", "minimum": 1, "maximum": 10000 } } }, { "title": "{ from, to, step }", "description": "Centres from `from` every `step` up to `to` (included when it falls on a step).", "type": "object", "required": ["from", "to", "step"], "additionalProperties": false, "properties": { "from": { "description": "First centre.", "type": "number" }, "to": { "description": "Upper end (>= from).", "type": "number" }, "step": { "description": "Distance between centres, > 0 (at most 10000 centres).", "type": "number", "exclusiveMinimum": 0 } } }, { "title": "`at-samples`", "description": "One centre at each training row's value of x.", "const": "at-samples" }] }, "limits": { "title": "limits", "description": "Limits by key. Each is a number (fail above it), { warn, fail } or `off`.", "type": "object", "additionalProperties": false, "properties": { "gap_ratio": { "$ref": "#/$defs/limit", "description": "Hold-out RMSE divided by training RMSE.", "default": 1.5 }, "params_per_sample": { "$ref": "#/$defs/limit", "description": "Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).", "default": 0.1 }, "coefficient": { "$ref": "#/$defs/limit", "description": "Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.", "default": 25 }, "base_change": { "$ref": "#/$defs/limit", "description": "Relative change of the hold-out RMSE against the same model on the base branch.", "default": "off" }, "cv_ratio": { "$ref": "#/$defs/limit", "description": "Pooled k-fold cross-validation RMSE divided by training RMSE.", "default": "off" }, "swing": { "$ref": "#/$defs/limit", "description": "How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.", "default": { "warn": 0.25, "fail": 0.5 } }, "swing_beyond": { "$ref": "#/$defs/limit", "description": "Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).", "default": { "warn": 1 } }, "leakage": { "$ref": "#/$defs/limit", "description": "Hold-out rows that also appear in the training data (the default 0 fails when there is any).", "default": 0 }, "reproducibility": { "$ref": "#/$defs/limit", "description": "Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.", "default": 0.01 }, "condition": { "$ref": "#/$defs/limit", "description": "2-norm condition number of the column-scaled design matrix.", "default": { "warn": 100000000 } }, "complexity": { "$ref": "#/$defs/limit", "description": "Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.", "default": { "warn": 1.5 } } } }, "limit": { "title": "limit", "description": "A number (fail beyond it in the check's direction: above a ceiling, below a floor), { warn, fail } (at least one) in the same direction, explicit bounds { warn_below, fail_below, warn_above, fail_above } (at least one; a floor's warn >= its fail, a ceiling's warn <= its fail), or `off` (skip the check).", "oneOf": [{ "title": "a number >= 0 (fail beyond it)", "description": "Fail when the figure is beyond this number in the check's direction (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, { "title": "{ warn, fail }", "description": "Warn beyond `warn`, fail beyond `fail`, in the check's direction; give at least one (a ceiling's warn <= fail, a floor's warn >= fail).", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn": { "description": "Warn when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, "fail": { "description": "Fail when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 } } }, { "title": "{ warn_below, fail_below, warn_above, fail_above }", "description": "Explicit bounds on either side, whatever the check's direction: fail below `fail_below` or above `fail_above`, warn below `warn_below` or above `warn_above`; give at least one.", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn_below": { "description": "Warn when the figure is below this number.", "type": "number" }, "fail_below": { "description": "Fail when the figure is below this number.", "type": "number" }, "warn_above": { "description": "Warn when the figure is above this number.", "type": "number" }, "fail_above": { "description": "Fail when the figure is above this number.", "type": "number" } } }, { "title": "`off`", "description": "Skip the check.", "const": "off" }] } } };
const pattern3 = new RegExp("^[A-Za-z0-9._-]+$", "u");
const schema23 = { "title": "term", "description": "One term of the design: a mapping with exactly one key, the term kind.", "type": "object", "minProperties": 1, "maxProperties": 1, "propertyNames": { "enum": ["linear", "polynomial", "rbf"] }, "properties": { "linear": { "description": "The columns as they are: one design column per listed data column.", "type": "array", "minItems": 1, "items": { "description": "A data column name.", "type": "string", "minLength": 1 } }, "polynomial": { "description": "Powers z^1 .. z^degree of z = (x - shift) / scale.", "type": "object", "required": ["of", "degree"], "additionalProperties": false, "properties": { "of": { "description": "The data column x.", "type": "string", "minLength": 1 }, "degree": { "description": "Highest power, 1 to 30.", "type": "integer", "minimum": 1, "maximum": 30 }, "shift": { "description": "Subtracted from x before scaling. Default: the training mean of x; 0 with scale 1 gives raw powers.", "type": "number" }, "scale": { "description": "Divides x - shift. Default: the training population standard deviation of x. Must be > 0.", "type": "number", "exclusiveMinimum": 0 } } }, "rbf": { "description": "Gaussian radial basis columns exp(-(x - c)^2 / (2 width^2)), one per centre c.", "type": "object", "required": ["of", "centers", "width"], "additionalProperties": false, "properties": { "of": { "description": "The data column x.", "type": "string", "minLength": 1 }, "centers": { "$ref": "#/$defs/centers", "description": "The centres c: a list, { from, to, count }, { from, to, step } or `at-samples` (one per training row)." }, "width": { "description": "Width (standard deviation) of each Gaussian, > 0.", "type": "number", "exclusiveMinimum": 0 } } } } };
const schema24 = { "title": "centers", "description": "Centres of Gaussian radial basis columns.", "oneOf": [{ "title": "a list of numbers", "description": "The centres as listed.", "type": "array", "minItems": 1, "items": { "description": "One centre.", "type": "number" } }, { "title": "{ from, to, count }", "description": "`count` evenly spaced centres from `from` to `to`, both included.", "type": "object", "required": ["from", "to", "count"], "additionalProperties": false, "properties": { "from": { "description": "First centre.", "type": "number" }, "to": { "description": "Last centre (>= from).", "type": "number" }, "count": { "description": "Number of centres, 1 to 10000.", "type": "integer", "minimum": 1, "maximum": 10000 } } }, { "title": "{ from, to, step }", "description": "Centres from `from` every `step` up to `to` (included when it falls on a step).", "type": "object", "required": ["from", "to", "step"], "additionalProperties": false, "properties": { "from": { "description": "First centre.", "type": "number" }, "to": { "description": "Upper end (>= from).", "type": "number" }, "step": { "description": "Distance between centres, > 0 (at most 10000 centres).", "type": "number", "exclusiveMinimum": 0 } } }, { "title": "`at-samples`", "description": "One centre at each training row's value of x.", "const": "at-samples" }] };
function validate69(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate69.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    const _errs0 = errors;
    let valid0 = false;
    let passing0 = null;
    const _errs1 = errors;
    if (Array.isArray(data)) {
        if (data.length < 1) {
            const err0 = { instancePath, schemaPath: "#/oneOf/0/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema24.oneOf[0], data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
        const len0 = data.length;
        for (let i0 = 0; i0 < len0; i0++) {
            let data0 = data[i0];
            if (!((typeof data0 == "number") && (isFinite(data0)))) {
                const err1 = { instancePath: instancePath + "/" + i0, schemaPath: "#/oneOf/0/items/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[0].items.type, parentSchema: schema24.oneOf[0].items, data: data0 };
                if (vErrors === null) {
                    vErrors = [err1];
                }
                else {
                    vErrors.push(err1);
                }
                errors++;
            }
        }
    }
    else {
        const err2 = { instancePath, schemaPath: "#/oneOf/0/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema24.oneOf[0].type, parentSchema: schema24.oneOf[0], data };
        if (vErrors === null) {
            vErrors = [err2];
        }
        else {
            vErrors.push(err2);
        }
        errors++;
    }
    var _valid0 = _errs1 === errors;
    if (_valid0) {
        valid0 = true;
        passing0 = 0;
        var items0 = true;
    }
    const _errs5 = errors;
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (data.from === undefined) {
            const err3 = { instancePath, schemaPath: "#/oneOf/1/required", keyword: "required", params: { missingProperty: "from" }, message: "must have required property '" + "from" + "'", schema: schema24.oneOf[1].required, parentSchema: schema24.oneOf[1], data };
            if (vErrors === null) {
                vErrors = [err3];
            }
            else {
                vErrors.push(err3);
            }
            errors++;
        }
        if (data.to === undefined) {
            const err4 = { instancePath, schemaPath: "#/oneOf/1/required", keyword: "required", params: { missingProperty: "to" }, message: "must have required property '" + "to" + "'", schema: schema24.oneOf[1].required, parentSchema: schema24.oneOf[1], data };
            if (vErrors === null) {
                vErrors = [err4];
            }
            else {
                vErrors.push(err4);
            }
            errors++;
        }
        if (data.count === undefined) {
            const err5 = { instancePath, schemaPath: "#/oneOf/1/required", keyword: "required", params: { missingProperty: "count" }, message: "must have required property '" + "count" + "'", schema: schema24.oneOf[1].required, parentSchema: schema24.oneOf[1], data };
            if (vErrors === null) {
                vErrors = [err5];
            }
            else {
                vErrors.push(err5);
            }
            errors++;
        }
        for (const key0 in data) {
            if (!(((key0 === "from") || (key0 === "to")) || (key0 === "count"))) {
                const err6 = { instancePath, schemaPath: "#/oneOf/1/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema24.oneOf[1], data };
                if (vErrors === null) {
                    vErrors = [err6];
                }
                else {
                    vErrors.push(err6);
                }
                errors++;
            }
        }
        if (data.from !== undefined) {
            let data1 = data.from;
            if (!((typeof data1 == "number") && (isFinite(data1)))) {
                const err7 = { instancePath: instancePath + "/from", schemaPath: "#/oneOf/1/properties/from/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[1].properties.from.type, parentSchema: schema24.oneOf[1].properties.from, data: data1 };
                if (vErrors === null) {
                    vErrors = [err7];
                }
                else {
                    vErrors.push(err7);
                }
                errors++;
            }
        }
        if (data.to !== undefined) {
            let data2 = data.to;
            if (!((typeof data2 == "number") && (isFinite(data2)))) {
                const err8 = { instancePath: instancePath + "/to", schemaPath: "#/oneOf/1/properties/to/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[1].properties.to.type, parentSchema: schema24.oneOf[1].properties.to, data: data2 };
                if (vErrors === null) {
                    vErrors = [err8];
                }
                else {
                    vErrors.push(err8);
                }
                errors++;
            }
        }
        if (data.count !== undefined) {
            let data3 = data.count;
            if (!(((typeof data3 == "number") && (!(data3 % 1) && !isNaN(data3))) && (isFinite(data3)))) {
                const err9 = { instancePath: instancePath + "/count", schemaPath: "#/oneOf/1/properties/count/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema24.oneOf[1].properties.count.type, parentSchema: schema24.oneOf[1].properties.count, data: data3 };
                if (vErrors === null) {
                    vErrors = [err9];
                }
                else {
                    vErrors.push(err9);
                }
                errors++;
            }
            if ((typeof data3 == "number") && (isFinite(data3))) {
                if (data3 > 10000 || isNaN(data3)) {
                    const err10 = { instancePath: instancePath + "/count", schemaPath: "#/oneOf/1/properties/count/maximum", keyword: "maximum", params: { comparison: "<=", limit: 10000 }, message: "must be <= 10000", schema: 10000, parentSchema: schema24.oneOf[1].properties.count, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err10];
                    }
                    else {
                        vErrors.push(err10);
                    }
                    errors++;
                }
                if (data3 < 1 || isNaN(data3)) {
                    const err11 = { instancePath: instancePath + "/count", schemaPath: "#/oneOf/1/properties/count/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema24.oneOf[1].properties.count, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err11];
                    }
                    else {
                        vErrors.push(err11);
                    }
                    errors++;
                }
            }
        }
    }
    else {
        const err12 = { instancePath, schemaPath: "#/oneOf/1/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema24.oneOf[1].type, parentSchema: schema24.oneOf[1], data };
        if (vErrors === null) {
            vErrors = [err12];
        }
        else {
            vErrors.push(err12);
        }
        errors++;
    }
    var _valid0 = _errs5 === errors;
    if (_valid0 && valid0) {
        valid0 = false;
        passing0 = [passing0, 1];
    }
    else {
        if (_valid0) {
            valid0 = true;
            passing0 = 1;
            var props0 = true;
        }
        const _errs14 = errors;
        if (data && typeof data == "object" && !Array.isArray(data)) {
            if (data.from === undefined) {
                const err13 = { instancePath, schemaPath: "#/oneOf/2/required", keyword: "required", params: { missingProperty: "from" }, message: "must have required property '" + "from" + "'", schema: schema24.oneOf[2].required, parentSchema: schema24.oneOf[2], data };
                if (vErrors === null) {
                    vErrors = [err13];
                }
                else {
                    vErrors.push(err13);
                }
                errors++;
            }
            if (data.to === undefined) {
                const err14 = { instancePath, schemaPath: "#/oneOf/2/required", keyword: "required", params: { missingProperty: "to" }, message: "must have required property '" + "to" + "'", schema: schema24.oneOf[2].required, parentSchema: schema24.oneOf[2], data };
                if (vErrors === null) {
                    vErrors = [err14];
                }
                else {
                    vErrors.push(err14);
                }
                errors++;
            }
            if (data.step === undefined) {
                const err15 = { instancePath, schemaPath: "#/oneOf/2/required", keyword: "required", params: { missingProperty: "step" }, message: "must have required property '" + "step" + "'", schema: schema24.oneOf[2].required, parentSchema: schema24.oneOf[2], data };
                if (vErrors === null) {
                    vErrors = [err15];
                }
                else {
                    vErrors.push(err15);
                }
                errors++;
            }
            for (const key1 in data) {
                if (!(((key1 === "from") || (key1 === "to")) || (key1 === "step"))) {
                    const err16 = { instancePath, schemaPath: "#/oneOf/2/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema24.oneOf[2], data };
                    if (vErrors === null) {
                        vErrors = [err16];
                    }
                    else {
                        vErrors.push(err16);
                    }
                    errors++;
                }
            }
            if (data.from !== undefined) {
                let data4 = data.from;
                if (!((typeof data4 == "number") && (isFinite(data4)))) {
                    const err17 = { instancePath: instancePath + "/from", schemaPath: "#/oneOf/2/properties/from/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[2].properties.from.type, parentSchema: schema24.oneOf[2].properties.from, data: data4 };
                    if (vErrors === null) {
                        vErrors = [err17];
                    }
                    else {
                        vErrors.push(err17);
                    }
                    errors++;
                }
            }
            if (data.to !== undefined) {
                let data5 = data.to;
                if (!((typeof data5 == "number") && (isFinite(data5)))) {
                    const err18 = { instancePath: instancePath + "/to", schemaPath: "#/oneOf/2/properties/to/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[2].properties.to.type, parentSchema: schema24.oneOf[2].properties.to, data: data5 };
                    if (vErrors === null) {
                        vErrors = [err18];
                    }
                    else {
                        vErrors.push(err18);
                    }
                    errors++;
                }
            }
            if (data.step !== undefined) {
                let data6 = data.step;
                if ((typeof data6 == "number") && (isFinite(data6))) {
                    if (data6 <= 0 || isNaN(data6)) {
                        const err19 = { instancePath: instancePath + "/step", schemaPath: "#/oneOf/2/properties/step/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema24.oneOf[2].properties.step, data: data6 };
                        if (vErrors === null) {
                            vErrors = [err19];
                        }
                        else {
                            vErrors.push(err19);
                        }
                        errors++;
                    }
                }
                else {
                    const err20 = { instancePath: instancePath + "/step", schemaPath: "#/oneOf/2/properties/step/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema24.oneOf[2].properties.step.type, parentSchema: schema24.oneOf[2].properties.step, data: data6 };
                    if (vErrors === null) {
                        vErrors = [err20];
                    }
                    else {
                        vErrors.push(err20);
                    }
                    errors++;
                }
            }
        }
        else {
            const err21 = { instancePath, schemaPath: "#/oneOf/2/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema24.oneOf[2].type, parentSchema: schema24.oneOf[2], data };
            if (vErrors === null) {
                vErrors = [err21];
            }
            else {
                vErrors.push(err21);
            }
            errors++;
        }
        var _valid0 = _errs14 === errors;
        if (_valid0 && valid0) {
            valid0 = false;
            passing0 = [passing0, 2];
        }
        else {
            if (_valid0) {
                valid0 = true;
                passing0 = 2;
                if (props0 !== true) {
                    props0 = true;
                }
            }
            const _errs23 = errors;
            if ("at-samples" !== data) {
                const err22 = { instancePath, schemaPath: "#/oneOf/3/const", keyword: "const", params: { allowedValue: "at-samples" }, message: "must be equal to constant", schema: "at-samples", parentSchema: schema24.oneOf[3], data };
                if (vErrors === null) {
                    vErrors = [err22];
                }
                else {
                    vErrors.push(err22);
                }
                errors++;
            }
            var _valid0 = _errs23 === errors;
            if (_valid0 && valid0) {
                valid0 = false;
                passing0 = [passing0, 3];
            }
            else {
                if (_valid0) {
                    valid0 = true;
                    passing0 = 3;
                }
            }
        }
    }
    if (!valid0) {
        const err23 = { instancePath, schemaPath: "#/oneOf", keyword: "oneOf", params: { passingSchemas: passing0 }, message: "must match exactly one schema in oneOf", schema: schema24.oneOf, parentSchema: schema24, data };
        if (vErrors === null) {
            vErrors = [err23];
        }
        else {
            vErrors.push(err23);
        }
        errors++;
    }
    else {
        errors = _errs0;
        if (vErrors !== null) {
            if (_errs0) {
                vErrors.length = _errs0;
            }
            else {
                vErrors = null;
            }
        }
    }
    validate69.errors = vErrors;
    evaluated0.props = props0;
    evaluated0.items = items0;
    return errors === 0;
}
validate69.evaluated = { "dynamicProps": true, "dynamicItems": true };
function validate68(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate68.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (Object.keys(data).length > 1) {
            const err0 = { instancePath, schemaPath: "#/maxProperties", keyword: "maxProperties", params: { limit: 1 }, message: "must NOT have more than 1 properties", schema: 1, parentSchema: schema23, data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
        if (Object.keys(data).length < 1) {
            const err1 = { instancePath, schemaPath: "#/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema23, data };
            if (vErrors === null) {
                vErrors = [err1];
            }
            else {
                vErrors.push(err1);
            }
            errors++;
        }
        for (const key0 in data) {
            const _errs1 = errors;
            if (!(((key0 === "linear") || (key0 === "polynomial")) || (key0 === "rbf"))) {
                const err2 = { instancePath, schemaPath: "#/propertyNames/enum", keyword: "enum", params: { allowedValues: schema23.propertyNames.enum }, message: "must be equal to one of the allowed values", schema: schema23.propertyNames.enum, parentSchema: schema23.propertyNames, data: key0, propertyName: key0 };
                if (vErrors === null) {
                    vErrors = [err2];
                }
                else {
                    vErrors.push(err2);
                }
                errors++;
            }
            var valid0 = _errs1 === errors;
            if (!valid0) {
                const err3 = { instancePath, schemaPath: "#/propertyNames", keyword: "propertyNames", params: { propertyName: key0 }, message: "property name must be valid", schema: schema23.propertyNames, parentSchema: schema23, data };
                if (vErrors === null) {
                    vErrors = [err3];
                }
                else {
                    vErrors.push(err3);
                }
                errors++;
            }
        }
        if (data.linear !== undefined) {
            let data0 = data.linear;
            if (Array.isArray(data0)) {
                if (data0.length < 1) {
                    const err4 = { instancePath: instancePath + "/linear", schemaPath: "#/properties/linear/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema23.properties.linear, data: data0 };
                    if (vErrors === null) {
                        vErrors = [err4];
                    }
                    else {
                        vErrors.push(err4);
                    }
                    errors++;
                }
                const len0 = data0.length;
                for (let i0 = 0; i0 < len0; i0++) {
                    let data1 = data0[i0];
                    if (typeof data1 === "string") {
                        if (func1(data1) < 1) {
                            const err5 = { instancePath: instancePath + "/linear/" + i0, schemaPath: "#/properties/linear/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema23.properties.linear.items, data: data1 };
                            if (vErrors === null) {
                                vErrors = [err5];
                            }
                            else {
                                vErrors.push(err5);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err6 = { instancePath: instancePath + "/linear/" + i0, schemaPath: "#/properties/linear/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema23.properties.linear.items.type, parentSchema: schema23.properties.linear.items, data: data1 };
                        if (vErrors === null) {
                            vErrors = [err6];
                        }
                        else {
                            vErrors.push(err6);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err7 = { instancePath: instancePath + "/linear", schemaPath: "#/properties/linear/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema23.properties.linear.type, parentSchema: schema23.properties.linear, data: data0 };
                if (vErrors === null) {
                    vErrors = [err7];
                }
                else {
                    vErrors.push(err7);
                }
                errors++;
            }
        }
        if (data.polynomial !== undefined) {
            let data2 = data.polynomial;
            if (data2 && typeof data2 == "object" && !Array.isArray(data2)) {
                if (data2.of === undefined) {
                    const err8 = { instancePath: instancePath + "/polynomial", schemaPath: "#/properties/polynomial/required", keyword: "required", params: { missingProperty: "of" }, message: "must have required property '" + "of" + "'", schema: schema23.properties.polynomial.required, parentSchema: schema23.properties.polynomial, data: data2 };
                    if (vErrors === null) {
                        vErrors = [err8];
                    }
                    else {
                        vErrors.push(err8);
                    }
                    errors++;
                }
                if (data2.degree === undefined) {
                    const err9 = { instancePath: instancePath + "/polynomial", schemaPath: "#/properties/polynomial/required", keyword: "required", params: { missingProperty: "degree" }, message: "must have required property '" + "degree" + "'", schema: schema23.properties.polynomial.required, parentSchema: schema23.properties.polynomial, data: data2 };
                    if (vErrors === null) {
                        vErrors = [err9];
                    }
                    else {
                        vErrors.push(err9);
                    }
                    errors++;
                }
                for (const key1 in data2) {
                    if (!((((key1 === "of") || (key1 === "degree")) || (key1 === "shift")) || (key1 === "scale"))) {
                        const err10 = { instancePath: instancePath + "/polynomial", schemaPath: "#/properties/polynomial/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema23.properties.polynomial, data: data2 };
                        if (vErrors === null) {
                            vErrors = [err10];
                        }
                        else {
                            vErrors.push(err10);
                        }
                        errors++;
                    }
                }
                if (data2.of !== undefined) {
                    let data3 = data2.of;
                    if (typeof data3 === "string") {
                        if (func1(data3) < 1) {
                            const err11 = { instancePath: instancePath + "/polynomial/of", schemaPath: "#/properties/polynomial/properties/of/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema23.properties.polynomial.properties.of, data: data3 };
                            if (vErrors === null) {
                                vErrors = [err11];
                            }
                            else {
                                vErrors.push(err11);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err12 = { instancePath: instancePath + "/polynomial/of", schemaPath: "#/properties/polynomial/properties/of/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema23.properties.polynomial.properties.of.type, parentSchema: schema23.properties.polynomial.properties.of, data: data3 };
                        if (vErrors === null) {
                            vErrors = [err12];
                        }
                        else {
                            vErrors.push(err12);
                        }
                        errors++;
                    }
                }
                if (data2.degree !== undefined) {
                    let data4 = data2.degree;
                    if (!(((typeof data4 == "number") && (!(data4 % 1) && !isNaN(data4))) && (isFinite(data4)))) {
                        const err13 = { instancePath: instancePath + "/polynomial/degree", schemaPath: "#/properties/polynomial/properties/degree/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema23.properties.polynomial.properties.degree.type, parentSchema: schema23.properties.polynomial.properties.degree, data: data4 };
                        if (vErrors === null) {
                            vErrors = [err13];
                        }
                        else {
                            vErrors.push(err13);
                        }
                        errors++;
                    }
                    if ((typeof data4 == "number") && (isFinite(data4))) {
                        if (data4 > 30 || isNaN(data4)) {
                            const err14 = { instancePath: instancePath + "/polynomial/degree", schemaPath: "#/properties/polynomial/properties/degree/maximum", keyword: "maximum", params: { comparison: "<=", limit: 30 }, message: "must be <= 30", schema: 30, parentSchema: schema23.properties.polynomial.properties.degree, data: data4 };
                            if (vErrors === null) {
                                vErrors = [err14];
                            }
                            else {
                                vErrors.push(err14);
                            }
                            errors++;
                        }
                        if (data4 < 1 || isNaN(data4)) {
                            const err15 = { instancePath: instancePath + "/polynomial/degree", schemaPath: "#/properties/polynomial/properties/degree/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema23.properties.polynomial.properties.degree, data: data4 };
                            if (vErrors === null) {
                                vErrors = [err15];
                            }
                            else {
                                vErrors.push(err15);
                            }
                            errors++;
                        }
                    }
                }
                if (data2.shift !== undefined) {
                    let data5 = data2.shift;
                    if (!((typeof data5 == "number") && (isFinite(data5)))) {
                        const err16 = { instancePath: instancePath + "/polynomial/shift", schemaPath: "#/properties/polynomial/properties/shift/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema23.properties.polynomial.properties.shift.type, parentSchema: schema23.properties.polynomial.properties.shift, data: data5 };
                        if (vErrors === null) {
                            vErrors = [err16];
                        }
                        else {
                            vErrors.push(err16);
                        }
                        errors++;
                    }
                }
                if (data2.scale !== undefined) {
                    let data6 = data2.scale;
                    if ((typeof data6 == "number") && (isFinite(data6))) {
                        if (data6 <= 0 || isNaN(data6)) {
                            const err17 = { instancePath: instancePath + "/polynomial/scale", schemaPath: "#/properties/polynomial/properties/scale/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema23.properties.polynomial.properties.scale, data: data6 };
                            if (vErrors === null) {
                                vErrors = [err17];
                            }
                            else {
                                vErrors.push(err17);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err18 = { instancePath: instancePath + "/polynomial/scale", schemaPath: "#/properties/polynomial/properties/scale/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema23.properties.polynomial.properties.scale.type, parentSchema: schema23.properties.polynomial.properties.scale, data: data6 };
                        if (vErrors === null) {
                            vErrors = [err18];
                        }
                        else {
                            vErrors.push(err18);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err19 = { instancePath: instancePath + "/polynomial", schemaPath: "#/properties/polynomial/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema23.properties.polynomial.type, parentSchema: schema23.properties.polynomial, data: data2 };
                if (vErrors === null) {
                    vErrors = [err19];
                }
                else {
                    vErrors.push(err19);
                }
                errors++;
            }
        }
        if (data.rbf !== undefined) {
            let data7 = data.rbf;
            if (data7 && typeof data7 == "object" && !Array.isArray(data7)) {
                if (data7.of === undefined) {
                    const err20 = { instancePath: instancePath + "/rbf", schemaPath: "#/properties/rbf/required", keyword: "required", params: { missingProperty: "of" }, message: "must have required property '" + "of" + "'", schema: schema23.properties.rbf.required, parentSchema: schema23.properties.rbf, data: data7 };
                    if (vErrors === null) {
                        vErrors = [err20];
                    }
                    else {
                        vErrors.push(err20);
                    }
                    errors++;
                }
                if (data7.centers === undefined) {
                    const err21 = { instancePath: instancePath + "/rbf", schemaPath: "#/properties/rbf/required", keyword: "required", params: { missingProperty: "centers" }, message: "must have required property '" + "centers" + "'", schema: schema23.properties.rbf.required, parentSchema: schema23.properties.rbf, data: data7 };
                    if (vErrors === null) {
                        vErrors = [err21];
                    }
                    else {
                        vErrors.push(err21);
                    }
                    errors++;
                }
                if (data7.width === undefined) {
                    const err22 = { instancePath: instancePath + "/rbf", schemaPath: "#/properties/rbf/required", keyword: "required", params: { missingProperty: "width" }, message: "must have required property '" + "width" + "'", schema: schema23.properties.rbf.required, parentSchema: schema23.properties.rbf, data: data7 };
                    if (vErrors === null) {
                        vErrors = [err22];
                    }
                    else {
                        vErrors.push(err22);
                    }
                    errors++;
                }
                for (const key2 in data7) {
                    if (!(((key2 === "of") || (key2 === "centers")) || (key2 === "width"))) {
                        const err23 = { instancePath: instancePath + "/rbf", schemaPath: "#/properties/rbf/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key2 }, message: "must NOT have additional properties", schema: false, parentSchema: schema23.properties.rbf, data: data7 };
                        if (vErrors === null) {
                            vErrors = [err23];
                        }
                        else {
                            vErrors.push(err23);
                        }
                        errors++;
                    }
                }
                if (data7.of !== undefined) {
                    let data8 = data7.of;
                    if (typeof data8 === "string") {
                        if (func1(data8) < 1) {
                            const err24 = { instancePath: instancePath + "/rbf/of", schemaPath: "#/properties/rbf/properties/of/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema23.properties.rbf.properties.of, data: data8 };
                            if (vErrors === null) {
                                vErrors = [err24];
                            }
                            else {
                                vErrors.push(err24);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err25 = { instancePath: instancePath + "/rbf/of", schemaPath: "#/properties/rbf/properties/of/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema23.properties.rbf.properties.of.type, parentSchema: schema23.properties.rbf.properties.of, data: data8 };
                        if (vErrors === null) {
                            vErrors = [err25];
                        }
                        else {
                            vErrors.push(err25);
                        }
                        errors++;
                    }
                }
                if (data7.centers !== undefined) {
                    if (!(validate69(data7.centers, { instancePath: instancePath + "/rbf/centers", parentData: data7, parentDataProperty: "centers", rootData, dynamicAnchors }))) {
                        vErrors = vErrors === null ? validate69.errors : vErrors.concat(validate69.errors);
                        errors = vErrors.length;
                    }
                }
                if (data7.width !== undefined) {
                    let data10 = data7.width;
                    if ((typeof data10 == "number") && (isFinite(data10))) {
                        if (data10 <= 0 || isNaN(data10)) {
                            const err26 = { instancePath: instancePath + "/rbf/width", schemaPath: "#/properties/rbf/properties/width/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema23.properties.rbf.properties.width, data: data10 };
                            if (vErrors === null) {
                                vErrors = [err26];
                            }
                            else {
                                vErrors.push(err26);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err27 = { instancePath: instancePath + "/rbf/width", schemaPath: "#/properties/rbf/properties/width/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema23.properties.rbf.properties.width.type, parentSchema: schema23.properties.rbf.properties.width, data: data10 };
                        if (vErrors === null) {
                            vErrors = [err27];
                        }
                        else {
                            vErrors.push(err27);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err28 = { instancePath: instancePath + "/rbf", schemaPath: "#/properties/rbf/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema23.properties.rbf.type, parentSchema: schema23.properties.rbf, data: data7 };
                if (vErrors === null) {
                    vErrors = [err28];
                }
                else {
                    vErrors.push(err28);
                }
                errors++;
            }
        }
    }
    else {
        const err29 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema23.type, parentSchema: schema23, data };
        if (vErrors === null) {
            vErrors = [err29];
        }
        else {
            vErrors.push(err29);
        }
        errors++;
    }
    validate68.errors = vErrors;
    return errors === 0;
}
validate68.evaluated = { "props": { "linear": true, "polynomial": true, "rbf": true }, "dynamicProps": false, "dynamicItems": false };
const schema25 = { "title": "limits", "description": "Limits by key. Each is a number (fail above it), { warn, fail } or `off`.", "type": "object", "additionalProperties": false, "properties": { "gap_ratio": { "$ref": "#/$defs/limit", "description": "Hold-out RMSE divided by training RMSE.", "default": 1.5 }, "params_per_sample": { "$ref": "#/$defs/limit", "description": "Fitted parameters divided by training rows (common practice: at least 10 rows per parameter).", "default": 0.1 }, "coefficient": { "$ref": "#/$defs/limit", "description": "Largest standardised coefficient |w_j| * sd(phi_j) / sd(y) over the non-intercept columns.", "default": 25 }, "base_change": { "$ref": "#/$defs/limit", "description": "Relative change of the hold-out RMSE against the same model on the base branch.", "default": "off" }, "cv_ratio": { "$ref": "#/$defs/limit", "description": "Pooled k-fold cross-validation RMSE divided by training RMSE.", "default": "off" }, "swing": { "$ref": "#/$defs/limit", "description": "How far predictions between neighbouring training samples leave the band [min y, max y] of training targets, in band widths.", "default": { "warn": 0.25, "fail": 0.5 } }, "swing_beyond": { "$ref": "#/$defs/limit", "description": "Like `swing`, in a margin of 10 % of the input range beyond the training samples (extrapolation).", "default": { "warn": 1 } }, "leakage": { "$ref": "#/$defs/limit", "description": "Hold-out rows that also appear in the training data (the default 0 fails when there is any).", "default": 0 }, "reproducibility": { "$ref": "#/$defs/limit", "description": "Largest difference between shipped and refit predictions on the hold-out rows, divided by the range of the training target.", "default": 0.01 }, "condition": { "$ref": "#/$defs/limit", "description": "2-norm condition number of the column-scaled design matrix.", "default": { "warn": 100000000 } }, "complexity": { "$ref": "#/$defs/limit", "description": "Current k-fold CV RMSE divided by the CV RMSE of the simpler setting the one-standard-error rule picks.", "default": { "warn": 1.5 } } } };
const schema26 = { "title": "limit", "description": "A number (fail beyond it in the check's direction: above a ceiling, below a floor), { warn, fail } (at least one) in the same direction, explicit bounds { warn_below, fail_below, warn_above, fail_above } (at least one; a floor's warn >= its fail, a ceiling's warn <= its fail), or `off` (skip the check).", "oneOf": [{ "title": "a number >= 0 (fail beyond it)", "description": "Fail when the figure is beyond this number in the check's direction (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, { "title": "{ warn, fail }", "description": "Warn beyond `warn`, fail beyond `fail`, in the check's direction; give at least one (a ceiling's warn <= fail, a floor's warn >= fail).", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn": { "description": "Warn when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 }, "fail": { "description": "Fail when the figure is beyond this number (above a ceiling, below a floor).", "type": "number", "minimum": 0 } } }, { "title": "{ warn_below, fail_below, warn_above, fail_above }", "description": "Explicit bounds on either side, whatever the check's direction: fail below `fail_below` or above `fail_above`, warn below `warn_below` or above `warn_above`; give at least one.", "type": "object", "minProperties": 1, "additionalProperties": false, "properties": { "warn_below": { "description": "Warn when the figure is below this number.", "type": "number" }, "fail_below": { "description": "Fail when the figure is below this number.", "type": "number" }, "warn_above": { "description": "Warn when the figure is above this number.", "type": "number" }, "fail_above": { "description": "Fail when the figure is above this number.", "type": "number" } } }, { "title": "`off`", "description": "Skip the check.", "const": "off" }] };
function validate73(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate73.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    const _errs0 = errors;
    let valid0 = false;
    let passing0 = null;
    const _errs1 = errors;
    if ((typeof data == "number") && (isFinite(data))) {
        if (data < 0 || isNaN(data)) {
            const err0 = { instancePath, schemaPath: "#/oneOf/0/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema26.oneOf[0], data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
    }
    else {
        const err1 = { instancePath, schemaPath: "#/oneOf/0/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[0].type, parentSchema: schema26.oneOf[0], data };
        if (vErrors === null) {
            vErrors = [err1];
        }
        else {
            vErrors.push(err1);
        }
        errors++;
    }
    var _valid0 = _errs1 === errors;
    if (_valid0) {
        valid0 = true;
        passing0 = 0;
    }
    const _errs3 = errors;
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (Object.keys(data).length < 1) {
            const err2 = { instancePath, schemaPath: "#/oneOf/1/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema26.oneOf[1], data };
            if (vErrors === null) {
                vErrors = [err2];
            }
            else {
                vErrors.push(err2);
            }
            errors++;
        }
        for (const key0 in data) {
            if (!((key0 === "warn") || (key0 === "fail"))) {
                const err3 = { instancePath, schemaPath: "#/oneOf/1/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema26.oneOf[1], data };
                if (vErrors === null) {
                    vErrors = [err3];
                }
                else {
                    vErrors.push(err3);
                }
                errors++;
            }
        }
        if (data.warn !== undefined) {
            let data0 = data.warn;
            if ((typeof data0 == "number") && (isFinite(data0))) {
                if (data0 < 0 || isNaN(data0)) {
                    const err4 = { instancePath: instancePath + "/warn", schemaPath: "#/oneOf/1/properties/warn/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema26.oneOf[1].properties.warn, data: data0 };
                    if (vErrors === null) {
                        vErrors = [err4];
                    }
                    else {
                        vErrors.push(err4);
                    }
                    errors++;
                }
            }
            else {
                const err5 = { instancePath: instancePath + "/warn", schemaPath: "#/oneOf/1/properties/warn/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[1].properties.warn.type, parentSchema: schema26.oneOf[1].properties.warn, data: data0 };
                if (vErrors === null) {
                    vErrors = [err5];
                }
                else {
                    vErrors.push(err5);
                }
                errors++;
            }
        }
        if (data.fail !== undefined) {
            let data1 = data.fail;
            if ((typeof data1 == "number") && (isFinite(data1))) {
                if (data1 < 0 || isNaN(data1)) {
                    const err6 = { instancePath: instancePath + "/fail", schemaPath: "#/oneOf/1/properties/fail/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema26.oneOf[1].properties.fail, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err6];
                    }
                    else {
                        vErrors.push(err6);
                    }
                    errors++;
                }
            }
            else {
                const err7 = { instancePath: instancePath + "/fail", schemaPath: "#/oneOf/1/properties/fail/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[1].properties.fail.type, parentSchema: schema26.oneOf[1].properties.fail, data: data1 };
                if (vErrors === null) {
                    vErrors = [err7];
                }
                else {
                    vErrors.push(err7);
                }
                errors++;
            }
        }
    }
    else {
        const err8 = { instancePath, schemaPath: "#/oneOf/1/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema26.oneOf[1].type, parentSchema: schema26.oneOf[1], data };
        if (vErrors === null) {
            vErrors = [err8];
        }
        else {
            vErrors.push(err8);
        }
        errors++;
    }
    var _valid0 = _errs3 === errors;
    if (_valid0 && valid0) {
        valid0 = false;
        passing0 = [passing0, 1];
    }
    else {
        if (_valid0) {
            valid0 = true;
            passing0 = 1;
            var props0 = true;
        }
        const _errs10 = errors;
        if (data && typeof data == "object" && !Array.isArray(data)) {
            if (Object.keys(data).length < 1) {
                const err9 = { instancePath, schemaPath: "#/oneOf/2/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema26.oneOf[2], data };
                if (vErrors === null) {
                    vErrors = [err9];
                }
                else {
                    vErrors.push(err9);
                }
                errors++;
            }
            for (const key1 in data) {
                if (!((((key1 === "warn_below") || (key1 === "fail_below")) || (key1 === "warn_above")) || (key1 === "fail_above"))) {
                    const err10 = { instancePath, schemaPath: "#/oneOf/2/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema26.oneOf[2], data };
                    if (vErrors === null) {
                        vErrors = [err10];
                    }
                    else {
                        vErrors.push(err10);
                    }
                    errors++;
                }
            }
            if (data.warn_below !== undefined) {
                let data2 = data.warn_below;
                if (!((typeof data2 == "number") && (isFinite(data2)))) {
                    const err11 = { instancePath: instancePath + "/warn_below", schemaPath: "#/oneOf/2/properties/warn_below/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[2].properties.warn_below.type, parentSchema: schema26.oneOf[2].properties.warn_below, data: data2 };
                    if (vErrors === null) {
                        vErrors = [err11];
                    }
                    else {
                        vErrors.push(err11);
                    }
                    errors++;
                }
            }
            if (data.fail_below !== undefined) {
                let data3 = data.fail_below;
                if (!((typeof data3 == "number") && (isFinite(data3)))) {
                    const err12 = { instancePath: instancePath + "/fail_below", schemaPath: "#/oneOf/2/properties/fail_below/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[2].properties.fail_below.type, parentSchema: schema26.oneOf[2].properties.fail_below, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err12];
                    }
                    else {
                        vErrors.push(err12);
                    }
                    errors++;
                }
            }
            if (data.warn_above !== undefined) {
                let data4 = data.warn_above;
                if (!((typeof data4 == "number") && (isFinite(data4)))) {
                    const err13 = { instancePath: instancePath + "/warn_above", schemaPath: "#/oneOf/2/properties/warn_above/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[2].properties.warn_above.type, parentSchema: schema26.oneOf[2].properties.warn_above, data: data4 };
                    if (vErrors === null) {
                        vErrors = [err13];
                    }
                    else {
                        vErrors.push(err13);
                    }
                    errors++;
                }
            }
            if (data.fail_above !== undefined) {
                let data5 = data.fail_above;
                if (!((typeof data5 == "number") && (isFinite(data5)))) {
                    const err14 = { instancePath: instancePath + "/fail_above", schemaPath: "#/oneOf/2/properties/fail_above/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema26.oneOf[2].properties.fail_above.type, parentSchema: schema26.oneOf[2].properties.fail_above, data: data5 };
                    if (vErrors === null) {
                        vErrors = [err14];
                    }
                    else {
                        vErrors.push(err14);
                    }
                    errors++;
                }
            }
        }
        else {
            const err15 = { instancePath, schemaPath: "#/oneOf/2/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema26.oneOf[2].type, parentSchema: schema26.oneOf[2], data };
            if (vErrors === null) {
                vErrors = [err15];
            }
            else {
                vErrors.push(err15);
            }
            errors++;
        }
        var _valid0 = _errs10 === errors;
        if (_valid0 && valid0) {
            valid0 = false;
            passing0 = [passing0, 2];
        }
        else {
            if (_valid0) {
                valid0 = true;
                passing0 = 2;
                if (props0 !== true) {
                    props0 = true;
                }
            }
            const _errs21 = errors;
            if ("off" !== data) {
                const err16 = { instancePath, schemaPath: "#/oneOf/3/const", keyword: "const", params: { allowedValue: "off" }, message: "must be equal to constant", schema: "off", parentSchema: schema26.oneOf[3], data };
                if (vErrors === null) {
                    vErrors = [err16];
                }
                else {
                    vErrors.push(err16);
                }
                errors++;
            }
            var _valid0 = _errs21 === errors;
            if (_valid0 && valid0) {
                valid0 = false;
                passing0 = [passing0, 3];
            }
            else {
                if (_valid0) {
                    valid0 = true;
                    passing0 = 3;
                }
            }
        }
    }
    if (!valid0) {
        const err17 = { instancePath, schemaPath: "#/oneOf", keyword: "oneOf", params: { passingSchemas: passing0 }, message: "must match exactly one schema in oneOf", schema: schema26.oneOf, parentSchema: schema26, data };
        if (vErrors === null) {
            vErrors = [err17];
        }
        else {
            vErrors.push(err17);
        }
        errors++;
    }
    else {
        errors = _errs0;
        if (vErrors !== null) {
            if (_errs0) {
                vErrors.length = _errs0;
            }
            else {
                vErrors = null;
            }
        }
    }
    validate73.errors = vErrors;
    evaluated0.props = props0;
    return errors === 0;
}
validate73.evaluated = { "dynamicProps": true, "dynamicItems": false };
function validate72(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate72.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    if (data && typeof data == "object" && !Array.isArray(data)) {
        for (const key0 in data) {
            if (!(func2.call(schema25.properties, key0))) {
                const err0 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema25, data };
                if (vErrors === null) {
                    vErrors = [err0];
                }
                else {
                    vErrors.push(err0);
                }
                errors++;
            }
        }
        if (data.gap_ratio !== undefined) {
            if (!(validate73(data.gap_ratio, { instancePath: instancePath + "/gap_ratio", parentData: data, parentDataProperty: "gap_ratio", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.params_per_sample !== undefined) {
            if (!(validate73(data.params_per_sample, { instancePath: instancePath + "/params_per_sample", parentData: data, parentDataProperty: "params_per_sample", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.coefficient !== undefined) {
            if (!(validate73(data.coefficient, { instancePath: instancePath + "/coefficient", parentData: data, parentDataProperty: "coefficient", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.base_change !== undefined) {
            if (!(validate73(data.base_change, { instancePath: instancePath + "/base_change", parentData: data, parentDataProperty: "base_change", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.cv_ratio !== undefined) {
            if (!(validate73(data.cv_ratio, { instancePath: instancePath + "/cv_ratio", parentData: data, parentDataProperty: "cv_ratio", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.swing !== undefined) {
            if (!(validate73(data.swing, { instancePath: instancePath + "/swing", parentData: data, parentDataProperty: "swing", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.swing_beyond !== undefined) {
            if (!(validate73(data.swing_beyond, { instancePath: instancePath + "/swing_beyond", parentData: data, parentDataProperty: "swing_beyond", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.leakage !== undefined) {
            if (!(validate73(data.leakage, { instancePath: instancePath + "/leakage", parentData: data, parentDataProperty: "leakage", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.reproducibility !== undefined) {
            if (!(validate73(data.reproducibility, { instancePath: instancePath + "/reproducibility", parentData: data, parentDataProperty: "reproducibility", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.condition !== undefined) {
            if (!(validate73(data.condition, { instancePath: instancePath + "/condition", parentData: data, parentDataProperty: "condition", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
        if (data.complexity !== undefined) {
            if (!(validate73(data.complexity, { instancePath: instancePath + "/complexity", parentData: data, parentDataProperty: "complexity", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate73.errors : vErrors.concat(validate73.errors);
                errors = vErrors.length;
            }
        }
    }
    else {
        const err1 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema25.type, parentSchema: schema25, data };
        if (vErrors === null) {
            vErrors = [err1];
        }
        else {
            vErrors.push(err1);
        }
        errors++;
    }
    validate72.errors = vErrors;
    return errors === 0;
}
validate72.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };
function validate67(data, { instancePath = "", parentData, parentDataProperty, rootData = data, dynamicAnchors = {} } = {}) {
    /*# sourceURL="urn:fitgate:schema:descriptor:1" */ ;
    let vErrors = null;
    let errors = 0;
    const evaluated0 = validate67.evaluated;
    if (evaluated0.dynamicProps) {
        evaluated0.props = undefined;
    }
    if (evaluated0.dynamicItems) {
        evaluated0.items = undefined;
    }
    if (data && typeof data == "object" && !Array.isArray(data)) {
        if (data.version === undefined) {
            const err0 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "version" }, message: "must have required property '" + "version" + "'", schema: schema22.required, parentSchema: schema22, data };
            if (vErrors === null) {
                vErrors = [err0];
            }
            else {
                vErrors.push(err0);
            }
            errors++;
        }
        if (data.name === undefined) {
            const err1 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "name" }, message: "must have required property '" + "name" + "'", schema: schema22.required, parentSchema: schema22, data };
            if (vErrors === null) {
                vErrors = [err1];
            }
            else {
                vErrors.push(err1);
            }
            errors++;
        }
        if (data.data === undefined) {
            const err2 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "data" }, message: "must have required property '" + "data" + "'", schema: schema22.required, parentSchema: schema22, data };
            if (vErrors === null) {
                vErrors = [err2];
            }
            else {
                vErrors.push(err2);
            }
            errors++;
        }
        if (data.terms === undefined) {
            const err3 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "terms" }, message: "must have required property '" + "terms" + "'", schema: schema22.required, parentSchema: schema22, data };
            if (vErrors === null) {
                vErrors = [err3];
            }
            else {
                vErrors.push(err3);
            }
            errors++;
        }
        for (const key0 in data) {
            if (!((((((((key0 === "version") || (key0 === "name")) || (key0 === "task")) || (key0 === "data")) || (key0 === "terms")) || (key0 === "fit")) || (key0 === "coefficients")) || (key0 === "limits"))) {
                const err4 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema22, data };
                if (vErrors === null) {
                    vErrors = [err4];
                }
                else {
                    vErrors.push(err4);
                }
                errors++;
            }
        }
        if (data.version !== undefined) {
            let data0 = data.version;
            if (1 !== data0) {
                const err5 = { instancePath: instancePath + "/version", schemaPath: "#/properties/version/const", keyword: "const", params: { allowedValue: 1 }, message: "must be equal to constant", schema: 1, parentSchema: schema22.properties.version, data: data0 };
                if (vErrors === null) {
                    vErrors = [err5];
                }
                else {
                    vErrors.push(err5);
                }
                errors++;
            }
        }
        if (data.name !== undefined) {
            let data1 = data.name;
            if (typeof data1 === "string") {
                if (func1(data1) > 100) {
                    const err6 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/maxLength", keyword: "maxLength", params: { limit: 100 }, message: "must NOT have more than 100 characters", schema: 100, parentSchema: schema22.properties.name, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err6];
                    }
                    else {
                        vErrors.push(err6);
                    }
                    errors++;
                }
                if (func1(data1) < 1) {
                    const err7 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema22.properties.name, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err7];
                    }
                    else {
                        vErrors.push(err7);
                    }
                    errors++;
                }
                if (!pattern3.test(data1)) {
                    const err8 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/pattern", keyword: "pattern", params: { pattern: "^[A-Za-z0-9._-]+$" }, message: "must match pattern \"" + "^[A-Za-z0-9._-]+$" + "\"", schema: "^[A-Za-z0-9._-]+$", parentSchema: schema22.properties.name, data: data1 };
                    if (vErrors === null) {
                        vErrors = [err8];
                    }
                    else {
                        vErrors.push(err8);
                    }
                    errors++;
                }
            }
            else {
                const err9 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema22.properties.name.type, parentSchema: schema22.properties.name, data: data1 };
                if (vErrors === null) {
                    vErrors = [err9];
                }
                else {
                    vErrors.push(err9);
                }
                errors++;
            }
        }
        if (data.task !== undefined) {
            let data2 = data.task;
            if (!(data2 === "regression")) {
                const err10 = { instancePath: instancePath + "/task", schemaPath: "#/properties/task/enum", keyword: "enum", params: { allowedValues: schema22.properties.task.enum }, message: "must be equal to one of the allowed values", schema: schema22.properties.task.enum, parentSchema: schema22.properties.task, data: data2 };
                if (vErrors === null) {
                    vErrors = [err10];
                }
                else {
                    vErrors.push(err10);
                }
                errors++;
            }
        }
        if (data.data !== undefined) {
            let data3 = data.data;
            if (data3 && typeof data3 == "object" && !Array.isArray(data3)) {
                if (data3.train === undefined) {
                    const err11 = { instancePath: instancePath + "/data", schemaPath: "#/properties/data/required", keyword: "required", params: { missingProperty: "train" }, message: "must have required property '" + "train" + "'", schema: schema22.properties.data.required, parentSchema: schema22.properties.data, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err11];
                    }
                    else {
                        vErrors.push(err11);
                    }
                    errors++;
                }
                if (data3.holdout === undefined) {
                    const err12 = { instancePath: instancePath + "/data", schemaPath: "#/properties/data/required", keyword: "required", params: { missingProperty: "holdout" }, message: "must have required property '" + "holdout" + "'", schema: schema22.properties.data.required, parentSchema: schema22.properties.data, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err12];
                    }
                    else {
                        vErrors.push(err12);
                    }
                    errors++;
                }
                if (data3.target === undefined) {
                    const err13 = { instancePath: instancePath + "/data", schemaPath: "#/properties/data/required", keyword: "required", params: { missingProperty: "target" }, message: "must have required property '" + "target" + "'", schema: schema22.properties.data.required, parentSchema: schema22.properties.data, data: data3 };
                    if (vErrors === null) {
                        vErrors = [err13];
                    }
                    else {
                        vErrors.push(err13);
                    }
                    errors++;
                }
                for (const key1 in data3) {
                    if (!(((key1 === "train") || (key1 === "holdout")) || (key1 === "target"))) {
                        const err14 = { instancePath: instancePath + "/data", schemaPath: "#/properties/data/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema22.properties.data, data: data3 };
                        if (vErrors === null) {
                            vErrors = [err14];
                        }
                        else {
                            vErrors.push(err14);
                        }
                        errors++;
                    }
                }
                if (data3.train !== undefined) {
                    let data4 = data3.train;
                    if (typeof data4 === "string") {
                        if (func1(data4) < 1) {
                            const err15 = { instancePath: instancePath + "/data/train", schemaPath: "#/properties/data/properties/train/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema22.properties.data.properties.train, data: data4 };
                            if (vErrors === null) {
                                vErrors = [err15];
                            }
                            else {
                                vErrors.push(err15);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err16 = { instancePath: instancePath + "/data/train", schemaPath: "#/properties/data/properties/train/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema22.properties.data.properties.train.type, parentSchema: schema22.properties.data.properties.train, data: data4 };
                        if (vErrors === null) {
                            vErrors = [err16];
                        }
                        else {
                            vErrors.push(err16);
                        }
                        errors++;
                    }
                }
                if (data3.holdout !== undefined) {
                    let data5 = data3.holdout;
                    if (typeof data5 === "string") {
                        if (func1(data5) < 1) {
                            const err17 = { instancePath: instancePath + "/data/holdout", schemaPath: "#/properties/data/properties/holdout/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema22.properties.data.properties.holdout, data: data5 };
                            if (vErrors === null) {
                                vErrors = [err17];
                            }
                            else {
                                vErrors.push(err17);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err18 = { instancePath: instancePath + "/data/holdout", schemaPath: "#/properties/data/properties/holdout/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema22.properties.data.properties.holdout.type, parentSchema: schema22.properties.data.properties.holdout, data: data5 };
                        if (vErrors === null) {
                            vErrors = [err18];
                        }
                        else {
                            vErrors.push(err18);
                        }
                        errors++;
                    }
                }
                if (data3.target !== undefined) {
                    let data6 = data3.target;
                    if (typeof data6 === "string") {
                        if (func1(data6) < 1) {
                            const err19 = { instancePath: instancePath + "/data/target", schemaPath: "#/properties/data/properties/target/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema22.properties.data.properties.target, data: data6 };
                            if (vErrors === null) {
                                vErrors = [err19];
                            }
                            else {
                                vErrors.push(err19);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err20 = { instancePath: instancePath + "/data/target", schemaPath: "#/properties/data/properties/target/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema22.properties.data.properties.target.type, parentSchema: schema22.properties.data.properties.target, data: data6 };
                        if (vErrors === null) {
                            vErrors = [err20];
                        }
                        else {
                            vErrors.push(err20);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err21 = { instancePath: instancePath + "/data", schemaPath: "#/properties/data/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema22.properties.data.type, parentSchema: schema22.properties.data, data: data3 };
                if (vErrors === null) {
                    vErrors = [err21];
                }
                else {
                    vErrors.push(err21);
                }
                errors++;
            }
        }
        if (data.terms !== undefined) {
            let data7 = data.terms;
            if (Array.isArray(data7)) {
                if (data7.length < 1) {
                    const err22 = { instancePath: instancePath + "/terms", schemaPath: "#/properties/terms/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema22.properties.terms, data: data7 };
                    if (vErrors === null) {
                        vErrors = [err22];
                    }
                    else {
                        vErrors.push(err22);
                    }
                    errors++;
                }
                const len0 = data7.length;
                for (let i0 = 0; i0 < len0; i0++) {
                    if (!(validate68(data7[i0], { instancePath: instancePath + "/terms/" + i0, parentData: data7, parentDataProperty: i0, rootData, dynamicAnchors }))) {
                        vErrors = vErrors === null ? validate68.errors : vErrors.concat(validate68.errors);
                        errors = vErrors.length;
                    }
                }
            }
            else {
                const err23 = { instancePath: instancePath + "/terms", schemaPath: "#/properties/terms/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema22.properties.terms.type, parentSchema: schema22.properties.terms, data: data7 };
                if (vErrors === null) {
                    vErrors = [err23];
                }
                else {
                    vErrors.push(err23);
                }
                errors++;
            }
        }
        if (data.fit !== undefined) {
            let data9 = data.fit;
            if (data9 && typeof data9 == "object" && !Array.isArray(data9)) {
                for (const key2 in data9) {
                    if (!((((((key2 === "intercept") || (key2 === "ridge")) || (key2 === "folds")) || (key2 === "fold_order")) || (key2 === "seed")) || (key2 === "parameter_count"))) {
                        const err24 = { instancePath: instancePath + "/fit", schemaPath: "#/properties/fit/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key2 }, message: "must NOT have additional properties", schema: false, parentSchema: schema22.properties.fit, data: data9 };
                        if (vErrors === null) {
                            vErrors = [err24];
                        }
                        else {
                            vErrors.push(err24);
                        }
                        errors++;
                    }
                }
                if (data9.intercept !== undefined) {
                    let data10 = data9.intercept;
                    if (typeof data10 !== "boolean") {
                        const err25 = { instancePath: instancePath + "/fit/intercept", schemaPath: "#/properties/fit/properties/intercept/type", keyword: "type", params: { type: "boolean" }, message: "must be boolean", schema: schema22.properties.fit.properties.intercept.type, parentSchema: schema22.properties.fit.properties.intercept, data: data10 };
                        if (vErrors === null) {
                            vErrors = [err25];
                        }
                        else {
                            vErrors.push(err25);
                        }
                        errors++;
                    }
                }
                if (data9.ridge !== undefined) {
                    let data11 = data9.ridge;
                    if ((typeof data11 == "number") && (isFinite(data11))) {
                        if (data11 < 0 || isNaN(data11)) {
                            const err26 = { instancePath: instancePath + "/fit/ridge", schemaPath: "#/properties/fit/properties/ridge/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema22.properties.fit.properties.ridge, data: data11 };
                            if (vErrors === null) {
                                vErrors = [err26];
                            }
                            else {
                                vErrors.push(err26);
                            }
                            errors++;
                        }
                    }
                    else {
                        const err27 = { instancePath: instancePath + "/fit/ridge", schemaPath: "#/properties/fit/properties/ridge/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema22.properties.fit.properties.ridge.type, parentSchema: schema22.properties.fit.properties.ridge, data: data11 };
                        if (vErrors === null) {
                            vErrors = [err27];
                        }
                        else {
                            vErrors.push(err27);
                        }
                        errors++;
                    }
                }
                if (data9.folds !== undefined) {
                    let data12 = data9.folds;
                    if (!(((typeof data12 == "number") && (!(data12 % 1) && !isNaN(data12))) && (isFinite(data12)))) {
                        const err28 = { instancePath: instancePath + "/fit/folds", schemaPath: "#/properties/fit/properties/folds/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema22.properties.fit.properties.folds.type, parentSchema: schema22.properties.fit.properties.folds, data: data12 };
                        if (vErrors === null) {
                            vErrors = [err28];
                        }
                        else {
                            vErrors.push(err28);
                        }
                        errors++;
                    }
                    if ((typeof data12 == "number") && (isFinite(data12))) {
                        if (data12 < 2 || isNaN(data12)) {
                            const err29 = { instancePath: instancePath + "/fit/folds", schemaPath: "#/properties/fit/properties/folds/minimum", keyword: "minimum", params: { comparison: ">=", limit: 2 }, message: "must be >= 2", schema: 2, parentSchema: schema22.properties.fit.properties.folds, data: data12 };
                            if (vErrors === null) {
                                vErrors = [err29];
                            }
                            else {
                                vErrors.push(err29);
                            }
                            errors++;
                        }
                    }
                }
                if (data9.fold_order !== undefined) {
                    let data13 = data9.fold_order;
                    if (!((data13 === "shuffled") || (data13 === "blocks"))) {
                        const err30 = { instancePath: instancePath + "/fit/fold_order", schemaPath: "#/properties/fit/properties/fold_order/enum", keyword: "enum", params: { allowedValues: schema22.properties.fit.properties.fold_order.enum }, message: "must be equal to one of the allowed values", schema: schema22.properties.fit.properties.fold_order.enum, parentSchema: schema22.properties.fit.properties.fold_order, data: data13 };
                        if (vErrors === null) {
                            vErrors = [err30];
                        }
                        else {
                            vErrors.push(err30);
                        }
                        errors++;
                    }
                }
                if (data9.seed !== undefined) {
                    let data14 = data9.seed;
                    if (!(((typeof data14 == "number") && (!(data14 % 1) && !isNaN(data14))) && (isFinite(data14)))) {
                        const err31 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema22.properties.fit.properties.seed.type, parentSchema: schema22.properties.fit.properties.seed, data: data14 };
                        if (vErrors === null) {
                            vErrors = [err31];
                        }
                        else {
                            vErrors.push(err31);
                        }
                        errors++;
                    }
                    if ((typeof data14 == "number") && (isFinite(data14))) {
                        if (data14 > 4294967295 || isNaN(data14)) {
                            const err32 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/maximum", keyword: "maximum", params: { comparison: "<=", limit: 4294967295 }, message: "must be <= 4294967295", schema: 4294967295, parentSchema: schema22.properties.fit.properties.seed, data: data14 };
                            if (vErrors === null) {
                                vErrors = [err32];
                            }
                            else {
                                vErrors.push(err32);
                            }
                            errors++;
                        }
                        if (data14 < 0 || isNaN(data14)) {
                            const err33 = { instancePath: instancePath + "/fit/seed", schemaPath: "#/properties/fit/properties/seed/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema22.properties.fit.properties.seed, data: data14 };
                            if (vErrors === null) {
                                vErrors = [err33];
                            }
                            else {
                                vErrors.push(err33);
                            }
                            errors++;
                        }
                    }
                }
                if (data9.parameter_count !== undefined) {
                    let data15 = data9.parameter_count;
                    if (!((data15 === "columns") || (data15 === "effective"))) {
                        const err34 = { instancePath: instancePath + "/fit/parameter_count", schemaPath: "#/properties/fit/properties/parameter_count/enum", keyword: "enum", params: { allowedValues: schema22.properties.fit.properties.parameter_count.enum }, message: "must be equal to one of the allowed values", schema: schema22.properties.fit.properties.parameter_count.enum, parentSchema: schema22.properties.fit.properties.parameter_count, data: data15 };
                        if (vErrors === null) {
                            vErrors = [err34];
                        }
                        else {
                            vErrors.push(err34);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err35 = { instancePath: instancePath + "/fit", schemaPath: "#/properties/fit/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema22.properties.fit.type, parentSchema: schema22.properties.fit, data: data9 };
                if (vErrors === null) {
                    vErrors = [err35];
                }
                else {
                    vErrors.push(err35);
                }
                errors++;
            }
        }
        if (data.coefficients !== undefined) {
            let data16 = data.coefficients;
            if (Array.isArray(data16)) {
                if (data16.length < 1) {
                    const err36 = { instancePath: instancePath + "/coefficients", schemaPath: "#/properties/coefficients/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema22.properties.coefficients, data: data16 };
                    if (vErrors === null) {
                        vErrors = [err36];
                    }
                    else {
                        vErrors.push(err36);
                    }
                    errors++;
                }
                const len1 = data16.length;
                for (let i1 = 0; i1 < len1; i1++) {
                    let data17 = data16[i1];
                    if (!((typeof data17 == "number") && (isFinite(data17)))) {
                        const err37 = { instancePath: instancePath + "/coefficients/" + i1, schemaPath: "#/properties/coefficients/items/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema22.properties.coefficients.items.type, parentSchema: schema22.properties.coefficients.items, data: data17 };
                        if (vErrors === null) {
                            vErrors = [err37];
                        }
                        else {
                            vErrors.push(err37);
                        }
                        errors++;
                    }
                }
            }
            else {
                const err38 = { instancePath: instancePath + "/coefficients", schemaPath: "#/properties/coefficients/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema22.properties.coefficients.type, parentSchema: schema22.properties.coefficients, data: data16 };
                if (vErrors === null) {
                    vErrors = [err38];
                }
                else {
                    vErrors.push(err38);
                }
                errors++;
            }
        }
        if (data.limits !== undefined) {
            if (!(validate72(data.limits, { instancePath: instancePath + "/limits", parentData: data, parentDataProperty: "limits", rootData, dynamicAnchors }))) {
                vErrors = vErrors === null ? validate72.errors : vErrors.concat(validate72.errors);
                errors = vErrors.length;
            }
        }
    }
    else {
        const err39 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema22.type, parentSchema: schema22, data };
        if (vErrors === null) {
            vErrors = [err39];
        }
        else {
            vErrors.push(err39);
        }
        errors++;
    }
    validate67.errors = vErrors;
    return errors === 0;
}
validate67.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };

;// CONCATENATED MODULE: ./src/config/schemas.ts
/**
 * The two JSON Schemas (shipped as JSON files beside this module) as validators. They are
 * compiled ahead of time by test/tools/gen-validators.mjs (ajv standalone code, run by
 * `npm run bundle`) into ./generated/validators.ts, with the limit keys of `LIMIT_KEYS` added to
 * their `limits` so that a key added to the table is accepted even before the schema files list
 * it (a test keeps the files in step, another fails when the generated module is stale). No
 * schema is compiled at run time.
 */



/** The settings schema as shipped (`settings.schema.json`). */
const settingsSchema = (/* unused pure expression or super */ null && (settingsSchemaFile));
/** The descriptor schema as shipped (`descriptor.schema.json`). */
const descriptorSchema = (/* unused pure expression or super */ null && (descriptorSchemaFile));
/** Validates a parsed settings file against `settings.schema.json`. */
const validateSettingsValue = (value) => run(validateSettings, value);
/** Validates a parsed descriptor against `descriptor.schema.json`. */
const validateDescriptorValue = (value) => run(validateDescriptor, value);
function run(validate, value) {
    return validate(value) ? null : [...(validate.errors ?? [])];
}

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __nccwpck_require__(8815);
;// CONCATENATED MODULE: ./src/config/yaml-source.ts
/**
 * YAML text to a plain value plus the source position of any key path, with the guards a
 * file from a pull request needs: a size cap, a nesting cap, an alias cap, duplicate keys
 * refused, and non-UTF-8 or binary content refused. Every problem is an {@link InputError}
 * naming the file, line and column.
 */


/** Guards applied to every YAML file fitgate reads. */
const YAML_GUARDS = Object.freeze({
    /** Largest YAML file in bytes: 1 MiB. */
    maxBytes: 1024 * 1024,
    /** Deepest nesting of mappings and lists. */
    maxDepth: 64,
    /** Most alias expansions (`*name`) in one document. */
    maxAliasCount: 100,
});
/** Stable codes of the errors this module throws. */
const YAML_ERROR = Object.freeze({
    syntax: 'yaml-syntax',
    duplicateKey: 'yaml-duplicate-key',
    collectionKey: 'yaml-collection-key',
    tooDeep: 'yaml-too-deep',
    aliases: 'yaml-aliases',
    tooLarge: 'file-too-large',
    encoding: 'file-encoding',
});
/**
 * Decodes file bytes as UTF-8 text (a leading byte-order mark is dropped).
 *
 * @param bytes the file's contents
 * @param file repository-relative path, for messages
 * @throws InputError `file-too-large` above {@link YAML_GUARDS}.maxBytes, `file-encoding` for
 *   bytes that are not UTF-8 or that contain NUL characters (binary content)
 */
function decodeYamlBytes(bytes, file) {
    checkSize(bytes.byteLength, file);
    let text;
    try {
        text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    }
    catch {
        const at = firstInvalidUtf8(bytes);
        throw new core_errors/* InputError */.dz(YAML_ERROR.encoding, `is not UTF-8 text (invalid byte 0x${bytes[at].toString(16).padStart(2, '0')} at offset ${at}); expected a UTF-8 YAML file`, { file, ...positionInBytes(bytes, at) });
    }
    const nul = text.indexOf('\u0000');
    if (nul >= 0) {
        throw new core_errors/* InputError */.dz(YAML_ERROR.encoding, 'contains a NUL character, so it looks binary; expected a UTF-8 YAML file', { file, ...positionInText(text, nul) });
    }
    return text;
}
/**
 * Reads and parses a YAML file through the repository reader, checking its size before reading.
 *
 * @param repo the repository
 * @param path repository-relative path
 */
async function readYamlFile(repo, path) {
    checkSize(await repo.size(path), path);
    return parseYaml(decodeYamlBytes(await repo.read(path), path), path);
}
/**
 * Parses YAML 1.2 text (core schema: `off`, `yes`, `no` stay strings) into a plain value.
 *
 * @param text the YAML text
 * @param file repository-relative path, for messages
 * @throws InputError `yaml-syntax` (the yaml package's message and position), `yaml-duplicate-key`,
 *   `yaml-too-deep` (nesting above {@link YAML_GUARDS}.maxDepth), `yaml-aliases` (more alias
 *   expansions than {@link YAML_GUARDS}.maxAliasCount), `file-too-large`
 */
function parseYaml(text, file) {
    checkSize(Buffer.byteLength(text, 'utf8'), file);
    if (text.charCodeAt(0) === 0xfeff)
        text = text.slice(1);
    // A cheap bound first: the yaml package's parser gets slow (and its composer runs out of
    // stack) on documents nested thousands deep, so refuse those before parsing.
    const rough = roughNesting(text);
    if (rough.depth > ROUGH_DEPTH_CAP) {
        throw new core_errors/* InputError */.dz(YAML_ERROR.tooDeep, `is nested more than ${YAML_GUARDS.maxDepth} levels deep; expected a shallow settings or descriptor file`, { file, ...positionInText(text, rough.offset) });
    }
    const lineCounter = new dist/* LineCounter */.HN();
    const doc = (0,dist/* parseDocument */.Tp)(text, { lineCounter, prettyErrors: false, uniqueKeys: false, version: '1.2', schema: 'core' });
    const at = (offset) => {
        const { line, col } = lineCounter.linePos(offset);
        return { line, column: col };
    };
    if (doc.errors.length > 0) {
        const error = doc.errors[0];
        const stackOverflow = /call stack/i.test(error.message);
        const message = error.message.replace(/ at line \d+, column \d+:?[\s\S]*$/, '');
        throw new core_errors/* InputError */.dz(stackOverflow ? YAML_ERROR.tooDeep : YAML_ERROR.syntax, stackOverflow ? `is nested too deeply; expected at most ${YAML_GUARDS.maxDepth} levels` : `is not valid YAML: ${(0,core_errors/* clip */.$Q)(message, 120)}`, { file, ...at(error.pos[0]) });
    }
    checkStructure(doc, text, file, at);
    let value;
    try {
        value = doc.toJS({ maxAliasCount: YAML_GUARDS.maxAliasCount });
    }
    catch (error) {
        const first = firstAlias(doc.contents);
        throw new core_errors/* InputError */.dz(YAML_ERROR.aliases, `expands aliases (*name) more than ${YAML_GUARDS.maxAliasCount} times (${error instanceof Error ? error.message : String(error)}); expected few aliases`, { file, ...(first ? at(first) : {}) });
    }
    const locate = (path, wantValue) => {
        let node = doc.contents;
        let keyOffset = node && node.range ? node.range[0] : 0;
        for (const segment of path) {
            node = resolveAlias(doc, node);
            if (typeof segment === 'number' && (0,dist/* isSeq */.oP)(node)) {
                const item = node.items[segment];
                if (item === undefined)
                    return null;
                node = item;
                const range = item?.range;
                if (!range)
                    return null;
                keyOffset = range[0];
            }
            else if ((0,dist/* isMap */.jh)(node)) {
                const pair = node.items.find((p) => keyText(p.key) === String(segment));
                if (!pair)
                    return null;
                const keyRange = pair.key?.range;
                keyOffset = keyRange ? keyRange[0] : keyOffset;
                node = pair.value;
            }
            else {
                return null;
            }
        }
        if (keyOffset === null)
            return null;
        if (wantValue) {
            const range = resolveAlias(doc, node)?.range;
            const own = node?.range;
            if (own)
                return at(own[0]);
            if (range)
                return at(range[0]);
        }
        return at(keyOffset);
    };
    return {
        value,
        positionOf: (path) => locate(path, false),
        valuePositionOf: (path) => locate(path, true),
    };
}
/** Above this rough bound the text is refused before parsing (the exact check is {@link YAML_GUARDS}.maxDepth). */
const ROUGH_DEPTH_CAP = 512;
/**
 * An over-estimate of nesting depth from the raw text: open flow brackets (anywhere, even
 * inside strings) and leading indentation plus leading `- ` items on each line. Cheap and
 * linear; only pathological text gets near {@link ROUGH_DEPTH_CAP}.
 */
function roughNesting(text) {
    let flow = 0;
    let best = 0;
    let bestOffset = 0;
    let lineStart = true;
    let lead = 0;
    for (let i = 0; i < text.length; i++) {
        const c = text.charCodeAt(i);
        if (c === 0x0a) {
            lineStart = true;
            lead = 0;
            continue;
        }
        if (lineStart) {
            if (c === 0x20 || c === 0x09)
                lead += 1;
            else if (c === 0x2d && text.charCodeAt(i + 1) === 0x20)
                lead += 1;
            else
                lineStart = false;
            if (lead > best) {
                best = lead;
                bestOffset = i;
            }
        }
        if (c === 0x5b || c === 0x7b) {
            flow += 1;
            if (flow > best) {
                best = flow;
                bestOffset = i;
            }
        }
        else if ((c === 0x5d || c === 0x7d) && flow > 0) {
            flow -= 1;
        }
    }
    return { depth: best, offset: bestOffset };
}
/** Checks nesting depth, duplicate keys and keys that are lists or mappings on the syntax tree (aliases are followed only to see what a key is). */
function checkStructure(doc, text, file, at) {
    const visit = (node, depth) => {
        if ((0,dist/* isMap */.jh)(node) || (0,dist/* isSeq */.oP)(node)) {
            if (depth > YAML_GUARDS.maxDepth) {
                throw new core_errors/* InputError */.dz(YAML_ERROR.tooDeep, `is nested more than ${YAML_GUARDS.maxDepth} levels deep; expected a shallow settings or descriptor file`, {
                    file,
                    ...(node.range ? at(node.range[0]) : {}),
                });
            }
        }
        if ((0,dist/* isMap */.jh)(node)) {
            const seen = new Map();
            for (const pair of node.items) {
                const keyOffset = pair.key?.range?.[0] ?? node.range?.[0] ?? 0;
                // YAML allows a list or a mapping as a key; no key of fitgate's files is one, and plain
                // JavaScript objects cannot hold one (the yaml package would print a process warning).
                const keyNode = resolveAlias(doc, pair.key);
                if ((0,dist/* isMap */.jh)(keyNode) || (0,dist/* isSeq */.oP)(keyNode)) {
                    const range = pair.key?.range;
                    const written = range ? text.slice(range[0], range[1]).replace(/\s+/g, ' ').trim() : '';
                    throw new core_errors/* InputError */.dz(YAML_ERROR.collectionKey, `a ${(0,dist/* isMap */.jh)(keyNode) ? 'mapping' : 'list'} used as a key (\`${(0,core_errors/* clip */.$Q)(written, 40)}\`); expected a plain name before the colon`, {
                        file,
                        ...at(keyOffset),
                    });
                }
                const key = keyText(pair.key);
                const before = seen.get(key);
                if (before !== undefined) {
                    const first = at(before);
                    throw new core_errors/* InputError */.dz(YAML_ERROR.duplicateKey, `key \`${(0,core_errors/* clip */.$Q)(key)}\` appears twice in the same mapping (first at line ${first.line}); expected each key once`, {
                        file,
                        key,
                        ...at(keyOffset),
                    });
                }
                seen.set(key, keyOffset);
                visit(pair.key, depth + 1);
                visit(pair.value, depth + 1);
            }
        }
        else if ((0,dist/* isSeq */.oP)(node)) {
            for (const item of node.items)
                visit(item, depth + 1);
        }
        else if ((0,dist/* isPair */.tO)(node)) {
            visit(node.key, depth + 1);
            visit(node.value, depth + 1);
        }
    };
    visit(doc.contents, 1);
}
/** A mapping key as the text plain JavaScript would use for it. */
function keyText(key) {
    if ((0,dist/* isScalar */.jn)(key))
        return String(key.value);
    if (key === null || key === undefined)
        return '';
    if ((0,dist/* isAlias */.Vj)(key))
        return `*${key.source}`;
    return String(key);
}
function resolveAlias(doc, node) {
    let current = node;
    for (let hops = 0; (0,dist/* isAlias */.Vj)(current) && hops < 8; hops++)
        current = current.resolve(doc);
    return current;
}
/** Offset of the first alias in document order, or null. */
function firstAlias(root) {
    const stack = [root];
    let best = null;
    while (stack.length > 0) {
        const node = stack.pop();
        if ((0,dist/* isAlias */.Vj)(node)) {
            const start = node.range?.[0];
            if (start !== undefined && (best === null || start < best))
                best = start;
        }
        else if ((0,dist/* isMap */.jh)(node)) {
            for (const pair of node.items)
                stack.push(pair.key, pair.value);
        }
        else if ((0,dist/* isSeq */.oP)(node)) {
            stack.push(...node.items);
        }
    }
    return best;
}
function checkSize(bytes, file) {
    if (bytes > YAML_GUARDS.maxBytes) {
        throw new core_errors/* InputError */.dz(YAML_ERROR.tooLarge, `is ${bytes} bytes; expected a YAML file of at most ${YAML_GUARDS.maxBytes} bytes (1 MiB)`, { file });
    }
}
function firstInvalidUtf8(bytes) {
    // Largest prefix with no invalid byte (a cut-off sequence at its end is fine), by bisection:
    // prefix validity is monotone and files are at most 1 MiB.
    const validPrefix = (length) => {
        try {
            new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, length), { stream: true });
            return true;
        }
        catch {
            return false;
        }
    };
    if (validPrefix(bytes.length))
        return Math.max(0, bytes.length - 1); // cut off at the end
    let lo = 0; // valid
    let hi = bytes.length; // invalid
    while (hi - lo > 1) {
        const mid = (lo + hi) >>> 1;
        if (validPrefix(mid))
            lo = mid;
        else
            hi = mid;
    }
    return hi - 1;
}
function positionInBytes(bytes, offset) {
    let line = 1;
    let lineStart = 0;
    for (let i = 0; i < offset; i++) {
        if (bytes[i] === 0x0a) {
            line += 1;
            lineStart = i + 1;
        }
    }
    return { line, column: offset - lineStart + 1 };
}
function positionInText(text, offset) {
    let line = 1;
    let lineStart = 0;
    for (let i = 0; i < offset; i++) {
        if (text.charCodeAt(i) === 0x0a) {
            line += 1;
            lineStart = i + 1;
        }
    }
    return { line, column: offset - lineStart + 1 };
}

;// CONCATENATED MODULE: ./src/config/settings-file.ts
/**
 * The repository settings file (`fitgate.yml` by default): where the descriptors are, the
 * limits every model gets, defaults for `fit`, and resource caps.
 */






/** Default settings path, relative to the repository root. */
const DEFAULT_SETTINGS_PATH = 'fitgate.yml';
/** Descriptor glob used when there is no settings file. */
const DEFAULT_MODEL_PATTERNS = Object.freeze(['**/*.model.yml']);
/** Built-in `fit` defaults: 5 shuffled folds, seed 1. */
const DEFAULT_FIT = Object.freeze({ folds: 5, foldOrder: 'shuffled', seed: 1, parameterCount: 'columns' });
/** Built-in resource caps: 512 MiB per data file, 2e8 training rows x parameters. */
const DEFAULT_CAPS = Object.freeze({ maxFileMb: 512, maxCells: 200_000_000 });
/** Stable codes of the errors this module throws (besides YAML and schema codes). */
const SETTINGS_ERROR = Object.freeze({ missing: 'file-missing', limitOrder: 'limit-order' });
const MIB = 1024 * 1024;
/** Lines of each `models` pattern, kept beside a loaded settings object for later messages. */
const modelLines = new WeakMap();
/**
 * The settings line of the `index`-th `models` pattern, or null (no file, or settings not
 * made by {@link loadSettings}).
 */
function modelPatternLine(settings, index) {
    return modelLines.get(settings)?.[index] ?? null;
}
/** Settings used when the repository has no settings file. */
function defaultSettings() {
    return {
        file: null,
        models: [...DEFAULT_MODEL_PATTERNS],
        limits: {},
        fit: { ...DEFAULT_FIT },
        caps: { maxFileBytes: DEFAULT_CAPS.maxFileMb * MIB, maxCells: DEFAULT_CAPS.maxCells },
    };
}
/**
 * Loads and validates the settings file; a missing file at the default path gives defaults
 * with models ["**\/*.model.yml"]; a missing file given explicitly is an InputError.
 *
 * @param repo the repository
 * @param path repository-relative settings path (default {@link DEFAULT_SETTINGS_PATH} at the caller)
 * @param options `explicit`: the user named the file (default false), so it must exist
 * @throws InputError `file-missing`, `path-outside`, YAML errors, `schema`, `limit-order`
 */
async function loadSettings(repo, path, options = {}) {
    const kind = await repo.entryKind(path);
    const notes = await yamlTwinNotes(repo, path);
    if (kind === 'missing') {
        if (options.explicit) {
            throw new core_errors/* InputError */.dz(SETTINGS_ERROR.missing, `settings file not found in ${repo.label}; expected a YAML file such as ${DEFAULT_SETTINGS_PATH}`, { file: path });
        }
        return { ...defaultSettings(), notes };
    }
    if (kind !== 'file') {
        // A folder, a link to nothing or a FIFO where the settings belong is never taken for "no settings".
        throw new core_errors/* InputError */.dz(repo_path/* NOT_A_FILE */.bd, `the settings file ${(0,repo_path/* kindWords */.Gk)(kind)}; expected a regular YAML file there, or nothing at all (for the defaults)`, { file: path });
    }
    const doc = await readYamlFile(repo, path);
    // The same object (the pattern lines are kept beside it).
    const settings = settingsFromDocument(doc, path);
    settings.notes = notes;
    return settings;
}
/**
 * A note when a file named like `path` but ending `.yaml` sits beside it (fitgate reads only the
 * `.yml` name it was given): empty otherwise.
 */
async function yamlTwinNotes(repo, path) {
    if (!path.endsWith('.yml'))
        return [];
    const twin = `${path.slice(0, -4)}.yaml`;
    let kind;
    try {
        kind = await repo.entryKind(twin);
    }
    catch {
        return []; // a twin that leads outside is not read, and not ours to report
    }
    if (kind === 'missing')
        return [];
    return [`${(0,core_errors/* clip */.$Q)(twin)} is not read: fitgate reads its settings from ${(0,core_errors/* clip */.$Q)(path)} (rename the file, or name it with --config / the \`config\` input)`];
}
/**
 * Validates a parsed settings document and builds the {@link SettingsFile}.
 *
 * @param doc the parsed YAML
 * @param file repository-relative path of the settings file
 */
function settingsFromDocument(doc, file) {
    const errors = validateSettingsValue(doc.value);
    if (errors)
        throw schemaError(errors, doc, file);
    const raw = doc.value;
    const defaults = defaultSettings();
    const settings = {
        file,
        models: raw.models ? [...raw.models] : defaults.models,
        limits: readLimits(doc, file, raw.limits, ['limits']),
        fit: {
            folds: raw.fit?.folds ?? DEFAULT_FIT.folds,
            foldOrder: raw.fit?.fold_order ?? DEFAULT_FIT.foldOrder,
            seed: raw.fit?.seed ?? DEFAULT_FIT.seed,
            parameterCount: raw.fit?.parameter_count ?? DEFAULT_FIT.parameterCount,
        },
        caps: {
            maxFileBytes: Math.round((raw.caps?.max_file_mb ?? DEFAULT_CAPS.maxFileMb) * MIB),
            maxCells: raw.caps?.max_cells ?? DEFAULT_CAPS.maxCells,
        },
    };
    if (raw.models)
        modelLines.set(settings, raw.models.map((_, i) => doc.positionOf(['models', i])?.line ?? 1));
    return settings;
}
/**
 * Reads a validated `limits` map with the line of each key, checking the order of its bounds
 * ({@link limitOrderProblem}).
 *
 * @param doc the parsed document
 * @param file repository-relative path
 * @param limits the map as validated by the schema (or undefined)
 * @param at key path of the map, e.g. `['limits']`
 */
function readLimits(doc, file, limits, at) {
    const out = {};
    for (const [key, spec] of Object.entries(limits ?? {})) {
        const problem = limitOrderProblem(spec, limitDirection(key));
        if (problem !== null)
            throw errorAt(doc, file, SETTINGS_ERROR.limitOrder, [...at, key, problem[0]], problem[1]);
        out[key] = { spec: typeof spec === 'object' ? { ...spec } : spec, line: doc.positionOf([...at, key])?.line ?? 1 };
    }
    return out;
}

// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __nccwpck_require__(6760);
;// CONCATENATED MODULE: ./src/config/discover.ts
/**
 * Which descriptors a run checks: the paths given on the command line, or the settings
 * file's glob patterns; and the rule that model names are unique.
 */




/** Stable codes of the errors this module throws. */
const DISCOVER_ERROR = Object.freeze({
    missing: 'file-missing',
    notAFile: repo_path/* NOT_A_FILE */.bd,
    outside: 'path-outside',
    globOutside: 'glob-outside',
    globEmpty: 'glob-empty',
    duplicateName: 'duplicate-name',
});
/** Most file names one note lists. */
const NAMES_LISTED = 5;
/**
 * Descriptor paths for a run: the given paths (each must exist, be a regular file and be inside
 * the repository) or the settings' globs (a glob that matches nothing, or that leaves the
 * repository, is an InputError naming the settings line). A path a glob matches that is not a
 * regular file stays in the list: loading it gives that model's error.
 *
 * @param repo the repository
 * @param settings the loaded settings file
 * @param explicit repository-relative descriptor paths from the command line (empty: use the globs)
 * @returns the paths, sorted and de-duplicated, and notes for the run
 * @throws InputError `path-outside`, `file-missing`, `not-a-file`, `glob-outside`, `glob-empty`,
 *   `glob-too-complex`, `glob-too-large`
 */
async function discoverDescriptors(repo, settings, explicit) {
    const found = new Set();
    const notes = [];
    if (explicit.length > 0) {
        for (const given of explicit) {
            const path = normaliseGiven(given);
            const kind = await repo.entryKind(path);
            if (kind === 'missing') {
                throw new core_errors/* InputError */.dz(DISCOVER_ERROR.missing, `descriptor not found in ${repo.label}; expected a repository-relative path to a *.model.yml file`, { file: given });
            }
            if (kind !== 'file')
                throw new core_errors/* InputError */.dz(DISCOVER_ERROR.notAFile, `the descriptor ${(0,repo_path/* kindWords */.Gk)(kind)}; expected a regular *.model.yml file`, { file: given });
            found.add(path);
        }
        return { paths: [...found].sort(), notes };
    }
    for (const [index, pattern] of settings.models.entries()) {
        const where = { file: settings.file ?? undefined, line: modelPatternLine(settings, index) ?? undefined, key: `models[${index}]` };
        const shown = (0,core_errors/* quoteValue */.cl)(pattern);
        const { matches, twins, links } = await globWithTwin(repo, pattern, where);
        const unread = twins.length > 0 ? `${listNames(twins)} ${twins.length === 1 ? 'is' : 'are'} not read: the pattern asks for .yml, and fitgate reads only the names a pattern matches (rename ${twins.length === 1 ? 'it' : 'them'} to .yml, or change the pattern)` : '';
        const unsearched = links.length > 0 ? `${listNames(links)} ${links.length === 1 ? 'is a symbolic link' : 'are symbolic links'} that the pattern would search below; links are never followed as folders (name the real folder in the pattern)` : '';
        if (matches.length === 0) {
            const source = settings.file === null ? ' (the default, as there is no settings file)' : '';
            const why = [unread, unsearched].filter((t) => t !== '').map((t) => `; ${t}`).join('');
            throw new core_errors/* InputError */.dz(DISCOVER_ERROR.globEmpty, `pattern ${shown}${source} matches no file in ${repo.label}; expected at least one model descriptor${why}`, where);
        }
        if (unread !== '')
            notes.push(`pattern ${shown}: ${unread}.`);
        if (unsearched !== '')
            notes.push(`pattern ${shown}: ${unsearched}.`);
        for (const match of matches)
            found.add(match);
    }
    return { paths: [...found].sort(), notes };
}
/**
 * Globs one pattern and, when it ends with `.yml`, its `.yaml` twin in the same walk: matches of
 * the pattern, twin files that the pattern does not match, and links the pattern would search
 * below. A refused pattern becomes an InputError at the settings line.
 */
async function globWithTwin(repo, pattern, where) {
    const twin = pattern.endsWith('.yml') ? `${pattern.slice(0, -4)}.yaml` : null;
    try {
        if (twin !== null) {
            try {
                const both = await repo.glob([pattern, twin]);
                // Every match of a pattern ending with the literal `.yml` ends with it, and every match of the twin with `.yaml`.
                return { matches: both.paths.filter((p) => p.endsWith('.yml')), twins: both.paths.filter((p) => p.endsWith('.yaml')), links: both.notEntered };
            }
            catch (error) {
                if (!(error instanceof core_errors/* InputError */.dz))
                    throw error;
                // The twin alone is over a cap: fall through to the pattern alone, whose error (if any) is the one to show.
            }
        }
        const alone = await repo.glob([pattern]);
        return { matches: alone.paths, twins: [], links: alone.notEntered };
    }
    catch (error) {
        if (!(error instanceof core_errors/* InputError */.dz) || error.location.file !== undefined)
            throw error;
        throw new core_errors/* InputError */.dz(error.code === DISCOVER_ERROR.outside ? DISCOVER_ERROR.globOutside : error.code, error.message, where);
    }
}
/** Up to {@link NAMES_LISTED} names, each cut to 80 characters, then how many more. */
function listNames(names) {
    const shown = names.slice(0, NAMES_LISTED).map((n) => (0,core_errors/* clip */.$Q)(n));
    return names.length > NAMES_LISTED ? `${shown.join(', ')} and ${names.length - NAMES_LISTED} more` : shown.join(', ');
}
/**
 * After loading: duplicate model names are an InputError naming both files.
 *
 * @param descriptors loaded descriptors, in run order
 * @throws InputError `duplicate-name` at the second descriptor's `name` line
 */
function checkUniqueNames(descriptors) {
    const seen = new Map();
    for (const d of descriptors) {
        const first = seen.get(d.name);
        if (first) {
            throw new core_errors/* InputError */.dz(DISCOVER_ERROR.duplicateName, `model name ${(0,core_errors/* quoteValue */.cl)(d.name)} is also used by ${(0,core_errors/* clip */.$Q)(first.file)}:${first.nameLine}; expected a name unique in the repository`, { file: d.file, line: d.nameLine, key: 'name' });
        }
        seen.set(d.name, d);
    }
}
function normaliseGiven(given) {
    const p = given.replace(/\\/g, '/');
    const normal = external_node_path_.posix.normalize(p).replace(/^(\.\/)+/, '');
    if (p.startsWith('/') || /^[A-Za-z]:/.test(p) || normal === '..' || normal.startsWith('../')) {
        throw new core_errors/* InputError */.dz(DISCOVER_ERROR.outside, 'is outside the repository; expected a path relative to the repository root', { file: given });
    }
    return normal;
}

;// CONCATENATED MODULE: ./src/config/descriptor.ts
/**
 * A model descriptor (`*.model.yml`): YAML to a validated {@link Descriptor} with data paths
 * resolved inside the repository, `fit` defaults applied and limits merged.
 */








/** Most centres one `rbf` term may have (also the schema's cap on `count`). */
const MAX_RBF_CENTERS = 10_000;
/** Stable codes of the errors this module throws (besides YAML, schema and limit codes). */
const DESCRIPTOR_ERROR = Object.freeze({
    dataMissing: 'file-missing',
    notAFile: repo_path/* NOT_A_FILE */.bd,
    centers: 'rbf-centers',
});
/**
 * Loads one descriptor, validates it, resolves data paths (relative to the descriptor's
 * folder, via repo.resolve: never outside the repository, links included), applies settings
 * fit defaults and merges limits defaults < settings < descriptor key by key.
 *
 * @param repo the repository
 * @param path repository-relative descriptor path
 * @param settings the loaded settings file (fit defaults and limits)
 * @throws InputError YAML errors, `schema`, `limit-order`, `rbf-centers`, `path-outside`, `file-missing`
 */
async function loadDescriptor(repo, path, settings) {
    const doc = await readYamlFile(repo, path);
    const descriptor = descriptorFromDocument(doc, path, settings);
    for (const which of ['train', 'holdout']) {
        const key = ['data', which];
        const at = doc.valuePositionOf(key);
        const where = { line: at?.line ?? descriptor.data.lines[which], column: at?.column ?? 1, key: `data.${which}` };
        const resolved = await repo.resolve(path, descriptor.data[which], where);
        const kind = await repo.entryKind(resolved);
        if (kind === 'missing') {
            throw errorAt(doc, path, DESCRIPTOR_ERROR.dataMissing, key, `${showValue(descriptor.data[which])} (${(0,core_errors/* clip */.$Q)(resolved)}) is not a file in ${repo.label}; expected a CSV path relative to this descriptor's folder`);
        }
        if (kind !== 'file') {
            throw errorAt(doc, path, DESCRIPTOR_ERROR.notAFile, key, `${showValue(descriptor.data[which])} (${(0,core_errors/* clip */.$Q)(resolved)}) ${(0,repo_path/* kindWords */.Gk)(kind)}; expected a CSV file relative to this descriptor's folder`);
        }
        descriptor.data[which] = resolved;
    }
    return descriptor;
}
/**
 * Validates a parsed descriptor and builds the {@link Descriptor}; data paths are left as
 * written (see {@link loadDescriptor}, which resolves them).
 *
 * @param doc the parsed YAML
 * @param file repository-relative descriptor path
 * @param settings the loaded settings file
 */
function descriptorFromDocument(doc, file, settings) {
    const errors = validateDescriptorValue(doc.value);
    if (errors)
        throw schemaError(errors, doc, file);
    const raw = doc.value;
    const line = (path) => doc.positionOf(path)?.line ?? 1;
    const terms = raw.terms.map((term, index) => readTerm(doc, file, term, index, line(['terms', index])));
    const termsLine = line(['terms']);
    const fitLine = raw.fit ? line(['fit']) : termsLine;
    const limits = readLimits(doc, file, raw.limits, ['limits']);
    return {
        file,
        name: raw.name,
        task: raw.task ?? 'regression',
        data: {
            train: raw.data.train,
            holdout: raw.data.holdout,
            target: raw.data.target,
            lines: { train: line(['data', 'train']), holdout: line(['data', 'holdout']), target: line(['data', 'target']) },
        },
        terms,
        fit: {
            intercept: raw.fit?.intercept ?? true,
            ridge: raw.fit?.ridge ?? 0,
            folds: raw.fit?.folds ?? settings.fit.folds,
            foldOrder: raw.fit?.fold_order ?? settings.fit.foldOrder,
            seed: raw.fit?.seed ?? settings.fit.seed,
            parameterCount: raw.fit?.parameter_count ?? settings.fit.parameterCount,
            line: fitLine,
            ridgeLine: raw.fit?.ridge !== undefined ? line(['fit', 'ridge']) : fitLine,
        },
        coefficients: raw.coefficients ? [...raw.coefficients] : null,
        coefficientsLine: raw.coefficients ? line(['coefficients']) : null,
        limits: mergeLimits(settings, limits),
        nameLine: line(['name']),
        termsLine,
    };
}
function readTerm(doc, file, term, index, line) {
    if ('linear' in term)
        return { kind: 'linear', columns: [...term.linear], line };
    if ('polynomial' in term) {
        const p = term.polynomial;
        return { kind: 'polynomial', of: p.of, degree: p.degree, shift: p.shift ?? null, scale: p.scale ?? null, line };
    }
    const r = term.rbf;
    return { kind: 'rbf', of: r.of, centers: readCenters(doc, file, r.centers, ['terms', index, 'rbf', 'centers']), width: r.width, line };
}
function readCenters(doc, file, centers, at) {
    if (centers === 'at-samples')
        return { kind: 'at-samples' };
    if (Array.isArray(centers))
        return { kind: 'list', values: [...centers] };
    if (centers.to < centers.from) {
        throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'to'], `\`to\` ${showValue(centers.to)} is below \`from\` ${showValue(centers.from)}; expected from <= to`);
    }
    if ('count' in centers) {
        if (centers.count > 1 && centers.to === centers.from) {
            throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'count'], `${centers.count} centres from ${centers.from} to ${centers.to} would all coincide; expected from < to or count 1`);
        }
        return { kind: 'count', from: centers.from, to: centers.to, count: centers.count };
    }
    const n = Math.floor((centers.to - centers.from) / centers.step) + 1;
    if (!(n <= MAX_RBF_CENTERS)) {
        throw errorAt(doc, file, DESCRIPTOR_ERROR.centers, [...at, 'step'], `step ${showValue(centers.step)} gives ${Number.isFinite(n) ? n : 'too many'} centres from ${centers.from} to ${centers.to}; expected at most ${MAX_RBF_CENTERS}`);
    }
    return { kind: 'step', from: centers.from, to: centers.to, step: centers.step };
}

// EXTERNAL MODULE: ./src/kernels/index.ts + 10 modules
var kernels = __nccwpck_require__(8667);
;// CONCATENATED MODULE: ./src/run/error-result.ts
/**
 * The outcome of a model that could not be checked: verdict `error` with the file, line and code.
 */

/** Error code of a model that failed through a fault in fitgate rather than in its files. */
const INTERNAL_ERROR = 'internal-error';
/**
 * The outcome of a model that could not be checked. The message starts with the key path
 * (`` `terms[0].polynomial.degree`: ``) when the error has one, as {@link InputError.describe}
 * does, since the result keeps only the file and line of the location.
 */
function errorResult(name, descriptor, error) {
    const key = error.location.key;
    return {
        name,
        descriptor,
        verdict: 'error',
        rows: { train: 0, holdout: 0 },
        parameters: 0,
        columns: [],
        metrics: null,
        coefficients: [],
        shipped: null,
        checks: [],
        error: {
            message: key !== undefined && key !== '' ? `\`${(0,core_errors/* clip */.$Q)(key)}\`: ${error.message}` : error.message,
            file: error.location.file ?? null,
            line: error.location.line ?? null,
            code: error.code,
        },
    };
}

;// CONCATENATED MODULE: external "node:url"
const external_node_url_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:url");
// EXTERNAL MODULE: external "node:worker_threads"
var external_node_worker_threads_ = __nccwpck_require__(5919);
// EXTERNAL MODULE: ./src/checks/index.ts + 14 modules
var src_checks = __nccwpck_require__(1093);
// EXTERNAL MODULE: ./src/diagnostics/cross-validation.ts
var cross_validation = __nccwpck_require__(7114);
// EXTERNAL MODULE: ./src/diagnostics/folds.ts
var diagnostics_folds = __nccwpck_require__(9236);
// EXTERNAL MODULE: ./src/diagnostics/random.ts
var random = __nccwpck_require__(5089);
;// CONCATENATED MODULE: ./src/diagnostics/leakage.ts

/** How many line numbers of each file to report. */
const LEAKAGE_EXAMPLE_LINES = 5;
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
/**
 * 32-bit hash of the bit patterns of row i's values (-0 counts as 0): each 32-bit half is folded
 * in with one multiply (golden-ratio and MurmurHash3 constants, Appleby 2011), then the lowbias32
 * finaliser (Wellons 2018) spreads the bits once per row. Matches are always confirmed by exact
 * comparison, so the hash only has to spread rows over the table.
 */
function rowHash(columns, i) {
    let h = 0x811c9dc5;
    for (let c = 0; c < columns.length; c++) {
        f64[0] = columns[c][i] + 0; // -0 + 0 === +0: equal values hash equal
        h = Math.imul(h ^ u32[0], 0x9e3779b1);
        h = Math.imul((h ^ (h >>> 15)) ^ u32[1], 0x85ebca6b);
        h ^= h >>> 13;
    }
    return (0,random/* mix32 */.QV)(h);
}
function sameInputs(a, i, b, j) {
    for (let c = 0; c < a.length; c++)
        if (a[c][i] !== b[c][j])
            return false;
    return true;
}
/** The slot of `hash`: where it is, or the empty slot where it goes. */
function findSlot(table, hash) {
    const { slotHead, slotHash, mask } = table;
    let s = (Math.imul(hash, 0x9e3779b1) >>> 0) & mask;
    while (slotHead[s] >= 0 && slotHash[s] !== hash)
        s = (s + 1) & mask;
    return s;
}
// The two passes are functions of their own, one loop each (see DEVELOPERS.md, "Writing hot loops").
/** Puts rows 0..n-1 in the table, so that each chain lists its rows in file order. */
function indexRows(table, inputs, n) {
    for (let r = n - 1; r >= 0; r--) {
        const hash = rowHash(inputs, r);
        const s = findSlot(table, hash);
        table.next[r] = table.slotHead[s];
        table.slotHash[s] = hash;
        table.slotHead[s] = r;
    }
}
/**
 * Streams the training rows past the table of hold-out rows in file order: firstMatch[r] receives
 * the first training row whose inputs equal hold-out row r's, targetToo[r] = 1 when some such row
 * has its target too.
 */
function matchRows(table, holdout, train, firstMatch, targetToo) {
    for (let i = 0; i < train.rows; i++) {
        let r = table.slotHead[findSlot(table, rowHash(train.inputs, i))];
        while (r >= 0) {
            if (sameInputs(holdout.inputs, r, train.inputs, i)) {
                if (firstMatch[r] < 0)
                    firstMatch[r] = i;
                if (holdout.y[r] === train.y[i])
                    targetToo[r] = 1;
            }
            r = table.next[r];
        }
    }
}
/**
 * Finds hold-out rows equal to a training row in every input column of the model (values compared
 * exactly, as parsed doubles; -0 equals 0), and among them those whose target is equal too.
 * Cost: one pass over each file plus exact comparisons on hash hits; memory one hash table of the
 * hold-out rows (typed arrays, about 20 bytes per row).
 *
 * @param train training rows (inputs in the model's order, targets, lines)
 * @param holdout hold-out rows (same input order)
 */
function findLeakage(train, holdout) {
    const columns = train.inputs.length;
    // A hash table of the hold-out rows (the smaller file, usually); the training rows then stream
    // past it in file order, so each hold-out row's first match is the earliest training row.
    const h = holdout.rows;
    let size = 1024;
    while (size < 2 * h)
        size *= 2;
    const table = { mask: size - 1, slotHash: new Uint32Array(size), slotHead: new Int32Array(size).fill(-1), next: new Int32Array(h).fill(-1) };
    indexRows(table, holdout.inputs, h);
    const firstMatch = new Int32Array(h).fill(-1);
    const targetToo = new Uint8Array(h);
    if (h > 0)
        matchRows(table, holdout, train, firstMatch, targetToo);
    let inputMatches = 0;
    let fullMatches = 0;
    const holdoutLines = [];
    const trainLines = [];
    for (let r = 0; r < h; r++) {
        if (firstMatch[r] < 0)
            continue;
        inputMatches++;
        if (targetToo[r] === 1)
            fullMatches++;
        if (holdoutLines.length < LEAKAGE_EXAMPLE_LINES) {
            holdoutLines.push(holdout.lines[r]);
            trainLines.push(train.lines[firstMatch[r]]);
        }
    }
    return { inputMatches, fullMatches, holdoutLines, trainLines, holdoutRows: holdout.rows, columns };
}

// EXTERNAL MODULE: ./src/design/design-matrix.ts
var design_matrix = __nccwpck_require__(6566);
// EXTERNAL MODULE: ./src/design/blocks.ts
var blocks = __nccwpck_require__(7254);
// EXTERNAL MODULE: ./src/design/stats.ts
var stats = __nccwpck_require__(6801);
;// CONCATENATED MODULE: ./src/diagnostics/column-median.ts
/**
 * Medians of training columns, computed once per column and shared by every reader (swing,
 * charts): selection on a scratch copy, remembered per column array.
 */

const remembered = new WeakMap();
/**
 * Median of the first n values of a column: the middle value, or the mean of the two middle
 * values when n is even; NaN when n = 0. Remembered per column array (and n), so a second
 * reader gets it for free. The column is not modified.
 *
 * @param values the column (length >= n)
 * @param n rows to take
 * @param scratch optional work array of length >= n (default: a new one)
 */
function columnMedian(values, n, scratch) {
    const known = remembered.get(values);
    if (known !== undefined && known.n === n)
        return known.median;
    let median = Number.NaN;
    if (n > 0) {
        const s = scratch !== undefined && scratch.length >= n ? scratch.subarray(0, n) : new Float64Array(n);
        median = (n >= BRACKET_MIN_ROWS ? bracketedMedian(values, n, s) : null) ?? selectedMedian(values, n, s);
    }
    remembered.set(values, { n, median });
    return median;
}
/** Columns of at least this many rows try {@link bracketedMedian} first. */
const BRACKET_MIN_ROWS = 16384;
/** Rows in the bracketing sample. */
const BRACKET_SAMPLE = 2048;
/** Sample ranks on each side of the sample's middle that bound the bracket (about 9 standard deviations of the middle's rank). */
const BRACKET_HALF_WIDTH = 200;
/** The median by selection on a copy of all n values (in `work`, length >= n). */
function selectedMedian(values, n, work) {
    const s = work.subarray(0, n);
    s.set(values.subarray(0, n));
    return middleOf(s, n, n >> 1);
}
/**
 * The median of a[0..m) given that the wanted middle ranks are `upper` (and `upper - 1` when n is
 * even) of the whole column, counted from a's first value: selection on a.
 */
function middleOf(a, n, upper) {
    const value = selectKth(a, upper);
    if (n % 2 === 1)
        return value;
    // The lower middle is the largest value left of the upper middle after selection.
    return ((0,stats/* largest */.nQ)(a, upper) + value) / 2;
}
/**
 * The exact median in one pass over the column and a selection among a tenth of it: the middle
 * ranks are bracketed by two values of a sorted even-stride sample, the pass counts the values
 * below the bracket and gathers those inside it, and the middle is selected among those (the
 * sampling step of Floyd & Rivest, "Expected time bounds for selection", Communications of the ACM
 * 18(3), 1975). Returns null when the bracket misses a middle rank or holds too many values (the
 * caller then selects among all of them), so the result is always the exact median.
 */
function bracketedMedian(values, n, work) {
    const sample = new Float64Array(BRACKET_SAMPLE);
    for (let t = 0; t < BRACKET_SAMPLE; t++)
        sample[t] = values[Math.floor((t * n) / BRACKET_SAMPLE)];
    sample.sort();
    const lo = sample[BRACKET_SAMPLE / 2 - BRACKET_HALF_WIDTH];
    const hi = sample[BRACKET_SAMPLE / 2 + BRACKET_HALF_WIDTH];
    const inside = gatherBracket(values, n, lo, hi, work, Math.min(n, work.length));
    if (inside < 0)
        return null;
    const below = countBelow(values, n, lo);
    const upper = n >> 1;
    const lower = n % 2 === 1 ? upper : upper - 1;
    // Both middle ranks must fall among the gathered values.
    if (lower < below || upper >= below + inside)
        return null;
    return middleOf(work.subarray(0, inside), n, upper - below);
}
// The passes below are one loop and a return each (see DEVELOPERS.md, "Writing hot loops").
/**
 * One pass: copies the values in [lo, hi] to `out` (in column order) and returns how many; -1 when
 * more than `capacity` values fall in the bracket.
 */
function gatherBracket(values, n, lo, hi, out, capacity) {
    let inside = 0;
    for (let i = 0; i < n; i++) {
        const v = values[i];
        if (v >= lo && v <= hi) {
            if (inside === capacity)
                return -1;
            out[inside++] = v;
        }
    }
    return inside;
}
/** Values below `lo` among values[0..n). */
function countBelow(values, n, lo) {
    let below = 0;
    for (let i = 0; i < n; i++)
        if (values[i] < lo)
            below++;
    return below;
}
/**
 * k-th smallest value (0-based) of a, partially reordering it so that a[i] <= a[k] for i < k
 * (Hoare's selection, "FIND", Communications of the ACM 4(7), 1961; middle-of-three pivot).
 *
 * @param a values (reordered in place)
 * @param k rank, 0 <= k < a.length
 */
function selectKth(a, k) {
    let lo = 0;
    let hi = a.length - 1;
    while (hi > lo) {
        const mid = (lo + hi) >> 1;
        let x = a[lo];
        let y = a[mid];
        let z = a[hi];
        // Sort the three with plain swaps (no array literals: see DEVELOPERS.md, "Writing hot loops").
        let t;
        if (x > y) {
            t = x;
            x = y;
            y = t;
        }
        if (y > z) {
            t = y;
            y = z;
            z = t;
        }
        if (x > y) {
            t = x;
            x = y;
            y = t;
        }
        const pivot = y;
        let i = lo;
        let j = hi;
        while (i <= j) {
            while (a[i] < pivot)
                i++;
            while (a[j] > pivot)
                j--;
            if (i <= j) {
                const t = a[i];
                a[i] = a[j];
                a[j] = t;
                i++;
                j--;
            }
        }
        if (k <= j)
            hi = j;
        else if (k >= i)
            lo = i;
        else
            return a[k];
    }
    return a[k];
}

;// CONCATENATED MODULE: ./src/diagnostics/radix-sort.ts
/**
 * Sorting of large Float64Array columns: a distribution (bucket) sort when the values are spread
 * evenly, else a least-significant-digit radix sort on the IEEE 754 bit patterns (Knuth, The Art
 * of Computer Programming, vol. 3, 2nd ed., sec. 5.2.5); both several times faster than the
 * built-in typed-array sort on a million values (196 ms against 577 ms here), with the same
 * result.
 */
/**
 * Below this length the built-in sort is used: in a short run, where this code has not been
 * optimised yet, the built-in sort is faster up to about 50,000 values (measured here, one
 * process each: five columns of 20,000 values in 8 ms against 13-16 ms, of 100,000 in 44 ms
 * against 30 ms).
 */
const RADIX_FROM = 65536;
const LITTLE_ENDIAN = new Uint8Array(new Uint32Array([1]).buffer)[0] === 1;
/**
 * Sorts `a` ascending in place, in the order of `Float64Array.prototype.sort` (-0 before +0; the
 * columns sorted here hold no NaN) and returns it.
 *
 * Evenly spread values go by buckets of equal width ({@link bucketSort}). Otherwise the bit
 * pattern of each value becomes an unsigned key that orders like the number (sign bit
 * flipped for positives, every bit inverted for negatives), keys are sorted by four stable
 * counting passes of 16 bits (a pass is skipped when every key has the same digit), and the
 * patterns are turned back.
 *
 * @param a values (sorted in place)
 * @param scratch optional work array of length >= 2 * a.length (default: a new one)
 */
function sortFloat64(a, scratch) {
    const n = a.length;
    if (n < RADIX_FROM || !LITTLE_ENDIAN)
        return a.sort();
    const usable = scratch !== undefined && scratch.length >= 2 * n && scratch.byteOffset % 8 === 0;
    const work = usable ? scratch.subarray(0, 2 * n) : new Uint32Array(2 * n);
    if (bucketSort(a, new Float64Array(work.buffer, work.byteOffset, n)))
        return a;
    return radixSort(a, work);
}
/** Largest bucket {@link bucketSort} sorts by insertion; a larger one sends the column to the radix sort. */
const MAX_BUCKET = 48;
/** a < b in the order of the built-in sort (-0 before +0). */
function before(a, b) {
    return a < b || (a === 0 && b === 0 && Object.is(a, -0) && !Object.is(b, -0));
}
/**
 * Distribution sort for evenly spread values (Knuth, vol. 3, sec. 5.2.5 again: sorting by
 * address calculation): about n/4 buckets of equal width between the extremes (the bucket index
 * never decreases as the value grows), then insertion sort in each bucket. Returns false, with
 * `a` unchanged, when the values are not spread evenly enough (a bucket over MAX_BUCKET values)
 * or the extremes are not usable; the caller then sorts another way.
 */
function bucketSort(a, out) {
    const n = a.length;
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < n; i++) {
        const v = a[i];
        if (v < lo)
            lo = v;
        if (v > hi)
            hi = v;
    }
    const buckets = n >> 2;
    const scale = buckets / (hi - lo);
    if (!(hi > lo) || !Number.isFinite(scale) || !(scale > 0))
        return false;
    const start = new Int32Array(buckets + 1);
    const last = buckets - 1;
    for (let i = 0; i < n; i++) {
        const b = Math.min(last, Math.floor((a[i] - lo) * scale));
        start[b + 1]++;
    }
    for (let b = 0; b < buckets; b++) {
        if (start[b + 1] > MAX_BUCKET)
            return false;
        start[b + 1] += start[b];
    }
    const fill = start.slice(0, buckets);
    for (let i = 0; i < n; i++) {
        const v = a[i];
        const b = Math.min(last, Math.floor((v - lo) * scale));
        out[fill[b]++] = v;
    }
    for (let b = 0; b < buckets; b++) {
        const end = start[b + 1];
        for (let i = start[b] + 1; i < end; i++) {
            const v = out[i];
            let j = i - 1;
            while (j >= start[b] && before(v, out[j])) {
                out[j + 1] = out[j];
                j--;
            }
            out[j + 1] = v;
        }
    }
    a.set(out);
    return true;
}
/** The radix sort of {@link sortFloat64} (any values; `scratch` holds 2n words). */
function radixSort(a, scratch) {
    const n = a.length;
    const u = new Uint32Array(a.buffer, a.byteOffset, 2 * n);
    const counts = new Uint32Array(4 * 65536);
    for (let i = 0; i < n; i++) {
        let lo = u[2 * i];
        let hi = u[2 * i + 1];
        if (hi & 0x80000000) {
            hi = ~hi >>> 0;
            lo = ~lo >>> 0;
        }
        else {
            hi = (hi | 0x80000000) >>> 0;
        }
        u[2 * i] = lo;
        u[2 * i + 1] = hi;
        counts[lo & 0xffff]++;
        counts[65536 + (lo >>> 16)]++;
        counts[131072 + (hi & 0xffff)]++;
        counts[196608 + (hi >>> 16)]++;
    }
    let src = u;
    let dst = scratch;
    for (let d = 0; d < 4; d++) {
        const base = d * 65536;
        const word = d < 2 ? 0 : 1;
        const shift = d % 2 === 0 ? 0 : 16;
        const firstDigit = (src[word] >>> shift) & 0xffff;
        if (counts[base + firstDigit] === n)
            continue; // every key has this digit
        let sum = 0;
        for (let b = 0; b < 65536; b++) {
            const c = counts[base + b];
            counts[base + b] = sum;
            sum += c;
        }
        for (let i = 0; i < n; i++) {
            const digit = (src[2 * i + word] >>> shift) & 0xffff;
            const pos = counts[base + digit]++;
            dst[2 * pos] = src[2 * i];
            dst[2 * pos + 1] = src[2 * i + 1];
        }
        const t = src;
        src = dst;
        dst = t;
    }
    if (src !== u)
        u.set(src);
    for (let i = 0; i < n; i++) {
        const hi = u[2 * i + 1];
        if (hi & 0x80000000) {
            u[2 * i + 1] = (hi & 0x7fffffff) >>> 0;
        }
        else {
            u[2 * i + 1] = ~hi >>> 0;
            u[2 * i] = ~u[2 * i] >>> 0;
        }
    }
    return a;
}

;// CONCATENATED MODULE: ./src/diagnostics/nearest-neighbours.ts
/**
 * The k nearest neighbours of every point of a small set (the swing scan's sampled rows), exactly
 * as a search over all pairs finds them, through a k-d tree (Bentley, "Multidimensional binary
 * search trees used for associative searching", Communications of the ACM 18(9), 1975).
 */
/** Points per leaf of the tree. */
const LEAF_SIZE = 8;
/**
 * Pairs (row, neighbour) of each point and its `kk` nearest other points by squared Euclidean
 * distance, summed over the coordinates in order (exact duplicates, distance 0, are skipped;
 * equal distances: the lower index first).
 *
 * The search descends the tree to the point's own leaf first and visits a subtree on the other
 * side of a split only when the distance to the split plane, squared, is at most the k-th best
 * distance so far: every point there is at least that far in that coordinate alone, and a sum of
 * squares is at least any of its terms (in floating point too, as rounding is monotone). So the
 * result is the result of the search over all s x s pairs.
 *
 * @param flat coordinates, row-major: flat[a * d + c]
 * @param s points
 * @param d coordinates per point
 * @param kk neighbours per point (at most s - 1)
 * @param rows the training row of each point
 * @returns flat pairs [row, neighbour, row, neighbour, ...] of training rows, points in order and
 *   each point's neighbours nearest first
 */
function nearestPairs(flat, s, d, kk, rows) {
    const pairs = new Int32Array(2 * s * Math.max(kk, 0));
    if (s < 2 || kk < 1 || d < 1)
        return pairs.subarray(0, 0);
    const tree = buildTree(flat, s, d);
    let count = 0;
    const best = new Float64Array(kk);
    const bestIdx = new Int32Array(kk);
    for (let a = 0; a < s; a++) {
        best.fill(Infinity);
        bestIdx.fill(-1);
        searchTree(tree, 0, flat, d, a, kk, best, bestIdx);
        for (let t = 0; t < kk; t++) {
            if (bestIdx[t] < 0)
                continue;
            pairs[count++] = rows[a];
            pairs[count++] = rows[bestIdx[t]];
        }
    }
    return pairs.subarray(0, count);
}
/** Builds the tree: each node splits its points at the median of its widest coordinate. */
function buildTree(flat, s, d) {
    const capacity = 2 * Math.ceil(s / (LEAF_SIZE / 2)) + 1;
    const tree = {
        idx: Int32Array.from({ length: s }, (_, a) => a),
        lo: new Int32Array(capacity),
        hi: new Int32Array(capacity),
        mid: new Int32Array(capacity),
        dim: new Int32Array(capacity),
        value: new Float64Array(capacity),
        left: new Int32Array(capacity),
        right: new Int32Array(capacity),
    };
    let nodes = 0;
    const make = (lo, hi) => {
        const node = nodes++;
        tree.lo[node] = lo;
        tree.hi[node] = hi;
        tree.left[node] = -1;
        tree.right[node] = -1;
        tree.dim[node] = -1;
        if (hi - lo <= LEAF_SIZE)
            return node;
        const c = widestCoordinate(flat, d, tree.idx, lo, hi);
        if (c < 0)
            return node; // every point equal: a leaf
        const mid = (lo + hi) >> 1;
        selectByCoordinate(flat, d, c, tree.idx, lo, hi, mid);
        tree.dim[node] = c;
        tree.mid[node] = mid;
        tree.value[node] = flat[tree.idx[mid] * d + c];
        tree.left[node] = make(lo, mid);
        tree.right[node] = make(mid, hi);
        return node;
    };
    make(0, s);
    return tree;
}
/** The coordinate with the widest range over idx[lo..hi), or -1 when every range is 0. */
function widestCoordinate(flat, d, idx, lo, hi) {
    let bestDim = -1;
    let bestWidth = 0;
    for (let c = 0; c < d; c++) {
        let min = Infinity;
        let max = -Infinity;
        for (let t = lo; t < hi; t++) {
            const v = flat[idx[t] * d + c];
            if (v < min)
                min = v;
            if (v > max)
                max = v;
        }
        if (max - min > bestWidth) {
            bestWidth = max - min;
            bestDim = c;
        }
    }
    return bestDim;
}
/**
 * Reorders idx[lo..hi) so that idx[k] holds the point whose coordinate c has rank k - lo, points
 * before it no greater and points after it no smaller in that coordinate (Hoare's selection).
 */
function selectByCoordinate(flat, d, c, idx, lo, hi, k) {
    let l = lo;
    let r = hi - 1;
    while (r > l) {
        const pivot = flat[idx[(l + r) >> 1] * d + c];
        let i = l;
        let j = r;
        while (i <= j) {
            while (flat[idx[i] * d + c] < pivot)
                i++;
            while (flat[idx[j] * d + c] > pivot)
                j--;
            if (i <= j) {
                const t = idx[i];
                idx[i] = idx[j];
                idx[j] = t;
                i++;
                j--;
            }
        }
        if (k <= j)
            r = j;
        else if (k >= i)
            l = i;
        else
            return;
    }
}
/**
 * The k nearest points of point a within `node`'s subtree, merged into best (distances) and
 * bestIdx (points), nearest first: the side of each split that holds a first, the other side only
 * when the squared distance to the split can still be at most the k-th best. Points equal to the
 * split value may sit on either side, so a gap of 0 visits both.
 */
function searchTree(tree, node, flat, d, a, kk, best, bestIdx) {
    const c = tree.dim[node];
    if (c < 0) {
        for (let t = tree.lo[node]; t < tree.hi[node]; t++) {
            const b = tree.idx[t];
            if (b !== a)
                considerNeighbour(flat, d, a, b, kk, best, bestIdx);
        }
        return;
    }
    const diff = flat[a * d + c] - tree.value[node];
    searchTree(tree, diff < 0 ? tree.left[node] : tree.right[node], flat, d, a, kk, best, bestIdx);
    if (diff * diff <= best[kk - 1])
        searchTree(tree, diff < 0 ? tree.right[node] : tree.left[node], flat, d, a, kk, best, bestIdx);
}
/**
 * Puts point b into point a's list of the kk nearest (sorted by distance, then index) when it
 * belongs there; the distance is summed over the coordinates in order, as the list's entries were.
 */
function considerNeighbour(flat, d, a, b, kk, best, bestIdx) {
    const limit = best[kk - 1];
    const ra = a * d;
    const rb = b * d;
    let dist = 0;
    // Partial sums only grow: once one passes the k-th best, the point cannot enter.
    for (let c = 0; c < d && dist <= limit; c++) {
        const t = flat[ra + c] - flat[rb + c];
        dist += t * t;
    }
    if (dist === 0 || dist > limit || (dist === limit && b > bestIdx[kk - 1]))
        return;
    let pos = kk - 1;
    while (pos > 0 && (best[pos - 1] > dist || (best[pos - 1] === dist && bestIdx[pos - 1] > b))) {
        best[pos] = best[pos - 1];
        bestIdx[pos] = bestIdx[pos - 1];
        pos--;
    }
    best[pos] = dist;
    bestIdx[pos] = b;
}

;// CONCATENATED MODULE: ./src/diagnostics/swing.ts
/**
 * Swing between and beyond samples: how far a model's predictions leave the band of observed
 * training targets on inputs between the training rows and just past their range.
 */






/**
 * Excursion of predictions outside the band [lo, hi] in units of its width:
 * max(0, max(pred) - hi, lo - min(pred)) / (hi - lo). NaN when hi <= lo or no predictions.
 */
function excursion(prediction, lo, hi) {
    if (!(hi > lo) || prediction.length === 0)
        return Number.NaN;
    let worst = 0;
    for (let i = 0; i < prediction.length; i++) {
        const v = prediction[i];
        const e = Number.isNaN(v) ? Infinity : Math.max(v - hi, lo - v);
        if (e > worst)
            worst = e;
    }
    return worst / (hi - lo);
}
/**
 * Grid across one input's range: `uniform` evenly spaced points from min to max, plus `perGap`
 * evenly spaced interior points in each gap between neighbouring distinct values (in the
 * `maxGaps` widest gaps when there are more; at least one per gap), plus `marginPoints` on each
 * side up to `margin` x range outside. Sorted, without duplicates.
 *
 * @param values the input's training values (any order; not modified)
 * @returns inside and beyond points, ascending; empty when the input has no spread
 */
function inputGrid(values, options = {}) {
    const sorted = Float64Array.from(values).sort();
    return gridFromSorted(sorted, sorted.length, options);
}
/**
 * {@link inputGrid} from the input's values already sorted ascending in `sorted[0..n)`; the
 * array is overwritten (its distinct values are packed to the front).
 */
function gridFromSorted(sorted, n, options, work) {
    const perGap = options.perGap ?? 8;
    const uniform = options.uniform ?? 201;
    const margin = options.margin ?? 0.1;
    const marginPoints = options.marginPoints ?? 40;
    const maxGaps = options.maxGaps ?? 4000;
    const count = packDistinct(sorted, n);
    const distinct = sorted.subarray(0, count);
    if (count < 2)
        return { inside: new Float64Array(0), beyond: new Float64Array(0) };
    const lo = distinct[0];
    const hi = distinct[count - 1];
    const width = hi - lo;
    const gaps = widestGaps(distinct, maxGaps, work);
    const per = Math.max(1, Math.min(perGap, Math.floor((maxGaps * perGap) / gaps.length)));
    const inside = new Float64Array(uniform + gaps.length * per);
    fillUniform(inside, uniform, lo, hi);
    const w = fillGaps(inside, uniform, distinct, gaps, per);
    const beyond = marginGrid(lo, hi, margin * width, marginPoints);
    return { inside: unique(inside, w), beyond: unique(beyond, beyond.length) };
}
// The loops of the grid are functions of their own, each a loop and its return (see
// DEVELOPERS.md, "Writing hot loops").
/** Packs the distinct values of the ascending a[0..n) to its front; returns how many. */
function packDistinct(a, n) {
    let count = 0;
    for (let i = 0; i < n; i++)
        if (count === 0 || a[i] !== a[count - 1])
            a[count++] = a[i];
    return count;
}
/** The distinct values of xs[0..length), ascending (xs is reordered). */
function unique(xs, length) {
    const u = sortFloat64(xs.subarray(0, length));
    return u.slice(0, packDistinct(u, u.length));
}
/** out[0..count): count evenly spaced points from lo to hi, both included (hi exactly). */
function fillUniform(out, count, lo, hi) {
    const width = hi - lo;
    for (let t = 0; t < count; t++)
        out[t] = t === count - 1 ? hi : lo + (width * t) / Math.max(1, count - 1);
}
/** Writes `per` points inside each listed gap of `distinct` from out[at]; returns the next free index. */
function fillGaps(out, at, distinct, gaps, per) {
    let w = at;
    for (let g = 0; g < gaps.length; g++) {
        const a = distinct[gaps[g]];
        const b = distinct[gaps[g] + 1];
        for (let t = 1; t <= per; t++)
            out[w++] = a + ((b - a) * t) / (per + 1);
    }
    return w;
}
/** `count` points on each side of [lo, hi], at (t / count) of `reach` for t = 1..count, alternating below and above. */
function marginGrid(lo, hi, reach, count) {
    const beyond = new Float64Array(2 * count);
    for (let t = 1; t <= count; t++) {
        const d = (reach * t) / count;
        beyond[2 * t - 2] = lo - d;
        beyond[2 * t - 1] = hi + d;
    }
    return beyond;
}
/**
 * Indices g of the `maxGaps` widest gaps distinct[g + 1] - distinct[g] (ties: lower g first), in
 * ascending g; all gaps when there are no more than `maxGaps`. Linear time: the threshold width
 * is found by selection ({@link select}) on one typed array of the widths.
 */
function widestGaps(distinct, maxGaps, work) {
    const count = distinct.length - 1;
    if (count <= maxGaps)
        return Int32Array.from({ length: count }, (_, g) => g);
    const widths = work !== undefined && work.length >= count ? work.subarray(0, count) : new Float64Array(count);
    gapWidths(distinct, count, widths);
    const threshold = selectKth(widths, count - maxGaps);
    const out = new Int32Array(maxGaps);
    pickGaps(distinct, count, threshold, maxGaps - gapsWiderThan(distinct, count, threshold), out);
    return out;
}
// One loop per function (see DEVELOPERS.md, "Writing hot loops").
/** widths[g] = distinct[g + 1] - distinct[g] for g < count. */
function gapWidths(distinct, count, widths) {
    for (let g = 0; g < count; g++)
        widths[g] = distinct[g + 1] - distinct[g];
}
/** How many of the first `count` gaps are wider than `threshold`. */
function gapsWiderThan(distinct, count, threshold) {
    let above = 0;
    for (let g = 0; g < count; g++)
        if (distinct[g + 1] - distinct[g] > threshold)
            above++;
    return above;
}
/** Writes to `out`, ascending, every gap wider than `threshold` and the first `ties` gaps equal to it. */
function pickGaps(distinct, count, threshold, ties, out) {
    let left = ties;
    let w = 0;
    for (let g = 0; g < count; g++) {
        const width = distinct[g + 1] - distinct[g];
        if (width > threshold || (width === threshold && left-- > 0))
            out[w++] = g;
    }
}
/**
 * Copies the values an input's grid is built from into `out` and returns how many: every row
 * when there are at most `max`, else `max - 2` rows at an even stride plus the smallest and the
 * largest value. Large files have gaps far narrower than any swing, so the sample loses nothing
 * the figure could show and saves sorting millions of values.
 */
function gridSample(column, n, max, out) {
    if (n <= max) {
        out.set(column.subarray(0, n));
        return n;
    }
    const [lo, hi] = (0,stats/* range */.y1)(column, n);
    const strided = max - 2;
    out[strided] = lo;
    out[strided + 1] = hi;
    stridedSample(column, n, strided, out);
    return max;
}
/** out[t] = column[floor(t n / count)] for t = 0 .. count-1. */
function stridedSample(column, n, count, out) {
    for (let t = 0; t < count; t++)
        out[t] = column[Math.floor((t * n) / count)];
}
/** Indices of at most `count` points (ascending) spread evenly, always keeping `keep`. */
function thinIndices(length, count, keep) {
    if (length <= count)
        return Array.from({ length }, (_, i) => i);
    const chosen = new Set(keep.filter((i) => i >= 0 && i < length));
    const slots = Math.max(2, count - chosen.size);
    for (let t = 0; t < slots; t++)
        chosen.add(Math.round((t * (length - 1)) / (slots - 1)));
    return [...chosen].sort((a, b) => a - b);
}
/**
 * Predictions along input c with every other input fixed, as a function of that input's values:
 * terms that do not read input c add the same amount at every point, so they are evaluated once
 * (at the fixed values) and only the terms that read c are filled per point. A model whose every
 * term reads c is predicted with its whole design, as {@link predictRows} does.
 *
 * @param design the fitted design
 * @param coefficients fitted coefficients (length p)
 * @param c index of the varying input in `design.inputs`
 * @param fixed value of every input (entry c is ignored)
 * @returns predict(xs): predictions at the points xs of input c
 */
function predictorAlong(design, coefficients, c, fixed) {
    const name = design.inputs[c];
    const varying = design.terms.map((t) => t.inputs.includes(name));
    const constantColumns = (n) => design.inputs.map((_, k) => new Float64Array(n).fill(fixed[k]));
    if (varying.every(Boolean)) {
        return (xs) => {
            const columns = constantColumns(xs.length);
            columns[c] = xs;
            return (0,blocks/* predictRows */.tp)(design, { inputs: columns, rows: xs.length }, coefficients);
        };
    }
    // The fixed part: intercept plus every term that does not read input c, at the fixed values.
    const row = design.fill(constantColumns(1), 0, 1);
    let base = design.intercept ? coefficients[0] : 0;
    const sub = [];
    design.terms.forEach((t, i) => {
        const first = design.termOffsets[i];
        const width = t.columnNames.length;
        for (let j = first; j < first + width; j++) {
            if (varying[i])
                sub.push(coefficients[j]);
            else
                base += row[j] * coefficients[j];
        }
    });
    const partial = (0,design_matrix/* createDesign */.x)(design.terms.filter((_, i) => varying[i]), false);
    const fixedByName = new Map(design.inputs.map((input, k) => [input, fixed[k]]));
    return (xs) => {
        const columns = partial.inputs.map((input) => (input === name ? xs : new Float64Array(xs.length).fill(fixedByName.get(input) ?? Number.NaN)));
        const out = (0,blocks/* predictRows */.tp)(partial, { inputs: columns, rows: xs.length }, sub);
        for (let i = 0; i < out.length; i++)
            out[i] += base;
        return out;
    };
}
/**
 * Merges two ascending point sets that never share a value (the margins lie outside the range)
 * with their predictions into xs and ps (length of both sets together): the order a stable sort
 * by x gives.
 */
function mergeAscending(ax, ap, bx, bp, xs, ps) {
    const na = ax.length;
    const nb = bx.length;
    for (let a = 0, b = 0, dst = 0; dst < na + nb; dst++) {
        if (b >= nb || (a < na && ax[a] <= bx[b])) {
            xs[dst] = ax[a];
            ps[dst] = ap[a++];
        }
        else {
            xs[dst] = bx[b];
            ps[dst] = bp[b++];
        }
    }
}
/** [index of the smallest, index of the largest] value (first of equals); [0, 0] when empty. */
function extremeIndices(values) {
    return [indexOfSmallest(values), indexOfLargest(values)];
}
// One loop per function (see DEVELOPERS.md, "Writing hot loops").
function indexOfSmallest(values) {
    let imin = 0;
    for (let i = 1; i < values.length; i++)
        if (values[i] < values[imin])
            imin = i;
    return imin;
}
function indexOfLargest(values) {
    let imax = 0;
    for (let i = 1; i < values.length; i++)
        if (values[i] > values[imax])
            imax = i;
    return imax;
}
/** Excursion of one prediction: max(0, v - hi, lo - v) / (hi - lo); Infinity for NaN. */
function pointExcursion(v, lo, hi) {
    return Number.isNaN(v) ? Infinity : Math.max(0, v - hi, lo - v) / (hi - lo);
}
/** The first index of pred[0..m) with the largest {@link pointExcursion}; 0 when none is larger than -Infinity. */
function worstExcursionIndex(pred, m, lo, hi) {
    let value = -Infinity;
    let index = 0;
    for (let i = 0; i < m; i++) {
        const e = pointExcursion(pred[i], lo, hi);
        if (e > value) {
            value = e;
            index = i;
        }
    }
    return index;
}
/**
 * The inputs of the sampled rows, each divided by its standard deviation over them after taking
 * off their mean (0 for an input without spread), row-major: flat[a * d + c] for the neighbour
 * search.
 */
function scaledRows(inputs, rows) {
    const s = rows.length;
    const d = inputs.length;
    const flat = new Float64Array(s * d);
    const v = new Float64Array(s);
    for (let c = 0; c < d; c++) {
        const col = inputs[c];
        for (let a = 0; a < s; a++)
            v[a] = col[rows[a]];
        let mean = 0;
        for (let a = 0; a < s; a++)
            mean += v[a] / s;
        let ss = 0;
        for (let a = 0; a < s; a++)
            ss += (v[a] - mean) * (v[a] - mean);
        const sd = Math.sqrt(ss / s);
        for (let a = 0; a < s; a++)
            flat[a * d + c] = sd > 0 ? (v[a] - mean) / sd : 0;
    }
    return flat;
}
/** `perSegment` evenly spaced points strictly inside each segment between a row and its neighbour, one column per input. */
function segmentPoints(inputs, pairs, perSegment) {
    const d = inputs.length;
    const segmentsCount = pairs.length / 2;
    const m = segmentsCount * perSegment;
    const columns = inputs.map(() => new Float64Array(m));
    for (let c = 0; c < d; c++)
        segmentsAlong(inputs[c], pairs, segmentsCount, perSegment, columns[c]);
    return columns;
}
/** One input's points inside every segment (pairs[2q] to pairs[2q + 1]), `perSegment` each, into `out`. */
function segmentsAlong(col, pairs, segmentsCount, perSegment, out) {
    for (let q = 0; q < segmentsCount; q++) {
        const from = col[pairs[2 * q]];
        const to = col[pairs[2 * q + 1]];
        for (let t = 1; t <= perSegment; t++)
            out[q * perSegment + t - 1] = from + (t / (perSegment + 1)) * (to - from);
    }
}
/**
 * The coefficient-independent part of {@link measureSwing}: band, medians, grids and segments.
 *
 * @param design the model's design (only its inputs are read)
 * @param train training rows (inputs in `design.inputs` order)
 * @param options grid sizes (see {@link SwingOptions})
 */
function planSwing(design, train, options = {}) {
    const n = train.rows;
    const d = design.inputs.length;
    const [ylo, yhi] = (0,stats/* range */.y1)(train.y, n);
    // One scratch buffer for every input: selection for the medians, then a typed sort for the grid.
    const scratch = new Float64Array(n);
    const medians = train.inputs.map((col) => columnMedian(col, n, scratch));
    const radixScratch = new Uint32Array(2 * n);
    const grids = [];
    const gridOptions = { ...options, maxGaps: Math.ceil((options.maxGaps ?? 4000) / Math.max(1, d)) };
    for (let c = 0; c < d; c++) {
        const len = gridSample(train.inputs[c], n, options.maxGridRows ?? 20_000, scratch);
        const sample = scratch.subarray(0, len);
        const grid = gridFromSorted(sortFloat64(sample, radixScratch), len, gridOptions, new Float64Array(radixScratch.buffer, 0, len));
        if (grid.inside.length > 0)
            grids.push({ input: c, inside: grid.inside, beyond: grid.beyond });
    }
    // Several inputs: segments between sampled rows and their nearest neighbours.
    let segments = null;
    let segmentColumns = null;
    if (d >= 2 && n >= 2) {
        const maxRows = options.maxRows ?? 1000;
        const kNear = options.neighbours ?? 3;
        const perSegment = options.segmentPoints ?? 8;
        const s = Math.min(n, maxRows);
        const rows = Int32Array.from({ length: s }, (_, t) => Math.floor((t * n) / s));
        const flat = scaledRows(train.inputs, rows);
        const kk = Math.min(kNear, s - 1);
        const pairs = nearestPairs(flat, s, d, kk, rows);
        if (pairs.length > 0 && perSegment > 0)
            segmentColumns = segmentPoints(train.inputs, pairs, perSegment);
        segments = { rows: s, neighbours: kk, pointsPerSegment: perSegment };
    }
    return { band: [ylo, yhi], medians, grids, segmentColumns, segments, margin: options.margin ?? 0.1, maxCurvePoints: options.maxCurvePoints ?? 400 };
}
/**
 * Scores a {@link SwingPlan} under the fitted coefficients: the swing figures and curves.
 *
 * @param plan from {@link planSwing} on the same design and rows
 * @param design the fitted design
 * @param coefficients fitted coefficients (length p)
 */
function scoreSwing(plan, design, coefficients) {
    const [ylo, yhi] = plan.band;
    const { medians, maxCurvePoints } = plan;
    let inside = 0;
    let beyond = 0;
    let insideCount = 0;
    let beyondCount = 0;
    let worstInside = null;
    let worstBeyond = null;
    const pointAt = (columns, i, prediction) => {
        // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
        const inputs = Object.create(null);
        design.inputs.forEach((name, c) => (inputs[name] = columns[c][i]));
        return { inputs, prediction };
    };
    /** Scores points (predicted here unless their predictions are given); returns the predictions. */
    const score = (columns, m, where, given) => {
        const pred = given ?? (0,blocks/* predictRows */.tp)(design, { inputs: columns, rows: m }, coefficients);
        if (m > 0) {
            const index = worstExcursionIndex(pred, m, ylo, yhi);
            const value = pointExcursion(pred[index], ylo, yhi);
            if (where === 'inside') {
                if (worstInside === null || value > inside) {
                    inside = Math.max(inside, value);
                    worstInside = pointAt(columns, index, pred[index]);
                }
            }
            else if (worstBeyond === null || value > beyond) {
                beyond = Math.max(beyond, value);
                worstBeyond = pointAt(columns, index, pred[index]);
            }
        }
        if (where === 'inside')
            insideCount += m;
        else
            beyondCount += m;
        return pred;
    };
    // Along each input, the others at their medians (one reused column of each median).
    const constants = medians.map(() => new Float64Array(0));
    const constant = (k, length) => {
        if (constants[k].length < length)
            constants[k] = new Float64Array(length).fill(medians[k]);
        return constants[k].subarray(0, length);
    };
    const curves = [];
    for (const grid of plan.grids) {
        const c = grid.input;
        const along = (xs) => design.inputs.map((_, k) => (k === c ? xs : constant(k, xs.length)));
        const predict = predictorAlong(design, coefficients, c, medians);
        const pin = score(along(grid.inside), grid.inside.length, 'inside', predict(grid.inside));
        const pout = score(along(grid.beyond), grid.beyond.length, 'beyond', predict(grid.beyond));
        // Curve for charts: all points ascending, thinned with the extremes kept.
        const xs = new Float64Array(grid.inside.length + grid.beyond.length);
        const ps = new Float64Array(xs.length);
        mergeAscending(grid.inside, pin, grid.beyond, pout, xs, ps);
        const [imin, imax] = extremeIndices(ps);
        const keep = thinIndices(xs.length, maxCurvePoints, [imax, imin]);
        const others = Object.create(null);
        design.inputs.forEach((name, k) => {
            if (k !== c)
                others[name] = medians[k];
        });
        curves.push({
            input: design.inputs[c],
            others,
            range: [grid.inside[0], grid.inside[grid.inside.length - 1]],
            x: keep.map((i) => xs[i]),
            prediction: keep.map((i) => ps[i]),
        });
    }
    if (plan.segmentColumns !== null)
        score(plan.segmentColumns, plan.segmentColumns[0].length, 'inside');
    const valid = ylo < yhi;
    return {
        inside: valid && insideCount > 0 ? inside : Number.NaN,
        beyond: valid && beyondCount > 0 ? beyond : Number.NaN,
        band: [ylo, yhi],
        points: { inside: insideCount, beyond: beyondCount },
        worstInside,
        worstBeyond,
        curves,
        segments: plan.segments,
        margin: plan.margin,
    };
}
/**
 * Measures swing between and beyond samples for a fitted model: {@link planSwing}, then
 * {@link scoreSwing}.
 *
 * One input: a dense grid across the training range ({@link inputGrid}). Several inputs: (a) the
 * same grid along each input with the other inputs at their training medians, and (b) points on
 * the segments between each of up to `maxRows` sampled training rows (an even stride through the
 * file) and its `neighbours` nearest sampled rows (Euclidean distance on inputs divided by their
 * standard deviations). Margins are along each input. The figure is {@link excursion} against the
 * band of training targets.
 *
 * @param design the fitted design
 * @param train training rows (inputs in `design.inputs` order)
 * @param coefficients fitted coefficients (length p)
 * @param options grid sizes (see {@link SwingOptions})
 */
function measureSwing(design, train, coefficients, options = {}) {
    return scoreSwing(planSwing(design, train, options), design, coefficients);
}

;// CONCATENATED MODULE: ./src/diagnostics/analyses.ts




/** One model's shared diagnostics, each computed on first use and kept. */
class ModelAnalyses {
    #inputs;
    #folds;
    #foldFactors;
    #crossValidation;
    #swing;
    #leakage;
    /**
     * @param inputs the model's design, fit and rows
     * @param known results of the run's own passes; default none
     */
    constructor(inputs, known = {}) {
        this.#inputs = inputs;
        this.#folds = known.folds;
        this.#foldFactors = known.foldFactors;
        this.#crossValidation = known.crossValidation ?? undefined;
    }
    /** The training rows' cross-validation folds (see {@link assignFolds}). */
    folds() {
        if (this.#folds === undefined) {
            const { folds, foldOrder, seed } = this.#inputs.folds;
            this.#folds = (0,diagnostics_folds/* assignFolds */.o)(this.#inputs.train.rows, folds, foldOrder, seed);
        }
        return this.#folds;
    }
    /** QR factors of each fold's training rows and of each fold's complement (one pass when not known). */
    foldFactors() {
        if (this.#foldFactors === undefined) {
            const perFold = (0,cross_validation/* foldFactors */.Y6)(this.#inputs.design, this.#inputs.train, this.folds());
            this.#foldFactors = { perFold, complements: (0,cross_validation/* complementFactors */.Zd)(perFold) };
        }
        return this.#foldFactors;
    }
    /** k-fold, leave-one-out and GCV figures of the refit (see {@link crossValidate}). */
    crossValidation() {
        if (this.#crossValidation === undefined) {
            const { perFold, complements } = this.foldFactors();
            const { design, train, fit } = this.#inputs;
            this.#crossValidation = (0,cross_validation/* crossValidate */.DJ)(design, train, fit, this.folds(), { factors: perFold, complements });
        }
        return this.#crossValidation;
    }
    /** Swing between and beyond the samples of the refit (see {@link measureSwing}). */
    swing() {
        this.#swing ??= measureSwing(this.#inputs.design, this.#inputs.train, this.#inputs.fit.coefficients);
        return this.#swing;
    }
    /** Hold-out rows that repeat a training row (see {@link findLeakage}). */
    leakage() {
        this.#leakage ??= findLeakage(this.#inputs.train, this.#inputs.holdout);
        return this.#leakage;
    }
}

// EXTERNAL MODULE: ./src/result/result.ts
var result_result = __nccwpck_require__(1628);
;// CONCATENATED MODULE: ./src/run/base-comparison.ts
/**
 * A model's figures against the same model (by name) on the base commit of a pull request.
 */

/** Relative change (head - base) / base; +Infinity when base is 0 and head is not; null when either is missing. */
function relativeChange(head, base) {
    if (Number.isNaN(head) || Number.isNaN(base))
        return null;
    if (base === 0)
        return head === 0 ? 0 : Infinity;
    return (head - base) / Math.abs(base);
}
/** The `base` field of a model result: `new`, or the base figures and the changes. */
function compareWithBase(metrics, baseline, commit) {
    if (baseline === null) {
        return { status: 'new', commit, holdout_rmse: null, gap_ratio: null, holdout_rmse_change: null, gap_ratio_change: null };
    }
    const b = baseline.metrics;
    const headRmse = (0,result_result/* fromJsonNumber */.M)(metrics.holdout_rmse);
    const headGap = (0,result_result/* fromJsonNumber */.M)(metrics.gap_ratio);
    const baseRmse = b ? (0,result_result/* fromJsonNumber */.M)(b.holdout_rmse) : Number.NaN;
    const baseGap = b ? (0,result_result/* fromJsonNumber */.M)(b.gap_ratio) : Number.NaN;
    const rmseChange = relativeChange(headRmse, baseRmse);
    const gapChange = Number.isNaN(headGap) || Number.isNaN(baseGap) ? null : headGap - baseGap;
    return {
        status: 'compared',
        commit,
        holdout_rmse: b ? b.holdout_rmse : null,
        gap_ratio: b ? b.gap_ratio : null,
        holdout_rmse_change: rmseChange === null ? null : (0,result_result/* jsonNumber */.qj)(rmseChange),
        gap_ratio_change: gapChange === null ? null : (0,result_result/* jsonNumber */.qj)(gapChange),
    };
}

;// CONCATENATED MODULE: ./src/run/base-curves.ts
/** True when two lists hold the same values in the same order. */
function same(a, b) {
    return a.length === b.length && a.every((v, i) => v === b[i]);
}
/** The base curve along the same input as `head`, or undefined when the base has none. */
function baseOf(head, base, commit) {
    if (!base || base.input !== head.input || base.x.length === 0)
        return undefined;
    return { commit, x: [...base.x], y: [...base.y] };
}
/**
 * `charts` with the base commit's curves added (`fit.base`, `partials[i].base`, matched by input
 * name), when the model changed: its design columns or coefficients differ from the base's, or
 * a curve does. A model new in the pull request, one that could not be checked on the base, or
 * one whose fit is the same gets no base curve. The head's charts are not modified.
 * @param charts the head model's chart data
 * @param head the head model's design columns and refit coefficients
 * @param baseline the same model on the base commit, or null
 * @param commit full SHA of the base commit
 */
function withBaseCurves(charts, head, baseline, commit) {
    const base = baseline?.charts;
    if (!base || baseline.verdict === 'error')
        return charts;
    const curvesDiffer = (charts.fit !== null && base.fit !== null && !same(charts.fit.y, base.fit.y)) ||
        charts.partials.some((p) => {
            const b = base.partials.find((q) => q.input === p.input);
            return b !== undefined && !same(p.y, b.y);
        });
    const changed = !same(head.columns, baseline.columns) || !same(head.coefficients, baseline.coefficients) || curvesDiffer;
    if (!changed)
        return charts;
    const fitBase = charts.fit ? baseOf(charts.fit, base.fit, commit) : undefined;
    return {
        ...charts,
        fit: charts.fit && fitBase ? { ...charts.fit, base: fitBase } : charts.fit,
        partials: charts.partials.map((p) => {
            const b = baseOf(p, base.partials.find((q) => q.input === p.input), commit);
            return b ? { ...p, base: b } : p;
        }),
    };
}

;// CONCATENATED MODULE: ./src/result/chart-types.ts
/**
 * The chart data of a model in the Result: plain series the reporters draw, built by run/chart-data.ts.
 */
/** Most points drawn per series (training or hold-out); larger files are thinned evenly. */
const MAX_CHART_POINTS = 2000;
/** Points of the evenly spaced grid along a curve. */
const CURVE_POINTS = 401;
/** Margin on each side of an input's training range for curves, as a fraction of the range (as the swing check's default). */
const CURVE_MARGIN = 0.1;
/** Significant digits kept in chart numbers (plenty for a picture, a third of the JSON size). */
const CHART_DIGITS = 7;

;// CONCATENATED MODULE: ./src/run/chart-data.ts






/** Rounds to {@link CHART_DIGITS} significant digits; null for NaN and infinities. */
function chartNumber(x) {
    return Number.isFinite(x) ? Number(x.toPrecision(CHART_DIGITS)) : null;
}
/**
 * Rows to keep when a file has more than `max` rows: `max` evenly spaced indices
 * floor(t n / max), t = 0 .. max-1 (deterministic: the same file always gives the same points).
 */
function thinRows(n, max = MAX_CHART_POINTS) {
    if (n <= max)
        return Int32Array.from({ length: n }, (_, i) => i);
    return Int32Array.from({ length: max }, (_, t) => Math.floor((t * n) / max));
}
function series(data, predictions, max) {
    const keep = thinRows(data.rows, max);
    const thinned = keep.length < data.rows;
    const pick = (col) => Array.from(keep, (i) => chartNumber(col[i]));
    return {
        rows: data.rows,
        shown: keep.length,
        thinned,
        thinning: thinned ? `${keep.length} of ${data.rows} rows, evenly spaced through the file` : '',
        lines: Array.from(keep, (i) => data.lines[i]),
        x: data.inputs.map(pick),
        actual: pick(data.y),
        fitted: pick(predictions),
        residual: Array.from(keep, (i) => chartNumber(data.y[i] - predictions[i])),
    };
}
/** Predictions along input c over [lo, hi] (plus `extra` x values), the others at `medians`. */
function curveAlong(model, c, lo, hi, medians, extra) {
    const xs = [];
    for (let t = 0; t < CURVE_POINTS; t++)
        xs.push(t === CURVE_POINTS - 1 ? hi : lo + ((hi - lo) * t) / (CURVE_POINTS - 1));
    for (const v of extra)
        if (v >= lo && v <= hi)
            xs.push(v);
    const grid = Float64Array.from(xs).sort();
    const columns = model.design.inputs.map((_, k) => (k === c ? grid : new Float64Array(grid.length).fill(medians[k])));
    const pred = (0,blocks/* predictRows */.tp)(model.design, { inputs: columns, rows: grid.length }, model.fit.coefficients);
    const x = [];
    const y = [];
    for (let i = 0; i < grid.length; i++) {
        const xi = chartNumber(grid[i]);
        if (xi === null || (x.length > 0 && xi === x[x.length - 1]))
            continue;
        x.push(xi);
        y.push(chartNumber(pred[i]));
    }
    return { x, y };
}
/**
 * Stretches of the curve outside [lo, hi]; edges are placed where the straight line between two
 * neighbouring grid points crosses the band edge. A null prediction counts as outside (above).
 */
function bandRegions(x, y, lo, hi) {
    const regions = [];
    const sideOf = (v) => (v === null || v > hi ? 'above' : v < lo ? 'below' : null);
    const cross = (i, edge) => {
        const a = y[i - 1];
        const b = y[i];
        if (a === null || b === null || a === b)
            return x[i];
        const f = (edge - a) / (b - a);
        return x[i - 1] + Math.min(1, Math.max(0, f)) * (x[i] - x[i - 1]);
    };
    let open = null;
    for (let i = 0; i < x.length; i++) {
        const s = sideOf(y[i]);
        if (open && s !== open.side) {
            open.to = cross(i, open.side === 'above' ? hi : lo);
            regions.push(open);
            open = null;
        }
        if (s && !open)
            open = { from: i === 0 ? x[0] : cross(i, s === 'above' ? hi : lo), to: x[i], side: s };
    }
    if (open) {
        open.to = x[x.length - 1];
        regions.push(open);
    }
    return regions.map((r) => ({ from: chartNumber(r.from) ?? r.from, to: chartNumber(r.to) ?? r.to, side: r.side }));
}
function numberPair(v) {
    const xs = numbers(v);
    return xs && xs.length === 2 && Number.isFinite(xs[0]) && Number.isFinite(xs[1]) ? [xs[0], xs[1]] : null;
}
/** An array of JSON numbers (finite numbers or `"Infinity"` style strings) as numbers, or null. */
function numbers(v) {
    if (!Array.isArray(v) || !v.every((e) => typeof e === 'number' || e === 'Infinity' || e === '-Infinity' || e === 'NaN'))
        return null;
    return v.map((e) => (0,result_result/* fromJsonNumber */.M)(e));
}
function readSwing(checks, input) {
    const check = checks.find((c) => c.id === 'swing');
    if (!check?.detail)
        return null;
    const d = check.detail;
    const band = numberPair(d.band);
    let curve = null;
    const curves = Array.isArray(d.curves) ? d.curves : [];
    const mine = curves.find((c) => c && c.input === input);
    if (mine) {
        const x = numbers(mine.x);
        const prediction = numbers(mine.prediction);
        if (x && prediction && x.length === prediction.length && x.length > 0)
            curve = { x, prediction, range: numberPair(mine.range) };
    }
    let regions = null;
    if (Array.isArray(d.regions)) {
        regions = [];
        for (const r of d.regions) {
            if (r && (r.input === undefined || r.input === input) && typeof r.from === 'number' && typeof r.to === 'number') {
                regions.push({ from: r.from, to: r.to, side: r.side === 'below' ? 'below' : 'above' });
            }
        }
    }
    return { band, curve, regions };
}
function finiteOrNull(v) {
    const x = typeof v === 'number' || typeof v === 'string' ? (0,result_result/* fromJsonNumber */.M)(v) : Number.NaN;
    return Number.isFinite(x) ? x : null;
}
/**
 * Reads the complexity check's sweep from its detail: `{ setting: 'degree' | 'width' | 'ridge',
 * current, chosen (the suggested index), curve: [{ setting, cv_rmse }] }`.
 */
function readSweep(checks) {
    const check = checks.find((c) => c.id === 'complexity');
    if (!check?.detail || !Array.isArray(check.detail.curve))
        return null;
    const d = check.detail;
    const curve = d.curve;
    const at = (index) => {
        const i = typeof index === 'number' && Number.isInteger(index) ? index : -1;
        return i >= 0 && i < curve.length ? finiteOrNull(curve[i]?.setting) : null;
    };
    const rows = [];
    for (const p of curve) {
        const s = p && typeof p === 'object' ? finiteOrNull(p.setting) : null;
        if (s !== null)
            rows.push({ s, cv: finiteOrNull(p.cv_rmse) });
    }
    if (rows.length === 0)
        return null;
    rows.sort((a, b) => a.s - b.s);
    const parameter = typeof d.setting === 'string' ? d.setting : 'setting';
    const positive = rows.filter((r) => r.s > 0).map((r) => r.s);
    return {
        parameter,
        log: parameter !== 'degree' && positive.length >= 2 && rows.every((r) => r.s >= 0) && Math.max(...positive) / Math.min(...positive) >= 10,
        settings: rows.map((r) => chartNumber(r.s) ?? r.s),
        cv: rows.map((r) => (r.cv === null ? null : chartNumber(r.cv))),
        train: null,
        chosen: at(d.current),
        suggested: at(d.chosen),
    };
}
/**
 * Builds the chart data of one fitted model from its rows, predictions and check outcomes.
 * Cost: one pass over each file's kept rows, the medians (shared with swing: {@link columnMedian}), and
 * {@link CURVE_POINTS} predictions per curve.
 * @param model the fitted model (design, coefficients, data, predictions)
 * @param checks the model's check outcomes (swing and complexity details are read when present)
 * @param maxPoints most points per series; default {@link MAX_CHART_POINTS}
 */
function buildChartData(model, checks, maxPoints = MAX_CHART_POINTS) {
    const { design, tables, metrics, fit, descriptor } = model;
    const { train, holdout } = tables;
    const inputs = [...design.inputs];
    const medians = train.inputs.map((col) => columnMedian(col, train.rows));
    // One input: the curve over the scanned range with the band; several: partial curves.
    let fitCurve = null;
    const partials = [];
    for (let c = 0; c < inputs.length; c++) {
        const [tlo, thi] = (0,stats/* range */.y1)(train.inputs[c], train.rows);
        if (!(thi > tlo))
            continue;
        const swing = inputs.length === 1 ? readSwing(checks, inputs[c]) : null;
        const swingCurve = swing?.curve ?? null;
        const lo = swingCurve ? Math.min(swingCurve.x[0], tlo) : tlo - CURVE_MARGIN * (thi - tlo);
        const hi = swingCurve ? Math.max(swingCurve.x[swingCurve.x.length - 1], thi) : thi + CURVE_MARGIN * (thi - tlo);
        const { x, y } = curveAlong(model, c, lo, hi, medians, swingCurve ? swingCurve.x : []);
        // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
        const others = Object.create(null);
        inputs.forEach((name, k) => {
            if (k !== c)
                others[name] = chartNumber(medians[k]) ?? 0;
        });
        const curve = { input: inputs[c], others, range: [chartNumber(tlo) ?? tlo, chartNumber(thi) ?? thi], x, y };
        if (inputs.length === 1) {
            const band = swing?.band ?? metrics.targetRange;
            fitCurve = {
                ...curve,
                band: [chartNumber(band[0]) ?? band[0], chartNumber(band[1]) ?? band[1]],
                regions: swing?.regions ?? bandRegions(x, y, band[0], band[1]),
                source: swing && (swing.band || swing.curve) ? 'swing' : 'data',
            };
        }
        else {
            partials.push(curve);
        }
    }
    // Standardised coefficients of the non-intercept columns.
    const coefCheck = checks.find((c) => c.id === 'coefficient-size');
    const columns = [];
    const values = [];
    for (let j = 0; j < design.p; j++) {
        if (!design.penalised[j])
            continue;
        columns.push(design.columnNames[j]);
        values.push(chartNumber((fit.coefficients[j] * metrics.columnSd[j]) / metrics.targetSd));
    }
    return {
        target: descriptor.data.target,
        inputs,
        train: series(train, model.trainPredictions, maxPoints),
        holdout: series(holdout, model.holdoutPredictions, maxPoints),
        fit: fitCurve,
        partials,
        sweep: readSweep(checks),
        coefficients: { columns, values, limit: coefCheck?.limit ?? null, warn: coefCheck?.warn ?? null },
    };
}

// EXTERNAL MODULE: ./src/diagnostics/regression-metrics.ts
var regression_metrics = __nccwpck_require__(155);
;// CONCATENATED MODULE: ./src/diagnostics/shipped.ts


function measures(data, predictions) {
    const sums = (0,regression_metrics/* emptySums */.y3)();
    (0,regression_metrics/* addErrors */.xB)(sums, data.y, predictions, data.rows);
    return (0,regression_metrics/* errorMeasures */._I)(sums);
}
/**
 * Scores shipped coefficients on the training and hold-out rows (one prediction pass each).
 * @param shipped length design.p (the caller checks it)
 * @param refit the refit's coefficients (length design.p)
 */
function scoreShipped(design, train, holdout, shipped, refit) {
    const holdoutPredictions = (0,blocks/* predictRows */.tp)(design, holdout, shipped);
    let diff = 0;
    for (let j = 0; j < design.p; j++)
        diff = Math.max(diff, Math.abs(shipped[j] - refit[j]));
    return {
        coefficients: shipped,
        holdoutPredictions,
        train: measures(train, (0,blocks/* predictRows */.tp)(design, train, shipped)),
        holdout: measures(holdout, holdoutPredictions),
        maxCoefficientDifference: diff,
    };
}

;// CONCATENATED MODULE: ./src/design/column-spread.ts
/**
 * Population standard deviations of the design columns, gathered block by block in the same
 * pass that folds rows into the factor. Sums are taken about each column's first value, which
 * keeps the subtraction well conditioned for columns with a large offset.
 */

/** Running sums per column. */
class ColumnSpread {
    p;
    shift;
    s1;
    s2;
    n = 0;
    /** @param p number of columns */
    constructor(p) {
        this.p = p;
        this.shift = new Float64Array(p);
        this.s1 = new Float64Array(p);
        this.s2 = new Float64Array(p);
    }
    /** Adds a column-major block of `m` rows. */
    add(X, m) {
        if (m === 0)
            return;
        for (let j = 0; j < this.p; j++) {
            const base = j * m;
            if (this.n === 0)
                this.shift[j] = X[base];
            const column = X.subarray(base, base + m);
            // One pass per sum (one loop per function; see DEVELOPERS.md, "Writing hot loops").
            this.s1[j] += (0,stats/* sumOfDeviations */.jZ)(column, m, this.shift[j]);
            this.s2[j] += (0,stats/* sumOfSquaredDeviations */.Mq)(column, m, this.shift[j]);
        }
        this.n += m;
    }
    /** Population standard deviation sqrt(mean((x - mean)^2)) of each column (NaN with no rows). */
    sd() {
        const out = new Float64Array(this.p);
        for (let j = 0; j < this.p; j++) {
            const mean = this.s1[j] / this.n;
            out[j] = Math.sqrt(Math.max(0, this.s2[j] / this.n - mean * mean));
        }
        return out;
    }
}

// EXTERNAL MODULE: ./src/fit/index.ts + 3 modules
var src_fit = __nccwpck_require__(2485);
// EXTERNAL MODULE: ./src/data/csv-rules.ts
var csv_rules = __nccwpck_require__(8706);
// EXTERNAL MODULE: ./src/data/line-blocks.ts + 1 modules
var line_blocks = __nccwpck_require__(4113);
;// CONCATENATED MODULE: ./src/data/fast-path.ts
/**
 * The fast CSV path: one loop over the bytes of plain numeric CSV (no quotes), parsing
 * numbers straight into Float64Array columns without building a string per field.
 *
 * It accepts a strict subset of what the general path accepts and gives the same numbers
 * and line numbers for it. Anything else (a quote, a lone carriage return, a field count
 * that differs from the header's, a cell that is not a plain finite number, white space
 * other than spaces and tabs where it matters) makes it give up with
 * {@link FastPathDeclined}; the caller then reads the file again on the general path,
 * which either accepts it or throws the error the user should see.
 */


/** Thrown when the fast path meets input it does not handle. Never leaves this folder. */
class FastPathDeclined extends Error {
    line;
    constructor(line) {
        super(`fast CSV path declined at line ${line}`);
        this.line = line;
    }
}
// Bytes the loop looks at.
const TAB = 9;
const LF = 10;
const VT = 11;
const FF = 12;
const CR = 13;
const SPACE = 32;
const QUOTE = 34;
const PLUS = 43;
const COMMA = 44;
const MINUS = 45;
const POINT = 46;
const DIGIT_0 = 48;
const DIGIT_9 = 57;
const UPPER_E = 69;
const LOWER_E = 101;
/**
 * Largest mantissa that can take one more decimal digit and stay below 2^53 (every integer
 * up to 2^53 is exact in a double): 900719925474098 * 10 + 9 < 9007199254740992.
 */
const MANTISSA_ROOM = 900719925474099;
/** Exponents beyond this are clamped while reading digits (the value then goes through Number()). */
const EXPONENT_CLAMP = 100000;
/** Powers of ten that are exact in a double: 10^0 .. 10^22. */
const EXACT_POWERS_OF_TEN = Float64Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const utf8 = new TextDecoder('utf-8', { ignoreBOM: true });
/**
 * Reads plain numeric CSV and yields numeric chunks; throws {@link FastPathDeclined} at the
 * first thing it does not handle (chunks already yielded stay valid: they are exactly what
 * the general path gives for those rows).
 *
 * A number is built exactly: the digits go into an integer mantissa m (kept below 2^53) and
 * a decimal exponent e; when |e| <= 22 the value is m * 10^e or m / 10^-e, one correctly
 * rounded operation on two exact doubles, hence equal to `Number(text)` (W. D. Clinger,
 * "How to read floating point numbers accurately", PLDI 1990, the fast path). Otherwise the
 * cell's text goes through `Number()`.
 *
 * @param pieces the file's bytes in pieces of any size
 * @param target what to read
 */
async function* fastChunks(pieces, target) {
    const reader = new FastReader(target);
    for await (const block of (0,line_blocks/* lineBlocks */.Dr)(pieces)) {
        const stop = (0,line_blocks/* blockError */.Si)(target.file, reader.line, block);
        if (stop !== null)
            throw stop;
        let bytes = block.bytes;
        if (block.final && bytes[bytes.length - 1] !== LF) {
            // Give the last line its line feed so that every inner loop stops on one.
            const closed = new Uint8Array(bytes.length + 1);
            closed.set(bytes);
            closed[bytes.length] = LF;
            bytes = closed;
        }
        reader.read(bytes);
        if (reader.stopped)
            return;
        for (const chunk of reader.builder.take()) {
            yield chunk;
            if (target.recycle === true)
                reader.builder.recycle(chunk);
        }
    }
    if (reader.plan === null)
        throw (0,csv_rules/* emptyError */.CA)(target.file);
    reader.builder.flush();
    for (const chunk of reader.builder.take()) {
        yield chunk;
        if (target.recycle === true)
            reader.builder.recycle(chunk);
    }
}
/** State of the fast path between blocks. */
class FastReader {
    target;
    builder;
    plan = null;
    /** 1-based line number of the next line to read. */
    line = 1;
    /** True once a header-only read has its header. */
    stopped = false;
    constructor(target) {
        this.target = target;
        this.builder = new csv_rules/* ChunkBuilder */.vB(target.request, target.chunkRows);
    }
    /** Reads whole lines; `buf` ends with a line feed. */
    read(buf) {
        let p = this.plan === null ? this.readHeader(buf) : 0;
        if (this.plan === null || this.stopped)
            return;
        const builder = this.builder;
        while (p < buf.length) {
            p = this.readRows(buf, p);
            // The buffer switch lives out here so the hot loop never runs code it has no type
            // feedback for (which would throw away its optimised code).
            if (builder.row === builder.capacity)
                builder.full();
        }
    }
    /** Reads rows from `p` until the block ends or the chunk buffers are full; returns the new offset. */
    readRows(buf, p) {
        const plan = this.plan;
        const end = buf.length;
        const slotOfField = plan.slotOfField;
        const lastField = slotOfField.length - 1;
        const builder = this.builder;
        const slots = builder.slots;
        const lines = builder.lines;
        const capacity = builder.capacity;
        let row = builder.row;
        let line = this.line;
        let text = null;
        // The counters are stored on every line, inside the loop: code after a loop that V8 optimised
        // while it ran has no type feedback, and reaching it would throw the optimised code away.
        while (p < end && row < capacity) {
            // Line start: skip spaces and tabs; a line of nothing else is blank.
            let b = buf[p];
            while (b === SPACE || b === TAB)
                b = buf[++p];
            if (b === LF) {
                p++;
                line++;
                this.line = line;
                continue;
            }
            if (b === CR && buf[p + 1] === LF) {
                p += 2;
                line++;
                this.line = line;
                continue;
            }
            // Other white space could make the line blank for the general path: let it decide.
            if (b > 127 || b === VT || b === FF || b === CR)
                throw new FastPathDeclined(line);
            let field = 0;
            for (;;) {
                const slot = slotOfField[field];
                if (slot >= 0) {
                    // A requested cell: [spaces] [sign] digits [. digits] [e [sign] digits] [spaces]
                    while (b === SPACE || b === TAB)
                        b = buf[++p];
                    const start = p;
                    let negative = false;
                    if (b === MINUS) {
                        negative = true;
                        b = buf[++p];
                    }
                    else if (b === PLUS) {
                        b = buf[++p];
                    }
                    let mantissa = 0;
                    let digits = 0;
                    let exponent = 0;
                    let exact = true;
                    while (b >= DIGIT_0 && b <= DIGIT_9) {
                        if (mantissa < MANTISSA_ROOM)
                            mantissa = mantissa * 10 + (b - DIGIT_0);
                        else
                            exact = false;
                        digits++;
                        b = buf[++p];
                    }
                    if (b === POINT) {
                        b = buf[++p];
                        while (b >= DIGIT_0 && b <= DIGIT_9) {
                            if (mantissa < MANTISSA_ROOM) {
                                mantissa = mantissa * 10 + (b - DIGIT_0);
                                exponent--;
                            }
                            else
                                exact = false;
                            digits++;
                            b = buf[++p];
                        }
                    }
                    if (digits === 0)
                        throw new FastPathDeclined(line);
                    if (b === LOWER_E || b === UPPER_E) {
                        b = buf[++p];
                        // The sign multiplies: a unary minus would run only for negative exponents, and code
                        // that runs rarely has no type feedback when V8 optimises the loop.
                        let exponentSign = 1;
                        if (b === MINUS) {
                            exponentSign = -1;
                            b = buf[++p];
                        }
                        else if (b === PLUS) {
                            b = buf[++p];
                        }
                        if (!(b >= DIGIT_0 && b <= DIGIT_9))
                            throw new FastPathDeclined(line);
                        let e = 0;
                        while (b >= DIGIT_0 && b <= DIGIT_9) {
                            if (e < EXPONENT_CLAMP)
                                e = e * 10 + (b - DIGIT_0);
                            b = buf[++p];
                        }
                        exponent += exponentSign * e;
                    }
                    let value;
                    if (exact && exponent >= -22 && exponent <= 22) {
                        value = exponent < 0 ? mantissa / EXACT_POWERS_OF_TEN[-exponent] : mantissa * EXACT_POWERS_OF_TEN[exponent];
                        if (negative)
                            value = -value;
                    }
                    else {
                        text ??= Buffer.from(buf.buffer, buf.byteOffset, buf.byteLength);
                        value = Number(text.toString('latin1', start, p));
                        // Overflow, and underflow of a nonzero text (mantissa > 0) to 0 or a subnormal: the
                        // general path says which (the exact branch above can do neither).
                        if (!Number.isFinite(value) || (mantissa !== 0 && Math.abs(value) < csv_rules/* MIN_NORMAL */.Vt))
                            throw new FastPathDeclined(line);
                    }
                    while (b === SPACE || b === TAB)
                        b = buf[++p];
                    slots[slot][row] = value;
                }
                else {
                    // An unused cell: skip to the comma or the line end.
                    while (b !== COMMA && b !== LF) {
                        if (b === QUOTE || (b === CR && buf[p + 1] !== LF))
                            throw new FastPathDeclined(line);
                        if (b === CR)
                            break;
                        b = buf[++p];
                    }
                }
                if (b === COMMA) {
                    if (field === lastField)
                        throw new FastPathDeclined(line);
                    field++;
                    b = buf[++p];
                    continue;
                }
                if (b === CR && buf[p + 1] === LF)
                    b = buf[++p];
                if (b !== LF || field !== lastField)
                    throw new FastPathDeclined(line);
                p++;
                break;
            }
            lines[row] = line;
            line++;
            row++;
            builder.row = row;
            this.line = line;
        }
        return p;
    }
    /**
     * Reads lines up to and including the first non-blank one, the header; returns the offset
     * after it (or `buf.length` when the block has no header yet).
     */
    readHeader(buf) {
        let p = 0;
        while (p < buf.length) {
            const lf = buf.indexOf(LF, p);
            let end = lf;
            if (end > p && buf[end - 1] === CR)
                end--;
            for (let i = p; i < end; i++) {
                if (buf[i] === QUOTE || buf[i] === CR)
                    throw new FastPathDeclined(this.line);
            }
            const text = utf8.decode(buf.subarray(p, end));
            const line = this.line++;
            p = lf + 1;
            if (text.trim() === '')
                continue;
            const header = text.split(',').map((name) => name.trim());
            this.plan = (0,csv_rules/* planColumns */.j7)(this.target.file, header, line, this.target.request);
            this.target.onHeader(this.plan);
            if (this.target.headerOnly)
                this.stopped = true;
            return p;
        }
        return p;
    }
}

;// CONCATENATED MODULE: ./src/data/table.ts
/**
 * CSV data files to numeric columns.
 *
 * A data file is UTF-8 CSV: a header row of column names, then rows of numbers; columns are
 * chosen by name and only those are converted. What is accepted, in words:
 *
 * - Fields are separated by commas; lines end with `\n` or `\r\n`; a UTF-8 byte-order mark
 *   is dropped. Fields may be quoted with `"` (a quote inside is written `""`), so `"1.5"`
 *   is the number 1.5.
 * - White space around a field is ignored (the characters `String.prototype.trim` removes),
 *   inside quotes too: ` 1.5 ` and `" 1.5 "` are 1.5. Lines holding only white space are
 *   blank and skipped, before the header as well as between rows.
 * - The header is the first non-blank record; its names are trimmed and must be unique.
 * - A cell of a requested column must be a finite decimal number as JavaScript's `Number()`
 *   reads it: sign, digits, point, exponent (`-1`, `.5`, `1.`, `2.5E-3`). Empty cells, `NaN`,
 *   `Infinity`, `inf`, hexadecimal, values that overflow (`1e999`) and nonzero values that
 *   underflow (`1e-400`, `1e-310`: `Number()` gives 0 or a subnormal) are errors.
 * - The header must end within the first 1 MiB of the file and name at most 100,000 columns
 *   (checked before a longer line is held in memory). A header that looks like a Git LFS
 *   pointer, a semicolon- or tab-separated file, or CR-only line ends gets a hint in the error.
 * - Every row has as many fields as the header.
 * - The whole file must be UTF-8, not only the columns used.
 *
 * Two readers give the same numbers, line numbers and errors: a fast loop over the bytes for
 * plain numeric CSV (fast-path.ts), and csv-parse for everything else (general-path.ts). The
 * fast one hands the file to the general one when it meets something it does not handle.
 */



/**
 * Streams a CSV file as numeric chunks (header checked first).
 *
 * Every chunk but the last holds exactly `chunkRows` rows; a file with a header and no data
 * rows yields no chunk. Errors are InputErrors: `file-too-large` (before reading),
 * `file-missing`, `csv-empty`, `csv-header`, `csv-missing-column`, `csv-ragged`, `csv-cell`,
 * `csv-syntax`, `csv-encoding`; each names the file and, where there is one, the line.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param options columns to read; chunk size (default 65536 rows); size cap (default 512 MiB);
 *   `general: true` to skip the fast path
 */
async function* readTableChunks(repo, path, options) {
    const settings = checkOptions(options);
    await table_checkSize(repo, path, settings.maxBytes);
    yield* scan(() => repo.stream(path), path, settings, () => undefined, false);
}
/**
 * Reads the requested columns whole into preallocated arrays (no per-row objects, no list of
 * chunks kept): after the first chunk the row count is estimated from the file size and the
 * bytes read so far (plus 5 %), each chunk is copied in as it arrives and dropped, and the
 * arrays grow by 1.5x when the estimate was short. The result views the first `rows` entries
 * (capacity beyond that stays allocated: a few percent). Peak memory is about the data plus
 * one chunk, instead of twice the data.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param options as for {@link readTableChunks}
 * @returns the header, the row count, one Float64Array of length `rows` per requested name, and the rows' lines
 */
async function readTable(repo, path, options) {
    const settings = checkOptions(options);
    const size = await table_checkSize(repo, path, settings.maxBytes);
    let header = [];
    let bytesRead = 0;
    const counted = async function* () {
        for await (const piece of repo.stream(path)) {
            bytesRead += piece.length;
            yield piece;
        }
    };
    // First position of each distinct requested name (a repeated name shares one array).
    const firstOf = settings.columns.map((name) => settings.columns.indexOf(name));
    let columns = [];
    let lines = new Int32Array(0);
    let rows = 0;
    const grow = (capacity) => {
        columns = settings.columns.map((_, k) => {
            if (firstOf[k] !== k)
                return columns[firstOf[k]];
            const next = new Float64Array(capacity);
            if (rows > 0)
                next.set(columns[k].subarray(0, rows));
            return next;
        });
        const nextLines = new Int32Array(capacity);
        if (rows > 0)
            nextLines.set(lines.subarray(0, rows));
        lines = nextLines;
    };
    for await (const chunk of scan(counted, path, settings, (plan) => (header = plan.header), false, true)) {
        const needed = rows + chunk.rows;
        if (needed > lines.length) {
            let capacity = Math.max(needed, Math.ceil(lines.length * 1.5));
            if (rows === 0 && bytesRead > 0) {
                // First chunk: estimate the whole file's rows from its bytes per row.
                const estimate = Math.ceil((size / bytesRead) * chunk.rows * 1.05);
                capacity = Math.max(needed, Math.min(estimate, Math.ceil(size / 2) + 1));
            }
            grow(capacity);
        }
        settings.columns.forEach((_, k) => {
            if (firstOf[k] === k)
                columns[k].set(chunk.columns[k], rows);
        });
        lines.set(chunk.lines, rows);
        rows = needed;
    }
    const out = new Map();
    settings.columns.forEach((name, k) => {
        if (!out.has(name))
            out.set(name, rows === 0 ? new Float64Array(0) : columns[k].subarray(0, rows));
    });
    return { file: path, header, rows, columns: out, lines: rows === 0 ? new Int32Array(0) : lines.subarray(0, rows) };
}
/**
 * Reads only the header names (for messages and checks): trimmed, in file order, checked
 * for repeats (`csv-header`); `csv-empty` when the file has none.
 *
 * @param repo where the file lives
 * @param path repository-relative path of the CSV file
 * @param maxBytes size cap in bytes; default 512 MiB
 */
async function readHeader(repo, path, maxBytes = DEFAULT_MAX_BYTES) {
    const settings = checkOptions({ columns: [], maxBytes });
    await table_checkSize(repo, path, settings.maxBytes);
    let header = [];
    // A header-only scan ends right after the header and yields no rows.
    const scanning = scan(() => repo.stream(path), path, settings, (plan) => (header = plan.header), true);
    while (!(await scanning.next()).done)
        ;
    return header;
}
/** Checks the caller's options (a programming error, not the user's: TypeError / RangeError). */
function checkOptions(options) {
    const { columns, chunkRows = csv_rules/* DEFAULT_CHUNK_ROWS */._I, maxBytes = csv_rules/* DEFAULT_MAX_BYTES */.fS, general = false } = options;
    if (!Array.isArray(columns) || columns.some((c) => typeof c !== 'string')) {
        throw new TypeError('readTable: `columns` must be an array of column names');
    }
    if (!Number.isInteger(chunkRows) || chunkRows < 1 || chunkRows > 2 ** 30) {
        throw new RangeError(`readTable: \`chunkRows\` must be an integer from 1 to 2^30, got ${chunkRows}`);
    }
    if (!(maxBytes >= 0))
        throw new RangeError(`readTable: \`maxBytes\` must be a non-negative number, got ${maxBytes}`);
    return { columns, chunkRows, maxBytes, general };
}
/** InputError `file-too-large` when the file is over the cap; returns the size in bytes. */
async function table_checkSize(repo, path, maxBytes) {
    const size = await repo.size(path);
    if (size > maxBytes) {
        throw new core_errors/* InputError */.dz('file-too-large', `the file is ${megabytes(size)} (${size} bytes), over the cap of ${megabytes(maxBytes)} (${maxBytes} bytes); raise caps.max_file_mb in fitgate.yml`, { file: path });
    }
    return size;
}
function megabytes(bytes) {
    return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}
/**
 * Runs the fast path, and on the general path from the start when the fast one declines,
 * handing out only the rows the fast path has not handed out already.
 */
async function* scan(open, path, settings, onHeader, headerOnly, recycle = false) {
    let headerSeen = false;
    const target = {
        file: path,
        request: (0,csv_rules/* planRequest */.NX)(settings.columns),
        chunkRows: settings.chunkRows,
        headerOnly,
        recycle,
        onHeader: (plan) => {
            if (headerSeen)
                return;
            headerSeen = true;
            onHeader(plan);
        },
    };
    let handedOut = 0;
    if (!settings.general) {
        try {
            for await (const chunk of fastChunks(open(), target)) {
                handedOut += chunk.rows;
                yield chunk;
            }
            return;
        }
        catch (error) {
            if (!(error instanceof FastPathDeclined))
                throw error;
        }
    }
    // csv-parse is loaded only when a file needs it (most data files take the fast path).
    const { generalChunks } = await Promise.all(/* import() */[__nccwpck_require__.e(70), __nccwpck_require__.e(462)]).then(__nccwpck_require__.bind(__nccwpck_require__, 6462));
    yield* generalChunks(open(), target, handedOut);
}

;// CONCATENATED MODULE: ./src/data/load-model-data.ts


/**
 * Reads the input columns (in `inputs` order) and the target of both files.
 * @throws InputError `target-as-input` when a term reads the target column,
 *   `no-rows` when either file has no data rows
 */
async function loadModelData(repo, descriptor, inputs, settings) {
    const { data } = descriptor;
    if (inputs.includes(data.target)) {
        throw new core_errors/* InputError */.dz('target-as-input', `the target column \`${(0,core_errors/* clip */.$Q)(data.target)}\` is also used as an input by a term; a model may not read its own target`, { file: descriptor.file, line: data.lines.target, key: 'data.target' });
    }
    const columns = [...inputs, data.target];
    const maxBytes = settings.caps.maxFileBytes;
    const load = async (path, line, key) => {
        let table;
        try {
            table = await readTable(repo, path, { columns, maxBytes });
        }
        catch (error) {
            throw withAsker(error, descriptor);
        }
        if (table.rows === 0) {
            throw new core_errors/* InputError */.dz('no-rows', `\`${(0,core_errors/* clip */.$Q)(path)}\` has a header but no data rows; expected at least one row`, {
                file: descriptor.file,
                line,
                key,
            });
        }
        return {
            inputs: inputs.map((c) => table.columns.get(c)),
            y: table.columns.get(data.target),
            lines: table.lines,
            rows: table.rows,
            file: path,
            byName: table.columns,
        };
    };
    const train = await load(data.train, data.lines.train, 'data.train');
    const holdout = await load(data.holdout, data.lines.holdout, 'data.holdout');
    const { byName, ...trainData } = train;
    const { byName: _unused, ...holdoutData } = holdout;
    return { train: trainData, holdout: holdoutData, trainColumns: byName };
}
/**
 * A missing column names the descriptor line that asked for it: `data.target`, or the first term
 * that reads the column. Other errors pass unchanged.
 */
function withAsker(error, descriptor) {
    if (!(error instanceof core_errors/* InputError */.dz) || error.code !== 'csv-missing-column' || error.location.key === undefined)
        return error;
    const column = error.location.key;
    const term = descriptor.terms.find((t) => (t.kind === 'linear' ? t.columns.includes(column) : t.of === column));
    const asker = column === descriptor.data.target ? `\`data.target\` on line ${descriptor.data.lines.target}` : term ? `the ${term.kind} term on line ${term.line}` : null;
    if (asker === null)
        return error;
    return new core_errors/* InputError */.dz(error.code, `${error.message} (asked for by ${asker} of ${(0,core_errors/* clip */.$Q)(descriptor.file)})`, error.location);
}

// EXTERNAL MODULE: ./src/design/terms/index.ts + 3 modules
var design_terms = __nccwpck_require__(7482);
;// CONCATENATED MODULE: ./src/run/plan.ts







/**
 * Largest number of design columns. The diagnostics take singular value decompositions of p x p
 * factors (several per model and fold when the design is rank deficient), whose cost grows with
 * p^3: at 200 columns each takes about 0.4 s here, so a pull request cannot make a run take hours.
 */
const MAX_PARAMETERS = 200;
/**
 * Largest magnitude of a design value or target: sums of squares of up to 1e9 rows must stay
 * finite in double precision (1e140^2 * 1e9 = 1e289 < 1.8e308).
 */
const MAX_MAGNITUDE = 1e140;
/**
 * Plans one model.
 * @throws InputError for bad data, a design over the caps, a target out of range or constant
 */
async function planModel(repo, descriptor, settings) {
    const inputs = [];
    for (const t of descriptor.terms)
        for (const c of (0,design_terms/* termInputs */.Q)(t))
            if (!inputs.includes(c))
                inputs.push(c);
    const tables = await loadModelData(repo, descriptor, inputs, settings);
    const { train } = tables;
    const file = descriptor.file;
    // Fix term parameters from the training rows, then check the size before taking memory.
    const terms = descriptor.terms.map((spec) => (0,design_terms/* createTerm */.P)(spec, tables.trainColumns, file));
    const design = (0,design_matrix/* createDesign */.x)(terms, descriptor.fit.intercept);
    const p = design.p;
    if (p > MAX_PARAMETERS) {
        throw new core_errors/* InputError */.dz('too-many-parameters', `the terms build ${p} design columns; at most ${MAX_PARAMETERS} are supported (the diagnostics decompose p x p factors, at a cost that grows with p^3); use fewer radial centres or a lower degree`, { file, line: descriptor.termsLine, key: 'terms' });
    }
    if (train.rows * p > settings.caps.maxCells) {
        throw new core_errors/* InputError */.dz('too-large', `${train.rows} training rows x ${p} parameters = ${train.rows * p} cells is over the cap of ${settings.caps.maxCells}; raise caps.max_cells in the settings file to allow it`, { file, line: descriptor.termsLine, key: 'terms' });
    }
    for (const data of [train, tables.holdout]) {
        const i = (0,kernels/* firstBeyond */.gy)(data.y, data.rows, MAX_MAGNITUDE);
        if (i >= 0) {
            throw new core_errors/* InputError */.dz('target-range', `the target \`${(0,core_errors/* clip */.$Q)(descriptor.data.target)}\` is ${data.y[i]} on line ${data.lines[i]} of ${(0,core_errors/* clip */.$Q)(data.file)}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): rescale the target`, { file, line: descriptor.data.lines.target, key: 'data.target' });
        }
    }
    const targetStats = (0,stats/* meanAndSd */.ud)(train.y, train.rows);
    if (!(targetStats.sd > 0)) {
        throw new core_errors/* InputError */.dz('constant-target', `the target \`${(0,core_errors/* clip */.$Q)(descriptor.data.target)}\` is constant (${train.y[0]}) in every training row; there is nothing to model`, { file, line: descriptor.data.lines.target, key: 'data.target' });
    }
    const folds = (0,diagnostics_folds/* assignFolds */.o)(train.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
    return { descriptor, tables, design, folds, targetSd: targetStats.sd };
}

;// CONCATENATED MODULE: ./src/run/passes.ts
/**
 * The planned passes over a model's training rows, each building the design block by block
 * (memory grows with p^2 and the block size, never with rows x p):
 *
 * 1. the fold pass: each fold's rows into its own QR factor (the full factor is their merge),
 *    the design's range check and column spreads alongside;
 * 2. the refinement pass, where one step of iterative refinement converges and gains digits;
 * 3. the scoring pass: predictions, out-of-fold errors and leverages together.
 */







/**
 * Pass 1: folds every training row into its fold's factor, merges them and solves.
 * @throws InputError `design-overflow` when a design value is not within ±{@link MAX_MAGNITUDE}
 */
function foldPass(plan) {
    const { design, tables, folds, descriptor } = plan;
    const train = tables.train;
    const builder = new cross_validation/* FoldFactorBuilder */.UN(design.p, folds);
    const spread = new ColumnSpread(design.p);
    (0,blocks/* forEachBlock */.aN)(design, train, (X, start, m) => {
        checkRange(plan, X, start, m);
        builder.add(X, train.y, start, m);
        spread.add(X, m);
    });
    const fit = (0,src_fit/* fitFactor */.Ps)((0,cross_validation/* mergeFactors */.Z4)(builder.factors, design.p), { ridge: descriptor.fit.ridge, penalised: design.penalised });
    const foldFactors = { perFold: builder.factors, complements: folds.k >= 2 ? (0,cross_validation/* complementFactors */.Zd)(builder.factors) : [] };
    return { fit, foldFactors, columnSd: spread.sd() };
}
/**
 * Pass 2: one step of iterative refinement where it applies (not for well-conditioned designs,
 * whose QR solution is already accurate to about 1e-14); the fit unchanged otherwise.
 */
function refinePass(plan, fit) {
    if (!(0,src_fit/* refinementApplies */.C4)(fit))
        return fit;
    const train = plan.tables.train;
    const pass = new src_fit/* RefinementPass */.rT(fit);
    (0,blocks/* forEachBlock */.aN)(plan.design, train, (X, start, m) => pass.addRows(X, train.y.subarray(start, start + m), m));
    return pass.finish();
}
/** Pass 3: training predictions with the cross-validation in one pass, then the hold-out rows. */
function scoringPass(plan, fit, foldFactors) {
    const { design, tables, folds } = plan;
    const { train, holdout } = tables;
    let trainPredictions = new Float64Array(train.rows);
    let crossValidation;
    try {
        crossValidation = (0,cross_validation/* crossValidate */.DJ)(design, train, fit, folds, { factors: foldFactors.perFold, complements: foldFactors.complements, predictions: trainPredictions });
    }
    catch {
        // The cross-validation check runs it again and reports why it could not be computed (as a
        // check that throws does); the fit itself stands.
        crossValidation = null;
        trainPredictions = (0,blocks/* predictRows */.tp)(design, train, fit.coefficients);
    }
    return { trainPredictions, holdoutPredictions: (0,blocks/* predictRows */.tp)(design, holdout, fit.coefficients), crossValidation };
}
/**
 * InputError `design-overflow` when a block of the training design holds a value that is not a
 * finite number within ±{@link MAX_MAGNITUDE}: finite data can still overflow in a term (a huge
 * `shift` or `scale`, a high power of a large input), and sums of squares must stay finite.
 */
function checkRange(plan, X, start, m) {
    const { design, descriptor } = plan;
    const train = plan.tables.train;
    const at = (0,kernels/* firstBeyond */.gy)(X, design.p * m, MAX_MAGNITUDE);
    if (at < 0)
        return;
    const j = Math.floor(at / m);
    const i = at % m;
    let term = 0;
    while (term + 1 < design.termOffsets.length && design.termOffsets[term + 1] <= j)
        term += 1;
    const line = design.terms[term]?.spec.line ?? descriptor.termsLine;
    throw new core_errors/* InputError */.dz('design-overflow', `design column \`${(0,core_errors/* clip */.$Q)(design.columnNames[j])}\` is ${X[at]} at training row on line ${train.lines[start + i]} of ${(0,core_errors/* clip */.$Q)(train.file)}; expected values within ±${MAX_MAGNITUDE} (sums of squares must stay finite): use inputs of a smaller size, a lower degree, or a shift and scale near the data`, { file: descriptor.file, line, key: 'terms' });
}

;// CONCATENATED MODULE: ./src/run/fit-model.ts






/**
 * Loads, fits and scores one model (no checks).
 * @throws InputError for bad data, a constant target, a design over the caps, or shipped
 *   coefficients of the wrong length
 */
async function fitModel(repo, descriptor, settings) {
    const plan = await planModel(repo, descriptor, settings);
    const { design, tables, folds } = plan;
    const first = foldPass(plan);
    const fit = refinePass(plan, first.fit);
    const scored = scoringPass(plan, fit, first.foldFactors);
    const metrics = coreMetrics(plan.targetSd, first.columnSd, fit, design, tables, scored.trainPredictions, scored.holdoutPredictions);
    return {
        descriptor,
        design,
        fit,
        tables,
        metrics,
        trainPredictions: scored.trainPredictions,
        holdoutPredictions: scored.holdoutPredictions,
        folds,
        crossValidation: scored.crossValidation,
        foldFactors: first.foldFactors,
        shipped: shippedScore(descriptor, design, tables, fit),
    };
}
/**
 * The figures every check may read: training and hold-out RMSE, MAE and R^2, the gap ratio,
 * parameters per row and coefficient sizes (|w_j| sd(phi_j) / sd(y) over penalised columns).
 */
function coreMetrics(targetSd, columnSd, fit, design, tables, trainPredictions, holdoutPredictions) {
    const { train, holdout } = tables;
    const trainSums = (0,regression_metrics/* emptySums */.y3)();
    (0,regression_metrics/* addErrors */.xB)(trainSums, train.y, trainPredictions, train.rows);
    const holdoutSums = (0,regression_metrics/* emptySums */.y3)();
    (0,regression_metrics/* addErrors */.xB)(holdoutSums, holdout.y, holdoutPredictions, holdout.rows);
    const tr = (0,regression_metrics/* errorMeasures */._I)(trainSums);
    const ho = (0,regression_metrics/* errorMeasures */._I)(holdoutSums);
    let maxStd = Number.NaN;
    let maxStdColumn = -1;
    let maxAbs = 0;
    for (let j = 0; j < design.p; j++) {
        const w = Math.abs(fit.coefficients[j]);
        if (w > maxAbs || Number.isNaN(w))
            maxAbs = w;
        if (!design.penalised[j])
            continue;
        const s = (w * columnSd[j]) / targetSd;
        if (maxStdColumn < 0 || s > maxStd) {
            maxStd = s;
            maxStdColumn = j;
        }
    }
    return {
        trainRmse: tr.rmse,
        holdoutRmse: ho.rmse,
        trainMae: tr.mae,
        holdoutMae: ho.mae,
        trainR2: tr.r2,
        holdoutR2: ho.r2,
        gapRatio: (0,regression_metrics/* gapRatio */.yr)(tr.rmse, ho.rmse),
        paramsPerSample: design.p / train.rows,
        maxStdCoefficient: maxStd,
        maxStdCoefficientColumn: maxStdColumn,
        maxAbsCoefficient: maxAbs,
        columnSd,
        targetSd,
        targetRange: (0,stats/* range */.y1)(train.y, train.rows),
    };
}
/**
 * The shipped coefficients scored on the same rows, or null when the descriptor ships none.
 * @throws InputError `coefficients-length` when their count is not the design's
 */
function shippedScore(descriptor, design, tables, fit) {
    const shipped = descriptor.coefficients;
    if (shipped === null)
        return null;
    if (shipped.length !== design.p) {
        throw new core_errors/* InputError */.dz('coefficients-length', `\`coefficients\` has ${shipped.length} values but the terms build ${design.p} columns (${design.columnNames.slice(0, 12).map((c) => (0,core_errors/* clip */.$Q)(c)).join(', ')}${design.p > 12 ? ', …' : ''}); expected one value per column, intercept first`, { file: descriptor.file, line: descriptor.coefficientsLine ?? undefined, key: 'coefficients' });
    }
    return scoreShipped(design, tables.train, tables.holdout, shipped, fit.coefficients);
}

;// CONCATENATED MODULE: ./src/run/evaluate.ts
/**
 * One model from descriptor to outcome: fit and score it (fit-model.ts), run every check of the
 * registry against its limits, and build its part of the Result.
 */









/** The report's figures of the shipped coefficients, or null. */
function shippedMetrics(shipped) {
    if (shipped === null)
        return null;
    return {
        train_rmse: (0,result_result/* jsonNumber */.qj)(shipped.train.rmse),
        holdout_rmse: (0,result_result/* jsonNumber */.qj)(shipped.holdout.rmse),
        max_coefficient_difference: (0,result_result/* jsonNumber */.qj)(shipped.maxCoefficientDifference),
    };
}
/** Model metrics for the report. */
function reportMetrics(model) {
    const { metrics: m, fit, design } = model;
    return {
        train_rmse: (0,result_result/* jsonNumber */.qj)(m.trainRmse),
        holdout_rmse: (0,result_result/* jsonNumber */.qj)(m.holdoutRmse),
        train_mae: (0,result_result/* jsonNumber */.qj)(m.trainMae),
        holdout_mae: (0,result_result/* jsonNumber */.qj)(m.holdoutMae),
        train_r2: (0,result_result/* jsonNumber */.qj)(m.trainR2),
        holdout_r2: (0,result_result/* jsonNumber */.qj)(m.holdoutR2),
        gap_ratio: (0,result_result/* jsonNumber */.qj)(m.gapRatio),
        params_per_sample: (0,result_result/* jsonNumber */.qj)(m.paramsPerSample),
        max_std_coefficient: (0,result_result/* jsonNumber */.qj)(m.maxStdCoefficient),
        max_std_coefficient_column: m.maxStdCoefficientColumn >= 0 ? design.columnNames[m.maxStdCoefficientColumn] : null,
        max_abs_coefficient: (0,result_result/* jsonNumber */.qj)(m.maxAbsCoefficient),
        rank: fit.rank,
        condition_number: (0,result_result/* jsonNumber */.qj)(fit.conditionNumber),
        condition_number_scaled: (0,result_result/* jsonNumber */.qj)(fit.conditionNumberScaled),
    };
}
/**
 * Fits one model and runs every check on it. Input problems become a model with verdict
 * `error` (the run goes on); anything else is re-thrown.
 * @param base outcomes on the base commit to compare with; default none (no `base` field)
 */
async function evaluateModel(repo, descriptor, settings, base) {
    let model;
    try {
        model = await fitModel(repo, descriptor, settings);
    }
    catch (error) {
        if (error instanceof core_errors/* InputError */.dz)
            return errorResult(descriptor.name, descriptor.file, error);
        // A fault of fitgate's own on this model's data: report it on this model (exit status 2) so
        // that every other model still gets its outcome; the code marks it as a bug to report.
        const detail = error instanceof Error ? error.message : String(error);
        return errorResult(descriptor.name, descriptor.file, new core_errors/* InputError */.dz(INTERNAL_ERROR, `fitgate could not compute this model (${detail}); this is a fault in fitgate, please report it with the descriptor and data`, { file: descriptor.file, line: descriptor.termsLine }));
    }
    // The run's own passes already produced the folds, their factors and the cross-validation.
    const analyses = new ModelAnalyses({ design: model.design, fit: model.fit, train: model.tables.train, holdout: model.tables.holdout, folds: descriptor.fit }, { folds: model.folds, foldFactors: model.foldFactors, crossValidation: model.crossValidation });
    const context = {
        descriptor,
        design: model.design,
        fit: model.fit,
        metrics: model.metrics,
        train: model.tables.train,
        holdout: model.tables.holdout,
        baseline: base?.models.get(descriptor.name) ?? null,
        analyses,
        predictions: { train: model.trainPredictions, holdout: model.holdoutPredictions },
        shipped: model.shipped,
    };
    const metrics = reportMetrics(model);
    const checks = [];
    let verdict = 'pass';
    for (const check of src_checks/* CHECKS */.ui) {
        const { outcome, figures } = (0,src_checks/* runCheck */.k_)(check, context);
        checks.push(outcome);
        if (figures)
            Object.assign(metrics, figures);
        if (outcome.status === 'fail' || outcome.status === 'warn')
            verdict = (0,result_result/* worse */.JJ)(verdict, outcome.status);
    }
    return {
        name: descriptor.name,
        descriptor: descriptor.file,
        verdict,
        rows: { train: model.tables.train.rows, holdout: model.tables.holdout.rows },
        parameters: model.design.p,
        columns: [...model.design.columnNames],
        metrics,
        coefficients: Array.from(model.fit.coefficients, result_result/* jsonNumber */.qj),
        shipped: shippedMetrics(model.shipped),
        checks,
        ...(base ? { base: compareWithBase(metrics, context.baseline, base.commit) } : {}),
        error: null,
        extra: {
            rank_deficient: model.fit.rankDeficient,
            terms: model.design.terms.map((t, i) => ({ kind: t.spec.kind, line: t.spec.line, first_column: model.design.termOffsets[i], columns: t.columnNames.length, fixed: t.fixed })),
        },
        charts: withBaseCurves(buildChartData(model, checks), { columns: model.design.columnNames, coefficients: Array.from(model.fit.coefficients, result_result/* jsonNumber */.qj) }, context.baseline, base?.commit ?? ''),
    };
}

// EXTERNAL MODULE: ./src/repo/fs-repository.ts
var fs_repository = __nccwpck_require__(4526);
// EXTERNAL MODULE: ./src/run/pool.ts + 1 modules
var pool = __nccwpck_require__(4236);
// EXTERNAL MODULE: ./src/run/worker-role.ts
var worker_role = __nccwpck_require__(5280);
;// CONCATENATED MODULE: ./src/run/model-worker.ts
/**
 * Models on worker threads: the main thread sends each model's descriptor (with the settings
 * file and, when comparing with a base commit, that model's base outcome) as plain data; a
 * worker reads the model's files from the same repository root, fits it, runs its checks and
 * sends the ModelResult back, with its thread's kernel notes. Results come back in descriptor
 * order, identical to a serial run.
 *
 * The worker runs this very module's file. The CLI is bundled into one file, so there the
 * worker loads the whole bundle: the bundle's entry must not start its own work in a worker
 * (it asks isFitgateWorker() of worker-role.ts first), and this module's top level starts the worker loop.
 * When the module is not JavaScript (a `.ts` file run through a transpiler, as in tests),
 * worker threads cannot load it and models run serially.
 */







/** True in a model worker thread started by {@link evaluateModels} (the only kind of fitgate worker). */
function isModelWorker() {
    return (0,worker_role/* isFitgateWorker */.$)();
}
/**
 * The file a worker should run: this module's own file, or null when it is not plain JavaScript
 * (then worker threads cannot load it and models run serially).
 */
function workerScript() {
    const url = import.meta.url;
    if (!url.startsWith('file:') || !/\.(m?js|cjs)$/.test(url))
        return null;
    return (0,external_node_url_namespaceObject.fileURLToPath)(url);
}
/**
 * Evaluates models, on worker threads when that is possible and worth it (more than one model,
 * `jobs` > 1, a disk root, and a JavaScript module file), serially otherwise.
 * @param repo the repository reader (used by the serial path)
 * @param descriptors the models, in report order
 * @param settings the settings file
 * @param options workers and base comparison; default serial, no comparison
 * @returns one ModelResult per descriptor, in the same order
 */
async function evaluateModels(repo, descriptors, settings, options = {}) {
    const jobs = Math.min(options.jobs ?? 1, descriptors.length);
    const script = workerScript();
    if (jobs <= 1 || options.root === undefined || script === null) {
        const results = [];
        for (const descriptor of descriptors)
            results.push(await evaluateModel(repo, descriptor, settings, options.base));
        return results;
    }
    const base = options.base;
    const tasks = descriptors.map((descriptor) => base ? { descriptor, baseline: base.models.get(descriptor.name) ?? null, commit: base.commit } : { descriptor });
    const data = { [worker_role/* WORKER_FLAG */.o]: true, root: options.root, settings };
    const replies = await (0,pool/* runPool */.kD)(tasks, { jobs, script, workerData: data });
    for (const reply of replies)
        (0,kernels/* recordKernelNotes */.YK)(reply.kernelNotes);
    return replies.map((reply) => reply.result);
}
/** The worker loop: evaluate each model task sent by the pool. */
function startModelWorker() {
    const data = external_node_worker_threads_.workerData;
    const repo = (0,fs_repository/* createFsRepository */.E)(data.root);
    (0,pool/* serveTasks */.aJ)(async (task) => {
        const base = task.baseline === undefined
            ? undefined
            : { models: new Map(task.baseline === null ? [] : [[task.descriptor.name, task.baseline]]), commit: task.commit ?? '' };
        const result = await evaluateModel(repo, task.descriptor, data.settings, base);
        return { result, kernelNotes: (0,kernels/* kernelNotes */.TJ)() };
    });
}
if (isModelWorker())
    startModelWorker();

// EXTERNAL MODULE: ./src/run/shard.ts
var run_shard = __nccwpck_require__(6941);
// EXTERNAL MODULE: ./src/core/version.ts
var version = __nccwpck_require__(3323);
;// CONCATENATED MODULE: ./src/run/pipeline.ts
/**
 * The whole run: settings file -> descriptors -> one outcome per model -> Result.
 * No output of its own: reporters format the Result; the entry points decide the exit status.
 */










/**
 * Checks every model of a run.
 * Problems with the settings file or the list of descriptors throw an InputError (nothing can be
 * checked). A descriptor or data file that is bad makes that model's verdict `error`; every
 * other model is still checked, so the Result always has every model's outcome. When the row
 * kernels fell back to JavaScript in this process, the Result's notes say so once.
 * @param settings what to check
 * @param repo the repository's files
 * @param options baseline of a base commit and run notes; default none
 */
async function runPipeline(settings, repo, options = {}) {
    const file = await loadSettings(repo, settings.config, { explicit: settings.configExplicit });
    const shard = options.shard ?? null;
    const discovery = await discoverDescriptors(repo, file, settings.descriptors);
    const paths = (0,run_shard/* selectShard */.Xm)(discovery.paths, shard);
    const models = [];
    const loaded = [];
    for (const path of paths) {
        try {
            loaded.push(await loadDescriptor(repo, path, file));
        }
        catch (error) {
            if (!(error instanceof core_errors/* InputError */.dz))
                throw error;
            models.push(errorResult(path, path, error));
        }
    }
    checkUniqueNames(loaded);
    const base = options.baseline ? { models: options.baseline, commit: options.baseCommit ?? '' } : undefined;
    models.push(...(await evaluateModels(repo, loaded, file, { jobs: options.jobs, root: options.root, base })));
    const notes = [...(options.notes ?? []), ...(file.notes ?? []), ...discovery.notes];
    if (shard)
        notes.push(`shard ${(0,run_shard/* formatShard */._D)(shard)}: ${paths.length} model${paths.length === 1 ? '' : 's'} of this run's share`);
    // The row kernels' note when they had to fall back to JavaScript (here or on a worker thread).
    for (const note of (0,kernels/* kernelNotes */.TJ)())
        if (!notes.includes(note))
            notes.push(note);
    const result = (0,result_result/* summarise */.fS)(models, version/* VERSION */.x, notes);
    if (shard)
        result.shard = { index: shard.index, count: shard.count };
    return result;
}


/***/ }),

/***/ 4236:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {


// EXPORTS
__nccwpck_require__.d(__webpack_exports__, {
  yV: () => (/* binding */ defaultJobs),
  kD: () => (/* binding */ runPool),
  aJ: () => (/* binding */ serveTasks)
});

;// CONCATENATED MODULE: external "node:os"
const external_node_os_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:os");
// EXTERNAL MODULE: external "node:worker_threads"
var external_node_worker_threads_ = __nccwpck_require__(5919);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __nccwpck_require__(4296);
;// CONCATENATED MODULE: ./src/run/pool.ts
/**
 * A small pool of worker threads: runs a list of tasks on up to `jobs` workers and returns the
 * results in the order of the tasks, whatever order they finish in. Tasks and results cross the
 * thread boundary as plain data (structured clone), so they must be plain objects, arrays,
 * strings, numbers, booleans, null and typed arrays.
 *
 * The worker side calls {@link serveTasks} with the function that does one task. An
 * {@link InputError} thrown there comes back as an InputError (code, message, location); any
 * other error comes back as an Error with the worker's message and stack. The first error
 * stops the pool (the other workers are terminated) and rejects the run.
 */



/** The number of workers to use by default: the cores Node may use (os.availableParallelism()). */
function defaultJobs() {
    return Math.max(1, (0,external_node_os_namespaceObject.availableParallelism)());
}
/** Turns a thrown value into plain data for the other thread. */
function errorData(error) {
    if (error instanceof errors/* InputError */.dz) {
        return { name: 'InputError', message: error.message, stack: error.stack, code: error.code, location: { ...error.location } };
    }
    if (error instanceof Error)
        return { name: error.name, message: error.message, stack: error.stack };
    return { name: 'Error', message: String(error) };
}
/** Turns plain error data back into an InputError or an Error. */
function revive(data) {
    if (data.name === 'InputError' && data.code !== undefined)
        return new errors/* InputError */.dz(data.code, data.message, data.location ?? {});
    const error = new Error(data.message);
    error.name = data.name;
    if (data.stack !== undefined)
        error.stack = data.stack;
    return error;
}
/**
 * Runs every task on a pool of worker threads.
 * @param tasks plain-data tasks, each handed to one worker
 * @param options number of workers, worker script and its data
 * @returns one result per task, in task order
 * @throws the first task error (InputErrors stay InputErrors), or an Error when a worker exits early
 */
function runPool(tasks, options) {
    const size = Math.min(Math.max(1, Math.floor(options.jobs)), tasks.length);
    const results = new Array(tasks.length);
    if (tasks.length === 0)
        return Promise.resolve(results);
    return new Promise((resolve, reject) => {
        const workers = [];
        let next = 0;
        let done = 0;
        let settled = false;
        const stop = () => {
            for (const w of workers)
                void w.terminate();
        };
        const failWith = (error) => {
            if (settled)
                return;
            settled = true;
            stop();
            reject(error);
        };
        const feed = (worker) => {
            if (next >= tasks.length)
                return;
            const message = { index: next, task: tasks[next] };
            next++;
            worker.postMessage(message);
        };
        for (let w = 0; w < size; w++) {
            const worker = new external_node_worker_threads_.Worker(options.script, { workerData: options.workerData });
            workers.push(worker);
            worker.on('message', (reply) => {
                if (settled)
                    return;
                if (!reply.ok)
                    return failWith(revive(reply.error));
                results[reply.index] = reply.value;
                done++;
                if (done === tasks.length) {
                    settled = true;
                    stop();
                    resolve(results);
                    return;
                }
                feed(worker);
            });
            worker.on('error', (error) => failWith(error instanceof Error ? error : new Error(String(error))));
            worker.on('exit', (code) => {
                if (!settled)
                    failWith(new Error(`a worker thread exited (code ${code}) before the pool finished its tasks`));
            });
            feed(worker);
        }
    });
}
/**
 * The worker side: answers every task the pool sends with `handle(task)`. Call once, at the top
 * level of the worker script. Does nothing on the main thread.
 * @param handle does one task; its value (or error) goes back to the pool
 */
function serveTasks(handle) {
    if (external_node_worker_threads_.isMainThread || external_node_worker_threads_.parentPort === null)
        return;
    const port = external_node_worker_threads_.parentPort;
    port.on('message', (message) => {
        Promise.resolve()
            .then(() => handle(message.task))
            .then((value) => port.postMessage({ index: message.index, ok: true, value }), (error) => port.postMessage({ index: message.index, ok: false, error: errorData(error) }));
    });
}


/***/ }),

/***/ 6941:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   Xm: () => (/* binding */ selectShard),
/* harmony export */   _D: () => (/* binding */ formatShard),
/* harmony export */   hH: () => (/* binding */ MAX_SHARDS),
/* harmony export */   uK: () => (/* binding */ parseShard)
/* harmony export */ });
/* unused harmony export SHARD_ERROR */
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(4296);
/**
 * Sharding: a deterministic share of the models for one job of a matrix.
 *
 * The rule: sort the repository-relative descriptor paths by UTF-16 code units (the order of
 * JavaScript's default string comparison, independent of locale), then deal them out round-robin:
 * the path at 0-based position i of the sorted list belongs to shard (i mod N) + 1. Every model
 * is in exactly one shard, shard sizes differ by at most one, and every job of the matrix
 * computes the same split from the same checkout without talking to the others.
 */

/** Error codes of {@link parseShard}. */
const SHARD_ERROR = Object.freeze({ syntax: 'shard-syntax', range: 'shard-range' });
/** Largest number of shards accepted (a matrix of jobs is far smaller). */
const MAX_SHARDS = 10_000;
/**
 * Reads `K/N` as written on the command line or in the action input.
 * @param text e.g. `2/4`; white space around the numbers is allowed
 * @param key where the text came from, for the error (e.g. `--shard`)
 * @throws InputError `shard-syntax` when the text is not two positive integers `K/N`,
 *   `shard-range` when K > N or N is over {@link MAX_SHARDS}
 */
function parseShard(text, key = '--shard') {
    const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
    if (!match) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(SHARD_ERROR.syntax, `expected K/N with whole numbers 1 <= K <= N (e.g. 2/4), got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(text)}`, { key });
    }
    const index = Number(match[1]);
    const count = Number(match[2]);
    if (index < 1 || count < 1 || index > count || count > MAX_SHARDS) {
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(SHARD_ERROR.range, `expected 1 <= K <= N <= ${MAX_SHARDS} in K/N, got ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(text)} (K = ${index}, N = ${count})`, { key });
    }
    return { index, count };
}
/** Compares strings by UTF-16 code units (locale-independent). */
function byCodeUnits(a, b) {
    return a < b ? -1 : a > b ? 1 : 0;
}
/**
 * The paths of one shard: round-robin over the sorted, de-duplicated paths (see the module note).
 * @param paths repository-relative descriptor paths, any order
 * @param shard which share to take; null = all paths (sorted)
 * @returns this shard's paths, sorted
 */
function selectShard(paths, shard) {
    const sorted = [...new Set(paths)].sort(byCodeUnits);
    if (shard === null)
        return sorted;
    return sorted.filter((_, i) => i % shard.count === shard.index - 1);
}
/** `K/N` text of a shard (for notes and reports). */
function formatShard(shard) {
    return `${shard.index}/${shard.count}`;
}


/***/ }),

/***/ 5280:
/***/ ((__unused_webpack_module, __webpack_exports__, __nccwpck_require__) => {

/* harmony export */ __nccwpck_require__.d(__webpack_exports__, {
/* harmony export */   $: () => (/* binding */ isFitgateWorker),
/* harmony export */   o: () => (/* binding */ WORKER_FLAG)
/* harmony export */ });
/* harmony import */ var node_worker_threads__WEBPACK_IMPORTED_MODULE_0__ = __nccwpck_require__(5919);
/* harmony import */ var node_worker_threads__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__nccwpck_require__.n(node_worker_threads__WEBPACK_IMPORTED_MODULE_0__);
/**
 * Whether this thread is one of fitgate's worker threads. Every worker runs the same bundle as the
 * command (the bundle of an entry is its worker script too), so the entry files ask
 * {@link isFitgateWorker} and stand aside, and the worker module starts its loop instead.
 */

/** The `workerData` key that marks a fitgate worker. */
const WORKER_FLAG = 'fitgateWorker';
/** True in any worker thread fitgate started. */
function isFitgateWorker() {
    return !node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.isMainThread && typeof node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.workerData === 'object' && node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.workerData !== null && node_worker_threads__WEBPACK_IMPORTED_MODULE_0__.workerData[WORKER_FLAG] === true;
}


/***/ }),

/***/ 181:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("buffer");

/***/ }),

/***/ 1421:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:child_process");

/***/ }),

/***/ 7598:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:crypto");

/***/ }),

/***/ 3024:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs");

/***/ }),

/***/ 1455:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs/promises");

/***/ }),

/***/ 6760:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:path");

/***/ }),

/***/ 5919:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:worker_threads");

/***/ }),

/***/ 932:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("process");

/***/ }),

/***/ 2203:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("stream");

/***/ }),

/***/ 7349:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveBlockMap = __nccwpck_require__(7103);
var resolveBlockSeq = __nccwpck_require__(334);
var resolveFlowCollection = __nccwpck_require__(3142);

function resolveCollection(CN, ctx, token, onError, tagName, tag) {
    const coll = token.type === 'block-map'
        ? resolveBlockMap.resolveBlockMap(CN, ctx, token, onError, tag)
        : token.type === 'block-seq'
            ? resolveBlockSeq.resolveBlockSeq(CN, ctx, token, onError, tag)
            : resolveFlowCollection.resolveFlowCollection(CN, ctx, token, onError, tag);
    const Coll = coll.constructor;
    // If we got a tagName matching the class, or the tag name is '!',
    // then use the tagName from the node class used to create it.
    if (tagName === '!' || tagName === Coll.tagName) {
        coll.tag = Coll.tagName;
        return coll;
    }
    if (tagName)
        coll.tag = tagName;
    return coll;
}
function composeCollection(CN, ctx, token, props, onError) {
    const tagToken = props.tag;
    const tagName = !tagToken
        ? null
        : ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg));
    if (token.type === 'block-seq') {
        const { anchor, newlineAfterProp: nl } = props;
        const lastProp = anchor && tagToken
            ? anchor.offset > tagToken.offset
                ? anchor
                : tagToken
            : (anchor ?? tagToken);
        if (lastProp && (!nl || nl.offset < lastProp.offset)) {
            const message = 'Missing newline after block sequence props';
            onError(lastProp, 'MISSING_CHAR', message);
        }
    }
    const expType = token.type === 'block-map'
        ? 'map'
        : token.type === 'block-seq'
            ? 'seq'
            : token.start.source === '{'
                ? 'map'
                : 'seq';
    // shortcut: check if it's a generic YAMLMap or YAMLSeq
    // before jumping into the custom tag logic.
    if (!tagToken ||
        !tagName ||
        tagName === '!' ||
        (tagName === YAMLMap.YAMLMap.tagName && expType === 'map') ||
        (tagName === YAMLSeq.YAMLSeq.tagName && expType === 'seq')) {
        return resolveCollection(CN, ctx, token, onError, tagName);
    }
    let tag = ctx.schema.tags.find(t => t.tag === tagName && t.collection === expType);
    if (!tag) {
        const kt = ctx.schema.knownTags[tagName];
        if (kt?.collection === expType) {
            ctx.schema.tags.push(Object.assign({}, kt, { default: false }));
            tag = kt;
        }
        else {
            if (kt) {
                onError(tagToken, 'BAD_COLLECTION_TYPE', `${kt.tag} used for ${expType} collection, but expects ${kt.collection ?? 'scalar'}`, true);
            }
            else {
                onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, true);
            }
            return resolveCollection(CN, ctx, token, onError, tagName);
        }
    }
    const coll = resolveCollection(CN, ctx, token, onError, tagName, tag);
    const res = tag.resolve?.(coll, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg), ctx.options) ?? coll;
    const node = identity.isNode(res)
        ? res
        : new Scalar.Scalar(res);
    node.range = coll.range;
    node.tag = tagName;
    if (tag?.format)
        node.format = tag.format;
    return node;
}

exports.composeCollection = composeCollection;


/***/ }),

/***/ 3683:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Document = __nccwpck_require__(3021);
var composeNode = __nccwpck_require__(5937);
var resolveEnd = __nccwpck_require__(7788);
var resolveProps = __nccwpck_require__(4631);

function composeDoc(options, directives, { offset, start, value, end }, onError) {
    const opts = Object.assign({ _directives: directives }, options);
    const doc = new Document.Document(undefined, opts);
    const ctx = {
        atKey: false,
        atRoot: true,
        directives: doc.directives,
        options: doc.options,
        schema: doc.schema
    };
    const props = resolveProps.resolveProps(start, {
        indicator: 'doc-start',
        next: value ?? end?.[0],
        offset,
        onError,
        parentIndent: 0,
        startOnNewline: true
    });
    if (props.found) {
        doc.directives.docStart = true;
        if (value &&
            (value.type === 'block-map' || value.type === 'block-seq') &&
            !props.hasNewline)
            onError(props.end, 'MISSING_CHAR', 'Block collection cannot start on same line with directives-end marker');
    }
    // @ts-expect-error If Contents is set, let's trust the user
    doc.contents = value
        ? composeNode.composeNode(ctx, value, props, onError)
        : composeNode.composeEmptyNode(ctx, props.end, start, null, props, onError);
    const contentEnd = doc.contents.range[2];
    const re = resolveEnd.resolveEnd(end, contentEnd, false, onError);
    if (re.comment)
        doc.comment = re.comment;
    doc.range = [offset, contentEnd, re.offset];
    return doc;
}

exports.composeDoc = composeDoc;


/***/ }),

/***/ 5937:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var composeCollection = __nccwpck_require__(7349);
var composeScalar = __nccwpck_require__(5413);
var resolveEnd = __nccwpck_require__(7788);
var utilEmptyScalarPosition = __nccwpck_require__(2599);

const CN = { composeNode, composeEmptyNode };
function composeNode(ctx, token, props, onError) {
    const atKey = ctx.atKey;
    const { spaceBefore, comment, anchor, tag } = props;
    let node;
    let isSrcToken = true;
    switch (token.type) {
        case 'alias':
            node = composeAlias(ctx, token, onError);
            if (anchor || tag)
                onError(token, 'ALIAS_PROPS', 'An alias node must not specify any properties');
            break;
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'block-scalar':
            node = composeScalar.composeScalar(ctx, token, tag, onError);
            if (anchor)
                node.anchor = anchor.source.substring(1);
            break;
        case 'block-map':
        case 'block-seq':
        case 'flow-collection':
            try {
                node = composeCollection.composeCollection(CN, ctx, token, props, onError);
                if (anchor)
                    node.anchor = anchor.source.substring(1);
            }
            catch (error) {
                // Almost certainly here due to a stack overflow
                const message = error instanceof Error ? error.message : String(error);
                onError(token, 'RESOURCE_EXHAUSTION', message);
            }
            break;
        default: {
            const message = token.type === 'error'
                ? token.message
                : `Unsupported token (type: ${token.type})`;
            onError(token, 'UNEXPECTED_TOKEN', message);
            isSrcToken = false;
        }
    }
    node ?? (node = composeEmptyNode(ctx, token.offset, undefined, null, props, onError));
    if (anchor && node.anchor === '')
        onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    if (atKey &&
        ctx.options.stringKeys &&
        (!identity.isScalar(node) ||
            typeof node.value !== 'string' ||
            (node.tag && node.tag !== 'tag:yaml.org,2002:str'))) {
        const msg = 'With stringKeys, all keys must be strings';
        onError(tag ?? token, 'NON_STRING_KEY', msg);
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        if (token.type === 'scalar' && token.source === '')
            node.comment = comment;
        else
            node.commentBefore = comment;
    }
    // @ts-expect-error Type checking misses meaning of isSrcToken
    if (ctx.options.keepSourceTokens && isSrcToken)
        node.srcToken = token;
    return node;
}
function composeEmptyNode(ctx, offset, before, pos, { spaceBefore, comment, anchor, tag, end }, onError) {
    const token = {
        type: 'scalar',
        offset: utilEmptyScalarPosition.emptyScalarPosition(offset, before, pos),
        indent: -1,
        source: ''
    };
    const node = composeScalar.composeScalar(ctx, token, tag, onError);
    if (anchor) {
        node.anchor = anchor.source.substring(1);
        if (node.anchor === '')
            onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        node.comment = comment;
        node.range[2] = end;
    }
    return node;
}
function composeAlias({ options }, { offset, source, end }, onError) {
    const alias = new Alias.Alias(source.substring(1));
    if (alias.source === '')
        onError(offset, 'BAD_ALIAS', 'Alias cannot be an empty string');
    if (alias.source.endsWith(':'))
        onError(offset + source.length - 1, 'BAD_ALIAS', 'Alias ending in : is ambiguous', true);
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, options.strict, onError);
    alias.range = [offset, valueEnd, re.offset];
    if (re.comment)
        alias.comment = re.comment;
    return alias;
}

exports.composeEmptyNode = composeEmptyNode;
exports.composeNode = composeNode;


/***/ }),

/***/ 5413:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);

function composeScalar(ctx, token, tagToken, onError) {
    const { value, type, comment, range } = token.type === 'block-scalar'
        ? resolveBlockScalar.resolveBlockScalar(ctx, token, onError)
        : resolveFlowScalar.resolveFlowScalar(token, ctx.options.strict, onError);
    const tagName = tagToken
        ? ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg))
        : null;
    let tag;
    if (ctx.options.stringKeys && ctx.atKey) {
        tag = ctx.schema[identity.SCALAR];
    }
    else if (tagName)
        tag = findScalarTagByName(ctx.schema, value, tagName, tagToken, onError);
    else if (token.type === 'scalar')
        tag = findScalarTagByTest(ctx, value, token, onError);
    else
        tag = ctx.schema[identity.SCALAR];
    let scalar;
    try {
        const res = tag.resolve(value, msg => onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg), ctx.options);
        scalar = identity.isScalar(res) ? res : new Scalar.Scalar(res);
    }
    catch (error) {
        const msg = error instanceof Error ? error.message : String(error);
        onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg);
        scalar = new Scalar.Scalar(value);
    }
    scalar.range = range;
    scalar.source = value;
    if (type)
        scalar.type = type;
    if (tagName)
        scalar.tag = tagName;
    if (tag.format)
        scalar.format = tag.format;
    if (comment)
        scalar.comment = comment;
    return scalar;
}
function findScalarTagByName(schema, value, tagName, tagToken, onError) {
    if (tagName === '!')
        return schema[identity.SCALAR]; // non-specific tag
    const matchWithTest = [];
    for (const tag of schema.tags) {
        if (!tag.collection && tag.tag === tagName) {
            if (tag.default && tag.test)
                matchWithTest.push(tag);
            else
                return tag;
        }
    }
    for (const tag of matchWithTest)
        if (tag.test?.test(value))
            return tag;
    const kt = schema.knownTags[tagName];
    if (kt && !kt.collection) {
        // Ensure that the known tag is available for stringifying,
        // but does not get used by default.
        schema.tags.push(Object.assign({}, kt, { default: false, test: undefined }));
        return kt;
    }
    onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, tagName !== 'tag:yaml.org,2002:str');
    return schema[identity.SCALAR];
}
function findScalarTagByTest({ atKey, directives, schema }, value, token, onError) {
    const tag = schema.tags.find(tag => (tag.default === true || (atKey && tag.default === 'key')) &&
        tag.test?.test(value)) || schema[identity.SCALAR];
    if (schema.compat) {
        const compat = schema.compat.find(tag => tag.default && tag.test?.test(value)) ??
            schema[identity.SCALAR];
        if (tag.tag !== compat.tag) {
            const ts = directives.tagString(tag.tag);
            const cs = directives.tagString(compat.tag);
            const msg = `Value may be parsed as either ${ts} or ${cs}`;
            onError(token, 'TAG_RESOLVE_FAILED', msg, true);
        }
    }
    return tag;
}

exports.composeScalar = composeScalar;


/***/ }),

/***/ 9984:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var directives = __nccwpck_require__(1342);
var Document = __nccwpck_require__(3021);
var errors = __nccwpck_require__(1464);
var identity = __nccwpck_require__(1127);
var composeDoc = __nccwpck_require__(3683);
var resolveEnd = __nccwpck_require__(7788);

function getErrorPos(src) {
    if (typeof src === 'number')
        return [src, src + 1];
    if (Array.isArray(src))
        return src.length === 2 ? src : [src[0], src[1]];
    const { offset, source } = src;
    return [offset, offset + (typeof source === 'string' ? source.length : 1)];
}
function parsePrelude(prelude) {
    let comment = '';
    let atComment = false;
    let afterEmptyLine = false;
    for (let i = 0; i < prelude.length; ++i) {
        const source = prelude[i];
        switch (source[0]) {
            case '#':
                comment +=
                    (comment === '' ? '' : afterEmptyLine ? '\n\n' : '\n') +
                        (source.substring(1) || ' ');
                atComment = true;
                afterEmptyLine = false;
                break;
            case '%':
                if (prelude[i + 1]?.[0] !== '#')
                    i += 1;
                atComment = false;
                break;
            default:
                // This may be wrong after doc-end, but in that case it doesn't matter
                if (!atComment)
                    afterEmptyLine = true;
                atComment = false;
        }
    }
    return { comment, afterEmptyLine };
}
/**
 * Compose a stream of CST nodes into a stream of YAML Documents.
 *
 * ```ts
 * import { Composer, Parser } from 'yaml'
 *
 * const src: string = ...
 * const tokens = new Parser().parse(src)
 * const docs = new Composer().compose(tokens)
 * ```
 */
class Composer {
    constructor(options = {}) {
        this.doc = null;
        this.atDirectives = false;
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
        this.onError = (source, code, message, warning) => {
            const pos = getErrorPos(source);
            if (warning)
                this.warnings.push(new errors.YAMLWarning(pos, code, message));
            else
                this.errors.push(new errors.YAMLParseError(pos, code, message));
        };
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        this.directives = new directives.Directives({ version: options.version || '1.2' });
        this.options = options;
    }
    decorate(doc, afterDoc) {
        const { comment, afterEmptyLine } = parsePrelude(this.prelude);
        //console.log({ dc: doc.comment, prelude, comment })
        if (comment) {
            const dc = doc.contents;
            if (afterDoc) {
                doc.comment = doc.comment ? `${doc.comment}\n${comment}` : comment;
            }
            else if (afterEmptyLine || doc.directives.docStart || !dc) {
                doc.commentBefore = comment;
            }
            else if (identity.isCollection(dc) && !dc.flow && dc.items.length > 0) {
                let it = dc.items[0];
                if (identity.isPair(it))
                    it = it.key;
                const cb = it.commentBefore;
                it.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
            else {
                const cb = dc.commentBefore;
                dc.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
        }
        if (afterDoc) {
            for (let i = 0; i < this.errors.length; ++i)
                doc.errors.push(this.errors[i]);
            for (let i = 0; i < this.warnings.length; ++i)
                doc.warnings.push(this.warnings[i]);
        }
        else {
            doc.errors = this.errors;
            doc.warnings = this.warnings;
        }
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
    }
    /**
     * Current stream status information.
     *
     * Mostly useful at the end of input for an empty stream.
     */
    streamInfo() {
        return {
            comment: parsePrelude(this.prelude).comment,
            directives: this.directives,
            errors: this.errors,
            warnings: this.warnings
        };
    }
    /**
     * Compose tokens into documents.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *compose(tokens, forceDoc = false, endOffset = -1) {
        for (const token of tokens)
            yield* this.next(token);
        yield* this.end(forceDoc, endOffset);
    }
    /** Advance the composer by one CST token. */
    *next(token) {
        if (node_process.env.LOG_STREAM)
            console.dir(token, { depth: null });
        switch (token.type) {
            case 'directive':
                this.directives.add(token.source, (offset, message, warning) => {
                    const pos = getErrorPos(token);
                    pos[0] += offset;
                    this.onError(pos, 'BAD_DIRECTIVE', message, warning);
                });
                this.prelude.push(token.source);
                this.atDirectives = true;
                break;
            case 'document': {
                const doc = composeDoc.composeDoc(this.options, this.directives, token, this.onError);
                if (this.atDirectives && !doc.directives.docStart)
                    this.onError(token, 'MISSING_CHAR', 'Missing directives-end/doc-start indicator line');
                this.decorate(doc, false);
                if (this.doc)
                    yield this.doc;
                this.doc = doc;
                this.atDirectives = false;
                break;
            }
            case 'byte-order-mark':
            case 'space':
                break;
            case 'comment':
            case 'newline':
                this.prelude.push(token.source);
                break;
            case 'error': {
                const msg = token.source
                    ? `${token.message}: ${JSON.stringify(token.source)}`
                    : token.message;
                const error = new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg);
                if (this.atDirectives || !this.doc)
                    this.errors.push(error);
                else
                    this.doc.errors.push(error);
                break;
            }
            case 'doc-end': {
                if (!this.doc) {
                    const msg = 'Unexpected doc-end without preceding document';
                    this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg));
                    break;
                }
                this.doc.directives.docEnd = true;
                const end = resolveEnd.resolveEnd(token.end, token.offset + token.source.length, this.doc.options.strict, this.onError);
                this.decorate(this.doc, true);
                if (end.comment) {
                    const dc = this.doc.comment;
                    this.doc.comment = dc ? `${dc}\n${end.comment}` : end.comment;
                }
                this.doc.range[2] = end.offset;
                break;
            }
            default:
                this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', `Unsupported token ${token.type}`));
        }
    }
    /**
     * Call at end of input to yield any remaining document.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *end(forceDoc = false, endOffset = -1) {
        if (this.doc) {
            this.decorate(this.doc, true);
            yield this.doc;
            this.doc = null;
        }
        else if (forceDoc) {
            const opts = Object.assign({ _directives: this.directives }, this.options);
            const doc = new Document.Document(undefined, opts);
            if (this.atDirectives)
                this.onError(endOffset, 'MISSING_CHAR', 'Missing directives-end indicator line');
            doc.range = [0, endOffset, endOffset];
            this.decorate(doc, false);
            yield doc;
        }
    }
}

exports.Composer = Composer;


/***/ }),

/***/ 7103:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilFlowIndentCheck = __nccwpck_require__(4051);
var utilMapIncludes = __nccwpck_require__(1187);

const startColMsg = 'All mapping items must start at the same column';
function resolveBlockMap({ composeNode, composeEmptyNode }, ctx, bm, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLMap.YAMLMap;
    const map = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    let offset = bm.offset;
    let commentEnd = null;
    for (const collItem of bm.items) {
        const { start, key, sep, value } = collItem;
        // key properties
        const keyProps = resolveProps.resolveProps(start, {
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: bm.indent,
            startOnNewline: true
        });
        const implicitKey = !keyProps.found;
        if (implicitKey) {
            if (key) {
                if (key.type === 'block-seq')
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'A block sequence may not be used as an implicit map key');
                else if ('indent' in key && key.indent !== bm.indent)
                    onError(offset, 'BAD_INDENT', startColMsg);
            }
            if (!keyProps.anchor && !keyProps.tag && !sep) {
                commentEnd = keyProps.end;
                if (keyProps.comment) {
                    if (map.comment)
                        map.comment += '\n' + keyProps.comment;
                    else
                        map.comment = keyProps.comment;
                }
                continue;
            }
            if (keyProps.newlineAfterProp || utilContainsNewline.containsNewline(key)) {
                onError(key ?? start[start.length - 1], 'MULTILINE_IMPLICIT_KEY', 'Implicit keys need to be on a single line');
            }
        }
        else if (keyProps.found?.indent !== bm.indent) {
            onError(offset, 'BAD_INDENT', startColMsg);
        }
        // key value
        ctx.atKey = true;
        const keyStart = keyProps.end;
        const keyNode = key
            ? composeNode(ctx, key, keyProps, onError)
            : composeEmptyNode(ctx, keyStart, start, null, keyProps, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bm.indent, key, onError);
        ctx.atKey = false;
        if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
            onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
        // value properties
        const valueProps = resolveProps.resolveProps(sep ?? [], {
            indicator: 'map-value-ind',
            next: value,
            offset: keyNode.range[2],
            onError,
            parentIndent: bm.indent,
            startOnNewline: !key || key.type === 'block-scalar'
        });
        offset = valueProps.end;
        if (valueProps.found) {
            if (implicitKey) {
                if (value?.type === 'block-map' && !valueProps.hasNewline)
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'Nested mappings are not allowed in compact mappings');
                if (ctx.options.strict &&
                    keyProps.start < valueProps.found.offset - 1024)
                    onError(keyNode.range, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit block mapping key');
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : composeEmptyNode(ctx, offset, sep, null, valueProps, onError);
            if (ctx.schema.compat)
                utilFlowIndentCheck.flowIndentCheck(bm.indent, value, onError);
            offset = valueNode.range[2];
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
        else {
            // key with no value
            if (implicitKey)
                onError(keyNode.range, 'MISSING_CHAR', 'Implicit map keys need to be followed by map values');
            if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
    }
    if (commentEnd && commentEnd < offset)
        onError(commentEnd, 'IMPOSSIBLE', 'Map comment with trailing content');
    map.range = [bm.offset, offset, commentEnd ?? offset];
    return map;
}

exports.resolveBlockMap = resolveBlockMap;


/***/ }),

/***/ 8913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function resolveBlockScalar(ctx, scalar, onError) {
    const start = scalar.offset;
    const header = parseBlockScalarHeader(scalar, ctx.options.strict, onError);
    if (!header)
        return { value: '', type: null, comment: '', range: [start, start, start] };
    const type = header.mode === '>' ? Scalar.Scalar.BLOCK_FOLDED : Scalar.Scalar.BLOCK_LITERAL;
    const lines = scalar.source ? splitLines(scalar.source) : [];
    // determine the end of content & start of chomping
    let chompStart = lines.length;
    for (let i = lines.length - 1; i >= 0; --i) {
        const content = lines[i][1];
        if (content === '' || content === '\r')
            chompStart = i;
        else
            break;
    }
    // shortcut for empty contents
    if (chompStart === 0) {
        const value = header.chomp === '+' && lines.length > 0
            ? '\n'.repeat(Math.max(1, lines.length - 1))
            : '';
        let end = start + header.length;
        if (scalar.source)
            end += scalar.source.length;
        return { value, type, comment: header.comment, range: [start, end, end] };
    }
    // find the indentation level to trim from start
    let trimIndent = scalar.indent + header.indent;
    let offset = scalar.offset + header.length;
    let contentStart = 0;
    for (let i = 0; i < chompStart; ++i) {
        const [indent, content] = lines[i];
        if (content === '' || content === '\r') {
            if (header.indent === 0 && indent.length > trimIndent)
                trimIndent = indent.length;
        }
        else {
            if (indent.length < trimIndent) {
                const message = 'Block scalars with more-indented leading empty lines must use an explicit indentation indicator';
                onError(offset + indent.length, 'MISSING_CHAR', message);
            }
            if (header.indent === 0)
                trimIndent = indent.length;
            contentStart = i;
            if (trimIndent === 0 && !ctx.atRoot) {
                const message = 'Block scalar values in collections must be indented';
                onError(offset, 'BAD_INDENT', message);
            }
            break;
        }
        offset += indent.length + content.length + 1;
    }
    // include trailing more-indented empty lines in content
    for (let i = lines.length - 1; i >= chompStart; --i) {
        if (lines[i][0].length > trimIndent)
            chompStart = i + 1;
    }
    let value = '';
    let sep = '';
    let prevMoreIndented = false;
    // leading whitespace is kept intact
    for (let i = 0; i < contentStart; ++i)
        value += lines[i][0].slice(trimIndent) + '\n';
    for (let i = contentStart; i < chompStart; ++i) {
        let [indent, content] = lines[i];
        offset += indent.length + content.length + 1;
        const crlf = content[content.length - 1] === '\r';
        if (crlf)
            content = content.slice(0, -1);
        /* istanbul ignore if already caught in lexer */
        if (content && indent.length < trimIndent) {
            const src = header.indent
                ? 'explicit indentation indicator'
                : 'first line';
            const message = `Block scalar lines must not be less indented than their ${src}`;
            onError(offset - content.length - (crlf ? 2 : 1), 'BAD_INDENT', message);
            indent = '';
        }
        if (type === Scalar.Scalar.BLOCK_LITERAL) {
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
        }
        else if (indent.length > trimIndent || content[0] === '\t') {
            // more-indented content within a folded block
            if (sep === ' ')
                sep = '\n';
            else if (!prevMoreIndented && sep === '\n')
                sep = '\n\n';
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
            prevMoreIndented = true;
        }
        else if (content === '') {
            // empty line
            if (sep === '\n')
                value += '\n';
            else
                sep = '\n';
        }
        else {
            value += sep + content;
            sep = ' ';
            prevMoreIndented = false;
        }
    }
    switch (header.chomp) {
        case '-':
            break;
        case '+':
            for (let i = chompStart; i < lines.length; ++i)
                value += '\n' + lines[i][0].slice(trimIndent);
            if (value[value.length - 1] !== '\n')
                value += '\n';
            break;
        default:
            value += '\n';
    }
    const end = start + header.length + scalar.source.length;
    return { value, type, comment: header.comment, range: [start, end, end] };
}
function parseBlockScalarHeader({ offset, props }, strict, onError) {
    /* istanbul ignore if should not happen */
    if (props[0].type !== 'block-scalar-header') {
        onError(props[0], 'IMPOSSIBLE', 'Block scalar header not found');
        return null;
    }
    const { source } = props[0];
    const mode = source[0];
    let indent = 0;
    let chomp = '';
    let error = -1;
    for (let i = 1; i < source.length; ++i) {
        const ch = source[i];
        if (!chomp && (ch === '-' || ch === '+'))
            chomp = ch;
        else {
            const n = Number(ch);
            if (!indent && n)
                indent = n;
            else if (error === -1)
                error = offset + i;
        }
    }
    if (error !== -1)
        onError(error, 'UNEXPECTED_TOKEN', `Block scalar header includes extra characters: ${source}`);
    let hasSpace = false;
    let comment = '';
    let length = source.length;
    for (let i = 1; i < props.length; ++i) {
        const token = props[i];
        switch (token.type) {
            case 'space':
                hasSpace = true;
            // fallthrough
            case 'newline':
                length += token.source.length;
                break;
            case 'comment':
                if (strict && !hasSpace) {
                    const message = 'Comments must be separated from other tokens by white space characters';
                    onError(token, 'MISSING_CHAR', message);
                }
                length += token.source.length;
                comment = token.source.substring(1);
                break;
            case 'error':
                onError(token, 'UNEXPECTED_TOKEN', token.message);
                length += token.source.length;
                break;
            /* istanbul ignore next should not happen */
            default: {
                const message = `Unexpected token in block scalar header: ${token.type}`;
                onError(token, 'UNEXPECTED_TOKEN', message);
                const ts = token.source;
                if (ts && typeof ts === 'string')
                    length += ts.length;
            }
        }
    }
    return { mode, indent, chomp, comment, length };
}
/** @returns Array of lines split up as `[indent, content]` */
function splitLines(source) {
    const split = source.split(/\n( *)/);
    const first = split[0];
    const m = first.match(/^( *)/);
    const line0 = m?.[1]
        ? [m[1], first.slice(m[1].length)]
        : ['', first];
    const lines = [line0];
    for (let i = 1; i < split.length; i += 2)
        lines.push([split[i], split[i + 1]]);
    return lines;
}

exports.resolveBlockScalar = resolveBlockScalar;


/***/ }),

/***/ 334:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var YAMLSeq = __nccwpck_require__(2223);
var resolveProps = __nccwpck_require__(4631);
var utilFlowIndentCheck = __nccwpck_require__(4051);

function resolveBlockSeq({ composeNode, composeEmptyNode }, ctx, bs, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLSeq.YAMLSeq;
    const seq = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = bs.offset;
    let commentEnd = null;
    for (const { start, value } of bs.items) {
        const props = resolveProps.resolveProps(start, {
            indicator: 'seq-item-ind',
            next: value,
            offset,
            onError,
            parentIndent: bs.indent,
            startOnNewline: true
        });
        if (!props.found) {
            if (props.anchor || props.tag || value) {
                if (value?.type === 'block-seq')
                    onError(props.end, 'BAD_INDENT', 'All sequence items must start at the same column');
                else
                    onError(offset, 'MISSING_CHAR', 'Sequence item without - indicator');
            }
            else {
                commentEnd = props.end;
                if (props.comment)
                    seq.comment = props.comment;
                continue;
            }
        }
        const node = value
            ? composeNode(ctx, value, props, onError)
            : composeEmptyNode(ctx, props.end, start, null, props, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bs.indent, value, onError);
        offset = node.range[2];
        seq.items.push(node);
    }
    seq.range = [bs.offset, offset, commentEnd ?? offset];
    return seq;
}

exports.resolveBlockSeq = resolveBlockSeq;


/***/ }),

/***/ 7788:
/***/ ((__unused_webpack_module, exports) => {



function resolveEnd(end, offset, reqSpace, onError) {
    let comment = '';
    if (end) {
        let hasSpace = false;
        let sep = '';
        for (const token of end) {
            const { source, type } = token;
            switch (type) {
                case 'space':
                    hasSpace = true;
                    break;
                case 'comment': {
                    if (reqSpace && !hasSpace)
                        onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                    const cb = source.substring(1) || ' ';
                    if (!comment)
                        comment = cb;
                    else
                        comment += sep + cb;
                    sep = '';
                    break;
                }
                case 'newline':
                    if (comment)
                        sep += source;
                    hasSpace = true;
                    break;
                default:
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${type} at node end`);
            }
            offset += source.length;
        }
    }
    return { comment, offset };
}

exports.resolveEnd = resolveEnd;


/***/ }),

/***/ 3142:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveEnd = __nccwpck_require__(7788);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilMapIncludes = __nccwpck_require__(1187);

const blockMsg = 'Block collections are not allowed within flow collections';
const isBlock = (token) => token && (token.type === 'block-map' || token.type === 'block-seq');
function resolveFlowCollection({ composeNode, composeEmptyNode }, ctx, fc, onError, tag) {
    const isMap = fc.start.source === '{';
    const fcName = isMap ? 'flow map' : 'flow sequence';
    const NodeClass = (tag?.nodeClass ?? (isMap ? YAMLMap.YAMLMap : YAMLSeq.YAMLSeq));
    const coll = new NodeClass(ctx.schema);
    coll.flow = true;
    const atRoot = ctx.atRoot;
    if (atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = fc.offset + fc.start.source.length;
    for (let i = 0; i < fc.items.length; ++i) {
        const collItem = fc.items[i];
        const { start, key, sep, value } = collItem;
        const props = resolveProps.resolveProps(start, {
            flow: fcName,
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: fc.indent,
            startOnNewline: false
        });
        if (!props.found) {
            if (!props.anchor && !props.tag && !sep && !value) {
                if (i === 0 && props.comma)
                    onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
                else if (i < fc.items.length - 1)
                    onError(props.start, 'UNEXPECTED_TOKEN', `Unexpected empty item in ${fcName}`);
                if (props.comment) {
                    if (coll.comment)
                        coll.comment += '\n' + props.comment;
                    else
                        coll.comment = props.comment;
                }
                offset = props.end;
                continue;
            }
            if (!isMap && ctx.options.strict && utilContainsNewline.containsNewline(key))
                onError(key, // checked by containsNewline()
                'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
        }
        if (i === 0) {
            if (props.comma)
                onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
        }
        else {
            if (!props.comma)
                onError(props.start, 'MISSING_CHAR', `Missing , between ${fcName} items`);
            if (props.comment) {
                let prevItemComment = '';
                loop: for (const st of start) {
                    switch (st.type) {
                        case 'comma':
                        case 'space':
                            break;
                        case 'comment':
                            prevItemComment = st.source.substring(1);
                            break loop;
                        default:
                            break loop;
                    }
                }
                if (prevItemComment) {
                    let prev = coll.items[coll.items.length - 1];
                    if (identity.isPair(prev))
                        prev = prev.value ?? prev.key;
                    if (prev.comment)
                        prev.comment += '\n' + prevItemComment;
                    else
                        prev.comment = prevItemComment;
                    props.comment = props.comment.substring(prevItemComment.length + 1);
                }
            }
        }
        if (!isMap && !sep && !props.found) {
            // item is a value in a seq
            // → key & sep are empty, start does not include ? or :
            const valueNode = value
                ? composeNode(ctx, value, props, onError)
                : composeEmptyNode(ctx, props.end, sep, null, props, onError);
            coll.items.push(valueNode);
            offset = valueNode.range[2];
            if (isBlock(value))
                onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
        }
        else {
            // item is a key+value pair
            // key value
            ctx.atKey = true;
            const keyStart = props.end;
            const keyNode = key
                ? composeNode(ctx, key, props, onError)
                : composeEmptyNode(ctx, keyStart, start, null, props, onError);
            if (isBlock(key))
                onError(keyNode.range, 'BLOCK_IN_FLOW', blockMsg);
            ctx.atKey = false;
            // value properties
            const valueProps = resolveProps.resolveProps(sep ?? [], {
                flow: fcName,
                indicator: 'map-value-ind',
                next: value,
                offset: keyNode.range[2],
                onError,
                parentIndent: fc.indent,
                startOnNewline: false
            });
            if (valueProps.found) {
                if (!isMap && !props.found && ctx.options.strict) {
                    if (sep)
                        for (const st of sep) {
                            if (st === valueProps.found)
                                break;
                            if (st.type === 'newline') {
                                onError(st, 'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
                                break;
                            }
                        }
                    if (props.start < valueProps.found.offset - 1024)
                        onError(valueProps.found, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit flow sequence key');
                }
            }
            else if (value) {
                if ('source' in value && value.source?.[0] === ':')
                    onError(value, 'MISSING_CHAR', `Missing space after : in ${fcName}`);
                else
                    onError(valueProps.start, 'MISSING_CHAR', `Missing , or : between ${fcName} items`);
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : valueProps.found
                    ? composeEmptyNode(ctx, valueProps.end, sep, null, valueProps, onError)
                    : null;
            if (valueNode) {
                if (isBlock(value))
                    onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
            }
            else if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            if (isMap) {
                const map = coll;
                if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
                    onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
                map.items.push(pair);
            }
            else {
                const map = new YAMLMap.YAMLMap(ctx.schema);
                map.flow = true;
                map.items.push(pair);
                const endRange = (valueNode ?? keyNode).range;
                map.range = [keyNode.range[0], endRange[1], endRange[2]];
                coll.items.push(map);
            }
            offset = valueNode ? valueNode.range[2] : valueProps.end;
        }
    }
    const expectedEnd = isMap ? '}' : ']';
    const [ce, ...ee] = fc.end;
    let cePos = offset;
    if (ce?.source === expectedEnd)
        cePos = ce.offset + ce.source.length;
    else {
        const name = fcName[0].toUpperCase() + fcName.substring(1);
        const msg = atRoot
            ? `${name} must end with a ${expectedEnd}`
            : `${name} in block collection must be sufficiently indented and end with a ${expectedEnd}`;
        onError(offset, atRoot ? 'MISSING_CHAR' : 'BAD_INDENT', msg);
        if (ce && ce.source.length !== 1)
            ee.unshift(ce);
    }
    if (ee.length > 0) {
        const end = resolveEnd.resolveEnd(ee, cePos, ctx.options.strict, onError);
        if (end.comment) {
            if (coll.comment)
                coll.comment += '\n' + end.comment;
            else
                coll.comment = end.comment;
        }
        coll.range = [fc.offset, cePos, end.offset];
    }
    else {
        coll.range = [fc.offset, cePos, cePos];
    }
    return coll;
}

exports.resolveFlowCollection = resolveFlowCollection;


/***/ }),

/***/ 6842:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var resolveEnd = __nccwpck_require__(7788);

function resolveFlowScalar(scalar, strict, onError) {
    const { offset, type, source, end } = scalar;
    let _type;
    let value;
    const _onError = (rel, code, msg) => onError(offset + rel, code, msg);
    switch (type) {
        case 'scalar':
            _type = Scalar.Scalar.PLAIN;
            value = plainValue(source, _onError);
            break;
        case 'single-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_SINGLE;
            value = singleQuotedValue(source, _onError);
            break;
        case 'double-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_DOUBLE;
            value = doubleQuotedValue(source, _onError);
            break;
        /* istanbul ignore next should not happen */
        default:
            onError(scalar, 'UNEXPECTED_TOKEN', `Expected a flow scalar value, but found: ${type}`);
            return {
                value: '',
                type: null,
                comment: '',
                range: [offset, offset + source.length, offset + source.length]
            };
    }
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, strict, onError);
    return {
        value,
        type: _type,
        comment: re.comment,
        range: [offset, valueEnd, re.offset]
    };
}
function plainValue(source, onError) {
    let badChar = '';
    switch (source[0]) {
        /* istanbul ignore next should not happen */
        case '\t':
            badChar = 'a tab character';
            break;
        case ',':
            badChar = 'flow indicator character ,';
            break;
        case '%':
            badChar = 'directive indicator character %';
            break;
        case '|':
        case '>': {
            badChar = `block scalar indicator ${source[0]}`;
            break;
        }
        case '@':
        case '`': {
            badChar = `reserved character ${source[0]}`;
            break;
        }
    }
    if (badChar)
        onError(0, 'BAD_SCALAR_START', `Plain value cannot start with ${badChar}`);
    return unfoldLines(source);
}
function singleQuotedValue(source, onError) {
    if (source[source.length - 1] !== "'" || source.length === 1)
        onError(source.length, 'MISSING_CHAR', "Missing closing 'quote");
    return unfoldLines(source.slice(1, -1)).replace(/''/g, "'");
}
function unfoldLines(source) {
    const line = /(.*?)\r?\n/sy;
    let match = line.exec(source);
    if (!match)
        return source;
    /**
     * The negative lookbehinds in these RegExps are to
     * prevent causing a polynomial search time in certain cases.
     *
     * The try-catch is for Safari < 16.4 and other old browsers:
     * https://caniuse.com/js-regexp-lookbehind
     */
    let trimEnd, trimBoth;
    try {
        trimEnd = new RegExp('(?<![ \t])[ \t]+$');
        trimBoth = new RegExp('^[ \t]+|(?<![ \t])[ \t]+$', 'g');
    }
    catch {
        trimEnd = /[ \t]+$/;
        trimBoth = /^[ \t]+|[ \t]+$/g;
    }
    let res = match[1].replace(trimEnd, '');
    let sep = ' ';
    let pos = line.lastIndex;
    while ((match = line.exec(source))) {
        const lm = match[1].replace(trimBoth, '');
        if (lm === '') {
            if (sep === '\n')
                res += sep;
            else
                sep = '\n';
        }
        else {
            res += sep + lm;
            sep = ' ';
        }
        pos = line.lastIndex;
    }
    const last = /[ \t]*(.*)/sy;
    last.lastIndex = pos;
    match = last.exec(source);
    return res + sep + (match?.[1] ?? '');
}
function doubleQuotedValue(source, onError) {
    let res = '';
    for (let i = 1; i < source.length - 1; ++i) {
        const ch = source[i];
        if (ch === '\r' && source[i + 1] === '\n')
            continue;
        if (ch === '\n') {
            const { fold, offset } = foldNewline(source, i);
            res += fold;
            i = offset;
        }
        else if (ch === '\\') {
            let next = source[++i];
            const cc = escapeCodes[next];
            if (cc)
                res += cc;
            else if (next === '\n') {
                // skip escaped newlines, but still trim the following line
                next = source[i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === '\r' && source[i + 1] === '\n') {
                // skip escaped CRLF newlines, but still trim the following line
                next = source[++i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === 'x' || next === 'u' || next === 'U') {
                const length = next === 'x' ? 2 : next === 'u' ? 4 : 8;
                res += parseCharCode(source, i + 1, length, onError);
                i += length;
            }
            else {
                const raw = source.substr(i - 1, 2);
                onError(i - 1, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
                res += raw;
            }
        }
        else if (ch === ' ' || ch === '\t') {
            // trim trailing whitespace
            const wsStart = i;
            let next = source[i + 1];
            while (next === ' ' || next === '\t')
                next = source[++i + 1];
            if (next !== '\n' && !(next === '\r' && source[i + 2] === '\n'))
                res += i > wsStart ? source.slice(wsStart, i + 1) : ch;
        }
        else {
            res += ch;
        }
    }
    if (source[source.length - 1] !== '"' || source.length === 1)
        onError(source.length, 'MISSING_CHAR', 'Missing closing "quote');
    return res;
}
/**
 * Fold a single newline into a space, multiple newlines to N - 1 newlines.
 * Presumes `source[offset] === '\n'`
 */
function foldNewline(source, offset) {
    let fold = '';
    let ch = source[offset + 1];
    while (ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r') {
        if (ch === '\r' && source[offset + 2] !== '\n')
            break;
        if (ch === '\n')
            fold += '\n';
        offset += 1;
        ch = source[offset + 1];
    }
    if (!fold)
        fold = ' ';
    return { fold, offset };
}
const escapeCodes = {
    '0': '\0', // null character
    a: '\x07', // bell character
    b: '\b', // backspace
    e: '\x1b', // escape character
    f: '\f', // form feed
    n: '\n', // line feed
    r: '\r', // carriage return
    t: '\t', // horizontal tab
    v: '\v', // vertical tab
    N: '\u0085', // Unicode next line
    _: '\u00a0', // Unicode non-breaking space
    L: '\u2028', // Unicode line separator
    P: '\u2029', // Unicode paragraph separator
    ' ': ' ',
    '"': '"',
    '/': '/',
    '\\': '\\',
    '\t': '\t'
};
function parseCharCode(source, offset, length, onError) {
    const cc = source.substr(offset, length);
    const ok = cc.length === length && /^[0-9a-fA-F]+$/.test(cc);
    const code = ok ? parseInt(cc, 16) : NaN;
    try {
        return String.fromCodePoint(code);
    }
    catch {
        const raw = source.substr(offset - 2, length + 2);
        onError(offset - 2, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
        return raw;
    }
}

exports.resolveFlowScalar = resolveFlowScalar;


/***/ }),

/***/ 4631:
/***/ ((__unused_webpack_module, exports) => {



function resolveProps(tokens, { flow, indicator, next, offset, onError, parentIndent, startOnNewline }) {
    let spaceBefore = false;
    let atNewline = startOnNewline;
    let hasSpace = startOnNewline;
    let comment = '';
    let commentSep = '';
    let hasNewline = false;
    let reqSpace = false;
    let tab = null;
    let anchor = null;
    let tag = null;
    let newlineAfterProp = null;
    let comma = null;
    let found = null;
    let start = null;
    for (const token of tokens) {
        if (reqSpace) {
            if (token.type !== 'space' &&
                token.type !== 'newline' &&
                token.type !== 'comma')
                onError(token.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
            reqSpace = false;
        }
        if (tab) {
            if (atNewline && token.type !== 'comment' && token.type !== 'newline') {
                onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
            }
            tab = null;
        }
        switch (token.type) {
            case 'space':
                // At the doc level, tabs at line start may be parsed
                // as leading white space rather than indentation.
                // In a flow collection, only the parser handles indent.
                if (!flow &&
                    (indicator !== 'doc-start' || next?.type !== 'flow-collection') &&
                    token.source.includes('\t')) {
                    tab = token;
                }
                hasSpace = true;
                break;
            case 'comment': {
                if (!hasSpace)
                    onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                const cb = token.source.substring(1) || ' ';
                if (!comment)
                    comment = cb;
                else
                    comment += commentSep + cb;
                commentSep = '';
                atNewline = false;
                break;
            }
            case 'newline':
                if (atNewline) {
                    if (comment)
                        comment += token.source;
                    else if (!found || indicator !== 'seq-item-ind')
                        spaceBefore = true;
                }
                else
                    commentSep += token.source;
                atNewline = true;
                hasNewline = true;
                if (anchor || tag)
                    newlineAfterProp = token;
                hasSpace = true;
                break;
            case 'anchor':
                if (anchor)
                    onError(token, 'MULTIPLE_ANCHORS', 'A node can have at most one anchor');
                if (token.source.endsWith(':'))
                    onError(token.offset + token.source.length - 1, 'BAD_ALIAS', 'Anchor ending in : is ambiguous', true);
                anchor = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            case 'tag': {
                if (tag)
                    onError(token, 'MULTIPLE_TAGS', 'A node can have at most one tag');
                tag = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            }
            case indicator:
                // Could here handle preceding comments differently
                if (anchor || tag)
                    onError(token, 'BAD_PROP_ORDER', `Anchors and tags must be after the ${token.source} indicator`);
                if (found)
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.source} in ${flow ?? 'collection'}`);
                found = token;
                atNewline =
                    indicator === 'seq-item-ind' || indicator === 'explicit-key-ind';
                hasSpace = false;
                break;
            case 'comma':
                if (flow) {
                    if (comma)
                        onError(token, 'UNEXPECTED_TOKEN', `Unexpected , in ${flow}`);
                    comma = token;
                    atNewline = false;
                    hasSpace = false;
                    break;
                }
            // else fallthrough
            default:
                onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.type} token`);
                atNewline = false;
                hasSpace = false;
        }
    }
    const last = tokens[tokens.length - 1];
    const end = last ? last.offset + last.source.length : offset;
    if (reqSpace &&
        next &&
        next.type !== 'space' &&
        next.type !== 'newline' &&
        next.type !== 'comma' &&
        (next.type !== 'scalar' || next.source !== '')) {
        onError(next.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
    }
    if (tab &&
        ((atNewline && tab.indent <= parentIndent) ||
            next?.type === 'block-map' ||
            next?.type === 'block-seq'))
        onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
    return {
        comma,
        found,
        spaceBefore,
        comment,
        hasNewline,
        anchor,
        tag,
        newlineAfterProp,
        end,
        start: start ?? end
    };
}

exports.resolveProps = resolveProps;


/***/ }),

/***/ 9499:
/***/ ((__unused_webpack_module, exports) => {



function containsNewline(key) {
    if (!key)
        return null;
    switch (key.type) {
        case 'alias':
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            if (key.source.includes('\n'))
                return true;
            if (key.end)
                for (const st of key.end)
                    if (st.type === 'newline')
                        return true;
            return false;
        case 'flow-collection':
            for (const it of key.items) {
                for (const st of it.start)
                    if (st.type === 'newline')
                        return true;
                if (it.sep)
                    for (const st of it.sep)
                        if (st.type === 'newline')
                            return true;
                if (containsNewline(it.key) || containsNewline(it.value))
                    return true;
            }
            return false;
        default:
            return true;
    }
}

exports.containsNewline = containsNewline;


/***/ }),

/***/ 2599:
/***/ ((__unused_webpack_module, exports) => {



function emptyScalarPosition(offset, before, pos) {
    if (before) {
        pos ?? (pos = before.length);
        for (let i = pos - 1; i >= 0; --i) {
            let st = before[i];
            switch (st.type) {
                case 'space':
                case 'comment':
                case 'newline':
                    offset -= st.source.length;
                    continue;
            }
            // Technically, an empty scalar is immediately after the last non-empty
            // node, but it's more useful to place it after any whitespace.
            st = before[++i];
            while (st?.type === 'space') {
                offset += st.source.length;
                st = before[++i];
            }
            break;
        }
    }
    return offset;
}

exports.emptyScalarPosition = emptyScalarPosition;


/***/ }),

/***/ 4051:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var utilContainsNewline = __nccwpck_require__(9499);

function flowIndentCheck(indent, fc, onError) {
    if (fc?.type === 'flow-collection') {
        const end = fc.end[0];
        if (end.indent === indent &&
            (end.source === ']' || end.source === '}') &&
            utilContainsNewline.containsNewline(fc)) {
            const msg = 'Flow end indicator should be more indented than parent';
            onError(end, 'BAD_INDENT', msg, true);
        }
    }
}

exports.flowIndentCheck = flowIndentCheck;


/***/ }),

/***/ 1187:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

function mapIncludes(ctx, items, search) {
    const { uniqueKeys } = ctx.options;
    if (uniqueKeys === false)
        return false;
    const isEqual = typeof uniqueKeys === 'function'
        ? uniqueKeys
        : (a, b) => a === b || (identity.isScalar(a) && identity.isScalar(b) && a.value === b.value);
    return items.some(pair => isEqual(pair.key, search));
}

exports.mapIncludes = mapIncludes;


/***/ }),

/***/ 3021:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var toJS = __nccwpck_require__(4043);
var Schema = __nccwpck_require__(5840);
var stringifyDocument = __nccwpck_require__(6829);
var anchors = __nccwpck_require__(1596);
var applyReviver = __nccwpck_require__(3661);
var createNode = __nccwpck_require__(2404);
var directives = __nccwpck_require__(1342);

class Document {
    constructor(value, replacer, options) {
        /** A comment before this Document */
        this.commentBefore = null;
        /** A comment immediately after this Document */
        this.comment = null;
        /** Errors encountered during parsing. */
        this.errors = [];
        /** Warnings encountered during parsing. */
        this.warnings = [];
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.DOC });
        let _replacer = null;
        if (typeof replacer === 'function' || Array.isArray(replacer)) {
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const opt = Object.assign({
            intAsBigInt: false,
            keepSourceTokens: false,
            logLevel: 'warn',
            prettyErrors: true,
            strict: true,
            stringKeys: false,
            uniqueKeys: true,
            version: '1.2'
        }, options);
        this.options = opt;
        let { version } = opt;
        if (options?._directives) {
            this.directives = options._directives.atDocument();
            if (this.directives.yaml.explicit)
                version = this.directives.yaml.version;
        }
        else
            this.directives = new directives.Directives({ version });
        this.setSchema(version, options);
        // @ts-expect-error We can't really know that this matches Contents.
        this.contents =
            value === undefined ? null : this.createNode(value, _replacer, options);
    }
    /**
     * Create a deep copy of this Document and its contents.
     *
     * Custom Node values that inherit from `Object` still refer to their original instances.
     */
    clone() {
        const copy = Object.create(Document.prototype, {
            [identity.NODE_TYPE]: { value: identity.DOC }
        });
        copy.commentBefore = this.commentBefore;
        copy.comment = this.comment;
        copy.errors = this.errors.slice();
        copy.warnings = this.warnings.slice();
        copy.options = Object.assign({}, this.options);
        if (this.directives)
            copy.directives = this.directives.clone();
        copy.schema = this.schema.clone();
        // @ts-expect-error We can't really know that this matches Contents.
        copy.contents = identity.isNode(this.contents)
            ? this.contents.clone(copy.schema)
            : this.contents;
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** Adds a value to the document. */
    add(value) {
        if (assertCollection(this.contents))
            this.contents.add(value);
    }
    /** Adds a value to the document. */
    addIn(path, value) {
        if (assertCollection(this.contents))
            this.contents.addIn(path, value);
    }
    /**
     * Create a new `Alias` node, ensuring that the target `node` has the required anchor.
     *
     * If `node` already has an anchor, `name` is ignored.
     * Otherwise, the `node.anchor` value will be set to `name`,
     * or if an anchor with that name is already present in the document,
     * `name` will be used as a prefix for a new unique anchor.
     * If `name` is undefined, the generated anchor will use 'a' as a prefix.
     */
    createAlias(node, name) {
        if (!node.anchor) {
            const prev = anchors.anchorNames(this);
            node.anchor =
                // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
                !name || prev.has(name) ? anchors.findNewAnchor(name || 'a', prev) : name;
        }
        return new Alias.Alias(node.anchor);
    }
    createNode(value, replacer, options) {
        let _replacer = undefined;
        if (typeof replacer === 'function') {
            value = replacer.call({ '': value }, '', value);
            _replacer = replacer;
        }
        else if (Array.isArray(replacer)) {
            const keyToStr = (v) => typeof v === 'number' || v instanceof String || v instanceof Number;
            const asStr = replacer.filter(keyToStr).map(String);
            if (asStr.length > 0)
                replacer = replacer.concat(asStr);
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const { aliasDuplicateObjects, anchorPrefix, flow, keepUndefined, onTagObj, tag } = options ?? {};
        const { onAnchor, setAnchors, sourceObjects } = anchors.createNodeAnchors(this, 
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        anchorPrefix || 'a');
        const ctx = {
            aliasDuplicateObjects: aliasDuplicateObjects ?? true,
            keepUndefined: keepUndefined ?? false,
            onAnchor,
            onTagObj,
            replacer: _replacer,
            schema: this.schema,
            sourceObjects
        };
        const node = createNode.createNode(value, tag, ctx);
        if (flow && identity.isCollection(node))
            node.flow = true;
        setAnchors();
        return node;
    }
    /**
     * Convert a key and a value into a `Pair` using the current schema,
     * recursively wrapping all values as `Scalar` or `Collection` nodes.
     */
    createPair(key, value, options = {}) {
        const k = this.createNode(key, null, options);
        const v = this.createNode(value, null, options);
        return new Pair.Pair(k, v);
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        return assertCollection(this.contents) ? this.contents.delete(key) : false;
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        if (Collection.isEmptyPath(path)) {
            if (this.contents == null)
                return false;
            // @ts-expect-error Presumed impossible if Strict extends false
            this.contents = null;
            return true;
        }
        return assertCollection(this.contents)
            ? this.contents.deleteIn(path)
            : false;
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    get(key, keepScalar) {
        return identity.isCollection(this.contents)
            ? this.contents.get(key, keepScalar)
            : undefined;
    }
    /**
     * Returns item at `path`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        if (Collection.isEmptyPath(path))
            return !keepScalar && identity.isScalar(this.contents)
                ? this.contents.value
                : this.contents;
        return identity.isCollection(this.contents)
            ? this.contents.getIn(path, keepScalar)
            : undefined;
    }
    /**
     * Checks if the document includes a value with the key `key`.
     */
    has(key) {
        return identity.isCollection(this.contents) ? this.contents.has(key) : false;
    }
    /**
     * Checks if the document includes a value at `path`.
     */
    hasIn(path) {
        if (Collection.isEmptyPath(path))
            return this.contents !== undefined;
        return identity.isCollection(this.contents) ? this.contents.hasIn(path) : false;
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    set(key, value) {
        if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, [key], value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.set(key, value);
        }
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        if (Collection.isEmptyPath(path)) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = value;
        }
        else if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, Array.from(path), value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.setIn(path, value);
        }
    }
    /**
     * Change the YAML version and schema used by the document.
     * A `null` version disables support for directives, explicit tags, anchors, and aliases.
     * It also requires the `schema` option to be given as a `Schema` instance value.
     *
     * Overrides all previously set schema options.
     */
    setSchema(version, options = {}) {
        if (typeof version === 'number')
            version = String(version);
        let opt;
        switch (version) {
            case '1.1':
                if (this.directives)
                    this.directives.yaml.version = '1.1';
                else
                    this.directives = new directives.Directives({ version: '1.1' });
                opt = { resolveKnownTags: false, schema: 'yaml-1.1' };
                break;
            case '1.2':
            case 'next':
                if (this.directives)
                    this.directives.yaml.version = version;
                else
                    this.directives = new directives.Directives({ version });
                opt = { resolveKnownTags: true, schema: 'core' };
                break;
            case null:
                if (this.directives)
                    delete this.directives;
                opt = null;
                break;
            default: {
                const sv = JSON.stringify(version);
                throw new Error(`Expected '1.1', '1.2' or null as first argument, but found: ${sv}`);
            }
        }
        // Not using `instanceof Schema` to allow for duck typing
        if (options.schema instanceof Object)
            this.schema = options.schema;
        else if (opt)
            this.schema = new Schema.Schema(Object.assign(opt, options));
        else
            throw new Error(`With a null YAML version, the { schema: Schema } option is required`);
    }
    // json & jsonArg are only used from toJSON()
    toJS({ json, jsonArg, mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        const ctx = {
            anchors: new Map(),
            doc: this,
            keep: !json,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this.contents, jsonArg ?? '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
    /**
     * A JSON representation of the document `contents`.
     *
     * @param jsonArg Used by `JSON.stringify` to indicate the array index or
     *   property name.
     */
    toJSON(jsonArg, onAnchor) {
        return this.toJS({ json: true, jsonArg, mapAsMap: false, onAnchor });
    }
    /** A YAML representation of the document. */
    toString(options = {}) {
        if (this.errors.length > 0)
            throw new Error('Document with errors cannot be stringified');
        if ('indent' in options &&
            (!Number.isInteger(options.indent) || Number(options.indent) <= 0)) {
            const s = JSON.stringify(options.indent);
            throw new Error(`"indent" option must be a positive integer, not ${s}`);
        }
        return stringifyDocument.stringifyDocument(this, options);
    }
}
function assertCollection(contents) {
    if (identity.isCollection(contents))
        return true;
    throw new Error('Expected a YAML collection as document contents');
}

exports.Document = Document;


/***/ }),

/***/ 1596:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

/**
 * Verify that the input string is a valid anchor.
 *
 * Will throw on errors.
 */
function anchorIsValid(anchor) {
    if (/[\x00-\x19\s,[\]{}]/.test(anchor)) {
        const sa = JSON.stringify(anchor);
        const msg = `Anchor must not contain whitespace or control characters: ${sa}`;
        throw new Error(msg);
    }
    return true;
}
function anchorNames(root) {
    const anchors = new Set();
    visit.visit(root, {
        Value(_key, node) {
            if (node.anchor)
                anchors.add(node.anchor);
        }
    });
    return anchors;
}
/** Find a new anchor name with the given `prefix` and a one-indexed suffix. */
function findNewAnchor(prefix, exclude) {
    for (let i = 1; true; ++i) {
        const name = `${prefix}${i}`;
        if (!exclude.has(name))
            return name;
    }
}
function createNodeAnchors(doc, prefix) {
    const aliasObjects = [];
    const sourceObjects = new Map();
    let prevAnchors = null;
    return {
        onAnchor: (source) => {
            aliasObjects.push(source);
            prevAnchors ?? (prevAnchors = anchorNames(doc));
            const anchor = findNewAnchor(prefix, prevAnchors);
            prevAnchors.add(anchor);
            return anchor;
        },
        /**
         * With circular references, the source node is only resolved after all
         * of its child nodes are. This is why anchors are set only after all of
         * the nodes have been created.
         */
        setAnchors: () => {
            for (const source of aliasObjects) {
                const ref = sourceObjects.get(source);
                if (typeof ref === 'object' &&
                    ref.anchor &&
                    (identity.isScalar(ref.node) || identity.isCollection(ref.node))) {
                    ref.node.anchor = ref.anchor;
                }
                else {
                    const error = new Error('Failed to resolve repeated object (this should not happen)');
                    error.source = source;
                    throw error;
                }
            }
        },
        sourceObjects
    };
}

exports.anchorIsValid = anchorIsValid;
exports.anchorNames = anchorNames;
exports.createNodeAnchors = createNodeAnchors;
exports.findNewAnchor = findNewAnchor;


/***/ }),

/***/ 3661:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Applies the JSON.parse reviver algorithm as defined in the ECMA-262 spec,
 * in section 24.5.1.1 "Runtime Semantics: InternalizeJSONProperty" of the
 * 2021 edition: https://tc39.es/ecma262/#sec-json.parse
 *
 * Includes extensions for handling Map and Set objects.
 */
function applyReviver(reviver, obj, key, val) {
    if (val && typeof val === 'object') {
        if (Array.isArray(val)) {
            for (let i = 0, len = val.length; i < len; ++i) {
                const v0 = val[i];
                const v1 = applyReviver(reviver, val, String(i), v0);
                // eslint-disable-next-line @typescript-eslint/no-array-delete
                if (v1 === undefined)
                    delete val[i];
                else if (v1 !== v0)
                    val[i] = v1;
            }
        }
        else if (val instanceof Map) {
            for (const k of Array.from(val.keys())) {
                const v0 = val.get(k);
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    val.delete(k);
                else if (v1 !== v0)
                    val.set(k, v1);
            }
        }
        else if (val instanceof Set) {
            for (const v0 of Array.from(val)) {
                const v1 = applyReviver(reviver, val, v0, v0);
                if (v1 === undefined)
                    val.delete(v0);
                else if (v1 !== v0) {
                    val.delete(v0);
                    val.add(v1);
                }
            }
        }
        else {
            for (const [k, v0] of Object.entries(val)) {
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    delete val[k];
                else if (v1 !== v0)
                    val[k] = v1;
            }
        }
    }
    return reviver.call(obj, key, val);
}

exports.applyReviver = applyReviver;


/***/ }),

/***/ 2404:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

const defaultTagPrefix = 'tag:yaml.org,2002:';
function findTagObject(value, tagName, tags) {
    if (tagName) {
        const match = tags.filter(t => t.tag === tagName);
        const tagObj = match.find(t => !t.format) ?? match[0];
        if (!tagObj)
            throw new Error(`Tag ${tagName} not found`);
        return tagObj;
    }
    return tags.find(t => t.identify?.(value) && !t.format);
}
function createNode(value, tagName, ctx) {
    if (identity.isDocument(value))
        value = value.contents;
    if (identity.isNode(value))
        return value;
    if (identity.isPair(value)) {
        const map = ctx.schema[identity.MAP].createNode?.(ctx.schema, null, ctx);
        map.items.push(value);
        return map;
    }
    if (value instanceof String ||
        value instanceof Number ||
        value instanceof Boolean ||
        (typeof BigInt !== 'undefined' && value instanceof BigInt) // not supported everywhere
    ) {
        // https://tc39.es/ecma262/#sec-serializejsonproperty
        value = value.valueOf();
    }
    const { aliasDuplicateObjects, onAnchor, onTagObj, schema, sourceObjects } = ctx;
    // Detect duplicate references to the same object & use Alias nodes for all
    // after first. The `ref` wrapper allows for circular references to resolve.
    let ref = undefined;
    if (aliasDuplicateObjects && value && typeof value === 'object') {
        ref = sourceObjects.get(value);
        if (ref) {
            ref.anchor ?? (ref.anchor = onAnchor(value));
            return new Alias.Alias(ref.anchor);
        }
        else {
            ref = { anchor: null, node: null };
            sourceObjects.set(value, ref);
        }
    }
    if (tagName?.startsWith('!!'))
        tagName = defaultTagPrefix + tagName.slice(2);
    let tagObj = findTagObject(value, tagName, schema.tags);
    if (!tagObj) {
        if (value && typeof value.toJSON === 'function') {
            // eslint-disable-next-line @typescript-eslint/no-unsafe-call
            value = value.toJSON();
        }
        if (!value || typeof value !== 'object') {
            const node = new Scalar.Scalar(value);
            if (ref)
                ref.node = node;
            return node;
        }
        tagObj =
            value instanceof Map
                ? schema[identity.MAP]
                : Symbol.iterator in Object(value)
                    ? schema[identity.SEQ]
                    : schema[identity.MAP];
    }
    if (onTagObj) {
        onTagObj(tagObj);
        delete ctx.onTagObj;
    }
    const node = tagObj?.createNode
        ? tagObj.createNode(ctx.schema, value, ctx)
        : typeof tagObj?.nodeClass?.from === 'function'
            ? tagObj.nodeClass.from(ctx.schema, value, ctx)
            : new Scalar.Scalar(value);
    if (tagName)
        node.tag = tagName;
    else if (!tagObj.default)
        node.tag = tagObj.tag;
    if (ref)
        ref.node = node;
    return node;
}

exports.createNode = createNode;


/***/ }),

/***/ 1342:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

const escapeChars = {
    '!': '%21',
    ',': '%2C',
    '[': '%5B',
    ']': '%5D',
    '{': '%7B',
    '}': '%7D'
};
const escapeTagName = (tn) => tn.replace(/[!,[\]{}]/g, ch => escapeChars[ch]);
class Directives {
    constructor(yaml, tags) {
        /**
         * The directives-end/doc-start marker `---`. If `null`, a marker may still be
         * included in the document's stringified representation.
         */
        this.docStart = null;
        /** The doc-end marker `...`.  */
        this.docEnd = false;
        this.yaml = Object.assign({}, Directives.defaultYaml, yaml);
        this.tags = Object.assign({}, Directives.defaultTags, tags);
    }
    clone() {
        const copy = new Directives(this.yaml, this.tags);
        copy.docStart = this.docStart;
        return copy;
    }
    /**
     * During parsing, get a Directives instance for the current document and
     * update the stream state according to the current version's spec.
     */
    atDocument() {
        const res = new Directives(this.yaml, this.tags);
        switch (this.yaml.version) {
            case '1.1':
                this.atNextDocument = true;
                break;
            case '1.2':
                this.atNextDocument = false;
                this.yaml = {
                    explicit: Directives.defaultYaml.explicit,
                    version: '1.2'
                };
                this.tags = Object.assign({}, Directives.defaultTags);
                break;
        }
        return res;
    }
    /**
     * @param onError - May be called even if the action was successful
     * @returns `true` on success
     */
    add(line, onError) {
        if (this.atNextDocument) {
            this.yaml = { explicit: Directives.defaultYaml.explicit, version: '1.1' };
            this.tags = Object.assign({}, Directives.defaultTags);
            this.atNextDocument = false;
        }
        const parts = line.trim().split(/[ \t]+/);
        const name = parts.shift();
        switch (name) {
            case '%TAG': {
                if (parts.length !== 2) {
                    onError(0, '%TAG directive should contain exactly two parts');
                    if (parts.length < 2)
                        return false;
                }
                const [handle, prefix] = parts;
                this.tags[handle] = prefix;
                return true;
            }
            case '%YAML': {
                this.yaml.explicit = true;
                if (parts.length !== 1) {
                    onError(0, '%YAML directive should contain exactly one part');
                    return false;
                }
                const [version] = parts;
                if (version === '1.1' || version === '1.2') {
                    this.yaml.version = version;
                    return true;
                }
                else {
                    const isValid = /^\d+\.\d+$/.test(version);
                    onError(6, `Unsupported YAML version ${version}`, isValid);
                    return false;
                }
            }
            default:
                onError(0, `Unknown directive ${name}`, true);
                return false;
        }
    }
    /**
     * Resolves a tag, matching handles to those defined in %TAG directives.
     *
     * @returns Resolved tag, which may also be the non-specific tag `'!'` or a
     *   `'!local'` tag, or `null` if unresolvable.
     */
    tagName(source, onError) {
        if (source === '!')
            return '!'; // non-specific tag
        if (source[0] !== '!') {
            onError(`Not a valid tag: ${source}`);
            return null;
        }
        if (source[1] === '<') {
            const verbatim = source.slice(2, -1);
            if (verbatim === '!' || verbatim === '!!') {
                onError(`Verbatim tags aren't resolved, so ${source} is invalid.`);
                return null;
            }
            if (source[source.length - 1] !== '>')
                onError('Verbatim tags must end with a >');
            return verbatim;
        }
        const [, handle, suffix] = source.match(/^(.*!)([^!]*)$/s);
        if (!suffix)
            onError(`The ${source} tag has no suffix`);
        const prefix = this.tags[handle];
        if (prefix) {
            try {
                return prefix + decodeURIComponent(suffix);
            }
            catch (error) {
                onError(String(error));
                return null;
            }
        }
        if (handle === '!')
            return source; // local tag
        onError(`Could not resolve tag: ${source}`);
        return null;
    }
    /**
     * Given a fully resolved tag, returns its printable string form,
     * taking into account current tag prefixes and defaults.
     */
    tagString(tag) {
        for (const [handle, prefix] of Object.entries(this.tags)) {
            if (tag.startsWith(prefix))
                return handle + escapeTagName(tag.substring(prefix.length));
        }
        return tag[0] === '!' ? tag : `!<${tag}>`;
    }
    toString(doc) {
        const lines = this.yaml.explicit
            ? [`%YAML ${this.yaml.version || '1.2'}`]
            : [];
        const tagEntries = Object.entries(this.tags);
        let tagNames;
        if (doc && tagEntries.length > 0 && identity.isNode(doc.contents)) {
            const tags = {};
            visit.visit(doc.contents, (_key, node) => {
                if (identity.isNode(node) && node.tag)
                    tags[node.tag] = true;
            });
            tagNames = Object.keys(tags);
        }
        else
            tagNames = [];
        for (const [handle, prefix] of tagEntries) {
            if (handle === '!!' && prefix === 'tag:yaml.org,2002:')
                continue;
            if (!doc || tagNames.some(tn => tn.startsWith(prefix)))
                lines.push(`%TAG ${handle} ${prefix}`);
        }
        return lines.join('\n');
    }
}
Directives.defaultYaml = { explicit: false, version: '1.2' };
Directives.defaultTags = { '!!': 'tag:yaml.org,2002:' };

exports.Directives = Directives;


/***/ }),

/***/ 1464:
/***/ ((__unused_webpack_module, exports) => {



class YAMLError extends Error {
    constructor(name, pos, code, message) {
        super();
        this.name = name;
        this.code = code;
        this.message = message;
        this.pos = pos;
    }
}
class YAMLParseError extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLParseError', pos, code, message);
    }
}
class YAMLWarning extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLWarning', pos, code, message);
    }
}
const prettifyError = (src, lc) => (error) => {
    if (error.pos[0] === -1)
        return;
    error.linePos = error.pos.map(pos => lc.linePos(pos));
    const { line, col } = error.linePos[0];
    error.message += ` at line ${line}, column ${col}`;
    let ci = col - 1;
    let lineStr = src
        .substring(lc.lineStarts[line - 1], lc.lineStarts[line])
        .replace(/[\n\r]+$/, '');
    // Trim to max 80 chars, keeping col position near the middle
    if (ci >= 60 && lineStr.length > 80) {
        const trimStart = Math.min(ci - 39, lineStr.length - 79);
        lineStr = '…' + lineStr.substring(trimStart);
        ci -= trimStart - 1;
    }
    if (lineStr.length > 80)
        lineStr = lineStr.substring(0, 79) + '…';
    // Include previous line in context if pointing at line start
    if (line > 1 && /^ *$/.test(lineStr.substring(0, ci))) {
        // Regexp won't match if start is trimmed
        let prev = src.substring(lc.lineStarts[line - 2], lc.lineStarts[line - 1]);
        if (prev.length > 80)
            prev = prev.substring(0, 79) + '…\n';
        lineStr = prev + lineStr;
    }
    if (/[^ ]/.test(lineStr)) {
        let count = 1;
        const end = error.linePos[1];
        if (end?.line === line && end.col > col) {
            count = Math.max(1, Math.min(end.col - col, 80 - ci));
        }
        const pointer = ' '.repeat(ci) + '^'.repeat(count);
        error.message += `:\n\n${lineStr}\n${pointer}\n`;
    }
};

exports.YAMLError = YAMLError;
exports.YAMLParseError = YAMLParseError;
exports.YAMLWarning = YAMLWarning;
exports.prettifyError = prettifyError;


/***/ }),

/***/ 8815:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {

var __webpack_unused_export__;


var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(3021);
var Schema = __nccwpck_require__(5840);
var errors = __nccwpck_require__(1464);
var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);
var publicApi = __nccwpck_require__(4047);
var visit = __nccwpck_require__(204);



__webpack_unused_export__ = composer.Composer;
__webpack_unused_export__ = Document.Document;
__webpack_unused_export__ = Schema.Schema;
__webpack_unused_export__ = errors.YAMLError;
__webpack_unused_export__ = errors.YAMLParseError;
__webpack_unused_export__ = errors.YAMLWarning;
__webpack_unused_export__ = Alias.Alias;
exports.Vj = identity.isAlias;
__webpack_unused_export__ = identity.isCollection;
__webpack_unused_export__ = identity.isDocument;
exports.jh = identity.isMap;
__webpack_unused_export__ = identity.isNode;
exports.tO = identity.isPair;
exports.jn = identity.isScalar;
exports.oP = identity.isSeq;
__webpack_unused_export__ = Pair.Pair;
__webpack_unused_export__ = Scalar.Scalar;
__webpack_unused_export__ = YAMLMap.YAMLMap;
__webpack_unused_export__ = YAMLSeq.YAMLSeq;
__webpack_unused_export__ = cst;
__webpack_unused_export__ = lexer.Lexer;
exports.HN = lineCounter.LineCounter;
__webpack_unused_export__ = parser.Parser;
__webpack_unused_export__ = publicApi.parse;
__webpack_unused_export__ = publicApi.parseAllDocuments;
exports.Tp = publicApi.parseDocument;
__webpack_unused_export__ = publicApi.stringify;
__webpack_unused_export__ = visit.visit;
__webpack_unused_export__ = visit.visitAsync;


/***/ }),

/***/ 7249:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);

function debug(logLevel, ...messages) {
    if (logLevel === 'debug')
        console.log(...messages);
}
function warn(logLevel, warning) {
    if (logLevel === 'debug' || logLevel === 'warn') {
        if (typeof node_process.emitWarning === 'function')
            node_process.emitWarning(warning);
        else
            console.warn(warning);
    }
}

exports.debug = debug;
exports.warn = warn;


/***/ }),

/***/ 4065:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var visit = __nccwpck_require__(204);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

class Alias extends Node.NodeBase {
    constructor(source) {
        super(identity.ALIAS);
        this.source = source;
        Object.defineProperty(this, 'tag', {
            set() {
                throw new Error('Alias nodes cannot have tags');
            }
        });
    }
    /**
     * Resolve the value of this alias within `doc`, finding the last
     * instance of the `source` anchor before this node.
     */
    resolve(doc, ctx) {
        if (ctx?.maxAliasCount === 0)
            throw new ReferenceError('Alias resolution is disabled');
        let nodes;
        if (ctx?.aliasResolveCache) {
            nodes = ctx.aliasResolveCache;
        }
        else {
            nodes = [];
            visit.visit(doc, {
                Node: (_key, node) => {
                    if (identity.isAlias(node) || identity.hasAnchor(node))
                        nodes.push(node);
                }
            });
            if (ctx)
                ctx.aliasResolveCache = nodes;
        }
        let found = undefined;
        for (const node of nodes) {
            if (node === this)
                break;
            if (node.anchor === this.source)
                found = node;
        }
        if (found && ctx) {
            const { anchors, doc, maxAliasCount } = ctx;
            let data = anchors.get(found);
            if (!data) {
                // Resolve anchors for Node.prototype.toJS()
                toJS.toJS(found, null, ctx);
                data = anchors.get(found);
            }
            /* istanbul ignore if */
            if (data?.res === undefined) {
                const msg = 'This should not happen: Alias anchor was not resolved?';
                throw new ReferenceError(msg);
            }
            if (maxAliasCount >= 0) {
                data.count += 1;
                if (data.aliasCount === 0)
                    data.aliasCount = getAliasCount(doc, found, anchors);
                if (data.count * data.aliasCount > maxAliasCount) {
                    const msg = 'Excessive alias count indicates a resource exhaustion attack';
                    throw new ReferenceError(msg);
                }
            }
        }
        return found;
    }
    toJSON(_arg, ctx) {
        if (!ctx)
            return { source: this.source };
        const source = this.resolve(ctx.doc, ctx);
        if (!source) {
            const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
            throw new ReferenceError(msg);
        }
        return ctx.anchors.get(source).res;
    }
    toString(ctx, _onComment, _onChompKeep) {
        const src = `*${this.source}`;
        if (ctx) {
            anchors.anchorIsValid(this.source);
            if (ctx.options.verifyAliasOrder && !ctx.anchors.has(this.source)) {
                const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
                throw new Error(msg);
            }
            if (ctx.implicitKey)
                return `${src} `;
        }
        return src;
    }
}
function getAliasCount(doc, node, anchors) {
    if (identity.isAlias(node)) {
        const source = node.resolve(doc);
        const anchor = anchors && source && anchors.get(source);
        return anchor ? anchor.count * anchor.aliasCount : 0;
    }
    else if (identity.isCollection(node)) {
        let count = 0;
        for (const item of node.items) {
            const c = getAliasCount(doc, item, anchors);
            if (c > count)
                count = c;
        }
        return count;
    }
    else if (identity.isPair(node)) {
        const kc = getAliasCount(doc, node.key, anchors);
        const vc = getAliasCount(doc, node.value, anchors);
        return Math.max(kc, vc);
    }
    return 1;
}

exports.Alias = Alias;


/***/ }),

/***/ 101:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);

function collectionFromPath(schema, path, value) {
    let v = value;
    for (let i = path.length - 1; i >= 0; --i) {
        const k = path[i];
        if (typeof k === 'number' && Number.isInteger(k) && k >= 0) {
            const a = [];
            a[k] = v;
            v = a;
        }
        else {
            v = new Map([[k, v]]);
        }
    }
    return createNode.createNode(v, undefined, {
        aliasDuplicateObjects: false,
        keepUndefined: false,
        onAnchor: () => {
            throw new Error('This should not happen, please report a bug.');
        },
        schema,
        sourceObjects: new Map()
    });
}
// Type guard is intentionally a little wrong so as to be more useful,
// as it does not cover untypable empty non-string iterables (e.g. []).
const isEmptyPath = (path) => path == null ||
    (typeof path === 'object' && !!path[Symbol.iterator]().next().done);
class Collection extends Node.NodeBase {
    constructor(type, schema) {
        super(type);
        Object.defineProperty(this, 'schema', {
            value: schema,
            configurable: true,
            enumerable: false,
            writable: true
        });
    }
    /**
     * Create a copy of this collection.
     *
     * @param schema - If defined, overwrites the original's schema
     */
    clone(schema) {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (schema)
            copy.schema = schema;
        copy.items = copy.items.map(it => identity.isNode(it) || identity.isPair(it) ? it.clone(schema) : it);
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /**
     * Adds a value to the collection. For `!!map` and `!!omap` the value must
     * be a Pair instance or a `{ key, value }` object, which may not have a key
     * that already exists in the map.
     */
    addIn(path, value) {
        if (isEmptyPath(path))
            this.add(value);
        else {
            const [key, ...rest] = path;
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.addIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
    /**
     * Removes a value from the collection.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.delete(key);
        const node = this.get(key, true);
        if (identity.isCollection(node))
            return node.deleteIn(rest);
        else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        const [key, ...rest] = path;
        const node = this.get(key, true);
        if (rest.length === 0)
            return !keepScalar && identity.isScalar(node) ? node.value : node;
        else
            return identity.isCollection(node) ? node.getIn(rest, keepScalar) : undefined;
    }
    hasAllNullValues(allowScalar) {
        return this.items.every(node => {
            if (!identity.isPair(node))
                return false;
            const n = node.value;
            return (n == null ||
                (allowScalar &&
                    identity.isScalar(n) &&
                    n.value == null &&
                    !n.commentBefore &&
                    !n.comment &&
                    !n.tag));
        });
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     */
    hasIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.has(key);
        const node = this.get(key, true);
        return identity.isCollection(node) ? node.hasIn(rest) : false;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        const [key, ...rest] = path;
        if (rest.length === 0) {
            this.set(key, value);
        }
        else {
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.setIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
}

exports.Collection = Collection;
exports.collectionFromPath = collectionFromPath;
exports.isEmptyPath = isEmptyPath;


/***/ }),

/***/ 6673:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var applyReviver = __nccwpck_require__(3661);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

class NodeBase {
    constructor(type) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: type });
    }
    /** Create a copy of this node.  */
    clone() {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** A plain JavaScript representation of this node. */
    toJS(doc, { mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        if (!identity.isDocument(doc))
            throw new TypeError('A document argument is required');
        const ctx = {
            anchors: new Map(),
            doc,
            keep: true,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this, '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
}

exports.NodeBase = NodeBase;


/***/ }),

/***/ 7165:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyPair = __nccwpck_require__(9748);
var addPairToJSMap = __nccwpck_require__(7104);
var identity = __nccwpck_require__(1127);

function createPair(key, value, ctx) {
    const k = createNode.createNode(key, undefined, ctx);
    const v = createNode.createNode(value, undefined, ctx);
    return new Pair(k, v);
}
class Pair {
    constructor(key, value = null) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.PAIR });
        this.key = key;
        this.value = value;
    }
    clone(schema) {
        let { key, value } = this;
        if (identity.isNode(key))
            key = key.clone(schema);
        if (identity.isNode(value))
            value = value.clone(schema);
        return new Pair(key, value);
    }
    toJSON(_, ctx) {
        const pair = ctx?.mapAsMap ? new Map() : {};
        return addPairToJSMap.addPairToJSMap(ctx, pair, this);
    }
    toString(ctx, onComment, onChompKeep) {
        return ctx?.doc
            ? stringifyPair.stringifyPair(this, ctx, onComment, onChompKeep)
            : JSON.stringify(this);
    }
}

exports.Pair = Pair;
exports.createPair = createPair;


/***/ }),

/***/ 3301:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

const isScalarValue = (value) => !value || (typeof value !== 'function' && typeof value !== 'object');
class Scalar extends Node.NodeBase {
    constructor(value) {
        super(identity.SCALAR);
        this.value = value;
    }
    toJSON(arg, ctx) {
        return ctx?.keep ? this.value : toJS.toJS(this.value, arg, ctx);
    }
    toString() {
        return String(this.value);
    }
}
Scalar.BLOCK_FOLDED = 'BLOCK_FOLDED';
Scalar.BLOCK_LITERAL = 'BLOCK_LITERAL';
Scalar.PLAIN = 'PLAIN';
Scalar.QUOTE_DOUBLE = 'QUOTE_DOUBLE';
Scalar.QUOTE_SINGLE = 'QUOTE_SINGLE';

exports.Scalar = Scalar;
exports.isScalarValue = isScalarValue;


/***/ }),

/***/ 4454:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyCollection = __nccwpck_require__(1212);
var addPairToJSMap = __nccwpck_require__(7104);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);

function findPair(items, key) {
    const k = identity.isScalar(key) ? key.value : key;
    for (const it of items) {
        if (identity.isPair(it)) {
            if (it.key === key || it.key === k)
                return it;
            if (identity.isScalar(it.key) && it.key.value === k)
                return it;
        }
    }
    return undefined;
}
class YAMLMap extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:map';
    }
    constructor(schema) {
        super(identity.MAP, schema);
        this.items = [];
    }
    /**
     * A generic collection parsing method that can be extended
     * to other node classes that inherit from YAMLMap
     */
    static from(schema, obj, ctx) {
        const { keepUndefined, replacer } = ctx;
        const map = new this(schema);
        const add = (key, value) => {
            if (typeof replacer === 'function')
                value = replacer.call(obj, key, value);
            else if (Array.isArray(replacer) && !replacer.includes(key))
                return;
            if (value !== undefined || keepUndefined)
                map.items.push(Pair.createPair(key, value, ctx));
        };
        if (obj instanceof Map) {
            for (const [key, value] of obj)
                add(key, value);
        }
        else if (obj && typeof obj === 'object') {
            for (const key of Object.keys(obj))
                add(key, obj[key]);
        }
        if (typeof schema.sortMapEntries === 'function') {
            map.items.sort(schema.sortMapEntries);
        }
        return map;
    }
    /**
     * Adds a value to the collection.
     *
     * @param overwrite - If not set `true`, using a key that is already in the
     *   collection will throw. Otherwise, overwrites the previous value.
     */
    add(pair, overwrite) {
        let _pair;
        if (identity.isPair(pair))
            _pair = pair;
        else if (!pair || typeof pair !== 'object' || !('key' in pair)) {
            // In TypeScript, this never happens.
            _pair = new Pair.Pair(pair, pair?.value);
        }
        else
            _pair = new Pair.Pair(pair.key, pair.value);
        const prev = findPair(this.items, _pair.key);
        const sortEntries = this.schema?.sortMapEntries;
        if (prev) {
            if (!overwrite)
                throw new Error(`Key ${_pair.key} already set`);
            // For scalars, keep the old node & its comments and anchors
            if (identity.isScalar(prev.value) && Scalar.isScalarValue(_pair.value))
                prev.value.value = _pair.value;
            else
                prev.value = _pair.value;
        }
        else if (sortEntries) {
            const i = this.items.findIndex(item => sortEntries(_pair, item) < 0);
            if (i === -1)
                this.items.push(_pair);
            else
                this.items.splice(i, 0, _pair);
        }
        else {
            this.items.push(_pair);
        }
    }
    delete(key) {
        const it = findPair(this.items, key);
        if (!it)
            return false;
        const del = this.items.splice(this.items.indexOf(it), 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const it = findPair(this.items, key);
        const node = it?.value;
        return (!keepScalar && identity.isScalar(node) ? node.value : node) ?? undefined;
    }
    has(key) {
        return !!findPair(this.items, key);
    }
    set(key, value) {
        this.add(new Pair.Pair(key, value), true);
    }
    /**
     * @param ctx - Conversion context, originally set in Document#toJS()
     * @param {Class} Type - If set, forces the returned collection type
     * @returns Instance of Type, Map, or Object
     */
    toJSON(_, ctx, Type) {
        const map = Type ? new Type() : ctx?.mapAsMap ? new Map() : {};
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const item of this.items)
            addPairToJSMap.addPairToJSMap(ctx, map, item);
        return map;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        for (const item of this.items) {
            if (!identity.isPair(item))
                throw new Error(`Map items must all be pairs; found ${JSON.stringify(item)} instead`);
        }
        if (!ctx.allNullValues && this.hasAllNullValues(false))
            ctx = Object.assign({}, ctx, { allNullValues: true });
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '',
            flowChars: { start: '{', end: '}' },
            itemIndent: ctx.indent || '',
            onChompKeep,
            onComment
        });
    }
}

exports.YAMLMap = YAMLMap;
exports.findPair = findPair;


/***/ }),

/***/ 2223:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyCollection = __nccwpck_require__(1212);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var toJS = __nccwpck_require__(4043);

class YAMLSeq extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:seq';
    }
    constructor(schema) {
        super(identity.SEQ, schema);
        this.items = [];
    }
    add(value) {
        this.items.push(value);
    }
    /**
     * Removes a value from the collection.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     *
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return false;
        const del = this.items.splice(idx, 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return undefined;
        const it = this.items[idx];
        return !keepScalar && identity.isScalar(it) ? it.value : it;
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     */
    has(key) {
        const idx = asItemIndex(key);
        return typeof idx === 'number' && idx < this.items.length;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     *
     * If `key` does not contain a representation of an integer, this will throw.
     * It may be wrapped in a `Scalar`.
     */
    set(key, value) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            throw new Error(`Expected a valid index, not ${key}.`);
        const prev = this.items[idx];
        if (identity.isScalar(prev) && Scalar.isScalarValue(value))
            prev.value = value;
        else
            this.items[idx] = value;
    }
    toJSON(_, ctx) {
        const seq = [];
        if (ctx?.onCreate)
            ctx.onCreate(seq);
        let i = 0;
        for (const item of this.items)
            seq.push(toJS.toJS(item, String(i++), ctx));
        return seq;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '- ',
            flowChars: { start: '[', end: ']' },
            itemIndent: (ctx.indent || '') + '  ',
            onChompKeep,
            onComment
        });
    }
    static from(schema, obj, ctx) {
        const { replacer } = ctx;
        const seq = new this(schema);
        if (obj && Symbol.iterator in Object(obj)) {
            let i = 0;
            for (let it of obj) {
                if (typeof replacer === 'function') {
                    const key = obj instanceof Set ? it : String(i++);
                    it = replacer.call(obj, key, it);
                }
                seq.items.push(createNode.createNode(it, undefined, ctx));
            }
        }
        return seq;
    }
}
function asItemIndex(key) {
    let idx = identity.isScalar(key) ? key.value : key;
    if (idx && typeof idx === 'string')
        idx = Number(idx);
    return typeof idx === 'number' && Number.isInteger(idx) && idx >= 0
        ? idx
        : null;
}

exports.YAMLSeq = YAMLSeq;


/***/ }),

/***/ 7104:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var log = __nccwpck_require__(7249);
var merge = __nccwpck_require__(452);
var stringify = __nccwpck_require__(2148);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

function addPairToJSMap(ctx, map, { key, value }) {
    if (identity.isNode(key) && key.addToJSMap)
        key.addToJSMap(ctx, map, value);
    // TODO: Should drop this special case for bare << handling
    else if (merge.isMergeKey(ctx, key))
        merge.addMergeToJSMap(ctx, map, value);
    else {
        const jsKey = toJS.toJS(key, '', ctx);
        if (map instanceof Map) {
            map.set(jsKey, toJS.toJS(value, jsKey, ctx));
        }
        else if (map instanceof Set) {
            map.add(jsKey);
        }
        else {
            const stringKey = stringifyKey(key, jsKey, ctx);
            const jsValue = toJS.toJS(value, stringKey, ctx);
            if (stringKey in map)
                Object.defineProperty(map, stringKey, {
                    value: jsValue,
                    writable: true,
                    enumerable: true,
                    configurable: true
                });
            else
                map[stringKey] = jsValue;
        }
    }
    return map;
}
function stringifyKey(key, jsKey, ctx) {
    if (jsKey === null)
        return '';
    // eslint-disable-next-line @typescript-eslint/no-base-to-string
    if (typeof jsKey !== 'object')
        return String(jsKey);
    if (identity.isNode(key) && ctx?.doc) {
        const strCtx = stringify.createStringifyContext(ctx.doc, {});
        strCtx.anchors = new Set();
        for (const node of ctx.anchors.keys())
            strCtx.anchors.add(node.anchor);
        strCtx.inFlow = true;
        strCtx.inStringifyKey = true;
        const strKey = key.toString(strCtx);
        if (!ctx.mapKeyWarned) {
            let jsonStr = JSON.stringify(strKey);
            if (jsonStr.length > 40)
                jsonStr = jsonStr.substring(0, 36) + '..."';
            log.warn(ctx.doc.options.logLevel, `Keys with collection values will be stringified due to JS Object restrictions: ${jsonStr}. Set mapAsMap: true to use object keys.`);
            ctx.mapKeyWarned = true;
        }
        return strKey;
    }
    return JSON.stringify(jsKey);
}

exports.addPairToJSMap = addPairToJSMap;


/***/ }),

/***/ 1127:
/***/ ((__unused_webpack_module, exports) => {



const ALIAS = Symbol.for('yaml.alias');
const DOC = Symbol.for('yaml.document');
const MAP = Symbol.for('yaml.map');
const PAIR = Symbol.for('yaml.pair');
const SCALAR = Symbol.for('yaml.scalar');
const SEQ = Symbol.for('yaml.seq');
const NODE_TYPE = Symbol.for('yaml.node.type');
const isAlias = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === ALIAS;
const isDocument = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === DOC;
const isMap = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === MAP;
const isPair = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === PAIR;
const isScalar = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SCALAR;
const isSeq = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SEQ;
function isCollection(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case MAP:
            case SEQ:
                return true;
        }
    return false;
}
function isNode(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case ALIAS:
            case MAP:
            case SCALAR:
            case SEQ:
                return true;
        }
    return false;
}
const hasAnchor = (node) => (isScalar(node) || isCollection(node)) && !!node.anchor;

exports.ALIAS = ALIAS;
exports.DOC = DOC;
exports.MAP = MAP;
exports.NODE_TYPE = NODE_TYPE;
exports.PAIR = PAIR;
exports.SCALAR = SCALAR;
exports.SEQ = SEQ;
exports.hasAnchor = hasAnchor;
exports.isAlias = isAlias;
exports.isCollection = isCollection;
exports.isDocument = isDocument;
exports.isMap = isMap;
exports.isNode = isNode;
exports.isPair = isPair;
exports.isScalar = isScalar;
exports.isSeq = isSeq;


/***/ }),

/***/ 4043:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

/**
 * Recursively convert any node or its contents to native JavaScript
 *
 * @param value - The input value
 * @param arg - If `value` defines a `toJSON()` method, use this
 *   as its first argument
 * @param ctx - Conversion context, originally set in Document#toJS(). If
 *   `{ keep: true }` is not set, output should be suitable for JSON
 *   stringification.
 */
function toJS(value, arg, ctx) {
    // eslint-disable-next-line @typescript-eslint/no-unsafe-return
    if (Array.isArray(value))
        return value.map((v, i) => toJS(v, String(i), ctx));
    if (value && typeof value.toJSON === 'function') {
        // eslint-disable-next-line @typescript-eslint/no-unsafe-call
        if (!ctx || !identity.hasAnchor(value))
            return value.toJSON(arg, ctx);
        const data = { aliasCount: 0, count: 1, res: undefined };
        ctx.anchors.set(value, data);
        ctx.onCreate = res => {
            data.res = res;
            delete ctx.onCreate;
        };
        const res = value.toJSON(arg, ctx);
        if (ctx.onCreate)
            ctx.onCreate(res);
        return res;
    }
    if (typeof value === 'bigint' && !ctx?.keep)
        return Number(value);
    return value;
}

exports.toJS = toJS;


/***/ }),

/***/ 110:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);
var errors = __nccwpck_require__(1464);
var stringifyString = __nccwpck_require__(3069);

function resolveAsScalar(token, strict = true, onError) {
    if (token) {
        const _onError = (pos, code, message) => {
            const offset = typeof pos === 'number' ? pos : Array.isArray(pos) ? pos[0] : pos.offset;
            if (onError)
                onError(offset, code, message);
            else
                throw new errors.YAMLParseError([offset, offset + 1], code, message);
        };
        switch (token.type) {
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return resolveFlowScalar.resolveFlowScalar(token, strict, _onError);
            case 'block-scalar':
                return resolveBlockScalar.resolveBlockScalar({ options: { strict } }, token, _onError);
        }
    }
    return null;
}
/**
 * Create a new scalar token with `value`
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.end Comments and whitespace after the end of the value, or after the block scalar header. If undefined, a newline will be added.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.indent The indent level of the token.
 * @param context.inFlow Is this scalar within a flow collection? This may affect the resolved type of the token's value.
 * @param context.offset The offset position of the token.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function createScalarToken(value, context) {
    const { implicitKey = false, indent, inFlow = false, offset = -1, type = 'PLAIN' } = context;
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey,
        indent: indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    const end = context.end ?? [
        { type: 'newline', offset: -1, indent, source: '\n' }
    ];
    switch (source[0]) {
        case '|':
        case '>': {
            const he = source.indexOf('\n');
            const head = source.substring(0, he);
            const body = source.substring(he + 1) + '\n';
            const props = [
                { type: 'block-scalar-header', offset, indent, source: head }
            ];
            if (!addEndtoBlockProps(props, end))
                props.push({ type: 'newline', offset: -1, indent, source: '\n' });
            return { type: 'block-scalar', offset, indent, props, source: body };
        }
        case '"':
            return { type: 'double-quoted-scalar', offset, indent, source, end };
        case "'":
            return { type: 'single-quoted-scalar', offset, indent, source, end };
        default:
            return { type: 'scalar', offset, indent, source, end };
    }
}
/**
 * Set the value of `token` to the given string `value`, overwriting any previous contents and type that it may have.
 *
 * Best efforts are made to retain any comments previously associated with the `token`,
 * though all contents within a collection's `items` will be overwritten.
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param token Any token. If it does not include an `indent` value, the value will be stringified as if it were an implicit key.
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.afterKey In most cases, values after a key should have an additional level of indentation.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.inFlow Being within a flow collection may affect the resolved type of the token's value.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function setScalarValue(token, value, context = {}) {
    let { afterKey = false, implicitKey = false, inFlow = false, type } = context;
    let indent = 'indent' in token ? token.indent : null;
    if (afterKey && typeof indent === 'number')
        indent += 2;
    if (!type)
        switch (token.type) {
            case 'single-quoted-scalar':
                type = 'QUOTE_SINGLE';
                break;
            case 'double-quoted-scalar':
                type = 'QUOTE_DOUBLE';
                break;
            case 'block-scalar': {
                const header = token.props[0];
                if (header.type !== 'block-scalar-header')
                    throw new Error('Invalid block scalar header');
                type = header.source[0] === '>' ? 'BLOCK_FOLDED' : 'BLOCK_LITERAL';
                break;
            }
            default:
                type = 'PLAIN';
        }
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey: implicitKey || indent === null,
        indent: indent !== null && indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    switch (source[0]) {
        case '|':
        case '>':
            setBlockScalarValue(token, source);
            break;
        case '"':
            setFlowScalarValue(token, source, 'double-quoted-scalar');
            break;
        case "'":
            setFlowScalarValue(token, source, 'single-quoted-scalar');
            break;
        default:
            setFlowScalarValue(token, source, 'scalar');
    }
}
function setBlockScalarValue(token, source) {
    const he = source.indexOf('\n');
    const head = source.substring(0, he);
    const body = source.substring(he + 1) + '\n';
    if (token.type === 'block-scalar') {
        const header = token.props[0];
        if (header.type !== 'block-scalar-header')
            throw new Error('Invalid block scalar header');
        header.source = head;
        token.source = body;
    }
    else {
        const { offset } = token;
        const indent = 'indent' in token ? token.indent : -1;
        const props = [
            { type: 'block-scalar-header', offset, indent, source: head }
        ];
        if (!addEndtoBlockProps(props, 'end' in token ? token.end : undefined))
            props.push({ type: 'newline', offset: -1, indent, source: '\n' });
        for (const key of Object.keys(token))
            if (key !== 'type' && key !== 'offset')
                delete token[key];
        Object.assign(token, { type: 'block-scalar', indent, props, source: body });
    }
}
/** @returns `true` if last token is a newline */
function addEndtoBlockProps(props, end) {
    if (end)
        for (const st of end)
            switch (st.type) {
                case 'space':
                case 'comment':
                    props.push(st);
                    break;
                case 'newline':
                    props.push(st);
                    return true;
            }
    return false;
}
function setFlowScalarValue(token, source, type) {
    switch (token.type) {
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            token.type = type;
            token.source = source;
            break;
        case 'block-scalar': {
            const end = token.props.slice(1);
            let oa = source.length;
            if (token.props[0].type === 'block-scalar-header')
                oa -= token.props[0].source.length;
            for (const tok of end)
                tok.offset += oa;
            delete token.props;
            Object.assign(token, { type, source, end });
            break;
        }
        case 'block-map':
        case 'block-seq': {
            const offset = token.offset + source.length;
            const nl = { type: 'newline', offset, indent: token.indent, source: '\n' };
            delete token.items;
            Object.assign(token, { type, source, end: [nl] });
            break;
        }
        default: {
            const indent = 'indent' in token ? token.indent : -1;
            const end = 'end' in token && Array.isArray(token.end)
                ? token.end.filter(st => st.type === 'space' ||
                    st.type === 'comment' ||
                    st.type === 'newline')
                : [];
            for (const key of Object.keys(token))
                if (key !== 'type' && key !== 'offset')
                    delete token[key];
            Object.assign(token, { type, indent, source, end });
        }
    }
}

exports.createScalarToken = createScalarToken;
exports.resolveAsScalar = resolveAsScalar;
exports.setScalarValue = setScalarValue;


/***/ }),

/***/ 1733:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringify a CST document, token, or collection item
 *
 * Fair warning: This applies no validation whatsoever, and
 * simply concatenates the sources in their logical order.
 */
const stringify = (cst) => 'type' in cst ? stringifyToken(cst) : stringifyItem(cst);
function stringifyToken(token) {
    switch (token.type) {
        case 'block-scalar': {
            let res = '';
            for (const tok of token.props)
                res += stringifyToken(tok);
            return res + token.source;
        }
        case 'block-map':
        case 'block-seq': {
            let res = '';
            for (const item of token.items)
                res += stringifyItem(item);
            return res;
        }
        case 'flow-collection': {
            let res = token.start.source;
            for (const item of token.items)
                res += stringifyItem(item);
            for (const st of token.end)
                res += st.source;
            return res;
        }
        case 'document': {
            let res = stringifyItem(token);
            if (token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
        default: {
            let res = token.source;
            if ('end' in token && token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
    }
}
function stringifyItem({ start, key, sep, value }) {
    let res = '';
    for (const st of start)
        res += st.source;
    if (key)
        res += stringifyToken(key);
    if (sep)
        for (const st of sep)
            res += st.source;
    if (value)
        res += stringifyToken(value);
    return res;
}

exports.stringify = stringify;


/***/ }),

/***/ 7715:
/***/ ((__unused_webpack_module, exports) => {



const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove item');
/**
 * Apply a visitor to a CST document or item.
 *
 * Walks through the tree (depth-first) starting from the root, calling a
 * `visitor` function with two arguments when entering each item:
 *   - `item`: The current item, which included the following members:
 *     - `start: SourceToken[]` – Source tokens before the key or value,
 *       possibly including its anchor or tag.
 *     - `key?: Token | null` – Set for pair values. May then be `null`, if
 *       the key before the `:` separator is empty.
 *     - `sep?: SourceToken[]` – Source tokens between the key and the value,
 *       which should include the `:` map value indicator if `value` is set.
 *     - `value?: Token` – The value of a sequence item, or of a map pair.
 *   - `path`: The steps from the root to the current node, as an array of
 *     `['key' | 'value', number]` tuples.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this token, continue with
 *      next sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current item, then continue with the next one
 *   - `number`: Set the index of the next step. This is useful especially if
 *     the index of the current token has changed.
 *   - `function`: Define the next visitor for this item. After the original
 *     visitor is called on item entry, next visitors are called after handling
 *     a non-empty `key` and when exiting the item.
 */
function visit(cst, visitor) {
    if ('type' in cst && cst.type === 'document')
        cst = { start: cst.start, value: cst.value };
    _visit(Object.freeze([]), cst, visitor);
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current item */
visit.SKIP = SKIP;
/** Remove the current item */
visit.REMOVE = REMOVE;
/** Find the item at `path` from `cst` as the root */
visit.itemAtPath = (cst, path) => {
    let item = cst;
    for (const [field, index] of path) {
        const tok = item?.[field];
        if (tok && 'items' in tok) {
            item = tok.items[index];
        }
        else
            return undefined;
    }
    return item;
};
/**
 * Get the immediate parent collection of the item at `path` from `cst` as the root.
 *
 * Throws an error if the collection is not found, which should never happen if the item itself exists.
 */
visit.parentCollection = (cst, path) => {
    const parent = visit.itemAtPath(cst, path.slice(0, -1));
    const field = path[path.length - 1][0];
    const coll = parent?.[field];
    if (coll && 'items' in coll)
        return coll;
    throw new Error('Parent collection not found');
};
function _visit(path, item, visitor) {
    let ctrl = visitor(item, path);
    if (typeof ctrl === 'symbol')
        return ctrl;
    for (const field of ['key', 'value']) {
        const token = item[field];
        if (token && 'items' in token) {
            for (let i = 0; i < token.items.length; ++i) {
                const ci = _visit(Object.freeze(path.concat([[field, i]])), token.items[i], visitor);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    token.items.splice(i, 1);
                    i -= 1;
                }
            }
            if (typeof ctrl === 'function' && field === 'key')
                ctrl = ctrl(item, path);
        }
    }
    return typeof ctrl === 'function' ? ctrl(item, path) : ctrl;
}

exports.visit = visit;


/***/ }),

/***/ 3461:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cstScalar = __nccwpck_require__(110);
var cstStringify = __nccwpck_require__(1733);
var cstVisit = __nccwpck_require__(7715);

/** The byte order mark */
const BOM = '\u{FEFF}';
/** Start of doc-mode */
const DOCUMENT = '\x02'; // C0: Start of Text
/** Unexpected end of flow-mode */
const FLOW_END = '\x18'; // C0: Cancel
/** Next token is a scalar value */
const SCALAR = '\x1f'; // C0: Unit Separator
/** @returns `true` if `token` is a flow or block collection */
const isCollection = (token) => !!token && 'items' in token;
/** @returns `true` if `token` is a flow or block scalar; not an alias */
const isScalar = (token) => !!token &&
    (token.type === 'scalar' ||
        token.type === 'single-quoted-scalar' ||
        token.type === 'double-quoted-scalar' ||
        token.type === 'block-scalar');
/* istanbul ignore next */
/** Get a printable representation of a lexer token */
function prettyToken(token) {
    switch (token) {
        case BOM:
            return '<BOM>';
        case DOCUMENT:
            return '<DOC>';
        case FLOW_END:
            return '<FLOW_END>';
        case SCALAR:
            return '<SCALAR>';
        default:
            return JSON.stringify(token);
    }
}
/** Identify the type of a lexer token. May return `null` for unknown tokens. */
function tokenType(source) {
    switch (source) {
        case BOM:
            return 'byte-order-mark';
        case DOCUMENT:
            return 'doc-mode';
        case FLOW_END:
            return 'flow-error-end';
        case SCALAR:
            return 'scalar';
        case '---':
            return 'doc-start';
        case '...':
            return 'doc-end';
        case '':
        case '\n':
        case '\r\n':
            return 'newline';
        case '-':
            return 'seq-item-ind';
        case '?':
            return 'explicit-key-ind';
        case ':':
            return 'map-value-ind';
        case '{':
            return 'flow-map-start';
        case '}':
            return 'flow-map-end';
        case '[':
            return 'flow-seq-start';
        case ']':
            return 'flow-seq-end';
        case ',':
            return 'comma';
    }
    switch (source[0]) {
        case ' ':
        case '\t':
            return 'space';
        case '#':
            return 'comment';
        case '%':
            return 'directive-line';
        case '*':
            return 'alias';
        case '&':
            return 'anchor';
        case '!':
            return 'tag';
        case "'":
            return 'single-quoted-scalar';
        case '"':
            return 'double-quoted-scalar';
        case '|':
        case '>':
            return 'block-scalar-header';
    }
    return null;
}

exports.createScalarToken = cstScalar.createScalarToken;
exports.resolveAsScalar = cstScalar.resolveAsScalar;
exports.setScalarValue = cstScalar.setScalarValue;
exports.stringify = cstStringify.stringify;
exports.visit = cstVisit.visit;
exports.BOM = BOM;
exports.DOCUMENT = DOCUMENT;
exports.FLOW_END = FLOW_END;
exports.SCALAR = SCALAR;
exports.isCollection = isCollection;
exports.isScalar = isScalar;
exports.prettyToken = prettyToken;
exports.tokenType = tokenType;


/***/ }),

/***/ 361:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cst = __nccwpck_require__(3461);

/*
START -> stream

stream
  directive -> line-end -> stream
  indent + line-end -> stream
  [else] -> line-start

line-end
  comment -> line-end
  newline -> .
  input-end -> END

line-start
  doc-start -> doc
  doc-end -> stream
  [else] -> indent -> block-start

block-start
  seq-item-start -> block-start
  explicit-key-start -> block-start
  map-value-start -> block-start
  [else] -> doc

doc
  line-end -> line-start
  spaces -> doc
  anchor -> doc
  tag -> doc
  flow-start -> flow -> doc
  flow-end -> error -> doc
  seq-item-start -> error -> doc
  explicit-key-start -> error -> doc
  map-value-start -> doc
  alias -> doc
  quote-start -> quoted-scalar -> doc
  block-scalar-header -> line-end -> block-scalar(min) -> line-start
  [else] -> plain-scalar(false, min) -> doc

flow
  line-end -> flow
  spaces -> flow
  anchor -> flow
  tag -> flow
  flow-start -> flow -> flow
  flow-end -> .
  seq-item-start -> error -> flow
  explicit-key-start -> flow
  map-value-start -> flow
  alias -> flow
  quote-start -> quoted-scalar -> flow
  comma -> flow
  [else] -> plain-scalar(true, 0) -> flow

quoted-scalar
  quote-end -> .
  [else] -> quoted-scalar

block-scalar(min)
  newline + peek(indent < min) -> .
  [else] -> block-scalar(min)

plain-scalar(is-flow, min)
  scalar-end(is-flow) -> .
  peek(newline + (indent < min)) -> .
  [else] -> plain-scalar(min)
*/
function isEmpty(ch) {
    switch (ch) {
        case undefined:
        case ' ':
        case '\n':
        case '\r':
        case '\t':
            return true;
        default:
            return false;
    }
}
const hexDigits = new Set('0123456789ABCDEFabcdef');
const tagChars = new Set("0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz-#;/?:@&=+$_.!~*'()");
const flowIndicatorChars = new Set(',[]{}');
const invalidAnchorChars = new Set(' ,[]{}\n\r\t');
const isNotAnchorChar = (ch) => !ch || invalidAnchorChars.has(ch);
/**
 * Splits an input string into lexical tokens, i.e. smaller strings that are
 * easily identifiable by `tokens.tokenType()`.
 *
 * Lexing starts always in a "stream" context. Incomplete input may be buffered
 * until a complete token can be emitted.
 *
 * In addition to slices of the original input, the following control characters
 * may also be emitted:
 *
 * - `\x02` (Start of Text): A document starts with the next token
 * - `\x18` (Cancel): Unexpected end of flow-mode (indicates an error)
 * - `\x1f` (Unit Separator): Next token is a scalar value
 * - `\u{FEFF}` (Byte order mark): Emitted separately outside documents
 */
class Lexer {
    constructor() {
        /**
         * Flag indicating whether the end of the current buffer marks the end of
         * all input
         */
        this.atEnd = false;
        /**
         * Explicit indent set in block scalar header, as an offset from the current
         * minimum indent, so e.g. set to 1 from a header `|2+`. Set to -1 if not
         * explicitly set.
         */
        this.blockScalarIndent = -1;
        /**
         * Block scalars that include a + (keep) chomping indicator in their header
         * include trailing empty lines, which are otherwise excluded from the
         * scalar's contents.
         */
        this.blockScalarKeep = false;
        /** Current input */
        this.buffer = '';
        /**
         * Flag noting whether the map value indicator : can immediately follow this
         * node within a flow context.
         */
        this.flowKey = false;
        /** Count of surrounding flow collection levels. */
        this.flowLevel = 0;
        /**
         * Minimum level of indentation required for next lines to be parsed as a
         * part of the current scalar value.
         */
        this.indentNext = 0;
        /** Indentation level of the current line. */
        this.indentValue = 0;
        /** Position of the next \n character. */
        this.lineEndPos = null;
        /** Stores the state of the lexer if reaching the end of incpomplete input */
        this.next = null;
        /** A pointer to `buffer`; the current position of the lexer. */
        this.pos = 0;
    }
    /**
     * Generate YAML tokens from the `source` string. If `incomplete`,
     * a part of the last line may be left as a buffer for the next call.
     *
     * @returns A generator of lexical tokens
     */
    *lex(source, incomplete = false) {
        if (source) {
            if (typeof source !== 'string')
                throw TypeError('source is not a string');
            this.buffer = this.buffer ? this.buffer + source : source;
            this.lineEndPos = null;
        }
        this.atEnd = !incomplete;
        let next = this.next ?? 'stream';
        while (next && (incomplete || this.hasChars(1)))
            next = yield* this.parseNext(next);
    }
    atLineEnd() {
        let i = this.pos;
        let ch = this.buffer[i];
        while (ch === ' ' || ch === '\t')
            ch = this.buffer[++i];
        if (!ch || ch === '#' || ch === '\n')
            return true;
        if (ch === '\r')
            return this.buffer[i + 1] === '\n';
        return false;
    }
    charAt(n) {
        return this.buffer[this.pos + n];
    }
    continueScalar(offset) {
        let ch = this.buffer[offset];
        if (this.indentNext > 0) {
            let indent = 0;
            while (ch === ' ')
                ch = this.buffer[++indent + offset];
            if (ch === '\r') {
                const next = this.buffer[indent + offset + 1];
                if (next === '\n' || (!next && !this.atEnd))
                    return offset + indent + 1;
            }
            return ch === '\n' || indent >= this.indentNext || (!ch && !this.atEnd)
                ? offset + indent
                : -1;
        }
        if (ch === '-' || ch === '.') {
            const dt = this.buffer.substr(offset, 3);
            if ((dt === '---' || dt === '...') && isEmpty(this.buffer[offset + 3]))
                return -1;
        }
        return offset;
    }
    getLine() {
        let end = this.lineEndPos;
        if (typeof end !== 'number' || (end !== -1 && end < this.pos)) {
            end = this.buffer.indexOf('\n', this.pos);
            this.lineEndPos = end;
        }
        if (end === -1)
            return this.atEnd ? this.buffer.substring(this.pos) : null;
        if (this.buffer[end - 1] === '\r')
            end -= 1;
        return this.buffer.substring(this.pos, end);
    }
    hasChars(n) {
        return this.pos + n <= this.buffer.length;
    }
    setNext(state) {
        this.buffer = this.buffer.substring(this.pos);
        this.pos = 0;
        this.lineEndPos = null;
        this.next = state;
        return null;
    }
    peek(n) {
        return this.buffer.substr(this.pos, n);
    }
    *parseNext(next) {
        switch (next) {
            case 'stream':
                return yield* this.parseStream();
            case 'line-start':
                return yield* this.parseLineStart();
            case 'block-start':
                return yield* this.parseBlockStart();
            case 'doc':
                return yield* this.parseDocument();
            case 'flow':
                return yield* this.parseFlowCollection();
            case 'quoted-scalar':
                return yield* this.parseQuotedScalar();
            case 'block-scalar':
                return yield* this.parseBlockScalar();
            case 'plain-scalar':
                return yield* this.parsePlainScalar();
        }
    }
    *parseStream() {
        let line = this.getLine();
        if (line === null)
            return this.setNext('stream');
        if (line[0] === cst.BOM) {
            yield* this.pushCount(1);
            line = line.substring(1);
        }
        if (line[0] === '%') {
            let dirEnd = line.length;
            let cs = line.indexOf('#');
            while (cs !== -1) {
                const ch = line[cs - 1];
                if (ch === ' ' || ch === '\t') {
                    dirEnd = cs - 1;
                    break;
                }
                else {
                    cs = line.indexOf('#', cs + 1);
                }
            }
            while (true) {
                const ch = line[dirEnd - 1];
                if (ch === ' ' || ch === '\t')
                    dirEnd -= 1;
                else
                    break;
            }
            const n = (yield* this.pushCount(dirEnd)) + (yield* this.pushSpaces(true));
            yield* this.pushCount(line.length - n); // possible comment
            this.pushNewline();
            return 'stream';
        }
        if (this.atLineEnd()) {
            const sp = yield* this.pushSpaces(true);
            yield* this.pushCount(line.length - sp);
            yield* this.pushNewline();
            return 'stream';
        }
        yield cst.DOCUMENT;
        return yield* this.parseLineStart();
    }
    *parseLineStart() {
        const ch = this.charAt(0);
        if (!ch && !this.atEnd)
            return this.setNext('line-start');
        if (ch === '-' || ch === '.') {
            if (!this.atEnd && !this.hasChars(4))
                return this.setNext('line-start');
            const s = this.peek(3);
            if ((s === '---' || s === '...') && isEmpty(this.charAt(3))) {
                yield* this.pushCount(3);
                this.indentValue = 0;
                this.indentNext = 0;
                return s === '---' ? 'doc' : 'stream';
            }
        }
        this.indentValue = yield* this.pushSpaces(false);
        if (this.indentNext > this.indentValue && !isEmpty(this.charAt(1)))
            this.indentNext = this.indentValue;
        return yield* this.parseBlockStart();
    }
    *parseBlockStart() {
        const [ch0, ch1] = this.peek(2);
        if (!ch1 && !this.atEnd)
            return this.setNext('block-start');
        if ((ch0 === '-' || ch0 === '?' || ch0 === ':') && isEmpty(ch1)) {
            const n = (yield* this.pushCount(1)) + (yield* this.pushSpaces(true));
            this.indentNext = this.indentValue + 1;
            this.indentValue += n;
            return 'block-start';
        }
        return 'doc';
    }
    *parseDocument() {
        yield* this.pushSpaces(true);
        const line = this.getLine();
        if (line === null)
            return this.setNext('doc');
        let n = yield* this.pushIndicators();
        switch (line[n]) {
            case '#':
                yield* this.pushCount(line.length - n);
            // fallthrough
            case undefined:
                yield* this.pushNewline();
                return yield* this.parseLineStart();
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel = 1;
                return 'flow';
            case '}':
            case ']':
                // this is an error
                yield* this.pushCount(1);
                return 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'doc';
            case '"':
            case "'":
                return yield* this.parseQuotedScalar();
            case '|':
            case '>':
                n += yield* this.parseBlockScalarHeader();
                n += yield* this.pushSpaces(true);
                yield* this.pushCount(line.length - n);
                yield* this.pushNewline();
                return yield* this.parseBlockScalar();
            default:
                return yield* this.parsePlainScalar();
        }
    }
    *parseFlowCollection() {
        let nl, sp;
        let indent = -1;
        do {
            nl = yield* this.pushNewline();
            if (nl > 0) {
                sp = yield* this.pushSpaces(false);
                this.indentValue = indent = sp;
            }
            else {
                sp = 0;
            }
            sp += yield* this.pushSpaces(true);
        } while (nl + sp > 0);
        const line = this.getLine();
        if (line === null)
            return this.setNext('flow');
        if ((indent !== -1 && indent < this.indentNext && line[0] !== '#') ||
            (indent === 0 &&
                (line.startsWith('---') || line.startsWith('...')) &&
                isEmpty(line[3]))) {
            // Allowing for the terminal ] or } at the same (rather than greater)
            // indent level as the initial [ or { is technically invalid, but
            // failing here would be surprising to users.
            const atFlowEndMarker = indent === this.indentNext - 1 &&
                this.flowLevel === 1 &&
                (line[0] === ']' || line[0] === '}');
            if (!atFlowEndMarker) {
                // this is an error
                this.flowLevel = 0;
                yield cst.FLOW_END;
                return yield* this.parseLineStart();
            }
        }
        let n = 0;
        while (line[n] === ',') {
            n += yield* this.pushCount(1);
            n += yield* this.pushSpaces(true);
            this.flowKey = false;
        }
        n += yield* this.pushIndicators();
        switch (line[n]) {
            case undefined:
                return 'flow';
            case '#':
                yield* this.pushCount(line.length - n);
                return 'flow';
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel += 1;
                return 'flow';
            case '}':
            case ']':
                yield* this.pushCount(1);
                this.flowKey = true;
                this.flowLevel -= 1;
                return this.flowLevel ? 'flow' : 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'flow';
            case '"':
            case "'":
                this.flowKey = true;
                return yield* this.parseQuotedScalar();
            case ':': {
                const next = this.charAt(1);
                if (this.flowKey || isEmpty(next) || next === ',') {
                    this.flowKey = false;
                    yield* this.pushCount(1);
                    yield* this.pushSpaces(true);
                    return 'flow';
                }
            }
            // fallthrough
            default:
                this.flowKey = false;
                return yield* this.parsePlainScalar();
        }
    }
    *parseQuotedScalar() {
        const quote = this.charAt(0);
        let end = this.buffer.indexOf(quote, this.pos + 1);
        if (quote === "'") {
            while (end !== -1 && this.buffer[end + 1] === "'")
                end = this.buffer.indexOf("'", end + 2);
        }
        else {
            // double-quote
            while (end !== -1) {
                let n = 0;
                while (this.buffer[end - 1 - n] === '\\')
                    n += 1;
                if (n % 2 === 0)
                    break;
                end = this.buffer.indexOf('"', end + 1);
            }
        }
        // Only looking for newlines within the quotes
        const qb = this.buffer.substring(0, end);
        let nl = qb.indexOf('\n', this.pos);
        if (nl !== -1) {
            while (nl !== -1) {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = qb.indexOf('\n', cs);
            }
            if (nl !== -1) {
                // this is an error caused by an unexpected unindent
                end = nl - (qb[nl - 1] === '\r' ? 2 : 1);
            }
        }
        if (end === -1) {
            if (!this.atEnd)
                return this.setNext('quoted-scalar');
            end = this.buffer.length;
        }
        yield* this.pushToIndex(end + 1, false);
        return this.flowLevel ? 'flow' : 'doc';
    }
    *parseBlockScalarHeader() {
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        let i = this.pos;
        while (true) {
            const ch = this.buffer[++i];
            if (ch === '+')
                this.blockScalarKeep = true;
            else if (ch > '0' && ch <= '9')
                this.blockScalarIndent = Number(ch) - 1;
            else if (ch !== '-')
                break;
        }
        return yield* this.pushUntil(ch => isEmpty(ch) || ch === '#');
    }
    *parseBlockScalar() {
        let nl = this.pos - 1; // may be -1 if this.pos === 0
        let indent = 0;
        let ch;
        loop: for (let i = this.pos; (ch = this.buffer[i]); ++i) {
            switch (ch) {
                case ' ':
                    indent += 1;
                    break;
                case '\n':
                    nl = i;
                    indent = 0;
                    break;
                case '\r': {
                    const next = this.buffer[i + 1];
                    if (!next && !this.atEnd)
                        return this.setNext('block-scalar');
                    if (next === '\n')
                        break;
                } // fallthrough
                default:
                    break loop;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('block-scalar');
        if (indent >= this.indentNext) {
            if (this.blockScalarIndent === -1)
                this.indentNext = indent;
            else {
                this.indentNext =
                    this.blockScalarIndent + (this.indentNext === 0 ? 1 : this.indentNext);
            }
            do {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = this.buffer.indexOf('\n', cs);
            } while (nl !== -1);
            if (nl === -1) {
                if (!this.atEnd)
                    return this.setNext('block-scalar');
                nl = this.buffer.length;
            }
        }
        // Trailing insufficiently indented tabs are invalid.
        // To catch that during parsing, we include them in the block scalar value.
        let i = nl + 1;
        ch = this.buffer[i];
        while (ch === ' ')
            ch = this.buffer[++i];
        if (ch === '\t') {
            while (ch === '\t' || ch === ' ' || ch === '\r' || ch === '\n')
                ch = this.buffer[++i];
            nl = i - 1;
        }
        else if (!this.blockScalarKeep) {
            do {
                let i = nl - 1;
                let ch = this.buffer[i];
                if (ch === '\r')
                    ch = this.buffer[--i];
                const lastChar = i; // Drop the line if last char not more indented
                while (ch === ' ')
                    ch = this.buffer[--i];
                if (ch === '\n' && i >= this.pos && i + 1 + indent > lastChar)
                    nl = i;
                else
                    break;
            } while (true);
        }
        yield cst.SCALAR;
        yield* this.pushToIndex(nl + 1, true);
        return yield* this.parseLineStart();
    }
    *parsePlainScalar() {
        const inFlow = this.flowLevel > 0;
        let end = this.pos - 1;
        let i = this.pos - 1;
        let ch;
        while ((ch = this.buffer[++i])) {
            if (ch === ':') {
                const next = this.buffer[i + 1];
                if (isEmpty(next) || (inFlow && flowIndicatorChars.has(next)))
                    break;
                end = i;
            }
            else if (isEmpty(ch)) {
                let next = this.buffer[i + 1];
                if (ch === '\r') {
                    if (next === '\n') {
                        i += 1;
                        ch = '\n';
                        next = this.buffer[i + 1];
                    }
                    else
                        end = i;
                }
                if (next === '#' || (inFlow && flowIndicatorChars.has(next)))
                    break;
                if (ch === '\n') {
                    const cs = this.continueScalar(i + 1);
                    if (cs === -1)
                        break;
                    i = Math.max(i, cs - 2); // to advance, but still account for ' #'
                }
            }
            else {
                if (inFlow && flowIndicatorChars.has(ch))
                    break;
                end = i;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('plain-scalar');
        yield cst.SCALAR;
        yield* this.pushToIndex(end + 1, true);
        return inFlow ? 'flow' : 'doc';
    }
    *pushCount(n) {
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos += n;
            return n;
        }
        return 0;
    }
    *pushToIndex(i, allowEmpty) {
        const s = this.buffer.slice(this.pos, i);
        if (s) {
            yield s;
            this.pos += s.length;
            return s.length;
        }
        else if (allowEmpty)
            yield '';
        return 0;
    }
    *pushIndicators() {
        let n = 0;
        loop: while (true) {
            switch (this.charAt(0)) {
                case '!':
                    n += yield* this.pushTag();
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '&':
                    n += yield* this.pushUntil(isNotAnchorChar);
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '-': // this is an error
                case '?': // this is an error outside flow collections
                case ':': {
                    const inFlow = this.flowLevel > 0;
                    const ch1 = this.charAt(1);
                    if (isEmpty(ch1) || (inFlow && flowIndicatorChars.has(ch1))) {
                        if (!inFlow)
                            this.indentNext = this.indentValue + 1;
                        else if (this.flowKey)
                            this.flowKey = false;
                        n += yield* this.pushCount(1);
                        n += yield* this.pushSpaces(true);
                        continue loop;
                    }
                }
            }
            break loop;
        }
        return n;
    }
    *pushTag() {
        if (this.charAt(1) === '<') {
            let i = this.pos + 2;
            let ch = this.buffer[i];
            while (!isEmpty(ch) && ch !== '>')
                ch = this.buffer[++i];
            return yield* this.pushToIndex(ch === '>' ? i + 1 : i, false);
        }
        else {
            let i = this.pos + 1;
            let ch = this.buffer[i];
            while (ch) {
                if (tagChars.has(ch))
                    ch = this.buffer[++i];
                else if (ch === '%' &&
                    hexDigits.has(this.buffer[i + 1]) &&
                    hexDigits.has(this.buffer[i + 2])) {
                    ch = this.buffer[(i += 3)];
                }
                else
                    break;
            }
            return yield* this.pushToIndex(i, false);
        }
    }
    *pushNewline() {
        const ch = this.buffer[this.pos];
        if (ch === '\n')
            return yield* this.pushCount(1);
        else if (ch === '\r' && this.charAt(1) === '\n')
            return yield* this.pushCount(2);
        else
            return 0;
    }
    *pushSpaces(allowTabs) {
        let i = this.pos - 1;
        let ch;
        do {
            ch = this.buffer[++i];
        } while (ch === ' ' || (allowTabs && ch === '\t'));
        const n = i - this.pos;
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos = i;
        }
        return n;
    }
    *pushUntil(test) {
        let i = this.pos;
        let ch = this.buffer[i];
        while (!test(ch))
            ch = this.buffer[++i];
        return yield* this.pushToIndex(i, false);
    }
}

exports.Lexer = Lexer;


/***/ }),

/***/ 6628:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Tracks newlines during parsing in order to provide an efficient API for
 * determining the one-indexed `{ line, col }` position for any offset
 * within the input.
 */
class LineCounter {
    constructor() {
        this.lineStarts = [];
        /**
         * Should be called in ascending order. Otherwise, call
         * `lineCounter.lineStarts.sort()` before calling `linePos()`.
         */
        this.addNewLine = (offset) => this.lineStarts.push(offset);
        /**
         * Performs a binary search and returns the 1-indexed { line, col }
         * position of `offset`. If `line === 0`, `addNewLine` has never been
         * called or `offset` is before the first known newline.
         */
        this.linePos = (offset) => {
            let low = 0;
            let high = this.lineStarts.length;
            while (low < high) {
                const mid = (low + high) >> 1; // Math.floor((low + high) / 2)
                if (this.lineStarts[mid] < offset)
                    low = mid + 1;
                else
                    high = mid;
            }
            if (this.lineStarts[low] === offset)
                return { line: low + 1, col: 1 };
            if (low === 0)
                return { line: 0, col: offset };
            const start = this.lineStarts[low - 1];
            return { line: low, col: offset - start + 1 };
        };
    }
}

exports.LineCounter = LineCounter;


/***/ }),

/***/ 3456:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);

function includesToken(list, type) {
    for (let i = 0; i < list.length; ++i)
        if (list[i].type === type)
            return true;
    return false;
}
function findNonEmptyIndex(list) {
    for (let i = 0; i < list.length; ++i) {
        switch (list[i].type) {
            case 'space':
            case 'comment':
            case 'newline':
                break;
            default:
                return i;
        }
    }
    return -1;
}
function isFlowToken(token) {
    switch (token?.type) {
        case 'alias':
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'flow-collection':
            return true;
        default:
            return false;
    }
}
function getPrevProps(parent) {
    switch (parent.type) {
        case 'document':
            return parent.start;
        case 'block-map': {
            const it = parent.items[parent.items.length - 1];
            return it.sep ?? it.start;
        }
        case 'block-seq':
            return parent.items[parent.items.length - 1].start;
        /* istanbul ignore next should not happen */
        default:
            return [];
    }
}
/** Note: May modify input array */
function getFirstKeyStartProps(prev) {
    if (prev.length === 0)
        return [];
    let i = prev.length;
    loop: while (--i >= 0) {
        switch (prev[i].type) {
            case 'doc-start':
            case 'explicit-key-ind':
            case 'map-value-ind':
            case 'seq-item-ind':
            case 'newline':
                break loop;
        }
    }
    while (prev[++i]?.type === 'space') {
        /* loop */
    }
    return prev.splice(i, prev.length);
}
function arrayPushArray(target, source) {
    // May exhaust call stack with large `source` array
    if (source.length < 1e5)
        Array.prototype.push.apply(target, source);
    else
        for (let i = 0; i < source.length; ++i)
            target.push(source[i]);
}
function fixFlowSeqItems(fc) {
    if (fc.start.type === 'flow-seq-start') {
        for (const it of fc.items) {
            if (it.sep &&
                !it.value &&
                !includesToken(it.start, 'explicit-key-ind') &&
                !includesToken(it.sep, 'map-value-ind')) {
                if (it.key)
                    it.value = it.key;
                delete it.key;
                if (isFlowToken(it.value)) {
                    if (it.value.end)
                        arrayPushArray(it.value.end, it.sep);
                    else
                        it.value.end = it.sep;
                }
                else
                    arrayPushArray(it.start, it.sep);
                delete it.sep;
            }
        }
    }
}
/**
 * A YAML concrete syntax tree (CST) parser
 *
 * ```ts
 * const src: string = ...
 * for (const token of new Parser().parse(src)) {
 *   // token: Token
 * }
 * ```
 *
 * To use the parser with a user-provided lexer:
 *
 * ```ts
 * function* parse(source: string, lexer: Lexer) {
 *   const parser = new Parser()
 *   for (const lexeme of lexer.lex(source))
 *     yield* parser.next(lexeme)
 *   yield* parser.end()
 * }
 *
 * const src: string = ...
 * const lexer = new Lexer()
 * for (const token of parse(src, lexer)) {
 *   // token: Token
 * }
 * ```
 */
class Parser {
    /**
     * @param onNewLine - If defined, called separately with the start position of
     *   each new line (in `parse()`, including the start of input).
     */
    constructor(onNewLine) {
        /** If true, space and sequence indicators count as indentation */
        this.atNewLine = true;
        /** If true, next token is a scalar value */
        this.atScalar = false;
        /** Current indentation level */
        this.indent = 0;
        /** Current offset since the start of parsing */
        this.offset = 0;
        /** On the same line with a block map key */
        this.onKeyLine = false;
        /** Top indicates the node that's currently being built */
        this.stack = [];
        /** The source of the current token, set in parse() */
        this.source = '';
        /** The type of the current token, set in parse() */
        this.type = '';
        // Must be defined after `next()`
        this.lexer = new lexer.Lexer();
        this.onNewLine = onNewLine;
    }
    /**
     * Parse `source` as a YAML stream.
     * If `incomplete`, a part of the last line may be left as a buffer for the next call.
     *
     * Errors are not thrown, but yielded as `{ type: 'error', message }` tokens.
     *
     * @returns A generator of tokens representing each directive, document, and other structure.
     */
    *parse(source, incomplete = false) {
        if (this.onNewLine && this.offset === 0)
            this.onNewLine(0);
        for (const lexeme of this.lexer.lex(source, incomplete))
            yield* this.next(lexeme);
        if (!incomplete)
            yield* this.end();
    }
    /**
     * Advance the parser by the `source` of one lexical token.
     */
    *next(source) {
        this.source = source;
        if (node_process.env.LOG_TOKENS)
            console.log('|', cst.prettyToken(source));
        if (this.atScalar) {
            this.atScalar = false;
            yield* this.step();
            this.offset += source.length;
            return;
        }
        const type = cst.tokenType(source);
        if (!type) {
            const message = `Not a YAML token: ${source}`;
            yield* this.pop({ type: 'error', offset: this.offset, message, source });
            this.offset += source.length;
        }
        else if (type === 'scalar') {
            this.atNewLine = false;
            this.atScalar = true;
            this.type = 'scalar';
        }
        else {
            this.type = type;
            yield* this.step();
            switch (type) {
                case 'newline':
                    this.atNewLine = true;
                    this.indent = 0;
                    if (this.onNewLine)
                        this.onNewLine(this.offset + source.length);
                    break;
                case 'space':
                    if (this.atNewLine && source[0] === ' ')
                        this.indent += source.length;
                    break;
                case 'explicit-key-ind':
                case 'map-value-ind':
                case 'seq-item-ind':
                    if (this.atNewLine)
                        this.indent += source.length;
                    break;
                case 'doc-mode':
                case 'flow-error-end':
                    return;
                default:
                    this.atNewLine = false;
            }
            this.offset += source.length;
        }
    }
    /** Call at end of input to push out any remaining constructions */
    *end() {
        while (this.stack.length > 0)
            yield* this.pop();
    }
    get sourceToken() {
        const st = {
            type: this.type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
        return st;
    }
    *step() {
        const top = this.peek(1);
        if (this.type === 'doc-end' && top?.type !== 'doc-end') {
            while (this.stack.length > 0)
                yield* this.pop();
            this.stack.push({
                type: 'doc-end',
                offset: this.offset,
                source: this.source
            });
            return;
        }
        if (!top)
            return yield* this.stream();
        switch (top.type) {
            case 'document':
                return yield* this.document(top);
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return yield* this.scalar(top);
            case 'block-scalar':
                return yield* this.blockScalar(top);
            case 'block-map':
                return yield* this.blockMap(top);
            case 'block-seq':
                return yield* this.blockSequence(top);
            case 'flow-collection':
                return yield* this.flowCollection(top);
            case 'doc-end':
                return yield* this.documentEnd(top);
        }
        /* istanbul ignore next should not happen */
        yield* this.pop();
    }
    peek(n) {
        return this.stack[this.stack.length - n];
    }
    *pop(error) {
        const token = error ?? this.stack.pop();
        /* istanbul ignore if should not happen */
        if (!token) {
            const message = 'Tried to pop an empty stack';
            yield { type: 'error', offset: this.offset, source: '', message };
        }
        else if (this.stack.length === 0) {
            yield token;
        }
        else {
            const top = this.peek(1);
            if (token.type === 'block-scalar') {
                // Block scalars use their parent rather than header indent
                token.indent = 'indent' in top ? top.indent : 0;
            }
            else if (token.type === 'flow-collection' && top.type === 'document') {
                // Ignore all indent for top-level flow collections
                token.indent = 0;
            }
            if (token.type === 'flow-collection')
                fixFlowSeqItems(token);
            switch (top.type) {
                case 'document':
                    top.value = token;
                    break;
                case 'block-scalar':
                    top.props.push(token); // error
                    break;
                case 'block-map': {
                    const it = top.items[top.items.length - 1];
                    if (it.value) {
                        top.items.push({ start: [], key: token, sep: [] });
                        this.onKeyLine = true;
                        return;
                    }
                    else if (it.sep) {
                        it.value = token;
                    }
                    else {
                        Object.assign(it, { key: token, sep: [] });
                        this.onKeyLine = !it.explicitKey;
                        return;
                    }
                    break;
                }
                case 'block-seq': {
                    const it = top.items[top.items.length - 1];
                    if (it.value)
                        top.items.push({ start: [], value: token });
                    else
                        it.value = token;
                    break;
                }
                case 'flow-collection': {
                    const it = top.items[top.items.length - 1];
                    if (!it || it.value)
                        top.items.push({ start: [], key: token, sep: [] });
                    else if (it.sep)
                        it.value = token;
                    else
                        Object.assign(it, { key: token, sep: [] });
                    return;
                }
                /* istanbul ignore next should not happen */
                default:
                    yield* this.pop();
                    yield* this.pop(token);
            }
            if ((top.type === 'document' ||
                top.type === 'block-map' ||
                top.type === 'block-seq') &&
                (token.type === 'block-map' || token.type === 'block-seq')) {
                const last = token.items[token.items.length - 1];
                if (last &&
                    !last.sep &&
                    !last.value &&
                    last.start.length > 0 &&
                    findNonEmptyIndex(last.start) === -1 &&
                    (token.indent === 0 ||
                        last.start.every(st => st.type !== 'comment' || st.indent < token.indent))) {
                    if (top.type === 'document')
                        top.end = last.start;
                    else
                        top.items.push({ start: last.start });
                    token.items.splice(-1, 1);
                }
            }
        }
    }
    *stream() {
        switch (this.type) {
            case 'directive-line':
                yield { type: 'directive', offset: this.offset, source: this.source };
                return;
            case 'byte-order-mark':
            case 'space':
            case 'comment':
            case 'newline':
                yield this.sourceToken;
                return;
            case 'doc-mode':
            case 'doc-start': {
                const doc = {
                    type: 'document',
                    offset: this.offset,
                    start: []
                };
                if (this.type === 'doc-start')
                    doc.start.push(this.sourceToken);
                this.stack.push(doc);
                return;
            }
        }
        yield {
            type: 'error',
            offset: this.offset,
            message: `Unexpected ${this.type} token in YAML stream`,
            source: this.source
        };
    }
    *document(doc) {
        if (doc.value)
            return yield* this.lineEnd(doc);
        switch (this.type) {
            case 'doc-start': {
                if (findNonEmptyIndex(doc.start) !== -1) {
                    yield* this.pop();
                    yield* this.step();
                }
                else
                    doc.start.push(this.sourceToken);
                return;
            }
            case 'anchor':
            case 'tag':
            case 'space':
            case 'comment':
            case 'newline':
                doc.start.push(this.sourceToken);
                return;
        }
        const bv = this.startBlockValue(doc);
        if (bv)
            this.stack.push(bv);
        else {
            yield {
                type: 'error',
                offset: this.offset,
                message: `Unexpected ${this.type} token in YAML document`,
                source: this.source
            };
        }
    }
    *scalar(scalar) {
        if (this.type === 'map-value-ind') {
            const prev = getPrevProps(this.peek(2));
            const start = getFirstKeyStartProps(prev);
            let sep;
            if (scalar.end) {
                sep = scalar.end;
                sep.push(this.sourceToken);
                delete scalar.end;
            }
            else
                sep = [this.sourceToken];
            const map = {
                type: 'block-map',
                offset: scalar.offset,
                indent: scalar.indent,
                items: [{ start, key: scalar, sep }]
            };
            this.onKeyLine = true;
            this.stack[this.stack.length - 1] = map;
        }
        else
            yield* this.lineEnd(scalar);
    }
    *blockScalar(scalar) {
        switch (this.type) {
            case 'space':
            case 'comment':
            case 'newline':
                scalar.props.push(this.sourceToken);
                return;
            case 'scalar':
                scalar.source = this.source;
                // block-scalar source includes trailing newline
                this.atNewLine = true;
                this.indent = 0;
                if (this.onNewLine) {
                    let nl = this.source.indexOf('\n') + 1;
                    while (nl !== 0) {
                        this.onNewLine(this.offset + nl);
                        nl = this.source.indexOf('\n', nl) + 1;
                    }
                }
                yield* this.pop();
                break;
            /* istanbul ignore next should not happen */
            default:
                yield* this.pop();
                yield* this.step();
        }
    }
    *blockMap(map) {
        const it = map.items[map.items.length - 1];
        // it.sep is true-ish if pair already has key or : separator
        switch (this.type) {
            case 'newline':
                this.onKeyLine = false;
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    it.start.push(this.sourceToken);
                }
                return;
            case 'space':
            case 'comment':
                if (it.value) {
                    map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    if (this.atIndentedComment(it.start, map.indent)) {
                        const prev = map.items[map.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            map.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
        }
        if (this.indent >= map.indent) {
            const atMapIndent = !this.onKeyLine && this.indent === map.indent;
            const atNextItem = atMapIndent &&
                (it.sep || it.explicitKey) &&
                this.type !== 'seq-item-ind';
            // For empty nodes, assign newline-separated not indented empty tokens to following node
            let start = [];
            if (atNextItem && it.sep && !it.value) {
                const nl = [];
                for (let i = 0; i < it.sep.length; ++i) {
                    const st = it.sep[i];
                    switch (st.type) {
                        case 'newline':
                            nl.push(i);
                            break;
                        case 'space':
                            break;
                        case 'comment':
                            if (st.indent > map.indent)
                                nl.length = 0;
                            break;
                        default:
                            nl.length = 0;
                    }
                }
                if (nl.length >= 2)
                    start = it.sep.splice(nl[1]);
            }
            switch (this.type) {
                case 'anchor':
                case 'tag':
                    if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        it.sep.push(this.sourceToken);
                    }
                    else {
                        it.start.push(this.sourceToken);
                    }
                    return;
                case 'explicit-key-ind':
                    if (!it.sep && !it.explicitKey) {
                        it.start.push(this.sourceToken);
                        it.explicitKey = true;
                    }
                    else if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start, explicitKey: true });
                    }
                    else {
                        this.stack.push({
                            type: 'block-map',
                            offset: this.offset,
                            indent: this.indent,
                            items: [{ start: [this.sourceToken], explicitKey: true }]
                        });
                    }
                    this.onKeyLine = true;
                    return;
                case 'map-value-ind':
                    if (it.explicitKey) {
                        if (!it.sep) {
                            if (includesToken(it.start, 'newline')) {
                                Object.assign(it, { key: null, sep: [this.sourceToken] });
                            }
                            else {
                                const start = getFirstKeyStartProps(it.start);
                                this.stack.push({
                                    type: 'block-map',
                                    offset: this.offset,
                                    indent: this.indent,
                                    items: [{ start, key: null, sep: [this.sourceToken] }]
                                });
                            }
                        }
                        else if (it.value) {
                            map.items.push({ start: [], key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else if (isFlowToken(it.key) &&
                            !includesToken(it.sep, 'newline')) {
                            const start = getFirstKeyStartProps(it.start);
                            const key = it.key;
                            const sep = it.sep;
                            sep.push(this.sourceToken);
                            // @ts-expect-error type guard is wrong here
                            delete it.key;
                            // @ts-expect-error type guard is wrong here
                            delete it.sep;
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key, sep }]
                            });
                        }
                        else if (start.length > 0) {
                            // Not actually at next item
                            it.sep = it.sep.concat(start, this.sourceToken);
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    else {
                        if (!it.sep) {
                            Object.assign(it, { key: null, sep: [this.sourceToken] });
                        }
                        else if (it.value || atNextItem) {
                            map.items.push({ start, key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start: [], key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    this.onKeyLine = true;
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (atNextItem || it.value) {
                        map.items.push({ start, key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        this.stack.push(fs);
                    }
                    else {
                        Object.assign(it, { key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    return;
                }
                default: {
                    const bv = this.startBlockValue(map);
                    if (bv) {
                        if (bv.type === 'block-seq') {
                            if (!it.explicitKey &&
                                it.sep &&
                                !includesToken(it.sep, 'newline')) {
                                yield* this.pop({
                                    type: 'error',
                                    offset: this.offset,
                                    message: 'Unexpected block-seq-ind on same line with key',
                                    source: this.source
                                });
                                return;
                            }
                        }
                        else if (atMapIndent) {
                            map.items.push({ start });
                        }
                        this.stack.push(bv);
                        return;
                    }
                }
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *blockSequence(seq) {
        const it = seq.items[seq.items.length - 1];
        switch (this.type) {
            case 'newline':
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        seq.items.push({ start: [this.sourceToken] });
                }
                else
                    it.start.push(this.sourceToken);
                return;
            case 'space':
            case 'comment':
                if (it.value)
                    seq.items.push({ start: [this.sourceToken] });
                else {
                    if (this.atIndentedComment(it.start, seq.indent)) {
                        const prev = seq.items[seq.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            seq.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
            case 'anchor':
            case 'tag':
                if (it.value || this.indent <= seq.indent)
                    break;
                it.start.push(this.sourceToken);
                return;
            case 'seq-item-ind':
                if (this.indent !== seq.indent)
                    break;
                if (it.value || includesToken(it.start, 'seq-item-ind'))
                    seq.items.push({ start: [this.sourceToken] });
                else
                    it.start.push(this.sourceToken);
                return;
        }
        if (this.indent > seq.indent) {
            const bv = this.startBlockValue(seq);
            if (bv) {
                this.stack.push(bv);
                return;
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *flowCollection(fc) {
        const it = fc.items[fc.items.length - 1];
        if (this.type === 'flow-error-end') {
            let top;
            do {
                yield* this.pop();
                top = this.peek(1);
            } while (top?.type === 'flow-collection');
        }
        else if (fc.end.length === 0) {
            switch (this.type) {
                case 'comma':
                case 'explicit-key-ind':
                    if (!it || it.sep)
                        fc.items.push({ start: [this.sourceToken] });
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'map-value-ind':
                    if (!it || it.value)
                        fc.items.push({ start: [], key: null, sep: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        Object.assign(it, { key: null, sep: [this.sourceToken] });
                    return;
                case 'space':
                case 'comment':
                case 'newline':
                case 'anchor':
                case 'tag':
                    if (!it || it.value)
                        fc.items.push({ start: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (!it || it.value)
                        fc.items.push({ start: [], key: fs, sep: [] });
                    else if (it.sep)
                        this.stack.push(fs);
                    else
                        Object.assign(it, { key: fs, sep: [] });
                    return;
                }
                case 'flow-map-end':
                case 'flow-seq-end':
                    fc.end.push(this.sourceToken);
                    return;
            }
            const bv = this.startBlockValue(fc);
            /* istanbul ignore else should not happen */
            if (bv)
                this.stack.push(bv);
            else {
                yield* this.pop();
                yield* this.step();
            }
        }
        else {
            const parent = this.peek(2);
            if (parent.type === 'block-map' &&
                ((this.type === 'map-value-ind' && parent.indent === fc.indent) ||
                    (this.type === 'newline' &&
                        !parent.items[parent.items.length - 1].sep))) {
                yield* this.pop();
                yield* this.step();
            }
            else if (this.type === 'map-value-ind' &&
                parent.type !== 'flow-collection') {
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                fixFlowSeqItems(fc);
                const sep = fc.end.splice(1, fc.end.length);
                sep.push(this.sourceToken);
                const map = {
                    type: 'block-map',
                    offset: fc.offset,
                    indent: fc.indent,
                    items: [{ start, key: fc, sep }]
                };
                this.onKeyLine = true;
                this.stack[this.stack.length - 1] = map;
            }
            else {
                yield* this.lineEnd(fc);
            }
        }
    }
    flowScalar(type) {
        if (this.onNewLine) {
            let nl = this.source.indexOf('\n') + 1;
            while (nl !== 0) {
                this.onNewLine(this.offset + nl);
                nl = this.source.indexOf('\n', nl) + 1;
            }
        }
        return {
            type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
    }
    startBlockValue(parent) {
        switch (this.type) {
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return this.flowScalar(this.type);
            case 'block-scalar-header':
                return {
                    type: 'block-scalar',
                    offset: this.offset,
                    indent: this.indent,
                    props: [this.sourceToken],
                    source: ''
                };
            case 'flow-map-start':
            case 'flow-seq-start':
                return {
                    type: 'flow-collection',
                    offset: this.offset,
                    indent: this.indent,
                    start: this.sourceToken,
                    items: [],
                    end: []
                };
            case 'seq-item-ind':
                return {
                    type: 'block-seq',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: [this.sourceToken] }]
                };
            case 'explicit-key-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                start.push(this.sourceToken);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, explicitKey: true }]
                };
            }
            case 'map-value-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, key: null, sep: [this.sourceToken] }]
                };
            }
        }
        return null;
    }
    atIndentedComment(start, indent) {
        if (this.type !== 'comment')
            return false;
        if (this.indent <= indent)
            return false;
        return start.every(st => st.type === 'newline' || st.type === 'space');
    }
    *documentEnd(docEnd) {
        if (this.type !== 'doc-mode') {
            if (docEnd.end)
                docEnd.end.push(this.sourceToken);
            else
                docEnd.end = [this.sourceToken];
            if (this.type === 'newline')
                yield* this.pop();
        }
    }
    *lineEnd(token) {
        switch (this.type) {
            case 'comma':
            case 'doc-start':
            case 'doc-end':
            case 'flow-seq-end':
            case 'flow-map-end':
            case 'map-value-ind':
                yield* this.pop();
                yield* this.step();
                break;
            case 'newline':
                this.onKeyLine = false;
            // fallthrough
            case 'space':
            case 'comment':
            default:
                // all other values are errors
                if (token.end)
                    token.end.push(this.sourceToken);
                else
                    token.end = [this.sourceToken];
                if (this.type === 'newline')
                    yield* this.pop();
        }
    }
}

exports.Parser = Parser;


/***/ }),

/***/ 4047:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(3021);
var errors = __nccwpck_require__(1464);
var log = __nccwpck_require__(7249);
var identity = __nccwpck_require__(1127);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);

function parseOptions(options) {
    const prettyErrors = options.prettyErrors !== false;
    const lineCounter$1 = options.lineCounter || (prettyErrors && new lineCounter.LineCounter()) || null;
    return { lineCounter: lineCounter$1, prettyErrors };
}
/**
 * Parse the input as a stream of YAML documents.
 *
 * Documents should be separated from each other by `...` or `---` marker lines.
 *
 * @returns If an empty `docs` array is returned, it will be of type
 *   EmptyStream and contain additional stream information. In
 *   TypeScript, you should use `'empty' in docs` as a type guard for it.
 */
function parseAllDocuments(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    const docs = Array.from(composer$1.compose(parser$1.parse(source)));
    if (prettyErrors && lineCounter)
        for (const doc of docs) {
            doc.errors.forEach(errors.prettifyError(source, lineCounter));
            doc.warnings.forEach(errors.prettifyError(source, lineCounter));
        }
    if (docs.length > 0)
        return docs;
    return Object.assign([], { empty: true }, composer$1.streamInfo());
}
/** Parse an input string into a single YAML.Document */
function parseDocument(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    // `doc` is always set by compose.end(true) at the very latest
    let doc = null;
    for (const _doc of composer$1.compose(parser$1.parse(source), true, source.length)) {
        if (!doc)
            doc = _doc;
        else if (doc.options.logLevel !== 'silent') {
            doc.errors.push(new errors.YAMLParseError(_doc.range.slice(0, 2), 'MULTIPLE_DOCS', 'Source contains multiple documents; please use YAML.parseAllDocuments()'));
            break;
        }
    }
    if (prettyErrors && lineCounter) {
        doc.errors.forEach(errors.prettifyError(source, lineCounter));
        doc.warnings.forEach(errors.prettifyError(source, lineCounter));
    }
    return doc;
}
function parse(src, reviver, options) {
    let _reviver = undefined;
    if (typeof reviver === 'function') {
        _reviver = reviver;
    }
    else if (options === undefined && reviver && typeof reviver === 'object') {
        options = reviver;
    }
    const doc = parseDocument(src, options);
    if (!doc)
        return null;
    doc.warnings.forEach(warning => log.warn(doc.options.logLevel, warning));
    if (doc.errors.length > 0) {
        if (doc.options.logLevel !== 'silent')
            throw doc.errors[0];
        else
            doc.errors = [];
    }
    return doc.toJS(Object.assign({ reviver: _reviver }, options));
}
function stringify(value, replacer, options) {
    let _replacer = null;
    if (typeof replacer === 'function' || Array.isArray(replacer)) {
        _replacer = replacer;
    }
    else if (options === undefined && replacer) {
        options = replacer;
    }
    if (typeof options === 'string')
        options = options.length;
    if (typeof options === 'number') {
        const indent = Math.round(options);
        options = indent < 1 ? undefined : indent > 8 ? { indent: 8 } : { indent };
    }
    if (value === undefined) {
        const { keepUndefined } = options ?? replacer ?? {};
        if (!keepUndefined)
            return undefined;
    }
    if (identity.isDocument(value) && !_replacer)
        return value.toString(options);
    return new Document.Document(value, _replacer, options).toString(options);
}

exports.parse = parse;
exports.parseAllDocuments = parseAllDocuments;
exports.parseDocument = parseDocument;
exports.stringify = stringify;


/***/ }),

/***/ 5840:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var tags = __nccwpck_require__(18);

const sortMapEntriesByKey = (a, b) => a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
class Schema {
    constructor({ compat, customTags, merge, resolveKnownTags, schema, sortMapEntries, toStringDefaults }) {
        this.compat = Array.isArray(compat)
            ? tags.getTags(compat, 'compat')
            : compat
                ? tags.getTags(null, compat)
                : null;
        this.name = (typeof schema === 'string' && schema) || 'core';
        this.knownTags = resolveKnownTags ? tags.coreKnownTags : {};
        this.tags = tags.getTags(customTags, this.name, merge);
        this.toStringOptions = toStringDefaults ?? null;
        Object.defineProperty(this, identity.MAP, { value: map.map });
        Object.defineProperty(this, identity.SCALAR, { value: string.string });
        Object.defineProperty(this, identity.SEQ, { value: seq.seq });
        // Used by createMap()
        this.sortMapEntries =
            typeof sortMapEntries === 'function'
                ? sortMapEntries
                : sortMapEntries === true
                    ? sortMapEntriesByKey
                    : null;
    }
    clone() {
        const copy = Object.create(Schema.prototype, Object.getOwnPropertyDescriptors(this));
        copy.tags = this.tags.slice();
        return copy;
    }
}

exports.Schema = Schema;


/***/ }),

/***/ 7451:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLMap = __nccwpck_require__(4454);

const map = {
    collection: 'map',
    default: true,
    nodeClass: YAMLMap.YAMLMap,
    tag: 'tag:yaml.org,2002:map',
    resolve(map, onError) {
        if (!identity.isMap(map))
            onError('Expected a mapping for this tag');
        return map;
    },
    createNode: (schema, obj, ctx) => YAMLMap.YAMLMap.from(schema, obj, ctx)
};

exports.map = map;


/***/ }),

/***/ 3632:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const nullTag = {
    identify: value => value == null,
    createNode: () => new Scalar.Scalar(null),
    default: true,
    tag: 'tag:yaml.org,2002:null',
    test: /^(?:~|[Nn]ull|NULL)?$/,
    resolve: () => new Scalar.Scalar(null),
    stringify: ({ source }, ctx) => typeof source === 'string' && nullTag.test.test(source)
        ? source
        : ctx.options.nullStr
};

exports.nullTag = nullTag;


/***/ }),

/***/ 1706:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLSeq = __nccwpck_require__(2223);

const seq = {
    collection: 'seq',
    default: true,
    nodeClass: YAMLSeq.YAMLSeq,
    tag: 'tag:yaml.org,2002:seq',
    resolve(seq, onError) {
        if (!identity.isSeq(seq))
            onError('Expected a sequence for this tag');
        return seq;
    },
    createNode: (schema, obj, ctx) => YAMLSeq.YAMLSeq.from(schema, obj, ctx)
};

exports.seq = seq;


/***/ }),

/***/ 6464:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyString = __nccwpck_require__(3069);

const string = {
    identify: value => typeof value === 'string',
    default: true,
    tag: 'tag:yaml.org,2002:str',
    resolve: str => str,
    stringify(item, ctx, onComment, onChompKeep) {
        ctx = Object.assign({ actualString: true }, ctx);
        return stringifyString.stringifyString(item, ctx, onComment, onChompKeep);
    }
};

exports.string = string;


/***/ }),

/***/ 3959:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const boolTag = {
    identify: value => typeof value === 'boolean',
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/,
    resolve: str => new Scalar.Scalar(str[0] === 't' || str[0] === 'T'),
    stringify({ source, value }, ctx) {
        if (source && boolTag.test.test(source)) {
            const sv = source[0] === 't' || source[0] === 'T';
            if (value === sv)
                return source;
        }
        return value ? ctx.options.trueStr : ctx.options.falseStr;
    }
};

exports.boolTag = boolTag;


/***/ }),

/***/ 8405:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: str => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/,
    resolve: str => parseFloat(str),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str));
        const dot = str.indexOf('.');
        if (dot !== -1 && str[str.length - 1] === '0')
            node.minFractionDigits = str.length - dot - 1;
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 9874:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
const intResolve = (str, offset, radix, { intAsBigInt }) => (intAsBigInt ? BigInt(str) : parseInt(str.substring(offset), radix));
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value) && value >= 0)
        return prefix + value.toString(radix);
    return stringifyNumber.stringifyNumber(node);
}
const intOct = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^0o[0-7]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 8, opt),
    stringify: node => intStringify(node, 8, '0o')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^0x[0-9a-fA-F]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 896:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.boolTag,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float
];

exports.schema = schema;


/***/ }),

/***/ 3559:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);

function intIdentify(value) {
    return typeof value === 'bigint' || Number.isInteger(value);
}
const stringifyJSON = ({ value }) => JSON.stringify(value);
const jsonScalars = [
    {
        identify: value => typeof value === 'string',
        default: true,
        tag: 'tag:yaml.org,2002:str',
        resolve: str => str,
        stringify: stringifyJSON
    },
    {
        identify: value => value == null,
        createNode: () => new Scalar.Scalar(null),
        default: true,
        tag: 'tag:yaml.org,2002:null',
        test: /^null$/,
        resolve: () => null,
        stringify: stringifyJSON
    },
    {
        identify: value => typeof value === 'boolean',
        default: true,
        tag: 'tag:yaml.org,2002:bool',
        test: /^true$|^false$/,
        resolve: str => str === 'true',
        stringify: stringifyJSON
    },
    {
        identify: intIdentify,
        default: true,
        tag: 'tag:yaml.org,2002:int',
        test: /^-?(?:0|[1-9][0-9]*)$/,
        resolve: (str, _onError, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str, 10),
        stringify: ({ value }) => intIdentify(value) ? value.toString() : JSON.stringify(value)
    },
    {
        identify: value => typeof value === 'number',
        default: true,
        tag: 'tag:yaml.org,2002:float',
        test: /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?$/,
        resolve: str => parseFloat(str),
        stringify: stringifyJSON
    }
];
const jsonError = {
    default: true,
    tag: '',
    test: /^/,
    resolve(str, onError) {
        onError(`Unresolved plain scalar ${JSON.stringify(str)}`);
        return str;
    }
};
const schema = [map.map, seq.seq].concat(jsonScalars, jsonError);

exports.schema = schema;


/***/ }),

/***/ 18:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);
var schema = __nccwpck_require__(896);
var schema$1 = __nccwpck_require__(3559);
var binary = __nccwpck_require__(6083);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var schema$2 = __nccwpck_require__(5913);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schemas = new Map([
    ['core', schema.schema],
    ['failsafe', [map.map, seq.seq, string.string]],
    ['json', schema$1.schema],
    ['yaml11', schema$2.schema],
    ['yaml-1.1', schema$2.schema]
]);
const tagsByName = {
    binary: binary.binary,
    bool: bool.boolTag,
    float: float.float,
    floatExp: float.floatExp,
    floatNaN: float.floatNaN,
    floatTime: timestamp.floatTime,
    int: int.int,
    intHex: int.intHex,
    intOct: int.intOct,
    intTime: timestamp.intTime,
    map: map.map,
    merge: merge.merge,
    null: _null.nullTag,
    omap: omap.omap,
    pairs: pairs.pairs,
    seq: seq.seq,
    set: set.set,
    timestamp: timestamp.timestamp
};
const coreKnownTags = {
    'tag:yaml.org,2002:binary': binary.binary,
    'tag:yaml.org,2002:merge': merge.merge,
    'tag:yaml.org,2002:omap': omap.omap,
    'tag:yaml.org,2002:pairs': pairs.pairs,
    'tag:yaml.org,2002:set': set.set,
    'tag:yaml.org,2002:timestamp': timestamp.timestamp
};
function getTags(customTags, schemaName, addMergeTag) {
    const schemaTags = schemas.get(schemaName);
    if (schemaTags && !customTags) {
        return addMergeTag && !schemaTags.includes(merge.merge)
            ? schemaTags.concat(merge.merge)
            : schemaTags.slice();
    }
    let tags = schemaTags;
    if (!tags) {
        if (Array.isArray(customTags))
            tags = [];
        else {
            const keys = Array.from(schemas.keys())
                .filter(key => key !== 'yaml11')
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown schema "${schemaName}"; use one of ${keys} or define customTags array`);
        }
    }
    if (Array.isArray(customTags)) {
        for (const tag of customTags)
            tags = tags.concat(tag);
    }
    else if (typeof customTags === 'function') {
        tags = customTags(tags.slice());
    }
    if (addMergeTag)
        tags = tags.concat(merge.merge);
    return tags.reduce((tags, tag) => {
        const tagObj = typeof tag === 'string' ? tagsByName[tag] : tag;
        if (!tagObj) {
            const tagName = JSON.stringify(tag);
            const keys = Object.keys(tagsByName)
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown custom tag ${tagName}; use one of ${keys}`);
        }
        if (!tags.includes(tagObj))
            tags.push(tagObj);
        return tags;
    }, []);
}

exports.coreKnownTags = coreKnownTags;
exports.getTags = getTags;


/***/ }),

/***/ 6083:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_buffer = __nccwpck_require__(181);
var Scalar = __nccwpck_require__(3301);
var stringifyString = __nccwpck_require__(3069);

const binary = {
    identify: value => value instanceof Uint8Array, // Buffer inherits from Uint8Array
    default: false,
    tag: 'tag:yaml.org,2002:binary',
    /**
     * Returns a Buffer in node and an Uint8Array in browsers
     *
     * To use the resulting buffer as an image, you'll want to do something like:
     *
     *   const blob = new Blob([buffer], { type: 'image/jpeg' })
     *   document.querySelector('#photo').src = URL.createObjectURL(blob)
     */
    resolve(src, onError) {
        if (typeof node_buffer.Buffer === 'function') {
            return node_buffer.Buffer.from(src, 'base64');
        }
        else if (typeof atob === 'function') {
            // On IE 11, atob() can't handle newlines
            const str = atob(src.replace(/[\n\r]/g, ''));
            const buffer = new Uint8Array(str.length);
            for (let i = 0; i < str.length; ++i)
                buffer[i] = str.charCodeAt(i);
            return buffer;
        }
        else {
            onError('This environment does not support reading binary tags; either Buffer or atob is required');
            return src;
        }
    },
    stringify({ comment, type, value }, ctx, onComment, onChompKeep) {
        if (!value)
            return '';
        const buf = value; // checked earlier by binary.identify()
        let str;
        if (typeof node_buffer.Buffer === 'function') {
            str =
                buf instanceof node_buffer.Buffer
                    ? buf.toString('base64')
                    : node_buffer.Buffer.from(buf.buffer).toString('base64');
        }
        else if (typeof btoa === 'function') {
            let s = '';
            for (let i = 0; i < buf.length; ++i)
                s += String.fromCharCode(buf[i]);
            str = btoa(s);
        }
        else {
            throw new Error('This environment does not support writing binary tags; either Buffer or btoa is required');
        }
        type ?? (type = Scalar.Scalar.BLOCK_LITERAL);
        if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
            const lineWidth = Math.max(ctx.options.lineWidth - ctx.indent.length, ctx.options.minContentWidth);
            const n = Math.ceil(str.length / lineWidth);
            const lines = new Array(n);
            for (let i = 0, o = 0; i < n; ++i, o += lineWidth) {
                lines[i] = str.substr(o, lineWidth);
            }
            str = lines.join(type === Scalar.Scalar.BLOCK_LITERAL ? '\n' : ' ');
        }
        return stringifyString.stringifyString({ comment, type, value: str }, ctx, onComment, onChompKeep);
    }
};

exports.binary = binary;


/***/ }),

/***/ 8398:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function boolStringify({ value, source }, ctx) {
    const boolObj = value ? trueTag : falseTag;
    if (source && boolObj.test.test(source))
        return source;
    return value ? ctx.options.trueStr : ctx.options.falseStr;
}
const trueTag = {
    identify: value => value === true,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:Y|y|[Yy]es|YES|[Tt]rue|TRUE|[Oo]n|ON)$/,
    resolve: () => new Scalar.Scalar(true),
    stringify: boolStringify
};
const falseTag = {
    identify: value => value === false,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:N|n|[Nn]o|NO|[Ff]alse|FALSE|[Oo]ff|OFF)$/,
    resolve: () => new Scalar.Scalar(false),
    stringify: boolStringify
};

exports.falseTag = falseTag;
exports.trueTag = trueTag;


/***/ }),

/***/ 5782:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: (str) => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:[0-9][0-9_]*)?(?:\.[0-9_]*)?[eE][-+]?[0-9]+$/,
    resolve: (str) => parseFloat(str.replace(/_/g, '')),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:[0-9][0-9_]*)?\.[0-9_]*$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str.replace(/_/g, '')));
        const dot = str.indexOf('.');
        if (dot !== -1) {
            const f = str.substring(dot + 1).replace(/_/g, '');
            if (f[f.length - 1] === '0')
                node.minFractionDigits = f.length;
        }
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 873:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
function intResolve(str, offset, radix, { intAsBigInt }) {
    const sign = str[0];
    if (sign === '-' || sign === '+')
        offset += 1;
    str = str.substring(offset).replace(/_/g, '');
    if (intAsBigInt) {
        switch (radix) {
            case 2:
                str = `0b${str}`;
                break;
            case 8:
                str = `0o${str}`;
                break;
            case 16:
                str = `0x${str}`;
                break;
        }
        const n = BigInt(str);
        return sign === '-' ? BigInt(-1) * n : n;
    }
    const n = parseInt(str, radix);
    return sign === '-' ? -1 * n : n;
}
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value)) {
        const str = value.toString(radix);
        return value < 0 ? '-' + prefix + str.substr(1) : prefix + str;
    }
    return stringifyNumber.stringifyNumber(node);
}
const intBin = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'BIN',
    test: /^[-+]?0b[0-1_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 2, opt),
    stringify: node => intStringify(node, 2, '0b')
};
const intOct = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^[-+]?0[0-7_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 1, 8, opt),
    stringify: node => intStringify(node, 8, '0')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9][0-9_]*$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^[-+]?0x[0-9a-fA-F_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intBin = intBin;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 452:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

// If the value associated with a merge key is a single mapping node, each of
// its key/value pairs is inserted into the current mapping, unless the key
// already exists in it. If the value associated with the merge key is a
// sequence, then this sequence is expected to contain mapping nodes and each
// of these nodes is merged in turn according to its order in the sequence.
// Keys in mapping nodes earlier in the sequence override keys specified in
// later mapping nodes. -- http://yaml.org/type/merge.html
const MERGE_KEY = '<<';
const merge = {
    identify: value => value === MERGE_KEY ||
        (typeof value === 'symbol' && value.description === MERGE_KEY),
    default: 'key',
    tag: 'tag:yaml.org,2002:merge',
    test: /^<<$/,
    resolve: () => Object.assign(new Scalar.Scalar(Symbol(MERGE_KEY)), {
        addToJSMap: addMergeToJSMap
    }),
    stringify: () => MERGE_KEY
};
const isMergeKey = (ctx, key) => (merge.identify(key) ||
    (identity.isScalar(key) &&
        (!key.type || key.type === Scalar.Scalar.PLAIN) &&
        merge.identify(key.value))) &&
    ctx?.doc.schema.tags.some(tag => tag.tag === merge.tag && tag.default);
function addMergeToJSMap(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (identity.isSeq(source))
        for (const it of source.items)
            mergeValue(ctx, map, it);
    else if (Array.isArray(source))
        for (const it of source)
            mergeValue(ctx, map, it);
    else
        mergeValue(ctx, map, source);
}
function mergeValue(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (!identity.isMap(source))
        throw new Error('Merge sources must be maps or map aliases');
    const srcMap = source.toJSON(null, ctx, Map);
    for (const [key, value] of srcMap) {
        if (map instanceof Map) {
            if (!map.has(key))
                map.set(key, value);
        }
        else if (map instanceof Set) {
            map.add(key);
        }
        else if (!Object.prototype.hasOwnProperty.call(map, key)) {
            Object.defineProperty(map, key, {
                value,
                writable: true,
                enumerable: true,
                configurable: true
            });
        }
    }
    return map;
}
function resolveAliasValue(ctx, value) {
    return ctx && identity.isAlias(value) ? value.resolve(ctx.doc, ctx) : value;
}

exports.addMergeToJSMap = addMergeToJSMap;
exports.isMergeKey = isMergeKey;
exports.merge = merge;


/***/ }),

/***/ 303:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var pairs = __nccwpck_require__(8385);

class YAMLOMap extends YAMLSeq.YAMLSeq {
    constructor() {
        super();
        this.add = YAMLMap.YAMLMap.prototype.add.bind(this);
        this.delete = YAMLMap.YAMLMap.prototype.delete.bind(this);
        this.get = YAMLMap.YAMLMap.prototype.get.bind(this);
        this.has = YAMLMap.YAMLMap.prototype.has.bind(this);
        this.set = YAMLMap.YAMLMap.prototype.set.bind(this);
        this.tag = YAMLOMap.tag;
    }
    /**
     * If `ctx` is given, the return type is actually `Map<unknown, unknown>`,
     * but TypeScript won't allow widening the signature of a child method.
     */
    toJSON(_, ctx) {
        if (!ctx)
            return super.toJSON(_);
        const map = new Map();
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const pair of this.items) {
            let key, value;
            if (identity.isPair(pair)) {
                key = toJS.toJS(pair.key, '', ctx);
                value = toJS.toJS(pair.value, key, ctx);
            }
            else {
                key = toJS.toJS(pair, '', ctx);
            }
            if (map.has(key))
                throw new Error('Ordered maps must not include duplicate keys');
            map.set(key, value);
        }
        return map;
    }
    static from(schema, iterable, ctx) {
        const pairs$1 = pairs.createPairs(schema, iterable, ctx);
        const omap = new this();
        omap.items = pairs$1.items;
        return omap;
    }
}
YAMLOMap.tag = 'tag:yaml.org,2002:omap';
const omap = {
    collection: 'seq',
    identify: value => value instanceof Map,
    nodeClass: YAMLOMap,
    default: false,
    tag: 'tag:yaml.org,2002:omap',
    resolve(seq, onError) {
        const pairs$1 = pairs.resolvePairs(seq, onError);
        const seenKeys = [];
        for (const { key } of pairs$1.items) {
            if (identity.isScalar(key)) {
                if (seenKeys.includes(key.value)) {
                    onError(`Ordered maps must not include duplicate keys: ${key.value}`);
                }
                else {
                    seenKeys.push(key.value);
                }
            }
        }
        return Object.assign(new YAMLOMap(), pairs$1);
    },
    createNode: (schema, iterable, ctx) => YAMLOMap.from(schema, iterable, ctx)
};

exports.YAMLOMap = YAMLOMap;
exports.omap = omap;


/***/ }),

/***/ 8385:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLSeq = __nccwpck_require__(2223);

function resolvePairs(seq, onError) {
    if (identity.isSeq(seq)) {
        for (let i = 0; i < seq.items.length; ++i) {
            let item = seq.items[i];
            if (identity.isPair(item))
                continue;
            else if (identity.isMap(item)) {
                if (item.items.length > 1)
                    onError('Each pair must have its own sequence indicator');
                const pair = item.items[0] || new Pair.Pair(new Scalar.Scalar(null));
                if (item.commentBefore)
                    pair.key.commentBefore = pair.key.commentBefore
                        ? `${item.commentBefore}\n${pair.key.commentBefore}`
                        : item.commentBefore;
                if (item.comment) {
                    const cn = pair.value ?? pair.key;
                    cn.comment = cn.comment
                        ? `${item.comment}\n${cn.comment}`
                        : item.comment;
                }
                item = pair;
            }
            seq.items[i] = identity.isPair(item) ? item : new Pair.Pair(item);
        }
    }
    else
        onError('Expected a sequence for this tag');
    return seq;
}
function createPairs(schema, iterable, ctx) {
    const { replacer } = ctx;
    const pairs = new YAMLSeq.YAMLSeq(schema);
    pairs.tag = 'tag:yaml.org,2002:pairs';
    let i = 0;
    if (iterable && Symbol.iterator in Object(iterable))
        for (let it of iterable) {
            if (typeof replacer === 'function')
                it = replacer.call(iterable, String(i++), it);
            let key, value;
            if (Array.isArray(it)) {
                if (it.length === 2) {
                    key = it[0];
                    value = it[1];
                }
                else
                    throw new TypeError(`Expected [key, value] tuple: ${it}`);
            }
            else if (it && it instanceof Object) {
                const keys = Object.keys(it);
                if (keys.length === 1) {
                    key = keys[0];
                    value = it[key];
                }
                else {
                    throw new TypeError(`Expected tuple with one key, not ${keys.length} keys`);
                }
            }
            else {
                key = it;
            }
            pairs.items.push(Pair.createPair(key, value, ctx));
        }
    return pairs;
}
const pairs = {
    collection: 'seq',
    default: false,
    tag: 'tag:yaml.org,2002:pairs',
    resolve: resolvePairs,
    createNode: createPairs
};

exports.createPairs = createPairs;
exports.pairs = pairs;
exports.resolvePairs = resolvePairs;


/***/ }),

/***/ 5913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var binary = __nccwpck_require__(6083);
var bool = __nccwpck_require__(8398);
var float = __nccwpck_require__(5782);
var int = __nccwpck_require__(873);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.trueTag,
    bool.falseTag,
    int.intBin,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float,
    binary.binary,
    merge.merge,
    omap.omap,
    pairs.pairs,
    set.set,
    timestamp.intTime,
    timestamp.floatTime,
    timestamp.timestamp
];

exports.schema = schema;


/***/ }),

/***/ 1528:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);

class YAMLSet extends YAMLMap.YAMLMap {
    constructor(schema) {
        super(schema);
        this.tag = YAMLSet.tag;
    }
    add(key) {
        let pair;
        if (identity.isPair(key))
            pair = key;
        else if (key &&
            typeof key === 'object' &&
            'key' in key &&
            'value' in key &&
            key.value === null)
            pair = new Pair.Pair(key.key, null);
        else
            pair = new Pair.Pair(key, null);
        const prev = YAMLMap.findPair(this.items, pair.key);
        if (!prev)
            this.items.push(pair);
    }
    /**
     * If `keepPair` is `true`, returns the Pair matching `key`.
     * Otherwise, returns the value of that Pair's key.
     */
    get(key, keepPair) {
        const pair = YAMLMap.findPair(this.items, key);
        return !keepPair && identity.isPair(pair)
            ? identity.isScalar(pair.key)
                ? pair.key.value
                : pair.key
            : pair;
    }
    set(key, value) {
        if (typeof value !== 'boolean')
            throw new Error(`Expected boolean value for set(key, value) in a YAML set, not ${typeof value}`);
        const prev = YAMLMap.findPair(this.items, key);
        if (prev && !value) {
            this.items.splice(this.items.indexOf(prev), 1);
        }
        else if (!prev && value) {
            this.items.push(new Pair.Pair(key));
        }
    }
    toJSON(_, ctx) {
        return super.toJSON(_, ctx, Set);
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        if (this.hasAllNullValues(true))
            return super.toString(Object.assign({}, ctx, { allNullValues: true }), onComment, onChompKeep);
        else
            throw new Error('Set items must all have null values');
    }
    static from(schema, iterable, ctx) {
        const { replacer } = ctx;
        const set = new this(schema);
        if (iterable && Symbol.iterator in Object(iterable))
            for (let value of iterable) {
                if (typeof replacer === 'function')
                    value = replacer.call(iterable, value, value);
                set.items.push(Pair.createPair(value, null, ctx));
            }
        return set;
    }
}
YAMLSet.tag = 'tag:yaml.org,2002:set';
const set = {
    collection: 'map',
    identify: value => value instanceof Set,
    nodeClass: YAMLSet,
    default: false,
    tag: 'tag:yaml.org,2002:set',
    createNode: (schema, iterable, ctx) => YAMLSet.from(schema, iterable, ctx),
    resolve(map, onError) {
        if (identity.isMap(map)) {
            if (map.hasAllNullValues(true))
                return Object.assign(new YAMLSet(), map);
            else
                onError('Set items must all have null values');
        }
        else
            onError('Expected a mapping for this tag');
        return map;
    }
};

exports.YAMLSet = YAMLSet;
exports.set = set;


/***/ }),

/***/ 6752:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

/** Internal types handle bigint as number, because TS can't figure it out. */
function parseSexagesimal(str, asBigInt) {
    const sign = str[0];
    const parts = sign === '-' || sign === '+' ? str.substring(1) : str;
    const num = (n) => asBigInt ? BigInt(n) : Number(n);
    const res = parts
        .replace(/_/g, '')
        .split(':')
        .reduce((res, p) => res * num(60) + num(p), num(0));
    return (sign === '-' ? num(-1) * res : res);
}
/**
 * hhhh:mm:ss.sss
 *
 * Internal types handle bigint as number, because TS can't figure it out.
 */
function stringifySexagesimal(node) {
    let { value } = node;
    let num = (n) => n;
    if (typeof value === 'bigint')
        num = n => BigInt(n);
    else if (isNaN(value) || !isFinite(value))
        return stringifyNumber.stringifyNumber(node);
    let sign = '';
    if (value < 0) {
        sign = '-';
        value *= num(-1);
    }
    const _60 = num(60);
    const parts = [value % _60]; // seconds, including ms
    if (value < 60) {
        parts.unshift(0); // at least one : is required
    }
    else {
        value = (value - parts[0]) / _60;
        parts.unshift(value % _60); // minutes
        if (value >= 60) {
            value = (value - parts[0]) / _60;
            parts.unshift(value); // hours
        }
    }
    return (sign +
        parts
            .map(n => String(n).padStart(2, '0'))
            .join(':')
            .replace(/000000\d*$/, '') // % 60 may introduce error
    );
}
const intTime = {
    identify: value => typeof value === 'bigint' || Number.isInteger(value),
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+$/,
    resolve: (str, _onError, { intAsBigInt }) => parseSexagesimal(str, intAsBigInt),
    stringify: stringifySexagesimal
};
const floatTime = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+\.[0-9_]*$/,
    resolve: str => parseSexagesimal(str, false),
    stringify: stringifySexagesimal
};
const timestamp = {
    identify: value => value instanceof Date,
    default: true,
    tag: 'tag:yaml.org,2002:timestamp',
    // If the time zone is omitted, the timestamp is assumed to be specified in UTC. The time part
    // may be omitted altogether, resulting in a date format. In such a case, the time part is
    // assumed to be 00:00:00Z (start of day, UTC).
    test: RegExp('^([0-9]{4})-([0-9]{1,2})-([0-9]{1,2})' + // YYYY-Mm-Dd
        '(?:' + // time is optional
        '(?:t|T|[ \\t]+)' + // t | T | whitespace
        '([0-9]{1,2}):([0-9]{1,2}):([0-9]{1,2}(\\.[0-9]+)?)' + // Hh:Mm:Ss(.ss)?
        '(?:[ \\t]*(Z|[-+][012]?[0-9](?::[0-9]{2})?))?' + // Z | +5 | -03:30
        ')?$'),
    resolve(str) {
        const match = str.match(timestamp.test);
        if (!match)
            throw new Error('!!timestamp expects a date, starting with yyyy-mm-dd');
        const [, year, month, day, hour, minute, second] = match.map(Number);
        const millisec = match[7] ? Number((match[7] + '00').substr(1, 3)) : 0;
        let date = Date.UTC(year, month - 1, day, hour || 0, minute || 0, second || 0, millisec);
        const tz = match[8];
        if (tz && tz !== 'Z') {
            let d = parseSexagesimal(tz, false);
            if (Math.abs(d) < 30)
                d *= 60;
            date -= 60000 * d;
        }
        return new Date(date);
    },
    stringify: ({ value }) => value?.toISOString().replace(/(T00:00:00)?\.000Z$/, '') ?? ''
};

exports.floatTime = floatTime;
exports.intTime = intTime;
exports.timestamp = timestamp;


/***/ }),

/***/ 4475:
/***/ ((__unused_webpack_module, exports) => {



const FOLD_FLOW = 'flow';
const FOLD_BLOCK = 'block';
const FOLD_QUOTED = 'quoted';
/**
 * Tries to keep input at up to `lineWidth` characters, splitting only on spaces
 * not followed by newlines or spaces unless `mode` is `'quoted'`. Lines are
 * terminated with `\n` and started with `indent`.
 */
function foldFlowLines(text, indent, mode = 'flow', { indentAtStart, lineWidth = 80, minContentWidth = 20, onFold, onOverflow } = {}) {
    if (!lineWidth || lineWidth < 0)
        return text;
    if (lineWidth < minContentWidth)
        minContentWidth = 0;
    const endStep = Math.max(1 + minContentWidth, 1 + lineWidth - indent.length);
    if (text.length <= endStep)
        return text;
    const folds = [];
    const escapedFolds = {};
    let end = lineWidth - indent.length;
    if (typeof indentAtStart === 'number') {
        if (indentAtStart > lineWidth - Math.max(2, minContentWidth))
            folds.push(0);
        else
            end = lineWidth - indentAtStart;
    }
    let split = undefined;
    let prev = undefined;
    let overflow = false;
    let i = -1;
    let escStart = -1;
    let escEnd = -1;
    if (mode === FOLD_BLOCK) {
        i = consumeMoreIndentedLines(text, i, indent.length);
        if (i !== -1)
            end = i + endStep;
    }
    for (let ch; (ch = text[(i += 1)]);) {
        if (mode === FOLD_QUOTED && ch === '\\') {
            escStart = i;
            switch (text[i + 1]) {
                case 'x':
                    i += 3;
                    break;
                case 'u':
                    i += 5;
                    break;
                case 'U':
                    i += 9;
                    break;
                default:
                    i += 1;
            }
            escEnd = i;
        }
        if (ch === '\n') {
            if (mode === FOLD_BLOCK)
                i = consumeMoreIndentedLines(text, i, indent.length);
            end = i + indent.length + endStep;
            split = undefined;
        }
        else {
            if (ch === ' ' &&
                prev &&
                prev !== ' ' &&
                prev !== '\n' &&
                prev !== '\t') {
                // space surrounded by non-space can be replaced with newline + indent
                const next = text[i + 1];
                if (next && next !== ' ' && next !== '\n' && next !== '\t')
                    split = i;
            }
            if (i >= end) {
                if (split) {
                    folds.push(split);
                    end = split + endStep;
                    split = undefined;
                }
                else if (mode === FOLD_QUOTED) {
                    // white-space collected at end may stretch past lineWidth
                    while (prev === ' ' || prev === '\t') {
                        prev = ch;
                        ch = text[(i += 1)];
                        overflow = true;
                    }
                    // Account for newline escape, but don't break preceding escape
                    const j = i > escEnd + 1 ? i - 2 : escStart - 1;
                    // Bail out if lineWidth & minContentWidth are shorter than an escape string
                    if (escapedFolds[j])
                        return text;
                    folds.push(j);
                    escapedFolds[j] = true;
                    end = j + endStep;
                    split = undefined;
                }
                else {
                    overflow = true;
                }
            }
        }
        prev = ch;
    }
    if (overflow && onOverflow)
        onOverflow();
    if (folds.length === 0)
        return text;
    if (onFold)
        onFold();
    let res = text.slice(0, folds[0]);
    for (let i = 0; i < folds.length; ++i) {
        const fold = folds[i];
        const end = folds[i + 1] || text.length;
        if (fold === 0)
            res = `\n${indent}${text.slice(0, end)}`;
        else {
            if (mode === FOLD_QUOTED && escapedFolds[fold])
                res += `${text[fold]}\\`;
            res += `\n${indent}${text.slice(fold + 1, end)}`;
        }
    }
    return res;
}
/**
 * Presumes `i + 1` is at the start of a line
 * @returns index of last newline in more-indented block
 */
function consumeMoreIndentedLines(text, i, indent) {
    let end = i;
    let start = i + 1;
    let ch = text[start];
    while (ch === ' ' || ch === '\t') {
        if (i < start + indent) {
            ch = text[++i];
        }
        else {
            do {
                ch = text[++i];
            } while (ch && ch !== '\n');
            end = i;
            start = i + 1;
            ch = text[start];
        }
    }
    return end;
}

exports.FOLD_BLOCK = FOLD_BLOCK;
exports.FOLD_FLOW = FOLD_FLOW;
exports.FOLD_QUOTED = FOLD_QUOTED;
exports.foldFlowLines = foldFlowLines;


/***/ }),

/***/ 2148:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var identity = __nccwpck_require__(1127);
var stringifyComment = __nccwpck_require__(9799);
var stringifyString = __nccwpck_require__(3069);

function createStringifyContext(doc, options) {
    const opt = Object.assign({
        blockQuote: true,
        commentString: stringifyComment.stringifyComment,
        defaultKeyType: null,
        defaultStringType: 'PLAIN',
        directives: null,
        doubleQuotedAsJSON: false,
        doubleQuotedMinMultiLineLength: 40,
        falseStr: 'false',
        flowCollectionPadding: true,
        indentSeq: true,
        lineWidth: 80,
        minContentWidth: 20,
        nullStr: 'null',
        simpleKeys: false,
        singleQuote: null,
        trailingComma: false,
        trueStr: 'true',
        verifyAliasOrder: true
    }, doc.schema.toStringOptions, options);
    let inFlow;
    switch (opt.collectionStyle) {
        case 'block':
            inFlow = false;
            break;
        case 'flow':
            inFlow = true;
            break;
        default:
            inFlow = null;
    }
    return {
        anchors: new Set(),
        doc,
        flowCollectionPadding: opt.flowCollectionPadding ? ' ' : '',
        indent: '',
        indentStep: typeof opt.indent === 'number' ? ' '.repeat(opt.indent) : '  ',
        inFlow,
        options: opt
    };
}
function getTagObject(tags, item) {
    if (item.tag) {
        const match = tags.filter(t => t.tag === item.tag);
        if (match.length > 0)
            return match.find(t => t.format === item.format) ?? match[0];
    }
    let tagObj = undefined;
    let obj;
    if (identity.isScalar(item)) {
        obj = item.value;
        let match = tags.filter(t => t.identify?.(obj));
        if (match.length > 1) {
            const testMatch = match.filter(t => t.test);
            if (testMatch.length > 0)
                match = testMatch;
        }
        tagObj =
            match.find(t => t.format === item.format) ?? match.find(t => !t.format);
    }
    else {
        obj = item;
        tagObj = tags.find(t => t.nodeClass && obj instanceof t.nodeClass);
    }
    if (!tagObj) {
        const name = obj?.constructor?.name ?? (obj === null ? 'null' : typeof obj);
        throw new Error(`Tag not resolved for ${name} value`);
    }
    return tagObj;
}
// needs to be called before value stringifier to allow for circular anchor refs
function stringifyProps(node, tagObj, { anchors: anchors$1, doc }) {
    if (!doc.directives)
        return '';
    const props = [];
    const anchor = (identity.isScalar(node) || identity.isCollection(node)) && node.anchor;
    if (anchor && anchors.anchorIsValid(anchor)) {
        anchors$1.add(anchor);
        props.push(`&${anchor}`);
    }
    const tag = node.tag ?? (tagObj.default ? null : tagObj.tag);
    if (tag)
        props.push(doc.directives.tagString(tag));
    return props.join(' ');
}
function stringify(item, ctx, onComment, onChompKeep) {
    if (identity.isPair(item))
        return item.toString(ctx, onComment, onChompKeep);
    if (identity.isAlias(item)) {
        if (ctx.doc.directives)
            return item.toString(ctx);
        if (ctx.resolvedAliases?.has(item)) {
            throw new TypeError(`Cannot stringify circular structure without alias nodes`);
        }
        else {
            if (ctx.resolvedAliases)
                ctx.resolvedAliases.add(item);
            else
                ctx.resolvedAliases = new Set([item]);
            item = item.resolve(ctx.doc);
        }
    }
    let tagObj = undefined;
    const node = identity.isNode(item)
        ? item
        : ctx.doc.createNode(item, { onTagObj: o => (tagObj = o) });
    tagObj ?? (tagObj = getTagObject(ctx.doc.schema.tags, node));
    const props = stringifyProps(node, tagObj, ctx);
    if (props.length > 0)
        ctx.indentAtStart = (ctx.indentAtStart ?? 0) + props.length + 1;
    const str = typeof tagObj.stringify === 'function'
        ? tagObj.stringify(node, ctx, onComment, onChompKeep)
        : identity.isScalar(node)
            ? stringifyString.stringifyString(node, ctx, onComment, onChompKeep)
            : node.toString(ctx, onComment, onChompKeep);
    if (!props)
        return str;
    return identity.isScalar(node) || str[0] === '{' || str[0] === '['
        ? `${props} ${str}`
        : `${props}\n${ctx.indent}${str}`;
}

exports.createStringifyContext = createStringifyContext;
exports.stringify = stringify;


/***/ }),

/***/ 1212:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyCollection(collection, ctx, options) {
    const flow = ctx.inFlow ?? collection.flow;
    const stringify = flow ? stringifyFlowCollection : stringifyBlockCollection;
    return stringify(collection, ctx, options);
}
function stringifyBlockCollection({ comment, items }, ctx, { blockItemPrefix, flowChars, itemIndent, onChompKeep, onComment }) {
    const { indent, options: { commentString } } = ctx;
    const itemCtx = Object.assign({}, ctx, { indent: itemIndent, type: null });
    let chompKeep = false; // flag for the preceding node's status
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (!chompKeep && item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, chompKeep);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (!chompKeep && ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, chompKeep);
            }
        }
        chompKeep = false;
        let str = stringify.stringify(item, itemCtx, () => (comment = null), () => (chompKeep = true));
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        if (chompKeep && comment)
            chompKeep = false;
        lines.push(blockItemPrefix + str);
    }
    let str;
    if (lines.length === 0) {
        str = flowChars.start + flowChars.end;
    }
    else {
        str = lines[0];
        for (let i = 1; i < lines.length; ++i) {
            const line = lines[i];
            str += line ? `\n${indent}${line}` : '\n';
        }
    }
    if (comment) {
        str += '\n' + stringifyComment.indentComment(commentString(comment), indent);
        if (onComment)
            onComment();
    }
    else if (chompKeep && onChompKeep)
        onChompKeep();
    return str;
}
function stringifyFlowCollection({ items }, ctx, { flowChars, itemIndent }) {
    const { indent, indentStep, flowCollectionPadding: fcPadding, options: { commentString } } = ctx;
    itemIndent += indentStep;
    const itemCtx = Object.assign({}, ctx, {
        indent: itemIndent,
        inFlow: true,
        type: null
    });
    let reqNewline = false;
    let linesAtValue = 0;
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, false);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, false);
                if (ik.comment)
                    reqNewline = true;
            }
            const iv = identity.isNode(item.value) ? item.value : null;
            if (iv) {
                if (iv.comment)
                    comment = iv.comment;
                if (iv.commentBefore)
                    reqNewline = true;
            }
            else if (item.value == null && ik?.comment) {
                comment = ik.comment;
            }
        }
        if (comment)
            reqNewline = true;
        let str = stringify.stringify(item, itemCtx, () => (comment = null));
        reqNewline || (reqNewline = lines.length > linesAtValue || str.includes('\n'));
        if (i < items.length - 1) {
            str += ',';
        }
        else if (ctx.options.trailingComma) {
            if (ctx.options.lineWidth > 0) {
                reqNewline || (reqNewline = lines.reduce((sum, line) => sum + line.length + 2, 2) +
                    (str.length + 2) >
                    ctx.options.lineWidth);
            }
            if (reqNewline) {
                str += ',';
            }
        }
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        lines.push(str);
        linesAtValue = lines.length;
    }
    const { start, end } = flowChars;
    if (lines.length === 0) {
        return start + end;
    }
    else {
        if (!reqNewline) {
            const len = lines.reduce((sum, line) => sum + line.length + 2, 2);
            reqNewline = ctx.options.lineWidth > 0 && len > ctx.options.lineWidth;
        }
        if (reqNewline) {
            let str = start;
            for (const line of lines)
                str += line ? `\n${indentStep}${indent}${line}` : '\n';
            return `${str}\n${indent}${end}`;
        }
        else {
            return `${start}${fcPadding}${lines.join(' ')}${fcPadding}${end}`;
        }
    }
}
function addCommentBefore({ indent, options: { commentString } }, lines, comment, chompKeep) {
    if (comment && chompKeep)
        comment = comment.replace(/^\n+/, '');
    if (comment) {
        const ic = stringifyComment.indentComment(commentString(comment), indent);
        lines.push(ic.trimStart()); // Avoid double indent on first line
    }
}

exports.stringifyCollection = stringifyCollection;


/***/ }),

/***/ 9799:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringifies a comment.
 *
 * Empty comment lines are left empty,
 * lines consisting of a single space are replaced by `#`,
 * and all other lines are prefixed with a `#`.
 */
const stringifyComment = (str) => str.replace(/^(?!$)(?: $)?/gm, '#');
function indentComment(comment, indent) {
    if (/^\n+$/.test(comment))
        return comment.substring(1);
    return indent ? comment.replace(/^(?! *$)/gm, indent) : comment;
}
const lineComment = (str, indent, comment) => str.endsWith('\n')
    ? indentComment(comment, indent)
    : comment.includes('\n')
        ? '\n' + indentComment(comment, indent)
        : (str.endsWith(' ') ? '' : ' ') + comment;

exports.indentComment = indentComment;
exports.lineComment = lineComment;
exports.stringifyComment = stringifyComment;


/***/ }),

/***/ 6829:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyDocument(doc, options) {
    const lines = [];
    let hasDirectives = options.directives === true;
    if (options.directives !== false && doc.directives) {
        const dir = doc.directives.toString(doc);
        if (dir) {
            lines.push(dir);
            hasDirectives = true;
        }
        else if (doc.directives.docStart)
            hasDirectives = true;
    }
    if (hasDirectives)
        lines.push('---');
    const ctx = stringify.createStringifyContext(doc, options);
    const { commentString } = ctx.options;
    if (doc.commentBefore) {
        if (lines.length !== 1)
            lines.unshift('');
        const cs = commentString(doc.commentBefore);
        lines.unshift(stringifyComment.indentComment(cs, ''));
    }
    let chompKeep = false;
    let contentComment = null;
    if (doc.contents) {
        if (identity.isNode(doc.contents)) {
            if (doc.contents.spaceBefore && hasDirectives)
                lines.push('');
            if (doc.contents.commentBefore) {
                const cs = commentString(doc.contents.commentBefore);
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            // top-level block scalars need to be indented if followed by a comment
            ctx.forceBlockIndent = !!doc.comment;
            contentComment = doc.contents.comment;
        }
        const onChompKeep = contentComment ? undefined : () => (chompKeep = true);
        let body = stringify.stringify(doc.contents, ctx, () => (contentComment = null), onChompKeep);
        if (contentComment)
            body += stringifyComment.lineComment(body, '', commentString(contentComment));
        if ((body[0] === '|' || body[0] === '>') &&
            lines[lines.length - 1] === '---') {
            // Top-level block scalars with a preceding doc marker ought to use the
            // same line for their header.
            lines[lines.length - 1] = `--- ${body}`;
        }
        else
            lines.push(body);
    }
    else {
        lines.push(stringify.stringify(doc.contents, ctx));
    }
    if (doc.directives?.docEnd) {
        if (doc.comment) {
            const cs = commentString(doc.comment);
            if (cs.includes('\n')) {
                lines.push('...');
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            else {
                lines.push(`... ${cs}`);
            }
        }
        else {
            lines.push('...');
        }
    }
    else {
        let dc = doc.comment;
        if (dc && chompKeep)
            dc = dc.replace(/^\n+/, '');
        if (dc) {
            if ((!chompKeep || contentComment) && lines[lines.length - 1] !== '')
                lines.push('');
            lines.push(stringifyComment.indentComment(commentString(dc), ''));
        }
    }
    return lines.join('\n') + '\n';
}

exports.stringifyDocument = stringifyDocument;


/***/ }),

/***/ 8689:
/***/ ((__unused_webpack_module, exports) => {



function stringifyNumber({ format, minFractionDigits, tag, value }) {
    if (typeof value === 'bigint')
        return String(value);
    const num = typeof value === 'number' ? value : Number(value);
    if (!isFinite(num))
        return isNaN(num) ? '.nan' : num < 0 ? '-.inf' : '.inf';
    let n = Object.is(value, -0) ? '-0' : JSON.stringify(value);
    if (!format &&
        minFractionDigits &&
        (!tag || tag === 'tag:yaml.org,2002:float') &&
        /^-?\d/.test(n) &&
        !n.includes('e')) {
        let i = n.indexOf('.');
        if (i < 0) {
            i = n.length;
            n += '.';
        }
        let d = minFractionDigits - (n.length - i - 1);
        while (d-- > 0)
            n += '0';
    }
    return n;
}

exports.stringifyNumber = stringifyNumber;


/***/ }),

/***/ 9748:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyPair({ key, value }, ctx, onComment, onChompKeep) {
    const { allNullValues, doc, indent, indentStep, options: { commentString, indentSeq, simpleKeys } } = ctx;
    let keyComment = (identity.isNode(key) && key.comment) || null;
    if (simpleKeys) {
        if (keyComment) {
            throw new Error('With simple keys, key nodes cannot have comments');
        }
        if (identity.isCollection(key) || (!identity.isNode(key) && typeof key === 'object')) {
            const msg = 'With simple keys, collection cannot be used as a key value';
            throw new Error(msg);
        }
    }
    let explicitKey = !simpleKeys &&
        (!key ||
            (keyComment && value == null && !ctx.inFlow) ||
            identity.isCollection(key) ||
            (identity.isScalar(key)
                ? key.type === Scalar.Scalar.BLOCK_FOLDED || key.type === Scalar.Scalar.BLOCK_LITERAL
                : typeof key === 'object'));
    ctx = Object.assign({}, ctx, {
        allNullValues: false,
        implicitKey: !explicitKey && (simpleKeys || !allNullValues),
        indent: indent + indentStep
    });
    let keyCommentDone = false;
    let chompKeep = false;
    let str = stringify.stringify(key, ctx, () => (keyCommentDone = true), () => (chompKeep = true));
    if (!explicitKey && !ctx.inFlow && str.length > 1024) {
        if (simpleKeys)
            throw new Error('With simple keys, single line scalar must not span more than 1024 characters');
        explicitKey = true;
    }
    if (ctx.inFlow) {
        if (allNullValues || value == null) {
            if (keyCommentDone && onComment)
                onComment();
            return str === '' ? '?' : explicitKey ? `? ${str}` : str;
        }
    }
    else if ((allNullValues && !simpleKeys) || (value == null && explicitKey)) {
        str = `? ${str}`;
        if (keyComment && !keyCommentDone) {
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        }
        else if (chompKeep && onChompKeep)
            onChompKeep();
        return str;
    }
    if (keyCommentDone)
        keyComment = null;
    if (explicitKey) {
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        str = `? ${str}\n${indent}:`;
    }
    else {
        str = `${str}:`;
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
    }
    let vsb, vcb, valueComment;
    if (identity.isNode(value)) {
        vsb = !!value.spaceBefore;
        vcb = value.commentBefore;
        valueComment = value.comment;
    }
    else {
        vsb = false;
        vcb = null;
        valueComment = null;
        if (value && typeof value === 'object')
            value = doc.createNode(value);
    }
    ctx.implicitKey = false;
    if (!explicitKey && !keyComment && identity.isScalar(value))
        ctx.indentAtStart = str.length + 1;
    chompKeep = false;
    if (!indentSeq &&
        indentStep.length >= 2 &&
        !ctx.inFlow &&
        !explicitKey &&
        identity.isSeq(value) &&
        !value.flow &&
        !value.tag &&
        !value.anchor) {
        // If indentSeq === false, consider '- ' as part of indentation where possible
        ctx.indent = ctx.indent.substring(2);
    }
    let valueCommentDone = false;
    const valueStr = stringify.stringify(value, ctx, () => (valueCommentDone = true), () => (chompKeep = true));
    let ws = ' ';
    if (keyComment || vsb || vcb) {
        ws = vsb ? '\n' : '';
        if (vcb) {
            const cs = commentString(vcb);
            ws += `\n${stringifyComment.indentComment(cs, ctx.indent)}`;
        }
        if (valueStr === '' && !ctx.inFlow) {
            if (ws === '\n' && valueComment)
                ws = '\n\n';
        }
        else {
            ws += `\n${ctx.indent}`;
        }
    }
    else if (!explicitKey && identity.isCollection(value)) {
        const vs0 = valueStr[0];
        const nl0 = valueStr.indexOf('\n');
        const hasNewline = nl0 !== -1;
        const flow = ctx.inFlow ?? value.flow ?? value.items.length === 0;
        if (hasNewline || !flow) {
            let hasPropsLine = false;
            if (hasNewline && (vs0 === '&' || vs0 === '!')) {
                let sp0 = valueStr.indexOf(' ');
                if (vs0 === '&' &&
                    sp0 !== -1 &&
                    sp0 < nl0 &&
                    valueStr[sp0 + 1] === '!') {
                    sp0 = valueStr.indexOf(' ', sp0 + 1);
                }
                if (sp0 === -1 || nl0 < sp0)
                    hasPropsLine = true;
            }
            if (!hasPropsLine)
                ws = `\n${ctx.indent}`;
        }
    }
    else if (valueStr === '' || valueStr[0] === '\n') {
        ws = '';
    }
    str += ws + valueStr;
    if (ctx.inFlow) {
        if (valueCommentDone && onComment)
            onComment();
    }
    else if (valueComment && !valueCommentDone) {
        str += stringifyComment.lineComment(str, ctx.indent, commentString(valueComment));
    }
    else if (chompKeep && onChompKeep) {
        onChompKeep();
    }
    return str;
}

exports.stringifyPair = stringifyPair;


/***/ }),

/***/ 3069:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var foldFlowLines = __nccwpck_require__(4475);

const getFoldOptions = (ctx, isBlock) => ({
    indentAtStart: isBlock ? ctx.indent.length : ctx.indentAtStart,
    lineWidth: ctx.options.lineWidth,
    minContentWidth: ctx.options.minContentWidth
});
// Also checks for lines starting with %, as parsing the output as YAML 1.1 will
// presume that's starting a new document.
const containsDocumentMarker = (str) => /^(%|---|\.\.\.)/m.test(str);
function lineLengthOverLimit(str, lineWidth, indentLength) {
    if (!lineWidth || lineWidth < 0)
        return false;
    const limit = lineWidth - indentLength;
    const strLen = str.length;
    if (strLen <= limit)
        return false;
    for (let i = 0, start = 0; i < strLen; ++i) {
        if (str[i] === '\n') {
            if (i - start > limit)
                return true;
            start = i + 1;
            if (strLen - start <= limit)
                return false;
        }
    }
    return true;
}
function doubleQuotedString(value, ctx) {
    const json = JSON.stringify(value);
    if (ctx.options.doubleQuotedAsJSON)
        return json;
    const { implicitKey } = ctx;
    const minMultiLineLength = ctx.options.doubleQuotedMinMultiLineLength;
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    let str = '';
    let start = 0;
    for (let i = 0, ch = json[i]; ch; ch = json[++i]) {
        if (ch === ' ' && json[i + 1] === '\\' && json[i + 2] === 'n') {
            // space before newline needs to be escaped to not be folded
            str += json.slice(start, i) + '\\ ';
            i += 1;
            start = i;
            ch = '\\';
        }
        if (ch === '\\')
            switch (json[i + 1]) {
                case 'u':
                    {
                        str += json.slice(start, i);
                        const code = json.substr(i + 2, 4);
                        switch (code) {
                            case '0000':
                                str += '\\0';
                                break;
                            case '0007':
                                str += '\\a';
                                break;
                            case '000b':
                                str += '\\v';
                                break;
                            case '001b':
                                str += '\\e';
                                break;
                            case '0085':
                                str += '\\N';
                                break;
                            case '00a0':
                                str += '\\_';
                                break;
                            case '2028':
                                str += '\\L';
                                break;
                            case '2029':
                                str += '\\P';
                                break;
                            default:
                                if (code.substr(0, 2) === '00')
                                    str += '\\x' + code.substr(2);
                                else
                                    str += json.substr(i, 6);
                        }
                        i += 5;
                        start = i + 1;
                    }
                    break;
                case 'n':
                    if (implicitKey ||
                        json[i + 2] === '"' ||
                        json.length < minMultiLineLength) {
                        i += 1;
                    }
                    else {
                        // folding will eat first newline
                        str += json.slice(start, i) + '\n\n';
                        while (json[i + 2] === '\\' &&
                            json[i + 3] === 'n' &&
                            json[i + 4] !== '"') {
                            str += '\n';
                            i += 2;
                        }
                        str += indent;
                        // space after newline needs to be escaped to not be folded
                        if (json[i + 2] === ' ')
                            str += '\\';
                        i += 1;
                        start = i + 1;
                    }
                    break;
                default:
                    i += 1;
            }
    }
    str = start ? str + json.slice(start) : json;
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_QUOTED, getFoldOptions(ctx, false));
}
function singleQuotedString(value, ctx) {
    if (ctx.options.singleQuote === false ||
        (ctx.implicitKey && value.includes('\n')) ||
        /[ \t]\n|\n[ \t]/.test(value) // single quoted string can't have leading or trailing whitespace around newline
    )
        return doubleQuotedString(value, ctx);
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    const res = "'" + value.replace(/'/g, "''").replace(/\n+/g, `$&\n${indent}`) + "'";
    return ctx.implicitKey
        ? res
        : foldFlowLines.foldFlowLines(res, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function quotedString(value, ctx) {
    const { singleQuote } = ctx.options;
    let qs;
    if (singleQuote === false)
        qs = doubleQuotedString;
    else {
        const hasDouble = value.includes('"');
        const hasSingle = value.includes("'");
        if (hasDouble && !hasSingle)
            qs = singleQuotedString;
        else if (hasSingle && !hasDouble)
            qs = doubleQuotedString;
        else
            qs = singleQuote ? singleQuotedString : doubleQuotedString;
    }
    return qs(value, ctx);
}
// The negative lookbehind avoids a polynomial search,
// but isn't supported yet on Safari: https://caniuse.com/js-regexp-lookbehind
let blockEndNewlines;
try {
    blockEndNewlines = new RegExp('(^|(?<!\n))\n+(?!\n|$)', 'g');
}
catch {
    blockEndNewlines = /\n+(?!\n|$)/g;
}
function blockString({ comment, type, value }, ctx, onComment, onChompKeep) {
    const { blockQuote, commentString, lineWidth } = ctx.options;
    // 1. Block can't end in whitespace unless the last line is non-empty.
    // 2. Strings consisting of only whitespace are best rendered explicitly.
    if (!blockQuote || /\n[\t ]+$/.test(value)) {
        return quotedString(value, ctx);
    }
    const indent = ctx.indent ||
        (ctx.forceBlockIndent || containsDocumentMarker(value) ? '  ' : '');
    const literal = blockQuote === 'literal'
        ? true
        : blockQuote === 'folded' || type === Scalar.Scalar.BLOCK_FOLDED
            ? false
            : type === Scalar.Scalar.BLOCK_LITERAL
                ? true
                : !lineLengthOverLimit(value, lineWidth, indent.length);
    if (!value)
        return literal ? '|\n' : '>\n';
    // determine chomping from whitespace at value end
    let chomp;
    let endStart;
    for (endStart = value.length; endStart > 0; --endStart) {
        const ch = value[endStart - 1];
        if (ch !== '\n' && ch !== '\t' && ch !== ' ')
            break;
    }
    let end = value.substring(endStart);
    const endNlPos = end.indexOf('\n');
    if (endNlPos === -1) {
        chomp = '-'; // strip
    }
    else if (value === end || endNlPos !== end.length - 1) {
        chomp = '+'; // keep
        if (onChompKeep)
            onChompKeep();
    }
    else {
        chomp = ''; // clip
    }
    if (end) {
        value = value.slice(0, -end.length);
        if (end[end.length - 1] === '\n')
            end = end.slice(0, -1);
        end = end.replace(blockEndNewlines, `$&${indent}`);
    }
    // determine indent indicator from whitespace at value start
    let startWithSpace = false;
    let startEnd;
    let startNlPos = -1;
    for (startEnd = 0; startEnd < value.length; ++startEnd) {
        const ch = value[startEnd];
        if (ch === ' ')
            startWithSpace = true;
        else if (ch === '\n')
            startNlPos = startEnd;
        else
            break;
    }
    let start = value.substring(0, startNlPos < startEnd ? startNlPos + 1 : startEnd);
    if (start) {
        value = value.substring(start.length);
        start = start.replace(/\n+/g, `$&${indent}`);
    }
    const indentSize = indent ? '2' : '1'; // root is at -1
    // Leading | or > is added later
    let header = (startWithSpace ? indentSize : '') + chomp;
    if (comment) {
        header += ' ' + commentString(comment.replace(/ ?[\r\n]+/g, ' '));
        if (onComment)
            onComment();
    }
    if (!literal) {
        const foldedValue = value
            .replace(/\n+/g, '\n$&')
            .replace(/(?:^|\n)([\t ].*)(?:([\n\t ]*)\n(?![\n\t ]))?/g, '$1$2') // more-indented lines aren't folded
            //                ^ more-ind. ^ empty     ^ capture next empty lines only at end of indent
            .replace(/\n+/g, `$&${indent}`);
        let literalFallback = false;
        const foldOptions = getFoldOptions(ctx, true);
        if (blockQuote !== 'folded' && type !== Scalar.Scalar.BLOCK_FOLDED) {
            foldOptions.onOverflow = () => {
                literalFallback = true;
            };
        }
        const body = foldFlowLines.foldFlowLines(`${start}${foldedValue}${end}`, indent, foldFlowLines.FOLD_BLOCK, foldOptions);
        if (!literalFallback)
            return `>${header}\n${indent}${body}`;
    }
    value = value.replace(/\n+/g, `$&${indent}`);
    return `|${header}\n${indent}${start}${value}${end}`;
}
function plainString(item, ctx, onComment, onChompKeep) {
    const { type, value } = item;
    const { actualString, implicitKey, indent, indentStep, inFlow } = ctx;
    if ((implicitKey && value.includes('\n')) ||
        (inFlow && /[[\]{},]/.test(value))) {
        return quotedString(value, ctx);
    }
    if (/^[\n\t ,[\]{}#&*!|>'"%@`]|^[?-]$|^[?-][ \t]|[\n:][ \t]|[ \t]\n|[\n\t ]#|[\n\t :]$/.test(value)) {
        // not allowed:
        // - '-' or '?'
        // - start with an indicator character (except [?:-]) or /[?-] /
        // - '\n ', ': ' or ' \n' anywhere
        // - '#' not preceded by a non-space char
        // - end with ' ' or ':'
        return implicitKey || inFlow || !value.includes('\n')
            ? quotedString(value, ctx)
            : blockString(item, ctx, onComment, onChompKeep);
    }
    if (!implicitKey &&
        !inFlow &&
        type !== Scalar.Scalar.PLAIN &&
        value.includes('\n')) {
        // Where allowed & type not set explicitly, prefer block style for multiline strings
        return blockString(item, ctx, onComment, onChompKeep);
    }
    if (containsDocumentMarker(value)) {
        if (indent === '') {
            ctx.forceBlockIndent = true;
            return blockString(item, ctx, onComment, onChompKeep);
        }
        else if (implicitKey && indent === indentStep) {
            return quotedString(value, ctx);
        }
    }
    const str = value.replace(/\n+/g, `$&\n${indent}`);
    // Verify that output will be parsed as a string, as e.g. plain numbers and
    // booleans get parsed with those types in v1.2 (e.g. '42', 'true' & '0.9e-3'),
    // and others in v1.1.
    if (actualString) {
        const test = (tag) => tag.default && tag.tag !== 'tag:yaml.org,2002:str' && tag.test?.test(str);
        const { compat, tags } = ctx.doc.schema;
        if (tags.some(test) || compat?.some(test))
            return quotedString(value, ctx);
    }
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function stringifyString(item, ctx, onComment, onChompKeep) {
    const { implicitKey, inFlow } = ctx;
    const ss = typeof item.value === 'string'
        ? item
        : Object.assign({}, item, { value: String(item.value) });
    let { type } = item;
    if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
        // force double quotes on control characters & unpaired surrogates
        if (/[\x00-\x08\x0b-\x1f\x7f-\x9f\u{D800}-\u{DFFF}]/u.test(ss.value))
            type = Scalar.Scalar.QUOTE_DOUBLE;
    }
    const _stringify = (_type) => {
        switch (_type) {
            case Scalar.Scalar.BLOCK_FOLDED:
            case Scalar.Scalar.BLOCK_LITERAL:
                return implicitKey || inFlow
                    ? quotedString(ss.value, ctx) // blocks are not valid inside flow containers
                    : blockString(ss, ctx, onComment, onChompKeep);
            case Scalar.Scalar.QUOTE_DOUBLE:
                return doubleQuotedString(ss.value, ctx);
            case Scalar.Scalar.QUOTE_SINGLE:
                return singleQuotedString(ss.value, ctx);
            case Scalar.Scalar.PLAIN:
                return plainString(ss, ctx, onComment, onChompKeep);
            default:
                return null;
        }
    };
    let res = _stringify(type);
    if (res === null) {
        const { defaultKeyType, defaultStringType } = ctx.options;
        const t = (implicitKey && defaultKeyType) || defaultStringType;
        res = _stringify(t);
        if (res === null)
            throw new Error(`Unsupported default string type ${t}`);
    }
    return res;
}

exports.stringifyString = stringifyString;


/***/ }),

/***/ 204:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove node');
/**
 * Apply a visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
function visit(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = visit_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        visit_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current node */
visit.SKIP = SKIP;
/** Remove the current node */
visit.REMOVE = REMOVE;
function visit_(key, node, visitor, path) {
    const ctrl = callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visit_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = visit_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = visit_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = visit_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
/**
 * Apply an async visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `Promise`: Must resolve to one of the following values
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
async function visitAsync(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = await visitAsync_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        await visitAsync_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visitAsync.BREAK = BREAK;
/** Do not visit the children of the current node */
visitAsync.SKIP = SKIP;
/** Remove the current node */
visitAsync.REMOVE = REMOVE;
async function visitAsync_(key, node, visitor, path) {
    const ctrl = await callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visitAsync_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = await visitAsync_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = await visitAsync_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = await visitAsync_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
function initVisitor(visitor) {
    if (typeof visitor === 'object' &&
        (visitor.Collection || visitor.Node || visitor.Value)) {
        return Object.assign({
            Alias: visitor.Node,
            Map: visitor.Node,
            Scalar: visitor.Node,
            Seq: visitor.Node
        }, visitor.Value && {
            Map: visitor.Value,
            Scalar: visitor.Value,
            Seq: visitor.Value
        }, visitor.Collection && {
            Map: visitor.Collection,
            Seq: visitor.Collection
        }, visitor);
    }
    return visitor;
}
function callVisitor(key, node, visitor, path) {
    if (typeof visitor === 'function')
        return visitor(key, node, path);
    if (identity.isMap(node))
        return visitor.Map?.(key, node, path);
    if (identity.isSeq(node))
        return visitor.Seq?.(key, node, path);
    if (identity.isPair(node))
        return visitor.Pair?.(key, node, path);
    if (identity.isScalar(node))
        return visitor.Scalar?.(key, node, path);
    if (identity.isAlias(node))
        return visitor.Alias?.(key, node, path);
    return undefined;
}
function replaceNode(key, path, node) {
    const parent = path[path.length - 1];
    if (identity.isCollection(parent)) {
        parent.items[key] = node;
    }
    else if (identity.isPair(parent)) {
        if (key === 'key')
            parent.key = node;
        else
            parent.value = node;
    }
    else if (identity.isDocument(parent)) {
        parent.contents = node;
    }
    else {
        const pt = identity.isAlias(parent) ? 'alias' : 'scalar';
        throw new Error(`Cannot replace node with ${pt} parent`);
    }
}

exports.visit = visit;
exports.visitAsync = visitAsync;


/***/ })

/******/ });
/************************************************************************/
/******/ // The module cache
/******/ var __webpack_module_cache__ = {};
/******/ 
/******/ // The require function
/******/ function __nccwpck_require__(moduleId) {
/******/ 	// Check if module is in cache
/******/ 	var cachedModule = __webpack_module_cache__[moduleId];
/******/ 	if (cachedModule !== undefined) {
/******/ 		return cachedModule.exports;
/******/ 	}
/******/ 	// Create a new module (and put it into the cache)
/******/ 	var module = __webpack_module_cache__[moduleId] = {
/******/ 		// no module.id needed
/******/ 		// no module.loaded needed
/******/ 		exports: {}
/******/ 	};
/******/ 
/******/ 	// Execute the module function
/******/ 	var threw = true;
/******/ 	try {
/******/ 		__webpack_modules__[moduleId](module, module.exports, __nccwpck_require__);
/******/ 		threw = false;
/******/ 	} finally {
/******/ 		if(threw) delete __webpack_module_cache__[moduleId];
/******/ 	}
/******/ 
/******/ 	// Return the exports of the module
/******/ 	return module.exports;
/******/ }
/******/ 
/******/ // expose the modules object (__webpack_modules__)
/******/ __nccwpck_require__.m = __webpack_modules__;
/******/ 
/************************************************************************/
/******/ /* webpack/runtime/asset-relocator-loader */
/******/ if (typeof __nccwpck_require__ !== 'undefined') __nccwpck_require__.ab = decodeURIComponent(new URL('.', import.meta.url).pathname).slice(import.meta.url.match(/^file:\/\/\/\w:/) ? 1 : 0, -1) + "/";
/******/ 
/******/ /* webpack/runtime/async module */
/******/ (() => {
/******/ 	var webpackQueues = typeof Symbol === "function" ? Symbol("webpack queues") : "__webpack_queues__";
/******/ 	var webpackExports = typeof Symbol === "function" ? Symbol("webpack exports") : "__webpack_exports__";
/******/ 	var webpackError = typeof Symbol === "function" ? Symbol("webpack error") : "__webpack_error__";
/******/ 	var resolveQueue = (queue) => {
/******/ 		if(queue && queue.d < 1) {
/******/ 			queue.d = 1;
/******/ 			queue.forEach((fn) => (fn.r--));
/******/ 			queue.forEach((fn) => (fn.r-- ? fn.r++ : fn()));
/******/ 		}
/******/ 	}
/******/ 	var wrapDeps = (deps) => (deps.map((dep) => {
/******/ 		if(dep !== null && typeof dep === "object") {
/******/ 			if(dep[webpackQueues]) return dep;
/******/ 			if(dep.then) {
/******/ 				var queue = [];
/******/ 				queue.d = 0;
/******/ 				dep.then((r) => {
/******/ 					obj[webpackExports] = r;
/******/ 					resolveQueue(queue);
/******/ 				}, (e) => {
/******/ 					obj[webpackError] = e;
/******/ 					resolveQueue(queue);
/******/ 				});
/******/ 				var obj = {};
/******/ 				obj[webpackQueues] = (fn) => (fn(queue));
/******/ 				return obj;
/******/ 			}
/******/ 		}
/******/ 		var ret = {};
/******/ 		ret[webpackQueues] = x => {};
/******/ 		ret[webpackExports] = dep;
/******/ 		return ret;
/******/ 	}));
/******/ 	__nccwpck_require__.a = (module, body, hasAwait) => {
/******/ 		var queue;
/******/ 		hasAwait && ((queue = []).d = -1);
/******/ 		var depQueues = new Set();
/******/ 		var exports = module.exports;
/******/ 		var currentDeps;
/******/ 		var outerResolve;
/******/ 		var reject;
/******/ 		var promise = new Promise((resolve, rej) => {
/******/ 			reject = rej;
/******/ 			outerResolve = resolve;
/******/ 		});
/******/ 		promise[webpackExports] = exports;
/******/ 		promise[webpackQueues] = (fn) => (queue && fn(queue), depQueues.forEach(fn), promise["catch"](x => {}));
/******/ 		module.exports = promise;
/******/ 		body((deps) => {
/******/ 			currentDeps = wrapDeps(deps);
/******/ 			var fn;
/******/ 			var getResult = () => (currentDeps.map((d) => {
/******/ 				if(d[webpackError]) throw d[webpackError];
/******/ 				return d[webpackExports];
/******/ 			}))
/******/ 			var promise = new Promise((resolve) => {
/******/ 				fn = () => (resolve(getResult));
/******/ 				fn.r = 0;
/******/ 				var fnQueue = (q) => (q !== queue && !depQueues.has(q) && (depQueues.add(q), q && !q.d && (fn.r++, q.push(fn))));
/******/ 				currentDeps.map((dep) => (dep[webpackQueues](fnQueue)));
/******/ 			});
/******/ 			return fn.r ? promise : getResult();
/******/ 		}, (err) => ((err ? reject(promise[webpackError] = err) : outerResolve(exports)), resolveQueue(queue)));
/******/ 		queue && queue.d < 0 && (queue.d = 0);
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/compat get default export */
/******/ (() => {
/******/ 	// getDefaultExport function for compatibility with non-harmony modules
/******/ 	__nccwpck_require__.n = (module) => {
/******/ 		var getter = module && module.__esModule ?
/******/ 			() => (module['default']) :
/******/ 			() => (module);
/******/ 		__nccwpck_require__.d(getter, { a: getter });
/******/ 		return getter;
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/define property getters */
/******/ (() => {
/******/ 	// define getter functions for harmony exports
/******/ 	__nccwpck_require__.d = (exports, definition) => {
/******/ 		for(var key in definition) {
/******/ 			if(__nccwpck_require__.o(definition, key) && !__nccwpck_require__.o(exports, key)) {
/******/ 				Object.defineProperty(exports, key, { enumerable: true, get: definition[key] });
/******/ 			}
/******/ 		}
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/ensure chunk */
/******/ (() => {
/******/ 	__nccwpck_require__.f = {};
/******/ 	// This file contains only the entry chunk.
/******/ 	// The chunk loading function for additional chunks
/******/ 	__nccwpck_require__.e = (chunkId) => {
/******/ 		return Promise.all(Object.keys(__nccwpck_require__.f).reduce((promises, key) => {
/******/ 			__nccwpck_require__.f[key](chunkId, promises);
/******/ 			return promises;
/******/ 		}, []));
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/get javascript chunk filename */
/******/ (() => {
/******/ 	// This function allow to reference async chunks
/******/ 	__nccwpck_require__.u = (chunkId) => {
/******/ 		// return url for filenames based on template
/******/ 		return "" + chunkId + ".index.js";
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/hasOwnProperty shorthand */
/******/ (() => {
/******/ 	__nccwpck_require__.o = (obj, prop) => (Object.prototype.hasOwnProperty.call(obj, prop))
/******/ })();
/******/ 
/******/ /* webpack/runtime/make namespace object */
/******/ (() => {
/******/ 	// define __esModule on exports
/******/ 	__nccwpck_require__.r = (exports) => {
/******/ 		if(typeof Symbol !== 'undefined' && Symbol.toStringTag) {
/******/ 			Object.defineProperty(exports, Symbol.toStringTag, { value: 'Module' });
/******/ 		}
/******/ 		Object.defineProperty(exports, '__esModule', { value: true });
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/import chunk loading */
/******/ (() => {
/******/ 	// no baseURI
/******/ 	
/******/ 	// object to store loaded and loading chunks
/******/ 	// undefined = chunk not loaded, null = chunk preloaded/prefetched
/******/ 	// [resolve, Promise] = chunk loading, 0 = chunk loaded
/******/ 	var installedChunks = {
/******/ 		792: 0
/******/ 	};
/******/ 	
/******/ 	var installChunk = (data) => {
/******/ 		var {ids, modules, runtime} = data;
/******/ 		// add "modules" to the modules object,
/******/ 		// then flag all "ids" as loaded and fire callback
/******/ 		var moduleId, chunkId, i = 0;
/******/ 		for(moduleId in modules) {
/******/ 			if(__nccwpck_require__.o(modules, moduleId)) {
/******/ 				__nccwpck_require__.m[moduleId] = modules[moduleId];
/******/ 			}
/******/ 		}
/******/ 		if(runtime) runtime(__nccwpck_require__);
/******/ 		for(;i < ids.length; i++) {
/******/ 			chunkId = ids[i];
/******/ 			if(__nccwpck_require__.o(installedChunks, chunkId) && installedChunks[chunkId]) {
/******/ 				installedChunks[chunkId][0]();
/******/ 			}
/******/ 			installedChunks[ids[i]] = 0;
/******/ 		}
/******/ 	
/******/ 	}
/******/ 	
/******/ 	__nccwpck_require__.f.j = (chunkId, promises) => {
/******/ 			// import() chunk loading for javascript
/******/ 			var installedChunkData = __nccwpck_require__.o(installedChunks, chunkId) ? installedChunks[chunkId] : undefined;
/******/ 			if(installedChunkData !== 0) { // 0 means "already installed".
/******/ 	
/******/ 				// a Promise means "currently loading".
/******/ 				if(installedChunkData) {
/******/ 					promises.push(installedChunkData[1]);
/******/ 				} else {
/******/ 					if(true) { // all chunks have JS
/******/ 						// setup Promise in chunk cache
/******/ 						var promise = import("./" + __nccwpck_require__.u(chunkId)).then(installChunk, (e) => {
/******/ 							if(installedChunks[chunkId] !== 0) installedChunks[chunkId] = undefined;
/******/ 							throw e;
/******/ 						});
/******/ 						var promise = Promise.race([promise, new Promise((resolve) => (installedChunkData = installedChunks[chunkId] = [resolve]))])
/******/ 						promises.push(installedChunkData[1] = promise);
/******/ 					}
/******/ 				}
/******/ 			}
/******/ 	};
/******/ 	
/******/ 	// no prefetching
/******/ 	
/******/ 	// no preloaded
/******/ 	
/******/ 	// no external install chunk
/******/ 	
/******/ 	// no on chunks loaded
/******/ })();
/******/ 
/************************************************************************/
/******/ 
/******/ // startup
/******/ // Load entry module and return exports
/******/ // This entry module used 'module' so it can't be inlined
/******/ var __webpack_exports__ = __nccwpck_require__(5581);
/******/ __webpack_exports__ = await __webpack_exports__;
/******/ 
