import type { InitCommand } from './args.js';
import type { CommandOutcome } from './tool-commands.js';
export async function runInit(_parsed: InitCommand): Promise<CommandOutcome> {
  return { stdout: '', stderr: 'not yet\n', status: 2 };
}
