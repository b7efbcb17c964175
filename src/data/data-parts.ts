/**
 * A table read from several files (`data.train: [part-1.csv, part-2.csv]` or a glob): where each
 * row comes from.
 *
 * The parts are read in the order given (the descriptor loader sorts them) and concatenated. A
 * row's place is kept in the one `lines` array every stage already carries, as a table-wide
 * line: the part's own 1-based line plus the part's `lineOffset`, where the first part's offset
 * is 0 and each next part's offset is the previous offset plus the previous part's last data line
 * (at least 1). Table-wide lines therefore rise strictly from part to part, and
 * {@link placeOfLine} turns one back into the part's path and its own line. A table read from one
 * file has no parts list, and its lines are the file's lines, as before.
 */

import { clip } from '../core/errors.js';

/** One part of a table read from several files. */
export interface DataPart {
  /** Repository-relative path of the part. */
  file: string;
  /** Added to the part's own line numbers to give table-wide lines (0 for the first part). */
  lineOffset: number;
}

/** A file and a line in it. */
export interface LinePlace {
  file: string;
  line: number;
}

/** Largest table-wide line (lines are kept in an Int32Array). */
export const MAX_TABLE_LINE = 2 ** 31 - 1;

/**
 * The part file and its own line of a table-wide line.
 *
 * @param data the table's `file` and, when read from several files, its `parts`
 * @param line a table-wide line (a value of the table's `lines`)
 * @returns `{ file, line }` as written in the part; the table's file and the line unchanged when it has no parts
 */
export function placeOfLine(data: { file: string; parts?: readonly DataPart[] }, line: number): LinePlace {
  const parts = data.parts;
  if (parts === undefined || parts.length === 0) return { file: data.file, line };
  // The last part whose offset is below the line (offsets rise strictly; lines are >= 1).
  let lo = 0;
  let hi = parts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (parts[mid].lineOffset < line) lo = mid;
    else hi = mid - 1;
  }
  return { file: parts[lo].file, line: line - parts[lo].lineOffset };
}

/**
 * `line L of FILE` for a table-wide line, the file cut to 80 characters (clip).
 *
 * @param data as for {@link placeOfLine}
 * @param line a table-wide line
 */
export function lineOfFile(data: { file: string; parts?: readonly DataPart[] }, line: number): string {
  const place = placeOfLine(data, line);
  return `line ${place.line} of ${clip(place.file)}`;
}

/**
 * A list of table-wide lines as text grouped by file, in the order given: `a.csv lines 3, 5` or,
 * across parts, `p-1.csv lines 3, 5; p-2.csv line 2`.
 *
 * @param data as for {@link placeOfLine}
 * @param lines table-wide lines
 */
export function linesText(data: { file: string; parts?: readonly DataPart[] }, lines: readonly number[]): string {
  const groups: { file: string; lines: number[] }[] = [];
  for (const line of lines) {
    const place = placeOfLine(data, line);
    const last = groups[groups.length - 1];
    if (last !== undefined && last.file === place.file) last.lines.push(place.line);
    else groups.push({ file: place.file, lines: [place.line] });
  }
  return groups.map((g) => `${clip(g.file)} line${g.lines.length === 1 ? '' : 's'} ${g.lines.join(', ')}`).join('; ');
}

/**
 * The label of a table read from parts, for messages: the first part's path and how many more
 * (`train/p-1.csv (+2 more parts)`); the path itself for one part.
 *
 * @param paths the parts, in reading order (at least one)
 */
export function partsLabel(paths: readonly string[]): string {
  if (paths.length <= 1) return paths[0] ?? '';
  return `${paths[0]} (+${paths.length - 1} more part${paths.length === 2 ? '' : 's'})`;
}

/**
 * Table-wide lines as each part's own lines, with the part of each: for report details of a
 * table read from parts (`{ lines, files }`, parallel lists). Null for a table of one file
 * (whose lines are its own already), so that such reports keep their shape.
 *
 * @param data as for {@link placeOfLine}
 * @param lines table-wide lines
 */
export function partLines(
  data: { file: string; parts?: readonly DataPart[] },
  lines: readonly number[],
): { lines: number[]; files: string[] } | null {
  if (data.parts === undefined) return null;
  const places = lines.map((line) => placeOfLine(data, line));
  return { lines: places.map((p) => p.line), files: places.map((p) => p.file) };
}
