/**
 * Sentences several reporters print, as plain text: each reporter escapes them for its medium
 * (HTML, Markdown, XML).
 */
import { formatNumber } from '../core/format.js';
import type { CheckResult, Result } from '../result/result.js';

/** A check's limits: `warn > 0.25, fail > 0.5`, floors as `warn < 0.8, fail < 0.6`, or `off`. */
export function limitText(c: Pick<CheckResult, 'warn' | 'limit' | 'floor'>): string {
  const parts: string[] = [];
  if (c.floor?.warn != null) parts.push(`warn < ${formatNumber(c.floor.warn)}`);
  if (c.floor?.fail != null) parts.push(`fail < ${formatNumber(c.floor.fail)}`);
  if (c.warn !== null) parts.push(`warn > ${formatNumber(c.warn)}`);
  if (c.limit !== null) parts.push(`fail > ${formatNumber(c.limit)}`);
  return parts.length ? parts.join(', ') : 'off';
}

/** The run's verdict in words, e.g. `2 of 6 models over a limit`. */
export function verdictHeadline(result: Pick<Result, 'verdict' | 'counts'>): string {
  const { counts } = result;
  if (result.verdict === 'pass') return 'every model within its limits';
  if (result.verdict === 'warn') return `every model within its fail limits, ${counts.warn} with warnings`;
  if (result.verdict === 'fail') return `${counts.fail} of ${counts.models} models over a limit`;
  return `${counts.error} of ${counts.models} models could not be checked`;
}

/** The counts behind the verdict: `6 checked: 1 pass, 0 warn, 5 fail, 0 error`. */
export function countsText(counts: Result['counts']): string {
  return `${counts.models} checked: ${counts.pass} pass, ${counts.warn} warn, ${counts.fail} fail, ${counts.error} error`;
}
