/**
 * Forged runner commands and markup break-outs, through the built CLI and the action: names,
 * columns and cells holding `::error::` after a line break and the older `##[error]` in the middle
 * of a line, `]]>`, `</td>` and line breaks. No line of any output may hold a runner command
 * fitgate did not write; XML, HTML and Markdown keep their structure. The action registers the
 * token with the runner's masking first, and text a REST API server sends back (an error body,
 * a deprecation header that Octokit would print) is cut and cleaned before it is printed.
 */
import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_SERVER_TEXT } from '../../src/report/runner-commands.js';
import { descriptor, rows, SETTINGS, TRAIN } from './corpus/repo.js';
import {
  foreignCommands,
  prepareBundles,
  runAction,
  runCli,
  runnerCommands,
  TOKEN,
  withoutMask,
  writeCase,
  type CaseDirs,
  type Run,
} from './harness.js';

/** A descriptor file name (the broken descriptor's name is its path) with a command in the middle of the line. */
const MID_LINE_FILE = 'models/a ##[error]forged-mid-line.model.yml';
/** A descriptor file name with a line break before a command, and `]]>`. */
const BREAK_FILE = 'models/b ]]> x\n::error::forged-after-break.model.yml';
/** A column name that closes a table cell and opens a script, with a line break and a mid-line command. */
const CELL_COLUMN = 'u</td><script>alert(1)</script>\n##[warning]forged-column ]]>';

/** Quotes a CSV field. */
const q = (s: string): string => `"${s.replace(/"/g, '""')}"`;

/** x, a wobbly second input named CELL_COLUMN, y. */
function data(n: number, x0: number, step: number): string {
  const lines = [['x', q(CELL_COLUMN), 'y'].join(',')];
  rows(n, x0, step)
    .trim()
    .split('\n')
    .slice(1)
    .forEach((line, i) => {
      const [x, y] = line.split(',');
      lines.push([x, String((i % 4) * 0.3), y].join(','));
    });
  return `${lines.join('\n')}\n`;
}

const FILES = {
  // Coefficient sizes and parameters per row fail, so the column is named in findings.
  'fitgate.yml': `${SETTINGS}limits:\n  params_per_sample: 0.05\n`,
  'models/m.model.yml': descriptor({ terms: `  - linear: [x, ${JSON.stringify(CELL_COLUMN)}]\n` }),
  'models/cell.model.yml': descriptor({ name: 'cell', train: '../data/bad.csv' }),
  [MID_LINE_FILE]: 'version: 1\nname: [broken\n',
  [BREAK_FILE]: 'version: 1\nname: [broken\n',
  'data/train.csv': data(30, 0, 1),
  'data/holdout.csv': data(10, 0.5, 3),
  // A bad cell, short enough to be quoted whole (messages quote at most 80 characters).
  'data/bad.csv': TRAIN.replace('\n3,', `\n${q('x ##[error]c\n::error::c </td>')},`),
};

let dirs: CaseDirs;
let text: Run;
let markdown: Run;
let json: Run;
let action: Run;

beforeAll(async () => {
  prepareBundles();
  dirs = writeCase(FILES, 'forged');
  [text, markdown, json, action] = await Promise.all([
    runCli(dirs, ['--html', 'html', '--junit', 'junit.xml', '--sarif', 'x.sarif']),
    runCli(dirs, ['--format', 'markdown']),
    runCli(dirs, ['--format', 'json']),
    runAction(dirs, { html: 'site', junit: 'site/junit.xml' }),
  ]);
}, 240_000);

afterAll(() => {
  if (dirs) rmSync(dirs.base, { recursive: true, force: true });
});

describe('no runner command anywhere in a line (item 4)', () => {
  it('every model gets its outcome (exit 2: two descriptors and one cell are broken)', () => {
    expect(json.status, json.stderr).toBe(2);
    const report = JSON.parse(json.stdout) as { models: { name: string; verdict: string; columns: string[] }[] };
    expect(report.models.map((m) => [m.name, m.verdict]).sort()).toEqual(
      [
        [BREAK_FILE, 'error'],
        [MID_LINE_FILE, 'error'],
        ['cell', 'error'],
        ['m', 'fail'],
      ].sort(),
    );
    // JSON keeps every name exactly.
    expect(report.models.find((m) => m.name === 'm')?.columns).toContain(CELL_COLUMN);
  });

  it.each([
    ['text', () => text],
    ['markdown', () => markdown],
    ['json', () => json],
  ])('CLI --format %s: no line of standard output or error holds a runner command', (_, run) => {
    const r = run();
    expect(runnerCommands(r.stdout), r.stdout).toEqual([]);
    expect(runnerCommands(r.stderr), r.stderr).toEqual([]);
    expect(r.stdout).toContain('forged');
  });

  it('CLI text shows the names, with the mid-line command broken and the line break as a space', () => {
    expect(text.stdout).toContain('models/a ## [error]forged-mid-line.model.yml');
    expect(text.stdout).toContain('models/b ]]> x ::error::forged-after-break.model.yml');
    // The cell is quoted as a JSON string: its line break shows as `\n`.
    expect(text.stdout).toContain('got "x ## [error]c\\n::error::c </td>"');
  });

  it('action: the token is masked first, and no line holds a command fitgate did not write', () => {
    expect(action.status).toBe(1);
    expect(action.stdout.split('\n')[0]).toBe(`::add-mask::${TOKEN}`);
    expect(withoutMask(action.stdout)).not.toContain(TOKEN);
    expect(foreignCommands(action.stdout), action.stdout).toEqual([]);
    expect(runnerCommands(action.stderr)).toEqual([]);
    // The findings are there, as fitgate's own annotations.
    expect(action.stdout).toMatch(/^::error file=models\/a ## \[error\]forged-mid-line\.model\.yml,line=\d+,/m);
    expect(action.stdout).toMatch(/^::error file=models\/b \]\]> x%0A%3A%3Aerror%3A%3Aforged-after-break\.model\.yml,/m);
  });

  it('the job summary holds no command either (Markdown escapes the bracket)', () => {
    expect(runnerCommands(action.summary)).toEqual([]);
    expect(action.summary).toContain('##\\[error\\]forged-mid-line');
  });
});

describe('text reaching XML, HTML or Markdown cannot break out of its element (item 1)', () => {
  it('JUnit XML: every line is one element, no raw line break, `]]>` and `</td>` as text', () => {
    for (const xml of [
      readFileSync(path.join(dirs.base, 'junit.xml'), 'utf8'),
      readFileSync(path.join(dirs.repo, 'site', 'junit.xml'), 'utf8'),
    ]) {
      const lines = xml.trimEnd().split('\n');
      for (const line of lines) expect(line, line).toMatch(/^\s*<[/?a-z][^<>]*>(?:[^<>]*<\/[a-z-]+>)?$/);
      expect(xml).not.toContain(']]>');
      expect(xml).toContain(']]&gt;');
      expect(xml).toContain('c &lt;/td&gt;');
      expect(xml).toContain('x&#10;::error::forged-after-break');
      expect((xml.match(/<testcase\b/g) ?? []).length).toBe((xml.match(/<\/testcase>|<testcase\b[^>]*\/>/g) ?? []).length);
    }
  });

  it('HTML: every <td> closes once, the script stays text', () => {
    for (const html of [
      readFileSync(path.join(dirs.base, 'html', 'index.html'), 'utf8'),
      readFileSync(path.join(dirs.repo, 'site', 'index.html'), 'utf8'),
    ]) {
      expect((html.match(/<td[\s>]/g) ?? []).length).toBe((html.match(/<\/td>/g) ?? []).length);
      expect(html).not.toContain('<script>alert(1)');
      expect(html).toContain('u&lt;/td&gt;&lt;script&gt;alert(1)&lt;/script&gt;');
    }
  });

  it('Markdown: each table row on one line, no tag from the repository', () => {
    for (const md of [markdown.stdout, action.summary]) {
      expect(md).not.toMatch(/<\/td>|<script/);
      for (const line of md.split('\n').filter((l) => l.startsWith('|'))) expect(line.endsWith('|'), line).toBe(true);
      expect(md).not.toMatch(/^::error::forged/m);
    }
  });
});

describe('text from the REST API server is cut and cleaned before it is printed (item 4)', () => {
  let server: Server;
  let url = '';
  const seen: string[] = [];
  const HOSTILE = `\n::error::forged-by-server ##[error]forged-mid ${'x'.repeat(500)}`;

  beforeAll(async () => {
    server = createServer((req: IncomingMessage, res: ServerResponse) => {
      seen.push(`${req.method} ${req.url} ${req.headers.authorization === `token ${TOKEN}` ? 'with token' : 'without token'}`);
      req.resume();
      // Every answer says the route is deprecated (Octokit prints a warning quoting these headers).
      const headers = {
        'content-type': 'application/json',
        deprecation: 'true',
        sunset: 'soon ##[error]forged-by-header',
        link: '<https://example.invalid/##[error]forged-link>; rel="deprecation"',
      };
      if (req.method === 'GET') {
        res.writeHead(200, headers);
        res.end('[]');
      } else {
        res.writeHead(500, headers);
        res.end(JSON.stringify({ message: HOSTILE }));
      }
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });

  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
  });

  it('an error body and deprecation headers reach the log as short clean lines', async () => {
    const event = path.join(dirs.base, 'event.json');
    writeFileSync(
      event,
      JSON.stringify({
        number: 7,
        pull_request: { number: 7, base: { sha: 'a'.repeat(40) }, head: { sha: 'b'.repeat(40) } },
        repository: { name: 'models', owner: { login: 'acme' } },
      }),
    );
    const run = await runAction(dirs, {}, 60_000, { GITHUB_EVENT_NAME: 'pull_request', GITHUB_EVENT_PATH: event, GITHUB_API_URL: url });
    expect(seen.length, run.stdout).toBeGreaterThanOrEqual(2);
    expect(seen.every((s) => s.endsWith('with token'))).toBe(true);
    expect(foreignCommands(run.stdout), run.stdout).toEqual([]);
    expect(runnerCommands(run.stderr), run.stderr).toEqual([]);
    expect(withoutMask(run.stdout)).not.toContain(TOKEN);
    // The failed comment: the server's message, cut to MAX_SERVER_TEXT characters and on one line.
    const failed = run.stdout
      .split('\n')
      .find((l) => l.startsWith('::warning title=fitgate::the pull-request comment could not be written'));
    expect(failed, run.stdout).toBeDefined();
    const quoted = /written: HTTP 500: (.*)\. The result is unchanged\.$/.exec(failed ?? '')?.[1] ?? '';
    expect([...quoted].length).toBeLessThanOrEqual(MAX_SERVER_TEXT);
    expect(quoted.startsWith('»  ::error::forged-by-server ## [error]forged-mid xxx')).toBe(true);
    expect(quoted.endsWith('…')).toBe(true);
    // Octokit's deprecation warning: through fitgate's own warning line, the header text defused.
    const warned = run.stdout.split('\n').filter((l) => l.startsWith('::warning title=fitgate::GitHub API: '));
    expect(warned.length, run.stdout).toBeGreaterThan(0);
    for (const line of warned) expect(line).not.toContain('##[');
    expect(warned.join('\n')).toContain('## [error]forged-by-header');
    expect(run.stderr).not.toContain('deprecated');
  });
});
