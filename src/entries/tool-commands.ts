/**
 * The commands besides `check` and `merge` (`init`, `refit`, `explain`), each in its own module
 * loaded when asked for. Returns what to print and the exit status; the entry writes and exits.
 */
import type { ExplainCommand, InitCommand, RefitCommand } from './args.js';

import type { CommandOutcome } from './command-outcome.js';

export type { CommandOutcome } from './command-outcome.js';

/**
 * Runs one of the tool commands. Errors (InputError and others) propagate to the entry, which
 * prints them as for `check` (exit status 2).
 */
export async function runToolCommand(parsed: ExplainCommand | InitCommand | RefitCommand): Promise<CommandOutcome> {
  if (parsed.kind === 'explain') {
    const { explainChecks } = await import('./explain-command.js');
    const { text, status } = explainChecks(parsed.ids);
    return status === 0 ? { stdout: text, stderr: '', status } : { stdout: '', stderr: text, status };
  }
  if (parsed.kind === 'init') {
    const { runInit } = await import('./init-command.js');
    return runInit(parsed);
  }
  const { runRefit } = await import('./refit-command.js');
  return runRefit(parsed);
}
