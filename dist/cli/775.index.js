export const id = 775;
export const ids = [775];
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

/***/ 8775:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  explainChecks: () => (/* binding */ explainChecks)
});

// EXTERNAL MODULE: ./src/checks/index.ts + 23 modules
var checks = __webpack_require__(6903);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/core/nearest.ts
var nearest = __webpack_require__(761);
// EXTERNAL MODULE: ./src/core/links.ts
var links = __webpack_require__(4982);
// EXTERNAL MODULE: ./src/core/extremes.ts
var extremes = __webpack_require__(398);
;// CONCATENATED MODULE: ./src/report/explain.ts



/** The explanation of one check, ending with a line break. */
function formatExplanation(check) {
    const direction = check.direction === 'above' ? 'a ceiling: the figure fails above its limit' : 'a floor: the figure fails below its limit';
    return [
        `${check.id}: ${check.title}`,
        '',
        `Limit key \`${check.limitKey}\` (${direction}). ${check.limitSummary}`,
        '',
        check.description,
        '',
        `What to change: ${check.advice}`,
        '',
        `Source: src/checks/${check.id}.ts`,
        `Docs: ${(0,links/* checkDocsUrl */.z)(check.id)}`,
        '',
    ].join('\n');
}
/** Every check's id, limit key and title, one per line, in report order. */
function formatCheckList() {
    const width = (0,extremes/* maxOf */._)(checks/* CHECKS */.ui.map((c) => c.id.length));
    const keyWidth = (0,extremes/* maxOf */._)(checks/* CHECKS */.ui.map((c) => c.limitKey.length));
    return `${checks/* CHECKS */.ui.map((c) => `${c.id.padEnd(width)}  ${c.limitKey.padEnd(keyWidth)}  ${c.title}`).join('\n')}\n`;
}

;// CONCATENATED MODULE: ./src/entries/explain-command.ts
/**
 * `fitgate explain [check-id...]`: prints each named check's explanation (by id or limit key);
 * with no id, the list of checks. An unknown id is a usage mistake (status 2) with the nearest
 * id as a suggestion.
 */




/** What to print and the exit status: 0 every id known, 2 one was not. */
function explainChecks(ids) {
    if (ids.length === 0)
        return { text: formatCheckList(), status: 0 };
    const parts = [];
    for (const id of ids) {
        const check = (0,checks/* findCheck */.Sd)(id) ?? checks/* CHECKS */.ui.find((c) => c.limitKey === id);
        if (check === undefined) {
            const near = (0,nearest/* nearestWord */.z)(id, [...checks/* CHECKS */.ui.map((c) => c.id), ...checks/* CHECKS */.ui.map((c) => c.limitKey)]);
            const hint = near !== null ? ` (did you mean '${near}'?)` : '';
            return { text: `error: unknown check ${(0,errors/* quoteValue */.cl)(id, 60)}${hint}\n(run \`fitgate explain\` for the list of checks)\n`, status: 2 };
        }
        parts.push(formatExplanation(check));
    }
    return { text: parts.join('\n'), status: 0 };
}


/***/ })

};
