/**
 * The terminal report: one aligned table of every model, then one block per model that did not
 * pass, with each check's figure against its limit and the descriptor line to change.
 */
import { classifierLine, isClassifier } from './classifier-figures.js';
import { kindLine, kindMark } from './model-kind.js';
import { refitCompareLine } from './refit-compare.js';
import { fromJsonNumber, type CheckResult, type ModelResult, type Result } from '../result/result.js';
import { formatNumber } from '../core/format.js';
import { maxOf } from '../core/extremes.js';
import { escapeTerminal } from './escape.js';
import { neutraliseLog } from './runner-commands.js';
import { TARGET_SCALE_HEADINGS, targetScaleRows, targetScaleSentence } from './target-scale-text.js';

/** Options of the text report. */
export interface TextOptions {
  /** Use ANSI colours (only on a terminal). Default false. */
  color?: boolean;
  /** List every check of every model with its figure, passing and skipped ones included. Default false. */
  verbose?: boolean;
}

const COLOURS = { pass: '32', warn: '33', fail: '31', error: '35', skipped: '2' } as const;

function paint(text: string, status: keyof typeof COLOURS, color: boolean): string {
  return color ? `\u001b[${COLOURS[status]}m${text}\u001b[0m` : text;
}

function table(rows: string[][], rightAligned: boolean[]): string[] {
  const widths = rows[0].map((_, j) => maxOf(rows.map((r) => [...r[j]].length)));
  return rows.map((r) =>
    r
      .map((cell, j) => {
        const pad = ' '.repeat(widths[j] - [...cell].length);
        return rightAligned[j] ? pad + cell : cell + pad;
      })
      .join('  ')
      .trimEnd(),
  );
}

function metric(m: ModelResult, key: string): string {
  const v = m.metrics?.[key];
  return typeof v === 'number' || typeof v === 'string' ? formatNumber(fromJsonNumber(v as never)) : '–';
}

function checkLine(model: ModelResult, c: CheckResult, color: boolean): string {
  const status = paint(c.status.toUpperCase().padEnd(c.status === 'skipped' ? 7 : 4), c.status, color);
  const text = `  ${status} ${c.id} (${escapeTerminal(model.descriptor)}:${c.line}): ${escapeTerminal(c.message)}`;
  return c.advice ? `${text}\n       ${escapeTerminal(c.advice)}` : text;
}

/**
 * Where a model's error is, for the line under its header: `file:line:column: ` (the form
 * editors and terminals link), the parts that are known.
 */
function errorWhere(m: ModelResult): string {
  const e = m.error;
  if (!e?.file) return '';
  return `${e.file}${e.line ? `:${e.line}${e.column ? `:${e.column}` : ''}` : ''}: `;
}

/**
 * A model's header: status, name and descriptor path; a model that could not be loaded is named
 * by its path, which then stands once.
 */
function modelHeader(m: ModelResult, color: boolean): string {
  const where = m.name === m.descriptor ? '' : ` (${escapeTerminal(m.descriptor)})`;
  return `${paint(m.verdict.toUpperCase(), m.verdict, color)} ${escapeTerminal(m.name)}${where}`;
}

/** The base column: hold-out RMSE change (a classifier's hold-out log-loss change) in per cent, `new` for a model absent on the base. */
function baseCell(m: ModelResult): string {
  if (m.base === undefined) return '–';
  if (m.base.status === 'new') return 'new';
  // A classifier's change is that of its hold-out log-loss (its RMSE fields are null).
  const figure = m.base.holdout_log_loss_change ?? m.base.holdout_rmse_change;
  const change = figure === null ? null : fromJsonNumber(figure);
  if (change === null || !Number.isFinite(change)) return '–';
  const percent = change * 100;
  return `${percent > 0 ? '+' : ''}${formatNumber(percent)}%`;
}

/**
 * Formats the Result for a terminal: the table of models (a `vs base` column when the run was
 * compared with a base commit), one block per model that did not pass (every model, with every
 * check, when `verbose`), the run's notes and the closing count.
 */
export function formatText(result: Result, options: TextOptions = {}): string {
  const color = options.color ?? false;
  const out: string[] = [];
  // With a base comparison, one more column: the hold-out RMSE change against the base commit.
  const withBase = result.models.some((m) => m.base !== undefined);
  const header = ['status', 'model', 'hold-out RMSE', 'gap ratio', 'params/row', 'max std coef', ...(withBase ? ['vs base'] : [])];
  const rows = result.models.map((m) => [
    m.verdict,
    escapeTerminal(m.name) + kindMark(m),
    metric(m, 'holdout_rmse'),
    metric(m, 'gap_ratio'),
    metric(m, 'params_per_sample'),
    metric(m, 'max_std_coefficient'),
    ...(withBase ? [baseCell(m)] : []),
  ]);
  if (rows.length > 0) {
    const lines = table([header, ...rows], [false, false, true, true, true, true, true]);
    out.push(lines[0]);
    lines.slice(1).forEach((line, i) => {
      const v = result.models[i].verdict;
      out.push(paint(v, v, color) + line.slice(v.length));
    });
  } else {
    out.push('no models to check');
  }
  const verbose = options.verbose ?? false;
  for (const m of result.models) {
    if (m.verdict === 'pass' && !verbose) continue;
    out.push('');
    out.push(modelHeader(m, color));
    if (m.error) {
      out.push(`  ${escapeTerminal(errorWhere(m) + m.error.message)}`);
      continue;
    }
    const kind = kindLine(m);
    if (kind !== null) out.push(`  ${escapeTerminal(kind)}`);
    const refit = refitCompareLine(m);
    if (refit !== null) out.push(`  ${escapeTerminal(refit)}`);
    if (isClassifier(m)) out.push(`  ${escapeTerminal(classifierLine(m))}`);
    const scale = targetScaleSentence(m);
    if (scale !== null) {
      out.push(`  ${scale}:`);
      for (const line of table([[...TARGET_SCALE_HEADINGS], ...targetScaleRows(m)], [false, true, true, true, true, true, true]))
        out.push(`    ${line}`);
    }
    for (const c of m.checks) if (verbose || c.status === 'fail' || c.status === 'warn') out.push(checkLine(m, c, color));
  }
  for (const m of result.models) {
    const previous = m.base?.status === 'renamed' ? m.base.previous : undefined;
    if (previous)
      out.push(
        '',
        `note: ${escapeTerminal(m.name)} is compared with ${escapeTerminal(previous.name)} (${escapeTerminal(previous.descriptor)}) of the base commit, found by its ${previous.matched_by === 'data' ? 'data files' : 'descriptor path'}`,
      );
  }
  for (const note of result.notes) out.push('', `note: ${escapeTerminal(note)}`);
  const { counts } = result;
  out.push('');
  out.push(
    `${paint(result.verdict.toUpperCase(), result.verdict, color)}: ${counts.models} model${counts.models === 1 ? '' : 's'}, ${counts.pass} passed, ${counts.warn} warned, ${counts.fail} failed, ${counts.error} could not be checked`,
  );
  // Read by a CI runner when the CLI runs in a CI step: no line may hold a runner command.
  return `${neutraliseLog(out.join('\n'))}\n`;
}
