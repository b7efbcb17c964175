/**
 * The Markdown report: the job summary, the pull-request comment and `--format markdown`.
 * One verdict line, a table of every model, then for each model that did not pass each check's
 * figure against its limit with one sentence on what to change. Built as a string; the caller
 * writes it. Text from the repository is escaped with {@link escapeMarkdown} and cut to a
 * readable length; the whole report stays under `maxBytes`.
 */
import { calibrationChart, classifierLine, isClassifier } from './classifier-figures.js';
import { kindLine, kindMark } from './model-kind.js';
import { refitCompareLine } from './refit-compare.js';
import { mermaidChart } from './mermaid.js';
import { fromJsonNumber, type JsonNumber, type ModelResult, type Result } from '../result/result.js';
import { formatNumber } from '../core/format.js';
import { escapeMarkdown } from './escape.js';
import { countsText, limitText, verdictHeadline } from './wording.js';
import { TARGET_SCALE_HEADINGS, targetScaleRows, targetScaleSentence } from './target-scale-text.js';

/** Options of the Markdown report. */
export interface MarkdownOptions {
  /** Heading text before the verdict. Default `fitgate`. */
  title?: string;
  /** Largest output in UTF-8 bytes; table rows and model blocks past it are cut with a note. Default 1,000,000 (under GitHub's 1 MiB summary limit). */
  maxBytes?: number;
  /** Lines put first, before the heading (e.g. a hidden marker), counted in `maxBytes`. Default none. */
  preamble?: string[];
}

/** Default size cap: under GitHub's job-summary limit of 1 MiB (1,048,576 bytes). */
export const DEFAULT_MAX_BYTES = 1_000_000;

/** Longest piece of repository text (a name, a message) shown, in characters. */
const MAX_TEXT = 300;

/** Bytes kept free for the closing note when cutting. */
const NOTE_RESERVE = 400;

const MARK: Record<string, string> = { pass: 'pass', warn: 'WARN', fail: 'FAIL', error: 'ERROR', skipped: 'skipped' };

/** Repository text for Markdown: cut to {@link MAX_TEXT} characters, then escaped. */
function text(s: string): string {
  const chars = [...s];
  return escapeMarkdown(chars.length > MAX_TEXT ? `${chars.slice(0, MAX_TEXT - 1).join('')}…` : s);
}

function cell(v: JsonNumber | string | number | null | undefined): string {
  if (typeof v === 'number' || typeof v === 'string') return formatNumber(fromJsonNumber(v as JsonNumber));
  return '–';
}

function signed(x: number, suffix = ''): string {
  if (Number.isNaN(x)) return 'NaN';
  if (x === 0) return `0${suffix}`;
  return `${x > 0 ? '+' : ''}${formatNumber(x)}${suffix}`;
}

/** The verdict in one line. */
export function verdictLine(result: Result): string {
  const head = result.verdict === 'pass' && result.counts.models === 0 ? 'no models to check' : verdictHeadline(result);
  return `**${MARK[result.verdict]}**: ${head} (${countsText(result.counts)})`;
}

/** The "against base" cell of a model: `new`, the changes (after `renamed from <name>:` for a renamed model), or `–`. */
function baseCell(m: ModelResult): string {
  const b = m.base;
  if (!b) return '–';
  if (b.status === 'new') return 'new';
  const from = b.status === 'renamed' && b.previous ? `renamed from ${text(b.previous.name)}: ` : '';
  const rmse = b.holdout_rmse_change === null ? null : fromJsonNumber(b.holdout_rmse_change);
  const loss =
    b.holdout_log_loss_change === undefined || b.holdout_log_loss_change === null ? null : fromJsonNumber(b.holdout_log_loss_change);
  const gap = b.gap_ratio_change === null ? null : fromJsonNumber(b.gap_ratio_change);
  if (rmse === null && loss === null && gap === null) return `${from}base not checked`;
  const parts: string[] = [];
  if (rmse !== null) parts.push(`RMSE ${Number.isFinite(rmse) ? signed(rmse * 100, '%') : signed(rmse)}`);
  if (loss !== null) parts.push(`log-loss ${Number.isFinite(loss) ? signed(loss * 100, '%') : signed(loss)}`);
  if (gap !== null) parts.push(`gap ${signed(gap)}`);
  return `${from}${parts.join(', ')}`;
}

/** Table header (and separator) of the model overview. */
function overviewHead(withBase: boolean): string[] {
  return [
    `| Status | Model | Hold-out RMSE | Gap ratio | Params / row | Largest std. coef. |${withBase ? ' Against base |' : ''}`,
    `| --- | --- | ---: | ---: | ---: | ---: |${withBase ? ' --- |' : ''}`,
  ];
}

/** One row of the model overview. */
export function overviewRow(m: ModelResult, withBase: boolean): string {
  const x = m.metrics;
  return `| ${MARK[m.verdict]} | ${text(m.name + kindMark(m))} | ${cell(x?.holdout_rmse)} | ${cell(x?.gap_ratio)} | ${cell(x?.params_per_sample)} | ${cell(x?.max_std_coefficient)} |${withBase ? ` ${baseCell(m)} |` : ''}`;
}

/** The block of one model that did not pass. */
export function modelDetail(m: ModelResult): string[] {
  const lines = [`### ${MARK[m.verdict]}: ${text(m.name)}`, '', `Descriptor: ${text(m.descriptor)}`, ''];
  if (m.error) {
    const where = m.error.file ? `${text(m.error.file)}${m.error.line ? ` line ${m.error.line}` : ''}: ` : '';
    lines.push(`Could not be checked. ${where}${text(m.error.message)}`, '');
    return lines;
  }
  const shown = m.checks.filter((c) => c.status === 'fail' || c.status === 'warn');
  const kind = kindLine(m);
  if (kind !== null) lines.push(text(kind), '');
  const refit = refitCompareLine(m);
  if (refit !== null) lines.push(text(refit), '');
  if (isClassifier(m)) lines.push(text(classifierLine(m)), '');
  const scale = targetScaleSentence(m);
  if (scale !== null) {
    lines.push(`${scale}:`, '', `| ${TARGET_SCALE_HEADINGS.join(' | ')} |`, '| --- | ---: | ---: | ---: | ---: | ---: | ---: |');
    for (const row of targetScaleRows(m)) lines.push(`| ${row.join(' | ')} |`);
    lines.push('');
  }
  lines.push('| Check | Status | Value | Limit | Line |', '| --- | --- | ---: | --- | ---: |');
  for (const c of shown) lines.push(`| ${c.id} | ${MARK[c.status]} | ${cell(c.value)} | ${limitText(c)} | ${c.line} |`);
  lines.push('');
  for (const c of shown) lines.push(`- **${c.id}**: ${text(c.message)}. ${text(c.advice)}`);
  lines.push('');
  const chart = isClassifier(m) ? calibrationChart(m) : mermaidChart(m);
  if (chart !== null) lines.push(chart);
  return lines;
}

function bytes(s: string): number {
  return Buffer.byteLength(s, 'utf8');
}

/**
 * Formats the Result as Markdown, at most `maxBytes` UTF-8 bytes. When the report would be
 * larger, table rows and then model blocks are left out (the table first keeps every model
 * that did not pass) and a closing note says how many.
 * @param result the run's Result
 * @param options title, size cap and preamble; defaults in {@link MarkdownOptions}
 */
export function formatMarkdown(result: Result, options: MarkdownOptions = {}): string {
  const maxBytes = options.maxBytes ?? DEFAULT_MAX_BYTES;
  const budget = maxBytes - NOTE_RESERVE;
  const withBase = result.models.some((m) => m.base !== undefined);
  const head = [...(options.preamble ?? []), `## ${text(options.title ?? 'fitgate')}`, '', verdictLine(result), ''];
  for (const n of result.notes) head.push(`> ${text(n)}`, '');
  let out = `${head.join('\n')}\n`;

  const notPassing = result.models.filter((m) => m.verdict !== 'pass');
  const blocks = notPassing.map((m) => `\n${modelDetail(m).join('\n')}`);
  const detailBytes = blocks.reduce((sum, b) => sum + bytes(b), 0);

  // The table: when it must be cut it keeps the models that did not pass first, and takes at
  // least half of what is left, the rest going to the details of those models.
  const cuts: string[] = [];
  if (result.models.length > 0) {
    const tableHead = `${overviewHead(withBase).join('\n')}\n`;
    const rows = result.models.map((m) => `${overviewRow(m, withBase)}\n`);
    const left = budget - bytes(out);
    const tableBudget = bytes(out) + Math.max(left / 2, left - detailBytes);
    let size = bytes(out) + bytes(tableHead);
    const keep = new Set<number>();
    const order = result.models
      .map((_, i) => i)
      .sort((a, b) => Number(result.models[a].verdict === 'pass') - Number(result.models[b].verdict === 'pass') || a - b);
    for (const i of order) {
      if (size + bytes(rows[i]) > tableBudget) break;
      keep.add(i);
      size += bytes(rows[i]);
    }
    out += tableHead + result.models.map((_, i) => (keep.has(i) ? rows[i] : '')).join('');
    if (keep.size < result.models.length) cuts.push(`${result.models.length - keep.size} of ${result.models.length} table rows`);
  }

  // One block per model that did not pass.
  let shown = 0;
  let size = bytes(out);
  for (const block of blocks) {
    const b = bytes(block);
    if (size + b > budget) break;
    out += block;
    size += b;
    shown += 1;
  }
  if (shown < notPassing.length) cuts.push(`${notPassing.length - shown} of ${notPassing.length} model details`);
  if (cuts.length > 0) {
    out += `\n_Cut to stay under the size limit: ${cuts.join(' and ')} left out. Run \`fitgate check\` or read the JSON report for all of them._\n`;
  }
  return out;
}
