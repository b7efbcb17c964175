export const id = 502;
export const ids = [502];
export const modules = {

/***/ 9502:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   MAX_WALK_ENTRIES: () => (/* binding */ MAX_WALK_ENTRIES),
/* harmony export */   WALK_TOO_LARGE: () => (/* binding */ WALK_TOO_LARGE),
/* harmony export */   walkTree: () => (/* binding */ walkTree)
/* harmony export */ });
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(3024);
/* harmony import */ var node_fs__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(4296);
/* harmony import */ var _repo_path_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(3856);
/**
 * The walk of a folder on disk that finds the descriptors a settings file's `models` patterns
 * match. It never leaves the repository: a folder is entered only while a pattern could still
 * match below it (so `node_modules`, `.git` and dot folders only when a pattern names them), a
 * symbolic link to a folder is never followed (it is reported instead when a pattern would
 * search below it, so that nothing is skipped in silence), and every entry counts against a cap.
 */




/** Most folder entries one walk may look at (a pattern that reaches further is refused). */
const MAX_WALK_ENTRIES = 1_000_000;
/** Code of a walk over {@link MAX_WALK_ENTRIES}. */
const WALK_TOO_LARGE = 'glob-too-large';
/**
 * Walks `rootReal` for entries the patterns match.
 *
 * @param rootReal the repository root's real path (absolute, links resolved)
 * @param patterns the compiled `models` patterns
 * @param maxEntries most entries looked at; default {@link MAX_WALK_ENTRIES}
 * @throws InputError `glob-too-large` past `maxEntries`, `file-unreadable` for a folder that cannot be listed
 */
function walkTree(rootReal, patterns, maxEntries = MAX_WALK_ENTRIES) {
    const paths = [];
    const notEntered = [];
    /** Folders still to list: repository path, absolute path, pattern state. */
    const todo = [{ rel: '', abs: rootReal, state: patterns.start }];
    let seen = 0;
    while (todo.length > 0) {
        const folder = todo.pop();
        let entries;
        try {
            entries = (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.readdirSync)(folder.abs, { withFileTypes: true });
        }
        catch (error) {
            const code = codeOf(error);
            if (code === 'ENOENT' || code === 'ENOTDIR')
                continue; // gone while the walk ran
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(_repo_path_js__WEBPACK_IMPORTED_MODULE_3__/* .FILE_UNREADABLE */ .FP, `the folder cannot be listed (${code ?? 'error'}) while searching for descriptors; expected a readable folder`, { file: folder.rel === '' ? '.' : folder.rel });
        }
        for (const entry of entries) {
            seen += 1;
            if (seen > maxEntries) {
                throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .InputError */ .dz(WALK_TOO_LARGE, `the \`models\` patterns reach more than ${maxEntries} files and folders; expected patterns that name the folders holding descriptors (e.g. models/**/*.model.yml)`, {});
            }
            const name = entry.name;
            const rel = folder.rel === '' ? name : `${folder.rel}/${name}`;
            const state = patterns.step(folder.state, name);
            if (entry.isDirectory()) {
                if (patterns.alive(state))
                    todo.push({ rel, abs: node_path__WEBPACK_IMPORTED_MODULE_1__.join(folder.abs, name), state });
                continue;
            }
            const accepted = patterns.accepts(state);
            const alive = patterns.alive(state);
            if (!accepted && !alive)
                continue;
            if (entry.isSymbolicLink() && leadsToFolder(node_path__WEBPACK_IMPORTED_MODULE_1__.join(folder.abs, name))) {
                // A link to a folder is never followed (its target may be anywhere): reported when a
                // pattern would search below it, never a match (a folder is not a descriptor).
                if (alive)
                    notEntered.push(rel);
                continue;
            }
            // Files, and links to anything else (the reader checks where they lead when it reads them).
            if (accepted)
                paths.push(rel);
        }
    }
    return { paths: paths.sort(), notEntered: notEntered.sort() };
}
/** True when the link at `abs` leads to a folder (its status only is looked at, never its contents). */
function leadsToFolder(abs) {
    try {
        return (0,node_fs__WEBPACK_IMPORTED_MODULE_0__.statSync)(abs).isDirectory();
    }
    catch {
        return false;
    }
}
function codeOf(error) {
    return error !== null && typeof error === 'object' && 'code' in error ? String(error.code) : undefined;
}


/***/ })

};
