/**
 * Which lines of a file's new side a pull request's diff shows, from the unified-diff `patch`
 * the REST API gives for each changed file (list files of a pull request). A review comment can
 * only be placed on such a line (side `RIGHT`): an added line or a context line of a hunk.
 */

/** Most patch lines read; the API itself leaves out the patch of very large files. */
export const MAX_PATCH_LINES = 100000;

/** A hunk header: `@@ -a[,b] +c[,d] @@ optional section text`. */
const HUNK = /^@@ -\d+(?:,\d+)? \+(\d+)(?:,(\d+))? @@/;

/**
 * The new-side lines of a patch, by 1-based line number, with their text (without the leading
 * `+` or space, and without a trailing carriage return). Removed lines (`-`) and
 * `\ No newline at end of file` markers take no new-side line. Lines before the first hunk header
 * (a `diff --git` preamble) are ignored; a hunk that claims more lines than it has simply ends.
 * At most {@link MAX_PATCH_LINES} patch lines are read.
 * @param patch the file's `patch` (may be empty: a binary file or a rename without change)
 * @returns line number -> text, for every line a review comment may point at
 */
export function diffLines(patch: string): Map<number, string> {
  const lines = new Map<number, string>();
  const rows = patch.split('\n', MAX_PATCH_LINES);
  let next = -1;
  let left = 0;
  for (const row of rows) {
    const header = HUNK.exec(row);
    if (header) {
      next = Number(header[1]);
      left = header[2] === undefined ? 1 : Number(header[2]);
      continue;
    }
    if (next < 0 || left <= 0) continue;
    const mark = row.charAt(0);
    if (mark === '+' || mark === ' ') {
      lines.set(next, row.slice(1).replace(/\r$/, ''));
      next += 1;
      left -= 1;
    }
    // '-' (old side only) and '\' (no newline at end of file) take no new-side line.
  }
  return lines;
}
