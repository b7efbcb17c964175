export const id = 823;
export const ids = [823];
export const modules = {

/***/ 4823:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   ACTION_FETCH_HINT: () => (/* binding */ ACTION_FETCH_HINT),
/* harmony export */   CLI_FETCH_HINT: () => (/* binding */ CLI_FETCH_HINT),
/* harmony export */   evaluateBase: () => (/* binding */ evaluateBase)
/* harmony export */ });
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(1455);
/* harmony import */ var node_fs_promises__WEBPACK_IMPORTED_MODULE_0___default = /*#__PURE__*/__webpack_require__.n(node_fs_promises__WEBPACK_IMPORTED_MODULE_0__);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(6760);
/* harmony import */ var node_path__WEBPACK_IMPORTED_MODULE_1___default = /*#__PURE__*/__webpack_require__.n(node_path__WEBPACK_IMPORTED_MODULE_1__);
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(4296);
/* harmony import */ var _run_base_comparison_js__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(5148);
/* harmony import */ var _run_pipeline_js__WEBPACK_IMPORTED_MODULE_4__ = __webpack_require__(5141);
/* harmony import */ var _repo_git_repository_js__WEBPACK_IMPORTED_MODULE_5__ = __webpack_require__(4029);
/**
 * Evaluates every model as it was on a base commit, read with git from that commit (settings
 * file, descriptors and data alike), so that the head run can compare with it. Used by the
 * action on pull requests and by `fitgate check --base <ref>`. A base that cannot be read or
 * checked never stops the head run: it becomes one note.
 */






/** Hint for the action: how to make the base commit available. */
const ACTION_FETCH_HINT = 'fetch it with `fetch-depth: 2` on actions/checkout (a pull_request checkout is the merge commit, whose first parent is the base). Models are not compared with the base branch in this run.';
/** Hint for the command line. */
const CLI_FETCH_HINT = 'fetch it (for example `git fetch origin <branch>`) or name a commit that exists locally. Models are not compared with a base in this run.';
/**
 * The head run's options from the base commit: the baseline by model name with each base model's
 * data files (to match renamed models) and the base SHA, or one note saying why there is no
 * comparison.
 * @param settings the head run's settings (the same settings file path and descriptors are read at the base)
 * @param revision the base commit: a SHA or any revision git understands
 * @param options the hint shown when git does not have the commit
 */
async function evaluateBase(settings, revision, options) {
    const short = /^[0-9a-f]{40,64}$/.test(revision) ? revision.slice(0, 7) : revision;
    const top = await (0,_repo_git_repository_js__WEBPACK_IMPORTED_MODULE_5__/* .tryGitTopLevel */ .ZS)(settings.root);
    if (top === null)
        return {
            notes: [
                `base commit ${short} is not available: ${settings.root} is not inside a git work tree. Models are not compared with a base in this run.`,
            ],
        };
    const sha = await (0,_repo_git_repository_js__WEBPACK_IMPORTED_MODULE_5__/* .tryResolveCommit */ .Fl)(settings.root, revision);
    if (sha === null)
        return { notes: [`base commit ${short} is not available; ${options.fetchHint}`] };
    const prefix = node_path__WEBPACK_IMPORTED_MODULE_1___default().relative(await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.realpath)(top), await (0,node_fs_promises__WEBPACK_IMPORTED_MODULE_0__.realpath)(settings.root))
        .split((node_path__WEBPACK_IMPORTED_MODULE_1___default().sep))
        .join('/');
    const repo = (0,_repo_git_repository_js__WEBPACK_IMPORTED_MODULE_5__/* .createGitRepository */ .Zd)({ cwd: settings.root, commit: sha, prefix });
    try {
        // Explicitly named descriptors that do not exist at the base are new in the head.
        const descriptors = [];
        for (const d of settings.descriptors)
            if (await repo.isFile(d))
                descriptors.push(d);
        const baseline = new Map();
        const baselineData = new Map();
        if (settings.descriptors.length === 0 || descriptors.length > 0) {
            const configThere = await repo.isFile(settings.config);
            if (configThere || !settings.configExplicit) {
                // The data files of each base model, to find it again when a pull request renames and moves it.
                const onDescriptors = (loaded) => {
                    for (const d of loaded)
                        baselineData.set(d.name, (0,_run_base_comparison_js__WEBPACK_IMPORTED_MODULE_3__/* .dataKey */ .gf)(d));
                };
                const base = await (0,_run_pipeline_js__WEBPACK_IMPORTED_MODULE_4__/* .runPipeline */ .a)({ ...settings, descriptors }, repo, { onDescriptors });
                for (const m of base.models)
                    baseline.set(m.name, m);
            }
        }
        return { baseline, baselineData, baseCommit: sha, notes: [] };
    }
    catch (error) {
        return {
            notes: [`base commit ${sha.slice(0, 7)} could not be checked (${(0,_core_errors_js__WEBPACK_IMPORTED_MODULE_2__/* .errorMessage */ .gJ)(error)}); models are not compared with it in this run.`],
        };
    }
}


/***/ })

};
