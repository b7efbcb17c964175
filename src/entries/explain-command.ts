/**
 * `fitgate explain [check-id...]`: prints each named check's explanation (by id or limit key);
 * with no id, the list of checks. An unknown id is a usage mistake (status 2) with the nearest
 * id as a suggestion.
 */
import { CHECKS, findCheck } from '../checks/index.js';
import { quoteValue } from '../core/errors.js';
import { nearestWord } from '../core/nearest.js';
import { formatCheckList, formatExplanation } from '../report/explain.js';

/** What to print and the exit status: 0 every id known, 2 one was not. */
export function explainChecks(ids: readonly string[]): { text: string; status: 0 | 2 } {
  if (ids.length === 0) return { text: formatCheckList(), status: 0 };
  const parts: string[] = [];
  for (const id of ids) {
    const check = findCheck(id) ?? CHECKS.find((c) => c.limitKey === id);
    if (check === undefined) {
      const near = nearestWord(id, [...CHECKS.map((c) => c.id), ...CHECKS.map((c) => c.limitKey)]);
      const hint = near !== null ? ` (did you mean '${near}'?)` : '';
      return { text: `error: unknown check ${quoteValue(id, 60)}${hint}\n(run \`fitgate explain\` for the list of checks)\n`, status: 2 };
    }
    parts.push(formatExplanation(check));
  }
  return { text: parts.join('\n'), status: 0 };
}
