/**
 * The terminal report: one aligned table of every model, then one block per model that did not
 * pass, with each check's figure against its limit and the descriptor line to change.
 */
import { fromJsonNumber, type CheckResult, type ModelResult, type Result } from '../result/result.js';
import { formatNumber } from '../core/format.js';
import { maxOf } from '../core/extremes.js';
import { escapeTerminal } from './escape.js';

/** Options of the text report. */
export interface TextOptions {
  /** Use ANSI colours (only on a terminal). Default false. */
  color?: boolean;
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
  const status = paint(c.status.toUpperCase().padEnd(4), c.status, color);
  const text = `  ${status} ${c.id} (${escapeTerminal(model.descriptor)}:${c.line}): ${escapeTerminal(c.message)}`;
  return c.advice ? `${text}\n       ${escapeTerminal(c.advice)}` : text;
}

/** Formats the Result for a terminal. */
export function formatText(result: Result, options: TextOptions = {}): string {
  const color = options.color ?? false;
  const out: string[] = [];
  const header = ['status', 'model', 'hold-out RMSE', 'gap ratio', 'params/row', 'max std coef'];
  const rows = result.models.map((m) => [
    m.verdict,
    escapeTerminal(m.name),
    metric(m, 'holdout_rmse'),
    metric(m, 'gap_ratio'),
    metric(m, 'params_per_sample'),
    metric(m, 'max_std_coefficient'),
  ]);
  if (rows.length > 0) {
    const lines = table([header, ...rows], [false, false, true, true, true, true]);
    out.push(lines[0]);
    lines.slice(1).forEach((line, i) => {
      const v = result.models[i].verdict;
      out.push(paint(v, v, color) + line.slice(v.length));
    });
  } else {
    out.push('no models to check');
  }
  for (const m of result.models) {
    if (m.verdict === 'pass') continue;
    out.push('');
    out.push(`${paint(m.verdict.toUpperCase(), m.verdict, color)} ${escapeTerminal(m.name)} (${escapeTerminal(m.descriptor)})`);
    if (m.error) {
      const where = m.error.file ? `${m.error.file}${m.error.line ? `:${m.error.line}` : ''}: ` : '';
      out.push(`  ${escapeTerminal(where + m.error.message)}`);
      continue;
    }
    for (const c of m.checks) if (c.status === 'fail' || c.status === 'warn') out.push(checkLine(m, c, color));
  }
  for (const m of result.models) {
    const previous = m.base?.status === 'renamed' ? m.base.previous : undefined;
    if (previous) out.push('', `note: ${escapeTerminal(m.name)} is compared with ${escapeTerminal(previous.name)} (${escapeTerminal(previous.descriptor)}) of the base commit, found by its ${previous.matched_by === 'data' ? 'data files' : 'descriptor path'}`);
  }
  for (const note of result.notes) out.push('', `note: ${escapeTerminal(note)}`);
  const { counts } = result;
  out.push('');
  out.push(
    `${paint(result.verdict.toUpperCase(), result.verdict, color)}: ${counts.models} model${counts.models === 1 ? '' : 's'}, ${counts.pass} passed, ${counts.warn} warned, ${counts.fail} failed, ${counts.error} could not be checked`,
  );
  // A line that would begin with `::` (after white space, which a CI runner trims) could be read
  // as a workflow command when the CLI runs in a CI step: it starts with `» ` instead.
  return `${out.join('\n').split('\n').map((line) => (line.trimStart().startsWith('::') ? `» ${line}` : line)).join('\n')}\n`;
}
