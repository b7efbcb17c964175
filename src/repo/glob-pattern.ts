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
import { InputError, quoteValue } from '../core/errors.js';
import { PATH_OUTSIDE } from './repo-path.js';

/** Longest `models` pattern accepted, in characters. */
export const MAX_PATTERN_LENGTH = 1000;

/** Most alternatives one pattern may expand to through its `{a,b}` braces. */
export const MAX_ALTERNATIVES = 256;

/** Code of a pattern over the length or alternatives cap. */
export const GLOB_TOO_COMPLEX = 'glob-too-complex';

/** Folder names entered (and matched) only when a pattern segment names them literally. */
const PROTECTED = new Set(['node_modules', '.git']);

/** Why a pattern is refused: it leaves the repository, or it is too long or has too many alternatives. */
export interface PatternProblem {
  kind: 'outside' | 'complex';
  /** What is wrong and what was expected (the pattern quoted, cut to 80 characters). */
  message: string;
}

/**
 * Checks a `models` pattern before it is used.
 *
 * @param pattern the pattern as written
 * @returns null when it is usable, else the problem: `outside` for an absolute pattern or a `..`
 *   segment anywhere (also between braces, commas, parentheses or bars: `{..,a}/x`, `@(..)/x`),
 *   `complex` for more than {@link MAX_PATTERN_LENGTH} characters or more than
 *   {@link MAX_ALTERNATIVES} brace alternatives
 */
export function patternProblem(pattern: string): PatternProblem | null {
  const shown = quoteValue(pattern);
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
export function expandBraces(pattern: string, limit = MAX_ALTERNATIVES): string[] | null {
  const out: string[] = [];
  // A stack of texts still to expand, so that no recursion depth depends on the pattern.
  const todo = [pattern];
  let steps = 0;
  while (todo.length > 0) {
    // Each step either finishes an alternative or splits one brace: bounded by the limit.
    if (++steps > 4 * limit + pattern.length) return null;
    const text = todo.pop() as string;
    const group = firstBraceGroup(text);
    if (group === null) {
      out.push(text);
      if (out.length > limit) return null;
      continue;
    }
    const { open, close, parts } = group;
    if (out.length + todo.length + parts.length > limit) return null;
    const head = text.slice(0, open);
    const tail = text.slice(close + 1);
    for (let k = parts.length - 1; k >= 0; k--) todo.push(head + parts[k] + tail);
  }
  return out;
}

/** The first top-level `{...}` with a top-level comma, or null. */
function firstBraceGroup(text: string): { open: number; close: number; parts: string[] } | null {
  let depth = 0;
  let open = -1;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '{') {
      if (depth === 0) open = i;
      depth += 1;
    } else if (c === '}' && depth > 0) {
      depth -= 1;
      if (depth === 0) {
        const parts = splitTopLevel(text.slice(open + 1, i));
        if (parts.length >= 2) return { open, close: i, parts };
      }
    }
  }
  return null;
}

function splitTopLevel(text: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '{') depth += 1;
    else if (c === '}') depth -= 1;
    else if (c === ',' && depth === 0) {
      parts.push(text.slice(start, i));
      start = i + 1;
    }
  }
  parts.push(text.slice(start));
  return parts;
}

/** One character position of a segment pattern. */
type Token = { kind: 'char'; code: number } | { kind: 'any' } | { kind: 'star' } | { kind: 'class'; negated: boolean; ranges: number[] };

/** One segment of a pattern. */
type Segment = { kind: 'globstar' } | { kind: 'literal'; text: string } | { kind: 'wild'; tokens: Token[]; noDot: boolean };

/** Reads a segment pattern into tokens (runs of `*` become one). */
function compileSegment(text: string): Segment {
  if (text === '**') return { kind: 'globstar' };
  const tokens: Token[] = [];
  let wild = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '*') {
      while (text[i + 1] === '*') i += 1;
      tokens.push({ kind: 'star' });
      wild = true;
    } else if (c === '?') {
      tokens.push({ kind: 'any' });
      wild = true;
    } else if (c === '[') {
      const close = text.indexOf(']', i + 2);
      if (close < 0) {
        tokens.push({ kind: 'char', code: 91 });
        continue;
      }
      let body = text.slice(i + 1, close);
      const negated = body.startsWith('!') || body.startsWith('^');
      if (negated) body = body.slice(1);
      const ranges: number[] = [];
      for (let k = 0; k < body.length; k++) {
        const lo = body.charCodeAt(k);
        if (body[k + 1] === '-' && k + 2 < body.length) {
          ranges.push(lo, body.charCodeAt(k + 2));
          k += 2;
        } else ranges.push(lo, lo);
      }
      tokens.push({ kind: 'class', negated, ranges });
      wild = true;
      i = close;
    } else {
      tokens.push({ kind: 'char', code: text.charCodeAt(i) });
    }
  }
  if (!wild) return { kind: 'literal', text };
  return { kind: 'wild', tokens, noDot: tokens[0].kind === 'star' || tokens[0].kind === 'any' };
}

function tokenMatches(token: Token, code: number): boolean {
  switch (token.kind) {
    case 'char':
      return token.code === code;
    case 'any':
      return true;
    case 'class': {
      let inside = false;
      for (let k = 0; k < token.ranges.length && !inside; k += 2) inside = code >= token.ranges[k] && code <= token.ranges[k + 1];
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
function segmentMatches(segment: Segment, name: string): boolean {
  if (segment.kind === 'globstar') return globstarTakes(name);
  if (segment.kind === 'literal') return segment.text === name;
  if (PROTECTED.has(name)) return false;
  if (segment.noDot && name.charCodeAt(0) === 46) return false;
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
    } else if (t < tokens.length && tokenMatches(tokens[t], name.charCodeAt(n))) {
      t += 1;
      n += 1;
    } else if (starT >= 0) {
      t = starT + 1;
      starN += 1;
      n = starN;
    } else return false;
  }
  while (t < tokens.length && tokens[t].kind === 'star') t += 1;
  return t === tokens.length;
}

/** True when `**` may take this segment: not empty, no leading dot, not `node_modules`. */
function globstarTakes(name: string): boolean {
  return name !== '' && name.charCodeAt(0) !== 46 && !PROTECTED.has(name);
}

/**
 * Where a walk stands in every alternative: per alternative, the sorted pattern positions the
 * path so far can have reached (an empty list: that alternative can no longer match).
 */
export type WalkState = readonly (readonly number[])[];

/** A compiled set of patterns. */
export interface PatternSet {
  /** The state at the repository root (no segment read). */
  readonly start: WalkState;
  /** The state after one more path segment (a file or folder name). */
  step(state: WalkState, name: string): WalkState;
  /** True when the path read so far matches a pattern. */
  accepts(state: WalkState): boolean;
  /** True when some path below the one read so far could still match (a walk enters the folder). */
  alive(state: WalkState): boolean;
  /** True when the repository-relative path (`/` separators) matches a pattern. */
  matches(path: string): boolean;
  /** True when a pattern could match some path below the folder `path` (a walk would enter it). */
  searchesBelow(path: string): boolean;
}

/** One alternative: its segments and the positions reachable without reading a segment. */
interface Alternative {
  segments: Segment[];
}

/** Adds `i` and every position after a run of `**` (not the last segment) that may take no segment. */
function close(alt: Alternative, positions: number[]): number[] {
  const seen = new Set<number>();
  const todo = [...positions];
  while (todo.length > 0) {
    const i = todo.pop() as number;
    if (seen.has(i)) continue;
    seen.add(i);
    const seg = alt.segments[i];
    // A `**` before another segment may take no segment; the last `**` takes at least one
    // (`deep/**` matches files below `deep`, not `deep` itself).
    if (seg !== undefined && seg.kind === 'globstar' && i < alt.segments.length - 1) todo.push(i + 1);
  }
  return [...seen].sort((a, b) => a - b);
}

function stepAlternative(alt: Alternative, positions: readonly number[], name: string): number[] {
  const next: number[] = [];
  const last = alt.segments.length - 1;
  for (const i of positions) {
    const seg = alt.segments[i];
    if (seg === undefined) continue;
    if (seg.kind === 'globstar') {
      if (globstarTakes(name)) {
        next.push(i);
        if (i === last) next.push(i + 1);
      }
    } else if (segmentMatches(seg, name)) next.push(i + 1);
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
export function compilePatterns(patterns: readonly string[]): PatternSet {
  const alternatives: Alternative[] = [];
  for (const pattern of patterns) {
    const problem = patternProblem(pattern);
    if (problem !== null) throw new InputError(problem.kind === 'outside' ? PATH_OUTSIDE : GLOB_TOO_COMPLEX, problem.message, {});
    const text = pattern.replace(/\\/g, '/').replace(/^(\.\/)+/, '');
    for (const alt of expandBraces(text) ?? []) {
      const parts = alt
        .replace(/^(\.\/)+/, '')
        .split('/')
        .filter((s) => s !== '' && s !== '.');
      // A pattern ending with `/` names folders, and a folder is never a descriptor: an empty
      // last segment matches no name.
      const segments: Segment[] = parts.map(compileSegment);
      if (alt.endsWith('/')) segments.push({ kind: 'literal', text: '' });
      if (parts.length > 0) alternatives.push({ segments });
    }
  }
  const start: WalkState = alternatives.map((alt) => close(alt, [0]));
  const step = (state: WalkState, name: string): WalkState =>
    state.map((positions, a) => (positions.length === 0 ? positions : stepAlternative(alternatives[a], positions, name)));
  const accepts = (state: WalkState): boolean => state.some((positions, a) => positions.includes(alternatives[a].segments.length));
  const alive = (state: WalkState): boolean => state.some((positions, a) => positions.some((i) => i < alternatives[a].segments.length));
  const walk = (path: string): WalkState | null => {
    let state = start;
    for (const name of path.split('/')) {
      if (!alive(state)) return null;
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
export function globMatcher(pattern: string): (path: string) => boolean {
  const set = compilePatterns([pattern]);
  return (path) => set.matches(path);
}
