/**
 * Text from the repository reaches the terminal, the runner's log (where a line starting with
 * `::` is a command), annotations, Markdown, HTML, JUnit XML and JSON. Column names, a target,
 * descriptor file names and cell text built to break each medium must come out as text.
 */
import { readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { descriptor, rows } from './corpus/repo.js';
import { foreignCommands, prepareBundles, runAction, runCli, STACK_LINE, writeCase, type CaseDirs, type Run } from './harness.js';

const COMMAND_COLUMN = '::error::x';
const HTML_COLUMN = '<img src=x onerror=alert(1)>';
const NEWLINE_COLUMN = 'c\n::warning::y';
const PIPE_TARGET = 'a|b';
/** A descriptor file name that is HTML and a workflow command; its content is broken, so the file name becomes the model's name. */
const HTML_FILE = 'models/<img src=x onerror=alert(2)>.model.yml';
/** A descriptor file name with a line break followed by a command. */
const NEWLINE_FILE = 'models/n\n::error::boom.model.yml';

/** Quotes a CSV field. */
const q = (s: string): string => `"${s.replace(/"/g, '""')}"`;

function data(n: number, x0: number, step: number): string {
  // Two identical inputs (so the conditioning check names both), a third with a wobble, and the target.
  const base = rows(n, x0, step).trim().split('\n').slice(1);
  const lines = [[q(COMMAND_COLUMN), q(HTML_COLUMN), q(NEWLINE_COLUMN), q(PIPE_TARGET)].join(',')];
  base.forEach((line, i) => {
    const [x, y] = line.split(',');
    lines.push([x, x, String(Number(x) * Number(x) * 0.01 + (i % 3)), y].join(','));
  });
  return `${lines.join('\n')}\n`;
}

/** YAML double-quoted scalar. */
const yq = (s: string): string => JSON.stringify(s);

const FILES = {
  'fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\nlimits:\n  gap_ratio: 0.5\n',
  'models/m.model.yml': descriptor({
    target: yq(PIPE_TARGET),
    terms: `  - linear: [${yq(COMMAND_COLUMN)}, ${yq(HTML_COLUMN)}]\n  - polynomial: { of: ${yq(NEWLINE_COLUMN)}, degree: 2 }\n`,
  }),
  'models/cell.model.yml': descriptor({
    name: 'cell',
    train: '../::error::bad.csv',
    target: yq(PIPE_TARGET),
    terms: `  - linear: [${yq(COMMAND_COLUMN)}]\n`,
  }),
  [HTML_FILE]: 'version: 1\nname: [broken\n',
  [NEWLINE_FILE]: 'version: 1\nname: [broken\n',
  'data/train.csv': data(30, 0, 1),
  'data/holdout.csv': data(10, 0.5, 3),
  // A bad cell whose text is a command, HTML and a Markdown table break.
  '::error::bad.csv': data(30, 0, 1).replace(/\n3,3,/, `\n${q(`\n::error::cell<script>|x`)},3,`),
};

let dirs: CaseDirs;
let text: Run;
let markdown: Run;
let json: Run;
let action: Run;
let html = '';
/** A run that stops as a whole (duplicate names) with a file name holding a line break and a command. */
let whole: Run;
let wholeAction: Run;
let wholeDirs: CaseDirs;
let junit = '';

beforeAll(async () => {
  prepareBundles();
  dirs = writeCase(FILES, 'injection');
  [text, markdown, json, action] = await Promise.all([
    runCli(dirs, ['--html', 'html', '--junit', 'junit.xml']),
    runCli(dirs, ['--format', 'markdown']),
    runCli(dirs, ['--format', 'json']),
    runAction(dirs),
  ]);
  wholeDirs = writeCase(
    {
      'fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\n',
      'models/a.model.yml': descriptor(),
      'models/b\n::error::dup.model.yml': descriptor(),
      'data/train.csv': rows(30),
      'data/holdout.csv': rows(10, 0.5, 3),
    },
    'injection-whole',
  );
  [whole, wholeAction] = await Promise.all([runCli(wholeDirs, []), runAction(wholeDirs)]);
  html = readFileSync(path.join(dirs.base, 'html', 'index.html'), 'utf8');
  junit = readFileSync(path.join(dirs.base, 'junit.xml'), 'utf8');
}, 120_000);

afterAll(() => {
  if (dirs) rmSync(dirs.base, { recursive: true, force: true });
  if (wholeDirs) rmSync(wholeDirs.base, { recursive: true, force: true });
});

/** Lines that start (after white space) with a workflow command or a raw tag of ours. */
function commandLines(s: string): string[] {
  return s.split(/\r?\n/).filter((l) => l.trimStart().startsWith('::'));
}

describe('text from the repository is escaped for each medium', () => {
  it('runs: every model gets an outcome, the broken ones as errors (exit 2), nothing crashes', () => {
    for (const run of [text, markdown, json]) {
      expect(run.status, run.stderr).toBe(2);
      expect(run.stderr).not.toMatch(STACK_LINE);
    }
    const report = JSON.parse(json.stdout) as {
      models: { name: string; verdict: string; columns: string[]; error: { message: string } | null }[];
    };
    const byName = new Map(report.models.map((m) => [m.name, m]));
    expect([...byName.keys()].sort()).toEqual(['cell', 'm', HTML_FILE, NEWLINE_FILE].sort());
    expect(byName.get('m')?.verdict).toBe('fail');
    // JSON keeps the names exactly (JSON.stringify escapes them for JSON).
    expect(byName.get('m')?.columns).toEqual(expect.arrayContaining([COMMAND_COLUMN, HTML_COLUMN]));
    expect(byName.get('cell')?.error?.message).toContain('::error::cell<script>|x');
  });

  it('terminal text: no line begins a workflow command, no raw line break from a name', () => {
    expect(commandLines(text.stdout), text.stdout).toEqual([]);
    expect(text.stdout).not.toMatch(/[\u0000-\u0008\u000b-\u001f]/);
    expect(text.stdout).toContain(COMMAND_COLUMN.slice(2)); // shown, as text
  });

  it('Markdown: tags escaped, pipes escaped, each table row on one line', () => {
    const md = markdown.stdout;
    expect(md).not.toContain('<img');
    expect(md).not.toContain('<script');
    expect(md).toContain('&lt;img');
    expect(commandLines(md)).toEqual([]);
    for (const line of md.split('\n').filter((l) => l.startsWith('|'))) {
      const cells = line.replace(/\\\|/g, '').split('|').length - 2;
      expect(cells, line).toBeGreaterThanOrEqual(5);
      expect(line.endsWith('|'), line).toBe(true);
    }
    expect(md).toContain('cell&lt;script&gt;\\|x');
  });

  it('HTML: no tag or attribute from the repository', () => {
    expect(html).not.toMatch(/<img[^>]*onerror/i);
    expect(html).not.toContain('<script>|x');
    expect(html).not.toContain('onerror=alert(1)>');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });

  it('JUnit XML: no tag from the repository', () => {
    expect(junit).not.toMatch(/<img|<script/);
  });

  it('action: no workflow command on stdout that fitgate did not write; the summary is escaped', () => {
    expect(action.status).toBe(1);
    expect(action.outputs.verdict).toBe('error');
    expect(foreignCommands(action.stdout), action.stdout).toEqual([]);
    for (const line of action.stdout.split('\n')) {
      expect(line.startsWith('::error::x'), line).toBe(false);
      expect(line.startsWith('::warning::y'), line).toBe(false);
      expect(line.startsWith('::error::boom'), line).toBe(false);
      expect(line.startsWith('::error::cell'), line).toBe(false);
    }
    expect(action.summary).not.toContain('<img');
    expect(action.summary).not.toContain('<script');
  });

  it('a run-level error naming a file with a line break stays on one line (CLI standard error, action log)', () => {
    expect(whole.status, whole.stderr).toBe(2);
    expect(whole.stderr).toContain('also used by');
    expect(commandLines(whole.stderr), whole.stderr).toEqual([]);
    expect(commandLines(whole.stdout), whole.stdout).toEqual([]);
    expect(wholeAction.status).toBe(1);
    expect(foreignCommands(wholeAction.stdout), wholeAction.stdout).toEqual([]);
    expect(commandLines(wholeAction.stderr)).toEqual([]);
  });
});
