/**
 * Runs a Python script with Debian's python3 (numpy / sklearn from Debian packages), giving it one
 * JSON value on stdin and reading one JSON value from its stdout. For tests that check fitgate's
 * figures against an independent construction; ask `requireTool` first.
 */
import { spawnSync } from 'node:child_process';
import { PYTHON3 } from './require-tool.js';

/** Runs `script` with `input` as JSON on stdin; returns its stdout parsed as JSON. Throws with stderr on failure. */
export function runPythonJson<T>(script: string, input: unknown): T {
  const run = spawnSync(PYTHON3, ['-c', script], {
    input: JSON.stringify(input),
    encoding: 'utf8',
    timeout: 120_000,
    maxBuffer: 64 * 1024 * 1024,
    env: { PATH: '/usr/bin:/bin', HOME: process.env.HOME ?? '/' },
  });
  if (run.status !== 0)
    throw new Error(`python3 failed (status ${run.status ?? run.signal}): ${(run.stderr || String(run.error ?? '')).slice(0, 2000)}`);
  return JSON.parse(run.stdout) as T;
}
