export const id = 955;
export const ids = [955];
export const modules = {

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
