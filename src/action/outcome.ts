/**
 * The step's outcome from a Result: the outputs, the JSON report file, and the one-line
 * failure message. The decision itself is {@link exitStatus}, shared with the CLI.
 */
import path from 'node:path';
import { jsonReport } from '../report/json.js';
import { exitStatus, type Result } from '../result/result.js';
import { writeFileSafely } from '../entries/safe-write.js';

/** Names of the action's outputs (as in action.yml). */
export const OUTPUTS = { verdict: 'verdict', failed: 'failed', report: 'report' } as const;

/** Most model names listed in the failure message. */
const MAX_NAMES = 5;

/**
 * Number of models that fail the step: over a fail limit, or over a warning limit too with
 * `fail-on: warn`. Models that could not be checked are not counted (they fail the step as errors).
 */
export function failedCount(result: Result, failOn: 'fail' | 'warn'): number {
  return result.counts.fail + (failOn === 'warn' ? result.counts.warn : 0);
}

function names(models: Result['models']): string {
  const shown = models.slice(0, MAX_NAMES).map((m) => m.name);
  return `${shown.join(', ')}${models.length > MAX_NAMES ? ` and ${models.length - MAX_NAMES} more` : ''}`;
}

/**
 * The message the step fails with, or null when it passes (exactly when the CLI exits 0).
 * @param result the run's Result
 * @param failOn `fail` or `warn`
 */
export function failureMessage(result: Result, failOn: 'fail' | 'warn'): string | null {
  const status = exitStatus(result, failOn);
  if (status === 0) return null;
  const { counts } = result;
  if (status === 2) {
    const bad = result.models.filter((m) => m.verdict === 'error');
    const first = bad[0]?.error;
    const where = first?.file ? `${first.file}${first.line ? `:${first.line}` : ''}: ` : '';
    return `${counts.error} of ${counts.models} models could not be checked (${names(bad)}); fix the file named in each annotation. First: ${where}${first?.message ?? ''}`;
  }
  const over = result.models.filter((m) => m.verdict === 'fail' || (failOn === 'warn' && m.verdict === 'warn'));
  const what = failOn === 'warn' ? 'over a limit (fail-on: warn counts warnings)' : 'over a limit';
  return `${over.length} of ${counts.models} models ${what}: ${names(over)}. The annotations point at the descriptor lines; the job summary has each figure against its limit.`;
}

/**
 * Writes the JSON report under `dir` and returns its path: `fitgate-report.json`, or
 * `fitgate-report-<step>.json` when `GITHUB_ACTION` names the step (several steps in one job).
 * Written with {@link writeFileSafely}: never through a link, atomically.
 * @param result the run's Result
 * @param dir folder to write in (created when missing); the report is written piece by piece, atomically
 * @param step the step's id (`GITHUB_ACTION`), or undefined
 * @throws InputError naming `RUNNER_TEMP` when the file is refused or cannot be written
 */
export async function writeReport(result: Result, dir: string, step: string | undefined): Promise<string> {
  const slug = (step ?? '').replace(/[^A-Za-z0-9_.-]+/g, '-').replace(/^[-.]+/, '');
  const file = path.join(dir, slug === '' ? 'fitgate-report.json' : `fitgate-report-${slug}.json`);
  writeFileSafely(file, jsonReport(result), { option: 'RUNNER_TEMP', within: [] });
  return file;
}
