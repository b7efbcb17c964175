export const id = 627;
export const ids = [627];
export const modules = {

/***/ 5627:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   runToolCommand: () => (/* binding */ runToolCommand)
/* harmony export */ });
/**
 * Runs one of the tool commands. Errors (InputError and others) propagate to the entry, which
 * prints them as for `check` (exit status 2).
 */
async function runToolCommand(parsed) {
    if (parsed.kind === 'explain') {
        const { explainChecks } = await __webpack_require__.e(/* import() */ 775).then(__webpack_require__.bind(__webpack_require__, 8775));
        const { text, status } = explainChecks(parsed.ids);
        return status === 0 ? { stdout: text, stderr: '', status } : { stdout: '', stderr: text, status };
    }
    if (parsed.kind === 'init') {
        const { runInit } = await __webpack_require__.e(/* import() */ 739).then(__webpack_require__.bind(__webpack_require__, 9739));
        return runInit(parsed);
    }
    const { runRefit } = await __webpack_require__.e(/* import() */ 301).then(__webpack_require__.bind(__webpack_require__, 7301));
    return runRefit(parsed);
}


/***/ })

};
