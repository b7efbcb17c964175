/**
 * `fitgate explain`: a check's entry as plain text for a terminal (format only): its id and
 * title, its limit key and direction, its description (figure, formula and source, the same
 * text docs/checks.md shows), what to change, the module that measures it and its docs page.
 */
import type { Check } from '../checks/index.js';
import { CHECKS } from '../checks/index.js';
import { checkDocsUrl } from '../core/links.js';
import { maxOf } from '../core/extremes.js';

/** The explanation of one check, ending with a line break. */
export function formatExplanation(check: Check): string {
  const direction =
    check.direction === 'above' ? 'a ceiling: the figure fails above its limit' : 'a floor: the figure fails below its limit';
  return [
    `${check.id}: ${check.title}`,
    '',
    `Limit key \`${check.limitKey}\` (${direction}). ${check.limitSummary}`,
    '',
    check.description,
    '',
    `What to change: ${check.advice}`,
    '',
    `Source: src/checks/${check.id}.ts`,
    `Docs: ${checkDocsUrl(check.id)}`,
    '',
  ].join('\n');
}

/** Every check's id, limit key and title, one per line, in report order. */
export function formatCheckList(): string {
  const width = maxOf(CHECKS.map((c) => c.id.length));
  const keyWidth = maxOf(CHECKS.map((c) => c.limitKey.length));
  return `${CHECKS.map((c) => `${c.id.padEnd(width)}  ${c.limitKey.padEnd(keyWidth)}  ${c.title}`).join('\n')}\n`;
}
