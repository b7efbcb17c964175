/**
 * End to end: runs the committed bundle `node dist/index.js` as the runner does (INPUT_*
 * variables with hyphens kept, GITHUB_* files, RUNNER_TEMP), on a real two-commit git
 * repository, with GITHUB_API_URL pointing at a small stand-in for the REST API on 127.0.0.1.
 * Run `npm run bundle` first when the sources changed.
 */
import { execFile } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'yaml';
import { findCheck } from '../../src/checks/index.js';
import { BAD_DESCRIPTOR, makeFixture, type Fixture } from './fixture.js';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const bundle = path.join(repoRoot, 'dist', 'index.js');
const TOKEN = 'ghs_test-token-do-not-print-4711';
const MARKER = '<!-- fitgate-report -->';
/** The line that registers the token with the runner's masking: the first of every run that read its inputs. */
const MASK = `::add-mask::${TOKEN}`;

/** One request the stand-in API received. */
interface Seen {
  method: string;
  url: string;
  authorization: string | undefined;
  body: { body?: string } | null;
}

/** The stand-in REST API: issue comments of acme/models#7, two per page. */
class FakeApi {
  server: Server;
  seen: Seen[] = [];
  comments: { id: number; body: string }[] = [
    { id: 101, body: 'Looks good to me' },
    { id: 102, body: 'One question about the data' },
    { id: 103, body: 'Another reviewer comment' },
  ];
  mode: 'ok' | 'forbidden' = 'ok';
  nextId = 900;
  url = '';

  constructor() {
    this.server = createServer((req, res) => void this.handle(req, res));
  }

  async start(): Promise<void> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const raw = Buffer.concat(chunks).toString('utf8');
    const url = new URL(req.url ?? '/', this.url);
    this.seen.push({
      method: req.method ?? '',
      url: url.pathname + url.search,
      authorization: req.headers.authorization,
      body: raw ? JSON.parse(raw) : null,
    });
    const send = (status: number, body: unknown, headers: Record<string, string> = {}): void => {
      res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', ...headers });
      res.end(JSON.stringify(body));
    };
    if (this.mode === 'forbidden') return send(403, { message: 'Resource not accessible by integration', status: '403' });
    if (req.method === 'GET' && url.pathname === '/repos/acme/models/issues/7/comments') {
      const page = Number(url.searchParams.get('page') ?? '1');
      const items = this.comments.slice((page - 1) * 2, page * 2);
      const last = Math.max(1, Math.ceil(this.comments.length / 2));
      const next = new URL(url);
      next.searchParams.set('page', String(page + 1));
      return send(
        200,
        items.map((c) => ({ id: c.id, body: c.body, user: { login: 'someone' } })),
        page < last ? { link: `<${next.href}>; rel="next"` } : {},
      );
    }
    if (req.method === 'POST' && url.pathname === '/repos/acme/models/issues/7/comments') {
      const body = String(JSON.parse(raw).body);
      const comment = { id: this.nextId++, body };
      this.comments.push(comment);
      return send(201, comment);
    }
    // The review suggestions' endpoints (action/review-suggestions.ts): no changed file, no review comment.
    if (
      req.method === 'GET' &&
      (url.pathname === '/repos/acme/models/pulls/7/files' || url.pathname === '/repos/acme/models/pulls/7/comments')
    )
      return send(200, []);
    const m = /^\/repos\/acme\/models\/issues\/comments\/(\d+)$/.exec(url.pathname);
    if (req.method === 'PATCH' && m) {
      const comment = this.comments.find((c) => c.id === Number(m[1]));
      if (!comment) return send(404, { message: 'Not Found' });
      comment.body = String(JSON.parse(raw).body);
      return send(200, comment);
    }
    return send(404, { message: `no route ${req.method} ${url.pathname}` });
  }
}

/** What one run of the bundle left behind. */
interface Run {
  status: number;
  stdout: string;
  stderr: string;
  /** Workflow-command lines of stdout, in order. */
  commands: string[];
  outputs: Record<string, string>;
  summary: string;
}

let fixture: Fixture;
let api: FakeApi;
let runCount = 0;

/** Parses the `name<<delimiter` blocks of a GITHUB_OUTPUT file. */
function parseOutputs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  const re = /^([^<\n]+)<<(\S+)\n([\s\S]*?)\n\2$/gm;
  for (const m of text.matchAll(re)) out[m[1]] = m[3];
  return out;
}

/**
 * The inputs of the fitgate step of examples/workflows/fitgate.yml (the README's workflow), as
 * the runner passes them: `INPUT_<NAME>` with the name upper-cased and hyphens kept. The fixture
 * keeps its models in the sub-folder `ml/`, so `working-directory` is the one input overridden.
 */
function workflowInputs(): Record<string, string> {
  const workflow = parse(readFileSync(path.resolve(path.dirname(bundle), '..', 'examples', 'workflows', 'fitgate.yml'), 'utf8')) as {
    jobs: Record<string, { steps: { uses?: string; with?: Record<string, unknown> }[] }>;
  };
  const step = Object.values(workflow.jobs)
    .flatMap((j) => j.steps)
    .find((st) => st.uses?.endsWith('/fitgate@v1'));
  if (!step?.with) throw new Error('examples/workflows/fitgate.yml has no fitgate step with inputs');
  return Object.fromEntries(Object.entries(step.with).map(([k, v]) => [`INPUT_${k.toUpperCase()}`, String(v)]));
}

function runAction(inputs: Record<string, string>, baseSha: string): Promise<Run> {
  runCount += 1;
  const tmp = path.join(fixture.workspace, '..', `${path.basename(fixture.workspace)}-run${runCount}`);
  const outputFile = `${tmp}-output.txt`;
  const summaryFile = `${tmp}-summary.md`;
  const eventFile = `${tmp}-event.json`;
  writeFileSync(outputFile, '');
  writeFileSync(summaryFile, '');
  writeFileSync(
    eventFile,
    JSON.stringify({
      action: 'synchronize',
      number: 7,
      pull_request: { number: 7, base: { sha: baseSha, ref: 'main' }, head: { sha: fixture.headSha } },
      repository: { name: 'models', owner: { login: 'acme' } },
    }),
  );
  const env: NodeJS.ProcessEnv = {
    PATH: process.env.PATH,
    HOME: process.env.HOME,
    GITHUB_ACTIONS: 'true',
    GITHUB_WORKSPACE: fixture.workspace,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_EVENT_PATH: eventFile,
    GITHUB_OUTPUT: outputFile,
    GITHUB_STEP_SUMMARY: summaryFile,
    GITHUB_REPOSITORY: 'acme/models',
    GITHUB_API_URL: api.url,
    RUNNER_TEMP: `${tmp}-temp`,
    ...workflowInputs(),
    'INPUT_WORKING-DIRECTORY': 'ml',
    'INPUT_GITHUB-TOKEN': TOKEN,
    ...inputs,
  };
  return new Promise((resolve) => {
    execFile(process.execPath, [bundle], { cwd: fixture.workspace, env, encoding: 'utf8' }, (error, stdout, stderr) => {
      const status = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
      resolve({
        status,
        stdout,
        stderr,
        commands: stdout.split('\n').filter((l) => l.startsWith('::')),
        outputs: parseOutputs(readFileSync(outputFile, 'utf8')),
        summary: readFileSync(summaryFile, 'utf8'),
      });
    });
  });
}

const FAILURE = `::error::1 of 5 models could not be checked (${BAD_DESCRIPTOR.replace(/%/g, '%25')}); fix the file named in each annotation. First: ${BAD_DESCRIPTOR.replace(/%/g, '%25')}:3: is not valid YAML: Flow sequence in block collection must be sufficiently indented and end with a ]`;

/** A check's advice sentence, from the registry (the wording is the check's own). */
function advice(id: string): string {
  const check = findCheck(id);
  if (!check) throw new Error(`no check ${id} in the registry`);
  return check.advice.replace(/%/g, '%25');
}

/** The annotation lines every run on the head commit writes, in order. */
// The run's note naming the settings file it read (every run has one).
const SETTINGS = '::notice title=fitgate::settings: fitgate.yml';

const FINDINGS = [
  '::error file=ml/models/bad%2C50%25%3A%3Aerror%3A%3Ax.model.yml,line=3,title=fitgate could not check models/bad%2C50%25%3A%3Aerror%3A%3Ax.model.yml::is not valid YAML: Flow sequence in block collection must be sufficiently indented and end with a ]',
  `::error file=ml/models/steady.model.yml,line=11,title=fitgate base-change (steady)::hold-out RMSE 0.4203 against 0.1382 on the base commit (+204%25); over the fail limit 0.1. ${advice('base-change')}`,
  `::error file=ml/models/wide.model.yml,line=7,title=fitgate parameter-ratio (wide)::4 parameters for 12 training rows (0.3333 per row); over the fail limit 0.1. ${advice('parameter-ratio')}`,
  `::warning file=ml/models/lean.model.yml,line=10,title=fitgate parameter-ratio (lean)::2 parameters for 12 training rows (0.1667 per row); over the warning limit 0.1. ${advice('parameter-ratio')}`,
];

beforeAll(async () => {
  if (!existsSync(bundle)) throw new Error(`${bundle} is missing: run \`npm run bundle\` first`);
  fixture = makeFixture();
  api = new FakeApi();
  await api.start();
});

afterAll(async () => {
  if (api) await new Promise((resolve) => api.server.close(resolve));
});

describe('node dist/index.js on a pull request', () => {
  let first: Run;
  let second: Run;

  it('annotates, summarises, sets outputs and fails the step on the first run, creating the comment', async () => {
    first = await runAction({}, fixture.baseSha);
    expect(first.commands, first.stdout + first.stderr).toEqual([MASK, ...FINDINGS, SETTINGS, FAILURE]);
    expect(first.status).toBe(1);
    // The token is printed once, first, to register it with the runner's masking.
    expect(first.stdout.split('\n').filter((l) => l.includes(TOKEN))).toEqual([MASK]);
    expect(first.stderr).not.toContain(TOKEN);

    // Outputs: verdict, failed count, path of the JSON report under RUNNER_TEMP.
    expect(first.outputs.verdict).toBe('error');
    expect(first.outputs.failed).toBe('2');
    expect(first.outputs.report).toBe(path.join(`${fixture.workspace}-run1-temp`, 'fitgate-report.json'));
    const report = JSON.parse(readFileSync(first.outputs.report, 'utf8'));
    expect(report.models.map((m: { name: string; base?: { status: string } }) => [m.name, m.base?.status ?? null])).toEqual([
      [BAD_DESCRIPTOR, null],
      ['fresh', 'new'],
      ['lean', 'compared'],
      ['steady', 'compared'],
      ['wide', 'compared'],
    ]);
    expect(report.models[3].base.commit).toBe(fixture.baseSha);

    // The workflow's `html` input: the HTML report in the workspace, one section per model.
    const html = readFileSync(path.join(fixture.workspace, 'fitgate-report', 'index.html'), 'utf8');
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    for (const name of ['fresh', 'lean', 'steady', 'wide']) expect(html).toContain(name);

    // Summary: the verdict line, the table with the changes against the base, the details.
    const lines = first.summary.split('\n');
    expect(lines.slice(0, 11)).toEqual([
      '## fitgate',
      '',
      '**ERROR**: 1 of 5 models could not be checked (5 checked: 1 pass, 1 warn, 2 fail, 1 error)',
      '',
      '> settings: fitgate.yml',
      '',
      '| Status | Model | Hold-out RMSE | Gap ratio | Params / row | Largest std. coef. | Against base |',
      '| --- | --- | ---: | ---: | ---: | ---: | --- |',
      '| ERROR | models/bad,50%::error::x.model.yml | – | – | – | – | – |',
      '| pass | fresh | 0.4203 | 2.995 | 0.1 | 0.9999 | new |',
      '| WARN | lean | 4.992 | 0.953 | 0.1667 | 0.9476 | RMSE 0%, gap 0 |',
    ]);
    expect(lines[11]).toMatch(/^\| FAIL \| steady \| 0\.4203 \| 2\.995 \| 0\.1 \| 0\.9999 \| RMSE \+204\.2%, gap \+2\.0\d* \|$/);
    expect(first.summary).toContain('| base-change | FAIL | 2.042 | fail > 0.1 | 11 |');

    // Comment: listed across both pages, then created once with the marker and the same report
    // (the review suggestions' calls to /pulls/ are tested in review-suggestions.e2e.test.ts).
    const issues = api.seen.filter((s) => s.url.includes('/issues/'));
    const calls = issues.map((s) => `${s.method} ${s.url}`);
    expect(calls).toEqual([
      'GET /repos/acme/models/issues/7/comments?per_page=100',
      `GET /repos/acme/models/issues/7/comments?per_page=100&page=2`,
      'POST /repos/acme/models/issues/7/comments',
    ]);
    expect(api.seen.every((s) => s.authorization === `token ${TOKEN}`)).toBe(true);
    const posted = issues[2].body?.body ?? '';
    expect(posted.startsWith(`${MARKER}\n## fitgate\n`)).toBe(true);
    expect(posted.slice(MARKER.length + 1)).toBe(first.summary);
  });

  it('updates the same comment in place on the second run and never adds one', async () => {
    api.seen = [];
    const before = api.comments.length;
    second = await runAction({}, fixture.baseSha);
    expect(second.commands).toEqual([MASK, ...FINDINGS, SETTINGS, FAILURE]);
    expect(api.seen.filter((s) => s.url.includes('/issues/')).map((s) => `${s.method} ${s.url}`)).toEqual([
      'GET /repos/acme/models/issues/7/comments?per_page=100',
      'GET /repos/acme/models/issues/7/comments?per_page=100&page=2',
      'PATCH /repos/acme/models/issues/comments/900',
    ]);
    expect(api.comments.length).toBe(before);
    expect(api.comments.filter((c) => c.body.includes(MARKER)).length).toBe(1);
  });

  it('turns a 403 into one notice and leaves the result unchanged', async () => {
    api.mode = 'forbidden';
    api.seen = [];
    const run = await runAction({}, fixture.baseSha);
    api.mode = 'ok';
    const notice =
      '::notice title=fitgate::the pull-request comment could not be written (HTTP 403): the token may not write to this pull request (pull requests from forks get a read-only token; the comment needs pull-requests: write). The result is unchanged and the report is in the job summary.';
    expect(run.commands).toEqual([MASK, ...FINDINGS, SETTINGS, notice, FAILURE]);
    expect(run.status).toBe(first.status);
    expect(run.outputs.verdict).toBe(first.outputs.verdict);
    expect(run.outputs.failed).toBe(first.outputs.failed);
    expect(run.stdout.split('\n').filter((l) => l.includes(TOKEN))).toEqual([MASK]);
  });

  it('says once that the base commit is missing and carries on', async () => {
    api.seen = [];
    const missing = 'f'.repeat(40);
    const run = await runAction({ INPUT_COMMENT: 'false' }, missing);
    const note =
      '::notice title=fitgate::base commit fffffff is not available; fetch it with `fetch-depth: 2` on actions/checkout (a pull_request checkout is the merge commit, whose first parent is the base). Models are not compared with the base branch in this run.';
    expect(run.commands.filter((l) => l.includes('not available'))).toEqual([note]);
    // Without a base, steady passes its own limits; the other findings stay.
    expect(run.commands).toEqual([MASK, FINDINGS[0], FINDINGS[2], FINDINGS[3], SETTINGS, note, FAILURE]);
    expect(run.summary).toContain('> base commit fffffff is not available');
    expect(run.summary).not.toContain('Against base');
    expect(api.seen).toEqual([]);
  });

  it('passes a run with warnings, and fails it with fail-on: warn', async () => {
    const inputs = { INPUT_CONFIG: 'lean-only.yml', INPUT_COMMENT: 'false' };
    const lenient = await runAction(inputs, fixture.baseSha);
    expect(lenient.commands).toEqual([MASK, FINDINGS[3], '::notice title=fitgate::settings: lean-only.yml']);
    expect(lenient.status).toBe(0);
    expect(lenient.outputs.verdict).toBe('warn');
    expect(lenient.outputs.failed).toBe('0');
    const strict = await runAction({ ...inputs, 'INPUT_FAIL-ON': 'warn' }, fixture.baseSha);
    expect(strict.commands).toEqual([
      MASK,
      FINDINGS[3],
      '::notice title=fitgate::settings: lean-only.yml',
      '::error::1 of 1 models over a limit (fail-on: warn counts warnings): lean. The annotations point at the descriptor lines; the job summary has each figure against its limit.',
    ]);
    expect(strict.status).toBe(1);
    expect(strict.outputs.failed).toBe('1');
  });

  it('stops with exit-2 style errors on bad inputs', async () => {
    const bad = await runAction({ 'INPUT_FAIL-ON': 'sometimes', INPUT_COMMENT: 'false' }, fixture.baseSha);
    expect(bad.commands).toEqual(['::error::fitgate could not run: `fail-on`: input `fail-on` must be `fail` or `warn`, got "sometimes"']);
    expect(bad.status).toBe(1);
    expect(bad.outputs).toEqual({ verdict: 'error' });

    const outside = await runAction({ 'INPUT_WORKING-DIRECTORY': '../elsewhere', INPUT_COMMENT: 'false' }, fixture.baseSha);
    expect(outside.commands).toEqual([
      '::error::fitgate could not run: `working-directory`: input `working-directory` must be a path inside the workspace, got "../elsewhere"',
    ]);
  });
});
