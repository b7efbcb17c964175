import type { RefitCommand } from './args.js';
import type { CommandOutcome } from './tool-commands.js';
export async function runRefit(_parsed: RefitCommand): Promise<CommandOutcome> {
  return { stdout: '', stderr: 'not yet\n', status: 2 };
}
