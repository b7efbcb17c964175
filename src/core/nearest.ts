/**
 * "Did you mean": the allowed word nearest to a mistyped one, by the optimal-string-alignment
 * distance (insertions, deletions, substitutions and swaps of two neighbours, each costing 1;
 * Damerau 1964, restricted form).
 */

/** Words longer than this are not compared (the cost grows with the product of the lengths). */
const MAX_LENGTH = 64;

/**
 * Edit distance between `a` and `b` with adjacent swaps (optimal string alignment), or
 * `Infinity` when either is longer than 64 characters.
 */
export function editDistance(a: string, b: string): number {
  if (a.length > MAX_LENGTH || b.length > MAX_LENGTH) return Number.POSITIVE_INFINITY;
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[] = new Array(rows * cols).fill(0);
  for (let i = 0; i < rows; i++) d[i * cols] = i;
  for (let j = 0; j < cols; j++) d[j] = j;
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[(i - 1) * cols + j] + 1, d[i * cols + j - 1] + 1, d[(i - 1) * cols + j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[(i - 2) * cols + j - 2] + 1);
      d[i * cols + j] = best;
    }
  }
  return d[rows * cols - 1];
}

/**
 * The candidate nearest to `word` (case ignored), when it is close enough to be a typo: at most
 * 1 edit for words of up to 4 characters, 2 up to 8, 3 beyond. Ties go to the earlier candidate.
 * Returns null when none is close enough or `word` is itself a candidate.
 */
export function nearestWord(word: string, candidates: readonly string[]): string | null {
  const lower = word.toLowerCase();
  const allowed = lower.length <= 4 ? 1 : lower.length <= 8 ? 2 : 3;
  let best: string | null = null;
  let bestDistance = allowed + 1;
  for (const candidate of candidates) {
    if (candidate === word) return null;
    const distance = editDistance(lower, candidate.toLowerCase());
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}
