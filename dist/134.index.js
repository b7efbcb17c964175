export const id = 134;
export const ids = [134];
export const modules = {

/***/ 3909:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   W: () => (/* binding */ loadClassifierData)
/* harmony export */ });
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(4296);
/* harmony import */ var _load_model_data_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5240);
/* harmony import */ var _data_parts_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(6837);



/** Largest number of distinct labels collected before a target is judged not binary. */
const MAX_LABELS = 20;
/**
 * A classifier's rows are always held in memory, never streamed as a sample (its fit makes passes
 * of its own over every row; run/fit-classifier.ts refuses training files too large to hold).
 */
const HELD = { streamAboveBytes: Number.POSITIVE_INFINITY };
/**
 * Reads a classifier's columns: the inputs as numbers, the target as two classes mapped to 1
 * (positive) and 0 (negative). Numbers: the two values 0 and 1 (1 positive), or two other
 * numbers with `data.positive` naming one. Text: `true`/`false` (any case; true positive), or
 * two labels with `data.positive` naming one. The hold-out rows may hold only labels the
 * training rows hold.
 * @throws InputError `target-classes` when the training rows hold fewer or more than two
 *   classes (naming those found), `positive-label` when `data.positive` is needed and missing or
 *   names no class found, and the errors of {@link loadModelData}
 */
async function loadClassifierData(repo, descriptor, inputs, settings) {
    let tables;
    try {
        tables = await (0,_load_model_data_js__WEBPACK_IMPORTED_MODULE_1__/* .loadModelData */ .u)(repo, descriptor, inputs, settings, HELD);
    }
    catch (error) {
        if (error instanceof _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz && error.code === 'csv-cell' && error.location.key === descriptor.data.target) {
            return loadTextLabels(repo, descriptor, inputs, settings);
        }
        throw error;
    }
    const found = distinctNumbers(tables.train.y, tables.train.rows);
    const shown = found.map((v) => String(v));
    const labels = chooseClasses(descriptor, shown, 'numeric');
    const positive = Number(labels.positive);
    const negative = Number(labels.negative);
    for (const data of [tables.train, tables.holdout]) {
        const y = data.y;
        for (let i = 0; i < data.rows; i++) {
            const v = y[i];
            if (v === positive)
                y[i] = 1;
            else if (v === negative)
                y[i] = 0;
            else
                throw unknownLabel(descriptor, (0,_data_parts_js__WEBPACK_IMPORTED_MODULE_2__/* .placeOfLine */ .xX)(data, data.lines[i]), String(v), labels);
        }
    }
    return { ...tables, labels };
}
/**
 * The inputs as numbers and the target as text labels: read as the numeric target would be (the
 * descriptor's separator, split column, dropped rows, category inputs and weights), the labels
 * coded by first appearance in the training rows.
 * @throws InputError `target-classes` when the training rows hold more than {@link MAX_LABELS} labels
 */
async function loadTextLabels(repo, descriptor, inputs, settings) {
    const { targetText, ...tables } = await (0,_load_model_data_js__WEBPACK_IMPORTED_MODULE_1__/* .loadModelData */ .u)(repo, descriptor, inputs, settings, { ...HELD, targetAsText: true });
    const text = targetText;
    const found = [];
    for (const label of text.train) {
        if (found.includes(label))
            continue;
        if (found.length >= MAX_LABELS) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('target-classes', `a binary classifier needs exactly two classes in the target \`${descriptor.data.target}\`; ${tables.train.file} holds more than ${MAX_LABELS}`, { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' });
        }
        found.push(label);
    }
    const labels = chooseClasses(descriptor, found, 'text');
    for (const [data, cells] of [
        [tables.train, text.train],
        [tables.holdout, text.holdout],
    ]) {
        for (let i = 0; i < data.rows; i++) {
            const label = cells[i];
            if (label === labels.positive)
                data.y[i] = 1;
            else if (label === labels.negative)
                data.y[i] = 0;
            else
                throw unknownLabel(descriptor, (0,_data_parts_js__WEBPACK_IMPORTED_MODULE_2__/* .placeOfLine */ .xX)(data, data.lines[i]), label, labels);
        }
    }
    return { ...tables, labels };
}
/**
 * Picks the positive and negative class among the labels found in the training rows.
 * @throws InputError `target-classes` or `positive-label`
 */
function chooseClasses(descriptor, found, kind) {
    const where = { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' };
    const list = found
        .slice(0, 6)
        .map((l) => (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(l, 30))
        .join(', ') + (found.length > 6 ? ', …' : '');
    if (found.length !== 2) {
        const count = found.length >= MAX_LABELS ? `at least ${MAX_LABELS}` : String(found.length);
        throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('target-classes', `a binary classifier needs exactly two classes in the target \`${descriptor.data.target}\`; the training rows hold ${count} (${list})`, where);
    }
    const positive = descriptor.data.positive ?? null;
    if (positive !== null) {
        const at = found.indexOf(positive);
        if (at < 0) {
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('positive-label', `\`data.positive\` is ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(positive, 30)} but the training rows' classes are ${list}; expected one of them`, {
                ...where,
                key: 'data.positive',
            });
        }
        return { positive, negative: found[1 - at], kind };
    }
    if (kind === 'numeric' && found.includes('0') && found.includes('1'))
        return { positive: '1', negative: '0', kind };
    const lower = found.map((l) => l.toLowerCase());
    if (lower.includes('true') && lower.includes('false')) {
        const at = lower.indexOf('true');
        return { positive: found[at], negative: found[1 - at], kind };
    }
    throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('positive-label', `the target \`${descriptor.data.target}\` holds the classes ${list}; set \`data.positive\` to the one that is the positive class (0/1 and true/false need no setting)`, where);
}
function unknownLabel(descriptor, place, label, labels) {
    return new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz('target-classes', `the target \`${descriptor.data.target}\` is ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(label, 30)} on line ${place.line} of ${place.file}; the training rows' classes are ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(labels.positive, 30)} and ${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(labels.negative, 30)}`, { file: descriptor.file, line: descriptor.data.lines.target, key: 'data.target' });
}
/** Distinct values of y[0..n), in order of first appearance (at most {@link MAX_LABELS}). */
function distinctNumbers(y, n) {
    const out = [];
    for (let i = 0; i < n && out.length < MAX_LABELS; i++)
        if (!out.includes(y[i]))
            out.push(y[i]);
    return out;
}


/***/ }),

/***/ 2266:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   MP: () => (/* binding */ rocPoints),
/* harmony export */   N0: () => (/* binding */ calibrationBins),
/* harmony export */   gt: () => (/* binding */ probabilities),
/* harmony export */   "if": () => (/* binding */ classificationFigures),
/* harmony export */   xD: () => (/* binding */ calibration)
/* harmony export */ });
/* unused harmony export rocAuc */
/* harmony import */ var _fit_logistic_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(4702);
/* harmony import */ var _radix_sort_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(8459);
/**
 * Figures of a binary classifier's probabilities against 0/1 labels: log-loss, Brier score,
 * accuracy at a threshold, ROC AUC (Mann-Whitney, ties counted half), class counts, and the
 * logistic recalibration (calibration intercept and slope, Cox 1958).
 */


/** p = 1 / (1 + exp(-eta)) for every entry. */
function probabilities(eta) {
    const out = new Float64Array(eta.length);
    for (let i = 0; i < eta.length; i++)
        out[i] = 1 / (1 + Math.exp(-eta[i]));
    return out;
}
/**
 * The figures of rows with labels y (0/1), linear predictors eta and probabilities p.
 * @param threshold a row is predicted positive when p >= threshold
 */
function classificationFigures(y, eta, p, n, threshold) {
    let dev = 0;
    let brier = 0;
    let correct = 0;
    let positives = 0;
    for (let i = 0; i < n; i++) {
        const yi = y[i];
        dev += (0,_fit_logistic_js__WEBPACK_IMPORTED_MODULE_0__/* .rowDeviance */ .ul)(eta[i], yi);
        const d = p[i] - yi;
        brier += d * d;
        if ((p[i] >= threshold ? 1 : 0) === yi)
            correct += 1;
        positives += yi;
    }
    return {
        rows: n,
        positives,
        negatives: n - positives,
        logLoss: dev / 2 / n,
        brier: brier / n,
        accuracy: correct / n,
        auc: rocAuc(y, p, n),
    };
}
/**
 * ROC AUC as the Mann-Whitney statistic: the share of (positive, negative) pairs in which the
 * positive scores higher, ties counted one half (Hanley & McNeil 1982, Radiology 143(1); equal to
 * the trapezoidal area under the ROC curve). NaN when either class is absent.
 */
function rocAuc(y, score, n) {
    let np = 0;
    for (let i = 0; i < n; i++)
        np += y[i];
    const nn = n - np;
    if (np === 0 || nn === 0)
        return Number.NaN;
    const pos = new Float64Array(np);
    const neg = new Float64Array(nn);
    let a = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
        if (y[i] === 1)
            pos[a++] = score[i];
        else
            neg[b++] = score[i];
    }
    (0,_radix_sort_js__WEBPACK_IMPORTED_MODULE_1__/* .sortFloat64 */ .f)(pos);
    (0,_radix_sort_js__WEBPACK_IMPORTED_MODULE_1__/* .sortFloat64 */ .f)(neg);
    return pairsAbove(pos, neg) / np / nn;
}
/** Sum over positives of (negatives below it + half the negatives equal to it), both sorted ascending. */
function pairsAbove(pos, neg) {
    let below = 0;
    let equalEnd = 0;
    let total = 0;
    for (let i = 0; i < pos.length; i++) {
        const v = pos[i];
        while (below < neg.length && neg[below] < v)
            below++;
        if (equalEnd < below)
            equalEnd = below;
        while (equalEnd < neg.length && neg[equalEnd] === v)
            equalEnd++;
        total += below + (equalEnd - below) / 2;
    }
    return total;
}
/**
 * Calibration intercept and slope (Cox 1958, Biometrika 45(3-4), "Two further applications of a
 * model for binary regression"): the unpenalised logistic regression of y on the model's linear
 * predictor eta = logit p, by Newton's method on the two parameters with step halving, stopping
 * when a step lowers the deviance by at most 1e-12 relative (at most 100 steps). NaN when a class
 * is absent or eta is constant (the slope is then not identified); a separated recalibration
 * (perfect ranking) gives the large values its steps reach, flagged `converged: false`.
 */
function calibration(y, eta, n) {
    let positives = 0;
    let lo = Number.POSITIVE_INFINITY;
    let hi = Number.NEGATIVE_INFINITY;
    for (let i = 0; i < n; i++) {
        positives += y[i];
        if (eta[i] < lo)
            lo = eta[i];
        if (eta[i] > hi)
            hi = eta[i];
    }
    if (positives === 0 || positives === n || !(hi > lo))
        return { intercept: Number.NaN, slope: Number.NaN, converged: false };
    let a = Math.log(positives / (n - positives));
    let b = 0;
    let dev = twoParameterDeviance(y, eta, n, a, b);
    for (let iter = 0; iter < 100; iter++) {
        // Gradient and Hessian of the log-likelihood in (a, b).
        let g0 = 0;
        let g1 = 0;
        let h00 = 0;
        let h01 = 0;
        let h11 = 0;
        for (let i = 0; i < n; i++) {
            const e = eta[i];
            const pr = 1 / (1 + Math.exp(-(a + b * e)));
            const r = y[i] - pr;
            const w = pr * (1 - pr);
            g0 += r;
            g1 += r * e;
            h00 += w;
            h01 += w * e;
            h11 += w * e * e;
        }
        const det = h00 * h11 - h01 * h01;
        if (!(det > 0))
            return { intercept: a, slope: b, converged: false };
        let da = (h11 * g0 - h01 * g1) / det;
        let db = (h00 * g1 - h01 * g0) / det;
        let next = twoParameterDeviance(y, eta, n, a + da, b + db);
        let halvings = 0;
        while (!(next <= dev + 1e-13 * Math.abs(dev)) && halvings < 40) {
            da /= 2;
            db /= 2;
            next = twoParameterDeviance(y, eta, n, a + da, b + db);
            halvings++;
        }
        if (halvings >= 40)
            return { intercept: a, slope: b, converged: false };
        a += da;
        b += db;
        const decrease = dev - next;
        dev = next;
        if (decrease <= 1e-12 * (Math.abs(dev) + 0.1))
            return { intercept: a, slope: b, converged: true };
    }
    return { intercept: a, slope: b, converged: false };
}
function twoParameterDeviance(y, eta, n, a, b) {
    let dev = 0;
    for (let i = 0; i < n; i++)
        dev += (0,_fit_logistic_js__WEBPACK_IMPORTED_MODULE_0__/* .rowDeviance */ .ul)(a + b * eta[i], y[i]);
    return dev;
}
/**
 * Calibration diagram (reliability diagram; DeGroot & Fienberg 1983, The Statistician 32):
 * `bins` equal-width bins of the predicted probability, each with its count, mean prediction and
 * observed share of positives (the last bin includes 1).
 */
function calibrationBins(y, p, n, bins = 10) {
    const count = new Float64Array(bins);
    const sumP = new Float64Array(bins);
    const sumY = new Float64Array(bins);
    for (let i = 0; i < n; i++) {
        const b = Math.min(bins - 1, Math.floor(p[i] * bins));
        count[b] += 1;
        sumP[b] += p[i];
        sumY[b] += y[i];
    }
    return Array.from(count, (c, b) => ({
        from: b / bins,
        to: (b + 1) / bins,
        count: c,
        predicted: c > 0 ? sumP[b] / c : Number.NaN,
        observed: c > 0 ? sumY[b] / c : Number.NaN,
    }));
}
/**
 * Points of the ROC curve (false positive rate, true positive rate) for drawing: the rates at the
 * thresholds t = 1 - k / max (k = 0 .. max; a row counts positive when p >= t), from (0, 0) to
 * (1, 1), counted in one pass over the rows (exact at those thresholds).
 */
function rocPoints(y, p, n, max = 50) {
    const pos = new Float64Array(max + 1);
    const neg = new Float64Array(max + 1);
    let positives = 0;
    for (let i = 0; i < n; i++) {
        // Bin k holds p in [1 - k/max, 1 - (k-1)/max): the rows first counted at threshold index k.
        const k = Math.min(max, Math.max(0, Math.ceil((1 - p[i]) * max)));
        if (y[i] === 1) {
            pos[k] += 1;
            positives += 1;
        }
        else {
            neg[k] += 1;
        }
    }
    const negatives = n - positives;
    if (positives === 0 || negatives === 0)
        return { fpr: [0, 1], tpr: [0, 1] };
    const fpr = [0];
    const tpr = [0];
    let tp = 0;
    let fp = 0;
    for (let k = 0; k <= max; k++) {
        tp += pos[k];
        fp += neg[k];
        fpr.push(fp / negatives);
        tpr.push(tp / positives);
    }
    return { fpr, tpr };
}


/***/ }),

/***/ 4702:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  i_: () => (/* binding */ firstStepsWithout),
  Sz: () => (/* binding */ fitLogistic),
  ic: () => (/* binding */ outOfFoldDeviance),
  ul: () => (/* binding */ rowDeviance)
});

// UNUSED EXPORTS: LOGISTIC_MAX_ITERATIONS, LOGISTIC_TOLERANCE

// EXTERNAL MODULE: ./src/design/blocks.ts
var blocks = __webpack_require__(7254);
// EXTERNAL MODULE: ./src/kernels/index.ts + 11 modules
var kernels = __webpack_require__(4733);
;// CONCATENATED MODULE: ./src/fit/gram-step.ts
/**
 * Newton steps of a logistic fit from the weighted Gram matrix (normal equations) instead of a
 * QR factor, for well-conditioned problems.
 *
 * A pass accumulates the upper triangle of the Gram matrix of the extended block [sqrt(W) X | u]
 * with u_i = (y_i - p_i) / sqrt(W_i): its leading p x p part is X^T W X and its last column the
 * gradient X^T (y - p) of the log-likelihood. A symmetric rank-k update costs about p^2 / 2
 * multiply-adds per row, a Householder fold of the same row about 2 p^2 (Golub & Van Loan,
 * Matrix Computations, 4th ed., sec. 5.3.2 and 5.2.1). Gram matrices of disjoint sets of rows
 * at the same coefficients add exactly as matrices (no down-dating), so the Gram of the rows
 * without one cross-validation fold is the sum of the other folds' Grams.
 *
 * The step d solves (X^T W X + ridge E) d = X^T (y - p) - ridge E w by Cholesky on the
 * symmetrically scaled matrix S = D H D, D = diag(H)^-1/2 (Golub & Van Loan, sec. 4.2). The
 * normal equations square the condition number, so the Gram route is taken only when an upper
 * bound of the 2-norm condition number of S, p trace(S^-1) (lambda_max(S) <= trace(S) = p and
 * 1 / lambda_min(S) <= trace(S^-1)), is at most {@link GRAM_MAX_CONDITION}; the caller then falls
 * back to the QR engine. The step's relative error is then about p eps cond(S) <= 1e-8, which
 * changes the path of Newton's method, never its limit: the optimum is where the gradient, summed
 * row by row and exact up to rounding, vanishes.
 *
 * Under the same bound, the Cholesky factor of the scaled Gram (no penalty) also gives the R
 * factor of the weighted design itself ({@link gramFactor}), for its rank and condition numbers.
 */
/** Largest bound p trace(S^-1) on the condition number of the scaled Hessian for a Gram step (about the square of the design's 3e3). */
const GRAM_MAX_CONDITION = 1e7;
/**
 * Size of the Gram matrix of a p-column design extended by one column, rounded up to even (the
 * kernel, kernels/gram.ts, works on column pairs; the padding column is zero).
 */
function gramSize(p) {
    const q = p + 1;
    return q + (q & 1);
}
/** out += a, entry by entry (Gram matrices of disjoint rows at the same coefficients add). */
function addInto(out, a) {
    for (let i = 0; i < out.length; i++)
        out[i] += a[i];
}
/**
 * The Cholesky factor of the symmetrically scaled matrix S = D H D, D = diag(H)^-1/2 (Golub & Van
 * Loan, sec. 4.2), when S is certainly well conditioned: null when a diagonal entry of H is not
 * positive and finite, Cholesky breaks down, or the bound p trace(S^-1) on the 2-norm condition
 * number of S exceeds {@link GRAM_MAX_CONDITION} (trace(S^-1) = ||L^-1||_F^2, by forward
 * substitution for each unit vector).
 * @param H symmetric positive (semi-)definite p x p, column-major, both triangles filled
 * @returns D (length p) and the lower-triangular L (column-major, L[j * p + i] for i >= j) with S = L L^T
 */
function scaledCholesky(H, p) {
    const D = new Float64Array(p);
    for (let j = 0; j < p; j++) {
        const h = H[j * p + j];
        if (!(h > 0 && Number.isFinite(h)))
            return null;
        D[j] = 1 / Math.sqrt(h);
    }
    // Cholesky S = L L^T of S = D H D (lower triangle, column-major L[j * p + i], i >= j).
    const L = new Float64Array(p * p);
    for (let j = 0; j < p; j++) {
        for (let i = j; i < p; i++) {
            let s = H[j * p + i] * D[i] * D[j];
            for (let k = 0; k < j; k++)
                s -= L[k * p + i] * L[k * p + j];
            if (i === j) {
                if (!(s > 0))
                    return null;
                L[j * p + j] = Math.sqrt(s);
            }
            else
                L[j * p + i] = s / L[j * p + j];
        }
    }
    let trace = 0;
    const x = new Float64Array(p);
    for (let c = 0; c < p; c++) {
        for (let i = c; i < p; i++) {
            let s = i === c ? 1 : 0;
            for (let k = c; k < i; k++)
                s -= L[k * p + i] * x[k];
            x[i] = s / L[i * p + i];
            trace += x[i] * x[i];
        }
    }
    if (!(p * trace <= GRAM_MAX_CONDITION))
        return null;
    return { D, L };
}
/**
 * The upper-triangular factor R (p x p, column-major, positive diagonal) with R^T R = X^T W X,
 * the leading p x p part of an extended Gram (no penalty), from the Cholesky factor of its scaled
 * form ({@link scaledCholesky}: R = L^T D^-1), or null when that is not certainly well conditioned.
 * R is the R factor of the weighted design sqrt(W) X up to the signs of its rows (the factor is
 * unique with a positive diagonal), so its singular values and right singular vectors are the
 * design's, as from a QR factor of the same rows up to rounding: forming the Gram perturbs the
 * smallest singular value by about p eps cond(S) / 2 relative (cond(S) = cond(sqrt(W) X D)^2,
 * the squaring of the normal equations, Golub & Van Loan, sec. 5.3.7), against about p eps
 * cond(sqrt(W) X D) for the QR factor: at most about 3e-8 under the bound, about 1e-12 at a
 * scaled condition number of 70 (test/fit/gram-factor.test.ts compares both).
 * @param G extended Gram (size {@link gramSize}(p) squared, upper triangle)
 * @param p design columns (>= 1)
 */
function gramFactor(G, p) {
    const q = gramSize(p);
    const H = new Float64Array(p * p);
    for (let k = 0; k < p; k++) {
        for (let j = 0; j <= k; j++) {
            H[k * p + j] = G[k * q + j];
            H[j * p + k] = G[k * q + j];
        }
    }
    const scaled = scaledCholesky(H, p);
    if (scaled === null)
        return null;
    const { D, L } = scaled;
    const R = new Float64Array(p * p);
    for (let j = 0; j < p; j++)
        for (let i = 0; i <= j; i++)
            R[j * p + i] = L[i * p + j] / D[j];
    return R;
}
/**
 * The Newton step of a Gram pass, or null when the scaled Hessian is not certainly well
 * conditioned (Cholesky breaks down, a value is not finite, or the bound exceeds
 * {@link GRAM_MAX_CONDITION}): the caller then solves with the QR engine.
 * @param G extended Gram (size {@link gramSize}(p)) at coefficients w
 * @param w the coefficients the Gram was taken at (length p)
 * @returns the new coefficients w + d and the Newton decrement d^T H d
 */
function gramStep(G, w, ridge, penalised) {
    const p = w.length;
    const q = gramSize(p);
    // H = X^T W X + ridge E and the right-hand side b = X^T (y - p) - ridge E w.
    const H = new Float64Array(p * p);
    const b = new Float64Array(p);
    for (let k = 0; k < p; k++) {
        for (let j = 0; j <= k; j++) {
            const v = G[k * q + j];
            H[k * p + j] = v;
            H[j * p + k] = v;
        }
        b[k] = G[p * q + k];
        if (penalised[k]) {
            H[k * p + k] += ridge;
            b[k] -= ridge * w[k];
        }
    }
    const scaled = scaledCholesky(H, p);
    if (scaled === null)
        return null;
    const { D, L } = scaled;
    // S (D^-1 d) = D b.
    const t = new Float64Array(p);
    for (let i = 0; i < p; i++) {
        let s = D[i] * b[i];
        for (let k = 0; k < i; k++)
            s -= L[k * p + i] * t[k];
        t[i] = s / L[i * p + i];
    }
    for (let i = p - 1; i >= 0; i--) {
        let s = t[i];
        for (let k = i + 1; k < p; k++)
            s -= L[i * p + k] * t[k];
        t[i] = s / L[i * p + i];
    }
    const next = new Float64Array(p);
    let decrement = 0;
    for (let j = 0; j < p; j++) {
        const d = D[j] * t[j];
        next[j] = w[j] + d;
        let hd = 0;
        for (let k = 0; k < p; k++)
            hd += H[k * p + j] * D[k] * t[k];
        decrement += d * hd;
    }
    if (!next.every(Number.isFinite))
        return null;
    return { w: next, decrement };
}

// EXTERNAL MODULE: ./src/fit/qr-accumulator.ts
var qr_accumulator = __webpack_require__(1355);
// EXTERNAL MODULE: ./src/fit/index.ts + 2 modules
var fit = __webpack_require__(2450);
;// CONCATENATED MODULE: ./src/fit/logistic.ts
/**
 * Binary logistic regression by iteratively reweighted least squares (IRLS), each Newton step
 * solved from the weighted Gram matrix or, when that is not certainly well conditioned, through
 * the streaming QR engine on the weighted design, block by block (memory grows with p^2 and the
 * block size, never with rows x p).
 *
 * Objective: F(w) = D(w) + ridge * sum over penalised j of w_j^2, with the deviance
 * D(w) = -2 sum_i [y_i log p_i + (1 - y_i) log(1 - p_i)], p_i = 1 / (1 + exp(-x_i^T w)). This is
 * 2 / C times the objective of scikit-learn's LogisticRegression with C = 1 / ridge and an
 * unpenalised intercept, so both have the same minimiser.
 *
 * Newton step (McCullagh & Nelder, Generalized Linear Models, 2nd ed., 1989, sec. 2.5; Green
 * 1984, JRSS B 46(2), "Iteratively reweighted least squares"): with W_i = p_i (1 - p_i) and the
 * working response z_i = eta_i + (y_i - p_i) / W_i, the next w minimises
 * sum_i W_i (z_i - x_i^T w)^2 + ridge ||E w||^2, i.e. the least squares of the rows
 * sqrt(W_i) x_i against sqrt(W_i) z_i with the ridge penalty rows, which the QR accumulator folds
 * (or, equivalently, (X^T W X + ridge E) d = X^T (y - p) - ridge E w for the step d = w_new - w)
 * (W_i is floored at 1e-14 so that a saturated row keeps a finite working response; the floor
 * changes the path, not the minimiser, where the gradient X^T (y - p) - ridge E w is zero).
 *
 * Step halving: when F at the new w is above F at the previous one (beyond 1e-12 relative, the
 * rounding of the sums), w moves half way back, up to 40 times.
 *
 * Stopping rule: the fit has converged when a Newton step lowers F by at most 1e-10 (|F| + 0.1)
 * (the relative rule of R's glm.fit, tighter: Newton converges quadratically, so the coefficients
 * of that step are accurate to about the square of the previous step's change), or, from the
 * second step on, when the Newton decrement of the step just solved (the decrease the quadratic
 * model predicts, d^T (X^T W X + ridge E) d) is at most that, the new coefficients then taken
 * without another pass; at most 100 Newton steps.
 *
 * Gram steps (gram-step.ts): a pass accumulates the weighted Gram matrix X^T W X and the gradient
 * X^T (y - p) instead of the QR factor (about a quarter of the multiply-adds per row), and the
 * Newton step is solved by Cholesky when the scaled Hessian is certainly well conditioned
 * (condition number bound at most 1e7); otherwise the problem repeats that pass at the same
 * coefficients with the QR engine and keeps it. Both solve the same Newton step up to rounding,
 * and the gradient that decides the optimum is summed row by row either way, so the optimum and
 * the stopping rule are the same. A problem that asks for its weighted factor
 * ({@link LogisticProblem.factor}) gets it from one Gram pass at the returned coefficients, as the
 * Cholesky factor of that Gram (the R of a QR factor of sqrt(W) X up to row signs) when the Gram
 * is certainly well conditioned (the same bound as for a step), else from one more pass with the
 * QR engine.
 *
 * Shared Grams for cross-validation: a fit over all rows can keep one Gram per part of the rows
 * (the folds) at each pass; at the same coefficients every fold fit has the same weights, so the
 * Newton step of the fit without fold f is solved from the sum of the other folds' Grams
 * ({@link firstStepsWithout}) and the fold fits, started there, need one pass over the rows fewer.
 */





/** Largest number of Newton steps. */
const LOGISTIC_MAX_ITERATIONS = 100;
/** Relative decrease of the objective at which IRLS stops. */
const LOGISTIC_TOLERANCE = 1e-10;
/** Smallest IRLS weight p (1 - p). */
const MIN_WEIGHT = 1e-14;
/** Largest number of step halvings in a row. */
const MAX_HALVINGS = 40;
/**
 * Fits one or more logistic regressions over the same design in shared passes (one pass over
 * the rows per Newton step of all problems still running: the design block is built once).
 *
 * @param design the fixed design
 * @param data the rows (y in {0, 1})
 * @param options ridge and penalised columns
 * @param problems the fits to make (e.g. the full fit, or one per cross-validation fold)
 * @returns one fit per problem, in order
 */
function fitLogistic(design, data, options, problems) {
    const p = design.p;
    const maxIterations = options.maxIterations ?? LOGISTIC_MAX_ITERATIONS;
    const states = problems.map((problem) => {
        const s = {
            problem,
            w: problem.start ? Float64Array.from(problem.start) : new Float64Array(0),
            previous: null,
            previousObjective: Number.POSITIVE_INFINITY,
            acc: new qr_accumulator/* QrAccumulator */.S(p),
            deviance: 0,
            rows: 0,
            iterations: 0,
            halvings: 0,
            halvingRun: 0,
            done: p === 0,
            converged: p === 0,
            lastFactor: null,
            lastR: null,
            lastDeviance: Number.NaN,
            partGram: null,
            partRows: null,
            partDev: null,
            lastParts: null,
            gram: true,
            G: new Float64Array(0),
            redo: false,
        };
        const first = problem.firstStep;
        const prepared = first && p > 0 ? gramStep(first.gram, first.from, options.ridge, options.penalised) : null;
        if (first && prepared) {
            // Start after the prepared step: as if its pass had just been accepted and solved.
            s.previous = Float64Array.from(first.from);
            s.previousObjective = first.objective;
            s.lastDeviance = first.deviance;
            s.w = prepared.w;
            s.iterations = 1;
        }
        else if (first) {
            // The prepared Gram is not well conditioned: start where it was taken, with the QR engine.
            s.w = Float64Array.from(first.from);
            s.gram = false;
        }
        else if (!problem.start)
            s.w = defaultStart(design, data, problem);
        return s;
    });
    const q = gramSize(p);
    const size = Math.max(1, Math.min(data.rows, 1 << 16));
    const eta = new Float64Array(size);
    const weighted = blockWeights(size);
    const { scale, target, resid, index } = weighted;
    const partScale = new Float64Array(size);
    const partResid = new Float64Array(size);
    const single = new Int32Array(2);
    let work = new Float64Array(0);
    for (let guard = 0; guard < (maxIterations + 1) * (MAX_HALVINGS + 2); guard++) {
        const active = states.filter((s) => !s.done);
        if (active.length === 0)
            break;
        for (const s of active) {
            s.acc = new qr_accumulator/* QrAccumulator */.S(p);
            s.G = new Float64Array(s.gram ? q * q : 0);
            s.deviance = 0;
            s.rows = 0;
            const parts = s.problem.parts;
            if (parts && s.gram) {
                s.partGram = new Float64Array(parts.count * q * q);
                s.partRows = new Float64Array(parts.count);
                s.partDev = new Float64Array(parts.count);
            }
            else {
                s.partGram = null;
                s.partRows = null;
                s.partDev = null;
            }
        }
        (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
            if (work.length < m * p)
                work = new Float64Array(m * p);
            for (const s of active) {
                eta.fill(0, 0, m);
                (0,kernels/* addProducts */.kD)(eta, 0, X, m, s.w, p);
                const { parts } = s.problem;
                if (parts && s.partGram && s.partRows && s.partDev) {
                    // Every row, each into its part's Gram (rows of a part gathered in row order).
                    weightRowsByPart(eta, data.y, start, m, parts.of, s.partDev, scale, resid);
                    const offsets = sortByPart(parts.of, start, m, parts.count, index);
                    gather(scale, index, m, partScale);
                    gather(resid, index, m, partResid);
                    (0,kernels/* addGramRows */.m$)(s.partGram, q, X, m, p, index, partScale, partResid, offsets, parts.count);
                    for (let f = 0; f < parts.count; f++)
                        s.partRows[f] += offsets[f + 1] - offsets[f];
                    s.rows += m;
                    continue;
                }
                const r = weighBlock(eta, data.y, start, m, s.problem, weighted);
                s.deviance += blockDeviance;
                s.rows += r;
                if (s.gram) {
                    single[1] = r;
                    (0,kernels/* addGramRows */.m$)(s.G, q, X, m, p, index, scale, resid, single, 1);
                }
                else {
                    for (let j = 0; j < p; j++)
                        scaleColumn(X, j * m, index, scale, r, work, j * r);
                    s.acc.addRows(work, target, r);
                }
            }
        });
        for (const s of active) {
            if (s.partGram && s.partDev) {
                // The problem's Gram and deviance: the sums of its parts', in part order.
                for (let f = 0; f < s.partDev.length; f++)
                    addInto(s.G, s.partGram.subarray(f * q * q, (f + 1) * q * q));
                s.deviance = 0;
                for (let f = 0; f < s.partDev.length; f++)
                    s.deviance += s.partDev[f];
            }
            step(s, options, maxIterations);
        }
    }
    for (const s of states) {
        // Problems that asked for their factor: one Gram pass at the returned coefficients, which
        // also gives the deviance and objective there (and the predictors, when asked), then the
        // Cholesky factor of that Gram, or, when it is not certainly well conditioned, one QR pass.
        if (!s.problem.factor || p === 0)
            continue;
        const at = gramAt(design, data, s.problem, s.w);
        s.lastR = gramFactor(at.gram, p);
        s.lastFactor = s.lastR === null ? factorAt(design, data, s.problem, s.w).factor : null;
        s.lastDeviance = at.deviance;
        s.previousObjective = at.deviance + options.ridge * penaltySum(s.w, options.penalised);
    }
    return states.map((s) => ({
        coefficients: s.w,
        deviance: s.lastDeviance,
        objective: s.previousObjective,
        iterations: s.iterations,
        halvings: s.halvings,
        converged: s.converged,
        rows: s.rows,
        weightedFactor: s.lastR !== null ? null : (s.lastFactor ?? (s.gram ? null : s.acc)),
        weightedR: s.lastR,
        parts: s.lastParts,
    }));
}
/**
 * The extended Gram of a problem's weighted rows [sqrt(W) X | u] at coefficients w (gram-step.ts)
 * and its deviance there, in one pass; with `problem.eta`, every row's linear predictor is left
 * there (each block's sum as predictRows makes it: zero, then addProducts).
 */
function gramAt(design, data, problem, w) {
    const p = design.p;
    const q = gramSize(p);
    const size = Math.max(1, Math.min(data.rows, 1 << 16));
    const out = problem.eta;
    if (out)
        out.fill(0, 0, data.rows);
    const block = new Float64Array(size);
    const weighted = blockWeights(size);
    const { scale, resid, index } = weighted;
    const single = new Int32Array(2);
    const gram = new Float64Array(q * q);
    let deviance = 0;
    const onBlock = problem.onBlock;
    (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
        if (onBlock)
            onBlock(X, start, m);
        let eta = block;
        if (out) {
            (0,kernels/* addProducts */.kD)(out, start, X, m, w, p);
            eta = out.subarray(start, start + m);
        }
        else {
            eta.fill(0, 0, m);
            (0,kernels/* addProducts */.kD)(eta, 0, X, m, w, p);
        }
        const r = weighBlock(eta, data.y, start, m, problem, weighted);
        deviance += blockDeviance;
        single[1] = r;
        (0,kernels/* addGramRows */.m$)(gram, q, X, m, p, index, scale, resid, single, 1);
    });
    return { gram, deviance };
}
/** The QR factor of the weighted rows sqrt(W) [X | z] of a problem at coefficients w, and its deviance there, in one pass. */
function factorAt(design, data, problem, w) {
    const p = design.p;
    const size = Math.max(1, Math.min(data.rows, 1 << 16));
    const eta = new Float64Array(size);
    const weighted = blockWeights(size);
    const { scale, target, index } = weighted;
    const factor = new qr_accumulator/* QrAccumulator */.S(p);
    let deviance = 0;
    let work = new Float64Array(0);
    (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
        if (work.length < m * p)
            work = new Float64Array(m * p);
        eta.fill(0, 0, m);
        (0,kernels/* addProducts */.kD)(eta, 0, X, m, w, p);
        const r = weighBlock(eta, data.y, start, m, problem, weighted);
        deviance += blockDeviance;
        for (let j = 0; j < p; j++)
            scaleColumn(X, j * m, index, scale, r, work, j * r);
        factor.addRows(work, target, r);
    });
    return { factor, deviance };
}
/**
 * The first Newton step of each fit without one part of the rows, from the per-part Grams of a
 * fit over all rows ({@link LogisticProblem.parts}): at the common coefficients `at` every row
 * has the same weight and residual in every such fit, so the Gram of the fit without part f is
 * the sum of the other parts' Grams (in part order; an exact addition, no subtraction), and its
 * deviance the sum of theirs. Each step is the Newton step a pass over those rows at `at` would
 * give (up to the rounding of the sums), so cross-validation folds started from the full fit need
 * one pass fewer. A fold whose summed Gram is not well conditioned starts at `at` instead.
 * @param parts the full fit's parts (at least 2)
 * @returns one prepared step per part, for {@link LogisticProblem.firstStep}
 */
function firstStepsWithout(parts, options) {
    const k = parts.grams.length;
    const penalty = options.ridge * penaltySum(parts.at, options.penalised);
    const steps = [];
    for (let f = 0; f < k; f++) {
        const gram = new Float64Array(gramSize(parts.at.length) ** 2);
        let deviance = 0;
        for (let q = 0; q < k; q++) {
            if (q === f)
                continue;
            addInto(gram, parts.grams[q]);
            deviance += parts.deviance[q];
        }
        steps.push({ from: parts.at, objective: deviance + penalty, deviance, gram });
    }
    return steps;
}
/** After a pass: accept the step (and solve the next), halve it, or stop. */
function step(s, options, maxIterations) {
    const objective = s.deviance + options.ridge * penaltySum(s.w, options.penalised);
    if (s.redo) {
        // The pass that was accepted, repeated at the same coefficients with the QR engine: solve only.
        s.redo = false;
        s.lastFactor = s.acc;
        solveNext(s, options, objective);
        return;
    }
    const noise = 1e-12 * (Math.abs(s.previousObjective) + 0.1);
    if (s.previous !== null && !(objective <= s.previousObjective + noise)) {
        // Not lower: halve the step back towards the previous coefficients.
        s.halvings += 1;
        s.halvingRun += 1;
        if (s.halvingRun > MAX_HALVINGS || !Number.isFinite(s.previousObjective)) {
            s.w = s.previous;
            s.done = true;
            return;
        }
        for (let j = 0; j < s.w.length; j++)
            s.w[j] = (s.w[j] + s.previous[j]) / 2;
        return;
    }
    s.halvingRun = 0;
    s.lastFactor = s.gram ? null : s.acc;
    s.lastDeviance = s.deviance;
    s.lastParts =
        s.partGram && s.partRows && s.partDev
            ? {
                at: Float64Array.from(s.w),
                grams: Array.from(s.partDev, (_, f) => s.partGram.subarray(f * s.G.length, (f + 1) * s.G.length)),
                rows: s.partRows,
                deviance: s.partDev,
            }
            : null;
    const decrease = s.previousObjective - objective;
    s.previousObjective = objective;
    if (s.previous !== null && decrease <= LOGISTIC_TOLERANCE * (Math.abs(objective) + 0.1)) {
        s.done = true;
        s.converged = true;
        return;
    }
    if (s.iterations >= maxIterations) {
        s.done = true;
        return;
    }
    solveNext(s, options, objective);
}
/** Solves the Newton step from the pass just accepted (Gram, else QR factor), and stops when its decrement is below the tolerance. */
function solveNext(s, options, objective) {
    const previous = Float64Array.from(s.w);
    let decrement;
    if (s.gram) {
        const next = gramStep(s.G, s.w, options.ridge, options.penalised);
        if (next === null) {
            // Not certainly well conditioned: the same pass again with the QR engine, from now on.
            s.gram = false;
            s.redo = true;
            return;
        }
        s.w = next.w;
        decrement = next.decrement;
    }
    else {
        s.w = (0,fit/* solveCoefficients */.gQ)(s.acc, { ridge: options.ridge, penalised: options.penalised });
        decrement = newtonDecrease(s.acc.R, s.w, previous, options);
    }
    s.previous = previous;
    s.iterations += 1;
    // Newton decrement: the quadratic model's decrease for the full step d = w_new - w, d^T (X^T W X + ridge E) d
    // (= ||R d||^2 + ridge ||E d||^2 from a QR factor). When it is below the tolerance the new
    // coefficients are taken without another pass (Boyd & Vandenberghe, Convex Optimization, 2004, sec. 9.5.1).
    if (s.iterations > 1 && decrement <= LOGISTIC_TOLERANCE * (Math.abs(objective) + 0.1)) {
        s.done = true;
        s.converged = true;
    }
}
/** ||R d||^2 + ridge ||E d||^2 with d = w - previous (R upper triangular, column-major p x p). */
function newtonDecrease(R, w, previous, options) {
    const p = w.length;
    let total = 0;
    for (let i = 0; i < p; i++) {
        let row = 0;
        for (let j = i; j < p; j++)
            row += R[j * p + i] * (w[j] - previous[j]);
        total += row * row;
        if (options.penalised[i])
            total += options.ridge * (w[i] - previous[i]) ** 2;
    }
    return total;
}
/** sum over penalised j of w_j^2. */
function penaltySum(w, penalised) {
    let s = 0;
    for (let j = 0; j < w.length; j++)
        if (penalised[j])
            s += w[j] * w[j];
    return s;
}
/** Zero coefficients, but the intercept (column 0 when the design has one) at logit of the mean target of the rows fitted. */
function defaultStart(design, data, problem) {
    const w = new Float64Array(design.p);
    if (!design.intercept)
        return w;
    let n = 0;
    let positives = 0;
    for (let i = 0; i < data.rows; i++) {
        if (problem.foldOf && problem.foldOf[i] === problem.exclude)
            continue;
        n += 1;
        positives += data.y[i];
    }
    const mean = (positives + 0.5) / (n + 1);
    w[0] = Math.log(mean / (1 - mean));
    return w;
}
/** {@link BlockWeights} for blocks of up to `size` rows. */
function blockWeights(size) {
    return { scale: new Float64Array(size), target: new Float64Array(size), resid: new Float64Array(size), index: new Int32Array(size) };
}
/**
 * The IRLS weights of one block of a problem's rows: {@link weightRows} without the rows of the
 * problem's excluded fold, {@link weightAllRows} when it has no folds.
 * @returns the number of rows kept (packed from 0 in `into`)
 */
function weighBlock(eta, y, start, m, problem, into) {
    const { scale, target, resid, index } = into;
    return problem.foldOf
        ? weightRows(eta, y, start, m, problem.foldOf, problem.exclude ?? -1, scale, target, resid, index)
        : weightAllRows(eta, y, start, m, scale, target, resid, index);
}
/** The deviance of the last block weighted (read right after {@link weightRows}). */
let blockDeviance = 0;
/**
 * The IRLS weights of one block: for each row kept, its index, sqrt(W), u = (y - p) / sqrt(W) and
 * sqrt(W) z = sqrt(W) eta + u, packed from 0; the block's deviance in {@link blockDeviance}.
 * @returns the number of rows kept
 */
function weightRows(eta, y, start, m, foldOf, exclude, scale, target, resid, index) {
    let r = 0;
    let dev = 0;
    for (let i = 0; i < m; i++) {
        if (foldOf[start + i] === exclude)
            continue;
        const e = eta[i];
        const yi = y[start + i];
        const x = Math.exp(-Math.abs(e));
        dev += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
        const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
        const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
        const s = Math.sqrt(w);
        scale[r] = s;
        resid[r] = (yi - pr) / s;
        target[r] = s * e + resid[r];
        index[r] = i;
        r++;
    }
    blockDeviance = dev;
    return r;
}
/** {@link weightRows} for every row of the block. */
function weightAllRows(eta, y, start, m, scale, target, resid, index) {
    let dev = 0;
    for (let i = 0; i < m; i++) {
        const e = eta[i];
        const yi = y[start + i];
        const x = Math.exp(-Math.abs(e));
        dev += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
        const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
        const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
        const s = Math.sqrt(w);
        scale[i] = s;
        resid[i] = (yi - pr) / s;
        target[i] = s * e + resid[i];
        index[i] = i;
    }
    blockDeviance = dev;
    return m;
}
/**
 * The out-of-fold deviance of k fits each made without one fold: per fold f, the deviance of the
 * rows of fold f under the coefficients of fit f, in one pass over the rows. Each row's logit is
 * summed column after column with its own fold's coefficients, as addProducts sums it, so the
 * figures are those of predicting each fold with its own fit.
 * @param foldOf fold of each row (0 .. k-1)
 * @param coefficients the k fits' coefficients, fit f made without fold f
 * @returns the deviance of each fold's rows (length k)
 */
function outOfFoldDeviance(design, data, foldOf, coefficients) {
    const k = coefficients.length;
    const p = design.p;
    const deviance = new Float64Array(k);
    const eta = new Float64Array(Math.max(1, Math.min(data.rows, 1 << 16)));
    const W = new Float64Array(p * k);
    for (let f = 0; f < k; f++)
        for (let j = 0; j < p; j++)
            W[j * k + f] = coefficients[f][j];
    (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
        eta.fill(0, 0, m);
        for (let j = 0; j < p; j++)
            addFoldColumn(eta, X, j * m, W, j * k, foldOf, start, m);
        addFoldDeviance(deviance, eta, data.y, foldOf, start, m);
    });
    return deviance;
}
/** eta[i] += X[col + i] W[base + foldOf[start + i]] for i < m. */
function addFoldColumn(eta, X, col, W, base, foldOf, start, m) {
    for (let i = 0; i < m; i++)
        eta[i] += X[col + i] * W[base + foldOf[start + i]];
}
/** deviance[foldOf[start + i]] += rowDeviance(eta[i], y[start + i]) for i < m, in row order. */
function addFoldDeviance(deviance, eta, y, foldOf, start, m) {
    for (let i = 0; i < m; i++)
        deviance[foldOf[start + i]] += rowDeviance(eta[i], y[start + i]);
}
/**
 * sqrt(W) and u = (y - p) / sqrt(W) of every row of the block (as {@link weightRows}), each
 * row's deviance added to its part's sum (`partDev[of[start + i]]`).
 */
function weightRowsByPart(eta, y, start, m, of, partDev, scale, resid) {
    for (let i = 0; i < m; i++) {
        const e = eta[i];
        const yi = y[start + i];
        const x = Math.exp(-Math.abs(e));
        partDev[of[start + i]] += 2 * (Math.log1p(x) + Math.max(e, 0) - yi * e);
        const pr = e >= 0 ? 1 / (1 + x) : x / (1 + x);
        const w = Math.max(pr * (1 - pr), MIN_WEIGHT);
        const s = Math.sqrt(w);
        scale[i] = s;
        resid[i] = (yi - pr) / s;
    }
}
/** Block-row indices grouped by part (a stable counting sort into `index`); returns the offsets of the parts (length count + 1). */
function sortByPart(of, start, m, count, index) {
    const offsets = new Int32Array(count + 1);
    for (let i = 0; i < m; i++)
        offsets[of[start + i] + 1] += 1;
    for (let q = 0; q < count; q++)
        offsets[q + 1] += offsets[q];
    const next = offsets.slice(0, count);
    for (let i = 0; i < m; i++)
        index[next[of[start + i]]++] = i;
    return offsets;
}
/** out[k] = from[rows[k]] for k < r. */
function gather(from, rows, r, out) {
    for (let k = 0; k < r; k++)
        out[k] = from[rows[k]];
}
/**
 * One row's deviance -2 [y log p + (1 - y) log(1 - p)] from eta = logit p, without overflow:
 * 2 [log(1 + exp(-|eta|)) + max(eta, 0) - y eta].
 */
function rowDeviance(eta, y) {
    return 2 * (Math.log1p(Math.exp(-Math.abs(eta))) + Math.max(eta, 0) - y * eta);
}
/** out[to + k] = scale[k] X[from + index[k]] for k < r. */
function scaleColumn(X, from, index, scale, r, out, to) {
    for (let k = 0; k < r; k++)
        out[to + k] = scale[k] * X[from + index[k]];
}


/***/ }),

/***/ 8134:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  k: () => (/* binding */ classificationFigureMetrics),
  evaluateClassifier: () => (/* binding */ evaluateClassifier)
});

// EXTERNAL MODULE: ./src/checks/index.ts + 24 modules
var src_checks = __webpack_require__(1550);
// EXTERNAL MODULE: ./src/config/data-paths.ts
var data_paths = __webpack_require__(8761);
// EXTERNAL MODULE: ./src/result/result.ts
var result = __webpack_require__(1628);
// EXTERNAL MODULE: ./src/run/base-comparison.ts
var base_comparison = __webpack_require__(5148);
// EXTERNAL MODULE: ./src/run/run-checks.ts
var run_checks = __webpack_require__(6580);
// EXTERNAL MODULE: ./src/design/blocks.ts
var blocks = __webpack_require__(7254);
// EXTERNAL MODULE: ./src/design/stats.ts
var stats = __webpack_require__(6801);
// EXTERNAL MODULE: ./src/diagnostics/column-median.ts
var column_median = __webpack_require__(8455);
// EXTERNAL MODULE: ./src/diagnostics/radix-sort.ts
var radix_sort = __webpack_require__(8459);
;// CONCATENATED MODULE: ./src/diagnostics/roc-curve.ts
/**
 * The exact ROC curve of a classifier's scores and its thinning for drawing. The curve (Fawcett,
 * "An introduction to ROC analysis", Pattern Recognition Letters 27, 2006, algorithm 1) steps
 * through the distinct scores from the highest down: at each, every row with that score turns
 * positive, so tied rows move the point diagonally, the same ties the AUC's Mann-Whitney count
 * halves. Thinning keeps the vertices of the curve's upper convex hull (the ROC convex hull,
 * Provost & Fawcett 2001, Machine Learning 42) so that the drawn curve's hull is the exact one.
 */

/**
 * The exact ROC curve of `n` rows: labels `y` in {0, 1}, `score` higher for the positive class
 * (rows whose score is NaN are left out). Both classes present: from (0, 0) to (1, 1), one point
 * per distinct score. One class missing: the diagonal (0, 0), (1, 1). Cost: two sorts of the
 * scores (radix, linear) and one merge.
 */
function rocCurve(y, score, n) {
    let np = 0;
    let nn = 0;
    for (let i = 0; i < n; i++) {
        if (Number.isNaN(score[i]))
            continue;
        if (y[i] === 1)
            np++;
        else
            nn++;
    }
    if (np === 0 || nn === 0) {
        return {
            fpr: Float64Array.of(0, 1),
            tpr: Float64Array.of(0, 1),
            score: Float64Array.of(Number.NaN, Number.NaN),
            positives: np,
            negatives: nn,
        };
    }
    const pos = new Float64Array(np);
    const neg = new Float64Array(nn);
    let a = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
        if (Number.isNaN(score[i]))
            continue;
        if (y[i] === 1)
            pos[a++] = score[i];
        else
            neg[b++] = score[i];
    }
    sortFloat64(pos);
    sortFloat64(neg);
    return mergeDescending(pos, neg);
}
/** The curve from both classes' scores, each sorted ascending. */
function mergeDescending(pos, neg) {
    const np = pos.length;
    const nn = neg.length;
    const size = np + nn + 1;
    const fpr = new Float64Array(size);
    const tpr = new Float64Array(size);
    const score = new Float64Array(size);
    score[0] = Number.NaN;
    let i = np - 1;
    let j = nn - 1;
    let tp = 0;
    let fp = 0;
    let k = 1;
    while (i >= 0 || j >= 0) {
        // The highest score left; every row of either class with it turns positive together.
        const v = j < 0 || (i >= 0 && pos[i] >= neg[j]) ? pos[i] : neg[j];
        while (i >= 0 && pos[i] === v) {
            tp++;
            i--;
        }
        while (j >= 0 && neg[j] === v) {
            fp++;
            j--;
        }
        fpr[k] = fp / nn;
        tpr[k] = tp / np;
        score[k] = v;
        k++;
    }
    return { fpr: fpr.slice(0, k), tpr: tpr.slice(0, k), score: score.slice(0, k), positives: np, negatives: nn };
}
/**
 * Indices of the vertices of the upper convex hull of the curve's points (x = fpr ascending,
 * y = tpr), first and last point included (Andrew's monotone chain, upper half; collinear points
 * left out).
 */
function upperHull(fpr, tpr) {
    const hull = [];
    for (let k = 0; k < fpr.length; k++) {
        while (hull.length >= 2) {
            const a = hull[hull.length - 2];
            const b = hull[hull.length - 1];
            // Cross product of (b - a) and (k - a): >= 0 means b is not above the chord a..k.
            const cross = (fpr[b] - fpr[a]) * (tpr[k] - tpr[a]) - (tpr[b] - tpr[a]) * (fpr[k] - fpr[a]);
            if (cross >= 0)
                hull.pop();
            else
                break;
        }
        hull.push(k);
    }
    return hull;
}
/** `count` evenly spaced entries of a sorted list of indices, its first and last kept. */
function evenlyOf(list, count) {
    if (list.length <= count)
        return [...list];
    if (count <= 1)
        return [list[0]];
    const out = [];
    for (let t = 0; t < count; t++)
        out.push(list[Math.round((t * (list.length - 1)) / (count - 1))]);
    return out;
}
/**
 * The ROC curve of {@link rocCurve} thinned as {@link thinCurve} thins it (the same points), without
 * holding the whole curve: one walk through the sorted scores counts the points and finds the
 * upper hull, a second emits the kept points. Memory: the sorted scores and the hull, not three
 * arrays of n + 1 points (a file of a million rows saves 24 MB).
 * @param max most points kept (at least 2)
 */
function thinnedRocCurve(y, score, n, max) {
    let np = 0;
    let nn = 0;
    for (let i = 0; i < n; i++) {
        if (Number.isNaN(score[i]))
            continue;
        if (y[i] === 1)
            np++;
        else
            nn++;
    }
    if (np === 0 || nn === 0) {
        return { points: 2, kept: [0, 1], fpr: [0, 1], tpr: [0, 1], score: [Number.NaN, Number.NaN], positives: np, negatives: nn };
    }
    const pos = new Float64Array(np);
    const neg = new Float64Array(nn);
    let a = 0;
    let b = 0;
    for (let i = 0; i < n; i++) {
        if (Number.isNaN(score[i]))
            continue;
        if (y[i] === 1)
            pos[a++] = score[i];
        else
            neg[b++] = score[i];
    }
    const scratch = new Uint32Array(2 * Math.max(np, nn));
    (0,radix_sort/* sortFloat64 */.f)(pos, scratch);
    (0,radix_sort/* sortFloat64 */.f)(neg, scratch);
    // First walk: the number of points and the upper hull (Andrew's monotone chain, as upperHull).
    const hull = [0];
    const hx = [0];
    const hy = [0];
    let points = 1;
    walk(pos, neg, (fpr, tpr) => {
        while (hull.length >= 2) {
            const k = hull.length - 1;
            const cross = (hx[k] - hx[k - 1]) * (tpr - hy[k - 1]) - (hy[k] - hy[k - 1]) * (fpr - hx[k - 1]);
            if (cross >= 0) {
                hull.pop();
                hx.pop();
                hy.pop();
            }
            else
                break;
        }
        hull.push(points);
        hx.push(fpr);
        hy.push(tpr);
        points++;
    });
    const kept = chooseKept(points, hull, max);
    // Second walk: the kept points.
    const out = { points, kept, fpr: [0], tpr: [0], score: [Number.NaN], positives: np, negatives: nn };
    let index = 1;
    let next = 1;
    walk(pos, neg, (fpr, tpr, v) => {
        if (next < kept.length && kept[next] === index) {
            out.fpr.push(fpr);
            out.tpr.push(tpr);
            out.score.push(v);
            next++;
        }
        index++;
    });
    return out;
}
/** Calls `visit(fpr, tpr, score)` for each point after (0, 0), from the highest score down (both lists sorted ascending). */
function walk(pos, neg, visit) {
    const np = pos.length;
    const nn = neg.length;
    let i = np - 1;
    let j = nn - 1;
    let tp = 0;
    let fp = 0;
    while (i >= 0 || j >= 0) {
        const v = j < 0 || (i >= 0 && pos[i] >= neg[j]) ? pos[i] : neg[j];
        while (i >= 0 && pos[i] === v) {
            tp++;
            i--;
        }
        while (j >= 0 && neg[j] === v) {
            fp++;
            j--;
        }
        visit(fp / nn, tp / np, v);
    }
}
/**
 * The points of a curve to draw: all of them when at most `max`; otherwise the hull vertices
 * (at most max / 2 of them, thinned evenly beyond) and points evenly spaced along the curve
 * (by index) to fill `max`, in curve order, first and last always kept.
 * @param max at least 2
 * @returns ascending indices into the curve, at most `max`
 */
function thinCurve(fpr, tpr, max) {
    return chooseKept(fpr.length, fpr.length <= max ? [] : upperHull(fpr, tpr), max);
}
/** {@link thinCurve} from the number of points and the hull's vertices. */
function chooseKept(n, hull, max) {
    if (n <= max)
        return Array.from({ length: n }, (_, i) => i);
    const keep = new Set(evenlyOf(hull, Math.max(2, Math.floor(max / 2))));
    keep.add(0);
    keep.add(n - 1);
    const room = max - keep.size;
    // Evenly spaced points along the curve; some may coincide with hull vertices, so take a few
    // more rounds with a finer step while room is left (bounded: at most 4 rounds).
    for (let round = 0, want = room; round < 4 && keep.size < max; round++, want *= 2) {
        for (let t = 1; t <= want && keep.size < max; t++)
            keep.add(Math.round((t * (n - 1)) / (want + 1)));
    }
    return [...keep].sort((u, v) => u - v);
}

// EXTERNAL MODULE: ./src/result/chart-types.ts
var chart_types = __webpack_require__(3473);
;// CONCATENATED MODULE: ./src/result/classifier-chart-types.ts
/**
 * The chart data of a binary classifier in the Result (`ModelResult.classifier_charts`): plain
 * series the HTML report draws, built by run/classifier-chart-data.ts. Every number is finite or
 * null, and every list is bounded whatever the rows: a ROC curve keeps at most
 * {@link ROC_MAX_POINTS} points, a calibration diagram has {@link CALIBRATION_BINS} bins, the
 * points of a file at most MAX_CHART_POINTS (chart-types.ts) and the probability curves at most
 * MAX_PARTIAL_CURVES, as for regression models.
 */
/** Most points kept of a ROC curve (training or hold-out); a longer curve is thinned keeping its convex hull. */
const ROC_MAX_POINTS = 300;
/** Bins of a calibration diagram: equal-width bins of the predicted probability, [0, 0.1), [0.1, 0.2), ... [0.9, 1]. */
const CALIBRATION_BINS = 10;

// EXTERNAL MODULE: ./src/run/chart-data.ts
var chart_data = __webpack_require__(2834);
;// CONCATENATED MODULE: ./src/run/classifier-chart-data.ts







/** The ROC curve of one file's rows for drawing (scores: the logits, whose order is the probabilities'). */
function rocCurveData(y, eta, rows, max = ROC_MAX_POINTS) {
    const curve = thinnedRocCurve(y, eta, rows, Math.max(2, max));
    return {
        rows,
        positives: curve.positives,
        negatives: curve.negatives,
        points: curve.points,
        thinned: curve.kept.length < curve.points,
        fpr: curve.fpr.map((v) => (0,chart_data/* chartNumber */.s6)(v) ?? 0),
        tpr: curve.tpr.map((v) => (0,chart_data/* chartNumber */.s6)(v) ?? 0),
        threshold: curve.score.map((v) => (Number.isNaN(v) ? null : (0,chart_data/* chartNumber */.s6)(1 / (1 + Math.exp(-v))))),
        hull: hullOfKept(curve.fpr, curve.tpr),
    };
}
/** Indices of the kept points on the upper hull of the kept points (the whole curve's hull when it was kept whole). */
function hullOfKept(fpr, tpr) {
    return upperHull(Float64Array.from(fpr), Float64Array.from(tpr));
}
/**
 * The calibration diagram of one file ({@link CALIBRATION_BINS} equal-width bins of p = 1 / (1 +
 * exp(-eta)), as diagnostics/classification-metrics.ts calibrationBins bins them), from the
 * logits without a second array of probabilities.
 */
function calibrationData(y, eta, rows) {
    const bins = CALIBRATION_BINS;
    const count = new Float64Array(bins);
    const sumP = new Float64Array(bins);
    const sumY = new Float64Array(bins);
    for (let i = 0; i < rows; i++) {
        const p = 1 / (1 + Math.exp(-eta[i]));
        const b = Math.min(bins - 1, Math.floor(p * bins));
        count[b] += 1;
        sumP[b] += p;
        sumY[b] += y[i];
    }
    return Array.from(count, (c, b) => ({
        from: b / bins,
        to: (b + 1) / bins,
        count: c,
        predicted: c > 0 ? (0,chart_data/* chartNumber */.s6)(sumP[b] / c) : null,
        observed: c > 0 ? (0,chart_data/* chartNumber */.s6)(sumY[b] / c) : null,
    }));
}
/** The rows of one file as points, thinned evenly (seriesPoints of chart-data.ts). */
function points(data, eta, max) {
    const keep = (0,chart_data/* thinRows */.L)(data.rows, (0,chart_data/* seriesPoints */.t3)(data.inputs.length, max));
    const thinned = keep.length < data.rows;
    return {
        rows: data.rows,
        shown: keep.length,
        thinned,
        thinning: thinned ? `${keep.length} of ${data.rows} rows, evenly spaced through the file` : '',
        lines: Array.from(keep, (i) => data.lines[i]),
        x: data.inputs.map((col) => Array.from(keep, (i) => (0,chart_data/* chartNumber */.s6)(col[i]))),
        label: Array.from(keep, (i) => (data.y[i] === 1 ? 1 : 0)),
        probability: Array.from(keep, (i) => (0,chart_data/* chartNumber */.s6)(1 / (1 + Math.exp(-eta[i])))),
    };
}
/**
 * Builds the chart data of one fitted classifier.
 * Cost: two sorts of each file's logits (ROC), one pass over each file for the calibration bins,
 * the training medians of the inputs, and at most {@link CURVE_POINTS} predictions per curve.
 * @param model the fitted classifier (design, coefficients, rows, logits, labels)
 * @param maxPoints most points per file; default MAX_CHART_POINTS (fewer for many inputs)
 */
function buildClassifierChartData(model, maxPoints = chart_types/* MAX_CHART_POINTS */.Q5) {
    const { design, fit, descriptor } = model.context;
    const { train, holdout, trainEta, holdoutEta } = model;
    const inputs = [...design.inputs];
    const medians = train.inputs.map((col) => (0,column_median/* columnMedian */.zP)(col, train.rows));
    const spread = [];
    for (let c = 0; c < inputs.length; c++) {
        const [lo, hi] = (0,stats/* range */.y1)(train.inputs[c], train.rows);
        if (hi > lo)
            spread.push(c);
    }
    const shown = spread.slice(0, chart_types/* MAX_PARTIAL_CURVES */.Ql);
    const gridPoints = inputs.length === 1 ? chart_types/* CURVE_POINTS */.M0 : (0,chart_data/* partialCurvePoints */.Y0)(shown.length);
    const curves = [];
    for (const c of shown) {
        const [tlo, thi] = (0,stats/* range */.y1)(train.inputs[c], train.rows);
        const lo = tlo - chart_types/* CURVE_MARGIN */.L0 * (thi - tlo);
        const hi = thi + chart_types/* CURVE_MARGIN */.L0 * (thi - tlo);
        // A category input is drawn at its level codes only (no margins, no points between levels).
        const discrete = design.terms.find((t) => t.discreteValues !== undefined && t.inputs.includes(inputs[c]))?.discreteValues;
        const points = discrete?.length ?? gridPoints;
        const grid = new Float64Array(points);
        if (discrete !== undefined)
            grid.set(discrete);
        else
            for (let t = 0; t < points; t++)
                grid[t] = t === points - 1 ? hi : lo + ((hi - lo) * t) / (points - 1);
        const columns = inputs.map((_, k) => (k === c ? grid : new Float64Array(points).fill(medians[k])));
        const eta = (0,blocks/* predictRows */.tp)(design, { inputs: columns, rows: points }, fit.coefficients);
        const x = [];
        const p = [];
        for (let t = 0; t < points; t++) {
            const xt = (0,chart_data/* chartNumber */.s6)(grid[t]);
            if (xt === null || (x.length > 0 && xt === x[x.length - 1]))
                continue;
            x.push(xt);
            p.push((0,chart_data/* chartNumber */.s6)(1 / (1 + Math.exp(-eta[t]))));
        }
        // Keyed by column names (user text): no prototype, so `__proto__` is a name like any other.
        const others = Object.create(null);
        inputs.forEach((name, k) => {
            if (k !== c)
                others[name] = (0,chart_data/* chartNumber */.s6)(medians[k]) ?? 0;
        });
        curves.push({ input: inputs[c], others, range: [(0,chart_data/* chartNumber */.s6)(tlo) ?? tlo, (0,chart_data/* chartNumber */.s6)(thi) ?? thi], x, p });
    }
    return {
        target: descriptor.data.target,
        positive: model.labels.positive,
        negative: model.labels.negative,
        threshold: descriptor.fit.threshold ?? 0.5,
        inputs,
        roc: { train: rocCurveData(train.y, trainEta, train.rows), holdout: rocCurveData(holdout.y, holdoutEta, holdout.rows) },
        calibration: {
            train: calibrationData(train.y, trainEta, train.rows),
            holdout: calibrationData(holdout.y, holdoutEta, holdout.rows),
        },
        train: points(train, trainEta, maxPoints),
        holdout: points(holdout, holdoutEta, maxPoints),
        curves,
        ...(spread.length > shown.length ? { curvesLeftOut: spread.length - shown.length } : {}),
    };
}

// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/data/row-source.ts
var row_source = __webpack_require__(7172);
// EXTERNAL MODULE: ./src/data/labels.ts
var data_labels = __webpack_require__(3909);
// EXTERNAL MODULE: ./src/data/data-parts.ts
var data_parts = __webpack_require__(6837);
// EXTERNAL MODULE: ./src/design/column-spread.ts
var column_spread = __webpack_require__(1552);
// EXTERNAL MODULE: ./src/fit/logistic.ts + 1 modules
var logistic = __webpack_require__(4702);
// EXTERNAL MODULE: ./src/diagnostics/complexity.ts + 1 modules
var complexity = __webpack_require__(7070);
// EXTERNAL MODULE: ./src/diagnostics/folds.ts + 1 modules
var diagnostics_folds = __webpack_require__(7694);
;// CONCATENATED MODULE: ./src/diagnostics/classifier-complexity.ts




/**
 * Rows the classifier sweep uses at most (an even-stride subsample above it): every setting is
 * k IRLS fits, so the sweep is kept to a bounded cost; 20,000 rows rank the settings well within
 * their standard errors (common practice: the curve only has to rank the settings).
 */
const CLASSIFIER_SWEEP_MAX_ROWS = 20000;
/**
 * Sweeps the classifier's complexity setting. Ridge: lambda = s x 10^t, t = 3, 2, ..., -3, with
 * s = max(current lambda, rows / 1000), plus the current lambda, largest (simplest) first, each
 * setting's fit on all the sweep's rows started from the previous one's, and its fold fits from
 * it (their first Newton step from its per-fold Grams: fit/logistic.ts, firstStepsWithout). Other
 * kinds: the settings of complexity.ts `sweepSettings` (degree, width, knots, harmonics); a
 * setting the data cannot carry is left out. Each setting: the mean of the fold log-losses and its standard error (sample
 * sd / sqrt(k)).
 * @returns null when there is nothing to sweep or fewer than 2 folds
 */
function sweepClassifier(descriptor, design, train) {
    const target = (0,complexity/* sweepTarget */.mb)(descriptor, design);
    if (target === null || train.rows < 2)
        return null;
    const rows = train.rows > CLASSIFIER_SWEEP_MAX_ROWS ? (0,complexity/* subsample */.pb)(train, CLASSIFIER_SWEEP_MAX_ROWS) : train;
    const folds = (0,diagnostics_folds/* assignFolds */.oF)(rows.rows, descriptor.fit.folds, descriptor.fit.foldOrder, descriptor.fit.seed);
    if (folds.k < 2)
        return null;
    const ridge = descriptor.fit.ridge;
    const points = [];
    if (target.kind === 'ridge') {
        const s = Math.max(ridge, rows.rows / 1000);
        const grid = [];
        for (let t = 3; t >= -3; t--)
            grid.push(s * 10 ** t);
        const lambdas = [...grid.filter((l) => l > ridge), ridge, ...grid.filter((l) => l < ridge)];
        for (const l of lambdas)
            points.push({ value: l, current: l === ridge, design, ridge: l });
    }
    else {
        const trainColumns = new Map(design.inputs.map((name, c) => [name, train.inputs[c]]));
        const swept = { kind: target.kind, term: target.term };
        for (const { value, current } of (0,complexity/* sweepSettings */._j)(design.terms[target.term].spec, swept.kind)) {
            let changed;
            try {
                changed = (0,complexity/* designAtSetting */.qZ)(design, swept, { value, current }, trainColumns, descriptor.file);
            }
            catch (error) {
                // A setting the data cannot carry (e.g. more spline knots than distinct quantiles) is left out.
                if (!(error instanceof errors/* InputError */.dz))
                    throw error;
                continue;
            }
            points.push({ value, current, design: changed, ridge });
        }
    }
    const curve = [];
    let start = null;
    for (const point of points) {
        const d = point.design;
        const options = { ridge: point.ridge, penalised: [...d.penalised] };
        // The fit on all the sweep's rows first (from the previous setting's, on the same design),
        // keeping one Gram per fold: each fold's first Newton step then needs no pass of its own.
        const [full] = (0,logistic/* fitLogistic */.Sz)(d, rows, options, [
            { parts: { of: folds.foldOf, count: folds.k }, ...(start && d === design ? { start } : {}) },
        ]);
        if (d === design)
            start = full.coefficients;
        const steps = full.parts !== null ? (0,logistic/* firstStepsWithout */.i_)(full.parts, options) : null;
        const problems = Array.from({ length: folds.k }, (_, f) => ({
            foldOf: folds.foldOf,
            exclude: f,
            ...(steps ? { firstStep: steps[f] } : { start: full.coefficients }),
        }));
        const fits = (0,logistic/* fitLogistic */.Sz)(d, rows, options, problems);
        const deviance = (0,logistic/* outOfFoldDeviance */.ic)(d, rows, folds.foldOf, fits.map((x) => x.coefficients));
        const losses = Array.from(deviance, (dv, f) => dv / 2 / folds.sizes[f]);
        const mean = losses.reduce((a, b) => a + b, 0) / losses.length;
        const variance = losses.reduce((a, b) => a + (b - mean) ** 2, 0) / (losses.length - 1);
        curve.push({ value: point.value, cvLogLoss: mean, standardError: Math.sqrt(variance / losses.length) });
    }
    const { best, chosen } = (0,complexity/* oneStandardErrorRule */.gs)(curve.map((c) => ({ mean: c.cvLogLoss, se: c.standardError })));
    return { kind: target.kind, line: target.line, current: points.findIndex((p) => p.current), points: curve, chosen, best };
}

// EXTERNAL MODULE: ./src/diagnostics/classification-metrics.ts
var classification_metrics = __webpack_require__(2266);
// EXTERNAL MODULE: ./src/diagnostics/leakage.ts
var leakage = __webpack_require__(2918);
// EXTERNAL MODULE: ./src/fit/index.ts + 2 modules
var src_fit = __webpack_require__(2450);
// EXTERNAL MODULE: ./src/core/extremes.ts
var extremes = __webpack_require__(398);
;// CONCATENATED MODULE: ./src/diagnostics/separation.ts
/**
 * Separation of a binary classifier's training rows (Albert & Anderson 1984, Biometrika 71(1),
 * "On the existence of maximum likelihood estimates in logistic regression models"): with
 * a_i = (2 y_i - 1) x_i, the rows are
 * - completely separated when some direction b gives a_i^T b > 0 for every row,
 * - quasi-completely separated when some b gives a_i^T b >= 0 for every row and > 0 for some,
 * - overlapping otherwise; only then do finite maximum-likelihood coefficients exist.
 *
 * Exact test by linear programming (the formulation of Konis 2007, "Linear programming algorithms
 * for detecting separated data in binary logistic regression models", DPhil thesis, University of
 * Oxford): maximise sum_{i in T} a_i^T b subject to a_i^T b >= 0 for every row and -1 <= b_j <= 1.
 * The optimum is positive exactly when some row of T can be separated; the rows with a_i^T b > 0
 * at the optimum are separated, and the test repeats with T = the rows not yet separated until the
 * optimum is 0. The union is the set of every separable row (the separating directions form a
 * convex cone, so the sum of those found separates all of them at once): complete separation when
 * it holds every row. Rows enter the program's constraints by cutting planes (a pass finds the rows
 * the current b violates and adds the worst), so the program stays small whatever the rows; the
 * simplex prices by Dantzig's rule and falls back to Bland's rule (no cycling on these degenerate
 * programs) when the objective stalls. On more than 4,000 rows an even-stride subset of 4,000 is
 * tested first: when its rows overlap and its design has full column rank, so do all rows (a
 * proof, not a sample estimate). Columns are scaled by their
 * largest magnitude; a_i^T b counts as positive above 1e-9 (|a_i| scaled, |b| <= 1).
 */



/** Rows added to the program per cutting-plane round, at most. */
const CUTS_PER_ROUND = 64;
/** Largest number of row constraints in the program; beyond it the test gives up (`exact: false`). */
const MAX_CUTS = 4000;
/** A scaled a_i^T b above this counts as positive; below -this as violated. */
const TOLERANCE = 1e-9;
/** Rows listed in the result, at most. */
const MAX_LISTED = 20;
/**
 * Tests the training rows for separation (see the module comment).
 * @param design the fixed design (with its intercept column, if any)
 * @param data the training rows, y in {0, 1}
 */
function findSeparation(design, data) {
    if (data.rows > SUBSAMPLE_ROWS) {
        // Overlap of a subset of rows whose design has full column rank proves overlap of all rows:
        // every b with a_i^T b >= 0 on all rows has it on the subset, hence a_i^T b = 0 there, hence b = 0.
        const sub = subsample(data, SUBSAMPLE_ROWS);
        const found = separationOf(design, sub);
        if (found.kind === 'none' && found.exact && fullColumnRank(design, sub))
            return found;
    }
    return separationOf(design, data);
}
/** Rows of the even-stride subset tried first on large data. */
const SUBSAMPLE_ROWS = 4000;
/** Every (n / m)-th row. */
function subsample(data, m) {
    const n = data.rows;
    const pick = (col, out) => {
        for (let t = 0; t < m; t++)
            out[t] = col[Math.floor((t * n) / m)];
        return out;
    };
    return {
        inputs: data.inputs.map((c) => pick(c, new Float64Array(m))),
        y: pick(data.y, new Float64Array(m)),
        rows: m,
        lines: pick(data.lines, new Int32Array(m)),
    };
}
/** Whether the design of these rows has rank p (the scaled-spectrum rule of the QR engine). */
function fullColumnRank(design, data) {
    const acc = new src_fit/* QrAccumulator */.SC(design.p);
    const zeros = new Float64Array(Math.max(1, Math.min(data.rows, 1 << 16)));
    (0,blocks/* forEachBlock */.aN)(design, data, (X, _start, m) => acc.addRows(X, zeros, m));
    return (0,src_fit/* fitFactor */.Ps)(acc).rank === design.p;
}
/** The test on all of `data`'s rows (see the module comment). */
function separationOf(design, data) {
    const p = design.p;
    const n = data.rows;
    const none = { kind: 'none', separatedRows: 0, lines: [], columns: [], direction: new Array(p).fill(0), exact: true };
    if (p === 0 || n === 0)
        return none;
    const scale = new Float64Array(p);
    (0,blocks/* forEachBlock */.aN)(design, data, (X, _start, m) => {
        for (let j = 0; j < p; j++)
            for (let i = 0; i < m; i++)
                scale[j] = Math.max(scale[j], Math.abs(X[j * m + i]));
    });
    for (let j = 0; j < p; j++)
        if (!(scale[j] > 0) || !Number.isFinite(scale[j]))
            scale[j] = 1;
    const separated = new Uint8Array(n);
    const total = new Float64Array(p);
    let exact = true;
    let count = 0;
    const cuts = [];
    for (let round = 0; round < n + 1; round++) {
        // Objective: the sum of a_i over the rows not yet separated.
        const c = new Float64Array(p);
        (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
            for (let i = 0; i < m; i++) {
                if (separated[start + i])
                    continue;
                const sign = 2 * data.y[start + i] - 1;
                for (let j = 0; j < p; j++)
                    c[j] += (sign * X[j * m + i]) / scale[j];
            }
        });
        const solved = solveWithCuts(design, data, scale, c, cuts);
        if (!solved.exact)
            exact = false;
        const b = solved.b;
        let found = 0;
        (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
            for (let i = 0; i < m; i++) {
                if (separated[start + i])
                    continue;
                if (rowValue(X, m, i, p, b, scale, 2 * data.y[start + i] - 1) > TOLERANCE) {
                    separated[start + i] = 1;
                    found += 1;
                }
            }
        });
        if (found === 0)
            break;
        count += found;
        for (let j = 0; j < p; j++)
            total[j] += b[j];
        if (count === n || !solved.exact)
            break;
    }
    if (count === 0)
        return { ...none, exact };
    const lines = [];
    for (let i = 0; i < n && lines.length < MAX_LISTED; i++)
        if (separated[i])
            lines.push(data.lines[i]);
    const big = (0,extremes/* maxOf */._)(Array.from(total, Math.abs));
    const columns = [];
    const direction = [];
    for (let j = 0; j < p; j++) {
        const v = total[j] / big;
        if (Math.abs(v) > 1e-6)
            columns.push(j);
        direction.push(Math.abs(v) > 1e-6 ? v / scale[j] : 0);
    }
    return { kind: count === n ? 'complete' : 'quasi-complete', separatedRows: count, lines, columns, direction, exact };
}
/** (2y - 1) x_i^T b with x scaled column by column. */
function rowValue(X, m, i, p, b, scale, sign) {
    let s = 0;
    for (let j = 0; j < p; j++)
        s += (X[j * m + i] / scale[j]) * b[j];
    return sign * s;
}
/**
 * Maximises c^T b over -1 <= b <= 1 and a_i^T b >= 0 for every row, adding violated rows to
 * `cuts` (kept between calls: a cut stays valid) until the solution violates none.
 */
function solveWithCuts(design, data, scale, c, cuts) {
    const p = design.p;
    // Each round adds at least one cut or returns, and the cuts are capped: at most MAX_CUTS rounds.
    for (let round = 0; round <= MAX_CUTS; round++) {
        const b = simplexMax(c, cuts, p);
        const worst = [];
        (0,blocks/* forEachBlock */.aN)(design, data, (X, start, m) => {
            for (let i = 0; i < m; i++) {
                const sign = 2 * data.y[start + i] - 1;
                const v = rowValue(X, m, i, p, b, scale, sign);
                if (v >= -TOLERANCE)
                    continue;
                if (worst.length === CUTS_PER_ROUND && v >= worst[worst.length - 1].value)
                    continue;
                const row = new Float64Array(p);
                for (let j = 0; j < p; j++)
                    row[j] = (sign * X[j * m + i]) / scale[j];
                worst.push({ value: v, row });
                worst.sort((a, z) => a.value - z.value);
                if (worst.length > CUTS_PER_ROUND)
                    worst.pop();
            }
        });
        if (worst.length === 0)
            return { b, exact: true };
        if (cuts.length + worst.length > MAX_CUTS)
            return { b: new Float64Array(p), exact: false };
        for (const w of worst)
            cuts.push(w.row);
    }
    return { b: new Float64Array(p), exact: false };
}
/**
 * Dense tableau simplex for max c^T b, -1 <= b_j <= 1, a^T b >= 0 for each a in `rows`, with
 * b = u - v (u, v >= 0, u_j + v_j <= 1): every right-hand side is 0 or 1, so the origin is a
 * feasible start (no phase one). Dantzig's rule (the most negative reduced cost enters) while the
 * objective rises; after 50 pivots without a rise, Bland's rule (the lowest-index improving column
 * enters, the lowest-index basic variable among ratio ties leaves), which cannot cycle. At most
 * 100,000 pivots.
 */
function simplexMax(c, rows, p) {
    const r = rows.length;
    const mRows = r + p;
    const nVars = 2 * p;
    const cols = nVars + mRows + 1; // variables, slacks, right-hand side
    const T = new Float64Array((mRows + 1) * cols);
    const basis = new Int32Array(mRows);
    for (let k = 0; k < r; k++) {
        // -a^T (u - v) <= 0
        const a = rows[k];
        for (let j = 0; j < p; j++) {
            T[k * cols + j] = -a[j];
            T[k * cols + p + j] = a[j];
        }
    }
    for (let j = 0; j < p; j++) {
        const k = r + j;
        T[k * cols + j] = 1;
        T[k * cols + p + j] = 1;
        T[k * cols + cols - 1] = 1;
    }
    for (let k = 0; k < mRows; k++) {
        T[k * cols + nVars + k] = 1;
        basis[k] = nVars + k;
    }
    const z = mRows * cols;
    for (let j = 0; j < p; j++) {
        T[z + j] = -c[j];
        T[z + p + j] = c[j];
    }
    const nonZero = new Int32Array(cols);
    const eps = 1e-12;
    let stalled = 0;
    let objective = 0;
    for (let iter = 0; iter < 100000; iter++) {
        // Dantzig's rule (most negative reduced cost) while the objective rises; Bland's rule after
        // 50 pivots without a rise, which cannot cycle.
        const bland = stalled > 50;
        let enter = -1;
        let most = -eps;
        for (let j = 0; j < cols - 1; j++) {
            if (T[z + j] < most) {
                enter = j;
                if (bland)
                    break;
                most = T[z + j];
            }
        }
        if (enter < 0)
            break;
        let leave = -1;
        let best = Number.POSITIVE_INFINITY;
        for (let k = 0; k < mRows; k++) {
            const a = T[k * cols + enter];
            if (a <= eps)
                continue;
            const ratio = T[k * cols + cols - 1] / a;
            if (ratio < best - 1e-15 || (Math.abs(ratio - best) <= 1e-15 && basis[k] < basis[leave])) {
                best = ratio;
                leave = k;
            }
        }
        if (leave < 0)
            break; // unbounded cannot happen (every variable is bounded)
        const pivot = T[leave * cols + enter];
        for (let j = 0; j < cols; j++)
            T[leave * cols + j] /= pivot;
        // Only the pivot row's non-zero entries change the other rows (most of its slack part is zero).
        let nnz = 0;
        for (let j = 0; j < cols; j++)
            if (T[leave * cols + j] !== 0)
                nonZero[nnz++] = j;
        for (let k = 0; k <= mRows; k++) {
            if (k === leave)
                continue;
            const f = T[k * cols + enter];
            if (f === 0)
                continue;
            eliminate(T, k * cols, leave * cols, f, nonZero, nnz);
        }
        basis[leave] = enter;
        const now = T[z + cols - 1];
        stalled = now > objective + 1e-12 ? 0 : stalled + 1;
        objective = Math.max(objective, now);
    }
    const x = new Float64Array(nVars);
    for (let k = 0; k < mRows; k++)
        if (basis[k] < nVars)
            x[basis[k]] = T[k * cols + cols - 1];
    const b = new Float64Array(p);
    for (let j = 0; j < p; j++)
        b[j] = x[j] - x[p + j];
    return b;
}
/** T[row + j] -= f T[pivot + j] for the pivot row's non-zero columns j = nonZero[t], t < nnz. */
function eliminate(T, row, pivot, f, nonZero, nnz) {
    for (let t = 0; t < nnz; t++) {
        const j = nonZero[t];
        T[row + j] -= f * T[pivot + j];
    }
}

// EXTERNAL MODULE: ./src/run/plan.ts + 1 modules
var run_plan = __webpack_require__(7143);
;// CONCATENATED MODULE: ./src/run/fit-classifier.ts













/**
 * Largest estimated CSV text of a classifier's training file (data/row-source.ts estimates it):
 * 512 MiB, the default file cap, so classifiers within the defaults are unaffected.
 */
const CLASSIFIER_MAX_BYTES = 512 * 1024 * 1024;
/**
 * Loads, fits and scores one classifier.
 * @throws InputError for bad data or labels, a design over the caps, or shipped coefficients of the wrong length
 */
async function fitClassifier(repo, descriptor, settings) {
    // Classifiers are held in memory (their fit makes several passes of its own): a file above the
    // default file cap is refused plainly rather than left to run out of memory.
    const { train: file, trainParts } = descriptor.data;
    if ((0,row_source/* streamsTrainingData */.yK)(await (0,row_source/* trainingFileSizes */.RC)(repo, file, trainParts), CLASSIFIER_MAX_BYTES)) {
        throw new errors/* InputError */.dz('too-large-to-hold', `${trainParts === undefined ? 'the training file' : `the ${trainParts.length} training parts`} ${(0,errors/* clip */.$Q)(trainParts === undefined ? file : (0,data_parts/* partsLabel */.xq)(trainParts))} ${trainParts === undefined ? 'is' : 'are'} estimated at over ${CLASSIFIER_MAX_BYTES / (1024 * 1024)} MiB of CSV text; a classifier's rows are held in memory and files this large are read as a stream for regression models only; expected a smaller training file`, { file: descriptor.file, line: descriptor.data.lines.train, key: 'data.train' });
    }
    let labels = null;
    const plan = await (0,run_plan/* planModel */.B7)(repo, descriptor, settings, async (r, d, inputs, s) => {
        const tables = await (0,data_labels/* loadClassifierData */.W)(r, d, inputs, s);
        labels = tables.labels;
        return tables;
    });
    const { design, tables, folds } = plan;
    const { train, holdout } = tables;
    const options = { ridge: descriptor.fit.ridge, penalised: [...design.penalised] };
    const spread = new column_spread/* ColumnSpread */.W(design.p);
    // With folds, each pass also keeps one Gram per fold, so that the folds' first Newton steps need no pass of their own.
    const parts = folds.k >= 2 ? { of: folds.foldOf, count: folds.k } : undefined;
    // The factor pass at the returned coefficients also leaves the training rows' logits and takes the columns' spread.
    const trainEta = new Float64Array(train.rows);
    const [fit] = (0,logistic/* fitLogistic */.Sz)(design, train, options, [
        { start: warmStart(design, train, options), parts, factor: true, eta: trainEta, onBlock: (X, _start, m) => spread.add(X, m) },
    ]);
    const columnSd = spread.sd();
    const weighted = weightedDiagnostics(fit, design.p, options);
    const holdoutEta = (0,blocks/* predictRows */.tp)(design, holdout, fit.coefficients);
    const threshold = descriptor.fit.threshold ?? 0.5;
    const trainP = (0,classification_metrics/* probabilities */.gt)(trainEta);
    const holdoutP = (0,classification_metrics/* probabilities */.gt)(holdoutEta);
    const trainFigures = (0,classification_metrics/* classificationFigures */["if"])(train.y, trainEta, trainP, train.rows, threshold);
    const holdoutFigures = (0,classification_metrics/* classificationFigures */["if"])(holdout.y, holdoutEta, holdoutP, holdout.rows, threshold);
    const separation = findSeparation(design, train);
    // Without a penalty, separated rows have no finite maximum-likelihood coefficients (Albert &
    // Anderson 1984): the stopping rule is then met only because the objective approaches 0 as the
    // coefficients grow, so neither the fit nor its folds count as converged.
    const unbounded = options.ridge === 0 && separation.kind !== 'none';
    return {
        context: {
            descriptor,
            design,
            fit: unbounded ? { ...fit, converged: false } : fit,
            weighted,
            train: trainFigures,
            holdout: holdoutFigures,
            calibration: (0,classification_metrics/* calibration */.xD)(holdout.y, holdoutEta, holdout.rows),
            crossValidation: crossValidateClassifier(design, train, folds, fit, options, unbounded),
            separation,
            shipped: shippedClassifier(descriptor, design, train, holdout, fit, trainEta, holdoutEta),
            columnSd,
            leakage: leakageOf(train, holdout),
            ...(train.parts !== undefined ? { trainSource: { file: train.file, parts: train.parts } } : {}),
            complexity: sweepClassifier(descriptor, design, train),
        },
        labels: labels,
        train,
        holdout,
        trainEta,
        holdoutEta,
        folds,
        charts: {
            rocTrain: (0,classification_metrics/* rocPoints */.MP)(train.y, trainP, train.rows),
            rocHoldout: (0,classification_metrics/* rocPoints */.MP)(holdout.y, holdoutP, holdout.rows),
            calibration: (0,classification_metrics/* calibrationBins */.N0)(holdout.y, holdoutP, holdout.rows),
        },
    };
}
/**
 * Rank and conditioning of the weighted design sqrt(W) X at the fit's coefficients: from the
 * Cholesky factor of its Gram when the fit has one (fit/gram-step.ts, gramFactor), else from its
 * QR factor (fit/index.ts, fitFactor).
 */
function weightedDiagnostics(fit, p, options) {
    if (fit.weightedR !== null)
        return (0,src_fit/* factorDiagnostics */._z)(fit.weightedR, p, fit.rows);
    if (fit.weightedFactor === null)
        throw new Error('fitLogistic: the weighted factor asked for is missing');
    return (0,src_fit/* fitFactor */.Ps)(fit.weightedFactor, options);
}
/** Above this many training rows the full fit starts from the fit of an even-stride subset of this many rows. */
const WARM_START_ROWS = 50000;
/**
 * Starting coefficients for the full fit: on large data, the fit of an even-stride subset of
 * {@link WARM_START_ROWS} rows with the penalty scaled to its share of the rows (the optimum is
 * the full fit's, from wherever Newton's method starts; a near start saves whole passes over the
 * rows). Undefined (the default start) on smaller data.
 */
function warmStart(design, train, options) {
    const n = train.rows;
    const m = WARM_START_ROWS;
    if (n <= 2 * m)
        return undefined;
    const pick = (col) => {
        const out = new Float64Array(m);
        for (let t = 0; t < m; t++)
            out[t] = col[Math.floor((t * n) / m)];
        return out;
    };
    const sub = { inputs: train.inputs.map(pick), y: pick(train.y), rows: m };
    const [fit] = (0,logistic/* fitLogistic */.Sz)(design, sub, { ...options, ridge: (options.ridge * m) / n }, [{}]);
    return fit.coefficients.every(Number.isFinite) ? fit.coefficients : undefined;
}
/**
 * k-fold cross-validation: the fit without each fold (the same terms, fixed from all training
 * rows, and the same ridge), started from the full fit, all folds in shared passes; the pooled
 * log-loss of the out-of-fold probabilities. Null below 2 folds. When the full fit kept its
 * per-fold Grams (`full.parts`, one part per fold), each fold's first Newton step is solved
 * from them without a pass (fit/logistic.ts, firstStepsWithout); the optimum is the same.
 * With `unbounded` (ridge 0 and separated training rows: no finite optimum) the fold fits are
 * reported as not converged, whatever the stopping rule said: their log-loss is where the
 * iterations stopped on the way to infinite coefficients (on completely separated rows it tends
 * to 0, the out-of-fold rows being separated by the same direction).
 */
function crossValidateClassifier(design, train, folds, full, options, unbounded = false) {
    const k = folds.k;
    if (k < 2)
        return null;
    const steps = full.parts !== null && full.parts.grams.length === k ? (0,logistic/* firstStepsWithout */.i_)(full.parts, options) : null;
    const problems = Array.from({ length: k }, (_, f) => ({
        foldOf: folds.foldOf,
        exclude: f,
        start: full.coefficients,
        ...(steps ? { firstStep: steps[f] } : {}),
    }));
    const fits = (0,logistic/* fitLogistic */.Sz)(design, train, options, problems);
    const foldDeviance = (0,logistic/* outOfFoldDeviance */.ic)(design, train, folds.foldOf, fits.map((x) => x.coefficients));
    let total = 0;
    for (let f = 0; f < k; f++)
        total += foldDeviance[f];
    return {
        k,
        logLoss: total / 2 / train.rows,
        foldLogLoss: Array.from(foldDeviance, (d, f) => d / 2 / folds.sizes[f]),
        foldRows: [...folds.sizes],
        converged: !unbounded && fits.every((x) => x.converged),
    };
}
/** The shipped coefficients' probabilities against the refit's; null when the descriptor ships none. */
function shippedClassifier(descriptor, design, train, holdout, fit, trainEta, holdoutEta) {
    const shipped = descriptor.coefficients;
    if (shipped === null)
        return null;
    if (shipped.length !== design.p) {
        throw new errors/* InputError */.dz('coefficients-length', `\`coefficients\` has ${shipped.length} values but the terms build ${design.p} columns (${design.columnNames.slice(0, 12).join(', ')}${design.p > 12 ? ', …' : ''}); expected one value per column, intercept first`, { file: descriptor.file, line: descriptor.coefficientsLine ?? undefined, key: 'coefficients' });
    }
    let maxP = 0;
    const losses = [];
    for (const [data, refit] of [
        [train, trainEta],
        [holdout, holdoutEta],
    ]) {
        const eta = (0,blocks/* predictRows */.tp)(design, data, shipped);
        let dev = 0;
        for (let i = 0; i < data.rows; i++) {
            const d = Math.abs(1 / (1 + Math.exp(-eta[i])) - 1 / (1 + Math.exp(-refit[i])));
            if (d > maxP || Number.isNaN(d))
                maxP = d;
            dev += (0,logistic/* rowDeviance */.ul)(eta[i], data.y[i]);
        }
        losses.push(dev / 2 / data.rows);
    }
    let maxW = 0;
    for (let j = 0; j < design.p; j++)
        maxW = Math.max(maxW, Math.abs(shipped[j] - fit.coefficients[j]));
    return { maxProbabilityDifference: maxP, maxCoefficientDifference: maxW, trainLogLoss: losses[0], holdoutLogLoss: losses[1] };
}
function leakageOf(train, holdout) {
    const found = (0,leakage/* findLeakage */.Gw)(train, holdout);
    return {
        duplicates: found.fullMatches,
        examples: found.holdoutLines.map((line, i) => {
            if (train.parts === undefined && holdout.parts === undefined)
                return { holdoutLine: line, trainLine: found.trainLines[i] };
            // Read from parts: each part's own line and its file.
            const h = (0,data_parts/* placeOfLine */.xX)(holdout, line);
            const t = (0,data_parts/* placeOfLine */.xX)(train, found.trainLines[i]);
            return { holdoutLine: h.line, trainLine: t.line, holdoutFile: h.file, trainFile: t.file };
        }),
    };
}

// EXTERNAL MODULE: ./src/diagnostics/regression-metrics.ts
var regression_metrics = __webpack_require__(155);
;// CONCATENATED MODULE: ./src/run/evaluate-classifier.ts
/**
 * One binary classifier from descriptor to outcome: fit and score it (fit-classifier.ts), run
 * every check of the registry with its classifier measure (checks that apply to regression only
 * are skipped with `<id>/not-for-classification`), and build its part of the Result.
 */









/**
 * The report keys of a classifier's figures on both files, shared by models of terms and models
 * trained elsewhere: log-loss, Brier score, accuracy at the threshold, ROC AUC and class counts.
 * @param threshold `fit.threshold` (default 0.5)
 */
function classificationFigureMetrics(train, holdout, threshold) {
    const n = (x) => (0,result/* jsonNumber */.qj)(x);
    return {
        train_log_loss: n(train.logLoss),
        holdout_log_loss: n(holdout.logLoss),
        train_brier: n(train.brier),
        holdout_brier: n(holdout.brier),
        train_accuracy: n(train.accuracy),
        holdout_accuracy: n(holdout.accuracy),
        train_auc: n(train.auc),
        holdout_auc: n(holdout.auc),
        threshold,
        train_positives: train.positives,
        train_negatives: train.negatives,
        holdout_positives: holdout.positives,
        holdout_negatives: holdout.negatives,
    };
}
/**
 * The report's metrics of a classifier: the training and hold-out figures, calibration, class
 * counts and the fit's convergence; the checks add theirs (gap ratio, CV log-loss...). The
 * regression keys (RMSE, MAE, R^2) are null: they do not apply.
 */
function classifierMetrics(model) {
    const { train, holdout, fit, design, weighted } = model.context;
    const n = (x) => (0,result/* jsonNumber */.qj)(x);
    return {
        task: 'classification',
        train_rmse: null,
        holdout_rmse: null,
        train_mae: null,
        holdout_mae: null,
        train_r2: null,
        holdout_r2: null,
        gap_ratio: n((0,regression_metrics/* gapRatio */.yr)(train.logLoss, holdout.logLoss)),
        params_per_sample: n(design.p / train.rows),
        max_std_coefficient: null,
        max_std_coefficient_column: null,
        max_abs_coefficient: n((0,extremes/* maxOf */._)(Array.from(fit.coefficients, Math.abs), 0)),
        rank: weighted.rank,
        condition_number: n(weighted.conditionNumberScaled),
        ...classificationFigureMetrics(train, holdout, model.context.descriptor.fit.threshold ?? 0.5),
        positive_label: model.labels.positive,
        negative_label: model.labels.negative,
        fit_iterations: fit.iterations,
        fit_converged: fit.converged ? 1 : 0,
        deviance: n(fit.deviance),
    };
}
/**
 * Fits one classifier and runs every check on it. Errors are handled by the caller
 * (evaluate.ts), as for regression models.
 */
async function evaluateClassifier(repo, descriptor, settings, base) {
    const model = await fitClassifier(repo, descriptor, settings);
    const baseMatch = base?.matches.get(descriptor.file) ?? null;
    const context = { ...model.context, baseline: baseMatch?.model ?? null };
    const metrics = classifierMetrics(model);
    const { checks, verdict } = (0,run_checks/* runChecks */.J)(src_checks/* CHECKS */.ui, (check) => (0,src_checks/* runClassifierCheck */.Rc)(check, context), metrics);
    return {
        name: descriptor.name,
        descriptor: descriptor.file,
        verdict,
        rows: { train: model.train.rows, holdout: model.holdout.rows },
        ...(0,data_paths/* dataFilesField */.IJ)(descriptor.data),
        ...(model.train.dropped !== undefined ? { dropped: { train: model.train.dropped, holdout: model.holdout.dropped ?? 0 } } : {}),
        parameters: model.context.design.p,
        columns: [...model.context.design.columnNames],
        metrics,
        coefficients: Array.from(model.context.fit.coefficients, result/* jsonNumber */.qj),
        shipped: null,
        checks,
        ...(base ? { base: (0,base_comparison/* compareWithBase */.te)(metrics, baseMatch, base.commit) } : {}),
        error: null,
        extra: {
            task: 'classification',
            labels: model.labels,
            roc: { train: model.charts.rocTrain, holdout: model.charts.rocHoldout },
            calibration_bins: model.charts.calibration.map((b) => ({
                from: b.from,
                to: b.to,
                count: b.count,
                predicted: (0,result/* jsonNumber */.qj)(b.predicted),
                observed: (0,result/* jsonNumber */.qj)(b.observed),
            })),
            terms: model.context.design.terms.map((t, i) => ({
                kind: t.spec.kind,
                line: t.spec.line,
                first_column: model.context.design.termOffsets[i],
                columns: t.columnNames.length,
                fixed: t.fixed,
            })),
        },
        classifier_charts: buildClassifierChartData(model),
    };
}


/***/ })

};
