/**
 * Workflow-command annotations: one error per failing check or unchecked model, one warning per
 * warning, at the descriptor line the check points at, most severe first, capped at what the
 * runner shows per step, then one notice counting the rest. The exact command lines are built
 * here (and only here) so that they can be tested byte for byte; text from the repository is
 * escaped so that it can never start a workflow command of its own.
 */
import path from 'node:path';
import type { ModelResult, Result } from '../result/result.js';
import { defuseLegacyCommands } from './runner-commands.js';
import { kindMark } from './model-kind.js';
import { clip, type InputError } from '../core/errors.js';

/** Severity of an annotation. */
export type AnnotationLevel = 'error' | 'warning' | 'notice';

/** One annotation before it becomes a command line. */
export interface Annotation {
  level: AnnotationLevel;
  /** Message (any text; escaped when formatted). */
  message: string;
  /** Path relative to the workspace (`/` separators), or absent. */
  file?: string;
  /** 1-based line in `file`, or absent. */
  line?: number;
  /** Title shown above the message, or absent. */
  title?: string;
}

/** Options of {@link collectAnnotations}. */
export interface AnnotationOptions {
  /**
   * Where the fitgate root lies inside the workspace (`/` separators): prefixed to every file
   * so that annotations land on the right file when `working-directory` is a sub-folder.
   * Default `''` (the root is the workspace).
   */
  prefix?: string;
  /** Most errors and most warnings annotated (the runner shows 10 of each per step). Default 10. */
  maxPerLevel?: number;
}

/** The runner shows at most this many error and this many warning annotations per step. */
export const MAX_PER_LEVEL = 10;

/**
 * Escapes a command's message as the toolkit does (`%`, CR, LF percent-encoded), so the text
 * stays on one line and cannot begin a command.
 */
export function escapeData(text: string): string {
  return text.replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');
}

/** Escapes a command property value: as {@link escapeData} plus `:` and `,`. */
export function escapeProperty(text: string): string {
  return escapeData(text).replace(/:/g, '%3A').replace(/,/g, '%2C');
}

/**
 * One workflow command line (without the line break), e.g.
 * `::error file=models/a.model.yml,line=12,title=…::message`. Every `##[` in the file, title and
 * message is broken first ({@link defuseLegacyCommands}), so that no line fitgate prints holds
 * the runner's older command form.
 */
export function formatCommand(a: Annotation): string {
  const props: string[] = [];
  if (a.file !== undefined && a.file !== '') props.push(`file=${escapeProperty(defuseLegacyCommands(a.file))}`);
  if (a.line !== undefined && a.line > 0) props.push(`line=${a.line}`);
  if (a.title !== undefined && a.title !== '') props.push(`title=${escapeProperty(defuseLegacyCommands(a.title))}`);
  return `::${a.level}${props.length > 0 ? ` ${props.join(',')}` : ''}::${escapeData(defuseLegacyCommands(a.message))}`;
}

/** Joins the fitgate root's prefix and a root-relative path. */
export function workspacePath(prefix: string, file: string): string {
  return prefix === '' || prefix === '.' ? file : path.posix.join(prefix, file);
}

/** Every finding of one model as an annotation, in check order. */
function modelFindings(m: ModelResult, prefix: string): Annotation[] {
  if (m.error) {
    return [
      {
        level: 'error',
        file: workspacePath(prefix, m.error.file ?? m.descriptor),
        ...(m.error.line !== null ? { line: m.error.line } : {}),
        title: `fitgate could not check ${m.name}`,
        message: m.error.message,
      },
    ];
  }
  const found: Annotation[] = [];
  for (const c of m.checks) {
    if (c.status !== 'fail' && c.status !== 'warn') continue;
    found.push({
      level: c.status === 'fail' ? 'error' : 'warning',
      file: workspacePath(prefix, m.descriptor),
      line: c.line,
      title: `fitgate ${c.id} (${m.name}${kindMark(m)})`,
      message: c.advice ? `${c.message}. ${c.advice}` : c.message,
    });
  }
  return found;
}

/**
 * The annotations of a run: errors first, then warnings (each in report order), at most
 * `maxPerLevel` of each, then one notice counting those left out, then one notice per run note.
 * @param result the run's Result
 * @param options root prefix and cap; defaults in {@link AnnotationOptions}
 */
export function collectAnnotations(result: Result, options: AnnotationOptions = {}): Annotation[] {
  const prefix = options.prefix ?? '';
  const max = options.maxPerLevel ?? MAX_PER_LEVEL;
  const all = result.models.flatMap((m) => modelFindings(m, prefix));
  const errors = all.filter((a) => a.level === 'error');
  const warnings = all.filter((a) => a.level === 'warning');
  const out = [...errors.slice(0, max), ...warnings.slice(0, max)];
  const leftErrors = Math.max(0, errors.length - max);
  const leftWarnings = Math.max(0, warnings.length - max);
  if (leftErrors + leftWarnings > 0) {
    out.push({
      level: 'notice',
      title: 'fitgate',
      message: `${leftErrors + leftWarnings} more findings are not annotated (${leftErrors} errors, ${leftWarnings} warnings; the runner shows ${max} of each per step). The job summary lists every model.`,
    });
  }
  for (const note of result.notes) out.push({ level: 'notice', title: 'fitgate', message: note });
  return out;
}

/**
 * The annotation for a run that could not be done: an error at the file and line of the
 * problem when known.
 * @param error the problem
 * @param prefix the fitgate root's place in the workspace; default `''`
 */
export function inputErrorAnnotation(error: InputError, prefix = ''): Annotation {
  const { file, line } = error.location;
  return {
    level: 'error',
    ...(file !== undefined ? { file: workspacePath(prefix, file) } : {}),
    ...(file !== undefined && line !== undefined ? { line } : {}),
    title: 'fitgate could not run',
    message: error.location.key !== undefined ? `\`${clip(error.location.key)}\`: ${error.message}` : error.message,
  };
}

/** The command lines of a run's annotations, each ending with a line break. */
export function formatAnnotations(result: Result, options: AnnotationOptions = {}): string {
  return collectAnnotations(result, options)
    .map((a) => `${formatCommand(a)}\n`)
    .join('');
}
