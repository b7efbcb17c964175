export const id = 57;
export const ids = [57,955];
export const modules = {

/***/ 2057:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {


// EXPORTS
__webpack_require__.d(__webpack_exports__, {
  CLI_FETCH_HINT: () => (/* binding */ CLI_FETCH_HINT),
  evaluateBase: () => (/* binding */ evaluateBase)
});

// UNUSED EXPORTS: ACTION_FETCH_HINT

// EXTERNAL MODULE: external "node:fs/promises"
var promises_ = __webpack_require__(1455);
// EXTERNAL MODULE: external "node:path"
var external_node_path_ = __webpack_require__(6760);
var external_node_path_default = /*#__PURE__*/__webpack_require__.n(external_node_path_);
// EXTERNAL MODULE: ./src/core/errors.ts
var errors = __webpack_require__(4296);
// EXTERNAL MODULE: ./src/run/base-comparison.ts
var base_comparison = __webpack_require__(5148);
// EXTERNAL MODULE: ./src/run/pipeline.ts + 30 modules
var pipeline = __webpack_require__(1015);
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


/***/ }),

/***/ 955:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   GLOB_TOO_COMPLEX: () => (/* binding */ GLOB_TOO_COMPLEX),
/* harmony export */   MAX_ALTERNATIVES: () => (/* binding */ MAX_ALTERNATIVES),
/* harmony export */   MAX_PATTERN_LENGTH: () => (/* binding */ MAX_PATTERN_LENGTH),
/* harmony export */   compilePatterns: () => (/* binding */ compilePatterns),
/* harmony export */   expandBraces: () => (/* binding */ expandBraces),
/* harmony export */   globMatcher: () => (/* binding */ globMatcher),
/* harmony export */   patternProblem: () => (/* binding */ patternProblem)
/* harmony export */ });
/* harmony import */ var _core_errors_js__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(4296);
/* harmony import */ var _repo_path_js__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(3856);
/**
 * The glob matcher of the `models` patterns, one for every reader (disk, git commit, memory):
 * `*` and `?` stay within one path segment, `**` spans segments, `[...]` (with `!` or `^` to
 * negate, `a-z` ranges) and `{a,b}` (nested too) work, wildcards and `**` do not match a leading
 * `.` of a segment, and the segments `node_modules` and `.git` are matched only by a pattern
 * segment that names them literally. `\` is a path separator, as on Windows. There are no
 * extglobs: `(`, `|` and `)` are plain characters.
 *
 * Matching takes time linear in the pattern times the path: a segment is matched by the greedy
 * wildcard algorithm that returns only to the last `*` (each `*` is tried at each position at most
 * once), and `**` by a set of pattern positions carried along the path's segments (a
 * nondeterministic automaton, never backtracking). A pattern of many stars answers at once.
 *
 * Patterns are bounded before anything is matched: at most {@link MAX_PATTERN_LENGTH} characters
 * and {@link MAX_ALTERNATIVES} alternatives once braces are expanded; a `..` segment anywhere
 * (inside braces and parentheses too) and an absolute pattern are refused.
 */


/** Longest `models` pattern accepted, in characters. */
const MAX_PATTERN_LENGTH = 1000;
/** Most alternatives one pattern may expand to through its `{a,b}` braces. */
const MAX_ALTERNATIVES = 256;
/** Code of a pattern over the length or alternatives cap. */
const GLOB_TOO_COMPLEX = 'glob-too-complex';
/** Folder names entered (and matched) only when a pattern segment names them literally. */
const PROTECTED = new Set(['node_modules', '.git']);
/**
 * Checks a `models` pattern before it is used.
 *
 * @param pattern the pattern as written
 * @returns null when it is usable, else the problem: `outside` for an absolute pattern or a `..`
 *   segment anywhere (also between braces, commas, parentheses or bars: `{..,a}/x`, `@(..)/x`),
 *   `complex` for more than {@link MAX_PATTERN_LENGTH} characters or more than
 *   {@link MAX_ALTERNATIVES} brace alternatives
 */
function patternProblem(pattern) {
    const shown = (0,_core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .quoteValue */ .cl)(pattern);
    if (pattern.length > MAX_PATTERN_LENGTH) {
        return { kind: 'complex', message: `pattern ${shown} has ${pattern.length} characters; expected at most ${MAX_PATTERN_LENGTH}` };
    }
    const p = pattern.replace(/\\/g, '/');
    if (p.includes('\u0000'))
        return { kind: 'outside', message: `pattern ${shown} contains a NUL character; expected a plain relative pattern` };
    if (p.startsWith('/') || /^[A-Za-z]:/.test(p)) {
        return {
            kind: 'outside',
            message: `pattern ${shown} is absolute, so it leaves the repository; expected a pattern relative to the repository root`,
        };
    }
    if (p.split(/[/{},()|]/).some((piece) => piece === '..')) {
        return {
            kind: 'outside',
            message: `pattern ${shown} leaves the repository through a \`..\` segment; expected a pattern that stays inside it (no \`..\` anywhere, braces included)`,
        };
    }
    const alternatives = expandBraces(p, MAX_ALTERNATIVES);
    if (alternatives === null) {
        return {
            kind: 'complex',
            message: `pattern ${shown} expands to more than ${MAX_ALTERNATIVES} alternatives through its braces; expected fewer (write several patterns instead)`,
        };
    }
    if (alternatives.some((a) => a.startsWith('/') || /^[A-Za-z]:/.test(a))) {
        return {
            kind: 'outside',
            message: `pattern ${shown} has an absolute alternative, which leaves the repository; expected patterns relative to the repository root`,
        };
    }
    return null;
}
/**
 * `{a,b}` to alternatives, nested braces included; an unclosed brace and a brace without a
 * top-level comma stay literal.
 *
 * @param pattern the pattern
 * @param limit most alternatives; default {@link MAX_ALTERNATIVES}
 * @returns the alternatives, or null when there would be more than `limit` (found without
 *   making them all)
 */
function expandBraces(pattern, limit = MAX_ALTERNATIVES) {
    const out = [];
    // A stack of texts still to expand, so that no recursion depth depends on the pattern.
    const todo = [pattern];
    let steps = 0;
    while (todo.length > 0) {
        // Each step either finishes an alternative or splits one brace: bounded by the limit.
        if (++steps > 4 * limit + pattern.length)
            return null;
        const text = todo.pop();
        const group = firstBraceGroup(text);
        if (group === null) {
            out.push(text);
            if (out.length > limit)
                return null;
            continue;
        }
        const { open, close, parts } = group;
        if (out.length + todo.length + parts.length > limit)
            return null;
        const head = text.slice(0, open);
        const tail = text.slice(close + 1);
        for (let k = parts.length - 1; k >= 0; k--)
            todo.push(head + parts[k] + tail);
    }
    return out;
}
/** The first top-level `{...}` with a top-level comma, or null. */
function firstBraceGroup(text) {
    let depth = 0;
    let open = -1;
    for (let i = 0; i < text.length; i++) {
        const c = text[i];
        if (c === '{') {
            if (depth === 0)
                open = i;
            depth += 1;
        }
        else if (c === '}' && depth > 0) {
            depth -= 1;
            if (depth === 0) {
                const parts = splitTopLevel(text.slice(open + 1, i));
                if (parts.length >= 2)
                    return { open, close: i, parts };
            }
        }
    }
    return null;
}
function splitTopLevel(text) {
    const parts = [];
    let depth = 0;
    let start = 0;
    for (let i = 0; i < text.length; i++) {
        const c = text[i];
        if (c === '{')
            depth += 1;
        else if (c === '}')
            depth -= 1;
        else if (c === ',' && depth === 0) {
            parts.push(text.slice(start, i));
            start = i + 1;
        }
    }
    parts.push(text.slice(start));
    return parts;
}
/** Reads a segment pattern into tokens (runs of `*` become one). */
function compileSegment(text) {
    if (text === '**')
        return { kind: 'globstar' };
    const tokens = [];
    let wild = false;
    for (let i = 0; i < text.length; i++) {
        const c = text[i];
        if (c === '*') {
            while (text[i + 1] === '*')
                i += 1;
            tokens.push({ kind: 'star' });
            wild = true;
        }
        else if (c === '?') {
            tokens.push({ kind: 'any' });
            wild = true;
        }
        else if (c === '[') {
            const close = text.indexOf(']', i + 2);
            if (close < 0) {
                tokens.push({ kind: 'char', code: 91 });
                continue;
            }
            let body = text.slice(i + 1, close);
            const negated = body.startsWith('!') || body.startsWith('^');
            if (negated)
                body = body.slice(1);
            const ranges = [];
            for (let k = 0; k < body.length; k++) {
                const lo = body.charCodeAt(k);
                if (body[k + 1] === '-' && k + 2 < body.length) {
                    ranges.push(lo, body.charCodeAt(k + 2));
                    k += 2;
                }
                else
                    ranges.push(lo, lo);
            }
            tokens.push({ kind: 'class', negated, ranges });
            wild = true;
            i = close;
        }
        else {
            tokens.push({ kind: 'char', code: text.charCodeAt(i) });
        }
    }
    if (!wild)
        return { kind: 'literal', text };
    return { kind: 'wild', tokens, noDot: tokens[0].kind === 'star' || tokens[0].kind === 'any' };
}
function tokenMatches(token, code) {
    switch (token.kind) {
        case 'char':
            return token.code === code;
        case 'any':
            return true;
        case 'class': {
            let inside = false;
            for (let k = 0; k < token.ranges.length && !inside; k += 2)
                inside = code >= token.ranges[k] && code <= token.ranges[k + 1];
            return inside !== token.negated;
        }
        default:
            return false;
    }
}
/**
 * Matches one path segment: the greedy wildcard algorithm that returns only to the latest `*`
 * (time at most tokens x characters).
 */
function segmentMatches(segment, name) {
    if (segment.kind === 'globstar')
        return globstarTakes(name);
    if (segment.kind === 'literal')
        return segment.text === name;
    if (PROTECTED.has(name))
        return false;
    if (segment.noDot && name.charCodeAt(0) === 46)
        return false;
    const tokens = segment.tokens;
    let t = 0;
    let n = 0;
    let starT = -1;
    let starN = 0;
    while (n < name.length) {
        if (t < tokens.length && tokens[t].kind === 'star') {
            starT = t;
            starN = n;
            t += 1;
        }
        else if (t < tokens.length && tokenMatches(tokens[t], name.charCodeAt(n))) {
            t += 1;
            n += 1;
        }
        else if (starT >= 0) {
            t = starT + 1;
            starN += 1;
            n = starN;
        }
        else
            return false;
    }
    while (t < tokens.length && tokens[t].kind === 'star')
        t += 1;
    return t === tokens.length;
}
/** True when `**` may take this segment: not empty, no leading dot, not `node_modules`. */
function globstarTakes(name) {
    return name !== '' && name.charCodeAt(0) !== 46 && !PROTECTED.has(name);
}
/** Adds `i` and every position after a run of `**` (not the last segment) that may take no segment. */
function close(alt, positions) {
    const seen = new Set();
    const todo = [...positions];
    while (todo.length > 0) {
        const i = todo.pop();
        if (seen.has(i))
            continue;
        seen.add(i);
        const seg = alt.segments[i];
        // A `**` before another segment may take no segment; the last `**` takes at least one
        // (`deep/**` matches files below `deep`, not `deep` itself).
        if (seg !== undefined && seg.kind === 'globstar' && i < alt.segments.length - 1)
            todo.push(i + 1);
    }
    return [...seen].sort((a, b) => a - b);
}
function stepAlternative(alt, positions, name) {
    const next = [];
    const last = alt.segments.length - 1;
    for (const i of positions) {
        const seg = alt.segments[i];
        if (seg === undefined)
            continue;
        if (seg.kind === 'globstar') {
            if (globstarTakes(name)) {
                next.push(i);
                if (i === last)
                    next.push(i + 1);
            }
        }
        else if (segmentMatches(seg, name))
            next.push(i + 1);
    }
    return next.length === 0 ? next : close(alt, next);
}
/**
 * Compiles `models` patterns (each checked with {@link patternProblem}).
 *
 * @param patterns the patterns as written; `\` separators become `/`, a leading `./` is dropped,
 *   empty segments (`a//b`) are dropped
 * @throws InputError `path-outside` for a pattern that leaves the repository, `glob-too-complex`
 *   for one over the caps
 */
function compilePatterns(patterns) {
    const alternatives = [];
    for (const pattern of patterns) {
        const problem = patternProblem(pattern);
        if (problem !== null)
            throw new _core_errors_js__WEBPACK_IMPORTED_MODULE_0__/* .InputError */ .dz(problem.kind === 'outside' ? _repo_path_js__WEBPACK_IMPORTED_MODULE_1__/* .PATH_OUTSIDE */ .oE : GLOB_TOO_COMPLEX, problem.message, {});
        const text = pattern.replace(/\\/g, '/').replace(/^(\.\/)+/, '');
        for (const alt of expandBraces(text) ?? []) {
            const parts = alt
                .replace(/^(\.\/)+/, '')
                .split('/')
                .filter((s) => s !== '' && s !== '.');
            // A pattern ending with `/` names folders, and a folder is never a descriptor: an empty
            // last segment matches no name.
            const segments = parts.map(compileSegment);
            if (alt.endsWith('/'))
                segments.push({ kind: 'literal', text: '' });
            if (parts.length > 0)
                alternatives.push({ segments });
        }
    }
    const start = alternatives.map((alt) => close(alt, [0]));
    const step = (state, name) => state.map((positions, a) => (positions.length === 0 ? positions : stepAlternative(alternatives[a], positions, name)));
    const accepts = (state) => state.some((positions, a) => positions.includes(alternatives[a].segments.length));
    const alive = (state) => state.some((positions, a) => positions.some((i) => i < alternatives[a].segments.length));
    const walk = (path) => {
        let state = start;
        for (const name of path.split('/')) {
            if (!alive(state))
                return null;
            state = step(state, name);
        }
        return state;
    };
    return {
        start,
        step,
        accepts,
        alive,
        matches(path) {
            const state = walk(path);
            return state !== null && accepts(state);
        },
        searchesBelow(path) {
            const state = walk(path);
            return state !== null && alive(state);
        },
    };
}
/**
 * A matcher of repository-relative paths for one pattern (see {@link compilePatterns}).
 *
 * @param pattern e.g. `models/**\/*.model.yml`
 * @returns a predicate on `/`-separated paths
 */
function globMatcher(pattern) {
    const set = compilePatterns([pattern]);
    return (path) => set.matches(path);
}


/***/ })

};
