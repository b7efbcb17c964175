/**
 * Runs every case of the hostile corpus (corpus/cases.ts) through the built CLI and through the
 * action's entry point, and checks: the exit status (the action: exit 1 and the `verdict`
 * output for statuses 1 and 2), the words of the message, no stack trace, no "unexpected"
 * error, nothing from outside the repository in any output, the token nowhere but in the line
 * that masks it, no line the runner would take as a command in the CLI's output, and none on the
 * action's that fitgate did not write.
 */
import { appendFileSync, rmSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CASES, type CorpusCase } from './corpus/cases.js';
import {
  foreignCommands,
  NODE_WARNING,
  prepareBundles,
  runAction,
  runCli,
  runnerCommands,
  SECRET,
  STACK_LINE,
  TOKEN,
  verdictsFor,
  withoutMask,
  writeCase,
  type CaseDirs,
  type Run,
} from './harness.js';

const written = new Map<string, CaseDirs>();

function dirsOf(c: CorpusCase): CaseDirs {
  let dirs = written.get(c.id);
  if (!dirs) {
    dirs = writeCase(c.files, c.id, c.base);
    written.set(c.id, dirs);
  }
  return dirs;
}

function show(run: Run): string {
  const cut = (s: string): string => (s.length > 3000 ? `${s.slice(0, 3000)}…` : s);
  return `status ${run.status} after ${run.ms} ms\n--- stdout\n${cut(run.stdout)}\n--- stderr\n${cut(run.stderr)}`;
}

beforeAll(() => {
  prepareBundles();
});

afterAll(() => {
  for (const dirs of written.values()) rmSync(dirs.base, { recursive: true, force: true });
});

describe('the corpus', () => {
  it('has at least 40 cases, each id once', () => {
    const ids = CASES.map((c) => c.id);
    expect(ids.length).toBeGreaterThanOrEqual(40);
    expect(new Set(ids).size, `repeated ids in ${ids.join(', ')}`).toBe(ids.length);
    const viaAction = CASES.filter((c) => c.inputs !== null);
    expect(viaAction.length).toBeGreaterThanOrEqual(40);
  });
});

describe.concurrent('hostile repositories through the CLI', () => {
  it.each(CASES)('$id: $about -> exit $exit', async (c) => {
    const dirs = dirsOf(c);
    const run = await runCli(dirs, c.args ?? [], undefined, c.command);
    const all = `${run.stdout}\n${run.stderr}`;
    // HOSTILE_DUMP=file collects every case's output, to read the messages as a user would.
    if (process.env.HOSTILE_DUMP) appendFileSync(process.env.HOSTILE_DUMP, `\n=== ${c.id} (${c.about})\n${show(run)}\n`);
    expect(run.status, show(run)).toBe(c.exit);
    for (const word of c.words) expect(all, `word ${JSON.stringify(word)}\n${show(run)}`).toContain(word);
    expect(all, show(run)).not.toMatch(STACK_LINE);
    expect(run.stderr, `a library's warning is not a message of fitgate's\n${show(run)}`).not.toMatch(NODE_WARNING);
    expect(run.stderr, `an unexpected error is a bug\n${show(run)}`).not.toContain('--debug');
    expect(all).not.toContain(SECRET);
    expect(runnerCommands(all), `no line may hold a runner command\n${show(run)}`).toEqual([]);
    expect(all, `a fault in fitgate is a bug\n${show(run)}`).not.toContain('fault in fitgate');
    if (c.exit === 2 && run.stdout === '') expect(run.stderr, show(run)).toMatch(/^fitgate: \S/);
    if (c.verdicts) {
      const json = await runCli(dirs, [...(c.args ?? []), '--format', 'json'], undefined, c.command);
      const report = JSON.parse(json.stdout) as { models: { name: string; verdict: string }[] };
      const got = Object.fromEntries(report.models.map((x) => [x.name, x.verdict]));
      expect(got).toEqual(c.verdicts);
    }
  });
});

describe.concurrent('hostile repositories through the action', () => {
  it.each(CASES.filter((c) => c.inputs !== null))('$id: $about -> exit $exit', async (c) => {
    const dirs = dirsOf(c);
    const run = await runAction(dirs, c.inputs ?? {});
    expect(run.status, show(run)).toBe(c.exit === 0 ? 0 : 1);
    expect(verdictsFor(c.exit), show(run)).toContain(run.outputs.verdict);
    if (c.exit !== 0) expect(run.stdout, show(run)).toMatch(/^::error( [^\n]*)?::/m);
    for (const word of c.words) expect(run.stdout, `word ${JSON.stringify(word)}\n${show(run)}`).toContain(word);
    expect(`${run.stdout}\n${run.stderr}`, show(run)).not.toMatch(STACK_LINE);
    expect(run.stderr, `a library's warning is not a message of fitgate's\n${show(run)}`).not.toMatch(NODE_WARNING);
    expect(run.stdout, `an unexpected error is a bug\n${show(run)}`).not.toContain('failed unexpectedly');
    expect(foreignCommands(run.stdout), show(run)).toEqual([]);
    expect(foreignCommands(run.stderr), show(run)).toEqual([]);
    // The token is printed once, to register it with the runner's masking, before anything else.
    if (run.stdout.includes(TOKEN)) expect(run.stdout.startsWith(`::add-mask::${TOKEN}\n`), show(run)).toBe(true);
    for (const text of [withoutMask(run.stdout), run.stderr, run.summary, run.report, JSON.stringify(run.outputs)]) {
      expect(text).not.toContain(SECRET);
      expect(text).not.toContain(TOKEN);
    }
    if (c.verdicts && run.report !== '') {
      const report = JSON.parse(run.report) as { models: { name: string; verdict: string }[] };
      expect(Object.fromEntries(report.models.map((x) => [x.name, x.verdict]))).toEqual(c.verdicts);
    }
  });
});
