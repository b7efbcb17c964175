/**
 * The Markdown report: the job summary, the pull-request comment and `--format markdown`.
 * One verdict line, a table of every model, then for each model that did not pass each check's
 * figure against its limit with one sentence on what to change. Built as a string; the caller
 * writes it. Text from the repository is escaped with {@link escapeMarkdown}.
 */
import { fromJsonNumber, type CheckResult, type ModelResult, type Result } from '../result.js';
import { formatNumber } from '../format.js';
import { escapeMarkdown } from './escape.js';

/** Options of the Markdown report. */
export interface MarkdownOptions {
  /** Heading text before the verdict. Default `fitgate`. */
  title?: string;
  /** Largest output in bytes; models past it are cut with a note. Default 1,000,000 (under GitHub's 1 MiB summary limit). */
  maxBytes?: number;
  /** Extra lines put right under the verdict line (e.g. a hidden marker). Default none. */
  preamble?: string[];
}

const MARK: Record<string, string> = { pass: 'pass', warn: 'WARN', fail: 'FAIL', error: 'ERROR', skipped: 'skipped' };

function cell(v: unknown): string {
  if (typeof v === 'number' || typeof v === 'string') return formatNumber(fromJsonNumber(v as never));
  return '–';
}

function limitText(c: CheckResult): string {
  if (c.limit === null && c.warn === null) return 'off';
  const parts: string[] = [];
  if (c.warn !== null) parts.push(`warn > ${formatNumber(c.warn)}`);
  if (c.limit !== null) parts.push(`fail > ${formatNumber(c.limit)}`);
  return parts.join(', ');
}

/** The verdict in one line. */
export function verdictLine(result: Result): string {
  const { counts } = result;
  const over = counts.fail + counts.error;
  const head =
    result.verdict === 'pass'
      ? `every model within its limits`
      : result.verdict === 'warn'
        ? `every model within its fail limits, ${counts.warn} with warnings`
        : result.verdict === 'fail'
          ? `${counts.fail} of ${counts.models} models over a limit`
          : `${counts.error} of ${counts.models} models could not be checked`;
  return `**${MARK[result.verdict]}**: ${head} (${counts.models} checked: ${counts.pass} pass, ${counts.warn} warn, ${counts.fail} fail, ${counts.error} error)${over === 0 ? '' : ''}`;
}

function overview(models: ModelResult[]): string[] {
  const lines = [
    '| Status | Model | Hold-out RMSE | Gap ratio | Params / row | Max std. coef. |',
    '| --- | --- | ---: | ---: | ---: | ---: |',
  ];
  for (const m of models) {
    const x = m.metrics;
    lines.push(
      `| ${MARK[m.verdict]} | ${escapeMarkdown(m.name)} | ${cell(x?.holdout_rmse)} | ${cell(x?.gap_ratio)} | ${cell(x?.params_per_sample)} | ${cell(x?.max_std_coefficient)} |`,
    );
  }
  return lines;
}

/** The block of one model that did not pass. */
export function modelDetail(m: ModelResult): string[] {
  const lines = [`### ${MARK[m.verdict]}: ${escapeMarkdown(m.name)}`, '', `Descriptor: \`${m.descriptor.replace(/`/g, "'")}\``, ''];
  if (m.error) {
    const where = m.error.file ? `${escapeMarkdown(m.error.file)}${m.error.line ? ` line ${m.error.line}` : ''}: ` : '';
    lines.push(`Could not be checked. ${where}${escapeMarkdown(m.error.message)}`, '');
    return lines;
  }
  lines.push('| Check | Status | Value | Limit | Line |', '| --- | --- | ---: | --- | ---: |');
  const shown = m.checks.filter((c) => c.status === 'fail' || c.status === 'warn');
  for (const c of shown) lines.push(`| ${c.id} | ${MARK[c.status]} | ${cell(c.value)} | ${limitText(c)} | ${c.line} |`);
  lines.push('');
  for (const c of shown) lines.push(`- **${c.id}**: ${escapeMarkdown(c.message)}. ${escapeMarkdown(c.advice)}`);
  lines.push('');
  return lines;
}

/** Formats the Result as Markdown. */
export function formatMarkdown(result: Result, options: MarkdownOptions = {}): string {
  const maxBytes = options.maxBytes ?? 1_000_000;
  const head = [`## ${escapeMarkdown(options.title ?? 'fitgate')}`, '', ...(options.preamble ?? []), verdictLine(result), ''];
  const notes = result.notes.map((n) => `> ${escapeMarkdown(n)}`);
  let text = [...head, ...(notes.length ? [...notes, ''] : []), ...overview(result.models), ''].join('\n');
  const failing = result.models.filter((m) => m.verdict !== 'pass');
  let shownModels = 0;
  for (const m of failing) {
    const block = `${modelDetail(m).join('\n')}\n`;
    if (Buffer.byteLength(text) + Buffer.byteLength(block) > maxBytes - 400) break;
    text += `\n${block}`;
    shownModels += 1;
  }
  if (shownModels < failing.length) {
    text += `\n_Cut to stay under the size limit: ${failing.length - shownModels} more models did not pass; run \`fitgate check\` or read the JSON report for all of them._\n`;
  }
  return text;
}
