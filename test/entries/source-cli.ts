// Test helper: runs the `fitgate` command from the sources (src/ transpiled into a temporary
// folder by test/run/transpile.ts), as a user would run the built one, without needing dist/.
import { spawnSync } from 'node:child_process';
import { transpileSources } from '../run/transpile.js';

/** What a run of the command gave. */
export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** The transpiled sources: `run(args, cwd)` starts `node cli.js ...args`; `remove()` deletes the folder. */
export function sourceCli(): {
  run: (args: string[], cwd: string, env?: Record<string, string>) => CliRun;
  remove: () => void;
  dir: string;
} {
  const { dir, remove } = transpileSources();
  const run = (args: string[], cwd: string, env: Record<string, string> = {}): CliRun => {
    const r = spawnSync(process.execPath, [`${dir}/cli.js`, ...args], {
      cwd,
      encoding: 'utf8',
      env: { ...process.env, NO_COLOR: '1', ...env },
      maxBuffer: 64 * 1024 * 1024,
    });
    return { status: r.status, stdout: r.stdout, stderr: r.stderr };
  };
  return { run, remove, dir };
}
