// The action's entry (src/main.ts, transpiled to JavaScript as test/run/transpile.ts does, since
// dist/ is rebuilt only on release) with the runner's files missing: a GITHUB_OUTPUT that names no
// writable file fails the step with one error line before anything is checked; a job summary that
// cannot be written is one warning and changes nothing else. Never a stack trace.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { transpileSources } from '../run/transpile.js';

const examples = fileURLToPath(new URL('../../examples', import.meta.url));
let lib: { dir: string; remove: () => void } | undefined;
let tmp = '';
let runs = 0;

beforeAll(() => {
  lib = transpileSources();
  tmp = mkdtempSync(path.join(os.tmpdir(), 'fitgate-runner-files-'));
});
afterAll(() => {
  lib?.remove();
  if (tmp) rmSync(tmp, { recursive: true, force: true });
});

/** What one run of the action left: status, workflow-command lines, stderr, the outputs. */
interface Run {
  status: number | null;
  commands: string[];
  stderr: string;
  outputs: Record<string, string>;
}

/** Parses the `name<<delimiter` blocks of a GITHUB_OUTPUT file. */
function parseOutputs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of text.matchAll(/^([^<\n]+)<<(\S+)\n([\s\S]*?)\n\2$/gm)) out[m[1]] = m[3];
  return out;
}

/**
 * Runs the action on the example repository (no pull request, no comment) with GITHUB_OUTPUT and
 * GITHUB_STEP_SUMMARY pointing at fresh files, or at `output` / `summary` when given.
 */
function runAction(files: { output?: string; summary?: string } = {}): Run {
  runs += 1;
  const dir = path.join(tmp, `run${runs}`);
  mkdirSync(dir);
  const outputFile = path.join(dir, 'output.txt');
  writeFileSync(outputFile, '');
  writeFileSync(path.join(dir, 'summary.md'), '');
  const env: NodeJS.ProcessEnv = {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    GITHUB_ACTIONS: 'true',
    GITHUB_WORKSPACE: examples,
    GITHUB_EVENT_NAME: 'push',
    GITHUB_OUTPUT: files.output ?? outputFile,
    GITHUB_STEP_SUMMARY: files.summary ?? path.join(dir, 'summary.md'),
    RUNNER_TEMP: path.join(dir, 'temp'),
    INPUT_COMMENT: 'false',
  };
  const run = spawnSync(process.execPath, [path.join(lib!.dir, 'main.js')], {
    cwd: examples,
    env,
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  return {
    status: run.status,
    commands: run.stdout.split('\n').filter((line) => line.startsWith('::') && !/^::(error|warning) file=/.test(line)),
    stderr: run.stderr,
    outputs: parseOutputs(readFileSync(outputFile, 'utf8')),
  };
}

describe('the action when a runner file is missing', () => {
  let normal: Run;

  beforeAll(() => {
    normal = runAction();
  });

  it('(with both files: the example repository fails the step and sets the three outputs)', () => {
    expect(normal.status, normal.stderr).toBe(1);
    expect(normal.stderr).toBe('');
    expect(normal.outputs).toEqual({ verdict: 'fail', failed: '5', report: expect.stringMatching(/[/\\]temp[/\\]fitgate-report\.json$/) });
  });

  for (const [what, name, problem] of [
    ['a GITHUB_OUTPUT file that does not exist', 'missing/output.txt', 'does not exist'],
    ['a GITHUB_OUTPUT that is a folder', '.', 'is not a file'],
  ] as const) {
    it(`${what}: one error line naming the variable and the path, the step fails, no stack trace`, () => {
      const output = path.join(tmp, name);
      const run = runAction({ output });
      expect(run.commands).toEqual([
        `::error::fitgate could not run: \`GITHUB_OUTPUT\`: expected the file the runner creates for the step's outputs, got ${JSON.stringify(output)}, which ${problem}`,
      ]);
      expect(run.status).toBe(1);
      expect(run.stderr).toBe('');
      expect(run.outputs).toEqual({});
    });
  }

  it('a GITHUB_STEP_SUMMARY file that does not exist: one warning, the same outputs and status', () => {
    const summary = path.join(tmp, 'missing', 'summary.md');
    const run = runAction({ summary });
    expect(run.commands.filter((line) => !normal.commands.includes(line))).toEqual([
      `::warning title=fitgate::could not write the job summary: Unable to access summary file: '${summary}'. Check if the file has correct read/write permissions.`,
    ]);
    expect(run.commands.length).toBe(normal.commands.length + 1);
    expect(run.status).toBe(normal.status);
    expect(run.stderr).toBe('');
    expect({ ...run.outputs, report: path.basename(run.outputs.report) }).toEqual({
      ...normal.outputs,
      report: path.basename(normal.outputs.report),
    });
  });
});
