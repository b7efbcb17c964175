export const id = 57;
export const ids = [57];
export const modules = {

/***/ 2057:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  ACTION_FETCH_HINT: () => (/* binding */ ACTION_FETCH_HINT),
  CLI_FETCH_HINT: () => (/* binding */ CLI_FETCH_HINT),
  evaluateBase: () => (/* binding */ evaluateBase)
});

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/run/base-comparison.ts
var base_comparison = __webpack_require__(5148);
// EXTERNAL MODULE: ./src/run/pipeline.ts + 15 modules
var pipeline = __webpack_require__(324);
// EXTERNAL MODULE: external "node:child_process"
var external_node_child_process_ = __webpack_require__(1421);
// EXTERNAL MODULE: external "node:fs"
var external_node_fs_ = __webpack_require__(3024);
// EXTERNAL MODULE: ./src/repo/glob-pattern.ts
var glob_pattern = __webpack_require__(955);
// EXTERNAL MODULE: ./src/repo/repo-path.ts
var repo_path = __webpack_require__(3856);
;// CONCATENATED MODULE: ./src/repo/git-repository.ts
/**
 * A {@link RepoReader} over one git commit: files are read from the commit's tree with
 * `git cat-file`, never from the working tree. The reader's root may be a sub-folder of the
 * git repository (the action's `working-directory`); nothing outside that folder is read.
 * Symbolic links are resolved inside the commit's tree only: a link whose target leaves the
 * root is refused like a `..` path.
 */






/** Largest number of links followed for one path (as Linux's MAXSYMLINKS). */
const MAX_LINKS = 40;
/** Most folders named by {@link safeDirectoryArgs} (a path deeper than this is cut at the top). */
const MAX_SAFE_DEPTH = 128;
/**
 * `-c safe.directory=<folder>` for `cwd` and each folder above it (as given and as real paths),
 * put before every git command fitgate runs. In a job that runs inside a container the workspace
 * belongs to another user id than the job's, and git refuses such a repository ("detected
 * dubious ownership", git 2.35.2 and later); the setting on the command line, which git reads as
 * protected configuration, lets only fitgate's own git calls read that one repository, and never
 * changes the user's git configuration. The repository's top folder is among the folders named,
 * whichever it is.
 */
function safeDirectoryArgs(cwd) {
    const folders = new Set();
    const starts = [external_node_path_default().resolve(cwd)];
    try {
        starts.push((0,external_node_fs_.realpathSync)(cwd));
    }
    catch {
        // A folder that cannot be resolved is named as given only.
    }
    for (const start of starts) {
        let folder = start;
        for (let depth = 0; depth < MAX_SAFE_DEPTH; depth++) {
            folders.add(folder);
            const parent = external_node_path_default().dirname(folder);
            if (parent === folder)
                break;
            folder = parent;
        }
    }
    return [...folders].flatMap((f) => ['-c', `safe.directory=${f}`]);
}
/**
 * Runs git with arguments (never through a shell) and returns standard output as bytes. Every
 * call names the work tree as a safe directory for that call only ({@link safeDirectoryArgs}).
 * @throws Error with git's standard error when git exits non-zero
 */
function runGit(cwd, args, maxBuffer = 64 * 1024 * 1024) {
    return new Promise((resolve, reject) => {
        (0,external_node_child_process_.execFile)('git', [...safeDirectoryArgs(cwd), ...args], { cwd, encoding: 'buffer', maxBuffer, env: { ...process.env, GIT_TERMINAL_PROMPT: '0' } }, (error, stdout, stderr) => {
            if (error) {
                const detail = Buffer.isBuffer(stderr) ? stderr.toString('utf8').trim() : '';
                reject(new Error(`git ${args[0]} failed: ${detail || error.message}`));
            }
            else
                resolve(stdout);
        });
    });
}
/**
 * The full SHA of a revision when it names a commit present in the local object store, else null
 * (unknown revision, or a shallow clone without it).
 * @param cwd a folder inside the git work tree
 * @param revision a SHA, branch, tag or expression such as `HEAD^1`
 */
async function tryResolveCommit(cwd, revision) {
    if (revision.startsWith('-'))
        return null;
    try {
        const out = await runGit(cwd, ['rev-parse', '--verify', '--quiet', '--end-of-options', `${revision}^{commit}`]);
        const sha = out.toString('utf8').trim();
        return /^[0-9a-f]{40,64}$/.test(sha) ? sha : null;
    }
    catch {
        return null;
    }
}
/**
 * The top folder of the git work tree that contains `dir` (absolute), or null when `dir` is not
 * inside a git work tree.
 */
async function tryGitTopLevel(dir) {
    try {
        const out = await runGit(dir, ['rev-parse', '--show-toplevel']);
        const top = out.toString('utf8').trim();
        return top === '' ? null : top;
    }
    catch {
        return null;
    }
}
/** Normalises a repository-relative path; null when it is absolute or leaves the root. */
function normalise(p) {
    try {
        return (0,repo_path/* normaliseRepoPath */.Gn)(p);
    }
    catch {
        return null;
    }
}
/** Parses `git ls-tree -r -l -z --full-tree` output into entries by path (relative to `prefix`). */
function parseTree(out, prefix) {
    const entries = new Map();
    const lead = prefix === '' ? '' : `${prefix}/`;
    for (const record of out.toString('utf8').split('\0')) {
        if (record === '')
            continue;
        const tab = record.indexOf('\t');
        const [mode, , oid, size] = record.slice(0, tab).split(/ +/);
        const full = record.slice(tab + 1);
        if (!full.startsWith(lead))
            continue;
        const rel = full.slice(lead.length);
        const kind = mode === '120000' ? 'link' : mode === '100644' || mode === '100755' ? 'file' : 'other';
        entries.set(rel, { kind, oid, size: Number(size) || 0 });
    }
    return entries;
}
/**
 * A reader of the files of one commit under `prefix`. The tree is listed once, on first use.
 * @param options git folder, commit and root prefix
 */
function createGitRepository(options) {
    const { cwd, commit } = options;
    const prefix = normalise(options.prefix ?? '') ?? '';
    const label = `base commit ${commit.slice(0, 7)}`;
    let listing = null;
    const tree = () => {
        listing ??= runGit(cwd, ['ls-tree', '-r', '-l', '-z', '--full-tree', commit], 1024 * 1024 * 1024).then((out) => parseTree(out, prefix));
        return listing;
    };
    const outside = (file, where, target) => new errors/* InputError */.dz(repo_path/* PATH_OUTSIDE */.oE, `path ${(0,errors/* quoteValue */.cl)(target)} leaves the repository through a link in ${label}; expected a path inside it`, {
        file: where.file ?? file,
        line: where.line,
        column: where.column,
        key: where.key,
    });
    const missing = (file) => new errors/* InputError */.dz(repo_path/* FILE_MISSING */.GY, `no such file in ${label}; expected an existing file`, { file });
    /**
     * Follows links component by component inside the tree. Returns the final path and its entry
     * (undefined when nothing is there), or null when a link leaves the root.
     */
    async function realPath(p) {
        const entries = await tree();
        let parts = p === '' ? [] : p.split('/');
        let done = [];
        let hops = 0;
        while (parts.length > 0) {
            const next = [...done, parts[0]].join('/');
            const entry = entries.get(next);
            if (entry?.kind === 'link') {
                hops += 1;
                if (hops > MAX_LINKS)
                    return null;
                const target = (await runGit(cwd, ['cat-file', 'blob', entry.oid])).toString('utf8');
                const joined = target.startsWith('/') ? null : normalise(external_node_path_default().posix.join(done.join('/'), target));
                if (joined === null)
                    return null;
                parts = [...(joined === '' ? [] : joined.split('/')), ...parts.slice(1)];
                done = [];
                continue;
            }
            done.push(parts[0]);
            parts = parts.slice(1);
        }
        const final = done.join('/');
        return { path: final, entry: entries.get(final) };
    }
    /** What `p` names (links followed inside the tree), with its entry when it is a file. */
    async function kindOf(p) {
        const n = normalise(p);
        if (n === null)
            throw outside(p, {}, p);
        const real = await realPath(n);
        if (real === null)
            throw outside(p, {}, p);
        const entry = real.entry;
        if (entry?.kind === 'file')
            return { kind: 'file', entry };
        if (entry?.kind === 'other')
            return { kind: 'special', entry: null };
        // Not an entry of the tree: a folder (entries below it), a link that leads nowhere, or nothing.
        const entries = await tree();
        const below = real.path === '' ? '' : `${real.path}/`;
        for (const key of entries.keys())
            if (key.startsWith(below))
                return { kind: 'folder', entry: null };
        return { kind: real.path !== n || entries.get(n)?.kind === 'link' ? 'broken-link' : 'missing', entry: null };
    }
    /** The blob entry of a regular file at `p` (links followed), or an InputError. */
    async function fileEntry(p) {
        const { kind, entry } = await kindOf(p);
        if (kind === 'missing')
            throw missing(normalise(p) ?? p);
        if (kind !== 'file' || entry === null)
            throw (0,repo_path/* notAFileError */.V5)(kind === 'file' ? 'special' : kind, { file: p });
        return entry;
    }
    /** Runs git for the bytes of a file; git's failure (a damaged object store) is `file-unreadable`. */
    async function blob(p, args, maxBuffer) {
        try {
            return await runGit(cwd, args, maxBuffer);
        }
        catch (error) {
            throw (0,repo_path/* unreadableError */.Sw)(error, { file: p });
        }
    }
    return {
        label,
        async resolve(fromFile, target, where) {
            const joined = (0,repo_path/* joinRepoPath */.Kp)(fromFile, target, { file: fromFile, ...where });
            if ((await realPath(joined)) === null)
                throw outside(fromFile, { file: fromFile, ...where }, target);
            return joined;
        },
        async isFile(p) {
            const n = normalise(p);
            if (n === null)
                return false;
            const real = await realPath(n);
            return real?.entry?.kind === 'file';
        },
        async entryKind(p) {
            return (await kindOf(p)).kind;
        },
        async size(p) {
            return (await fileEntry(p)).size;
        },
        async read(p) {
            const entry = await fileEntry(p);
            return new Uint8Array(await blob(p, ['cat-file', 'blob', entry.oid], Math.max(entry.size + 1024, 1024 * 1024)));
        },
        async *stream(p, chunkBytes = 1024 * 1024) {
            const entry = await fileEntry(p);
            const child = (0,external_node_child_process_.spawn)('git', [...safeDirectoryArgs(cwd), 'cat-file', 'blob', entry.oid], { cwd, stdio: ['ignore', 'pipe', 'ignore'] });
            const closed = new Promise((resolve, reject) => {
                child.on('error', reject);
                child.on('close', resolve);
            });
            let pending = [];
            let pendingBytes = 0;
            for await (const piece of child.stdout) {
                pending.push(piece);
                pendingBytes += piece.length;
                if (pendingBytes >= chunkBytes) {
                    yield new Uint8Array(Buffer.concat(pending));
                    pending = [];
                    pendingBytes = 0;
                }
            }
            const code = await closed;
            if (code !== 0)
                throw (0,repo_path/* unreadableError */.Sw)({ code: `git cat-file exit status ${code}` }, { file: p });
            if (pendingBytes > 0)
                yield new Uint8Array(Buffer.concat(pending));
        },
        async glob(patterns) {
            const compiled = (0,glob_pattern.compilePatterns)(patterns);
            const entries = await tree();
            const paths = [];
            const notEntered = [];
            for (const [p, entry] of entries) {
                if (entry.kind === 'other')
                    continue; // a submodule is a folder of another repository
                if (compiled.matches(p))
                    paths.push(p);
                // A link a pattern would search below is never followed as a folder (as on disk).
                if (entry.kind === 'link' && compiled.searchesBelow(p))
                    notEntered.push(p);
            }
            return { paths: paths.sort(), notEntered: notEntered.sort() };
        },
    };
}

;// CONCATENATED MODULE: ./src/action/base-commit.ts
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
    const top = await tryGitTopLevel(settings.root);
    if (top === null)
        return {
            notes: [
                `base commit ${short} is not available: ${settings.root} is not inside a git work tree. Models are not compared with a base in this run.`,
            ],
        };
    const sha = await tryResolveCommit(settings.root, revision);
    if (sha === null)
        return { notes: [`base commit ${short} is not available; ${options.fetchHint}`] };
    const prefix = external_node_path_default().relative(await (0,promises_.realpath)(top), await (0,promises_.realpath)(settings.root))
        .split((external_node_path_default()).sep)
        .join('/');
    const repo = createGitRepository({ cwd: settings.root, commit: sha, prefix });
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
                        baselineData.set(d.name, (0,base_comparison/* dataKey */.gf)(d));
                };
                const base = await (0,pipeline/* runPipeline */.a)({ ...settings, descriptors }, repo, { onDescriptors });
                for (const m of base.models)
                    baseline.set(m.name, m);
            }
        }
        return { baseline, baselineData, baseCommit: sha, notes: [] };
    }
    catch (error) {
        return {
            notes: [`base commit ${sha.slice(0, 7)} could not be checked (${(0,errors/* errorMessage */.gJ)(error)}); models are not compared with it in this run.`],
        };
    }
}


/***/ })

};
