/**
 * A small glob matcher for readers without a file system (memory, git blobs). It follows
 * the rules the disk reader's tinyglobby applies with `dot: false`: `*` and `?` stay within
 * one path segment, `**` spans segments, `[...]` and `{a,b}` work, and wildcards do not
 * match a leading `.` of a segment.
 */
import { InputError } from '../core/errors.js';
import { PATH_OUTSIDE } from './repo-path.js';

/**
 * Compiles a glob pattern to a matcher of repository-relative paths.
 *
 * @param pattern e.g. `models/**\/*.model.yml`
 * @returns a predicate on `/`-separated paths
 */
export function globMatcher(pattern: string): (path: string) => boolean {
  const regexes = expandBraces(pattern).map((p) => new RegExp(`^${segmentsToRegex(p.split('/').filter((s, i, all) => s !== '' || i === all.length - 1))}$`));
  return (path) => regexes.some((r) => r.test(path));
}

/** `{a,b}` to alternatives, nested braces included; an unclosed brace stays literal. */
export function expandBraces(pattern: string): string[] {
  let depth = 0;
  let open = -1;
  for (let i = 0; i < pattern.length; i++) {
    const c = pattern[i];
    if (c === '\\') {
      i += 1;
    } else if (c === '{') {
      if (depth === 0) open = i;
      depth += 1;
    } else if (c === '}' && depth > 0) {
      depth -= 1;
      if (depth === 0) {
        const inner = pattern.slice(open + 1, i);
        const parts = splitTopLevel(inner);
        if (parts.length < 2) continue;
        const head = pattern.slice(0, open);
        const tail = pattern.slice(i + 1);
        return parts.flatMap((part) => expandBraces(head + part + tail));
      }
    }
  }
  return [pattern];
}

function splitTopLevel(text: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '\\') i += 1;
    else if (c === '{') depth += 1;
    else if (c === '}') depth -= 1;
    else if (c === ',' && depth === 0) {
      parts.push(text.slice(start, i));
      start = i + 1;
    }
  }
  parts.push(text.slice(start));
  return parts;
}

const NO_DOT = '(?!\\.)';

function segmentsToRegex(segments: string[]): string {
  let out = '';
  for (let i = 0; i < segments.length; i++) {
    const segment = segments[i];
    const last = i === segments.length - 1;
    if (segment === '**') {
      // Zero or more whole segments, none starting with a dot.
      out += last ? `(?:${NO_DOT}[^/]+(?:/${NO_DOT}[^/]+)*)?` : `(?:${NO_DOT}[^/]+/)*`;
    } else {
      out += segmentToRegex(segment) + (last ? '' : '/');
    }
  }
  return out;
}

function segmentToRegex(segment: string): string {
  let out = '';
  for (let i = 0; i < segment.length; i++) {
    const c = segment[i];
    if (c === '\\' && i + 1 < segment.length) {
      out += escapeRegex(segment[i + 1]);
      i += 1;
    } else if (c === '*') {
      while (segment[i + 1] === '*') i += 1;
      out += (out === '' ? NO_DOT : '') + '[^/]*';
    } else if (c === '?') {
      out += (out === '' ? NO_DOT : '') + '[^/]';
    } else if (c === '[') {
      const close = segment.indexOf(']', i + 2);
      if (close < 0) {
        out += '\\[';
        continue;
      }
      const body = segment.slice(i + 1, close).replace(/\\/g, '\\\\');
      const negated = body.startsWith('!') || body.startsWith('^');
      out += negated ? `[^/${body.slice(1)}]` : `[${body}]`;
      i = close;
    } else {
      out += escapeRegex(c);
    }
  }
  return out;
}

function escapeRegex(c: string): string {
  return /[.*+?^${}()|[\]\\/]/.test(c) ? `\\${c}` : c;
}

/**
 * One matcher per pattern of a settings file's `models` list (for readers without a disk: memory
 * and git commits). `\\` separators become `/` and leading `./` is dropped.
 * @throws InputError `path-outside` for an absolute pattern or one that starts with `..`
 */
export function patternMatchers(patterns: readonly string[]): Array<(path: string) => boolean> {
  return patterns.map((pattern) => {
    const p = pattern.replace(/\\/g, '/');
    if (p.startsWith('/') || /^[A-Za-z]:/.test(p) || p === '..' || p.startsWith('../')) {
      throw new InputError(PATH_OUTSIDE, `glob pattern ${JSON.stringify(pattern)} leaves the repository; expected a pattern relative to the root`, {});
    }
    return globMatcher(p.replace(/^(\.\/)+/, ''));
  });
}
